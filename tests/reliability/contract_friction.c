/* Contract of friction.h: every coefficient positive and no larger than the
   laminar value at the lowest Reynolds number, 1.328/sqrt(1e3) = 0.042. */
#include <math.h>

#include "acperf.h"
#include "contract.h"

#define CF_HI 0.0420

static int reynolds_ok(double re) { return re >= ACP_REYNOLDS_MIN && re <= ACP_REYNOLDS_MAX; }
static int mach_ok(double m) { return m >= 0.0 && m <= ACP_MACH_MAX; }

void contract_friction(contract *c) {
  const double re = contract_arg(c), m = contract_arg(c), f = contract_arg(c);
  const double len = contract_arg(c), k = contract_arg(c);

  const double lam = acp_skin_friction_laminar(re);
  contract_value(c, "acp_skin_friction_laminar", lam, 0x1p-1074, CF_HI);
  contract_expect(c, reynolds_ok(re) == !isnan(lam), "acp_skin_friction_laminar",
                  "NaN exactly when the Reynolds number is outside 1e3 to 1e10");

  const double turb = acp_skin_friction_turbulent(re, m);
  contract_value(c, "acp_skin_friction_turbulent", turb, 0x1p-1074, CF_HI);
  contract_expect(c, (reynolds_ok(re) && mach_ok(m)) == !isnan(turb),
                  "acp_skin_friction_turbulent", "NaN exactly when an argument is out of range");

  const double mix = acp_skin_friction_mixed(re, m, f);
  contract_value(c, "acp_skin_friction_mixed", mix, 0x1p-1074, CF_HI);
  const int f_ok = f >= 0.0 && f <= 1.0;
  contract_expect(c, (reynolds_ok(re) && mach_ok(m) && f_ok) == !isnan(mix),
                  "acp_skin_friction_mixed", "NaN exactly when an argument is out of range");
  if (!isnan(mix))
    contract_expect(c, mix >= fmin(lam, turb) * (1 - 1e-15) && mix <= fmax(lam, turb) * (1 + 1e-15),
                    "acp_skin_friction_mixed", "not between the laminar and turbulent values");

  const double cut = acp_roughness_cutoff_reynolds(len, k, m);
  contract_value(c, "acp_roughness_cutoff_reynolds", cut, 0.0, 1.7976931348623157e308);
  const int geometry_ok = isfinite(len) && isfinite(k) && len > 0.0 && k > 0.0;
  if (!(geometry_ok && mach_ok(m)))
    contract_expect(c, isnan(cut), "acp_roughness_cutoff_reynolds", "accepted an invalid argument");

  const double cf = acp_skin_friction(re, m, f, len, k);
  contract_value(c, "acp_skin_friction", cf, 0x1p-1074, CF_HI);
  const int surface_ok = isfinite(len) && len > 0.0 && isfinite(k) && k >= 0.0;
  if ((reynolds_ok(re) && mach_ok(m) && f_ok && surface_ok) != !isnan(cf))
    contract_violation(c, "acp_skin_friction", 
                       "NaN exactly when out of range: re %.17g M %.17g f %.17g l %.17g k %.17g",
                       re, m, f, len, k);
  if (!isnan(cf) && k == 0.0)
    contract_same(c, "acp_skin_friction", "smooth surface vs the mixed value", cf, mix);
  if (!isnan(cf) && !isnan(mix))
    contract_expect(c, cf >= mix * (1.0 - 1e-14), "acp_skin_friction",
                    "a rough surface with less friction than a smooth one");

  /* Form factors (Raymer eqs. 12.30 to 12.32): bounds from the documented
     ranges: surface 0.74 (70 deg sweep) to 8.0, body 1 to 61.01, nacelle 1 to 1.35. */
  const double tc = contract_arg(c), xm = contract_arg(c), sweep = contract_arg(c);
  const double ffs = acp_form_factor_surface(tc, xm, sweep, m);
  contract_value(c, "acp_form_factor_surface", ffs, 0.74, 8.0);
  const int surface_args = tc >= 0.0 && tc <= 0.4 && xm >= 0.1 && xm <= 0.7 && sweep >= 0.0 &&
                           sweep <= 70.0 * 3.141592653589793 / 180.0 && m >= 0.0 && m <= 1.0;
  contract_expect(c, surface_args == !isnan(ffs), "acp_form_factor_surface",
                  "NaN exactly when an argument is out of range");
  const double ffb = acp_form_factor_body(len), ffn = acp_form_factor_nacelle(len);
  contract_value(c, "acp_form_factor_body", ffb, 1.0, 61.01);
  contract_value(c, "acp_form_factor_nacelle", ffn, 1.0, 1.35);
  const int fineness_ok = len >= 1.0 && len <= 100.0;
  contract_expect(c, fineness_ok == !isnan(ffb) && fineness_ok == !isnan(ffn),
                  "acp_form_factor_body/nacelle", "NaN exactly when the fineness is out of range");
}
