"""The reviewer's notes on what plumb reported for the review29 books when first run,
beyond the planted mistakes, and the planted mistakes it misses, each with its reason. Read by
make_books.py to write the .expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.
"""

NOTE_G = ("a note on a correct cell: {n} read as {what}, which it is ({src})")

EXTRA = {
    "channel-normal-depth": [
        ("a correct cell plumb still flags: =IF(C32<1,\"subcritical\",\"SUPERCRITICAL\") returns "
         "text and needs no unit, but plumb takes the text input 'Grass, short (mown)' in C6 (the "
         "lining, a VLOOKUP key in the Value column) for the column's heading and reads '(mown)' "
         "as a unit it does not know",
         "Channel!C34 no-unit"),
        ("a correct cell plumb still flags: =IF(C28<=C8,\"OK\",\"SCOUR - line the channel\"), "
         "the same reading of the input text in C6 as a heading",
         "Channel!C35 no-unit"),
        ("a note on the planted cell C38: 9.81 read as water's specific weight in kN/m³, which it "
         "is (γ_w = ρ·g, common practice); the unit-scale error on the same cell is the planted "
         "finding",
         "Channel!C38 gravity-number"),
        (NOTE_G.format(n="32.2 in Fr = V/√(32.2·A/T)", what="standard gravity in ft/s²",
                       src="Chow 1959 ch. 1; g_n = 32.174 ft/s², NIST SP 811"),
         "US!C11 gravity-number"),
        (NOTE_G.format(n="62.4 in τ0 = 62.4·R·S", what="water's specific weight in lbf/ft³",
                       src="common practice"),
         "US!C12 gravity-number"),
    ],
    "plant-fault-level": [
        ("an input plumb cannot read (not a formula cell): the heading 'Z [Ω/1000 ft]' is the "
         "unit NFPA 70 (NEC 2020) Chapter 9 Table 9 prints ('ohms to neutral per 1000 feet'); "
         "plumb refuses a number in a unit's denominator ('expected a unit after / '), so the "
         "Ω/1000 ft to mΩ/m conversions in column F are checked without it",
         "Cables!E5 no-unit"),
        ("the same heading, the same input limit", "Cables!E6 no-unit"),
        ("the same heading, the same input limit (it hides the planted slip in F7)",
         "Cables!E7 no-unit"),
        ("the same heading, the same input limit", "Cables!E8 no-unit"),
    ],
    "lng-boiloff-sendout": [],
    "mine-dewatering": [
        ("a note on a correct cell: Hazen–Williams in SI, 10.67 read as the fit's constant, which "
         "it is (common practice)",
         "Pump!C22 trade-constant"),
        (NOTE_G.format(n="9.81 in p = SG·9.81·H (kPa)", what="water's specific weight in kN/m³",
                       src="common practice"),
         "Pump!C28 gravity-number"),
        (NOTE_G.format(n="0.433 in p = 0.433·SG·H_ft (psi)", what="water's specific weight in "
                       "psi/ft", src="common practice"),
         "Pump!C29 gravity-number"),
        ("a note only on the planted cell C30 (0.433 read as water's specific weight); the "
         "warning for SG on the wrong side, which the README promises and the notation gives, "
         "is not made (see the missed slip above)",
         "Pump!C30 gravity-number"),
        (NOTE_G.format(n="9.81 in P_h = 9.81·SG·Q·H (kW)", what="water's specific weight in "
                       "kN/m³", src="common practice"),
         "Pump!C31 gravity-number"),
        (NOTE_G.format(n="3960 in bhp = gpm·ft·SG/(3960·η)", what="one over water's specific "
                       "weight in the pump trade's units", src="Cameron Hydraulic Data 19th ed., "
                       "from memory"),
         "Pump!C36 gravity-number"),
    ],
}

MISSED = {
    "plant-fault-level": {
        "Fault!C42": ("(I_HV = I_LV·V_LV/V_HV with the voltage ratio inverted, 525 times too "
                      "large): kV/kV is a pure number either way, so no unit check can see it; "
                      "expected no finding, recorded as a slip a reviewer must catch"),
        "Cables!F7": ("(Ω/1000 ft to mΩ/m divided by 3.281 instead of multiplied): the input "
                      "column's unit 'Ω/1000 ft' does not read as a unit, so the conversion is "
                      "checked without it; expected a unit-scale error (wrong way round), as "
                      "Inflow!C7 of the mine book gets"),
    },
    "mine-dewatering": {
        "Pump!C30": ("(p = 0.433·H_ft/SG, the specific gravity dividing where it multiplies, off "
                     "by SG² = 1.32): expected the gravity-number warning the README documents "
                     "for '0.433*h/SG'; the .plumb notation gives it (tried: 'SG : 1 \"specific "
                     "gravity of the slurry\"'), but in a workbook no row label or symbol "
                     "('Slurry specific gravity', 'Specific gravity', 'SG', 'Relative density' "
                     "all tried) makes plumb see the cell as a specific gravity: only the note"),
    },
}

RENAMED = {
    "mine-dewatering": {
        "Pump!C37": ("result-unit", "with the head in m, 3960 no longer rounds 1/γ_w in the "
                     "units around it, so gpm·m stays a bare [L^4 T^-1]; the message's note "
                     "names the cause (3960 wants ft; about 1207 in m)"),
    },
}

MESSAGES = {
    "channel-normal-depth": {
        "Trials!B7": ("right cell, advice that does not fix it: 'multiply Channel!$C$11*A7 by "
                      "3.28084' converts the correct z·y term (m) to ft, leaving (ft)·m in an "
                      "m² column, 3.281 too large (tried: plumb then flags it again); the fix is "
                      "to take the width from C9 (m). The term converted is picked by its place "
                      "(the first term is the reference), not by the cell's unit"),
        "Channel!C30": ("right, but '1/0.09290304 times too large' says 10.76 (ft² per m²) the "
                        "long way round"),
    },
    "lng-boiloff-sendout": {
        "Terminal!C26": ("right cell, advice that does not fix it: 'multiply C24 by 1000' turns "
                         "the pump heat (kW) into W, leaving a sum in W under kW, 1000 too large "
                         "(tried: plumb then flags it again); the fix is to divide the W term "
                         "C22*C23 by 1000"),
    },
}
