/**
 * @file acperf/airspeed.h
 * @brief Calibrated, equivalent and true airspeed and Mach number; impact
 *        and dynamic pressure; crossover altitude; Reynolds number; wind triangle.
 *
 * Compressible-flow relations of NACA Report 1135 (Ames Research Staff,
 * "Equations, tables, and charts for compressible flow", 1953) for air with
 * gamma = 1.4:
 *  - subsonic impact pressure (eq. 44):  qc = p ((1 + 0.2 M^2)^3.5 - 1)
 *  - supersonic, Rayleigh pitot formula (eq. 100):
 *        qc = p (166.9216 M^7/(7 M^2 - 1)^2.5 - 1)
 *  - CAS is the speed that gives the same impact pressure at sea-level
 *    standard conditions (p0, a0); EAS = TAS sqrt(rho/rho0) = M sqrt(gamma p/rho0).
 *
 * Speeds are in m/s (TAS, CAS, EAS), pressure altitude hp in geopotential
 * metres, dtemp the ISA deviation in K. Ranges (enforced): speeds 0 to
 * 5 a (Mach 0 to 5), hp and dtemp as in atmosphere.h. Scalar forms return
 * NaN on error; array forms return the count of invalid points and put NaN
 * in their outputs; `dtemp` may be NULL in an array form for a standard day.
 */
#ifndef ACPERF_AIRSPEED_H
#define ACPERF_AIRSPEED_H

#include <stddef.h>
#include "acperf/export.h"

#define ACP_MACH_MAX 5.0 /**< highest Mach number accepted by the airspeed functions */

ACP_BEGIN_DECLS

/** Mach number from CAS (m/s) at pressure altitude hp (m); NaN on error. */
ACP_API double acp_cas_to_mach(double cas, double hp);
/** CAS (m/s) from Mach at pressure altitude hp (m); NaN on error. */
ACP_API double acp_mach_to_cas(double mach, double hp);
/** TAS (m/s) from CAS (m/s) at hp (m) and ISA deviation dtemp (K); NaN on error. */
ACP_API double acp_cas_to_tas(double cas, double hp, double dtemp);
/** CAS (m/s) from TAS (m/s) at hp (m) and dtemp (K); NaN on error. */
ACP_API double acp_tas_to_cas(double tas, double hp, double dtemp);
/** Mach from TAS (m/s): M = TAS/a(T); NaN on error. */
ACP_API double acp_tas_to_mach(double tas, double hp, double dtemp);
/** TAS (m/s) from Mach: TAS = M a(T); NaN on error. */
ACP_API double acp_mach_to_tas(double mach, double hp, double dtemp);
/** TAS (m/s) from EAS (m/s): TAS = EAS sqrt(rho0/rho); NaN on error. */
ACP_API double acp_eas_to_tas(double eas, double hp, double dtemp);
/** EAS (m/s) from TAS (m/s): EAS = TAS sqrt(rho/rho0); NaN on error. */
ACP_API double acp_tas_to_eas(double tas, double hp, double dtemp);
/** EAS (m/s) from CAS (m/s) at hp; independent of temperature; NaN on error. */
ACP_API double acp_cas_to_eas(double cas, double hp);
/** CAS (m/s) from EAS (m/s) at hp; NaN on error. */
ACP_API double acp_eas_to_cas(double eas, double hp);
/** EAS (m/s) from Mach at hp: EAS = M sqrt(gamma p/rho0); NaN on error. */
ACP_API double acp_mach_to_eas(double mach, double hp);
/** Mach from EAS (m/s) at hp; NaN on error. */
ACP_API double acp_eas_to_mach(double eas, double hp);

/**
 * Impact pressure qc = pt - p (Pa) at Mach and hp: the isentropic relation
 * below Mach 1, the Rayleigh pitot formula above (NACA Report 1135 eqs. 44 and 100).
 * NaN on error.
 */
ACP_API double acp_impact_pressure(double mach, double hp);
/**
 * Mach from the impact-to-static pressure ratio qc/p, 0 to the value at Mach 5.
 * Below qc/p = 0.892929 (Mach 1) the isentropic relation is inverted in closed
 * form; above it the logarithm of the Rayleigh pitot formula is solved by
 * Newton's method from M0 = 0.881285 sqrt(qc/p + 1) (the first iterate of the
 * classic fixed-point form), one step past a step below 1e-9 M: at most 5
 * steps from Mach 1 to 5 (at most 30; ACP_ERR_NO_CONVERGENCE otherwise).
 *
 * @param ratio qc/p, >= 0
 * @param mach  out: Mach number; NaN on error
 * @return ACP_OK; ACP_ERR_INVALID; ACP_ERR_RANGE (above Mach 5); ACP_ERR_NO_CONVERGENCE.
 */
ACP_API int acp_pressure_ratio_to_mach(double ratio, double *mach);
/** Impact pressure (Pa) of a CAS (m/s): the sea-level standard qc of that speed. NaN on error. */
ACP_API double acp_cas_to_impact_pressure(double cas);
/** CAS (m/s) of an impact pressure qc (Pa) >= 0. NaN on error. */
ACP_API double acp_impact_pressure_to_cas(double qc);
/** Dynamic pressure q = rho TAS^2/2 = gamma p M^2/2 (Pa) at Mach and hp. NaN on error. */
ACP_API double acp_dynamic_pressure(double mach, double hp);

/**
 * Crossover altitude: the pressure altitude at which a CAS and a Mach number
 * give the same TAS, i.e. where the impact pressure of the CAS equals p(hp) times
 * the impact pressure ratio of the Mach. Independent of the ISA deviation.
 *
 * @param cas  calibrated airspeed (m/s), > 0
 * @param mach Mach number, > 0 to 5
 * @param hp   out: crossover pressure altitude (m); NaN on error
 * @return ACP_OK; ACP_ERR_INVALID; ACP_ERR_RANGE (crossover outside -5,000 to 84,852 m).
 */
ACP_API int acp_crossover_altitude(double cas, double mach, double *hp);

/** Reynolds number per metre of length, rho TAS/mu (1/m), at hp and dtemp. NaN on error. */
ACP_API double acp_reynolds_per_metre(double tas, double hp, double dtemp);

/**
 * Wind triangle: heading and ground speed to make good a track.
 *
 * Angles in radians, true, clockwise from north. The wind is given as the
 * direction it blows FROM (meteorological convention) and its speed.
 * Wind-correction angle wca = asin(W sin(wind_from - track)/TAS),
 * ground speed = TAS cos(wca) - W cos(wind_from - track), heading = track + wca,
 * drift = track - heading (positive when the wind pushes the aircraft to the right).
 *
 * @param tas          true airspeed (m/s), > 0
 * @param track        desired track (rad)
 * @param wind_from    wind direction, from (rad)
 * @param wind_speed   wind speed (m/s), >= 0
 * @param ground_speed out: ground speed (m/s) (may be NULL)
 * @param heading      out: true heading (rad), in [0, 2 pi) (may be NULL)
 * @param drift        out: drift angle (rad), in (-pi/2, pi/2) (may be NULL)
 * @return ACP_OK; ACP_ERR_INVALID; ACP_ERR_RANGE when the crosswind exceeds the
 *         TAS or the ground speed would not be positive (track cannot be flown)
 *         or would overflow.
 */
ACP_API int acp_wind_triangle(double tas, double track, double wind_from, double wind_speed,
                              double *ground_speed, double *heading, double *drift);

/* Array forms: each returns the count of invalid points, whose outputs are NaN. */
ACP_API size_t acp_cas_to_mach_n(size_t n, const double *cas, const double *hp, double *mach);
ACP_API size_t acp_mach_to_cas_n(size_t n, const double *mach, const double *hp, double *cas);
ACP_API size_t acp_cas_to_tas_n(size_t n, const double *cas, const double *hp,
                                const double *dtemp, double *tas);
ACP_API size_t acp_tas_to_cas_n(size_t n, const double *tas, const double *hp,
                                const double *dtemp, double *cas);
ACP_API size_t acp_tas_to_mach_n(size_t n, const double *tas, const double *hp,
                                 const double *dtemp, double *mach);
ACP_API size_t acp_mach_to_tas_n(size_t n, const double *mach, const double *hp,
                                 const double *dtemp, double *tas);
ACP_API size_t acp_eas_to_tas_n(size_t n, const double *eas, const double *hp,
                                const double *dtemp, double *tas);
ACP_API size_t acp_tas_to_eas_n(size_t n, const double *tas, const double *hp,
                                const double *dtemp, double *eas);
ACP_API size_t acp_cas_to_eas_n(size_t n, const double *cas, const double *hp, double *eas);
ACP_API size_t acp_eas_to_cas_n(size_t n, const double *eas, const double *hp, double *cas);

ACP_END_DECLS

#endif /* ACPERF_AIRSPEED_H */
