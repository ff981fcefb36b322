"""review53: what plumb (the reviewer's binary) reports on these books beyond the
planted mistakes, the planted cells it names by another rule, and its messages that mislead,
each with the reviewer's reason, recorded after reading every finding. Read by make_books.py
when it writes the .expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.

As run by the reviewer: planted flagged 36/36; correct formula
cells clean 131/141 (medical air 35/35, district heating 36/36, sprinklers 33/36, crude
terminal 27/34). No planted cell is missed. None of the ten flagged correct cells was the
reviewer's mistake (each re-derived below, value checked against a second route where one
exists). One correct cell was tightened by the reviewer on re-reading, not because plumb
flagged it: Design!C15, K_US = K/14.41, now /14.42 (3.78541 L/gal × √14.5038 psi/bar = 14.416;
14.41 was cut, not rounded; plumb passed both).

Since then five of the ten flagged correct cells are clean (136/141): the sprinklers' pressure
from its K-factor (Design!C20), the US Hazen-Williams form fed from SI cells (Lines!J6, J8), the
mean temperature taken to °F in one cell (Tank!C42) and the pump's discharge gauge pressure from
a friction loss and a column (Tank!C69).
"""

G = ("a note on a correct cell: 9.81 read as standard gravity, which it is (g_n = 9.80665 "
     "m/s², SI Brochure 9th ed.)")
WALTHER = ("a correct cell plumb flags: ASTM D341's log log(ν + 0.7) = A − B·log T (from memory), "
           "the standard's own form, with ν in cSt and T in K; the logarithms of a viscosity and "
           "of an absolute temperature are taken in those stated units. By the letter of a "
           "dimensional check a logarithm wants a ratio, and the note's advice (divide by a "
           "reference value) is sound; but a workbook cell has no way to mark a unit-bound "
           "formula as the notation's ? does, so every Walther cell stays an error")
EXTRA = {
    "medical-air-plant": [
        ("a note on a correct cell: 273.15 read as the normal reference temperature in the "
         "ratio (t_r + 273.15)/273.15, which it is (DIN 1343)", "Plant!C32 trade-constant"),
        ("a note on a correct cell: 519.67 °R read as the standard reference temperature "
         "(60 °F) in ratio with (t_F + 459.67), which it is", "Plant!C37 trade-constant"),
        ("a note on a correct cell: 243.04 read as the Magnus fit's constant in °C, the fit "
         "solved for the dew point, which it is (Alduchov & Eskridge (1996), from memory)",
         "Plant!C45 trade-constant"),
        ("a note on a correct cell: 1.2 read as ρ·c_p of air in kJ/(m³·K), which it is "
         "(ASHRAE Fundamentals (2017) ch. 1, from memory)", "Plant!C54 trade-constant"),
    ],
    "dh-branch-b7": [
        (G, "Branch!C42 gravity-number"),
    ],
    "car-park-sprinklers": [
        ("a note on a correct cell: 4.52 read as an empirical fit's constant, which it is "
         "(Hazen-Williams's for psi/ft from gpm and inches, the cells converted by 3.785 and "
         "25.4)", "Lines!J6 trade-constant"),
        ("the same on the DN80 run", "Lines!J8 trade-constant"),
        ("a note on a correct cell: 9.81 read as γ_w in kN/m³, which it is (common practice)",
         "Design!C35 gravity-number"),
        ("a note on a correct cell: 6.05 (×10⁵) read as the SI Hazen–Williams fit's constant, "
         "which it is (EN 12845 (2015), from memory)", "Lines!G6 trade-constant"),
        ("a note on a correct cell: as Lines!G6", "Lines!G7 trade-constant"),
        ("a note on a correct cell: as Lines!G6", "Lines!G8 trade-constant"),
    ],
    "crude-tank-heating": [
        ("a warning on an input: °API is not a unit plumb reads; fair, since API gravity is no "
         "multiple of a unit (SG = 141.5/(°API + 131.5)), though the advice 'measure °API = "
         "<size> <known unit>' cannot express it; '-' would do", "Tank!C7 no-unit"),
        ("a note on a correct cell: 999.0 read as the density of water in kg/m³, which it is "
         "(999.0 kg/m³ at 60 °F, from memory)", "Tank!C9 trade-constant"),
        ("a correct cell plumb flags: α_15 = K_0/ρ_15² with K_0 = 613.9723 for crude oils, API "
         "MPMS 11.1 Table 54A (from memory); K_0 carries kg²/(m⁶·K), typed bare as the "
         "standard prints it. The finding is true to the letter (a dimensioned constant typed "
         "as a number), but unlike Hazen–Williams's 6.05×10⁵ it is not recognised as a fit "
         "constant and the message gives no hint of the remedy (K_0 in a cell with its unit)",
         "Tank!C19 result-unit"),
        (WALTHER + " (four findings on this cell: ν_1 + 0.7, ν_2 + 0.7, T_2, T_1)",
         "Tank!C28 dimensioned-argument"),
        ("the second of C28's four", "Tank!C28 dimensioned-argument"),
        ("the third of C28's four", "Tank!C28 dimensioned-argument"),
        ("the fourth of C28's four", "Tank!C28 dimensioned-argument"),
        (WALTHER + " (two findings: ν_1 + 0.7 and T_1)", "Tank!C29 dimensioned-argument"),
        ("the second of C29's two", "Tank!C29 dimensioned-argument"),
        (WALTHER + " (one finding: T at the storage temperature)",
         "Tank!C30 dimensioned-argument"),
        ("a planted cell's extra findings, beside its right one (offset-scale on the °C "
         "readings): the same two Walther logarithms of cSt as on C28",
         "Tank!C31 dimensioned-argument"),
        ("the second of those two", "Tank!C31 dimensioned-argument"),
        ("the planted cell's second °C reading, reported as its first is", "Tank!C31 offset-scale"),
        ("a correct cell plumb flags: Cragoe's c_p = (0.388 + 0.00045·t_°F)/√SG Btu/(lb·°F) "
         "(US Bureau of Standards Misc. Pub. 97 (1929), from memory) is a linear fit on the °F "
         "scale, as Magnus's fit is on the °C scale (which plumb accepts); the message calls a "
         "specific-heat expression 'on the °F scale' and its notes (gas laws, a rise) do not "
         "apply. 0.460 Btu/(lb·°F) = 1.93 kJ/(kg·K), in the range of crude oils",
         "Tank!C43 offset-scale"),
        (G, "Tank!C68 gravity-number"),
        (G, "Tank!C69 gravity-number"),
        (G, "Tank!C77 gravity-number"),
    ],
}

MISSED = {}

RENAMED = {
    "car-park-sprinklers": {
        "Design!C44": ("offset-scale", "flagged, but for the wrong reason: the same Q·p_g/(600·η) "
                                       "passes in C43; with 60 in place of 600 plumb no longer "
                                       "reads the pump formula and blames the gauge pressure, "
                                       "so the 10 times too large is never named"),
        "Design!C45": ("offset-scale", "flagged, but for the wrong reason, as C44: η in % used "
                                       "as a fraction is never named"),
        "Lines!J7": ("result-unit", "flagged, but by the same rule that flags the correct "
                                    "J6 and J8 ([1] there, [L^(-487/100)] here): the finding "
                                    "does not tell the slip (the bore in mm in the US form) "
                                    "from the correct cells beside it"),
    },
}

MESSAGES = {
    "dh-branch-b7": {
        "Branch!C35": "\"the conversion factor 1000 in this formula is the wrong way round\" "
                      "for =q/1000/(π·d_mm²/4): the 1000 is the L-to-m³ conversion and is "
                      "right; the slip is the bore left in mm. Multiplying by 1000 does give "
                      "the right number (10⁶ folded), but the words blame the good factor",
    },
    "car-park-sprinklers": {
        "Design!C44": "\"'C37' is on the bar(g) scale ... cannot be multiplied\", with notes on "
                      "suction pressure and gas laws; the correct C43 multiplies the same "
                      "gauge pressure and passes; the 60 for 600 is not mentioned",
        "Design!C45": "as Design!C44; the % used as a fraction is not mentioned",
        "Lines!J7": "\"this formula computes [L^(-487/100)]\": an engineer cannot act on it, "
                    "and the correct rows get the same rule",
    },
    "crude-tank-heating": {
        "Tank!C63": "\"the conversion factor 1000 in this formula is the wrong way round\" for "
                    "Re = v·d_mm/1000/ν_cSt: the 1000 is the bore's mm to m and is right; the "
                    "slip is the cSt not converted (×10⁻⁶). Multiplying by 1000 gives the right "
                    "number (10³·10⁻⁶ folded), but the words blame the good factor",
    },
}

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")
HEADNOTE = {stem: [LINE] for stem in ("medical-air-plant", "dh-branch-b7", "car-park-sprinklers",
                                      "crude-tank-heating")}
