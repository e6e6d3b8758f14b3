/* Contract of polar.h on the demo aircraft and fuzzed private copies:
   documented statuses, every output NaN on error; inside the documented
   ranges the shared demo aircraft give a result unless a component's
   Reynolds number leaves 1e3 to 1e10; parts add up; the load-factor, bank,
   coefficient, component and array forms agree with acp_drag(). */
#include <math.h>
#include <string.h>

#include "acperf.h"
#include "contract.h"

#define DEG (3.14159265358979323846 / 180.0)
#define ALLOWED (ST(ACP_ERR_INVALID) | ST(ACP_ERR_RANGE))
#define REL 1e-12

static int parts_nan(const acp_drag_parts *d) {
  return isnan(d->friction) && isnan(d->form) && isnan(d->interference) && isnan(d->parasite) &&
         isnan(d->induced) && isnan(d->wave) && isnan(d->total);
}

static void check_parts(contract *c, const char *fn, int st, const acp_drag_parts *d, int buildup) {
  contract_code(c, fn, st, ALLOWED);
  contract_value(c, fn, d->total, 0.0, 1.7976931348623157e308);
  contract_record(c, d->induced);
  contract_record(c, d->friction);
  if (st != ACP_OK) {
    contract_expect(c, parts_nan(d), fn, "an output not NaN on error");
    return;
  }
  const int finite = isfinite(d->parasite) && d->parasite >= 0.0 && isfinite(d->induced) &&
                     d->induced >= 0.0 && isfinite(d->wave) && d->wave >= 0.0;
  contract_expect(c, finite, fn, "ACP_OK with a part not finite and non-negative");
  contract_close(c, fn, "total = parasite + induced + wave", d->total,
                 d->parasite + d->induced + d->wave, 0.0, REL);
  if (buildup)
    contract_close(c, fn, "friction + form + interference = parasite",
                   d->friction + d->form + d->interference, d->parasite, 0.0, REL);
  else
    contract_expect(c, isnan(d->friction) && isnan(d->form) && isnan(d->interference), fn,
                    "parts of a single cd0 not NaN");
}

static void same_parts(contract *c, const char *fn, const acp_drag_parts *a, const acp_drag_parts *b) {
  contract_same(c, fn, "friction", a->friction, b->friction);
  contract_same(c, fn, "parasite", a->parasite, b->parasite);
  contract_same(c, fn, "induced", a->induced, b->induced);
  contract_same(c, fn, "wave", a->wave, b->wave);
  contract_same(c, fn, "total", a->total, b->total);
}

static void helpers(contract *c) {
  const double a = contract_range(c, 1.0, 30.0), sw = contract_range(c, 0.0, 70.0 * DEG);
  const int a_ok = a >= 1.0 && a <= 30.0, sw_ok = sw >= 0.0 && sw <= 70.0 * DEG;
  const double es = acp_oswald_straight(a);
  contract_value(c, "acp_oswald_straight", es, 0.3, 1.1);
  contract_expect(c, a_ok == !isnan(es), "acp_oswald_straight", "NaN exactly outside A 1 to 30");
  const double ew = acp_oswald_swept(a, sw);
  contract_value(c, "acp_oswald_swept", ew, -3.2, 1.5);
  contract_expect(c, (a_ok && sw_ok) == !isnan(ew), "acp_oswald_swept",
                  "NaN exactly outside A 1 to 30, sweep 0 to 70 deg");
  const double ee = acp_oswald_estimate(a, sw);
  contract_value(c, "acp_oswald_estimate", ee, 0.3, 1.0);
  contract_expect(c, (a_ok && sw_ok) == !isnan(ee), "acp_oswald_estimate",
                  "NaN exactly outside A 1 to 30, sweep 0 to 70 deg");
  if (!isnan(ee) && sw == 0.0)
    contract_same(c, "acp_oswald_estimate", "no sweep: the straight-wing value",
                  ee, fmin(1.0, fmax(0.3, es)));

  const double b = contract_range(c, 1.0, 80.0), h = contract_range(c, 0.0, 0.5 * b);
  const double aw = acp_winglet_aspect_ratio(a, h, b);
  contract_value(c, "acp_winglet_aspect_ratio", aw, 0.0, 1.7976931348623157e308);
  const int w_ok = isfinite(a) && a > 0.0 && isfinite(b) && b > 0.0 && h >= 0.0 && h <= 0.5 * b;
  if (!w_ok) contract_expect(c, isnan(aw), "acp_winglet_aspect_ratio", "accepted an invalid argument");
  /* A (1 + 1.9 h/b) with h <= b/2; a denormal A keeps fewer digits in any
     evaluation order: an absolute 1e-300 there, as contract_element() */
  if (!isnan(aw) && !(aw >= a * (1.0 - 1e-15) - 1e-300 && aw <= 1.95 * a * (1.0 + 1e-15) + 1e-300))
    contract_violation(c, "acp_winglet_aspect_ratio", "A %.17g, h %.17g, b %.17g: %.17g not between A and 1.95 A",
                       a, h, b, aw);

  const double kappa = contract_range(c, 0.7, 1.0), tc = contract_range(c, 0.0, 0.3);
  const double ksw = contract_range(c, 0.0, 60.0 * DEG), cl = contract_range(c, -10.0, 10.0);
  const double mdd = acp_korn_mach(kappa, tc, ksw, cl);
  contract_value(c, "acp_korn_mach", mdd, -30.0, 2.0);
  const int k_ok = kappa >= 0.7 && kappa <= 1.0 && tc >= 0.0 && tc <= 0.3 && ksw >= 0.0 &&
                   ksw <= 60.0 * DEG && fabs(cl) <= 10.0;
  contract_expect(c, k_ok == !isnan(mdd), "acp_korn_mach", "NaN exactly outside the documented ranges");
  const double mc = acp_critical_mach(mdd);
  contract_value(c, "acp_critical_mach", mc, -31.0, 2.0);
  if (!isnan(mdd))
    contract_close(c, "acp_critical_mach", "Mdd - (0.1/80)^(1/3)", mc, mdd - ACP_MDD_MCRIT_GAP,
                   1e-15, 0.0);
  const double raw = contract_arg(c);
  contract_expect(c, isfinite(raw) == !isnan(acp_critical_mach(raw)), "acp_critical_mach",
                  "NaN exactly for NaN/Inf");

  const double m = contract_range(c, 0.0, 5.0), mcrit = contract_range(c, 0.0, 5.0);
  const double cdw = acp_wave_drag_coefficient(m, mcrit);
  contract_value(c, "acp_wave_drag_coefficient", cdw, 0.0, 20.0 * 625.0);
  const int m_ok = m >= 0.0 && m <= 5.0 && mcrit >= 0.0 && mcrit <= 5.0;
  contract_expect(c, m_ok == !isnan(cdw), "acp_wave_drag_coefficient",
                  "NaN exactly outside Mach 0 to 5");
  if (m_ok && m <= mcrit) contract_expect(c, cdw == 0.0, "acp_wave_drag_coefficient", "not 0 below Mcrit");
}

void contract_polar(contract *c) {
  helpers(c);
  acp_aircraft *own;
  const acp_aircraft *ac = contract_some_aircraft(c, &own);
  double count = 0.0, area = NAN, leak = 0.0, misc = 0.0;
  acp_aircraft_get(ac, "component_count", &count);
  acp_aircraft_get(ac, "wing_area", &area);
  acp_aircraft_get(ac, "leakage_fraction", &leak);
  acp_aircraft_get(ac, "cd_misc", &misc);
  const int buildup = count > 0.0;
  double kappa = NAN;
  acp_aircraft_get(ac, "korn_kappa", &kappa);

  const double mass = contract_range(c, ACP_POLAR_MASS_MIN, ACP_POLAR_MASS_MAX);
  const double hp = contract_range(c, ACP_ISA_HP_MIN, 20000.0);
  const double dt = contract_range(c, ACP_ISA_DTEMP_MIN, ACP_ISA_DTEMP_MAX);
  acp_atmos atm;
  const int atm_ok = acp_isa(hp, dt, &atm) == ACP_OK;
  const double tas = contract_range(c, 0.0, atm_ok ? ACP_POLAR_MACH_MAX * atm.sound_speed : 300.0);
  const double n = contract_range(c, 0.0, ACP_POLAR_LOAD_MAX);
  const double bank = contract_range(c, -ACP_POLAR_BANK_MAX, ACP_POLAR_BANK_MAX);

  acp_drag_parts d, dl, db;
  const int st = acp_drag(ac, mass, hp, dt, tas, &d);
  check_parts(c, "acp_drag", st, &d, buildup);
  const int inside = atm_ok && mass >= ACP_POLAR_MASS_MIN && mass <= ACP_POLAR_MASS_MAX &&
                     tas > 0.0 && tas / atm.sound_speed <= ACP_POLAR_MACH_MAX;
  if (!inside) contract_expect(c, st != ACP_OK, "acp_drag", "ACP_OK outside the documented ranges");

  /* Components: their Reynolds numbers decide ACP_ERR_RANGE inside the ranges. */
  int reynolds_ok = 1;
  double sum = 0.0;
  for (size_t i = 0; i < (size_t)count && i < ACP_AIRCRAFT_MAX_COMPONENTS; ++i) {
    acp_component_drag cd;
    const int cst = acp_drag_component(ac, i, hp, dt, tas, &cd);
    contract_code(c, "acp_drag_component", cst, ALLOWED);
    contract_value(c, "acp_drag_component", cd.parasite, 0.0, 1e9);
    contract_value(c, "acp_drag_component", cd.skin_friction, 0x1p-1074, 0.042);
    if (cst == ACP_OK) {
      contract_close(c, "acp_drag_component", "parts add up", cd.friction + cd.form + cd.interference,
                     cd.parasite, 0.0, REL);
      sum += cd.parasite;
    } else {
      contract_expect(c, isnan(cd.reynolds) && isnan(cd.parasite), "acp_drag_component",
                      "an output not NaN on error");
      reynolds_ok = 0;
    }
  }
  acp_component_drag none;
  contract_expect(c, acp_drag_component(ac, (size_t)count, hp, dt, tas, &none) != ACP_OK &&
                         acp_drag_component(ac, 0, hp, dt, tas, NULL) == ACP_ERR_INVALID,
                  "acp_drag_component", "index past the last component or NULL out accepted");
  /* with a wave-drag model the Korn equation's |CL| <= 10 (polar.h) */
  const double q = atm_ok ? 0.5 * atm.density * tas * tas : NAN;
  const double cl1 = mass * 9.80665 / (q * area), cln = n * cl1;
  const int cl_ok = isnan(kappa) || fabs(cl1) <= 10.0, cln_ok = isnan(kappa) || fabs(cln) <= 10.0;
  if (inside && !own && isfinite(cl1))
    contract_expect(c, (st == ACP_OK) == (reynolds_ok && cl_ok), "acp_drag",
                    "inside the ranges: refused although every component is in its Reynolds range "
                    "(and |CL| <= 10 with korn_kappa), or accepted although one is not");

  const int lst = acp_drag_load(ac, mass, hp, dt, tas, n, &dl);
  check_parts(c, "acp_drag_load", lst, &dl, buildup);
  if (!(n >= 0.0 && n <= ACP_POLAR_LOAD_MAX))
    contract_expect(c, lst != ACP_OK, "acp_drag_load", "ACP_OK outside load factor 0 to 10");
  else if (st == ACP_OK && cln_ok && isfinite(cln) && cln < 1e300)
    contract_expect(c, lst == ACP_OK, "acp_drag_load", "refused a load factor in range");
  if (n == 1.0) same_parts(c, "acp_drag_load", &dl, &d);
  acp_drag_parts one;
  acp_drag_load(ac, mass, hp, dt, tas, 1.0, &one);
  same_parts(c, "acp_drag_load", &one, &d);
  if (st == ACP_OK && lst == ACP_OK)
    contract_same(c, "acp_drag_load", "parasite drag independent of lift", dl.parasite, d.parasite);

  const int bst = acp_drag_bank(ac, mass, hp, dt, tas, bank, &db);
  check_parts(c, "acp_drag_bank", bst, &db, buildup);
  if (fabs(bank) <= ACP_POLAR_BANK_MAX) {
    acp_drag_parts want;
    acp_drag_load(ac, mass, hp, dt, tas, 1.0 / cos(bank), &want);
    same_parts(c, "acp_drag_bank", &db, &want);
  } else {
    contract_expect(c, bst != ACP_OK, "acp_drag_bank", "ACP_OK outside 85 deg of bank");
  }

  acp_polar_point p;
  const int pst = acp_polar(ac, mass, hp, dt, tas, n, &p);
  contract_code(c, "acp_polar", pst, ALLOWED);
  contract_value(c, "acp_polar", p.cd, 0.0, 1.7976931348623157e308);
  contract_expect(c, pst == lst, "acp_polar", "status differs from acp_drag_load");
  if (pst == ACP_OK && lst == ACP_OK) {
    const double qs = p.dynamic_pressure * area;
    contract_close(c, "acp_polar", "cd q S = total drag", p.cd * qs, dl.total, 1e-300, REL);
    contract_close(c, "acp_polar", "cd0 + cdi + cdw = cd", p.cd0 + p.cd_induced + p.cd_wave, p.cd,
                   0.0, REL);
    contract_close(c, "acp_polar", "cl = n m g/(q S)", p.cl * qs, n * mass * 9.80665, 1e-300, REL);
    if (buildup && st == ACP_OK)
      contract_close(c, "acp_drag_component", "components with leakage and cd_misc = parasite",
                     (1.0 + leak) * sum + misc * qs, d.parasite, 0.0, 1e-11);
  } else if (pst != ACP_OK) {
    contract_expect(c, isnan(p.cd) && isnan(p.cl) && isnan(p.mach), "acp_polar",
                    "an output not NaN on error");
  }

  /* Array forms loop over the scalar code: bit for bit. */
  const double ms[2] = {mass, contract_range(c, 1.0, 1e6)};
  const double hs[2] = {hp, hp}, ds[2] = {dt, dt}, vs[2] = {tas, contract_range(c, 1.0, 300.0)};
  const double ns[2] = {n, 1.0};
  double fr[2], pa[2], in[2], wa[2], to[2];
  const int null_load = (int)contract_pick(c, 2), null_dt = (int)contract_pick(c, 2);
  const size_t bad = acp_drag_n(ac, 2, ms, hs, null_dt ? NULL : ds, vs, null_load ? NULL : ns,
                                fr, NULL, NULL, pa, in, wa, to);
  size_t nan_count = 0;
  for (int i = 0; i < 2; ++i) {
    acp_drag_parts w;
    acp_drag_load(ac, ms[i], hs[i], null_dt ? 0.0 : ds[i], vs[i], null_load ? 1.0 : ns[i], &w);
    contract_same(c, "acp_drag_n", "friction", fr[i], w.friction);
    contract_same(c, "acp_drag_n", "parasite", pa[i], w.parasite);
    contract_same(c, "acp_drag_n", "induced", in[i], w.induced);
    contract_same(c, "acp_drag_n", "wave", wa[i], w.wave);
    contract_same(c, "acp_drag_n", "total", to[i], w.total);
    nan_count += isnan(w.total) ? 1u : 0u;
  }
  contract_expect(c, bad == nan_count, "acp_drag_n", "count differs from the elements in error");
  contract_expect(c, acp_drag_n(ac, 2, NULL, hs, ds, vs, ns, NULL, NULL, NULL, NULL, NULL, NULL, to) == 2 &&
                         isnan(to[0]) && isnan(to[1]),
                  "acp_drag_n", "NULL mass not every element invalid");
  const size_t cbad = acp_drag_curve(ac, mass, hp, dt, 2, vs, pa, NULL, wa, to);
  nan_count = 0;
  for (int i = 0; i < 2; ++i) {
    acp_drag_parts w;
    acp_drag(ac, mass, hp, dt, vs[i], &w);
    contract_same(c, "acp_drag_curve", "parasite", pa[i], w.parasite);
    contract_same(c, "acp_drag_curve", "total", to[i], w.total);
    nan_count += isnan(w.total) ? 1u : 0u;
  }
  contract_expect(c, cbad == nan_count, "acp_drag_curve", "count differs from the elements in error");
  contract_expect(c, acp_drag(NULL, 1000, 0, 0, 100, &d) == ACP_ERR_INVALID && parts_nan(&d) &&
                         acp_drag(ac, 1000, 0, 0, 100, NULL) == ACP_ERR_INVALID,
                  "acp_drag", "NULL accepted");
  acp_aircraft_free(own);
}
