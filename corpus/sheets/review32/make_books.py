#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review32), written with the
standard zipfile module (corpus/sheets/xlsx_writer.py and item_sheet.py, shared by the review
books).

Trades: a steel mezzanine beam schedule with deflection checks; a district heating network's
pipe sizing; a water well's constant-rate pumping test read by the Cooper-Jacob straight line;
a paint shop's cure oven and its solvent exhaust. All scenarios, sites, readings and catalogue
data are invented (demonstration only); the formulas and published factors are the trade's
own, with their sources named in a text cell at the top of each sheet.

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. The findings plumb makes beyond the planted ones, and the planted cells it
misses, are recorded with their reasons in EXTRA and MISSED below, after running the binary
of the day.

Run: python3 make_books.py  ->  *.xlsx, *.cells.plumb, *.expect (where absent; --expect rewrites them) in this folder
"""
import os
import sys

HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, HERE)
sys.path.insert(0, os.path.dirname(HERE))
from item_sheet import ItemSheet, write_books  # noqa: E402 (shared in corpus/sheets)

CAUTION = ("Invented scenario, data for demonstration only. A dimensionally consistent formula can "
           "still be wrong; this check does not replace independent review under local codes and "
           "licensed practice.")
ItemSheet.caution = CAUTION


# --------------------------------------------------------------------------------------------
# Book 1: steel mezzanine beam schedule with deflection checks (m and ft, kN/m and plf, kN·m and
# kip·ft, mm and in, span/deflection ratios)
# --------------------------------------------------------------------------------------------
BEAM_SRC = (
    "Sources: NBC 2015 (National Building Code of Canada) Div. B Table 4.1.3.2.-A, load "
    "combination 1.25D + 1.5L, and Table 4.1.5.3 (storage areas 4.8 kPa) (from memory); CSA "
    "S16-19 cl. 13.5, M_r = φ·Z·F_y with φ = 0.90, and E = 200 000 MPa (from memory); simply "
    "supported beam under uniform load, M = wL²/8 and δ = 5wL⁴/(384EI), AISC Steel Construction "
    "Manual 15th ed. (2017) Table 3-23 case 1; US check ASCE 7-16 §2.3.1 (1.2D + 1.6L) and AISC "
    "360-16 §F2 (φ_b = 0.90, M_n = F_y·Z_x), E = 29 000 ksi; live-load deflection limit "
    "span/360: common practice; W-shape properties: CISC Handbook of Steel Construction 11th ed. "
    "(from memory, check before use); NIST SP 811 (2008) App. B.8 (1 ft = 0.3048 m, so 3.281 "
    "ft/m; 1 in = 25.4 mm; 1 lbf/ft = 14.59 N/m, so 68.52 plf per kN/m; 1 kip·ft = 1.356 kN·m, "
    "so 0.7376 kip·ft per kN·m; 1 in³ = 16 387 mm³, so 0.06102 in³ per 10³ mm³; 1 in⁴ = "
    "416 231 mm⁴, so 2.403 in⁴ per 10⁶ mm⁴; 1 ksi = 6.895 MPa); 12 in/ft and 1728 in³/ft³; "
    "g = 9.81 m/s² (common practice). Spans, spacings and loads invented.")
des = ItemSheet("Design", "Brackwater Logistics cold store, storage mezzanine: floor beam design "
                "data (invented scenario)", BEAM_SRC)
des.add("gk", "Dead load: deck, 65 mm topping, services", "g_k", 3.0, "kPa")
des.add("qk", "Live load: storage mezzanine", "q_k", 4.8, "kPa")
des.add("aD", "Load factor, dead (NBC)", "α_D", 1.25, "-")
des.add("aL", "Load factor, live (NBC)", "α_L", 1.5, "-")
des.add("fy", "Yield strength, 350W", "F_y", 350, "MPa")
des.add("phi", "Resistance factor, steel", "φ", 0.9, "-")
des.add("E", "Modulus of elasticity", "E", 200000, "MPa")
des.add("lim", "Live-load deflection limit, span divided by", "n_lim", 360, "-")
des.add("Ek", "Modulus of elasticity, ksi (US check)", "E_ksi", "={E}/6.895", "ksi")
DESIGN = des.finish()

D = des.ref
BEAMS = {
    "A1": "Brackwater mezzanine: floor beam schedule (simply supported, uniform load)",
    "A2": ("Sources: as the Design sheet: w_f = 1.25·(g_k·s + self weight) + 1.5·q_k·s; self "
           "weight = mass × 9.81/1000; M_f = w_f·L²/8; M_r = φ·Z_x·F_y (kN·m = 10³ mm³ × MPa / "
           "1000); δ_L = 5·q_k·s·L⁴/(384·E·I_x) with L in mm and I_x in mm⁴ (kN/m = N/mm); 1 in "
           "= 25.4 mm (NIST SP 811 (2008) App. B.8). Section properties from the Sections sheet."),
    "A3": CAUTION,
    "A4": "Mark", "B4": "Span [m]", "C4": "Span [ft]", "D4": "Spacing [m]", "E4": "Section",
    "F4": "Self weight [kN/m]", "G4": "w_f [kN/m]", "H4": "M_f [kN·m]", "I4": "M_r [kN·m]",
    "J4": "Utilisation [%]", "K4": "δ_L [mm]", "L4": "δ_L [in]", "M4": "Span/δ_L [-]",
    "A11": "Highest utilisation", "B11": "=MAX(J5:J8)", "C11": "%",
    "A12": "Largest live-load deflection", "B12": "=MAX(K5:L8)", "C12": "mm",
    "A13": "Smallest span/deflection ratio", "B13": "=MIN(M5:M8)", "C13": "-",
    "A14": "Strength, all beams", "B14": "=IF(B11<=100,\"OK\",\"FAIL\")",
    "A15": "Deflection, all beams", "B15": f"=IF(B13>={D('lim')},\"OK\",\"CHECK\")",
}
for r, (mark, span, spacing, sec) in enumerate([("B1", 6.0, 2.5, "W310x39"),
                                                ("B2", 7.5, 2.5, "W360x45"),
                                                ("B3", 9.0, 2.0, "W410x54"),
                                                ("B4", 5.4, 3.0, "W250x33")], start=5):
    BEAMS[f"A{r}"], BEAMS[f"B{r}"], BEAMS[f"D{r}"], BEAMS[f"E{r}"] = mark, span, spacing, sec
    BEAMS[f"C{r}"] = f"=B{r}*3.281"
    BEAMS[f"F{r}"] = f"=VLOOKUP(E{r},Sections!$A$5:$D$9,2,FALSE)*9.81/1000"
    BEAMS[f"G{r}"] = f"={D('aD')}*({D('gk')}*D{r}+F{r})+{D('aL')}*{D('qk')}*D{r}"
    BEAMS[f"H{r}"] = f"=G{r}*B{r}^2/8"
    BEAMS[f"I{r}"] = f"={D('phi')}*VLOOKUP(E{r},Sections!$A$5:$D$9,3,FALSE)*{D('fy')}/1000"
    BEAMS[f"J{r}"] = f"=H{r}/I{r}*100"
    BEAMS[f"K{r}"] = (f"=5*{D('qk')}*D{r}*(B{r}*1000)^4/(384*{D('E')}"
                      f"*VLOOKUP(E{r},Sections!$A$5:$D$9,4,FALSE)*10^6)")
    BEAMS[f"L{r}"] = f"=K{r}/25.4"
    BEAMS[f"M{r}"] = f"=B{r}*1000/K{r}"
BEAMS["F6"] = "=VLOOKUP(E6,Sections!$A$5:$D$9,2,FALSE)/1000"           # planted: g left out
BEAMS["J7"] = "=H7/I7"                                                 # planted: fraction under %
BEAMS["K8"] = (f"=5*{D('qk')}*D8*(B8*1000)^4/(384*{D('E')}"
               f"*VLOOKUP(E8,Sections!$A$5:$D$9,4,FALSE))")             # planted: 10^6 left out
BEAMS["M6"] = "=B6/K6"                                                 # planted: m over mm

us = ItemSheet("US", "Brackwater mezzanine: US check of one beam for the steel fabricator "
               "(ASCE 7-16 / AISC 360-16, LRFD)",
               "Sources: as the Design sheet (ASCE 7-16 §2.3.1; AISC 360-16 §F2; NIST SP 811 "
               "(2008) App. B.8 factors 68.52 plf per kN/m, 0.7376 kip·ft per kN·m, 0.06102 in³ "
               "per 10³ mm³, 2.403 in⁴ per 10⁶ mm⁴, 25.4 mm/in). δ = 5wL⁴/(384EI) with w in plf, "
               "L in ft, E in psi and I in in⁴, times 1728 in³/ft³ (common practice).")
us.add("mark", "Beam", "mark", "B3")
us.add("L", "Span", "L", "=VLOOKUP({mark},Beams!$A$5:$M$8,3,FALSE)", "ft")
us.add("sec", "Section", "section", "=VLOOKUP({mark},Beams!$A$5:$M$8,5,FALSE)")
us.add("wD", "Dead load (deck, topping, services, self weight)", "w_D",
       "=({Design.gk}*VLOOKUP({mark},Beams!$A$5:$M$8,4,FALSE)"
       "+VLOOKUP({mark},Beams!$A$5:$M$8,6,FALSE))*68.52", "plf")
us.add("wL", "Live load", "w_L", "={Design.qk}*VLOOKUP({mark},Beams!$A$5:$M$8,4,FALSE)*68.52",
       "plf")
us.add("wL2", "Live load (fabricator's sheet)", "w_L2",
       "={Design.qk}*VLOOKUP({mark},Beams!$A$5:$M$8,4,FALSE)/68.52", "plf",
       planted=("unit-scale", "kN/m to plf divided by 68.52: wrong way round"))
us.add("wu", "Factored load, 1.2D + 1.6L", "w_u", "=1.2*{wD}+1.6*{wL}", "plf")
us.add("Mu", "Factored moment", "M_u", "={wu}*{L}^2/8/1000", "kip·ft")
us.add("Mf", "Factored moment from the schedule (NBC), kip·ft", "M_f",
       "=VLOOKUP({mark},Beams!$A$5:$M$8,8,FALSE)*0.7376", "kip·ft")
us.add("Mf2", "Factored moment from the schedule (rev. A)", "M_f2",
       "=VLOOKUP({mark},Beams!$A$5:$M$8,8,FALSE)*1.356", "kip·ft",
       planted=("unit-scale", "kN·m to kip·ft multiplied by 1.356: wrong way round"))
us.add("Zx", "Plastic modulus", "Z_x", "=VLOOKUP({sec},Sections!$A$5:$D$9,3,FALSE)*0.06102",
       "in³")
us.add("phiMn", "Design flexural strength", "φM_n", "=0.9*{Design.fy}/6.895*{Zx}/12", "kip·ft")
us.add("chk", "Flexure check", "check", "=IF({Mu}<={phiMn},\"OK\",\"NG\")")
us.add("Ix", "Moment of inertia", "I_x", "=VLOOKUP({sec},Sections!$A$5:$D$9,4,FALSE)*2.403",
       "in⁴")
us.add("dL", "Live-load deflection", "δ_L", "=5*{wL}*{L}^4*1728/(384*{Design.Ek}*1000*{Ix})",
       "in")
us.add("dL2", "Live-load deflection (first pass)", "δ_L2",
       "=5*{wL}*{L}^4/(384*{Design.Ek}*1000*{Ix})", "in",
       planted=("unit-scale", "plf·ft⁴/(psi·in⁴) without the 1728 in³/ft³: 1728 too small"))
us.add("dS", "Live-load deflection from the schedule", "δ_S",
       "=VLOOKUP({mark},Beams!$A$5:$M$8,12,FALSE)/25.4", "in",
       planted=("unit-scale", "the schedule's in column divided by 25.4 again: 25.4 too small"))
us.add("dlim", "Deflection limit, span/360", "δ_lim", "={L}*12/{Design.lim}", "in")
us.add("dchk", "Deflection check", "check_δ", "=IF({dL}<={dlim},\"OK\",\"NG\")")
US = us.finish([des])

SECTIONS = {
    "A1": "W shapes (CISC Handbook of Steel Construction 11th ed., from memory; check the current "
          "tables before use)",
    "A2": CAUTION,
    "A4": "Section", "B4": "Mass [kg/m]", "C4": "Z_x [10³ mm³]", "D4": "I_x [10⁶ mm⁴]",
}
for r, (s, m, z, i) in enumerate([("W250x33", 32.8, 424, 48.9), ("W310x39", 38.9, 610, 85.1),
                                  ("W360x45", 44.6, 784, 122), ("W410x54", 53.9, 1050, 186),
                                  ("W460x60", 59.6, 1290, 255)], start=5):
    SECTIONS[f"A{r}"], SECTIONS[f"B{r}"], SECTIONS[f"C{r}"], SECTIONS[f"D{r}"] = s, m, z, i

BEAM = {
    "trade": "structural steel: mezzanine floor beam schedule with deflection checks",
    "sheets": [("Design", DESIGN), ("Beams", BEAMS), ("US", US), ("Sections", SECTIONS)],
    "sidecar": ("# Invented scenario. A dimensionally consistent formula can still be wrong; this\n"
                "# check does not replace independent review under local codes and licensed practice.\n"
                "# Brackwater mezzanine: the US trade's plf (pound-force per linear foot, AISC\n"
                "# Manual 15th ed.; 1 lbf/ft, NIST SP 811 (2008) App. B.8), and the section\n"
                "# table's columns as the CISC Handbook prints them, in 10³ mm³ and 10⁶ mm⁴.\n"
                "measure plf = 1 lbf/ft \"pound-force per linear foot\"\n"
                "measure e3mm3 = 1000 mm^3 \"10³ mm³, a section table's unit of modulus\"\n"
                "measure e6mm4 = 1e6 mm^4 \"10⁶ mm⁴, a section table's unit of second moment\"\n"
                "cells Sections!C5:C9 : e3mm3 \"Z_x\"\n"
                "cells Sections!D5:D9 : e6mm4 \"I_x\"\n"),
    "planted": {**us.planted,
                "Beams!F6": ("result-unit", "self weight from kg/m with g left out: kg/m "
                             "written as kN/m"),
                "Beams!J7": ("unit-scale", "M_f/M_r as a fraction written under %: 100 too small"),
                "Beams!K8": ("unit-scale", "I_x in 10⁶ mm⁴ used as mm⁴: deflection 10⁶ too "
                             "large"),
                "Beams!M6": ("unit-scale", "span in m over deflection in mm without ×1000: ratio "
                             "1000 too small"),
                "Beams!B12": ("mixed-range", "largest deflection taken over the mm and in "
                              "columns together")},
}

# --------------------------------------------------------------------------------------------
# Book 2: district heating network, pipe sizing (kW and MBH, m³/h and gpm, K and °F, m/s and
# fps, Pa/m and ft/100 ft)
# --------------------------------------------------------------------------------------------
DH_SRC = (
    "Sources: heat carried Φ = ρ·c_p·V̇·ΔT; Darcy–Weisbach R = f·ρ·V²/(2D) with the "
    "Swamee–Jain friction factor f = 0.25/[log10(ε/(3.7D) + 5.74/Re^0.9)]², F. M. White, Fluid "
    "Mechanics 8th ed. (2016) ch. 6; water at 60 °C: ρ = 983 kg/m³, c_p = 4.18 kJ/(kg·K), "
    "μ = 0.47 mPa·s (from memory of White's App. A tables); steel pipe bores and ε = 0.05 mm "
    "(EN 253 service pipe, from memory; check the maker's data); design guide 100 Pa/m in "
    "branches, ×2 for flow and return and 30 % for fittings: common practice (from memory); "
    "linear expansion of steel 0.012 mm/(m·K): common practice; saturation pressure of water at "
    "80 °C 47.4 kPa (steam tables, from memory); 101.325 kPa standard atmosphere; US check "
    "Btu/h = 500 × gpm × ΔT°F for water, ASHRAE Handbook—HVAC Systems and Equipment (2020) "
    "ch. 12 (from memory); NIST SP 811 (2008) App. B.8 (1 kW = 3412 Btu/h, so 3.412 MBH per "
    "kW; 1 m³/h = 4.403 US gpm; 1 m/s = 3.281 ft/s; a difference of 1 K is 1.8 °F). Loads, "
    "routes and pressures invented.")
dh = ItemSheet("Design", "Harlow Fen heat network, phase 2: design data and pumping (invented "
               "scenario)", DH_SRC)
dh.add("Ts", "Flow (supply) temperature", "T_s", 80, "°C")
dh.add("Tr", "Return temperature", "T_r", 45, "°C")
dh.add("dT", "Design temperature difference", "ΔT", "={Ts}-{Tr}", "K")
dh.add("dTF", "Design temperature difference, °F (US check)", "ΔT_F", "={dT}*1.8", "°F")
dh.add("dTF2", "Design temperature difference, °F (US submittal)", "ΔT_F2", "={dT}*1.8+32", "°F",
       planted=("offset-scale", "a temperature difference converted to °F with +32"))
dh.add("rho", "Water density at 60 °C", "ρ", 983, "kg/m³")
dh.add("cp", "Specific heat of water", "c_p", 4.18, "kJ/(kg·K)")
dh.add("mu", "Dynamic viscosity at 60 °C", "μ", 0.47, "mPa·s")
dh.add("eps", "Pipe roughness (steel)", "ε", 0.05, "mm")
dh.add("allow", "Allowance for fittings and valves", "a_f", 30, "%")
dh.add("Rmax", "Pressure gradient guide, branches", "R_max", 100, "Pa/m")
dh.add("Qheat", "Total connected heat (check)", "Φ_tot", "=SUM(Branches!B5:C8)", "kW",
       planted=("mixed-range", "connected heat summed over the kW and MBH columns together"))
dh.add("psys", "Lowest system pressure (high point, pump stopped)", "p_sys", 1.5, "bar g")
dh.add("psat", "Saturation pressure of water at 80 °C", "p_sat", 47.4, "kPa a")
dh.add("margin", "Margin above boiling at the high point", "Δp_b",
       "={psys}*100+101.325-{psat}", "kPa")
dh.add("margin2", "Margin above boiling (first draft)", "Δp_b2", "={psys}*100-{psat}", "kPa",
       planted=("offset-scale", "a gauge pressure less an absolute one"))
dh.add("alpha", "Linear expansion of steel", "α", 0.012, "mm/(m·K)")
dh.add("Tinst", "Installation temperature", "T_inst", 10, "°C")
dh.add("Lrun", "Straight run between expansion bends", "L_run", 42, "m")
dh.add("dL", "Expansion of the run at flow temperature", "ΔL", "={alpha}*{Lrun}*({Ts}-{Tinst})",
       "mm")
dh.add("dL2", "Expansion of the run (bend schedule)", "ΔL_2", "={alpha}*{Lrun}*{Ts}", "mm",
       planted=("offset-scale", "the °C reading used where the rise above installation "
                "temperature (K) is needed"))
dh.add("dpplant", "Plant room loss (boiler, header, strainer)", "Δp_plant", 60, "kPa")
dh.add("dpsub", "Substation loss at the index branch (HEX, control valve)", "Δp_sub", 50, "kPa")
dh.add("dppump", "Pump differential pressure", "Δp_pump", "=Branches!L11+{dpplant}+{dpsub}", "kPa")
dh.add("etap", "Pump and motor efficiency", "η", 62, "%")
dh.add("Ppump", "Pump electrical power", "P_el", "={dppump}*Branches!D9/3600/({etap}/100)", "kW")
dh.add("Ppump2", "Pump electrical power (tender)", "P_el2",
       "={dppump}*1000*Branches!D9/3600/({etap}/100)", "kW",
       planted=("unit-scale", "kPa turned to Pa, so the power is in W, written as kW: 1000 too "
                "large"))
DHDES = dh.finish()

H = dh.ref
BRANCH = {
    "A1": "Harlow Fen phase 2: branch and main pipe sizing at design load",
    "A2": ("Sources: as the Design sheet: V̇ = Φ·3600/(ρ·c_p·ΔT) in m³/h; V = V̇/3600/(π·D²/4); "
           "Swamee–Jain f with Re = ρ·V·D/μ; R = f·ρ·V²/(2D); Δp = R × 2L × (1 + fittings "
           "allowance) (flow and return); 1 kW = 3.412 MBH (NIST SP 811 (2008) App. B.8); bores "
           "from the Pipes sheet."),
    "A3": CAUTION,
    "A4": "Branch", "B4": "Heat [kW]", "C4": "Heat [MBH]", "D4": "Flow [m³/h]", "E4": "DN",
    "F4": "Bore [mm]", "G4": "Velocity [m/s]", "H4": "Friction factor [-]", "I4": "R [Pa/m]",
    "J4": "Route length [m]", "K4": "Velocity [fps]", "L4": "Δp flow + return [kPa]",
    "A9": "Main (plant to first tee)", "B9": "=SUM(B5:B8)",
    "D9": "=SUM(D5:D8)", "E9": 200, "J9": 380,
    "A11": "Index circuit (main + worst branch)", "L11": "=L9+MAX(L5:L8)",
    "A12": "Highest velocity", "G12": "=MAX(G5:G9)",
    "A13": "Gradient check", "I13": f"=IF(MAX(I5:I8)<={H('Rmax')},\"OK\",\"REVIEW\")",
}
for r, (name, kw, dn, length) in enumerate([("B-1 Mill Lane school", 850, 100, 240),
                                            ("B-2 Fenside flats", 1200, 125, 410),
                                            ("B-3 leisure centre", 640, 80, 180),
                                            ("B-4 Harlow Fen estate", 1450, 125, 520)], start=5):
    BRANCH[f"A{r}"], BRANCH[f"B{r}"], BRANCH[f"E{r}"], BRANCH[f"J{r}"] = name, kw, dn, length
    BRANCH[f"C{r}"] = f"=B{r}*3.412"
    BRANCH[f"D{r}"] = f"=B{r}*3600/({H('rho')}*{H('cp')}*{H('dT')})"
for r in range(5, 10):
    BRANCH[f"F{r}"] = f"=VLOOKUP(E{r},Pipes!$A$5:$B$11,2,FALSE)"
    BRANCH[f"G{r}"] = f"=D{r}/3600/(PI()*(F{r}/1000)^2/4)"
    BRANCH[f"H{r}"] = (f"=0.25/LOG10({H('eps')}/(3.7*F{r})+5.74/({H('rho')}*G{r}*F{r}/1000"
                       f"/({H('mu')}/1000))^0.9)^2")
    BRANCH[f"I{r}"] = f"=H{r}*{H('rho')}*G{r}^2/(2*F{r}/1000)"
    BRANCH[f"K{r}"] = f"=G{r}*3.281"
    BRANCH[f"L{r}"] = f"=I{r}*2*J{r}*(1+{H('allow')}/100)/1000"
BRANCH["G7"] = "=D7/(PI()*(F7/1000)^2/4)"                          # planted: m³/h as m³/s
BRANCH["L6"] = f"=I6*2*J6*(1+{H('allow')})/1000"                   # planted: 30 % used as 30

PIPES = {
    "A1": "Steel service pipe bores (EN 253 pre-insulated pipe, from memory; check the maker's "
          "data)",
    "A2": CAUTION,
    "A4": "DN", "B4": "Bore [mm]",
}
for r, (dn, bore) in enumerate([(65, 70.3), (80, 82.5), (100, 107.1), (125, 132.5), (150, 160.3),
                                (200, 210.1), (250, 263.0)], start=5):
    PIPES[f"A{r}"], PIPES[f"B{r}"] = dn, bore

dus = ItemSheet("US", "Harlow Fen phase 2: main pipe restated for the US design reviewer",
                "Sources: as the Design sheet (ASHRAE Handbook—HVAC Systems and Equipment (2020) "
                "ch. 12: Btu/h = 500 × gpm × ΔT°F for water; NIST SP 811 (2008) App. B.8: 1 kW = "
                "3.412 MBH, 1 m³/h = 4.403 gpm, 3.281 ft/m). Head loss per 100 ft of pipe = "
                "R/(ρ·g) × 100 (m per m is ft per ft), g = 9.81 m/s² (common practice).")
dus.add("MBH", "Main heat load", "Φ_MBH", "=Branches!B9*3.412", "MBH")
dus.add("MBH2", "Main heat load (reviewer's form)", "Φ_MBH2", "=Branches!B9*3412", "MBH",
        planted=("unit-scale", "kW × 3412 gives Btu/h, written as MBH: 1000 too large"))
dus.add("gpm", "Main flow, 500 rule", "Q_gpm", "={MBH}*1000/(500*{Design.dTF})", "gpm")
dus.add("gpmc", "Main flow, converted from m³/h", "Q_gpm,c", "=Branches!D9*4.403", "gpm")
dus.add("gpmc2", "Main flow, converted (rev. A)", "Q_gpm,c2", "=Branches!D9*0.2271", "gpm",
        planted=("unit-scale", "m³/h to gpm multiplied by 0.2271 (m³/h per gpm): wrong way "
                 "round"))
dus.add("hf", "Main head loss per 100 ft", "h_100", "=Branches!I9/({Design.rho}*9.81)*100",
        "ft/100 ft")
DHUS = dus.finish([dh])

DH = {
    "trade": "district heating: network pipe sizing and pumping",
    "sheets": [("Design", DHDES), ("Branches", BRANCH), ("US", DHUS), ("Pipes", PIPES)],
    "planted": {**dh.planted, **dus.planted,
                "Branches!G7": ("unit-scale", "flow in m³/h used as m³/s: velocity 3600 too "
                                "large"),
                "Branches!L6": ("unit-scale", "30 % fittings allowance used as 30: loss 24 "
                                "times too large")},
}

# --------------------------------------------------------------------------------------------
# Book 3: water well constant-rate pumping test, Cooper-Jacob (m and ft, L/s and gpm, m²/d and
# gpd/ft, min and d)
# --------------------------------------------------------------------------------------------
WELL_SRC = (
    "Sources: Cooper–Jacob straight-line method T = 2.303·Q/(4π·Δs) = 0.183·Q/Δs and S = "
    "2.25·T·t₀/r², valid for u = r²S/(4Tt) below about 0.01, C. W. Fetter, Applied Hydrogeology "
    "4th ed. (2001) ch. 5, and G. P. Kruseman & N. A. de Ridder, Analysis and Evaluation of "
    "Pumping Test Data 2nd ed. (1990) ch. 3; US form T[gpd/ft] = 264·Q[gpm]/Δs[ft], Driscoll, "
    "Groundwater and Wells 2nd ed. (1986) ch. 9 (from memory); specific capacity Q/s: common "
    "practice; NIST SP 811 (2008) App. B.8 (1 L/s = 15.85 US gpm; 1 L/s = 86.4 m³/d; 3.281 "
    "ft/m; 1 m²/d = 80.52 gpd/ft, from 1 m²/d = 264.2 gal/d over 3.281 ft); 1440 min/d. Well, "
    "rate and water levels invented.")
tw = ItemSheet("Test", "Oxcombe Farm production well PW-2: 24-hour constant-rate test, "
               "observation well OW-1 (invented scenario)", WELL_SRC)
tw.add("Q", "Pumping rate (mean of meter readings)", "Q", 12.5, "L/s")
tw.add("Qg", "Pumping rate, gpm", "Q_gpm", "={Q}*15.85", "gpm")
tw.add("Qd", "Pumping rate, m³/d", "Q_d", "={Q}*86.4", "m³/d")
tw.add("Qd2", "Pumping rate, m³/d (abstraction licence form)", "Q_d2", "={Q}*3.6", "m³/d",
       planted=("unit-scale", "L/s × 3.6 gives m³/h, written under m³/d: 24 too small"))
tw.add("r", "Distance PW-2 to OW-1", "r", 30, "m")
tw.add("b", "Saturated aquifer thickness", "b", 18, "m")
tw.add("swl", "Static water level in OW-1 (below datum)", "SWL", 12.40, "m")
tw.add("t1", "Time at start of the straight-line cycle", "t_1", 100, "min")
tw.add("t2", "Time one log cycle later", "t_2", 1000, "min")
tw.add("s1", "Drawdown at t_1", "s_1", "=VLOOKUP({t1},Readings!$A$5:$E$14,4,FALSE)", "m")
tw.add("s2", "Drawdown at t_2", "s_2", "=VLOOKUP({t2},Readings!$A$5:$E$14,4,FALSE)", "m")
tw.add("ds", "Drawdown per log cycle", "Δs", "=({s2}-{s1})/LOG10({t2}/{t1})", "m")
tw.add("T", "Transmissivity", "T", "=0.183*{Qd}/{ds}", "m²/d")
tw.add("T2", "Transmissivity (field sheet)", "T_2", "=0.183*{Q}/{ds}", "m²/d",
       planted=("unit-scale", "0.183·Q/Δs with Q in L/s, not m³/d: 86.4 too small"))
tw.add("Tg", "Transmissivity, gpd/ft", "T_gpd", "={T}*80.52", "gpd/ft")
tw.add("Tg2", "Transmissivity, gpd/ft (driller's report)", "T_gpd2", "={T}/80.52", "gpd/ft",
       planted=("unit-scale", "m²/d to gpd/ft divided by 80.52: wrong way round"))
tw.add("t0", "Time where the straight line meets zero drawdown", "t_0",
       "={t1}*10^(-{s1}/{ds})", "min")
tw.add("t0d", "Time at zero drawdown, days", "t_0,d", "={t0}/1440", "d")
tw.add("S", "Storativity", "S", "=2.25*{T}*{t0d}/{r}^2", "-")
tw.add("S2", "Storativity (field sheet)", "S_2", "=2.25*{T}*{t0}/{r}^2", "-",
       planted=("unit-scale", "t₀ in min with T in m²/d: 1440 too large"))
tw.add("K", "Hydraulic conductivity", "K", "={T}/{b}", "m/d")
tw.add("Kft", "Hydraulic conductivity, ft/d", "K_ft", "={K}*3.281", "ft/d")
tw.add("u", "u at t_1 (Cooper–Jacob valid below 0.01)", "u",
       "={r}^2*{S}/(4*{T}*{t1}/1440)", "-")
tw.add("uchk", "Straight-line validity", "check_u", "=IF({u}<0.01,\"OK\",\"USE LATER DATA\")")
tw.add("smax", "Largest drawdown in OW-1", "s_max", "=MAX(Readings!D5:E14)", "m",
       planted=("mixed-range", "largest drawdown taken over the m and ft columns together"))
tw.add("dsft", "Drawdown per log cycle, ft", "Δs_ft", "={ds}*3.281", "ft")
tw.add("Tus", "Transmissivity, US form", "T_US", "=264*{Qg}/{dsft}", "gpd/ft")
tw.add("Tus2", "Transmissivity, US form (first pass)", "T_US2", "=264*{Qg}/{ds}", "gpd/ft",
       planted=("unit-scale", "264·Q/Δs with Δs in m, not ft: 3.281 too large"))
tw.add("spw", "Drawdown in PW-2 at 24 h", "s_pw", 7.85, "m")
tw.add("SC", "Specific capacity", "SC", "={Q}/{spw}", "L/s/m")
tw.add("SCg", "Specific capacity, gpm/ft", "SC_gpm", "={Qg}/({spw}*3.281)", "gpm/ft")
tw.add("SCg2", "Specific capacity, gpm/ft (well log)", "SC_gpm2", "={Qg}/{spw}", "gpm/ft",
       planted=("unit-scale", "gpm over drawdown in m written as gpm/ft: 3.281 too large"))
TEST = tw.finish()

W = tw.ref
READ = {
    "A1": "Oxcombe Farm PW-2 test: water levels in OW-1 (electric dip tape, invented readings)",
    "A2": ("Sources: drawdown = depth to water − static level; 1440 min/d; 3.281 ft/m (NIST SP "
           "811 (2008) App. B.8)."),
    "A3": CAUTION,
    "A4": "Time [min]", "B4": "Time [d]", "C4": "Depth to water [m]", "D4": "Drawdown [m]",
    "E4": "Drawdown [ft]",
    "A16": "Test length / largest", "B16": "=MAX(B5:B14)", "D16": "=MAX(D5:D14)",
    "E16": "=MAX(E5:E14)",
}
for r, (t, depth) in enumerate([(1, 12.61), (2, 12.76), (5, 12.97), (10, 13.10), (20, 13.23),
                                (50, 13.41), (100, 13.54), (200, 13.67), (500, 13.85),
                                (1000, 13.98)], start=5):
    READ[f"A{r}"], READ[f"C{r}"] = t, depth
    READ[f"B{r}"] = f"=A{r}/1440"
    READ[f"D{r}"] = f"=C{r}-{W('swl')}"
    READ[f"E{r}"] = f"=D{r}*3.281"
READ["B9"] = "=A9/60"          # planted: min to d divided by 60
READ["E12"] = "=D12/3.281"     # planted: m to ft the wrong way round

WELL = {
    "trade": "hydrogeology: constant-rate pumping test, Cooper-Jacob straight line",
    "sheets": [("Test", TEST), ("Readings", READ)],
    "sidecar": ("# Invented scenario. A dimensionally consistent formula can still be wrong; this\n"
                "# check does not replace independent review under local codes and licensed practice.\n"
                "# Oxcombe Farm PW-2: the US groundwater trade's gpd (US gallons per day, as in\n"
                "# gpd/ft; Driscoll, Groundwater and Wells 2nd ed. (1986)).\n"
                "measure gpd = 1 gal/d \"US gallon per day\"\n"),
    "planted": {**tw.planted,
                "Readings!B9": ("unit-scale", "min to d divided by 60 (gives h): 24 too large"),
                "Readings!E12": ("unit-scale", "m to ft divided by 3.281: wrong way round")},
}

# --------------------------------------------------------------------------------------------
# Book 4: paint shop cure oven and solvent exhaust (kW and Btu/h, m³/h and scfm, kg/h and lb/h,
# % LEL, °C and °F)
# --------------------------------------------------------------------------------------------
PAINT_SRC = (
    "Sources: NFPA 86, Standard for Ovens and Furnaces (2019 ed.) ch. 11: a continuous solvent "
    "oven's ventilation keeps the vapour below 25 % of its LEL, with a correction for the LEL's "
    "fall at oven temperature (from memory; check the edition in force); ideal-gas molar volume "
    "24.45 m³/kmol at 25 °C and 101.325 kPa (from memory); solvent molar mass, LEL and latent "
    "heat: SFPE Handbook of Fire Protection Engineering 5th ed. (2016) (from memory; check the "
    "SDS); heat of air 1.08 × scfm × ΔT°F Btu/h, ASHRAE Handbook—Fundamentals (2021) ch. 18; "
    "air ρ·c_p = 1.2 kg/m³ × 1.005 kJ/(kg·K) (common practice); steel c_p 0.49 kJ/(kg·K) "
    "(common practice); fan power = V̇·Δp/η (common practice); NIST SP 811 (2008) App. B.8 (1 kW "
    "= 3412 Btu/h; 1 m³/h = 0.5886 ft³/min; 1 kg = 2.205 lb; t/°F = 1.8·t/°C + 32; T/K = t/°C "
    "+ 273.15). Standard air taken at 25 °C here for the solvent basis; the fan trade's 70 °F "
    "differs by 1.3 % (neglected). Oven sizes, loads and readings invented.")
ov = ItemSheet("Oven", "Tennick Engineering powder/wet line 2: cure oven heat and solvent "
               "exhaust (invented scenario)", PAINT_SRC)
ov.add("solv", "Solvent (worst case in the paint range)", "solvent", "Xylene")
ov.add("ms", "Solvent evaporated in the oven", "m_s", 18, "kg/h")
ov.add("msl", "Solvent evaporated, lb/h", "m_s,lb", "={ms}*2.205", "lb/h")
ov.add("msl2", "Solvent evaporated, lb/h (insurer's form)", "m_s,lb2", "={ms}/2.205", "lb/h",
       planted=("unit-scale", "kg/h to lb/h divided by 2.205: wrong way round"))
ov.add("M", "Molar mass", "M", "=VLOOKUP({solv},Solvents!$A$5:$D$9,2,FALSE)", "kg/kmol")
ov.add("LEL", "Lower explosive limit", "LEL", "=VLOOKUP({solv},Solvents!$A$5:$D$9,3,FALSE)", "%")
ov.add("hfg", "Latent heat of vaporisation", "h_fg", "=VLOOKUP({solv},Solvents!$A$5:$D$9,4,FALSE)",
       "kJ/kg")
ov.add("Vv", "Solvent vapour at 25 °C", "V_v", "={ms}/{M}*24.45", "m³/h")
ov.add("SF", "Design share of the LEL (NFPA 86, continuous oven)", "f_LEL", 25, "%")
ov.add("Qs", "Fresh air for dilution at 25 °C", "Q_s", "={Vv}/({LEL}/100*{SF}/100)", "m³/h")
ov.add("Qs2", "Fresh air for dilution (hand check)", "Q_s2", "={Vv}/({LEL}*{SF}/100)", "m³/h",
       planted=("unit-scale", "LEL of 1.1 % used as 1.1: air 100 times too small"))
ov.add("kT", "LEL correction for oven temperature (NFPA 86 annex, from memory)", "k_T", 1.4, "-")
ov.add("Qc", "Dilution air at oven temperature's LEL, at 25 °C", "Q_c", "={Qs}*{kT}", "m³/h")
ov.add("Qset", "Exhaust fan duty (design, at 25 °C)", "Q_x", 5600, "m³/h")
ov.add("Qchk", "Exhaust covers the dilution air", "check_Q", "=IF({Qset}>={Qc},\"OK\",\"RAISE\")")
ov.add("Qsc", "Exhaust, scfm", "Q_scfm", "={Qset}*0.5886", "scfm")
ov.add("Qsc2", "Exhaust, scfm (burner maker's sheet)", "Q_scfm2", "={Qset}*35.31", "scfm",
       planted=("unit-scale", "m³/h × 35.31 gives ft³/h, written as scfm: 60 too large"))
ov.add("To", "Oven air temperature", "t_o", 180, "°C")
ov.add("Ta", "Make-up air temperature (winter)", "t_a", 5, "°C")
ov.add("Qa", "Exhaust at oven temperature (actual)", "Q_a",
       "={Qset}*({To}+273.15)/(25+273.15)", "m³/h")
ov.add("Qa2", "Exhaust at oven temperature (fan schedule)", "Q_a2", "={Qset}*{To}/25", "m³/h",
       planted=("offset-scale", "Charles's law with °C readings, not kelvins"))
ov.add("Qacfm", "Exhaust at oven temperature, acfm", "Q_acfm", "={Qa}*0.5886", "acfm")
ov.add("ToF", "Oven air temperature, °F", "t_o,F", "={To}*1.8+32", "°F")
ov.add("ToF2", "Oven air temperature, °F (controller set-up)", "t_o,F2", "={To}*1.8", "°F",
       planted=("offset-scale", "°C to °F without the +32"))
ov.add("TaF", "Make-up air temperature, °F", "t_a,F", "={Ta}*1.8+32", "°F")
ov.add("QexB", "Exhaust heat loss, US form", "Φ_ex,US", "=1.08*{Qsc}*({ToF}-{TaF})", "Btu/h")
ov.add("mp", "Steel parts through the oven", "m_p", 2400, "kg/h")
ov.add("mh", "Hangers and conveyor chain through the oven", "m_h", 650, "kg/h")
ov.add("cps", "Specific heat of steel", "c_p,s", 0.49, "kJ/(kg·K)")
ov.add("tpi", "Part temperature entering", "t_p,in", 15, "°C")
ov.add("tpo", "Part temperature leaving", "t_p,out", 170, "°C")
ov.add("U", "Panel heat loss coefficient (150 mm mineral wool)", "U", 0.35, "W/(m²·K)")
ov.add("A", "Oven panel area", "A", 410, "m²")
ov.heading("Heat balance")
ov.add("Qex", "Exhaust heat loss", "Φ_ex", "=1.2*1.005*{Qset}/3600*({To}-{Ta})", "kW")
ov.add("Qp", "Heat to parts, hangers and chain", "Φ_p", "=({mp}+{mh})*{cps}*({tpo}-{tpi})/3600",
       "kW")
ov.add("Qe", "Heat to evaporate the solvent", "Φ_e", "={ms}*{hfg}/3600", "kW")
ov.add("Qw", "Panel losses", "Φ_w", "={U}*{A}*({To}-{Ta})/1000", "kW")
ov.add("Qn", "Net heat demand", "Φ_n", "=SUM({Qex}:{Qw})", "kW")
ov.add("Qp2", "Heat to parts (first draft)", "Φ_p2", "={mp}*{cps}*({tpo}-{tpi})", "kW",
       planted=("unit-scale", "kg/h × kJ/(kg·K) × K gives kJ/h, written as kW: 3600 too large"))
ov.add("eta", "Burner efficiency (direct gas-fired)", "η_b", 90, "%")
ov.add("Qb", "Burner input", "Φ_b", "={Qn}/({eta}/100)", "kW")
ov.add("QbB", "Burner input, Btu/h", "Φ_b,US", "={Qb}*3412", "Btu/h")
ov.add("QbB2", "Burner input, Btu/h (gas utility form)", "Φ_b,US2", "={Qb}*3.412", "Btu/h",
       planted=("unit-scale", "kW × 3.412 gives MBH, written as Btu/h: 1000 too small"))
ov.add("dpf", "Exhaust fan total pressure", "Δp_f", 750, "Pa")
ov.add("etaf", "Exhaust fan efficiency", "η_f", 60, "%")
ov.add("Pf", "Exhaust fan shaft power", "P_f", "={Qa}/3600*{dpf}/({etaf}/100)/1000", "kW")
ov.add("Pf2", "Exhaust fan shaft power (motor list)", "P_f2", "={Qa}/3600*{dpf}/({etaf}/100)",
       "kW", planted=("unit-scale", "m³/s × Pa gives W, written as kW: 1000 too large"))
ov.add("conc", "Solvent vapour in the exhaust", "x_v", "={Vv}/{Qset}*100", "%")
ov.add("pLEL", "Vapour as a share of the LEL", "x_LEL", "={conc}/{LEL}*100", "%")
ov.add("chk", "LEL check", "check", "=IF({pLEL}<={SF},\"OK\",\"INCREASE EXHAUST\")")
ov.add("Tmean", "Mean oven air temperature (zone probes)", "t_m", "=Zones!C10", "°C")
ov.add("Tmean2", "Mean oven air temperature (daily log)", "t_m2", "=AVERAGE(Zones!C5:D8)", "°C",
       planted=("mixed-range", "mean taken over the °C and °F probe columns together"))
OVEN = ov.finish()

ZONES = {
    "A1": "Line 2 cure oven: zone probe readings during the heat-up survey (invented readings)",
    "A2": "Sources: t/°F = 1.8·t/°C + 32 (NIST SP 811 (2008) App. B.8); deviation = reading − "
          "set point.",
    "A3": CAUTION,
    "A4": "Zone", "B4": "Set point [°C]", "C4": "Probe [°C]", "D4": "Probe [°F]",
    "E4": "Deviation [K]",
    "A10": "Mean / largest deviation", "C10": "=AVERAGE(C5:C8)", "D10": "=AVERAGE(D5:D8)",
    "E10": "=MAX(E5:E8)",
}
for r, (z, sp, rd) in enumerate([("Z1 heat-up", 185, 176.4), ("Z2 hold", 180, 181.2),
                                 ("Z3 hold", 180, 179.1), ("Z4 exit", 175, 172.8)], start=5):
    ZONES[f"A{r}"], ZONES[f"B{r}"], ZONES[f"C{r}"] = z, sp, rd
    ZONES[f"D{r}"] = f"=C{r}*1.8+32"
    ZONES[f"E{r}"] = f"=C{r}-B{r}"

SOLVENTS = {
    "A1": "Solvent data (SFPE Handbook 5th ed., from memory; check the SDS)",
    "A2": CAUTION,
    "A4": "Solvent", "B4": "Molar mass [kg/kmol]", "C4": "LEL [%]", "D4": "Latent heat [kJ/kg]",
}
for r, row in enumerate([("Acetone", 58.08, 2.5, 518), ("Butyl acetate", 116.2, 1.7, 309),
                         ("MEK", 72.11, 1.4, 443), ("Toluene", 92.14, 1.1, 351),
                         ("Xylene", 106.2, 1.1, 343)], start=5):
    for c, v in zip("ABCD", row):
        SOLVENTS[f"{c}{r}"] = v

PAINT = {
    "trade": "industrial finishing: paint cure oven heat and solvent exhaust",
    "sheets": [("Oven", OVEN), ("Zones", ZONES), ("Solvents", SOLVENTS)],
    "planted": {**ov.planted},
}

BOOKS = {"mezzanine-beams": BEAM, "heat-network": DH, "pump-test": WELL, "cure-oven": PAINT}

# The findings plumb makes beyond the planted mistakes, and the planted cells it misses, each
# with the reviewer's reason (filled in after running the binary).
GRAV = ("a note on a correct cell: 9.81 in the self weight mass × 9.81/1000 (kg/m to kN/m) read "
        "as standard gravity, which it is")
DN = ("a correct input plumb still flags: a DN is a designation of size with no unit (ISO 6708), "
      "used only as the VLOOKUP key; its unit never reaches the result")
EXTRA = {
    "mezzanine-beams": [(GRAV, "Beams!F5 gravity-number"), (GRAV, "Beams!F7 gravity-number"),
                        (GRAV, "Beams!F8 gravity-number")],
    "heat-network": [
        ("a note on a correct cell: 500 in gpm = Btu/h/(500·ΔT°F) read as the heat capacity of "
         "a volume of water (ASHRAE), which it is", "US!C8 trade-constant"),
        ("a note on a correct cell: 9.81 in R/(ρ·g)·100 (Pa/m to ft/100 ft) read as standard "
         "gravity, which it is", "US!C11 gravity-number")]
        + [(DN, f"Branches!E{r} no-unit") for r in range(5, 10)]
        + [(DN, f"Pipes!A{r} no-unit") for r in range(5, 12)],
    "pump-test": [
        ("a note on a correct cell: 264 in T = 264·Q[gpm]/Δs[ft] read as ln 10/(4π) × 1440 "
         "min/d folded together, which it is (Driscoll 1986)", "Test!C32 trade-constant")],
    "cure-oven": [
        ("a note on a correct cell: 24.45 m³/kmol read as the molar volume of an ideal gas at "
         "25 °C and 101.325 kPa, which it is", "Oven!C13 trade-constant"),
        ("a note on a correct cell: 25 + 273.15 read as the reference temperature of Charles's "
         "law, which it is", "Oven!C25 trade-constant"),
        ("a note on a correct cell: 1.08 × scfm × ΔT°F read as air's volumetric heat capacity "
         "(ASHRAE), which it is", "Oven!C31 trade-constant"),
        ("a note on a correct cell, in loose words: in 1.2*1.005 the 1.2 is air's density "
         "(kg/m³) and 1.005 its c_p (kJ/(kg·K)); plumb calls the 1.2 alone the heat capacity of a "
         "volume (the product, 1.206, is)", "Oven!C40 trade-constant")],
}
MISSED = {
    "mezzanine-beams": {
        "US!C22": "the schedule's column 12 is already in in; dividing by 25.4 again gives a "
                  "number 25.4 times too small under 'in'. Expected unit-scale (a factor the "
                  "units do not need). In probes plumb reports 3.281, 39.37, 304.8, 1000, 3.6, "
                  "60, 1440 and 3412 as not needed where the units agree, but never 25.4, 2.54, "
                  "0.0254, 12, 86.4 or 1.8"},
}
RENAMED = {
    "heat-network": {"Design!C10": ("sum-mismatch", "it reads the 32 as a bare number added to "
                                    "a temperature difference")},
}
MESSAGES = {
    "heat-network": {
        "Design!C10": "'cannot add 32 to C8*1.8: their dimensions differ': right cell, but the "
                      "slip is the °F zero added to a difference; nothing says a difference "
                      "converts by ×1.8 alone"},
    "pump-test": {
        "Test!C9": "'the value shown is 86.4 times too small': it is 24 times too small (45 "
                   "for 1080 m³/d); the typed 3.6 (L/s to m³/h) is left out of the ratio",
        "Test!C33": "'the value shown is 438.912 times too small': it is 3.281 times too large; "
                    "with Δs in m the 264 is no longer read as the folded well constant, so the "
                    "ratio is worked as if 264 were a count"},
}


def main():
    write_books(HERE, BOOKS, {"EXTRA": EXTRA, "MISSED": MISSED, "RENAMED": RENAMED,
                              "MESSAGES": MESSAGES})


if __name__ == "__main__":
    main()
