"""review51: what plumb reports on these books beyond
the planted mistakes, the planted cells it misses, the planted cells it names by another rule,
and its messages that mislead, each with the reviewer's reason, recorded after reading every
finding (the mass-weighted mean =SUMPRODUCT(C6:C9,D6:D9)/SUM(C6:C9) in °C, which the
reviewer's binary flagged as an offset-scale error, is now read as a mean of readings and
passes). Read by make_books.py when it writes the .expect files (python3 make_books.py
--expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.

Two of the reviewer's own cells were wrong as first written and were fixed after plumb flagged
them (the fix is in make_books.py): Oxygen!C41, PSA electricity Nm³/d × kWh/Nm³ written 'kWh'
where it gives kWh/d; Pipeline!C30, pumping days from a daily fill written 'm³' (and its inputs
't' and 'h') where they are m³/d, t/d and h/d.
"""

G = ("a note on a correct cell: 9.81 read as standard gravity, which it is (g_n = 9.80665 "
     "m/s², SI Brochure 9th ed.)")
GW = ("a note on a correct cell: 9.81 beside a specific gravity read as γ_w in kN/m³, which "
      "it is (ρ_w·g_n = 9.81 kN/m³, common practice)")
EXTRA = {
    "deicing-truck-heater": [],
    "ras-oxygen-pumping": [
        (G, "Oxygen!C54 gravity-number"),
        ("a note on a correct cell: 367 read as 1/γ_w in m³/h·m per kW, which it is "
         "(Hydraulic Institute, from memory)", "Oxygen!C58 gravity-number"),
        ("a note on a correct cell: 3960 read as 1/γ_w in gpm·ft per hp, which it is "
         "(Hydraulic Institute, from memory)", "Oxygen!C59 gravity-number"),
        ("a note on a correct cell: 8760 read as the hours in a year, which it is",
         "Oxygen!C60 trade-constant"),
        ("a note on a planted cell, beside its error: 8760 read as the hours in a year, which "
         "it is", "Oxygen!C61 trade-constant"),
    ],
    "winery-must-chiller": [],
    "dredge-slurry-pipeline": [
        ("a note on a correct cell: 1000 read as the density of water in kg/m³, which it is "
         "(ρ_s = S_s·ρ_w)", "Pipeline!C19 trade-constant"),
        (G, "Pipeline!C33 gravity-number"),
        (GW, "Pipeline!C42 gravity-number"),
        (GW, "Pipeline!C50 gravity-number"),
        (GW, "Pipeline!C53 gravity-number"),
        ("a note on a planted cell, beside its error: 9.81 beside a specific gravity read as "
         "γ_w in kN/m³, which it is (common practice)", "Pipeline!C54 gravity-number"),
        (G, "Pipeline!C59 gravity-number"),
    ],
}

MISSED = {
    "dredge-slurry-pipeline": {
        "Pipeline!C40": "(head of mixture to head of water divided by the mixture's specific "
                        "gravity, 1.64 times too small): both heads are in m and S_m is a pure "
                        "number, so no dimensional check can see it; the README's specific "
                        "gravity rule covers only the water numbers (2.31, 0.433, 3960)",
    },
}

RENAMED = {
    "deicing-truck-heater": {
        "Heater!C26": ("sum-mismatch", "with a good message: 32 is the scales' offset and a "
                                       "difference takes none"),
        "Fluid!C8": ("offset-scale", "flagged, but the headline (off by the scales' zeros) "
                                     "misstates a 1.8 divided where it multiplies; the note "
                                     "gives the right formula"),
    },
    "dredge-slurry-pipeline": {
        "Pipeline!C60": ("result-unit", "flagged, but as [L^(1/2)]: with D in mm the 9.81 is "
                                        "no longer read as g, so the finding points at a "
                                        "missing g rather than the mm"),
    },
}

MESSAGES = {
    "deicing-truck-heater": {
        "Fluid!C8": "\"this formula gives a value on the °C scale ... off by the difference of "
                    "the scales' zeros\" for =B8/1.8+32: the 32 is there; the 1.8 divides "
                    "where it should multiply (value 13.4 °F where -28.3 °F is right). The same "
                    "binary says it plainly for =(C23-32)/1.8 (\"runs the wrong way\")",
    },
    "dredge-slurry-pipeline": {
        "Pipeline!C60": "\"this formula computes [L^(1/2)]\" for Durand's √(2·9.81·D_mm·...): "
                        "an engineer would hunt for a missing g; the slip is the mm (√1000 too "
                        "large), which the message does not name",
    },
}

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")
HEADNOTE = {stem: [LINE] for stem in ("deicing-truck-heater", "ras-oxygen-pumping",
                                      "winery-must-chiller", "dredge-slurry-pipeline")}
