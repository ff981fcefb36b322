"""review37: what plumb reported on these books beyond the planted mistakes, the planted cells it
missed, and the planted cells it names by another rule, each with the reviewer's reason (as
first recorded on an older binary; the .expect files are kept by hand since). Read by
make_books.py when it writes the .expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.
"""

ATM = ("a note on a correct cell: (p + 14.7)/(100 + 14.7) is the leak table's scaling by "
       "absolute pressure (DOE Sourcebook (2003 ed.), from memory; choked flow, Çengel & Boles "
       "9th ed. ch. 17), and plumb reads 100 + 14.7 as a gauge reading plus the atmosphere, "
       "which it is")
G322 = ("a note on a correct cell: 32.2 in the orifice equation √(2·g·h) with h in ft read as "
        "standard gravity in ft/s² (HEC-22 3rd ed. (2009) ch. 8), which it is")
TONS24 = ("a note on a correct cell: TR = gpm·ΔT/24 (common practice), 24 read as one over the "
          "heat capacity of a volume of water in those units (12 000 Btu/h per TR ÷ 500 "
          "Btu/(h·gpm·°F)), which it is")
HW452 = ("a note on a correct cell: Hazen–Williams 4.52 (NFPA 13 (2022) ch. 28, psi/ft from gpm "
         "and in) read as an empirical fit's constant, which it is")
ONE_IN = ("a correct cell plumb still flags: the pipe-size column right of the flow column holds "
          "the text '1 in' (a 1 in branch pipe, as hydraulic calc forms print size right after "
          "flow), and plumb reads that text as the unit of the flow cell beside it, above the "
          "column heading 'Q [gpm]'; '1-1/4 in', '3 in' and '1\"' do not read as units, so only "
          "the 1 in rows go wrong")

EXTRA = {
    "air-audit": [
        ("a note on a correct cell: 14.7 psia read as the standard reference pressure in the "
         "ratio p_in/14.7 (standard air 14.7 psia, 68 °F: CAGI, common practice), which it is",
         "Audit!C17 trade-constant"),
        ("a note on a correct cell: 68 + 459.67 (°R) read as the standard reference "
         "temperature, which it is (the same cell has two notes)", "Audit!C17 trade-constant"),
        ("a note on a planted cell: 14.7 in the pressure-decay formula read as a standard "
         "reference pressure (DOE Sourcebook's 14.7, from memory), which it is",
         "Audit!C38 trade-constant"),
        ("a correct cell plumb still flags: the DOE Sourcebook rule of thumb, 1 % of power per "
         "2 psi (from memory), typed as (p_op − p_new)/2 into %; the 2 carries psi per %, typed "
         "bare, so by units the cell is a pressure. Fair to ask for the 2 psi in a cell with its "
         "unit; the formula itself is the trade's and right (6.0 % against 6.1 % from adiabatic "
         "compression in C57)", "Audit!C56 result-unit"),
        ("a note on a correct cell: as Leaks!E6, and a second note on the 14.7 of (D5 + 14.7) "
         "worded 'the atmospheric pressure added to a column's pressure'; D5 is a gauge line "
         "pressure, not a liquid column, so the words mislead a little (the reading is right: "
         "gauge to absolute). Only E5 gets this second note; E6, E8, E9 and E10 do not",
         "Leaks!E5 trade-constant"),
        (ATM, "Leaks!E5 trade-constant"),
        (ATM, "Leaks!E6 trade-constant"),
        (ATM, "Leaks!E8 trade-constant"),
        (ATM, "Leaks!E9 trade-constant"),
        (ATM, "Leaks!E10 trade-constant"),
    ],
    "sprinkler-nodes": [
        (HW452, "Design!C29 trade-constant"),
        ("a note on a correct cell: 0.433 psi/ft read as the specific weight of water, which it "
         "is (common practice)", "Design!C32 gravity-number"),
        ("a correct cell plumb still flags: SI Hazen–Williams p = 6.05×10⁵·Q^1.85/(C^1.85·"
         "d^4.87) bar/m (NFPA 13 (2022) ch. 28, from memory) on Nodes!D6, which plumb takes to "
         "be in '1 in' (see Nodes!D6); with the size text written 1\" the same cell gets only "
         "the fit-constant note", "Design!C48 result-unit"),
        (ONE_IN + "; here q at the end sprinkler carried into Q", "Nodes!D6 result-unit"),
        (ONE_IN + "; Hazen–Williams on a Q plumb takes to be a length", "Nodes!J6 result-unit"),
        (ONE_IN + "; Q of the pipe before plus q at this sprinkler", "Nodes!D7 sum-mismatch"),
        (ONE_IN + "; Hazen–Williams on a Q plumb takes to be a length", "Nodes!J7 result-unit"),
        (ONE_IN + "; D7 (read as '1 in') plus q at sprinkler 3 (the planted C8, gpm)",
         "Nodes!D8 sum-mismatch"),
        (HW452, "Nodes!J8 trade-constant"),
        (HW452, "Nodes!J9 trade-constant"),
        (HW452, "Nodes!J10 trade-constant"),
    ],
    "pond-stage-storage": [
        ("a note on a correct cell: rational method Q = C·i·A in cfs from acre·in/h, 1.0083 "
         "left out by convention (HEC-22 3rd ed. (2009) ch. 3), which it is",
         "Pond!C16 trade-constant"),
        ("a note on a correct cell: as Pond!C16 (its C is the planted C13, taken as written)",
         "Pond!C17 trade-constant"),
        ("a note on a correct cell: invert + D/24, the 12 in/ft and the radius's 2 folded "
         "together, read as such", "Pond!C26 trade-constant"),
        (G322, "Pond!C32 gravity-number"),
        (G322 + " (the IF's branch not taken at this stage)", "Stage!F5 gravity-number"),
        (G322, "Stage!F6 gravity-number"),
        (G322, "Stage!F8 gravity-number"),
        (G322, "Stage!F9 gravity-number"),
    ],
    "chw-plant": [
        (TONS24 + "; here gpm = TR·24/ΔT", "Plant!C14 trade-constant"),
        ("a note on a correct cell: Q = 4.19·q·ΔT (kW from L/s and K) read as the heat capacity "
         "of a volume of water, which it is (common practice)", "Plant!C19 trade-constant"),
        ("a note on a planted cell: 3960 in hp = gpm·ft/(3960·η) read as one over water's "
         "specific weight in those units, which it is (common practice)",
         "Plant!C35 gravity-number"),
        ("a note on a correct cell: 500 in gpm = Btu/h/(500·range) read as the heat capacity of "
         "a volume of water, which it is (common practice)", "Plant!C43 trade-constant"),
        ("a correct cell plumb still flags: ton-hours of a day as mean TR × 24 (24 h in a day, "
         "typed into the formula as engineers do); plumb does not read 24 as the hours of a "
         "day, though it reads 8760 as the hours of a year", "Plant!C56 result-unit"),
        (TONS24, "Log!G5 trade-constant"),
        (TONS24, "Log!G6 trade-constant"),
        (TONS24, "Log!G7 trade-constant"),
        (TONS24, "Log!G9 trade-constant"),
    ],
}

MISSED = {
    "chw-plant": {
        "Plant!C22": ("(unit-scale expected when planted): kW/TR ÷ 3.517 is exactly the "
                      "conversion of kW/TR into a plain ratio, which is 1/COP; COP and its "
                      "reciprocal are both dimensionless, so no check of units can tell them "
                      "apart. My expectation when planting it was wrong: I read 3.517 as a bare "
                      "number, plumb rightly reads it as TR's kW"),
    },
}

RENAMED = {
    "chw-plant": {
        "Log!G8": ("result-unit", "without the ÷ 12 000 the 500 does not round ρ·c_p into TR, "
                   "so plumb leaves it a bare number and the term is a flow times a temperature; "
                   "the cell is reported, but as a dimension error rather than 'Btu/h written as "
                   "TR, 12 000 too large'"),
    },
}

MESSAGES = {
    "sprinkler-nodes": {
        "Design!C49": ("'the conversion factor in this formula is the wrong way round: to give "
                       "psi/ft it must multiply by 4.42075, but it multiplies by 0.226206'; the "
                       "formula multiplies by 14.5 × 3.281 = 47.57 (bar→psi right, m→ft the "
                       "wrong way), so the value is 10.76 times too large; 0.226206 is not the "
                       "factor written"),
    },
}
