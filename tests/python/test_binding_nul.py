"""A str with an embedded NUL is refused, never cut short (issue 16, item 12).

A C string ends at its first NUL, so before this check `Aircraft.from_text` read
only the text before it, `ac["name"] = "a\\0b"` stored "a" and `from_file` opened
the path before it. References: the C prototypes of the headers (every
`const char *` parameter, found by conftest.parse_headers), and the design
contract (/work/shared/DESIGN.md: errors are AcperfError, a ValueError; messages
short and naming the argument). The demo aircraft is invented.
"""

import re

import pytest

import acperf
from conftest import demo_aircraft_path, parse_headers

PATH = demo_aircraft_path()
TEXT = PATH.read_text()
INVALID = acperf.capi.ACP_ERR_INVALID


def refused(call, argument):
    """The AcperfError of a call refused for a NUL in `argument`."""
    with pytest.raises(acperf.AcperfError) as err:
        call()
    exc = err.value
    assert isinstance(exc, ValueError) and exc.status == INVALID
    msg = str(exc)
    assert f": {argument} " in msg and "NUL character" in msg, msg
    assert len(msg) < 200 and "Swig" not in msg and not re.search(r"0x[0-9a-f]{6}", msg), msg
    return msg


def test_aircraft_text_with_a_nul_is_refused():
    # the example: before, this loaded without oswald (the estimate used instead)
    refused(lambda: acperf.Aircraft.from_text("cd0 = 0.02\0 5\noswald = 0.8\n"), "text")
    # a whole file: the message gives the length and where, never the text
    at = TEXT.index("oswald")
    msg = refused(lambda: acperf.Aircraft.from_text(TEXT[:at] + "\0" + TEXT[at:]), "text")
    assert f"at index {at}" in msg and "oswald" not in msg
    assert acperf.Aircraft.from_text(TEXT)["oswald"] > 0  # the same text without it loads


def test_a_path_with_a_nul_is_refused():
    refused(lambda: acperf.Aircraft.from_file(str(PATH) + "\0junk"), "path")
    assert acperf.Aircraft.from_file(str(PATH))["wing_area"] > 0


def test_aircraft_keys_and_text_values_with_a_nul_are_refused():
    ac = acperf.Aircraft.from_file(PATH)
    name, area = ac["name"], ac["wing_area"]
    refused(lambda: ac.__setitem__("name", "a\0b"), "value")
    refused(lambda: ac.__setitem__("wing_area\0junk", 50.0), "key")
    refused(lambda: ac.__setitem__("na\0me", "x"), "key")
    refused(lambda: ac.__getitem__("cd0\0junk"), "key")  # not a KeyError, not cd0
    refused(lambda: ac.__getitem__("component.wing\0.type"), "key")
    refused(lambda: ac.__delitem__("wing_area\0"), "key")
    assert ac["name"] == name and ac["wing_area"] == area  # nothing changed


def test_mission_keys_with_a_nul_are_refused():
    m = acperf.Mission(distance=500 * 1852.0)
    refused(lambda: m.__setitem__("distance\0junk", 1.0), "key")
    refused(lambda: m.__getitem__("distance\0"), "key")
    refused(lambda: acperf.Mission(**{"cruise_altitude\0x": 10668.0}), "key")
    assert m["distance"] == 500 * 1852.0


def test_unit_names_with_a_nul_are_refused():
    refused(lambda: acperf.units.to_si(1.0, "ft\0junk"), "unit")
    refused(lambda: acperf.units.from_si(1.0, "kt\0"), "unit")


def _c_string_functions():
    """(C name, [parameter types and names]) of every function with a const char * input."""
    return sorted((name, params) for name, (_, params) in parse_headers().items()
                  if any(t == "const char*" for t, _ in params))


STRING_FUNCTIONS = _c_string_functions()


@pytest.mark.parametrize("cname, params", STRING_FUNCTIONS, ids=[f[0] for f in STRING_FUNCTIONS])
def test_every_c_string_argument_refuses_a_nul(cname, params):
    # Each const char * parameter of the headers, through the raw SWIG call, with the
    # other arguments valid: refused by name before the C function runs.
    assert len(STRING_FUNCTIONS) >= 11
    ac = acperf.Aircraft.from_file(PATH)
    mission = acperf.Mission()
    targets = [p for t, p in params if t == "const char*"]
    for target in targets:
        args = []
        for i, (t, p) in enumerate(params):
            if t.endswith("acp_aircraft*"):
                args.append(ac._handle)
            elif t.endswith("acp_mission*"):
                args.append(mission._handle)
            elif t == "double":
                args.append(1.0)
            elif t == "const char*":
                args.append("cd0\0x" if p == target else
                            ("ft" if p == "unit" else "name = 'x'\n" if p == "text" else "cd0"))
            # (char *err/buf, size_t len) pairs are outputs: no Python argument
        refused(lambda: getattr(acperf.capi, cname)(*args), target)
