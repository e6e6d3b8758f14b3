"""Units of the trade (acperf/units.h): exact constants and conversions to SI.

The constants are the library's own (ACP_FT, ACP_KT, ... read from libacperf's
header through SWIG), so Python and C cannot disagree:

    >>> from acperf import units
    >>> units.ft_to_m(35000.0)      # 10668.0
    >>> units.to_si(250.0, "kt")    # m/s

Each conversion is a single IEEE multiplication, division or addition by one
of these constants, exactly as in libacperf's units.c. Scalars go through the
C function; arrays apply the same operation with numpy (bit-for-bit the same
result, checked point by point against the C function in the tests), since
libacperf has no array form of these one-operation helpers. Non-finite input
gives NaN/Inf, as in C: these conversions never fail.
"""

import operator

import numpy as np

from . import capi as _c
from ._core import AcperfError, AcperfWarning, _as_float_array, _series_index, fast_path

FT = _c.ACP_FT
NM = _c.ACP_NM
KT = _c.ACP_KT
LB = _c.ACP_LB
FL = _c.ACP_FL
FPM = _c.ACP_FPM
HPA = _c.ACP_HPA
INHG = _c.ACP_INHG
CELSIUS_ZERO = _c.ACP_CELSIUS_ZERO
MINUTE = _c.ACP_MINUTE
HOUR = _c.ACP_HOUR
DEG = _c.ACP_DEG

# Python name -> (C function, numpy operation, constant): the operation of units.c.
_LINEAR = {
    "ft_to_m": ("acp_ft_to_m", operator.mul, FT),
    "m_to_ft": ("acp_m_to_ft", operator.truediv, FT),
    "kt_to_mps": ("acp_kt_to_mps", operator.mul, KT),
    "mps_to_kt": ("acp_mps_to_kt", operator.truediv, KT),
    "nm_to_m": ("acp_nm_to_m", operator.mul, NM),
    "m_to_nm": ("acp_m_to_nm", operator.truediv, NM),
    "lb_to_kg": ("acp_lb_to_kg", operator.mul, LB),
    "kg_to_lb": ("acp_kg_to_lb", operator.truediv, LB),
    "fl_to_m": ("acp_fl_to_m", operator.mul, FL),
    "m_to_fl": ("acp_m_to_fl", operator.truediv, FL),
    "fpm_to_mps": ("acp_fpm_to_mps", operator.mul, FPM),
    "mps_to_fpm": ("acp_mps_to_fpm", operator.truediv, FPM),
    "hpa_to_pa": ("acp_hpa_to_pa", operator.mul, HPA),
    "pa_to_hpa": ("acp_pa_to_hpa", operator.truediv, HPA),
    "inhg_to_pa": ("acp_inhg_to_pa", operator.mul, INHG),
    "pa_to_inhg": ("acp_pa_to_inhg", operator.truediv, INHG),
    "degc_to_k": ("acp_degc_to_k", operator.add, CELSIUS_ZERO),
    "k_to_degc": ("acp_k_to_degc", operator.sub, CELSIUS_ZERO),
    "deg_to_rad": ("acp_deg_to_rad", operator.mul, DEG),
    "rad_to_deg": ("acp_rad_to_deg", operator.truediv, DEG),
}


def _make_linear(name, cname, op, const):
    scalar = getattr(_c, cname)

    def convert(x):
        try:
            return scalar(x)
        except TypeError:
            pass
        a = _as_float_array(x, "x", name)
        out = op(a, const)
        if out.ndim == 0:
            return float(out)
        index = _series_index((x,))
        if index is not None:
            import pandas as pd

            return pd.Series(out, index=index, name=getattr(x, "name", None))
        return out

    convert.__name__ = convert.__qualname__ = name
    convert.__module__ = __name__
    convert.__doc__ = (f"{name}(x): {cname}() of libacperf, for scalars, lists, arrays or "
                       f"Series (the same single operation by {const!r}).\n\n"
                       + (scalar.__doc__ or ""))
    convert.c_function = cname
    return fast_path(convert, cname, ("x",))


for _name, (_cname, _op, _const) in _LINEAR.items():
    globals()[_name] = _make_linear(_name, _cname, _op, _const)
del _name, _cname, _op, _const


def _named(fname, cfunc, value, unit):
    if not isinstance(unit, str):
        raise TypeError(f"{fname}: unit must be a str such as 'ft' or 'kt'")
    try:
        return cfunc(value, unit)
    except TypeError:
        pass
    a = _as_float_array(value, "value", fname)
    if a.ndim == 0:
        return cfunc(float(a), unit)
    cfunc(1.0, unit)  # an unknown unit raises here, before any point is computed
    flat = a.reshape(-1)
    out = np.full(flat.shape, np.nan)
    bad = 0
    for i, v in enumerate(flat):  # libacperf has no array form of acp_to_si
        try:
            out[i] = cfunc(float(v), unit)
        except AcperfError:
            bad += 1
    if bad:
        import warnings

        warnings.warn(f"{fname}: {bad} of {flat.size} points invalid (non-finite); "
                      "their results are NaN", AcperfWarning, stacklevel=3)
    out = out.reshape(a.shape)
    index = _series_index((value,))
    if index is not None:
        import pandas as pd

        return pd.Series(out, index=index, name=getattr(value, "name", None))
    return out


def to_si(value, unit):
    return _named("to_si", _c.acp_to_si, value, unit)


def from_si(si, unit):
    return _named("from_si", _c.acp_from_si, si, unit)


to_si.__doc__ = ("to_si(value, unit): value in a named unit to SI (acp_to_si). Scalars, "
                 "lists, arrays or Series; an unknown unit raises AcperfError.\n\n"
                 + (_c.acp_to_si.__doc__ or ""))
from_si.__doc__ = ("from_si(si, unit): SI value to a named unit (acp_from_si). Scalars, "
                   "lists, arrays or Series; an unknown unit raises AcperfError.\n\n"
                   + (_c.acp_from_si.__doc__ or ""))

__all__ = ["FT", "NM", "KT", "LB", "FL", "FPM", "HPA", "INHG", "CELSIUS_ZERO", "MINUTE",
           "HOUR", "DEG", "to_si", "from_si", *_LINEAR]
