"""Why a trip cannot be flown, through the binding (issue 16, items 1 and 13).

References: the C functions acp_trip() and acp_trip_for_zero_fuel_mass() called
through ctypes (conftest.CLib), which give the status and the reason and excess
in acp_trip_result (acperf/mission.h: "on error all NaN except `infeasible` and
`excess` for the errors the enum names"); and the design contract
(/work/shared/DESIGN.md, "Bindings"): InfeasibleTrip, a subclass of AcperfError
(a ValueError), with `.reason` an IntEnum member, `.excess` and `.result`;
messages short, naming the argument, its value and the limit. The demo jet and
the missions are invented; results are estimates, not approved data.
"""

import math
import pickle
import warnings

import numpy as np
import pytest

import acperf
from conftest import CStatusError, demo_aircraft_path

NM = 1852.0
JET = acperf.Aircraft.from_file(demo_aircraft_path())
FL350 = 10668.0

# (function, mission keys, mass, the reason the library gives): each a different
# limit of the demo jet (mass_max_takeoff 40,000 kg, mass_max_landing 37,000 kg,
# mass_max_zero_fuel 34,500 kg, mass_operating_empty 24,500 kg, fuel_capacity
# 9,000 kg, max_altitude 11,277.6 m).
CASES = [
    ("trip", dict(distance=500 * NM, cruise_altitude=FL350), 44000.0, "OVER_MAX_TAKEOFF"),
    ("trip", dict(distance=300 * NM, cruise_altitude=7000.0), 39900.0, "OVER_MAX_LANDING"),
    ("trip", dict(distance=3000 * NM, cruise_altitude=FL350), 39000.0, "OVER_FUEL_CAPACITY"),
    ("trip_for_zero_fuel_mass", dict(distance=500 * NM, cruise_altitude=FL350), 36000.0,
     "OVER_MAX_ZERO_FUEL"),
    ("trip", dict(distance=20 * NM, cruise_altitude=FL350), 36000.0, "TOO_SHORT"),
    ("trip", dict(distance=500 * NM, cruise_altitude=12000.0), 36000.0, "ABOVE_MAX_ALTITUDE"),
    ("trip", dict(distance=250 * NM, cruise_altitude=11000.0, isa_deviation=30.0), 39900.0,
     "CANNOT_CRUISE"),
    ("trip", dict(distance=500 * NM, cruise_altitude=600.0, origin_altitude=1000.0), 36000.0,
     "CRUISE_TOO_LOW"),
    ("trip", dict(distance=500 * NM, cruise_altitude=FL350), 20000.0, "BELOW_OPERATING_EMPTY"),
    ("trip_for_zero_fuel_mass", dict(distance=1.0e7, cruise_altitude=FL350), 32000.0,
     "OVER_MAX_TAKEOFF"),
]
IDS = [f"{c[0]}-{c[3]}" for c in CASES]


def c_trip(clib, fname, mission, mass):
    """(status, acp_trip_result as a dict) of the C call through ctypes."""
    try:
        return 0, clib.call("acp_" + fname, int(JET._handle), int(mission._handle), mass)
    except CStatusError as exc:
        return exc.status, exc.outputs


def paths(fname):
    """The scalar call (Python floats: the SWIG call; the trips have no fast path,
    gen_fastcall.py) and the numpy scalars that reach it through the array path (a
    0-d array, a float32 that SWIG does not take)."""
    fn = getattr(acperf, fname)
    assert not isinstance(fn, acperf._fast.function)
    return {"float": fn, "0-d array": lambda ac, m, x: fn(ac, m, np.array(x)),
            "float32": lambda ac, m, x: fn(ac, m, np.float32(x))}


@pytest.mark.parametrize("fname, keys, mass, reason", CASES, ids=IDS)
def test_infeasible_trip_carries_the_libraries_reason_excess_and_result(clib, fname, keys,
                                                                        mass, reason):
    mission = acperf.Mission(**keys)
    status, want = c_trip(clib, fname, mission, mass)
    assert status in (2, 4)  # ACP_ERR_RANGE or ACP_ERR_THRUST (mission.h)
    code = int(want["infeasible"])
    assert code == acperf.TripInfeasible[reason]
    for label, call in paths(fname).items():
        with pytest.raises(acperf.InfeasibleTrip) as err:
            call(JET, mission, mass)
        exc = err.value
        # the hierarchy of the contract
        assert isinstance(exc, acperf.AcperfError) and isinstance(exc, ValueError), label
        assert exc.status == status, label
        # the reason: the member of the C code
        assert type(exc.reason) is acperf.TripInfeasible and exc.reason == code, label
        assert exc.reason is acperf.TripInfeasible[reason], label
        # the excess: the C field, to the bit (NaN where the reason has none)
        assert type(exc.excess) is float, label
        assert (math.isnan(exc.excess) and math.isnan(want["excess"])
                or exc.excess == want["excess"]), label
        # the result: a TripResult, reason and excess, all else NaN as in C
        r = exc.result
        assert type(r) is acperf.TripResult and r.infeasible is exc.reason, label
        assert r.excess == exc.excess or math.isnan(r.excess) and math.isnan(exc.excess)
        others = [getattr(r, f) for f in r._fields
                  if f not in ("infeasible", "excess", "excess_at_least")]
        assert all(type(v) is float and math.isnan(v) for v in others), label
        assert r.excess_at_least == want["excess_at_least"] and r.excess_at_least in (0.0, 1.0)
        assert all(math.isnan(want[f]) for f in r._fields
                   if f not in ("infeasible", "excess", "excess_at_least"))
        # the message: short, names the function, the argument and its value, no address
        msg = str(exc)
        param = "takeoff_mass" if fname == "trip" else "zero_fuel_mass"
        assert msg.startswith(f"{fname}({param}={mass:,.0f} kg): "), msg
        assert len(msg) < 200 and "0x" not in msg and "Swig" not in msg, msg


def test_the_message_says_which_limit_and_by_how_much(clib):
    # The brief's example: the take-off mass found for a zero-fuel mass exceeds
    # mass_max_takeoff; the message gives the excess of acp_trip_result and the limit.
    # (4,500 km: the trip can be flown above the limit, so the excess is exact)
    mission = acperf.Mission(distance=4.5e6, cruise_altitude=FL350)
    _, want = c_trip(clib, "trip_for_zero_fuel_mass", mission, 32000.0)
    assert want["excess_at_least"] == 0.0
    with pytest.raises(acperf.InfeasibleTrip) as err:
        acperf.trip_for_zero_fuel_mass(JET, mission, 32000.0)
    assert str(err.value) == (
        f"trip_for_zero_fuel_mass(zero_fuel_mass=32,000 kg): take-off mass above "
        f"mass_max_takeoff by {want['excess']:,.0f} kg (mass_max_takeoff = 40,000 kg)")
    # a reason without an excess (mission.h: CANNOT_CRUISE sets none) names the key only
    hot = acperf.Mission(distance=250 * NM, cruise_altitude=11000.0, isa_deviation=30.0)
    with pytest.raises(acperf.InfeasibleTrip) as err:
        acperf.trip(JET, hot, 39900.0)
    assert " by " not in str(err.value) and "(cruise_altitude = 11,000 m)" in str(err.value)
    assert math.isnan(err.value.excess)


def test_an_infeasible_trip_pickles_with_its_reason():
    mission = acperf.Mission(distance=500 * NM, cruise_altitude=FL350)
    with pytest.raises(acperf.InfeasibleTrip) as err:
        acperf.trip(JET, mission, 44000.0)
    back = pickle.loads(pickle.dumps(err.value))
    assert type(back) is acperf.InfeasibleTrip and str(back) == str(err.value)
    assert back.reason is acperf.TripInfeasible.OVER_MAX_TAKEOFF
    assert back.excess == err.value.excess and back.status == err.value.status


def test_other_trip_errors_stay_acperf_errors_with_a_result(clib):
    # NaN take-off mass: ACP_ERR_INVALID, no reason named (infeasible NaN in C)
    mission = acperf.Mission(distance=500 * NM, cruise_altitude=FL350)
    status, want = c_trip(clib, "trip", mission, math.nan)
    assert status == 1 and math.isnan(want["infeasible"])
    with pytest.raises(acperf.AcperfError) as err:
        acperf.trip(JET, mission, math.nan)
    assert type(err.value) is acperf.AcperfError and err.value.status == 1
    r = err.value.result
    assert type(r) is acperf.TripResult and type(r.infeasible) is float
    assert math.isnan(r.infeasible)


def test_array_trip_gives_reason_and_excess_per_row(clib):
    # The array form (point by point: mission.h has no acp_trip_n) keeps the reason
    # and the excess of each infeasible row, as the C call leaves them; the other
    # fields of those rows are NaN, and one AcperfWarning counts them.
    mission = acperf.Mission(distance=500 * NM, cruise_altitude=FL350)
    masses = np.array([36000.0, 44000.0, 20000.0, 35000.0])
    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always")
        got = acperf.trip(JET, mission, masses)
    assert [str(w.message) for w in caught if issubclass(w.category, acperf.AcperfWarning)] == [
        "trip: 2 of 4 points invalid (argument invalid or outside the model's valid range); "
        "their results are NaN but for infeasible, excess, excess_at_least"]
    for i, mass in enumerate(masses):
        status, want = c_trip(clib, "trip", mission, float(mass))
        assert got.infeasible[i] == want["infeasible"]
        assert (got.excess[i] == want["excess"]
                or math.isnan(got.excess[i]) and math.isnan(want["excess"]))
        assert (got.trip_fuel[i] == want["trip_fuel"]) if status == 0 else \
            math.isnan(got.trip_fuel[i])
    assert list(got.infeasible) == [0, acperf.TripInfeasible.OVER_MAX_TAKEOFF,
                                    acperf.TripInfeasible.BELOW_OPERATING_EMPTY, 0]
    assert got.excess[1] == 4000.0 and got.excess[2] == 4500.0


def test_help_says_what_an_infeasible_trip_raises():
    for fn in (acperf.trip, acperf.trip_for_zero_fuel_mass):
        assert "acperf.InfeasibleTrip: .reason (a TripInfeasible)" in fn.__doc__
        assert "Fly a mission" in fn.__doc__ or "take-off mass needed" in fn.__doc__  # C's


def test_a_feasible_trip_says_feasible_on_every_path(clib):
    mission = acperf.Mission(distance=500 * NM, cruise_altitude=FL350)
    _, want = c_trip(clib, "trip", mission, 36000.0)
    for label, call in paths("trip").items():
        r = call(JET, mission, 36000.0)
        assert r.infeasible is acperf.TripInfeasible.FEASIBLE, label
        assert r.trip_fuel == want["trip_fuel"], label


def test_a_lower_bound_says_at_least():
    """A trip that cannot be flown from an iterate above mass_max_takeoff stops with
    the excess of that iterate, a lower bound (mission.h: excess_at_least = 1); the
    message says so. 6,000 km from a 32 t zero-fuel mass: the demo jet cannot cruise at
    the take-off mass it would need."""
    ac = acperf.Aircraft.from_file(demo_aircraft_path("regional_jet.toml"))
    with pytest.raises(acperf.InfeasibleTrip) as info:
        acperf.trip_for_zero_fuel_mass(ac, acperf.Mission(distance=6.0e6, cruise_altitude=10668.0),
                                       32000.0)
    assert info.value.reason is acperf.TripInfeasible.OVER_MAX_TAKEOFF
    assert info.value.result.excess_at_least == 1.0
    assert "by at least" in str(info.value)
