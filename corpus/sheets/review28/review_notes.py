"""The reviewer's record of plumb's findings beyond the planted mistakes, and the planted cells
it misses (review28, as first recorded). Invented scenarios; a dimensionally consistent formula
can still be wrong, and this check does not replace independent review under local codes and
licensed practice."""
N = "a note on a trade's number, read as such (right reading)"
EXTRA = {
    "vav-schedule": [
        (N + ": 1.08 Btu/(h·cfm·°F), standard air, ASHRAE Fundamentals 2017 ch. 18",
         "Design!C28 trade-constant"),
        (N + ": 1.2 W/(L/s·K), the SI form of the same", "Design!C30 trade-constant"),
        (N + ": 1.08 in the reheat column", "Schedule!I5 trade-constant"),
        (N + ": 1.08 in the reheat column", "Schedule!I6 trade-constant"),
        (N + ": 1.08 in the reheat column", "Schedule!I7 trade-constant"),
        (N + ": 1.08 in the reheat column", "Schedule!I8 trade-constant"),
    ],
    "gas-piping": [
        (N + ": 14.7 psia, the standard atmosphere, in the line-pressure correction",
         "Design!C21 trade-constant"),
        ("a correct cell plumb still flags: IFGC 2021 Eq. 4-1, D = Q^0.381/(19.17·(ΔH/(Cr·L))"
         "^0.206) with D in in., Q in cfh, ΔH in in. w.c., L in ft (from memory); a unit-bound "
         "empirical fit whose 19.17 carries the units, which a workbook cannot mark as plumb's "
         "notation can with '?'", "Design!C30 result-unit"),
        ("a correct cell plumb still flags: the same IFGC fit inverted for the drop, ΔH = Cr·L·"
         "(Q/(2313·D^2.623))^1.848", "Runs!I5 result-unit"),
        ("a correct cell plumb still flags: the same IFGC fit", "Runs!I7 result-unit"),
        ("a correct cell plumb still flags: the same IFGC fit", "Runs!I8 result-unit"),
    ],
    "tower-makeup": [
        (N + ": 500 Btu/(h·gpm·°F) for water, ASHRAE HVAC Systems and Equipment 2020 ch. 40",
         "Tower!C18 trade-constant"),
        (N + ": 4.19 kJ/(kg·K) with q in L/s (m³/h over 3.6)", "Tower!C20 trade-constant"),
        (N + ": 8.34 lb/gal of water in the chloride load", "Tower!C49 trade-constant"),
        ("a correct cell plumb still flags: the rule of thumb E = 0.00085·gpm·R[°F] (Cooling "
         "Technology Institute guidance, from memory), whose 0.00085 carries 1/°F (c_p/h_fg "
         "times the evaporated share); plumb is right about the dimension, but the trade writes "
         "it this way and a workbook cannot mark the coefficient", "Tower!C30 result-unit"),
        ("a correct cell plumb still flags: drift 0.005 % of circulation written =C7*0.005/100 "
         "(CTI, from memory); the /100 turns the percentage into a fraction, but plumb calls it "
         "'a factor not needed' and the cell 0.01 times its true value (it passes =C7*2/100 "
         "but flags 0.5/100, 0.2/100, 0.02/100 alike)", "Tower!C44 unit-scale"),
    ],
    "spray-booth": [
        (N + ": 385.3 ft³/lbmol at 68 °F and 1 atm", "Booth!C40 trade-constant"),
        (N + ": 24.45 L/mol at 25 °C", "Booth!C41 trade-constant"),
        (N + ": 385.3 ft³/lbmol in the vapour column", "Coatings!G5 trade-constant"),
        (N + ": 385.3 ft³/lbmol in the vapour column", "Coatings!G6 trade-constant"),
        (N + ": 385.3 ft³/lbmol in the vapour column", "Coatings!G7 trade-constant"),
        (N + ": 385.3 ft³/lbmol in the vapour column", "Coatings!G8 trade-constant"),
    ],
}
MISSED = {
    "vav-schedule": {
        "Design!C23": ("1.699 already holds the 60 min/h of cfm to m³/h; the extra *60 makes the "
                       "value 60 times too large, and plumb stays silent (it flags *1.699*1000 "
                       "and *1.699*3600, and =C21*101.94, but not a 60 beside a complete "
                       "conversion); expected unit-scale"),
    },
    "tower-makeup": {
        "Tower!C27": ("c_p·R/h_fg is a fraction and f_e is already in %, so the product is in %; "
                      "the trailing *100 makes it 100 times too large; plumb passes any *100 or "
                      "/100 into a % cell (=C4*100 with C4 in % is silent too, =C4*1000 is "
                      "caught); expected unit-scale"),
    },
    "spray-booth": {
        "Booth!C18": ("the same doubled 60 as vav-schedule Design!C23: cfm × 1.699 × 60 written "
                      "as m³/h; expected unit-scale"),
    },
}
RENAMED = {
    "vav-schedule": {
        "Design!C14": ("offset-scale", "the right cell, and the note shows the bracketed "
                       "=(C12-32)/1.8"),
        "Design!C31": ("result-unit", "the headline gives a dimension, but the note names the "
                       "cause: 1.2 wants ΔT in K, in °F it would be 0.6667"),
    },
    "gas-piping": {
        "Runs!I6": ("result-unit", "flagged only as its correct neighbours I5, I7 and I8 are "
                    "(the IFGC fit read as a dimension error); nothing singles out the length "
                    "in m, so in substance a miss"),
    },
    "tower-makeup": {
        "Tower!C21": ("result-unit", "with m³/h in it plumb no longer reads 4.19 as water's "
                      "heat capacity and reports a dimension; the missing /3.6 is not named"),
        "Tower!C50": ("result-unit", "without the 1440 plumb no longer reads 8.34 as water's "
                      "density and reports a volume flow; the missing 1440 min/d is not named"),
    },
}
MESSAGES = {
    "tower-makeup": {
        "Tower!C9": ("'the value shown is 4.40287 times too large': wrong; 0.0631 is the "
                     "gpm-to-L/s factor and the value is 3.6 times too small (0.0631 counted as "
                     "a coefficient and left out of the figure)"),
    },
    "spray-booth": {
        "Booth!C28": ("'its units are 1.58005 × 10⁶ times too large for it, its coefficient 6356 "
                      "aside': the slip is the Pa input, 249.1 times the in. w.c. the formula "
                      "wants; the figure folds 6356 in and the note points at 6356"),
    },
}
RENOTE = {}
