/* CAS, EAS, TAS and Mach with compressible flow (NACA Report 1135, gamma = 1.4). */
#include "acperf/airspeed.h"

#include "acperf/atmosphere.h"
#include "acperf/status.h"
#include "atmosphere_layers.h"
#include "internal.h"

/* Rayleigh pitot formula for gamma = 1.4: pt2/p = K M^7/(7 M^2 - 1)^2.5 with
   K = 7.2^3.5/6 (NACA Report 1135 eq. 100), to 18 digits. */
#define RAYLEIGH_K 166.92158009316830
/* sqrt(7^2.5/K): the fixed-point factor that solves the Rayleigh formula for M. */
#define RAYLEIGH_ITER 0.88128485434733104
/* qc/p at Mach 1: 1.2^3.5 - 1. */
#define RATIO_MACH1 0.89292915873785409

/* Impact-to-static pressure ratio qc/p of a Mach number (M >= 0). */
static double mach_to_ratio(double m) {
  if (m <= 1.0) return expm1(3.5 * log1p(0.2 * m * m)); /* no cancellation at low speed */
  const double m2 = m * m;
  return RAYLEIGH_K * m2 * m2 * m2 * m / pow(7.0 * m2 - 1.0, 2.5) - 1.0;
}

int acp_pressure_ratio_to_mach(double ratio, double *mach) {
  if (!mach) return ACP_ERR_INVALID;
  *mach = ACP_NAN;
  if (!isfinite(ratio) || ratio < 0.0) return ACP_ERR_INVALID;
  if (ratio <= RATIO_MACH1) {
    *mach = sqrt(5.0 * expm1(log1p(ratio) / 3.5));
    return ACP_OK;
  }
  if (ratio > mach_to_ratio(ACP_MACH_MAX) * (1.0 + 1e-14)) return ACP_ERR_RANGE;
  /* Newton's method on g(M) = ln K + 7 ln M - 2.5 ln(7 M^2 - 1) - ln(qc/p + 1),
     g'(M) = 7/M - 35 M/(7 M^2 - 1) > 0 for M > 1, from the first fixed-point
     iterate c sqrt(qc/p + 1): quadratic convergence; once a step is below
     1e-9 M one more step reaches rounding. */
  const double target = log1p(ratio);
  double m = RAYLEIGH_ITER * sqrt(ratio + 1.0);
  int close = 0;
  for (int k = 0; k < 30; ++k) {
    const double d = 7.0 * m * m - 1.0;
    const double g = log(RAYLEIGH_K) + 7.0 * log(m) - 2.5 * log(d) - target;
    const double step = g / (7.0 / m - 35.0 * m / d);
    m -= step;
    if (close) {
      *mach = fmin(m, ACP_MACH_MAX); /* ratios accepted within round-off above Mach 5 */
      return ACP_OK;
    }
    close = fabs(step) <= 1e-9 * m;
  }
  return ACP_ERR_NO_CONVERGENCE;
}

/* Standard pressure at hp and the temperature with dtemp; status on bad input. */
static int state(double hp, double dtemp, double *p, double *t) {
  int st = atm_check(hp, dtemp);
  if (st != ACP_OK) return st;
  double tstd;
  atm_standard(hp, &tstd, p);
  *t = tstd + dtemp;
  return ACP_OK;
}

static double sound_speed(double t) { return sqrt(ACP_GAMMA * ACP_R_AIR * t); }

/* Mach number valid for the conversions: finite, 0 to ACP_MACH_MAX. */
static int mach_ok(double m) { return acp_in_range(m, 0.0, ACP_MACH_MAX); }

/* A Mach number computed from a speed: within round-off above the edge it is
   the edge (so Mach 5 converted to a speed and back stays valid), else NaN
   outside the range. */
static double mach_result(double m) {
  if (m > ACP_MACH_MAX && m <= ACP_MACH_MAX * (1.0 + 1e-14)) return ACP_MACH_MAX;
  return mach_ok(m) ? m : ACP_NAN;
}

double acp_cas_to_impact_pressure(double cas) {
  if (!(cas >= 0.0)) return ACP_NAN; /* before dividing: -1e-320/a0 underflows to -0 */
  const double m = mach_result(cas / ACP_A0);
  if (isnan(m)) return ACP_NAN;
  return ACP_P0 * mach_to_ratio(m);
}

double acp_impact_pressure_to_cas(double qc) {
  double m;
  if (!(qc >= 0.0)) return ACP_NAN; /* before dividing: a tiny negative qc/p0 is -0 */
  if (acp_pressure_ratio_to_mach(qc / ACP_P0, &m) != ACP_OK) return ACP_NAN;
  return m * ACP_A0;
}

double acp_impact_pressure(double mach, double hp) {
  double p, t;
  if (!mach_ok(mach) || state(hp, 0.0, &p, &t) != ACP_OK) return ACP_NAN;
  return p * mach_to_ratio(mach);
}

double acp_dynamic_pressure(double mach, double hp) {
  double p, t;
  if (!mach_ok(mach) || state(hp, 0.0, &p, &t) != ACP_OK) return ACP_NAN;
  return 0.5 * ACP_GAMMA * p * mach * mach;
}

double acp_cas_to_mach(double cas, double hp) {
  double p, t, m;
  const double qc = acp_cas_to_impact_pressure(cas);
  if (isnan(qc) || state(hp, 0.0, &p, &t) != ACP_OK) return ACP_NAN;
  if (acp_pressure_ratio_to_mach(qc / p, &m) != ACP_OK) return ACP_NAN;
  return m;
}

double acp_mach_to_cas(double mach, double hp) {
  return acp_impact_pressure_to_cas(acp_impact_pressure(mach, hp));
}

double acp_tas_to_mach(double tas, double hp, double dtemp) {
  double p, t;
  if (!isfinite(tas) || tas < 0.0 || state(hp, dtemp, &p, &t) != ACP_OK) return ACP_NAN;
  return mach_result(tas / sound_speed(t));
}

double acp_mach_to_tas(double mach, double hp, double dtemp) {
  double p, t;
  if (!mach_ok(mach) || state(hp, dtemp, &p, &t) != ACP_OK) return ACP_NAN;
  return mach * sound_speed(t);
}

double acp_cas_to_tas(double cas, double hp, double dtemp) {
  double p, t;
  if (state(hp, dtemp, &p, &t) != ACP_OK) return ACP_NAN;
  return acp_cas_to_mach(cas, hp) * sound_speed(t);
}

double acp_tas_to_cas(double tas, double hp, double dtemp) {
  return acp_mach_to_cas(acp_tas_to_mach(tas, hp, dtemp), hp);
}

/* EAS = M sqrt(gamma p/rho0): depends on pressure only. */
double acp_mach_to_eas(double mach, double hp) {
  double p, t;
  if (!mach_ok(mach) || state(hp, 0.0, &p, &t) != ACP_OK) return ACP_NAN;
  return mach * sqrt(ACP_GAMMA * p / ACP_RHO0);
}

double acp_eas_to_mach(double eas, double hp) {
  double p, t;
  if (!isfinite(eas) || eas < 0.0 || state(hp, 0.0, &p, &t) != ACP_OK) return ACP_NAN;
  return mach_result(eas / sqrt(ACP_GAMMA * p / ACP_RHO0));
}

double acp_cas_to_eas(double cas, double hp) {
  return acp_mach_to_eas(acp_cas_to_mach(cas, hp), hp);
}

double acp_eas_to_cas(double eas, double hp) {
  return acp_mach_to_cas(acp_eas_to_mach(eas, hp), hp);
}

double acp_eas_to_tas(double eas, double hp, double dtemp) {
  return acp_mach_to_tas(acp_eas_to_mach(eas, hp), hp, dtemp);
}

double acp_tas_to_eas(double tas, double hp, double dtemp) {
  return acp_mach_to_eas(acp_tas_to_mach(tas, hp, dtemp), hp);
}

int acp_crossover_altitude(double cas, double mach, double *hp) {
  if (!hp) return ACP_ERR_INVALID;
  *hp = ACP_NAN;
  if (!isfinite(cas) || !isfinite(mach) || cas <= 0.0 || mach <= 0.0) return ACP_ERR_INVALID;
  const double qc = acp_cas_to_impact_pressure(cas);
  if (isnan(qc) || mach > ACP_MACH_MAX) return ACP_ERR_RANGE;
  /* p(hp) = qc(CAS) / (qc/p)(M), then the closed-form pressure altitude. */
  int st = acp_isa_pressure_altitude(qc / mach_to_ratio(mach), hp);
  return st == ACP_ERR_INVALID ? ACP_ERR_RANGE : st;
}

double acp_reynolds_per_metre(double tas, double hp, double dtemp) {
  acp_atmos a;
  if (!isfinite(tas) || tas < 0.0 || acp_isa(hp, dtemp, &a) != ACP_OK) return ACP_NAN;
  if (isnan(mach_result(tas / a.sound_speed))) return ACP_NAN;
  return tas / a.kinematic_viscosity;
}

#define TWO_PI 6.28318530717958647692

int acp_wind_triangle(double tas, double track, double wind_from, double wind_speed,
                      double *ground_speed, double *heading, double *drift) {
  acp_put(ground_speed, ACP_NAN);
  acp_put(heading, ACP_NAN);
  acp_put(drift, ACP_NAN);
  if (!isfinite(tas) || !isfinite(track) || !isfinite(wind_from) || !isfinite(wind_speed) ||
      tas <= 0.0 || wind_speed < 0.0)
    return ACP_ERR_INVALID;
  const double rel = wind_from - track;
  const double cross = wind_speed * sin(rel) / tas;
  if (fabs(cross) >= 1.0) return ACP_ERR_RANGE;
  const double wca = asin(cross);
  const double gs = tas * cos(wca) - wind_speed * cos(rel);
  if (!(gs > 0.0) || !isfinite(gs)) return ACP_ERR_RANGE;
  double hdg = fmod(track + wca, TWO_PI);
  if (hdg < 0.0) hdg += TWO_PI;
  if (hdg >= TWO_PI) hdg = 0.0; /* -tiny + 2 pi rounds to 2 pi */
  acp_put(ground_speed, gs);
  acp_put(heading, hdg);
  acp_put(drift, -wca);
  return ACP_OK;
}
