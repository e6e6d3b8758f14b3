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

/* The Mach-free factor (l/k)^1.053 of the roughness cutoff (Raymer eq. 12.28,
   12.29) of a component of length l and roughness k; NaN without roughness
   (k <= 0). A per-model constant, kept by the aircraft model. */
double friction_cutoff_base(double length, double roughness);

/* As acp_skin_friction() (arguments checked by the caller except the Reynolds
   number, which gives NaN outside 1e3 to 1e10), with the roughness given as its
   friction_cutoff_base(). */
double friction_skin(double reynolds, const friction_mach *f, double laminar_fraction,
                     double cutoff_base);

/* The sweep factor cos(sweep)^0.28 of the surface form factor (Raymer eq. 12.30);
   a per-model constant, kept by the aircraft model. */
double friction_sweep_factor(double sweep_max_thickness);

/* As acp_form_factor_surface() without argument checks (Mach 0 to 1), with the
   sweep given as its friction_sweep_factor(). */
double friction_form_surface(double thickness_ratio, double max_thickness_position,
                             double sweep_factor, const friction_mach *f);

#endif /* ACPERF_FRICTION_INTERNAL_H */
