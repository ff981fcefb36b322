"""What the frozen plumb (/work/frozen15/plumb) reports on the review76 books beyond the
planted mistakes, and the planted cells it misses or names by another rule, each with the
reviewer's reason. Read by make_books.py when it writes the .expect files.

Invented scenario. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.
"""

NOTE_834 = ("a note on a correct cell: 8.34 lb/gal read as the trade's number in MGD × mg/L "
            "(AWWA 2016, from memory)")
NOTE_834_RHO = ("a note on a correct cell: 8.34 lb/gal read as the density of water in "
                "lb/d ÷ (8.34 × SG) (AWWA 2016, from memory)")
NOTE_033 = ("a note on a correct cell: 0.33 W·h/(m³·K) read as air's ρ·c_p (CIBSE Guide A "
            "2015, from memory)")
NOTE_419 = ("a note on a correct cell: 4.19 read as water's ρ·c_p in kJ/(L·K) (common "
            "practice)")

EXTRA = {
    "chemical-dosing": [
        (NOTE_834, "Dosing!C16 trade-constant"),
        (NOTE_834_RHO, "Dosing!C25 trade-constant"),
    ] + [(NOTE_834, f"Log!E{r} trade-constant") for r in range(5, 12)],
    "heat-loss": [
        (NOTE_033, "Rooms!L6 trade-constant"),
        (NOTE_033, "Rooms!L7 trade-constant"),
        (NOTE_033, "Rooms!L8 trade-constant"),
        ("a note on the planted cell L9 besides its error: the 0.33 is still read as air's "
         "ρ·c_p", "Rooms!L9 trade-constant"),
        ("a correct cell plumb still flags: the heading 'U [Btu/h·ft²·°F]' is read as "
         "(Btu/h)·ft²·°F, not Btu/(h·ft²·°F) as ASHRAE Handbook—Fundamentals (I-P) prints it; "
         "=B5/5.678 is right (NIST SP 811 (2008) App. B.8: 5.678 W/(m²·K) per Btu/(h·ft²·°F))",
         "Constructions!C5 result-unit"),
        ("a correct cell plumb still flags: the same heading misread; =B6/5.678 is right",
         "Constructions!C6 result-unit"),
        ("a correct cell plumb still flags: the same heading misread; =B8/5.678 is right",
         "Constructions!C8 result-unit"),
        ("a correct cell plumb still flags: U·A·ΔT in Btu/h with U from the IP column, whose "
         "unit 'Btu/h·ft²·°F' (beside C22) is misread as above (ASHRAE Fundamentals 2021 I-P, "
         "from memory)", "Summary!C23 result-unit"),
        ("a note on a correct cell: 1.08 Btu/(h·cfm·°F) read as air's ρ·c_p (ASHRAE "
         "Fundamentals 2021 I-P, from memory)", "Summary!C31 trade-constant"),
    ],
    "boiler-blowdown": [
        ("a note on a correct cell: 500 lb/h per gpm (8.34 lb/gal × 60 min/h, common "
         "practice) read as water's density", "Boiler!C28 trade-constant"),
    ],
    "milk-cooling": [
        (NOTE_419, "Cooling!C44 trade-constant"),
        ("a note on a correct cell: 8.34 Btu/(gal·°F) read as water's ρ·c_p (common practice)",
         "Cooling!C46 trade-constant"),
        (NOTE_419, "Wash!F5 trade-constant"),
        (NOTE_419, "Wash!F6 trade-constant"),
        (NOTE_419, "Wash!F7 trade-constant"),
        ("a correct cell plumb still flags: =SUM(B5:B8) under the heading 'Volume [US gal]'; "
         "plumb does not read 'US gal' (NIST SP 811 (2008) App. B.8 'gallon (U.S.)', its own "
         "'gal'), and its advice, 'measure US = ...', would define a unit called US",
         "Wash!B9 no-unit"),
        ("an input plumb cannot give a unit: 'US gal' in the heading (as Wash!B9)",
         "Wash!B5 no-unit"),
        ("an input plumb cannot give a unit: 'US gal' in the heading (as Wash!B9)",
         "Wash!B6 no-unit"),
        ("an input plumb cannot give a unit: 'US gal' in the heading (as Wash!B9)",
         "Wash!B7 no-unit"),
        ("an input plumb cannot give a unit: 'US gal' in the heading (as Wash!B9)",
         "Wash!B8 no-unit"),
    ],
}

MISSED = {
    "milk-cooling": {
        "Cooling!C38": ("the US gal column has no unit for plumb ('US gal' not read), so the "
                        "SUM over gal and L is not seen as mixed; with a sidecar line 'cells "
                        "Wash!B5:B9 : gal' plumb reports mixed-range"),
        "Wash!C7": ("the US gal input has no unit for plumb, so the wrong-way 3.785 is not "
                    "seen; with the sidecar line above plumb reports unit-scale, wrong way "
                    "round"),
    },
}

RENAMED = {
    "heat-loss": {
        "Design!C13": ("sum-mismatch", "'cannot add 32 to C8*1.8', which is the slip: a "
                       "difference given the °F scale's offset"),
        "Constructions!C7": ("result-unit", "reported only because the heading 'Btu/h·ft²·°F' "
                             "is misread (as on the correct rows); with 'Btu/(h·ft²·°F)' "
                             "plumb says the 5.678 is the wrong way round, which is the slip"),
    },
    "milk-cooling": {
        "Cooling!C12": ("result-unit", "it cannot know 8.6 lb/gal of milk, so L × 8.6 "
                        "'computes a volume'; right cell, and the 3.785 is not named"),
        "Cooling!C47": ("result-unit", "with ΔT in °F the 4.19 is no longer read as water's "
                        "ρ·c_p, so the message gives a dimension, not the 1.8"),
        "Wash!F8": ("result-unit", "without the /3600 the 4.19 is no longer read as water's "
                    "ρ·c_p, so the message gives [L^3 Θ], not 'kJ written as kWh, 3600 too "
                    "large'"),
    },
}
