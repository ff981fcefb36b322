#!/usr/bin/env python3
"""Four new review workbooks for plumb's workbook checking (second review), written with the
standard zipfile module (xlsx_writer.py).

Trades: a district energy meter and heat pump; a pipeline hydrotest and pigging run; a
wastewater sludge line and digester; a steel bolted end-plate connection. Layouts the first
review did not use: tables with units in the headings over several rows with SUM, AVERAGE, MAX
and MIN beneath them, defined names (single cells and a range) used across sheets, IF with
numeric and text results, a sidecar with a measure line and a cells line.

Every formula cell is either a planted mistake (PLANTED, with the rule expected) or a correct
cell that must stay clean; CONVERSIONS marks the correct conversions among the latter.

Run: python3 make_books.py  ->  books/*.xlsx (+ sidecars), books/*.expect, books/expect.json
"""
import json
import os

from xlsx_writer import write_xlsx

HERE = os.path.dirname(os.path.abspath(__file__))
OUT = os.path.join(HERE, "books")

# --------------------------------------------------------------------------------------------
# Book 1: a district energy substation meter and a water-source heat pump (kW, °C, L/s, COP)
# --------------------------------------------------------------------------------------------
METER = {
    "A1": "Riverside energy centre: heat meter log, export to network (invented scheme)",
    "A2": "Hour ending", "B2": "Flow [L/s]", "C2": "Supply [°C]", "D2": "Return [°C]",
    "E2": "ΔT [K]", "F2": "Heat [kW]",
    "A3": "01:00", "B3": 18.2, "C3": 75.2, "D3": 45.1,
    "A4": "02:00", "B4": 17.6, "C4": 74.8, "D4": 44.6,
    "A5": "03:00", "B5": 19.4, "C5": 76.1, "D5": 45.8,
    "A6": "04:00", "B6": 21.0, "C6": 77.0, "D6": 46.9,
    "A7": "05:00", "B7": 22.3, "C7": 78.3, "D7": 47.5,
    "A8": "06:00", "B8": 20.1, "C8": 77.5, "D8": 46.2,
    "A9": "Mean",
    "B9": "=AVERAGE(B3:B8)", "C9": "=AVERAGE(C3:C8)", "D9": "=AVERAGE(D3:D8)",
    "E9": "=AVERAGE(E3:E8)", "F9": "=AVERAGE(F3:F8)",
    "A11": "Item", "B11": "Symbol", "C11": "Value", "D11": "Unit",
    "A12": "Reading interval", "B12": "dt", "C12": 1, "D12": "h",
    "A13": "Metered heat over the log", "B13": "E", "C13": "=SUM(F3:F8)*C12", "D13": "kWh",
    "A14": "Metered heat, MJ", "B14": "E_MJ", "C14": "=C13*3.6", "D14": "MJ",
    "A15": "Metered heat, MJ (planted)", "B15": "E_x", "C15": "=C13/3.6", "D15": "MJ",
    "A16": "Mean flow", "B16": "q_h", "C16": "=AVERAGE(B3:B8)*3.6", "D16": "m³/h",
    "A17": "Mean heat output", "B17": "Phi", "C17": "=F9", "D17": "kW",
    "A18": "Mean supply temperature, °F", "B18": "T_sF", "C18": "=C9*1.8+32", "D18": "°F",
    "A19": "Mean return temperature, absolute", "B19": "T_rK", "C19": "=D9+273.15", "D19": "K",
    "A20": "Mean ΔT (check)", "B20": "dT", "C20": "=C9-D9", "D20": "K",
}
for r in range(3, 9):
    METER[f"E{r}"] = f"=C{r}-D{r}"
    METER[f"F{r}"] = f"=B{r}*4.19*E{r}"
METER["F6"] = "=B6*4.19*C6"      # planted: supply temperature in place of ΔT
METER["F7"] = "=B7*4190*E7"      # planted: J/(kg·K) heat capacity, no /1000, into kW

HEATPUMP = {
    "A1": "Riverside energy centre: water-source heat pump (invented scheme)",
    "A2": "Item", "B2": "Symbol", "C2": "Value", "D2": "Unit",
    "A3": "Heat output (metered mean)", "B3": "Phi", "C3": "=HeatOut", "D3": "kW",
    "A4": "Compressor electrical input", "B4": "P_c", "C4": 720, "D4": "kW",
    "A5": "Circulating pumps", "B5": "P_p", "C5": 2200, "D5": "W",
    "A6": "Heat pump COP", "B6": "COP", "C6": "=C3/C4", "D6": "-",
    "A7": "System COP", "B7": "COP_s", "C7": "=C3/(C4+C5/1000)", "D7": "-",
    "A8": "System COP (planted)", "B8": "COP_x", "C8": "=C3/(C4+C5)", "D8": "-",
    "A9": "Condensing temperature", "B9": "T_c", "C9": 80, "D9": "°C",
    "A10": "Source water temperature", "B10": "T_e", "C10": 12, "D10": "°C",
    "A11": "Temperature lift", "B11": "dT_l", "C11": "=C9-C10", "D11": "K",
    "A12": "Carnot COP", "B12": "COP_C", "C12": "=(C9+273.15)/C11", "D12": "-",
    "A13": "Carnot COP (planted)", "B13": "COP_Cx", "C13": "=C9/(C9-C10)", "D13": "-",
    "A14": "Carnot efficiency", "B14": "eta_C", "C14": "=C6/C12*100", "D14": "%",
    "A15": "Heat taken from source", "B15": "Phi_e", "C15": "=C3-C4", "D15": "kW",
    "A16": "Source water flow", "B16": "q_e", "C16": 45, "D16": "L/s",
    "A17": "Source water cooling", "B17": "dT_e", "C17": "=C15/(4.19*C16)", "D17": "K",
    "A18": "Source water flow, m³/h", "B18": "q_eh", "C18": "=C16*3600/1000", "D18": "m³/h",
    "A19": "Condensing pressure", "B19": "p_c", "C19": 28.5, "D19": "bar(g)",
    "A20": "Evaporating pressure", "B20": "p_e", "C20": 2.1, "D20": "bar(g)",
    "A21": "Condensing pressure, absolute", "B21": "p_ca", "C21": "=C19+1.013", "D21": "bar",
    "A22": "Pressure ratio", "B22": "r_p", "C22": "=(C19+1.013)/(C20+1.013)", "D22": "-",
    "A23": "Pressure ratio (planted)", "B23": "r_x", "C23": "=C19/C20", "D23": "-",
    "A24": "Distribution losses", "B24": "x_l", "C24": 8, "D24": "%",
    "A25": "Heat delivered to customers", "B25": "Phi_d", "C25": "=C3*(1-C24/100)", "D25": "kW",
    "A26": "Heat delivered (planted)", "B26": "Phi_dx", "C26": "=C3*(1-C24)", "D26": "kW",
    "A27": "Full-load hours per year", "B27": "t_a", "C27": 5200, "D27": "h",
    "A28": "Annual heat", "B28": "E_a", "C28": "=C3*C27/1000", "D28": "MWh",
    "A29": "Annual heat (planted)", "B29": "E_ax", "C29": "=C3/1000*C27/1000", "D29": "MWh",
    "A30": "Peak network demand", "B30": "Phi_pk", "C30": 3.1, "D30": "MW",
    "A31": "Back-up boiler duty", "B31": "Phi_b", "C31": "=IF(C30*1000>C3,C30*1000-C3,0)",
    "D31": "kW",
    "A32": "Back-up boiler duty (planted)", "B32": "Phi_bx", "C32": "=IF(C30>C3,C30-C3,0)",
    "D32": "kW",
    "A33": "Meter ΔT status", "B33": "flag", "C33": "=IF(Meter!E9<25,\"LOW DT\",\"OK\")",
}

# --------------------------------------------------------------------------------------------
# Book 2: a gas pipeline section's hydrostatic test and pigging (psig, bar, m, °F)
# --------------------------------------------------------------------------------------------
LINE = {
    "A1": "Kestrel lateral, test section 3 (invented pipeline)",
    "A2": "Item", "B2": "Symbol", "C2": "Value", "D2": "Unit",
    "A3": "Outside diameter", "B3": "OD", "C3": 12.75, "D3": "in",
    "A4": "Wall thickness", "B4": "WT", "C4": 0.375, "D4": "in",
    "A5": "SMYS, API 5L X52", "B5": "S", "C5": 52000, "D5": "psi",
    "A6": "Design factor (class 1)", "B6": "F", "C6": 0.72, "D6": "-",
    "A7": "Test section length", "B7": "L", "C7": 14.2, "D7": "km",
    "A8": "Inside diameter", "B8": "ID", "C8": "=C3-2*C4", "D8": "in",
    "A9": "Inside diameter, mm", "B9": "ID_mm", "C9": "=C8*25.4", "D9": "mm",
    "A10": "Bore area", "B10": "A", "C10": "=PI()*(C9/1000)^2/4", "D10": "m²",
    "A11": "Bore area (planted)", "B11": "A_x", "C11": "=PI()*C9^2/4", "D11": "m²",
    "A12": "Section volume", "B12": "V", "C12": "=C10*C7*1000", "D12": "m³",
    "A13": "Section volume, bbl", "B13": "V_bbl", "C13": "=C12*6.29", "D13": "bbl",
    "A14": "Section volume, US gal", "B14": "V_gal", "C14": "=C12*264.17", "D14": "gal",
    "A15": "High point elevation", "B15": "z_h", "C15": 212, "D15": "m",
    "A16": "Low point elevation", "B16": "z_l", "C16": 131, "D16": "m",
    "A17": "Elevation difference", "B17": "dz", "C17": "=C15-C16", "D17": "m",
}
HYDROTEST = {
    "A1": "Kestrel lateral, test section 3: hydrostatic test (invented pipeline)",
    "A2": "Item", "B2": "Symbol", "C2": "Value", "D2": "Unit",
    "A3": "MAOP (Barlow)", "B3": "p_d", "C3": "=2*SMYS*WT*DesignFactor/OD", "D3": "psig",
    "A4": "Test pressure factor", "B4": "k_t", "C4": 1.25, "D4": "-",
    "A5": "Test pressure at high point", "B5": "p_t", "C5": "=C3*C4", "D5": "psig",
    "A6": "Test pressure, bar(g)", "B6": "p_tb", "C6": "=C5/14.5", "D6": "bar(g)",
    "A7": "Test pressure, kPa(g)", "B7": "p_tk", "C7": "=C5*6.895", "D7": "kPa(g)",
    "A8": "Test pressure, bar(g) (planted)", "B8": "p_tbx", "C8": "=C5*14.5", "D8": "bar(g)",
    "A9": "Water density", "B9": "rho", "C9": 1000, "D9": "kg/m³",
    "A10": "Gravity", "B10": "g", "C10": 9.81, "D10": "m/s²",
    "A11": "Test pressure at low point", "B11": "p_l", "C11": "=C6+C9*C10*Line!C17/100000",
    "D11": "bar(g)",
    "A12": "Test pressure at low point (planted)", "B12": "p_lx",
    "C12": "=C6+C9*Line!C17/100000", "D12": "bar(g)",
    "A13": "Test pressure at low point, psig", "B13": "p_lp", "C13": "=C5+0.433*Line!C17/0.3048",
    "D13": "psig",
    "A14": "Hoop stress at low point", "B14": "s_h", "C14": "=C13*OD/(2*WT)", "D14": "psi",
    "A15": "Hoop stress, % SMYS", "B15": "x_s", "C15": "=C14/SMYS*100", "D15": "%",
    "A16": "Hoop stress, % SMYS (planted)", "B16": "x_sx", "C16": "=C14/SMYS", "D16": "%",
    "A17": "Test pressure, absolute", "B17": "p_ta", "C17": "=C5+14.7", "D17": "psia",
    "A18": "Air left in section after fill, free", "B18": "V_a0", "C18": 0.35, "D18": "m³",
    "A19": "Air volume at test pressure", "B19": "V_a", "C19": "=C18*14.7/C17", "D19": "m³",
    "A20": "Air volume at test pressure (planted)", "B20": "V_ax", "C20": "=C18*14.7/C5",
    "D20": "m³",
    "A21": "Fill pump rate", "B21": "q_f", "C21": 850, "D21": "gpm",
    "A22": "Fill time", "B22": "t_f", "C22": "=Line!C14/C21/60", "D22": "h",
    "A23": "Fill time (planted)", "B23": "t_fx", "C23": "=Line!C14/C21*60", "D23": "h",
    "A24": "Pig speed", "B24": "v_p", "C24": 1.2, "D24": "m/s",
    "A25": "Pig run time", "B25": "t_p", "C25": "=Line!C7*1000/C24/3600", "D25": "h",
    "A26": "Pig run time (planted)", "B26": "t_px", "C26": "=Line!C7/C24/3600", "D26": "h",
    "A27": "Water temperature at start", "B27": "T_w", "C27": 54, "D27": "°F",
    "A28": "Water temperature, °C", "B28": "T_wC", "C28": "=(C27-32)/1.8", "D28": "°C",
    "A29": "Water temperature, °C (planted)", "B29": "T_wx", "C29": "=C27-32/1.8", "D29": "°C",
    "A30": "Allowed pressure change over hold", "B30": "dp_ok", "C30": 10, "D30": "psi",
    "A31": "Test result", "B31": "result", "C31": "=IF(ABS(Hold!D7)<=C30,\"PASS\",\"FAIL\")",
}
HOLD = {
    "A1": "Hold period readings at the high point",
    "A2": "Time [h]", "B2": "Pressure [psig]", "C2": "Water temp [°F]",
    "D2": "Change from start [psi]", "E2": "Pressure [bar(g)]", "F2": "Pressure [psia]",
    "A3": 0, "B3": 2753, "C3": 54.0,
    "A4": 2, "B4": 2751, "C4": 53.5,
    "A5": 4, "B5": 2748, "C5": 53.0,
    "A6": 6, "B6": 2749, "C6": 53.2,
    "A7": 8, "B7": 2746, "C7": 52.8,
    "A8": "Mean / range",
    "B8": "=AVERAGE(B3:B7)", "C8": "=AVERAGE(C3:C7)", "D8": "=MAX(D3:D7)-MIN(D3:D7)",
    "E8": "=AVERAGE(E3:E7)", "F8": "=AVERAGE(F3:F7)",
}
for r in range(3, 8):
    HOLD[f"D{r}"] = f"=B{r}-$B$3"
    HOLD[f"E{r}"] = f"=B{r}*0.06895"
    HOLD[f"F{r}"] = f"=B{r}+14.7"
HOLD["F6"] = "=B6+1.013"          # planted: bar atmosphere added to psig

# --------------------------------------------------------------------------------------------
# Book 3: a wastewater works' sludge line and anaerobic digester (m³/d, % DS, kg/d, °C, Nm³)
# --------------------------------------------------------------------------------------------
SLUDGE = {
    "A1": "Marsh End STW: sludge production (invented works)",
    "A2": "Stream", "B2": "Flow [m³/d]", "C2": "Dry solids [%]", "D2": "Density [kg/m³]",
    "E2": "Solids load [kg/d]", "F2": "Solids load [t/d]",
    "A3": "Primary sludge", "B3": 180, "C3": 4.5, "D3": 1020,
    "A4": "Thickened surplus activated sludge", "B4": 95, "C4": 5.5, "D4": 1010,
    "A5": "Imported sludge", "B5": 25, "C5": 3.0, "D5": 1015,
    "A6": "Total / mean",
    "B6": "=SUM(B3:B5)", "C6": "=AVERAGE(C3:C5)", "D6": "=AVERAGE(D3:D5)",
    "E6": "=SUM(E3:E5)", "F6": "=SUM(F3:F5)",
}
for r in range(3, 6):
    SLUDGE[f"E{r}"] = f"=B{r}*D{r}*C{r}/100"
    SLUDGE[f"F{r}"] = f"=E{r}/1000"
SLUDGE["E4"] = "=B4*D4*C4"        # planted: % dry solids used as a fraction

DIGESTER = {
    "A1": "Marsh End STW: digester and biogas (invented works)",
    "A2": "Item", "B2": "Symbol", "C2": "Value", "D2": "Unit",
    "A3": "Feed flow", "B3": "Q", "C3": "=FeedFlow", "D3": "m³/d",
    "A4": "Dry solids load", "B4": "M_DS", "C4": "=SUM(Loads)", "D4": "kg/d",
    "A5": "Volatile fraction of DS", "B5": "x_VS", "C5": 72, "D5": "%",
    "A6": "Volatile solids load", "B6": "M_VS", "C6": "=C4*C5/100", "D6": "kg/d",
    "A7": "Digester working volume", "B7": "V", "C7": 4800, "D7": "m³",
    "A8": "Hydraulic retention time", "B8": "HRT", "C8": "=C7/C3", "D8": "d",
    "A9": "Hydraulic retention time (planted)", "B9": "HRT_x", "C9": "=C7/C3*24", "D9": "d",
    "A10": "Organic loading rate", "B10": "OLR", "C10": "=C6/C7", "D10": "kg/(m³·d)",
    "A11": "VS destruction", "B11": "x_d", "C11": 55, "D11": "%",
    "A12": "Specific gas yield, per kg VS destroyed", "B12": "y", "C12": 0.95, "D12": "m³/kg",
    "A13": "Biogas production at digester conditions", "B13": "Q_g", "C13": "=C6*C11/100*C12",
    "D13": "m³/d",
    "A14": "Digester temperature", "B14": "T_d", "C14": 37, "D14": "°C",
    "A15": "Gas holder pressure", "B15": "p_g", "C15": 2.5, "D15": "kPa(g)",
    "A16": "Gas holder pressure, absolute", "B16": "p_a", "C16": "=C15+101.325", "D16": "kPa",
    "A17": "Biogas at normal conditions", "B17": "Q_n",
    "C17": "=C13*273.15/(C14+273.15)*C16/101.325", "D17": "Nm³/d",
    "A18": "Biogas at normal conditions (planted)", "B18": "Q_nx",
    "C18": "=C13*273.15/C14*C16/101.325", "D18": "Nm³/d",
    "A19": "Biogas at normal conditions (planted)", "B19": "Q_ny",
    "C19": "=C13*273.15/(C14+273.15)*C15/101.325", "D19": "Nm³/d",
    "A20": "Methane content", "B20": "x_CH4", "C20": 63, "D20": "%",
    "A21": "Methane calorific value", "B21": "CV", "C21": 35.8, "D21": "MJ/Nm³",
    "A22": "Energy in biogas", "B22": "E_g", "C22": "=C17*C20/100*C21", "D22": "MJ/d",
    "A23": "Energy in biogas, kWh/d", "B23": "E_kWh", "C23": "=C22/3.6", "D23": "kWh/d",
    "A24": "Mean fuel power", "B24": "P_f", "C24": "=C22/86.4", "D24": "kW",
    "A25": "Mean fuel power (planted)", "B25": "P_fx", "C25": "=C22/3600", "D25": "kW",
    "A26": "CHP electrical efficiency", "B26": "eta_e", "C26": 38, "D26": "%",
    "A27": "CHP electrical output", "B27": "P_e", "C27": "=C24*C26/100", "D27": "kW",
    "A28": "CHP heat recovery efficiency", "B28": "eta_h", "C28": 45, "D28": "%",
    "A29": "CHP heat output", "B29": "P_h", "C29": "=C24*C28/100", "D29": "kW",
    "A30": "Raw sludge temperature (winter)", "B30": "T_s", "C30": 9, "D30": "°C",
    "A31": "Sludge density", "B31": "rho", "C31": 1000, "D31": "kg/m³",
    "A32": "Sludge specific heat", "B32": "c_p", "C32": 4.19, "D32": "kJ/(kg·K)",
    "A33": "Sludge heating load", "B33": "P_s", "C33": "=C3*C31*C32*(C14-C30)/86400",
    "D33": "kW",
    "A34": "Sludge heating load (short form)", "B34": "P_s2",
    "C34": "=C3*4.19*(C14-C30)*1000/86400", "D34": "kW",
    "A35": "Sludge heating load (planted)", "B35": "P_sx", "C35": "=C3*C31*C32*C14/86400",
    "D35": "kW",
    "A36": "Digester wall and roof U·A", "B36": "UA", "C36": 850, "D36": "W/K",
    "A37": "Outside design temperature", "B37": "T_o", "C37": -5, "D37": "°C",
    "A38": "Fabric heat loss", "B38": "P_w", "C38": "=C36*(C14-C37)/1000", "D38": "kW",
    "A39": "Total heat demand", "B39": "P_t", "C39": "=C33+C38", "D39": "kW",
    "A40": "Boiler top-up", "B40": "P_b", "C40": "=IF(C39>C29,C39-C29,0)", "D40": "kW",
    "A41": "Total heat demand (planted)", "B41": "P_tx", "C41": "=C33+C36*(C14-C37)",
    "D41": "kW",
    "A42": "Digested solids", "B42": "M_out", "C42": "=C4-C6*C11/100", "D42": "kg/d",
    "A43": "Cake dry solids", "B43": "x_c", "C43": 22, "D43": "%",
    "A44": "Dewatered cake", "B44": "M_c", "C44": "=C42/(C43/100)/1000", "D44": "t/d",
    "A45": "Dewatered cake (planted)", "B45": "M_cx", "C45": "=C42/(C43/100)*1000", "D45": "t/d",
    "A46": "Polymer dose", "B46": "d_p", "C46": 8, "D46": "kg/t",
    "A47": "Polymer use", "B47": "M_p", "C47": "=C42/1000*C46", "D47": "kg/d",
    "A48": "Biogas density", "B48": "rho_g", "C48": 1.15, "D48": "kg/Nm³",
    "A49": "Biogas mass", "B49": "M_g", "C49": "=C17*C48", "D49": "kg/d",
    "A50": "Minimum HRT", "B50": "HRT_min", "C50": 15, "D50": "d",
    "A51": "HRT check", "B51": "flag", "C51": "=IF(C8>=C50,\"OK\",\"SHORT\")",
}

# --------------------------------------------------------------------------------------------
# Book 4: a bolted extended end-plate beam-to-column connection (kN, mm, MPa, kN·m)
# --------------------------------------------------------------------------------------------
LOADS = {
    "A1": "Grid C/4 beam-to-column connection (invented frame)",
    "A2": "Item", "B2": "Symbol", "C2": "Value", "D2": "Unit",
    "A3": "Design moment at column face", "B3": "M_Ed", "C3": 185, "D3": "kN·m",
    "A4": "Design shear", "B4": "V_Ed", "C4": 240, "D4": "kN",
    "A5": "Beam depth", "B5": "h", "C5": 533.1, "D5": "mm",
    "A6": "Beam flange thickness", "B6": "t_f", "C6": 15.6, "D6": "mm",
    "A7": "Design moment, kip·ft", "B7": "M_us", "C7": "=C3*0.7376", "D7": "kip·ft",
    "A8": "Design shear, kip", "B8": "V_us", "C8": "=C4/4.448", "D8": "kip",
    "A9": "Flange force", "B9": "F_f", "C9": "=C3*1000/(C5-C6)", "D9": "kN",
    "A10": "Flange force (planted)", "B10": "F_fx", "C10": "=C3/(C5-C6)/1000", "D10": "kN",
}
BOLTS = {
    "A1": "Tension bolt rows (lever arms from the compression flange centre)",
    "A2": "Bolt row", "B2": "Lever arm [mm]", "C2": "z² [mm²]", "D2": "Row force [kN]",
    "E2": "Force per bolt [kN]",
    "A3": "1 (extension)", "B3": 580,
    "A4": "2", "B4": 470,
    "A5": "3", "B5": 380,
    "A6": "4", "B6": 290,
    "A7": "Σ", "C7": "=SUM(C3:C6)", "D7": "=SUM(D3:D6)",
}
for r in range(3, 7):
    BOLTS[f"C{r}"] = f"=B{r}^2"
    BOLTS[f"D{r}"] = f"=M_Ed*1000*B{r}/$C$7"
    BOLTS[f"E{r}"] = f"=D{r}/2"
BOLTS["D4"] = "=M_Ed*B4/$C$7"     # planted: kN·m over mm with no *1000

CHECKS = {
    "A1": "Grid C/4 connection checks (invented frame)",
    "A2": "Item", "B2": "Symbol", "C2": "Value", "D2": "Unit",
    "A3": "Bolt diameter (M20, 8.8)", "B3": "d", "C3": 20, "D3": "mm",
    "A4": "Tensile stress area", "B4": "A_s", "C4": 245, "D4": "mm²",
    "A5": "Bolt ultimate strength", "B5": "f_ub", "C5": 800, "D5": "MPa",
    "A6": "Partial factor γ_M2", "B6": "g_M2", "C6": 1.25, "D6": "-",
    "A7": "Tension resistance per bolt", "B7": "F_tRd", "C7": "=0.9*C5*C4/C6/1000", "D7": "kN",
    "A8": "Tension resistance per bolt (planted)", "B8": "F_tx", "C8": "=0.9*C5*C4/C6*1000",
    "D8": "kN",
    "A9": "Largest bolt tension", "B9": "F_tEd", "C9": "=MAX(Bolts!E3:E6)", "D9": "kN",
    "A10": "Tension utilisation", "B10": "u_t", "C10": "=C9/C7", "D10": "-",
    "A11": "Tension utilisation, %", "B11": "u_tp", "C11": "=C9/C7*100", "D11": "%",
    "A12": "Shear resistance per bolt", "B12": "F_vRd", "C12": "=0.6*C5*C4/C6/1000", "D12": "kN",
    "A13": "Number of bolts in shear", "B13": "n", "C13": 8, "D13": "-",
    "A14": "End plate thickness", "B14": "t_p", "C14": 20, "D14": "mm",
    "A15": "Plate ultimate strength (S275)", "B15": "f_u", "C15": 430, "D15": "MPa",
    "A16": "Bearing resistance per bolt", "B16": "F_bRd", "C16": "=2.5*0.7*C15*C3*C14/C6/1000",
    "D16": "kN",
    "A17": "Bearing resistance per bolt, N", "B17": "F_bN", "C17": "=2.5*0.7*C15*C3*C14/C6",
    "D17": "N",
    "A18": "Governing bolt shear resistance", "B18": "F_Rd", "C18": "=MIN(C12,C16)", "D18": "kN",
    "A19": "Governing bolt shear resistance (planted)", "B19": "F_Rdx", "C19": "=MIN(C12,C17)",
    "D19": "kN",
    "A20": "Group shear resistance", "B20": "V_Rd", "C20": "=C13*C18", "D20": "kN",
    "A21": "Shear check", "B21": "flag", "C21": "=IF(V_Ed<=C20,\"OK\",\"FAIL\")",
    "A22": "Fillet weld leg", "B22": "s", "C22": 8, "D22": "mm",
    "A23": "Weld throat", "B23": "a", "C23": "=0.7*C22", "D23": "mm",
    "A24": "Weld design shear strength", "B24": "f_vwd", "C24": "=C15/(SQRT(3)*0.85*C6)",
    "D24": "MPa",
    "A25": "Weld resistance per length", "B25": "F_wRd", "C25": "=C24*C23/1000", "D25": "kN/mm",
    "A26": "Weld length required", "B26": "L_w", "C26": "=V_Ed/C25", "D26": "mm",
    "A27": "Weld length required (planted)", "B27": "L_wx", "C27": "=V_Ed/(C24*C23)", "D27": "mm",
    "A28": "End plate yield strength", "B28": "f_y", "C28": 275, "D28": "MPa",
    "A29": "End plate width", "B29": "b_p", "C29": 250, "D29": "mm",
    "A30": "Plate plastic moment", "B30": "M_pl", "C30": "=C28*C29*C14^2/4/1000000",
    "D30": "kN·m",
    "A31": "Plate plastic moment (planted)", "B31": "M_plx", "C31": "=C28*C29*C14^2/4/1000",
    "D31": "kN·m",
    "A32": "Seating bracket section modulus", "B32": "W_cm", "C32": 385, "D32": "cm³",
    "A33": "Section modulus, mm³", "B33": "W_el", "C33": "=C32*1000", "D33": "mm³",
    "A34": "Load eccentricity on bracket", "B34": "e", "C34": 150, "D34": "mm",
    "A35": "Bracket moment", "B35": "M_b", "C35": "=V_Ed*C34/1000", "D35": "kN·m",
    "A36": "Bracket bending stress", "B36": "s_b", "C36": "=C35*1000000/C33", "D36": "MPa",
    "A37": "Bracket bending stress (planted)", "B37": "s_bx", "C37": "=C35*1000000/(C33*1000)",
    "D37": "MPa",
    "A38": "Bracket bending stress, ksi", "B38": "s_bk", "C38": "=C36*0.145", "D38": "ksi",
    "A39": "Steel modulus", "B39": "E", "C39": 210, "D39": "GPa",
    "A40": "Bracket length", "B40": "L_b", "C40": 300,
    "A41": "Bracket second moment of area", "B41": "I_b", "C41": 96000000,
    "A42": "Bracket tip deflection", "B42": "w", "C42": "=V_Ed*1000*C40^3/(3*C39*1000*C41)",
    "D42": "mm",
    "A43": "Bracket tip deflection (planted)", "B43": "w_x", "C43": "=V_Ed*1000*C40^3/(3*C39*C41)",
    "D43": "mm",
}

BOOKS = {
    "heat-meter-heat-pump": {
        "trade": "district energy: heat meter log and water-source heat pump",
        "sheets": [("Meter", METER), ("HeatPump", HEATPUMP)],
        "names": {"HeatOut": ("Meter", "$C$17")},
        "planted": {
            "Meter!F6": ("offset-scale", "heat from the supply temperature in °C, not ΔT"),
            "Meter!F7": ("result-unit", "4190 J/(kg·K) per litre without /1000: W into a kW column"),
            "Meter!C15": ("unit-scale", "kWh to MJ divided by 3.6: wrong way round"),
            "HeatPump!C8": ("unit-scale", "kW compressor plus pumps in W"),
            "HeatPump!C13": ("offset-scale", "Carnot COP from °C, not K"),
            "HeatPump!C23": ("offset-scale", "pressure ratio of two gauge pressures"),
            "HeatPump!C26": ("unit-scale", "8 % losses used as a fraction: 1 - 8"),
            "HeatPump!C29": ("unit-scale", "kW to MW done twice: /1000 * h /1000"),
            "HeatPump!C32": ("unit-scale", "IF comparing and subtracting MW and kW"),
        },
        "conversions": {
            "Meter!E3": "°C supply - °C return into K",
            "Meter!F3": "4.19 * L/s * K = kW (water's volumetric heat)",
            "Meter!C13": "sum of kW readings * h = kWh",
            "Meter!C14": "kWh * 3.6 = MJ",
            "Meter!C16": "AVERAGE(L/s) * 3.6 = m³/h",
            "Meter!C18": "°C * 1.8 + 32 = °F",
            "Meter!C19": "°C + 273.15 = K",
            "HeatPump!C7": "kW + W/1000",
            "HeatPump!C12": "(°C + 273.15) / K difference",
            "HeatPump!C17": "kW / (4.19 * L/s) = K",
            "HeatPump!C18": "L/s * 3600/1000 = m³/h",
            "HeatPump!C21": "bar(g) + 1.013 = bar absolute",
            "HeatPump!C22": "ratio of (bar(g) + 1.013)",
            "HeatPump!C28": "kW * h / 1000 = MWh",
            "HeatPump!C31": "IF with MW * 1000 against kW",
        },
    },
    "pipeline-hydrotest": {
        "trade": "pipeline: hydrostatic test and pigging of a section",
        "sheets": [("Line", LINE), ("Hydrotest", HYDROTEST), ("Hold", HOLD)],
        "names": {"OD": ("Line", "$C$3"), "WT": ("Line", "$C$4"), "SMYS": ("Line", "$C$5"),
                  "DesignFactor": ("Line", "$C$6")},
        "planted": {
            "Line!C11": ("unit-scale", "bore area from the ID in mm into m²: 10⁶ too large"),
            "Hydrotest!C8": ("unit-scale", "psig to bar(g) multiplied by 14.5: wrong way round"),
            "Hydrotest!C12": ("sum-mismatch", "water column ρ·h without g added to a pressure"),
            "Hydrotest!C16": ("unit-scale", "hoop stress / SMYS left as a fraction in a % cell"),
            "Hydrotest!C20": ("offset-scale", "Boyle's law with the gauge test pressure"),
            "Hydrotest!C23": ("unit-scale", "gal / gpm * 60 into h: 3600 too large"),
            "Hydrotest!C26": ("unit-scale", "section length in km over m/s: 1000 too small"),
            "Hydrotest!C29": ("unit-scale", "°F to °C without brackets: T - 32/1.8"),
            "Hold!F6": ("offset-scale", "bar atmosphere 1.013 added to psig"),
        },
        "conversions": {
            "Line!C9": "in * 25.4 = mm",
            "Line!C10": "π (mm/1000)² / 4 = m²",
            "Line!C12": "m² * km * 1000 = m³",
            "Line!C13": "m³ * 6.29 = bbl",
            "Line!C14": "m³ * 264.17 = US gal",
            "Hydrotest!C3": "Barlow 2 S t F / D = psig",
            "Hydrotest!C6": "psig / 14.5 = bar(g)",
            "Hydrotest!C7": "psig * 6.895 = kPa(g)",
            "Hydrotest!C11": "bar(g) + ρ g h / 100000",
            "Hydrotest!C13": "psig + 0.433 psi/ft * m/0.3048",
            "Hydrotest!C15": "psi / psi * 100 = %",
            "Hydrotest!C17": "psig + 14.7 = psia",
            "Hydrotest!C19": "V * 14.7 / psia (Boyle)",
            "Hydrotest!C22": "gal / gpm / 60 = h",
            "Hydrotest!C25": "km * 1000 / (m/s) / 3600 = h",
            "Hydrotest!C28": "(°F - 32)/1.8 = °C",
            "Hold!E3": "psig * 0.06895 = bar(g) (table)",
            "Hold!F3": "psig + 14.7 = psia (table)",
            "Hold!D3": "psig - psig = psi (table)",
        },
    },
    "sludge-digester": {
        "trade": "wastewater: sludge production and anaerobic digester",
        "sheets": [("Sludge", SLUDGE), ("Digester", DIGESTER)],
        "names": {"FeedFlow": ("Sludge", "$B$6"), "Loads": ("Sludge", "$E$3:$E$5")},
        "sidecar": "# Units the sheet uses that plumb's table lacks: the normal cubic metre, a\n"
                   "# volume of gas stated at 0 °C and 101.325 kPa\n"
                   "measure Nm = 1 m \"metre of a normal cubic metre, so that Nm³ is m³\"\n",
        "planted": {
            "Sludge!E4": ("unit-scale", "% dry solids used as a fraction: 100 too large"),
            "Digester!C9": ("unit-scale", "m³ / (m³/d) * 24 into d: hours in a day cell"),
            "Digester!C18": ("offset-scale", "gas normalised with 273.15/T in °C"),
            "Digester!C19": ("offset-scale", "gas normalised with the gauge holder pressure"),
            "Digester!C25": ("unit-scale", "MJ/d / 3600 into kW: should be /86.4"),
            "Digester!C35": ("offset-scale", "sludge heating from T in °C, not the rise"),
            "Digester!C41": ("unit-scale", "kW plus U·A·ΔT in W"),
            "Digester!C45": ("unit-scale", "kg/d to t/d multiplied by 1000: wrong way round"),
        },
        "conversions": {
            "Sludge!E3": "m³/d * kg/m³ * %/100 = kg/d (table)",
            "Sludge!F3": "kg/d / 1000 = t/d (table)",
            "Digester!C6": "kg/d * %/100",
            "Digester!C16": "kPa(g) + 101.325 = kPa",
            "Digester!C17": "m³ * 273.15/(°C + 273.15) * kPa/101.325 = Nm³",
            "Digester!C23": "MJ/d / 3.6 = kWh/d",
            "Digester!C24": "MJ/d / 86.4 = kW",
            "Digester!C33": "m³/d * kg/m³ * kJ/(kg·K) * K / 86400 = kW",
            "Digester!C34": "m³/d * 4.19 * K * 1000 / 86400 = kW (water constants)",
            "Digester!C38": "W/K * K / 1000 = kW",
            "Digester!C44": "kg/d / (%/100) / 1000 = t/d",
            "Digester!C47": "kg/d / 1000 * kg/t = kg/d",
        },
    },
    "steel-endplate": {
        "trade": "structural steel: bolted extended end-plate connection",
        "sheets": [("Loads", LOADS), ("Bolts", BOLTS), ("Checks", CHECKS)],
        "names": {"M_Ed": ("Loads", "$C$3"), "V_Ed": ("Loads", "$C$4")},
        "sidecar": "# Units of the bracket data, which the sheet leaves without a unit column\n"
                   "cells Checks!C40 : mm \"bracket length from the detail\"\n"
                   "cells Checks!C41 : mm^4 \"from the section table\"\n",
        "planted": {
            "Loads!C10": ("unit-scale", "kN·m / mm then /1000: wrong way round (10⁶)"),
            "Bolts!D4": ("unit-scale", "kN·m * mm / mm² with no *1000"),
            "Checks!C8": ("unit-scale", "MPa * mm² = N, *1000 into kN: wrong way round"),
            "Checks!C19": ("unit-scale", "MIN of a kN and an N resistance"),
            "Checks!C27": ("unit-scale", "kN / (MPa * mm) into mm without *1000"),
            "Checks!C31": ("unit-scale", "MPa * mm³ /1000 into kN·m: should be /10⁶"),
            "Checks!C37": ("unit-scale", "cm³ to mm³ done twice: W_el (already mm³) * 1000"),
            "Checks!C43": ("unit-scale", "kN * 1000 but GPa without * 1000: 1000 too large"),
        },
        "conversions": {
            "Loads!C7": "kN·m * 0.7376 = kip·ft",
            "Loads!C8": "kN / 4.448 = kip",
            "Loads!C9": "kN·m * 1000 / mm = kN",
            "Bolts!D3": "kN·m * 1000 * mm / mm² = kN (table)",
            "Checks!C7": "0.9 * MPa * mm² / γ / 1000 = kN",
            "Checks!C11": "kN / kN * 100 = %",
            "Checks!C16": "MPa * mm * mm / 1000 = kN",
            "Checks!C25": "MPa * mm / 1000 = kN/mm",
            "Checks!C30": "MPa * mm * mm² / 10⁶ = kN·m",
            "Checks!C33": "cm³ * 1000 = mm³",
            "Checks!C35": "kN * mm / 1000 = kN·m",
            "Checks!C36": "kN·m * 10⁶ / mm³ = MPa",
            "Checks!C38": "MPa * 0.145 = ksi",
            "Checks!C42": "kN*1000 mm³ / (GPa*1000 mm⁴) = mm",
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
    os.makedirs(OUT, exist_ok=True)
    summary = {}
    for stem, book in BOOKS.items():
        write_xlsx(os.path.join(OUT, stem + ".xlsx"), book["sheets"], book.get("names"))
        if "sidecar" in book:
            with open(os.path.join(OUT, stem + ".cells.plumb"), "w", encoding="utf-8") as f:
                f.write(book["sidecar"])
        formulas = formula_cells(book)
        for cell in list(book["planted"]) + list(book["conversions"]):
            assert cell in formulas, f"{stem}: {cell} is not a formula cell"
        correct = [c for c in formulas if c not in book["planted"]]
        with open(os.path.join(OUT, stem + ".expect"), "w", encoding="utf-8") as f:
            f.write("# sheet!cell rule: the planted mistakes plumb must report; every other\n"
                    "# formula cell must stay clean (written by make_books.py)\n")
            for cell, (rule, what) in book["planted"].items():
                f.write(f"# planted: {what}\n{cell} {rule}\n")
        summary[stem] = {
            "trade": book["trade"],
            "planted": {c: {"rule": r, "what": w} for c, (r, w) in book["planted"].items()},
            "conversions": book["conversions"],
            "correct": correct,
            "formulas": {c: book_formula(book, c) for c in formulas},
        }
    with open(os.path.join(OUT, "expect.json"), "w", encoding="utf-8") as f:
        json.dump(summary, f, indent=1, ensure_ascii=False)


if __name__ == "__main__":
    main()
