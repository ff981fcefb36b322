"""review77: what the round's build of the time reports on these books beyond the planted
mistakes, the planted cells it names by another rule or flags for another reason, and its
messages that mislead, each with the reviewer's reason, recorded after reading every finding.
Read by make_books.py when it writes the .expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.

As run by the reviewer (count.py): planted flagged 37/37 (cold store 9/9, leachate 9/9, bridge
deck 9/9, clean steam 10/10), but two of them only by accident: SBR!C38 and Deck!C32 get the
very finding their correct neighbours get (SBR!C37, Deck!C31), and the slip itself (a % used as
a fraction) is named in neither, so by the slip named it is 35/37. Correct formula cells clean
150/155 (cold store 40/40, leachate 36/38, bridge deck 31/34, clean steam 43/43). No crash or
hang; exit status 1 on every book, in text and JSON alike, and the two runs name the same cells
and rules.

The reviewer's variants (probe/probes.py, not counted): the oxygen-to-air line passes with w_O2
(kg/kg) and ρ_N (kg/Nm³) in cells, or with either one typed, and then the % slip is named (100
times too small); typed together, 0.2318·1.293, the /24 is called needless, yet the same line
into Nm³/d without the /24 passes too. Blower power passes with c_p in a cell of kJ/(kg·K) and
fails with 1.005 typed. HEC-22 passes with K_u a pure number and n in a cell of s/m^(1/3),
whether written 5/3, 8/3 or 1.67, 2.67, and the % slip is then named (21 544 times too large);
but with K_u given a wrong unit (m^(1/3)/s) the 1.67, 2.67 form still passes, the ×1000 read as
"an empirical fit's constant carrying [L^(-101/300) T]", while the 5/3, 8/3 form is an error:
decimal exponents let a dimensional error through. Manning's V = (1/n)·R^(2/3)·S^(1/2) passes
with n in s/m^(1/3), and its % slip is named (10 times too large). ρ·A with ρ in a cell into
kN/m is "linear density", never "is a g missing". p_g + 1.013 into bar a passes beside a
declared barometer of 1.002 bar; p_abs − 1.01325 into barg is a warning naming that barometer;
p_g + 14.7 (a psi atmosphere added to bar) is an error, rightly. kW × 0.2843, kW ÷ 3.5 and
kW × 3412/12 000 into TR all pass; R = 0.4615 typed in v = R·T/p passes with a note.
"""

EXTRA = {
    "ammonia-cold-store-frostholm": [
        ("a note on a correct cell: 9.81 read as standard gravity, which it is (H = Δp/(ρ·g))",
         "Plant!C54 gravity-number"),
        ("a note on a correct cell: 500 read as the heat capacity of a volume of water, which "
         "it is (8.33 lb/gal × 60 min/h × 1 Btu/(lb·°F), ASHRAE, from memory)",
         "Plant!C95 trade-constant"),
    ],
    "leachate-sbr-cattersby-moor": [
        ("a note on a correct cell: 8.34 read as the weight of a US gallon of water turning "
         "mgd × mg/L into lb/d, which it is (common practice)", "SBR!C20 trade-constant"),
        ("FLAGGED CORRECT CELL (plumb's limit, and the message misleads): air = O2/24/"
         "(0.2318·1.293·OTE/100), kg O2/d to Nm³/h, with 0.2318 kg O2 per kg air and 1.293 "
         "kg/Nm³ (Perry's 8th ed., from memory). plumb says 'the factor 24 is not needed ... "
         "1/24 times its true value'; the 24 turns per day into per hour, and the same line "
         "into Nm³/d without it passes too (probe C14). With either constant in a cell the "
         "line passes (probe C10, C12, C13)", "SBR!C37 unit-scale"),
        ("a misleading note on a correct cell: 0.2318 read as 'the density of air'; it is "
         "the mass fraction of oxygen in air (kg/kg), the 1.293 beside it being the density",
         "SBR!C37 trade-constant"),
        ("the same misleading note on the planted cell: 0.2318 is the oxygen mass fraction, "
         "not a density", "SBR!C38 trade-constant"),
        ("a note on a correct cell: 9.81 read within ρ·g, which it is (static head on the "
         "jets, 1000·9.81·h)", "SBR!C50 gravity-number"),
        ("a note on a correct cell: 1.293 read as the density of air, which it is (at 0 °C, "
         "101.325 kPa)", "SBR!C58 trade-constant"),
        ("FLAGGED CORRECT CELL (plumb's limit): adiabatic blower power ṁ·c_p·T₁·[(p₂/p₁)^0.2857 "
         "− 1]/η with c_p = 1.005 kJ/(kg·K) typed (common practice); plumb reads the 1.005 as a "
         "bare number and reports [M T^-1 Θ] with no hint that it is c_p, though it knows "
         "1.293 for air's density two rows up. With c_p in a cell of kJ/(kg·K) the line passes "
         "(probe C20)", "SBR!C60 result-unit"),
        ("a note on a correct cell: 9.81 read within ρ·g, which it is (ρ·g·Q·H)",
         "SBR!C69 gravity-number"),
        ("a note on the planted cell, right in itself: 9.81 within ρ·g",
         "SBR!C70 gravity-number"),
        ("a note on a correct cell: 0.433 read as the specific weight of water in psi/ft, "
         "which it is", "SBR!C73 gravity-number"),
        ("a note on a correct cell: 3960 read as one over the specific weight of water, "
         "which it is (hp = gpm·ft/(3960·η), Hydraulic Institute, from memory)",
         "SBR!C74 gravity-number"),
    ],
    "bridge-deck-drainage-lenfold": [
        ("a note on a correct cell: the US rational method C·i·A in cfs, the 1.008 left out "
         "by convention; plumb says so, rightly (HEC-22, from memory)",
         "Deck!C20 trade-constant"),
        ("FLAGGED CORRECT CELL (plumb's limit): HEC-22 kerb-and-gutter flow Q = (K_u/n)·"
         "S_x^1.67·S_L^0.5·T^2.67, K_u = 0.376 in SI (FHWA HEC-22, 3rd ed. (2009), eq. 4-2, "
         "from memory), n typed without a unit as the trade tabulates it; plumb reports "
         "[L^(267/100)] and offers no remedy. With n in a cell of s/m^(1/3) it passes (probe "
         "C32, C33)", "Deck!C31 result-unit"),
        ("FLAGGED CORRECT CELL (plumb's limit): the same HEC-22 equation solved for the "
         "spread T, exponent 0.375 = 1/2.67 (HEC-22, from memory)", "Deck!C33 result-unit"),
        ("FLAGGED CORRECT CELL (plumb's limit): Manning's V = (1/n)·R^(2/3)·S^(1/2) in SI "
         "units (common practice) with n typed without a unit; plumb reports [L^(2/3)]. "
         "With n in a cell of s/m^(1/3) it passes (probe C38)", "Deck!C51 result-unit"),
        ("a note on a correct cell: 9.81 read within ρ·g, which it is (weight of water in "
         "the pipe, 1000·9.81·A)", "Deck!C56 gravity-number"),
    ],
    "clean-steam-ashgarth": [
    ],
}

MISSED = {}

RENAMED = {
    "leachate-sbr-cattersby-moor": {
        "SBR!C34": ("result-unit", "kg/d × kg/L is no volume; the right rule for a density "
                                   "used the wrong way round, and the message is plain"),
        "SBR!C38": ("unit-scale", "FLAGGED BY ACCIDENT: the finding is the same 'factor 24 "
                                  "is not needed' as on the correct SBR!C37; the % used as a "
                                  "fraction is not named (with the constants in cells it is, "
                                  "probe C11)"),
    },
    "bridge-deck-drainage-lenfold": {
        "Deck!C32": ("result-unit", "FLAGGED BY ACCIDENT: the finding is the same "
                                    "[L^(267/100)] as on the correct Deck!C31; the % gradients "
                                    "used as fractions are not named (with n in s/m^(1/3) "
                                    "they are, 21 544 times too large, probe C34)"),
    },
}

MESSAGES = {
    "leachate-sbr-cattersby-moor": {
        "SBR!C38": "'the factor 24 is not needed' is wrong: the 24 is days to hours; the slip "
                   "is the OTE in % used as a fraction",
    },
    "bridge-deck-drainage-lenfold": {
        "Deck!C32": "'computes [L^(267/100)]' says nothing of the % gradients used as "
                    "fractions, the slip that makes the value 21 544 times too large",
        "Deck!C57": "'computes [L^2] (area)' for ρ·A with ρ typed as 1000: true of what it "
                    "reads, but it neither reads the 1000 as the density of water nor asks "
                    "whether a g is missing",
    },
    "clean-steam-ashgarth": {
        "Generator!C84": "the headline (1000 times too large) is right, but 'its inputs give "
                         "numbers in units of 2.77778 (1/0.36) kW' counts the typed 3600, "
                         "100 000 and 100 out of the inputs and is hard to act on: the "
                         "formula gives W",
    },
}

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")
HEADNOTE = {stem: [LINE] for stem in ("ammonia-cold-store-frostholm",
                                      "leachate-sbr-cattersby-moor",
                                      "bridge-deck-drainage-lenfold", "clean-steam-ashgarth")}

# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.
