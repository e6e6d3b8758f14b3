"""Shared helpers of the pytest checks of the Python binding (test_binding_*.py).

The binding is checked against libacperf called through ctypes, which shares
nothing with SWIG: the prototypes are read from the public headers and the C
functions are called one point at a time. ctest sets ACPERF_LIBRARY to the
built shared library and PYTHONPATH to the binding's build tree.
"""

import ctypes
import math
import os
import re
from pathlib import Path

import pytest

ROOT = Path(__file__).resolve().parents[2]
HEADERS = ROOT / "libperf" / "include" / "acperf"

D = ctypes.c_double
PD = ctypes.POINTER(ctypes.c_double)

_PROTO = re.compile(r"ACP_API\s+([\w\s\*]+?)\s*\b(acp_\w+)\s*\(([^)]*)\)\s*;", re.S)
_STRUCT = re.compile(r"typedef\s+struct\s*\{(.*?)\}\s*(acp_\w+)\s*;", re.S)


def _strip_comments(text):
    return re.sub(r"/\*.*?\*/", " ", text, flags=re.S)


def parse_headers(headers=None):
    """{name: (return type, [(param type, param name)])} of every ACP_API function."""
    protos = {}
    for h in headers or sorted(HEADERS.glob("*.h")):
        text = _strip_comments(h.read_text())
        for ret, name, params in _PROTO.findall(text):
            plist = []
            for p in params.split(","):
                p = " ".join(p.split())
                if not p or p == "void":
                    continue
                m = re.match(r"(.*?)\s*(\w+)$", p)
                plist.append((m.group(1).replace(" *", "*").strip(), m.group(2)))
            protos[name] = (" ".join(ret.split()).replace(" *", "*"), plist)
    return protos


def parse_structs(headers=None):
    """{struct name: [field names in order]} of the plain output structs."""
    structs = {}
    for h in headers or sorted(HEADERS.glob("*.h")):
        text = _strip_comments(h.read_text())
        for body, name in _STRUCT.findall(text):
            fields = []
            for decl in body.split(";"):
                decl = decl.strip()
                if decl.startswith("double"):
                    fields += [f.strip() for f in decl[len("double"):].split(",")]
            structs[name] = fields
    return structs


def library_path():
    path = os.environ.get("ACPERF_LIBRARY")
    if path:
        return path
    import acperf  # build tree: <build>/bindings/python/acperf

    guess = Path(acperf.__file__).resolve().parents[3] / "libperf" / "libacperf.so"
    if guess.exists():
        return str(guess)
    pytest.skip("set ACPERF_LIBRARY to libacperf.so for the ctypes checks")


class CStatusError(Exception):
    """A status-returning C function returned non-zero (through ctypes)."""

    def __init__(self, status, outputs=None):
        super().__init__(status)
        self.status = status
        self.outputs = outputs  # what the C function left in its outputs


class CLib:
    """libacperf through ctypes, one scalar call at a time, typed from the headers."""

    def __init__(self, path):
        self.lib = ctypes.CDLL(path)
        self.protos = parse_headers()
        self.structs = {name: type(name, (ctypes.Structure,), {"_fields_": [(f, D) for f in fields]})
                        for name, fields in parse_structs().items()}
        self.lib.acp_strerror.restype = ctypes.c_char_p
        self.lib.acp_strerror.argtypes = [ctypes.c_int]

    def strerror(self, status):
        return self.lib.acp_strerror(status).decode()

    def call(self, name, *args):
        """Scalar call: a float (NaN on failure) for double functions; for status
        functions the outputs (float, tuple, or struct as dict) or CStatusError."""
        ret, params = self.protos[name]
        fn = getattr(self.lib, name)
        argtypes, cargs, outs = [], [], []
        values = iter(args)
        for ptype, pname in params:
            if ptype == "double":
                argtypes.append(D)
                cargs.append(D(next(values)))
            elif ptype in ("const acp_aircraft*", "acp_aircraft*", "const acp_mission*"):
                argtypes.append(ctypes.c_void_p)
                cargs.append(next(values))
            elif ptype == "int":  # enum values (rating, mode): whole numbers
                v = next(values)
                argtypes.append(ctypes.c_int)
                cargs.append(int(v) if math.isfinite(v) else -1)
            elif ptype == "size_t":
                argtypes.append(ctypes.c_size_t)
                cargs.append(next(values))
            elif ptype == "const char*":
                argtypes.append(ctypes.c_char_p)
                cargs.append(next(values).encode())
            elif ptype == "double*":
                cell = D(math.nan)
                argtypes.append(PD)
                cargs.append(ctypes.byref(cell))
                outs.append(cell)
            elif ptype.rstrip("*") in self.structs:
                cell = self.structs[ptype.rstrip("*")]()
                argtypes.append(ctypes.POINTER(type(cell)))
                cargs.append(ctypes.byref(cell))
                outs.append(cell)
            else:
                raise NotImplementedError(f"{name}: parameter type {ptype}")
        fn.argtypes = argtypes
        if ret == "double":
            fn.restype = D
            return fn(*cargs)
        assert ret == "int", (name, ret)
        fn.restype = ctypes.c_int
        status = fn(*cargs)
        vals = [{f: getattr(o, f) for f, _ in o._fields_} if isinstance(o, ctypes.Structure)
                else o.value for o in outs]
        vals = vals[0] if len(vals) == 1 else tuple(vals)
        if status != 0:
            raise CStatusError(status, vals)
        return vals


def demo_aircraft_path(name="regional_jet.toml"):
    return ROOT / "examples" / "aircraft" / name


@pytest.fixture(scope="session")
def clib():
    return CLib(library_path())


def same(a, b):
    """Equal to the last bit, NaN equal to NaN (same C code, same inputs)."""
    return (math.isnan(a) and math.isnan(b)) or a == b


def close(a, b):
    """Array form against the scalar C function: the vectorised kernels (libmvec,
    docs/performance.md) agree within 1e-14 relative; NaN equal to NaN."""
    return same(a, b) or abs(a - b) <= 1e-14 * abs(b)


def typed_as_documented(values, result_type=None):
    """Each value a float, except in the coded fields of `result_type` (its `_enums`,
    from the C enum each struct comment names): a member of that IntEnum, or a float
    NaN where the C field is NaN (docs/python.md, "Enums"). A type check, no check
    values: the values themselves are compared with the C calls by the tests."""
    enums = getattr(result_type, "_enums", ()) or (None,) * len(values)
    return all(type(v) is float if e is None else
               (type(v) is e or (type(v) is float and math.isnan(v)))
               for v, e in zip(values, enums))
