/* Trip fuel: climb + cruise + descent, fuel policy, take-off mass for a zero-fuel mass. */
#include "acperf/mission.h"

#include <stdlib.h>
#include <string.h>

#include "acperf/airspeed.h"
#include "acperf/climb.h"
#include "acperf/cruise.h"
#include "acperf/propulsion.h"
#include "acperf/status.h"
#include "aircraft_internal.h"
#include "cruise_internal.h"
#include "internal.h"
#include "performance_internal.h"

#define TOD_ITERATIONS ACP_TRIP_DESCENT_ITERATIONS
#define TOD_TOL 1.0            /* m: the descent's distance settles */
#define ZFM_ITERATIONS ACP_TRIP_MASS_ITERATIONS
#define ZFM_TOL 0.1            /* kg: zero-fuel mass match (issue 4) */
/* The segments of a trip are flown without the take-off mass limit and the
   empty-mass floor (down to the model's 1 kg): the trip checks its take-off,
   landing and zero-fuel masses itself, with the excess of the whole trip. */
#define TRIP_RELAX (PERF_RELAX_MTOW | PERF_RELAX_FLOOR)
#define TAXI_SPEED 5.0         /* m/s (about 10 kt) for the idle fuel flow of taxiing */

enum mkey {
  MK_DISTANCE,
  MK_CRUISE_ALTITUDE,
  MK_ORIGIN_ALTITUDE,
  MK_DESTINATION_ALTITUDE,
  MK_ISA_DEVIATION,
  MK_WIND,
  MK_CRUISE_MODE,
  MK_COST_INDEX,
  MK_STEP_CLIMB,
  MK_CLIMB_STEP,
  MK_CRUISE_STEP,
  MK_TAXI_TIME,
  MK_TAXI_FUEL,
  MK_CONTINGENCY_FRACTION,
  MK_CONTINGENCY_MINIMUM,
  MK_ALTERNATE_FUEL,
  MK_FINAL_RESERVE_TIME,
  MK_HOLDING_HEIGHT,
  MK_DESCENT_END_HEIGHT,
  MK_COUNT
};

#define MF_ZERO_OR_RANGE 1u /* 0 is allowed besides [lo, hi] */
#define MF_INTEGER 2u

typedef struct {
  const char *name;
  double lo, hi, def;
  unsigned flags;
} mkeydef;

static const mkeydef MKEYS[MK_COUNT] = {
    [MK_DISTANCE] = {"distance", 1000.0, 2.0e7, ACP_NAN, 0},
    [MK_CRUISE_ALTITUDE] = {"cruise_altitude", 0.0, 25000.0, ACP_NAN, 0},
    [MK_ORIGIN_ALTITUDE] = {"origin_altitude", -500.0, 5000.0, 0.0, 0},
    [MK_DESTINATION_ALTITUDE] = {"destination_altitude", -500.0, 5000.0, 0.0, 0},
    [MK_ISA_DEVIATION] = {"isa_deviation", -60.0, 60.0, 0.0, 0},
    [MK_WIND] = {"wind", -100.0, 100.0, 0.0, 0},
    [MK_CRUISE_MODE] = {"cruise_mode", ACP_CRUISE_FIXED_MACH, ACP_CRUISE_MAX_ENDURANCE,
                        ACP_CRUISE_FIXED_MACH, MF_INTEGER},
    [MK_COST_INDEX] = {"cost_index", 0.0, 1000.0, 0.0, 0},
    [MK_STEP_CLIMB] = {"step_climb", 100.0, 3000.0, 0.0, MF_ZERO_OR_RANGE},
    [MK_CLIMB_STEP] = {"climb_step", 10.0, 1000.0, 0.0, MF_ZERO_OR_RANGE},
    [MK_CRUISE_STEP] = {"cruise_step", 100.0, 1.0e6, 0.0, MF_ZERO_OR_RANGE},
    [MK_TAXI_TIME] = {"taxi_time", 0.0, 7200.0, ACP_TAXI_TIME_TYPICAL, 0},
    [MK_TAXI_FUEL] = {"taxi_fuel", 0.0, 1.0e5, ACP_NAN, 0},
    [MK_CONTINGENCY_FRACTION] = {"contingency_fraction", 0.0, 0.5, ACP_CONTINGENCY_FRACTION_TYPICAL,
                                 0},
    [MK_CONTINGENCY_MINIMUM] = {"contingency_minimum", 0.0, 1.0e5, 0.0, 0},
    [MK_ALTERNATE_FUEL] = {"alternate_fuel", 0.0, 1.0e6, 0.0, 0},
    [MK_FINAL_RESERVE_TIME] = {"final_reserve_time", 0.0, 14400.0, ACP_FINAL_RESERVE_TIME_TYPICAL,
                               0},
    [MK_HOLDING_HEIGHT] = {"holding_height", 0.0, 10000.0, ACP_HOLDING_HEIGHT_TYPICAL, 0},
    [MK_DESCENT_END_HEIGHT] = {"descent_end_height", 0.0, 3000.0, 0.0, 0},
};

struct acp_mission {
  double v[MK_COUNT];
};

acp_mission *acp_mission_new(void) {
  acp_mission *m = malloc(sizeof *m);
  if (!m) return NULL;
  for (int k = 0; k < MK_COUNT; ++k) m->v[k] = MKEYS[k].def;
  return m;
}

void acp_mission_free(acp_mission *mission) { free(mission); }

static int find(const char *key) {
  for (int k = 0; k < MK_COUNT; ++k)
    if (strcmp(key, MKEYS[k].name) == 0) return k;
  return -1;
}

int acp_mission_set(acp_mission *mission, const char *key, double value) {
  if (!mission || !key) return ACP_ERR_INVALID;
  const int k = find(key);
  if (k < 0) return ACP_ERR_UNKNOWN_KEY;
  const mkeydef *d = &MKEYS[k];
  if (!isfinite(value) || ((d->flags & MF_INTEGER) && value != floor(value)))
    return ACP_ERR_INVALID;
  if (!acp_in_range(value, d->lo, d->hi) && !((d->flags & MF_ZERO_OR_RANGE) && value == 0.0))
    return ACP_ERR_RANGE;
  mission->v[k] = value;
  return ACP_OK;
}

int acp_mission_get(const acp_mission *mission, const char *key, double *value) {
  if (!value) return ACP_ERR_INVALID;
  *value = ACP_NAN;
  if (!mission || !key) return ACP_ERR_INVALID;
  const int k = find(key);
  if (k < 0) return ACP_ERR_UNKNOWN_KEY;
  *value = mission->v[k];
  return ACP_OK;
}

/* ---- the trip ------------------------------------------------------------ */

static void result_nan(acp_trip_result *o) {
  double *f = (double *)o;
  for (size_t i = 0; i < sizeof *o / sizeof(double); ++i) f[i] = ACP_NAN;
}

/* An infeasible trip: everything NaN but the reason and the excess. */
static int infeasible(acp_trip_result *o, int st, int why, double excess) {
  result_nan(o);
  o->infeasible = why;
  o->excess = excess;
  o->excess_at_least = 0.0;
  return st;
}

static int taxi_fuel(const acp_aircraft *ac, const acp_mission *ms, double *fuel) {
  if (!isnan(ms->v[MK_TAXI_FUEL])) {
    *fuel = ms->v[MK_TAXI_FUEL];
    return ACP_OK;
  }
  acp_engine_point e;
  const int st = acp_engine_rating(ac, ACP_RATING_IDLE, ms->v[MK_ORIGIN_ALTITUDE],
                                   ms->v[MK_ISA_DEVIATION], TAXI_SPEED, &e);
  *fuel = ms->v[MK_TAXI_TIME] * e.fuel_flow;
  return st;
}

/* An error of a segment as the trip's reason, where an aircraft limit names one:
   fuel burnt to nothing (the segments' floor is the model's 1 kg: the trip
   checks the empty mass on its own masses), a speed below the stall. */
static int segment_error(acp_trip_result *o, int st, double limit, double excess) {
  if (st == ACP_ERR_THRUST) return infeasible(o, st, ACP_TRIP_CANNOT_CRUISE, ACP_NAN);
  if (st == ACP_ERR_RANGE && limit == ACP_LIMIT_MASS_OPERATING_EMPTY)
    return infeasible(o, st, ACP_TRIP_NO_FUEL, excess);
  if (st == ACP_ERR_RANGE && limit == ACP_LIMIT_CL_MAX)
    return infeasible(o, st, ACP_TRIP_BELOW_STALL, excess);
  return st;
}

/* The trip's cruise step: the mission's (or the default), lengthened where the
   cruise would need more than ACP_TRIP_CRUISE_STEPS_MAX steps (mission.h). */
static double trip_cruise_step(double step, double d_cruise) {
  const double s = step > 0.0 ? step : ACP_CRUISE_STEP_DISTANCE_DEFAULT;
  return fmax(s, d_cruise / ACP_TRIP_CRUISE_STEPS_MAX);
}

/* A level speed change of no length: the speed is already right. */
static void no_change(acp_profile *p, double mass, double tas) {
  p->time = p->distance = p->fuel = 0.0;
  p->speed_change_time = p->speed_change_distance = p->speed_change_fuel = 0.0;
  p->mass_end = mass;
  p->tas_end = tas;
  p->limit = ACP_LIMIT_NONE;
  p->limit_excess = 0.0;
}

/* A level speed change from v0 to v1 at hp, or none when relevant is false. */
static int change(const acp_aircraft *ac, const acp_mission *ms, double mass, double hp, double v0,
                  double v1, int relevant, acp_profile *p) {
  if (!relevant || v1 == v0) {
    no_change(p, mass, v0);
    return ACP_OK;
  }
  return perf_speed_change(ac, mass, hp, ms->v[MK_ISA_DEVIATION], ms->v[MK_WIND], v0, v1,
                           TRIP_RELAX, p);
}

/* The segments of a trip (docs/methods/trip.md). */
typedef struct {
  acp_profile climb, accelerate, decelerate, descent, approach;
  acp_cruise_result cruise;
} legs;

/* From the end of the cruise (mass, level, speed) down: the deceleration to
   the descent speed (when the descent is slower; a faster descent starts at
   its speed), the descent to the destination plus descent_end_height, and the
   deceleration to approach_cas there (when the aircraft has one). */
static int descend(const acp_aircraft *ac, const acp_mission *ms, double mass, double h_tod,
                   double v_cruise, acp_trip_result *o, legs *l) {
  const double *v = ms->v;
  const double dtemp = v[MK_ISA_DEVIATION], wind = v[MK_WIND];
  const double h_end = v[MK_DESTINATION_ALTITUDE] + v[MK_DESCENT_END_HEIGHT];
  acp_profile_point top;
  int st = perf_point(ac, 1, mass, h_tod, dtemp, wind, TRIP_RELAX, &top);
  if (st == ACP_OK)
    st = change(ac, ms, mass, h_tod, v_cruise, top.tas, top.tas < v_cruise, &l->decelerate);
  if (st != ACP_OK) return segment_error(o, st, l->decelerate.limit, l->decelerate.limit_excess);
  st = perf_profile(ac, 1, l->decelerate.mass_end, h_tod, h_end, dtemp, wind, v[MK_CLIMB_STEP],
                    TRIP_RELAX, &l->descent);
  if (st != ACP_OK) return segment_error(o, st, l->descent.limit, l->descent.limit_excess);
  const double vapp = ac_value(ac, AK_APPROACH_CAS);
  const double tas_app = isnan(vapp) ? ACP_NAN : acp_cas_to_tas(vapp, h_end, dtemp);
  st = change(ac, ms, l->descent.mass_end, h_end, l->descent.tas_end, tas_app,
              tas_app < l->descent.tas_end, &l->approach);
  if (st != ACP_OK) return segment_error(o, st, l->approach.limit, l->approach.limit_excess);
  return ACP_OK;
}

static double down_distance(const legs *l) {
  return l->decelerate.distance + l->descent.distance + l->approach.distance;
}

/* The climb, the acceleration to the cruise speed at the cruise level (at the
   climb rating; a slower cruise speed is reached at idle). */
static int climb_up(const acp_aircraft *ac, const acp_mission *ms, double tow, acp_trip_result *o,
                    legs *l) {
  const double *v = ms->v;
  const double hc = v[MK_CRUISE_ALTITUDE], dtemp = v[MK_ISA_DEVIATION], wind = v[MK_WIND];
  int st = perf_profile(ac, 0, tow, v[MK_ORIGIN_ALTITUDE], hc, dtemp, wind, v[MK_CLIMB_STEP],
                        TRIP_RELAX, &l->climb);
  if (st == ACP_ERR_THRUST) return infeasible(o, st, ACP_TRIP_CANNOT_CLIMB, ACP_NAN);
  if (st != ACP_OK) return segment_error(o, st, l->climb.limit, l->climb.limit_excess);
  cruise_cond c;
  acp_cruise_point p;
  cruise_point_nan(&p);
  st = cruise_cond_at(&c, ac, hc, dtemp, wind);
  if (st == ACP_OK)
    st = cruise_speed_at(&c, (int)v[MK_CRUISE_MODE], v[MK_COST_INDEX], l->climb.mass_end, NULL, &p);
  if (st != ACP_OK) return segment_error(o, st, p.limit_exceeded, p.limit_excess);
  st = change(ac, ms, l->climb.mass_end, hc, l->climb.tas_end, p.tas, 1, &l->accelerate);
  if (st == ACP_ERR_THRUST) return infeasible(o, st, ACP_TRIP_CANNOT_CLIMB, ACP_NAN);
  if (st != ACP_OK) return segment_error(o, st, l->accelerate.limit, l->accelerate.limit_excess);
  return ACP_OK;
}

/* Climb, accelerate, cruise to the top of descent, decelerate, descend,
   decelerate to the approach speed (the take-off mass limit is checked by
   the callers). */
static int fly(const acp_aircraft *ac, const acp_mission *ms, double tow, acp_trip_result *o) {
  const double *v = ms->v;
  const double dist = v[MK_DISTANCE], hc = v[MK_CRUISE_ALTITUDE];
  const double ho = v[MK_ORIGIN_ALTITUDE], hd = v[MK_DESTINATION_ALTITUDE];
  const double dtemp = v[MK_ISA_DEVIATION], wind = v[MK_WIND];
  const int mode = (int)v[MK_CRUISE_MODE];
  const double h_low = fmax(ho, hd + v[MK_DESCENT_END_HEIGHT]);
  if (hc <= h_low) return infeasible(o, ACP_ERR_RANGE, ACP_TRIP_CRUISE_TOO_LOW, h_low - hc);
  const double top = ac_value(ac, AK_MAX_ALTITUDE);
  if (hc > top) return infeasible(o, ACP_ERR_RANGE, ACP_TRIP_ABOVE_MAX_ALTITUDE, hc - top);
  legs l;
  memset(&l, 0, sizeof l); /* every field is set by the loop's first pass; zero meanwhile */
  int st = climb_up(ac, ms, tow, o, &l);
  if (st != ACP_OK) return st;
  acp_cruise_result *cr = &l.cruise;
  /* Top of descent: descend from the cruise's end mass, level and speed; the
     cruise distance follows. Settled when the distance from the top of
     descent changes by less than TOD_TOL metres at the same level: the last
     cruise stands. */
  const double m_cruise = l.accelerate.mass_end, v_cruise = l.accelerate.tas_end;
  double m_tod = m_cruise, h_tod = hc, v_tod = v_cruise, d_down = ACP_NAN;
  cr->hp_end = hc;
  int settled = 0;
  for (int k = 0; k < TOD_ITERATIONS; ++k) {
    st = descend(ac, ms, m_tod, h_tod, v_tod, o, &l);
    if (st != ACP_OK) return st;
    if (fabs(down_distance(&l) - d_down) < TOD_TOL && h_tod == cr->hp_end) {
      settled = 1;
      break;
    }
    d_down = down_distance(&l);
    const double d_cruise = dist - l.climb.distance - l.accelerate.distance - d_down;
    if (d_cruise < 0.0) return infeasible(o, ACP_ERR_RANGE, ACP_TRIP_TOO_SHORT, -d_cruise);
    if (d_cruise < 1.0) { /* no cruise to speak of */
      cr->time = cr->distance = cr->fuel = 0.0;
      cr->mass_end = m_cruise;
      cr->hp_end = hc;
      cr->tas_end = v_cruise;
      cr->sar_mean = ACP_NAN;
    } else {
      st = perf_cruise(ac, mode, v[MK_COST_INDEX], m_cruise, hc, dtemp, wind,
                       ACP_CRUISE_END_DISTANCE, d_cruise, trip_cruise_step(v[MK_CRUISE_STEP], d_cruise),
                       v[MK_STEP_CLIMB], TRIP_RELAX, cr);
      if (st != ACP_OK) return segment_error(o, st, cr->limit, cr->limit_excess);
    }
    m_tod = cr->mass_end;
    h_tod = cr->hp_end;
    v_tod = cr->tas_end;
  }
  if (!settled) return ACP_ERR_NO_CONVERGENCE;
  o->takeoff_mass = tow;
  o->landing_mass = l.approach.mass_end;
  o->trip_fuel = tow - l.approach.mass_end;
  o->trip_time = l.climb.time + l.accelerate.time + cr->time + l.decelerate.time +
                 l.descent.time + l.approach.time;
  o->climb_time = l.climb.time;
  o->climb_distance = l.climb.distance;
  o->climb_fuel = l.climb.fuel;
  o->cruise_time = cr->time;
  o->cruise_distance = cr->distance;
  o->cruise_fuel = cr->fuel;
  o->descent_time = l.descent.time;
  o->descent_distance = l.descent.distance;
  o->descent_fuel = l.descent.fuel;
  o->top_of_climb_mass = l.climb.mass_end;
  o->top_of_descent_mass = m_tod;
  o->cruise_altitude_end = h_tod;
  o->cruise_sar_mean = cr->sar_mean;
  o->climb_acceleration_time = l.accelerate.time;
  o->climb_acceleration_distance = l.accelerate.distance;
  o->climb_acceleration_fuel = l.accelerate.fuel;
  o->descent_deceleration_time = l.decelerate.time;
  o->descent_deceleration_distance = l.decelerate.distance;
  o->descent_deceleration_fuel = l.decelerate.fuel;
  o->approach_deceleration_time = l.approach.time;
  o->approach_deceleration_distance = l.approach.distance;
  o->approach_deceleration_fuel = l.approach.fuel;
  return ACP_OK;
}

/* The fuel policy on a flown trip: reserves, zero-fuel mass, block fuel. */
static int reserves(const acp_aircraft *ac, const acp_mission *ms, acp_trip_result *o) {
  const double *v = ms->v;
  o->contingency_fuel = fmax(v[MK_CONTINGENCY_FRACTION] * o->trip_fuel, v[MK_CONTINGENCY_MINIMUM]);
  o->alternate_fuel = v[MK_ALTERNATE_FUEL];
  const double m_hold = o->landing_mass - o->contingency_fuel - o->alternate_fuel;
  if (!(m_hold > ACP_POLAR_MASS_MIN))
    return infeasible(o, ACP_ERR_RANGE, ACP_TRIP_BELOW_OPERATING_EMPTY,
                      perf_mass_floor(ac) - m_hold);
  double fr = 0.0;
  if (v[MK_FINAL_RESERVE_TIME] > 0.0) {
    acp_cruise_result h;
    const int st = perf_cruise(ac, ACP_CRUISE_MAX_ENDURANCE, 0.0, m_hold,
                               v[MK_DESTINATION_ALTITUDE] + v[MK_HOLDING_HEIGHT],
                               v[MK_ISA_DEVIATION], 0.0, ACP_CRUISE_END_TIME,
                               v[MK_FINAL_RESERVE_TIME], 0.0, 0.0,
                               TRIP_RELAX, &h);
    if (st != ACP_OK) return segment_error(o, st, h.limit, h.limit_excess);
    fr = h.fuel;
  }
  o->final_reserve_fuel = fr;
  o->zero_fuel_mass = m_hold - fr;
  double taxi;
  const int st = taxi_fuel(ac, ms, &taxi);
  if (st != ACP_OK) return st;
  o->taxi_fuel = taxi;
  o->ramp_mass = o->takeoff_mass + taxi;
  o->takeoff_fuel = o->trip_fuel + o->contingency_fuel + o->alternate_fuel + fr;
  o->block_fuel = taxi + o->takeoff_fuel;
  o->block_time = v[MK_TAXI_TIME] + o->trip_time;
  o->infeasible = ACP_TRIP_FEASIBLE;
  o->excess = ACP_NAN;
  o->excess_at_least = 0.0;
  o->iterations = 1.0;
  return ACP_OK;
}

static int trip_at(const acp_aircraft *ac, const acp_mission *ms, double tow, acp_trip_result *o) {
  /* nothing of an earlier trip (acp_trip_for_zero_fuel_mass() iterates)
     survives an error: every field NaN until it is computed */
  result_nan(o);
  if (!acp_in_range(tow, ACP_POLAR_MASS_MIN, ACP_POLAR_MASS_MAX)) return ACP_ERR_RANGE;
  int st = fly(ac, ms, tow, o);
  if (st == ACP_OK) st = reserves(ac, ms, o);
  return st;
}

/* Limits of the aircraft on a computed trip (keys that are given). The
   zero-fuel mass is compared with zfm_slack: acp_trip_for_zero_fuel_mass()
   checked the mass asked for exactly and matches it to ZFM_TOL. */
static int limits(const acp_aircraft *ac, acp_trip_result *o, double zfm_slack) {
  const double mtow = ac_value(ac, AK_MASS_MAX_TAKEOFF), mlw = ac_value(ac, AK_MASS_MAX_LANDING);
  const double mzfw = ac_value(ac, AK_MASS_MAX_ZERO_FUEL), cap = ac_value(ac, AK_FUEL_CAPACITY);
  const double oew = perf_mass_floor(ac);
  if (o->zero_fuel_mass < oew - zfm_slack)
    return infeasible(o, ACP_ERR_RANGE, ACP_TRIP_BELOW_OPERATING_EMPTY, oew - o->zero_fuel_mass);
  if (o->takeoff_mass > mtow)
    return infeasible(o, ACP_ERR_RANGE, ACP_TRIP_OVER_MAX_TAKEOFF, o->takeoff_mass - mtow);
  if (o->landing_mass > mlw)
    return infeasible(o, ACP_ERR_RANGE, ACP_TRIP_OVER_MAX_LANDING, o->landing_mass - mlw);
  if (o->zero_fuel_mass > mzfw + zfm_slack)
    return infeasible(o, ACP_ERR_RANGE, ACP_TRIP_OVER_MAX_ZERO_FUEL, o->zero_fuel_mass - mzfw);
  if (o->block_fuel > cap)
    return infeasible(o, ACP_ERR_RANGE, ACP_TRIP_OVER_FUEL_CAPACITY, o->block_fuel - cap);
  return ACP_OK;
}

static int check(const acp_aircraft *ac, const acp_mission *ms, double mass,
                 acp_trip_result *out) {
  if (!out) return ACP_ERR_INVALID;
  result_nan(out);
  if (!ac || !ms || !isfinite(mass)) return ACP_ERR_INVALID;
  if (isnan(ms->v[MK_DISTANCE]) || isnan(ms->v[MK_CRUISE_ALTITUDE])) return ACP_ERR_INVALID;
  if (perf_check(ac, NULL, 0) != ACP_OK) return ACP_ERR_INVALID;
  if ((int)ms->v[MK_CRUISE_MODE] == ACP_CRUISE_FIXED_MACH && isnan(ac_value(ac, AK_CRUISE_MACH)))
    return ACP_ERR_INVALID;
  return acp_in_range(mass, ACP_POLAR_MASS_MIN, ACP_POLAR_MASS_MAX) ? ACP_OK : ACP_ERR_RANGE;
}

int acp_trip(const acp_aircraft *ac, const acp_mission *mission, double takeoff_mass,
             acp_trip_result *out) {
  int st = check(ac, mission, takeoff_mass, out);
  if (st != ACP_OK) return st;
  const double mtow = ac_value(ac, AK_MASS_MAX_TAKEOFF), oew = perf_mass_floor(ac);
  if (takeoff_mass > mtow)
    return infeasible(out, ACP_ERR_RANGE, ACP_TRIP_OVER_MAX_TAKEOFF, takeoff_mass - mtow);
  if (takeoff_mass < oew)
    return infeasible(out, ACP_ERR_RANGE, ACP_TRIP_BELOW_OPERATING_EMPTY, oew - takeoff_mass);
  st = trip_at(ac, mission, takeoff_mass, out);
  if (st == ACP_OK) st = limits(ac, out, 0.0);
  if (st != ACP_OK && isnan(out->infeasible)) result_nan(out);
  return st;
}

int acp_trip_for_zero_fuel_mass(const acp_aircraft *ac, const acp_mission *mission,
                                double zero_fuel_mass, acp_trip_result *out) {
  int st = check(ac, mission, zero_fuel_mass, out);
  if (st != ACP_OK) return st;
  const double mzfw = ac_value(ac, AK_MASS_MAX_ZERO_FUEL), oew = perf_mass_floor(ac);
  if (zero_fuel_mass > mzfw)
    return infeasible(out, ACP_ERR_RANGE, ACP_TRIP_OVER_MAX_ZERO_FUEL, zero_fuel_mass - mzfw);
  if (zero_fuel_mass < oew)
    return infeasible(out, ACP_ERR_RANGE, ACP_TRIP_BELOW_OPERATING_EMPTY, oew - zero_fuel_mass);
  /* g(tow) = zero-fuel mass of the trip flown from tow, less the wanted one;
     g rises with tow at a slope a little below 1. Start from below (the
     take-off mass is at least the zero-fuel mass plus the alternate fuel). */
  const double mtow = ac_value(ac, AK_MASS_MAX_TAKEOFF);
  double tow = zero_fuel_mass + mission->v[MK_ALTERNATE_FUEL], tow_prev = ACP_NAN,
         g_prev = ACP_NAN;
  for (int k = 1; k <= ZFM_ITERATIONS; ++k) {
    st = trip_at(ac, mission, tow, out);
    const int light = out->infeasible == ACP_TRIP_NO_FUEL ||
                      out->infeasible == ACP_TRIP_BELOW_OPERATING_EMPTY;
    if (st == ACP_ERR_RANGE && light && isnan(g_prev)) {
      /* the start (zero-fuel mass + alternate) burns to below the empty mass
         before it settles: start heavier by the missing mass and 5 % */
      tow += out->excess + 0.05 * zero_fuel_mass;
      continue;
    }
    /* a trip that cannot be flown from a take-off mass above the limit: the
       mass needed is above it by at least that much */
    if (st != ACP_OK && tow > mtow) {
      infeasible(out, ACP_ERR_RANGE, ACP_TRIP_OVER_MAX_TAKEOFF, tow - mtow);
      out->excess_at_least = 1.0;
      return ACP_ERR_RANGE;
    }
    if (st != ACP_OK) {
      if (isnan(out->infeasible)) result_nan(out);
      return st;
    }
    const double g = out->zero_fuel_mass - zero_fuel_mass;
    const double slope = isnan(g_prev) || g == g_prev ? 1.0 : (g - g_prev) / (tow - tow_prev);
    if (fabs(g) < ZFM_TOL) {
      /* A zero-fuel mass asked for at a limit (the empty mass, the maximum)
         may be met a little outside it: one more pass onto the inside, so
         that acp_trip() at the take-off mass found flies too. */
      const double inside = fmin(fmax(out->zero_fuel_mass, oew + 1e-3 * ZFM_TOL),
                                 mzfw - 1e-3 * ZFM_TOL);
      if (inside != out->zero_fuel_mass && !(mzfw - oew < 2e-3 * ZFM_TOL) && k < ZFM_ITERATIONS) {
        tow_prev = tow;
        g_prev = g;
        tow += (inside - out->zero_fuel_mass) / (slope > 0.1 ? slope : 1.0);
        continue;
      }
      out->iterations = k;
      st = limits(ac, out, ZFM_TOL);
      if (st != ACP_OK && isnan(out->infeasible)) result_nan(out);
      return st;
    }
    tow_prev = tow;
    g_prev = g;
    tow -= g / (slope > 0.1 ? slope : 1.0);
  }
  result_nan(out);
  return ACP_ERR_NO_CONVERGENCE;
}
