/**
 * @file acperf/schedule.h
 * @brief Climb and descent speed schedules: a CAS below a limit altitude, a
 *        CAS above it and a Mach above the crossover, capped by VMO/MMO; the
 *        acceleration factor of flying the schedule.
 *
 * A schedule (low-altitude CAS `cas_low` below `hp_limit`, then `cas`, then
 * `mach` above the crossover altitude of `cas` and `mach`) gives at any
 * pressure altitude the mode flown and the CAS, Mach and TAS. The common
 * default of 250 kt below 10,000 ft comes from air-traffic rules in many
 * airspaces (common practice); local rules take precedence.
 *
 * The acceleration factor f = 1 + (V/g) dV/dh (h geometric) is what climbing
 * or descending along the schedule costs in kinetic energy: the rate of climb
 * is (T - D) V/(m g f). dV/dh is evaluated on the actual day from the mode
 * flown: constant Mach, dV/dhp = M a L/(2 T); constant CAS, the impact
 * pressure is fixed, so d(qc/p)/dhp = (qc/p) g0/(R Tstd) and dM/d(qc/p) =
 * 1/(1.4 M (1 + 0.2 M^2)^2.5); then dh = (T/Tstd) dhp converts pressure to
 * geometric altitude. In ISA this is the published closed form
 * (V/g) dV/dh = 0.7 M^2 (phi - 0.190263) for constant CAS in the troposphere,
 * phi = ((1 + 0.2 M^2)^3.5 - 1)/(0.7 M^2 (1 + 0.2 M^2)^2.5), 0.7 M^2 phi above
 * it, -0.133184 M^2 for constant Mach in the troposphere and 0 above
 * (docs/methods/schedule.md).
 */
#ifndef ACPERF_SCHEDULE_H
#define ACPERF_SCHEDULE_H

#include "acperf/export.h"

ACP_BEGIN_DECLS

/** Mode of a schedule at an altitude (stored as a double in acp_schedule_point). */
enum acp_schedule_mode {
  ACP_MODE_LOW_CAS = 1, /**< below the limit altitude: cas_low */
  ACP_MODE_CAS = 2,     /**< constant CAS between the limit and the crossover */
  ACP_MODE_MACH = 3,    /**< constant Mach above the crossover */
  ACP_MODE_VMO = 4,     /**< capped at VMO (CAS) */
  ACP_MODE_MMO = 5      /**< capped at MMO (Mach) */
};

/** A schedule at one altitude. All doubles (no padding): VBA- and ctypes-friendly. Append-only. */
typedef struct {
  double mode;                /**< an acp_schedule_mode value */
  double cas;                 /**< calibrated airspeed, m/s */
  double mach;                /**< Mach number */
  double tas;                 /**< true airspeed, m/s */
  double crossover;           /**< crossover pressure altitude of cas and mach, m */
  double dtas_dhp;            /**< dTAS/d(pressure altitude) in the mode flown, 1/s */
  double acceleration_factor; /**< 1 + (V/g) dV/dh, h geometric */
} acp_schedule_point;

/**
 * Evaluate a speed schedule at a pressure altitude.
 *
 * @param hp       pressure altitude (m), -5,000 to 84,852
 * @param dtemp    ISA deviation (K), -100 to 100
 * @param cas_low  CAS below the limit altitude (m/s), > 0
 * @param hp_limit limit pressure altitude (m); below it cas_low is flown
 * @param cas      CAS above the limit altitude (m/s), > 0
 * @param mach     Mach above the crossover, > 0 to 5
 * @param vmo      maximum operating CAS (m/s), > 0; a speed above it is capped
 * @param mmo      maximum operating Mach, > 0; a Mach above it is capped
 * @param out      out: the point; all NaN on error
 * @return ACP_OK; ACP_ERR_INVALID (NULL, NaN/Inf, speeds <= 0);
 *         ACP_ERR_RANGE (hp/dtemp outside the atmosphere, Mach above 5, a
 *         constant-CAS mode above Mach 1, where the subsonic relations end,
 *         or a CAS so small that its Mach number underflows to 0). NaN/Inf in
 *         any argument is ACP_ERR_INVALID before any range is looked at. In
 *         the CAS modes `cas` is exactly the CAS flown (cas_low, cas or vmo).
 */
ACP_API int acp_speed_schedule(double hp, double dtemp, double cas_low, double hp_limit,
                               double cas, double mach, double vmo, double mmo,
                               acp_schedule_point *out);

/**
 * Acceleration factor 1 + (V/g) dV/dh of climbing at constant CAS (mode
 * ACP_MODE_CAS) or constant Mach (ACP_MODE_MACH) at a Mach number, pressure
 * altitude and ISA deviation; the closed forms of the header comment, valid on
 * any day. NaN on invalid input or another mode.
 */
ACP_API double acp_acceleration_factor(int mode, double mach, double hp, double dtemp);

ACP_END_DECLS

#endif /* ACPERF_SCHEDULE_H */
