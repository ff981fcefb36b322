"""Reviewer's record of the frozen binary's findings beyond the planted ones (review88).
Invented scenario. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice."""

TC = "a note on a trade's number, read as such (no error or warning)"
EXTRA = {
    "fertigation": [
        ("a correct cell plumb still flags: ppm/(g/mol) = mmol/L takes ppm as mg/L in a dilute "
         "nutrient solution (common practice); plumb reads ppm as a mass fraction (1e-6) and wants "
         "a water density, which has no number here (1 kg/L)", "Mix!C14 result-unit"),
        ("a correct cell plumb still flags: as Mix!C14", "Mix!C17 result-unit"),
        (TC + ": '1000' as 1/ρ_w (ppm to g/L)", "Mix!C31 trade-constant"),
        (TC + ": '1000' as 1/ρ_w (ppm to g/L)", "Mix!C32 trade-constant"),
    ],
    "boiler-feedwater": [
        (TC + ": 500 lb/h per gpm", "Feed!C14 trade-constant"),
        (TC + ": the pounds formula's 8.34", "Feed!C18 trade-constant"),
        (TC + ", but misworded: '24' is hours per day; the water density is in the /1000",
         "Feed!C19 trade-constant"),
        ("a correct cell plumb still flags: kg/d over a specific gravity written in L/d, SG "
         "standing for kg/L (common practice); plumb wants the 1 kg/L written", "Feed!C24 result-unit"),
        (TC + ": '1000' read as ρ·c_p of water, though it is ρ (kg/m³) and 4.186 is c_p",
         "Feed!C34 trade-constant"),
        (TC + ": 500 lb/h per gpm", "Feed!C38 trade-constant"),
    ],
    "datacentre-pue": [
        (TC + ": 1.08 as ρ·c_p of standard air", "Load!C26 trade-constant"),
        (TC + ": ρ = p/(R·T) with 101325 Pa and 287 J/(kg·K) typed in (coherent SI; common "
         "practice), read together as one atmosphere over air's gas constant (once flagged "
         "result-unit)", "Load!C33 trade-constant"),
        ("a correct cell plumb still flags: V = Q/(ρ·c_p·ΔT) with c_p = 1.006 kJ/(kg·K) typed in "
         "(coherent with kW; common practice)", "Load!C35 result-unit"),
        (TC, "Racks!F5 trade-constant"), (TC, "Racks!F6 trade-constant"),
        (TC, "Racks!F7 trade-constant"), (TC, "Racks!F8 trade-constant"),
        (TC, "Racks!F10 trade-constant"),
    ],
}
MISSED = {}
RENAMED = {
    "fertigation": {"Mix!C18": "result-unit"},
    "datacentre-pue": {"Load!C27": "result-unit",
                       "Racks!F9": "result-unit"},
}
RENOTE = {}
