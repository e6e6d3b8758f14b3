/**
 * @file acperf/climb.h
 * @brief Climb and descent: rate of climb at a point, profiles along the
 *        aircraft's speed schedules with wind, per-step traces, ceilings.
 *
 * Method (docs/methods/climb.md): the energy equation
 * dh/dt = (T - D) V/(m g f) with f the acceleration factor of the schedule
 * (acperf/schedule.h), lift = weight (small path angles, common practice),
 * thrust and fuel flow from acperf/propulsion.h (climb: maximum-climb rating;
 * descent: flight idle), drag from acperf/polar.h. Pressure altitude changes
 * at (Tstd/T) dh/dt. The profile is integrated in steps of pressure altitude
 * with Simpson's rule on dt/dhp, dm/dhp and dx/dhp, the masses at the middle
 * and the end predicted (fourth order where the integrand is smooth: the
 * profile is cut at every kink); the level acceleration (climb) or
 * deceleration (descent) between the low-altitude CAS and the schedule's CAS
 * happens at the speed-limit altitude, integrated with Simpson's rule in
 * ACP_SPEED_CHANGE_STEPS steps of TAS from dV/dt = (T - D)/m. One function
 * books every step's time, distance and fuel.
 *
 * Limits (docs/limits.md): the points and profiles refuse a mass above
 * mass_max_takeoff or below mass_operating_empty, an altitude above
 * max_altitude, a speed above vmo/mmo and a lift coefficient above cl_max
 * with ACP_ERR_RANGE, naming the limit and the excess in `limit` and
 * `limit_excess`; a profile that would burn to below the empty mass (1 kg
 * when it is not given) stops with the same status.
 * Ground distance uses the along-track wind component: V cos(gamma) + wind.
 *
 * Aircraft keys used: engine keys, climb_cas, climb_mach, descent_cas,
 * descent_mach, speed_limit_cas, speed_limit_altitude, vmo, mmo (when given).
 */
#ifndef ACPERF_CLIMB_H
#define ACPERF_CLIMB_H

#include <stddef.h>
#include "acperf/aircraft.h"
#include "acperf/export.h"
#include "acperf/schedule.h"

#define ACP_SPEED_CHANGE_STEPS 6 /**< TAS steps of a level speed change (its bound on work) */
#define ACP_CLIMB_STEP_MIN 10.0   /**< least pressure-altitude step, m: with the cuts, a profile takes
                                       at most ceil(|hp_end - hp_start|/step) + 4 altitude steps of
                                       3 point evaluations and two level speed changes (its bound) */
#define ACP_CLIMB_STEP_MAX 1000.0 /**< greatest pressure-altitude step, m */
#define ACP_CLIMB_STEP_DEFAULT 609.6 /**< default pressure-altitude step, m (2,000 ft): Simpson steps cut at every kink (docs/methods/climb.md) */

ACP_BEGIN_DECLS

/** One point of a climb or descent. All doubles. Append-only. */
typedef struct {
  double time;                /**< s since the start */
  double distance;            /**< ground distance since the start, m */
  double hp;                  /**< pressure altitude, m */
  double mass;                /**< kg */
  double tas;                 /**< m/s */
  double cas;                 /**< m/s */
  double mach;
  double rate;                /**< rate of change of pressure altitude, m/s (negative descending) */
  double gradient;            /**< flight-path angle, rad (geometric) */
  double thrust;              /**< N, all engines */
  double drag;                /**< N */
  double fuel_flow;           /**< kg/s */
  double acceleration_factor; /**< f of the schedule (0 marks a level speed change) */
  double mode;                /**< acp_schedule_mode of the schedule at this point */
  double limit;               /**< point functions: an acp_limit (NONE on success; the limit
                                   exceeded on ACP_ERR_RANGE from a limit, else NaN) */
  double limit_excess;        /**< by how much (unit of the limit); 0 on success, else NaN */
} acp_profile_point;

/** Totals of a climb or descent. All doubles. Append-only. */
typedef struct {
  double time;       /**< s */
  double distance;   /**< ground distance, m */
  double fuel;       /**< kg */
  double mass_end;   /**< kg */
  double tas_end;    /**< m/s */
  double speed_change_time;     /**< s of the level acceleration/deceleration at the limit altitude */
  double speed_change_distance; /**< m of it */
  double speed_change_fuel;     /**< kg of it */
  double limit;        /**< an acp_limit: NONE on success; on ACP_ERR_RANGE from a limit, the
                            limit exceeded (at the start or where the profile crossed it); else NaN */
  double limit_excess; /**< by how much (kg, m, CL, m/s or Mach); 0 on success, else NaN */
} acp_profile;

/** The least margin to buffet onset in cruise, as a load factor (common practice: 1.3 g). */
#define ACP_BUFFET_MARGIN 1.3

/** What holds an altitude of acp_ceiling_set. */
enum acp_altitude_limit {
  ACP_ALTITUDE_LIMIT_NONE = 0,   /**< nothing: the SAR has an inner maximum there (or no limit
                                      is given, for max_cruise_altitude: the 25,000 m search top) */
  ACP_ALTITUDE_LIMIT_THRUST = 1, /**< the maximum-cruise thrust: level flight fails 1 m above */
  ACP_ALTITUDE_LIMIT_CLIMB = 2,  /**< the residual climb rate (100 ft/min for optimum_altitude,
                                      300 ft/min for the cruise altitudes) */
  ACP_ALTITUDE_LIMIT_BUFFET = 3, /**< the ACP_BUFFET_MARGIN margin to buffet onset */
  ACP_ALTITUDE_LIMIT_MAX_ALTITUDE = 4 /**< the aircraft's max_altitude */
};

/** Ceilings and optimum altitude at a mass. All doubles. Append-only. */
typedef struct {
  double service_ceiling;      /**< pressure altitude (m) where the climb rate falls to 100 ft/min */
  double max_climb_altitude;   /**< where it falls to 300 ft/min (common practice) */
  double buffet_altitude;      /**< highest altitude with a 1.3 g margin to buffet at cruise_mach */
  double max_cruise_altitude;  /**< lowest of max_climb_altitude, buffet_altitude, max_altitude */
  double optimum_altitude;     /**< altitude of the greatest specific air range at cruise_mach
                                    below the service ceiling where level flight holds (never
                                    one where it fails); may lie above max_cruise_altitude */
  double optimum_limit;        /**< an acp_altitude_limit: what holds optimum_altitude */
  double best_cruise_altitude; /**< the same within max_cruise_altitude: the altitude to fly */
  double best_cruise_limit;    /**< an acp_altitude_limit: what holds best_cruise_altitude */
  double max_cruise_limit;     /**< an acp_altitude_limit: which limit gives max_cruise_altitude */
} acp_ceiling_set;

/**
 * The climb at a point of the climb schedule (maximum-climb thrust).
 *
 * @param ac    aircraft with drag, engine and climb-schedule keys
 * @param mass  kg; hp pressure altitude (m); dtemp ISA deviation (K)
 * @param wind  along-track wind component (m/s), positive tailwind, |wind| <= 200
 *              (as acp_cruise(); beyond it ACP_ERR_RANGE, also in every function below)
 * @param out   out: the point (time and distance 0); NaN on error
 * @return ACP_OK (the rate may be negative: no climb possible there);
 *         ACP_ERR_INVALID (NULL, NaN/Inf, missing keys); ACP_ERR_RANGE.
 */
ACP_API int acp_climb_point(const acp_aircraft *ac, double mass, double hp, double dtemp,
                            double wind, acp_profile_point *out);

/** The same on the descent schedule at flight idle. */
ACP_API int acp_descent_point(const acp_aircraft *ac, double mass, double hp, double dtemp,
                              double wind, acp_profile_point *out);

/**
 * Climb from hp_start to hp_end (> hp_start) along the climb schedule.
 *
 * @param step  pressure-altitude step (m), ACP_CLIMB_STEP_MIN to ACP_CLIMB_STEP_MAX (10 to 1,000);
 *              0 for ACP_CLIMB_STEP_DEFAULT
 * @param out   out: totals; NaN on error
 * @return ACP_OK; ACP_ERR_INVALID; ACP_ERR_RANGE (altitudes outside the
 *         model, speeds beyond the drag model, |wind| above 200 m/s, mass
 *         outside 1 to 1,000,000 kg); ACP_ERR_THRUST (the climb rate
 *         reaches zero before hp_end: the altitude cannot be reached).
 */
ACP_API int acp_climb(const acp_aircraft *ac, double mass, double hp_start, double hp_end,
                      double dtemp, double wind, double step, acp_profile *out);

/**
 * acp_climb() with a per-step trace. The number of points is known before the
 * integration: when `capacity` is smaller, nothing is integrated, `*count`
 * gives the number needed and the status is ACP_ERR_RANGE.
 *
 * @param points   capacity points out (first: the start; last: hp_end)
 * @param count    out: number of points written (or needed)
 */
ACP_API int acp_climb_trace(const acp_aircraft *ac, double mass, double hp_start,
                            double hp_end, double dtemp, double wind, double step,
                            size_t capacity, acp_profile_point *points, size_t *count,
                            acp_profile *out);

/** Descent from hp_start down to hp_end (< hp_start) at flight idle along the descent schedule. */
ACP_API int acp_descent(const acp_aircraft *ac, double mass, double hp_start, double hp_end,
                        double dtemp, double wind, double step, acp_profile *out);

/** acp_descent() with a per-step trace, as acp_climb_trace(). */
ACP_API int acp_descent_trace(const acp_aircraft *ac, double mass, double hp_start,
                              double hp_end, double dtemp, double wind, double step,
                              size_t capacity, acp_profile_point *points, size_t *count,
                              acp_profile *out);

/**
 * A level speed change at one pressure altitude from tas_start to tas_end:
 * an acceleration at the maximum-climb rating, or a deceleration at flight
 * idle, integrated as the speed change inside a profile (dV/dt = (T - D)/m
 * in ACP_SPEED_CHANGE_STEPS steps of TAS, the trapezoidal rule on dt/dV,
 * dx/dV and dm/dV). The trip uses it at the top of climb (to the cruise
 * speed), the top of descent (to the descent speed) and at the end of the
 * descent (to approach_cas).
 *
 * @param tas_start, tas_end  true airspeeds (m/s), > 0, within the aircraft's
 *                   speed limits (cl_max, vmo, mmo); equal speeds give zeros
 * @param out        out: time, distance, fuel (also in the speed_change_*
 *                   fields), mass_end, tas_end; the limit fields
 * @return ACP_OK; ACP_ERR_INVALID; ACP_ERR_RANGE (as acp_climb(), a speed
 *         outside the limits or the models: `limit` names an aircraft
 *         limit); ACP_ERR_THRUST (the specific excess power is below
 *         10 ft/min at either end: the change would take unbounded time).
 */
ACP_API int acp_level_speed_change(const acp_aircraft *ac, double mass, double hp, double dtemp,
                                   double wind, double tas_start, double tas_end,
                                   acp_profile *out);

/**
 * Ceilings at a mass: the altitudes where the climb rate along the climb
 * schedule falls to 100 ft/min (service ceiling) and 300 ft/min, where the
 * lift coefficient at 1.3 g and cruise_mach reaches cl_buffet (cl_max when
 * cl_buffet is not given), the resulting maximum cruise altitude and the
 * optimum altitude for specific air range at cruise_mach (common practice for
 * the 100 and 300 ft/min and 1.3 g margins).
 *
 * Work: a scan in 250 m steps up to 25,000 m (100 climb points) and a bisection
 * to 0.01 m (21 points) per ceiling; the optimum altitude: a 100 m scan (251
 * SAR points) and a golden section to 0.01 m (2 x 22 points), twice.
 *
 * @return ACP_OK (a ceiling above the search range, 25,000 m, is NaN);
 *         ACP_ERR_INVALID; ACP_ERR_RANGE; ACP_ERR_THRUST (no climb at all at
 *         the lowest altitude).
 */
ACP_API int acp_ceilings(const acp_aircraft *ac, double mass, double dtemp, acp_ceiling_set *out);

/**
 * A table of climbs: time, distance and fuel to climb from hp_start to each
 * altitude of hp_end, for each mass and each ISA deviation.
 *
 * One climb per (mass, deviation) is integrated through the altitudes in
 * ascending order, each altitude a step boundary (a chain of acp_climb() legs),
 * so a table costs about one climb per (mass, deviation) however many
 * altitudes it has. A cell agrees with acp_climb() from hp_start to its
 * altitude within the integration's accuracy (the steps fall differently):
 * 1e-4 relative with the default step where the climb is far from the
 * ceiling; near it, where the integration error grows with 1/(rate of climb),
 * within three times the change of acp_climb() when its step is halved
 * (both checked by tests/reliability).
 *
 * @param ac       aircraft as acp_climb()
 * @param hp_start start pressure altitude (m)
 * @param wind     along-track wind (m/s), positive tailwind
 * @param step     pressure-altitude step (m) as acp_climb()
 * @param n_mass, mass     masses (kg)
 * @param n_hp, hp_end     end pressure altitudes (m), ascending, each above hp_start
 * @param n_dtemp, dtemp   ISA deviations (K)
 * @param table_time, table_distance, table_fuel  n_mass x n_hp x n_dtemp
 *                 outputs (s, m, kg), element [(i_mass n_hp + i_hp) n_dtemp + i_dtemp];
 *                 each may be NULL
 * @return the number of cells without a result (NaN): invalid arguments (all
 *         cells), an altitude not reached (it and those above), a failed climb;
 *         SIZE_MAX, nothing written, when n_mass n_hp n_dtemp overflows a size_t.
 */
ACP_API size_t acp_climb_table(const acp_aircraft *ac, double hp_start, double wind, double step,
                               size_t n_mass, const double *mass, size_t n_hp,
                               const double *hp_end, size_t n_dtemp, const double *dtemp,
                               double *table_time, double *table_distance, double *table_fuel);

ACP_END_DECLS

#endif /* ACPERF_CLIMB_H */
