/* The reliability contract of the public API, shared by the numeric fuzz
   target and the thread test.

   contract_run() calls every public function of the covered modules with
   arguments drawn from an input stream, checks each result against the
   documented contract (a named status and NaN outputs on error, or a finite
   result inside the documented range, consistency with the other forms of
   the same computation) and records every output for bitwise comparison.
   Adding a module: write contract_<module>.c with contract_<module>(), and
   add one line to contract_modules.h. */
#ifndef ACPERF_RELIABILITY_CONTRACT_H
#define ACPERF_RELIABILITY_CONTRACT_H

#include <stddef.h>
#include <stdint.h>

#define CONTRACT_MAX_ARGS 64

typedef struct contract contract;
typedef struct acp_aircraft acp_aircraft;

/* Called on every violation with a message naming the function and inputs. */
typedef void (*contract_fail_fn)(contract *c, const char *message);

struct contract {
  const double *args; /* argument stream, read cyclically */
  size_t nargs;
  size_t next;
  uint32_t choice;       /* selector bits: unit names, NULL outputs, array lengths */
  double *record;        /* every output, in call order (may be NULL) */
  size_t nrecord, maxrecord;
  contract_fail_fn fail;
  unsigned long failures;
  unsigned long calls;   /* public calls made */
  unsigned sample;       /* model modules: an expensive function runs on 1 in `sample` calls (0: never) */
};

void contract_init(contract *c, const double *args, size_t nargs, uint32_t choice,
                   double *record, size_t maxrecord, contract_fail_fn fail);

/* Next argument of the stream (0 when the stream is empty). */
double contract_arg(contract *c);
/* Next selector value in [0, n). */
unsigned contract_pick(contract *c, unsigned n);

/* An argument for a function with documented interval [lo, hi]: mostly
   spread inside it (from the stream's next value), sometimes the raw value,
   an edge or the next double outside an edge. */
double contract_range(contract *c, double lo, double hi);
/* Whether this call runs an expensive function (1 in c->sample). */
int contract_sampled(contract *c);

/* The shared read-only models of the model modules: the demo aircraft
   (examples/aircraft/regional_jet.toml and light_twin.toml), loaded once
   before any thread starts. contract_models_init() returns 0 on success. */
int contract_models_init(const char *examples_dir);
void contract_models_free(void);
/* One of the shared demo aircraft, chosen by the stream. */
const acp_aircraft *contract_shared_aircraft(contract *c);
/* A private copy (acp_aircraft_copy) of a demo aircraft with up to three
   keys set to fuzzed values (acp_aircraft_set); NULL when out of memory.
   Free it with acp_aircraft_free(). */
acp_aircraft *contract_private_aircraft(contract *c);
/* Shared or private (*own is then the copy to free, else NULL). */
const acp_aircraft *contract_some_aircraft(contract *c, acp_aircraft **own);

/* Record an output for the bitwise comparisons of the thread test. */
void contract_record(contract *c, double v);

/* Violation handler of the fuzz targets: abort on the first violation, or with
   ACPERF_FUZZ_KEEP_GOING=1 report each kind once and go on. */
void contract_fuzz_violation(contract *c, const char *message);

/* Report a violation (printf-style message, prefixed by the function name). */
void contract_violation(contract *c, const char *fn, const char *fmt, ...)
#if defined(__GNUC__)
    __attribute__((format(printf, 3, 4)))
#endif
    ;

/* v is NaN, or finite and within [lo, hi]; records v. */
void contract_value(contract *c, const char *fn, double v, double lo, double hi);
/* st is ACP_OK or one of the codes in allowed (a bit mask 1u << code); records st. */
void contract_code(contract *c, const char *fn, int st, unsigned allowed);
/* cond holds, else a violation with message what. */
void contract_expect(contract *c, int cond, const char *fn, const char *what);
/* |a - b| <= abs_tol + rel_tol |b|, else a violation naming the quantity. */
void contract_close(contract *c, const char *fn, const char *what, double a, double b,
                    double abs_tol, double rel_tol);
/* Same bits (NaN == NaN), else a violation: a form and its twin must agree exactly. */
void contract_same(contract *c, const char *fn, const char *what, double a, double b);
/* An array form's element against its scalar form: 1e-14 relative, NaN for NaN. */
void contract_element(contract *c, const char *fn, const char *what, double a, double b);

#define ST(code) (1u << (code))

/* Array forms against their scalar forms: each element bit for bit, NaN where
   invalid, the returned count equal to the number of NaN elements; a NULL
   output is skipped; a NULL required input makes every element invalid.
   arrayN has N input arrays; in array3 the third (dtemp) may be NULL for 0. */
typedef double (*contract_scalar1)(double);
typedef double (*contract_scalar2)(double, double);
typedef double (*contract_scalar3)(double, double, double);
typedef size_t (*contract_array1_fn)(size_t, const double *, double *);
typedef size_t (*contract_array2_fn)(size_t, const double *, const double *, double *);
typedef size_t (*contract_array3_fn)(size_t, const double *, const double *, const double *,
                                     double *);
void contract_array1(contract *c, const char *fn, contract_array1_fn fa, contract_scalar1 fs);
void contract_array2(contract *c, const char *fn, contract_array2_fn fa, contract_scalar2 fs);
void contract_array3(contract *c, const char *fn, contract_array3_fn fa, contract_scalar3 fs);

/* The modules covered, one function each (see contract_modules.h). */
#define CONTRACT_MODULE(m) void contract_##m(contract *c);
#define CONTRACT_MODEL(m) void contract_##m(contract *c);
#include "contract_modules.h"
#undef CONTRACT_MODULE
#undef CONTRACT_MODEL

/* Every covered module in turn (the thread test). */
void contract_run(contract *c);
/* The foundation modules only (fuzz_numeric: fast, many executions). */
void contract_run_foundation(contract *c);
/* The model modules only, on the demo aircraft (fuzz_models). */
void contract_run_models(contract *c);

#endif
