/* Unit conversions between SI and the units of the trade (constants in units.h). */
#include "acperf/units.h"

#include <string.h>

#include "acperf/atmosphere.h"
#include "acperf/status.h"
#include "internal.h"

double acp_ft_to_m(double ft) { return ft * ACP_FT; }
double acp_m_to_ft(double m) { return m / ACP_FT; }
double acp_kt_to_mps(double kt) { return kt * ACP_KT; }
double acp_mps_to_kt(double mps) { return mps / ACP_KT; }
double acp_nm_to_m(double nm) { return nm * ACP_NM; }
double acp_m_to_nm(double m) { return m / ACP_NM; }
double acp_lb_to_kg(double lb) { return lb * ACP_LB; }
double acp_kg_to_lb(double kg) { return kg / ACP_LB; }
double acp_fl_to_m(double fl) { return fl * ACP_FL; }
double acp_m_to_fl(double m) { return m / ACP_FL; }
double acp_fpm_to_mps(double fpm) { return fpm * ACP_FPM; }
double acp_mps_to_fpm(double mps) { return mps / ACP_FPM; }
double acp_hpa_to_pa(double hpa) { return hpa * ACP_HPA; }
double acp_pa_to_hpa(double pa) { return pa / ACP_HPA; }
double acp_inhg_to_pa(double inhg) { return inhg * ACP_INHG; }
double acp_pa_to_inhg(double pa) { return pa / ACP_INHG; }
double acp_degc_to_k(double degc) { return degc + ACP_CELSIUS_ZERO; }
double acp_k_to_degc(double k) { return k - ACP_CELSIUS_ZERO; }
double acp_deg_to_rad(double deg) { return deg * ACP_DEG; }
double acp_rad_to_deg(double rad) { return rad / ACP_DEG; }

/* si = value * factor + offset. */
typedef struct {
  const char *name;
  double factor;
  double offset;
} unit_def;

static const unit_def UNITS[] = {
    {"m", 1.0, 0.0},          {"ft", ACP_FT, 0.0},
    {"FL", ACP_FL, 0.0},      {"km", 1000.0, 0.0},
    {"NM", ACP_NM, 0.0},      {"m/s", 1.0, 0.0},
    {"kt", ACP_KT, 0.0},      {"km/h", 1.0 / 3.6, 0.0},
    {"ft/min", ACP_FPM, 0.0}, {"kg", 1.0, 0.0},
    {"lb", ACP_LB, 0.0},      {"t", 1000.0, 0.0},
    {"Pa", 1.0, 0.0},         {"hPa", ACP_HPA, 0.0},
    {"mbar", ACP_HPA, 0.0},   {"inHg", ACP_INHG, 0.0},
    {"K", 1.0, 0.0},          {"degC", 1.0, ACP_CELSIUS_ZERO},
    {"s", 1.0, 0.0},          {"min", ACP_MINUTE, 0.0},
    {"h", ACP_HOUR, 0.0},     {"rad", 1.0, 0.0},
    {"deg", ACP_DEG, 0.0},    {"N", 1.0, 0.0},
    {"lbf", ACP_LB * ACP_G0, 0.0}, /* pound-force: lb x standard gravity, exact */
    {"kg/s", 1.0, 0.0},       {"kg/h", 1.0 / ACP_HOUR, 0.0},
    {"lb/h", ACP_LB / ACP_HOUR, 0.0},
};

static const unit_def *find_unit(const char *name) {
  for (size_t i = 0; i < sizeof UNITS / sizeof UNITS[0]; ++i)
    if (strcmp(UNITS[i].name, name) == 0) return &UNITS[i];
  return NULL;
}

static int convert(double x, const char *unit, double *out, int to_si) {
  if (!out) return ACP_ERR_INVALID;
  *out = ACP_NAN;
  if (!unit || !isfinite(x)) return ACP_ERR_INVALID;
  const unit_def *u = find_unit(unit);
  if (!u) return ACP_ERR_UNKNOWN_KEY;
  const double y = to_si ? x * u->factor + u->offset : (x - u->offset) / u->factor;
  if (!isfinite(y)) return ACP_ERR_RANGE; /* overflow: no double holds the result */
  *out = y;
  return ACP_OK;
}

int acp_to_si(double value, const char *unit, double *si) { return convert(value, unit, si, 1); }

int acp_from_si(double si, const char *unit, double *value) {
  return convert(si, unit, value, 0);
}
