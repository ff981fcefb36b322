"""review68: what plumb (the round's build of the time) reports on these books beyond the
planted mistakes, the planted cells it misses or names by another rule, and its messages that
mislead, each with the reviewer's reason as an engineer, recorded after reading every finding.
Read by make_books.py when it writes the .expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.

As run by the reviewer (count.py): planted flagged 35/36 (ice cream 9/9, furnace 9/9, metro
9/9, hatchery 8/9); correct formula cells clean 149/151 (ice cream 41/41, furnace 38/38, metro
38/38, hatchery 32/34). No crash or hang; exit status 1 on every book (errors found), in text and
JSON alike, and the two runs name the same flagged cells and rules.

Probes (probe/, not counted): probe/variants.py (24 variants: 19 where plumb agrees with the
engineer's mark, 5 where it differs: a total from a 'W/1000 eggs' input missing its /1000, a plain number and a
kW figure written into 'W/1000 eggs', all clean; 'grains/lb' and 'mm w.g.' not read as units
(warnings) on correct cells); probe/sidecar_probe.py (a sidecar's 'measure eggs = 1 1' is
accepted but 'W/1000 eggs' still does not read, where 'W/1000 ft' does; the same rate typed per
egg in mW is checked and its slip caught); probe/units_probe.py and probe/eggs_probe.py (a
formula cell whose unit text is 'W/1000 eggs' or 'L/(h·1000 eggs)' passes whatever it computes,
with no no-unit warning, where 'eggs' alone draws one).
"""

EXTRA = {
    "icecream-plant-brindle-moor": [
        ("a note on a correct cell: 4.19 read as the heat capacity of a volume of water, which it "
         "is (kJ/(L·K), common practice)", "Plant!C23 trade-constant"),
        ("a note on a correct cell: 500 read as the heat capacity of a volume of water, which it "
         "is (8.33 lb/gal × 60 min/h × 1 Btu/(lb·°F), ASHRAE, from memory)",
         "Plant!C26 trade-constant"),
        ("a note on a correct cell: 287.05 read as the gas constant of dry air, which it is",
         "Plant!C68 trade-constant"),
    ],
    "reheat-furnace-corbeck-mill": [
        ("notes on a correct cell: 1.01325 (bar) and 273.15 (K) read as the normal reference "
         "state in ratio with the line pressure and temperature, which they are (the Nm³ at 0 °C "
         "and 101.325 kPa)", "Furnace!C47 trade-constant"),
        ("notes on a correct cell: 273.15 and 101.325 read as the Nm³'s reference state, which "
         "they are (hot air to the burners)", "Furnace!C63 trade-constant"),
        ("notes on a correct cell: the same reference state, fan inlet volume",
         "Furnace!C67 trade-constant"),
    ],
    "metro-vent-wexcombe-cross": [
        ("a note on a correct cell: 287.05 read as the gas constant of dry air, which it is",
         "Tunnel!C24 trade-constant"),
        ("a note on a correct cell: 1.08 read as the heat capacity of a volume of standard air "
         "in Btu/(h·cfm·°F), which it is (ASHRAE, from memory)", "Tunnel!C72 trade-constant"),
        ("a note on a correct cell: 287.05, outdoor air density", "Tunnel!C78 trade-constant"),
        ("a note on a correct cell: 287.05, shaft air density", "Tunnel!C79 trade-constant"),
        ("a note on a correct cell: 9.81 read as standard gravity in the stack effect, which it "
         "is", "Tunnel!C80 gravity-number"),
    ],
    "hatchery-fellmoor-green": [
        ("an input the trade writes per 1000 eggs: 'W/1000 eggs' does not read as a unit "
         "(warned on the input, which is fair); its formulas are then checked without it, so "
         "the planted slip in C12 goes through (see the miss above)", "Rooms!C8 no-unit"),
        ("the same for the hatchers' embryo heat", "Rooms!C10 no-unit"),
        ("FLAGGED CORRECT CELL (plumb's limit): CO2 of all setters = thousands of eggs × L/h per "
         "1000 eggs /1000 (L to m³), =C7/1000*C16/1000 into m³/h, which is right: 921.6 × 10 "
         "L/h = 9.216 m³/h. The input's unit 'L/h' stands for L/h per 1000 eggs (the label says "
         "so; 'L/(h·1000 eggs)' does not read either, probe/eggs2_probe.py); plumb takes the egg "
         "count's /1000 for an unneeded conversion, and its remedy, to remove it, would make "
         "the flow 1000 times too large. Typed per egg in mL/h the same total passes "
         "(probe/variants.py C27)", "Rooms!C19 unit-scale"),
        ("FLAGGED CORRECT CELL (plumb's limit): the same for the hatchers' CO2, "
         "=C9/1000*C24/1000", "Rooms!C26 unit-scale"),
        ("a note on a correct cell: 287.05 read as the gas constant of dry air, which it is",
         "Rooms!C40 trade-constant"),
        ("a note on a correct cell: 8.34 read as lb per US gallon of water, which it is",
         "Rooms!C53 trade-constant"),
        ("a note on a correct cell: 1.08 read as the heat capacity of a volume of air; the note "
         "rightly says it comes to less or more with the air's density (here outdoor air at −5 "
         "°C, some 7 % denser than standard air)", "Rooms!C65 trade-constant"),
        ("a note on a correct cell: 4.19 kJ/(L·K) for water", "Rooms!C69 trade-constant"),
        ("a note on a correct cell: 500 for water in Btu/(h·gpm·°F)", "Rooms!C70 trade-constant"),
        ("a note on a correct cell: 0.433 read as the specific weight of water in psi/ft, which "
         "it is", "Rooms!C73 gravity-number"),
    ],
}

MISSED = {
    "hatchery-fellmoor-green": {
        "Rooms!C12": "(the embryo heat in W per 1000 eggs times thousands of eggs written as kW, "
                     "1000 times too large: 73 728 'kW' for 73.7 kW): its input's unit, 'W/1000 "
                     "eggs', as the trade writes it, does not read, so plumb gives the input "
                     "whatever unit each formula needs and checks nothing; the only hint is the "
                     "no-unit warning on C8. A sidecar's 'measure eggs = 1 1' does not make the "
                     "text read (probe/sidecar_probe.py); typed per egg in mW the slip is caught "
                     "(probe/variants.py C26)",
    },
}

RENAMED = {
    "icecream-plant-brindle-moor": {
        "Plant!C25": ("sum-mismatch", "a difference plus 32: the message says a difference "
                                      "takes no offset, 1 K = 1.8 Δ°F, which is right"),
    },
    "metro-vent-wexcombe-cross": {
        "Tunnel!C68": ("sum-mismatch", "a temperature rise plus 32: the same message, right"),
    },
}

MESSAGES = {
    "metro-vent-wexcombe-cross": {
        "Tunnel!C51": "Pa/9.81 (mm of water) written as inH2O: plumb says \"the value shown is "
                      "249.08891 times too large\", but 117.2 against the true 4.62 inH2O is "
                      "25.4 times (the mm-to-inch slip); it passes over the 9.81 as if it were "
                      "not there, and the same Pa/9.81 into mmH2O (C52) it accepts",
        "Tunnel!C81": "\"this formula computes [M L^-2] (areal density)\" for Δρ·H without g: "
                      "true, but no remedy is offered (no 'is a g missing')",
    },
    "reheat-furnace-corbeck-mill": {
        "Furnace!C32": "opaque, not wrong: MW over a % is \"in units of 100 MW\"; where the % "
                       "sits in a sum (C52) plumb says to divide it by 100, here it does not",
        "Furnace!C71": "opaque, not wrong: kPa over 249.1 is \"in units of 4.01463 "
                       "(1/0.24908891) inH2O\"; it does not say that kPa was taken as Pa",
    },
    "hatchery-fellmoor-green": {
        "Rooms!C12": "nothing on the cell; the no-unit warning on its input C8 says 'W/1000 "
                     "eggs' \"does not read as a unit: expected a unit after '*' or '/'\", "
                     "though a round count before a unit is read elsewhere ('W/1000 ft')",
    },
}

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")
HEADNOTE = {stem: [LINE] for stem in ("icecream-plant-brindle-moor", "reheat-furnace-corbeck-mill",
                                      "metro-vent-wexcombe-cross", "hatchery-fellmoor-green")}

# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.


# Each of these cells carries two notes, the reference pressure's and the reference
# temperature's, and the corpus counts both.
for _cell in ("Furnace!C47", "Furnace!C63", "Furnace!C67"):
    EXTRA["reheat-furnace-corbeck-mill"].append(
        ("the second note on the same cell: the other half of the reference state",
         f"{_cell} trade-constant"))
