"""The reviewer's record of plumb's findings beyond the planted mistakes, and the planted cells
it misses (review94, frozen18 binary). Invented scenarios; a dimensionally consistent formula
can still be wrong, and this check does not replace independent review under local codes and
licensed practice."""
N = "a note on a trade's number, read as such (right reading)"
EXTRA = {
    "grain-dryer": [(N + ": 1.08 Btu/(h·cfm·°F), ASHRAE Fundamentals 2017 ch. 1", "Dryer!C40 trade-constant")],
    "air-dryer": [
        (N + ": 273.15 K and 1.013 bar of the normal state", "Dryer!C14 trade-constant"),
        (N, "Dryer!C14 trade-constant"),
        (N + ": 273.15 K (note on the planted cell's neighbour term)", "Dryer!C15 trade-constant"),
        ("a note that misreads 14.5 (bar to psi) as a standard reference pressure", "Dryer!C31 trade-constant"),
        ("a correct cell plumb still flags: 14.5 is 1 bar = 14.5 psi (NIST SP 811 (2008) App. "
         "B.8, 14.5038 rounded), dividing a psi drop by it gives bar; plumb reads it as a "
         "'standard reference pressure' and calls the term dimensionless", "Dryer!C31 sum-mismatch"),
        ("a correct cell plumb still flags: the rule of thumb '1 % of compressor power per 2 psi' "
         "(US DOE compressed air sourcebook 2003, from memory) holds a 2 psi the formula leaves "
         "bare; plumb is right that the 2 carries psi, but the rule is written this way in the "
         "trade", "Dryer!C37 result-unit"),
    ],
    "pv-yield": [
        (N + ": 8760 h in a year of 365 days", "Yield!C32 trade-constant"),
        (N + ": 8760 h (on the planted cell)", "Yield!C33 trade-constant"),
        (N + ": 8760 h", "Yield!C34 trade-constant"),
        ("a correct cell plumb still flags: NOCT model T_c = T_a + (NOCT − 20)·G/800 (Duffie & "
         "Beckman 4th ed. 2013 ch. 23) with the 800 W/m² of the NOCT test written bare, as the "
         "trade writes it", "Yield!C38 sum-mismatch"),
    ],
}
# Filters!E7 (a drop already in psi multiplied by 14.5 again) was missed when this book was
# written; plumb reports it since a later round.
MISSED = {}
RENAMED = {}
MESSAGES = {}
