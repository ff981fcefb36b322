"""review52: what plumb (the reviewer's binary) reports on these books beyond the
planted mistakes, the planted cells it misses, the planted cells it names by another rule, and
its messages that mislead, each with the reviewer's reason, recorded after reading every
finding. Read by make_books.py when it writes the .expect files (python3 make_books.py
--expect); count.py counts the same findings from the JSON output.

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.

As run: all 39 planted cells flagged, each under the rule planted; 140 of 142 correct formula
cells clean. The two correct cells flagged are both the trade's own formulas, judged right by
the reviewer (reasons below): Conveyor!C67, Bond's law, and Brewhouse!C8, hL to US beer barrels.
"""

G = ("a note on a correct cell: 9.81 read as standard gravity, which it is (g_n = 9.80665 "
     "m/s², SI Brochure 9th ed.)")
GW = ("a note on a correct cell: 9.81 read as γ_w in kPa per m of water, which it is "
      "(ρ_w·g_n = 9.81 kN/m³, common practice)")
EXTRA = {
    "pool-hall-dehumidification": [],
    "quarry-conveyor-crusher": [
        (G, "Conveyor!C29 gravity-number"),
        (G, "Conveyor!C30 gravity-number"),
        (G, "Conveyor!C48 gravity-number"),
        ("a note on a planted cell, beside its error: 9.81 read as standard gravity, which it "
         "is", "Conveyor!C49 gravity-number"),
        ("a note on a correct cell: 9550 read as 60000/(2π), which it is (M = 9550·P/n, common "
         "practice)", "Conveyor!C62 trade-constant"),
        ("a correct cell flagged: Bond's law W = 10·W_i·(1/√P80 − 1/√F80) with sizes in µm "
         "(here mm × 1000) and W_i in kWh/t (Bond 1952; Wills' Mineral Processing Technology, "
         "8th ed., from memory). The 10 carries √(100 µm), an empirical constant as Hazen–"
         "Williams' 10.67 is, which plumb reads as a fit's constant on Booster!C30; Bond's it "
         "reads as a pure number and reports [L^(3/2) T^-2]. The cell is right (0.331 kWh/t); "
         "plumb's limit", "Conveyor!C67 result-unit"),
    ],
    "water-booster-station": [
        (GW, "Booster!C25 gravity-number"),
        ("a note on a correct cell: 10.67 read as the SI Hazen–Williams fit's constant, which "
         "it is (from memory)", "Booster!C30 trade-constant"),
        (GW, "Booster!C37 gravity-number"),
        (G + "; the same cell's v²/(2·9.81)", "Booster!C37 gravity-number"),
        ("a note on a correct cell: 9.81 read as γ_w, kN/m³ times L/s times m giving W, which "
         "it is", "Booster!C44 gravity-number"),
        ("a note on a correct cell: 3960 read as 1/γ_w in gpm·ft per hp, which it is (common "
         "practice)", "Booster!C47 gravity-number"),
        (GW, "Booster!C72 gravity-number"),
    ],
    "brewery-wort-boil-cooling": [
        ("a correct cell flagged: =C7/1.1735 into 'bbl'. In a brewery the barrel is the US beer "
         "barrel, 31 US gal = 117.35 L (27 CFR 25.11, from memory); plumb's only 'bbl' is the "
         "42 gal oil barrel, and a sidecar cannot redefine it ('bbl' is already a unit), only "
         "add another name (bbl_beer). The cell is right (42.6 bbl); plumb's catalogue",
         "Brewhouse!C8 unit-scale"),
    ],
}

MISSED = {}

RENAMED = {}

MESSAGES = {
    "brewery-wort-boil-cooling": {
        "Brewhouse!C41": "right cell and rule, but the advice reads \"write (C36 + the "
                         "atmospheric pressure in bar(g)), or (C36 + 1.01325) at sea level, the "
                         "standard atmosphere in bar(g)\": the atmosphere in bar(g) is zero; it "
                         "means in bar. And it does not name the sheet's own barometer cell C37 "
                         "(1.013 bar a), as it does for the booster's NPSH (Booster!C38). The "
                         "atmosphere is now said in bar; the barometer cell is still not named",
    },
}

# Not a planted cell, so kept here for the report: the message on the correct Brewhouse!C8
# ("its units are 1.58987 times too large ... 1.1735 ... is not the factor these units need")
# would lead a brewer to divide by 1.5899 hL (the oil barrel) and understate the batch by 26 %.

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")
HEADNOTE = {stem: [LINE] for stem in ("pool-hall-dehumidification", "quarry-conveyor-crusher",
                                      "water-booster-station", "brewery-wort-boil-cooling")}
