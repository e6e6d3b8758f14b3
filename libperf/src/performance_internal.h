/* Level-flight helpers shared by the integrators (climb.c, cruise.c, mission.c). */
#ifndef ACPERF_PERFORMANCE_INTERNAL_H
#define ACPERF_PERFORMANCE_INTERNAL_H

#include "acperf/atmosphere.h"
#include "acperf/climb.h"
#include "acperf/cruise.h"
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

/* A limit found exceeded: an acp_limit code and by how much (kg, m, CL, m/s, Mach). */
typedef struct {
  double code, excess;
} perf_limit;

/* The limit fields of an output after status st: NONE and 0 on success; the
   limit on an error that lim names (code > 0); else NaN. */
void perf_limit_report(int st, const perf_limit *lim, double *code, double *excess);

/* The lowest mass a profile may reach: mass_operating_empty, else ACP_POLAR_MASS_MIN. */
double perf_mass_floor(const acp_aircraft *ac);

/* What the trip relaxes while it iterates on the take-off mass (it reports a
   take-off mass above the limit itself, with the excess). */
#define PERF_RELAX_MTOW 1u
/* ... and the empty-mass floor of its segments and of the final-reserve
   holding (the trip checks the zero-fuel mass it ends at itself, so that the
   excess below the empty mass is that of the whole trip). */
#define PERF_RELAX_FLOOR 2u

/* perf_mass_floor(), or ACP_POLAR_MASS_MIN when relax has PERF_RELAX_FLOOR. */
double perf_floor(const acp_aircraft *ac, unsigned relax);

/* The aircraft's limits on a mass and a pressure altitude (keys that are given;
   hp NaN skips the altitude): ACP_OK with lim NONE, or ACP_ERR_RANGE with lim set. */
int perf_envelope(const acp_aircraft *ac, double mass, double hp, unsigned relax,
                  perf_limit *lim);

/* acp_climb() (descent 0) and acp_descent() (descent 1), their points, acp_level_speed_change() and acp_cruise(),
   with the limits in relax not enforced (for the trip). */
int perf_profile(const acp_aircraft *ac, int descent, double mass, double hp_start, double hp_end,
                 double dtemp, double wind, double step, unsigned relax, acp_profile *out);
int perf_point(const acp_aircraft *ac, int descent, double mass, double hp, double dtemp,
               double wind, unsigned relax, acp_profile_point *out);
int perf_speed_change(const acp_aircraft *ac, double mass, double hp, double dtemp, double wind,
                      double tas_start, double tas_end, unsigned relax, acp_profile *out);
int perf_cruise(const acp_aircraft *ac, int mode, double cost_index, double mass, double hp,
                double dtemp, double wind, int end, double end_value, double step,
                double step_climb, unsigned relax, acp_cruise_result *out);

/* The limits on a speed in level 1 g flight at lift coefficient cl, Mach and
   CAS: cl_max (the stall), mmo and vmo. ACP_OK, or ACP_ERR_RANGE with lim set. */
int perf_speed_envelope(const acp_aircraft *ac, double cl, double mach, double cas,
                        perf_limit *lim);

/* Lift coefficient of level 1 g flight at mass and TAS in air at. */
double perf_lift_coefficient(const acp_aircraft *ac, double mass, const acp_atmos *at, double tas);

#endif /* ACPERF_PERFORMANCE_INTERNAL_H */
