/* Cruise integration at constant altitude with optional step climbs. */
#include "acperf/climb.h"
#include "acperf/cruise.h"
#include "acperf/status.h"
#include "aircraft_internal.h"
#include "cruise_internal.h"
#include "internal.h"
#include "performance_internal.h"

#define DISTANCE_MAX 2.0e7  /* m: half the Earth's circumference */
#define TIME_MAX 2.0e5      /* s: about 55 h */
#define STEP_CLIMB_MIN 100.0
#define STEP_CLIMB_MAX 3000.0
#define ALTITUDE_TOP 25000.0 /* highest step-climb level without max_altitude, m */

typedef struct {
  const acp_aircraft *ac;
  int mode, end;
  double ci, dtemp, wind, end_value, step, step_climb;
} cruise_args;

typedef struct {
  cruise_cond c;          /* at the current level */
  acp_cruise_point p;     /* the current point (time, distance, mass, hp) */
  double progress;        /* distance, fuel or time flown so far */
  double hint[2];         /* warm start of the speed searches (cruise_speed_at()) */
  acp_cruise_result *out;
  acp_cruise_point *trace;
  size_t capacity, count;
  double mass_floor;      /* perf_mass_floor(): no point below it */
  perf_limit lim;         /* an aircraft limit found exceeded (NaN: none) */
  double buffet_min;      /* least buffet margin of the points flown */
} cruise_run;

static void result_nan(acp_cruise_result *o) {
  o->time = o->distance = o->fuel = o->mass_end = o->hp_end = o->sar_mean = ACP_NAN;
  o->tas_start = o->tas_end = o->mach_start = o->mach_end = o->step_climbs = ACP_NAN;
  o->step_climb_time = o->step_climb_distance = o->step_climb_fuel = ACP_NAN;
  o->limit = o->limit_excess = o->buffet_margin_min = ACP_NAN;
}

static int exceeded(cruise_run *r, double code, double excess) {
  r->lim.code = code;
  r->lim.excess = excess;
  return ACP_ERR_RANGE;
}

static void record(cruise_run *r) {
  if (r->trace && r->count < r->capacity) r->trace[r->count] = r->p;
  ++r->count;
}

/* The mode's point at mass m on the current level, keeping time and distance. */
static int point_at(const cruise_args *a, cruise_run *r, double m, double t, double x,
                    acp_cruise_point *p) {
  if (!(m >= r->mass_floor)) return exceeded(r, ACP_LIMIT_MASS_OPERATING_EMPTY, r->mass_floor - m);
  const int st = cruise_speed_at(&r->c, a->mode, a->ci, m, r->hint, p);
  if (st != ACP_OK) {
    if (!isnan(p->limit_exceeded)) exceeded(r, p->limit_exceeded, p->limit_excess);
    return st;
  }
  p->time = t;
  p->distance = x;
  if (!(p->buffet_margin >= r->buffet_min)) r->buffet_min = p->buffet_margin;
  return ACP_OK;
}

/* One step of size h of the end quantity. */
static int advance(const cruise_args *a, cruise_run *r, double h) {
  const acp_cruise_point *p0 = &r->p;
  acp_cruise_point p1;
  double m1, t1, x1;
  int st;
  if (a->end == ACP_CRUISE_END_FUEL) {
    /* mass is the variable: trapezoidal rule on dx/dm and dt/dm */
    m1 = p0->mass - h;
    st = point_at(a, r, m1, 0.0, 0.0, &p1);
    if (st != ACP_OK) return st;
    x1 = p0->distance + 0.5 * h * (p0->sar + p1.sar);
    t1 = p0->time + 0.5 * h * (1.0 / p0->fuel_flow + 1.0 / p1.fuel_flow);
  } else {
    /* Heun: Euler-predicted end mass, then the trapezoidal rule */
    const int by_time = a->end == ACP_CRUISE_END_TIME;
    const double dm0 = by_time ? p0->fuel_flow : p0->fuel_flow / p0->ground_speed;
    st = point_at(a, r, p0->mass - h * dm0, 0.0, 0.0, &p1);
    if (st != ACP_OK) return st;
    const double dm1 = by_time ? p1.fuel_flow : p1.fuel_flow / p1.ground_speed;
    m1 = p0->mass - 0.5 * h * (dm0 + dm1);
    if (by_time) {
      t1 = p0->time + h;
      x1 = p0->distance + 0.5 * h * (p0->ground_speed + p1.ground_speed);
    } else {
      x1 = p0->distance + h;
      t1 = p0->time + 0.5 * h * (1.0 / p0->ground_speed + 1.0 / p1.ground_speed);
    }
    st = point_at(a, r, m1, 0.0, 0.0, &p1);
    if (st != ACP_OK) return st;
  }
  p1.time = t1;
  p1.distance = x1;
  r->p = p1;
  r->progress += h;
  record(r);
  return ACP_OK;
}

/* What a climb would use of the end quantity. */
static double used(const cruise_args *a, const acp_profile *cl) {
  return a->end == ACP_CRUISE_END_DISTANCE ? cl->distance
         : a->end == ACP_CRUISE_END_FUEL   ? cl->fuel
                                           : cl->time;
}

static double top_level(const acp_aircraft *ac) {
  const double top = ac_value(ac, AK_MAX_ALTITUDE);
  return isnan(top) ? ALTITUDE_TOP : top;
}

/* Climb one step when the higher level is better and reachable (header). */
static int maybe_step_climb(const cruise_args *a, cruise_run *r) {
  const double h1 = r->p.hp + a->step_climb;
  if (h1 > top_level(a->ac) * (1.0 + 1e-12)) return ACP_OK;
  cruise_cond up;
  if (cruise_cond_at(&up, a->ac, h1, a->dtemp, a->wind) != ACP_OK) return ACP_OK;
  acp_cruise_point pu;
  double hint_up[2] = {r->hint[0], r->hint[1]};
  if (cruise_speed_at(&up, a->mode, a->ci, r->p.mass, hint_up, &pu) != ACP_OK ||
      !(cruise_merit(a->mode, a->ci, &pu) < cruise_merit(a->mode, a->ci, &r->p)))
    return ACP_OK;
  acp_profile_point cp;
  int st = acp_climb_point(a->ac, r->p.mass, h1, a->dtemp, a->wind, &cp);
  if (st == ACP_ERR_INVALID) return st; /* no climb schedule: step climbs impossible */
  if (st != ACP_OK || !(cp.rate >= ACP_STEP_CLIMB_RATE_MIN)) return ACP_OK;
  acp_profile cl;
  if (acp_climb(a->ac, r->p.mass, r->p.hp, h1, a->dtemp, a->wind, 0.0, &cl) != ACP_OK ||
      !(r->progress + used(a, &cl) < a->end_value))
    return ACP_OK;
  acp_cruise_point p1;
  r->c = up;
  r->hint[0] = hint_up[0];
  r->hint[1] = hint_up[1];
  st = point_at(a, r, cl.mass_end, r->p.time + cl.time, r->p.distance + cl.distance, &p1);
  if (st != ACP_OK) return st;
  r->progress += used(a, &cl);
  r->p = p1;
  r->out->step_climbs += 1.0;
  r->out->step_climb_time += cl.time;
  r->out->step_climb_distance += cl.distance;
  r->out->step_climb_fuel += cl.fuel;
  record(r);
  return ACP_OK;
}

static double default_step(int end) {
  return end == ACP_CRUISE_END_DISTANCE ? ACP_CRUISE_STEP_DISTANCE_DEFAULT
         : end == ACP_CRUISE_END_FUEL   ? ACP_CRUISE_STEP_FUEL_DEFAULT
                                        : ACP_CRUISE_STEP_TIME_DEFAULT;
}

static int check_args(cruise_args *a, double mass, cruise_run *r) {
  if (!isfinite(a->end_value) || !isfinite(a->step) || !isfinite(a->step_climb))
    return ACP_ERR_INVALID;
  if (a->end < ACP_CRUISE_END_DISTANCE || a->end > ACP_CRUISE_END_TIME) return ACP_ERR_INVALID;
  if (!(a->end_value > 0.0) || a->step < 0.0) return ACP_ERR_INVALID;
  if (a->step == 0.0) a->step = default_step(a->end);
  if (a->end_value / a->step > ACP_CRUISE_STEPS_MAX) return ACP_ERR_RANGE;
  if (a->step > a->end_value) a->step = a->end_value;
  if (a->step_climb != 0.0 && !acp_in_range(a->step_climb, STEP_CLIMB_MIN, STEP_CLIMB_MAX))
    return ACP_ERR_RANGE;
  if (a->end == ACP_CRUISE_END_FUEL && !(a->end_value < mass - r->mass_floor))
    return exceeded(r, ACP_LIMIT_MASS_OPERATING_EMPTY, a->end_value - (mass - r->mass_floor));
  const double hi = a->end == ACP_CRUISE_END_DISTANCE ? DISTANCE_MAX
                    : a->end == ACP_CRUISE_END_FUEL   ? INFINITY
                                                      : TIME_MAX;
  return a->end_value < hi ? ACP_OK : ACP_ERR_RANGE;
}

/* Points a trace needs (header of acp_cruise_trace()). */
static size_t points_needed(const cruise_args *a, double hp) {
  size_t n = (size_t)ceil(a->end_value / a->step - 1e-9) + 1;
  if (a->step_climb > 0.0) {
    const double levels = floor((top_level(a->ac) - hp) / a->step_climb + 1e-9);
    if (levels > 0.0) n += (size_t)levels;
  }
  return n;
}

/* The integration itself (arguments checked, r set up). */
static int integrate(cruise_args *a, cruise_run *r, double mass, double hp, size_t capacity,
                     acp_cruise_point *points, size_t *count, acp_cruise_result *out) {
  if (count) {
    *count = points_needed(a, hp);
    if (*count > capacity) return ACP_ERR_RANGE;
  }
  r->out = out;
  r->trace = points;
  r->capacity = capacity;
  r->count = 0;
  r->progress = 0.0;
  r->hint[0] = r->hint[1] = 0.0;
  out->step_climbs = out->step_climb_time = out->step_climb_distance = out->step_climb_fuel = 0.0;
  int st = point_at(a, r, mass, 0.0, 0.0, &r->p);
  if (st != ACP_OK) return st;
  record(r);
  const double tas0 = r->p.tas, mach0 = r->p.mach;
  /* Steps of a->step, the last one shortened; a step climb counts as progress,
     so the number of steps never exceeds ceil(end_value/step). */
  while (a->end_value - r->progress > 1e-9 * a->step) {
    st = advance(a, r, fmin(a->step, a->end_value - r->progress));
    if (st != ACP_OK) return st;
    if (a->step_climb > 0.0 && a->end_value - r->progress > 1e-9 * a->step) {
      st = maybe_step_climb(a, r);
      if (st != ACP_OK) return st;
    }
  }
  /* an end so small that no fuel is burnt has no mean SAR: out of range */
  if (!(mass - r->p.mass > 0.0)) return ACP_ERR_RANGE;
  out->time = r->p.time;
  out->distance = r->p.distance;
  out->fuel = mass - r->p.mass;
  out->mass_end = r->p.mass;
  out->hp_end = r->p.hp;
  out->sar_mean = out->distance / out->fuel;
  out->tas_start = tas0;
  out->mach_start = mach0;
  out->tas_end = r->p.tas;
  out->mach_end = r->p.mach;
  out->buffet_margin_min = r->buffet_min;
  if (count) *count = r->count;
  return ACP_OK;
}

/* Check, set up and integrate; *lim the aircraft limit found exceeded (NaN: none). */
static int run(const acp_aircraft *ac, int mode, double cost_index, double mass, double hp,
               double dtemp, double wind, int end, double end_value, double step,
               double step_climb, size_t capacity, acp_cruise_point *points, size_t *count,
               unsigned relax, acp_cruise_result *out, perf_limit *lim) {
  cruise_args a = {ac, mode, end, cost_index, dtemp, wind, end_value, step, step_climb};
  cruise_run r;
  r.lim.code = r.lim.excess = ACP_NAN;
  r.buffet_min = ACP_NAN;
  int st = cruise_check(ac, mode, cost_index, mass, wind);
  if (st == ACP_OK) {
    r.mass_floor = perf_floor(ac, relax);
    st = cruise_cond_at(&r.c, ac, hp, dtemp, wind);
  }
  if (st == ACP_OK && perf_envelope(ac, mass, hp, relax, &r.lim) != ACP_OK) st = ACP_ERR_RANGE;
  if (st == ACP_OK) st = check_args(&a, mass, &r);
  if (st == ACP_OK) st = integrate(&a, &r, mass, hp, capacity, points, count, out);
  *lim = r.lim;
  return st;
}

int acp_cruise_trace(const acp_aircraft *ac, int mode, double cost_index, double mass, double hp,
                     double dtemp, double wind, int end, double end_value, double step,
                     double step_climb, size_t capacity, acp_cruise_point *points, size_t *count,
                     acp_cruise_result *out) {
  if (!out) return ACP_ERR_INVALID;
  result_nan(out);
  if (!count) return ACP_ERR_INVALID;
  *count = 0;
  if (!points && capacity > 0) return ACP_ERR_INVALID;
  perf_limit lim;
  const int st = run(ac, mode, cost_index, mass, hp, dtemp, wind, end, end_value, step,
                     step_climb, capacity, points, count, 0u, out, &lim);
  if (st != ACP_OK) {
    result_nan(out);
    if (!(st == ACP_ERR_RANGE && *count > capacity)) *count = 0; /* keep "needed" only */
  }
  perf_limit_report(st, &lim, &out->limit, &out->limit_excess);
  return st;
}

int perf_cruise(const acp_aircraft *ac, int mode, double cost_index, double mass, double hp,
                double dtemp, double wind, int end, double end_value, double step,
                double step_climb, unsigned relax, acp_cruise_result *out) {
  if (!out) return ACP_ERR_INVALID;
  result_nan(out);
  perf_limit lim;
  const int st = run(ac, mode, cost_index, mass, hp, dtemp, wind, end, end_value, step,
                     step_climb, 0, NULL, NULL, relax, out, &lim);
  if (st != ACP_OK) result_nan(out);
  perf_limit_report(st, &lim, &out->limit, &out->limit_excess);
  return st;
}

int acp_cruise(const acp_aircraft *ac, int mode, double cost_index, double mass, double hp,
               double dtemp, double wind, int end, double end_value, double step,
               double step_climb, acp_cruise_result *out) {
  return perf_cruise(ac, mode, cost_index, mass, hp, dtemp, wind, end, end_value, step, step_climb,
                     0u, out);
}
