"""review55: what plumb (the reviewer's binary) reports on these books
beyond the planted mistakes, the planted cells it names by another rule, and its messages that
mislead, each with the reviewer's reason, recorded after reading every finding. Read by
make_books.py when it writes the .expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.

As run by the reviewer (count.py): planted flagged 36/36 (CIP 9/9, laundry 9/9, dewatering
9/9, rainwater 9/9); correct formula cells clean 138/138 (CIP 37/37, laundry 33/33,
dewatering 36/36, rainwater 32/32). No crash or hang; exit status 1 on every book (errors
found), in text and JSON alike.

The reviewer's diagnostic variants (probe/probe.py, not counted): '=bar(g)*14.5+14.7' into psig
is named unit-scale '14.5038 times too small' with the 14.5 written as 14.5038 too, while the
same formula into psia is clean and 'psig cell + 14.7' into psig is named offset-scale rightly;
the 2.725 kWh/ML-per-metre check is clean only with the efficiencies written as %/100: with
fractions ('/(η·η_m)') or '/10000' the same correct formula is a result-unit error, and with the
2.725 replaced by 2.5 or left out it is an error too, so the cell in the book passes because a
'/100' is read as water's specific weight, not because 2.725 is recognised.

Since then Skid!C49 (=C47*14.5+14.7 into psig) is named offset-scale, the atmosphere added to a
gauge reading, as planted; the other findings are as the reviewer recorded them.
"""

G = ("a note on a correct cell: 9.81 read as standard gravity, which it is (g_n = 9.80665 "
     "m/s², SI Brochure 9th ed.)")
EXTRA = {
    "cip-skid-harrow-dene": [
        (G, "Skid!C60 gravity-number"),
    ],
    "laundry-grand-sable": [
        ("a note on a correct cell: 1.2 read as air's ρ·c_p in kJ/(m³·K), which it is (ASHRAE "
         "Fundamentals (2021), ch. 18, from memory)", "Laundry!C68 trade-constant"),
        ("a note on a correct cell: 1.08 read as air's ρ·c_p in Btu·min/(ft³·h·°F), which it "
         "is (ASHRAE Fundamentals (2021), ch. 18, from memory)", "Laundry!C69 trade-constant"),
    ],
    "dewatering-corrie-bend": [
        (G, "Dewatering!C24 gravity-number"),
        (G + ", on the planted cell", "Dewatering!C25 gravity-number"),
        (G, "Dewatering!C27 gravity-number"),
        (G, "Dewatering!C35 gravity-number"),
        ("a note on a correct cell: 0.433 read as γ_w in psi/ft, which it is (common "
         "practice)", "Dewatering!C37 gravity-number"),
        ("the same note on the planted cell, beside the warning that catches it",
         "Dewatering!C38 gravity-number"),
        (G, "Dewatering!C46 gravity-number"),
        (G, "Dewatering!C50 gravity-number"),
        (G + ", on the planted cell", "Dewatering!C51 gravity-number"),
        ("a note on a correct cell: 3960 read as one over γ_w in gpm·ft/hp, which it is "
         "(common practice)", "Dewatering!C55 gravity-number"),
        ("a note on a correct cell, wrong in part: '100' is read as the specific weight of "
         "water; the 100 turns the efficiency's % into a fraction, and 2.725 kWh/ML per metre "
         "(g_n/3.6, common practice) is the number that carries γ_w. The cell is right and "
         "stays clean, but for the wrong reason: with the efficiencies as fractions the same "
         "formula is a result-unit error (probe/probe.py)", "Dewatering!C60 gravity-number"),
        ("a note on a correct cell: 8760 read as the hours in a year, which it is",
         "Dewatering!C62 trade-constant"),
    ],
    "rainwater-wrenfield": [
        ("a note on a correct cell: 365 read as the days in a year, which it is (its advice, "
         "'write the hours in a cell marked h', speaks of hours where the sheet counts days)",
         "Harvest!C18 trade-constant"),
        (G, "Harvest!C50 gravity-number"),
    ],
}

MISSED = {}

RENAMED = {
    "cip-skid-harrow-dene": {
    },
}

MESSAGES = {
    "cip-skid-harrow-dene": {
    },
    "rainwater-wrenfield": {
        "Harvest!C51": "\"this formula computes [M L T^-1] (momentum)\" for ρ·Q·H/η without g: "
                       "true, but unlike the NPSH cell of the dewatering book ('differs by "
                       "exactly an acceleration ... is a g missing') no remedy is offered",
    },
}

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")
HEADNOTE = {stem: [LINE] for stem in ("cip-skid-harrow-dene", "laundry-grand-sable",
                                      "dewatering-corrie-bend", "rainwater-wrenfield")}
