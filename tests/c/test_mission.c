/* Trip fuel: bookkeeping of the phases and the fuel policy, recomposition
   from the public climb/cruise/descent functions, the zero-fuel-mass
   iteration, rules of thumb as sanity bands (marked common practice), and
   every infeasible mission and bad argument as a named error. */
#include "check.h"
#include "fixtures.h"

#include <acperf.h>

/* The invented operator's standard sector: 500 NM at FL350. */
static acp_mission *sector(double nm, double fl) {
  acp_mission *m = acp_mission_new();
  assert_non_null(m);
  assert_int_equal(acp_mission_set(m, "distance", nm * ACP_NM), ACP_OK);
  assert_int_equal(acp_mission_set(m, "cruise_altitude", fl * ACP_FL), ACP_OK);
  return m;
}

static void test_mission_keys(void **state) {
  (void)state;
  acp_mission *m = acp_mission_new();
  double v = 0.0;
  /* typical defaults (common practice; the approved fuel policy governs) */
  assert_int_equal(acp_mission_get(m, "contingency_fraction", &v), ACP_OK);
  CHECK_CLOSE(v, 0.05, 0.0, 0.0, "contingency 5 % of trip fuel");
  assert_int_equal(acp_mission_get(m, "final_reserve_time", &v), ACP_OK);
  CHECK_CLOSE(v, 1800.0, 0.0, 0.0, "final reserve 30 min");
  assert_int_equal(acp_mission_get(m, "holding_height", &v), ACP_OK);
  CHECK_CLOSE(v, 1500 * ACP_FT, 1e-9, 0.0, "holding 1,500 ft above the destination");
  assert_int_equal(acp_mission_get(m, "taxi_time", &v), ACP_OK);
  CHECK_CLOSE(v, 600.0, 0.0, 0.0, "taxi 10 min");
  assert_int_equal(acp_mission_get(m, "cruise_mode", &v), ACP_OK);
  CHECK_CLOSE(v, ACP_CRUISE_FIXED_MACH, 0.0, 0.0, "fixed Mach by default");
  assert_int_equal(acp_mission_get(m, "taxi_fuel", &v), ACP_OK);
  CHECK_NAN(v, "taxi fuel estimated unless set");
  assert_int_equal(acp_mission_get(m, "distance", &v), ACP_OK);
  CHECK_NAN(v, "distance has no default");
  /* set and get back */
  assert_int_equal(acp_mission_set(m, "wind", -25.0), ACP_OK);
  assert_int_equal(acp_mission_get(m, "wind", &v), ACP_OK);
  CHECK_CLOSE(v, -25.0, 0.0, 0.0, "wind");
  assert_int_equal(acp_mission_set(m, "step_climb", 0.0), ACP_OK);
  assert_int_equal(acp_mission_set(m, "step_climb", 609.6), ACP_OK);
  /* errors */
  assert_int_equal(acp_mission_set(m, "no_such_key", 1.0), ACP_ERR_UNKNOWN_KEY);
  assert_int_equal(acp_mission_get(m, "no_such_key", &v), ACP_ERR_UNKNOWN_KEY);
  CHECK_NAN(v, "NaN on error");
  assert_int_equal(acp_mission_set(m, "wind", NAN), ACP_ERR_INVALID);
  assert_int_equal(acp_mission_set(m, "wind", INFINITY), ACP_ERR_INVALID);
  assert_int_equal(acp_mission_set(m, "wind", 150.0), ACP_ERR_RANGE);
  assert_int_equal(acp_mission_set(m, "distance", 10.0), ACP_ERR_RANGE);
  assert_int_equal(acp_mission_set(m, "contingency_fraction", -0.01), ACP_ERR_RANGE);
  assert_int_equal(acp_mission_set(m, "cruise_mode", 2.5), ACP_ERR_INVALID);
  assert_int_equal(acp_mission_set(m, "cruise_mode", 6), ACP_ERR_RANGE);
  assert_int_equal(acp_mission_set(m, "step_climb", 50.0), ACP_ERR_RANGE);
  assert_int_equal(acp_mission_set(NULL, "wind", 1.0), ACP_ERR_INVALID);
  assert_int_equal(acp_mission_set(m, NULL, 1.0), ACP_ERR_INVALID);
  assert_int_equal(acp_mission_get(m, "wind", NULL), ACP_ERR_INVALID);
  assert_int_equal(acp_mission_get(NULL, "wind", &v), ACP_ERR_INVALID);
  assert_int_equal(acp_mission_get(m, "wind", &v), ACP_OK);
  CHECK_CLOSE(v, -25.0, 0.0, 0.0, "unchanged by the failed sets");
  acp_mission_free(m);
  acp_mission_free(NULL);
}

/* The phases add up, the fuel policy is applied as documented, and the
   trip is the composition of the public climb, cruise and descent. */
static void test_bookkeeping(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_example("regional_jet.toml");
  acp_mission *m = sector(500, 350);
  const double zfw = 32000.0;
  acp_trip_result t;
  assert_int_equal(acp_trip_for_zero_fuel_mass(ac, m, zfw, &t), ACP_OK);
  CHECK_CLOSE(t.infeasible, ACP_TRIP_FEASIBLE, 0.0, 0.0, "feasible");
  CHECK_NAN(t.excess, "no excess");
  CHECK_CLOSE(t.zero_fuel_mass, zfw, 0.1, 0.0, "zero-fuel mass matched to 0.1 kg");
  assert_true(t.iterations >= 2.0 && t.iterations <= 30.0);
  CHECK_CLOSE(t.climb_distance + t.climb_acceleration_distance + t.cruise_distance +
                  t.descent_deceleration_distance + t.descent_distance +
                  t.approach_deceleration_distance,
              500 * ACP_NM, 1.0, 0.0, "phases cover the distance (top of descent to 1 m)");
  CHECK_CLOSE(t.climb_fuel + t.climb_acceleration_fuel + t.cruise_fuel + t.descent_deceleration_fuel +
                  t.descent_fuel + t.approach_deceleration_fuel,
              t.trip_fuel, 0.0, 1e-12, "trip fuel");
  CHECK_CLOSE(t.climb_time + t.climb_acceleration_time + t.cruise_time + t.descent_deceleration_time +
                  t.descent_time + t.approach_deceleration_time,
              t.trip_time, 0.0, 1e-12, "trip time");
  /* the demo jet climbs at Mach 0.76 and cruises at 0.78: it accelerates at
     the top of climb; it descends at 0.78, so it does not decelerate there; it
     decelerates to its approach_cas at the end of the descent */
  assert_true(t.climb_acceleration_time > 0.0 && t.climb_acceleration_fuel > 0.0);
  CHECK_CLOSE(t.descent_deceleration_time, 0.0, 0.0, 0.0, "descent as fast as the cruise");
  assert_true(t.approach_deceleration_time > 0.0 && t.approach_deceleration_fuel > 0.0);
  CHECK_CLOSE(t.takeoff_mass - t.landing_mass, t.trip_fuel, 0.0, 1e-12, "TOW - LW = trip fuel");
  CHECK_CLOSE(t.contingency_fuel, 0.05 * t.trip_fuel, 0.0, 1e-12, "contingency 5 %");
  CHECK_CLOSE(t.alternate_fuel, 0.0, 0.0, 0.0, "no alternate given");
  CHECK_CLOSE(t.block_fuel,
              t.taxi_fuel + t.trip_fuel + t.contingency_fuel + t.alternate_fuel +
                  t.final_reserve_fuel,
              0.0, 1e-12, "block fuel");
  CHECK_CLOSE(t.takeoff_fuel, t.block_fuel - t.taxi_fuel, 0.0, 1e-12, "fuel at take-off");
  CHECK_CLOSE(t.takeoff_mass, t.zero_fuel_mass + t.takeoff_fuel, 1e-6, 0.0, "TOW = ZFW + fuel");
  CHECK_CLOSE(t.ramp_mass, t.takeoff_mass + t.taxi_fuel, 0.0, 1e-12, "ramp mass");
  CHECK_CLOSE(t.block_time, t.trip_time + 600.0, 0.0, 1e-12, "block time = trip + taxi");
  /* taxi fuel: 10 min at the engines' flight-idle fuel flow (the file's 0.07
     kg/s per engine, referred, at sea level and about 10 kt) */
  CHECK_CLOSE(t.taxi_fuel, 600.0 * 2 * 0.07, 0.0, 1e-3, "taxi fuel from idle fuel flow");
  /* final reserve: 30 min at the least fuel flow, between the fuel flows at
     its end mass (ZFW) and its start mass (ZFW + reserve) */
  acp_cruise_point lo, hi;
  const double hh = 1500 * ACP_FT;
  assert_int_equal(acp_cruise_speed(ac, ACP_CRUISE_MAX_ENDURANCE, 0, t.zero_fuel_mass, hh, 0, 0,
                                    &lo),
                   ACP_OK);
  assert_int_equal(acp_cruise_speed(ac, ACP_CRUISE_MAX_ENDURANCE, 0,
                                    t.zero_fuel_mass + t.final_reserve_fuel, hh, 0, 0, &hi),
                   ACP_OK);
  assert_true(t.final_reserve_fuel > 1800.0 * lo.fuel_flow);
  assert_true(t.final_reserve_fuel < 1800.0 * hi.fuel_flow);
  /* recomposition from the public functions */
  acp_profile cl, de;
  acp_cruise_result cr;
  assert_int_equal(acp_climb(ac, t.takeoff_mass, 0, 350 * ACP_FL, 0, 0, 0, &cl), ACP_OK);
  CHECK_CLOSE(cl.mass_end, t.top_of_climb_mass, 0.0, 1e-12, "top of climb");
  acp_cruise_point cp;
  assert_int_equal(acp_cruise_speed(ac, ACP_CRUISE_FIXED_MACH, 0, cl.mass_end, 350 * ACP_FL, 0, 0,
                                    &cp), ACP_OK);
  acp_profile acc;
  assert_int_equal(acp_level_speed_change(ac, cl.mass_end, 350 * ACP_FL, 0, 0, cl.tas_end, cp.tas,
                                          &acc), ACP_OK);
  CHECK_CLOSE(acc.fuel, t.climb_acceleration_fuel, 0.0, 1e-12, "acceleration at the top of climb");
  assert_int_equal(acp_cruise(ac, ACP_CRUISE_FIXED_MACH, 0, acc.mass_end, 350 * ACP_FL, 0, 0,
                              ACP_CRUISE_END_DISTANCE, t.cruise_distance, 0, 0, &cr),
                   ACP_OK);
  CHECK_CLOSE(cr.mass_end, t.top_of_descent_mass, 0.0, 1e-12, "top of descent");
  assert_int_equal(acp_descent(ac, cr.mass_end, 350 * ACP_FL, 0, 0, 0, 0, &de), ACP_OK);
  double vapp;
  assert_int_equal(acp_aircraft_get(ac, "approach_cas", &vapp), ACP_OK);
  acp_profile app;
  assert_int_equal(acp_level_speed_change(ac, de.mass_end, 0, 0, 0, de.tas_end,
                                          acp_cas_to_tas(vapp, 0, 0), &app), ACP_OK);
  CHECK_CLOSE(app.mass_end, t.landing_mass, 0.0, 1e-12, "landing");
  /* the same trip from the take-off mass found */
  acp_trip_result u;
  assert_int_equal(acp_trip(ac, m, t.takeoff_mass, &u), ACP_OK);
  CHECK_CLOSE(u.zero_fuel_mass, zfw, 0.1, 0.0, "acp_trip at that mass gives the zero-fuel mass");
  CHECK_CLOSE(u.iterations, 1.0, 0.0, 0.0, "one pass");
  /* sanity bands for an invented ~40 t regional jet (common practice, from
     memory: such jets burn roughly 3 to 4.5 kg per NM on a 500 NM sector;
     band widened to 2.5 to 5 as a sanity check, not a validation) */
  const double per_nm = t.trip_fuel / 500.0;
  assert_true(per_nm > 2.5 && per_nm < 5.0);
  /* trip time: more than the distance at the cruise TAS, less than that + 30 min */
  const double v_cruise = 0.78 * acp_isa_sound_speed(350 * ACP_FL, 0);
  assert_true(t.trip_time > 500 * ACP_NM / v_cruise);
  assert_true(t.trip_time < 500 * ACP_NM / v_cruise + 1800.0);
  acp_mission_free(m);
  acp_aircraft_free(ac);
}

/* Fuel-policy keys: alternate, contingency minimum, no final reserve, taxi fuel given. */
static void test_policy(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_example("regional_jet.toml");
  acp_mission *m = sector(400, 330);
  acp_trip_result a, b;
  assert_int_equal(acp_trip_for_zero_fuel_mass(ac, m, 31000, &a), ACP_OK);
  assert_int_equal(acp_mission_set(m, "alternate_fuel", 1200), ACP_OK);
  assert_int_equal(acp_mission_set(m, "contingency_minimum", 300), ACP_OK);
  assert_int_equal(acp_mission_set(m, "taxi_fuel", 150), ACP_OK);
  assert_int_equal(acp_trip_for_zero_fuel_mass(ac, m, 31000, &b), ACP_OK);
  CHECK_CLOSE(b.alternate_fuel, 1200.0, 0.0, 0.0, "alternate fuel");
  CHECK_CLOSE(b.contingency_fuel, 300.0, 0.0, 0.0, "contingency minimum applies (5 % < 300 kg)");
  CHECK_CLOSE(b.taxi_fuel, 150.0, 0.0, 0.0, "taxi fuel given");
  /* carrying 1,500 kg more costs trip fuel: the heavier aircraft burns more */
  assert_true(b.trip_fuel > a.trip_fuel);
  assert_true(b.takeoff_mass > a.takeoff_mass + 1200.0);
  assert_int_equal(acp_mission_set(m, "final_reserve_time", 0), ACP_OK);
  assert_int_equal(acp_trip_for_zero_fuel_mass(ac, m, 31000, &b), ACP_OK);
  CHECK_CLOSE(b.final_reserve_fuel, 0.0, 0.0, 0.0, "no final reserve");
  acp_mission_free(m);
  acp_aircraft_free(ac);
}

/* Speed modes and wind in a trip (common practice): maximum range burns the
   least cruise fuel, long-range cruise about 1 % more per distance and is
   faster; a headwind costs fuel and time, a tailwind saves them. */
static void test_modes_and_wind(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_example("regional_jet.toml");
  acp_mission *m = sector(800, 350);
  acp_trip_result mr, lrc, eco, head, still, tail;
  assert_int_equal(acp_mission_set(m, "cruise_mode", ACP_CRUISE_MAX_RANGE), ACP_OK);
  assert_int_equal(acp_trip_for_zero_fuel_mass(ac, m, 30000, &mr), ACP_OK);
  assert_int_equal(acp_mission_set(m, "cruise_mode", ACP_CRUISE_LONG_RANGE), ACP_OK);
  assert_int_equal(acp_trip_for_zero_fuel_mass(ac, m, 30000, &lrc), ACP_OK);
  assert_int_equal(acp_mission_set(m, "cruise_mode", ACP_CRUISE_ECONOMY), ACP_OK);
  assert_int_equal(acp_mission_set(m, "cost_index", 40), ACP_OK);
  assert_int_equal(acp_trip_for_zero_fuel_mass(ac, m, 30000, &eco), ACP_OK);
  assert_true(mr.trip_fuel < lrc.trip_fuel && lrc.trip_fuel < eco.trip_fuel);
  assert_true(mr.trip_time > lrc.trip_time && lrc.trip_time > eco.trip_time);
  /* SAR 0.99 of the maximum at every point: the mean SARs differ by about 1/0.99 */
  CHECK_CLOSE(mr.cruise_sar_mean / lrc.cruise_sar_mean, 1.0 / 0.99, 0.0, 1e-3,
              "long-range cruise: 1 % less SAR");
  assert_int_equal(acp_mission_set(m, "cruise_mode", ACP_CRUISE_LONG_RANGE), ACP_OK);
  assert_int_equal(acp_mission_set(m, "wind", -25.7), ACP_OK); /* 50 kt headwind */
  assert_int_equal(acp_trip_for_zero_fuel_mass(ac, m, 30000, &head), ACP_OK);
  assert_int_equal(acp_mission_set(m, "wind", 0), ACP_OK);
  assert_int_equal(acp_trip_for_zero_fuel_mass(ac, m, 30000, &still), ACP_OK);
  assert_int_equal(acp_mission_set(m, "wind", 25.7), ACP_OK);
  assert_int_equal(acp_trip_for_zero_fuel_mass(ac, m, 30000, &tail), ACP_OK);
  assert_true(head.trip_fuel > still.trip_fuel && still.trip_fuel > tail.trip_fuel);
  assert_true(head.trip_time > still.trip_time && still.trip_time > tail.trip_time);
  /* sanity band: the air distance of the cruise grows as TAS/(TAS - wind),
     about 13 % for 50 kt against 446 kt; the climb burns about the same, the
     cruise covers more ground (climb and descent cover less) and the
     long-range speed rises into the wind: expect 5 % to 20 % more trip fuel */
  const double ratio = head.trip_fuel / still.trip_fuel;
  assert_true(ratio > 1.05 && ratio < 1.20);
  acp_mission_free(m);
  acp_aircraft_free(ac);
}

/* A trip with step climbs climbs from FL310 and burns less than one without. */
static void test_trip_step_climbs(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_example("regional_jet.toml");
  acp_mission *m = sector(1200, 310);
  acp_trip_result flat, step;
  assert_int_equal(acp_mission_set(m, "cruise_mode", ACP_CRUISE_LONG_RANGE), ACP_OK);
  assert_int_equal(acp_trip_for_zero_fuel_mass(ac, m, 31000, &flat), ACP_OK);
  assert_int_equal(acp_mission_set(m, "step_climb", 2000 * ACP_FT), ACP_OK);
  assert_int_equal(acp_trip_for_zero_fuel_mass(ac, m, 31000, &step), ACP_OK);
  assert_true(step.cruise_altitude_end > 310 * ACP_FL);
  assert_true(step.cruise_altitude_end <= 370 * ACP_FL + 1e-6);
  CHECK_CLOSE(flat.cruise_altitude_end, 310 * ACP_FL, 1e-9, 0.0, "no step climb");
  assert_true(step.trip_fuel < flat.trip_fuel);
  CHECK_CLOSE(step.climb_distance + step.climb_acceleration_distance + step.cruise_distance +
                  step.descent_deceleration_distance + step.descent_distance +
                  step.approach_deceleration_distance,
              1200 * ACP_NM, 1.0, 0.0, "distance closes with step climbs");
  acp_mission_free(m);
  acp_aircraft_free(ac);
}

static void check_infeasible(int st, const acp_trip_result *t, int want_st, int why, double excess,
                             double tol, const char *label) {
  if (st != want_st) print_error("%s: status %d want %d\n", label, st, want_st);
  assert_int_equal(st, want_st);
  CHECK_CLOSE(t->infeasible, why, 0.0, 0.0, label);
  if (tol < 0.0) assert_true(t->excess > 0.0); /* only its sign is known */
  else if (isnan(excess)) CHECK_NAN(t->excess, label);
  else CHECK_CLOSE(t->excess, excess, tol, 0.0, label);
  CHECK_NAN(t->trip_fuel, label);
  CHECK_NAN(t->takeoff_mass, label);
  CHECK_NAN(t->block_fuel, label);
}

/* Every infeasible mission is a named error with its reason and excess. */
static void test_infeasible(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_example("regional_jet.toml");
  acp_mission *m = sector(500, 350);
  acp_trip_result t;
  int st;
  st = acp_trip(ac, m, 41000, &t);
  check_infeasible(st, &t, ACP_ERR_RANGE, ACP_TRIP_OVER_MAX_TAKEOFF, 1000.0, 1e-9, "MTOW");
  st = acp_trip_for_zero_fuel_mass(ac, m, 35000, &t);
  check_infeasible(st, &t, ACP_ERR_RANGE, ACP_TRIP_OVER_MAX_ZERO_FUEL, 500.0, 1e-9, "MZFW");
  /* a take-off mass whose reserves leave a zero-fuel mass above the limit */
  st = acp_trip(ac, m, 38000, &t);
  assert_int_equal(st, ACP_ERR_RANGE);
  CHECK_CLOSE(t.infeasible, ACP_TRIP_OVER_MAX_ZERO_FUEL, 0.0, 0.0, "MZFW from a take-off mass");
  assert_true(t.excess > 0.0);
  /* long sector and heavy: above MTOW */
  acp_mission *far = sector(1500, 350);
  assert_int_equal(acp_mission_set(far, "alternate_fuel", 1000), ACP_OK);
  st = acp_trip_for_zero_fuel_mass(ac, far, 34000, &t);
  assert_int_equal(st, ACP_ERR_RANGE);
  CHECK_CLOSE(t.infeasible, ACP_TRIP_OVER_MAX_TAKEOFF, 0.0, 0.0, "needed take-off mass above MTOW");
  assert_true(t.excess > 0.0);
  /* short sector with a big alternate: lands above MLW */
  acp_mission *near = sector(300, 350);
  assert_int_equal(acp_mission_set(near, "alternate_fuel", 2500), ACP_OK);
  st = acp_trip_for_zero_fuel_mass(ac, near, 34000, &t);
  assert_int_equal(st, ACP_ERR_RANGE);
  CHECK_CLOSE(t.infeasible, ACP_TRIP_OVER_MAX_LANDING, 0.0, 0.0, "MLW");
  assert_true(t.excess > 0.0 && t.excess < 500.0);
  /* too little tank */
  assert_int_equal(acp_aircraft_set(ac, "fuel_capacity", 2000), ACP_OK);
  st = acp_trip_for_zero_fuel_mass(ac, m, 32000, &t);
  assert_int_equal(st, ACP_ERR_RANGE);
  CHECK_CLOSE(t.infeasible, ACP_TRIP_OVER_FUEL_CAPACITY, 0.0, 0.0, "fuel capacity");
  assert_true(t.excess > 0.0);
  assert_int_equal(acp_aircraft_set(ac, "fuel_capacity", 9000), ACP_OK);
  /* shorter than climb + descent */
  acp_mission *hop = sector(150, 350);
  st = acp_trip_for_zero_fuel_mass(ac, hop, 32000, &t);
  check_infeasible(st, &t, ACP_ERR_RANGE, ACP_TRIP_TOO_SHORT, NAN, -1, "too short (missing m)");
  /* above max_altitude (37,000 ft) */
  acp_mission *high = sector(800, 390);
  st = acp_trip(ac, high, 36000, &t);
  assert_int_equal(st, ACP_ERR_RANGE);
  CHECK_CLOSE(t.infeasible, ACP_TRIP_ABOVE_MAX_ALTITUDE, 0.0, 0.0, "above max_altitude");
  CHECK_CLOSE(t.excess, 2000 * ACP_FT, 1e-6, 0.0, "by 2,000 ft");
  /* without the altitude limit the climb to 15,000 m cannot be made */
  assert_int_equal(acp_aircraft_unset(ac, "max_altitude"), ACP_OK);
  assert_int_equal(acp_mission_set(high, "cruise_altitude", 15000), ACP_OK);
  st = acp_trip(ac, high, 38000, &t);
  check_infeasible(st, &t, ACP_ERR_THRUST, ACP_TRIP_CANNOT_CLIMB, NAN, 0, "cannot climb");
  /* a cruise Mach the engines cannot hold (MMO removed, wave drag) */
  assert_int_equal(acp_aircraft_unset(ac, "mmo"), ACP_OK);
  assert_int_equal(acp_aircraft_set(ac, "cruise_mach", 0.93), ACP_OK);
  st = acp_trip(ac, m, 38000, &t);
  check_infeasible(st, &t, ACP_ERR_THRUST, ACP_TRIP_CANNOT_CRUISE, NAN, 0, "cannot cruise");
  assert_int_equal(acp_aircraft_set(ac, "cruise_mach", 0.78), ACP_OK);
  /* cruise altitude not above the airports */
  acp_mission *low = sector(300, 350);
  assert_int_equal(acp_mission_set(low, "destination_altitude", 1000), ACP_OK);
  assert_int_equal(acp_mission_set(low, "cruise_altitude", 800), ACP_OK);
  st = acp_trip(ac, low, 36000, &t);
  check_infeasible(st, &t, ACP_ERR_RANGE, ACP_TRIP_CRUISE_TOO_LOW, 200.0, 1e-9, "cruise too low");
  /* reserves larger than the aircraft: the landing mass less them is below the
     operating empty mass */
  assert_int_equal(acp_mission_set(m, "alternate_fuel", 1.0e6), ACP_OK);
  st = acp_trip(ac, m, 36000, &t);
  assert_int_equal(st, ACP_ERR_RANGE);
  CHECK_CLOSE(t.infeasible, ACP_TRIP_BELOW_OPERATING_EMPTY, 0.0, 0.0, "reserves below empty");
  acp_mission_free(m);
  acp_mission_free(far);
  acp_mission_free(near);
  acp_mission_free(hop);
  acp_mission_free(high);
  acp_mission_free(low);
  acp_aircraft_free(ac);
}

static void test_bad_arguments(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_example("regional_jet.toml");
  acp_mission *m = sector(500, 350);
  acp_trip_result t;
  assert_int_equal(acp_trip(NULL, m, 36000, &t), ACP_ERR_INVALID);
  CHECK_NAN(t.trip_fuel, "NaN out");
  CHECK_NAN(t.infeasible, "no reason for a bad argument");
  assert_int_equal(acp_trip(ac, NULL, 36000, &t), ACP_ERR_INVALID);
  assert_int_equal(acp_trip(ac, m, 36000, NULL), ACP_ERR_INVALID);
  assert_int_equal(acp_trip_for_zero_fuel_mass(NULL, m, 30000, &t), ACP_ERR_INVALID);
  assert_int_equal(acp_trip_for_zero_fuel_mass(ac, m, 30000, NULL), ACP_ERR_INVALID);
  const double bad[] = {NAN, INFINITY, -INFINITY};
  for (size_t i = 0; i < 3; ++i) {
    assert_int_equal(acp_trip(ac, m, bad[i], &t), ACP_ERR_INVALID);
    CHECK_NAN(t.block_fuel, "NaN out");
    assert_int_equal(acp_trip_for_zero_fuel_mass(ac, m, bad[i], &t), ACP_ERR_INVALID);
  }
  assert_int_equal(acp_trip(ac, m, 0.5, &t), ACP_ERR_RANGE);
  assert_int_equal(acp_trip_for_zero_fuel_mass(ac, m, -5, &t), ACP_ERR_RANGE);
  /* a mission without its distance or cruise altitude */
  acp_mission *empty = acp_mission_new();
  assert_int_equal(acp_trip(ac, empty, 36000, &t), ACP_ERR_INVALID);
  assert_int_equal(acp_mission_set(empty, "distance", 500 * ACP_NM), ACP_OK);
  assert_int_equal(acp_trip(ac, empty, 36000, &t), ACP_ERR_INVALID);
  acp_mission_free(empty);
  /* an aircraft without engines, or without a climb schedule */
  acp_aircraft *drag_only = acp_aircraft_new();
  char err[128];
  assert_int_equal(
      acp_aircraft_parse(drag_only, "wing_area = 30\nspan = 15\ncd0 = 0.02\noswald = 0.8\n", err,
                         sizeof err),
      ACP_OK);
  assert_int_equal(acp_trip(drag_only, m, 5000, &t), ACP_ERR_INVALID);
  acp_aircraft_free(drag_only);
  assert_int_equal(acp_aircraft_unset(ac, "climb_cas"), ACP_OK);
  assert_int_equal(acp_trip(ac, m, 36000, &t), ACP_ERR_INVALID);
  CHECK_NAN(t.trip_fuel, "NaN out");
  acp_mission_free(m);
  acp_aircraft_free(ac);
}

/* The whole profile: a descent slower than the cruise decelerates at the top
   of descent, and a descent that ends at descent_end_height decelerates to
   approach_cas there. Each segment is recomposed from the public functions
   (acp_climb, acp_level_speed_change, acp_cruise, acp_descent) at the trip's
   own masses, and the segments add up to the trip (bookkeeping identities). */
static void test_whole_profile(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_example("regional_jet.toml");
  assert_int_equal(acp_aircraft_set(ac, "descent_mach", 0.74), ACP_OK);
  assert_int_equal(acp_aircraft_set(ac, "approach_cas", 140 * ACP_KT), ACP_OK);
  acp_mission *m = sector(500, 350);
  const double h_end = 1500 * ACP_FT;
  assert_int_equal(acp_mission_set(m, "descent_end_height", h_end), ACP_OK);
  acp_trip_result t;
  assert_int_equal(acp_trip(ac, m, 36000, &t), ACP_OK);
  assert_true(t.descent_deceleration_time > 0.0 && t.descent_deceleration_fuel > 0.0);
  assert_true(t.approach_deceleration_time > 0.0 && t.approach_deceleration_fuel > 0.0);
  CHECK_CLOSE(t.climb_fuel + t.climb_acceleration_fuel + t.cruise_fuel + t.descent_deceleration_fuel +
                  t.descent_fuel + t.approach_deceleration_fuel,
              t.trip_fuel, 0.0, 1e-12, "six segments make the trip fuel");
  CHECK_CLOSE(t.climb_distance + t.climb_acceleration_distance + t.cruise_distance +
                  t.descent_deceleration_distance + t.descent_distance +
                  t.approach_deceleration_distance,
              500 * ACP_NM, 1.0, 0.0, "six segments cover the distance");
  /* recomposition */
  acp_profile cl, acc, dec, de, app;
  acp_cruise_point cp;
  acp_cruise_result cr;
  acp_profile_point top;
  assert_int_equal(acp_climb(ac, 36000, 0, 350 * ACP_FL, 0, 0, 0, &cl), ACP_OK);
  assert_int_equal(acp_cruise_speed(ac, ACP_CRUISE_FIXED_MACH, 0, cl.mass_end, 350 * ACP_FL, 0, 0,
                                    &cp), ACP_OK);
  assert_int_equal(acp_level_speed_change(ac, cl.mass_end, 350 * ACP_FL, 0, 0, cl.tas_end, cp.tas,
                                          &acc), ACP_OK);
  assert_int_equal(acp_cruise(ac, ACP_CRUISE_FIXED_MACH, 0, acc.mass_end, 350 * ACP_FL, 0, 0,
                              ACP_CRUISE_END_DISTANCE, t.cruise_distance, 0, 0, &cr), ACP_OK);
  CHECK_CLOSE(cr.mass_end, t.top_of_descent_mass, 0.0, 1e-12, "top of descent");
  assert_int_equal(acp_descent_point(ac, cr.mass_end, 350 * ACP_FL, 0, 0, &top), ACP_OK);
  CHECK_CLOSE(top.mach, 0.74, 0.0, 1e-9, "the descent starts at its Mach");
  assert_int_equal(acp_level_speed_change(ac, cr.mass_end, 350 * ACP_FL, 0, 0, cr.tas_end, top.tas,
                                          &dec), ACP_OK);
  CHECK_CLOSE(dec.fuel, t.descent_deceleration_fuel, 0.0, 1e-12, "top-of-descent deceleration");
  assert_int_equal(acp_descent(ac, dec.mass_end, 350 * ACP_FL, h_end, 0, 0, 0, &de), ACP_OK);
  CHECK_CLOSE(de.fuel, t.descent_fuel, 0.0, 1e-12, "descent to 1,500 ft");
  assert_int_equal(acp_level_speed_change(ac, de.mass_end, h_end, 0, 0, de.tas_end,
                                          acp_cas_to_tas(140 * ACP_KT, h_end, 0), &app), ACP_OK);
  CHECK_CLOSE(app.fuel, t.approach_deceleration_fuel, 0.0, 1e-12, "approach deceleration");
  CHECK_CLOSE(app.mass_end, t.landing_mass, 0.0, 1e-12, "the landing mass");
  /* the cruise must now lie above the end of the descent */
  assert_int_equal(acp_mission_set(m, "cruise_altitude", 1000 * ACP_FT), ACP_OK);
  assert_int_equal(acp_trip(ac, m, 36000, &t), ACP_ERR_RANGE);
  CHECK_CLOSE(t.infeasible, ACP_TRIP_CRUISE_TOO_LOW, 0.0, 0.0, "cruise below the descent's end");
  acp_mission_free(m);
  acp_aircraft_free(ac);
}

/* Defect 9 of issue 12: a fine cruise_step multiplied by the top-of-descent
   and take-off-mass iterations made trips take seconds (long-range cruise,
   cruise_step 100 m: 3,000 km in 3.7 s, for a zero-fuel mass 16 s), and an
   impossible 9,900 km trip took 18.8 s to say so. The trip's cruise now takes
   at most ACP_TRIP_CRUISE_STEPS_MAX steps (mission.h): a 100 m step gives the
   same trip as the step the cap makes of it (to 1e-9: the cap is taken of
   each top-of-descent pass's cruise distance, which differ by less than a
   metre); and the impossible
   trip stops at the take-off mass limit (it ended as "cannot cruise" at a
   take-off mass far above the limit). Work bounds are what is tested here;
   times are measured by tests/bench, not here. */
static void test_work_bounds(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_example("regional_jet.toml");
  acp_mission *m = acp_mission_new();
  assert_int_equal(acp_mission_set(m, "distance", 3.0e6), ACP_OK);
  assert_int_equal(acp_mission_set(m, "cruise_altitude", 350 * ACP_FL), ACP_OK);
  assert_int_equal(acp_mission_set(m, "cruise_mode", ACP_CRUISE_LONG_RANGE), ACP_OK);
  assert_int_equal(acp_mission_set(m, "cruise_step", 100.0), ACP_OK);
  acp_trip_result fine, capped;
  assert_int_equal(acp_trip(ac, m, 38000, &fine), ACP_OK);
  assert_int_equal(acp_mission_set(m, "cruise_step", fine.cruise_distance / ACP_TRIP_CRUISE_STEPS_MAX),
                   ACP_OK);
  assert_int_equal(acp_trip(ac, m, 38000, &capped), ACP_OK);
  CHECK_CLOSE(fine.trip_fuel, capped.trip_fuel, 0.0, 1e-9, "a 100 m step is the capped step");
  CHECK_CLOSE(fine.cruise_time, capped.cruise_time, 0.0, 1e-9, "the same cruise time");
  /* the capped trip against the default 50 NM step: the same fuel within the
     integration error of Heun's method (1e-5 relative, cruise.md) */
  assert_int_equal(acp_mission_set(m, "cruise_step", 0.0), ACP_OK);
  acp_trip_result coarse;
  assert_int_equal(acp_trip(ac, m, 38000, &coarse), ACP_OK);
  CHECK_CLOSE(fine.trip_fuel, coarse.trip_fuel, 0.0, 1e-5, "capped step against the default");
  /* impossible, for the right reason: the aircraft cannot fly at the take-off
     mass it would need, so the excess is a lower bound, flagged */
  assert_int_equal(acp_mission_set(m, "distance", 9.9e6), ACP_OK);
  acp_trip_result far;
  assert_int_equal(acp_trip_for_zero_fuel_mass(ac, m, 30000, &far), ACP_ERR_RANGE);
  CHECK_CLOSE(far.infeasible, ACP_TRIP_OVER_MAX_TAKEOFF, 0.0, 0.0, "9,900 km: above MTOW");
  assert_true(far.excess > 0.0);
  CHECK_CLOSE(far.excess_at_least, 1.0, 0.0, 0.0, "a lower bound");
  /* a trip that can be flown above the limit: the excess is exact, the take-off
     mass the same aircraft without the limit needs, less the limit */
  assert_int_equal(acp_mission_set(m, "distance", 4.5e6), ACP_OK);
  assert_int_equal(acp_trip_for_zero_fuel_mass(ac, m, 32000, &far), ACP_ERR_RANGE);
  CHECK_CLOSE(far.infeasible, ACP_TRIP_OVER_MAX_TAKEOFF, 0.0, 0.0, "4,500 km: above MTOW");
  CHECK_CLOSE(far.excess_at_least, 0.0, 0.0, 0.0, "an exact excess");
  acp_aircraft *free_ac = aircraft_without_limits(ac);
  acp_trip_result need;
  assert_int_equal(acp_trip_for_zero_fuel_mass(free_ac, m, 32000, &need), ACP_OK);
  CHECK_CLOSE(far.excess, need.takeoff_mass - 40000.0, 0.2, 0.0, "the excess of the converged trip");
  acp_aircraft_free(free_ac);
  /* over the fuel capacity when the take-off mass limit is lifted */
  assert_int_equal(acp_aircraft_unset(ac, "mass_max_takeoff"), ACP_OK);
  assert_int_equal(acp_trip_for_zero_fuel_mass(ac, m, 32000, &far), ACP_ERR_RANGE);
  CHECK_CLOSE(far.infeasible, ACP_TRIP_OVER_FUEL_CAPACITY, 0.0, 0.0, "4,500 km: over capacity");
  CHECK_CLOSE(far.excess, need.block_fuel - 9000.0, 0.2, 0.0, "by the converged block fuel");
  acp_mission_free(m);
  acp_aircraft_free(ac);
}

int main(void) {
  const struct CMUnitTest tests[] = {
      cmocka_unit_test(test_mission_keys),   cmocka_unit_test(test_bookkeeping),
      cmocka_unit_test(test_policy),         cmocka_unit_test(test_modes_and_wind),
      cmocka_unit_test(test_trip_step_climbs), cmocka_unit_test(test_infeasible),
      cmocka_unit_test(test_bad_arguments),  cmocka_unit_test(test_whole_profile),
      cmocka_unit_test(test_work_bounds),
  };
  return cmocka_run_group_tests(tests, NULL, NULL);
}
