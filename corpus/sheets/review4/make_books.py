#!/usr/bin/env python3
"""Four review workbooks for plumb's workbook checking (review 17), written with the standard
zipfile module (xlsx_writer.py, copied from corpus/sheets/review2 and extended).

Trades and scenarios (all invented):
  1. lindenhof-hydronic: a European office floor's radiator schedule, circulation pump and
     expansion vessel (W, kW, °C flow/return, ΔT in K, kPa, m³/h, L/s, bar(g)).
  2. harrow-lane-storm: a business park's storm sewer design table, Lloyd-Davies / rational
     method with Manning full-bore capacities (mm, m, % and m/m, mm/h, ha, L/s, m³/s).
  3. fenwick-h2-trailer: a hydrogen tube trailer's arrival check and deliverable inventory
     (bar g, bar a, kg, Nm³, °C, K, real-gas law with Z).
  4. osprey-separator-gaslift: an oilfield test separator and a pad's gas-lift allocation in
     field units (psig, psia, bbl/d, Mscf/d, °F, °R, °API, ft, in).

Every formula cell is either a planted mistake (listed in PLANTED with the rule I expect) or a
correct formula that must stay clean. Item sheets are written as rows (label, symbol, value or
formula, unit); a formula names other rows of its sheet as {symbol} and rows of another item
sheet as {Sheet.symbol}; these are replaced by cell addresses.

Run: python3 make_books.py  ->  *.xlsx (+ sidecars), *.planted, expect.json

The *.expect files beside the books are the *.planted lists plus every finding plumb makes on a
correct cell (notes, inputs without units, and the correct cells it still flags, each with why),
kept by hand, so that the corpus test compares every finding.
"""
import json
import os
import re

from xlsx_writer import write_xlsx

HERE = os.path.dirname(os.path.abspath(__file__))

SYMBOLS = {}  # (sheet, symbol) -> "C<row>"


def item_sheet(name, title, source, first_row, rows):
    """rows: (label, symbol, value, unit[, planted rule, what]); returns cells and plants."""
    cells = {"A1": title, "A2": source,
             f"A{first_row - 1}": "Item", f"B{first_row - 1}": "Symbol",
             f"C{first_row - 1}": "Value", f"D{first_row - 1}": "Unit"}
    plants = {}
    r = first_row
    for row in rows:
        if len(row) == 1:          # a section heading
            cells[f"A{r}"] = row[0]
            r += 1
            continue
        label, sym, value, unit = row[:4]
        cells[f"A{r}"] = label
        if sym:
            cells[f"B{r}"] = sym
            SYMBOLS[(name, sym)] = f"C{r}"
        cells[f"C{r}"] = value
        if unit:
            cells[f"D{r}"] = unit
        if len(row) > 4:
            plants[f"{name}!C{r}"] = (row[4], row[5])
        r += 1
    return cells, plants


def resolve(sheets):
    """Replace {sym} and {Sheet.sym} in every formula by the cell address."""
    for name, cells in sheets:
        for key, val in cells.items():
            if isinstance(val, str) and val.startswith("="):
                def sub(m):
                    ref = m.group(1)
                    if "." in ref:
                        sh, sym = ref.split(".", 1)
                        return f"{sh}!{SYMBOLS[(sh, sym)]}"
                    return SYMBOLS[(name, ref)]
                cells[key] = re.sub(r"\{([^{}]+)\}", sub, val)


# ============================================================================================
# Book 1: hydronic heating of an office floor (radiators, pump, expansion vessel)
# ============================================================================================
RAD = {
    "A1": "Lindenhof office block, 2nd floor: radiator schedule, LTHW 70/50 and 70/55 (invented project)",
    "A2": "Sources: EN 442-2 radiator output Φ = Φ50·(ΔT/50 K)^n with log-mean excess ΔT_ln = "
          "(t_f − t_r)/ln((t_f − t_i)/(t_r − t_i)); mass flow m = Φ·3600/(c_p·ΔT) (heat balance); "
          "volume flow q[L/s] = Φ[kW]/(4.19·ΔT) (common practice); catalogue data invented",
    "A4": "Room", "B4": "Heat loss [W]", "C4": "Flow [°C]", "D4": "Return [°C]", "E4": "ΔT [K]",
    "F4": "Mass flow [kg/h]", "G4": "Room [°C]", "H4": "Excess ΔT_ln [K]",
    "I4": "Required at ΔT50 [W]", "J4": "Length [mm]", "K4": "Rated at ΔT50 [W]",
    "L4": "Output at design [W]", "M4": "Flow [L/s]",
    "A15": "Total / min",
    "B15": "=SUM(B5:B13)", "F15": "=SUM(F5:F13)", "H15": "=MIN(H5:H13)", "L15": "=SUM(L5:L13)",
    "M15": "=SUM(M5:M13)",
    "A17": "Item", "B17": "Symbol", "C17": "Value", "D17": "Unit",
    "A18": "Specific heat capacity of water at 60 °C (from memory)", "B18": "c_p", "C18": 4185,
    "D18": "J/(kg·K)",
    "A19": "Radiator exponent, Type 22 panel (catalogue, EN 442-2)", "B19": "n", "C19": 1.3,
    "D19": "-",
}
ROOMS = [("2.01 Office north", 1450, 70, 50, 20), ("2.02 Office north", 1320, 70, 50, 20),
         ("2.03 Meeting room", 1780, 70, 50, 20), ("2.04 Office south", 980, 70, 50, 20),
         ("2.05 Office south", 1040, 70, 50, 20), ("2.06 Kitchenette", 620, 70, 55, 20),
         ("2.07 WC", 410, 70, 55, 20), ("2.08 Corridor", 760, 70, 55, 18),
         ("2.09 Stair", 1150, 70, 55, 15)]
for i, (room, q, tf, tr, ti) in enumerate(ROOMS):
    r = 5 + i
    RAD.update({f"A{r}": room, f"B{r}": q, f"C{r}": tf, f"D{r}": tr, f"G{r}": ti,
                f"E{r}": f"=C{r}-D{r}",
                f"F{r}": f"=B{r}*3600/($C$18*E{r})",
                f"H{r}": f"=(C{r}-D{r})/LN((C{r}-G{r})/(D{r}-G{r}))",
                f"I{r}": f"=ROUND(B{r}*(50/H{r})^$C$19,0)",
                f"J{r}": f"=VLOOKUP(I{r},Catalogue!$A$5:$C$13,2,TRUE)",
                f"K{r}": f"=VLOOKUP(I{r},Catalogue!$A$5:$C$13,3,TRUE)",
                f"L{r}": f"=K{r}*(H{r}/50)^$C$19",
                f"M{r}": f"=B{r}/1000/(4.19*E{r})"})
RAD["F7"] = "=B7*3600/($C$18*C7)"   # planted: flow temperature in °C in place of ΔT
RAD_PLANTS = {"Radiators!F7": ("offset-scale", "mass flow from the flow temperature in °C, not ΔT")}

CAT = {
    "A1": "Radiator catalogue: Type 22 panel, 600 mm high (invented manufacturer's data)",
    "A2": "Source: invented data for the demo; outputs at ΔT50 to EN 442-2. 'Select from' is the "
          "next smaller size's output, so an approximate VLOOKUP picks the smallest panel that "
          "meets the load (common practice)",
    "A4": "Select from [W]", "B4": "Length [mm]", "C4": "Output ΔT50 [W]",
    "A5": 0,
}
for i, length in enumerate(range(400, 2001, 200)):
    r = 5 + i
    CAT[f"B{r}"] = length
    CAT[f"C{r}"] = round(1.817 * length)
    if i:
        CAT[f"A{r}"] = f"=C{r - 1}"

PUMP, PUMP_PLANTS = item_sheet(
    "Pump",
    "Lindenhof office block, 2nd floor: circulation pump and expansion vessel (invented project)",
    "Sources: Darcy–Weisbach Δp = f·L/D·ρv²/2; pump head H = Δp/(ρ·g); hydraulic power "
    "P = q·Δp (q[m³/h]·Δp[kPa]/3600 = kW); EN 12828 expansion vessel V_n = (V_e + V_WR)·(p_e + 1)/"
    "(p_e − p_0), p_0 ≥ h_st/10 + 0.2 bar, p_e = p_sv − 0.5 bar, V_WR ≥ 0.5 % of content and ≥ 3 L "
    "(from memory); water 977.8 kg/m³ at 70 °C, expansion 2.24 % from 10 to 70 °C (from memory); "
    "DN20 bore 21.6 mm (from memory); g = 9.81 m/s² (common practice)",
    4,
    [
        ("Design heat load", "Phi", "=SUM(Radiators!B5:B13)/1000", "kW"),
        ("Design heat load (second copy)", "Phi_x", "=SUM(Radiators!B5:B13)", "kW",
         "unit-scale", "sum of W radiator losses into a kW cell, no /1000"),
        ("Boiler margin", "x_b", 15, "%"),
        ("Boiler output", "Phi_b", "=ROUND({Phi}*(1+{x_b}/100),1)", "kW"),
        ("Design mass flow", "m", "=Radiators!F15", "kg/h"),
        ("Water density at 70 °C", "rho", 977.8, "kg/m³"),
        ("Volume flow", "q", "={m}/{rho}/3.6", "L/s"),
        ("Volume flow, m³/h", "q_h", "={q}*3.6", "m³/h"),
        ("Volume flow, m³/h (second copy)", "q_hx", "={q}/3.6", "m³/h",
         "unit-scale", "L/s to m³/h divided by 3.6: wrong way round"),
        ("Volume flow, m³/s", "q_s", "={q}/1000", "m³/s"),
        ("Pipe bore, DN20 medium steel", "D", 21.6, "mm"),
        ("Velocity in main", "v", "={q_s}/(PI()*({D}/1000)^2/4)", "m/s"),
        ("Velocity in main (second copy)", "v_x", "={q_s}/(PI()*{D}^2/4)", "m/s",
         "unit-scale", "bore in mm not converted: 10⁶ too small"),
        ("Velocity check", "chk_v", "=IF({v}>1,\"REDUCE\",\"OK\")", None),
        ("Darcy friction factor", "f", 0.03, "-"),
        ("Index circuit length, flow + return", "L", 86, "m"),
        ("Pipe friction loss", "dp_f", "={f}*{L}/({D}/1000)*{rho}*{v}^2/2/1000", "kPa"),
        ("Fittings allowance", "z", 30, "%"),
        ("Pipe and fittings loss", "dp_p", "={dp_f}*(1+{z}/100)", "kPa"),
        ("TRV and lockshield loss", "dp_v", 10, "kPa"),
        ("Boiler / plate heat exchanger loss", "dp_b", 12, "kPa"),
        ("Pump differential pressure", "dp", "=SUM({dp_p}:{dp_b})", "kPa"),
        ("Pump head", "H", "={dp}*1000/({rho}*9.81)", "m"),
        ("Pump head (second copy)", "H_x", "={dp}/({rho}*9.81)", "m",
         "unit-scale", "kPa not converted to Pa: 1000 too small"),
        ("Hydraulic power", "P_h", "={q_h}*{dp}/3600", "kW"),
        ("Hydraulic power in W (second copy)", "P_hx", "={q_h}*{dp}/3600", "W",
         "unit-scale", "the kW formula with W typed beside it"),
        ("Pump efficiency (wire to water)", "eta", 25, "%"),
        ("Pump electrical input", "P_e", "={P_h}*1000/({eta}/100)", "W"),
        ("Mean design ΔT of the radiators", "dT", "=AVERAGE(Radiators!E5:E13)", "K"),
        ("Mean return temperature", "t_r", "=Radiators!C5-{dT}", "°C"),
        ("Expansion vessel (EN 12828)",),
        ("System water content", "V_s", 240, "L"),
        ("Expansion of water, 10 to 70 °C", "e", 2.24, "%"),
        ("Expansion volume", "V_e", "={V_s}*{e}/100", "L"),
        ("Expansion volume (second copy)", "V_ex", "={V_s}*{e}", "L",
         "unit-scale", "% expansion used as a fraction: 100 too large"),
        ("Water seal", "V_WR", "=MAX(3,{V_s}*0.005)", "L"),
        ("Static height above vessel", "h_st", 14, "m"),
        ("Vessel pre-charge pressure", "p_0", "={h_st}/10+0.2", "bar(g)"),
        ("Safety valve set pressure", "p_sv", 3, "bar(g)"),
        ("Final pressure", "p_e", "={p_sv}-0.5", "bar(g)"),
        ("Vessel nominal volume", "V_n", "=({V_e}+{V_WR})*({p_e}+1)/({p_e}-{p_0})", "L"),
        ("Vessel nominal volume (second copy)", "V_nx", "=({V_e}+{V_WR})*{p_e}/({p_e}-{p_0})",
         "L", "offset-scale", "gauge final pressure in the vessel ratio, without + 1 bar"),
        ("Vessel volume, rounded up", "V_sel", "=ROUNDUP({V_n},0)", "L"),
    ])

# ============================================================================================
# Book 2: storm sewer design table (rational method, Manning full bore)
# ============================================================================================
CATCH = {
    "A1": "Harrow Lane business park: storm catchment summary (invented site)",
    "A2": "Sources: rational method Q = C·i·A, Q[m³/s] = C·i[mm/h]·A[ha]/360 and Q[L/s] = "
          "2.78·C·i·A (1 mm/h on 1 ha = 2.778 L/s, common practice); runoff coefficients from "
          "memory; 1 ha = 10 000 m² (SI Brochure 9th ed., Table 8); greenfield rate invented",
    "A4": "Surface", "B4": "Area [m²]", "C4": "C [-]", "D4": "C·A [m²]", "E4": "Area [ha]",
    "A10": "Total",
    "B10": "=SUM(B5:B9)", "D10": "=SUM(D5:D9)", "E10": "=SUM(E5:E9)",
}
for i, (s, a, c) in enumerate([("Roofs", 8450, 0.95), ("Car park", 12300, 0.90),
                               ("Access road", 3650, 0.90), ("Footways", 1900, 0.85),
                               ("Landscaping", 9800, 0.20)]):
    r = 5 + i
    CATCH.update({f"A{r}": s, f"B{r}": a, f"C{r}": c, f"D{r}": f"=B{r}*C{r}",
                  f"E{r}": f"=B{r}/10000"})
CATCH_ITEMS, CATCH_PLANTS = item_sheet(
    "Catchment", "", "", 13,
    [
        ("Weighted runoff coefficient", "C_w", "=SUMPRODUCT(B5:B9,C5:C9)/B10", "-"),
        ("Weighted runoff coefficient (check)", "C_w2", "=D10/B10", "-"),
        ("Total area", "A", "=B10/10000", "ha"),
        ("Total area (second copy)", "A_x", "=B10/1000", "ha",
         "unit-scale", "m² to ha divided by 1000, not 10 000"),
        ("Design intensity at outfall", "i", "=Sewer!L14", "mm/h"),
        ("Peak flow, whole site", "Q", "={C_w}*{i}*{A}/360", "m³/s"),
        ("Peak flow, whole site, L/s", "Q_L", "={Q}*1000", "L/s"),
        ("Peak flow, whole site, L/s (Lloyd-Davies form)", "Q_L2", "=2.78*{C_w}*{i}*{A}", "L/s"),
        ("Greenfield runoff rate", "q_g", 5, "L/(s·ha)"),
        ("Allowed discharge", "Q_a", "={q_g}*{A}", "L/s"),
        ("Attenuation needed?", "att", "=IF({Q_L}>{Q_a},\"YES\",\"NO\")", None),
    ])
del CATCH_ITEMS["A1"], CATCH_ITEMS["A2"]
CATCH.update(CATCH_ITEMS)

IDF = {
    "A1": "Design rainfall, 1 in 2 year return period (invented curve for the demo)",
    "A2": "Source: invented intensity–duration data; depth = i·D/60 (common practice)",
    "A4": "Duration [min]", "B4": "Intensity [mm/h]", "C4": "Depth [mm]",
    "A16": "Largest depth", "C16": "=MAX(C5:C14)",
}
for i, (d, it) in enumerate([(5, 62), (10, 46), (15, 37), (20, 31), (30, 24), (45, 18.5),
                             (60, 15), (90, 11.5), (120, 9.5), (180, 7)]):
    r = 5 + i
    IDF.update({f"A{r}": d, f"B{r}": it, f"C{r}": f"=B{r}*A{r}/60"})
IDF["C9"] = "=B9*A9"   # planted: mm/h times min without /60
IDF_PLANTS = {"IDF!C9": ("unit-scale", "depth from mm/h times minutes without /60")}

SEWER = {
    "A1": "Harrow Lane business park: storm sewer design, Lloyd-Davies method (invented site)",
    "A2": "Sources: Manning V = (1/n)·R^(2/3)·S^(1/2), R = D/4 running full; capacity V·πD²/4; "
          "time of flow L/V; t_c = entry time + Σ time of flow; Q = 2.78·C·i·A (L/s, mm/h, ha) "
          "(common practice); n = 0.013 s/m^(1/3) for concrete (from memory); self-cleansing "
          "velocity 0.75 m/s (common practice)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
    "A4": "Manning's n, concrete pipe", "B4": "n", "C4": 0.013, "D4": "s/m^(1/3)",
    "A5": "Time of entry", "B5": "t_e", "C5": 5, "D5": "min",
    "A6": "Self-cleansing velocity", "B6": "v_min", "C6": 0.75, "D6": "m/s",
    "A8": "Pipe", "B8": "Length [m]", "C8": "US IL [m]", "D8": "DS IL [m]", "E8": "Slope [m/m]",
    "F8": "Slope [%]", "G8": "Dia [mm]", "H8": "Velocity [m/s]", "I8": "Capacity [L/s]",
    "J8": "Time of flow [min]", "K8": "t_c [min]", "L8": "Intensity [mm/h]", "M8": "Area [ha]",
    "N8": "C [-]", "O8": "Cum. C·A [ha]", "P8": "Flow [L/s]", "Q8": "Flow [m³/s]",
    "R8": "Utilisation [%]", "S8": "Check",
    "A15": "Total / worst",
    "B15": "=SUM(B9:B14)", "H15": "=MIN(H9:H14)", "P15": "=MAX(P9:P14)", "R15": "=MAX(R9:R14)",
}
LEGS = [("S1.0", 42, 48.20, 47.90, 375, 0.62, 0.85), ("S1.1", 55, 47.85, 47.45, 450, 0.85, 0.80),
        ("S1.2", 38, 47.40, 47.12, 525, 0.48, 0.75), ("S1.3", 61, 47.05, 46.62, 600, 0.90, 0.70),
        ("S1.4", 47, 46.55, 46.20, 675, 0.71, 0.65), ("S1.5", 35, 46.10, 45.88, 675, 0.40, 0.90)]
for i, (p, length, us, ds, dia, area, c) in enumerate(LEGS):
    r = 9 + i
    SEWER.update({
        f"A{r}": p, f"B{r}": length, f"C{r}": us, f"D{r}": ds, f"G{r}": dia, f"M{r}": area,
        f"N{r}": c,
        f"E{r}": f"=(C{r}-D{r})/B{r}",
        f"F{r}": f"=E{r}*100",
        f"H{r}": f"=1/$C$4*(G{r}/4000)^(2/3)*E{r}^0.5",
        f"I{r}": f"=H{r}*PI()*(G{r}/1000)^2/4*1000",
        f"J{r}": f"=B{r}/H{r}/60",
        f"K{r}": f"=$C$5+J{r}" if i == 0 else f"=K{r - 1}+J{r}",
        f"L{r}": f"=VLOOKUP(K{r},IDF!$A$5:$B$14,2,TRUE)",
        f"O{r}": f"=M{r}*N{r}" if i == 0 else f"=O{r - 1}+M{r}*N{r}",
        f"P{r}": f"=2.78*O{r}*L{r}",
        f"Q{r}": f"=P{r}/1000",
        f"R{r}": f"=P{r}/I{r}*100",
        f"S{r}": f"=IF(P{r}>I{r},\"UPSIZE\",IF(H{r}<$C$6,\"LOW V\",\"OK\"))",
    })
SEWER["F10"] = "=(C10-D10)/B10"                         # planted
SEWER["H11"] = "=1/$C$4*(G11/4000)^(2/3)*F11^0.5"       # planted
SEWER["H12"] = "=1/$C$4*(G12/4)^(2/3)*E12^0.5"          # planted
SEWER["I13"] = "=H13*PI()*(G13/1000)^2/4"               # planted
SEWER["J14"] = "=B14/H14"                               # planted
SEWER["P11"] = "=O11*L11/360"                           # planted
SEWER_PLANTS = {
    "Sewer!F10": ("unit-scale", "slope as m/m typed into the % column"),
    "Sewer!H11": ("unit-scale", "Manning with the slope in % under the root: √100 = 10 too fast"),
    "Sewer!H12": ("unit-scale", "Manning with D in mm: R = D/4 not converted to m"),
    "Sewer!I13": ("unit-scale", "capacity in m³/s written into the L/s column, no *1000"),
    "Sewer!J14": ("unit-scale", "time of flow L/V in seconds into the min column, no /60"),
    "Sewer!P11": ("unit-scale", "C·i·A/360 gives m³/s, written into the L/s column"),
}

# ============================================================================================
# Book 3: hydrogen tube trailer (bar g, bar a, kg, Nm³, °C, K, Z)
# ============================================================================================
TUBES = {
    "A1": "Fenwick hydrogen hub: tube trailer TT-07, arrival readings (invented)",
    "A2": "Sources: p_abs = p_g + 1.01325 bar (standard atmosphere 101.325 kPa, ISO 2533); "
          "T/K = t/°C + 273.15 (SI Brochure 9th ed.); ρ = p·M/(Z·R·T) (real-gas law); "
          "M(H2) = 2.016 g/mol (IUPAC, from memory); R = 8.314 J/(mol·K) (CODATA 2018, "
          "8.314462618); normal state 0 °C, 1.01325 bar (DIN 1343, from memory); Z on sheet Zdata",
    "A4": "Tube", "B4": "Water volume [L]", "C4": "Pressure [bar g]", "D4": "Pressure [bar a]",
    "E4": "Temperature [°C]", "F4": "Temperature [K]", "G4": "Z [-]", "H4": "Density [kg/m³]",
    "I4": "Mass [kg]", "J4": "Normal volume [Nm³]",
    "A15": "Total / mean",
    "B15": "=SUM(B5:B14)", "C15": "=AVERAGE(C5:C14)", "E15": "=AVERAGE(E5:E14)",
    "I15": "=SUM(I5:I14)", "J15": "=SUM(J5:J14)",
    "A17": "Item", "B17": "Symbol", "C17": "Value", "D17": "Unit",
    "A18": "Molar mass of hydrogen", "B18": "M", "C18": 2.016, "D18": "g/mol",
    "A19": "Molar gas constant", "B19": "R", "C19": 8.314, "D19": "J/(mol·K)",
    "A20": "Normal pressure", "B20": "p_n", "C20": 1.01325, "D20": "bar a",
    "A21": "Normal temperature", "B21": "T_n", "C21": 273.15, "D21": "K",
    "A22": "Normal density of hydrogen", "B22": "rho_n",
    "C22": "=C20*100000*C18/1000/(C19*C21)", "D22": "kg/Nm³",
}
READ = [(2050, 238.5, 9.5), (2050, 239.0, 9.8), (2050, 237.6, 10.1), (2050, 238.2, 10.4),
        (2050, 240.1, 9.9), (2050, 236.9, 10.6), (2050, 238.8, 10.2), (2050, 239.4, 9.7),
        (2050, 237.2, 10.0), (2050, 238.0, 10.3)]
for i, (v, p, t) in enumerate(READ):
    r = 5 + i
    TUBES.update({
        f"A{r}": f"T{i + 1:02d}", f"B{r}": v, f"C{r}": p, f"E{r}": t,
        f"D{r}": f"=C{r}+1.01325",
        f"F{r}": f"=E{r}+273.15",
        f"G{r}": f"=VLOOKUP(D{r},Zdata!$A$5:$B$11,2,TRUE)",
        f"H{r}": f"=D{r}*100000*$C$18/1000/(G{r}*$C$19*F{r})",
        f"I{r}": f"=H{r}*B{r}/1000",
        f"J{r}": f"=I{r}/$C$22",
    })
TUBES["D8"] = "=C8+14.7"        # planted
TUBES["F10"] = "=E10-273.15"    # planted
TUBES_PLANTS = {
    "Tubes!D8": ("offset-scale", "the atmosphere in psi (14.7) added to a bar g reading"),
    "Tubes!F10": ("offset-scale", "°C to K subtracting 273.15: wrong way round"),
}

ZDATA = {
    "A1": "Compressibility factor of hydrogen at 15 °C (from memory, approximate, ±1 %)",
    "A2": "Source: from memory; the VLOOKUP takes the row at or below the pressure (common "
          "practice for a coarse table)",
    "A4": "Pressure [bar a]", "B4": "Z [-]",
}
for i, (p, z) in enumerate([(0, 1.000), (50, 1.032), (100, 1.064), (150, 1.096), (200, 1.128),
                            (250, 1.161), (300, 1.194)]):
    ZDATA.update({f"A{5 + i}": p, f"B{5 + i}": z})

INV, INV_PLANTS = item_sheet(
    "Inventory",
    "Fenwick hydrogen hub: TT-07 deliverable inventory and checks (invented)",
    "Sources: ρ = p·M/(Z·R·T); Z = 1 + b·p, a linear fit to hydrogen at 15 °C (from memory); "
    "LHV of hydrogen 120 MJ/kg (from memory, 119.96); Barlow hoop stress σ = p·D/(2t) (common "
    "practice); 1 MPa = 10 bar, 1 bar = 14.5038 psi, 1 MWh = 3600 MJ (NIST SP 811)",
    4,
    [
        ("Trailer water volume", "V", "=SUM(Tubes!B5:B14)/1000", "m³"),
        ("Trailer water volume (second copy)", "V_x", "=SUM(Tubes!B5:B14)", "m³",
         "unit-scale", "sum of litres into an m³ cell, no /1000"),
        ("Settled full pressure at 15 °C", "p_f", 250, "bar g"),
        ("Full pressure, absolute", "p_fa", "={p_f}+1.01325", "bar a"),
        ("Reference temperature", "t_ref", 15, "°C"),
        ("Reference temperature, absolute", "T_ref", "={t_ref}+273.15", "K"),
        ("Compressibility slope (fit)", "b", 0.00064, "1/bar"),
        ("Z when full", "Z_f", "=1+{b}*{p_fa}", "-"),
        ("Density when full", "rho_f", "={p_fa}*100000*Tubes!C18/1000/({Z_f}*Tubes!C19*{T_ref})",
         "kg/m³"),
        ("Density when full (second copy)", "rho_fx",
         "={p_fa}*100000*Tubes!C18/({Z_f}*Tubes!C19*{T_ref})", "kg/m³",
         "unit-scale", "molar mass in g/mol without /1000: 1000 too large"),
        ("Density when full (third copy)", "rho_fy",
         "={p_fa}*100000*Tubes!C18/1000/({Z_f}*Tubes!C19*{t_ref})", "kg/m³",
         "offset-scale", "gas law with the temperature in °C, not K"),
        ("Mass when full", "m_f", "={rho_f}*{V}", "kg"),
        ("Delivery cut-off pressure", "p_r", 20, "bar g"),
        ("Cut-off pressure, absolute", "p_ra", "={p_r}+1.01325", "bar a"),
        ("Z at cut-off", "Z_r", "=1+{b}*{p_ra}", "-"),
        ("Density at cut-off", "rho_r", "={p_ra}*100000*Tubes!C18/1000/({Z_r}*Tubes!C19*{T_ref})",
         "kg/m³"),
        ("Mass left at cut-off", "m_r", "={rho_r}*{V}", "kg"),
        ("Deliverable mass, full trailer", "m_d", "={m_f}-{m_r}", "kg"),
        ("Deliverable mass, as arrived", "m_da", "=Tubes!I15-{m_r}", "kg"),
        ("Deliverable normal volume, as arrived", "V_n", "={m_da}/Tubes!C22", "Nm³"),
        ("Lower heating value", "LHV", 120, "MJ/kg"),
        ("Deliverable energy", "E", "={m_da}*{LHV}/3600", "MWh"),
        ("Deliverable energy (second copy)", "E_x", "={m_da}*{LHV}/3.6", "MWh",
         "unit-scale", "MJ to MWh divided by 3.6 (that gives kWh)"),
        ("Maximum allowable working pressure", "MAWP", 275, "bar g"),
        ("Highest tube pressure, absolute", "p_max", "=MAX(Tubes!D5:D14)", "bar a"),
        ("MAWP check", "chk", "=IF(MAX(Tubes!C5:C14)>{MAWP},\"OVER MAWP\",\"OK\")", None),
        ("MAWP check (second copy)", "chk_x", "=IF({p_max}>{MAWP},\"OVER MAWP\",\"OK\")", None,
         "offset-scale", "absolute pressure compared with a gauge MAWP"),
        ("Hot-day tube temperature", "t_hot", 50, "°C"),
        ("Pressure on a hot day, absolute (Z held)", "p_ha", "={p_fa}*({t_hot}+273.15)/{T_ref}",
         "bar a"),
        ("Pressure on a hot day, gauge", "p_h", "={p_ha}-1.01325", "bar g"),
        ("Pressure on a hot day (second copy)", "p_hx", "={p_fa}*{t_hot}/{t_ref}", "bar a",
         "offset-scale", "Charles's law with °C temperatures"),
        ("Full pressure, psig", "p_fpsi", "={p_f}*14.5", "psig"),
        ("Full pressure, MPa gauge", "p_fM", "={p_f}/10", "MPa g"),
        ("Tube outside diameter", "D_o", 559, "mm"),
        ("Tube wall thickness", "t", 18, "mm"),
        ("Hoop stress at MAWP", "s_h", "={MAWP}/10*{D_o}/(2*{t})", "MPa"),
        ("Hoop stress at MAWP (second copy)", "s_hx", "={MAWP}*{D_o}/(2*{t})", "MPa",
         "unit-scale", "bar g used as MPa: 10 too large"),
        ("Dispensing rate", "q_d", 30, "kg/h"),
        ("Time to reach cut-off", "t_d", "={m_da}/{q_d}", "h"),
        ("Days of supply at 16 h/day", "t_days", "=ROUND({t_d}/16,1)", "d"),
    ])

# ============================================================================================
# Book 4: oilfield separator and gas lift, field units
# ============================================================================================
SEP, SEP_PLANTS = item_sheet(
    "Separator",
    "Osprey field, Pad 3: vertical two-phase test separator V-310, one well on test (invented)",
    "Sources: Souders–Brown V_max = K·√((ρ_L − ρ_G)/ρ_G), K = 0.35 ft/s with mesh pad (GPSA "
    "Engineering Data Book, sec. 7, from memory); ρ_G = p·SG·M_air/(Z·R·T), R = 10.73 "
    "psia·ft³/(lbmol·°R) (common practice); SG = 141.5/(131.5 + °API) (API definition); "
    "ρ = 62.4·SG lb/ft³ (common practice); actual gas q = q_sc·(14.7/p)·(T/520)·Z (common "
    "practice); 5.615 ft³/bbl, 1440 min/d, psia = psig + 14.7, °R = °F + 459.67 (NIST SP 811)",
    4,
    [
        ("Operating pressure", "p", 85, "psig"),
        ("Operating pressure, absolute", "p_a", "={p}+14.7", "psia"),
        ("Operating temperature", "T", 95, "°F"),
        ("Operating temperature, absolute", "T_R", "={T}+459.67", "°R"),
        ("Gas rate", "q_g", 450, "Mscf/d"),
        ("Oil rate", "q_o", 420, "bbl/d"),
        ("Water rate", "q_w", 350, "bbl/d"),
        ("Gas specific gravity (air = 1)", "SG_g", 0.68, "-"),
        ("Oil gravity", "API", 38, "°API"),
        ("Gas compressibility factor", "Z", 0.98, "-"),
        ("Molar mass of air", "M_air", 28.97, "lb/lbmol"),
        ("Gas constant", "R", 10.73, "psia·ft³/(lbmol·°R)"),
        ("Gas density", "rho_g", "={p_a}*{SG_g}*{M_air}/({Z}*{R}*{T_R})", "lb/ft³"),
        ("Gas density (second copy)", "rho_gx", "={p_a}*{SG_g}*{M_air}/({Z}*{R}*{T})", "lb/ft³",
         "offset-scale", "gas law with °F, not °R"),
        ("Oil specific gravity", "SG_o", "=141.5/(131.5+{API})", "-"),
        ("Oil density", "rho_o", "=62.4*{SG_o}", "lb/ft³"),
        ("Produced water specific gravity", "SG_w", 1.05, "-"),
        ("Water density", "rho_w", "=62.4*{SG_w}", "lb/ft³"),
        ("Liquid density, flow-weighted", "rho_L", "=({rho_o}*{q_o}+{rho_w}*{q_w})/({q_o}+{q_w})",
         "lb/ft³"),
        ("Souders–Brown K, mesh pad", "K", 0.35, "ft/s"),
        ("Maximum gas velocity", "V_max", "={K}*SQRT(({rho_L}-{rho_g})/{rho_g})", "ft/s"),
        ("Actual gas rate", "q_a", "={q_g}*1000/86400*(14.7/{p_a})*({T_R}/520)*{Z}", "ft³/s"),
        ("Actual gas rate (second copy)", "q_ax", "={q_g}*1000/86400*(14.7/{p})*({T_R}/520)*{Z}",
         "ft³/s", "offset-scale", "gas volume corrected with the gauge pressure"),
        ("Gas area needed", "A_g", "={q_a}/{V_max}", "ft²"),
        ("Minimum inside diameter", "d_min", "=SQRT(4*{A_g}/PI())*12", "in"),
        ("Minimum inside diameter (second copy)", "d_minx", "=SQRT(4*{A_g}/PI())", "in",
         "unit-scale", "diameter in ft written as in, no *12"),
        ("Selected inside diameter (6 in steps, 30 in minimum for liquid)", "d",
         "=MAX(ROUNDUP({d_min}/6,0)*6,30)", "in"),
        ("Liquid retention time", "t_r", 3, "min"),
        ("Liquid volume held", "V_L", "=({q_o}+{q_w})*{t_r}/1440", "bbl"),
        ("Liquid volume held (second copy)", "V_Lx", "=({q_o}+{q_w})*{t_r}/24", "bbl",
         "unit-scale", "bbl/d times minutes divided by 24, not 1440"),
        ("Liquid volume held, ft³", "V_Lf", "={V_L}*5.615", "ft³"),
        ("Liquid volume held, ft³ (second copy)", "V_Lfx", "={V_L}/5.615", "ft³",
         "unit-scale", "bbl to ft³ divided by 5.615: wrong way round"),
        ("Liquid height", "h_L", "={V_Lf}/(PI()*({d}/12)^2/4)", "ft"),
        ("Liquid height, in", "h_Li", "={h_L}*12", "in"),
        ("Gas-oil ratio", "GOR", "={q_g}*1000/{q_o}", "scf/bbl"),
        ("Water cut", "WC", "={q_w}/({q_o}+{q_w})*100", "%"),
        ("Water cut flag", "chk", "=IF({WC}>50,\"HIGH WC\",\"OK\")", None),
    ])

GL = {
    "A1": "Osprey field, Pad 3: gas-lift allocation and top unloading valve (invented)",
    "A2": "Sources: q_L = q_o/(1 − WC); formation gas = q_o·GOR; lift gas = q_L·GLR_inj (common "
          "practice); static gas column p_d = p_s·exp(0.01875·SG·D/(Z·T)), D in ft, T in °R "
          "(Brown, The Technology of Artificial Lift Methods, vol. 2a, from memory); top valve "
          "depth D = (p_ko − p_wh)/g_s (common practice); 0.433 psi/ft per SG (common practice)",
    "A4": "Well", "B4": "Oil [bbl/d]", "C4": "Water cut [%]", "D4": "Liquid [bbl/d]",
    "E4": "GOR [scf/bbl]", "F4": "Formation gas [Mscf/d]", "G4": "Injection GLR [scf/bbl]",
    "H4": "Lift gas [Mscf/d]", "I4": "Total gas [Mscf/d]",
    "A11": "Pad total",
    "B11": "=SUM(B5:B10)", "D11": "=SUM(D5:D10)", "F11": "=SUM(F5:F10)", "H11": "=SUM(H5:H10)",
    "I11": "=SUM(I5:I10)", "C11": "=(D11-B11)/D11*100",
}
for i, (w, qo, wc, gor, glr) in enumerate([("P3-01", 420, 45, 650, 400), ("P3-02", 310, 62, 720, 450),
                                           ("P3-03", 280, 58, 600, 450), ("P3-04", 390, 40, 680, 350),
                                           ("P3-05", 250, 70, 700, 500), ("P3-06", 200, 55, 640, 400)]):
    r = 5 + i
    GL.update({f"A{r}": w, f"B{r}": qo, f"C{r}": wc, f"E{r}": gor, f"G{r}": glr,
               f"D{r}": f"=B{r}/(1-C{r}/100)",
               f"F{r}": f"=B{r}*E{r}/1000",
               f"H{r}": f"=D{r}*G{r}/1000",
               f"I{r}": f"=F{r}+H{r}"})
GL["D7"] = "=B7/(1-C7)"      # planted
GL["F9"] = "=B9*E9"          # planted
GL_TABLE_PLANTS = {
    "GasLift!D7": ("unit-scale", "water cut in % used as a fraction: 1 − 58"),
    "GasLift!F9": ("unit-scale", "bbl/d × scf/bbl gives scf/d, written as Mscf/d, no /1000"),
}
GL_ITEMS, GL_PLANTS = item_sheet(
    "GasLift", "", "", 14,
    [
        ("Lift gas available from compressor", "q_av", 900, "Mscf/d"),
        ("Lift gas shortfall", "q_sh", "=MAX(0,H11-{q_av})", "Mscf/d"),
        ("Lift gas demand per minute", "q_min", "=H11*1000/1440", "scf/min"),
        ("Kick-off (surface injection) pressure", "p_ko", 1150, "psig"),
        ("Flowing wellhead pressure", "p_wh", 120, "psig"),
        ("Kill fluid gradient", "g_s", 0.465, "psi/ft"),
        ("Depth of top valve", "D_1", "=({p_ko}-{p_wh})/{g_s}", "ft"),
        ("Kick-off pressure, absolute", "p_koa", "={p_ko}+14.7", "psia"),
        ("Depth of top valve (second copy)", "D_1x", "=({p_koa}-{p_wh})/{g_s}", "ft",
         "offset-scale", "psia minus psig"),
        ("Lift gas specific gravity", "SG", "={Separator.SG_g}", "-"),
        ("Mean annulus temperature", "T_m", 140, "°F"),
        ("Mean annulus temperature, absolute", "T_mR", "={T_m}+460", "°R"),
        ("Mean Z in the annulus", "Z_a", 0.9, "-"),
        ("Casing pressure at top valve", "p_d", "={p_koa}*EXP(0.01875*{SG}*{D_1}/({Z_a}*{T_mR}))",
         "psia"),
        ("Casing pressure at top valve, gauge", "p_dg", "={p_d}-14.7", "psig"),
        ("Tubing inside diameter, 2-7/8 in", "d_t", 2.441, "in"),
        ("Tubing flow area", "A_t", "=PI()*{d_t}^2/4/144", "ft²"),
        ("Tubing flow area (second copy)", "A_tx", "=PI()*{d_t}^2/4", "ft²",
         "unit-scale", "area from a diameter in inches written as ft², no /144"),
        ("Water column to top valve", "p_hw", "=0.433*{Separator.SG_w}*{D_1}", "psi"),
        ("Top valve depth flag", "chk", "=IF({D_1}>8000,\"TOO DEEP\",\"OK\")", None),
    ])
del GL_ITEMS["A1"], GL_ITEMS["A2"]
GL.update(GL_ITEMS)
GL_PLANTS.update(GL_TABLE_PLANTS)

BOOKS = {
    "lindenhof-hydronic": {
        "trade": "building services: LTHW radiator schedule, circulation pump, expansion vessel",
        "sheets": [("Radiators", RAD), ("Catalogue", CAT), ("Pump", PUMP)],
        "plants": {**RAD_PLANTS, **PUMP_PLANTS},
    },
    "harrow-lane-storm": {
        "trade": "drainage: storm sewer design table, rational (Lloyd-Davies) method, Manning",
        "sheets": [("Catchment", CATCH), ("IDF", IDF), ("Sewer", SEWER)],
        "plants": {**CATCH_PLANTS, **IDF_PLANTS, **SEWER_PLANTS},
    },
    "fenwick-h2-trailer": {
        "trade": "compressed gas: hydrogen tube trailer arrival check and inventory",
        "sheets": [("Tubes", TUBES), ("Zdata", ZDATA), ("Inventory", INV)],
        "plants": {**TUBES_PLANTS, **INV_PLANTS},
    },
    "osprey-separator-gaslift": {
        "trade": "oil and gas production: test separator sizing and gas-lift allocation",
        "sheets": [("Separator", SEP), ("GasLift", GL)],
        "plants": {**SEP_PLANTS, **GL_PLANTS},
        "sidecar": "# Units the sheet uses that plumb's table lacks: the pound-mole (NIST SP 811,\n"
                   "# B.8: 1 lb = 0.45359237 kg exactly, so 1 lbmol = 453.59237 mol)\n"
                   "measure lbmol = 453.59237 mol\n",
    },
}


def formula_cells(sheets):
    out = []
    for name, cells in sheets:
        for cell, val in cells.items():
            if isinstance(val, str) and val.startswith("="):
                out.append((f"{name}!{cell}", val))
    return out


def main():
    summary = {}
    for book, spec in BOOKS.items():
        resolve(spec["sheets"])
        write_xlsx(os.path.join(HERE, f"{book}.xlsx"), spec["sheets"])
        if "sidecar" in spec:
            with open(os.path.join(HERE, f"{book}.cells.plumb"), "w") as f:
                f.write(spec["sidecar"])
        fcells = dict(formula_cells(spec["sheets"]))
        for key in spec["plants"]:
            assert key in fcells, key
        with open(os.path.join(HERE, f"{book}.planted"), "w") as f:
            f.write("# sheet!cell rule: the planted mistakes plumb must report; every other\n"
                    "# formula cell must stay clean (written by make_books.py)\n")
            for key, (rule, what) in spec["plants"].items():
                f.write(f"# planted: {what}\n{key} {rule}\n")
        summary[book] = {
            "trade": spec["trade"],
            "planted": {k: {"rule": r, "what": w, "formula": fcells[k]}
                        for k, (r, w) in spec["plants"].items()},
            "correct": {k: v for k, v in fcells.items() if k not in spec["plants"]},
        }
    with open(os.path.join(HERE, "expect.json"), "w") as f:
        json.dump(summary, f, indent=1, ensure_ascii=False)
    for book, s in summary.items():
        print(f"{book}: {len(s['planted'])} planted, {len(s['correct'])} correct formula cells")


if __name__ == "__main__":
    main()
