/* Climb and descent along the aircraft's speed schedules (energy method). */
#include "acperf/climb.h"

#include "acperf/airspeed.h"
#include "acperf/atmosphere.h"
#include "acperf/polar.h"
#include "acperf/status.h"
#include "acperf/units.h"
#include "aircraft_internal.h"
#include "internal.h"
#include "performance_internal.h"
#include "propulsion_internal.h"

#define RATE_MIN 0.0508         /* 10 ft/min: below it a climb or descent "stops" */
#define SEARCH_TOP 25000.0      /* highest altitude searched for ceilings, m */
#define ATM_TROPOPAUSE 11000.0  /* where the lapse rate (and f) jumps, m */
#define WIND_MAX 200.0          /* largest along-track wind, m/s (as acp_cruise()) */

typedef struct {
  const acp_aircraft *ac;
  int descent;
  double dtemp, wind;
  double mass_floor; /* perf_mass_floor(): no point of a profile below it */
  perf_limit *lim;   /* where a limit found exceeded is told */
} phase;

/* Schedules change mode (speed limit, crossover) at an altitude, and the
   acceleration factor jumps there: a point at such an altitude is evaluated
   SIDE metres into the segment it belongs to. */
#define SIDE 1e-6

/* The phase's schedule at hp. The low-altitude limit never raises the speed:
   below it the aircraft flies the lower of the limit CAS and the schedule CAS. */
static int schedule_at(const phase *ph, double hp, acp_schedule_point *s) {
  const acp_aircraft *ac = ph->ac;
  const double cas = ac_value(ac, ph->descent ? AK_DESCENT_CAS : AK_CLIMB_CAS);
  const double mach = ac_value(ac, ph->descent ? AK_DESCENT_MACH : AK_CLIMB_MACH);
  const double vmo = isnan(ac_value(ac, AK_VMO)) ? 400.0 : ac_value(ac, AK_VMO);
  const double mmo = isnan(ac_value(ac, AK_MMO)) ? ACP_POLAR_MACH_MAX : ac_value(ac, AK_MMO);
  return acp_speed_schedule(hp, ph->dtemp, fmin(ac_value(ac, AK_SPEED_LIMIT_CAS), cas),
                            ac_value(ac, AK_SPEED_LIMIT_ALTITUDE), cas, mach, vmo, mmo, s);
}

/* Forces, rates and fuel at (hp, tas) with acceleration factor f; f = 0 is a
   level speed change (rate 0). */
static int forces(const phase *ph, double mass, double hp, double tas, double f,
                  acp_profile_point *p) {
  if (!(mass >= ph->mass_floor)) {
    ph->lim->code = ACP_LIMIT_MASS_OPERATING_EMPTY;
    ph->lim->excess = ph->mass_floor - mass;
    return ACP_ERR_RANGE;
  }
  acp_atmos at;
  int st = acp_isa(hp, ph->dtemp, &at);
  if (st != ACP_OK) return st;
  const double mach = tas / at.sound_speed;
  acp_engine_point e;
  st = prop_rating(ph->ac, ph->descent ? ACP_RATING_IDLE : ACP_RATING_CLIMB, &at, mach, tas, &e);
  if (st != ACP_OK) return st;
  const double drag = polar_drag(ph->ac, &at, mass * ACP_G0, tas);
  if (isnan(drag)) return ACP_ERR_RANGE;
  const double cas = acp_mach_to_cas(mach, hp);
  if (perf_speed_envelope(ph->ac, perf_lift_coefficient(ph->ac, mass, &at, tas), mach, cas,
                          ph->lim) != ACP_OK)
    return ACP_ERR_RANGE;
  const double roc = f > 0.0 ? (e.thrust - drag) * tas / (mass * ACP_G0 * f) : 0.0;
  const double gamma = asin(fmax(-1.0, fmin(1.0, roc / tas)));
  p->hp = hp;
  p->mass = mass;
  p->tas = tas;
  p->mach = mach;
  p->cas = cas;
  p->rate = roc * (at.temperature - ph->dtemp) / at.temperature; /* geometric to pressure */
  p->gradient = gamma;
  p->thrust = e.thrust;
  p->drag = drag;
  p->fuel_flow = e.fuel_flow;
  p->acceleration_factor = f;
  p->limit = ACP_LIMIT_NONE;
  p->limit_excess = 0.0;
  return ACP_OK;
}

/* A point on the schedule at hp, flying the schedule of hp + side. */
static int scheduled_side(const phase *ph, double mass, double hp, double side,
                          acp_profile_point *p) {
  acp_schedule_point s;
  int st = schedule_at(ph, hp + side, &s);
  if (st == ACP_OK) st = forces(ph, mass, hp, s.tas, s.acceleration_factor, p);
  p->mode = s.mode;
  return st;
}

static int scheduled(const phase *ph, double mass, double hp, acp_profile_point *p) {
  return scheduled_side(ph, mass, hp, 0.0, p);
}

static double ground_speed(const phase *ph, const acp_profile_point *p) {
  return p->tas * cos(p->gradient) + ph->wind;
}

/* Integration state: totals, the trace being written, the current point. */
typedef struct {
  acp_profile_point cur;
  acp_profile_point *trace;
  size_t count, capacity;
  double speed_change_time, speed_change_distance, speed_change_fuel;
} run;

static void record(run *r) {
  if (r->trace && r->count < r->capacity) r->trace[r->count] = r->cur;
  ++r->count;
}

/* The rate keeps its sign (climbing or descending) and the ground speed stays positive. */
static int usable(const phase *ph, const acp_profile_point *p) {
  if (!(ground_speed(ph, p) > 0.0)) return ACP_ERR_RANGE;
  if (p->acceleration_factor > 0.0 && (ph->descent ? p->rate > -RATE_MIN : p->rate < RATE_MIN))
    return ACP_ERR_THRUST;
  return ACP_OK;
}

/* The one place where a step is booked, altitude steps and level speed
   changes alike: p1 becomes the current point, with the time, distance and
   mass of the point before plus dt and dx and less dm. Time runs forward,
   fuel is burnt, never added, and the mass stays above the floor. */
static int book(const phase *ph, run *r, const acp_profile_point *p1, double dt, double dx,
                double dm) {
  if (!(dt > 0.0) || !(dm >= 0.0)) return ACP_ERR_RANGE;
  const double t = r->cur.time + dt, x = r->cur.distance + dx, m = r->cur.mass - dm;
  if (!(m >= ph->mass_floor)) {
    ph->lim->code = ACP_LIMIT_MASS_OPERATING_EMPTY;
    ph->lim->excess = ph->mass_floor - m;
    return ACP_ERR_RANGE;
  }
  r->cur = *p1;
  r->cur.time = t;
  r->cur.distance = x;
  r->cur.mass = m;
  record(r);
  return ACP_OK;
}

/* Along the schedule from the current altitude to h1 in n steps. Each step is
   Simpson's rule on dt/dhp = 1/rate, dm/dhp = fuel flow/rate and dx/dhp =
   ground speed/rate, with the masses at the middle and the end predicted from
   the start and the middle (fourth order in the step where the integrand is
   smooth: the plan cuts the profile at every kink). */
static int altitude_segment(const phase *ph, run *r, double h1, size_t n) {
  const double h0 = r->cur.hp, side = h1 > h0 ? SIDE : -SIDE;
  /* the start on this segment's side of a mode change */
  acp_profile_point start;
  int st = scheduled_side(ph, r->cur.mass, h0, side, &start);
  if (st == ACP_OK) st = usable(ph, &start);
  if (st != ACP_OK) return st;
  start.time = r->cur.time;
  start.distance = r->cur.distance;
  r->cur = start;
  for (size_t i = 1; i <= n; ++i) {
    const double h = h0 + (h1 - h0) * (double)i / (double)n;
    const acp_profile_point p0 = r->cur;
    const double dh = h - p0.hp;
    acp_profile_point pm, p1;
    st = scheduled(ph, p0.mass - 0.5 * dh * p0.fuel_flow / p0.rate, p0.hp + 0.5 * dh, &pm);
    if (st == ACP_OK) st = usable(ph, &pm);
    if (st == ACP_OK)
      st = scheduled_side(ph, p0.mass - dh * pm.fuel_flow / pm.rate, h, -side, &p1);
    if (st == ACP_OK) st = usable(ph, &p1);
    if (st != ACP_OK) return st;
    const double w = dh / 6.0;
    const double dt = w * (1.0 / p0.rate + 4.0 / pm.rate + 1.0 / p1.rate);
    const double dx = w * (ground_speed(ph, &p0) / p0.rate + 4.0 * ground_speed(ph, &pm) / pm.rate +
                           ground_speed(ph, &p1) / p1.rate);
    const double dm = w * (p0.fuel_flow / p0.rate + 4.0 * pm.fuel_flow / pm.rate +
                           p1.fuel_flow / p1.rate);
    st = book(ph, r, &p1, dt, dx, dm);
    if (st != ACP_OK) return st;
  }
  return ACP_OK;
}

/* The specific excess power (T - D) V/W of a level-flight point is at least
   RATE_MIN, accelerating when climbing and decelerating when descending. */
static int enough_power(const phase *ph, const acp_profile_point *p) {
  const double ps = (p->thrust - p->drag) * p->tas / (p->mass * ACP_G0);
  return ph->descent ? ps < -RATE_MIN : ps > RATE_MIN;
}

/* Level acceleration (climb) or deceleration (descent) at the current altitude
   to TAS v1, in ACP_SPEED_CHANGE_STEPS steps of TAS: Simpson's rule on
   dt/dV = m/(T - D), dx/dV = (ground speed) dt/dV and dm/dV = (fuel flow)
   dt/dV, the masses at the middle and the end of each step predicted as in
   altitude_segment(). Climbing must accelerate and descending decelerate with
   a specific excess power of at least RATE_MIN at every point (else the
   change takes unbounded time, as a climb below RATE_MIN would). */
static int speed_segment(const phase *ph, run *r, double v1, double mode) {
  const double v0 = r->cur.tas, t0 = r->cur.time, x0 = r->cur.distance, m0 = r->cur.mass;
  acp_profile_point p0;
  int st = forces(ph, r->cur.mass, r->cur.hp, v0, 0.0, &p0);
  if (st != ACP_OK) return st;
  p0.time = t0;
  p0.distance = x0;
  p0.mode = r->cur.mode;
  r->cur = p0;
  for (int i = 1; i <= ACP_SPEED_CHANGE_STEPS; ++i) {
    const acp_profile_point *a = &r->cur;
    const double dv = v0 + (v1 - v0) * i / ACP_SPEED_CHANGE_STEPS - a->tas;
    const double acc0 = (a->thrust - a->drag) / a->mass;
    acp_profile_point pm, p1;
    if (!enough_power(ph, a)) return ACP_ERR_THRUST;
    st = forces(ph, a->mass - 0.5 * dv * a->fuel_flow / acc0, a->hp, a->tas + 0.5 * dv, 0.0, &pm);
    if (st != ACP_OK) return st;
    if (!enough_power(ph, &pm)) return ACP_ERR_THRUST;
    const double accm = (pm.thrust - pm.drag) / pm.mass;
    st = forces(ph, a->mass - dv * pm.fuel_flow / accm, a->hp, a->tas + dv, 0.0, &p1);
    if (st != ACP_OK) return st;
    if (!enough_power(ph, &p1)) return ACP_ERR_THRUST;
    const double acc1 = (p1.thrust - p1.drag) / p1.mass;
    p1.mode = mode;
    const double w = dv / 6.0;
    const double dt = w * (1.0 / acc0 + 4.0 / accm + 1.0 / acc1);
    const double dx = w * (ground_speed(ph, a) / acc0 + 4.0 * ground_speed(ph, &pm) / accm +
                           ground_speed(ph, &p1) / acc1);
    const double dm = w * (a->fuel_flow / acc0 + 4.0 * pm.fuel_flow / accm + p1.fuel_flow / acc1);
    st = book(ph, r, &p1, dt, dx, dm);
    if (st != ACP_OK) return st;
  }
  r->speed_change_time += r->cur.time - t0;
  r->speed_change_distance += r->cur.distance - x0;
  r->speed_change_fuel += m0 - r->cur.mass;
  return ACP_OK;
}

static size_t steps(double from, double to, double step) {
  const double n = ceil(fabs(to - from) / step - 1e-9);
  return n < 1.0 ? 1u : (size_t)n;
}

/* The segments of a profile: the integrand has kinks where the schedule
   changes mode (speed limit, crossover) and where the lapse rate changes
   (tropopause), so each of those inside the profile ends a segment; steps
   never straddle one. The level speed change happens at the speed limit. */
#define PLAN_MAX 4
typedef struct {
  double end[PLAN_MAX];  /* end altitude of each segment, in the direction flown */
  size_t steps[PLAN_MAX];
  size_t nseg;
  size_t change_after;   /* segment after which the speed changes; PLAN_MAX if none */
  int change_first;      /* a climb starting at the limit altitude: change speed first */
  double limit;
} plan;

static plan make_plan(const phase *ph, double h0, double h1, double step) {
  plan p = {.nseg = 0, .change_after = PLAN_MAX};
  p.limit = ac_value(ph->ac, AK_SPEED_LIMIT_ALTITUDE);
  /* at the limit altitude itself the low-side speed is flown (as at the end of
     a climb to it), so a climb from there accelerates first */
  p.change_first = !ph->descent && fabs(h0 - p.limit) <= 1e-6 && h1 > p.limit;
  double cuts[3] = {p.limit, ACP_NAN, ATM_TROPOPAUSE};
  const double cas = ac_value(ph->ac, ph->descent ? AK_DESCENT_CAS : AK_CLIMB_CAS);
  const double mach = ac_value(ph->ac, ph->descent ? AK_DESCENT_MACH : AK_CLIMB_MACH);
  if (acp_crossover_altitude(cas, mach, &cuts[1]) != ACP_OK) cuts[1] = ACP_NAN;
  const double dir = h1 > h0 ? 1.0 : -1.0;
  double from = h0;
  for (;;) {
    /* the nearest cut strictly between the current altitude and h1 */
    double next = h1;
    int is_limit = 0;
    for (int k = 0; k < 3; ++k)
      if (!isnan(cuts[k]) && (cuts[k] - from) * dir > 1e-6 && (h1 - cuts[k]) * dir > 1e-6 &&
          (cuts[k] - next) * dir < 0.0) {
        next = cuts[k];
        is_limit = k == 0;
      }
    p.end[p.nseg] = next;
    p.steps[p.nseg] = steps(from, next, step);
    if (is_limit) p.change_after = p.nseg;
    ++p.nseg;
    if (next == h1 || p.nseg == PLAN_MAX) break;
    from = next;
  }
  /* symmetric with the climb: a descent to the limit altitude ends on the
     low-side speed, so it decelerates there last (and one from there starts slow) */
  if (ph->descent && fabs(h1 - p.limit) <= 1e-6 && h0 > p.limit) p.change_after = p.nseg - 1;
  return p;
}

static size_t plan_points(const plan *p) {
  size_t n = 1 + (p->change_after < PLAN_MAX || p->change_first ? ACP_SPEED_CHANGE_STEPS : 0);
  for (size_t k = 0; k < p->nseg; ++k) n += p->steps[k];
  return n;
}

/* The level speed change at the limit altitude onto the schedule beyond it. */
static int change_at_limit(const phase *ph, run *r, double limit, double side) {
  acp_profile_point next;
  const int st = scheduled_side(ph, r->cur.mass, limit, side, &next);
  return st == ACP_OK ? speed_segment(ph, r, next.tas, next.mode) : st;
}

/* The profile from h0 to h1 along the plan (arguments checked). */
static int integrate(const phase *ph, double mass, double h0, double h1, double step,
                     size_t capacity, acp_profile_point *points, size_t *count,
                     acp_profile *out) {
  const plan pl = make_plan(ph, h0, h1, step);
  if (count) {
    *count = plan_points(&pl);
    if (capacity < *count) return ACP_ERR_RANGE;
  }
  run r = {.trace = points, .capacity = capacity};
  const double side = ph->descent ? -SIDE : SIDE;
  int st = scheduled_side(ph, mass, h0, pl.change_first ? -SIDE : side, &r.cur);
  if (st == ACP_OK) st = usable(ph, &r.cur);
  if (st != ACP_OK) return st;
  r.cur.time = r.cur.distance = 0.0;
  record(&r);
  if (pl.change_first) st = change_at_limit(ph, &r, pl.limit, side);
  for (size_t k = 0; k < pl.nseg && st == ACP_OK; ++k) {
    st = altitude_segment(ph, &r, pl.end[k], pl.steps[k]);
    if (st == ACP_OK && k == pl.change_after) st = change_at_limit(ph, &r, pl.limit, side);
  }
  if (st != ACP_OK) return st;
  out->time = r.cur.time;
  out->distance = r.cur.distance;
  out->fuel = mass - r.cur.mass;
  out->mass_end = r.cur.mass;
  out->tas_end = r.cur.tas;
  out->speed_change_time = r.speed_change_time;
  out->speed_change_distance = r.speed_change_distance;
  out->speed_change_fuel = r.speed_change_fuel;
  if (count) *count = r.count;
  return ACP_OK;
}

static void set_nan_profile(acp_profile *o) {
  o->time = o->distance = o->fuel = o->mass_end = o->tas_end = ACP_NAN;
  o->speed_change_time = o->speed_change_distance = o->speed_change_fuel = ACP_NAN;
  o->limit = o->limit_excess = ACP_NAN;
}

/* Arguments of the point and profile functions, and the aircraft's mass and
   altitude limits at h0 and h1 (lim set when one is exceeded). */
static int check_args(const acp_aircraft *ac, double mass, double h0, double h1, double dtemp,
                      double wind, double *step, unsigned relax, perf_limit *lim) {
  lim->code = lim->excess = ACP_NAN;
  if (!ac || !isfinite(mass) || !isfinite(h0) || !isfinite(h1) || !isfinite(dtemp) ||
      !isfinite(wind) || !isfinite(*step))
    return ACP_ERR_INVALID;
  if (perf_check(ac, NULL, 0) != ACP_OK) return ACP_ERR_INVALID;
  if (*step == 0.0) *step = ACP_CLIMB_STEP_DEFAULT;
  if (!acp_in_range(*step, ACP_CLIMB_STEP_MIN, ACP_CLIMB_STEP_MAX) || !acp_in_range(mass, ACP_POLAR_MASS_MIN, ACP_POLAR_MASS_MAX) ||
      !acp_in_range(wind, -WIND_MAX, WIND_MAX))
    return ACP_ERR_RANGE;
  acp_atmos at;
  int st = acp_isa(h0, dtemp, &at);
  if (st == ACP_OK) st = acp_isa(h1, dtemp, &at);
  if (st == ACP_OK) st = perf_envelope(ac, mass, fmax(h0, h1), relax, lim);
  return st;
}

static int profile(const acp_aircraft *ac, int descent, double mass, double h0, double h1,
                   double dtemp, double wind, double step, unsigned relax, size_t capacity,
                   acp_profile_point *points, size_t *count, acp_profile *out) {
  if (!out) return ACP_ERR_INVALID;
  set_nan_profile(out);
  perf_limit lim;
  int st = check_args(ac, mass, h0, h1, dtemp, wind, &step, relax, &lim);
  if (st == ACP_OK && (descent ? !(h1 < h0) : !(h1 > h0))) st = ACP_ERR_INVALID;
  if (st == ACP_OK) {
    const phase ph = {ac, descent, dtemp, wind, perf_floor(ac, relax), &lim};
    st = integrate(&ph, mass, h0, h1, step, capacity, points, count, out);
  }
  if (st != ACP_OK) set_nan_profile(out);
  perf_limit_report(st, &lim, &out->limit, &out->limit_excess);
  return st;
}

int perf_profile(const acp_aircraft *ac, int descent, double mass, double hp_start, double hp_end,
                 double dtemp, double wind, double step, unsigned relax, acp_profile *out) {
  return profile(ac, descent, mass, hp_start, hp_end, dtemp, wind, step, relax, 0, NULL, NULL,
                 out);
}

/* A level speed change at hp from v0 to v1: accelerating at the climb
   rating, decelerating at flight idle (the profile's phase). */
static int speed_change(const acp_aircraft *ac, double mass, double hp, double dtemp, double wind,
                        double v0, double v1, unsigned relax, acp_profile *out) {
  if (!out) return ACP_ERR_INVALID;
  set_nan_profile(out);
  perf_limit lim;
  double step = ACP_CLIMB_STEP_DEFAULT;
  int st = check_args(ac, mass, hp, hp, dtemp, wind, &step, relax, &lim);
  if (st == ACP_OK && !(isfinite(v0) && isfinite(v1))) st = ACP_ERR_INVALID;
  if (st == ACP_OK && !(v0 > 0.0 && v1 > 0.0)) st = ACP_ERR_RANGE;
  /* both ends inside the speed limits, so that an excess names the speed asked for */
  acp_atmos at;
  if (st == ACP_OK) st = acp_isa(hp, dtemp, &at);
  for (int i = 0; i < 2 && st == ACP_OK; ++i) {
    const double v = i ? v1 : v0, mach = v / at.sound_speed;
    st = perf_speed_envelope(ac, perf_lift_coefficient(ac, mass, &at, v), mach,
                             acp_mach_to_cas(mach, hp), &lim);
  }
  run r = {.cur = {.hp = hp, .mass = mass, .tas = v0, .time = 0.0, .distance = 0.0,
                   .mode = ACP_NAN}};
  if (st == ACP_OK && v1 != v0) {
    const phase ph = {ac, v1 < v0, dtemp, wind, perf_floor(ac, relax), &lim};
    st = speed_segment(&ph, &r, v1, ACP_NAN);
  }
  if (st == ACP_OK) {
    out->time = out->speed_change_time = r.cur.time;
    out->distance = out->speed_change_distance = r.cur.distance;
    out->fuel = out->speed_change_fuel = mass - r.cur.mass;
    out->mass_end = r.cur.mass;
    out->tas_end = v1;
  }
  perf_limit_report(st, &lim, &out->limit, &out->limit_excess);
  return st;
}

int perf_speed_change(const acp_aircraft *ac, double mass, double hp, double dtemp, double wind,
                      double tas_start, double tas_end, unsigned relax, acp_profile *out) {
  return speed_change(ac, mass, hp, dtemp, wind, tas_start, tas_end, relax, out);
}

int acp_level_speed_change(const acp_aircraft *ac, double mass, double hp, double dtemp,
                           double wind, double tas_start, double tas_end, acp_profile *out) {
  return speed_change(ac, mass, hp, dtemp, wind, tas_start, tas_end, 0u, out);
}

int acp_climb(const acp_aircraft *ac, double mass, double hp_start, double hp_end, double dtemp,
              double wind, double step, acp_profile *out) {
  return profile(ac, 0, mass, hp_start, hp_end, dtemp, wind, step, 0u, 0, NULL, NULL, out);
}

int acp_climb_trace(const acp_aircraft *ac, double mass, double hp_start, double hp_end,
                    double dtemp, double wind, double step, size_t capacity,
                    acp_profile_point *points, size_t *count, acp_profile *out) {
  if (!count || (capacity > 0 && !points)) return ACP_ERR_INVALID;
  return profile(ac, 0, mass, hp_start, hp_end, dtemp, wind, step, 0u, capacity, points, count, out);
}

int acp_descent(const acp_aircraft *ac, double mass, double hp_start, double hp_end,
                double dtemp, double wind, double step, acp_profile *out) {
  return profile(ac, 1, mass, hp_start, hp_end, dtemp, wind, step, 0u, 0, NULL, NULL, out);
}

int acp_descent_trace(const acp_aircraft *ac, double mass, double hp_start, double hp_end,
                      double dtemp, double wind, double step, size_t capacity,
                      acp_profile_point *points, size_t *count, acp_profile *out) {
  if (!count || (capacity > 0 && !points)) return ACP_ERR_INVALID;
  return profile(ac, 1, mass, hp_start, hp_end, dtemp, wind, step, 0u, capacity, points, count, out);
}

static void set_nan_point(acp_profile_point *p) {
  p->time = p->distance = p->hp = p->mass = p->tas = p->cas = p->mach = ACP_NAN;
  p->rate = p->gradient = p->thrust = p->drag = p->fuel_flow = ACP_NAN;
  p->acceleration_factor = p->mode = ACP_NAN;
  p->limit = p->limit_excess = ACP_NAN;
}

static int point(const acp_aircraft *ac, int descent, double mass, double hp, double dtemp,
                 double wind, unsigned relax, acp_profile_point *out) {
  if (!out) return ACP_ERR_INVALID;
  set_nan_point(out);
  double step = ACP_CLIMB_STEP_DEFAULT;
  perf_limit lim;
  int st = check_args(ac, mass, hp, hp, dtemp, wind, &step, relax, &lim);
  if (st == ACP_OK) {
    const phase ph = {ac, descent, dtemp, wind, perf_floor(ac, relax), &lim};
    st = scheduled(&ph, mass, hp, out);
  }
  if (st != ACP_OK) {
    set_nan_point(out);
    perf_limit_report(st, &lim, &out->limit, &out->limit_excess);
    return st;
  }
  out->time = out->distance = 0.0;
  return ACP_OK;
}

int perf_point(const acp_aircraft *ac, int descent, double mass, double hp, double dtemp,
               double wind, unsigned relax, acp_profile_point *out) {
  return point(ac, descent, mass, hp, dtemp, wind, relax, out);
}

int acp_climb_point(const acp_aircraft *ac, double mass, double hp, double dtemp, double wind,
                    acp_profile_point *out) {
  return point(ac, 0, mass, hp, dtemp, wind, 0u, out);
}

int acp_descent_point(const acp_aircraft *ac, double mass, double hp, double dtemp, double wind,
                      acp_profile_point *out) {
  return point(ac, 1, mass, hp, dtemp, wind, 0u, out);
}

/* ---- ceilings ---------------------------------------------------------- */

/* Climb rate (m/s of pressure altitude) on the climb schedule; NaN where the
   models end (beyond the drag model's Mach, the atmosphere). */
static double climb_rate(const phase *ph, double mass, double hp) {
  acp_profile_point p;
  return scheduled(ph, mass, hp, &p) == ACP_OK ? p.rate : ACP_NAN;
}

/* Highest altitude below SEARCH_TOP where the climb rate is at least `rate`:
   scan upwards in 250 m steps, then bisect the first crossing to 0.01 m. NaN
   when the rate holds to the top; -Inf when it is not reached even at 0 m. */
static double ceiling(const phase *ph, double mass, double rate) {
  double lo = 0.0;
  if (!(climb_rate(ph, mass, lo) >= rate)) return -(double)INFINITY;
  for (int k = 1; k * 250.0 <= SEARCH_TOP; ++k) {
    double hi = k * 250.0;
    if (climb_rate(ph, mass, hi) >= rate) {
      lo = hi;
      continue;
    }
    while (hi - lo > 0.01) {
      const double mid = 0.5 * (lo + hi);
      if (climb_rate(ph, mass, mid) >= rate) lo = mid; else hi = mid;
    }
    return lo;
  }
  return ACP_NAN;
}

/* Specific air range at cruise_mach at hp (NaN where level flight fails or
   leaves the speed limits: cl_max, mmo, vmo). */
static double sar_at(const acp_aircraft *ac, double mass, double hp, double dtemp) {
  acp_atmos at;
  if (acp_isa(hp, dtemp, &at) != ACP_OK) return ACP_NAN;
  const double mach = ac_value(ac, AK_CRUISE_MACH), tas = mach * at.sound_speed;
  perf_limit lim;
  if (perf_speed_envelope(ac, perf_lift_coefficient(ac, mass, &at, tas), mach,
                          acp_mach_to_cas(mach, hp), &lim) != ACP_OK)
    return ACP_NAN;
  return perf_sar(ac, mass, &at, tas, 0.0);
}

/* Altitude of the greatest SAR at or below top where level flight holds: a
   100 m scan, then golden section on the best point's neighbours, returning
   the best altitude evaluated (so never one where level flight fails). *binds
   says what holds it: ACP_ALTITUDE_LIMIT_NONE (an inner maximum), top_code
   (within 1 m of top) or ACP_ALTITUDE_LIMIT_THRUST (level flight fails 1 m
   above: the turbofan's SAR rises up to its cruise-thrust ceiling). */
static double optimum_altitude(const acp_aircraft *ac, double mass, double dtemp, double top,
                               double top_code, double *binds) {
  double best = ACP_NAN, best_h = ACP_NAN;
  *binds = ACP_NAN;
  for (int k = 0; k * 100.0 <= top + 100.0; ++k) {
    const double h = fmin(k * 100.0, top);
    const double s = sar_at(ac, mass, h, dtemp);
    if (!isnan(s) && (isnan(best) || s > best)) {
      best = s;
      best_h = h;
    }
    if (h == top) break;
  }
  if (isnan(best_h)) return ACP_NAN;
  double a = fmax(0.0, best_h - 100.0), b = fmin(top, best_h + 100.0);
  const double g = 0.38196601125010515;
  while (b - a > 0.01) {
    const double c = a + g * (b - a), d = b - g * (b - a);
    const double sc = sar_at(ac, mass, c, dtemp), sd = sar_at(ac, mass, d, dtemp);
    if (!isnan(sc) && sc > best) best = sc, best_h = c;
    if (!isnan(sd) && sd > best) best = sd, best_h = d;
    if (isnan(sd) || sc > sd) b = d; else a = c;
  }
  if (top - best_h <= 1.0)
    *binds = top_code;
  else
    *binds = isnan(sar_at(ac, mass, best_h + 1.0, dtemp)) ? ACP_ALTITUDE_LIMIT_THRUST
                                                          : ACP_ALTITUDE_LIMIT_NONE;
  return best_h;
}

int acp_ceilings(const acp_aircraft *ac, double mass, double dtemp, acp_ceiling_set *out) {
  if (!out) return ACP_ERR_INVALID;
  out->service_ceiling = out->max_climb_altitude = out->buffet_altitude = ACP_NAN;
  out->max_cruise_altitude = out->optimum_altitude = ACP_NAN;
  out->optimum_limit = out->best_cruise_altitude = out->best_cruise_limit = ACP_NAN;
  out->max_cruise_limit = ACP_NAN;
  double step = ACP_CLIMB_STEP_DEFAULT;
  perf_limit lim;
  int st = check_args(ac, mass, 0.0, 0.0, dtemp, 0.0, &step, 0u, &lim);
  if (st != ACP_OK) return st;
  if (isnan(ac_value(ac, AK_CRUISE_MACH))) return ACP_ERR_INVALID;
  const phase ph = {ac, 0, dtemp, 0.0, perf_mass_floor(ac), &lim};
  /* 100 and 300 ft/min residual climb (common practice) */
  const double service = ceiling(&ph, mass, 100.0 * ACP_FPM);
  const double climb = ceiling(&ph, mass, 300.0 * ACP_FPM);
  if (isinf(service)) return ACP_ERR_THRUST;
  /* 1.3 g to buffet at cruise_mach: p = 1.3 m g/(0.7 M^2 S CL_buffet) */
  const double clb = isnan(ac_value(ac, AK_CL_BUFFET)) ? ac_value(ac, AK_CL_MAX)
                                                        : ac_value(ac, AK_CL_BUFFET);
  const double m = ac_value(ac, AK_CRUISE_MACH);
  double buffet = ACP_NAN;
  if (!isnan(clb) &&
      acp_isa_pressure_altitude(ACP_BUFFET_MARGIN * mass * ACP_G0 /
                                    (0.7 * m * m * ac->v[AK_WING_AREA] * clb),
                                &buffet) != ACP_OK)
    buffet = ACP_NAN;
  out->service_ceiling = service;
  out->max_climb_altitude = isinf(climb) ? ACP_NAN : climb;
  if (buffet > SEARCH_TOP) buffet = ACP_NAN; /* above the search range: NaN, as documented */
  out->buffet_altitude = buffet;
  double top = SEARCH_TOP, top_code = ACP_ALTITUDE_LIMIT_NONE;
  const double limits[] = {out->max_climb_altitude, buffet, ac_value(ac, AK_MAX_ALTITUDE)};
  const double codes[] = {ACP_ALTITUDE_LIMIT_CLIMB, ACP_ALTITUDE_LIMIT_BUFFET,
                          ACP_ALTITUDE_LIMIT_MAX_ALTITUDE};
  for (size_t i = 0; i < 3; ++i)
    if (limits[i] < top) top = limits[i], top_code = codes[i];
  out->max_cruise_altitude = top;
  out->max_cruise_limit = top_code;
  out->optimum_altitude = optimum_altitude(ac, mass, dtemp, isnan(service) ? SEARCH_TOP : service,
                                           ACP_ALTITUDE_LIMIT_CLIMB, &out->optimum_limit);
  out->best_cruise_altitude =
      optimum_altitude(ac, mass, dtemp, top, top_code, &out->best_cruise_limit);
  return ACP_OK;
}

/* ---- tables ------------------------------------------------------------ */

static void table_put(double *a, size_t i, double v) {
  if (a) a[i] = v;
}

size_t acp_climb_table(const acp_aircraft *ac, double hp_start, double wind, double step,
                       size_t n_mass, const double *mass, size_t n_hp, const double *hp_end,
                       size_t n_dtemp, const double *dtemp, double *table_time,
                       double *table_distance, double *table_fuel) {
  /* the cell count in two steps: n_hp n_dtemp can overflow on its own */
  if ((n_hp && n_dtemp > SIZE_MAX / n_hp) || (n_mass && n_hp * n_dtemp > SIZE_MAX / n_mass))
    return SIZE_MAX;
  double *const outs[] = {table_time, table_distance, table_fuel};
  const size_t cells = acp_all_invalid(n_mass * n_hp * n_dtemp, outs, 3);
  if (!ac || !mass || !hp_end || !dtemp) return cells;
  for (size_t j = 0; j < n_hp; ++j)
    if (!(hp_end[j] > hp_start) || (j > 0 && !(hp_end[j] > hp_end[j - 1]))) return cells;
  size_t filled = 0;
  for (size_t i = 0; i < n_mass; ++i)
    for (size_t k = 0; k < n_dtemp; ++k) {
      /* chain the climb through the altitudes: each leg starts where the last ended */
      double m = mass[i], t = 0.0, x = 0.0, from = hp_start;
      for (size_t j = 0; j < n_hp; ++j) {
        acp_profile leg;
        if (acp_climb(ac, m, from, hp_end[j], dtemp[k], wind, step, &leg) != ACP_OK) break;
        t += leg.time;
        x += leg.distance;
        m = leg.mass_end;
        from = hp_end[j];
        const size_t c = (i * n_hp + j) * n_dtemp + k;
        table_put(table_time, c, t);
        table_put(table_distance, c, x);
        table_put(table_fuel, c, mass[i] - m);
        ++filled;
      }
    }
  return cells - filled;
}
