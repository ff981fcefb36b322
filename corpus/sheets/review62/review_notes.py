"""review62: what plumb (the round's build of the time) reports on these books beyond the
planted mistakes, the planted cells it names by another rule, and its messages that mislead,
each with the reviewer's reason, recorded after reading every finding. Read by make_books.py
when it writes the .expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.

As run by the reviewer (count.py): planted flagged 38/38 (chilled water 9/9, fermenter 10/10,
quarry dewatering 9/9, heat pump 10/10); correct formula cells clean 146/146 (39/39, 36/36,
35/35, 36/36). No crash or hang; exit status 1 on every book (errors found), text and JSON
alike; the JSON findings match the text ones cell for cell.

The reviewer's diagnostic variants (probe/probe2.py, not counted): '=t+273.15' into °F is named
unit-scale '1.8 times too small', while '=(t+273.15)*1.8' into °F is named offset-scale rightly
(on the Rankine scale, zeros 255.372 K apart) and '=(t+273.15)*1.8-459.67' into °F is clean; the
CO2 gas-law cell draws the same note whether written '/44.01*8.314', '*8.314/44.01' or
'*0.1889', and with '/44' the note names 44 as 'one over the gas constant of carbon dioxide'.
A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.
"""

G = ("a note on a correct cell: 9.81 read as standard gravity, which it is (g_n = 9.80665 "
     "m/s², SI Brochure 9th ed.)")
W = ("a note on a correct cell: {n} read as the heat capacity of a volume of water in the "
     "units around it, which it is ({what}, common practice)")
EXTRA = {
    "chw-plant-st-aldric": [
        (W.format(n="4.19", what="4.19 kJ/(L·K) in Q(kW) = 4.19·q(L/s)·ΔT(K)"),
         "Plant!C14 trade-constant"),
        (W.format(n="500", what="500 Btu/(h·gpm·°F) in Q(Btu/h) = 500·gpm·ΔT(°F)"),
         "Plant!C15 trade-constant"),
        ("a note on a correct cell: 24 read as one over water's ρ·c_p in TR per gpm·°F, which "
         "it is (12 000/500, TR = gpm·ΔT(°F)/24, common practice)", "Plant!C18 trade-constant"),
        (G, "Plant!C45 gravity-number"),
    ],
    "fermenter-marrow-flats": [
        ("a note on a correct cell, its words wrong: '8.314 is read as the gas constant of "
         "carbon dioxide ... R_CO2 = R/M_CO2 comes to 8.313 to 8.316 there'. 8.314 is the "
         "universal R in kJ/(kmol·K) (CODATA 2018) and the /44.01 beside it turns kg into kmol; "
         "R_CO2 = R/M_CO2 is 0.1889 kJ/(kg·K). The cell is right and stays clean",
         "Fermenter!C25 trade-constant"),
    ],
    "dewatering-brackenhurst": [
        ("a note on a correct cell: 10.67 read as an empirical fit's constant carrying "
         "L^-0.686·T^1.852, which it is (Hazen–Williams in SI, m and m³/s, AWWA M11, from "
         "memory)", "Dewatering!C30 trade-constant"),
        (G, "Dewatering!C32 gravity-number"),
        (G, "Dewatering!C36 gravity-number"),
        (G + ", on the planted cell, beside the error that catches it",
         "Dewatering!C37 gravity-number"),
        (G, "Dewatering!C46 gravity-number"),
        (G, "Dewatering!C51 gravity-number"),
        (G, "Dewatering!C54 gravity-number"),
    ],
    "heat-pump-ashgrove": [
        (W.format(n="4.19", what="4.19 kJ/(L·K) in q(L/s) = Q(kW)/(4.19·ΔT(K))"),
         "HeatPump!C20 trade-constant"),
        (W.format(n="500", what="500 Btu/(h·gpm·°F)"), "HeatPump!C23 trade-constant"),
        (G, "HeatPump!C43 gravity-number"),
        (G, "HeatPump!C45 gravity-number"),
    ],
}

MISSED = {}

RENAMED = {
    "fermenter-marrow-flats": {
        "Fermenter!C46": ("sum-mismatch", "'cannot add 32 to C32*1.8: their dimensions "
                                          "differ'; its note says it well: a difference takes "
                                          "no offset, 1 K = 1.8 Δ°F"),
        "Glycol!E9": ("unit-scale", "'the value shown is 1.8 times too small': a kelvin "
                                    "value in a °F column is off by scale and zero together"),
    },
}

MESSAGES = {
    "fermenter-marrow-flats": {
        "Glycol!E9": "\"the value shown is 1.8 times too small ... its inputs give numbers in "
                     "units of 1.8 °F\" for '=D9+273.15' in a °F column: misleading. The cell "
                     "shows 239.15 (kelvins) where -29.2 °F belongs; times 1.8 gives 430.5, "
                     "degrees Rankine, which plumb itself names offset-scale when written "
                     "'=(D9+273.15)*1.8' (probe/probe2.py). The fix is D9*1.8+32",
    },
    "chw-plant-st-aldric": {
        "Meter!G9": "\"its inputs give numbers in units of 1000 -\": the dash, typed as the "
                    "dimensionless unit, reads oddly in the sentence; 'a thousand times the "
                    "ratio' or 'MWh per kWh' would say it",
    },
}

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")
HEADNOTE = {stem: [LINE] for stem in ("chw-plant-st-aldric", "fermenter-marrow-flats",
                                      "dewatering-brackenhurst", "heat-pump-ashgrove")}


# Later in the same round plumb told a °C reading made absolute in a °F column the conversion
# between the scales: Glycol!E9 is named offset-scale, with '=D9*1.8 + 32' as its advice.
RENAMED["fermenter-marrow-flats"]["Glycol!E9"] = (
    "offset-scale", "'°F' is on the °F scale but 'D9+273.15' is on the absolute scale (K); the "
    "note says 273.15 takes a reading to kelvins from °C: write D9*1.8 + 32")
MESSAGES["fermenter-marrow-flats"].pop("Glycol!E9", None)
