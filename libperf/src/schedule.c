/* Climb and descent speed schedules and their acceleration factor. */
#include "acperf/schedule.h"

#include "acperf/airspeed.h"
#include "acperf/atmosphere.h"
#include "acperf/status.h"
#include "atmosphere_layers.h"
#include "internal.h"

/* Temperature gradient dT/dhp (K/m) of the standard atmosphere at hp; an ISA
   deviation is constant, so it is also the day's gradient. */
static double lapse_at(double hp) {
  int k = ATM_NLAYERS - 1;
  while (k > 0 && hp < ATM_LAYERS[k].h) --k;
  return ATM_LAYERS[k].lapse;
}

/* dV/dhp at constant Mach: V = M a(T), da/dT = a/(2T). */
static double dtas_constant_mach(double mach, double a, double t, double lapse) {
  return mach * a / (2.0 * t) * lapse;
}

/* dV/dhp at constant CAS: qc fixed, p falls as dp/dhp = -p g0/(R Tstd). */
static double dtas_constant_cas(double mach, double a, double t, double tstd, double lapse) {
  const double s = 1.0 + 0.2 * mach * mach;
  const double ratio = expm1(3.5 * log1p(0.2 * mach * mach)); /* qc/p */
  const double dratio = ratio * ACP_G0 / (ACP_R_AIR * tstd);
  const double dmach = dratio / (1.4 * mach * pow(s, 2.5));
  return a * dmach + dtas_constant_mach(mach, a, t, lapse);
}

/* 1 + (V/g) dV/dh with h geometric: dh = (T/Tstd) dhp. */
static double factor(double tas, double dtas_dhp, double t, double tstd) {
  return 1.0 + tas / ACP_G0 * dtas_dhp * tstd / t;
}

double acp_acceleration_factor(int mode, double mach, double hp, double dtemp) {
  acp_atmos at;
  if ((mode != ACP_MODE_CAS && mode != ACP_MODE_MACH) || !(mach > 0.0) ||
      mach > ACP_MACH_MAX || acp_isa(hp, dtemp, &at) != ACP_OK)
    return ACP_NAN;
  const double tstd = at.temperature - dtemp, lapse = lapse_at(hp);
  const double d = mode == ACP_MODE_MACH
                       ? dtas_constant_mach(mach, at.sound_speed, at.temperature, lapse)
                       : dtas_constant_cas(mach, at.sound_speed, at.temperature, tstd, lapse);
  return factor(mach * at.sound_speed, d, at.temperature, tstd);
}

static void set_nan(acp_schedule_point *o) {
  o->mode = o->cas = o->mach = o->tas = o->crossover = o->dtas_dhp = ACP_NAN;
  o->acceleration_factor = ACP_NAN;
}

int acp_speed_schedule(double hp, double dtemp, double cas_low, double hp_limit, double cas,
                       double mach, double vmo, double mmo, acp_schedule_point *out) {
  if (!out) return ACP_ERR_INVALID;
  set_nan(out);
  /* NaN/Inf anywhere is ACP_ERR_INVALID before any range is looked at */
  const double in[] = {hp, dtemp, cas_low, hp_limit, cas, mach, vmo, mmo};
  for (size_t i = 0; i < sizeof in / sizeof in[0]; ++i)
    if (!isfinite(in[i])) return ACP_ERR_INVALID;
  if (!(cas_low > 0.0) || !(cas > 0.0) || !(mach > 0.0) || !(vmo > 0.0) || !(mmo > 0.0))
    return ACP_ERR_INVALID;
  if (mach > ACP_MACH_MAX || mmo > ACP_MACH_MAX) return ACP_ERR_RANGE;
  acp_atmos at;
  int st = acp_isa(hp, dtemp, &at);
  if (st != ACP_OK) return st;

  double crossover;
  if (acp_crossover_altitude(cas, mach, &crossover) != ACP_OK)
    crossover = ACP_NAN; /* outside the atmosphere: one of the two modes everywhere */
  /* Mode by altitude: the crossover is where the CAS reaches the Mach. */
  int mode;
  double target_cas = cas;
  if (hp < hp_limit) {
    mode = ACP_MODE_LOW_CAS;
    target_cas = cas_low;
  } else {
    mode = acp_cas_to_mach(cas, hp) >= mach ? ACP_MODE_MACH : ACP_MODE_CAS;
  }
  if (mode == ACP_MODE_LOW_CAS && acp_cas_to_mach(cas_low, hp) >= mach) mode = ACP_MODE_MACH;
  double m = mode == ACP_MODE_MACH ? mach : acp_cas_to_mach(target_cas, hp);
  /* Caps: the lower of VMO and MMO in Mach terms. */
  const double m_vmo = acp_cas_to_mach(vmo, hp);
  if (m > m_vmo) {
    m = m_vmo;
    mode = ACP_MODE_VMO;
  }
  if (m > mmo) {
    m = mmo;
    mode = ACP_MODE_MMO;
  }
  if (!(m > 0.0)) return ACP_ERR_RANGE; /* NaN, or a CAS so small its Mach underflows to 0 */

  const double tstd = at.temperature - dtemp, lapse = lapse_at(hp);
  const int constant_mach = mode == ACP_MODE_MACH || mode == ACP_MODE_MMO;
  if (!constant_mach && m > 1.0) return ACP_ERR_RANGE; /* the CAS relations used are subsonic */
  const double d = constant_mach
                       ? dtas_constant_mach(m, at.sound_speed, at.temperature, lapse)
                       : dtas_constant_cas(m, at.sound_speed, at.temperature, tstd, lapse);
  out->mode = mode;
  out->mach = m;
  out->tas = m * at.sound_speed;
  /* the CAS flown, exactly, in the CAS modes: the round trip through the
     impact pressure loses digits when it is a denormal (tiny speeds) */
  out->cas = mode == ACP_MODE_LOW_CAS ? cas_low
             : mode == ACP_MODE_CAS   ? cas
             : mode == ACP_MODE_VMO   ? vmo
                                      : acp_mach_to_cas(m, hp);
  out->crossover = crossover;
  out->dtas_dhp = d;
  out->acceleration_factor = factor(out->tas, d, at.temperature, tstd);
  return ACP_OK;
}
