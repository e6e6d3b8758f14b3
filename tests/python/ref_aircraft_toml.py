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

from reflib import Checker, aircraft_api, flatten, load, model_differences

lib = aircraft_api(load())
EXAMPLES = pathlib.Path(__file__).resolve().parents[2] / "examples" / "aircraft"
check = Checker("aircraft files: tomllib vs the C parser")


def compare(ac, flat, label):
    check.count += 1
    check.failures += [f"{label}: {d}" for d in model_differences(lib, ac, flat)]


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
