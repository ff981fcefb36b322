#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review77), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; layout after
corpus/sheets/review64/make_books.py.

Trades: a cold store's ammonia refrigeration plant; a landfill leachate treatment plant (SBR,
aeration blowers, methanol, trade effluent charge); a bridge deck's drainage (kerb channel,
gullies, carrier pipe, attenuation, expansion joint); a pharmaceutical clean-steam generator
(heat balance, plant-steam use, EN 285 quality tests, header velocity). All scenarios, sites,
firms, readings and maker's data are invented (demonstration only); the formulas and published
factors are the trade's own, with their sources named in a text cell at the top of each sheet
("from memory" where recalled and not checked, "common practice" for a fact of the trade with
no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and
its messages that mislead, are recorded in review_notes.py after running the round's build of the time.

Run: python3 make_books.py [--expect]  ->  *.xlsx (and *.expect) in this folder only
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
# Book 1: cold store, pumped-recirculation ammonia plant (m, m², m³, W/(m²·K), °C, °F, K, t/d,
# kJ/(kg·K), W/m², kW, %, TR, Btu/h, kJ/kg, kg/s, kg/h, kg/m³, m³/h, gpm, bar, bar a, barg,
# psig, hp, L/h, m³/d)
# --------------------------------------------------------------------------------------------
CST_SRC = (
    "Sources: refrigeration loads by transmission Q = U·A·ΔT, product Q = m·c_p·ΔT, lighting, "
    "fans and infiltration (ASHRAE Handbook, Refrigeration (2018), ch. 24, from memory); c_p of "
    "frozen meat below freezing 1.9 kJ/(kg·K) (ASHRAE Refrigeration (2018), ch. 19, from "
    "memory); ammonia (R717) saturation: h_g = 1421 kJ/kg and p = 1.08 bar a at −32 °C, h_f = "
    "366 kJ/kg and p = 13.5 bar a at 35 °C, liquid density 683 kg/m³ at −32 °C (IIR reference, "
    "ASHRAE Handbook, Fundamentals (2017), ch. 30, from memory; check against the tables); "
    "refrigerating effect h_g,evap − h_f,cond and ṁ = Q/Δh (common practice); isentropic "
    "discharge T₂ = T₁·(p₂/p₁)^((k−1)/k), k = 1.31 for ammonia vapour (from memory); pump head "
    "H = Δp/(ρ·g), g_n = 9.81 m/s² (SI Brochure 9th ed. gives 9.80665); 1 TR = 12 000 Btu/h = "
    "3.517 kW, 1 kW = 3412 Btu/h, 1 hp = 0.7457 kW, 1 bar = 14.50 psi, 1 US gal = 3.785 L "
    "(NIST SP 811 (2008) App. B.8); °F = 1.8·°C + 32, K = °C + 273.15 (SI Brochure 9th ed.); "
    "latent heat of water at 30 °C 2430 kJ/kg (IAPWS-IF97 tables, from memory); evaporative "
    "condenser bleed = E/(N − 1) at N cycles of concentration (common practice); Btu/h = "
    "500·gpm·ΔT(°F) (ASHRAE Handbook, HVAC Applications, from memory). Cold store, plant, "
    "maker's data and readings invented.")
cs = ItemSheet("Plant", "Frostholm Cold Stores, Wickham Staithe (invented): −25 °C frozen store, "
               "pumped-recirculation ammonia plant, summer design day", CST_SRC)
cs.heading("Store and transmission")
cs.add("L", "Store length", "L", 80, "m")
cs.add("W", "Store width", "W", 50, "m")
cs.add("H", "Store height to the ceiling", "H", 12, "m")
cs.add("Afl", "Floor area", "A_fl", "={L}*{W}", "m²")
cs.add("Aenv", "Envelope area (walls, roof and floor)", "A_env", "=2*{L}*{W}+2*({L}+{W})*{H}",
       "m²")
cs.add("U", "Insulated panel U-value (maker, invented)", "U", 0.16, "W/(m²·K)")
cs.add("tamb", "Design ambient temperature (invented)", "t_amb", 25, "°C")
cs.add("troom", "Store air temperature", "t_room", -25, "°C")
cs.add("dT", "Temperature difference across the envelope", "ΔT", "={tamb}-{troom}", "K")
cs.add("Qtr", "Transmission load", "Q_tr", "={U}*{Aenv}*{dT}/1000", "kW")
cs.add("Qtr2", "Transmission load (first draft)", "Q_tr2", "={U}*{Aenv}*{dT}", "kW",
       planted=("unit-scale", "W·m⁻²·K⁻¹ × m² × K gives W, written as kW: /1000 missing"))
cs.add("troomF", "Store air temperature, °F (US racking maker)", "t_room,F",
       "={troom}*1.8+32", "°F")
cs.add("TroomK", "Store air temperature, absolute", "T_room", "={troom}+273.15", "K")
cs.add("TroomK2", "Store air temperature, absolute (first draft)", "T_room2", "={troom}", "K",
       planted=("offset-scale", "a °C reading set equal to kelvins"))
cs.heading("Product")
cs.add("md", "Frozen product received", "m_d", 120, "t/d")
cs.add("tin", "Product temperature on arrival", "t_in", -15, "°C")
cs.add("cpf", "Specific heat of frozen meat", "c_p,f", 1.9, "kJ/(kg·K)")
cs.add("dTp", "Product cooled through", "ΔT_p", "={tin}-{troom}", "K")
cs.add("Qpr", "Product load", "Q_pr", "={md}*1000*{cpf}*{dTp}/86400", "kW")
cs.add("Qpr2", "Product load (first draft)", "Q_pr2", "={md}*{cpf}*{dTp}/86400", "kW",
       planted=("unit-scale", "tonnes used as kilograms: 1000 too small"))
cs.heading("Internal loads and design load")
cs.add("qlt", "Lighting (LED high-bay)", "q_lt", 6, "W/m²")
cs.add("Qlt", "Lighting load", "Q_lt", "={qlt}*{Afl}/1000", "kW")
cs.add("Qfan", "Evaporator fan motors (maker, invented)", "Q_fan", 45, "kW")
cs.add("Qinf", "Door infiltration, forklifts and people (estimate, invented)", "Q_inf", 38, "kW")
cs.add("Qsum", "Sum of loads", "Q_sum", "={Qtr}+{Qpr}+{Qlt}+{Qfan}+{Qinf}", "kW")
cs.add("sf", "Safety margin", "s_f", 10, "%")
cs.add("Qdes", "Design refrigeration load", "Q_des", "={Qsum}*(1+{sf}/100)", "kW")
cs.add("Qdes2", "Design refrigeration load (first draft)", "Q_des2", "={Qsum}*(1+{sf})", "kW",
       planted=("unit-scale", "a % used as a fraction: eleven times the load"))
cs.add("QTR", "Design load, tons of refrigeration (US compressor maker)", "Q_TR",
       "={Qdes}/3.517", "TR")
cs.add("QTR2", "Design load, TR (first draft)", "Q_TR2", "={Qdes}*3.517", "TR",
       planted=("unit-scale", "kW to TR multiplied by 3.517: wrong way round"))
cs.add("QBtu", "Design load, Btu/h", "Q_US", "={Qdes}*3412", "Btu/h")
cs.heading("Ammonia circuit")
cs.add("tev", "Evaporating temperature", "t_ev", -32, "°C")
cs.add("tcd", "Condensing temperature", "t_cd", 35, "°C")
cs.add("hg", "Saturated vapour enthalpy at −32 °C (tables)", "h_g", 1421, "kJ/kg")
cs.add("hf", "Saturated liquid enthalpy at 35 °C (tables)", "h_f", 366, "kJ/kg")
cs.add("qe", "Refrigerating effect", "q_e", "={hg}-{hf}", "kJ/kg")
cs.add("mr", "Ammonia evaporated (compressor mass flow)", "ṁ_r", "={Qdes}/{qe}", "kg/s")
cs.add("mrh", "Ammonia evaporated, hourly", "ṁ_r,h", "={mr}*3600", "kg/h")
cs.add("mrh2", "Ammonia evaporated, hourly (first draft)", "ṁ_r,h2", "={Qdes}/{qe}", "kg/h",
       planted=("unit-scale", "kW over kJ/kg gives kg/s, written as kg/h: ×3600 missing"))
cs.add("n", "Liquid recirculation ratio", "n", 4, "-")
cs.add("rhol", "Liquid ammonia density at −32 °C (tables)", "ρ_l", 683, "kg/m³")
cs.add("Vl", "Liquid pump flow", "V̇_l", "={mr}*{n}/{rhol}*3600", "m³/h")
cs.add("Vlgpm", "Liquid pump flow, US gpm (pump maker)", "V̇_l,US", "={Vl}*1000/60/3.785", "gpm")
cs.add("dpp", "Liquid pump differential pressure (invented)", "Δp_p", 2.2, "bar")
cs.add("Hp", "Liquid pump head", "H_p", "={dpp}*100000/({rhol}*9.81)", "m")
cs.add("Hp2", "Liquid pump head (first draft)", "H_p2", "={dpp}*100000/{rhol}", "m",
       planted=("result-unit", "Δp/ρ with g left out: J/kg written as metres"))
cs.add("etap", "Liquid pump efficiency (maker, invented)", "η_p", 45, "%")
cs.add("Ppump", "Liquid pump shaft power", "P_p", "={Vl}/3600*{dpp}*100000/({etap}/100)/1000",
       "kW")
cs.heading("Evaporators")
cs.add("TDev", "Air-to-refrigerant temperature difference", "TD", "={troom}-{tev}", "K")
cs.add("Uev", "Air cooler U-value on the outside area (maker, invented)", "U_ev", 28,
       "W/(m²·K)")
cs.add("Aev", "Air cooler surface needed", "A_ev", "={Qdes}*1000/({Uev}*{TDev})", "m²")
cs.heading("Compressors (single-stage screw, oil-injected)")
cs.add("pb", "Site barometer (invented)", "p_b", 1.008, "bar a")
cs.add("ps", "Suction pressure, saturation at −32 °C (tables)", "p_s", 1.08, "bar a")
cs.add("psg", "Suction pressure on the gauge", "p_s,g", "={ps}-{pb}", "barg")
cs.add("pdg", "Discharge pressure on the gauge (reading, invented)", "p_d,g", 12.5, "barg")
cs.add("pd", "Discharge pressure, absolute", "p_d", "={pdg}+{pb}", "bar a")
cs.add("pdpsig", "Discharge pressure, psig (US compressor maker)", "p_d,US", "={pdg}*14.5",
       "psig")
cs.add("PR", "Pressure ratio", "r_p", "={pd}/{ps}", "-")
cs.add("PR2", "Pressure ratio (first draft)", "r_p2", "={pdg}/{ps}", "-",
       planted=("offset-scale", "a gauge discharge over an absolute suction pressure"))
cs.add("sh", "Suction superheat", "ΔT_sh", 8, "K")
cs.add("Tsuc", "Suction temperature, absolute", "T_1", "={tev}+{sh}+273.15", "K")
cs.add("T2", "Isentropic discharge temperature (before oil injection)", "T_2",
       "={Tsuc}*{PR}^((1.31-1)/1.31)", "K")
cs.add("t2", "Isentropic discharge temperature, °C", "t_2", "={T2}-273.15", "°C")
cs.add("t2b", "Isentropic discharge temperature, °C (first draft)", "t_2b",
       "=({tev}+{sh})*{PR}^((1.31-1)/1.31)", "°C",
       planted=("offset-scale", "a °C suction temperature in an absolute-temperature power law"))
cs.add("COP", "Coefficient of performance at these conditions (maker, invented)", "COP", 1.9,
       "-")
cs.add("Pc", "Compressor shaft power", "P_c", "={Qdes}/{COP}", "kW")
cs.add("Pchp", "Compressor shaft power, hp", "P_c,US", "={Pc}/0.7457", "hp")
cs.add("etam", "Motor efficiency", "η_m", 95, "%")
cs.add("Pel", "Compressor motor input", "P_el", "={Pc}/({etam}/100)", "kW")
cs.add("Qc", "Heat rejected at the condenser and oil cooler", "Q_c", "={Qdes}+{Pc}", "kW")
cs.heading("Evaporative condenser water")
cs.add("hfgw", "Latent heat of water at 30 °C (tables)", "h_fg,w", 2430, "kJ/kg")
cs.add("mev", "Water evaporated", "ṁ_ev", "={Qc}/{hfgw}*3600", "kg/h")
cs.add("N", "Cycles of concentration (water treatment contractor)", "N", 4, "-")
cs.add("mbl", "Bleed", "ṁ_bl", "={mev}/({N}-1)", "kg/h")
cs.add("rhow", "Density of make-up water", "ρ_w", 0.999, "kg/L")
cs.add("Vmu", "Make-up water", "V̇_mu", "=({mev}+{mbl})/{rhow}", "L/h")
cs.add("Vmugpm", "Make-up water, US gpm", "V̇_mu,US", "={Vmu}/60/3.785", "gpm")
cs.add("Vmud", "Make-up water per day", "V_mu,d", "={Vmu}*24/1000", "m³/d")
cs.heading("Oil cooler (water-cooled, US-built skid)")
cs.add("goc", "Oil cooler water flow", "V̇_oc", 40, "gpm")
cs.add("toi", "Oil cooler water in", "t_oc,in", 85, "°F")
cs.add("too", "Oil cooler water out", "t_oc,out", 97, "°F")
cs.add("Qoc", "Oil cooler duty, Btu/h (500·gpm·ΔT)", "Q_oc,US", "=500*{goc}*({too}-{toi})",
       "Btu/h")
cs.add("Qockw", "Oil cooler duty", "Q_oc", "={Qoc}/3412", "kW")
CSTS = cs.finish()

CSTB = {
    "trade": "industrial refrigeration: cold store loads, ammonia circuit, compressors, condenser",
    "sheets": [("Plant", CSTS)],
    "planted": dict(cs.planted),
}

# --------------------------------------------------------------------------------------------
# Book 2: landfill leachate treatment (m³/d, L/s, m³/h, gpm, mg/L, kg/d, kg/kg, %, kg/L, L/d,
# Nm³/h, scfm, kg/Nm³, d, m³, m, mm, m², kPa, kPag, °C, K, kg/s, kJ/(kg·K), kW, W, hp, £/m³,
# £/d, £/yr, kWh/d, £/kWh)
# --------------------------------------------------------------------------------------------
LCH_SRC = (
    "Sources: Metcalf & Eddy, Wastewater Engineering, 5th ed. (2014), from memory: oxygen 1.1 "
    "kg per kg BOD removed (invented within the book's range), 4.57 kg O2 per kg N nitrified, "
    "2.86 kg O2 credited per kg nitrate-N denitrified, alkalinity 7.14 kg CaCO3 used per kg N "
    "nitrified and 3.57 recovered per kg N denitrified, methanol 2.47 kg per kg nitrate-N; "
    "mg/L = g/m³ (SI Brochure 9th ed.); m³/d to L/s by 86.4 = 86 400 s/d ÷ 1000 L/m³ (common "
    "practice); methanol density 0.791 kg/L at 20 °C (CRC Handbook of Chemistry and Physics, "
    "from memory); air 23.18 % oxygen by mass and 1.293 kg/Nm³ at 0 °C, 101.325 kPa (Perry's "
    "Chemical Engineers' Handbook, 8th ed., from memory); 1 Nm³/h = 0.6221 scfm at 60 °F, "
    "14.696 psia (35.315/60 × 288.71/273.15, common practice); static head ρ·g·h, g_n = 9.81 "
    "m/s² (SI Brochure 9th ed.); adiabatic blower power P = ṁ·c_p·T₁·[(p₂/p₁)^0.2857 − 1]/η, "
    "c_p = 1.005 kJ/(kg·K), 0.2857 = (k − 1)/k for k = 1.4 (common practice); hydraulic power "
    "ρ·g·Q·H (common practice); 1 US gal = 3.785 L, 1 ft = 0.3048 m, 1 hp = 0.7457 kW "
    "(NIST SP 811 (2008) App. B.8); US checks lb/d = 8.34·mgd·mg/L, 0.433 psi per ft of water, hp = "
    "gpm·ft·SG/(3960·η) (Hydraulic Institute and common practice, from memory); trade "
    "effluent charge by the Mogden formula C = R + V + B·Ot/Os + S·St/Ss (UK water companies' "
    "charges schemes, from memory; rates and Os, Ss invented). Landfill, plant, "
    "analyses, tariffs and readings invented.")
lc = ItemSheet("SBR", "Cattersby Moor landfill (invented; operator Brantwell Waste Services, "
               "invented): leachate sequencing batch reactor, discharge to sewer", LCH_SRC)
lc.heading("Flow")
lc.add("Q", "Leachate to treatment, design", "Q", 240, "m³/d")
lc.add("QLs", "Leachate flow, L/s", "Q_Ls", "={Q}/86.4", "L/s")
lc.add("QLs2", "Leachate flow, L/s (first draft)", "Q_Ls2", "={Q}/86400", "L/s",
       planted=("unit-scale", "m³/d over 86 400 gives m³/s, written as L/s: 1000 too small"))
lc.add("Qh", "Leachate flow, hourly", "Q_h", "={Q}/24", "m³/h")
lc.add("Qgpm", "Leachate flow, US gpm (US pump maker)", "Q_US", "={Q}*1000/3.785/1440", "gpm")
lc.add("Qmgd", "Leachate flow, million US gallons a day (US reviewer's check)", "Q_mgd",
       "={Q}/3785", "mgd")
lc.heading("Loads (leachate analyses, invented)")
lc.add("COD", "COD", "COD", 5200, "mg/L")
lc.add("BOD", "BOD", "BOD", 1800, "mg/L")
lc.add("NH4", "Ammoniacal nitrogen", "NH4-N", 1400, "mg/L")
lc.add("Ne", "Ammoniacal nitrogen in the treated leachate (consent, invented)", "N_e", 20,
       "mg/L")
lc.add("Lcod", "COD load", "L_COD", "={Q}*{COD}/1000", "kg/d")
lc.add("Lcod2", "COD load (first draft)", "L_COD2", "={Q}*{COD}", "kg/d",
       planted=("unit-scale", "m³/d × mg/L gives g/d, written as kg/d: /1000 missing"))
lc.add("Lcodlb", "COD load, lb/d (8.34·mgd·mg/L)", "L_COD,US", "=8.34*{Qmgd}*{COD}", "lb/d")
lc.add("Lbod", "BOD load", "L_BOD", "={Q}*{BOD}/1000", "kg/d")
lc.add("Nn", "Nitrogen nitrified", "N_n", "={Q}*({NH4}-{Ne})/1000", "kg/d")
lc.add("rem", "Ammoniacal nitrogen removal", "r_N", "=(1-{Ne}/{NH4})*100", "%")
lc.add("fdn", "Share of the nitrate denitrified", "f_dn", 80, "%")
lc.add("Ndn", "Nitrogen denitrified", "N_dn", "={Nn}*{fdn}/100", "kg/d")
lc.heading("Oxygen, alkalinity and carbon")
lc.add("fc", "Oxygen per BOD removed", "f_c", 1.1, "kg/kg")
lc.add("O2", "Oxygen demand", "R_O2", "={fc}*{Lbod}+4.57*{Nn}-2.86*{Ndn}", "kg/d")
lc.add("alk", "Alkalinity consumed, as CaCO3", "Alk", "=7.14*{Nn}-3.57*{Ndn}", "kg/d")
lc.add("fme", "Share of denitrification carbon from methanol (old leachate, invented)",
       "f_me", 60, "%")
lc.add("meth", "Methanol dose", "ṁ_me", "=2.47*{Ndn}*{fme}/100", "kg/d")
lc.add("rhome", "Methanol density at 20 °C", "ρ_me", 0.791, "kg/L")
lc.add("methL", "Methanol dose by volume", "V_me", "={meth}/{rhome}", "L/d")
lc.add("methL2", "Methanol dose by volume (first draft)", "V_me2", "={meth}*{rhome}", "L/d",
       planted=("unit-scale", "kg to L multiplied by the density: wrong way round"))
lc.heading("Aeration")
lc.add("OTE", "Field oxygen transfer efficiency, jet aerators in leachate (invented)", "OTE",
       18, "%")
lc.add("Air", "Air to the jets", "q_N", "={O2}/24/(0.2318*1.293*{OTE}/100)", "Nm³/h")
lc.add("Air2", "Air to the jets (first draft)", "q_N2", "={O2}/24/(0.2318*1.293*{OTE})",
       "Nm³/h", planted=("unit-scale", "a % used as a fraction: 100 too small"))
lc.add("Airscfm", "Air to the jets, scfm (US blower maker, 60 °F)", "q_US", "={Air}*0.6221",
       "scfm")
lc.add("HRT", "Hydraulic retention time", "HRT", 8, "d")
lc.add("V", "Reactor volume", "V", "={Q}*{HRT}", "m³")
lc.add("dep", "Reactor top water level above the floor", "h", 6.5, "m")
lc.add("depmm", "Reactor top water level (tank maker's drawing)", "h_mm", 6500, "mm")
lc.add("Atank", "Reactor plan area", "A", "={V}/{dep}", "m²")
lc.add("Atank2", "Reactor plan area (from the drawing)", "A_2", "={V}/{depmm}", "m²",
       planted=("unit-scale", "a depth in mm used as metres: 1000 too small"))
lc.add("Dtank", "Reactor diameter, circular tank", "D", "=SQRT(4*{Atank}/PI())", "m")
lc.heading("Blowers")
lc.add("sub", "Jet submergence", "h_s", 6.0, "m")
lc.add("pb", "Site barometer (invented)", "p_b", 99.2, "kPa")
lc.add("pst", "Static head on the jets", "Δp_st", "=1000*9.81*{sub}/1000", "kPa")
lc.add("dpl", "Jet, pipework and silencer losses (maker, invented)", "Δp_l", 12, "kPa")
lc.add("p2g", "Blower discharge pressure on the gauge", "p_2,g", "={pst}+{dpl}", "kPag")
lc.add("p2", "Blower discharge pressure, absolute", "p_2", "={p2g}+{pb}", "kPa")
lc.add("PR", "Blower pressure ratio", "r_p", "={p2}/{pb}", "-")
lc.add("PR2", "Blower pressure ratio (first draft)", "r_p2", "={p2g}/{pb}", "-",
       planted=("offset-scale", "a gauge discharge over an absolute inlet pressure"))
lc.add("T1", "Blower inlet air temperature, summer", "t_1", 20, "°C")
lc.add("T1K", "Blower inlet air temperature, absolute", "T_1", "={T1}+273.15", "K")
lc.add("mair", "Air mass flow", "ṁ", "={Air}*1.293/3600", "kg/s")
lc.add("etab", "Blower efficiency, adiabatic (maker, invented)", "η_b", 70, "%")
lc.add("Pbl", "Blower shaft power", "P_bl",
       "={mair}*1.005*{T1K}*({PR}^0.2857-1)/({etab}/100)", "kW")
lc.add("Pbl2", "Blower shaft power (first draft)", "P_bl2",
       "={mair}*1.005*{T1}*({PR}^0.2857-1)/({etab}/100)", "kW",
       planted=("offset-scale", "a °C inlet temperature where the absolute one belongs"))
lc.add("Pblhp", "Blower shaft power, hp", "P_bl,US", "={Pbl}/0.7457", "hp")
lc.add("Pmix", "Reactor mixer (maker, invented)", "P_mix", 5500, "W")
lc.add("Ptot", "Aeration and mixing power", "P_tot", "={Pbl}+{Pmix}/1000", "kW")
lc.add("Ptot2", "Aeration and mixing power (first draft)", "P_tot2", "={Pbl}+{Pmix}", "kW",
       planted=("unit-scale", "W added to kW"))
lc.heading("Transfer pump to sewer")
lc.add("Hpump", "Pump head, duty point", "H", 18, "m")
lc.add("etap", "Pump efficiency", "η_p", 60, "%")
lc.add("Php", "Pump hydraulic power", "P_h", "=1000*9.81*{Qh}/3600*{Hpump}/1000", "kW")
lc.add("Php2", "Pump hydraulic power (first draft)", "P_h2", "=1000*9.81*{Qh}*{Hpump}/1000",
       "kW", planted=("unit-scale", "m³/h used as m³/s: /3600 missing"))
lc.add("Psh", "Pump shaft power", "P_sh", "={Php}/({etap}/100)", "kW")
lc.add("Hft", "Pump head, ft (US pump maker)", "H_US", "={Hpump}/0.3048", "ft")
lc.add("Hpsi", "Pump head as pressure, water (0.433 psi/ft)", "Δp_US", "=0.433*{Hft}", "psi")
lc.add("Pshhp", "Pump shaft power, hp (gpm·ft/(3960·η))", "P_sh,US",
       "={Qgpm}*{Hft}/(3960*{etap}/100)", "hp")
lc.add("E", "Energy per day, blowers, mixer and pump", "E_d", "=({Ptot}+{Psh})*24", "kWh/d")
lc.add("tar", "Electricity tariff (invented)", "c_e", 0.21, "£/kWh")
lc.add("cost", "Electricity cost per day", "C_e", "={E}*{tar}", "£/d")
lc.heading("Trade effluent charge (Mogden formula; rates invented)")
lc.add("R", "Reception and conveyance", "R", 0.45, "£/m³")
lc.add("Vc", "Volumetric and primary treatment", "V", 0.32, "£/m³")
lc.add("Bc", "Biological treatment", "B", 0.38, "£/m³")
lc.add("Sc", "Sludge treatment and disposal", "S", 0.29, "£/m³")
lc.add("Ot", "COD of the treated leachate, settled", "Ot", 900, "mg/L")
lc.add("Os", "Standard strength COD of sewage (charges scheme, invented)", "Os", 452, "mg/L")
lc.add("St", "Suspended solids of the treated leachate", "St", 60, "mg/L")
lc.add("Ss", "Standard suspended solids of sewage (charges scheme, invented)", "Ss", 336,
       "mg/L")
lc.add("Cm", "Charge per cubic metre", "C", "={R}+{Vc}+{Bc}*{Ot}/{Os}+{Sc}*{St}/{Ss}", "£/m³")
lc.add("chg", "Trade effluent charge per day", "C_d", "={Cm}*{Q}", "£/d")
lc.add("ann", "Trade effluent charge per year", "C_a", "={chg}*365", "£/yr")
LCHS = lc.finish()

LCHB = {
    "trade": "waste: landfill leachate SBR, aeration blowers, methanol, trade effluent charge",
    "sheets": [("SBR", LCHS)],
    "planted": dict(lc.planted),
}

# --------------------------------------------------------------------------------------------
# Book 3: bridge deck drainage (m, m², ha, acre, mm/h, in/h, L/s, m³/s, cfs, gpm, %, L/(s·m),
# mm, L, m/s, min, m³, 1/K, °C, °F, K, kN/m)
# --------------------------------------------------------------------------------------------
BRG_SRC = (
    "Sources: rational method Q = C·i·A, with i in mm/h and A in m² giving L/h, so L/s = "
    "C·i·A/3600, and Q = 2.78·C·i·A with A in ha (common practice); US form Q[cfs] = "
    "C·i[in/h]·A[acre], the 1.008 taken as 1 (common practice; FHWA HEC-22, 3rd ed. (2009), "
    "from memory); kerb-and-gutter flow Q = (K_u/n)·S_x^1.67·S_L^0.5·T^2.67, K_u = 0.376 in SI "
    "with Q in m³/s and T in m (FHWA HEC-22, 3rd ed. (2009), eq. 4-2, from memory); Manning's "
    "V = (1/n)·R^(2/3)·S^(1/2) in SI, R = D/4 running full (common practice), n = 0.016 for "
    "asphalt and 0.012 for the carrier pipe (from memory); thermal movement ΔL = α·L·ΔT, "
    "α = 12 × 10⁻⁶ /K for a steel-concrete composite deck (EN 1991-1-5, from memory); weight "
    "of water ρ·g·A, g_n = 9.81 m/s² (SI Brochure 9th ed.); 1 in = 25.4 mm, 1 acre = 4047 m², "
    "1 L/s = 15.85 US gpm, 1 cfs = 28.32 L/s (NIST SP 811 (2008) App. B.8); °F = 1.8·°C + 32 "
    "(SI Brochure 9th ed.). Bridge, storm, consent and maker's data invented.")
bd = ItemSheet("Deck", "Lenfold Viaduct (invented; Harrowgate & Pell Consulting, invented): "
               "one-way crossfall deck over the river Tamber (invented), kerb channel, gullies "
               "and carrier pipe", BRG_SRC)
bd.heading("Catchment and design storm")
bd.add("Ld", "Deck length between abutments", "L_d", 240, "m")
bd.add("W", "Width draining to the low kerb", "W", 12.4, "m")
bd.add("A", "Deck area draining", "A", "={Ld}*{W}", "m²")
bd.add("Aha", "Deck area, hectares", "A_ha", "={A}/10000", "ha")
bd.add("Aac", "Deck area, acres (US reviewer's check)", "A_ac", "={A}/4047", "acre")
bd.add("C", "Runoff coefficient, surfacing", "C", 0.95, "-")
bd.add("i", "Design rainfall intensity, 5 min storm (invented)", "i", 75, "mm/h")
bd.add("iin", "Design rainfall intensity, in/h", "i_US", "={i}/25.4", "in/h")
bd.add("iin2", "Design rainfall intensity, in/h (first draft)", "i_US2", "={i}*25.4", "in/h",
       planted=("unit-scale", "mm to in multiplied by 25.4: wrong way round"))
bd.add("Q", "Design runoff from the deck", "Q", "={C}*{i}*{A}/3600", "L/s")
bd.add("Q2", "Design runoff from the deck (first draft)", "Q_2", "={C}*{i}*{A}", "L/s",
       planted=("unit-scale", "mm/h × m² gives L/h, written as L/s: /3600 missing"))
bd.add("Qb", "Design runoff, 2.78·C·i·A check", "Q_b", "=2.78*{C}*{i}*{Aha}", "L/s")
bd.add("Qm3", "Design runoff, m³/s", "Q_m3", "={Q}/1000", "m³/s")
bd.add("Qcfs", "Design runoff, cfs (US form of the rational method)", "Q_US",
       "={C}*{iin}*{Aac}", "cfs")
bd.add("Qgpm", "Design runoff, US gpm (US gully maker)", "Q_gpm", "={Q}*15.85", "gpm")
bd.add("Qgpm2", "Design runoff, US gpm (first draft)", "Q_gpm2", "={Q}/15.85", "gpm",
       planted=("unit-scale", "L/s to gpm divided by 15.85: wrong way round"))
bd.add("dur", "Storm duration for the attenuation check", "t_d", 30, "min")
bd.add("dr", "Rainfall depth in the storm", "d_r", "={i}*{dur}/60", "mm")
bd.heading("Kerb channel and gully spacing")
bd.add("Sx", "Crossfall", "S_x", 2.5, "%")
bd.add("SL", "Longitudinal gradient", "S_L", 1.2, "%")
bd.add("n", "Manning's n, asphalt channel", "n", 0.016, "-")
bd.add("q1", "Runoff per metre of deck", "q_1", "={C}*{i}*{W}/3600", "L/(s·m)")
bd.add("Tmax", "Allowable spread (hard strip width, invented)", "T_max", 1.5, "m")
bd.add("Qg", "Channel flow at the allowable spread (HEC-22)", "Q_g",
       "=0.376/{n}*({Sx}/100)^1.67*({SL}/100)^0.5*{Tmax}^2.67*1000", "L/s")
bd.add("Qg2", "Channel flow at the allowable spread (first draft)", "Q_g2",
       "=0.376/{n}*{Sx}^1.67*{SL}^0.5*{Tmax}^2.67*1000", "L/s",
       planted=("unit-scale", "gradients in % used as fractions in HEC-22"))
bd.add("Tfull", "Spread if the whole deck ran to the end in the channel", "T_full",
       "=({Qm3}*{n}/(0.376*({Sx}/100)^1.67*({SL}/100)^0.5))^0.375", "m")
bd.add("dk", "Flow depth at the kerb at the allowable spread", "d_k", "={Tmax}*{Sx}/100*1000",
       "mm")
bd.add("Ef", "Gully grating efficiency at that flow (maker, invented)", "E", 70, "%")
bd.add("L1", "Distance to the first gully", "L_1", "={Qg}/{q1}", "m")
bd.add("Ls", "Spacing of the following gullies", "L_s", "={Ef}/100*{Qg}/{q1}", "m")
bd.add("Ng", "Number of gullies", "N_g", "=ROUNDUP(({Ld}-{L1})/{Ls},0)+1", "-")
bd.heading("Gully pots and carrier pipe")
bd.add("Dgp", "Gully pot diameter", "D_gp", 450, "mm")
bd.add("hws", "Gully pot water depth below the outlet", "h_ws", 0.9, "m")
bd.add("Vgp", "Gully pot water volume", "V_gp", "=PI()*({Dgp}/1000)^2/4*{hws}*1000", "L")
bd.add("Dp", "Carrier pipe bore", "D_p", 300, "mm")
bd.add("Dpin", "Carrier pipe bore, in", "D_p,US", "={Dp}/25.4", "in")
bd.add("np", "Manning's n, carrier pipe", "n_p", 0.012, "-")
bd.add("Sp", "Carrier pipe gradient", "S_p", 0.8, "%")
bd.add("Dpm", "Carrier pipe bore, m", "D_p,m", "={Dp}/1000", "m")
bd.add("Ap", "Carrier pipe bore area", "A_p", "=PI()*{Dpm}^2/4", "m²")
bd.add("Ap2", "Carrier pipe bore area (first draft)", "A_p2", "=PI()*{Dp}^2/4", "m²",
       planted=("unit-scale", "a bore in mm used as metres: 10⁶ too large"))
bd.add("Rp", "Hydraulic radius, running full", "R_p", "={Dpm}/4", "m")
bd.add("Vfull", "Velocity running full (Manning)", "V_f",
       "=1/{np}*{Rp}^(2/3)*({Sp}/100)^0.5", "m/s")
bd.add("Qfull", "Capacity running full", "Q_f", "={Vfull}*{Ap}*1000", "L/s")
bd.add("Qfull2", "Capacity running full (first draft)", "Q_f2", "={Vfull}*{Ap}", "L/s",
       planted=("unit-scale", "m³/s written as L/s: ×1000 missing"))
bd.add("Qfcfs", "Capacity running full, cfs", "Q_f,US", "={Qfull}/28.32", "cfs")
bd.add("use", "Design runoff as a share of the capacity", "Q/Q_f", "={Q}/{Qfull}*100", "%")
bd.add("w", "Weight of water in the pipe running full (hanger design)", "w",
       "=1000*9.81*{Ap}/1000", "kN/m")
bd.add("w2", "Weight of water in the pipe running full (first draft)", "w_2",
       "=1000*{Ap}/1000", "kN/m", planted=("result-unit", "ρ·A with g left out: a mass per "
                                                        "length written as a force per length"))
bd.heading("Outfall attenuation")
bd.add("qd", "Discharge consent to the river (invented)", "q_d", 5, "L/s")
bd.add("Va", "Attenuation storage for the design storm", "V_a", "=({Q}-{qd})*{dur}*60/1000",
       "m³")
bd.add("Va2", "Attenuation storage (first draft)", "V_a2", "=({Q}-{qd})*{dur}/1000", "m³",
       planted=("unit-scale", "L/s × min used as L: ×60 missing"))
bd.add("Vr", "Rain falling on the deck in the storm", "V_r", "={dr}/1000*{A}", "m³")
bd.heading("Drainage trough at the expansion joint")
bd.add("alpha", "Coefficient of thermal expansion, composite deck", "α", 0.000012, "1/K")
bd.add("Lexp", "Length of deck moving at the joint", "L_exp", 120, "m")
bd.add("tmax", "Maximum uniform bridge temperature (invented)", "T_e,max", 42, "°C")
bd.add("tmin", "Minimum uniform bridge temperature (invented)", "T_e,min", -15, "°C")
bd.add("t0", "Temperature at installation of the joint", "T_0", 10, "°C")
bd.add("dTe", "Range of uniform temperature", "ΔT_N", "={tmax}-{tmin}", "K")
bd.add("dL", "Movement range at the joint", "ΔL", "={alpha}*{Lexp}*{dTe}*1000", "mm")
bd.add("dL2", "Movement range at the joint (first draft)", "ΔL_2", "={alpha}*{Lexp}*{dTe}",
       "mm", planted=("unit-scale", "a movement in metres written as mm: ×1000 missing"))
bd.add("dLe", "Expansion from the installation temperature", "ΔL_e",
       "={alpha}*{Lexp}*({tmax}-{t0})*1000", "mm")
bd.add("dLc", "Contraction from the installation temperature", "ΔL_c",
       "={alpha}*{Lexp}*({t0}-{tmin})*1000", "mm")
bd.add("tmaxF", "Maximum bridge temperature, °F (US joint maker)", "T_e,max,F",
       "={tmax}*1.8+32", "°F")
BRGS = bd.finish()

BRGB = {
    "trade": "highway drainage: bridge deck runoff, kerb channel, gullies, carrier pipe, joint",
    "sheets": [("Deck", BRGS)],
    "planted": dict(bd.planted),
}

# --------------------------------------------------------------------------------------------
# Book 4: pharmaceutical clean-steam generator (kg/h, lb/h, %, barg, bar a, psig, °C, °F, K,
# kJ/kg, m³/kg, kW, W, Btu/h, BoHP, W/(m²·K), m², mm, m³/s, m/s, mL, kJ/(kg·K), kg/m³, m³/h,
# bar, h/d, $/t, $/d)
# --------------------------------------------------------------------------------------------
CLS_SRC = (
    "Sources: saturated steam on the Steam sheet, water at 25 °C h = 104.9 kJ/kg, saturated "
    "vapour at 1.013 bar a h_g = 2675.5 kJ/kg, c_p of low-pressure superheated steam 2.03 "
    "kJ/(kg·K) (IAPWS-IF97 steam tables, from memory; check against the tables before use); "
    "specific gas constant of water vapour R = 8.314/18.015 = 0.4615 kJ/(kg·K) (CODATA 2018 R, "
    "molar mass from memory); generator heat balance Q = ṁ_s·h_g + ṁ_bd·h_f − ṁ_fw·h_fw and "
    "plant steam = Q/h_fg (common practice); Q = U·A·ΔT (common practice); EN 285:2015 clean "
    "steam tests (from memory): non-condensable gases ≤ 3.5 mL per 100 mL of condensate, "
    "superheat on expansion to atmosphere ≤ 25 K, dryness ≥ 0.95; throttling calorimeter "
    "x = (h_cal − h_f)/h_fg (common practice); clean steam header velocity ≤ 25 m/s (common "
    "practice); pump power V̇·Δp/η, US form hp = gpm·psi/(1714·η) (common practice); "
    "1 kg = 2.205 lb, 1 bar = 14.50 psi, "
    "1 kW = 3412 Btu/h, 1 boiler horsepower = 9.81 kW (NIST SP 811 (2008) App. B.8); "
    "K = °C + 273.15, °F = 1.8·°C + 32 (SI Brochure 9th ed.). Plant, maker's data, tariff and "
    "readings invented.")
ps = ItemSheet("Generator", "Ashgarth Biologics, building 4 clean utilities (invented): "
               "falling-film clean-steam generator on plant steam, design day", CLS_SRC)
ps.heading("Clean steam demand")
ps.add("mac", "Autoclaves (makers' data, invented)", "ṁ_ac", 220, "kg/h")
ps.add("msip", "Sterilisation in place of vessels", "ṁ_SIP", 140, "kg/h")
ps.add("mhum", "HVAC humidifiers", "ṁ_hum", 40, "kg/h")
ps.add("ms", "Clean steam output", "ṁ_s", "={mac}+{msip}+{mhum}", "kg/h")
ps.add("mslb", "Clean steam output, lb/h (US generator maker)", "ṁ_s,US", "={ms}*2.205", "lb/h")
ps.add("mslb2", "Clean steam output, lb/h (first draft)", "ṁ_s,US2", "={ms}/2.205", "lb/h",
       planted=("unit-scale", "kg to lb divided by 2.205: wrong way round"))
ps.add("bd", "Blowdown, share of the feed", "b", 4, "%")
ps.add("mf", "Purified water feed", "ṁ_fw", "={ms}/(1-{bd}/100)", "kg/h")
ps.add("mf2", "Purified water feed (first draft)", "ṁ_fw2", "={ms}/(1-{bd})", "kg/h",
       planted=("unit-scale", "a % used as a fraction: 1 − 4 gives a negative feed"))
ps.add("mbd", "Blowdown", "ṁ_bd", "={mf}-{ms}", "kg/h")
ps.heading("Pressures and steam properties")
ps.add("pg", "Clean steam pressure on the gauge", "p_g", 3.0, "barg")
ps.add("pb", "Site barometer (invented)", "p_b", 1.002, "bar a")
ps.add("pa", "Clean steam pressure, absolute", "p_a", "={pg}+{pb}", "bar a")
ps.add("pa2", "Clean steam pressure, absolute (first draft)", "p_a2", "={pg}", "bar a",
       planted=("offset-scale", "a gauge reading set equal to an absolute pressure"))
ps.add("psig", "Clean steam pressure, psig (US generator maker)", "p_US", "={pg}*14.5", "psig")
ps.add("ppg", "Plant steam pressure on the gauge", "p_p,g", 8.0, "barg")
ps.add("ppa", "Plant steam pressure, absolute", "p_p", "={ppg}+{pb}", "bar a")
ps.add("tsat", "Clean steam saturation temperature (Steam sheet)", "t_s",
       "=VLOOKUP({pa},Steam!A6:G11,2,TRUE)", "°C")
ps.add("hf", "Saturated water enthalpy, clean side (Steam sheet)", "h_f",
       "=VLOOKUP({pa},Steam!A6:G11,3,TRUE)", "kJ/kg")
ps.add("hfg", "Latent heat, clean side (Steam sheet)", "h_fg",
       "=VLOOKUP({pa},Steam!A6:G11,4,TRUE)", "kJ/kg")
ps.add("hg", "Dry saturated steam enthalpy, clean side (Steam sheet)", "h_g",
       "=VLOOKUP({pa},Steam!A6:G11,5,TRUE)", "kJ/kg")
ps.add("vg", "Dry saturated steam specific volume, clean side (Steam sheet)", "v_g",
       "=VLOOKUP({pa},Steam!A6:G11,6,TRUE)", "m³/kg")
ps.add("tsp", "Plant steam saturation temperature (Steam sheet)", "t_p",
       "=VLOOKUP({ppa},Steam!A6:G11,2,TRUE)", "°C")
ps.add("hfgp", "Latent heat, plant side (Steam sheet)", "h_fg,p",
       "=VLOOKUP({ppa},Steam!A6:G11,4,TRUE)", "kJ/kg")
ps.heading("Heat balance and plant steam")
ps.add("hfw", "Purified water enthalpy at 25 °C (tables)", "h_fw", 104.9, "kJ/kg")
ps.add("Q", "Generator duty", "Q", "=({ms}*{hg}+{mbd}*{hf}-{mf}*{hfw})/3600", "kW")
ps.add("Q2", "Generator duty (first draft)", "Q_2", "={ms}*{hg}+{mbd}*{hf}-{mf}*{hfw}", "kW",
       planted=("unit-scale", "kg/h × kJ/kg written as kW: /3600 missing"))
ps.add("Pls", "Shell and column standing loss (maker, invented)", "P_ls", 1800, "W")
ps.add("Qt", "Duty with the standing loss", "Q_t", "={Q}+{Pls}/1000", "kW")
ps.add("Qt2", "Duty with the standing loss (first draft)", "Q_t2", "={Q}+{Pls}", "kW",
       planted=("unit-scale", "W added to kW"))
ps.add("mps", "Plant steam used", "ṁ_p", "={Qt}*3600/{hfgp}", "kg/h")
ps.add("mps2", "Plant steam used (first draft)", "ṁ_p2", "={Qt}/{hfgp}", "kg/h",
       planted=("unit-scale", "kW over kJ/kg gives kg/s, written as kg/h: ×3600 missing"))
ps.add("QBtu", "Duty, Btu/h (US maker's data sheet)", "Q_US", "={Qt}*3412", "Btu/h")
ps.add("QBo", "Duty, boiler horsepower", "Q_BoHP", "={Qt}/9.81", "BoHP")
ps.add("dTx", "Temperature difference, plant to clean side", "ΔT_x", "={tsp}-{tsat}", "K")
ps.add("Ux", "Overall coefficient, falling-film evaporator (maker, invented)", "U", 1400,
       "W/(m²·K)")
ps.add("Ax", "Heating surface needed", "A_x", "={Qt}*1000/({Ux}*{dTx})", "m²")
ps.add("hrs", "Operating hours", "t_op", 20, "h/d")
ps.add("cps", "Plant steam cost (invented)", "c_p", 38, "$/t")
ps.add("cost", "Plant steam cost per day", "C_d", "={mps}*{hrs}/1000*{cps}", "$/d")
ps.heading("Clean steam header (DN50)")
ps.add("Dn", "Header bore", "D", 52.5, "mm")
ps.add("Vdot", "Steam volume flow", "V̇", "={ms}*{vg}/3600", "m³/s")
ps.add("Ah", "Header bore area", "A", "=PI()*({Dn}/1000)^2/4", "m²")
ps.add("vel", "Steam velocity in the header", "v", "={Vdot}/{Ah}", "m/s")
ps.add("vel2", "Steam velocity in the header (first draft)", "v_2", "={Vdot}/(PI()*{Dn}^2/4)",
       "m/s", planted=("unit-scale", "a bore in mm used as metres: 10⁶ too small"))
ps.heading("EN 285 quality tests (readings invented)")
ps.add("te", "Temperature of the steam expanded to atmosphere", "t_e", 108.5, "°C")
ps.add("t0", "Boiling point of water at the site barometer (tables)", "t_0", 99.7, "°C")
ps.add("sh", "Superheat", "ΔT_sh", "={te}-{t0}", "K")
ps.add("hg0", "Saturated vapour enthalpy at 1.013 bar a (tables)", "h_g0", 2675.5, "kJ/kg")
ps.add("cpv", "Specific heat of low-pressure steam", "c_p,v", 2.03, "kJ/(kg·K)")
ps.add("tcal", "Throttling calorimeter temperature", "t_cal", 104, "°C")
ps.add("tb0", "Saturation temperature in the calorimeter", "t_b0", 100.0, "°C")
ps.add("hcal", "Enthalpy in the calorimeter", "h_cal", "={hg0}+{cpv}*({tcal}-{tb0})", "kJ/kg")
ps.add("x", "Dryness fraction", "x", "=({hcal}-{hf})/{hfg}", "-")
ps.add("Vng", "Non-condensable gas collected in the burette", "V_g", 1.9, "mL")
ps.add("Vco", "Condensate collected", "V_c", 95, "mL")
ps.add("ncg", "Non-condensable gases", "NCG", "={Vng}/{Vco}*100", "%")
ps.add("ncg2", "Non-condensable gases (first draft)", "NCG_2", "={Vng}/{Vco}", "%",
       planted=("unit-scale", "a fraction written as a %: ×100 missing"))
ps.heading("Ideal-gas check of the table's specific volume")
ps.add("Rw", "Specific gas constant of water vapour", "R_w", 0.4615, "kJ/(kg·K)")
ps.add("TsK", "Clean steam saturation temperature, absolute", "T_s", "={tsat}+273.15", "K")
ps.add("vig", "Specific volume as an ideal gas", "v_ig", "={Rw}*{TsK}/({pa}*100)", "m³/kg")
ps.add("vig2", "Specific volume as an ideal gas (first draft)", "v_ig2",
       "={Rw}*{tsat}/({pa}*100)", "m³/kg",
       planted=("offset-scale", "a °C temperature in the gas law"))
ps.add("Z", "Compressibility factor implied", "Z", "={vg}/{vig}", "-")
ps.heading("Feed pump")
ps.add("rhof", "Purified water density at 25 °C", "ρ_fw", 997, "kg/m³")
ps.add("Vf", "Feed flow", "V̇_fw", "={mf}/{rhof}", "m³/h")
ps.add("dpf", "Feed pump differential pressure (invented)", "Δp_f", 5.0, "bar")
ps.add("etaf", "Feed pump efficiency (maker, invented)", "η_f", 35, "%")
ps.add("Pf", "Feed pump shaft power", "P_f", "={Vf}/3600*{dpf}*100000/({etaf}/100)", "W")
ps.add("Vfgpm", "Feed flow, US gpm (US pump maker)", "V̇_fw,US", "={Vf}*1000/60/3.785", "gpm")
ps.add("dpsi", "Feed pump differential pressure, psi", "Δp_f,US", "={dpf}*14.5", "psi")
ps.add("Pfhp", "Feed pump shaft power, hp (gpm·psi/(1714·η))", "P_f,US",
       "={Vfgpm}*{dpsi}/(1714*{etaf}/100)", "hp")
ps.add("Pf2", "Feed pump shaft power (first draft)", "P_f2",
       "={Vf}/3600*{dpf}*100000/({etaf}/100)", "kW",
       planted=("unit-scale", "a power in W written as kW"))
CLSS = ps.finish()

STEAM = {
    "A1": "Saturated steam by absolute pressure (IAPWS-IF97 steam tables, rounded, from memory; "
          "check against the tables before use)",
    "A2": "Sources: IAPWS-IF97 (from memory); °F = 1.8·°C + 32 (SI Brochure 9th ed. and NIST SP "
          "811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Pressure [bar a]", "B5": "t_sat [°C]", "C5": "h_f [kJ/kg]", "D5": "h_fg [kJ/kg]",
    "E5": "h_g [kJ/kg]", "F5": "v_g [m³/kg]", "G5": "t_sat [°F]",
}
for r, (p, t, hf, hfg, hg, vg) in enumerate([(3.5, 138.9, 584.3, 2147.4, 2731.6, 0.5243),
                                             (4.0, 143.6, 604.7, 2133.4, 2738.1, 0.4624),
                                             (4.5, 147.9, 623.2, 2120.7, 2743.9, 0.4140),
                                             (8.0, 170.4, 721.1, 2048.0, 2769.1, 0.2404),
                                             (9.0, 175.4, 742.8, 2031.1, 2773.9, 0.2150),
                                             (10.0, 179.9, 762.8, 2015.3, 2778.1, 0.1944)],
                                            start=6):
    STEAM[f"A{r}"], STEAM[f"B{r}"], STEAM[f"C{r}"] = p, t, hf
    STEAM[f"D{r}"], STEAM[f"E{r}"], STEAM[f"F{r}"] = hfg, hg, vg
    STEAM[f"G{r}"] = f"=B{r}*1.8+32"

CLSB = {
    "trade": "pharmaceutical clean utilities: clean-steam generator, plant steam, EN 285 tests",
    "sheets": [("Generator", CLSS), ("Steam", STEAM)],
    "planted": dict(ps.planted),
}

BOOKS = {"ammonia-cold-store-frostholm": CSTB, "leachate-sbr-cattersby-moor": LCHB,
         "bridge-deck-drainage-lenfold": BRGB, "clean-steam-ashgarth": CLSB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()

# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.
