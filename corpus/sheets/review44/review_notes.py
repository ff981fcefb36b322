"""review44: what plumb reported on these books beyond the planted mistakes, the planted cells it
misses or names by another rule, and its messages that mislead, each with the reviewer's reason
(as first recorded on an older binary at review time, chosen per cell after reading every
finding, then brought up to date with the binary of the day when the books came into the
corpus: the 1.293 of the air mass flow (Plant!C39), once flagged result-unit, is now read as
the density of air with a note; the inverse Magnus fit (Plant!C55), once flagged
dimensioned-argument twice, now reads its 243.04 as the fit's constant in °C and each 6.1094 as
a reference value in hPa, with notes). Read by make_books.py when it writes the .expect files
(python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.
"""

HW = ("a note on a correct cell: the Hazen-Williams constant read as an empirical fit's, which "
      "it is (4.52 for psi/ft from gpm and inches, NFPA 13 (2019) sec. 28.2.2.1, from memory)")
GW = ("a note on a correct cell: the number read as the specific weight of water (or g), which "
      "it is (common practice)")

EXTRA = {
    "htst-pasteurizer": [],
    "sprinkler-hydraulics": [
        (HW, "Calc!C27 trade-constant"),
        (GW + ": 0.433 psi/ft", "Calc!C30 gravity-number"),
        ("a correct cell plumb flags: pump discharge (psig) less the pressure required (psi); "
         "both are gauge readings, as every pressure in an NFPA 13 calc is, but plumb's catalogue "
         "reads a bare 'psi' as psia. The book mixes psig and psi for gauge readings (the "
         "reviewer's labelling), and plumb's convention is the trade's opposite",
         "Calc!C41 offset-scale"),
        (HW, "Branch!H5 trade-constant"),
        (HW, "Branch!H6 trade-constant"),
    ],
    "elevated-tank": [
        (GW + ": 9.81 kPa/m", "Tank!C25 gravity-number"),
        (GW + ": 1.422 psi/m", "Tank!C26 gravity-number"),
        (GW + " (on the planted cell)", "Tank!C29 gravity-number"),
        (GW + ": 9.81 kPa/m", "Tank!C31 gravity-number"),
        ("a note on a correct cell: 10.67, Hazen-Williams in SI (common practice, from memory), "
         "read as an empirical fit's constant", "Tank!C41 trade-constant"),
        (GW + ": 9.81 kN/m³", "Tank!C44 gravity-number"),
        (GW + " (on the planted cell)", "Tank!C45 gravity-number"),
        (GW + ": 367 = 1/γ_w in m³/h·m per kW", "Tank!C46 gravity-number"),
        (GW + " (on the planted cell)", "Tank!C47 gravity-number"),
        (GW + ": g_n", "Tank!C61 gravity-number"),
        (GW + ": g_n (on the planted cell it misses)", "Tank!C62 gravity-number"),
    ],
    "compressed-air": [
        ("a note on a correct cell: 101.325 kPa, the normal state (DIN 1343)",
         "Plant!C10 trade-constant"),
        ("a note on a correct cell: 273.15 K, the normal state (DIN 1343)",
         "Plant!C10 trade-constant"),
        ("a note on a correct cell: 101.325 kPa, standard air", "Plant!C11 trade-constant"),
        ("a note on a correct cell: 288.71 K (60 °F), standard air", "Plant!C11 trade-constant"),
        ("a note on a correct cell: Nm³/min × 1.293 kg/Nm³ / 60 s/min gives kg/s; 1.293 read "
         "as the density of air, which it is (dry air at the normal state of DIN 1343, 0 °C and "
         "101.325 kPa; from memory, the ideal-gas value is 1.2923)", "Plant!C39 trade-constant"),
        ("a note on a correct cell: the Magnus constant 6.1094 hPa (Alduchov & Eskridge 1996, "
         "from memory)", "Plant!C52 trade-constant"),
        ("a note on a correct cell: the inverse Magnus fit t_d = 243.04·ln(e/6.1094)/"
         "(17.625 − ln(e/6.1094)) (Alduchov & Eskridge 1996, from memory); 243.04 read as the "
         "fit's constant in °C, which it is", "Plant!C55 trade-constant"),
        ("a note on the same cell: 6.1094 in the first LN read as a reference value in hPa, so "
         "that the argument is a ratio, which it is", "Plant!C55 trade-constant"),
        ("(the same note on the second LN)", "Plant!C55 trade-constant"),
    ],
}

MISSED = {
    "sprinkler-hydraulics": {
        "Calc!C43": "psia + psi − psi: plumb reads the bare psi of C32 as absolute and the "
                    "margin's psi as an absolute reading, and accepts absolute less gauge there "
                    "as 'the atmosphere as an absolute reading'; with every gauge reading written "
                    "psig it is still missed while the margin's unit is psi",
    },
    "elevated-tank": {
        "Tank!C62": "the suction reading's row says 'gauge reading' but its unit is kPa, which "
                    "plumb reads as absolute; written kPa(g) it is found",
    },
}

MESSAGES = {
    "htst-pasteurizer": {
        "HTST!C14": "\"must multiply by 0.00440287, but it multiplies by 227.125\": the formula "
                    "multiplies by 3.785/60 = 0.0631; 227.125 is not in it (the 3.785 alone is "
                    "the wrong way round)",
        "HTST!C59": "\"its inputs give numbers in units of 25.4 -\": true before the formula's "
                    "0.0254, but hard to relate to the headline (1000 too small: mPa·s as Pa·s)",
    },
    "sprinkler-hydraulics": {
        "Calc!C14": "\"multiplies by 0.0245424\": the formula multiplies by 3.785/10.76 = 0.352; "
                    "only the 10.76 is the wrong way round",
        "Branch!H7": "result-unit with a dimension [L^(17/25) T^(-37/20)] no engineer can use; "
                     "nothing points at the 25.4 that turned inches into mm",
    },
    "elevated-tank": {
        "Tank!C16": "\"multiplies by 0.00378541\": the formula multiplies by 1000 × 3.785 = "
                    "3785",
    },
    "compressed-air": {
        "Plant!C54": "\"gives a value on the barg scale ... add or subtract the atmospheric "
                     "pressure\": the result is a vapour pressure in hPa; the fix is the absolute "
                     "line pressure (C50) in the denominator, not an atmosphere added to the result",
    },
}

RENAMED = {
    "sprinkler-hydraulics": {
        "Branch!H7": ("result-unit", "with d in mm the 4.52 is no longer read as the fit's "
                      "constant, so the dimension is left as it falls"),
    },
    "elevated-tank": {
        "Tank!C27": ("result-unit", "0.433 on metres is length where psi is written; the note "
                     "names the fix (about 1.421 in m, or convert to ft)"),
    },
}

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")
HEADNOTE = {stem: [LINE] for stem in ("htst-pasteurizer", "sprinkler-hydraulics", "elevated-tank",
                                      "compressed-air")}
