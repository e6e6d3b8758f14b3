"""Shared ctypes loader for the reference checks (independent of the SWIG binding)."""
import ctypes
import struct
import sys

D = ctypes.c_double


def load(path=None):
    """Load libacperf given on the command line and declare the scalar functions used."""
    lib = ctypes.CDLL(path or sys.argv[1])
    for name, nargs in [
        ("acp_cas_to_tas", 3), ("acp_tas_to_cas", 3), ("acp_cas_to_mach", 2),
        ("acp_mach_to_cas", 2), ("acp_geometric_altitude", 1), ("acp_isa_pressure", 1),
    ]:
        fn = getattr(lib, name)
        fn.restype = D
        fn.argtypes = [D] * nargs
    return lib


class AcpAtmos(ctypes.Structure):
    _fields_ = [(n, D) for n in ("temperature", "pressure", "density", "sound_speed",
                                  "dynamic_viscosity", "kinematic_viscosity")]


def isa(lib, hp, dtemp=0.0):
    out = AcpAtmos()
    status = lib.acp_isa(D(hp), D(dtemp), ctypes.byref(out))
    if status != 0:
        raise ValueError(f"acp_isa({hp}, {dtemp}) returned status {status}")
    return out


def aircraft_api(lib):
    """Declare the aircraft model functions the text-format checks call."""
    lib.acp_aircraft_new.restype = ctypes.c_void_p
    lib.acp_aircraft_free.argtypes = [ctypes.c_void_p]
    for name in ("acp_aircraft_load", "acp_aircraft_parse"):
        getattr(lib, name).argtypes = [ctypes.c_void_p, ctypes.c_char_p, ctypes.c_char_p,
                                       ctypes.c_size_t]
    lib.acp_aircraft_get.argtypes = [ctypes.c_void_p, ctypes.c_char_p, ctypes.POINTER(D)]
    lib.acp_aircraft_get_text.argtypes = [ctypes.c_void_p, ctypes.c_char_p, ctypes.c_char_p,
                                          ctypes.c_size_t]
    lib.acp_aircraft_key_at.argtypes = [ctypes.c_void_p, ctypes.c_size_t, ctypes.c_char_p,
                                        ctypes.c_size_t]
    return lib


def flatten(doc):
    """tomllib's nested tables as the C library's key names ("component.NAME.FIELD")."""
    flat = {}
    for key, value in doc.items():
        if key == "component" and isinstance(value, dict):
            for comp, table in value.items():
                for field, v in (table.items() if isinstance(table, dict) else [(None, table)]):
                    flat[f"component.{comp}.{field}"] = v
        else:
            flat[key] = value
    return flat


def model_differences(lib, ac, flat):
    """How the C model differs from tomllib's flattened document: the key sets (the C
    list from acp_aircraft_key_at) and each value, numbers bit for bit (so -0.0 is not
    0); a list of texts, empty when they read the same."""
    keys, buf, i = set(), ctypes.create_string_buffer(128), 0
    while lib.acp_aircraft_key_at(ac, i, buf, len(buf)) == 0:
        keys.add(buf.value.decode())
        i += 1
    diffs = []
    listed = {k for k, v in flat.items() if v != ""}  # "" is a text's default: not listed
    if keys != listed:
        diffs.append(f"key sets differ: only tomllib {sorted(listed - keys)}, "
                     f"only C {sorted(keys - listed)}")
    for key, want in flat.items():
        if isinstance(want, str):
            text = ctypes.create_string_buffer(256)
            if lib.acp_aircraft_get_text(ac, key.encode(), text, len(text)) != 0 or \
                    text.value.decode() != want:
                diffs.append(f"{key} = {text.value!r}, tomllib {want!r}")
        else:
            got = D()
            st = lib.acp_aircraft_get(ac, key.encode(), ctypes.byref(got))
            if st != 0 or struct.pack("<d", got.value) != struct.pack("<d", float(want)):
                diffs.append(f"{key}: C {got.value!r} (status {st}), tomllib {want!r}")
    return diffs


class Checker:
    """Counts checks and failures; exits non-zero when any check failed."""

    def __init__(self, title):
        self.title, self.count, self.failures = title, 0, []

    def close(self, got, want, rel, label):
        self.count += 1
        if not abs(got - want) <= rel * abs(want):
            self.failures.append(f"{label}: got {got!r} want {want!r} (rel tol {rel})")

    def finish(self):
        for f in self.failures[:20]:
            print("FAIL", f)
        print(f"{self.title}: {self.count} checks, {len(self.failures)} failures")
        sys.exit(1 if self.failures or self.count == 0 else 0)
