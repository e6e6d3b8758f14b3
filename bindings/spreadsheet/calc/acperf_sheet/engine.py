"""Evaluate one spreadsheet function of functions.py through the SWIG module.

Independent of UNO: the Calc component passes the cell arguments as PyUNO
gives them (float, str, None for a blank cell, a tuple of row tuples for a
range) and turns the two exceptions below into cell errors. Only shapes, units
and errors are handled here; every number comes from libacperf.
"""

import math

from .functions import BY_NAME  # noqa: F401  (re-exported for the component)
from .lib import capi

try:  # the array forms (for partial speed sets) take numpy arrays
    import numpy as _np
except ImportError:  # pragma: no cover - numpy is a dependency of capi itself
    _np = None

# Status codes of acperf/status.h that mean "the input is wrong": #VALUE!.
_INVALID_STATUSES = {capi.ACP_ERR_INVALID, capi.ACP_ERR_PARSE, capi.ACP_ERR_UNKNOWN_KEY}
_TEXT_KEYS = ("name", "engine_type")


class InvalidInput(Exception):
    """An argument is blank, text, not finite, or rejected by the library: #VALUE!."""


class NoResult(Exception):
    """Outside the model's range or no solution: #NUM!."""


def _blank(value):
    """Calc gives a blank cell of a range as void (None) or as an empty text."""
    return value is None or value == ""


def _unwrap(value):
    """A 1x1 range is its one value."""
    while isinstance(value, tuple) and len(value) == 1 and isinstance(value[0], tuple) \
            and len(value[0]) == 1:
        value = value[0][0]
    return value


def number(value, what):
    """A finite number, or InvalidInput naming what is wrong (blank is never 0)."""
    value = _unwrap(value)
    if _blank(value):
        raise InvalidInput(f"{what} is blank")
    if isinstance(value, str):
        raise InvalidInput(f"{what} is text ({value!r}), not a number")
    if isinstance(value, bool) or not isinstance(value, (int, float)):
        raise InvalidInput(f"{what} is not a number")
    value = float(value)
    if not math.isfinite(value):
        raise InvalidInput(f"{what} is not finite")
    return value


def text(value, what):
    value = _unwrap(value)
    if not isinstance(value, str) or not value.strip():
        raise InvalidInput(f"{what} must be text")
    return value.strip()


def column(value):
    """The elements of a one-row or one-column range, or None for a single value."""
    value = _unwrap(value)
    if not isinstance(value, tuple):
        return None
    rows = [tuple(r) for r in value]
    if len(rows) == 1:
        return list(rows[0])
    if all(len(r) == 1 for r in rows):
        return [r[0] for r in rows]
    raise InvalidInput("a range argument must be a single row or a single column")


def to_si(value, unit):
    return value if unit is None else capi.acp_to_si(value, unit)


def from_si(value, unit):
    if unit is None or not math.isfinite(value):
        return value
    return capi.acp_from_si(value, unit)


class Aircraft:
    """The model built from a two-column key/value range; freed on close."""

    def __init__(self, rng):
        rng = rng if isinstance(rng, tuple) else ((rng,),)
        self.ptr = capi.acp_aircraft_new()
        try:
            self._fill(rng)
        except BaseException:
            self.close()
            raise

    def _fill(self, rng):
        if any(len(row) != 2 for row in rng):
            raise InvalidInput("the aircraft range must have exactly two columns: key, value")
        given = 0
        for i, (key, value) in enumerate(rng, start=1):
            if _blank(key) and _blank(value):
                continue  # an empty row of the range: room for more keys
            if not isinstance(key, str) or not key.strip():
                raise InvalidInput(f"aircraft range row {i}: the key must be text")
            key = key.strip()
            try:
                if key in _TEXT_KEYS or (key.startswith("component.") and key.endswith(".type")):
                    if _blank(value) or not isinstance(value, str) or not value.strip():
                        raise InvalidInput(f"aircraft range row {i}: '{key}' needs a text value")
                    capi.acp_aircraft_set_text(self.ptr, key, value.strip())
                else:
                    capi.acp_aircraft_set(self.ptr, key, number(value, f"aircraft range row {i} '{key}'"))
            except capi.AcperfError as e:
                raise InvalidInput(f"aircraft range row {i}: {e}") from None
            given += 1
        if not given:
            raise InvalidInput("the aircraft range is empty")
        try:
            capi.acp_aircraft_check(self.ptr)
        except capi.AcperfError as e:
            raise InvalidInput(str(e)) from None

    def close(self):
        if self.ptr is not None:
            capi.acp_aircraft_free(self.ptr)
            self.ptr = None


def _classify(err):
    if getattr(err, "status", None) in _INVALID_STATUSES:
        raise InvalidInput(str(err)) from None


def _point(fn, ac, si, texts):
    """One evaluation: the shown outputs in the spreadsheet's units (NaN: #NUM!)."""
    c = getattr(capi, fn.call)
    lead = [ac.ptr] if ac is not None else []
    nan = [math.nan] * len(fn.outputs)
    try:
        if fn.kind == "value":
            raw = [c(*si)]
        elif fn.kind == "out":
            r = c(*si)
            raw = list(r) if isinstance(r, (list, tuple)) else [r]
        elif fn.kind == "struct":
            s = c(*lead, *si)
            raw = [getattr(s, o.field) for o in fn.outputs]
        else:
            raise AssertionError(fn.kind)
    except capi.AcperfError as e:
        _classify(e)
        raw = nan
        if fn.partial and e.status == capi.ACP_ERR_RANGE and _np is not None:
            # The scalar form raised; the array form keeps the speeds it found.
            r = getattr(capi, fn.call + "_n")(*lead, *[_np.array([x]) for x in si])
            raw = [float(a[0]) for a in r[1:1 + len(fn.outputs)]]
    values = {o.field: from_si(v, o.unit) for o, v in zip(fn.outputs, raw)}
    return [values[o.field] for o in fn.shown]


def evaluate(fn, args):
    """Evaluate fn on the cell arguments. Returns a number, a text, or a list of
    rows (lists of numbers, NaN where there is no result). Raises InvalidInput."""
    args = list(args)
    expected = int(fn.aircraft) + len(fn.args) + len(fn.text_args)
    if len(args) != expected:
        raise InvalidInput(f"{fn.name} takes {expected} arguments")
    if fn.kind == "version":
        return capi.acp_version_string()
    if fn.kind == "check":
        try:
            Aircraft(args[0]).close()
        except InvalidInput as e:
            return str(e)
        return "OK"
    ac = Aircraft(args.pop(0)) if fn.aircraft else None
    try:
        numeric, texts = args[:len(fn.args)], args[len(fn.args):]
        texts = [text(t, name) for t, (name, _) in zip(texts, fn.text_args)]
        if fn.kind == "get":
            try:
                return capi.acp_aircraft_get(ac.ptr, texts[0])
            except capi.AcperfError as e:
                _classify(e)
                raise NoResult(str(e)) from None
        cols = [column(v) for v in numeric]
        lengths = {len(c) for c in cols if c is not None}
        if len(lengths) > 1:
            raise InvalidInput("range arguments must have the same number of cells")
        n = lengths.pop() if lengths else None
        rows = []
        for k in range(n if n is not None else 1):
            point = [number(c[k] if c is not None else v, a.name)
                     for c, v, a in zip(cols, numeric, fn.args)]
            si = [to_si(v, a.unit) for v, a in zip(point, fn.args)]
            if fn.kind == "convert":
                try:
                    rows.append([capi.acp_from_si(capi.acp_to_si(point[0], texts[0]), texts[1])])
                except capi.AcperfError as e:
                    raise InvalidInput(str(e)) from None
            else:
                rows.append(_point(fn, ac, si, texts))
        if n is None and not fn.returns_row:
            return rows[0][0]
        return rows
    finally:
        if ac is not None:
            ac.close()
