#!/usr/bin/env python3
"""Four review workbooks for plumb's workbook checker (review25), written with the standard
zipfile module (corpus/sheets/xlsx_writer.py and item_sheet.py, shared by the review books).

Trades: a greenhouse fertigation sheet; a boiler feedwater chemistry sheet; a data centre PUE and
cooling sheet; a sewage pump station wet well cycle sheet. Invented scenario: every site, reading
and catalogue figure is invented, for demonstration only. Formulas and published factors carry
their sources in a text cell at the top of each sheet.

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Run: python3 make_books.py  ->  *.xlsx, *.cells.plumb, *.expect, expect.json here
"""
import json
import os
import re
import sys

HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, HERE)
sys.path.insert(0, os.path.dirname(HERE))
from item_sheet import ItemSheet, write_books  # noqa: E402 (shared in corpus/sheets)

CAUTION = ("Invented scenario, data for demonstration only. A dimensionally consistent formula can "
           "still be wrong; this check does not replace independent review under local codes and "
           "licensed practice.")
ItemSheet.caution = CAUTION


# ============================================================================================
# Book 1: greenhouse fertigation (L/h and gal/h, mS/cm and µS/cm, ppm and mmol/L, 1:100 stock)
# ============================================================================================
FERT_SRC = (
    "Sources: ppm taken as mg/L in dilute nutrient solution and mmol/L = (mg/L)/(g/mol): common "
    "practice; standard atomic weights N 14.007, K 39.098, Ca 40.078 g/mol (IUPAC 2021 abridged "
    "values, from memory); 1 mS/cm = 1000 µS/cm (SI Brochure 9th ed., Table 7 prefixes); 1 US "
    "gal = 3.785 L (NIST SP 811 (2008) App. B.8); fertiliser needed in drip water = nutrient "
    "target / (nutrient content/100), stock strength = drip strength × dilution ratio (1:100 "
    "injector), common practice (from memory of Sonneveld & Voogt, Plant Nutrition of Greenhouse "
    "Crops, Springer 2009, ch. 13). Fertiliser nutrient contents: label values from memory "
    "(calcium nitrate 15.5 % N, 19 % Ca; potassium nitrate 13 % N, 38 % K). Added EC = target "
    "EC − raw water EC: common practice. Data invented.")
fe = ItemSheet("Mix", "Brackenfold Nurseries house 3, tomato fertigation recipe "
               "(invented scenario)", FERT_SRC)
fe.add("ECraw", "Raw water EC (borehole)", "EC_raw", 420, "µS/cm")
fe.add("ECrawm", "Raw water EC", "EC_raw,mS", "={ECraw}/1000", "mS/cm")
fe.add("ECt", "Target drip EC", "EC_t", 2.6, "mS/cm")
fe.add("ECadd", "EC to be added by fertiliser", "EC_add", "={ECt}-{ECrawm}", "mS/cm")
fe.add("ECadd2", "EC to be added (dosing computer setpoint)", "EC_add2", "={ECt}-{ECraw}",
       "mS/cm", planted=("unit-scale", "raw water EC in µS/cm subtracted from a target in mS/cm"))
fe.add("ECtu", "Target drip EC, µS/cm (handheld meter)", "EC_t,µS", "={ECt}*1000", "µS/cm")
fe.add("Nt", "Nitrogen target (nitrate N)", "N_t", 190, "ppm")
fe.add("MN", "Atomic weight of N", "M_N", 14.007, "g/mol")
fe.add("Nmm", "Nitrogen target, mmol/L", "N_t,mmol", "={Nt}/{MN}", "mmol/L")
fe.add("Kt", "Potassium target", "K_t", 280, "ppm")
fe.add("MK", "Atomic weight of K", "M_K", 39.098, "g/mol")
fe.add("Kmm", "Potassium target, mmol/L", "K_t,mmol", "={Kt}/{MK}", "mmol/L")
fe.add("Kmm2", "Potassium target, mmol/L (grower's copy)", "K_t,mmol2", "={Kt}*{MK}", "mmol/L",
       planted=("dimension", "mg/L to mmol/L multiplied by the atomic weight: wrong way round"))
fe.add("KN", "Potassium nitrate", "fert_1", "Potassium nitrate")
fe.add("CN", "Calcium nitrate", "fert_2", "Calcium nitrate")
fe.add("kK", "K content of potassium nitrate", "w_K", "=VLOOKUP({KN},Salts!A5:D8,3,FALSE)", "%")
fe.add("kNk", "N content of potassium nitrate", "w_N1", "=VLOOKUP({KN},Salts!A5:D8,2,FALSE)", "%")
fe.add("kNc", "N content of calcium nitrate", "w_N2", "=VLOOKUP({CN},Salts!A5:D8,2,FALSE)", "%")
fe.add("dKN", "Potassium nitrate in drip water", "c_KN", "={Kt}/({kK}/100)", "ppm")
fe.add("NKN", "N supplied by potassium nitrate", "N_KN", "={dKN}*{kNk}/100", "ppm")
fe.add("NKN2", "N supplied by potassium nitrate (check)", "N_KN2", "={dKN}*{kNk}", "ppm",
       planted=("unit-scale", "13 % used as 13 (percentage as a fraction): 100 too large"))
fe.add("Nrest", "N still needed from calcium nitrate", "N_rest", "=MAX({Nt}-{NKN},0)", "ppm")
fe.add("dCN", "Calcium nitrate in drip water", "c_CN", "={Nrest}/({kNc}/100)", "ppm")
fe.add("R", "Injector dilution ratio (1:R)", "R", 100, "-")
fe.add("Vt", "Stock tank volume (each of A and B)", "V_t", 1000, "L")
fe.add("sKN", "Potassium nitrate, stock strength", "s_KN", "={dKN}*{R}/1000", "g/L")
fe.add("sCN", "Calcium nitrate, stock strength", "s_CN", "={dCN}*{R}/1000", "g/L")
fe.add("mKN", "Potassium nitrate to weigh into tank B", "m_KN", "={sKN}*{Vt}/1000", "kg")
fe.add("mCN", "Calcium nitrate to weigh into tank A", "m_CN", "={sCN}*{Vt}/1000", "kg")
fe.add("mCN2", "Calcium nitrate to weigh (mixing sheet)", "m_CN2", "={sCN}*{Vt}", "kg",
       planted=("unit-scale", "g/L × L gives g, written as kg: 1000 too large"))
fe.add("Q", "Irrigation flow, all valves open", "Q", "=Zones!E10", "L/h")
fe.add("Qg", "Irrigation flow, gal/h (injector catalogue)", "Q_gal", "={Q}/3.785", "gal/h")
fe.add("qs", "Stock draw per injector", "q_s", "={Q}/{R}", "L/h")
fe.add("qsg", "Stock draw per injector, gal/h", "q_s,gal", "={qs}*3.785", "gal/h",
       planted=("unit-scale", "L/h to gal/h multiplied by 3.785: wrong way round"))
fe.add("tt", "Stock tank lasts", "t_t", "={Vt}/{qs}", "h")
fe.add("td", "Irrigation run time per day (summer)", "t_d", 95, "min/d")
fe.add("Vd", "Drip water per day", "V_d", "={Q}*{td}/60/1000", "m³/d")
fe.add("Vd2", "Drip water per day (water budget)", "V_d2", "={Q}*{td}/1000", "m³/d",
       planted=("unit-scale", "L/h × min without /60: 60 too large"))
fe.add("days", "Days per tank fill", "n_fill", "={tt}/({td}/60)", "d")
fe.add("ECchk", "Setpoint check (EC at most 3.5 mS/cm)", "chk",
       "=IF({ECt}<=3.5,\"OK\",\"CHECK\")")
MIX = fe.finish()

ZONES = {
    "A1": "Brackenfold house 3: drip zones (invented layout)",
    "A2": ("Sources: zone flow = emitters × emitter flow; 1 US gal = 3.785 L (NIST SP 811 (2008) "
           "App. B.8); emitter rating 2 L/h pressure compensating (invented catalogue)."),
    "A3": CAUTION,
    "A4": "Zone", "B4": "Emitters [-]", "C4": "Emitter flow [L/h]", "D4": "Emitter flow [gal/h]",
    "E4": "Zone flow [L/h]", "F4": "Zone flow [gal/h]",
    "A10": "Total / mean",
    "B10": "=SUM(B5:B9)", "C10": "=AVERAGE(C5:C9)", "E10": "=SUM(E5:E9)", "F10": "=SUM(F5:F9)",
}
for r, (z, n, q) in enumerate([("3A", 1440, 2.0), ("3B", 1440, 2.0), ("3C", 1200, 2.0),
                               ("3D", 1200, 1.6), ("3E", 960, 2.3)], start=5):
    ZONES[f"A{r}"], ZONES[f"B{r}"], ZONES[f"C{r}"] = z, n, q
    ZONES[f"D{r}"] = f"=C{r}/3.785"
    ZONES[f"E{r}"] = f"=B{r}*C{r}"
    ZONES[f"F{r}"] = f"=E{r}/3.785"
ZONES["F8"] = "=B8*C8"                 # planted: L/h figure under gal/h
ZONES["C11"] = "=MAX(C5:D9)"           # planted: max over the L/h and gal/h columns
ZONES["A11"] = "Largest emitter"
ZONES["D11"] = "L/h"

SALTS = {
    "A1": "Fertiliser salts: nutrient content by mass (label values from memory; check the bag)",
    "A4": "Fertiliser", "B4": "N [%]", "C4": "K [%]", "D4": "Ca [%]",
}
for r, row in enumerate([("Calcium nitrate", 15.5, 0, 19), ("Potassium nitrate", 13, 38, 0),
                         ("Potassium sulphate", 0, 41.5, 0), ("Ammonium nitrate", 34, 0, 0)],
                        start=5):
    for c, v in zip("ABCD", row):
        SALTS[f"{c}{r}"] = v

FERT = {
    "trade": "horticulture: greenhouse fertigation recipe and stock tanks",
    "sheets": [("Mix", MIX), ("Zones", ZONES), ("Salts", SALTS)],
    "planted": {**fe.planted,
                "Zones!F8": ("unit-scale", "zone flow in L/h written under gal/h: 3.785 too "
                             "large"),
                "Zones!C11": ("mixed-range", "largest emitter taken over the L/h and gal/h "
                              "columns together")},
}

# ============================================================================================
# Book 2: boiler feedwater chemistry (gpm and m³/h, ppm, lb/day and kg/d, blowdown %)
# ============================================================================================
BOIL_SRC = (
    "Sources: 1 gpm = 0.2271 m³/h and 1 US gal = 3.785 L (NIST SP 811 (2008) App. B.8); the "
    "pounds formula lb/d = Mgal/d × ppm × 8.34 lb/gal, and 500 lb/h per gpm of water (8.34 × "
    "60): common practice; 1 ppm = 1 g/m³ in water (common practice); cycles of concentration "
    "= blowdown conductivity / feedwater conductivity, blowdown = feed / cycles, sodium sulphite "
    "7.88 ppm per ppm of dissolved O2 (2 × 126.04 / 32.00) plus residual / cycles: Nalco Water "
    "Handbook 3rd ed. (2009) ch. 11-12 (from memory); 14.7 psi standard atmosphere and 1 psi = "
    "6.895 kPa (NIST SP 811 (2008) App. B.8); t/°C = (t/°F − 32)/1.8 (NIST SP 811 (2008) "
    "App. B.8); 1 kW = 3412 Btu/h (NIST SP 811 (2008) App. B.8: 1 Btu_IT/h = 0.2931 W); water "
    "c_p 4.186 kJ/(kg·K) (common practice); blowdown and make-up enthalpies from steam tables "
    "(ASME Steam Tables 8th ed., from memory). Plant data invented.")
bo = ItemSheet("Feed", "Harrowgate Mill boiler house, boiler no. 2: feedwater treatment "
               "(invented scenario)", BOIL_SRC)
bo.add("Qf", "Feedwater flow (meter FT-201)", "Q_f", 162, "gpm")
bo.add("Qfm", "Feedwater flow, m³/h", "Q_f,m3h", "={Qf}*0.2271", "m³/h")
bo.add("Qfm2", "Feedwater flow, m³/h (vendor datasheet)", "Q_f,m3h2", "={Qf}/0.2271", "m³/h",
       planted=("unit-scale", "gpm to m³/h divided by 0.2271: wrong way round"))
bo.add("cyc", "Cycles of concentration (lab, week mean)", "N_c", "=Lab!F12", "-")
bo.add("bd", "Blowdown, share of feed", "b", "=100/{cyc}", "%")
bo.add("Qb", "Blowdown flow", "Q_b", "={Qf}*{bd}/100", "gpm")
bo.add("Qb2", "Blowdown flow (operator log)", "Q_b2", "={Qf}*{bd}", "gpm",
       planted=("unit-scale", "blowdown in % used as a fraction: 100 too large"))
bo.add("Qs", "Steam raised (as water)", "Q_s", "={Qf}-{Qb}", "gpm")
bo.add("msteam", "Steam raised", "m_s", "={Qs}*500", "lb/h")
bo.add("O2", "Dissolved O2 leaving the deaerator", "c_O2", 0.007, "ppm")
bo.add("res", "Sulphite residual held in the boiler", "c_res", 30, "ppm")
bo.add("dose", "Sodium sulphite dose, on feed", "c_dose", "=7.88*{O2}+{res}/{cyc}", "ppm")
bo.add("lbd", "Sodium sulphite use (as 100 %)", "m_lb", "={Qf}*1440/10^6*{dose}*8.34", "lb/d")
bo.add("kgd", "Sodium sulphite use (as 100 %), kg/d", "m_kg", "={Qfm}*24*{dose}/1000", "kg/d")
bo.add("kgd2", "Sodium sulphite use, kg/d (from lb/d)", "m_kg2", "={lbd}*2.205", "kg/d",
       planted=("unit-scale", "lb/d to kg/d multiplied by 2.205: wrong way round"))
bo.add("str", "Product strength (catalysed sulphite solution)", "w_p", 38, "%")
bo.add("prod", "Product use", "m_p", "={kgd}/({str}/100)", "kg/d")
bo.add("SG", "Product specific gravity", "SG", 1.32, "-")
bo.add("prodL", "Product use, by volume", "V_p", "={prod}/{SG}", "L/d")
bo.add("drum", "Drum size", "V_drum", 208, "L")
bo.add("ddays", "Days per drum", "t_drum", "={drum}/{prodL}", "d")
bo.add("pda", "Deaerator pressure (gauge PI-205)", "p_da", 5, "psig")
bo.add("pdaa", "Deaerator pressure, absolute", "p_da,a", "={pda}+14.7", "psia")
bo.add("pdak", "Deaerator pressure, kPa (absolute, for steam tables)", "p_da,kPa",
       "=({pda}+14.7)*6.895", "kPa")
bo.add("pdak2", "Deaerator pressure, kPa abs (rev. A)", "p_da,kPa2", "={pda}*6.895", "kPa",
       planted=("offset-scale", "gauge reading converted without the atmosphere, written as "
                "absolute kPa"))
bo.add("Tfw", "Feedwater temperature (TI-206)", "t_fw", 227, "°F")
bo.add("Tfwc", "Feedwater temperature, °C", "t_fw,C", "=({Tfw}-32)/1.8", "°C")
bo.add("Tmu", "Make-up water temperature", "t_mu", 12, "°C")
bo.add("Pfw", "Heat to raise make-up to feed temperature", "P_fw",
       "={Qfm}*1000/3600*4.186*({Tfwc}-{Tmu})", "kW")
bo.add("Pfw2", "Heat to feed (first draft)", "P_fw2", "={Qfm}*1000/3600*4.186*{Tfwc}", "kW",
       planted=("offset-scale", "feed temperature in °C where the rise over make-up belongs"))
bo.add("hbd", "Enthalpy of blowdown (sat. liquid, 150 psig)", "h_bd", 338, "Btu/lb")
bo.add("hmu", "Enthalpy of make-up", "h_mu", 22, "Btu/lb")
bo.add("mbd", "Blowdown mass flow", "m_bd", "={Qb}*500", "lb/h")
bo.add("Qbl", "Heat lost in blowdown", "Q_bd", "={mbd}*({hbd}-{hmu})", "Btu/h")
bo.add("Pbl", "Heat lost in blowdown, kW", "P_bd", "={Qbl}/3412", "kW")
bo.add("Pbl2", "Heat lost in blowdown, kW (energy audit)", "P_bd2", "={Qbl}*3412", "kW",
       planted=("unit-scale", "Btu/h to kW multiplied by 3412: wrong way round"))
bo.add("bchk", "Blowdown check (within 2 - 10 %)", "chk",
       "=IF(AND({bd}>=2,{bd}<=10),\"OK\",\"ADJUST\")")
FEED = bo.finish()

LAB = {
    "A1": "Harrowgate Mill boiler no. 2: daily lab readings, week 14 (invented)",
    "A2": ("Sources: cycles = blowdown conductivity / feedwater conductivity; blowdown % = 100 / "
           "cycles (Nalco Water Handbook 3rd ed. (2009) ch. 12, from memory); 1 gpm = 0.2271 "
           "m³/h (NIST SP 811 (2008) App. B.8); 1 mS/cm = 1000 µS/cm (SI Brochure 9th ed., "
           "Table 7)."),
    "A3": CAUTION,
    "A4": "Day", "B4": "Feed [gpm]", "C4": "Feed [m³/h]", "D4": "Feed conductivity [µS/cm]",
    "E4": "Blowdown conductivity [mS/cm]", "F4": "Cycles [-]", "G4": "Blowdown [%]",
    "A12": "Week mean", "B12": "=AVERAGE(B5:B11)", "C12": "=AVERAGE(C5:C11)",
    "D12": "=AVERAGE(D5:D11)", "E12": "=AVERAGE(E5:E11)", "F12": "=AVERAGE(F5:F11)",
    "G12": "=AVERAGE(G5:G11)",
}
for r, (d, q, cf, cb) in enumerate([("Mon", 158, 92, 3.10), ("Tue", 165, 95, 3.25),
                                    ("Wed", 160, 90, 3.05), ("Thu", 171, 97, 3.40),
                                    ("Fri", 166, 94, 3.30), ("Sat", 150, 91, 2.95),
                                    ("Sun", 148, 89, 2.90)], start=5):
    LAB[f"A{r}"], LAB[f"B{r}"], LAB[f"D{r}"], LAB[f"E{r}"] = d, q, cf, cb
    LAB[f"C{r}"] = f"=B{r}*0.2271"
    LAB[f"F{r}"] = f"=E{r}*1000/D{r}"
    LAB[f"G{r}"] = f"=100/F{r}"
LAB["F8"] = "=E8/D8"                  # planted: mS/cm over µS/cm, 1000 missing
LAB["G10"] = "=1/F10"                 # planted: fraction written in the % column

BOIL = {
    "trade": "steam: boiler feedwater chemistry and blowdown",
    "sheets": [("Feed", FEED), ("Lab", LAB)],
    "planted": {**bo.planted,
                "Lab!F8": ("unit-scale", "cycles from mS/cm over µS/cm without ×1000: 1000 too "
                           "small"),
                "Lab!G10": ("unit-scale", "1/cycles (a fraction) written in the % column: 100 "
                            "too small")},
}

# ============================================================================================
# Book 3: data centre PUE and cooling (kW, tons and kW, cfm and m³/h, °F and °C)
# ============================================================================================
DC_SRC = (
    "Sources: PUE = total facility power / IT equipment power (ISO/IEC 30134-2:2016); 1 ton of "
    "refrigeration = 12 000 Btu/h = 3.517 kW and 1 kW = 3412 Btu/h (NIST SP 811 (2008) App. "
    "B.8); sensible heat Q[Btu/h] = 1.08 × cfm × ΔT[°F] for standard air (0.075 lb/ft³ × 0.24 "
    "Btu/(lb·°F) × 60 min/h; ASHRAE Handbook—Fundamentals (2017) ch. 18, from memory); 1 cfm = "
    "1.699 m³/h (NIST SP 811 (2008) App. B.8); t/°C = (t/°F − 32)/1.8 and T/K = t/°C + 273.15 "
    "(NIST SP 811 (2008) App. B.8); air density ρ = p/(R·T) with R = 287 J/(kg·K) and c_p = "
    "1.006 kJ/(kg·K) (ISO 2533:1975 gives 287.05; common practice); ASHRAE TC 9.9 recommended "
    "inlet range 18–27 °C (64.4–80.6 °F) (Thermal Guidelines for Data Processing Environments "
    "5th ed., from memory). Loads and plant data invented.")
dc = ItemSheet("Load", "Northgate Data Hall 2: PUE and cooling check (invented scenario)", DC_SRC)
dc.add("IT", "IT load (racks sheet)", "P_IT", "=Racks!E11", "kW")
dc.add("ups", "UPS efficiency at this load", "eta_ups", 94.5, "%")
dc.add("upsin", "UPS input power", "P_ups,in", "={IT}/({ups}/100)", "kW")
dc.add("upsl", "UPS and distribution loss", "P_ups,loss", "={upsin}-{IT}", "kW")
dc.add("light", "Lighting and small power, hall", "P_light", 6800, "W")
dc.add("Qc", "Heat to be removed from the hall", "Q_c", "={IT}+{upsl}+{light}/1000", "kW")
dc.add("Qt", "Cooling load", "Q_c,tons", "={Qc}/3.517", "tons")
dc.add("Qt2", "Cooling load (chiller enquiry)", "Q_c,tons2", "={Qc}*3.517", "tons",
       planted=("unit-scale", "kW to tons multiplied by 3.517: wrong way round"))
dc.add("kwt", "Chiller efficiency at part load", "k_ch", 0.58, "kW/ton")
dc.add("Pch", "Chiller power", "P_ch", "={Qt}*{kwt}", "kW")
dc.add("Pcrah", "CRAH fan power (sum of units)", "P_crah", "=SUM(Crah!D5:D10)", "kW")
dc.add("Ppump", "Chilled water and condenser pumps", "P_pump", 38, "kW")
dc.add("Pct", "Cooling tower fans", "P_ct", 22, "kW")
dc.add("Ptot", "Total facility power", "P_tot",
       "={upsin}+{light}/1000+{Pch}+{Pcrah}+{Ppump}+{Pct}", "kW")
dc.add("Ptot2", "Total facility power (monthly report)", "P_tot2",
       "={upsin}+{light}+{Pch}+{Pcrah}+{Ppump}+{Pct}", "kW",
       planted=("unit-scale", "lighting in W added to kW terms"))
dc.add("PUE", "Power usage effectiveness", "PUE", "={Ptot}/{IT}", "-")
dc.add("PUEc", "PUE check (design target 1.4)", "chk", "=IF({PUE}<=1.4,\"OK\",\"ABOVE TARGET\")")
dc.add("Ts", "Supply air temperature (CRAH setpoint)", "t_s", 68, "°F")
dc.add("Tr", "Return air temperature (hot aisle)", "t_r", 92, "°F")
dc.add("dT", "Air temperature rise across the IT", "ΔT", "={Tr}-{Ts}", "Δ°F")
dc.add("cfm", "Airflow needed by the IT load", "V_air", "={Qc}*3412/(1.08*{dT})", "cfm")
dc.add("cfm2", "Airflow needed (quick check)", "V_air2", "={Qc}/(1.08*{dT})", "cfm",
       planted=("unit-scale", "kW put in the 1.08 formula, which wants Btu/h: 3412 missing"))
dc.add("m3h", "Airflow needed, m³/h", "V_air,m3h", "={cfm}*1.699", "m³/h")
dc.add("m3h2", "Airflow needed, m³/h (EU contractor)", "V_air,m3h2", "={cfm}*0.4719", "m³/h",
       planted=("unit-scale", "cfm × 0.4719 gives L/s, written as m³/h: 3.6 too small"))
dc.add("Tsc", "Supply air temperature, °C", "t_s,C", "=({Ts}-32)/1.8", "°C")
dc.add("Trc", "Return air temperature, °C", "t_r,C", "=({Tr}-32)/1.8", "°C")
dc.add("dTk", "Air temperature rise, K", "ΔT_K", "={dT}/1.8", "K")
dc.add("rho", "Supply air density (sea level)", "rho", "=101325/(287*({Tsc}+273.15))", "kg/m³")
dc.add("rho2", "Supply air density (rev. A)", "rho_2", "=101325/(287*{Tsc})", "kg/m³",
       planted=("offset-scale", "ideal gas density with the temperature in °C, not K"))
dc.add("m3s", "Airflow needed, SI check", "V_air,SI", "={Qc}/({rho}*1.006*{dTk})", "m³/s")
dc.add("m3s2", "Airflow needed, SI check (rev. A)", "V_air,SI2", "={Qc}/({rho}*1.006*{Trc})",
       "m³/s", planted=("offset-scale", "return temperature in °C where the rise in K belongs"))
dc.add("inlet", "Inlet in ASHRAE recommended range", "chk_in",
       "=IF(AND({Tsc}>=18,{Tsc}<=27),\"OK\",\"OUT OF RANGE\")")
LOAD = dc.finish()

RACKS = {
    "A1": "Northgate Data Hall 2: rack rows (invented layout)",
    "A2": ("Sources: row load = racks × design load per rack (Rack types table); row airflow = "
           "kW × 3412 / (1.08 × ΔT) with ΔT from the Load sheet; 1 cfm = 1.699 m³/h (NIST SP "
           "811 (2008) App. B.8; ASHRAE Handbook—Fundamentals (2017), from memory)."),
    "A3": CAUTION,
    "A4": "Row", "B4": "Racks [-]", "C4": "Rack type", "D4": "Load per rack [kW]",
    "E4": "Row load [kW]", "F4": "Row airflow [cfm]", "G4": "Row airflow [m³/h]",
    "A11": "Total", "B11": "=SUM(B5:B10)", "E11": "=SUM(E5:E10)", "F11": "=SUM(F5:F10)",

    "A12": "Mean load per rack", "D12": "=E11/B11", "E12": "kW",
    "A14": "Type", "B14": "Design load [kW]",
}
for r, (row, n, t) in enumerate([("A", 20, "Standard"), ("B", 20, "Standard"), ("C", 16, "Dense"),
                                 ("D", 16, "Dense"), ("E", 10, "GPU"), ("F", 12, "Storage")],
                                start=5):
    RACKS[f"A{r}"], RACKS[f"B{r}"], RACKS[f"C{r}"] = row, n, t
    RACKS[f"D{r}"] = f"=VLOOKUP(C{r},$A$15:$B$18,2,FALSE)"
    RACKS[f"E{r}"] = f"=B{r}*D{r}"
    RACKS[f"F{r}"] = f"=E{r}*3412/(1.08*{dc.ref('dT')})"
    RACKS[f"G{r}"] = f"=F{r}*1.699"
RACKS["G8"] = "=F8/1.699"                                   # planted: wrong way round
RACKS["F9"] = f"=E9*3412/(1.08*{dc.ref('dTk')})"            # planted: ΔT in K in the °F formula
for r, (t, kw) in enumerate([("Standard", 6), ("Dense", 12), ("GPU", 30), ("Storage", 4)],
                            start=15):
    RACKS[f"A{r}"], RACKS[f"B{r}"] = t, kw

CRAH = {
    "A1": "Northgate Data Hall 2: CRAH units (invented nameplate and BMS readings)",
    "A2": "Sources: fan power from BMS; 1 cfm = 1.699 m³/h (NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A4": "Unit", "B4": "Airflow [m³/h]", "C4": "Airflow [cfm]", "D4": "Fan power [kW]",
    "A11": "Total", "C11": "=SUM(C5:C10)", "D11": "=SUM(D5:D10)",
    "A12": "Airflow margin over need", "C12": "=C11/" + dc.ref("cfm") + "*100", "D12": "%",
}
for r, (u, q, p) in enumerate([("CRAH-1", 38000, 6.1), ("CRAH-2", 38000, 6.3),
                               ("CRAH-3", 38000, 5.9), ("CRAH-4", 38000, 6.0),
                               ("CRAH-5", 38000, 6.2)], start=5):
    CRAH[f"A{r}"], CRAH[f"B{r}"], CRAH[f"D{r}"] = u, q, p
    CRAH[f"C{r}"] = f"=B{r}/1.699"

DC = {
    "trade": "data centre: PUE, cooling load and airflow",
    "sheets": [("Load", LOAD), ("Racks", RACKS), ("Crah", CRAH)],
    "planted": {**dc.planted,
                "Racks!G8": ("unit-scale", "cfm to m³/h divided by 1.699: wrong way round"),
                "Racks!F9": ("unit-scale", "temperature rise in K put in the 1.08 °F formula: "
                             "airflow 1.8 too large")},
}

# ============================================================================================
# Book 4: sewage pump station wet well cycle (L/s and gpm, m³ and US gal, min, starts/h)
# ============================================================================================
PS_SRC = (
    "Sources: minimum active volume V = θ·q/4 for one constant-speed pump (θ = minimum cycle "
    "time, q = pump rate), cycle time t = V/(q − Q) + V/Q: Metcalf & Eddy, Wastewater "
    "Engineering: Collection and Pumping of Wastewater (1981) ch. 9, and Jones et al., Pumping "
    "Station Design 3rd ed. (2008) ch. 12 (from memory); at most 6 starts per hour for small "
    "submersibles: common practice, check with the pump maker; 1 gpm = 0.0631 L/s, 1 L/s = "
    "15.85 gpm, 1 m³ = 264.2 US gal, 1 L/s = 3.6 m³/h (NIST SP 811 (2008) App. B.8); peaking "
    "factor from the sewer authority's design table (invented). Emergency storage 2 h at "
    "average flow: common practice (from memory of Ten States Standards 2014 ed. §42). "
    "Flows, levels and pump data invented.")
ps = ItemSheet("WetWell", "Ashby Fen pumping station PS-7: wet well and cycle check "
               "(invented scenario)", PS_SRC)
ps.add("Qa", "Average dry weather inflow", "Q_a", 14.2, "L/s")
ps.add("Qag", "Average dry weather inflow, gpm", "Q_a,gpm", "={Qa}*15.85", "gpm")
ps.add("Qag2", "Average inflow, gpm (US pump rep)", "Q_a,gpm2", "={Qa}*0.0631", "gpm",
       planted=("unit-scale", "L/s to gpm multiplied by 0.0631: wrong way round"))
ps.add("PF", "Peaking factor (authority table)", "PF", 3.2, "-")
ps.add("Qpk", "Peak wet weather inflow", "Q_pk", "={Qa}*{PF}", "L/s")
ps.add("model", "Pump (duty/standby pair)", "model", "FP-80")
ps.add("Qp", "Pump rate at duty point", "q", "=VLOOKUP({model},Pumps!A5:D8,2,FALSE)", "L/s")
ps.add("Qpg", "Pump rate, gpm", "q_gpm", "={Qp}/0.0631", "gpm")
ps.add("pchk", "Pump capacity check", "chk_q", "=IF({Qp}>={Qpk},\"OK\",\"UNDERSIZED\")")
ps.add("nmax", "Maximum starts per hour", "n_max", 6, "starts/h")
ps.add("th", "Minimum cycle time", "theta", "=60/{nmax}", "min")
ps.add("V", "Active volume required", "V_req", "={th}*60*{Qp}/1000/4", "m³")
ps.add("V2", "Active volume required (hand calc)", "V_req2", "={th}*{Qp}/4", "m³",
       planted=("unit-scale", "min × L/s without ×60/1000: 16.7 too large"))
ps.add("Vg", "Active volume required, US gal", "V_gal", "={V}*264.2", "gal")
ps.add("Vg2", "Active volume, US gal (submittal)", "V_gal2", "={V}*7.481", "gal",
       planted=("unit-scale", "m³ to gal with the gal-per-ft³ factor 7.481: should be 264.2"))
ps.add("D", "Wet well inside diameter", "D", 2400, "mm")
ps.add("A", "Wet well plan area", "A", "=PI()*({D}/1000)^2/4", "m²")
ps.add("h", "Pump on to pump off depth", "h", "={V}/{A}", "m")
ps.add("hset", "Set depth, rounded up to 50 mm", "h_set", "=CEILING({h}*1000,50)", "mm")
ps.add("Vset", "Active volume provided", "V_set", "={A}*{hset}/1000", "m³")
ps.add("Vset2", "Active volume provided (level sheet)", "V_set2", "={A}*{hset}", "m³",
       planted=("unit-scale", "set depth in mm used as m: 1000 too large"))
ps.add("tmin", "Shortest cycle (cycles sheet)", "t_min", "=MIN(Cycles!F5:F10)", "min")
ps.add("smax", "Most starts per hour (cycles sheet)", "n_s", "=MAX(Cycles!G5:G10)", "starts/h")
ps.add("schk", "Starts check", "chk_n", "=IF({smax}<={nmax},\"OK\",\"TOO MANY\")")
ps.add("tem", "Emergency storage time at average flow", "t_em", 2, "h")
ps.add("Vem", "Emergency storage volume", "V_em", "={Qa}*3.6*{tem}", "m³")
ps.add("Vem2", "Emergency storage volume (rev. A)", "V_em2", "={Qa}*3.6*{tem}*3600/1000", "m³",
       planted=("unit-scale", "L/s to m³ converted twice (3.6 and 3600/1000): 3.6 too large"))
ps.add("Vemg", "Emergency storage volume, US gal", "V_em,gal", "={Vem}*264.2", "gal")
WETWELL = ps.finish()

CYC = {
    "A1": "Ashby Fen PS-7: fill, run and cycle times over the inflow range",
    "A2": ("Sources: fill = V/Q, run = V/(q − Q), cycle = fill + run, starts = 60/cycle (Metcalf "
           "& Eddy 1981 ch. 9, from memory); 1 L/s = 15.85 gpm (NIST SP 811 (2008) App. B.8). "
           "The shortest cycle falls at Q = q/2."),
    "A3": CAUTION,
    "A4": "Case", "B4": "Inflow [L/s]", "C4": "Inflow [gpm]", "D4": "Fill time [min]",
    "E4": "Run time [min]", "F4": "Cycle time [min]", "G4": "Starts [starts/h]",
}
V, q = ps.ref("Vset"), ps.ref("Qp")
for r, (case, frac) in enumerate([("Night low", 0.15), ("Average", 0.25), ("Q = q/2", 0.5),
                                  ("Morning peak", 0.6), ("Storm", 0.8), ("Near capacity", 0.9)],
                                 start=5):
    RQ = round(frac * 46, 1)
    CYC[f"A{r}"], CYC[f"B{r}"] = case, RQ
    CYC[f"C{r}"] = f"=B{r}*15.85"
    CYC[f"D{r}"] = f"={V}/(B{r}/1000)/60"
    CYC[f"E{r}"] = f"={V}/(({q}-B{r})/1000)/60"
    CYC[f"F{r}"] = f"=D{r}+E{r}"
    CYC[f"G{r}"] = f"=60/F{r}"
CYC["D8"] = f"={V}/(C8/1000)/60"         # planted: inflow in gpm used as L/s
CYC["E9"] = f"={V}/(({q}-B9)/1000)"      # planted: seconds written as minutes
CYC["G10"] = "=1/F10"                    # planted: starts per minute under starts/h

PUMPS = {
    "A1": "Submersible sewage pumps, duty point on this station's system curve (invented)",
    "A4": "Model", "B4": "Flow [L/s]", "C4": "Head [m]", "D4": "Motor [kW]",
}
for r, row in enumerate([("FP-60", 32, 14.5, 7.5), ("FP-80", 46, 15.2, 11),
                         ("FP-100", 61, 16.0, 15), ("FP-120", 78, 17.1, 22)], start=5):
    for c, v in zip("ABCD", row):
        PUMPS[f"{c}{r}"] = v

PS = {
    "trade": "wastewater: sewage pump station wet well cycle",
    "sheets": [("WetWell", WETWELL), ("Cycles", CYC), ("Pumps", PUMPS)],
    "sidecar": ("# Invented scenario. A dimensionally consistent formula can still be wrong; this\n"
                "# check does not replace independent review under local codes and licensed practice.\n"
                "# Ashby Fen PS-7: the trade's counting word in 'starts/h' (common practice).\n"
                "measure starts = 1 1 \"a pump start (a count)\"\n"),
    "planted": {**ps.planted,
                "Cycles!D8": ("unit-scale", "fill time with the inflow in gpm used as L/s"),
                "Cycles!E9": ("unit-scale", "run time in s written under min: 60 too large"),
                "Cycles!G10": ("unit-scale", "1/cycle gives starts per minute, written as "
                               "starts/h: 60 too small")},
}

BOOKS = {"fertigation": FERT, "boiler-feedwater": BOIL, "datacentre-pue": DC,
         "wetwell-cycle": PS}

EXTRA = {}    # stem -> list of (comment, "Sheet!Cell rule")
MISSED = {}   # stem -> {"Sheet!Cell": "why"}
RENAMED = {}  # stem -> {"Sheet!Cell": rule plumb names}
RENOTE = {}   # "Sheet!Cell" -> a further comment on how plumb reports a planted cell
try:
    from review_notes import EXTRA, MISSED, RENAMED, RENOTE  # noqa: F401,F811
except ImportError:
    pass


def main():
    write_books(HERE, BOOKS, {"EXTRA": EXTRA, "MISSED": MISSED, "RENAMED": RENAMED, "RENOTE": RENOTE})


if __name__ == "__main__":
    main()
