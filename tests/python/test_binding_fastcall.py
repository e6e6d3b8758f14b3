"""The scalar fast path (acperf._fast, bindings/python/fastcall.c) against the SWIG path.

Every public function whose C inputs are all doubles is an acperf._fast.function:
positional floats and ints go straight to C, anything else to the generated
Python function (`__wrapped__`, whose scalar path is the SWIG call). For every
such function, on the grid of test_binding_api.py (valid and invalid points),
the fast call must give the same bits as the SWIG call, or the same
AcperfError (message, status); and the calls it does not take must reach the
Python function unchanged.
"""

import inspect
import math
import pickle

import numpy as np
import pytest

import acperf
from acperf import _fast
from conftest import parse_headers, same
from test_binding_api import POOLS, grid

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


def points_of(fn):
    params = list(inspect.signature(fn).parameters)
    if fn.c_function in ("acp_" + n for n in acperf.units.__all__):
        return [(v,) for v in UNIT_VALUES]
    return grid(params)


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
    if isinstance(ra, tuple):
        return len(ra) == len(rb) and all(same(x, y) for x, y in zip(ra, rb))
    return same(ra, rb)


def test_every_all_double_function_has_the_fast_path():
    # The functions of the headers whose inputs are all doubles, no model, with a
    # double result or double/struct outputs: each public form is a fast function.
    protos = parse_headers()
    assert len(FAST_NAMES) >= 70
    for cname in FAST_NAMES:
        _, params = protos[cname]
        assert params and params[0][0] == "double", cname
        assert cname in FUNCTIONS, f"{cname}: no public Python form"
        assert isinstance(FUNCTIONS[cname], FAST), f"{cname}: public form is not the fast path"
    # and none of those taking a model, a string or an enum
    for cname, fn in FUNCTIONS.items():
        if isinstance(fn, FAST):
            assert all(t == "double" for t, _ in protos[cname][1][:len(
                inspect.signature(fn).parameters)]), cname


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
        raw = outcome(swig, *pt)
        assert raw[0] == fast[0] and (raw[0] == "ok" or raw[2:] == fast[2:]), (pt, raw, fast)
        if fast[0] == "ok":
            nok += 1
            values = fast[1] if isinstance(fast[1], tuple) else (fast[1],)
            assert all(type(v) is float for v in values)
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
    # int64 scalars (fallback), keywords (fallback): all as the Python function
    variants = [tuple(int(v) if math.isfinite(v) and v == int(v) else v for v in pt),
                tuple(np.float64(v) for v in pt),
                tuple(np.float32(v) for v in pt)]
    for args in variants:
        assert same_result(outcome(fn, *args), outcome(fn.__wrapped__, *args)), args
    kw = dict(zip(params, pt))
    assert same_result(outcome(lambda: fn(**kw)), outcome(lambda: fn.__wrapped__(**kw)))
    # trailing defaults (dtemp=0.0): filled in by the fast path, shown in errors as SWIG does
    required = [p for p in params.values() if p.default is inspect.Parameter.empty]
    if len(required) < len(params):
        short = pt[:len(required)]
        assert same_result(outcome(fn, *short), outcome(fn.__wrapped__, *short))
        bad = (math.nan,) * len(required)
        assert same_result(outcome(fn, *bad), outcome(fn.__wrapped__, *bad))


def test_fast_calls_never_reach_the_python_function_and_the_rest_do():
    calls = []

    def fallback(*args, **kwargs):
        calls.append((args, kwargs))
        return "fallback"

    f = FAST("acp_cas_to_tas", 3, fallback, (0.0,), None)
    assert f(150.0, 3000.0) == acperf.capi.acp_cas_to_tas(150.0, 3000.0, 0.0)
    assert f(150, 3000, 10) == acperf.capi.acp_cas_to_tas(150.0, 3000.0, 10.0)
    assert f(np.float64(150.0), True, 0.0) == acperf.capi.acp_cas_to_tas(150.0, 1.0, 0.0)
    with pytest.raises(acperf.AcperfError, match=r"acp_cas_to_tas\(-1.0, 3000.0, 0.0\)"):
        f(-1.0, 3000.0)
    assert calls == []
    for args, kwargs in [(([150.0],), {"hp": 0.0}), ((150.0, 0.0), {"dtemp": 1.0}),
                         ((np.float32(1.0), 0.0), {}), ((np.int64(1), 0.0), {}),
                         ((150.0,), {}), ((1.0, 2.0, 3.0, 4.0), {}), ((10 ** 400, 0.0), {}),
                         (("150", 0.0), {}), ((None, 0.0), {})]:
        assert f(*args, **kwargs) == "fallback"
        assert calls[-1] == (args, kwargs)
    assert len(calls) == 9


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
        FAST("acp_drag", 5, print, (), None)  # takes a model: SWIG only
    with pytest.raises(ValueError):
        FAST("acp_cas_to_mach", 3, print, (), None)  # wrong parameter count
    with pytest.raises(ValueError):
        FAST("acp_isa", 2, print, (), None)  # six outputs need a result type
    with pytest.raises(TypeError):
        FAST("acp_isa", 2, print, (), dict)  # not a namedtuple
