/* Contract of cruise.h: SAR (every input) = ground speed / fuel flow of the
   engines delivering the drag; Breguet forms against their formulas and
   NaN outside their ranges; speed modes and cruise integration (sampled):
   statuses, NaN on error, the point's SAR equal to acp_specific_air_range(),
   the maximum-range speed a local maximum of SAR, the end quantity met,
   mass balance, traces equal to the plain form, array forms bit for bit. */
#include <math.h>
#include <stdlib.h>

#include "acperf.h"
#include "contract.h"

#define ALLOWED (ST(ACP_ERR_INVALID) | ST(ACP_ERR_RANGE) | ST(ACP_ERR_THRUST))
#define G0 9.80665
#define MAX_POINTS 80

static void breguet(contract *c) {
  const double v = contract_range(c, 0.0, 300.0), tsfc = contract_range(c, 0.0, 3e-5);
  const double ld = contract_range(c, 0.0, 25.0), m0 = contract_range(c, 0.0, 50000.0);
  const double m1 = contract_range(c, 0.0, 1.0) * m0, eta = contract_range(c, 0.0, 1.0);
  const int pos = v > 0 && tsfc > 0 && ld > 0 && m0 > 0 && m1 > 0 && m1 <= m0 && isfinite(v) &&
                  isfinite(tsfc) && isfinite(ld) && isfinite(m0) && isfinite(m1);
  const double r = acp_breguet_range(v, tsfc, ld, m0, m1);
  contract_value(c, "acp_breguet_range", r, 0.0, 1.7976931348623157e308);
  if (!pos) contract_expect(c, isnan(r), "acp_breguet_range", "accepted an invalid argument");
  const double want = v / (G0 * tsfc) * ld * log(m0 / m1);
  if (pos && isfinite(want)) contract_close(c, "acp_breguet_range", "formula", r, want, 1e-300, 1e-13);
  const double e = acp_breguet_endurance(tsfc, ld, m0, m1);
  contract_value(c, "acp_breguet_endurance", e, 0.0, 1.7976931348623157e308);
  const double we = 1.0 / (G0 * tsfc) * ld * log(m0 / m1);
  if (pos && isfinite(we)) contract_close(c, "acp_breguet_endurance", "formula", e, we, 1e-300, 1e-13);
  /* the endurance has no speed argument: its own validity */
  const int pos_e = tsfc > 0 && ld > 0 && m0 > 0 && m1 > 0 && m1 <= m0 && isfinite(tsfc) &&
                    isfinite(ld) && isfinite(m0) && isfinite(m1);
  if (!pos_e) contract_expect(c, isnan(e), "acp_breguet_endurance", "accepted an invalid argument");
  if (pos_e && isfinite(we)) contract_expect(c, !isnan(e), "acp_breguet_endurance", "refused a valid argument");
  const double rp = acp_breguet_range_propeller(eta, tsfc, ld, m0, m1);
  contract_value(c, "acp_breguet_range_propeller", rp, 0.0, 1.7976931348623157e308);
  const double wp = eta / (G0 * tsfc) * ld * log(m0 / m1);
  const int eta_ok = eta > 0 && eta <= 1;
  if (pos && eta_ok && isfinite(wp))
    contract_close(c, "acp_breguet_range_propeller", "formula", rp, wp, 1e-300, 1e-13);
  if (!eta_ok) contract_expect(c, isnan(rp), "acp_breguet_range_propeller", "accepted an invalid efficiency");
}

/* SAR from its parts: drag, engines delivering it, ground speed. */
static double sar_parts(const acp_aircraft *ac, double mass, double hp, double dt, double tas, double wind) {
  acp_drag_parts d;
  acp_engine_point e;
  if (acp_drag(ac, mass, hp, dt, tas, &d) != ACP_OK) return NAN;
  if (acp_engine_thrust(ac, d.total, hp, dt, tas, &e) != ACP_OK) return NAN;
  return (tas + wind) / e.fuel_flow;
}

static void speed_mode(contract *c, const acp_aircraft *ac, double mass, double hp, double dt, double wind) {
  const int mode = (int)contract_pick(c, 7); /* 0 and 6 are not modes */
  const double ci = contract_range(c, 0.0, 1000.0);
  acp_cruise_point p;
  const int st = acp_cruise_speed(ac, mode, ci, mass, hp, dt, wind, &p);
  const char *fn = "acp_cruise_speed";
  contract_code(c, fn, st, ALLOWED);
  contract_value(c, fn, p.tas, 0x1p-1074, 400.0);
  contract_value(c, fn, p.sar, 0x1p-1074, 1e6);
  contract_value(c, fn, p.limit, 0.0, 5.0);
  contract_value(c, fn, p.fuel_flow, 0x1p-1074, 1e3);
  if (mode < 1 || mode > 5) contract_expect(c, st != ACP_OK, fn, "an unknown mode accepted");
  if (st != ACP_OK) {
    contract_expect(c, isnan(p.tas) && isnan(p.sar) && isnan(p.mach) && isnan(p.limit), fn,
                    "an output not NaN on error");
  } else {
    contract_expect(c, p.time == 0 && p.distance == 0 && p.hp == hp && p.mass == mass && !isnan(p.sar) &&
                           !isnan(p.drag) && !isnan(p.lift_to_drag),
                    fn, "a point not at the given condition, or a NaN output");
    double sar = NAN;
    acp_specific_air_range(ac, mass, hp, dt, p.tas, wind, &sar);
    contract_close(c, fn, "SAR at the mode's speed", p.sar, sar, 0, 1e-12);
    contract_close(c, fn, "ground speed", p.ground_speed, p.tas + wind, 1e-12, 1e-14);
    if (mode == ACP_CRUISE_MAX_RANGE && p.limit == ACP_CRUISE_LIMIT_NONE) {
      double lo = NAN, hi = NAN;
      acp_specific_air_range(ac, mass, hp, dt, 0.98 * p.tas, wind, &lo);
      acp_specific_air_range(ac, mass, hp, dt, 1.02 * p.tas, wind, &hi);
      contract_expect(c, !(lo > p.sar * (1 + 1e-9)) && !(hi > p.sar * (1 + 1e-9)), fn,
                      "maximum-range SAR below its value 2 % either side");
    }
    if (mode == ACP_CRUISE_MAX_ENDURANCE && p.limit == ACP_CRUISE_LIMIT_NONE) {
      acp_drag_parts d;
      acp_engine_point e;
      for (int k = -1; k <= 1; k += 2)
        if (acp_drag(ac, mass, hp, dt, p.tas * (1 + 0.02 * k), &d) == ACP_OK &&
            acp_engine_thrust(ac, d.total, hp, dt, p.tas * (1 + 0.02 * k), &e) == ACP_OK)
          contract_expect(c, p.fuel_flow <= e.fuel_flow * (1 + 1e-9), fn,
                          "maximum-endurance fuel flow above its value 2 % either side");
    }
  }
  double tas = 0, mach = 0, sar = 0;
  const size_t bad = acp_cruise_speed_n(ac, mode, ci, 1, &mass, &hp, &dt, &wind, &tas, &mach, &sar);
  contract_same(c, "acp_cruise_speed_n", "tas", tas, p.tas);
  contract_same(c, "acp_cruise_speed_n", "sar", sar, p.sar);
  contract_expect(c, bad == (st == ACP_OK ? 0u : 1u), "acp_cruise_speed_n", "count differs");
}

static void integrate(contract *c, const acp_aircraft *ac, double mass, double hp, double dt, double wind) {
  const int mode = 1 + (int)contract_pick(c, 5);
  const int end = (int)contract_pick(c, 5); /* 0 and 4 are not ends */
  const double value = end == ACP_CRUISE_END_FUEL   ? contract_range(c, 0.0, 1500.0)
                       : end == ACP_CRUISE_END_TIME ? contract_range(c, 0.0, 7200.0)
                                                    : contract_range(c, 0.0, 1.5e6);
  const double step = contract_pick(c, 2) ? 0.0 : value / (1.0 + contract_pick(c, 20));
  const double climb = contract_pick(c, 3) ? 0.0 : contract_range(c, 100.0, 3000.0);
  const double ci = contract_range(c, 0.0, 1000.0);
  acp_cruise_result r, rt;
  const char *fn = "acp_cruise";
  const int st = acp_cruise(ac, mode, ci, mass, hp, dt, wind, end, value, step, climb, &r);
  contract_code(c, fn, st, ALLOWED);
  contract_value(c, fn, r.fuel, 0x1p-1074, 1e6);
  contract_value(c, fn, r.time, 0x1p-1074, 1e7);
  contract_value(c, fn, r.step_climbs, 0.0, 1000.0);
  if (end < 1 || end > 3) contract_expect(c, st != ACP_OK, fn, "an unknown end accepted");
  if (st != ACP_OK) {
    contract_expect(c, isnan(r.fuel) && isnan(r.time) && isnan(r.distance) && isnan(r.mass_end), fn,
                    "an output not NaN on error");
  } else {
    contract_close(c, fn, "mass_end = mass - fuel", r.mass_end, mass - r.fuel, 1e-9, 1e-12);
    const double got = end == ACP_CRUISE_END_DISTANCE ? r.distance : end == ACP_CRUISE_END_FUEL ? r.fuel : r.time;
    contract_close(c, fn, "the end quantity", got, value, 1e-6, 1e-9);
    contract_close(c, fn, "sar_mean = distance/fuel", r.sar_mean, r.distance / r.fuel, 0, 1e-12);
    contract_expect(c, r.step_climbs == floor(r.step_climbs) && (climb > 0 || r.step_climbs == 0), fn,
                    "step climbs not a whole number, or flown without step_climb");
  }
  size_t need = 0, n = 0;
  const int q = acp_cruise_trace(ac, mode, ci, mass, hp, dt, wind, end, value, step, climb, 0, NULL,
                                 &need, &rt);
  contract_code(c, "acp_cruise_trace", q, ALLOWED);
  if (st == ACP_OK)
    contract_expect(c, q == ACP_ERR_RANGE && need >= 2, "acp_cruise_trace", "size query without the count");
  if (q != ACP_ERR_RANGE || need < 2 || need > MAX_POINTS) return;
  acp_cruise_point *pts = malloc(need * sizeof *pts);
  if (!pts) return;
  const int t = acp_cruise_trace(ac, mode, ci, mass, hp, dt, wind, end, value, step, climb, need, pts,
                                 &n, &rt);
  contract_expect(c, t == st, "acp_cruise_trace", "status differs from acp_cruise");
  if (t == ACP_OK && st == ACP_OK) {
    contract_same(c, "acp_cruise_trace", "fuel", rt.fuel, r.fuel);
    contract_same(c, "acp_cruise_trace", "distance", rt.distance, r.distance);
    contract_same(c, "acp_cruise_trace", "time", rt.time, r.time);
    contract_expect(c, n >= 2 && n <= need, "acp_cruise_trace", "count outside 2 to the number needed");
    if (n >= 2 && n <= need) {
      contract_close(c, "acp_cruise_trace", "last point's mass", pts[n - 1].mass, r.mass_end, 1e-9, 1e-12);
      contract_close(c, "acp_cruise_trace", "last point's distance", pts[n - 1].distance, r.distance, 1e-6, 1e-12);
    }
  }
  free(pts);
}

void contract_cruise(contract *c) {
  breguet(c);
  acp_aircraft *own;
  const acp_aircraft *ac = contract_some_aircraft(c, &own);
  const double mass = contract_range(c, 3000.0, 42000.0);
  const double hp = contract_range(c, ACP_ISA_HP_MIN, 13000.0);
  const double dt = contract_range(c, -60.0, 60.0), wind = contract_range(c, -200.0, 200.0);
  const double tas = contract_range(c, 0.0, 300.0);
  double sar = 0.0;
  const int st = acp_specific_air_range(ac, mass, hp, dt, tas, wind, &sar);
  const char *fn = "acp_specific_air_range";
  contract_code(c, fn, st, ALLOWED);
  contract_value(c, fn, sar, 0x1p-1074, 1e6);
  contract_expect(c, (st == ACP_OK) == !isnan(sar), fn, "NaN with ACP_OK, or a value with an error");
  if (st == ACP_OK) contract_close(c, fn, "ground speed / fuel flow at thrust = drag", sar,
                                   sar_parts(ac, mass, hp, dt, tas, wind), 0, 1e-12);
  if (!(fabs(wind) <= 200.0)) contract_expect(c, st != ACP_OK, fn, "a wind beyond 200 m/s accepted");
  if (st == ACP_OK) contract_expect(c, tas + wind > 0, fn, "ground speed not positive accepted");
  const double ms[2] = {mass, mass}, hs[2] = {hp, hp}, ds[2] = {dt, dt}, vs[2] = {tas, 0.9 * tas};
  const double ws[2] = {wind, wind};
  double out[2];
  const int null_dt = (int)contract_pick(c, 2), null_w = (int)contract_pick(c, 2);
  const size_t bad = acp_specific_air_range_n(ac, 2, ms, hs, null_dt ? NULL : ds, vs, null_w ? NULL : ws, out);
  size_t nan_count = 0;
  for (int i = 0; i < 2; ++i) {
    double w = 0.0;
    acp_specific_air_range(ac, ms[i], hs[i], null_dt ? 0.0 : dt, vs[i], null_w ? 0.0 : wind, &w);
    contract_same(c, "acp_specific_air_range_n", "sar", out[i], w);
    nan_count += isnan(w) ? 1u : 0u;
  }
  contract_expect(c, bad == nan_count, "acp_specific_air_range_n", "count differs");
  contract_expect(c, acp_specific_air_range(ac, mass, hp, dt, tas, wind, NULL) == ACP_ERR_INVALID,
                  fn, "NULL out accepted");
  if (contract_sampled(c)) {
    if (contract_pick(c, 3) == 0) integrate(c, ac, mass, hp, dt, wind);
    else speed_mode(c, ac, mass, hp, dt, wind);
  }
  acp_aircraft_free(own);
}
