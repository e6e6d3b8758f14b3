/**
 * @file acperf/mission.h
 * @brief Trip fuel: climb + cruise + descent over a ground distance with
 *        wind, reserve fuel after a fuel policy, and the take-off mass needed
 *        for a zero-fuel mass.
 *
 * A mission (an opaque object with keyed set/get, like acp_aircraft) holds
 * the route, the cruise and the fuel policy; acp_trip() flies it from a
 * take-off mass, acp_trip_for_zero_fuel_mass() finds the take-off mass for a
 * zero-fuel mass. The trip is six segments: a climb from the origin's
 * pressure altitude to the cruise altitude (acp_climb()); a level speed change
 * there to the cruise speed (acp_level_speed_change()); a cruise in a speed
 * mode (acp_cruise()); a level deceleration to the descent schedule's speed
 * at the top of descent, when that is slower (a faster descent starts at its
 * speed: the acceleration in the descent's first part is not modelled); a
 * descent to the destination's pressure altitude plus descent_end_height
 * (acp_descent()); and a level deceleration there to the aircraft's
 * approach_cas, when it has one. The cruise distance is the distance less the
 * other segments' (the top of descent is found by iterating on the mass and
 * level at the end of the cruise). Every segment books time, distance and
 * fuel the same way, so trip fuel = take-off mass - landing mass = the sum of
 * the six segments' fuel.
 *
 * Fuel policy (keys below): block fuel = taxi + trip + contingency +
 * alternate + final reserve. Contingency is a fraction of the trip fuel
 * (typical default 5 %, not less than contingency_minimum); the final
 * reserve is holding at maximum-endurance speed at holding_height above the
 * destination for final_reserve_time (typical default 30 min at 1,500 ft:
 * common practice for turbine aeroplanes), computed for the mass at which
 * it would be used (zero-fuel mass + final reserve). These are typical
 * defaults only: the operator's approved fuel policy and the local
 * aviation authority's rules take precedence. Results are engineering
 * estimates, not approved flight-manual or flight-planning data.
 *
 * Mission keys (SI; docs/methods/trip.md):
 *
 * | key                  | unit   | range            | default |
 * |----------------------|--------|------------------|---------|
 * | distance             | m      | 1,000 to 2e7     | required: ground distance of the route |
 * | cruise_altitude      | m      | 0 to 25,000      | required: pressure altitude |
 * | origin_altitude      | m      | -500 to 5,000    | 0 |
 * | destination_altitude | m      | -500 to 5,000    | 0 |
 * | isa_deviation        | K      | -60 to 60        | 0 |
 * | wind                 | m/s    | -100 to 100      | 0: along-track component, + tailwind |
 * | cruise_mode          |        | acp_cruise_mode  | 1: ACP_CRUISE_FIXED_MACH |
 * | cost_index           | kg/min | 0 to 1,000       | 0 |
 * | step_climb           | m      | 0 or 100 to 3,000| 0: none |
 * | climb_step           | m      | 0 or 10 to 1,000 | 0: ACP_CLIMB_STEP_DEFAULT |
 * | cruise_step          | m      | 0 or 100 to 1e6  | 0: ACP_CRUISE_STEP_DISTANCE_DEFAULT; lengthened to at most ACP_TRIP_CRUISE_STEPS_MAX steps |
 * | taxi_time            | s      | 0 to 7,200       | 600 (typical default; taxi-out) |
 * | taxi_fuel            | kg     | 0 to 1e5         | not set: taxi_time x flight-idle fuel flow at the origin |
 * | contingency_fraction |        | 0 to 0.5         | 0.05 (typical default) |
 * | contingency_minimum  | kg     | 0 to 1e5         | 0 |
 * | alternate_fuel       | kg     | 0 to 1e6         | 0 |
 * | final_reserve_time   | s      | 0 to 14,400      | 1,800 (typical default) |
 * | holding_height       | m      | 0 to 10,000      | 457.2 (1,500 ft, typical default) |
 * | descent_end_height   | m      | 0 to 3,000       | 0: where the descent (and the deceleration to approach_cas) ends, above the destination; the final approach below it is not modelled |
 */
#ifndef ACPERF_MISSION_H
#define ACPERF_MISSION_H

#include "acperf/aircraft.h"
#include "acperf/export.h"

/** Typical default contingency fraction of the trip fuel (common practice). */
#define ACP_CONTINGENCY_FRACTION_TYPICAL 0.05
/** Typical default final reserve: 30 min holding (common practice for turbine aeroplanes), s. */
#define ACP_FINAL_RESERVE_TIME_TYPICAL 1800.0
/** Typical default holding height above the destination: 1,500 ft, m. */
#define ACP_HOLDING_HEIGHT_TYPICAL 457.2
/** Typical default taxi-out time: 10 min, s. */
#define ACP_TAXI_TIME_TYPICAL 600.0
/** Most steps of a trip's cruise: a shorter cruise_step is lengthened to the cruise distance
    over this (Heun's method errs by about 1e-5 of the cruise fuel at 100 steps, cruise.md). */
#define ACP_TRIP_CRUISE_STEPS_MAX 100.0
/** Most passes of the top-of-descent iteration of one trip. */
#define ACP_TRIP_DESCENT_ITERATIONS 20
/** Most trips flown by acp_trip_for_zero_fuel_mass(). */
#define ACP_TRIP_MASS_ITERATIONS 30

ACP_BEGIN_DECLS

/** Opaque mission: route, cruise and fuel policy. */
typedef struct acp_mission acp_mission;

/** Why a trip is not feasible (acp_trip_result.infeasible). */
enum acp_trip_infeasible {
  ACP_TRIP_FEASIBLE = 0,
  ACP_TRIP_OVER_MAX_TAKEOFF = 1,   /**< take-off mass above mass_max_takeoff (ACP_ERR_RANGE) */
  ACP_TRIP_OVER_MAX_LANDING = 2,   /**< landing mass above mass_max_landing (ACP_ERR_RANGE) */
  ACP_TRIP_OVER_FUEL_CAPACITY = 3, /**< block fuel above fuel_capacity (ACP_ERR_RANGE) */
  ACP_TRIP_OVER_MAX_ZERO_FUEL = 4, /**< zero-fuel mass above mass_max_zero_fuel (ACP_ERR_RANGE) */
  ACP_TRIP_TOO_SHORT = 5,          /**< distance shorter than climb + descent (ACP_ERR_RANGE) */
  ACP_TRIP_ABOVE_MAX_ALTITUDE = 6, /**< cruise altitude above max_altitude (ACP_ERR_RANGE) */
  ACP_TRIP_CANNOT_CLIMB = 7,       /**< the cruise altitude cannot be reached (ACP_ERR_THRUST) */
  ACP_TRIP_CANNOT_CRUISE = 8,      /**< level flight cannot be held in cruise or holding (ACP_ERR_THRUST) */
  ACP_TRIP_CRUISE_TOO_LOW = 9,     /**< cruise altitude not above the origin and destination (ACP_ERR_RANGE) */
  ACP_TRIP_NO_FUEL = 10,           /**< the fuel needed exceeds the mass available (ACP_ERR_RANGE) */
  ACP_TRIP_BELOW_OPERATING_EMPTY = 11, /**< a take-off or zero-fuel mass below
                                            mass_operating_empty (ACP_ERR_RANGE; excess kg) */
  ACP_TRIP_BELOW_STALL = 12        /**< the cruise or holding speed is below the 1 g stall:
                                        lift coefficient above cl_max (ACP_ERR_RANGE; excess CL) */
};

/** A trip and its fuel. All doubles. Append-only. Masses kg, times s, distances m. */
typedef struct {
  double infeasible;  /**< an acp_trip_infeasible value: set on success (0) and on these errors */
  double excess;      /**< by how much the limit is exceeded (kg; m for TOO_SHORT and altitudes); else NaN */
  double takeoff_mass;
  double landing_mass;
  double zero_fuel_mass;
  double ramp_mass;           /**< take-off mass + taxi fuel */
  double trip_fuel;           /**< climb + its acceleration + cruise + the descent's
                                   deceleration + descent + the approach deceleration */
  double taxi_fuel;
  double contingency_fuel;
  double alternate_fuel;
  double final_reserve_fuel;
  double block_fuel;          /**< taxi + trip + contingency + alternate + final reserve */
  double takeoff_fuel;        /**< fuel on board at take-off: block - taxi */
  double trip_time;           /**< s, the same six segments */
  double block_time;          /**< s, taxi_time + trip_time (taxi-in not modelled) */
  double climb_time, climb_distance, climb_fuel;
  double cruise_time, cruise_distance, cruise_fuel;
  double descent_time, descent_distance, descent_fuel;
  double top_of_climb_mass;
  double top_of_descent_mass;
  double cruise_altitude_end; /**< after step climbs, m */
  double cruise_sar_mean;     /**< cruise distance/fuel, m/kg */
  double iterations;          /**< iterations of acp_trip_for_zero_fuel_mass() (1 for acp_trip()) */
  double climb_acceleration_time;     /**< s: level speed change from the climb speed to the
                                           cruise speed at the cruise altitude (top of climb) */
  double climb_acceleration_distance; /**< m of it */
  double climb_acceleration_fuel;     /**< kg of it */
  double descent_deceleration_time;   /**< s: level deceleration from the cruise speed to the
                                           descent speed at the top of descent (0 when the
                                           descent is not slower) */
  double descent_deceleration_distance; /**< m of it */
  double descent_deceleration_fuel;     /**< kg of it */
  double approach_deceleration_time;  /**< s: level deceleration to approach_cas at the end of
                                           the descent (0 without approach_cas) */
  double approach_deceleration_distance; /**< m of it */
  double approach_deceleration_fuel;     /**< kg of it */
  double excess_at_least; /**< 1 when `excess` is only a lower bound (a trip that cannot be flown
                               from a take-off mass above mass_max_takeoff), else 0 */
} acp_trip_result;

/** A mission with the typical defaults; NULL when out of memory. Free with acp_mission_free(). */
ACP_API acp_mission *acp_mission_new(void);
/** Free a mission (NULL is allowed). */
ACP_API void acp_mission_free(acp_mission *mission);

/**
 * Set a mission key (table in the header comment).
 * @return ACP_OK; ACP_ERR_INVALID (NULL, NaN/Inf, cruise_mode not a whole
 *         number); ACP_ERR_RANGE (outside the key's range);
 *         ACP_ERR_UNKNOWN_KEY.
 */
ACP_API int acp_mission_set(acp_mission *mission, const char *key, double value);

/**
 * Get a mission key; NaN for a key without value (distance and
 * cruise_altitude before they are set, taxi_fuel when it is estimated).
 * @return ACP_OK; ACP_ERR_INVALID (NULL); ACP_ERR_UNKNOWN_KEY.
 */
ACP_API int acp_mission_get(const acp_mission *mission, const char *key, double *value);

/**
 * Fly a mission from a take-off mass, with the reserve fuel exactly as the
 * policy asks: the zero-fuel mass is the landing mass less contingency,
 * alternate and final reserve fuel.
 *
 * Limits are checked when the aircraft has the keys: mass_max_takeoff,
 * mass_max_landing, mass_max_zero_fuel, fuel_capacity (block fuel),
 * max_altitude (cruise altitude).
 *
 * @param ac           aircraft with drag, engine, climb and descent schedule
 *                     keys (and cruise_mach for the fixed-Mach mode)
 * @param mission      the mission (distance and cruise_altitude set)
 * @param takeoff_mass kg
 * @param out          out: the trip; on error all NaN except `infeasible`, `excess_at_least`
 *                     and `excess` for the errors the enum names
 * @return ACP_OK; ACP_ERR_INVALID (NULL, NaN/Inf, incomplete aircraft,
 *         distance or cruise_altitude not set); ACP_ERR_RANGE (a limit, the
 *         distance too short, the cruise altitude too low or above
 *         max_altitude: see `infeasible`; or outside the models);
 *         ACP_ERR_THRUST (the cruise altitude cannot be reached, or level
 *         flight not held: `infeasible`); ACP_ERR_NO_CONVERGENCE (the top of
 *         descent did not settle).
 */
ACP_API int acp_trip(const acp_aircraft *ac, const acp_mission *mission, double takeoff_mass,
                     acp_trip_result *out);

/**
 * The take-off mass needed to fly a mission with a zero-fuel mass: the
 * trip fuel depends on the take-off mass, so the take-off mass is iterated
 * (secant steps on the zero-fuel-mass mismatch, starting from fixed-point
 * steps) until the trip's zero-fuel mass matches to 0.1 kg.
 *
 * Inside the iteration the take-off mass limit and the empty-mass floor are
 * relaxed, so that a converged trip reports the exact excess of the first
 * limit it exceeds. A trip that cannot be flown at all from an iterate above
 * mass_max_takeoff (the aircraft cannot climb or cruise that heavy) stops
 * there as ACP_TRIP_OVER_MAX_TAKEOFF with the excess of that iterate: a lower
 * bound, flagged by excess_at_least = 1.
 *
 * Work: at most ACP_TRIP_MASS_ITERATIONS trips, each at most
 * ACP_TRIP_DESCENT_ITERATIONS cruises of at most ACP_TRIP_CRUISE_STEPS_MAX
 * steps (and one climb, descent and holding, bounded as in climb.h and
 * cruise.h).
 *
 * @param zero_fuel_mass kg
 * @return as acp_trip(); ACP_ERR_NO_CONVERGENCE after ACP_TRIP_MASS_ITERATIONS trips.
 */
ACP_API int acp_trip_for_zero_fuel_mass(const acp_aircraft *ac, const acp_mission *mission,
                                        double zero_fuel_mass, acp_trip_result *out);

ACP_END_DECLS

#endif /* ACPERF_MISSION_H */
