/* Cruise: specific air range, cruise speed modes, Breguet equations. */
#include "acperf/cruise.h"

#include "acperf/airspeed.h"
#include "acperf/polar.h"
#include "acperf/status.h"
#include "aircraft_internal.h"
#include "cruise_internal.h"
#include "internal.h"
#include "performance_internal.h"

#define GRID 32            /* speeds tabulated over the search interval */
#define MIN_TOL 1e-8       /* minimiser: speed to 1e-8 relative (about sqrt(double epsilon)) */
#define ROOT_TOL 1e-10     /* long-range cruise: speed bracket, relative */
#define BOUNDARY_TOL 1e-10 /* thrust-limit boundary: bisection bracket, relative */
#define HINT_SPAN 0.02     /* warm-start bracket: +-2 % around the previous speed */
#define LOW_SPEED_FACTOR 1.2 /* search from 1.2 VS1G (common practice) */
#define CL_LOW_DEFAULT 1.2 /* lift coefficient of the low end without cl_max */
#define WIND_MAX 200.0
#define COST_INDEX_MAX 1000.0

void cruise_point_nan(acp_cruise_point *p) {
  p->time = p->distance = p->hp = p->mass = p->tas = p->cas = p->mach = ACP_NAN;
  p->ground_speed = p->drag = p->fuel_flow = p->tsfc = p->lift_to_drag = p->sar = ACP_NAN;
  p->limit = p->buffet_margin = p->limit_exceeded = p->limit_excess = ACP_NAN;
}

int cruise_cond_at(cruise_cond *c, const acp_aircraft *ac, double hp, double dtemp, double wind) {
  c->ac = ac;
  c->hp = hp;
  c->dtemp = dtemp;
  c->wind = wind;
  return acp_isa(hp, dtemp, &c->at);
}

int cruise_check(const acp_aircraft *ac, int mode, double cost_index, double mass, double wind) {
  if (!ac || !isfinite(cost_index) || !isfinite(mass) || !isfinite(wind)) return ACP_ERR_INVALID;
  if (mode < ACP_CRUISE_FIXED_MACH || mode > ACP_CRUISE_MAX_ENDURANCE) return ACP_ERR_INVALID;
  if (perf_check(ac, NULL, 0) != ACP_OK) return ACP_ERR_INVALID;
  if (mode == ACP_CRUISE_FIXED_MACH && isnan(ac_value(ac, AK_CRUISE_MACH))) return ACP_ERR_INVALID;
  if (!acp_in_range(cost_index, 0.0, COST_INDEX_MAX) ||
      !acp_in_range(mass, ACP_POLAR_MASS_MIN, ACP_POLAR_MASS_MAX) ||
      !acp_in_range(wind, -WIND_MAX, WIND_MAX))
    return ACP_ERR_RANGE;
  return ACP_OK;
}

/* Level flight at tas: the whole point, inside the aircraft's speed limits
   (cl_max, mmo, vmo: else ACP_ERR_RANGE with the limit in p). */
static int level(const cruise_cond *c, double mass, double tas, int limit, acp_cruise_point *p) {
  double drag;
  acp_engine_point e;
  const int st = perf_level(c->ac, mass, &c->at, tas, &drag, &e);
  const double gs = tas + c->wind;
  if (st != ACP_OK || !(gs > 0.0)) {
    cruise_point_nan(p);
    return st != ACP_OK ? st : ACP_ERR_RANGE;
  }
  const double mach = tas / c->at.sound_speed, cas = acp_mach_to_cas(mach, c->hp);
  const double cl = perf_lift_coefficient(c->ac, mass, &c->at, tas);
  perf_limit lim;
  if (perf_speed_envelope(c->ac, cl, mach, cas, &lim) != ACP_OK) {
    cruise_point_nan(p);
    p->limit_exceeded = lim.code;
    p->limit_excess = lim.excess;
    return ACP_ERR_RANGE;
  }
  const double clb = ac_value(c->ac, AK_CL_BUFFET);
  p->time = p->distance = 0.0;
  p->hp = c->hp;
  p->mass = mass;
  p->tas = tas;
  p->mach = mach;
  p->cas = cas;
  p->ground_speed = gs;
  p->drag = drag;
  p->fuel_flow = e.fuel_flow;
  p->tsfc = e.fuel_flow / drag;
  p->lift_to_drag = mass * ACP_G0 / drag;
  p->sar = gs / e.fuel_flow;
  p->limit = limit;
  p->buffet_margin = (isnan(clb) ? ac_value(c->ac, AK_CL_MAX) : clb) / cl;
  p->limit_exceeded = ACP_LIMIT_NONE;
  p->limit_excess = 0.0;
  return ACP_OK;
}

/* The aircraft's limits at the start of a cruise (mass and altitude), told in p. */
int cruise_envelope(const cruise_cond *c, double mass, acp_cruise_point *p) {
  perf_limit lim;
  const int st = perf_envelope(c->ac, mass, c->hp, 0u, &lim);
  if (st != ACP_OK) {
    p->limit_exceeded = lim.code;
    p->limit_excess = lim.excess;
  }
  return st;
}

static double merit_of(int mode, double cost_index, double fuel_flow, double gs) {
  switch (mode) {
  case ACP_CRUISE_MAX_ENDURANCE: return fuel_flow;
  case ACP_CRUISE_ECONOMY: return (fuel_flow + cost_index / 60.0) / gs;
  default: return fuel_flow / gs;
  }
}

double cruise_merit(int mode, double cost_index, const acp_cruise_point *p) {
  return merit_of(mode, cost_index, p->fuel_flow, p->ground_speed);
}

/* Objective of the search at tas (lower is better); NaN where level flight
   fails, *st its status. */
static double objective(const cruise_cond *c, int mode, double ci, double mass, double tas,
                        int *st) {
  double drag;
  acp_engine_point e;
  *st = perf_level(c->ac, mass, &c->at, tas, &drag, &e);
  const double gs = tas + c->wind;
  if (*st == ACP_OK && !(gs > 0.0) && mode != ACP_CRUISE_MAX_ENDURANCE) *st = ACP_ERR_RANGE;
  return *st == ACP_OK ? merit_of(mode, ci, e.fuel_flow, gs) : ACP_NAN;
}

/* Search interval [lo, hi] and the limit that sets hi. */
static int interval(const cruise_cond *c, double mass, double *lo, double *hi, int *hi_limit) {
  const acp_aircraft *ac = c->ac;
  const double cl_max = ac_value(ac, AK_CL_MAX);
  const double q_lo = mass * ACP_G0 / (ac_value(ac, AK_WING_AREA) *
                                       (isnan(cl_max) ? CL_LOW_DEFAULT : cl_max));
  *lo = sqrt(2.0 * q_lo / c->at.density) * (isnan(cl_max) ? 1.0 : LOW_SPEED_FACTOR);
  *hi = ACP_POLAR_MACH_MAX * c->at.sound_speed * (1.0 - 1e-12);
  *hi_limit = ACP_CRUISE_LIMIT_MACH_MODEL;
  const double mmo = ac_value(ac, AK_MMO), vmo = ac_value(ac, AK_VMO);
  if (!isnan(mmo) && mmo * c->at.sound_speed < *hi) {
    *hi = mmo * c->at.sound_speed;
    *hi_limit = ACP_CRUISE_LIMIT_MMO;
  }
  if (!isnan(vmo)) {
    const double v = acp_cas_to_tas(vmo, c->hp, c->dtemp);
    if (v < *hi) {
      *hi = v;
      *hi_limit = ACP_CRUISE_LIMIT_VMO;
    }
  }
  return *lo < *hi ? ACP_OK : ACP_ERR_RANGE;
}

/* Bisect the boundary between a feasible speed `in` and an infeasible `out`;
   returns a feasible speed within BOUNDARY_TOL of it. */
static double boundary(const cruise_cond *c, int mode, double ci, double mass, double in,
                       double out) {
  int st;
  while (fabs(out - in) > BOUNDARY_TOL * in) {
    const double mid = 0.5 * (in + out);
    if (isnan(objective(c, mode, ci, mass, mid, &st))) out = mid;
    else in = mid;
  }
  return in;
}

/* Objective for the minimiser: infeasible counts as +infinity. */
static double obj_inf(const cruise_cond *c, int mode, double ci, double mass, double v) {
  int st;
  const double f = objective(c, mode, ci, mass, v, &st);
  return isnan(f) ? HUGE_VAL : f;
}

/* Minimum of the objective on [a, b] by Brent's method (golden section with
   parabolic interpolation; Brent, "Algorithms for Minimization without
   Derivatives", 1973, chapter 5), to |x - x*| <= MIN_TOL x. */
static double brent_min(const cruise_cond *c, int mode, double ci, double mass, double a,
                        double b) {
  const double g = 0.3819660112501051; /* (3 - sqrt(5))/2 */
  double x = a + g * (b - a), w = x, v = x;
  double fx = obj_inf(c, mode, ci, mass, x), fw = fx, fv = fx;
  double d = 0.0, e = 0.0;
  for (int it = 0; it < 200; ++it) {
    const double m = 0.5 * (a + b), tol = MIN_TOL * fabs(x), t2 = 2.0 * tol;
    if (fabs(x - m) <= t2 - 0.5 * (b - a)) break;
    double p = 0.0, q = 0.0, r = 0.0;
    if (fabs(e) > tol) { /* parabola through x, w, v */
      r = (x - w) * (fx - fv);
      q = (x - v) * (fx - fw);
      p = (x - v) * q - (x - w) * r;
      q = 2.0 * (q - r);
      if (q > 0.0) p = -p;
      else q = -q;
      r = e;
      e = d;
    }
    if (fabs(p) < fabs(0.5 * q * r) && p > q * (a - x) && p < q * (b - x)) {
      d = p / q; /* parabolic step */
      const double u = x + d;
      if (u - a < t2 || b - u < t2) d = x < m ? tol : -tol;
    } else {
      e = (x < m ? b : a) - x; /* golden-section step into the larger part */
      d = g * e;
    }
    const double u = x + (fabs(d) >= tol ? d : (d > 0.0 ? tol : -tol));
    const double fu = obj_inf(c, mode, ci, mass, u);
    if (fu <= fx) {
      if (u < x) b = x;
      else a = x;
      v = w;
      fv = fw;
      w = x;
      fw = fx;
      x = u;
      fx = fu;
    } else {
      if (u < x) a = u;
      else b = u;
      if (fu <= fw || w == x) {
        v = w;
        fv = fw;
        w = u;
        fw = fu;
      } else if (fu <= fv || v == x || v == w) {
        v = u;
        fv = fu;
      }
    }
  }
  return x;
}

/* Warm start: when the objective at hint is below its values HINT_SPAN
   either side (all feasible, inside [lo, hi]), that is a bracket of the
   minimum. */
static int hinted(const cruise_cond *c, int mode, double ci, double mass, double hint, double lo,
                  double hi, double *v_best) {
  if (!(hint > 0.0)) return 0;
  const double a = hint * (1.0 - HINT_SPAN), b = hint * (1.0 + HINT_SPAN);
  if (a <= lo || b >= hi) return 0;
  const double fm = obj_inf(c, mode, ci, mass, hint);
  if (!(fm < obj_inf(c, mode, ci, mass, a)) || !(fm < obj_inf(c, mode, ci, mass, b)) ||
      fm == HUGE_VAL)
    return 0;
  *v_best = brent_min(c, mode, ci, mass, a, b);
  return 1;
}

/* Minimum of the objective over the interval: speed and the limit holding it. */
static int minimise(const cruise_cond *c, int mode, double ci, double mass, double hint,
                    double *v_best, int *limit) {
  double lo, hi;
  int hi_limit;
  int st = interval(c, mass, &lo, &hi, &hi_limit);
  if (st != ACP_OK) return st;
  *limit = ACP_CRUISE_LIMIT_NONE;
  /* a headwind at least as strong as the fastest speed: no ground speed at all */
  if (mode != ACP_CRUISE_MAX_ENDURANCE && !(hi + c->wind > 0.0)) return ACP_ERR_RANGE;
  if (hinted(c, mode, ci, mass, hint, lo, hi, v_best)) return ACP_OK;
  double v[GRID], f[GRID];
  int s[GRID];
  int any_thrust = 0, best = -1, last_st = ACP_ERR_RANGE;
  const double ratio = log(hi / lo) / (GRID - 1);
  for (int i = 0; i < GRID; ++i) {
    v[i] = i == GRID - 1 ? hi : lo * exp(ratio * i);
    f[i] = objective(c, mode, ci, mass, v[i], &st);
    s[i] = st;
    if (st == ACP_ERR_THRUST) any_thrust = 1;
    else if (st != ACP_OK) last_st = st;
    if (!isnan(f[i]) && (best < 0 || f[i] < f[best])) best = i;
  }
  if (best < 0) return any_thrust ? ACP_ERR_THRUST : last_st;
  /* The bracket around the best grid point, cut to the feasible part. */
  double a = v[best > 0 ? best - 1 : 0], b = v[best < GRID - 1 ? best + 1 : GRID - 1];
  int a_limit = best <= 1 ? ACP_CRUISE_LIMIT_LOW_SPEED : ACP_CRUISE_LIMIT_NONE;
  int b_limit = best >= GRID - 2 ? hi_limit : ACP_CRUISE_LIMIT_NONE;
  if (best > 0 && isnan(f[best - 1])) {
    a = boundary(c, mode, ci, mass, v[best], a);
    a_limit = s[best - 1] == ACP_ERR_THRUST ? ACP_CRUISE_LIMIT_THRUST : ACP_CRUISE_LIMIT_LOW_SPEED;
  }
  if (best < GRID - 1 && isnan(f[best + 1])) {
    b = boundary(c, mode, ci, mass, v[best], b);
    b_limit = s[best + 1] == ACP_ERR_THRUST ? ACP_CRUISE_LIMIT_THRUST : hi_limit;
  }
  double x = a < b ? brent_min(c, mode, ci, mass, a, b) : a;
  double fx = obj_inf(c, mode, ci, mass, x);
  /* A minimum at an end of the interval is that end. */
  if (a_limit != ACP_CRUISE_LIMIT_NONE) {
    const double fa = obj_inf(c, mode, ci, mass, a);
    if (fa <= fx) {
      x = a;
      fx = fa;
      *limit = a_limit;
    }
  }
  if (b_limit != ACP_CRUISE_LIMIT_NONE && obj_inf(c, mode, ci, mass, b) <= fx) {
    x = b;
    *limit = b_limit;
  }
  *v_best = x;
  return ACP_OK;
}

/* Root of h(v) = merit(v) - target between a (h < 0) and b (h >= 0): regula
   falsi with the Illinois modification (Dowell and Jarratt, BIT 11, 1971),
   to a bracket of ROOT_TOL v. */
static double crossing(const cruise_cond *c, double mass, double target, double a, double b) {
  int st;
  double ha = objective(c, ACP_CRUISE_MAX_RANGE, 0.0, mass, a, &st) - target;
  double hb = objective(c, ACP_CRUISE_MAX_RANGE, 0.0, mass, b, &st) - target;
  int side = 0;
  for (int it = 0; it < 200 && b - a > ROOT_TOL * b; ++it) {
    double x = (a * hb - b * ha) / (hb - ha);
    if (!(x > a && x < b)) x = 0.5 * (a + b);
    const double hx = objective(c, ACP_CRUISE_MAX_RANGE, 0.0, mass, x, &st) - target;
    if (hx < 0.0) {
      a = x;
      ha = hx;
      if (side == -1) hb *= 0.5;
      side = -1;
    } else {
      b = x;
      hb = hx;
      if (side == 1) ha *= 0.5;
      side = 1;
    }
    if (hx == 0.0) return x;
  }
  return ha * ha < hb * hb ? a : b;
}

/* Long-range cruise: above the maximum-range speed, where SAR = 0.99 of its
   maximum. hint[0] the previous long-range speed, hint[1] the previous
   maximum-range speed (0: none); both updated. */
static int long_range(const cruise_cond *c, double mass, double *hint, double *v_out,
                      int *limit) {
  double v_mr, lo, hi;
  int hi_limit, st;
  int lim = ACP_CRUISE_LIMIT_NONE;
  st = minimise(c, ACP_CRUISE_MAX_RANGE, 0.0, mass, hint ? hint[1] : 0.0, &v_mr, &lim);
  if (st == ACP_OK) st = interval(c, mass, &lo, &hi, &hi_limit);
  if (st != ACP_OK) return st;
  if (hint) hint[1] = v_mr;
  *limit = ACP_CRUISE_LIMIT_NONE;
  if (lim != ACP_CRUISE_LIMIT_NONE && lim != ACP_CRUISE_LIMIT_LOW_SPEED) {
    *v_out = v_mr; /* the maximum-range speed is already held at the top */
    *limit = lim;
    return ACP_OK;
  }
  /* merit = fuel per distance: long-range cruise where it rises to merit_min/0.99 */
  const double target = objective(c, ACP_CRUISE_MAX_RANGE, 0.0, mass, v_mr, &st) /
                        ACP_LONG_RANGE_FRACTION;
  double a = v_mr, b;
  if (hint && hint[0] > v_mr) { /* warm start: a bracket around the previous speed */
    const double a1 = fmax(v_mr, hint[0] * (1.0 - HINT_SPAN)), b1 = hint[0] * (1.0 + HINT_SPAN);
    if (b1 < hi && objective(c, ACP_CRUISE_MAX_RANGE, 0.0, mass, a1, &st) < target &&
        objective(c, ACP_CRUISE_MAX_RANGE, 0.0, mass, b1, &st) >= target) {
      *v_out = hint[0] = crossing(c, mass, target, a1, b1);
      return ACP_OK;
    }
  }
  /* Walk up from v_mr in 2 % steps to bracket the crossing, the thrust limit or the top. */
  for (;;) {
    b = fmin(a * 1.02, hi);
    const double fb = objective(c, ACP_CRUISE_MAX_RANGE, 0.0, mass, b, &st);
    if (isnan(fb)) { /* the thrust limit comes first */
      const double top = boundary(c, ACP_CRUISE_MAX_RANGE, 0.0, mass, a, b);
      if (objective(c, ACP_CRUISE_MAX_RANGE, 0.0, mass, top, &st) <= target) {
        *v_out = top;
        *limit = ACP_CRUISE_LIMIT_THRUST;
        return ACP_OK;
      }
      b = top;
      break;
    }
    if (fb >= target) break;
    if (b >= hi) {
      *v_out = hi;
      *limit = hi_limit;
      return ACP_OK;
    }
    a = b;
  }
  *v_out = crossing(c, mass, target, a, b);
  if (hint) hint[0] = *v_out;
  return ACP_OK;
}

static int fixed_mach(const cruise_cond *c, double *v_out, int *limit) {
  const acp_aircraft *ac = c->ac;
  double mach = ac_value(ac, AK_CRUISE_MACH);
  *limit = ACP_CRUISE_LIMIT_NONE;
  const double mmo = ac_value(ac, AK_MMO), vmo = ac_value(ac, AK_VMO);
  if (!isnan(mmo) && mach > mmo) {
    mach = mmo;
    *limit = ACP_CRUISE_LIMIT_MMO;
  }
  double v = mach * c->at.sound_speed;
  if (!isnan(vmo)) {
    const double v_vmo = acp_cas_to_tas(vmo, c->hp, c->dtemp);
    if (v > v_vmo) {
      v = v_vmo;
      *limit = ACP_CRUISE_LIMIT_VMO;
    }
  }
  *v_out = v;
  return ACP_OK;
}

int cruise_speed_at(const cruise_cond *c, int mode, double cost_index, double mass,
                    double *hint, acp_cruise_point *out) {
  double v = ACP_NAN;
  int limit = ACP_CRUISE_LIMIT_NONE, st;
  switch (mode) {
  case ACP_CRUISE_FIXED_MACH: st = fixed_mach(c, &v, &limit); break;
  case ACP_CRUISE_LONG_RANGE: st = long_range(c, mass, hint, &v, &limit); break;
  default:
    st = minimise(c, mode, cost_index, mass, hint ? hint[0] : 0.0, &v, &limit);
    if (hint && st == ACP_OK) hint[0] = v;
    break;
  }
  if (st != ACP_OK) {
    cruise_point_nan(out);
    return st;
  }
  return level(c, mass, v, limit, out);
}

int acp_cruise_speed(const acp_aircraft *ac, int mode, double cost_index, double mass, double hp,
                     double dtemp, double wind, acp_cruise_point *out) {
  if (!out) return ACP_ERR_INVALID;
  cruise_point_nan(out);
  int st = cruise_check(ac, mode, cost_index, mass, wind);
  if (st != ACP_OK) return st;
  cruise_cond c;
  st = cruise_cond_at(&c, ac, hp, dtemp, wind);
  if (st == ACP_OK) st = cruise_envelope(&c, mass, out);
  return st == ACP_OK ? cruise_speed_at(&c, mode, cost_index, mass, NULL, out) : st;
}

size_t acp_cruise_speed_n(const acp_aircraft *ac, int mode, double cost_index, size_t n,
                          const double *mass, const double *hp, const double *dtemp,
                          const double *wind, double *tas, double *mach, double *sar) {
  if (!ac || !mass || !hp) {
    double *const outs[] = {tas, mach, sar};
    return acp_all_invalid(n, outs, 3);
  }
  size_t bad = 0;
  for (size_t i = 0; i < n; ++i) {
    acp_cruise_point p;
    if (acp_cruise_speed(ac, mode, cost_index, mass[i], hp[i], acp_opt(dtemp, i, 0.0),
                         acp_opt(wind, i, 0.0), &p) != ACP_OK) {
      cruise_point_nan(&p);
      ++bad;
    }
    acp_put(tas ? &tas[i] : NULL, p.tas);
    acp_put(mach ? &mach[i] : NULL, p.mach);
    acp_put(sar ? &sar[i] : NULL, p.sar);
  }
  return bad;
}

int acp_specific_air_range(const acp_aircraft *ac, double mass, double hp, double dtemp, double tas,
                           double wind, double *sar) {
  if (!sar) return ACP_ERR_INVALID;
  *sar = ACP_NAN;
  if (!isfinite(tas)) return ACP_ERR_INVALID;
  int st = cruise_check(ac, ACP_CRUISE_MAX_RANGE, 0.0, mass, wind);
  cruise_cond c;
  if (st == ACP_OK) st = cruise_cond_at(&c, ac, hp, dtemp, wind);
  acp_cruise_point p;
  if (st == ACP_OK) st = cruise_envelope(&c, mass, &p);
  if (st != ACP_OK) return st;
  if (!(tas > 0.0) || tas > ACP_POLAR_MACH_MAX * c.at.sound_speed) return ACP_ERR_RANGE;
  st = level(&c, mass, tas, ACP_CRUISE_LIMIT_NONE, &p);
  *sar = p.sar;
  return st;
}

size_t acp_specific_air_range_n(const acp_aircraft *ac, size_t n, const double *mass,
                                const double *hp, const double *dtemp, const double *tas,
                                const double *wind, double *sar) {
  if (!ac || !mass || !hp || !tas) return acp_all_invalid(n, &sar, 1);
  size_t bad = 0;
  for (size_t i = 0; i < n; ++i) {
    double s = ACP_NAN;
    if (acp_specific_air_range(ac, mass[i], hp[i], acp_opt(dtemp, i, 0.0), tas[i],
                               acp_opt(wind, i, 0.0), &s) != ACP_OK)
      ++bad;
    acp_put(sar ? &sar[i] : NULL, s);
  }
  return bad;
}

/* ---- Breguet ------------------------------------------------------------ */

static int masses_ok(double m0, double m1) {
  return isfinite(m0) && isfinite(m1) && m1 > 0.0 && m0 >= m1;
}

/* ln(m0/m1); when the quotient overflows (a denormal m1) the difference of
   the logarithms, which is finite */
static double log_ratio(double m0, double m1) {
  const double q = m0 / m1;
  return isfinite(q) ? log(q) : log(m0) - log(m1);
}

double acp_breguet_range(double tas, double tsfc, double lift_to_drag, double mass_start,
                         double mass_end) {
  if (!(isfinite(tas) && tas > 0.0) || !(isfinite(tsfc) && tsfc > 0.0) ||
      !(isfinite(lift_to_drag) && lift_to_drag > 0.0) || !masses_ok(mass_start, mass_end))
    return ACP_NAN;
  const double r = tas / (ACP_G0 * tsfc) * lift_to_drag * log_ratio(mass_start, mass_end);
  return isfinite(r) ? r : ACP_NAN; /* overflow (a denormal TSFC) is no result */
}

double acp_breguet_endurance(double tsfc, double lift_to_drag, double mass_start,
                             double mass_end) {
  if (!(isfinite(tsfc) && tsfc > 0.0) || !(isfinite(lift_to_drag) && lift_to_drag > 0.0) ||
      !masses_ok(mass_start, mass_end))
    return ACP_NAN;
  const double e = lift_to_drag / (ACP_G0 * tsfc) * log_ratio(mass_start, mass_end);
  return isfinite(e) ? e : ACP_NAN;
}

double acp_breguet_range_propeller(double propeller_efficiency, double psfc, double lift_to_drag,
                                   double mass_start, double mass_end) {
  if (!(isfinite(propeller_efficiency) && propeller_efficiency > 0.0 &&
        propeller_efficiency <= 1.0) ||
      !(isfinite(psfc) && psfc > 0.0) || !(isfinite(lift_to_drag) && lift_to_drag > 0.0) ||
      !masses_ok(mass_start, mass_end))
    return ACP_NAN;
  const double r = propeller_efficiency / (ACP_G0 * psfc) * lift_to_drag * log_ratio(mass_start, mass_end);
  return isfinite(r) ? r : ACP_NAN;
}
