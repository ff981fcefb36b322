"""review76: what the round's build of the time (plumb, handing the books to its sibling
plumb-workbooks) reports on these books beyond the planted slips, the planted cells it names by
another rule, and its messages that mislead, each with the reviewer's reason, recorded after
reading every finding. Read by make_books.py when it writes the .expect files
(python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.

As run by the reviewer (count.py): planted flagged 40/40 (mine 10/10, glasshouse 10/10, tower
10/10, gas 10/10); correct formula cells clean 160/161 (mine 41/41, glasshouse 44/44, tower
35/35, gas 40/41). No crash or hang; exit status 1 on every book (errors found), in text and
JSON alike, and the text and JSON runs name the same cells and rules. No planted slip missed.

The reviewer's variants (probe/probe.py, probe/baro.py; not counted; outputs in
probe/probe_out.txt and probe/baro_out.txt):
- a gauge reading plus a typed atmosphere is judged against the site's barometer only where the
  barometer row's label says 'Site barometer': with 'Barometer at the shaft collar' (0.975 bar a)
  'p_g + 1.01325' into bar a is clean; relabelled 'Site barometer' it is a warning, and
  'p_g + 0.88' an error. The sea-level 101.325 typed at a 1200 m site labelled 'Site barometer'
  (88 kPa) is warned, rightly;
- cfm to m³/min by '*0.028' (0.02832 to two figures, 1.1 % low) is an error "35.3147 times too
  large", though '/35' passes and the README reads a factor's digits within half a unit of the
  last; '*0.03' (6 % high) is rightly an error, with the same wrong magnitude;
- '=Q*13.2' (the imperial gallon's L/s to gpm) into US gpm is an error, rightly, but "15.8503
  times too small" where it is 1.2 times;
- Q·H/102 in kW (Q in L/s), ρ·9.81·Q·H/10⁶ in kW with Q in L/s, ft/2.31 into psig, Hazen-
  Williams' US 4.52 form in psi/ft, degree days in °C·d, a loop drop typed in °C: all pass,
  rightly; ft/0.433 into psig is an error that says 0.433 is the wrong way round, rightly;
- an expansion vessel's ratio with only p_i made absolute is still an error, rightly;
- 0.184 kg CO2/kWh typed inline, ×E/1000 into t/yr, is an error (as Gas!C72 below); the same
  factor in a cell of its own with 'kg CO2/kWh' beside it passes (Heat!C86).
"""

EXTRA = {
    "mine-air-brackenfell-deep": [
        ("a note on a correct cell: 9.81 read as standard gravity in the barometric rise "
         "ρ_air·g·Δz, which it is (SI Brochure 9th ed.)", "Air!C26 gravity-number"),
    ],
    "glasshouse-saltmarsh-wrayholme": [
        ("a note on a correct cell: 0.33 read as ρ·c_p of air per hour in W·h/(m³·K), which it "
         "is (CIBSE Guide A (2015), from memory)", "Heat!C24 trade-constant"),
        ("a note on a correct cell: 4.19 read as c_p of water, which it is", "Heat!C45 "
         "trade-constant"),
        ("a note on a correct cell: 500 read as the heat capacity of a volume of water "
         "(8.33 lb/gal × 60 min/h × 1 Btu/(lb·°F), ASHRAE, from memory), which it is; the SG "
         "and c_p ratio beside it correct it for the glycol", "Heat!C46 trade-constant"),
        ("a note on a correct cell: 9.81 read as standard gravity", "Heat!C51 gravity-number"),
        ("a note on a planted cell beside its error: 9.81 read as standard gravity, which it "
         "is; the slip there is the %", "Heat!C52 gravity-number"),
        ("a note on a correct cell: 3960 read as one over γ_w in gpm·ft per hp, which it is "
         "(common practice); the SG multiplies, as it must", "Heat!C54 gravity-number"),
        ("a note on a correct cell: 9.81 read as standard gravity", "Heat!C55 gravity-number"),
        ("a note on a correct cell: 9.81 read as standard gravity in H = Δp/(ρ·g)",
         "Heat!C56 gravity-number"),
        ("a note on a correct cell: 9.81 read as standard gravity in the static head",
         "Heat!C63 gravity-number"),
        ("a note on a correct cell: 0.33 read as ρ·c_p of air per hour, which it is",
         "Heat!C79 trade-constant"),
    ],
    "water-tower-carrick-hill": [
        ("a note on a correct cell: 10.67 read as Hazen-Williams' fit constant for m³/s and m, "
         "which it is (Mays, Water Distribution Systems Handbook (2000), from memory)",
         "Tower!C28 trade-constant"),
        ("a note on a correct cell: 9.81 read as standard gravity in v²/(2g)",
         "Tower!C32 gravity-number"),
        ("a note on a correct cell: 9.81 read as standard gravity in v²/(2g)",
         "Tower!C34 gravity-number"),
        ("a note on a correct cell: 9.81 read as standard gravity in ρ·g·Q·H",
         "Tower!C39 gravity-number"),
        ("a note on a correct cell: 367 read as one over γ_w in m³/h·m per kW, which it is "
         "(common practice)", "Tower!C41 gravity-number"),
        ("a note on a correct cell: 3960 read as one over γ_w in gpm·ft per hp, which it is",
         "Tower!C46 gravity-number"),
        ("a note on a correct cell: 9.81 read as standard gravity in NPSHa",
         "Tower!C59 gravity-number"),
        ("a note on a correct cell: 9.81 read as standard gravity in NPSHa from the gauge",
         "Tower!C62 gravity-number"),
        ("a note on a correct cell: 9.81 read as standard gravity in ρ·g·h",
         "Tower!C68 gravity-number"),
        ("a note on a correct cell: 0.433 read as γ_w in psi/ft, which it is (common "
         "practice)", "Tower!C70 gravity-number"),
        ("a note on a correct cell: 9.81 read as standard gravity in a·v/g",
         "Tower!C74 gravity-number"),
        ("a note on a correct cell: 9.81 read as standard gravity in ρ·g·h",
         "Tower!C75 gravity-number"),
    ],
    "gas-boiler-house-skelbrook": [
        ("a note on a correct cell: 1.225 read as the density of air at a standard state, "
         "which it is (ISO standard atmosphere, from memory)", "Gas!C56 trade-constant"),
        ("FLAGGED CORRECT CELL (plumb's limit): CO2 per year = E·0.184/1000 in t/yr, the "
         "emission factor 0.184 kg CO2/kWh typed into the formula (UK reporting factor, from "
         "memory), as reports are commonly written; plumb reads 0.184 as a bare number and "
         "says the cell computes a power. The same factor in a cell with its unit passes "
         "(glasshouse Heat!C86)", "Gas!C72 result-unit"),
    ],
}

MISSED = {}

RENAMED = {
    "water-tower-carrick-hill": {
        "Tower!C29": ("result-unit", "the bore in mm leaves Hazen-Williams' fit constant with "
                                     "fractional powers, so plumb names the dimension, not the "
                                     "scale; flagged all the same"),
        "Tower!C71": ("result-unit", "2.31 ft/psi multiplied where 0.433 psi/ft belongs: plumb "
                                     "reads 2.31 as a bare number and says the cell computes a "
                                     "length; flagged all the same"),
    },
}

MESSAGES = {
    "water-tower-carrick-hill": {
        "Tower!C24": "\"the value shown is 15.8503 times too small\" for Q·13.2 into US gpm: "
                     "13.2 is the imperial gallon's factor, so the value is 1.2 times too "
                     "small; plumb treats 13.2 as a bare coefficient and, unlike Gas!C33, does "
                     "not say so",
        "Tower!C29": "\"computes [L^(2107/1250) T^(-463/250)]\": true, but nothing points at the "
                     "bore in mm, which is the slip; the correct C28 gets the fit-constant note",
        "Tower!C40": "\"computes [M L T^-1] (momentum)\" for ρ·Q·H: no engineer means a "
                     "momentum there; the remedy, a missing g, is not offered",
        "Tower!C63": "\"off by 101325 Pa, the atmosphere the gauge reads from\": the station's "
                     "barometer is declared in C55 (99.9 kPa, labelled 'Barometer at the booster "
                     "station'), so the error is 99.9 kPa and the fix is + C55; plumb names the "
                     "cell only when the label says 'Site barometer' (probe/baro.py)",
        "Tower!C71": "\"computes [L] (length)\": true of 2.31 read as a bare number, but it "
                     "does not say 2.31 is ft per psi turned over, as it does say for 0.433 "
                     "divided (probe/probe.py)",
    },
    "mine-air-brackenfell-deep": {
        "Air!C27": "\"computes [M L^-2] (areal density)\" for ρ·Δz: true, but no remedy (a "
                   "missing g) is offered",
        "Air!C32": "\"off by 101325 Pa, the atmosphere the gauge reads from\": the collar's "
                   "barometer is declared in C20 (0.975 bar a), so the error is 97.5 kPa; plumb "
                   "does not take a row labelled 'Barometer at the shaft collar' as the site's",
    },
    "glasshouse-saltmarsh-wrayholme": {
        "Heat!C68": "the remedy \"write (psig + 14.5763), 'C70' in psi\" for p_i·14.5 + 14.7 "
                    "into psig: the cell is meant to be gauge, so the fix is to drop the 14.7; "
                    "adding the barometer would make it absolute, which psig is not",
        "Heat!C52": "\"its inputs give numbers in units of 0.1 kW\" beside \"100 times too "
                    "small\": the typed /1000 is left out of 'inputs', so the two lines read as "
                    "a contradiction; the % in C50 is the cause",
        "Heat!C72": "names only C65 (\"write (C65 + C70)\"); p_f in C69 is gauge too, and "
                    "mending only C65 leaves an error (probe/probe.py, vv_half)",
    },
}

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")
HEADNOTE = {stem: [LINE] for stem in ("mine-air-brackenfell-deep",
                                      "glasshouse-saltmarsh-wrayholme",
                                      "water-tower-carrick-hill", "gas-boiler-house-skelbrook")}

# A dimensionally consistent formula can still be wrong; this check does not replace independent
# review under local codes and licensed practice.
