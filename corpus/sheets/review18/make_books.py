#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review69), written with the
standard zipfile module (corpus/sheets/xlsx_writer.py, shared by the review books).

Trades: a pharmaceutical HVAC room schedule (m³/h and cfm, Pa and in. w.c.); a cooling tower
make-up and blowdown sheet (m³/h and gpm, µS/cm, mg/L, drift %); a biogas plant's gas yield
sheet (kg/d of VS, Nm³ CH4/kg VS, Nm³/d, %, MWh/yr); a car park's ventilation sheet (CO in g/h,
ppm and mg/m³, m³/s and cfm, kW).

Invented scenarios: every company, site, room, reading and catalogue figure is invented, for
demonstration only. The formulas and published factors are the trade's own, with sources named
in a text cell at the top of each sheet. A dimensionally consistent formula can still be wrong;
this check does not replace independent review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
should stay clean. The biogas book has a sidecar (biogas-plant.cells.plumb) for the trade's
'Nm³ CH4/kg VS' and 'kg VS/(m³·d)', which plumb does not read as written.

Run: python3 make_books.py  ->  *.xlsx, *.cells.plumb, *.expect, expect.json in this folder
"""
import json
import os
import re

import sys
sys.path.insert(0, os.path.dirname(os.path.dirname(os.path.abspath(__file__))))
from xlsx_writer import write_xlsx  # noqa: E402 (the shared writer in corpus/sheets)

HERE = os.path.dirname(os.path.abspath(__file__))

CAUTION = ("Invented scenario: names, sizes and readings are invented, for demonstration only. "
           "A dimensionally consistent formula can still be wrong; this check does not replace "
           "independent review under local codes and licensed practice.")


class ItemSheet:
    """An 'Item | Symbol | Value | Unit' sheet. Formulas name other rows as {key}; planted rows
    carry (rule, what)."""

    def __init__(self, name, title, sources, first_row=5):
        self.name = name
        self.cells = {"A1": title, "A2": sources, "A3": CAUTION,
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
        return f"{self.name}!$C${self.keys[key]}"

    def cell(self, key):
        return f"{self.name}!C{self.keys[key]}"

    def finish(self):
        def sub(m):
            return f"C{self.keys[m.group(1)]}"

        for r, value in self.pending:
            if isinstance(value, str) and value.startswith("="):
                value = re.sub(r"\{([A-Za-z0-9_]+)\}", sub, value)
            self.cells[f"C{r}"] = value
        return self.cells


def table(title, sources, headings, rows, first_row=5, caution=False):
    """A table: title in A1, sources in A2, headings in row first_row-1, data from first_row."""
    cells = {"A1": title, "A2": sources}
    if caution:
        cells["A3"] = CAUTION
    for i, h in enumerate(headings):
        cells[f"{chr(65 + i)}{first_row - 1}"] = h
    for r, row in enumerate(rows, start=first_row):
        for i, v in enumerate(row):
            if v is not None:
                cells[f"{chr(65 + i)}{r}"] = v
    return cells


# --------------------------------------------------------------------------------------------
# Book 1: pharmaceutical HVAC room schedule (m³, 1/h, m³/h, cfm, L/s, Pa, in. w.c., °C, W, kW)
# --------------------------------------------------------------------------------------------
HVAC_SRC = ("Sources: EU GMP Annex 1 (2022) §4.29: 10–15 Pa between adjacent rooms of different "
            "grades (guidance value); air change rates by grade after ISPE Baseline Guide Vol. 3, "
            "Sterile Product Manufacturing Facilities (2nd ed., 2011) (from memory: B 40, C 20, "
            "D 12, CNC 6 per hour, the company's own minimums); door-gap leakage "
            "Q = C·A·√(2·Δp/ρ), the orifice equation (F. M. White, Fluid Mechanics, 8th ed., "
            "ch. 6; C = 0.65 common practice) and its I-P form Q = 2610·A·√Δp with cfm, ft² and "
            "in. w.c. (ASHRAE Handbook—HVAC Applications (2019), 'Fire and smoke control', from "
            "memory); ρ = p/(R·T), R = 287.05 J/(kg·K) for dry air (from memory); sensible heat "
            "1.2·q·ΔT (W, L/s, K) and 1.08·cfm·ΔT (Btu/h, °F) (ASHRAE Handbook—Fundamentals "
            "(2021), from memory); fan shaft power q·Δp/η and bhp = cfm·in. w.c./(6356·η) "
            "(common practice); NIST SP 811 (2008) App. B.8: 1 cfm = 1.699 m³/h, 1 in. w.c. = "
            "249.1 Pa, 1 m² = 10.764 ft². Duct leakage 120 cfm: vendor figure (invented).")

GRADES = table(
    "Harrowgate Biologics: room grades and company minimum air change rates (invented scenario)",
    "Sources: see the AHU sheet. Minimum air changes from memory of ISPE guidance; Δp per EU GMP "
    "Annex 1 (2022) §4.29.",
    ["Grade", "Min. air changes [1/h]", "Min. Δp to lower grade [Pa]"],
    [["B", 40, 10], ["C", 20, 10], ["D", 12, 10], ["CNC", 6, 0]])

ROOMS = table(
    "Harrowgate Biologics, fill-finish suite 2: room schedule (invented scenario)",
    HVAC_SRC,
    ["Room", "Name", "Grade", "Area [m²]", "Height [m]", "Volume [m³]", "Air changes [1/h]",
     "Supply [m³/h]", "Supply [cfm]", "Room pressure [Pa]", "Room pressure [in. w.c.]",
     "Δp to next room [Pa]"],
    [], caution=True)
for r, (no, name, grade, area, pres) in enumerate([
        ("R101", "Aseptic filling", "B", 36, 45), ("R102", "Personnel airlock B/C", "B", 8, 32),
        ("R103", "Solution preparation", "C", 30, 20),
        ("R104", "Washing and sterilisation", "D", 24, 10),
        ("R105", "Grade D corridor", "D", 40, 10)], start=5):
    ROOMS.update({f"A{r}": no, f"B{r}": name, f"C{r}": grade, f"D{r}": area, f"E{r}": 3.0,
                  f"F{r}": f"=D{r}*E{r}",
                  f"G{r}": f"=VLOOKUP(C{r},Grades!$A$5:$C$8,2,FALSE)",
                  f"H{r}": f"=F{r}*G{r}", f"I{r}": f"=H{r}/1.699", f"J{r}": pres,
                  f"K{r}": f"=J{r}/249.1", f"L{r}": f"=J{r}-J{r + 1}"})
ROOMS["L9"] = "=J9"          # the corridor against the unclassified area outside, at 0 Pa
ROOMS.update({"A10": "Total", "F10": "=SUM(F5:F9)", "H10": "=SUM(H5:H9)", "I10": "=SUM(I5:I9)"})
ROOMS["I6"] = "=H6*1.699"    # planted
ROOMS["H7"] = "=F7*G7/60"    # planted
ROOMS["L8"] = "=J8-K9"       # planted

ahu = ItemSheet("AHU", "Harrowgate Biologics, fill-finish suite 2: AHU-2 air balance and fan "
                "(invented scenario)", HVAC_SRC)
ahu.add("dp", "Pressure difference across door R101 → R102", "Δp_d", "=Rooms!L5", "Pa")
ahu.add("Cd", "Door gap flow coefficient", "C_d", 0.65, "-")
ahu.add("Ag", "Door gap area (closed door, four edges)", "A_g", 0.018, "m²")
ahu.add("pb", "Barometric pressure (site)", "p_b", 101325, "Pa")
ahu.add("Ra", "Gas constant of dry air", "R_a", 287.05, "J/(kg·K)")
ahu.add("Tr", "Room air temperature", "T_r", 20, "°C")
ahu.add("rho", "Air density at room conditions", "ρ", "={pb}/({Ra}*({Tr}+273.15))", "kg/m³")
ahu.add("rho2", "Air density (rev. A, quick)", "ρ_A", "={pb}/({Ra}*{Tr})", "kg/m³",
        planted=("offset-scale", "room temperature in °C where the gas law wants K"))
ahu.add("ql", "Door leakage flow", "q_d", "={Cd}*{Ag}*SQRT(2*{dp}/{rho})", "m³/s")
ahu.add("ql2", "Door leakage flow (for the balance sheet)", "q_dL",
        "={Cd}*{Ag}*SQRT(2*{dp}/{rho})", "L/s",
        planted=("unit-scale", "the m³/s formula under an L/s unit: 1000 too small"))
ahu.add("qlc", "Door leakage flow, cfm (I-P check)", "q_dc",
        "=2610*{Ag}*10.764*SQRT(Rooms!K5-Rooms!K6)", "cfm")
ahu.add("chk", "Cascade check R101 → R102", "check", '=IF({dp}>=10,"OK","LOW")')
ahu.add("qr", "Supply to rooms (from Rooms)", "q_r", "=Rooms!H10", "m³/h")
ahu.add("qlh", "Door leakage make-up", "q_dh", "={ql}*3600", "m³/h")
ahu.add("qdl", "Duct leakage allowance (vendor figure)", "q_dl", 120, "cfm")
ahu.add("qs2", "AHU supply airflow (sum of the three lines above)", "q_s2", "=SUM({qr}:{qdl})",
        "m³/h", planted=("mixed-range", "SUM over m³/h cells and the duct leakage in cfm"))
ahu.add("qs", "AHU supply airflow", "q_s", "={qr}+{qlh}+{qdl}*1.699", "m³/h")
ahu.add("fa", "Fresh air fraction", "x_fa", 20, "%")
ahu.add("qfa", "Fresh air flow", "q_fa", "={qs}*{fa}/100", "m³/h")
ahu.add("qfa2", "Fresh air flow (rev. A)", "q_faA", "={qs}*{fa}", "m³/h",
        planted=("unit-scale", "20 % used as 20: 100 too large"))
ahu.add("qss", "AHU supply airflow, m³/s", "q_ss", "={qs}/3600", "m³/s")
ahu.add("qsl", "AHU supply airflow, L/s", "q_sl", "={qs}/3.6", "L/s")
ahu.add("qsc", "AHU supply airflow, cfm", "q_sc", "={qs}/1.699", "cfm")
ahu.add("Ts", "Supply air temperature", "T_s", 14, "°C")
ahu.add("dT", "Room − supply temperature difference", "ΔT", "={Tr}-{Ts}", "K")
ahu.add("Qs", "Sensible cooling by the supply air", "Q_s", "=1.2*{qsl}*{dT}", "W")
ahu.add("dTF", "Temperature difference, °F", "ΔT_F", "={dT}*1.8", "Δ°F")
ahu.add("QsB", "Sensible cooling, Btu/h", "Q_sB", "=1.08*{qsc}*{dTF}", "Btu/h")
ahu.add("QsB2", "Sensible cooling, Btu/h (US office check)", "Q_sB2", "=1.08*{qsc}*{dT}",
        "Btu/h", planted=("unit-scale", "ΔT in K in the 1.08 formula, which wants °F: 1.8 too "
                                        "small"))
ahu.add("dpf", "Fan total pressure (HEPA at mid-life)", "Δp_f", 1400, "Pa")
ahu.add("ef", "Fan total efficiency", "η_f", 68, "%")
ahu.add("Pf", "Fan shaft power", "P_f", "={qss}*{dpf}/({ef}/100)/1000", "kW")
ahu.add("Pf2", "Fan shaft power (hand calc)", "P_f2", "={qss}*{dpf}/({ef}/100)", "kW",
        planted=("unit-scale", "m³/s × Pa gives W, typed as kW: 1000 too large"))
ahu.add("dpw", "Fan total pressure, in. w.c.", "Δp_fw", "={dpf}/249.1", "in. w.c.")
ahu.add("bhp", "Fan brake horsepower", "P_bhp", "={qsc}*{dpw}/(6356*{ef}/100)", "hp")
AHU = ahu.finish()

HVAC = {
    "trade": "pharmaceutical HVAC: cleanroom room schedule, pressure cascade and AHU",
    "sheets": [("Rooms", ROOMS), ("AHU", AHU), ("Grades", GRADES)],
    "planted": {"Rooms!I6": ("unit-scale", "m³/h to cfm multiplied by 1.699: wrong way round"),
                "Rooms!H7": ("unit-scale", "m³ × 1/h is already m³/h; the /60 makes it 60 too "
                                           "small"),
                "Rooms!L8": ("unit-scale", "a room pressure in Pa less the next room's in in. "
                                           "w.c. (one column off)"),
                **ahu.planted},
}

# --------------------------------------------------------------------------------------------
# Book 2: cooling tower make-up and blowdown (m³/h, gpm, L/s, µS/cm, mg/L, %, kW, Btu/h)
# --------------------------------------------------------------------------------------------
CT_SRC = ("Sources: evaporation ≈ 0.00085·R·ΔT (gpm, °F), Perry's Chemical Engineers' Handbook "
          "(8th ed., 2008) §12 (from memory); heat balance E = R·c_p·ΔT·f/h_fg with f the share "
          "of heat rejected by evaporation, 80–90 % (common practice); M = E + B + D and "
          "B = E/(C − 1) − D, C the ratio of tower to make-up concentration (Nalco Water "
          "Handbook (3rd ed., 2009), from memory); drift 0.005 % of circulation for modern "
          "eliminators (CTI, from memory); silica limit 150 mg/L as SiO2 and TDS ≈ 0.65 × "
          "conductivity in µS/cm (common practice); cooling tower ton = 15 000 Btu/h (CTI, from "
          "memory); 500·gpm·ΔT (Btu/h, °F) and 4.19·q·ΔT (kW, L/s, K) for water, lb/d = mgd × "
          "mg/L × 8.34 (common practice); h_fg = 2430 kJ/kg at 30 °C and ρ = 995.7 kg/m³ (from "
          "memory of steam tables); pump power ρ·g·Q·H/η (any fluid mechanics text); NIST SP 811 "
          "(2008) App. B.8: 1 m³/h = 4.403 gpm, 1 gpm = 0.2271 m³/h = 0.0631 L/s.")
ct = ItemSheet("Tower", "Norcastle Foods, chiller plant CT-1/CT-2: cooling tower water balance "
               "(invented scenario)", CT_SRC)
ct.add("R", "Circulating water flow", "R", 1200, "m³/h")
ct.add("Rg", "Circulating water flow, gpm", "R_g", "={R}*4.403", "gpm")
ct.add("Rg2", "Circulating water flow, gpm (vendor data sheet)", "R_g2", "={R}*0.2271", "gpm",
       planted=("unit-scale", "m³/h to gpm multiplied by 0.2271 (the gpm → m³/h factor): "
                              "wrong way round"))
ct.add("Th", "Hot water temperature", "T_h", 37, "°C")
ct.add("Tc", "Cold water temperature", "T_c", 29, "°C")
ct.add("Twb", "Design wet bulb temperature", "T_wb", 24.5, "°C")
ct.add("rng", "Cooling range", "ΔT", "={Th}-{Tc}", "K")
ct.add("app", "Approach to wet bulb", "ΔT_a", "={Tc}-{Twb}", "K")
ct.add("rngF", "Cooling range, °F", "ΔT_F", "={rng}*1.8", "Δ°F")
ct.add("Q", "Heat rejected", "Q", "={R}/3.6*4.19*{rng}", "kW")
ct.add("QB", "Heat rejected, Btu/h", "Q_B", "=500*{Rg}*{rngF}", "Btu/h")
ct.add("QB2", "Heat rejected, Btu/h (site sheet)", "Q_B2", "=500*{Rg}*{rng}", "Btu/h",
       planted=("unit-scale", "range in K in the 500 formula, which wants °F: 1.8 too small"))
ct.add("Qt", "Heat rejected, cooling tower tons", "Q_t", "={QB}/15000", "tons")
ct.add("cp", "Specific heat of water", "c_p", 4.18, "kJ/(kg·K)")
ct.add("hfg", "Latent heat of evaporation at 30 °C", "h_fg", 2430, "kJ/kg")
ct.add("fe", "Share of heat rejected by evaporation", "f_e", 85, "%")
ct.add("E", "Evaporation (heat balance)", "E", "={R}*{cp}*{rng}/{hfg}*{fe}/100", "m³/h")
ct.add("EL", "Evaporation, L/s", "E_L", "={E}/3.6", "L/s")
ct.add("Eg", "Evaporation, gpm", "E_g", "={E}*4.403", "gpm")
ct.add("ECm", "Make-up water conductivity (Log average)", "EC_m", "=Log!B11", "µS/cm")
ct.add("ECt", "Tower water conductivity (Log average)", "EC_t", "=Log!C11", "µS/cm")
ct.add("C", "Cycles of concentration (conductivity)", "C", "={ECt}/{ECm}", "-")
ct.add("TDS", "Tower water TDS (estimated from conductivity)", "TDS", "={ECt}*0.65", "mg/L")
ct.add("Si", "Make-up silica as SiO2", "Si_m", 24, "mg/L")
ct.add("Sil", "Silica limit in circulating water", "Si_max", 150, "mg/L")
ct.add("Cmax", "Maximum cycles by silica", "C_max", "={Sil}/{Si}", "-")
ct.add("chk", "Cycles check", "check", '=IF({C}>{Cmax},"BLOW DOWN MORE","OK")')
ct.add("Cd", "Design cycles of concentration", "C_d", "=MIN({Cmax},6)", "-")
ct.add("dr", "Drift loss (eliminator guarantee)", "x_d", 0.005, "%")
ct.add("Er", "Evaporation (rule of thumb)", "E_r", "=0.00085*{Rg}*{rngF}", "gpm")
ct.add("B", "Blowdown", "B", "={E}/({Cd}-1)-{D}", "m³/h")
ct.add("D", "Drift", "D", "={R}*{dr}/100", "m³/h")
ct.add("M", "Make-up water", "M", "={E}+{B}+{D}", "m³/h")
ct.add("M2", "Make-up water (check: sum of the three lines above)", "M_2", "=SUM({Er}:{D})",
       "m³/h", planted=("mixed-range", "SUM over m³/h cells and the rule-of-thumb evaporation "
                                       "in gpm"))
ct.add("D2", "Drift (rev. 0)", "D_2", "={R}*{dr}", "m³/h",
       planted=("unit-scale", "0.005 % used as 0.005: 100 too large"))
ct.add("BL", "Blowdown (for the drain sizing)", "B_L", "={E}/({Cd}-1)-{D}", "L/s",
       planted=("unit-scale", "the m³/h formula under an L/s unit: 3.6 too small"))
ct.add("Mg", "Make-up water, gpm", "M_g", "={M}*4.403", "gpm")
ct.add("ML", "Make-up water, L/s", "M_L", "={Mg}*0.0631", "L/s")
ct.add("hrs", "Operating hours", "t_op", 6000, "h/yr")
ct.add("Ma", "Annual make-up water", "M_a", "={M}*{hrs}", "m³/yr")
ct.add("dose", "Inhibitor dose (on blowdown)", "c_i", 12, "mg/L")
ct.add("inh", "Inhibitor consumption", "m_i", "={B}*24*{dose}/1000", "kg/d")
ct.add("inh2", "Inhibitor consumption (vendor form)", "m_i2", "={B}*24*{dose}", "kg/d",
       planted=("unit-scale", "m³/d × mg/L gives g/d, typed as kg/d: 1000 too large"))
ct.add("Bg", "Blowdown, gpm", "B_g", "={B}*4.403", "gpm")
ct.add("inhl", "Inhibitor consumption, lb/d", "m_il", "={Bg}*1440/1000000*{dose}*8.34", "lb/d")
ct.add("H", "Circulating pump head", "H", 24, "m")
ct.add("rho", "Water density at 30 °C", "ρ", 995.7, "kg/m³")
ct.add("g", "Gravity", "g", 9.81, "m/s²")
ct.add("ep", "Pump efficiency", "η_p", 82, "%")
ct.add("Pp", "Circulating pump shaft power", "P_p", "={rho}*{g}*{R}/3600*{H}/({ep}/100)/1000",
       "kW")
ct.add("Pp2", "Circulating pump shaft power (hand calc)", "P_p2",
       "={rho}*{R}/3600*{H}/({ep}/100)/1000", "kW",
       planted=("result-unit", "ρ·Q·H/η with g left out"))
ct.add("Pfan", "Tower fan motors (2 × 37 kW)", "P_fan", 74, "kW")
ct.add("Phe", "Basin heaters (2 × 6000 W)", "P_he", 12000, "W")
ct.add("Pt", "Electrical load of the cooling water system", "P_t", "={Pp}+{Pfan}+{Phe}/1000",
       "kW")
ct.add("Pt2", "Electrical load (first issue)", "P_t2", "={Pp}+{Pfan}+{Phe}", "kW",
       planted=("unit-scale", "basin heaters in W added to kW"))
TOWER = ct.finish()

LOG = table(
    "Norcastle Foods CT-1/CT-2: monthly water log (invented readings)",
    "Sources: conductivity from the plant's on-line meters and monthly meter readings "
    "(invented); cycles = tower/make-up conductivity and make-up/blowdown volume (Nalco Water "
    "Handbook (3rd ed., 2009), from memory).",
    ["Month", "Make-up EC [µS/cm]", "Tower EC [µS/cm]", "Cycles [-]", "Make-up metered [m³]",
     "Blowdown metered [m³]", "Evaporation and drift [m³]"], [])
for r, (mon, ecm, ect, mu, bd) in enumerate([
        ("Jan", 455, 2010, 5200, 1150), ("Feb", 470, 2090, 5600, 1230),
        ("Mar", 448, 2150, 7100, 1480), ("Apr", 462, 2240, 8300, 1790),
        ("May", 475, 2180, 9400, 2080), ("Jun", 458, 2120, 10100, 2260)], start=5):
    LOG.update({f"A{r}": mon, f"B{r}": ecm, f"C{r}": ect, f"D{r}": f"=C{r}/B{r}",
                f"E{r}": mu, f"F{r}": bd, f"G{r}": f"=E{r}-F{r}"})
LOG.update({"A11": "Average / total", "B11": "=AVERAGE(B5:B10)", "C11": "=AVERAGE(C5:C10)",
            "D11": "=AVERAGE(D5:D10)", "E11": "=SUM(E5:E10)", "F11": "=SUM(F5:F10)",
            "G11": "=SUM(G5:G10)", "A12": "Cycles by metered volumes", "D12": "=E11/F11"})

TOWERBOOK = {
    "trade": "industrial cooling water: cooling tower evaporation, cycles, blowdown, make-up",
    "sheets": [("Tower", TOWER), ("Log", LOG)],
    "planted": dict(ct.planted),
}

# --------------------------------------------------------------------------------------------
# Book 3: biogas plant gas yield (t/d, kg/d of TS and VS, Nm³/kg, Nm³/d, %, mbar, MWh/yr, kW)
# --------------------------------------------------------------------------------------------
BG_SRC = ("Sources: FNR, Guide to Biogas—From Production to Use (5th ed., 2010): substrate TS, "
          "VS and methane yields (from memory; the table's values are rounded and illustrative); "
          "methane lower heating value 9.97 kWh/Nm³ (from memory); DIN 1343 normal conditions "
          "0 °C and 1013.25 mbar; V_N = V·(p/p_N)·(T_N/T) with absolute p and T (ideal gas, any "
          "thermodynamics text); OLR = VS load/V, up to 3.5 kg VS/(m³·d) in a mesophilic stirred "
          "tank, and HRT = V/feed volume (common practice); "
          "CHP efficiencies 40 % electrical and 44 % thermal (common practice); feed heating "
          "m·c·ΔT with c = 4.0 kJ/(kg·K) for slurry and silage mixes (from memory); NIST SP 811 "
          "(2008) App. B.8: 1 kWh = 3.6 MJ; 1 atm = 1.01325 bar; a year of 365 d, 8760 h.")
SUBSTRATES = table(
    "Ashby Moor AD plant: substrate data used for design (invented scenario)",
    "Sources: see the Gas sheet (FNR Guide to Biogas, 5th ed., 2010, from memory; rounded, "
    "illustrative values).",
    ["Substrate", "TS [%]", "VS/TS [%]", "CH4 yield [Nm³ CH4/kg VS]", "CH4 content [%]"],
    [["Cattle slurry", 9, 80, 0.20, 55], ["Pig slurry", 6, 80, 0.25, 60],
     ["Maize silage", 33, 95, 0.34, 52], ["Grass silage", 35, 90, 0.31, 54],
     ["Food waste", 25, 90, 0.42, 60]])
FEED = table(
    "Ashby Moor AD plant: daily feed and methane yield (invented scenario)", BG_SRC,
    ["Substrate", "Fresh mass [t/d]", "TS [%]", "VS/TS [%]", "TS [kg/d]", "VS [kg/d]",
     "CH4 yield [Nm³ CH4/kg VS]", "CH4 [Nm³/d]"], [], caution=True)
for r, (sub, fm) in enumerate([("Cattle slurry", 60), ("Maize silage", 18),
                               ("Grass silage", 8), ("Food waste", 10)], start=5):
    FEED.update({f"A{r}": sub, f"B{r}": fm,
                 f"C{r}": f"=VLOOKUP($A{r},Substrates!$A$5:$E$9,2,FALSE)",
                 f"D{r}": f"=VLOOKUP($A{r},Substrates!$A$5:$E$9,3,FALSE)",
                 f"E{r}": f"=B{r}*1000*C{r}/100", f"F{r}": f"=E{r}*D{r}/100",
                 f"G{r}": f"=VLOOKUP($A{r},Substrates!$A$5:$E$9,4,FALSE)",
                 f"H{r}": f"=F{r}*G{r}"})
FEED.update({"A9": "Total", "B9": "=SUM(B5:B8)", "E9": "=SUM(E5:E8)", "F9": "=SUM(F5:F8)",
             "H9": "=SUM(H5:H8)"})
FEED["E6"] = "=B6*1000*C6/100*1000"    # planted

gas = ItemSheet("Gas", "Ashby Moor AD plant: biogas, energy and digester checks (invented "
                "scenario)", BG_SRC)
gas.add("CH4", "Methane production (from Feed)", "V_CH4", "=Feed!H9", "Nm³/d")
gas.add("xm", "Methane content of biogas (design)", "x_CH4", 54, "%")
gas.add("Bg", "Biogas production", "V_bg", "={CH4}/({xm}/100)", "Nm³/d")
gas.add("Bg2", "Biogas production (first draft)", "V_bg2", "={CH4}/{xm}", "Nm³/d",
        planted=("unit-scale", "54 % used as 54: 100 too small"))
gas.add("Bgh", "Biogas production, hourly", "q_bg", "={Bg}/24", "Nm³/h")
gas.add("qm", "Biogas flow at the meter (actual, measured)", "q_m", 385, "m³/h")
gas.add("Tm", "Gas temperature at the meter", "T_m", 35, "°C")
gas.add("pg", "Gas pressure at the meter", "p_g", 25, "mbar(g)")
gas.add("pb", "Barometric pressure (site)", "p_b", 1008, "mbar")
gas.add("qN", "Measured biogas flow at normal conditions", "q_N",
        "={qm}*({pb}+{pg})/1013.25*273.15/({Tm}+273.15)", "Nm³/h")
gas.add("qN2", "Measured biogas flow at normal conditions (rev. A)", "q_N2",
        "={qm}*({pb}+{pg})/1013.25*273.15/{Tm}", "Nm³/h",
        planted=("offset-scale", "gas temperature in °C where the gas law wants K"))
gas.add("V", "Digester working volume (2 × 2900 m³)", "V_d", 5800, "m³")
gas.add("OLR", "Organic loading rate", "OLR", "=Feed!F9/{V}", "kg VS/(m³·d)")
gas.add("chk", "Loading check (mesophilic CSTR, up to 3.5)", "check",
        '=IF({OLR}>3.5,"REDUCE FEED","OK")')
gas.add("rf", "Feed density", "ρ_f", 1.0, "t/m³")
gas.add("qf", "Feed volume", "q_f", "=Feed!B9/{rf}", "m³/d")
gas.add("HRT", "Hydraulic retention time", "HRT", "={V}/{qf}", "d")
gas.add("qp", "Feed pump average rate", "q_p", "={qf}/24", "m³/h")
gas.add("HRT2", "Hydraulic retention time (from pump rate)", "HRT_2", "={V}/{qp}", "d",
        planted=("unit-scale", "m³ ÷ m³/h gives hours, typed as days: 24 too large"))
gas.add("LHV", "Methane lower heating value", "H_i", 9.97, "kWh/Nm³")
gas.add("E", "Primary energy in methane", "E", "={CH4}*{LHV}*365/1000", "MWh/yr")
gas.add("Egj", "Primary energy, GJ/yr", "E_GJ", "={E}*3.6", "GJ/yr")
gas.add("Egj2", "Primary energy, GJ/yr (report table)", "E_GJ2", "={E}/3.6", "GJ/yr",
        planted=("unit-scale", "MWh to GJ divided by 3.6: wrong way round"))
gas.add("hel", "CHP electrical efficiency", "η_el", 40, "%")
gas.add("hth", "CHP thermal efficiency", "η_th", 44, "%")
gas.add("Eel", "Electricity generated", "E_el", "={E}*{hel}/100", "MWh/yr")
gas.add("Pel", "Average electrical output", "P_el", "={Eel}*1000/8760", "kW")
gas.add("Eth", "Heat generated", "E_th", "={E}*{hth}/100", "MWh/yr")
gas.add("Ps", "Digester stirrers (4 × 5.5 kW)", "P_s", 22, "kW")
gas.add("Pfd", "Feed pumps and screw", "P_fd", 11, "kW")
gas.add("Pan", "Gas analyser, controls and lighting", "P_an", 850, "W")
gas.add("Ppar2", "Parasitic electrical load (sum of the three lines above)", "P_par2",
        "=SUM({Ps}:{Pan})", "kW",
        planted=("mixed-range", "SUM over kW cells and the controls in W"))
gas.add("Ppar", "Parasitic electrical load", "P_par", "={Ps}+{Pfd}+{Pan}/1000", "kW")
gas.add("Pnet", "Net electrical export", "P_net", "={Pel}-{Ppar}", "kW")
gas.add("Tf", "Feed temperature (winter)", "T_f", 8, "°C")
gas.add("Td", "Digester temperature", "T_d", 40, "°C")
gas.add("cf", "Specific heat of feed", "c_f", 4.0, "kJ/(kg·K)")
gas.add("Qh", "Heat to warm the feed", "Q_h", "=Feed!B9*1000/86400*{cf}*({Td}-{Tf})", "kW")
gas.add("Qh2", "Heat to warm the feed (first draft)", "Q_h2", "=Feed!B9*{cf}*({Td}-{Tf})", "kW",
        planted=("unit-scale", "t/d × kJ/(kg·K) × K with the 1000/86400 left out: 86.4 too "
                               "large"))
gas.add("rec", "Methane recovery of the upgrading unit (option B)", "x_rec", 98, "%")
gas.add("qbm", "Biomethane to grid (option B)", "q_bm", "={CH4}/24*{rec}/100", "Nm³/h")
gas.add("pgr", "Grid injection pressure", "p_gr", 4, "bar(g)")
gas.add("Tgr", "Gas temperature at injection", "T_gr", 15, "°C")
gas.add("qa", "Biomethane flow at line conditions", "q_a",
        "={qbm}*1.01325/({pgr}+1.01325)*({Tgr}+273.15)/273.15", "m³/h")
gas.add("qa2", "Biomethane flow at line conditions (rev. A)", "q_a2",
        "={qbm}*1.01325/{pgr}*({Tgr}+273.15)/273.15", "m³/h",
        planted=("offset-scale", "gauge pressure where the gas law wants absolute"))
GAS = gas.finish()

BIOGAS = {
    "trade": "anaerobic digestion: substrate VS load, methane and biogas yield, energy, CHP",
    "sheets": [("Feed", FEED), ("Gas", GAS), ("Substrates", SUBSTRATES)],
    "planted": {"Feed!E6": ("unit-scale", "t/d × 1000 is already kg/d; the second ×1000 makes "
                                          "it 1000 too large"),
                **gas.planted},
}

# --------------------------------------------------------------------------------------------
# Book 4: car park ventilation (g/min, g/h, ppm, mg/m³, m³/s, cfm, ft², °C, Pa, kW, W, kWh/yr)
# --------------------------------------------------------------------------------------------
CP_SRC = ("Sources: ASHRAE Handbook—HVAC Applications (2019), 'Enclosed vehicular facilities': "
          "CO generated by cars running in the garage and dilution airflow Q = G/(C_lim − "
          "C_amb) (from memory); the emission rates on the Emission sheet are invented, shaped "
          "like that chapter's hot/cold-start table; CO limit 25 ppm (ACGIH TLV-TWA, from "
          "memory), ambient 2 ppm (invented); mg/m³ = ppm·M/24.45 at 25 °C and 101.325 kPa "
          "(common practice), M(CO) = 28.01 g/mol (IUPAC atomic weights); 6 air changes per "
          "hour for normal ventilation and 10 for smoke clearance (BS 7346-7:2013, from memory); "
          "0.75 cfm/ft² minimum exhaust (International Mechanical Code (2018) Table 403.3.1.1, "
          "from memory); hot smoke volume Q·T_s/T_a in kelvin (ideal gas); fan shaft power "
          "q·Δp/η (common practice); NIST SP 811 (2008) App. B.8: 1 m³/s = 2119 cfm, 1 m² = "
          "10.764 ft², 1 m³ = 35.31 ft³.")
EMISSION = table(
    "Quayside multi-storey: CO emission per car running (invented values)",
    "Sources: invented, shaped like the ASHRAE Handbook—HVAC Applications (2019) table of hot "
    "and cold-start emissions (from memory).",
    ["Condition", "CO emission [g/min]"],
    [["Hot running", 0.35], ["Cold start", 0.95], ["Idling", 0.25]])

cp = ItemSheet("Vent", "Quayside multi-storey car park: ventilation design (invented scenario)",
               CP_SRC)
cp.add("cond", "Design emission condition", "cond", "Cold start")
cp.add("Cl", "CO limit (8 h)", "C_lim", 25, "ppm")
cp.add("Ca", "Ambient CO", "C_amb", 2, "ppm")
cp.add("M", "Molar mass of CO", "M", 28.01, "g/mol")
cp.add("Clm", "CO limit, mg/m³", "C_limm", "={Cl}*{M}/24.45", "mg/m³")
cp.add("Cam", "Ambient CO, mg/m³", "C_ambm", "={Ca}*{M}/24.45", "mg/m³")
cp.add("dC", "Allowable CO rise", "ΔC", "={Clm}-{Cam}", "mg/m³")
cp.add("dC2", "Allowable CO rise (quick)", "ΔC_2", "={Cl}-{Ca}", "mg/m³",
       planted=("result-unit", "ppm taken as mg/m³: the ×M/24.45 conversion missing"))
cp.add("Q", "Total design airflow (from Levels)", "Q", "=Levels!I9", "m³/s")
cp.add("Qc", "Total design airflow, cfm", "Q_c", "={Q}*2119", "cfm")
cp.add("Aft", "Floor area, ft²", "A_ft", "=Levels!B9*10.764", "ft²")
cp.add("rI", "Minimum exhaust rate (IMC)", "r_I", 0.75, "cfm/ft²")
cp.add("QI", "Minimum exhaust airflow (IMC)", "Q_I", "={Aft}*{rI}", "cfm")
cp.add("QI2", "Minimum exhaust airflow (IMC, rev. A)", "Q_I2", "=Levels!B9*{rI}", "cfm",
       planted=("unit-scale", "m² × cfm/ft²: 10.76 too small"))
cp.add("chk", "Code check", "check", '=IF({Qc}>={QI},"OK","INCREASE")')
cp.add("n10", "Smoke clearance rate", "n_s", 10, "1/h")
cp.add("Qf", "Smoke clearance airflow (at ambient)", "Q_f", "=Levels!D9*{n10}/3600", "m³/s")
cp.add("Ta", "Ambient air temperature", "T_a", 20, "°C")
cp.add("Ts", "Smoke temperature at the extract fans", "T_s", 200, "°C")
cp.add("Qh", "Smoke extract volume at the fans", "Q_h", "={Qf}*({Ts}+273.15)/({Ta}+273.15)",
       "m³/s")
cp.add("Qh2", "Smoke extract volume at the fans (rev. A)", "Q_h2", "={Qf}*{Ts}/{Ta}", "m³/s",
       planted=("offset-scale", "a ratio of °C temperatures where the gas law wants K"))
cp.add("dp", "Fan total pressure", "Δp", 450, "Pa")
cp.add("ef", "Fan efficiency", "η_f", 62, "%")
cp.add("em", "Motor efficiency", "η_m", 93, "%")
cp.add("Ps", "Extract fan shaft power (normal ventilation)", "P_s",
       "={Q}*{dp}/({ef}/100)/1000", "kW")
cp.add("Ps2", "Extract fan shaft power (rev. A)", "P_s2", "={Q}*{dp}/{ef}/1000", "kW",
       planted=("unit-scale", "62 % used as 62: 100 too small"))
cp.add("Pe", "Extract fan electrical input", "P_e", "={Ps}/({em}/100)", "kW")
cp.add("Pj", "Jet fans (12 × 1.5 kW)", "P_j", 18, "kW")
cp.add("Pc", "CO detection panel and sensors", "P_c", 450, "W")
cp.add("Pt2", "Ventilation electrical load (sum of the three lines above)", "P_t2",
       "=SUM({Pe}:{Pc})", "kW", planted=("mixed-range", "SUM over kW cells and the panel in W"))
cp.add("Pt", "Ventilation electrical load", "P_t", "={Pe}+{Pj}+{Pc}/1000", "kW")
cp.add("hr", "Running hours at design airflow (CO-controlled)", "t_r", 2400, "h/yr")
cp.add("Ea", "Annual ventilation energy", "E_a", "={Pt}*{hr}", "kWh/yr")
cp.add("EaM", "Annual ventilation energy, MWh/yr", "E_aM", "={Ea}/1000", "MWh/yr")
cp.add("EaM2", "Annual ventilation energy, MWh/yr (summary)", "E_aM2", "={Pt}*{hr}", "MWh/yr",
       planted=("unit-scale", "kW × h/yr gives kWh/yr, typed as MWh/yr: 1000 too large"))
VENT = cp.finish()

LEVELS = table(
    "Quayside multi-storey car park: airflow by level (invented scenario)", CP_SRC,
    ["Level", "Floor area [m²]", "Clear height [m]", "Volume [m³]", "Cars running at peak [-]",
     "CO emission [g/h]", "Dilution airflow [m³/s]", "Airflow at 6 air changes [m³/s]",
     "Design airflow [m³/s]", "Design airflow [cfm]"], [], caution=True)
for r, (lvl, area, cars) in enumerate([("B1 (entry level)", 4300, 40), ("B2", 4300, 25),
                                       ("B3", 4300, 18), ("B4", 3900, 12)], start=5):
    LEVELS.update({f"A{r}": lvl, f"B{r}": area, f"C{r}": 2.6, f"D{r}": f"=B{r}*C{r}",
                   f"E{r}": cars,
                   f"F{r}": f"=E{r}*VLOOKUP({cp.ref('cond')},Emission!$A$5:$B$7,2,FALSE)*60",
                   f"G{r}": f"=F{r}*1000/{cp.ref('dC')}/3600",
                   f"H{r}": f"=D{r}*6/3600", f"I{r}": f"=MAX(G{r},H{r})",
                   f"J{r}": f"=I{r}*2119"})
LEVELS.update({"A9": "Total", "B9": "=SUM(B5:B8)", "D9": "=SUM(D5:D8)", "I9": "=SUM(I5:I8)",
               "J9": "=SUM(J5:J8)"})
LEVELS["G6"] = f"=F6/{cp.ref('dC')}/3600"   # planted
LEVELS["H7"] = "=D7*6/60"                    # planted
LEVELS["J8"] = "=I8*35.31"                   # planted

CARPARK = {
    "trade": "building services: enclosed car park CO dilution, air changes, smoke clearance, fans",
    "sheets": [("Levels", LEVELS), ("Vent", VENT), ("Emission", EMISSION)],
    "planted": {"Levels!G6": ("unit-scale", "g/h over mg/m³ with the ×1000 left out: 1000 too "
                                            "small"),
                "Levels!H7": ("unit-scale", "air changes per hour over 60, not 3600: m³/min "
                                            "typed as m³/s, 60 too large"),
                "Levels!J8": ("unit-scale", "m³/s × 35.31 gives ft³/s, not cfm: 60 too small"),
                **cp.planted},
}

BOOKS = {"pharma-hvac": HVAC, "cooling-tower": TOWERBOOK, "biogas-plant": BIOGAS,
         "car-park": CARPARK}

# ---------------------------------------------------------------------------------------------
# Sidecars: the units plumb's table cannot read as the trade writes them.
# ---------------------------------------------------------------------------------------------
SIDE_HEAD = ("# Sidecar for {stem}.xlsx (review69). Invented scenario; demonstration only.\n"
             "# A dimensionally consistent formula can still be wrong, and this check does "
             "not replace\n# independent review under local codes and licensed practice.\n")
SIDECARS = {
    "biogas-plant": (
        "# The trade writes the methane yield 'Nm³ CH4/kg VS' and the loading rate\n"
        "# 'kg VS/(m³·d)', naming the gas and the solids counted (FNR Guide to Biogas, 5th ed.,\n"
        "# 2010); plumb does not read the names, so these cells get the units they stand for.\n"
        'cells Substrates!D5:D9 : Nm3/kg "Nm³ CH4 per kg VS"\n'
        'cells Feed!G5:G8 : Nm3/kg "Nm³ CH4 per kg VS"\n'
        f'cells {gas.cell("OLR")} : kg/(m^3*d) "kg VS per m³ of digester per day"\n'),
}
NO_SIDECAR = {
    "biogas-plant": ("without the sidecar, Gas!C17 (the loading rate under 'kg VS/(m³·d)') gets a "
                     "no-unit warning, the five yields on Substrates get no-unit warnings as "
                     "inputs, and the formula cells under 'CH4 yield [Nm³ CH4/kg VS]' (Feed!G5:G8) "
                     "get no finding of their own, so Feed!H5:H8 are checked without the yield's "
                     "unit; every planted cell is still reported"),
}

# Findings beyond the planted mistakes, filled in after running the frozen plumb:
# book -> list of (cell, rule, comment).
NOTE = "a note on a trade's number, read as such"
ACH6 = ("a correct cell plumb still flags: =D*6/3600, 6 air changes per hour for normal "
        "ventilation (BS 7346-7:2013, from memory) typed into the formula as the trade does; a "
        "bare number carries no unit, so plumb reads the cell as a volume (m³) under an m³/s "
        "heading. The same rate in a cell written 1/h passes (Vent!C21, with the rate in Vent!C20)")
EXTRA = {
    "pharma-hvac": [
        ("AHU!C15", "result-unit",
         "a correct cell plumb still flags: =2610*C7*10.764*SQRT(Rooms!K5-Rooms!K6), the I-P "
         "door-gap leakage Q = 2610·A·√Δp in cfm, ft² and in. w.c. (ASHRAE Handbook—HVAC "
         "Applications (2019), 'Fire and smoke control', from memory); 2610 is C·√(2/ρ) for "
         "C = 0.65 and air at 0.075 lb/ft³ folded with the units, a unit-bound coefficient a "
         "workbook cannot mark as one; it gives 115 cfm, the SI orifice form's 0.0544 m³/s in "
         "C13"),
        ("AHU!C30", "trade-constant", NOTE + " (1.2 W per L/s per K, ρ·c_p of air)"),
        ("AHU!C32", "trade-constant", NOTE + " (1.08 Btu/h per cfm per °F, ρ·c_p of air)"),
    ],
    "cooling-tower": [
        ("Tower!C14", "trade-constant", NOTE + " (4.19 kW per L/s per K, ρ·c_p of water)"),
        ("Tower!C15", "trade-constant", NOTE + " (500 Btu/h per gpm per °F, ρ·c_p of water)"),
        ("Tower!C27", "result-unit",
         "a correct cell plumb still flags: =C25*0.65, TDS ≈ 0.65 × conductivity (common "
         "practice, 0.55 to 0.70 by water); the 0.65 carries (mg/L)/(µS/cm), an empirical "
         "factor between two dimensions that a workbook cannot mark as one"),
        ("Tower!C34", "result-unit",
         "a correct cell plumb still flags: =0.00085*C6*C13, evaporation ≈ 0.00085 per °F of "
         "range times the circulation (Perry's Chemical Engineers' Handbook, 8th ed., §12, from "
         "memory); the 0.00085 carries 1/°F. It gives 64.7 gpm against the heat balance's "
         "61.8 gpm (C23)"),
    ],
    "biogas-plant": [
        ("Gas!C14", "trade-constant", NOTE + " (1013.25 mbar, the normal pressure of DIN 1343)"),
        ("Gas!C14", "trade-constant", NOTE + " (273.15 K, the normal temperature of DIN 1343)"),
        ("Gas!C48", "trade-constant", NOTE + " (1.01325 bar, the normal pressure of DIN 1343)"),
        ("Gas!C48", "trade-constant", NOTE + " (273.15 K, the normal temperature of DIN 1343)"),
        ("Gas!C49", "trade-constant",
         NOTE + " (273.15 K, on the planted cell, beside its offset-scale error)"),
    ],
    "car-park": [
        ("Levels!H5", "result-unit", ACH6),
        ("Levels!H6", "result-unit", ACH6),
        ("Levels!H8", "result-unit", ACH6),
        ("Vent!C9", "trade-constant", NOTE + " (24.45 L/mol, ideal gas at 25 °C, 101.325 kPa)"),
        ("Vent!C10", "trade-constant", NOTE + " (24.45 L/mol, ideal gas at 25 °C, 101.325 kPa)"),
    ],
}
# Planted cells plumb misses: cell -> why.
MISSED = {}
# Planted cells plumb reports under another rule than the one planted: cell -> rule reported.
RENAMED = {"AHU!C33": "result-unit", "Tower!C16": "result-unit", "Levels!H7": "result-unit"}


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
        side = SIDECARS.get(stem)
        side_path = os.path.join(HERE, stem + ".cells.plumb")
        if side:
            with open(side_path, "w", encoding="utf-8") as f:
                f.write(SIDE_HEAD.format(stem=stem) + side)
        elif os.path.exists(side_path):
            os.remove(side_path)
        formulas = formula_cells(book)
        for cell in book["planted"]:
            assert cell in formulas, f"{stem}: {cell} is not a formula cell"
        correct = [c for c in formulas if c not in book["planted"]]
        with open(os.path.join(HERE, stem + ".expect"), "w", encoding="utf-8") as f:
            f.write("# sheet!cell rule: the planted mistakes plumb must report; every other\n"
                    "# formula cell must stay clean (written by make_books.py, review69).\n"
                    "# Invented scenario. A dimensionally consistent formula can still be "
                    "wrong; this check\n# does not replace independent review under local "
                    "codes and licensed practice.\n")
            if side and stem in NO_SIDECAR:
                f.write(f"# Units plumb's table lacks come from the sidecar {stem}.cells.plumb; "
                        f"{NO_SIDECAR[stem]}.\n")
            for cell, (rule, what) in book["planted"].items():
                f.write(f"# planted: {what}\n")
                if cell in MISSED:
                    f.write(f"# a slip plumb still misses: {cell} {MISSED[cell]}\n")
                    continue
                if cell in RENAMED:
                    f.write(f"# planted as {rule}; plumb names it {RENAMED[cell]}\n")
                    rule = RENAMED[cell]
                f.write(f"{cell} {rule}\n")
            extra = EXTRA.get(stem) or []
            if extra:
                f.write("\n# found beyond the planted mistakes (kept so that any change "
                        "shows):\n")
                for cell, rule, comment in extra:
                    f.write(f"# {comment}\n{cell} {rule}\n")
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
