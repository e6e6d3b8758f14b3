/* Friction and form-factor formulas with their Mach-dependent factors computed
   once per flight condition: the drag build-up evaluates many components at one
   Mach. The public functions in friction.c go through the same code, so both
   give the same bits. */
#ifndef ACPERF_FRICTION_INTERNAL_H
#define ACPERF_FRICTION_INTERNAL_H

typedef struct {
  double compressibility; /* (1 + 0.144 M^2)^0.65, Raymer eq. 12.27 */
  double roughness_mach;  /* M^1.16, Raymer eq. 12.29 */
  double form_mach;       /* max(1, 1.34 M^0.18), Raymer eq. 12.30 */
} friction_mach;

/* The factors at a Mach number (0 to 5, checked by the caller). */
void friction_mach_init(double mach, friction_mach *f);

/* As acp_skin_friction() (arguments checked by the caller except the Reynolds
   number, which gives NaN outside 1e3 to 1e10). */
double friction_skin(double reynolds, const friction_mach *f, double laminar_fraction,
                     double length, double roughness);

/* As acp_form_factor_surface() without argument checks (Mach 0 to 1). */
double friction_form_surface(double thickness_ratio, double max_thickness_position,
                             double sweep_max_thickness, const friction_mach *f);

#endif /* ACPERF_FRICTION_INTERNAL_H */
