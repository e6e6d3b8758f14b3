/*
 * acperf demo: a performance report for an invented operator's invented day.
 *
 * Kestrel Coast Airways (an invented operator) plans a morning departure from
 * an invented aerodrome at 1,150 ft elevation on a cold day. Every figure below
 * is an engineering estimate, not approved flight-manual data.
 */
#include <acperf.h>
#include <stdio.h>

static const char *CAUTION =
    "CAUTION: engineering estimates for study and planning support only. These are\n"
    "not approved flight-manual data. For operational use rely on the aircraft's\n"
    "approved data, the operator's approved procedures and the rules of the local\n"
    "aviation authority.\n";

/* The invented day: aerodrome and upper-air temperatures as ISA deviations. */
#define AERODROME_ELEVATION_FT 1150.0
#define AERODROME_OAT_C (-2.0)
#define AERODROME_QNH_HPA 1002.0
#define CLIMB_CAS_KT 290.0
#define CLIMB_MACH 0.76
#define LOW_ALTITUDE_CAS_KT 250.0

/* ISA deviation of the invented day at a flight level: -14 K near the ground,
   easing to -4 K in the stratosphere. */
static double day_dtemp(double fl) { return fl < 100.0 ? -14.0 : (fl < 300.0 ? -9.0 : -4.0); }

static void print_day(void) {
  const double elev = acp_ft_to_m(AERODROME_ELEVATION_FT);
  const double oat = acp_degc_to_k(AERODROME_OAT_C);
  double hp = 0.0, corr = 0.0;
  printf("== Operating day ==\n");
  printf("Aerodrome elevation %.0f ft, OAT %.0f degC, QNH %.0f hPa\n", AERODROME_ELEVATION_FT,
         AERODROME_OAT_C, AERODROME_QNH_HPA);
  if (acp_pressure_altitude_from_qnh(elev, acp_hpa_to_pa(AERODROME_QNH_HPA), &hp) == ACP_OK)
    printf("Aerodrome pressure altitude      %8.0f ft\n", acp_m_to_ft(hp));
  printf("ISA deviation at the aerodrome   %8.1f K\n", acp_isa_deviation(oat, hp));
  printf("Density altitude                 %8.0f ft\n",
         acp_m_to_ft(acp_density_altitude(hp, acp_isa_deviation(oat, hp))));
  const double heights_ft[] = {1000.0, 2000.0, 3000.0};
  for (size_t i = 0; i < sizeof heights_ft / sizeof heights_ft[0]; ++i) {
    int st = acp_cold_temperature_correction(acp_ft_to_m(heights_ft[i]), elev, oat, &corr);
    printf("Cold-temperature correction at %4.0f ft above aerodrome: %s%4.0f ft\n",
           heights_ft[i], st == ACP_OK ? "+" : "", acp_m_to_ft(corr));
  }
  printf("\n");
}

static void print_atmosphere_table(void) {
  printf("== Atmosphere and climb speeds (%.0f KCAS below FL100, then %.0f KCAS / M%.2f) ==\n",
         LOW_ALTITUDE_CAS_KT, CLIMB_CAS_KT, CLIMB_MACH);
  double crossover = 0.0;
  const int xst = acp_crossover_altitude(acp_kt_to_mps(CLIMB_CAS_KT), CLIMB_MACH, &crossover);
  printf("%5s %7s %7s %7s %8s %9s %8s %7s %7s %6s\n", "FL", "ISAdev", "OAT", "p", "density",
         "a", "CAS", "TAS", "Mach", "mode");
  printf("%5s %7s %7s %7s %8s %9s %8s %7s %7s %6s\n", "", "K", "degC", "hPa", "kg/m3", "kt",
         "kt", "kt", "", "");
  for (double fl = 0.0; fl <= 410.0; fl += 30.0) {
    const double hp = acp_fl_to_m(fl), dt = day_dtemp(fl);
    acp_atmos a;
    if (acp_isa(hp, dt, &a) != ACP_OK) continue;
    const char *mode = "CAS";
    double cas = acp_kt_to_mps(fl < 100.0 ? LOW_ALTITUDE_CAS_KT : CLIMB_CAS_KT);
    if (xst == ACP_OK && fl >= 100.0 && hp >= crossover) {
      cas = acp_mach_to_cas(CLIMB_MACH, hp);
      mode = "Mach";
    }
    printf("%5.0f %7.1f %7.1f %7.1f %8.4f %9.1f %8.1f %7.1f %7.3f %6s\n", fl, dt,
           acp_k_to_degc(a.temperature), acp_pa_to_hpa(a.pressure), a.density,
           acp_mps_to_kt(a.sound_speed), acp_mps_to_kt(cas),
           acp_mps_to_kt(acp_cas_to_tas(cas, hp, dt)), acp_cas_to_mach(cas, hp), mode);
  }
  if (xst == ACP_OK)
    printf("Crossover altitude of %.0f KCAS / M%.2f: %.0f ft (FL%.0f)\n", CLIMB_CAS_KT,
           CLIMB_MACH, acp_m_to_ft(crossover), acp_m_to_fl(crossover));
  printf("\n");
}

static void print_winds(void) {
  printf("== Cruise wind triangle at M%.2f, FL350 ==\n", CLIMB_MACH);
  const double hp = acp_fl_to_m(350.0);
  const double tas = acp_mach_to_tas(CLIMB_MACH, hp, day_dtemp(350.0));
  const double winds[][2] = {{270.0, 60.0}, {90.0, 60.0}, {180.0, 45.0}};
  printf("%-22s %8s %8s %8s\n", "wind (from / kt)", "GS kt", "HDG", "drift");
  for (size_t i = 0; i < sizeof winds / sizeof winds[0]; ++i) {
    double gs, hdg, drift;
    if (acp_wind_triangle(tas, acp_deg_to_rad(90.0), acp_deg_to_rad(winds[i][0]),
                          acp_kt_to_mps(winds[i][1]), &gs, &hdg, &drift) != ACP_OK)
      continue;
    printf("%03.0f / %-16.0f %8.1f %8.1f %8.1f\n", winds[i][0], winds[i][1], acp_mps_to_kt(gs),
           acp_rad_to_deg(hdg), acp_rad_to_deg(drift) + 0.0);
  }
  printf("(track 090 true, TAS %.1f kt)\n\n", acp_mps_to_kt(tas));
}

int main(void) {
  printf("acperf %s performance report: Kestrel Coast Airways (invented operator)\n\n",
         acp_version_string());
  printf("%s\n", CAUTION);
  print_day();
  print_atmosphere_table();
  print_winds();
  printf("%s", CAUTION);
  return 0;
}
