"""review50: what plumb reports on these books beyond the planted mistakes, the
planted cells it misses, the planted cells it names by another rule, and its messages that
mislead, each with the reviewer's reason, recorded after reading every finding. Read by
make_books.py when it writes the .expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.
"""

W1000 = ("a note on a correct cell: 1000 read as the density of water in kg/m³, which it is "
         "(ACI 211.1 absolute volume, from memory)")
EXTRA = {
    "wok-hood-makeup-air": [
        ("a note on a correct cell: 4005 in (V/4005)² read as √(2/ρ) of standard air in fpm "
         "and in. w.g., which it is (ASHRAE Handbook — Fundamentals (2021) ch. 21, from memory)",
         "Hood!C25 trade-constant"),
        ("a note on a correct cell: 1.08 read as ρ_a·c_p,a of standard air in Btu/(h·cfm·°F), "
         "which it is (common practice)", "Hood!C50 trade-constant"),
    ],
    "lox-vie-hospital": [
        ("a correct cell plumb flags: usable gas = US gal of liquid × 115 scf per US gal (CGA "
         "practice; 1.141 kg/L over 1.325 kg/m³ at 70 °F is 861 L of gas per L, × 0.1337 ft³ "
         "per US gal = 115). plumb takes 115 as a pure number and says the value shown is 7.48 "
         "times too large, which it is not: 7.48 is the US gallons in a cubic foot. Fair that "
         "it cannot know a gas-per-liquid factor typed bare (the same book's 860/1000 into m³ "
         "passes), but the headline misstates the value", "VIE!C21 unit-scale"),
        ("a note on a correct cell: 273.15 read as the 0 °C reference of the Nm³, which it is",
         "VIE!C38 trade-constant"),
        ("a note on a correct cell: 9.81 read as standard gravity, which it is (g_n = 9.80665 "
         "m/s², SI Brochure 9th ed.)", "VIE!C63 gravity-number"),
    ],
    "readymix-batching": [
        (W1000, "Mix!D6 trade-constant"),
        (W1000, "Mix!D8 trade-constant"),
        (W1000, "Mix!D9 trade-constant"),
        (W1000, "Mix!D10 trade-constant"),
    ],
    "dh-substation-phx": [
        ("a note on a correct cell: 0.86 read as 1/(ρ_w·c_p,w) in m³/h per kW/K, which it is "
         "(860 kcal/h per kW, common practice)", "Substation!C29 trade-constant"),
        ("a note on a correct cell: 500 read as ρ_w·c_p,w in Btu/(h·gpm·°F), which it is "
         "(common practice)", "Substation!C34 trade-constant"),
        ("a note on a correct cell: 0.3346 ft per kPa read as 1/γ_w, which it is (NIST SP 811 "
         "(2008) App. B.8: 1 ft of water = 2.989 kPa)", "Substation!C51 gravity-number"),
        ("a note on a correct cell: 3960 gpm·ft/hp read as one over γ_w, which it is "
         "(Hydraulic Institute, from memory)", "Substation!C56 gravity-number"),
    ],
}

MISSED = {}

RENAMED = {
    "wok-hood-makeup-air": {
        "Hood!C51": ("result-unit", "with a good hint: in K the 1.08 comes to about 1.944, or "
                                    "convert the rise to °F"),
    },
    "readymix-batching": {
        "Batch!C63": ("offset-scale", "a fair rule: °C reading written as °F without the 32"),
        "Mix!D7": ("result-unit", "fair: it computes a density; a hint that the 1000 kg/m³ of "
                                  "water is missing would say it better"),
    },
    "dh-substation-phx": {
        "Substation!C20": ("sum-mismatch", "with a good message: 32 is the scales' offset and "
                                           "a difference takes none"),
        "Substation!C52": ("result-unit", "with a good hint: in kPa the 2.31 comes to about "
                                          "0.335"),
    },
}

MESSAGES = {
    "lox-vie-hospital": {
        "VIE!C21": "\"the value shown is 7.48133 times too large\" on a correct cell: the "
                   "value is right; 7.48 is the US gallons in a cubic foot, and the typed 115 "
                   "scf per US gal is taken for a pure number",
    },
}

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")
HEADNOTE = {stem: [LINE] for stem in ("wok-hood-makeup-air", "lox-vie-hospital",
                                      "readymix-batching", "dh-substation-phx")}
