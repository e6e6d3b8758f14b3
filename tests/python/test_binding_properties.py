"""Property tests (python3-hypothesis) of the binding: round trips and monotonicity.

The properties are facts of the physics, not values: a conversion followed by
its inverse gives the input back (to a tolerance set by the conditioning of the
formulas, stated at each test), and the standard pressure falls as pressure
altitude rises (hydrostatic equation, ISO 2533:1975 eq. 12/13; common practice).
Each property is checked through the array path and the scalar path.
"""

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st
from hypothesis.extra import numpy as hnp

import acperf
from acperf import units

settings.register_profile("acperf", max_examples=150, deadline=None, database=None)
settings.load_profile("acperf")

HP = st.floats(-5000.0, 84852.0)
HP_LOW = st.floats(-5000.0, 20000.0)
DTEMP = st.floats(-60.0, 60.0)
CAS = st.floats(5.0, 400.0)
MACH = st.floats(0.01, 4.5)


def arrays(elements, size=20):
    return hnp.arrays(np.float64, st.integers(1, size), elements=elements)


@given(CAS, HP_LOW, DTEMP)
def test_cas_tas_round_trip(cas, hp, dtemp):
    try:
        tas = acperf.cas_to_tas(cas, hp, dtemp)
    except acperf.AcperfError:
        return  # outside Mach 5 at this altitude: nothing to invert
    assert acperf.tas_to_cas(tas, hp, dtemp) == pytest.approx(cas, rel=1e-10)


@given(arrays(CAS), HP_LOW)
def test_cas_mach_round_trip_array(cas, hp):
    mach = acperf.cas_to_mach(cas, hp)
    np.testing.assert_allclose(acperf.mach_to_cas(mach, hp), cas, rtol=1e-10)


@given(MACH, HP, DTEMP)
def test_mach_tas_round_trip(mach, hp, dtemp):
    tas = acperf.mach_to_tas(mach, hp, dtemp)
    assert acperf.tas_to_mach(tas, hp, dtemp) == pytest.approx(mach, rel=1e-12)


@given(st.floats(1.0, 300.0), HP_LOW, DTEMP)
def test_eas_tas_round_trip(eas, hp, dtemp):
    tas = acperf.eas_to_tas(eas, hp, dtemp)
    assert acperf.tas_to_eas(tas, hp, dtemp) == pytest.approx(eas, rel=1e-12)


@given(CAS, HP_LOW)
def test_cas_eas_round_trip(cas, hp):
    eas = acperf.cas_to_eas(cas, hp)
    assert acperf.eas_to_cas(eas, hp) == pytest.approx(cas, rel=1e-10)


@given(arrays(st.floats(-5000.0, 84000.0)))
def test_pressure_altitude_round_trip(hp):
    p = acperf.isa(hp).pressure
    np.testing.assert_allclose(acperf.isa_pressure_altitude(p), hp, rtol=1e-10, atol=1e-6)


@given(arrays(st.floats(-9000.0, 900000.0)))
def test_geometric_geopotential_round_trip(z):
    h = acperf.geopotential_altitude(z)
    np.testing.assert_allclose(acperf.geometric_altitude(h), z, rtol=1e-12, atol=1e-8)


@given(arrays(HP, size=50))
def test_pressure_decreases_with_altitude(hp):
    hp = np.unique(hp)  # sorted, distinct
    p = acperf.isa(hp).pressure
    # never higher, to the vectorised kernel's rounding (1e-14 relative,
    # docs/performance.md): altitudes a nanometre apart may tie within it
    assert np.all(np.diff(p) <= 1e-14 * p[:-1])
    # strictly lower wherever the altitudes differ by a millimetre or more
    far = np.diff(hp) >= 1e-3
    assert np.all(np.diff(p)[far] < 0.0)
    # the scalar path agrees with the array path point by point (1e-14 relative)
    scalar = np.array([acperf.isa_pressure(h) for h in hp])
    assert np.all(np.abs(scalar - p) <= 1e-14 * p)


@given(HP, st.floats(1.0, 5000.0))
def test_pressure_decreases_scalar(hp, step):
    hi = min(hp + step, 84852.0)
    if hi > hp:
        assert acperf.isa_pressure(hi) < acperf.isa_pressure(hp)


@given(st.floats(-1.0e6, 1.0e6, allow_subnormal=False))
def test_unit_round_trips(x):
    for there, back in [(units.ft_to_m, units.m_to_ft), (units.kt_to_mps, units.mps_to_kt),
                        (units.nm_to_m, units.m_to_nm), (units.lb_to_kg, units.kg_to_lb),
                        (units.fl_to_m, units.m_to_fl), (units.fpm_to_mps, units.mps_to_fpm),
                        (units.hpa_to_pa, units.pa_to_hpa), (units.inhg_to_pa, units.pa_to_inhg),
                        (units.deg_to_rad, units.rad_to_deg)]:
        assert back(there(x)) == pytest.approx(x, rel=1e-15, abs=1e-300)
    assert units.k_to_degc(units.degc_to_k(x)) == pytest.approx(x, rel=1e-15, abs=1e-9)


@given(st.floats(-1.0e5, 1.0e5),
       st.sampled_from(["m", "ft", "FL", "km", "NM", "m/s", "kt", "km/h", "ft/min", "kg", "lb",
                        "t", "Pa", "hPa", "mbar", "inHg", "K", "degC", "s", "min", "h", "rad",
                        "deg", "N", "lbf", "kg/h", "kg/s", "lb/h"]))
def test_named_unit_round_trip(x, unit):
    # Unit names listed in acperf/units.h (acp_to_si).
    assert units.from_si(units.to_si(x, unit), unit) == pytest.approx(x, rel=1e-14, abs=1e-10)


@given(st.floats(60.0, 200.0), st.floats(0.6, 0.9))
def test_crossover_gives_equal_tas(cas, mach):
    # At the crossover altitude the CAS and the Mach number are the same speed.
    try:
        hp = acperf.crossover_altitude(cas, mach)
    except acperf.AcperfError:
        return
    assert acperf.cas_to_mach(cas, hp) == pytest.approx(mach, rel=1e-9)

