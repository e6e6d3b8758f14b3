/* Airspeeds: NACA Report 1135 relations, identities, round trips, bad input. */
#include <acperf.h>

#include "check.h"

#define PI 3.14159265358979323846

/* Identity: at sea level on a standard day CAS = EAS = TAS (definition of CAS/EAS). */
static void test_sea_level_identity(void **state) {
  (void)state;
  for (double v = 10.0; v <= 600.0; v += 10.0) {
    CHECK_CLOSE(acp_cas_to_tas(v, 0.0, 0.0), v, 0.0, 1e-13, "CAS = TAS at SL");
    CHECK_CLOSE(acp_cas_to_eas(v, 0.0), v, 0.0, 1e-13, "CAS = EAS at SL");
    CHECK_CLOSE(acp_eas_to_tas(v, 0.0, 0.0), v, 0.0, 1e-13, "EAS = TAS at SL");
  }
}

/* Mach 1 at sea level is 661.47 KCAS (common practice: a0 = 340.294 m/s, ISO 2533). */
static void test_mach_one_sea_level(void **state) {
  (void)state;
  CHECK_CLOSE(acp_mach_to_cas(1.0, 0.0) / ACP_KT, 661.47, 0.01, 0.0, "M1 at SL in kt");
  CHECK_CLOSE(acp_cas_to_mach(661.4786 * ACP_KT, 0.0), 1.0, 1e-6, 0.0, "661.48 kt is M1");
}

/* NACA Report 1135: table I (isentropic) p/pt at M = 0.5 is 0.84302 and at
   M = 0.9 is 0.59126; table II (normal shock) pt2/p1 at M1 = 1.5 is 3.413 and
   at M1 = 2.0 is 5.640 (values from memory of the tables). */
static void test_naca_1135_tables(void **state) {
  (void)state;
  const double p = acp_isa_pressure(0.0);
  CHECK_CLOSE(p / (p + acp_impact_pressure(0.5, 0.0)), 0.84302, 5e-6, 0.0, "M 0.5");
  CHECK_CLOSE(p / (p + acp_impact_pressure(0.9, 0.0)), 0.59126, 5e-6, 0.0, "M 0.9");
  CHECK_CLOSE((p + acp_impact_pressure(1.5, 0.0)) / p, 3.413, 5e-4, 0.0, "M 1.5");
  CHECK_CLOSE((p + acp_impact_pressure(2.0, 0.0)) / p, 5.640, 5e-4, 0.0, "M 2.0");
  /* Both branches agree at Mach 1 (the shock has zero strength there). */
  CHECK_CLOSE(acp_impact_pressure(1.0 - 1e-12, 0.0), acp_impact_pressure(1.0 + 1e-12, 0.0), 0.0,
              1e-10, "continuous at M 1");
}

/* Figures recalled from flight-planning practice (from memory, 0.5 % band):
   250 KCAS at 10,000 ft ISA is about 289 KTAS and M 0.452; the crossover of
   300 KCAS / M 0.78 is near 29,300 ft. */
static void test_worked_values(void **state) {
  (void)state;
  const double hp = 10000.0 * ACP_FT;
  CHECK_CLOSE(acp_cas_to_tas(250.0 * ACP_KT, hp, 0.0) / ACP_KT, 289.0, 0.0, 0.005, "TAS");
  CHECK_CLOSE(acp_cas_to_mach(250.0 * ACP_KT, hp), 0.452, 0.0, 0.005, "Mach");
  double hx;
  assert_int_equal(acp_crossover_altitude(300.0 * ACP_KT, 0.78, &hx), ACP_OK);
  CHECK_CLOSE(hx / ACP_FT, 29300.0, 0.0, 0.005, "crossover 300/0.78");
  /* Definition: at the crossover the CAS flies exactly at the Mach. */
  const struct { double cas_kt, mach; } pairs[] = {{250, 0.70}, {280, 0.78}, {320, 0.82}, {500, 1.6}};
  for (size_t i = 0; i < sizeof pairs / sizeof pairs[0]; ++i) {
    assert_int_equal(acp_crossover_altitude(pairs[i].cas_kt * ACP_KT, pairs[i].mach, &hx), ACP_OK);
    CHECK_CLOSE(acp_cas_to_mach(pairs[i].cas_kt * ACP_KT, hx), pairs[i].mach, 1e-12, 0.0,
                "CAS gives the Mach at the crossover");
  }
  assert_int_equal(acp_crossover_altitude(600.0 * ACP_KT, 0.3, &hx), ACP_ERR_RANGE);
  CHECK_NAN(hx, "crossover out of range");
}

/* EAS = TAS sqrt(sigma) (definition), independent of temperature given pressure. */
static void test_eas(void **state) {
  (void)state;
  acp_atmos a;
  assert_int_equal(acp_isa(8000.0, 12.0, &a), ACP_OK);
  const double tas = 230.0;
  CHECK_CLOSE(acp_tas_to_eas(tas, 8000.0, 12.0), tas * sqrt(a.density / ACP_RHO0), 0.0, 1e-14,
              "EAS definition");
  CHECK_CLOSE(acp_cas_to_eas(150.0, 8000.0),
              acp_tas_to_eas(acp_cas_to_tas(150.0, 8000.0, -30.0), 8000.0, -30.0), 0.0, 1e-13,
              "EAS independent of dtemp");
  /* Below about 200 kt at low altitude EAS and CAS differ by < 1 kt (common practice). */
  assert_true(fabs(acp_cas_to_eas(200.0 * ACP_KT, 3000.0) - 200.0 * ACP_KT) < ACP_KT);
  CHECK_CLOSE(acp_dynamic_pressure(0.8, 11000.0),
              0.5 * acp_isa_density(11000.0, 0.0) * pow(acp_mach_to_tas(0.8, 11000.0, 0.0), 2), 0.0,
              1e-13, "q = rho V^2/2 = gamma p M^2/2");
}

/* Every conversion pair round-trips, subsonic and supersonic, on warm and cold days. */
static void test_round_trips(void **state) {
  (void)state;
  const double hps[] = {-2000.0, 0.0, 3048.0, 11000.0, 15000.0, 25000.0};
  const double dts[] = {-40.0, 0.0, 35.0};
  const double machs[] = {0.05, 0.3, 0.78, 0.95, 1.0, 1.2, 2.5, 4.9};
  for (size_t i = 0; i < 6; ++i)
    for (size_t j = 0; j < 3; ++j)
      for (size_t k = 0; k < 8; ++k) {
        const double hp = hps[i], dt = dts[j], m = machs[k];
        const double tas = acp_mach_to_tas(m, hp, dt);
        const double cas = acp_mach_to_cas(m, hp);
        const double eas = acp_mach_to_eas(m, hp);
        if (isnan(cas)) continue; /* CAS above Mach 5 at sea level: outside the range */
        CHECK_CLOSE(acp_tas_to_mach(tas, hp, dt), m, 0.0, 1e-14, "TAS-Mach");
        CHECK_CLOSE(acp_cas_to_mach(cas, hp), m, 0.0, 1e-12, "CAS-Mach");
        CHECK_CLOSE(acp_cas_to_tas(cas, hp, dt), tas, 0.0, 1e-12, "CAS-TAS");
        CHECK_CLOSE(acp_tas_to_cas(tas, hp, dt), cas, 0.0, 1e-12, "TAS-CAS");
        CHECK_CLOSE(acp_eas_to_tas(eas, hp, dt), tas, 0.0, 1e-13, "EAS-TAS");
        CHECK_CLOSE(acp_tas_to_eas(tas, hp, dt), eas, 0.0, 1e-13, "TAS-EAS");
        CHECK_CLOSE(acp_eas_to_cas(eas, hp), cas, 0.0, 1e-12, "EAS-CAS");
        CHECK_CLOSE(acp_cas_to_eas(cas, hp), eas, 0.0, 1e-12, "CAS-EAS");
        CHECK_CLOSE(acp_eas_to_mach(eas, hp), m, 0.0, 1e-13, "EAS-Mach");
        CHECK_CLOSE(acp_impact_pressure_to_cas(acp_cas_to_impact_pressure(cas)), cas, 0.0, 1e-12,
                    "qc-CAS");
      }
}

/* Reynolds number per metre: rho V/mu from the atmosphere (definition). At sea
   level ISA 100 m/s gives 6.846e6 per metre (1/nu0 = 1/1.4607e-5, US 1976 table). */
static void test_reynolds(void **state) {
  (void)state;
  CHECK_CLOSE(acp_reynolds_per_metre(100.0, 0.0, 0.0), 100.0 / 1.4607e-5, 0.0, 5e-5, "Re/m");
  CHECK_NAN(acp_reynolds_per_metre(-1.0, 0.0, 0.0), "negative speed");
}

/* Wind triangle, checked by vector addition: air vector + wind vector lies along
   the track with the length of the ground speed. */
static void test_wind_triangle(void **state) {
  (void)state;
  const double tas = 100.0;
  const struct { double track_deg, from_deg, wind; } cases[] = {
      {0, 90, 20}, {0, 0, 20}, {0, 180, 20}, {45, 300, 35}, {270, 10, 50}, {359, 1, 99}};
  for (size_t i = 0; i < sizeof cases / sizeof cases[0]; ++i) {
    double gs, hdg, drift;
    const double trk = cases[i].track_deg * ACP_DEG, wf = cases[i].from_deg * ACP_DEG;
    assert_int_equal(acp_wind_triangle(tas, trk, wf, cases[i].wind, &gs, &hdg, &drift), ACP_OK);
    /* north and east components: air + wind (wind blows towards wf + pi) */
    const double n = tas * cos(hdg) - cases[i].wind * cos(wf);
    const double e = tas * sin(hdg) - cases[i].wind * sin(wf);
    CHECK_CLOSE(n, gs * cos(trk), 1e-9, 0.0, "north component");
    CHECK_CLOSE(e, gs * sin(trk), 1e-9, 0.0, "east component");
    CHECK_CLOSE(remainder(trk - hdg - drift, 2.0 * PI), 0.0, 1e-12, 0.0, "drift");
  }
  double gs, hdg, drift;
  assert_int_equal(acp_wind_triangle(100.0, 0.0, 0.0, 20.0, &gs, NULL, NULL), ACP_OK);
  CHECK_CLOSE(gs, 80.0, 1e-12, 0.0, "headwind");
  assert_int_equal(acp_wind_triangle(100.0, 0.0, PI / 2, 150.0, &gs, &hdg, &drift), ACP_ERR_RANGE);
  CHECK_NAN(gs, "no solution");
  assert_int_equal(acp_wind_triangle(100.0, 0.0, 0.0, 120.0, &gs, &hdg, &drift), ACP_ERR_RANGE);
  assert_int_equal(acp_wind_triangle(0.0, 0.0, 0.0, 10.0, &gs, &hdg, &drift), ACP_ERR_INVALID);
  assert_int_equal(acp_wind_triangle(100.0, (double)NAN, 0.0, 10.0, &gs, &hdg, &drift),
                   ACP_ERR_INVALID);
}

static void test_bad_input(void **state) {
  (void)state;
  const double nan = (double)NAN, inf = (double)INFINITY;
  const double bad_speed[] = {nan, inf, -inf, -1.0, 6.0 * ACP_A0};
  for (size_t i = 0; i < sizeof bad_speed / sizeof bad_speed[0]; ++i) {
    CHECK_NAN(acp_cas_to_mach(bad_speed[i], 0.0), "cas_to_mach");
    CHECK_NAN(acp_cas_to_tas(bad_speed[i], 0.0, 0.0), "cas_to_tas");
    CHECK_NAN(acp_tas_to_cas(bad_speed[i], 0.0, 0.0), "tas_to_cas");
    CHECK_NAN(acp_tas_to_mach(bad_speed[i], 0.0, 0.0), "tas_to_mach");
    CHECK_NAN(acp_eas_to_tas(bad_speed[i], 0.0, 0.0), "eas_to_tas");
    CHECK_NAN(acp_cas_to_impact_pressure(bad_speed[i]), "cas_to_qc");
    CHECK_NAN(acp_mach_to_cas(bad_speed[i], 0.0), "mach_to_cas");
    CHECK_NAN(acp_mach_to_tas(bad_speed[i], 0.0, 0.0), "mach_to_tas");
  }
  const double bad_hp[] = {nan, inf, -inf, -6000.0, 90000.0};
  for (size_t i = 0; i < sizeof bad_hp / sizeof bad_hp[0]; ++i) {
    CHECK_NAN(acp_cas_to_mach(100.0, bad_hp[i]), "hp cas_to_mach");
    CHECK_NAN(acp_cas_to_tas(100.0, bad_hp[i], 0.0), "hp cas_to_tas");
    CHECK_NAN(acp_mach_to_eas(0.5, bad_hp[i]), "hp mach_to_eas");
    CHECK_NAN(acp_impact_pressure(0.5, bad_hp[i]), "hp qc");
    CHECK_NAN(acp_dynamic_pressure(0.5, bad_hp[i]), "hp q");
  }
  CHECK_NAN(acp_cas_to_tas(100.0, 0.0, -300.0), "absolute temperature below zero");
  CHECK_NAN(acp_tas_to_mach(100.0, 0.0, nan), "dtemp NaN");
  double m, hx;
  assert_int_equal(acp_pressure_ratio_to_mach(-0.1, &m), ACP_ERR_INVALID);
  CHECK_NAN(m, "ratio NaN out");
  assert_int_equal(acp_pressure_ratio_to_mach(1e6, &m), ACP_ERR_RANGE);
  assert_int_equal(acp_pressure_ratio_to_mach(1.0, NULL), ACP_ERR_INVALID);
  assert_int_equal(acp_crossover_altitude(nan, 0.8, &hx), ACP_ERR_INVALID);
  assert_int_equal(acp_crossover_altitude(150.0, 0.0, &hx), ACP_ERR_INVALID);
  assert_int_equal(acp_crossover_altitude(150.0, 6.0, &hx), ACP_ERR_RANGE);
  assert_int_equal(acp_crossover_altitude(150.0, 0.8, NULL), ACP_ERR_INVALID);
}

static void test_array_forms(void **state) {
  (void)state;
  const double v[] = {100.0, 150.0, (double)NAN, 250.0};
  const double hp[] = {0.0, 5000.0, 1000.0, 95000.0};
  const double dt[] = {10.0, -10.0, 0.0, 0.0};
  double out[4];
  assert_int_equal(acp_cas_to_tas_n(4, v, hp, dt, out), 2);
  CHECK_CLOSE(out[1], acp_cas_to_tas(150.0, 5000.0, -10.0), 0.0, 1e-14, "cas_to_tas_n");
  CHECK_NAN(out[2], "NaN element");
  CHECK_NAN(out[3], "out-of-range element");
  assert_int_equal(acp_cas_to_tas_n(2, v, hp, NULL, out), 0);
  CHECK_CLOSE(out[1], acp_cas_to_tas(150.0, 5000.0, 0.0), 0.0, 1e-14, "NULL dtemp");
  assert_int_equal(acp_tas_to_cas_n(2, v, hp, dt, NULL), 0); /* output not wanted */
  const double m[] = {0.3, 0.8};
  assert_int_equal(acp_mach_to_cas_n(2, m, hp, out), 0);
  CHECK_CLOSE(out[1], acp_mach_to_cas(0.8, 5000.0), 0.0, 1e-14, "mach_to_cas_n");
  assert_int_equal(acp_cas_to_mach_n(2, out, hp, out), 0); /* in place */
  CHECK_CLOSE(out[1], 0.8, 0.0, 1e-12, "cas_to_mach_n in place");
  assert_int_equal(acp_mach_to_tas_n(2, m, hp, dt, out), 0);
  assert_int_equal(acp_tas_to_mach_n(2, out, hp, dt, out), 0);
  CHECK_CLOSE(out[0], 0.3, 0.0, 1e-14, "tas/mach _n");
  assert_int_equal(acp_eas_to_tas_n(2, v, hp, dt, out), 0);
  assert_int_equal(acp_tas_to_eas_n(2, out, hp, dt, out), 0);
  CHECK_CLOSE(out[1], 150.0, 0.0, 1e-13, "eas/tas _n");
  assert_int_equal(acp_cas_to_eas_n(2, v, hp, out), 0);
  assert_int_equal(acp_eas_to_cas_n(2, out, hp, out), 0);
  CHECK_CLOSE(out[1], 150.0, 0.0, 1e-12, "cas/eas _n");
  assert_int_equal(acp_cas_to_tas_n(2, NULL, hp, dt, out), 2); /* missing input */
}

int main(void) {
  const struct CMUnitTest tests[] = {
      cmocka_unit_test(test_sea_level_identity), cmocka_unit_test(test_mach_one_sea_level),
      cmocka_unit_test(test_naca_1135_tables),   cmocka_unit_test(test_worked_values),
      cmocka_unit_test(test_eas),                cmocka_unit_test(test_round_trips),
      cmocka_unit_test(test_reynolds),           cmocka_unit_test(test_wind_triangle),
      cmocka_unit_test(test_bad_input),          cmocka_unit_test(test_array_forms),
  };
  return cmocka_run_group_tests(tests, NULL, NULL);
}
