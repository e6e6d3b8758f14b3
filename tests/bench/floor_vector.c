/* The one-pow()-per-element floor again, vectorised through libmvec exactly as
   the library's kernels are (same flags, same dispatch), so the table shows both
   the plain libm floor and the vector floor measured in the same run. A timing
   floor only: no check values here (nothing is compared with a reference). */
#include <math.h>
#include <stddef.h>

#include "../../libperf/src/vector_math.h"

void floor_pow_vector(size_t n, const double *base, const double *expo, double *out);

ACP_DISPATCH
void floor_pow_vector(size_t n, const double *base, const double *expo, double *out) {
#pragma omp simd
  for (size_t i = 0; i < n; ++i) out[i] = pow(base[i], expo[i]);
}
