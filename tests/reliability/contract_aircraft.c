/* Contract of aircraft.h (the model's keyed set/get/unset, text keys, key
   listing, components, check, copy, parse of one number, load errors).
   The text parser itself has its own fuzz target (fuzz_aircraft_parse.c). */
#include <math.h>
#include <stdio.h>
#include <string.h>

#include "acperf.h"
#include "contract.h"

/* Keys with their documented ranges (docs/aircraft-format.md); whole: the
   value must be a whole number. */
static const struct {
  const char *key;
  double lo, hi;
  int whole;
} KEYS[] = {
    {"wing_area", 0.1, 5000.0, 0},        {"span", 0.3, 150.0, 0},
    {"cd0", 0.001, 0.5, 0},               {"oswald", 0.3, 1.0, 0},
    {"cl_max", 0.3, 5.0, 0},              {"cl_min_drag", -0.5, 1.5, 0},
    {"sweep_leading_edge", 0.0, 70.0 * 3.14159265358979323846 / 180.0, 0},
    {"winglet_height", 0.0, 20.0, 0},     {"korn_kappa", 0.7, 1.0, 0},
    {"wing_thickness_ratio", 0.02, 0.25, 0}, {"cd_misc", 0.0, 0.1, 0},
    {"leakage_fraction", 0.0, 0.5, 0},    {"engine_type", 1.0, 3.0, 1},
    {"engine_count", 1.0, 8.0, 1},        {"engine_thrust", 100.0, 1e6, 0},
    {"throttle_ratio", 0.9, 1.3, 0},      {"tsfc_c0", 1e-6, 1e-3, 0},
    {"psfc", 1e-8, 1e-6, 0},              {"idle_fuel_flow", 0.0, 5.0, 0},
    {"vmo", 20.0, 400.0, 0},              {"mmo", 0.1, 0.95, 0},
    {"max_altitude", 0.0, 25000.0, 0},    {"fuel_capacity", 0.0, 5e5, 0},
    {"speed_limit_altitude", -5000.0, 25000.0, 0}, {"cruise_mach", 0.05, 0.95, 0},
    {"component.wing.wetted_area", 1e-4, 1e4, 0}, {"component.wing.laminar_fraction", 0.0, 1.0, 0},
    {"component.fuselage.fineness_ratio", 1.0, 50.0, 0}, {"component.wing.count", 1.0, 16.0, 1},
    {"component.wing.type", 1.0, 4.0, 1},
};
#define NKEYS (sizeof KEYS / sizeof KEYS[0])
static const char *const DERIVED[] = {"aspect_ratio", "aspect_ratio_effective", "oswald_estimate",
                                      "oswald_effective", "induced_factor", "component_count"};

static int same_bits(double a, double b) {
  return (isnan(a) && isnan(b)) || memcmp(&a, &b, sizeof a) == 0;
}

static int terminated(const char *s, size_t len) { return memchr(s, '\0', len) != NULL; }

static void keyed(contract *c, acp_aircraft *ac) {
  /* A documented key: OK exactly inside its range, the model unchanged on error. */
  const unsigned k = contract_pick(c, (unsigned)NKEYS);
  const double v = contract_range(c, KEYS[k].lo, KEYS[k].hi);
  double before = 0.0, after = 0.0;
  const int gst = acp_aircraft_get(ac, KEYS[k].key, &before);
  contract_code(c, "acp_aircraft_get", gst, 0);
  const int st = acp_aircraft_set(ac, KEYS[k].key, v);
  contract_code(c, "acp_aircraft_set", st, ST(ACP_ERR_INVALID) | ST(ACP_ERR_RANGE));
  const int inside = isfinite(v) && v >= KEYS[k].lo && v <= KEYS[k].hi;
  const int whole = !KEYS[k].whole || (isfinite(v) && v == floor(v));
  if ((st == ACP_OK) != (inside && whole))
    contract_violation(c, "acp_aircraft_set", "%s = %.17g: status %d, range [%g, %g]%s",
                       KEYS[k].key, v, st, KEYS[k].lo, KEYS[k].hi,
                       KEYS[k].whole ? ", whole" : "");
  if (!isfinite(v))
    contract_expect(c, st == ACP_ERR_INVALID, "acp_aircraft_set", "NaN/Inf not ACP_ERR_INVALID");
  else if (!inside && whole)
    contract_expect(c, st == ACP_ERR_RANGE, "acp_aircraft_set", "outside the range not ACP_ERR_RANGE");
  contract_code(c, "acp_aircraft_get", acp_aircraft_get(ac, KEYS[k].key, &after), 0);
  contract_record(c, after);
  if (st == ACP_OK)
    contract_expect(c, same_bits(after, v), "acp_aircraft_get", "does not read back the value set");
  else
    contract_expect(c, same_bits(after, before), "acp_aircraft_set", "model changed on error");

  /* Read-only, unknown and NULL. */
  const char *d = DERIVED[contract_pick(c, 6)];
  double dv = 0.0;
  contract_code(c, "acp_aircraft_get", acp_aircraft_get(ac, d, &dv), ST(ACP_ERR_INVALID));
  contract_value(c, "acp_aircraft_get", dv, 0.0, 1e7);
  contract_expect(c, acp_aircraft_set(ac, d, v) == ACP_ERR_INVALID, "acp_aircraft_set",
                  "a read-only key accepted");
  contract_expect(c, acp_aircraft_unset(ac, d) == ACP_ERR_INVALID, "acp_aircraft_unset",
                  "a read-only key accepted");
  contract_expect(c, acp_aircraft_set(ac, "wingarea", 1.0) == ACP_ERR_UNKNOWN_KEY &&
                         acp_aircraft_get(ac, "component.nosuch.length", &dv) == ACP_ERR_UNKNOWN_KEY &&
                         isnan(dv),
                  "acp_aircraft_set/get", "unknown key not ACP_ERR_UNKNOWN_KEY with NaN");
  contract_expect(c, acp_aircraft_set(NULL, "span", 10.0) == ACP_ERR_INVALID &&
                         acp_aircraft_set(ac, NULL, 10.0) == ACP_ERR_INVALID &&
                         acp_aircraft_get(ac, "span", NULL) == ACP_ERR_INVALID &&
                         acp_aircraft_copy(NULL, ac) == ACP_ERR_INVALID &&
                         acp_aircraft_copy(ac, NULL) == ACP_ERR_INVALID,
                  "acp_aircraft_set/get/copy", "NULL accepted");

  /* Unset: back to the default (or NaN); unset twice is the same. */
  if (contract_pick(c, 4) == 0) {
    contract_code(c, "acp_aircraft_unset", acp_aircraft_unset(ac, KEYS[k].key), 0);
    double u1 = 0.0, u2 = 0.0;
    acp_aircraft_get(ac, KEYS[k].key, &u1);
    contract_code(c, "acp_aircraft_unset", acp_aircraft_unset(ac, KEYS[k].key), 0);
    acp_aircraft_get(ac, KEYS[k].key, &u2);
    contract_expect(c, same_bits(u1, u2), "acp_aircraft_unset", "unset twice differs");
    contract_record(c, u1);
  }
}

static void texts(contract *c, acp_aircraft *ac) {
  static const char *const VALUES[] = {"turbofan", "turboprop", "piston", "ramjet", "", "surface",
                                       "body", "nacelle", "other", "wing"};
  static const char *const TKEYS[] = {"engine_type", "component.wing.type", "name", "span"};
  const char *key = TKEYS[contract_pick(c, 4)];
  const char *val = VALUES[contract_pick(c, 10)];
  const int st = acp_aircraft_set_text(ac, key, val);
  contract_code(c, "acp_aircraft_set_text", st, ST(ACP_ERR_INVALID));
  if (strcmp(key, "span") == 0)
    contract_expect(c, st == ACP_ERR_INVALID, "acp_aircraft_set_text", "text for a numeric key");
  char buf[80];
  const size_t len = 1u + contract_pick(c, 12);
  memset(buf, 'x', sizeof buf);
  const int gst = acp_aircraft_get_text(ac, key, buf, len);
  contract_code(c, "acp_aircraft_get_text", gst, ST(ACP_ERR_UNKNOWN_KEY));
  contract_expect(c, terminated(buf, len) && buf[len] == 'x', "acp_aircraft_get_text",
                  "text not terminated inside its buffer, or written past it");
  if (st == ACP_OK && gst == ACP_OK && len > strlen(val))
    contract_expect(c, strcmp(buf, val) == 0, "acp_aircraft_get_text", "does not read back the text");
  contract_expect(c, acp_aircraft_get_text(ac, "name", buf, 0) == ACP_ERR_INVALID &&
                         acp_aircraft_set_text(ac, "name", NULL) == ACP_ERR_INVALID,
                  "acp_aircraft_get_text/set_text", "NULL or len 0 accepted");
}

/* Every listed key reads back; the listing ends with ACP_ERR_RANGE. */
static void listing(contract *c, const acp_aircraft *ac) {
  char key[96];
  size_t i = 0;
  int st = ACP_OK;
  for (; i < 400; ++i) {
    st = acp_aircraft_key_at(ac, i, key, sizeof key);
    if (st != ACP_OK) break;
    double v = 0.0;
    char t[80];
    const int g = acp_aircraft_get(ac, key, &v);
    const int gt = acp_aircraft_get_text(ac, key, t, sizeof t);
    if (g != ACP_OK && gt != ACP_OK)
      contract_violation(c, "acp_aircraft_key_at", "listed key '%s' reads as neither number nor text", key);
  }
  contract_code(c, "acp_aircraft_key_at", st, ST(ACP_ERR_RANGE));
  contract_expect(c, st == ACP_ERR_RANGE, "acp_aircraft_key_at", "listing does not end");
  contract_record(c, (double)i);
  const size_t len = 1u + contract_pick(c, 6);
  memset(key, 'x', sizeof key);
  st = acp_aircraft_key_at(ac, contract_pick(c, (unsigned)i + 2u), key, len);
  contract_code(c, "acp_aircraft_key_at", st, ST(ACP_ERR_RANGE));
  contract_expect(c, terminated(key, len) && key[len] == 'x', "acp_aircraft_key_at",
                  "key not terminated inside its buffer");

  double count = 0.0;
  acp_aircraft_get(ac, "component_count", &count);
  char name[40];
  for (size_t k = 0; k <= (size_t)count && k < 20; ++k) {
    st = acp_aircraft_component(ac, k, name, sizeof name);
    contract_code(c, "acp_aircraft_component", st, ST(ACP_ERR_RANGE));
    contract_expect(c, (st == ACP_OK) == (k < (size_t)count), "acp_aircraft_component",
                    "status disagrees with component_count");
  }
  char err[48];
  memset(err, 'x', sizeof err);
  const size_t elen = contract_pick(c, 40);
  st = acp_aircraft_check(ac, elen ? err : NULL, elen);
  contract_code(c, "acp_aircraft_check", st, ST(ACP_ERR_INVALID));
  if (elen) contract_expect(c, terminated(err, elen), "acp_aircraft_check", "message not terminated");
}

/* One number through the text format: accepted exactly inside the key's
   range and read back bit for bit (printed with 17 digits). */
static void parse_number(contract *c) {
  const double v = contract_range(c, sqrt(0.5 * 40.0), sqrt(50.0 * 40.0));
  char text[160], err[96];
  snprintf(text, sizeof text, "wing_area = 40.0\nspan = %.17g\ncd0 = 0.02\noswald = 0.8\n", v);
  acp_aircraft *ac = acp_aircraft_new();
  if (!ac) return;
  const int st = acp_aircraft_parse(ac, text, err, sizeof err);
  contract_code(c, "acp_aircraft_parse", st, ST(ACP_ERR_PARSE));
  /* the key's range, and the aspect ratio span^2/wing_area 0.5 to 50 */
  const int inside = isfinite(v) && v >= 0.3 && v <= 150.0 && v * v / 40.0 >= 0.5 && v * v / 40.0 <= 50.0;
  if ((st == ACP_OK) != inside)
    contract_violation(c, "acp_aircraft_parse", "span = %.17g: status %d (%s)", v, st, err);
  double got = 0.0;
  acp_aircraft_get(ac, "span", &got);
  if (st == ACP_OK) contract_expect(c, same_bits(got, v), "acp_aircraft_parse", "span not read exactly");
  /* A file that cannot be opened leaves the model as it was. */
  const int lst = acp_aircraft_load(ac, "/nonexistent/acperf/aircraft.toml", err, sizeof err);
  contract_expect(c, lst == ACP_ERR_IO, "acp_aircraft_load", "missing file not ACP_ERR_IO");
  double after = 0.0;
  acp_aircraft_get(ac, "span", &after);
  contract_expect(c, same_bits(after, got), "acp_aircraft_load", "model changed on error");
  contract_expect(c, acp_aircraft_load(ac, NULL, err, sizeof err) == ACP_ERR_INVALID,
                  "acp_aircraft_load", "NULL path accepted");
  acp_aircraft_free(ac);
  acp_aircraft_free(NULL);
}

void contract_aircraft(contract *c) {
  acp_aircraft *own = contract_private_aircraft(c);
  if (!own) return;
  keyed(c, own);
  if (contract_pick(c, 3) == 0) texts(c, own);
  listing(c, contract_pick(c, 2) ? own : contract_shared_aircraft(c));
  if (contract_pick(c, 4) == 0) parse_number(c);
  acp_aircraft_free(own);
}
