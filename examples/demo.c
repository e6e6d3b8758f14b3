/*
 * acperf demo: a performance report for an invented operator's invented day.
 *
 * Kestrel Coastal Airways (an invented operator) plans a morning departure of
 * its invented regional jet from an invented aerodrome at 1,150 ft elevation on
 * a cold day. Every figure below is an engineering estimate, not approved
 * flight-manual data.
 *
 * usage: acperf_demo [aircraft.toml [output-directory]]
 * Prints the report and writes CSV tables and an SVG drag chart to the output
 * directory (default ./acperf-report).
 */
#include <acperf.h>
#include <errno.h>
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <sys/stat.h>

#include "demo_chart.h"

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
           acp_rad_to_deg(hdg), fabs(drift) < 1e-9 ? 0.0 : acp_rad_to_deg(drift));
  }
  printf("(track 090 true, TAS %.1f kt)\n\n", acp_mps_to_kt(tas));
}

/* ---- output files ------------------------------------------------------ */

static char out_dir[512];

static FILE *open_output(const char *name) {
  char path[768];
  snprintf(path, sizeof path, "%s/%s", out_dir, name);
  FILE *f = fopen(path, "w");
  if (!f) fprintf(stderr, "acperf_demo: cannot write %s: %s\n", path, strerror(errno));
  return f;
}

static void close_output(FILE *f, const char *name) {
  if (f && fclose(f) == 0) printf("(written: %s/%s)\n", out_dir, name);
}

/* ---- the aircraft ------------------------------------------------------ */

#define FT ACP_FT
#define CRUISE_FL 350.0
#define CLIMB_MASS 38000.0

static void print_aircraft(const acp_aircraft *ac) {
  char name[ACP_AIRCRAFT_NAME_MAX];
  double s, b, ar, mtom, oew;
  acp_aircraft_get_text(ac, "name", name, sizeof name);
  acp_aircraft_get(ac, "wing_area", &s);
  acp_aircraft_get(ac, "span", &b);
  acp_aircraft_get(ac, "aspect_ratio", &ar);
  acp_aircraft_get(ac, "mass_max_takeoff", &mtom);
  acp_aircraft_get(ac, "mass_operating_empty", &oew);
  printf("== Aircraft: %s ==\n", name);
  printf("wing %.1f m2, span %.1f m, aspect ratio %.2f; MTOM %.0f kg, OEM %.0f kg\n\n", s, b, ar,
         mtom, oew);
}

/* Drag split by origin and by component at a cruise point. */
static void print_drag_breakdown(const acp_aircraft *ac) {
  const double mass = 34000.0, hp = acp_fl_to_m(CRUISE_FL), dt = day_dtemp(CRUISE_FL);
  const double tas = acp_mach_to_tas(0.78, hp, dt);
  acp_drag_parts d;
  if (acp_drag(ac, mass, hp, dt, tas, &d) != ACP_OK) return;
  printf("== Drag breakdown: %.0f kg, FL%.0f, M0.78 (%.0f KTAS), ISA%+.0f ==\n", mass, CRUISE_FL,
         acp_mps_to_kt(tas), dt);
  const char *names[] = {"friction", "form", "interference", "parasite", "induced", "wave",
                         "total"};
  const double v[] = {d.friction, d.form, d.interference, d.parasite, d.induced, d.wave, d.total};
  for (int i = 0; i < 7; ++i)
    printf("  %-13s %8.2f kN  %5.1f %%\n", names[i], v[i] / 1000.0, 100.0 * v[i] / d.total);
  printf("  L/D %.1f\n", mass * ACP_G0 / d.total);
  printf("  by component (parasite, kN):");
  char comp[ACP_COMPONENT_NAME_MAX];
  for (size_t i = 0; acp_aircraft_component(ac, i, comp, sizeof comp) == ACP_OK; ++i) {
    acp_component_drag cd;
    if (acp_drag_component(ac, i, hp, dt, tas, &cd) == ACP_OK)
      printf(" %s %.2f;", comp, cd.parasite / 1000.0);
  }
  printf("\n\n");
}

static void print_speeds(const acp_aircraft *ac) {
  const double masses[] = {30000.0, 36000.0, 40000.0};
  const double levels[] = {100.0, 250.0, 350.0};
  FILE *csv = open_output("speeds.csv");
  if (csv)
    fprintf(csv, "mass_kg,flight_level,isa_dev_K,vmd_kcas,vmp_kcas,vmr_kcas,vs1g_kcas,"
                 "vmr_mach,ld_max,vmr_over_vmd\n");
  printf("== Characteristic speeds (KCAS; VMR also as Mach) ==\n");
  printf("%8s %5s %6s %6s %6s %6s %7s %7s %8s\n", "mass kg", "FL", "VMD", "VMP", "VMR", "VS1G",
         "M(VMR)", "L/Dmax", "VMR/VMD");
  for (size_t i = 0; i < 3; ++i)
    for (size_t j = 0; j < 3; ++j) {
      const double hp = acp_fl_to_m(levels[j]), dt = day_dtemp(levels[j]);
      acp_speed_set cas, tas, mach;
      /* a speed not found (VMR beyond the drag model) is NaN: print what there is */
      acp_speeds_cas(ac, masses[i], hp, dt, &cas);
      acp_speeds(ac, masses[i], hp, dt, &tas);
      acp_speeds_mach(ac, masses[i], hp, dt, &mach);
      printf("%8.0f %5.0f %6.0f %6.0f %6.0f %6.0f %7.3f %7.2f %8.3f\n", masses[i], levels[j],
             acp_mps_to_kt(cas.vmd), acp_mps_to_kt(cas.vmp), acp_mps_to_kt(cas.vmr),
             acp_mps_to_kt(cas.vs1g), mach.vmr, tas.ld_max, tas.vmr / tas.vmd);
      if (csv)
        fprintf(csv, "%.0f,%.0f,%.1f,%.3f,%.3f,%.3f,%.3f,%.5f,%.4f,%.5f\n", masses[i], levels[j],
                dt, acp_mps_to_kt(cas.vmd), acp_mps_to_kt(cas.vmp), acp_mps_to_kt(cas.vmr),
                acp_mps_to_kt(cas.vs1g), mach.vmr, tas.ld_max, tas.vmr / tas.vmd);
    }
  printf("(VMR/VMD is about 1.32 on a parabolic polar, common practice; less where wave drag "
         "bites)\n");
  close_output(csv, "speeds.csv");
  printf("\n");
}

/* The drag curve at one condition: CSV and SVG, VMD/VMR marked, unstable side shaded. */
static void write_drag_curve(const acp_aircraft *ac) {
  enum { N = 90 };
  const double mass = 36000.0, fl = 250.0, hp = acp_fl_to_m(fl), dt = day_dtemp(fl);
  acp_speed_set sp;
  acp_speeds(ac, mass, hp, dt, &sp);
  double tas[N], kcas[N], par[N], ind[N], wave[N], tot[N];
  const double v0 = sp.vs1g, v1 = acp_mach_to_tas(0.85, hp, dt);
  for (int i = 0; i < N; ++i) tas[i] = v0 + (v1 - v0) * i / (N - 1);
  acp_drag_curve(ac, mass, hp, dt, N, tas, par, ind, wave, tot);
  for (int i = 0; i < N; ++i) {
    kcas[i] = acp_mps_to_kt(acp_tas_to_cas(tas[i], hp, dt));
    par[i] /= 1000.0;
    ind[i] /= 1000.0;
    wave[i] /= 1000.0;
    tot[i] /= 1000.0;
  }
  const double vmd = acp_mps_to_kt(acp_tas_to_cas(sp.vmd, hp, dt));
  const double vmr = acp_mps_to_kt(acp_tas_to_cas(sp.vmr, hp, dt));
  acp_stability lo, hi;
  acp_speed_stability(ac, mass, hp, dt, 0.9 * sp.vmd, &lo);
  acp_speed_stability(ac, mass, hp, dt, 1.1 * sp.vmd, &hi);
  printf("== Drag curve and speed stability, %.0f kg, FL%.0f ==\n", mass, fl);
  printf("VMD %.0f KCAS, VMR %.0f KCAS. dD/dV at 0.9 VMD: %.0f N per m/s (%s); at 1.1 VMD: "
         "%+.0f N per m/s (%s)\n", vmd, vmr, lo.slope, lo.stable < 0 ? "speed unstable" : "stable",
         hi.slope, hi.stable > 0 ? "speed stable" : "unstable");
  FILE *csv = open_output("drag_curve.csv");
  if (csv) {
    fprintf(csv, "kcas,ktas,parasite_kN,induced_kN,wave_kN,total_kN,speed_stable\n");
    for (int i = 0; i < N; ++i)
      fprintf(csv, "%.3f,%.3f,%.5f,%.5f,%.5f,%.5f,%d\n", kcas[i], acp_mps_to_kt(tas[i]), par[i],
              ind[i], wave[i], tot[i], kcas[i] > vmd ? 1 : 0);
  }
  close_output(csv, "drag_curve.csv");
  char title[160];
  snprintf(title, sizeof title, "Drag of the invented regional jet, %.0f kg, FL%.0f, ISA%+.0f", mass,
           fl, dt);
  const drag_chart chart = {title, N, kcas, par, ind, tot, vmd, vmr, vmd, "calibrated airspeed (kt)"};
  FILE *svg = open_output("drag_curve.svg");
  if (svg && write_drag_chart_svg(svg, &chart) != 0) fprintf(stderr, "acperf_demo: SVG failed\n");
  close_output(svg, "drag_curve.svg");
  printf("\n");
}

static void write_profile_csv(const char *name, const acp_profile_point *p, size_t n) {
  FILE *csv = open_output(name);
  if (!csv) return;
  fprintf(csv, "time_min,distance_nm,pressure_altitude_ft,mass_kg,kcas,ktas,mach,rate_fpm,"
               "thrust_kN,drag_kN,fuel_flow_kg_h,acceleration_factor,mode\n");
  for (size_t i = 0; i < n; ++i)
    fprintf(csv, "%.4f,%.4f,%.2f,%.2f,%.3f,%.3f,%.5f,%.1f,%.4f,%.4f,%.2f,%.5f,%.0f\n",
            p[i].time / 60.0, acp_m_to_nm(p[i].distance), acp_m_to_ft(p[i].hp), p[i].mass,
            acp_mps_to_kt(p[i].cas), acp_mps_to_kt(p[i].tas), p[i].mach, acp_mps_to_fpm(p[i].rate),
            p[i].thrust / 1000.0, p[i].drag / 1000.0, p[i].fuel_flow * 3600.0,
            p[i].acceleration_factor, p[i].mode);
  close_output(csv, name);
}

static void print_profile(const char *what, int st, const acp_profile *p) {
  if (st != ACP_OK) {
    printf("%s: %s\n", what, acp_strerror(st));
    return;
  }
  printf("%s: %.1f min, %.1f NM, %.0f kg fuel (level speed change %.1f min, %.1f NM, %.0f kg)\n",
         what, p->time / 60.0, acp_m_to_nm(p->distance), p->fuel, p->speed_change_time / 60.0,
         acp_m_to_nm(p->speed_change_distance), p->speed_change_fuel);
}

static void print_climb_descent(const acp_aircraft *ac, double hp_origin) {
  static acp_profile_point pts[1024];
  size_t n = 0;
  acp_profile p;
  const double dt = -9.0, top = acp_fl_to_m(CRUISE_FL);
  printf("== Climb and descent (ISA%+.0f, no wind, climb 290 KCAS / M0.76 above 250 KCAS "
         "below 10,000 ft) ==\n", dt);
  int st = acp_climb_trace(ac, CLIMB_MASS, hp_origin + 1500.0 * FT, top, dt, 0.0, 0.0, 1024, pts,
                           &n, &p);
  print_profile("climb from 1,500 ft above the aerodrome to FL350", st, &p);
  if (st == ACP_OK) write_profile_csv("climb.csv", pts, n);
  acp_ceiling_set c;
  if (acp_ceilings(ac, CLIMB_MASS, dt, &c) == ACP_OK)
    printf("at %.0f kg: service ceiling FL%.0f, 300 ft/min FL%.0f, 1.3 g buffet FL%.0f, "
           "maximum cruise FL%.0f, optimum (SAR at M0.78) FL%.0f\n", CLIMB_MASS,
           acp_m_to_fl(c.service_ceiling), acp_m_to_fl(c.max_climb_altitude),
           acp_m_to_fl(c.buffet_altitude), acp_m_to_fl(c.max_cruise_altitude),
           acp_m_to_fl(c.optimum_altitude));
  st = acp_descent_trace(ac, 33000.0, top, hp_origin + 1500.0 * FT, dt, 0.0, 0.0, 1024, pts, &n, &p);
  print_profile("idle descent from FL350 to 1,500 ft above the aerodrome", st, &p);
  if (st == ACP_OK) {
    printf("  %.2f NM per 1,000 ft (rule of thumb about 3, common practice)\n",
           acp_m_to_nm(p.distance) / (acp_m_to_ft(top - hp_origin - 1500.0 * FT) / 1000.0));
    write_profile_csv("descent.csv", pts, n);
  }
  printf("\n");
}

/* Specific air range over masses and flight levels at the fixed cruise Mach and
   in long-range cruise, and the speeds of every cruise mode at one condition. */
static void print_cruise(const acp_aircraft *ac) {
  const double masses[] = {30000.0, 34000.0, 38000.0};
  const double levels[] = {290.0, 330.0, 350.0, 370.0};
  FILE *csv = open_output("sar.csv");
  if (csv) fprintf(csv, "mass_kg,flight_level,isa_dev_K,mode,mach,ktas,sar_nm_per_1000kg,fuel_flow_kg_h\n");
  printf("== Cruise: specific air range, NM per 1,000 kg (no wind) ==\n");
  printf("%8s %5s %14s %14s\n", "mass kg", "FL", "M0.78", "long-range");
  for (size_t i = 0; i < 3; ++i)
    for (size_t j = 0; j < 4; ++j) {
      const double hp = acp_fl_to_m(levels[j]), dt = day_dtemp(levels[j]);
      acp_cruise_point fixed, lrc;
      const int a = acp_cruise_speed(ac, ACP_CRUISE_FIXED_MACH, 0.0, masses[i], hp, dt, 0.0, &fixed);
      const int b = acp_cruise_speed(ac, ACP_CRUISE_LONG_RANGE, 0.0, masses[i], hp, dt, 0.0, &lrc);
      char t1[32] = "(no level flight)", t2[32] = "(no level flight)";
      if (a == ACP_OK) snprintf(t1, sizeof t1, "%.1f", acp_m_to_nm(fixed.sar) * 1000.0);
      if (b == ACP_OK)
        snprintf(t2, sizeof t2, "%.1f (M%.3f)", acp_m_to_nm(lrc.sar) * 1000.0, lrc.mach);
      printf("%8.0f %5.0f %14s %14s\n", masses[i], levels[j], t1, t2);
      const acp_cruise_point *pts[] = {&fixed, &lrc};
      const int st[] = {a, b};
      const char *modes[] = {"fixed_mach", "long_range"};
      for (int k = 0; k < 2 && csv; ++k)
        if (st[k] == ACP_OK)
          fprintf(csv, "%.0f,%.0f,%.1f,%s,%.5f,%.3f,%.4f,%.2f\n", masses[i], levels[j], dt,
                  modes[k], pts[k]->mach, acp_mps_to_kt(pts[k]->tas),
                  acp_m_to_nm(pts[k]->sar) * 1000.0, pts[k]->fuel_flow * 3600.0);
    }
  close_output(csv, "sar.csv");
  const double hp = acp_fl_to_m(CRUISE_FL), dt = day_dtemp(CRUISE_FL), mass = 36000.0;
  const struct { int mode; double ci; const char *name; } modes[] = {
      {ACP_CRUISE_MAX_ENDURANCE, 0.0, "maximum endurance (holding)"},
      {ACP_CRUISE_MAX_RANGE, 0.0, "maximum range"},
      {ACP_CRUISE_LONG_RANGE, 0.0, "long-range cruise (99 % of max SAR)"},
      {ACP_CRUISE_ECONOMY, 30.0, "economy, cost index 30 kg/min"},
      {ACP_CRUISE_FIXED_MACH, 0.0, "fixed Mach (cruise_mach)"}};
  printf("speed modes at %.0f kg, FL%.0f:\n", mass, CRUISE_FL);
  for (size_t i = 0; i < sizeof modes / sizeof modes[0]; ++i) {
    acp_cruise_point p;
    if (acp_cruise_speed(ac, modes[i].mode, modes[i].ci, mass, hp, dt, 0.0, &p) != ACP_OK) continue;
    printf("  %-38s M%.3f %4.0f KTAS %6.0f kg/h %6.1f NM/1000 kg\n", modes[i].name, p.mach,
           acp_mps_to_kt(p.tas), p.fuel_flow * 3600.0, acp_m_to_nm(p.sar) * 1000.0);
  }
  printf("\n");
}

/* A 500 NM trip with typical fuel-policy defaults and a headwind. */
static void print_trip(const acp_aircraft *ac, double hp_origin) {
  acp_mission *m = acp_mission_new();
  if (!m) return;
  const double zfm = 32000.0;
  acp_mission_set(m, "distance", acp_nm_to_m(500.0));
  acp_mission_set(m, "cruise_altitude", acp_fl_to_m(CRUISE_FL));
  acp_mission_set(m, "origin_altitude", hp_origin);
  acp_mission_set(m, "destination_altitude", 0.0);
  acp_mission_set(m, "isa_deviation", -9.0);
  acp_mission_set(m, "wind", acp_kt_to_mps(-30.0));
  acp_mission_set(m, "cruise_mode", ACP_CRUISE_LONG_RANGE);
  acp_mission_set(m, "descent_end_height", acp_ft_to_m(1500.0)); /* then the approach, not modelled */
  printf("== Trip: 500 NM, FL350 long-range cruise, 30 kt headwind, ISA-9, zero-fuel mass "
         "%.0f kg ==\n", zfm);
  printf("(fuel policy: typical defaults, 10 min taxi, 5 %% contingency, 30 min final reserve "
         "at 1,500 ft; the operator's approved fuel policy and local rules take precedence)\n");
  acp_trip_result t;
  const int st = acp_trip_for_zero_fuel_mass(ac, m, zfm, &t);
  if (st != ACP_OK) {
    printf("not feasible: %s (reason %.0f)\n\n", acp_strerror(st), t.infeasible);
    acp_mission_free(m);
    return;
  }
  const struct { const char *name; double time, distance, fuel; } legs[] = {
      {"climb", t.climb_time, t.climb_distance, t.climb_fuel},
      {"top-of-climb speed change", t.climb_acceleration_time, t.climb_acceleration_distance,
       t.climb_acceleration_fuel},
      {"cruise", t.cruise_time, t.cruise_distance, t.cruise_fuel},
      {"top-of-descent deceleration", t.descent_deceleration_time, t.descent_deceleration_distance,
       t.descent_deceleration_fuel},
      {"descent to 1,500 ft", t.descent_time, t.descent_distance, t.descent_fuel},
      {"deceleration to approach speed", t.approach_deceleration_time,
       t.approach_deceleration_distance, t.approach_deceleration_fuel}};
  for (size_t i = 0; i < sizeof legs / sizeof legs[0]; ++i)
    printf("  %-31s %5.1f min %6.1f NM %6.0f kg\n", legs[i].name, legs[i].time / 60.0,
           acp_m_to_nm(legs[i].distance), legs[i].fuel);
  printf("  trip fuel %.0f kg, trip time %.1f min; taxi %.0f, contingency %.0f, alternate %.0f, "
         "final reserve %.0f kg\n", t.trip_fuel, t.trip_time / 60.0, t.taxi_fuel,
         t.contingency_fuel, t.alternate_fuel, t.final_reserve_fuel);
  printf("  block fuel %.0f kg, block time %.1f min; take-off mass %.0f kg, landing mass %.0f kg\n\n",
         t.block_fuel, t.block_time / 60.0, t.takeoff_mass, t.landing_mass);
  FILE *csv = open_output("trip.csv");
  if (csv) {
    fprintf(csv, "item,value,unit\n");
    const struct { const char *name; double v; const char *unit; } rows[] = {
        {"trip_fuel", t.trip_fuel, "kg"}, {"block_fuel", t.block_fuel, "kg"},
        {"taxi_fuel", t.taxi_fuel, "kg"}, {"contingency_fuel", t.contingency_fuel, "kg"},
        {"alternate_fuel", t.alternate_fuel, "kg"}, {"final_reserve_fuel", t.final_reserve_fuel, "kg"},
        {"trip_time", t.trip_time / 60.0, "min"}, {"block_time", t.block_time / 60.0, "min"},
        {"takeoff_mass", t.takeoff_mass, "kg"}, {"landing_mass", t.landing_mass, "kg"},
        {"climb_distance", acp_m_to_nm(t.climb_distance), "NM"},
        {"climb_acceleration_distance", acp_m_to_nm(t.climb_acceleration_distance), "NM"},
        {"climb_acceleration_fuel", t.climb_acceleration_fuel, "kg"},
        {"cruise_distance", acp_m_to_nm(t.cruise_distance), "NM"},
        {"descent_deceleration_distance", acp_m_to_nm(t.descent_deceleration_distance), "NM"},
        {"descent_deceleration_fuel", t.descent_deceleration_fuel, "kg"},
        {"descent_distance", acp_m_to_nm(t.descent_distance), "NM"},
        {"approach_deceleration_distance", acp_m_to_nm(t.approach_deceleration_distance), "NM"},
        {"approach_deceleration_fuel", t.approach_deceleration_fuel, "kg"}};
    for (size_t i = 0; i < sizeof rows / sizeof rows[0]; ++i)
      fprintf(csv, "%s,%.3f,%s\n", rows[i].name, rows[i].v, rows[i].unit);
  }
  close_output(csv, "trip.csv");
  printf("\n");
  acp_mission_free(m);
}

int main(int argc, char **argv) {
  const char *aircraft_path = argc > 1 ? argv[1] : ACP_EXAMPLES_DIR "/aircraft/regional_jet.toml";
  snprintf(out_dir, sizeof out_dir, "%s", argc > 2 ? argv[2] : "acperf-report");
  if (mkdir(out_dir, 0755) != 0 && errno != EEXIST) {
    fprintf(stderr, "acperf_demo: cannot create %s: %s\n", out_dir, strerror(errno));
    return 1;
  }
  printf("acperf %s performance report: Kestrel Coastal Airways (invented operator)\n\n",
         acp_version_string());
  printf("%s\n", CAUTION);
  print_day();
  print_atmosphere_table();
  acp_aircraft *ac = acp_aircraft_new();
  char err[256];
  if (!ac || acp_aircraft_load(ac, aircraft_path, err, sizeof err) != ACP_OK) {
    fprintf(stderr, "acperf_demo: %s: %s\n", aircraft_path, ac ? err : "out of memory");
    acp_aircraft_free(ac);
    return 1;
  }
  double hp_origin = 0.0;
  acp_pressure_altitude_from_qnh(acp_ft_to_m(AERODROME_ELEVATION_FT),
                                 acp_hpa_to_pa(AERODROME_QNH_HPA), &hp_origin);
  print_aircraft(ac);
  print_drag_breakdown(ac);
  print_speeds(ac);
  write_drag_curve(ac);
  print_climb_descent(ac, hp_origin);
  print_cruise(ac);
  print_trip(ac, hp_origin);
  print_winds();
  acp_aircraft_free(ac);
  printf("%s", CAUTION);
  return 0;
}
