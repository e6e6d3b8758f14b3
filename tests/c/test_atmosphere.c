/* Standard atmosphere: tabulated values, inverses, companions and bad input. */
#include <acperf.h>

#include "check.h"

/* ISO 2533:1975 / ICAO Doc 7488 tabulated values at the layer bases (geopotential
   altitude), 6 significant digits as printed (values from memory of the tables;
   the same altitudes are checked to 1e-9 against python3-fluids' 1976 atmosphere
   by tests/python/ref_atmosphere_fluids.py). Tolerance: half a unit in the 6th digit. */
static const struct {
  double hp, temperature, pressure, density, density_tol;
} ISA_TABLE[] = {
    {-5000.0, 320.650, 1.77687e5, 1.93047, 5e-6},
    {0.0, 288.150, 1.01325e5, 1.22500, 5e-6},
    {11000.0, 216.650, 2.26320e4, 0.363918, 5e-6},
    {20000.0, 216.650, 5.47487e3, 8.80348e-2, 5e-6},
    {32000.0, 228.650, 8.68014e2, 1.32250e-2, 5e-6},
    {47000.0, 270.650, 1.10906e2, 1.42753e-3, 5e-6},
    {51000.0, 270.650, 6.69384e1, 8.61600e-4, 5e-6},
    {71000.0, 214.650, 3.95639, 6.42105e-5, 5e-6},
    {84852.0, 186.946, 3.73380e-1, 6.958e-6, 5e-4}, /* US 1976 prints 4 digits at 86 km */
};

static void test_table(void **state) {
  (void)state;
  for (size_t i = 0; i < sizeof ISA_TABLE / sizeof ISA_TABLE[0]; ++i) {
    acp_atmos a;
    char label[64];
    snprintf(label, sizeof label, "ISA at %.0f m", ISA_TABLE[i].hp);
    assert_int_equal(acp_isa(ISA_TABLE[i].hp, 0.0, &a), ACP_OK);
    CHECK_CLOSE(a.temperature, ISA_TABLE[i].temperature, 5e-4, 0.0, label);
    CHECK_CLOSE(a.pressure, ISA_TABLE[i].pressure, 0.0, 5e-6, label);
    CHECK_CLOSE(a.density, ISA_TABLE[i].density, 0.0, ISA_TABLE[i].density_tol, label);
  }
}

/* Sea level, ISO 2533 table 1 / US 1976 table I: a0 = 340.294 m/s,
   mu0 = 1.7894e-5 Pa s, nu0 = 1.4607e-5 m2/s; at 11 km a = 295.069 m/s,
   mu = 1.4216e-5 Pa s (from memory of the tables). */
static void test_sound_speed_viscosity(void **state) {
  (void)state;
  acp_atmos a;
  assert_int_equal(acp_isa(0.0, 0.0, &a), ACP_OK);
  CHECK_CLOSE(a.sound_speed, 340.294, 5e-4, 0.0, "a0");
  CHECK_CLOSE(a.dynamic_viscosity, 1.7894e-5, 5e-10, 0.0, "mu0");
  CHECK_CLOSE(a.kinematic_viscosity, 1.4607e-5, 5e-10, 0.0, "nu0");
  assert_int_equal(acp_isa(11000.0, 0.0, &a), ACP_OK);
  CHECK_CLOSE(a.sound_speed, 295.069, 5e-4, 0.0, "a at 11 km");
  CHECK_CLOSE(a.dynamic_viscosity, 1.4216e-5, 5e-10, 0.0, "mu at 11 km");
}

/* Off-standard day: pressure stays that of the pressure altitude, temperature
   is offset, density follows the gas law (common practice). */
static void test_isa_deviation(void **state) {
  (void)state;
  acp_atmos std, hot;
  assert_int_equal(acp_isa(3000.0, 0.0, &std), ACP_OK);
  assert_int_equal(acp_isa(3000.0, 20.0, &hot), ACP_OK);
  CHECK_CLOSE(hot.pressure, std.pressure, 0.0, 1e-15, "pressure unchanged");
  CHECK_CLOSE(hot.temperature, std.temperature + 20.0, 1e-12, 0.0, "temperature offset");
  CHECK_CLOSE(hot.density, std.density * std.temperature / hot.temperature, 0.0, 1e-14,
              "density by the gas law");
  CHECK_CLOSE(acp_isa_deviation(hot.temperature, 3000.0), 20.0, 1e-12, 0.0, "deviation back");
  CHECK_CLOSE(acp_outside_air_temperature(20.0, 3000.0), hot.temperature, 1e-12, 0.0, "OAT");
}

/* Continuity at every layer boundary: both formulas meet. */
static void test_layer_continuity(void **state) {
  (void)state;
  const double bases[] = {11000.0, 20000.0, 32000.0, 47000.0, 51000.0, 71000.0};
  for (size_t i = 0; i < sizeof bases / sizeof bases[0]; ++i) {
    acp_atmos lo, hi;
    assert_int_equal(acp_isa(bases[i] - 1e-7, 0.0, &lo), ACP_OK);
    assert_int_equal(acp_isa(bases[i] + 1e-7, 0.0, &hi), ACP_OK);
    CHECK_CLOSE(lo.pressure, hi.pressure, 0.0, 1e-10, "pressure continuous");
    CHECK_CLOSE(lo.temperature, hi.temperature, 1e-8, 0.0, "temperature continuous");
  }
}

static void test_pressure_altitude_round_trip(void **state) {
  (void)state;
  for (double h = -5000.0; h <= 84852.0; h += 250.0) {
    double hp;
    assert_int_equal(acp_isa_pressure_altitude(acp_isa_pressure(h), &hp), ACP_OK);
    CHECK_CLOSE(hp, h, 1e-6, 1e-12, "pressure altitude round trip");
    double hd;
    assert_int_equal(acp_isa_density_altitude(acp_isa_density(h, 0.0), &hd), ACP_OK);
    CHECK_CLOSE(hd, h, 1e-6, 1e-12, "density altitude round trip");
  }
  /* 1000 hPa lies at 110.88 m in the standard (ISO 2533 table: 110.9 m, from memory). */
  double hp;
  assert_int_equal(acp_isa_pressure_altitude(100000.0, &hp), ACP_OK);
  CHECK_CLOSE(hp, 110.9, 0.05, 0.0, "1000 hPa");
}

/* Geometric and geopotential altitude (ISO 2533 eq. 8): 86 km geometric is
   84.852 km geopotential, the US 1976 model's top (US 1976 section 1.2);
   the 11 km tropopause is at 11,019 m geometric (from memory of the tables). */
static void test_geopotential(void **state) {
  (void)state;
  CHECK_CLOSE(acp_geopotential_altitude(86000.0), 84852.0, 0.1, 0.0, "86 km");
  CHECK_CLOSE(acp_geometric_altitude(11000.0), 11019.0, 0.5, 0.0, "tropopause");
  for (double z = -10000.0; z <= 1.0e6; z += 9999.0)
    CHECK_CLOSE(acp_geometric_altitude(acp_geopotential_altitude(z)), z, 1e-8, 1e-14, "round trip");
  CHECK_NAN(acp_geopotential_altitude(2.0e6), "above the range");
  CHECK_NAN(acp_geometric_altitude((double)NAN), "NaN");
}

/* Density altitude: about 120 ft per degC of ISA deviation near sea level
   (common practice rule of thumb); a sanity band of 10 %. */
static void test_density_altitude(void **state) {
  (void)state;
  const double da_ft = acp_density_altitude(0.0, 20.0) / ACP_FT;
  CHECK_CLOSE(da_ft, 20.0 * 120.0, 0.0, 0.10, "ISA+20 at sea level");
  CHECK_CLOSE(acp_density_altitude(5000.0, 0.0), 5000.0, 1e-6, 0.0, "standard day");
}

/* Total temperature: NACA Report 1135 table I gives T/Tt = 0.88652 at M = 0.8
   and 0.83333 at M = 1 (r = 1). */
static void test_total_temperature(void **state) {
  (void)state;
  CHECK_CLOSE(250.0 / acp_total_temperature(250.0, 0.8, 1.0), 0.88652, 5e-6, 0.0, "M 0.8");
  CHECK_CLOSE(250.0 / acp_total_temperature(250.0, 1.0, 1.0), 0.83333, 5e-6, 0.0, "M 1");
  CHECK_CLOSE(acp_static_temperature(acp_total_temperature(230.0, 0.78, 0.9), 0.78, 0.9), 230.0,
              1e-12, 0.0, "round trip");
  CHECK_CLOSE(acp_total_temperature(230.0, 0.78, 0.0), 230.0, 0.0, 0.0, "r = 0");
  CHECK_NAN(acp_total_temperature(230.0, 0.78, 1.5), "r > 1");
  CHECK_NAN(acp_total_temperature(-1.0, 0.78, 1.0), "T <= 0");
}

/* Altimeter setting: at 1013.25 hPa indicated = pressure altitude; at 1000 hPa
   the shift is 110.9 m = 364 ft, close to the 27 ft/hPa rule (common practice). */
static void test_qnh(void **state) {
  (void)state;
  double hp, ind;
  assert_int_equal(acp_pressure_altitude_from_qnh(1500.0, 101325.0, &hp), ACP_OK);
  CHECK_CLOSE(hp, 1500.0, 1e-9, 0.0, "standard setting");
  assert_int_equal(acp_pressure_altitude_from_qnh(0.0, 100000.0, &hp), ACP_OK);
  CHECK_CLOSE(hp / ACP_FT, 13.25 * 27.0, 0.0, 0.05, "27 ft per hPa");
  assert_int_equal(acp_indicated_altitude_from_qnh(hp, 100000.0, &ind), ACP_OK);
  CHECK_CLOSE(ind, 0.0, 1e-9, 0.0, "round trip");
  assert_int_equal(acp_pressure_altitude_from_qnh(0.0, 50000.0, &hp), ACP_ERR_RANGE);
  CHECK_NAN(hp, "NaN on error");
  assert_int_equal(acp_pressure_altitude_from_qnh((double)NAN, 101325.0, &hp), ACP_ERR_INVALID);
}

/* Cold-temperature correction against an independent numerical integration of
   the hydrostatic height error (the derivation of the ICAO PANS-OPS formula):
   dH = -int dT/(T0 + L0 h) dh over the height, by Simpson's rule. */
static double integrated_correction(double height, double elevation, double dtemp) {
  const int n = 2000;
  const double step = height / n;
  double sum = 0.0;
  for (int i = 0; i <= n; ++i) {
    const double h = elevation + i * step;
    const double w = (i == 0 || i == n) ? 1.0 : (i % 2 ? 4.0 : 2.0);
    sum += w * (-dtemp / (288.15 - 0.0065 * h));
  }
  return sum * step / 3.0;
}

static void test_cold_temperature_correction(void **state) {
  (void)state;
  const struct { double height, elevation, oat_c; } cases[] = {
      {300.0, 0.0, -30.0}, {1000.0, 500.0, -20.0}, {1500.0, 1500.0, -40.0}, {600.0, 0.0, 15.0}};
  for (size_t i = 0; i < sizeof cases / sizeof cases[0]; ++i) {
    double c;
    const double t = acp_degc_to_k(cases[i].oat_c);
    const double dtemp = t - (288.15 - 0.0065 * cases[i].elevation);
    assert_int_equal(acp_cold_temperature_correction(cases[i].height, cases[i].elevation, t, &c),
                     ACP_OK);
    CHECK_CLOSE(c, integrated_correction(cases[i].height, cases[i].elevation, dtemp), 1e-6, 1e-9,
                "PANS-OPS formula vs integration");
  }
  /* Rule of thumb: about 4 % of height per 10 degC below ISA (common practice). */
  double c;
  assert_int_equal(acp_cold_temperature_correction(1000.0, 0.0, acp_degc_to_k(-15.0), &c), ACP_OK);
  CHECK_CLOSE(c / 1000.0, 0.12, 0.0, 0.15, "4 % per 10 degC");
  assert_int_equal(acp_cold_temperature_correction(-1.0, 0.0, 250.0, &c), ACP_ERR_INVALID);
  assert_int_equal(acp_cold_temperature_correction(12000.0, 0.0, 250.0, &c), ACP_ERR_RANGE);
  CHECK_NAN(c, "NaN on error");
}

static void test_bad_input(void **state) {
  (void)state;
  const double inf = (double)INFINITY, nan = (double)NAN;
  const struct { double hp, dtemp; int status; } cases[] = {
      {nan, 0.0, ACP_ERR_INVALID},      {inf, 0.0, ACP_ERR_INVALID},
      {-inf, 0.0, ACP_ERR_INVALID},     {0.0, nan, ACP_ERR_INVALID},
      {0.0, inf, ACP_ERR_INVALID},      {-5000.1, 0.0, ACP_ERR_RANGE},
      {84852.1, 0.0, ACP_ERR_RANGE},    {0.0, -100.1, ACP_ERR_RANGE},
      {0.0, 100.1, ACP_ERR_RANGE},      {84852.0, -187.0, ACP_ERR_RANGE},
  };
  for (size_t i = 0; i < sizeof cases / sizeof cases[0]; ++i) {
    acp_atmos a;
    assert_int_equal(acp_isa(cases[i].hp, cases[i].dtemp, &a), cases[i].status);
    CHECK_NAN(a.temperature, "T NaN");
    CHECK_NAN(a.pressure, "p NaN");
    CHECK_NAN(a.density, "rho NaN");
    CHECK_NAN(a.sound_speed, "a NaN");
    CHECK_NAN(a.kinematic_viscosity, "nu NaN");
  }
  assert_int_equal(acp_isa(0.0, 0.0, NULL), ACP_ERR_INVALID);
  double hp;
  assert_int_equal(acp_isa_pressure_altitude(-1.0, &hp), ACP_ERR_INVALID);
  assert_int_equal(acp_isa_pressure_altitude(0.0, &hp), ACP_ERR_INVALID);
  assert_int_equal(acp_isa_pressure_altitude(nan, &hp), ACP_ERR_INVALID);
  assert_int_equal(acp_isa_pressure_altitude(2.0e5, &hp), ACP_ERR_RANGE);
  assert_int_equal(acp_isa_pressure_altitude(0.1, &hp), ACP_ERR_RANGE);
  CHECK_NAN(hp, "NaN on error");
  assert_int_equal(acp_isa_pressure_altitude(1.0e5, NULL), ACP_ERR_INVALID);
  assert_int_equal(acp_isa_density_altitude(-1.0, &hp), ACP_ERR_INVALID);
  CHECK_NAN(acp_isa_temperature(nan, 0.0), "scalar T");
  CHECK_NAN(acp_isa_pressure(1.0e5), "scalar p");
  CHECK_NAN(acp_isa_deviation(0.0, 0.0), "OAT 0 K");
  CHECK_NAN(acp_density_altitude(0.0, inf), "density altitude");
}

static void test_array_form(void **state) {
  (void)state;
  const double hp[] = {0.0, 11000.0, (double)NAN, 90000.0, 30000.0};
  const double dt[] = {0.0, 10.0, 0.0, 0.0, -5.0};
  double t[5], p[5], rho[5], a[5], mu[5], nu[5];
  assert_int_equal(acp_isa_n(5, hp, dt, t, p, rho, a, mu, nu), 2);
  for (size_t i = 0; i < 5; ++i) {
    acp_atmos s;
    if (acp_isa(hp[i], dt[i], &s) == ACP_OK) {
      /* the vectorised path agrees within 1e-14 (see test_kernels.c) */
      CHECK_CLOSE(t[i], s.temperature, 0.0, 1e-14, "T");
      CHECK_CLOSE(p[i], s.pressure, 0.0, 1e-14, "p");
      CHECK_CLOSE(rho[i], s.density, 0.0, 1e-14, "rho");
      CHECK_CLOSE(a[i], s.sound_speed, 0.0, 1e-14, "a");
      CHECK_CLOSE(mu[i], s.dynamic_viscosity, 0.0, 1e-14, "mu");
      CHECK_CLOSE(nu[i], s.kinematic_viscosity, 0.0, 1e-14, "nu");
    } else {
      CHECK_NAN(t[i], "invalid element");
      CHECK_NAN(nu[i], "invalid element");
    }
  }
  /* NULL dtemp is a standard day; NULL outputs are skipped. */
  assert_int_equal(acp_isa_n(2, hp, NULL, NULL, p, NULL, NULL, NULL, NULL), 0);
  CHECK_CLOSE(p[1], 22632.040095007799, 0.0, 1e-14, "NULL dtemp");
  double h2[3];
  const double pr[] = {101325.0, -1.0, 22632.040095007799};
  assert_int_equal(acp_isa_pressure_altitude_n(3, pr, h2), 1);
  CHECK_CLOSE(h2[2], 11000.0, 1e-8, 0.0, "array inverse");
  CHECK_NAN(h2[1], "array inverse invalid");
  double z[2], hh[2];
  const double zin[] = {11019.0, 5.0e6};
  assert_int_equal(acp_geopotential_altitude_n(2, zin, hh), 1);
  assert_int_equal(acp_geometric_altitude_n(1, hh, z), 0);
  CHECK_CLOSE(z[0], 11019.0, 1e-8, 0.0, "array geometric");
}

int main(void) {
  const struct CMUnitTest tests[] = {
      cmocka_unit_test(test_table),
      cmocka_unit_test(test_sound_speed_viscosity),
      cmocka_unit_test(test_isa_deviation),
      cmocka_unit_test(test_layer_continuity),
      cmocka_unit_test(test_pressure_altitude_round_trip),
      cmocka_unit_test(test_geopotential),
      cmocka_unit_test(test_density_altitude),
      cmocka_unit_test(test_total_temperature),
      cmocka_unit_test(test_qnh),
      cmocka_unit_test(test_cold_temperature_correction),
      cmocka_unit_test(test_bad_input),
      cmocka_unit_test(test_array_form),
  };
  return cmocka_run_group_tests(tests, NULL, NULL);
}
