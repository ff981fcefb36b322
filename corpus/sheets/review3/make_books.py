#!/usr/bin/env python3
"""Four review workbooks for plumb's workbook checking (ninth review), written with the standard
zipfile module (xlsx_writer.py, copied from corpus/sheets/review2 and extended).

Trades and books (all scenarios, sites and firms invented):
  1. hvac-office-ahu.xlsx      an office floor's supply-air system: zone airflows, duct sizing and
                               fan selection in US units (cfm, fpm, in. w.g., bhp, 1.08, 4.5, 500)
  2. steel-base-plate.xlsx     a steel column base plate and anchor rods in SI (kN, mm, MPa, kN·m)
  3. steam-heater.xlsx         a process plant's shell-and-tube steam heater (kg/h, kW, °C, barg
                               steam, LMTD, latent heat looked up in a steam table)
  4. crude-gathering.xlsx      a crude oil gathering line's hydraulics (bbl/d, psi, ft, cP, °API,
                               Darcy friction)

Formulas are written with {symbol} (same sheet) or {Sheet!symbol} placeholders that are replaced
by the symbol's value cell. Every formula cell is either planted (a mistake engineers make, with
the rule expected) or correct; both lists are written to <book>.expect and expect.json.

Run: python3 make_books.py
"""
import json
import os
import re

from xlsx_writer import write_xlsx

HERE = os.path.dirname(os.path.abspath(__file__))

PLACEHOLDER = re.compile(r"\{(?:([A-Za-z]+)!)?([A-Za-z_][A-Za-z0-9_]*)\}")


class Sheet:
    def __init__(self, name):
        self.name = name
        self.cells = {}
        self.syms = {}
        self.planted = {}  # cell -> (rule, what)

    def text(self, cell, value):
        self.cells[cell] = value

    def items(self, first_row, rows):
        """rows: (label, symbol, value or formula, unit[, (rule, what) when planted])."""
        self.cells[f"A{first_row}"] = "Item"
        self.cells[f"B{first_row}"] = "Symbol"
        self.cells[f"C{first_row}"] = "Value"
        self.cells[f"D{first_row}"] = "Unit"
        r = first_row + 1
        for row in rows:
            label, sym, value, unit = row[:4]
            self.cells[f"A{r}"] = label
            self.cells[f"B{r}"] = sym
            self.cells[f"C{r}"] = value
            if unit:
                self.cells[f"D{r}"] = unit
            if sym in self.syms:
                raise ValueError(f"{self.name}: symbol {sym} twice")
            self.syms[sym] = f"C{r}"
            if len(row) > 4:
                self.planted[f"C{r}"] = row[4]
            r += 1
        return r

    def plant(self, cell, formula, rule, what):
        self.cells[cell] = formula
        self.planted[cell] = (rule, what)


def resolve(sheets):
    by_name = {s.name: s for s in sheets}
    for s in sheets:
        for cell, raw in list(s.cells.items()):
            if isinstance(raw, str) and raw.startswith("="):
                def sub(m, s=s):
                    target = by_name[m.group(1)] if m.group(1) else s
                    ref = target.syms[m.group(2)]
                    return f"{target.name}!{ref}" if m.group(1) else ref
                s.cells[cell] = PLACEHOLDER.sub(sub, raw)


# ---------------------------------------------------------------------------------------------
# Book 1: office floor supply-air system (US units)
# ---------------------------------------------------------------------------------------------
def book_hvac():
    zones = Sheet("Zones")
    zones.text("A1", "Larkspur Court offices, level 4: AHU-4 supply air (invented project)")
    zones.text("A2", "Sources: sensible heat q_s = 1.08·cfm·ΔT and total heat q_t = 4.5·cfm·Δh "
               "for standard air, 0.075 lb/ft³ × 0.24 Btu/(lb·°F) × 60 min/h (Carrier System "
               "Design Manual, part 2, from memory; ASHRAE Handbook—Fundamentals writes 1.10 "
               "with c_p 0.244); chilled water gpm = q/(500·ΔT), 500 = 8.33 lb/gal × 60 min/h "
               "(common practice); 1 ton = 12 000 Btu/h, 1 cfm = 0.4719 L/s, 1 Btu/h = 0.2931 W "
               "(NIST SP 811, B.8); air density ρ = ρ_std·530/(t + 460), ideal gas with "
               "°R = °F + 459.67 (NIST SP 811, B.8); °C = (°F − 32)/1.8 (NIST SP 811, B.8).")
    zones.text("A3", "Zone loads from the block load run of 12 March (invented); ΔT = room "
               "minus supply.")
    heads = ["Zone", "Sensible load [Btu/h]", "Room [°F]", "Supply [°F]", "ΔT [°F]",
             "Airflow [cfm]", "Airflow [L/s]"]
    for i, h in enumerate(heads):
        zones.text(f"{'ABCDEFG'[i]}5", h)
    data = [("4N open office", 86400, 75, 55), ("4E open office", 64800, 75, 55),
            ("4S open office", 97200, 75, 55), ("4W perimeter offices", 58300, 75, 55),
            ("Conference 4.12", 23800, 74, 55), ("Core and corridors", 18500, 76, 55)]
    for r, (z, q, tr, ts) in enumerate(data, start=6):
        zones.text(f"A{r}", z)
        zones.text(f"B{r}", q)
        zones.text(f"C{r}", tr)
        zones.text(f"D{r}", ts)
        zones.text(f"E{r}", f"=C{r}-D{r}")
        zones.text(f"F{r}", f"=B{r}/(1.08*E{r})")
        zones.text(f"G{r}", f"=F{r}*0.4719")
    zones.text("A12", "Sum / minimum")
    zones.text("B12", "=SUM(B6:B11)")
    zones.text("E12", "=MIN(E6:E11)")
    zones.text("F12", "=SUM(F6:F11)")
    zones.text("G12", "=SUM(G6:G11)")
    zones.items(14, [
        ("Diversity on the sum of zone peaks", "DF", 0.9, "-"),
        ("Design supply airflow (rounded to 50 cfm)", "Q_s", "=ROUND(F12*{DF}/50,0)*50",
         "cfm"),
        ("Block airflow check (block load, least ΔT)", "Q_b", "=B12/1.08*E12", "cfm",
         ("result-unit", "precedence slip: load/1.08*ΔT multiplies by ΔT instead of dividing")),
        ("Design supply airflow for the metric schedule", "Q_sL", "={Q_s}", "L/s",
         ("unit-scale", "cfm copied into a cell labelled L/s without ×0.4719")),
        ("Minimum outdoor air fraction", "x_oa", 25, "%"),
        ("Outdoor airflow", "Q_oa", "={Q_s}*{x_oa}/100", "cfm"),
        ("Outdoor air, summer design dry bulb", "T_oa", 94, "°F"),
        ("Return air temperature", "T_ra", 77, "°F"),
        ("Mixed air temperature", "T_ma", "={T_ra}+{x_oa}/100*({T_oa}-{T_ra})", "°F"),
        ("Mixed air temperature, weighted-mean form", "T_mw",
         "={x_oa}/100*{T_oa}+(1-{x_oa}/100)*{T_ra}", "°F"),
        ("Coil leaving air temperature", "T_la", 54, "°F"),
        ("Coil sensible load", "q_cs", "=1.08*{Q_s}*({T_ma}-{T_la})", "Btu/h"),
        ("Entering air enthalpy (psychrometric chart)", "h_ea", 31.2, "Btu/lb"),
        ("Leaving air enthalpy (psychrometric chart)", "h_la", 22.1, "Btu/lb"),
        ("Coil total load", "q_ct", "=4.5*{Q_s}*({h_ea}-{h_la})", "Btu/h"),
        ("Coil sensible heat ratio", "SHR", "={q_cs}/{q_ct}", "-"),
        ("Coil total load, tons", "q_tn", "={q_ct}/12000", "tons"),
        ("Coil total load, kW", "q_kW", "={q_ct}*0.2931/1000", "kW"),
        ("Chilled water rise", "dT_w", 12, "Δ°F"),
        ("Chilled water flow", "Q_w", "={q_ct}/(500*{dT_w})", "gpm"),
        ("Chilled water rise, metric equipment schedule", "dT_wK", 6.7, "K"),
        ("Chilled water flow, from the metric schedule", "Q_wx", "={q_ct}/(500*{dT_wK})",
         "gpm", ("unit-scale", "a kelvin rise in the 500 formula, which wants °F: 1.8 too much flow")),
        ("Coil leaving air temperature, °C", "T_laC", "=({T_la}-32)/1.8", "°C"),
        ("Supply air temperature, °C (metric schedule)", "T_sC", "=(D6-32)*1.8", "°C",
         ("unit-scale", "°F to °C multiplied by 1.8 instead of divided")),
        ("Standard air density", "rho_s", 0.075, "lb/ft³"),
        ("Air density at mixed-air temperature", "rho_m", "={rho_s}*530/({T_ma}+460)",
         "lb/ft³"),
        ("Air density at mixed-air temperature, check", "rho_x", "={rho_s}*70/{T_ma}",
         "lb/ft³", ("offset-scale", "Charles's law with °F readings, not absolute °R")),
    ])

    duct = Sheet("Duct")
    duct.text("A1", "Larkspur Court offices, level 4: AHU-4 supply duct sizing (invented project)")
    duct.text("A2", "Sources: rectangular area = W·H/144 (ft² from in.); velocity = cfm/area; "
              "equivalent diameter D_e = 1.30(ab)^0.625/(a + b)^0.25 (Huebscher, as printed in "
              "ASHRAE Handbook—Fundamentals, duct design chapter, from memory); velocity "
              "pressure p_v = (V/4005)² in. w.g., standard air (ASHRAE Handbook—Fundamentals, "
              "duct design chapter, from memory); 1 fpm = 0.00508 m/s (NIST SP 811, B.8); "
              "2000 fpm limit on mains above ceilings (common practice).")
    heads = ["Section", "Airflow [cfm]", "Width [in]", "Height [in]", "Area [ft²]",
             "Velocity [fpm]", "Eq. diameter [in]", "Vel. pressure [in. w.g.]",
             "Velocity [m/s]", "Check"]
    for i, h in enumerate(heads):
        duct.text(f"{'ABCDEFGHIJ'[i]}4", h)
    sections = [("AHU-4 discharge to shaft", "={Zones!Q_s}", 44, 28),
                ("Shaft to north/east split", "=Zones!F6+Zones!F7", 30, 20),
                ("South trunk", "=Zones!F8", 24, 18),
                ("West trunk", "=Zones!F9", 20, 16),
                ("Core branch", "=Zones!F10+Zones!F11", 14, 12)]
    for r, (name, q, w, h) in enumerate(sections, start=5):
        duct.text(f"A{r}", name)
        duct.text(f"B{r}", q)
        duct.text(f"C{r}", w)
        duct.text(f"D{r}", h)
        duct.text(f"E{r}", f"=C{r}*D{r}/144")
        duct.text(f"F{r}", f"=B{r}/E{r}")
        duct.text(f"G{r}", f"=1.3*(C{r}*D{r})^0.625/(C{r}+D{r})^0.25")
        duct.text(f"H{r}", f"=(F{r}/4005)^2")
        duct.text(f"I{r}", f"=F{r}*0.00508")
        duct.text(f"J{r}", f"=IF(F{r}<=2000,\"OK\",\"HIGH\")")
    duct.plant("E7", "=C7*D7/12", "unit-scale", "in² to ft² divided by 12, not 144")
    duct.text("A10", "Maximum")
    duct.text("F10", "=MAX(F5:F9)")
    duct.text("H10", "=MAX(H5:H9)")
    duct.items(12, [
        ("Runout to VAV-4.12, round", "D_r", 14, "in"),
        ("Runout airflow", "Q_r", "=Zones!F10", "cfm"),
        ("Runout area", "A_r", "=PI()*({D_r}/12)^2/4", "ft²"),
        ("Runout velocity", "V_r", "={Q_r}/{A_r}", "fpm"),
        ("Index run friction loss (duct program)", "dp_d", 0.42, "in. w.g."),
    ])

    fan = Sheet("Fan")
    fan.text("A1", "Larkspur Court offices, level 4: AHU-4 supply fan selection (invented project)")
    fan.text("A2", "Sources: fan brake horsepower bhp = cfm·TSP/(6356·η), 6356 = 33 000 "
             "ft·lbf/(min·hp) ÷ 5.193 lbf/ft² per in. w.g. (ASHRAE Handbook—HVAC Systems and "
             "Equipment, fans chapter, from memory); fan laws: cfm ∝ rpm, pressure ∝ rpm², "
             "power ∝ rpm³ (same chapter); 1 hp = 0.746 kW, 1 in. w.g. = 249.1 Pa, "
             "1 cfm·in. w.g. = 0.1176 W (NIST SP 811, B.8); motor: next size above bhp × 1.15 "
             "(common practice); NEMA premium efficiency 92.4 % at 15 hp (NEMA MG 1 table, "
             "from memory).")
    fan.text("A4", "Component")
    fan.text("B4", "Pressure drop [in. w.g.]")
    comps = [("Outdoor air louvre and damper", 0.15), ("MERV 8 pre-filter, mid-life", 0.45),
             ("Chilled water coil, wet", 0.85), ("Supply duct, index run", "={Duct!dp_d}"),
             ("Fittings on the index run", 0.35), ("VAV box and diffuser", 0.40)]
    for r, (name, v) in enumerate(comps, start=5):
        fan.text(f"A{r}", name)
        fan.text(f"B{r}", v)
    fan.text("A11", "Subtotal")
    fan.text("B11", "=SUM(B5:B10)")
    fan.text("F13", "Required from [hp]")
    fan.text("G13", "Motor [hp]")
    motors = [(0, 3), (3, 5), (5, 7.5), (7.5, 10), (10, 15), (15, 20), (20, 25), (25, 30),
              (30, 40), (40, 50)]
    for r, (lo, hp) in enumerate(motors, start=14):
        fan.text(f"F{r}", lo)
        fan.text(f"G{r}", hp)
    fan.items(13, [
        ("Final filter, MERV 14 (vendor data, mid-life)", "dp_ff", 125, "Pa"),
        ("Total static pressure", "TSP", "=B11+{dp_ff}/249.1", "in. w.g."),
        ("Total static pressure, filter as listed", "TSP_x", "=SUM(B5:B10)+{dp_ff}",
         "in. w.g.", ("unit-scale", "a Pa filter drop added to in. w.g.")),
        ("Total static pressure, Pa", "TSP_Pa", "={TSP}*249.1", "Pa"),
        ("Fan airflow", "Q", "={Zones!Q_s}", "cfm"),
        ("Fan total efficiency at duty (fan curve)", "eta", 64, "%"),
        ("Fan brake horsepower", "bhp", "={Q}*{TSP}/(6356*{eta}/100)", "bhp"),
        ("Fan brake horsepower, quick check", "bhp_x", "={Q}*{TSP}/(6356*{eta})", "bhp",
         ("unit-scale", "efficiency in % used as a fraction: 100 times too small")),
        ("Air power", "P_air", "={Q}*{TSP}*0.1176", "W"),
        ("Fan shaft power", "P_sh", "={bhp}*0.746", "kW"),
        ("Motor efficiency", "eta_m", 0.924, "-"),
        ("Motor input power", "P_in", "={P_sh}/{eta_m}", "kW"),
        ("Motor input power, electrical schedule", "P_inx", "={bhp}*746/{eta_m}", "kW",
         ("unit-scale", "746 W per hp into a kW cell")),
        ("Motor power required, 15 % margin", "hp_req", "={bhp}*1.15", "hp"),
        ("Motor nameplate", "hp_m", "=VLOOKUP({hp_req},F14:G23,2)", "hp"),
        ("Fan speed at duty", "n1", 1150, "rpm"),
        ("Airflow after re-balance (+8 %)", "Q2", "={Q}*1.08", "cfm"),
        ("Fan speed for the new airflow", "n2", "={n1}*{Q2}/{Q}", "rpm"),
        ("Static pressure at the new speed", "TSP2", "={TSP}*({n2}/{n1})^2", "in. w.g."),
        ("Brake horsepower at the new speed", "bhp2", "={bhp}*({n2}/{n1})^3", "bhp"),
        ("Motor check", "chk", "=IF({bhp2}<={hp_m},\"OK\",\"UPSIZE MOTOR\")", ""),
    ])
    sheets = [zones, duct, fan]
    resolve(sheets)
    inwg = [f"Duct!H5:H10", f"Duct!{duct.syms['dp_d']}", "Fan!B5:B11"]
    inwg += [f"Fan!{fan.syms[s]}" for s in ("TSP", "TSP_x", "TSP2")]
    sidecar = ["# Units the sheet types in ways plumb's table lacks (the sheet is left as the",
               "# engineers typed it: 'in. w.g.', 'bhp', 'tons')",
               'measure bhp = 1 hp "brake horsepower: the fan shaft power"',
               'measure tons = 1 TR "ton of refrigeration, 12 000 Btu/h"']
    sidecar += [f'cells {c} : inH2O "typed in. w.g. in the sheet"' for c in inwg]
    return "hvac-office-ahu", ("office floor supply-air system: zone airflows, duct sizing and "
                               "fan selection (US units)"), sheets, sidecar


# ---------------------------------------------------------------------------------------------
# Book 2: steel column base plate and anchor rods (SI)
# ---------------------------------------------------------------------------------------------
def book_baseplate():
    loads = Sheet("Loads")
    loads.text("A1", "Harrow Lane distribution centre: column C-7 at grid D/4 (invented project)")
    loads.text("A2", "Sources: LRFD combinations 1.2D + 1.6L, 1.2D + 1.0W + 1.0L and 0.9D + 1.0W "
               "(ASCE/SEI 7-16, 2.3.1, combinations 2, 4 and 6, from memory; roof live, snow "
               "and rain nil on this bay: invented). Actions at the top of the base plate.")
    for i, h in enumerate(["Action", "P [kN]", "M [kN·m]", "V [kN]"]):
        loads.text(f"{'ABCD'[i]}4", h)
    for r, (name, p, m, v) in enumerate([("Dead, D", 310, 18, 6), ("Live, L", 190, 12, 4),
                                         ("Wind, W", 40, 95, 38)], start=5):
        loads.text(f"A{r}", name)
        loads.text(f"B{r}", p)
        loads.text(f"C{r}", m)
        loads.text(f"D{r}", v)
    for i, h in enumerate(["Combination", "P_u [kN]", "M_u [kN·m]", "V_u [kN]"]):
        loads.text(f"{'ABCD'[i]}9", h)
    loads.text("A10", "1.2D + 1.6L")
    loads.text("A11", "1.2D + 1.0W + 1.0L")
    loads.text("A12", "0.9D + 1.0W")
    loads.text("A13", "Envelope (max)")
    for c in "BCD":
        loads.text(f"{c}10", f"=1.2*{c}5+1.6*{c}6")
        loads.text(f"{c}11", f"=1.2*{c}5+1.0*{c}7+1.0*{c}6")
        loads.text(f"{c}12", f"=0.9*{c}5+1.0*{c}7")
        loads.text(f"{c}13", f"=MAX({c}10:{c}12)")
    loads.plant("C12", "=0.9*C5+1.0*B7", "sum-mismatch",
                "copy slip: the wind axial load (kN) added to a moment (kN·m)")

    plate = Sheet("Plate")
    plate.text("A1", "Harrow Lane distribution centre: C-7 base plate (invented project)")
    plate.text("A2", "Sources: AISC Design Guide 1, 2nd ed. (Fisher and Kloiber, 2006): 3.1 "
               "(bearing, t = l·√(2P_u/(0.9F_y·B·N))), 3.3 (moment: e_crit = N/2 − P_u/(2q_max), "
               "Y from the quadratic, t = 1.5m√(f_p/F_y) or 2.11√(f_p·Y(m − Y/2)/F_y)) and 3.4 "
               "(tension side, t = 2.11√(T_u·x/(B·F_y))); AISC 360-16 J8: φ_c = 0.65, "
               "f_p,max = φ0.85f'c√(A2/A1) ≤ φ1.7f'c. W310×97: d = 308 mm, b_f = 305 mm, "
               "t_f = 15.4 mm (AISC shapes database, metric, from memory). Steel 7850 kg/m³ "
               "(common practice); g = 9.81 m/s² (standard gravity 9.80665, SI Brochure 9th ed.).")
    plate.items(4, [
        ("Factored axial load (1.2D + 1.0W + 1.0L)", "Pu", "=Loads!B11", "kN"),
        ("Factored moment", "Mu", "=Loads!C11", "kN·m"),
        ("Column depth", "d", 308, "mm"),
        ("Column flange width", "bf", 305, "mm"),
        ("Column flange thickness", "tf", 15.4, "mm"),
        ("Plate length, in the plane of the moment", "N", 450, "mm"),
        ("Plate width", "B", 450, "mm"),
        ("Concrete strength f'c", "fc", 28, "MPa"),
        ("Plate yield strength (ASTM A36)", "Fy", 250, "MPa"),
        ("Pedestal area, 600 × 600 (pedestal schedule)", "A2", 0.36, "m²"),
        ("Plate area", "A1", "={N}*{B}", "mm²"),
        ("Area ratio √(A2/A1), not above 2", "rA", "=MIN(SQRT({A2}*1000000/{A1}),2)", "-"),
        ("Area ratio as typed on the pedestal sheet", "rA_x", "=MIN(SQRT({A2}/{A1}),2)", "-",
         ("unit-scale", "m² over mm² under the root: 1000 times too small")),
        ("Design bearing stress φ0.85f'c√(A2/A1)", "fpmax", "=0.65*0.85*{fc}*{rA}", "MPa"),
        ("Eccentricity M_u/P_u", "e", "={Mu}/{Pu}*1000", "mm"),
        ("Bearing force per unit length q_max = f_p,max·B", "q", "={fpmax}*{B}", "kN/m"),
        ("Critical eccentricity", "ecrit", "={N}/2-{Pu}*1000/(2*{q})", "mm"),
        ("Critical eccentricity, hand check", "ecrit_x", "={N}/2-{Pu}/(2*{q})", "mm",
         ("unit-scale", "kN over kN/m is metres, subtracted from mm")),
        ("Moment case", "case", "=IF({e}>{ecrit},\"large moment\",\"small moment\")", ""),
        ("Plate centre to anchor line", "f", 175, "mm"),
        ("Bearing length Y", "Y",
         "=({f}+{N}/2)-SQRT(({f}+{N}/2)^2-2*{Pu}*1000*({e}+{f})/{q})", "mm"),
        ("Anchor tension, total T_u = q·Y − P_u", "Tu", "={q}*{Y}/1000-{Pu}", "kN"),
        ("Cantilever m", "m", "=({N}-0.95*{d})/2", "mm"),
        ("Cantilever n", "n", "=({B}-0.8*{bf})/2", "mm"),
        ("Cantilever λn'", "lam", "=SQRT({d}*{bf})/4", "mm"),
        ("Governing cantilever", "l", "=MAX({m},{n},{lam})", "mm"),
        ("Thickness, bearing side", "t_b",
         "=IF({Y}>={m},1.5*{m}*SQRT({fpmax}/{Fy}),2.11*SQRT({fpmax}*{Y}*({m}-{Y}/2)/{Fy}))",
         "mm"),
        ("Anchor line to flange centre", "x", "={f}-{d}/2+{tf}/2", "mm"),
        ("Thickness, tension side", "t_t", "=2.11*SQRT({Tu}*1000*{x}/({B}*{Fy}))", "mm"),
        ("Thickness for axial load alone", "t_ax",
         "={l}*SQRT(2*{Pu}*1000/(0.9*{Fy}*{B}*{N}))", "mm"),
        ("Thickness for axial load alone, old sheet", "t_axx",
         "={l}*SQRT(2*{Pu}/(0.9*{Fy}*{B}*{N}))", "mm",
         ("unit-scale", "kN over MPa·mm² under the root without ×1000: √1000 too thin")),
        ("Thickness required", "t_req", "=MAX({t_b},{t_t},{t_ax})", "mm"),
        ("Thickness provided", "t_p", 38, "mm"),
        ("Plate check", "chk", "=IF({t_p}>={t_req},\"OK\",\"THICKEN\")", ""),
        ("Plate mass", "mass", "={N}*{B}*{t_p}*7850/1000000000", "kg"),
        ("Plate self-weight", "W", "={mass}*9.81/1000", "kN"),
        ("Plate self-weight for the load take-down", "W_x", "={mass}/1000", "kN",
         ("result-unit", "mass in kg divided by 1000 called kN: the g is missing")),
    ])

    anch = Sheet("Anchors")
    anch.text("A1", "Harrow Lane distribution centre: C-7 anchor rods (invented project)")
    anch.text("A2", "Sources: ACI 318-19 ch. 17 (from memory): steel in tension N_sa = A_se·f_uta "
              "(17.6.1.2), φ = 0.75; steel in shear V_sa = 0.6·A_se·f_uta (17.7.1.2b), "
              "φ = 0.65, × 0.8 on a grout pad (17.7.1.2.1); basic concrete breakout "
              "N_b = k_c·λ_a·√f'c·h_ef^1.5, k_c = 10 for cast-in anchors with N, MPa and mm "
              "(17.6.2.2.1); interaction ≤ 1.2 (17.8.3). Tensile stress area A_s = "
              "π/4·(d − 0.9382P)² (ISO 898-1). ASTM F1554 Grade 36: f_uta = 400 MPa (58 ksi). "
              "E_s = 200 GPa (AISC 360-16). Lever-arm check T = M/z − P/2 (common practice).")
    anch.items(4, [
        ("Anchor tension, total (from the plate sheet)", "Tu", "={Plate!Tu}", "kN"),
        ("Factored shear (envelope)", "Vu", "=Loads!D13", "kN"),
        ("Factored moment", "Mu", "={Plate!Mu}", "kN·m"),
        ("Factored axial load", "Pu", "={Plate!Pu}", "kN"),
        ("Anchors in tension", "n_t", 2, "-"),
        ("Anchors in all", "n_a", 4, "-"),
        ("Anchor diameter (M24)", "da", 24, "mm"),
        ("Thread pitch", "P", 3, "mm"),
        ("Tensile stress area", "As", "=PI()/4*({da}-0.9382*{P})^2", "mm²"),
        ("Anchor ultimate strength f_uta", "futa", 400, "MPa"),
        ("φN_sa per anchor", "Nsa", "=0.75*{As}*{futa}/1000", "kN"),
        ("φN_sa per anchor, summary table", "Nsa_x", "=0.75*{As}*{futa}", "kN",
         ("unit-scale", "MPa·mm² gives N, written as kN")),
        ("Tension per anchor", "Tb", "={Tu}/{n_t}", "kN"),
        ("φV_sa per anchor, on grout", "Vsa", "=0.65*0.6*{As}*{futa}*0.8/1000", "kN"),
        ("Shear per anchor", "Vb", "={Vu}/{n_a}", "kN"),
        ("Interaction", "IR", "={Tb}/{Nsa}+{Vb}/{Vsa}", "-"),
        ("Interaction check", "chk", "=IF({IR}<=1.2,\"OK\",\"NG\")", ""),
        ("Effective embedment", "hef", 300, "mm"),
        ("Basic breakout strength, one anchor", "Nb",
         "=10*1.0*SQRT({Plate!fc})*{hef}^1.5/1000", "kN"),
        ("Lever arm, anchor line to compression flange", "z", "={Plate!f}+{Plate!d}/2-{Plate!tf}/2",
         "mm"),
        ("Anchor tension, lever-arm check", "T_s", "={Mu}*1000/{z}-{Pu}/2", "kN"),
        ("Anchor tension, lever-arm check (calc pad)", "T_sx", "={Mu}/{z}-{Pu}/2", "kN",
         ("unit-scale", "kN·m over mm without ×1000, added to kN")),
        ("Steel modulus", "Es", 200, "GPa"),
        ("Concrete modulus (supplier test)", "Ec", 26700, "MPa"),
        ("Modular ratio", "nmod", "={Es}*1000/{Ec}", "-"),
        ("Modular ratio for the grout check", "nmod_x", "={Es}/{Ec}", "-",
         ("unit-scale", "GPa over MPa: 1000 times too small")),
        ("Anchor rod length (embedment + plate + 50 grout + 75 projection)", "L_rod",
         "=({hef}+{Plate!t_p}+50+75)/1000", "m"),
    ])
    sheets = [loads, plate, anch]
    resolve(sheets)
    return "steel-base-plate", "steel column base plate and anchor rods (SI)", sheets, None


# ---------------------------------------------------------------------------------------------
# Book 3: process plant shell-and-tube steam heater
# ---------------------------------------------------------------------------------------------
def book_steam():
    steam = Sheet("Steam")
    steam.text("A1", "Ashgrove chemical works: saturated steam properties used by E-214 "
               "(extract)")
    steam.text("A2", "Source: saturated water and steam, pressure table, IAPWS-IF97 values "
               "rounded (from memory; check against a published table such as Rogers and "
               "Mayhew before use).")
    for i, h in enumerate(["p [bar(a)]", "T_sat [°C]", "h_f [kJ/kg]", "h_fg [kJ/kg]",
                           "v_g [m³/kg]"]):
        steam.text(f"{'ABCDE'[i]}4", h)
    table = [(1.01325, 100.0, 419.1, 2256.5, 1.673), (2, 120.2, 504.7, 2201.6, 0.8857),
             (3, 133.5, 561.4, 2163.5, 0.6058), (4, 143.6, 604.7, 2133.4, 0.4624),
             (5, 151.8, 640.1, 2107.4, 0.3748), (6, 158.8, 670.4, 2085.0, 0.3156),
             (7, 164.9, 697.0, 2064.9, 0.2728), (8, 170.4, 720.9, 2046.5, 0.2403),
             (9, 175.4, 742.6, 2029.5, 0.2149), (10, 179.9, 762.5, 2013.6, 0.1944)]
    for r, row in enumerate(table, start=5):
        for i, v in enumerate(row):
            steam.text(f"{'ABCDE'[i]}{r}", v)

    duty = Sheet("Duty")
    duty.text("A1", "Ashgrove chemical works: E-214 brine heater, duty and steam demand "
              "(invented plant)")
    duty.text("A2", "Sources: duty Q = ṁ·c_p·ΔT (kg/h to kg/s: /3600); steam ṁ_s = Q/h_fg, "
              "condensing without subcooling; flash fraction x = (h_f1 − h_f2)/h_fg2 (Spirax "
              "Sarco, The Steam and Condensate Loop, from memory); absolute = gauge + 1.01325 "
              "bar (standard atmosphere, NIST SP 811, B.8); 1 kW = 3412 Btu/h (NIST SP 811, "
              "B.8); ideal-gas density ρ = p·M/(R·T), M = 18.015 g/mol, R = 8.314 J/(mol·K) "
              "(CODATA 2018); 20 % NaCl brine c_p 3.40 kJ/(kg·K) (Perry's Chemical Engineers' "
              "Handbook, from memory); steam nozzle velocity ≤ 30 m/s (common practice).")
    duty.items(4, [
        ("Brine flow", "m", 48000, "kg/h"),
        ("Brine specific heat", "cp", 3.40, "kJ/(kg·K)"),
        ("Brine inlet temperature", "T_in", 20, "°C"),
        ("Brine outlet temperature", "T_out", 85, "°C"),
        ("Heat duty", "Q", "={m}/3600*{cp}*({T_out}-{T_in})", "kW"),
        ("Heat duty, datasheet summary", "Q_x", "={m}*{cp}*({T_out}-{T_in})", "kW",
         ("unit-scale", "kg/h times kJ/(kg·K) times K is kJ/h, written as kW (/3600 missing)")),
        ("Heat duty for the vendor enquiry", "Q_B", "={Q}*3412", "Btu/h"),
        ("Steam pressure downstream of the control valve", "p_g", 6, "barg"),
        ("Steam pressure, absolute", "p_a", "={p_g}+1.01325", "bar(a)"),
        ("Saturation temperature", "Tsat", "=VLOOKUP({p_a},Steam!A5:E14,2)", "°C"),
        ("Latent heat", "hfg", "=VLOOKUP({p_a},Steam!A5:E14,4)", "kJ/kg"),
        ("Latent heat, as first looked up", "hfg_x", "=VLOOKUP({p_g},Steam!A5:E14,4)", "kJ/kg",
         ("offset-scale", "steam table (absolute pressure) looked up with the gauge pressure")),
        ("Condensate enthalpy at steam pressure", "hf1", "=VLOOKUP({p_a},Steam!A5:E14,3)",
         "kJ/kg"),
        ("Specific volume of the steam", "vg", "=VLOOKUP({p_a},Steam!A5:E14,5)", "m³/kg"),
        ("Steam flow", "ms", "={Q}*3600/{hfg}", "kg/h"),
        ("Allowance for losses and warm-up", "loss", 5, "%"),
        ("Design steam flow", "ms_d", "={ms}*(1+{loss}/100)", "kg/h"),
        ("Duty check from the steam side", "Q_chk", "={ms}*{hfg}/3600", "kW"),
        ("Steam density at the inlet nozzle", "rho_s", "=1/{vg}", "kg/m³"),
        ("Molar mass of water", "M_w", 18.015, "g/mol"),
        ("Molar gas constant", "R", 8.314, "J/(mol·K)"),
        ("Steam density, ideal-gas check", "rho_ig",
         "={p_a}*100*{M_w}/({R}*({Tsat}+273.15))", "kg/m³"),
        ("Steam density, ideal gas on the gauge reading", "rho_igx",
         "={p_g}*100*{M_w}/({R}*({Tsat}+273.15))", "kg/m³",
         ("offset-scale", "gauge pressure in the ideal-gas law")),
        ("Steam density, ideal gas in °C", "rho_igT", "={p_a}*100*{M_w}/({R}*{Tsat})", "kg/m³",
         ("offset-scale", "°C in the ideal-gas law where K is needed")),
        ("Steam inlet nozzle bore (DN 150 Sch 40)", "D_noz", 154, "mm"),
        ("Steam nozzle velocity", "v_noz", "={ms_d}/3600/{rho_s}/(PI()*({D_noz}/1000)^2/4)",
         "m/s"),
        ("Nozzle check", "chk", "=IF({v_noz}<=30,\"OK\",\"HIGH\")", ""),
        ("Condensate enthalpy at the receiver (atmospheric)", "hf2", "=Steam!C5", "kJ/kg"),
        ("Latent heat at the receiver", "hfg2", "=Steam!D5", "kJ/kg"),
        ("Flash steam fraction", "x_fl", "=({hf1}-{hf2})/{hfg2}*100", "%"),
        ("Flash steam fraction, condensate pot sizing", "x_flx", "=({hf1}-{hf2})/{hfg2}", "%",
         ("unit-scale", "a fraction written beside %: 100 times too small")),
        ("Flash steam to the vent condenser", "m_fl", "={ms_d}*{x_fl}/100", "kg/h"),
        ("Brine outlet, °F (vendor datasheet)", "T_outF", "={T_out}*1.8+32", "°F"),
    ])

    hx = Sheet("Exchanger")
    hx.text("A1", "Ashgrove chemical works: E-214 sizing check (invented plant)")
    hx.text("A2", "Sources: LMTD = (ΔT1 − ΔT2)/ln(ΔT1/ΔT2), F = 1 with condensing steam (Kern, "
            "Process Heat Transfer, from memory); 1/U_d = 1/U_c + R_f (TEMA Standards, fouling "
            "resistances, from memory); A = Q/(U·LMTD); tubes N = A/(π·d_o·L); tube velocity "
            "= ṁ/(ρ·(N/n_p)·π·d_i²/4); Re = ρ·v·d_i/μ, 1 cP = 0.001 Pa·s (NIST SP 811, B.8); "
            "3/4 in. BWG 16 tube: d_o 19.05 mm, d_i 15.75 mm (TEMA tube data table, from "
            "memory); 20 % NaCl brine: 1150 kg/m³, 0.95 cP near 50 °C (from memory).")
    hx.items(4, [
        ("Heat duty", "Q", "={Duty!Q}", "kW"),
        ("Steam saturation temperature", "Tsat", "={Duty!Tsat}", "°C"),
        ("Brine inlet", "T_in", "={Duty!T_in}", "°C"),
        ("Brine outlet", "T_out", "={Duty!T_out}", "°C"),
        ("Terminal difference, brine inlet end", "dT1", "={Tsat}-{T_in}", "K"),
        ("Terminal difference, brine outlet end", "dT2", "={Tsat}-{T_out}", "K"),
        ("LMTD", "LMTD", "=({dT1}-{dT2})/LN({dT1}/{dT2})", "K"),
        ("Clean overall coefficient (vendor estimate)", "Uc", 1250, "W/(m²·K)"),
        ("Fouling resistance, brine side", "Rf", 0.35, "m²·K/kW"),
        ("Dirty overall coefficient", "Ud", "=1/(1/{Uc}+{Rf}/1000)", "W/(m²·K)"),
        ("Dirty overall coefficient, first pass", "Ud_x", "=1/(1/{Uc}+{Rf})", "W/(m²·K)",
         ("unit-scale", "m²·K/kW added to m²·K/W")),
        ("Area required", "A_req", "={Q}*1000/({Ud}*{LMTD})", "m²"),
        ("Area required, first pass", "A_x", "={Q}/({Ud}*{LMTD})", "m²",
         ("unit-scale", "kW over W/(m²·K): 1000 times too small")),
        ("Tube outside diameter", "d_o", 19.05, "mm"),
        ("Tube inside diameter", "d_i", 15.75, "mm"),
        ("Tube length", "L", 4.88, "m"),
        ("Tubes required", "Nt_req", "={A_req}/(PI()*{d_o}/1000*{L})", "-"),
        ("Tubes provided (tube count table)", "Nt", 120, "-"),
        ("Tube passes", "np", 2, "-"),
        ("Area provided", "A_act", "={Nt}*PI()*{d_o}/1000*{L}", "m²"),
        ("Overdesign", "OD", "=({A_act}/{A_req}-1)*100", "%"),
        ("Brine density", "rho", 1150, "kg/m³"),
        ("Brine viscosity at mean temperature", "mu", 0.95, "cP"),
        ("Tube-side velocity", "v",
         "={Duty!m}/3600/{rho}/({Nt}/{np}*PI()*({d_i}/1000)^2/4)", "m/s"),
        ("Tube-side velocity, hand check", "v_x",
         "={Duty!m}/3600/{rho}/({Nt}/{np}*PI()*{d_i}^2/4)", "m/s",
         ("unit-scale", "tube bore in mm squared where m is needed")),
        ("Tube-side Reynolds number", "Re", "={rho}*{v}*{d_i}/1000/({mu}/1000)", "-"),
        ("Tube-side Reynolds number, datasheet", "Re_x", "={rho}*{v}*{d_i}/1000/{mu}", "-",
         ("unit-scale", "viscosity in cP used as Pa·s")),
        ("Flow regime", "regime", "=IF({Re}>10000,\"turbulent\",\"transition: check h_i\")",
         ""),
    ])
    sheets = [steam, duty, hx]
    resolve(sheets)
    return "steam-heater", "process plant shell-and-tube steam heater (SI, barg steam)", sheets, \
        None


# ---------------------------------------------------------------------------------------------
# Book 4: crude oil gathering line hydraulics (US oilfield units)
# ---------------------------------------------------------------------------------------------
def book_crude():
    fluid = Sheet("Fluid")
    fluid.text("A1", "Coyote Draw gathering system: Battery 7 to the central tank battery, "
               "crude properties (invented field)")
    fluid.text("A2", "Sources: SG = 141.5/(131.5 + °API) (API MPMS ch. 11.1 definition, from "
               "memory); water at 60 °F 62.37 lb/ft³, written 62.4 (common practice); "
               "1 lb/ft³ = 16.018 kg/m³ (NIST SP 811, B.8); cSt = cP/SG, SG standing for the "
               "density in g/cm³ (common practice); °C = (°F − 32)/1.8 (NIST SP 811, B.8). "
               "Viscosity from the lab report of 3 May (invented).")
    fluid.items(4, [
        ("Stock-tank oil gravity", "API", 36.5, "°API"),
        ("Specific gravity, 60/60 °F", "SG", "=141.5/(131.5+{API})", "-"),
        ("Density", "rho", "={SG}*62.4", "lb/ft³"),
        ("Density, kg/m³", "rho_SI", "={rho}*16.018", "kg/m³"),
        ("Flowing temperature, summer", "T_f", 85, "°F"),
        ("Flowing temperature, °C", "T_fC", "=({T_f}-32)/1.8", "°C"),
        ("Dynamic viscosity at flowing temperature", "mu", 6.2, "cP"),
        ("Kinematic viscosity", "nu", "={mu}/{SG}", "cSt"),
    ])

    prof = Sheet("Profile")
    prof.text("A1", "Coyote Draw gathering system: route profile from the alignment sheets "
              "(invented field)")
    prof.text("A2", "Sources: alignment sheets rev. B (invented); 1 ft = 0.3048 m (NIST SP 811, "
              "B.8).")
    for i, h in enumerate(["Segment", "Length [ft]", "Start elevation [ft]",
                           "End elevation [ft]", "Rise [ft]", "Length [km]"]):
        prof.text(f"{'ABCDEF'[i]}4", h)
    segs = [("Battery 7 to CR 112 crossing", 8200, 3120, 3165),
            ("CR 112 to draw crossing", 11450, 3165, 3208),
            ("Draw crossing to bench", 6300, 3208, 3190),
            ("Bench to ridge", 9800, 3190, 3244),
            ("Ridge to lease road", 7400, 3244, 3281),
            ("Lease road to CTB", 5150, 3281, 3296)]
    for r, (name, length, z1, z2) in enumerate(segs, start=5):
        prof.text(f"A{r}", name)
        prof.text(f"B{r}", length)
        prof.text(f"C{r}", z1)
        prof.text(f"D{r}", z2)
        prof.text(f"E{r}", f"=D{r}-C{r}")
        prof.text(f"F{r}", f"=B{r}*0.3048/1000")
    prof.plant("F8", "=B8/0.3048/1000", "unit-scale", "ft to m divided by 0.3048: wrong way")
    prof.text("A11", "Total")
    prof.text("B11", "=SUM(B5:B10)")
    prof.text("E11", "=SUM(E5:E10)")
    prof.text("F11", "=SUM(F5:F10)")
    prof.text("A12", "Highest point")
    prof.text("D12", "=MAX(C5:D10)")

    line = Sheet("Line")
    line.text("A1", "Coyote Draw gathering system: 8 in. line hydraulics (invented field)")
    line.text("A2", "Sources: 1 bbl = 5.615 ft³ = 42 gal = 0.159 m³ (NIST SP 811, B.8); "
              "V = 0.0119·Q/d² ft/s, Q in bbl/d, d in in. (Crane TP-410, from memory); "
              "Re = ρVD/μ, 1 cP = 0.000672 lb/(ft·s) (NIST SP 811, B.8); Darcy f = 64/Re "
              "laminar, Swamee–Jain f = 0.25/[log10(ε/3.7D + 5.74/Re^0.9)]² turbulent (Swamee "
              "and Jain, 1976); h_f = f·(L/D)·V²/2g, g = 32.174 ft/s²; Δp = 0.433·SG·h psi "
              "(water 0.433 psi/ft, common practice); P_m = 0.0605·f·Q²·SG/d⁵ psi/mi (Menon, "
              "Liquid Pipeline Hydraulics, from memory); MAOP = 2·S·t·F/D (ASME B31.4, 403.2.1, "
              "F = 0.72); hydraulic hp = gpm·psi/1714 (common practice); 1 hp = 0.746 kW, "
              "1 psi = 6.895 kPa (NIST SP 811, B.8); ε = 0.0018 in. = 0.00015 ft for commercial "
              "steel (Moody, 1944); 8-5/8 in. × 0.322 in. (ASME B36.10M, from memory).")
    line.items(4, [
        ("Design throughput", "Q", 14500, "bbl/d"),
        ("Flow, ft³/s", "Q_cfs", "={Q}*5.615/86400", "ft³/s"),
        ("Flow, gpm", "Q_gpm", "={Q}*42/1440", "gpm"),
        ("Flow, m³/d", "Q_m3", "={Q}*0.159", "m³/d"),
        ("Outside diameter", "OD", 8.625, "in"),
        ("Wall thickness", "wt", 0.322, "in"),
        ("Wall thickness, mill certificate", "wt_mm", 8.18, "mm"),
        ("Inside diameter", "ID", "={OD}-2*{wt}", "in"),
        ("Flow area", "A", "=PI()*({ID}/12)^2/4", "ft²"),
        ("Velocity", "V", "={Q_cfs}/{A}", "ft/s"),
        ("Velocity, hand check", "V_x", "={Q_cfs}/(PI()*{ID}^2/4)", "ft/s",
         ("unit-scale", "bore in inches squared with ft³/s: 144 times too small")),
        ("Velocity, Crane form", "V_c", "=0.0119*{Q}/{ID}^2", "ft/s"),
        ("Reynolds number", "Re", "={Fluid!rho}*{V}*({ID}/12)/({Fluid!mu}*0.000672)", "-"),
        ("Pipe roughness, commercial steel", "eps", 0.0018, "in"),
        ("Pipe roughness, Moody chart value", "eps_ft", 0.00015, "ft"),
        ("Darcy friction factor", "f",
         "=IF({Re}<2000,64/{Re},0.25/LOG10({eps}/(3.7*{ID})+5.74/{Re}^0.9)^2)", "-"),
        ("Darcy friction factor, Moody roughness", "f_x",
         "=0.25/LOG10({eps_ft}/(3.7*{ID})+5.74/{Re}^0.9)^2", "-",
         ("unit-scale", "roughness in ft over bore in in.: relative roughness 12 times small")),
        ("Line length", "L", "=Profile!B11", "ft"),
        ("Friction head", "hf", "={f}*{L}/({ID}/12)*{V}^2/(2*32.174)", "ft"),
        ("Friction head, hand check", "hf_x", "={f}*{L}/({ID}/12)*{V}^2/2", "ft",
         ("result-unit", "V²/2 without g: not a head")),
        ("Friction pressure drop", "dPf", "={hf}*0.433*{Fluid!SG}", "psi"),
        ("Friction drop per mile, Menon form", "dPm", "=0.0605*{f}*{Q}^2*{Fluid!SG}/{ID}^5",
         "psi/mi"),
        ("Friction drop from the per-mile form", "dPf_m", "={dPm}*{L}/5280", "psi"),
        ("Net rise, Battery 7 to CTB", "rise", "=Profile!E11", "ft"),
        ("CTB pad elevation (survey)", "z_ctb", 1004.6, "m"),
        ("Net rise from the survey", "rise_x", "={z_ctb}-Profile!C5", "ft",
         ("unit-scale", "a survey elevation in m less a profile elevation in ft")),
        ("Elevation pressure", "dPe", "=0.433*{Fluid!SG}*{rise}", "psi"),
        ("Required arrival pressure at the CTB", "P_out", 60, "psig"),
        ("Required pump discharge pressure", "P_in", "={P_out}+{dPf}+{dPe}", "psig"),
        ("Pump discharge pressure, pump datasheet", "P_inx", "={P_out}+{dPf}+{dPe}+14.7",
         "psig", ("offset-scale", "atmosphere added but the cell still says psig")),
        ("Pump discharge pressure, absolute", "P_ia", "={P_in}+14.7", "psia"),
        ("Pump discharge pressure, kPa(g)", "P_ik", "={P_in}*6.895", "kPa(g)"),
        ("SMYS, API 5L X52", "S", 52000, "psi"),
        ("Design factor", "F", 0.72, "-"),
        ("MAOP (Barlow)", "MAOP", "=2*{S}*{wt}*{F}/{OD}", "psig"),
        ("MAOP from the mill-certificate wall", "MAOP_x", "=2*{S}*{wt_mm}*{F}/{OD}", "psig",
         ("unit-scale", "wall in mm over diameter in in.: 25.4 times too high")),
        ("MAOP check", "chk", "=IF({P_in}<={MAOP},\"OK\",\"EXCEEDS MAOP\")", ""),
        ("Pump suction pressure (tank head)", "P_s", 8, "psig"),
        ("Pump differential pressure", "dP_p", "={P_in}-{P_s}", "psi"),
        ("Hydraulic horsepower", "HHP", "={Q_gpm}*{dP_p}/1714", "hp"),
        ("Hydraulic horsepower, pump curve sheet", "HHP_x", "={Q_gpm}*{dP_p}/3960", "hp",
         ("unit-scale", "3960 wants head in ft, not psi: the result is 2.31 times too small")),
        ("Pump efficiency", "eta", 72, "%"),
        ("Brake horsepower", "BHP", "={HHP}/({eta}/100)", "hp"),
        ("Motor load", "P_kW", "={BHP}*0.746", "kW"),
        ("Motor load for the electrical one-line", "P_kWx", "={BHP}/0.746", "kW",
         ("unit-scale", "hp to kW divided by 0.746: wrong way")),
        ("Line fill", "Vol", "={A}*{L}/5.615", "bbl"),
        ("Transit time", "t_tr", "={Vol}/{Q}*24", "h"),
    ])
    sheets = [fluid, prof, line]
    resolve(sheets)
    sidecar = ["# API gravity is a dimensionless scale; the sheet types °API beside it",
               f'cells Fluid!{fluid.syms["API"]} : 1 "API gravity, typed °API in the sheet"']
    return "crude-gathering", "crude oil gathering line hydraulics (US oilfield units)", \
        sheets, sidecar


def cell_key(cell):
    m = re.fullmatch(r"([A-Z]+)([0-9]+)", cell)
    return (len(m.group(1)), m.group(1), int(m.group(2)))


def main():
    summary = {}
    for build in (book_hvac, book_baseplate, book_steam, book_crude):
        name, trade, sheets, sidecar = build()
        write_xlsx(os.path.join(HERE, f"{name}.xlsx"), [(s.name, s.cells) for s in sheets])
        side_path = os.path.join(HERE, f"{name}.cells.plumb")
        if sidecar:
            with open(side_path, "w", encoding="utf-8") as fh:
                fh.write("\n".join(sidecar) + "\n")
        elif os.path.exists(side_path):
            os.remove(side_path)
        planted, correct = {}, []
        lines = ["# sheet!cell rule: the planted mistakes plumb must report; every other",
                 f"# formula cell must stay clean (written by make_books.py). Trade: {trade}"]
        for s in sheets:
            for cell, raw in sorted(s.cells.items(), key=lambda kv: cell_key(kv[0])):
                if not (isinstance(raw, str) and raw.startswith("=")):
                    continue
                key = f"{s.name}!{cell}"
                if cell in s.planted:
                    rule, what = s.planted[cell]
                    planted[key] = {"rule": rule, "what": what, "formula": raw}
                    lines.append(f"# planted: {what}")
                    lines.append(f"{key} {rule}")
                else:
                    correct.append({"cell": key, "formula": raw})
        with open(os.path.join(HERE, f"{name}.expect"), "w", encoding="utf-8") as fh:
            fh.write("\n".join(lines) + "\n")
        summary[name] = {"trade": trade, "planted": planted, "correct": correct}
        print(f"{name}: {len(planted)} planted, {len(correct)} correct formula cells")
    with open(os.path.join(HERE, "expect.json"), "w", encoding="utf-8") as fh:
        json.dump(summary, fh, indent=1, ensure_ascii=False)


if __name__ == "__main__":
    main()
