"""The aircraft model (acperf/aircraft.h) as a Python object.

    >>> ac = acperf.Aircraft.from_file("examples/aircraft/regional_jet.toml")
    >>> ac["cd0"], ac["wing_area"], ac["name"]
    >>> ac2 = acperf.Aircraft.from_dict({"wing_area": 30.0, "span": 15.0, "cd0": 0.025,
    ...                                  "oswald": 0.8, "cl_max": 1.5})

Keys, units (SI) and ranges are those of the C library (docs/aircraft-format.md);
every check is the library's own: an unknown key, a value out of range or a
malformed file raises AcperfError with the library's status text and, for files
and text, its "line N: ..." message. A key, text value, path or aircraft text with
a NUL character is refused (AcperfError, ACP_ERR_INVALID): C would read it cut short.
"""

from . import capi as _c
from . import _fast
from ._core import AcperfError

__all__ = ["Aircraft"]

_TEXT_KEYS_SUFFIX = ".type"


def _is_text_key(key):
    return key in ("name", "engine_type") or (key.startswith("component.") and key.endswith(_TEXT_KEYS_SUFFIX))


class Aircraft(_fast.model):
    """An aircraft model: an owned acp_aircraft handle with dict-like access by key."""

    __slots__ = ("_handle", "__weakref__")

    def __init__(self):
        handle = _c.acp_aircraft_new()
        if handle is None:
            raise MemoryError("acp_aircraft_new: out of memory")
        self._handle = handle
        self._attach(handle, "A")  # its C address, for the fast scalar calls

    def __del__(self):
        handle = getattr(self, "_handle", None)
        if handle is not None:
            self._detach()
            self._handle = None
            _c.acp_aircraft_free(handle)

    # ---- construction --------------------------------------------------------
    @classmethod
    def from_text(cls, text):
        """A model from the text format (a strict subset of TOML)."""
        ac = cls()
        _c.acp_aircraft_parse(ac._handle, text)
        return ac

    @classmethod
    def from_file(cls, path):
        """A model read from a file in the text format."""
        ac = cls()
        _c.acp_aircraft_load(ac._handle, str(path))
        return ac

    @classmethod
    def from_dict(cls, values):
        """A model from {key: value}: numbers for numeric keys, str for text keys
        ("name", "component.NAME.type"); component keys as "component.NAME.FIELD",
        or nested as {"component": {"NAME": {"FIELD": value}}}."""
        ac = cls()
        for key, value in _flatten(values):
            ac[key] = value
        return ac

    def copy(self):
        """An independent copy of the model."""
        other = Aircraft()
        _c.acp_aircraft_copy(other._handle, self._handle)
        return other

    # copy.copy, copy.deepcopy and pickle (multiprocessing): a new model of its own,
    # never a second owner of the same C object
    def __copy__(self):
        return self.copy()

    def __deepcopy__(self, memo):
        return self.copy()

    def __reduce__(self):
        return (Aircraft.from_dict, (self.to_dict(),))

    # ---- keys ----------------------------------------------------------------
    def __getitem__(self, key):
        get = _c.acp_aircraft_get_text if _is_text_key(key) else _c.acp_aircraft_get
        try:
            return get(self._handle, key)
        except AcperfError as exc:  # a key with a NUL is refused, not unknown
            if exc.status == _c.ACP_ERR_UNKNOWN_KEY:
                raise KeyError(key) from exc
            raise

    def __setitem__(self, key, value):
        if isinstance(value, str):
            _c.acp_aircraft_set_text(self._handle, key, value)
        else:
            _c.acp_aircraft_set(self._handle, key, float(value))

    def __delitem__(self, key):
        _c.acp_aircraft_unset(self._handle, key)

    def keys(self):
        """The keys that have a value given (not defaults), in the library's order."""
        out = []
        index = 0
        while True:
            try:
                out.append(_c.acp_aircraft_key_at(self._handle, index))
            except AcperfError:
                return out
            index += 1

    def __iter__(self):
        return iter(self.keys())

    def __contains__(self, key):
        return key in self.keys()

    def to_dict(self):
        """{key: value} of the keys given (text keys as str)."""
        return {k: self[k] for k in self.keys()}

    def components(self):
        """Names of the components of the drag build-up, in order."""
        out = []
        index = 0
        while True:
            try:
                out.append(_c.acp_aircraft_component(self._handle, index))
            except AcperfError:
                return out
            index += 1

    def check(self):
        """Raise AcperfError naming what is missing or inconsistent; None when complete."""
        _c.acp_aircraft_check(self._handle)

    def __repr__(self):
        try:
            name = self["name"]
        except (KeyError, AcperfError):
            name = ""
        return f"<acperf.Aircraft {name!r}, {len(self.keys())} keys given>"


def _flatten(values, prefix=""):
    for key, value in values.items():
        if isinstance(value, dict):
            yield from _flatten(value, f"{prefix}{key}.")
        else:
            yield f"{prefix}{key}", value
