/* Contract of schedule.h: statuses, the point inside the VMO/MMO caps, the
   mode consistent with the altitudes, TAS = Mach x a, and the point's
   acceleration factor equal to acp_acceleration_factor() of its mode. */
#include <math.h>

#include "acperf.h"
#include "contract.h"

/* The least acceleration factor: constant Mach in the troposphere on a cold
   day, 1 - 0.133184 M^2 Tstd/T (schedule.h, the ISA form scaled by dh =
   (T/Tstd) dhp), lowest at Mach 5 at the tropopause with dtemp -100 K:
   1 - 0.133184 x 25 x 216.65/116.65 = -5.184. Above 11,000 m the lapse rate
   is 0 or a smaller magnitude (-2.8 K/km at most): above -2.3. */
#define F_MIN (1.0 - 0.133184 * 25.0 * 216.65 / 116.65 - 1e-3)

void contract_schedule(contract *c) {
  const double hp = contract_range(c, ACP_ISA_HP_MIN, 25000.0);
  const double dt = contract_range(c, ACP_ISA_DTEMP_MIN, ACP_ISA_DTEMP_MAX);
  const double cas_low = contract_range(c, 50.0, 180.0), limit = contract_range(c, -5000.0, 15000.0);
  const double cas = contract_range(c, 60.0, 220.0), mach = contract_range(c, 0.1, 0.95);
  const double vmo = contract_range(c, 60.0, 250.0), mmo = contract_range(c, 0.1, 0.95);
  acp_schedule_point p;
  const int st = acp_speed_schedule(hp, dt, cas_low, limit, cas, mach, vmo, mmo, &p);
  const char *fn = "acp_speed_schedule";
  contract_code(c, fn, st, ST(ACP_ERR_INVALID) | ST(ACP_ERR_RANGE));
  contract_value(c, fn, p.mode, 1.0, 5.0);
  contract_value(c, fn, p.tas, 0x1p-1074, 5.0 * 411.3);
  contract_value(c, fn, p.acceleration_factor, F_MIN, 20.0);
  contract_record(c, p.crossover);
  acp_atmos a;
  const int atm_ok = acp_isa(hp, dt, &a) == ACP_OK;
  const int args_ok = isfinite(cas_low) && isfinite(limit) && isfinite(cas) && isfinite(mach) &&
                      isfinite(vmo) && isfinite(mmo) && cas_low > 0 && cas > 0 && mach > 0 &&
                      vmo > 0 && mmo > 0;
  if (!args_ok)
    contract_expect(c, st == ACP_ERR_INVALID, fn, "NaN/Inf or a speed <= 0 not ACP_ERR_INVALID");
  if (args_ok && !atm_ok)
    contract_expect(c, st == (isfinite(hp) && isfinite(dt) ? ACP_ERR_RANGE : ACP_ERR_INVALID), fn,
                    "outside the atmosphere not ACP_ERR_RANGE (NaN/Inf: ACP_ERR_INVALID)");
  if (st != ACP_OK) {
    contract_expect(c, isnan(p.mode) && isnan(p.cas) && isnan(p.mach) && isnan(p.tas) &&
                           isnan(p.acceleration_factor),
                    fn, "an output not NaN on error");
    return;
  }
  contract_expect(c, isfinite(p.cas) && isfinite(p.mach) && isfinite(p.dtas_dhp), fn,
                  "ACP_OK with a NaN output");
  const int mode = (int)p.mode;
  contract_expect(c, p.mach <= mmo * (1.0 + 1e-15) && p.cas <= vmo * (1.0 + 1e-9), fn,
                  "speed above VMO or MMO");
  contract_expect(c, (mode == ACP_MODE_LOW_CAS) <= (hp < limit), fn, "low-altitude CAS above the limit");
  if (mode == ACP_MODE_LOW_CAS) contract_close(c, fn, "CAS of the low mode", p.cas, cas_low, 0, 1e-9);
  if (mode == ACP_MODE_CAS) contract_close(c, fn, "CAS of the CAS mode", p.cas, cas, 0, 1e-9);
  if (mode == ACP_MODE_MACH) contract_close(c, fn, "Mach of the Mach mode", p.mach, mach, 0, 1e-15);
  contract_close(c, fn, "TAS = Mach a", p.tas, p.mach * a.sound_speed, 0, 1e-14);
  const int constant_mach = mode == ACP_MODE_MACH || mode == ACP_MODE_MMO;
  const double f = acp_acceleration_factor(constant_mach ? ACP_MODE_MACH : ACP_MODE_CAS, p.mach, hp, dt);
  contract_close(c, fn, "factor of the mode flown", p.acceleration_factor, f, 0, 1e-12);
  contract_expect(c, acp_speed_schedule(hp, dt, cas_low, limit, cas, mach, vmo, mmo, NULL) ==
                         ACP_ERR_INVALID, fn, "NULL out accepted");

  /* The factor on its own: NaN exactly outside its domain. */
  const int m = (int)contract_pick(c, 7) - 1;
  const double mm = contract_range(c, 0.0, ACP_MACH_MAX);
  const double g = acp_acceleration_factor(m, mm, hp, dt);
  /* constant Mach in the troposphere: 1 - 0.133 M^2, below 0 above about Mach 2.7 */
  contract_value(c, "acp_acceleration_factor", g, F_MIN, 20.0);
  const int ok = (m == ACP_MODE_CAS || m == ACP_MODE_MACH) && mm > 0.0 && mm <= ACP_MACH_MAX && atm_ok;
  contract_expect(c, ok == !isnan(g), "acp_acceleration_factor", "NaN exactly outside its domain");
  /* 11 to 20 km, the top excluded: at 20 km the layer above (+1 K/km) begins */
  if (ok && m == ACP_MODE_MACH && hp >= 11000.0 && hp < 20000.0)
    contract_close(c, "acp_acceleration_factor", "constant Mach, isothermal layer: 1", g, 1.0, 1e-15, 0);
}
