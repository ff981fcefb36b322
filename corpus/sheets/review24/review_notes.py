"""Reviewer's notes after running the frozen plumb (review87). Invented scenario. A dimensionally
consistent formula can still be wrong; this check does not replace independent review under
local codes and licensed practice."""
NOTE = "a note on a trade's number, read as such"
EXTRA = {
    "hotel-energy-audit": [
        (NOTE + " (8760 h in a year, common practice)", "Audit!C40 trade-constant"),
    ],
    "steel-connections": [
        ("a correct cell plumb still flags: the 6 mm weld leg is typed into the formula as a bare "
         "number, so MPa × 0.7 × 6 reads as a stress; with the leg in mm, MPa × mm = N/mm = kN/m "
         "(EN 1993-1-8:2005 §4.5.3.3, F_w,Rd = f_vw,d·a)", "Design!C11 result-unit"),
    ],
    "water-tanks": [
        (NOTE + " (9.81 kPa per m of water, common practice)", "Summary!C27 gravity-number"),
        (NOTE + " (0.433 psi per ft of water, common practice)", "Summary!C28 gravity-number"),
        (NOTE + " (8.34 lb per US gal, common practice)", "Summary!C31 trade-constant"),
    ],
    "ev-fleet-charging": [
        ("a correct cell plumb still flags: the charger's 50 kW is typed into the formula as a "
         "bare number, so 50 × 1000/(√3·V·pf) reads as 1/V, not A (I = P/(√3·V_LL·pf), Glover, "
         "Sarma & Overbye 6th ed. ch. 2)", "Site!C20 result-unit"),
    ],
}
MISSED = {
    "ev-fleet-charging": {
        "Site!C36": "(a formula of typed numbers only, 77 kWh × 30 %/50 kW × 60, gives minutes "
                    "and is written under h: plumb checks no unit on a formula with no cell in it; "
                    "expected unit-scale, 60 too large)",
    },
}
RENAMED = {
    "water-tanks": {"Summary!C30": "result-unit"},
    "ev-fleet-charging": {"Site!C21": "result-unit"},
}
