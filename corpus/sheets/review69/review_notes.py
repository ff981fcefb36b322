"""review69: what plumb (the round's build of the time) reports on these books beyond
the planted slips, the planted cells it misses, and its messages that mislead, each with the
reviewer's reason as an engineer, recorded after reading every finding. Read by make_books.py
when it writes the .expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.

As run by the reviewer (count.py): planted flagged 34/35 (digester 9/9, crushing 9/9, oxygen
8/9, tunnel 8/8); correct formula cells clean 148/150 (digester 40/41, crushing 32/33, oxygen
41/41, tunnel 35/35). Every planted cell plumb flags it names by the planted rule. No crash or
hang; exit status 1 on every book (errors found), in text and JSON alike, and the text and
JSON runs name the same cells, severities and rules.

The reviewer's variants (probe/probes.py, probe/probes.txt; not counted): a rate per 100 m
written 'L/(s·hm)' is read, 'q·L/100' passes and 'q·L' is named 100 times too large, while the
trade's 'L/s per 100 m' and 'L/(s·100 m)' do not read at all (probe/units2.py); Bond written
with the 100 µm reference in a cell, 'W_i·(√(100 µm/P80) − √(100 µm/F80))', passes, as Bond
prints it, '10·W_i·(1/√P80 − 1/√F80)', it is a result-unit error; Metcalf & Eddy's '13.7·
ln(SRT) + 18.9' is a dimensioned-argument error, and written as plumb advises, 'ln(SRT/1 d)',
it is named 100 times too small for its % cell, so the correct formula is flagged either way;
liquid oxygen from gas litres multiplied by the expansion ratio instead of divided is missed
whether the ratio is a cell, 860 typed in, or ρ_l/ρ_g written out (any density ratio is a pure
number), and caught only when the slip leaves a density uncancelled; Nm³ to scf by 35.31 alone
is rightly named for leaving out the reference temperatures (5.7 %), 37.32 folded passes, and
so does 35.31 × 294.26/273.15, a 70 °F base, although plumb's note says its scf is at 60 °F;
'V/Q·24' into d is named (the 24 not needed); plumb's own fix for the mm bore,
'Q·1000/(π/4·D_mm²)', passes and gives the right number; Hazen-Williams with Q in L/s or D in
mm, the 0.433 and the 3960 with a head in metres, and the NFPA 13 form with d in mm are all
errors, rightly.
"""

G = ("a note on a correct cell: 9.81 read as standard gravity, which it is (g_n = 9.80665 "
     "m/s², SI Brochure 9th ed.)")
EXTRA = {
    "digester-chp-hobbs-marsh": [
        ("a note on a correct cell: 1000 in SG = ρ/1000 read as the density of water in kg/m³, "
         "which it is (common practice)", "Digester!C12 trade-constant"),
        ("a note on a correct cell: 8.34 read as the density of water in lb/US gal, which it "
         "is (common practice)", "Digester!C15 trade-constant"),
        ("FLAGGED CORRECT CELL (plumb's limit): volatile solids destroyed V_d = 13.7·ln(SRT) + "
         "18.9 %, SRT in days, as Metcalf & Eddy, 5th ed. (2014), ch. 13 prints it (from "
         "memory); an empirical fit whose logarithm takes the days as a number. plumb's remedy, "
         "'divide by a reference value' (ln(SRT/1 d)), leads to a second false flag, '100 "
         "times too small' for the % cell (probe/probes.py, P5)",
         "Digester!C23 dimensioned-argument"),
        ("two notes on a correct cell: 273.15 read as the reference temperature of the Nm³ "
         "and 101.325 as the reference pressure, which they are (0 °C, 101.325 kPa)",
         "Digester!C41 trade-constant"),
        ("the same note on the planted cell (273.15), beside the error that catches it",
         "Digester!C42 trade-constant"),
        ("a note on a correct cell: 500 read as the heat capacity of a volume of water, which "
         "it is (8.33 lb/gal × 60 min/h × 1 Btu/(lb·°F), ASHRAE, from memory)",
         "Digester!C72 trade-constant"),
    ],
    "crushing-plant-greyscar-edge": [
        ("FLAGGED CORRECT CELL (plumb's limit): Bond's third theory W = 10·W_i·(1/√P80 − "
         "1/√F80), P80 and F80 in µm, W in kWh/t, as Bond (1961) and Wills, 8th ed. (2016), "
         "print it (from memory); the 10 is √(100 µm) and carries units. plumb says only that "
         "the formula computes [L^(3/2) T^-2]; written with the 100 µm in a cell, the same "
         "formula passes (probe/probes.py, P3)", "Plant!C19 result-unit"),
        (G + " (DIN 22101 main resistance)", "Plant!C43 gravity-number"),
        (G + " (lift power ṁ·g·H)", "Plant!C44 gravity-number"),
        ("the same gravity note on the planted cell (9.81 read as g_n, rightly), beside the "
         "error that catches it", "Plant!C46 gravity-number"),
    ],
    "oxygen-vie-larchmont-infirmary": [
        ("a note on a correct cell: 1.01325 read as the reference pressure in bar, which it "
         "is (the demand litres at 1 atm)", "Oxygen!C64 trade-constant"),
    ],
    "tunnel-drainage-hartside-gill": [
        ("a warning on an input cell, not a formula: the groundwater inflow's unit as the "
         "trade writes it, 'L/s per 100 m', does not read, so Tunnel!C9 (q·L/100) is checked "
         "without it; 'L/(s·100 m)' does not read either, while 'L/(s·hm)' does and then the "
         "cell is checked (probe/units2.py, probe/probes.py P1, P2). The warning's guess, "
         "'used as a kinematic viscosity or diffusivity', has the right dimension, L²/T, and "
         "the wrong quantity", "Tunnel!C8 no-unit"),
        ("a note on a correct cell: 10.67 read as the SI Hazen-Williams fit's constant, which "
         "it is (Q in m³/s, D and L in m)", "Tunnel!C26 trade-constant"),
        (G, "Tunnel!C33 gravity-number"),
        ("a note on a correct cell: 3960 read as one over γ_w in gpm·ft/hp, which it is "
         "(common practice)", "Tunnel!C37 gravity-number"),
        ("the same note on the fire main's Hazen-Williams, a correct cell",
         "Tunnel!C42 trade-constant"),
        (G, "Tunnel!C43 gravity-number"),
        ("a note on a correct cell: 4.52 read as the NFPA 13 Hazen-Williams fit's constant, "
         "which it is (gpm, in, psi per ft)", "Tunnel!C48 trade-constant"),
        ("a note on a correct cell: 0.433 read as γ_w in psi/ft, which it is (common "
         "practice)", "Tunnel!C50 gravity-number"),
        (G, "Tunnel!C54 gravity-number"),
    ],
}

MISSED = {
    "oxygen-vie-larchmont-infirmary": {
        "Oxygen!C19": ("(gas litres per day multiplied by the liquid-to-gas expansion ratio, "
                       "860, where it must divide: 740 000 times too large). The ratio of two "
                       "densities is a pure number either way up, so no dimensional check can "
                       "see it; the same slip is missed with 860 typed in or ρ_l/ρ_g written "
                       "out (probe/probes.py, P7, P8, P11)"),
    },
}

RENAMED = {}

MESSAGES = {
    "crushing-plant-greyscar-edge": {
        "Plant!C45": "\"this formula computes [M L T^-1] (momentum)\" for ṁ·H without g: true, "
                     "but no remedy is offered (no 'is a g missing')",
        "Plant!C73": "the remedy \"write (psig + the atmospheric pressure in psi)\" tells the "
                     "engineer to add the atmosphere to a gauge reading, which is the slip "
                     "itself; the fix is to drop the + 14.7 or to write the cell's unit as psia",
    },
    "tunnel-drainage-hartside-gill": {
        "Tunnel!C30": "\"the conversion factor 1000 in this formula is the wrong way round\": "
                      "the /1000 (litres to m³) is right; the slip is the bore in mm. Its fix "
                      "(×1000) does give the right number (probe P18), but it points at the "
                      "wrong term and leaves the bore in mm on a sheet that works in metres",
        "Tunnel!C34": "\"this formula computes [M L T^-1] (momentum)\" for ρ·Q·H/η without g: "
                      "true, but no remedy is offered (no 'is a g missing')",
    },
    "digester-chp-hobbs-marsh": {
    },
}

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")
HEADNOTE = {stem: [LINE] for stem in ("digester-chp-hobbs-marsh", "crushing-plant-greyscar-edge",
                                      "oxygen-vie-larchmont-infirmary",
                                      "tunnel-drainage-hartside-gill")}

# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.


# The cell carries both notes, the reference temperature's and the reference pressure's, and
# the corpus counts both.
EXTRA["digester-chp-hobbs-marsh"].append(
    ("the second note on the same cell: the reference pressure", "Digester!C41 trade-constant"))
