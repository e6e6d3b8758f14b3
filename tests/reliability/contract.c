/* Shared machinery of the reliability contract (see contract.h). */
#include "contract.h"

#include <stdlib.h>

#include <math.h>
#include <stdarg.h>
#include <stdio.h>
#include <string.h>

#include "acperf.h"

void contract_init(contract *c, const double *args, size_t nargs, uint32_t choice,
                   double *record, size_t maxrecord, contract_fail_fn fail) {
  memset(c, 0, sizeof *c);
  c->args = args;
  c->nargs = nargs;
  c->choice = choice;
  c->record = record;
  c->maxrecord = maxrecord;
  c->fail = fail;
  c->sample = 8;
}

double contract_arg(contract *c) {
  if (c->nargs == 0) return 0.0;
  const double v = c->args[c->next % c->nargs];
  c->next++;
  return v;
}

unsigned contract_pick(contract *c, unsigned n) {
  /* A small LCG stepped from the input's selector word: deterministic per input. */
  c->choice = c->choice * 1664525u + 1013904223u;
  return n ? (unsigned)((c->choice >> 16) % n) : 0u;
}

void contract_record(contract *c, double v) {
  if (c->record && c->nrecord < c->maxrecord) c->record[c->nrecord] = v;
  c->nrecord++;
}

void contract_violation(contract *c, const char *fn, const char *fmt, ...) {
  char msg[512];
  int k = snprintf(msg, sizeof msg, "%s: ", fn);
  va_list ap;
  va_start(ap, fmt);
  if (k > 0 && (size_t)k < sizeof msg) vsnprintf(msg + k, sizeof msg - (size_t)k, fmt, ap);
  va_end(ap);
  c->failures++;
  if (c->fail) c->fail(c, msg);
}

void contract_value(contract *c, const char *fn, double v, double lo, double hi) {
  c->calls++;
  contract_record(c, v);
  if (isnan(v)) return;
  if (!isfinite(v) || v < lo || v > hi)
    contract_violation(c, fn, "result %.17g outside [%.17g, %.17g]", v, lo, hi);
}

void contract_code(contract *c, const char *fn, int st, unsigned allowed) {
  c->calls++;
  contract_record(c, (double)st);
  if (st == ACP_OK) return;
  if (st < 0 || st > 30 || !(allowed & (1u << st)))
    contract_violation(c, fn, "status %d (%s) is not one it documents", st, acp_strerror(st));
}

void contract_expect(contract *c, int cond, const char *fn, const char *what) {
  if (!cond) contract_violation(c, fn, "%s", what);
}

void contract_close(contract *c, const char *fn, const char *what, double a, double b,
                    double abs_tol, double rel_tol) {
  if (!(fabs(a - b) <= abs_tol + rel_tol * fabs(b)))
    contract_violation(c, fn, "%s: %.17g vs %.17g (diff %.3g)", what, a, b, fabs(a - b));
}

void contract_element(contract *c, const char *fn, const char *what, double a, double b) {
  /* The array forms are vectorised with their own (equivalent) formulas and
     glibc's vector math: within 1e-14 relative of the scalar form
     (docs/performance.md), NaN exactly where the scalar form fails. */
  if (isnan(a) && isnan(b)) return;
  /* near the denormal range (below about 1e-290) a result keeps fewer digits in
     any evaluation order: an absolute 1e-300 there; nothing physical is so small */
  if (!(fabs(a - b) <= 1e-14 * fabs(b) + 1e-300))
    contract_violation(c, fn, "%s: %.17g vs %.17g differ by more than 1e-14", what, a, b);
}

void contract_same(contract *c, const char *fn, const char *what, double a, double b) {
  if (isnan(a) && isnan(b)) return;
  if (memcmp(&a, &b, sizeof a) != 0)
    contract_violation(c, fn, "%s: %.17g vs %.17g differ", what, a, b);
}

#define ARRAY_MAX 6

/* Fill the inputs of an array call; returns n. *null_in tells a NULL input. */
static size_t array_inputs(contract *c, double in[3][ARRAY_MAX], int *null_in, int *null_out,
                           int *null_dtemp) {
  const size_t n = contract_pick(c, ARRAY_MAX + 1);
  for (size_t i = 0; i < n; ++i)
    for (int k = 0; k < 3; ++k) in[k][i] = contract_arg(c);
  *null_in = contract_pick(c, 8) == 0;
  *null_out = contract_pick(c, 6) == 0;
  *null_dtemp = contract_pick(c, 3) == 0;
  return n;
}

static void array_outputs(contract *c, const char *fn, size_t n, size_t bad, const double *out,
                          const double *want, int null_out) {
  size_t nan_count = 0;
  for (size_t i = 0; i < n; ++i) {
    nan_count += isnan(want[i]) ? 1u : 0u;
    contract_record(c, want[i]);
    if (!null_out) contract_element(c, fn, "element differs from the scalar form", out[i], want[i]);
  }
  c->calls++;
  contract_record(c, (double)bad);
  if (bad != nan_count)
    contract_violation(c, fn, "returned %zu invalid, %zu elements are NaN", bad, nan_count);
}

void contract_array1(contract *c, const char *fn, contract_array1_fn fa, contract_scalar1 fs) {
  double in[3][ARRAY_MAX], out[ARRAY_MAX], want[ARRAY_MAX];
  int null_in, null_out, null_dtemp;
  const size_t n = array_inputs(c, in, &null_in, &null_out, &null_dtemp);
  for (size_t i = 0; i < n; ++i) want[i] = null_in ? NAN : fs(in[0][i]);
  const size_t bad = fa(n, null_in ? NULL : in[0], null_out ? NULL : out);
  array_outputs(c, fn, n, bad, out, want, null_out);
}

void contract_array2(contract *c, const char *fn, contract_array2_fn fa, contract_scalar2 fs) {
  double in[3][ARRAY_MAX], out[ARRAY_MAX], want[ARRAY_MAX];
  int null_in, null_out, null_dtemp;
  const size_t n = array_inputs(c, in, &null_in, &null_out, &null_dtemp);
  const int which = (int)contract_pick(c, 2); /* which input is NULL */
  for (size_t i = 0; i < n; ++i) want[i] = null_in ? NAN : fs(in[0][i], in[1][i]);
  const size_t bad = fa(n, null_in && which == 0 ? NULL : in[0], null_in && which == 1 ? NULL : in[1],
                        null_out ? NULL : out);
  array_outputs(c, fn, n, bad, out, want, null_out);
}

void contract_array3(contract *c, const char *fn, contract_array3_fn fa, contract_scalar3 fs) {
  double in[3][ARRAY_MAX], out[ARRAY_MAX], want[ARRAY_MAX];
  int null_in, null_out, null_dtemp;
  const size_t n = array_inputs(c, in, &null_in, &null_out, &null_dtemp);
  const int which = (int)contract_pick(c, 2);
  for (size_t i = 0; i < n; ++i)
    want[i] = null_in ? NAN : fs(in[0][i], in[1][i], null_dtemp ? 0.0 : in[2][i]);
  const size_t bad = fa(n, null_in && which == 0 ? NULL : in[0], null_in && which == 1 ? NULL : in[1],
                        null_dtemp ? NULL : in[2], null_out ? NULL : out);
  array_outputs(c, fn, n, bad, out, want, null_out);
}

double contract_range(contract *c, double lo, double hi) {
  const double x = contract_arg(c);
  switch (contract_pick(c, 10)) {
  case 0: return x;
  case 1: return lo;
  case 2: return hi;
  case 3: return nextafter(lo, -HUGE_VAL);
  case 4: return nextafter(hi, HUGE_VAL);
  default: {
    /* the fractional part of the value's magnitude, 0.5 for NaN and Inf */
    const double a = fabs(x);
    const double u = isfinite(a) ? a - floor(a) : 0.5;
    return lo + (hi - lo) * u;
  }
  }
}

int contract_sampled(contract *c) {
  return c->sample != 0 && contract_pick(c, c->sample) == 0;
}

static acp_aircraft *g_demo[2]; /* written once before threads start, then read-only */

int contract_models_init(const char *examples_dir) {
  static const char *const FILES[2] = {"regional_jet.toml", "light_twin.toml"};
  for (int i = 0; i < 2; ++i) {
    char path[1024], err[256];
    snprintf(path, sizeof path, "%s/aircraft/%s", examples_dir, FILES[i]);
    g_demo[i] = acp_aircraft_new();
    if (!g_demo[i] || acp_aircraft_load(g_demo[i], path, err, sizeof err) != ACP_OK) {
      fprintf(stderr, "contract: cannot load %s: %s\n", path, g_demo[i] ? err : "no memory");
      return 1;
    }
  }
  return 0;
}

void contract_models_free(void) {
  for (int i = 0; i < 2; ++i) {
    acp_aircraft_free(g_demo[i]);
    g_demo[i] = NULL;
  }
}

const acp_aircraft *contract_shared_aircraft(contract *c) {
  return g_demo[contract_pick(c, 2)];
}

/* Numeric keys a fuzzed private copy may change, with their documented
   ranges (docs/aircraft-format.md): every numeric aircraft-level key the
   demo aircraft can carry, and a few component keys. */
static const struct {
  const char *key;
  double lo, hi;
} FUZZ_KEYS[] = {
    {"wing_area", 0.1, 5000.0}, {"span", 0.3, 150.0}, {"oswald", 0.3, 1.0},
    {"cl_max", 0.3, 5.0}, {"cl_min_drag", -0.5, 1.5}, {"sweep_leading_edge", 0.0, 1.2217},
    {"winglet_height", 0.0, 20.0}, {"korn_kappa", 0.7, 1.0}, {"wing_thickness_ratio", 0.02, 0.25},
    {"sweep_quarter_chord", 0.0, 1.0472}, {"cd_misc", 0.0, 0.1}, {"leakage_fraction", 0.0, 0.5},
    {"engine_count", 1.0, 8.0}, {"engine_thrust", 100.0, 1.0e6}, {"throttle_ratio", 0.9, 1.3},
    {"tsfc_c0", 1e-6, 1e-3}, {"tsfc_c1", 0.0, 1e-3}, {"engine_power", 1e3, 2e7},
    {"power_lapse_exponent", 0.3, 1.5}, {"propeller_efficiency", 0.3, 0.95},
    {"psfc", 1e-8, 1e-6}, {"climb_rating", 0.3, 1.0}, {"cruise_rating", 0.3, 1.0},
    {"idle_thrust_fraction", 0.0, 0.3}, {"idle_fuel_flow", 0.0, 5.0}, {"vmo", 20.0, 400.0},
    {"mmo", 0.1, 0.95}, {"max_altitude", 0.0, 25000.0}, {"cl_buffet", 0.2, 2.0},
    {"speed_limit_cas", 20.0, 300.0}, {"speed_limit_altitude", -5000.0, 25000.0},
    {"climb_cas", 20.0, 300.0}, {"climb_mach", 0.05, 0.95}, {"descent_cas", 20.0, 300.0},
    {"descent_mach", 0.05, 0.95}, {"cruise_mach", 0.05, 0.95}, {"approach_cas", 20.0, 150.0},
    {"mass_operating_empty", 1.0, 1e6}, {"mass_max_zero_fuel", 1.0, 1e6},
    {"mass_max_landing", 1.0, 1e6}, {"mass_max_takeoff", 1.0, 1e6}, {"fuel_capacity", 0.0, 5e5},
    {"component.wing.wetted_area", 1e-4, 1e4}, {"component.wing.roughness", 0.0, 1e-3},
    {"component.wing.thickness_ratio", 0.01, 0.4}, {"component.fuselage.length", 0.01, 300.0},
    {"component.fuselage.fineness_ratio", 1.0, 50.0}, {"component.nacelle.interference", 1.0, 3.0},
};
#define NFUZZ_KEYS (sizeof FUZZ_KEYS / sizeof FUZZ_KEYS[0])

/* Put the four mass limits in the order the aircraft check asks for (docs/limits.md),
   so that a whole-range aircraft is not refused for their order alone. */
static void sort_masses(acp_aircraft *ac) {
  static const char *const names[4] = {"mass_operating_empty", "mass_max_zero_fuel",
                                       "mass_max_landing", "mass_max_takeoff"};
  double m[4];
  for (int i = 0; i < 4; ++i) acp_aircraft_get(ac, names[i], &m[i]);
  for (int i = 1; i < 4; ++i) /* insertion sort; NaN (not given) stays where it is */
    for (int j = i; j > 0 && m[j - 1] > m[j]; --j) {
      const double t = m[j];
      m[j] = m[j - 1];
      m[j - 1] = t;
    }
  for (int i = 0; i < 4; ++i)
    if (!isnan(m[i])) acp_aircraft_set(ac, names[i], m[i]);
}

/* A copy of a demo aircraft with some keys changed, or (one in four) every key
   of FUZZ_KEYS drawn afresh over its whole documented range, so that the
   fuzzer reaches far from the demo aircraft and the combinations near the
   limits (contract_range() picks the edges and just outside them too). A
   set that the model refuses (a mass limit out of order, a winglet over half
   the span) leaves the key as it was. */
acp_aircraft *contract_private_aircraft(contract *c) {
  acp_aircraft *own = acp_aircraft_new();
  if (!own) return NULL;
  if (acp_aircraft_copy(own, contract_shared_aircraft(c)) != ACP_OK)
    contract_violation(c, "acp_aircraft_copy", "copy of a demo aircraft refused");
  const int whole = contract_pick(c, 4) == 0;
  const unsigned nkeys = whole ? (unsigned)NFUZZ_KEYS : 1u + contract_pick(c, 6);
  for (unsigned i = 0; i < nkeys; ++i) {
    const unsigned k = whole ? i : contract_pick(c, (unsigned)NFUZZ_KEYS);
    const double v = contract_range(c, FUZZ_KEYS[k].lo, FUZZ_KEYS[k].hi);
    const int st = acp_aircraft_set(own, FUZZ_KEYS[k].key, v);
    contract_code(c, "acp_aircraft_set", st, ST(ACP_ERR_INVALID) | ST(ACP_ERR_RANGE));
  }
  if (whole) sort_masses(own);
  return own;
}

const acp_aircraft *contract_some_aircraft(contract *c, acp_aircraft **own) {
  *own = NULL;
  if (contract_pick(c, 4) != 0) return contract_shared_aircraft(c);
  *own = contract_private_aircraft(c);
  return *own;
}

void contract_run(contract *c) {
  contract_run_foundation(c);
  contract_run_models(c);
}

void contract_run_foundation(contract *c) {
#define CONTRACT_MODULE(m) contract_##m(c);
#define CONTRACT_MODEL(m)
#include "contract_modules.h"
#undef CONTRACT_MODULE
#undef CONTRACT_MODEL
}

void contract_run_models(contract *c) {
#define CONTRACT_MODULE(m)
#define CONTRACT_MODEL(m) contract_##m(c);
#include "contract_modules.h"
#undef CONTRACT_MODULE
#undef CONTRACT_MODEL
}

/* A fuzz target's violation handler: ACPERF_FUZZ_KEEP_GOING=1 reports each kind
   of violation once and goes on (for surveying a new module); otherwise the first
   violation aborts, which libFuzzer reports as a crash. */
void contract_fuzz_violation(contract *c, const char *message) {
  (void)c;
  static char seen[64][48];
  static int nseen = -1;
  if (nseen < 0) nseen = getenv("ACPERF_FUZZ_KEEP_GOING") ? 0 : 64;
  if (nseen >= 64) {
    fprintf(stderr, "contract violation: %s\n", message);
    abort();
  }
  for (int i = 0; i < nseen; ++i)
    if (strncmp(seen[i], message, 40) == 0) return;
  strncpy(seen[nseen], message, 40);
  seen[nseen++][40] = '\0';
  fprintf(stderr, "contract violation: %s\n", message);
}
