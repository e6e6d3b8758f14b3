/* Cruise speeds for the integrators (cruise_profile.c, mission.c): no argument
   checks beyond what the public wrappers did. */
#ifndef ACPERF_CRUISE_INTERNAL_H
#define ACPERF_CRUISE_INTERNAL_H

#include "acperf/atmosphere.h"
#include "acperf/cruise.h"

/* A cruise condition: aircraft (checked), atmosphere at hp, wind. */
typedef struct {
  const acp_aircraft *ac;
  double hp, dtemp, wind;
  acp_atmos at;
} cruise_cond;

/* Fill c for hp (status of acp_isa()). */
int cruise_cond_at(cruise_cond *c, const acp_aircraft *ac, double hp, double dtemp, double wind);

/* The speed of `mode` at `mass` and level flight there (time and distance 0).
   ACP_OK or a status, with out all NaN. hint (NULL: none): double[2], the
   previous speed of the mode and (long-range cruise) the previous
   maximum-range speed, 0 when unknown; used as a warm start and updated. */
int cruise_speed_at(const cruise_cond *c, int mode, double cost_index, double mass,
                    double *hint, acp_cruise_point *out);

/* The mode's figure of merit at a point (lower is better): fuel per ground
   distance, cost per ground distance (economy) or fuel flow (endurance). */
double cruise_merit(int mode, double cost_index, const acp_cruise_point *p);

/* The aircraft's mass and altitude limits at the start of a cruise: ACP_OK, or
   ACP_ERR_RANGE with the limit in p's limit_exceeded and limit_excess. */
int cruise_envelope(const cruise_cond *c, double mass, acp_cruise_point *p);

/* NaN in every field. */
void cruise_point_nan(acp_cruise_point *p);

/* Shared argument checks: mode, cost index, mass, wind; the aircraft complete
   (and cruise_mach for the fixed-Mach mode). ACP_OK or ACP_ERR_INVALID/RANGE. */
int cruise_check(const acp_aircraft *ac, int mode, double cost_index, double mass, double wind);

#endif /* ACPERF_CRUISE_INTERNAL_H */
