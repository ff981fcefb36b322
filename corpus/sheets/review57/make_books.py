#!/usr/bin/env python3
"""F# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.
our independent review workbooks for plumb's workbook checking (review57), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; pattern after
corpus/sheets/review55/make_books.py.

Trades: a greenhouse's hot-water heating and CO2 dosing; a sawmill's dust extraction and
cyclone; a municipal swimming pool's circulation and chemical dosing; an underground parking
garage's CO ventilation. All scenarios, sites, firms, readings and maker's data are invented
(demonstration only); the formulas and published factors are the trade's own, with their sources
named in a text cell at the top of each sheet ("from memory" where recalled and not checked,
"common practice" for a fact of the trade with no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and
its messages that mislead, are recorded in review_notes.py after running the round's build.

Run: python3 make_books.py  ->  *.xlsx and *.expect in this folder (nothing written elsewhere)
"""
import os
import sys

sys.dont_write_bytecode = True   # write nothing beside the shared modules
HERE = os.path.dirname(os.path.abspath(__file__))
SHARED = os.path.dirname(HERE)
sys.path.insert(0, SHARED)
from item_sheet import ItemSheet, write_books_with_notes  # noqa: E402 (shared, not copied)

CAUTION = ("Invented scenario, data for demonstration only. A dimensionally consistent formula can "
           "still be wrong; this check does not replace independent review under local codes and "
           "licensed practice.")
ItemSheet.caution = CAUTION

# --------------------------------------------------------------------------------------------
# Book 1: greenhouse hot-water heating and CO2 dosing (m², ft², m, m³, °C, °F, K, W/(m²·K),
# Btu/(h·ft²·°F), 1/h, kW, W/m², Btu/h, MBH, %, kWh/m³, m³/h, gpm, kJ/(kg·K), kg/m³, mm, m/s,
# kPa, ppm, g/mol, J/(mol·K), mg/m³, kg/h, g/(m²·h), kg/(ha·h), h/d, kg/d, bar(g))
# --------------------------------------------------------------------------------------------
GH_SRC = (
    "Sources: 1 m² = 10.76 ft², 1 kW = 3412 Btu/h = 3.412 MBH, 1 m³/h = 4.403 US gpm, "
    "1 Btu/(h·ft²·°F) = 5.678 W/(m²·K) (NIST SP 811 (2008) App. B.8); °F = 1.8·°C + 32, "
    "K = °C + 273.15 (SI Brochure 9th ed.); cover U-values on the Covers sheet and air "
    "leakage of 0.5 air changes per hour for a tight glasshouse (ASABE EP406 'Heating, "
    "ventilating and cooling greenhouses', from memory); air's ρ·c_p ≈ 1.2 kJ/(m³·K) "
    "(ASHRAE Handbook, Fundamentals (2021), ch. 18, from memory); water c_p 4.19 kJ/(kg·K) "
    "and ρ 978 kg/m³ at 70 °C (IAPWS, from memory); US hot-water rule gpm = Btu/h/(500·ΔT°F), "
    "500 = 8.33 lb/gal × 60 min/h × 1 Btu/(lb·°F) (common practice); ideal gas ρ = p·M/(R·T), "
    "R = 8.314 J/(mol·K) (CODATA 2018), M(CO₂) = 44.01 g/mol (IUPAC atomic weights); ppm by "
    "volume (common practice); crop CO₂ uptake at high light 2 to 3 g/(m²·h) (horticultural "
    "practice, from memory); CO₂ from burning network gas ≈ 1.9 kg per m³ (from memory); "
    "choked flow in a regulator below an absolute pressure ratio of about 0.55 for CO₂ "
    "(common practice). Nursery, glasshouse, gas contract and readings invented.")
gh = ItemSheet("Heat", "Kestrel Fen Growers (invented): glasshouse block 3, tomato crop, "
               "hot-water heating from a gas boiler and CO₂ dosing, winter design", GH_SRC)
gh.heading("Glasshouse")
gh.add("Af", "Floor area of block 3 (1 ha)", "A_f", 10000, "m²")
gh.add("Ag", "Cover area, roof and walls (glass)", "A_g", 12600, "m²")
gh.add("Agft", "Cover area, ft² (US screen maker's form)", "A_g,US", "={Ag}*10.76", "ft²")
gh.add("hm", "Mean height of the Venlo house", "h_m", 6.2, "m")
gh.add("V", "Air volume of the house", "V", "={Af}*{hm}", "m³")
gh.heading("Design conditions")
gh.add("ti", "Inside set point, night", "t_i", 18, "°C")
gh.add("to", "Outside design temperature (invented site)", "t_o", -10, "°C")
gh.add("tiF", "Inside set point, °F", "t_i,F", "={ti}*1.8+32", "°F")
gh.add("dT", "Design temperature difference", "ΔT", "={ti}-{to}", "K")
gh.add("dTF", "Design temperature difference, °F", "ΔT_F", "={dT}*1.8", "°F")
gh.heading("Heat loss")
gh.add("cov", "Cover type (code on the Covers sheet)", "cover", 1, "-")
gh.add("U", "Overall coefficient of the cover", "U", "=VLOOKUP({cov},Covers!A6:D9,3,FALSE)",
       "W/(m²·K)")
gh.add("UUS", "Overall coefficient of the cover, US", "U_US",
       "=VLOOKUP({cov},Covers!A6:D9,4,FALSE)", "Btu/(h·ft²·°F)")
gh.add("Qc", "Transmission loss through the cover", "Q_c", "={U}*{Ag}*{dT}/1000", "kW")
gh.add("Qc2", "Transmission loss through the cover (first draft)", "Q_c2", "={U}*{Ag}*{dT}",
       "kW", planted=("unit-scale", "W written as kW: the /1000 missing"))
gh.add("QcUS", "Transmission loss, Btu/h (US check)", "Q_c,US", "={UUS}*{Agft}*{dTF}", "Btu/h")
gh.add("N", "Air leakage, air changes per hour", "N", 0.5, "1/h")
gh.add("Qi", "Air leakage loss", "Q_i", "=1.2*{V}*{N}*{dT}/3600", "kW")
gh.add("Qi2", "Air leakage loss (first draft)", "Q_i2", "=1.2*{V}*{N}*{dT}", "kW",
       planted=("unit-scale", "air changes per hour used as per second: the /3600 missing"))
gh.add("Q", "Design heat loss", "Q", "={Qc}+{Qi}", "kW")
gh.add("q", "Design heat loss per floor area", "q", "={Q}*1000/{Af}", "W/m²")
gh.heading("Boiler")
gh.add("marg", "Boiler margin (pick-up after night set-back)", "m", 10, "%")
gh.add("Qb", "Boiler output", "Q_b", "={Q}*(1+{marg}/100)", "kW")
gh.add("Qb2", "Boiler output (first draft)", "Q_b2", "={Q}*(1+{marg})", "kW",
       planted=("unit-scale", "a % margin used as a fraction"))
gh.add("QbMBH", "Boiler output, MBH (US boiler maker)", "Q_b,US", "={Qb}*3.412", "MBH")
gh.add("QbMBH2", "Boiler output, MBH (first draft)", "Q_b,US2", "={Qb}*3412", "MBH",
       planted=("unit-scale", "Btu/h written as MBH: the /1000 missing"))
gh.add("etab", "Boiler efficiency on net calorific value (condensing, invented)", "η_b", 95, "%")
gh.add("Qin", "Boiler fuel input", "Q_in", "={Qb}/({etab}/100)", "kW")
gh.add("Hu", "Net calorific value of the network gas (contract, invented)", "H_u", 9.8,
       "kWh/m³")
gh.add("Vg", "Gas flow at full output", "V̇_g", "={Qin}/{Hu}", "m³/h")
gh.heading("Heating water")
gh.add("tf", "Flow temperature", "t_f", 80, "°C")
gh.add("tr", "Return temperature", "t_r", 60, "°C")
gh.add("dTw", "Water temperature drop", "Δt_w", "={tf}-{tr}", "K")
gh.add("cpw", "Specific heat of water at 70 °C", "c_p", 4.19, "kJ/(kg·K)")
gh.add("rhow", "Density of water at 70 °C", "ρ_w", 978, "kg/m³")
gh.add("Vw", "Heating water flow", "V̇_w", "={Qb}*3600/({cpw}*{rhow}*{dTw})", "m³/h")
gh.add("Vwgpm", "Heating water flow, US gpm", "V̇_w,US", "={Vw}*4.403", "gpm")
gh.add("VwUS", "Heating water flow, US gpm (500 rule check)", "V̇_w,US,c",
       "={Qb}*3412/(500*{dTw}*1.8)", "gpm")
gh.add("VwUS2", "Heating water flow, US gpm (first draft)", "V̇_w,US2",
       "={Qb}*3412/(500*{dTw})", "gpm",
       planted=("unit-scale", "a K difference where the 500 rule wants °F: 1.8 too large"))
gh.add("d", "Main bore, DN150 (6 in schedule 40)", "d", 154.1, "mm")
gh.add("v", "Velocity in the main", "v", "={Vw}/3600/(PI()*({d}/1000)^2/4)", "m/s")
gh.add("dpp", "Circulator differential pressure at duty", "Δp", 180, "kPa")
gh.add("etap", "Circulator efficiency, wire to water (maker, invented)", "η_p", 70, "%")
gh.add("Pp", "Circulator input power", "P_p", "={Vw}/3600*{dpp}/({etap}/100)", "kW")
gh.heading("CO₂ dosing (vents closed)")
gh.add("cout", "Outside CO₂ concentration", "c_o", 420, "ppm")
gh.add("cset", "CO₂ set point inside", "c_i", 800, "ppm")
gh.add("pb", "Barometer (site, invented)", "p_b", 101.3, "kPa")
gh.add("M", "Molar mass of CO₂", "M", 44.01, "g/mol")
gh.add("R", "Molar gas constant", "R", 8.314, "J/(mol·K)")
gh.add("rhoC", "Density of CO₂ at the inside set point", "ρ_CO₂",
       "={pb}*{M}/({R}*({ti}+273.15))", "kg/m³")
gh.add("rhoC2", "Density of CO₂ (first draft)", "ρ_CO₂2", "={pb}*{M}/({R}*{ti})", "kg/m³",
       planted=("offset-scale", "a °C reading in the gas law where kelvins belong"))
gh.add("cmg", "CO₂ set point, mass concentration", "c_m", "={cset}*{rhoC}", "mg/m³")
gh.add("ml", "CO₂ lost with the leakage air", "ṁ_l",
       "={V}*{N}*({cset}-{cout})*{rhoC}/1000000", "kg/h")
gh.add("ml2", "CO₂ lost with the leakage air (first draft)", "ṁ_l2",
       "={V}*{N}*({cset}-{cout})*{rhoC}/1000", "kg/h",
       planted=("unit-scale", "ppm divided by 1000 where 10⁶ belongs"))
gh.add("u", "Crop uptake of CO₂ at high light", "u", 2.5, "g/(m²·h)")
gh.add("mu", "CO₂ taken up by the crop", "ṁ_u", "={u}*{Af}/1000", "kg/h")
gh.add("md", "CO₂ dose rate", "ṁ_d", "={ml}+{mu}", "kg/h")
gh.add("mha", "CO₂ dose rate per hectare", "ṁ_ha", "={md}/({Af}/10000)", "kg/(ha·h)")
gh.add("yC", "CO₂ from burning network gas, per m³ of gas", "y", 1.9, "kg/m³")
gh.add("VgC", "Gas burnt for the CO₂ dose (flue gas dosing)", "V̇_g,CO₂", "={md}/{yC}", "m³/h")
gh.add("hd", "Dosing hours per day", "t_d", 10, "h/d")
gh.add("mday", "CO₂ per day", "m_d", "={md}*{hd}", "kg/d")
gh.heading("Liquid CO₂ back-up: regulator")
gh.add("p1", "Tank vapour pressure at the regulator inlet", "p_1", 18, "bar(g)")
gh.add("p2", "Distribution pressure after the regulator", "p_2", 1.5, "bar(g)")
gh.add("r", "Pressure ratio across the regulator, absolute", "r",
       "=({p2}+1.013)/({p1}+1.013)", "-")
gh.add("r2", "Pressure ratio across the regulator (first draft)", "r_2", "={p2}/{p1}", "-",
       planted=("offset-scale", "a ratio of gauge readings where absolute pressures belong"))
GHS = gh.finish()

COVERS = {
    "A1": "Overall heat transfer coefficients of glasshouse covers (rounded; check against "
          "the source before use)",
    "A2": "Sources: ASABE EP406 (from memory); 1 Btu/(h·ft²·°F) = 5.678 W/(m²·K) (NIST SP 811 "
          "(2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Code", "B5": "Cover", "C5": "U [W/(m²·K)]", "D5": "U [Btu/(h·ft²·°F)]",
}
for r, (code, name, u) in enumerate([(1, "Single glass", 6.2),
                                     (2, "Single glass, energy screen closed", 4.3),
                                     (3, "Double acrylic, twin-wall", 3.4),
                                     (4, "Double polyethylene, air-inflated", 4.0)], start=6):
    COVERS[f"A{r}"], COVERS[f"B{r}"], COVERS[f"C{r}"] = code, name, u
    COVERS[f"D{r}"] = f"=C{r}/5.678"
COVERS["D8"] = "=C8*5.678"
COVERS_PLANTED = {"Covers!D8": ("unit-scale", "W/(m²·K) to Btu/(h·ft²·°F) multiplied by 5.678: "
                                              "wrong way round")}

GHB = {
    "trade": "horticulture: glasshouse hot-water heating, boiler, circulator and CO₂ dosing",
    "sheets": [("Heat", GHS), ("Covers", COVERS)],
    "planted": {**gh.planted, **COVERS_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 2: sawmill dust extraction and cyclone (in, ft², fpm, m/s, cfm, m³/h, m³/s, °F, °C,
# inHg, kPa, J/(kg·K), kg/m³, in. w.g., Pa, %, bhp, kW, kg/h, g/m³, gr/ft³, mg/m³, m³, h)
# --------------------------------------------------------------------------------------------
SAW_SRC = (
    "Sources: 1 cfm = 1.699 m³/h = 0.0004719 m³/s, 1 fpm = 0.00508 m/s, 1 inHg = 3.386 kPa, "
    "1 in. w.g. = 249.1 Pa, 1 hp = 0.7457 kW, 1 g/m³ = 0.437 gr/ft³ (NIST SP 811 (2008) App. "
    "B.8); °C = (°F − 32)/1.8; branch design velocities 4000 to 4500 fpm for sawdust and chips, "
    "VP = (V/4005)² in. w.g. for standard air, density factor df = (530/(t°F + 460))·(p_b/29.92) "
    "(ACGIH Industrial Ventilation, A Manual of Recommended Practice for Design, from memory); "
    "fan brake power bhp = cfm·SP/(6356·η) (common practice); air ρ = p/(R·T), R = 287.05 "
    "J/(kg·K) (common practice); VP = ρ·v²/2 (common practice); bulk density of green "
    "sawdust and chips about 190 kg/m³ (from memory). Mill, machines, maker's data and "
    "readings invented.")
sw = ItemSheet("Extract", "Alder Cross Sawmill (invented): green-end dust and chip extraction, "
               "one main to a high-efficiency cyclone over the chip bin", SAW_SRC)
sw.heading("Air flow")
sw.add("Q", "Air flow, sum of the branches (Hoods sheet)", "Q", "=Hoods!D11", "cfm")
sw.add("Qh", "Air flow, m³/h", "Q_h", "={Q}*1.699", "m³/h")
sw.add("Qs", "Air flow, m³/s", "Q_s", "={Q}*0.0004719", "m³/s")
sw.add("Qs2", "Air flow, m³/s (fan maker's enquiry)", "Q_s2", "={Q}*0.02832", "m³/s",
       planted=("unit-scale", "ft³/min taken as ft³/s: the /60 missing"))
sw.heading("Main duct")
sw.add("D", "Main duct diameter", "D", 16, "in")
sw.add("A", "Main duct area", "A", "=PI()*({D}/12)^2/4", "ft²")
sw.add("A2", "Main duct area (first draft)", "A_2", "=PI()*{D}^2/4", "ft²",
       planted=("unit-scale", "the diameter in inches not turned to feet: 144 too large"))
sw.add("V", "Velocity in the main", "V", "={Q}/{A}", "fpm")
sw.add("Vms", "Velocity in the main, m/s", "V_SI", "={V}*0.00508", "m/s")
sw.add("Vms2", "Velocity in the main, m/s (first draft)", "V_SI2", "={V}*0.3048", "m/s",
       planted=("unit-scale", "ft/min converted as ft/s: the /60 missing"))
sw.add("Vmin", "Minimum transport velocity for chips", "V_min", 4000, "fpm")
sw.add("VP", "Velocity pressure in the main, standard air", "VP", "=({V}/4005)^2", "in. w.g.")
sw.heading("Air at the fan")
sw.add("tF", "Air temperature in the main (summer)", "t_F", 90, "°F")
sw.add("tC", "Air temperature in the main, °C", "t_C", "=({tF}-32)/1.8", "°C")
sw.add("pbHg", "Site barometer (invented)", "p_b", 29.35, "inHg")
sw.add("pbk", "Site barometer, kPa", "p_b,k", "={pbHg}*3.386", "kPa")
sw.add("Ra", "Gas constant of dry air", "R_a", 287.05, "J/(kg·K)")
sw.add("rho", "Air density in the main", "ρ", "={pbk}*1000/({Ra}*({tC}+273.15))", "kg/m³")
sw.add("VPPa", "Velocity pressure in the main, at the actual density", "VP_SI",
       "=0.5*{rho}*{Vms}^2", "Pa")
sw.add("DF", "Density factor", "df", "=530/({tF}+460)*{pbHg}/29.92", "-")
sw.add("DF2", "Density factor (first draft)", "df_2", "=530/{tF}*{pbHg}/29.92", "-",
       planted=("offset-scale", "a °F reading in a ratio: the 460 to °R missing"))
sw.heading("Static pressure, standard air")
sw.add("SPh", "Worst branch, hood entry and branch losses (ACGIH sheet, invented)", "SP_h",
       3.2, "in. w.g.")
sw.add("f100", "Main duct friction at the design velocity (chart)", "f", 1.3,
       "in. w.g./100 ft")
sw.add("Lm", "Main duct length, equivalent", "L_m", 160, "ft")
sw.add("SPm", "Main duct loss", "SP_m", "={f100}*{Lm}/100", "in. w.g.")
sw.add("dpc", "Cyclone pressure drop at design flow (maker, invented)", "Δp_c", 4.5, "in. w.g.")
sw.add("SPo", "Fan outlet, stack and weather cap", "SP_o", 0.5, "in. w.g.")
sw.add("SP", "Fan static pressure, standard air", "SP", "={SPh}+{SPm}+{dpc}+{SPo}", "in. w.g.")
sw.add("SPa", "Fan static pressure at the actual density", "SP_a", "={SP}*{DF}", "in. w.g.")
sw.heading("Fan")
sw.add("eta", "Fan static efficiency at duty (maker, invented)", "η", 68, "%")
sw.add("bhp", "Fan brake power", "bhp", "={Q}*{SPa}/(6356*{eta}/100)", "bhp")
sw.add("kW", "Fan shaft power", "P", "={Qs}*{SPa}*249.1/({eta}/100)/1000", "kW")
sw.add("kWc", "Fan shaft power from the brake horsepower (check)", "P_c", "={bhp}*0.7457",
       "kW")
sw.add("kW2", "Fan shaft power from the brake horsepower (first draft)", "P_c2",
       "={bhp}/0.7457", "kW",
       planted=("unit-scale", "hp to kW divided by 0.7457: wrong way round"))
sw.add("marg", "Motor margin", "m", 15, "%")
sw.add("Pm", "Motor rating, at least", "P_m", "={kW}*(1+{marg}/100)", "kW")
sw.heading("Dust")
sw.add("md", "Sawdust and chips to the cyclone (mill survey, invented)", "ṁ_d", 1450, "kg/h")
sw.add("cl", "Dust loading in the main", "c_l", "={md}*1000/{Qh}", "g/m³")
sw.add("cl2", "Dust loading in the main (first draft)", "c_l2", "={md}/{Qh}", "g/m³",
       planted=("unit-scale", "kg/m³ written as g/m³: the ×1000 missing"))
sw.add("clgr", "Dust loading, gr/ft³", "c_l,US", "={cl}*0.437", "gr/ft³")
sw.add("mlr", "Mass loading ratio, dust to air", "μ", "={md}/({Qh}*{rho})", "-")
sw.add("eff", "Cyclone collection efficiency (maker, invented)", "η_c", 99.5, "%")
sw.add("me", "Dust leaving the cyclone", "ṁ_e", "={md}*(1-{eff}/100)", "kg/h")
sw.add("me2", "Dust leaving the cyclone (first draft)", "ṁ_e2", "={md}*(1-{eff})", "kg/h",
       planted=("unit-scale", "a % efficiency used as a fraction"))
sw.add("ce", "Emission concentration at the cyclone outlet", "c_e", "={me}*1000000/{Qh}",
       "mg/m³")
sw.add("rb", "Bulk density of green sawdust and chips", "ρ_b", 190, "kg/m³")
sw.add("Vb", "Chip bin volume", "V_b", 40, "m³")
sw.add("tf", "Time to fill the bin", "t_f", "={Vb}*{rb}/{md}", "h")
sw.add("tf2", "Time to fill the bin (first draft)", "t_f2", "={Vb}*{rb}/{md}*60", "h",
       planted=("unit-scale", "minutes written as hours: 60 too large"))
SAWS = sw.finish()

HOODS = {
    "A1": "Alder Cross Sawmill: branch flows at the design velocity (invented machines and "
          "branch sizes)",
    "A2": "Sources: Q = A·V, A = π·D²/4 with D in ft (common practice); 1 cfm = 1.699 m³/h "
          "(NIST SP 811 (2008) App. B.8); design velocities (ACGIH Industrial Ventilation, from "
          "memory).",
    "A3": CAUTION,
    "A5": "Machine", "B5": "Branch diameter [in]", "C5": "Design velocity [fpm]",
    "D5": "Air flow [cfm]", "E5": "Air flow [m³/h]",
    "A11": "Total", "D11": "=SUM(D6:D10)",
}
for r, (mach, dia, vel) in enumerate([("Headrig band mill", 8, 4000),
                                      ("Edger", 7, 4000),
                                      ("Trimmer", 6, 4000),
                                      ("Chipper canter", 10, 4500),
                                      ("Band resaw", 6, 4000)], start=6):
    HOODS[f"A{r}"], HOODS[f"B{r}"], HOODS[f"C{r}"] = mach, dia, vel
    HOODS[f"D{r}"] = f"=PI()*(B{r}/12)^2/4*C{r}"
    HOODS[f"E{r}"] = f"=D{r}*1.699"
HOODS["E8"] = "=D8/1.699"
HOODS["E9"] = "=D9*0.02832"
HOODS_PLANTED = {"Hoods!E8": ("unit-scale", "cfm to m³/h divided by 1.699: wrong way round"),
                 "Hoods!E9": ("unit-scale", "cfm to m³/h by the ft³ factor alone: the ×60 "
                                            "missing")}

SAWB = {
    "trade": "wood processing: sawmill dust extraction, duct, fan and cyclone",
    "sheets": [("Extract", SAWS), ("Hoods", HOODS)],
    "planted": {**sw.planted, **HOODS_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 3: municipal pool circulation and chemical dosing (m, m², m³, US gal, h, m³/h, L/s, gpm,
# m/h, gpm/ft², °C, °F, K, kg/m³, kJ/(kg·K), %, kW, hp, kPa(g), kPa, m/s, W/m², Btu/h, 1/d, L,
# m³/d, mg/L, kg/d, lb/d, mgd, kg/L, L/d, L/h, kg)
# --------------------------------------------------------------------------------------------
POOL_SRC = (
    "Sources: 1 m³ = 264.2 US gal, 1 m³/h = 4.403 US gpm, 1 m/h = 0.409 gpm/ft², 1 kg = "
    "2.205 lb, 1 kW = 3412 Btu/h, 1 hp = 0.7457 kW (NIST SP 811 (2008) App. B.8); °F = 1.8·°C "
    "+ 32; g_n = 9.81 m/s² (SI Brochure 9th ed.); turnover period, filtration rate and 30 L of "
    "dilution per bather (PWTAG, Swimming Pool Water (2017), from memory); pump input "
    "ρ·g·Q·H/η (common practice); NPSHa from a suction gauge = (p_s + p_b − p_v)/(ρ·g) + "
    "v²/(2g) (Hydraulic Institute, from memory); water properties on the Water sheet (IAPWS, "
    "from memory); chlorine dose mass = flow × dose, 1 mg/L = 1 g/m³, and the US 'pounds "
    "formula' lb/d = MGD × mg/L × 8.34 (common practice); sodium hypochlorite about 14 % "
    "available chlorine w/w at 1.21 kg/L (from memory). Pool, centre, maker's data and "
    "readings invented.")
pl = ItemSheet("Pool", "Brackwater Leisure Centre (invented): 50 m competition pool, "
               "circulation, filters, heating and hypochlorite dosing, design", POOL_SRC)
pl.heading("Pool and circulation")
pl.add("L", "Pool length", "L", 50, "m")
pl.add("W", "Pool width", "W", 25, "m")
pl.add("h", "Mean depth", "h", 2.0, "m")
pl.add("A", "Water surface area", "A", "={L}*{W}", "m²")
pl.add("V", "Pool volume", "V", "={A}*{h}", "m³")
pl.add("Vgal", "Pool volume, US gal", "V_US", "={V}*264.2", "US gal")
pl.add("T", "Turnover period", "T", 4, "h")
pl.add("Q", "Circulation rate", "Q", "={V}/{T}", "m³/h")
pl.add("QLs", "Circulation rate, L/s", "Q_s", "={Q}/3.6", "L/s")
pl.add("Qgpm", "Circulation rate, US gpm", "Q_US", "={Q}*4.403", "gpm")
pl.add("Qgpm2", "Circulation rate, US gpm (US pump maker's enquiry)", "Q_US2", "={Q}*264.2",
       "gpm", planted=("unit-scale", "m³/h to US gal/h written as gpm: the /60 missing"))
pl.heading("Filters")
pl.add("vf", "Filtration rate (medium rate)", "v_f", 25, "m/h")
pl.add("Af", "Filter area needed", "A_f", "={Q}/{vf}", "m²")
pl.add("nf", "Filters in parallel", "n_f", 3, "-")
pl.add("Df", "Filter diameter", "D_f", "=SQRT(4*{Af}/({nf}*PI()))", "m")
pl.add("vfUS", "Filtration rate, gpm/ft²", "v_f,US", "={vf}*0.409", "gpm/ft²")
pl.add("vfUS2", "Filtration rate, gpm/ft² (US filter maker)", "v_f,US2", "={vf}*2.445",
       "gpm/ft²", planted=("unit-scale", "m/h to gpm/ft² multiplied by 2.445: wrong way round"))
pl.heading("Circulation pumps")
pl.add("tw", "Pool water temperature", "t_w", 28, "°C")
pl.add("rho", "Density of the pool water (Water sheet)", "ρ",
       "=VLOOKUP({tw},Water!A6:E10,2,FALSE)", "kg/m³")
pl.add("cp", "Specific heat of the pool water (Water sheet)", "c_p",
       "=VLOOKUP({tw},Water!A6:E10,3,FALSE)", "kJ/(kg·K)")
pl.add("H", "Pump head at duty, through the filters and heater", "H", 16, "m")
pl.add("etap", "Pump and motor efficiency (maker, invented)", "η_p", 72, "%")
pl.add("Pp", "Pump input power", "P_p", "={rho}*9.81*{Q}/3600*{H}/1000/({etap}/100)", "kW")
pl.add("Pp2", "Pump input power (first draft)", "P_p2",
       "={rho}*{Q}/3600*{H}/1000/({etap}/100)", "kW",
       planted=("result-unit", "ρ·Q·H with g left out"))
pl.add("Pphp", "Pump input power, hp", "P_p,US", "={Pp}/0.7457", "hp")
pl.heading("Pump suction (commissioning test)")
pl.add("ps", "Suction gauge reading at the pump inlet", "p_s", 12, "kPa(g)")
pl.add("pb", "Barometer on the test day", "p_b", 101.0, "kPa")
pl.add("pv", "Vapour pressure of the pool water (Water sheet)", "p_v",
       "=VLOOKUP({tw},Water!A6:E10,4,FALSE)", "kPa")
pl.add("vs", "Velocity in the suction pipe at the gauge", "v_s", 1.6, "m/s")
pl.add("NPSH", "NPSH available", "NPSHa",
       "=({ps}+{pb}-{pv})*1000/({rho}*9.81)+{vs}^2/(2*9.81)", "m")
pl.add("NPSH2", "NPSH available (first draft)", "NPSHa2",
       "=({ps}-{pv})*1000/({rho}*9.81)+{vs}^2/(2*9.81)", "m",
       planted=("offset-scale", "a gauge reading less an absolute vapour pressure: the "
                                "barometer left out"))
pl.heading("Heating")
pl.add("t0", "Fill water temperature", "t_0", 10, "°C")
pl.add("twF", "Pool water temperature, °F", "t_w,F", "={tw}*1.8+32", "°F")
pl.add("dT", "Temperature rise on first fill", "ΔT", "={tw}-{t0}", "K")
pl.add("th", "Time allowed for the first heat-up", "t_h", 72, "h")
pl.add("Qh", "Heater duty for the first heat-up", "Q_h", "={V}*{rho}*{cp}*{dT}/({th}*3600)",
       "kW")
pl.add("Qh2", "Heater duty for the first heat-up (first draft)", "Q_h2",
       "={V}*{rho}*{cp}*{dT}/{th}", "kW",
       planted=("unit-scale", "hours where seconds belong: the ×3600 missing"))
pl.add("QhB", "Heater duty, Btu/h (US heater maker)", "Q_h,US", "={Qh}*3412", "Btu/h")
pl.add("qs", "Surface losses, evaporation and convection, in use (design, invented)", "q_s",
       180, "W/m²")
pl.add("Qs", "Surface losses", "Q_s", "={qs}*{A}/1000", "kW")
pl.add("Qs2", "Surface losses (first draft)", "Q_s2", "={qs}*{A}", "kW",
       planted=("unit-scale", "W written as kW: the /1000 missing"))
pl.heading("Dilution water")
pl.add("nb", "Bathers per day (design)", "n_b", 1400, "1/d")
pl.add("dil", "Dilution water per bather", "v_b", 30, "L")
pl.add("Vmu", "Dilution water per day", "V_mu", "={nb}*{dil}/1000", "m³/d")
pl.add("Qmu", "Heat to warm the dilution water", "Q_mu", "={Vmu}*{rho}*{cp}*{dT}/86400", "kW")
pl.heading("Chlorine dosing")
pl.add("dc", "Chlorine dose on the circulating flow (design)", "c_d", 0.5, "mg/L")
pl.add("mCl", "Available chlorine per day", "m_Cl", "={Q}*{dc}*24/1000", "kg/d")
pl.add("mCllb", "Available chlorine per day, lb/d", "m_Cl,US", "={mCl}*2.205", "lb/d")
pl.add("MGD", "Circulation rate, million US gal per day", "Q_MGD", "={Qgpm}*1440/1000000",
       "mgd")
pl.add("mClUS", "Available chlorine per day, lb/d (pounds formula check)", "m_Cl,US,c",
       "={MGD}*{dc}*8.34", "lb/d")
pl.add("mClUS2", "Available chlorine per day, lb/d (first draft)", "m_Cl,US2",
       "={Qgpm}*{dc}*8.34", "lb/d",
       planted=("unit-scale", "gpm put in the pounds formula where MGD belongs"))
pl.add("ca", "Available chlorine in the sodium hypochlorite", "c_a", 14, "% w/w")
pl.add("rhoh", "Density of the sodium hypochlorite", "ρ_h", 1.21, "kg/L")
pl.add("Vh", "Hypochlorite per day", "V_h", "={mCl}/({ca}/100)/{rhoh}", "L/d")
pl.add("Vh2", "Hypochlorite per day (first draft)", "V_h2", "={mCl}/{ca}/{rhoh}", "L/d",
       planted=("unit-scale", "a % w/w used as a fraction: 100 too small"))
pl.add("qdp", "Dosing pump rate, continuous", "q_dp", "={Vh}/24", "L/h")
pl.add("cs", "Superchlorination level after a fouling", "c_s", 10, "mg/L")
pl.add("ms", "Available chlorine for superchlorination", "m_s", "={V}*{cs}/1000", "kg")
pl.add("ms2", "Available chlorine for superchlorination (first draft)", "m_s2",
       "={V}*{cs}/1000000", "kg", planted=("unit-scale", "g to kg divided by 10⁶: /1000 doubled"))
POOLS = pl.finish()

WATER = {
    "A1": "Properties of water by temperature (rounded; check against the tables before use)",
    "A2": "Sources: IAPWS-95 / IAPWS-IF97 (from memory); °F = 1.8·°C + 32 (SI Brochure 9th ed.).",
    "A3": CAUTION,
    "A5": "Temperature [°C]", "B5": "Density [kg/m³]", "C5": "Specific heat [kJ/(kg·K)]",
    "D5": "Vapour pressure [kPa]", "E5": "Temperature [°F]",
}
for r, (t, rho, cp, pv) in enumerate([(10, 999.7, 4.193, 1.228), (20, 998.2, 4.182, 2.339),
                                      (26, 996.8, 4.180, 3.363), (28, 996.2, 4.179, 3.782),
                                      (30, 995.7, 4.178, 4.247)], start=6):
    WATER[f"A{r}"], WATER[f"B{r}"], WATER[f"C{r}"], WATER[f"D{r}"] = t, rho, cp, pv
    WATER[f"E{r}"] = f"=A{r}*1.8+32"
WATER["E9"] = "=A9/1.8+32"
WATER_PLANTED = {"Water!E9": ("offset-scale", "°C to °F with the 1.8 dividing: wrong way round")}

POOLB = {
    "trade": "leisure: municipal pool circulation, filters, heating and chlorine dosing",
    "sheets": [("Pool", POOLS), ("Water", WATER)],
    "planted": {**pl.planted, **WATER_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 4: underground parking garage CO ventilation (m², m, m³, ft², cfm/ft², cfm, m³/s, 1/h,
# min, g/min, kg/h, kPa, °C, K, g/mol, J/(mol·K), kg/m³, ppm, m³/h, Pa, %, kW, in. w.g., bhp,
# J/(kg·K), m/s, fpm, h, MWh)
# --------------------------------------------------------------------------------------------
CAR_SRC = (
    "Sources: 1 m² = 10.76 ft², 1 cfm = 0.0004719 m³/s, 1 m³/s = 2119 cfm, 1 m/s = 196.9 fpm, "
    "1 in. w.g. = 249.1 Pa (NIST SP 811 (2008) App. B.8); K = °C + 273.15 (SI Brochure 9th "
    "ed.); 0.75 cfm/ft² exhaust for enclosed parking (ASHRAE 62.1-2019 Table 6.5 and IMC "
    "2021 Table 403.3.1.1, from memory); contaminant method Q = G/(c_lim − c_o) and cold-start "
    "CO emission per car (ASHRAE Handbook, HVAC Applications (2019), ch. 16, from memory); "
    "ideal gas ρ = p·M/(R·T), R = 8.314 J/(mol·K) (CODATA 2018), M(CO) = 28.01 g/mol; 10 air "
    "changes per hour in fire mode (BS 7346-7:2013, from memory); fan laws Q ∝ n, P ∝ n³ and "
    "bhp = cfm·TP/(6356·η) (common practice); stack pressure Δp = (ρ_o − ρ_i)·g·H, g_n = 9.81 "
    "m/s² (SI Brochure 9th ed.), air R = 287.05 J/(kg·K). Garage, levels, traffic and readings "
    "invented.")
cg = ItemSheet("Vent", "Lantern Square (invented): three-level underground car park, CO "
               "ventilation by exhaust fans, normal and fire mode", CAR_SRC)
cg.heading("Garage (Levels sheet)")
cg.add("Atot", "Floor area, all levels", "A", "=Levels!B9", "m²")
cg.add("Vtot", "Air volume, all levels", "V", "=Levels!D9", "m³")
cg.add("rate", "Code exhaust rate for enclosed parking", "q_A", 0.75, "cfm/ft²")
cg.heading("Code minimum exhaust")
cg.add("Qcfm", "Code minimum exhaust (Levels sheet)", "Q_code", "=Levels!F9", "cfm")
cg.add("Qs", "Code minimum exhaust, m³/s", "Q_code,SI", "={Qcfm}*0.0004719", "m³/s")
cg.add("ach", "Air changes per hour at the code rate", "n", "={Qs}*3600/{Vtot}", "1/h")
cg.add("ach2", "Air changes per hour at the code rate (first draft)", "n_2", "={Qs}/{Vtot}",
       "1/h", planted=("unit-scale", "per second written as per hour: the ×3600 missing"))
cg.heading("Contaminant method (CO)")
cg.add("nv", "Vehicles in and out, peak hour (traffic study, invented)", "N_v", 360, "1/h")
cg.add("tr", "Mean running time in the garage per vehicle", "t_r", 2.5, "min")
cg.add("ncar", "Vehicles running at any moment", "n_c", "={nv}*{tr}/60", "-")
cg.add("eCO", "CO emission per vehicle running cold", "e", 4.0, "g/min")
cg.add("G", "CO generation", "G", "={ncar}*{eCO}*60/1000", "kg/h")
cg.add("pb", "Barometer (site, invented)", "p_b", 101.3, "kPa")
cg.add("ti", "Garage air temperature", "t_i", 15, "°C")
cg.add("TK", "Garage air temperature, absolute", "T_i", "={ti}+273.15", "K")
cg.add("TK2", "Garage air temperature, absolute (first draft)", "T_i2", "={ti}", "K",
       planted=("offset-scale", "a °C reading set equal to kelvins"))
cg.add("M", "Molar mass of CO", "M", 28.01, "g/mol")
cg.add("R", "Molar gas constant", "R", 8.314, "J/(mol·K)")
cg.add("rhoCO", "Density of CO at garage conditions", "ρ_CO", "={pb}*{M}/({R}*{TK})", "kg/m³")
cg.add("cl", "CO design limit in the garage", "c_lim", 25, "ppm")
cg.add("co", "CO in the outdoor air", "c_o", 2, "ppm")
cg.add("Qco", "Exhaust to hold CO at the limit", "Q_CO",
       "={G}/{rhoCO}/(({cl}-{co})/1000000)", "m³/h")
cg.add("Qco2", "Exhaust to hold CO at the limit (first draft)", "Q_CO2",
       "={G}/{rhoCO}/({cl}-{co})", "m³/h",
       planted=("unit-scale", "a ppm difference used as a fraction: the 10⁶ missing"))
cg.add("Qcos", "Exhaust to hold CO at the limit, m³/s", "Q_CO,s", "={Qco}/3600", "m³/s")
cg.heading("Fire mode and fans")
cg.add("nF", "Fire mode, air changes per hour", "n_F", 10, "1/h")
cg.add("QF", "Fire mode exhaust", "Q_F", "={nF}*{Vtot}/3600", "m³/s")
cg.add("Qd", "Normal mode exhaust, larger of code and CO", "Q_d", "=MAX({Qs},{Qcos})", "m³/s")
cg.add("nfan", "Exhaust fans, sized for fire mode", "n_fan", 4, "-")
cg.add("Qfan", "Flow per fan, fire mode", "Q_fan", "={QF}/{nfan}", "m³/s")
cg.add("dpf", "Fan total pressure, fire mode (system curve, invented)", "Δp_f", 450, "Pa")
cg.add("etaf", "Fan total efficiency (maker, invented)", "η_f", 62, "%")
cg.add("Pf", "Fan shaft power, fire mode, per fan", "P_f", "={Qfan}*{dpf}/({etaf}/100)/1000",
       "kW")
cg.add("Pf2", "Fan shaft power, fire mode, per fan (first draft)", "P_f2",
       "={Qfan}*{dpf}/({etaf}/100)", "kW",
       planted=("unit-scale", "W written as kW: the /1000 missing"))
cg.add("dpin", "Fan total pressure, in. w.g.", "Δp_f,US", "={dpf}/249.1", "in. w.g.")
cg.add("Qfcfm", "Flow per fan, cfm", "Q_fan,US", "={Qfan}*2119", "cfm")
cg.add("bhp", "Fan brake power per fan (US check)", "bhp",
       "={Qfcfm}*{dpin}/(6356*{etaf}/100)", "bhp")
cg.add("sp", "Fan speed in normal mode, share of full speed", "s", "={Qd}/{QF}*100", "%")
cg.add("Pn", "Fan power in normal mode, all fans", "P_n", "={nfan}*{Pf}*({sp}/100)^3", "kW")
cg.add("Pn2", "Fan power in normal mode, all fans (first draft)", "P_n2",
       "={nfan}*{Pf}*{sp}^3/100", "kW",
       planted=("unit-scale", "a % speed cubed and divided by 100 once: 10⁴ too large"))
cg.add("hn", "Normal mode running hours per year", "t_n", 6570, "h")
cg.add("E", "Fan energy per year, normal mode", "E", "={Pn}*{hn}/1000", "MWh")
cg.heading("Exhaust shaft")
cg.add("Hsh", "Exhaust shaft height, lowest level to discharge", "H_sh", 14, "m")
cg.add("to", "Outdoor temperature, winter", "t_o", -5, "°C")
cg.add("Ra", "Gas constant of dry air", "R_a", 287.05, "J/(kg·K)")
cg.add("rhoo", "Outdoor air density", "ρ_o", "={pb}*1000/({Ra}*({to}+273.15))", "kg/m³")
cg.add("rhoi", "Garage air density", "ρ_i", "={pb}*1000/({Ra}*{TK})", "kg/m³")
cg.add("dps", "Stack pressure in the shaft, winter", "Δp_s", "=({rhoo}-{rhoi})*9.81*{Hsh}",
       "Pa")
cg.add("dps2", "Stack pressure in the shaft, winter (first draft)", "Δp_s2",
       "=({rhoo}-{rhoi})*{Hsh}", "Pa", planted=("result-unit", "ρ·H with g left out"))
cg.add("ash", "Shaft free area (2.4 m × 2.0 m)", "A_sh", 4.8, "m²")
cg.add("vsh", "Velocity in the shaft, normal mode", "v_sh", "={Qd}/{ash}", "m/s")
cg.add("vfpm", "Velocity in the shaft, fpm", "v_sh,US", "={vsh}*196.9", "fpm")
cg.add("vfpm2", "Velocity in the shaft, fpm (first draft)", "v_sh,US2", "={vsh}*3.281", "fpm",
       planted=("unit-scale", "m/s to ft/s written as fpm: the ×60 missing"))
CARS = cg.finish(others=())

_rate = cg.ref("rate")
LEVELS = {
    "A1": "Lantern Square car park: levels, volumes and code exhaust (invented levels)",
    "A2": "Sources: volume = area × clear height; 1 m² = 10.76 ft² (NIST SP 811 (2008) App. "
          "B.8); 0.75 cfm/ft² (ASHRAE 62.1-2019, from memory), the rate in the Vent sheet.",
    "A3": CAUTION,
    "A5": "Level", "B5": "Floor area [m²]", "C5": "Clear height [m]", "D5": "Volume [m³]",
    "F5": "Code exhaust [cfm]", "G5": "Code exhaust [m³/s]",
    "A9": "Total", "B9": "=SUM(B6:B8)", "D9": "=SUM(D6:D8)", "F9": "=SUM(F6:F8)",
}
for r, (lvl, area, hgt) in enumerate([("B1", 4200, 2.6), ("B2", 4200, 2.6), ("B3", 3900, 2.8)],
                                     start=6):
    LEVELS[f"A{r}"], LEVELS[f"B{r}"], LEVELS[f"C{r}"] = lvl, area, hgt
    LEVELS[f"D{r}"] = f"=B{r}*C{r}"
    LEVELS[f"F{r}"] = f"=B{r}*10.76*{_rate}"
    LEVELS[f"G{r}"] = f"=F{r}*0.0004719"
LEVELS["G7"] = f"=B7*{_rate}*0.0004719"
LEVELS_PLANTED = {"Levels!G7": ("unit-scale", "m² times a rate per ft²: the 10.76 missing")}

CARB = {
    "trade": "building services: underground car park CO ventilation, fans and shaft",
    "sheets": [("Vent", CARS), ("Levels", LEVELS)],
    "planted": {**cg.planted, **LEVELS_PLANTED},
}

BOOKS = {"greenhouse-kestrel-fen": GHB, "sawmill-alder-cross": SAWB,
         "pool-brackwater": POOLB, "car-park-lantern-square": CARB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()
