#!/usr/bin/env python3
"""Four review workbooks for plumb's workbook checking (review44), written with the standard
zipfile module (xlsx_writer.py, copied from review2 and given ROUND and VLOOKUP).

Trades: a building heat-loss schedule room by room; water distribution demand and storage; a
pumping station's power and electricity bill; chlorine dosing and a contact tank's CT.
All scenarios, buildings, works and tariffs are invented.

Every formula cell is either a planted mistake (PLANTED, with the rule expected) or a correct
cell that must stay clean (CONVERSIONS marks the correct conversions among them).

Run: python3 make_books.py  ->  *.xlsx (+ sidecars), *.expect, expect.json in this folder
"""
import json
import os

from xlsx_writer import write_xlsx

OUT = os.path.dirname(os.path.abspath(__file__))

# --------------------------------------------------------------------------------------------
# Book 1: building heat-loss schedule, room by room (W, kW, Btu/h, °C, ach)
# --------------------------------------------------------------------------------------------
DESIGN = {
    "A1": "Hollin Street health centre: heat-loss design data (invented building)",
    "A2": "Sources: Φ = Σ U·A·ΔT and Φ_v = ρ·c·n·V·ΔT/3600 (CIBSE Guide A, 2015, §5; BS EN 12831-1); "
          "1 W/(m²·K) = 0.1761 Btu/(h·ft²·°F) and 1 W = 3.412 Btu/h (NIST SP 811, rounded); "
          "air ρ = 1.2 kg/m³, c = 1.005 kJ/(kg·K) (common practice)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Inside design temperature", "B4": "T_i", "C4": 21, "D4": "°C",
    "A5": "Outside design temperature", "B5": "T_o", "C5": -4, "D5": "°C",
    "A6": "Design temperature difference", "B6": "dT", "C6": "=C4-C5", "D6": "K",
    "A7": "Design temperature difference, °F", "B7": "dT_F", "C7": "=C6*1.8", "D7": "Δ°F",
    "A8": "Outside design temperature, °F", "B8": "T_oF", "C8": "=C5*1.8+32", "D8": "°F",
    "A9": "Inside design temperature, °F", "B9": "T_iF", "C9": "=C4*1.8", "D9": "°F",
    "A10": "External wall U-value", "B10": "U_w", "C10": 0.28, "D10": "W/(m²·K)",
    "A11": "Roof U-value", "B11": "U_r", "C11": 0.16, "D11": "W/(m²·K)",
    "A12": "Window U-value", "B12": "U_g", "C12": 1.4, "D12": "W/(m²·K)",
    "A13": "Ground floor U-value", "B13": "U_f", "C13": 0.22, "D13": "W/(m²·K)",
    "A14": "External wall U-value, imperial", "B14": "U_wI", "C14": "=C10*0.1761",
    "D14": "Btu/(h·ft²·°F)",
    "A15": "Window U-value, imperial", "B15": "U_gI", "C15": "=C12/0.1761",
    "D15": "Btu/(h·ft²·°F)",
    "A16": "Air density", "B16": "rho_a", "C16": 1.2, "D16": "kg/m³",
    "A17": "Air specific heat", "B17": "c_a", "C17": 1.005, "D17": "kJ/(kg·K)",
    "A18": "Ventilation heat per air change", "B18": "c_v", "C18": "=C16*C17*1000/3600",
    "D18": "W·h/(m³·K)",
    "A19": "Design margin", "B19": "x_m", "C19": 10, "D19": "%",
    "A20": "Heating degree-days (base 15.5 °C), invented site", "B20": "DD", "C20": 2100,
    "D20": "K·d",
    "A21": "Boiler seasonal efficiency", "B21": "eta_s", "C21": 92, "D21": "%",
}
FABRIC = {
    "A1": "Fabric heat loss by room (areas from the invented drawings)",
    "A2": "Source: Φ_f = (Σ U·A)·ΔT, CIBSE Guide A (2015) §5",
    "A3": "Room", "B3": "Wall [m²]", "C3": "Window [m²]", "D3": "Roof [m²]", "E3": "Floor [m²]",
    "F3": "Fabric loss [W]", "G3": "Fabric loss [kW]",
    "A4": "Reception and waiting", "B4": 38.5, "C4": 9.6, "D4": 42.0, "E4": 42.0,
    "A5": "Consulting room 1", "B5": 21.0, "C5": 4.2, "D5": 16.5, "E5": 16.5,
    "A6": "Consulting room 2", "B6": 21.0, "C6": 4.2, "D6": 16.5, "E6": 16.5,
    "A7": "Treatment room", "B7": 26.4, "C7": 5.4, "D7": 22.0, "E7": 22.0,
    "A8": "Staff room", "B8": 18.2, "C8": 3.6, "D8": 14.0, "E8": 14.0,
    "A9": "WC and cleaner's store", "B9": 9.8, "C9": 0.8, "D9": 6.5, "E9": 6.5,
    "A10": "Total", "B10": "=SUM(B4:B9)", "C10": "=SUM(C4:C9)", "D10": "=SUM(D4:D9)",
    "E10": "=SUM(E4:E9)", "F10": "=SUM(F4:F9)", "G10": "=SUM(G4:G9)",
    "A11": "Largest room", "F11": "=MAX(F4:F9)",
    "A13": "Glazing ratio", "B13": "=C10/(B10+C10)*100", "C13": "%",
}
for r in range(4, 10):
    FABRIC[f"F{r}"] = f"=(B{r}*Uw+C{r}*Ug+D{r}*Ur+E{r}*Uf)*dT"
    FABRIC[f"G{r}"] = f"=F{r}/1000"
FABRIC["F7"] = "=(B7*Uw+C7*Ug+D7*Ur+E7*Uf)*Design!$C$4"   # planted: inside °C, not ΔT
FABRIC["G8"] = "=F8*1000"                                    # planted: W to kW the wrong way

ROOMS = {
    "A1": "Heat-loss schedule by room: ventilation and design load (invented building)",
    "A2": "Sources: Φ_v = c_v·n·V·ΔT with c_v = ρc/3600 ≈ 0.33 W·h/(m³·K) (CIBSE Guide A §5); "
          "Q_a = H·DD·24 (degree-day method, CIBSE TM41); 1 kWh = 3.6 MJ (SI Brochure); "
          "1 kW = 3412 Btu/h (NIST SP 811, rounded)",
    "A3": "Room", "B3": "Floor area [m²]", "C3": "Ceiling height [mm]", "D3": "Volume [m³]",
    "E3": "Air changes [ach]", "F3": "Ventilation loss [W]", "G3": "Total loss [W]",
    "H3": "Design load [W]", "I3": "Design load [Btu/h]",
    "A10": "Total", "B10": "=SUM(B4:B9)", "D10": "=SUM(D4:D9)", "F10": "=SUM(F4:F9)",
    "G10": "=SUM(G4:G9)", "H10": "=SUM(H4:H9)", "I10": "=SUM(I4:I9)",
    "A12": "Design heat loss, building", "B12": "=H10/1000", "C12": "kW",
    "A13": "Boiler output with 10 % pick-up", "B13": "=ROUND(B12*1.1,0)", "C13": "kW",
    "A14": "Boiler output, rounded for the schedule", "B14": "=ROUND(H10*1.1,0)", "C14": "kW",
    "A15": "Heat loss per floor area", "B15": "=H10/B10", "C15": "W/m²",
    "A16": "Benchmark check", "B16": "=IF(B15>80,\"HIGH\",\"OK\")",
    "A17": "Building heat-loss coefficient", "B17": "=G10/dT", "C17": "W/K",
    "A18": "Annual heating energy", "B18": "=B17*Design!C20*24/1000", "C18": "kWh",
    "A19": "Annual heating energy, GJ", "B19": "=B18*3.6/1000", "C19": "GJ",
    "A20": "Annual fuel input", "B20": "=B18/(Design!C21/100)", "C20": "kWh",
    "A21": "Peak design load, Btu/h", "B21": "=B12*3412", "C21": "Btu/h",
    "A22": "Reception ventilation loss (0.33 n V ΔT)", "B22": "=0.33*E4*D4*dT", "C22": "W",
    "A23": "Annual heating energy, fabric only", "B23": "=Fabric!F10/dT*Design!C20/1000",
    "C23": "kWh",
    "A24": "Smallest room design load", "B24": "=MIN(H4:H9)", "C24": "W",
}
for i, (h, n) in enumerate([(2700, 1.5), (2700, 2.0), (2700, 2.0), (3000, 3.0), (2700, 1.5),
                            (2400, 3.0)]):
    r = 4 + i
    ROOMS[f"A{r}"] = FABRIC[f"A{r}"]
    ROOMS[f"B{r}"] = f"=Fabric!E{r}"
    ROOMS[f"C{r}"] = h
    ROOMS[f"D{r}"] = f"=B{r}*C{r}/1000"
    ROOMS[f"E{r}"] = n
    ROOMS[f"F{r}"] = f"=Design!$C$18*E{r}*D{r}*dT"
    ROOMS[f"G{r}"] = f"=Fabric!F{r}+F{r}"
    ROOMS[f"H{r}"] = f"=G{r}*(1+Design!$C$19/100)"
    ROOMS[f"I{r}"] = f"=H{r}*3.412"
ROOMS["D6"] = "=B6*C6"                                        # planted: mm height not converted
ROOMS["F5"] = "=Design!$C$16*Design!$C$17*E5*D5*dT"           # planted: ρ·c in kJ, no /3.6
ROOMS["H7"] = "=G7*(1+Design!$C$19)"                          # planted: 10 % used as 10

# --------------------------------------------------------------------------------------------
# Book 2: water distribution demand and storage (L/s, m³/d, ML/d, gpm, m³, gal, kPa, psi)
# --------------------------------------------------------------------------------------------
DEMAND = {
    "A1": "Brackenfield new town: distribution zone demand (invented scheme)",
    "A2": "Sources: per-capita demands and peaking factors from memory (AWWA M32 style tables, "
          "common practice); 1 US gal = 3.785 L, 1 L/s = 15.85 gpm (NIST SP 811, rounded)",
    "A4": "Zone", "B4": "Population [-]", "C4": "Per-capita demand [L/d]",
    "D4": "Average day [m³/d]", "E4": "Average day [L/s]", "F4": "Average day [ML/d]",
    "G4": "Peak hour factor [-]", "H4": "Peak hour [L/s]", "I4": "Peak hour [gpm]",
    "A5": "North", "B5": 8200, "C5": 180,
    "A6": "East", "B6": 5400, "C6": 170,
    "A7": "Central", "B7": 12600, "C7": 200,
    "A8": "West", "B8": 3100, "C8": 165,
    "A9": "Industrial estate (equivalent population)", "B9": 4500, "C9": 220,
    "A10": "Total", "B10": "=SUM(B5:B9)", "D10": "=SUM(D5:D9)", "E10": "=SUM(E5:E9)",
    "F10": "=SUM(F5:F9)", "H10": "=SUM(H5:H9)", "I10": "=SUM(I5:I9)",
    "K4": "Population [-]", "L4": "Peak hour factor [-]",
    "K3": "Peaking factor table (from memory, typical of small systems)",
    "K5": 0, "L5": 3.0, "K6": 2000, "L6": 2.7, "K7": 5000, "L7": 2.5, "K8": 10000, "L8": 2.2,
    "K9": 20000, "L9": 2.0,
    "A12": "Item", "B12": "Symbol", "C12": "Value", "D12": "Unit",
    "A13": "Average day demand", "B13": "Q_ad", "C13": "=D10", "D13": "m³/d",
    "A14": "Maximum day factor", "B14": "k_md", "C14": 1.5, "D14": "-",
    "A15": "Maximum day demand", "B15": "Q_md", "C15": "=C13*C14", "D15": "m³/d",
    "A16": "Maximum day demand, ML/d", "B16": "Q_mdML", "C16": "=C15/1000", "D16": "ML/d",
    "A17": "Maximum day demand, MGD", "B17": "Q_mdUS", "C17": "=C15*264.17/1000000",
    "D17": "MGD",
    "A18": "Maximum day demand, L/s", "B18": "q_md", "C18": "=C15/86.4", "D18": "L/s",
    "A19": "Fire flow (insurer's requirement)", "B19": "q_f", "C19": 2500, "D19": "gpm",
    "A20": "Fire flow, L/s", "B20": "q_fL", "C20": "=C19/15.85", "D20": "L/s",
    "A21": "Maximum day plus fire", "B21": "q_mf", "C21": "=C18+C20", "D21": "L/s",
    "A22": "Maximum day plus fire (trunk main schedule)", "B22": "q_mf2", "C22": "=C18+C19",
    "D22": "L/s",
    "A23": "Distribution design flow", "B23": "q_d", "C23": "=MAX(H10,C21)", "D23": "L/s",
}
for r in range(5, 10):
    DEMAND[f"D{r}"] = f"=B{r}*C{r}/1000"
    DEMAND[f"E{r}"] = f"=D{r}*1000/86400"
    DEMAND[f"F{r}"] = f"=D{r}/1000"
    DEMAND[f"G{r}"] = f"=VLOOKUP(B{r},$K$5:$L$9,2,TRUE)"
    DEMAND[f"H{r}"] = f"=E{r}*G{r}"
    DEMAND[f"I{r}"] = f"=H{r}*15.85"
DEMAND["E6"] = "=D6/86.4"          # correct short form
DEMAND["E7"] = "=D7/86400"         # planted: m³/d to L/s without *1000
DEMAND["F8"] = "=D8*1000"          # planted: m³/d to ML/d the wrong way
DEMAND["I6"] = "=H6/15.85"         # planted: L/s to gpm the wrong way

STORAGE = {
    "A1": "Brackenfield new town: service reservoir sizing (invented scheme)",
    "A2": "Sources: storage = equalisation (25 % of max day, common practice) + fire (flow × "
          "duration) + emergency (8 h of average day, from memory, Ten States Standards style); "
          "1 m³ = 264.17 US gal (NIST SP 811); 1 m of water = 9.81 kPa = 1.422 psi; 1 ft of water "
          "= 0.433 psi (common practice)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Maximum day demand", "B4": "Q_md", "C4": "=Demand!C15", "D4": "m³/d",
    "A5": "Balancing period", "B5": "t_b", "C5": 24, "D5": "h",
    "A6": "Equalisation share of max day", "B6": "x_e", "C6": 25, "D6": "%",
    "A7": "Equalisation storage", "B7": "V_e", "C7": "=C4/24*C5*C6/100", "D7": "m³",
    "A8": "Fire flow", "B8": "q_f", "C8": "=Demand!C19", "D8": "gpm",
    "A9": "Fire duration", "B9": "t_f", "C9": 2, "D9": "h",
    "A10": "Fire storage, US gal", "B10": "V_fg", "C10": "=C8*C9*60", "D10": "gal",
    "A11": "Fire storage", "B11": "V_f", "C11": "=C10/264.17", "D11": "m³",
    "A12": "Fire storage (direct)", "B12": "V_f2", "C12": "=C8*C9/264.17", "D12": "m³",
    "A13": "Emergency storage period", "B13": "t_em", "C13": 8, "D13": "h",
    "A14": "Emergency storage", "B14": "V_em", "C14": "=Demand!C13*C13/24", "D14": "m³",
    "A15": "Total storage required", "B15": "V_t", "C15": "=C7+C11+C14", "D15": "m³",
    "A16": "Total storage, US gal", "B16": "V_tg", "C16": "=C15*264.17", "D16": "gal",
    "A17": "Total storage, ML", "B17": "V_tML", "C17": "=C15/1000", "D17": "ML",
    "A18": "Nominal reservoir volume (next 250 m³)", "B18": "V_n",
    "C18": "=ROUND(C15/250+0.5,0)*250", "D18": "m³",
    "A19": "Reservoir inside diameter", "B19": "D", "C19": 24, "D19": "m",
    "A20": "Reservoir water depth", "B20": "h", "C20": "=C18/(PI()*C19^2/4)", "D20": "m",
    "A21": "Reservoir diameter, ft", "B21": "D_ft", "C21": "=C19/0.3048", "D21": "ft",
    "A22": "Static head at lowest connection", "B22": "H_s", "C22": 46, "D22": "m",
    "A23": "Static pressure at lowest connection", "B23": "p_s", "C23": "=C22*9.81",
    "D23": "kPa",
    "A24": "Static pressure, psi", "B24": "p_sI", "C24": "=C22*1.422", "D24": "psi",
    "A25": "Static pressure, psi (field sheet)", "B25": "p_sI2", "C25": "=C22*0.433",
    "D25": "psi",
    "A26": "Water density", "B26": "rho", "C26": 1000, "D26": "kg/m³",
    "A27": "Gravity", "B27": "g", "C27": 9.81, "D27": "m/s²",
    "A28": "Static pressure from ρgh", "B28": "p_r", "C28": "=C26*C27*C22/1000", "D28": "kPa",
    "A29": "Static pressure from ρh", "B29": "p_r2", "C29": "=C26*C22/1000", "D29": "kPa",
    "A30": "Minimum service pressure", "B30": "p_min", "C30": 280, "D30": "kPa",
    "A31": "Pressure check", "B31": "flag", "C31": "=IF(C28>=C30,\"OK\",\"LOW\")",
    "A32": "Nominal reservoir volume, US gal", "B32": "V_ng", "C32": "=C18/264.17",
    "D32": "gal",
    "A33": "Equalisation storage (as first issued)", "B33": "V_e2", "C33": "=C4/24*C5*C6",
    "D33": "m³",
}

# --------------------------------------------------------------------------------------------
# Book 3: pumping station power and electricity bill (kW, kWh, m, %, kVA, pence, GBP)
# --------------------------------------------------------------------------------------------
PUMPS = {
    "A1": "Low Moss booster station: duty pump power (invented station)",
    "A2": "Sources: P = ρ·g·Q·H/η (hydraulic power, fluid mechanics textbooks); bhp = Q[gpm]·"
          "H[ft]/(3960·η) (Hydraulic Institute, common practice); 1 hp = 0.7457 kW (NIST SP 811); "
          "2.725 kWh lifts 1 ML through 1 m (ρg/3.6e6, common practice)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Duty flow", "B4": "Q", "C4": 85, "D4": "L/s",
    "A5": "Suction pressure (panel gauge)", "B5": "p_s", "C5": 35, "D5": "kPa(g)",
    "A6": "Discharge pressure (panel gauge)", "B6": "p_d", "C6": 520, "D6": "kPa(g)",
    "A7": "Suction pressure (telemetry, absolute transducer)", "B7": "p_sa", "C7": 136,
    "D7": "kPa",
    "A8": "Water density", "B8": "rho", "C8": 999, "D8": "kg/m³",
    "A9": "Gravity", "B9": "g", "C9": 9.81, "D9": "m/s²",
    "A10": "Total head", "B10": "H", "C10": "=(C6-C5)*1000/(C8*C9)", "D10": "m",
    "A11": "Total head (telemetry)", "B11": "H_t", "C11": "=(C6-C7)*1000/(C8*C9)", "D11": "m",
    "A12": "Total head, ft", "B12": "H_ft", "C12": "=C10/0.3048", "D12": "ft",
    "A13": "Pump efficiency at duty", "B13": "eta_p", "C13": 78, "D13": "%",
    "A14": "Motor efficiency (IE3)", "B14": "eta_m", "C14": 94.5, "D14": "%",
    "A15": "Hydraulic power", "B15": "P_h", "C15": "=C8*C9*C4*C10/1000000", "D15": "kW",
    "A16": "Shaft power", "B16": "P_s", "C16": "=C15/(C13/100)", "D16": "kW",
    "A17": "Shaft power (datasheet check)", "B17": "P_s2", "C17": "=C15/C13", "D17": "kW",
    "A18": "Electrical input", "B18": "P_e", "C18": "=C16/(C14/100)", "D18": "kW",
    "A19": "Duty flow, gpm", "B19": "Q_gpm", "C19": "=C4*15.85", "D19": "gpm",
    "A20": "Brake horsepower", "B20": "bhp", "C20": "=C19*C12/(3960*C13/100)", "D20": "hp",
    "A21": "Brake power, kW", "B21": "P_b", "C21": "=C20*0.7457", "D21": "kW",
    "A22": "Brake power, kW (vendor sheet)", "B22": "P_b2", "C22": "=C20/0.7457", "D22": "kW",
    "A23": "Control panel, ventilation and lighting", "B23": "P_aux", "C23": 1800, "D23": "W",
    "A24": "Station load", "B24": "P_st", "C24": "=C18+C23/1000", "D24": "kW",
    "A25": "Station load (first issue)", "B25": "P_st2", "C25": "=C18+C23", "D25": "kW",
    "A26": "Wire-to-water efficiency", "B26": "eta_ww", "C26": "=C15/C18*100", "D26": "%",
    "A27": "Specific energy, theoretical", "B27": "e_th", "C27": "=2.725*C10/(C26/100)",
    "D27": "kWh/ML",
    "A28": "Power factor", "B28": "pf", "C28": 0.88, "D28": "-",
    "A29": "Apparent power", "B29": "S", "C29": "=C24/C28", "D29": "kVA",
    "A30": "Motor rating selected", "B30": "P_m", "C30": "=IF(C18<=55,55,75)", "D30": "kW",
}
BILL = {
    "A1": "Low Moss booster station: energy and electricity bill, January to June (invented tariff)",
    "A2": "Sources: energy = station load × run hours; bill = units × unit rate + standing "
          "charge + capacity charge (supplier's tariff, invented); 1 ML = 10⁶ L (SI Brochure)",
    "A4": "Month", "B4": "Volume pumped [ML]", "C4": "Run hours [h]", "D4": "Energy [kWh]",
    "E4": "Specific energy [kWh/ML]", "F4": "Energy charge [GBP]",
    "A5": "January", "B5": 198, "A6": "February", "B6": 184, "A7": "March", "B7": 205,
    "A8": "April", "B8": 214, "A9": "May", "B9": 236, "A10": "June", "B10": 251,
    "A11": "Total", "B11": "=SUM(B5:B10)", "C11": "=SUM(C5:C10)", "D11": "=SUM(D5:D10)",
    "E11": "=D11/B11", "F11": "=SUM(F5:F10)",
    "A12": "Monthly mean", "E12": "=AVERAGE(E5:E10)", "D12": "=AVERAGE(D5:D10)",
    "A14": "Unit rate", "B14": 14.6, "C14": "pence/kWh",
    "A15": "Standing charge", "B15": 0.85, "C15": "GBP/d",
    "A16": "Days in period", "B16": 181, "C16": "d",
    "A17": "Standing charges", "B17": "=B15*B16", "C17": "GBP",
    "A18": "Maximum demand (metered)", "B18": 112, "C18": "kVA",
    "A19": "Capacity charge rate", "B19": 0.072, "C19": "GBP/(kVA·d)",
    "A20": "Capacity charges", "B20": "=B18*B19*B16", "C20": "GBP",
    "A21": "Total bill", "B21": "=F11+B17+B20", "C21": "GBP",
    "A22": "Total bill (budget sheet)", "B22": "=F11+B17+B18*B19", "C22": "GBP",
    "A23": "Cost per ML pumped", "B23": "=B21/B11", "C23": "GBP/ML",
    "A24": "Average price paid", "B24": "=B21/D11", "C24": "pence/kWh",
    "A25": "Average price paid (checked)", "B25": "=B21/D11*100", "C25": "pence/kWh",
    "A26": "Maximum demand against installed load", "B26": "=B18*Pumps!C28/Pumps!C24*100",
    "C26": "%",
}
for r in range(5, 11):
    BILL[f"C{r}"] = f"=B{r}*1000000/(Pumps!$C$4*3600)"
    BILL[f"D{r}"] = f"=C{r}*Pumps!$C$24"
    BILL[f"E{r}"] = f"=D{r}/B{r}"
    BILL[f"F{r}"] = f"=D{r}*$B$14/100"
BILL["C8"] = "=B8*1000/(Pumps!$C$4*3600)"    # planted: ML taken as 1000 L
BILL["F9"] = "=D9*$B$14"                     # planted: pence/kWh × kWh into GBP, no /100

# --------------------------------------------------------------------------------------------
# Book 4: chlorine dosing and contact tank (mg/L, kg/d, lb/d, L/h, CT mg·min/L)
# --------------------------------------------------------------------------------------------
DOSING = {
    "A1": "Harrow Fell WTW: chlorine dosing (invented works)",
    "A2": "Sources: kg/d = mg/L × ML/d (1 mg/L in 1 ML is 1 kg, common practice); lb/d = mg/L "
          "× MGD × 8.34 (pounds formula, US operator practice); 1 US gal = 3.785 L, 1 kg = "
          "2.2046 lb (NIST SP 811); hypochlorite 12.5 % available chlorine, density 1.2 kg/L "
          "(supplier's data, from memory)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Plant flow (maximum)", "B4": "Q", "C4": 18, "D4": "ML/d",
    "A5": "Plant flow, MGD", "B5": "Q_US", "C5": "=C4/3.785", "D5": "MGD",
    "A6": "Plant flow, m³/h", "B6": "Q_h", "C6": "=C4*1000/24", "D6": "m³/h",
    "A7": "Plant flow, L/s", "B7": "Q_s", "C7": "=C4*1000000/86400", "D7": "L/s",
    "A8": "Chlorine demand", "B8": "D_c", "C8": 1.4, "D8": "mg/L",
    "A9": "Target free chlorine residual", "B9": "C_r", "C9": 1.0, "D9": "mg/L",
    "A10": "Chlorine dose", "B10": "d", "C10": "=C8+C9", "D10": "mg/L",
    "A11": "Chlorine required", "B11": "M", "C11": "=C10*C4", "D11": "kg/d",
    "A12": "Chlorine required, lb/d", "B12": "M_lb", "C12": "=C10*C5*8.34", "D12": "lb/d",
    "A13": "Chlorine required, lb/d (operator's sheet)", "B13": "M_lb2", "C13": "=C10*C4*8.34",
    "D13": "lb/d",
    "A14": "Chlorine required (from hourly flow)", "B14": "M_h", "C14": "=C10*C6*24",
    "D14": "kg/d",
    "A15": "Chlorine required, lb/d from kg/d", "B15": "M_lb3", "C15": "=C11*2.2046",
    "D15": "lb/d",
    "A16": "Hypochlorite available chlorine", "B16": "x_h", "C16": 12.5, "D16": "%",
    "A17": "Hypochlorite density", "B17": "rho_h", "C17": 1.2, "D17": "kg/L",
    "A18": "Hypochlorite feed rate", "B18": "q_h", "C18": "=C11/(C16/100)/C17/24", "D18": "L/h",
    "A19": "Hypochlorite feed rate (pump setting)", "B19": "q_h2", "C19": "=C11/C16/C17/24",
    "D19": "L/h",
    "A20": "Hypochlorite use", "B20": "q_d", "C20": "=C18*24", "D20": "L/d",
    "A21": "Hypochlorite use, US gal/d", "B21": "q_g", "C21": "=C20/3.785", "D21": "gal/d",
    "A22": "Hypochlorite use, US gal/d (order form)", "B22": "q_g2", "C22": "=C20*3.785",
    "D22": "gal/d",
    "A23": "Bulk tank capacity", "B23": "V_b", "C23": 30, "D23": "m³",
    "A24": "Days of storage", "B24": "t_s", "C24": "=C23*1000/C20", "D24": "d",
    "A25": "Days of storage (delivery plan)", "B25": "t_s2", "C25": "=C23/C20", "D25": "d",
    "A26": "Storage check (30 d minimum, common practice)", "B26": "flag",
    "C26": "=IF(C24>=30,\"OK\",\"SHORT\")",
}
CONTACT = {
    "A1": "Harrow Fell WTW: contact tank CT (invented works)",
    "A2": "Sources: CT = C × T10, T10 = BF × V/Q (US EPA Disinfection Profiling and "
          "Benchmarking Guidance Manual); required CT for 3-log Giardia with free chlorine at "
          "pH 7, 1.0 mg/L: from memory of the EPA CT tables, approximate, verify before use",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Tank length", "B4": "L", "C4": 32, "D4": "m",
    "A5": "Tank width", "B5": "W", "C5": 12, "D5": "m",
    "A6": "Minimum water depth", "B6": "h", "C6": 3200, "D6": "mm",
    "A7": "Contact volume", "B7": "V", "C7": "=C4*C5*C6/1000", "D7": "m³",
    "A8": "Contact volume (GA drawing check)", "B8": "V2", "C8": "=C4*C5*C6", "D8": "m³",
    "A9": "Baffle factor (superior baffling)", "B9": "BF", "C9": 0.5, "D9": "-",
    "A10": "Peak hour factor", "B10": "k_p", "C10": 1.3, "D10": "-",
    "A11": "Peak hourly flow", "B11": "Q_p", "C11": "=Dosing!C7*C10", "D11": "L/s",
    "A12": "T10 at peak flow", "B12": "T10", "C12": "=C7*C9/(C11/1000)/60", "D12": "min",
    "A13": "T10 at peak flow (tracer report)", "B13": "T10b", "C13": "=C7*C9/C11/60",
    "D13": "min",
    "A14": "T10, seconds", "B14": "T10s", "C14": "=C12*60", "D14": "s",
    "A15": "Free chlorine residual at outlet", "B15": "C", "C15": "=Dosing!C9", "D15": "mg/L",
    "A16": "CT achieved", "B16": "CT", "C16": "=C15*C12", "D16": "mg·min/L",
    "A17": "CT achieved (SCADA)", "B17": "CT2", "C17": "=C15*C14", "D17": "mg·min/L",
    "A18": "Winter water temperature", "B18": "T_F", "C18": 41, "D18": "°F",
    "A19": "Winter water temperature, °C", "B19": "T_C", "C19": "=(C18-32)/1.8", "D19": "°C",
    "A20": "Winter water temperature, °C (lab sheet)", "B20": "T_C2", "C20": "=(C18-32)*1.8",
    "D20": "°C",
    "A21": "CT required, 3-log Giardia", "B21": "CT_req",
    "C21": "=VLOOKUP(C19,$A$28:$B$33,2,TRUE)", "D21": "mg·min/L",
    "A22": "CT ratio", "B22": "r_CT", "C22": "=C16/C21", "D22": "-",
    "A23": "Giardia log inactivation achieved", "B23": "LI", "C23": "=3*C22", "D23": "-",
    "A24": "CT check", "B24": "flag", "C24": "=IF(C22>=1,\"PASS\",\"FAIL\")",
    "A25": "Contact time at average flow", "B25": "t_a",
    "C25": "=C7*C9/(Dosing!C7/1000)/60", "D25": "min",
    "A26": "CT table (free chlorine, pH 7, 1.0 mg/L, 3-log Giardia; from memory, approximate)",
    "A27": "Temperature [°C]", "B27": "CT required [mg·min/L]",
    "A28": 0.5, "B28": 149, "A29": 5, "B29": 105, "A30": 10, "B30": 79, "A31": 15, "B31": 53,
    "A32": 20, "B32": 39, "A33": 25, "B33": 26,
}

BOOKS = {
    "heat-loss-schedule": {
        "trade": "building services: heat-loss schedule room by room",
        "sheets": [("Design", DESIGN), ("Fabric", FABRIC), ("Rooms", ROOMS)],
        "names": {"Uw": ("Design", "$C$10"), "Ur": ("Design", "$C$11"),
                  "Ug": ("Design", "$C$12"), "Uf": ("Design", "$C$13"),
                  "dT": ("Design", "$C$6")},
        "sidecar": "# Air changes per hour, as the schedule writes them (common practice)\n"
                   "measure ach = 1 1/h \"air changes per hour\"\n",
        "planted": {
            "Design!C9": ("offset-scale", "°C × 1.8 into °F without + 32"),
            "Design!C15": ("unit-scale", "W/(m²·K) to Btu/(h·ft²·°F) divided by 0.1761"),
            "Fabric!F7": ("offset-scale", "U·A times the inside temperature in °C, not ΔT"),
            "Fabric!G8": ("unit-scale", "W to kW multiplied by 1000"),
            "Rooms!D6": ("unit-scale", "m² × ceiling height in mm with no /1000"),
            "Rooms!F5": ("unit-scale", "ρ·c in kJ/(m³·K) × ach × V × ΔT: kJ/h into W, no /3.6"),
            "Rooms!H7": ("unit-scale", "10 % margin used as 10: × (1 + 10)"),
            "Rooms!B14": ("unit-scale", "ROUND of the W total into a kW cell"),
            "Rooms!B23": ("unit-scale", "degree-day energy with no × 24 h/d"),
        },
        "conversions": {
            "Design!C6": "°C − °C = K", "Design!C7": "K × 1.8 = Δ°F",
            "Design!C8": "°C × 1.8 + 32 = °F", "Design!C14": "W/(m²·K) × 0.1761",
            "Design!C18": "kg/m³ × kJ/(kg·K) × 1000/3600 = W·h/(m³·K)",
            "Fabric!G4": "W / 1000 = kW", "Rooms!D4": "m² × mm / 1000 = m³",
            "Rooms!F4": "W·h/(m³·K) × ach × m³ × K = W", "Rooms!I4": "W × 3.412 = Btu/h",
            "Rooms!B12": "W / 1000 = kW", "Rooms!B18": "W/K × K·d × 24 / 1000 = kWh",
            "Rooms!B19": "kWh × 3.6 / 1000 = GJ", "Rooms!B21": "kW × 3412 = Btu/h",
            "Rooms!B22": "0.33 × ach × m³ × K = W (CIBSE short form)",
        },
    },
    "water-demand-storage": {
        "trade": "water supply: distribution demand and service reservoir storage",
        "sheets": [("Demand", DEMAND), ("Storage", STORAGE)],
        "names": {},
        "planted": {
            "Demand!E7": ("unit-scale", "m³/d / 86400 into L/s: no × 1000"),
            "Demand!F8": ("unit-scale", "m³/d to ML/d multiplied by 1000"),
            "Demand!I6": ("unit-scale", "L/s to gpm divided by 15.85"),
            "Demand!C22": ("unit-scale", "L/s plus a fire flow in gpm"),
            "Storage!C12": ("unit-scale", "gpm × h / 264.17: no × 60 min/h"),
            "Storage!C25": ("result-unit", "0.433 psi per foot applied to metres"),
            "Storage!C29": ("result-unit", "ρ·h without g into kPa"),
            "Storage!C32": ("unit-scale", "m³ to US gal divided by 264.17"),
            "Storage!C33": ("unit-scale", "25 % used as 25"),
        },
        "conversions": {
            "Demand!D5": "person × L/d / 1000 = m³/d", "Demand!E5": "m³/d × 1000/86400 = L/s",
            "Demand!E6": "m³/d / 86.4 = L/s", "Demand!F5": "m³/d / 1000 = ML/d",
            "Demand!I5": "L/s × 15.85 = gpm", "Demand!C17": "m³/d × 264.17 / 10⁶ = MGD",
            "Demand!C18": "m³/d / 86.4 = L/s", "Demand!C20": "gpm / 15.85 = L/s",
            "Storage!C7": "m³/d / 24 × h × % / 100 = m³", "Storage!C10": "gpm × h × 60 = gal",
            "Storage!C11": "gal / 264.17 = m³", "Storage!C16": "m³ × 264.17 = gal",
            "Storage!C17": "m³ / 1000 = ML", "Storage!C21": "m / 0.3048 = ft",
            "Storage!C23": "m of water × 9.81 = kPa", "Storage!C24": "m of water × 1.422 = psi",
            "Storage!C28": "ρ g h / 1000 = kPa",
        },
    },
    "pump-station-energy": {
        "trade": "water pumping: station power and electricity bill",
        "sheets": [("Pumps", PUMPS), ("Bill", BILL)],
        "names": {},
        "sidecar": "# Money, which has no dimension: the pound as a pure number and the penny\n"
                   "measure GBP = 1 1 \"pound sterling\"\n"
                   "measure pence = 0.01 GBP \"penny\"\n",
        "planted": {
            "Pumps!C11": ("offset-scale", "gauge discharge minus absolute suction pressure"),
            "Pumps!C17": ("unit-scale", "78 % efficiency used as 78"),
            "Pumps!C22": ("unit-scale", "hp to kW divided by 0.7457"),
            "Pumps!C25": ("unit-scale", "kW plus auxiliary load in W"),
            "Bill!C8": ("unit-scale", "ML × 1000 taken as litres: run hours 1000 too small"),
            "Bill!F9": ("unit-scale", "kWh × pence/kWh into GBP without /100"),
            "Bill!B22": ("sum-mismatch", "capacity charge missing the days: GBP/d added to GBP"),
            "Bill!B24": ("unit-scale", "GBP/kWh written as pence/kWh: no × 100"),
        },
        "conversions": {
            "Pumps!C10": "kPa(g) − kPa(g) × 1000/(ρ g) = m", "Pumps!C12": "m / 0.3048 = ft",
            "Pumps!C15": "kg/m³ × m/s² × L/s × m / 10⁶ = kW",
            "Pumps!C16": "kW / (%/100)", "Pumps!C19": "L/s × 15.85 = gpm",
            "Pumps!C20": "gpm × ft / (3960 η) = hp", "Pumps!C21": "hp × 0.7457 = kW",
            "Pumps!C24": "kW + W/1000", "Pumps!C27": "2.725 kWh/(ML·m) × m / η = kWh/ML",
            "Bill!C5": "ML × 10⁶ / (L/s × 3600) = h", "Bill!D5": "h × kW = kWh",
            "Bill!F5": "kWh × pence/kWh / 100 = GBP", "Bill!B25": "GBP/kWh × 100 = pence/kWh",
        },
    },
    "chlorine-contact": {
        "trade": "water treatment: chlorine dosing and contact tank CT",
        "sheets": [("Dosing", DOSING), ("Contact", CONTACT)],
        "names": {},
        "planted": {
            "Dosing!C13": ("unit-scale", "pounds formula 8.34 with ML/d instead of MGD"),
            "Dosing!C14": ("unit-scale", "mg/L × m³/d gives g/d, written kg/d"),
            "Dosing!C19": ("unit-scale", "12.5 % used as 12.5"),
            "Dosing!C22": ("unit-scale", "L/d to US gal/d multiplied by 3.785"),
            "Dosing!C25": ("unit-scale", "m³ / (L/d) without × 1000"),
            "Contact!C8": ("unit-scale", "depth in mm times m × m into m³"),
            "Contact!C13": ("unit-scale", "m³ / (L/s) without × 1000"),
            "Contact!C17": ("unit-scale", "CT from T10 in seconds into mg·min/L"),
            "Contact!C20": ("unit-scale", "°F to °C multiplied by 1.8 instead of divided"),
        },
        "conversions": {
            "Dosing!C5": "ML/d / 3.785 = MGD", "Dosing!C6": "ML/d × 1000/24 = m³/h",
            "Dosing!C7": "ML/d × 10⁶/86400 = L/s", "Dosing!C11": "mg/L × ML/d = kg/d",
            "Dosing!C12": "mg/L × MGD × 8.34 = lb/d", "Dosing!C15": "kg/d × 2.2046 = lb/d",
            "Dosing!C18": "kg/d / (%/100) / (kg/L) / 24 = L/h", "Dosing!C21": "L/d / 3.785 = gal/d",
            "Dosing!C24": "m³ × 1000 / (L/d) = d", "Contact!C7": "m × m × mm / 1000 = m³",
            "Contact!C12": "m³ / (L/s / 1000) / 60 = min", "Contact!C14": "min × 60 = s",
            "Contact!C16": "mg/L × min", "Contact!C19": "(°F − 32)/1.8 = °C",
            "Contact!C25": "m³ / (L/s / 1000) / 60 = min",
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
