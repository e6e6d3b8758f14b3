/* Shared helpers for the cmocka tests: tolerance checks that print both values.
   No check values live here: each test names the source of its values beside them. */
#ifndef ACPERF_TEST_CHECK_H
#define ACPERF_TEST_CHECK_H

#include <math.h>
#include <setjmp.h>
#include <stdarg.h>
#include <stddef.h>
#include <stdint.h>
#include <stdio.h>

#include <cmocka.h>

/* |got - want| <= abs_tol + rel_tol |want|; fails with both values and a label. */
#define CHECK_CLOSE(got, want, abs_tol, rel_tol, label)                                    \
  do {                                                                                      \
    const double g_ = (got), w_ = (want);                                                   \
    const double lim_ = (abs_tol) + (rel_tol)*fabs(w_);                                     \
    if (!(fabs(g_ - w_) <= lim_)) {                                                         \
      print_error("%s: got %.17g want %.17g (diff %.3g > %.3g)\n", (label), g_, w_,         \
                  fabs(g_ - w_), lim_);                                                     \
      fail();                                                                               \
    }                                                                                       \
  } while (0)

#define CHECK_NAN(got, label)                                                               \
  do {                                                                                      \
    const double g_ = (got);                                                                \
    if (!isnan(g_)) {                                                                       \
      print_error("%s: got %.17g, want NaN\n", (label), g_);                                \
      fail();                                                                               \
    }                                                                                       \
  } while (0)

#endif /* ACPERF_TEST_CHECK_H */
