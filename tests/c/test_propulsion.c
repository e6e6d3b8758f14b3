/* Propulsion: the published lapse and consumption formulas at hand-evaluated
   points, ratings, the idle floor, propeller thrust, errors. */
#include <acperf.h>

#include "check.h"
#include "fixtures.h"

/* Mattingly eq. 2.45a (high-bypass turbofan): alpha = delta0 (1 - 0.49 sqrt(M))
   below the throttle ratio, minus 3 (theta0 - TR)/(1.5 + M) above it. Hand
   evaluations (Python, float64) at the listed points. */
static void test_turbofan_lapse(void **state) {
  (void)state;
  /* sea level static ISA: delta0 = theta0 = 1, so alpha = 1 */
  CHECK_CLOSE(acp_turbofan_thrust_lapse(0.0, 0.0, 0.0, 1.0), 1.0, 1e-15, 0.0, "SLS");
  /* M 0.8 at 11,000 m ISA: theta0 = 216.65/288.15 x 1.128 = 0.84810,
     delta0 = 22632.04/101325 x 1.128^3.5 = 0.34048 (from the ISA values),
     alpha = 0.34048 x (1 - 0.49 sqrt(0.8)) = 0.19126 */
  CHECK_CLOSE(acp_turbofan_thrust_lapse(0.8, 11000.0, 0.0, 1.0), 0.19126, 5e-5, 0.0, "M0.8 11 km");
  /* a hot day at sea level, M 0.3: theta0 = (318.15/288.15) x 1.018 = 1.12398 > TR 1.05:
     alpha = 1.018^3.5 x (1 - 0.49 sqrt(0.3) - 3 x 0.07399/1.8) = 1.06443 x 0.60831 = 0.64750 */
  CHECK_CLOSE(acp_turbofan_thrust_lapse(0.3, 0.0, 30.0, 1.05), 0.64750, 5e-5, 0.0, "hot day");
  /* the temperature break: continuous at theta0 = TR */
  const double m = 0.3, tr = 1.018 * (288.15 + 10.0) / 288.15;
  CHECK_CLOSE(acp_turbofan_thrust_lapse(m, 0.0, 10.0, tr - 1e-12),
              acp_turbofan_thrust_lapse(m, 0.0, 10.0, tr + 1e-12), 1e-9, 0.0, "continuous at TR");
  CHECK_NAN(acp_turbofan_thrust_lapse(0.5, 0.0, 0.0, 2.0), "TR out of range");
  CHECK_NAN(acp_turbofan_thrust_lapse(1.2, 0.0, 0.0, 1.0), "beyond the drag model's Mach");
}

/* TSFC = (c0 + c1 M) sqrt(T/T0) (Mattingly's installed-TSFC form); 1 lb/(lbf h)
   = 1/(3600 g0) kg/(N s) exactly. */
static void test_tsfc(void **state) {
  (void)state;
  CHECK_CLOSE(ACP_TSFC_LB_LBF_H, 2.8325e-5, 5e-10, 0.0, "unit");
  const double c0 = 0.4 * ACP_TSFC_LB_LBF_H, c1 = 0.3 * ACP_TSFC_LB_LBF_H;
  CHECK_CLOSE(acp_turbofan_tsfc(0.8, 11000.0, 0.0, c0, c1) / ACP_TSFC_LB_LBF_H,
              (0.4 + 0.3 * 0.8) * sqrt(216.65 / 288.15), 0.0, 1e-14, "TSFC at 11 km");
  CHECK_NAN(acp_turbofan_tsfc(0.8, 11000.0, 0.0, -1.0, c1), "negative c0");
}

/* Gagg and Ferrar (NACA TN 493): P/P0 = 1.132 sigma - 0.132. */
static void test_piston(void **state) {
  (void)state;
  CHECK_CLOSE(acp_piston_power_lapse(1.0), 1.0, 1e-15, 0.0, "sea level");
  CHECK_CLOSE(acp_piston_power_lapse(0.5), 0.434, 1e-15, 0.0, "sigma 0.5");
  CHECK_NAN(acp_piston_power_lapse(0.1), "below the range");
}

/* Ratings are the documented fractions of the maximum; fuel flow is TSFC x
   thrust with the idle flow as a floor; thrust above the maximum is an error. */
static void test_ratings_and_fuel(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_example("regional_jet.toml");
  double climb, cruise, idle, n, t0;
  acp_aircraft_get(ac, "climb_rating", &climb);
  acp_aircraft_get(ac, "cruise_rating", &cruise);
  acp_aircraft_get(ac, "idle_thrust_fraction", &idle);
  acp_aircraft_get(ac, "engine_count", &n);
  acp_aircraft_get(ac, "engine_thrust", &t0);
  const double hp = 10000.0, tas = 230.0;
  acp_engine_point mx, cl, cr, id;
  assert_int_equal(acp_engine_rating(ac, ACP_RATING_MAXIMUM, hp, 0.0, tas, &mx), ACP_OK);
  assert_int_equal(acp_engine_rating(ac, ACP_RATING_CLIMB, hp, 0.0, tas, &cl), ACP_OK);
  assert_int_equal(acp_engine_rating(ac, ACP_RATING_CRUISE, hp, 0.0, tas, &cr), ACP_OK);
  assert_int_equal(acp_engine_rating(ac, ACP_RATING_IDLE, hp, 0.0, tas, &id), ACP_OK);
  double tr;
  acp_aircraft_get(ac, "throttle_ratio", &tr);
  CHECK_CLOSE(mx.thrust,
              n * t0 * acp_turbofan_thrust_lapse(tas / acp_isa_sound_speed(hp, 0.0), hp, 0.0, tr),
              0.0, 1e-14, "maximum = n T0 alpha");
  CHECK_CLOSE(cl.thrust, climb * mx.thrust, 0.0, 1e-14, "climb rating");
  CHECK_CLOSE(cr.thrust, cruise * mx.thrust, 0.0, 1e-14, "cruise rating");
  CHECK_CLOSE(id.thrust, idle * mx.thrust, 0.0, 1e-14, "idle");
  CHECK_CLOSE(cl.fuel_flow, cl.tsfc * cl.thrust, 0.0, 1e-14, "fuel = TSFC x thrust");
  assert_true(id.fuel_flow > id.tsfc * 0.0 && id.fuel_flow >= mx.tsfc * id.thrust);
  acp_engine_point e;
  assert_int_equal(acp_engine_thrust(ac, 0.5 * cr.thrust, hp, 0.0, tas, &e), ACP_OK);
  CHECK_CLOSE(e.fuel_flow, mx.tsfc * 0.5 * cr.thrust, 0.0, 1e-14, "part thrust");
  assert_int_equal(acp_engine_thrust(ac, 1.01 * mx.thrust, hp, 0.0, tas, &e), ACP_ERR_THRUST);
  CHECK_NAN(e.fuel_flow, "NaN on error");
  assert_int_equal(acp_engine_thrust(ac, 0.5 * id.thrust, hp, 0.0, tas, &e), ACP_ERR_RANGE);
  assert_int_equal(acp_engine_rating(ac, 9, hp, 0.0, tas, &e), ACP_ERR_INVALID);
  assert_int_equal(acp_engine_rating(ac, ACP_RATING_CLIMB, hp, 0.0, 400.0, &e), ACP_ERR_RANGE);
  assert_int_equal(acp_engine_rating(NULL, ACP_RATING_CLIMB, hp, 0.0, tas, &e), ACP_ERR_INVALID);
  /* an aircraft without engine keys */
  acp_aircraft *bare = acp_aircraft_new();
  assert_int_equal(acp_engine_rating(bare, ACP_RATING_CLIMB, hp, 0.0, tas, &e), ACP_ERR_INVALID);
  acp_aircraft_free(bare);
  acp_aircraft_free(ac);
}

/* Propeller: thrust = eta P/V with P = n P0 sigma^n (turboprop); fuel = psfc P. */
static void test_turboprop(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_example("light_twin.toml");
  double n, p0, expo, eta, psfc, ratio;
  acp_aircraft_get(ac, "engine_count", &n);
  acp_aircraft_get(ac, "engine_power", &p0);
  acp_aircraft_get(ac, "power_lapse_exponent", &expo);
  acp_aircraft_get(ac, "propeller_efficiency", &eta);
  acp_aircraft_get(ac, "psfc", &psfc);
  acp_aircraft_get(ac, "climb_rating", &ratio);
  const double hp = 3000.0, tas = 100.0;
  const double sigma = acp_isa_density(hp, 0.0) / ACP_RHO0;
  acp_engine_point e;
  assert_int_equal(acp_engine_rating(ac, ACP_RATING_CLIMB, hp, 0.0, tas, &e), ACP_OK);
  const double power = ratio * n * p0 * pow(sigma, expo);
  CHECK_CLOSE(e.shaft_power, power, 0.0, 1e-12, "shaft power");
  CHECK_CLOSE(e.thrust, eta * power / tas, 0.0, 1e-12, "thrust eta P/V");
  CHECK_CLOSE(e.fuel_flow, psfc * power, 0.0, 1e-12, "fuel psfc P");
  assert_int_equal(acp_engine_rating(ac, ACP_RATING_CLIMB, hp, 0.0, 0.5, &e), ACP_ERR_RANGE);
  acp_aircraft_free(ac);
}

int main(void) {
  const struct CMUnitTest tests[] = {
      cmocka_unit_test(test_turbofan_lapse), cmocka_unit_test(test_tsfc),
      cmocka_unit_test(test_piston), cmocka_unit_test(test_ratings_and_fuel),
      cmocka_unit_test(test_turboprop)};
  return cmocka_run_group_tests(tests, NULL, NULL);
}
