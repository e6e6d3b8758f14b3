/* Drag polar: Raymer's form factors and Oswald formulas, the winglet relation,
   Korn / Lock compressibility, the component build-up and the drag functions.
   Each check value names its source. Values marked "evaluated by hand" were
   computed from the published formula with Python 3 (float64) by the author
   of this test, independently of the library's code, and are quoted to 17
   significant digits. */
#include "check.h"
#include "fixtures.h"

#include <string.h>

#include <acperf.h>

#define PI 3.14159265358979323846
#define EPS 2.220446049250313e-16

/* ---- formula tables -------------------------------------------------------- */

typedef struct {
  double tc, xc, sweep_deg, mach, want;
  const char *source;
} ff_surface_row;

static void test_form_factor_surface(void **state) {
  (void)state;
  static const ff_surface_row rows[] = {
      /* Raymer, Aircraft Design 4th ed., eq. 12.30, evaluated by hand:
         (1 + 0.6/0.3*0.12 + 100*0.12^4) * 1.34*0.5^0.18 */
      {0.12, 0.3, 0.0, 0.5, 1.4912262959402034, "Raymer eq. 12.30, t/c .12 x/c .3 M .5"},
      /* (1 + 0.6/0.4*0.09 + 100*0.09^4) * 1.34*0.8^0.18 * cos(30 deg)^0.28 */
      {0.09, 0.4, 30.0, 0.8, 1.4114603937099992, "Raymer eq. 12.30, t/c .09 x/c .4 30 deg M .8"},
      /* Below M = 0.1967 the Mach factor is held at 1 (project's choice):
         1 + 0.6/0.3*0.12 + 100*0.12^4 = 1.260736 exactly */
      {0.12, 0.3, 0.0, 0.1, 1.260736, "Raymer eq. 12.30 with the Mach factor held at 1"},
      {0.0, 0.3, 0.0, 0.1, 1.0, "zero thickness at low Mach: 1"},
  };
  for (size_t i = 0; i < sizeof rows / sizeof rows[0]; ++i)
    CHECK_CLOSE(acp_form_factor_surface(rows[i].tc, rows[i].xc, rows[i].sweep_deg * PI / 180.0,
                                        rows[i].mach),
                rows[i].want, 0.0, 8 * EPS, rows[i].source);
  /* continuity of the held Mach factor at (1/1.34)^(1/0.18) = 0.19672621276765 */
  const double m0 = 0.19672621276765;
  CHECK_CLOSE(acp_form_factor_surface(0.12, 0.3, 0.0, m0 * (1 + 1e-9)),
              acp_form_factor_surface(0.12, 0.3, 0.0, m0 * (1 - 1e-9)), 0.0, 1e-9,
              "form factor continuous where the Mach factor reaches 1");
  CHECK_NAN(acp_form_factor_surface(NAN, 0.3, 0.0, 0.5), "NaN t/c");
  CHECK_NAN(acp_form_factor_surface(0.12, 0.05, 0.0, 0.5), "x/c below 0.1");
  CHECK_NAN(acp_form_factor_surface(0.12, 0.3, 2.0, 0.5), "sweep above 70 deg");
  CHECK_NAN(acp_form_factor_surface(0.12, 0.3, 0.0, 1.2), "supersonic");
  CHECK_NAN(acp_form_factor_surface(0.12, 0.3, 0.0, INFINITY), "Inf Mach");
}

static void test_form_factor_bodies(void **state) {
  (void)state;
  /* Raymer eq. 12.31: 1 + 60/f^3 + f/400; f = 8: 1 + 0.1171875 + 0.02 = 1.1371875 (by hand) */
  CHECK_CLOSE(acp_form_factor_body(8.0), 1.1371875, 0.0, 4 * EPS, "Raymer eq. 12.31, f = 8");
  /* f = 3: 1 + 60/27 + 3/400 = 3.2297222222222222 (by hand) */
  CHECK_CLOSE(acp_form_factor_body(3.0), 3.2297222222222222, 0.0, 4 * EPS,
              "Raymer eq. 12.31, f = 3");
  /* Raymer eq. 12.32: 1 + 0.35/f; f = 4: 1.0875, f = 2.5: 1.14 (by hand) */
  CHECK_CLOSE(acp_form_factor_nacelle(4.0), 1.0875, 0.0, 4 * EPS, "Raymer eq. 12.32, f = 4");
  CHECK_CLOSE(acp_form_factor_nacelle(2.5), 1.14, 0.0, 4 * EPS, "Raymer eq. 12.32, f = 2.5");
  CHECK_NAN(acp_form_factor_body(0.5), "fineness below 1");
  CHECK_NAN(acp_form_factor_nacelle(NAN), "NaN fineness");
  CHECK_NAN(acp_form_factor_body(-INFINITY), "-Inf fineness");
}

static void test_oswald_and_winglet(void **state) {
  (void)state;
  /* Raymer eq. 12.48: 1.78 (1 - 0.045 A^0.68) - 0.64, A = 8, by hand */
  CHECK_CLOSE(acp_oswald_straight(8.0), 0.81059232993939634, 0.0, 8 * EPS, "Raymer eq. 12.48, A 8");
  /* Raymer eq. 12.49: 4.61 (1 - 0.045 A^0.68) cos(45 deg)^0.15 - 3.1, A = 4, by hand */
  CHECK_CLOSE(acp_oswald_swept(4.0, 45.0 * PI / 180.0), 0.77094875918305661, 0.0, 16 * EPS,
              "Raymer eq. 12.49, A 4, 45 deg");
  /* the library's blend: half way between eq. 12.48 and eq. 12.49 at 30 deg for 15 deg */
  CHECK_CLOSE(acp_oswald_estimate(8.0, 15.0 * PI / 180.0), 0.69363642717373586, 0.0, 16 * EPS,
              "linear blend at 15 deg (project's choice)");
  CHECK_CLOSE(acp_oswald_estimate(8.0, 0.0), acp_oswald_straight(8.0), 0.0, 0.0, "blend at 0");
  CHECK_CLOSE(acp_oswald_estimate(4.0, 45.0 * PI / 180.0), acp_oswald_swept(4.0, 45.0 * PI / 180.0),
              0.0, 0.0, "blend above 30 deg is eq. 12.49");
  CHECK_NAN(acp_oswald_straight(0.5), "A below 1");
  CHECK_NAN(acp_oswald_swept(8.0, NAN), "NaN sweep");
  /* End-plate relation A (1 + 1.9 h/b) quoted by Raymer: 9 (1 + 1.9/30) = 9.57 */
  CHECK_CLOSE(acp_winglet_aspect_ratio(9.0, 1.0, 30.0), 9.57, 0.0, 4 * EPS, "A_eff, h 1 b 30");
  CHECK_CLOSE(acp_winglet_aspect_ratio(9.0, 0.0, 30.0), 9.0, 0.0, 0.0, "no winglet");
  CHECK_NAN(acp_winglet_aspect_ratio(9.0, 20.0, 30.0), "winglet above b/2");
  CHECK_NAN(acp_winglet_aspect_ratio(9.0, 1.0, 0.0), "span 0");
}

static void test_korn_lock(void **state) {
  (void)state;
  /* Korn equation, unswept: Mdd = kappa - t/c - CL/10 = 0.95 - 0.12 - 0.05 = 0.78 */
  CHECK_CLOSE(acp_korn_mach(0.95, 0.12, 0.0, 0.5), 0.78, 0.0, 4 * EPS, "Korn 2-D, supercritical");
  /* with 25 deg sweep (Mason's simple-sweep form), by hand:
     0.95/cos25 - 0.12/cos^2 25 - 0.5/(10 cos^3 25) */
  CHECK_CLOSE(acp_korn_mach(0.95, 0.12, 25.0 * PI / 180.0, 0.5), 0.8349509062435102, 0.0, 8 * EPS,
              "Korn with sweep 25 deg");
  CHECK_CLOSE(acp_korn_mach(0.87, 0.10, 0.0, -0.4), acp_korn_mach(0.87, 0.10, 0.0, 0.4), 0.0, 0.0,
              "Korn uses |CL|");
  CHECK_NAN(acp_korn_mach(1.2, 0.1, 0.0, 0.5), "kappa above 1");
  CHECK_NAN(acp_korn_mach(0.95, 0.1, NAN, 0.5), "NaN sweep");
  /* Mcrit = Mdd - (0.1/80)^(1/3); (0.1/80)^(1/3) = 0.1077217345015942 by hand */
  CHECK_CLOSE(acp_critical_mach(0.8), 0.8 - 0.1077217345015942, 0.0, 4 * EPS, "Mcrit from Mdd");
  CHECK_NAN(acp_critical_mach(INFINITY), "Inf Mdd");
  /* Lock: 20 (M - Mcrit)^4 above, 0 below, continuous at Mcrit */
  CHECK_CLOSE(acp_wave_drag_coefficient(0.8, 0.7), 20.0 * 1e-4, 0.0, 1e-12, "Lock, dM = 0.1");
  CHECK_CLOSE(acp_wave_drag_coefficient(0.5, 0.7), 0.0, 0.0, 0.0, "Lock below Mcrit: 0");
  CHECK_CLOSE(acp_wave_drag_coefficient(0.7, 0.7), 0.0, 0.0, 0.0, "Lock at Mcrit: 0");
  CHECK_CLOSE(acp_wave_drag_coefficient(0.7 + 1e-6, 0.7), 0.0, 1e-22, 0.0,
              "Lock continuous just above Mcrit");
  /* slope 0.1 at Mdd = Mcrit + (0.1/80)^(1/3): the definition of drag divergence */
  const double mcrit = 0.7, mdd = mcrit + 0.1077217345015942, h = 1e-6;
  CHECK_CLOSE((acp_wave_drag_coefficient(mdd + h, mcrit) - acp_wave_drag_coefficient(mdd - h, mcrit)) /
                  (2 * h),
              0.1, 1e-9, 0.0, "dCDw/dM = 0.1 at Mdd");
  CHECK_NAN(acp_wave_drag_coefficient(NAN, 0.7), "NaN Mach");
  CHECK_NAN(acp_wave_drag_coefficient(0.8, NAN), "NaN Mcrit");
}

/* ---- aircraft for the drag checks ------------------------------------------ */

static const char *SIMPLE = "wing_area = 30\nspan = 15\ncd0 = 0.02\noswald = 0.8\ncl_max = 1.5\n";

/* One surface, evaluated by hand at sea level ISA, 100 m/s, with the ISO 2533
   sea-level state rho = p0/(R T0) = 1.22500001812 kg/m3, mu = 1.78938027808e-05 Pa s
   (Sutherland, ISO 2533 eq. 22), a = 340.293988026 m/s: M = 0.293863551866,
   Re = rho*100*2/mu = 13691891.3563, Cf = 0.455/(log10 Re^2.58 (1+0.144 M^2)^0.65)
   = 0.00283489139989 (Raymer eq. 12.27), FF = 1.35517438059 (eq. 12.30), q = 6125.00009 Pa,
   Swet 40 m2: friction q Cf Swet = 694.548403249 N, form q Cf (FF-1) Swet = 246.685798913 N,
   interference q Cf FF Swet = 94.1234202162 N (Q = 1.1). */
static const char *ONE_WING = "wing_area = 20\nspan = 12\noswald = 0.8\n"
                              "[component.wing]\ntype = \"surface\"\nwetted_area = 40\n"
                              "length = 2\nthickness_ratio = 0.12\nmax_thickness_position = 0.3\n"
                              "interference = 1.1\n";

static void test_build_up_by_hand(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_text(ONE_WING);
  acp_component_drag c;
  assert_int_equal(acp_drag_component(ac, 0, 0.0, 0.0, 100.0, &c), ACP_OK);
  CHECK_CLOSE(c.reynolds, 13691891.3563, 0.0, 1e-9, "Re on the chord");
  CHECK_CLOSE(c.skin_friction, 0.00283489139989, 0.0, 1e-9, "Cf turbulent, Raymer eq. 12.27");
  CHECK_CLOSE(c.form_factor, 1.35517438059, 0.0, 1e-9, "FF, Raymer eq. 12.30");
  CHECK_CLOSE(c.interference_factor, 1.1, 0.0, 0.0, "Q");
  CHECK_CLOSE(c.friction, 694.548403249, 0.0, 1e-9, "friction q Cf Swet");
  CHECK_CLOSE(c.form, 246.685798913, 0.0, 1e-9, "form q Cf (FF-1) Swet");
  CHECK_CLOSE(c.interference, 94.1234202162, 0.0, 1e-9, "interference q Cf FF (Q-1) Swet");
  acp_drag_parts d;
  assert_int_equal(acp_drag(ac, 2000.0, 0.0, 0.0, 100.0, &d), ACP_OK);
  CHECK_CLOSE(d.friction, 694.548403249, 0.0, 1e-9, "aircraft friction = the one component");
  CHECK_CLOSE(d.parasite, 694.548403249 + 246.685798913 + 94.1234202162, 0.0, 1e-9, "parasite");
  assert_int_equal(acp_drag_component(ac, 1, 0.0, 0.0, 100.0, &c), ACP_ERR_RANGE);
  CHECK_NAN(c.friction, "no component 1");
  acp_aircraft_free(ac);
}

static void test_parts_sum(void **state) {
  (void)state;
  static const char *files[] = {"regional_jet.toml", "light_twin.toml"};
  static const double cond[][4] = {/* mass kg, hp m, dtemp K, tas m/s */
                                   {34000, 11277.6, 0, 230},  {36000, 0, 15, 120},
                                   {30000, 7620, -10, 200},   {5000, 0, 0, 70},
                                   {5000, 7620, 0, 130},      {4000, 3000, 20, 90}};
  for (size_t f = 0; f < 2; ++f) {
    acp_aircraft *ac = aircraft_from_example(files[f]);
    for (size_t i = 0; i < sizeof cond / sizeof cond[0]; ++i) {
      acp_drag_parts d;
      acp_polar_point p;
      assert_int_equal(acp_drag(ac, cond[i][0], cond[i][1], cond[i][2], cond[i][3], &d), ACP_OK);
      assert_int_equal(acp_polar(ac, cond[i][0], cond[i][1], cond[i][2], cond[i][3], 1.0, &p),
                       ACP_OK);
      /* DESIGN.md: parasite = friction + form + interference with a build-up */
      CHECK_CLOSE(d.friction + d.form + d.interference, d.parasite, 0.0, 1e-13,
                  "friction + form + interference = parasite");
      CHECK_CLOSE(d.parasite + d.induced + d.wave, d.total, 0.0, 1e-13, "parts sum to total");
      CHECK_CLOSE(p.cd_friction + p.cd_form + p.cd_interference + p.cd_leakage + p.cd_misc, p.cd0,
                  0.0, 1e-13, "coefficients sum to CD0");
      /* sum over the components of acp_drag_component = the build-up before increments */
      double sum = 0.0;
      for (size_t k = 0;; ++k) {
        acp_component_drag c;
        if (acp_drag_component(ac, k, cond[i][1], cond[i][2], cond[i][3], &c) != ACP_OK) break;
        sum += c.parasite;
      }
      double s;
      assert_int_equal(acp_aircraft_get(ac, "wing_area", &s), ACP_OK);
      CHECK_CLOSE(sum / (p.dynamic_pressure * s), p.cd_friction + p.cd_form + p.cd_interference,
                  0.0, 1e-12, "components add up to the build-up");
      assert_true(d.friction > 0 && d.form > 0 && d.interference > 0 && d.induced > 0);
    }
    acp_aircraft_free(ac);
  }
}

/* Change one key, compare the drag at one condition. */
static double drag_with(const char *text, const char *key, double value, double tas) {
  acp_aircraft *ac = aircraft_from_text(text);
  if (key) assert_int_equal(acp_aircraft_set(ac, key, value), ACP_OK);
  acp_drag_parts d;
  assert_int_equal(acp_drag(ac, 2000.0, 0.0, 0.0, tas, &d), ACP_OK);
  acp_aircraft_free(ac);
  return d.total;
}

static void test_what_a_change_buys(void **state) {
  (void)state;
  const double base = drag_with(ONE_WING, NULL, 0, 100.0);
  /* Raymer section 12.5.3: a rough skin (cutoff Reynolds number below the flow's) raises Cf */
  assert_true(drag_with(ONE_WING, "component.wing.roughness", 1.015e-5, 100.0) >= base);
  assert_true(drag_with(ONE_WING, "component.wing.roughness", 1e-4, 100.0) > base);
  assert_true(drag_with(ONE_WING, "component.wing.roughness", 1e-4, 100.0) >
              drag_with(ONE_WING, "component.wing.roughness", 1e-5, 100.0));
  /* a worse interference factor raises drag by exactly Cf FF dQ Swet q */
  CHECK_CLOSE(drag_with(ONE_WING, "component.wing.interference", 1.3, 100.0) - base,
              694.548403249 * 1.35517438059 * 0.2, 0.0, 1e-8, "dQ = 0.2 costs q Cf FF 0.2 Swet");
  /* laminar flow lowers drag; a longer span and winglets lower induced drag */
  assert_true(drag_with(ONE_WING, "component.wing.laminar_fraction", 0.5, 100.0) < base);
  assert_true(drag_with(ONE_WING, "span", 14.0, 100.0) < base);
  assert_true(drag_with(ONE_WING, "winglet_height", 0.6, 100.0) < base);
  /* the miscellaneous and leakage increments add drag */
  assert_true(drag_with(ONE_WING, "cd_misc", 0.001, 100.0) > base);
  CHECK_CLOSE(drag_with(ONE_WING, "leakage_fraction", 0.05, 100.0) - base,
              0.05 * (694.548403249 + 246.685798913 + 94.1234202162), 0.0, 1e-8,
              "leakage is a fraction of the components' drag");
  /* a form-factor override replaces the formula */
  CHECK_CLOSE(drag_with(ONE_WING, "component.wing.form_factor", 1.0, 100.0) - base,
              -(246.685798913 + 94.1234202162) + 694.548403249 * 0.1 - 0.0, 0.0, 1e-8,
              "FF = 1: no form drag, interference Cf (Q-1) Swet q");
}

static void test_cd0_polar(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_text(SIMPLE);
  acp_drag_parts d;
  acp_atmos atm;
  assert_int_equal(acp_isa(0.0, 0.0, &atm), ACP_OK);
  const double tas = 80.0, mass = 5000.0, q = 0.5 * atm.density * tas * tas;
  const double k = 1.0 / (PI * 7.5 * 0.8), cl = mass * ACP_G0 / (q * 30.0);
  assert_int_equal(acp_drag(ac, mass, 0.0, 0.0, tas, &d), ACP_OK);
  /* DESIGN.md: with a single cd0 the three parts are NaN */
  CHECK_NAN(d.friction, "cd0: friction NaN");
  CHECK_NAN(d.form, "cd0: form NaN");
  CHECK_NAN(d.interference, "cd0: interference NaN");
  CHECK_CLOSE(d.parasite, 0.02 * q * 30.0, 0.0, 1e-14, "parasite = CD0 q S");
  CHECK_CLOSE(d.induced, k * cl * cl * q * 30.0, 0.0, 1e-14, "induced = k CL^2 q S, k = 1/(pi A e)");
  CHECK_CLOSE(d.wave, 0.0, 0.0, 0.0, "no korn_kappa: no wave drag");
  /* a 60 deg bank doubles the load factor and quadruples the induced drag */
  acp_drag_parts t;
  assert_int_equal(acp_drag_bank(ac, mass, 0.0, 0.0, tas, 60.0 * PI / 180.0, &t), ACP_OK);
  CHECK_CLOSE(t.induced, 4.0 * d.induced, 0.0, 1e-13, "n = 1/cos 60 = 2: induced x 4");
  CHECK_CLOSE(t.parasite, d.parasite, 0.0, 0.0, "parasite independent of lift");
  assert_int_equal(acp_drag_load(ac, mass, 0.0, 0.0, tas, 2.0, &t), ACP_OK);
  CHECK_CLOSE(t.induced, 4.0 * d.induced, 0.0, 1e-13, "load factor 2");
  /* minimum-drag CL offset: induced = k (CL - CL_md)^2 */
  assert_int_equal(acp_aircraft_set(ac, "cl_min_drag", 0.2), ACP_OK);
  assert_int_equal(acp_drag_load(ac, mass, 0.0, 0.0, tas, 0.0, &t), ACP_OK);
  CHECK_CLOSE(t.induced, k * 0.04 * q * 30.0, 0.0, 1e-13, "n = 0: k CL_md^2 q S");
  acp_aircraft_free(ac);
}

static void test_wave_drag_in_polar(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_example("regional_jet.toml");
  acp_polar_point p;
  const double hp = 11277.6, mass = 34000.0;
  /* below Mcrit: zero wave drag */
  assert_int_equal(acp_polar(ac, mass, hp, 0.0, 180.0, 1.0, &p), ACP_OK);
  assert_true(p.mach < p.mach_critical);
  CHECK_CLOSE(p.cd_wave, 0.0, 0.0, 0.0, "no wave drag below Mcrit");
  /* Mcrit and Mdd as the Korn / Lock relations at the polar's CL */
  CHECK_CLOSE(p.mach_drag_divergence, acp_korn_mach(0.92, 0.11, 0.4363, p.cl), 0.0, 1e-15,
              "Mdd is Korn at this CL");
  CHECK_CLOSE(p.mach_critical, p.mach_drag_divergence - 0.1077217345015942, 0.0, 1e-15, "Mcrit");
  /* above Mcrit: Lock's law */
  assert_int_equal(acp_polar(ac, mass, hp, 0.0, 240.0, 1.0, &p), ACP_OK);
  assert_true(p.mach > p.mach_critical);
  CHECK_CLOSE(p.cd_wave, 20.0 * pow(p.mach - p.mach_critical, 4), 0.0, 1e-14, "Lock 20 dM^4");
  /* the total drag is continuous across Mcrit: scan speeds finely */
  double prev = NAN;
  for (double v = 200.0; v < 230.0; v += 0.01) {
    acp_drag_parts d;
    assert_int_equal(acp_drag(ac, mass, hp, 0.0, v, &d), ACP_OK);
    if (!isnan(prev)) assert_true(fabs(d.total - prev) < 5.0); /* N per 0.01 m/s */
    prev = d.total;
  }
  acp_aircraft_free(ac);
}

static void test_drag_curve(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_example("light_twin.toml");
  double tas[40], par[40], ind[40], wave[40], tot[40];
  for (int i = 0; i < 40; ++i) tas[i] = 40.0 + 5.0 * i;
  assert_int_equal(acp_drag_curve(ac, 5000.0, 1500.0, 0.0, 40, tas, par, ind, wave, tot), 0);
  for (int i = 1; i < 40; ++i) {
    assert_true(par[i] > par[i - 1]); /* parasite drag rises with speed */
    assert_true(ind[i] < ind[i - 1]); /* induced drag falls */
    CHECK_CLOSE(par[i] + ind[i] + wave[i], tot[i], 0.0, 1e-14, "curve total");
  }
  /* array form element by element equals the scalar form; NaN element counted */
  double mass[3] = {5000, NAN, 5000}, hp[3] = {0, 0, 0}, v[3] = {70, 70, 2000}, tot3[3], fr3[3];
  assert_int_equal(acp_drag_n(ac, 3, mass, hp, NULL, v, NULL, fr3, NULL, NULL, NULL, NULL, NULL,
                              tot3),
                   2);
  acp_drag_parts d;
  assert_int_equal(acp_drag(ac, 5000, 0, 0, 70, &d), ACP_OK);
  CHECK_CLOSE(tot3[0], d.total, 0.0, 0.0, "array = scalar");
  CHECK_CLOSE(fr3[0], d.friction, 0.0, 0.0, "array = scalar, friction");
  CHECK_NAN(tot3[1], "NaN mass element");
  CHECK_NAN(tot3[2], "Mach > 0.95 element");
  CHECK_NAN(fr3[2], "Mach > 0.95 element friction");
  assert_int_equal(acp_drag_n(ac, 3, NULL, hp, NULL, v, NULL, NULL, NULL, NULL, NULL, NULL, NULL,
                              tot3),
                   3);
  assert_int_equal(acp_drag_n(ac, 0, mass, hp, NULL, v, NULL, NULL, NULL, NULL, NULL, NULL, NULL,
                              NULL),
                   0);
  acp_aircraft_free(ac);
}

typedef struct {
  double mass, hp, dtemp, tas, n;
  int want;
  const char *what;
} bad_row;

static void test_bad_arguments(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_text(SIMPLE);
  static const bad_row rows[] = {
      {NAN, 0, 0, 80, 1, ACP_ERR_INVALID, "NaN mass"},
      {5000, NAN, 0, 80, 1, ACP_ERR_INVALID, "NaN altitude"},
      {5000, 0, INFINITY, 80, 1, ACP_ERR_INVALID, "Inf ISA deviation"},
      {5000, 0, 0, NAN, 1, ACP_ERR_INVALID, "NaN speed"},
      {5000, 0, 0, INFINITY, 1, ACP_ERR_INVALID, "Inf speed"},
      {5000, 0, 0, 80, NAN, ACP_ERR_INVALID, "NaN load factor"},
      {0, 0, 0, 80, 1, ACP_ERR_RANGE, "zero mass"},
      {-5, 0, 0, 80, 1, ACP_ERR_RANGE, "negative mass"},
      {2e6, 0, 0, 80, 1, ACP_ERR_RANGE, "mass above 1e6 kg"},
      {5000, 0, 0, 0, 1, ACP_ERR_RANGE, "zero speed"},
      {5000, 0, 0, -10, 1, ACP_ERR_RANGE, "negative speed"},
      {5000, 0, 0, 330, 1, ACP_ERR_RANGE, "Mach above 0.95"},
      {5000, 90000, 0, 80, 1, ACP_ERR_RANGE, "altitude above the atmosphere"},
      {5000, 0, 150, 80, 1, ACP_ERR_RANGE, "ISA deviation above 100 K"},
      {5000, 0, 0, 80, 11, ACP_ERR_RANGE, "load factor above 10"},
      {5000, 0, 0, 80, -1, ACP_ERR_RANGE, "negative load factor"},
  };
  for (size_t i = 0; i < sizeof rows / sizeof rows[0]; ++i) {
    acp_drag_parts d;
    const int st = acp_drag_load(ac, rows[i].mass, rows[i].hp, rows[i].dtemp, rows[i].tas,
                                 rows[i].n, &d);
    if (st != rows[i].want) print_error("%s: status %d want %d\n", rows[i].what, st, rows[i].want);
    assert_int_equal(st, rows[i].want);
    CHECK_NAN(d.total, rows[i].what);
    CHECK_NAN(d.parasite, rows[i].what);
  }
  acp_drag_parts d;
  assert_int_equal(acp_drag(NULL, 5000, 0, 0, 80, &d), ACP_ERR_INVALID);
  CHECK_NAN(d.total, "NULL aircraft");
  assert_int_equal(acp_drag(ac, 5000, 0, 0, 80, NULL), ACP_ERR_INVALID);
  assert_int_equal(acp_drag_bank(ac, 5000, 0, 0, 80, 89.0 * PI / 180.0, &d), ACP_ERR_RANGE);
  assert_int_equal(acp_drag_bank(ac, 5000, 0, 0, 80, NAN, &d), ACP_ERR_INVALID);
  acp_polar_point p;
  assert_int_equal(acp_polar(ac, 5000, 0, 0, 80, 1, NULL), ACP_ERR_INVALID);
  assert_int_equal(acp_polar(ac, NAN, 0, 0, 80, 1, &p), ACP_ERR_INVALID);
  CHECK_NAN(p.cd, "polar NaN on error");
  /* an incomplete aircraft is an invalid argument */
  assert_int_equal(acp_aircraft_unset(ac, "span"), ACP_OK);
  assert_int_equal(acp_drag(ac, 5000, 0, 0, 80, &d), ACP_ERR_INVALID);
  CHECK_NAN(d.total, "incomplete aircraft");
  acp_aircraft_free(ac);
  /* a component Reynolds number below 1e3 is outside the model */
  ac = aircraft_from_text(ONE_WING);
  assert_int_equal(acp_drag(ac, 2000, 0, 0, 0.001, &d), ACP_ERR_RANGE);
  acp_aircraft_free(ac);
}

static void test_derived_keys(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_text(SIMPLE);
  double v;
  assert_int_equal(acp_aircraft_get(ac, "aspect_ratio", &v), ACP_OK);
  CHECK_CLOSE(v, 7.5, 0.0, 4 * EPS, "A = b^2/S");
  assert_int_equal(acp_aircraft_get(ac, "induced_factor", &v), ACP_OK);
  CHECK_CLOSE(v, 1.0 / (PI * 7.5 * 0.8), 0.0, 4 * EPS, "k = 1/(pi A e)");
  assert_int_equal(acp_aircraft_get(ac, "oswald_effective", &v), ACP_OK);
  CHECK_CLOSE(v, 0.8, 0.0, 0.0, "e given");
  assert_int_equal(acp_aircraft_unset(ac, "oswald"), ACP_OK);
  assert_int_equal(acp_aircraft_get(ac, "oswald_effective", &v), ACP_OK);
  CHECK_CLOSE(v, acp_oswald_straight(7.5), 0.0, 0.0, "e estimated when not given");
  assert_int_equal(acp_aircraft_set(ac, "winglet_height", 0.75), ACP_OK);
  assert_int_equal(acp_aircraft_get(ac, "aspect_ratio_effective", &v), ACP_OK);
  CHECK_CLOSE(v, 7.5 * (1 + 1.9 * 0.75 / 15), 0.0, 4 * EPS, "A_eff with winglets");
  assert_int_equal(acp_aircraft_set(ac, "induced_factor", 0.05), ACP_ERR_INVALID);
  assert_int_equal(acp_aircraft_get(ac, "component_count", &v), ACP_OK);
  CHECK_CLOSE(v, 0.0, 0.0, 0.0, "no components");
  acp_aircraft_free(ac);
}

int main(void) {
  const struct CMUnitTest tests[] = {
      cmocka_unit_test(test_form_factor_surface), cmocka_unit_test(test_form_factor_bodies),
      cmocka_unit_test(test_oswald_and_winglet),  cmocka_unit_test(test_korn_lock),
      cmocka_unit_test(test_build_up_by_hand),    cmocka_unit_test(test_parts_sum),
      cmocka_unit_test(test_what_a_change_buys),  cmocka_unit_test(test_cd0_polar),
      cmocka_unit_test(test_wave_drag_in_polar),  cmocka_unit_test(test_drag_curve),
      cmocka_unit_test(test_bad_arguments),       cmocka_unit_test(test_derived_keys),
  };
  return cmocka_run_group_tests(tests, NULL, NULL);
}
