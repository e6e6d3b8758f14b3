/* The aircraft model: keys, ranges, defaults, set/get, completeness check.
   The text parser is in aircraft_parse.c. */
#include "acperf/aircraft.h"

#include <stdarg.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "acperf/polar.h"
#include "acperf/status.h"
#include "aircraft_internal.h"
#include "friction_internal.h"
#include "internal.h"

#define PI 3.14159265358979323846
#define DEG (PI / 180.0)

/* Type masks of the component keys. */
#define T_S (1u << ACP_COMPONENT_SURFACE)
#define T_B (1u << ACP_COMPONENT_BODY)
#define T_N (1u << ACP_COMPONENT_NACELLE)
#define T_O (1u << ACP_COMPONENT_OTHER)

/* Aircraft keys: name, unit, valid range, default (NaN: none), flags.
   The same table is documented in docs/aircraft-format.md. */
const ac_keydef AC_KEYS[AK_COUNT] = {
    [AK_WING_AREA] = {"wing_area", "m2", 0.1, 5000.0, ACP_NAN, KF_REQUIRED},
    [AK_SPAN] = {"span", "m", 0.3, 150.0, ACP_NAN, KF_REQUIRED},
    [AK_CD0] = {"cd0", "", 0.001, 0.5, ACP_NAN, 0},
    [AK_OSWALD] = {"oswald", "", 0.3, 1.0, ACP_NAN, 0},
    [AK_CL_MAX] = {"cl_max", "", 0.3, 5.0, ACP_NAN, 0},
    [AK_CL_MIN_DRAG] = {"cl_min_drag", "", -0.5, 1.5, 0.0, 0},
    [AK_SWEEP_LE] = {"sweep_leading_edge", "rad", 0.0, 70.0 * DEG, 0.0, 0},
    [AK_WINGLET_HEIGHT] = {"winglet_height", "m", 0.0, 20.0, 0.0, 0},
    [AK_KORN_KAPPA] = {"korn_kappa", "", 0.7, 1.0, ACP_NAN, 0},
    [AK_THICKNESS_RATIO] = {"wing_thickness_ratio", "", 0.02, 0.25, ACP_NAN, 0},
    [AK_SWEEP_QC] = {"sweep_quarter_chord", "rad", 0.0, 60.0 * DEG, 0.0, 0},
    [AK_CD_MISC] = {"cd_misc", "", 0.0, 0.1, 0.0, 0},
    [AK_LEAKAGE] = {"leakage_fraction", "", 0.0, 0.5, 0.0, 0},
    [AK_ENGINE_TYPE] = {"engine_type", "", 1.0, 3.0, ACP_NAN, KF_INTEGER},
    [AK_ENGINE_COUNT] = {"engine_count", "", 1.0, 8.0, ACP_NAN, KF_INTEGER},
    [AK_ENGINE_THRUST] = {"engine_thrust", "N", 100.0, 1.0e6, ACP_NAN, 0},
    [AK_THROTTLE_RATIO] = {"throttle_ratio", "", 0.9, 1.3, 1.0, 0},
    [AK_TSFC_C0] = {"tsfc_c0", "kg/(N s)", 1.0e-6, 1.0e-3, ACP_NAN, 0},
    [AK_TSFC_C1] = {"tsfc_c1", "kg/(N s)", 0.0, 1.0e-3, 0.0, 0},
    [AK_ENGINE_POWER] = {"engine_power", "W", 1.0e3, 2.0e7, ACP_NAN, 0},
    [AK_POWER_LAPSE_EXPONENT] = {"power_lapse_exponent", "", 0.3, 1.5, ACP_NAN, 0},
    [AK_PROPELLER_EFFICIENCY] = {"propeller_efficiency", "", 0.3, 0.95, ACP_NAN, 0},
    [AK_PSFC] = {"psfc", "kg/(W s)", 1.0e-8, 1.0e-6, ACP_NAN, 0},
    [AK_CLIMB_RATING] = {"climb_rating", "", 0.3, 1.0, ACP_NAN, 0},
    [AK_CRUISE_RATING] = {"cruise_rating", "", 0.3, 1.0, ACP_NAN, 0},
    [AK_IDLE_THRUST_FRACTION] = {"idle_thrust_fraction", "", 0.0, 0.3, ACP_NAN, 0},
    [AK_IDLE_FUEL_FLOW] = {"idle_fuel_flow", "kg/s", 0.0, 5.0, ACP_NAN, 0},
    [AK_VMO] = {"vmo", "m/s", 20.0, 400.0, ACP_NAN, 0},
    [AK_MMO] = {"mmo", "", 0.1, 0.95, ACP_NAN, 0},
    [AK_MAX_ALTITUDE] = {"max_altitude", "m", 0.0, 25000.0, ACP_NAN, 0},
    [AK_CL_BUFFET] = {"cl_buffet", "", 0.2, 2.0, ACP_NAN, 0},
    [AK_MASS_MAX_TAKEOFF] = {"mass_max_takeoff", "kg", 1.0, 1.0e6, ACP_NAN, 0},
    [AK_MASS_MAX_LANDING] = {"mass_max_landing", "kg", 1.0, 1.0e6, ACP_NAN, 0},
    [AK_MASS_MAX_ZERO_FUEL] = {"mass_max_zero_fuel", "kg", 1.0, 1.0e6, ACP_NAN, 0},
    [AK_MASS_OPERATING_EMPTY] = {"mass_operating_empty", "kg", 1.0, 1.0e6, ACP_NAN, 0},
    [AK_FUEL_CAPACITY] = {"fuel_capacity", "kg", 0.0, 5.0e5, ACP_NAN, 0},
    /* 250 kt below 10,000 ft: the speed limit of many air-traffic rules (common practice) */
    [AK_SPEED_LIMIT_CAS] = {"speed_limit_cas", "m/s", 20.0, 300.0, 250.0 * 1852.0 / 3600.0, 0},
    [AK_SPEED_LIMIT_ALTITUDE] = {"speed_limit_altitude", "m", -5000.0, 25000.0, 3048.0, 0},
    [AK_CLIMB_CAS] = {"climb_cas", "m/s", 20.0, 300.0, ACP_NAN, 0},
    [AK_CLIMB_MACH] = {"climb_mach", "", 0.05, 0.95, ACP_NAN, 0},
    [AK_DESCENT_CAS] = {"descent_cas", "m/s", 20.0, 300.0, ACP_NAN, 0},
    [AK_DESCENT_MACH] = {"descent_mach", "", 0.05, 0.95, ACP_NAN, 0},
    [AK_CRUISE_MACH] = {"cruise_mach", "", 0.05, 0.95, ACP_NAN, 0},
    [AK_APPROACH_CAS] = {"approach_cas", "m/s", 20.0, 150.0, ACP_NAN, 0},
};

/* Component fields; flags: the types that use the field | KF_*. */
const ac_keydef COMP_KEYS[CK_COUNT] = {
    [CK_TYPE] = {"type", "", 1.0, 4.0, ACP_NAN, KF_TYPES_ALL | KF_REQUIRED | KF_INTEGER},
    [CK_WETTED_AREA] = {"wetted_area", "m2", 1e-4, 10000.0, ACP_NAN, KF_TYPES_ALL | KF_REQUIRED},
    [CK_LENGTH] = {"length", "m", 0.01, 300.0, ACP_NAN, KF_TYPES_ALL | KF_REQUIRED},
    [CK_THICKNESS_RATIO] = {"thickness_ratio", "", 0.01, 0.4, ACP_NAN, T_S | KF_REQUIRED},
    [CK_MAX_THICKNESS_POSITION] = {"max_thickness_position", "", 0.1, 0.7, 0.3, T_S},
    [CK_SWEEP_MAX_THICKNESS] = {"sweep_max_thickness", "rad", 0.0, 70.0 * DEG, 0.0, T_S},
    [CK_FINENESS_RATIO] = {"fineness_ratio", "", 1.0, 50.0, ACP_NAN, T_B | T_N | KF_REQUIRED},
    [CK_INTERFERENCE] = {"interference", "", 1.0, 3.0, 1.0, KF_TYPES_ALL},
    [CK_LAMINAR_FRACTION] = {"laminar_fraction", "", 0.0, 1.0, 0.0, KF_TYPES_ALL},
    [CK_ROUGHNESS] = {"roughness", "m", 0.0, 1e-3, 0.0, KF_TYPES_ALL},
    [CK_FORM_FACTOR] = {"form_factor", "", 1.0, 5.0, ACP_NAN, KF_TYPES_ALL},
    [CK_COUNT_OF] = {"count", "", 1.0, 16.0, 1.0, KF_TYPES_ALL | KF_INTEGER},
};

static const char *const TYPE_NAMES[] = {"", "surface", "body", "nacelle", "other"};

/* ---- small helpers ------------------------------------------------------ */

static void msg(char *err, size_t errlen, const char *fmt, ...) {
  if (!err || errlen == 0) return;
  va_list ap;
  va_start(ap, fmt);
  vsnprintf(err, errlen, fmt, ap);
  va_end(ap);
}

/* A number for a message with `digits` significant digits and '.' as the
   decimal point whatever the locale: printf's %g writes the locale's decimal
   point (a ',' under de_DE; in some locales more than one byte), which is
   the one run of bytes that are not ASCII letters, digits or a sign. */
typedef struct {
  char s[40];
} number_text;

static number_text number(double v, int digits) {
  char raw[sizeof(number_text)];
  number_text t;
  snprintf(raw, sizeof raw, "%.*g", digits, v);
  size_t j = 0;
  for (size_t i = 0; raw[i] && j + 1 < sizeof t.s; ++i) {
    const char c = raw[i];
    if ((c >= '0' && c <= '9') || (c >= 'a' && c <= 'z') || c == '-' || c == '+')
      t.s[j++] = c;
    else if (j == 0 || t.s[j - 1] != '.')
      t.s[j++] = '.';
  }
  t.s[j] = '\0';
  return t;
}

static void copy_text(char *dst, size_t len, const char *src) {
  if (!dst || len == 0) return;
  size_t n = strlen(src);
  if (n >= len) n = len - 1;
  memcpy(dst, src, n);
  dst[n] = '\0';
}

int ac_valid_name(const char *name, size_t n) {
  if (n == 0 || n >= ACP_COMPONENT_NAME_MAX) return 0;
  for (size_t i = 0; i < n; ++i) {
    const char ch = name[i];
    if (!((ch >= 'a' && ch <= 'z') || (ch >= 'A' && ch <= 'Z') || (ch >= '0' && ch <= '9') ||
          ch == '_' || ch == '-'))
      return 0;
  }
  return 1;
}

static int find_key(const ac_keydef *table, int count, const char *name) {
  for (int i = 0; i < count; ++i)
    if (strcmp(table[i].name, name) == 0) return i;
  return -1;
}

void ac_clear(acp_aircraft *ac) {
  memset(ac, 0, sizeof *ac);
  for (int i = 0; i < AK_COUNT; ++i) ac->v[i] = ACP_NAN;
  ac_derive(ac);
}

void ac_derive(acp_aircraft *ac) {
  for (size_t i = 0; i < ac->ncomp; ++i) {
    ac_component *c = &ac->comp[i];
    c->cutoff_base = friction_cutoff_base(comp_value(c, CK_LENGTH), comp_value(c, CK_ROUGHNESS));
    c->sweep_factor = friction_sweep_factor(comp_value(c, CK_SWEEP_MAX_THICKNESS));
  }
  ac->induced_factor = polar_induced_factor(ac);
  ac->check_status = ac_check(ac, NULL, 0);
}

static void comp_clear(ac_component *c) {
  memset(c, 0, sizeof *c);
  for (int i = 0; i < CK_COUNT; ++i) c->v[i] = ACP_NAN;
}

double ac_value(const acp_aircraft *ac, enum ac_key k) {
  return isnan(ac->v[k]) ? AC_KEYS[k].def : ac->v[k];
}

double comp_value(const ac_component *c, enum comp_key k) {
  if (!isnan(c->v[k])) return c->v[k];
  if (k == CK_FORM_FACTOR && c->v[CK_TYPE] == ACP_COMPONENT_OTHER) return 1.0;
  return COMP_KEYS[k].def;
}

ac_component *ac_find_component(acp_aircraft *ac, const char *name, size_t n) {
  for (size_t i = 0; i < ac->ncomp; ++i)
    if (strlen(ac->comp[i].name) == n && memcmp(ac->comp[i].name, name, n) == 0)
      return &ac->comp[i];
  return NULL;
}

ac_component *ac_add_component(acp_aircraft *ac, const char *name, size_t n) {
  if (!ac_valid_name(name, n) || ac->ncomp >= ACP_AIRCRAFT_MAX_COMPONENTS) return NULL;
  ac_component *c = &ac->comp[ac->ncomp++];
  comp_clear(c);
  memcpy(c->name, name, n);
  c->name[n] = '\0';
  return c;
}

/* Split "component.NAME.FIELD": name and field pointers; 0 when not that form.
   With field_optional, "component.NAME" is accepted too (field = NULL). */
static int split_component_key(const char *key, const char **name, size_t *nlen,
                               const char **field, int field_optional) {
  static const char prefix[] = "component.";
  if (strncmp(key, prefix, sizeof prefix - 1) != 0) return 0;
  const char *p = key + sizeof prefix - 1;
  const char *dot = strchr(p, '.');
  *name = p;
  if (!dot) {
    if (!field_optional) return 0;
    *nlen = strlen(p);
    *field = NULL;
    return 1;
  }
  *nlen = (size_t)(dot - p);
  *field = dot + 1;
  return 1;
}

/* Range and integer check of a value against a key definition. */
static int check_value(const ac_keydef *d, const char *key, double value, char *err,
                       size_t errlen) {
  if (!isfinite(value)) {
    msg(err, errlen, "key '%s': value is not a finite number", key);
    return ACP_ERR_INVALID;
  }
  if ((d->flags & KF_INTEGER) && value != floor(value)) {
    msg(err, errlen, "key '%s': %s is not a whole number", key, number(value, 15).s);
    return ACP_ERR_INVALID;
  }
  if (!acp_in_range(value, d->lo, d->hi)) {
    msg(err, errlen, "key '%s': %s%s%s is outside the valid range %s to %s%s%s", key,
        number(value, 15).s, *d->unit ? " " : "", d->unit, number(d->lo, 15).s,
        number(d->hi, 15).s, *d->unit ? " " : "", d->unit);
    return ACP_ERR_RANGE;
  }
  return ACP_OK;
}

/* ---- set / get ---------------------------------------------------------- */

int ac_set(acp_aircraft *ac, const char *key, double value, char *err, size_t errlen) {
  const int k = find_key(AC_KEYS, AK_COUNT, key);
  if (k >= 0) {
    const int st = check_value(&AC_KEYS[k], key, value, err, errlen);
    if (st == ACP_OK) ac->v[k] = value;
    return st;
  }
  const char *name, *field;
  size_t nlen;
  if (!split_component_key(key, &name, &nlen, &field, 0)) {
    msg(err, errlen, "unknown key '%s'", key);
    return ACP_ERR_UNKNOWN_KEY;
  }
  const int f = find_key(COMP_KEYS, CK_COUNT, field);
  if (f < 0) {
    msg(err, errlen, "unknown component key '%s'", field);
    return ACP_ERR_UNKNOWN_KEY;
  }
  if (!ac_valid_name(name, nlen)) {
    msg(err, errlen, "invalid component name in '%s' (letters, digits, '_' and '-', 1 to %d)",
        key, ACP_COMPONENT_NAME_MAX - 1);
    return ACP_ERR_INVALID;
  }
  const int st = check_value(&COMP_KEYS[f], key, value, err, errlen);
  if (st != ACP_OK) return st;
  ac_component *c = ac_find_component(ac, name, nlen);
  if (!c) c = ac_add_component(ac, name, nlen);
  if (!c) {
    msg(err, errlen, "too many components (at most %d)", ACP_AIRCRAFT_MAX_COMPONENTS);
    return ACP_ERR_RANGE;
  }
  c->v[f] = value;
  return ACP_OK;
}

static const char *const ENGINE_NAMES[] = {"", "turbofan", "turboprop", "piston"};

static int type_code(const char *text) {
  for (int t = ACP_COMPONENT_SURFACE; t <= ACP_COMPONENT_OTHER; ++t)
    if (strcmp(text, TYPE_NAMES[t]) == 0) return t;
  return 0;
}

int ac_set_text(acp_aircraft *ac, const char *key, const char *value, char *err, size_t errlen) {
  if (strcmp(key, "name") == 0) {
    const size_t n = strlen(value);
    if (n >= ACP_AIRCRAFT_NAME_MAX) {
      msg(err, errlen, "key 'name': longer than %d bytes", ACP_AIRCRAFT_NAME_MAX - 1);
      return ACP_ERR_INVALID;
    }
    for (size_t i = 0; i < n; ++i) {
      const unsigned char ch = (unsigned char)value[i];
      if (ch < 0x20 || ch == 0x7f) {
        msg(err, errlen, "key 'name': control character in the text");
        return ACP_ERR_INVALID;
      }
    }
    memcpy(ac->name, value, n + 1);
    return ACP_OK;
  }
  if (strcmp(key, "engine_type") == 0) {
    for (int t = ENGINE_TURBOFAN; t <= ENGINE_PISTON; ++t)
      if (strcmp(value, ENGINE_NAMES[t]) == 0) return ac_set(ac, key, (double)t, err, errlen);
    msg(err, errlen, "key 'engine_type': '%s' is not one of turbofan, turboprop, piston", value);
    return ACP_ERR_INVALID;
  }
  const char *name, *field;
  size_t nlen;
  if (split_component_key(key, &name, &nlen, &field, 0) && strcmp(field, "type") == 0) {
    const int t = type_code(value);
    if (!t) {
      msg(err, errlen, "key '%s': type '%s' is not one of surface, body, nacelle, other", key,
          value);
      return ACP_ERR_INVALID;
    }
    return ac_set(ac, key, (double)t, err, errlen);
  }
  if (find_key(AC_KEYS, AK_COUNT, key) >= 0 ||
      (split_component_key(key, &name, &nlen, &field, 0) &&
       find_key(COMP_KEYS, CK_COUNT, field) >= 0)) {
    msg(err, errlen, "key '%s' takes a number, not text", key);
    return ACP_ERR_INVALID;
  }
  msg(err, errlen, "unknown key '%s'", key);
  return ACP_ERR_UNKNOWN_KEY;
}

acp_aircraft *acp_aircraft_new(void) {
  acp_aircraft *ac = malloc(sizeof *ac);
  if (ac) ac_clear(ac);
  return ac;
}

void acp_aircraft_free(acp_aircraft *ac) { free(ac); }

int acp_aircraft_copy(acp_aircraft *dst, const acp_aircraft *src) {
  if (!dst || !src) return ACP_ERR_INVALID;
  if (dst != src) memcpy(dst, src, sizeof *dst);
  return ACP_OK;
}

int acp_aircraft_set(acp_aircraft *ac, const char *key, double value) {
  if (!ac || !key) return ACP_ERR_INVALID;
  if (polar_derived_key(key)) return ACP_ERR_INVALID;
  const int st = ac_set(ac, key, value, NULL, 0);
  ac_derive(ac);
  return st;
}

int acp_aircraft_set_text(acp_aircraft *ac, const char *key, const char *value) {
  if (!ac || !key || !value) return ACP_ERR_INVALID;
  const int st = ac_set_text(ac, key, value, NULL, 0);
  ac_derive(ac);
  return st;
}

int acp_aircraft_get(const acp_aircraft *ac, const char *key, double *value) {
  if (!value) return ACP_ERR_INVALID;
  *value = ACP_NAN;
  if (!ac || !key) return ACP_ERR_INVALID;
  const int k = find_key(AC_KEYS, AK_COUNT, key);
  if (k >= 0) {
    *value = ac_value(ac, (enum ac_key)k);
    return ACP_OK;
  }
  if (polar_derived_key(key)) return polar_derived_value(ac, key, value);
  const char *name, *field;
  size_t nlen;
  if (!split_component_key(key, &name, &nlen, &field, 0)) return ACP_ERR_UNKNOWN_KEY;
  const int f = find_key(COMP_KEYS, CK_COUNT, field);
  const ac_component *c = ac_find_component((acp_aircraft *)ac, name, nlen);
  if (f < 0 || !c) return ACP_ERR_UNKNOWN_KEY;
  *value = comp_value(c, (enum comp_key)f);
  return ACP_OK;
}

int acp_aircraft_get_text(const acp_aircraft *ac, const char *key, char *buf, size_t len) {
  if (!buf || len == 0) return ACP_ERR_INVALID;
  buf[0] = '\0';
  if (!ac || !key) return ACP_ERR_INVALID;
  if (strcmp(key, "name") == 0) {
    copy_text(buf, len, ac->name);
    return ACP_OK;
  }
  if (strcmp(key, "engine_type") == 0) {
    const double t = ac->v[AK_ENGINE_TYPE];
    copy_text(buf, len, isnan(t) ? "" : ENGINE_NAMES[(int)t]);
    return ACP_OK;
  }
  const char *name, *field;
  size_t nlen;
  if (split_component_key(key, &name, &nlen, &field, 0) && strcmp(field, "type") == 0) {
    const ac_component *c = ac_find_component((acp_aircraft *)ac, name, nlen);
    if (!c) return ACP_ERR_UNKNOWN_KEY;
    const double t = c->v[CK_TYPE];
    copy_text(buf, len, isnan(t) ? "" : TYPE_NAMES[(int)t]);
    return ACP_OK;
  }
  return ACP_ERR_UNKNOWN_KEY;
}

static int unset(acp_aircraft *ac, const char *key);

int acp_aircraft_unset(acp_aircraft *ac, const char *key) {
  if (!ac || !key) return ACP_ERR_INVALID;
  const int st = unset(ac, key);
  ac_derive(ac);
  return st;
}

static int unset(acp_aircraft *ac, const char *key) {
  if (strcmp(key, "name") == 0) {
    ac->name[0] = '\0';
    return ACP_OK;
  }
  const int k = find_key(AC_KEYS, AK_COUNT, key);
  if (k >= 0) {
    ac->v[k] = ACP_NAN;
    return ACP_OK;
  }
  if (polar_derived_key(key)) return ACP_ERR_INVALID;
  const char *name, *field;
  size_t nlen;
  if (!split_component_key(key, &name, &nlen, &field, 1)) return ACP_ERR_UNKNOWN_KEY;
  ac_component *c = ac_find_component(ac, name, nlen);
  if (!c) return ACP_ERR_UNKNOWN_KEY;
  if (!field) { /* remove the component, keeping the order of the others */
    const size_t i = (size_t)(c - ac->comp);
    memmove(&ac->comp[i], &ac->comp[i + 1], (ac->ncomp - i - 1) * sizeof ac->comp[0]);
    --ac->ncomp;
    return ACP_OK;
  }
  const int f = find_key(COMP_KEYS, CK_COUNT, field);
  if (f < 0) return ACP_ERR_UNKNOWN_KEY;
  c->v[f] = ACP_NAN;
  return ACP_OK;
}

int acp_aircraft_key_at(const acp_aircraft *ac, size_t index, char *key, size_t len) {
  if (!key || len == 0) return ACP_ERR_INVALID;
  key[0] = '\0';
  if (!ac) return ACP_ERR_INVALID;
  size_t i = 0;
  if (ac->name[0] != '\0' && i++ == index) {
    copy_text(key, len, "name");
    return ACP_OK;
  }
  for (int k = 0; k < AK_COUNT; ++k)
    if (!isnan(ac->v[k]) && i++ == index) {
      copy_text(key, len, AC_KEYS[k].name);
      return ACP_OK;
    }
  for (size_t c = 0; c < ac->ncomp; ++c)
    for (int f = 0; f < CK_COUNT; ++f)
      if (!isnan(ac->comp[c].v[f]) && i++ == index) {
        snprintf(key, len, "component.%s.%s", ac->comp[c].name, COMP_KEYS[f].name);
        return ACP_OK;
      }
  return ACP_ERR_RANGE;
}

int acp_aircraft_component(const acp_aircraft *ac, size_t index, char *name, size_t len) {
  if (!name || len == 0) return ACP_ERR_INVALID;
  name[0] = '\0';
  if (!ac) return ACP_ERR_INVALID;
  if (index >= ac->ncomp) return ACP_ERR_RANGE;
  copy_text(name, len, ac->comp[index].name);
  return ACP_OK;
}

/* ---- completeness -------------------------------------------------------- */

static int check_component(const ac_component *c, char *err, size_t errlen) {
  char where[64] = "";
  if (err && errlen) { /* only for a message: formatting costs more than the checks */
    if (c->line)
      snprintf(where, sizeof where, "component '%s' (line %u)", c->name, c->line);
    else
      snprintf(where, sizeof where, "component '%s'", c->name);
  }
  if (isnan(c->v[CK_TYPE])) {
    msg(err, errlen, "%s: missing key 'type'", where);
    return ACP_ERR_INVALID;
  }
  const int t = (int)c->v[CK_TYPE];
  for (int f = 0; f < CK_COUNT; ++f) {
    const unsigned uses = COMP_KEYS[f].flags & (1u << t);
    if (!uses && !isnan(c->v[f])) {
      msg(err, errlen, "%s: key '%s' does not apply to a component of type '%s'", where,
          COMP_KEYS[f].name, TYPE_NAMES[t]);
      return ACP_ERR_INVALID;
    }
    if (uses && (COMP_KEYS[f].flags & KF_REQUIRED) && isnan(c->v[f])) {
      msg(err, errlen, "%s: missing key '%s' (needed by type '%s')", where, COMP_KEYS[f].name,
          TYPE_NAMES[t]);
      return ACP_ERR_INVALID;
    }
  }
  return ACP_OK;
}

/* The mass limits that are given rise: operating empty <= maximum zero-fuel
   <= maximum landing <= maximum take-off (what each means makes it so). */
static int check_mass_order(const acp_aircraft *ac, char *err, size_t errlen) {
  static const enum ac_key chain[] = {AK_MASS_OPERATING_EMPTY, AK_MASS_MAX_ZERO_FUEL,
                                      AK_MASS_MAX_LANDING, AK_MASS_MAX_TAKEOFF};
  const size_t n = sizeof chain / sizeof chain[0];
  for (size_t i = 0; i < n; ++i)
    for (size_t j = i + 1; j < n; ++j)
      if (ac->v[chain[i]] > ac->v[chain[j]]) { /* NaN (not given) compares false */
        msg(err, errlen,
            "'%s' (%.0f kg) is above '%s' (%.0f kg): the mass limits must rise, operating "
            "empty <= maximum zero-fuel <= maximum landing <= maximum take-off",
            AC_KEYS[chain[i]].name, ac->v[chain[i]], AC_KEYS[chain[j]].name, ac->v[chain[j]]);
        return ACP_ERR_INVALID;
      }
  return ACP_OK;
}

int ac_check(const acp_aircraft *ac, char *err, size_t errlen) {
  msg(err, errlen, "%s", "");
  for (int k = 0; k < AK_COUNT; ++k)
    if ((AC_KEYS[k].flags & KF_REQUIRED) && isnan(ac->v[k])) {
      msg(err, errlen, "missing key '%s'", AC_KEYS[k].name);
      return ACP_ERR_INVALID;
    }
  const int has_cd0 = !isnan(ac->v[AK_CD0]);
  if (has_cd0 && ac->ncomp > 0) {
    msg(err, errlen, "'cd0' and [component.*] tables are alternatives: give one, not both");
    return ACP_ERR_INVALID;
  }
  if (!has_cd0 && ac->ncomp == 0) {
    msg(err, errlen, "no zero-lift drag: give 'cd0' or at least one [component.NAME] table");
    return ACP_ERR_INVALID;
  }
  if (has_cd0 && (!isnan(ac->v[AK_CD_MISC]) || !isnan(ac->v[AK_LEAKAGE]))) {
    msg(err, errlen, "'cd_misc' and 'leakage_fraction' belong to a component build-up, not to "
                     "a single 'cd0'");
    return ACP_ERR_INVALID;
  }
  if (!isnan(ac->v[AK_KORN_KAPPA]) && isnan(ac->v[AK_THICKNESS_RATIO])) {
    msg(err, errlen, "'korn_kappa' needs 'wing_thickness_ratio'");
    return ACP_ERR_INVALID;
  }
  const double ar = ac->v[AK_SPAN] * ac->v[AK_SPAN] / ac->v[AK_WING_AREA];
  if (!acp_in_range(ar, 0.5, 50.0)) {
    msg(err, errlen, "aspect ratio span^2/wing_area = %s is outside 0.5 to 50", number(ar, 6).s);
    return ACP_ERR_INVALID;
  }
  /* Without 'oswald' the polar uses the estimate, which covers aspect ratios
     1 to 30 only: outside, k would be NaN behind an ACP_OK. */
  if (isnan(ac->v[AK_OSWALD]) && isnan(acp_oswald_estimate(ar, ac_value(ac, AK_SWEEP_LE)))) {
    msg(err, errlen, "aspect ratio %s is outside the Oswald estimate's 1 to 30: give 'oswald'",
        number(ar, 6).s);
    return ACP_ERR_INVALID;
  }
  if (2.0 * ac->v[AK_WINGLET_HEIGHT] > ac->v[AK_SPAN]) {
    msg(err, errlen, "'winglet_height' is more than half the span");
    return ACP_ERR_INVALID;
  }
  for (size_t i = 0; i < ac->ncomp; ++i) {
    const int st = check_component(&ac->comp[i], err, errlen);
    if (st != ACP_OK) return st;
  }
  return check_mass_order(ac, err, errlen);
}

int acp_aircraft_check(const acp_aircraft *ac, char *err, size_t errlen) {
  if (!ac) {
    msg(err, errlen, "no aircraft (NULL)");
    return ACP_ERR_INVALID;
  }
  return ac_check(ac, err, errlen);
}
