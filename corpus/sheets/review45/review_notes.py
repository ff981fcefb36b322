"""review45: what plumb reported on these books beyond the planted mistakes, the planted cells it
names by another rule, and its messages that mislead, each with the reviewer's reason (as first
recorded on an older binary at review time, chosen per cell after reading every finding, then
brought up to date with the binary of the day when the books came into the corpus: plumb now
adds notes on correct cells, reading 9.81 as standard gravity, 11.8 as one over the specific
weight of water, 10.67 as the Hazen-Williams fit's constant, 62.4 and 4.19 as water's density
and specific heat, and 14.7 psia and 520 °R as the gas trade's standard state, all of which they
are; and the bare 287 of the air density in the dryer's zone cells, already flagged
result-unit, now also carries a note of its own reading it as a reference temperature, which
misleads). Read by make_books.py when it writes the .expect files (python3 make_books.py
--expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.
"""

RAIR = ("a correct cell plumb flags: ρ = p/(R·T) with p = 101.325 kPa × 1000 Pa/kPa and R = 287 "
        "J/(kg·K), the gas constant of dry air (287.05, ISO 2533:1975; 8.314462618/0.0289652, "
        "CODATA 2018), T = t + 273.15 K; plumb does not read 287 as R of air (nor 101325/287 or "
        "0.287, as the reviewer's throwaway probe book showed) and reports a dimension "
        "instead")
G_NOTE = ("a note on a correct cell: 9.81 read as standard gravity, which it is (g_n = "
          "9.80665 m/s², ISO 80000-3, from memory)")
STD_GAS = ("a note on a correct cell: 14.7 read as a standard reference pressure in psia and 520 "
           "as a standard reference temperature in °R, the gas trade's standard state (14.7 psia, "
           "60 °F = 519.67 °R, common practice), which they are")
EXTRA = {
    "glycol-chiller": [
        (G_NOTE + ": pump head = Δp/(ρ·g)", "Chiller!C50 gravity-number"),
    ],
    "hydro-scheme": [
        (G_NOTE + ": Darcy-Weisbach v²/(2g)", "Hydro!C25 gravity-number"),
        (G_NOTE + " (on the planted cell, whose slip is the mm diameter, reported above)",
         "Hydro!C26 gravity-number"),
        ("a note on a correct cell: 10.67 of the SI Hazen-Williams formula read as an empirical "
         "fit's constant, which it is (common practice, from memory)", "Hydro!C28 trade-constant"),
        ("a correct cell plumb flags: the US-units Hazen-Williams form h_f = "
         "4.73·L·Q^1.852/(C^1.852·D^4.87) (ft, cfs, ft), from V = 1.318·C·R^0.63·S^0.54 (common "
         "practice, from memory): 1/(1.318·(π/4)·4^-0.63)^1.852 = 4.73; the sheet's value 15.94 "
         "ft = 4.86 m agrees with the SI form in C28 (10.67, accepted with a note) to 0.2 %",
         "Hydro!C30 result-unit"),
        (G_NOTE + ": minor losses K·v²/(2g)", "Hydro!C32 gravity-number"),
        (G_NOTE + ": P = ρ·g·Q·H·η", "Hydro!C38 gravity-number"),
        (G_NOTE + " (on the planted cell, whose slip is the efficiency in %, reported above)",
         "Hydro!C39 gravity-number"),
        ("a note on a correct cell: 11.8 of the US rule P(kW) = Q(cfs)·H(ft)·η/11.8 read as one "
         "over the specific weight of water in those units, which it is (737.6 ft·lbf/s per kW "
         "over 62.4 lbf/ft³, common practice)", "Hydro!C42 gravity-number"),
        (G_NOTE + ": static pressure ρ·g·h", "Hydro!C43 gravity-number"),
    ],
    "three-phase-separator": [
        (STD_GAS + " (the 14.7)", "Separator!C30 trade-constant"),
        ("(the 520 of the same cell)", "Separator!C30 trade-constant"),
        (STD_GAS + " (the 14.7, on the planted cell, whose slip is the /24, reported above)",
         "Separator!C31 trade-constant"),
        ("(the 520 of the same cell)", "Separator!C31 trade-constant"),
        ("a note on a correct cell: 62.4 read as the density of water in lb/ft³, which it is (at "
         "60 °F, from memory, as the sheet's sources name it)", "Separator!C33 trade-constant"),
        ("(the same note on the produced water's density)", "Separator!C34 trade-constant"),
        (G_NOTE + ": Stokes settling g·d²·Δρ/(18·μ)", "Separator!C55 gravity-number"),
        (G_NOTE + " (on the planted cell, whose slip is the viscosity in cP, reported above)",
         "Separator!C56 gravity-number"),
    ],
    "belt-dryer": [
        ("a note on a correct cell: 4.19 read as the specific heat of water in kJ/(kg·K), which "
         "it is (common practice)", "Dryer!C27 trade-constant"),
        ("a note on a correct cell, once flagged result-unit: ρ = p/(R·T) with 101.325 kPa × "
         "1000 and 287 J/(kg·K) typed in, read together as one atmosphere over air's gas "
         "constant", "Dryer!C39 trade-constant"),
        (RAIR + "; the note beside it reads 287 as a reference temperature, which it is not",
         "Zones!D5 result-unit"),
        ("a note that misleads: '287' read as a standard reference temperature in the unit of "
         "the temperature difference beside it; 287 is the gas constant of dry air in "
         "J/(kg·K), and (B5 − C36) is a difference, not a reading", "Zones!D5 trade-constant"),
        (RAIR + "; as D5", "Zones!D6 result-unit"),
        ("(the same misleading note as on D5)", "Zones!D6 trade-constant"),
        ("(the same misleading note as on D5, here on the planted cell)",
         "Zones!D7 trade-constant"),
    ],
}

MISSED = {}

RENAMED = {
    "glycol-chiller": {"Chiller!C35": ("sum-mismatch", "the note says a difference takes no "
                                       "offset, which is the slip")},
    "belt-dryer": {"Zones!D7": ("result-unit", "flagged for the bare 287 of the density, as "
                                "D5 and D6; the planted × 1000 itself is not named (with p and "
                                "R in cells, plumb names it, as the reviewer's throwaway "
                                "probe book showed)")},
}

MESSAGES = {
    "belt-dryer": {
        "Zones!D7": "in its note of its own (trade-constant, listed below), \"'287' is read as a "
                    "standard reference temperature in the unit of '(B7-Dryer!$C$36)'\": 287 is "
                    "the gas constant of air in J/(kg·K), and B7 − C36 is a temperature "
                    "difference, not a reading",
        "Dryer!C19": "\"'C8' counts 0.001 times as much as 'C17'\": means the number in t/h is "
                     "1/1000 of the number in kg/h; the fix note (multiply C8 by 1000) is right",
    },
}

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")
HEADNOTE = {stem: [LINE] for stem in ("glycol-chiller", "hydro-scheme", "three-phase-separator",
                                      "belt-dryer")}
