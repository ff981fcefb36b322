"""Reviewer's notes for make_books.py (review81): what the frozen plumb (/work/frozen16) reports
beyond the planted mistakes, the planted cells it misses, and the planted cells it names under
another rule, each with the reason, after running it on the four books. Invented scenarios; a
dimensionally consistent formula can still be wrong, and this check does not replace
independent review under local codes and licensed practice."""

RENAMED = {
    "district-cooling": {"Plant!C18": "result-unit"},
    "pressure-zone": {"Nodes!I8": "result-unit", "Pipes!H6": "result-unit"},
}

MISSED = {
    "pressure-zone": {
        "Zone!C14": ("(a conversion doubled: the sum is already in gpm and is multiplied by 15.85 "
                     "gpm per L/s again; plumb names 15.85 as the wrong way round where it does "
                     "convert (district-cooling Plant!C8), but does not call it 'not needed' when "
                     "the units already agree; probed in /work/review81/probe: likewise 0.0631, "
                     "0.145, 0.7457, 3.517 and 1.607 pass unflagged on a cell already in the "
                     "target unit, while 3.281, 6.895, 10.764, 35.31 and 3.785 are flagged)"),
    },
    "lfg-collection": {
        "Plant!C13": ("(Btu/scf to MJ/Nm³ with the volume factor 0.03726 alone, 5.4 % low: plumb "
                      "accepts both 0.03726 and the right 0.03939 here, although it flags the "
                      "same omission of the 60 °F to 0 °C ratio in a flow, Wells!C7, scfm × 1.699 "
                      "into Nm³/h)"),
        "Plant!C26": ("(the header vacuum is typed in 'in. w.c.', as landfill gas monitoring "
                      "sheets write it; plumb reads 'in. w.c.' as the absolute inch of water, "
                      "not the gauge inH2Og, so the vacuum / 27.68 written as psia looks "
                      "consistent; with 'inH2O g' beside the input the same formula is an "
                      "offset-scale error, probed in /work/review81/probe/wc.xlsx)"),
    },
}

NOTE = "a note on a correct cell"
EXTRA = {
    "district-cooling": [
        (f"{NOTE}: TR = gpm·ΔT[°F]/24, the 24 read as one over the volumetric heat capacity of "
         "water in those units, which it is (12 000 Btu/h per TR ÷ 500; ASHRAE Handbook—HVAC "
         "Systems and Equipment 2020, from memory)", "Plant!C16 trade-constant"),
        (f"{NOTE}: 4.19 kJ/(L·K) read as ρ·c_p of water, which it is (common practice)",
         "Plant!C17 trade-constant"),
        (f"{NOTE}, in misleading words: in bhp = gpm·ft/(3960·η%/100) the 100 turns the "
         "efficiency in % into a fraction and 3960 is the pump trade's one-over-γ_w (Cameron "
         "Hydraulic Data, from memory); plumb calls the 100 the specific weight of water",
         "Plant!C29 gravity-number"),
    ],
    "pressure-zone": [
        (f"{NOTE}, in misleading words: in p = h·3.281·0.433 the 3.281 is the ft-per-m factor "
         "(NIST SP 811) and 0.433 psi/ft is water's specific weight; plumb calls the 3.281 the "
         "specific weight of water and says nothing of the 0.433", "Zone!C24 gravity-number"),
        (f"{NOTE}: 9.81 kPa per m read as γ_w of water, which it is (common practice)",
         "Nodes!H5 gravity-number"),
        (f"{NOTE}: the same reading of 9.81", "Nodes!H6 gravity-number"),
        (f"{NOTE}: the same reading of 9.81", "Nodes!H7 gravity-number"),
        (f"{NOTE}: the same reading of 9.81", "Nodes!H8 gravity-number"),
        (f"{NOTE}: 10.67 read as the Hazen–Williams SI fit's constant (AWWA M32, from memory)",
         "Pipes!H5 trade-constant"),
        (f"{NOTE}: the same reading of 10.67", "Pipes!H7 trade-constant"),
        (f"{NOTE}: the same reading of 10.67", "Pipes!H8 trade-constant"),
    ],
    "lfg-collection": [
        (f"{NOTE}: 14.696 psia read as the standard reference pressure, which it is",
         "Plant!C24 trade-constant"),
        (f"{NOTE}: 519.67 °R (60 °F) read as the standard reference temperature, which it is",
         "Plant!C24 trade-constant"),
        ("a note on the planted cell C25 as well (the same reading of 14.696)",
         "Plant!C25 trade-constant"),
    ],
}
