/* Level-flight helpers shared by the climb, cruise and mission modules. */
#include "performance_internal.h"

#include "acperf/status.h"
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
