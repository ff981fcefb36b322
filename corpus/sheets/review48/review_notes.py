"""review48: what plumb reports on these books beyond the planted mistakes, the
planted cells it misses, the planted cells it names by another rule, and its messages that
mislead, each with the reviewer's reason, recorded after reading every finding. Read by
make_books.py when it writes the .expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.
"""

G = ("a note on a correct cell: 9.81 read as standard gravity, which it is (g_n = 9.80665 m/s², "
     "SI Brochure 9th ed.)")
W1422 = ("a note on a correct cell: 1.422 psi per m of water read as the specific weight of "
         "water, which it is (9.80665 kPa/m / 6.894757 kPa/psi, NIST SP 811 (2008) App. B.8)")
EXTRA = {
    "hotel-dhw-recovery": [
        ("a note on a planted cell, beside its error: 500 read as water's heat capacity per "
         "gpm, which it is; beside gal/h the scale rule names the 60", "DHW!C34 trade-constant"),
        ("a note on a correct cell: 8.33 read as ρ_w·c_p,w in Btu/(h·(US gal/h)·°F), which it "
         "is (8.33 lb/US gal × 1 Btu/(lb·°F), common practice)", "DHW!C35 trade-constant"),
        ("a note on a correct cell: 500 read as ρ_w·c_p,w in Btu/(h·gpm·°F), which it is "
         "(8.33 × 60 × 1, common practice)", "DHW!C32 trade-constant"),
        ("a note on a correct cell: the same 500 in the recirculation flow",
         "DHW!C68 trade-constant"),
        ("a note on a correct cell: 3960 gpm·ft/hp read as one over γ_w, which it is",
         "DHW!C72 gravity-number"),
    ],
    "rice-column-dryer": [
        ("a note on a correct cell: 1.08 read as ρ_a·c_p,a of standard air in Btu/(h·cfm·°F), "
         "which it is (common practice)", "Dryer!C47 trade-constant"),
    ],
    "ship-fuel-separator": [
        ("a correct cell plumb flags: μ_50 = ν·(ρ_15 − α·(50 − 15))/1000 in mPa·s, the "
         "density carried from 15 °C to 50 °C with the temperatures typed in (cSt × kg/m³ / "
         "1000 = mPa·s, SI Brochure 9th ed.; α linear correction common practice). plumb reads "
         "(50 − 15) as a pure number and reports 'dimensions differ'; the same correction with "
         "a °C cell, =C13-C14*(C15-15) in C17, passes. Fair as a style point (put 50 °C in a "
         "cell), but the message does not say the typed numbers may be temperatures",
         "FuelOil!C32 sum-mismatch"),
    ],
    "snowmaking-pumping": [
        (G, "Snow!C19 gravity-number"),
        (W1422, "Snow!C22 gravity-number"),
        (W1422, "Snow!C25 gravity-number"),
        (G, "Snow!C35 gravity-number"),
        ("a note on a correct cell: 3960 gpm·ft/hp read as one over γ_w, which it is",
         "Snow!C36 gravity-number"),
        ("a note on a correct cell: 1000 read as the density of water in kg/m³, which it is",
         "Snow!C61 trade-constant"),
    ],
}

MISSED = {}

RENAMED = {
    "hotel-dhw-recovery": {
    },
    "rice-column-dryer": {
        "Dryer!C52": ("sum-mismatch", "with a good message: 32 is the scales' offset and a "
                                      "difference takes none"),
    },
    "snowmaking-pumping": {
        "Snow!C37": ("result-unit", "with a good hint: in m the 3960 comes to about 1207"),
        "Snow!C52": ("offset-scale", "a fair rule: the value stays on the °F scale"),
        "Snow!C54": ("offset-scale", "a fair rule: °C limit against a °F reading"),
    },
}

MESSAGES = {
    "rice-column-dryer": {
        "Dryer!C9": "\"the value shown is 22.2225 times too small\": it is 1000 times too small "
                    "(2.2046 lb/kg typed where 2204.6 lb/t belongs)",
        "Dryer!C27": "\"its units are 947.817 times too large for it, its coefficient 1.055 "
                     "aside\": 1.055 is the Btu-to-kJ factor, the cell is 1000 too large (kJ "
                     "written as MJ); the message calls it a coefficient",
        "Dryer!C55": "\"the value shown is 249.08891 times too small\": it is 9.81 times too "
                     "small (88.9 against 871.9 Pa); the typed 25.4 is left out of the ratio",
    },
    "ship-fuel-separator": {
        "FuelOil!C28": "\"the value shown is 24000 times too large\": it is 1000 times too "
                       "large (L/h written as m³/h); the 24/23 margin is taken for a unit",
    },
}

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")
HEADNOTE = {stem: [LINE] for stem in ("hotel-dhw-recovery", "rice-column-dryer",
                                      "ship-fuel-separator", "snowmaking-pumping")}
