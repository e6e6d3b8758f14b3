/* Flat-plate skin friction: published formulas, an independent correlation, roughness. */
#include <acperf.h>

#include "check.h"

/* Schoenherr's turbulent flat-plate correlation (Schoenherr 1932, the ITTC-1957
   line's ancestor): 0.242/sqrt(Cf) = log10(Re Cf), solved by bisection here. It
   is independent of Prandtl-Schlichting; the two agree within 3 % from 1e5 to 1e9
   (checked by this test). */
static double schoenherr(double re) {
  double lo = 1e-4, hi = 0.1;
  for (int i = 0; i < 200; ++i) {
    const double mid = 0.5 * (lo + hi);
    if (0.242 / sqrt(mid) - log10(re * mid) > 0.0) lo = mid; else hi = mid;
  }
  return 0.5 * (lo + hi);
}

/* Blasius: Cf = 1.328/sqrt(Re) (Schlichting, Boundary-Layer Theory, flat plate). */
static void test_laminar(void **state) {
  (void)state;
  CHECK_CLOSE(acp_skin_friction_laminar(1.0e6), 1.328e-3, 0.0, 1e-15, "Blasius at 1e6");
  CHECK_CLOSE(acp_skin_friction_laminar(4.0e4), 1.328 / 200.0, 0.0, 1e-15, "Blasius at 4e4");
}

static void test_turbulent(void **state) {
  (void)state;
  /* Prandtl-Schlichting at Re = 1e7: 0.455/7^2.58 = 0.0030037 (hand evaluation). */
  CHECK_CLOSE(acp_skin_friction_turbulent(1.0e7, 0.0), 0.0030037, 5e-8, 0.0, "P-S at 1e7");
  for (double re = 1.0e5; re <= 1.0e9; re *= 3.0)
    CHECK_CLOSE(acp_skin_friction_turbulent(re, 0.0), schoenherr(re), 0.0, 0.03,
                "Prandtl-Schlichting vs Schoenherr");
  /* Compressibility factor (1 + 0.144 M^2)^0.65 (Raymer eq. 12.27): 1.0590 at M 0.8. */
  CHECK_CLOSE(acp_skin_friction_turbulent(1.0e7, 0.0) / acp_skin_friction_turbulent(1.0e7, 0.8),
              1.0590, 5e-5, 0.0, "compressibility at M 0.8");
  /* Turbulent friction exceeds laminar at the same Re (boundary-layer theory). */
  assert_true(acp_skin_friction_turbulent(1.0e6, 0.0) > 3.0 * acp_skin_friction_laminar(1.0e6));
}

static void test_mixed(void **state) {
  (void)state;
  const double re = 2.0e7, m = 0.6;
  const double lam = acp_skin_friction_laminar(re), turb = acp_skin_friction_turbulent(re, m);
  CHECK_CLOSE(acp_skin_friction_mixed(re, m, 0.0), turb, 0.0, 0.0, "all turbulent");
  CHECK_CLOSE(acp_skin_friction_mixed(re, m, 1.0), lam, 0.0, 0.0, "all laminar");
  CHECK_CLOSE(acp_skin_friction_mixed(re, m, 0.25), 0.25 * lam + 0.75 * turb, 0.0, 1e-15,
              "weighted mean (Raymer 12.5.3)");
  CHECK_NAN(acp_skin_friction_mixed(re, m, 1.1), "fraction above 1");
  CHECK_NAN(acp_skin_friction_mixed(re, m, -0.1), "fraction below 0");
}

static void test_roughness(void **state) {
  (void)state;
  /* Raymer eq. 12.28 at l/k = 1e5: 38.21 x 1e5^1.053 = 7.0336e6 (evaluated with Python). */
  CHECK_CLOSE(acp_roughness_cutoff_reynolds(1.0, 1.0e-5, 0.3), 7.0336e6, 0.0, 1e-4, "eq. 12.28");
  /* Eq. 12.29 at M 2: 44.62 x 1e5^1.053 x 2^1.16 = 1.8354e7 (evaluated with Python). */
  CHECK_CLOSE(acp_roughness_cutoff_reynolds(1.0, 1.0e-5, 2.0), 1.8354e7, 0.0, 1e-4, "eq. 12.29");
  /* Continuous where the two formulas meet. */
  const double mx = pow(38.21 / 44.62, 1.0 / 1.16);
  CHECK_CLOSE(acp_roughness_cutoff_reynolds(2.0, 1e-5, mx - 1e-9),
              acp_roughness_cutoff_reynolds(2.0, 1e-5, mx + 1e-9), 0.0, 1e-7, "switch continuous");

  /* A 3 m chord at Re 5e7 (Mach 0.5): camouflage paint (k = 1.015e-5 m, Raymer
     table 12.5) cuts off below the flow's Re and raises Cf; polished metal
     (k = 0.152e-5 m) does not. */
  const double re = 5.0e7, m = 0.5, len = 3.0;
  const double smooth = acp_skin_friction(re, m, 0.1, len, 0.0);
  CHECK_CLOSE(smooth, acp_skin_friction_mixed(re, m, 0.1), 0.0, 0.0, "no roughness");
  assert_true(acp_roughness_cutoff_reynolds(len, 1.015e-5, m) < re);
  assert_true(acp_skin_friction(re, m, 0.1, len, 1.015e-5) > smooth * 1.01);
  assert_true(acp_roughness_cutoff_reynolds(len, 0.152e-5, m) > re);
  CHECK_CLOSE(acp_skin_friction(re, m, 0.1, len, 0.152e-5), smooth, 0.0, 0.0, "below cutoff");
  /* Rougher always means at least as much friction. */
  double prev = smooth;
  for (double k = 1e-7; k < 1e-3; k *= 2.0) {
    const double cf = acp_skin_friction(re, m, 0.0, len, k);
    assert_true(cf >= prev);
    prev = cf;
  }
}

static void test_bad_input(void **state) {
  (void)state;
  const double nan = (double)NAN, inf = (double)INFINITY;
  const double bad_re[] = {nan, inf, -inf, 0.0, -1.0e6, 999.0, 1.1e10};
  for (size_t i = 0; i < sizeof bad_re / sizeof bad_re[0]; ++i) {
    CHECK_NAN(acp_skin_friction_laminar(bad_re[i]), "laminar");
    CHECK_NAN(acp_skin_friction_turbulent(bad_re[i], 0.5), "turbulent");
    CHECK_NAN(acp_skin_friction_mixed(bad_re[i], 0.5, 0.2), "mixed");
    CHECK_NAN(acp_skin_friction(bad_re[i], 0.5, 0.2, 1.0, 1e-5), "rough");
  }
  CHECK_NAN(acp_skin_friction_turbulent(1e6, -0.1), "negative Mach");
  CHECK_NAN(acp_skin_friction_turbulent(1e6, nan), "NaN Mach");
  CHECK_NAN(acp_skin_friction_turbulent(1e6, 5.5), "Mach above 5");
  CHECK_NAN(acp_roughness_cutoff_reynolds(0.0, 1e-5, 0.5), "zero length");
  CHECK_NAN(acp_roughness_cutoff_reynolds(1.0, 0.0, 0.5), "zero roughness");
  CHECK_NAN(acp_roughness_cutoff_reynolds(1.0, inf, 0.5), "infinite roughness");
  CHECK_NAN(acp_skin_friction(1e6, 0.5, 0.2, 1.0, -1e-5), "negative roughness");
  CHECK_NAN(acp_skin_friction(1e6, 0.5, 0.2, -1.0, 1e-5), "negative length");
  CHECK_NAN(acp_skin_friction(1e6, 0.5, nan, 1.0, 1e-5), "NaN fraction");
}

int main(void) {
  const struct CMUnitTest tests[] = {
      cmocka_unit_test(test_laminar), cmocka_unit_test(test_turbulent),
      cmocka_unit_test(test_mixed),   cmocka_unit_test(test_roughness),
      cmocka_unit_test(test_bad_input),
  };
  return cmocka_run_group_tests(tests, NULL, NULL);
}
