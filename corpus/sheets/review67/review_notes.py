"""review67: what plumb (the round's build of the time) reports on these books beyond
the planted mistakes, the planted cells it misses or names by another rule, and its messages that
mislead, each with the reviewer's reason, recorded after reading every finding. Read by
make_books.py when it writes the .expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.

As run by the reviewer (count.py): planted flagged 39/39 (winery 10/10, rendering 10/10, ORC
10/10, bascule 9/9); correct formula cells clean 160/164 (winery 37/37, rendering 41/43, ORC
41/42, bascule 41/42). No crash or hang; exit status 1 on every book (errors found), in text and
JSON alike, and the text and JSON runs name the same cells. Three planted cells are named by
another rule than the one planted (RENAMED below), each with a message that points at the fault.

The reviewer's diagnostic variants (probe/probes.py, results in probe/results.txt, not
counted): 71 variants, 60 where plumb's verdict agrees with the engineer's, 10 correct forms
it fails and 1 wrong form it passes:
- rad/s and rpm: '×2π/60', '×60/(2π)', '×60/2/π', '×9.549', '×0.1047', '×60/6.2832' and
  '×30/3.1416' pass, but the exact '×π/30' (rpm to rad/s) and '×30/π' or '/π×30' (rad/s to
  rpm) fail, each said to be 60 times off (rad-s-2, rpm-3, rpm-7); the missing 2π ('×60',
  '/60') is named rightly, with a good message;
- a range in °F from two readings converted in line, '(t₂·1.8 + 32) − (t₁·1.8 + 32)', fails
  into Δ°F ('1.8 times too small', and with the brackets left off '1.8 is not needed') yet
  passes into K, where it is 1.8 times too large: the one wrong form passed (degF-diff-6); with
  the two °F readings in cells of their own the difference passes into Δ°F and fails into K,
  both rightly (degF-cells);
- the US heat check '500·gpm·Δ°F' passes; times a hot-water density ratio typed as 'ρ/999'
  it fails (hot-500-1, -6), though 'ρ/999' alone passes into '-', '×0.9688' passes, '8.34·60·
  gpm·Δ°F·ρ/999' passes (its note calling 8.34 'the specific heat of water') and 'ρ/1000'
  passes (its note calling 500 'the specific heat of water'); with 999 kg/m³ in a cell it
  passes;
- the cooling tower's evaporation rule, '0.00085·gpm·range(°F)', fails in every form tried
  (also '0.1 %/°F × 0.85' and the metric '0.00153·m³/h·range(K)'); with 0.00085 in a cell of
  '1/Δ°F' it passes;
- passes and fails as an engineer would: a gauge plus the site barometer (cell or 1.013) into
  bar a, '14.7' added to barg refused; kW to TR by 0.2843, 3412/12000 and 3.52 (3.156 refused);
  ppm by 10⁻⁶ or 10⁶ (by 10⁴ refused); °Brix × density × 10 into g/L; kW to MMBtu/h by /293.07
  and 3412/10⁶; lb/h by /2.205 or ×0.4536; COS of a degree cell through RADIANS, ×π/180 or
  /57.3 (bare, and ×180/π, refused with a good message); t·m without g into t·m, and into kN·m
  refused; the imbalance % as '1 − e/100' and '(100 − e)/100' ('1 − e', '1 − e/1000' and
  '100 − e' refused). One message there misleads: 'p_g·14.5 + p_b' (a barometer in bar added
  to psi) is blamed on the 14.5 ('not needed'), which the psia cell needs.
"""

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")

EXTRA = {
    "winery-cellar-corbel-ridge": [
        ("a note on a correct cell: 4.19 read as the specific heat of water, which it is "
         "(c_p of the glycol over water's)", "Cellar!C43 trade-constant"),
        ("a note on a correct cell: 500 read as the heat capacity of a volume of water, which it "
         "is (8.33 lb/gal × 60 min/h × 1 Btu/(lb·°F), ASHRAE, from memory); the glycol's SG and "
         "c_p ratio beside it pass", "Cellar!C44 trade-constant"),
        ("a note on a correct cell: 8.34 read as the density of water in lb/US gal, which it is",
         "Cellar!C47 trade-constant"),
    ],
    "rendering-cooker-fenwick-moss": [
        ("FLAGGED CORRECT CELL (plumb's limit): the cooling water range in °F from the two "
         "readings converted in line, (t_o·1.8 + 32) − (t_i·1.8 + 32) = 18 Δ°F, which is right; "
         "plumb says the value is 1.8 times too small, and the same formula into K passes "
         "(probe/results.txt, degF-diff)", "Cooker!C53 unit-scale"),
        ("a note on a correct cell: 500 read as the heat capacity of a volume of water, which it "
         "is", "Cooker!C58 trade-constant"),
        ("a note on a correct cell: 2.31 read as one over the specific weight of water, ft per "
         "psi, which it is", "Cooker!C62 gravity-number"),
        ("a note on a correct cell: 3960 read as one over the specific weight of water (hp from "
         "gpm and ft), which it is", "Cooker!C65 gravity-number"),
        ("a note on a correct cell: 0.433 read as the specific weight of water, psi per ft, "
         "which it is", "Cooker!C67 gravity-number"),
        ("FLAGGED CORRECT CELL (plumb's limit): the cooling tower evaporation rule of thumb "
         "E(gpm) = 0.00085·gpm·range(°F) (Perry's Chemical Engineers' Handbook, 8th ed., sect. "
         "12, from memory; about 0.1 % of the flow per °F of range, 85 % of the heat rejected "
         "by evaporation); the 0.00085 carries 1/°F; with it in a cell of '1/Δ°F' the same "
         "passes (probe/results.txt, tower-evap)", "Cooker!C72 result-unit"),
    ],
    "orc-engine-saltcote-fen": [
        ("FLAGGED CORRECT CELL (plumb's limit): the US heat check 500·gpm·Δ°F scaled to hot "
         "water by the density ratio ρ/999 (999 kg/m³, water near 60 °F, where the 500 is "
         "taken; ASHRAE, from memory); 500·gpm·Δ°F alone, ρ/999 alone and the same with 999 "
         "in a cell all pass (probe/results.txt, hot-500)", "ORC!C18 result-unit"),
        ("a note on a correct cell: 287.05 read as the gas constant of dry air, which it is",
         "ORC!C70 trade-constant"),
    ],
    "bascule-drive-pellow-quay": [
        ("a note on a correct cell: 9.81 read as standard gravity, which it is (t·m × g gives "
         "kN·m)", "Drive!C16 gravity-number"),
        ("a note on a correct cell: 9.81 read as standard gravity, which it is",
         "Drive!C55 gravity-number"),
        ("FLAGGED CORRECT CELL (plumb's limit): rpm to rad/s by π/30, ω = π·n/30, exact and "
         "common practice; plumb says the value is 60 times too large, while 2π/60 and 1/9.549 "
         "pass (probe/results.txt, rad-s)", "Drive!C66 unit-scale"),
        ("a note on a correct cell: 5252 read as 33 000/(2π), which it is", "Drive!C68 "
                                                                             "trade-constant"),
    ],
}

MISSED = {}

RENAMED = {
    "rendering-cooker-fenwick-moss": {
        "Cooker!C52": ("sum-mismatch", "+32 on a °F difference: the message says a difference "
                                       "takes no offset, 1 K = 1.8 Δ°F, which is right"),
        "Steam!F8": ("unit-scale", "°C to °F by the °F to °C formula: the message says the "
                                   "conversion runs the wrong way and gives =B8*1.8+32, right"),
    },
    "bascule-drive-pellow-quay": {
        "Drive!C17": ("result-unit", "tonne-metres written as kN·m: named as [M L] against "
                                     "torque, which is true"),
    },
}

MESSAGES = {
    "bascule-drive-pellow-quay": {
        "Drive!C17": "\"this formula computes [M L]\" for t·m written as kN·m: true, but no "
                     "remedy is offered; 'a g is missing' is the fault and the fix",
    },
}

HEADNOTE = {stem: [LINE] for stem in ("winery-cellar-corbel-ridge",
                                      "rendering-cooker-fenwick-moss",
                                      "orc-engine-saltcote-fen", "bascule-drive-pellow-quay")}

# Messages on flagged correct cells that mislead (kept here, as they have no planted line):
# Cooker!C53 "its inputs give numbers in units of 1.8 Δ°F ... 1.8 times too small": the value
#   18 Δ°F is right, and the remedy would make it wrong;
# Drive!C66 "its inputs give numbers in units of 1/60 rad/s ... 60 times too large": π/30 is
#   the whole conversion, 2π/60 reduced;
# ORC!C18 "differs in dimension ... [M T^-1 Θ]": names neither the 500 nor the 999 typed as a
#   density, where the note on 500·gpm·Δ°F alone reads the 500 rightly;
# Cooker!C72 "computes [L^3 T^-1 Θ]": true of the bare numbers, but it does not say that the
#   coefficient 0.00085 carries 1/°F and belongs in a cell of that unit (which passes).
MISLEADING_ON_CORRECT = {
    "rendering-cooker-fenwick-moss": ["Cooker!C53", "Cooker!C72"],
    "orc-engine-saltcote-fen": ["ORC!C18"],
    "bascule-drive-pellow-quay": ["Drive!C66"],
}

# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.


# Later in the same round plumb read 30 beside π with a speed in rpm as 60 ÷ 2, the 2 of a
# revolution's 2π: Drive!C66, ω = π·n/30, is clean with that note.
def _drop(table, stem, *lines):
    table[stem] = [e for e in table[stem] if e[1] not in lines]


_drop(EXTRA, "bascule-drive-pellow-quay", "Drive!C66 unit-scale")
EXTRA["bascule-drive-pellow-quay"].append(
    ("a note on a correct cell: 30 read as 60 ÷ 2 beside π, the 2π/60 of rpm to rad/s, which it "
     "is", "Drive!C66 trade-constant"))
MISLEADING_ON_CORRECT["bascule-drive-pellow-quay"].remove("Drive!C66")
if not MISLEADING_ON_CORRECT["bascule-drive-pellow-quay"]:
    del MISLEADING_ON_CORRECT["bascule-drive-pellow-quay"]
