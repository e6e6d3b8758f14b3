/* Units, status names and the run-time version. */
#include <acperf.h>
#include <string.h>

#include "check.h"

/* Exact definitions: 1 ft = 0.3048 m, 1 NM = 1852 m, 1 lb = 0.45359237 kg
   (1959 agreement; IHB 1929); 1 lbf = 4.4482216152605 N and
   1 inHg = 3386.389 Pa (NIST SP 811, appendix B.8); 0 degC = 273.15 K (SI). */
static void test_definitions(void **state) {
  (void)state;
  assert_true(acp_ft_to_m(1.0) == 0.3048);
  assert_true(acp_nm_to_m(1.0) == 1852.0);
  assert_true(acp_lb_to_kg(1.0) == 0.45359237);
  CHECK_CLOSE(acp_kt_to_mps(1.0), 0.514444444444444, 1e-15, 0.0, "knot");
  CHECK_CLOSE(acp_fl_to_m(350.0), 10668.0, 1e-9, 0.0, "FL350");
  CHECK_CLOSE(acp_fpm_to_mps(1000.0), 5.08, 1e-12, 0.0, "1000 ft/min");
  CHECK_CLOSE(acp_inhg_to_pa(1.0), 3386.389, 5e-4, 0.0, "inHg (NIST)");
  /* 29.92 inHg is the standard setting, 1013.2 hPa (common practice). */
  CHECK_CLOSE(acp_pa_to_hpa(acp_inhg_to_pa(29.92)), 1013.2, 0.05, 0.0, "29.92 inHg");
  CHECK_CLOSE(acp_degc_to_k(-56.5), 216.65, 1e-12, 0.0, "tropopause degC");
  CHECK_CLOSE(acp_deg_to_rad(180.0), 3.14159265358979323846, 1e-15, 0.0, "pi");
  double v;
  assert_int_equal(acp_to_si(1.0, "lbf", &v), ACP_OK);
  CHECK_CLOSE(v, 4.4482216152605, 1e-13, 0.0, "lbf (NIST)");
}

static void test_round_trips(void **state) {
  (void)state;
  const double x = 1234.5678;
  CHECK_CLOSE(acp_m_to_ft(acp_ft_to_m(x)), x, 0.0, 1e-15, "ft");
  CHECK_CLOSE(acp_mps_to_kt(acp_kt_to_mps(x)), x, 0.0, 1e-15, "kt");
  CHECK_CLOSE(acp_m_to_nm(acp_nm_to_m(x)), x, 0.0, 1e-15, "NM");
  CHECK_CLOSE(acp_kg_to_lb(acp_lb_to_kg(x)), x, 0.0, 1e-15, "lb");
  CHECK_CLOSE(acp_m_to_fl(acp_fl_to_m(x)), x, 0.0, 1e-15, "FL");
  CHECK_CLOSE(acp_mps_to_fpm(acp_fpm_to_mps(x)), x, 0.0, 1e-15, "ft/min");
  CHECK_CLOSE(acp_pa_to_hpa(acp_hpa_to_pa(x)), x, 0.0, 1e-15, "hPa");
  CHECK_CLOSE(acp_pa_to_inhg(acp_inhg_to_pa(x)), x, 0.0, 1e-15, "inHg");
  CHECK_CLOSE(acp_k_to_degc(acp_degc_to_k(x)), x, 0.0, 1e-15, "degC");
  CHECK_CLOSE(acp_rad_to_deg(acp_deg_to_rad(x)), x, 0.0, 1e-15, "deg");
  const char *names[] = {"m", "ft", "FL", "km", "NM", "m/s", "kt", "km/h", "ft/min", "kg",
                         "lb", "t", "Pa", "hPa", "mbar", "inHg", "K", "degC", "s", "min",
                         "h", "rad", "deg", "N", "lbf", "kg/s", "kg/h", "lb/h"};
  for (size_t i = 0; i < sizeof names / sizeof names[0]; ++i) {
    double si, back;
    assert_int_equal(acp_to_si(x, names[i], &si), ACP_OK);
    assert_int_equal(acp_from_si(si, names[i], &back), ACP_OK);
    CHECK_CLOSE(back, x, 0.0, 1e-14, names[i]);
  }
  double si;
  assert_int_equal(acp_to_si(15.0, "degC", &si), ACP_OK);
  CHECK_CLOSE(si, 288.15, 1e-12, 0.0, "15 degC");
  assert_int_equal(acp_to_si(250.0, "kt", &si), ACP_OK);
  CHECK_CLOSE(si, acp_kt_to_mps(250.0), 0.0, 1e-15, "250 kt");
}

static void test_unit_errors(void **state) {
  (void)state;
  double v = 0.0;
  assert_int_equal(acp_to_si(1.0, "furlong", &v), ACP_ERR_UNKNOWN_KEY);
  CHECK_NAN(v, "unknown unit");
  assert_int_equal(acp_to_si(1.0, "FT", &v), ACP_ERR_UNKNOWN_KEY); /* case-sensitive */
  assert_int_equal(acp_to_si((double)NAN, "ft", &v), ACP_ERR_INVALID);
  assert_int_equal(acp_from_si((double)INFINITY, "ft", &v), ACP_ERR_INVALID);
  assert_int_equal(acp_to_si(1.0, NULL, &v), ACP_ERR_INVALID);
  assert_int_equal(acp_to_si(1.0, "ft", NULL), ACP_ERR_INVALID);
}

static void test_status_and_version(void **state) {
  (void)state;
  for (int s = -5; s < 20; ++s) {
    const char *msg = acp_strerror(s);
    assert_non_null(msg);
    assert_true(strlen(msg) > 0);
  }
  assert_string_equal(acp_strerror(ACP_OK), "success");
  assert_string_equal(acp_strerror(ACP_ERR_RANGE), "outside the model's valid range");
  assert_string_equal(acp_strerror(12345), "unknown status code");
  assert_int_equal(acp_version(), ACP_VERSION);
  assert_string_equal(acp_version_string(), ACP_VERSION_STRING);
  assert_true(ACP_VERSION_AT_LEAST(0, 1, 0));
  assert_false(ACP_VERSION_AT_LEAST(ACP_VERSION_MAJOR + 1, 0, 0));
}

int main(void) {
  const struct CMUnitTest tests[] = {
      cmocka_unit_test(test_definitions), cmocka_unit_test(test_round_trips),
      cmocka_unit_test(test_unit_errors), cmocka_unit_test(test_status_and_version),
  };
  return cmocka_run_group_tests(tests, NULL, NULL);
}
