/* Contract of units.h: the plain conversions never fail and invert each
   other; the named conversions accept only known names and finite values. */
#include <math.h>
#include <string.h>

#include "acperf.h"
#include "contract.h"

typedef double (*conv_fn)(double);
typedef struct {
  const char *name;
  conv_fn to, back;
} conv_pair;

static const conv_pair PAIRS[] = {
    {"acp_ft_to_m", acp_ft_to_m, acp_m_to_ft},       {"acp_m_to_ft", acp_m_to_ft, acp_ft_to_m},
    {"acp_kt_to_mps", acp_kt_to_mps, acp_mps_to_kt}, {"acp_mps_to_kt", acp_mps_to_kt, acp_kt_to_mps},
    {"acp_nm_to_m", acp_nm_to_m, acp_m_to_nm},       {"acp_m_to_nm", acp_m_to_nm, acp_nm_to_m},
    {"acp_lb_to_kg", acp_lb_to_kg, acp_kg_to_lb},    {"acp_kg_to_lb", acp_kg_to_lb, acp_lb_to_kg},
    {"acp_fl_to_m", acp_fl_to_m, acp_m_to_fl},       {"acp_m_to_fl", acp_m_to_fl, acp_fl_to_m},
    {"acp_fpm_to_mps", acp_fpm_to_mps, acp_mps_to_fpm},
    {"acp_mps_to_fpm", acp_mps_to_fpm, acp_fpm_to_mps},
    {"acp_hpa_to_pa", acp_hpa_to_pa, acp_pa_to_hpa}, {"acp_pa_to_hpa", acp_pa_to_hpa, acp_hpa_to_pa},
    {"acp_inhg_to_pa", acp_inhg_to_pa, acp_pa_to_inhg},
    {"acp_pa_to_inhg", acp_pa_to_inhg, acp_inhg_to_pa},
    {"acp_degc_to_k", acp_degc_to_k, acp_k_to_degc}, {"acp_k_to_degc", acp_k_to_degc, acp_degc_to_k},
    {"acp_deg_to_rad", acp_deg_to_rad, acp_rad_to_deg},
    {"acp_rad_to_deg", acp_rad_to_deg, acp_deg_to_rad},
};

/* The documented names, and names that must be refused. */
static const char *const UNIT_NAMES[] = {
    "m",  "ft", "FL",  "km",   "NM",   "m/s",  "kt", "km/h", "ft/min", "kg",
    "lb", "t",  "Pa",  "hPa",  "mbar", "inHg", "K",  "degC", "s",      "min",
    "h",  "rad", "deg", "N",   "lbf",  "kg/h", "kg/s", "lb/h",
    /* refused: */ "", "M", "ft ", "knots", "degF", "m/s/s", NULL,
};
#define N_UNIT_NAMES (sizeof UNIT_NAMES / sizeof UNIT_NAMES[0])
#define N_KNOWN 28

void contract_units(contract *c) {
  const double x = contract_arg(c);
  for (size_t i = 0; i < sizeof PAIRS / sizeof PAIRS[0]; ++i) {
    const conv_pair *p = &PAIRS[i];
    const double y = p->to(x);
    c->calls++;
    contract_record(c, y);
    /* IEEE arithmetic: NaN in gives NaN, a finite value gives a finite value
       unless it overflows, and the inverse brings it back. */
    if (isnan(x)) {
      contract_expect(c, isnan(y), p->name, "NaN in, not NaN out");
      continue;
    }
    contract_expect(c, !isnan(y), p->name, "NaN out of a non-NaN input");
    if (isfinite(x) && isfinite(y) && fabs(x) > 1e-300 && fabs(y) > 1e-300 && fabs(x) < 1e300 &&
        fabs(y) < 1e300)
      contract_close(c, p->name, "round trip", p->back(y), x, 1e-12, 4e-16);
  }

  const char *unit = UNIT_NAMES[contract_pick(c, N_UNIT_NAMES)];
  for (int dir = 0; dir < 2; ++dir) {
    const char *fn = dir ? "acp_from_si" : "acp_to_si";
    double out = 0.0, back = 0.0;
    const int st = dir ? acp_from_si(x, unit, &out) : acp_to_si(x, unit, &out);
    contract_code(c, fn, st, ST(ACP_ERR_INVALID) | ST(ACP_ERR_UNKNOWN_KEY) | ST(ACP_ERR_RANGE));
    contract_record(c, out);
    if (st != ACP_OK) {
      contract_expect(c, isnan(out), fn, "output not NaN on error");
    } else {
      contract_expect(c, isfinite(out), fn, "ACP_OK with a non-finite result");
      const int bst = dir ? acp_to_si(out, unit, &back) : acp_from_si(out, unit, &back);
      if (bst == ACP_OK && fabs(x) > 1e-290 && fabs(x) < 1e290)
        contract_close(c, fn, "round trip", back, x, 1e-9 * fmax(1.0, fabs(out)), 1e-15);
    }
    int is_known = 0;
    for (size_t k = 0; unit && k < N_KNOWN; ++k) is_known |= strcmp(unit, UNIT_NAMES[k]) == 0;
    if (!unit || !isfinite(x))
      contract_expect(c, st == ACP_ERR_INVALID, fn, "NULL unit or non-finite value accepted");
    else if (!is_known)
      contract_expect(c, st == ACP_ERR_UNKNOWN_KEY, fn, "unknown unit name accepted");
    const int nst = dir ? acp_from_si(x, "m", NULL) : acp_to_si(x, "m", NULL);
    contract_expect(c, nst == ACP_ERR_INVALID, fn, "NULL output pointer not refused");
  }
}
