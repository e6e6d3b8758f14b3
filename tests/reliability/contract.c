/* Shared machinery of the reliability contract (see contract.h). */
#include "contract.h"

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

void contract_run(contract *c) {
#define CONTRACT_MODULE(m) contract_##m(c);
#include "contract_modules.h"
#undef CONTRACT_MODULE
}
