"""Machinery of the Pythonic layer: one C function pair -> one Python function.

Each public function of the package is made by :func:`bind` from a scalar C
function (always) and its array form ``_n`` (when libacperf has one). The
generated function

* calls the scalar C function directly when every argument is a Python or
  numpy float/int (the fast path: one SWIG ``-builtin`` call; a failure raises
  :class:`AcperfError` from C with the status text of ``acp_strerror``);
* for the functions whose inputs are models, numbers and enumerations, is
  itself a C callable of ``acperf._fast`` (fastcall.c): Python floats and ints
  and Aircraft/Mission objects, by position or keyword, go straight to the C
  function with no Python frame, the same results and the same AcperfError as
  the SWIG call; every other call goes to the generated Python function (its
  ``__wrapped__``), described here;
* otherwise converts the arguments to float64 numpy arrays (lists, tuples,
  numpy arrays of any dtype or stride, pandas Series), broadcasts them against
  each other, calls the array form once on contiguous memory, reshapes the
  outputs to the broadcast shape, gives them the index of a pandas Series
  input, and warns with :class:`AcperfWarning` when points were invalid (their
  outputs are NaN).

This module converts shapes, units and errors only; every number comes from
libacperf. To bind a new C function, add one :func:`bind` line to the module
of its header (see atmosphere.py); a model argument such as an aircraft goes
in ``models`` and is passed through unbroadcast.
"""

import collections
import inspect
import warnings

import numpy as np

from . import capi as _c
from . import _fast
from ._enums import coded

AcperfError = _c.AcperfError
AcperfError.__module__ = "acperf"
_fast.set_error(AcperfError)
_FAST_NAMES = frozenset(_fast.names())


class InfeasibleTrip(AcperfError):
    """A trip that cannot be flown, and why (acp_trip, acp_trip_for_zero_fuel_mass).

    reason  the acperf.TripInfeasible member the library names
    excess  by how much the limit is exceeded, a float in the unit TripInfeasible
            documents (kg, m, or a lift coefficient; NaN where it has none)
    result  the TripResult of the call: infeasible and excess, every other field NaN
    status  the acp_status code (ACP_ERR_RANGE or ACP_ERR_THRUST)
    """

    def __init__(self, message, reason=None, excess=float("nan"), result=None, status=None):
        super().__init__(message)
        self.reason, self.excess, self.result, self.status = reason, excess, result, status


InfeasibleTrip.__module__ = "acperf"


class AcperfWarning(RuntimeWarning):
    """Some points of an array call were invalid; their results are NaN."""


class Result:
    """Mixin of the named results (a namedtuple of floats or of arrays)."""

    __slots__ = ()

    _enums = ()  # per field: the IntEnum of a coded field, else None (result_type)

    @classmethod
    def _from_c(cls, values):
        """The result of the C outputs `values` (floats), coded fields as enum members."""
        if not any(cls._enums):
            return cls(*values)
        return cls(*(coded(e, v) for e, v in zip(cls._enums, values)))

    def to_dict(self):
        """The fields as a dict, in field order."""
        return dict(zip(self._fields, self))

    def to_frame(self):
        """The fields as the columns of a pandas DataFrame (array results)."""
        import pandas as pd

        data = self.to_dict()
        index = next((v.index for v in data.values() if isinstance(v, pd.Series)), None)
        if all(np.ndim(v) == 0 for v in data.values()):
            return pd.DataFrame({k: [v] for k, v in data.items()})
        return pd.DataFrame({k: np.asarray(v).ravel() for k, v in data.items()}, index=index)


def result_type(name, fields, doc, codes=None):
    """A named result: a namedtuple whose fields are the C struct's field names.

    codes  {field: IntEnum} of the fields that hold a C enum value (acperf/_enums.py):
           a scalar result gives the member there (a float NaN stays NaN)."""
    codes = dict(codes or {})
    unknown = set(codes) - set(fields)
    if unknown:
        raise ValueError(f"{name}: coded fields {sorted(unknown)} are not fields")
    base = collections.namedtuple(name, fields)
    return type(name, (Result, base), {
        "__slots__": (), "__doc__": doc, "__module__": "acperf",
        "_enums": tuple(codes.get(f) for f in fields)})


def struct_fields(swig_type):
    """Field names of a SWIG-wrapped C struct (unordered set)."""
    return {k for k, v in vars(swig_type).items()
            if inspect.isdatadescriptor(v) and not k.startswith("_") and k not in ("this", "thisown")}


_NO_DEFAULT = inspect.Parameter.empty

# The generated function: the fast scalar path, else the array path.
_TEMPLATE = """\
def {name}({signature}):
    try:
        return _finish(_scalar({args}))
    except TypeError:
        return _array({args})
"""
_TEMPLATE_PLAIN = """\
def {name}({signature}):
    try:
        return _scalar({args})
    except TypeError:
        return _array({args})
"""


def model_handle(model):
    """The C handle of a model argument: an object's `_handle` (acperf.Aircraft), a
    raw SWIG pointer as it is, and a numpy scalar given for a number passed through
    unbroadcast (the cruise's mode and cost index) as a Python float."""
    if isinstance(model, np.number):
        return float(model)
    return getattr(model, "_handle", model)


def bind(name, scalar, array=None, params=(), defaults=None, outputs=None, result=None,
         models=(), nullable=("dtemp", "load_factor"), array_extra=(), module="acperf"):
    """Make the Python function `name` from a scalar C function and its array form.

    scalar    SWIG function of the scalar C form (raises AcperfError on failure)
    array     SWIG function of the `_n` form, or None when the C library has none
              (then the array path calls the scalar function per point)
    params    parameter names, exactly as in the C header
    defaults  {param: default} for trailing parameters (dtemp=0.0)
    outputs   output names of a multi-output function, in the order of the
              C out-pointers / `_n` outputs; None for a single output
    result    named result type for multi-output functions
    models    leading parameters passed through as they are (models, handles)
    nullable  parameters the array form reads as "standard" when NULL: passed as
              None when given as the scalar standard value (dtemp 0, load_factor 1)
    array_extra  trailing arguments of the array form that the scalar form has
              not (None for an optional input such as load_factor)
    """
    defaults = dict(defaults or {})
    sig_parts = []
    for p in params:
        sig_parts.append(f"{p}={defaults[p]!r}" if p in defaults else p)
    signature = ", ".join(sig_parts)
    nmodel = len(models)
    if tuple(params[:nmodel]) != tuple(models):
        raise ValueError(f"{name}: model parameters {models} must come first")
    args = ", ".join([f"_model({p})" for p in params[:nmodel]] + list(params[nmodel:]))
    vec_params = tuple(params[nmodel:])
    nulls = tuple(i for i, p in enumerate(vec_params) if p in nullable)

    if result is not None and outputs is None:
        outputs = result._fields
    if result is None and outputs is not None:
        raise ValueError(f"{name}: several outputs need a result type")

    def array_path(*values):
        return _array_call(name, scalar, array, values[:nmodel], values[nmodel:], vec_params,
                           nulls, outputs, result, tuple(array_extra))

    if result is None:
        code = _TEMPLATE_PLAIN
        namespace = {"_scalar": scalar, "_array": array_path, "_model": model_handle}
    else:
        def finish(value, _result=result, _fields=result._fields):
            if isinstance(value, list):  # several out-pointers
                return _result._from_c(value)
            return _result._from_c([getattr(value, f) for f in _fields])  # an output struct
        code = _TEMPLATE
        namespace = {"_scalar": scalar, "_array": array_path, "_finish": finish,
                     "_model": model_handle}
    exec(code.format(name=name, signature=signature, args=args), namespace)
    fn = namespace[name]
    fn.__module__ = module
    fn.__qualname__ = name
    fn.__doc__ = _docstring(name, scalar, array, outputs, result)
    fn.c_function = scalar.__name__
    fn.c_array_function = array.__name__ if array is not None else None
    fn.c_models = tuple(models)
    return fast_path(fn, scalar.__name__, tuple(params),
                     tuple(defaults[p] for p in params if p in defaults), result)


def fast_path(fn, cname, params, defaults=(), result=None):
    """`fn` as an acperf._fast.function: all-scalar calls (by position or keyword,
    models as Aircraft/Mission objects) go straight to the C function `cname`,
    anything else to `fn`. `fn` itself when the C function has no fast path
    (inputs other than models, numbers and enumerations) or its outputs are not
    the fields of `result`."""
    if cname not in _FAST_NAMES:
        return fn
    codes = None
    if result is not None and any(result._enums):
        codes = tuple(None if e is None else dict(e._value2member_map_) for e in result._enums)
    fast = _fast.function(cname, params, fn, defaults, result, codes)
    if result is not None and tuple(result._fields) != fast.fast_outputs:
        return fn
    fast.__dict__.update(fn.__dict__)  # c_function, c_array_function, c_models
    for attr in ("__name__", "__qualname__", "__module__", "__doc__"):
        setattr(fast, attr, getattr(fn, attr))
    return fast


def _docstring(name, scalar, array, outputs, result):
    how = ("Array form: one call of {0} on the whole broadcast array.".format(array.__name__)
           if array is not None else
           "Array form: libacperf has no array form of this function yet; arrays are "
           "evaluated point by point through {0}.".format(scalar.__name__))
    out = (f"Returns a {result.__name__} ({', '.join(result._fields)})."
           if result is not None else "Returns a float, or an array of the broadcast shape.")
    head = (f"{name}: Python form of {scalar.__name__}() in libacperf.\n\n"
            "Arguments: scalars, lists, numpy arrays (any real dtype or stride) or pandas\n"
            "Series, broadcast against each other, in the SI units of the C function.\n"
            f"{out} A pandas Series input gives Series outputs with its index.\n"
            "A scalar call that fails raises acperf.AcperfError; an array call puts NaN\n"
            f"where a point is invalid and warns with acperf.AcperfWarning.\n{how}\n\n"
            "Results are engineering estimates, not approved flight-manual data.\n\n"
            "From the C header:\n")
    return head + (scalar.__doc__ or "")


def _series_index(values):
    for v in values:
        if hasattr(v, "index") and hasattr(v, "to_numpy") and np.ndim(v) == 1:
            return v.index
    return None


def _as_float_array(value, param, fname):
    try:
        if value is None or isinstance(value, (str, bytes)):
            raise TypeError(param)
        return np.asarray(value, dtype=np.float64)
    except (TypeError, ValueError) as exc:
        raise TypeError(f"{fname}: {param} must be a real number or an array of them "
                        f"(got {type(value).__name__})") from exc


_STANDARD = {"dtemp": 0.0, "load_factor": 1.0}  # what a NULL array means in the C API


def _array_call(fname, scalar, array, models, values, params, nulls, outputs, result,
                array_extra=()):
    arrays = [_as_float_array(v, p, fname) for v, p in zip(values, params)]
    shape = np.broadcast_shapes(*(a.shape for a in arrays))
    if shape == ():
        # numpy scalars, 0-d arrays: a scalar call, with its exception.
        out = scalar(*models, *(float(a) for a in arrays))
        if result is None:
            return out
        if isinstance(out, list):
            return result._from_c(out)
        return result._from_c([getattr(out, f) for f in result._fields])
    n = int(np.prod(shape))
    if array is not None:
        flat = []
        for i, a in enumerate(arrays):
            if i in nulls and a.ndim == 0 and a == _STANDARD[params[i]]:
                flat.append(None)  # the C array form reads NULL as the standard value
                continue
            if a.shape != shape:
                a = np.broadcast_to(a, shape)
            flat.append(np.ascontiguousarray(a).reshape(n))
        res = array(*models, *flat, *array_extra)
        bad, outs = res[0], res[1:]
        kept = ()
    else:
        bad, outs, kept = _pointwise(scalar, models, arrays, shape, n, outputs)
    if bad:
        but = f" but for {', '.join(kept)}" if kept else ""
        warnings.warn(f"{fname}: {bad} of {n} points invalid (argument invalid or outside "
                      f"the model's valid range); their results are NaN{but}",
                      AcperfWarning, stacklevel=4)
    index = _series_index(values)
    names = outputs if outputs is not None else (None,)
    shaped = []
    for o, oname in zip(outs, names):
        o = o.reshape(shape)
        if index is not None and len(shape) == 1 and len(index) == shape[0]:
            import pandas as pd

            o = pd.Series(o, index=index, name=oname if oname is not None else fname)
        shaped.append(o)
    if result is None:
        return shaped[0]
    return result(*shaped)


def _pointwise(scalar, models, arrays, shape, n, outputs):
    """Array path of a function without a C array form: one scalar call per point.
    A failed point is NaN, except for what its exception's `result` keeps (the
    reason and excess of an infeasible trip: mission.h). Returns the count of
    failed points, the outputs and the names of the fields such points kept."""
    flat = [np.broadcast_to(a, shape).reshape(n) for a in arrays]
    nout = 1 if outputs is None else len(outputs)
    outs = [np.full(n, np.nan) for _ in range(nout)]
    bad, kept = 0, {}
    for i in range(n):
        try:
            r = scalar(*models, *(float(a[i]) for a in flat))
        except AcperfError as exc:
            bad += 1
            r = getattr(exc, "result", None)
            if r is None or outputs is None:
                continue
            kept.update((f, None) for f in outputs if not np.isnan(getattr(r, f)))
        if nout == 1:
            outs[0][i] = r
        elif isinstance(r, list):
            for o, v in zip(outs, r):
                o[i] = v
        else:
            for o, f in zip(outs, outputs):
                o[i] = getattr(r, f)
    return bad, outs, tuple(kept)
