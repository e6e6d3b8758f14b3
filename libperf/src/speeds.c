/* Characteristic speeds, gliding and speed stability, found numerically on the
   full drag model (method: acperf/speeds.h and docs/methods/drag.md). */
#include "acperf/speeds.h"

#include "acperf/airspeed.h"
#include "acperf/atmosphere.h"
#include "acperf/polar.h"
#include "acperf/status.h"
#include "aircraft_internal.h"
#include "internal.h"

#define GRID 121          /* tabulated speeds of the coarse search */
#define CL_SEARCH 5.0     /* the search starts at the speed of this lift coefficient */
#define SLOPE_STEP 1e-5   /* relative step of the central-difference slope */
#define BISECT_TOL 1e-13  /* relative width at which the bisection stops */
#define GLIDE_ITER 60     /* fixed-point steps of the glide angle, at most */

/* What a search minimises. */
enum objective { OBJ_DRAG, OBJ_POWER, OBJ_RANGE, OBJ_GLIDE_ANGLE, OBJ_SINK };

typedef struct {
  const acp_aircraft *ac;
  acp_atmos atm;
  double weight; /* N */
  double vlo, vhi;
} search;

/* Steady glide angle at TAS v: W sin g = D(lift = W cos g). NaN when the
   drag exceeds the weight or the iteration does not settle. */
static double glide_angle(const search *s, double v) {
  double g = 0.0;
  for (int i = 0; i < GLIDE_ITER; ++i) {
    const double d = polar_drag(s->ac, &s->atm, s->weight * cos(g), v);
    if (!(d / s->weight < 1.0)) return ACP_NAN;
    const double next = asin(d / s->weight);
    if (fabs(next - g) <= 1e-15) return next;
    g = next;
  }
  return ACP_NAN;
}

/* The drag, power and range objectives from the drag at TAS v: D, D v, D / v. */
static double objective_from_drag(enum objective obj, double drag, double v) {
  return obj == OBJ_POWER ? drag * v : obj == OBJ_RANGE ? drag / v : drag;
}

static double objective_at(const search *s, enum objective obj, double v) {
  switch (obj) {
  case OBJ_DRAG:
  case OBJ_POWER:
  case OBJ_RANGE: return objective_from_drag(obj, polar_drag(s->ac, &s->atm, s->weight, v), v);
  case OBJ_GLIDE_ANGLE: return glide_angle(s, v);
  case OBJ_SINK: return v * sin(glide_angle(s, v));
  }
  return ACP_NAN;
}

static double slope_at(const search *s, enum objective obj, double v) {
  const double h = SLOPE_STEP * v;
  return (objective_at(s, obj, v + h) - objective_at(s, obj, v - h)) / (2.0 * h);
}

/* The tabulated speeds of the coarse search: GRID speeds in geometric steps
   from s->vlo to s->vhi (ratio: the step). */
static double grid_ratio(const search *s) { return pow(s->vhi / s->vlo, 1.0 / (GRID - 1)); }
static double grid_speed(const search *s, double ratio, int i) {
  return i == GRID - 1 ? s->vhi : s->vlo * pow(ratio, i);
}

/* Drag at each tabulated speed, shared by the drag, power and range searches
   (objective_from_drag makes each objective from it, as objective_at does). */
static void grid_drag(const search *s, double *drag) {
  const double ratio = grid_ratio(s);
  for (int i = 0; i < GRID; ++i)
    drag[i] = polar_drag(s->ac, &s->atm, s->weight, grid_speed(s, ratio, i));
}

/* The speed minimising obj between s->vlo and s->vhi; ACP_ERR_RANGE when the
   least tabulated value is at an end or nothing could be evaluated. drag: the
   grid_drag() of s for the drag, power and range objectives, or NULL. */
static int minimise(const search *s, enum objective obj, const double *drag, double *vbest) {
  *vbest = ACP_NAN;
  const double ratio = grid_ratio(s);
  double best = INFINITY;
  int ibest = -1;
  for (int i = 0; i < GRID; ++i) {
    const double v = grid_speed(s, ratio, i);
    const double f = drag ? objective_from_drag(obj, drag[i], v) : objective_at(s, obj, v);
    if (f < best) {
      best = f;
      ibest = i;
    }
  }
  if (ibest <= 0 || ibest >= GRID - 1) return ACP_ERR_RANGE;
  double lo = s->vlo * pow(ratio, ibest - 1), hi = s->vlo * pow(ratio, ibest + 1);
  for (int k = 0; k < 200 && hi - lo > BISECT_TOL * hi; ++k) {
    const double mid = 0.5 * (lo + hi);
    const double d = slope_at(s, obj, mid);
    if (isnan(d)) return ACP_ERR_RANGE;
    if (d > 0.0)
      hi = mid;
    else
      lo = mid;
  }
  *vbest = 0.5 * (lo + hi);
  return ACP_OK;
}

/* Checks and the search interval at a mass and altitude. */
static int setup(search *s, const acp_aircraft *ac, double mass, double hp, double dtemp) {
  const int st = polar_condition(ac, mass, hp, dtemp, 1.0, 1.0, &s->atm);
  if (st != ACP_OK) return st;
  s->ac = ac;
  s->weight = mass * ACP_G0;
  s->vlo = sqrt(2.0 * s->weight / (s->atm.density * ac->v[AK_WING_AREA] * CL_SEARCH));
  s->vhi = ACP_POLAR_MACH_MAX * s->atm.sound_speed * (1.0 - 1e-12);
  return s->vlo < 0.5 * s->vhi ? ACP_OK : ACP_ERR_RANGE;
}

static void speeds_nan(acp_speed_set *out) {
  out->vmd = out->vmp = out->vmr = out->vs1g = out->ld_max = ACP_NAN;
}

static int first_error(int a, int b) { return a != ACP_OK ? a : b; }

/* ---- the drag-curve search of acp_speeds (acperf/speeds.h) ------------------

   In level flight D(V) = A(V) V^2 + b/V^2 + c exactly, with the induced drag's
   b = 2 k W^2/(rho S) and c = -2 k W CL0 known and A(V) = q S (CD0 + CDw + k
   CL0^2)/V^2 (so A is constant for a parabolic polar). Each speed minimises
   D V^n (n = 0 VMD, 1 VMP, -1 VMR): V D' + n D = 0. The drag evaluations give
   A at their speeds; ln A, a slowly varying function of u = ln V, is
   interpolated by the quadratic through the three evaluations nearest the
   speed sought, and the stationary point of the interpolated D V^n is solved
   by Newton's method (arithmetic only); the drag is then evaluated there. For
   constant A the first step is the parabolic polar's closed form. */

#define FAST_STEPS ACP_SPEEDS_FAST_STEPS
#define FAST_TOL 1e-7  /* a speed is found when the next step is below this, relative */
#define FAST_CL 0.6    /* the first evaluation: at this lift coefficient */
#define NEWTON_MAX 30  /* Newton steps on the interpolated curve, at most */
#define SAMPLES_MAX (1 + 3 * FAST_STEPS)

typedef struct {
  double u, r, drag; /* ln V, ln A(V), D(V) */
} sample;

typedef struct {
  const search *s;
  double b, c;
  double ulo, uhi; /* ln V inside which the tabulated search would find the same minimum */
  sample pt[SAMPLES_MAX];
  int n;
} curve;

/* Evaluate the drag at u = ln V and keep it; 0 when it cannot be had. */
static int curve_add(curve *cv, double u) {
  if (cv->n >= SAMPLES_MAX) return 0;
  const double v = exp(u), x = v * v;
  const double d = polar_drag(cv->s->ac, &cv->s->atm, cv->s->weight, v);
  const double a = (d - cv->b / x - cv->c) / x;
  if (!(a > 0.0) || !isfinite(a)) return 0;
  cv->pt[cv->n++] = (sample){u, log(a), d};
  return 1;
}

/* The quadratic through the (up to) three evaluations nearest u0: ln A(u) ~
   r0 + f1 (u - u0') + f2 (u - u0')(u - u1'). */
typedef struct {
  double u0, u1, r0, f1, f2;
} quad;

static quad curve_quad(const curve *cv, double u0) {
  int idx[3] = {-1, -1, -1};
  for (int k = 0; k < 3 && (k == 0 || idx[k - 1] >= 0); ++k)
    for (int i = 0; i < cv->n; ++i) {
      int distinct = 1;
      for (int j = 0; j < k; ++j)
        if (idx[j] == i || fabs(cv->pt[i].u - cv->pt[idx[j]].u) < 1e-9) distinct = 0;
      if (distinct && (idx[k] < 0 || fabs(cv->pt[i].u - u0) < fabs(cv->pt[idx[k]].u - u0)))
        idx[k] = i;
    }
  const sample *p0 = &cv->pt[idx[0]];
  quad q = {p0->u, p0->u, p0->r, 0.0, 0.0};
  if (idx[1] < 0) return q;
  const sample *p1 = &cv->pt[idx[1]];
  q.u1 = p1->u;
  q.f1 = (p1->r - p0->r) / (p1->u - p0->u);
  if (idx[2] < 0) return q;
  const sample *p2 = &cv->pt[idx[2]];
  const double f12 = (p2->r - p1->r) / (p2->u - p1->u);
  q.f2 = (f12 - q.f1) / (p2->u - p0->u);
  return q;
}

/* The stationary point of the interpolated D V^n near u: Newton's method on
   h(u) = (2 + n + p') A V^2 - (2 - n) b/V^2 + n c, the derivative of the
   interpolated curve times V (times V^-n). NaN when it does not settle. */
static double curve_solve(const curve *cv, double n, double u) {
  const quad q = curve_quad(cv, u);
  for (int it = 0; it < NEWTON_MAX; ++it) {
    const double p = q.r0 + (u - q.u0) * (q.f1 + q.f2 * (u - q.u1));
    const double dp = q.f1 + q.f2 * (2.0 * u - q.u0 - q.u1), ddp = 2.0 * q.f2;
    const double av2 = exp(p + 2.0 * u), bv2 = (2.0 - n) * cv->b * exp(-2.0 * u);
    const double h = (2.0 + n + dp) * av2 - bv2 + n * cv->c;
    const double dh = (ddp + (2.0 + n + dp) * (2.0 + dp)) * av2 + 2.0 * bv2;
    if (!(dh > 0.0)) return ACP_NAN;
    const double step = fmax(-0.5, fmin(0.5, h / dh));
    u -= step;
    if (fabs(step) < 1e-13) return u;
  }
  return ACP_NAN;
}

/* One speed (objective D V^n) by the interpolated search from u; ACP_OK with
   *v (and the drag there, *drag, when the speed is an evaluated one), or
   ACP_ERR_NO_CONVERGENCE for the tabulated search to decide. */
static int curve_speed(curve *cv, double n, double u, double *v, double *drag) {
  for (int k = 0; k < FAST_STEPS; ++k) {
    const double next = curve_solve(cv, n, u);
    if (!(next > cv->ulo && next < cv->uhi)) break;
    if (k > 0 && fabs(next - u) < FAST_TOL) {
      /* VMD the evaluated speed, for L/D max = W/D(VMD) exactly at it */
      *v = exp(n == 0.0 ? u : next);
      *drag = n == 0.0 ? cv->pt[cv->n - 1].drag : ACP_NAN;
      return ACP_OK;
    }
    if (!curve_add(cv, next)) break;
    u = next;
  }
  return ACP_ERR_NO_CONVERGENCE;
}

/* The three speeds of acp_speeds (and VMD alone when vmp and vmr are NULL), each
   by the interpolated search or, when that fails, by the tabulated one; the
   drag at VMD in *d_vmd. */
static int find_speeds(const search *s, double *vmd, double *d_vmd, double *vmp, double *vmr) {
  const acp_aircraft *ac = s->ac;
  const double k = ac->induced_factor, cl0 = ac_value(ac, AK_CL_MIN_DRAG);
  const double ratio = grid_ratio(s);
  curve cv;
  cv.s = s;
  cv.b = 2.0 * k * s->weight * s->weight / (s->atm.density * ac->v[AK_WING_AREA]);
  cv.c = -2.0 * k * s->weight * cl0;
  cv.ulo = log(s->vlo * ratio);
  cv.uhi = log(s->vhi / ratio);
  cv.n = 0;
  const double u0 = 0.5 * log(2.0 * s->weight / (s->atm.density * ac->v[AK_WING_AREA] * FAST_CL));
  const int ok0 = curve_add(&cv, fmax(cv.ulo, fmin(cv.uhi, u0)));
  double *const out[3] = {vmd, vmp, vmr};
  static const double power[3] = {0.0, 1.0, -1.0};
  static const enum objective obj[3] = {OBJ_DRAG, OBJ_POWER, OBJ_RANGE};
  double drag[GRID];
  int tabulated = 0, st = ACP_OK;
  *d_vmd = ACP_NAN;
  for (int i = 0; i < 3; ++i) {
    if (!out[i]) continue;
    double d = ACP_NAN;
    /* start from the speed found before (VMD for VMP and VMR) */
    const double start = !ok0 ? 0.0 : i == 0 || isnan(*vmd) ? cv.pt[0].u : log(*vmd);
    if (!ok0 || curve_speed(&cv, power[i], start, out[i], &d) != ACP_OK) {
      if (!tabulated) grid_drag(s, drag);
      tabulated = 1;
      st = first_error(st, minimise(s, obj[i], drag, out[i]));
    }
    if (i == 0) *d_vmd = isnan(d) && !isnan(*vmd) ? polar_drag(ac, &s->atm, s->weight, *vmd) : d;
  }
  return st;
}

int acp_speeds(const acp_aircraft *ac, double mass, double hp, double dtemp,
               acp_speed_set *out) {
  if (!out) return ACP_ERR_INVALID;
  speeds_nan(out);
  search s;
  int st = setup(&s, ac, mass, hp, dtemp);
  if (st != ACP_OK) return st;
  double d_vmd;
  st = find_speeds(&s, &out->vmd, &d_vmd, &out->vmp, &out->vmr);
  if (!isnan(out->vmd)) out->ld_max = s.weight / d_vmd;
  const double cl_max = ac->v[AK_CL_MAX];
  if (!isnan(cl_max))
    out->vs1g = sqrt(2.0 * s.weight / (s.atm.density * ac->v[AK_WING_AREA] * cl_max));
  return st;
}

/* Convert the four speeds of a set from TAS: kind 1 CAS, 2 Mach. */
static void convert(acp_speed_set *v, double hp, double dtemp, int kind) {
  double *f[4] = {&v->vmd, &v->vmp, &v->vmr, &v->vs1g};
  for (int i = 0; i < 4; ++i)
    if (!isnan(*f[i]))
      *f[i] = kind == 1 ? acp_tas_to_cas(*f[i], hp, dtemp) : acp_tas_to_mach(*f[i], hp, dtemp);
}

int acp_speeds_cas(const acp_aircraft *ac, double mass, double hp, double dtemp,
                   acp_speed_set *out) {
  const int st = acp_speeds(ac, mass, hp, dtemp, out);
  if (out) convert(out, hp, dtemp, 1);
  return st;
}

int acp_speeds_mach(const acp_aircraft *ac, double mass, double hp, double dtemp,
                    acp_speed_set *out) {
  const int st = acp_speeds(ac, mass, hp, dtemp, out);
  if (out) convert(out, hp, dtemp, 2);
  return st;
}

static size_t speeds_array(int kind, const acp_aircraft *ac, size_t n, const double *mass,
                           const double *hp, const double *dtemp, double *vmd, double *vmp,
                           double *vmr, double *vs1g, double *ld_max) {
  if (!ac || !mass || !hp) {
    double *const outs[] = {vmd, vmp, vmr, vs1g, ld_max};
    return acp_all_invalid(n, outs, 5);
  }
  size_t bad = 0;
  for (size_t i = 0; i < n; ++i) {
    acp_speed_set v;
    const double dt = acp_opt(dtemp, i, 0.0);
    const int st = acp_speeds(ac, mass[i], hp[i], dt, &v);
    if (kind) convert(&v, hp[i], dt, kind);
    if (st != ACP_OK) ++bad;
    acp_put(vmd ? vmd + i : NULL, v.vmd);
    acp_put(vmp ? vmp + i : NULL, v.vmp);
    acp_put(vmr ? vmr + i : NULL, v.vmr);
    acp_put(vs1g ? vs1g + i : NULL, v.vs1g);
    acp_put(ld_max ? ld_max + i : NULL, v.ld_max);
  }
  return bad;
}

size_t acp_speeds_n(const acp_aircraft *ac, size_t n, const double *mass, const double *hp,
                    const double *dtemp, double *vmd, double *vmp, double *vmr, double *vs1g,
                    double *ld_max) {
  return speeds_array(0, ac, n, mass, hp, dtemp, vmd, vmp, vmr, vs1g, ld_max);
}

size_t acp_speeds_cas_n(const acp_aircraft *ac, size_t n, const double *mass, const double *hp,
                        const double *dtemp, double *vmd, double *vmp, double *vmr,
                        double *vs1g, double *ld_max) {
  return speeds_array(1, ac, n, mass, hp, dtemp, vmd, vmp, vmr, vs1g, ld_max);
}

size_t acp_speeds_mach_n(const acp_aircraft *ac, size_t n, const double *mass, const double *hp,
                         const double *dtemp, double *vmd, double *vmp, double *vmr,
                         double *vs1g, double *ld_max) {
  return speeds_array(2, ac, n, mass, hp, dtemp, vmd, vmp, vmr, vs1g, ld_max);
}

/* ---- gliding ---------------------------------------------------------------- */

static void glide_nan(acp_glide_set *g) {
  g->best_glide_ratio = g->best_glide_speed = g->best_glide_sink_rate = ACP_NAN;
  g->min_sink_speed = g->min_sink_rate = ACP_NAN;
}

int acp_glide(const acp_aircraft *ac, double mass, double hp, double dtemp, acp_glide_set *out) {
  if (!out) return ACP_ERR_INVALID;
  glide_nan(out);
  search s;
  int st = setup(&s, ac, mass, hp, dtemp);
  if (st != ACP_OK) return st;
  double v;
  int st1 = minimise(&s, OBJ_GLIDE_ANGLE, NULL, &v);
  if (st1 == ACP_OK) {
    const double g = glide_angle(&s, v);
    if (isnan(g)) {
      st1 = ACP_ERR_NO_CONVERGENCE;
    } else {
      out->best_glide_speed = v;
      out->best_glide_ratio = 1.0 / tan(g);
      out->best_glide_sink_rate = v * sin(g);
    }
  }
  int st2 = minimise(&s, OBJ_SINK, NULL, &v);
  if (st2 == ACP_OK) {
    const double g = glide_angle(&s, v);
    if (isnan(g)) {
      st2 = ACP_ERR_NO_CONVERGENCE;
    } else {
      out->min_sink_speed = v;
      out->min_sink_rate = v * sin(g);
    }
  }
  return first_error(st1, st2);
}

size_t acp_glide_n(const acp_aircraft *ac, size_t n, const double *mass, const double *hp,
                   const double *dtemp, double *best_glide_ratio, double *best_glide_speed,
                   double *best_glide_sink_rate, double *min_sink_speed, double *min_sink_rate) {
  if (!ac || !mass || !hp) {
    double *const outs[] = {best_glide_ratio, best_glide_speed, best_glide_sink_rate,
                            min_sink_speed, min_sink_rate};
    return acp_all_invalid(n, outs, 5);
  }
  size_t bad = 0;
  for (size_t i = 0; i < n; ++i) {
    acp_glide_set g;
    if (acp_glide(ac, mass[i], hp[i], acp_opt(dtemp, i, 0.0), &g) != ACP_OK) ++bad;
    acp_put(best_glide_ratio ? best_glide_ratio + i : NULL, g.best_glide_ratio);
    acp_put(best_glide_speed ? best_glide_speed + i : NULL, g.best_glide_speed);
    acp_put(best_glide_sink_rate ? best_glide_sink_rate + i : NULL, g.best_glide_sink_rate);
    acp_put(min_sink_speed ? min_sink_speed + i : NULL, g.min_sink_speed);
    acp_put(min_sink_rate ? min_sink_rate + i : NULL, g.min_sink_rate);
  }
  return bad;
}

/* ---- speed stability ------------------------------------------------------- */

int acp_speed_stability(const acp_aircraft *ac, double mass, double hp, double dtemp, double tas,
                        acp_stability *out) {
  if (!out) return ACP_ERR_INVALID;
  out->slope = out->vmd = out->stable = ACP_NAN;
  search s;
  int st = setup(&s, ac, mass, hp, dtemp);
  if (st != ACP_OK) return st;
  if (!isfinite(tas)) return ACP_ERR_INVALID;
  if (!(tas > 0.0)) return ACP_ERR_RANGE;
  const double slope = slope_at(&s, OBJ_DRAG, tas);
  if (!isfinite(slope)) return ACP_ERR_RANGE; /* also a difference that overflows */
  out->slope = slope;
  out->stable = slope > 0.0 ? 1.0 : slope < 0.0 ? -1.0 : 0.0;
  double d_vmd;
  return find_speeds(&s, &out->vmd, &d_vmd, NULL, NULL);
}

size_t acp_speed_stability_n(const acp_aircraft *ac, size_t n, const double *mass,
                             const double *hp, const double *dtemp, const double *tas,
                             double *slope, double *vmd, double *stable) {
  if (!ac || !mass || !hp || !tas) {
    double *const outs[] = {slope, vmd, stable};
    return acp_all_invalid(n, outs, 3);
  }
  size_t bad = 0;
  for (size_t i = 0; i < n; ++i) {
    acp_stability r;
    if (acp_speed_stability(ac, mass[i], hp[i], acp_opt(dtemp, i, 0.0), tas[i], &r) != ACP_OK)
      ++bad;
    acp_put(slope ? slope + i : NULL, r.slope);
    acp_put(vmd ? vmd + i : NULL, r.vmd);
    acp_put(stable ? stable + i : NULL, r.stable);
  }
  return bad;
}

size_t acp_speed_stability_boundary_n(const acp_aircraft *ac, size_t n, const double *mass,
                                      const double *hp, const double *dtemp, double *vmd_tas,
                                      double *vmd_cas, double *vmd_mach) {
  if (!ac || !mass || !hp) {
    double *const outs[] = {vmd_tas, vmd_cas, vmd_mach};
    return acp_all_invalid(n, outs, 3);
  }
  size_t bad = 0;
  for (size_t i = 0; i < n; ++i) {
    double v = ACP_NAN, cas = ACP_NAN, mach = ACP_NAN;
    search s;
    const double dt = acp_opt(dtemp, i, 0.0);
    int st = setup(&s, ac, mass[i], hp[i], dt);
    double d_vmd;
    if (st == ACP_OK) st = find_speeds(&s, &v, &d_vmd, NULL, NULL);
    if (st == ACP_OK) {
      cas = acp_tas_to_cas(v, hp[i], dt);
      mach = acp_tas_to_mach(v, hp[i], dt);
    }
    if (st != ACP_OK) ++bad;
    acp_put(vmd_tas ? vmd_tas + i : NULL, v);
    acp_put(vmd_cas ? vmd_cas + i : NULL, cas);
    acp_put(vmd_mach ? vmd_mach + i : NULL, mach);
  }
  return bad;
}
