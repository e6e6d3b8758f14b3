/* Aircraft models for the cmocka tests: from text, or from the invented demo
   files in examples/aircraft (ACP_EXAMPLES_DIR). Fail the test on any error.
   No check values here: the invented aircraft are demo data, and each test names
   the source (closed form, handbook formula, common practice) of what it checks. */
#ifndef ACPERF_TEST_FIXTURES_H
#define ACPERF_TEST_FIXTURES_H

#include <acperf.h>

#include "check.h"

static inline acp_aircraft *aircraft_from_text(const char *text) {
  acp_aircraft *ac = acp_aircraft_new();
  char err[256];
  assert_non_null(ac);
  const int st = acp_aircraft_parse(ac, text, err, sizeof err);
  if (st != ACP_OK) print_error("parse: %s\n", err);
  assert_int_equal(st, ACP_OK);
  return ac;
}

static inline acp_aircraft *aircraft_from_example(const char *name) {
  char path[512], err[256];
  snprintf(path, sizeof path, "%s/aircraft/%s", ACP_EXAMPLES_DIR, name);
  acp_aircraft *ac = acp_aircraft_new();
  assert_non_null(ac);
  const int st = acp_aircraft_load(ac, path, err, sizeof err);
  if (st != ACP_OK) print_error("%s: %s\n", path, err);
  assert_int_equal(st, ACP_OK);
  return ac;
}

/* A copy of an aircraft without its mass, altitude and speed limits, for
   tests of the physics beyond the envelope (thrust, ceilings, stall). */
static inline acp_aircraft *aircraft_without_limits(const acp_aircraft *src) {
  static const char *const keys[] = {"mass_max_takeoff", "mass_max_landing", "mass_max_zero_fuel",
                                     "mass_operating_empty", "fuel_capacity", "max_altitude"};
  acp_aircraft *ac = acp_aircraft_new();
  assert_non_null(ac);
  assert_int_equal(acp_aircraft_copy(ac, src), ACP_OK);
  for (size_t i = 0; i < sizeof keys / sizeof keys[0]; ++i)
    assert_int_equal(acp_aircraft_unset(ac, keys[i]), ACP_OK);
  return ac;
}

#endif /* ACPERF_TEST_FIXTURES_H */
