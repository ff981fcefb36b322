"""The reviewer's record of what plumb reports on the four review34 books beyond the planted
mistakes, and the planted cells it misses or names under another rule, each with the reason (as
first recorded; the .expect files are kept by hand since). Read by make_books.py to write the
.expect files (`python3 make_books.py --expect`).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.
"""

HEADNOTE = {
    "chiller-plant": [
        "Hospital chilled water plant (invented). Sources are named in each sheet's A2 cell.",
        "The reviewer's fix of an own layout mistake before this record: a 'Reported in' note column",
        "(text 'kW'/'TR') first sat right of the TR column, and plumb read it, as its README",
        "says it will, as the unit of the TR cells; the note column now stands in column B.",
    ],
    "crude-pump-station": [
        "Crude oil pump station (invented). Sources are named in each sheet's A2 cell.",
    ],
    "warehouse-sprinklers": [
        "Warehouse sprinkler hydraulics (invented). Sources are named in each sheet's A2 cell.",
    ],
    "girder-prestress": [
        "Precast pretensioned girder (invented). Sources are named in each sheet's A2 cell.",
    ],
}

MISSED = {
    "chiller-plant": {
        "Plant!C56": "(expected unit-scale: the factor 0.0631 is not needed, the flow in C55 is "
                     "already in L/s). plumb calls a 4-digit factor that is not needed an error "
                     "(=C6*0.06309 or =B5/3.517 are flagged) but lets the 3-digit 0.0631 through "
                     "as a plain coefficient: a scratch probe showed m³/h × 0.0631, 0.063, 0.631 "
                     "and 0.00379 written as m³/h all pass silently, while 0.2271 and 4.403 are "
                     "flagged",
    },
}

RENAMED = {
    "crude-pump-station": {
        "Station!C45": ("result-unit", "it reads 2.31 as 1/γ_w for a result in ft and says so "
                        "in a note (0.7041 in m)"),
    },
    "warehouse-sprinklers": {
        "Design!C46": ("result-unit", "with the bore in mm the 4.52 is no longer read as the fit "
                       "constant, so the result is an odd dimension; the message does not name "
                       "the diameter's unit"),
        "Nodes!M8": ("result-unit", "0.0981 is read as a bare number, so the cell computes a "
                     "length; the message does not suggest 0.433 psi/ft"),
    },
}

MESSAGES = {
    "crude-pump-station": {
        "Station!C50": "'its units are 24.4898 times too large for it, its coefficient 2449 "
                       "aside' - misleading: the value shown is 100 times too small (η in % "
                       "used as a fraction); the correct cell C49 shows 2449 is the exact "
                       "bbl/h·psi-to-hp constant",
    },
    "girder-prestress": {
        "Losses!C30": "advises multiplying the moment term by 999950, not 10^6: it compares with "
                      "the first term, whose kip-to-kN factor is the rounded 4.448",
    },
}

EXTRA = {
    "chiller-plant": [
        ("a note on a correct cell: TR = gpm·ΔT/24 (common practice); 24 read as 1/(ρ·c_p) of "
         "water in those units, which it is", "Plant!C22 trade-constant"),
        ("a note on a correct cell: bhp = gpm·ft/(3960·η) (Cameron Hydraulic Data 19th ed., "
         "from memory); 3960 read as 1/γ_w, which it is", "Plant!C48 gravity-number"),
        ("a note on a correct cell: q[Btu/h] = 500·gpm·ΔT[°F] (common practice); 500 read as "
         "ρ·c_p of water in those units, which it is", "Plant!C58 trade-constant"),
    ],
    "crude-pump-station": [
        ("a note on a correct cell: h[ft] = 2.31·p[psi]/SG (common practice); 2.31 read as "
         "1/γ_w, which it is", "Station!C44 gravity-number"),
        ("a correct cell plumb still flags: the input Station!C7 holds API gravity with "
         "'°API' beside it, as the trade writes it (API MPMS ch. 11.1); plumb does not know "
         "°API and suggests a 'measure' line, but °API is a non-linear scale, not a multiple "
         "of a unit: '-' is what it can take. Its only use, SG = 141.5/(131.5 + °API) in "
         "Station!C8, is checked clean", "Station!C7 no-unit"),
    ],
    "warehouse-sprinklers": [
        ("a note on a correct cell: NFPA 13 (2019) Hazen–Williams 4.52 form read as the "
         "fit's constant", "Design!C38 trade-constant"),
        ("a note on a correct cell: the EN 12845 SI Hazen–Williams 6.05·10⁵ form read as "
         "the fit's constant", "Design!C45 trade-constant"),
        ("a note on a correct cell: NFPA 13 Hazen–Williams 4.52 form", "Nodes!J5 trade-constant"),
        ("a note on a correct cell: 0.433 psi/ft read as γ_w, which it is",
         "Nodes!M5 gravity-number"),
        ("a note on a correct cell: NFPA 13 Hazen–Williams 4.52 form", "Nodes!J6 trade-constant"),
        ("a note on a correct cell: 0.433 psi/ft read as γ_w", "Nodes!M6 gravity-number"),
        ("a note on a correct cell: NFPA 13 Hazen–Williams 4.52 form", "Nodes!J7 trade-constant"),
        ("a note on a correct cell: 0.433 psi/ft read as γ_w", "Nodes!M7 gravity-number"),
        ("a note on a correct cell: NFPA 13 Hazen–Williams 4.52 form", "Nodes!J8 trade-constant"),
    ],
    "girder-prestress": [
        ("a note on a correct cell: E_ci = 33 000·K1·w_c^1.5·√f'ci (AASHTO LRFD 8th ed. eq. "
         "5.4.2.4-1, from memory), 33000 read as the fit's constant", "Girder!C21 trade-constant"),
        ("a correct cell plumb still flags: γ_st = 5/(1 + f'ci) with f'ci in ksi is AASHTO "
         "LRFD 8th ed. §5.9.3.3 (eq. 5.9.3.3-3, from memory) exactly as printed: an empirical "
         "fit whose 1 is 1 ksi; plumb reads 4.52, 33000 and 1.7 − 0.01·H as fits but not a "
         "fit's additive constant, and calls the result 'compressibility'",
         "Losses!C16 result-unit"),
        ("a correct cell plumb still flags: Δf_pLT = 10.0·f_pi·A_ps/A_g·γ_h·γ_st + "
         "12.0·γ_h·γ_st + Δf_pR, AASHTO LRFD 8th ed. §5.9.3.3 (eq. 5.9.3.3-1, from memory), "
         "whose 12.0 is in ksi; plumb reads the bare 12 as dimensionless",
         "Losses!C18 sum-mismatch"),
    ],
}
