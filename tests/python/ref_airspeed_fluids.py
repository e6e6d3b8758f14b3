"""CAS/TAS/Mach of the C library against python3-fluids' isentropic relations.

Independent path: fluids.compressible.T_stagnation_ideal (T0 = T + V^2/(2 cp))
and P_stagnation (p0/p = (T0/T)^(k/(k-1))) give the impact pressure of a speed;
scipy's brentq finds the TAS whose impact pressure at altitude equals that of
the CAS at sea-level standard conditions (the definition of CAS, NACA Report
1135). Subsonic only: fluids has no normal-shock relation (the supersonic branch
is checked against NACA 1135 table values in tests/c/test_airspeed.c). The
atmosphere (p, T) comes from the library; it is checked on its own by
ref_atmosphere_fluids.py.
"""
from fluids.compressible import P_stagnation, T_stagnation_ideal
from scipy.optimize import brentq

from reflib import Checker, isa, load

lib = load()
check = Checker("airspeed vs python3-fluids isentropic relations")

R, GAMMA, T0, P0 = 287.05287, 1.4, 288.15, 101325.0
CP = GAMMA * R / (GAMMA - 1.0)
KT = 1852.0 / 3600.0
FT = 0.3048


def impact_pressure(v, p, t):
    return P_stagnation(p, t, T_stagnation_ideal(t, v, CP), GAMMA) - p


for cas_kt in (60.0, 120.0, 180.0, 250.0, 300.0, 340.0, 400.0):
    for hp_ft in (-1000.0, 0.0, 5000.0, 10000.0, 18000.0, 25000.0, 31000.0, 37000.0, 41000.0):
        for dtemp in (-30.0, 0.0, 20.0):
            hp, cas = hp_ft * FT, cas_kt * KT
            a = isa(lib, hp, dtemp)
            qc = impact_pressure(cas, P0, T0)
            sound = (GAMMA * R * a.temperature) ** 0.5
            if qc / a.pressure > 1.2 ** 3.5 - 1.0:
                continue  # supersonic at this altitude: outside fluids' relations
            tas = brentq(lambda v: impact_pressure(v, a.pressure, a.temperature) - qc,
                         0.0, sound, xtol=1e-13, rtol=1e-15)
            label = f"{cas_kt} KCAS at {hp_ft} ft ISA{dtemp:+}"
            check.close(lib.acp_cas_to_tas(cas, hp, dtemp), tas, 1e-11, label + " TAS")
            check.close(lib.acp_cas_to_mach(cas, hp), tas / sound, 1e-11, label + " Mach")
            check.close(lib.acp_tas_to_cas(tas, hp, dtemp), cas, 1e-11, label + " back to CAS")
check.finish()
