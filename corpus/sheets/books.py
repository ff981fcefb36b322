"""The corpus calc workbooks: invented scenarios, written the way engineers lay out sheets.

Each book lists its cells (A1 -> number, text or "=formula") and the findings plumb must
report as "Sheet!Cell rule". Every planted mistake sits beside correct conversions.
"""

# A booster pump sizing sheet: description, symbol, value, unit in columns A to D.
PUMP = {
    "A1": "Booster pump sizing (invented scenario)",
    "A2": "Item", "B2": "Symbol", "C2": "Value", "D2": "Unit",
    "A3": "Design flow", "B3": "Q", "C3": 45, "D3": "L/s",
    "A4": "Pipe internal diameter", "B4": "D", "C4": 250, "D4": "mm",
    "A5": "Pipe length", "B5": "L", "C5": 1200, "D5": "m",
    "A6": "Friction factor", "B6": "f", "C6": 0.018, "D6": "-",
    "A7": "Gravity", "B7": "g", "C7": 9.81, "D7": "m/s2",
    "A8": "Flow in SI", "B8": "Q_si", "C8": "=C3/1000", "D8": "m3/s",
    "A9": "Diameter in SI", "B9": "D_m", "C9": "=C4/1000", "D9": "m",
    "A10": "Bore area", "B10": "A", "C10": "=PI()*C9^2/4", "D10": "m²",
    "A11": "Velocity", "B11": "V", "C11": "=C8/C10", "D11": "m/s",
    "A12": "Velocity from L/s (planted)", "B12": "V_x", "C12": "=C3/C10", "D12": "m/s",
    "A13": "Friction head", "B13": "h_f", "C13": "=C6*C5/C9*C11^2/(2*C7)", "D13": "m",
    "A14": "Friction head, no g (planted)", "B14": "h_x", "C14": "=C6*C5/C9*C11^2/2", "D14": "m",
    "A15": "Static head", "B15": "H_s", "C15": 18.5, "D15": "m",
    "A16": "Total head", "B16": "H", "C16": "=C15+C13", "D16": "m",
    "A17": "Water density", "B17": "rho", "C17": 998, "D17": "kg/m3",
    "A18": "Hydraulic power", "B18": "P_h", "C18": "=C17*C7*C8*C16/1000", "D18": "kW",
    "A19": "Hydraulic power, factor (planted)", "B19": "P_x", "C19": "=C17*C7*C8*C16*1000",
    "D19": "kW",
    "A20": "Pump efficiency", "B20": "eta", "C20": 72, "D20": "%",
    "A21": "Shaft power", "B21": "P_s", "C21": "=C18/(C20/100)", "D21": "kW",
    "A22": "Shaft power, % as number (planted)", "B22": "P_y", "C22": "=C18/C20", "D22": "kW",
    "A23": "Motor rating", "B23": "P_m", "C23": 55, "D23": "kW",
    "A24": "Motor check", "C24": "=IF(C21<C23,\"OK\",\"UNDERSIZED\")",
    "A25": "Auxiliary load", "B25": "P_a", "C25": 750, "D25": "W",
    "A26": "Total load (planted)", "B26": "P_t", "C26": "=C21+C25", "D26": "kW",
    "A27": "Total load", "B27": "P_t", "C27": "=C21+C25/1000", "D27": "kW",
    "A28": "Water temperature", "B28": "T", "C28": 15, "D28": "°C",
    "A29": "Absolute temperature", "B29": "T_K", "C29": "=C28+273.15", "D29": "K",
    "A30": "Absolute temperature (planted)", "B30": "T_x", "C30": "=C28", "D30": "K",
    "A31": "Suction pressure", "B31": "p_s", "C31": 150, "D31": "kPa(g)",
    "A32": "Suction pressure, absolute", "B32": "p_a", "C32": "=C31+101.325", "D32": "kPa",
    "A33": "Pressure ratio (planted)", "B33": "r", "C33": "=C31/C32", "D33": "-",
    "A34": "Pressure ratio", "B34": "r", "C34": "=C32/(C31+101.325)", "D34": "-",
    "A35": "Wall roughness", "B35": "eps", "C35": 0.05,
    "A36": "Relative roughness", "B36": "eps_r", "C36": "=C35/C4", "D36": "-",
    "A37": "Viscosity", "B37": "mu", "C37": 1.14, "D37": "mPa·s",
    "A38": "Reynolds number", "B38": "Re", "C38": "=C17*C11*C9/(C37/1000)", "D38": "-",
    "A39": "Reynolds number (planted)", "B39": "Re_x", "C39": "=C17*C11*C9/C37", "D39": "-",
    "A40": "Log-gamma (not checked)", "C40": "=GAMMALN(C6)", "D40": "-",
    "A41": "Velocity head", "B41": "h_v", "C41": "=-C11^2/(2*C7)*-1", "D41": "m",
}

# A runoff table: units in the column headings, one sub-catchment a row.
RUNOFF = {
    "A1": "Rational method peak flows (invented catchment)",
    "A2": "Sub-catchment", "B2": "Area [ha]", "C2": "Runoff coeff. [-]",
    "D2": "Intensity [mm/h]", "E2": "Peak flow [m3/s]",
    "A3": "North", "B3": 12.5, "C3": 0.45, "D3": 62, "E3": "=C3*D3*B3/360",
    "A4": "East", "B4": 8.2, "C4": 0.6, "D4": 58, "E4": "=C4*D4*B4/360",
    "A5": "South", "B5": 20.1, "C5": 0.35, "D5": 55, "E5": "=C5*D5*B5/360",
    "A6": "West (planted)", "B6": 5.4, "C6": 0.7, "D6": 64, "E6": "=C6*D6*B6/3600",
    "A7": "Total", "E7": "=SUM(E3:E6)",
    "G2": "Stream", "H2": "Flow [kg/s]", "I2": "cp [kJ/(kg·K)]", "J2": "T in (°C)",
    "K2": "T out (°C)", "L2": "ΔT [K]", "M2": "Duty [kW]",
    "G3": "Cooler 1", "H3": 4.2, "I3": 4.18, "J3": 65, "K3": 30, "L3": "=J3-K3",
    "M3": "=H3*I3*L3",
    "G4": "Cooler 2", "H4": 2.8, "I4": 4.18, "J4": 70, "K4": 35, "L4": "=J4-K4",
    "M4": "=H4*I4*(J4-K4)",
    "G5": "Cooler 3 (planted)", "H5": 3.1, "I5": 4.18, "J5": 72, "K5": 33, "L5": "=J5-K5",
    "M5": "=H5*I5*J5*L5",
    "O2": "Pipe run", "P2": "Length", "Q2": "Unit",
    "O3": "Run 1", "P3": 120, "Q3": "m",
    "O4": "Run 2", "P4": 85, "Q4": "m",
    "O5": "Run 3 (planted)", "P5": 300, "Q5": "ft",
    "O6": "Total", "P6": "=SUM(P3:P5)", "Q6": "m",
}

# A reservoir book on three sheets, with defined names and a sidecar.
INPUTS = {
    "A1": "Well test inputs (invented field)",
    "A3": "Oil rate", "B3": "q_o", "C3": 850,
    "A4": "Formation volume factor", "B4": "B_o", "C4": 1.25, "D4": "-",
    "A5": "Reservoir pressure", "B5": "p_r", "C5": 24000, "D5": "kPa",
    "A6": "Well pressure", "B6": "p_wf", "C6": 3200, "D6": "psi",
    "A7": "Net pay", "B7": "h", "C7": 12, "D7": "m",
    "A8": "Deviation", "B8": "theta", "C8": 35, "D8": "°",
    "A9": "Limit pressure", "B9": "p_lim", "C9": 20000, "D9": "kPa",
}
TABLES = {
    "A1": "Oil viscosity against pressure (invented PVT)",
    "A2": "Pressure [kPa]", "B2": "Viscosity [mPa·s]",
    "A3": 10000, "B3": 1.9, "A4": 15000, "B4": 1.7, "A5": 20000, "B5": 1.55,
    "A6": 25000, "B6": 1.45, "A7": 30000, "B7": 1.4,
}
CALC = {
    "A1": "Calculations",
    "A3": "Reservoir rate", "C3": "=Rate*FVF", "D3": "bbl/d",
    "A4": "Viscosity at p_r", "C4": "=VLOOKUP(Inputs!C5,Tables!A3:B7,2,TRUE)", "D4": "mPa·s",
    "A5": "Viscosity at p_wf (planted)", "C5": "=VLOOKUP(Inputs!C6,Tables!A3:B7,2,TRUE)",
    "D5": "mPa·s",
    "A6": "Drawdown", "C6": "=Inputs!C5-Inputs!C6*6.894757", "D6": "kPa",
    "A7": "Drawdown (planted)", "C7": "=Inputs!C5-Inputs!C6", "D7": "kPa",
    "A8": "Iteration A (planted)", "C8": "=C9+1", "D8": "-",
    "A9": "Iteration B", "C9": "=C8*2", "D9": "-",
    "A10": "Vertical pay", "C10": "=Inputs!C7*COS(RADIANS(Inputs!C8))", "D10": "m",
    "A11": "Vertical pay (planted)", "C11": "=Inputs!C7*COS(Inputs!C8)", "D11": "m",
    "A12": "Choice (planted)", "C12": "=IF(Inputs!C5>Inputs!C9,Inputs!C7,Inputs!C5)", "D12": "m",
    "A13": "Above limit", "C13": "=IF(Inputs!C5>Inputs!C9,1,0)", "D13": "-",
    "A14": "Productivity", "C14": "=C3/C6", "D14": "bbl/(d·kPa)",
    "A15": "Pressure, squared ratio", "C15": "=(Inputs!C9/Inputs!C5)^2", "D15": "-",
    "A16": "Unit of pay (planted)", "C16": "=Inputs!C7+Inputs!C5", "D16": "m",
}

BOOKS = {
    "pump-sizing": {
        "sheets": [("Pump", PUMP)],
        "expect": [
            "Pump!C12 unit-scale", "Pump!C14 result-unit", "Pump!C19 unit-scale",
            "Pump!C22 unit-scale", "Pump!C26 unit-scale", "Pump!C30 offset-scale",
            "Pump!C33 offset-scale", "Pump!C35 no-unit ~ used as a length [L] in Pump!C36",
            "Pump!C35 no-unit ~ must be in mm, as C4 is", "Pump!C39 unit-scale",
            "Pump!C40 not-checked",
        ],
    },
    "runoff-and-duty": {
        "sheets": [("Tables", RUNOFF)],
        "expect": [
            "Tables!E6 unit-scale", "Tables!M5 offset-scale", "Tables!P6 mixed-range",
        ],
    },
    "well-test": {
        "sheets": [("Inputs", INPUTS), ("Tables", TABLES), ("Calc", CALC)],
        "names": {"Rate": ("Inputs", "$C$3"), "FVF": ("Inputs", "$C$4")},
        "sidecar": "# Units of the workbook's defined names (plumb reads this with well-test.*)\n"
                   "Rate : bbl/d \"stock-tank oil rate\"\n"
                   "# Units of cells, ranges and whole columns; they win over the text beside a cell and\n"
                   "# over its column's heading\n"
                   "cells Tables!A : kPa \"the PVT table's pressures\"\n"
                   "cells Tables!B3:B7 : mPa*s \"viscosities from the lab report\"\n"
                   "cells Inputs!C7 : m \"net pay from the log\"\n",
        "expect": [
            "Calc!C5 unit-scale", "Calc!C7 unit-scale", "Calc!C8 circular-reference",
            "Calc!C11 unit-scale", "Calc!C12 argument-mismatch", "Calc!C16 sum-mismatch",
        ],
    },
}

# The demo workbook (corpus/demo-workbook): the Corran Vale booster station of corpus/demo,
# as its spreadsheet calc, with three mistakes of the kind such sheets carry.
STATION = {
    "A1": "Corran Vale booster station: duty point check (invented scenario)",
    "A2": "Item", "B2": "Symbol", "C2": "Value", "D2": "Unit",
    "A3": "Duty flow", "B3": "Q", "C3": 62, "D3": "L/s",
    "A4": "Rising main bore", "B4": "D", "C4": 306, "D4": "mm",
    "A5": "Rising main length", "B5": "L", "C5": 1.85, "D5": "km",
    "A6": "Darcy friction factor", "B6": "f", "C6": 0.0165, "D6": "-",
    "A7": "Static lift", "B7": "H_st", "C7": 57, "D7": "m",
    "A8": "Standard gravity", "B8": "g", "C8": 9.80665, "D8": "m/s2",
    "A9": "Water density", "B9": "rho", "C9": 999.1, "D9": "kg/m³",
    "A10": "Bore area", "B10": "A", "C10": "=PI()*(C4/1000)^2/4", "D10": "m²",
    "A11": "Velocity", "B11": "V", "C11": "=C3/1000/C10", "D11": "m/s",
    "A12": "Friction head", "B12": "h_f", "C12": "=C6*(C5*1000)/(C4/1000)*C11^2/(2*C8)",
    "D12": "m",
    "A13": "Total head", "B13": "H", "C13": "=C7+C12", "D13": "m",
    "A14": "Hydraulic power", "B14": "P_h", "C14": "=C9*C8*C3*C13/1000", "D14": "kW",
    "A15": "Pump efficiency", "B15": "eta", "C15": 0.78, "D15": "-",
    "A16": "Shaft power", "B16": "P_s", "C16": "=C14/C15", "D16": "kW",
    "A17": "Motor rating", "B17": "P_m", "C17": 55, "D17": "kW",
    "A18": "Motor loading", "B18": "x", "C18": "=C16/C17", "D18": "-",
    "A19": "Suction gauge", "B19": "p_s", "C19": 35, "D19": "kPa(g)",
    "A20": "Vapour pressure", "B20": "p_v", "C20": 1.7, "D20": "kPa",
    "A21": "NPSH available", "B21": "NPSH_a", "C21": "=(C19-C20)*1000/(C9*C8)", "D21": "m",
    "A23": "Period", "B23": "Flow [L/s]", "C23": "Duration [h]", "D23": "Volume [m3]",
    "A24": "Night", "B24": 48, "C24": 8, "D24": "=B24*C24*3.6",
    "A25": "Day", "B25": 62, "C25": 12, "D25": "=B25*C25*3.6",
    "A26": "Evening", "B26": 58, "C26": 4, "D26": "=B26*C26*3600",
    "A27": "Day total", "D27": "=SUM(D24:D26)",
}
BOOKS["corran-vale-station"] = {
    "folder": "../demo-workbook",
    "sheets": [("Duty", STATION)],
    "expect": ["Duty!C14 unit-scale", "Duty!C21 offset-scale", "Duty!D26 unit-scale"],
}
