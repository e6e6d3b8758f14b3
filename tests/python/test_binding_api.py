"""Every Python function of acperf against libacperf's own scalar result.

For each binding, on a grid of points that includes invalid ones:
  * the Python scalar path (SWIG) and the C function called through ctypes
    (independent of SWIG, prototypes read from the headers) must agree to the
    last bit, and fail on the same points: AcperfError carrying the status
    text of acp_strerror where C returns a status, NaN where C returns NaN;
  * the array path (one call of the `_n` form, or the point-by-point fallback)
    must give the same bits, NaN on the failed points, and warn with their count.
The reference here is the C library itself: the physics is checked against
published standards by the C tests and the other test_binding_* files.
"""

import inspect
import itertools
import math
import re
import warnings

import numpy as np
import pytest

import acperf
from conftest import (close, HEADERS, CStatusError, parse_headers, parse_structs, same,
                      typed_as_documented)

# Sample values per C parameter name, valid and invalid ones (the last entries
# of most lists are outside the documented ranges of the headers).
POOLS = {
    "hp": [-2000.0, 0.0, 3048.0, 11000.0, 15000.0, 30000.0, 84852.0, 90000.0],
    "dtemp": [0.0, -30.0, 20.0, 150.0],
    "cas": [0.0, 60.0, 150.0, 250.0, 400.0, 2000.0],
    "tas": [0.0, 60.0, 150.0, 250.0, 600.0, -5.0],
    "eas": [0.0, 60.0, 150.0, 250.0, 400.0, -1.0],
    "mach": [0.0, 0.3, 0.78, 0.99, 1.5, 3.0, 6.0],
    "pressure": [101325.0, 50000.0, 5000.0, 10.0, 200000.0, -1.0],
    "geometric": [-5000.0, 0.0, 11000.0, 86000.0, 2.0e6],
    "geopotential": [-5000.0, 0.0, 11000.0, 84852.0, 1.0e7],
    "density": [1.225, 0.5, 0.01, 10.0, -1.0],
    "oat": [288.15, 220.0, 300.0, -1.0],
    "sat": [216.65, 288.15, 250.0, 0.0],
    "tat": [216.65, 288.15, 250.0, 0.0],
    "recovery": [1.0, 0.9, 0.0, 1.5],
    "indicated": [0.0, 1000.0, 10000.0, 90000.0],
    "qnh": [101325.0, 98000.0, 103000.0, 50000.0],
    "height": [0.0, 300.0, 1000.0, -10.0],
    "elevation": [0.0, 1500.0, 12000.0],
    "temperature": [288.15, 250.0, 230.0, 0.0],
    "ratio": [0.0, 0.1, 0.89, 2.0, 10.0, 1.0e4, -1.0],
    "qc": [0.0, 1000.0, 50000.0, 300000.0, -1.0],
    "track": [0.0, 1.0, 3.0, 5.5],
    "wind_from": [0.0, 1.0, 3.0, 5.5],
    "wind_speed": [0.0, 10.0, 50.0, 200.0],
    "reynolds": [1.0e3, 1.0e5, 1.0e7, 1.0e9, 1.0e11, 10.0],
    "laminar_fraction": [0.0, 0.3, 1.0, 1.2],
    "length": [0.5, 3.0, 30.0, 0.0],
    "roughness": [0.0, 1.5e-6, 1.0e-5, -1.0],
    "aspect_ratio": [4.0, 9.4, 20.0, 0.0],
    "sweep_le": [0.0, 0.47, 1.0, 2.0],
    "winglet_height": [0.0, 0.9, 2.0, -1.0],
    "span": [10.0, 26.0, 60.0, 0.0],
    "kappa": [0.87, 0.95, 0.0],
    "thickness_ratio": [0.08, 0.12, 0.15, 0.6],
    "sweep": [0.0, 0.4, 0.6, 2.0],
    "cl": [0.0, 0.4, 0.8, -5.0],
    "mach_drag_divergence": [0.6, 0.8, 0.9, 2.0],
    "mach_critical": [0.6, 0.7, 0.75, -1.0],
    "max_thickness_position": [0.3, 0.4, 0.5, 1.5],
    # schedule.h: 250 kt below 10,000 ft, 290 kt / M0.76, VMO 320 kt, MMO 0.82
    # (invented); element 1 of each pool is a valid value
    "cas_low": [-1.0, 128.6],
    "hp_limit": [3048.0, 3048.0],
    "vmo": [-1.0, 164.6],
    "mmo": [6.0, 0.82],
    "mode": [9.0, 2.0, 3.0],
    # propulsion.h
    "throttle_ratio": [2.0, 1.05, 1.0],
    "c0": [-1.0, 1.19e-5],
    "c1": [0.0, 1.05e-5],
    "density_ratio": [0.1, 1.0, 0.5],
    # cruise.h, Breguet: 230 m/s, TSFC 0.6 lb/(lbf h) = 1.7e-5 kg/(N s), L/D 16 (invented)
    "tsfc": [-1.0, 1.7e-5, 2.0e-5],
    "lift_to_drag": [0.0, 16.0, 12.0],
    "mass_start": [-1.0, 36000.0, 5000.0],
    "mass_end": [40000.0, 33000.0, 4500.0],
    "propeller_efficiency": [1.5, 0.82],
    "psfc": [0.0, 1.0e-7],
    "sweep_max_thickness": [0.0, 0.3, 0.5, 2.0],
    "fineness_ratio": [2.0, 7.5, 12.0, 0.0],
}
MAX_POINTS = 400

# Every function of the Pythonic layer bound to a C function; those taking a
# model (an aircraft) are checked in test_binding_aircraft.py.
BOUND = sorted(name for name in acperf.__all__
               if callable(getattr(acperf, name)) and hasattr(getattr(acperf, name), "c_function"))
PLAIN = [name for name in BOUND if not getattr(getattr(acperf, name), "c_models", ("model",))]


def grid(params):
    pools = [POOLS[p] for p in params]
    points = list(itertools.product(*pools))
    step = max(1, len(points) // MAX_POINTS)
    return points[::step] + [tuple(math.nan for _ in params)]


def c_reference(clib, cname, point):
    """(ok, value or status) of the C function through ctypes."""
    ret, _ = clib.protos[cname]
    try:
        value = clib.call(cname, *point)
    except CStatusError as exc:
        return False, exc.status
    if ret == "double":
        return (not math.isnan(value)), value
    return True, value


def as_tuple(value, fields):
    if isinstance(value, dict):
        return tuple(value[f] for f in fields)
    if isinstance(value, tuple):
        return value
    return (value,)


def test_bound_functions_found():
    # The layer binds the functions of atmosphere.h, airspeed.h and friction.h.
    assert len(BOUND) >= 40
    assert "isa" in BOUND and "cas_to_mach" in BOUND and "skin_friction" in BOUND


@pytest.mark.parametrize("name", BOUND)
def test_parameter_names_are_the_c_names(name):
    fn = getattr(acperf, name)
    ret, cparams = parse_headers()[fn.c_function]
    # trace functions take (capacity, points, count) from the Python layer itself
    inputs = [p for t, p in cparams if t in ("double", "const char*", "const acp_aircraft*", "int",
                                             "const acp_mission*")
              or (t == "size_t" and p not in ("n", "capacity") and not p.startswith("n_"))
              or (t == "const double*")]
    assert list(inspect.signature(fn).parameters) == inputs
    assert fn.c_function.startswith("acp_" + name)


@pytest.mark.parametrize("name", PLAIN)
def test_scalar_and_array_paths_match_c(name, clib):
    fn = getattr(acperf, name)
    params = list(inspect.signature(fn).parameters)
    fields = getattr(fn(*[POOLS[p][1] for p in params]), "_fields", None) \
        if name not in ("crossover_altitude",) else None
    points = grid(params)
    expected = [c_reference(clib, fn.c_function, pt) for pt in points]
    assert any(ok for ok, _ in expected), "the grid must contain valid points"

    # Scalar path, point by point.
    for pt, (ok, ref) in zip(points, expected):
        if ok:
            got = fn(*pt)
            want = as_tuple(ref, fields)
            got_t = tuple(got) if fields else (got,)
            assert all(same(g, w) for g, w in zip(got_t, want)), (pt, got, ref)
            assert typed_as_documented(got_t, type(got) if fields else None), got
        else:
            with pytest.raises(acperf.AcperfError) as err:
                fn(*pt)
            if clib.protos[fn.c_function][0] == "int":
                assert err.value.status == ref
                assert clib.strerror(ref) in str(err.value)
            else:
                assert err.value.status is None
                assert clib.strerror(1) in str(err.value)  # "invalid argument, or ..."
            assert isinstance(err.value, ValueError)

    # Array path, all points in one call.
    columns = [np.array(col) for col in zip(*points)]
    nbad = sum(1 for ok, _ in expected if not ok)
    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always")
        got = fn(*columns)
    msgs = [str(w.message) for w in caught if issubclass(w.category, acperf.AcperfWarning)]
    if nbad:
        assert len(msgs) == 1 and msgs[0].startswith(f"{name}: {nbad} of {len(points)} points")
    else:
        assert not msgs
    outs = [np.asarray(o) for o in (got if fields else (got,))]
    for i, (ok, ref) in enumerate(expected):
        if ok:
            want = as_tuple(ref, fields)
            assert all(close(o[i], w) for o, w in zip(outs, want)), (points[i], ref)
        else:
            assert all(math.isnan(o[i]) for o in outs), points[i]


def header_file(name):
    """A public header in the source tree (version.h is configured from version.h.in)."""
    path = HEADERS / name
    return path if path.exists() else HEADERS / (name + ".in")


def wrapped_headers():
    text = (HEADERS.parents[2] / "bindings" / "python" / "acperf.i").read_text()
    return [header_file(m.split("/")[-1])
            for m in re.findall(r'%include\s+"(acperf/\w+\.h)"', text)]


def test_every_header_is_wrapped():
    # A new public header needs its %include line in bindings/python/acperf.i
    # (and its Python forms): this fails until it has them.
    wrapped = {h.name.replace(".h.in", ".h") for h in wrapped_headers()}
    public = {h.name.replace(".h.in", ".h") for h in HEADERS.glob("*.h*")} - {"export.h"}
    assert public - wrapped == set()


def test_every_wrapped_function_is_reachable():
    protos = parse_headers(wrapped_headers())
    assert len(protos) > 60
    python_forms = {getattr(acperf, n).c_function for n in BOUND}
    python_forms |= {getattr(acperf, n).c_array_function for n in BOUND} - {None}
    python_forms |= {getattr(acperf.units, n).c_function
                     for n in acperf.units.__all__ if hasattr(getattr(acperf.units, n), "c_function")}
    python_forms |= {"acp_to_si", "acp_from_si", "acp_strerror", "acp_version",
                     "acp_version_string"}
    # the model functions behind acperf.Aircraft (checked in test_binding_aircraft.py)
    python_forms |= {n for n in protos if n.startswith("acp_aircraft_")}
    # and behind acperf.Mission
    python_forms |= {n for n in protos if n.startswith("acp_mission_")}
    for cname in protos:
        assert hasattr(acperf.capi, cname), f"{cname} missing from acperf.capi"
    assert set(protos) - python_forms == set(), "C functions without a Python form"
    assert acperf.strerror is acperf.capi.acp_strerror
    assert acperf.version() == acperf.capi.acp_version()


def test_result_fields_are_the_c_struct_fields():
    structs = parse_structs()
    assert list(acperf.Atmos._fields) == structs["acp_atmos"]
    assert set(acperf.Atmos._fields) == acperf._core.struct_fields(acperf.capi.acp_atmos)
    # The `_n` outputs of isa are in the struct's order (they are named alike).
    _, params = parse_headers()["acp_isa_n"]
    assert [p for t, p in params if t == "double*"] == structs["acp_atmos"]
    # wind_triangle's result fields are the C out-pointer names.
    _, params = parse_headers()["acp_wind_triangle"]
    assert [p for t, p in params if t == "double*"] == list(acperf.WindTriangle._fields)


def test_docstrings_come_from_the_headers():
    assert "ISO 2533" in acperf.isa.__doc__
    assert "NACA Report 1135" in acperf.impact_pressure.__doc__
    assert "estimates, not approved flight-manual data" in acperf.cas_to_mach.__doc__
    assert "acp_cas_to_mach_n" in acperf.cas_to_mach.__doc__
