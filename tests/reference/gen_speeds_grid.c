/*
 * Writes tests/reference/speeds_grid.csv: acp_speeds() of the library itself
 * over a grid of masses, altitudes and ISA deviations for three aircraft (the
 * two invented demo aircraft and a plain parabolic polar, PLAIN_AIRCRAFT
 * below). A REGRESSION TABLE, not an outside reference: the values are the
 * library's own outputs before the speed-up of issue 14 (the 121-speed
 * tabulation and slope bisection of commit 1f944b0), kept so that a faster
 * method can be held to them (tests/c/test_speeds_regression.c, 1e-6
 * relative per speed, same status). The outside references of the speeds
 * (closed forms of the parabolic polar) are in tests/c/test_speeds.c.
 *
 * Build and run from the top of the repository, against a built library:
 *   cc -std=c11 -O2 -Ilibperf/include -Ibuild-test/libperf/include \
 *      tests/reference/gen_speeds_grid.c -Lbuild-test/libperf -lacperf -lm \
 *      -o /tmp/gen_speeds_grid
 *   LD_LIBRARY_PATH=build-test/libperf /tmp/gen_speeds_grid examples/aircraft \
 *      > tests/reference/speeds_grid.csv
 *
 * Grid per aircraft: 5 masses evenly from the operating empty mass to the
 * maximum take-off mass, 6 pressure altitudes evenly from 0 to max_altitude,
 * ISA deviations -30, -10, +15, +30 K (120 points), and 5 points beyond it for
 * the statuses (edges()); 375 in all.
 */
#include <acperf.h>
#include <math.h>
#include <stdio.h>

/* The plain aircraft: a parabolic polar with a single cd0 (no build-up, no
   wave drag), with mass and altitude ranges of its own for the grid. */
#define PLAIN_AIRCRAFT                                                                      \
  "wing_area = 30\nspan = 15\ncd0 = 0.02\noswald = 0.8\ncl_max = 1.5\n"                     \
  "mass_operating_empty = 3000\nmass_max_takeoff = 12000\nmax_altitude = 11000\n"

static const double DTEMPS[] = {-30.0, -10.0, 15.0, 30.0};

static void row(const char *label, const acp_aircraft *ac, double mass, double hp, double dtemp) {
  acp_speed_set s;
  const int st = acp_speeds(ac, mass, hp, dtemp, &s);
  printf("%s,%.17g,%.17g,%.17g,%d,%.17g,%.17g,%.17g,%.17g,%.17g\n", label, mass, hp, dtemp, st,
         s.vmd, s.vmp, s.vmr, s.vs1g, s.ld_max);
}

/* Beyond the grid, for the statuses: heavy and high (VMR past Mach 0.95
   without wave drag), above the atmosphere model, a NaN mass. */
static void edges(const char *label, const acp_aircraft *ac, double m_hi, double h_hi) {
  row(label, ac, 2.0 * m_hi, h_hi, 0.0);
  row(label, ac, 3.0 * m_hi, h_hi + 4000.0, 30.0);
  row(label, ac, m_hi, h_hi + 8000.0, -30.0);
  row(label, ac, m_hi, 1.0e6, 0.0);
  row(label, ac, (double)NAN, 0.0, 0.0);
}

static int grid(const char *label, const acp_aircraft *ac) {
  double m_lo, m_hi, h_hi;
  if (acp_aircraft_get(ac, "mass_operating_empty", &m_lo) != ACP_OK ||
      acp_aircraft_get(ac, "mass_max_takeoff", &m_hi) != ACP_OK ||
      acp_aircraft_get(ac, "max_altitude", &h_hi) != ACP_OK)
    return 1;
  for (int i = 0; i < 5; ++i)
    for (int j = 0; j < 6; ++j)
      for (size_t k = 0; k < sizeof DTEMPS / sizeof DTEMPS[0]; ++k)
        row(label, ac, m_lo + (m_hi - m_lo) * i / 4.0, h_hi * j / 5.0, DTEMPS[k]);
  edges(label, ac, m_hi, h_hi);
  return 0;
}

int main(int argc, char **argv) {
  if (argc != 2) return 2;
  static const char *const files[] = {"regional_jet.toml", "light_twin.toml"};
  printf("# Regression table: acp_speeds() outputs of acperf itself before the speed-up of\n"
         "# issue 14 (tabulation and bisection, commit 1f944b0); not an outside reference.\n"
         "# Made by tests/reference/gen_speeds_grid.c (plain = the parabolic polar named there).\n"
         "# TAS m/s; mass kg; hp m; dtemp K; status an acp_status code; nan where not given.\n");
  printf("aircraft,mass,hp,dtemp,status,vmd,vmp,vmr,vs1g,ld_max\n");
  for (size_t f = 0; f < 2; ++f) {
    char path[1024], err[256];
    snprintf(path, sizeof path, "%s/%s", argv[1], files[f]);
    acp_aircraft *ac = acp_aircraft_new();
    if (!ac || acp_aircraft_load(ac, path, err, sizeof err) != ACP_OK || grid(files[f], ac)) {
      fprintf(stderr, "%s: %s\n", path, err);
      return 1;
    }
    acp_aircraft_free(ac);
  }
  acp_aircraft *ac = acp_aircraft_new();
  char err[256];
  if (!ac || acp_aircraft_parse(ac, PLAIN_AIRCRAFT, err, sizeof err) != ACP_OK ||
      grid("plain", ac)) {
    fprintf(stderr, "plain: %s\n", err);
    return 1;
  }
  acp_aircraft_free(ac);
  return 0;
}
