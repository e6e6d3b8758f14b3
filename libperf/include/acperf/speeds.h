/**
 * @file acperf/speeds.h
 * @brief Characteristic speeds on the full drag model: minimum drag (best
 *        L/D), minimum power, maximum range (jet), 1 g stall; gliding; speed
 *        stability.
 *
 * Each speed is found numerically on the aircraft's whole drag model (build-up
 * with Reynolds and Mach effects, lift-dependent drag with its CL offset,
 * wave drag), not from the closed forms of the parabolic polar.
 *
 * VMD, VMP, VMR (acp_speeds, and VMD of the speed-stability functions): in
 * level flight D(V) = A(V) V^2 + b/V^2 + c exactly, b = 2 k W^2/(rho S) and
 * c = -2 k W CL0 from the induced drag, and A constant for a parabolic polar.
 *  1. the drag is evaluated at the speed of CL = 0.6; A there gives the
 *     parabolic polar's closed forms as the first estimates;
 *  2. each speed (VMP and VMR from VMD) is refined by interpolated Newton
 *     steps: ln A from the drag evaluations is interpolated by the quadratic
 *     in ln V through the three nearest, the stationary point of the
 *     interpolated D V^n (n = 0, 1, -1) is found by Newton's method, and the
 *     drag is evaluated there; a speed is found when the next step is below
 *     1e-7 V (VMD: the last evaluated speed, so L/D max = W/D(VMD) exactly);
 *     at most ACP_SPEEDS_FAST_STEPS evaluations per speed;
 *  3. a speed whose steps do not settle, leave the interval or meet a drag
 *     that cannot be had is found by the tabulated search of acp_glide()
 *     below (121 speeds, slope bisection), which also decides ACP_ERR_RANGE.
 * On the demo regional jet this takes 12 to 22 drag evaluations (14.8 on
 * average over the benchmark's conditions, tests/bench); the speeds agree
 * with the former tabulated search to 7.9e-8 relative over
 * tests/reference/speeds_grid.csv, and with the parabolic polar's closed
 * forms to rounding. The minimum found is the one the parabolic estimate
 * leads to: the same as the tabulated search's wherever the objective has a
 * single minimum in the interval.
 *
 * Gliding (acp_glide): the objective is tabulated at 121 true airspeeds
 * spaced evenly in log V, from the speed at CL = 5 up to Mach
 * ACP_POLAR_MACH_MAX; around the smallest tabulated value the speed where
 * the objective's central-difference slope (step 1e-5 V) changes sign is
 * bisected to a bracket of 1e-13 V (about 1e-10 relative against closed
 * forms). At most about 400 evaluations per speed.
 *
 * No allocation. Every call has the bound ACP_SPEEDS_DRAG_EVALUATIONS_MAX on
 * its drag evaluations (acp_speeds; the glide's fixed-point steps aside).
 *
 * A minimum that lies at either end of the search interval (for example no
 * maximum of V/D below Mach 0.95 when the aircraft has no wave-drag model)
 * gives ACP_ERR_RANGE and NaN for that speed; the other speeds are still given.
 *
 * Speeds are TAS in m/s unless the function says CAS or Mach; mass in kg;
 * hp pressure altitude (m), dtemp ISA deviation (K). Level 1 g flight.
 */
#ifndef ACPERF_SPEEDS_H
#define ACPERF_SPEEDS_H

#include <stddef.h>
#include "acperf/aircraft.h"
#include "acperf/export.h"

ACP_BEGIN_DECLS

/** Drag evaluations per speed of the interpolated search, at most. */
#define ACP_SPEEDS_FAST_STEPS 16
/** Drag evaluations of one acp_speeds() call, at most: the first, three
    interpolated searches, and for speeds they cannot settle the tabulated
    search (121, and 2 per bisection step, 200 steps, per speed), and L/D max. */
#define ACP_SPEEDS_DRAG_EVALUATIONS_MAX (1 + 3 * ACP_SPEEDS_FAST_STEPS + 121 + 3 * 400 + 1)

/** Characteristic speeds (TAS m/s, or CAS m/s, or Mach) and L/D max. Append-only. */
typedef struct {
  double vmd;    /**< minimum drag speed: best lift-to-drag ratio */
  double vmp;    /**< minimum power speed: least D V */
  double vmr;    /**< maximum range speed of a jet at constant TSFC: most V/D */
  double vs1g;   /**< 1 g stall speed sqrt(2 m g/(rho S cl_max)); NaN without cl_max */
  double ld_max; /**< L/D at vmd */
} acp_speed_set;

/** Gliding (no thrust) at one altitude. Append-only. */
typedef struct {
  double best_glide_ratio;     /**< greatest horizontal distance per height lost */
  double best_glide_speed;     /**< TAS along the path at the best ratio, m/s */
  double best_glide_sink_rate; /**< sink rate at best_glide_speed, m/s (positive down) */
  double min_sink_speed;       /**< TAS along the path at the least sink rate, m/s */
  double min_sink_rate;        /**< least sink rate, m/s (positive down) */
} acp_glide_set;

/** Speed stability at a speed. Append-only. */
typedef struct {
  double slope;  /**< dD/dV in level 1 g flight, N per m/s */
  double vmd;    /**< minimum drag speed, TAS m/s: the stability boundary */
  double stable; /**< +1 speed stable (dD/dV > 0, above VMD), -1 unstable (below), 0 neutral */
} acp_stability;

/**
 * Characteristic speeds in TAS (m/s) and L/D max at a mass, altitude and ISA deviation.
 *
 * vmd minimises D (L = W fixed, so it maximises L/D); vmp minimises D V;
 * vmr minimises D/V. For a parabolic polar without CL offset, Reynolds
 * effects or wave drag they equal the closed forms
 * VMD = sqrt(2 W/(rho S)) (k/CD0)^(1/4), VMP = 3^(-1/4) VMD,
 * VMR = 3^(1/4) VMD, L/D max = 1/(2 sqrt(CD0 k)).
 *
 * @param out out: speeds; fields NaN where they cannot be had
 * @return ACP_OK; ACP_ERR_INVALID (NULL, NaN/Inf, incomplete aircraft);
 *         ACP_ERR_RANGE (input outside the model, or a speed outside the
 *         search interval: that speed NaN, the others given).
 */
ACP_API int acp_speeds(const acp_aircraft *ac, double mass, double hp, double dtemp,
                       acp_speed_set *out);
/** acp_speeds() with the four speeds as calibrated airspeeds (m/s). */
ACP_API int acp_speeds_cas(const acp_aircraft *ac, double mass, double hp, double dtemp,
                           acp_speed_set *out);
/** acp_speeds() with the four speeds as Mach numbers. */
ACP_API int acp_speeds_mach(const acp_aircraft *ac, double mass, double hp, double dtemp,
                            acp_speed_set *out);

/**
 * Array forms of acp_speeds(), acp_speeds_cas(), acp_speeds_mach(): element
 * i at mass[i], hp[i], dtemp[i] (dtemp NULL: standard day). Outputs may be
 * NULL when not wanted.
 * @return the number of elements with any error (their failed outputs NaN).
 */
ACP_API size_t acp_speeds_n(const acp_aircraft *ac, size_t n, const double *mass,
                            const double *hp, const double *dtemp, double *vmd, double *vmp,
                            double *vmr, double *vs1g, double *ld_max);
ACP_API size_t acp_speeds_cas_n(const acp_aircraft *ac, size_t n, const double *mass,
                                const double *hp, const double *dtemp, double *vmd,
                                double *vmp, double *vmr, double *vs1g, double *ld_max);
ACP_API size_t acp_speeds_mach_n(const acp_aircraft *ac, size_t n, const double *mass,
                                 const double *hp, const double *dtemp, double *vmd,
                                 double *vmp, double *vmr, double *vs1g, double *ld_max);

/**
 * Gliding performance without thrust (clean aircraft, its polar as given;
 * windmilling or feathered-propeller drag is not added).
 *
 * Exact steady glide: at a TAS V along the path the glide angle g solves
 * W sin g = D(V, lift = W cos g) (fixed-point iteration from g = 0, to
 * 1e-15 rad, at most 60 steps); glide ratio = 1/tan g, sink rate = V sin g.
 * The best glide minimises g; the least sink minimises V sin g. For a
 * parabolic polar they sit close to VMD and VMP and the best ratio to
 * L/D max (exactly so in the small-angle limit).
 *
 * @return as acp_speeds(); ACP_ERR_NO_CONVERGENCE if an iteration fails.
 */
ACP_API int acp_glide(const acp_aircraft *ac, double mass, double hp, double dtemp,
                      acp_glide_set *out);
/** Array form of acp_glide(); returns the count of elements with any error. */
ACP_API size_t acp_glide_n(const acp_aircraft *ac, size_t n, const double *mass,
                           const double *hp, const double *dtemp, double *best_glide_ratio,
                           double *best_glide_speed, double *best_glide_sink_rate,
                           double *min_sink_speed, double *min_sink_rate);

/**
 * Speed stability at a true airspeed: dD/dV in level 1 g flight (central
 * difference, step 1e-5 V) and the classification: speed stable when drag
 * rises with speed (above VMD: at constant thrust a speed loss brings less
 * drag and the aircraft accelerates back), unstable when it falls (below
 * VMD, "the back of the drag curve"). Common practice.
 *
 * @param tas true airspeed (m/s)
 * @return as acp_drag(); vmd NaN (status ACP_ERR_RANGE) if VMD cannot be had;
 *         ACP_ERR_RANGE when the slope is not a finite double. The slope has
 *         no bound of its own: at low speed it grows as the induced drag's
 *         -2 D_i/V.
 */
ACP_API int acp_speed_stability(const acp_aircraft *ac, double mass, double hp, double dtemp,
                                double tas, acp_stability *out);
/** Array form of acp_speed_stability(); returns the count of elements with any error. */
ACP_API size_t acp_speed_stability_n(const acp_aircraft *ac, size_t n, const double *mass,
                                     const double *hp, const double *dtemp, const double *tas,
                                     double *slope, double *vmd, double *stable);

/**
 * The speed-stability boundary (VMD) over arrays of masses and altitudes:
 * element i at mass[i], hp[i], dtemp[i] (NULL: standard day), as TAS (m/s),
 * CAS (m/s) and Mach. Outputs may be NULL when not wanted.
 * @return the number of invalid elements (their outputs NaN).
 */
ACP_API size_t acp_speed_stability_boundary_n(const acp_aircraft *ac, size_t n,
                                              const double *mass, const double *hp,
                                              const double *dtemp, double *vmd_tas,
                                              double *vmd_cas, double *vmd_mach);

ACP_END_DECLS

#endif /* ACPERF_SPEEDS_H */
