/* Drag polar: component build-up (Raymer), parabolic polar, Oswald estimates,
   winglets, Korn drag divergence and Lock wave drag. Formulas and sources:
   docs/methods/drag.md and acperf/polar.h. */
#include "acperf/polar.h"

#include <string.h>

#include "acperf/airspeed.h"
#include "acperf/atmosphere.h"
#include "acperf/friction.h"
#include "acperf/status.h"
#include "aircraft_internal.h"
#include "friction_internal.h"
#include "internal.h"

#define PI 3.14159265358979323846
#define DEG (PI / 180.0)

/* ---- formulas ------------------------------------------------------------ */

static double raymer_span_term(double a) { return 1.0 - 0.045 * pow(a, 0.68); }

double acp_oswald_straight(double aspect_ratio) {
  if (!acp_in_range(aspect_ratio, 1.0, 30.0)) return ACP_NAN;
  return 1.78 * raymer_span_term(aspect_ratio) - 0.64;
}

double acp_oswald_swept(double aspect_ratio, double sweep_le) {
  if (!acp_in_range(aspect_ratio, 1.0, 30.0) || !acp_in_range(sweep_le, 0.0, 70.0 * DEG))
    return ACP_NAN;
  return 4.61 * raymer_span_term(aspect_ratio) * pow(cos(sweep_le), 0.15) - 3.1;
}

double acp_oswald_estimate(double aspect_ratio, double sweep_le) {
  const double straight = acp_oswald_straight(aspect_ratio);
  const double swept = acp_oswald_swept(aspect_ratio, fmax(sweep_le, 30.0 * DEG));
  if (isnan(straight) || isnan(swept) || !acp_in_range(sweep_le, 0.0, 70.0 * DEG)) return ACP_NAN;
  double e;
  if (sweep_le >= 30.0 * DEG)
    e = acp_oswald_swept(aspect_ratio, sweep_le);
  else
    e = straight + (swept - straight) * sweep_le / (30.0 * DEG);
  return fmin(1.0, fmax(0.3, e));
}

double acp_winglet_aspect_ratio(double aspect_ratio, double winglet_height, double span) {
  if (!(isfinite(aspect_ratio) && aspect_ratio > 0.0) || !(isfinite(span) && span > 0.0) ||
      !acp_in_range(winglet_height, 0.0, 0.5 * span))
    return ACP_NAN;
  /* h/b first: it is exact at h = b/2, where 1.9 h of a denormal h rounds; held
     to 1/2, which an odd denormal b passes above (its b/2 rounds up) */
  const double a = aspect_ratio * (1.0 + 1.9 * fmin(winglet_height / span, 0.5));
  return isfinite(a) ? a : ACP_NAN; /* overflow (a huge A) is no result */
}

double acp_korn_mach(double kappa, double thickness_ratio, double sweep, double cl) {
  if (!acp_in_range(kappa, 0.7, 1.0) || !acp_in_range(thickness_ratio, 0.0, 0.3) ||
      !acp_in_range(sweep, 0.0, 60.0 * DEG) || !acp_in_range(fabs(cl), 0.0, 10.0))
    return ACP_NAN;
  const double c = cos(sweep);
  return kappa / c - thickness_ratio / (c * c) - fabs(cl) / (10.0 * c * c * c);
}

double acp_critical_mach(double mach_drag_divergence) {
  if (!isfinite(mach_drag_divergence)) return ACP_NAN;
  return mach_drag_divergence - ACP_MDD_MCRIT_GAP;
}

static double lock(double mach, double mcrit) {
  if (mach <= mcrit) return 0.0;
  const double d = mach - mcrit;
  return 20.0 * d * d * d * d;
}

double acp_wave_drag_coefficient(double mach, double mach_critical) {
  if (!acp_in_range(mach, 0.0, ACP_MACH_MAX) || !acp_in_range(mach_critical, 0.0, ACP_MACH_MAX))
    return ACP_NAN;
  return lock(mach, mach_critical);
}

/* ---- the aircraft's induced-drag factor ---------------------------------- */

static double aspect_ratio(const acp_aircraft *ac) {
  return ac->v[AK_SPAN] * ac->v[AK_SPAN] / ac->v[AK_WING_AREA];
}

static double oswald_used(const acp_aircraft *ac) {
  const double e = ac->v[AK_OSWALD];
  return isnan(e) ? acp_oswald_estimate(aspect_ratio(ac), ac_value(ac, AK_SWEEP_LE)) : e;
}

double polar_induced_factor(const acp_aircraft *ac) {
  const double a_eff =
      acp_winglet_aspect_ratio(aspect_ratio(ac), ac_value(ac, AK_WINGLET_HEIGHT), ac->v[AK_SPAN]);
  return 1.0 / (PI * a_eff * oswald_used(ac));
}

int polar_derived_key(const char *key) {
  static const char *const keys[] = {"aspect_ratio",     "aspect_ratio_effective",
                                     "oswald_estimate",  "oswald_effective",
                                     "induced_factor",   "component_count"};
  for (size_t i = 0; i < sizeof keys / sizeof keys[0]; ++i)
    if (strcmp(key, keys[i]) == 0) return 1;
  return 0;
}

int polar_derived_value(const acp_aircraft *ac, const char *key, double *value) {
  *value = ACP_NAN;
  if (strcmp(key, "component_count") == 0) {
    *value = (double)ac->ncomp;
    return ACP_OK;
  }
  if (isnan(ac->v[AK_SPAN]) || isnan(ac->v[AK_WING_AREA])) return ACP_OK; /* not known yet */
  const double a = aspect_ratio(ac);
  if (strcmp(key, "aspect_ratio") == 0)
    *value = a;
  else if (strcmp(key, "aspect_ratio_effective") == 0)
    *value = acp_winglet_aspect_ratio(a, ac_value(ac, AK_WINGLET_HEIGHT), ac->v[AK_SPAN]);
  else if (strcmp(key, "oswald_estimate") == 0)
    *value = acp_oswald_estimate(a, ac_value(ac, AK_SWEEP_LE));
  else if (strcmp(key, "oswald_effective") == 0)
    *value = oswald_used(ac);
  else if (strcmp(key, "induced_factor") == 0)
    *value = polar_induced_factor(ac);
  return ACP_OK;
}

/* ---- the build-up --------------------------------------------------------- */

/* Cf, FF, Q and Reynolds number of one component; ACP_ERR_RANGE when Cf
   cannot be had (Reynolds number outside 1e3 to 1e10). */
static int component_factors(const ac_component *c, const acp_atmos *atm, double tas,
                             const friction_mach *fm, acp_component_drag *cd) {
  const double length = comp_value(c, CK_LENGTH);
  const double re = atm->density * tas * length / atm->dynamic_viscosity;
  const double cf = friction_skin(re, fm, comp_value(c, CK_LAMINAR_FRACTION), c->cutoff_base);
  double ff = c->v[CK_FORM_FACTOR];
  if (isnan(ff)) {
    switch ((int)c->v[CK_TYPE]) {
    case ACP_COMPONENT_SURFACE:
      ff = friction_form_surface(comp_value(c, CK_THICKNESS_RATIO),
                                 comp_value(c, CK_MAX_THICKNESS_POSITION), c->sweep_factor, fm);
      break;
    case ACP_COMPONENT_BODY: ff = acp_form_factor_body(comp_value(c, CK_FINENESS_RATIO)); break;
    case ACP_COMPONENT_NACELLE:
      ff = acp_form_factor_nacelle(comp_value(c, CK_FINENESS_RATIO));
      break;
    default: ff = 1.0; break;
    }
  }
  cd->reynolds = re;
  cd->skin_friction = cf;
  cd->form_factor = ff;
  cd->interference_factor = comp_value(c, CK_INTERFERENCE);
  if (isnan(cf) || isnan(ff)) return ACP_ERR_RANGE;
  /* drag areas D/q (m2) of all copies; forces are set by the caller */
  const double swet = comp_value(c, CK_WETTED_AREA) * comp_value(c, CK_COUNT_OF);
  const double q_factor = cd->interference_factor;
  cd->friction = cf * swet;
  cd->form = cf * (ff - 1.0) * swet;
  cd->interference = cf * ff * (q_factor - 1.0) * swet;
  cd->parasite = cf * ff * q_factor * swet;
  return ACP_OK;
}

static void polar_nan(acp_polar_point *pp) {
  double *f = &pp->mach;
  for (size_t i = 0; i < sizeof *pp / sizeof(double); ++i) f[i] = ACP_NAN;
}

static void parts_nan(acp_drag_parts *dp) {
  dp->friction = dp->form = dp->interference = dp->parasite = ACP_NAN;
  dp->induced = dp->wave = dp->total = ACP_NAN;
}

int polar_eval(const acp_aircraft *ac, const acp_atmos *atm, double lift, double tas,
               acp_polar_point *pp) {
  polar_nan(pp);
  const double mach = tas / atm->sound_speed;
  if (!(tas > 0.0) || !(mach <= ACP_POLAR_MACH_MAX)) return ACP_ERR_RANGE;
  const double s = ac->v[AK_WING_AREA];
  const double q = 0.5 * atm->density * tas * tas;
  const double cl = lift / (q * s);
  /* a speed so low that q underflows: no finite lift coefficient */
  if (!isfinite(cl)) return ACP_ERR_RANGE;
  double cd0;
  if (ac->ncomp == 0) {
    cd0 = ac->v[AK_CD0];
  } else {
    double fr = 0.0, fo = 0.0, in = 0.0;
    friction_mach fm; /* the Mach factors once for all components */
    friction_mach_init(mach, &fm);
    for (size_t i = 0; i < ac->ncomp; ++i) {
      acp_component_drag cd;
      if (component_factors(&ac->comp[i], atm, tas, &fm, &cd) != ACP_OK) return ACP_ERR_RANGE;
      fr += cd.friction;
      fo += cd.form;
      in += cd.interference;
    }
    pp->cd_friction = fr / s;
    pp->cd_form = fo / s;
    pp->cd_interference = in / s;
    pp->cd_leakage = ac_value(ac, AK_LEAKAGE) * (fr + fo + in) / s;
    pp->cd_misc = ac_value(ac, AK_CD_MISC);
    cd0 = pp->cd_friction + pp->cd_form + pp->cd_interference + pp->cd_leakage + pp->cd_misc;
  }
  const double k = ac->induced_factor; /* ac_derive(): polar_induced_factor(ac) */
  const double dcl = cl - ac_value(ac, AK_CL_MIN_DRAG);
  double cdw = 0.0;
  if (!isnan(ac->v[AK_KORN_KAPPA])) {
    const double mdd = acp_korn_mach(ac->v[AK_KORN_KAPPA], ac->v[AK_THICKNESS_RATIO],
                                     ac_value(ac, AK_SWEEP_QC), cl);
    if (isnan(mdd)) return ACP_ERR_RANGE; /* |CL| > 10 */
    pp->mach_drag_divergence = mdd;
    pp->mach_critical = mdd - ACP_MDD_MCRIT_GAP;
    cdw = lock(mach, pp->mach_critical);
  }
  pp->mach = mach;
  pp->dynamic_pressure = q;
  pp->reynolds_per_metre = atm->density * tas / atm->dynamic_viscosity;
  pp->cl = cl;
  pp->cd0 = cd0;
  pp->cd_induced = k * dcl * dcl;
  pp->cd_wave = cdw;
  pp->cd = cd0 + pp->cd_induced + cdw;
  pp->induced_factor = k;
  if (!isfinite(pp->cd * q * s)) { /* the drag overflows a double */
    polar_nan(pp);
    return ACP_ERR_RANGE;
  }
  return ACP_OK;
}

double polar_drag(const acp_aircraft *ac, const acp_atmos *atm, double lift, double tas) {
  acp_polar_point pp;
  if (polar_eval(ac, atm, lift, tas, &pp) != ACP_OK) return ACP_NAN;
  return pp.cd * pp.dynamic_pressure * ac->v[AK_WING_AREA];
}

/* Forces from the coefficients: leakage shared in proportion, misc as form drag. */
static void parts_from_polar(const acp_aircraft *ac, const acp_polar_point *pp,
                             acp_drag_parts *dp) {
  const double qs = pp->dynamic_pressure * ac->v[AK_WING_AREA];
  if (ac->ncomp > 0) {
    const double base = pp->cd_friction + pp->cd_form + pp->cd_interference;
    const double share = base > 0.0 ? 1.0 + pp->cd_leakage / base : 1.0;
    dp->friction = pp->cd_friction * share * qs;
    dp->form = (pp->cd_form * share + pp->cd_misc) * qs;
    dp->interference = pp->cd_interference * share * qs;
  } else {
    dp->friction = dp->form = dp->interference = ACP_NAN;
  }
  dp->parasite = pp->cd0 * qs;
  dp->induced = pp->cd_induced * qs;
  dp->wave = pp->cd_wave * qs;
  dp->total = pp->cd * qs;
}

/* ---- public drag functions ----------------------------------------------- */

/* Common checks of a flight condition; the atmosphere on success. */
int polar_condition(const acp_aircraft *ac, double mass, double hp, double dtemp, double tas,
                     double load_factor, acp_atmos *atm) {
  if (!ac) return ACP_ERR_INVALID;
  if (!isfinite(mass) || !isfinite(tas) || !isfinite(load_factor)) return ACP_ERR_INVALID;
  const int st = acp_isa(hp, dtemp, atm);
  if (st != ACP_OK) return st;
  if (ac->check_status != ACP_OK) return ACP_ERR_INVALID; /* ac_derive(): ac_check() */
  if (!acp_in_range(mass, ACP_POLAR_MASS_MIN, ACP_POLAR_MASS_MAX) || !(tas > 0.0) ||
      !acp_in_range(load_factor, 0.0, ACP_POLAR_LOAD_MAX))
    return ACP_ERR_RANGE;
  return ACP_OK;
}

int acp_polar(const acp_aircraft *ac, double mass, double hp, double dtemp, double tas,
              double load_factor, acp_polar_point *out) {
  if (!out) return ACP_ERR_INVALID;
  polar_nan(out);
  acp_atmos atm;
  const int st = polar_condition(ac, mass, hp, dtemp, tas, load_factor, &atm);
  if (st != ACP_OK) return st;
  return polar_eval(ac, &atm, load_factor * mass * ACP_G0, tas, out);
}

int acp_drag_load(const acp_aircraft *ac, double mass, double hp, double dtemp, double tas,
                  double load_factor, acp_drag_parts *out) {
  if (!out) return ACP_ERR_INVALID;
  parts_nan(out);
  acp_polar_point pp;
  const int st = acp_polar(ac, mass, hp, dtemp, tas, load_factor, &pp);
  if (st == ACP_OK) parts_from_polar(ac, &pp, out);
  return st;
}

int acp_drag(const acp_aircraft *ac, double mass, double hp, double dtemp, double tas,
             acp_drag_parts *out) {
  return acp_drag_load(ac, mass, hp, dtemp, tas, 1.0, out);
}

int acp_drag_bank(const acp_aircraft *ac, double mass, double hp, double dtemp, double tas,
                  double bank, acp_drag_parts *out) {
  if (!out) return ACP_ERR_INVALID;
  parts_nan(out);
  if (!isfinite(bank)) return ACP_ERR_INVALID;
  if (!(fabs(bank) <= ACP_POLAR_BANK_MAX)) return ACP_ERR_RANGE;
  return acp_drag_load(ac, mass, hp, dtemp, tas, 1.0 / cos(bank), out);
}

int acp_drag_component(const acp_aircraft *ac, size_t index, double hp, double dtemp,
                       double tas, acp_component_drag *out) {
  if (!out) return ACP_ERR_INVALID;
  double *f = &out->reynolds;
  for (size_t i = 0; i < sizeof *out / sizeof(double); ++i) f[i] = ACP_NAN;
  acp_atmos atm;
  const int st = polar_condition(ac, ACP_POLAR_MASS_MIN, hp, dtemp, tas, 1.0, &atm);
  if (st != ACP_OK) return st;
  if (index >= ac->ncomp) return ACP_ERR_RANGE;
  const double mach = tas / atm.sound_speed;
  if (!(mach <= ACP_POLAR_MACH_MAX)) return ACP_ERR_RANGE;
  acp_component_drag cd;
  friction_mach fm;
  friction_mach_init(mach, &fm);
  if (component_factors(&ac->comp[index], &atm, tas, &fm, &cd) != ACP_OK) return ACP_ERR_RANGE;
  const double q = 0.5 * atm.density * tas * tas;
  cd.friction *= q;
  cd.form *= q;
  cd.interference *= q;
  cd.parasite *= q;
  *out = cd;
  return ACP_OK;
}

static void put_parts(size_t i, const acp_drag_parts *dp, double *friction, double *form,
                      double *interference, double *parasite, double *induced, double *wave,
                      double *total) {
  if (friction) friction[i] = dp->friction;
  if (form) form[i] = dp->form;
  if (interference) interference[i] = dp->interference;
  if (parasite) parasite[i] = dp->parasite;
  if (induced) induced[i] = dp->induced;
  if (wave) wave[i] = dp->wave;
  if (total) total[i] = dp->total;
}

size_t acp_drag_n(const acp_aircraft *ac, size_t n, const double *mass, const double *hp,
                  const double *dtemp, const double *tas, const double *load_factor,
                  double *friction, double *form, double *interference, double *parasite,
                  double *induced, double *wave, double *total) {
  if (!ac || !mass || !hp || !tas) {
    double *const outs[] = {friction, form, interference, parasite, induced, wave, total};
    return acp_all_invalid(n, outs, 7);
  }
  size_t bad = 0;
  for (size_t i = 0; i < n; ++i) {
    acp_drag_parts dp;
    const int st = acp_drag_load(ac, mass[i], hp[i], acp_opt(dtemp, i, 0.0), tas[i],
                                 acp_opt(load_factor, i, 1.0), &dp);
    if (st != ACP_OK) ++bad;
    put_parts(i, &dp, friction, form, interference, parasite, induced, wave, total);
  }
  return bad;
}

size_t acp_drag_curve(const acp_aircraft *ac, double mass, double hp, double dtemp, size_t n,
                      const double *tas, double *parasite, double *induced, double *wave,
                      double *total) {
  if (!ac || !tas) {
    double *const outs[] = {parasite, induced, wave, total};
    return acp_all_invalid(n, outs, 4);
  }
  size_t bad = 0;
  for (size_t i = 0; i < n; ++i) {
    acp_drag_parts dp;
    if (acp_drag(ac, mass, hp, dtemp, tas[i], &dp) != ACP_OK) ++bad;
    put_parts(i, &dp, NULL, NULL, NULL, parasite, induced, wave, total);
  }
  return bad;
}
