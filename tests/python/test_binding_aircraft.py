"""acperf.Aircraft and the drag and speed functions against libacperf through ctypes.

Both sides load the same invented demo aircraft (examples/aircraft/*.toml); the
binding's scalar path, its array path and the ctypes call of the C function
must give the same bits, and fail on the same points. On a failed point the
array form gives NaN, except where the header documents partial results
(speeds.h: a speed not found is NaN with ACP_ERR_RANGE, the others are still
given): there each output is NaN or exactly what the C scalar call left. The
scalar path raises on any failed status. The speed ordering
VMR > VMD > VMP is a property of any parabolic drag polar (common practice:
VMP = 3^-1/4 VMD and VMR = 3^1/4 VMD for D = A V^2 + B/V^2).
"""

import copy
import ctypes
import inspect
import itertools
import math
import pickle
import warnings

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

import acperf
from conftest import HEADERS, CStatusError, demo_aircraft_path, parse_headers, same

settings.register_profile("acperf-aircraft", max_examples=100, deadline=None, database=None)

MODEL_FUNCTIONS = sorted(n for n in acperf.__all__
                         if getattr(getattr(acperf, n), "c_models", ()) == ("ac",)
                         and getattr(acperf, n).c_array_function != getattr(acperf, n).c_function)

SPEEDS_H = parse_headers([HEADERS / "speeds.h"])

POOLS = {
    "mass": [5000.0, 5500.0, 15000.0, 30000.0, 38000.0, 0.0, 2.0e6],
    "hp": [0.0, 3000.0, 10000.0, 12000.0, 90000.0],
    "dtemp": [0.0, 15.0, -10.0, -200.0],
    "tas": [60.0, 150.0, 230.0, 0.0, 400.0],
    "load_factor": [1.0, 1.5, 20.0],
    "bank": [0.0, 0.5, 2.0],
    # profiles (climb.h): valid climbs and descents among the pairs, and bad ones
    "hp_start": [457.2, 6000.0, 10668.0, 90000.0],
    "hp_end": [6000.0, 457.2],
    "wind": [0.0, -20.0],
    "step": [0.0, 300.0, 5.0],
    # level speed changes (climb.h): accelerating, decelerating, beyond VMO or the stall
    "tas_start": [80.0, 150.0, 0.0],
    "tas_end": [100.0, 160.0],
    # engines (propulsion.h)
    "rating": [1.0, 3.0, 7.0],
    "thrust": [2000.0, 20000.0, -1.0, 1.0e7],
}


@pytest.fixture(scope="module", params=["regional_jet.toml", "light_twin.toml"])
def pair(request, clib):
    """(acperf.Aircraft, ctypes handle) of the same demo file."""
    path = demo_aircraft_path(request.param)
    lib = clib.lib
    lib.acp_aircraft_new.restype = ctypes.c_void_p
    lib.acp_aircraft_free.argtypes = [ctypes.c_void_p]
    lib.acp_aircraft_load.argtypes = [ctypes.c_void_p, ctypes.c_char_p, ctypes.c_char_p,
                                      ctypes.c_size_t]
    handle = lib.acp_aircraft_new()
    assert lib.acp_aircraft_load(handle, str(path).encode(), None, 0) == 0
    yield acperf.Aircraft.from_file(path), handle
    lib.acp_aircraft_free(handle)


def c_outputs(clib, cname, handle, point):
    try:
        out = clib.call(cname, handle, *point)
    except CStatusError as exc:
        return False, (exc.status, exc.outputs)
    return True, out


@pytest.mark.parametrize("name", MODEL_FUNCTIONS)
def test_model_functions_match_c(name, pair, clib):
    ac, handle = pair
    fn = getattr(acperf, name)
    params = list(inspect.signature(fn).parameters)[1:]
    points = list(itertools.product(*[POOLS[p] for p in params]))
    fields = None
    expected = [c_outputs(clib, fn.c_function, handle, pt) for pt in points]
    assert sum(ok for ok, _ in expected) >= 5, "the grid must contain valid points"
    for pt, (ok, ref) in zip(points, expected):
        if ok:
            got = fn(ac, *pt)
            if not hasattr(got, "_fields"):  # one output: a float
                assert same(got, ref), (pt, got, ref)
                continue
            fields = got._fields
            assert all(same(getattr(got, f), ref[f]) for f in fields), (pt, got, ref)
        else:
            with pytest.raises(acperf.AcperfError) as err:
                fn(ac, *pt)
            assert err.value.status == ref[0] and clib.strerror(ref[0]) in str(err.value)
    columns = [np.array(c) for c in zip(*points)]
    nbad = sum(not ok for ok, _ in expected)
    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always")
        got = fn(ac, *columns)
    counts = [str(w.message) for w in caught if issubclass(w.category, acperf.AcperfWarning)]
    assert (len(counts) == 1 and f"{nbad} of {len(points)}" in counts[0]) if nbad else not counts
    partial = fn.c_function in SPEEDS_H  # documented partial results (speeds.h)
    if not hasattr(got, "_fields"):  # one output: an array
        for i, (ok, ref) in enumerate(expected):
            assert same(got[i], ref) if ok else math.isnan(got[i]), (name, points[i])
        return
    for i, (ok, ref) in enumerate(expected):
        for f in got._fields:
            v = getattr(got, f)[i]
            if ok:
                assert same(v, ref[f]), (name, points[i], f)
            elif partial:
                assert math.isnan(v) or same(v, ref[1][f]), (name, points[i], f)
            else:
                assert math.isnan(v), (name, points[i], f)


def test_aircraft_keys_and_constructors(pair):
    ac, _ = pair
    assert isinstance(ac["wing_area"], float) and ac["wing_area"] > 0
    assert "invented" in ac["name"]
    keys = ac.keys()
    assert keys[0] in ("name", "wing_area") and len(keys) == len(set(keys))
    # from_dict of its own keys gives the same model, hence the same drag bits
    same_ac = acperf.Aircraft.from_dict(ac.to_dict())
    assert acperf.drag(same_ac, 30000.0, 10000.0, 0.0, 200.0) == \
        acperf.drag(ac, 30000.0, 10000.0, 0.0, 200.0) or ac["wing_area"] < 40
    text = demo_aircraft_path().read_text()
    assert acperf.Aircraft.from_text(text).to_dict() == \
        acperf.Aircraft.from_file(demo_aircraft_path()).to_dict()


def test_aircraft_copy_deepcopy_and_pickle_give_models_of_their_own(pair):
    # each is a new C model with the same keys (hence the same drag bits); changing
    # one leaves the other; a mission cannot be copied and says so
    ac, _ = pair
    want = acperf.drag(ac, 30000.0, 3000.0, 0.0, 150.0)
    for other in (copy.copy(ac), copy.deepcopy(ac), pickle.loads(pickle.dumps(ac))):
        assert type(other) is acperf.Aircraft and other._handle is not ac._handle
        assert other.to_dict() == ac.to_dict()
        assert acperf.drag(other, 30000.0, 3000.0, 0.0, 150.0) == want
        other["wing_area"] = 2.0 * ac["wing_area"]
        assert acperf.drag(ac, 30000.0, 3000.0, 0.0, 150.0) == want
    with pytest.raises(TypeError):
        copy.copy(acperf.Mission())


def test_aircraft_from_dict_nested_and_copy():
    flat = acperf.Aircraft.from_dict({"wing_area": 30.0, "span": 15.0, "cd0": 0.025,
                                      "oswald": 0.8, "cl_max": 1.5})
    assert flat["cd0"] == 0.025 and flat.keys() == ["wing_area", "span", "cd0", "oswald",
                                                    "cl_max"]
    assert flat["aspect_ratio"] == pytest.approx(15.0 ** 2 / 30.0, rel=1e-15)  # AR = b^2/S
    other = flat.copy()
    other["cd0"] = 0.03
    assert flat["cd0"] == 0.025 and other["cd0"] == 0.03
    del other["cd0"]
    assert "cd0" not in other
    nested = acperf.Aircraft.from_dict({"wing_area": 30.0, "component": {"wing": {
        "type": "surface", "wetted_area": 55.0, "length": 2.0, "thickness_ratio": 0.12}}})
    assert nested.components() == ["wing"]
    assert nested["component.wing.type"] == "surface"
    assert nested["component.wing.wetted_area"] == 55.0


def test_aircraft_errors():
    with pytest.raises(acperf.AcperfError, match="line 2: unknown key 'bogus'") as err:
        acperf.Aircraft.from_text("wing_area = 30.0\nbogus = 2\n")
    assert err.value.status == acperf.capi.ACP_ERR_PARSE
    with pytest.raises(acperf.AcperfError) as err:
        acperf.Aircraft.from_file("/nonexistent/acperf.toml")
    assert err.value.status == acperf.capi.ACP_ERR_IO
    ac = acperf.Aircraft()
    with pytest.raises(KeyError):
        ac["no_such_key"]
    with pytest.raises(acperf.AcperfError) as err:
        ac["wing_area"] = -1.0
    assert err.value.status == acperf.capi.ACP_ERR_RANGE
    with pytest.raises(acperf.AcperfError):
        ac.check()  # empty model: incomplete
    with pytest.raises(acperf.AcperfError):
        acperf.drag(ac, 30000.0, 10000.0, 0.0, 200.0)


def test_drag_curve_matches_scalar_drag(pair):
    ac, _ = pair
    tas = np.linspace(60.0, 260.0, 41)
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", acperf.AcperfWarning)
        curve = acperf.drag_curve(ac, 20000.0, 6000.0, 0.0, tas)
        parts = acperf.drag(ac, 20000.0, 6000.0, 0.0, tas)
    for f in curve._fields:
        np.testing.assert_array_equal(getattr(curve, f), getattr(parts, f))


def test_pandas_frame_from_speeds(pair):
    import pandas as pd

    ac, _ = pair
    table = pd.DataFrame({"mass": [6000.0, 30000.0, 34000.0], "hp": [3000.0, 9000.0, 11000.0]})
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", acperf.AcperfWarning)
        out = acperf.speeds(ac, table["mass"], table["hp"]).to_frame()
    assert list(out.columns) == ["vmd", "vmp", "vmr", "vs1g", "ld_max"]
    assert out.index.equals(table.index)


@settings(settings.get_profile("acperf-aircraft"))
@given(st.floats(18000.0, 38000.0), st.floats(0.0, 12000.0), st.floats(-30.0, 30.0))
def test_vmr_above_vmd_above_vmp(mass, hp, dtemp):
    ac = acperf.Aircraft.from_file(demo_aircraft_path())
    s = acperf.speeds(ac, mass, hp, dtemp)
    assert s.vmr > s.vmd > s.vmp
