/* The ISO 2533:1975 standard atmosphere (= ICAO Doc 7488, = US 1976 below 84,852 m). */
#include "acperf/atmosphere.h"

#include "acperf/status.h"
#include "atmosphere_layers.h"
#include "internal.h"
#include "vector_math.h"

#include <string.h>

/* Layers of ISO 2533:1975 table 4: base geopotential altitude (m), lapse rate
   (K/m), base temperature (K), base pressure (Pa). Base pressures are the
   standard's hydrostatic recurrence from 101,325 Pa evaluated with 40-digit
   decimal arithmetic (the ISO tables print 6 digits: 2.26320E+04 Pa at
   11 km, 5.47487E+03 at 20 km, 8.68014E+02 at 32 km, ...). The first layer
   extends down to -5,000 m with the same lapse rate. */
const atm_layer ATM_LAYERS[ATM_NLAYERS] = {
    {0.0, -0.0065, 288.15, 101325.0, -ACP_G0 / (ACP_R_AIR * -0.0065)},
    {11000.0, 0.0, 216.65, 22632.040095007799, 0.0},
    {20000.0, 0.001, 216.65, 5474.8774242810459, -ACP_G0 / (ACP_R_AIR * 0.001)},
    {32000.0, 0.0028, 228.65, 868.01577662021338, -ACP_G0 / (ACP_R_AIR * 0.0028)},
    {47000.0, 0.0, 270.65, 110.90577336730986, 0.0},
    {51000.0, -0.0028, 270.65, 66.938528121179633, -ACP_G0 / (ACP_R_AIR * -0.0028)},
    {71000.0, -0.002, 214.65, 3.9563921603965990, -ACP_G0 / (ACP_R_AIR * -0.002)},
};

/* Index of the layer holding geopotential altitude h (h already range-checked). */
static int layer_of_altitude(double h) {
  int i = ATM_NLAYERS - 1;
  while (i > 0 && h < ATM_LAYERS[i].h) --i;
  return i;
}

void atm_standard(double hp, double *temperature, double *pressure) {
  const atm_layer *l = &ATM_LAYERS[layer_of_altitude(hp)];
  const double dh = hp - l->h;
  const double t = l->t + l->lapse * dh;
  *temperature = t;
  *pressure = l->lapse == 0.0 ? l->p * exp(-ACP_G0 * dh / (ACP_R_AIR * l->t))
                              : l->p * pow(t / l->t, l->exponent);
}

int atm_check(double hp, double dtemp) {
  if (!isfinite(hp) || !isfinite(dtemp)) return ACP_ERR_INVALID;
  if (!acp_in_range(hp, ACP_ISA_HP_MIN, ACP_ISA_HP_MAX)) return ACP_ERR_RANGE;
  if (!acp_in_range(dtemp, ACP_ISA_DTEMP_MIN, ACP_ISA_DTEMP_MAX)) return ACP_ERR_RANGE;
  return ACP_OK;
}

static void set_nan(acp_atmos *out) {
  out->temperature = out->pressure = out->density = ACP_NAN;
  out->sound_speed = out->dynamic_viscosity = out->kinematic_viscosity = ACP_NAN;
}

/* Sutherland's law, ISO 2533:1975 eq. 22. */
static double sutherland(double t) {
  return ACP_SUTHERLAND_BETA * t * sqrt(t) / (t + ACP_SUTHERLAND_S);
}

int acp_isa(double hp, double dtemp, acp_atmos *out) {
  if (!out) return ACP_ERR_INVALID;
  int st = atm_check(hp, dtemp);
  if (st != ACP_OK) {
    set_nan(out);
    return st;
  }
  double tstd, p;
  atm_standard(hp, &tstd, &p);
  const double t = tstd + dtemp;
  out->temperature = t;
  out->pressure = p;
  out->density = p / (ACP_R_AIR * t);
  out->sound_speed = sqrt(ACP_GAMMA * ACP_R_AIR * t);
  out->dynamic_viscosity = sutherland(t);
  out->kinematic_viscosity = out->dynamic_viscosity / out->density;
  return ACP_OK;
}

/* ---- array path: branch-free layer selection, one pow() per element -------
   Per layer k: p = pb * pow(x, y) with x = Tstd/Tb, y = -g0/(R L) in a gradient
   layer, and x = e, y = -g0 (h - hb)/(R Tb) in an isothermal one, so both kinds
   take the same single pow(). e is rounded to double (relative 1e-16), which
   moves p by under 2e-16 relative since |y| < 2 there. */
#define E_MINUS_1 1.7182818284590452354
static const double BLK_H[ATM_NLAYERS] = {0.0, 11000.0, 20000.0, 32000.0, 47000.0, 51000.0, 71000.0};
static const double BLK_TB[ATM_NLAYERS] = {288.15, 216.65, 216.65, 228.65, 270.65, 270.65, 214.65};
static const double BLK_LAPSE[ATM_NLAYERS] = {-0.0065, 0.0, 0.001, 0.0028, 0.0, -0.0028, -0.002};
static const double BLK_INV_TB[ATM_NLAYERS] = {1.0 / 288.15, 1.0 / 216.65, 1.0 / 216.65,
                                               1.0 / 228.65, 1.0 / 270.65, 1.0 / 270.65,
                                               1.0 / 214.65};
static const double BLK_X_ISO[ATM_NLAYERS] = {0.0, E_MINUS_1, 0.0, 0.0, E_MINUS_1, 0.0, 0.0};
static const double BLK_EXPO[ATM_NLAYERS] = {
    -ACP_G0 / (ACP_R_AIR * -0.0065), 0.0, -ACP_G0 / (ACP_R_AIR * 0.001),
    -ACP_G0 / (ACP_R_AIR * 0.0028), 0.0, -ACP_G0 / (ACP_R_AIR * -0.0028),
    -ACP_G0 / (ACP_R_AIR * -0.002)};
static const double BLK_ISO_K[ATM_NLAYERS] = {0.0, -ACP_G0 / (ACP_R_AIR * 216.65), 0.0, 0.0,
                                              -ACP_G0 / (ACP_R_AIR * 270.65), 0.0, 0.0};
static const double BLK_PB[ATM_NLAYERS] = {101325.0,           22632.040095007799,
                                           5474.8774242810459, 868.01577662021338,
                                           110.90577336730986, 66.938528121179633,
                                           3.9563921603965990};
static const double BLK_ZERO[ACP_BLOCK] = {0.0};

ACP_DISPATCH
size_t atm_block(size_t n, const double *hp, const double *dtemp, double *t, double *p) {
  if (!dtemp) dtemp = BLK_ZERO; /* n <= ACP_BLOCK */
#pragma omp simd
  for (size_t i = 0; i < n; ++i) {
    const double h0 = hp[i], d0 = dtemp[i];
    /* 0 for a valid point, NaN otherwise: added to the outputs, it marks them
       without a branch ('&' not '&&' for the same reason). */
    const double bad = ((h0 >= ACP_ISA_HP_MIN) & (h0 <= ACP_ISA_HP_MAX) &
                        (d0 >= ACP_ISA_DTEMP_MIN) & (d0 <= ACP_ISA_DTEMP_MAX))
                           ? 0.0
                           : ACP_NAN;
    const double h = bad == 0.0 ? h0 : 0.0;
    /* The layer's constants by a chain of selects, which vectorises where
       indexed loads (gathers) do not. */
    double hb = BLK_H[0], tb = BLK_TB[0], lapse = BLK_LAPSE[0], inv_tb = BLK_INV_TB[0];
    double x_iso = BLK_X_ISO[0], expo = BLK_EXPO[0], iso_k = BLK_ISO_K[0], pb = BLK_PB[0];
#define ATM_PICK(k)                                \
  do {                                             \
    const int above = h >= BLK_H[k];               \
    hb = above ? BLK_H[k] : hb;                    \
    tb = above ? BLK_TB[k] : tb;                   \
    lapse = above ? BLK_LAPSE[k] : lapse;          \
    inv_tb = above ? BLK_INV_TB[k] : inv_tb;       \
    x_iso = above ? BLK_X_ISO[k] : x_iso;          \
    expo = above ? BLK_EXPO[k] : expo;             \
    iso_k = above ? BLK_ISO_K[k] : iso_k;          \
    pb = above ? BLK_PB[k] : pb;                   \
  } while (0)
    /* Unrolled by hand: GCC vectorises straight-line selects, not an inner loop. */
    ATM_PICK(1);
    ATM_PICK(2);
    ATM_PICK(3);
    ATM_PICK(4);
    ATM_PICK(5);
    ATM_PICK(6);
#undef ATM_PICK
    const double dh = h - hb;
    const double tstd = tb + lapse * dh;
    t[i] = tstd + d0 + bad;
    p[i] = pb * pow(tstd * inv_tb + x_iso, expo + iso_k * dh) + bad;
  }
  size_t bad = 0;
  for (size_t i = 0; i < n; ++i) bad += isnan(p[i]) ? 1u : 0u;
  return bad;
}

/* The derived quantities of a block; NaN temperature propagates. */
ACP_DISPATCH
static void atm_outputs(size_t n, const double *t, const double *p, double *density,
                        double *sound_speed, double *mu, double *nu) {
  if (density) {
#pragma omp simd
    for (size_t i = 0; i < n; ++i) density[i] = p[i] / (ACP_R_AIR * t[i]);
  }
  if (sound_speed) {
#pragma omp simd
    for (size_t i = 0; i < n; ++i) sound_speed[i] = sqrt(ACP_GAMMA * ACP_R_AIR * t[i]);
  }
  if (mu || nu) {
#pragma omp simd
    for (size_t i = 0; i < n; ++i) {
      const double m = ACP_SUTHERLAND_BETA * t[i] * sqrt(t[i]) / (t[i] + ACP_SUTHERLAND_S);
      if (mu) mu[i] = m;
      if (nu) nu[i] = m * ACP_R_AIR * t[i] / p[i];
    }
  }
}

size_t acp_isa_n(size_t n, const double *hp, const double *dtemp, double *temperature,
                 double *pressure, double *density, double *sound_speed,
                 double *dynamic_viscosity, double *kinematic_viscosity) {
  if (!hp) {
    double *const outs[] = {temperature,       pressure,           density, sound_speed,
                            dynamic_viscosity, kinematic_viscosity};
    return acp_all_invalid(n, outs, 6);
  }
  double t[ACP_BLOCK], p[ACP_BLOCK];
  size_t bad = 0;
  /* a block's inputs are read (into t and p) before any of its outputs is
     written: an output may be hp or dtemp itself */
  for (size_t i = 0; i < n; i += ACP_BLOCK) {
    const size_t m = block_length(n, i);
    bad += atm_block(m, hp + i, dtemp ? dtemp + i : NULL, t, p);
    if (temperature) memcpy(temperature + i, t, m * sizeof t[0]);
    if (pressure) memcpy(pressure + i, p, m * sizeof p[0]);
    atm_outputs(m, t, p, density ? density + i : NULL, sound_speed ? sound_speed + i : NULL,
                dynamic_viscosity ? dynamic_viscosity + i : NULL,
                kinematic_viscosity ? kinematic_viscosity + i : NULL);
  }
  return bad;
}

double acp_isa_temperature(double hp, double dtemp) {
  acp_atmos a;
  return acp_isa(hp, dtemp, &a) == ACP_OK ? a.temperature : ACP_NAN;
}

double acp_isa_pressure(double hp) {
  acp_atmos a;
  return acp_isa(hp, 0.0, &a) == ACP_OK ? a.pressure : ACP_NAN;
}

double acp_isa_density(double hp, double dtemp) {
  acp_atmos a;
  return acp_isa(hp, dtemp, &a) == ACP_OK ? a.density : ACP_NAN;
}

double acp_isa_sound_speed(double hp, double dtemp) {
  acp_atmos a;
  return acp_isa(hp, dtemp, &a) == ACP_OK ? a.sound_speed : ACP_NAN;
}

/* A result within a micrometre of the model's edge is round-off, not out of range. */
static int altitude_result(double h, double *out) {
  const double tol = 1e-6;
  if (!(h >= ACP_ISA_HP_MIN - tol && h <= ACP_ISA_HP_MAX + tol)) {
    *out = ACP_NAN;
    return ACP_ERR_RANGE;
  }
  *out = h;
  return ACP_OK;
}

int acp_isa_pressure_altitude(double pressure, double *hp) {
  if (!hp) return ACP_ERR_INVALID;
  *hp = ACP_NAN;
  if (!isfinite(pressure) || pressure <= 0.0) return ACP_ERR_INVALID;
  int i = ATM_NLAYERS - 1;
  while (i > 0 && pressure > ATM_LAYERS[i].p) --i;
  const atm_layer *l = &ATM_LAYERS[i];
  const double ratio = pressure / l->p;
  const double h = l->lapse == 0.0
                       ? l->h - ACP_R_AIR * l->t / ACP_G0 * log(ratio)
                       : l->h + l->t / l->lapse * (pow(ratio, 1.0 / l->exponent) - 1.0);
  return altitude_result(h, hp);
}

size_t acp_isa_pressure_altitude_n(size_t n, const double *pressure, double *hp) {
  if (!pressure) return acp_all_invalid(n, &hp, 1);
  size_t bad = 0;
  for (size_t i = 0; i < n; ++i) {
    double h = ACP_NAN;
    if (acp_isa_pressure_altitude(pressure[i], &h) != ACP_OK) ++bad;
    acp_put(hp ? &hp[i] : NULL, h);
  }
  return bad;
}

#define GEOMETRIC_MIN (-10000.0)
#define GEOMETRIC_MAX 1.0e6

double acp_geopotential_altitude(double geometric) {
  if (!acp_in_range(geometric, GEOMETRIC_MIN, GEOMETRIC_MAX)) return ACP_NAN;
  return ACP_EARTH_RADIUS * geometric / (ACP_EARTH_RADIUS + geometric);
}

double acp_geometric_altitude(double geopotential) {
  const double lo = acp_geopotential_altitude(GEOMETRIC_MIN);
  const double hi = acp_geopotential_altitude(GEOMETRIC_MAX);
  if (!acp_in_range(geopotential, lo, hi)) return ACP_NAN;
  return ACP_EARTH_RADIUS * geopotential / (ACP_EARTH_RADIUS - geopotential);
}

size_t acp_geopotential_altitude_n(size_t n, const double *geometric, double *geopotential) {
  if (!geometric) return acp_all_invalid(n, &geopotential, 1);
  size_t bad = 0;
  for (size_t i = 0; i < n; ++i) {
    const double h = acp_geopotential_altitude(geometric[i]);
    bad += isnan(h) ? 1u : 0u;
    acp_put(geopotential ? &geopotential[i] : NULL, h);
  }
  return bad;
}

size_t acp_geometric_altitude_n(size_t n, const double *geopotential, double *geometric) {
  if (!geopotential) return acp_all_invalid(n, &geometric, 1);
  size_t bad = 0;
  for (size_t i = 0; i < n; ++i) {
    const double z = acp_geometric_altitude(geopotential[i]);
    bad += isnan(z) ? 1u : 0u;
    acp_put(geometric ? &geometric[i] : NULL, z);
  }
  return bad;
}

int acp_isa_density_altitude(double density, double *h) {
  if (!h) return ACP_ERR_INVALID;
  *h = ACP_NAN;
  if (!isfinite(density) || density <= 0.0) return ACP_ERR_INVALID;
  int i = ATM_NLAYERS - 1;
  while (i > 0 && density > ATM_LAYERS[i].p / (ACP_R_AIR * ATM_LAYERS[i].t)) --i;
  const atm_layer *l = &ATM_LAYERS[i];
  const double ratio = density / (l->p / (ACP_R_AIR * l->t));
  /* rho/rho_b = (T/Tb)^(exponent - 1) in a gradient layer; exp(-g0 dh/(R Tb)) if isothermal. */
  const double alt = l->lapse == 0.0
                         ? l->h - ACP_R_AIR * l->t / ACP_G0 * log(ratio)
                         : l->h + l->t / l->lapse * (pow(ratio, 1.0 / (l->exponent - 1.0)) - 1.0);
  return altitude_result(alt, h);
}

double acp_density_altitude(double hp, double dtemp) {
  double h;
  return acp_isa_density_altitude(acp_isa_density(hp, dtemp), &h) == ACP_OK ? h : ACP_NAN;
}

double acp_isa_deviation(double oat, double hp) {
  if (!isfinite(oat) || oat <= 0.0) return ACP_NAN;
  const double dtemp = oat - acp_isa_temperature(hp, 0.0);
  return acp_in_range(dtemp, ACP_ISA_DTEMP_MIN, ACP_ISA_DTEMP_MAX) ? dtemp : ACP_NAN;
}

double acp_outside_air_temperature(double dtemp, double hp) {
  return acp_isa_temperature(hp, dtemp);
}

static int total_temperature_args(double temp, double mach, double recovery) {
  return isfinite(temp) && temp > 0.0 && acp_in_range(mach, 0.0, 5.0) &&
         acp_in_range(recovery, 0.0, 1.0);
}

/* A temperature result must be a positive finite double: huge inputs overflow,
   denormal ones underflow to 0 K. */
static double temperature_result(double t) { return isfinite(t) && t > 0.0 ? t : ACP_NAN; }

double acp_total_temperature(double sat, double mach, double recovery) {
  if (!total_temperature_args(sat, mach, recovery)) return ACP_NAN;
  return temperature_result(sat * (1.0 + recovery * 0.5 * (ACP_GAMMA - 1.0) * mach * mach));
}

double acp_static_temperature(double tat, double mach, double recovery) {
  if (!total_temperature_args(tat, mach, recovery)) return ACP_NAN;
  return temperature_result(tat / (1.0 + recovery * 0.5 * (ACP_GAMMA - 1.0) * mach * mach));
}

#define QNH_MIN 80000.0
#define QNH_MAX 110000.0

/* Pressure altitude of the altimeter setting, the shift the subscale applies. */
static int setting_shift(double qnh, double *shift) {
  *shift = ACP_NAN;
  if (!isfinite(qnh)) return ACP_ERR_INVALID;
  if (!acp_in_range(qnh, QNH_MIN, QNH_MAX)) return ACP_ERR_RANGE;
  return acp_isa_pressure_altitude(qnh, shift);
}

int acp_pressure_altitude_from_qnh(double indicated, double qnh, double *hp) {
  if (!hp) return ACP_ERR_INVALID;
  *hp = ACP_NAN;
  if (!isfinite(indicated)) return ACP_ERR_INVALID;
  double shift;
  int st = setting_shift(qnh, &shift);
  if (st != ACP_OK) return st;
  return altitude_result(indicated + shift, hp);
}

int acp_indicated_altitude_from_qnh(double hp, double qnh, double *indicated) {
  if (!indicated) return ACP_ERR_INVALID;
  *indicated = ACP_NAN;
  int st = atm_check(hp, 0.0);
  if (st != ACP_OK) return st;
  double shift;
  st = setting_shift(qnh, &shift);
  if (st != ACP_OK) return st;
  *indicated = hp - shift;
  return ACP_OK;
}

int acp_cold_temperature_correction(double height, double elevation, double temperature,
                                    double *correction) {
  if (!correction) return ACP_ERR_INVALID;
  *correction = ACP_NAN;
  if (!isfinite(height) || !isfinite(elevation) || !isfinite(temperature) || height < 0.0 ||
      temperature <= 0.0)
    return ACP_ERR_INVALID;
  const double tropopause = ATM_LAYERS[1].h;
  if (!acp_in_range(elevation, ACP_ISA_HP_MIN, tropopause) || elevation + height > tropopause)
    return ACP_ERR_RANGE;
  const double l0 = ATM_LAYERS[0].lapse;
  const double dtemp = temperature - (ACP_T0 + l0 * elevation);
  if (!acp_in_range(dtemp, ACP_ISA_DTEMP_MIN, ACP_ISA_DTEMP_MAX)) return ACP_ERR_RANGE;
  *correction = -dtemp / l0 * log1p(l0 * height / (ACP_T0 + l0 * elevation));
  return ACP_OK;
}
