/* Vectorised math for the array kernels: glibc's libmvec through GCC's SIMD
   declarations, and run-time dispatch between AVX-512, AVX2 and baseline x86-64
   clones of each hot kernel. Not -ffast-math: libmvec's double functions are
   accurate to 4 ulp and keep IEEE NaN/Inf behaviour, so the array forms stay
   within 1e-14 relative of the scalar ones (tests/c/test_kernels.c checks it).
   Elsewhere (clang, MinGW, non-glibc) these macros are empty and the same loops
   run scalar. */
#ifndef ACPERF_VECTOR_MATH_H
#define ACPERF_VECTOR_MATH_H

#include <math.h>

#if defined(__GNUC__) && !defined(__clang__) && defined(__x86_64__) && defined(__GLIBC__)
#if __GLIBC__ > 2 || (__GLIBC__ == 2 && __GLIBC_MINOR__ >= 35) /* vector log1p, expm1 */
#define ACP_VECTOR_MATH 1
#endif
#endif

#ifdef ACP_VECTOR_MATH
#define ACP_SIMD_DECL __attribute__((simd("notinbranch")))
ACP_SIMD_DECL double pow(double, double);
ACP_SIMD_DECL double exp(double);
ACP_SIMD_DECL double log(double);
ACP_SIMD_DECL double log1p(double);
ACP_SIMD_DECL double expm1(double);
/* ACP_SINGLE_TARGET builds one code path for the flags given (-mavx2, ...):
   the tests use it to check every path the dispatcher can pick. */
#ifndef ACP_SINGLE_TARGET
#define ACP_DISPATCH __attribute__((target_clones("avx512f", "avx2", "default")))
#endif
#endif
#ifndef ACP_DISPATCH
#define ACP_DISPATCH
#endif

/* Elements per block of the array kernels: stack buffers, no allocation. */
#define ACP_BLOCK 256

#include <stddef.h>

/* Length of the block starting at element i of n (1 to ACP_BLOCK for i < n). */
static inline size_t block_length(size_t n, size_t i) {
  const size_t left = n - i;
  return left < ACP_BLOCK ? left : ACP_BLOCK;
}

#endif /* ACPERF_VECTOR_MATH_H */
