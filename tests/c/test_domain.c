/* Input-domain audit: every public function of the covered modules (status,
   version, units, atmosphere, airspeed, friction) at and just outside each
   documented edge of each argument, and with NaN and +-Inf.

   One row per function: a nominal valid point and, per argument, the
   documented interval with the value just inside and just outside each
   edge and the status documented there. Exact edges use the next double
   outward. Edges that are a result's range (pressure altitude of a pressure,
   Mach 5 of a speed) are tested 1e-12 relative (or 1 mm) outside, because
   the library takes a result within round-off of the edge (1e-14 relative,
   1 micrometre) as the edge. Scalar forms report every error as NaN
   ("NAN_ERR"). Point checks then cover what a per-argument interval cannot
   (zero or negative where the error changes kind, NULL pointers, array
   forms), and the regressions found by fuzzing (tests/reliability). */
#include "domain.h"

/* ---- wrappers: status forms return their status, scalar forms NAN_ERR ---- */
#define SCALAR1(f) static int w_##f(const double *x, double *o) { *o = f(x[0]); return isnan(*o) ? NAN_ERR : ACP_OK; }
#define SCALAR2(f) static int w_##f(const double *x, double *o) { *o = f(x[0], x[1]); return isnan(*o) ? NAN_ERR : ACP_OK; }
#define SCALAR3(f) static int w_##f(const double *x, double *o) { *o = f(x[0], x[1], x[2]); return isnan(*o) ? NAN_ERR : ACP_OK; }
#define SCALAR4(f) static int w_##f(const double *x, double *o) { *o = f(x[0], x[1], x[2], x[3]); return isnan(*o) ? NAN_ERR : ACP_OK; }
#define SCALAR5(f) static int w_##f(const double *x, double *o) { *o = f(x[0], x[1], x[2], x[3], x[4]); return isnan(*o) ? NAN_ERR : ACP_OK; }
#define STATUS1(f) static int w_##f(const double *x, double *o) { return f(x[0], o); }
#define STATUS2(f) static int w_##f(const double *x, double *o) { return f(x[0], x[1], o); }

static int w_acp_isa(const double *x, double *o) {
  acp_atmos a;
  const int st = acp_isa(x[0], x[1], &a);
  /* Every field NaN on error, every field finite on success. */
  const double f[6] = {a.temperature, a.pressure, a.density, a.sound_speed,
                       a.dynamic_viscosity, a.kinematic_viscosity};
  for (int i = 1; i < 6; ++i)
    if (isnan(f[i]) != isnan(f[0])) return 99;
  *o = a.temperature;
  return st;
}
SCALAR2(acp_isa_temperature)
SCALAR1(acp_isa_pressure)
SCALAR2(acp_isa_density)
SCALAR2(acp_isa_sound_speed)
STATUS1(acp_isa_pressure_altitude)
SCALAR1(acp_geopotential_altitude)
SCALAR1(acp_geometric_altitude)
STATUS1(acp_isa_density_altitude)
SCALAR2(acp_density_altitude)
SCALAR2(acp_isa_deviation)
SCALAR2(acp_outside_air_temperature)
SCALAR3(acp_total_temperature)
SCALAR3(acp_static_temperature)
STATUS2(acp_pressure_altitude_from_qnh)
STATUS2(acp_indicated_altitude_from_qnh)
static int w_acp_cold_temperature_correction(const double *x, double *o) {
  return acp_cold_temperature_correction(x[0], x[1], x[2], o);
}
SCALAR2(acp_cas_to_mach)
SCALAR2(acp_mach_to_cas)
SCALAR3(acp_cas_to_tas)
SCALAR3(acp_tas_to_cas)
SCALAR3(acp_tas_to_mach)
SCALAR3(acp_mach_to_tas)
SCALAR3(acp_eas_to_tas)
SCALAR3(acp_tas_to_eas)
SCALAR2(acp_cas_to_eas)
SCALAR2(acp_eas_to_cas)
SCALAR2(acp_mach_to_eas)
SCALAR2(acp_eas_to_mach)
SCALAR2(acp_impact_pressure)
STATUS1(acp_pressure_ratio_to_mach)
SCALAR1(acp_cas_to_impact_pressure)
SCALAR1(acp_impact_pressure_to_cas)
SCALAR2(acp_dynamic_pressure)
STATUS2(acp_crossover_altitude)
SCALAR3(acp_reynolds_per_metre)
static int w_acp_wind_triangle(const double *x, double *o) {
  double hdg, drift;
  const int st = acp_wind_triangle(x[0], x[1], x[2], x[3], o, &hdg, &drift);
  if (isnan(hdg) != isnan(*o) || isnan(drift) != isnan(*o)) return 99;
  return st;
}
SCALAR1(acp_skin_friction_laminar)
SCALAR2(acp_skin_friction_turbulent)
SCALAR3(acp_skin_friction_mixed)
SCALAR3(acp_roughness_cutoff_reynolds)
SCALAR5(acp_skin_friction)
SCALAR4(acp_form_factor_surface)
SCALAR1(acp_form_factor_body)
SCALAR1(acp_form_factor_nacelle)
static int w_acp_to_si(const double *x, double *o) { return acp_to_si(x[0], "kt", o); }
static int w_acp_from_si(const double *x, double *o) { return acp_from_si(x[0], "kt", o); }

/* One call: the status and the output agree with the expectation. */
static int expect(const row *r, const double *x, int want, const char *what, int arg) {
  double out = 0.0;
  const int st = r->call(x, &out);
  const int got = r->scalar ? (isnan(out) ? NAN_ERR : ACP_OK) : st;
  int ok = got == want;
  if (!r->scalar) ok = ok && (st == ACP_OK ? isfinite(out) : isnan(out));
  else ok = ok && (isnan(out) || isfinite(out));
  if (!ok)
    print_error("%s: argument %d %s (%.17g): status %d output %.17g, want %d\n", r->fn, arg + 1,
                what, x[arg], st, out, want);
  return ok;
}

#define ROW(f, scalar, n, nom, ...) {#f, w_##f, scalar, n, nom, {__VA_ARGS__}}

static void test_edges(void **state) {
  (void)state;
  const int R = ACP_ERR_RANGE, I = ACP_ERR_INVALID, N = NAN_ERR;
  const bound HP = closed(ACP_ISA_HP_MIN, ACP_ISA_HP_MAX, R), DT = closed(-100.0, 100.0, R);
  const bound MACH = closed(0.0, ACP_MACH_MAX, N);
  /* Speeds whose Mach number at sea level is 0 to 5 (a0 = speed of sound at 288.15 K). */
  const bound SPEED = {0.0, -DBL_TRUE_MIN, 5.0 * ACP_A0, 5.0 * ACP_A0 * (1.0 + 1e-12), N, N};
  const double p_top = acp_isa_pressure(ACP_ISA_HP_MAX), p_bottom = acp_isa_pressure(ACP_ISA_HP_MIN);
  const double rho_top = acp_isa_density(ACP_ISA_HP_MAX, 0), rho_bottom = acp_isa_density(ACP_ISA_HP_MIN, 0);
  const double ratio5 = acp_impact_pressure(5.0, 0.0) / ACP_P0;
  const double qc5 = acp_cas_to_impact_pressure(5.0 * ACP_A0);
  const double deg70 = 70.0 * 3.14159265358979323846 / 180.0;
  /* Crossover of 150 m/s: the Mach numbers whose crossover is -5,000 m and at
     Mach 0.78 the CAS whose crossover is 84,852 and -5,000 m. */
  const double xm_lo = acp_cas_to_mach(150.0, ACP_ISA_HP_MIN);
  const double xc_lo = acp_mach_to_cas(0.78, ACP_ISA_HP_MAX), xc_hi = acp_mach_to_cas(0.78, ACP_ISA_HP_MIN);

  const row rows[] = {
      ROW(acp_isa, 0, 2, NOM(1000, 0), HP, DT),
      ROW(acp_isa_temperature, 1, 2, NOM(1000, 0), HP, DT),
      ROW(acp_isa_pressure, 1, 1, NOM(1000), HP),
      ROW(acp_isa_density, 1, 2, NOM(1000, 0), HP, DT),
      ROW(acp_isa_sound_speed, 1, 2, NOM(1000, 0), HP, DT),
      ROW(acp_isa_pressure_altitude, 0, 1, NOM(50000), rel(p_top, p_bottom, 1e-6, R)),
      ROW(acp_geopotential_altitude, 1, 1, NOM(0), closed(-10000.0, 1.0e6, N)),
      ROW(acp_geometric_altitude, 1, 1, NOM(0),
          closed(acp_geopotential_altitude(-10000.0), acp_geopotential_altitude(1.0e6), N)),
      ROW(acp_isa_density_altitude, 0, 1, NOM(1.0), rel(rho_top, rho_bottom, 1e-6, R)),
      ROW(acp_density_altitude, 1, 2, NOM(1000, 0), HP, DT),
      ROW(acp_isa_deviation, 1, 2, NOM(250, 0), rel(188.15, 388.15, 1e-12, N), HP),
      ROW(acp_outside_air_temperature, 1, 2, NOM(0, 1000), DT, HP),
      ROW(acp_total_temperature, 1, 3, NOM(250, 0.8, 1), positive(N), MACH, closed(0, 1, N)),
      ROW(acp_static_temperature, 1, 3, NOM(250, 0.8, 1), positive(N), MACH, closed(0, 1, N)),
      ROW(acp_pressure_altitude_from_qnh, 0, 2, NOM(1000, 101325),
          ((bound){-5000.0, -5000.001, 84852.0, 84852.001, R, R}), closed(80000, 110000, R)),
      ROW(acp_indicated_altitude_from_qnh, 0, 2, NOM(1000, 101325), HP, closed(80000, 110000, R)),
      ROW(acp_cold_temperature_correction, 0, 3, NOM(300, 0, 268.15),
          ((bound){0.0, -DBL_TRUE_MIN, 11000.0, up(11000.0), I, R}), closed(-5000, 10700, R),
          rel(188.15, 388.15, 1e-12, R)),
      ROW(acp_cas_to_mach, 1, 2, NOM(1, 0), SPEED, HP),
      ROW(acp_mach_to_cas, 1, 2, NOM(0.01, 0), MACH, HP),
      ROW(acp_cas_to_tas, 1, 3, NOM(1, 0, 0), SPEED, HP, DT),
      ROW(acp_tas_to_cas, 1, 3, NOM(1, 0, 0), SPEED, HP, DT),
      ROW(acp_tas_to_mach, 1, 3, NOM(1, 0, 0), SPEED, HP, DT),
      ROW(acp_mach_to_tas, 1, 3, NOM(0.01, 0, 0), MACH, HP, DT),
      ROW(acp_eas_to_tas, 1, 3, NOM(1, 0, 0), SPEED, HP, DT),
      ROW(acp_tas_to_eas, 1, 3, NOM(1, 0, 0), SPEED, HP, DT),
      ROW(acp_cas_to_eas, 1, 2, NOM(1, 0), SPEED, HP),
      ROW(acp_eas_to_cas, 1, 2, NOM(1, 0), SPEED, HP),
      ROW(acp_mach_to_eas, 1, 2, NOM(0.01, 0), MACH, HP),
      ROW(acp_eas_to_mach, 1, 2, NOM(1, 0), SPEED, HP),
      ROW(acp_impact_pressure, 1, 2, NOM(0.01, 0), MACH, HP),
      ROW(acp_pressure_ratio_to_mach, 0, 1, NOM(1.0),
          ((bound){0.0, -DBL_TRUE_MIN, ratio5, ratio5 * (1.0 + 1e-12), I, R})),
      ROW(acp_cas_to_impact_pressure, 1, 1, NOM(100), SPEED),
      ROW(acp_impact_pressure_to_cas, 1, 1, NOM(1000),
          ((bound){0.0, -DBL_TRUE_MIN, qc5, qc5 * (1.0 + 1e-12), N, N})),
      ROW(acp_dynamic_pressure, 1, 2, NOM(0.01, 0), MACH, HP),
      ROW(acp_crossover_altitude, 0, 2, NOM(150, 0.78), rel(xc_lo, xc_hi, 1e-9, R),
          ((bound){xm_lo, xm_lo * (1.0 - 1e-9), ACP_MACH_MAX, ACP_MACH_MAX * (1.0 + 1e-12), R, R})),
      ROW(acp_reynolds_per_metre, 1, 3, NOM(100, 0, 0), SPEED, HP, DT),
      ROW(acp_wind_triangle, 0, 4, NOM(100, 0, 0, 10),
          ((bound){10.0 * (1.0 + 1e-12), 10.0, INF, INF, R, NOEDGE}), FREE, FREE,
          ((bound){0.0, -DBL_TRUE_MIN, 100.0 * (1.0 - 1e-12), 100.0, I, R})),
      ROW(acp_skin_friction_laminar, 1, 1, NOM(1e6), closed(ACP_REYNOLDS_MIN, ACP_REYNOLDS_MAX, N)),
      ROW(acp_skin_friction_turbulent, 1, 2, NOM(1e6, 0.5),
          closed(ACP_REYNOLDS_MIN, ACP_REYNOLDS_MAX, N), MACH),
      ROW(acp_skin_friction_mixed, 1, 3, NOM(1e6, 0.5, 0.1),
          closed(ACP_REYNOLDS_MIN, ACP_REYNOLDS_MAX, N), MACH, closed(0, 1, N)),
      /* roughness > 0; the smallest positive roughness overflows the cutoff
         (l/k > 1e292, documented NaN), so the inside probe is 1e-280. */
      ROW(acp_roughness_cutoff_reynolds, 1, 3, NOM(2, 1e-5, 0.5), positive(N),
          ((bound){1e-280, 0.0, INF, INF, N, NOEDGE}), MACH),
      ROW(acp_skin_friction, 1, 5, NOM(1e6, 0.5, 0.1, 2, 1e-5),
          closed(ACP_REYNOLDS_MIN, ACP_REYNOLDS_MAX, N), MACH, closed(0, 1, N), positive(N),
          nonnegative(N)),
      ROW(acp_form_factor_surface, 1, 4, NOM(0.12, 0.3, 0.3, 0.5), closed(0, 0.4, N),
          closed(0.1, 0.7, N), closed(0, deg70, N), closed(0, 1, N)),
      ROW(acp_form_factor_body, 1, 1, NOM(8), closed(1, 100, N)),
      ROW(acp_form_factor_nacelle, 1, 1, NOM(4), closed(1, 100, N)),
      ROW(acp_to_si, 0, 1, NOM(100), FREE),
      ROW(acp_from_si, 0, 1, NOM(100), FREE),
  };
  int ok = 1;
  for (size_t i = 0; i < sizeof rows / sizeof rows[0]; ++i) ok &= check_row(&rows[i]);
  assert_true(ok);
}

/* What one interval per argument cannot express. */
static void test_points(void **state) {
  (void)state;
  double o, g, h, d;
  acp_atmos a;
  /* Zero and negative are invalid (not out of range) where the quantity cannot be. */
  assert_int_equal(acp_isa_pressure_altitude(0.0, &o), ACP_ERR_INVALID);
  assert_int_equal(acp_isa_pressure_altitude(-1.0, &o), ACP_ERR_INVALID);
  assert_int_equal(acp_isa_pressure_altitude(DBL_TRUE_MIN, &o), ACP_ERR_RANGE);
  assert_int_equal(acp_isa_density_altitude(0.0, &o), ACP_ERR_INVALID);
  assert_int_equal(acp_isa_density_altitude(DBL_TRUE_MIN, &o), ACP_ERR_RANGE);
  CHECK_NAN(acp_isa_deviation(0.0, 0.0), "isa_deviation oat 0");
  assert_int_equal(acp_cold_temperature_correction(300, 0, 0.0, &o), ACP_ERR_INVALID);
  assert_int_equal(acp_cold_temperature_correction(300, 0, 100.0, &o), ACP_ERR_RANGE);
  assert_int_equal(acp_crossover_altitude(0.0, 0.78, &o), ACP_ERR_INVALID);
  assert_int_equal(acp_crossover_altitude(150, 0.0, &o), ACP_ERR_INVALID);
  assert_int_equal(acp_crossover_altitude(5.0 * ACP_A0 * (1 + 1e-12), 5.0, &o), ACP_ERR_RANGE);
  assert_int_equal(acp_wind_triangle(0.0, 0, 0, 0, &g, &h, &d), ACP_ERR_INVALID);
  assert_int_equal(acp_wind_triangle(100, 0, 1.5707963267948966, 100, &g, &h, &d), ACP_ERR_RANGE);
  assert_int_equal(acp_wind_triangle(100, 0, 0, 0, NULL, NULL, NULL), ACP_OK);
  /* NULL out-pointers are invalid arguments. */
  assert_int_equal(acp_isa(0, 0, NULL), ACP_ERR_INVALID);
  assert_int_equal(acp_isa_pressure_altitude(50000, NULL), ACP_ERR_INVALID);
  assert_int_equal(acp_isa_density_altitude(1.0, NULL), ACP_ERR_INVALID);
  assert_int_equal(acp_pressure_altitude_from_qnh(0, 101325, NULL), ACP_ERR_INVALID);
  assert_int_equal(acp_indicated_altitude_from_qnh(0, 101325, NULL), ACP_ERR_INVALID);
  assert_int_equal(acp_cold_temperature_correction(300, 0, 268.15, NULL), ACP_ERR_INVALID);
  assert_int_equal(acp_pressure_ratio_to_mach(1.0, NULL), ACP_ERR_INVALID);
  assert_int_equal(acp_crossover_altitude(150, 0.78, NULL), ACP_ERR_INVALID);
  assert_int_equal(acp_to_si(1.0, "kt", NULL), ACP_ERR_INVALID);
  assert_int_equal(acp_from_si(1.0, "kt", NULL), ACP_ERR_INVALID);
  assert_int_equal(acp_to_si(1.0, NULL, &o), ACP_ERR_INVALID);
  CHECK_NAN(o, "to_si NULL unit");
  assert_int_equal(acp_from_si(1.0, "knots", &o), ACP_ERR_UNKNOWN_KEY);
  CHECK_NAN(o, "from_si unknown unit");
  (void)a;
  /* Status names and the version. */
  assert_string_equal(acp_strerror(-1), "unknown status code");
  assert_string_equal(acp_strerror(ACP_ERR_UNKNOWN_KEY + 1), "unknown status code");
  assert_string_equal(acp_strerror(2147483647), "unknown status code");
  for (int s = ACP_OK; s <= ACP_ERR_UNKNOWN_KEY; ++s)
    assert_string_not_equal(acp_strerror(s), "unknown status code");
  assert_int_equal(acp_version(), ACP_VERSION);
  assert_string_equal(acp_version_string(), ACP_VERSION_STRING);
}

/* The plain unit conversions never fail: IEEE arithmetic on NaN and Inf. */
static void test_plain_units(void **state) {
  (void)state;
  double (*const f[])(double) = {
      acp_ft_to_m,    acp_m_to_ft,    acp_kt_to_mps, acp_mps_to_kt,  acp_nm_to_m,
      acp_m_to_nm,    acp_lb_to_kg,   acp_kg_to_lb,  acp_fl_to_m,    acp_m_to_fl,
      acp_fpm_to_mps, acp_mps_to_fpm, acp_hpa_to_pa, acp_pa_to_hpa,  acp_inhg_to_pa,
      acp_pa_to_inhg, acp_degc_to_k,  acp_k_to_degc, acp_deg_to_rad, acp_rad_to_deg};
  for (size_t i = 0; i < sizeof f / sizeof f[0]; ++i) {
    CHECK_NAN(f[i](NAN), "NaN in");
    assert_true(isinf(f[i](INF)) && f[i](INF) > 0);
    assert_true(isfinite(f[i](1.0)));
  }
}

/* Array forms: n = 0, NULL inputs (all invalid), NULL outputs (skipped), the
   invalid elements counted. One valid and one invalid element each. */
static void test_arrays(void **state) {
  (void)state;
  double out[2], o2[2];
  const double hp[2] = {1000, 1e6}, dt[2] = {0, 0}, v[2] = {100, 100}, z[2] = {0, -1e5};
  assert_int_equal(acp_isa_n(0, NULL, NULL, NULL, NULL, NULL, NULL, NULL, NULL), 0);
  assert_int_equal(acp_isa_n(2, NULL, NULL, out, NULL, NULL, NULL, NULL, NULL), 2);
  assert_int_equal(acp_isa_n(2, hp, dt, out, o2, NULL, NULL, NULL, NULL), 1);
  assert_true(isfinite(out[0]) && isnan(out[1]) && isnan(o2[1]));
  assert_int_equal(acp_isa_n(2, hp, NULL, NULL, NULL, NULL, NULL, NULL, NULL), 1);
  const double p[2] = {50000, -1};
  assert_int_equal(acp_isa_pressure_altitude_n(2, p, out), 1);
  assert_int_equal(acp_isa_pressure_altitude_n(2, NULL, out), 2);
  assert_int_equal(acp_geopotential_altitude_n(2, z, out), 1);
  assert_int_equal(acp_geometric_altitude_n(2, z, NULL), 1);
  assert_int_equal(acp_geopotential_altitude_n(2, NULL, out), 2);
  assert_int_equal(acp_geometric_altitude_n(2, NULL, out), 2);
  size_t (*const two[])(size_t, const double *, const double *, double *) = {
      acp_cas_to_mach_n, acp_mach_to_cas_n, acp_cas_to_eas_n, acp_eas_to_cas_n};
  const double m[2] = {0.3, 0.3};
  for (size_t i = 0; i < 4; ++i) {
    const double *in = i == 1 ? m : v;
    assert_int_equal(two[i](2, in, hp, out), 1);
    assert_true(isfinite(out[0]) && isnan(out[1]));
    assert_int_equal(two[i](2, NULL, hp, out), 2);
    assert_int_equal(two[i](2, in, NULL, NULL), 2);
    assert_int_equal(two[i](0, NULL, NULL, NULL), 0);
  }
  size_t (*const three[])(size_t, const double *, const double *, const double *, double *) = {
      acp_cas_to_tas_n,  acp_tas_to_cas_n, acp_tas_to_mach_n,
      acp_mach_to_tas_n, acp_eas_to_tas_n, acp_tas_to_eas_n};
  for (size_t i = 0; i < 6; ++i) {
    const double *in = i == 3 ? m : v;
    assert_int_equal(three[i](2, in, hp, dt, out), 1);
    assert_int_equal(three[i](2, in, hp, NULL, out), 1); /* NULL dtemp: standard day */
    assert_true(isfinite(out[0]) && isnan(out[1]));
    assert_int_equal(three[i](2, NULL, hp, dt, out), 2);
    assert_int_equal(three[i](0, NULL, NULL, NULL, NULL), 0);
  }
}

/* Regressions of the defects the fuzz target found (tests/reliability). */
static void test_fuzz_regressions(void **state) {
  (void)state;
  double o = 0.0;
  /* A converted value that overflows is ACP_ERR_RANGE, not ACP_OK with Inf. */
  assert_int_equal(acp_to_si(1e308, "NM", &o), ACP_ERR_RANGE);
  CHECK_NAN(o, "to_si overflow");
  assert_int_equal(acp_from_si(1e308, "km/h", &o), ACP_ERR_RANGE);
  CHECK_NAN(o, "from_si overflow");
  /* The roughness cutoff past the largest double is NaN; the friction of such a
     (hydraulically smooth in effect) surface is still given. */
  CHECK_NAN(acp_roughness_cutoff_reynolds(1e300, 1e-300, 0.5), "cutoff overflow");
  CHECK_CLOSE(acp_skin_friction(1e6, 0.5, 0.0, 1e300, 1e-300),
              acp_skin_friction_turbulent(1e6, 0.5), 0.0, 0.0, "no cutoff");
  /* Temperatures are positive finite doubles or NaN. */
  CHECK_NAN(acp_total_temperature(1e308, 5.0, 1.0), "TAT overflow");
  CHECK_NAN(acp_static_temperature(DBL_TRUE_MIN, 5.0, 1.0), "SAT underflow to 0 K");
  /* Mach 5 converted to a speed and back stays Mach 5 (round-off at the edge). */
  assert_true(acp_cas_to_mach(5.0 * ACP_A0, 0.0) <= ACP_MACH_MAX);
  assert_true(acp_cas_to_mach(acp_mach_to_cas(5.0, 0.0), 0.0) == ACP_MACH_MAX);
  for (double h = -5000; h <= 80000; h += 8500) {
    assert_true(acp_tas_to_mach(acp_mach_to_tas(5.0, h, 37.0), h, 37.0) == ACP_MACH_MAX);
    assert_true(acp_eas_to_mach(acp_mach_to_eas(5.0, h), h) == ACP_MACH_MAX);
  }
  /* A negative speed or pressure is refused even when dividing it by a0 or p0
     underflows to -0. */
  CHECK_NAN(acp_cas_to_mach(-DBL_TRUE_MIN, 0.0), "cas -denormal");
  CHECK_NAN(acp_cas_to_impact_pressure(-DBL_TRUE_MIN), "cas -denormal");
  CHECK_NAN(acp_impact_pressure_to_cas(-DBL_TRUE_MIN), "qc -denormal");
  /* A heading just below 0 wraps to 0, never to 2 pi. */
  double g, h, d;
  assert_int_equal(acp_wind_triangle(100.0, 0.0, -1e-20, 10.0, &g, &h, &d), ACP_OK);
  assert_true(h >= 0.0 && h < 6.283185307179586);
  /* A ground speed that overflows is out of range. */
  assert_int_equal(acp_wind_triangle(1e308, 0.0, 3.141592653589793, 1e308, &g, &h, &d),
                   ACP_ERR_RANGE);
}

/* Regression: without 'oswald', an aspect ratio outside the Oswald estimate's
   1 to 30 made acp_drag() return ACP_OK with NaN induced drag (found by the
   aircraft-parser fuzz target); now the model check refuses it. */
static void test_oswald_estimate_range(void **state) {
  (void)state;
  acp_aircraft *ac = acp_aircraft_new();
  assert_non_null(ac);
  char err[200];
  const char *text = "wing_area = 29.0\nspan = 32.6\ncd0 = 0.02\n"; /* aspect ratio 36.6 */
  assert_int_equal(acp_aircraft_parse(ac, text, err, sizeof err), ACP_ERR_PARSE);
  assert_non_null(strstr(err, "oswald"));
  const char *given = "wing_area = 29.0\nspan = 32.6\ncd0 = 0.02\noswald = 0.8\n";
  assert_int_equal(acp_aircraft_parse(ac, given, err, sizeof err), ACP_OK);
  acp_drag_parts dp;
  assert_int_equal(acp_drag(ac, 5000.0, 3000.0, 0.0, 80.0, &dp), ACP_OK);
  assert_true(isfinite(dp.total) && dp.total > 0.0);
  acp_aircraft_free(ac);
}

int main(void) {
  const struct CMUnitTest tests[] = {
      cmocka_unit_test(test_edges),  cmocka_unit_test(test_points),
      cmocka_unit_test(test_plain_units), cmocka_unit_test(test_arrays),
      cmocka_unit_test(test_fuzz_regressions), cmocka_unit_test(test_oswald_estimate_range),
  };
  return cmocka_run_group_tests(tests, NULL, NULL);
}
