"""review39: what plumb reported on these books beyond the planted mistakes, the planted cells it
names by another rule, and its messages that mislead, each with the reviewer's reason (as first
recorded on an older binary; the .expect files are kept by hand since). Read by make_books.py
when it writes the .expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.
"""

FLAG = "a correct cell plumb still flags: "

EXTRA = {
    "fan-pump-vsd": [
        (FLAG + "Fan!C21 =C19*1000/(287.05*(C20+273.15)), air density ρ = p/(R·T) with the "
         "dry-air gas constant R = 287.05 J/(kg·K) (ISO 2533:1975, from memory) typed as a "
         "number; plumb reads 287.05 as a pure number and reports [M L^-1 T^-2 Θ^-1] against "
         "kg/m³. It accepts 9.81, 3960, 8.34 and 6356 of the trades but not R of air; with R in "
         "a cell holding J/kg·K the cell passes",
         "Fan!C21 result-unit"),
        ("a note on a correct cell: 3960 in bhp = gpm·ft/(3960·η) read as one over water's "
         "specific weight in those units, which it is (33 000 ft·lbf/min per hp over 8.33 "
         "lb/gal)", "Pump!C13 gravity-number"),
        ("a note on a correct cell: the same reading of 3960 at average flow",
         "Pump!C21 gravity-number"),
    ],
    "steam-traps": [
        (FLAG + "Survey!G5 =24.24*(C5+Basis!$C$6)*D5^2*F5/100, the US DOE Steam Tip Sheet #1 "
         "loss W[lb/h] = 24.24·P[psia]·D[in]² (an empirical constant with its discharge "
         "coefficient, from memory) as DOE prints it; plumb reads 24.24 as a pure number, so "
         "psia × in² is a force, and reports [M L T^-2] against lb/h. It reads Hazen-Williams' "
         "10.67 and HDS-5's 19.63 as a fit's constant but not this one", "Survey!G5 result-unit"),
        (FLAG + "Survey!G6, the same DOE formula (trap OK, loss factor 0 %)",
         "Survey!G6 result-unit"),
        (FLAG + "Survey!G9, the same DOE formula (contractor's trap ST-05)",
         "Survey!G9 result-unit"),
        (FLAG + "Survey!G10, the same DOE formula (ST-06; its orifice cell D10 is the planted "
         "mistake, reported there)", "Survey!G10 result-unit"),
        (FLAG + "Survey!G11, the same DOE formula (ST-07, cold)", "Survey!G11 result-unit"),
    ],
    "road-culvert": [
        (FLAG + "Hydrology!C11 =0.0195*C9^0.77*C10^(-0.385), Kirpich's t_c in min with L in m "
         "(Chow, Maidment & Mays 1988, from memory); plumb reads 0.0195 as a pure number and "
         "reports [L^0.77] against min, where it reads HDS-5's 19.63 and Hazen-Williams' 10.67 "
         "as a fit's constant", "Hydrology!C11 result-unit"),
        (FLAG + "Culvert!C16 =1/C14*C10*C11^(2/3)*C13^0.5, Manning's full-bore capacity in SI "
         "(K_u = 1.0, Chow 1959 ch. 5; HDS-5 2012) with n tabulated without a unit, as HDS-5 "
         "tabulates it; plumb reports [L^(8/3)] against m³/s and does not read the SI Manning "
         "form (with n in s/m^(1/3) the same cell passes)", "Culvert!C16 result-unit"),
        ("a note on a correct cell: HDS-5's K_u = 19.63 in K_u·n²·L/R^1.33 read as a fit's "
         "constant", "Culvert!C22 trade-constant"),
        (FLAG + "Culvert!C43 =(1+C15+29*C14^2*C38/C39^1.33)*C40^2/(2*C41), HDS-5 (2012) "
         "outlet control in US customary units, K_u = 29; plumb reports the friction term "
         "[L^-0.33] as not matching the 1 + k_e of the sum, though it reads the SI twin's 19.63 "
         "(Culvert!C22) as a fit's constant", "Culvert!C43 sum-mismatch"),
        ("a note on a correct cell: the rational method Q = C·i·A in cfs with i in in/h and A in "
         "acres, the 1.008 left out by convention (HEC-22); plumb names the convention "
         "correctly", "Flows!F5 trade-constant"),
        ("a note on a correct cell: the same for the 25-year flow", "Flows!F6 trade-constant"),
        ("a note on a correct cell: the same for the 50-year flow", "Flows!F7 trade-constant"),
        ("a note on a correct cell: the same for the 100-year flow", "Flows!F8 trade-constant"),
    ],
    "ice-rink": [
        ("a note on a correct cell: 8.34 read as water's density in lb/gal, which it is",
         "Rink!C44 trade-constant"),
        ("a note on a correct cell, in loose words: 500 in gpm = Btu/h/(500·SG·c_p·Δt) read as "
         "'the density of water in the units around it'; it is 8.34 lb/gal × 60 min/h, so the "
         "reading holds only with the minutes per hour folded in", "Brine!C22 trade-constant"),
    ],
}

MISSED = {}

RENAMED = {
    "steam-traps": {
        "Survey!G7": ("result-unit", "only the DOE 24.24 constant's dimension, the finding every "
                      "correct row of the column also gets; the % used as a fraction is not "
                      "what it reports"),
        "Survey!G8": ("result-unit", "only the DOE 24.24 constant's dimension, as on every "
                      "correct row; the gauge pressure in a product is not reported (with 24.24 "
                      "in a cell holding its unit, plumb reports offset-scale on the psig cell)"),
        "Summary!C8": ("unit-scale", "two ranges as MAX's arguments, not one mixed range; its "
                       "advice, ×14.5038 for bar g to psig, is right"),
    },
    "ice-rink": {
        "Brine!C20": ("sum-mismatch", "it calls the +32 a dimensionless number whose dimension "
                      "differs from the rise's, not an offset added to a difference"),
    },
}

MESSAGES = {
    "fan-pump-vsd": {
        "FanProfile!E6": ("'the conversion factor in this formula is the wrong way round: to "
                          "give kW it must multiply by 0.01, but it multiplies by 100'. The "
                          "formula has no factor 100 to turn round: the speed in % is cubed "
                          "without /100, so the value is 10⁶ too large; (C6/100)^3 is the fix"),
    },
    "road-culvert": {
        "Culvert!C45": ("'the factor 3.281 is not needed ... remove the factor'. Wrong advice: "
                        "the invert's ×3.281 is needed for a level in ft; the headwater C30 "
                        "(in m) is the term left unconverted. Removing the factor gives a level "
                        "in m under an ft label"),
    },
    "ice-rink": {
        "Brine!C20": ("'cannot add 32 to C11*1.8: their dimensions differ' names the cell "
                      "but not the slip: a temperature rise takes ×1.8 alone, no +32"),
    },
}
