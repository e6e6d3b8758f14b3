/* Array kernels against the scalar functions: every element within 1e-14
   relative (libmvec is accurate to 4 ulp), invalid elements NaN and counted.
   Built once against the dispatching library and, by tests/CMakeLists.txt, once
   per code path (baseline x86-64, AVX2, AVX-512) so each path is checked. */
#include <acperf.h>
#include <stdlib.h>
#include <string.h>

#include "check.h"

#define N 4099 /* not a multiple of the block size or of any vector width */

static double uniform(unsigned long long *s, double lo, double hi) {
  *s = *s * 6364136223846793005ull + 1442695040888963407ull;
  return lo + (hi - lo) * (double)(*s >> 11) / 9007199254740992.0;
}

typedef struct {
  double hp[N], dt[N], v[N], out[N];
} sample;

/* Flight conditions over the whole model, with every 37th element invalid
   (NaN, Inf, out of range) and some supersonic points. */
static sample *make_sample(double vmax) {
  sample *s = malloc(sizeof *s);
  assert_non_null(s);
  unsigned long long seed = 2024u;
  /* -4.9e-324: a negative denormal scales to -0 in a conversion; it must still fail */
  const double bad[] = {(double)NAN, (double)INFINITY, -1.0, 1.0e6, -(double)INFINITY, -4.9e-324};
  for (size_t i = 0; i < N; ++i) {
    s->hp[i] = uniform(&seed, ACP_ISA_HP_MIN, ACP_ISA_HP_MAX);
    s->dt[i] = uniform(&seed, -60.0, 60.0);
    s->v[i] = uniform(&seed, 0.0, vmax);
    if (i % 37 == 5) s->hp[i] = bad[(i / 37) % 6];
    if (i % 37 == 11) s->dt[i] = bad[(i / 37) % 6];
    if (i % 37 == 19) s->v[i] = bad[(i / 37) % 6];
  }
  return s;
}

static void expect_match(const double *array, const double *scalar, size_t n, const char *what) {
  for (size_t i = 0; i < n; ++i) {
    if (isnan(scalar[i])) {
      CHECK_NAN(array[i], what);
    } else {
      CHECK_CLOSE(array[i], scalar[i], 0.0, 1e-14, what);
    }
  }
}

static void test_isa(void **state) {
  (void)state;
  sample *s = make_sample(1.0);
  static double f[6][N], want[6][N];
  size_t invalid = 0;
  for (size_t i = 0; i < N; ++i) {
    acp_atmos a;
    invalid += acp_isa(s->hp[i], s->dt[i], &a) != ACP_OK;
    want[0][i] = a.temperature;
    want[1][i] = a.pressure;
    want[2][i] = a.density;
    want[3][i] = a.sound_speed;
    want[4][i] = a.dynamic_viscosity;
    want[5][i] = a.kinematic_viscosity;
  }
  assert_true(invalid > 0);
  assert_int_equal(acp_isa_n(N, s->hp, s->dt, f[0], f[1], f[2], f[3], f[4], f[5]), invalid);
  const char *names[] = {"T", "p", "rho", "a", "mu", "nu"};
  for (int k = 0; k < 6; ++k) expect_match(f[k], want[k], N, names[k]);
  free(s);
}

typedef double (*conv3)(double, double, double);
typedef size_t (*conv3_n)(size_t, const double *, const double *, const double *, double *);
typedef double (*conv2)(double, double);
typedef size_t (*conv2_n)(size_t, const double *, const double *, double *);

static void check3(conv3 scalar, conv3_n array, double vmax, const char *what) {
  sample *s = make_sample(vmax);
  static double want[N];
  size_t invalid = 0;
  for (size_t i = 0; i < N; ++i) {
    want[i] = scalar(s->v[i], s->hp[i], s->dt[i]);
    invalid += isnan(want[i]);
  }
  assert_int_equal(array(N, s->v, s->hp, s->dt, s->out), invalid);
  expect_match(s->out, want, N, what);
  free(s);
}

static void check2(conv2 scalar, conv2_n array, double vmax, const char *what) {
  sample *s = make_sample(vmax);
  static double want[N];
  size_t invalid = 0;
  for (size_t i = 0; i < N; ++i) {
    want[i] = scalar(s->v[i], s->hp[i]);
    invalid += isnan(want[i]);
  }
  assert_int_equal(array(N, s->v, s->hp, s->out), invalid);
  expect_match(s->out, want, N, what);
  free(s);
}

/* Speeds up to 700 m/s and Mach up to 2.5 cover the subsonic closed forms and
   the supersonic fallback to the scalar path. */
static void test_airspeed(void **state) {
  (void)state;
  check3(acp_cas_to_tas, acp_cas_to_tas_n, 700.0, "cas_to_tas_n");
  check3(acp_tas_to_cas, acp_tas_to_cas_n, 700.0, "tas_to_cas_n");
  check3(acp_tas_to_mach, acp_tas_to_mach_n, 700.0, "tas_to_mach_n");
  check3(acp_mach_to_tas, acp_mach_to_tas_n, 2.5, "mach_to_tas_n");
  check3(acp_eas_to_tas, acp_eas_to_tas_n, 700.0, "eas_to_tas_n");
  check3(acp_tas_to_eas, acp_tas_to_eas_n, 700.0, "tas_to_eas_n");
  check2(acp_cas_to_mach, acp_cas_to_mach_n, 700.0, "cas_to_mach_n");
  check2(acp_mach_to_cas, acp_mach_to_cas_n, 2.5, "mach_to_cas_n");
  check2(acp_cas_to_eas, acp_cas_to_eas_n, 700.0, "cas_to_eas_n");
  check2(acp_eas_to_cas, acp_eas_to_cas_n, 700.0, "eas_to_cas_n");
}

int main(void) {
#ifdef ACP_KERNEL_PATH
  /* A single-path build: skip when this CPU cannot run it. */
  __builtin_cpu_init();
  if ((strcmp(ACP_KERNEL_PATH, "avx2") == 0 && !__builtin_cpu_supports("avx2")) ||
      (strcmp(ACP_KERNEL_PATH, "avx512") == 0 && !__builtin_cpu_supports("avx512f"))) {
    printf("skipped: this CPU has no %s\n", ACP_KERNEL_PATH);
    return 77;
  }
  printf("code path: %s\n", ACP_KERNEL_PATH);
#endif
  const struct CMUnitTest tests[] = {cmocka_unit_test(test_isa), cmocka_unit_test(test_airspeed)};
  return cmocka_run_group_tests(tests, NULL, NULL);
}
