"""The scalar fast path (acperf._fast, bindings/python/fastcall.c) against the SWIG path.

Every public function whose C inputs are models (aircraft, mission), then
doubles and enum-valued ints is an acperf._fast.function: floats and ints and
Aircraft/Mission objects, by position or keyword, go straight to C, anything
else to the generated Python function (`__wrapped__`, whose scalar path is the
SWIG call). For every such function, on the grids of test_binding_api.py and
test_binding_aircraft.py (valid and invalid points), the fast call must give
the same bits as the SWIG call, or the same AcperfError (message, status); and
the calls it does not take must reach the Python function unchanged. The
reference is the library's own SWIG call: the physics is checked elsewhere.
"""

import gc
import inspect
import itertools
import math
import pickle

import numpy as np
import pytest

import acperf
from acperf import _fast
from conftest import demo_aircraft_path, parse_headers, same, typed_as_documented
from test_binding_api import POOLS, grid
from test_binding_aircraft import POOLS as AIRCRAFT_POOLS

FAST = _fast.function
UNIT_VALUES = [0.0, 1000.0, -3.5, 1.0e308, math.inf, -math.inf, math.nan]


def public_functions():
    """{C name: public function} of the package and its units module."""
    found = {}
    for mod in (acperf, acperf.units):
        for name in mod.__all__:
            fn = getattr(mod, name)
            if callable(fn) and hasattr(fn, "c_function"):
                found.setdefault(fn.c_function, fn)
    return found


FUNCTIONS = public_functions()
FAST_NAMES = sorted(_fast.names())
UNITS = [getattr(acperf.units, n) for n in acperf.units.__all__]
MODEL_NAMES = [c for c in FAST_NAMES if set(FUNCTIONS[c].fast_inputs) & set("AM")]

JET = acperf.Aircraft.from_file(demo_aircraft_path())
MISSION = acperf.Mission(distance=300 * 1852.0, cruise_altitude=10668.0)
# Numbers of the model functions: the pools of test_binding_aircraft.py and, for
# the cruise and the trip, valid and invalid values of cruise.h and mission.h
# (the invented demo jet: 30 to 40 t, about 10 km; enum values 0 to 4 are modes,
# 9 and 2.5 are none). The first value of each pool is valid.
MODEL_POOLS = dict(AIRCRAFT_POOLS, **{
    "mode": [2.0, 0.0, 9.0, 2.5], "cost_index": [0.0, 30.0, -1.0],
    "end": [0.0, 1.0, 7.0], "end_value": [100000.0, 2000.0, -1.0],
    "step_climb": [0.0, 1.0], "takeoff_mass": [34000.0, 1.0e7, -1.0],
    "zero_fuel_mass": [30000.0, -1.0], "mass": [36000.0, 30000.0, 0.0, 2.0e6],
    "hp": [10668.0, 3000.0, 90000.0], "tas": [230.0, 150.0, 0.0, 400.0],
    "rating": [1.0, 3.0, 7.0, 2.5, 1.0e10],
    "tas_start": [150.0, 0.0, 400.0], "tas_end": [160.0, 140.0],
})
MODEL_MAX_POINTS = 40


def model_grid(params):
    """Each pool's values around the first (valid) point, then a sample of the
    product, then all NaN."""
    pools = [[JET] if p == "ac" else [MISSION] if p == "mission" else MODEL_POOLS[p]
             for p in params]
    base = tuple(pool[0] for pool in pools)
    points = [base[:i] + (v,) + base[i + 1:] for i, pool in enumerate(pools) for v in pool[1:]]
    product = list(itertools.product(*pools))
    points += product[::max(1, len(product) // MODEL_MAX_POINTS)]
    return [base] + points + [tuple(v if isinstance(v, acperf._fast.model) else math.nan
                                    for v in base)]


def points_of(fn):
    params = list(inspect.signature(fn).parameters)
    if fn.c_function in ("acp_" + n for n in acperf.units.__all__):
        return [(v,) for v in UNIT_VALUES]
    if set(fn.fast_inputs) & set("AM"):
        return model_grid(params)
    return grid(params)


def swig_args(args):
    """The arguments as SWIG takes them: models as their handles."""
    return tuple(acperf._core.model_handle(a) for a in args)


def outcome(call, *args):
    """("ok", result) or ("error", type, message, status) of a call."""
    try:
        return ("ok", call(*args))
    except acperf.AcperfError as exc:
        return ("error", type(exc), str(exc), exc.status)


def same_result(a, b):
    if a[0] != b[0]:
        return False
    if a[0] == "error":
        return a == b
    ra, rb = a[1], b[1]
    if type(ra) is not type(rb):
        return False
    if isinstance(ra, tuple):  # the same bits, and an enum member where the other has one
        return len(ra) == len(rb) and all(same(x, y) and type(x) is type(y)
                                          for x, y in zip(ra, rb))
    return same(ra, rb)


CODES = {"double": "d", "const acp_aircraft*": "A", "const acp_mission*": "M"}


def c_codes(params):
    """Type codes of a prototype's inputs as the fast path names them (None: other)."""
    return "".join(CODES.get(t, "e" if (t, p) in [("int", "rating"), ("int", "mode"),
                                                   ("int", "end")] else "?")
                   for t, p in params)


def test_every_model_and_number_function_has_the_fast_path():
    # The functions of the headers whose inputs are models, then doubles and enums,
    # with a double result or double/struct outputs: each public form is a fast
    # function whose inputs are exactly the C function's, in the header's order.
    protos = parse_headers()
    assert len(FAST_NAMES) >= 95 and len(MODEL_NAMES) >= 20
    for cname in FAST_NAMES:
        _, params = protos[cname]
        assert cname in FUNCTIONS, f"{cname}: no public Python form"
        fn = FUNCTIONS[cname]
        assert isinstance(fn, FAST), f"{cname}: public form is not the fast path"
        codes = fn.fast_inputs
        assert c_codes(params[:len(codes)]) == codes, cname
        if fn not in UNITS:  # the unit conversions all take `x`
            assert list(inspect.signature(fn).parameters) == [p for _, p in params[:len(codes)]]
    # and every public form that is not fast has an input the fast path cannot take
    # (a size, a string, an array, a capacity) or outputs that are not doubles
    for cname, fn in FUNCTIONS.items():
        if not isinstance(fn, FAST) and cname in protos:
            ret, params = protos[cname]
            n = len(inspect.signature(fn).parameters)
            outs = params[n:]
            plain = "?" not in c_codes(params[:n]) and all(
                t == "double*" for t, _ in outs) and (ret == "double") == (not outs)
            assert not plain or cname.endswith("_n"), cname


@pytest.mark.parametrize("cname", FAST_NAMES)
def test_fast_path_is_the_swig_path_bit_for_bit(cname):
    fn = FUNCTIONS[cname]
    swig = getattr(acperf.capi, cname)
    points = points_of(fn)
    nerr = nok = 0
    for pt in points:
        fast = outcome(fn, *pt)
        slow = outcome(fn.__wrapped__, *pt)  # the Python function: SWIG's scalar call
        assert same_result(fast, slow), (pt, fast, slow)
        raw = outcome(swig, *swig_args(pt))
        assert raw[0] == fast[0] and (raw[0] == "ok" or raw[2:] == fast[2:]), (pt, raw, fast)
        if fast[0] == "ok":
            nok += 1
            values = fast[1] if isinstance(fast[1], tuple) else (fast[1],)
            assert typed_as_documented(values, type(fast[1]) if isinstance(fast[1], tuple) else None)
        else:
            nerr += 1
            assert fast[1] is acperf.AcperfError
    assert nok > 0, "the grid must contain valid points"
    if fn.c_function not in ("acp_" + n for n in acperf.units.__all__):
        assert nerr > 0, "the grid must contain invalid points"  # at least the NaN point


@pytest.mark.parametrize("cname", FAST_NAMES)
def test_other_scalar_types_and_defaults(cname):
    fn = FUNCTIONS[cname]
    params = inspect.signature(fn).parameters
    pt = points_of(fn)[0]
    ref = outcome(fn.__wrapped__, *pt)
    # ints (also in the error message), numpy float64 (a float), numpy float32 and
    # int64 scalars (fallback), keywords: all as the Python function
    def each(convert):
        return tuple(v if isinstance(v, acperf._fast.model) else convert(v) for v in pt)

    variants = [each(lambda v: int(v) if math.isfinite(v) and v == int(v) else v),
                each(np.float64), each(np.float32)]
    for args in variants:
        assert same_result(outcome(fn, *args), outcome(fn.__wrapped__, *args)), args
    kw = dict(zip(params, pt))
    assert same_result(outcome(lambda: fn(**kw)), outcome(lambda: fn.__wrapped__(**kw)))
    last = list(params)[-1]
    head = pt[:-1]
    assert same_result(outcome(lambda: fn(*head, **{last: pt[-1]})),
                       outcome(lambda: fn.__wrapped__(*head, **{last: pt[-1]})))
    # trailing defaults (dtemp=0.0): filled in by the fast path, shown in errors as SWIG does
    required = [p for p in params.values() if p.default is inspect.Parameter.empty]
    if len(required) < len(params):
        short = pt[:len(required)]
        assert same_result(outcome(fn, *short), outcome(fn.__wrapped__, *short))
        bad = tuple(v if isinstance(v, acperf._fast.model) else math.nan
                    for v in pt[:len(required)])
        assert same_result(outcome(fn, *bad), outcome(fn.__wrapped__, *bad))


def test_fast_calls_never_reach_the_python_function_and_the_rest_do():
    calls = []

    def fallback(*args, **kwargs):
        calls.append((args, kwargs))
        return "fallback"

    f = FAST("acp_cas_to_tas", ("cas", "hp", "dtemp"), fallback, (0.0,), None)
    assert f(150.0, 3000.0) == acperf.capi.acp_cas_to_tas(150.0, 3000.0, 0.0)
    assert f(150, 3000, 10) == acperf.capi.acp_cas_to_tas(150.0, 3000.0, 10.0)
    assert f(np.float64(150.0), True, 0.0) == acperf.capi.acp_cas_to_tas(150.0, 1.0, 0.0)
    with pytest.raises(acperf.AcperfError, match=r"acp_cas_to_tas\(-1.0, 3000.0, 0.0\)"):
        f(-1.0, 3000.0)
    # keywords, in any order, with the defaults filled in
    assert f(150.0, 3000.0, dtemp=10.0) == acperf.capi.acp_cas_to_tas(150.0, 3000.0, 10.0)
    assert f(dtemp=10.0, hp=3000.0, cas=150.0) == acperf.capi.acp_cas_to_tas(150.0, 3000.0, 10.0)
    assert f(150.0, hp=3000.0) == acperf.capi.acp_cas_to_tas(150.0, 3000.0, 0.0)
    hp = "".join(["h", "p"])  # a keyword name that is not the interned string
    assert f(150.0, **{hp: 3000.0}) == acperf.capi.acp_cas_to_tas(150.0, 3000.0, 0.0)
    with pytest.raises(acperf.AcperfError, match=r"acp_cas_to_tas\(-1.0, 3000.0, 0.0\)"):
        f(hp=3000.0, cas=-1.0)
    assert calls == []
    for args, kwargs in [(([150.0],), {"hp": 0.0}), ((150.0, 0.0), {"dtemp": [1.0]}),
                         ((np.float32(1.0), 0.0), {}), ((np.int64(1), 0.0), {}),
                         ((150.0,), {}), ((1.0, 2.0, 3.0, 4.0), {}), ((10 ** 400, 0.0), {}),
                         (("150", 0.0), {}), ((None, 0.0), {}),
                         ((150.0, 0.0), {"altitude": 1.0}), ((150.0, 0.0), {"hp": 1.0}),
                         ((), {"hp": 0.0, "dtemp": 1.0}), ((150.0,), {"dtemp": 1.0})]:
        assert f(*args, **kwargs) == "fallback"
        assert calls[-1] == (args, kwargs)
    assert len(calls) == 13


def test_argument_errors_are_the_python_functions():
    fn = acperf.cas_to_mach
    for args in [(150.0,), (150.0, 1.0, 2.0), ("x", 0.0), (10 ** 400, 0.0)]:
        with pytest.raises(Exception) as fast:
            fn(*args)
        with pytest.raises(Exception) as slow:
            fn.__wrapped__(*args)
        assert type(fast.value) is type(slow.value) and str(fast.value) == str(slow.value)


def test_a_fast_function_looks_like_the_python_function():
    fn = acperf.isa
    assert isinstance(fn, FAST)
    assert list(inspect.signature(fn).parameters) == ["hp", "dtemp"]
    assert fn.__name__ == "isa" and fn.__qualname__ == "isa" and fn.__module__ == "acperf"
    assert fn.__doc__ == fn.__wrapped__.__doc__ and "ISO 2533" in fn.__doc__
    assert (fn.c_function, fn.c_array_function, fn.c_models) == ("acp_isa", "acp_isa_n", ())
    assert fn.fast_outputs == acperf.Atmos._fields
    assert pickle.loads(pickle.dumps(fn)) is fn
    assert pickle.loads(pickle.dumps(acperf.units.ft_to_m)) is acperf.units.ft_to_m
    r = fn(11000.0)
    assert type(r) is acperf.Atmos and r.to_dict()["temperature"] == 216.65
    assert isinstance(fn([0.0, 11000.0]).temperature, np.ndarray)  # the array path

    class Holder:
        convert = acperf.units.ft_to_m  # bound like a Python function

    with pytest.raises(TypeError):
        Holder().convert(1.0)  # the instance is the first argument: two arguments
    assert Holder.convert(1.0) == 0.3048


def test_fast_function_refuses_what_it_cannot_do():
    with pytest.raises(LookupError):
        FAST("acp_drag_component", ("ac", "index", "hp", "dtemp", "tas"), print, (),
             acperf.ComponentDrag)  # a size_t index: SWIG only
    with pytest.raises(ValueError):
        FAST("acp_cas_to_mach", ("cas", "hp", "dtemp"), print, (), None)  # parameter count
    with pytest.raises(ValueError):
        FAST("acp_isa", ("hp", "dtemp"), print, (), None)  # six outputs need a result type
    with pytest.raises(TypeError):
        FAST("acp_isa", ("hp", "dtemp"), print, (), dict)  # not a namedtuple
    with pytest.raises(TypeError):
        FAST("acp_isa", ("hp", 2), print, (), acperf.Atmos)  # names must be str
    with pytest.raises(TypeError):  # a default for a model
        FAST("acp_ceilings", ("ac", "mass", "dtemp"), print, (JET, 1.0, 0.0), acperf.CeilingSet)


def test_models_on_the_fast_path():
    calls = []

    def fallback(*args, **kwargs):
        calls.append((args, kwargs))
        return "fallback"

    f = FAST("acp_drag", ("ac", "mass", "hp", "dtemp", "tas"), fallback, (), acperf.DragParts)
    assert f.fast_inputs == "Adddd"
    raw = acperf.capi.acp_drag(JET._handle, 36000.0, 10668.0, 0.0, 230.0)
    want = tuple(getattr(raw, name) for name in acperf.DragParts._fields)
    assert f(JET, 36000.0, 10668.0, 0.0, 230.0) == want
    assert f(tas=230.0, ac=JET, mass=36000.0, hp=10668.0, dtemp=0.0) == want
    # a copy has its own C object; a changed model is read afresh
    other = JET.copy()
    assert f(other, 36000.0, 10668.0, 0.0, 230.0) == want
    other["component.wing.roughness"] = 4.0 * other["component.wing.roughness"]
    assert f(other, 36000.0, 10668.0, 0.0, 230.0) != want
    assert calls == []
    # a raw SWIG handle, a mission for the aircraft, a detached model, None: fallback
    detached = JET.copy()
    detached._detach()
    for model in (JET._handle, MISSION, detached, None, 1.0):
        assert f(model, 36000.0, 10668.0, 0.0, 230.0) == "fallback"
    assert len(calls) == 5
    # and the public function gives the Python path's errors there
    with pytest.raises(TypeError):
        acperf.drag(MISSION, 36000.0, 10668.0, 0.0, 230.0)
    assert acperf.drag(detached, 36000.0, 10668.0, 0.0, 230.0) == acperf.DragParts(*want)
    with pytest.raises(ValueError):
        acperf.Aircraft()._attach(JET._handle, "X")


def test_enumerations_as_swig_takes_them():
    # arrays.i: a whole real number is the enum value, anything else -1 (refused)
    fn = acperf.engine_rating
    for rating in (1, 1.0, True, 2.5, math.nan, math.inf, 1.0e10, -1.0e10, 3):
        fast = outcome(fn, JET, rating, 10668.0, 0.0, 230.0)
        slow = outcome(fn.__wrapped__, JET, rating, 10668.0, 0.0, 230.0)
        assert same_result(fast, slow), (rating, fast, slow)


def test_recycled_named_results_never_change_what_a_caller_holds():
    # A named result no one holds any more is refilled by the next call (fastcall.c,
    # acpf_named); whatever a caller still holds, the result or one of its floats,
    # keeps its values. The reference is the SWIG path (`__wrapped__`).
    fn = acperf.isa
    want = {hp: fn.__wrapped__(hp) for hp in (0.0, 1000.0, 2000.0, 3000.0, 5000.0, 11000.0)}
    kept = fn(0.0)
    other = fn(11000.0)
    assert kept == want[0.0] and other == want[11000.0]
    temperature = fn(5000.0).temperature  # the result dropped, one field kept
    first, second, *_ = fn(3000.0)  # unpacked
    gone = fn(1000.0)
    gone_id = id(gone)
    del gone
    again = fn(2000.0)
    assert id(again) == gone_id, "the dropped result is the one refilled"
    assert again == want[2000.0] and type(again) is acperf.Atmos
    assert temperature == want[5000.0].temperature
    assert (first, second) == want[3000.0][:2]
    assert kept == want[0.0] and other == want[11000.0]
    # a failed call leaves the last result as it was; a dropped one is refilled right
    del again
    with pytest.raises(acperf.AcperfError):
        fn(math.nan)
    assert [tuple(fn(hp)) for hp in want] == [tuple(v) for v in want.values()]
    assert all(type(v) is float for v in fn(1000.0))
    # a loop that stores each result in the same name refills the one before last;
    # a loop that keeps them all gets new ones
    seen = set()
    r = None
    for hp in list(want) * 3:
        r = fn(hp)
        seen.add(id(r))
        assert r == want[hp]
    assert len(seen) <= 3
    held = [fn(hp) for hp in list(want) * 2]
    assert held == list(want.values()) * 2 and len({id(h) for h in held}) == len(held)
    # floats only, so never in a cycle: left out of the cycle collector's scans
    assert not any(gc.is_tracked(h) for h in held)


def test_errors_show_a_model_by_what_it_is_not_its_address():
    """Issue 16, item 2: a failed call's message named the SWIG handle with its
    address ("<Swig Object of type 'struct acp_aircraft *' at 0x...>"). Both paths
    now show the model as <aircraft> (or <mission>), and the same text."""
    heavy = (JET, 45000.0, 457.2, 3048.0)  # above mass_max_takeoff: ACP_ERR_RANGE
    with pytest.raises(acperf.AcperfError) as fast:
        acperf.climb(*heavy)
    with pytest.raises(acperf.AcperfError) as swig:
        acperf.capi.acp_climb(JET._handle, *heavy[1:], 0.0, 0.0, 0.0)
    for err in (fast, swig):
        text = str(err.value)
        assert text.startswith("acp_climb(<aircraft>, 45000.0, 457.2, 3048.0")
        assert "0x" not in text and "Swig" not in text
    assert str(fast.value) == str(swig.value)
