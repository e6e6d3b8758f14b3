"""Evaluate one spreadsheet function of functions.py through the SWIG module.

Independent of UNO: the Calc component passes the cell arguments as PyUNO
gives them (float, str, None for a blank cell, a tuple of row tuples for a
range) and turns the two exceptions below into cell errors. Only shapes, units
and errors are handled here; every number comes from libacperf.
"""

import math

from .functions import BY_NAME  # noqa: F401  (re-exported for the component)
from .functions import CRUISE_MODES, MISSION_KEYS, TRIP_INFEASIBLE
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


def _split(unit):
    """A composite unit "A/B" of two library units (e.g. "NM/t", "lb/h/lbf"):
    (A, B); a plain unit: (unit, None)."""
    if unit in _PLAIN or "/" not in unit:
        return unit, None
    a, b = unit.rsplit("/", 1)
    return a, b


def to_si(value, unit):
    if unit is None:
        return value
    a, b = _split(unit)
    v = capi.acp_to_si(value, a)
    return v if b is None else v / capi.acp_to_si(1.0, b)


def from_si(value, unit):
    if unit is None or not math.isfinite(value):
        return value
    a, b = _split(unit)
    v = capi.acp_from_si(value, a)
    return v if b is None else v * capi.acp_to_si(1.0, b)


# Units of the library whose name has a slash (not composites).
_PLAIN = {"m/s", "km/h", "ft/min", "kg/s", "kg/h", "lb/h"}


class _RangeModel:
    """A C model (aircraft, mission) built from a two-column key/value range;
    freed on close. Subclasses name the C constructor and destructor and set
    one key from one row."""

    what = "range"

    def __init__(self, rng):
        rng = rng if isinstance(rng, tuple) else ((rng,),)
        self.ptr = self._new()
        try:
            self._fill(rng)
        except BaseException:
            self.close()
            raise

    def _fill(self, rng):
        if any(len(row) != 2 for row in rng):
            raise InvalidInput(f"the {self.what} range must have exactly two columns: key, value")
        given = 0
        for i, (key, value) in enumerate(rng, start=1):
            if _blank(key) and _blank(value):
                continue  # an empty row of the range: room for more keys
            if not isinstance(key, str) or not key.strip():
                raise InvalidInput(f"{self.what} range row {i}: the key must be text")
            self._set(i, key.strip(), value)
            given += 1
        if not given:
            raise InvalidInput(f"the {self.what} range is empty")
        self._check()

    def _check(self):
        pass

    def close(self):
        if self.ptr is not None:
            self._free(self.ptr)
            self.ptr = None


class Aircraft(_RangeModel):
    """The aircraft model built from a two-column key/value range."""

    what = "aircraft"
    _new = staticmethod(capi.acp_aircraft_new)
    _free = staticmethod(capi.acp_aircraft_free)

    def _set(self, i, key, value):
        try:
            if key in _TEXT_KEYS or (key.startswith("component.") and key.endswith(".type")):
                if _blank(value) or not isinstance(value, str) or not value.strip():
                    raise InvalidInput(f"aircraft range row {i}: '{key}' needs a text value")
                capi.acp_aircraft_set_text(self.ptr, key, value.strip())
            else:
                capi.acp_aircraft_set(self.ptr, key, number(value, f"aircraft range row {i} '{key}'"))
        except capi.AcperfError as e:
            raise InvalidInput(f"aircraft range row {i}: {e}") from None

    def _check(self):
        try:
            capi.acp_aircraft_check(self.ptr)
        except capi.AcperfError as e:
            raise InvalidInput(str(e)) from None


class Mission(_RangeModel):
    """The mission built from a two-column key/value range (keys of
    MISSION_KEYS in operations units, converted to SI)."""

    what = "mission"
    _new = staticmethod(capi.acp_mission_new)
    _free = staticmethod(capi.acp_mission_free)

    def _set(self, i, key, value):
        if key not in MISSION_KEYS:
            raise InvalidInput(f"mission range row {i}: unknown key '{key}'")
        if key == "cruise_mode" and isinstance(value, str) and not _blank(value):
            value = _enum(value, CRUISE_MODES, "cruise_mode")
        else:
            value = to_si(number(value, f"mission range row {i} '{key}'"), MISSION_KEYS[key])
        try:
            capi.acp_mission_set(self.ptr, key, value)
        except capi.AcperfError as e:
            raise InvalidInput(f"mission range row {i}: {e}") from None


def _enum(value, names, what):
    """The C enum value of a text argument (case and blanks ignored)."""
    key = text(value, what).lower().replace(" ", "_").replace("-", "_")
    if key not in names:
        raise InvalidInput(f"{what} must be one of " + ", ".join(names))
    return names[key]


def _classify(err):
    if getattr(err, "status", None) in _INVALID_STATUSES:
        raise InvalidInput(str(err)) from None


def c_arguments(fn, ac, mission, si, texts):
    """The C call's arguments in order (fn.layout): the models, the SI numbers,
    enum values of text arguments, and the table's fixed numbers."""
    by_name = dict(zip([a.name for a in fn.args], si))
    by_name.update(texts)
    out = []
    for tok in fn.layout:
        if tok == "@ac":
            out.append(ac.ptr)
        elif tok == "@mission":
            out.append(mission.ptr)
        elif isinstance(tok, str):
            out.append(by_name[tok])
        else:
            out.append(tok)
    return out


def _trace(fn, cargs):
    """A trace's points (rows of struct fields): grow the buffer while the C
    function says it is too small (ACP_ERR_RANGE with nothing integrated)."""
    capacity = 256
    while True:
        try:
            points, _totals = getattr(capi, fn.call)(*cargs, capacity)
            return [list(map(float, p)) for p in points]
        except capi.AcperfError as e:
            if e.status != capi.ACP_ERR_RANGE or capacity >= 1 << 16:
                raise
            capacity *= 4


def _point(fn, ac, mission, si, texts):
    """One evaluation: the shown outputs in the spreadsheet's units (NaN: #NUM!).
    A trace gives a list of such rows."""
    c = getattr(capi, fn.call)
    cargs = c_arguments(fn, ac, mission, si, texts)
    nan = [math.nan] * len(fn.outputs)
    try:
        if fn.kind == "value":
            raw = [c(*cargs)]
        elif fn.kind == "out":
            r = c(*cargs)
            raw = list(r) if isinstance(r, (list, tuple)) else [r]
        elif fn.kind == "struct":
            s = c(*cargs)
            raw = [getattr(s, o.field) for o in fn.outputs]
        elif fn.kind == "trace":
            return [_shown(fn, p) for p in _trace(fn, cargs)]
        else:
            raise AssertionError(fn.kind)
    except capi.AcperfError as e:
        _classify(e)
        if fn.kind == "trace":
            raise NoResult(str(e)) from None
        raw = nan
        if fn.partial and e.status == capi.ACP_ERR_RANGE and _np is not None:
            # The scalar form raised; the array form keeps the speeds it found.
            r = getattr(capi, fn.call + "_n")(*cargs[:1], *[_np.array([x]) for x in si])
            raw = [float(a[0]) for a in r[1:1 + len(fn.outputs)]]
    return _shown(fn, raw)


def _shown(fn, raw):
    values = {o.field: from_si(v, o.unit) for o, v in zip(fn.outputs, raw)}
    return [values[o.field] for o in fn.shown]


def trip_status(fn, ac, mission, si):
    """ACP_TRIP_STATUS: "OK", or why the trip is infeasible (text)."""
    try:
        getattr(capi, fn.call)(*c_arguments(fn, ac, mission, si, {}))
        return "OK"
    except capi.AcperfError as e:
        r = getattr(e, "result", None)
        code = getattr(r, "infeasible", math.nan) if r is not None else math.nan
        if isinstance(code, float) and math.isfinite(code) and int(code) in TRIP_INFEASIBLE:
            what, unit = TRIP_INFEASIBLE[int(code)]
            excess = getattr(r, "excess", math.nan)
            if unit is not None and math.isfinite(excess):
                by = "by at least" if getattr(r, "excess_at_least", 0.0) == 1.0 else "by"
                return f"{what} {by} {from_si(excess, unit):.0f} {unit}"
            return what
        return str(e)


def evaluate(fn, args):
    """Evaluate fn on the cell arguments. Returns a number, a text, or a list of
    rows (lists of numbers, NaN where there is no result). Raises InvalidInput."""
    args = list(args)
    expected = len(fn.range_args) + len(fn.args) + len(fn.text_args)
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
    ac = mission = None
    try:
        try:
            ac = Aircraft(args.pop(0)) if fn.aircraft else None
            mission = Mission(args.pop(0)) if fn.mission else None
        except InvalidInput as e:
            if fn.kind == "status":
                return str(e)
            raise
        numeric, texts = args[:len(fn.args)], args[len(fn.args):]
        texts = {name: (_enum(t, fn.enums[name], name) if name in fn.enums else text(t, name))
                 for t, (name, _) in zip(texts, fn.text_args)}
        if fn.kind == "get":
            try:
                return capi.acp_aircraft_get(ac.ptr, texts["key"])
            except capi.AcperfError as e:
                _classify(e)
                raise NoResult(str(e)) from None
        cols = [column(v) for v in numeric]
        lengths = {len(c) for c in cols if c is not None}
        if len(lengths) > 1:
            raise InvalidInput("range arguments must have the same number of cells")
        n = lengths.pop() if lengths else None
        if n is not None and fn.kind in ("trace", "status"):
            raise InvalidInput(f"{fn.name} takes single values, not ranges")
        rows = []
        for k in range(n if n is not None else 1):
            point = [number(c[k] if c is not None else v, a.name)
                     for c, v, a in zip(cols, numeric, fn.args)]
            si = [to_si(v, a.unit) for v, a in zip(point, fn.args)]
            if fn.kind == "convert":
                try:
                    rows.append([capi.acp_from_si(capi.acp_to_si(point[0], texts["from_unit"]),
                                                  texts["to_unit"])])
                except capi.AcperfError as e:
                    raise InvalidInput(str(e)) from None
            elif fn.kind == "status":
                return trip_status(fn, ac, mission, si)
            elif fn.kind == "trace":
                return _point(fn, ac, mission, si, texts)
            else:
                rows.append(_point(fn, ac, mission, si, texts))
        if n is None and not fn.returns_row:
            return rows[0][0]
        return rows
    finally:
        if ac is not None:
            ac.close()
        if mission is not None:
            mission.close()
