"""The reviewer's record of plumb's findings on review35's books beyond the planted mistakes,
and the planted cells it misses (as first recorded; the .expect files are kept by hand since),
read by make_books.py when it writes the .expect files (--expect). Invented scenarios; a
dimensionally consistent formula can still be wrong, and this check does not replace independent
review under local codes and licensed practice."""

# stem -> list of (comment, "Sheet!Cell rule"): every finding beyond the planted ones
EXTRA = {
    "reservoir-pumping": [
        ("a correct cell plumb still flags: Hazen–Williams in SI, h_f = 10.67·L·Q^1.852/"
         "(C^1.852·D^4.87) (common practice), with the main's length in km turned into m by "
         "×1000 beside the 10.67; plumb reads a lone 10.67 as the fit's constant (with L in a "
         "cell in m it gives the trade-constant note), but the ×1000 beside it makes it give up "
         "that reading and say the formula computes [L^(843/500) T^(-463/250)]",
         "Pumping!C30 result-unit"),
        ("a note on a correct cell: 9.81 in Δp = 9.81·H (kPa per m of water) read as water's "
         "specific weight in kN/m³, which it is (common practice)", "Pumping!C35 gravity-number"),
        ("a note on a correct cell: 9.81 in P = 9.81·Q·H (kW, Q in m³/s, H in m) read as "
         "water's specific weight, which it is", "Pumping!C37 gravity-number"),
        ("a note on the planted cell C39 as well (the same reading of 9.81)",
         "Pumping!C39 gravity-number"),
        ("a note on a correct cell: 3960 in water horsepower gpm·ft/3960 (Cameron Hydraulic "
         "Data, from memory) read as one over water's specific weight in those units, which it "
         "is", "Pumping!C45 gravity-number"),
        ("a note on a correct cell, in misleading words: in SE = 2.725·H/(η/100) kWh/ML "
         "(2.725 kWh/ML per m is water's specific weight, 9.81 MJ/ML/m ÷ 3.6 MJ/kWh: common "
         "practice) plumb calls the 100 of the percentage 'the specific weight of water' and "
         "says nothing of the 2.725; the cell is right, the reason given is wrong",
         "Pumping!C49 gravity-number"),
        ("a correct cell plumb still flags, with some right on its side: balancing storage = "
         "Q_pd·(24 − t_p)/24, the peak day's demand during the 4 hours a day the station does "
         "not pump (common practice), 2.09 ML; plumb reads the 24 in the bracket in the unit of "
         "t_p (h/d), so the bracket over 24 is a pure number and the result a flow rate: the "
         "formula leaves the one-day cycle (× 1 d) unwritten, as the trade always does",
         "Reservoir!C16 result-unit"),
        ("an input cell, not a formula: the tariff in $/kWh; plumb has no currency and does "
         "not read '$', so the cost cell C51 is checked without it (no finding on C51)",
         "Pumping!C50 no-unit"),
    ],
    "boiler-blowdown": [
        ("a correct cell plumb still flags: makeup TDS ≈ 0.7 × conductivity, the trade's "
         "factor in ppm per µS/cm at 25 °C (common practice; Spirax Sarco, from memory); plumb "
         "says the formula computes an electrical conductivity and does not read 0.7 as a "
         "trade's factor", "Blowdown!C18 result-unit"),
        ("a correct cell plumb still flags, with some right on its side: feedwater TDS in "
         "mg/L written as ppm (1 mg/L = 1 ppm in dilute water, density 1 kg/L: common "
         "practice); plumb says mg/L is a density and ppm a number; strictly the cell should "
         "divide by the water's density in kg/L", "Blowdown!C23 result-unit"),
        ("a correct cell plumb still flags: Q = m·4.19·ΔT/3600 (kg/h × kJ/(kg·K) × K → kW; "
         "c_p of water 4.19 kJ/(kg·K): common practice); plumb does not read the 4.19 typed "
         "into the formula as water's specific heat (in no form tried: with kg/s and no /3600 "
         "as well) and says the formula computes [M T^-1 Θ]", "Blowdown!C61 result-unit"),
        ("an input cell, not a formula: the gas price in $/GJ; plumb does not read '$', so the "
         "saving C69 is checked without it (no finding on C69)", "Blowdown!C68 no-unit"),
    ],
    "potline": [
        ("a correct cell plumb still flags: the smelter's rule W = 2.98·V/CE kWh/kg Al "
         "(2.98 = 1/0.3356 kWh/(kg·V), Grjotheim and Kvande 1993, from memory), 13.30, the "
         "same as C36 from Faraday's law; plumb says the formula computes a voltage and does "
         "not read 2.98 as the trade's constant", "Line!C37 result-unit"),
        ("a second finding on the planted cell C61: the other °C reading raised to the fourth "
         "power", "Line!C61 offset-scale"),
        ("an input cell, not a formula: the power price in $/MWh; plumb does not read '$', so "
         "C67, C68 (a planted slip) and C69 are checked without it", "Line!C66 no-unit"),
    ],
    "slope-stability": [
        ("a note on a correct cell: 9.81 in γ = ρ·9.81 (Mg/m³ to kN/m³) read as standard "
         "gravity, which it is (common practice)", "Slope!C16 gravity-number"),
    ],
}

# stem -> {"Sheet!Cell": why}: planted cells plumb misses
MISSED = {
    "potline": {
        "Line!C68": ("(unit-scale expected: kWh/kg × $/MWh is already $/t, so the /1000 makes "
                     "the energy cost 1000 times too small, 0.52 $/t for 518; plumb has no "
                     "currency, reads neither '$/MWh' nor '$/t', and checks the cell without "
                     "them: only the input C66 gets a no-unit warning, which names C68 among "
                     "the cells checked without a unit)"),
    },
}

# stem -> {"Sheet!Cell": rule plumb names, or (rule, why)}
RENAMED = {
    "reservoir-pumping": {
        "Pumping!C31": ("result-unit", "right cell, wrong words: the finding is the one plumb "
                        "gives the correct C30 (it cannot read this Hazen–Williams at all) and "
                        "says nothing of the bore in mm"),
        "Pumping!C38": ("result-unit", "with a good note: 9.81 is water's specific weight for "
                        "a head in m, in ft it would be about 2.99"),
    },
    "boiler-blowdown": {
        "Blowdown!C62": ("result-unit", "right cell, wrong words: the finding is the one plumb "
                         "gives the correct C61 (it does not read the 4.19) and says nothing of "
                         "the /3.6 that makes kJ/h into W"),
    },
}

# stem -> {"Sheet!Cell": comment on plumb's message for a planted cell}
MESSAGES = {
    "slope-stability": {
        "Slope!C36": ("right cell, advised factor the wrong way: plumb says to multiply "
                      "(σ_n − u)·tanφ' (kPa) by 20.8854, which would leave a psf value in a cell "
                      "written kPa; the fix is the cohesion's conversion, C14 × 0.04788"),
    },
}

# stem -> comment lines written at the head of the .expect
HEADNOTE = {
    "reservoir-pumping": [
        "The sidecar reservoir-pumping.cells.plumb ('measure cap = 1 1') was written before",
        "the first run, as the README advises for a word plumb's unit table lacks (L/cap/d).",
        "Without it plumb gives 3 more no-unit warnings, all on inputs (Demand!C5:C7).",
    ],
    "potline": [
        "The sidecar potline.cells.plumb ('measure Al = 1 1') was written before the first run,",
        "as the README advises: the smelter's 'kWh/kg Al' and 't/t Al' are not in plumb's table.",
        "Without it plumb gives 7 more no-unit warnings: on 5 formula cells (Line!C36, C37, C38,",
        "C40 and the planted C39, then reported only as 'unit not read') and on inputs C49, C51.",
    ],
    "slope-stability": [
        "The sidecar slope-stability.cells.plumb ('measure pcf = 1 lbf/ft^3') was written before",
        "the first run: plumb's table has psf but not pcf. Without it plumb gives 7 no-unit",
        "warnings: on the correct formula cell Slope!C44 and on inputs Slope!C45, Lab!B5:B9.",
    ],
}
