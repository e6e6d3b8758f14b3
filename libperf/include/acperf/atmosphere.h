/**
 * @file acperf/atmosphere.h
 * @brief The ISO 2533:1975 / ICAO Doc 7488 standard atmosphere and its companions.
 *
 * The standard atmosphere of ISO 2533:1975 (identical to the ICAO Standard
 * Atmosphere, Doc 7488/3, and to the U.S. Standard Atmosphere 1976 below
 * 84,852 m geopotential): seven layers of linear temperature in geopotential
 * altitude, hydrostatic pressure, ideal-gas density, Sutherland viscosity.
 *
 * Off-standard days: pressure follows pressure altitude exactly as in the
 * standard; the temperature is the standard temperature plus a constant
 * deviation `dtemp` (K); density, speed of sound and viscosity follow from
 * that temperature. This is the usual performance-engineering convention
 * (common practice).
 *
 * Validity (enforced, ACP_ERR_RANGE outside):
 *  - pressure altitude hp: ACP_ISA_HP_MIN to ACP_ISA_HP_MAX (-5,000 m to
 *    84,852 m geopotential);
 *  - ISA deviation dtemp: ACP_ISA_DTEMP_MIN to ACP_ISA_DTEMP_MAX (-100 K to
 *    +100 K), which keeps the absolute temperature above 86 K.
 * NaN or infinite arguments are ACP_ERR_INVALID.
 */
#ifndef ACPERF_ATMOSPHERE_H
#define ACPERF_ATMOSPHERE_H

#include <stddef.h>
#include "acperf/export.h"

/* Constants of ISO 2533:1975, section 2 (exact by the standard's definition). */
#define ACP_G0 9.80665            /**< standard gravity, m/s2 */
#define ACP_R_AIR 287.05287       /**< specific gas constant of air, J/(kg K) */
#define ACP_GAMMA 1.4             /**< ratio of specific heats of air */
#define ACP_EARTH_RADIUS 6356766.0 /**< nominal Earth radius for geopotential altitude, m */
#define ACP_T0 288.15             /**< sea-level standard temperature, K */
#define ACP_P0 101325.0           /**< sea-level standard pressure, Pa */
#define ACP_RHO0 (ACP_P0 / (ACP_R_AIR * ACP_T0)) /**< sea-level standard density, kg/m3 (1.225000018; ISO 2533 table: 1.2250) */
#define ACP_A0 340.293988026089 /**< sea-level speed of sound sqrt(1.4 R T0), m/s, to 15 digits (ISO 2533 table: 340.294) */
#define ACP_SUTHERLAND_BETA 1.458e-6 /**< Sutherland constant, kg/(m s K^0.5) */
#define ACP_SUTHERLAND_S 110.4    /**< Sutherland temperature, K */

#define ACP_ISA_HP_MIN (-5000.0)  /**< lowest pressure altitude of the model, m */
#define ACP_ISA_HP_MAX 84852.0    /**< highest pressure altitude of the model, m */
#define ACP_ISA_DTEMP_MIN (-100.0) /**< lowest ISA deviation accepted, K */
#define ACP_ISA_DTEMP_MAX 100.0   /**< highest ISA deviation accepted, K */

ACP_BEGIN_DECLS

/** State of the atmosphere at one point. Append-only. */
typedef struct {
  double temperature;         /**< static temperature, K */
  double pressure;            /**< static pressure, Pa */
  double density;             /**< density, kg/m3 */
  double sound_speed;         /**< speed of sound, m/s */
  double dynamic_viscosity;   /**< dynamic viscosity, Pa s */
  double kinematic_viscosity; /**< kinematic viscosity, m2/s */
} acp_atmos;

/**
 * Standard atmosphere at a pressure altitude, with an ISA temperature deviation.
 *
 * @param hp     pressure altitude (m, geopotential), -5,000 to 84,852
 * @param dtemp  ISA temperature deviation (K), -100 to +100
 * @param out    out: the atmosphere; all fields NaN on error
 * @return ACP_OK; ACP_ERR_INVALID (NULL out, NaN/Inf input);
 *         ACP_ERR_RANGE (hp or dtemp outside the model).
 *
 * Notes:
 *  1. T = Tb + Lb (hp - Hb) + dtemp; p from the hydrostatic equation per
 *     layer: p = pb (Tstd/Tb)^(-g0/(R Lb)), or pb exp(-g0 (hp-Hb)/(R Tb))
 *     where Lb = 0 (ISO 2533:1975, eqs. 12 and 13).
 *  2. rho = p/(R T); a = sqrt(gamma R T); mu = beta T^1.5/(T + S) (Sutherland,
 *     ISO 2533 eq. 22); nu = mu/rho.
 *  3. Layer base pressures are the standard's recurrence evaluated to 20
 *     digits; they agree with the ISO 2533 tables to their 6 printed digits.
 */
ACP_API int acp_isa(double hp, double dtemp, acp_atmos *out);

/**
 * Array form of acp_isa().
 *
 * @param n      number of points
 * @param hp     n pressure altitudes (m)
 * @param dtemp  n ISA deviations (K), or NULL for a standard day
 * @param temperature,pressure,density,sound_speed,dynamic_viscosity,kinematic_viscosity
 *               n outputs each, or NULL when not wanted
 * @return the number of invalid points; their outputs are NaN.
 */
ACP_API size_t acp_isa_n(size_t n, const double *hp, const double *dtemp,
                         double *temperature, double *pressure, double *density,
                         double *sound_speed, double *dynamic_viscosity,
                         double *kinematic_viscosity);

/** Standard temperature plus dtemp at hp (K); NaN on error. Same ranges as acp_isa(). */
ACP_API double acp_isa_temperature(double hp, double dtemp);
/** Standard pressure at hp (Pa); NaN on error. */
ACP_API double acp_isa_pressure(double hp);
/** Density at hp and dtemp (kg/m3); NaN on error. */
ACP_API double acp_isa_density(double hp, double dtemp);
/** Speed of sound at hp and dtemp (m/s); NaN on error. */
ACP_API double acp_isa_sound_speed(double hp, double dtemp);

/**
 * Pressure altitude of a static pressure (inverse of the standard pressure).
 *
 * @param pressure static pressure (Pa), between the standard pressures at
 *                 84,852 m (0.3734 Pa) and -5,000 m (177,687 Pa)
 * @param hp       out: pressure altitude (m, geopotential); NaN on error
 * @return ACP_OK; ACP_ERR_INVALID (NULL, NaN/Inf, pressure <= 0);
 *         ACP_ERR_RANGE (outside the model).
 *
 * Closed form per layer (ISO 2533 eqs. 12 and 13 solved for H):
 * H = Hb + (Tb/Lb) ((p/pb)^(-R Lb/g0) - 1), or Hb - (R Tb/g0) ln(p/pb).
 */
ACP_API int acp_isa_pressure_altitude(double pressure, double *hp);
/** Array form of acp_isa_pressure_altitude(); returns the count of invalid points (NaN). */
ACP_API size_t acp_isa_pressure_altitude_n(size_t n, const double *pressure, double *hp);

/**
 * Geopotential altitude of a geometric altitude: H = r0 Z/(r0 + Z),
 * r0 = 6,356,766 m (ISO 2533:1975 eq. 8).
 *
 * @param geometric geometric altitude above mean sea level (m), -10,000 to 1,000,000
 * @return geopotential altitude (m); NaN on NaN/Inf or outside the range.
 */
ACP_API double acp_geopotential_altitude(double geometric);
/**
 * Geometric altitude of a geopotential altitude: Z = r0 H/(r0 - H)
 * (ISO 2533:1975 eq. 8 solved for Z).
 *
 * @param geopotential geopotential altitude (m), -10,000 to 1,000,000 geometric equivalent
 * @return geometric altitude (m); NaN on NaN/Inf or outside the range.
 */
ACP_API double acp_geometric_altitude(double geopotential);
/** Array forms; return the count of invalid points (NaN). */
ACP_API size_t acp_geopotential_altitude_n(size_t n, const double *geometric, double *geopotential);
ACP_API size_t acp_geometric_altitude_n(size_t n, const double *geopotential, double *geometric);

/**
 * Density altitude: the standard-atmosphere altitude whose density equals
 * `density`.
 *
 * @param density air density (kg/m3), within the standard densities of the model
 * @param h       out: density altitude (m, geopotential); NaN on error
 * @return ACP_OK; ACP_ERR_INVALID (NULL, NaN/Inf, density <= 0); ACP_ERR_RANGE.
 *
 * Closed form per layer: rho/rho_b = (T/Tb)^(-g0/(R L) - 1), or exp(-g0 (H-Hb)/(R Tb)).
 */
ACP_API int acp_isa_density_altitude(double density, double *h);
/** Density altitude (m) at pressure altitude hp and ISA deviation dtemp; NaN on error. */
ACP_API double acp_density_altitude(double hp, double dtemp);

/** ISA deviation (K) of an outside air temperature oat (K) at hp; NaN on error or oat <= 0. */
ACP_API double acp_isa_deviation(double oat, double hp);
/** Outside air temperature (K) at hp for an ISA deviation dtemp (K); NaN on error. */
ACP_API double acp_outside_air_temperature(double dtemp, double hp);

/**
 * Total air temperature from static temperature and Mach:
 * TAT = SAT (1 + r (gamma-1)/2 M^2) (adiabatic compression; r = 1 gives the
 * stagnation temperature; NACA Report 1135 eq. 43 for r = 1).
 *
 * @param sat       static air temperature (K), > 0
 * @param mach      Mach number, 0 to 5
 * @param recovery  probe recovery factor r, 0 to 1
 * @return total air temperature (K); NaN on invalid input, or when the
 *         result is not a positive finite double (overflow, underflow).
 */
ACP_API double acp_total_temperature(double sat, double mach, double recovery);
/** Inverse of acp_total_temperature(): static temperature (K) from total; NaN on error. */
ACP_API double acp_static_temperature(double tat, double mach, double recovery);

/**
 * Pressure altitude from the reading of an altimeter set to QNH.
 *
 * Setting the subscale of a standard altimeter shifts its reading by the
 * pressure altitude of the setting, so hp = indicated + Hp(qnh); at
 * qnh = 1013.25 hPa the two are equal (common practice; the rule of thumb
 * of about 27 ft per hPa near sea level follows from it).
 *
 * @param indicated altimeter reading (m)
 * @param qnh       altimeter setting (Pa), 80,000 to 110,000
 * @param hp        out: pressure altitude (m); NaN on error
 * @return ACP_OK; ACP_ERR_INVALID; ACP_ERR_RANGE (setting or result outside the model).
 */
ACP_API int acp_pressure_altitude_from_qnh(double indicated, double qnh, double *hp);
/** Inverse of acp_pressure_altitude_from_qnh(): altimeter reading (m) at hp with setting qnh. */
ACP_API int acp_indicated_altitude_from_qnh(double hp, double qnh, double *indicated);

/**
 * Altimeter cold-temperature correction (ICAO Doc 8168 PANS-OPS, Vol I,
 * altimeter corrections): the height to add to an altitude above the
 * aerodrome when the air is colder than ISA.
 *
 * dH = (-dT/L0) ln(1 + L0 h/(T0 + L0 elev)), L0 = -0.0065 K/m, T0 = 288.15 K,
 * dT = aerodrome temperature minus ISA temperature at the aerodrome elevation.
 * It is the hydrostatic height error of an atmosphere with a constant
 * deviation dT from ISA in the troposphere.
 *
 * @param height      height above the aerodrome (altimeter setting source) (m), >= 0
 * @param elevation   aerodrome elevation (m), -5,000 to 11,000
 * @param temperature aerodrome outside air temperature (K), > 0
 * @param correction  out: correction (m), positive when colder than ISA;
 *                    negative when warmer (warm-day corrections are not
 *                    subtracted from minimum altitudes); NaN on error
 * @return ACP_OK; ACP_ERR_INVALID; ACP_ERR_RANGE (elevation + height above 11,000 m).
 *
 * Caution: an estimate. The approved procedure, the operator's manual and the
 * aerodrome's published corrections take precedence.
 */
ACP_API int acp_cold_temperature_correction(double height, double elevation,
                                            double temperature, double *correction);

ACP_END_DECLS

#endif /* ACPERF_ATMOSPHERE_H */
