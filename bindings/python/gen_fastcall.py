#!/usr/bin/python3
"""Generate the call table of acperf._fast (fastcall.c) from the public headers.

    gen_fastcall.py <acperf.i> <include dir> <output .h>

Reads the SWIG interface for the headers it wraps, in order, and for where
NaN-checking of double returns starts (`%apply double ACPY_CHECKED`), so the
fast path refuses exactly what the SWIG path refuses. From each header it
takes the functions whose inputs are models first, then numbers:

  inputs   const acp_aircraft * (type code 'A'), const acp_mission * ('M'),
           then double ('d') or an enum-valued int rating/mode/end ('e', taken
           as arrays.i takes it: a whole real number, else -1)
  double f(inputs)                            kind PLAIN (before the %apply)
                                              or NAN (NaN raises), one output
  int f(inputs, double *a, double *b)         kind STATUS, outputs a, b, ...
  int f(inputs, <struct of doubles> *o)       kind STATUS, outputs the fields

and writes one trampoline per function, `int f(const acpf_value *in, double *out)`,
plus the table acpf_table[] (C name, input types, outputs and their names).
Anything else (strings, sizes, arrays, other structs) stays with SWIG alone, and so
do the functions of SWIG_ONLY.
Nothing here computes: each trampoline is one call of the C function.
"""

import re
import sys
from pathlib import Path

PROTO = re.compile(r"ACP_API\s+([\w\s\*]+?)\s*\b(acp_\w+)\s*\(([^)]*)\)\s*;", re.S)
STRUCT = re.compile(r"typedef\s+struct\s*\{(.*?)\}\s*(acp_\w+)\s*;", re.S)


def strip_comments(text):
    return re.sub(r"/\*.*?\*/|//[^\n]*", " ", text, flags=re.S)


def params_of(text):
    out = []
    for p in text.split(","):
        p = " ".join(p.split())
        if not p or p == "void":
            continue
        m = re.match(r"(.*?)\s*(\w+)$", p)
        out.append((m.group(1).replace(" *", "*").strip(), m.group(2)))
    return out


def double_structs(texts):
    """{name: [fields]} of the typedef structs made only of doubles."""
    structs = {}
    for text in texts:
        for body, name in STRUCT.findall(text):
            fields, plain = [], True
            for decl in body.split(";"):
                decl = decl.strip()
                if not decl:
                    continue
                if not decl.startswith("double ") or "[" in decl or "*" in decl:
                    plain = False
                    break
                fields += [f.strip() for f in decl[len("double"):].split(",")]
            if plain and fields:
                structs[name] = fields
    return structs


# Functions that fit the rules but stay with SWIG: the trips, whose Python form reads
# the reason of an infeasible trip from the output struct the SWIG error carries and
# raises acperf.InfeasibleTrip (_cruise.py); a trip takes milliseconds, so the call
# overhead does not matter.
SWIG_ONLY = {"acp_trip", "acp_trip_for_zero_fuel_mass"}

MODELS = {"const acp_aircraft*": "A", "const acp_mission*": "M"}
ENUMS = ("rating", "mode", "end")  # arrays.i's enum-valued int parameters
ARGUMENT = {"A": "(const acp_aircraft *)in[{0}].model", "M": "(const acp_mission *)in[{0}].model",
            "d": "in[{0}].number", "e": "in[{0}].enumeration"}


def input_codes(plist):
    """Type codes of the leading inputs of a prototype: models first, then numbers."""
    codes = ""
    for ctype, pname in plist:
        if ctype in MODELS and not set(codes) & set("de"):  # models come first
            codes += MODELS[ctype]
        elif ctype == "double":
            codes += "d"
        elif ctype == "int" and pname in ENUMS:
            codes += "e"
        else:
            break
    return codes


def main(interface, incdir, output):
    swig = strip_comments(Path(interface).read_text())
    # headers in SWIG order, each marked checked when after the %apply of ACPY_CHECKED
    checked_from = swig.find("%apply double ACPY_CHECKED")
    headers = []
    for m in re.finditer(r'%include\s+"(acperf/\w+\.h)"', swig):
        path = Path(incdir) / m.group(1)
        if not path.exists():  # version.h is configured from version.h.in
            path = path.with_name(path.name + ".in")
        headers.append((path, checked_from >= 0 and m.start() > checked_from))
    texts = [(strip_comments(h.read_text()), checked) for h, checked in headers]
    structs = double_structs(t for t, _ in texts)

    entries, code = [], []
    for text, checked in texts:
        for ret, name, params in PROTO.findall(text):
            ret = " ".join(ret.split())
            plist = params_of(params)
            codes = input_codes(plist)
            rest = plist[len(codes):]
            if not codes or "d" not in codes or name in SWIG_ONLY:
                continue
            call_in = ", ".join(ARGUMENT[c].format(i) for i, c in enumerate(codes))
            if ret == "double" and not rest:
                kind, outputs = ("ACPF_NAN" if checked else "ACPF_PLAIN"), [name]
                body = f"  out[0] = {name}({call_in});\n  return 0;"
            elif ret == "int" and rest and all(t == "double*" for t, _ in rest):
                kind, outputs = "ACPF_STATUS", [p for _, p in rest]
                ptrs = ", ".join(f"&out[{i}]" for i in range(len(rest)))
                body = f"  return {name}({call_in}, {ptrs});"
            elif (ret == "int" and len(rest) == 1 and rest[0][0].endswith("*")
                  and rest[0][0][:-1] in structs):
                sname = rest[0][0][:-1]
                kind, outputs = "ACPF_STATUS", structs[sname]
                copy = "".join(f"  out[{i}] = s.{f};\n" for i, f in enumerate(outputs))
                body = (f"  {sname} s;\n  const int status = {name}({call_in}, &s);\n"
                        f"{copy}  return status;")
            else:
                continue
            code.append(f"static int acpf_{name}(const acpf_value *in, double *out) {{\n{body}\n}}\n")
            names = ", ".join(f'"{o}"' for o in outputs)
            code.append(f"static const char *const acpf_{name}_out[] = {{{names}}};\n")
            entries.append(f'  {{"{name}", "{codes}", {len(codes)}, {len(outputs)}, {kind}, '
                           f"acpf_{name}, acpf_{name}_out}},")
    if len(entries) < 10:
        sys.exit(f"gen_fastcall.py: only {len(entries)} functions found in {interface}")
    with open(output, "w") as f:
        f.write("/* Generated by bindings/python/gen_fastcall.py from the public headers and\n"
                "   acperf.i: do not edit, do not commit. */\n")
        f.write("".join(code))
        f.write("static const acpf_entry acpf_table[] = {\n" + "\n".join(entries)
                + "\n  {NULL, NULL, 0, 0, 0, NULL, NULL}\n};\n")


if __name__ == "__main__":
    if len(sys.argv) != 4:
        sys.exit(__doc__)
    main(*sys.argv[1:])
