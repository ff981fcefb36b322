#!/usr/bin/env python3
"""Writes each calc workbook of books.py as flat ODF XML (.fods), formulas in OpenFormula.

Formulas are written in A1 form in books.py and translated here; LibreOffice then opens the
.fods and saves the .xlsx and .ods that the corpus test reads (make-workbooks.sh).
"""
import re
import sys
from xml.sax.saxutils import escape, quoteattr

import books

REF = re.compile(r"(?:(?P<sheet>'[^']+'|[A-Za-z_][A-Za-z0-9_]*)!)?"
                 r"(?P<a>\$?[A-Z]{1,3}\$?[0-9]+)(?::(?P<b>\$?[A-Z]{1,3}\$?[0-9]+))?(?![A-Za-z0-9_(])")


def to_openformula(a1):
    out, i = [], 0
    parts = re.split(r'("[^"]*")', a1[1:])
    for k, part in enumerate(parts):
        if k % 2 == 1:
            out.append(part)
            continue
        def ref(m):
            sheet = m.group("sheet")
            prefix = "$" + sheet + "." if sheet else "."
            text = prefix + m.group("a")
            if m.group("b"):
                text += ":." + m.group("b")
            return "[" + text + "]"
        out.append(REF.sub(ref, part).replace(",", ";"))
    return "of:=" + "".join(out)


def column_index(letters):
    n = 0
    for c in letters:
        n = n * 26 + ord(c) - 64
    return n - 1


def cell_xml(value):
    if value is None:
        return "<table:table-cell/>"
    if isinstance(value, str) and value.startswith("="):
        return ('<table:table-cell table:formula=%s office:value-type="float" '
                'office:value="0"/>' % quoteattr(to_openformula(value)))
    if isinstance(value, (int, float)):
        return ('<table:table-cell office:value-type="float" office:value="%s">'
                '<text:p>%s</text:p></table:table-cell>' % (value, value))
    return ('<table:table-cell office:value-type="string"><text:p>%s</text:p>'
            '</table:table-cell>' % escape(value))


def sheet_xml(name, cells):
    grid = {}
    for ref, value in cells.items():
        m = re.fullmatch(r"([A-Z]+)([0-9]+)", ref)
        grid[(int(m.group(2)) - 1, column_index(m.group(1)))] = value
    rows = max(r for r, _ in grid) + 1
    cols = max(c for _, c in grid) + 1
    out = ['<table:table table:name=%s>' % quoteattr(name)]
    for r in range(rows):
        out.append("<table:table-row>")
        out.extend(cell_xml(grid.get((r, c))) for c in range(cols))
        out.append("</table:table-row>")
    out.append("</table:table>")
    return "\n".join(out)


def book_xml(book):
    names = ""
    if book.get("names"):
        names = "<table:named-expressions>" + "".join(
            '<table:named-range table:name=%s table:base-cell-address="$%s.$A$1" '
            'table:cell-range-address=%s/>' % (quoteattr(n), s, quoteattr("$" + s + "." + a))
            for n, (s, a) in book["names"].items()) + "</table:named-expressions>"
    sheets = "\n".join(sheet_xml(n, c) for n, c in book["sheets"])
    return ('<?xml version="1.0" encoding="UTF-8"?>\n'
            '<office:document xmlns:office="urn:oasis:names:tc:opendocument:xmlns:office:1.0" '
            'xmlns:table="urn:oasis:names:tc:opendocument:xmlns:table:1.0" '
            'xmlns:text="urn:oasis:names:tc:opendocument:xmlns:text:1.0" '
            'xmlns:of="urn:oasis:names:tc:opendocument:xmlns:of:1.2" '
            'office:version="1.3" office:mimetype="application/vnd.oasis.opendocument.spreadsheet">'
            '<office:body><office:spreadsheet>\n%s\n%s\n</office:spreadsheet></office:body>'
            '</office:document>\n' % (sheets, names))


def main(out_dir):
    for name, book in books.BOOKS.items():
        folder = book.get("folder", ".")
        with open("%s/%s.fods" % (out_dir, name), "w", encoding="utf-8") as f:
            f.write(book_xml(book))
        with open("%s/%s.folder" % (out_dir, name), "w", encoding="utf-8") as f:
            f.write(folder)
        with open("%s/%s.expect" % (out_dir, name), "w", encoding="utf-8") as f:
            f.write("# sheet!cell rule: the findings plumb must report, and no others\n")
            f.write("# (sheet!cell rule ~ words: that finding must also say these words)\n")
            for line in sorted(book["expect"]):
                f.write(line + "\n")
        if book.get("sidecar"):
            with open("%s/%s.cells.plumb" % (out_dir, name), "w", encoding="utf-8") as f:
                f.write(book["sidecar"])


if __name__ == "__main__":
    main(sys.argv[1] if len(sys.argv) > 1 else ".")
