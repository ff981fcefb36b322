"""review71: what the round's build of the time reports on these books beyond the
planted slips, the planted cells it misses or names by another rule, and its messages that
mislead, each with the reviewer's reason as an engineer, recorded after reading every finding.
Read by make_books.py when it writes the .expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.

As run by the reviewer (count.py): planted flagged 39/39 (hangar 10/10, feed barge 10/10,
asphalt 9/9, laboratory 10/10), three of them under another rule than planted (Hangar!C44,
Hangar!C58, Lab!C43); correct formula cells clean 154/155 (hangar 41/41, feed barge 34/34,
asphalt 39/39, laboratory 40/41). No crash or hang; exit status 1 on every book, in text and
JSON alike, and the two runs name the same cells and rules.

The one correct cell flagged is hot water's density at 70 °C typed as 0.978 kg/L (Lab!C56,
kg/s over kg/L into L/s), read as one over sea water's density and called the wrong way round.
The probes (probe/probes.py, probe/probes.txt) show the other side of the same reading: the
slip 'kg/s × 0.978' into L/s is passed with a note, the right 'kg/s / 0.9718' (80 °C) is
flagged like the book's cell, and the same division by a cell holding 0.978 kg/L is clean.

Messages that mislead (details in MESSAGES and in the EXTRA comment on Lab!C56): three
planted cells are named with the wrong size of the error or the wrong culprit (Hangar!C44
blames the gauge scale where the fault is 3960 in place of 1714, and offers to add the
barometer; Hangar!C62 says 16.67 times, 60000 aside, where the value is 10⁶ too small from a
bore in mm; Lab!C66 says 249 times too large where the value is 9.81 times too large).

Probes (probe/probes.py, 49 variants, each marked by the reviewer): plumb agrees with the mark
on 37. Right but flagged: 0.978 and 0.9718 kg/L (hot water) typed as divisors (a1, a3); Pa/250
into in. w.c. (c3, a rough figure 0.4 % off; a defensible flag); Stefan-Boltzmann with the lid
area typed as 0.8 (h1, h2, h5, h7: 'computes [Θ^4]', while the same with the area in a cell
passes with a note); kW × g/kWh / 840 into L/h (j2, diesel's density typed). Wrong but passed:
kg/s × 0.978 into L/s (a5); SG × 8.345 × SG (e4); K·√(p_bar × 100) (k2, the ×100 under the
root not questioned, where a /60 not needed elsewhere is named); 500·gpm·Δ°F for thermal oil
(o1, water's constant on oil, about twice the duty). Messages on wrong variants that give the
wrong size: m/s × 200 into fpm is called '196.85 times too small' (it is 1.6 % high, d4);
Pa/25.4 is called '249 times too large' (9.81, c4); gpm·Δpsi/3960 is called '1714.29 times too
large, its coefficient 3960 aside' (2.31 too small, b3).
"""

G = ("a note on a correct cell: 9.81 read as standard gravity, which it is (g_n = 9.80665 "
     "m/s², SI Brochure 9th ed.)")
EXTRA = {
    "hangar-foam-skellow-fen": [
        ("a note on a correct cell: 0.0981 read as water's specific weight in bar/m, which it "
         "is (common practice)", "Hangar!C54 gravity-number"),
        ("a note on a correct cell: 0.433 read as water's specific weight in psi/ft, which it "
         "is (common practice)", "Hangar!C55 gravity-number"),
        (G, "Hangar!C57 gravity-number"),
        ("a note on a correct cell: 6.05×10⁵ read as an empirical fit's constant, which it is "
         "(Hazen-Williams in bar/m with L/min and mm, NFPA 13 (2022), from memory)",
         "Hangar!C65 trade-constant"),
        ("a note on a correct cell: 4.52 read as an empirical fit's constant, which it is "
         "(Hazen-Williams in psi/ft with gpm and in, NFPA 13 (2022), from memory)",
         "Hangar!C68 trade-constant"),
    ],
    "feed-barge-skerra-voe": [
        ("a note on a correct cell: 287.05 read as dry air's gas constant in J/(kg·K), which "
         "it is (common practice)", "Barge!C59 trade-constant"),
    ],
    "asphalt-heater-brackenhurst": [
        ("a note on a correct cell: 5.67×10⁻⁸ read as the Stefan-Boltzmann constant, which it "
         "is (CODATA 2018). The probes show the same line flagged as a result-unit error, "
         "'computes [Θ^4]', once the lid area is typed as 0.8 in place of a cell in m² "
         "(probe/probes.py h1, h5, h7)", "Bitumen!C45 trade-constant"),
    ],
    "lab-fume-exhaust-st-aldhelms": [
        ("a note on a correct cell: 1.08 read as air's ρ·c_p in Btu·min/(ft³·h·°F), which it "
         "is (ASHRAE Fundamentals (2021), from memory)", "Lab!C42 trade-constant"),
        ("a note on a correct cell: 287.05 read as dry air's gas constant, which it is",
         "Lab!C47 trade-constant"),
        ("a note on a correct cell: 4.19 read as water's specific heat in kJ/(kg·K), which it "
         "is (common practice)", "Lab!C55 trade-constant"),
        ("FLAGGED CORRECT CELL (plumb's limit, and a message that misleads): LPHW flow in L/s "
         "= ṁ/ρ with water at 70 °C, 0.978 kg/L (the 80/60 °C circuit's mean; 977.8 kg/m³ "
         "from steam tables, from memory). plumb reads 0.978 as one over sea water's density "
         "(it knows water's only between 0 and 30 °C) and says the factor is 'the wrong way "
         "round' and 'needs a multiplication': following it gives 0.256 L/s in place of 0.268 "
         "L/s, 4.4 % low. With 0.978 in a cell written kg/L the same division is clean, and "
         "the slip '×0.978' is passed with a note (probe/probes.py a1 to a5). Since the "
         "round's fixes plumb reads 0.978 as hot water's density (958 to 995.65 kg/m³, 30 to "
         "100 °C) and gives a note only",
         "Lab!C56 trade-constant"),
    ],
}

MISSED = {}

RENAMED = {
    "hangar-foam-skellow-fen": {
        "Hangar!C44": ("offset-scale", "gpm × psig/3960 is called a gauge reading that cannot "
                                       "be multiplied; the same gpm × psig over 1714 two rows "
                                       "up (Hangar!C43) is clean, so the fault is the factor"),
        "Hangar!C58": ("result-unit", "ρ·h without g is named as an areal density, which is "
                                      "true"),
    },
    "lab-fume-exhaust-st-aldhelms": {
        "Lab!C43": ("result-unit", "1.08·cfm·ΔT with ΔT in K; the message says 1.08 wants "
                                   "°F and that in K it would be about 1.944, which is right"),
    },
}

MESSAGES = {
    "hangar-foam-skellow-fen": {
        "Hangar!C44": "\"'C37' is on the psig scale, whose zero is arbitrary, so it cannot be "
                      "multiplied\", with the advice to write (C37 + 14.5908): wrong culprit "
                      "and a wrong remedy. A pump's power takes the pressure it adds, never "
                      "the absolute pressure; the slip is 3960 (hp from gpm and ft of head) "
                      "used with psi, where 1714 belongs: 2.31 times too small",
        "Hangar!C58": "\"this formula computes [M L^-2] (areal density)\" for ρ·h: true, but "
                      "no remedy is offered (no 'is g missing?')",
        "Hangar!C62": "\"its units are 16.6667 (1/0.06) times too small for it, its coefficient "
                      "60000 aside\" and \"60000 ... is not the factor these units need\": the "
                      "60000 is right (L/min to m³/s, as in Hangar!C61, which is clean); the "
                      "fault is the bore in mm squared into m², and the value shown is 10⁶ "
                      "times too small, a figure the message never gives",
    },
    "lab-fume-exhaust-st-aldhelms": {
        "Lab!C66": "\"the value shown is 249.08891 times too large\" for Pa/25.4 into in. w.c.: "
                   "the value shown (33.5) is 9.81 times the right one (3.41); 249 is what it "
                   "would be with no factor at all",
    },
}

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")
HEADNOTE = {stem: [LINE] for stem in ("hangar-foam-skellow-fen", "feed-barge-skerra-voe",
                                      "asphalt-heater-brackenhurst",
                                      "lab-fume-exhaust-st-aldhelms")}

# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.


# Two findings on one cell are counted twice by the corpus: Bitumen!C46, the radiation loss
# with both °C readings raised to the fourth power, is told so for each reading.
EXTRA["asphalt-heater-brackenhurst"].append(
    ("the second reading of the same planted cell raised to a power on the °C scale",
     "Bitumen!C46 offset-scale"))
