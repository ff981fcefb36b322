"""review42: what plumb reported on these books beyond the planted mistakes, the planted cells it
names by another rule, and its messages that mislead, each with the reviewer's reason (as first
recorded on an older binary at review time, chosen per cell after reading every finding, then
brought up to date with the binary of the day when the books came into the corpus: the 296.8 of
m = p·V/(R·T) (N2!C50), once flagged result-unit, is now read as nitrogen's gas constant with a
note; the planted Pumps!C46, once named result-unit with a message about momentum, is now
reported unit-scale naming the 3600, with a note reading its 9.81 as g; the message on N2!C39
now says that 1.01325 is the atmosphere in bar and 14.6959 in psia, so it is no longer listed
as misleading). Read by make_books.py when it writes the .expect files (python3 make_books.py
--expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.
"""

G_NOTE = "a note on a correct cell: 9.81 read as standard gravity, which it is"
REF_T = ("a note on a correct cell: 273.15 in a ratio of absolute temperatures read as the "
         "reference temperature (0 °C, DIN 1343), which it is")
REF_P = ("a note on a correct cell: 1.01325 (bar) or 101.325 (kPa) in a ratio of pressures read "
         "as the standard atmosphere, the normal state's pressure (DIN 1343), which it is")

EXTRA = {
    "blast-freezer": [
        ("a correct cell plumb flags: the occupancy heat q_p = 272 − 6·t W per person with t the "
         "room temperature in °C (ASHRAE Handbook—Refrigeration (2018) ch. 24, from memory; "
         "at −28 °C it gives 440 W, in line with the handbook's table of 420 W at −25 °C and "
         "rising 30 W per 5 K). The fit's coefficients carry W and W/K; a workbook has no way "
         "to mark them (the notation's '?'), and plumb reads the bare 272 as a °C reading, so "
         "says the formula 'computes [Θ] (temperature)'. A limit of plumb, not a slip",
         "Load!C52 result-unit"),
    ],
    "quarry-sump": [
        (G_NOTE, "Pumps!C31 gravity-number"),
        ("a note on the planted cell C32: 9.81 read as standard gravity, which it is (the slip "
         "is the diameter in mm, reported above)", "Pumps!C32 gravity-number"),
        ("a note on a correct cell: 10.67 of the SI Hazen–Williams formula read as an empirical "
         "fit's constant, which it is (common practice)", "Pumps!C34 trade-constant"),
        (G_NOTE, "Pumps!C36 gravity-number"),
        (G_NOTE, "Pumps!C45 gravity-number"),
        ("a note on the planted cell C46: 9.81 read as standard gravity, which it is (the slip "
         "is the flow C15 in m³/h where m³/s belongs, 3600 too large, reported above)",
         "Pumps!C46 gravity-number"),
        ("a note that misleads, on a correct cell: WHP = gpm × ft × SG / 3960 with SG written "
         "ρ/1000; the 1000 is the density of water in kg/m³ (SG = ρ/ρ_w), not one over g, and "
         "the advice to write 9.80665 there is wrong", "Pumps!C50 gravity-number"),
    ],
    "nitrogen-psa": [
        (REF_P, "N2!C22 trade-constant"),
        (REF_T, "N2!C22 trade-constant"),
        (REF_P, "N2!C43 trade-constant"),
        (REF_T, "N2!C43 trade-constant"),
        (REF_P, "N2!C48 trade-constant"),
        (REF_T, "N2!C48 trade-constant"),
        ("a note on the planted cell C49, as on C48: 1.01325 read as the standard atmosphere",
         "N2!C49 trade-constant"),
        ("a note on the planted cell C49, as on C48: 273.15 read as the reference temperature",
         "N2!C49 trade-constant"),
        ("a note on a correct cell, flagged result-unit by an older build: m = p·V/(R·T) with "
         "p = (p_g + 1.01325) bar × 100 000 Pa/bar, V in m³, T = t + 273.15 K and R = 296.8 "
         "J/(kg·K); plumb reads the bare 296.8 as nitrogen's gas constant, which it is "
         "(8.31446/0.028013, CODATA 2018); 89.0 kg in an 8 m³ tank at 10.01 bar a and 30 °C",
         "N2!C50 trade-constant"),
        (REF_P, "N2!C53 trade-constant"),
        (REF_T, "N2!C53 trade-constant"),
    ],
    "steam-rack": [
        (G_NOTE, "Rack!C64 gravity-number"),
    ],
}

MISSED = {}

RENAMED = {
    "steam-rack": {
        "Rack!C19": ("sum-mismatch", "its note names the slip exactly: 32 is the offset between "
                     "the scales and a difference takes none"),
    },
}

MESSAGES = {
    "nitrogen-psa": {
        "N2!C49": "\"... counts 0.0166667 times as much as 'min'\": right cell; the words are "
                  "hard to read (the value is in hours written as minutes); the fix, multiply "
                  "by 60, is right",
        "N2!C12": "\"'C10' counts 100 times as much as '1'\": right cell; it means the number "
                  "in % is 100 times the fraction; the fix, divide C10 by 100, is right",
    },
    "blast-freezer": {
        "Load!C67": "\"'C65' counts 100 times as much as '1'\": as on N2!C12 of nitrogen-psa",
        "Load!C52": "\"this formula computes [Θ] (temperature)\": on a correct empirical fit "
                    "(W per person from a °C reading); the bare 272 is read as °C; no hint that "
                    "the coefficients carry units",
    },
}
