"""review63: what plumb (the round's build of the time) reports on these books beyond the
planted mistakes, the planted cells it misses or names by another rule, and its messages that
mislead, each with the reviewer's reason, recorded after reading every finding. Read by
make_books.py when it writes the .expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.

As run by the reviewer (count.py, runs/count.txt): planted flagged 36/37 (crude 10/10, brine
9/9, pivot 8/9, hot liquor 9/9); correct formula cells clean 144/145 (crude 34/35, brine 40/40,
pivot 36/36, hot liquor 34/34). No crash or hang; exit status 1 on every book (errors found),
in text and JSON alike, and the two formats name the same cells and rules.

First run (runs/count-first-run.txt): correct cells clean 141/145. Strap!C6:C8 were written
'=(B7-B6)/12' under 'Increment [bbl/in]', the trade's shorthand; plumb named them result-unit
(a volume where bbl/in belongs). That was the reviewer's fault, not plumb's: the 12 stands for
the 12 in of the 1 ft step between rows, a length typed as a bare number. They are now
'=(B7-B6)/((A7-A6)*12)' (clean), and the planted Strap!C9 is its slip '=(B10-B9)/(A10-A9)'
(named unit-scale, 12 times too large, rightly).

The reviewer's diagnostic variants (probe/probe2.py, probe3.py, not counted): bbl/h*42 into
gal/h, bbl*42 into gal and bbl/h*0.7 into gpm are clean, but bbl/h*42/60 and bbl/h/60*42 into
gpm (or gal/min) are unit-scale errors that advise multiplying by 0.7 again; an absolute
pressure times 2.31 in a sum of heads is clean (only the 2.31 note), while psia + ft*0.433
into psig is caught; a °C or °F reading less a number into Δ°C, Δ°F or K is clean when the row
label says 'difference' or 'rise', and an offset-scale error claiming that 'Δ°C' is 'an
absolute temperature' when the label does not (row label 'Offset').
"""

G = ("a note on a correct cell: 9.81 read as standard gravity, which it is (g_n = 9.80665 "
     "m/s², SI Brochure 9th ed.)")
W433 = ("a note on a correct cell: 0.433 read as γ_w in psi/ft, which it is (common practice); "
        "the brine's SG multiplies it as it should")
W3960 = ("a note on a correct cell: 3960 read as one over γ_w in gpm·ft/hp, which it is "
         "(common practice)")
W231 = "a note on a correct cell: 2.31 read as one over γ_w in ft/psi, which it is (common practice)"
D8337 = ("a note on a correct cell: 8.337 read as the density of water in lb/gal, which it is "
         "at 60 °F (common practice)")
EXTRA = {
    "crude-tank-brackwater": [
        ("FLAGGED CORRECT CELL: =C57*42/60, bbl/h to US gpm; 1 bbl = 42 US gal exactly (NIST "
         "SP 811 (2008) App. B.8, and plumb's own catalogue 'exact as 42 gal'), 1 h = 60 min, "
         "so 4200 bbl/h = 2940 gpm. plumb says it 'counts 1.42857 (1/0.7) times as much as "
         "gpm' and advises multiplying by 0.7, which would give 2058 gpm, 30 % low. bbl*42 "
         "into gal and bbl/h*0.7 into gpm pass (probe/probe2.py): the 42 beside the 60 is not "
         "read as the barrel", "Tank!C59 unit-scale"),
        ("input cell, not counted: '°API' is not a unit plumb reads (API gravity is a "
         "dimensionless index, so the warning is fair; its advice to 'measure °API = <size> "
         "<known unit>' cannot be followed, the scale not being proportional)",
         "Tank!C23 no-unit"),
    ],
    "brine-plant-kettle-ridge": [
        (W433, "Plant!C51 gravity-number"),
        ("the same note on the planted cell, beside the warning that catches it",
         "Plant!C52 gravity-number"),
        (W3960, "Plant!C55 gravity-number"),
        (D8337, "Brine!C6 trade-constant"),
        (D8337, "Brine!C7 trade-constant"),
        (D8337, "Brine!C9 trade-constant"),
        (D8337, "Brine!C10 trade-constant"),
    ],
    "pivot-hollins-draw": [
        (W231, "Pivot!C42 gravity-number"),
        ("the same note on the planted cell it misses (the note is all plumb says there)",
         "Pivot!C44 gravity-number"),
        (W3960, "Pivot!C50 gravity-number"),
        (G, "Pivot!C55 gravity-number"),
    ],
}

MISSED = {
    "pivot-hollins-draw": {
        "Pivot!C44": "(an absolute pressure, pivot gauge plus the 13.2 psia site barometer, "
                     "turned into head and added to the lifts: TDH 30.5 ft too high). plumb "
                     "gives only the 2.31 note. A limit rather than a fault: by units alone "
                     "an absolute pressure head in a sum of heads is what an NPSH sum holds, "
                     "so only the trade's convention (TDH on gauge pressure) tells",
    },
}

RENAMED = {
    "crude-tank-brackwater": {
        "Tank!C21": ("offset-scale", "the slip is a °C reading where the °F one belongs, less "
                                     "the 60 °F base (a Δ°C written as Δ°F, and the wrong base); "
                                     "plumb calls the result off by a scale's zero"),
    },
}

MESSAGES = {
    "crude-tank-brackwater": {
        "Tank!C21": "\"the unit written for its cell, 'Δ°F' ..., is an absolute temperature\" "
                    "and 'a °C reading is in K once 273.15 is added': Δ°F is a difference, and "
                    "adding 273.15 would not mend the cell; the fix is the °F reading (C14) "
                    "less 60. The same words come on a correct '=C6-15' (°C) into Δ°C "
                    "whose row label lacks 'difference' (probe/probe3.py)",
        "Tank!C60": "'the value shown is 1.42857 (1/0.7) times too large': it is 60 times too "
                    "large (176 400 against 2940 gpm); the 42 gal/bbl is dropped as a "
                    "coefficient, as on the correct Tank!C59",
    },
    "pivot-hollins-draw": {
        "Pivot!C21": "'the value shown is 18.8572 times too large': it is 24 times too small "
                     "(0.0152 against 0.364 in/day); the 453 is dropped as a coefficient, and "
                     "the number the engineer reads first is neither the size nor the "
                     "direction of the slip",
        "Pivot!C10": "'its units are 43560.2 times too large for it, its coefficient 4047 "
                     "aside' never says the value is 10.76 times too large (43 560/4047); the "
                     "note that 4047 is not the factor these units need is the useful line",
        "Pivot!C31": "the headline (60 times too large) is right, but 'its inputs give numbers "
                     "in units of 1.66667 (1/0.6) h' (min per %, the /100 beside it set "
                     "aside) is hard to read; minutes are what the formula gives",
    },
    "hot-liquor-fellgate": {
        "Brewhouse!C31": "advises '(C26 + 1.01325) at sea level' though the sheet has the "
                         "site barometer in C27 (1.013 bar, labelled so); elsewhere plumb "
                         "points to such a cell ('write (psig + C17)', probe/probe2.py)",
    },
}

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")
HEADNOTE = {stem: [LINE] for stem in ("crude-tank-brackwater", "brine-plant-kettle-ridge",
                                      "pivot-hollins-draw", "hot-liquor-fellgate")}


# Later in the same round plumb read the clock units of a workbook's cells as it reads a
# declared symbol's, so that 42/60 from bbl/h into gpm is two conversions: Tank!C59 is clean.
# Tank!C60's message is unchanged (60 times too large, said to be 1/0.7).
def _drop(table, stem, *lines):
    table[stem] = [e for e in table[stem] if e[1] not in lines]


_drop(EXTRA, "crude-tank-brackwater", "Tank!C59 unit-scale")
