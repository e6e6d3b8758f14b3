"""Every examples/aircraft/*.toml reads the same with Python's tomllib and the C parser.

tomllib (Python's standard TOML 1.0 reader) is the outside reference for the
format: the C parser accepts a strict subset of TOML, so each demo file must
(1) load with tomllib, (2) load with acp_aircraft_load and acp_aircraft_parse,
(3) give the same set of keys (tomllib's tables flattened to the C library's
"component.NAME.FIELD" names; the C list from acp_aircraft_key_at) and
(4) the same value for every key, exactly. Run by ctest as
`python3 ref_aircraft_toml.py path/to/libacperf.so`.
"""
import ctypes
import pathlib
import tomllib

from reflib import Checker, load

lib = load()
lib.acp_aircraft_new.restype = ctypes.c_void_p
lib.acp_aircraft_free.argtypes = [ctypes.c_void_p]
for name in ("acp_aircraft_load", "acp_aircraft_parse"):
    getattr(lib, name).argtypes = [ctypes.c_void_p, ctypes.c_char_p, ctypes.c_char_p,
                                   ctypes.c_size_t]
lib.acp_aircraft_get.argtypes = [ctypes.c_void_p, ctypes.c_char_p,
                                 ctypes.POINTER(ctypes.c_double)]
lib.acp_aircraft_get_text.argtypes = [ctypes.c_void_p, ctypes.c_char_p, ctypes.c_char_p,
                                      ctypes.c_size_t]
lib.acp_aircraft_key_at.argtypes = [ctypes.c_void_p, ctypes.c_size_t, ctypes.c_char_p,
                                    ctypes.c_size_t]

EXAMPLES = pathlib.Path(__file__).resolve().parents[2] / "examples" / "aircraft"
TEXT_KEYS = {"name"}
check = Checker("aircraft files: tomllib vs the C parser")


def flatten(doc):
    """tomllib's nested tables as the C library's key names."""
    flat = {}
    for key, value in doc.items():
        if key == "component":
            for comp, table in value.items():
                for field, v in table.items():
                    flat[f"component.{comp}.{field}"] = v
        else:
            flat[key] = value
    return flat


def c_keys(ac):
    keys, buf, i = set(), ctypes.create_string_buffer(128), 0
    while lib.acp_aircraft_key_at(ac, i, buf, len(buf)) == 0:
        keys.add(buf.value.decode())
        i += 1
    return keys


def compare(ac, flat, label):
    err = ctypes.create_string_buffer(256)
    keys = c_keys(ac)
    check.count += 1
    if keys != set(flat):
        check.failures.append(f"{label}: key sets differ: only tomllib {sorted(set(flat) - keys)}, "
                              f"only C {sorted(keys - set(flat))}")
    for key, want in flat.items():
        if isinstance(want, str):
            check.count += 1
            if lib.acp_aircraft_get_text(ac, key.encode(), err, len(err)) != 0 or \
                    err.value.decode() != want:
                check.failures.append(f"{label}: {key} = {err.value!r}, tomllib {want!r}")
        else:
            got = ctypes.c_double()
            st = lib.acp_aircraft_get(ac, key.encode(), ctypes.byref(got))
            check.count += 1
            if st != 0 or got.value != float(want):
                check.failures.append(f"{label}: {key}: C {got.value!r} (status {st}), "
                                      f"tomllib {want!r}")


files = sorted(EXAMPLES.glob("*.toml"))
if len(files) < 2:
    check.failures.append(f"expected at least two demo aircraft in {EXAMPLES}")
for path in files:
    with open(path, "rb") as f:
        flat = flatten(tomllib.load(f))
    ac = lib.acp_aircraft_new()
    err = ctypes.create_string_buffer(256)
    st = lib.acp_aircraft_load(ac, str(path).encode(), err, len(err))
    check.count += 1
    if st != 0:
        check.failures.append(f"{path.name}: acp_aircraft_load status {st}: {err.value.decode()}")
    else:
        compare(ac, flat, path.name + " (load)")
    st = lib.acp_aircraft_parse(ac, path.read_bytes(), err, len(err))
    check.count += 1
    if st != 0:
        check.failures.append(f"{path.name}: acp_aircraft_parse status {st}: {err.value.decode()}")
    else:
        compare(ac, flat, path.name + " (parse)")
    lib.acp_aircraft_free(ac)

# Texts the C parser accepts must mean the same to tomllib (the subset rule).
SAMPLES = [
    "wing_area = 30\nspan=15\n\t cd0 = 2.0e-2 # c\nname = 'lit'\n",
    "wing_area = 3E1\nspan = +15\ncd0 = 0.02\r\n",
    "wing_area = 20\nspan = 12\n[ component . w ]\ntype = \"surface\"\nwetted_area = 40\n"
    "length = 2\nthickness_ratio = 0.12\ncount = 2\n",
]
for i, text in enumerate(SAMPLES):
    ac = lib.acp_aircraft_new()
    err = ctypes.create_string_buffer(256)
    st = lib.acp_aircraft_parse(ac, text.encode(), err, len(err))
    check.count += 1
    if st != 0:
        check.failures.append(f"sample {i}: C parse status {st}: {err.value.decode()}")
    else:
        compare(ac, flatten(tomllib.loads(text)), f"sample {i}")
    lib.acp_aircraft_free(ac)

check.finish()
