#!/usr/bin/env python3
"""Four review workbooks for plumb's workbook checking (review25), written with the standard
zipfile module (xlsx_writer.py, copied from corpus/sheets/review2 and extended with VLOOKUP
and ROUND).

Trades (all scenarios invented):
  1. steam-condensate: a dairy's steam and condensate balance (kg/h, lb/h, barg, psig, bar a,
     kJ/kg by VLOOKUP on a steam table sheet, kW)
  2. road-culvert-ditch: a road drainage catchment, roadside ditch and culvert (m³/s, cfs,
     mm/h, ha, acres, Manning n, slopes in % and ft/ft, velocities)
  3. cng-lng-station: a CNG / L-CNG fuel station for a municipal fleet (kg, GGE/DGE, MJ, Nm³,
     bar g, °C, kg/h dispensing, MJ/kg)
  4. solar-hot-water: a care home's solar thermal hot water system (m², kWh/m²/day, L/day, °C,
     kW, %, W/m²K)

Every formula cell is either a planted mistake (PLANTED, with the rule expected) or a correct
cell that must stay clean. Run: python3 make_books.py -> *.xlsx, *.cells.plumb, *.planted (the
*.expect files beside the books add, by hand, every finding on a correct cell and the slip
plumb still misses, each with why),
expect.json in this folder.
"""
import json
import os

from xlsx_writer import write_xlsx

HERE = os.path.dirname(os.path.abspath(__file__))

# --------------------------------------------------------------------------------------------
# Book 1: steam and condensate balance
# --------------------------------------------------------------------------------------------
# Saturated steam by pressure: p [bar a], Tsat [°C], hf, hfg, hg [kJ/kg], vg [m³/kg]
# Values from memory of the IAPWS-IF97 saturation tables, rounded; check against a printed
# table (e.g. Rogers & Mayhew, Thermodynamic and Transport Properties of Fluids) before use.
STEAM_ROWS = [
    (1.01325, 100.0, 419.1, 2256.4, 2675.5, 1.673),
    (2, 120.2, 504.7, 2201.6, 2706.2, 0.8857),
    (3, 133.5, 561.4, 2163.5, 2724.9, 0.6058),
    (4, 143.6, 604.7, 2133.4, 2738.1, 0.4624),
    (5, 151.8, 640.1, 2107.4, 2747.5, 0.3748),
    (6, 158.8, 670.4, 2085.0, 2755.5, 0.3156),
    (7, 165.0, 697.0, 2064.9, 2762.0, 0.2728),
    (8, 170.4, 720.9, 2046.5, 2767.5, 0.2403),
    (9, 175.4, 742.6, 2029.5, 2772.1, 0.2149),
    (10, 179.9, 762.6, 2013.6, 2776.2, 0.1944),
    (11, 184.1, 781.1, 1998.5, 2779.7, 0.1774),
    (12, 188.0, 798.4, 1984.3, 2782.7, 0.1632),
    (14, 195.0, 830.1, 1957.7, 2787.8, 0.1408),
    (16, 201.4, 858.6, 1933.2, 2791.7, 0.1237),
]
STEAM = {
    "A1": "Saturated steam, by pressure (extract)",
    "A2": "Source: IAPWS-IF97 saturation properties, rounded (values from memory; check "
          "against a printed steam table before use)",
    "A4": "p [bar a]", "B4": "Tsat [°C]", "C4": "hf [kJ/kg]", "D4": "hfg [kJ/kg]",
    "E4": "hg [kJ/kg]", "F4": "vg [m³/kg]",
}
for i, row in enumerate(STEAM_ROWS, 5):
    for col, v in zip("ABCDEF", row):
        STEAM[f"{col}{i}"] = v
TBL = "SteamTable!$A$5:$F$18"

USERS = {
    "A1": "Kilnmoor dairy: steam users on the HP (9 barg) and LP (3 barg) mains (invented plant)",
    "A2": "Sources: duty = m·hfg/3600 (kg/h × kJ/kg → kW), Spirax Sarco, The Steam and "
          "Condensate Loop (from memory); bar a = barg + 1.013 (common practice); "
          "1 kg = 2.2046 lb and 1 bar = 14.5 psi (NIST SP 811, App. B.8, rounded)",
    "A4": "User", "B4": "Steam [kg/h]", "C4": "Supply [barg]", "D4": "Supply [bar a]",
    "E4": "hfg [kJ/kg]", "F4": "Duty [kW]", "G4": "Steam [lb/h]", "H4": "Supply [psig]",
    "A5": "Pasteuriser 1", "B5": 850, "C5": 3,
    "A6": "Pasteuriser 2", "B6": 850, "C6": 3,
    "A7": "CIP heater", "B7": 1200, "C7": 3,
    "A8": "Evaporator", "B8": 3400, "C8": 9,
    "A9": "Spray dryer air heater", "B9": 2600, "C9": 9,
    "A10": "Tank heating", "B10": 300, "C10": 3,
    "A11": "Total", "B11": "=SUM(B5:B10)", "F11": "=SUM(F5:F10)", "G11": "=SUM(G5:G10)",
}
for r in range(5, 11):
    USERS[f"D{r}"] = f"=C{r}+1.013"
    USERS[f"E{r}"] = f"=VLOOKUP(ROUND(D{r},0),{TBL},4,FALSE)"
    USERS[f"F{r}"] = f"=B{r}*E{r}/3600"
    USERS[f"G{r}"] = f"=B{r}*2.2046"
    USERS[f"H{r}"] = f"=C{r}*14.5"
USERS["E8"] = f"=VLOOKUP(ROUND(C8,0),{TBL},4,FALSE)"   # planted: barg key into a bar a table
USERS["F9"] = "=B9*E9/1000"                              # planted: /1000 for /3600
USERS["G7"] = "=B7/2.2046"                               # planted: factor the wrong way round
USERS["H10"] = "=D10*14.5"                               # planted: bar a into psig

BALANCE = {
    "A1": "Kilnmoor dairy: steam and condensate balance (invented plant)",
    "A2": "Sources: flash fraction (hf1 − hf2)/hfg2 and boiler fuel m·(hg − hfw)/η: Spirax "
          "Sarco, The Steam and Condensate Loop (from memory); feedwater enthalpy ≈ 4.19·t "
          "kJ/kg from the 0 °C datum of the steam tables (common practice); steam velocity "
          "m·vg/A (common practice); 1 bar = 100 kPa (SI Brochure 9th ed., Table 8); "
          "°F = 1.8·°C + 32 (NIST SP 811, App. B.9)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Total steam demand", "B4": "m_s", "C4": "=Users!B11", "D4": "kg/h",
    "A5": "Total steam demand, lb/h", "B5": "m_s_lb", "C5": "=C4*2.2046", "D5": "lb/h",
    "A6": "Boiler outlet pressure", "B6": "p_b", "C6": 10, "D6": "barg",
    "A7": "Boiler outlet pressure, absolute", "B7": "p_ba", "C7": "=C6+1.013", "D7": "bar a",
    "A8": "Boiler outlet pressure, psig", "B8": "p_bp", "C8": "=C6*14.5", "D8": "psig",
    "A9": "Boiler outlet pressure, kPa g", "B9": "p_bk", "C9": "=C6*100", "D9": "kPa(g)",
    "A10": "Saturation temperature at boiler", "B10": "T_sat",
    "C10": f"=VLOOKUP(ROUND(C7,0),{TBL},2,FALSE)", "D10": "°C",
    "A11": "Saturation temperature, °F", "B11": "T_satF", "C11": "=C10*1.8+32", "D11": "°F",
    "A12": "Enthalpy of dry saturated steam at boiler", "B12": "h_g",
    "C12": f"=VLOOKUP(ROUND(C7,0),{TBL},5,FALSE)", "D12": "kJ/kg",
    "A13": "Condensate returned, share of steam", "B13": "x_c", "C13": 65, "D13": "%",
    "A14": "Condensate returned", "B14": "m_c", "C14": "=C4*C13/100", "D14": "kg/h",
    "A15": "Condensate returned (site log basis)", "B15": "m_c2", "C15": "=C4*C13",
    "D15": "kg/h",
    "A16": "Condensate return temperature", "B16": "T_c", "C16": 85, "D16": "°C",
    "A17": "Make-up water temperature", "B17": "T_m", "C17": 12, "D17": "°C",
    "A18": "Make-up water", "B18": "m_m", "C18": "=C4-C14", "D18": "kg/h",
    "A19": "Feedwater temperature (mixed)", "B19": "T_fw", "C19": "=(C14*C16+C18*C17)/C4",
    "D19": "°C",
    "A20": "Feedwater enthalpy", "B20": "h_fw", "C20": "=4.19*C19", "D20": "kJ/kg",
    "A21": "Boiler efficiency (gross)", "B21": "eta_b", "C21": 84, "D21": "%",
    "A22": "Boiler fuel input", "B22": "Q_f", "C22": "=C4*(C12-C20)/(C21/100)/3600",
    "D22": "kW",
    "A23": "Boiler fuel input (from feed temperature)", "B23": "Q_f2",
    "C23": "=C4*(C12-C19)/(C21/100)/3600", "D23": "kW",
    "A24": "Boiler fuel input, MW", "B24": "Q_fMW", "C24": "=C22/1000", "D24": "MW",
    "A25": "Flash vessel pressure", "B25": "p_f", "C25": 3, "D25": "barg",
    "A26": "Flash vessel pressure, absolute", "B26": "p_fa", "C26": "=C25+1.013", "D26": "bar a",
    "A27": "hf of HP condensate (9 barg users)", "B27": "h_f1",
    "C27": f"=VLOOKUP(ROUND(Users!D8,0),{TBL},3,FALSE)", "D27": "kJ/kg",
    "A28": "hf at flash vessel pressure", "B28": "h_f2",
    "C28": f"=VLOOKUP(ROUND(C26,0),{TBL},3,FALSE)", "D28": "kJ/kg",
    "A29": "hfg at flash vessel pressure", "B29": "h_fg2",
    "C29": f"=VLOOKUP(ROUND(C26,0),{TBL},4,FALSE)", "D29": "kJ/kg",
    "A30": "Flash steam fraction", "B30": "x_f", "C30": "=(C27-C28)/C29*100", "D30": "%",
    "A31": "HP condensate to flash vessel", "B31": "m_hp", "C31": "=Users!B8+Users!B9",
    "D31": "kg/h",
    "A32": "Flash steam to LP main", "B32": "m_f", "C32": "=C31*C30/100", "D32": "kg/h",
    "A33": "Heat recovered as flash steam", "B33": "Q_fl", "C33": "=C32*C29/3600", "D33": "kW",
    "A34": "Steam main bore (DN150, Sch 40)", "B34": "d", "C34": 154.1, "D34": "mm",
    "A35": "Specific volume at boiler", "B35": "v_g",
    "C35": f"=VLOOKUP(ROUND(C7,0),{TBL},6,FALSE)", "D35": "m³/kg",
    "A36": "Steam velocity in main", "B36": "v", "C36": "=C4/3600*C35/(PI()*(C34/1000)^2/4)",
    "D36": "m/s",
    "A37": "Steam velocity in main (as first issued)", "B37": "v2",
    "C37": "=C4/3600*C35/(PI()*C34^2/4)", "D37": "m/s",
    "A38": "Velocity limit, saturated steam main", "B38": "v_max", "C38": 35, "D38": "m/s",
    "A39": "Velocity check", "B39": "flag", "C39": "=IF(C36<=C38,\"OK\",\"HIGH\")",
    "A40": "Main length", "B40": "L", "C40": 180, "D40": "m",
    "A41": "Heat loss per metre, insulated", "B41": "q_l", "C41": 95, "D41": "W/m",
    "A42": "Main heat loss", "B42": "Q_l", "C42": "=C41*C40/1000", "D42": "kW",
    "A43": "Condensate formed in main", "B43": "m_l",
    "C43": f"=C42*3600/VLOOKUP(ROUND(C7,0),{TBL},4,FALSE)", "D43": "kg/h",
    "A44": "Boiler duty with mains losses (summary sheet)", "B44": "Q_t2",
    "C44": "=Users!F11+C41*C40", "D44": "kW",
    "A45": "Boiler duty with mains losses", "B45": "Q_t", "C45": "=Users!F11+C42", "D45": "kW",
    "A46": "Largest single user", "B46": "m_max", "C46": "=MAX(Users!B5:B10)", "D46": "kg/h",
}

# --------------------------------------------------------------------------------------------
# Book 2: road drainage catchment, roadside ditch and culvert
# --------------------------------------------------------------------------------------------
CATCH = {
    "A1": "B4127 Hollin Moss realignment, ch. 2+350: culvert catchment (invented scheme)",
    "A2": "Sources: rational method Q = C·i·A/360 (m³/s, mm/h, ha) and Q = C·i·A (cfs, in/h, "
          "acres): FHWA HEC-22, Urban Drainage Design Manual (from memory); travel time "
          "L/(60·V), NRCS TR-55 velocity method (from memory); 1 ha = 2.471 acres, "
          "1 m³/s = 35.31 cfs, 1 in = 25.4 mm (NIST SP 811, App. B.8, rounded)",
    "A4": "Sub-catchment", "B4": "Area [ha]", "C4": "Runoff C [-]", "D4": "C·A [ha]",
    "E4": "Area [acres]", "F4": "Flow length [m]", "G4": "Velocity [m/s]",
    "H4": "Travel time [min]",
    "A5": "Carriageway and hard strip", "B5": 0.82, "C5": 0.9, "F5": 410, "G5": 0.9,
    "A6": "Verges and cutting slopes", "B6": 0.55, "C6": 0.35, "F6": 120, "G6": 0.3,
    "A7": "Improved pasture", "B7": 6.4, "C7": 0.25, "F7": 380, "G7": 0.45,
    "A8": "Woodland", "B8": 3.1, "C8": 0.15, "F8": 260, "G8": 0.25,
    "A9": "Total / longest", "B9": "=SUM(B5:B8)", "D9": "=SUM(D5:D8)", "E9": "=SUM(E5:E8)",
    "H9": "=MAX(H5:H8)",
    "A11": "Item", "B11": "Symbol", "C11": "Value", "D11": "Unit",
    "A12": "Weighted runoff coefficient", "B12": "C_w", "C12": "=D9/B9", "D12": "-",
    "A13": "Entry time", "B13": "t_e", "C13": 5, "D13": "min",
    "A14": "Time of concentration", "B14": "t_c", "C14": "=C13+H9", "D14": "min",
    "A15": "Rainfall intensity, 1 in 100 yr, duration t_c", "B15": "i", "C15": 68,
    "D15": "mm/h",
    "A16": "Climate change allowance", "B16": "x_cc", "C16": 20, "D16": "%",
    "A17": "Design intensity", "B17": "i_d", "C17": "=C15*(1+C16/100)", "D17": "mm/h",
    "A18": "Design flow", "B18": "Q", "C18": "=C12*C17*B9/360", "D18": "m³/s",
    "A19": "Design flow (hand check)", "B19": "Q2", "C19": "=D9*C17/3.6", "D19": "m³/s",
    "A20": "Design flow, cfs", "B20": "Q_cfs", "C20": "=C18*35.31", "D20": "cfs",
    "A21": "Design intensity, in/h", "B21": "i_in", "C21": "=C17/25.4", "D21": "in/h",
    "A22": "Design flow, US form C·i·A", "B22": "Q_US", "C22": "=C12*C21*E9", "D22": "cfs",
    "A23": "Design flow, L/s", "B23": "Q_Ls", "C23": "=C18*1000", "D23": "L/s",
}
for r in range(5, 9):
    CATCH[f"D{r}"] = f"=B{r}*C{r}"
    CATCH[f"E{r}"] = f"=B{r}*2.471"
    CATCH[f"H{r}"] = f"=F{r}/G{r}/60"
CATCH["E7"] = "=B7/2.471"      # planted: factor the wrong way round
CATCH["H6"] = "=F6/G6"         # planted: seconds into a minutes column

DITCH = {
    "A1": "Hollin Moss: roadside ditch, trapezoidal, grass-lined (invented scheme)",
    "A2": "Sources: Manning V = (1/n)·R^(2/3)·S^(1/2) (SI) and V = (1.49/n)·R^(2/3)·S^(1/2) "
          "(US): V. T. Chow, Open-Channel Hydraulics, 1959, Sec. 5-6 (from memory); trapezoid "
          "A = (b + z·y)·y, P = b + 2y·√(1 + z²), T = b + 2zy and Fr = V/√(g·A/T): Chow, ch. 2-3 "
          "(from memory); 1 m = 3.281 ft (NIST SP 811, rounded)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Design flow", "B4": "Q", "C4": "=Catchment!C18", "D4": "m³/s",
    "A5": "Bottom width", "B5": "b", "C5": 0.6, "D5": "m",
    "A6": "Side slope (horizontal per vertical)", "B6": "z", "C6": 2, "D6": "-",
    "A7": "Flow depth (trial)", "B7": "y", "C7": 450, "D7": "mm",
    "A8": "Flow depth, m", "B8": "y_m", "C8": "=C7/1000", "D8": "m",
    "A9": "Flow area", "B9": "A", "C9": "=(C5+C6*C8)*C8", "D9": "m²",
    "A10": "Flow area (sketch values)", "B10": "A2", "C10": "=(C5+C6*C7)*C7", "D10": "m²",
    "A11": "Wetted perimeter", "B11": "P", "C11": "=C5+2*C8*SQRT(1+C6^2)", "D11": "m",
    "A12": "Hydraulic radius", "B12": "R", "C12": "=C9/C11", "D12": "m",
    "A13": "Longitudinal gradient", "B13": "S", "C13": 1.5, "D13": "%",
    "A14": "Longitudinal gradient, ft/ft", "B14": "S_ft", "C14": "=C13/100", "D14": "ft/ft",
    "A15": "Manning n, grass-lined", "B15": "n", "C15": 0.035, "D15": "s/m^(1/3)",
    "A16": "Mean velocity", "B16": "V", "C16": "=1/C15*C12^(2/3)*(C13/100)^0.5", "D16": "m/s",
    "A17": "Mean velocity (first trial)", "B17": "V2", "C17": "=1/C15*C12^(2/3)*C13^0.5",
    "D17": "m/s",
    "A18": "Capacity", "B18": "Q_c", "C18": "=C16*C9", "D18": "m³/s",
    "A19": "Capacity, cfs", "B19": "Q_ccfs", "C19": "=C18*35.31", "D19": "cfs",
    "A20": "Hydraulic radius, ft", "B20": "R_ft", "C20": "=C12*3.281", "D20": "ft",
    "A21": "Mean velocity, US form", "B21": "V_US", "C21": "=1.49/C15*C20^(2/3)*C14^0.5",
    "D21": "ft/s",
    "A22": "Mean velocity, ft/s", "B22": "V_fps", "C22": "=C16*3.281", "D22": "ft/s",
    "A23": "Top width", "B23": "T", "C23": "=C5+2*C6*C8", "D23": "m",
    "A24": "Froude number", "B24": "Fr", "C24": "=C16/SQRT(9.81*C9/C23)", "D24": "-",
    "A25": "Froude number (spot check)", "B25": "Fr2", "C25": "=C16/SQRT(C9/C23)", "D25": "-",
    "A26": "Permissible velocity, grass", "B26": "V_max", "C26": 1.8, "D26": "m/s",
    "A27": "Velocity check", "B27": "flag", "C27": "=IF(C16<=C26,\"OK\",\"LINE DITCH\")",
    "A28": "Capacity check", "B28": "flag2", "C28": "=IF(C18>=C4,\"OK\",\"DEEPEN\")",
    "A29": "Freeboard", "B29": "f", "C29": 150, "D29": "mm",
    "A30": "Ditch depth required", "B30": "D_d", "C30": "=C8+C29/1000", "D30": "m",
    "A31": "Velocity check, US reviewer copy", "B31": "flag3",
    "C31": "=IF(C22<=C26,\"OK\",\"LINE DITCH\")",
}

CULVERT = {
    "A1": "Hollin Moss: road culvert, outlet control (invented scheme)",
    "A2": "Sources: outlet-control loss H = [1 + ke + 2g·n²·L/R^(4/3)]·V²/(2g), outlet depth "
          "ho = max(TW, (dc + D)/2) and HW = H + ho − L·So: FHWA HDS-5, Hydraulic Design of "
          "Highway Culverts (from memory); ke = 0.5 square-edged headwall (HDS-5 table, from "
          "memory); 1 ft = 0.3048 m (NIST SP 811, exact)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Design flow", "B4": "Q", "C4": "=Catchment!C18", "D4": "m³/s",
    "A5": "Pipe diameter", "B5": "D", "C5": 900, "D5": "mm",
    "A6": "Barrel length", "B6": "L", "C6": 24, "D6": "m",
    "A7": "Barrel slope", "B7": "S_o", "C7": 0.8, "D7": "%",
    "A8": "Manning n, concrete pipe", "B8": "n", "C8": 0.012, "D8": "s/m^(1/3)",
    "A9": "Entrance loss coefficient", "B9": "k_e", "C9": 0.5, "D9": "-",
    "A10": "Gravity", "B10": "g", "C10": 9.81, "D10": "m/s²",
    "A11": "Barrel area", "B11": "A", "C11": "=PI()*(C5/1000)^2/4", "D11": "m²",
    "A12": "Full-barrel velocity", "B12": "V", "C12": "=C4/C11", "D12": "m/s",
    "A13": "Hydraulic radius, full", "B13": "R", "C13": "=C5/1000/4", "D13": "m",
    "A14": "Friction term", "B14": "k_f", "C14": "=2*C10*C8^2*C6/C13^(4/3)", "D14": "-",
    "A15": "Outlet-control head loss", "B15": "H", "C15": "=(1+C9+C14)*C12^2/(2*C10)",
    "D15": "m",
    "A16": "Friction term (from D)", "B16": "k_f2", "C16": "=2*C10*C8^2*C6/(C5/4)^(4/3)",
    "D16": "-",
    "A17": "Tailwater depth", "B17": "TW", "C17": 0.55, "D17": "m",
    "A18": "Critical depth (HDS-5 chart)", "B18": "d_c", "C18": 0.62, "D18": "m",
    "A19": "Outlet reference depth", "B19": "h_o", "C19": "=MAX(C17,(C18+C5/1000)/2)",
    "D19": "m",
    "A20": "Headwater, outlet control", "B20": "HW", "C20": "=C15+C19-C6*C7/100", "D20": "m",
    "A21": "Headwater, outlet control (check)", "B21": "HW2", "C21": "=C15+C19-C6*C7",
    "D21": "m",
    "A22": "Headwater to diameter", "B22": "HW_D", "C22": "=C20/(C5/1000)", "D22": "-",
    "A23": "Allowable HW/D", "B23": "HW_Dmax", "C23": 1.2, "D23": "-",
    "A24": "Headwater check", "B24": "flag", "C24": "=IF(C22<=C23,\"OK\",\"UPSIZE\")",
    "A25": "Outlet velocity, ft/s", "B25": "V_fps", "C25": "=C12/0.3048", "D25": "ft/s",
    "A26": "Headwater, ft", "B26": "HW_ft", "C26": "=C20*3.281", "D26": "ft",
    "A27": "Outlet velocity, maximum of barrel and ditch", "B27": "V_out",
    "C27": "=MAX(C12,Ditch!C16)", "D27": "m/s",
}

# --------------------------------------------------------------------------------------------
# Book 3: CNG / L-CNG fuel station
# --------------------------------------------------------------------------------------------
FLEET = {
    "A1": "Harland Road depot: CNG demand of the municipal fleet (invented scheme)",
    "A2": "Sources: GGE = 5.660 lb = 2.567 kg and DGE = 6.384 lb = 2.896 kg of CNG, NIST "
          "Handbook 44 / NCWM (from memory); natural gas LHV 47.1 MJ/kg and normal density "
          "0.78 kg/Nm³ (from memory, typical pipeline gas); diesel 35.8 MJ/L (from memory); "
          "1 kWh = 3.6 MJ (SI Brochure 9th ed., Table 8); compressor specific energy "
          "0.28 kWh/Nm³ to 250 bar g (from memory)",
    "A4": "Fleet", "B4": "Vehicles [-]", "C4": "Distance [km/d]",
    "D4": "Fuel use [kg/100 km]", "E4": "Daily fuel [kg/d]", "F4": "Daily fuel [DGE/d]",
    "G4": "Daily energy [MJ/d]",
    "A5": "Refuse trucks", "B5": 14, "C5": 120, "D5": 38,
    "A6": "City buses", "B6": 22, "C6": 210, "D6": 32,
    "A7": "Vans", "B7": 30, "C7": 140, "D7": 9,
    "A8": "Yard tractors", "B8": 8, "C8": 60, "D8": 20,
    "A9": "Total", "B9": "=SUM(B5:B8)", "E9": "=SUM(E5:E8)", "F9": "=SUM(F5:F8)",
    "G9": "=SUM(G5:G8)",
    "A11": "Item", "B11": "Symbol", "C11": "Value", "D11": "Unit",
    "A13": "Daily demand", "B13": "m_d", "C13": "=E9", "D13": "kg/d",
    "A14": "Daily demand, GGE", "B14": "m_gge", "C14": "=C13/2.567", "D14": "GGE/d",
    "A16": "Lower heating value", "B16": "LHV", "C16": 47.1, "D16": "MJ/kg",
    "A17": "Daily energy", "B17": "E_d", "C17": "=C13*C16", "D17": "MJ/d",
    "A18": "Daily energy, kWh", "B18": "E_kWh", "C18": "=C17/3.6", "D18": "kWh/d",
    "A19": "Daily energy, kWh (tariff sheet)", "B19": "E_kWh2", "C19": "=C17*3.6",
    "D19": "kWh/d",
    "A20": "Diesel energy density", "B20": "e_dsl", "C20": 35.8, "D20": "MJ/L",
    "A21": "Diesel displaced", "B21": "V_dsl", "C21": "=C17/C20", "D21": "L/d",
    "A22": "Normal gas density", "B22": "rho_n", "C22": 0.78, "D22": "kg/Nm³",
    "A23": "Daily gas volume", "B23": "V_n", "C23": "=C13/C22", "D23": "Nm³/d",
    "A25": "Compressor running time", "B25": "t_op", "C25": 18, "D25": "h/d",
    "A26": "Compressor capacity required", "B26": "m_c", "C26": "=C13/C25", "D26": "kg/h",
    "A27": "Compressor capacity, Nm³/h", "B27": "V_c", "C27": "=C26/C22", "D27": "Nm³/h",
    "A28": "Compressor capacity, Nm³/h (vendor form)", "B28": "V_c2", "C28": "=C26*C22",
    "D28": "Nm³/h",
    "A29": "Compressor specific energy", "B29": "e_c", "C29": 0.28, "D29": "kWh/Nm³",
    "A30": "Compressor shaft power", "B30": "P_c", "C30": "=C27*C29", "D30": "kW",
    "A31": "Bus fill (one day's fuel)", "B31": "m_f", "C31": 67, "D31": "kg",
    "A32": "Fast-fill time per bus", "B32": "t_f", "C32": 6, "D32": "min",
    "A33": "Dispenser flow required", "B33": "q_f", "C33": "=C31/C32*60", "D33": "kg/h",
    "A34": "Dispenser flow required (second dispenser)", "B34": "q_f2", "C34": "=C31/C32",
    "D34": "kg/h",
    "A35": "Dispenser rated flow", "B35": "q_r", "C35": 25, "D35": "kg/min",
    "A36": "Dispenser check", "B36": "flag", "C36": "=IF(C33<=C35*60,\"OK\",\"SLOW\")",
}
for r in range(5, 9):
    FLEET[f"E{r}"] = f"=B{r}*C{r}*D{r}/100"
    FLEET[f"F{r}"] = f"=E{r}/2.896"
    FLEET[f"G{r}"] = f"=E{r}*$C$16"
FLEET["E6"] = "=B6*C6*D6"       # planted: per 100 km not divided by 100
FLEET["F7"] = "=E7*2.896"       # planted: factor the wrong way round

STORAGE = {
    "A1": "Harland Road depot: cascade storage (invented scheme)",
    "A2": "Sources: real gas m = p·V·M/(Z·R·T), p absolute in Pa, T in K: Çengel & Boles, "
          "Thermodynamics, ch. 3 (from memory); R = 8.314 J/(mol·K) (CODATA 2018, rounded); "
          "methane M = 16.04 g/mol (IUPAC atomic weights, rounded); Z of pipeline gas at "
          "15 °C (from memory); bar a = bar g + 1.013 (common practice); 1 bar = 14.5 psi "
          "(NIST SP 811, rounded)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Cascade water capacity (3 banks)", "B4": "V", "C4": 4200, "D4": "L",
    "A5": "Storage pressure, full", "B5": "p_1", "C5": 250, "D5": "bar g",
    "A6": "Storage pressure, full, absolute", "B6": "p_1a", "C6": "=C5+1.013", "D6": "bara",
    "A7": "Storage pressure, full, psig", "B7": "p_1p", "C7": "=C5*14.5", "D7": "psig",
    "A8": "Minimum bank pressure", "B8": "p_2", "C8": 100, "D8": "bar g",
    "A9": "Minimum bank pressure, absolute", "B9": "p_2a", "C9": "=C8+1.013", "D9": "bara",
    "A10": "Gas temperature", "B10": "T", "C10": 15, "D10": "°C",
    "A11": "Gas temperature, absolute", "B11": "T_K", "C11": "=C10+273.15", "D11": "K",
    "A12": "Molar mass (methane)", "B12": "M", "C12": 16.04, "D12": "g/mol",
    "A13": "Molar gas constant", "B13": "R", "C13": 8.314, "D13": "J/(mol·K)",
    "A14": "Compressibility at full pressure", "B14": "Z_1", "C14": 0.80, "D14": "-",
    "A15": "Compressibility at minimum pressure", "B15": "Z_2", "C15": 0.86, "D15": "-",
    "A16": "Stored mass, full", "B16": "m_1",
    "C16": "=C6*100000*C4/1000*C12/1000/(C14*C13*C11)", "D16": "kg",
    "A17": "Stored mass at minimum pressure", "B17": "m_2",
    "C17": "=C9*100000*C4/1000*C12/1000/(C15*C13*C11)", "D17": "kg",
    "A18": "Usable mass", "B18": "m_u", "C18": "=C16-C17", "D18": "kg",
    "A19": "Stored mass, full (gauge reading)", "B19": "m_1g",
    "C19": "=C5*100000*C4/1000*C12/1000/(C14*C13*C11)", "D19": "kg",
    "A20": "Stored mass, full (site temperature)", "B20": "m_1t",
    "C20": "=C6*100000*C4/1000*C12/1000/(C14*C13*C10)", "D20": "kg",
    "A21": "Usable gas, GGE", "B21": "m_ugge", "C21": "=C18/2.567", "D21": "GGE",
    "A22": "Usable energy", "B22": "E_u", "C22": "=C18*Fleet!C16", "D22": "MJ",
    "A23": "Whole bus fills from storage", "B23": "n_f", "C23": "=ROUNDDOWN(C18/Fleet!C31,0)",
    "D23": "-",
    "A24": "Compressor recovery time", "B24": "t_r", "C24": "=C18/Fleet!C26", "D24": "h",
    "A25": "Compressor recovery time, min", "B25": "t_rm", "C25": "=C18/Fleet!C26*60",
    "D25": "min",
    "A26": "Compressor recovery time, min (duty log)", "B26": "t_rm2",
    "C26": "=C18/Fleet!C26/60", "D26": "min",
}

LNG = {
    "A1": "Harland Road depot: LNG tank and vaporiser for L-CNG supply (invented scheme)",
    "A2": "Sources: LNG density 430 kg/m³, boiling point −162 °C and latent heat 510 kJ/kg, "
          "gas cp 2.2 kJ/(kg·K) (typical values, from memory); vaporiser duty "
          "m·(hfg + cp·ΔT)/3600 (common practice); boil-off as % of contents per day "
          "(common practice)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Tank gross volume", "B4": "V_t", "C4": 60, "D4": "m³",
    "A5": "Maximum fill", "B5": "x_fill", "C5": 90, "D5": "%",
    "A6": "LNG density", "B6": "rho_L", "C6": 430, "D6": "kg/m³",
    "A7": "LNG capacity", "B7": "m_L", "C7": "=C4*C5/100*C6", "D7": "kg",
    "A8": "LNG capacity, t", "B8": "m_Lt", "C8": "=C7/1000", "D8": "t",
    "A9": "Boil-off rate", "B9": "x_bo", "C9": 0.15, "D9": "%/d",
    "A10": "Boil-off", "B10": "m_bo", "C10": "=C7*C9/100", "D10": "kg/d",
    "A11": "Boil-off (vendor data sheet)", "B11": "m_bo2", "C11": "=C7*C9", "D11": "kg/d",
    "A12": "Send-out to L-CNG pumps", "B12": "m_s", "C12": "=Fleet!C26", "D12": "kg/h",
    "A13": "Latent heat of LNG", "B13": "h_fg", "C13": 510, "D13": "kJ/kg",
    "A14": "LNG temperature", "B14": "T_L", "C14": -162, "D14": "°C",
    "A15": "Gas outlet temperature", "B15": "T_g", "C15": 10, "D15": "°C",
    "A16": "Gas specific heat", "B16": "c_p", "C16": 2.2, "D16": "kJ/(kg·K)",
    "A17": "Vaporiser duty", "B17": "Q_v", "C17": "=C12*(C13+C16*(C15-C14))/3600", "D17": "kW",
    "A18": "Vaporiser duty (outlet basis)", "B18": "Q_v2", "C18": "=C12*(C13+C16*C15)/3600",
    "D18": "kW",
    "A19": "Autonomy on a full tank", "B19": "t_aut", "C19": "=C7/Fleet!C13", "D19": "d",
    "A20": "LNG energy density by volume", "B20": "e_v", "C20": "=C6*Fleet!C16/1000",
    "D20": "MJ/L",
    "A21": "Energy density against diesel", "B21": "r_e", "C21": "=C20/Fleet!C20", "D21": "-",
    "A22": "Energy in a full tank", "B22": "E_t", "C22": "=C7*Fleet!C16/1000", "D22": "GJ",
}

# --------------------------------------------------------------------------------------------
# Book 4: solar thermal hot water
# --------------------------------------------------------------------------------------------
DEMAND = {
    "A1": "Elmfield care home: hot water demand (invented scheme)",
    "A2": "Sources: heat to water Q = V·ρ·c·ΔT with 1 kg/L and 4.19 kJ/(kg·K), 3600 kJ per "
          "kWh (common practice; 1 kWh = 3.6 MJ, SI Brochure 9th ed., Table 8); draw-offs per "
          "head (invented for this scheme); °F = 1.8·°C + 32 (NIST SP 811, App. B.9)",
    "A4": "Use", "B4": "Count [-]", "C4": "Draw per head [L/day]", "D4": "Daily volume [L/day]",
    "A5": "Residents", "B5": 48, "C5": 45,
    "A6": "Staff on shift", "B6": 20, "C6": 10,
    "A7": "Kitchen (per meal served)", "B7": 150, "C7": 4,
    "A8": "Laundry (per machine)", "B8": 4, "C8": 100,
    "A9": "Total", "B9": "", "D9": "=SUM(D5:D8)",
    "A11": "Item", "B11": "Symbol", "C11": "Value", "D11": "Unit",
    "A12": "Daily hot water", "B12": "V_d", "C12": "=D9", "D12": "L/day",
    "A13": "Cold feed temperature", "B13": "T_c", "C13": 10, "D13": "°C",
    "A14": "Set point (legionella control)", "B14": "T_s", "C14": 60, "D14": "°C",
    "A15": "Temperature rise", "B15": "dT", "C15": "=C14-C13", "D15": "K",
    "A16": "Daily heat demand", "B16": "Q_d", "C16": "=C12*4.19*C15/3600", "D16": "kWh/day",
    "A17": "Daily heat demand (from set point)", "B17": "Q_d2", "C17": "=C12*4.19*C14/3600",
    "D17": "kWh/day",
    "A18": "Daily heat demand (metering sheet)", "B18": "Q_d3", "C18": "=C12*4.19*C15",
    "D18": "kWh/day",
    "A19": "Set point, °F", "B19": "T_sF", "C19": "=C14*1.8+32", "D19": "°F",
    "A20": "Annual heat demand", "B20": "Q_a", "C20": "=C16*365/1000", "D20": "MWh/yr",
    "A21": "Distribution losses", "B21": "x_l", "C21": 15, "D21": "%",
    "A22": "Daily heat demand with losses", "B22": "Q_g", "C22": "=C16*(1+C21/100)",
    "D22": "kWh/day",
}
for r in range(5, 9):
    DEMAND[f"D{r}"] = f"=B{r}*C{r}"
del DEMAND["B9"]

COLL = {
    "A1": "Elmfield care home: collector array (invented scheme)",
    "A2": "Sources: collector efficiency η = η0 − a1·(Tm − Ta)/G − a2·(Tm − Ta)²/G with η0, "
          "a1, a2 on gross area: EN ISO 9806:2017 (from memory); module data invented; daily "
          "yield A·H·η_sys and low-flow rate 15 L/(h·m²) (common practice); temperature rise "
          "Φ/(ṁ·cp) (common practice)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Module width", "B4": "w", "C4": 1150, "D4": "mm",
    "A5": "Module height", "B5": "h", "C5": 2010, "D5": "mm",
    "A6": "Module gross area", "B6": "A_m", "C6": "=C4*C5/1000000", "D6": "m²",
    "A7": "Module gross area (data sheet check)", "B7": "A_m2", "C7": "=C4*C5/1000", "D7": "m²",
    "A8": "Number of modules", "B8": "N", "C8": 12, "D8": "-",
    "A9": "Array gross area", "B9": "A", "C9": "=C8*C6", "D9": "m²",
    "A10": "Zero-loss efficiency", "B10": "eta0", "C10": 0.78, "D10": "-",
    "A11": "Heat loss coefficient a1", "B11": "a1", "C11": 3.6, "D11": "W/m²K",
    "A12": "Heat loss coefficient a2", "B12": "a2", "C12": 0.015, "D12": "W/m²K²",
    "A13": "Mean fluid temperature", "B13": "T_m", "C13": 45, "D13": "°C",
    "A14": "Ambient temperature", "B14": "T_a", "C14": 14, "D14": "°C",
    "A15": "Design irradiance", "B15": "G", "C15": 800, "D15": "W/m²",
    "A16": "Design irradiance, kW/m²", "B16": "G_k", "C16": "=C15/1000", "D16": "kW/m²",
    "A17": "Collector efficiency at design point", "B17": "eta",
    "C17": "=C10-C11*(C13-C14)/C15-C12*(C13-C14)^2/C15", "D17": "-",
    "A18": "Collector efficiency (irradiance from pyranometer log)", "B18": "eta2",
    "C18": "=C10-C11*(C13-C14)/C16-C12*(C13-C14)^2/C16", "D18": "-",
    "A19": "Collector efficiency, %", "B19": "eta_p", "C19": "=C17*100", "D19": "%",
    "A20": "Peak array output", "B20": "P_pk", "C20": "=C9*C15*C17/1000", "D20": "kW",
    "A21": "Peak array output (summary)", "B21": "P_pk2", "C21": "=C9*C15*C17", "D21": "kW",
    "A22": "Daily irradiation on collector plane (design month)", "B22": "H", "C22": 4.1,
    "D22": "kWh/m²/day",
    "A23": "Mean daily system efficiency", "B23": "eta_s", "C23": 45, "D23": "%",
    "A24": "Daily solar yield", "B24": "Q_s", "C24": "=C9*C22*C23/100", "D24": "kWh/day",
    "A25": "Daily solar yield (quick estimate)", "B25": "Q_s2", "C25": "=C9*C22*C23",
    "D25": "kWh/day",
    "A26": "Specific flow (low-flow system)", "B26": "q_sp", "C26": 15, "D26": "L/(h·m²)",
    "A27": "Array flow", "B27": "q", "C27": "=C26*C9", "D27": "L/h",
    "A28": "Fluid density (40 % propylene glycol)", "B28": "rho", "C28": 1.04, "D28": "kg/L",
    "A29": "Fluid specific heat", "B29": "c_p", "C29": 3.7, "D29": "kJ/(kg·K)",
    "A30": "Array mass flow", "B30": "m", "C30": "=C27*C28/3600", "D30": "kg/s",
    "A31": "Collector temperature rise at peak", "B31": "dT_c", "C31": "=C20/(C30*C29)",
    "D31": "K",
    "A32": "Collector temperature rise at peak (commissioning sheet)", "B32": "dT_c2",
    "C32": "=C20*1000/(C30*C29)", "D32": "K",
}

SYSTEM = {
    "A1": "Elmfield care home: store, back-up and savings (invented scheme)",
    "A2": "Sources: store 50-70 L per m² of collector (common practice); standing loss "
          "UA·(Ts − Ta)·24 h (common practice); reheat Φ = V·c·ΔT/t with 1 kg/L, 4.19 "
          "kJ/(kg·K) (common practice); gas emission factor 0.183 kg CO2/kWh (from memory, "
          "UK published factors); a year of 365 days (common practice)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Solar fraction, design month", "B4": "f_s", "C4": "=Collector!C24/Demand!C22*100",
    "D4": "%",
    "A5": "Solar fraction, design month (cover sheet)", "B5": "f_s2",
    "C5": "=Collector!C24/Demand!C22", "D5": "%",
    "A6": "Store volume per collector area", "B6": "v_sp", "C6": 60, "D6": "L/m²",
    "A7": "Solar store volume", "B7": "V_s", "C7": "=C6*Collector!C9", "D7": "L",
    "A8": "Solar store volume, m³", "B8": "V_sm", "C8": "=C7/1000", "D8": "m³",
    "A9": "Store heat loss coefficient", "B9": "UA", "C9": 3.2, "D9": "W/K",
    "A10": "Store mean temperature", "B10": "T_st", "C10": 55, "D10": "°C",
    "A11": "Plant room temperature", "B11": "T_pr", "C11": 18, "D11": "°C",
    "A12": "Store standing loss", "B12": "Q_st", "C12": "=C9*(C10-C11)*24/1000",
    "D12": "kWh/day",
    "A13": "Store standing loss (manufacturer's form)", "B13": "Q_st2",
    "C13": "=C9*(C10-C11)*24", "D13": "kWh/day",
    "A14": "Peak-hour reheat volume", "B14": "V_r", "C14": 600, "D14": "L",
    "A15": "Reheat time", "B15": "t_r", "C15": 1.5, "D15": "h",
    "A16": "Back-up heater rating", "B16": "P_b", "C16": "=C14*4.19*Demand!C15/(3600*C15)",
    "D16": "kW",
    "A17": "Annual irradiation on collector plane", "B17": "H_a", "C17": 1150,
    "D17": "kWh/(m²·yr)",
    "A18": "Annual system efficiency", "B18": "eta_a", "C18": 38, "D18": "%",
    "A19": "Annual solar yield", "B19": "Q_a", "C19": "=Collector!C9*C17*C18/100/1000",
    "D19": "MWh/yr",
    "A20": "Gas boiler seasonal efficiency", "B20": "eta_g", "C20": 88, "D20": "%",
    "A21": "Gas saved", "B21": "G_s", "C21": "=C19/(C20/100)", "D21": "MWh/yr",
    "A22": "Gas emission factor", "B22": "EF", "C22": 0.183, "D22": "kg/kWh",
    "A23": "Carbon dioxide saved", "B23": "CO2", "C23": "=C21*C22", "D23": "t/yr",
    "A24": "Annual solar share", "B24": "f_a", "C24": "=C19/Demand!C20*100", "D24": "%",
    "A25": "Store size check", "B25": "flag",
    "C25": "=IF(C7>=50*Collector!C9,\"OK\",\"SMALL\")",
}

BOOKS = {
    "steam-condensate": {
        "trade": "process steam: a dairy's steam and condensate balance",
        "sheets": [("SteamTable", STEAM), ("Users", USERS), ("Balance", BALANCE)],
        "planted": {
            "Users!E8": ("offset-scale", "steam table in bar a looked up with the barg reading"),
            "Users!F9": ("unit-scale", "kg/h × kJ/kg divided by 1000 into kW: should be /3600"),
            "Users!G7": ("unit-scale", "kg/h to lb/h divided by 2.2046: wrong way round"),
            "Users!H10": ("offset-scale", "absolute bar × 14.5 written as psig"),
            "Balance!C15": ("unit-scale", "65 % used as a fraction: 100 times too large"),
            "Balance!C23": ("sum-mismatch", "hg (kJ/kg) minus the feed temperature in °C"),
            "Balance!C37": ("unit-scale", "steam velocity from the bore in mm: 10⁶ too small"),
            "Balance!C44": ("unit-scale", "kW total plus W/m × m mains loss"),
        },
    },
    "road-culvert-ditch": {
        "trade": "road drainage: catchment, roadside ditch and culvert",
        "sheets": [("Catchment", CATCH), ("Ditch", DITCH), ("Culvert", CULVERT)],
        "planted": {
            "Catchment!E7": ("unit-scale", "ha to acres divided by 2.471: wrong way round"),
            "Catchment!H6": ("unit-scale", "L/V in seconds into the minutes column"),
            "Catchment!C19": ("unit-scale", "C·i·A/3.6 with A in ha (3.6 is for km²)"),
            "Ditch!C10": ("unit-scale", "flow area from the depth in mm beside width in m"),
            "Ditch!C17": ("unit-scale", "Manning with the slope in % under the root"),
            "Ditch!C25": ("unit-scale", "Froude number without g"),
            "Ditch!C31": ("unit-scale", "velocity in ft/s compared with a limit in m/s"),
            "Culvert!C16": ("unit-scale", "friction term with R from D in mm"),
            "Culvert!C21": ("unit-scale", "barrel fall L·S with S in % as a fraction"),
        },
    },
    "cng-lng-station": {
        "trade": "fuel station: CNG demand, cascade storage and L-CNG supply",
        "sheets": [("Fleet", FLEET), ("Storage", STORAGE), ("LNG", LNG)],
        "sidecar": "# Units the fuel trade uses that plumb's table lacks.\n"
                   "# NIST Handbook 44 / NCWM (from memory): a gasoline gallon equivalent of CNG\n"
                   "# is 5.660 lb (2.567 kg), a diesel gallon equivalent 6.384 lb (2.896 kg).\n"
                   "measure GGE = 2.567 kg \"gasoline gallon equivalent of CNG\"\n"
                   "measure DGE = 2.896 kg \"diesel gallon equivalent of CNG\"\n",
        "planted": {
            "Fleet!E6": ("unit-scale", "kg/100 km not divided by 100"),
            "Fleet!F7": ("unit-scale", "kg to DGE multiplied by 2.896: wrong way round"),
            "Fleet!C19": ("unit-scale", "MJ to kWh multiplied by 3.6: wrong way round"),
            "Fleet!C28": ("result-unit", "kg/h times kg/Nm³ into Nm³/h"),
            "Fleet!C34": ("unit-scale", "kg per min into kg/h without × 60"),
            "Storage!C19": ("offset-scale", "real-gas mass from the gauge pressure"),
            "Storage!C20": ("offset-scale", "real-gas mass from T in °C"),
            "Storage!C26": ("unit-scale", "hours to minutes divided by 60: wrong way round"),
            "LNG!C11": ("unit-scale", "0.15 %/d used as a fraction"),
            "LNG!C18": ("offset-scale", "vaporiser sensible heat from the outlet °C, not ΔT"),
        },
    },
    "solar-hot-water": {
        "trade": "solar thermal: a care home's solar hot water system",
        "sheets": [("Demand", DEMAND), ("Collector", COLL), ("System", SYSTEM)],
        "sidecar": "# A year for annual energy: 365 days (common practice)\n"
                   "measure yr = 365 d \"year of 365 days, for annual energy\"\n",
        "planted": {
            "Demand!C17": ("offset-scale", "heat to water from the set point in °C, not ΔT"),
            "Demand!C18": ("unit-scale", "L × 4.19 × K is kJ: no /3600 into kWh"),
            "Collector!C7": ("unit-scale", "mm × mm /1000 into m²: should be /10⁶"),
            "Collector!C18": ("unit-scale", "G in kW/m² with a1, a2 in W/m²K: 1000 × too large"),
            "Collector!C21": ("unit-scale", "m² × W/m² into kW without /1000"),
            "Collector!C25": ("unit-scale", "45 % system efficiency used as a fraction"),
            "Collector!C32": ("unit-scale", "kW × 1000 over kg/s × kJ/(kg·K): 1000 too large"),
            "System!C5": ("unit-scale", "solar fraction as a ratio written into a % cell"),
            "System!C13": ("unit-scale", "W/K × K × 24 h into kWh/day without /1000"),
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
        if "sidecar" in book:
            with open(os.path.join(HERE, stem + ".cells.plumb"), "w", encoding="utf-8") as f:
                f.write(book["sidecar"])
        formulas = formula_cells(book)
        for cell in book["planted"]:
            assert cell in formulas, f"{stem}: {cell} is not a formula cell"
        correct = [c for c in formulas if c not in book["planted"]]
        with open(os.path.join(HERE, stem + ".planted"), "w", encoding="utf-8") as f:
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
