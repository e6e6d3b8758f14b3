/**
 * @file acperf/polar.h
 * @brief Drag of an aircraft at a flight condition: component drag build-up,
 *        parabolic polar, compressibility (Korn / Lock), turns, drag curves.
 *
 * Method (every formula and its source: docs/methods/drag.md):
 *  - zero-lift (parasite) drag either from the key `cd0`, or built up per
 *    component (Raymer, "Aircraft Design: A Conceptual Approach", component
 *    build-up method, section 12.5 of the 4th edition):
 *    CD0 = (1 + leakage_fraction) sum(Cf FF Q Swet)/S + cd_misc,
 *    with Cf from acp_skin_friction() at the component's Reynolds number
 *    rho V l/mu (roughness cutoff, laminar fraction) and FF from
 *    acp_form_factor_surface/body/nacelle() or the component's form_factor;
 *  - lift-dependent drag of the parabolic polar with a minimum-drag lift
 *    coefficient: CDi = k (CL - CL_md)^2, k = 1/(pi A_eff e);
 *  - wave drag (only with `korn_kappa`): CDw = 20 (M - Mcrit)^4 above the
 *    critical Mach, 0 below (Lock), Mcrit = Mdd - (0.1/80)^(1/3), Mdd from
 *    the Korn equation with simple sweep theory.
 *
 * The three parasite parts of acp_drag_parts (friction Cf Swet, form
 * Cf (FF-1) Swet, interference Cf FF Swet) add up to `parasite`:
 * the leakage and protuberance increment is a fraction of the components'
 * parasite drag and is shared among the three in proportion; the
 * miscellaneous increment `cd_misc` (upsweep, base, gear fairings: pressure
 * drag) is counted as form drag. acp_polar() gives the increments apart.
 * With a single `cd0` the three parts are NaN.
 *
 * Validity (enforced): mass 1 kg to 1,000,000 kg; TAS > 0 up to Mach
 * ACP_POLAR_MACH_MAX; hp and dtemp as acp_isa(); load factor 0 to 10; bank
 * angle -85 deg to 85 deg, and its load factor 1/cos(bank) at most 10, so
 * in effect |bank| <= acos(0.1) = 84.26 deg; each component's Reynolds number 1e3 to 1e10;
 * with a wave-drag model (`korn_kappa`) a lift coefficient of at most 10 in
 * magnitude (the Korn equation's range here); a speed so low that the lift
 * coefficient or the drag is not a finite double is out of range.
 * Results at a lift coefficient above cl_max are the polar's extrapolation.
 */
#ifndef ACPERF_POLAR_H
#define ACPERF_POLAR_H

#include <stddef.h>
#include "acperf/aircraft.h"
#include "acperf/export.h"

#define ACP_POLAR_MACH_MAX 0.95   /**< highest Mach number of the drag model */
#define ACP_POLAR_MASS_MIN 1.0    /**< lowest mass accepted, kg */
#define ACP_POLAR_MASS_MAX 1.0e6  /**< highest mass accepted, kg */
#define ACP_POLAR_LOAD_MAX 10.0   /**< highest load factor accepted */
#define ACP_POLAR_BANK_MAX (85.0 * 3.14159265358979323846 / 180.0) /**< largest bank angle, rad */
/** Mcrit = Mdd - ACP_MDD_MCRIT_GAP: (0.1/80)^(1/3), where Lock's law has slope 0.1. */
#define ACP_MDD_MCRIT_GAP 0.10772173450159418

ACP_BEGIN_DECLS

/** Drag forces at a flight condition, N. Append-only. */
typedef struct {
  double friction;     /**< skin friction, sum Cf Swet q (with its share of leakage) */
  double form;         /**< form (pressure) drag, sum Cf (FF-1) Swet q, and cd_misc */
  double interference; /**< interference, sum Cf FF (Q-1) Swet q (with its share of leakage) */
  double parasite;     /**< zero-lift drag CD0 q S */
  double induced;      /**< lift-dependent drag k (CL - CL_md)^2 q S */
  double wave;         /**< wave drag 20 (M - Mcrit)^4 q S */
  double total;        /**< parasite + induced + wave */
} acp_drag_parts;

/** The polar at a flight condition, as coefficients on the wing area. Append-only. */
typedef struct {
  double mach;                 /**< Mach number */
  double dynamic_pressure;     /**< q = rho V^2/2, Pa */
  double reynolds_per_metre;   /**< rho V/mu, 1/m */
  double cl;                   /**< lift coefficient n m g/(q S) */
  double cd_friction;          /**< components' friction, before leakage (NaN with cd0) */
  double cd_form;              /**< components' form drag, before leakage (NaN with cd0) */
  double cd_interference;      /**< components' interference, before leakage (NaN with cd0) */
  double cd_leakage;           /**< leakage and protuberances (NaN with cd0) */
  double cd_misc;              /**< miscellaneous increment (NaN with cd0) */
  double cd0;                  /**< zero-lift drag coefficient, all of the above */
  double cd_induced;           /**< k (CL - CL_md)^2 */
  double cd_wave;              /**< wave drag coefficient (0 without korn_kappa) */
  double cd;                   /**< total */
  double induced_factor;       /**< k = 1/(pi A_eff e) */
  double mach_drag_divergence; /**< Korn Mdd at this CL (NaN without korn_kappa) */
  double mach_critical;        /**< Mdd - (0.1/80)^(1/3) (NaN without korn_kappa) */
} acp_polar_point;

/** One component's share of the drag, N (all `count` copies). Append-only. */
typedef struct {
  double reynolds;            /**< Reynolds number on the component length */
  double skin_friction;       /**< Cf (mixed laminar/turbulent, roughness cutoff) */
  double form_factor;         /**< FF */
  double interference_factor; /**< Q */
  double friction;            /**< Cf Swet q, N */
  double form;                /**< Cf (FF-1) Swet q, N */
  double interference;        /**< Cf FF (Q-1) Swet q, N */
  double parasite;            /**< Cf FF Q Swet q, N (no leakage share) */
} acp_component_drag;

/**
 * Drag in level, unaccelerated 1 g flight (lift = weight).
 *
 * @param ac    aircraft (complete: acp_aircraft_check())
 * @param mass  mass (kg)
 * @param hp    pressure altitude (m, geopotential)
 * @param dtemp ISA deviation (K)
 * @param tas   true airspeed (m/s)
 * @param out   out: drag parts (N); all NaN on error
 * @return ACP_OK; ACP_ERR_INVALID (NULL, NaN/Inf, incomplete aircraft);
 *         ACP_ERR_RANGE (an input or a component Reynolds number outside
 *         the model).
 */
ACP_API int acp_drag(const acp_aircraft *ac, double mass, double hp, double dtemp, double tas,
                     acp_drag_parts *out);

/**
 * Drag with lift = n m g: pull-ups, turns. n = 0 to 10. Errors as acp_drag().
 */
ACP_API int acp_drag_load(const acp_aircraft *ac, double mass, double hp, double dtemp,
                          double tas, double load_factor, acp_drag_parts *out);

/**
 * Drag in a level coordinated turn at bank angle phi (rad, |phi| <= 85 deg):
 * load factor n = 1/cos(phi), at most 10 as in acp_drag_load(), so
 * |phi| <= acos(0.1) = 84.26 deg; beyond, ACP_ERR_RANGE. Errors as acp_drag().
 */
ACP_API int acp_drag_bank(const acp_aircraft *ac, double mass, double hp, double dtemp,
                          double tas, double bank, acp_drag_parts *out);

/**
 * The polar's coefficients at a condition (lift = n m g). Errors as acp_drag().
 */
ACP_API int acp_polar(const acp_aircraft *ac, double mass, double hp, double dtemp, double tas,
                      double load_factor, acp_polar_point *out);

/**
 * One component's Reynolds number, skin friction, form and interference
 * factors and drag at a condition (independent of lift).
 *
 * @param index component index, 0 to component_count - 1 (acp_aircraft_component())
 * @return ACP_OK; ACP_ERR_INVALID (NULL, NaN/Inf, incomplete aircraft);
 *         ACP_ERR_RANGE (no such component, input outside the model).
 */
ACP_API int acp_drag_component(const acp_aircraft *ac, size_t index, double hp, double dtemp,
                               double tas, acp_component_drag *out);

/**
 * Array form of acp_drag_load(): element i at mass[i], hp[i], dtemp[i],
 * tas[i], load_factor[i]. dtemp NULL: standard day; load_factor NULL: 1.
 * Each output may be NULL when not wanted.
 * @return the number of invalid elements (their outputs are NaN); n when ac is bad.
 */
ACP_API size_t acp_drag_n(const acp_aircraft *ac, size_t n, const double *mass, const double *hp,
                          const double *dtemp, const double *tas, const double *load_factor,
                          double *friction, double *form, double *interference,
                          double *parasite, double *induced, double *wave, double *total);

/**
 * The drag curve: acp_drag() at one mass, altitude and ISA deviation over
 * n true airspeeds tas[i]. Outputs may be NULL when not wanted.
 * @return the number of invalid elements (their outputs are NaN).
 */
ACP_API size_t acp_drag_curve(const acp_aircraft *ac, double mass, double hp, double dtemp,
                              size_t n, const double *tas, double *parasite, double *induced,
                              double *wave, double *total);

/**
 * Oswald efficiency of a straight wing, Raymer eq. 12.48 (4th ed.):
 * e = 1.78 (1 - 0.045 A^0.68) - 0.64.
 * @param aspect_ratio A, 1 to 30
 * @return e; NaN on invalid input.
 */
ACP_API double acp_oswald_straight(double aspect_ratio);

/**
 * Oswald efficiency of a swept wing, Raymer eq. 12.49 (4th ed.), for
 * leading-edge sweep above 30 deg:
 * e = 4.61 (1 - 0.045 A^0.68) (cos L_LE)^0.15 - 3.1.
 * @param aspect_ratio A, 1 to 30
 * @param sweep_le     leading-edge sweep (rad), 0 to 70 deg
 * @return e; NaN on invalid input.
 */
ACP_API double acp_oswald_swept(double aspect_ratio, double sweep_le);

/**
 * The library's Oswald estimate: acp_oswald_straight() at no sweep,
 * acp_oswald_swept() from 30 deg of leading-edge sweep, linear in sweep
 * between the two (project's choice, docs/methods/drag.md); limited to
 * 0.3 to 1.
 * @return e; NaN on invalid input.
 */
ACP_API double acp_oswald_estimate(double aspect_ratio, double sweep_le);

/**
 * Effective aspect ratio with winglets (or end plates) of height h:
 * A_eff = A (1 + 1.9 h/b), the end-plate relation quoted by Raymer
 * (section 12.6, induced drag) from Hoerner; it does not credit a winglet's
 * better efficiency than an end plate, so it is conservative for winglets.
 * @param aspect_ratio A, > 0
 * @param winglet_height h (m), 0 to b/2
 * @param span b (m), > 0
 * @return A_eff; NaN on invalid input or when A_eff overflows a double.
 */
ACP_API double acp_winglet_aspect_ratio(double aspect_ratio, double winglet_height, double span);

/**
 * Drag-divergence Mach number by the Korn equation extended to sweep by
 * simple sweep theory (Mason, "Configuration Aerodynamics", transonic
 * chapter; Malone and Mason 1995):
 * Mdd = kappa/cos L - (t/c)/cos^2 L - CL/(10 cos^3 L).
 *
 * @param kappa           airfoil technology factor, 0.7 to 1.0 (0.87 conventional
 *                        NACA 6-series, 0.95 supercritical)
 * @param thickness_ratio t/c, 0 to 0.3
 * @param sweep           wing sweep (rad), 0 to 60 deg (the library uses the quarter-chord sweep)
 * @param cl              lift coefficient (its magnitude is used), |CL| <= 10
 * @return Mdd; NaN on invalid input.
 */
ACP_API double acp_korn_mach(double kappa, double thickness_ratio, double sweep, double cl);

/**
 * Critical Mach number from the drag-divergence Mach number:
 * Mcrit = Mdd - (0.1/80)^(1/3), the Mach at which Lock's law 20 (M - Mcrit)^4
 * has slope dCD/dM = 0.1 at Mdd (Gur, Mason and Schetz, "Full-configuration
 * drag estimation", J. Aircraft 47(4), 2010). NaN for NaN/Inf.
 */
ACP_API double acp_critical_mach(double mach_drag_divergence);

/**
 * Wave drag coefficient by Lock's fourth-power law: 20 (M - Mcrit)^4 for
 * M > Mcrit, 0 otherwise (continuous, with zero slope, at Mcrit).
 * @param mach          Mach number, 0 to 5
 * @param mach_critical critical Mach number, 0 to 5
 * @return CDw; NaN on invalid input.
 */
ACP_API double acp_wave_drag_coefficient(double mach, double mach_critical);

ACP_END_DECLS

#endif /* ACPERF_POLAR_H */
