#!/usr/bin/python3
"""acperf.dll under wine64: dll_check.exe loads it with LoadLibrary and calls
each case of cases.py through GetProcAddress with the prototype read from the
C headers, converting units with the DLL's acp_to_si/acp_from_si as the VBA
module does; every result is compared with reference.py (the Linux library
through the Python binding). Headless, WINEDEBUG=-all, a throwaway WINEPREFIX,
the wineserver ended at the end."""

import argparse
import math
import os
import shutil
import subprocess
import sys

HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, HERE)
sys.path.insert(0, os.path.join(HERE, "..", "..", "bindings", "spreadsheet"))
import cases as C  # noqa: E402
import functions as T  # noqa: E402
import generate  # noqa: E402
import reference as R  # noqa: E402

# Different C runtime (mingw-w64's math on msvcrt against glibc's libm): the
# closed forms agree to a few ulp; the speeds come from a numerical search
# (bisection of a finite-difference slope, speeds.h) whose end point moves with
# the last bits of the drag, so they are compared to 1e-9. Measured values are
# printed below.
RTOL_CLOSED, RTOL_SEARCH = 1e-12, 1e-9

HEADERS = sorted(os.path.join(C.ROOT, "libperf", "include", "acperf", f)
                 for f in os.listdir(os.path.join(C.ROOT, "libperf", "include", "acperf"))
                 if f.endswith(".h"))


def signature(protos, name):
    ret, params = protos[name]
    letters = "".join("A" if "acp_aircraft" in t else "M" if "acp_mission" in t
                      else "d" if t == "double" else "i" if t == "int" else "P"
                      for t, _ in params)
    return ("d" if ret == "double" else "i") + ":" + letters


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--wine", required=True)
    ap.add_argument("--wineserver", required=True)
    ap.add_argument("--dir", required=True)
    ap.add_argument("--prefix", required=True)
    a = ap.parse_args()
    protos = {n: (r, p) for r, n, p in generate.parse_headers(HEADERS)}
    aircraft = {C.RJ: R.aircraft_rows(C.RJ_FILE), C.TWIN: R.aircraft_rows(C.TWIN_FILE)}
    missions = {ref: C.MISSIONS[k] for k, ref in C.MISSION.items()}
    script, expect, current, current_mission = [], {}, None, None
    for i, (name, args) in enumerate(C.CASES):
        fn = T.BY_NAME[name]
        # Traces (struct arrays) and the trip status text are the VBA wrappers'
        # business: their C calls are not made here (docs/spreadsheet.md).
        if fn.kind not in ("value", "out", "struct"):
            continue
        nr = len(fn.range_args)
        if fn.aircraft and args[0] not in aircraft:
            continue
        if fn.mission:
            rows = missions.get(args[1])
            if rows is None or not all(k in T.MISSION_KEYS and isinstance(v, float)
                                       for k, v in rows):
                continue   # bad mission ranges are the VBA wrapper's business
            try:
                R.mission(rows)
            except R.Invalid:
                continue   # so is a value the library rejects (the wrapper's #VALUE!)
        nums, texts = args[nr:nr + len(fn.args)], args[nr + len(fn.args):]
        if not all(isinstance(x, float) for x in nums):
            continue  # ranges and text are the VBA wrapper's business, not the DLL's
        if not all(isinstance(t, str) for t in texts):
            continue
        enum = {}
        for (tname, _), t in zip(fn.text_args, texts):
            key = t.strip().lower().replace(" ", "_").replace("-", "_")
            if key not in fn.enums.get(tname, {}):
                break
            enum[tname] = fn.enums[tname][key]
        if len(enum) != len(texts):
            continue
        if fn.aircraft and current != args[0]:
            current = args[0]
            script.append("aircraft")
            for k, v in aircraft[current]:
                script.append(f"{'text' if isinstance(v, str) else 'set'} {k} "
                              f"{v if isinstance(v, str) else repr(float(v))}")
        if fn.mission and current_mission != args[1]:
            current_mission = args[1]
            script.append("mission")
            for k, v in missions[args[1]]:
                script.append(f"mset {k} {T.MISSION_KEYS[k] or '-'} {float(v)!r}")
        # the C arguments in order (fn.layout), models left out: unit and value
        by_name = {a.name: (a.unit or "-", v) for a, v in zip(fn.args, nums)}
        by_name.update({k: ("-", float(v)) for k, v in enum.items()})
        cin = [by_name[t] if isinstance(t, str) else ("-", float(t))
               for t in fn.layout if t not in ("@ac", "@mission")]
        ins = " ".join(f"{u} {v!r}" for u, v in cin)
        outs = " ".join(o.unit or "-" for o in fn.outputs)
        script.append(f"call c{i} {fn.call} {signature(protos, fn.call)} {len(cin)} {ins} "
                      f"{len(fn.outputs)} {outs}")
        ref_args = ([aircraft[args[0]]] if fn.aircraft else []) + \
            ([missions[args[1]]] if fn.mission else []) + list(nums) + list(texts)
        expect[f"c{i}"] = (fn, R.expected(name, ref_args)[0])
    script.append("symbols " + " ".join(sorted(protos)))

    shutil.rmtree(a.prefix, ignore_errors=True)
    os.makedirs(a.prefix)
    env = dict(os.environ, WINEPREFIX=a.prefix, WINEDEBUG="-all", WINEARCH="win64",
               WINEDLLOVERRIDES="mscoree,mshtml=")
    env.pop("DISPLAY", None)
    try:
        r = subprocess.run([a.wine, os.path.join(a.dir, "dll_check.exe"),
                            os.path.join(a.dir, "acperf.dll")],
                           input="\n".join(script) + "\n", capture_output=True, text=True,
                           env=env, timeout=240, cwd=a.dir)
    finally:
        subprocess.run([a.wineserver, "-k"], env=env, capture_output=True)
        shutil.rmtree(a.prefix, ignore_errors=True)   # about 700 MB, made anew each run
    lines = [l for l in r.stdout.splitlines() if l.strip()]
    failed, passed, worst = [], 0, {"closed": 0.0, "search": 0.0}
    got = {}
    for l in lines:
        w = l.split()
        if w[0] in ("error", "missing"):
            failed.append(l)
        elif w[0] in expect:
            got[w[0]] = w
    if "done" not in lines:
        failed.append("the symbol check did not finish: " + r.stderr[-500:])
    for cid, (fn, want) in expect.items():
        if cid not in got:
            failed.append(f"{cid} {fn.name}: no result")
            continue
        vals = dict(zip([o.field for o in fn.outputs], got[cid][2:]))
        shown = [vals[o.field] for o in fn.shown]
        tol = RTOL_SEARCH if fn.partial or fn.search or fn.kind == "struct" and fn.aircraft and "speeds" in fn.call or "glide" in fn.call else RTOL_CLOSED
        kind = "search" if tol == RTOL_SEARCH else "closed"
        for g, x in zip(shown, want):
            gv = float(g)
            if isinstance(x, str):
                ok = math.isnan(gv)   # #VALUE!/#NUM!: no result from the DLL either
            else:
                err = abs(gv - x) / abs(x) if x else abs(gv)
                worst[kind] = max(worst[kind], err)
                ok = err <= tol
            if ok:
                passed += 1
            else:
                failed.append(f"{cid} {fn.name}: got {g}, want {x}")
    for f in failed:
        print("FAIL", f)
    called = sorted({fn.name for fn, _ in expect.values()})
    print(f"{len(called)} of {len(T.FUNCTIONS)} spreadsheet functions called: {' '.join(called)}")
    print(f"{len(expect)} calls through LoadLibrary/GetProcAddress under wine, {len(protos)} "
          f"symbols looked up; largest relative difference: closed forms {worst['closed']:.2e}, "
          f"numerical searches {worst['search']:.2e}")
    print(f"{passed} passed, {len(failed)} failed")
    return 1 if failed or not expect else 0


if __name__ == "__main__":
    sys.exit(main())
