"""Flat ODF spreadsheets (.fods): a small writer for the test workbook and a
reader that gives every cell's literal value or formula (for the comparison).

Formulas are written and read in ODF's stored form, which names each add-in
function by its implementation name and method:
  of:=ORG.ACPERF.CALC.FUNCTIONS.CASTOTAS([.B2];10000;0)
"""

import re
import xml.etree.ElementTree as ET
from xml.sax.saxutils import quoteattr, escape

NS = {"office": "urn:oasis:names:tc:opendocument:xmlns:office:1.0",
      "table": "urn:oasis:names:tc:opendocument:xmlns:table:1.0",
      "text": "urn:oasis:names:tc:opendocument:xmlns:text:1.0"}
PREFIX = "ORG.ACPERF.CALC.FUNCTIONS."


def col_name(c):
    s = ""
    c += 1
    while c:
        c, r = divmod(c - 1, 26)
        s = chr(65 + r) + s
    return s


def col_index(name):
    n = 0
    for ch in name:
        n = n * 26 + ord(ch) - 64
    return n - 1


class Formula:
    """A formula cell: text after 'of:=', and the size of its array (rows, cols)."""

    def __init__(self, text, rows=1, cols=1):
        self.text, self.rows, self.cols = text, rows, cols


def write(path, sheets):
    """sheets: [(name, {(row, col): value})], value a float, a str or a Formula."""
    out = ['<?xml version="1.0" encoding="UTF-8"?>',
           '<office:document xmlns:office="%s" xmlns:table="%s" xmlns:text="%s" '
           'xmlns:of="urn:oasis:names:tc:opendocument:xmlns:of:1.2" office:version="1.3" '
           'office:mimetype="application/vnd.oasis.opendocument.spreadsheet">'
           % (NS["office"], NS["table"], NS["text"]),
           '<office:body><office:spreadsheet>']
    for name, cells in sheets:
        out.append(f'<table:table table:name={quoteattr(name)}>')
        nrows = max((r for r, _ in cells), default=0) + 1
        for r in range(nrows):
            row = sorted((c, v) for (rr, c), v in cells.items() if rr == r)
            out.append("<table:table-row>")
            col = 0
            for c, v in row:
                if c > col:
                    out.append(f'<table:table-cell table:number-columns-repeated="{c - col}"/>')
                if isinstance(v, Formula):
                    span = (f' table:number-matrix-columns-spanned="{v.cols}"'
                            f' table:number-matrix-rows-spanned="{v.rows}"'
                            if (v.rows, v.cols) != (1, 1) else "")
                    out.append(f'<table:table-cell table:formula={quoteattr("of:=" + v.text)}{span}/>')
                elif isinstance(v, str):
                    out.append(f'<table:table-cell office:value-type="string"><text:p>{escape(v)}'
                               '</text:p></table:table-cell>')
                else:
                    out.append(f'<table:table-cell office:value-type="float" office:value="{float(v)!r}">'
                               '</table:table-cell>')
                col = c + 1
            out.append("</table:table-row>")
        out.append("</table:table>")
    out.append("</office:spreadsheet></office:body></office:document>")
    with open(path, "w", encoding="utf-8") as f:
        f.write("\n".join(out) + "\n")


def _t(tag):
    p, n = tag.split(":")
    return f"{{{NS[p]}}}{n}"


def read(path):
    """[(sheet name, {(row, col): value})]: literal float/str, or a Formula."""
    root = ET.parse(path).getroot()
    sheets = []
    for tab in root.iter(_t("table:table")):
        cells, r = {}, 0
        for row in tab.iter(_t("table:table-row")):
            rrep = int(row.get(_t("table:number-rows-repeated"), "1"))
            c = 0
            for cell in row:
                if cell.tag not in (_t("table:table-cell"), _t("table:covered-table-cell")):
                    continue
                crep = int(cell.get(_t("table:number-columns-repeated"), "1"))
                f = cell.get(_t("table:formula"))
                if f is not None:
                    cells[(r, c)] = Formula(f.split(":", 1)[1][1:] if f.startswith("of:=") else f,
                                            int(cell.get(_t("table:number-matrix-rows-spanned"), "1")),
                                            int(cell.get(_t("table:number-matrix-columns-spanned"), "1")))
                elif cell.get(_t("office:value-type")) in ("float", "percentage", "currency"):
                    for k in range(crep):
                        cells[(r, c + k)] = float(cell.get(_t("office:value")))
                elif cell.get(_t("office:value-type")) == "string":
                    txt = "\n".join("".join(p.itertext()) for p in cell.iter(_t("text:p")))
                    for k in range(crep):
                        cells[(r, c + k)] = txt
                c += crep
            r += rrep
        sheets.append((tab.get(_t("table:name")), cells))
    return sheets


_REF = re.compile(r"^\[\$?([^.\]]*)\.\$?([A-Z]+)\$?(\d+)(?::\$?([^.\]]*)\.\$?([A-Z]+)\$?(\d+))?\]$")


def split_args(s):
    """Split 'a;b;c' at top-level semicolons (not inside quotes, brackets, braces)."""
    out, depth, cur, q = [], 0, "", False
    for ch in s:
        if ch == '"':
            q = not q
        if not q and ch in "([{":
            depth += 1
        if not q and ch in ")]}":
            depth -= 1
        if ch == ";" and depth == 0 and not q:
            out.append(cur)
            cur = ""
        else:
            cur += ch
    if cur or out:
        out.append(cur)
    return out


def parse_call(text):
    """'ORG.ACPERF.CALC.FUNCTIONS.METHOD(args)' -> (method upper-case, [arg texts])."""
    m = re.match(r"^" + re.escape(PREFIX) + r"(\w+)\((.*)\)$", text, re.S)
    if not m:
        raise ValueError(f"not a single acperf call: {text}")
    return m.group(1), split_args(m.group(2))


def parse_ref(arg, sheet):
    """A cell or range reference -> (sheet, r0, c0, r1, c1), or None."""
    m = _REF.match(arg.strip())
    if not m:
        return None
    s0 = m.group(1) or sheet
    r0, c0 = int(m.group(3)) - 1, col_index(m.group(2))
    if m.group(5):
        return (s0, r0, c0, int(m.group(6)) - 1, col_index(m.group(5)))
    return (s0, r0, c0, r0, c0)
