#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review73), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; the layout
follows corpus/sheets/review64/make_books.py (and review55).

Trades: a hotel's domestic hot water and its heat pump (L/d, US gal, kW, Btu/h, °C and °F
readings and differences, COP); a wastewater works' aeration blowers (kg O2/d, Nm³/h, scfm,
kPa(g) with the site barometer, kW, hp); a steel warehouse's crane runway beam and portal frame
(t, kN, kip, m, ft, mm, MPa, ksi, g applied or left out); an oil terminal's tank heating and
loading pumps (m³, bbl, m³/h, bbl/h, gpm, °C, kW, kPa and psi, SG). All scenarios, sites,
firms, readings and maker's data are invented (demonstration only); the formulas and published
factors are the trade's own, with their sources named in a text cell at the top of each sheet
("from memory" where recalled and not checked, "common practice" for a fact of the trade with
no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted slip (planted=(rule, what)) or a correct cell that must
stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and its
messages that mislead, are recorded in review_notes.py after running the round's build of the time
(the round's build of the time).

Run: python3 make_books.py  ->  *.xlsx (and *.expect where none exist yet) in this folder;
     python3 make_books.py --expect  rewrites the .expect files from review_notes.py.
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
# Book 1: hotel domestic hot water and heat pump (-, %, L/d, L/h, L/s, L, m³, US gal/d, US gal,
# gpm, h, h/d, °C, °F, K, Δ°F, kg/L, kJ/(kg·K), kWh/d, Btu/d, kW, W, Btu/h, W/m, kWh/yr)
# --------------------------------------------------------------------------------------------
HOT_SRC = (
    "Sources: 1 US gal = 3.785 L, 1 L/s = 15.85 US gpm, 1 kW = 3412 Btu/h "
    "(NIST SP 811 (2008) App. B.8); °F = 1.8·°C + 32, and a difference of 1 K = 1.8 Δ°F (SI "
    "Brochure 9th ed.; NIST SP 811); heat Q = V·ρ·c_p·ΔT, c_p of water 4.19 kJ/(kg·K), density "
    "0.983 kg/L at 60 °C (common practice; steam tables, from memory); US forms Btu/h = 500·gpm·"
    "ΔT(°F) and Btu = 8.34·gal·ΔT(°F) (ASHRAE Handbook, HVAC Applications (2019), ch. 51 Service "
    "Water Heating, from memory); hot water per guest and the peak factor over the mean hour "
    "(CIBSE Guide G (2004) and ASHRAE ch. 51, from memory; the values here invented); storage at "
    "60 °C, circulation return not below 50 °C (HSE ACOP L8, 4th ed. (2013), and HSG274 Part 2, "
    "from memory); usable share of stored hot water 70 % (common practice); share of hot water "
    "in mixed water (t_m − t_c)/(t_h − t_c) (common practice); COP = Q_h/P_el and Carnot COP = "
    "T_h/(T_h − T_c) in kelvins (Çengel and Boles, Thermodynamics: An Engineering Approach, 9th "
    "ed., ch. 6); circulation flow = Q/(ρ·c_p·ΔT) (common practice). Hotel, rooms, occupancy, "
    "readings and maker's data invented.")
hw = ItemSheet("DHW", "Harbourlight Hotel, Saltmere Quay (invented): 180 rooms, domestic hot "
               "water by CO2 heat pumps and calorifier store, design day", HOT_SRC)
hw.heading("Occupancy and demand")
hw.add("N", "Bedrooms", "N", 180, "-")
hw.add("occ", "Occupancy, design day", "occ", 85, "%")
hw.add("ppr", "Guests per occupied room", "n_g", 1.6, "-")
hw.add("G", "Guests", "G", "={N}*{occ}/100*{ppr}", "-")
hw.add("G2", "Guests (first draft)", "G_2", "={N}*{occ}*{ppr}", "-",
       planted=("unit-scale", "a % occupancy used as a fraction: 100 too large"))
hw.add("q", "Hot water per guest at 60 °C (invented)", "q_g", 115, "L/d")
hw.add("Vg", "Guest hot water", "V_g", "={G}*{q}", "L/d")
hw.add("Vo", "Kitchen, spa and staff (Demand sheet)", "V_o", "=Demand!D10", "L/d")
hw.add("Vt", "Hot water per day", "V_d", "={Vg}+{Vo}", "L/d")
hw.add("Vtg", "Hot water per day, US gal/d (US maker's selection tool)", "V_d,US",
       "={Vt}/3.785", "US gal/d")
hw.add("Vtg2", "Hot water per day, US gal/d (first draft)", "V_d,US2", "={Vt}*3.785",
       "US gal/d", planted=("unit-scale", "L to US gal multiplied by 3.785: wrong way round"))
hw.add("Vav", "Mean hourly draw", "V̇_av", "={Vt}/24", "L/h")
hw.add("pf", "Peak factor, 3 h peak over the mean hour (invented)", "f_pk", 2.5, "-")
hw.add("Vpk", "Peak draw", "V̇_pk", "={Vav}*{pf}", "L/h")
hw.add("Vpkg", "Peak draw, US gpm", "V̇_pk,US", "={Vpk}/60/3.785", "gpm")
hw.heading("Temperatures")
hw.add("tc", "Cold feed temperature, winter", "t_c", 10, "°C")
hw.add("ts", "Store temperature", "t_s", 60, "°C")
hw.add("tm", "Mixed water at the showers", "t_m", 41, "°C")
hw.add("tr", "Circulation return temperature, minimum", "t_r", 55, "°C")
hw.add("tcF", "Cold feed temperature, °F", "t_c,F", "={tc}*1.8+32", "°F")
hw.add("tsF", "Store temperature, °F", "t_s,F", "={ts}*1.8+32", "°F")
hw.add("dT", "Temperature rise, cold feed to store", "ΔT", "={ts}-{tc}", "K")
hw.add("dTF", "Temperature rise, °F (US check)", "ΔT_F", "={dT}*1.8", "Δ°F")
hw.add("dTF2", "Temperature rise, °F (first draft)", "ΔT_F2", "={dT}*1.8+32", "Δ°F",
       planted=("offset-scale", "a difference converted like a reading: the +32 does not belong"))
hw.add("fh", "Share of stored water in the mixed water at the showers", "x_h",
       "=({tm}-{tc})/({ts}-{tc})*100", "%")
hw.heading("Heat")
hw.add("rho", "Density of water at 60 °C", "ρ", 0.983, "kg/L")
hw.add("cp", "Specific heat of water", "c_p", 4.19, "kJ/(kg·K)")
hw.add("Ed", "Heat to the hot water, per day", "E_d", "={Vt}*{rho}*{cp}*{dT}/3600", "kWh/d")
hw.add("Ed2", "Heat to the hot water, per day (first draft)", "E_d2", "={Vt}*{rho}*{cp}*{dT}",
       "kWh/d", planted=("unit-scale", "kJ/d written as kWh/d: the /3600 missing"))
hw.add("EdB", "Heat per day, Btu/d (US check, 8.34 lb/gal)", "E_d,US", "=8.34*{Vtg}*{dTF}",
       "Btu/d")
hw.add("EdBk", "US check restated in kWh/d", "E_d,US k", "={EdB}/3412", "kWh/d")
hw.add("Qpk", "Heat drawn over the peak", "Q_pk", "={Vpk}*{rho}*{cp}*{dT}/3600", "kW")
hw.add("QpkB", "Heat drawn over the peak, Btu/h", "Q_pk,US", "={Qpk}*3412", "Btu/h")
hw.add("QpkB2", "Heat drawn over the peak, Btu/h (first draft)", "Q_pk,US2", "={Qpk}*3.412",
       "Btu/h", planted=("unit-scale", "the W to Btu/h factor applied to kW: 1000 too small"))
hw.add("QpkUS", "Heat drawn over the peak, US check 500·gpm·ΔT", "Q_pk,US c",
       "=500*{Vpkg}*{dTF}", "Btu/h")
hw.heading("Store")
hw.add("Pch", "Heat pump output chosen, 3 × 45 kW at 7 °C air (maker, invented)", "P_hp", 135,
       "kW")
hw.add("Rr", "Recovery rate at that output", "V̇_r", "={Pch}*3600/({rho}*{cp}*{dT})", "L/h")
hw.add("tpk", "Peak period", "t_pk", 3, "h")
hw.add("fu", "Usable share of the stored volume", "f_u", 70, "%")
hw.add("Vs", "Store volume needed", "V_s", "=({Vpk}-{Rr})*{tpk}/({fu}/100)", "L")
hw.add("Vsm", "Store volume needed, m³ (plant room layout)", "V_s,m3", "={Vs}/1000", "m³")
hw.add("Vsm2", "Store volume needed, m³ (first draft)", "V_s,m3 2", "={Vs}/100", "m³",
       planted=("unit-scale", "L to m³ divided by 100: the wrong factor, 10 too large"))
hw.add("Vcyl", "Calorifier cylinder, each (maker, invented)", "V_cyl", 1500, "L")
hw.add("ncyl", "Cylinders", "n_cyl", "=ROUNDUP({Vs}/{Vcyl},0)", "-")
hw.heading("Losses and circulation")
hw.add("Psl", "Standing loss per cylinder (maker, invented)", "P_sl", 95, "W")
hw.add("Els", "Standing loss of the store, per day", "E_ls", "={Psl}*{ncyl}*24/1000", "kWh/d")
hw.add("Els2", "Standing loss of the store, per day (first draft)", "E_ls2",
       "={Psl}*{ncyl}*24", "kWh/d", planted=("unit-scale", "W·h written as kWh: the /1000 missing"))
hw.add("Lc", "Circulation loop length, flow and return", "L_c", 420, "m")
hw.add("ql", "Loop heat loss per metre, insulated (invented)", "q_l", 12, "W/m")
hw.add("Ql", "Loop heat loss", "Q_l", "={Lc}*{ql}/1000", "kW")
hw.add("dTl", "Temperature drop round the loop", "ΔT_l", "={ts}-{tr}", "K")
hw.add("Vl", "Circulation flow", "V̇_l", "={Ql}/({rho}*{cp}*{dTl})", "L/s")
hw.add("dTlF", "Temperature drop round the loop, °F", "ΔT_l,F", "={dTl}*1.8", "Δ°F")
hw.add("VlUS", "Circulation flow, US check Btu/h over 500·ΔT", "V̇_l,US c",
       "={Ql}*3412/(500*{dTlF})", "gpm")
hw.heading("Heat pump")
hw.add("Et", "Heat per day including losses", "E_t", "={Ed}+{Els}+{Ql}*24", "kWh/d")
hw.add("thp", "Heat pump running hours allowed", "t_hp", 18, "h/d")
hw.add("Php", "Heat pump output needed", "P_hp,req", "={Et}/{thp}", "kW")
hw.add("COP", "COP at 7 °C air, 60 °C water (maker, invented)", "COP", 3.2, "-")
hw.add("Pel", "Heat pump electrical input", "P_el", "={Pch}/{COP}", "kW")
hw.add("PelW", "Heat pump electrical input, W (first draft, panel schedule)", "P_el,W",
       "={Pch}/{COP}", "W", planted=("unit-scale", "kW written as W: the ×1000 missing"))
hw.add("tcd", "Condensing temperature (maker, invented)", "t_cd", 65, "°C")
hw.add("tev", "Evaporating temperature at 7 °C air (maker, invented)", "t_ev", 0, "°C")
hw.add("COPc", "Carnot COP", "COP_C", "=({tcd}+273.15)/({tcd}-{tev})", "-")
hw.add("COPc2", "Carnot COP (first draft)", "COP_C2", "={tcd}/({tcd}-{tev})", "-",
       planted=("offset-scale", "a °C reading used as an absolute temperature"))
hw.add("eta2", "Second-law efficiency", "η_II", "={COP}/{COPc}*100", "%")
hw.add("Eyr", "Electricity per year", "E_yr", "={Et}/{COP}*365", "kWh/yr")
HWS = hw.finish()

DEMAND = {
    "A1": "Harbourlight Hotel: hot water to other users on the design day (invented counts and "
          "rates at 60 °C)",
    "A2": "Sources: daily volume = number × volume each (common practice; CIBSE Guide G (2004), "
          "from memory, for the order of the rates).",
    "A3": CAUTION,
    "A5": "User", "B5": "Number [-]", "C5": "Each [L/d]", "D5": "Daily [L/d]",
    "A10": "Total", "D10": "=SUM(D6:D9)",
}
for r, (u, n, each) in enumerate([("Restaurant covers", 450, 8), ("Spa visits", 120, 25),
                                  ("Staff showers", 60, 30), ("Housekeeping", 1, 900)], start=6):
    DEMAND[f"A{r}"], DEMAND[f"B{r}"], DEMAND[f"C{r}"] = u, n, each
    DEMAND[f"D{r}"] = f"=B{r}*C{r}"

HOTB = {
    "trade": "building services: hotel domestic hot water, store and heat pump sizing",
    "sheets": [("DHW", HWS), ("Demand", DEMAND)],
    "planted": hw.planted,
}

# --------------------------------------------------------------------------------------------
# Book 2: wastewater works aeration blowers (m³/d, mg/L, kg/d, kg O2/d, kg O2/h, °C, K, °F, m,
# kg/m³, kPa, kPa(g), kPa a, psig, %/m, %, kg/h, kg/s, kg/Nm³, Nm³/h, scfm, kJ/(kg·K), kW, hp,
# kg O2/kWh, m³/h, mm, m/s)
# --------------------------------------------------------------------------------------------
AER_SRC = (
    "Sources: oxygen demand R_o = Q·(S_o − S) − 1.42·P_X,bio + 4.57·Q·NO_x, with g/m³ = mg/L "
    "(Metcalf & Eddy, Wastewater Engineering, 5th ed. (2014), ch. 8, from memory); field to "
    "standard transfer SOTR = AOTR/[α·F·(β·C_s,T,m − C)/C_s,20,m·θ^(T−20)], θ = 1.024, the "
    "saturation at mid-depth scaled by the absolute pressure there over the standard atmosphere "
    "(M&E 5th ed., ch. 5, from memory); oxygen 23.2 % of air by mass, air 1.293 kg/Nm³ at 0 °C "
    "and 101.325 kPa (CRC Handbook, from memory); 1 Nm³ = 37.33 scf at 60 °F and 14.696 psia, "
    "so Nm³/h × 0.6221 = scfm (NIST SP 811 (2008) B.8, 1 m³ = 35.31 ft³, times the ideal gas "
    "ratio 288.71 K/273.15 K; common practice); hydrostatic p = ρ·g·h, g_n = 9.80665 m/s² "
    "rounded 9.81 (SI Brochure 9th ed.); absolute = gauge + site barometer (common practice); "
    "adiabatic blower power P = ṁ·c_p·T₁·[(p₂/p₁)^0.283 − 1]/η, 0.283 = (k − 1)/k for air, "
    "c_p = 1.005 kJ/(kg·K) (M&E 5th ed., ch. 5, from memory); 1 hp = 0.7457 kW, 1 psi = "
    "6.895 kPa (NIST SP 811 (2008) B.8); °F = 1.8·°C + 32 (NIST SP 811). Works, flows, loads, "
    "gauges and maker's data invented.")
ae = ItemSheet("Aeration", "Otterburn Ings wastewater works (invented): activated sludge "
               "aeration, four lanes, fine-bubble diffusers and three duty blowers, summer peak",
               AER_SRC)
ae.heading("Oxygen demand")
ae.add("Q", "Design flow", "Q", 24000, "m³/d")
ae.add("S0", "Biodegradable COD in", "S_o", 260, "mg/L")
ae.add("S", "Biodegradable COD out", "S", 12, "mg/L")
ae.add("Px", "Biomass produced, as VSS (invented)", "P_X,bio", 2100, "kg/d")
ae.add("NOx", "Ammonia nitrified", "NO_x", 32, "mg/L")
ae.add("Ro", "Oxygen demand", "R_o", "={Q}*({S0}-{S})/1000-1.42*{Px}+4.57*{Q}*{NOx}/1000",
       "kg O2/d")
ae.add("Ro2", "Oxygen demand (first draft)", "R_o2",
       "={Q}*({S0}-{S})-1.42*{Px}+4.57*{Q}*{NOx}/1000", "kg O2/d",
       planted=("unit-scale", "m³/d × mg/L is g/d: the /1000 left off the first term"))
ae.add("Roh", "Oxygen demand, mean hour", "R_o,h", "={Ro}/24", "kg O2/h")
ae.add("fpk", "Peak factor on the oxygen demand (invented)", "f_pk", 1.5, "-")
ae.add("Rpk", "AOTR at the peak", "AOTR", "={Roh}*{fpk}", "kg O2/h")
ae.heading("Field conditions")
ae.add("T", "Basin temperature, summer", "T", 24, "°C")
ae.add("alp", "α, process water over clean water", "α", 0.50, "-")
ae.add("bet", "β, salinity and solids", "β", 0.95, "-")
ae.add("Ff", "Diffuser fouling factor", "F", 0.90, "-")
ae.add("th", "Temperature correction θ", "θ", 1.024, "-")
ae.add("C", "Operating dissolved oxygen", "C", 2.0, "mg/L")
ae.add("CsT", "Saturation at 24 °C, 101.325 kPa (Standard Methods, from memory)", "C_s,T",
       8.42, "mg/L")
ae.add("Cs20", "Saturation at 20 °C, 101.325 kPa (Standard Methods, from memory)", "C_s,20",
       9.09, "mg/L")
ae.add("hd", "Diffuser submergence", "h_d", 5.2, "m")
ae.add("rw", "Density of the mixed liquor", "ρ_w", 998, "kg/m³")
ae.add("ph", "Water pressure at the diffusers", "p_h", "={rw}*9.81*{hd}/1000", "kPa")
ae.add("ph2", "Water pressure at the diffusers (first draft)", "p_h2", "={rw}*{hd}/1000", "kPa",
       planted=("result-unit", "ρ·h with g left out: a mass per area, not a pressure"))
ae.add("pb", "Site barometer, works at 160 m (invented)", "p_b", 99.4, "kPa")
ae.add("ps", "Standard atmosphere", "p_s", 101.325, "kPa")
ae.add("pm", "Absolute pressure at mid-depth", "p_m", "={pb}+{ph}/2", "kPa a")
ae.add("CsTm", "Saturation at mid-depth, field", "C_s,T,m", "={CsT}*{pm}/{ps}", "mg/L")
ae.add("Cs20m", "Saturation at mid-depth, standard", "C_s,20,m", "={Cs20}*({ps}+{ph}/2)/{ps}",
       "mg/L")
ae.add("rat", "AOTR over SOTR", "AOTR/SOTR",
       "={alp}*{Ff}*({bet}*{CsTm}-{C})/{Cs20m}*{th}^({T}-20)", "-")
ae.add("SOTR", "SOTR at the peak", "SOTR", "={Rpk}/{rat}", "kg O2/h")
ae.heading("Air")
ae.add("sm", "SOTE per metre of submergence (maker, invented)", "SOTE/m", 6.0, "%/m")
ae.add("SOTE", "SOTE at the submergence", "SOTE", "={sm}*{hd}", "%")
ae.add("wO", "Oxygen in air, by mass", "w_O2", 23.2, "%")
ae.add("ma", "Air mass flow", "ṁ_a", "={SOTR}/({SOTE}/100*{wO}/100)", "kg/h")
ae.add("ma2", "Air mass flow (first draft)", "ṁ_a2", "={SOTR}/({SOTE}*{wO}/100)", "kg/h",
       planted=("unit-scale", "SOTE in % used as a fraction: 100 too small"))
ae.add("rn", "Density of air at 0 °C and 101.325 kPa", "ρ_n", 1.293, "kg/Nm³")
ae.add("Qn", "Air flow", "Q_n", "={ma}/{rn}", "Nm³/h")
ae.add("Qs", "Air flow, scfm (US blower maker)", "Q_scfm", "={Qn}*0.6221", "scfm")
ae.add("Qs2", "Air flow, scfm (first draft)", "Q_scfm2", "={Qn}/0.6221", "scfm",
       planted=("unit-scale", "Nm³/h to scfm divided by 0.6221: wrong way round"))
ae.add("Qs3", "Air flow, scfm (second draft)", "Q_scfm3", "={Qn}*37.33", "scfm",
       planted=("unit-scale", "Nm³ to scf with the /60 missing: scf per hour written as scfm"))
ae.heading("Blowers")
ae.add("dpl", "Pipework, valve and diffuser losses (maker, invented)", "Δp_l", 6.5, "kPa")
ae.add("pg", "Blower discharge pressure", "p_2g", "={ph}+{dpl}", "kPa(g)")
ae.add("pgp", "Blower discharge pressure, psig (US blower maker)", "p_2g,US", "={pg}/6.895",
       "psig")
ae.add("dpf", "Inlet filter and silencer loss", "Δp_f", 0.8, "kPa")
ae.add("p1", "Blower inlet pressure, absolute", "p_1", "={pb}-{dpf}", "kPa a")
ae.add("p2", "Blower discharge pressure, absolute", "p_2", "={pg}+{pb}", "kPa a")
ae.add("rp", "Pressure ratio", "r_p", "={p2}/{p1}", "-")
ae.add("rp2", "Pressure ratio (first draft)", "r_p2", "={pg}/{p1}", "-",
       planted=("offset-scale", "a gauge discharge pressure over an absolute inlet pressure"))
ae.add("t1", "Inlet air temperature, summer", "t_1", 30, "°C")
ae.add("T1", "Inlet air temperature, absolute", "T_1", "={t1}+273.15", "K")
ae.add("t1F", "Inlet air temperature, °F (US blower maker)", "t_1,F", "={t1}*1.8+32", "°F")
ae.add("cpa", "Specific heat of air", "c_p", 1.005, "kJ/(kg·K)")
ae.add("eb", "Blower efficiency, adiabatic (maker, invented)", "η_b", 72, "%")
ae.add("md", "Air mass flow, per second", "ṁ", "={ma}/3600", "kg/s")
ae.add("Pbl", "Blower shaft power", "P_b", "={md}*{cpa}*{T1}*({rp}^0.283-1)/({eb}/100)", "kW")
ae.add("Pbl2", "Blower shaft power (first draft)", "P_b2",
       "={md}*{cpa}*{t1}*({rp}^0.283-1)/({eb}/100)", "kW",
       planted=("offset-scale", "a °C inlet reading where the absolute temperature belongs"))
ae.add("T2", "Discharge air temperature, absolute", "T_2",
       "={T1}*(1+({rp}^0.283-1)/({eb}/100))", "K")
ae.add("t2", "Discharge air temperature", "t_2", "={T2}-273.15", "°C")
ae.add("t2F", "Discharge air temperature, °F", "t_2,F", "={t2}*1.8+32", "°F")
ae.add("em", "Motor efficiency", "η_m", 95, "%")
ae.add("Pm", "Motor input power", "P_m", "={Pbl}/({em}/100)", "kW")
ae.add("Pmh", "Motor input power, hp (US motor list)", "P_m,US", "={Pm}/0.7457", "hp")
ae.add("Pmh2", "Motor input power, hp (first draft)", "P_m,US2", "={Pm}*0.7457", "hp",
       planted=("unit-scale", "kW to hp multiplied by 0.7457: wrong way round"))
ae.add("SAE", "Standard aeration efficiency, wire to water", "SAE", "={SOTR}/{Pm}",
       "kg O2/kWh")
ae.heading("Discharge header")
ae.add("Qa", "Actual flow in the discharge header", "Q_a", "={Qn}*{T2}/273.15*{ps}/{p2}",
       "m³/h")
ae.add("Dh", "Header bore", "D_h", 450, "mm")
ae.add("v", "Air velocity in the header", "v", "={Qa}/3600/(PI()*({Dh}/1000)^2/4)", "m/s")
ae.add("v2", "Air velocity in the header (first draft)", "v_2", "={Qa}/3600/(PI()*{Dh}^2/4)",
       "m/s", planted=("unit-scale", "a bore in mm squared beside a flow in m³: 10⁶ too small"))
AES = ae.finish()

_Qn = ae.ref("Qn")
LANES = {
    "A1": "Otterburn Ings: air split over the four aeration lanes (invented shares of the design "
          "load)",
    "A2": "Sources: lane air = share × total (common practice); Nm³/h × 0.6221 = scfm at 60 °F "
          "and 14.696 psia (NIST SP 811 (2008) B.8 with the ideal gas temperature ratio; common "
          "practice).",
    "A3": CAUTION,
    "A5": "Lane", "B5": "Share [%]", "C5": "Air [Nm³/h]", "D5": "Air [scfm]",
    "A10": "Total", "B10": "=SUM(B6:B9)", "C10": "=SUM(C6:C9)", "D10": "=SUM(D6:D9)",
}
for r, (lane, sh) in enumerate([("Lane 1", 28), ("Lane 2", 26), ("Lane 3", 24), ("Lane 4", 22)],
                               start=6):
    LANES[f"A{r}"], LANES[f"B{r}"] = lane, sh
    LANES[f"C{r}"] = f"=B{r}/100*{_Qn}"
    LANES[f"D{r}"] = f"=C{r}*0.6221"
LANES["D8"] = "=C8*0.5886"
LANES_PLANTED = {"Lanes!D8": ("unit-scale", "Nm³/h to scfm by the volume factor 35.31/60 alone: "
                                            "the 0 °C to 60 °F reference left out, a factor "
                                            "1.057 low")}

AERB = {
    "trade": "wastewater: aeration oxygen demand, SOTR, air flow, blower pressure and power",
    "sheets": [("Aeration", AES), ("Lanes", LANES)],
    "planted": {**ae.planted, **LANES_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 3: steel warehouse crane runway and portal frame (t, kg/m, m/s², kN, kip, kN/m, kN/m²,
# m, mm, ft, m/min, m/s, mph, -, %, kN·m, kip·ft, cm³, in³, cm⁴, cm², MPa, ksi, GPa, kg/m³,
# psf)
# --------------------------------------------------------------------------------------------
RUN_SRC = (
    "Sources: weight W = m·g, g_n = 9.80665 m/s² rounded 9.81 (SI Brochure 9th ed.); 1 kip = "
    "4.448 kN, 1 kN = 0.2248 kip, 1 kN·m = 0.7376 kip·ft, 1 in³ = 16.39 cm³, 1 ksi = 6.895 MPa "
    "(NIST SP 811 (2008) App. B.8); dynamic factor φ₂ = φ₂,min + β₂·v_h, hoisting class HC2: "
    "φ₂,min = 1.10, β₂ = 0.34 with v_h in m/s (EN 1991-3:2006 Table 2.5, from memory); partial "
    "factor 1.35 on crane actions (EN 1990 Annex A1 with EN 1993-6, from memory); lateral load "
    "10 % of the hoisted load plus crab over the wheels (common practice, simplified); largest "
    "moment from two equal moving wheel loads P at spacing a on a simple span L, M = P·(2L − "
    "a)²/(8L) for a < 0.586·L, and the deflection under two symmetric loads δ = P·c·(3L² − "
    "4c²)/(24·E·I), c = (L − a)/2 (Roark's Formulas for Stress and Strain, 8th ed., table 8.1, "
    "from memory); vertical deflection limit L/600 (EN 1993-6:2007 Table 7.2, from memory); "
    "σ = M/W_el, S355 f_y = 355 MPa for t ≤ 16 mm (EN 10025-2). Crane, building, sections and "
    "maker's data invented.")
rw = ItemSheet("Runway", "Brackenfold distribution shed (invented): 10 t overhead travelling "
               "crane, runway beam check over one 6 m bay", RUN_SRC)
rw.heading("Crane")
rw.add("mh", "Safe working load", "m_h", 10, "t")
rw.add("mc", "Crab (trolley and hoist) mass (maker, invented)", "m_c", 2.4, "t")
rw.add("mb", "Bridge mass (maker, invented)", "m_b", 11.5, "t")
rw.add("S", "Crane span, rail to rail", "S", 21.0, "m")
rw.add("e", "Minimum hook approach", "e", 1.1, "m")
rw.add("nw", "Wheels per end carriage", "n_w", 2, "-")
rw.add("a", "Wheel spacing on an end carriage", "a", 3.2, "m")
rw.add("vm", "Hoisting speed (maker, invented)", "v_h,m", 8, "m/min")
rw.add("g", "Standard gravity, rounded", "g", 9.81, "m/s²")
rw.add("Qh", "Hook load", "Q_h", "={mh}*{g}", "kN")
rw.add("Qk", "Hook load, kip (US crane maker)", "Q_h,US", "={Qh}*0.2248", "kip")
rw.add("Qk2", "Hook load, kip (first draft)", "Q_h,US2", "={Qh}*4.448", "kip",
       planted=("unit-scale", "kN to kip multiplied by 4.448: wrong way round"))
rw.add("Rmax", "Largest static wheel load, crab at the near end", "R_max",
       "=(({mh}+{mc})*{g}*({S}-{e})/{S}+{mb}*{g}/2)/{nw}", "kN")
rw.add("Rmax2", "Largest static wheel load (first draft)", "R_max2",
       "=(({mh}+{mc})*{g}*({S}-{e})/{S}+{mb}/2)/{nw}", "kN",
       planted=("sum-mismatch", "the bridge's mass added to weights: g left out of one term"))
rw.add("Rmin", "Least wheel load, empty crab at the far end", "R_min",
       "=({mc}*{g}*{e}/{S}+{mb}*{g}/2)/{nw}", "kN")
rw.add("vh", "Hoisting speed", "v_h", "={vm}/60", "m/s")
rw.add("vh2", "Hoisting speed (first draft)", "v_h2", "={vm}*60", "m/s",
       planted=("unit-scale", "m/min to m/s multiplied by 60: wrong way round"))
rw.add("phi", "Dynamic factor φ₂, class HC2", "φ₂", "=1.10+0.34*{vh}", "-")
rw.add("Rd", "Design wheel load", "R_d", "=1.35*{phi}*{Rmax}", "kN")
rw.add("Rdk", "Design wheel load, kip", "R_d,US", "={Rd}/4.448", "kip")
rw.add("lat", "Lateral load, share of hoisted load plus crab", "f_lat", 10, "%")
rw.add("HT", "Lateral load per wheel", "H_T", "={lat}/100*({mh}+{mc})*{g}/(2*{nw})", "kN")
rw.add("HT2", "Lateral load per wheel (first draft)", "H_T2",
       "={lat}*({mh}+{mc})*{g}/(2*{nw})", "kN",
       planted=("unit-scale", "a % share used as a fraction: 100 too large"))
rw.heading("Runway beam")
rw.add("L", "Runway span (bay)", "L", 6.0, "m")
rw.add("mr", "Beam and rail mass (invented section)", "m_r", 92, "kg/m")
rw.add("wsw", "Beam and rail self weight", "w_sw", "={mr}*{g}/1000", "kN/m")
rw.add("Mw", "Moment from the two wheels", "M_w", "={Rd}*(2*{L}-{a})^2/(8*{L})", "kN·m")
rw.add("Msw", "Moment from self weight, factored", "M_sw", "=1.35*{wsw}*{L}^2/8", "kN·m")
rw.add("M", "Design moment", "M", "={Mw}+{Msw}", "kN·m")
rw.add("W", "Elastic section modulus (invented section)", "W_el", 1620, "cm³")
rw.add("I", "Second moment of area (invented section)", "I", 37100, "cm⁴")
rw.add("sig", "Bending stress", "σ", "={M}*1000/{W}", "MPa")
rw.add("sig2", "Bending stress (first draft)", "σ_2", "={M}*1000000/{W}", "MPa",
       planted=("unit-scale", "kN·m to N·mm applied with W left in cm³: 1000 too large"))
rw.add("fy", "Yield strength, S355", "f_y", 355, "MPa")
rw.add("ur", "Utilisation in bending", "U", "={sig}/{fy}*100", "%")
rw.add("fyk", "Yield strength, ksi (US reviewer)", "f_y,US", "={fy}/6.895", "ksi")
rw.add("fyk2", "Yield strength, ksi (first draft)", "f_y,US2", "={fy}*6.895", "ksi",
       planted=("unit-scale", "MPa to ksi multiplied by 6.895: wrong way round"))
rw.add("Mk", "Design moment, kip·ft", "M_US", "={M}*0.7376", "kip·ft")
rw.add("Mk2", "Design moment, kip·ft (first draft)", "M_US2", "={M}*0.2248", "kip·ft",
       planted=("unit-scale", "kN·m to kip·ft by the force factor alone: m to ft left out"))
rw.add("Win", "Elastic section modulus, in³", "W_el,US", "={W}/16.39", "in³")
rw.add("sigk", "Bending stress, ksi (US check)", "σ_US", "={Mk}*12/{Win}", "ksi")
rw.add("E", "Modulus of elasticity", "E", 210, "GPa")
rw.add("c", "Wheel to support, loads placed symmetrically", "c", "=({L}-{a})/2", "m")
rw.add("dl", "Deflection under the static wheel loads", "δ",
       "={Rmax}*1000*({c}*1000)*(3*({L}*1000)^2-4*({c}*1000)^2)/(24*{E}*1000*{I}*10000)", "mm")
rw.add("dlim", "Deflection limit, L/600", "δ_lim", "={L}*1000/600", "mm")
rw.add("dlim2", "Deflection limit, L/600 (first draft)", "δ_lim2", "={L}/600", "mm",
       planted=("unit-scale", "a span in m over 600 written as mm: 1000 too small"))

PORT_SRC = (
    "Sources: self weight = m·g (SI Brochure 9th ed., g_n rounded 9.81); ULS line load "
    "1.35·G_k + 1.5·Q_k (EN 1990:2002 eq. 6.10 with Table A1.2(B), from memory); pinned-base "
    "portal with a flat rafter under a uniform load: corner moment M_e = w·L²/(4·(2k + 3)), "
    "k = (I_r/I_c)·(h/L), H = M_e/h (Kleinlogel's frame formulas, from memory); wheel loads on "
    "the column by the influence line of a simple span (common practice); basic velocity "
    "pressure q_b = ½·ρ·v_b², ρ = 1.25 kg/m³ (EN 1991-1-4:2005 eq. 4.10, from memory); US "
    "q = 0.00256·V² in psf with V in mph, before its K factors (ASCE 7-16 eq. 26.10-1, from "
    "memory); 1 m/s = 2.237 mph, 1 kN/m² = 20.89 psf, 1 ft = 0.3048 m (NIST SP 811 (2008) "
    "App. B.8); sway limit h/300 (common practice for portal frames without cranes' tighter "
    "limits, simplified). Building, loads and sections invented.")
pt = ItemSheet("Portal", "Brackenfold distribution shed (invented): pinned-base portal frame, "
               "30 m span, 6 m bays, carrying the crane runway", PORT_SRC)
pt.heading("Geometry and loads")
pt.add("Lp", "Frame span", "L", 30, "m")
pt.add("h", "Eaves height", "h", 8, "m")
pt.add("gk", "Roof dead load: sheeting, purlins, services (invented)", "g_k", 0.30, "kN/m²")
pt.add("sk", "Snow load on the roof (invented)", "s_k", 0.60, "kN/m²")
pt.add("mr", "Rafter mass (invented section)", "m_r", 74, "kg/m")
pt.add("swr", "Rafter self weight", "w_r", "={mr}*9.81/1000", "kN/m")
pt.add("swr2", "Rafter self weight (first draft)", "w_r2", "={mr}/1000", "kN/m",
       planted=("result-unit", "kg/m written as kN/m: g left out"))
pt.add("wd", "Design line load on the rafter", "w_d",
       "=1.35*({gk}*{Runway.L}+{swr})+1.5*{sk}*{Runway.L}", "kN/m")
pt.add("Ir", "Rafter second moment of area (invented)", "I_r", 47500, "cm⁴")
pt.add("Ic", "Column second moment of area (invented)", "I_c", 61500, "cm⁴")
pt.add("k", "Stiffness ratio", "k", "={Ir}/{Ic}*{h}/{Lp}", "-")
pt.add("Me", "Eaves moment", "M_e", "={wd}*{Lp}^2/(4*(2*{k}+3))", "kN·m")
pt.add("H", "Horizontal thrust at the bases", "H", "={Me}/{h}", "kN")
pt.add("Mm", "Midspan moment", "M_m", "={wd}*{Lp}^2/8-{Me}", "kN·m")
pt.heading("Column")
pt.add("V", "Column load from the roof", "V", "={wd}*{Lp}/2", "kN")
pt.add("Rc", "Crane wheels onto the column bracket", "R_c",
       "={Runway.Rd}*(2-{Runway.a}/{Runway.L})", "kN")
pt.add("Nc", "Column axial load", "N_c", "={V}+{Rc}", "kN")
pt.add("Ac", "Column area (invented section)", "A_c", 117, "cm²")
pt.add("sc", "Column axial stress", "σ_c", "={Nc}*10/{Ac}", "MPa")
pt.add("sck", "Column axial stress, ksi", "σ_c,US", "={sc}/6.895", "ksi")
pt.heading("Wind")
pt.add("vb", "Basic wind velocity (invented)", "v_b", 24, "m/s")
pt.add("ra", "Density of air (EN 1991-1-4 recommended value)", "ρ_a", 1.25, "kg/m³")
pt.add("qb", "Basic velocity pressure", "q_b", "=0.5*{ra}*{vb}^2/1000", "kN/m²")
pt.add("vmph", "Basic wind velocity, mph", "V", "={vb}*2.237", "mph")
pt.add("qUS", "Velocity pressure, US check 0.00256·V²", "q_US", "=0.00256*{vmph}^2", "psf")
pt.add("qps", "Basic velocity pressure, psf", "q_b,US", "={qb}*20.89", "psf")
pt.add("qps2", "Basic velocity pressure, psf (first draft)", "q_b,US2", "={qb}*0.02089", "psf",
       planted=("unit-scale", "the Pa to psf factor applied to kN/m²: 1000 too small"))
pt.add("ce", "Exposure factor (invented)", "c_e", 2.1, "-")
pt.add("cpe", "Net pressure coefficient, windward wall", "c_pe", 0.8, "-")
pt.add("wc", "Design wind load on the column", "w_c",
       "=1.5*{ce}*{qb}*{cpe}*{Runway.L}", "kN/m")
pt.add("Mc", "Column moment from wind, propped at the eaves", "M_c", "={wc}*{h}^2/8", "kN·m")
pt.add("dsw", "Sway limit at the eaves, h/300", "δ_sw", "={h}*1000/300", "mm")
PTS = pt.finish((rw,))
RWS = rw.finish()

STEELB = {
    "trade": "structural: crane runway beam and pinned-base portal frame checks",
    "sheets": [("Runway", RWS), ("Portal", PTS)],
    "planted": {**rw.planted, **pt.planted},
}

# --------------------------------------------------------------------------------------------
# Book 4: oil terminal tank heating and loading pumps (m, m², m³, bbl, SG, kg/m³, t, °C, °F,
# K, 1/K, W/(m²·K), kW, kJ/(kg·K), h, kPa(g), kPa, kPa a, psig, psi, kJ/kg, kg/h,
# ft, m³/h, bbl/h, gpm, %, hp, mm, m/s, cSt)
# --------------------------------------------------------------------------------------------
TANK_SRC = (
    "Sources: 1 bbl = 42 US gal = 0.158987 m³, so 1 m³ = 6.2898 bbl and 1 m³ = 264.2 US gal; "
    "1 kW = 3412 Btu/h; 1 kg = 2.205 lb; 1 psi = 6.895 kPa; 1 m = 3.281 ft (NIST SP 811 (2008) "
    "App. B.8); °F = 1.8·°C + 32 (NIST SP 811); density = SG × water at 15 °C, 999.1 kg/m³ "
    "(API MPMS ch. 11.1 practice, from memory); tank heat loss Q = Σ U·A·ΔT with U in the range "
    "for insulated shells and roofs and a floor on sand (common practice; Kern, Process Heat "
    "Transfer (1950), from memory; the values here invented); heat to raise the stock Q = m·c_p·"
    "ΔT/t, c_p of heavy fuel oil 1.9 kJ/(kg·K) (Cragoe, from memory); steam ṁ = Q/h_fg, h_fg = "
    "2048 kJ/kg and t_sat = 170.4 °C at 8 bar a (IAPWS-IF97 tables, from memory); coil area "
    "A = Q/(U·(t_sat − t_oil)), U = 110 W/(m²·K) for steam in heavy oil (common practice, from "
    "memory); hydrostatic p = ρ·g·h, g_n rounded 9.81 (SI Brochure 9th ed.) and p(psi) = "
    "0.433·SG·h(ft) (Hydraulic Institute, common practice); volume correction VCF = "
    "exp(−α₁₅·Δt·(1 + 0.8·α₁₅·Δt)), α₁₅ = K₀/ρ₁₅² + K₁/ρ₁₅, K₀ = 186.9696 and K₁ = "
    "0.4862 for fuel oils, Δt = t − 15 °C (API MPMS 11.1 (1980) Table 54B, from memory). "
    "Terminal, tanks, product data and readings invented.")
tk = ItemSheet("Tank", "Kittiwake Point products terminal (invented): heavy fuel oil tank T-104, "
               "winter heating and steam coil", TANK_SRC)
tk.heading("Tank and stock")
tk.add("D", "Tank diameter", "D", 36, "m")
tk.add("Hs", "Shell height", "H_s", 18, "m")
tk.add("hl", "Liquid height, working", "h_l", 14.2, "m")
tk.add("V", "Gross observed volume", "V", "=PI()*{D}^2/4*{hl}", "m³")
tk.add("Vb", "Gross observed volume, bbl", "V_bbl", "={V}*6.2898", "bbl")
tk.add("Vbg", "Gross observed volume, bbl (by US gal)", "V_bbl,g", "={V}*264.2/42", "bbl")
tk.add("Vb2", "Gross observed volume, bbl (first draft)", "V_bbl2", "={V}*0.159", "bbl",
       planted=("unit-scale", "m³ to bbl multiplied by 0.159: wrong way round"))
tk.add("SG", "Specific gravity at 15 °C", "SG", 0.975, "SG")
tk.add("rw", "Density of water at 15 °C", "ρ_w", 999.1, "kg/m³")
tk.add("rho", "Density at 15 °C", "ρ", "={SG}*{rw}", "kg/m³")
tk.add("m", "Stock mass", "m", "={V}*{rho}/1000", "t")
tk.heading("Heat loss, winter")
tk.add("ts", "Storage temperature", "t_s", 55, "°C")
tk.add("tsF", "Storage temperature, °F (US surveyor)", "t_s,F", "={ts}*1.8+32", "°F")
tk.add("tsF2", "Storage temperature, °F (first draft)", "t_s,F2", "={ts}*1.8", "°F",
       planted=("offset-scale", "°C to °F with the +32 left out"))
tk.add("ta", "Ambient design temperature, winter (invented)", "t_a", -2, "°C")
tk.add("tg", "Ground under the floor (invented)", "t_g", 8, "°C")
tk.add("As", "Shell area", "A_s", "=PI()*{D}*{Hs}", "m²")
tk.add("Ar", "Roof area (and floor)", "A_r", "=PI()*{D}^2/4", "m²")
tk.add("Us", "U, insulated shell (invented)", "U_s", 0.9, "W/(m²·K)")
tk.add("Ur", "U, insulated roof (invented)", "U_r", 1.4, "W/(m²·K)")
tk.add("Uf", "U, floor on sand (invented)", "U_f", 0.6, "W/(m²·K)")
tk.add("Ql", "Heat loss", "Q_l",
       "=(({Us}*{As}+{Ur}*{Ar})*({ts}-{ta})+{Uf}*{Ar}*({ts}-{tg}))/1000", "kW")
tk.add("Ql2", "Heat loss (first draft)", "Q_l2",
       "=({Us}*{As}+{Ur}*{Ar})*({ts}-{ta})+{Uf}*{Ar}*({ts}-{tg})", "kW",
       planted=("unit-scale", "W written as kW: the /1000 missing"))
tk.heading("Heating up")
tk.add("cp", "Specific heat of heavy fuel oil", "c_p", 1.9, "kJ/(kg·K)")
tk.add("dTh", "Temperature rise after a cold receipt", "ΔT_h", 6, "K")
tk.add("th", "Time allowed", "t_h", 72, "h")
tk.add("Qh", "Heat to raise the stock", "Q_h", "={m}*1000*{cp}*{dTh}/({th}*3600)", "kW")
tk.add("Qh2", "Heat to raise the stock (first draft)", "Q_h2", "={m}*{cp}*{dTh}/({th}*3600)",
       "kW", planted=("unit-scale", "a mass in t used as kg: 1000 too small"))
tk.add("Qt", "Coil duty", "Q_t", "={Ql}+{Qh}", "kW")
tk.heading("Steam coil")
tk.add("pg", "Steam supply pressure", "p_g", 700, "kPa(g)")
tk.add("pb", "Site barometer (invented)", "p_b", 101.0, "kPa")
tk.add("pa", "Steam supply pressure, absolute", "p_a", "={pg}+{pb}", "kPa a")
tk.add("pgp", "Steam supply pressure, psig", "p_g,US", "={pg}/6.895", "psig")
tk.add("hfg", "Latent heat at 8 bar a (tables)", "h_fg", 2048, "kJ/kg")
tk.add("tst", "Saturation temperature at 8 bar a (tables)", "t_sat", 170.4, "°C")
tk.add("ms", "Steam to the coil", "ṁ_s", "={Qt}*3600/{hfg}", "kg/h")
tk.add("Uc", "U, steam coil in heavy oil", "U_c", 110, "W/(m²·K)")
tk.add("Ac", "Coil area", "A_c", "={Qt}*1000/({Uc}*({tst}-{ts}))", "m²")
tk.heading("Volume correction and floor pressure")
tk.add("a15", "Thermal expansion coefficient at 15 °C", "α₁₅", "=186.9696/{rho}^2+0.4862/{rho}", "1/K")
tk.add("dt15", "Storage temperature above 15 °C", "Δt", "={ts}-15", "K")
tk.add("VCF", "Volume correction factor", "VCF", "=EXP(-{a15}*{dt15}*(1+0.8*{a15}*{dt15}))",
       "-")
tk.add("GSV", "Gross standard volume at 15 °C", "GSV", "={V}*{VCF}", "m³")
tk.add("pf", "Liquid pressure on the floor", "p_f", "={rho}*9.81*{hl}/1000", "kPa")
tk.add("hft", "Liquid height, ft", "h_l,US", "={hl}*3.281", "ft")
tk.add("pfp", "Liquid pressure on the floor, psi (0.433·SG·h)", "p_f,US", "=0.433*{SG}*{hft}",
       "psi")

PUMP_SRC = (
    "Sources: 1 m³/h = 6.2898 bbl/h = 4.403 US gpm, 1 psi = 6.895 kPa, 1 m = 3.281 ft, 1 hp = "
    "0.7457 kW (NIST SP 811 (2008) App. B.8); head H = Δp/(ρ·g), g_n rounded 9.81 (SI Brochure "
    "9th ed.); US forms H(ft) = 2.31·Δp(psi)/SG, hydraulic hp = gpm·psi/1714 and bhp = gpm·"
    "ft·SG/(3960·η) (Hydraulic Institute; Karassik et al., Pump Handbook, 4th ed. (2008), from "
    "memory); hydraulic power kW = m³/h·kPa/3600 (common practice); NPSHa from a suction gauge "
    "= (p_b + p_s,g − p_v)/(ρ·g) + v²/(2g) (Karassik et al., from memory); Darcy-Weisbach "
    "Δp = f·(L/D)·ρ·v²/2 with f = 64/Re in laminar flow, Re = v·D/ν, 1 cSt = 10⁻⁶ m²/s (White, "
    "Fluid Mechanics, 8th ed., ch. 6). Pumps, gauges, product data and barge parcel invented.")
pu = ItemSheet("Pumps", "Kittiwake Point products terminal (invented): barge loading pumps "
               "P-21A/B from T-104, heavy fuel oil at 55 °C", PUMP_SRC)
pu.heading("Duty")
pu.add("Q", "Loading rate", "Q", 900, "m³/h")
pu.add("Qb", "Loading rate, bbl/h (jetty log)", "Q_bbl", "={Q}*6.2898", "bbl/h")
pu.add("Qg", "Loading rate, US gpm (US pump curve)", "Q_US", "={Q}*4.403", "gpm")
pu.add("Qg2", "Loading rate, US gpm (first draft)", "Q_US2", "={Q}*264.2", "gpm",
       planted=("unit-scale", "m³/h to gpm by the gallons alone: the /60 missing"))
pu.add("Vp", "Barge parcel (invented)", "V_p", 60000, "bbl")
pu.add("tl", "Loading time", "t_l", "={Vp}/{Qb}", "h")
pu.heading("Pressures and head")
pu.add("pd", "Discharge gauge", "p_d", 820, "kPa(g)")
pu.add("ps", "Suction gauge", "p_s", 35, "kPa(g)")
pu.add("dp", "Differential pressure", "Δp", "={pd}-{ps}", "kPa")
pu.add("dpp", "Differential pressure, psi", "Δp_US", "={dp}/6.895", "psi")
pu.add("H", "Differential head", "H", "={dp}*1000/({Tank.rho}*9.81)", "m")
pu.add("Hf", "Differential head, ft (2.31·psi/SG)", "H_US", "={dpp}*2.31/{Tank.SG}", "ft")
pu.add("Hf2", "Differential head, ft (first draft)", "H_US2", "={dpp}*2.31*{Tank.SG}", "ft",
       planted=("gravity-number", "the specific gravity multiplies 2.31 ft/psi where it must "
                                  "divide it: off by SG²"))
pu.heading("Power")
pu.add("Ph", "Hydraulic power", "P_h", "={Q}*{dp}/3600", "kW")
pu.add("Phh", "Hydraulic power, hp (gpm·psi/1714)", "P_h,US", "={Qg}*{dpp}/1714", "hp")
pu.add("eta", "Pump efficiency at duty (maker, invented)", "η", 74, "%")
pu.add("Psh", "Shaft power", "P_sh", "={Ph}/({eta}/100)", "kW")
pu.add("Psh2", "Shaft power (first draft)", "P_sh2", "={Ph}/{eta}", "kW",
       planted=("unit-scale", "an efficiency in % used as a fraction: 100 too small"))
pu.add("bhp", "Shaft power, bhp (gpm·ft·SG/3960·η)", "P_sh,US",
       "={Qg}*{Hf}*{Tank.SG}/(3960*{eta}/100)", "hp")
pu.heading("Suction")
pu.add("pv", "Vapour pressure at 55 °C, absolute (invented)", "p_v", 1.2, "kPa")
pu.add("Ds", "Suction bore", "D_s", 350, "mm")
pu.add("vs", "Suction velocity", "v_s", "={Q}/3600/(PI()*({Ds}/1000)^2/4)", "m/s")
pu.add("vs2", "Suction velocity (first draft)", "v_s2", "={Q}/(PI()*({Ds}/1000)^2/4)", "m/s",
       planted=("unit-scale", "m³/h over m² written as m/s: the /3600 missing"))
pu.add("NPa", "NPSH available", "NPSHa",
       "=({Tank.pb}+{ps}-{pv})*1000/({Tank.rho}*9.81)+{vs}^2/(2*9.81)", "m")
pu.add("NPa2", "NPSH available (first draft)", "NPSHa2",
       "=({ps}-{pv})*1000/({Tank.rho}*9.81)+{vs}^2/(2*9.81)", "m",
       planted=("offset-scale", "a gauge suction reading less an absolute vapour pressure: "
                                "the barometer left out"))
pu.add("NPr", "NPSH required (maker, invented)", "NPSHr", 4.5, "m")
pu.add("NPm", "NPSH margin", "ΔNPSH", "={NPa}-{NPr}", "m")
pu.heading("Line to the jetty")
pu.add("Lj", "Line length, equivalent", "L", 850, "m")
pu.add("Dj", "Line bore", "D", 381, "mm")
pu.add("nu", "Kinematic viscosity at 55 °C (invented)", "ν", 380, "cSt")
pu.add("vj", "Line velocity", "v", "={Q}/3600/(PI()*({Dj}/1000)^2/4)", "m/s")
pu.add("Re", "Reynolds number", "Re", "={vj}*({Dj}/1000)/({nu}*0.000001)", "-")
pu.add("f", "Friction factor, laminar", "f", "=64/{Re}", "-")
pu.add("dpj", "Line friction loss", "Δp_j", "={f}*{Lj}/({Dj}/1000)*{Tank.rho}*{vj}^2/2/1000",
       "kPa")
PUS = pu.finish((tk,))
TKS = tk.finish()

OILB = {
    "trade": "oil terminal: tank heat loss and steam coil, loading pumps, NPSH and line loss",
    "sheets": [("Tank", TKS), ("Pumps", PUS)],
    "planted": {**tk.planted, **pu.planted},
}

BOOKS = {"hotel-dhw-harbourlight": HOTB, "aeration-otterburn-ings": AERB,
         "crane-portal-brackenfold": STEELB, "terminal-kittiwake-point": OILB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()

# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.
