/* Contract of atmosphere.h. Bounds are the model's extremes: hp -5,000 to
   84,852 m and dtemp -100 to +100 K give temperatures 86.9 to 420.7 K and
   pressures 0.3734 to 177,687 Pa; the other bounds follow (rounded outward). */
#include <float.h>
#include <math.h>

#include "acperf.h"
#include "contract.h"

#define T_LO 86.0
#define T_HI 421.0
#define P_LO 0.373
#define P_HI 177688.0
#define HP_TOL 1e-6 /* results within a micrometre of an edge are round-off */
#define GEOPOTENTIAL_LO (-10015.8) /* geopotential altitude of -10,000 m geometric */
#define GEOPOTENTIAL_HI 864071.0   /* geopotential altitude of 1,000,000 m geometric */

static int in_model(double hp, double dtemp) {
  return hp >= ACP_ISA_HP_MIN && hp <= ACP_ISA_HP_MAX && dtemp >= ACP_ISA_DTEMP_MIN &&
         dtemp <= ACP_ISA_DTEMP_MAX;
}

static double pressure_altitude_scalar(double p) {
  double h;
  return acp_isa_pressure_altitude(p, &h) == ACP_OK ? h : NAN;
}

static void check_isa(contract *c, double hp, double dt) {
  acp_atmos a;
  const int st = acp_isa(hp, dt, &a);
  contract_code(c, "acp_isa", st, ST(ACP_ERR_INVALID) | ST(ACP_ERR_RANGE));
  const double f[6] = {a.temperature, a.pressure, a.density,
                       a.sound_speed, a.dynamic_viscosity, a.kinematic_viscosity};
  const double lo[6] = {T_LO, P_LO, 1e-6, 186.0, 5e-6, 1e-6};
  const double hi[6] = {T_HI, P_HI, 2.81, 412.0, 2.5e-5, 10.0};
  for (int i = 0; i < 6; ++i) {
    contract_record(c, f[i]);
    if (st != ACP_OK && !isnan(f[i]))
      contract_violation(c, "acp_isa", "hp %.17g dtemp %.17g: status %d, field %d not NaN", hp, dt,
                         st, i);
    if (st == ACP_OK && !(f[i] >= lo[i] && f[i] <= hi[i]))
      contract_violation(c, "acp_isa", "hp %.17g dtemp %.17g: field %d = %.17g outside [%g, %g]",
                         hp, dt, i, f[i], lo[i], hi[i]);
  }
  /* The status is exactly the documented domain. */
  const int want = !isfinite(hp) || !isfinite(dt) ? ACP_ERR_INVALID
                   : in_model(hp, dt)             ? ACP_OK
                                                  : ACP_ERR_RANGE;
  if (st != want)
    contract_violation(c, "acp_isa", "hp %.17g dtemp %.17g: status %d, documented %d", hp, dt, st,
                       want);
  if (st == ACP_OK) {
    contract_close(c, "acp_isa", "ideal gas p = rho R T", a.pressure,
                   a.density * ACP_R_AIR * a.temperature, 0.0, 1e-14);
    contract_close(c, "acp_isa", "a = sqrt(gamma R T)", a.sound_speed,
                   sqrt(ACP_GAMMA * ACP_R_AIR * a.temperature), 0.0, 1e-14);
  }
  /* The scalar forms are the same computation. */
  const double ok = st == ACP_OK;
  contract_same(c, "acp_isa_temperature", "vs acp_isa", acp_isa_temperature(hp, dt),
                ok ? a.temperature : NAN);
  contract_same(c, "acp_isa_density", "vs acp_isa", acp_isa_density(hp, dt), ok ? a.density : NAN);
  contract_same(c, "acp_isa_sound_speed", "vs acp_isa", acp_isa_sound_speed(hp, dt),
                ok ? a.sound_speed : NAN);
  contract_same(c, "acp_outside_air_temperature", "vs acp_isa", acp_outside_air_temperature(dt, hp),
                ok ? a.temperature : NAN);
  acp_atmos s;
  const int sst = acp_isa(hp, 0.0, &s);
  contract_same(c, "acp_isa_pressure", "vs acp_isa", acp_isa_pressure(hp),
                sst == ACP_OK ? s.pressure : NAN);
  c->calls += 5;
  contract_expect(c, acp_isa(hp, dt, NULL) == ACP_ERR_INVALID, "acp_isa", "NULL out accepted");
}

static void check_isa_n(contract *c) {
  enum { N = 5 };
  double hp[N], dt[N], o[6][N];
  const size_t n = contract_pick(c, N + 1);
  for (size_t i = 0; i < n; ++i) {
    hp[i] = contract_arg(c);
    dt[i] = contract_arg(c);
  }
  const int null_dt = contract_pick(c, 3) == 0, null_out = (int)contract_pick(c, 7) - 1;
  double *outs[6];
  for (int k = 0; k < 6; ++k) outs[k] = k == null_out ? NULL : o[k];
  const size_t bad = acp_isa_n(n, hp, null_dt ? NULL : dt, outs[0], outs[1], outs[2], outs[3],
                               outs[4], outs[5]);
  size_t want_bad = 0;
  for (size_t i = 0; i < n; ++i) {
    acp_atmos a;
    const int st = acp_isa(hp[i], null_dt ? 0.0 : dt[i], &a);
    want_bad += st != ACP_OK;
    const double f[6] = {a.temperature, a.pressure, a.density,
                         a.sound_speed, a.dynamic_viscosity, a.kinematic_viscosity};
    for (int k = 0; k < 6; ++k)
      if (outs[k]) contract_element(c, "acp_isa_n", "element vs acp_isa", outs[k][i], f[k]);
  }
  c->calls++;
  contract_record(c, (double)bad);
  if (bad != want_bad) contract_violation(c, "acp_isa_n", "returned %zu, want %zu", bad, want_bad);
  contract_expect(c, acp_isa_n(n, NULL, NULL, NULL, NULL, NULL, NULL, NULL, NULL) == n, "acp_isa_n",
                  "NULL hp not counted as all invalid");
}

void contract_atmosphere(contract *c) {
  const double hp = contract_arg(c), dt = contract_arg(c), x = contract_arg(c);
  check_isa(c, hp, dt);
  check_isa_n(c);

  /* Pressure altitude: inverse of the standard pressure. */
  double h = 0.0;
  int st = acp_isa_pressure_altitude(x, &h);
  contract_code(c, "acp_isa_pressure_altitude", st, ST(ACP_ERR_INVALID) | ST(ACP_ERR_RANGE));
  contract_value(c, "acp_isa_pressure_altitude", h, ACP_ISA_HP_MIN - HP_TOL, ACP_ISA_HP_MAX + HP_TOL);
  contract_expect(c, (st == ACP_OK) == !isnan(h), "acp_isa_pressure_altitude",
                  "output NaN with ACP_OK, or a value with an error");
  if (isfinite(x) && x > 0.374 && x < 177687.0)
    contract_expect(c, st == ACP_OK, "acp_isa_pressure_altitude", "refused a pressure in the model");
  if (st == ACP_OK && h >= ACP_ISA_HP_MIN && h <= ACP_ISA_HP_MAX)
    contract_close(c, "acp_isa_pressure_altitude", "round trip p(hp(p))", acp_isa_pressure(h), x, 0.0,
                   1e-12);
  contract_expect(c, acp_isa_pressure_altitude(x, NULL) == ACP_ERR_INVALID,
                  "acp_isa_pressure_altitude", "NULL out accepted");
  contract_array1(c, "acp_isa_pressure_altitude_n", acp_isa_pressure_altitude_n,
                  pressure_altitude_scalar);

  /* Geopotential and geometric altitude. */
  const double hg = acp_geopotential_altitude(x), zg = acp_geometric_altitude(x);
  contract_value(c, "acp_geopotential_altitude", hg, GEOPOTENTIAL_LO, GEOPOTENTIAL_HI);
  contract_value(c, "acp_geometric_altitude", zg, -10000.0, 1.0e6);
  if (x >= -10000.0 && x <= 1.0e6) {
    contract_expect(c, !isnan(hg), "acp_geopotential_altitude", "refused an altitude in range");
    contract_close(c, "acp_geometric_altitude", "round trip z(H(z))", acp_geometric_altitude(hg), x,
                   1e-9, 1e-15);
  }
  contract_array1(c, "acp_geopotential_altitude_n", acp_geopotential_altitude_n,
                  acp_geopotential_altitude);
  contract_array1(c, "acp_geometric_altitude_n", acp_geometric_altitude_n, acp_geometric_altitude);

  /* Density altitude. */
  st = acp_isa_density_altitude(x, &h);
  contract_code(c, "acp_isa_density_altitude", st, ST(ACP_ERR_INVALID) | ST(ACP_ERR_RANGE));
  contract_value(c, "acp_isa_density_altitude", h, ACP_ISA_HP_MIN - HP_TOL, ACP_ISA_HP_MAX + HP_TOL);
  contract_expect(c, (st == ACP_OK) == !isnan(h), "acp_isa_density_altitude",
                  "output NaN with ACP_OK, or a value with an error");
  contract_expect(c, acp_isa_density_altitude(x, NULL) == ACP_ERR_INVALID,
                  "acp_isa_density_altitude", "NULL out accepted");
  const double da = acp_density_altitude(hp, dt);
  contract_value(c, "acp_density_altitude", da, ACP_ISA_HP_MIN - HP_TOL, ACP_ISA_HP_MAX + HP_TOL);
  if (in_model(hp, 0.0) && dt == 0.0)
    contract_close(c, "acp_density_altitude", "equals hp on a standard day", da, hp, 1e-6, 1e-12);

  /* ISA deviation and outside air temperature. */
  const double dev = acp_isa_deviation(x, hp);
  contract_value(c, "acp_isa_deviation", dev, ACP_ISA_DTEMP_MIN, ACP_ISA_DTEMP_MAX);
  if (!isnan(dev))
    contract_close(c, "acp_isa_deviation", "oat = T(hp, dev)", acp_outside_air_temperature(dev, hp),
                   x, 1e-9, 1e-15);

  /* Total and static temperature. */
  const double m = contract_arg(c), r = contract_arg(c);
  const double tat = acp_total_temperature(x, m, r), sat = acp_static_temperature(x, m, r);
  contract_value(c, "acp_total_temperature", tat, 0x1p-1074, DBL_MAX);
  contract_value(c, "acp_static_temperature", sat, 0x1p-1074, DBL_MAX);
  if (!isnan(tat)) contract_expect(c, tat >= x, "acp_total_temperature", "TAT below SAT");
  if (!isnan(sat)) contract_expect(c, sat <= x, "acp_static_temperature", "SAT above TAT");

  /* Altimeter setting. */
  const double qnh = contract_arg(c);
  double out = 0.0;
  st = acp_pressure_altitude_from_qnh(hp, qnh, &out);
  contract_code(c, "acp_pressure_altitude_from_qnh", st, ST(ACP_ERR_INVALID) | ST(ACP_ERR_RANGE));
  contract_value(c, "acp_pressure_altitude_from_qnh", out, ACP_ISA_HP_MIN - HP_TOL,
                 ACP_ISA_HP_MAX + HP_TOL);
  contract_expect(c, (st == ACP_OK) == !isnan(out), "acp_pressure_altitude_from_qnh",
                  "output NaN with ACP_OK, or a value with an error");
  if (st == ACP_OK && out >= ACP_ISA_HP_MIN && out <= ACP_ISA_HP_MAX) {
    double back;
    const int bst = acp_indicated_altitude_from_qnh(out, qnh, &back);
    contract_expect(c, bst == ACP_OK, "acp_indicated_altitude_from_qnh", "refused a round trip");
    if (bst == ACP_OK)
      contract_close(c, "acp_indicated_altitude_from_qnh", "round trip", back, hp, 1e-8, 1e-15);
  }
  st = acp_indicated_altitude_from_qnh(hp, qnh, &out);
  contract_code(c, "acp_indicated_altitude_from_qnh", st, ST(ACP_ERR_INVALID) | ST(ACP_ERR_RANGE));
  /* hp minus the pressure altitude of a setting between 80,000 and 110,000 Pa. */
  contract_value(c, "acp_indicated_altitude_from_qnh", out, ACP_ISA_HP_MIN - 1950.0,
                 ACP_ISA_HP_MAX + 750.0);
  contract_expect(c, (st == ACP_OK) == !isnan(out), "acp_indicated_altitude_from_qnh",
                  "output NaN with ACP_OK, or a value with an error");
  contract_expect(c, acp_pressure_altitude_from_qnh(hp, qnh, NULL) == ACP_ERR_INVALID &&
                         acp_indicated_altitude_from_qnh(hp, qnh, NULL) == ACP_ERR_INVALID,
                  "acp_*_altitude_from_qnh", "NULL out accepted");

  /* Cold-temperature correction: positive when colder than ISA. */
  const double height = contract_arg(c), elev = contract_arg(c), temp = contract_arg(c);
  st = acp_cold_temperature_correction(height, elev, temp, &out);
  contract_code(c, "acp_cold_temperature_correction", st, ST(ACP_ERR_INVALID) | ST(ACP_ERR_RANGE));
  contract_value(c, "acp_cold_temperature_correction", out, -20000.0, 20000.0);
  contract_expect(c, (st == ACP_OK) == !isnan(out), "acp_cold_temperature_correction",
                  "output NaN with ACP_OK, or a value with an error");
  if (st == ACP_OK) {
    const double isa_t = ACP_T0 - 0.0065 * elev;
    if (temp < isa_t) contract_expect(c, out >= 0.0, "acp_cold_temperature_correction", "cold, < 0");
    if (temp > isa_t) contract_expect(c, out <= 0.0, "acp_cold_temperature_correction", "warm, > 0");
  }
  contract_expect(c, acp_cold_temperature_correction(height, elev, temp, NULL) == ACP_ERR_INVALID,
                  "acp_cold_temperature_correction", "NULL out accepted");
}
