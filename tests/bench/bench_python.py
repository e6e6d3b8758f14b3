#!/usr/bin/python3
"""Benchmark of the Python binding against the same C calls made through ctypes.

Not a test: it prints figures. Run from the top of the repository after a build:

    PYTHONPATH=build-py/bindings/python /usr/bin/python3 tests/bench/bench_python.py \
        build-py/libperf/libacperf.so

1. Array calls, 1e6 points: acperf.<fn>(arrays) against the `_n` C function on
   the same arrays through ctypes (output arrays allocated in both), best of N
   runs, alternated so that both see the same machine load.
2. Scalar calls: time per call of acperf.<fn>(floats), of the raw SWIG function
   acperf.capi.acp_<fn> and of ctypes, and the C time per point measured by the
   array form; overhead = time per call - C time per point.
"""

import ctypes
import sys
import time
import timeit

import numpy as np

import acperf

N = 1_000_000
REPEAT = 9

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


def scalar_bench():
    print("Scalar calls, best of 7 x 200,000 calls:")
    # C time per point, from the array form on 1e6 identical points.
    cas = np.full(N, 150.0)
    hp = np.full(N, 3000.0)
    cfn = declare("acp_cas_to_mach_n", 2, 1)
    t_c = best(lambda: c_array_call(cfn, [cas, hp], 1)) / N
    ct = lib.acp_cas_to_mach
    ct.restype, ct.argtypes = D, [D, D]
    ft = lib.acp_ft_to_m
    ft.restype, ft.argtypes = D, [D]

    def empty(a, b):
        return a

    g = {"acperf": acperf, "cas_to_mach": acperf.cas_to_mach, "raw": acperf.capi.acp_cas_to_mach,
         "ct": ct, "ft_to_m": acperf.units.ft_to_m, "raw_ft": acperf.capi.acp_ft_to_m,
         "ct_ft": ft, "empty": empty}
    rows = [
        ("acperf.cas_to_mach(150.0, 3000.0)", "cas_to_mach(150.0, 3000.0)", t_c),
        ("acperf.capi.acp_cas_to_mach (raw SWIG)", "raw(150.0, 3000.0)", t_c),
        ("ctypes acp_cas_to_mach", "ct(150.0, 3000.0)", t_c),
        ("acperf.units.ft_to_m(1000.0)", "ft_to_m(1000.0)", 0.0),
        ("acperf.capi.acp_ft_to_m (raw SWIG)", "raw_ft(1000.0)", 0.0),
        ("ctypes acp_ft_to_m", "ct_ft(1000.0)", 0.0),
        ("empty Python function (reference)", "empty(150.0, 3000.0)", 0.0),
    ]
    print(f"  C time per point of acp_cas_to_mach (from the array form): {t_c * 1e9:.1f} ns")
    for label, stmt, c_cost in rows:
        t = per_call(stmt, g)
        extra = f"   overhead {(t - c_cost) * 1e9:6.1f} ns" if c_cost else ""
        print(f"  {label:42s} {t * 1e9:7.1f} ns/call{extra}")


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
    scalar_bench()
    alternatives_bench()
