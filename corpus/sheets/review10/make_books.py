#!/usr/bin/env python3
"""Four review workbooks for plumb's workbook checking (review43), written with the standard
zipfile module (xlsx_writer.py, copied from corpus/sheets/review2 and extended).

Trades: (1) a natural gas lateral sized by the Weymouth equation; (2) a boiler feedwater and
blowdown balance; (3) a compressed-air plant sizing and leak test; (4) a steam turbine
generator's output and heat rate. All scenarios and plant data are invented.

Every formula cell is either a planted mistake (PLANTED, with the rule expected) or a correct
cell that must stay clean.

Run: python3 make_books.py  ->  *.xlsx, *.expect, expect.json in this folder
"""
import json
import os

from xlsx_writer import write_xlsx

HERE = os.path.dirname(os.path.abspath(__file__))

# --------------------------------------------------------------------------------------------
# Book 1: natural gas lateral by the Weymouth equation (Mscf/d, psia, miles, inches)
# --------------------------------------------------------------------------------------------
GAS_DATA = {
    "A1": "Heron Creek lateral: line data (invented pipeline)",
    "A2": "Sources: line pipe OD and wall from ASME B36.10M (from memory); base conditions "
          "14.73 psia and 60 °F (common practice, AGA); °R = °F + 459.67 and 1 mi = 1.609 km, "
          "1 in = 25.4 mm (NIST SP 811)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Inlet pressure (compressor discharge)", "B4": "P1g", "C4": 850, "D4": "psig",
    "A5": "Delivery pressure (town border station)", "B5": "P2g", "C5": 400, "D5": "psig",
    "A6": "Atmospheric pressure", "B6": "Pa", "C6": 14.7, "D6": "psia",
    "A7": "Base pressure", "B7": "Pb", "C7": 14.73, "D7": "psia",
    "A8": "Base temperature", "B8": "Tb", "C8": 60, "D8": "°F",
    "A9": "Flowing gas temperature", "B9": "Tf", "C9": 75, "D9": "°F",
    "A10": "Gas specific gravity (air = 1)", "B10": "G", "C10": 0.62, "D10": "-",
    "A11": "Compressibility factor", "B11": "Z", "C11": 0.88, "D11": "-",
    "A12": "Pipeline efficiency factor", "B12": "E", "C12": 0.92, "D12": "-",
    "A13": "Length", "B13": "L", "C13": 18.5, "D13": "mi",
    "A14": "Nominal pipe size", "B14": "NPS", "C14": 12, "D14": "-",
    "A15": "Outside diameter", "B15": "OD", "C15": "=VLOOKUP(C14,F4:H7,2,FALSE)", "D15": "in",
    "A16": "Wall thickness", "B16": "WT", "C16": "=VLOOKUP(C14,F4:H7,3,FALSE)", "D16": "in",
    "A17": "Inside diameter", "B17": "D", "C17": "=C15-2*C16", "D17": "in",
    "A18": "Inlet pressure, absolute", "B18": "P1", "C18": "=C4+C6", "D18": "psia",
    "A19": "Delivery pressure, absolute", "B19": "P2", "C19": "=C5+C6", "D19": "psia",
    "A20": "Base temperature, absolute", "B20": "Tb_R", "C20": "=C8+459.67", "D20": "°R",
    "A21": "Flowing temperature, absolute", "B21": "Tf_R", "C21": "=C9+459.67", "D21": "°R",
    "A22": "Inside diameter, mm", "B22": "D_mm", "C22": "=C17*25.4", "D22": "mm",
    "A23": "Length, km", "B23": "L_km", "C23": "=C13*1.609", "D23": "km",
    "A24": "Length, ft (for the profile sheet)", "B24": "L_ft", "C24": "=C13/5280", "D24": "ft",
    "F3": "NPS [-]", "G3": "OD [in]", "H3": "Wall [in]",
    "F4": 8, "G4": 8.625, "H4": 0.322,
    "F5": 10, "G5": 10.75, "H5": 0.365,
    "F6": 12, "G6": 12.75, "H6": 0.375,
    "F7": 16, "G7": 16.0, "H7": 0.375,
}
GAS_FLOW = {
    "A1": "Heron Creek lateral: capacity by the Weymouth equation (invented pipeline)",
    "A2": "Sources: Weymouth Q = 433.5 E (Tb/Pb) ((P1²-P2²)/(G Tf L Z))^0.5 D^2.667, Q scf/d, "
          "P psia, T °R, L mi, D in (E. S. Menon, Gas Pipeline Hydraulics, 2005, ch. 2); "
          "average pressure 2/3(P1+P2-P1P2/(P1+P2)) (same); velocity 0.002122 (Qb/D²)(Pb/Tb)"
          "(ZT/P) ft/s (same); Barlow P = 2 S t F E T/D (49 CFR 192.105); 1 psi = 6.895 kPa, "
          "1 ft³ = 0.02832 m³ (NIST SP 811)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Capacity, Weymouth", "B4": "Qb",
    "C4": "=433.5*Data!C12*(Data!C20/Data!C7)*((Data!C18^2-Data!C19^2)/"
          "(Data!C10*Data!C21*Data!C13*Data!C11))^0.5*Data!C17^2.667",
    "D4": "scf/d",
    "A5": "Capacity", "B5": "Q_M", "C5": "=C4/1000", "D5": "Mscf/d",
    "A6": "Capacity, MMscf/d", "B6": "Q_MM", "C6": "=ROUND(C4/1000000,2)", "D6": "MMscf/d",
    "A7": "Capacity, gauge pressures (quick check)", "B7": "Qb_g",
    "C7": "=433.5*Data!C12*(Data!C20/Data!C7)*((Data!C4^2-Data!C5^2)/"
          "(Data!C10*Data!C21*Data!C13*Data!C11))^0.5*Data!C17^2.667",
    "D7": "scf/d",
    "A8": "Capacity at flowing temperature as read", "B8": "Qb_F",
    "C8": "=433.5*Data!C12*(Data!C20/Data!C7)*((Data!C18^2-Data!C19^2)/"
          "(Data!C10*Data!C9*Data!C13*Data!C11))^0.5*Data!C17^2.667",
    "D8": "scf/d",
    "A9": "Capacity for the nomination sheet", "B9": "Q_nom", "C9": "=C4/1000000",
    "D9": "Mscf/d",
    "A10": "Capacity, standard m³/d", "B10": "Q_m3", "C10": "=C4*0.02832", "D10": "Sm³/d",
    "A11": "Average pressure", "B11": "Pavg",
    "C11": "=2/3*(Data!C18+Data!C19-Data!C18*Data!C19/(Data!C18+Data!C19))", "D11": "psia",
    "A12": "Gas velocity at inlet", "B12": "u1",
    "C12": "=0.002122*(C4/Data!C17^2)*(Data!C7/Data!C20)*(Data!C11*Data!C21/Data!C18)",
    "D12": "ft/s",
    "A13": "Pressure drop", "B13": "dP", "C13": "=Data!C18-Data!C19", "D13": "psi",
    "A14": "Pressure drop, kPa", "B14": "dP_k", "C14": "=C13*6.895", "D14": "kPa",
    "A15": "Pressure drop, kPa (for the SI summary)", "B15": "dP_k2", "C15": "=C13/6.895",
    "D15": "kPa",
    "A16": "SMYS, API 5L X42", "B16": "S", "C16": 42000, "D16": "psi",
    "A17": "Design factor, class 2", "B17": "F", "C17": 0.6, "D17": "-",
    "A18": "MAOP (Barlow)", "B18": "MAOP", "C18": "=2*C16*Data!C16*C17/Data!C15", "D18": "psig",
    "A19": "Inlet pressure check", "B19": "chk", "C19": "=IF(Data!C4>C18,\"OVER MAOP\",\"OK\")",
    "A20": "Inlet pressure check (absolute)", "B20": "chk_a",
    "C20": "=IF(Data!C18>C18,\"OVER MAOP\",\"OK\")",
}
GAS_METER = {
    "A1": "Heron Creek lateral: delivery meter log (invented)",
    "A2": "Sources: °R = °F + 459.67, psia = psig + 14.7 (NIST SP 811; common practice)",
    "A3": "Day", "B3": "Delivered [Mscf/d]", "C3": "Temperature [°F]", "D3": "Pressure [psig]",
    "E3": "Pressure [psia]", "F3": "Temperature [°R]", "G3": "Delivered [MMscf/d]",
    "A4": "Mon", "B4": 9120, "C4": 61, "D4": 402,
    "A5": "Tue", "B5": 9480, "C5": 63, "D5": 398,
    "A6": "Wed", "B6": 10230, "C6": 58, "D6": 391,
    "A7": "Thu", "B7": 10810, "C7": 55, "D7": 386,
    "A8": "Fri", "B8": 9950, "C8": 57, "D8": 395,
    "A9": "Mean", "B9": "=AVERAGE(B4:B8)", "C9": "=AVERAGE(C4:C8)", "D9": "=AVERAGE(D4:D8)",
    "E9": "=AVERAGE(E4:E8)", "F9": "=AVERAGE(F4:F8)", "G9": "=AVERAGE(G4:G8)",
    "A11": "Peak", "B11": "=MAX(B4:B8)",
    "A12": "Lowest pressure", "E12": "=MIN(E4:E8)",
    "A14": "Peak day as a share of capacity", "B14": "=B11/Flow!C5*100", "C14": "%",
}
for r in range(4, 9):
    GAS_METER[f"E{r}"] = f"=D{r}+14.7"
    GAS_METER[f"F{r}"] = f"=C{r}+459.67"
    GAS_METER[f"G{r}"] = f"=B{r}/1000"
GAS_METER["F6"] = "=C6+273.15"      # planted: the kelvin offset into a °R column
GAS_METER["G7"] = "=B7/1000000"     # planted: Mscf to MMscf divided by 10⁶

# --------------------------------------------------------------------------------------------
# Book 2: boiler feedwater and blowdown balance (lb/h, kg/h, ppm TDS, °F and °C)
# --------------------------------------------------------------------------------------------
BLR_STEAM = {
    "A1": "Saturated steam, from steam tables (values from memory, rounded)",
    "A2": "Source: saturated steam table, 14.7 psia atmosphere (from memory)",
    "A3": "Pressure [psig]", "B3": "Tsat [°F]", "C3": "hf [BTU/lb]", "D3": "hfg [BTU/lb]",
    "A4": 0, "B4": 212, "C4": 180, "D4": 970,
    "A5": 15, "B5": 250, "C5": 218, "D5": 946,
    "A6": 50, "B6": 298, "C6": 267, "D6": 912,
    "A7": 100, "B7": 338, "C7": 309, "D7": 881,
    "A8": 150, "B8": 366, "C8": 339, "D8": 857,
    "A9": 200, "B9": 388, "C9": 362, "D9": 837,
}
BLR_BAL = {
    "A1": "Marlow Foods plant boiler B2: feedwater and blowdown balance (invented)",
    "A2": "Sources: blowdown B = S·F/(C_b - F) on steam (Spirax Sarco, The Steam and Condensate "
          "Loop, blowdown section); flash fraction (hf1 - hf2)/hfg2 (same); 500 lb/h per gpm "
          "= 8.34 lb/gal x 60 (common practice); 1 lb = 0.4536 kg, 1 kW = 3412 BTU/h, "
          "1 psi = 6.895 kPa (NIST SP 811)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Steam generation", "B4": "S", "C4": 25000, "D4": "lb/h",
    "A5": "Boiler operating pressure", "B5": "p_b", "C5": 150, "D5": "psig",
    "A6": "Condensate return", "B6": "x_c", "C6": 60, "D6": "%",
    "A7": "Condensate TDS", "B7": "TDS_c", "C7": 5, "D7": "ppm",
    "A8": "Make-up water TDS (softened)", "B8": "TDS_m", "C8": 350, "D8": "ppm",
    "A9": "Boiler water TDS limit", "B9": "C_b", "C9": 3000, "D9": "ppm",
    "A10": "Make-up water temperature", "B10": "T_m", "C10": 60, "D10": "°F",
    "A11": "Make-up water enthalpy", "B11": "h_m", "C11": 28, "D11": "BTU/lb",
    "A12": "Feedwater TDS", "B12": "F",
    "C12": "=C6/100*C7+(1-C6/100)*C8", "D12": "ppm",
    "A13": "Blowdown rate", "B13": "B", "C13": "=C4*C12/(C9-C12)", "D13": "lb/h",
    "A14": "Feedwater flow", "B14": "m_fw", "C14": "=C4+C13", "D14": "lb/h",
    "A15": "Blowdown, % of feedwater", "B15": "x_b", "C15": "=C13/C14*100", "D15": "%",
    "A16": "Blowdown, % of feedwater (for the log)", "B16": "x_b2", "C16": "=C13/C14",
    "D16": "%",
    "A17": "Cycles of concentration", "B17": "N", "C17": "=C9/C12", "D17": "-",
    "A18": "Feedwater flow, kg/h", "B18": "m_fwk", "C18": "=C14*0.4536", "D18": "kg/h",
    "A19": "Steam generation, kg/h", "B19": "S_k", "C19": "=C4*2.205", "D19": "kg/h",
    "A20": "Make-up water", "B20": "m_m", "C20": "=C14*(1-C6/100)", "D20": "lb/h",
    "A21": "Make-up water (treatment plant sheet)", "B21": "m_m2", "C21": "=C14*(1-C6)",
    "D21": "lb/h",
    "A22": "Make-up water, gpm", "B22": "q_m", "C22": "=C20/500", "D22": "gpm",
    "A23": "Make-up water, gpm (softener sizing)", "B23": "q_m2", "C23": "=C20*500",
    "D23": "gpm",
    "A24": "Boiler water enthalpy at operating pressure", "B24": "h_b",
    "C24": "=VLOOKUP(C5,Steam!A4:D9,3,FALSE)", "D24": "BTU/lb",
    "A25": "Boiler saturation temperature", "B25": "T_b",
    "C25": "=VLOOKUP(C5,Steam!A4:D9,2,FALSE)", "D25": "°F",
    "A26": "Boiler pressure, absolute", "B26": "p_ba", "C26": "=C5+14.7", "D26": "psia",
    "A27": "Saturation temperature at absolute pressure", "B27": "T_bx",
    "C27": "=VLOOKUP(C26,Steam!A4:D9,2,TRUE)", "D27": "°F",
    "A28": "Boiler pressure, kPa(g)", "B28": "p_bk", "C28": "=C5*6.895", "D28": "kPa(g)",
    "A29": "Boiler pressure, bar(g)", "B29": "p_bb", "C29": "=C5/14.5", "D29": "bar(g)",
}
BLR_HEAT = {
    "A1": "Marlow Foods plant boiler B2: blowdown heat loss and recovery (invented)",
    "A2": "Sources: heat = m·Δh and m·cp·ΔT with cp = 1 BTU/(lb·°F) for water (common "
          "practice); flash fraction (hf1 - hf2)/hfg2 (Spirax Sarco, The Steam and Condensate "
          "Loop); °C = (°F - 32)/1.8, 1 kW = 3412 BTU/h (NIST SP 811)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Blowdown heat loss (to make-up)", "B4": "Q_b",
    "C4": "=Balance!C13*(Balance!C24-Balance!C11)", "D4": "BTU/h",
    "A5": "Blowdown heat loss, kW", "B5": "Q_bk", "C5": "=C4/3412", "D5": "kW",
    "A6": "Blowdown heat loss, kW (energy report)", "B6": "Q_bk2", "C6": "=C4/3.412",
    "D6": "kW",
    "A7": "Flash fraction at the flash vessel (0 psig)", "B7": "x_f",
    "C7": "=(Balance!C24-Steam!C4)/Steam!D4", "D7": "-",
    "A8": "Flash steam recovered", "B8": "m_f", "C8": "=Balance!C13*C7", "D8": "lb/h",
    "A9": "Residual blowdown to heat exchanger", "B9": "m_r", "C9": "=Balance!C13-C8",
    "D9": "lb/h",
    "A10": "Heat exchanger inlet temperature", "B10": "T_1", "C10": "=Steam!B4", "D10": "°F",
    "A11": "Heat exchanger outlet temperature (design)", "B11": "T_2", "C11": 40, "D11": "°C",
    "A12": "Heat exchanger outlet temperature", "B12": "T_2F", "C12": "=C11*1.8+32",
    "D12": "°F",
    "A13": "Specific heat of water", "B13": "cp", "C13": 1, "D13": "BTU/(lb·°F)",
    "A14": "Heat recovered in exchanger", "B14": "Q_hx", "C14": "=C9*C13*(C10-C12)",
    "D14": "BTU/h",
    "A15": "Heat recovered in exchanger (first pass)", "B15": "Q_hx1",
    "C15": "=C9*C13*(C10-C11)", "D15": "BTU/h",
    "A16": "Boiler saturation temperature, °C", "B16": "T_bC",
    "C16": "=(Balance!C25-32)/1.8", "D16": "°C",
    "A17": "HX inlet temperature, °C", "B17": "T_1C", "C17": "=(C10-32)*1.8", "D17": "°C",
    "A18": "Total recovered (flash + exchanger)", "B18": "Q_r",
    "C18": "=C8*Steam!D4+C14", "D18": "BTU/h",
    "A19": "Share of blowdown heat recovered", "B19": "eta_r",
    "C19": "=ROUND(C18/C4*100,1)", "D19": "%",
    "A20": "Operating hours per year", "B20": "t_a", "C20": 8000, "D20": "h",
    "A21": "Annual heat recovered", "B21": "E_r", "C21": "=C18*C20/1000000", "D21": "MMBtu",
}

# --------------------------------------------------------------------------------------------
# Book 3: compressed-air plant sizing and leak test (scfm, acfm, psig, kW, hours)
# --------------------------------------------------------------------------------------------
AIR_DEMAND = {
    "A1": "Ashdown Castings: compressed-air demand survey (invented)",
    "A2": "Sources: average demand = rated flow x duty (Compressed Air Challenge, Best "
          "Practices for Compressed Air Systems, 2nd ed., demand survey); standard air "
          "14.7 psia, 68 °F, 36 % RH (common practice, CAGI)",
    "A3": "End use", "B3": "Rated flow [scfm]", "C3": "Duty [%]", "D3": "Average demand [scfm]",
    "E3": "Peak demand [scfm]",
    "A4": "Core blowers", "B4": 180, "C4": 40,
    "A5": "Shot blast cabinet", "B5": 260, "C5": 65,
    "A6": "Pneumatic grinders (6)", "B6": 150, "C6": 35,
    "A7": "Mould release sprays", "B7": 45, "C7": 80,
    "A8": "Instrument air and valves", "B8": 30, "C8": 100,
    "A9": "Total", "B9": "=SUM(B4:B8)", "D9": "=SUM(D4:D8)", "E9": "=SUM(E4:E8)",
    "A10": "Mean duty", "C10": "=AVERAGE(C4:C8)",
}
for r in range(4, 9):
    AIR_DEMAND[f"D{r}"] = f"=B{r}*C{r}/100"
    AIR_DEMAND[f"E{r}"] = f"=IF(C{r}>50,B{r},B{r}*0.5)"
AIR_DEMAND["D6"] = "=B6*C6"          # planted: duty in % used as a fraction

AIR_PLANT = {
    "A1": "Ashdown Castings: compressor sizing (invented)",
    "A2": "Sources: acfm = scfm (14.7/Pa)((T+459.67)/(68+459.67)) (Compressed Air Challenge, "
          "Best Practices, 2nd ed.); 18 kW per 100 acfm at 100-110 psig (common practice, "
          "from memory); receiver V = t C Pa/(P1 - P2) in ft³ (same, storage section); "
          "1 hp = 0.746 kW, 1 ft³ = 7.48 gal (NIST SP 811)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Average demand", "B4": "Q_a", "C4": "=Demand!D9", "D4": "scfm",
    "A5": "Leak allowance", "B5": "x_l", "C5": 20, "D5": "%",
    "A6": "Design demand", "B6": "Q_d", "C6": "=C4*(1+C5/100)", "D6": "scfm",
    "A7": "Site atmospheric pressure (610 m elevation)", "B7": "Pa", "C7": 13.7, "D7": "psia",
    "A8": "Intake air temperature, summer", "B8": "T_i", "C8": 95, "D8": "°F",
    "A9": "Design demand at intake", "B9": "Q_i",
    "C9": "=C6*(14.7/C7)*((C8+459.67)/(68+459.67))", "D9": "acfm",
    "A10": "Design demand at intake (vendor form)", "B10": "Q_i2",
    "C10": "=C6*(14.7/C7)*(C8/68)", "D10": "acfm",
    "A11": "Discharge pressure", "B11": "p_d", "C11": 110, "D11": "psig",
    "A12": "Discharge pressure, absolute", "B12": "P_d", "C12": "=C11+14.7", "D12": "psia",
    "A13": "Compression ratio", "B13": "r", "C13": "=(C11+14.7)/C7", "D13": "-",
    "A14": "Compression ratio (vendor form)", "B14": "r2", "C14": "=C11/C7", "D14": "-",
    "A15": "Specific power", "B15": "SP", "C15": 18, "D15": "kW/(100 acfm)",
    "A16": "Compressor input power", "B16": "P", "C16": "=C9*C15/100", "D16": "kW",
    "A17": "Compressor input power, hp", "B17": "P_hp", "C17": "=C16/0.746", "D17": "hp",
    "A18": "Motor rating selected", "B18": "P_m", "C18": 150, "D18": "hp",
    "A19": "Motor rating, kW", "B19": "P_mk", "C19": "=C18*0.746", "D19": "kW",
    "A20": "Motor rating, kW (electrical schedule)", "B20": "P_mk2", "C20": "=C18/0.746",
    "D20": "kW",
    "A21": "Running hours per year", "B21": "t_a", "C21": 6000, "D21": "h",
    "A22": "Annual energy", "B22": "E", "C22": "=C16*C21/1000", "D22": "MWh",
    "A23": "Annual energy, kWh (tariff sheet)", "B23": "E_k", "C23": "=C16*C21/1000",
    "D23": "kWh",
    "A24": "Allowed drop across storage", "B24": "dp_s", "C24": 15, "D24": "psi",
    "A25": "Storage duration for peak event", "B25": "t_s", "C25": 1.5, "D25": "min",
    "A26": "Peak event excess demand", "B26": "Q_p", "C26": "=Demand!E9-C4", "D26": "scfm",
    "A27": "Receiver volume", "B27": "V", "C27": "=C25*C26*C7/C24", "D27": "ft³",
    "A28": "Receiver volume, gal", "B28": "V_g", "C28": "=C27*7.48", "D28": "gal",
    "A29": "Receiver volume, gal (purchase order)", "B29": "V_g2", "C29": "=C27/7.48",
    "D29": "gal",
}
AIR_LEAK = {
    "A1": "Ashdown Castings: weekend leak test, pressure decay in the receivers (invented)",
    "A2": "Sources: leakage (cfm free air) = V (P1 - P2)/(T x 14.7) x 1.25, V ft³, P psig, "
          "T min (Compressed Air Challenge, Best Practices, 2nd ed., leak section; US DOE "
          "compressed air tip sheet); 18 kW per 100 cfm (common practice, from memory)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "System volume (receivers + piping)", "B4": "V", "C4": 410, "D4": "ft³",
    "A5": "Start pressure", "B5": "p1", "C5": 100, "D5": "psig",
    "A6": "End pressure", "B6": "p2", "C6": 50, "D6": "psig",
    "A7": "Decay time", "B7": "t", "C7": 9.5, "D7": "min",
    "A8": "Decay time, logged", "B8": "t_s", "C8": "=C7*60", "D8": "s",
    "A9": "Leakage", "B9": "Q_L", "C9": "=C4*(C5-C6)/(C7*14.7)*1.25", "D9": "scfm",
    "A10": "Leakage (from the logger time)", "B10": "Q_L2", "C10": "=C4*(C5-C6)/(C8*14.7)*1.25",
    "D10": "scfm",
    "A11": "Leakage share of average demand", "B11": "x_L", "C11": "=C9/Plant!C4*100",
    "D11": "%",
    "A12": "Leakage share (dashboard)", "B12": "x_L2", "C12": "=C9/Plant!C4", "D12": "%",
    "A13": "Leak power", "B13": "P_L", "C13": "=C9*Plant!C15/100", "D13": "kW",
    "A14": "Leak energy per year (8760 h, pressurised)", "B14": "E_L",
    "C14": "=C13*8760/1000", "D14": "MWh",
    "A15": "Leak status", "B15": "flag", "C15": "=IF(C11>Plant!C5,\"FIX LEAKS\",\"OK\")",
    "A16": "Start pressure, kPa(g)", "B16": "p1_k", "C16": "=C5*6.895", "D16": "kPa(g)",
    "A17": "Start pressure, bar(g)", "B17": "p1_b", "C17": "=C5/14.5", "D17": "bar(g)",
}

# --------------------------------------------------------------------------------------------
# Book 4: steam turbine generator output and heat rate (BTU/kWh, kJ/kWh, t/h, MW)
# --------------------------------------------------------------------------------------------
STG_DATA = {
    "A1": "Fenwick CHP unit 1: steam turbine generator, guarantee point (invented)",
    "A2": "Sources: power = m (h1 - h2); turbine cycle heat rate = m (h1 - h_fw)/P_gen; "
          "efficiency = 3600/HR (kJ/kWh) = 3412/HR (BTU/kWh) (common practice, ASME PTC 6 "
          "definitions); enthalpies from steam tables (from memory); 1 BTU = 1.055 kJ, "
          "1 kWh = 3412 BTU, 1 bar = 14.5 psi, t/h / 3.6 = kg/s (NIST SP 811)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Main steam flow", "B4": "m", "C4": 180, "D4": "t/h",
    "A5": "Main steam pressure", "B5": "p1", "C5": 124, "D5": "bar(g)",
    "A6": "Main steam temperature", "B6": "T1", "C6": 540, "D6": "°C",
    "A7": "Main steam enthalpy", "B7": "h1", "C7": 3450, "D7": "kJ/kg",
    "A8": "Exhaust enthalpy, actual", "B8": "h2", "C8": 2350, "D8": "kJ/kg",
    "A9": "Exhaust enthalpy, isentropic", "B9": "h2s", "C9": 2080, "D9": "kJ/kg",
    "A10": "Final feedwater enthalpy", "B10": "h_fw", "C10": 1050, "D10": "kJ/kg",
    "A11": "Condenser pressure", "B11": "p_c", "C11": 0.08, "D11": "bar(a)",
    "A12": "Generator efficiency", "B12": "eta_g", "C12": 98.2, "D12": "%",
    "A13": "Boiler efficiency (HHV)", "B13": "eta_b", "C13": 88, "D13": "%",
    "A14": "Main steam flow, kg/s", "B14": "m_s", "C14": "=C4/3.6", "D14": "kg/s",
    "A15": "Main steam flow, kg/s (DCS tag)", "B15": "m_s2", "C15": "=C4*3.6", "D15": "kg/s",
    "A16": "Main steam temperature, K", "B16": "T1_K", "C16": "=C6+273.15", "D16": "K",
    "A17": "Main steam temperature, °F", "B17": "T1_F", "C17": "=C6*1.8+32", "D17": "°F",
    "A18": "Main steam temperature, °F (US datasheet)", "B18": "T1_F2", "C18": "=C6*1.8",
    "D18": "°F",
    "A19": "Main steam pressure, psig", "B19": "p1_p", "C19": "=C5*14.5", "D19": "psig",
    "A20": "Condenser pressure, kPa", "B20": "p_ck", "C20": "=C11*100", "D20": "kPa",
    "A21": "Expansion pressure ratio", "B21": "r", "C21": "=C5/C11", "D21": "-",
}
STG_PERF = {
    "A1": "Fenwick CHP unit 1: output and heat rate (invented)",
    "A2": "Sources: as the Data sheet (ASME PTC 6 definitions, common practice; NIST SP 811 "
          "factors)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Turbine shaft power", "B4": "P_t", "C4": "=Data!C14*(Data!C7-Data!C8)", "D4": "kW",
    "A5": "Turbine shaft power (from t/h)", "B5": "P_t2", "C5": "=Data!C4*(Data!C7-Data!C8)",
    "D5": "kW",
    "A6": "Generator output", "B6": "P_g", "C6": "=C4*Data!C12/100/1000", "D6": "MW",
    "A7": "Generator output (one-line diagram)", "B7": "P_g2", "C7": "=C4*Data!C12/1000",
    "D7": "MW",
    "A8": "Heat added to steam", "B8": "Q", "C8": "=Data!C14*(Data!C7-Data!C10)", "D8": "kW",
    "A9": "Turbine cycle heat rate", "B9": "HR", "C9": "=C8*3600/(C6*1000)", "D9": "kJ/kWh",
    "A10": "Turbine cycle heat rate, BTU/kWh", "B10": "HR_B", "C10": "=C9/1.055",
    "D10": "BTU/kWh",
    "A11": "Turbine cycle heat rate, BTU/kWh (US report)", "B11": "HR_B2", "C11": "=C9*1.055",
    "D11": "BTU/kWh",
    "A12": "Turbine cycle efficiency", "B12": "eta_c", "C12": "=3600/C9*100", "D12": "%",
    "A13": "Turbine cycle efficiency (from BTU/kWh)", "B13": "eta_c2", "C13": "=3412/C10*100",
    "D13": "%",
    "A14": "Turbine cycle efficiency (summary)", "B14": "eta_c3", "C14": "=3412/C9*100",
    "D14": "%",
    "A15": "Isentropic efficiency", "B15": "eta_s",
    "C15": "=(Data!C7-Data!C8)/(Data!C7-Data!C9)*100", "D15": "%",
    "A16": "Net unit heat rate (fuel)", "B16": "HR_n", "C16": "=C9/(Data!C13/100)",
    "D16": "kJ/kWh",
    "A17": "Steam rate", "B17": "SR", "C17": "=Data!C4*1000/(C6*1000)", "D17": "kg/kWh",
    "A18": "Steam rate, lb/kWh", "B18": "SR_lb", "C18": "=C17*2.205", "D18": "lb/kWh",
    "A19": "Operating hours per year", "B19": "t_a", "C19": 7600, "D19": "h",
    "A20": "Annual generation", "B20": "E_a", "C20": "=C6*C19", "D20": "MWh",
    "A21": "Annual generation, GWh", "B21": "E_G", "C21": "=C20/1000", "D21": "GWh",
    "A22": "Annual generation (budget sheet)", "B22": "E_a2", "C22": "=C6*C19/1000",
    "D22": "MWh",
    "A23": "Output check against 55 MW rating", "B23": "chk",
    "C23": "=IF(C6>55,\"ABOVE RATING\",\"OK\")",
}
STG_LOAD = {
    "A1": "Fenwick CHP unit 1: part-load test points (invented)",
    "A2": "Sources: steam rate = steam flow/output, t/h per MW = kg/kWh; heat rate = "
          "m (h1 - h_fw)/P (common practice, ASME PTC 6 definitions)",
    "A3": "Point", "B3": "Output [MW]", "C3": "Steam flow [t/h]", "D3": "Steam rate [kg/kWh]",
    "E3": "Heat rate [kJ/kWh]",
    "A4": "100 %", "B4": 53.2, "C4": 180,
    "A5": "85 %", "B5": 45.1, "C5": 155,
    "A6": "70 %", "B6": 37.3, "C6": 131,
    "A7": "50 %", "B7": 26.5, "C7": 98,
    "A8": "Mean", "B8": "=AVERAGE(B4:B7)", "D8": "=AVERAGE(D4:D7)", "E8": "=AVERAGE(E4:E7)",
    "A9": "Best (lowest) heat rate", "E9": "=MIN(E4:E7)",
    "A10": "Worst heat rate", "E10": "=MAX(E4:E7)",
}
for r in range(4, 8):
    STG_LOAD[f"D{r}"] = f"=C{r}/B{r}"
    STG_LOAD[f"E{r}"] = f"=C{r}*1000*(Data!$C$7-Data!$C$10)/(B{r}*1000)"
STG_LOAD["D6"] = "=C6*1000/B6"       # planted: t/h to kg/h but MW left as MW

BOOKS = {
    "weymouth-gas-lateral": {
        "trade": "natural gas pipeline: lateral capacity by the Weymouth equation",
        "sheets": [("Data", GAS_DATA), ("Flow", GAS_FLOW), ("Meter", GAS_METER)],
        "planted": {
            "Data!C24": ("unit-scale", "miles to feet divided by 5280: wrong way round"),
            "Flow!C7": ("offset-scale", "Weymouth with gauge pressures in P1² - P2²"),
            "Flow!C8": ("offset-scale", "Weymouth with the flowing temperature in °F, not °R"),
            "Flow!C9": ("unit-scale", "scf/d / 10⁶ written as Mscf/d: 1000 too small"),
            "Flow!C15": ("unit-scale", "psi to kPa divided by 6.895: wrong way round"),
            "Flow!C20": ("offset-scale", "psia inlet pressure compared with a psig MAOP"),
            "Meter!F6": ("offset-scale", "°F + 273.15 into a °R column"),
            "Meter!G7": ("unit-scale", "Mscf/d / 10⁶ into MMscf/d: 1000 too small"),
        },
    },
    "boiler-blowdown": {
        "trade": "boiler house: feedwater and blowdown balance",
        "sheets": [("Steam", BLR_STEAM), ("Balance", BLR_BAL), ("Heat", BLR_HEAT)],
        "planted": {
            "Balance!C16": ("unit-scale", "blowdown / feedwater left as a fraction in a % cell"),
            "Balance!C19": ("unit-scale", "lb/h to kg/h multiplied by 2.205: wrong way round"),
            "Balance!C21": ("unit-scale", "60 % condensate return used as a fraction: 1 - 60"),
            "Balance!C23": ("unit-scale", "lb/h to gpm multiplied by 500: wrong way round"),
            "Balance!C27": ("offset-scale", "psia looked up in a table keyed on psig"),
            "Heat!C6": ("unit-scale", "BTU/h / 3.412 gives W, written as kW"),
            "Heat!C15": ("offset-scale", "°F inlet minus a °C outlet temperature"),
            "Heat!C17": ("unit-scale", "°F to °C multiplied by 1.8: wrong way round"),
        },
    },
    "compressed-air-plant": {
        "trade": "compressed air: plant sizing and leak test",
        "sheets": [("Demand", AIR_DEMAND), ("Plant", AIR_PLANT), ("Leak", AIR_LEAK)],
        "planted": {
            "Demand!D6": ("unit-scale", "duty in % used as a fraction"),
            "Plant!C10": ("offset-scale", "intake correction as a ratio of °F temperatures"),
            "Plant!C14": ("offset-scale", "compression ratio of a gauge over an absolute pressure"),
            "Plant!C20": ("unit-scale", "hp to kW divided by 0.746: wrong way round"),
            "Plant!C23": ("unit-scale", "kW·h / 1000 written as kWh: 1000 too small"),
            "Plant!C29": ("unit-scale", "ft³ to gal divided by 7.48: wrong way round"),
            "Leak!C10": ("unit-scale", "decay time in s in a formula that needs min"),
            "Leak!C12": ("unit-scale", "leakage share left as a fraction in a % cell"),
        },
    },
    "steam-turbine-heat-rate": {
        "trade": "power generation: steam turbine generator output and heat rate",
        "sheets": [("Data", STG_DATA), ("Performance", STG_PERF), ("LoadTest", STG_LOAD)],
        "planted": {
            "Data!C15": ("unit-scale", "t/h to kg/s multiplied by 3.6: wrong way round"),
            "Data!C18": ("offset-scale", "°C to °F without the +32"),
            "Data!C21": ("offset-scale", "ratio of a bar(g) over an absolute bar pressure"),
            "Performance!C5": ("unit-scale", "t/h times kJ/kg written as kW: /3.6 missing"),
            "Performance!C7": ("unit-scale", "98.2 % generator efficiency used as a fraction"),
            "Performance!C11": ("unit-scale", "kJ/kWh to BTU/kWh multiplied by 1.055: wrong way"),
            "Performance!C14": ("unit-scale", "3412 (BTU per kWh) over a heat rate in kJ/kWh"),
            "Performance!C22": ("unit-scale", "MW·h / 1000 written as MWh: 1000 too small"),
            "LoadTest!D6": ("unit-scale", "t/h * 1000 over MW into kg/kWh: 1000 too large"),
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
