"""The reviewer's record of plumb's findings beyond the planted mistakes (frozen18 binary), read
by make_books.py when it writes the .expect files. Invented scenario; a dimensionally consistent
formula can still be wrong, and this check does not replace independent review under local codes
and licensed practice."""

EXTRA = {
    "pool-treatment": [
        ("a note on a correct cell, in misleading words: in E = V·1000·c_p·ΔT/3600 the 1000 is "
         "water's density (kg/m³, common practice) and 3600 the kJ per kWh (NIST SP 811 (2008) "
         "App. B.8); plumb says '3600 is read as one over the density of water'",
         "Pool!C40 trade-constant"),
        ("a note on a correct cell: 8.34 lb/gal in the pounds formula read as water's weight per "
         "US gallon (AWWA practice; right)", "Pool!C50 trade-constant"),
    ],
    "cold-store": [
        ("a note on a correct cell: 4.5 in Q = 4.5·cfm·Δh read as air density in the units "
         "around it (0.075 lb/ft³ × 60 min/h, common practice; right)",
         "Loads!C22 trade-constant"),
    ],
    "earthworks": [],
    "stack-emissions": [
        ("two notes on a correct cell: 273.15 and 101.325 read as the reference temperature and "
         "pressure of the Nm³ (DIN 1343, from memory; right)", "Stack!C22 trade-constant"),
        ("a correct cell plumb still flags: p_abs = p_bar + p_static is how a stack test "
         "writes absolute pressure (40 CFR 60 App. A Method 2, from memory): the static gauge "
         "reading is against the local barometer already in C18; plumb takes mbar g as zero at "
         "101.325 kPa and advises adding the atmosphere again", "Stack!C20 offset-scale"),
        ("a correct cell plumb still flags: 2.05 is the trade's mg/Nm³ per ppm of NO2 (46.01/"
         "22.414, common practice); a factor typed with a hidden unit is read as a bare number",
         "Stack!C33 result-unit"),
        ("a correct cell plumb still flags: Method 19's 1.194E-7 is lb/scf per ppm of NOx (40 CFR "
         "60 App. A Method 19 Table 19-1, from memory); typed bare, plumb reads it as a number "
         "and names the resulting dimension 'compressibility'", "Stack!C46 result-unit"),
    ],
}

MISSED = {
    "earthworks": {
        "Haul!C43": ("bank and loose volumes are one unit of volume (BCM and LCM both 1 m³ in "
                     "the sidecar: the swell is a state of the material, not a unit), so a "
                     "loose load counted as bank production is dimensionally sound; expected: a "
                     "unit-scale finding only if the checker could carry the bank/loose state"),
    },
}

RENAMED = {}
