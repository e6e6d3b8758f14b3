/* Contract of mission.h: keyed set/get against the documented ranges (every
   input); trips and the take-off mass for a zero-fuel mass (sampled):
   statuses, the named infeasibility with its status, NaN on error, the fuel
   and mass balance, the route's distance flown, and the zero-fuel mass met. */
#include <math.h>
#include <string.h>

#include "acperf.h"
#include "contract.h"

static const struct {
  const char *key;
  double lo, hi;
  int zero_or; /* 1: 0 is also allowed below lo */
  int whole;
} KEYS[] = {
    {"distance", 1000.0, 2e7, 0, 0},         {"cruise_altitude", 0.0, 25000.0, 0, 0},
    {"origin_altitude", -500.0, 5000.0, 0, 0}, {"destination_altitude", -500.0, 5000.0, 0, 0},
    {"isa_deviation", -60.0, 60.0, 0, 0},    {"wind", -100.0, 100.0, 0, 0},
    {"cruise_mode", 1.0, 5.0, 0, 1},         {"cost_index", 0.0, 1000.0, 0, 0},
    {"step_climb", 100.0, 3000.0, 1, 0},     {"climb_step", 10.0, 1000.0, 1, 0},
    {"cruise_step", 100.0, 1e6, 1, 0},       {"taxi_time", 0.0, 7200.0, 0, 0},
    {"taxi_fuel", 0.0, 1e5, 0, 0},           {"contingency_fraction", 0.0, 0.5, 0, 0},
    {"contingency_minimum", 0.0, 1e5, 0, 0}, {"alternate_fuel", 0.0, 1e6, 0, 0},
    {"final_reserve_time", 0.0, 14400.0, 0, 0}, {"holding_height", 0.0, 10000.0, 0, 0},
    {"descent_end_height", 0.0, 3000.0, 0, 0},
};
#define NKEYS (sizeof KEYS / sizeof KEYS[0])

/* status that goes with each acp_trip_infeasible value */
static const int INFEASIBLE_STATUS[] = {ACP_OK, ACP_ERR_RANGE, ACP_ERR_RANGE, ACP_ERR_RANGE,
                                        ACP_ERR_RANGE, ACP_ERR_RANGE, ACP_ERR_RANGE,
                                        ACP_ERR_THRUST, ACP_ERR_THRUST, ACP_ERR_RANGE, ACP_ERR_RANGE,
                                        ACP_ERR_RANGE, ACP_ERR_RANGE};
#define INFEASIBLE_MAX ((int)(sizeof INFEASIBLE_STATUS / sizeof INFEASIBLE_STATUS[0]) - 1)

static void keys(contract *c, acp_mission *m) {
  const unsigned k = contract_pick(c, (unsigned)NKEYS);
  const double v = contract_range(c, KEYS[k].zero_or ? 0.0 : KEYS[k].lo, KEYS[k].hi);
  double before = 0, after = 0;
  contract_code(c, "acp_mission_get", acp_mission_get(m, KEYS[k].key, &before), 0);
  const int st = acp_mission_set(m, KEYS[k].key, v);
  contract_code(c, "acp_mission_set", st, ST(ACP_ERR_INVALID) | ST(ACP_ERR_RANGE));
  const int inside = isfinite(v) && ((v >= KEYS[k].lo && v <= KEYS[k].hi) || (KEYS[k].zero_or && v == 0.0));
  const int whole = !KEYS[k].whole || (isfinite(v) && v == floor(v));
  if ((st == ACP_OK) != (inside && whole))
    contract_violation(c, "acp_mission_set", "%s = %.17g: status %d", KEYS[k].key, v, st);
  if (!isfinite(v)) contract_expect(c, st == ACP_ERR_INVALID, "acp_mission_set", "NaN/Inf not invalid");
  acp_mission_get(m, KEYS[k].key, &after);
  contract_record(c, after);
  if (st == ACP_OK)
    contract_expect(c, after == v || (isnan(after) && isnan(v)), "acp_mission_get", "does not read back");
  else
    contract_expect(c, memcmp(&after, &before, sizeof after) == 0 || (isnan(after) && isnan(before)),
                    "acp_mission_set", "mission changed on error");
  double x = 0;
  contract_expect(c, acp_mission_set(m, "range", 1e5) == ACP_ERR_UNKNOWN_KEY &&
                         acp_mission_get(m, "range", &x) == ACP_ERR_UNKNOWN_KEY && isnan(x) &&
                         acp_mission_set(NULL, "wind", 0) == ACP_ERR_INVALID &&
                         acp_mission_set(m, NULL, 0) == ACP_ERR_INVALID &&
                         acp_mission_get(m, "wind", NULL) == ACP_ERR_INVALID,
                  "acp_mission_set/get", "unknown key or NULL accepted");
}

static void check_trip(contract *c, const char *fn, int st, const acp_trip_result *r, double distance,
                       const acp_aircraft *ac) {
  contract_code(c, fn, st, ST(ACP_ERR_INVALID) | ST(ACP_ERR_RANGE) | ST(ACP_ERR_THRUST) |
                               ST(ACP_ERR_NO_CONVERGENCE));
  contract_value(c, fn, r->infeasible, 0.0, INFEASIBLE_MAX);
  contract_value(c, fn, r->trip_fuel, 0x1p-1074, 1e6);
  contract_value(c, fn, r->block_fuel, 0x1p-1074, 1e6);
  contract_value(c, fn, r->takeoff_mass, 1.0, 1e6);
  if (!isnan(r->infeasible)) {
    const int inf = (int)r->infeasible;
    contract_expect(c, r->infeasible == inf && inf >= 0 && inf <= INFEASIBLE_MAX &&
                           INFEASIBLE_STATUS[inf] == st,
                    fn, "infeasible value does not go with the status");
    /* excess: NaN when feasible and for the thrust kinds (no amount), else >= 0 */
    const int amount = inf != 0 && inf != ACP_TRIP_CANNOT_CLIMB && inf != ACP_TRIP_CANNOT_CRUISE;
    contract_expect(c, amount ? r->excess >= 0.0 : isnan(r->excess), fn,
                    "excess not NaN without an amount, or not >= 0 for an exceeded limit");
  }
  if (st == ACP_OK) {
    contract_expect(c, r->infeasible == 0.0, fn, "ACP_OK not marked feasible");
    const double *f = &r->takeoff_mass;
    for (size_t i = 0; i < (sizeof *r - 2 * sizeof(double)) / sizeof(double); ++i)
      if (!isfinite(f[i])) {
        contract_violation(c, fn, "ACP_OK with output %zu not finite", i);
        break;
      }
    contract_close(c, fn, "landing = take-off - trip fuel", r->landing_mass, r->takeoff_mass - r->trip_fuel, 1e-6, 1e-12);
    contract_close(c, fn, "zero-fuel = landing - reserves", r->zero_fuel_mass,
                   r->landing_mass - r->contingency_fuel - r->alternate_fuel - r->final_reserve_fuel, 1e-6, 1e-12);
    contract_close(c, fn, "block fuel", r->block_fuel,
                   r->taxi_fuel + r->trip_fuel + r->contingency_fuel + r->alternate_fuel + r->final_reserve_fuel,
                   1e-6, 1e-12);
    contract_close(c, fn, "trip fuel", r->trip_fuel,
                   r->climb_fuel + r->climb_acceleration_fuel + r->cruise_fuel +
                       r->descent_deceleration_fuel + r->descent_fuel + r->approach_deceleration_fuel,
                   1e-6, 1e-12);
    double oew = NAN;
    acp_aircraft_get(ac, "mass_operating_empty", &oew);
    contract_expect(c, !(r->zero_fuel_mass < oew - 0.1), fn, "a zero-fuel mass below the empty mass");
    contract_close(c, fn, "ramp = take-off + taxi", r->ramp_mass, r->takeoff_mass + r->taxi_fuel, 1e-6, 1e-12);
    contract_close(c, fn, "take-off fuel = block - taxi", r->takeoff_fuel, r->block_fuel - r->taxi_fuel, 1e-6, 1e-12);
    contract_close(c, fn, "distance flown",
                   r->climb_distance + r->climb_acceleration_distance + r->cruise_distance +
                       r->descent_deceleration_distance + r->descent_distance +
                       r->approach_deceleration_distance,
                   distance, 1.0, 1e-6);
  } else if (isnan(r->infeasible) || r->infeasible != 0.0) {
    contract_expect(c, isnan(r->takeoff_mass) && isnan(r->trip_fuel) && isnan(r->block_fuel), fn,
                    "an output not NaN on error");
  } else {
    contract_violation(c, fn, "status %d with infeasible 0", st);
  }
}

void contract_mission(contract *c) {
  acp_mission *m = acp_mission_new();
  if (!m) return;
  keys(c, m);
  if (contract_sampled(c)) {
    acp_aircraft *own;
    const acp_aircraft *ac = contract_some_aircraft(c, &own);
    double mtow = 40000.0;
    acp_aircraft_get(ac, "mass_max_takeoff", &mtow);
    const double distance = contract_range(c, 1000.0, 3e6);
    acp_mission_set(m, "distance", distance);
    acp_mission_set(m, "cruise_altitude", contract_range(c, 0.0, 12000.0));
    const unsigned extra = contract_pick(c, 3);
    for (unsigned i = 0; i < extra; ++i) keys(c, m);
    double d = NAN;
    acp_mission_get(m, "distance", &d);
    acp_trip_result r;
    if (contract_pick(c, 4)) {
      const double tow = contract_range(c, 0.5, 1.05) * mtow;
      const int st = acp_trip(ac, m, tow, &r);
      check_trip(c, "acp_trip", st, &r, d, ac);
      if (st == ACP_OK) {
        contract_expect(c, r.takeoff_mass == tow && r.iterations == 1.0, "acp_trip",
                        "take-off mass not the one given, or iterations not 1");
      }
    } else {
      const double zfm = contract_range(c, 0.5, 0.9) * mtow;
      const int st = acp_trip_for_zero_fuel_mass(ac, m, zfm, &r);
      check_trip(c, "acp_trip_for_zero_fuel_mass", st, &r, d, ac);
      if (st == ACP_OK) {
        contract_close(c, "acp_trip_for_zero_fuel_mass", "zero-fuel mass met", r.zero_fuel_mass, zfm, 0.1, 0);
        acp_trip_result again;
        const int s2 = acp_trip(ac, m, r.takeoff_mass, &again);
        contract_expect(c, s2 == ACP_OK, "acp_trip_for_zero_fuel_mass", "its take-off mass does not fly");
        if (s2 == ACP_OK)
          contract_close(c, "acp_trip_for_zero_fuel_mass", "the trip from its take-off mass",
                         again.zero_fuel_mass, zfm, 0.1, 0);
      }
    }
    contract_expect(c, acp_trip(ac, NULL, 30000.0, &r) == ACP_ERR_INVALID && isnan(r.takeoff_mass) &&
                           acp_trip(ac, m, 30000.0, NULL) == ACP_ERR_INVALID,
                    "acp_trip", "NULL accepted");
    acp_aircraft_free(own);
  }
  acp_mission_free(m);
}
