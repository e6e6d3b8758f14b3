"""The C aircraft parser against Python's tomllib on thousands of small random texts.

The format is a strict subset of TOML 1.0 and aircraft.h promises that a text the
library accepts reads the same with tomllib. A grammar with a fixed seed makes
aircraft texts from the subset (every spelling of numbers, strings, blanks,
comments, table headers and line ends it allows, with keys and values inside the
model's ranges), each with at most one construct from one of two lists:

- invalid TOML (leading zeros, `5.`, a lone CR, a BOM, bad UTF-8, a key twice, ...):
  tomllib refuses it, and the C parser must refuse it too;
- valid TOML outside the subset (underscores, inf, arrays, dotted keys, escapes, an
  unknown key or table, a value out of range, ...): the C parser must refuse it.

A text without either must be accepted by both with the same keys and the same
values, bit for bit (the sign of zero too). Then the same texts with one to three
random edits from the format's own bytes, where only the promise is checked: what C
accepts, tomllib accepts with the same values. Every C message must be valid UTF-8.
16,000 texts, about a second. Run by ctest as
`python3 ref_parser_tomllib.py path/to/libacperf.so`.
"""
import ctypes
import random
import tomllib

from reflib import Checker, aircraft_api, flatten, load, model_differences

lib = aircraft_api(load())
check = Checker("aircraft parser: tomllib vs the C parser on random texts")
rng = random.Random(20)  # fixed: every run sees the same texts
GRAMMAR_TEXTS, EDITED_TEXTS = 8000, 8000

# ---- the subset ---------------------------------------------------------------


def number(lo, hi):
    """A TOML number literal inside [lo, hi], in one of the subset's spellings."""
    while True:
        x = rng.uniform(lo, hi)
        form = rng.randrange(6)
        if form == 0:
            lit = f"{x:.{rng.randrange(1, 6)}f}"
        elif form == 1:
            lit = f"{x:.{rng.randrange(0, 5)}e}".replace("e+0", "e").replace("e-0", "e-")
        elif form == 2:
            lit = f"{x:.{rng.randrange(1, 4)}E}"
        elif form == 3:
            lit = f"{x * 10:.2f}e-1"
        elif form == 4:
            lit = repr(x)
        else:
            lit = str(round(x))
        if not lit.startswith("-") and rng.random() < 0.1:
            lit = "+" + lit
        if lo <= float(lit) <= hi and "inf" not in lit:
            return lit


ZEROS = ["0", "-0", "+0", "0.0", "-0.0", "+0.0", "-0e0", "0E0", "-0.0e3", "-0.5", "1.5"]
OPTIONAL = [("oswald", 0.3, 1.0), ("cl_max", 0.3, 5.0), ("sweep_leading_edge", 0.0, 1.2),
            ("vmo", 20.0, 400.0), ("mmo", 0.1, 0.95), ("max_altitude", 0.0, 25000.0)]
STRINGS = ["Demo", "Test aircraft (invented)", "caf\u00e9 \u2014 \U0001f6e9", "a # not a comment",
           "it's", "", "x" * 63, "\ufeff inside"]


def text_value(s):
    """A basic or literal string holding s, as the subset allows."""
    if "'" in s or ("\"" not in s and rng.random() < 0.5):
        return f'"{s}"'
    return f"'{s}'"


BLANKS = ["", " ", "  ", "\t", " \t"]
COMMENTS = ["", "", " # note", "#", "\t# caf\u00e9", " #  = [x] 'y'"]


def ws():
    return rng.choice(BLANKS)


def statement(key, value):
    return f"{ws()}{key}{ws()}={ws()}{value}{ws()}{rng.choice(COMMENTS)}"


def header(name):
    return f"{ws()}[{ws()}component{ws()}.{ws()}{name}{ws()}]{ws()}{rng.choice(COMMENTS)}"


def aircraft():
    """The statements of an aircraft in the subset: (lines, root keys, component lines)."""
    area = float(number(10.0, 100.0))
    span = f"{(rng.uniform(4.0, 15.0) * area) ** 0.5:.{rng.randrange(1, 4)}f}"
    root = [("wing_area", repr(area) if rng.random() < 0.5 else f"{area:g}"), ("span", span)]
    for key, lo, hi in rng.sample(OPTIONAL, rng.randrange(0, 4)):
        root.append((key, number(lo, hi)))
    if rng.random() < 0.5:
        root.append(("cl_min_drag", rng.choice(ZEROS)))
    if rng.random() < 0.5:
        root.append(("name", text_value(rng.choice(STRINGS))))
    tables = []
    if rng.random() < 0.4:
        for c in range(rng.randrange(1, 3)):
            kind = rng.choice(["surface", "body", "other"])
            rows = [("type", text_value(kind)), ("wetted_area", number(1.0, 200.0)),
                    ("length", number(0.5, 30.0))]
            if kind == "surface":
                rows.append(("thickness_ratio", number(0.05, 0.2)))
            if kind == "body":
                rows.append(("fineness_ratio", number(2.0, 12.0)))
            rng.shuffle(rows)
            tables.append((rng.choice(["wing", "body", "w-2", "c_3", "7"]) + str(c), rows))
    else:
        root.append(("cd0", number(0.01, 0.05)))
    rng.shuffle(root)
    return root, tables


def lines_of(root, tables):
    lines = [statement(k, v) for k, v in root]
    for name, rows in tables:
        lines.append(header(name))
        lines += [statement(k, v) for k, v in rows]
    out = []
    for line in lines:
        while rng.random() < 0.15:
            out.append(rng.choice(["", "# comment", "   # x = 1", "\t", "#\u00e9\u00e8"]))
        out.append(line)
    return out


def join(lines):
    ends = rng.choice(["\n", "\r\n", "mixed"])
    text = ""
    for line in lines:
        text += line + (rng.choice(["\n", "\r\n"]) if ends == "mixed" else ends)
    if rng.random() < 0.3:
        text = text.rstrip("\r\n")  # no line end after the last line
    return text.encode()


# ---- one construct from outside: invalid TOML, or valid TOML outside the subset -------

INVALID_VALUES = ["030", "3.", ".3", "3e", "3.e1", "1__0", "_1", "1_", "--1", "+-1", "3.0.0",
                  "1e1.5", "0x", "1 2", "3,5", "= 3", "'abc", '"abc', "'a'b'", '"a"x', "1e",
                  "+", "-", "0_1", "1e_1", "00", "-01", "0.0.", "1.e"]
INVALID_LINES = ["wing area = 30", "= 30", "span", "span =", "span = = 3", "w\u00edng_area = 30",
                 "[component.w", "[component.w]x", "[component..w]", "[]", "[component.]",
                 "[ component.w ] ]", "span$ = 1", "\u00e9 = 1", "name = \"a\x01b\"",
                 "# a\x7f", "# a\x01", "span = 1 # \x1f", "[component.w\u00edng]"]
INVALID_BYTES = [b"\xff", b"\xc3", b"\xc0\xaf", b"\xed\xa0\x80", b"\xf4\x90\x80\x80", b"\xe2\x82"]
OUTSIDE_VALUES = ["1_000", "inf", "nan", "+inf", "-nan", "0x1F", "0o17", "0b1", "1979-05-27",
                  "07:32:00", "true", "false", "[1, 2]", "[]", "{a = 1}", '"a\\tb"', '"""abc"""',
                  "'''abc'''", "1e9", "-3", "1e300",
                  "'tab\there'", "'" + "x" * 64 + "'"]
OUTSIDE_LINES = ["name = 'tab\there'", "a.b = 1", '"span" = 1', "'cd0' = 0.02", "foo = 1", "[other]",
                 '[component."w"]', "[[component.w]]", "[component.a.b]", "[component]",
                 "colour = 'red'"]


def special(root, tables):
    """Put one construct from outside the subset into the aircraft; returns (lines or
    text, kind) with kind 'invalid' (tomllib refuses) or 'outside' (valid TOML the C
    parser refuses)."""
    pick = rng.randrange(10)
    if pick == 0:  # a root value
        i = rng.randrange(len(root))
        bad = rng.choice(INVALID_VALUES + OUTSIDE_VALUES)
        root[i] = (root[i][0], bad)
        return lines_of(root, tables), "invalid" if bad in INVALID_VALUES else "outside"
    if pick == 1:  # a key twice, a table twice
        if tables and rng.random() < 0.5:
            tables.append((tables[0][0], tables[0][1]))
        else:
            root.append(rng.choice(root))
        return lines_of(root, tables), "invalid"
    if pick == 2:  # a root key inside a table: TOML puts it in the table
        if tables:
            tables[-1][1].append(("oswald", "0.8"))
            return lines_of(root, tables), "outside"
        return lines_of(root, tables), "subset"
    lines = lines_of(root, tables)
    at = rng.randrange(len(lines) + 1)
    if pick in (3, 4):
        line = rng.choice(INVALID_LINES)
        lines.insert(at, line)
        return lines, "invalid"
    if pick == 5:
        lines.insert(at, rng.choice(OUTSIDE_LINES))
        return lines, "outside"
    text = join(lines)
    if pick == 6:  # a CR without a LF: inside a line, at the very end, alone on a line
        where = rng.choice(["end", "inside", "alone"])
        if where == "end":
            return text.rstrip(b"\r\n") + b"\r", "invalid"
        if where == "alone":
            return text + b"\r" + b"span2 = 1\n", "invalid"
        k = text.find(b"=")
        return text[:k] + b"\r" + text[k:], "invalid"
    if pick == 7:  # a byte order mark
        return b"\xef\xbb\xbf" + text, "invalid"
    if pick == 8:  # bad UTF-8 in a comment
        return text + b"\n# " + rng.choice(INVALID_BYTES) + b"\n", "invalid"
    return text, "subset"


# ---- the two parsers ------------------------------------------------------------


def c_parse(text):
    """(accepted, model differences from tomllib's reading or None, message)."""
    ac = lib.acp_aircraft_new()
    err = ctypes.create_string_buffer(256)
    st = lib.acp_aircraft_parse(ac, text, err, len(err))
    diffs = None
    if st == 0:
        doc = toml(text)
        diffs = model_differences(lib, ac, flatten(doc)) if doc is not None else None
    lib.acp_aircraft_free(ac)
    return st == 0, diffs, err.value


def toml(text):
    """tomllib's reading of the bytes as tomllib.load() reads a file, None if refused."""
    try:
        return tomllib.loads(text.decode())
    except (UnicodeDecodeError, tomllib.TOMLDecodeError):
        return None


def judge(text, kind):
    ok, diffs, message = c_parse(text)
    doc = toml(text)
    check.count += 1
    label = f"{kind} text {text!r}"
    try:
        message.decode()
    except UnicodeDecodeError:
        check.failures.append(f"{label}: C message not UTF-8: {message!r}")
    if ok and doc is None:
        check.failures.append(f"{label}: C accepts, tomllib refuses")
    elif ok and diffs:
        check.failures.append(f"{label}: read differently: {diffs}")
    elif kind == "outside" and ok:
        check.failures.append(f"{label}: C accepts a construct outside the subset")
    elif kind == "subset" and not ok:
        check.failures.append(f"{label}: C refuses a text of the subset: {message.decode()}")
    elif kind == "subset" and doc is None:
        check.failures.append(f"{label}: tomllib refuses a text of the subset")
    elif kind == "invalid" and doc is not None:
        check.failures.append(f"{label}: tomllib accepts a text the grammar calls invalid")
    return ok


EDIT_BYTES = [b"=", b"#", b'"', b"'", b"[", b"]", b".", b"\n", b"\r", b" ", b"\t", b"0", b"e",
              b"-", b"+", b"_", b"\xc3", b"\xa9", b"x", b"1", b"\r\n"]


def edited(text):
    b = bytearray(text)
    for _ in range(rng.randrange(1, 4)):
        k = rng.randrange(len(b) + 1)
        op = rng.randrange(3)
        if op == 0:
            b[k:k] = rng.choice(EDIT_BYTES)
        elif op == 1 and k < len(b):
            del b[k]
        elif k < len(b):
            b[k:k + 1] = rng.choice(EDIT_BYTES)
    return bytes(b)


kinds = {"subset": 0, "invalid": 0, "outside": 0}
accepted = 0
subset_texts = []
for _ in range(GRAMMAR_TEXTS):
    root, tables = aircraft()
    made, kind = special(root, tables) if rng.random() < 0.6 else (lines_of(root, tables), "subset")
    text = made if isinstance(made, bytes) else join(made)
    kinds[kind] += 1
    accepted += judge(text, kind)
    if kind == "subset":
        subset_texts.append(text)
edits_accepted = 0
for _ in range(EDITED_TEXTS):
    edits_accepted += judge(edited(rng.choice(subset_texts)), "edited")

# the run must have reached each class
for kind, count in kinds.items():
    check.count += 1
    if count < GRAMMAR_TEXTS // 10:
        check.failures.append(f"only {count} {kind} texts")
check.count += 1
if not 0 < edits_accepted < EDITED_TEXTS:
    check.failures.append(f"{edits_accepted} of {EDITED_TEXTS} edited texts accepted: no mix")
print(f"grammar texts {kinds}, {accepted} accepted by C; edited texts: {edits_accepted} of "
      f"{EDITED_TEXTS} accepted by C")
check.finish()
