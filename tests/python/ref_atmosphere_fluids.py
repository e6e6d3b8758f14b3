"""The C standard atmosphere against Debian's python3-fluids ATMOSPHERE_1976.

fluids implements the U.S. Standard Atmosphere 1976, identical to ISO 2533:1975
below 84,852 m geopotential (86 km geometric); it takes GEOMETRIC altitude, so
each geopotential pressure altitude is converted with acp_geometric_altitude.
Its ISA deviation argument dT offsets the temperature like ours. Run by ctest as
`python3 ref_atmosphere_fluids.py path/to/libacperf.so`.
"""
import math

import numpy as np
from fluids.atmosphere import ATMOSPHERE_1976

from reflib import Checker, isa, load

lib = load()
DR = (8314.32 / 28.9644 - 287.05287) / 287.05287
check = Checker("atmosphere vs python3-fluids ATMOSPHERE_1976")

# 120 altitudes across all seven layers (fluids' own range starts at -610 m
# geometric in some versions, so the sweep starts at -600 m), three deviations.
altitudes = np.concatenate([np.linspace(-600.0, 84852.0, 110),
                            [11000.0, 20000.0, 32000.0, 47000.0, 51000.0, 71000.0,
                             10972.8, 3048.0, 1524.0, 12496.8]])
for hp in altitudes:
    z = lib.acp_geometric_altitude(hp)
    for dtemp in (0.0, -25.0, 15.0):
        ref = ATMOSPHERE_1976(z, dT=dtemp)
        ours = isa(lib, hp, dtemp)
        label = f"hp={hp:.1f} dT={dtemp}"
        check.close(ours.temperature, ref.T, 1e-10, label + " T")
        # fluids uses the US 1976 gas constant R*/M0 = 8314.32/28.9644 =
        # 287.0531 J/(kg K); ISO 2533 fixes R = 287.05287. That relative
        # difference dr = 7.04e-7 moves the hydrostatic pressure by
        # -dr ln(p0/p) (from the layer exponents g0/(R L)), the density by that
        # plus dr, the speed of sound by -dr/2. Those predicted offsets are
        # removed and the rest must vanish to 2e-9: any wrong layer constant or
        # formula shows up at 1e-4 or more.
        shift_p = -DR * math.log(101325.0 / ref.P)
        check.close(ours.pressure, ref.P * (1.0 + shift_p), 2e-9, label + " p")
        check.close(ours.density, ref.rho * (1.0 + shift_p + DR), 2e-9, label + " rho")
        check.close(ours.sound_speed, ref.v_sonic * (1.0 - DR / 2.0), 2e-9, label + " a")
        check.close(ours.dynamic_viscosity, ref.mu, 1e-9, label + " mu")
check.finish()
