"""review41: what plumb reported on these books beyond the planted mistakes, the planted cells it
names by another rule, and its messages that mislead, each with the reviewer's reason (as first
recorded on an older binary, chosen per cell after reading every finding, then brought up to
date with build/release/cli/plumb when the books came into the corpus: the Stefan-Boltzmann
constant 5.67E-8 (Pool!C36) and the 216.7 of ρ_v = 216.7·e/T (Air!C15, Air!C27), once flagged
result-unit, are now read with notes; the 1000 of Flare!C47 is now read as water's density;
the second °C reading of Pool!C37 and the second constant of Air!C10 and Air!C28 are now
recorded, as plumb reports each). Read by make_books.py when it writes the .expect files
(python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.
"""

REF_T = ("a note on a correct cell: 273.15 in a ratio of absolute temperatures read as the "
         "reference temperature (0 °C, DIN 1343), which it is")
REF_P = ("a note on a correct cell: 101.325 in a ratio of pressures read as the standard "
         "atmosphere in kPa (the normal state, DIN 1343), which it is")
MAGNUS = ("a note on a correct cell: the saturation pressure fit's constant (Alduchov & Eskridge "
          "1996, from memory) read as such, with its unit from the cell")
RW = ("a note on a correct cell, flagged result-unit by an older build: 216.7 in ρ_v = "
      "216.7·e/T read as one over the gas constant of water vapour, which it is (100 Pa/hPa × "
      "1000 g/kg / 461.5 J/(kg·K) = 216.7 g·K/(m³·hPa); common practice)")
CP = ("a note on a correct cell: 4.19 read as the specific heat of water in kJ/(kg·K), which it "
      "is (common practice)")
CLASS = ("an input plumb warns on (not a formula cell): the ISO 8573-1 class number, a key for "
         "VLOOKUP, is a label and needs no unit; the looked-up dew point has its heading's °C")

EXTRA = {
    "landfill-flare": [
        (REF_T, "Flare!C32 trade-constant"),
        ("a correct cell plumb still flags: Nm³/h × 0.717 kg/Nm³ × 8760 h/yr / 1000 kg/t gives "
         "t/yr; the methane density 0.717 and the 8760 h/yr are bare numbers in the formula, "
         "and plumb, reading the /1000 as water's density (the note below), says the value is "
         "1000 times too small, which it is not", "Flare!C47 unit-scale"),
        ("a note that misleads, on the same correct cell: the /1000 is kg to t, not one over "
         "the density of water; the density in the formula is methane's 0.717 kg/Nm³ (from "
         "memory)", "Flare!C47 trade-constant"),
    ],
    "pool-heating": [
        (MAGNUS + " (0.61094 kPa)", "Pool!C17 trade-constant"),
        (MAGNUS + " (0.61094 kPa)", "Pool!C18 trade-constant"),
        ("a note on a correct cell, flagged result-unit by an older build: 5.67E-8 read as the "
         "Stefan-Boltzmann constant in W/(m²·K⁴), which it is (CODATA 2018 gives "
         "5.670374419E-8)", "Pool!C36 trade-constant"),
        ("a second finding on the planted cell C37: σ·ε·A·(T_w⁴ − T_s⁴) raises two °C readings "
         "to the fourth power, the water's C13 and the enclosure's C35, and plumb reports each "
         "(the first is the planted line above)", "Pool!C37 offset-scale"),
        (CP, "Pool!C39 trade-constant"),
        (CP, "Pool!C45 trade-constant"),
        ("a note on a correct cell: 500 in Btu/h = 500·gpm·ΔT°F read as the heat capacity of "
         "a volume of water in those units, which it is (8.34 lb/gal × 60 min/h × 1 "
         "Btu/(lb·°F); common practice)", "Pool!C51 trade-constant"),
    ],
    "crane-base": [],
    "air-dryer": [
        (REF_P, "Air!C10 trade-constant"),
        (REF_T, "Air!C10 trade-constant"),
        (MAGNUS + " (6.1094 hPa)", "Air!C13 trade-constant"),
        (RW, "Air!C15 trade-constant"),
        (MAGNUS + " (6.1094 hPa)", "Air!C26 trade-constant"),
        (RW, "Air!C27 trade-constant"),
        (REF_P, "Air!C28 trade-constant"),
        (REF_T, "Air!C28 trade-constant"),
        ("a note on the planted cell C29: 273.15 read as the reference temperature, which it is "
         "(the slip is the gauge pressure, the planted line above)", "Air!C29 trade-constant"),
        (CLASS, "Air!C22 no-unit"),
        (CLASS, "Classes!A5 no-unit"),
        (CLASS, "Classes!A6 no-unit"),
        (CLASS, "Classes!A7 no-unit"),
        (CLASS, "Classes!A8 no-unit"),
        (CLASS, "Classes!A9 no-unit"),
    ],
}

MISSED = {}

RENAMED = {}

MESSAGES = {
    "air-dryer": {
        "Air!C32": "\"'C19' counts 1000 times as much as 'C30'\": right cell and rule, but the "
                   "words can be read as if a gram were worth 1000 kilograms; it means the number in "
                   "g/h is 1000 times the number in kg/h, and the next note, divide 'C19' by "
                   "1000, is the fix",
    },
    "pool-heating": {
        "Pool!C41": "\"'C33' counts 1000 times as much as 'C30'\": right cell and rule; as on "
                    "Air!C32 of air-dryer, it means the number in W is 1000 times the number in "
                    "kW, and the next note, divide 'C33' by 1000, is the fix",
    },
}
