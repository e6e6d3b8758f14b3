/* Contract of propulsion.h: the lapse and TSFC helpers NaN exactly outside
   their ranges and equal to their formulas inside; the aircraft's engines:
   statuses, outputs NaN on error, ratings ordered idle <= cruise <= climb
   <= maximum, fuel flow for a thrust rising with it, not below idle, and
   ACP_ERR_THRUST above the maximum. */
#include <math.h>

#include "acperf.h"
#include "contract.h"

#define ALLOWED (ST(ACP_ERR_INVALID) | ST(ACP_ERR_RANGE))

static void helpers(contract *c) {
  const double m = contract_range(c, 0.0, ACP_POLAR_MACH_MAX);
  const double hp = contract_range(c, ACP_ISA_HP_MIN, 25000.0);
  const double dt = contract_range(c, ACP_ISA_DTEMP_MIN, ACP_ISA_DTEMP_MAX);
  const double tr = contract_range(c, 0.9, 1.3);
  acp_atmos a;
  const int atm_ok = acp_isa(hp, dt, &a) == ACP_OK, m_ok = m >= 0.0 && m <= ACP_POLAR_MACH_MAX;
  const double lapse = acp_turbofan_thrust_lapse(m, hp, dt, tr);
  contract_value(c, "acp_turbofan_thrust_lapse", lapse, 0.0, 4.0);
  contract_expect(c, (atm_ok && m_ok && tr >= 0.9 && tr <= 1.3) == !isnan(lapse),
                  "acp_turbofan_thrust_lapse", "NaN exactly outside the documented ranges");
  const double c0 = contract_range(c, 0.0, 1e-3), c1 = contract_range(c, 0.0, 1e-3);
  const double tsfc = acp_turbofan_tsfc(m, hp, dt, c0, c1);
  contract_value(c, "acp_turbofan_tsfc", tsfc, 0.0, 1.7976931348623157e308);
  const int c_ok = isfinite(c0) && isfinite(c1) && c0 >= 0.0 && c1 >= 0.0;
  const double want = (c0 + c1 * m) * sqrt(a.temperature / ACP_T0);
  if (atm_ok && m_ok && c_ok && isfinite(want))
    contract_close(c, "acp_turbofan_tsfc", "(c0 + c1 M) sqrt(theta)", tsfc, want, 0.0, 1e-14);
  if (!(atm_ok && m_ok && c_ok))
    contract_expect(c, isnan(tsfc), "acp_turbofan_tsfc", "accepted an invalid argument");
  const double sigma = contract_range(c, 0.2, 1.5);
  const double pl = acp_piston_power_lapse(sigma);
  contract_value(c, "acp_piston_power_lapse", pl, 0.09, 1.57);
  const int s_ok = sigma >= 0.2 && sigma <= 1.5;
  contract_expect(c, s_ok == !isnan(pl), "acp_piston_power_lapse", "NaN exactly outside 0.2 to 1.5");
  if (s_ok) contract_close(c, "acp_piston_power_lapse", "1.132 sigma - 0.132", pl, 1.132 * sigma - 0.132, 1e-15, 1e-15);
}

static void check_point(contract *c, const char *fn, int st, const acp_engine_point *e, int jet) {
  /* a propeller's eta P/V at the 1 m/s the model allows, with 8 engines of the
     documented 20 MW in dense air, is up to about 2.5e8 N (found by the
     whole-range aircraft of the model fuzzer: the bound was 1e8) */
  contract_value(c, fn, e->thrust, 0.0, 1e9);
  contract_value(c, fn, e->fuel_flow, 0.0, 1e5);
  contract_value(c, fn, e->tsfc, 0.0, 1.7976931348623157e308); /* fuel/thrust: large near zero thrust */
  contract_value(c, fn, e->shaft_power, 0.0, 1e9);
  if (st != ACP_OK) {
    contract_expect(c, isnan(e->thrust) && isnan(e->fuel_flow) && isnan(e->tsfc) &&
                           isnan(e->shaft_power), fn, "an output not NaN on error");
    return;
  }
  contract_expect(c, isfinite(e->thrust) && isfinite(e->fuel_flow), fn, "ACP_OK with a NaN output");
  contract_expect(c, isnan(e->tsfc) == !isfinite(e->fuel_flow / e->thrust), fn,
                  "TSFC NaN other than at zero (or denormal) thrust");
  contract_expect(c, jet == isnan(e->shaft_power), fn, "shaft power NaN for a propeller or given for a jet");
}

void contract_propulsion(contract *c) {
  helpers(c);
  acp_aircraft *own;
  const acp_aircraft *ac = contract_some_aircraft(c, &own);
  double type = NAN;
  acp_aircraft_get(ac, "engine_type", &type);
  const int jet = type == 1.0;
  const double hp = contract_range(c, ACP_ISA_HP_MIN, 20000.0);
  const double dt = contract_range(c, -60.0, 60.0);
  acp_atmos a;
  const int atm_ok = acp_isa(hp, dt, &a) == ACP_OK;
  const double tas = contract_range(c, jet ? 0.0 : 1.0, atm_ok ? ACP_POLAR_MACH_MAX * a.sound_speed : 300.0);
  acp_engine_point r[4];
  int st[4];
  for (int k = 0; k < 4; ++k) {
    st[k] = acp_engine_rating(ac, k, hp, dt, tas, &r[k]);
    contract_code(c, "acp_engine_rating", st[k], ALLOWED);
    check_point(c, "acp_engine_rating", st[k], &r[k], jet);
    if (k > 0) contract_expect(c, st[k] == st[0], "acp_engine_rating", "status depends on the rating");
  }
  const int inside = atm_ok && tas >= (jet ? 0.0 : 1.0) && tas / a.sound_speed <= ACP_POLAR_MACH_MAX;
  if (!own) contract_expect(c, inside == (st[0] == ACP_OK), "acp_engine_rating",
                            "status disagrees with the documented ranges on a demo aircraft");
  const int bad_rating = contract_pick(c, 2) ? -1 : 4;
  acp_engine_point x;
  contract_expect(c, acp_engine_rating(ac, bad_rating, hp, dt, tas, &x) != ACP_OK && isnan(x.thrust),
                  "acp_engine_rating", "an unknown rating accepted");
  if (st[0] != ACP_OK) {
    acp_aircraft_free(own);
    return;
  }
  /* the demo aircraft's ratings are ordered (a fuzzed copy may rate climb below cruise) */
  if (!own)
    contract_expect(c, r[ACP_RATING_IDLE].thrust <= r[ACP_RATING_CRUISE].thrust &&
                         r[ACP_RATING_CRUISE].thrust <= r[ACP_RATING_CLIMB].thrust &&
                         r[ACP_RATING_CLIMB].thrust <= r[ACP_RATING_MAXIMUM].thrust,
                  "acp_engine_rating", "ratings not ordered idle <= cruise <= climb <= maximum");
  double climb = NAN, cruise = NAN, idle = NAN;
  acp_aircraft_get(ac, "climb_rating", &climb);
  acp_aircraft_get(ac, "cruise_rating", &cruise);
  acp_aircraft_get(ac, "idle_thrust_fraction", &idle);
  contract_close(c, "acp_engine_rating", "climb = climb_rating x maximum",
                 r[ACP_RATING_CLIMB].thrust, climb * r[ACP_RATING_MAXIMUM].thrust, 1e-300, 1e-14);
  contract_close(c, "acp_engine_rating", "cruise = cruise_rating x maximum",
                 r[ACP_RATING_CRUISE].thrust, cruise * r[ACP_RATING_MAXIMUM].thrust, 1e-300, 1e-14);
  contract_close(c, "acp_engine_rating", "idle = idle_thrust_fraction x maximum",
                 r[ACP_RATING_IDLE].thrust, idle * r[ACP_RATING_MAXIMUM].thrust, 1e-300, 1e-14);

  /* A thrust between idle and the maximum: fuel flow rising with it, not below idle. */
  const double lo = r[ACP_RATING_IDLE].thrust, hi = r[ACP_RATING_MAXIMUM].thrust;
  const double u = contract_range(c, 0.0, 1.0);
  const double t1 = lo + (hi - lo) * fmin(fmax(u, 0.0), 1.0);
  acp_engine_point e1, e2;
  const int s1 = acp_engine_thrust(ac, t1, hp, dt, tas, &e1);
  contract_code(c, "acp_engine_thrust", s1, ALLOWED | ST(ACP_ERR_THRUST));
  check_point(c, "acp_engine_thrust", s1, &e1, jet);
  contract_expect(c, s1 == ACP_OK, "acp_engine_thrust", "refused a thrust between idle and the maximum");
  const int s2 = acp_engine_thrust(ac, hi, hp, dt, tas, &e2);
  contract_expect(c, s2 == ACP_OK, "acp_engine_thrust", "refused the maximum thrust");
  if (s1 == ACP_OK && s2 == ACP_OK) {
    contract_expect(c, e1.fuel_flow <= e2.fuel_flow * (1.0 + 1e-12), "acp_engine_thrust",
                    "less thrust, more fuel");
    contract_expect(c, e1.fuel_flow >= r[ACP_RATING_IDLE].fuel_flow * (1.0 - 1e-12),
                    "acp_engine_thrust", "fuel flow below idle");
    contract_close(c, "acp_engine_thrust", "fuel flow at the maximum = the rating's", e2.fuel_flow,
                   r[ACP_RATING_MAXIMUM].fuel_flow, 1e-300, 1e-12);
  }
  const double over = hi > 0.0 ? hi * (1.0 + 1e-9) : 1.0;
  contract_expect(c, acp_engine_thrust(ac, over, hp, dt, tas, &x) == ACP_ERR_THRUST && isnan(x.fuel_flow),
                  "acp_engine_thrust", "more than the maximum thrust not ACP_ERR_THRUST");
  contract_expect(c, acp_engine_thrust(ac, -1.0, hp, dt, tas, &x) == ACP_ERR_INVALID &&
                         acp_engine_thrust(ac, NAN, hp, dt, tas, &x) == ACP_ERR_INVALID &&
                         acp_engine_rating(ac, 0, hp, dt, tas, NULL) == ACP_ERR_INVALID &&
                         acp_engine_rating(NULL, 0, hp, dt, tas, &x) == ACP_ERR_INVALID,
                  "acp_engine_thrust/rating", "a negative or NaN thrust, or NULL, accepted");
  acp_aircraft_free(own);
}
