"""review61: what plumb (the round's build of the time) reports on these books beyond the
planted mistakes, the planted cells it names by another rule, and its messages that mislead,
each with the reviewer's reason, recorded after reading every finding. Read by make_books.py
when it writes the .expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.

As run by the reviewer (count.py): planted flagged 37/37 (hood 10/10, gas well 10/10, spillway
9/9, cooling water 8/8); correct formula cells clean 132/136 (hood 36/36, gas well 30/33,
spillway 30/30, cooling water 36/37). No crash or hang; exit status 1 on every book (errors
found), in text and JSON alike; the JSON holds the same findings as the text.

The four flagged correct cells are the trade's published forms whose typed constants carry
units (Weymouth's 433.5, API RP 14E's 60 and C = 100) and the gpm·°F/24 tons check, whose
'tons' plumb does not read there although it reads the same word in Cooling!C9. The reviewer's
diagnostic variants are in a probe (not counted): with 'TR' written in place of 'tons' the
gpm·°F/24 cell is clean, 24 read as one over water's ρ·c_p; '500*gpm*ΔT/12000' into 'tons'
is the same no-unit warning.

A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.
"""

G = ("a note on a correct cell: 9.81 read as standard gravity, which it is (g_n = 9.80665 "
     "m/s², SI Brochure 9th ed.)")
EXTRA = {
    "kitchen-hood-bramblecote": [
        ("a note on a correct cell: 1.08 read as air's ρ·c_p in Btu·min/(ft³·h·°F), which it "
         "is (ASHRAE Fundamentals (2021), ch. 18, from memory)", "Hood!C56 trade-constant"),
        ("a note on a correct cell: 1.2 read as air's ρ·c_p in kJ/(m³·K), which it is (ASHRAE "
         "Fundamentals (2021), ch. 18, from memory)", "Hood!C58 trade-constant"),
    ],
    "gas-well-kestrel-draw": [
        ("FLAGGED CORRECT CELL (plumb's limit): the Weymouth equation as GPSA prints it, "
         "Q(scf/d) = 433.5·E·(T_b/p_b)·[(p₁² − p₂²)/(G·T_f·L·Z)]^0.5·D^2.667 with psia, °R, "
         "mi and in (GPSA Engineering Data Book, 13th ed. (2012), sect. 17, from memory; "
         "433.5 = 38.77 × 11.18, the general flow constant times Weymouth's transmission "
         "factor 11.18·D^(1/6)). The 433.5 carries units and D^2.667 a fractional power, so "
         "the formula 'computes [L^(2167/1000) Θ^(1/2)]'; the message does not say that a "
         "typed constant carries units, and its notes name 6 of the 10 input cells, leaving "
         "out D and L, the two that make the odd dimension", "Well!C41 result-unit"),
        ("FLAGGED CORRECT CELL (plumb's limit): API RP 14E's gas velocity "
         "v(ft/s) = 60·Z·Q(MMscf/d)·T(°R)/(d²·p) (API RP 14E, 5th ed. (1991), from memory); "
         "the 60 folds the standard state (14.7 psia, 520 °R), the day and in² to ft²: "
         "1e6/86400 × 14.7/520 × 144·4/π = 59.99. The SI check beside it (Well!C49, 2.443 m/s) "
         "agrees with C46 (2.437 m/s) within the rounding of 60", "Well!C44 result-unit"),
        ("a note on a correct cell: 2.7 read as one over air's gas constant in lb/ft³ from "
         "psia and °R, which it is (28.97/10.73 = 2.700; GPSA, from memory)",
         "Well!C50 trade-constant"),
        ("FLAGGED CORRECT CELL (plumb's limit): API RP 14E's erosional velocity v_e = C/√ρ_m "
         "with C = 100 for continuous service, ft/s from lb/ft³ (API RP 14E, 5th ed. (1991), "
         "from memory); C is an empirical constant with units (ft/s)·(lb/ft³)^0.5",
         "Well!C53 result-unit"),
    ],
    "spillway-harrowgill": [
        (G, "Dam!C26 gravity-number"),
        ("a note on a correct cell, WRONG: '2' read as twice standard gravity 'comes to "
         "1.9993 there', with the advice 'write 2*{g_n}*0.101937'. The 2 is the 2 of √(2gH) "
         "and 9.81 is g (Chow (1959), from memory); the note appears whenever the opening "
         "in mm is divided by 1000 in the same product (a probe: with the opening in "
         "m the note is the plain '9.81 read as standard gravity')", "Dam!C35 gravity-number"),
        ("a note on a correct cell: 64.4 read as 2·g in ft/s², which it is; its figures "
         "'2·g_n comes to 64.332' and 'times 3.28004' fold in the rounding of the typed "
         "3.281s (2·g_n is 64.348 ft/s², the foot factor 3.28084)", "Dam!C37 gravity-number"),
        ("a note on a correct cell: 9.81 read as water's specific weight in kN/m³, which it "
         "is (common practice)", "Dam!C39 gravity-number"),
    ],
    "cooling-water-calder-mere": [
        ("a note on a correct cell: 500 read as water's ρ·c_p in Btu/(h·gpm·°F), which it is "
         "(common practice)", "Cooling!C28 trade-constant"),
        ("FLAGGED CORRECT CELL (plumb's limit): tons = gpm·ΔT(°F)/24 (common practice; 24 = "
         "12 000 Btu/h per ton / 500). plumb reads 'tons' as the ton of refrigeration in "
         "Cooling!C9 (=C7/3.517) but not here: 'unknown unit tons (did you mean ton, tonR or "
         "torr?)', where 'ton' is the short ton, a mass. With 'TR' written the cell is clean "
         "(a probe)", "Cooling!C29 no-unit"),
        (G, "Cooling!C34 gravity-number"),
        ("a note on a correct cell: 2.31 read as one over water's specific weight in ft/psi, "
         "which it is (common practice)", "Cooling!C37 gravity-number"),
        (G, "Cooling!C42 gravity-number"),
        ("a note on a correct cell: 3960 read as one over water's specific weight in "
         "gpm·ft/hp, which it is (common practice)", "Cooling!C44 gravity-number"),
        ("the same note on the planted cell, beside the error that catches it",
         "Cooling!C45 gravity-number"),
        (G, "Cooling!C56 gravity-number"),
        (G, "Piping!H6 gravity-number"),
        (G, "Piping!H7 gravity-number"),
        (G, "Piping!H8 gravity-number"),
    ],
}

MISSED = {}

RENAMED = {
    "kitchen-hood-bramblecote": {
        "Hood!C59": ("result-unit", "the Δ°F rise read as a temperature dimension the 1.2 "
                                    "does not cancel; a note gives the right number (0.6667)"),
    },
    "spillway-harrowgill": {
        "Dam!C27": ("result-unit", "32.2 beside metres read as a bare number, [L^(1/2)]"),
        "Dam!C36": ("result-unit", "with the mm not divided by 1000, 9.81 is read as a bare "
                                   "number and the cell computes [L^(5/2)]"),
    },
    "cooling-water-calder-mere": {
        "Cooling!C17": ("sum-mismatch", "32 added to a difference; the message says so rightly"),
    },
}

MESSAGES = {
    "kitchen-hood-bramblecote": {
        "Hood!C59": "names C53 'in °R' where the sheet writes Δ°F (the same degree, but not the "
                    "unit the engineer typed); the advice 0.6667 = 1.2/1.8 is right",
    },
    "gas-well-kestrel-draw": {
        "Well!C23": "the advice is to add 273.15 and get K, where the cell asks for °R (°C·1.8 "
                    "+ 491.67, or the °F cell + 459.67)",
    },
    "spillway-harrowgill": {
        "Dam!C27": "\"this formula computes [L^(1/2)]\": true, but it does not say that 32.2 "
                   "is g in ft/s² beside a fall in metres; an engineer reads it as g missing",
        "Dam!C36": "\"this formula computes [L^(5/2)]\" points to a missing g; the slip is the "
                   "gate opening in mm without /1000, a scale, and 9.81 is there",
    },
}

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")
HEADNOTE = {stem: [LINE] for stem in ("kitchen-hood-bramblecote", "gas-well-kestrel-draw",
                                      "spillway-harrowgill", "cooling-water-calder-mere")}

# The planted C42 holds two gauge readings, each raised to a power: two findings, one each.
EXTRA["gas-well-kestrel-draw"].append(
    ("the planted cell's second gauge reading, C30, reported as well", "Well!C42 offset-scale"))
