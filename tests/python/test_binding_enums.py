"""The coded values as IntEnums (issue 16, item 5: the enums).

References: the C enums of the public headers (read from the header text, not
from the binding); the struct field comments that name the enum a field holds
("an acp_limit", "an acp_altitude_limit value", ...); speeds.h for the speed
stability code (+1, 0, -1, no C enum); the C calls through ctypes for the coded
values themselves; and the design contract (/work/shared/DESIGN.md: "Coded
result fields are IntEnums"). Estimates for an invented aircraft, not approved data.
"""

import math
import re

import numpy as np
import pytest

import acperf
from conftest import HEADERS, demo_aircraft_path, same, typed_as_documented

JET = acperf.Aircraft.from_file(demo_aircraft_path())

# Python enum: (C enum, header, prefix of its constants)
ENUMS = {
    acperf.TripInfeasible: ("acp_trip_infeasible", "mission.h", "ACP_TRIP_"),
    acperf.Limit: ("acp_limit", "aircraft.h", "ACP_LIMIT_"),
    acperf.AltitudeLimit: ("acp_altitude_limit", "climb.h", "ACP_ALTITUDE_LIMIT_"),
    acperf.CruiseMode: ("acp_cruise_mode", "cruise.h", "ACP_CRUISE_"),
    acperf.CruiseEnd: ("acp_cruise_end", "cruise.h", "ACP_CRUISE_END_"),
    acperf.CruiseLimit: ("acp_cruise_limit", "cruise.h", "ACP_CRUISE_LIMIT_"),
    acperf.ScheduleMode: ("acp_schedule_mode", "schedule.h", "ACP_MODE_"),
    acperf.Rating: ("acp_rating", "propulsion.h", "ACP_RATING_"),
}
BY_C_NAME = {c: e for e, (c, _, _) in ENUMS.items()}


def _text(name):
    return (HEADERS / name).read_text()


def header_enum(cname, header):
    """{constant: value} of `enum cname { ... };` in the header text."""
    body = re.search(r"enum\s+%s\s*\{(.*?)\};" % cname, _text(header), re.S).group(1)
    body = re.sub(r"/\*.*?\*/", " ", body, flags=re.S)
    return {k: int(v) for k, v in re.findall(r"(ACP_\w+)\s*=\s*(-?\d+)", body)}


def header_struct_codes():
    """{struct: {field: C enum name}} of the struct fields whose comment names a C enum."""
    enums = set(re.findall(r"enum\s+(acp_\w+)\s*\{",
                           "".join(h.read_text() for h in HEADERS.glob("*.h"))))
    found = {}
    for h in sorted(HEADERS.glob("*.h")):
        for body, name in re.findall(r"typedef\s+struct\s*\{(.*?)\}\s*(acp_\w+)\s*;",
                                     h.read_text(), re.S):
            codes = {}
            for field, comment in re.findall(r"double\s+(\w+)\s*;\s*/\*\*<(.*?)\*/", body, re.S):
                named = [e for e in re.findall(r"acp_\w+", comment) if e in enums]
                if named:
                    codes[field] = named[0]
            found[name] = codes
    return found


@pytest.mark.parametrize("py_enum", list(ENUMS), ids=lambda e: e.__name__)
def test_each_enum_is_the_c_enum(py_enum):
    cname, header, prefix = ENUMS[py_enum]
    want = {k[len(prefix):]: v for k, v in header_enum(cname, header).items()}
    assert want, cname
    assert {m.name: m.value for m in py_enum} == want
    assert issubclass(py_enum, int) and py_enum.__module__ == "acperf"
    for member in py_enum:  # the same value as the capi constant, and equal to the int
        assert member == getattr(acperf.capi, prefix + member.name) == int(member)


def test_speed_stability_is_the_code_of_speeds_h(clib):
    # speeds.h: "+1 speed stable (dD/dV > 0, above VMD), -1 unstable (below), 0 neutral"
    comment = re.search(r"double stable;\s*/\*\*<(.*?)\*/", _text("speeds.h"), re.S).group(1)
    assert "+1 speed stable" in comment and "-1 unstable" in comment and "0 neutral" in comment
    S = acperf.SpeedStability
    assert (S.STABLE, S.UNSTABLE, S.NEUTRAL) == (1, -1, 0) and len(S) == 3
    handle = int(JET._handle)
    vmd = acperf.speeds(JET, 36000.0, 10668.0).vmd
    for tas, member in ((vmd * 0.8, S.UNSTABLE), (vmd * 1.2, S.STABLE)):
        c = clib.call("acp_speed_stability", handle, 36000.0, 10668.0, 0.0, tas)
        for got in (acperf.speed_stability(JET, 36000.0, 10668.0, 0.0, tas),
                    acperf.speed_stability.__wrapped__(JET, 36000.0, 10668.0, 0.0, tas)):
            assert got.stable is member and got.stable == c["stable"]


def test_trip_infeasible_names_those_of_the_brief():
    names = [m.name for m in acperf.TripInfeasible]
    assert names[0] == "FEASIBLE" and names[1] == "OVER_MAX_TAKEOFF"
    assert names[-2:] == ["BELOW_OPERATING_EMPTY", "BELOW_STALL"] and len(names) == 13


def result_types():
    return [getattr(acperf, n) for n in acperf.__all__
            if isinstance(getattr(acperf, n), type) and getattr(acperf, n) is not acperf.Result
            and issubclass(getattr(acperf, n), acperf.Result)]


def test_every_coded_struct_field_is_its_enum_in_the_result():
    # Each result type whose fields are a C struct's: the fields whose header comment
    # names a C enum hold that enum; the others are plain numbers.
    codes = header_struct_codes()
    structs = {}
    for h in sorted(HEADERS.glob("*.h")):
        for body, name in re.findall(r"typedef\s+struct\s*\{(.*?)\}\s*(acp_\w+)\s*;",
                                     h.read_text(), re.S):
            body = re.sub(r"/\*.*?\*/", " ", body, flags=re.S)
            structs[name] = tuple(f.strip() for d in body.split(";") if d.strip()
                                  for f in d.strip()[len("double"):].split(","))
    matched = 0
    for rt in result_types():
        struct = [s for s, fields in structs.items() if fields == rt._fields]
        if not struct:
            assert not any(rt._enums), rt  # a result of out-pointers: no codes
            continue
        matched += 1
        want = {f: BY_C_NAME[c] for f, c in codes[struct[0]].items()}
        got = {f: e for f, e in zip(rt._fields, rt._enums) if e is not None}
        if struct[0] == "acp_stability":
            want["stable"] = acperf.SpeedStability  # a code without a C enum (speeds.h)
        assert got == want, (rt.__name__, struct[0])
    assert matched >= 15
    # the ones the brief names
    assert acperf.TripResult._enums[0] is acperf.TripInfeasible
    assert dict(zip(acperf.CruisePoint._fields, acperf.CruisePoint._enums))["limit"] \
        is acperf.CruiseLimit


def scalar_calls():
    """(name, call, ctypes name, ctypes args) of scalar calls with coded fields."""
    h = 10668.0
    mission = acperf.Mission(distance=500 * 1852.0, cruise_altitude=h)
    return [
        ("ceilings", lambda f: f(JET, 36000.0), "acp_ceilings", (36000.0, 0.0)),
        ("climb", lambda f: f(JET, 38000.0, 457.2, h), "acp_climb",
         (38000.0, 457.2, h, 0.0, 0.0, 0.0)),
        ("climb_point", lambda f: f(JET, 38000.0, 3000.0), "acp_climb_point",
         (38000.0, 3000.0, 0.0, 0.0)),
        ("descent_point", lambda f: f(JET, 33000.0, h), "acp_descent_point",
         (33000.0, h, 0.0, 0.0)),
        ("cruise_speed", lambda f: f(JET, acperf.CruiseMode.LONG_RANGE, 0.0, 36000.0, h, 0.0),
         "acp_cruise_speed", (3, 0.0, 36000.0, h, 0.0, 0.0)),
        ("cruise", lambda f: f(JET, acperf.CruiseMode.FIXED_MACH, 0.0, 36000.0, h, 0.0, 0.0,
                               acperf.CruiseEnd.DISTANCE, 1.0e5),
         "acp_cruise", (1, 0.0, 36000.0, h, 0.0, 0.0, 1, 1.0e5, 0.0, 0.0)),
        ("speed_schedule", lambda f: f(8000.0, 0.0, 128.0, 3048.0, 150.0, 0.78, 180.0, 0.82),
         "acp_speed_schedule", (8000.0, 0.0, 128.0, 3048.0, 150.0, 0.78, 180.0, 0.82)),
        ("trip", lambda f: f(JET, mission, 36000.0), "acp_trip", (int(mission._handle), 36000.0)),
    ]


@pytest.mark.parametrize("name, call, cname, cargs", scalar_calls(),
                         ids=[c[0] for c in scalar_calls()])
def test_scalar_results_give_members_on_every_path(clib, name, call, cname, cargs):
    fn = getattr(acperf, name)
    models = () if name == "speed_schedule" else (int(JET._handle),)
    want = clib.call(cname, *models, *cargs)
    forms = [fn, getattr(fn, "__wrapped__", fn)]  # the fast path (when it has one), SWIG's
    results = [call(f) for f in forms]
    for r in results:
        assert typed_as_documented(tuple(r), type(r)), (name, r)
        for field, e in zip(r._fields, r._enums):
            v = getattr(r, field)
            assert v == want[field] or math.isnan(v) and math.isnan(want[field]), (name, field)
            if e is not None and not math.isnan(want[field]):
                assert type(v) is e and v is e(int(want[field])), (name, field)
    assert [type(v) for v in results[0]] == [type(v) for v in results[-1]]


def test_nan_stays_a_float_and_unknown_codes_stay_numbers():
    n = len(acperf.Profile._fields)
    r = acperf.Profile._from_c([math.nan] * n)
    assert type(r.limit) is float and math.isnan(r.limit)
    r = acperf.Profile._from_c([0.0] * (n - 2) + [2.5, 0.0])
    assert type(r.limit) is float and r.limit == 2.5  # no acp_limit value: left as it is
    r = acperf.Profile._from_c([0.0] * (n - 2) + [3.0, 12.0])
    assert r.limit is acperf.Limit.MAX_ALTITUDE and type(r.limit_excess) is float


def test_array_results_stay_float_arrays_of_the_codes():
    # an array call keeps float64 (NaN marks a failed point); the values are the codes
    masses = np.array([36000.0, 2.0e6])
    with pytest.warns(acperf.AcperfWarning):
        r = acperf.ceilings(JET, masses)
    assert r.optimum_limit.dtype == np.float64 and math.isnan(r.optimum_limit[1])
    assert r.optimum_limit[0] == acperf.ceilings(JET, 36000.0).optimum_limit


def test_the_old_constants_are_the_members_and_work_as_arguments():
    assert acperf.CRUISE_LONG_RANGE is acperf.CruiseMode.LONG_RANGE
    assert acperf.END_DISTANCE is acperf.CruiseEnd.DISTANCE
    assert acperf.MODE_MACH is acperf.ScheduleMode.MACH
    assert acperf.RATING_CLIMB is acperf.Rating.CLIMB
    by_member = acperf.engine_rating(JET, acperf.Rating.CLIMB, 10668.0, 0.0, 230.0)
    by_int = acperf.engine_rating(JET, 1, 10668.0, 0.0, 230.0)
    assert all(same(a, b) for a, b in zip(by_member, by_int))
    mode = acperf.CruiseMode.MAX_RANGE
    assert acperf.cruise_speed(JET, mode, 0.0, 36000.0, 10668.0, 0.0) == \
        acperf.cruise_speed(JET, 2.0, 0.0, 36000.0, 10668.0, 0.0)


def test_recycled_fast_results_get_fresh_members():
    # fastcall.c refills a dropped named result in place: its coded fields must be
    # the members of the new call, never the old one's (the reference: SWIG's path)
    fn = acperf.ceilings
    want = {m: fn.__wrapped__(JET, m) for m in (26000.0, 36000.0, 40000.0)}
    for _ in range(3):
        for m, w in want.items():
            got = fn(JET, m)
            assert tuple(got) == tuple(w)
            assert [type(v) for v in got] == [type(v) for v in w]
