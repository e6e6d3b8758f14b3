/**
 * @file acperf/units.h
 * @brief Exact conversion constants between SI and the units of the trade.
 *
 * The library works in SI at its interface (m, s, kg, K, Pa, N, W, rad).
 * These constants and helpers convert the units operations staff use.
 * Each constant is exact by definition unless its comment says otherwise.
 */
#ifndef ACPERF_UNITS_H
#define ACPERF_UNITS_H

#include "acperf/export.h"

/** International foot: 1 ft = 0.3048 m exactly (international yard and pound agreement, 1959). */
#define ACP_FT 0.3048
/** International nautical mile: 1 NM = 1852 m exactly (International Hydrographic Conference, 1929). */
#define ACP_NM 1852.0
/** Knot: 1 kt = 1 NM/h = 1852/3600 m/s exactly. */
#define ACP_KT (1852.0 / 3600.0)
/** Avoirdupois pound: 1 lb = 0.45359237 kg exactly (1959 agreement). */
#define ACP_LB 0.45359237
/** Flight level: FL 1 = 100 ft of pressure altitude = 30.48 m exactly. */
#define ACP_FL 30.48
/** Foot per minute: 1 ft/min = 0.3048/60 m/s = 0.00508 m/s exactly. */
#define ACP_FPM 0.00508
/** Hectopascal: 1 hPa = 100 Pa exactly (= 1 mbar). */
#define ACP_HPA 100.0
/**
 * Conventional inch of mercury: 1 inHg = 13595.1 kg/m3 x 9.80665 m/s2 x 0.0254 m
 * = 3386.388640341 Pa (conventional mercury density and standard gravity;
 * NIST SP 811 gives 3.386389E+03 Pa).
 */
#define ACP_INHG 3386.388640341
/** Celsius zero: 0 degC = 273.15 K exactly (SI). */
#define ACP_CELSIUS_ZERO 273.15
/** Minute: 60 s. Hour: 3600 s. */
#define ACP_MINUTE 60.0
#define ACP_HOUR 3600.0
/** Degree of angle in radians: pi/180. */
#define ACP_DEG (3.14159265358979323846 / 180.0)

ACP_BEGIN_DECLS

/* Plain multiplications by the constants above, for callers without the
   macros (bindings, VBA, ctypes). Non-finite input gives NaN/Inf as IEEE
   arithmetic does; these never fail. */
ACP_API double acp_ft_to_m(double ft);
ACP_API double acp_m_to_ft(double m);
ACP_API double acp_kt_to_mps(double kt);
ACP_API double acp_mps_to_kt(double mps);
ACP_API double acp_nm_to_m(double nm);
ACP_API double acp_m_to_nm(double m);
ACP_API double acp_lb_to_kg(double lb);
ACP_API double acp_kg_to_lb(double kg);
ACP_API double acp_fl_to_m(double fl);
ACP_API double acp_m_to_fl(double m);
ACP_API double acp_fpm_to_mps(double fpm);
ACP_API double acp_mps_to_fpm(double mps);
ACP_API double acp_hpa_to_pa(double hpa);
ACP_API double acp_pa_to_hpa(double pa);
ACP_API double acp_inhg_to_pa(double inhg);
ACP_API double acp_pa_to_inhg(double pa);
ACP_API double acp_degc_to_k(double degc);
ACP_API double acp_k_to_degc(double k);
ACP_API double acp_deg_to_rad(double deg);
ACP_API double acp_rad_to_deg(double rad);

/**
 * Convert a value in a named unit to SI.
 *
 * Unit names (case-sensitive): "m", "ft", "FL", "km", "NM", "m/s", "kt",
 * "km/h", "ft/min", "kg", "lb", "t", "Pa", "hPa", "mbar", "inHg", "K",
 * "degC", "s", "min", "h", "rad", "deg", "N", "lbf", "kg/h", "kg/s", "lb/h".
 * "degC" is an absolute temperature (value + 273.15); temperature
 * differences are the same in K and degC.
 *
 * @param value  value in `unit`
 * @param unit   unit name from the list above
 * @param si     out: value in the SI unit of the same quantity; NaN on error
 * @return ACP_OK; ACP_ERR_INVALID for a NULL pointer or non-finite value;
 *         ACP_ERR_UNKNOWN_KEY for an unknown unit name; ACP_ERR_RANGE when
 *         the result overflows (is not a finite double).
 */
ACP_API int acp_to_si(double value, const char *unit, double *si);

/** Inverse of acp_to_si(): convert an SI value to a named unit. Same errors. */
ACP_API int acp_from_si(double si, const char *unit, double *value);

ACP_END_DECLS

#endif /* ACPERF_UNITS_H */
