/* Thrust, power and fuel flow of the aircraft's engines (published lapse models). */
#include "acperf/propulsion.h"

#include "acperf/atmosphere.h"
#include "acperf/polar.h"
#include "acperf/status.h"
#include "internal.h"
#include "aircraft_internal.h"
#include "propulsion_internal.h"

#include <stdio.h>

/* Total temperature and pressure ratios theta0, delta0 at a Mach and altitude. */
static int stagnation_ratios(double mach, double hp, double dtemp, double *theta0,
                             double *delta0, acp_atmos *at) {
  if (!isfinite(mach)) return ACP_ERR_INVALID;
  if (!acp_in_range(mach, 0.0, ACP_POLAR_MACH_MAX)) return ACP_ERR_RANGE;
  const int st = acp_isa(hp, dtemp, at);
  if (st != ACP_OK) return st;
  const double s = 1.0 + 0.2 * mach * mach;
  *theta0 = at->temperature / ACP_T0 * s;
  *delta0 = at->pressure / ACP_P0 * pow(s, 3.5);
  return ACP_OK;
}

double acp_turbofan_thrust_lapse(double mach, double hp, double dtemp, double throttle_ratio) {
  double theta0, delta0;
  acp_atmos at;
  if (!acp_in_range(throttle_ratio, 0.9, 1.3) ||
      stagnation_ratios(mach, hp, dtemp, &theta0, &delta0, &at) != ACP_OK)
    return ACP_NAN;
  return propulsion_turbofan_lapse(mach, theta0, delta0, throttle_ratio);
}

double propulsion_turbofan_lapse(double mach, double theta0, double delta0, double tr) {
  double a = 1.0 - 0.49 * sqrt(mach);
  if (theta0 > tr) a -= 3.0 * (theta0 - tr) / (1.5 + mach);
  return fmax(delta0 * a, 0.0);
}

double acp_turbofan_tsfc(double mach, double hp, double dtemp, double c0, double c1) {
  acp_atmos at;
  if (!isfinite(c0) || !isfinite(c1) || c0 < 0.0 || c1 < 0.0 || !isfinite(mach) ||
      !acp_in_range(mach, 0.0, ACP_POLAR_MACH_MAX) || acp_isa(hp, dtemp, &at) != ACP_OK)
    return ACP_NAN;
  const double tsfc = (c0 + c1 * mach) * sqrt(at.temperature / ACP_T0);
  return isfinite(tsfc) ? tsfc : ACP_NAN; /* overflow (huge c0 or c1) is no result */
}

double acp_piston_power_lapse(double density_ratio) {
  if (!acp_in_range(density_ratio, 0.2, 1.5)) return ACP_NAN;
  return 1.132 * density_ratio - 0.132;
}

/* ---- the aircraft's engines -------------------------------------------- */

static int need(const acp_aircraft *ac, enum ac_key k, char *err, size_t errlen) {
  if (!isnan(ac_value(ac, k))) return 1;
  if (err && errlen) snprintf(err, errlen, "missing key '%s' for the engine model", AC_KEYS[k].name);
  return 0;
}

int prop_check(const acp_aircraft *ac, char *err, size_t errlen) {
  if (!need(ac, AK_ENGINE_TYPE, err, errlen) || !need(ac, AK_ENGINE_COUNT, err, errlen) ||
      !need(ac, AK_CLIMB_RATING, err, errlen) || !need(ac, AK_CRUISE_RATING, err, errlen) ||
      !need(ac, AK_IDLE_THRUST_FRACTION, err, errlen) || !need(ac, AK_IDLE_FUEL_FLOW, err, errlen))
    return ACP_ERR_INVALID;
  if ((int)ac_value(ac, AK_ENGINE_TYPE) == ENGINE_TURBOFAN) {
    if (!need(ac, AK_ENGINE_THRUST, err, errlen) || !need(ac, AK_TSFC_C0, err, errlen))
      return ACP_ERR_INVALID;
  } else {
    if (!need(ac, AK_ENGINE_POWER, err, errlen) || !need(ac, AK_PROPELLER_EFFICIENCY, err, errlen) ||
        !need(ac, AK_PSFC, err, errlen))
      return ACP_ERR_INVALID;
    if ((int)ac_value(ac, AK_ENGINE_TYPE) == ENGINE_TURBOPROP &&
        !need(ac, AK_POWER_LAPSE_EXPONENT, err, errlen))
      return ACP_ERR_INVALID;
  }
  return ACP_OK;
}

static double rating_fraction(const acp_aircraft *ac, int rating) {
  switch (rating) {
  case ACP_RATING_MAXIMUM: return 1.0;
  case ACP_RATING_CLIMB: return ac_value(ac, AK_CLIMB_RATING);
  case ACP_RATING_CRUISE: return ac_value(ac, AK_CRUISE_RATING);
  case ACP_RATING_IDLE: return ac_value(ac, AK_IDLE_THRUST_FRACTION);
  default: return ACP_NAN;
  }
}

/* Maximum thrust (N, all engines), the fuel flow per newton (kg/(N s)) at it,
   and the idle fuel flow (kg/s), at a condition. Propellers: thrust eta P/V. */
typedef struct {
  double thrust_max, tsfc, idle_fuel_flow, power_max, eta;
} engine_state;

static int engine_state_at(const acp_aircraft *ac, const acp_atmos *at, double mach, double tas,
                           engine_state *e) {
  const double n = ac_value(ac, AK_ENGINE_COUNT);
  const double s = 1.0 + 0.2 * mach * mach;
  const double theta0 = at->temperature / ACP_T0 * s;
  const double delta0 = at->pressure / ACP_P0 * pow(s, 3.5);
  /* Idle fuel flow as a corrected parameter: Wf/(delta0 sqrt(theta0)) constant. */
  e->idle_fuel_flow = n * ac_value(ac, AK_IDLE_FUEL_FLOW) * delta0 * sqrt(theta0);
  const int type = (int)ac_value(ac, AK_ENGINE_TYPE);
  if (type == ENGINE_TURBOFAN) {
    e->thrust_max = n * ac_value(ac, AK_ENGINE_THRUST) *
                    propulsion_turbofan_lapse(mach, theta0, delta0, ac_value(ac, AK_THROTTLE_RATIO));
    e->tsfc = (ac_value(ac, AK_TSFC_C0) + ac_value(ac, AK_TSFC_C1) * mach) *
              sqrt(at->temperature / ACP_T0);
    e->power_max = e->eta = ACP_NAN;
    return ACP_OK;
  }
  if (!(tas >= 1.0)) return ACP_ERR_RANGE; /* propeller thrust eta P/V needs a speed */
  const double sigma = at->density / ACP_RHO0;
  const double lapse = type == ENGINE_PISTON
                           ? 1.132 * sigma - 0.132
                           : pow(sigma, ac_value(ac, AK_POWER_LAPSE_EXPONENT));
  e->power_max = n * ac_value(ac, AK_ENGINE_POWER) * fmax(lapse, 0.0);
  e->eta = ac_value(ac, AK_PROPELLER_EFFICIENCY);
  e->thrust_max = e->eta * e->power_max / tas;
  e->tsfc = ac_value(ac, AK_PSFC) * tas / e->eta; /* PSFC x P per newton of thrust */
  return ACP_OK;
}

static void fill(acp_engine_point *out, const engine_state *e, double thrust, double tas) {
  out->thrust = thrust;
  out->fuel_flow = fmax(e->tsfc * thrust, e->idle_fuel_flow);
  out->tsfc = out->fuel_flow / thrust;
  if (!isfinite(out->tsfc)) out->tsfc = ACP_NAN; /* no thrust (or a denormal one): no TSFC */
  out->shaft_power = isnan(e->eta) ? ACP_NAN : thrust * tas / e->eta;
}

static void set_nan(acp_engine_point *o) {
  o->thrust = o->fuel_flow = o->tsfc = o->shaft_power = ACP_NAN;
}

int prop_rating(const acp_aircraft *ac, int rating, const acp_atmos *at, double mach, double tas,
                acp_engine_point *out) {
  engine_state e;
  const int st = engine_state_at(ac, at, mach, tas, &e);
  if (st != ACP_OK) {
    set_nan(out);
    return st;
  }
  fill(out, &e, rating_fraction(ac, rating) * e.thrust_max, tas);
  return ACP_OK;
}

int prop_fuel(const acp_aircraft *ac, const acp_atmos *at, double mach, double tas, double thrust,
              acp_engine_point *out) {
  engine_state e;
  int st = engine_state_at(ac, at, mach, tas, &e);
  if (st == ACP_OK && thrust > e.thrust_max * (1.0 + 1e-12)) st = ACP_ERR_THRUST;
  if (st == ACP_OK && thrust < ac_value(ac, AK_IDLE_THRUST_FRACTION) * e.thrust_max * (1.0 - 1e-12))
    st = ACP_ERR_RANGE;
  if (st != ACP_OK) {
    set_nan(out);
    return st;
  }
  fill(out, &e, thrust, tas);
  return ACP_OK;
}

/* Checks of the public forms: aircraft, rating, atmosphere, Mach. */
static int public_condition(const acp_aircraft *ac, double hp, double dtemp, double tas,
                            acp_engine_point *out, acp_atmos *at, double *mach) {
  if (!out) return ACP_ERR_INVALID;
  set_nan(out);
  if (!ac || !isfinite(tas) || tas < 0.0) return ACP_ERR_INVALID;
  if (prop_check(ac, NULL, 0) != ACP_OK) return ACP_ERR_INVALID;
  const int st = acp_isa(hp, dtemp, at);
  if (st != ACP_OK) return st;
  *mach = tas / at->sound_speed;
  return *mach <= ACP_POLAR_MACH_MAX ? ACP_OK : ACP_ERR_RANGE;
}

int acp_engine_rating(const acp_aircraft *ac, int rating, double hp, double dtemp, double tas,
                      acp_engine_point *out) {
  acp_atmos at;
  double mach;
  const int st = public_condition(ac, hp, dtemp, tas, out, &at, &mach);
  if (st != ACP_OK) return st;
  if (rating < ACP_RATING_MAXIMUM || rating > ACP_RATING_IDLE) return ACP_ERR_INVALID;
  return prop_rating(ac, rating, &at, mach, tas, out);
}

int acp_engine_thrust(const acp_aircraft *ac, double thrust, double hp, double dtemp, double tas,
                      acp_engine_point *out) {
  acp_atmos at;
  double mach;
  const int st = public_condition(ac, hp, dtemp, tas, out, &at, &mach);
  if (st != ACP_OK) return st;
  if (!isfinite(thrust) || thrust < 0.0) return ACP_ERR_INVALID;
  return prop_fuel(ac, &at, mach, tas, thrust, out);
}
