"""The reviewer's record of what the frozen plumb (/work/frozen15/plumb) reports on the review75
books beyond the planted mistakes, and the planted mistakes it misses, each with the reason.
Read by make_books.py to write the .expect files. Invented scenarios; demonstration only. A
dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice."""

NOTE_WATER = "a note on a trade's number, read as such (correct cell, note only)"

EXTRA = {
    "crude-tank-ticket": [
        ("a note: 999.016 read as the density of water at 60 °F (correct cell, note only)",
         "Ticket!C35 trade-constant"),
        ("a correct cell plumb still flags: alpha_60 = 341.0957/rho_60^2 is API MPMS Ch. 11.1's "
         "own form (K0 = 341.0957 carries (kg/m³)²/°F); a workbook has no way to mark a "
         "unit-bound coefficient as the notation's '?' does",
         "Ticket!C36 result-unit"),
        ("a correct cell plumb still flags: VLOOKUP whose column number is chosen by IF (the "
         "API band) is left not-checked",
         "Ticket!C40 not-checked"),
        ("a correct cell plumb still flags: the same cell also gets a mixed-range error for "
         "the lookup table (key column in °F, CTL columns dimensionless), a normal lookup "
         "table, and on a cell it says it did not check",
         "Ticket!C40 mixed-range"),
        ("a correct cell plumb still flags: VLOOKUP with an IF column number, as Ticket!C40",
         "Ticket!C41 not-checked"),
    ],
    "chiller-plant": [
        ("a note: 500 in 500·gpm·ΔT read as water's volumetric heat capacity (correct cells, "
         "note only)", "Chillers!H5 trade-constant"),
        (NOTE_WATER, "Chillers!H6 trade-constant"),
        (NOTE_WATER, "Chillers!H7 trade-constant"),
        ("a note: 4.19 in 4.19·q·ΔT (L/s, K) read as water's volumetric heat capacity (correct "
         "cells, note only)", "Chillers!I6 trade-constant"),
        (NOTE_WATER, "Chillers!I7 trade-constant"),
        ("a correct cell plumb still flags: design condenser flow = 3 gpm per ton of heat "
         "rejected (common practice); the 3 carries gpm/ton and a workbook cannot mark it",
         "Tower!C8 result-unit"),
        ("a correct cell plumb still flags: evaporation = 0.00085 × gpm × range (°F), the "
         "cooling tower trade's rule (from memory); 0.00085 carries 1/°F and a workbook cannot "
         "mark it",
         "Tower!C14 result-unit"),
    ],
    "quarry-blast": [
        ("a correct cell plumb still flags: Konya's burden B[ft] = 3.15·D_e[in]·(SG_e/SG_r)^(1/3)"
         " (Konya & Walter 1991, from memory) is unit-bound: 3.15 folds in the 1/12 ft per in; "
         "plumb reports 'value 12 times too large'",
         "Design!C15 unit-scale"),
        ("a note: 0.3405 read as π/4 times the conversion from g/cm³·in² to lb/ft (correct "
         "cell, note only)", "Design!C24 trade-constant"),
    ],
    "air-leak-audit": [
        ("a note: 528 read as the standard temperature in °R (correct cell, note only)",
         "Summary!C15 trade-constant"),
        ("a note: 14.7 read as the standard atmosphere in psi in the pump-down test (correct "
         "cell, note only)", "Summary!C31 trade-constant"),
        ("a correct cell plumb still flags: leak flow scaled from the table's 100 psig by "
         "absolute pressure, F*(p+14.7)/(100+14.7), as the trade writes it; the denominator "
         "(100 psig + 14.7 psi) is not read as a pressure, so plumb says the cell computes a "
         "power", "Leaks!G5 result-unit"),
        ("a correct cell plumb still flags: as Leaks!G5", "Leaks!G6 result-unit"),
        ("a correct cell plumb still flags: as Leaks!G5", "Leaks!G7 result-unit"),
        ("a correct cell plumb still flags: as Leaks!G5", "Leaks!G9 result-unit"),
        ("a correct cell plumb still flags: as Leaks!G5", "Leaks!G10 result-unit"),
    ],
}

MISSED = {
    "chiller-plant": {
        "Chillers!G7": ("a temperature difference (column headed ΔT [°F]) less 32, as if it "
                        "were a °F reading: a difference has no zero to remove; the value is "
                        "negative (-10.8 K for a 12.5 °F rise); expected offset-scale or "
                        "unit-scale, plumb reports nothing"),
    },
    "quarry-blast": {
        "Design!C37": ("lb over yd³ is already lb/yd³, so the 1.686 (kg/m³ to lb/yd³) "
                       "converts a second time, 1.686 too large; expected unit-scale (factor "
                       "not needed), plumb takes 1.686 as a plain coefficient and reports "
                       "nothing"),
    },
}

RENAMED = {
    "chiller-plant": {"Chillers!I5": "result-unit"},
    "air-leak-audit": {"Summary!C34": "result-unit"},
}
