"""review82: what the frozen plumb (/work/frozen16) reports beyond the planted mistakes, and the
planted cells it names by another rule, with the reviewer's reasons. Read by make_books.py.

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.
"""

EXTRA = {
    "boiler-fuel": [
        ("a correct cell plumb still flags: Plant!C18 =C15/33475 under 'BHP'. The sidecar "
         "boiler-fuel.cells.plumb defines 'measure BHP = 33475 Btu/h' (boiler horsepower, ABMA, "
         "common practice), but the workbook reader takes the text 'BHP' (and 'bhp') as the "
         "mechanical horsepower, 2544.43 Btu/h, ahead of the sidecar's measure, with no note "
         "that the measure was set aside; the same measure works in a .plumb file. The message "
         "('2544.43 times too large') is then wrong for this sheet",
         "Plant!C18 unit-scale"),
        ("a note on a correct cell: 519.67 °R (60 °F), the contract base temperature, read as a "
         "standard reference temperature beside (t + 459.67), which it is",
         "Plant!C24 trade-constant"),
        ("a note on a planted cell (besides its offset-scale error): the same 519.67 °R",
         "Plant!C25 trade-constant"),
        ("a correct cell plumb still flags: Plant!C38 =(C35-C36)*(0.66/(21-C37)+0.009), the "
         "Siegert flue gas loss for natural gas (1. BImSchV Annex III, from memory), whose "
         "coefficients A2 = 0.66 and B = 0.009 carry 1/K (and %) that a workbook cannot write "
         "on a typed number; plumb reads the product as a temperature, where it reads "
         "Hazen-Williams' 10.67 in the pump book as an empirical fit's constant (a note)",
         "Plant!C38 result-unit"),
        ("a note on a correct cell: 273.15 in V_n·(t + 273.15)/273.15 read as the 0 °C "
         "reference state of the Nm³, which it is",
         "Plant!C41 trade-constant"),
    ],
    "pump-station": [
        ("a note on a correct cell: 10.67 in Hazen-Williams (SI) read as an empirical fit's "
         "constant carrying a dimension, which it is",
         "Duty!C20 trade-constant"),
        ("a note on a correct cell: 9.81 in K·V²/(2·9.81) read as g, which it is",
         "Duty!C25 gravity-number"),
        ("a note on a correct cell: in 9.81·Q[L/s]·H/1000 (kW) the 1000 is said to be 'one over "
         "the specific weight of water, 1000 to 1005'; the verdict is right, but the words are "
         "not: with 9.81 taken as g, 1000 to 1005 is one over the density of water in these "
         "units (the W per kW, with ρ_w = 1 kg/L); one over γ_w here is 102",
         "Duty!C39 gravity-number"),
        ("a note on a correct cell: 3960 in gpm·ft/3960 read as one over γ_w in hp/(gpm·ft), "
         "which it is (Cameron Hydraulic Data, from memory)",
         "Duty!C40 gravity-number"),
        ("a note on a correct cell: 9.81 in (p_d − p_s)/9.81 read as γ_w in kN/m³, which it is",
         "Duty!C56 gravity-number"),
        ("a note on a correct cell: 9.81 in (p_atm + p_s − p_v)/9.81 read as γ_w in kN/m³",
         "Duty!C60 gravity-number"),
        ("a note on a correct cell: 9.81 in V_s²/(2·9.81) read as g", "Duty!C60 gravity-number"),
    ],
    "reefer-fleet": [
        ("a note on a correct cell: 1.08 in 1.08·cfm·Δt (Btu/h, Δt in °F) read as the heat "
         "capacity of a volume of air, which it is (ASHRAE Handbook—Fundamentals, from memory)",
         "Body!C22 trade-constant"),
    ],
    "concrete-mix": [
        ("a correct cell plumb still flags: Design!C8 =IF(C7<3000,C7+1000,IF(C7<=5000,C7+1200,"
         "1.1*C7+700)), the required average strength without a test record (ACI 318-19 §26.12 "
         "/ ACI 301, from memory), 1000, 1200 and 700 all in psi; plumb takes the 1000 and the "
         "1200 beside C7 as psi but calls the 700 beside 1.1*C7 dimensionless (sum-mismatch)",
         "Design!C8 sum-mismatch"),
        ("a note on a correct cell: 62.4 read as the density of water in lb/ft³ (ACI 211.1 "
         "absolute volumes), which it is", "Design!C27 trade-constant"),
        ("a note on a correct cell: 62.4 lb/ft³ again", "Design!C28 trade-constant"),
        ("a note on a correct cell: 62.4 lb/ft³ again", "Design!C29 trade-constant"),
        ("a note on a correct cell: 62.4 lb/ft³ again", "Design!C32 trade-constant"),
        ("a note on a correct cell: 1000 read as the density of water in kg/m³, which it is",
         "Design!C40 trade-constant"),
        ("a note on a correct cell: 8.34 lb per US gallon of water, which it is",
         "Batch!B19 trade-constant"),
    ],
}

MISSED = {}

RENAMED = {
    # D in mm in Hazen-Williams: caught, but as a dimension (result-unit) with an exotic
    # dimension, not as a unit scale naming the millimetres
    "pump-station": {"Duty!C21": "result-unit"},
}

MESSAGES = {
    "concrete-mix": {
        "Design!C39": ("right cell, wrong factor: =C34*0.5933 (lb/ft³ times the lb/yd³ factor) "
                       "is 27 times too small, but plumb says '16.0185 times too small', as if "
                       "the 0.5933 were not there (a probe with =B3*2 gets the same 16.0185)"),
    },
    "pump-station": {
        "Duty!C21": ("right cell, wrong words: plumb reports a dimension, [L^(843/500) "
                     "T^(-463/250)] against m, where the slip is D in mm raised to 4.87 (a "
                     "unit scale); the note 'C18 is in mm' is the only pointer to it"),
    },
}
