/*
 * acperf benchmark: array kernels against floors measured in the same run.
 *
 * usage: acperf_bench [n] [repetitions]    time every kernel, print CSV:
 *          kernel,n,median_ns_per_element,min_ns,max_ns,ratio_to_pow_floor
 *        acperf_bench --once KERNEL n     run one kernel once (for callgrind counts)
 *        acperf_bench --ratios [rounds]   model functions in acp_drag() calls: each
 *          timed in rounds alternated with rounds of plain acp_drag() calls at the
 *          same conditions, minimum of each over the rounds, print CSV:
 *          function,calls_per_round,rounds,ns_per_call_min,drag_ns_per_call_min,ratio_to_drag
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
  acp_aircraft *ac; /* the invented demo regional jet */
  double *mass, *tas; /* 30 to 39 t; 180 to 240 m/s TAS: a jet's cruise and climb */
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
__attribute__((noinline)) /* The scalar function in a loop: the C cost a scalar call from Python pays too. */
__attribute__((noinline)) static void k_cas_to_mach_scalar(const arrays *a) {
  for (size_t i = 0; i < a->n; ++i) a->o1[i] = acp_cas_to_mach(a->speed[i], a->hp[i]);
}
__attribute__((noinline)) static void k_cas_to_tas_scalar(const arrays *a) {
  for (size_t i = 0; i < a->n; ++i) a->o1[i] = acp_cas_to_tas(a->speed[i], a->hp[i], a->dtemp[i]);
}
__attribute__((noinline)) static void k_isa_scalar(const arrays *a) {
  for (size_t i = 0; i < a->n; ++i) {
    acp_atmos s;
    acp_isa(a->hp[i], a->dtemp[i], &s);
    a->o1[i] = s.density;
  }
}
__attribute__((noinline)) static void k_ft_to_m_scalar(const arrays *a) {
  for (size_t i = 0; i < a->n; ++i) a->o1[i] = acp_ft_to_m(a->hp[i]);
}
static void k_mach_to_cas(const arrays *a) { acp_mach_to_cas_n(a->n, a->expo, a->hp, a->o1); }

/* Model kernels on the demo aircraft: per point (drag, speeds, SAR) or per call. */
__attribute__((noinline)) static void k_drag(const arrays *a) {
  acp_drag_n(a->ac, a->n, a->mass, a->hp, a->dtemp, a->tas, NULL, NULL, NULL, NULL, a->o1, NULL,
             NULL, a->o2);
}
__attribute__((noinline)) static void k_speeds(const arrays *a) {
  acp_speeds_n(a->ac, a->n, a->mass, a->hp, a->dtemp, a->o1, a->o2, a->o3, a->o4, NULL);
}
/* Scalar calls in a loop: what one call costs (the ratios of --ratios, and the
   instruction counts of instructions.sh per call). */
__attribute__((noinline)) static void k_drag_scalar(const arrays *a) {
  for (size_t i = 0; i < a->n; ++i) {
    acp_drag_parts d;
    acp_drag(a->ac, a->mass[i], a->hp[i], a->dtemp[i], a->tas[i], &d);
    a->o1[i] = d.total;
  }
}
__attribute__((noinline)) static void k_speeds_scalar(const arrays *a) {
  for (size_t i = 0; i < a->n; ++i) {
    acp_speed_set v;
    acp_speeds(a->ac, a->mass[i], a->hp[i], a->dtemp[i], &v);
    a->o1[i] = v.vmr;
  }
}
__attribute__((noinline)) static void k_sar(const arrays *a) {
  acp_specific_air_range_n(a->ac, a->n, a->mass, a->hp, a->dtemp, a->tas, NULL, a->o1);
}
/* One climb, 1,500 ft to FL350, per "point" (n counts calls). */
__attribute__((noinline)) static void k_climb(const arrays *a) {
  for (size_t i = 0; i < a->n; ++i) {
    acp_profile p;
    acp_climb(a->ac, a->mass[i], 457.2, 10668.0, a->dtemp[i], 0.0, 0.0, &p);
    a->o1[i] = p.fuel;
  }
}
/* One 500 NM cruise at M0.78, FL350 per call. */
__attribute__((noinline)) static void k_cruise(const arrays *a) {
  for (size_t i = 0; i < a->n; ++i) {
    acp_cruise_result r;
    acp_cruise(a->ac, ACP_CRUISE_FIXED_MACH, 0.0, a->mass[i], 10668.0, a->dtemp[i], 0.0,
               ACP_CRUISE_END_DISTANCE, 926000.0, 0.0, 0.0, &r);
    a->o1[i] = r.fuel;
  }
}
/* One trip of mission m for a zero-fuel mass per call; frees m. */
static void trips(const arrays *a, acp_mission *m) {
  for (size_t i = 0; i < a->n; ++i) {
    acp_trip_result r;
    acp_trip_for_zero_fuel_mass(a->ac, m, a->mass[i] - 5000.0, &r);
    a->o1[i] = r.trip_fuel;
  }
  acp_mission_free(m);
}

/* A mission of distance (m) at FL350. */
static acp_mission *fl350(double distance) {
  acp_mission *m = acp_mission_new();
  acp_mission_set(m, "distance", distance);
  acp_mission_set(m, "cruise_altitude", 10668.0);
  return m;
}

/* One 500 NM trip for a zero-fuel mass per call. */
__attribute__((noinline)) static void k_trip(const arrays *a) { trips(a, fl350(926000.0)); }

/* The worst trip of issue 12's probes: long-range cruise over 3,000 km with a
   100 m cruise_step (16 s before the trip's cruise steps were bounded). */
__attribute__((noinline)) static void k_trip_worst(const arrays *a) {
  acp_mission *m = fl350(3.0e6);
  acp_mission_set(m, "cruise_mode", ACP_CRUISE_LONG_RANGE);
  acp_mission_set(m, "cruise_step", 100.0);
  trips(a, m);
}

typedef struct {
  const char *name;
  void (*run)(const arrays *);
  size_t n_max; /* model kernels: at most this many points or calls per repetition */
} kernel;

static const kernel KERNELS[] = {
    {"floor_copy", floor_copy, 0},
    {"floor_exp", floor_exp, 0},
    {"floor_pow", floor_pow, 0},
    {"floor_two_pow", floor_pow2, 0},
    {"floor_pow_libmvec", floor_pow_simd, 0},
    {"isa_n_four", k_isa, 0},
    {"isa_n_six", k_isa_all, 0},
    {"isa_pressure_altitude_n", k_pressure_altitude, 0},
    {"cas_to_tas_n", k_cas_to_tas, 0},
    {"tas_to_cas_n", k_tas_to_cas, 0},
    {"cas_to_mach_n", k_cas_to_mach, 0},
    {"mach_to_cas_n", k_mach_to_cas, 0},
    {"cas_to_mach (scalar loop)", k_cas_to_mach_scalar, 0},
    {"cas_to_tas (scalar loop)", k_cas_to_tas_scalar, 0},
    {"isa (scalar loop)", k_isa_scalar, 0},
    {"ft_to_m (scalar loop)", k_ft_to_m_scalar, 0},
    {"drag_n", k_drag, 20000},
    {"speeds_n", k_speeds, 200},
    {"drag (scalar loop)", k_drag_scalar, 20000},
    {"speeds (scalar loop)", k_speeds_scalar, 200},
    {"specific_air_range_n", k_sar, 20000},
    {"climb_1500ft_to_FL350", k_climb, 50},
    {"cruise_500NM", k_cruise, 20},
    {"trip_500NM", k_trip, 5},
    {"trip_3000km_long_range_step_100m", k_trip_worst, 2},
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

static void table(arrays *ap, size_t n, int reps);

/* Nanoseconds per call of kernel k on a->n calls. */
static double per_call_ns(void (*k)(const arrays *), const arrays *a) {
  const double t0 = now_ns();
  k(a);
  return (now_ns() - t0) / (double)a->n;
}

/* The --ratios table: each model function against acp_drag() in alternated
   rounds on the same conditions, the minimum of each (issue 14's method: the
   ratio holds from machine to machine where the times do not). */
static void ratios(arrays *a, int rounds) {
  static const struct {
    const char *name;
    void (*run)(const arrays *);
    size_t calls;
  } F[] = {{"acp_speeds", k_speeds_scalar, 200},
           {"acp_climb 1,500 ft to FL350", k_climb, 20},
           {"acp_cruise 500 NM", k_cruise, 10},
           {"acp_trip_for_zero_fuel_mass 500 NM", k_trip, 3}};
  const size_t n = a->n;
  printf("function,calls_per_round,rounds,ns_per_call_min,drag_ns_per_call_min,ratio_to_drag\n");
  for (size_t f = 0; f < sizeof F / sizeof F[0]; ++f) {
    a->n = F[f].calls < n ? F[f].calls : n;
    double t_f = INFINITY, t_d = INFINITY;
    F[f].run(a); /* warm-up */
    k_drag_scalar(a);
    for (int r = 0; r < rounds; ++r) {
      t_f = fmin(t_f, per_call_ns(F[f].run, a));
      t_d = fmin(t_d, per_call_ns(k_drag_scalar, a));
    }
    printf("%s,%zu,%d,%.3f,%.3f,%.2f\n", F[f].name, a->n, rounds, t_f, t_d, t_f / t_d);
  }
  a->n = n;
}

int main(int argc, char **argv) {
  const int once = argc == 4 && strcmp(argv[1], "--once") == 0;
  const int ratio_mode = argc >= 2 && strcmp(argv[1], "--ratios") == 0;
  const size_t n = once ? (size_t)strtoull(argv[3], NULL, 10)
                   : ratio_mode ? 200
                   : argc > 1 ? (size_t)strtoull(argv[1], NULL, 10) : 100000;
  const int reps = once ? 1 : ratio_mode ? (argc > 2 ? atoi(argv[2]) : 51)
                   : argc > 2 ? atoi(argv[2]) : 31;
  if (n == 0 || reps < 1) return 2;
  arrays a = {n, alloc(n), alloc(n), alloc(n), alloc(n), alloc(n),
              alloc(n), alloc(n), alloc(n), alloc(n), acp_aircraft_new(), alloc(n), alloc(n)};
  char err[256];
  if (!a.ac || acp_aircraft_load(a.ac, ACP_EXAMPLES_DIR "/aircraft/regional_jet.toml", err,
                                 sizeof err) != ACP_OK) {
    fprintf(stderr, "demo aircraft: %s\n", err);
    return 1;
  }
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
    a.mass[i] = 30000.0 + 9000.0 * fmod(u * 11.0, 1.0);
    a.tas[i] = 180.0 + 60.0 * fmod(u * 17.0, 1.0);
  }
  const size_t nk = sizeof KERNELS / sizeof KERNELS[0];
  if (once) {
    for (size_t k = 0; k < nk; ++k)
      if (strcmp(KERNELS[k].name, argv[2]) == 0) {
        if (KERNELS[k].n_max && a.n > KERNELS[k].n_max) a.n = KERNELS[k].n_max;
        KERNELS[k].run(&a);
        return 0;
      }
    fprintf(stderr, "unknown kernel %s\n", argv[2]);
    return 2;
  }
  if (ratio_mode)
    ratios(&a, reps);
  else
    table(&a, n, reps);
  acp_aircraft_free(a.ac);
  double *all[] = {a.hp, a.dtemp, a.speed, a.base, a.expo, a.o1, a.o2, a.o3, a.o4, a.mass, a.tas};
  for (size_t i = 0; i < sizeof all / sizeof all[0]; ++i) free(all[i]);
  return 0;
}

/* The kernel table: every kernel timed reps times on n points (or its n_max). */
static void table(arrays *ap, size_t n, int reps) {
  arrays a = *ap;
  const size_t nk = sizeof KERNELS / sizeof KERNELS[0];
  double *t = alloc((size_t)reps);
  double floor_pow_ns = NAN;
  printf("kernel,n,median_ns_per_element,min_ns,max_ns,ratio_to_pow_floor\n");
  for (size_t k = 0; k < nk; ++k) {
    a.n = KERNELS[k].n_max && n > KERNELS[k].n_max ? KERNELS[k].n_max : n;
    KERNELS[k].run(&a); /* warm-up */
    for (int r = 0; r < reps; ++r) {
      const double t0 = now_ns();
      KERNELS[k].run(&a);
      t[r] = (now_ns() - t0) / (double)a.n;
    }
    qsort(t, (size_t)reps, sizeof t[0], cmp);
    const double med = t[reps / 2];
    if (strcmp(KERNELS[k].name, "floor_pow") == 0) floor_pow_ns = med;
    printf("%s,%zu,%.3f,%.3f,%.3f,%.3f\n", KERNELS[k].name, a.n, med, t[0], t[reps - 1],
           med / floor_pow_ns);
  }
  free(t);
}
