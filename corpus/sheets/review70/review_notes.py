"""review70: what the round's build of the time reports on these books beyond the
planted slips, the planted cells it misses or names by another rule, and its messages that
mislead, each with the reviewer's reason as an engineer, recorded after reading every finding.
Read by make_books.py when it writes the .expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.

As run by the reviewer (count.py): planted flagged 39/39 (purified water 10/10, coal boiler
10/10, marina 10/10, cold store 9/9), each under the rule it was planted as; correct formula
cells clean 160/165 (purified water 43/44, coal boiler 38/39, marina 41/43, cold store 38/39).
No crash or hang; exit status 1 on every book, in text and JSON alike, and the two runs name
the same cells and rules.

The five correct cells flagged are all trade formulas whose typed constants carry units: the
membrane makers' TCF with 3020 in kelvins, Dulong's HHV with its coefficients in MJ/kg, API
2000's thermal outbreathing fit, the smooth-bore nozzle's 29.83, and ASCE 7's minimum roof snow
load 20·I_s psf inside an IF. The probes (probe/probes.py, probe/probes.txt) show that each
passes once the constant is put in a cell with its unit (E/R in K; Dulong's coefficients in
MJ/kg; Y in m^0.3/h), and that a bare 20 as IF's default passes where 20·I_s does not.
"""

EXTRA = {
    "purified-water-quenby-moss": [
        ("FLAGGED CORRECT CELL (plumb's limit): the membrane makers' temperature correction "
         "factor exp[3020·(1/298 − 1/(273 + t))] below 25 °C (polyamide RO design manuals, "
         "from memory); 3020 is E/R in kelvins and 298 a temperature in kelvins. With 3020 in "
         "a cell written K the same line passes (probe/probes.py a1, a2)",
         "PW!C26 dimensioned-argument"),
        ("a note on a correct cell: 8.34 read as the heat capacity of a US gallon of water in "
         "Btu/°F, which it is (common practice)", "PW!C93 trade-constant"),
    ],
    "coal-boiler-drumlaw-brae": [
        ("FLAGGED CORRECT CELL (plumb's limit): Dulong's HHV = 33.82·C + 144.2·(H − O/8) + "
         "9.42·S with the analysis in % over 100 (Babcock & Wilcox, Steam, 41st ed., from "
         "memory); the coefficients are in MJ/kg. Put in cells written MJ/kg, the same sum "
         "passes (probe/probes.py g1)", "Coal!C37 result-unit"),
        ("notes on a correct cell: 273.15 read as the reference temperature of the Nm³ and "
         "101.325 as the reference pressure, which they are", "Coal!C72 trade-constant"),
    ],
    "marina-kittiwake-haven": [
        ("a note on a correct cell: 9.81 read as standard gravity, which it is",
         "Fuel!C27 gravity-number"),
        ("a note on a correct cell: 9.81 read as standard gravity, which it is",
         "Fuel!C32 gravity-number"),
        ("a note on a correct cell: 3960 read as one over water's specific weight in "
         "gpm·ft/hp, which it is", "Fuel!C33 gravity-number"),
        ("a note on a correct cell: 9.81 read as standard gravity, which it is",
         "Fuel!C34 gravity-number"),
        ("a note on a correct cell: 0.433 read as water's specific weight in psi/ft, which it "
         "is, with SG multiplying it as it should", "Fuel!C35 gravity-number"),
        ("FLAGGED CORRECT CELL (plumb's limit): API 2000's thermal outbreathing V_OT = "
         "Y·V_tk^0.9·R_i, Nm³/h with V_tk in m³, Y = 0.32 (API 2000, 7th ed. (2014), from "
         "memory); a fitted power law whose Y carries m^0.3/h. With Y in a cell written "
         "m^0.3/h it passes (probe/probes.py l2)", "Fuel!C46 result-unit"),
        ("a note on a correct cell: 9.81 read as standard gravity, which it is",
         "Fire!C33 gravity-number"),
        ("a note on a planted cell (its error is reported too): 9.81 read as standard gravity",
         "Fire!C34 gravity-number"),
        ("a note on a correct cell: 2.31 read as one over water's specific weight in ft/psi, "
         "which it is, with SG dividing it as it should", "Fire!C35 gravity-number"),
        ("a note on a correct cell: 9.81 read as standard gravity, which it is",
         "Fire!C41 gravity-number"),
        ("a note on a correct cell: 3960 read as one over water's specific weight in "
         "gpm·ft/hp, which it is", "Fire!C43 gravity-number"),
        ("FLAGGED CORRECT CELL (plumb's limit): the smooth-bore nozzle's Q = 29.83·c·d²·√p, "
         "gpm with d in in and p in psi (NFPA Fire Protection Handbook, 20th ed., from "
         "memory); 29.83 carries gpm/(in²·psi^0.5), that is √(2/ρ_w) in those units",
         "Fire!C54 result-unit"),
    ],
    "cold-store-roof-fenwold-gate": [
        ("FLAGGED CORRECT CELL (plumb's limit): ASCE 7-16 7.3.4's minimum roof snow load, "
         "I_s·p_g where p_g ≤ 20 psf, else 20·I_s psf; the 20 is in psf as the standard prints "
         "it. plumb takes a bare 20 as IF's default in the cell's unit (probe f1 passes) but "
         "not 20 times a pure factor; MIN(I_s·p_g, 20·I_s) is flagged the same way (probe f2)",
         "Roof!C15 argument-mismatch"),
        ("a note on a correct cell: 9.81 read as standard gravity, which it is",
         "Roof!C38 gravity-number"),
        ("a note on a correct cell: 8760 read as the hours in a year, which it is",
         "Floor!C40 trade-constant"),
    ],
}

MISSED = {}

RENAMED = {}

MESSAGES = {
    "coal-boiler-drumlaw-brae": {
        "Coal!C60": "\"this formula computes [M^2 L^-3 T^-1]\" for kg/h × kg/Nm³: true, but no "
                    "remedy (no 'the density divides'), where other messages name the factor "
                    "turned over",
    },
    "marina-kittiwake-haven": {
        "Fuel!C28": "\"this formula computes [L^2 T^-2] (specific energy)\" for Δp/ρ into m: "
                    "true, but no 'is a g missing', though the cells beside it use 9.81",
        "Fire!C42": "\"this formula computes [M L T^-1] (momentum)\" for ρ·Q·H/η with g left "
                    "out: the dimension's name points away from the fault, which is a missing "
                    "g in a pump power; no remedy offered",
    },
    "cold-store-roof-fenwold-gate": {
        "Roof!C39": "\"this formula computes [M] (mass)\" for a pallet load into kN: right, but "
                    "no 'multiply by g' offered",
    },
}

# Messages on correct cells (not in the .expect's planted lines; given in the report):
# PW!C26 says "divide by a reference value of the same dimension, as in ln(p/p_ref)"; the fault,
# if any, is that 3020 is typed without its unit (kelvins): dividing by a reference would break
# a correct formula. Coal!C37, Fuel!C46 and Fire!C54 name the dimension computed and offer no
# remedy; Roof!C15 names the branches' dimensions, which is true as plumb reads a bare 20.

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")
HEADNOTE = {stem: [LINE] for stem in ("purified-water-quenby-moss", "coal-boiler-drumlaw-brae",
                                      "marina-kittiwake-haven", "cold-store-roof-fenwold-gate")}

# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.


# Two findings on one cell are counted twice by the corpus: Coal!C72 carries the reference
# temperature's note and the reference pressure's, and Fire!C36, the specific gravity planted
# upside down, carries the note on 2.31 beside its warning.
EXTRA["coal-boiler-drumlaw-brae"].append(
    ("the second note on the same cell: the other half of the reference state",
     "Coal!C72 trade-constant"))
EXTRA["marina-kittiwake-haven"].append(
    ("a note on the planted cell: 2.31 read as one over water's specific weight, which it is",
     "Fire!C36 gravity-number"))
