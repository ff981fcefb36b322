#!/usr/bin/env python3
"""Four review workbooks for plumb's workbook checking (review33), written with the standard
zipfile module (xlsx_writer.py, copied from corpus/sheets/review2 and extended).

Trades (all scenarios, firms and sites invented):
  1. boiler-house-steam: a creamery boiler house steam balance (steam table VLOOKUPs, kg/h and
     lb/h, kW and Btu/h, feedwater °C and °F, blowdown %, gas in Nm³/h and therms);
  2. chilled-water-plant: a data hall chilled water plant (TR and kW, gpm and L/s, ΔT °F and K,
     kW/ton, pump head ft and kPa, cooling tower range and approach);
  3. retaining-wall: a cantilever retaining wall and footing (Rankine Ka, unit weight kN/m³ and
     pcf, surcharge kPa and psf, overturning and sliding factors of safety, bearing pressure);
  4. compressed-air: a foundry compressed air survey (scfm and Nm³/min, psig and bar g,
     compressor kW and hp, receiver V = t·Q·p_a/(p1 − p2), leak rate %).

Every formula cell is either a planted mistake (PLANTED, with the rule expected) or a correct
cell that must stay clean.

Run: python3 make_books.py  ->  *.xlsx, *.expect, expect.json in this folder
"""
import json
import os

from xlsx_writer import write_xlsx

HERE = os.path.dirname(os.path.abspath(__file__))

# ============================================================================================
# Book 1: Harrowgate Creamery boiler house steam balance (Fenwick Lyle Engineers, job 4471)
# ============================================================================================
STEAM_TABLE = {
    "A1": "Saturated steam by gauge pressure. Values from memory, rounded, after IAPWS-IF97 "
          "tables; atmosphere taken as 1.013 bar (common practice).",
    "A3": "p [bar g]", "B3": "p abs [bar a]", "C3": "T sat [°C]", "D3": "h_f [kJ/kg]",
    "E3": "h_fg [kJ/kg]", "F3": "h_g [kJ/kg]", "G3": "v_g [m³/kg]",
}
for i, row in enumerate([
        (0, 100.0, 419.0, 2257.0, 2676.0, 1.673),
        (1, 120.4, 505.6, 2201.1, 2706.7, 0.881),
        (3, 143.8, 605.3, 2133.4, 2738.7, 0.461),
        (5, 158.9, 670.9, 2086.0, 2756.9, 0.315),
        (7, 170.5, 721.4, 2047.7, 2769.1, 0.240),
        (10, 184.1, 781.1, 1998.5, 2779.6, 0.177),
        (14, 198.3, 844.7, 1945.2, 2789.9, 0.132)]):
    r = 4 + i
    STEAM_TABLE[f"A{r}"] = row[0]
    STEAM_TABLE[f"B{r}"] = f"=A{r}+1.013"
    for col, v in zip("CDEFG", row[1:]):
        STEAM_TABLE[f"{col}{r}"] = v

LK = "SteamTable!$A$4:$G$10"
BALANCE = {
    "A1": "Harrowgate Creamery boiler house: steam balance (invented scenario). Fenwick Lyle "
          "Engineers, job 4471, sheet 1 of 2",
    "A2": "Sources: steam properties from sheet SteamTable (from memory, after IAPWS-IF97); heat "
          "to steam Q = m(h_g - h_fw) (common practice); TDS blowdown B = S·c_f/(c_b - c_f) "
          "(common practice, boiler water treatment); flash fraction (h_f1 - h_f2)/h_fg2 "
          "(common practice); from-and-at 100 °C, h_fg = 2257 kJ/kg (steam tables); 1 lb = "
          "0.4536 kg, 1 kW = 3412 Btu/h, 1 Btu/lb = 2.326 kJ/kg (NIST SP 811, B.8); PRV critical "
          "pressure ratio 0.58 for steam (from memory)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Boiler operating pressure", "B4": "p_b", "C4": 10, "D4": "bar g",
    "A5": "Boiler pressure, absolute", "B5": "p_ba", "C5": "=C4+1.013", "D5": "bar a",
    "A6": "Saturation temperature", "B6": "T_s", "C6": f"=VLOOKUP(C4,{LK},3,FALSE)", "D6": "°C",
    "A7": "Enthalpy of dry saturated steam", "B7": "h_g", "C7": f"=VLOOKUP(C4,{LK},6,FALSE)",
    "D7": "kJ/kg",
    "A8": "Enthalpy of boiler water", "B8": "h_fb", "C8": f"=VLOOKUP(C4,{LK},4,FALSE)",
    "D8": "kJ/kg",
    "A9": "Process steam demand (pasteurisers, evaporator)", "B9": "m_p", "C9": 4200,
    "D9": "kg/h",
    "A10": "CIP and washdown", "B10": "m_c", "C10": 650, "D10": "kg/h",
    "A11": "AHU heating coils", "B11": "m_h", "C11": 0.38, "D11": "t/h",
    "A12": "Total steam demand", "B12": "m_s", "C12": "=C9+C10+C11*1000", "D12": "kg/h",
    "A13": "Total steam demand, lb/h", "B13": "m_s,lb", "C13": "=C12*0.4536", "D13": "lb/h",
    "A14": "Feedwater temperature (deaerator outlet)", "B14": "T_fw", "C14": 105, "D14": "°C",
    "A15": "Feedwater temperature, °F", "B15": "T_fw,F", "C15": "=C14*1.8", "D15": "°F",
    "A16": "Feedwater enthalpy (steam tables at 105 °C)", "B16": "h_fw", "C16": 440.2,
    "D16": "kJ/kg",
    "A17": "Heat to steam", "B17": "Q_s", "C17": "=C12*(C7-C16)/3600", "D17": "kW",
    "A18": "Heat to steam, Btu/h", "B18": "Q_s,Btu", "C18": "=C17*3.412", "D18": "Btu/h",
    "A19": "Feedwater TDS", "B19": "c_f", "C19": 180, "D19": "ppm",
    "A20": "Maximum boiler water TDS", "B20": "c_b", "C20": 3000, "D20": "ppm",
    "A21": "Blowdown rate", "B21": "m_bd", "C21": "=C12*C19/(C20-C19)", "D21": "kg/h",
    "A22": "Blowdown rate, lb/h", "B22": "m_bd,lb", "C22": "=C21/0.4536", "D22": "lb/h",
    "A23": "Blowdown, % of feedwater", "B23": "x_bd", "C23": "=ROUND(C21/(C12+C21)*100,1)",
    "D23": "%",
    "A24": "Feedwater flow", "B24": "m_fw", "C24": "=C12+C21", "D24": "kg/h",
    "A25": "Heat lost to blowdown", "B25": "Q_bd", "C25": "=C21*(C8-C16)/3600", "D25": "kW",
    "A26": "Boiler duty", "B26": "Q_b", "C26": "=C17+C25", "D26": "kW",
    "A27": "Boiler duty, Btu/h", "B27": "Q_b,Btu", "C27": "=C26*3412", "D27": "Btu/h",
    "A28": "Condensate return, % of steam", "B28": "x_cr", "C28": 55, "D28": "%",
    "A29": "Make-up water", "B29": "m_mu", "C29": "=C24-C12*C28", "D29": "kg/h",
    "A30": "Process header pressure (after PRV)", "B30": "p_2", "C30": 4, "D30": "bar g",
    "A31": "PRV pressure ratio p2/p1", "B31": "r_prv", "C31": "=C30/C4", "D31": "-",
    "A32": "PRV flow regime", "B32": "regime",
    "C32": "=IF(C31<0.58,\"critical\",\"subcritical\")",
    "A33": "Blowdown flash vessel pressure", "B33": "p_fv", "C33": 1, "D33": "bar g",
    "A34": "Flash steam fraction", "B34": "f_fl",
    "C34": f"=(C8-VLOOKUP(C33,{LK},4,FALSE))/VLOOKUP(C33,{LK},5,FALSE)", "D34": "-",
    "A35": "Flash steam recovered", "B35": "m_fl", "C35": "=C21*C34", "D35": "kg/h",
    "A36": "Flash steam volume flow", "B36": "V_fl", "C36": f"=C35*VLOOKUP(C33,{LK},7,FALSE)/3600",
    "D36": "m³/s",
    "A37": "Enthalpy of steam, Btu/lb", "B37": "h_g,Btu", "C37": "=C7/2.326", "D37": "Btu/lb",
    "A38": "Equivalent evaporation, from and at 100 °C", "B38": "m_FA",
    "C38": "=C12*(C7-C16)/2257", "D38": "kg/h",
}
FUEL = {
    "A1": "Harrowgate Creamery boiler house: fuel (invented scenario). Fenwick Lyle Engineers, "
          "job 4471, sheet 2 of 2",
    "A2": "Sources: fuel input = duty / efficiency (common practice); gross CV of natural gas "
          "39.5 MJ/m³ (from memory, typical UK supply); gas volume at meter V = V_n·T/273.15·"
          "p_n/p (ideal gas, common practice); 1 therm = 100 000 Btu = 29.31 kWh, 1 kW = 3412 "
          "Btu/h (NIST SP 811, B.8); 1 kWh = 3.6 MJ (SI Brochure 9th ed.)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Boiler duty", "B4": "Q_b", "C4": "=Balance!C26", "D4": "kW",
    "A5": "Boiler efficiency (gross CV basis)", "B5": "eta", "C5": 84, "D5": "%",
    "A6": "Fuel input", "B6": "Q_f", "C6": "=C4/(C5/100)", "D6": "kW",
    "A7": "Gross calorific value, natural gas", "B7": "CV", "C7": 39.5, "D7": "MJ/Nm³",
    "A8": "Gas flow", "B8": "V_g", "C8": "=C6/C7", "D8": "Nm³/h",
    "A9": "Fuel input, therms per hour", "B9": "q_th", "C9": "=C6*3412/100000", "D9": "therm/h",
    "A10": "Gas temperature at meter", "B10": "T_m", "C10": 12, "D10": "°C",
    "A11": "Gas pressure at meter", "B11": "p_m", "C11": 21, "D11": "mbar g",
    "A12": "Atmospheric pressure", "B12": "p_atm", "C12": 1013.25, "D12": "mbar",
    "A13": "Gas flow at meter conditions", "B13": "V_m",
    "C13": "=C8*(C10+273.15)/273.15*C12/C11", "D13": "m³/h",
    "A14": "Firing hours per day", "B14": "t_d", "C14": 20, "D14": "h",
    "A15": "Daily fuel energy", "B15": "E_d", "C15": "=C6*C14", "D15": "kWh",
    "A16": "Daily fuel energy, therms", "B16": "E_th", "C16": "=C15/29.31", "D16": "therm",
    "A17": "Daily fuel energy, GJ", "B17": "E_GJ", "C17": "=C15*3.6", "D17": "GJ",
    "A18": "Daily gas volume", "B18": "V_d", "C18": "=C8*C14", "D18": "Nm³",
}

# ============================================================================================
# Book 2: Quayside Data Centre, Hall 2 chilled water plant (Marlow Brandt MEP, calc CW-02)
# ============================================================================================
LOADS = {
    "A1": "Quayside Data Centre, Hall 2: cooling loads (invented scenario). Marlow Brandt MEP, "
          "calc CW-02",
    "A2": "Sources: IT loads from the client brief (invented); fan and UPS losses from the "
          "equipment schedule (invented); 1 TR = 12 000 Btu/h = 3.517 kW (NIST SP 811, B.8)",
    "A3": "Zone", "B3": "IT load [kW]", "C3": "Fan and UPS losses [kW]", "D3": "Total [kW]",
    "A4": "Hall 2A", "B4": 850, "C4": 62,
    "A5": "Hall 2B", "B5": 850, "C5": 62,
    "A6": "Hall 2C", "B6": 600, "C6": 48,
    "A7": "UPS and battery rooms", "B7": 0, "C7": 95,
    "A8": "Total", "B8": "=SUM(B4:B7)", "C8": "=SUM(C4:C7)", "D8": "=SUM(D4:D7)",
    "A9": "Largest zone", "D9": "=MAX(D4:D7)",
    "A11": "Item", "B11": "Symbol", "C11": "Value", "D11": "Unit",
    "A12": "Diversity on IT load", "B12": "f_d", "C12": 90, "D12": "%",
    "A13": "Diversified load", "B13": "Q_d", "C13": "=B8*C12+C8", "D13": "kW",
    "A14": "Design margin", "B14": "m", "C14": 10, "D14": "%",
    "A15": "Design cooling load", "B15": "Q", "C15": "=C13*(1+C14/100)", "D15": "kW",
    "A16": "Design cooling load, TR", "B16": "Q_TR", "C16": "=ROUND(C15/3.517,0)", "D16": "TR",
}
for r in range(4, 8):
    LOADS[f"D{r}"] = f"=B{r}+C{r}"

CHILLERS = {
    "A1": "Quayside Data Centre, Hall 2: chillers (invented scenario). Marlow Brandt MEP, "
          "calc CW-02",
    "A2": "Sources: 1 ton = 3.517 kW (NIST SP 811, B.8); kW/ton = kW input / tons; COP = "
          "tons·3.517/kW (common practice); gpm = tons·24/ΔT(°F), from Q = 500·gpm·ΔT (ASHRAE "
          "Fundamentals, common practice); q = Q/(4.19·ΔT) L/s (water, from memory); Carnot "
          "COP = T_e/(T_c - T_e) in kelvin (textbook); 1 gpm = 0.0631 L/s (NIST SP 811, B.8)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Duty chillers", "B4": "N", "C4": 3, "D4": "-",
    "A5": "Chiller capacity, each (AHRI rating)", "B5": "Q_ch", "C5": 600, "D5": "tons",
    "A6": "Plant capacity", "B6": "Q_pl", "C6": "=C4*C5*3.517", "D6": "kW",
    "A7": "Capacity margin over design load", "B7": "m_c",
    "C7": "=(C6-Loads!C15)/Loads!C15*100", "D7": "%",
    "A8": "Chiller input power, each, at design", "B8": "P_ch", "C8": 372, "D8": "kW",
    "A9": "Chiller efficiency", "B9": "eff", "C9": "=C5/C8", "D9": "kW/ton",
    "A10": "Chiller COP", "B10": "COP", "C10": "=C5*3.517/C8", "D10": "-",
    "A11": "CHW supply temperature", "B11": "T_s", "C11": 6.7, "D11": "°C",
    "A12": "CHW return temperature", "B12": "T_r", "C12": 13.3, "D12": "°C",
    "A13": "CHW ΔT", "B13": "dT", "C13": "=C12-C11", "D13": "K",
    "A14": "CHW ΔT, °F", "B14": "dT_F", "C14": "=C13*1.8+32", "D14": "°F",
    "A15": "CHW flow per chiller", "B15": "q", "C15": "=C5*24/(C13*1.8)", "D15": "gpm",
    "A16": "CHW flow per chiller, L/s", "B16": "q_SI", "C16": "=C15/0.0631", "D16": "L/s",
    "A17": "CHW flow per chiller (SI check)", "B17": "q_chk", "C17": "=C5*3.517/(4.19*C13)",
    "D17": "L/s",
    "A18": "Evaporating temperature", "B18": "T_e", "C18": 4.5, "D18": "°C",
    "A19": "Condensing temperature, design", "B19": "T_c", "C19": 38, "D19": "°C",
    "A20": "Condensing temperature, winter", "B20": "T_cw", "C20": 24, "D20": "°C",
    "A21": "Carnot COP, design", "B21": "COP_C", "C21": "=(C18+273.15)/(C19-C18)", "D21": "-",
    "A22": "Carnot COP, winter", "B22": "COP_Cw", "C22": "=C18/(C20-C18)", "D22": "-",
    "A23": "Chiller efficiency against Carnot, design", "B23": "eta_C", "C23": "=C10/C21*100",
    "D23": "%",
    "A24": "Chiller input power, plant", "B24": "P_pl", "C24": "=C4*C8", "D24": "kW",
    "A25": "Total CHW flow", "B25": "q_t", "C25": "=C4*C15", "D25": "gpm",
}
PUMPS = {
    "A1": "Quayside Data Centre, Hall 2: primary CHW pumps (invented scenario). Marlow Brandt "
          "MEP, calc CW-02",
    "A2": "Sources: index circuit head from the pipe sizing sheet (invented); 1 ft of water = "
          "2.989 kPa (NIST SP 811, B.8); p = γ_w·H with γ_w = 9.81 kN/m³ (common practice); "
          "bhp = gpm·ft/(3960·η) (Cameron Hydraulic Data, from memory); 1 hp = 0.746 kW, 1 gpm "
          "= 0.06309 L/s, 1 ft = 0.3048 m (NIST SP 811, B.8); P = Q·Δp/η (textbook)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Design flow per pump", "B4": "q", "C4": "=Chillers!C15", "D4": "gpm",
    "A5": "Design flow per pump, L/s", "B5": "q_SI", "C5": "=C4*0.06309", "D5": "L/s",
    "A6": "Pipework friction, index circuit", "B6": "H_p", "C6": 38, "D6": "ft",
    "A7": "Evaporator pressure drop (chiller data)", "B7": "dp_e", "C7": 62, "D7": "kPa",
    "A8": "Coil and control valve", "B8": "H_c", "C8": 25, "D8": "ft",
    "A9": "Total pump head", "B9": "H", "C9": "=C6+C7/2.989+C8", "D9": "ft",
    "A10": "Total pump head, kPa", "B10": "dp", "C10": "=C9*0.3048*9.81", "D10": "kPa",
    "A11": "Total pump head, m", "B11": "H_m", "C11": "=C9*0.3048", "D11": "m",
    "A12": "Pump efficiency", "B12": "eta_p", "C12": 78, "D12": "%",
    "A13": "Motor efficiency", "B13": "eta_m", "C13": 94.5, "D13": "%",
    "A14": "Pump brake horsepower", "B14": "P_bhp", "C14": "=C4*C9/(3960*C12/100)", "D14": "hp",
    "A15": "Motor input power", "B15": "P_in", "C15": "=C14*0.746/(C13/100)", "D15": "kW",
    "A16": "Pump shaft power (SI check)", "B16": "P_sh", "C16": "=C5*C10/(C12/100)", "D16": "kW",
    "A17": "Pumps running", "B17": "n", "C17": 3, "D17": "-",
    "A18": "Running hours per year", "B18": "t_a", "C18": 8760, "D18": "h",
    "A19": "Annual pump energy", "B19": "E_p", "C19": "=C15*C17*C18/1000", "D19": "MWh",
    "A20": "Pump power per TR of load", "B20": "p_TR", "C20": "=C15*C17/Loads!C16",
    "D20": "kW/TR",
}
TOWER = {
    "A1": "Quayside Data Centre, Hall 2: cooling towers (invented scenario). Marlow Brandt MEP, "
          "calc CW-02",
    "A2": "Sources: heat rejection = load·(1 + 1/COP) (common practice); range = T_in - T_out, "
          "approach = T_out - T_wb (CTI, common practice); condenser water 3 gpm/TR (common "
          "practice); Q = 500·gpm·ΔT (common practice); evaporation = Q/h_fg with h_fg = 2257 "
          "kJ/kg (steam tables, conservative); blowdown = E/(C - 1) (common practice); 1 kW = "
          "3412 Btu/h (NIST SP 811, B.8)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Design cooling load", "B4": "Q", "C4": "=Loads!C15", "D4": "kW",
    "A5": "Chiller COP", "B5": "COP", "C5": "=Chillers!C10", "D5": "-",
    "A6": "Heat rejection", "B6": "Q_r", "C6": "=C4*(1+1/C5)", "D6": "kW",
    "A7": "Heat rejection, Btu/h", "B7": "Q_r,Btu", "C7": "=C6*3412", "D7": "Btu/h",
    "A8": "Condenser water allowance", "B8": "k_cw", "C8": 3, "D8": "gpm/TR",
    "A9": "Condenser water flow", "B9": "q_cw", "C9": "=C8*Loads!C16", "D9": "gpm",
    "A10": "Tower entering water temperature", "B10": "T_in", "C10": 95, "D10": "°F",
    "A11": "Tower leaving water temperature", "B11": "T_out", "C11": 85, "D11": "°F",
    "A12": "Design ambient wet bulb", "B12": "T_wb", "C12": 78, "D12": "°F",
    "A13": "Range", "B13": "R", "C13": "=C10-C11", "D13": "Δ°F",
    "A14": "Approach", "B14": "A", "C14": "=C11-C12", "D14": "Δ°F",
    "A15": "Range, K", "B15": "R_K", "C15": "=C13/1.8", "D15": "K",
    "A16": "Approach, K", "B16": "A_K", "C16": "=C14*1.8", "D16": "K",
    "A17": "Tower leaving water temperature, °C", "B17": "T_out,C", "C17": "=C11-32*5/9",
    "D17": "°C",
    "A18": "Heat rejected, water side", "B18": "Q_w", "C18": "=500*C9*C13", "D18": "Btu/h",
    "A19": "Heat rejected, water side, kW", "B19": "Q_w,kW", "C19": "=C18/3412", "D19": "kW",
    "A20": "Evaporation", "B20": "E", "C20": "=C6/2257*3600", "D20": "kg/h",
    "A21": "Cycles of concentration", "B21": "N_c", "C21": 4, "D21": "-",
    "A22": "Blowdown", "B22": "B", "C22": "=C20/(C21-1)", "D22": "kg/h",
    "A23": "Make-up water", "B23": "M", "C23": "=C20+C22", "D23": "kg/h",
}

# ============================================================================================
# Book 3: Ashcombe Road car park, cantilever retaining wall RW-3 (Pellow & Grant Structural)
# ============================================================================================
WALL_INPUT = {
    "A1": "Ashcombe Road multi-storey car park: retaining wall RW-3, inputs (invented "
          "scenario). Pellow & Grant Structural, calc S-117",
    "A2": "Sources: geometry from drawing RW-3 (invented); soil data from geotechnical report "
          "GR-118 (invented); γ = ρ·g with g = 9.81 m/s² (textbook); base friction μ = tan(2φ/3) "
          "(common practice); 1 kN/m³ = 6.366 pcf, 1 kPa = 20.89 psf (NIST SP 811, B.8)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Retained height (top of wall to underside of footing)", "B4": "H", "C4": 4.2, "D4": "m",
    "A5": "Stem thickness at base", "B5": "t_s", "C5": 350, "D5": "mm",
    "A6": "Footing width", "B6": "B", "C6": 3.0, "D6": "m",
    "A7": "Footing thickness", "B7": "t_f", "C7": 450, "D7": "mm",
    "A8": "Toe length", "B8": "b_t", "C8": 0.8, "D8": "m",
    "A9": "Heel length", "B9": "b_h", "C9": "=C6-C8-C5/1000", "D9": "m",
    "A10": "Backfill friction angle", "B10": "phi", "C10": 30, "D10": "°",
    "A11": "Backfill bulk density (compaction tests)", "B11": "rho_s", "C11": 1.89,
    "D11": "Mg/m³",
    "A12": "Backfill unit weight", "B12": "gamma_s", "C12": "=C11*9.81", "D12": "kN/m³",
    "A13": "Concrete unit weight", "B13": "gamma_c", "C13": 24, "D13": "kN/m³",
    "A14": "Surcharge (car park traffic)", "B14": "q", "C14": 10, "D14": "kPa",
    "A15": "Surcharge, psf", "B15": "q_psf", "C15": "=C14*20.89", "D15": "psf",
    "A16": "Backfill unit weight, pcf", "B16": "gamma_pcf", "C16": "=C12*6.366", "D16": "pcf",
    "A17": "Allowable bearing pressure (report GR-118)", "B17": "q_allow", "C17": 3000,
    "D17": "psf",
    "A18": "Base friction coefficient", "B18": "mu", "C18": "=TAN(RADIANS(2/3*C10))", "D18": "-",
    "A19": "Soil depth in front of toe", "B19": "D_p", "C19": 0.9, "D19": "m",
    "A20": "Passive resistance relied on", "B20": "x_p", "C20": 50, "D20": "%",
}
WALL_PRESSURES = {
    "A1": "Ashcombe Road car park RW-3: earth pressures per metre run (invented scenario)",
    "A2": "Sources: Rankine Ka = tan²(45° - φ/2) = (1 - sin φ)/(1 + sin φ), Kp = 1/Ka "
          "(Rankine; Craig's Soil Mechanics); P_a = ½·Ka·γ·H², P_q = Ka·q·H, P_p = ½·Kp·γ·D² "
          "(textbook); 1 kN/m = 68.52 lbf/ft (NIST SP 811, B.8)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Active coefficient (Rankine)", "B4": "Ka", "C4": "=TAN(RADIANS(45-Input!C10/2))^2",
    "D4": "-",
    "A5": "Active coefficient, check (1 - sin φ form)", "B5": "Ka_chk",
    "C5": "=(1-SIN(Input!C10))/(1+SIN(Input!C10))", "D5": "-",
    "A6": "Active pressure at base, soil", "B6": "p_a", "C6": "=C4*Input!C12*Input!C4",
    "D6": "kPa",
    "A7": "Active pressure from surcharge", "B7": "p_q", "C7": "=C4*Input!C14", "D7": "kPa",
    "A8": "Thrust from soil", "B8": "P_a", "C8": "=0.5*C4*Input!C12*Input!C4^2", "D8": "kN/m",
    "A9": "Thrust from surcharge", "B9": "P_q", "C9": "=C4*Input!C14*Input!C4", "D9": "kN/m",
    "A10": "Total horizontal thrust", "B10": "P_h", "C10": "=C8+C9", "D10": "kN/m",
    "A11": "Overturning moment about toe", "B11": "M_O", "C11": "=C8*Input!C4/3+C9*Input!C4/2",
    "D11": "kN·m/m",
    "A12": "Passive coefficient", "B12": "Kp", "C12": "=1/C4", "D12": "-",
    "A13": "Passive thrust in front of toe", "B13": "P_p", "C13": "=0.5*C12*Input!C11*Input!C19^2",
    "D13": "kN/m",
    "A14": "Passive thrust relied on", "B14": "P_p,used", "C14": "=C13*Input!C20/100",
    "D14": "kN/m",
    "A15": "Total horizontal thrust, lbf/ft", "B15": "P_h,US", "C15": "=C10/68.52",
    "D15": "lbf/ft",
}
WALL_STABILITY = {
    "A1": "Ashcombe Road car park RW-3: stability per metre run, moments about the toe "
          "(invented scenario)",
    "A2": "Sources: FoS overturning = ΣM_R/ΣM_O ≥ 2.0, sliding = (μ·ΣV + P_p)/ΣH ≥ 1.5 "
          "(common practice); e = B/2 - (M_R - M_O)/V, q = V/B·(1 ± 6e/B) for e ≤ B/6 "
          "(textbook); 1 kPa = 20.89 psf, 1 psf = 0.04788 kPa, 1 kN/m = 0.06852 kip/ft (NIST "
          "SP 811, B.8)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Stem weight", "B4": "W_s", "C4": "=Input!C5*(Input!C4-Input!C7/1000)*Input!C13",
    "D4": "kN/m",
    "A5": "Stem lever arm", "B5": "x_s", "C5": "=Input!C8+Input!C5/1000/2", "D5": "m",
    "A6": "Footing weight", "B6": "W_f", "C6": "=Input!C6*Input!C7/1000*Input!C13", "D6": "kN/m",
    "A7": "Footing lever arm", "B7": "x_f", "C7": "=Input!C6/2", "D7": "m",
    "A8": "Soil on heel", "B8": "W_h", "C8": "=Input!C9*(Input!C4-Input!C7/1000)*Input!C12",
    "D8": "kN/m",
    "A9": "Heel soil lever arm", "B9": "x_h", "C9": "=Input!C6-Input!C9/2", "D9": "m",
    "A10": "Surcharge on heel", "B10": "W_q", "C10": "=Input!C14*Input!C9", "D10": "kN/m",
    "A11": "Total vertical load", "B11": "V", "C11": "=C4+C6+C8+C10", "D11": "kN/m",
    "A12": "Restoring moment", "B12": "M_R", "C12": "=C4*C5+C6*C7+(C8+C10)*C9", "D12": "kN·m/m",
    "A13": "Overturning moment", "B13": "M_O", "C13": "=Pressures!C11", "D13": "kN·m/m",
    "A14": "Horizontal thrust", "B14": "H", "C14": "=Pressures!C10", "D14": "kPa",
    "A15": "FoS overturning", "B15": "F_o", "C15": "=C12/C13", "D15": "-",
    "A16": "FoS sliding", "B16": "F_s", "C16": "=(Input!C18*C11+Pressures!C14)/Pressures!C10",
    "D16": "-",
    "A17": "Eccentricity", "B17": "e", "C17": "=Input!C6/2-(C12-C13)/C11", "D17": "m",
    "A18": "Eccentricity, mm", "B18": "e_mm", "C18": "=C17*1000", "D18": "mm",
    "A19": "Resultant within middle third?", "B19": "mid3",
    "C19": "=IF(ABS(C17)<=Input!C6/6,\"yes\",\"no\")",
    "A20": "Maximum bearing pressure", "B20": "q_max", "C20": "=C11/Input!C6*(1+6*C18/Input!C6)",
    "D20": "kPa",
    "A21": "Minimum bearing pressure", "B21": "q_min", "C21": "=C11/Input!C6*(1-6*C17/Input!C6)",
    "D21": "kPa",
    "A22": "Maximum bearing pressure, psf", "B22": "q_max,psf", "C22": "=C20*47.88", "D22": "psf",
    "A23": "Bearing check", "B23": "chk", "C23": "=IF(C20<=Input!C17,\"OK\",\"FAIL\")",
    "A24": "Bearing utilisation", "B24": "u_q", "C24": "=C20/(Input!C17*0.04788)*100",
    "D24": "%",
    "A25": "Governing FoS", "B25": "F_min", "C25": "=MIN(C15,C16)", "D25": "-",
    "A26": "Total horizontal thrust, kip/ft", "B26": "H_kip", "C26": "=Pressures!C10*0.06852",
    "D26": "kip/ft",
}

# ============================================================================================
# Book 4: Brackwater Foundry compressed air survey (Tolland Air Services, survey TA-2291)
# ============================================================================================
COMPRESSORS = {
    "A1": "Brackwater Foundry compressed air survey: compressors (invented scenario). Tolland "
          "Air Services, survey TA-2291",
    "A2": "Sources: rated FAD and power from the CAGI data sheets (invented); scf at 60 °F and "
          "14.696 psia, 1 Nm³ = 37.33 scf (common practice, from memory); 1 ft³ = 0.02832 m³, "
          "1 hp = 0.746 kW, 1 bar = 14.5 psi (NIST SP 811, B.8); inlet volume flow acfm = scfm·"
          "(T + 459.67)/519.67·14.696/p (ideal gas, common practice)",
    "A3": "Unit", "B3": "Rated FAD [scfm]", "C3": "Discharge [psig]", "D3": "Motor [hp]",
    "E3": "Motor [kW]", "F3": "Loaded input [kW]", "G3": "Specific power [kW/100 scfm]",
    "A4": "C1 (fixed speed)", "B4": 520, "C4": 110, "D4": 125, "F4": 98.5,
    "A5": "C2 (fixed speed)", "B5": 520, "C5": 110, "D5": 125, "F5": 101.2,
    "A6": "C3 (variable speed)", "B6": 350, "C6": 110, "D6": 100, "F6": 71.8,
    "A7": "Total", "B7": "=SUM(B4:B6)", "F7": "=SUM(F4:F6)",
    "A8": "Average", "G8": "=AVERAGE(G4:G6)",
    "A10": "Item", "B10": "Symbol", "C10": "Value", "D10": "Unit",
    "A11": "Total rated FAD", "B11": "Q", "C11": "=B7", "D11": "scfm",
    "A12": "Total rated FAD, Nm³/min", "B12": "Q_N", "C12": "=C11/37.33", "D12": "Nm³/min",
    "A13": "Total FAD, m³/min free air", "B13": "Q_m", "C13": "=C11*0.02832", "D13": "m³/min",
    "A14": "Discharge pressure", "B14": "p_d", "C14": "=MAX(C4:C6)", "D14": "psig",
    "A15": "Discharge pressure, bar g", "B15": "p_db", "C15": "=C14/14.5", "D15": "bar g",
    "A16": "Discharge pressure, absolute", "B16": "p_da", "C16": "=C14+14.7", "D16": "psia",
    "A17": "Overall pressure ratio", "B17": "r", "C17": "=C14/14.7", "D17": "-",
    "A18": "Refrigerated dryer input", "B18": "P_dry", "C18": 850, "D18": "W",
    "A19": "Total plant input power", "B19": "P_pl", "C19": "=F7+C18", "D19": "kW",
    "A20": "Intake air temperature, summer", "B20": "T_in", "C20": 95, "D20": "°F",
    "A21": "Site barometric pressure", "B21": "p_bar", "C21": 14.2, "D21": "psia",
    "A22": "Inlet volume flow at site", "B22": "Q_a",
    "C22": "=C11*(C20+459.67)/519.67*14.696/C21", "D22": "cfm",
    "A23": "Delivered standard flow on a hot day (mass basis)", "B23": "Q_hot",
    "C23": "=C11*60/C20", "D23": "scfm",
}
for r in range(4, 7):
    COMPRESSORS[f"E{r}"] = f"=D{r}*0.746"
    COMPRESSORS[f"G{r}"] = f"=F{r}/B{r}*100"
COMPRESSORS["E6"] = "=D6/0.746"

DEMAND = {
    "A1": "Brackwater Foundry compressed air survey: demand and leakage (invented scenario)",
    "A2": "Sources: leakage by load/unload timing, % = T_on/(T_on + T_off)·100 (common "
          "practice, compressed air system audits); leak by pressure decay Q = V·(p1 - p2)/"
          "(p_a·t) (common practice); 1 m³ = 35.31 ft³ (NIST SP 811, B.8)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Compressor loaded time, no production (average)", "B4": "T_on", "C4": 28, "D4": "s",
    "A5": "Compressor unloaded time, no production", "B5": "T_off", "C5": 74, "D5": "s",
    "A6": "Leakage, % of capacity", "B6": "x_L", "C6": "=C4/(C4+C5)*100", "D6": "%",
    "A7": "Leakage flow", "B7": "Q_L", "C7": "=Compressors!C11*C6", "D7": "scfm",
    "A8": "Leakage power", "B8": "P_L", "C8": "=C7/Compressors!C11*Compressors!F7", "D8": "kW",
    "A9": "Operating hours per year", "B9": "t_a", "C9": 6000, "D9": "h",
    "A10": "Leakage energy", "B10": "E_L", "C10": "=C8*C9", "D10": "kWh",
    "A11": "Leakage energy, MWh", "B11": "E_L,MWh", "C11": "=C10*1000", "D11": "MWh",
    "A12": "System volume (receivers and mains)", "B12": "V", "C12": 12.5, "D12": "m³",
    "A13": "Decay test start pressure", "B13": "p_1", "C13": 7.0, "D13": "bar g",
    "A14": "Decay test end pressure", "B14": "p_2", "C14": 5.5, "D14": "bar g",
    "A15": "Decay test duration", "B15": "t", "C15": 4.5, "D15": "min",
    "A16": "Atmospheric pressure", "B16": "p_a", "C16": 1.013, "D16": "bar",
    "A17": "Leak rate by pressure decay", "B17": "Q_dec", "C17": "=C12*(C13-C14)/(C16*C15)",
    "D17": "m³/min",
    "A18": "Leak rate by pressure decay, cfm", "B18": "Q_dec,cfm", "C18": "=C17*35.31",
    "D18": "cfm",
    "A19": "Leak rate by pressure decay, % of FAD", "B19": "x_dec",
    "C19": "=C17/Compressors!C13*100", "D19": "%",
    "A20": "Leak rate by pressure decay, L/s", "B20": "Q_dec,SI", "C20": "=C17*1000/60",
    "D20": "L/s",
}
RECEIVER = {
    "A1": "Brackwater Foundry compressed air survey: receiver for the shot-blast booth start "
          "(invented scenario)",
    "A2": "Sources: receiver volume V = t·Q·p_a/(p1 - p2), Q free air (common practice, "
          "compressor makers' sizing rule, from memory); 1 ft³ = 7.48 US gal = 0.02832 m³, "
          "1 gal = 3.785 L, 1 bar = 14.5 psi (NIST SP 811, B.8)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Event demand above compressor capacity", "B4": "Q_e", "C4": 180, "D4": "scfm",
    "A5": "Time the receiver must carry it", "B5": "t", "C5": 2.5, "D5": "min",
    "A6": "Atmospheric pressure", "B6": "p_a", "C6": 14.7, "D6": "psia",
    "A7": "Receiver pressure at start", "B7": "p_1", "C7": 110, "D7": "psig",
    "A8": "Minimum pressure allowed at the booth", "B8": "p_2", "C8": 90, "D8": "psig",
    "A9": "Receiver volume", "B9": "V", "C9": "=C5*C4*C6/(C7-C8)", "D9": "ft³",
    "A10": "Receiver volume, US gal", "B10": "V_gal", "C10": "=C9*7.48", "D10": "gal",
    "A11": "Receiver volume, m³", "B11": "V_m3", "C11": "=C9*35.31", "D11": "m³",
    "A12": "Selected standard receiver", "B12": "V_sel", "C12": 1060, "D12": "gal",
    "A13": "Selected receiver, litres", "B13": "V_sel,L", "C13": "=C12*3.785", "D13": "L",
    "A14": "Support time with the selected receiver", "B14": "t_sel",
    "C14": "=C12/7.48*(C7-C8)/(C4*C6)", "D14": "min",
    "A15": "Event demand, m³/min free air", "B15": "Q_e,SI", "C15": "=C4*0.02832",
    "D15": "m³/min",
    "A16": "Receiver pressure at start, bar g", "B16": "p_1b", "C16": "=C7/14.5", "D16": "bar g",
    "A17": "Minimum pressure, bar g", "B17": "p_2b", "C17": "=C8/14.5", "D17": "bar g",
    "A18": "Receiver volume (SI check)", "B18": "V_SI", "C18": "=C5*C15*1.013/(C16-C17)",
    "D18": "m³",
    "A19": "Receiver volume (SI check, second booth)", "B19": "V_SI2",
    "C19": "=C5*C15*1.013/(C7-C8)", "D19": "m³",
}

BOOKS = {
    "boiler-house-steam": {
        "trade": "boiler house: steam balance, blowdown and gas firing",
        "sheets": [("SteamTable", STEAM_TABLE), ("Balance", BALANCE), ("Fuel", FUEL)],
        "planted": {
            "Balance!C13": ("unit-scale", "kg/h to lb/h multiplied by 0.4536: wrong way round"),
            "Balance!C15": ("offset-scale", "°C to °F as *1.8 with no +32"),
            "Balance!C18": ("unit-scale", "kW times 3.412 (the Btu/h per W factor): 1000 too small"),
            "Balance!C29": ("unit-scale", "condensate return 55 % used as a fraction"),
            "Balance!C31": ("offset-scale", "PRV pressure ratio of two gauge pressures"),
            "Fuel!C8": ("unit-scale", "kW / (MJ/Nm³) into Nm³/h without *3.6"),
            "Fuel!C13": ("offset-scale", "gas meter correction divides by a gauge pressure"),
            "Fuel!C17": ("unit-scale", "kWh * 3.6 gives MJ, written GJ: 1000 too large"),
        },
    },
    "chilled-water-plant": {
        "trade": "HVAC: data hall chilled water plant, pumps and cooling towers",
        "sheets": [("Loads", LOADS), ("Chillers", CHILLERS), ("Pumps", PUMPS), ("Tower", TOWER)],
        "planted": {
            "Loads!C13": ("unit-scale", "90 % diversity used as a fraction: 100 times too large"),
            "Chillers!C9": ("unit-scale", "kW/ton computed upside down: tons/kW (both dimensionless)"),
            "Chillers!C14": ("sum-mismatch", "a ΔT in K converted to °F with +32 (a difference has no "
                             "offset, so the 32 is a bare number added to a temperature)"),
            "Chillers!C16": ("unit-scale", "gpm to L/s divided by 0.0631: wrong way round"),
            "Chillers!C22": ("offset-scale", "Carnot COP from °C, not K"),
            "Pumps!C16": ("unit-scale", "L/s * kPa is W, written kW: 1000 too large"),
            "Tower!C16": ("unit-scale", "approach °F to K multiplied by 1.8: wrong way round"),
            "Tower!C17": ("offset-scale", "°F to °C without brackets: T - 32*5/9"),
        },
    },
    "retaining-wall": {
        "trade": "geotechnical/structural: cantilever retaining wall and footing",
        "sheets": [("Input", WALL_INPUT), ("Pressures", WALL_PRESSURES),
                   ("Stability", WALL_STABILITY)],
        "planted": {
            "Pressures!C5": ("unit-scale", "SIN of φ in degrees, no RADIANS (Excel takes radians)"),
            "Pressures!C13": ("result-unit", "passive thrust from density Mg/m³: missing g"),
            "Pressures!C15": ("unit-scale", "kN/m to lbf/ft divided by 68.52: wrong way round"),
            "Stability!C4": ("unit-scale", "stem weight with thickness in mm beside m"),
            "Stability!C14": ("result-unit", "thrust in kN/m written as kPa"),
            "Stability!C20": ("unit-scale", "eccentricity in mm beside B in m in 6e/B"),
            "Stability!C22": ("unit-scale", "kPa to psf multiplied by 47.88 (Pa per psf)"),
            "Stability!C23": ("unit-scale", "bearing pressure kPa compared with allowable psf"),
        },
    },
    "compressed-air": {
        "trade": "compressed air: compressor survey, leakage and receiver sizing",
        "sheets": [("Compressors", COMPRESSORS), ("Demand", DEMAND), ("Receiver", RECEIVER)],
        "planted": {
            "Compressors!E6": ("unit-scale", "hp to kW divided by 0.746: wrong way round"),
            "Compressors!C17": ("result-unit", "pressure ratio from a gauge pressure: psig / 14.7 is "
                                "still a pressure"),
            "Compressors!C19": ("unit-scale", "kW compressors plus a dryer in W"),
            "Compressors!C23": ("offset-scale", "temperature ratio with °F, not °R"),
            "Demand!C7": ("unit-scale", "leakage % used as a fraction"),
            "Demand!C11": ("unit-scale", "kWh to MWh multiplied by 1000: wrong way round"),
            "Receiver!C11": ("unit-scale", "ft³ to m³ multiplied by 35.31: wrong way round"),
            "Receiver!C19": ("result-unit", "1.013 (bar) over a psi pressure difference: the bare "
                             "1.013 leaves m³/psi"),
        },
    },
}


def formula_cells(book):
    return [f"{name}!{cell}" for name, cells in book["sheets"] for cell, raw in cells.items()
            if isinstance(raw, str) and raw.startswith("=")]


def book_formula(book, ref):
    sheet, cell = ref.split("!")
    return dict(book["sheets"])[sheet][cell]


def main():
    summary = {}
    for stem, book in BOOKS.items():
        write_xlsx(os.path.join(HERE, stem + ".xlsx"), book["sheets"], book.get("names"))
        formulas = formula_cells(book)
        for cell in book["planted"]:
            assert cell in formulas, f"{stem}: {cell} is not a formula cell"
        correct = [c for c in formulas if c not in book["planted"]]
        with open(os.path.join(HERE, stem + ".expect"), "w", encoding="utf-8") as f:
            f.write("# sheet!cell rule: the planted mistakes plumb must report; every other\n"
                    "# formula cell must stay clean (written by make_books.py)\n")
            for cell, (rule, what) in book["planted"].items():
                f.write(f"# planted: {what}\n{cell} {rule}\n")
        summary[stem] = {
            "trade": book["trade"],
            "planted": {c: {"rule": r, "what": w} for c, (r, w) in book["planted"].items()},
            "correct": correct,
            "formulas": {c: book_formula(book, c) for c in formulas},
        }
    with open(os.path.join(HERE, "expect.json"), "w", encoding="utf-8") as f:
        json.dump(summary, f, indent=1, ensure_ascii=False)


if __name__ == "__main__":
    main()
