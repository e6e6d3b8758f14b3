#!/usr/bin/python3
"""acperf.dll's export table holds every public function of the headers and
nothing else; it imports only Windows system DLLs; every Declare of the
generated VBA module names an exported function (objdump of mingw-w64)."""

import argparse
import os
import re
import subprocess
import sys

sys.path.insert(0, os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", "..",
                                "bindings", "spreadsheet"))
import generate  # noqa: E402

SYSTEM_DLLS = {"kernel32.dll", "msvcrt.dll", "user32.dll", "advapi32.dll"}


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--objdump", required=True)
    ap.add_argument("--dll", required=True)
    ap.add_argument("--bas", required=True)
    ap.add_argument("--headers", nargs="+", required=True)
    a = ap.parse_args()
    dump = subprocess.run([a.objdump, "-p", a.dll], capture_output=True, text=True, check=True).stdout
    table = dump.split("[Ordinal/Name Pointer] Table", 1)[1]
    exported = set(re.findall(r"^\s+\[\s*\d+\]\s+(\w+)\s*$", table, re.M))
    imports = {m.lower() for m in re.findall(r"DLL Name: (\S+)", dump)}
    public = {name for _, name, _ in generate.parse_headers(a.headers)}
    with open(a.bas) as f:
        declared = set(re.findall(r'Alias "(acp_\w+)"', f.read()))
    failed = 0
    checks = [("public functions missing from the export table", public - exported),
              ("exported symbols that are not public functions", exported - public),
              ("imported DLLs that are not Windows system DLLs",
               {i for i in imports if i not in SYSTEM_DLLS and not i.startswith("api-ms-win-crt-")}),
              ("VBA Declares of functions the DLL does not export", declared - exported),
              ("public functions without a VBA Declare", public - declared)]
    for what, items in checks:
        ok = not items
        failed += not ok
        print(("ok   " if ok else "FAIL ") + what + (": " + ", ".join(sorted(items)) if items else ""))
    print(f"{len(public)} public functions, {len(exported)} exported, {len(declared)} declared in "
          f"the VBA module; imports: {', '.join(sorted(imports))}")
    print(f"{len(checks) - failed} passed, {failed} failed")
    return 1 if failed or not public else 0


if __name__ == "__main__":
    sys.exit(main())
