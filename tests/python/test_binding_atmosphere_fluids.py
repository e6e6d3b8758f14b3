"""acperf.isa (array path) against Debian's python3-fluids ATMOSPHERE_1976.

Reference: fluids.atmosphere.ATMOSPHERE_1976, the U.S. Standard Atmosphere 1976,
which is identical to ISO 2533:1975 below 84,852 m geopotential. fluids takes
GEOMETRIC altitude: each geopotential pressure altitude is converted with
acperf.geometric_altitude (ISO 2533 eq. 8), itself checked here against the
closed form Z = r0 H/(r0 - H) with r0 = 6,356,766 m (ISO 2533:1975 section 2).

fluids uses the U.S. 1976 gas constant R*/M0 = 8314.32/28.9644 J/(kg K) where
ISO 2533 fixes R = 287.05287 J/(kg K). The relative difference dr = 7.04e-7
shifts the hydrostatic pressure by -dr ln(p0/p) (the layer exponents are
g0/(R L)), the density by that plus dr and the speed of sound by -dr/2. Those
predicted offsets are applied to the reference; what remains must vanish to
2e-9, far below the 1e-4 any wrong layer constant or formula would leave.
"""

import math
import warnings

import numpy as np
import pytest

import acperf

fluids_atmosphere = pytest.importorskip("fluids.atmosphere")

DR = (8314.32 / 28.9644 - 287.05287) / 287.05287
R0 = 6356766.0  # ISO 2533:1975, nominal Earth radius for geopotential altitude

# Dense sweep: 2,001 pressure altitudes across all seven layers (fluids starts
# at about -610 m geometric in some versions, so the sweep starts at -600 m),
# plus every layer base.
HP = np.concatenate([np.linspace(-600.0, 84852.0, 2001),
                     [11000.0, 20000.0, 32000.0, 47000.0, 51000.0, 71000.0]])


def reference(hp, dtemp):
    z = acperf.geometric_altitude(hp)
    rows = [fluids_atmosphere.ATMOSPHERE_1976(float(zi), dT=dtemp) for zi in z]
    return {k: np.array([getattr(r, k) for r in rows]) for k in ("T", "P", "rho", "v_sonic", "mu")}


def test_geometric_altitude_closed_form():
    z = acperf.geometric_altitude(HP)
    np.testing.assert_allclose(z, R0 * HP / (R0 - HP), rtol=1e-14, atol=1e-9)


@pytest.mark.parametrize("dtemp", [0.0, -25.0, 15.0])
def test_isa_against_fluids_1976(dtemp):
    ref = reference(HP, dtemp)
    with warnings.catch_warnings():
        warnings.simplefilter("error")  # no point of the sweep may be invalid
        atm = acperf.isa(HP, dtemp)
    shift_p = -DR * np.log(101325.0 / ref["P"])
    np.testing.assert_allclose(atm.temperature, ref["T"], rtol=1e-10)
    np.testing.assert_allclose(atm.pressure, ref["P"] * (1.0 + shift_p), rtol=2e-9)
    np.testing.assert_allclose(atm.density, ref["rho"] * (1.0 + shift_p + DR), rtol=2e-9)
    np.testing.assert_allclose(atm.sound_speed, ref["v_sonic"] * (1.0 - DR / 2.0), rtol=2e-9)
    np.testing.assert_allclose(atm.dynamic_viscosity, ref["mu"], rtol=1e-9)
    np.testing.assert_allclose(atm.kinematic_viscosity, ref["mu"] / atm.density, rtol=1e-12)


def test_isa_fields_against_fluids_scalar_calls():
    # The single-field helpers (scalar path) at a few altitudes, same references.
    for hp in (0.0, 5000.0, 11000.0, 25000.0):
        ref = fluids_atmosphere.ATMOSPHERE_1976(acperf.geometric_altitude(hp), dT=10.0)
        shift_p = -DR * math.log(101325.0 / ref.P)
        assert acperf.isa_temperature(hp, 10.0) == pytest.approx(ref.T, rel=1e-10)
        assert acperf.isa_pressure(hp) == pytest.approx(
            fluids_atmosphere.ATMOSPHERE_1976(acperf.geometric_altitude(hp)).P * (1 + shift_p),
            rel=2e-9)
        assert acperf.isa_density(hp, 10.0) == pytest.approx(ref.rho * (1 + shift_p + DR), rel=2e-9)
        assert acperf.isa_sound_speed(hp, 10.0) == pytest.approx(ref.v_sonic * (1 - DR / 2), rel=2e-9)


def test_sea_level_table_values():
    # ISO 2533:1975 table values at 0 m: 288.15 K, 101,325 Pa, 1.2250 kg/m3,
    # 340.294 m/s, 1.7894e-5 Pa s (printed digits of the standard's table).
    atm = acperf.isa(0.0)
    assert atm.temperature == 288.15
    assert atm.pressure == 101325.0
    assert atm.density == pytest.approx(1.2250, abs=5e-5)
    assert atm.sound_speed == pytest.approx(340.294, abs=5e-4)
    assert atm.dynamic_viscosity == pytest.approx(1.7894e-5, abs=5e-10)
