/* Helpers shared by the library's modules; not installed, not exported. */
#ifndef ACPERF_INTERNAL_H
#define ACPERF_INTERNAL_H

#include <math.h>
#include <stddef.h>
#include <stdint.h> /* SIZE_MAX */

#define ACP_NAN ((double)NAN)

/* True when x lies in [lo, hi]; false for NaN. */
static inline int acp_in_range(double x, double lo, double hi) { return x >= lo && x <= hi; }

/* Store v through p when p is not NULL. */
static inline void acp_put(double *p, double v) {
  if (p) *p = v;
}

/* Element i of an optional array input: def when the array is NULL. */
static inline double acp_opt(const double *a, size_t i, double def) { return a ? a[i] : def; }

/* An array form's answer when a required input (or the model) is NULL: every
   element invalid, nothing evaluated, the given outputs NaN; returns n. With
   every output NULL too it returns at once, whatever n is (acperf.h). */
static inline size_t acp_all_invalid(size_t n, double *const *outs, size_t n_outs) {
  for (size_t k = 0; k < n_outs; ++k)
    if (outs[k])
      for (size_t i = 0; i < n; ++i) outs[k][i] = ACP_NAN;
  return n;
}

#endif /* ACPERF_INTERNAL_H */
