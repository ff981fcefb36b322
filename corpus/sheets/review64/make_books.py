#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review64), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; pattern after
corpus/sheets/review55/make_books.py.

Trades: a commercial laundry's steam and hot water (tunnel washer, boiler, gas); a municipal
wastewater works' aeration blowers (SOTR and AOTR, airflow, blower power); a farm shop's solar
PV array and battery; a gas pipeline's pressure drop by Weymouth (with a Panhandle A check). All
scenarios, sites, firms, readings and maker's data are invented (demonstration only); the
formulas and published factors are the trade's own, with their sources named in a text cell at
the top of each sheet ("from memory" where recalled and not checked, "common practice" for a
fact of the trade with no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and
its messages that mislead, are recorded in review_notes.py after running the frozen binary.

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
# Book 1: commercial laundry, tunnel washer hot water and steam (kg/h, lb/h, L/kg, US gal/lb,
# L/h, m³/h, gpm, m³/d, %, °C, °F, K, kg/L, kJ/(kg·K), kJ/kg, kW, W, Btu/h, BHP, bar(g), psig,
# bar a, m³/h of gas, MJ/m³, therm/h, therm/d, $/therm, $/d, $/kg, kWh/kg, ppm)
# --------------------------------------------------------------------------------------------
LDY_SRC = (
    "Sources: 1 kg = 2.205 lb, 1 L = 0.2642 US gal, 1 US gal = 3.785 L, 1 bar = 14.50 psi, "
    "1 kW = 3412 Btu/h, 1 therm = 105.5 MJ, 1 boiler horsepower = 33 475 Btu/h = 9.81 kW "
    "(NIST SP 811 (2008) App. B.8); °F = 1.8·°C + 32 (SI Brochure 9th ed. and NIST SP 811); "
    "tunnel washer fresh water 4 to 8 L/kg of dry linen with rinse recycling (common practice, "
    "5.5 L/kg invented); heat Q = m·c_p·ΔT, c_p of water 4.19 kJ/(kg·K) (common practice); US "
    "check Btu/h = 500·gpm·ΔT(°F), 500 = 8.33 lb/gal × 60 min/h × 1 Btu/(lb·°F) (ASHRAE "
    "Handbook, HVAC Applications, service water heating, from memory); saturated steam on the "
    "Steam sheet and h_f = 419 kJ/kg, h_fg = 2257 kJ/kg at 1.013 bar a, h_f = 356 kJ/kg at 85 °C "
    "(IAPWS-IF97 steam tables, from memory); steam to a calorifier = Q/h_fg, condensate leaving "
    "saturated (common practice); boiler output = ṁ·(h_g − h_fw) (common practice); natural gas "
    "gross calorific value 39.5 MJ/m³ (typical of UK supply, from memory); flash steam share = "
    "(h_f1 − h_f2)/h_fg2 and blowdown share = F/(B − F) from dissolved solids (common "
    "practice). Laundry, boiler, maker's data, tariff and readings invented.")
ld = ItemSheet("Tunnel", "Kestrel Linen Services, Ashby Fold works (invented): 16-module tunnel "
               "washer, calorifier and steam boiler, design day", LDY_SRC)
ld.heading("Throughput")
ld.add("mh", "Tunnel washer throughput (dry linen)", "ṁ", 1400, "kg/h")
ld.add("hrs", "Operating hours", "t_op", 16, "h/d")
ld.add("md", "Linen per day", "m_d", "={mh}*{hrs}", "kg/d")
ld.add("mhlb", "Tunnel throughput, lb/h (US maker's rating)", "ṁ_US", "={mh}*2.205", "lb/h")
ld.add("mhlb2", "Tunnel throughput, lb/h (first draft)", "ṁ_US2", "={mh}/2.205", "lb/h",
       planted=("unit-scale", "kg to lb divided by 2.205: wrong way round"))
ld.heading("Fresh water")
ld.add("wl", "Fresh water per kg of linen (with rinse recycling)", "w", 5.5, "L/kg")
ld.add("wlg", "Fresh water per lb of linen, US gal/lb (US maker's data)", "w_US",
       "={wl}*0.2642/2.205", "US gal/lb")
ld.add("wlg2", "Fresh water per lb of linen (first draft)", "w_US2", "={wl}*0.2642",
       "US gal/lb", planted=("unit-scale", "L/kg to US gal/lb with the kg to lb left out"))
ld.add("Vw", "Fresh water flow", "V̇_w", "={mh}*{wl}", "L/h")
ld.add("Vwm3", "Fresh water flow, m³/h", "V̇_w,m3", "={Vw}/1000", "m³/h")
ld.add("Vwm32", "Fresh water flow, m³/h (water board form)", "V̇_w,m3 2", "={Vw}/1000000",
       "m³/h", planted=("unit-scale", "L to m³ divided by 10⁶: the /1000 doubled"))
ld.add("Vwgpm", "Fresh water flow, US gpm", "V̇_w,US", "={Vw}/60/3.785", "gpm")
ld.add("Vwd", "Fresh water per day", "V_d", "={Vwm3}*{hrs}", "m³/d")
ld.heading("Hot water to the tunnel (calorifier)")
ld.add("sh", "Share of the fresh water heated", "s_h", 45, "%")
ld.add("tc", "Cold mains water temperature", "t_c", 10, "°C")
ld.add("th", "Hot water temperature to the tunnel", "t_h", 70, "°C")
ld.add("tcF", "Cold mains water temperature, °F", "t_c,F", "={tc}*1.8+32", "°F")
ld.add("thF", "Hot water temperature, °F", "t_h,F", "={th}*1.8+32", "°F")
ld.add("rhow", "Density of cold water at 10 °C", "ρ_w", 0.9997, "kg/L")
ld.add("mhw", "Hot water mass flow", "ṁ_hw", "={Vw}*{sh}/100*{rhow}", "kg/h")
ld.add("cpw", "Specific heat of water", "c_p", 4.19, "kJ/(kg·K)")
ld.add("dT", "Temperature rise in the calorifier", "ΔT", "={th}-{tc}", "K")
ld.add("Qhw", "Calorifier duty", "Q_hw", "={mhw}*{cpw}*{dT}/3600", "kW")
ld.add("Qhw2", "Calorifier duty (first draft)", "Q_hw2", "={mhw}*{cpw}*{dT}", "kW",
       planted=("unit-scale", "kg/h × kJ/kg written as kW: the /3600 missing"))
ld.add("QhwB", "Calorifier duty, Btu/h", "Q_hw,US", "={Qhw}*3412", "Btu/h")
ld.add("QhwUS", "Calorifier duty, Btu/h (US check, 500·gpm·ΔT)", "Q_hw,US c",
       "=500*{Vwgpm}*{sh}/100*({thF}-{tcF})", "Btu/h")
ld.heading("Steam")
ld.add("pg", "Boiler operating pressure", "p_g", 10.0, "bar(g)")
ld.add("pgpsig", "Boiler operating pressure, psig (US burner maker)", "p_g,US", "={pg}*14.5",
       "psig")
ld.add("pb", "Site barometer (invented)", "p_b", 1.01, "bar a")
ld.add("pa", "Boiler operating pressure, absolute", "p_a", "={pg}+{pb}", "bar a")
ld.add("pa2", "Boiler operating pressure, absolute (first draft)", "p_a2", "={pg}", "bar a",
       planted=("offset-scale", "a gauge reading set equal to an absolute pressure"))
ld.add("hf", "Enthalpy of saturated water (Steam sheet)", "h_f",
       "=VLOOKUP({pa},Steam!A6:F9,3,TRUE)", "kJ/kg")
ld.add("hfg", "Latent heat (Steam sheet)", "h_fg", "=VLOOKUP({pa},Steam!A6:F9,4,TRUE)", "kJ/kg")
ld.add("hg", "Enthalpy of dry saturated steam (Steam sheet)", "h_g",
       "=VLOOKUP({pa},Steam!A6:F9,5,TRUE)", "kJ/kg")
ld.add("msw", "Steam to the calorifier", "ṁ_s,hw", "={Qhw}*3600/{hfg}", "kg/h")
ld.add("mdr", "Steam to the dryers and ironers (makers' data, invented)", "ṁ_s,dr", 1150, "kg/h")
ld.add("ms", "Steam demand", "ṁ_s", "={msw}+{mdr}", "kg/h")
ld.add("mslb", "Steam demand, lb/h", "ṁ_s,US", "={ms}*2.205", "lb/h")
ld.add("hfw", "Feedwater enthalpy at 85 °C (tables)", "h_fw", 356, "kJ/kg")
ld.add("Qb", "Boiler output to steam", "Q_b", "={ms}*({hg}-{hfw})/3600", "kW")
ld.add("Qbhp", "Boiler output, boiler horsepower", "Q_b,BHP", "={Qb}/9.81", "BHP")
ld.add("Pls", "Boiler shell and steam main standing loss (invented)", "P_ls", 6500, "W")
ld.add("Qbt", "Boiler load including standing loss", "Q_bt", "={Qb}+{Pls}/1000", "kW")
ld.add("Qbt2", "Boiler load including standing loss (first draft)", "Q_bt2", "={Qb}+{Pls}",
       "kW", planted=("unit-scale", "W added to kW"))
ld.heading("Gas")
ld.add("eta", "Boiler efficiency, gross calorific value", "η_b", 82, "%")
ld.add("Pin", "Gas input", "P_in", "={Qbt}/({eta}/100)", "kW")
ld.add("Pin2", "Gas input (first draft)", "P_in2", "={Qbt}/{eta}", "kW",
       planted=("unit-scale", "a % used as a fraction: 100 too small"))
ld.add("CV", "Gross calorific value of the gas", "CV", 39.5, "MJ/m³")
ld.add("Vg", "Gas flow", "V̇_g", "={Pin}*3.6/{CV}", "m³/h")
ld.add("Vg2", "Gas flow (meter check)", "V̇_g2", "={Pin}*3600/{CV}", "m³/h",
       planted=("unit-scale", "kJ/h over MJ/m³: the /1000 missing"))
ld.add("thr", "Gas use, therms per hour", "G_th", "={Pin}*3.6/105.5", "therm/h")
ld.add("thd", "Gas use per day", "G_d", "={thr}*{hrs}", "therm/d")
ld.add("tar", "Gas tariff (invented)", "c_g", 1.10, "$/therm")
ld.add("cd", "Gas cost per day", "C_d", "={thd}*{tar}", "$/d")
ld.heading("Flash steam and blowdown")
ld.add("hf0", "Enthalpy of saturated water at 1.013 bar a (vented receiver)", "h_f0", 419,
       "kJ/kg")
ld.add("hfg0", "Latent heat at 1.013 bar a", "h_fg0", 2257, "kJ/kg")
ld.add("fl", "Flash steam share of the condensate", "x_fl", "=({hf}-{hf0})/{hfg0}*100", "%")
ld.add("mfl", "Flash steam at the vented receiver", "ṁ_fl", "={ms}*{fl}/100", "kg/h")
ld.add("F", "Feedwater dissolved solids", "F", 250, "ppm")
ld.add("B", "Boiler water dissolved solids, maximum (maker)", "B", 3000, "ppm")
ld.add("bd", "Blowdown share of the feedwater", "b", "={F}/({B}-{F})*100", "%")
LDYS = ld.finish()

STEAM = {
    "A1": "Saturated steam by absolute pressure (IAPWS-IF97 steam tables, rounded, from memory; "
          "check against the tables before use)",
    "A2": "Sources: IAPWS-IF97 (from memory); °F = 1.8·°C + 32 (NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Pressure [bar a]", "B5": "t_sat [°C]", "C5": "h_f [kJ/kg]", "D5": "h_fg [kJ/kg]",
    "E5": "h_g [kJ/kg]", "F5": "t_sat [°F]",
}
for r, (p, t, hf, hfg, hg) in enumerate([(9, 175.4, 742.6, 2030.5, 2773.0),
                                         (10, 179.9, 762.6, 2014.6, 2777.1),
                                         (11, 184.1, 781.1, 1999.6, 2780.7),
                                         (12, 188.0, 798.3, 1985.4, 2783.7)], start=6):
    STEAM[f"A{r}"], STEAM[f"B{r}"], STEAM[f"C{r}"] = p, t, hf
    STEAM[f"D{r}"], STEAM[f"E{r}"] = hfg, hg
    STEAM[f"F{r}"] = f"=B{r}*1.8+32"
STEAM["F7"] = "=B7*5/9+32"
STEAM_PLANTED = {"Steam!F7": ("unit-scale", "°C to °F by 5/9: the degree's ratio turned over")}

LDYB = {
    "trade": "commercial laundry: tunnel washer water, calorifier, steam boiler and gas",
    "sheets": [("Tunnel", LDYS), ("Steam", STEAM)],
    "planted": {**ld.planted, **STEAM_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 2: municipal wastewater aeration blowers (m³/d, mg/L, kg/kg, kg O2/d, kg O2/h, °C, °F, K,
# kPa, kPa(g), psig, bar(g), m, %/m, %, kg/m³, Nm³/h, m³/h, scfm, kg/s, kJ/(kg·K), kW, hp,
# kWh/d, kg O2/kWh)
# --------------------------------------------------------------------------------------------
AER_SRC = (
    "Sources: Metcalf & Eddy, Wastewater Engineering, 5th ed. (2014), ch. 5 and 8, from memory: "
    "oxygen 1.1 kg per kg BOD removed (invented within the book's range), 4.57 kg O2 per kg N "
    "nitrified, AOTR/SOTR = α·F·(β·τ·Ω·C*∞20 − C_L)/C*∞20 · θ^(T−20), θ = 1.024, τ = C*st/C*s20, "
    "Ω = p_b/p_s, C*∞20 = C*s20·(1 + d_e·D_f/P_a) with d_e = 0.4 and P_a the standard "
    "atmosphere as a water column; saturated dissolved oxygen by temperature on the DO sheet "
    "(Standard Methods, from memory); mg/L = g/m³ (SI Brochure 9th ed.); air 23.18 % oxygen by "
    "mass and 1.293 kg/Nm³ at 0 °C, 101.325 kPa (Perry's Chemical Engineers' Handbook, 8th ed., "
    "from memory); US blower 'standard' air at 20 °C (68 °F), 101.325 kPa, so 1 Nm³/h = 35.31/60 "
    "× 293.15/273.15 = 0.6317 scfm (common practice); 1 m³ = 35.31 ft³, 1 psi = 6.895 kPa, "
    "1 bar = 100 kPa, 1 hp = 0.7457 kW (NIST SP 811 (2008) App. B.8); static head ρ·g·h, g_n = "
    "9.81 m/s² (SI Brochure 9th ed.); adiabatic blower power P = ṁ·c_p·T₁·[(p₂/p₁)^((k−1)/k) − "
    "1]/η, discharge T₂ = T₁·[1 + ((p₂/p₁)^((k−1)/k) − 1)/η], c_p = 1.005 kJ/(kg·K), k = 1.4 "
    "(common practice). Works, basins, diffuser maker's data and readings invented.")
ae = ItemSheet("Aeration", "Millrace Vale wastewater treatment works (invented): activated "
               "sludge aeration, fine-bubble diffusers, duty blowers, summer design", AER_SRC)
ae.heading("Oxygen demand (AOTR)")
ae.add("Q", "Design flow to the aeration lanes", "Q", 18000, "m³/d")
ae.add("S0", "Settled sewage BOD", "S_0", 180, "mg/L")
ae.add("S", "Effluent soluble BOD", "S", 10, "mg/L")
ae.add("NOx", "Ammonia nitrified", "N_ox", 30, "mg/L")
ae.add("fc", "Oxygen per BOD removed", "f_c", 1.1, "kg/kg")
ae.add("fn", "Oxygen per nitrogen nitrified", "f_n", 4.57, "kg/kg")
ae.add("Rc", "Oxygen for BOD removal", "R_c", "={Q}*({S0}-{S})/1000*{fc}", "kg O2/d")
ae.add("Rc2", "Oxygen for BOD removal (first draft)", "R_c2", "={Q}*({S0}-{S})*{fc}",
       "kg O2/d", planted=("unit-scale", "m³/d × mg/L gives g/d, written as kg/d: /1000 missing"))
ae.add("Rn", "Oxygen for nitrification", "R_n", "={Q}*{NOx}/1000*{fn}", "kg O2/d")
ae.add("pk", "Peak factor on the oxygen load", "f_pk", 1.3, "-")
ae.add("AOTR", "Actual oxygen transfer rate, peak", "AOTR", "=({Rc}+{Rn})*{pk}", "kg O2/d")
ae.heading("Field to standard conditions (SOTR)")
ae.add("T", "Mixed liquor temperature, summer", "T", 22, "°C")
ae.add("TF", "Mixed liquor temperature, °F (US diffuser maker)", "T_F", "={T}*1.8+32", "°F")
ae.add("alpha", "α, fine-bubble diffusers in mixed liquor", "α", 0.55, "-")
ae.add("beta", "β, salinity and surface tension", "β", 0.95, "-")
ae.add("Ff", "Fouling factor", "F", 0.9, "-")
ae.add("theta", "Temperature correction factor", "θ", 1.024, "-")
ae.add("CL", "Operating dissolved oxygen", "C_L", 2.0, "mg/L")
ae.add("Cs20", "Saturated DO at 20 °C, clean water (DO sheet)", "C*s20", 9.09, "mg/L")
ae.add("Cst", "Saturated DO at the mixed liquor temperature (DO sheet)", "C*st",
       "=VLOOKUP({T},DO!A6:B11,2,FALSE)", "mg/L")
ae.add("pb", "Site barometer (works at 240 m, invented)", "p_b", 97.8, "kPa")
ae.add("ps", "Standard atmosphere", "p_s", 101.325, "kPa")
ae.add("Df", "Diffuser submergence", "D_f", 5.0, "m")
ae.add("de", "Mid-depth correction factor", "d_e", 0.4, "-")
ae.add("Pa", "Standard atmosphere as a water column", "P_a", "={ps}/9.81", "m")
ae.add("Cinf", "Saturated DO at mid-depth, 20 °C", "C*∞20", "={Cs20}*(1+{de}*{Df}/{Pa})",
       "mg/L")
ae.add("tau", "τ, saturation temperature correction", "τ", "={Cst}/{Cs20}", "-")
ae.add("Om", "Ω, pressure correction", "Ω", "={pb}/{ps}", "-")
ae.add("rat", "AOTR/SOTR", "AOTR/SOTR",
       "={alpha}*{Ff}*({beta}*{tau}*{Om}*{Cinf}-{CL})/{Cinf}*{theta}^({T}-20)", "-")
ae.add("rat2", "AOTR/SOTR (US maker's spreadsheet)", "AOTR/SOTR 2",
       "={alpha}*{Ff}*({beta}*{tau}*{Om}*{Cinf}-{CL})/{Cinf}*{theta}^({TF}-20)", "-",
       planted=("unit-scale", "θ^(T−20) with the temperature in °F"))
ae.add("SOTR", "Standard oxygen transfer rate", "SOTR", "={AOTR}/{rat}", "kg O2/d")
ae.add("SOTRh", "Standard oxygen transfer rate, hourly", "SOTR_h", "={SOTR}/24", "kg O2/h")
ae.heading("Air")
ae.add("SOTEm", "Standard oxygen transfer efficiency per m of submergence (maker)", "SOTE/m",
       6.0, "%/m")
ae.add("SOTE", "Standard oxygen transfer efficiency", "SOTE", "={SOTEm}*{Df}", "%")
ae.add("wO2", "Oxygen in air, by mass", "w_O2", 0.2318, "kg/kg")
ae.add("rhoN", "Density of air at 0 °C and 101.325 kPa", "ρ_N", 1.293, "kg/Nm³")
ae.add("qN", "Blower airflow", "q_N", "={SOTRh}/({SOTE}/100*{wO2}*{rhoN})", "Nm³/h")
ae.add("qN2", "Blower airflow (first draft)", "q_N2", "={SOTRh}/({SOTE}*{wO2}*{rhoN})", "Nm³/h",
       planted=("unit-scale", "a % used as a fraction: 100 too small"))
ae.add("qscfm", "Blower airflow, scfm (68 °F, 14.7 psia; US blower maker)", "q_US",
       "={qN}*0.6317", "scfm")
ae.add("tin", "Blower inlet air temperature, summer", "t_in", 30, "°C")
ae.add("Tin", "Blower inlet air temperature, absolute", "T_in", "={tin}+273.15", "K")
ae.add("dpf", "Inlet filter and silencer loss", "Δp_f", 0.6, "kPa")
ae.add("p1", "Blower inlet pressure, absolute", "p_1", "={pb}-{dpf}", "kPa")
ae.add("qA", "Blower inlet airflow, actual", "q_A", "={qN}*{Tin}/273.15*{ps}/{p1}", "m³/h")
ae.add("qA2", "Blower inlet airflow, actual (first draft)", "q_A2",
       "={qN}*{tin}/273.15*{ps}/{p1}", "m³/h",
       planted=("offset-scale", "a °C reading in a ratio of absolute temperatures"))
ae.add("w", "Air mass flow", "ṁ", "={qN}*{rhoN}/3600", "kg/s")
ae.add("w2", "Air mass flow (first draft)", "ṁ_2", "={qN}*{rhoN}/60", "kg/s",
       planted=("unit-scale", "per hour over 60 taken as per second: 60 where 3600 belongs"))
ae.heading("Blower pressure")
ae.add("rhoml", "Density of the mixed liquor", "ρ_ml", 998, "kg/m³")
ae.add("pst", "Static head on the diffusers", "Δp_st", "={rhoml}*9.81*{Df}/1000", "kPa")
ae.add("pst2", "Static head on the diffusers (first draft)", "Δp_st2", "={rhoml}*{Df}/1000",
       "kPa", planted=("result-unit", "ρ·h with g left out"))
ae.add("dpd", "Diffuser loss at design flow (maker)", "Δp_d", 4.0, "kPa")
ae.add("dpp", "Air main and drop-pipe friction loss", "Δp_p", 5.5, "kPa")
ae.add("pd", "Blower discharge pressure", "p_d", "={pst}+{dpd}+{dpp}", "kPa(g)")
ae.add("pdbar", "Blower discharge pressure, bar(g)", "p_d,bar", "={pd}/100", "bar(g)")
ae.add("pdbar2", "Blower discharge pressure, bar(g) (first draft)", "p_d,bar2", "={pd}/1000",
       "bar(g)", planted=("unit-scale", "kPa to bar divided by 1000 where 100 belongs"))
ae.add("p2", "Blower discharge pressure, absolute", "p_2", "={pd}+{pb}", "kPa")
ae.add("r", "Pressure ratio", "r", "={p2}/{p1}", "-")
ae.add("r2", "Pressure ratio (first draft)", "r_2", "={pd}/{p1}", "-",
       planted=("offset-scale", "a gauge pressure over an absolute one"))
ae.heading("Blower power")
ae.add("k", "Ratio of specific heats of air", "k", 1.4, "-")
ae.add("n", "Exponent (k − 1)/k", "n", "=({k}-1)/{k}", "-")
ae.add("cp", "Specific heat of air", "c_p", 1.005, "kJ/(kg·K)")
ae.add("etab", "Blower efficiency at duty (maker's curve, invented)", "η_b", 72, "%")
ae.add("etam", "Motor and drive efficiency", "η_m", 94, "%")
ae.add("Pad", "Adiabatic air power", "P_ad", "={w}*{cp}*{Tin}*({r}^{n}-1)", "kW")
ae.add("Psh", "Blower shaft power", "P_sh", "={Pad}/({etab}/100)", "kW")
ae.add("Pel", "Electrical input", "P_el", "={Psh}/({etam}/100)", "kW")
ae.add("T2", "Blower discharge temperature, absolute", "T_2",
       "={Tin}*(1+({r}^{n}-1)/({etab}/100))", "K")
ae.add("t2", "Blower discharge temperature", "t_2", "={T2}-273.15", "°C")
ae.add("t2b", "Blower discharge temperature (first draft)", "t_2b",
       "={tin}*(1+({r}^{n}-1)/({etab}/100))", "°C",
       planted=("offset-scale", "a °C reading scaled by a pressure ratio: absolute belongs"))
ae.add("E", "Blower energy per peak day", "E", "={Pel}*24", "kWh/d")
ae.add("AE", "Aeration efficiency, wire to water", "AE", "={AOTR}/{E}", "kg O2/kWh")
AERS = ae.finish()

_qN = ae.ref("qN")
ZONES = {
    "A1": "Millrace Vale: tapered air split along each aeration lane (invented shares and "
          "diffuser counts)",
    "A2": "Sources: zone air = share × total (common practice); saturated DO from Standard "
          "Methods (from memory).",
    "A3": CAUTION,
    "A5": "Zone", "B5": "Share of air [%]", "C5": "Diffusers [-]", "D5": "Air [Nm³/h]",
    "A10": "Total", "B10": "=SUM(B6:B9)", "D10": "=SUM(D6:D9)",
}
for r, (z, sh, nd) in enumerate([("Zone 1 (inlet)", 35, 900), ("Zone 2", 28, 720),
                                 ("Zone 3", 22, 560), ("Zone 4 (outlet)", 15, 380)], start=6):
    ZONES[f"A{r}"], ZONES[f"B{r}"], ZONES[f"C{r}"] = z, sh, nd
    ZONES[f"D{r}"] = f"=B{r}/100*{_qN}"
ZONES["D8"] = f"=B8*{_qN}"
ZONES_PLANTED = {"Zones!D8": ("unit-scale", "a % share used as a fraction: 100 too large")}

DO = {
    "A1": "Saturated dissolved oxygen in clean water at 101.325 kPa (Standard Methods for the "
          "Examination of Water and Wastewater, from memory)",
    "A2": "Sources: Standard Methods (from memory).",
    "A3": CAUTION,
    "A5": "Temperature [°C]", "B5": "C*s [mg/L]",
}
for r, (t, c) in enumerate([(10, 11.29), (15, 10.08), (20, 9.09), (22, 8.74), (25, 8.26),
                            (30, 7.56)], start=6):
    DO[f"A{r}"], DO[f"B{r}"] = t, c

AERB = {
    "trade": "wastewater: aeration blower sizing, AOTR to SOTR, airflow, pressure and power",
    "sheets": [("Aeration", AERS), ("Zones", ZONES), ("DO", DO)],
    "planted": {**ae.planted, **ZONES_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 3: farm shop solar PV and battery (W, kW, Wh/d, kWh/d, kWh/(m²·d), W/m², h/d, %, m, m²,
# ft², kWh/yr, °C, °F, Δ°F, %/K, V, A, Ah, kWh, kVA, Ω·mm²/m, mm², mV/A/m)
# --------------------------------------------------------------------------------------------
PV_SRC = (
    "Sources: array size = E/(PSH·PR), peak sun hours = daily irradiation over the 1000 W/m² "
    "of standard test conditions, performance ratio 70 to 80 % (IEC 61724-1, and MCS / common "
    "practice, from memory); cell temperature T_c = T_a + (NOCT − 20 °C)·G/800 W/m² and "
    "temperature coefficients of P_max and V_oc per kelvin from 25 °C (module data sheet "
    "practice, IEC 61215, from memory); battery capacity = E·autonomy/(DoD·η) and Ah = Wh/V "
    "(common practice); apparent power S = P/pf (common practice); voltage drop ΔV = 2·L·I·ρ/A, "
    "ρ of copper 0.0175 Ω·mm²/m (common practice), and by the tabulated mV/A/m (BS 7671:2018, "
    "App. 4, Table 4D2B, from memory: 7.3 mV/A/m for 6 mm² d.c., 4.4 mV/A/m for 10 mm² a.c. "
    "single phase); 1 m² = 10.76 ft² (NIST SP 811 (2008) App. B.8); °F = 1.8·°C + 32, and a "
    "difference of 1 K = 1.8 °F (SI Brochure 9th ed.). Farm shop, loads, site irradiation, "
    "module and battery data invented.")
pv = ItemSheet("PV", "Hollin Brook Farm Shop (invented): roof PV array, 48 V battery bank and "
               "hybrid inverter for the shop and cold room", PV_SRC)
pv.heading("Load (Loads sheet)")
pv.add("Ed", "Daily energy use", "E_d", "=Loads!E12/1000", "kWh/d")
pv.add("Pc", "Connected load", "P_c", "=Loads!F12/1000", "kW")
pv.add("div", "Diversity on the connected load", "f_div", 60, "%")
pv.add("Pmax", "Maximum demand", "P_max", "={Pc}*{div}/100", "kW")
pv.heading("Array")
pv.add("H", "Daily irradiation on the array plane, design month (invented)", "H", 2.8,
       "kWh/(m²·d)")
pv.add("Gs", "Irradiance at standard test conditions", "G_STC", 1000, "W/m²")
pv.add("PSH", "Peak sun hours", "PSH", "={H}/({Gs}/1000)", "h/d")
pv.add("PR", "Performance ratio", "PR", 75, "%")
pv.add("Preq", "Array peak power needed (kWp)", "P_req", "={Ed}/({PSH}*{PR}/100)", "kW")
pv.add("Preq2", "Array peak power needed (first draft)", "P_req2", "={Ed}/({PSH}*{PR})", "kW",
       planted=("unit-scale", "a % used as a fraction: 100 too small"))
pv.add("Wp", "Module rating at STC", "P_mod", 410, "W")
pv.add("N", "Modules", "N", "=ROUNDUP({Preq}*1000/{Wp},0)", "-")
pv.add("Pinst", "Array peak power installed (kWp)", "P_inst", "={N}*{Wp}/1000", "kW")
pv.add("Pinst2", "Array peak power installed (grant form)", "P_inst2", "={N}*{Wp}", "kW",
       planted=("unit-scale", "W written as kW: the /1000 missing"))
pv.add("Lm", "Module length", "L_m", 1.722, "m")
pv.add("Bm", "Module width", "B_m", 1.134, "m")
pv.add("Aarr", "Array area", "A", "={N}*{Lm}*{Bm}", "m²")
pv.add("Aft", "Array area, ft² (US racking supplier)", "A_US", "={Aarr}*10.76", "ft²")
pv.add("Aft2", "Array area, ft² (first draft)", "A_US2", "={Aarr}*3.281", "ft²",
       planted=("unit-scale", "m² to ft² by the length factor 3.281: it must be squared"))
pv.add("Hy", "Yearly irradiation on the array plane (invented)", "H_y", 1050, "kWh/(m²·yr)")
pv.add("Ey", "Yearly yield", "E_y", "={Pinst}*{Hy}/({Gs}/1000)*{PR}/100", "kWh/yr")
pv.heading("Module temperature and string")
pv.add("Ta", "Ambient temperature, summer design", "T_a", 30, "°C")
pv.add("NOCT", "Nominal operating cell temperature (data sheet)", "NOCT", 45, "°C")
pv.add("TaN", "Ambient temperature of the NOCT test", "T_a,NOCT", 20, "°C")
pv.add("GN", "Irradiance of the NOCT test", "G_NOCT", 800, "W/m²")
pv.add("Tc", "Cell temperature at STC irradiance, summer", "T_c",
       "={Ta}+({NOCT}-{TaN})*{Gs}/{GN}", "°C")
pv.add("dTF", "Cell temperature rise above ambient, °F (US maker's note)", "ΔT_F",
       "=({Tc}-{Ta})*1.8", "Δ°F")
pv.add("dTF2", "Cell temperature rise above ambient, °F (first draft)", "ΔT_F2",
       "=({Tc}-{Ta})*1.8+32", "Δ°F",
       planted=("offset-scale", "a difference converted like a reading: the +32 does not belong"))
pv.add("Ts", "Cell temperature at STC", "T_STC", 25, "°C")
pv.add("gam", "Temperature coefficient of P_max", "γ", -0.35, "%/K")
pv.add("Phot", "Module power at the summer cell temperature", "P_hot",
       "={Wp}*(1+{gam}/100*({Tc}-{Ts}))", "W")
pv.add("Phot2", "Module power at the summer cell temperature (first draft)", "P_hot2",
       "={Wp}*(1+{gam}*({Tc}-{Ts}))", "W",
       planted=("unit-scale", "a %/K coefficient used as a fraction: 100 too large"))
pv.add("Tmin", "Record low ambient at the site (invented)", "T_min", -10, "°C")
pv.add("TminF", "Record low ambient, °F (US inverter maker's tool)", "T_min,F",
       "={Tmin}*1.8+32", "°F")
pv.add("Voc", "Module open-circuit voltage at STC", "V_oc", 37.3, "V")
pv.add("bet", "Temperature coefficient of V_oc", "β", -0.27, "%/K")
pv.add("Voc2", "Module open-circuit voltage at the record low", "V_oc,cold",
       "={Voc}*(1+{bet}/100*({Tmin}-{Ts}))", "V")
pv.add("Vmx", "Inverter maximum DC input voltage", "V_max", 500, "V")
pv.add("nmx", "Modules per string, maximum", "n_max", "=ROUNDDOWN({Vmx}/{Voc2},0)", "-")
pv.heading("Battery")
pv.add("aut", "Autonomy", "t_aut", 1.0, "d")
pv.add("DoD", "Depth of discharge, maximum", "DoD", 80, "%")
pv.add("etab", "Battery round-trip efficiency", "η_b", 95, "%")
pv.add("Vb", "Battery bank voltage", "V_b", 48, "V")
pv.add("Eb", "Battery energy needed", "E_b", "={Ed}*{aut}/({DoD}/100*{etab}/100)", "kWh")
pv.add("Cb", "Battery capacity needed", "C_b", "={Eb}*1000/{Vb}", "Ah")
pv.add("Cb2", "Battery capacity needed (first draft)", "C_b2", "={Eb}/{Vb}", "Ah",
       planted=("unit-scale", "kWh over V taken as Ah: the ×1000 missing"))
pv.add("Cblk", "Battery block capacity (maker)", "C_blk", 200, "Ah")
pv.add("Vblk", "Battery block voltage", "V_blk", 12, "V")
pv.add("npar", "Parallel strings of blocks", "n_par", "=ROUNDUP({Cb}/{Cblk},0)", "-")
pv.add("Einst", "Battery energy installed", "E_inst", "={Vb}*{npar}*{Cblk}/1000", "kWh")
pv.heading("Inverter")
pv.add("pf", "Power factor of the load", "pf", 0.8, "-")
pv.add("S", "Inverter rating needed", "S", "={Pmax}/{pf}", "kVA")
pv.add("S2", "Inverter rating needed (first draft)", "S_2", "=Loads!F12*{div}/100/{pf}", "kVA",
       planted=("unit-scale", "W written as kVA: the /1000 missing"))
pv.add("Vac", "Supply voltage, single phase", "V_ac", 230, "V")
pv.add("Iac", "Inverter output current", "I_ac", "={S}*1000/{Vac}", "A")
pv.heading("Cable voltage drop")
pv.add("ns", "Modules per string chosen (3 strings of 12)", "n_s", 12, "-")
pv.add("Vmp", "Module voltage at maximum power", "V_mp", 31.3, "V")
pv.add("Imp", "Module current at maximum power", "I_mp", 13.1, "A")
pv.add("Vstr", "String voltage at maximum power", "V_str", "={ns}*{Vmp}", "V")
pv.add("Ldc", "String cable run, one way", "L_dc", 35, "m")
pv.add("Adc", "String cable size", "A_dc", 6, "mm²")
pv.add("rcu", "Resistivity of copper", "ρ_Cu", 0.0175, "Ω·mm²/m")
pv.add("dVdc", "String cable voltage drop", "ΔV_dc", "=2*{Ldc}*{Imp}*{rcu}/{Adc}", "V")
pv.add("dVdcp", "String cable voltage drop, share of string voltage", "ΔV_dc%",
       "={dVdc}/{Vstr}*100", "%")
pv.add("mVdc", "Tabulated voltage drop, 6 mm² d.c.", "mV_dc", 7.3, "mV/A/m")
pv.add("dVt", "String cable voltage drop by the table", "ΔV_t", "={mVdc}*{Imp}*{Ldc}/1000", "V")
pv.add("dVt2", "String cable voltage drop by the table (first draft)", "ΔV_t2",
       "={mVdc}*{Imp}*{Ldc}", "V",
       planted=("unit-scale", "mV written as V: the /1000 missing"))
pv.add("Lac", "Inverter to shop board cable run", "L_ac", 25, "m")
pv.add("mVac", "Tabulated voltage drop, 10 mm² a.c.", "mV_ac", 4.4, "mV/A/m")
pv.add("dVac", "Inverter to shop board voltage drop", "ΔV_ac%",
       "={mVac}*{Iac}*{Lac}/1000/{Vac}*100", "%")
PVS = pv.finish()

LOADS = {
    "A1": "Hollin Brook Farm Shop: daily load schedule (invented ratings and hours; hours are "
          "equivalent full-load hours)",
    "A2": "Sources: energy = power × number × hours (common practice).",
    "A3": CAUTION,
    "A5": "Load", "B5": "Rated power [W]", "C5": "Number [-]", "D5": "Hours [h/d]",
    "E5": "Energy [Wh/d]", "F5": "Connected [W]",
    "A12": "Total", "E12": "=SUM(E6:E11)",
    "F12": "=SUMPRODUCT(B6:B11,C6:C11)",
}
for r, (ld_, w, n, h) in enumerate([("Chilled display cabinets", 600, 2, 12),
                                    ("Upright freezers", 350, 2, 10),
                                    ("LED lighting", 40, 18, 10),
                                    ("Coffee machine", 2200, 1, 2),
                                    ("Till, card terminals and router", 60, 1, 24),
                                    ("Water heater", 3000, 1, 1)], start=6):
    LOADS[f"A{r}"], LOADS[f"B{r}"], LOADS[f"C{r}"], LOADS[f"D{r}"] = ld_, w, n, h
    LOADS[f"E{r}"] = f"=B{r}*C{r}*D{r}"
LOADS["E8"] = "=B8*C8*D8/1000"
LOADS_PLANTED = {"Loads!E8": ("unit-scale", "W × h written as Wh with a /1000: 1000 too small")}

PVB = {
    "trade": "electrical: farm shop solar PV array, battery, inverter and cable voltage drop",
    "sheets": [("PV", PVS), ("Loads", LOADS)],
    "planted": {**pv.planted, **LOADS_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 4: gas pipeline pressure drop (MMscfd, scfd, Sm³/d, in, mm, mi, km, psig, psia, barg,
# bar a, kPa, psi, °F, °R, °C, K, ft³/s, ft², ft/s, m/s, lb/ft³, lb/lbmol, %)
# --------------------------------------------------------------------------------------------
GAS_SRC = (
    "Sources: Weymouth Q_b = 433.5·E·(T_b/P_b)·[(P₁² − P₂²)/(G·T_f·L·Z)]^0.5·D^2.667 and "
    "Panhandle A Q_b = 435.87·E·(T_b/P_b)^1.0788·[(P₁² − P₂²)/(G^0.8539·T_f·L·Z)]^0.5394·"
    "D^2.6182, Q_b in scf/d, T in °R, P in psia, L in miles, D in inches (GPSA Engineering Data "
    "Book, 12th ed., sect. 17, and E. S. Menon, Gas Pipeline Hydraulics (2005), from memory); "
    "average pressure 2/3·(P₁ + P₂ − P₁·P₂/(P₁ + P₂)) (GPSA, from memory); gas density "
    "ρ = P·M/(Z·R·T), R = 10.73 psia·ft³/(lbmol·°R), M = 28.97·G (GPSA); erosional velocity "
    "V_e = C/√ρ, C = 100, ft/s and lb/ft³ (API RP 14E, 5th ed., from memory); MAOP = "
    "2·S·t/D·F·E·T (ASME B31.8 (2018) 841.1.1, from memory); 1 in = 25.4 mm, 1 mi = 1.609 km, "
    "1 ft³ = 0.02832 m³, 1 psi = 6.895 kPa, 1 bar = 14.50 psi, 1 ft = 0.3048 m, °R = °F + "
    "459.67, K = °R/1.8 (NIST SP 811 (2008) App. B.8); scf at 60 °F and 14.73 psia (contract "
    "base, invented), Sm³ at 15 °C and 101.325 kPa (ISO 13443). Pipeline, gas, contract and "
    "readings invented.")
gp = ItemSheet("Line", "Tarn Ridge export lateral (invented): 16 in, 42 mile line from the "
               "compressor station to the city gate, winter design day", GAS_SRC)
gp.heading("Flow")
gp.add("Q", "Design flow", "Q", 85, "MMscfd")
gp.add("Qd", "Design flow, scf/d", "Q_b", "={Q}*1000000", "scfd")
gp.add("Pb", "Contract base pressure", "P_b", 14.73, "psia")
gp.add("tb", "Contract base temperature", "t_b", 60, "°F")
gp.add("TbR", "Contract base temperature, absolute", "T_b", "={tb}+459.67", "°R")
gp.add("TbK", "Contract base temperature, kelvin", "T_b,K", "={TbR}/1.8", "K")
gp.add("ps", "ISO standard pressure", "p_s", 101.325, "kPa")
gp.add("TsK", "ISO standard temperature (15 °C)", "T_s", 288.15, "K")
gp.add("Qsm", "Design flow, Sm³/d (ISO 15 °C, 101.325 kPa)", "Q_SI",
       "={Qd}*0.02832*{TsK}/{TbK}*{Pb}*6.895/{ps}", "Sm³/d")
gp.add("Qsm2", "Design flow, Sm³/d (first draft)", "Q_SI2", "={Q}*1000*0.02832", "Sm³/d",
       planted=("unit-scale", "MMscf taken as thousands: 1000 too small"))
gp.heading("Pipe")
gp.add("OD", "Outside diameter, NPS 16", "D_o", 16, "in")
gp.add("wt", "Wall thickness", "t", 0.375, "in")
gp.add("D", "Inside diameter", "D", "={OD}-2*{wt}", "in")
gp.add("Dmm", "Inside diameter, mm", "D_mm", "={D}*25.4", "mm")
gp.add("Dmm2", "Inside diameter, mm (first draft)", "D_mm2", "={D}/25.4", "mm",
       planted=("unit-scale", "in to mm divided by 25.4: wrong way round"))
gp.add("L", "Length", "L", 42, "mi")
gp.add("Lkm", "Length, km", "L_km", "={L}*1.609", "km")
gp.add("Lkm2", "Length, km (permit form)", "L_km2", "={L}*1609", "km",
       planted=("unit-scale", "m per mile written into km: 1000 too large"))
gp.add("E", "Pipeline efficiency", "E", 0.92, "-")
gp.add("G", "Gas specific gravity (air = 1)", "G", 0.62, "-")
gp.add("Z", "Compressibility factor, average", "Z", 0.90, "-")
gp.heading("Pressures and temperature")
gp.add("P1g", "Inlet pressure at the station discharge", "P_1g", 1050, "psig")
gp.add("patm", "Atmosphere at the station (invented)", "p_atm", 14.7, "psia")
gp.add("P1", "Inlet pressure, absolute", "P_1", "={P1g}+{patm}", "psia")
gp.add("P1b", "Inlet pressure, barg", "P_1,bar", "={P1g}/14.5", "barg")
gp.add("P1b2", "Inlet pressure, barg (first draft)", "P_1,bar2", "={P1g}*14.5", "barg",
       planted=("unit-scale", "psi to bar multiplied by 14.5: wrong way round"))
gp.add("tf", "Flowing temperature (ground, winter)", "t_f", 55, "°F")
gp.add("Tf", "Flowing temperature, absolute", "T_f", "={tf}+459.67", "°R")
gp.add("tfC", "Flowing temperature, °C", "t_f,C", "=({tf}-32)/1.8", "°C")
gp.add("TfK", "Flowing temperature, kelvin", "T_f,K", "={Tf}/1.8", "K")
gp.add("TfK2", "Flowing temperature, kelvin (first draft)", "T_f,K2", "=({tf}-32)/1.8", "K",
       planted=("offset-scale", "a °C reading set equal to kelvins"))
gp.heading("Outlet pressure")
gp.add("P2", "Outlet pressure, Weymouth", "P_2",
       "=SQRT({P1}^2-({Qd}/(433.5*{E}*({TbR}/{Pb})*{D}^2.667))^2*{G}*{Tf}*{L}*{Z})", "psia")
gp.add("P2w", "Outlet pressure, Weymouth (first draft)", "P_2w",
       "=SQRT({P1g}^2-({Qd}/(433.5*{E}*({TbR}/{Pb})*{D}^2.667))^2*{G}*{Tf}*{L}*{Z})", "psia",
       planted=("offset-scale", "a gauge inlet pressure squared in Weymouth"))
gp.add("P2P", "Outlet pressure, Panhandle A (check)", "P_2P",
       "=SQRT({P1}^2-({Qd}/(435.87*{E}*({TbR}/{Pb})^1.0788*{D}^2.6182))^(1/0.5394)"
       "*{G}^0.8539*{Tf}*{L}*{Z})", "psia")
gp.add("P2g", "Outlet pressure at the city gate", "P_2g", "={P2}-{patm}", "psig")
gp.add("P2b", "Outlet pressure at the city gate, barg", "P_2,bar", "={P2g}/14.5", "barg")
gp.add("dp", "Pressure drop along the line", "Δp", "={P1}-{P2}", "psi")
gp.add("dpkm", "Pressure drop per km", "Δp/L", "={dp}*6.895/{Lkm}", "kPa/km")
gp.add("Pav", "Average pressure", "P_av", "=2/3*({P1}+{P2}-{P1}*{P2}/({P1}+{P2}))", "psia")
gp.heading("Velocity and MAOP")
gp.add("Qa", "Actual flow at the outlet", "Q_a", "={Qd}/86400*{Pb}/{P2}*{Tf}/{TbR}*{Z}",
       "ft³/s")
gp.add("Af", "Bore area", "A", "=PI()*({D}/12)^2/4", "ft²")
gp.add("v", "Gas velocity at the outlet", "v", "={Qa}/{Af}", "ft/s")
gp.add("M", "Molar mass of the gas", "M", "=28.97*{G}", "lb/lbmol")
gp.add("rho", "Gas density at the outlet", "ρ", "={P2}*{M}/({Z}*10.73*{Tf})", "lb/ft³")
gp.add("rho2", "Gas density at the outlet (first draft)", "ρ_2", "={P2}*{M}/({Z}*10.73*{tf})",
       "lb/ft³", planted=("offset-scale", "a °F reading in the gas law: °R belongs"))
gp.add("Ve", "Erosional velocity, API RP 14E", "V_e", "=100/SQRT({rho})", "ft/s")
gp.add("S", "Specified minimum yield strength, API 5L X52", "S", 52000, "psi")
gp.add("Fd", "Design factor, class 2 location", "F", 0.6, "-")
gp.add("Ej", "Longitudinal joint factor, seamless", "E_j", 1.0, "-")
gp.add("Tt", "Temperature derating factor, below 250 °F", "T_t", 1.0, "-")
gp.add("MAOP", "Maximum allowable operating pressure", "MAOP",
       "=2*{S}*{wt}/{OD}*{Fd}*{Ej}*{Tt}", "psig")
gp.add("mrg", "Margin of MAOP over the inlet pressure", "ΔP_m", "={MAOP}-{P1g}", "psi")
gp.add("mrg2", "Margin of MAOP over the inlet pressure (first draft)", "ΔP_m2",
       "={MAOP}-{P1}", "psi",
       planted=("offset-scale", "an absolute pressure taken from a gauge MAOP"))
gp.add("hs", "Hoop stress at the inlet pressure, share of SMYS", "σ_h/S",
       "={P1g}*{OD}/(2*{wt})/{S}*100", "%")
GASS = gp.finish()

_P1, _P2, _L, _pa = gp.ref("P1"), gp.ref("P2"), gp.ref("L"), gp.ref("patm")
VALVES = {
    "A1": "Tarn Ridge lateral: pressure at the block valve stations on the design day "
          "(Weymouth profile, invented station miles)",
    "A2": "Sources: P(x) = √(P₁² − (P₁² − P₂²)·x/L) for a line of uniform bore and flow "
          "(GPSA, from memory); 1 mi = 1.609 km, 1 bar = 14.50 psi (NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Station", "B5": "Distance [mi]", "C5": "Distance [km]", "D5": "Pressure [psia]",
    "E5": "Pressure [barg]",
}
for r, (st, x) in enumerate([("BV-1 Holme Beck", 11), ("BV-2 Scar Lane", 23),
                             ("BV-3 Low Tarn", 34)], start=6):
    VALVES[f"A{r}"], VALVES[f"B{r}"] = st, x
    VALVES[f"C{r}"] = f"=B{r}*1.609"
    VALVES[f"D{r}"] = f"=SQRT({_P1}^2-({_P1}^2-{_P2}^2)*B{r}/{_L})"
    VALVES[f"E{r}"] = f"=(D{r}-{_pa})/14.5"
VALVES["E7"] = "=D7/14.5"
VALVES_PLANTED = {"Valves!E7": ("offset-scale", "an absolute pressure converted straight into "
                                                "barg: the atmosphere not taken off")}

GASB = {
    "trade": "gas transmission: lateral pressure drop by Weymouth, velocity and MAOP",
    "sheets": [("Line", GASS), ("Valves", VALVES)],
    "planted": {**gp.planted, **VALVES_PLANTED},
}

BOOKS = {"laundry-kestrel-ashby": LDYB, "aeration-millrace-vale": AERB,
         "pv-farm-shop-hollin-brook": PVB, "gas-lateral-tarn-ridge": GASB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()

# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.
