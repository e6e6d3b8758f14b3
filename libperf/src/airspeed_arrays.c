/* Array forms of the airspeed conversions: vectorised per block of points.
   Each conversion goes input -> Mach -> output through two vector loops on a
   block held on the stack; the rare points outside the closed forms (supersonic
   CAS or Mach, which need the Rayleigh iteration) and invalid points are handed
   to the scalar function, so results and errors are those of the scalar path. */
#include "acperf/airspeed.h"

#include <string.h>

#include "acperf/atmosphere.h"
#include "atmosphere_layers.h"
#include "internal.h"
#include "vector_math.h"

#define RATIO_MACH1 0.89292915873785409 /* qc/p at Mach 1: 1.2^3.5 - 1 */
#define TINY 1e-100 /* below it a Mach or speed ratio squared loses digits to underflow */

/* (1 + y)^3.5 - 1 without cancellation at small y: with s = sqrt(1 + y),
   ((1 + y)^3 - 1) s + (s - 1), and s - 1 = y/(1 + s). */
static inline double pow35_minus_1(double y) {
  const double s = sqrt(1.0 + y);
  return y * (3.0 + y * (3.0 + y)) * s + y / (1.0 + s);
}

/* Subsonic Mach of an impact-pressure ratio: M^2 = 5((1 + r)^(2/7) - 1). */
static inline double subsonic_mach(double r) { return sqrt(5.0 * expm1(log1p(r) * (2.0 / 7.0))); }

typedef enum { Q_CAS, Q_TAS, Q_EAS, Q_MACH } quantity;

/* Mach of each point from CAS, TAS, EAS or Mach; NaN where the closed forms do
   not apply. Invalid points get NaN added (x + NaN = NaN, x + 0 = x exactly)
   rather than a branch, and a NaN temperature (invalid atmosphere) propagates
   through 0 * t. */
ACP_DISPATCH
static void to_mach(quantity q, size_t n, const double *in, const double *t, const double *p,
                    double *mach) {
  switch (q) {
  case Q_CAS:
#pragma omp simd
    for (size_t i = 0; i < n; ++i) {
      const double v = in[i] * (1.0 / ACP_A0);
      const double r = pow35_minus_1(0.2 * v * v) * ACP_P0 / p[i];
      /* the input's own sign: a negative denormal scales to -0; below 1e-100
         (speeds of no physical meaning) v^2 underflows: the scalar form decides */
      const double bad = ((in[i] >= 0.0) & ((v == 0.0) | (v > TINY)) & (v <= 1.0) &
                          (r <= RATIO_MACH1)) ? 0.0 : ACP_NAN;
      mach[i] = subsonic_mach(bad == 0.0 ? r : 0.0) + bad;
    }
    break;
  case Q_TAS:
#pragma omp simd
    for (size_t i = 0; i < n; ++i) {
      const double m = in[i] / sqrt(ACP_GAMMA * ACP_R_AIR * t[i]);
      mach[i] = m + (((in[i] >= 0.0) & (m <= ACP_MACH_MAX)) ? 0.0 : ACP_NAN);
    }
    break;
  case Q_EAS:
#pragma omp simd
    for (size_t i = 0; i < n; ++i) {
      const double m = in[i] / sqrt(ACP_GAMMA * p[i] / ACP_RHO0);
      mach[i] = m + 0.0 * t[i] + (((in[i] >= 0.0) & (m <= ACP_MACH_MAX)) ? 0.0 : ACP_NAN);
    }
    break;
  case Q_MACH:
#pragma omp simd
    for (size_t i = 0; i < n; ++i) {
      const double m = in[i];
      mach[i] = m + 0.0 * t[i] + (((m >= 0.0) & (m <= ACP_MACH_MAX)) ? 0.0 : ACP_NAN);
    }
    break;
  }
}

/* CAS, TAS, EAS or Mach of each point from its Mach; NaN where the closed forms do not apply. */
ACP_DISPATCH
static void from_mach(quantity q, size_t n, const double *mach, const double *t, const double *p,
                      double *out) {
  switch (q) {
  case Q_CAS:
#pragma omp simd
    for (size_t i = 0; i < n; ++i) {
      const double m = mach[i];
      const double r0 = pow35_minus_1(0.2 * m * m) * p[i] * (1.0 / ACP_P0);
      const double bad = (((m == 0.0) | (m > TINY)) & (m <= 1.0) & (r0 <= RATIO_MACH1))
                             ? 0.0 : ACP_NAN;
      out[i] = ACP_A0 * subsonic_mach(bad == 0.0 ? r0 : 0.0) + bad;
    }
    break;
  case Q_TAS:
#pragma omp simd
    for (size_t i = 0; i < n; ++i) out[i] = mach[i] * sqrt(ACP_GAMMA * ACP_R_AIR * t[i]);
    break;
  case Q_EAS:
#pragma omp simd
    for (size_t i = 0; i < n; ++i) out[i] = mach[i] * sqrt(ACP_GAMMA * p[i] / ACP_RHO0);
    break;
  case Q_MACH:
#pragma omp simd
    for (size_t i = 0; i < n; ++i) out[i] = mach[i];
    break;
  }
}

typedef double (*scalar_form)(double value, double hp, double dtemp);

/* Blocks of points: atmosphere, input -> Mach, Mach -> output, then the scalar
   function for every point the closed forms left as NaN. A block's results are
   made on the stack and copied out last, so the output may be one of the inputs
   (in place, acperf.h): the scalar fallback still reads the caller's input. */
static size_t convert(size_t n, const double *in, const double *hp, const double *dtemp,
                      double *out, quantity from, quantity to, scalar_form scalar) {
  if (!in || !hp) return acp_all_invalid(n, &out, 1);
  double t[ACP_BLOCK], p[ACP_BLOCK], m[ACP_BLOCK], res[ACP_BLOCK];
  size_t bad = 0;
  for (size_t i = 0; i < n; i += ACP_BLOCK) {
    const size_t len = block_length(n, i);
    const double *dt = dtemp ? dtemp + i : NULL;
    atm_block(len, hp + i, dt, t, p);
    to_mach(from, len, in + i, t, p, m);
    from_mach(to, len, m, t, p, res);
    for (size_t j = 0; j < len; ++j) {
      if (isnan(res[j]) && !isnan(p[j]) && !isnan(in[i + j]))
        res[j] = scalar(in[i + j], hp[i + j], dt ? dt[j] : 0.0);
      bad += isnan(res[j]) ? 1u : 0u;
    }
    if (out) memcpy(out + i, res, len * sizeof res[0]);
  }
  return bad;
}

/* Adapters giving every scalar form the (value, hp, dtemp) shape. */
static double cas_to_mach3(double v, double hp, double dt) { (void)dt; return acp_cas_to_mach(v, hp); }
static double mach_to_cas3(double v, double hp, double dt) { (void)dt; return acp_mach_to_cas(v, hp); }
static double cas_to_eas3(double v, double hp, double dt) { (void)dt; return acp_cas_to_eas(v, hp); }
static double eas_to_cas3(double v, double hp, double dt) { (void)dt; return acp_eas_to_cas(v, hp); }

size_t acp_cas_to_mach_n(size_t n, const double *cas, const double *hp, double *mach) {
  return convert(n, cas, hp, NULL, mach, Q_CAS, Q_MACH, cas_to_mach3);
}
size_t acp_mach_to_cas_n(size_t n, const double *mach, const double *hp, double *cas) {
  return convert(n, mach, hp, NULL, cas, Q_MACH, Q_CAS, mach_to_cas3);
}
size_t acp_cas_to_eas_n(size_t n, const double *cas, const double *hp, double *eas) {
  return convert(n, cas, hp, NULL, eas, Q_CAS, Q_EAS, cas_to_eas3);
}
size_t acp_eas_to_cas_n(size_t n, const double *eas, const double *hp, double *cas) {
  return convert(n, eas, hp, NULL, cas, Q_EAS, Q_CAS, eas_to_cas3);
}
size_t acp_cas_to_tas_n(size_t n, const double *cas, const double *hp, const double *dtemp,
                        double *tas) {
  return convert(n, cas, hp, dtemp, tas, Q_CAS, Q_TAS, acp_cas_to_tas);
}
size_t acp_tas_to_cas_n(size_t n, const double *tas, const double *hp, const double *dtemp,
                        double *cas) {
  return convert(n, tas, hp, dtemp, cas, Q_TAS, Q_CAS, acp_tas_to_cas);
}
size_t acp_tas_to_mach_n(size_t n, const double *tas, const double *hp, const double *dtemp,
                         double *mach) {
  return convert(n, tas, hp, dtemp, mach, Q_TAS, Q_MACH, acp_tas_to_mach);
}
size_t acp_mach_to_tas_n(size_t n, const double *mach, const double *hp, const double *dtemp,
                         double *tas) {
  return convert(n, mach, hp, dtemp, tas, Q_MACH, Q_TAS, acp_mach_to_tas);
}
size_t acp_eas_to_tas_n(size_t n, const double *eas, const double *hp, const double *dtemp,
                        double *tas) {
  return convert(n, eas, hp, dtemp, tas, Q_EAS, Q_TAS, acp_eas_to_tas);
}
size_t acp_tas_to_eas_n(size_t n, const double *tas, const double *hp, const double *dtemp,
                        double *eas) {
  return convert(n, tas, hp, dtemp, eas, Q_TAS, Q_EAS, acp_tas_to_eas);
}
