/* Source of the check values: the library's own earlier outputs (a regression
   table, not an outside reference; named as such in the file's header).

   acp_speeds() against a REGRESSION TABLE: tests/reference/speeds_grid.csv holds
   the library's own outputs before the speed-up of issue 14 (the 121-speed
   tabulation and slope bisection), made by tests/reference/gen_speeds_grid.c
   over a grid of masses, altitudes and ISA deviations of both demo aircraft and
   a plain parabolic polar. It is not an outside reference (those, the closed
   forms of the parabolic polar, are in test_speeds.c): it holds a faster method
   to the results before it, every speed to 1e-6 relative (issue 14's
   accuracy target) and the same status, NaN where the table has NaN. */
#include "check.h"
#include "fixtures.h"

#include <acperf.h>
#include <stdlib.h>
#include <string.h>

/* The plain aircraft of gen_speeds_grid.c (PLAIN_AIRCRAFT there). */
static const char *PLAIN =
    "wing_area = 30\nspan = 15\ncd0 = 0.02\noswald = 0.8\ncl_max = 1.5\n"
    "mass_operating_empty = 3000\nmass_max_takeoff = 12000\nmax_altitude = 11000\n";

#define REL_TOL 1e-6 /* issue 14: the same accuracy as before, 1e-6 relative per speed */

static acp_aircraft *aircraft_named(const char *label) {
  return strcmp(label, "plain") == 0 ? aircraft_from_text(PLAIN) : aircraft_from_example(label);
}

static void test_against_table(void **state) {
  (void)state;
  FILE *f = fopen(ACP_TEST_DATA_DIR "/speeds_grid.csv", "r");
  assert_non_null(f);
  char line[512], current[40] = "";
  acp_aircraft *ac = NULL;
  size_t rows = 0, fails = 0;
  double worst = 0.0;
  while (fgets(line, sizeof line, f)) {
    if (line[0] == '#' || strncmp(line, "aircraft,", 9) == 0) continue;
    const char *comma = strchr(line, ',');
    assert_non_null(comma);
    char label[sizeof current];
    const size_t len = (size_t)(comma - line);
    assert_true(len < sizeof label);
    memcpy(label, line, len);
    label[len] = '\0';
    if (strcmp(label, current) != 0) {
      acp_aircraft_free(ac);
      ac = aircraft_named(label);
      memcpy(current, label, len + 1);
    }
    const char *p = comma + 1;
    double v[9];
    for (int i = 0; i < 9; ++i) {
      char *end;
      v[i] = strtod(p, &end);
      assert_true(end != p);
      p = end + (*end == ',');
    }
    acp_speed_set s;
    const int st = acp_speeds(ac, v[0], v[1], v[2], &s);
    const double got[5] = {s.vmd, s.vmp, s.vmr, s.vs1g, s.ld_max};
    static const char *const names[5] = {"vmd", "vmp", "vmr", "vs1g", "ld_max"};
    int bad = st != (int)v[3];
    for (int i = 0; i < 5; ++i) {
      const double want = v[4 + i];
      if (isnan(want) || isnan(got[i])) {
        bad |= isnan(want) != isnan(got[i]);
        continue;
      }
      const double rel = fabs(got[i] - want) / fabs(want);
      if (rel > worst) worst = rel;
      if (rel > REL_TOL) {
        print_error("%s m %g hp %g dT %g %s: %.17g, table %.17g (rel %.3g)\n", current, v[0],
                    v[1], v[2], names[i], got[i], want, rel);
        bad = 1;
      }
    }
    if (bad && st != (int)v[3])
      print_error("%s m %g hp %g dT %g: status %d, table %d\n", current, v[0], v[1], v[2], st,
                  (int)v[3]);
    fails += (size_t)bad;
    ++rows;
  }
  fclose(f);
  acp_aircraft_free(ac);
  print_message("speeds_grid.csv: %zu rows, largest relative difference %.3g\n", rows, worst);
  assert_true(rows >= 300);
  assert_int_equal(fails, 0);
}

int main(void) {
  const struct CMUnitTest tests[] = {cmocka_unit_test(test_against_table)};
  return cmocka_run_group_tests(tests, NULL, NULL);
}
