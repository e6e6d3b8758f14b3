/* The array forms' two calling rules that hold for every one of them
   (acperf.h, "Array forms"):

   - in place: an output may be exactly one of the inputs; the results are
     the same bits as with separate outputs (every `_n` form and the drag
     curve, each output in place of each input);
   - bounded work: a NULL required input makes every element invalid and the
     call returns n without evaluating anything, so with every output NULL it
     returns at once whatever n is (n = 2^40 here; the ctest has a TIMEOUT,
     tests/CMakeLists.txt). The climb table's cell count
     n_mass n_hp n_dtemp may overflow in either product: SIZE_MAX.

   Source of the check values: the contract itself (acperf.h, "Array forms"),
   no published figures: the out-of-place call for the in-place results, n (all
   invalid) for a NULL input. The inputs mix
   valid points, points the airspeed kernels hand to the scalar fallback
   (supersonic CAS, Mach above 1) and invalid ones. Aircraft: the invented
   demo jet of examples/aircraft. */
#include <stdint.h>
#include <stdio.h>
#include <string.h>

#include "fixtures.h"

#define N 6      /* points per call */
#define MAX_IN 5 /* array inputs of a form, at most */
#define MAX_OUT 7
#define HUGE_N ((size_t)1 << 40)

static acp_aircraft *g_jet;

static int setup(void **state) {
  (void)state;
  g_jet = aircraft_from_example("regional_jet.toml");
  return g_jet ? 0 : 1;
}

static int teardown(void **state) {
  (void)state;
  acp_aircraft_free(g_jet);
  return 0;
}

/* One array form behind one shape: x[k] its k-th array input, y[k] its k-th output. */
typedef size_t (*array_call)(size_t n, const double *const *x, double *const *y);

typedef struct {
  const char *fn;
  array_call call;
  size_t n_in, n_out;
  const double *in[MAX_IN]; /* N values each */
} form;

/* ---- the forms ------------------------------------------------------------ */
#define A1(f) static size_t w_##f(size_t n, const double *const *x, double *const *y) { return f(n, x[0], y[0]); }
#define A2(f) static size_t w_##f(size_t n, const double *const *x, double *const *y) { return f(n, x[0], x[1], y[0]); }
#define A3(f) static size_t w_##f(size_t n, const double *const *x, double *const *y) { return f(n, x[0], x[1], x[2], y[0]); }
A2(acp_cas_to_mach_n) A2(acp_mach_to_cas_n) A2(acp_cas_to_eas_n) A2(acp_eas_to_cas_n)
A3(acp_cas_to_tas_n) A3(acp_tas_to_cas_n) A3(acp_tas_to_mach_n) A3(acp_mach_to_tas_n)
A3(acp_eas_to_tas_n) A3(acp_tas_to_eas_n)
A1(acp_isa_pressure_altitude_n) A1(acp_geopotential_altitude_n) A1(acp_geometric_altitude_n)

static size_t w_isa(size_t n, const double *const *x, double *const *y) {
  return acp_isa_n(n, x[0], x[1], y[0], y[1], y[2], y[3], y[4], y[5]);
}
static size_t w_drag(size_t n, const double *const *x, double *const *y) {
  return acp_drag_n(g_jet, n, x[0], x[1], x[2], x[3], x[4], y[0], y[1], y[2], y[3], y[4], y[5],
                    y[6]);
}
static size_t w_drag_curve(size_t n, const double *const *x, double *const *y) {
  return acp_drag_curve(g_jet, 30000.0, 9000.0, 0.0, n, x[0], y[0], y[1], y[2], y[3]);
}
static size_t w_speeds(size_t n, const double *const *x, double *const *y) {
  return acp_speeds_n(g_jet, n, x[0], x[1], x[2], y[0], y[1], y[2], y[3], y[4]);
}
static size_t w_speeds_cas(size_t n, const double *const *x, double *const *y) {
  return acp_speeds_cas_n(g_jet, n, x[0], x[1], x[2], y[0], y[1], y[2], y[3], y[4]);
}
static size_t w_speeds_mach(size_t n, const double *const *x, double *const *y) {
  return acp_speeds_mach_n(g_jet, n, x[0], x[1], x[2], y[0], y[1], y[2], y[3], y[4]);
}
static size_t w_glide(size_t n, const double *const *x, double *const *y) {
  return acp_glide_n(g_jet, n, x[0], x[1], x[2], y[0], y[1], y[2], y[3], y[4]);
}
static size_t w_stability(size_t n, const double *const *x, double *const *y) {
  return acp_speed_stability_n(g_jet, n, x[0], x[1], x[2], x[3], y[0], y[1], y[2]);
}
static size_t w_boundary(size_t n, const double *const *x, double *const *y) {
  return acp_speed_stability_boundary_n(g_jet, n, x[0], x[1], x[2], y[0], y[1], y[2]);
}
static size_t w_cruise_speed(size_t n, const double *const *x, double *const *y) {
  return acp_cruise_speed_n(g_jet, ACP_CRUISE_MAX_RANGE, 0.0, n, x[0], x[1], x[2], x[3], y[0],
                            y[1], y[2]);
}
static size_t w_sar(size_t n, const double *const *x, double *const *y) {
  return acp_specific_air_range_n(g_jet, n, x[0], x[1], x[2], x[3], x[4], y[0]);
}

/* Inputs: valid points, the scalar fallback's points (CAS 400 m/s and EAS
   600 m/s at sea level are supersonic, Mach 1.5 and 2.5), invalid ones. */
static const double SPEED[N] = {100, 400, 250, -1, NAN, 600};
static const double MACH[N] = {0.3, 1.5, 0.8, -1, NAN, 2.5};
static const double HP[N] = {0, 0, 11000, 0, 0, 20000};
static const double DTEMP[N] = {0, 10, -20, 150, 0, 5};
static const double PRESSURE[N] = {50000, 101325, -1, NAN, 1e6, 2000};
static const double GEOMETRIC[N] = {0, 11000, -2e4, NAN, 5e5, 8e4};
/* the demo jet: valid, too light (below the empty mass), NaN, too high, an
   overspeed and a fast cruise */
static const double MASS[N] = {30000, 1, 30000, NAN, 25000, 35000};
static const double HP_AC[N] = {9000, 0, 3000, 0, 40000, 11000};
static const double DT_AC[N] = {0, 10, -5, 0, 0, 0};
static const double TAS_AC[N] = {220, 120, 150, 200, 230, 900};
static const double LOAD[N] = {1, 1.5, 2, 1, 1, 1};
static const double WIND[N] = {0, -20, 30, 0, 0, 10};

#define FORM2(f, v) {#f, w_##f, 2, 1, {v, HP}}
#define FORM3(f, v) {#f, w_##f, 3, 1, {v, HP, DTEMP}}
static const form FORMS[] = {
    FORM2(acp_cas_to_mach_n, SPEED), FORM2(acp_mach_to_cas_n, MACH),
    FORM2(acp_cas_to_eas_n, SPEED),  FORM2(acp_eas_to_cas_n, SPEED),
    FORM3(acp_cas_to_tas_n, SPEED),  FORM3(acp_tas_to_cas_n, SPEED),
    FORM3(acp_tas_to_mach_n, SPEED), FORM3(acp_mach_to_tas_n, MACH),
    FORM3(acp_eas_to_tas_n, SPEED),  FORM3(acp_tas_to_eas_n, SPEED),
    {"acp_isa_n", w_isa, 2, 6, {HP, DTEMP}},
    {"acp_isa_pressure_altitude_n", w_acp_isa_pressure_altitude_n, 1, 1, {PRESSURE}},
    {"acp_geopotential_altitude_n", w_acp_geopotential_altitude_n, 1, 1, {GEOMETRIC}},
    {"acp_geometric_altitude_n", w_acp_geometric_altitude_n, 1, 1, {GEOMETRIC}},
    {"acp_drag_n", w_drag, 5, 7, {MASS, HP_AC, DT_AC, TAS_AC, LOAD}},
    {"acp_drag_curve", w_drag_curve, 1, 4, {TAS_AC}},
    {"acp_speeds_n", w_speeds, 3, 5, {MASS, HP_AC, DT_AC}},
    {"acp_speeds_cas_n", w_speeds_cas, 3, 5, {MASS, HP_AC, DT_AC}},
    {"acp_speeds_mach_n", w_speeds_mach, 3, 5, {MASS, HP_AC, DT_AC}},
    {"acp_glide_n", w_glide, 3, 5, {MASS, HP_AC, DT_AC}},
    {"acp_speed_stability_n", w_stability, 4, 3, {MASS, HP_AC, DT_AC, TAS_AC}},
    {"acp_speed_stability_boundary_n", w_boundary, 3, 3, {MASS, HP_AC, DT_AC}},
    {"acp_cruise_speed_n", w_cruise_speed, 4, 3, {MASS, HP_AC, DT_AC, WIND}},
    {"acp_specific_air_range_n", w_sar, 5, 1, {MASS, HP_AC, DT_AC, TAS_AC, WIND}},
};
#define N_FORMS (sizeof FORMS / sizeof FORMS[0])

/* Every `_n` function the public headers declare is in FORMS: the headers
   the umbrella header includes, each searched for "acp_<name>_n(". */
static void test_every_form_listed(void **state) {
  (void)state;
  char path[512], line[512];
  snprintf(path, sizeof path, "%s/../libperf/include/acperf.h", ACP_EXAMPLES_DIR);
  FILE *umbrella = fopen(path, "r");
  assert_non_null(umbrella);
  size_t found = 0;
  while (fgets(line, sizeof line, umbrella)) {
    char header[64];
    if (sscanf(line, "#include \"acperf/%63[a-z_].h\"", header) != 1) continue;
    snprintf(path, sizeof path, "%s/../libperf/include/acperf/%s.h", ACP_EXAMPLES_DIR, header);
    FILE *h = fopen(path, "r");
    if (!h) continue; /* version.h is generated in the build tree */
    while (fgets(line, sizeof line, h)) {
      const char *a = strstr(line, "acp_"), *paren = a ? strstr(a, "_n(") : NULL;
      if (!paren || strncmp(line, "ACP_API", 7) != 0) continue;
      const size_t len = (size_t)(paren - a) + 2;
      size_t f = 0;
      while (f < N_FORMS && !(strlen(FORMS[f].fn) == len && strncmp(FORMS[f].fn, a, len) == 0))
        ++f;
      if (f == N_FORMS) {
        print_error("%s.h: %.*s is not in FORMS\n", header, (int)len, a);
        fail();
      }
      ++found;
    }
    fclose(h);
  }
  fclose(umbrella);
  assert_int_equal(found, N_FORMS - 1); /* all but acp_drag_curve */
}

/* Output o in place of input k, each pair: the count and every output the
   same bits as the call with separate outputs (contract: acperf.h). */
static void test_in_place(void **state) {
  (void)state;
  for (size_t f = 0; f < N_FORMS; ++f) {
    const form *fm = &FORMS[f];
    double want[MAX_OUT][N];
    double *want_out[MAX_OUT] = {NULL};
    for (size_t o = 0; o < fm->n_out; ++o) want_out[o] = want[o];
    const size_t want_bad = fm->call(N, fm->in, want_out);
    /* the points are a mix: some valid, some not */
    if (want_bad == 0 || want_bad == N) {
      print_error("%s: %zu of %d invalid, the test needs a mix\n", fm->fn, want_bad, N);
      fail();
    }
    for (size_t k = 0; k < fm->n_in; ++k)
      for (size_t o = 0; o < fm->n_out; ++o) {
        double x[MAX_IN][N], y[MAX_OUT][N];
        const double *in[MAX_IN] = {NULL};
        double *out[MAX_OUT] = {NULL};
        for (size_t j = 0; j < fm->n_in; ++j) {
          memcpy(x[j], fm->in[j], sizeof x[j]);
          in[j] = x[j];
        }
        for (size_t j = 0; j < fm->n_out; ++j) out[j] = y[j];
        out[o] = x[k];
        const size_t bad = fm->call(N, in, out);
        if (bad != want_bad || memcmp(x[k], want[o], sizeof want[o]) != 0) {
          print_error("%s: output %zu in place of input %zu: %zu invalid (want %zu)\n", fm->fn,
                      o, k, bad, want_bad);
          for (size_t i = 0; i < N; ++i)
            print_error("  [%zu] %.17g want %.17g\n", i, x[k][i], want[o][i]);
          fail();
        }
        for (size_t j = 0; j < fm->n_out; ++j)
          if (j != o && memcmp(y[j], want[j], sizeof want[j]) != 0) {
            print_error("%s: output %zu in place of input %zu changed output %zu\n", fm->fn, o,
                        k, j);
            fail();
          }
      }
  }
}

/* n = 2^40 with every array NULL, then with each required input NULL in
   turn beside outputs NULL: n returned at once (contract: acperf.h). The
   optional inputs (dtemp, load factor, wind) NULL are a standard day, 1 g and
   no wind, so the functions check only the others. */
static void test_null_huge_n(void **state) {
  (void)state;
  const double *none[MAX_IN] = {NULL};
  double *no_out[MAX_OUT] = {NULL};
  for (size_t f = 0; f < N_FORMS; ++f) {
    const size_t bad = FORMS[f].call(HUGE_N, none, no_out);
    if (bad != HUGE_N) {
      print_error("%s: %zu invalid, want n = %zu\n", FORMS[f].fn, bad, HUGE_N);
      fail();
    }
  }
  /* a NULL model is a missing required input too */
  assert_int_equal(acp_drag_curve(NULL, 30000, 0, 0, HUGE_N, TAS_AC, NULL, NULL, NULL, NULL),
                   HUGE_N);
}

/* The given outputs of a call with a NULL required input are NaN (contract:
   acperf.h), also in the early return. */
static void test_null_input_outputs_nan(void **state) {
  (void)state;
  const double *none[MAX_IN] = {NULL};
  for (size_t f = 0; f < N_FORMS; ++f) {
    double y[MAX_OUT][N];
    double *out[MAX_OUT] = {NULL};
    for (size_t o = 0; o < FORMS[f].n_out; ++o) {
      for (size_t i = 0; i < N; ++i) y[o][i] = 1.0;
      out[o] = y[o];
    }
    assert_int_equal(FORMS[f].call(N, none, out), N);
    for (size_t o = 0; o < FORMS[f].n_out; ++o)
      for (size_t i = 0; i < N; ++i) CHECK_NAN(y[o][i], FORMS[f].fn);
  }
}

/* The climb table: NULL required inputs with huge dimensions return at once;
   a cell count that overflows a size_t, in the product n_hp n_dtemp or in
   the product with n_mass, is SIZE_MAX (contract: climb.h). The altitudes
   given are out of order, so a table the size check lets through returns
   after reading two of them. */
static void test_climb_table_bounds(void **state) {
  (void)state;
  const double mass[1] = {30000}, hp[2] = {3000, 1000}, dt[1] = {0};
  assert_int_equal(acp_climb_table(g_jet, 0, 0, 0, HUGE_N, NULL, 1, hp, 1, dt, NULL, NULL, NULL),
                   HUGE_N);
  assert_int_equal(acp_climb_table(g_jet, 0, 0, 0, 1, mass, HUGE_N, NULL, 1, dt, NULL, NULL, NULL),
                   HUGE_N);
  assert_int_equal(acp_climb_table(NULL, 0, 0, 0, 1, mass, 2, hp, HUGE_N, dt, NULL, NULL, NULL),
                   2 * HUGE_N);
  /* 2^33 2^31 = 2^64 wraps to 0 */
  assert_int_equal(acp_climb_table(g_jet, 0, 0, 0, 1, mass, (size_t)1 << 33, hp, (size_t)1 << 31,
                                   dt, NULL, NULL, NULL),
                   SIZE_MAX);
  /* 2^40 (2^30 1) = 2^70 wraps to 0 */
  assert_int_equal(acp_climb_table(g_jet, 0, 0, 0, HUGE_N, mass, (size_t)1 << 30, hp, 1, dt, NULL,
                                   NULL, NULL),
                   SIZE_MAX);
}

int main(void) {
  const struct CMUnitTest tests[] = {
      cmocka_unit_test(test_every_form_listed), cmocka_unit_test(test_in_place),
      cmocka_unit_test(test_null_huge_n),       cmocka_unit_test(test_null_input_outputs_nan),
      cmocka_unit_test(test_climb_table_bounds),
  };
  return cmocka_run_group_tests(tests, setup, teardown);
}
