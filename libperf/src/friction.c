/* Flat-plate skin friction for the component drag build-up (Raymer section 12.5.3). */
#include "acperf/friction.h"

#include "acperf/airspeed.h"
#include "friction_internal.h"
#include "internal.h"

static int reynolds_ok(double re) { return acp_in_range(re, ACP_REYNOLDS_MIN, ACP_REYNOLDS_MAX); }

double acp_skin_friction_laminar(double reynolds) {
  if (!reynolds_ok(reynolds)) return ACP_NAN;
  return 1.328 / sqrt(reynolds);
}

void friction_mach_init(double mach, friction_mach *f) {
  f->compressibility = pow(1.0 + 0.144 * mach * mach, 0.65);
  f->roughness_mach = pow(mach, 1.16);
  /* Raymer's Mach factor, held at 1 below M = (1/1.34)^(1/0.18) = 0.19673. */
  f->form_mach = fmax(1.0, 1.34 * pow(mach, 0.18));
}

static double turbulent(double reynolds, const friction_mach *f) {
  if (!reynolds_ok(reynolds)) return ACP_NAN;
  return 0.455 / (pow(log10(reynolds), 2.58) * f->compressibility);
}

double acp_skin_friction_turbulent(double reynolds, double mach) {
  if (!acp_in_range(mach, 0.0, ACP_MACH_MAX)) return ACP_NAN;
  friction_mach f;
  friction_mach_init(mach, &f);
  return turbulent(reynolds, &f);
}

double acp_skin_friction_mixed(double reynolds, double mach, double laminar_fraction) {
  if (!acp_in_range(laminar_fraction, 0.0, 1.0)) return ACP_NAN;
  return laminar_fraction * acp_skin_friction_laminar(reynolds) +
         (1.0 - laminar_fraction) * acp_skin_friction_turbulent(reynolds, mach);
}

double friction_cutoff_base(double length, double roughness) {
  return roughness > 0.0 ? pow(length / roughness, 1.053) : ACP_NAN;
}

static double cutoff_reynolds(double base, const friction_mach *f) {
  const double subsonic = 38.21 * base;
  const double transonic = 44.62 * base * f->roughness_mach;
  const double cutoff = fmax(subsonic, transonic);
  return isfinite(cutoff) ? cutoff : ACP_NAN; /* (l/k)^1.053 overflows past l/k ~ 1e292 */
}

double acp_roughness_cutoff_reynolds(double length, double roughness, double mach) {
  if (!isfinite(length) || !isfinite(roughness) || length <= 0.0 || roughness <= 0.0 ||
      !acp_in_range(mach, 0.0, ACP_MACH_MAX))
    return ACP_NAN;
  friction_mach f;
  friction_mach_init(mach, &f);
  return cutoff_reynolds(friction_cutoff_base(length, roughness), &f);
}

double friction_skin(double reynolds, const friction_mach *f, double laminar_fraction,
                     double cutoff_base) {
  if (!reynolds_ok(reynolds)) return ACP_NAN;
  double re_turb = reynolds;
  if (!isnan(cutoff_base)) { /* roughness given */
    /* NaN here is a cutoff past the largest double: no limit */
    const double cutoff = cutoff_reynolds(cutoff_base, f);
    if (!isnan(cutoff)) re_turb = fmin(reynolds, fmax(cutoff, ACP_REYNOLDS_MIN));
  }
  return laminar_fraction * acp_skin_friction_laminar(reynolds) +
         (1.0 - laminar_fraction) * turbulent(re_turb, f);
}

double acp_skin_friction(double reynolds, double mach, double laminar_fraction, double length,
                         double roughness) {
  if (!acp_in_range(laminar_fraction, 0.0, 1.0) || !reynolds_ok(reynolds) ||
      !(isfinite(roughness) && roughness >= 0.0) || !(isfinite(length) && length > 0.0) ||
      !acp_in_range(mach, 0.0, ACP_MACH_MAX))
    return ACP_NAN;
  friction_mach f;
  friction_mach_init(mach, &f);
  return friction_skin(reynolds, &f, laminar_fraction, friction_cutoff_base(length, roughness));
}

double friction_sweep_factor(double sweep_max_thickness) {
  return pow(cos(sweep_max_thickness), 0.28);
}

double friction_form_surface(double thickness_ratio, double max_thickness_position,
                             double sweep_factor, const friction_mach *f) {
  const double tc = thickness_ratio;
  const double shape = 1.0 + 0.6 / max_thickness_position * tc + 100.0 * tc * tc * tc * tc;
  return shape * f->form_mach * sweep_factor;
}

double acp_form_factor_surface(double thickness_ratio, double max_thickness_position,
                               double sweep_max_thickness, double mach) {
  if (!acp_in_range(thickness_ratio, 0.0, 0.4) || !acp_in_range(max_thickness_position, 0.1, 0.7) ||
      !acp_in_range(sweep_max_thickness, 0.0, 70.0 * 3.14159265358979323846 / 180.0) ||
      !acp_in_range(mach, 0.0, 1.0))
    return ACP_NAN;
  friction_mach f;
  friction_mach_init(mach, &f);
  return friction_form_surface(thickness_ratio, max_thickness_position,
                               friction_sweep_factor(sweep_max_thickness), &f);
}

double acp_form_factor_body(double fineness_ratio) {
  if (!acp_in_range(fineness_ratio, 1.0, 100.0)) return ACP_NAN;
  const double f = fineness_ratio;
  return 1.0 + 60.0 / (f * f * f) + f / 400.0;
}

double acp_form_factor_nacelle(double fineness_ratio) {
  if (!acp_in_range(fineness_ratio, 1.0, 100.0)) return ACP_NAN;
  return 1.0 + 0.35 / fineness_ratio;
}
