"""review72: what the round's build of the time reports on these books beyond the planted
slips, the planted cells it names by another rule, and its messages that mislead, each with the
reviewer's reason as an engineer, recorded after reading every finding. Read by make_books.py
when it writes the .expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.

As run by the reviewer (count.py): planted flagged 38/38 (reservoir 10/10, evaporator 10/10,
crusher 9/9, glasshouse 9/9); correct formula cells clean 150/154 (reservoir 40/42, evaporator
39/40, crusher 36/37, glasshouse 35/35). No crash or hang; exit status 1 on every book (errors
found), in text and JSON alike, and the two runs name the same cells and rules.

The reviewer's variants (probe/probes.py, probe/barometer.py, probe/units_probe.py; not
counted): a gauge reading plus the site's barometer typed as a number (99.8 kPa, 100 kPa,
1.0 bar) is an error in every form tried, alone or in NPSHa's sum, while the sea-level 101.325
or 1.013 typed in the same place is only a warning naming the declared barometer; Bond's
equation fails however it is written unless its 10 sits in a cell with the unit 'μm^0.5';
writing the balancing storage's day as a cell (× 1 d) passes; the unit texts 'st/h', 'kWh/st',
'ft head', 'm head', 'ppm CO2', '% solids' and 'L/(person·d)' do not read as units ('stph',
'ppm', '%' and 'L/d' do).
"""

EXTRA = {
    "reservoir-booster-fellbrook-cross": [
        ("FLAGGED CORRECT CELL (defensible): balancing storage as 25 % of the peak day, "
         "ML/d × 1000 × 25/100 into m³, the day left unsaid as the trade writes it (common "
         "practice). The value is right; plumb's reading (a flow, not a volume) is literally "
         "true, and writing the day as a cell (× 1 d) passes (probe p01)", "Station!C24 result-unit"),
        ("a note on a correct cell: 9.81 read as γ_w in kPa/m, which it is (a gauge head)",
         "Station!C37 gravity-number"),
        ("a note on a correct cell: Hazen-Williams' 10.67 read as an empirical fit's constant "
         "with its SI units, which it is", "Station!C46 trade-constant"),
        ("a note on a correct cell: 9.81 read as g_n in ρ·g·H", "Station!C51 gravity-number"),
        ("a note on a correct cell: 0.433 read as γ_w in psi/ft, which it is",
         "Station!C53 gravity-number"),
        ("a note on a correct cell: 9.81 read as g_n in Joukowsky's a·Δv/g",
         "Station!C59 gravity-number"),
        ("a note on a correct cell, flagged until the cell's unit was weighed with the number "
         "added: suction gauge plus the site barometer typed from the site log, 22 kPa(g) + "
         "99.8 = 121.8 kPa absolute (common practice), read as the site's atmosphere",
         "Station!C65 trade-constant"),
        ("a note on a correct cell: 9.81 read as g_n in NPSHa", "Station!C66 gravity-number"),
        ("a note on a correct cell: 9.81 read as g_n in ρ·g·Q·H", "Station!C73 gravity-number"),
        ("a note on a planted cell (beside its error): 9.81 read as g_n",
         "Station!C74 gravity-number"),
        ("a note on a correct cell: 3960 read as 1/γ_w for gpm·ft to hp, which it is "
         "(Hydraulic Institute, common practice)", "Station!C78 gravity-number"),
        ("a note on a correct cell: 8.34 read as lb per US gallon of water, the pounds formula "
         "(AWWA, from memory); the note rightly says it only converts units here",
         "Station!C87 trade-constant"),
        ("a note on a correct cell: 9.81 read as γ_w in kPa/m for a difference of two gauges",
         "Station!C91 gravity-number"),
    ],
    "evaporator-cip-ashgill-moor": [
        ("a note on a correct cell, flagged until the cell's unit was weighed with the number "
         "added: motive steam 8.0 bar(g) + 1.0 typed from the boiler log (the site barometer, "
         "1.00 bar a, in C24) = 9.0 bar a (common practice), read as the site's atmosphere",
         "Evaporator!C26 trade-constant"),
    ],
    "crusher-conveyor-stainmoor-edge": [
        ("FLAGGED CORRECT CELL (plumb's limit): Bond's W = 10·W_i·(1/√P80 − 1/√F80) with P80 "
         "and F80 in μm (Wills' Mineral Processing Technology, 8th ed., from memory); the 10 "
         "carries √μm (√100 μm). plumb reports [L^(3/2) T^-2] with no word of an empirical "
         "constant, where it reads Hazen-Williams' 10.67 as one (Station!C46 of the reservoir "
         "book); with the 10 in a cell whose unit is 'μm^0.5' it passes (probe p03)",
         "Crusher!C19 result-unit"),
        ("a note on a correct cell: 9.81 read as g_n in DIN 22101's main resistances",
         "Conveyor!C23 gravity-number"),
        ("a note on a correct cell: 9.81 read as g_n in the slope resistance",
         "Conveyor!C24 gravity-number"),
        ("a note on a correct cell: CEMA's 990 read as 1/g_n for stph·ft to hp, which it "
         "carries; its remedy 'write 9.80665' does not fit a trade constant",
         "Conveyor!C36 gravity-number"),
        ("a note on a correct cell: 9.81 read as g_n in the lift power",
         "Conveyor!C37 gravity-number"),
    ],
    "glasshouse-chp-co2-wrayholme": [
        ("a note on a correct cell: 500 read as ρ·c_p of water per gpm·°F (ASHRAE, from "
         "memory); the note quotes water between 0 and 30 °C, and this heating water runs at 70 "
         "to 90 °C, where ρ·c_p gives about 489, 2 % below 500: the note could say so",
         "CHP!C45 trade-constant"),
    ],
}

MISSED = {}

RENAMED = {
    "reservoir-booster-fellbrook-cross": {
        "Station!C39": ("offset-scale", "p·1000/ρ with p in kPa(g) is named as a gauge reading "
                                        "in a quotient; its first remedy, 'if a head was meant, "
                                        "g is missing', is the right one"),
    },
}

MESSAGES = {
    "reservoir-booster-fellbrook-cross": {
        "Station!C39": "the second remedy, 'a gauge reading plus the site's barometer is "
                       "absolute: write (C36 + C62)', would turn a residual head into an "
                       "absolute one, wrong for a service pressure",
        "Station!C56": "\"the conversion factor 1000 ... must multiply by it, not divide by "
                       "it\" blames the right L/s to m³/s conversion; the slip is the bore in "
                       "mm squared (the numbers come right either way, the advice misleads)",
    },
}

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")
HEADNOTE = {stem: [LINE] for stem in ("reservoir-booster-fellbrook-cross",
                                      "evaporator-cip-ashgill-moor",
                                      "crusher-conveyor-stainmoor-edge",
                                      "glasshouse-chp-co2-wrayholme")}

# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.
