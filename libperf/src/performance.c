/* Level-flight helpers shared by the climb, cruise and mission modules. */
#include "performance_internal.h"

#include "acperf/polar.h"
#include "acperf/status.h"
#include "acperf/units.h"
#include "aircraft_internal.h"
#include "internal.h"
#include "propulsion_internal.h"

int perf_check(const acp_aircraft *ac, char *err, size_t errlen) {
  const int st = ac_check(ac, err, errlen);
  return st != ACP_OK ? st : prop_check(ac, err, errlen);
}

int perf_level(const acp_aircraft *ac, double mass, const acp_atmos *at, double tas,
               double *drag, acp_engine_point *eng) {
  const double d = polar_drag(ac, at, mass * ACP_G0, tas);
  *drag = d;
  if (isnan(d)) return ACP_ERR_RANGE;
  const double mach = tas / at->sound_speed;
  acp_engine_point cruise;
  int st = prop_rating(ac, ACP_RATING_CRUISE, at, mach, tas, &cruise);
  if (st == ACP_OK && d > cruise.thrust) st = ACP_ERR_THRUST;
  if (st == ACP_OK) st = prop_fuel(ac, at, mach, tas, d, eng);
  return st;
}

double perf_sar(const acp_aircraft *ac, double mass, const acp_atmos *at, double tas, double wind) {
  double d;
  acp_engine_point e;
  if (perf_level(ac, mass, at, tas, &d, &e) != ACP_OK || !(tas + wind > 0.0)) return ACP_NAN;
  return (tas + wind) / e.fuel_flow;
}

double perf_floor(const acp_aircraft *ac, unsigned relax) {
  return relax & PERF_RELAX_FLOOR ? ACP_POLAR_MASS_MIN : perf_mass_floor(ac);
}

void perf_limit_report(int st, const perf_limit *lim, double *code, double *excess) {
  const int named = st == ACP_ERR_RANGE && lim->code > 0.0;
  *code = st == ACP_OK ? ACP_LIMIT_NONE : named ? lim->code : ACP_NAN;
  *excess = st == ACP_OK ? 0.0 : named ? lim->excess : ACP_NAN;
}

double perf_mass_floor(const acp_aircraft *ac) {
  const double oew = ac_value(ac, AK_MASS_OPERATING_EMPTY);
  return isnan(oew) ? ACP_POLAR_MASS_MIN : oew;
}

static int exceeded(perf_limit *lim, enum acp_limit code, double excess) {
  lim->code = code;
  lim->excess = excess;
  return ACP_ERR_RANGE;
}

int perf_envelope(const acp_aircraft *ac, double mass, double hp, unsigned relax,
                  perf_limit *lim) {
  lim->code = ACP_LIMIT_NONE;
  lim->excess = 0.0;
  const double mtow = ac_value(ac, AK_MASS_MAX_TAKEOFF);
  const double floor_ = perf_floor(ac, relax);
  const double top = ac_value(ac, AK_MAX_ALTITUDE);
  if (mass > mtow && !(relax & PERF_RELAX_MTOW)) return exceeded(lim, ACP_LIMIT_MASS_MAX_TAKEOFF, mass - mtow);
  if (mass < floor_) return exceeded(lim, ACP_LIMIT_MASS_OPERATING_EMPTY, floor_ - mass);
  if (hp > top) return exceeded(lim, ACP_LIMIT_MAX_ALTITUDE, hp - top);
  return ACP_OK;
}

/* Speeds at a limit itself (a schedule capped at VMO) pass: 1e-9 relative. */
#define SPEED_LIMIT_SLACK 1e-9

double perf_lift_coefficient(const acp_aircraft *ac, double mass, const acp_atmos *at, double tas) {
  return mass * ACP_G0 / (0.5 * at->density * tas * tas * ac->v[AK_WING_AREA]);
}

int perf_speed_envelope(const acp_aircraft *ac, double cl, double mach, double cas,
                        perf_limit *lim) {
  lim->code = ACP_LIMIT_NONE;
  lim->excess = 0.0;
  const double clmax = ac_value(ac, AK_CL_MAX), vmo = ac_value(ac, AK_VMO);
  const double mmo = ac_value(ac, AK_MMO);
  if (cl > clmax) return exceeded(lim, ACP_LIMIT_CL_MAX, cl - clmax);
  if (mach > mmo * (1.0 + SPEED_LIMIT_SLACK)) return exceeded(lim, ACP_LIMIT_MMO, mach - mmo);
  if (cas > vmo * (1.0 + SPEED_LIMIT_SLACK)) return exceeded(lim, ACP_LIMIT_VMO, cas - vmo);
  return ACP_OK;
}
