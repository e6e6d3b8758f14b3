/* Characteristic speeds, gliding and speed stability against the closed forms
   of the parabolic polar (any performance text, e.g. Raymer, Aircraft Design,
   chapter 17 "Performance and flight mechanics", or Anderson, Aircraft
   Performance and Design, chapter 5), the trade's rule of thumb VMR ~ 1.32
   VMD (common practice) and the optimality of the numerical speeds on the
   full model. */
#include "check.h"
#include "fixtures.h"

#include <acperf.h>

#define PI 3.14159265358979323846

/* Parabolic polar without Reynolds or Mach effects: CD = 0.02 + k CL^2,
   k = 1/(pi 7.5 0.8). */
static const char *SIMPLE = "wing_area = 30\nspan = 15\ncd0 = 0.02\noswald = 0.8\ncl_max = 1.5\n";
#define S_REF 30.0
#define CD0 0.02
#define K_IND (1.0 / (PI * 7.5 * 0.8))

static double density(double hp, double dtemp) {
  acp_atmos a;
  assert_int_equal(acp_isa(hp, dtemp, &a), ACP_OK);
  return a.density;
}

/* VMD = sqrt(2 W/(rho S)) (k/CD0)^(1/4) */
static double vmd_closed(double mass, double rho) {
  return sqrt(2.0 * mass * ACP_G0 / (rho * S_REF)) * pow(K_IND / CD0, 0.25);
}

typedef struct {
  double mass, hp, dtemp;
} cond_row;

static const cond_row CONDS[] = {
    {5000, 0, 0}, {5000, 10000, 0}, {3000, 2000, 25}, {8000, 6000, -20}, {12000, 11000, 10},
};

static void test_closed_forms(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_text(SIMPLE);
  for (size_t i = 0; i < sizeof CONDS / sizeof CONDS[0]; ++i) {
    const cond_row *c = &CONDS[i];
    acp_speed_set s;
    assert_int_equal(acp_speeds(ac, c->mass, c->hp, c->dtemp, &s), ACP_OK);
    const double rho = density(c->hp, c->dtemp), vmd = vmd_closed(c->mass, rho);
    /* tolerance 1e-8 relative: the search's documented accuracy is about 1e-10 */
    CHECK_CLOSE(s.vmd, vmd, 0.0, 1e-8, "VMD = sqrt(2W/(rho S)) (k/CD0)^1/4");
    CHECK_CLOSE(s.vmp, pow(3.0, -0.25) * vmd, 0.0, 1e-8, "VMP = 3^-1/4 VMD");
    CHECK_CLOSE(s.vmr, pow(3.0, 0.25) * vmd, 0.0, 1e-8, "VMR = 3^1/4 VMD");
    CHECK_CLOSE(s.ld_max, 1.0 / (2.0 * sqrt(CD0 * K_IND)), 0.0, 1e-12,
                "L/D max = 1/(2 sqrt(CD0 k))");
    CHECK_CLOSE(s.vs1g, sqrt(2.0 * c->mass * ACP_G0 / (rho * S_REF * 1.5)), 0.0, 1e-14,
                "VS1G = sqrt(2W/(rho S CLmax))");
    /* common practice: the maximum range speed is about 1.32 times VMD */
    CHECK_CLOSE(s.vmr / s.vmd, 1.32, 0.01, 0.0, "VMR about 1.32 VMD");
  }
  acp_aircraft_free(ac);
}

static void test_closed_form_with_cl_offset(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_text(SIMPLE);
  assert_int_equal(acp_aircraft_set(ac, "cl_min_drag", 0.2), ACP_OK);
  /* CD = CD0 + k (CL - CL0)^2: best L/D at CL* = sqrt(CD0/k + CL0^2),
     L/D max = 1/(2 k (CL* - CL0)) (derivation in docs/methods/drag.md) */
  const double cl0 = 0.2, cls = sqrt(CD0 / K_IND + cl0 * cl0);
  acp_speed_set s;
  assert_int_equal(acp_speeds(ac, 5000, 1000, 0, &s), ACP_OK);
  const double rho = density(1000, 0);
  CHECK_CLOSE(s.vmd, sqrt(2.0 * 5000 * ACP_G0 / (rho * S_REF * cls)), 0.0, 1e-8, "VMD with offset");
  CHECK_CLOSE(s.ld_max, 1.0 / (2.0 * K_IND * (cls - cl0)), 0.0, 1e-12, "L/D max with offset");
  acp_aircraft_free(ac);
}

static void test_cas_mach_forms(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_text(SIMPLE);
  acp_speed_set t, c, m;
  assert_int_equal(acp_speeds(ac, 6000, 5000, 10, &t), ACP_OK);
  assert_int_equal(acp_speeds_cas(ac, 6000, 5000, 10, &c), ACP_OK);
  assert_int_equal(acp_speeds_mach(ac, 6000, 5000, 10, &m), ACP_OK);
  CHECK_CLOSE(c.vmd, acp_tas_to_cas(t.vmd, 5000, 10), 0.0, 1e-15, "VMD CAS");
  CHECK_CLOSE(c.vmr, acp_tas_to_cas(t.vmr, 5000, 10), 0.0, 1e-15, "VMR CAS");
  CHECK_CLOSE(c.vs1g, acp_tas_to_cas(t.vs1g, 5000, 10), 0.0, 1e-15, "VS1G CAS");
  CHECK_CLOSE(m.vmp, acp_tas_to_mach(t.vmp, 5000, 10), 0.0, 1e-15, "VMP Mach");
  CHECK_CLOSE(c.ld_max, t.ld_max, 0.0, 0.0, "L/D unchanged");
  /* for this polar VMD is a constant EAS: the same at every altitude */
  acp_speed_set a0, a1;
  assert_int_equal(acp_speeds(ac, 6000, 0, 0, &a0), ACP_OK);
  assert_int_equal(acp_speeds(ac, 6000, 9000, 0, &a1), ACP_OK);
  CHECK_CLOSE(acp_tas_to_eas(a1.vmd, 9000, 0), acp_tas_to_eas(a0.vmd, 0, 0), 0.0, 1e-8,
              "VMD is a constant EAS for a parabolic polar");
  acp_aircraft_free(ac);
}

/* On the full model (Reynolds number, Mach, CL offset, wave drag) each speed
   is a local optimum of its objective: compare with speeds 0.1 % either side. */
static void test_optimal_on_full_model(void **state) {
  (void)state;
  static const char *files[] = {"regional_jet.toml", "light_twin.toml"};
  static const double cond[][3] = {{34000, 11277.6, 0}, {38000, 0, 15}, {30000, 7620, -10},
                                   {5500, 0, 0},        {5000, 7620, 0}, {4200, 3000, 20}};
  for (size_t f = 0; f < 2; ++f) {
    acp_aircraft *ac = aircraft_from_example(files[f]);
    for (size_t i = 3 * f; i < 3 * f + 3; ++i) {
      const double m = cond[i][0], hp = cond[i][1], dt = cond[i][2];
      acp_speed_set s;
      assert_int_equal(acp_speeds(ac, m, hp, dt, &s), ACP_OK);
      acp_drag_parts lo, mid, hi;
      for (int which = 0; which < 3; ++which) {
        const double v = which == 0 ? s.vmd : which == 1 ? s.vmp : s.vmr;
        assert_int_equal(acp_drag(ac, m, hp, dt, v * 0.999, &lo), ACP_OK);
        assert_int_equal(acp_drag(ac, m, hp, dt, v, &mid), ACP_OK);
        assert_int_equal(acp_drag(ac, m, hp, dt, v * 1.001, &hi), ACP_OK);
        const double p = which == 0 ? 0.0 : which == 1 ? 1.0 : -1.0; /* D V^p */
        const double flo = lo.total * pow(v * 0.999, p), fmid = mid.total * pow(v, p),
                     fhi = hi.total * pow(v * 1.001, p);
        assert_true(fmid < flo && fmid < fhi);
      }
      acp_drag_parts d;
      assert_int_equal(acp_drag(ac, m, hp, dt, s.vmd, &d), ACP_OK);
      CHECK_CLOSE(s.ld_max, m * ACP_G0 / d.total, 0.0, 1e-14, "L/D max = W/D(VMD)");
      assert_true(s.vmp < s.vmd && s.vmd < s.vmr && s.vs1g < s.vmp);
      /* plausibility of the demo aircraft (invented): L/D max 14 to 19 */
      assert_true(s.ld_max > 14.0 && s.ld_max < 19.0);
    }
    acp_aircraft_free(ac);
  }
  /* the light twin (no wave drag) keeps close to the rule of thumb */
  acp_aircraft *ac = aircraft_from_example("light_twin.toml");
  acp_speed_set s;
  assert_int_equal(acp_speeds(ac, 5000, 0, 0, &s), ACP_OK);
  CHECK_CLOSE(s.vmr / s.vmd, 1.32, 0.03, 0.0, "light twin VMR about 1.32 VMD (common practice)");
  acp_aircraft_free(ac);
  /* the regional jet at cruise altitude: wave drag holds VMR below the
     parabolic 1.316 VMD and below the drag-divergence Mach */
  ac = aircraft_from_example("regional_jet.toml");
  acp_speed_set mach;
  assert_int_equal(acp_speeds(ac, 34000, 11277.6, 0, &s), ACP_OK);
  assert_int_equal(acp_speeds_mach(ac, 34000, 11277.6, 0, &mach), ACP_OK);
  assert_true(s.vmr / s.vmd < 1.30);
  acp_polar_point p;
  assert_int_equal(acp_polar(ac, 34000, 11277.6, 0, s.vmr, 1.0, &p), ACP_OK);
  assert_true(mach.vmr < p.mach_drag_divergence);
  acp_aircraft_free(ac);
}

/* Least of CD/(CL^2 + CD^2)^(3/4) by scanning CL: the exact steady glide's sink
   rate is sqrt(2W/(rho S)) times it (derivation in docs/methods/drag.md). */
static double min_sink_scan(double *cl_best) {
  double best = INFINITY;
  for (int i = 0; i <= 200000; ++i) {
    const double cl = 0.2 + 2.3 * i / 200000.0, cd = CD0 + K_IND * cl * cl;
    const double f = cd / pow(cl * cl + cd * cd, 0.75);
    if (f < best) {
      best = f;
      *cl_best = cl;
    }
  }
  return best;
}

static void test_glide(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_text(SIMPLE);
  acp_glide_set g;
  acp_speed_set s;
  assert_int_equal(acp_glide(ac, 5000, 2000, 0, &g), ACP_OK);
  assert_int_equal(acp_speeds(ac, 5000, 2000, 0, &s), ACP_OK);
  const double rho = density(2000, 0), w = 5000 * ACP_G0;
  /* the best glide ratio of a polar without Reynolds or Mach effects is its
     L/D max; the glide flies CL* with lift W cos g, so V = VMD sqrt(cos g) */
  CHECK_CLOSE(g.best_glide_ratio, 1.0 / (2.0 * sqrt(CD0 * K_IND)), 0.0, 1e-12, "best glide = L/D max");
  const double gam = atan(1.0 / g.best_glide_ratio);
  CHECK_CLOSE(g.best_glide_speed, s.vmd * sqrt(cos(gam)), 0.0, 1e-8, "best glide speed");
  CHECK_CLOSE(g.best_glide_sink_rate, g.best_glide_speed * sin(gam), 0.0, 1e-12, "sink = V sin g");
  double cl_best;
  const double f = min_sink_scan(&cl_best);
  CHECK_CLOSE(g.min_sink_rate, sqrt(2.0 * w / (rho * S_REF)) * f, 0.0, 1e-8, "least sink rate");
  /* small-angle rule: least sink near VMP (within 1 %) */
  CHECK_CLOSE(g.min_sink_speed, s.vmp, 0.0, 0.01, "least-sink speed near VMP");
  assert_true(g.min_sink_rate < g.best_glide_sink_rate);
  assert_true(g.min_sink_speed < g.best_glide_speed);
  /* array form */
  double mass[2] = {5000, NAN}, hp[2] = {2000, 2000}, ratio[2], sink[2];
  assert_int_equal(acp_glide_n(ac, 2, mass, hp, NULL, ratio, NULL, NULL, NULL, sink), 1);
  CHECK_CLOSE(ratio[0], g.best_glide_ratio, 0.0, 0.0, "glide array = scalar");
  CHECK_CLOSE(sink[0], g.min_sink_rate, 0.0, 0.0, "glide array = scalar, sink");
  CHECK_NAN(ratio[1], "glide NaN element");
  CHECK_NAN(sink[1], "glide NaN element sink");
  assert_int_equal(acp_glide(ac, NAN, 0, 0, &g), ACP_ERR_INVALID);
  CHECK_NAN(g.best_glide_ratio, "glide NaN on error");
  assert_int_equal(acp_glide(ac, 5000, 0, 0, NULL), ACP_ERR_INVALID);
  acp_aircraft_free(ac);
}

static void test_speed_stability(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_example("regional_jet.toml");
  acp_speed_set s;
  assert_int_equal(acp_speeds(ac, 30000, 3000, 0, &s), ACP_OK);
  acp_stability st;
  /* below VMD: the back of the drag curve, speed unstable (common practice) */
  assert_int_equal(acp_speed_stability(ac, 30000, 3000, 0, 0.85 * s.vmd, &st), ACP_OK);
  assert_true(st.slope < 0.0);
  CHECK_CLOSE(st.stable, -1.0, 0.0, 0.0, "unstable below VMD");
  CHECK_CLOSE(st.vmd, s.vmd, 0.0, 0.0, "boundary is VMD");
  /* above VMD: speed stable */
  assert_int_equal(acp_speed_stability(ac, 30000, 3000, 0, 1.15 * s.vmd, &st), ACP_OK);
  assert_true(st.slope > 0.0);
  CHECK_CLOSE(st.stable, 1.0, 0.0, 0.0, "stable above VMD");
  /* at VMD the slope vanishes (to the search's accuracy) */
  acp_drag_parts d;
  assert_int_equal(acp_drag(ac, 30000, 3000, 0, s.vmd, &d), ACP_OK);
  assert_int_equal(acp_speed_stability(ac, 30000, 3000, 0, s.vmd, &st), ACP_OK);
  assert_true(fabs(st.slope) < 1e-6 * d.total / s.vmd);
  /* slope matches a wider central difference of acp_drag */
  acp_drag_parts a, b;
  const double v = 1.3 * s.vmd, h = 1e-3;
  assert_int_equal(acp_drag(ac, 30000, 3000, 0, v - h, &a), ACP_OK);
  assert_int_equal(acp_drag(ac, 30000, 3000, 0, v + h, &b), ACP_OK);
  assert_int_equal(acp_speed_stability(ac, 30000, 3000, 0, v, &st), ACP_OK);
  CHECK_CLOSE(st.slope, (b.total - a.total) / (2 * h), 0.0, 1e-6, "dD/dV");
  /* the array forms */
  double mass[3] = {30000, 30000, 30000}, hp[3] = {3000, 3000, 3000},
         tas[3] = {0.85 * s.vmd, 1.15 * s.vmd, NAN}, stable[3], slope[3];
  assert_int_equal(acp_speed_stability_n(ac, 3, mass, hp, NULL, tas, slope, NULL, stable), 1);
  CHECK_CLOSE(stable[0], -1.0, 0, 0, "array unstable");
  CHECK_CLOSE(stable[1], 1.0, 0, 0, "array stable");
  CHECK_NAN(stable[2], "array NaN speed");
  CHECK_NAN(slope[2], "array NaN speed slope");
  assert_int_equal(acp_speed_stability(ac, 30000, 3000, 0, -5.0, &st), ACP_ERR_RANGE);
  assert_int_equal(acp_speed_stability(ac, 30000, 3000, 0, NAN, &st), ACP_ERR_INVALID);
  CHECK_NAN(st.slope, "NaN on error");
  acp_aircraft_free(ac);
}

static void test_boundary_arrays(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_text(SIMPLE);
  /* boundary over masses and altitudes: the closed form of VMD */
  const double mass[6] = {4000, 5000, 6000, 4000, 5000, NAN};
  const double hp[6] = {0, 3000, 10000, 10000, 90000, 0};
  const double dtemp[6] = {0, 10, -10, 0, 0, 0};
  double tas[6], cas[6], mach[6];
  assert_int_equal(acp_speed_stability_boundary_n(ac, 6, mass, hp, dtemp, tas, cas, mach), 2);
  for (int i = 0; i < 4; ++i) {
    CHECK_CLOSE(tas[i], vmd_closed(mass[i], density(hp[i], dtemp[i])), 0.0, 1e-8, "boundary VMD");
    CHECK_CLOSE(cas[i], acp_tas_to_cas(tas[i], hp[i], dtemp[i]), 0.0, 1e-15, "boundary CAS");
    CHECK_CLOSE(mach[i], acp_tas_to_mach(tas[i], hp[i], dtemp[i]), 0.0, 1e-15, "boundary Mach");
  }
  CHECK_NAN(tas[4], "altitude outside the atmosphere");
  CHECK_NAN(mach[5], "NaN mass");
  /* the same through acp_speeds_n and its CAS form */
  double vmd[6], ld[6], vmdc[6];
  assert_int_equal(acp_speeds_n(ac, 6, mass, hp, dtemp, vmd, NULL, NULL, NULL, ld), 2);
  assert_int_equal(acp_speeds_cas_n(ac, 6, mass, hp, dtemp, vmdc, NULL, NULL, NULL, NULL), 2);
  for (int i = 0; i < 4; ++i) {
    CHECK_CLOSE(vmd[i], tas[i], 0.0, 0.0, "speeds_n VMD");
    CHECK_CLOSE(vmdc[i], cas[i], 0.0, 0.0, "speeds_cas_n VMD");
    CHECK_CLOSE(ld[i], 1.0 / (2.0 * sqrt(CD0 * K_IND)), 0.0, 1e-12, "speeds_n L/D");
  }
  CHECK_NAN(vmd[5], "speeds_n NaN");
  double vmdm[2];
  assert_int_equal(acp_speeds_mach_n(ac, 2, mass, hp, NULL, vmdm, NULL, NULL, NULL, NULL), 0);
  CHECK_CLOSE(vmdm[1], acp_tas_to_mach(vmd_closed(5000, density(3000, 0)), 3000, 0), 0.0, 1e-8,
              "speeds_mach_n");
  assert_int_equal(acp_speeds_n(ac, 2, NULL, hp, NULL, vmd, NULL, NULL, NULL, NULL), 2);
  acp_aircraft_free(ac);
}

static void test_errors(void **state) {
  (void)state;
  acp_aircraft *ac = aircraft_from_text(SIMPLE);
  acp_speed_set s;
  assert_int_equal(acp_speeds(NULL, 5000, 0, 0, &s), ACP_ERR_INVALID);
  CHECK_NAN(s.vmd, "NULL aircraft");
  assert_int_equal(acp_speeds(ac, 5000, 0, 0, NULL), ACP_ERR_INVALID);
  assert_int_equal(acp_speeds(ac, NAN, 0, 0, &s), ACP_ERR_INVALID);
  CHECK_NAN(s.ld_max, "NaN mass");
  assert_int_equal(acp_speeds(ac, 5000, INFINITY, 0, &s), ACP_ERR_INVALID);
  assert_int_equal(acp_speeds(ac, -1, 0, 0, &s), ACP_ERR_RANGE);
  assert_int_equal(acp_speeds(ac, 5000, -6000, 0, &s), ACP_ERR_RANGE);
  assert_int_equal(acp_speeds(ac, 5000, 0, -150, &s), ACP_ERR_RANGE);
  /* VMR above Mach 0.95 (no wave-drag model): ACP_ERR_RANGE, VMR NaN, the others given.
     VMD = 3^-1/4 VMR; at 10,000 m and 20,000 kg VMR = 3^1/4 x 226 m/s > 0.95 a = 284.6 m/s */
  assert_int_equal(acp_speeds(ac, 20000, 10000, 0, &s), ACP_ERR_RANGE);
  CHECK_NAN(s.vmr, "VMR beyond the model");
  CHECK_CLOSE(s.vmd, vmd_closed(20000, density(10000, 0)), 0.0, 1e-8, "VMD still given");
  /* no cl_max: vs1g NaN, no error */
  assert_int_equal(acp_aircraft_unset(ac, "cl_max"), ACP_OK);
  assert_int_equal(acp_speeds(ac, 5000, 0, 0, &s), ACP_OK);
  CHECK_NAN(s.vs1g, "no cl_max");
  /* an incomplete aircraft */
  assert_int_equal(acp_aircraft_unset(ac, "cd0"), ACP_OK);
  assert_int_equal(acp_speeds(ac, 5000, 0, 0, &s), ACP_ERR_INVALID);
  CHECK_NAN(s.vmd, "incomplete aircraft");
  acp_aircraft_free(ac);
}

int main(void) {
  const struct CMUnitTest tests[] = {
      cmocka_unit_test(test_closed_forms),          cmocka_unit_test(test_closed_form_with_cl_offset),
      cmocka_unit_test(test_cas_mach_forms),        cmocka_unit_test(test_optimal_on_full_model),
      cmocka_unit_test(test_glide),                 cmocka_unit_test(test_speed_stability),
      cmocka_unit_test(test_boundary_arrays),       cmocka_unit_test(test_errors),
  };
  return cmocka_run_group_tests(tests, NULL, NULL);
}
