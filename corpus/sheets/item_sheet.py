"""The review books' shared layout and writer (review19 on): an 'Item | Symbol | Value | Unit'
sheet whose formulas name other rows by key, and the function that writes a folder's books,
their sidecars and, where a folder has none yet, their .expect files.

The .expect files, once in the corpus, are kept by hand as plumb's findings change (each known
limit with its reason), so the writer leaves an existing one alone unless asked to rewrite it:
`python3 make_books.py --expect`.
"""
import importlib.util
import os
import re
import sys

from xlsx_writer import write_xlsx


class ItemSheet:
    """An 'Item | Symbol | Value | Unit' sheet. Formulas name other rows as {key} and rows of
    other item sheets as {Sheet.key}; planted rows carry (rule, what). A folder's make_books.py
    sets `caution`, the text every sheet carries in A3."""

    caution = ("Invented scenario, data for demonstration only. A dimensionally consistent formula "
               "can still be wrong; this check does not replace independent review under local "
               "codes and licensed practice.")

    def __init__(self, name, title, sources, first_row=6):
        self.name = name
        self.cells = {"A1": title, "A2": sources, "A3": self.caution,
                      f"A{first_row - 1}": "Item", f"B{first_row - 1}": "Symbol",
                      f"C{first_row - 1}": "Value", f"D{first_row - 1}": "Unit"}
        self.row = first_row
        self.keys = {}
        self.pending = []
        self.planted = {}

    def heading(self, text):
        r = self.row
        self.row += 1
        self.cells[f"A{r}"] = text

    def add(self, key, label, symbol, value, unit=None, planted=None):
        r = self.row
        self.row += 1
        self.keys[key] = r
        self.cells[f"A{r}"] = label
        self.cells[f"B{r}"] = symbol
        self.pending.append((r, value))
        if unit is not None:
            self.cells[f"D{r}"] = unit
        if planted:
            self.planted[f"{self.name}!C{r}"] = planted
        return r

    def ref(self, key):
        """An absolute reference from another sheet."""
        return f"{self.name}!$C${self.keys[key]}"

    def cell(self, key):
        return f"C{self.keys[key]}"

    def finish(self, others=()):
        others = {o.name: o for o in others}

        def sub(m):
            k = m.group(1)
            if "." in k:
                sheet, key = k.split(".")
                return others[sheet].ref(key)
            return f"C{self.keys[k]}"

        for r, value in self.pending:
            if isinstance(value, str) and value.startswith("="):
                value = re.sub(r"\{([A-Za-z0-9_.]+)\}", sub, value)
            self.cells[f"C{r}"] = value
        return self.cells


def formula_cells(book):
    return [f"{name}!{cell}" for name, cells in book["sheets"] for cell, raw in cells.items()
            if isinstance(raw, str) and raw.startswith("=")]


def book_formula(book, ref):
    sheet, cell = ref.split("!")
    return dict(book["sheets"])[sheet][cell]


def write_expect(path, stem, book, folder, notes):
    """The planted mistakes and every other finding, as the reviewer recorded them; a book's
    HEADNOTE lines (notes["HEADNOTE"][stem]), where it has any, go below the caution."""
    missed = notes.get("MISSED", {}).get(stem, {})
    renamed = notes.get("RENAMED", {}).get(stem, {})
    messages = notes.get("MESSAGES", {}).get(stem, {})
    with open(path, "w", encoding="utf-8") as f:
        f.write("# sheet!cell rule: the planted mistakes plumb must report; every other\n"
                f"# formula cell must stay clean (written by make_books.py, {folder}).\n"
                "# Invented scenario. A dimensionally consistent formula can still be wrong;\n"
                "# this check does not replace independent review under local codes and\n"
                "# licensed practice.\n")
        for line in notes.get("HEADNOTE", {}).get(stem, []):
            f.write(f"# {line}\n")
        for cell, (rule, what) in book["planted"].items():
            f.write(f"# planted: {what}\n")
            if cell in missed:
                f.write(f"# a slip plumb still misses: {cell} {book_formula(book, cell)} "
                        f"{missed[cell]}\n")
            elif cell in renamed:
                got = renamed[cell]
                got, why = got if isinstance(got, tuple) else (got, None)
                f.write(f"# planted as {rule}; plumb names it {got}" +
                        (f": {why}" if why else "") + "\n")
                if cell in notes.get("RENOTE", {}):
                    f.write(f"# planted: {notes['RENOTE'][cell]}\n")
                f.write(f"{cell} {got}\n")
            else:
                f.write(f"{cell} {rule}\n")
            if cell in messages:
                f.write(f"# plumb's message on it: {messages[cell]}\n")
        extra = notes.get("EXTRA", {}).get(stem, [])
        if extra:
            f.write("\n# found beyond the planted mistakes (kept so that any change shows):\n")
            for comment, line in extra:
                f.write(f"# {comment}\n{line}\n")


def write_books(here, books, notes):
    """Each book's .xlsx and sidecar; its .expect where there is none, or with --expect."""
    rewrite = "--expect" in sys.argv
    folder = os.path.basename(here)
    for stem, book in books.items():
        write_xlsx(os.path.join(here, stem + ".xlsx"), book["sheets"], book.get("names"))
        if book.get("sidecar"):
            with open(os.path.join(here, stem + ".cells.plumb"), "w", encoding="utf-8") as f:
                f.write(book["sidecar"])
        formulas = formula_cells(book)
        for cell in book["planted"]:
            assert cell in formulas, f"{stem}: {cell} is not a formula cell"
        expect = os.path.join(here, stem + ".expect")
        if rewrite or not os.path.exists(expect):
            write_expect(expect, stem, book, folder, notes)
        correct = [c for c in formulas if c not in book["planted"]]
        print(f"{stem}: {len(book['planted'])} planted, {len(correct)} correct formula cells")


NOTE_KEYS = ("EXTRA", "MISSED", "RENAMED", "MESSAGES", "HEADNOTE")


def notes_beside(here):
    """The review_notes.py beside a folder's make_books.py, as write_books takes them; each
    table empty where the file or the table is absent."""
    path = os.path.join(here, "review_notes.py")
    if not os.path.exists(path):
        return {key: {} for key in NOTE_KEYS}
    spec = importlib.util.spec_from_file_location("review_notes", path)
    module = importlib.util.module_from_spec(spec)
    spec.loader.exec_module(module)
    return {key: getattr(module, key, {}) for key in NOTE_KEYS}


def write_books_with_notes(here, books):
    """write_books with the folder's own review_notes.py."""
    write_books(here, books, notes_beside(here))
