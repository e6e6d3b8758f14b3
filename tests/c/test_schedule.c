/* Speed schedules and acceleration factors: published closed forms, finite
   differences on the actual day, modes and caps, bad input. */
#include <acperf.h>

#include "check.h"

/* Published closed forms in ISA (derivation in docs/methods/schedule.md; the
   constants 0.190263 = R |L|/g0 and 0.133184 = gamma R |L|/(2 g0) are the
   ones printed in flight-mechanics texts, 6 digits): */
static double phi(double m) {
  const double s = 1.0 + 0.2 * m * m;
  return (pow(s, 3.5) - 1.0) / (0.7 * m * m * pow(s, 2.5));
}

static void test_closed_forms(void **state) {
  (void)state;
  const double machs[] = {0.3, 0.5, 0.7, 0.8, 0.85};
  for (size_t i = 0; i < sizeof machs / sizeof machs[0]; ++i) {
    const double m = machs[i];
    /* constant CAS below the tropopause: 1 + 0.7 M^2 (phi - 0.190263) */
    CHECK_CLOSE(acp_acceleration_factor(ACP_MODE_CAS, m, 5000.0, 0.0),
                1.0 + 0.7 * m * m * (phi(m) - 0.190263), 1e-6, 0.0, "CAS, troposphere");
    /* constant CAS above it: 1 + 0.7 M^2 phi */
    CHECK_CLOSE(acp_acceleration_factor(ACP_MODE_CAS, m, 15000.0, 0.0),
                1.0 + 0.7 * m * m * phi(m), 1e-12, 0.0, "CAS, stratosphere");
    /* constant Mach below the tropopause: 1 - 0.133184 M^2 */
    CHECK_CLOSE(acp_acceleration_factor(ACP_MODE_MACH, m, 8000.0, 0.0), 1.0 - 0.133184 * m * m,
                1e-6, 0.0, "Mach, troposphere");
    /* constant Mach in the isothermal stratosphere: no acceleration */
    CHECK_CLOSE(acp_acceleration_factor(ACP_MODE_MACH, m, 15000.0, 0.0), 1.0, 0.0, 0.0,
                "Mach, stratosphere");
  }
}

/* On an off-standard day the factor comes from dTAS/dh of the actual day: a
   central difference of the library's CAS -> TAS (and Mach -> TAS) over +-1 m
   of pressure altitude, times Tstd/T for geometric height. */
static void test_finite_differences(void **state) {
  (void)state;
  const double dts[] = {-25.0, 0.0, 20.0};
  const double hps[] = {2000.0, 7000.0, 10500.0, 13000.0};
  for (size_t i = 0; i < 3; ++i)
    for (size_t j = 0; j < 4; ++j) {
      const double hp = hps[j], dt = dts[i], cas = 140.0, h = 1.0;
      const double tas = acp_cas_to_tas(cas, hp, dt);
      const double d = (acp_cas_to_tas(cas, hp + h, dt) - acp_cas_to_tas(cas, hp - h, dt)) / (2 * h);
      const double t = acp_isa_temperature(hp, dt), tstd = acp_isa_temperature(hp, 0.0);
      const double m = acp_cas_to_mach(cas, hp);
      CHECK_CLOSE(acp_acceleration_factor(ACP_MODE_CAS, m, hp, dt),
                  1.0 + tas / ACP_G0 * d * tstd / t, 1e-7, 0.0, "CAS, finite difference");
      const double dm = (acp_mach_to_tas(0.78, hp + h, dt) - acp_mach_to_tas(0.78, hp - h, dt)) / (2 * h);
      CHECK_CLOSE(acp_acceleration_factor(ACP_MODE_MACH, 0.78, hp, dt),
                  1.0 + acp_mach_to_tas(0.78, hp, dt) / ACP_G0 * dm * tstd / t, 1e-7, 0.0,
                  "Mach, finite difference");
    }
}

/* 250 kt below 10,000 ft (common practice), then 290 kt / M0.78; VMO 340 kt, MMO 0.82. */
static void test_modes(void **state) {
  (void)state;
  const double low = 250.0 * ACP_KT, lim = 10000.0 * ACP_FT, cas = 290.0 * ACP_KT;
  const double vmo = 340.0 * ACP_KT, mmo = 0.82;
  acp_schedule_point s;
  assert_int_equal(acp_speed_schedule(1000.0, 0.0, low, lim, cas, 0.78, vmo, mmo, &s), ACP_OK);
  assert_true(s.mode == ACP_MODE_LOW_CAS);
  CHECK_CLOSE(s.cas, low, 0.0, 1e-12, "low CAS");
  CHECK_CLOSE(s.tas, acp_cas_to_tas(low, 1000.0, 0.0), 0.0, 1e-12, "low CAS TAS");
  assert_int_equal(acp_speed_schedule(6000.0, 10.0, low, lim, cas, 0.78, vmo, mmo, &s), ACP_OK);
  assert_true(s.mode == ACP_MODE_CAS);
  CHECK_CLOSE(s.cas, cas, 0.0, 1e-12, "CAS");
  double hx;
  assert_int_equal(acp_crossover_altitude(cas, 0.78, &hx), ACP_OK);
  CHECK_CLOSE(s.crossover, hx, 0.0, 0.0, "crossover");
  assert_int_equal(acp_speed_schedule(hx + 1.0, 10.0, low, lim, cas, 0.78, vmo, mmo, &s), ACP_OK);
  assert_true(s.mode == ACP_MODE_MACH);
  CHECK_CLOSE(s.mach, 0.78, 0.0, 0.0, "Mach");
  CHECK_CLOSE(s.tas, acp_mach_to_tas(0.78, hx + 1.0, 10.0), 0.0, 1e-12, "Mach TAS");
  assert_int_equal(acp_speed_schedule(hx - 1.0, 10.0, low, lim, cas, 0.78, vmo, mmo, &s), ACP_OK);
  assert_true(s.mode == ACP_MODE_CAS);
  /* Caps: a 360 kt schedule is held at VMO; Mach 0.86 at MMO. */
  assert_int_equal(acp_speed_schedule(6000.0, 0.0, low, lim, 360.0 * ACP_KT, 0.86, vmo, mmo, &s),
                   ACP_OK);
  assert_true(s.mode == ACP_MODE_VMO);
  CHECK_CLOSE(s.cas, vmo, 0.0, 1e-12, "VMO cap");
  assert_int_equal(acp_speed_schedule(11000.0, 0.0, low, lim, 330.0 * ACP_KT, 0.86, vmo, mmo, &s),
                   ACP_OK);
  assert_true(s.mode == ACP_MODE_MMO);
  CHECK_CLOSE(s.mach, mmo, 0.0, 0.0, "MMO cap");
  /* The acceleration factor of the point is that of its mode. */
  assert_int_equal(acp_speed_schedule(6000.0, 5.0, low, lim, cas, 0.78, vmo, mmo, &s), ACP_OK);
  CHECK_CLOSE(s.acceleration_factor, acp_acceleration_factor(ACP_MODE_CAS, s.mach, 6000.0, 5.0),
              0.0, 1e-14, "factor of the mode");
}

static void test_bad_input(void **state) {
  (void)state;
  acp_schedule_point s;
  const double nan = (double)NAN, kt = ACP_KT;
  assert_int_equal(acp_speed_schedule(nan, 0, 250 * kt, 3048, 290 * kt, 0.78, 340 * kt, 0.82, &s),
                   ACP_ERR_INVALID);
  CHECK_NAN(s.tas, "NaN out");
  assert_int_equal(acp_speed_schedule(1000, 0, -1, 3048, 290 * kt, 0.78, 340 * kt, 0.82, &s),
                   ACP_ERR_INVALID);
  assert_int_equal(acp_speed_schedule(1000, 0, 250 * kt, nan, 290 * kt, 0.78, 340 * kt, 0.82, &s),
                   ACP_ERR_INVALID);
  assert_int_equal(acp_speed_schedule(1000, 0, 250 * kt, 3048, 290 * kt, 6.0, 340 * kt, 0.82, &s),
                   ACP_ERR_RANGE);
  assert_int_equal(acp_speed_schedule(90000, 0, 250 * kt, 3048, 290 * kt, 0.78, 340 * kt, 0.82, &s),
                   ACP_ERR_RANGE);
  assert_int_equal(acp_speed_schedule(1000, 0, 250 * kt, 3048, 290 * kt, 0.78, 340 * kt, 0.82, NULL),
                   ACP_ERR_INVALID);
  CHECK_NAN(acp_acceleration_factor(ACP_MODE_VMO, 0.5, 1000.0, 0.0), "mode without closed form");
  CHECK_NAN(acp_acceleration_factor(ACP_MODE_CAS, 0.0, 1000.0, 0.0), "Mach 0");
  CHECK_NAN(acp_acceleration_factor(ACP_MODE_CAS, 0.5, 1000.0, 200.0), "dtemp out of range");
}

int main(void) {
  const struct CMUnitTest tests[] = {
      cmocka_unit_test(test_closed_forms), cmocka_unit_test(test_finite_differences),
      cmocka_unit_test(test_modes), cmocka_unit_test(test_bad_input)};
  return cmocka_run_group_tests(tests, NULL, NULL);
}
