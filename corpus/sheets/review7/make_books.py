#!/usr/bin/env python3
"""Four review workbooks for plumb's workbook checking (review29), written with the standard
zipfile module (xlsx_writer.py, copied from corpus/sheets/review2 and extended).

Trades (all scenarios, firms and sites invented):
  1. hydraulic-power-unit: cylinder forces in bar·cm², flows in L/min and gpm, kW and hp,
     accumulator, oil cooler (Brackwell Fabrications, Dunmore Road works);
  2. two-phase-separator: vertical two-phase separator for an oil and gas lease, Souders-Brown,
     gas density from psig and °F, bbl/d, retention time (Red Mesa Operating, Hollis 14-2 lease);
  3. greenhouse-heating-irrigation: heat loss in W and Btu/h, boiler kW, pipe rail, drip
     emitters in L/h, pump head in m and ft (Hawthorn Glasshouse Growers, Ashby Fen);
  4. ups-battery: kVA and kW with power factor, cells and strings, Ah, autonomy in minutes,
     cable voltage drop in mV/A/m (Kingsmere Colocation, Northgate data hall 2).

Every formula cell is marked: ("P", rule, what) a planted mistake, "C" a correct formula,
"CC" a correct conversion (also correct). Rows of the symbol column are written as
(label, symbol, value or formula, unit, mark); {sym} and {Sheet.sym} in formulas are replaced
by the cell of that symbol. Table cells are given directly.

Numbers typed as inputs are invented for the demo unless a source is named beside them.

Run: python3 make_books.py  ->  *.xlsx, *.expect, expect.json (in this folder)
"""
import json
import os
import re

from xlsx_writer import write_xlsx

HERE = os.path.dirname(os.path.abspath(__file__))

SAFETY = ("Unit checking only: a dimensionally consistent formula can still be wrong; this sheet "
          "needs independent review under local codes and licensed practice.")


def build(book_sheets):
    """book_sheets: list of (sheet name, header dict of raw cells, start row, rows, table marks).

    Returns (sheets for write_xlsx, marks {"Sheet!Cell": mark}, formulas {"Sheet!Cell": f})."""
    syms = {}
    for name, _, start, rows, _ in book_sheets:
        for i, row in enumerate(rows):
            if row[1]:
                key = (name, row[1])
                assert key not in syms, key
                syms[key] = f"C{start + i}"

    def resolve(sheet, formula):
        def sub(m):
            ref = m.group(1)
            if "." in ref:
                sh, sy = ref.split(".", 1)
                return f"{sh}!{syms[(sh, sy)]}"
            return syms[(sheet, ref)]
        return re.sub(r"\{([A-Za-z_][A-Za-z0-9_.]*)\}", sub, formula)

    sheets, marks, formulas = [], {}, {}
    for name, raw, start, rows, table_marks in book_sheets:
        cells = {}
        for cell, v in raw.items():
            cells[cell] = resolve(name, v) if isinstance(v, str) and v.startswith("=") else v
        h = start - 1
        cells[f"A{h}"], cells[f"B{h}"], cells[f"C{h}"], cells[f"D{h}"] = (
            "Item", "Symbol", "Value", "Unit")
        for i, (label, sym, value, unit, mark) in enumerate(rows):
            r = start + i
            cells[f"A{r}"] = label
            if sym:
                cells[f"B{r}"] = sym
            cells[f"C{r}"] = resolve(name, value) if isinstance(value, str) else value
            if unit:
                cells[f"D{r}"] = unit
            if mark:
                marks[f"{name}!C{r}"] = mark
        for cell, mark in table_marks.items():
            marks[f"{name}!{cell}"] = mark
        for cell, v in cells.items():
            if isinstance(v, str) and v.startswith("="):
                formulas[f"{name}!{cell}"] = v
                assert f"{name}!{cell}" in marks, f"unmarked formula {name}!{cell}"
        sheets.append((name, cells))
    return sheets, marks, formulas


def P(rule, what):
    return ("P", rule, what)


# ============================================================================================
# Book 1: hydraulic power unit for a straightening press
# ============================================================================================
CYL_HEAD = {
    "A1": "Brackwell Fabrications, Dunmore Road works: hydraulic power unit for the No. 2 "
          "straightening press, cylinder duty (invented scenario)",
    "A2": "Sources: F = p·A and Q = A·v (Eaton/Vickers Industrial Hydraulics Manual, from memory); "
          "1 bar = 10^5 Pa, so 1 bar·cm² = 10 N and cm²·m/s ×6 = L/min (SI Brochure 9th ed., "
          "Table 8); 1 US gal = 3.785 L (NIST SP 811, B.8). " + SAFETY,
}
CYL_ROWS = [
    ("Bore diameter", "D", 160, "mm", None),
    ("Rod diameter", "d", 90, "mm", None),
    ("Stroke", "s", 600, "mm", None),
    ("Working pressure", "p", 210, "bar", None),
    ("Pressing (extend) speed", "v_e", 0.08, "m/s", None),
    ("Retract speed", "v_r", 0.15, "m/s", None),
    ("Dwell at full stroke", "t_d", 2, "s", None),
    ("Piston area", "A", "=PI()*({D}/10)^2/4", "cm²", "C"),
    ("Annulus area", "A_r", "=PI()*(({D}/10)^2-({d}/10)^2)/4", "cm²", "C"),
    ("Area ratio", "phi", "={A}/{A_r}", "-", "C"),
    ("Pressing force", "F_e", "={p}*{A}/100", "kN", "CC"),
    ("Retract force", "F_r", "={p}*{A_r}*10", "kN",
     P("unit-scale", "bar·cm² ×10 gives N, written as kN: 1000 times too large")),
    ("Extend flow", "Q_e", "={A}*{v_e}*6", "L/min", "CC"),
    ("Retract flow", "Q_r", "={A_r}*{v_r}*60", "L/min",
     P("unit-scale", "cm²·m/s ×60 for L/min (should be ×6): 10 times too large")),
    ("Extend flow, US", "Q_eg", "={Q_e}/3.785", "gpm", "CC"),
    ("Extend time", "t_e", "={s}/1000/{v_e}", "s", "CC"),
    ("Retract time", "t_r", "={s}/{v_r}", "s",
     P("unit-scale", "stroke in mm over speed in m/s: 1000 times too large")),
    ("Cycle time", "t_c", "=SUM({t_e},{t_r},{t_d})", "s", "C"),
    ("Cycles per hour", "N_c", "=3600/{t_c}", "1/h", "CC"),
]

PUMP_HEAD = {
    "A1": "Brackwell Fabrications: HPU pump, motor and lines (invented scenario)",
    "A2": "Sources: Vg = Q·1000/(n·ηv), P = p·Q/(600·ηt), T = Vg·Δp/(20π·ηhm) (Bosch Rexroth "
          "hydraulics formula sheet, from memory); hp = psi·gpm/1714 (Parker Fluid Power "
          "handbook, from memory); v = 21.22·Q/d² with Q in L/min, d in mm (common practice); "
          "1 hp = 0.746 kW, 1 bar = 14.5 psi (NIST SP 811, B.8). " + SAFETY,
    "F4": "Pump catalogue (invented for this demo)",
    "F5": "Size", "G5": "Vg [cm³/rev]", "H5": "p_max [bar]",
    "F6": "A10-45", "G6": 45, "H6": 280,
    "F7": "A10-71", "G7": 71, "H7": 280,
    "F8": "A10-100", "G8": 100, "H8": 250,
    "F9": "A10-140", "G9": 140, "H9": 250,
}
PUMP_ROWS = [
    ("Flow required (larger of extend and retract)", "Q", "=MAX({Cylinder.Q_e},{Cylinder.Q_r})",
     "L/min", "C"),
    ("Motor speed", "n", 1470, "rpm", None),
    ("Volumetric efficiency", "eta_v", 0.94, "-", None),
    ("Hydromechanical efficiency", "eta_hm", 0.92, "-", None),
    ("Overall efficiency", "eta_t", 86, "%", None),
    ("Displacement required", "V_g", "={Q}*1000/({n}*{eta_v})", "cm³/rev", "CC"),
    ("Displacement selected", "V_s", 140, "cm³/rev", None),
    ("Rated pressure of selected pump", "p_max", "=VLOOKUP({V_s},G6:H9,2,FALSE)", "bar", "C"),
    ("Pump flow delivered", "Q_p", "={V_s}*{n}*{eta_v}/1000", "L/min", "CC"),
    ("Relief valve setting (10 % over working)", "p_rv", "={Cylinder.p}*1.1", "bar", "C"),
    ("Relief setting within pump rating", "chk_p", "=IF({p_rv}<={p_max},\"OK\",\"TOO HIGH\")",
     None, "C"),
    ("Drive power", "P", "={p_rv}*{Q_p}/(600*{eta_t}/100)", "kW", "CC"),
    ("Drive power, hp", "P_hp", "={P}/0.746", "hp", "CC"),
    ("Relief setting, psi", "p_psi", "={p_rv}*14.5", "psi", "CC"),
    ("Pump flow, US", "Q_gpm", "={Q_p}/3.785", "gpm", "CC"),
    ("Drive power, US formula", "P_us0", "={p_psi}*{Q_gpm}/(1714*{eta_t}/100)", "hp", "CC"),
    ("Drive power, US formula (check)", "P_us", "={p_psi}*{Q_gpm}/(1714*{eta_t})", "hp",
     P("unit-scale", "overall efficiency in % used as a fraction: 100 times too small")),
    ("Pump shaft torque", "T", "={V_s}*{p_rv}/(20*PI()*{eta_hm})", "N·m", "CC"),
    ("Motor selected", "P_m", 200, "kW", None),
    ("Motor check", "chk_m", "=IF({P}<={P_m},\"OK\",\"UPSIZE\")", None, "C"),
    ("Motor rating, hp (US catalogue)", "P_mhp", "={P_m}*0.746", "hp",
     P("unit-scale", "kW to hp multiplied by 0.746: wrong way round")),
    ("Pressure line bore", "d_p", 38, "mm", None),
    ("Pressure line velocity", "v_p", "=21.22*{Q_p}/{d_p}^2", "m/s", "CC"),
    ("Suction line bore", "d_s", 89, "mm", None),
    ("Suction line velocity", "v_s", "={Q_p}/60000/(PI()*({d_s}/1000)^2/4)", "m/s", "CC"),
    ("Suction velocity check (limit 1.2 m/s)", "chk_s",
     "=IF({v_s}<=1.2,\"OK\",\"ENLARGE\")", None, "C"),
]

ACC_HEAD = {
    "A1": "Brackwell Fabrications: accumulator for the pressing stroke (invented scenario)",
    "A2": "Sources: Boyle's law p0·V0 = p1·V1 = p2·V2 in absolute pressures, isothermal and "
          "adiabatic (n = 1.4) sizing (HYDAC accumulator sizing guide, from memory); "
          "1.013 bar atmosphere (common practice); precharge ≤ 0.9·p1 absolute (common "
          "practice). " + SAFETY,
}
ACC_ROWS = [
    ("Fluid volume to deliver", "dV", 6.5, "L", None),
    ("Precharge pressure", "p0", 90, "bar(g)", None),
    ("Minimum working pressure", "p1", 120, "bar(g)", None),
    ("Maximum working pressure", "p2", 210, "bar(g)", None),
    ("Accumulator size, isothermal", "V0",
     "={dV}/(({p0}+1.013)/({p1}+1.013)-({p0}+1.013)/({p2}+1.013))", "L", "C"),
    ("Accumulator size, adiabatic", "V0a",
     "={dV}/((({p0}+1.013)/({p1}+1.013))^(1/1.4)-(({p0}+1.013)/({p2}+1.013))^(1/1.4))", "L",
     "C"),
    ("Accumulator size, quick check", "V0q", "={dV}/({p0}/{p1}-{p0}/{p2})", "L",
     P("offset-scale", "Boyle's law with gauge pressures")),
    ("Precharge check", "chk_0", "=IF({p0}+1.013<=0.9*({p1}+1.013),\"OK\",\"LOWER\")", None,
     "C"),
]

COOL_HEAD = {
    "A1": "Brackwell Fabrications: reservoir and oil cooler (invented scenario)",
    "A2": "Sources: heat to oil = input power × (1 − ηt) (common practice); selection by specific "
          "cooling power P01 = Φ/ETD in kW/K (cooler makers' method, from memory); "
          "ΔT = Φ/(ρ·c·Q) (any heat transfer text); oil ρ 0.87 kg/L, c 1.88 kJ/(kg·K) (ISO VG 46, "
          "from memory); water 4.19 kJ/(kg·K) per litre (from memory); 1 kW = 3412 Btu/h (NIST SP "
          "811, B.8); gpm = Btu/h / (500·ΔT°F) (ASHRAE rule, common practice); reservoir 3 × pump "
          "flow per minute (common practice). " + SAFETY,
}
COOL_ROWS = [
    ("Drive power", "P", "={Pump.P}", "kW", "C"),
    ("Heat load to oil", "Phi", "={P}*(1-{Pump.eta_t}/100)", "kW", "C"),
    ("Heat load, Btu/h", "Phi_b", "={Phi}*3412", "Btu/h", "CC"),
    ("Maximum oil temperature", "T_o", 55, "°C", None),
    ("Cooling water inlet temperature", "T_w", 27, "°C", None),
    ("Entry temperature difference", "ETD", "={T_o}-{T_w}", "K", "C"),
    ("Specific cooling power required", "P01", "={Phi}/{ETD}", "kW/K", "C"),
    ("Specific cooling power, quick check", "P01q", "={Phi}/{T_o}", "kW/K",
     P("offset-scale", "oil temperature in °C used where the entry temperature difference is "
       "needed")),
    ("Oil flow through cooler", "Q_o", "={Pump.Q_p}", "L/min", "C"),
    ("Oil density", "rho_o", 0.87, "kg/L", None),
    ("Oil specific heat", "c_o", 1.88, "kJ/(kg·K)", None),
    ("Oil temperature drop across cooler", "dT_o", "={Phi}*60/({rho_o}*{c_o}*{Q_o})", "K",
     "CC"),
    ("Oil temperature drop across cooler, °F", "dT_oF", "={dT_o}*1.8+32", "°F",
     P("offset-scale", "a temperature difference converted with +32")),
    ("Water temperature rise", "dT_w", 6, "K", None),
    ("Cooling water flow", "q_w", "={Phi}*60/(4.19*{dT_w})", "L/min", "CC"),
    ("Water temperature rise, °F", "dT_wF", "={dT_w}*1.8", "°F", "CC"),
    ("Cooling water flow, US", "q_wg", "={Phi_b}/(500*{dT_wF})", "gpm", "CC"),
    ("Reservoir retention (pump flow)", "t_res", 3, "min", None),
    ("Reservoir volume", "V_t", "={Q_o}*{t_res}", "L", "C"),
    ("Reservoir volume, US", "V_tg", "={V_t}/3.785", "gal", "CC"),
    ("Maximum oil temperature, °F", "T_oF", "={T_o}*1.8+32", "°F", "CC"),
    ("Cooling water flow, m³/h", "q_wh", "={q_w}*60/1000", "m³/h", "CC"),
]

BOOK1 = [("Cylinder", CYL_HEAD, 5, CYL_ROWS, {}),
         ("Pump", PUMP_HEAD, 5, PUMP_ROWS, {}),
         ("Accumulator", ACC_HEAD, 5, ACC_ROWS, {}),
         ("Cooler", COOL_HEAD, 5, COOL_ROWS, {})]

# ============================================================================================
# Book 2: vertical two-phase separator for an oil and gas lease
# ============================================================================================
BASIS_HEAD = {
    "A1": "Red Mesa Operating LLC, Hollis 14-2 lease, Caddo Draw: vertical two-phase production "
          "separator, design basis (invented scenario)",
    "A2": "Sources: oil SG = 141.5/(131.5 + °API) (API MPMS ch. 11, from memory); water cut = "
          "water/(oil + water) (common practice); psia = psig + 14.7, °R = °F + 459.67 (NIST SP "
          "811, B.8); 1 psi = 6.895 kPa (NIST SP 811, B.8); design pressure the greater of "
          "110 % and +25 psi over operating (common practice). " + SAFETY,
}
BASIS_ROWS = [
    ("Gas rate", "Q_g", 8.5, "MMscf/d", None),
    ("Oil rate", "Q_o", 1800, "bbl/d", None),
    ("Water cut", "wc", 22, "%", None),
    ("Operating pressure", "p", 650, "psig", None),
    ("Operating temperature", "T", 95, "°F", None),
    ("Gas specific gravity (air = 1)", "SG_g", 0.68, "-", None),
    ("Gas compressibility factor", "z", 0.89, "-", None),
    ("Oil gravity", "API", 38, "°API", None),
    ("Produced water specific gravity", "SG_w", 1.07, "-", None),
    ("Oil specific gravity", "SG_o", "=141.5/(131.5+{API})", "-", "C"),
    ("Water rate", "Q_w", "={Q_o}*{wc}/100/(1-{wc}/100)", "bbl/d", "C"),
    ("Water rate, quick check", "Q_wq", "={Q_o}*{wc}/(1-{wc})", "bbl/d",
     P("unit-scale", "water cut in % used as a fraction")),
    ("Total liquid rate", "Q_l", "={Q_o}+{Q_w}", "bbl/d", "C"),
    ("Operating pressure, absolute", "p_a", "={p}+14.7", "psia", "CC"),
    ("Operating temperature, absolute", "T_a", "={T}+459.67", "°R", "CC"),
    ("Operating pressure, kPa(g)", "p_k", "={p}*6.895", "kPa(g)", "CC"),
    ("Operating temperature, °C", "T_c", "=({T}-32)/1.8", "°C", "CC"),
    ("Design pressure", "p_d", "=MAX({p}*1.1,{p}+25)", "psig", "C"),
]

GAS_HEAD = {
    "A1": "Red Mesa Operating: separator gas capacity (invented scenario)",
    "A2": "Sources: ρg = p·M/(z·R·T) with R = 10.73 psia·ft³/(lbmol·°R) and M = 28.97·SG "
          "(GPSA Engineering Data Book, sec. 23, from memory); Souders-Brown Vt = K·√((ρl − ρg)/ρg), "
          "K = 0.25 ft/s vertical with mesh pad derated for pressure (GPSA sec. 7, from memory); "
          "water 62.4 lb/ft³ (common practice); standard conditions 14.7 psia and 520 °R "
          "(common practice); 1 lb/ft³ = 16.018 kg/m³ (NIST SP 811, B.8). " + SAFETY,
}
GAS_ROWS = [
    ("Gas molar mass", "M", "=28.97*{Basis.SG_g}", "lb/lbmol", "C"),
    ("Gas density at operating conditions", "rho_g",
     "={Basis.p_a}*{M}/({Basis.z}*10.73*{Basis.T_a})", "lb/ft³", "C"),
    ("Gas density, field check", "rho_gf",
     "={Basis.p}*{M}/({Basis.z}*10.73*{Basis.T_a})", "lb/ft³",
     P("offset-scale", "gauge pressure in the gas law")),
    ("Gas density, second check", "rho_gs",
     "={Basis.p_a}*{M}/({Basis.z}*10.73*{Basis.T})", "lb/ft³",
     P("offset-scale", "°F in the gas law where °R is needed")),
    ("Gas density, SI", "rho_gk", "={rho_g}*16.018", "kg/m³", "CC"),
    ("Liquid density (flow-weighted)", "rho_l",
     "=62.4*({Basis.Q_o}*{Basis.SG_o}+{Basis.Q_w}*{Basis.SG_w})/{Basis.Q_l}", "lb/ft³", "C"),
    ("Souders-Brown coefficient", "K", 0.25, "ft/s", None),
    ("Maximum gas velocity", "V_t", "={K}*SQRT(({rho_l}-{rho_g})/{rho_g})", "ft/s", "C"),
    ("Maximum gas velocity, as first typed", "V_tx", "={K}*SQRT({rho_l}-{rho_g}/{rho_g})",
     "ft/s", P("sum-mismatch", "brackets left out: density minus a ratio")),
    ("Actual gas flow", "q_a",
     "={Basis.Q_g}*1000000/86400*(14.7/{Basis.p_a})*({Basis.T_a}/520)*{Basis.z}", "ft³/s",
     "CC"),
    ("Gas flow area required", "A_g", "={q_a}/{V_t}", "ft²", "C"),
    ("Minimum vessel ID", "D_min", "=SQRT(4*{A_g}/PI())*12", "in", "CC"),
    ("Gas rate, SI", "Q_gm", "={Basis.Q_g}*28317", "m³/d", "CC"),
]

VES_HEAD = {
    "A1": "Red Mesa Operating: vessel size, liquid section and gauges (invented scenario)",
    "A2": "Sources: liquid volume = Q·t_r with t_r 3 min (API Spec 12J, Annex C, from memory); "
          "1 bbl = 5.615 ft³ = 42 US gal (NIST SP 811, B.8); vertical seam-to-seam length "
          "(h + D + 40)/12 ft for D > 36 in and slenderness 3 to 4 (Arnold & Stewart, Surface "
          "Production Operations vol. 1, from memory); 1 m³ = 6.29 bbl (NIST SP 811, B.8); "
          "Δp = ρ·g·h (any fluid mechanics text). " + SAFETY,
}
VES_ROWS = [
    ("Vessel ID selected (6 in steps, 24 in minimum)", "D",
     "=MAX(24,ROUNDUP({Gas.D_min}/6,0)*6)", "in", "C"),
    ("Liquid retention time", "t_r", 3, "min", None),
    ("Liquid settling volume", "V_l", "={Basis.Q_l}*{t_r}/1440", "bbl", "CC"),
    ("Liquid settling volume, quick check", "V_lq", "={Basis.Q_l}*{t_r}/24", "bbl",
     P("unit-scale", "bbl/d × min divided by 24 (hours a day) instead of 1440")),
    ("Liquid settling volume, ft³", "V_f", "={V_l}*5.615", "ft³", "CC"),
    ("Liquid height", "h", "={V_f}/(PI()*({D}/12)^2/4)*12", "in", "CC"),
    ("Seam-to-seam length", "L_ss", "=({h}+{D}+40)/12", "ft", "CC"),
    ("Slenderness ratio", "SR", "=12*{L_ss}/{D}", "-", "CC"),
    ("Slenderness ratio, quick check", "SR_q", "={L_ss}/{D}", "-",
     P("unit-scale", "length in ft over diameter in in")),
    ("Slenderness check", "chk", "=IF({SR}>4,\"CHECK\",\"OK\")", None, "C"),
    ("Total liquid, gpm", "Q_lg", "={Basis.Q_l}*42/1440", "gpm", "CC"),
    ("Total liquid, m³/d", "Q_lm", "={Basis.Q_l}*6.29", "m³/d",
     P("unit-scale", "bbl to m³ multiplied by 6.29: wrong way round")),
    ("Liquid density, SI", "rho_lk", "={Gas.rho_l}*16.018", "kg/m³", "CC"),
    ("Liquid height, m", "h_m", "={h}*0.0254", "m", "CC"),
    ("Level transmitter span (liquid head)", "dp_l", "={rho_lk}*9.81*{h_m}/1000", "kPa", "C"),
    ("Level transmitter span, check", "dp_lq", "={rho_lk}*{h_m}/1000", "kPa",
     P("result-unit", "ρ·h without g into kPa")),
]

BOOK2 = [("Basis", BASIS_HEAD, 5, BASIS_ROWS, {}),
         ("Gas", GAS_HEAD, 5, GAS_ROWS, {}),
         ("Vessel", VES_HEAD, 5, VES_ROWS, {})]
BOOK2_SIDECAR = ("# units the built-in table lacks, for the Red Mesa separator book\n"
                 "measure lbmol = 453.59237 mol \"pound-mole (NIST SP 811, B.8: 1 lb = "
                 "0.45359237 kg)\"\n")

# ============================================================================================
# Book 3: greenhouse heating and irrigation
# ============================================================================================
HL_HEAD = {
    "A1": "Hawthorn Glasshouse Growers, Ashby Fen, Block C (Venlo glasshouse, 4,800 m²): heat "
          "loss (invented scenario)",
    "A2": "Sources: Φ = Σ U·A·ΔT + 0.33·N·V·ΔT, 0.33 W·h/(m³·K) for air (CIBSE Guide A, sec. 5, "
          "from memory); U single glass 6.2, twin-wall polycarbonate 3.5 W/(m²·K) (ASABE EP406, "
          "from memory); 1 W = 3.412 Btu/h, 1 m² = 10.764 ft², 1 W/(m²·K) = 0.1761 "
          "Btu/(h·ft²·°F) (NIST SP 811, B.8); annual demand = (UA + 0.33·N·V)·DD·24 (CIBSE TM41, "
          "from memory). " + SAFETY,
    "A5": "Surface", "B5": "Area [m²]", "C5": "U [W/(m²·K)]", "D5": "UA [W/K]",
    "A6": "Roof glass", "B6": 5150, "C6": 6.2, "D6": "=B6*C6",
    "A7": "Side walls, glass", "B7": 620, "C7": 6.2, "D7": "=B7*C7",
    "A8": "Gable ends, twin-wall polycarbonate", "B8": 310, "C8": 3.5, "D8": "=B8*C8",
    "A9": "Kneewall, insulated concrete", "B9": 96, "C9": 0.9, "D9": "=B9*C9",
    "A10": "Total", "B10": "=SUM(B6:B9)", "D10": "=SUM(D6:D9)",
    "A11": "Area-weighted U", "C11": "=D10/B10",
}
HL_TABLE = {"D6": "C", "D7": "C", "D8": "C", "D9": "C", "B10": "C", "D10": "C", "C11": "C"}
HL_ROWS = [
    ("Inside design temperature", "T_i", 18, "°C", None),
    ("Outside design temperature", "T_o", -8, "°C", None),
    ("Design temperature difference", "dT", "={T_i}-{T_o}", "K", "C"),
    ("Fabric heat loss", "Phi_f", "=D10*{dT}", "W", "C"),
    ("Floor area", "A_f", 4800, "m²", None),
    ("Mean height", "H", 5.2, "m", None),
    ("Air volume", "V", "={A_f}*{H}", "m³", "C"),
    ("Air change rate", "N", 0.75, "1/h", None),
    ("Infiltration heat loss", "Phi_i", "=0.33*{N}*{V}*{dT}/1000", "kW", "CC"),
    ("Total heat loss", "Phi", "={Phi_f}+{Phi_i}", "W",
     P("unit-scale", "fabric loss in W added to infiltration loss in kW")),
    ("Total heat loss, kW", "Phi_k", "={Phi}/1000", "kW", "CC"),
    ("Total heat loss, Btu/h", "Phi_b", "={Phi}*3.412", "Btu/h", "CC"),
    ("Outside design temperature, °F", "T_oF", "={T_o}*1.8", "°F",
     P("offset-scale", "°C to °F without +32")),
    ("Inside design temperature, °F", "T_iF", "={T_i}*1.8+32", "°F", "CC"),
    ("Roof glass area, ft²", "A_rf", "=B6*10.764", "ft²", "CC"),
    ("Roof glass U, US", "U_us", "=C6*0.1761", "Btu/(h·ft²·°F)", "CC"),
    ("Roof loss, US check", "Phi_rus", "={A_rf}*{U_us}*({T_iF}-{T_oF})", "Btu/h", "C"),
    ("Heating degree days (base 15.5 °C)", "DD", 2650, "K·d", None),
    ("Annual heat demand", "E", "=(D10+0.33*{N}*{V})*{DD}*24/1000", "kWh", "CC"),
    ("Annual heat demand, quick check", "E_q", "=(D10+0.33*{N}*{V})*{DD}/1000", "kWh",
     P("unit-scale", "degree days times W/K without ×24 h/d: 24 times too small")),
]

BOIL_HEAD = {
    "A1": "Hawthorn Glasshouse Growers: boiler and pipe-rail heating (invented scenario)",
    "A2": "Sources: kW ×3.6 = MJ/h (SI Brochure 9th ed., Table 8); gross CV of natural gas "
          "39.5 MJ/m³ (from memory); water flow = Φ/(c·ΔT) with 4.19 kJ/(kg·K) per litre (from "
          "memory); boiler and pipe-rail tables invented for this demo. " + SAFETY,
    "F4": "Boiler range (invented)", "F5": "Output [kW]", "G5": "Gross input [kW]",
    "F6": 1200, "G6": 1310, "F7": 1600, "G7": 1745, "F8": 2000, "G8": 2180,
    "F9": 2500, "G9": 2725,
    "I4": "Pipe rail, 51 mm steel tube (invented)", "I5": "Excess temperature [K]",
    "J5": "Output [W/m]",
    "I6": 30, "J6": 64, "I7": 40, "J7": 91, "I8": 50, "J8": 120, "I9": 60, "J9": 151,
}
BOIL_ROWS = [
    ("Design heat loss", "Phi", "={HeatLoss.Phi_k}", "kW", "C"),
    ("Pick-up margin", "m", 15, "%", None),
    ("Boiler output required", "Phi_r", "={Phi}*(1+{m}/100)", "kW", "C"),
    ("Boiler output selected", "Phi_s", 1600, "kW", None),
    ("Boiler gross input (catalogue)", "Phi_in", "=VLOOKUP({Phi_s},F6:G9,2,FALSE)", "kW", "C"),
    ("Boiler efficiency (gross)", "eta", "={Phi_s}/{Phi_in}*100", "%", "CC"),
    ("Gas calorific value (gross)", "CV", 39.5, "MJ/m³", None),
    ("Gas flow at full fire", "V_g", "={Phi_in}*3.6/{CV}", "m³/h", "CC"),
    ("Gas flow at full fire, meter check", "V_gq", "={Phi_in}/{CV}", "m³/h",
     P("unit-scale", "kW over MJ/m³ without ×3.6")),
    ("Flow temperature", "T_f", 80, "°C", None),
    ("Return temperature", "T_r", 60, "°C", None),
    ("Heating water temperature difference", "dT_w", "={T_f}-{T_r}", "K", "C"),
    ("Heating water flow", "q_h", "={Phi_s}/(4.19*{dT_w})", "L/s", "C"),
    ("Heating water flow, pump schedule", "q_hq", "={Phi_s}/(4.19*{T_f})", "L/s",
     P("offset-scale", "flow temperature in °C where ΔT is needed")),
    ("Heating water flow, m³/h", "q_hm", "={q_h}*3.6", "m³/h", "CC"),
    ("Boiler output, Btu/h", "Phi_sb", "={Phi_s}*3412", "Btu/h", "CC"),
    ("Mean water temperature", "T_m", "=({T_f}+{T_r})/2", "°C", "C"),
    ("Excess temperature over air", "dT_x", "={T_m}-{HeatLoss.T_i}", "K", "C"),
    ("Pipe-rail output per metre", "q_p", "=VLOOKUP({dT_x},I6:J9,2,TRUE)", "W/m", "C"),
    ("Pipe-rail length required", "L_p", "={Phi_r}*1000/{q_p}", "m", "CC"),
    ("Pipe-rail length, per bay check", "L_pq", "={Phi_r}/{q_p}", "m",
     P("unit-scale", "kW over W/m: 1000 times too small")),
]

IRR_HEAD = {
    "A1": "Hawthorn Glasshouse Growers: drip irrigation zones and pump (invented scenario)",
    "A2": "Sources: Hazen-Williams h_f = 10.67·L·Q^1.852/(C^1.852·d^4.87), SI, C = 140 for PE "
          "(common practice; from memory); 1 bar = 10.2 m of water (common practice); "
          "P = ρ·g·Q·H/η (any pump text); hp = gpm·ft/(3960·η) (Hydraulic Institute, from "
          "memory); 1 L/s = 15.85 gpm, 1 ft = 0.3048 m (NIST SP 811, B.8). " + SAFETY,
    "A5": "Zone", "B5": "Benches", "C5": "Emitters per bench", "D5": "Emitter flow [L/h]",
    "E5": "Zone flow [L/h]", "F5": "Zone flow [m³/h]",
    "A6": "C1 (pot roses)", "B6": 24, "C6": 180, "D6": 2.0,
    "A7": "C2 (pot roses)", "B7": 24, "C7": 180, "D7": 2.0,
    "A8": "C3 (propagation)", "B8": 30, "C8": 240, "D8": 1.2,
    "A9": "C4 (stock plants)", "B9": 18, "C9": 120, "D9": 4.0,
    "A10": "Largest zone (one zone runs at a time)", "F10": "=MAX(F6:F9)",
}
for _r in range(6, 10):
    IRR_HEAD[f"E{_r}"] = f"=B{_r}*C{_r}*D{_r}"
    IRR_HEAD[f"F{_r}"] = f"=E{_r}/1000"
IRR_HEAD["F8"] = "=E8*1000"
IRR_TABLE = {"E6": "C", "E7": "C", "E8": "C", "E9": "C", "F6": "CC", "F7": "CC",
             "F8": P("unit-scale", "L/h to m³/h multiplied by 1000: wrong way round"),
             "F9": "CC", "F10": "C"}
IRR_ROWS = [
    ("Design flow (largest zone)", "Q", "=F10", "m³/h", "C"),
    ("Design flow, L/s", "Q_s", "={Q}/3.6", "L/s", "CC"),
    ("Design flow, US", "Q_g", "={Q_s}*15.85", "gpm", "CC"),
    ("Main, internal diameter (PE 63 PN10)", "d", 53.6, "mm", None),
    ("Main length including fittings", "L", 145, "m", None),
    ("Hazen-Williams coefficient", "C_hw", 140, "-", None),
    ("Main friction loss", "h_f",
     "=10.67*{L}*({Q_s}/1000)^1.852/({C_hw}^1.852*({d}/1000)^4.87)", "m", "C"),
    ("Static lift, tank to highest bench", "h_s", 4.5, "m", None),
    ("Emitter inlet pressure", "p_e", 1.5, "bar", None),
    ("Emitter pressure head", "h_e", "={p_e}*10.2", "m", "CC"),
    ("Disc filter loss at design flow", "dp_f", 35, "kPa", None),
    ("Total dynamic head", "H", "={h_s}+{h_f}+{h_e}+{dp_f}", "m",
     P("sum-mismatch", "filter loss in kPa added to heads in m")),
    ("Total dynamic head, ft", "H_ft", "={H}/0.3048", "ft", "CC"),
    ("Pump efficiency", "eta", 0.62, "-", None),
    ("Pump shaft power", "P", "=1000*9.81*{Q_s}/1000*{H}/{eta}/1000", "kW", "C"),
    ("Pump shaft power, quick check", "P_q", "=1000*{Q_s}/1000*{H}/{eta}/1000", "kW",
     P("result-unit", "ρ·Q·H without g")),
    ("Pump shaft power, US", "P_us", "={Q_g}*{H_ft}/(3960*{eta})", "hp", "CC"),
    ("Pump differential pressure", "dp_p", "={H}*9.81", "kPa", "C"),
    ("Water per plant per day", "w", 1.4, "L", None),
    ("Run time per day, zone C1", "t_run", "={w}/D6*60", "min", "CC"),
]

BOOK3 = [("HeatLoss", HL_HEAD, 14, HL_ROWS, HL_TABLE),
         ("Boiler", BOIL_HEAD, 5, BOIL_ROWS, {}),
         ("Irrigation", IRR_HEAD, 13, IRR_ROWS, IRR_TABLE)]

# ============================================================================================
# Book 4: UPS and battery sizing
# ============================================================================================
LOAD_HEAD = {
    "A1": "Kingsmere Colocation, Northgate data hall 2: UPS load schedule (invented scenario)",
    "A2": "Sources: P = S·cos φ (IEC 60050-131, from memory); growth allowance 20 % and 80 % "
          "loading limit (common practice); UPS frame table invented for this demo. " + SAFETY,
    "A5": "Load", "B5": "Apparent power [kVA]", "C5": "Power factor [-]",
    "D5": "Active power [kW]",
    "A6": "IT racks, row A", "B6": 120, "C6": 0.95,
    "A7": "IT racks, row B", "B7": 120, "C7": 0.95,
    "A8": "Network core", "B8": 18, "C8": 0.9,
    "A9": "CRAH fans (critical cooling)", "B9": 45, "C9": 0.85,
    "A10": "Security and BMS", "B10": 6, "C10": 0.8,
    "A11": "Total", "B11": "=SUM(B6:B10)", "C11": "=D11/B11", "D11": "=SUM(D6:D10)",
    "F4": "UPS frames (invented)", "F5": "Rating [kVA]", "G5": "Output [kW]",
    "H5": "Inverter efficiency [%]",
    "F6": 300, "G6": 270, "H6": 95.5, "F7": 400, "G7": 400, "H7": 96.0,
    "F8": 500, "G8": 500, "H8": 96.2,
}
for _r in range(6, 11):
    LOAD_HEAD[f"D{_r}"] = f"=B{_r}*C{_r}"
LOAD_HEAD["D10"] = "=B10*C10*1000"
LOAD_TABLE = {"D6": "C", "D7": "C", "D8": "C", "D9": "C",
              "D10": P("unit-scale", "kVA × PF × 1000 (W) in the kW column"),
              "B11": "C", "C11": "C", "D11": "C"}
LOAD_ROWS = [
    ("Connected active load", "P_c", "=D11", "kW", "C"),
    ("Connected apparent load", "S_c", "=B11", "kVA", "C"),
    ("Growth allowance", "g", 20, "%", None),
    ("Design active load", "P_d", "={P_c}*(1+{g}/100)", "kW", "C"),
    ("Design apparent load", "S_d", "={S_c}*(1+{g}/100)", "kVA", "C"),
    ("Design active load, MW (utility application)", "P_dM", "={P_d}/1000", "MW", "CC"),
    ("UPS frame selected", "S_u", 400, "kVA", None),
    ("UPS active power rating", "P_u", "=VLOOKUP({S_u},F6:H8,2,FALSE)", "kW", "C"),
    ("UPS loading, active", "x_u", "={P_d}/{P_u}*100", "%", "CC"),
    ("UPS loading, apparent", "x_s", "={S_d}/{S_u}", "%",
     P("unit-scale", "ratio left as a fraction in a % cell")),
    ("Inverter efficiency", "eta_i", "=VLOOKUP({S_u},F6:H8,3,FALSE)", "%", "C"),
    ("Loading check (80 % limit)", "chk", "=IF({x_u}>80,\"OVER LIMIT\",\"OK\")", None, "C"),
]

BAT_HEAD = {
    "A1": "Kingsmere Colocation: VRLA battery for 10 min autonomy (invented scenario)",
    "A2": "Sources: constant-power sizing, ageing factor 1.25 and design margin 1.1 (IEEE Std "
          "485 and IEEE Std 1184, from memory); 2.0 V/cell nominal, 1.75 V/cell end voltage, "
          "2.27 V/cell float (VRLA common practice); capacity temperature coefficient 0.006 /K "
          "(from memory); hydrogen ventilation Q = 0.05·n·I_gas·C_rt·10^-3 m³/h, I_gas 1 mA/Ah "
          "for VRLA on float (IEC 62485-2, from memory); cell power table invented for this "
          "demo. " + SAFETY,
    "F4": "Cell power to 1.75 V/cell at 25 °C (invented)",
    "F5": "Autonomy [min]", "G5": "Power per cell [W]",
    "F6": 5, "G6": 560, "F7": 10, "G7": 372, "F8": 15, "G8": 283, "F9": 20, "G9": 230,
    "F10": 30, "G10": 168,
}
BAT_ROWS = [
    ("Design active load", "P", "={Load.P_d}", "kW", "C"),
    ("Battery power at the DC bus", "P_b", "={P}/({Load.eta_i}/100)", "kW", "C"),
    ("Nominal DC bus voltage", "V_n", 480, "V", None),
    ("Cell nominal voltage", "V_c", 2, "V", None),
    ("Cells per string", "N", "={V_n}/{V_c}", "-", "C"),
    ("End-of-discharge voltage per cell", "V_e", 1.75, "V", None),
    ("Minimum DC bus voltage", "V_min", "={N}*{V_e}", "V", "C"),
    ("Power per cell", "P_cell", "={P_b}*1000/{N}", "W", "CC"),
    ("Ageing factor", "k_a", 1.25, "-", None),
    ("Design margin", "k_m", 1.1, "-", None),
    ("Battery room temperature", "T_r", 20, "°C", None),
    ("Capacity temperature coefficient", "alpha", 0.006, "1/K", None),
    ("Temperature factor", "k_t", "=1/(1+{alpha}*({T_r}-25))", "-", "C"),
    ("Required power per cell", "P_req", "={P_cell}*{k_a}*{k_m}*{k_t}", "W", "C"),
    ("Autonomy required", "t_a", 10, "min", None),
    ("Cell power available (table)", "P_tab", "=VLOOKUP({t_a},F6:G10,2,FALSE)", "W", "C"),
    ("Strings in parallel", "n_s", "=ROUNDUP({P_req}/{P_tab},0)", "-", "C"),
    ("Strings in parallel, quick check", "n_sq", "=ROUNDUP({P_b}/{N}/{P_tab},0)", "-",
     P("unit-scale", "battery power in kW over cell power in W")),
    ("Discharge current at end voltage", "I_d", "={P_b}*1000/{V_min}", "A", "CC"),
    ("Capacity required", "C_req", "={I_d}*{t_a}/60", "Ah", "CC"),
    ("Capacity required, quick check", "C_rq", "={I_d}*{t_a}", "Ah",
     P("unit-scale", "A × min written as Ah: 60 times too large")),
    ("Capacity of block selected (10 h rate)", "C_10", 150, "Ah", None),
    ("Autonomy, simple check (no rate effect)", "t_est", "={C_10}*{n_s}/{I_d}*60", "min",
     "CC"),
    ("Float voltage per cell", "V_f", 2.27, "V", None),
    ("Float voltage, string", "V_fl", "={N}*{V_f}", "V", "C"),
    ("Recharge time", "t_rc", 10, "h", None),
    ("Recharge current (110 % of capacity)", "I_rc", "=1.1*{C_10}*{n_s}/{t_rc}", "A", "C"),
    ("Charger power", "P_ch", "={V_fl}*{I_rc}/1000", "kW", "CC"),
    ("Battery room temperature, °F", "T_rF", "={T_r}*1.8+32", "°F", "CC"),
    ("Gas current on float (VRLA)", "I_gas", 1, "mA/Ah", None),
    ("Hydrogen ventilation airflow", "Q_v", "=0.05*{N}*{n_s}*{I_gas}*{C_10}/1000", "m³/h", "C"),
]

CAB_HEAD = {
    "A1": "Kingsmere Colocation: battery and output cables (invented scenario)",
    "A2": "Sources: voltage drop = (mV/A/m)·I·L/1000, d.c. and three-phase columns (BS 7671:2018 "
          "Appendix 4, Tables 4D1B, from memory: 300 mm² d.c. 0.15, 3-phase 0.14 mV/A/m); "
          "R = ρ·L/A with ρ_Cu 0.0172 Ω·mm²/m at 20 °C, α 0.00393 /K (IEC 60228, from memory); "
          "I = S/(√3·V) (any electrical text). " + SAFETY,
}
CAB_ROWS = [
    ("Battery discharge current", "I", "={Battery.I_d}", "A", "C"),
    ("Route length, battery to UPS (one way)", "L", 28, "m", None),
    ("Conductor size", "A_c", 300, "mm²", None),
    ("Conductors in parallel per pole", "n_p", 2, "-", None),
    ("Tabulated voltage drop, d.c.", "mVAm", 0.15, "mV/A/m", None),
    ("Voltage drop, d.c.", "V_d", "={mVAm}*{I}/{n_p}*{L}/1000", "V", "CC"),
    ("Voltage drop, d.c., quick check", "V_dq", "={mVAm}*{I}/{n_p}*{L}", "V",
     P("unit-scale", "mV/A/m × A × m left in mV, written as V")),
    ("Voltage drop, % of nominal", "x_d", "={V_d}/{Battery.V_n}*100", "%", "CC"),
    ("Voltage drop check (1 % limit)", "chk_d", "=IF({x_d}>1,\"EXCEEDS\",\"OK\")", None, "C"),
    ("Copper resistivity at 20 °C", "rho", 0.0172, "Ω·mm²/m", None),
    ("Loop resistance, parallel conductors", "R", "=2*{rho}*{L}/({A_c}*{n_p})", "Ω", "C"),
    ("Loop resistance, SI check", "R_q", "=2*{rho}*{L}/({A_c}/1000000*{n_p})", "Ω",
     P("unit-scale", "area converted to m² while ρ stays in Ω·mm²/m")),
    ("Voltage drop by resistance", "V_dR", "={I}*{R}", "V", "C"),
    ("Cable loss", "P_l", "={I}^2*{R}", "W", "C"),
    ("Copper temperature coefficient", "a_cu", 0.00393, "1/K", None),
    ("Conductor operating temperature", "T_c", 70, "°C", None),
    ("Loop resistance at operating temperature", "R_70", "={R}*(1+{a_cu}*({T_c}-20))", "Ω",
     "C"),
    ("Loop resistance at operating temperature, check", "R_70q", "={R}*(1+{a_cu}*{T_c})", "Ω",
     P("offset-scale", "conductor temperature in °C where the rise above 20 °C is needed")),
    ("Output line voltage", "V_LL", 400, "V", None),
    ("UPS output current", "I_ac", "={Load.S_d}*1000/(SQRT(3)*{V_LL})", "A", "CC"),
    ("UPS output current, quick check", "I_acq", "={Load.S_d}/(SQRT(3)*{V_LL})", "A",
     P("unit-scale", "kVA over V gives kA, written as A")),
    ("Output cable length", "L_ac", 35, "m", None),
    ("Tabulated voltage drop, three-phase", "mV3", 0.14, "mV/A/m", None),
    ("Voltage drop, output", "V_d3", "={mV3}*{I_ac}*{L_ac}/1000", "V", "CC"),
    ("Voltage drop, output, %", "x_d3", "={V_d3}/{V_LL}*100", "%", "CC"),
    ("DC protective device rating (125 %)", "I_n", "=1.25*{I}", "A", "C"),
]

BOOK4 = [("Load", LOAD_HEAD, 14, LOAD_ROWS, LOAD_TABLE),
         ("Battery", BAT_HEAD, 5, BAT_ROWS, {}),
         ("Cables", CAB_HEAD, 5, CAB_ROWS, {})]

BOOKS = [
    ("hydraulic-power-unit", "hydraulic power unit: cylinder, pump, accumulator, oil cooler",
     BOOK1, None),
    ("two-phase-separator", "oil and gas lease: vertical two-phase separator sizing", BOOK2,
     BOOK2_SIDECAR),
    ("greenhouse-heating-irrigation", "greenhouse heat loss, boiler, pipe rail, drip irrigation",
     BOOK3, None),
    ("ups-battery", "UPS load, VRLA battery and cable sizing", BOOK4, None),
]


def main():
    summary = {}
    for stem, trade, book, sidecar in BOOKS:
        sheets, marks, formulas = build(book)
        write_xlsx(os.path.join(HERE, stem + ".xlsx"), sheets)
        if sidecar:
            with open(os.path.join(HERE, stem + ".cells.plumb"), "w", encoding="utf-8") as f:
                f.write(sidecar)
        lines = ["# sheet!cell rule: the planted mistakes plumb must report; every other",
                 "# formula cell must stay clean (written by make_books.py)"]
        planted, correct = {}, []
        for cell in formulas:
            mark = marks[cell]
            if isinstance(mark, tuple):
                lines.append(f"# planted: {mark[2]}")
                lines.append(f"{cell} {mark[1]}")
                planted[cell] = {"rule": mark[1], "what": mark[2]}
            else:
                correct.append(cell)
        with open(os.path.join(HERE, stem + ".expect"), "w", encoding="utf-8") as f:
            f.write("\n".join(lines) + "\n")
        summary[stem] = {"trade": trade, "planted": planted, "correct": correct,
                         "conversions": [c for c in correct if marks[c] == "CC"],
                         "formulas": formulas}
        print(f"{stem}: {len(planted)} planted, {len(correct)} correct "
              f"({len(summary[stem]['conversions'])} conversions)")
    with open(os.path.join(HERE, "expect.json"), "w", encoding="utf-8") as f:
        json.dump(summary, f, indent=1, ensure_ascii=False)


if __name__ == "__main__":
    main()
