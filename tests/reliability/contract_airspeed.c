/* Contract of airspeed.h. Bounds: Mach 0 to 5; speeds 0 to 5 times the
   largest speed of sound of the model (420.7 K: 411.2 m/s); EAS to 5
   sqrt(gamma p/rho0) at the highest pressure (177,687 Pa: 450.6 m/s). */
#include <math.h>

#include "acperf.h"
#include "contract.h"

#define TAS_HI (5.0 * 411.3)
#define EAS_HI (5.0 * 450.7)
#define CAS_HI (5.0 * ACP_A0 * (1.0 + 1e-13))
#define QC_P_HI 32.0         /* qc/p at Mach 5 is 31.65 */
#define PRESSURE_HI 177688.0 /* highest static pressure of the model, Pa */
#define HP_TOL 1e-6
#define TWO_PI 6.283185307179586  /* the double nearest 2 pi */
#define HALF_PI 1.5707963267948966 /* the double nearest pi/2 */


/* f(g(x)) == x for conversions that are inverses at a fixed hp (and dtemp). */
static void round_trip(contract *c, const char *fn, double x, double y, double back) {
  if (isnan(y)) return;
  if (isnan(back)) {
    contract_violation(c, fn, "%.17g -> %.17g does not convert back", x, y);
    return;
  }
  contract_close(c, fn, "round trip", back, x, 1e-9, 1e-11);
}

void contract_airspeed(contract *c) {
  const double v = contract_arg(c), hp = contract_arg(c), dt = contract_arg(c);

  /* Speed conversions: range of each result, and the inverse brings it back. */
  const double m1 = acp_cas_to_mach(v, hp);
  contract_value(c, "acp_cas_to_mach", m1, 0.0, ACP_MACH_MAX);
  round_trip(c, "acp_cas_to_mach", v, m1, acp_mach_to_cas(m1, hp));
  const double c1 = acp_mach_to_cas(v, hp);
  contract_value(c, "acp_mach_to_cas", c1, 0.0, CAS_HI);
  round_trip(c, "acp_mach_to_cas", v, c1, acp_cas_to_mach(c1, hp));
  const double t1 = acp_cas_to_tas(v, hp, dt);
  contract_value(c, "acp_cas_to_tas", t1, 0.0, TAS_HI);
  round_trip(c, "acp_cas_to_tas", v, t1, acp_tas_to_cas(t1, hp, dt));
  const double c2 = acp_tas_to_cas(v, hp, dt);
  contract_value(c, "acp_tas_to_cas", c2, 0.0, CAS_HI);
  round_trip(c, "acp_tas_to_cas", v, c2, acp_cas_to_tas(c2, hp, dt));
  const double m2 = acp_tas_to_mach(v, hp, dt);
  contract_value(c, "acp_tas_to_mach", m2, 0.0, ACP_MACH_MAX);
  round_trip(c, "acp_tas_to_mach", v, m2, acp_mach_to_tas(m2, hp, dt));
  const double t2 = acp_mach_to_tas(v, hp, dt);
  contract_value(c, "acp_mach_to_tas", t2, 0.0, TAS_HI);
  round_trip(c, "acp_mach_to_tas", v, t2, acp_tas_to_mach(t2, hp, dt));
  const double t3 = acp_eas_to_tas(v, hp, dt);
  contract_value(c, "acp_eas_to_tas", t3, 0.0, TAS_HI);
  round_trip(c, "acp_eas_to_tas", v, t3, acp_tas_to_eas(t3, hp, dt));
  const double e1 = acp_tas_to_eas(v, hp, dt);
  contract_value(c, "acp_tas_to_eas", e1, 0.0, EAS_HI);
  round_trip(c, "acp_tas_to_eas", v, e1, acp_eas_to_tas(e1, hp, dt));
  const double e2 = acp_cas_to_eas(v, hp);
  contract_value(c, "acp_cas_to_eas", e2, 0.0, EAS_HI);
  round_trip(c, "acp_cas_to_eas", v, e2, acp_eas_to_cas(e2, hp));
  const double c3 = acp_eas_to_cas(v, hp);
  contract_value(c, "acp_eas_to_cas", c3, 0.0, CAS_HI);
  round_trip(c, "acp_eas_to_cas", v, c3, acp_cas_to_eas(c3, hp));
  const double e3 = acp_mach_to_eas(v, hp);
  contract_value(c, "acp_mach_to_eas", e3, 0.0, EAS_HI);
  round_trip(c, "acp_mach_to_eas", v, e3, acp_eas_to_mach(e3, hp));
  const double m3 = acp_eas_to_mach(v, hp);
  contract_value(c, "acp_eas_to_mach", m3, 0.0, ACP_MACH_MAX);
  round_trip(c, "acp_eas_to_mach", v, m3, acp_mach_to_eas(m3, hp));

  /* Inside the model (Mach 0 to 5, hp and dtemp in range) nothing is refused. */
  acp_atmos a;
  if (acp_isa(hp, dt, &a) == ACP_OK && v >= 0.0 && v <= 5.0) {
    contract_expect(c, !isnan(t2), "acp_mach_to_tas", "refused a Mach number in the model");
    contract_expect(c, !isnan(e3), "acp_mach_to_eas", "refused a Mach number in the model");
    contract_expect(c, !isnan(acp_impact_pressure(v, hp)), "acp_impact_pressure",
                    "refused a Mach number in the model");
  }

  /* Pressures. */
  const double qc = acp_impact_pressure(v, hp);
  contract_value(c, "acp_impact_pressure", qc, 0.0, PRESSURE_HI * QC_P_HI);
  const double q = acp_dynamic_pressure(v, hp);
  contract_value(c, "acp_dynamic_pressure", q, 0.0, 0.5 * ACP_GAMMA * PRESSURE_HI * 25.0);
  if (!isnan(qc) && !isnan(q) && v > 1e-3)
    contract_expect(c, qc >= q * (1.0 - 1e-12) || v > 1.0, "acp_impact_pressure",
                    "subsonic impact pressure below the dynamic pressure");
  const double qs = acp_cas_to_impact_pressure(v);
  contract_value(c, "acp_cas_to_impact_pressure", qs, 0.0, ACP_P0 * QC_P_HI);
  round_trip(c, "acp_cas_to_impact_pressure", v, qs, acp_impact_pressure_to_cas(qs));
  const double cq = acp_impact_pressure_to_cas(dt);
  contract_value(c, "acp_impact_pressure_to_cas", cq, 0.0, CAS_HI);

  double m = 0.0;
  int st = acp_pressure_ratio_to_mach(dt, &m);
  contract_code(c, "acp_pressure_ratio_to_mach", st,
                ST(ACP_ERR_INVALID) | ST(ACP_ERR_RANGE) | ST(ACP_ERR_NO_CONVERGENCE));
  contract_value(c, "acp_pressure_ratio_to_mach", m, 0.0, ACP_MACH_MAX);
  contract_expect(c, (st == ACP_OK) == !isnan(m), "acp_pressure_ratio_to_mach",
                  "output NaN with ACP_OK, or a value with an error");
  if (dt >= 0.0 && dt <= 31.6)
    contract_expect(c, st == ACP_OK, "acp_pressure_ratio_to_mach",
                    "no result for a ratio below Mach 5's");
  if (st == ACP_OK)
    contract_close(c, "acp_pressure_ratio_to_mach", "qc/p of the result",
                   acp_impact_pressure(m, 0.0) / ACP_P0, dt, 1e-13, 1e-12);
  contract_expect(c, acp_pressure_ratio_to_mach(dt, NULL) == ACP_ERR_INVALID,
                  "acp_pressure_ratio_to_mach", "NULL out accepted");

  /* Crossover altitude: there the CAS and the Mach number are the same speed. */
  double h = 0.0;
  st = acp_crossover_altitude(v, dt, &h);
  contract_code(c, "acp_crossover_altitude", st, ST(ACP_ERR_INVALID) | ST(ACP_ERR_RANGE));
  contract_value(c, "acp_crossover_altitude", h, ACP_ISA_HP_MIN - HP_TOL, ACP_ISA_HP_MAX + HP_TOL);
  contract_expect(c, (st == ACP_OK) == !isnan(h), "acp_crossover_altitude",
                  "output NaN with ACP_OK, or a value with an error");
  if (st == ACP_OK && h >= ACP_ISA_HP_MIN && h <= ACP_ISA_HP_MAX)
    contract_close(c, "acp_crossover_altitude", "CAS of the Mach there", acp_mach_to_cas(dt, h), v,
                   1e-9, 1e-9);
  contract_expect(c, acp_crossover_altitude(v, dt, NULL) == ACP_ERR_INVALID,
                  "acp_crossover_altitude", "NULL out accepted");

  /* Reynolds number per metre: rho TAS/mu; the model's extremes give < 1e9. */
  contract_value(c, "acp_reynolds_per_metre", acp_reynolds_per_metre(v, hp, dt), 0.0, 1e9);

  /* Wind triangle. */
  const double track = contract_arg(c), from = contract_arg(c), ws = contract_arg(c);
  double gs = 0.0, hdg = 0.0, drift = 0.0;
  st = acp_wind_triangle(v, track, from, ws, &gs, &hdg, &drift);
  contract_code(c, "acp_wind_triangle", st, ST(ACP_ERR_INVALID) | ST(ACP_ERR_RANGE));
  contract_value(c, "acp_wind_triangle", gs, 0x1p-1074, (v + ws) * (1.0 + 1e-15));
  contract_value(c, "acp_wind_triangle", hdg, 0.0, nextafter(TWO_PI, 0.0));
  contract_value(c, "acp_wind_triangle", drift, -HALF_PI, HALF_PI);
  if (st == ACP_OK) {
    contract_expect(c, !isnan(gs) && !isnan(hdg) && !isnan(drift), "acp_wind_triangle",
                    "ACP_OK with a NaN output");
    contract_expect(c, hdg < TWO_PI, "acp_wind_triangle", "heading not below 2 pi");
  } else {
    contract_expect(c, isnan(gs) && isnan(hdg) && isnan(drift), "acp_wind_triangle",
                    "an output not NaN on error");
  }
  const int pick = (int)contract_pick(c, 3);
  const int st2 = acp_wind_triangle(v, track, from, ws, pick == 0 ? NULL : &gs,
                                    pick == 1 ? NULL : &hdg, pick == 2 ? NULL : &drift);
  contract_expect(c, st2 == st, "acp_wind_triangle", "status depends on which outputs are wanted");

  /* Array forms. */
  contract_array2(c, "acp_cas_to_mach_n", acp_cas_to_mach_n, acp_cas_to_mach);
  contract_array2(c, "acp_mach_to_cas_n", acp_mach_to_cas_n, acp_mach_to_cas);
  contract_array2(c, "acp_cas_to_eas_n", acp_cas_to_eas_n, acp_cas_to_eas);
  contract_array2(c, "acp_eas_to_cas_n", acp_eas_to_cas_n, acp_eas_to_cas);
  contract_array3(c, "acp_cas_to_tas_n", acp_cas_to_tas_n, acp_cas_to_tas);
  contract_array3(c, "acp_tas_to_cas_n", acp_tas_to_cas_n, acp_tas_to_cas);
  contract_array3(c, "acp_tas_to_mach_n", acp_tas_to_mach_n, acp_tas_to_mach);
  contract_array3(c, "acp_mach_to_tas_n", acp_mach_to_tas_n, acp_mach_to_tas);
  contract_array3(c, "acp_eas_to_tas_n", acp_eas_to_tas_n, acp_eas_to_tas);
  contract_array3(c, "acp_tas_to_eas_n", acp_tas_to_eas_n, acp_tas_to_eas);
}
