"""review75: what the round's build of the time reports on these books beyond the planted
mistakes, the planted cells it misses or names by another rule, and its messages that mislead,
each with the reviewer's reason, recorded after reading every finding. Read by make_books.py
when it writes the .expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.

As run by the reviewer (count.py): planted flagged 38/38 (quarry 10/10, medical gases 10/10,
portal frame 9/9, biogas CHP 9/9), each by the rule planted; correct formula cells clean
143/147 (quarry 40/40, medical gases 36/38, portal frame 35/36, biogas CHP 32/33). No crash or
hang; exit status 1 on every book, in text and JSON alike, and the two runs name the same cells
and rules.

The reviewer's variants (probe/probes.py, not counted): the UK NA's c_alt = 1 + 0.001·A passes
with the 0.001 in a cell of unit 1/m and fails typed, whether as 0.001·A, A/1000 or inline in
v_b; the standard atmosphere's 1 − 2.25577×10⁻⁵·z passes with the coefficient in a cell of 1/m;
a vacuum below atmosphere as (p_b − p_abs)/0.1333 into mmHg passes, −p_g/0.1333 or −p_g·7.501
into mmHg fails (offset-scale), 'mmHg vac' is not read as a unit (no-unit), and p_g/0.1333 into
'mmHg(g)' passes (a negative gauge reading); ppm to mg/Nm³ passes with M in a cell of g/mol,
V_m typed as 22.414 or in a cell of L/mol; 3413 Btu/kWh (older US handbooks) and 3600 into
kJ/kWh pass; 3.666 into igpm passes and 4.4 for 4.403 into gpm passes (its rounding);
(p_g + 1.013)/1.013 beside a declared barometer of 0.998 bar passes with a note only (1.5 %
apart); ρ·Q·H into W and kg/m set equal to N/m are errors that name momentum and linear
density, never a missing g.
"""

EXTRA = {
    "quarry-dewatering-greyhope": [
        ("a note on a correct cell: 10.67 read as an empirical fit's constant, which it is "
         "(Hazen-Williams in SI form, Q in m³/s, D and L in m, common practice)",
         "Pumps!C33 trade-constant"),
        ("a note on a correct cell: 9.81 read as standard gravity, which it is (velocity "
         "head K·v²/(2g))", "Pumps!C35 gravity-number"),
        ("a note on a correct cell: 1000 read as the density of water, which it is (SG = "
         "ρ/ρ_w)", "Pumps!C40 trade-constant"),
        ("a note on a correct cell: 9.81 read as standard gravity, which it is (ρ·g·Q·H)",
         "Pumps!C41 gravity-number"),
        ("a note on a correct cell: 3960 read as one over the specific weight of water, "
         "which it is (hp = gpm·ft·SG/(3960·η), Hydraulic Institute, from memory)",
         "Pumps!C45 gravity-number"),
        ("a note on a correct cell: 0.433 read as the specific weight of water in psi/ft, "
         "which it is (common practice)", "Pumps!C52 gravity-number"),
        ("a note on a correct cell: 9.81 read as standard gravity, which it is (NPSHa)",
         "Pumps!C58 gravity-number"),
        ("a note on a correct cell: 9.81 read as standard gravity, which it is (Stokes' law)",
         "Lagoon!C10 gravity-number"),
        ("a note on the planted cell Lagoon!C11: 9.81 read as standard gravity, rightly; the "
         "slip there is the mPa·s, reported by unit-scale", "Lagoon!C11 gravity-number"),
    ],
    "medgas-st-ebbas": [
        ("a note on a correct cell: 8.314 read as the molar gas constant, which it is "
         "(CODATA 2018)", "Oxygen!C19 trade-constant"),
        ("FLAGGED CORRECT CELL (plumb's limit): the standard atmosphere at the site's "
         "altitude, p = 101.325·(1 − 2.25577×10⁻⁵·z)^5.2559 kPa with z in m (ASHRAE "
         "Handbook, Fundamentals, 2017, ch. 1, eq. 3, from memory); the 2.25577×10⁻⁵ carries "
         "1/m. With the coefficient in a cell of unit 1/m the same formula passes "
         "(probe/probes.py). The message calls it a sum of a number and a length, with no "
         "word that a typed coefficient may carry a unit", "Oxygen!C46 sum-mismatch"),
        ("FLAGGED CORRECT CELL (plumb's limit): the receiver vacuum below atmosphere, read "
         "positive as the plant's vacuum gauge shows it, −p_g/0.1333 with 1 mmHg = 0.1333 kPa "
         "(NIST SP 811 (2008) App. B.8); the row's label says 'vacuum below atmosphere'. "
         "plumb reads 'mmHg' as absolute and has no spelling for a vacuum reading ('mmHg vac' "
         "is not read as a unit; 'mmHg(g)' passes only as a negative gauge value), and its "
         "note 'add or subtract the atmospheric pressure' would make the cell wrong: a vacuum "
         "below atmosphere needs no atmosphere added. (p_b − p_abs)/0.1333 passes "
         "(probe/probes.py)", "Vacuum!C11 offset-scale"),
        ("a note on a correct cell: 1.2 read as the heat capacity of a volume of air, "
         "ρ_a·c_p,a in kJ/(m³·K); the product 1.2 × 1.005 is that, but the 1.2 written here "
         "is the density in kg/m³ and 1.005 the c_p in kJ/(kg·K) (common practice), so the "
         "note names the wrong number for the quantity; harmless here",
         "Vacuum!C28 trade-constant"),
        ("a note on the planted cell Vacuum!C29: the same reading of 1.2; the slip there is "
         "the 1000, reported by unit-scale", "Vacuum!C29 trade-constant"),
    ],
    "portal-wind-brackley-moor": [
        ("FLAGGED CORRECT CELL (plumb's limit): the altitude factor c_alt = 1 + 0.001·A with "
         "A in m (BS EN 1991-1-4 UK National Annex, NA.2.4, from memory); the 0.001 carries "
         "1/m. It passes with the 0.001 in a cell of unit 1/m, and fails written 1 + A/1000 "
         "(probe/probes.py). The message gives no hint that a code's coefficient may carry a "
         "unit", "Wind!C9 sum-mismatch"),
        ("a note on a correct cell: 0.613 read as half the density of air, which it is (UK "
         "NA, q_b = 0.613·v_b² in N/m²)", "Wind!C17 trade-constant"),
        ("a note on a correct cell: 0.00256 read as half the density of air in psf per mph², "
         "which it is (ASCE 7-10 eq. 29.3-1, from memory)", "Wind!C27 trade-constant"),
        ("a note on a correct cell: 287.05 read as the gas constant of dry air, which it is",
         "Wind!C33 trade-constant"),
        ("a note on a correct cell: 9.81 read as standard gravity, which it is (purlin self "
         "weight m·g)", "Purlins!C11 gravity-number"),
    ],
    "chp-biogas-hollins-moor": [
        ("a note on a correct cell: 101.325 read as the reference pressure of the Nm³, which "
         "it is (DIN 1343, common practice)", "CHP!C12 trade-constant"),
        ("a note on a correct cell: 273.15 read as the reference temperature of the Nm³, "
         "which it is", "CHP!C12 trade-constant"),
        ("FLAGGED CORRECT CELL (plumb's limit): H2S by volume to mass concentration, "
         "ppm·M/V_m with M = 34.08 g/mol and V_m = 22.414 L/mol at 0 °C, 101.325 kPa "
         "(CODATA 2018), as gas analysts and engine makers write it (common practice); both "
         "numbers carry units. It passes with M in a cell of g/mol and V_m typed "
         "(probe/probes.py): plumb reads 22.414 as the molar volume but not 34.08 as a molar "
         "mass, and says the formula 'computes [1] (dimensionless)'", "CHP!C19 result-unit"),
        ("a note on a correct cell: 8.314 read as the molar gas constant, which it is "
         "(CODATA 2018)", "CHP!C63 trade-constant"),
    ],
}

MISSED = {}

RENAMED = {}

MESSAGES = {
    "quarry-dewatering-greyhope": {
        "Pumps!C42": "\"this formula computes [M L T^-1] (momentum)\" for ρ·Q·H: true, but "
                     "'momentum' points away from the fault and no remedy is offered; the "
                     "missing factor is g (ρ·g·Q·H)",
    },
    "portal-wind-brackley-moor": {
        "Purlins!C13": "\"this formula computes [M L^-1] (linear density)\" for kg/m written "
                       "as kN/m: true, but it does not say that g (and /1000) is missing",
    },
    "medgas-st-ebbas": {
        "Vacuum!C13": "remedy \"write (C8 + 100.5), 'Oxygen!C42' in kPa\": the site barometer "
                      "in kPa is already on this sheet in C9, inside this very formula; the "
                      "advice invites a typed number (and a cell in bar on another sheet) "
                      "where C8 + C9 is the fix",
    },
    "chp-biogas-hollins-moor": {
        "CHP!C36": "headline right (1.055 times too large), but the note \"its inputs give "
                   "numbers in units of 341214 Btu/kWh ... or write the unit they give\" "
                   "offers a unit no one can write and does not name 3412 Btu/kWh as the "
                   "factor the cell needs",
        "CHP!C39": "remedy \"write (C34 + 0.998), 'C8' in bar\": C8 is the barometer in kPa, "
                   "already divided by 100 in this formula; C34 + C8/100 is the fix, not a "
                   "typed 0.998",
    },
}

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")
HEADNOTE = {stem: [LINE] for stem in ("quarry-dewatering-greyhope", "medgas-st-ebbas",
                                      "portal-wind-brackley-moor", "chp-biogas-hollins-moor")}

# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.
