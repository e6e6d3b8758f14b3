/**
 * @file acperf/propulsion.h
 * @brief Thrust, power and fuel flow: turbofan thrust lapse and TSFC,
 *        turboprop and piston shaft-power lapse with propeller efficiency and
 *        power-specific fuel consumption; ratings and idle.
 *
 * Published methods (docs/methods/propulsion.md):
 *  - turbofan maximum thrust lapse of Mattingly, Heiser and Pratt, "Aircraft
 *    Engine Design" (2nd ed., 2002), high-bypass turbofan, eq. 2.45a:
 *    alpha = delta0 (1 - 0.49 sqrt(M)) for theta0 <= TR, and
 *    alpha = delta0 (1 - 0.49 sqrt(M) - 3 (theta0 - TR)/(1.5 + M)) above,
 *    with theta0 = (T/T0)(1 + 0.2 M^2), delta0 = (p/p0)(1 + 0.2 M^2)^3.5 and TR
 *    the throttle ratio (the theta0 at which the engine reaches its limits);
 *  - turbofan installed TSFC of the same book, eq. 3.55a form:
 *    TSFC = (c0 + c1 M) sqrt(theta), theta = T/T0; Mattingly's high-bypass
 *    values are c0 = 0.39 and c1 = 0.23 lbm/(lbf h);
 *  - piston shaft-power lapse of Gagg and Ferrar (NACA TN 493, 1934):
 *    P/P0 = 1.132 sigma - 0.132; turboprop shaft-power lapse sigma^n with the
 *    exponent n a key of the aircraft (common practice, about 0.7 to 0.9);
 *  - propeller thrust eta P/V; fuel flow PSFC x P;
 *  - idle fuel flow scaled as a corrected parameter, Wf = Wf0 delta0 sqrt(theta0)
 *    (gas-turbine referred-parameter practice);
 *  - fuel flow at any thrust between idle and the rating: TSFC x thrust, and not
 *    less than the idle fuel flow.
 * Ratings are fractions of the maximum thrust (or power) available.
 */
#ifndef ACPERF_PROPULSION_H
#define ACPERF_PROPULSION_H

#include "acperf/aircraft.h"
#include "acperf/export.h"

/** 1 lbm/(lbf h) in kg/(N s): 0.45359237/(4.4482216152605 x 3600) = 1/(3600 g0). */
#define ACP_TSFC_LB_LBF_H (1.0 / (3600.0 * 9.80665))

ACP_BEGIN_DECLS

/** Engine ratings. */
enum acp_rating {
  ACP_RATING_MAXIMUM = 0, /**< maximum (take-off) thrust of the lapse model */
  ACP_RATING_CLIMB = 1,   /**< maximum climb: climb_rating x maximum */
  ACP_RATING_CRUISE = 2,  /**< maximum cruise: cruise_rating x maximum */
  ACP_RATING_IDLE = 3     /**< flight idle */
};

/** Thrust and fuel of all engines at a condition. All doubles. Append-only. */
typedef struct {
  double thrust;       /**< net thrust of all engines, N */
  double fuel_flow;    /**< fuel flow of all engines, kg/s */
  double tsfc;         /**< thrust-specific fuel consumption, kg/(N s); NaN at zero thrust */
  double shaft_power;  /**< shaft power of all engines, W (propeller engines; NaN for jets) */
} acp_engine_point;

/**
 * Turbofan maximum-thrust lapse alpha = T/T_sea-level-static (Mattingly eq. 2.45a).
 *
 * @param mach           Mach number, 0 to 0.95
 * @param hp             pressure altitude (m), as acp_isa()
 * @param dtemp          ISA deviation (K)
 * @param throttle_ratio TR, 0.9 to 1.3 (1.0 to 1.1 for civil turbofans)
 * @return alpha (may reach 0 at the hot, fast corner); NaN on invalid input.
 */
ACP_API double acp_turbofan_thrust_lapse(double mach, double hp, double dtemp,
                                         double throttle_ratio);

/**
 * Turbofan TSFC = (c0 + c1 M) sqrt(T/T0), kg/(N s) (Mattingly eq. 3.55a form).
 *
 * @param mach  Mach number, 0 to 0.95
 * @param hp    pressure altitude (m); dtemp ISA deviation (K)
 * @param c0,c1 coefficients, kg/(N s) (multiply lbm/(lbf h) by ACP_TSFC_LB_LBF_H), >= 0
 * @return TSFC; NaN on invalid input or when the TSFC overflows a double.
 */
ACP_API double acp_turbofan_tsfc(double mach, double hp, double dtemp, double c0, double c1);

/** Piston shaft-power lapse P/P0 = 1.132 sigma - 0.132 (Gagg and Ferrar, NACA TN 493); NaN outside 0.2 <= sigma <= 1.5. */
ACP_API double acp_piston_power_lapse(double density_ratio);

/**
 * Thrust and fuel flow of the aircraft's engines at a rating.
 *
 * @param ac     aircraft with propulsion keys (docs/aircraft-format.md)
 * @param rating an acp_rating
 * @param hp     pressure altitude (m); dtemp ISA deviation (K)
 * @param tas    true airspeed (m/s), >= 0 (propeller engines: >= 1, since
 *               propeller thrust is eta P/V; below it ACP_ERR_RANGE)
 * @param out    out: thrust, fuel flow, TSFC (and shaft power); NaN on error
 * @return ACP_OK; ACP_ERR_INVALID (NULL, NaN/Inf, no or incomplete propulsion
 *         keys); ACP_ERR_RANGE (Mach above 0.95, outside the atmosphere).
 */
ACP_API int acp_engine_rating(const acp_aircraft *ac, int rating, double hp, double dtemp,
                              double tas, acp_engine_point *out);

/**
 * Fuel flow of the aircraft's engines delivering a given total thrust: TSFC x
 * thrust (jets) or PSFC x thrust V/eta (propellers), not less than the idle
 * fuel flow.
 *
 * @param thrust total net thrust (N), between the idle thrust and the maximum
 * @return ACP_OK; ACP_ERR_INVALID (NULL, NaN/Inf, a negative thrust);
 *         ACP_ERR_RANGE (outside the atmosphere or Mach 0.95, a thrust below
 *         the idle thrust); ACP_ERR_THRUST (more than the maximum thrust there).
 *         At zero thrust (idle_thrust_fraction 0) the TSFC is NaN.
 */
ACP_API int acp_engine_thrust(const acp_aircraft *ac, double thrust, double hp, double dtemp,
                              double tas, acp_engine_point *out);

ACP_END_DECLS

#endif /* ACPERF_PROPULSION_H */
