"""A minimal .xlsx writer (standard zipfile) with a small formula evaluator for cached values,
shared by the review books' make_books.py scripts (review13 on; earlier folders keep their own
copies).

Defined names, AVERAGE, IF, MIN/MAX/SUM over ranges, string results, ROUND, ROUNDUP, ROUNDDOWN, CEILING, VLOOKUP
over a two-dimensional range with Excel's approximate match by default (the last row whose key
is not greater than the value), INDEX and MATCH (match types 1, 0 and -1) over one row or
column, TRUE/FALSE, LOG10, SIN, COS, TAN and their inverses ASIN, ACOS, ATAN (radians, with
RADIANS and DEGREES), AND, OR, PRODUCT and SUMPRODUCT.

The books are reproducible: every part of the zip carries one timestamp, by default the one the
book being replaced already has (so rewriting an unchanged book leaves its bytes as they were),
else 1980-01-01 00:00:00, so that a new book's bytes depend on its cells alone.
"""
import math
import re
import zipfile

REF_OR_RANGE = re.compile(
    r"(?:([A-Za-z_][A-Za-z0-9_]*)!)?\$?([A-Z]{1,3})\$?([0-9]+)(?![0-9(])"
    r"(?::\$?([A-Z]{1,3})\$?([0-9]+))?")


def col_number(letters):
    n = 0
    for ch in letters:
        n = n * 26 + ord(ch) - 64
    return n


def col_letters(n):
    s = ""
    while n:
        n, r = divmod(n - 1, 26)
        s = chr(65 + r) + s
    return s


class Rng(list):
    """The values of a range, column by column, with .rows for VLOOKUP."""
    rows = []


def flatten(args):
    out = []
    for a in args:
        if isinstance(a, list):
            out.extend(x for x in a if isinstance(x, (int, float)))
        else:
            out.append(a)
    return out


class Evaluator:
    def __init__(self, sheets, names):
        self.sheets = dict(sheets)
        self.names = names  # name -> (sheet, "$C$3" or "$F$3:$F$5")
        self.values = {}

    def value(self, sheet, cell):
        key = (sheet, cell)
        if key in self.values:
            return self.values[key]
        raw = self.sheets[sheet].get(cell)
        if isinstance(raw, str) and raw.startswith("="):
            result = self.evaluate(sheet, raw[1:])
        elif raw is None:
            result = 0.0
        else:
            result = raw
        self.values[key] = result
        return result

    def evaluate(self, sheet, formula):
        for name, (sh, ref) in sorted(self.names.items(), key=lambda kv: -len(kv[0])):
            formula = re.sub(rf"(?<![A-Za-z0-9_!\"]){re.escape(name)}(?![A-Za-z0-9_(])",
                             f"{sh}!{ref}", formula)

        def range_values(m):
            sh = m.group(1) or sheet
            c1, r1, c2, r2 = col_number(m.group(2)), int(m.group(3)), col_number(
                m.group(4)), int(m.group(5))
            return f"_r({sh!r},{c1},{r1},{c2},{r2})"

        def one_ref(m):
            return f"_v({(m.group(1) or sheet)!r},'{m.group(2)}{m.group(3)}')"

        expr = REF_OR_RANGE.sub(lambda m: range_values(m) if m.group(4) else one_ref(m), formula)
        expr = expr.replace("^", "**").replace("<>", "!=")
        def rng(sh, c1, r1, c2, r2):
            rows = [[self.value(sh, f"{col_letters(c)}{r}") for c in range(c1, c2 + 1)]
                    for r in range(r1, r2 + 1)]
            out = Rng(x for c in range(c2 - c1 + 1) for x in (row[c] for row in rows))
            out.rows = rows
            return out

        def vlookup(key, table, col, approx=True):
            if approx:
                hit = None
                for row in table.rows:
                    if row[0] <= key:
                        hit = row
                if hit is None:
                    raise ValueError(f"VLOOKUP: {key!r} below the table")
                return hit[col - 1]
            for row in table.rows:
                if row[0] == key:
                    return row[col - 1]
            raise ValueError(f"VLOOKUP: {key!r} not found")

        def match(key, array, kind=1):
            """The 1-based place of key in one row or column: kind 0 the first equal value (text
            without regard to case), 1 the last value not greater than key (ascending data),
            -1 the last value not less than key (descending data)."""
            if len(array.rows) > 1 and any(len(row) > 1 for row in array.rows):
                raise ValueError("MATCH: the range must be one row or one column")
            fold = (lambda v: v.lower()) if isinstance(key, str) else (lambda v: v)
            hit = None
            for i, v in enumerate(array, 1):
                if isinstance(v, str) != isinstance(key, str):
                    continue
                if kind == 0:
                    if fold(v) == fold(key):
                        return i
                elif (fold(v) <= fold(key)) if kind > 0 else (fold(v) >= fold(key)):
                    hit = i
            if hit is None:
                raise ValueError(f"MATCH: {key!r} not found")
            return hit

        def index(array, r, c=None):
            """INDEX(range, row, column); over one row or one column a single place will do."""
            rows = array.rows
            if c is None:
                if len(rows) == 1:
                    r, c = 1, r
                elif all(len(row) == 1 for row in rows):
                    c = 1
                else:
                    raise ValueError("INDEX: a two-dimensional range needs a column")
            r, c = int(r), int(c)
            if r < 1 or c < 1:
                raise ValueError("INDEX: row and column start at 1")
            return rows[r - 1][c - 1]

        def round_half_away(x, n=0):
            f = 10.0 ** n
            return math.floor(abs(x) * f + 0.5) / f * (1 if x >= 0 else -1)

        def round_up(x, n=0):
            f = 10.0 ** n
            return math.ceil(abs(x) * f - 1e-12) / f * (1 if x >= 0 else -1)

        def round_down(x, n=0):
            f = 10.0 ** n
            return math.floor(abs(x) * f + 1e-12) / f * (1 if x >= 0 else -1)

        def sqrt(x):
            """Excel evaluates only the branch IF takes; Python evaluates both, so a root of a
            negative number in the branch not taken gives NaN here instead of raising."""
            return math.sqrt(x) if x >= 0 else math.nan

        env = {
            "_v": self.value, "_r": rng, "VLOOKUP": vlookup, "ROUND": round_half_away,
            "ROUNDUP": round_up, "ROUNDDOWN": round_down, "CEILING": lambda x, m=1: math.ceil(x / m) * m, "TRUE": True, "FALSE": False, "PI": lambda: math.pi, "SQRT": sqrt, "LN": math.log,
            "EXP": math.exp, "ABS": abs, "RADIANS": math.radians, "COS": math.cos,
            "SIN": math.sin, "TAN": math.tan, "ASIN": math.asin, "ACOS": math.acos,
            "ATAN": math.atan, "DEGREES": math.degrees,
            "LOG10": math.log10, "AND": lambda *a: all(a), "OR": lambda *a: any(a),
            "PRODUCT": lambda *a: math.prod(flatten(a)),
            "SUMPRODUCT": lambda a, b: sum(x * y for x, y in zip(a, b)),
            "MIN": lambda *a: min(flatten(a)), "MAX": lambda *a: max(flatten(a)),
            "SUM": lambda *a: sum(flatten(a)),
            "AVERAGE": lambda *a: sum(flatten(a)) / len(flatten(a)),
            "IF": lambda c, a, b=0: a if c else b,
            "INDEX": index, "MATCH": match,
        }
        return eval(expr, {"__builtins__": {}}, env)


def esc(text):
    return (str(text).replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;")
            .replace('"', "&quot;"))


def split_cell(cell):
    m = re.fullmatch(r"([A-Z]+)([0-9]+)", cell)
    return m.group(1), int(m.group(2))


def sheet_xml(name, cells, evaluator):
    rows = {}
    for cell in cells:
        col, row = split_cell(cell)
        rows.setdefault(row, []).append((col_number(col), cell))
    out = ['<?xml version="1.0" encoding="UTF-8" standalone="yes"?>',
           '<worksheet xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main">',
           "<sheetData>"]
    for row in sorted(rows):
        out.append(f'<row r="{row}">')
        for _, cell in sorted(rows[row]):
            raw = cells[cell]
            if isinstance(raw, str) and raw.startswith("="):
                val = evaluator.value(name, cell)
                if isinstance(val, str):
                    out.append(f'<c r="{cell}" t="str"><f>{esc(raw[1:])}</f><v>{esc(val)}</v></c>')
                else:
                    out.append(f'<c r="{cell}"><f>{esc(raw[1:])}</f><v>{repr(float(val))}</v></c>')
            elif isinstance(raw, str):
                out.append(f'<c r="{cell}" t="inlineStr"><is><t>{esc(raw)}</t></is></c>')
            else:
                out.append(f'<c r="{cell}"><v>{raw}</v></c>')
        out.append("</row>")
    out.append("</sheetData></worksheet>")
    return "".join(out)


ZIP_EPOCH = (1980, 1, 1, 0, 0, 0)


def book_date_time(path):
    """The timestamp the parts of the book at path carry, if it is one of these books."""
    try:
        with zipfile.ZipFile(path) as z:
            stamps = {info.date_time for info in z.infolist()}
    except (OSError, zipfile.BadZipFile):
        return None
    return stamps.pop() if len(stamps) == 1 else None


def write_xlsx(path, sheets, names=None, date_time=None):
    """Write the book; date_time (a zip timestamp) defaults to the book's own, else ZIP_EPOCH."""
    names = names or {}
    date_time = date_time or book_date_time(path) or ZIP_EPOCH
    evaluator = Evaluator(sheets, names)
    n = len(sheets)
    content_types = (
        '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>'
        '<Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types">'
        '<Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/>'
        '<Default Extension="xml" ContentType="application/xml"/>'
        '<Override PartName="/xl/workbook.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml"/>'
        + "".join(f'<Override PartName="/xl/worksheets/sheet{i}.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.worksheet+xml"/>'
                  for i in range(1, n + 1))
        + "</Types>")
    root_rels = (
        '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>'
        '<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships">'
        '<Relationship Id="rId1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/officeDocument" Target="xl/workbook.xml"/>'
        "</Relationships>")
    defined = ""
    if names:
        defined = "<definedNames>" + "".join(
            f'<definedName name="{esc(nm)}">{esc(sh)}!{esc(ref)}</definedName>'
            for nm, (sh, ref) in sorted(names.items())) + "</definedNames>"
    workbook = (
        '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>'
        '<workbook xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" '
        'xmlns:r="http://schemas.openxmlformats.org/officeDocument/2006/relationships"><sheets>'
        + "".join(f'<sheet name="{esc(name)}" sheetId="{i}" r:id="rId{i}"/>'
                  for i, (name, _) in enumerate(sheets, 1))
        + "</sheets>" + defined + "</workbook>")
    workbook_rels = (
        '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>'
        '<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships">'
        + "".join(f'<Relationship Id="rId{i}" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/worksheet" Target="worksheets/sheet{i}.xml"/>'
                  for i in range(1, n + 1))
        + "</Relationships>")
    parts = [("[Content_Types].xml", content_types), ("_rels/.rels", root_rels),
             ("xl/workbook.xml", workbook), ("xl/_rels/workbook.xml.rels", workbook_rels)]
    parts += [(f"xl/worksheets/sheet{i}.xml", sheet_xml(name, cells, evaluator))
              for i, (name, cells) in enumerate(sheets, 1)]
    with zipfile.ZipFile(path, "w", zipfile.ZIP_DEFLATED) as z:
        for part, text in parts:
            info = zipfile.ZipInfo(part, date_time=date_time)
            info.compress_type = zipfile.ZIP_DEFLATED
            info.external_attr = 0o600 << 16     # as ZipFile.writestr sets for a name
            z.writestr(info, text)
