"""review66: what plumb (the round's build of the time) reports on these books beyond the planted
mistakes, the planted cells it misses or names by another rule, and its messages that mislead,
each with the reviewer's reason, recorded after reading every finding. Read by make_books.py when
it writes the .expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.

As run by the reviewer (count.py): planted flagged 38/39 (ammonia 9/9, water balance 10/10,
meter station 9/10, school solar 10/10); correct formula cells clean 156/160 (ammonia 42/42,
water balance 38/38, meter station 39/40, school solar 37/40). No crash or hang; exit status 1
on every book, in text and JSON alike, and the two runs name the same cells and rules.

Probes (probe/, not counted): p1.py and p2.py try variants of the flagged and missed cells and
folded or rounded factors; p3.py and p4.py a gauge reading plus a typed site barometer in a
workbook; p5.plumb the same in the notation. What they show is in the report and beside each
entry below.
"""

EXTRA = {
    "ammonia-brackenford-creamery": [
        ("a note on a correct cell: 500 read as the heat capacity of a volume of water, which it "
         "is (8.33 lb/gal × 60 min/h × 1 Btu/(lb·°F), ASHRAE, from memory)",
         "Load!C30 trade-constant"),
    ],
    "water-balance-cutters-flat": [
        ("a note on a correct cell: 9.81 read as standard gravity, which it is",
         "Water!C60 gravity-number"),
        ("a note on a correct cell: 367 read as one over γ_w in m³/h, m and kW, which it is",
         "Water!C62 gravity-number"),
        ("a note on a correct cell: 3960 read as one over γ_w in gpm, ft and hp, which it is",
         "Water!C65 gravity-number"),
        ("a note on the planted Water!C66 (its error is recorded above): 3960 read as one over "
         "γ_w", "Water!C66 gravity-number"),
        ("a note on a correct cell: 9.81 read as standard gravity (ρ in t/m³ gives kW with no "
         "/1000, and plumb lets it)", "Water!C71 gravity-number"),
        ("a note on the planted Water!C72 (its error is recorded above): 9.81 read as standard "
         "gravity", "Water!C72 gravity-number"),
        ("a note on a correct cell: 9.81 read as standard gravity (t/m³ × m/s² × m gives kPa)",
         "Water!C73 gravity-number"),
        ("a note on a correct cell: 0.433 read as water's specific weight in psi/ft, SG "
         "multiplying it as it should", "Water!C77 gravity-number"),
    ],
    "meter-station-harrow-moss": [
        ("a note on a correct cell, flagged until the cell's unit was weighed with the number "
         "added: the meter gauge reading plus the site barometer typed as the flow computer "
         "holds it, =C8+1.006 into bar a, read as the site's atmosphere (a note), as the "
         "notation reads p_g + 1", "Station!C11 trade-constant"),
    ],
    "solar-whinmoor-lane-school": [
        ("FLAGGED CORRECT CELL (defensible): the store's temperature rise over a mean day from "
         "the day's heat in kWh/d, Q·3600/(m·c_p) into K, as engineers write it; plumb is right "
         "that kWh/d over kJ/K is K/d, but its message ('computes [T^-1 Θ]') does not say that "
         "a period is missing. Written into K/d, or times a 1 d cell (C27, C28), it passes "
         "(probe/p1.py)", "Solar!C25 result-unit"),
        ("a note on a correct cell: 8.34 read as ρ_w·c_p of water in Btu/(US gal·°F), which it "
         "is", "Solar!C35 trade-constant"),
        ("a note on a correct cell: 8.34 read as ρ_w·c_p of water in Btu/(US gal·°F), which it "
         "is", "Solar!C43 trade-constant"),
        ("FLAGGED CORRECT CELL (defensible): specific yield, kWh/yr over kWp, in the trade's "
         "unit kWh/kWp with 'per year' understood (IEC 61724-1, from memory); plumb is right that "
         "the year is missing from the unit; written kWh/(kWp·yr), kWh/kWp/yr or h/yr it passes "
         "(probe/p1.py)", "Solar!C58 result-unit"),
        ("FLAGGED CORRECT CELL (plumb's limit): cell temperature T_a + (NOCT − 20)·G/800 "
         "(Duffie and Beckman, from memory), the 800 being the W/m² of the NOCT test; plumb "
         "reads 800 as a bare number and says the sum's dimensions differ, with no hint that a "
         "number carries the W/m². With 800 W/m² in a cell it passes (probe/p1.py)",
         "Solar!C72 sum-mismatch"),
    ],
}

MISSED = {
    "meter-station-harrow-moss": {
        "Station!C44": ("(a flow in Nm³ (0 °C) times a heating value in MJ per Sm³ (15 °C): "
                        "5.2 % low. plumb knows the two reference states apart, for it names "
                        "the ratio turned over in C31 and a ratio of two such volumes, but not "
                        "a product with a quantity per the other volume; the converse, Sm³/d × "
                        "MJ/Nm³, passes too (probe/p2.py); expected unit-scale)"),
    },
}

RENAMED = {
    "solar-whinmoor-lane-school": {
        "Solar!C34": ("sum-mismatch", "a temperature rise converted with +32: the message says "
                                      "a difference takes no offset, 1 K = 1.8 Δ°F, which is "
                                      "right"),
        "Solar!C74": ("sum-mismatch", "the kW/m² over the 800 W/m² of NOCT: flagged, but by "
                                      "the very finding the correct C72 gets, so nothing shows "
                                      "the 1000; with 800 W/m² in a cell, plumb names this "
                                      "slip as 0.001 times (unit-scale, probe/p1.py)"),
        "Quarters!D8": ("result-unit", "a quarter's energy with the days left out: plumb says "
                                       "the row computes a power where kWh is written, which "
                                       "is the fault"),
    },
}

MESSAGES = {
    "water-balance-cutters-flat": {
        "Water!C61": "\"this formula computes [M L T^-1] (momentum)\" for ρ·Q·H/η without g: "
                     "true, but 'momentum' leads away, and no remedy is offered (no 'is a g "
                     "missing')",
    },
    "meter-station-harrow-moss": {
        "Station!C57": "barg × 14.7 into psig: \"the value shown is 14.5038 times too small\" "
                       "is wrong; it is 14.7/14.504 = 1.35 % too large. The 14.7 is counted as "
                       "a coefficient, not as a factor of the right size gone wrong (14.7 psi is "
                       "the atmosphere, 14.50 psi the bar)",
    },
    "solar-whinmoor-lane-school": {
        "Solar!C74": "the same sum-mismatch text as the correct C72: it cannot tell the "
                     "engineer which of the two is wrong",
    },
}

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")
HEADNOTE = {stem: [LINE] for stem in ("ammonia-brackenford-creamery", "water-balance-cutters-flat",
                                      "meter-station-harrow-moss", "solar-whinmoor-lane-school")}

# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.


# Later in the same round plumb weighed the reference states of a workbook's cells in one
# product as it weighs a symbol's: Station!C44, a flow in Nm³ times a heating value per Sm³,
# is the unit-scale warning planted.
del MISSED["meter-station-harrow-moss"]
