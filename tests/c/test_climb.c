/* Climb, descent and ceilings of the invented demo aircraft: convergence, the
   energy equation, the logarithmic time to climb, wind, rules of thumb, errors. */
#include <acperf.h>
#include <stdlib.h>

#include "check.h"
#include "fixtures.h"

static int setup(void **state) {
  *state = aircraft_from_example("regional_jet.toml");
  return 0;
}

static int teardown(void **state) {
  acp_aircraft_free(*state);
  return 0;
}

#define FT ACP_FT

/* Halving the altitude step changes time, distance and fuel by less than 0.1 %
   (the criterion); the Simpson steps give far less. */
static void test_convergence(void **state) {
  const acp_aircraft *ac = *state;
  const double dts[] = {-15.0, 0.0, 20.0};
  for (size_t i = 0; i < 3; ++i) {
    acp_profile a, b;
    assert_int_equal(acp_climb(ac, 38000.0, 1500 * FT, 35000 * FT, dts[i], 0.0, 304.8, &a), ACP_OK);
    assert_int_equal(acp_climb(ac, 38000.0, 1500 * FT, 35000 * FT, dts[i], 0.0, 152.4, &b), ACP_OK);
    CHECK_CLOSE(a.time, b.time, 0.0, 1e-3, "climb time");
    CHECK_CLOSE(a.distance, b.distance, 0.0, 1e-3, "climb distance");
    CHECK_CLOSE(a.fuel, b.fuel, 0.0, 1e-3, "climb fuel");
    assert_int_equal(acp_descent(ac, 33000.0, 35000 * FT, 1500 * FT, dts[i], 0.0, 304.8, &a), ACP_OK);
    assert_int_equal(acp_descent(ac, 33000.0, 35000 * FT, 1500 * FT, dts[i], 0.0, 152.4, &b), ACP_OK);
    CHECK_CLOSE(a.time, b.time, 0.0, 1e-3, "descent time");
    CHECK_CLOSE(a.distance, b.distance, 0.0, 1e-3, "descent distance");
    CHECK_CLOSE(a.fuel, b.fuel, 0.0, 1e-3, "descent fuel");
  }
}

/* Energy bookkeeping along the trace (ISA, so geometric = pressure altitude):
   the work of the excess thrust, integral of (T - D) V dt, equals the gain of
   potential and kinetic energy m g dh + d(m V^2/2), to the quadrature error. */
static void test_energy(void **state) {
  const acp_aircraft *ac = *state;
  acp_profile_point pts[400];
  size_t n;
  acp_profile p;
  /* 500 ft steps: the check's own trapezoid needs the points dense */
  assert_int_equal(acp_climb_trace(ac, 38000.0, 1500 * FT, 35000 * FT, 0.0, 0.0, 152.4, 400, pts,
                                   &n, &p), ACP_OK);
  double work = 0.0, energy = 0.0;
  for (size_t i = 1; i < n; ++i) {
    const acp_profile_point *a = &pts[i - 1], *b = &pts[i];
    const double dt = b->time - a->time, m = 0.5 * (a->mass + b->mass);
    work += 0.5 * dt * ((a->thrust - a->drag) * a->tas + (b->thrust - b->drag) * b->tas);
    energy += m * ACP_G0 * (b->hp - a->hp) + 0.5 * m * (b->tas * b->tas - a->tas * a->tas);
  }
  CHECK_CLOSE(work, energy, 0.0, 2e-3, "work of excess thrust = energy gained");
  /* the trace ends where the totals say */
  CHECK_CLOSE(pts[n - 1].time, p.time, 0.0, 1e-15, "trace end time");
  CHECK_CLOSE(pts[n - 1].hp, 35000 * FT, 1e-9, 0.0, "trace end altitude");
  CHECK_CLOSE(pts[n - 1].mass, p.mass_end, 0.0, 1e-15, "trace end mass");
}

/* Time to climb with a rate of climb falling linearly with altitude is a
   logarithm: t = dh ln(r0/r1)/(r0 - r1) (the classic closed form of
   flight-mechanics texts). Summed over the trace's bands, whose rates are
   nearly linear, it must give the integrator's time. */
static void test_logarithmic_time(void **state) {
  const acp_aircraft *ac = *state;
  acp_profile_point pts[400];
  size_t n;
  acp_profile p;
  /* 10,500 to 29,000 ft: one mode (constant CAS), one layer: no jump in f */
  assert_int_equal(acp_climb_trace(ac, 38000.0, 10500 * FT, 29000 * FT, 0.0, 0.0, 152.4, 400, pts,
                                   &n, &p), ACP_OK);
  double t = 0.0;
  for (size_t i = 1; i < n; ++i) {
    const double r0 = pts[i - 1].rate, r1 = pts[i].rate, dh = pts[i].hp - pts[i - 1].hp;
    t += fabs(r0 - r1) < 1e-12 ? dh / r0 : dh * log(r0 / r1) / (r0 - r1);
  }
  CHECK_CLOSE(t, p.time, 0.0, 1e-3, "logarithmic time to climb");
}

/* An along-track wind moves the ground distance by wind x time and nothing else. */
static void test_wind(void **state) {
  const acp_aircraft *ac = *state;
  acp_profile calm, tail, head;
  assert_int_equal(acp_climb(ac, 38000.0, 1500 * FT, 31000 * FT, 0.0, 0.0, 0.0, &calm), ACP_OK);
  assert_int_equal(acp_climb(ac, 38000.0, 1500 * FT, 31000 * FT, 0.0, 20.0, 0.0, &tail), ACP_OK);
  assert_int_equal(acp_climb(ac, 38000.0, 1500 * FT, 31000 * FT, 0.0, -20.0, 0.0, &head), ACP_OK);
  CHECK_CLOSE(tail.time, calm.time, 0.0, 1e-14, "time independent of wind");
  CHECK_CLOSE(tail.fuel, calm.fuel, 0.0, 1e-14, "fuel independent of wind");
  CHECK_CLOSE(tail.distance - calm.distance, 20.0 * calm.time, 1e-6, 1e-12, "tailwind");
  CHECK_CLOSE(calm.distance - head.distance, 20.0 * calm.time, 1e-6, 1e-12, "headwind");
}

/* Idle descent: about 3 NM per 1,000 ft (common practice; a sanity band of
   2.5 to 4 NM). A warm day climbs slower (physics: less thrust, thinner air). */
static void test_rules_of_thumb(void **state) {
  const acp_aircraft *ac = *state;
  acp_profile d;
  assert_int_equal(acp_descent(ac, 33000.0, 35000 * FT, 1500 * FT, 0.0, 0.0, 0.0, &d), ACP_OK);
  const double nm_per_kft = d.distance / ACP_NM / 33.5;
  assert_true(nm_per_kft > 2.5 && nm_per_kft < 4.0);
  assert_true(d.speed_change_distance > 0.0 && d.speed_change_time > 0.0);
  acp_profile isa, hot;
  assert_int_equal(acp_climb(ac, 38000.0, 1500 * FT, 31000 * FT, 0.0, 0.0, 0.0, &isa), ACP_OK);
  assert_int_equal(acp_climb(ac, 38000.0, 1500 * FT, 31000 * FT, 20.0, 0.0, 0.0, &hot), ACP_OK);
  assert_true(hot.time > isa.time);
  assert_true(isa.speed_change_time > 0.0 && isa.speed_change_fuel > 0.0);
  /* A heavier aircraft climbs slower and burns more. */
  acp_profile heavy;
  assert_int_equal(acp_climb(ac, 40000.0, 1500 * FT, 31000 * FT, 0.0, 0.0, 0.0, &heavy), ACP_OK);
  assert_true(heavy.time > isa.time && heavy.fuel > isa.fuel);
}

/* Points: the climb rate is (T - D) V/(m g f) converted to pressure altitude. */
static void test_points(void **state) {
  const acp_aircraft *ac = *state;
  acp_profile_point c, d;
  assert_int_equal(acp_climb_point(ac, 38000.0, 20000 * FT, 10.0, 0.0, &c), ACP_OK);
  const double t = acp_isa_temperature(20000 * FT, 10.0), ts = acp_isa_temperature(20000 * FT, 0.0);
  CHECK_CLOSE(c.rate, (c.thrust - c.drag) * c.tas / (38000.0 * ACP_G0 * c.acceleration_factor) * ts / t,
              0.0, 1e-12, "energy equation");
  assert_true(c.mode == ACP_MODE_CAS);
  assert_int_equal(acp_descent_point(ac, 38000.0, 20000 * FT, 10.0, 0.0, &d), ACP_OK);
  assert_true(d.rate < 0.0 && d.thrust < c.thrust);
}

static void test_ceilings(void **state) {
  const acp_aircraft *ac = *state;
  acp_ceiling_set cs;
  assert_int_equal(acp_ceilings(ac, 38000.0, 0.0, &cs), ACP_OK);
  /* the ceilings lie above max_altitude: the rates there on a copy without it */
  acp_aircraft *free_ac = aircraft_without_limits(ac);
  acp_profile_point p;
  assert_int_equal(acp_climb_point(free_ac, 38000.0, cs.service_ceiling, 0.0, 0.0, &p), ACP_OK);
  CHECK_CLOSE(p.rate / ACP_FPM, 100.0, 0.5, 0.0, "100 ft/min at the service ceiling");
  assert_int_equal(acp_climb_point(free_ac, 38000.0, cs.max_climb_altitude, 0.0, 0.0, &p), ACP_OK);
  CHECK_CLOSE(p.rate / ACP_FPM, 300.0, 0.5, 0.0, "300 ft/min");
  acp_aircraft_free(free_ac);
  /* 1.3 g at cruise_mach reaches cl_buffet at the buffet altitude */
  double m, s, clb;
  assert_int_equal(acp_aircraft_get(ac, "cruise_mach", &m), ACP_OK);
  assert_int_equal(acp_aircraft_get(ac, "wing_area", &s), ACP_OK);
  assert_int_equal(acp_aircraft_get(ac, "cl_buffet", &clb), ACP_OK);
  CHECK_CLOSE(1.3 * 38000.0 * ACP_G0 / (0.7 * acp_isa_pressure(cs.buffet_altitude) * m * m * s), clb,
              0.0, 1e-9, "buffet margin");
  assert_true(cs.max_cruise_altitude <= cs.max_climb_altitude);
  assert_true(cs.max_cruise_altitude <= cs.buffet_altitude);
  assert_true(cs.service_ceiling > cs.max_climb_altitude);
  /* heavier: lower ceilings */
  acp_ceiling_set heavy;
  assert_int_equal(acp_ceilings(ac, 40000.0, 0.0, &heavy), ACP_OK);
  assert_true(heavy.service_ceiling < cs.service_ceiling && heavy.buffet_altitude < cs.buffet_altitude);
}

/* The bound on a climb's work, at the bound: the least step over the whole
   altitude range of the model below max_altitude (the trace's count is known
   before integrating: 1 + ceil(span/step) + cuts + the speed change), and the
   next double below it refused. */
static void test_work_bound(void **state) {
  const acp_aircraft *ac = *state;
  acp_profile p;
  size_t need = 0;
  const double top = 11000.0;
  assert_int_equal(acp_climb_trace(ac, 30000.0, 0.0, top, 0, 0, ACP_CLIMB_STEP_MIN, 0, NULL, &need, &p),
                   ACP_ERR_RANGE);
  assert_true(need >= 1 + (size_t)(top / ACP_CLIMB_STEP_MIN) &&
              need <= 1 + (size_t)(top / ACP_CLIMB_STEP_MIN) + 4 + ACP_SPEED_CHANGE_STEPS);
  assert_int_equal(acp_climb(ac, 30000.0, 0.0, top, 0, 0, ACP_CLIMB_STEP_MIN, &p), ACP_OK);
  assert_int_equal(acp_climb(ac, 30000.0, 0.0, top, 0, 0, nextafter(ACP_CLIMB_STEP_MIN, 0.0), &p),
                   ACP_ERR_RANGE);
  assert_int_equal(acp_climb(ac, 30000.0, 0.0, top, 0, 0, ACP_CLIMB_STEP_MAX, &p), ACP_OK);
  assert_int_equal(acp_climb(ac, 30000.0, 0.0, top, 0, 0, nextafter(ACP_CLIMB_STEP_MAX, 2e3), &p),
                   ACP_ERR_RANGE);
}

static void test_errors(void **state) {
  const acp_aircraft *ac = *state;
  acp_profile p;
  const double nan = (double)NAN;
  /* cannot reach 45,000 ft: the climb rate reaches zero first (on a copy
     without max_altitude, which would refuse the end altitude first) */
  acp_aircraft *free_ac = aircraft_without_limits(ac);
  assert_int_equal(acp_climb(free_ac, 38000.0, 1500 * FT, 45000 * FT, 0.0, 0.0, 0.0, &p),
                   ACP_ERR_THRUST);
  CHECK_NAN(p.fuel, "NaN on error");
  CHECK_NAN(p.limit, "no aircraft limit named for a thrust error");
  acp_aircraft_free(free_ac);
  assert_int_equal(acp_climb(ac, nan, 0.0, 3000.0, 0.0, 0.0, 0.0, &p), ACP_ERR_INVALID);
  assert_int_equal(acp_climb(ac, 38000.0, 3000.0, 1000.0, 0.0, 0.0, 0.0, &p), ACP_ERR_INVALID);
  assert_int_equal(acp_descent(ac, 38000.0, 1000.0, 3000.0, 0.0, 0.0, 0.0, &p), ACP_ERR_INVALID);
  assert_int_equal(acp_climb(ac, 38000.0, 0.0, 3000.0, 0.0, 0.0, 5.0, &p), ACP_ERR_RANGE);
  assert_int_equal(acp_climb(ac, 38000.0, 0.0, 3000.0, 0.0, (double)INFINITY, 0.0, &p),
                   ACP_ERR_INVALID);
  assert_int_equal(acp_climb(ac, 38000.0, 0.0, 90000.0, 0.0, 0.0, 0.0, &p), ACP_ERR_RANGE);
  assert_int_equal(acp_climb(NULL, 38000.0, 0.0, 3000.0, 0.0, 0.0, 0.0, &p), ACP_ERR_INVALID);
  assert_int_equal(acp_climb(ac, 38000.0, 0.0, 3000.0, 0.0, 0.0, 0.0, NULL), ACP_ERR_INVALID);
  /* a headwind stronger than the airspeed: no positive ground speed */
  assert_int_equal(acp_climb(ac, 38000.0, 0.0, 3000.0, 0.0, -300.0, 0.0, &p), ACP_ERR_RANGE);
  /* trace capacity: nothing integrated, the count needed given */
  acp_profile_point pts[4];
  size_t n = 0;
  assert_int_equal(acp_climb_trace(ac, 38000.0, 0.0, 3000.0, 0.0, 0.0, 0.0, 4, pts, &n, &p),
                   ACP_ERR_RANGE);
  assert_true(n > 4);
  /* an aircraft without engine keys */
  acp_aircraft *bare = acp_aircraft_new();
  assert_int_equal(acp_aircraft_set(bare, "wing_area", 30.0), ACP_OK);
  assert_int_equal(acp_aircraft_set(bare, "span", 15.0), ACP_OK);
  assert_int_equal(acp_aircraft_set(bare, "cd0", 0.025), ACP_OK);
  assert_int_equal(acp_aircraft_set(bare, "oswald", 0.8), ACP_OK);
  assert_int_equal(acp_climb(bare, 5000.0, 0.0, 3000.0, 0.0, 0.0, 0.0, &p), ACP_ERR_INVALID);
  acp_ceiling_set cs;
  assert_int_equal(acp_ceilings(bare, 5000.0, 0.0, &cs), ACP_ERR_INVALID);
  CHECK_NAN(cs.service_ceiling, "NaN on error");
  acp_aircraft_free(bare);
}

/* The light twin turboprop climbs too (propeller thrust eta P/V). */
static void test_turboprop(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_example("light_twin.toml");
  acp_profile a, b;
  assert_int_equal(acp_climb(ac, 5500.0, 1000 * FT, 20000 * FT, 0.0, 0.0, 304.8, &a), ACP_OK);
  assert_int_equal(acp_climb(ac, 5500.0, 1000 * FT, 20000 * FT, 0.0, 0.0, 152.4, &b), ACP_OK);
  CHECK_CLOSE(a.fuel, b.fuel, 0.0, 1e-3, "turboprop convergence");
  /* The 3 NM per 1,000 ft rule is a jet's; this turboprop's idle descent at
     200 kt has L/D about 10.6 at idle thrust, so about 1.8 NM per 1,000 ft:
     a sanity band of 1.5 to 4 (not a published value). */
  assert_int_equal(acp_descent(ac, 5000.0, 20000 * FT, 1000 * FT, 0.0, 0.0, 0.0, &a), ACP_OK);
  assert_true(a.distance / ACP_NM / 19.0 > 1.5 && a.distance / ACP_NM / 19.0 < 4.0);
  acp_aircraft_free(ac);
}

/* A climb table agrees with single climbs to each altitude; an altitude equal
   to the speed limit (10,000 ft) keeps the level acceleration; unreachable
   altitudes and bad arguments are NaN and counted. */
static void test_table(void **state) {
  const acp_aircraft *ac = *state;
  const double mass[] = {34000.0, 40000.0};
  const double hp[] = {10000 * FT, 25000 * FT, 35000 * FT, 45000 * FT};
  const double dt[] = {-10.0, 0.0, 15.0};
  double t[24], x[24], f[24];
  const size_t bad = acp_climb_table(ac, 1500 * FT, 0.0, 0.0, 2, mass, 4, hp, 3, dt, t, x, f);
  assert_int_equal(bad, 6); /* 45,000 ft: out of reach for every mass and day */
  for (size_t i = 0; i < 2; ++i)
    for (size_t j = 0; j < 4; ++j)
      for (size_t k = 0; k < 3; ++k) {
        const size_t c = (i * 4 + j) * 3 + k;
        acp_profile p;
        const int st = acp_climb(ac, mass[i], 1500 * FT, hp[j], dt[k], 0.0, 0.0, &p);
        if (st != ACP_OK) {
          CHECK_NAN(t[c], "unreachable cell");
          continue;
        }
        CHECK_CLOSE(t[c], p.time, 0.0, 1e-4, "table time");
        CHECK_CLOSE(x[c], p.distance, 0.0, 1e-4, "table distance");
        CHECK_CLOSE(f[c], p.fuel, 0.0, 1e-4, "table fuel");
      }
  /* a climb from the limit altitude accelerates first, as a climb through it does */
  acp_profile from_limit, below;
  assert_int_equal(acp_climb(ac, 38000.0, 10000 * FT, 20000 * FT, 0.0, 0.0, 0.0, &from_limit),
                   ACP_OK);
  assert_int_equal(acp_climb(ac, 38000.0, 9000 * FT, 20000 * FT, 0.0, 0.0, 0.0, &below), ACP_OK);
  assert_true(from_limit.speed_change_time > 0.0);
  CHECK_CLOSE(from_limit.speed_change_fuel, below.speed_change_fuel, 0.0, 0.05, "same speed change");
  /* altitudes not ascending, NULL arrays: every cell NaN */
  const double unsorted[] = {20000 * FT, 10000 * FT};
  assert_int_equal(acp_climb_table(ac, 0.0, 0.0, 0.0, 1, mass, 2, unsorted, 1, dt, t, NULL, NULL), 2);
  CHECK_NAN(t[0], "unsorted");
  assert_int_equal(acp_climb_table(NULL, 0.0, 0.0, 0.0, 1, mass, 1, hp, 1, dt, t, x, f), 1);
  assert_int_equal(acp_climb_table(ac, 0.0, 0.0, 0.0, 1, NULL, 1, hp, 1, dt, t, x, f), 1);
}

/* A level speed change against the test's own integration of dV/dt =
   (T - D)/m, dm/dt = -fuel flow, dx/dt = V + wind (the energy equation at
   constant altitude), in 4,000 midpoint steps of TAS from the public point
   models (acp_drag, acp_engine_rating): accelerating at the climb rating and
   decelerating at flight idle. 1e-4 relative: the library's 12 trapezoidal
   steps err by well under that on these gentle integrands. */
static void integrate_speed_change(const acp_aircraft *ac, double mass, double hp, double wind,
                                   double v0, double v1, int rating, double *t, double *x,
                                   double *fuel) {
  const int n = 4000;
  double m = mass;
  *t = *x = 0.0;
  for (int k = 0; k < n; ++k) {
    const double dv = (v1 - v0) / n, v = v0 + (k + 0.5) * dv;
    acp_drag_parts d;
    acp_engine_point e;
    assert_int_equal(acp_drag(ac, m, hp, 0.0, v, &d), ACP_OK);
    assert_int_equal(acp_engine_rating(ac, rating, hp, 0.0, v, &e), ACP_OK);
    const double dt = dv * m / (e.thrust - d.total);
    *t += dt;
    *x += (v + wind) * dt;
    m -= e.fuel_flow * dt;
  }
  *fuel = mass - m;
}

static void test_level_speed_change(void **state) {
  const acp_aircraft *ac = *state;
  const struct { double mass, hp, wind, v0, v1; int rating; } cases[] = {
      {38000.0, 10000 * FT, 0.0, 130.0, 165.0, ACP_RATING_CLIMB}, /* at the speed limit */
      {36000.0, 35000 * FT, 10.0, 224.0, 230.0, ACP_RATING_CLIMB}, /* top of climb */
      {33000.0, 35000 * FT, -20.0, 230.0, 215.0, ACP_RATING_IDLE}, /* top of descent */
      {33000.0, 1500 * FT, 0.0, 150.0, 75.0, ACP_RATING_IDLE},     /* to an approach speed */
  };
  for (size_t i = 0; i < sizeof cases / sizeof cases[0]; ++i) {
    acp_profile p;
    assert_int_equal(acp_level_speed_change(ac, cases[i].mass, cases[i].hp, 0.0, cases[i].wind,
                                            cases[i].v0, cases[i].v1, &p), ACP_OK);
    double t, x, fuel;
    integrate_speed_change(ac, cases[i].mass, cases[i].hp, cases[i].wind, cases[i].v0, cases[i].v1,
                           cases[i].rating, &t, &x, &fuel);
    CHECK_CLOSE(p.time, t, 0.0, 1e-4, "speed change time");
    CHECK_CLOSE(p.distance, x, 0.0, 1e-4, "speed change distance");
    CHECK_CLOSE(p.fuel, fuel, 0.0, 1e-4, "speed change fuel");
    CHECK_CLOSE(p.mass_end, cases[i].mass - p.fuel, 0.0, 1e-12, "mass booked");
    CHECK_CLOSE(p.tas_end, cases[i].v1, 0.0, 0.0, "end speed");
  }
  acp_profile p;
  assert_int_equal(acp_level_speed_change(ac, 36000.0, 3000.0, 0.0, 0.0, 180.0, 180.0, &p), ACP_OK);
  CHECK_CLOSE(p.fuel, 0.0, 0.0, 0.0, "no change, no fuel");
  assert_int_equal(acp_level_speed_change(ac, 36000.0, 3000.0, 0.0, 0.0, 180.0, NAN, &p),
                   ACP_ERR_INVALID);
  assert_int_equal(acp_level_speed_change(ac, 36000.0, 3000.0, 0.0, 0.0, 180.0, 0.0, &p),
                   ACP_ERR_RANGE);
  /* above VMO (164.6 m/s CAS): a speed limit, named */
  assert_int_equal(acp_level_speed_change(ac, 36000.0, 0.0, 0.0, 0.0, 150.0, 170.0, &p),
                   ACP_ERR_RANGE);
  CHECK_CLOSE(p.limit, ACP_LIMIT_VMO, 0.0, 0.0, "VMO named");
}

int main(void) {
  const struct CMUnitTest tests[] = {
      cmocka_unit_test(test_table),
      cmocka_unit_test(test_convergence), cmocka_unit_test(test_energy),
      cmocka_unit_test(test_logarithmic_time), cmocka_unit_test(test_wind),
      cmocka_unit_test(test_rules_of_thumb), cmocka_unit_test(test_points),
      cmocka_unit_test(test_ceilings), cmocka_unit_test(test_errors),
      cmocka_unit_test(test_turboprop), cmocka_unit_test(test_level_speed_change),
      cmocka_unit_test(test_work_bound),
  };
  return cmocka_run_group_tests(tests, setup, teardown);
}
