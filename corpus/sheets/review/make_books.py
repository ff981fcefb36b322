#!/usr/bin/env python3
"""Five review workbooks for plumb's workbook checking, written with the standard zipfile module.

Each book is a practising engineer's calc sheet of one trade, laid out as such sheets are
(description, symbol, value, unit in columns A-D; tables with units in their headings).
Every formula cell is either a planted mistake (listed in PLANTED with the rule expected) or a
correct cell that must stay clean. Cells listed in CONVERSIONS are the correct conversions the
brief asks for (rounded factors, gauge + atmosphere, degC + 273.15, trade constants...).

Run: python3 make_books.py  ->  *.xlsx (+ sidecars), *.expect and expect.json beside this file.
Each .expect lists every finding plumb reports, for the corpus test: the planted mistakes (under
the rule plumb gives, where that is not the one first expected), the notes on correct cells, and
the correct cells still flagged (KNOWN_FLAGS), each with why.
"""
import json
import math
import os
import re
import zipfile

HERE = os.path.dirname(os.path.abspath(__file__))
OUT = HERE

# --------------------------------------------------------------------------------------------
# Book 1: a water utility's service reservoir and chlorine contact tank (SI, ML/d, mg/L)
# --------------------------------------------------------------------------------------------
RESERVOIR = {
    "A1": "Hillcrest service reservoir: storage and structure (invented scheme)",
    "A2": "Item", "B2": "Symbol", "C2": "Value", "D2": "Unit",
    "A3": "Average day demand", "B3": "Q_ad", "C3": 9.6, "D3": "ML/d",
    "A4": "Peak day factor", "B4": "k_pd", "C4": 1.8, "D4": "-",
    "A5": "Peak day demand", "B5": "Q_pd", "C5": "=C3*C4", "D5": "ML/d",
    "A6": "Internal diameter", "B6": "D", "C6": 32, "D6": "m",
    "A7": "Top water level above floor", "B7": "H_w", "C7": 6.5, "D7": "m",
    "A8": "Freeboard", "B8": "f_b", "C8": 500, "D8": "mm",
    "A9": "Plan area", "B9": "A", "C9": "=PI()*C6^2/4", "D9": "m²",
    "A10": "Stored volume", "B10": "V", "C10": "=C9*C7", "D10": "m³",
    "A11": "Stored volume", "B11": "V_ML", "C11": "=C10/1000", "D11": "ML",
    "A12": "Storage at peak day demand", "B12": "t_s", "C12": "=C10/(C5*1000/24)", "D12": "h",
    "A13": "Storage at peak day (check)", "B13": "t_s2", "C13": "=C10/C5*24", "D13": "h",
    "A14": "Overall wall height", "B14": "H_wall", "C14": "=C7+C8", "D14": "m",
    "A15": "Water density", "B15": "rho", "C15": 999.8, "D15": "kg/m3",
    "A16": "Gravity", "B16": "g", "C16": 9.81, "D16": "m/s2",
    "A17": "Water pressure at floor", "B17": "p_b", "C17": "=C15*C16*C7/1000", "D17": "kPa(g)",
    "A18": "Water pressure at floor (quick)", "B18": "p_q", "C18": "=C15*C7/1000", "D18": "kPa",
    "A19": "Ring tension at floor", "B19": "T_h", "C19": "=C17*C6/2", "D19": "kN/m",
    "A20": "Wall thickness", "B20": "t_w", "C20": 300, "D20": "mm",
    "A21": "Hoop stress in wall", "B21": "sigma_h", "C21": "=C19/C20", "D21": "MPa",
    "A22": "Storage / peak day demand", "B22": "r_s", "C22": "=C11/C5", "D22": "d",
    # level-volume table, units in the headings
    "F2": "Level [m]", "G2": "Volume [m³]", "H2": "Volume [ML]",
    "F3": 1, "G3": "=PI()*$C$6^2/4*F3", "H3": "=G3/1000",
    "F4": 2, "G4": "=PI()*$C$6^2/4*F4", "H4": "=G4/1000",
    "F5": 3, "G5": "=PI()*$C$6^2/4*F5", "H5": "=G5/1000",
    "F6": 4, "G6": "=PI()*$C$6^2/4*F6", "H6": "=G6/1000000",
    "F7": 5, "G7": "=PI()*$C$6^2/4*F7", "H7": "=G7/1000",
    "F8": 6.5, "G8": "=$C$9*F8", "H8": "=G8/1000",
}
CONTACT = {
    "A1": "Chlorine contact tank and dosing (invented scheme)",
    "A2": "Item", "B2": "Symbol", "C2": "Value", "D2": "Unit",
    "A3": "Peak day flow", "B3": "Q_pd", "C3": "=Reservoir!C5", "D3": "ML/d",
    "A4": "Peak hour factor", "B4": "k_ph", "C4": 1.5, "D4": "-",
    "A5": "Peak hour flow", "B5": "Q_ph", "C5": "=C3*C4*1000/24", "D5": "m³/h",
    "A6": "Chlorine dose", "B6": "c_d", "C6": 2.5, "D6": "mg/L",
    "A7": "Chlorine feed rate", "B7": "W_Cl", "C7": "=C3*C6", "D7": "kg/d",
    "A8": "Peak day flow, US", "B8": "Q_mgd", "C8": "=C3/3.785", "D8": "mgd",
    "A9": "Chlorine feed rate, US", "B9": "W_lb", "C9": "=C8*C6*8.34", "D9": "lb/d",
    "A10": "Feed rate from lb/d", "B10": "W_kg", "C10": "=C9*0.4536", "D10": "kg/d",
    "A11": "Chlorine feed rate (supplier sheet)", "B11": "W_s", "C11": "=C3*C6*8.34",
    "D11": "kg/d",
    "A12": "Hypochlorite strength (available Cl)", "B12": "x_h", "C12": 12.5, "D12": "%",
    "A13": "Hypochlorite density", "B13": "rho_h", "C13": 1.2, "D13": "kg/L",
    "A14": "Hypochlorite volume per day", "B14": "V_h", "C14": "=C7/(C12/100*C13)",
    "D14": "L/d",
    "A15": "Dosing pump rate", "B15": "q_p", "C15": "=C14/24", "D15": "L/h",
    "A16": "Hypochlorite volume (check)", "B16": "V_h2", "C16": "=C7/(C12*C13)", "D16": "L/d",
    "A17": "Tank length", "B17": "L", "C17": 24, "D17": "m",
    "A18": "Tank width", "B18": "W", "C18": 8, "D18": "m",
    "A19": "Water depth", "B19": "d", "C19": 3.5, "D19": "m",
    "A20": "Tank volume", "B20": "V_c", "C20": "=C17*C18*C19", "D20": "m³",
    "A21": "Baffling factor T10/T", "B21": "BF", "C21": 0.5, "D21": "-",
    "A22": "Contact time T10", "B22": "T10", "C22": "=C20*C21/C5*60", "D22": "min",
    "A23": "Contact time T10 (check)", "B23": "T10b", "C23": "=C20*C21/C5", "D23": "min",
    "A24": "Free chlorine residual", "B24": "C", "C24": 1.2, "D24": "mg/L",
    "A25": "CT provided", "B25": "CT", "C25": "=C24*C22", "D25": "mg·min/L",
    "A26": "CT required (Giardia, 3-log, 8 °C)", "B26": "CT_r", "C26": 45, "D26": "mg·min/L",
    "A27": "CT ratio", "B27": "CT_ratio", "C27": "=C25/C26", "D27": "-",
    "A28": "Water temperature", "B28": "T_w", "C28": 8, "D28": "°C",
    "A29": "Water temperature, absolute", "B29": "T_K", "C29": "=C28+273.15", "D29": "K",
    "A30": "Chlorine decay rate at 20 °C", "B30": "k_20", "C30": 0.05, "D30": "1/h",
    "A31": "Chlorine decay rate at T_w", "B31": "k_T", "C31": "=C30*1.047^(C28-20)",
    "D31": "1/h",
    "A32": "Chlorine store pressure", "B32": "p_st", "C32": 101.325, "D32": "kPa",
    "A33": "Molar mass of chlorine", "B33": "M", "C33": 70.9, "D33": "kg/kmol",
    "A34": "Gas constant", "B34": "R", "C34": 8.314, "D34": "kJ/(kmol·K)",
    "A35": "Store temperature", "B35": "T_st", "C35": 25, "D35": "°C",
    "A36": "Chlorine gas density", "B36": "rho_g", "C36": "=C32*C33/(C34*(C35+273.15))",
    "D36": "kg/m³",
    "A37": "Chlorine gas density (check)", "B37": "rho_g2", "C37": "=C32*C33/(C34*C35)",
    "D37": "kg/m³",
    "A38": "Concentration-time, residual x hours", "B38": "Ch", "C38": "=C24*C22/60",
    "D38": "mg·h/L",
}

# --------------------------------------------------------------------------------------------
# Book 2: a gas boiler's building heat loss and flue (degC, kW, Pa)
# --------------------------------------------------------------------------------------------
HEATLOSS = {
    "A1": "Brook Lane school annexe: design heat loss (invented building)",
    "A2": "Item", "B2": "Symbol", "C2": "Value", "D2": "Unit",
    "A3": "Design inside temperature", "B3": "T_i", "C3": 21, "D3": "°C",
    "A4": "Design outside temperature", "B4": "T_o", "C4": -3, "D4": "°C",
    "A5": "Design temperature difference", "B5": "dT", "C5": "=C3-C4", "D5": "K",
    "A6": "Heated volume", "B6": "V", "C6": 1450, "D6": "m³",
    "A7": "Air change rate", "B7": "n", "C7": 0.75, "D7": "1/h",
    "A8": "Ventilation heat loss", "B8": "Phi_v", "C8": "=0.33*C7*C6*C5", "D8": "W",
    "A10": "Fabric heat loss",
    "A11": "Element", "B11": "Area [m²]", "C11": "U-value [W/(m²·K)]", "D11": "Heat loss [W]",
    "A12": "External walls", "B12": 310, "C12": 0.28, "D12": "=B12*C12*$C$5",
    "A13": "Roof", "B13": 240, "C13": 0.16, "D13": "=B13*C13*$C$5",
    "A14": "Ground floor", "B14": 240, "C14": 0.22, "D14": "=B14*C14*$C$5",
    "A15": "Windows", "B15": 62, "C15": 1.4, "D15": "=B15*C15*$C$3",
    "A16": "Doors", "B16": 8, "C16": 1.8, "D16": "=B16*C16*($C$3-$C$4)",
    "A17": "Total fabric", "D17": "=SUM(D12:D16)",
    "A19": "Fabric heat loss", "B19": "Phi_f", "C19": "=D17/1000", "D19": "kW",
    "A20": "Total design heat loss (first pass)", "B20": "Phi_1", "C20": "=C19+C8", "D20": "kW",
    "A21": "Total design heat loss", "B21": "Phi", "C21": "=(D17+C8)/1000", "D21": "kW",
    "A22": "Margin for intermittent heating", "B22": "x_m", "C22": 15, "D22": "%",
    "A23": "Boiler output required", "B23": "Phi_b", "C23": "=C21*(1+C22/100)", "D23": "kW",
    "A24": "Boiler output (first pass)", "B24": "Phi_b1", "C24": "=C21*(1+C22)", "D24": "kW",
    "A25": "Annual degree-days (base 15.5 °C)", "B25": "DD", "C25": 2100, "D25": "K·d",
    "A26": "Annual heat demand", "B26": "E_a", "C26": "=C21/C5*C25*24", "D26": "kWh",
}
FLUE = {
    "A1": "Boiler flue and combustion check (invented plant)",
    "A2": "Item", "B2": "Symbol", "C2": "Value", "D2": "Unit",
    "A3": "Boiler output", "B3": "Phi_b", "C3": "=HeatLoss!C23", "D3": "kW",
    "A4": "Boiler efficiency (gross)", "B4": "eta", "C4": 89, "D4": "%",
    "A5": "Gas input (gross)", "B5": "Phi_in", "C5": "=C3/(C4/100)", "D5": "kW",
    "A6": "Gross calorific value of natural gas", "B6": "GCV", "C6": 39.5, "D6": "MJ/m³",
    "A7": "Gas volume flow", "B7": "Q_g", "C7": "=C5/C6*3.6", "D7": "m³/h",
    "A8": "Gas volume flow, imperial meter", "B8": "Q_gi", "C8": "=C7*35.31", "D8": "ft³/h",
    "A9": "Gas volume flow (meter sizing)", "B9": "Q_gm", "C9": "=C5/C6*3600", "D9": "m³/h",
    "A10": "Stoichiometric air", "B10": "A_st", "C10": 9.7, "D10": "-",
    "A11": "Excess air ratio", "B11": "lambda", "C11": 1.25, "D11": "-",
    "A12": "Flue gas volume at 0 °C", "B12": "Q_n", "C12": "=C7*(1+C10*C11)", "D12": "m³/h",
    "A13": "Flue gas temperature", "B13": "T_f", "C13": 145, "D13": "°C",
    "A14": "Outside air temperature", "B14": "T_a", "C14": 5, "D14": "°C",
    "A15": "Flue gas temperature, absolute", "B15": "T_fK", "C15": "=C13+273.15", "D15": "K",
    "A16": "Air temperature, absolute", "B16": "T_aK", "C16": "=C14+273.15", "D16": "K",
    "A17": "Flue gas volume at T_f", "B17": "Q_f", "C17": "=C12*C15/273.15", "D17": "m³/h",
    "A18": "Flue gas volume at T_f (check)", "B18": "Q_f2", "C18": "=C12*C13/273.15",
    "D18": "m³/h",
    "A19": "Flue internal diameter", "B19": "D_f", "C19": 125, "D19": "mm",
    "A20": "Flue bore area", "B20": "A_f", "C20": "=PI()*(C19/1000)^2/4", "D20": "m²",
    "A21": "Flue gas velocity", "B21": "v_f", "C21": "=C17/3600/C20", "D21": "m/s",
    "A22": "Flue bore area (check)", "B22": "A_f2", "C22": "=PI()*C19^2/4", "D22": "m²",
    "A23": "Air density at 0 °C", "B23": "rho_0", "C23": 1.293, "D23": "kg/m³",
    "A24": "Flue gas density at 0 °C", "B24": "rho_f0", "C24": 1.26, "D24": "kg/m³",
    "A25": "Air density at T_a", "B25": "rho_a", "C25": "=C23*273.15/C16", "D25": "kg/m³",
    "A26": "Flue gas density at T_f", "B26": "rho_f", "C26": "=C24*273.15/C15", "D26": "kg/m³",
    "A27": "Flue gas density (check)", "B27": "rho_f2", "C27": "=C24*273.15/C13",
    "D27": "kg/m³",
    "A28": "Flue height", "B28": "H", "C28": 9.5, "D28": "m",
    "A29": "Gravity", "B29": "g", "C29": 9.81, "D29": "m/s²",
    "A30": "Theoretical draught", "B30": "dp_d", "C30": "=C29*C28*(C25-C26)", "D30": "Pa",
    "A31": "Theoretical draught (check)", "B31": "dp_d2", "C31": "=C28*(C25-C26)", "D31": "Pa",
    "A32": "Flue gas mass flow", "B32": "m_f", "C32": "=C17*C26/3600", "D32": "kg/s",
    "A33": "Specific heat of flue gas", "B33": "c_p", "C33": 1.1, "D33": "kJ/(kg·K)",
    "A34": "Sensible heat lost up the flue", "B34": "Phi_fl", "C34": "=C32*C33*(C13-C14)",
    "D34": "kW",
    "A35": "Flue loss, share of input", "B35": "x_fl", "C35": "=C34/C5*100", "D35": "%",
    "A36": "Flue loss, share of input (check)", "B36": "x_fl2", "C36": "=C34/C5", "D36": "%",
}

# --------------------------------------------------------------------------------------------
# Book 3: an oil-field production separator and stock tank (psig, bbl/d, degF)
# --------------------------------------------------------------------------------------------
SEPARATOR = {
    "A1": "Pad 7 two-phase production separator (invented field)",
    "A2": "Item", "B2": "Symbol", "C2": "Value", "D2": "Unit",
    "A3": "Oil rate", "B3": "q_o", "C3": 4500, "D3": "bbl/d",
    "A4": "Water cut", "B4": "WC", "C4": 30, "D4": "%",
    "A5": "Gas rate", "B5": "q_g", "C5": 3.2, "D5": "MMscf/d",
    "A6": "Separator pressure", "B6": "p_s", "C6": 125, "D6": "psig",
    "A7": "Separator temperature", "B7": "T_s", "C7": 100, "D7": "°F",
    "A8": "Separator pressure, absolute", "B8": "p_sa", "C8": "=C6+14.7", "D8": "psia",
    "A9": "Separator temperature, absolute", "B9": "T_sR", "C9": "=C7+459.67", "D9": "°R",
    "A10": "Gas deviation factor", "B10": "Z", "C10": 0.91, "D10": "-",
    "A11": "Gas specific gravity (air = 1)", "B11": "SG_g", "C11": 0.68, "D11": "-",
    "A12": "Molar mass of air", "B12": "M_air", "C12": 28.97, "D12": "lb/lbmol",
    "A13": "Gas molar mass", "B13": "M_g", "C13": "=C12*C11", "D13": "lb/lbmol",
    "A14": "Gas constant", "B14": "R", "C14": 10.73, "D14": "psia·ft³/(lbmol·°R)",
    "A15": "Gas density at separator", "B15": "rho_g", "C15": "=C8*C13/(C10*C14*C9)",
    "D15": "lb/ft³",
    "A16": "Gas density (check)", "B16": "rho_g2", "C16": "=C8*C13/(C10*C14*C7)",
    "D16": "lb/ft³",
    "A17": "Actual gas flow", "B17": "Q_a", "C17": "=C5*1000000/86400*(14.7/C8)*(C9/520)*C10",
    "D17": "ft³/s",
    "A18": "Actual gas flow (check)", "B18": "Q_a2",
    "C18": "=C5*1000000/86400*(14.7/C6)*(C9/520)*C10", "D18": "ft³/s",
    "A19": "Oil gravity, °API", "B19": "API", "C19": 38, "D19": "-",
    "A20": "Oil specific gravity", "B20": "SG_o", "C20": "=141.5/(C19+131.5)", "D20": "-",
    "A21": "Oil density", "B21": "rho_o", "C21": "=C20*62.4", "D21": "lb/ft³",
    "A22": "Souders-Brown coefficient", "B22": "K_SB", "C22": 0.35, "D22": "ft/s",
    "A23": "Allowable gas velocity", "B23": "V_t", "C23": "=C22*SQRT((C21-C15)/C15)",
    "D23": "ft/s",
    "A24": "Allowable gas velocity, SI", "B24": "V_tm", "C24": "=C23*0.3048", "D24": "m/s",
    "A25": "Allowable gas velocity, SI (check)", "B25": "V_tm2", "C25": "=C23/0.3048",
    "D25": "m/s",
    "A26": "Gas flow area", "B26": "A_g", "C26": "=C17/C23", "D26": "ft²",
    "A27": "Minimum vessel ID", "B27": "D_min", "C27": "=SQRT(4*C26/PI())*12", "D27": "in",
    "A28": "Water rate", "B28": "q_w", "C28": "=C3*C4/(100-C4)", "D28": "bbl/d",
    "A29": "Water rate (check)", "B29": "q_w2", "C29": "=C3*C4/(1-C4)", "D29": "bbl/d",
    "A30": "Liquid rate", "B30": "q_l", "C30": "=C3+C28", "D30": "bbl/d",
    "A31": "Liquid retention time", "B31": "t_r", "C31": 3, "D31": "min",
    "A32": "Liquid settling volume", "B32": "V_l", "C32": "=C30*5.615/1440*C31", "D32": "ft³",
    "A33": "Liquid settling volume (check)", "B33": "V_l2", "C33": "=C30*5.615/24*C31",
    "D33": "ft³",
    "A34": "Stock tank pressure", "B34": "p_t", "C34": 2, "D34": "psig",
    "A35": "Flash pressure ratio", "B35": "r_f", "C35": "=C8/(C34+14.7)", "D35": "-",
    "A36": "Flash pressure ratio (check)", "B36": "r_f2", "C36": "=C6/C34", "D36": "-",
    # well test allocation table, units in the headings
    "F2": "Well", "G2": "Oil [bbl/d]", "H2": "Water cut [%]", "I2": "Water [bbl/d]",
    "J2": "Gas [Mscf/d]", "K2": "GOR [scf/bbl]",
    "F3": "P7-01", "G3": 1650, "H3": 22, "I3": "=G3*H3/(100-H3)", "J3": 1180, "K3": "=J3*1000/G3",
    "F4": "P7-02", "G4": 1400, "H4": 35, "I4": "=G4*H4/(100-H4)", "J4": 990, "K4": "=J4*1000/G4",
    "F5": "P7-03", "G5": 980, "H5": 31, "I5": "=G5*H5/(100-H5)", "J5": 640, "K5": "=J5*1000/G5",
    "F6": "P7-04", "G6": 470, "H6": 41, "I6": "=G6*H6/(100-H6)", "J6": 390, "K6": "=J6/G6",
    "F7": "Total", "G7": "=SUM(G3:G6)", "I7": "=SUM(I3:I6)", "J7": "=SUM(J3:J6)",
    "K7": "=J7*1000/G7",
}
TANK = {
    "A1": "Stock tank and heater treater (invented field)",
    "A2": "Item", "B2": "Symbol", "C2": "Value", "D2": "Unit",
    "A3": "Tank diameter", "B3": "D", "C3": 30, "D3": "ft",
    "A4": "Shell height", "B4": "H", "C4": 24, "D4": "ft",
    "A5": "Safe fill height", "B5": "H_f", "C5": 22, "D5": "ft",
    "A6": "Nominal capacity", "B6": "V_n", "C6": "=PI()*C3^2/4*C4/5.615", "D6": "bbl",
    "A7": "Working capacity (check)", "B7": "V_w2", "C7": "=PI()*C3^2/4*C5*5.615", "D7": "bbl",
    "A8": "Working capacity", "B8": "V_w", "C8": "=PI()*C3^2/4*C5/5.615", "D8": "bbl",
    "A9": "Working capacity, SI", "B9": "V_wm", "C9": "=C8*0.159", "D9": "m³",
    "A10": "Days of storage at oil rate", "B10": "t_st", "C10": "=C8/Separator!C3", "D10": "d",
    "A11": "Oil specific gravity", "B11": "SG_o", "C11": "=Separator!C20", "D11": "-",
    "A12": "Pressure at tank floor, full", "B12": "p_fl", "C12": "=0.433*C11*C5", "D12": "psig",
    "A13": "Pressure at tank floor (check)", "B13": "p_fl2", "C13": "=62.4*C11*C5",
    "D13": "psig",
    "A14": "Pressure at tank floor, from lb/ft³", "B14": "p_fl3", "C14": "=62.4*C11*C5/144",
    "D14": "psig",
    "A15": "Heater inlet temperature", "B15": "T_in", "C15": 60, "D15": "°F",
    "A16": "Heater outlet temperature", "B16": "T_out", "C16": 120, "D16": "°F",
    "A17": "Oil specific heat", "B17": "c_p", "C17": 0.5, "D17": "Btu/(lb·°F)",
    "A18": "Oil mass flow", "B18": "m_o", "C18": "=Separator!C3*5.615*Separator!C21/24",
    "D18": "lb/h",
    "A19": "Heater duty", "B19": "Q_h", "C19": "=C18*C17*(C16-C15)", "D19": "Btu/h",
    "A20": "Heater duty, SI", "B20": "Q_hk", "C20": "=C19/3412", "D20": "kW",
    "A21": "Heater outlet temperature, SI", "B21": "T_outC", "C21": "=(C16-32)/1.8",
    "D21": "°C",
    "A22": "Heater outlet temperature, SI (check)", "B22": "T_outC2", "C22": "=(C16-32)*1.8",
    "D22": "°C",
    "A23": "Design ambient (vendor data)", "B23": "T_amb", "C23": 46, "D23": "°C",
    "A24": "Design ambient", "B24": "T_ambF", "C24": "=C23*1.8+32", "D24": "°F",
    "A25": "Heater duty, from rate in bbl/d and 350 lb/bbl water", "B25": "Q_w",
    "C25": "=Separator!C28*350/24*(C16-C15)", "D25": "Btu/h",
}
SEPARATOR_SIDECAR = (
    "# Units the sheet uses that plumb's table lacks\n"
    "measure lbmol = 453.59237 mol \"pound-mole\"\n"
)

# --------------------------------------------------------------------------------------------
# Book 4: a one-way reinforced concrete floor slab (kN, mm, MPa)
# --------------------------------------------------------------------------------------------
SLAB = {
    "A1": "Level 2 plant room slab: one-way spanning RC slab (invented project)",
    "A2": "Item", "B2": "Symbol", "C2": "Value", "D2": "Unit",
    "A3": "Clear span", "B3": "L", "C3": 4.8, "D3": "m",
    "A4": "Slab thickness", "B4": "h", "C4": 200, "D4": "mm",
    "A5": "Nominal cover", "B5": "c_nom", "C5": 25,
    "A6": "Main bar diameter", "B6": "phi", "C6": 12,
    "A7": "Bar spacing", "B7": "s", "C7": 150,
    "A8": "Design strip width", "B8": "b", "C8": 1000, "D8": "mm",
    "A9": "Concrete density", "B9": "rho_c", "C9": 2500, "D9": "kg/m³",
    "A10": "Gravity", "B10": "g", "C10": 9.81, "D10": "m/s²",
    "A11": "Unit weight of concrete", "B11": "gamma_c", "C11": "=C9*C10/1000", "D11": "kN/m³",
    "A12": "Unit weight of concrete (quick)", "B12": "gamma_c2", "C12": "=C9/100",
    "D12": "kN/m³",
    "A13": "Self weight", "B13": "g_sw", "C13": "=C11*C4/1000", "D13": "kN/m²",
    "A14": "Self weight (check)", "B14": "g_sw2", "C14": "=C11*C4", "D14": "kN/m²",
    "A15": "Finishes and services", "B15": "g_f", "C15": 1.5, "D15": "kN/m²",
    "A16": "Imposed load (plant room)", "B16": "q_k", "C16": 7.5, "D16": "kN/m²",
    "A17": "ULS design load", "B17": "w", "C17": "=1.35*(C13+C15)+1.5*C16", "D17": "kN/m²",
    "A18": "ULS line load on strip", "B18": "w_l", "C18": "=C17*C8/1000", "D18": "kN/m",
    "A19": "Design moment", "B19": "M_Ed", "C19": "=C18*C3^2/8", "D19": "kN·m",
    "A20": "Design shear", "B20": "V_Ed", "C20": "=C18*C3/2", "D20": "kN",
    "A21": "Effective depth", "B21": "d", "C21": "=C4-C5-C6/2", "D21": "mm",
    "A22": "Concrete strength", "B22": "f_ck", "C22": 30, "D22": "N/mm²",
    "A23": "Reinforcement strength", "B23": "f_yk", "C23": 500, "D23": "N/mm²",
    "A24": "K", "B24": "K", "C24": "=C19*1000000/(C8*C21^2*C22)", "D24": "-",
    "A25": "K (check)", "B25": "K2", "C25": "=C19/(C8*C21^2*C22)", "D25": "-",
    "A26": "Lever arm", "B26": "z", "C26": "=MIN(C21*(0.5+SQRT(0.25-C24/1.134)),0.95*C21)",
    "D26": "mm",
    "A27": "Tension steel required", "B27": "A_s,req", "C27": "=C19*1000000/(0.87*C23*C26)",
    "D27": "mm²",
    "A28": "Tension steel required (check)", "B28": "A_s,req2",
    "C28": "=C19*1000/(0.87*C23*C26)", "D28": "mm²",
    "A29": "Tension steel provided", "B29": "A_s,prov", "C29": "=PI()*C6^2/4*C8/C7",
    "D29": "mm²",
    "A30": "Mean tensile strength", "B30": "f_ctm", "C30": "=0.3*C22^(2/3)", "D30": "MPa",
    "A31": "Minimum steel", "B31": "A_s,min", "C31": "=0.26*C30/C23*C8*C21", "D31": "mm²",
    "A32": "Span / effective depth", "B32": "L/d", "C32": "=C3*1000/C21", "D32": "-",
    "A33": "Span / effective depth (check)", "B33": "L/d2", "C33": "=C3/C21", "D33": "-",
    "A34": "Shear stress", "B34": "v_Ed", "C34": "=C20*1000/(C8*C21)", "D34": "MPa",
    "A35": "Shear stress (check)", "B35": "v_Ed2", "C35": "=C20/(C8*C21)", "D35": "MPa",
    "A36": "Concrete modulus", "B36": "E_cm", "C36": 33, "D36": "GPa",
    "A37": "Second moment of area", "B37": "I", "C37": "=C8*C4^3/12", "D37": "mm⁴",
    "A38": "SLS line load", "B38": "w_s", "C38": "=(C13+C15+C16)*C8/1000", "D38": "kN/m",
    "A39": "Mid-span deflection", "B39": "delta",
    "C39": "=5*C38*(C3*1000)^4/(384*C36*1000*C37)", "D39": "mm",
    "A40": "Mid-span deflection (check)", "B40": "delta2",
    "C40": "=5*C38*C3^4/(384*C36*1000*C37)", "D40": "mm",
    "A41": "Deflection limit span/250", "B41": "delta_lim", "C41": "=C3*1000/250", "D41": "mm",
    "A42": "Point load from plant plinth", "B42": "P", "C42": 12000, "D42": "N",
    "A43": "Support reaction with plinth", "B43": "R", "C43": "=C20+C42", "D43": "kN",
    "A44": "Support reaction with plinth (check)", "B44": "R2", "C44": "=C20+C42/1000",
    "D44": "kN",
}
SLAB_SIDECAR = (
    "# Units of the detailing inputs, which the sheet leaves without a unit column\n"
    "cells Slab!C5:C7 : mm \"cover, bar diameter and spacing from the detailing schedule\"\n"
)

# --------------------------------------------------------------------------------------------
# Book 5: an air-handling unit's supply duct and fan, and a plant-room air compressor
# (Pa, m3/h, degC, barg)
# --------------------------------------------------------------------------------------------
DUCT = {
    "A1": "AHU-2 supply duct and fan (invented building)",
    "A2": "Item", "B2": "Symbol", "C2": "Value", "D2": "Unit",
    "A3": "Supply air volume flow", "B3": "q_v", "C3": 7200, "D3": "m³/h",
    "A4": "Room temperature", "B4": "T_r", "C4": 24, "D4": "°C",
    "A5": "Supply air temperature", "B5": "T_s", "C5": 14, "D5": "°C",
    "A6": "Supply air volume flow", "B6": "q_L", "C6": "=C3/3.6", "D6": "L/s",
    "A7": "Sensible cooling", "B7": "Phi_s", "C7": "=1.2*C6*(C4-C5)", "D7": "W",
    "A8": "Sensible cooling", "B8": "Phi_kW", "C8": "=C7/1000", "D8": "kW",
    "A9": "Sensible cooling (check)", "B9": "Phi_s2", "C9": "=1.2*C3*(C4-C5)", "D9": "W",
    "A10": "Atmospheric pressure", "B10": "p_atm", "C10": 101.325, "D10": "kPa",
    "A11": "Gas constant of dry air", "B11": "R_a", "C11": 287, "D11": "J/(kg·K)",
    "A12": "Supply air density", "B12": "rho", "C12": "=C10*1000/(C11*(C5+273.15))",
    "D12": "kg/m³",
    "A13": "Supply air density (check)", "B13": "rho2", "C13": "=C10*1000/(C11*C5)",
    "D13": "kg/m³",
    "A14": "Specific heat of air", "B14": "c_p", "C14": 1.005, "D14": "kJ/(kg·K)",
    "A15": "Sensible cooling from rho c_p", "B15": "Phi_s3", "C15": "=C3/3600*C12*C14*(C4-C5)",
    "D15": "kW",
    "A16": "Main duct width", "B16": "a", "C16": 800, "D16": "mm",
    "A17": "Main duct height", "B17": "b", "C17": 500, "D17": "mm",
    "A18": "Main duct area", "B18": "A", "C18": "=C16*C17/1000000", "D18": "m²",
    "A19": "Main duct area (check)", "B19": "A2", "C19": "=C16*C17/1000", "D19": "m²",
    "A20": "Main duct velocity", "B20": "v", "C20": "=C3/3600/C18", "D20": "m/s",
    "A21": "Velocity pressure", "B21": "p_v", "C21": "=0.5*C12*C20^2", "D21": "Pa",
    "A22": "Equivalent diameter", "B22": "D_e", "C22": "=1.3*(C16*C17)^0.625/(C16+C17)^0.25",
    "D22": "mm",
    "A23": "Friction factor", "B23": "f", "C23": 0.019, "D23": "-",
    "A24": "Index run length", "B24": "L", "C24": 42, "D24": "m",
    "A25": "Duct friction loss", "B25": "dp_f", "C25": "=C23*C24/(C22/1000)*C21", "D25": "Pa",
    "A26": "Duct friction loss (check)", "B26": "dp_f2", "C26": "=C23*C24/C22*C21", "D26": "Pa",
    "A27": "AHU, coil, filter and fittings", "B27": "dp_u", "C27": 480, "D27": "Pa",
    "A28": "Fan total pressure", "B28": "dp_t", "C28": "=C25+C27", "D28": "Pa",
    "A29": "Fan total efficiency", "B29": "eta_f", "C29": 68, "D29": "%",
    "A30": "Fan shaft power", "B30": "P_f", "C30": "=C3/3600*C28/(C29/100)/1000", "D30": "kW",
    "A31": "Fan shaft power (check)", "B31": "P_f2", "C31": "=C3*C28/(C29/100)/1000",
    "D31": "kW",
    "A32": "Fan total pressure, imperial", "B32": "dp_in", "C32": "=C28/249.1", "D32": "inH2O",
    "A33": "Supply air volume flow, imperial", "B33": "q_cfm", "C33": "=C3/1.699", "D33": "cfm",
    # branch table, units in the headings
    "F2": "Section", "G2": "Flow [m³/h]", "H2": "Width [mm]", "I2": "Height [mm]",
    "J2": "Velocity [m/s]",
    "F3": "Main", "G3": "=C3", "H3": 800, "I3": 500, "J3": "=G3/3600/(H3*I3/1000000)",
    "F4": "Branch A", "G4": 2400, "H4": 500, "I4": 300, "J4": "=G4/3600/(H4*I4/1000000)",
    "F5": "Branch B", "G5": 2400, "H5": 500, "I5": 300, "J5": "=G5/3600/(H5*I5/1000000)",
    "F6": "Branch C", "G6": 2400, "H6": 400, "I6": 300, "J6": "=G6/(H6*I6/1000000)",
    "F7": "Sum of branches", "G7": "=SUM(G4:G6)",
}
COMPRESSOR = {
    "A1": "Workshop air compressor and receiver (invented plant room)",
    "A2": "Item", "B2": "Symbol", "C2": "Value", "D2": "Unit",
    "A3": "Free air delivery", "B3": "FAD", "C3": 12, "D3": "m³/min",
    "A4": "Inlet air temperature", "B4": "T_1", "C4": 20, "D4": "°C",
    "A5": "Atmospheric pressure", "B5": "p_1", "C5": 1.013, "D5": "bar",
    "A6": "Receiver pressure, cut-out", "B6": "p_max", "C6": 7.5, "D6": "barg",
    "A7": "Receiver pressure, cut-in", "B7": "p_min", "C7": 6.5, "D7": "barg",
    "A8": "Discharge pressure, absolute", "B8": "p_2", "C8": "=C6+1.013", "D8": "bar",
    "A9": "Pressure ratio", "B9": "r", "C9": "=C8/C5", "D9": "-",
    "A10": "Pressure ratio (check)", "B10": "r2", "C10": "=C6/C5", "D10": "-",
    "A11": "Isentropic exponent", "B11": "k", "C11": 1.4, "D11": "-",
    "A12": "Inlet temperature, absolute", "B12": "T_1K", "C12": "=C4+273.15", "D12": "K",
    "A13": "Discharge temperature", "B13": "T_2", "C13": "=C12*C9^((C11-1)/C11)", "D13": "K",
    "A14": "Discharge temperature", "B14": "T_2C", "C14": "=C13-273.15", "D14": "°C",
    "A15": "Discharge temperature (check)", "B15": "T_2C2", "C15": "=C4*C9^((C11-1)/C11)",
    "D15": "°C",
    "A16": "Inlet pressure", "B16": "p_1k", "C16": "=C5*100", "D16": "kPa",
    "A17": "Isentropic power", "B17": "P_is",
    "C17": "=C11/(C11-1)*C16*C3/60*(C9^((C11-1)/C11)-1)", "D17": "kW",
    "A18": "Isentropic power (check)", "B18": "P_is2",
    "C18": "=C11/(C11-1)*C16*C3*(C9^((C11-1)/C11)-1)", "D18": "kW",
    "A19": "Free air delivery", "B19": "FAD_L", "C19": "=C3*1000/60", "D19": "L/s",
    "A20": "Minimum cycle time", "B20": "t_c", "C20": 2, "D20": "min",
    "A21": "Receiver volume", "B21": "V_r", "C21": "=C20*C3*C5/(C6-C7)", "D21": "m³",
    "A22": "Receiver volume (check)", "B22": "V_r2", "C22": "=C20*C3/(C6-C7)", "D22": "m³",
    "A23": "Receiver volume", "B23": "V_rL", "C23": "=C21*1000", "D23": "L",
    "A24": "Free air delivery, imperial", "B24": "FAD_cfm", "C24": "=C3*35.31", "D24": "cfm",
    "A25": "Inlet air density", "B25": "rho_1", "C25": "=C5*100000/(Duct!C11*C12)",
    "D25": "kg/m³",
    "A26": "Mass flow", "B26": "m", "C26": "=C25*C3/60", "D26": "kg/s",
    "A27": "Receiver pressure, cut-out, absolute", "B27": "p_maxa", "C27": "=C6*100+101.325",
    "D27": "kPa",
    "A28": "Mean receiver pressure", "B28": "p_m", "C28": "=(C6+C7)/2", "D28": "barg",
}

# --------------------------------------------------------------------------------------------
# What each book must give: planted mistakes (cell -> (rule, what is wrong)), and the correct
# conversions among the clean cells (cell -> what it does). Every other formula cell is correct
# too and must stay clean.
# --------------------------------------------------------------------------------------------
BOOKS = {
    "reservoir-contact": {
        "trade": "water utility: service reservoir and chlorine contact tank",
        "sheets": [("Reservoir", RESERVOIR), ("Contact", CONTACT)],
        "planted": {
            "Reservoir!C13": ("unit-scale", "hours of storage as V[m³]/Q[ML/d]*24: ML not turned to m³, 1000x too large"),
            "Reservoir!C14": ("unit-scale", "wall height as H[m] + freeboard[mm]: mm beside m"),
            "Reservoir!C18": ("result-unit", "floor pressure as rho*H/1000 with no g: gives t/m², not kPa"),
            "Reservoir!H6": ("unit-scale", "m³ to ML divided by 10^6 (thinking of litres): 1000x too small"),
            "Contact!C11": ("unit-scale", "US 8.34 lb/gal factor in an SI feed rate: ML/d x mg/L is already kg/d"),
            "Contact!C16": ("unit-scale", "12.5 % strength used as 12.5, not 0.125: 100x too small"),
            "Contact!C23": ("unit-scale", "T10 = V*BF/Q with Q in m³/h written into a min cell: 60x too small"),
            "Contact!C37": ("offset-scale", "gas density p*M/(R*T) with T in °C"),
        },
        "conversions": {
            "Reservoir!C11": "m³ to ML: /1000",
            "Reservoir!C12": "ML/d to m³/h: *1000/24",
            "Reservoir!C17": "rho*g*H/1000 to kPa, a gauge reading",
            "Reservoir!C19": "ring tension p_g*D/2 from a gauge pressure (wall load)",
            "Reservoir!C21": "kN/m over mm is MPa with no factor",
            "Reservoir!H3": "m³ to ML in a headed table: /1000",
            "Contact!C5": "ML/d to m³/h: *1000/24",
            "Contact!C7": "ML/d x mg/L = kg/d exactly",
            "Contact!C8": "ML/d to mgd: /3.785",
            "Contact!C9": "mgd x mg/L x 8.34 = lb/d",
            "Contact!C10": "lb to kg: *0.4536",
            "Contact!C14": "% to fraction: /100",
            "Contact!C22": "m³ / (m³/h) to min: *60",
            "Contact!C29": "°C + 273.15 = K",
            "Contact!C31": "temperature correction k20*1.047^(T-20), T in °C (empirical theta rule)",
            "Contact!C36": "gas density with (T + 273.15)",
            "Contact!C38": "mg·min/L to mg·h/L: /60",
        },
    },
    "boiler-flue-heatloss": {
        "trade": "building services: gas boiler sizing, flue and heat loss",
        "sheets": [("HeatLoss", HEATLOSS), ("Flue", FLUE)],
        "planted": {
            "HeatLoss!D15": ("offset-scale", "window loss U*A*T_i with the inside temperature in °C, not the difference"),
            "HeatLoss!C20": ("unit-scale", "kW + W: fabric in kW added to ventilation in W"),
            "HeatLoss!C24": ("unit-scale", "margin 15 % used as 15 in (1 + x): 16x, not 1.15x"),
            "Flue!C9": ("unit-scale", "kW/(MJ/m³)*3600 for m³/h: 1000x too large (3.6 is right)"),
            "Flue!C18": ("offset-scale", "Charles's law with the flue temperature in °C over 273.15"),
            "Flue!C22": ("unit-scale", "bore area from D in mm into a m² cell: 10^6x"),
            "Flue!C27": ("offset-scale", "density correction 273.15/T with T in °C"),
            "Flue!C31": ("result-unit", "stack draught H*(rho_a - rho_f) with no g: kg/m², not Pa"),
            "Flue!C36": ("unit-scale", "share as a fraction into a % cell: 100x too small"),
        },
        "conversions": {
            "HeatLoss!C5": "temperature difference T_i - T_o (°C) into K",
            "HeatLoss!C8": "0.33 n V dT: the volumetric heat capacity of air in Wh/(m³K)",
            "HeatLoss!D16": "U*A*(T_i - T_o) with °C readings",
            "HeatLoss!C19": "W to kW: /1000",
            "HeatLoss!C21": "(W + W)/1000 to kW",
            "HeatLoss!C23": "% margin: (1 + x/100)",
            "HeatLoss!C26": "kW/K x K·d x 24 = kWh",
            "Flue!C5": "% efficiency: /(eta/100)",
            "Flue!C7": "kW/(MJ/m³)*3.6 = m³/h",
            "Flue!C8": "m³ to ft³: *35.31",
            "Flue!C15": "°C + 273.15",
            "Flue!C17": "Charles's law with reference 273.15 K: Q*T/273.15",
            "Flue!C20": "(D/1000)^2 for m²",
            "Flue!C21": "m³/h /3600 /m² = m/s",
            "Flue!C25": "rho_0*273.15/T (reference state)",
            "Flue!C32": "m³/h x kg/m³ /3600 = kg/s",
            "Flue!C34": "m*cp*(T_f - T_a) with °C readings",
            "Flue!C35": "fraction *100 to %",
        },
    },
    "separator-tank": {
        "trade": "oil field: production separator, stock tank and heater",
        "sheets": [("Separator", SEPARATOR), ("Tank", TANK)],
        "sidecar": SEPARATOR_SIDECAR,
        "planted": {
            "Separator!C16": ("offset-scale", "gas density p*M/(Z*R*T) with T in °F"),
            "Separator!C18": ("offset-scale", "actual gas flow corrected with the gauge pressure 14.7/p_g"),
            "Separator!C25": ("unit-scale", "ft/s to m/s divided by 0.3048: wrong way round"),
            "Separator!C29": ("unit-scale", "water cut 30 % used as a fraction in q_o*WC/(1-WC)"),
            "Separator!C33": ("unit-scale", "bbl/d x 5.615 /24 x min: per hour, not per minute (60x)"),
            "Separator!C36": ("offset-scale", "flash ratio of two gauge pressures"),
            "Separator!K6": ("unit-scale", "GOR as Mscf/d / bbl/d into scf/bbl: 1000x too small"),
            "Tank!C7": ("unit-scale", "ft³ to bbl multiplied by 5.615: wrong way round"),
            "Tank!C13": ("unit-scale", "62.4 lb/ft³ x ft gives psf, not psi: /144 missing"),
            "Tank!C22": ("unit-scale", "°F to °C as (T-32)*1.8: factor the wrong way round"),
        },
        "conversions": {
            "Separator!C8": "psig + 14.7 = psia",
            "Separator!C9": "°F + 459.67 = °R",
            "Separator!C15": "gas law with psia and °R",
            "Separator!C17": "MMscf/d *1e6/86400 and (14.7/p)(T/520) standard state",
            "Separator!C21": "SG x 62.4 lb/ft³",
            "Separator!C24": "ft/s to m/s: *0.3048",
            "Separator!C27": "ft to in: *12",
            "Separator!C28": "water cut in % as WC/(100-WC)",
            "Separator!C32": "bbl/d *5.615/1440 x min = ft³",
            "Separator!C35": "ratio of absolute pressures, gauge + 14.7",
            "Separator!K3": "Mscf/d *1000 / bbl/d = scf/bbl",
            "Tank!C6": "ft³ /5.615 = bbl",
            "Tank!C9": "bbl to m³: *0.159",
            "Tank!C12": "0.433 psi/ft x SG x ft = psig",
            "Tank!C14": "62.4 x SG x ft /144 = psi",
            "Tank!C18": "bbl/d *5.615 x lb/ft³ /24 = lb/h",
            "Tank!C19": "Btu/(lb·°F) x lb/h x (T2 - T1) in °F",
            "Tank!C20": "Btu/h to kW: /3412",
            "Tank!C21": "(°F - 32)/1.8 = °C",
            "Tank!C24": "°C *1.8 + 32 = °F",
            "Tank!C25": "350 lb/bbl of water x bbl/d /24 x dT (c_p = 1 Btu/(lb·°F) folded in)",
        },
    },
    "rc-slab": {
        "trade": "structural: one-way reinforced concrete slab",
        "sheets": [("Slab", SLAB)],
        "sidecar": SLAB_SIDECAR,
        "planted": {
            "Slab!C12": ("result-unit", "unit weight as rho/100 (g taken as 10 and folded in): no g, kg/m³ not kN/m³"),
            "Slab!C14": ("unit-scale", "self weight gamma x h with h in mm: 1000x"),
            "Slab!C25": ("unit-scale", "K with M in kN·m and b, d in mm, no 1e6"),
            "Slab!C28": ("unit-scale", "A_s with kN·m to N·mm taken as *1000, not *1e6"),
            "Slab!C33": ("unit-scale", "span/depth with L in m over d in mm"),
            "Slab!C35": ("unit-scale", "shear stress kN/(mm·mm) into MPa without *1000"),
            "Slab!C40": ("unit-scale", "deflection with L in m inside L^4, E and I in mm: 10^12 off"),
            "Slab!C43": ("unit-scale", "kN + N: point load in N added to the shear in kN"),
        },
        "conversions": {
            "Slab!C11": "rho*g/1000 = kN/m³",
            "Slab!C13": "kN/m³ x mm /1000 = kN/m²",
            "Slab!C18": "kN/m² x mm /1000 = kN/m",
            "Slab!C24": "K = M*1e6/(b d² f_ck)",
            "Slab!C27": "A_s = M*1e6/(0.87 f_yk z)",
            "Slab!C30": "f_ctm = 0.3 f_ck^(2/3) (EC2, MPa-bound)",
            "Slab!C32": "L*1000/d",
            "Slab!C34": "V*1000/(b d) = MPa",
            "Slab!C39": "5 w (L*1000)^4/(384 E*1000 I) = mm",
            "Slab!C41": "L*1000/250 = mm",
            "Slab!C44": "kN + N/1000",
            "Slab!C21": "d = h - c - phi/2 with mm from the sidecar",
        },
    },
    "ahu-duct-compressor": {
        "trade": "HVAC and compressed air: supply duct, fan and air compressor",
        "sheets": [("Duct", DUCT), ("Compressor", COMPRESSOR)],
        "planted": {
            "Duct!C9": ("unit-scale", "1.2 q dT with q in m³/h, where 1.2 needs L/s: 3.6x too large"),
            "Duct!C13": ("offset-scale", "air density p/(R T) with T in °C"),
            "Duct!C19": ("unit-scale", "mm x mm /1000 for m²: 1000x too large"),
            "Duct!C26": ("unit-scale", "f L/D with D in mm beside L in m"),
            "Duct!C31": ("unit-scale", "fan power with m³/h not turned to m³/s"),
            "Duct!J6": ("unit-scale", "velocity from m³/h over m² without /3600"),
            "Compressor!C10": ("offset-scale", "pressure ratio barg/bar: gauge over absolute"),
            "Compressor!C15": ("offset-scale", "discharge temperature T1*r^((k-1)/k) with T1 in °C"),
            "Compressor!C18": ("unit-scale", "isentropic power with FAD in m³/min not /60"),
            "Compressor!C22": ("result-unit", "receiver volume t*FAD/dp without p_atm: m³/bar, not m³"),
        },
        "conversions": {
            "Duct!C6": "m³/h to L/s: /3.6",
            "Duct!C7": "1.2 x L/s x dT = W",
            "Duct!C8": "W to kW: /1000",
            "Duct!C12": "p*1000/(R*(T+273.15))",
            "Duct!C15": "m³/h /3600 x rho x c_p x dT = kW",
            "Duct!C18": "mm x mm /1e6 = m²",
            "Duct!C20": "m³/h /3600 / m² = m/s",
            "Duct!C25": "f L/(D/1000) x p_v",
            "Duct!C30": "m³/h/3600 x Pa /(eta/100) /1000 = kW",
            "Duct!C32": "Pa to inH2O: /249.1",
            "Duct!C33": "m³/h to cfm: /1.699",
            "Duct!J3": "velocity in a headed table: /3600/(W*H/1e6)",
            "Compressor!C8": "barg + 1.013 = bar absolute",
            "Compressor!C12": "°C + 273.15",
            "Compressor!C14": "K - 273.15 = °C",
            "Compressor!C16": "bar to kPa: *100",
            "Compressor!C17": "kPa x m³/min /60 = kW",
            "Compressor!C19": "m³/min *1000/60 = L/s",
            "Compressor!C21": "t x FAD x p_atm / (p_max - p_min), gauge difference",
            "Compressor!C23": "m³ to L: *1000",
            "Compressor!C24": "m³/min *35.31 = cfm",
            "Compressor!C25": "bar*100000/(R*T_K)",
            "Compressor!C27": "barg*100 + 101.325 = kPa absolute",
            "Compressor!C28": "mean of two gauge readings",
        },
    },
}

# --------------------------------------------------------------------------------------------
# Cached values: a small evaluator for the formulas above (Excel's operators and the few
# functions used), so each <f> carries the <v> a spreadsheet would show.
# --------------------------------------------------------------------------------------------
REF_OR_RANGE = re.compile(
    r"(?:([A-Za-z_][A-Za-z0-9_]*)!)?\$?([A-Z]{1,3})\$?([0-9]+)(?![0-9(])"
    r"(?::\$?([A-Z]{1,3})\$?([0-9]+))?")


def col_number(letters):
    n = 0
    for ch in letters:
        n = n * 26 + ord(ch) - 64
    return n


def col_letters(n):
    s = ""
    while n:
        n, r = divmod(n - 1, 26)
        s = chr(65 + r) + s
    return s


class Evaluator:
    def __init__(self, sheets):
        self.sheets = dict(sheets)
        self.values = {}

    def value(self, sheet, cell):
        key = (sheet, cell)
        if key in self.values:
            return self.values[key]
        raw = self.sheets[sheet].get(cell)
        if isinstance(raw, str) and raw.startswith("="):
            result = self.evaluate(sheet, raw[1:])
        elif raw is None:
            result = 0.0
        else:
            result = raw
        self.values[key] = result
        return result

    def evaluate(self, sheet, formula):
        def range_values(m):
            sh = m.group(1) or sheet
            c1, r1, c2, r2 = col_number(m.group(2)), int(m.group(3)), col_number(
                m.group(4)), int(m.group(5))
            cells = [f"{col_letters(c)}{r}" for c in range(c1, c2 + 1) for r in range(r1, r2 + 1)]
            return "[" + ",".join(f"_v({sh!r},{c!r})" for c in cells) + "]"

        def one_ref(m):
            return f"_v({(m.group(1) or sheet)!r},'{m.group(2)}{m.group(3)}')"

        # one pass over ranges and single references, so no reference is rewritten twice
        expr = REF_OR_RANGE.sub(
            lambda m: range_values(m) if m.group(4) else one_ref(m), formula)
        expr = expr.replace("^", "**")
        env = {
            "_v": self.value, "PI": lambda: math.pi, "SQRT": math.sqrt, "LN": math.log,
            "EXP": math.exp, "ABS": abs, "MIN": min, "MAX": max,
            "SUM": lambda *a: sum(sum(x) if isinstance(x, list) else x for x in a),
        }
        return eval(expr, {"__builtins__": {}}, env)


# --------------------------------------------------------------------------------------------
# The .xlsx package
# --------------------------------------------------------------------------------------------
def esc(text):
    return (str(text).replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;")
            .replace('"', "&quot;"))


def split_cell(cell):
    m = re.fullmatch(r"([A-Z]+)([0-9]+)", cell)
    return m.group(1), int(m.group(2))


def sheet_xml(name, cells, evaluator):
    rows = {}
    for cell in cells:
        col, row = split_cell(cell)
        rows.setdefault(row, []).append((col_number(col), cell))
    out = ['<?xml version="1.0" encoding="UTF-8" standalone="yes"?>',
           '<worksheet xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main">',
           "<sheetData>"]
    for row in sorted(rows):
        out.append(f'<row r="{row}">')
        for _, cell in sorted(rows[row]):
            raw = cells[cell]
            if isinstance(raw, str) and raw.startswith("="):
                val = evaluator.value(name, cell)
                out.append(f'<c r="{cell}"><f>{esc(raw[1:])}</f><v>{repr(float(val))}</v></c>')
            elif isinstance(raw, str):
                out.append(f'<c r="{cell}" t="inlineStr"><is><t>{esc(raw)}</t></is></c>')
            else:
                out.append(f'<c r="{cell}"><v>{raw}</v></c>')
        out.append("</row>")
    out.append("</sheetData></worksheet>")
    return "".join(out)


def write_xlsx(path, sheets):
    evaluator = Evaluator(sheets)
    n = len(sheets)
    content_types = (
        '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>'
        '<Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types">'
        '<Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/>'
        '<Default Extension="xml" ContentType="application/xml"/>'
        '<Override PartName="/xl/workbook.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml"/>'
        + "".join(f'<Override PartName="/xl/worksheets/sheet{i}.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.worksheet+xml"/>'
                  for i in range(1, n + 1))
        + "</Types>")
    root_rels = (
        '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>'
        '<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships">'
        '<Relationship Id="rId1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/officeDocument" Target="xl/workbook.xml"/>'
        "</Relationships>")
    workbook = (
        '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>'
        '<workbook xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" '
        'xmlns:r="http://schemas.openxmlformats.org/officeDocument/2006/relationships"><sheets>'
        + "".join(f'<sheet name="{esc(name)}" sheetId="{i}" r:id="rId{i}"/>'
                  for i, (name, _) in enumerate(sheets, 1))
        + "</sheets></workbook>")
    workbook_rels = (
        '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>'
        '<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships">'
        + "".join(f'<Relationship Id="rId{i}" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/worksheet" Target="worksheets/sheet{i}.xml"/>'
                  for i in range(1, n + 1))
        + "</Relationships>")
    with zipfile.ZipFile(path, "w", zipfile.ZIP_DEFLATED) as z:
        z.writestr("[Content_Types].xml", content_types)
        z.writestr("_rels/.rels", root_rels)
        z.writestr("xl/workbook.xml", workbook)
        z.writestr("xl/_rels/workbook.xml.rels", workbook_rels)
        for i, (name, cells) in enumerate(sheets, 1):
            z.writestr(f"xl/worksheets/sheet{i}.xml", sheet_xml(name, cells, evaluator))


def formula_cells(book):
    return [f"{name}!{cell}" for name, cells in book["sheets"] for cell, raw in cells.items()
            if isinstance(raw, str) and raw.startswith("=")]


# Planted mistakes plumb reports under another rule than the one first expected; both say the
# cell is wrong.
REPORTED_AS = {
    "Tank!C13": ("result-unit", "62.4 is not read as water's weight here, so the formula is a "
                 "length beside psig; the /144 is what is missing"),
    "Duct!C9": ("result-unit", "1.2 is read as air's heat capacity per L/s only; with m³/h the "
                "product is no power"),
}

# Words a planted cell's finding must say (the corpus test checks them): the figures off and
# the factors not needed that an engineer acts on.
WORDS = {
    "Contact!C11": "the factor 8.34 is not needed",
    "Separator!C16": "'C7' is on the °F scale",
    "Duct!J6": "the value shown is 3600 times too large",
    "Duct!C31": "the value shown is 3600 times too large",
    "Separator!C33": "the value shown is 60 times too large",
    "Slab!C28": "the value shown is 1000 times too small",
    "Slab!C40": "the value shown is 10¹² times too small",
    "HeatLoss!D15": "multiplies a temperature difference",
}

# Notes (information, never a failure) on cells, by book.
NOTES = {
    "reservoir-contact": [("Contact!C9", "trade-constant", "8.34 read as the weight of a US gallon of water")],
    "boiler-flue-heatloss": [
        ("HeatLoss!C8", "trade-constant", "0.33 read as the heat capacity of a volume of air"),
        ("Flue!C17", "trade-constant", "273.15 read as a standard reference temperature"),
        ("Flue!C25", "trade-constant", "273.15 read as a standard reference temperature"),
        ("Flue!C26", "trade-constant", "273.15 read as a standard reference temperature"),
    ],
    "separator-tank": [
        ("Separator!C17", "trade-constant", "14.7 read as a standard reference pressure"),
        ("Separator!C17", "trade-constant", "520 read as a standard reference temperature"),
        ("Separator!C18", "trade-constant", "14.7 read as a standard reference pressure"),
        ("Separator!C21", "trade-constant", "62.4 read as the density of water"),
        ("Tank!C12", "gravity-number", "0.433 read as the specific weight of water"),
        ("Tank!C14", "gravity-number", "62.4 read as the specific weight of water"),
        ("Tank!C25", "trade-constant", "350 read as the heat capacity of a barrel of water"),
    ],
    "ahu-duct-compressor": [("Duct!C7", "trade-constant", "1.2 read as the heat capacity of a volume of air")],
}

# Correct cells plumb still flags, with why; each is a finding to clear, not a wanted one.
KNOWN_FLAGS = {
    "reservoir-contact": [
        ("Reservoir!C19", "offset-scale", "ring tension p_g*D/2 from a gauge pressure is the net "
         "pressure on the wall times a length; the notation flags it too (being fixed there)"),
        ("Contact!C31", "dimensioned-exponent", "the theta^(T-20) rule's exponent is (T-20)/1 K; a "
         "workbook has no way to say so (arguable)"),
    ],
    "rc-slab": [
        ("Slab!C30", "result-unit", "EC2's f_ctm = 0.30*f_ck^(2/3) is bound to MPa; a workbook has "
         "no mark for a unit-bound coefficient (arguable)"),
    ],
}


def main():
    os.makedirs(OUT, exist_ok=True)
    summary = {}
    for stem, book in BOOKS.items():
        write_xlsx(os.path.join(OUT, stem + ".xlsx"), book["sheets"])
        if "sidecar" in book:
            with open(os.path.join(OUT, stem + ".cells.plumb"), "w", encoding="utf-8") as f:
                f.write(book["sidecar"])
        formulas = formula_cells(book)
        for cell in list(book["planted"]) + list(book["conversions"]):
            assert cell in formulas, f"{stem}: {cell} is not a formula cell"
        correct = [c for c in formulas if c not in book["planted"]]
        with open(os.path.join(OUT, stem + ".expect"), "w", encoding="utf-8") as f:
            f.write("# sheet!cell rule: the findings plumb must report, and no others; every\n"
                    "# formula cell not listed must stay clean (written by make_books.py)\n")
            for cell, (rule, what) in book["planted"].items():
                reported, why = REPORTED_AS.get(cell, (rule, ""))
                f.write(f"# planted: {what}" + (f"; reported as {reported}: {why}" if why else "")
                        + "\n")
                f.write(f"{cell} {reported}" + (f" ~ {WORDS[cell]}" if cell in WORDS else "")
                        + "\n")
            for cell, rule, why in NOTES.get(stem, []):
                f.write(f"# note on a correct cell: {why}\n{cell} {rule}\n")
            for cell, rule, why in KNOWN_FLAGS.get(stem, []):
                f.write(f"# a correct cell still flagged: {why}\n{cell} {rule}\n")
        summary[stem] = {
            "trade": book["trade"],
            "planted": {c: {"rule": r, "what": w} for c, (r, w) in book["planted"].items()},
            "conversions": book["conversions"],
            "correct": correct,
            "formulas": {c: book_formula(book, c) for c in formulas},
        }
    with open(os.path.join(OUT, "expect.json"), "w", encoding="utf-8") as f:
        json.dump(summary, f, indent=1, ensure_ascii=False)


def book_formula(book, ref):
    sheet, cell = ref.split("!")
    return dict(book["sheets"])[sheet][cell]


if __name__ == "__main__":
    main()
