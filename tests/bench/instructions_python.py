#!/usr/bin/python3
"""Instructions per scalar call from Python, under valgrind's callgrind.

Not a test: it prints figures. Times of a 50 ns call are noise on a shared
machine; instruction counts are repeatable. Run from the top of the repository
after a build with the Python binding:

    PYTHONPATH=build-bench/bindings/python /usr/bin/python3 tests/bench/instructions_python.py

Each statement runs in a loop of N calls in a fresh interpreter; the count of
a run of no calls (start-up, import, set-up) is taken off and the rest divided
by N. The C function's own count per call (acperf._fast.c_loop, N calls in C
with the same inputs) and the empty loop's are taken off too, leaving what the
Python side costs per call: the call, the argument conversion and the result
objects.

Source of the figures: this project's own measurements on the machine it runs
on (no outside reference and no check values: nothing here passes or fails).
The inputs are the invented demo jet and values of the ISA range (ISO 2533).
"""

import subprocess
import sys

N = 100_000

NAMES = ("acperf", "jet", "jet_handle", "capi", "x", "d", "w", "kept")
SETUP = f"""
import acperf
jet = acperf.Aircraft.from_file("examples/aircraft/regional_jet.toml")
jet_handle, capi, x, d, w = jet._handle, acperf.capi, 11000.0, 10.0, acperf.isa.__wrapped__
kept = []
def run(n, {", ".join(f"{k}={k}" for k in NAMES)}):  # locals, as in a notebook function
    for _ in range(n):
        BODY
"""

# (label, C function and inputs for c_loop, statement); "r = ..." keeps the
# previous result alive during the call, as a loop that stores its results does;
# kept.append(...) keeps every result (new objects each call, and the append).
CASES = [
    ("isa_temperature(x, d) [fast, one float]", ("acp_isa_temperature", "(x, d)"),
     "acperf.isa_temperature(x, d)"),
    ("  capi.acp_isa_temperature(x, d) [raw SWIG]", None, "capi.acp_isa_temperature(x, d)"),
    ("isa(x, d) [fast, Atmos dropped]", ("acp_isa", "(x, d)"), "acperf.isa(x, d)"),
    ("  r = isa(x, d) [fast, Atmos kept]", None, "r = acperf.isa(x, d)"),
    ("  kept.append(isa(x, d)) [fast, all kept]", None, "kept.append(acperf.isa(x, d))"),
    ("  isa(x, d).temperature [fast]", None, "acperf.isa(x, d).temperature"),
    ("  isa(x, dtemp=d) [fast, keyword]", None, "acperf.isa(x, dtemp=d)"),
    ("  capi.acp_isa(x, d) [raw SWIG, struct]", None, "capi.acp_isa(x, d)"),
    ("  capi.acp_isa(x, d).temperature [raw SWIG]", None, "capi.acp_isa(x, d).temperature"),
    ("  kept.append(capi.acp_isa(x, d)) [raw SWIG]", None, "kept.append(capi.acp_isa(x, d))"),
    ("  isa.__wrapped__(x, d) [Python path]", None, "w(x, d)"),
    ("drag(jet, ...) [fast, dropped]", ("acp_drag", "(jet, 36000.0, x, 0.0, 230.0)"),
     "acperf.drag(jet, 36000.0, x, 0.0, 230.0)"),
    ("  r = drag(jet, ...) [fast, kept]", None, "r = acperf.drag(jet, 36000.0, x, 0.0, 230.0)"),
    ("  capi.acp_drag(handle, ...) [raw SWIG, struct]", None,
     "capi.acp_drag(jet_handle, 36000.0, x, 0.0, 230.0)"),
]


def instructions(body, n):
    script = SETUP.replace("BODY", body) + f"run({n})\n"
    out = subprocess.run(["valgrind", "--tool=callgrind", "--callgrind-out-file=/dev/null",
                          sys.executable, "-c", script], capture_output=True, text=True,
                         check=True).stderr
    return int(next(line for line in out.splitlines() if "Collected" in line).split()[-1])


START = {}


def per_call(body, n=N):
    if "start" not in START:
        START["start"] = instructions("pass", 0)
    return (instructions(body, n) - START["start"]) / n


def main():
    empty = per_call("pass")
    print(f"Instructions per call under callgrind (loops of {N:,} calls; "
          f"empty loop {empty:.0f} taken off)")
    print(f"  {'statement':48s} {'total':>7s} {'C':>6s} {'Python side':>12s}")
    c_cost = 0.0
    for label, c_case, stmt in CASES:
        if c_case is not None:
            name, args = c_case
            # N calls in C, in one loop turn
            c_cost = per_call(f"acperf._fast.c_loop({name!r}, {args}, {N}, True)", 1) / N
        total = per_call(stmt) - empty
        print(f"  {label:48s} {total:7.0f} {c_cost:6.0f} {total - c_cost:12.0f}")


if __name__ == "__main__":
    main()
