#!/usr/bin/python3
"""End-to-end test of the Calc add-in: the real LibreOffice, headless.

1. Writes the test workbook (every case of cases.py) as flat ODF.
2. Installs the built acperf.oxt into a throwaway profile (office.py).
3. Converts the demo workbook and the test workbook to CSV with
   `soffice --headless --convert-to csv` (every formula recalculated on load).
4. Compares every cell of every sheet of both with the expected value: literal
   cells with the workbook's own content, acperf formula cells with
   reference.py (the Python binding: the C library's result), numbers to
   1e-12 relative (the CSV carries 15 significant digits), error cells by
   their text (#VALUE!, #NUM!).
"""

import argparse
import csv
import glob
import math
import os
import re
import shutil
import sys

HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, HERE)
sys.path.insert(0, os.path.join(HERE, "..", "..", "bindings", "spreadsheet"))

import cases as C  # noqa: E402
import fods  # noqa: E402
import functions as T  # noqa: E402
import reference as R  # noqa: E402
from office import Office  # noqa: E402

RTOL = 1e-12
TRACE_ROWS = 40
BY_METHOD = {f.method.upper(): f for f in T.FUNCTIONS}


def arg_text(a):
    if isinstance(a, C.Ref):
        a0, a1 = (a.range.split(":") + [None])[:2]
        return f"[${a.sheet}.{a0}" + (f":.{a1}]" if a1 else "]")
    if isinstance(a, str):
        return '"' + a.replace('"', '""') + '"'
    return repr(float(a))


def aircraft_block(kind):
    rows = R.aircraft_rows(C.RJ_FILE if kind != "TWIN" else C.TWIN_FILE)
    if kind == "BLANK_VALUE":
        rows = [(k, None if k == "wing_area" else v) for k, v in rows]
    elif kind == "TEXT_VALUE":
        rows = [(k, "26" if k == "span" else v) for k, v in rows]
    elif kind == "UNKNOWN_KEY":
        rows = rows + [("wing_aera", 72.0)]
    elif kind == "INCOMPLETE":
        rows = [(k, v) for k, v in rows if k != "span"]
    elif kind == "OUT_OF_RANGE":
        rows = [(k, 1000.0 if k == "span" else v) for k, v in rows]
    elif kind == "LOW_MACH":
        rows = [(k, 0.3 if k == "cruise_mach" else v) for k, v in rows]
    return rows


def write_test_workbook(path):
    air = {}
    for kind, col in C.AIRCRAFT_COLUMNS.items():
        block = aircraft_block(kind)
        assert len(block) <= C.AIRCRAFT_ROWS, f"{kind}: {len(block)} rows, the range has " \
            f"{C.AIRCRAFT_ROWS}"
        for r, (k, v) in enumerate(block):
            air[(r, col)] = k
            if v is not None:
                air[(r, col + 1)] = v
    mis = {}
    for kind, col in C.MISSION_COLUMNS.items():
        for r, (k, v) in enumerate(C.MISSIONS[kind]):
            mis[(r, col)] = k
            if v is not None:
                mis[(r, col + 1)] = v
    cells, row = {}, 0
    book = [("Aircraft", air), ("Inputs", dict(C.INPUTS)), ("Mission", mis)]
    for name, args in C.CASES:
        fn = T.BY_NAME[name]
        n = next((len(resolve_ref(a, book)) for a in args
                  if isinstance(a, C.Ref) and a.sheet == "Inputs"
                  and isinstance(resolve_ref(a, book), list)), None)
        rows = n if n is not None else 1
        if fn.kind == "trace":
            rows = TRACE_ROWS      # more than a trace has: the rows past it show #N/A
        cols = len(fn.shown) if fn.shown and fn.kind != "status" else 1
        text = fods.PREFIX + fn.method.upper() + "(" + ";".join(arg_text(a) for a in args) + ")"
        cells[(row, 0)] = name
        cells[(row, 1)] = fods.Formula(text, rows, cols) if (rows, cols) != (1, 1) \
            else fods.Formula(text)
        row += rows
    fods.write(path, [("Cases", cells)] + book)


def resolve_ref(ref, book):
    """Values of a Ref in a book [(name, cells)] (None for a blank cell)."""
    sheets = dict(book)
    if isinstance(ref, C.Ref):
        a0, a1 = (ref.range.split(":") + [ref.range])[:2]
        p = fods.parse_ref(f"[${ref.sheet}.{a0}:.{a1}]", ref.sheet)
    else:
        p = ref
    s, r0, c0, r1, c1 = p
    grid = [[sheets[s].get((r, c)) for c in range(c0, c1 + 1)] for r in range(r0, r1 + 1)]
    if (r0, c0) == (r1, c1) and not isinstance(ref, C.Ref):
        return grid[0][0]
    if c1 - c0 == 1 and s in ("Aircraft", "Mission") or (c1 - c0 == 1 and isinstance(grid[0][0], str)):
        return [tuple(g) for g in grid]
    if r0 == r1 or c0 == c1:
        return [v for g in grid for v in g]
    return grid  # a block: the add-in rejects it


def evaluate_book(book):
    """Expected value of every cell {(sheet, row, col): value}."""
    sheets = dict(book)
    want, used = {}, set()

    def cell_value(s, r, c):
        v = sheets[s].get((r, c))
        if isinstance(v, fods.Formula):
            return formula(s, r, c, v)[0][0]
        if v is None:   # a cell inside an array formula's result: its element
            for (r0, c0), f in sheets[s].items():
                if isinstance(f, fods.Formula) and r0 <= r < r0 + f.rows and c0 <= c < c0 + f.cols:
                    rows = formula(s, r0, c0, f)
                    return rows[r - r0][c - c0] if r - r0 < len(rows) and \
                        c - c0 < len(rows[r - r0]) else None
        return v

    def formula(s, r, c, f):
        total = re.match(r"^SUM\((\[[^\]]+\])\)$", f.text)
        if total:   # Calc's own SUM of acperf results (the demo's sum of the trip segments)
            rs, r0, c0, r1, c1 = fods.parse_ref(total.group(1), s)
            vals = [cell_value(rs, rr, cc) for rr in range(r0, r1 + 1) for cc in range(c0, c1 + 1)]
            errors = [v for v in vals if isinstance(v, str)]
            return [[errors[0] if errors else math.fsum(v for v in vals if v is not None)]]
        method, texts = fods.parse_call(f.text)
        fn = BY_METHOD[method]
        used.add(fn.name)
        args = []
        for t in texts:
            t = t.strip()
            ref = fods.parse_ref(t, s)
            if ref:
                rs, r0, c0, r1, c1 = ref
                if (r0, c0, r1, c1) == (r0, c0, r0, c0) and ":" not in t:
                    args.append(cell_value(rs, r0, c0))
                    continue
                grid = [[cell_value(rs, rr, cc) for cc in range(c0, c1 + 1)]
                        for rr in range(r0, r1 + 1)]
                if len(args) < len(fn.range_args):
                    args.append([tuple(g) for g in grid])
                elif r0 == r1 or c0 == c1:
                    args.append([v for g in grid for v in g])
                else:
                    args.append(("block",))
            elif t.startswith('"'):
                args.append(t[1:-1].replace('""', '"'))
            else:
                args.append(float(t))
        if any(isinstance(a, tuple) for a in args):
            return [[R.VALUE]]
        return R.expected(fn.name, args)

    for s, cells in book:
        for (r, c), v in cells.items():
            if isinstance(v, fods.Formula):
                rows = formula(s, r, c, v)
                for i in range(v.rows):
                    for j in range(v.cols):
                        # Calc repeats a 1x1 result over the whole array; #N/A past a table.
                        x = rows[i][j] if i < len(rows) and j < len(rows[i]) else (
                            rows[0][0] if len(rows) == 1 and len(rows[0]) == 1 else "#N/A")
                        want[(s, r + i, c + j)] = x
            else:
                want.setdefault((s, r, c), v)
    return want, used


def compare(book_path, csv_dir, stem, stats):
    book = fods.read(book_path)
    want, used = evaluate_book(book)
    bad = []
    for s, _ in book:
        path = os.path.join(csv_dir, f"{stem}-{s}.csv")
        with open(path, newline="", encoding="utf-8") as f:
            got = {(s, r, c): v for r, row in enumerate(csv.reader(f)) for c, v in enumerate(row)}
        for key in sorted(set(got) | {k for k in want if k[0] == s}):
            g, w = got.get(key, ""), want.get(key)
            if w is None and g == "":
                continue
            stats["cells"] += 1
            ok = False
            if isinstance(w, float):
                try:
                    gv = float(g)
                    ok = gv == w or abs(gv - w) <= RTOL * abs(w)
                    stats["numbers"] += 1
                except ValueError:
                    ok = False
            elif w is R.NOT_OK:
                ok = g not in ("", "OK")
            else:
                ok = g == w
                if w in (R.VALUE, R.NUM):
                    stats["errors"] += 1
            if not ok:
                bad.append(f"{stem} {s}!{fods.col_name(key[2])}{key[1] + 1}: got {g!r}, want {w!r}")
    return bad, used


def demo_aircraft_differences(demo):
    """The demo workbook's aircraft range (Aircraft!A2:B100, docs/spreadsheet.md) holds the
    demo aircraft file, key for key: a key added to the file must reach the workbook."""
    air = dict(fods.read(demo))["Aircraft"]
    sheet = {air[(r, 0)]: air.get((r, 1)) for r in range(1, 100) if isinstance(air.get((r, 0)), str)}
    want = dict(R.aircraft_rows(C.RJ_FILE))
    return [f"demo Aircraft range: {k} is {sheet.get(k)!r}, {C.RJ_FILE} has {v!r}"
            for k, v in want.items() if sheet.get(k) != v] + \
        [f"demo Aircraft range: {k} is not in {C.RJ_FILE}" for k in sheet if k not in want]


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--oxt", required=True)
    ap.add_argument("--soffice", default="soffice")
    ap.add_argument("--work", required=True)
    ap.add_argument("--demo", required=True)
    a = ap.parse_args()
    shutil.rmtree(a.work, ignore_errors=True)
    os.makedirs(a.work)
    test_book = os.path.join(a.work, "acperf_cases.fods")
    write_test_workbook(test_book)
    demo = os.path.join(a.work, os.path.basename(a.demo))
    shutil.copyfile(a.demo, demo)

    office = Office(a.soffice, os.path.join(a.work, "profile"))
    office.fresh_profile()
    office.install(a.oxt, os.path.join(os.path.dirname(os.path.realpath(a.soffice)), "unopkg"))
    out = os.path.join(a.work, "csv")
    os.makedirs(out)
    office.convert_csv(test_book, out)
    office.convert_csv(demo, out)
    print("CSV files:", " ".join(sorted(os.path.basename(p) for p in glob.glob(out + "/*.csv"))))

    stats = {"cells": 0, "numbers": 0, "errors": 0}
    bad, used = compare(test_book, out, "acperf_cases", stats)
    print(f"test workbook: {stats['cells']} cells compared ({stats['numbers']} numbers, "
          f"{stats['errors']} error cells); {len(used)} of {len(T.FUNCTIONS)} functions used")
    missing = sorted(set(T.BY_NAME) - used)
    if missing:
        bad.append("functions without a case in the test workbook: " + ", ".join(missing))
    stats2 = {"cells": 0, "numbers": 0, "errors": 0}
    bad2, used2 = compare(demo, out, os.path.splitext(os.path.basename(demo))[0], stats2)
    print(f"demo workbook: {stats2['cells']} cells compared ({stats2['numbers']} numbers, "
          f"{stats2['errors']} error cells); {len(used2)} functions used")
    if not used2:
        bad2.append("the demo workbook uses no acperf function")
    bad2 += demo_aircraft_differences(a.demo)
    for b in bad + bad2:
        print("MISMATCH", b)
    print(f"{stats['cells'] + stats2['cells'] - len(bad) - len(bad2)} passed, "
          f"{len(bad) + len(bad2)} failed")
    return 1 if bad or bad2 else 0


if __name__ == "__main__":
    sys.exit(main())
