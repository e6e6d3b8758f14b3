/* Helpers shared by the library's modules; not installed, not exported. */
#ifndef ACPERF_INTERNAL_H
#define ACPERF_INTERNAL_H

#include <math.h>
#include <stddef.h>

#define ACP_NAN ((double)NAN)

/* True when x lies in [lo, hi]; false for NaN. */
static inline int acp_in_range(double x, double lo, double hi) { return x >= lo && x <= hi; }

/* Store v through p when p is not NULL. */
static inline void acp_put(double *p, double v) {
  if (p) *p = v;
}

/* Element i of an optional array input: def when the array is NULL. */
static inline double acp_opt(const double *a, size_t i, double def) { return a ? a[i] : def; }

#endif /* ACPERF_INTERNAL_H */
