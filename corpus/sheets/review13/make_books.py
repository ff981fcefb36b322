#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review52), written with the
standard zipfile module (corpus/sheets/xlsx_writer.py, shared by the review books).

Trades: a chill-room refrigeration load; a hot water boiler plant; a fire sprinkler hydraulic
calculation; a crude oil tank farm inventory. All scenarios, sites and catalogue data are
invented; the formulas and published factors are the trade's own, with sources named in a text
cell at the top of each sheet.

Every formula cell is either a planted mistake (PLANTED, with the rule expected) or a correct
cell that must stay clean.

Run: python3 make_books.py  ->  *.xlsx, *.expect, expect.json in this folder
"""
import json
import os
import re

import sys
sys.path.insert(0, os.path.dirname(os.path.dirname(os.path.abspath(__file__))))
from xlsx_writer import write_xlsx  # noqa: E402 (the shared writer in corpus/sheets)

HERE = os.path.dirname(os.path.abspath(__file__))


class ItemSheet:
    """An 'Item | Symbol | Value | Unit' sheet. Formulas name other rows as {key}; planted rows
    carry (rule, what)."""

    def __init__(self, name, title, sources, first_row=5):
        self.name = name
        self.cells = {"A1": title, "A2": sources,
                      f"A{first_row - 1}": "Item", f"B{first_row - 1}": "Symbol",
                      f"C{first_row - 1}": "Value", f"D{first_row - 1}": "Unit"}
        self.row = first_row
        self.keys = {}
        self.pending = []
        self.planted = {}

    def add(self, key, label, symbol, value, unit=None, planted=None):
        r = self.row
        self.row += 1
        self.keys[key] = r
        self.cells[f"A{r}"] = label
        self.cells[f"B{r}"] = symbol
        self.pending.append((r, value))
        if unit is not None:
            self.cells[f"D{r}"] = unit
        if planted:
            self.planted[f"{self.name}!C{r}"] = planted
        return r

    def ref(self, key):
        return f"{self.name}!C{self.keys[key]}"

    def finish(self, outside=None):
        outside = outside or {}

        def sub(m):
            k = m.group(1)
            if k in self.keys:
                return f"C{self.keys[k]}"
            return outside[k]

        for r, value in self.pending:
            if isinstance(value, str) and value.startswith("="):
                value = re.sub(r"\{([A-Za-z0-9_]+)\}", sub, value)
            self.cells[f"C{r}"] = value
        return self.cells


# --------------------------------------------------------------------------------------------
# Book 1: chill room refrigeration load (W, kW, Btu/h, TR, kg/d, kJ/(kg·K), °C and K)
# --------------------------------------------------------------------------------------------
COLD_SRC = ("Sources: ASHRAE Handbook—Refrigeration (2018) ch. 24 'Refrigerated-facility loads' "
            "(transmission U·A·ΔT; product m·c·ΔT over the pull-down time; infiltration by air "
            "changes per 24 h times air density and enthalpy difference; occupancy and lighting "
            "loads); NIST SP 811 (2008) App. B.8 (1 W = 3.412 Btu_IT/h; ton of refrigeration = "
            "3.516853 kW). Produce specific heat 3.7 kJ/(kg·K), occupancy heat 270 W per person at "
            "0–2 °C and 6.5 air changes per day: from memory of the ASHRAE tables. Enthalpies read "
            "from a psychrometric chart (35 °C 40 % RH; 2 °C 90 % RH), from memory. 10 % safety "
            "factor and 18 h/d compressor run time: common practice.")
room = ItemSheet("Room", "Glenmore Produce, chill room CR-2: refrigeration load summary "
                 "(invented scenario)", COLD_SRC)
room.add("Tr", "Room design temperature", "T_r", 2, "°C")
room.add("To", "Outdoor design dry bulb", "T_o", 35, "°C")
room.add("L", "Room length (inside)", "L", 12, "m")
room.add("W", "Room width (inside)", "W", 8, "m")
room.add("H", "Room height (inside)", "H", 4.5, "m")
room.add("V", "Room volume", "V", "={L}*{W}*{H}", "m³")
room.add("Af", "Floor area", "A_f", "={L}*{W}", "m²")
room.add("mp", "Product received per day", "m_p", 12000, "kg/d")
room.add("Tp", "Product entering temperature", "T_p", 18, "°C")
room.add("cp", "Specific heat of produce above freezing", "c_p", 3.7, "kJ/(kg·K)")
room.add("Qp", "Product cooling load", "Q_p", "={mp}*{cp}*({Tp}-{Tr})/86400", "kW")
room.add("Qp2", "Product cooling load, 24 h pull-down", "Q_p24",
         "={mp}*{cp}*({Tp}-{Tr})/24", "kW",
         planted=("unit-scale", "kJ/d divided by 24 h gives kJ/h, typed as kW: 3600 too large"))
room.add("Qp3", "Product cooling load (field check)", "Q_pc", "={mp}*{cp}*{Tp}/86400", "kW",
         planted=("offset-scale", "product load from the entering temperature in °C, not ΔT"))
room.add("n", "Air changes per day (door openings)", "n", 6.5, "1/d")
room.add("ho", "Outdoor air enthalpy", "h_o", 72, "kJ/kg")
room.add("hi", "Room air enthalpy", "h_i", 12, "kJ/kg")
room.add("rho", "Air density at room conditions", "rho_a", 1.27, "kg/m³")
room.add("Qi", "Infiltration load", "Q_i", "={V}*{n}*{rho}*({ho}-{hi})/86400", "kW")
room.add("Np", "Persons working in the room", "N_p", 2, "-")
room.add("qp", "Heat per person", "q_p", 270, "W")
room.add("tp", "Hours occupied per day", "t_o", 8, "h/d")
room.add("Qo", "Occupancy load (24 h average)", "Q_o", "={Np}*{qp}*{tp}/24", "W")
room.add("ql", "Lighting power density", "q_l", 10, "W/m²")
room.add("Ql", "Lighting load", "Q_l", "={ql}*{Af}", "W")
room.add("Pf", "Evaporator fan motors", "P_f", 1.65, "kW")
room.add("Qt", "Transmission load (from Walls)", "Q_t", "=Walls!H11/1000", "kW")
room.add("Qin", "Internal loads", "Q_in", "=({Qo}+{Ql})/1000+{Pf}", "kW")
room.add("Qs", "Total heat load", "Q_sum", "={Qt}+{Qp}+{Qi}+{Qin}", "kW")
room.add("Qs2", "Total heat load (itemised)", "Q_sum2", "={Qt}+{Qp}+{Qi}+{Qo}+{Ql}+{Pf}", "kW",
         planted=("unit-scale", "occupancy and lighting in W added to kW loads"))
room.add("fs", "Safety factor", "f_s", 10, "%")
room.add("Qd", "Design load with safety factor", "Q_d", "={Qs}*(1+{fs}/100)", "kW")
room.add("Qd2", "Design load with safety factor (rev. B)", "Q_d2", "={Qs}*(1+{fs})", "kW",
         planted=("unit-scale", "10 % used as 10 in (1 + f)"))
room.add("tr", "Compressor run time", "t_r", 18, "h/d")
room.add("Qr", "Required refrigeration capacity", "Q_req", "={Qd}*24/{tr}", "kW")
room.add("QrB", "Required capacity, Btu/h", "Q_Btu", "={Qr}*3412", "Btu/h")
room.add("QrM", "Required capacity, MBH", "Q_MBH", "={Qr}*3412", "MBH",
         planted=("unit-scale", "Btu/h formula under an MBH unit: 1000 too large"))
room.add("QrT", "Required capacity, tons", "Q_TR", "={Qr}/3.517", "TR")
room.add("QrT2", "Required capacity, tons (vendor form)", "Q_TR2", "={Qr}*3.517", "TR",
         planted=("unit-scale", "kW to TR multiplied by 3.517: wrong way round"))
room.add("QrTr", "Required capacity, tons (rounded)", "Q_TRr", "=ROUND({QrT},1)", "TR")
room.add("sel", "Selected condensing unit", "model", "CU-25")
room.add("Qu", "Selected unit capacity", "Q_u", "=VLOOKUP({sel},Units!A4:C9,2,FALSE)", "kW")
room.add("ok", "Capacity check", "check", "=IF({Qu}>={Qr},\"OK\",\"UNDERSIZED\")")
room.add("mg", "Capacity margin", "margin", "=({Qu}-{Qr})/{Qr}*100", "%")
room.add("va", "Evaporator airflow", "V_a", "=VLOOKUP({sel},Units!A4:C9,3,FALSE)/3600", "m³/s")
ROOM = room.finish()

WALLS = {
    "A1": "Glenmore Produce, chill room CR-2: transmission through the insulated envelope",
    "A2": ("Sources: Q = U·A·ΔT, ASHRAE Handbook—Refrigeration (2018) ch. 24; panel U = k/t with "
           "surface films neglected (common practice for PIR panels); PIR k = 0.022 W/(m·K) from "
           "memory of panel makers' data; roof outside temperature 45 °C as a sun allowance and "
           "ground under the floor at 15 °C: common practice."),
    "A4": "Surface", "B4": "Area [m²]", "C4": "Panel thickness [mm]", "D4": "k [W/(m·K)]",
    "E4": "U [W/(m²·K)]", "F4": "Outside temp [°C]", "G4": "ΔT [K]", "H4": "Load [W]",
    "A11": "Total / max",
    "B11": "=SUM(B5:B10)", "G11": "=MAX(G5:G10)", "H11": "=SUM(H5:H10)",
}
for r, (surf, area, t, outside) in enumerate([
        ("North wall", "=Room!$C$7*Room!$C$9", 100, "=Room!$C$6"),
        ("South wall", "=Room!$C$7*Room!$C$9", 100, "=Room!$C$6"),
        ("East wall", "=Room!$C$8*Room!$C$9", 100, "=Room!$C$6"),
        ("West wall", "=Room!$C$8*Room!$C$9", 100, "=Room!$C$6"),
        ("Roof", "=Room!$C$11", 125, 45),
        ("Floor (on heated slab)", "=Room!$C$11", 100, 15)], start=5):
    WALLS[f"A{r}"] = surf
    WALLS[f"B{r}"] = area
    WALLS[f"C{r}"] = t
    WALLS[f"D{r}"] = 0.022
    WALLS[f"E{r}"] = f"=D{r}/(C{r}/1000)"
    WALLS[f"F{r}"] = outside
    WALLS[f"G{r}"] = f"=F{r}-Room!$C$5"
    WALLS[f"H{r}"] = f"=B{r}*E{r}*G{r}"
WALLS["E7"] = "=D7/C7"               # planted: thickness in mm used as m
WALLS["H9"] = "=B9*E9*F9"            # planted: outside temperature in °C in place of ΔT
assert room.keys["L"] == 7 and room.keys["H"] == 9 and room.keys["Af"] == 11
assert room.keys["Tr"] == 5 and room.keys["To"] == 6 and room.keys["W"] == 8

UNITS = {
    "A1": "Condensing unit range (invented catalogue data; rated at −5 °C evaporating, 32 °C "
          "ambient)",
    "A3": "Model", "B3": "Capacity [kW]", "C3": "Evaporator airflow [m³/h]",
}
for r, (m, q, a) in enumerate([("CU-15", 15.2, 7200), ("CU-20", 20.1, 9000),
                               ("CU-25", 25.4, 11500), ("CU-30", 30.3, 13800),
                               ("CU-40", 40.6, 18000), ("CU-50", 50.2, 22500)], start=4):
    UNITS[f"A{r}"], UNITS[f"B{r}"], UNITS[f"C{r}"] = m, q, a

COLD = {
    "trade": "refrigeration: chill room cooling load and condensing unit selection",
    "sheets": [("Room", ROOM), ("Walls", WALLS), ("Units", UNITS)],
    "planted": {**room.planted,
                "Walls!E7": ("unit-scale", "U = k/t with t in mm: 1000 too small"),
                "Walls!H9": ("offset-scale", "transmission from outside temperature in °C, not ΔT")},
}

# --------------------------------------------------------------------------------------------
# Book 2: hot water boiler plant (kW, MBH, gpm with 500, L/s, °C and °F, kPa(g))
# --------------------------------------------------------------------------------------------
BOIL_SRC = ("Sources: ASHRAE Handbook—HVAC Systems and Equipment (2020) ch. 13 'Hydronic heating "
            "and cooling' (gpm = Btu/h ÷ (500·ΔT °F); diaphragm expansion tank V_t = V_e/(1 − "
            "P_f/P_o) with absolute pressures); NIST SP 811 (2008) App. B.8 (1 W = 3.412 Btu_IT/h; "
            "1 gal = 3.785 L; 1 ft = 0.3048 m); pump power ρ·g·Q·H/η and US bhp = gpm·ft·SG/"
            "(3960·η), Cameron Hydraulic Data (19th ed.). Water c_p 4.19 kJ/(kg·K) and densities "
            "999.7 kg/m³ (10 °C) and 971.8 kg/m³ (80 °C): from memory of steam tables. Natural "
            "gas gross CV 38.3 MJ/m³: from memory. 85 % diversity and 10 % pick-up: common "
            "practice.")
plant = ItemSheet("Plant", "Harbour Road civic centre: LTHW boiler plant sizing (invented "
                  "scenario)", BOIL_SRC)
plant.add("Tf", "Flow temperature", "T_f", 82, "°C")
plant.add("Tr", "Return temperature", "T_r", 71, "°C")
plant.add("dT", "Temperature drop across system", "dT", "={Tf}-{Tr}", "K")
plant.add("TfF", "Flow temperature, °F", "T_fF", "={Tf}*1.8+32", "°F")
plant.add("TrF", "Return temperature, °F", "T_rF", "={Tr}*1.8+32", "°F")
plant.add("dTF", "Temperature drop, °F", "dT_F", "={dT}*1.8", "Δ°F")
plant.add("dTF2", "Temperature drop, °F (US consultant)", "dT_F2", "={dT}*1.8+32", "Δ°F",
          planted=("offset-scale", "a temperature difference converted with +32"))
plant.add("Qc", "Connected load (from Zones)", "Q_c", "=SUM(Zones!B5:B10)", "kW")
plant.add("div", "Diversity", "d", 85, "%")
plant.add("Qd", "Design load", "Q_d", "={Qc}*{div}/100", "kW")
plant.add("pu", "Piping losses and pick-up allowance", "a", 10, "%")
plant.add("Qp", "Plant output required", "Q_p", "={Qd}*(1+{pu}/100)", "kW")
plant.add("nb", "Duty boilers (plus one standby)", "n", 2, "-")
plant.add("Qb", "Output per boiler (rounded to 10 kW)", "Q_b", "=ROUND({Qp}/{nb},-1)", "kW")
plant.add("QbM", "Output per boiler, MBH", "Q_bM", "={Qb}*3.412", "MBH")
plant.add("eta", "Boiler gross efficiency", "eta_b", 92, "%")
plant.add("Qf", "Fuel input per boiler", "Q_f", "={Qb}/({eta}/100)", "kW")
plant.add("Qf2", "Fuel input per boiler (datasheet check)", "Q_f2", "={Qb}/{eta}", "kW",
          planted=("unit-scale", "92 % used as 92: input 100 too small"))
plant.add("cv", "Natural gas gross calorific value", "CV", 38.3, "MJ/m³")
plant.add("Vg", "Gas flow per boiler", "V_g", "={Qf}*3.6/{cv}", "m³/h")
plant.add("Vg2", "Gas flow per boiler (meter sizing)", "V_g2", "={Qf}/3.6/{cv}", "m³/h",
          planted=("unit-scale", "kW to MJ/h divided by 3.6: wrong way round"))
plant.add("Vgf", "Gas flow per boiler, ft³/h", "V_gf", "={Vg}*35.31", "ft³/h")
plant.add("Qg", "System flow rate, US", "Q_gpm", "={Qp}*3412/(500*{dTF})", "gpm")
plant.add("Qg2", "System flow rate, US (quick)", "Q_gpm2", "={Qp}/(500*{dTF})", "gpm",
          planted=("result-unit", "kW put in the 500 formula, which wants Btu/h"))
plant.add("Ql", "System flow rate", "Q_l", "={Qp}/(4.19*{dT})", "L/s")
plant.add("Ql2", "System flow rate (from °F drop)", "Q_l2", "={Qp}/(4.19*{dTF})", "L/s",
          planted=("unit-scale", "ΔT in °F where the 4.19 kJ/(kg·K) formula wants K"))
plant.add("Qm", "System flow rate, m³/h", "Q_m", "={Ql}*3.6", "m³/h")
plant.add("H", "Pump head (index circuit)", "H", 18, "m")
plant.add("Hft", "Pump head, ft", "H_ft", "={H}/0.3048", "ft")
plant.add("rho", "Water density at 80 °C", "rho", 971.8, "kg/m³")
plant.add("g", "Gravity", "g", 9.81, "m/s²")
plant.add("dp", "Pump differential pressure", "dp", "={rho}*{g}*{H}/1000", "kPa")
plant.add("etp", "Pump efficiency", "eta_p", 70, "%")
plant.add("Pp", "Pump shaft power", "P_p", "={rho}*{g}*{Ql}/1000*{H}/({etp}/100)/1000", "kW")
plant.add("Pp2", "Pump shaft power (hand calc)", "P_p2",
          "={rho}*{Ql}/1000*{H}/({etp}/100)/1000", "kW",
          planted=("result-unit", "ρ·Q·H/η with g left out"))
plant.add("SG", "Specific gravity of water at 80 °C", "SG", "={rho}/999", "-")
plant.add("bhp", "Pump brake horsepower", "P_hp", "={Qg}*{Hft}*{SG}/(3960*{etp}/100)", "hp")
plant.add("Vs", "System water volume", "V_s", 4.5, "m³")
plant.add("rc", "Water density at fill (10 °C)", "rho_c", 999.7, "kg/m³")
plant.add("Ve", "Expansion volume", "V_e", "={Vs}*({rc}/{rho}-1)", "m³")
plant.add("Pfi", "Fill pressure at tank", "P_f", 150, "kPa(g)")
plant.add("Po", "Maximum operating pressure at tank", "P_o", 350, "kPa(g)")
plant.add("Vt", "Expansion tank volume", "V_t", "={Ve}/(1-({Pfi}+101.3)/({Po}+101.3))", "m³")
plant.add("Vt2", "Expansion tank volume (supplier form)", "V_t2", "={Ve}/(1-{Pfi}/{Po})", "m³",
          planted=("offset-scale", "gauge pressures in the ratio that wants absolute"))
plant.add("Vtg", "Expansion tank volume, US gal", "V_tg", "={Vt}*264.2", "gal")
PLANT = plant.finish()
dTF_ref = f"Plant!$C${plant.keys['dTF']}"

ZONES = {
    "A1": "Harbour Road civic centre: heating loads by circuit",
    "A2": ("Sources: as the Plant sheet: MBH = kW × 3.412 (NIST SP 811), gpm = Btu/h ÷ (500·ΔT "
           "°F) (ASHRAE HVAC Systems and Equipment ch. 13), 1 gpm = 0.06309 L/s (NIST SP 811)."),
    "A4": "Circuit", "B4": "Heat load [kW]", "C4": "Heat load [MBH]", "D4": "Flow [gpm]",
    "E4": "Flow [L/s]",
    "A11": "Total",
    "B11": "=SUM(B5:B10)", "C11": "=SUM(C5:C10)", "D11": "=SUM(D5:D10)", "E11": "=SUM(E5:E10)",
}
for r, (name, kw) in enumerate([("AHU-1 heating coil", 185), ("AHU-2 heating coil", 140),
                                ("Radiators, north", 95), ("Radiators, south", 60),
                                ("DHW calorifier", 220), ("Unit heaters, loading bay", 45)],
                               start=5):
    ZONES[f"A{r}"] = name
    ZONES[f"B{r}"] = kw
    ZONES[f"C{r}"] = f"=B{r}*3.412"
    ZONES[f"D{r}"] = f"=C{r}*1000/(500*{dTF_ref})"
    ZONES[f"E{r}"] = f"=D{r}*0.06309"
ZONES["C8"] = "=B8*3412"         # planted: W factor on kW, into MBH
ZONES["E9"] = "=D9*3.785"        # planted: gpm to L/min typed into the L/s column

BOILER = {
    "trade": "building services: LTHW boiler plant, pumps and expansion tank",
    "sheets": [("Plant", PLANT), ("Zones", ZONES)],
    "planted": {**plant.planted,
                "Zones!C8": ("unit-scale", "kW × 3412 into MBH: 1000 too large"),
                "Zones!E9": ("unit-scale", "gpm × 3.785 gives L/min, column is L/s")},
}

# --------------------------------------------------------------------------------------------
# Book 3: fire sprinkler hydraulic calculation (K gpm/psi^0.5, L/min/bar^0.5, psi, bar, H-W)
# --------------------------------------------------------------------------------------------
SPR_SRC = ("Sources: NFPA 13 (2022): ordinary hazard group 2, 0.20 gpm/ft² over 1500 ft² (density/"
           "area curves); Q = K√P; Hazen–Williams p = 4.52·Q^1.85/(C^1.85·d^4.87) psi/ft with Q in "
           "gpm and d in in., and p = 6.05×10⁵·Q^1.85/(C^1.85·d^4.87) bar/m with Q in L/min and d "
           "in mm; elevation 0.433 psi/ft; minimum 7 psi at a sprinkler; hose allowance 250 gpm "
           "and 60 min supply for OH; K 5.6 US = K 80 metric (×14.4); C = 120 for black steel wet "
           "pipe. NFPA 291 (2022) supply curve p = S − (S − R)(Q/Q_F)^1.85. NIST SP 811 (2008) "
           "App. B.8 (1 gal = 3.785 L; 1 psi = 6.895 kPa; 1 bar = 14.5 psi; 1 ft = 0.3048 m). "
           "Pipe ID 3.068 in (3 in Sch 40, ASME B36.10M): from memory. 10 psi margin: common "
           "practice.")
des = ItemSheet("Design", "Brookfield distribution warehouse, office mezzanine: sprinkler "
                "hydraulic calculation (invented scenario)", SPR_SRC)
des.add("D", "Design density", "D", 0.20, "gpm/ft²")
des.add("Ad", "Design area of operation", "A_d", 1500, "ft²")
des.add("As", "Coverage per sprinkler (10 ft × 12 ft)", "A_s", 120, "ft²")
des.add("N", "Sprinklers in the design area", "N", "=ROUNDUP({Ad}/{As},0)", "-")
des.add("K", "Sprinkler K-factor", "K", 5.6, "gpm/psi^0.5")
des.add("Ksi", "Sprinkler K-factor, metric", "K_SI", "={K}*14.4", "L/min/bar^0.5")
des.add("Q1", "Minimum flow at the most remote sprinkler", "Q_1", "={D}*{As}", "gpm")
des.add("P1", "Pressure needed at the most remote sprinkler", "P_1", "=MAX(({Q1}/{K})^2,7)",
        "psi")
des.add("P1b", "Pressure at remote sprinkler, bar", "P_1b", "={P1}/14.5", "bar")
des.add("P1k", "Pressure at remote sprinkler, kPa", "P_1k", "={P1}*6.895", "kPa")
des.add("P1b2", "Pressure at remote sprinkler, bar (for the metric submittal)", "P_1b2",
        "={P1}*6.895", "bar",
        planted=("unit-scale", "psi × 6.895 gives kPa, typed as bar: 100 too large"))
des.add("Qs", "Sprinkler demand (from Heads)", "Q_s", "=Heads!D18", "gpm")
des.add("d", "Cross main inside diameter (3 in Sch 40)", "d", 3.068, "in")
des.add("dmm", "Cross main inside diameter, mm", "d_mm", "={d}*25.4", "mm")
des.add("C", "Hazen–Williams C", "C", 120, "-")
des.add("pf", "Friction loss per foot", "p_f", "=4.52*{Qs}^1.85/({C}^1.85*{d}^4.87)", "psi/ft")
des.add("pf2", "Friction loss per foot (from metric ID)", "p_f2",
        "=4.52*{Qs}^1.85/({C}^1.85*{dmm}^4.87)", "psi/ft",
        planted=("unit-scale", "US Hazen–Williams with the diameter in mm"))
des.add("pfm", "Friction loss per metre", "p_fm",
        "=6.05*10^5*({Qs}*3.785)^1.85/({C}^1.85*{dmm}^4.87)", "bar/m")
des.add("L", "Cross main and riser length", "L", 85, "ft")
des.add("Le", "Fittings, equivalent length", "L_e", 24, "ft")
des.add("pl", "Friction loss, cross main and riser", "p_l", "={pf}*({L}+{Le})", "psi")
des.add("dz", "Elevation, test point to remote sprinkler", "dz", 6.1, "m")
des.add("dzf", "Elevation, ft", "dz_ft", "={dz}/0.3048", "ft")
des.add("pe", "Elevation loss", "p_e", "=0.433*{dzf}", "psi")
des.add("pe2", "Elevation loss (from drawing level)", "p_e2", "=0.433*{dz}", "psi",
        planted=("result-unit", "0.433 psi/ft times an elevation in m"))
des.add("peb", "Elevation loss, bar", "p_eb", "={dz}*0.0981", "bar")
des.add("Pr", "Pressure required at the test point", "P_req", "={P1}+{pl}+{pe}", "psi")
des.add("Qh", "Hose stream allowance", "Q_h", 250, "gpm")
des.add("Qhl", "Hose stream allowance, L/min", "Q_hl", "={Qh}*3.785", "L/min")
des.add("Qt", "Total demand", "Q_t", "={Qs}+{Qh}", "gpm")
des.add("Qt2", "Total demand (metric hose figure)", "Q_t2", "={Qs}+{Qhl}", "gpm",
        planted=("unit-scale", "hose allowance in L/min added to gpm"))
des.add("Qtl", "Total demand, L/min", "Q_tl", "={Qt}*3.785", "L/min")
des.add("S", "Hydrant test: static pressure", "S", 75, "psi")
des.add("R", "Hydrant test: residual pressure", "R", 55, "psi")
des.add("QF", "Hydrant test: flow at residual", "Q_F", 1000, "gpm")
des.add("Pa", "Supply pressure available at total demand", "P_av",
        "={S}-({S}-{R})*({Qt}/{QF})^1.85", "psi")
des.add("Pab", "Supply pressure available, bar", "P_avb", "={Pa}/14.5", "bar")
des.add("mg", "Safety margin", "margin", "={Pa}-{Pr}", "psi")
des.add("res", "Supply adequate?", "result", "=IF({mg}>=10,\"OK\",\"INADEQUATE\")")
des.add("res2", "Supply adequate? (metric sheet)", "result2",
        "=IF({Pab}>={Pr}+10,\"OK\",\"INADEQUATE\")",
        planted=("unit-scale", "available pressure in bar compared with required psi"))
des.add("t", "Required supply duration", "t", 60, "min")
des.add("Vw", "Water required", "V_w", "={Qt}*{t}", "gal")
des.add("Vm", "Water required, m³", "V_m", "={Vw}*0.003785", "m³")
des.add("Vm2", "Water required, m³ (tank schedule)", "V_m2", "={Vw}/0.003785", "m³",
        planted=("unit-scale", "gal to m³ divided by 0.003785: wrong way round"))
des.add("Vml", "Water required, m³ (metric route)", "V_ml", "={Qtl}*{t}/1000", "m³")
DESIGN = des.finish()
P1_ref = des.ref("P1").replace("!C", "!$C$")

HEADS = {
    "A1": "Brookfield warehouse mezzanine: flowing sprinklers, node by node",
    "A2": ("Sources: Q = K√P, NFPA 13 (2022); 1 bar = 14.5 psi and 1 gal = 3.785 L, NIST SP 811 "
           "(2008). Node pressures after the balancing iteration of the hydraulic program "
           "(invented)."),
    "A4": "Node", "B4": "K [gpm/psi^0.5]", "C4": "Pressure [psi]", "D4": "Flow [gpm]",
    "E4": "Pressure [bar]", "F4": "Flow [L/min]",
    "A18": "Total / max",
    "C18": "=MAX(C5:C17)", "D18": "=SUM(D5:D17)", "E18": "=MAX(E5:E17)", "F18": "=SUM(F5:F17)",
}
pressures = [None, 19.1, 20.4, 22.6, 25.3, 18.9, 19.6, 21.0, 23.1, 19.8, 20.7, 22.3, 24.6]
for i, r in enumerate(range(5, 18)):
    HEADS[f"A{r}"] = f"S{i + 1}"
    HEADS[f"B{r}"] = 5.6
    HEADS[f"C{r}"] = f"={P1_ref}" if i == 0 else pressures[i]
    HEADS[f"D{r}"] = f"=B{r}*SQRT(C{r})"
    HEADS[f"E{r}"] = f"=C{r}/14.5"
    HEADS[f"F{r}"] = f"=D{r}*3.785"
HEADS["D7"] = "=B7*C7"          # planted: K × P, square root forgotten
HEADS["E8"] = "=C8*14.5"        # planted: psi to bar multiplied by 14.5

SPRINKLER = {
    "trade": "fire protection: sprinkler hydraulic calculation (NFPA 13 method)",
    "sheets": [("Design", DESIGN), ("Heads", HEADS)],
    "planted": {**des.planted,
                "Heads!D7": ("result-unit", "K × P with the square root forgotten"),
                "Heads!E8": ("unit-scale", "psi to bar multiplied by 14.5: wrong way round")},
}

# --------------------------------------------------------------------------------------------
# Book 4: crude oil tank farm inventory (bbl, m³, ft and mm gauges, °API, VCF to 15 °C / 60 °F)
# --------------------------------------------------------------------------------------------
GAUGES = {
    "A1": "Saltmarsh crude terminal: closing gauges, 31 March (invented terminal)",
    "A2": ("Sources: API MPMS Ch. 3.1A (manual gauging: innage and free water); vertical "
           "cylinder volume π·D²·h/4 in place of each tank's capacity table for this estimate "
           "(common practice); NIST SP 811 (2008) App. B.8 (1 ft = 0.3048 m; 1 bbl = "
           "0.158987 m³)."),
    "A4": "Tank", "B4": "Diameter [m]", "C4": "Innage [ft]", "D4": "Innage [mm]",
    "E4": "Free water [mm]", "F4": "Temperature [°C]", "G4": "TOV [m³]", "H4": "Free water [m³]",
    "I4": "TOV [bbl]",
    "A11": "Total / max",
    "F11": "=MAX(F5:F10)", "G11": "=SUM(G5:G10)", "H11": "=SUM(H5:H10)", "I11": "=SUM(I5:I10)",
}
for r, (tank, dia, ft, fw, temp) in enumerate([
        ("T-101", 48.8, 38.42, 120, 24.5), ("T-102", 48.8, 12.75, 85, 23.1),
        ("T-103", 54.9, 44.08, 140, 26.2), ("T-104", 54.9, 29.50, 95, 25.4),
        ("T-105", 36.6, 20.17, 60, 22.8), ("T-106", 36.6, 33.92, 110, 24.0)], start=5):
    GAUGES[f"A{r}"] = tank
    GAUGES[f"B{r}"] = dia
    GAUGES[f"C{r}"] = ft
    GAUGES[f"D{r}"] = f"=C{r}*304.8"
    GAUGES[f"E{r}"] = fw
    GAUGES[f"F{r}"] = temp
    GAUGES[f"G{r}"] = f"=PI()*B{r}^2/4*D{r}/1000"
    GAUGES[f"H{r}"] = f"=PI()*B{r}^2/4*E{r}/1000"
    GAUGES[f"I{r}"] = f"=G{r}/0.158987"
GAUGES["D6"] = "=C6*0.3048"                # planted: ft to m factor into a mm column
GAUGES["G9"] = "=PI()*B9^2/4*D9"           # planted: innage in mm used as m

OIL_SRC = ("Sources: API MPMS Ch. 11.1 (2004) / ASTM D1250 and ISO 91: CTL = exp(−α·ΔT·(1 + "
           "0.8·α·ΔT)), α = K0/ρ²; crude oil K0 = 613.9723 (kg/m³)²/K at 15 °C (Table 54A): "
           "from memory, check against the standard. °API = 141.5/SG − 131.5 (API MPMS Ch. "
           "11.1); water at 60 °F = 999.016 kg/m³ (API MPMS Ch. 11.1). NSV = GSV·(1 − S&W), API "
           "MPMS Ch. 12.1. NIST SP 811 (2008) App. B.8 (1 bbl = 0.158987 m³; 1 m³ = 6.2898 bbl). "
           "Hydrostatic ρ·g·h, any fluid mechanics text. Safe fill height from the tank's "
           "calibration record (invented).")
inv = ItemSheet("Ticket", "Saltmarsh crude terminal: stock ticket for one tank (invented "
                "terminal)", OIL_SRC)
inv.add("tank", "Tank", "tank", "T-103")
inv.add("api", "API gravity at 60 °F (lab)", "API", 32.4, "°API")
inv.add("SG", "Relative density 60/60 °F", "SG", "=141.5/({api}+131.5)", "-")
inv.add("rho", "Density at 15 °C", "rho_15", "={SG}*999.016", "kg/m³")
inv.add("T", "Tank temperature", "T", "=VLOOKUP({tank},Gauges!A5:I10,6,FALSE)", "°C")
inv.add("tov", "Total observed volume", "TOV", "=VLOOKUP({tank},Gauges!A5:I10,7,FALSE)", "m³")
inv.add("fw", "Free water", "FW", "=VLOOKUP({tank},Gauges!A5:I10,8,FALSE)", "m³")
inv.add("gov", "Gross observed volume", "GOV", "={tov}-{fw}", "m³")
inv.add("K0", "Expansion constant K0 (crude oil)", "K0", 613.9723, "(kg/m³)²/K")
inv.add("a", "Thermal expansion coefficient at 15 °C", "alpha", "={K0}/{rho}^2", "1/K")
inv.add("dT", "Temperature difference from 15 °C", "dT", "={T}-15", "K")
inv.add("ctl", "Volume correction factor (CTL)", "CTL",
        "=ROUND(EXP(-{a}*{dT}*(1+0.8*{a}*{dT})),5)", "-")
inv.add("ctl2", "Volume correction factor (quick)", "CTL2",
        "=EXP(-{a}*{T}*(1+0.8*{a}*{T}))", "-",
        planted=("offset-scale", "CTL from the tank temperature in °C, not T − 15"))
inv.add("gsv", "Gross standard volume at 15 °C", "GSV", "={gov}*{ctl}", "m³")
inv.add("gsvb", "Gross standard volume, bbl", "GSV_bbl", "={gsv}/0.158987", "bbl")
inv.add("gsvb2", "Gross standard volume, bbl (shipping note)", "GSV_bbl2", "={gsv}*0.158987",
        "bbl", planted=("unit-scale", "m³ to bbl multiplied by 0.158987: wrong way round"))
inv.add("sw", "Sediment and water", "SW", 0.35, "%")
inv.add("nsv", "Net standard volume", "NSV", "={gsv}*(1-{sw}/100)", "m³")
inv.add("nsv2", "Net standard volume (rev. 1)", "NSV2", "={gsv}*(1-{sw})", "m³",
        planted=("unit-scale", "0.35 % used as 0.35 in (1 − S&W)"))
inv.add("nsvb", "Net standard volume, bbl", "NSV_bbl", "={nsv}*6.2898", "bbl")
inv.add("mt", "Mass in vacuum", "m", "={nsv}*{rho}/1000", "t")
inv.add("mt2", "Mass in vacuum (for the B/L)", "m2", "={nsv}*{rho}", "t",
        planted=("unit-scale", "m³ × kg/m³ gives kg, typed as t: 1000 too large"))
inv.add("TF", "Tank temperature, °F", "T_F", "={T}*1.8+32", "°F")
inv.add("dTF", "Temperature difference from 60 °F", "dT_F", "={TF}-60", "Δ°F")
inv.add("dTF2", "Temperature difference from 60 °F (US table)", "dT_F2", "=({T}-15)*1.8+32",
        "Δ°F", planted=("offset-scale", "a temperature difference converted with +32"))
inv.add("D", "Tank diameter", "D", "=VLOOKUP({tank},Gauges!A5:I10,2,FALSE)", "m")
inv.add("h", "Innage", "h", "=VLOOKUP({tank},Gauges!A5:I10,4,FALSE)", "mm")
inv.add("sfh", "Safe fill height", "SFH", 15.8, "m")
inv.add("ull", "Available ullage volume", "V_u", "=PI()*{D}^2/4*({sfh}-{h}/1000)", "m³")
inv.add("ull2", "Available ullage volume (receipt plan)", "V_u2", "=PI()*{D}^2/4*({sfh}-{h})",
        "m³", planted=("unit-scale", "safe fill height in m less an innage in mm"))
inv.add("ullb", "Available ullage, bbl", "V_ub", "={ull}/0.158987", "bbl")
inv.add("rate", "Receipt rate from the ship", "q_r", 8000, "bbl/h")
inv.add("tf", "Time to safe fill height", "t_f", "={ullb}/{rate}", "h")
inv.add("g", "Gravity", "g", 9.81, "m/s²")
inv.add("pb", "Hydrostatic pressure on the tank bottom", "p_b", "={rho}*{g}*{h}/1000/1000",
        "kPa(g)")
inv.add("tot", "Tank farm TOV (all tanks)", "TOV_all", "=SUM(Gauges!G5:G10)", "m³")
inv.add("totb", "Tank farm TOV, bbl", "TOV_allb", "={tot}*6.2898", "bbl")
TICKET = inv.finish()

TANKFARM = {
    "trade": "oil terminal: tank gauging, volume correction and stock ticket",
    "sheets": [("Ticket", TICKET), ("Gauges", GAUGES)],
    "planted": {**inv.planted,
                "Gauges!D6": ("unit-scale", "ft × 0.3048 gives m, column is mm: 1000 too small"),
                "Gauges!G9": ("unit-scale", "innage in mm used as m: 1000 too large")},
}

BOOKS = {"cold-room": COLD, "boiler-plant": BOILER, "sprinkler-hydraulics": SPRINKLER,
         "tank-farm": TANKFARM}


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
    for stem, s in summary.items():
        print(f"{stem}: {len(s['planted'])} planted, {len(s['correct'])} correct formula cells")


if __name__ == "__main__":
    main()
