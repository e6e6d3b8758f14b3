/*
 * acperf benchmark: array kernels against floors measured in the same run.
 *
 * usage: acperf_bench [n] [repetitions]    time every kernel, print CSV:
 *          kernel,n,median_ns_per_element,min_ns,max_ns,ratio_to_pow_floor
 *        acperf_bench --once KERNEL n     run one kernel once (for callgrind counts)
 * Times drift on a shared machine; compare the ratios, not the nanoseconds.
 */
#define _POSIX_C_SOURCE 199309L
#include <acperf.h>
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <time.h>

typedef struct {
  size_t n;
  double *hp, *dtemp, *speed, *base, *expo, *o1, *o2, *o3, *o4;
} arrays;

/* Floors: the cheapest loops that any atmosphere or airspeed kernel must contain.
   Compiled plainly (-O2, no vector pragmas): one libm call per element. */
__attribute__((noinline)) static void floor_copy(const arrays *a) { memcpy(a->o1, a->hp, a->n * sizeof(double)); }
__attribute__((noinline)) static void floor_pow(const arrays *a) {
  for (size_t i = 0; i < a->n; ++i) a->o1[i] = pow(a->base[i], a->expo[i]);
}
__attribute__((noinline)) static void floor_pow2(const arrays *a) {
  for (size_t i = 0; i < a->n; ++i)
    a->o1[i] = pow(a->base[i], a->expo[i]) * pow(a->expo[i] + 2.0, a->base[i]);
}
void floor_pow_vector(size_t n, const double *base, const double *expo, double *out);
__attribute__((noinline)) static void floor_pow_simd(const arrays *a) { floor_pow_vector(a->n, a->base, a->expo, a->o1); }
__attribute__((noinline)) static void floor_exp(const arrays *a) {
  for (size_t i = 0; i < a->n; ++i) a->o1[i] = exp(a->expo[i]);
}

__attribute__((noinline)) static void k_isa(const arrays *a) {
  acp_isa_n(a->n, a->hp, a->dtemp, a->o1, a->o2, a->o3, a->o4, NULL, NULL);
}
__attribute__((noinline)) static void k_isa_all(const arrays *a) {
  acp_isa_n(a->n, a->hp, a->dtemp, a->o1, a->o2, a->o3, a->o4, a->o1, a->o2);
}
__attribute__((noinline)) static void k_pressure_altitude(const arrays *a) {
  acp_isa_pressure_altitude_n(a->n, a->base, a->o1); /* base holds pressures */
}
__attribute__((noinline)) static void k_cas_to_tas(const arrays *a) {
  acp_cas_to_tas_n(a->n, a->speed, a->hp, a->dtemp, a->o1);
}
__attribute__((noinline)) static void k_tas_to_cas(const arrays *a) {
  acp_tas_to_cas_n(a->n, a->speed, a->hp, a->dtemp, a->o1);
}
__attribute__((noinline)) static void k_cas_to_mach(const arrays *a) { acp_cas_to_mach_n(a->n, a->speed, a->hp, a->o1); }
__attribute__((noinline)) static void k_mach_to_cas(const arrays *a) { acp_mach_to_cas_n(a->n, a->expo, a->hp, a->o1); }

typedef struct {
  const char *name;
  void (*run)(const arrays *);
} kernel;

static const kernel KERNELS[] = {
    {"floor_copy", floor_copy},
    {"floor_exp", floor_exp},
    {"floor_pow", floor_pow},
    {"floor_two_pow", floor_pow2},
    {"floor_pow_libmvec", floor_pow_simd},
    {"isa_n_four", k_isa},
    {"isa_n_six", k_isa_all},
    {"isa_pressure_altitude_n", k_pressure_altitude},
    {"cas_to_tas_n", k_cas_to_tas},
    {"tas_to_cas_n", k_tas_to_cas},
    {"cas_to_mach_n", k_cas_to_mach},
    {"mach_to_cas_n", k_mach_to_cas},
};

static double now_ns(void) {
  struct timespec ts;
  clock_gettime(CLOCK_MONOTONIC, &ts);
  return (double)ts.tv_sec * 1e9 + (double)ts.tv_nsec;
}

static int cmp(const void *x, const void *y) {
  const double a = *(const double *)x, b = *(const double *)y;
  return (a > b) - (a < b);
}

static double *alloc(size_t n) {
  double *p = malloc(n * sizeof(double));
  if (!p) {
    fprintf(stderr, "out of memory\n");
    exit(1);
  }
  return p;
}

int main(int argc, char **argv) {
  const int once = argc == 4 && strcmp(argv[1], "--once") == 0;
  const size_t n = once ? (size_t)strtoull(argv[3], NULL, 10)
                        : argc > 1 ? (size_t)strtoull(argv[1], NULL, 10) : 100000;
  const int reps = once ? 1 : argc > 2 ? atoi(argv[2]) : 31;
  if (n == 0 || reps < 1) return 2;
  arrays a = {n, alloc(n), alloc(n), alloc(n), alloc(n), alloc(n),
              alloc(n), alloc(n), alloc(n), alloc(n)};
  /* Pseudo-random flight conditions (fixed LCG seed): sea level to FL450,
     ISA -20..+20, 60..130 m/s (117..253 kt) CAS, subsonic everywhere; pow inputs of the atmosphere's magnitude. */
  unsigned long long s = 12345u;
  for (size_t i = 0; i < n; ++i) {
    s = s * 6364136223846793005ull + 1442695040888963407ull;
    const double u = (double)(s >> 11) / 9007199254740992.0;
    a.hp[i] = -500.0 + 14200.0 * u;
    a.dtemp[i] = -20.0 + 40.0 * fmod(u * 7.0, 1.0);
    a.speed[i] = 60.0 + 70.0 * fmod(u * 13.0, 1.0);
    a.base[i] = 15000.0 + 90000.0 * fmod(u * 3.0, 1.0);
    a.expo[i] = 0.2 + 0.7 * fmod(u * 5.0, 1.0);
  }
  const size_t nk = sizeof KERNELS / sizeof KERNELS[0];
  if (once) {
    for (size_t k = 0; k < nk; ++k)
      if (strcmp(KERNELS[k].name, argv[2]) == 0) {
        KERNELS[k].run(&a);
        return 0;
      }
    fprintf(stderr, "unknown kernel %s\n", argv[2]);
    return 2;
  }
  double *t = alloc((size_t)reps);
  double floor_pow_ns = NAN;
  printf("kernel,n,median_ns_per_element,min_ns,max_ns,ratio_to_pow_floor\n");
  for (size_t k = 0; k < nk; ++k) {
    KERNELS[k].run(&a); /* warm-up */
    for (int r = 0; r < reps; ++r) {
      const double t0 = now_ns();
      KERNELS[k].run(&a);
      t[r] = (now_ns() - t0) / (double)n;
    }
    qsort(t, (size_t)reps, sizeof t[0], cmp);
    const double med = t[reps / 2];
    if (strcmp(KERNELS[k].name, "floor_pow") == 0) floor_pow_ns = med;
    printf("%s,%zu,%.3f,%.3f,%.3f,%.3f\n", KERNELS[k].name, n, med, t[0], t[reps - 1],
           med / floor_pow_ns);
  }
  free(t);
  double *all[] = {a.hp, a.dtemp, a.speed, a.base, a.expo, a.o1, a.o2, a.o3, a.o4};
  for (size_t i = 0; i < sizeof all / sizeof all[0]; ++i) free(all[i]);
  return 0;
}
