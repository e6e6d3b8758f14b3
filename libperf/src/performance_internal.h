/* Level-flight helpers shared by the integrators (climb.c, cruise.c, mission.c). */
#ifndef ACPERF_PERFORMANCE_INTERNAL_H
#define ACPERF_PERFORMANCE_INTERNAL_H

#include "acperf/atmosphere.h"
#include "acperf/propulsion.h"

/* ACP_OK when the aircraft has complete drag and engine models (message in err). */
int perf_check(const acp_aircraft *ac, char *err, size_t errlen);

/* Level 1 g flight at TAS tas in air at: drag (N) and the engines delivering it
   (thrust = drag). ACP_OK; ACP_ERR_RANGE (beyond the drag model, below idle
   thrust); ACP_ERR_THRUST (drag above the cruise rating's thrust). */
int perf_level(const acp_aircraft *ac, double mass, const acp_atmos *at, double tas,
               double *drag, acp_engine_point *eng);

/* Specific air range (m of ground per kg of fuel) of level flight: (tas + wind)/fuel
   flow; NaN where perf_level fails or the ground speed is not positive. */
double perf_sar(const acp_aircraft *ac, double mass, const acp_atmos *at, double tas, double wind);

#endif /* ACPERF_PERFORMANCE_INTERNAL_H */
