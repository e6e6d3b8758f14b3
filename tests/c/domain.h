/* The input-domain audit's table machinery, shared by test_domain.c (the
   foundation modules) and test_domain_models.c (the model modules): one row per
   function, a nominal valid point and per argument the documented interval with
   the status just outside each edge; check_row() probes each edge from inside
   and outside and each argument with NaN and +-Inf. The including file defines
   expect() (how one call is judged) before using check_row(). */
#ifndef ACPERF_TEST_DOMAIN_H
#define ACPERF_TEST_DOMAIN_H

#include <acperf.h>
#include <float.h>
#include <string.h>

#include "check.h"

#define NAN_ERR (-1) /* a scalar form's error: NaN */
#define NOEDGE 0     /* no edge on this side */
#define INF ((double)INFINITY)
#define DOMAIN_MAXARGS 8

typedef struct {
  double in_lo, out_lo, in_hi, out_hi; /* +-INF: no edge on that side; in NaN: outside only */
  int below, above;                    /* status just outside each edge */
} bound;

typedef int (*call_fn)(const double *x, double *out);

typedef struct {
  const char *fn;
  call_fn call;
  int scalar; /* 1: NaN-returning form */
  int nargs;
  double nominal[DOMAIN_MAXARGS];
  bound b[DOMAIN_MAXARGS];
} row;

static inline double down(double x) { return nextafter(x, -INF); }
static inline double up(double x) { return nextafter(x, INF); }
/* [lo, hi], the next double outside is an error e. */
static inline bound closed(double lo, double hi, int e) {
  return (bound){lo, down(lo), hi, up(hi), e, e};
}
/* (0, inf): 0 is an error e. */
static inline bound positive(int e) { return (bound){DBL_TRUE_MIN, 0.0, INF, INF, e, NOEDGE}; }
/* [0, inf). */
static inline bound nonnegative(int e) {
  return (bound){0.0, -DBL_TRUE_MIN, INF, INF, e, NOEDGE};
}
/* Result-range edges: outside by a relative step. */
static inline bound rel(double lo, double hi, double step, int e) {
  return (bound){lo, lo - step * fabs(lo), hi, hi + step * fabs(hi), e, e};
}
/* Outside only (the inside depends on the aircraft): below lo is e_lo, above hi e_hi. */
static inline bound out(double lo, int e_lo, double hi, int e_hi) {
  return (bound){NAN, down(lo), NAN, up(hi), e_lo, e_hi};
}
static const bound FREE = {-INF, -INF, INF, INF, NOEDGE, NOEDGE};

/* One call judged: the status (or NaN of a scalar form) is `want`. */
static int expect(const row *r, const double *x, int want, const char *what, int arg);

static inline int check_row(const row *r) {
  int ok = 1;
  double x[DOMAIN_MAXARGS];
  memcpy(x, r->nominal, sizeof x);
  ok &= expect(r, x, ACP_OK, "nominal", 0);
  const int invalid = r->scalar ? NAN_ERR : ACP_ERR_INVALID;
  for (int i = 0; i < r->nargs; ++i) {
    const bound *b = &r->b[i];
    const double probes[4] = {b->in_lo, b->out_lo, b->in_hi, b->out_hi};
    const int wants[4] = {ACP_OK, r->scalar ? NAN_ERR : b->below, ACP_OK,
                          r->scalar ? NAN_ERR : b->above};
    const char *what[4] = {"at the lower edge", "just below it", "at the upper edge",
                           "just above it"};
    for (int k = 0; k < 4; ++k) {
      /* no edge on this side, or this probe not wanted (outside-only edges) */
      if (isinf(probes[k & 2 ? 2 : 0]) || isinf(probes[k]) || isnan(probes[k])) continue;
      memcpy(x, r->nominal, sizeof x);
      x[i] = probes[k];
      ok &= expect(r, x, wants[k], what[k], i);
    }
    const double bad[3] = {NAN, INF, -INF};
    const char *bad_what[3] = {"NaN", "+Inf", "-Inf"};
    for (int k = 0; k < 3; ++k) {
      memcpy(x, r->nominal, sizeof x);
      x[i] = bad[k];
      ok &= expect(r, x, invalid, bad_what[k], i);
    }
  }
  return ok;
}

#define NOM(...) {__VA_ARGS__}

#endif /* ACPERF_TEST_DOMAIN_H */
