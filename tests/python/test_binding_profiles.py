"""Profiles, cruise, trips and tables through the binding, against the C library.

The generic binding tests cover functions whose only model is the aircraft; these
cover the traces, the cruise functions (mode and cost index lead), the Mission
object and the climb table, each against the library's own scalar results
(through the binding's scalar path, itself checked against ctypes elsewhere) or
the C structs' field lists. Results are estimates, not approved data.
"""

import math
import warnings

import numpy as np
import pytest

import acperf
from conftest import demo_aircraft_path, parse_structs

FT = 0.3048


@pytest.fixture(scope="module")
def jet():
    return acperf.Aircraft.from_file(demo_aircraft_path("regional_jet.toml"))


def test_traces_end_where_the_totals_say(jet):
    trace, totals = acperf.climb_trace(jet, 38000.0, 1500 * FT, 35000 * FT)
    assert list(acperf.ProfilePoint._fields) == parse_structs()["acp_profile_point"]
    assert trace.hp[0] == pytest.approx(1500 * FT) and trace.hp[-1] == pytest.approx(35000 * FT)
    assert trace.time[-1] == totals.time and trace.mass[-1] == totals.mass_end
    assert totals == acperf.climb(jet, 38000.0, 1500 * FT, 35000 * FT)
    assert np.all(np.diff(trace.time) > 0.0)
    d_trace, d_totals = acperf.descent_trace(jet, 33000.0, 35000 * FT, 1500 * FT)
    # descending, except the level deceleration at the speed limit (rate 0)
    assert d_trace.time[-1] == d_totals.time and np.all(d_trace.rate <= 0.0)
    assert np.sum(d_trace.rate == 0.0) == np.sum(d_trace.acceleration_factor == 0.0) > 0
    c_trace, c_totals = acperf.cruise_trace(jet, acperf.CRUISE_FIXED_MACH, 0.0, 36000.0,
                                            35000 * FT, 0.0, 0.0, acperf.END_DISTANCE,
                                            500 * 1852.0)
    assert list(acperf.CruisePoint._fields) == parse_structs()["acp_cruise_point"]
    assert c_trace.distance[-1] == pytest.approx(500 * 1852.0, rel=1e-12)
    assert c_totals.fuel == pytest.approx(36000.0 - c_trace.mass[-1], rel=1e-12)


def test_cruise_speed_forms_agree(jet):
    hp = np.array([31000.0, 35000.0, 37000.0]) * FT
    table = acperf.cruise_speed_n(jet, acperf.CRUISE_LONG_RANGE, 0.0, 36000.0, hp)
    for i, h in enumerate(hp):
        point = acperf.cruise_speed(jet, acperf.CRUISE_LONG_RANGE, 0.0, 36000.0, h, 0.0)
        assert table.mach[i] == point.mach and table.sar[i] == point.sar
        assert acperf.specific_air_range(jet, 36000.0, h, 0.0, point.tas) == point.sar


def test_mission_and_trip(jet):
    m = acperf.Mission(distance=500 * 1852.0, cruise_altitude=35000 * FT)
    assert m["distance"] == 500 * 1852.0 and m["contingency_fraction"] == 0.05
    trip = acperf.trip_for_zero_fuel_mass(jet, m, 32000.0)
    assert list(acperf.TripResult._fields) == parse_structs()["acp_trip_result"]
    assert trip.zero_fuel_mass == pytest.approx(32000.0, abs=0.1)
    assert trip.block_fuel == pytest.approx(trip.taxi_fuel + trip.trip_fuel + trip.contingency_fuel
                                            + trip.alternate_fuel + trip.final_reserve_fuel)
    again = acperf.trip(jet, m, trip.takeoff_mass)
    assert again.trip_fuel == pytest.approx(trip.trip_fuel, rel=1e-6)
    with pytest.raises(acperf.AcperfError):
        m["distance"] = -1.0
    with pytest.raises(acperf.AcperfError):
        acperf.trip_for_zero_fuel_mass(jet, acperf.Mission(distance=1.0e7,
                                                           cruise_altitude=35000 * FT), 32000.0)


def test_climb_table_matches_single_climbs(jet):
    masses, altitudes, days = [34000.0, 38000.0], [10000 * FT, 30000 * FT, 45000 * FT], [0.0, 12.0]
    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always")
        table = acperf.climb_table(jet, 1500 * FT, 0.0, 0.0, masses, altitudes, days)
    assert table.fuel.shape == (2, 3, 2)
    assert any(issubclass(w.category, acperf.AcperfWarning) for w in caught)
    for i, mass in enumerate(masses):
        for j, hp in enumerate(altitudes):
            for k, dt in enumerate(days):
                try:
                    single = acperf.climb(jet, mass, 1500 * FT, hp, dt)
                except acperf.AcperfError:
                    assert math.isnan(table.fuel[i, j, k])  # 45,000 ft: not reached
                    continue
                assert table.fuel[i, j, k] == pytest.approx(single.fuel, rel=1e-4)
                assert table.time[i, j, k] == pytest.approx(single.time, rel=1e-4)
