/**
 * @file acperf/cruise.h
 * @brief Cruise: specific air range at a point, cruise speed modes (fixed
 *        Mach, maximum range, long-range cruise, economy for a cost index,
 *        maximum endurance), cruise integration at constant altitude with
 *        optional step climbs, and the Breguet range and endurance equations.
 *
 * Level 1 g flight: thrust = drag (acperf/polar.h), fuel flow from the
 * engines delivering that thrust (acperf/propulsion.h), not more than the
 * maximum-cruise rating. Specific air range (SAR) is ground distance per
 * unit of fuel, (V + w)/Wf with V the true airspeed, w the along-track wind
 * (positive tailwind) and Wf the fuel flow. Methods and sources:
 * docs/methods/cruise.md.
 *
 * Speed modes are found numerically on the full model (drag build-up,
 * compressibility, TSFC varying with Mach, idle fuel-flow floor), not from
 * the closed forms of the parabolic polar: the objective is tabulated at 32
 * true airspeeds spaced evenly in log V over the search interval, then the
 * minimum is refined by Brent's method (golden section with parabolic
 * interpolation; Brent, "Algorithms for Minimization without Derivatives",
 * 1973, chapter 5) on the two grid intervals around the best grid point, to
 * 1e-8 V (long-range cruise: regula falsi with the Illinois modification on
 * SAR - 0.99 SAR_max, to a bracket of 1e-10 V; a warm start from the
 * previous point's speed brackets the search within 2 % when it can). The
 * search interval runs from 1.2 VS1G (common practice as a lowest cruise
 * speed; CL = 1.2 when the aircraft has no cl_max) to the lowest of VMO,
 * MMO, Mach ACP_POLAR_MACH_MAX (the drag model's end) and the speed where
 * drag reaches the maximum-cruise thrust. A speed held at one of these ends
 * is reported in acp_cruise_point.limit.
 *
 * Limits (docs/limits.md): a mass above mass_max_takeoff or below
 * mass_operating_empty, an altitude above max_altitude, a speed above
 * vmo/mmo or a 1 g lift coefficient above cl_max (the fixed-Mach mode below
 * the stall) is ACP_ERR_RANGE with the limit named in the output
 * (`limit_exceeded` of a point, `limit` of a cruise); a cruise that would
 * burn to below the empty mass stops there. The buffet margin is reported
 * (`buffet_margin`, a flag below ACP_BUFFET_MARGIN), not enforced.
 *
 * Aircraft keys used: drag keys, engine keys, cruise_mach (fixed-Mach mode),
 * vmo, mmo, cl_max, cl_buffet, the masses and max_altitude when given.
 *
 * Results are engineering estimates, not approved flight-manual data.
 */
#ifndef ACPERF_CRUISE_H
#define ACPERF_CRUISE_H

#include <stddef.h>
#include "acperf/aircraft.h"
#include "acperf/export.h"

/** Default cruise integration step over a distance, m (50 NM). */
#define ACP_CRUISE_STEP_DISTANCE_DEFAULT 92600.0
/** Default step over a fuel amount, kg. */
#define ACP_CRUISE_STEP_FUEL_DEFAULT 100.0
/** Default step over a time, s (5 min). */
#define ACP_CRUISE_STEP_TIME_DEFAULT 300.0
/** Long-range cruise: the faster speed giving this fraction of the maximum SAR (common practice). */
#define ACP_LONG_RANGE_FRACTION 0.99
/** Most steps of one cruise integration (end_value/step above it is ACP_ERR_RANGE): the bound
    on its work, with at most three speed searches per step of at most ACP_CRUISE_SEARCH_MAX
    objective evaluations each. */
#define ACP_CRUISE_STEPS_MAX 100000.0
/** Most objective evaluations of one cruise speed search, by construction (cruise.c): the
    32 grid speeds, at most 200 Brent iterations, two boundary bisections to 1e-10 (35 each),
    and for long-range cruise a walk in 2 % steps to the top of the interval (at most 100 for
    the widest interval, VMO/1.2 VS1G below 7) and at most 200 regula-falsi iterations. */
#define ACP_CRUISE_SEARCH_MAX 700
/** Least climb rate at the higher level for a step climb, m/s (300 ft/min, common practice). */
#define ACP_STEP_CLIMB_RATE_MIN 1.524

ACP_BEGIN_DECLS

/** Cruise speed modes. */
enum acp_cruise_mode {
  ACP_CRUISE_FIXED_MACH = 1,     /**< the aircraft's cruise_mach (capped at VMO/MMO) */
  ACP_CRUISE_MAX_RANGE = 2,      /**< maximum SAR (ground, with the wind) */
  ACP_CRUISE_LONG_RANGE = 3,     /**< faster speed with ACP_LONG_RANGE_FRACTION of the maximum SAR */
  ACP_CRUISE_ECONOMY = 4,        /**< least fuel plus cost-index time cost per ground distance */
  ACP_CRUISE_MAX_ENDURANCE = 5   /**< least fuel flow (holding) */
};

/** What ended a cruise integration (acp_cruise()). */
enum acp_cruise_end {
  ACP_CRUISE_END_DISTANCE = 1, /**< a ground distance, m */
  ACP_CRUISE_END_FUEL = 2,     /**< a fuel amount, kg */
  ACP_CRUISE_END_TIME = 3      /**< a time, s */
};

/** Which bound holds a cruise speed (acp_cruise_point.limit). */
enum acp_cruise_limit {
  ACP_CRUISE_LIMIT_NONE = 0,      /**< the speed is inside the search interval */
  ACP_CRUISE_LIMIT_LOW_SPEED = 1, /**< held at 1.2 VS1G, the low end of the search */
  ACP_CRUISE_LIMIT_VMO = 2,       /**< held at VMO */
  ACP_CRUISE_LIMIT_MMO = 3,       /**< held at MMO */
  ACP_CRUISE_LIMIT_MACH_MODEL = 4, /**< held at Mach ACP_POLAR_MACH_MAX, the drag model's end */
  ACP_CRUISE_LIMIT_THRUST = 5     /**< held where drag reaches the maximum-cruise thrust */
};

/** Level flight at a cruise point. All doubles (VBA- and ctypes-friendly). Append-only. */
typedef struct {
  double time;         /**< s since the start (integration traces; 0 otherwise) */
  double distance;     /**< ground distance since the start, m (traces; 0 otherwise) */
  double hp;           /**< pressure altitude, m */
  double mass;         /**< kg */
  double tas;          /**< true airspeed, m/s */
  double cas;          /**< calibrated airspeed, m/s */
  double mach;         /**< Mach number */
  double ground_speed; /**< tas + wind, m/s */
  double drag;         /**< drag = thrust, N */
  double fuel_flow;    /**< kg/s, all engines */
  double tsfc;         /**< fuel flow per thrust, kg/(N s) */
  double lift_to_drag; /**< m g / drag */
  double sar;          /**< specific air range over the ground, m/kg */
  double limit;        /**< an acp_cruise_limit value: which bound holds the speed */
  double buffet_margin; /**< load factor to buffet onset, cl_buffet/CL (cl_max/CL without
                             cl_buffet; NaN with neither): a flag below ACP_BUFFET_MARGIN (1.3 g),
                             not an error */
  double limit_exceeded; /**< an acp_limit: NONE on success; on ACP_ERR_RANGE from an aircraft
                              limit, which one (else NaN) */
  double limit_excess;   /**< by how much (kg, m, CL, m/s or Mach); 0 on success, else NaN */
} acp_cruise_point;

/** Totals of a cruise. All doubles. Append-only. */
typedef struct {
  double time;        /**< s */
  double distance;    /**< ground distance, m */
  double fuel;        /**< kg */
  double mass_end;    /**< kg */
  double hp_end;      /**< pressure altitude at the end (differs from the start after step climbs), m */
  double sar_mean;    /**< distance/fuel, m/kg */
  double tas_start;   /**< m/s */
  double tas_end;     /**< m/s */
  double mach_start;
  double mach_end;
  double step_climbs; /**< number of step climbs flown */
  double step_climb_time;     /**< s spent in step climbs (included in time) */
  double step_climb_distance; /**< m covered in step climbs (included in distance) */
  double step_climb_fuel;     /**< kg burnt in step climbs (included in fuel) */
  double limit;        /**< an acp_limit: NONE on success; on ACP_ERR_RANGE from an aircraft
                            limit (at the start or where the cruise crossed it), which one; else NaN */
  double limit_excess; /**< by how much (kg, m, CL, m/s or Mach); 0 on success, else NaN */
  double buffet_margin_min; /**< least buffet_margin of the points flown (NaN when unknown) */
} acp_cruise_result;

/**
 * Specific air range over the ground of level 1 g flight at a true airspeed.
 *
 * SAR = (V + w)/Wf, Wf the fuel flow of the engines delivering thrust = drag.
 *
 * @param ac    aircraft with drag and engine keys
 * @param mass  kg, 1 to 1,000,000
 * @param hp    pressure altitude (m), as acp_isa()
 * @param dtemp ISA deviation (K), as acp_isa()
 * @param tas   true airspeed (m/s), > 0 up to Mach ACP_POLAR_MACH_MAX
 * @param wind  along-track wind component (m/s), positive tailwind, |wind| <= 200
 * @param sar   out: m of ground per kg of fuel; NaN on error
 * @return ACP_OK; ACP_ERR_INVALID (NULL, NaN/Inf, incomplete aircraft);
 *         ACP_ERR_RANGE (outside the drag or atmosphere model, drag below
 *         idle thrust, ground speed not positive); ACP_ERR_THRUST (drag above
 *         the maximum-cruise thrust).
 */
ACP_API int acp_specific_air_range(const acp_aircraft *ac, double mass, double hp, double dtemp,
                                   double tas, double wind, double *sar);

/**
 * Array form of acp_specific_air_range(): element i at mass[i], hp[i],
 * dtemp[i] (NULL: standard day), tas[i], wind[i] (NULL: no wind).
 * @return the number of elements with an error (their sar NaN).
 */
ACP_API size_t acp_specific_air_range_n(const acp_aircraft *ac, size_t n, const double *mass,
                                        const double *hp, const double *dtemp, const double *tas,
                                        const double *wind, double *sar);

/**
 * The cruise speed of a mode at a condition, and level flight there.
 *
 * Objectives (each minimised over the search interval, header comment):
 *  - ACP_CRUISE_MAX_RANGE: Wf/(V + w) (the most ground distance per fuel);
 *  - ACP_CRUISE_LONG_RANGE: the speed above the maximum-range speed where SAR
 *    falls to 0.99 of its maximum (common practice);
 *  - ACP_CRUISE_ECONOMY: (Wf + CI/60)/(V + w), the cost per ground distance
 *    in kg of fuel with time priced at CI kg per minute (cost index, common
 *    practice); CI = 0 is the maximum-range speed;
 *  - ACP_CRUISE_MAX_ENDURANCE: Wf (holding; independent of the wind);
 *  - ACP_CRUISE_FIXED_MACH: cruise_mach, capped at VMO and MMO (limit says so).
 *
 * @param ac         aircraft with drag and engine keys (cruise_mach for the fixed-Mach mode)
 * @param mode       an acp_cruise_mode
 * @param cost_index kg/min, 0 to 1,000 (used by ACP_CRUISE_ECONOMY only)
 * @param mass       kg; hp pressure altitude (m); dtemp ISA deviation (K)
 * @param wind       along-track wind component (m/s), positive tailwind, |wind| <= 200
 * @param out        out: the point (time and distance 0); NaN on error
 * @return ACP_OK; ACP_ERR_INVALID (NULL, NaN/Inf, unknown mode, missing
 *         cruise_mach); ACP_ERR_RANGE (outside the models, an empty search
 *         interval, ground speed not positive); ACP_ERR_THRUST (the
 *         maximum-cruise thrust cannot hold level flight at any speed of the
 *         interval, or at the fixed Mach).
 */
ACP_API int acp_cruise_speed(const acp_aircraft *ac, int mode, double cost_index, double mass,
                             double hp, double dtemp, double wind, acp_cruise_point *out);

/**
 * Array form of acp_cruise_speed(): element i at mass[i], hp[i], dtemp[i]
 * (NULL: standard day), wind[i] (NULL: no wind); outputs TAS (m/s), Mach and
 * SAR (m/kg), each may be NULL.
 * @return the number of elements with an error (their outputs NaN).
 */
ACP_API size_t acp_cruise_speed_n(const acp_aircraft *ac, int mode, double cost_index, size_t n,
                                  const double *mass, const double *hp, const double *dtemp,
                                  const double *wind, double *tas, double *mach, double *sar);

/**
 * Cruise at constant pressure altitude (between step climbs) with the mass
 * decreasing, over a ground distance, a fuel amount or a time.
 *
 * At every point the speed is that of the mode at the current mass (so the
 * economy and maximum-range speeds slow down as fuel burns). Integration:
 * over a fuel amount, mass is the independent variable and the trapezoidal
 * rule integrates dx/dm = -(V + w)/Wf and dt/dm = -1/Wf; over a distance or
 * a time, the trapezoidal rule with the end mass predicted by an Euler step
 * (Heun's method, second order) integrates dm/dx = -Wf/(V + w) and
 * dt/dx = 1/(V + w), or dm/dt = -Wf and dx/dt = V + w.
 *
 * Step climbs (step_climb > 0): at the end of each step the aircraft climbs
 * step_climb metres when (1) the higher level is not above max_altitude,
 * (2) the SAR of the mode there is greater than at the current level, (3)
 * the climb rate along the climb schedule there is at least 300 ft/min
 * (common practice) and (4) the climb (acp_climb()) fits in what is left of
 * the cruise. The climb's time, distance and fuel count in the totals.
 *
 * @param ac         aircraft with drag and engine keys (and climb schedule keys for step climbs)
 * @param mode       an acp_cruise_mode; cost_index kg/min, 0 to 1,000 (economy mode)
 * @param mass       mass at the start (kg)
 * @param hp         pressure altitude (m); dtemp ISA deviation (K)
 * @param wind       along-track wind (m/s), positive tailwind, |wind| <= 200
 * @param end        an acp_cruise_end: what end_value measures
 * @param end_value  ground distance (m, up to 2e7), fuel (kg, less than mass) or time (s, up to 2e5), > 0
 * @param step       step in the unit of end_value (m, kg or s), > 0, or 0 for the defaults
 *                   ACP_CRUISE_STEP_*_DEFAULT; a step longer than end_value is shortened to
 *                   it, the last step is shortened to end exactly; at most ACP_CRUISE_STEPS_MAX steps
 * @param step_climb step-climb height (m), 0 (none) or 100 to 3,000
 * @param out        out: totals; NaN on error
 * @return ACP_OK; ACP_ERR_INVALID (NULL, NaN/Inf, unknown mode or end,
 *         negative step or end_value <= 0, no climb schedule with step
 *         climbs); ACP_ERR_RANGE (outside the models, more than ACP_CRUISE_STEPS_MAX
 *         steps, a fuel amount not less than the mass, a step-climb height
 *         outside 100 to 3,000 m); ACP_ERR_THRUST (level flight cannot be
 *         held at some point).
 */
ACP_API int acp_cruise(const acp_aircraft *ac, int mode, double cost_index, double mass, double hp,
                       double dtemp, double wind, int end, double end_value, double step,
                       double step_climb, acp_cruise_result *out);

/**
 * acp_cruise() with a per-step trace. The number of points needed is known
 * before the integration: ceil(end_value/step) + 1, plus one per possible
 * step climb (the levels up to max_altitude, or 25,000 m) when step_climb >
 * 0. When `capacity` is smaller, nothing is integrated, `*count` gives the
 * number needed and the status is ACP_ERR_RANGE; otherwise `*count` is the
 * number written (first: the start; last: the end; a step climb adds the
 * point where it ends).
 *
 * @param capacity number of elements of points
 * @param points   out: the trace (may be NULL when capacity is 0: a size query)
 * @param count    out: number of points written (or needed); not NULL
 * @return as acp_cruise(); ACP_ERR_RANGE with *count > capacity when the
 *         trace does not fit (*count 0 on any other error).
 */
ACP_API int acp_cruise_trace(const acp_aircraft *ac, int mode, double cost_index, double mass,
                             double hp, double dtemp, double wind, int end, double end_value,
                             double step, double step_climb, size_t capacity,
                             acp_cruise_point *points, size_t *count, acp_cruise_result *out);

/**
 * Breguet range equation (constant L/D, TAS and TSFC: the cruise-climb at
 * constant lift coefficient and Mach): R = (V/(g0 c)) (L/D) ln(m0/m1).
 *
 * @param tas          true airspeed (m/s), > 0
 * @param tsfc         thrust-specific fuel consumption c, kg/(N s), > 0
 * @param lift_to_drag L/D, > 0
 * @param mass_start   m0 (kg), > 0
 * @param mass_end     m1 (kg), 0 < m1 <= m0
 * @return still-air range (m); NaN on invalid input or when the range overflows a
 *         double (a TSFC so small, e.g. denormal, that 1/c does).
 * @note Breguet (1923); in every aircraft-performance text, e.g. Anderson,
 *       "Aircraft Performance and Design" (1999), section 5.13 (from memory).
 */
ACP_API double acp_breguet_range(double tas, double tsfc, double lift_to_drag, double mass_start,
                                 double mass_end);

/**
 * Breguet endurance equation (constant L/D and TSFC):
 * E = (1/(g0 c)) (L/D) ln(m0/m1).
 *
 * @param tsfc kg/(N s), > 0; lift_to_drag > 0; mass_start >= mass_end > 0 (kg)
 * @return endurance (s); NaN on invalid input or when it overflows a double.
 */
ACP_API double acp_breguet_endurance(double tsfc, double lift_to_drag, double mass_start,
                                     double mass_end);

/**
 * Breguet range of a propeller aircraft (constant L/D, propeller efficiency
 * and power-specific fuel consumption): R = (eta/(g0 cp)) (L/D) ln(m0/m1).
 *
 * @param propeller_efficiency eta, 0 < eta <= 1
 * @param psfc                 power-specific fuel consumption cp, kg/(W s), > 0
 * @param lift_to_drag         L/D, > 0; mass_start >= mass_end > 0 (kg)
 * @return still-air range (m); NaN on invalid input or when it overflows a double.
 */
ACP_API double acp_breguet_range_propeller(double propeller_efficiency, double psfc,
                                           double lift_to_drag, double mass_start,
                                           double mass_end);

ACP_END_DECLS

#endif /* ACPERF_CRUISE_H */
