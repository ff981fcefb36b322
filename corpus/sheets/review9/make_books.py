#!/usr/bin/env python3
"""Four review workbooks for plumb's workbook checking (review36), written with the standard
zipfile module (xlsx_writer.py, copied from corpus/sheets/review2 and extended).

Trades: a natural gas fuel line and regulator station; a swimming pool hall dehumidification
design; a stormwater detention basin; an electric motor and VFD schedule. All firms, sites and
data are invented for the review.

Every formula cell is either a planted mistake (PLANTED, with the rule expected and what the
mistake is) or a correct cell that must stay clean.

Run: python3 make_books.py  ->  <book>.xlsx, <book>.expect, expect.json in this folder
"""
import json
import os

from xlsx_writer import write_xlsx

HERE = os.path.dirname(os.path.abspath(__file__))

# ============================================================================================
# Book 1: natural gas supply to a bakery oven line: burners, pipe, regulator station
# ============================================================================================
BURNERS = {
    "A1": "Harlow Gate Bakery, oven line 2: gas burner schedule (Penrose Mechanical Ltd, invented)",
    "A2": "Sources: 1 kW = 3412.14 Btu/h (NIST SP 811, rounded 3412); gas flow = input × 3.6 / CV "
          "(common practice); 1 Nm³ (0 °C, 101.325 kPa) = 37.33 scf (60 °F, 14.696 psia) "
          "(common practice); CV 40.2 MJ/Nm³ and HHV 1020 Btu/scf of natural gas (from memory); "
          "1 therm = 29.31 kWh (NIST SP 811)",
    "A4": "Burner", "B4": "Input [kW]", "C4": "Input [Btu/h]", "D4": "Gas flow [Nm³/h]",
    "E4": "Gas flow [scfh]", "F4": "Gas flow by HHV [scfh]",
    "A5": "Oven zone 1", "B5": 180,
    "A6": "Oven zone 2", "B6": 180,
    "A7": "Oven zone 3", "B7": 150,
    "A8": "Oven zone 4", "B8": 150,
    "A9": "Prover heater", "B9": 45,
    "A10": "Fryer", "B10": 120,
    "A11": "Total",
    "B11": "=SUM(B5:B10)", "C11": "=SUM(C5:C10)", "D11": "=SUM(D5:D10)",
    "E11": "=SUM(E5:E10)", "F11": "=SUM(F5:F10)",
    "A13": "Item", "B13": "Symbol", "C13": "Value", "D13": "Unit",
    "A14": "Gross calorific value", "B14": "CV", "C14": 40.2, "D14": "MJ/Nm³",
    "A15": "Gross heating value per standard cubic foot", "B15": "HHV", "C15": 1020,
    "D15": "Btu/scf",
    "A16": "Pilot burners, all", "B16": "P_pil", "C16": 1500, "D16": "W",
    "A17": "Connected load incl. pilots", "B17": "P_c", "C17": "=B11+C16/1000", "D17": "kW",
    "A18": "Connected load incl. pilots (check copy)", "B18": "P_cx", "C18": "=B11+C16",
    "D18": "kW",
    "A19": "Diversity factor", "B19": "k_d", "C19": 0.85, "D19": "-",
    "A20": "Design load", "B20": "P_d", "C20": "=C17*C19", "D20": "kW",
    "A21": "Design gas flow", "B21": "Q_n", "C21": "=C20*3.6/GrossCV", "D21": "Nm³/h",
    "A22": "Design gas flow, scfh", "B22": "Q_s", "C22": "=C21*37.33", "D22": "scfh",
    "A23": "Design load, MBH", "B23": "P_MBH", "C23": "=C20*3412/1000", "D23": "MBH",
    "A24": "Operating hours per year", "B24": "t_a", "C24": 4200, "D24": "h",
    "A25": "Annual gas energy", "B25": "E_a", "C25": "=C20*C24", "D25": "kWh",
    "A26": "Annual gas energy, therms", "B26": "E_th", "C26": "=C25/29.31", "D26": "therm",
    "A27": "Annual gas volume", "B27": "V_a", "C27": "=C21*C24", "D27": "Nm³",
}
for r in range(5, 11):
    BURNERS[f"C{r}"] = f"=B{r}*3412"
    BURNERS[f"D{r}"] = f"=B{r}*3.6/$C$14"
    BURNERS[f"E{r}"] = f"=D{r}*37.33"
    BURNERS[f"F{r}"] = f"=C{r}/$C$15"
BURNERS["C7"] = "=B7/3412"          # planted: kW to Btu/h the wrong way round
BURNERS["D8"] = "=B8*3600/$C$14"    # planted: kW*3600 gives kJ/h, over MJ/Nm³: 1000x
BURNERS["E9"] = "=D9*35.31"         # planted: Nm³ to ft³ by volume alone, not to scf

LINE = {
    "A1": "Harlow Gate Bakery: gas line from regulator to oven manifold (invented)",
    "A2": "Sources: Darcy-Weisbach and the Swamee-Jain friction factor (White, Fluid Mechanics); "
          "ρ = p·M/(Z·R·T), R = 8.314 J/(mol·K) (CODATA); M, Z and viscosity of natural gas "
          "(from memory); DN65 Sch 40 bore 62.7 mm (ASME B36.10); 1 inH2O = 249.09 Pa "
          "(NIST SP 811); 1 psi = 6.895 kPa (NIST SP 811); allowable drop 10 % of supply "
          "pressure (common practice)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Regulated supply pressure", "B4": "p_g", "C4": 100, "D4": "mbar(g)",
    "A5": "Atmospheric pressure at site", "B5": "p_atm", "C5": 1005, "D5": "mbar",
    "A6": "Absolute line pressure", "B6": "p_a", "C6": "=C4+C5", "D6": "mbar",
    "A7": "Absolute line pressure, Pa", "B7": "p_Pa", "C7": "=C6*100", "D7": "Pa",
    "A8": "Gas temperature", "B8": "T_g", "C8": 10, "D8": "°C",
    "A9": "Gas temperature, absolute", "B9": "T_K", "C9": "=C8+273.15", "D9": "K",
    "A10": "Molar mass of natural gas", "B10": "M", "C10": 17.4, "D10": "g/mol",
    "A11": "Molar gas constant", "B11": "R", "C11": 8.314, "D11": "J/(mol·K)",
    "A12": "Compressibility factor", "B12": "Z", "C12": 0.998, "D12": "-",
    "A13": "Gas density at line conditions", "B13": "rho", "C13": "=C7*C10/1000/(C12*C11*C9)",
    "D13": "kg/m³",
    "A14": "Gas density at line conditions (check copy)", "B14": "rho_x",
    "C14": "=C4*100*C10/1000/(C12*C11*C9)", "D14": "kg/m³",
    "A15": "Normal reference pressure", "B15": "p_n", "C15": 1013.25, "D15": "mbar",
    "A16": "Normal reference temperature", "B16": "T_n", "C16": 273.15, "D16": "K",
    "A17": "Design gas flow, normal", "B17": "Q_n", "C17": "=Burners!C21", "D17": "Nm³/h",
    "A18": "Actual flow at line conditions", "B18": "Q_a", "C18": "=C17*(C15/C6)*(C9/C16)",
    "D18": "m³/h",
    "A19": "Actual flow, m³/s", "B19": "Q", "C19": "=C18/3600", "D19": "m³/s",
    "A20": "Pipe bore, DN65 Sch 40", "B20": "D", "C20": 62.7, "D20": "mm",
    "A21": "Bore area", "B21": "A", "C21": "=PI()*(C20/1000)^2/4", "D21": "m²",
    "A22": "Gas velocity", "B22": "v", "C22": "=C19/C21", "D22": "m/s",
    "A23": "Dynamic viscosity", "B23": "mu", "C23": 0.0000108, "D23": "Pa·s",
    "A24": "Reynolds number", "B24": "Re", "C24": "=C13*C22*(C20/1000)/C23", "D24": "-",
    "A25": "Pipe roughness, commercial steel", "B25": "eps", "C25": 0.045, "D25": "mm",
    "A26": "Friction factor (Swamee-Jain)", "B26": "f",
    "C26": "=0.25/LOG10(C25/(3.7*C20)+5.74/C24^0.9)^2", "D26": "-",
    "A27": "Equivalent length incl. fittings", "B27": "L", "C27": 85, "D27": "m",
    "A28": "Pressure drop", "B28": "dp", "C28": "=C26*C27/(C20/1000)*C13*C22^2/2", "D28": "Pa",
    "A29": "Pressure drop, mbar", "B29": "dp_mb", "C29": "=C28/100", "D29": "mbar",
    "A30": "Pressure drop, inH2O", "B30": "dp_wc", "C30": "=C28/249.09", "D30": "inH2O",
    "A31": "Pressure drop, psi", "B31": "dp_psi", "C31": "=C28/1000*6.895", "D31": "psi",
    "A32": "Allowable pressure drop (10 % of supply)", "B32": "dp_al", "C32": "=C4*10/100",
    "D32": "mbar",
    "A33": "Line check", "B33": "chk", "C33": "=IF(C29<=C32,\"OK\",\"RESIZE\")",
    "A34": "Velocity check (20 m/s limit)", "B34": "chk_v",
    "C34": "=IF(C22<=20,\"OK\",\"HIGH VELOCITY\")",
}

STATION = {
    "A1": "Harlow Gate Bakery: district regulator station RS-2 (invented)",
    "A2": "Sources: 1 bar = 14.5038 psi (NIST SP 811, rounded 14.5); standard atmosphere "
          "1.01325 bar = 14.696 psi (NIST SP 811), site barometer from sheet Line; critical pressure ratio (2/(k+1))^(k/(k-1)) "
          "(any gas dynamics text); Joule-Thomson cooling of natural gas about 0.5 K per bar "
          "(from memory); relief valve set at 110 % of downstream MOP (common practice); station "
          "sized for 125 % of design flow (common practice)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Inlet pressure", "B4": "p1", "C4": 2.0, "D4": "bar(g)",
    "A5": "Inlet pressure, psig", "B5": "p1_psig", "C5": "=C4*14.5", "D5": "psig",
    "A6": "Inlet pressure, absolute", "B6": "p1_psia", "C6": "=C5+14.7", "D6": "psia",
    "A7": "Inlet pressure, absolute (check copy)", "B7": "p1_x", "C7": "=C4+14.7", "D7": "psia",
    "A8": "Outlet set pressure", "B8": "p2", "C8": "=Line!C4", "D8": "mbar(g)",
    "A9": "Outlet set pressure, bar(g)", "B9": "p2_bar", "C9": "=C8/1000", "D9": "bar(g)",
    "A10": "Absolute pressure ratio across regulator", "B10": "r",
    "C10": "=(C9+Line!C5/1000)/(C4+Line!C5/1000)", "D10": "-",
    "A11": "Isentropic exponent of natural gas", "B11": "k", "C11": 1.31, "D11": "-",
    "A12": "Critical pressure ratio", "B12": "r_c", "C12": "=(2/(C11+1))^(C11/(C11-1))",
    "D12": "-",
    "A13": "Flow regime", "B13": "regime", "C13": "=IF(C10<C12,\"CRITICAL\",\"SUBCRITICAL\")",
    "A14": "Pressure drop across regulator", "B14": "dp_r", "C14": "=C4-C9", "D14": "bar",
    "A15": "Pressure drop across regulator (check copy)", "B15": "dp_rx", "C15": "=C4-C8",
    "D15": "bar",
    "A16": "Joule-Thomson coefficient", "B16": "mu_JT", "C16": 0.5, "D16": "K/bar",
    "A17": "Inlet gas temperature", "B17": "T1", "C17": 8, "D17": "°C",
    "A18": "Outlet gas temperature", "B18": "T2", "C18": "=C17-C16*C14", "D18": "°C",
    "A19": "Outlet gas temperature, °F", "B19": "T2_F", "C19": "=C18*1.8+32", "D19": "°F",
    "A20": "Temperature drop across regulator, °F", "B20": "dT_F", "C20": "=C16*C14*1.8+32",
    "D20": "Δ°F",
    "A21": "Preheat check", "B21": "chk_T", "C21": "=IF(C18<0,\"PREHEAT\",\"OK\")",
    "A22": "Station design flow (125 %)", "B22": "Q_st", "C22": "=Burners!C21*1.25",
    "D22": "Nm³/h",
    "A23": "Station design flow, scfh", "B23": "Q_st_s", "C23": "=C22*37.33", "D23": "scfh",
    "A24": "Downstream maximum operating pressure", "B24": "MOP", "C24": 150, "D24": "mbar(g)",
    "A25": "Relief valve set pressure", "B25": "p_set", "C25": "=C24*1.1", "D25": "mbar(g)",
    "A26": "Relief valve set pressure, psig", "B26": "p_set_psig", "C26": "=C25/1000*14.5",
    "D26": "psig",
}

# ============================================================================================
# Book 2: a pool hall's dehumidification: evaporation, latent load, air flow
# ============================================================================================
CONDITIONS = {
    "A1": "Ashcombe Leisure Centre, pool hall refurbishment: design conditions "
          "(Fenwick & Dale Building Services, invented)",
    "A2": "Sources: saturation pressure by the Magnus formula, coefficients of Alduchov & "
          "Eskridge (1996); W = 0.622·pw/(p − pw) (ASHRAE Handbook Fundamentals, psychrometrics); "
          "air 1-2 K above water, 60 % RH (common practice for pool halls); °F = °C × 1.8 + 32 "
          "(NIST SP 811); 7000 grains per pound (NIST SP 811); R of dry air 287.05 J/(kg·K) "
          "(ASHRAE Handbook Fundamentals)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Hall air temperature", "B4": "T_a", "C4": 30, "D4": "°C",
    "A5": "Hall air temperature, °F", "B5": "T_aF", "C5": "=C4*1.8+32", "D5": "°F",
    "A6": "Hall relative humidity", "B6": "RH", "C6": 60, "D6": "%",
    "A7": "Atmospheric pressure", "B7": "p", "C7": 101.325, "D7": "kPa",
    "A8": "Saturation pressure at hall air temperature", "B8": "p_ws",
    "C8": "=0.61094*EXP(17.625*C4/(C4+243.04))", "D8": "kPa",
    "A9": "Vapour pressure of hall air", "B9": "p_v", "C9": "=C6/100*C8", "D9": "kPa",
    "A10": "Vapour pressure of hall air (check copy)", "B10": "p_vx", "C10": "=C6*C8",
    "D10": "kPa",
    "A11": "Humidity ratio of hall air", "B11": "W_r", "C11": "=0.622*C9/(C7-C9)",
    "D11": "kg/kg",
    "A12": "Humidity ratio of hall air, g/kg", "B12": "W_rg", "C12": "=C11*1000", "D12": "g/kg",
    "A13": "Humidity ratio of hall air, gr/lb", "B13": "W_rgr", "C13": "=C11*7000",
    "D13": "gr/lb",
    "A14": "Supply air humidity ratio (off dehumidifier coil)", "B14": "W_s", "C14": 12.0,
    "D14": "g/kg",
    "A15": "Moisture pick-up", "B15": "dW", "C15": "=C12-C14", "D15": "g/kg",
    "A16": "Moisture pick-up (check copy)", "B16": "dW_x", "C16": "=C11-C14", "D16": "g/kg",
    "A17": "Gas constant of dry air", "B17": "R_a", "C17": 287.05, "D17": "J/(kg·K)",
    "A18": "Hall air density", "B18": "rho", "C18": "=C7*1000/(C17*(C4+273.15))",
    "D18": "kg/m³",
}

EVAPORATION = {
    "A1": "Ashcombe Leisure Centre: pool evaporation and latent load (invented)",
    "A2": "Sources: wp = (A/Y)·(pw − pa)·(0.089 + 0.0782·V)·Fa, wp in kg/s, A in m², p in kPa, "
          "Y in kJ/kg, V in m/s (ASHRAE Handbook HVAC Applications, natatoriums, SI form, from "
          "memory); activity factor 1.0 for public pools and spas (same table, from memory); "
          "latent gain of a seated spectator 70 W (CIBSE Guide A, from memory); 1 kW = 3412 Btu/h "
          "(NIST SP 811)",
    "A4": "Pool", "B4": "Area [m²]", "C4": "Water temp [°C]", "D4": "Water temp [°F]",
    "E4": "Sat. pressure at water [kPa]", "F4": "Activity factor [-]",
    "G4": "Evaporation [kg/h]", "H4": "Latent load [kW]",
    "A5": "Main pool 25 m x 12.5 m", "B5": 312.5, "C5": 28, "F5": 1.0,
    "A6": "Learner pool", "B6": 84, "C6": 30, "F6": 1.0,
    "A7": "Spa", "B7": 12, "C7": 36, "F7": 1.0,
    "A8": "Total / max",
    "B8": "=SUM(B5:B7)", "C8": "=MAX(C5:C7)", "G8": "=SUM(G5:G7)", "H8": "=SUM(H5:H7)",
    "A10": "Item", "B10": "Symbol", "C10": "Value", "D10": "Unit",
    "A11": "Latent heat of evaporation at pool temperature", "B11": "Y", "C11": 2430,
    "D11": "kJ/kg",
    "A12": "Air velocity over water surface", "B12": "V", "C12": 0.1, "D12": "m/s",
    "A13": "Total evaporation, kg/s", "B13": "w_s", "C13": "=G8/3600", "D13": "kg/s",
    "A14": "Latent load of pools, Btu/h", "B14": "Q_lB", "C14": "=H8*3412", "D14": "Btu/h",
    "A15": "Spectators at a gala", "B15": "n_sp", "C15": 120, "D15": "-",
    "A16": "Latent gain per spectator", "B16": "q_sp", "C16": 70, "D16": "W",
    "A17": "Latent load incl. spectators", "B17": "Q_lt", "C17": "=H8+C15*C16/1000", "D17": "kW",
    "A18": "Latent load incl. spectators (check copy)", "B18": "Q_ltx", "C18": "=H8+C15*C16",
    "D18": "kW",
}
for r in range(5, 8):
    EVAPORATION[f"D{r}"] = f"=C{r}*1.8+32"
    EVAPORATION[f"E{r}"] = f"=0.61094*EXP(17.625*C{r}/(C{r}+243.04))"
    EVAPORATION[f"G{r}"] = (f"=B{r}/$C$11*(E{r}-Conditions!$C$9)*(0.089+0.0782*$C$12)"
                            f"*F{r}*3600")
    EVAPORATION[f"H{r}"] = f"=G{r}*$C$11/3600"
EVAPORATION["D6"] = "=C6*1.8"        # planted: °C to °F without the +32
EVAPORATION["H6"] = "=G6*$C$11"      # planted: kg/h × kJ/kg without /3600, into kW

AIRFLOW = {
    "A1": "Ashcombe Leisure Centre: dehumidification air flow (invented)",
    "A2": "Sources: moisture balance m = w/ΔW (ASHRAE Handbook Fundamentals); 1 cfm = 1.699 m³/h "
          "and 1 L/s = 2.119 cfm (NIST SP 811); Qs = 1.08·cfm·ΔT(°F) and Ql = 0.68·cfm·ΔW(gr/lb) "
          "in Btu/h for standard air (ASHRAE Handbook Fundamentals); outdoor air 2.4 L/s per m² "
          "of pool and deck (ASHRAE 62.1, from memory); 1 g/kg = 7 gr/lb (NIST SP 811)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Total evaporation", "B4": "w", "C4": "=Evaporation!G8", "D4": "kg/h",
    "A5": "Moisture pick-up", "B5": "dW", "C5": "=Conditions!C15", "D5": "g/kg",
    "A6": "Dry air mass flow needed", "B6": "m_a", "C6": "=C4/(C5/1000)/3600", "D6": "kg/s",
    "A7": "Dry air mass flow needed (check copy)", "B7": "m_ax", "C7": "=C4/C5/3600",
    "D7": "kg/s",
    "A8": "Hall air density", "B8": "rho", "C8": "=Conditions!C18", "D8": "kg/m³",
    "A9": "Supply air volume flow", "B9": "q_v", "C9": "=C6/C8", "D9": "m³/s",
    "A10": "Supply air volume flow, m³/h", "B10": "q_vh", "C10": "=C9*3600", "D10": "m³/h",
    "A11": "Supply air volume flow, cfm", "B11": "q_cfm", "C11": "=C10/1.699", "D11": "cfm",
    "A12": "Supply air volume flow, cfm (check copy)", "B12": "q_cfmx", "C12": "=C10*1.699",
    "D12": "cfm",
    "A13": "Hall volume", "B13": "V_h", "C13": 3400, "D13": "m³",
    "A14": "Air change rate", "B14": "ACH", "C14": "=C10/C13", "D14": "1/h",
    "A15": "Pool and deck area", "B15": "A_pd", "C15": 520, "D15": "m²",
    "A16": "Outdoor air rate per area", "B16": "q_oa", "C16": 2.4, "D16": "L/(s·m²)",
    "A17": "Outdoor air", "B17": "Q_oa", "C17": "=C16*C15", "D17": "L/s",
    "A18": "Outdoor air, cfm", "B18": "Q_oacfm", "C18": "=C17*2.119", "D18": "cfm",
    "A19": "Supply air temperature", "B19": "T_s", "C19": 34, "D19": "°C",
    "A20": "Supply-to-hall temperature difference", "B20": "dT", "C20": "=C19-Conditions!C4",
    "D20": "K",
    "A21": "Supply-to-hall temperature difference, °F", "B21": "dT_F", "C21": "=C20*1.8",
    "D21": "Δ°F",
    "A22": "Supply-to-hall temperature difference, °F (check copy)", "B22": "dT_Fx",
    "C22": "=C20*1.8+32", "D22": "Δ°F",
    "A23": "Sensible heat of supply air", "B23": "Q_s", "C23": "=1.08*C11*C21", "D23": "Btu/h",
    "A24": "Sensible heat of supply air, kW", "B24": "Q_skW", "C24": "=C23/3412", "D24": "kW",
    "A25": "Moisture pick-up, gr/lb", "B25": "dW_gr", "C25": "=C5*7", "D25": "gr/lb",
    "A26": "Latent capacity of supply air", "B26": "Q_l", "C26": "=0.68*C11*C25", "D26": "Btu/h",
    "A27": "Latent capacity of supply air, kW", "B27": "Q_lkW", "C27": "=C26/3412", "D27": "kW",
    "A28": "Latent check", "B28": "chk", "C28": "=IF(C27>=Evaporation!H8,\"OK\",\"SHORT\")",
}

# ============================================================================================
# Book 3: a business park's stormwater detention basin
# ============================================================================================
CATCHMENT = {
    "A1": "Millbrook Business Park phase 2: catchment and peak runoff "
          "(Carrow Civil Partners, invented)",
    "A2": "Sources: rational method Q = C·i·A/360 (Q m³/s, i mm/h, A ha), and Q = C·i·A (cfs, "
          "in/h, acres, the factor 1.008 dropped by convention) (Chow, Maidment & Mays, Applied "
          "Hydrology); Kirpich tc = 0.0195·L^0.77·S^-0.385 (min, L in m) (same text); 1 ha = "
          "2.471 acres and 1 m³/s = 35.31 cfs (NIST SP 811); runoff coefficients (from memory); "
          "entry time 5 min (common practice); IDF values invented for the demo",
    "A4": "Surface", "B4": "Area [ha]", "C4": "Area [acres]", "D4": "Runoff coefficient [-]",
    "E4": "C x A [ha]",
    "A5": "Roofs", "B5": 2.10, "D5": 0.95,
    "A6": "Car parks and roads", "B6": 3.40, "D6": 0.90,
    "A7": "Landscaping", "B7": 1.85, "D7": 0.25,
    "A8": "Swales", "B8": 0.45, "D8": 0.15,
    "A9": "Total / composite",
    "B9": "=SUM(B5:B8)", "C9": "=SUM(C5:C8)", "D9": "=SUMPRODUCT(B5:B8,D5:D8)/B9",
    "E9": "=SUM(E5:E8)",
    "A11": "Item", "B11": "Symbol", "C11": "Value", "D11": "Unit",
    "A12": "Hydraulic length of catchment", "B12": "L", "C12": 620, "D12": "m",
    "A13": "Average slope", "B13": "S", "C13": 0.012, "D13": "m/m",
    "A14": "Time of concentration, Kirpich (cross-check)", "B14": "tc_K",
    "C14": "=0.0195*C12^0.77*C13^-0.385", "D14": "min",
    "A15": "Entry time", "B15": "t_e", "C15": 5, "D15": "min",
    "A16": "Pipe flow velocity", "B16": "v", "C16": 1.5, "D16": "m/s",
    "A17": "Time of concentration", "B17": "tc", "C17": "=C15+C12/C16/60", "D17": "min",
    "A18": "Storm duration (tc rounded up to 5 min)", "B18": "t_d", "C18": "=ROUNDUP(C17/5,0)*5",
    "D18": "min",
    "A19": "Rainfall intensity, 100-year", "B19": "i", "C19": "=VLOOKUP(C18,IDF!A4:B12,2)",
    "D19": "mm/h",
    "A20": "Rainfall intensity, in/h", "B20": "i_in", "C20": "=C19/25.4", "D20": "in/h",
    "A21": "Peak runoff", "B21": "Q_p", "C21": "=E9*C19/360", "D21": "m³/s",
    "A22": "Peak runoff (check copy)", "B22": "Q_px", "C22": "=E9*C19/3.6", "D22": "m³/s",
    "A23": "Peak runoff, US form", "B23": "Q_pUS", "C23": "=D9*C20*C9", "D23": "cfs",
    "A24": "Peak runoff, cfs", "B24": "Q_pcfs", "C24": "=C21*35.31", "D24": "cfs",
}
for r in range(5, 9):
    CATCHMENT[f"C{r}"] = f"=B{r}*2.471"
    CATCHMENT[f"E{r}"] = f"=B{r}*D{r}"
CATCHMENT["C7"] = "=B7/2.471"        # planted: ha to acres the wrong way round
# planted C22: the km² form of the rational method (/3.6) used with hectares

IDF = {
    "A1": "Millbrook: design rainfall, 100-year return period (values invented for the demo)",
    "A2": "Source: 1 in = 25.4 mm (NIST SP 811)",
    "A3": "Duration [min]", "B3": "Intensity [mm/h]", "C3": "Intensity [in/h]",
}
for r, (dur, inten) in enumerate(
        [(5, 180), (10, 140), (15, 115), (20, 97), (30, 76), (45, 59), (60, 48), (90, 36),
         (120, 29)], start=4):
    IDF[f"A{r}"] = dur
    IDF[f"B{r}"] = inten
    IDF[f"C{r}"] = f"=B{r}/25.4"

HYDROGRAPH = {
    "A1": "Millbrook: inflow hydrograph to the detention basin (invented)",
    "A2": "Sources: modified rational (triangular) hydrograph, rise over tc and recession over "
          "1.5·tc (common practice); step volume by the trapezoidal rule (common practice); "
          "1 m³/s = 35.31 cfs (NIST SP 811)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Time step", "B4": "dt", "C4": 5, "D4": "min",
    "A5": "Peak inflow", "B5": "Q_p", "C5": "=Catchment!C21", "D5": "m³/s",
    "A6": "Storm duration (time to peak)", "B6": "t_p", "C6": "=Catchment!C18", "D6": "min",
    "A8": "Time [min]", "B8": "Inflow [m³/s]", "C8": "Inflow [cfs]", "D8": "Step volume [m³]",
    "E8": "Cumulative volume [m³]",
    "A9": 0, "D9": 0, "E9": 0,
    "A19": "Peak / total", "B19": "=MAX(B9:B17)", "C19": "=MAX(C9:C17)", "D19": "=SUM(D9:D17)",
}
for r in range(9, 18):
    if r > 9:
        HYDROGRAPH[f"A{r}"] = f"=A{r - 1}+$C$4"
        HYDROGRAPH[f"D{r}"] = f"=(B{r}+B{r - 1})/2*$C$4*60"
        HYDROGRAPH[f"E{r}"] = f"=E{r - 1}+D{r}"
    HYDROGRAPH[f"B{r}"] = (f"=IF(A{r}<=$C$6,$C$5*A{r}/$C$6,"
                           f"MAX(0,$C$5*(2.5*$C$6-A{r})/(1.5*$C$6)))")
    HYDROGRAPH[f"C{r}"] = f"=B{r}*35.31"
HYDROGRAPH["D12"] = "=(B12+B11)/2*$C$4"   # planted: m³/s × min without ×60
HYDROGRAPH["C14"] = "=B14/35.31"          # planted: m³/s to cfs the wrong way round

OUTLET = {
    "A1": "Millbrook: basin outlet orifice and storage (invented)",
    "A2": "Sources: orifice Q = Cd·A·√(2gh), Cd = 0.6 sharp-edged (any hydraulics text); "
          "allowable discharge 5 L/s per ha (common practice; planning condition invented); "
          "outflow volume over a triangular outflow hydrograph Q·tb/2 (common practice); "
          "1 acre-ft = 1233.48 m³, 1 ft = 0.3048 m, 1 m³ = 35.31 ft³ (NIST SP 811); freeboard "
          "at least 0.3 m (common practice)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Orifice diameter", "B4": "d", "C4": 110, "D4": "mm",
    "A5": "Discharge coefficient", "B5": "Cd", "C5": 0.6, "D5": "-",
    "A6": "Orifice area", "B6": "A_o", "C6": "=PI()*(C4/1000)^2/4", "D6": "m²",
    "A7": "Gravitational acceleration", "B7": "g", "C7": 9.81, "D7": "m/s²",
    "A8": "Design top water level above invert", "B8": "H", "C8": 1.6, "D8": "m",
    "A9": "Orifice centreline above invert", "B9": "z_o", "C9": "=C4/1000/2", "D9": "m",
    "A10": "Head on orifice", "B10": "h", "C10": "=C8-C9", "D10": "m",
    "A11": "Outflow at top water level", "B11": "Q_o", "C11": "=C5*C6*SQRT(2*C7*C10)",
    "D11": "m³/s",
    "A12": "Outflow at top water level (check copy)", "B12": "Q_ox", "C12": "=C5*C6*SQRT(2*C10)",
    "D12": "m³/s",
    "A13": "Head on orifice (check copy)", "B13": "h_x", "C13": "=C8-C4/2", "D13": "m",
    "A14": "Outflow, L/s", "B14": "Q_oL", "C14": "=C11*1000", "D14": "L/s",
    "A15": "Outflow, cfs", "B15": "Q_ocfs", "C15": "=C11*35.31", "D15": "cfs",
    "A16": "Allowable discharge rate", "B16": "q_a", "C16": 5, "D16": "L/s/ha",
    "A17": "Allowable discharge", "B17": "Q_a", "C17": "=C16*Catchment!B9", "D17": "L/s",
    "A18": "Outlet check", "B18": "chk", "C18": "=IF(C14<=C17,\"OK\",\"REDUCE ORIFICE\")",
    "A19": "Inflow volume", "B19": "V_in", "C19": "=MAX(Hydrograph!E9:E17)", "D19": "m³",
    "A20": "Hydrograph base time", "B20": "t_b", "C20": "=2.5*Hydrograph!C6", "D20": "min",
    "A21": "Outflow volume during the storm", "B21": "V_out", "C21": "=C11*C20*60/2",
    "D21": "m³",
    "A22": "Storage required", "B22": "V_s", "C22": "=C19-C21", "D22": "m³",
    "A23": "Storage required, acre-ft", "B23": "V_saf", "C23": "=C22/1233.5", "D23": "acre-ft",
    "A24": "Storage required, acre-ft (check copy)", "B24": "V_safx", "C24": "=C22/43560",
    "D24": "acre-ft",
    "A25": "Storage required, ft³", "B25": "V_sft", "C25": "=C22*35.31", "D25": "ft³",
    "A26": "Basin plan area at mid-depth", "B26": "A_b", "C26": 1450, "D26": "m²",
    "A27": "Storage depth", "B27": "y", "C27": "=C22/C26", "D27": "m",
    "A28": "Freeboard", "B28": "fb", "C28": "=MAX(0.3,0.2*C27)", "D28": "m",
    "A29": "Basin depth incl. freeboard", "B29": "y_t", "C29": "=C27+C28", "D29": "m",
    "A30": "Basin depth, ft", "B30": "y_ft", "C30": "=C29/0.3048", "D30": "ft",
    "A31": "Basin depth, ft (check copy)", "B31": "y_ftx", "C31": "=C29*0.3048", "D31": "ft",
}

# ============================================================================================
# Book 4: a water works' motor and VFD schedule
# ============================================================================================
MOTORS = {
    "A1": "Thornfield WTW high-lift pump station upgrade: motor schedule "
          "(Kellaway Electrical Design, invented)",
    "A2": "Sources: I = P·1000/(√3·V·pf·η) (any electrical handbook); 1 hp = 0.7457 kW "
          "(NIST SP 811, rounded 0.746); DOL locked-rotor current 6 × FLC (common practice, from "
          "memory); T = 9550·P/n with T in N·m, P in kW, n in rpm (common practice); motor data "
          "invented",
    "A4": "Tag", "B4": "Duty", "C4": "Rated output [kW]", "D4": "Rated output [hp]",
    "E4": "Voltage [V]", "F4": "Power factor [-]", "G4": "Efficiency [%]",
    "H4": "Full-load current [A]", "I4": "Starting kVA (DOL) [kVA]", "J4": "Speed [rpm]",
    "K4": "Torque [N·m]",
    "A5": "HLP-1", "B5": "High-lift pump 1 (VFD)", "C5": 110, "E5": 400, "F5": 0.87,
    "G5": 95.4, "J5": 1485,
    "A6": "HLP-2", "B6": "High-lift pump 2 (VFD)", "C6": 110, "E6": 400, "F6": 0.87,
    "G6": 95.4, "J6": 1485,
    "A7": "HLP-3", "B7": "High-lift pump 3 (standby, VFD)", "C7": 110, "E7": 400, "F7": 0.87,
    "G7": 95.4, "J7": 1485,
    "A8": "BW-1", "B8": "Backwash pump (soft starter)", "C8": 55, "E8": 400, "F8": 0.86,
    "G8": 94.6, "J8": 1480,
    "A9": "AB-1", "B9": "Air scour blower (DOL)", "C9": 37, "E9": 400, "F9": 0.85,
    "G9": 93.9, "J9": 2950,
    "A10": "DS-1", "B10": "Dosing pump (DOL)", "C10": 2.2, "E10": 400, "F10": 0.82,
    "G10": 86.7, "J10": 1430,
    "A11": "Total / largest",
    "C11": "=SUM(C5:C10)", "D11": "=SUM(D5:D10)", "H11": "=SUM(H5:H10)", "I11": "=MAX(I5:I10)",
}
for r in range(5, 11):
    MOTORS[f"D{r}"] = f"=C{r}/0.746"
    MOTORS[f"H{r}"] = f"=C{r}*1000/(SQRT(3)*E{r}*F{r}*G{r}/100)"
    MOTORS[f"I{r}"] = f"=SQRT(3)*E{r}*6*H{r}/1000"
    MOTORS[f"K{r}"] = f"=9550*C{r}/J{r}"
MOTORS["D7"] = "=C7*0.746"                            # planted: kW to hp the wrong way
MOTORS["H8"] = "=C8*1000/(SQRT(3)*E8*F8*G8)"          # planted: efficiency % as a fraction
MOTORS["H9"] = "=C9/(SQRT(3)*E9*F9*G9/100)"           # planted: kW over V: no ×1000
MOTORS["I10"] = "=SQRT(3)*E10*6*H10"                  # planted: VA into a kVA column

CABLES = {
    "A1": "Thornfield WTW: cable sizing for HLP-1 (invented)",
    "A2": "Sources: copper XLPE multicore in air, IEC 60364-5-52 Table B.52.12 method E, and "
          "R, X per km (values from memory); ambient factor 0.96 at 35 °C and grouping factor 0.82 "
          "(IEC 60364-5-52, from memory); design current 125 % of FLC (NEC 430.22); "
          "ΔV = √3·I·L·(R·cosφ + X·sinφ)/1000 with R, X in Ω/km and L in m (common practice); "
          "voltage drop limit 5 % (BS 7671 Appendix 4, from memory)",
    "A4": "Size [mm²]", "B4": "Ampacity [A]", "C4": "R [Ω/km]", "D4": "X [Ω/km]",
    "A14": "Item", "B14": "Symbol", "C14": "Value", "D14": "Unit",
    "A15": "Motor full-load current", "B15": "I_fl", "C15": "=Motors!H5", "D15": "A",
    "A16": "Design current (125 %)", "B16": "I_b", "C16": "=1.25*C15", "D16": "A",
    "A17": "Ambient temperature factor", "B17": "k_a", "C17": 0.96, "D17": "-",
    "A18": "Grouping factor", "B18": "k_g", "C18": 0.82, "D18": "-",
    "A19": "Selected conductor size", "B19": "S", "C19": 120, "D19": "mm²",
    "A20": "Tabulated ampacity", "B20": "I_t", "C20": "=VLOOKUP(C19,A5:D12,2,FALSE)", "D20": "A",
    "A21": "Derated ampacity", "B21": "I_z", "C21": "=C20*C17*C18", "D21": "A",
    "A22": "Ampacity check", "B22": "chk_I", "C22": "=IF(C21>=C16,\"OK\",\"UPSIZE\")",
    "A23": "Cable route length", "B23": "L", "C23": 180, "D23": "m",
    "A24": "Conductor resistance", "B24": "R", "C24": "=VLOOKUP(C19,A5:D12,3,FALSE)",
    "D24": "Ω/km",
    "A25": "Conductor reactance", "B25": "X", "C25": "=VLOOKUP(C19,A5:D12,4,FALSE)",
    "D25": "Ω/km",
    "A26": "Motor power factor", "B26": "pf", "C26": "=Motors!F5", "D26": "-",
    "A27": "Voltage drop at full load", "B27": "dV",
    "C27": "=SQRT(3)*C15*C23*(C24*C26+C25*SIN(ACOS(C26)))/1000", "D27": "V",
    "A28": "Voltage drop at full load (check copy)", "B28": "dV_x",
    "C28": "=SQRT(3)*C15*C23*(C24*C26+C25*SIN(ACOS(C26)))", "D28": "V",
    "A29": "Voltage drop, % of supply", "B29": "dV_pc", "C29": "=C27/Motors!E5*100", "D29": "%",
    "A30": "Voltage drop check", "B30": "chk_V", "C30": "=IF(C29<=5,\"OK\",\"UPSIZE\")",
}
for r, (size, amp, res) in enumerate(
        [(16, 100, 1.47), (25, 127, 0.927), (35, 158, 0.668), (50, 192, 0.494), (70, 246, 0.342),
         (95, 298, 0.247), (120, 346, 0.196), (150, 399, 0.159)], start=5):
    CABLES[f"A{r}"] = size
    CABLES[f"B{r}"] = amp
    CABLES[f"C{r}"] = res
    CABLES[f"D{r}"] = 0.08

ENERGY = {
    "A1": "Thornfield WTW: VFD energy savings on HLP-1 (invented)",
    "A2": "Sources: affinity laws Q ∝ n, H ∝ n², P ∝ n³ (any pump handbook); P = ρ·g·Q·H/η "
          "(Hydraulic Institute); bhp = gpm·ft/(3960·η) for water (common practice); 1 L/s = "
          "15.85 gpm, 1 m = 3.281 ft, 1 N·m = 0.7376 lbf·ft (NIST SP 811); T(lbf·ft) = "
          "5252·hp/rpm (common practice); throttled power from the pump curve (invented); "
          "grid emission factor 0.2 kg CO2e/kWh (from memory, demo only)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Rated flow per pump", "B4": "Q", "C4": 180, "D4": "L/s",
    "A5": "Rated head", "B5": "H", "C5": 62, "D5": "m",
    "A6": "Pump efficiency", "B6": "eta_p", "C6": 82, "D6": "%",
    "A7": "Water density", "B7": "rho", "C7": 1000, "D7": "kg/m³",
    "A8": "Gravitational acceleration", "B8": "g", "C8": 9.81, "D8": "m/s²",
    "A9": "Pump shaft power at rated duty", "B9": "P_1", "C9": "=C7*C8*C4/1000*C5/(C6/100)/1000",
    "D9": "kW",
    "A10": "Rated flow, gpm", "B10": "Q_gpm", "C10": "=C4*15.85", "D10": "gpm",
    "A11": "Rated head, ft", "B11": "H_ft", "C11": "=C5*3.281", "D11": "ft",
    "A12": "Brake horsepower", "B12": "bhp", "C12": "=C10*C11/(3960*C6/100)", "D12": "hp",
    "A13": "Brake horsepower (check copy)", "B13": "bhp_x", "C13": "=C4*C11/(3960*C6/100)",
    "D13": "hp",
    "A14": "Motor rated speed", "B14": "n_1", "C14": "=Motors!J5", "D14": "rpm",
    "A15": "Reduced-duty output frequency", "B15": "f_2", "C15": 40, "D15": "Hz",
    "A16": "Supply frequency", "B16": "f_1", "C16": 50, "D16": "Hz",
    "A17": "Speed ratio", "B17": "k_n", "C17": "=C15/C16", "D17": "-",
    "A18": "Reduced speed", "B18": "n_2", "C18": "=C14*C17", "D18": "rpm",
    "A19": "Speed ratio (check copy)", "B19": "k_nx", "C19": "=C15/C14", "D19": "-",
    "A20": "Shaft power at reduced speed", "B20": "P_2", "C20": "=C9*C17^3", "D20": "kW",
    "A21": "Shaft power with throttling valve at reduced flow", "B21": "P_th", "C21": 118,
    "D21": "kW",
    "A22": "Motor efficiency", "B22": "eta_m", "C22": "=Motors!G5", "D22": "%",
    "A23": "VFD efficiency", "B23": "eta_v", "C23": 97, "D23": "%",
    "A24": "Input power with VFD", "B24": "P_vfd", "C24": "=C20/(C22/100)/(C23/100)", "D24": "kW",
    "A25": "Input power with throttling", "B25": "P_thr", "C25": "=C21/(C22/100)", "D25": "kW",
    "A26": "Operating hours at reduced duty per year", "B26": "t_a", "C26": 6000, "D26": "h",
    "A27": "Annual energy saving", "B27": "E_s", "C27": "=(C25-C24)*C26", "D27": "kWh",
    "A28": "Annual energy saving, MWh", "B28": "E_sM", "C28": "=C27/1000", "D28": "MWh",
    "A29": "Annual energy saving (check copy)", "B29": "E_sx", "C29": "=(C25-C24)*C26/1000",
    "D29": "kWh",
    "A30": "Grid emission factor", "B30": "EF", "C30": 0.2, "D30": "kg/kWh",
    "A31": "Annual CO2e saving", "B31": "m_CO2", "C31": "=C27*C30/1000", "D31": "t",
    "A32": "Shaft torque at reduced speed", "B32": "T_2", "C32": "=9550*C20/C18", "D32": "N·m",
    "A33": "Shaft torque at reduced speed, lbf·ft", "B33": "T_2US", "C33": "=C32*0.7376",
    "D33": "lbf·ft",
    "A34": "Rated torque of HLP-1 motor, lbf·ft", "B34": "T_r", "C34": "=Motors!D5*5252/Motors!J5",
    "D34": "lbf·ft",
}

BOOKS = {
    "gas-fuel-line": {
        "trade": "natural gas fuel line and regulator station for a bakery oven line",
        "sheets": [("Burners", BURNERS), ("Line", LINE), ("Station", STATION)],
        "names": {"GrossCV": ("Burners", "$C$14")},
        "planted": {
            "Burners!C7": ("unit-scale", "kW to Btu/h divided by 3412: wrong way round"),
            "Burners!D8": ("unit-scale", "kW × 3600 (kJ/h) over MJ/Nm³: gas flow 1000 times "
                                         "too large"),
            "Burners!E9": ("unit-scale", "Nm³/h × 35.31 is ft³/h at 0 °C, not scfh at 60 °F "
                                         "(5.4 % low)"),
            "Burners!C18": ("unit-scale", "kW burner total plus pilot watts"),
            "Line!C14": ("offset-scale", "gas density from the gauge pressure"),
            "Line!C31": ("unit-scale", "Pa to psi: kPa × 6.895, wrong way round"),
            "Station!C7": ("unit-scale", "bar(g) plus 14.7 psi written as psia"),
            "Station!C15": ("unit-scale", "bar(g) less mbar(g): pressure drop"),
            "Station!C20": ("offset-scale", "temperature drop converted to °F with +32"),
        },
    },
    "pool-dehumidification": {
        "trade": "swimming pool hall dehumidification",
        "sheets": [("Conditions", CONDITIONS), ("Evaporation", EVAPORATION),
                   ("Airflow", AIRFLOW)],
        "planted": {
            "Conditions!C10": ("unit-scale", "RH 60 % used as a fraction: p_v = RH × p_ws"),
            "Conditions!C16": ("unit-scale", "kg/kg less g/kg in the moisture pick-up"),
            "Evaporation!D6": ("offset-scale", "°C × 1.8 into °F without +32"),
            "Evaporation!H6": ("unit-scale", "kg/h × kJ/kg without /3600 into kW"),
            "Evaporation!C18": ("unit-scale", "pool kW plus spectator watts"),
            "Airflow!C7": ("unit-scale", "g/kg moisture pick-up used as kg/kg"),
            "Airflow!C12": ("unit-scale", "m³/h to cfm multiplied by 1.699: wrong way round"),
            "Airflow!C22": ("offset-scale", "temperature difference to °F with +32"),
        },
    },
    "stormwater-detention": {
        "trade": "stormwater detention basin (rational method, hydrograph, orifice, storage)",
        "sheets": [("Catchment", CATCHMENT), ("IDF", IDF), ("Hydrograph", HYDROGRAPH),
                   ("Outlet", OUTLET)],
        "planted": {
            "Catchment!C7": ("unit-scale", "ha to acres divided by 2.471: wrong way round"),
            "Catchment!C22": ("unit-scale", "rational method /3.6 (A in km²) used with ha"),
            "Hydrograph!D12": ("unit-scale", "m³/s × min without × 60"),
            "Hydrograph!C14": ("unit-scale", "m³/s to cfs divided by 35.31: wrong way round"),
            "Outlet!C12": ("result-unit", "orifice equation without g"),
            "Outlet!C13": ("unit-scale", "head: m less mm"),
            "Outlet!C24": ("unit-scale", "m³ divided by 43560 (ft² per acre) into acre-ft"),
            "Outlet!C31": ("unit-scale", "m to ft multiplied by 0.3048: wrong way round"),
        },
    },
    "motor-vfd-schedule": {
        "trade": "electric motor and VFD schedule, cable sizing and energy savings",
        "sheets": [("Motors", MOTORS), ("Cables", CABLES), ("Energy", ENERGY)],
        "planted": {
            "Motors!D7": ("unit-scale", "kW to hp multiplied by 0.746: wrong way round"),
            "Motors!H8": ("unit-scale", "efficiency in % used as a fraction in the FLC"),
            "Motors!H9": ("unit-scale", "FLC from kW without × 1000"),
            "Motors!I10": ("unit-scale", "starting VA written as kVA (no /1000)"),
            "Cables!C28": ("unit-scale", "voltage drop with L in m and R in Ω/km, no /1000"),
            "Energy!C13": ("result-unit", "bhp with L/s in place of gpm: 3960 then has no "
                                          "reading as 1/γ_w"),
            "Energy!C19": ("unit-scale", "speed ratio of Hz over rpm"),
            "Energy!C29": ("unit-scale", "kW × h / 1000 (MWh) written as kWh"),
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
