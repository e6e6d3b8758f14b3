/* Engine model for the integrators (climb.c, cruise.c, mission.c): no
   argument checks beyond what the public wrappers did. */
#ifndef ACPERF_PROPULSION_INTERNAL_H
#define ACPERF_PROPULSION_INTERNAL_H

#include "acperf/atmosphere.h"
#include "acperf/propulsion.h"

/* Mattingly's high-bypass lapse at total temperature/pressure ratios. */
double propulsion_turbofan_lapse(double mach, double theta0, double delta0, double tr);

/* ACP_OK when the aircraft has a complete engine description, else
   ACP_ERR_INVALID with a message in err (may be NULL). */
int prop_check(const acp_aircraft *ac, char *err, size_t errlen);

/* Thrust and fuel flow at a rating in air `at` at Mach `mach`, TAS `tas`
   (all engines). ACP_OK or ACP_ERR_RANGE (propeller at tas < 1 m/s). */
int prop_rating(const acp_aircraft *ac, int rating, const acp_atmos *at, double mach, double tas,
                acp_engine_point *out);

/* Fuel flow delivering `thrust` (N, all engines): ACP_OK, ACP_ERR_THRUST above
   the maximum, ACP_ERR_RANGE below idle thrust. */
int prop_fuel(const acp_aircraft *ac, const acp_atmos *at, double mach, double tas, double thrust,
              acp_engine_point *out);

#endif /* ACPERF_PROPULSION_INTERNAL_H */
