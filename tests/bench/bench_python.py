#!/usr/bin/python3
"""Benchmark of the Python binding against the same C calls made through ctypes.

Not a test: it prints figures. Run from the top of the repository after a build:

    PYTHONPATH=build-py/bindings/python /usr/bin/python3 tests/bench/bench_python.py \
        build-py/libperf/libacperf.so [build-py/tests/bench/acperf_bench]

1. Array calls, 1e6 points: acperf.<fn>(arrays) against the `_n` C function on
   the same arrays through ctypes (output arrays allocated in both), best of N
   runs, alternated so that both see the same machine load.
2. Scalar calls: time per call of acperf.<fn>(floats) (the fast path of
   acperf._fast), of the Python function behind it (`__wrapped__`: its SWIG
   scalar path, the public path before acperf._fast), of the raw SWIG function
   acperf.capi.acp_<fn> and of ctypes; overhead = time per call - C time per
   call, measured in this run by acperf._fast.c_loop (the C function in a C
   loop with the same inputs); the scalar loops of the C benchmark
   (acperf_bench, optional second argument, varied inputs) are shown beside.
   Named results are timed dropped at once (the fast path refills the last
   one), kept (`r = ...`: a new one each call) and with one field taken.
"""

import ctypes
import math
import sys
import time
import timeit

import numpy as np

import acperf

N = 1_000_000
REPEAT = 9
# The invented demo aircraft of the examples (from the top of the repository).
JET = acperf.Aircraft.from_file("examples/aircraft/regional_jet.toml")

lib = ctypes.CDLL(sys.argv[1] if len(sys.argv) > 1 else "build-py/libperf/libacperf.so")
PD = ctypes.POINTER(ctypes.c_double)
D = ctypes.c_double


def ptr(a):
    return a.ctypes.data_as(PD) if a is not None else None


def declare(name, nin, nout):
    fn = getattr(lib, name)
    fn.restype = ctypes.c_size_t
    fn.argtypes = [ctypes.c_size_t] + [PD] * (nin + nout)
    return fn


def c_array_call(fn, inputs, nout):
    outs = [np.empty(N) for _ in range(nout)]
    fn(N, *[ptr(a) for a in inputs], *[ptr(o) for o in outs])
    return outs


def best(fn, repeat=REPEAT):
    times = []
    for _ in range(repeat):
        t = time.perf_counter()
        fn()
        times.append(time.perf_counter() - t)
    return min(times)


def array_bench():
    rng = np.random.default_rng(1)
    cas = rng.uniform(50.0, 250.0, N)
    hp = rng.uniform(0.0, 12000.0, N)
    dtemp = rng.uniform(-20.0, 20.0, N)
    cases = [
        ("cas_to_mach(cas, hp)", lambda: acperf.cas_to_mach(cas, hp),
         declare("acp_cas_to_mach_n", 2, 1), [cas, hp], 1),
        ("cas_to_tas(cas, hp, dtemp)", lambda: acperf.cas_to_tas(cas, hp, dtemp),
         declare("acp_cas_to_tas_n", 3, 1), [cas, hp, dtemp], 1),
        ("isa(hp, dtemp) [6 outputs]", lambda: acperf.isa(hp, dtemp),
         declare("acp_isa_n", 2, 6), [hp, dtemp], 6),
    ]
    print(f"Array calls, {N:.0e} points, best of {REPEAT} (alternated):")
    for label, py, cfn, inputs, nout in cases:
        # same numbers from both
        ref = c_array_call(cfn, inputs, nout)
        got = py()
        got = list(got) if nout > 1 else [got]
        # the same C kernel: equal (NaN where NaN)
        assert all(np.array_equal(g, r, equal_nan=True) for g, r in zip(got, ref))
        tp, tc = [], []
        for _ in range(REPEAT):
            tp.append(best(py, 1))
            tc.append(best(lambda: c_array_call(cfn, inputs, nout), 1))
        tp, tc = min(tp), min(tc)
        print(f"  {label:30s} python {tp * 1e3:8.2f} ms   C via ctypes {tc * 1e3:8.2f} ms"
              f"   ratio {tp / tc:.3f}")


def per_call(stmt, glb, number=200_000):
    t = min(timeit.repeat(stmt, globals=glb, number=number, repeat=7))
    return t / number


def c_scalar_loops(bench_exe):
    """{kernel: (median, min) ns per call} of the scalar loops of tests/bench/bench.c
    (acperf_bench 200000 11), run now so that C and Python see the same machine."""
    import subprocess

    out = subprocess.run([bench_exe, "200000", "11"], check=True, capture_output=True,
                         text=True).stdout
    loops = {}
    for line in out.splitlines()[1:]:
        name, _, median, low = line.split(",")[:4]
        if name.endswith("(scalar loop)"):
            loops[name.split()[0]] = (float(median) * 1e-9, float(low) * 1e-9)
    return loops


def scalar_bench(bench_exe):
    print("Scalar calls, best of 9 x 200,000 calls:")
    ct = lib.acp_cas_to_mach
    ct.restype, ct.argtypes = D, [D, D]
    ft = lib.acp_ft_to_m
    ft.restype, ft.argtypes = D, [D]

    def empty(a, b):
        return a

    loops = c_scalar_loops(bench_exe) if bench_exe else {}
    for name, (med, low) in loops.items():
        print(f"  C scalar loop {name:12s} median {med * 1e9:6.1f} ns   min {low * 1e9:6.1f} ns"
              "   (acperf_bench: varied inputs)")
    # Overhead: each Python statement against the same C call with the same inputs
    # looped in C by acperf._fast.c_loop (the fast path's trampoline, no Python in
    # the loop), alternated 9 times so that both see the same machine load; minima.
    # "chained": the C loop with each call waiting for the previous result, as a
    # call from Python does (a free-running loop overlaps successive calls).
    g = {"acperf": acperf, "ct": ct, "ct_ft": ft, "empty": empty,
         "cas_to_mach": acperf.cas_to_mach, "cas_to_mach_py": acperf.cas_to_mach.__wrapped__,
         "raw": acperf.capi.acp_cas_to_mach,
         "cas_to_tas": acperf.cas_to_tas, "cas_to_tas_py": acperf.cas_to_tas.__wrapped__,
         "raw_tas": acperf.capi.acp_cas_to_tas,
         "isa": acperf.isa, "isa_py": acperf.isa.__wrapped__, "raw_isa": acperf.capi.acp_isa,
         "ft_to_m": acperf.units.ft_to_m, "ft_to_m_py": acperf.units.ft_to_m.__wrapped__,
         "raw_ft": acperf.capi.acp_ft_to_m,
         "drag": acperf.drag, "drag_py": acperf.drag.__wrapped__, "raw_drag": acperf.capi.acp_drag,
         "jet": JET, "jet_handle": JET._handle}
    groups = [
        ("acp_cas_to_mach", (150.0, 3000.0), [
            ("acperf.cas_to_mach(150.0, 3000.0) [fast]", "cas_to_mach(150.0, 3000.0)"),
            ("  Python function behind it (before)", "cas_to_mach_py(150.0, 3000.0)"),
            ("  acperf.capi.acp_cas_to_mach (raw SWIG)", "raw(150.0, 3000.0)"),
            ("  ctypes acp_cas_to_mach", "ct(150.0, 3000.0)")]),
        ("acp_cas_to_tas", (150.0, 3000.0, 10.0), [
            ("acperf.cas_to_tas(150.0, 3000.0, 10.0) [fast]", "cas_to_tas(150.0, 3000.0, 10.0)"),
            ("  Python function behind it (before)", "cas_to_tas_py(150.0, 3000.0, 10.0)"),
            ("  acperf.capi.acp_cas_to_tas (raw SWIG)", "raw_tas(150.0, 3000.0, 10.0)")]),
        ("acp_isa", (11000.0, 10.0), [
            ("acperf.isa(11000.0, 10.0) [fast, Atmos dropped]", "isa(11000.0, 10.0)"),
            ("  r = acperf.isa(11000.0, 10.0) [fast, kept]", "r = isa(11000.0, 10.0)"),
            ("  acperf.isa(11000.0, 10.0).temperature [fast]", "isa(11000.0, 10.0).temperature"),
            ("  acperf.isa(11000.0, dtemp=10.0) [fast, keyword]", "isa(11000.0, dtemp=10.0)"),
            ("  Python function behind it (before)", "isa_py(11000.0, 10.0)"),
            ("  acperf.capi.acp_isa (raw SWIG, struct)", "raw_isa(11000.0, 10.0)"),
            ("  r = acperf.capi.acp_isa (raw SWIG, kept)", "r = raw_isa(11000.0, 10.0)")]),
        ("acp_drag", (JET, 36000.0, 10668.0, 0.0, 230.0), [
            ("acperf.drag(jet, 36000.0, ...) [fast, dropped]", "drag(jet, 36000.0, 10668.0, 0.0, 230.0)"),
            ("  r = acperf.drag(jet, ...) [fast, kept]", "r = drag(jet, 36000.0, 10668.0, 0.0, 230.0)"),
            ("  Python function behind it (before)", "drag_py(jet, 36000.0, 10668.0, 0.0, 230.0)"),
            ("  acperf.capi.acp_drag (raw SWIG, struct)",
             "raw_drag(jet_handle, 36000.0, 10668.0, 0.0, 230.0)")]),
        ("acp_ft_to_m", (1000.0,), [
            ("acperf.units.ft_to_m(1000.0) [fast]", "ft_to_m(1000.0)"),
            ("  Python function behind it (before)", "ft_to_m_py(1000.0)"),
            ("  acperf.capi.acp_ft_to_m (raw SWIG)", "raw_ft(1000.0)"),
            ("  ctypes acp_ft_to_m", "ct_ft(1000.0)")]),
    ]
    n = 200_000
    print("  overhead = time per call - C time per call, same inputs, same run (minima)")
    for cname, args, rows in groups:
        t_c = t_chain = math.inf
        t_py = [math.inf] * len(rows)
        for _ in range(9):
            t_c = min(t_c, acperf._fast.c_loop(cname, args, n) / n)
            t_chain = min(t_chain, acperf._fast.c_loop(cname, args, n, True) / n)
            for i, (_, stmt) in enumerate(rows):
                t_py[i] = min(t_py[i], timeit.timeit(stmt, globals=g, number=n) / n)
        shown = "(" + ", ".join("jet" if a is JET else repr(a) for a in args) + ")"
        print(f"  C {cname}{shown} in a C loop {' ' * max(0, 26 - len(cname) - len(shown))}"
              f"{t_c * 1e9:7.1f} ns/call; chained {t_chain * 1e9:6.1f} ns/call")
        for (label, _), t in zip(rows, t_py):
            print(f"  {label:48s} {t * 1e9:7.1f} ns/call   overhead {(t - t_c) * 1e9:6.1f} ns"
                  f" (chained {(t - t_chain) * 1e9:6.1f})")
    t = per_call("empty(150.0, 3000.0)", g)
    print(f"  {'empty Python function (reference)':48s} {t * 1e9:7.1f} ns/call")


# What a notebook user would otherwise write: the ISO 2533 troposphere and lower
# stratosphere in numpy (the layers a flight uses; no checks), and Debian's
# python3-fluids 1976 atmosphere called point by point.
def numpy_isa(hp, dtemp):
    t_std = np.where(hp < 11000.0, 288.15 - 0.0065 * hp, 216.65)
    p = np.where(hp < 11000.0, 101325.0 * (t_std / 288.15) ** (9.80665 / (287.05287 * 0.0065)),
                 22632.040095007799 * np.exp(-9.80665 * (hp - 11000.0) / (287.05287 * 216.65)))
    t = t_std + dtemp
    rho = p / (287.05287 * t)
    a = np.sqrt(1.4 * 287.05287 * t)
    return t, p, rho, a


def alternatives_bench():
    from fluids.atmosphere import ATMOSPHERE_1976

    rng = np.random.default_rng(2)
    hp = rng.uniform(0.0, 20000.0, N)
    dtemp = rng.uniform(-20.0, 20.0, N)
    t_acperf = min(best(lambda: acperf.isa(hp, dtemp), 1) for _ in range(REPEAT)) / N
    t_numpy = min(best(lambda: numpy_isa(hp, dtemp), 1) for _ in range(REPEAT)) / N
    # numpy's answer is the same atmosphere (1e-12 relative), so the race is fair
    ref = acperf.isa(hp, dtemp)
    mine = numpy_isa(hp, dtemp)
    assert np.allclose(mine[1], ref.pressure, rtol=1e-12, atol=0.0)
    m = 20_000
    z = acperf.geometric_altitude(hp[:m])

    def fluids_loop():
        for zi, di in zip(z, dtemp[:m]):
            ATMOSPHERE_1976(zi, dT=di)

    t_fluids = best(fluids_loop, 1) / m
    print("Atmosphere per point, 1e6 points (fluids: 2e4 points):")
    print(f"  acperf.isa (array form, 6 outputs)  {t_acperf * 1e9:9.1f} ns")
    print(f"  numpy ISA (4 outputs, 2 layers)     {t_numpy * 1e9:9.1f} ns   "
          f"acperf is {t_numpy / t_acperf:.1f}x faster")
    print(f"  fluids ATMOSPHERE_1976, per point   {t_fluids * 1e9:9.1f} ns   "
          f"acperf is {t_fluids / t_acperf:.0f}x faster")


if __name__ == "__main__":
    print(f"acperf {acperf.__version__}, numpy {np.__version__}, Python {sys.version.split()[0]}")
    array_bench()
    scalar_bench(sys.argv[2] if len(sys.argv) > 2 else None)
    alternatives_bench()
