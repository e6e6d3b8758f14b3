/* The aircraft model (keys, ranges, defaults) and its text format: every bad
   file and bad argument gives a clear error, with the line for the parser.
   The format is a subset of TOML 1.0 (toml.io/en/v1.0.0); the examples are
   also read with Python's tomllib by tests/python/ref_aircraft_toml.py. */
#define _POSIX_C_SOURCE 200809L /* mkstemp, mkdtemp, mkfifo, alarm: the acp_aircraft_load() files */
#include "check.h"
#include "utf8.h"

#include <locale.h>
#include <stdlib.h>
#include <string.h>
#include <sys/stat.h>
#include <unistd.h>

#include <acperf.h>

static const char *GOOD = "# comment line, UTF-8: caf\xc3\xa9 \xe2\x80\x94 \xf0\x9f\x9b\xa9\n"
                          "name = \"Test aircraft\"   # trailing comment\n"
                          "wing_area = 30.5\n"
                          "span=15\n"
                          "\t cd0 = 2.0e-2\n"
                          "oswald = 0.8\n"
                          "cl_max = 1.5\n";

static const char *BUILDUP = "wing_area = 20\nspan = 12\n"
                             "[component.wing]\ntype = \"surface\"\nwetted_area = 40\n"
                             "length = 2\nthickness_ratio = 0.12\n"
                             "[ component . body ]  # blanks around the dot are TOML too\n"
                             "type = 'body'\nwetted_area = 30\nlength = 8\nfineness_ratio = 8\n";

/* The drag at a few flight conditions, as raw bytes (acp_drag_parts is doubles). */
typedef struct {
  acp_drag_parts parts[4];
} drag_sample;

static drag_sample sample_drag(const acp_aircraft *ac) {
  drag_sample d;
  const double hp[2] = {0.0, 3000.0}, tas[2] = {60.0, 120.0};
  for (int i = 0; i < 4; ++i)
    assert_int_equal(acp_drag(ac, 5000.0, hp[i / 2], 0.0, tas[i % 2], &d.parts[i]), ACP_OK);
  return d;
}

static acp_aircraft *parsed(const char *text) {
  acp_aircraft *ac = acp_aircraft_new();
  char err[200];
  assert_non_null(ac);
  assert_int_equal(acp_aircraft_parse(ac, text, err, sizeof err), ACP_OK);
  return ac;
}

#define ROUGH_WING "wing_area = 20\nspan = 12\ncl_max = 1.5\n" \
  "[component.wing]\ntype = \"surface\"\nwetted_area = 40\nlength = 2\n" \
  "thickness_ratio = 0.12\nsweep_max_thickness = 0.3\n"
#define BODY "[component.body]\ntype = \"body\"\nwetted_area = 30\nlength = 8\n" \
  "fineness_ratio = 8\n"

/* The model keeps the parts of the drag build-up that depend on it alone (the
   roughness cutoff's (l/k)^1.053, the sweep factor cos^0.28, the induced-drag
   factor); every setter must bring them up to date. A model changed key by key
   must give the same bits as one read from the text of its final values, and a
   copy as its original. */
static void test_changed_model_drags_as_a_fresh_one(void **state) {
  (void)state;
  acp_aircraft *ac = parsed(ROUGH_WING "roughness = 1.0e-5\n" BODY);
  const drag_sample before = sample_drag(ac);
  assert_int_equal(acp_aircraft_set(ac, "component.wing.roughness", 4.0e-5), ACP_OK);
  assert_int_equal(acp_aircraft_set(ac, "component.wing.sweep_max_thickness", 0.1), ACP_OK);
  assert_int_equal(acp_aircraft_set(ac, "component.body.roughness", 2.0e-5), ACP_OK);
  assert_int_equal(acp_aircraft_set(ac, "span", 13.0), ACP_OK);
  assert_int_equal(acp_aircraft_set(ac, "winglet_height", 0.5), ACP_OK);
  assert_int_equal(acp_aircraft_set(ac, "sweep_leading_edge", 0.4), ACP_OK);
  const char *final_text = "wing_area = 20\nspan = 13\ncl_max = 1.5\nwinglet_height = 0.5\n"
                           "sweep_leading_edge = 0.4\n[component.wing]\ntype = \"surface\"\n"
                           "wetted_area = 40\nlength = 2\nthickness_ratio = 0.12\n"
                           "sweep_max_thickness = 0.1\nroughness = 4.0e-5\n" BODY
                           "roughness = 2.0e-5\n";
  acp_aircraft *fresh = parsed(final_text);
  drag_sample got = sample_drag(ac), want = sample_drag(fresh);
  assert_memory_not_equal(&got, &before, sizeof got); /* the changes change the drag */
  assert_memory_equal(&got, &want, sizeof got);
  /* a copy carries them */
  acp_aircraft *copy = acp_aircraft_new();
  assert_int_equal(acp_aircraft_copy(copy, ac), ACP_OK);
  got = sample_drag(copy);
  assert_memory_equal(&got, &want, sizeof got);
  /* unset: a component key back to its default, then a whole component */
  assert_int_equal(acp_aircraft_unset(ac, "component.wing.roughness"), ACP_OK);
  assert_int_equal(acp_aircraft_unset(ac, "winglet_height"), ACP_OK);
  acp_aircraft_free(fresh);
  fresh = parsed("wing_area = 20\nspan = 13\ncl_max = 1.5\nsweep_leading_edge = 0.4\n"
                 "[component.wing]\ntype = \"surface\"\nwetted_area = 40\nlength = 2\n"
                 "thickness_ratio = 0.12\nsweep_max_thickness = 0.1\n" BODY
                 "roughness = 2.0e-5\n");
  got = sample_drag(ac);
  want = sample_drag(fresh);
  assert_memory_equal(&got, &want, sizeof got);
  /* an incomplete model is refused, and accepted again when complete */
  acp_drag_parts parts;
  assert_int_equal(acp_aircraft_unset(ac, "span"), ACP_OK);
  assert_int_equal(acp_drag(ac, 5000.0, 0.0, 0.0, 60.0, &parts), ACP_ERR_INVALID);
  assert_int_equal(acp_aircraft_set(ac, "span", 13.0), ACP_OK);
  got = sample_drag(ac);
  assert_memory_equal(&got, &want, sizeof got);
  assert_int_equal(acp_aircraft_unset(ac, "component.wing"), ACP_OK);
  acp_aircraft_free(fresh);
  fresh = parsed("wing_area = 20\nspan = 13\ncl_max = 1.5\nsweep_leading_edge = 0.4\n" BODY
                 "roughness = 2.0e-5\n");
  got = sample_drag(ac);
  want = sample_drag(fresh);
  assert_memory_equal(&got, &want, sizeof got);
  acp_aircraft_free(fresh);
  acp_aircraft_free(copy);
  acp_aircraft_free(ac);
}

static void test_model_keys(void **state) {
  (void)state;
  acp_aircraft *ac = acp_aircraft_new();
  assert_non_null(ac);
  double v;
  /* empty model: keys without default read NaN, defaults read their value */
  assert_int_equal(acp_aircraft_get(ac, "span", &v), ACP_OK);
  CHECK_NAN(v, "unset span");
  assert_int_equal(acp_aircraft_get(ac, "cl_min_drag", &v), ACP_OK);
  CHECK_CLOSE(v, 0.0, 0, 0, "default cl_min_drag");
  assert_int_equal(acp_aircraft_check(ac, NULL, 0), ACP_ERR_INVALID);
  /* set / get round trip */
  assert_int_equal(acp_aircraft_set(ac, "span", 28.5), ACP_OK);
  assert_int_equal(acp_aircraft_get(ac, "span", &v), ACP_OK);
  CHECK_CLOSE(v, 28.5, 0, 0, "span round trip");
  /* errors, and the model unchanged */
  assert_int_equal(acp_aircraft_set(ac, "span", 1000.0), ACP_ERR_RANGE);
  assert_int_equal(acp_aircraft_set(ac, "span", -1.0), ACP_ERR_RANGE);
  assert_int_equal(acp_aircraft_set(ac, "span", NAN), ACP_ERR_INVALID);
  assert_int_equal(acp_aircraft_set(ac, "span", INFINITY), ACP_ERR_INVALID);
  assert_int_equal(acp_aircraft_set(ac, "spam", 10.0), ACP_ERR_UNKNOWN_KEY);
  assert_int_equal(acp_aircraft_set(ac, "", 10.0), ACP_ERR_UNKNOWN_KEY);
  assert_int_equal(acp_aircraft_set(ac, NULL, 10.0), ACP_ERR_INVALID);
  assert_int_equal(acp_aircraft_set(NULL, "span", 10.0), ACP_ERR_INVALID);
  assert_int_equal(acp_aircraft_set(ac, "aspect_ratio", 10.0), ACP_ERR_INVALID);
  assert_int_equal(acp_aircraft_get(ac, "span", &v), ACP_OK);
  CHECK_CLOSE(v, 28.5, 0, 0, "span unchanged after errors");
  assert_int_equal(acp_aircraft_get(ac, "spam", &v), ACP_ERR_UNKNOWN_KEY);
  CHECK_NAN(v, "unknown key reads NaN");
  assert_int_equal(acp_aircraft_get(ac, "span", NULL), ACP_ERR_INVALID);
  assert_int_equal(acp_aircraft_get(NULL, "span", &v), ACP_ERR_INVALID);
  /* components by dotted key */
  assert_int_equal(acp_aircraft_set(ac, "component.wing.wetted_area", 120.0), ACP_OK);
  assert_int_equal(acp_aircraft_set(ac, "component.wing.type", ACP_COMPONENT_SURFACE), ACP_OK);
  assert_int_equal(acp_aircraft_set(ac, "component.wing.type", 5.0), ACP_ERR_RANGE);
  assert_int_equal(acp_aircraft_set(ac, "component.wing.type", 1.5), ACP_ERR_INVALID);
  assert_int_equal(acp_aircraft_set(ac, "component.wing.count", 2.5), ACP_ERR_INVALID);
  assert_int_equal(acp_aircraft_set(ac, "component.wing.colour", 1.0), ACP_ERR_UNKNOWN_KEY);
  assert_int_equal(acp_aircraft_set(ac, "component.bad name.length", 1.0), ACP_ERR_INVALID);
  assert_int_equal(acp_aircraft_set(ac, "component..length", 1.0), ACP_ERR_INVALID);
  assert_int_equal(acp_aircraft_set(ac, "component.wing", 1.0), ACP_ERR_UNKNOWN_KEY);
  assert_int_equal(acp_aircraft_get(ac, "component.wing.interference", &v), ACP_OK);
  CHECK_CLOSE(v, 1.0, 0, 0, "default interference");
  assert_int_equal(acp_aircraft_get(ac, "component.wing.max_thickness_position", &v), ACP_OK);
  CHECK_CLOSE(v, 0.3, 0, 0, "default position of max thickness");
  assert_int_equal(acp_aircraft_get(ac, "component.tail.length", &v), ACP_ERR_UNKNOWN_KEY);
  char text[64];
  assert_int_equal(acp_aircraft_get_text(ac, "component.wing.type", text, sizeof text), ACP_OK);
  assert_string_equal(text, "surface");
  assert_int_equal(acp_aircraft_set_text(ac, "component.wing.type", "nacelle"), ACP_OK);
  assert_int_equal(acp_aircraft_get(ac, "component.wing.type", &v), ACP_OK);
  CHECK_CLOSE(v, ACP_COMPONENT_NACELLE, 0, 0, "type by text");
  assert_int_equal(acp_aircraft_set_text(ac, "component.wing.type", "wing"), ACP_ERR_INVALID);
  assert_int_equal(acp_aircraft_set_text(ac, "span", "12"), ACP_ERR_INVALID);
  assert_int_equal(acp_aircraft_set_text(ac, "colour", "red"), ACP_ERR_UNKNOWN_KEY);
  assert_int_equal(acp_aircraft_set_text(ac, "name", "RJ \x01"), ACP_ERR_INVALID);
  assert_int_equal(acp_aircraft_set_text(ac, "name", "Demo RJ"), ACP_OK);
  assert_int_equal(acp_aircraft_get_text(ac, "name", text, 5), ACP_OK);
  assert_string_equal(text, "Demo"); /* cut to fit */
  assert_int_equal(acp_aircraft_get_text(ac, "span", text, sizeof text), ACP_ERR_UNKNOWN_KEY);
  assert_int_equal(acp_aircraft_get_text(ac, "name", text, 0), ACP_ERR_INVALID);
  /* at most ACP_AIRCRAFT_MAX_COMPONENTS components */
  char key[64];
  for (int i = 1; i < ACP_AIRCRAFT_MAX_COMPONENTS; ++i) {
    snprintf(key, sizeof key, "component.c%d.length", i);
    assert_int_equal(acp_aircraft_set(ac, key, 1.0), ACP_OK);
  }
  assert_int_equal(acp_aircraft_set(ac, "component.one_too_many.length", 1.0), ACP_ERR_RANGE);
  assert_int_equal(acp_aircraft_get(ac, "component_count", &v), ACP_OK);
  CHECK_CLOSE(v, ACP_AIRCRAFT_MAX_COMPONENTS, 0, 0, "component count");
  assert_int_equal(acp_aircraft_unset(ac, "component.c3"), ACP_OK);
  assert_int_equal(acp_aircraft_component(ac, 3, text, sizeof text), ACP_OK);
  assert_string_equal(text, "c4"); /* order kept */
  assert_int_equal(acp_aircraft_component(ac, 99, text, sizeof text), ACP_ERR_RANGE);
  assert_int_equal(acp_aircraft_unset(ac, "component.c3"), ACP_ERR_UNKNOWN_KEY);
  assert_int_equal(acp_aircraft_unset(ac, "aspect_ratio"), ACP_ERR_INVALID);
  assert_int_equal(acp_aircraft_unset(ac, "nothing"), ACP_ERR_UNKNOWN_KEY);
  acp_aircraft_free(ac);
  acp_aircraft_free(NULL);
}

static void test_key_listing_and_copy(void **state) {
  (void)state;
  acp_aircraft *ac = acp_aircraft_new(), *cp = acp_aircraft_new();
  char err[256], key[96];
  assert_int_equal(acp_aircraft_parse(ac, BUILDUP, err, sizeof err), ACP_OK);
  static const char *want[] = {"wing_area",
                               "span",
                               "component.wing.type",
                               "component.wing.wetted_area",
                               "component.wing.length",
                               "component.wing.thickness_ratio",
                               "component.body.type",
                               "component.body.wetted_area",
                               "component.body.length",
                               "component.body.fineness_ratio"};
  size_t i = 0;
  while (acp_aircraft_key_at(ac, i, key, sizeof key) == ACP_OK) {
    assert_true(i < sizeof want / sizeof want[0]);
    assert_string_equal(key, want[i]);
    ++i;
  }
  assert_int_equal(i, sizeof want / sizeof want[0]);
  assert_int_equal(acp_aircraft_key_at(ac, 0, key, 0), ACP_ERR_INVALID);
  assert_int_equal(acp_aircraft_copy(cp, ac), ACP_OK);
  double v;
  assert_int_equal(acp_aircraft_get(cp, "component.body.fineness_ratio", &v), ACP_OK);
  CHECK_CLOSE(v, 8.0, 0, 0, "copied");
  assert_int_equal(acp_aircraft_copy(NULL, ac), ACP_ERR_INVALID);
  acp_aircraft_free(ac);
  acp_aircraft_free(cp);
}

static void test_parse_good(void **state) {
  (void)state;
  acp_aircraft *ac = acp_aircraft_new();
  char err[256] = "stale";
  double v;
  assert_int_equal(acp_aircraft_parse(ac, GOOD, err, sizeof err), ACP_OK);
  assert_string_equal(err, "");
  assert_int_equal(acp_aircraft_get(ac, "cd0", &v), ACP_OK);
  CHECK_CLOSE(v, 0.02, 0, 0, "2.0e-2");
  assert_int_equal(acp_aircraft_get(ac, "wing_area", &v), ACP_OK);
  CHECK_CLOSE(v, 30.5, 0, 0, "30.5");
  char name[64];
  assert_int_equal(acp_aircraft_get_text(ac, "name", name, sizeof name), ACP_OK);
  assert_string_equal(name, "Test aircraft");
  /* CRLF line endings, no final newline, the build-up */
  assert_int_equal(acp_aircraft_parse(ac, "wing_area = 30\r\nspan = 15\r\ncd0 = 0.02", err,
                                      sizeof err),
                   ACP_OK);
  assert_int_equal(acp_aircraft_parse(ac, BUILDUP, err, sizeof err), ACP_OK);
  assert_int_equal(acp_aircraft_get(ac, "component.body.fineness_ratio", &v), ACP_OK);
  CHECK_CLOSE(v, 8.0, 0, 0, "component key");
  /* parsing replaces the model: cd0 of the previous text is gone */
  assert_int_equal(acp_aircraft_get(ac, "cd0", &v), ACP_OK);
  CHECK_NAN(v, "replaced");
  /* a huge line of blanks, a huge comment */
  const size_t big = 200000;
  char *text = malloc(big + 64);
  assert_non_null(text);
  memset(text, ' ', big);
  strcpy(text + big, "wing_area = 30\nspan = 15\ncd0 = 0.02\n");
  assert_int_equal(acp_aircraft_parse(ac, text, err, sizeof err), ACP_OK);
  memset(text, 'x', big);
  text[0] = '#';
  text[big - 1] = '\n';
  assert_int_equal(acp_aircraft_parse(ac, text, err, sizeof err), ACP_OK);
  free(text);
  /* NULL err is allowed */
  assert_int_equal(acp_aircraft_parse(ac, GOOD, NULL, 0), ACP_OK);
  acp_aircraft_free(ac);
}

typedef struct {
  const char *text;
  int line;          /* line named in the message; 0: none (whole-model check) */
  const char *words; /* words the message must contain */
} bad_text;

static const char *MIN = "wing_area = 30\nspan = 15\ncd0 = 0.02\n";

static void test_parse_errors(void **state) {
  (void)state;
  static const bad_text rows[] = {
      {"", 0, "missing key 'wing_area'"},
      {"wing_area = 30\n", 0, "missing key 'span'"},
      {"wing_area = 30\nspan = 15\n", 0, "no zero-lift drag"},
      {"wing_area 30\n", 1, "expected '='"},
      {"wing_area = 30\nwing_area = 31\n", 2, "duplicate key 'wing_area' (first on line 1)"},
      {"wing_area = 30\n[component.wing\n", 2, "unterminated table header"},
      {"wing_area = 30\n[component.wing] x\n", 2, "unexpected text after the table header"},
      {"[wing]\n", 1, "unknown table"},
      {"[component]\n", 1, "unknown table"},
      {"[component.a.b]\n", 1, "unknown table"},
      {"[component.\"w\"]\n", 1, "quoted keys"},
      {"[[component.x]]\n", 1, "arrays of tables"},
      {"[component.w]\ntype = \"other\"\n[component.w]\n", 3, "defined twice (first on line 1)"},
      {"[component.w]\ntype = \"other\"\nspan = 3\n", 3, "belongs before the first [table]"},
      {"[component.w]\ncolour = 3\n", 2, "unknown key 'colour' in [component.w]"},
      {"[component.w]\ntype = \"wing\"\n", 2, "not one of surface, body, nacelle, other"},
      {"[component.w]\ntype = 1\n", 2, "takes a quoted text"},
      {"foo = 1\n", 1, "unknown key 'foo'"},
      {"span = 1e9\n", 1, "outside the valid range"},
      {"span = -3\n", 1, "outside the valid range"},
      {"span = inf\n", 1, "inf and nan"},
      {"span = nan\n", 1, "inf and nan"},
      {"span = -inf\n", 1, "inf and nan"},
      {"span = 1_0\n", 1, "underscores"},
      {"span = 010\n", 1, "leading zeros"},
      {"span = .5\n", 1, "not a number"},
      {"span = 5.\n", 1, "digit must follow the decimal point"},
      {"span = 5e\n", 1, "digit must follow the exponent"},
      {"span = 0x10\n", 1, "hexadecimal"},
      {"span = 1e999\n", 1, "out of the range of a double"},
      {"span = 12abc\n", 1, "not a number"},
      {"span = 2024-01-01\n", 1, "not a number"},
      {"span = \"30\"\n", 1, "takes a number, not text"},
      {"name = 3\n", 1, "takes a quoted text"},
      {"name = \"abc\n", 1, "unterminated string"},
      {"name = \"a\\nb\"\n", 1, "escape sequences"},
      {"name = \"\"\"abc\"\"\"\n", 1, "multi-line strings"},
      {"span = 30 extra\n", 1, "unexpected text after the value"},
      {"span = [1, 2]\n", 1, "arrays are not supported"},
      {"span = {a = 1}\n", 1, "inline tables"},
      {"span = true\n", 1, "booleans"},
      {"a.b = 1\n", 1, "dotted keys"},
      {"\"span\" = 1\n", 1, "quoted keys"},
      {"span =\n", 1, "missing value for key 'span'"},
      {"span = # nothing\n", 1, "missing value"},
      {"= 3\n", 1, "invalid character '='"},
      {"wing_area = 30\nspan = 15\x01\n", 2, "control character"},
      {"wing_area = 30\rspan = 15\n", 1, "control character"},
      {"count = 2\n", 1, "unknown key 'count'"},
      {"wing_area = 30 # caf\xc3\n", 1, "not valid UTF-8"},
      {"name = \"\xed\xa0\x80\"\n", 1, "not valid UTF-8"},
      {"name = \"\xc0\xaf\"\n", 1, "not valid UTF-8"},
      {"[component.w]\ntype = \"surface\"\ncount = 1.5\n", 3, "not a whole number"},
      {"wing_area = 30\nspan = 15\ncd0 = 0.02\n[component.w]\ntype = \"other\"\nwetted_area = 1\n"
       "length = 1\n",
       0, "alternatives"},
      {"wing_area = 30\nspan = 15\n[component.w]\ntype = \"surface\"\nwetted_area = 1\n"
       "length = 1\n",
       0, "component 'w' (line 3): missing key 'thickness_ratio'"},
      {"wing_area = 30\nspan = 15\n[component.w]\nwetted_area = 1\n", 0, "missing key 'type'"},
      {"wing_area = 30\nspan = 15\n[component.w]\ntype = \"surface\"\nwetted_area = 1\nlength = 1\n"
       "thickness_ratio = 0.1\nfineness_ratio = 3\n",
       0, "'fineness_ratio' does not apply to a component of type 'surface'"},
      {"wing_area = 30\nspan = 15\ncd0 = 0.02\nkorn_kappa = 0.9\n", 0, "needs 'wing_thickness_ratio'"},
      {"wing_area = 30\nspan = 15\ncd0 = 0.02\nleakage_fraction = 0.1\n", 0,
       "belong to a component build-up"},
      {"wing_area = 1\nspan = 100\ncd0 = 0.02\n", 0, "aspect ratio"},
      {"wing_area = 30\nspan = 15\ncd0 = 0.02\nwinglet_height = 8\n", 0, "more than half the span"},
      /* tomllib refuses a CR that no LF follows, also at the very end */
      {"wing_area = 30\nspan = 15\ncd0 = 0.02\r", 3, "a CR without a LF"},
      {"wing_area = 30\r\r\n", 1, "a CR without a LF"},
      /* tomllib refuses a byte order mark ("Invalid statement"); a non-ASCII
         byte is named in hex, never copied raw into the message */
      {"\xEF\xBB\xBFwing_area = 30\n", 1, "byte order mark (U+FEFF) at the start"},
      {"\xEF\xBB\xBF# comment\n", 1, "byte order mark"},
      {"w\xC3\xADng_area = 30\n", 1, "non-ASCII byte 0xC3 in a key, after 'w'"},
      {"\xC3\xA9 = 1\n", 1, "non-ASCII byte 0xC3 at the start of a key"},
      {"span$ = 1\n", 1, "invalid character '$' in a key, after 'span'"},
      {"[component.w\xC3\xADng]\n", 1, "invalid non-ASCII byte 0xC3 in table header"},
      {"[\xC3\xA9]\n", 1, "invalid non-ASCII byte 0xC3 in table header"},
      {"[component.w;]\n", 1, "invalid character ';' in table header"},
  };
  acp_aircraft *ac = acp_aircraft_new();
  char err[256];
  assert_int_equal(acp_aircraft_parse(ac, MIN, err, sizeof err), ACP_OK);
  for (size_t i = 0; i < sizeof rows / sizeof rows[0]; ++i) {
    err[0] = '\0';
    const int st = acp_aircraft_parse(ac, rows[i].text, err, sizeof err);
    char prefix[32] = "";
    if (rows[i].line) snprintf(prefix, sizeof prefix, "line %d: ", rows[i].line);
    if (st != ACP_ERR_PARSE || strncmp(err, prefix, strlen(prefix)) != 0 ||
        !strstr(err, rows[i].words))
      print_error("row %zu: status %d, message \"%s\"; want line %d and \"%s\"\n", i, st, err,
                  rows[i].line, rows[i].words);
    assert_int_equal(st, ACP_ERR_PARSE);
    assert_true(strncmp(err, prefix, strlen(prefix)) == 0);
    assert_non_null(strstr(err, rows[i].words));
    assert_true(utf8_valid(err));
    assert_null(strstr(err, "expected '=' after key 'w'"));
    /* the model is unchanged by a failed parse */
    double v;
    assert_int_equal(acp_aircraft_get(ac, "cd0", &v), ACP_OK);
    CHECK_CLOSE(v, 0.02, 0, 0, "model unchanged");
  }
  /* 17 components */
  char text[4096];
  size_t n = (size_t)snprintf(text, sizeof text, "%s", "wing_area = 30\nspan = 15\n");
  for (int i = 0; i <= ACP_AIRCRAFT_MAX_COMPONENTS; ++i)
    n += (size_t)snprintf(text + n, sizeof text - n, "[component.c%d]\ntype = \"other\"\n", i);
  assert_int_equal(acp_aircraft_parse(ac, text, err, sizeof err), ACP_ERR_PARSE);
  assert_non_null(strstr(err, "line 35: too many components"));
  /* a tiny error buffer is cut, not overrun; NULL arguments */
  char small[8];
  assert_int_equal(acp_aircraft_parse(ac, "foo = 1", small, sizeof small), ACP_ERR_PARSE);
  assert_string_equal(small, "line 1:");
  assert_int_equal(acp_aircraft_parse(ac, NULL, err, sizeof err), ACP_ERR_INVALID);
  assert_int_equal(acp_aircraft_parse(NULL, MIN, err, sizeof err), ACP_ERR_INVALID);
  acp_aircraft_free(ac);
}

static void write_temp(char *path, const char *text, size_t len);

/* LC_NUMERIC set to de_DE.UTF-8, from the system or from the build tree
   (tests/CMakeLists.txt makes it there with localedef); 0 when neither has it. */
static int german_numbers(void) {
  if (setlocale(LC_NUMERIC, "de_DE.UTF-8")) return 1;
  if (setenv("LOCPATH", ACP_TEST_LOCALE_DIR, 1) != 0) return 0;
  return setlocale(LC_NUMERIC, "de_DE.UTF-8") != NULL;
}

/* Where the parser reads as tomllib does, and its messages: valid UTF-8 when
   cut to any buffer, never cut by an inner buffer, numbers with '.' under
   any locale. */
static void test_parse_like_tomllib(void **state) {
  (void)state;
  acp_aircraft *ac = acp_aircraft_new();
  char err[512], text[512];
  double v;
  /* tomllib: 'a = -0' gives the integer 0, 'a = -0.0' and 'a = -0e0' the float -0.0 */
  static const struct {
    const char *value;
    int negative;
  } zeros[] = {{"-0", 0}, {"+0", 0}, {"0", 0}, {"-0.0", 1}, {"-0e0", 1}, {"-0.0e5", 1}};
  for (size_t i = 0; i < sizeof zeros / sizeof zeros[0]; ++i) {
    snprintf(text, sizeof text, "%scl_min_drag = %s\n", MIN, zeros[i].value);
    assert_int_equal(acp_aircraft_parse(ac, text, err, sizeof err), ACP_OK);
    assert_int_equal(acp_aircraft_get(ac, "cl_min_drag", &v), ACP_OK);
    if (v != 0.0 || (signbit(v) != 0) != zeros[i].negative)
      print_error("cl_min_drag = %s read as %g\n", zeros[i].value, v);
    assert_true(v == 0.0 && (signbit(v) != 0) == zeros[i].negative);
  }
  /* the longest component-type message (a 31-byte name, a 63-byte type) in
     full: it was cut at 160 bytes */
  snprintf(text, sizeof text, "[component.%s]\ntype = \"%s\"\n",
           "abcdefghijklmnopqrstuvwxyz01234", /* ACP_COMPONENT_NAME_MAX - 1 */
           "tttttttttttttttttttttttttttttttttttttttttttttttttttttttttttttt\xC3\xA9");
  assert_int_equal(acp_aircraft_parse(ac, text, err, sizeof err), ACP_ERR_PARSE);
  assert_non_null(strstr(err, "is not one of surface, body, nacelle, other"));
  /* cut to every buffer length: never inside the UTF-8 of the type's last
     character, and terminated */
  const size_t full = strlen(err);
  for (size_t len = 1; len <= full + 1; ++len) {
    char cut[512];
    memset(cut, 'X', sizeof cut);
    assert_int_equal(acp_aircraft_parse(ac, text, cut, len), ACP_ERR_PARSE);
    assert_true(strlen(cut) < len);
    if (!utf8_valid(cut)) print_error("errlen %zu: \"%s\"\n", len, cut);
    assert_true(utf8_valid(cut));
  }
  /* messages under a German locale: numbers still with '.' (contract:
     aircraft.h, locale-independent; the locale's ',' shows it would matter) */
  const int german = german_numbers();
  if (!german) {
    print_message("de_DE.UTF-8 not available (localedef or Debian's `locales` missing): "
                  "locale check skipped\n");
  } else {
    assert_string_equal(localeconv()->decimal_point, ",");
    assert_int_equal(acp_aircraft_parse(ac, "wing_area = 30\nspan = 1500.5\n", err, sizeof err),
                     ACP_ERR_PARSE);
    assert_string_equal(err, "line 2: key 'span': 1500.5 m is outside the valid range 0.3 to 150 m");
    assert_int_equal(acp_aircraft_parse(ac, "wing_area = 0.5\nspan = 15\ncd0 = 0.02\n", err,
                                        sizeof err),
                     ACP_ERR_PARSE);
    assert_non_null(strstr(err, "span^2/wing_area = 450 is outside 0.5 to 50"));
    assert_int_equal(acp_aircraft_parse(ac, "[component.w]\ncount = 1.5\n", err, sizeof err),
                     ACP_ERR_PARSE);
    assert_non_null(strstr(err, "1.5 is not a whole number"));
    /* and numbers still read with '.' */
    assert_int_equal(acp_aircraft_parse(ac, "wing_area = 30.25\nspan = 15\ncd0 = 0.02\n", err,
                                        sizeof err),
                     ACP_OK);
    assert_int_equal(acp_aircraft_get(ac, "wing_area", &v), ACP_OK);
    CHECK_CLOSE(v, 30.25, 0, 0, "30.25 under de_DE");
    assert_non_null(setlocale(LC_NUMERIC, "C"));
  }
  /* a file ending in a lone CR: refused by load as by parse */
  char path[64];
  static const char *const LONE_CR = "wing_area = 30\nspan = 15\ncd0 = 0.02\r";
  static const char *const CRLF = "wing_area = 30\nspan = 15\ncd0 = 0.02\r\n";
  write_temp(path, LONE_CR, strlen(LONE_CR));
  assert_int_equal(acp_aircraft_load(ac, path, err, sizeof err), ACP_ERR_PARSE);
  assert_non_null(strstr(err, "line 3: control character (code 13, a CR without a LF"));
  remove(path);
  write_temp(path, CRLF, strlen(CRLF));
  assert_int_equal(acp_aircraft_load(ac, path, err, sizeof err), ACP_OK);
  remove(path);
  acp_aircraft_free(ac);
}

/* Write text (len bytes) to a temporary file; its path in path. */
static void write_temp(char *path, const char *text, size_t len) {
  strcpy(path, "/tmp/acperf_aircraft_XXXXXX");
  const int fd = mkstemp(path);
  assert_true(fd >= 0);
  FILE *f = fdopen(fd, "wb");
  assert_non_null(f);
  assert_int_equal(fwrite(text, 1, len, f), len);
  assert_int_equal(fclose(f), 0);
}

static void test_load(void **state) {
  (void)state;
  acp_aircraft *ac = acp_aircraft_new();
  char err[256], path[64], file[512];
  static const char *examples[] = {"regional_jet.toml", "light_twin.toml"};
  for (int i = 0; i < 2; ++i) {
    snprintf(file, sizeof file, "%s/aircraft/%s", ACP_EXAMPLES_DIR, examples[i]);
    assert_int_equal(acp_aircraft_load(ac, file, err, sizeof err), ACP_OK);
    assert_int_equal(acp_aircraft_check(ac, err, sizeof err), ACP_OK);
  }
  double v;
  assert_int_equal(acp_aircraft_get(ac, "component.nacelle.count", &v), ACP_OK);
  CHECK_CLOSE(v, 2.0, 0, 0, "light twin nacelles");
  /* the same text through load and parse */
  write_temp(path, GOOD, strlen(GOOD));
  assert_int_equal(acp_aircraft_load(ac, path, err, sizeof err), ACP_OK);
  assert_int_equal(acp_aircraft_get(ac, "wing_area", &v), ACP_OK);
  CHECK_CLOSE(v, 30.5, 0, 0, "loaded");
  remove(path);
  /* a line longer than the buffer */
  char *big = malloc(ACP_AIRCRAFT_LINE_MAX + 100);
  assert_non_null(big);
  strcpy(big, "wing_area = 30\n");
  memset(big + 15, ' ', ACP_AIRCRAFT_LINE_MAX + 10);
  write_temp(path, big, 15 + ACP_AIRCRAFT_LINE_MAX + 10);
  free(big);
  assert_int_equal(acp_aircraft_load(ac, path, err, sizeof err), ACP_ERR_PARSE);
  assert_non_null(strstr(err, "line 2: line longer than"));
  remove(path);
  /* a NUL byte; an error on a later line */
  write_temp(path, "wing_area = 30\nspan\0 = 1\n", 25);
  assert_int_equal(acp_aircraft_load(ac, path, err, sizeof err), ACP_ERR_PARSE);
  assert_non_null(strstr(err, "line 2: NUL"));
  remove(path);
  write_temp(path, "wing_area = 30\n\n\n# x\nspan = 500\n", 31);
  assert_int_equal(acp_aircraft_load(ac, path, err, sizeof err), ACP_ERR_PARSE);
  assert_non_null(strstr(err, "line 5: key 'span'"));
  remove(path);
  /* no file */
  assert_int_equal(acp_aircraft_load(ac, "/nonexistent/acperf.toml", err, sizeof err), ACP_ERR_IO);
  assert_non_null(strstr(err, "cannot open"));
  assert_int_equal(acp_aircraft_load(ac, NULL, err, sizeof err), ACP_ERR_INVALID);
  assert_int_equal(acp_aircraft_load(NULL, "x", err, sizeof err), ACP_ERR_INVALID);
  acp_aircraft_free(ac);
}

/* What is not a regular file is refused before anything is read from it
   (contract: aircraft.h): a FIFO without a writer (POSIX: open() without
   O_NONBLOCK and read() wait for a writer, so the load blocked for good), a
   directory, a character device. alarm(): a load that blocks fails the test
   instead of hanging it. */
static void test_load_not_regular(void **state) {
  (void)state;
#if defined(__unix__) || defined(__APPLE__)
  acp_aircraft *ac = acp_aircraft_new();
  char dir[] = "/tmp/acperf_fifo_XXXXXX", fifo[64], err[256];
  assert_non_null(mkdtemp(dir));
  snprintf(fifo, sizeof fifo, "%s/aircraft.toml", dir);
  assert_int_equal(mkfifo(fifo, 0600), 0);
  alarm(20);
  const char *const paths[] = {fifo, dir, "/dev/null"};
  for (size_t i = 0; i < 3; ++i) {
    err[0] = '\0';
    const int st = acp_aircraft_load(ac, paths[i], err, sizeof err);
    if (st != ACP_ERR_IO || !strstr(err, "is not a regular file"))
      print_error("%s: status %d, \"%s\"\n", paths[i], st, err);
    assert_int_equal(st, ACP_ERR_IO);
    assert_non_null(strstr(err, "is not a regular file"));
  }
  alarm(0);
  assert_int_equal(remove(fifo), 0);
  assert_int_equal(rmdir(dir), 0);
  acp_aircraft_free(ac);
#else
  skip(); /* no FIFOs outside POSIX */
#endif
}

/* Fuzz-ish: every prefix of a good file and single-byte corruptions never
   crash and give a status (sanitizers and valgrind watch the memory). */
static void test_parse_fuzz(void **state) {
  (void)state;
  acp_aircraft *ac = acp_aircraft_new();
  char err[128];
  char buf[512];
  const size_t n = strlen(BUILDUP);
  assert_true(n < sizeof buf);
  for (size_t cut = 0; cut <= n; ++cut) {
    memcpy(buf, BUILDUP, cut);
    buf[cut] = '\0';
    const int st = acp_aircraft_parse(ac, buf, err, sizeof err);
    assert_true(st == ACP_OK || st == ACP_ERR_PARSE);
  }
  static const char bytes[] = {'[', ']', '=', '"', '\'', '#', '.', '\n', ' ', '0', 'e', '-', '\t',
                               '\x7f', '\xff'};
  for (size_t pos = 0; pos < n; pos += 3)
    for (size_t b = 0; b < sizeof bytes; ++b) {
      memcpy(buf, BUILDUP, n + 1);
      buf[pos] = bytes[b];
      const int st = acp_aircraft_parse(ac, buf, err, sizeof err);
      assert_true(st == ACP_OK || st == ACP_ERR_PARSE);
      if (st == ACP_ERR_PARSE) assert_true(strlen(err) > 0);
    }
  acp_aircraft_free(ac);
}

int main(void) {
  const struct CMUnitTest tests[] = {
      cmocka_unit_test(test_model_keys),   cmocka_unit_test(test_key_listing_and_copy),
      cmocka_unit_test(test_changed_model_drags_as_a_fresh_one),
      cmocka_unit_test(test_parse_good),   cmocka_unit_test(test_parse_errors),
      cmocka_unit_test(test_load),         cmocka_unit_test(test_load_not_regular),
      cmocka_unit_test(test_parse_like_tomllib), cmocka_unit_test(test_parse_fuzz),
  };
  return cmocka_run_group_tests(tests, NULL, NULL);
}
