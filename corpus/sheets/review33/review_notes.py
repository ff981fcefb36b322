"""The reviewer's record of plumb's findings on review33's books beyond the planted mistakes,
and the planted cells it misses (as first recorded), read by make_books.py when it writes the
.expect files (--expect). Invented scenarios; a dimensionally consistent formula can still be
wrong, and this check does not replace independent review under local codes and licensed
practice."""

# stem -> list of (comment, "Sheet!Cell rule"): every finding beyond the planted ones
EXTRA = {
    "steam-balance": [
        ("a note on a correct cell: HP steam density ρ = p/(R·T) by the ideal gas law, "
         "p in bar a × 100 = kPa, T = t + 273.15 K, with steam's gas constant R = 0.4615 "
         "kJ/(kg·K) (CODATA 2018 R = 8.314 J/(mol·K) over M = 18.015 g/mol) typed into the "
         "formula, read as water vapour's gas constant (flagged as computing "
         "[M L^-1 T^-2 Θ^-1] until a later round)",
         "Balance!C42 trade-constant"),
    ],
    "oxygen-vie": [],
    "motor-list": [
        ("a correct cell plumb still flags: AWG area from the ASTM B258-18 diameter d = 0.127 mm "
         "× 92^((36 − n)/39) (from memory), 13.3 mm² for 6 AWG as the NEC ch. 9 Table 8 gives; "
         "the 0.127 mm is typed into the formula and plumb reads the result as dimensionless",
         "Cables!C18 result-unit"),
        ("a correct cell plumb still flags: the same ASTM B258 area formula, 4 AWG (21.2 mm²)",
         "Cables!C19 result-unit"),
        ("a correct cell plumb still flags: the same ASTM B258 area formula, 2 AWG (33.6 mm²)",
         "Cables!C20 result-unit"),
        ("a correct cell plumb still flags: incomer current I = S/(√3·U) with the 400 V "
         "nominal voltage (IEC 60038) typed into the formula, as the row label 'Incomer current "
         "at 400 V' says; plumb reads 400 as a bare number and says the formula computes power",
         "MCC!C18 result-unit"),
    ],
    "pool-heating": [
        ("a note on a correct cell: 0.61094 kPa of the Magnus-type fit p = 0.61094·exp(17.625·t/"
         "(t + 243.04)) (Alduchov & Eskridge 1996) read as the fit's constant, which it is",
         "Pool!C22 trade-constant"),
        ("a correct cell plumb still flags: the hall air's vapour pressure RH/100 × the same "
         "fit; with RH/100 in front plumb no longer reads 0.61094 as the fit's constant (it does "
         "on C22) and says the formula computes a dimensionless number",
         "Pool!C23 result-unit"),
        ("an input cell, not a formula: 'Bathers per day' with the unit '/d' typed beside it; "
         "plumb does not read '/d' (it reads '1/d') and its message does not suggest '1/d'",
         "Pool!C39 no-unit"),
    ],
}

# stem -> {"Sheet!Cell": why}: planted cells plumb misses
MISSED = {
    "motor-list": {
        "MCC!C15": ("(unit-scale warning expected: √(P² + Q²) is the apparent power in kVA, "
                    "written under kW for the utility form; plumb does not tell kVA and kvar from "
                    "kW in a workbook, and even '=C11' (the kVA cell) under kW passes in a "
                    "workbook while the notation's 'P = S' gets the warning)"),
    },
}

# stem -> {"Sheet!Cell": (rule plumb names, why)}
RENAMED = {}

MESSAGES = {}

# stem -> comment lines written at the head of the .expect
HEADNOTE = {
    "steam-balance": [
        "The sidecar steam-balance.cells.plumb ('measure klb = 1000 lb') was added after the",
        "first run, as plumb's own message advised: the steam trade's klb/h is not in plumb's",
        "unit table. Without it plumb gave 12 no-unit warnings: 9 on formula cells (8 correct",
        "ones, Balance!C16, Users!D5, D8, D9, D11, D12, D13, D15, and the planted Users!D6,",
        "reported only as 'unit not read') and 3 on inputs; it missed the planted Balance!C14,",
        "whose input had no unit (book count then: planted 9/10, correct clean 39/48).",
    ],
}
