/**
 * @file acperf/friction.h
 * @brief Flat-plate skin-friction coefficients: laminar, turbulent, mixed,
 *        and the surface-roughness cutoff Reynolds number; component form factors.
 *
 * These are the building blocks of the component drag build-up: the
 * friction coefficient Cf of a flat plate of the component's characteristic
 * length, referred to its wetted area (Raymer, "Aircraft Design: A Conceptual
 * Approach", component build-up method, section 12.5.3 in the 4th/5th editions).
 */
#ifndef ACPERF_FRICTION_H
#define ACPERF_FRICTION_H

#include "acperf/export.h"

#define ACP_REYNOLDS_MIN 1.0e3   /**< lowest Reynolds number accepted */
#define ACP_REYNOLDS_MAX 1.0e10  /**< highest Reynolds number accepted */

ACP_BEGIN_DECLS

/**
 * Laminar flat-plate skin friction, Blasius: Cf = 1.328/sqrt(Re)
 * (Blasius 1908; Schlichting, "Boundary-Layer Theory", flat plate at zero incidence).
 *
 * @param reynolds Reynolds number on the plate length, 1e3 to 1e10
 * @return Cf; NaN for NaN/Inf or outside the range.
 */
ACP_API double acp_skin_friction_laminar(double reynolds);

/**
 * Turbulent flat-plate skin friction, Prandtl-Schlichting with the
 * compressibility factor of Raymer eq. 12.27:
 * Cf = 0.455/((log10 Re)^2.58 (1 + 0.144 M^2)^0.65).
 *
 * @param reynolds Reynolds number on the plate length, 1e3 to 1e10
 *                 (the formula is fitted for 1e5 to 1e9)
 * @param mach     Mach number, 0 to 5
 * @return Cf; NaN for NaN/Inf or outside the ranges.
 */
ACP_API double acp_skin_friction_turbulent(double reynolds, double mach);

/**
 * Mixed laminar/turbulent skin friction: the laminar-fraction weighted mean
 * Cf = f Cf_lam(Re) + (1 - f) Cf_turb(Re, M) (Raymer section 12.5.3, "a weighted
 * average of laminar and turbulent Cf based on the percent laminar flow").
 *
 * @param reynolds         Reynolds number on the plate length, 1e3 to 1e10
 * @param mach             Mach number, 0 to 5
 * @param laminar_fraction fraction of the wetted area in laminar flow, 0 to 1
 * @return Cf; NaN on invalid input.
 */
ACP_API double acp_skin_friction_mixed(double reynolds, double mach, double laminar_fraction);

/**
 * Cutoff Reynolds number of a rough surface (Raymer eqs. 12.28 and 12.29):
 * subsonic 38.21 (l/k)^1.053, transonic and supersonic
 * 44.62 (l/k)^1.053 M^1.16. The larger of the two is used, which switches
 * continuously at M = 0.875 where they are equal (the project's choice of
 * where "transonic" begins).
 *
 * @param length    characteristic length l (m), > 0
 * @param roughness equivalent sand-grain roughness k (m), > 0 (polished metal
 *                  about 1.5e-6, smooth paint 6.3e-6, camouflage paint 1.0e-5:
 *                  Raymer table 12.5)
 * @param mach      Mach number, 0 to 5
 * @return cutoff Reynolds number; NaN on invalid input or when it overflows
 *         (l/k above about 1e292).
 */
ACP_API double acp_roughness_cutoff_reynolds(double length, double roughness, double mach);

/**
 * Skin friction of a real surface: the turbulent part uses min(Re, Re_cutoff)
 * so a rough skin raises Cf once its cutoff falls below the flow's Reynolds
 * number (Raymer section 12.5.3); the laminar part uses Re.
 *
 * @param reynolds         Reynolds number on the length, 1e3 to 1e10
 * @param mach             Mach number, 0 to 5
 * @param laminar_fraction 0 to 1
 * @param length           characteristic length (m), > 0
 * @param roughness        equivalent sand-grain roughness (m), >= 0; 0 for
 *                         a hydraulically smooth surface (no cutoff)
 * @return Cf; NaN on invalid input.
 */
ACP_API double acp_skin_friction(double reynolds, double mach, double laminar_fraction,
                                 double length, double roughness);

/**
 * Form factor of a lifting surface (wing, tail, strut, pylon): Raymer,
 * "Aircraft Design: A Conceptual Approach", component build-up method,
 * eq. 12.30 of the 4th edition:
 * FF = [1 + 0.6/(x/c)_m (t/c) + 100 (t/c)^4] [1.34 M^0.18 (cos L_m)^0.28].
 *
 * @param thickness_ratio        t/c, 0 to 0.4
 * @param max_thickness_position (x/c)_m, chordwise position of maximum thickness, 0.1 to 0.7
 * @param sweep_max_thickness    sweep of the maximum-thickness line L_m (rad), 0 to 70 deg
 * @param mach                   Mach number, 0 to 1
 * @return FF; NaN on invalid input.
 *
 * Note: the Mach factor 1.34 M^0.18 is below 1 under M = 0.197 and goes
 * to 0 at M = 0, which would make a surface's form factor vanish at low
 * speed. The library holds the factor at 1 below M = (1/1.34)^(1/0.18) =
 * 0.19673 (continuous there; project's choice, docs/methods/drag.md).
 */
ACP_API double acp_form_factor_surface(double thickness_ratio, double max_thickness_position,
                                       double sweep_max_thickness, double mach);

/**
 * Form factor of a fuselage or smooth canopy: FF = 1 + 60/f^3 + f/400,
 * f = length/diameter (Raymer, eq. 12.31 of the 4th edition).
 *
 * @param fineness_ratio f, 1 to 100
 * @return FF; NaN on invalid input.
 */
ACP_API double acp_form_factor_body(double fineness_ratio);

/**
 * Form factor of a nacelle or smooth external store: FF = 1 + 0.35/f
 * (Raymer, eq. 12.32 of the 4th edition).
 *
 * @param fineness_ratio f = length/diameter, 1 to 100
 * @return FF; NaN on invalid input.
 */
ACP_API double acp_form_factor_nacelle(double fineness_ratio);

ACP_END_DECLS

#endif /* ACPERF_FRICTION_H */
