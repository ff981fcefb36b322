"""review49: what plumb reports on these books beyond the planted mistakes, the
planted cells it misses, the planted cells it names by another rule, and its messages that
mislead, each with the reviewer's reason, recorded after reading every finding. Read by
make_books.py when it writes the .expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.
"""

G = ("a note on a correct cell: 9.81 read as standard gravity, which it is (g_n = 9.80665 m/s², "
     "SI Brochure 9th ed.)")
NTU = ("an input the reviewer wrote in NTU, the trade's turbidity unit, which plumb does not know; "
       "fair to warn (turbidity has no SI dimension), but it suggests 'BTU', an energy, and says "
       "it once for each of the six rows of one column heading")
EXTRA = {
    "school-vrf-heatpump": [],
    "quarry-secondary-line": [
        ("a correct cell plumb flags: Bond's third theory W = 10·W_i·(1/√P80 − 1/√F80) with P80 "
         "and F80 in µm and W_i in kWh/t (Wills' Mineral Processing Technology, 8th ed., from "
         "memory); the 10 is √(100 µm), so the formula is right only in those units and plumb "
         "is right that it is not homogeneous as typed. The message gives the dimension it "
         "computes ([L^(3/2) T^-2]) but no hint that a number with a hidden unit (√µm) may be "
         "meant", "Line!C20 result-unit"),
        (G, "Line!C39 gravity-number"),
        (G, "Line!C40 gravity-number"),
        (G, "Line!C46 gravity-number"),
        (G, "Conveyors!F5 gravity-number"),
        (G, "Conveyors!F6 gravity-number"),
        (G, "Conveyors!F8 gravity-number"),
    ],
    "wtw-alum-hypo-dosing": [
        ("a note on a correct cell: 8.34 lb/US gal read as water's weight per gallon, which it "
         "is (common practice), with the exact 8.3454 named", "Dosing!C21 trade-constant"),
        ("a note on a correct cell: the same 8.34 for the chlorine feed",
         "Dosing!C40 trade-constant"),
        (NTU, "Dosing!C16 no-unit"),
        (NTU, "Jar!A5 no-unit"),
        (NTU, "Jar!A6 no-unit"),
        (NTU, "Jar!A7 no-unit"),
        (NTU, "Jar!A8 no-unit"),
        (NTU, "Jar!A9 no-unit"),
        (NTU, "Jar!A10 no-unit"),
    ],
    "office-boiler-gas": [
        ("a note on a correct cell: 1013.25 mbar read as the standard reference pressure, "
         "which it is (ISO 13443, from memory)", "Boiler!C36 trade-constant"),
        ("a note on a correct cell: 288.15 K read as the standard reference temperature, "
         "which it is", "Boiler!C36 trade-constant"),
        ("a note on the planted cell: the same 288.15", "Boiler!C37 trade-constant"),
    ],
}

MISSED = {}

RENAMED = {
    "quarry-secondary-line": {
        "Line!C41": ("result-unit", "a fair rule ('computes [M] mass'); it does not say that "
                                    "the missing factor is an acceleration, g"),
        "Conveyors!F7": ("result-unit", "'computes [M L T^-1] (momentum)': true but odd for "
                                        "a lift power short of g; the missing factor "
                                        "[L T^-2] is not named"),
    },
    "wtw-alum-hypo-dosing": {
        "Dosing!C28": ("result-unit", "a fair rule: kg/h × kg/L is no volume flow"),
    },
}

MESSAGES = {
    "office-boiler-gas": {
        "Boiler!C23": "\"its units are 26.8392 times too small for it, its coefficient 947.8 "
                      "aside\": 947.8 is the MJ-to-Btu factor and the cell is 35.31 times too "
                      "large (Btu/m³ written as Btu/ft³); the message calls the factor a "
                      "coefficient and never says by how much the value is wrong",
    },
}

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")
HEADNOTE = {stem: [LINE] for stem in ("school-vrf-heatpump", "quarry-secondary-line",
                                      "wtw-alum-hypo-dosing", "office-boiler-gas")}
