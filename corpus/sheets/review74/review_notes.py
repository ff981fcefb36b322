"""review74: what the round's build of the time reports on these books beyond the planted
mistakes, the planted cells it names by another rule, and its messages that mislead, each with
the reviewer's reason, recorded after reading every finding. Read by make_books.py when it
writes the .expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.

As run by the reviewer (count.py): planted flagged 37/37 (brewhouse 9/9, fuel dock 9/9, sports
hall 9/9, rising main 10/10); correct formula cells clean 153/156 (brewhouse 37/40, fuel dock
36/36, sports hall 36/36, rising main 44/44). No crash or hang; exit status 1 on every book
(errors found), and the text and JSON runs name the same cells, severities and rules.
Since then the avoirdupois ounce has been added to the catalogue (NIST SP 811 (2008), B.8), and
the two correct cells it had flagged, Copper!C74 and C75, are clean: 155/156 now.

The reviewer's variants (probe/probe.py, output in probe/probe_out.txt, not counted):
- 'bbl' is only the 42 gal oil barrel: L/158.987 into bbl passes, L/117.3 (the 31 gal US beer
  barrel) is an error; 'US beer bbl' does not read as a unit (warning); a sidecar line
  'measure bblb = 31 gal' makes L/117.3 into bblb clean and L*117.3 into bblb a rightly worded
  'wrong way round' error.
- 'oz' is not in the catalogue: kg*35.27 into oz is a no-unit warning and the 7490 bitterness
  formula after it an error; with 'measure oz = 28.349523125 g' in a sidecar both are clean,
  and so is the 7490 written out as 28350/3.785.
- IBU with the hops in kg taken as grams (1000 too small) and the same with no ×1000 at all
  (10⁶ too small) get the one message, 'the conversion factor 100 ... is the wrong way round';
  the two /100 (% to a fraction) are right in both.
- hL/10 over π·D²/4 with D in mm into m: '10⁵ times too small' (it is 10⁶; the /10 that turns
  hL into m³ is left out of the count); hL over the same area with no /10: '10⁵', rightly.
- the 500 rule with °F readings, with a Δ°F cell, and with °C readings ×1.8 all pass (note);
  with °C readings and no 1.8 it is result-unit '[L^3 T^-1 Θ]', the same into W or Btu/h.
- gauge bar plus 1.013 into bar a beside a site barometer cell of 0.995 bar a: a warning that
  the absolute pressure comes out 0.018 bar high (fair: the sheet has the reading, use it);
  gauge plus the barometer cell: clean.
"""

G = ("a note on a correct cell: 9.81 read as standard gravity, which it is (g_n = 9.80665 "
     "m/s², SI Brochure 9th ed.)")

EXTRA = {
    "brewhouse-tallow-lane": [
        ("FLAGGED CORRECT CELL (plumb's limit): US beer barrels from litres, L/117.3 (31 US gal "
         "= 117.3 L, NIST Handbook 44, App. C, from memory); in brewing 'bbl' is the beer "
         "barrel, but plumb reads 'bbl' only as the 42 gal oil barrel and calls 117.3 a "
         "coefficient. A sidecar 'measure' line for a beer barrel clears it (probe/probe.py)",
         "Copper!C9 unit-scale"),
        (G, "Copper!C26 gravity-number"),
        ("a note on a correct cell: 500 read as the heat capacity of a volume of water, which "
         "it is (8.33 lb/gal × 60 min/h × 1 Btu/(lb·°F), ASHRAE, from memory)",
         "Copper!C83 trade-constant"),
        ("a note on a correct cell: 8.34 read as the density of water in lb/US gal, which it is "
         "(common practice)", "Copper!C84 trade-constant"),
        ("a note on a correct cell: 4.19 read as the specific heat of water, which it is "
         "(kJ/(kg·K), common practice)", "Copper!C85 trade-constant"),
        ("a note on a correct cell: 1000 read as the density of water, which it is (kg/s × "
         "3600 s/h ÷ 1000 kg/m³ gives m³/h)", "Copper!C86 trade-constant"),
    ],
    "fuel-dock-skerrow-quay": [
        (G, "Dock!C29 gravity-number"),
        (G, "Dock!C31 gravity-number"),
        (G, "Dock!C37 gravity-number"),
        (G, "Dock!C41 gravity-number"),
        ("a note on a correct cell: 0.999 read as the density of water, which it is (kg/L at "
         "15 °C, the reference of the specific gravity, from memory)",
         "Dock!C43 trade-constant"),
        ("a note on a correct cell: 0.433 read as γ_w in psi/ft, which it is, and the specific "
         "gravity multiplies it as the note asks (Cameron Hydraulic Data, 19th ed., from "
         "memory)", "Dock!C44 gravity-number"),
        (G, "Dock!C47 gravity-number"),
        ("a note on a correct cell: 3960 read as one over γ_w in gpm·ft/hp, which it is "
         "(common practice)", "Dock!C52 gravity-number"),
        (G, "Dock!C66 gravity-number"),
    ],
    "sports-hall-larchmere": [
        ("a note on a correct cell: 1.2 read as air's ρ·c_p in kJ/(m³·K), which it is (CIBSE "
         "Guide C (2007), from memory)", "Hall!C38 trade-constant"),
        ("a note on a correct cell: 1.08 read as air's ρ·c_p in the US units around it, which "
         "it is (0.075 lb/ft³ × 0.24 Btu/(lb·°F) × 60 min/h, ASHRAE Fundamentals (2021), from "
         "memory)", "Hall!C45 trade-constant"),
        ("a note on a correct cell: 0.287 read as the gas constant of dry air in kJ/(kg·K), "
         "which it is (common practice)", "Hall!C49 trade-constant"),
        ("a note on a correct cell: 4.19 read as the specific heat of water, which it is",
         "Hall!C56 trade-constant"),
        ("a note on a correct cell: 500 read as the heat capacity of a volume of water, which "
         "it is (ASHRAE, from memory)", "Hall!C60 trade-constant"),
        ("a note on a correct cell: 1.2 read as air's ρ·c_p in kJ/(m³·K), which it is",
         "Hall!C71 trade-constant"),
    ],
    "rising-main-fenwick-staithe": [
        ("a note on a correct cell: 10.67 read as the constant of an empirical fit that holds "
         "only in its own units, which is right for Hazen–Williams in m, m³/s and m (common "
         "practice, from memory)", "Station!C29 trade-constant"),
        (G, "Station!C34 gravity-number"),
        (G + ", on the planted cell, beside the error that catches it",
         "Station!C35 gravity-number"),
        (G, "Station!C37 gravity-number"),
        (G, "Station!C46 gravity-number"),
        ("a note on a correct cell: 0.433 read as γ_w in psi/ft, which it is (sewage taken as "
         "water, SG 1.0)", "Station!C47 gravity-number"),
        (G, "Station!C49 gravity-number"),
        ("a note on a correct cell: 3960 read as one over γ_w in gpm·ft/hp, which it is",
         "Station!C52 gravity-number"),
        (G, "Station!C60 gravity-number"),
        (G, "Station!C64 gravity-number"),
        ("a note on a correct cell: 8.34 × mg/L × mgd = lb/d, a unit conversion (common "
         "practice); the note's first line says 8.34 is read 'as the weight of a US gallon of "
         "water, not as a unit conversion' and its last line 'here it only converts units': "
         "the last is right", "Station!C81 trade-constant"),
    ],
}

MISSED = {}

RENAMED = {
    "sports-hall-larchmere": {
        "Hall!C61": ("result-unit", "the 500 rule with a °C difference and no ×1.8 is read as "
                                    "a dimension error, [L^3 T^-1 Θ] for power, not as a "
                                    "factor of 1.8; with the 1.8 the 500 is read as water's "
                                    "ρ·c_p"),
    },
}

MESSAGES = {
    "brewhouse-tallow-lane": {
        "Copper!C10": "\"its units are 158.987 times too large for it, its coefficient 117.3 "
                      "aside\": measured against the oil barrel; the slip, 117.3 turned "
                      "over (13 759 times too large in beer barrels), is not named. With a "
                      "beer barrel defined in a sidecar plumb says 'wrong way round' (probe)",
        "Copper!C24": "\"the value shown is 10⁵ times too small\": it is 10⁶ (2900² mm² read "
                      "as m²); the ×0.1 that turns hL into m³ is in the formula and right, "
                      "but is left out of the count",
        "Copper!C73": "\"the conversion factor 100 in this formula is the wrong way round\" "
                      "and \"10000 times too small\": both /100 turn a % into a fraction and "
                      "are right; the slip is the hops in kg taken as grams, 1000 too small "
                      "(the same message comes with no ×1000 at all, probe)",
    },
    "fuel-dock-skerrow-quay": {
        "Dock!C38": "\"this formula computes [L^2 T^-2] (specific energy ...)\" for a "
                    "pressure over a density: true, but no remedy ('is a g missing') is "
                    "offered",
    },
    "sports-hall-larchmere": {
        "Hall!C61": "\"this formula computes [L^3 T^-1 Θ]\": names a dimension error where "
                    "the 500 rule lacks only the ×1.8 that turns a °C difference into Δ°F; "
                    "no remedy offered",
    },
    "rising-main-fenwick-staithe": {
        "Station!C65": "\"this formula computes [L^2 T^-2] (specific energy ...)\" for a·Δv "
                       "written as a head: true, but no remedy ('is a g missing') is offered",
    },
}

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")
HEADNOTE = {stem: [LINE] for stem in ("brewhouse-tallow-lane", "fuel-dock-skerrow-quay",
                                      "sports-hall-larchmere", "rising-main-fenwick-staithe")}

# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.
