#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review45), written with the
standard library only (corpus/sheets/xlsx_writer.py and item_sheet.py, shared by the review
books), adapted like review43 and after its pattern (corpus/sheets/review43/make_books.py).

Trades: a craft brewery's glycol chiller for its fermenters; a small run-of-river hydropower
scheme; an oilfield three-phase separator; a belt dryer for a vegetable product. All scenarios,
sites, firms, readings and catalogue data are invented (demonstration only); the formulas and
published factors are the trade's own, with their sources named in a text cell at the top of each
sheet ("from memory" where recalled and not checked, "common practice" for a fact of the trade
with no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. The findings plumb makes beyond the planted ones, the planted cells it misses
or names by another rule, and its messages that mislead, are recorded with their reasons in
review_notes.py (EXTRA, MISSED, RENAMED, MESSAGES, HEADNOTE) after running the binary of the day.

Run: python3 make_books.py  ->  *.xlsx, *.expect (where absent; --expect rewrites them) in this
folder (these books need no .cells.plumb sidecar: the units are typed beside the cells, as the
trades type them)
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
# Book 1: brewery glycol chiller (hL and m³, kW and Btu/h, °C and °F, L/min and gpm, kPa, m
# and ft, hp, TR)
# --------------------------------------------------------------------------------------------
BREW_SRC = (
    "Sources: heat of fermentation about 587 kJ per kg of extract fermented (W. Kunze, "
    "Technology Brewing and Malting, 3rd int. ed. (2004), from memory); degrees Plato read as % "
    "extract by mass (common practice); wort 12 °P density 1048 kg/m³ and beer c_p 3.9 kJ/(kg·K) "
    "(from memory); propylene glycol solutions c_p and density by mass concentration near 0 °C, "
    "ASHRAE Handbook — Fundamentals (2017) ch. 31 (from memory, see the Glycol sheet); Q = m·c_p·ΔT "
    "(common practice); hydraulic power = Q·Δp (common practice); g = 9.81 m/s² (9.80665, SI "
    "Brochure 9th ed.); NIST SP 811 (2008) App. B.8: 1 kW = 3412 Btu/h, 1 US gal = 3.785 L, 1 hp "
    "= 0.7457 kW, 1 ton of refrigeration = 12 000 Btu/h = 3.517 kW, 1 m = 3.281 ft, 1 hL = 0.1 "
    "m³, 1 Btu/(lb·°F) = 4.1868 kJ/(kg·K); US rule Btu/h = 500 × gpm × ΔT°F for water (8.34 "
    "lb/gal × 60 min/h), times SG and c_p/4.1868 for a glycol (common practice). Brewery, tanks "
    "and chiller data invented.")
br = ItemSheet("Chiller", "Hollin Lane Brewing Co. (invented): glycol chiller for fermenters FV-1 "
               "to FV-4", BREW_SRC)
br.heading("Reference tank (30 hL)")
br.add("Vf", "Fermenter working volume", "V_f", 30, "hL")
br.add("Vm", "Fermenter working volume, m³", "V_m", "={Vf}/10", "m³")
br.add("rw", "Wort density (12 °P)", "rho_w", 1048, "kg/m³")
br.add("mw", "Mass of wort in the tank", "m_w", "={Vm}*{rw}", "kg")
br.add("rate", "Peak fall in extract (°P per day, % by mass)", "r_P", 2.0, "%/d")
br.add("qf", "Heat of fermentation per kg of extract fermented", "q_f", 587, "kJ/kg")
br.add("Qf", "Peak fermentation heat", "Q_f", "={mw}*{rate}/100*{qf}/86400", "kW")
br.add("Qf2", "Peak fermentation heat (brewer's note)", "Q_f2", "={mw}*{rate}*{qf}/86400", "kW",
       planted=("unit-scale", "extract rate in % per day used as a fraction: 100 too large"))
br.add("cpb", "Specific heat of green beer", "c_p,b", 3.9, "kJ/(kg·K)")
br.add("t1", "Fermentation temperature", "t_1", 19, "°C")
br.add("t2", "Crash-cooling target temperature", "t_2", 0, "°C")
br.add("tc", "Crash-cooling period", "t_c", 24, "h")
br.add("Qc", "Crash-cooling load", "Q_c", "={mw}*{cpb}*({t1}-{t2})/({tc}*3600)", "kW")
br.add("Qc2", "Crash-cooling load (first draft)", "Q_c2", "={mw}*{cpb}*({t1}-{t2})/{tc}", "kW",
       planted=("unit-scale", "period in h where s belongs: 3600 too large"))
br.heading("Glycol loop")
br.add("Qt", "Jacket load: all tanks at peak fermentation plus the largest crash", "Q_j",
       "=Tanks!C9+MAX(Tanks!D5:D8)", "kW")
br.add("Qp", "Heat gain to the glycol pipework (estimate)", "Q_p", 1.5, "kW")
br.add("xg", "Propylene glycol concentration (by mass)", "x_g", 35, "%")
br.add("cpg", "Glycol specific heat", "c_p,g", "=VLOOKUP({xg},Glycol!A5:D9,2,FALSE)",
       "kJ/(kg·K)")
br.add("rg", "Glycol density", "rho_g", "=VLOOKUP({xg},Glycol!A5:D9,3,FALSE)", "kg/m³")
br.add("tfz", "Glycol freezing point", "t_fz", "=VLOOKUP({xg},Glycol!A5:D9,4,FALSE)", "°C")
br.add("tgs", "Glycol supply temperature", "t_gs", -4, "°C")
br.add("tgr", "Glycol return temperature", "t_gr", 0, "°C")
br.add("tgsK", "Glycol supply temperature, K (property software)", "T_gs", "={tgs}+273.15", "K")
br.add("tgsK2", "Glycol supply temperature, K (pump selection form)", "T_gs2", "={tgs}", "K",
       planted=("offset-scale", "°C reading set equal to K"))
br.add("fzchk", "Freeze margin check (5 K)", "check_fz", "=IF({tgs}-{tfz}>=5,\"OK\",\"RAISE %\")")
br.add("dTg", "Glycol temperature rise across the jackets", "ΔT_g", "={tgr}-{tgs}", "K")
br.add("dTgF", "Glycol temperature rise across the jackets, °F", "ΔT_g,F", "={dTg}*1.8", "Δ°F")
br.add("dTgF2", "Glycol temperature rise, °F (US chiller form)", "ΔT_g,F2", "={dTg}*1.8+32",
       "Δ°F", planted=("offset-scale", "32 added to a temperature difference"))
br.add("mg", "Glycol mass flow", "m_g", "={Qt}/({cpg}*{dTg})", "kg/s")
br.add("Vg", "Glycol volume flow", "V_g", "={mg}/{rg}*1000*60", "L/min")
br.add("Vg2", "Glycol volume flow (first draft)", "V_g2", "={mg}/{rg}*60", "L/min",
       planted=("unit-scale", "m³/min written as L/min: the *1000 missing, 1000 too small"))
br.add("gpm", "Glycol volume flow, US gpm", "V_g,US", "={Vg}/3.785", "gpm")
br.add("gpm2", "Glycol volume flow, US gpm (chiller enquiry)", "V_g,US2", "={Vg}*3.785", "gpm",
       planted=("unit-scale", "L/min to gpm multiplied by 3.785: wrong way round"))
br.add("QUS", "Jacket load by the US rule (check)", "Q_j,US",
       "=500*{gpm}*{dTgF}*{rg}/1000*{cpg}/4.1868", "Btu/h")
br.heading("Glycol pump")
br.add("dp", "Pump differential pressure (loop loss at design flow)", "Δp", 250, "kPa")
br.add("eta", "Pump efficiency", "eta_p", 62, "%")
br.add("Ph", "Pump hydraulic power", "P_h", "={Vg}/60000*{dp}", "kW")
br.add("Psh", "Pump shaft power", "P_sh", "={Ph}/({eta}/100)", "kW")
br.add("Psh2", "Pump shaft power (rev. A)", "P_sh2", "={Ph}/{eta}", "kW",
       planted=("unit-scale", "efficiency in % used as a fraction: 100 too small"))
br.add("Php", "Pump shaft power, hp", "P_sh,hp", "={Psh}/0.7457", "hp")
br.add("PshW", "Pump shaft power, W (motor list)", "P_sh,W", "={Psh}*1000", "W")
br.add("Hg", "Pump head", "H", "={dp}*1000/({rg}*9.81)", "m")
br.add("Hg2", "Pump head (pump enquiry)", "H_2", "={dp}*1000/{rg}", "m",
       planted=("result-unit", "Δp/ρ without g: gives J/kg, not m"))
br.heading("Chiller")
br.add("Qd", "Chiller duty (jackets, pipework, pump heat)", "Q_d", "={Qt}+{Qp}+{Psh}", "kW")
br.add("Qd2", "Chiller duty (summary sheet)", "Q_d2", "={Qt}+{Qp}+{PshW}", "kW",
       planted=("unit-scale", "pump power in W added to loads in kW"))
br.add("QdB", "Chiller duty, Btu/h", "Q_d,US", "={Qd}*3412", "Btu/h")
br.add("TR", "Chiller duty, tons of refrigeration", "Q_d,TR", "={Qd}/3.517", "TR")
br.add("model", "Chiller model", "model", "GC-15")
br.add("cap", "Chiller capacity at −4 °C leaving glycol", "Q_cap",
       "=VLOOKUP({model},Chillers!A5:C8,2,FALSE)", "kW")
br.add("chk", "Chiller capacity check", "check", "=IF({cap}>={Qd},\"OK\",\"UPSIZE\")")
CHILLER = br.finish()

Cr = br.ref
TANKS = {
    "A1": "Hollin Lane Brewing Co.: fermenter loads, tank by tank (invented tank list)",
    "A2": ("Sources: as the Chiller sheet; 1 hL = 0.1 m³ (NIST SP 811 (2008) App. B.8); peak "
           "fermentation heat = mass × rate × heat of fermentation; crash load = m·c_p·ΔT over the "
           "period (common practice)."),
    "A3": CAUTION,
    "A4": "Tank", "B4": "Volume [hL]", "C4": "Peak fermentation [kW]", "D4": "Crash cooling [kW]",
    "A9": "Total / largest", "C9": "=SUM(C5:C8)", "D9": "=MAX(D5:D8)",
}
for r, (t, v) in enumerate([("FV-1", 30), ("FV-2", 30), ("FV-3", 60), ("FV-4", 60)], start=5):
    TANKS[f"A{r}"], TANKS[f"B{r}"] = t, v
    TANKS[f"C{r}"] = f"=B{r}/10*{Cr('rw')}*{Cr('rate')}/100*{Cr('qf')}/86400"
    TANKS[f"D{r}"] = (f"=B{r}/10*{Cr('rw')}*{Cr('cpb')}*({Cr('t1')}-{Cr('t2')})"
                      f"/({Cr('tc')}*3600)")
TANKS["C8"] = f"=B8*{Cr('rw')}*{Cr('rate')}/100*{Cr('qf')}/86400"   # planted: hL taken as m³

GLYCOL = {
    "A1": ("Propylene glycol solutions near 0 °C (from memory of ASHRAE Handbook — Fundamentals "
           "(2017) ch. 31; check the table before use)"),
    "A4": "Concentration [%]", "B4": "c_p [kJ/(kg·K)]", "C4": "Density [kg/m³]",
    "D4": "Freezing point [°C]",
}
for r, row in enumerate([(25, 3.93, 1026, -10), (30, 3.87, 1030, -13), (35, 3.80, 1034, -17),
                         (40, 3.73, 1038, -21), (45, 3.65, 1042, -26)], start=5):
    for c, v in zip("ABCD", row):
        GLYCOL[f"{c}{r}"] = v

CHILLERS = {
    "A1": "Packaged glycol chillers at −4 °C leaving glycol, 30 °C ambient (invented catalogue)",
    "A4": "Model", "B4": "Capacity [kW]", "C4": "COP [-]",
}
for r, row in enumerate([("GC-8", 8, 2.3), ("GC-12", 12, 2.4), ("GC-15", 15, 2.4),
                         ("GC-20", 20, 2.5)], start=5):
    for c, v in zip("ABC", row):
        CHILLERS[f"{c}{r}"] = v

BREW = {
    "trade": "brewery: fermenter glycol chiller and pump",
    "sheets": [("Chiller", CHILLER), ("Tanks", TANKS), ("Glycol", GLYCOL),
               ("Chillers", CHILLERS)],
    "planted": {**br.planted,
                "Tanks!C8": ("unit-scale", "volume in hL used as m³: the /10 missing, 10 too "
                             "large")},
}

# --------------------------------------------------------------------------------------------
# Book 2: run-of-river hydropower (m and ft, m³/s and cfs, mm, kPa g, psig and psia, kW and hp,
# MWh/yr, %)
# --------------------------------------------------------------------------------------------
HYD_SRC = (
    "Sources: P = ρ·g·Q·H_n·η (common practice; e.g. ESHA, Guide on How to Develop a Small "
    "Hydropower Plant (2004), from memory); Darcy-Weisbach h_f = f·L/D·v²/(2g) with the "
    "Swamee-Jain friction factor f = 0.25/[log10(ε/(3.7D) + 5.74/Re^0.9)]², and minor losses "
    "K·v²/(2g), Crane TP-410 (2009) ch. 1 and 2 (from memory); Hazen-Williams h_f = "
    "10.67·L·Q^1.852/(C^1.852·D^4.8704) in SI (m, m³/s) and 4.73·L·Q^1.852/(C^1.852·D^4.87) in "
    "US units (ft, cfs), common practice (from memory); roughness and C by material, Pipe sheet "
    "(from memory); water at 10 °C ρ = 999.7 kg/m³, ν = 1.31E-6 m²/s (from memory); g = 9.81 "
    "m/s²; US rule P(kW) = Q(cfs)·H(ft)·η/11.8 (737.6 ft·lbf/s per kW over 62.4 lbf/ft³, common "
    "practice); NIST SP 811 (2008) App. B.8: 3.281 ft/m, 35.31 ft³/m³, 1 hp = 0.7457 kW, 1 psi = "
    "6.895 kPa; standard atmosphere 14.7 psia; 8760 h/yr. Site, flows and data invented.")
hy = ItemSheet("Hydro", "Afon Garw run-of-river scheme (invented): penstock, power and energy",
               HYD_SRC)
hy.heading("Head and flow")
hy.add("zi", "Forebay water level (above datum)", "z_f", 312.0, "m")
hy.add("zt", "Turbine centreline (above datum)", "z_t", 270.0, "m")
hy.add("Hg", "Gross head", "H_g", "={zi}-{zt}", "m")
hy.add("Q", "Design flow", "Q", 1.8, "m³/s")
hy.add("Qcfs", "Design flow, cfs", "Q_cfs", "={Q}*35.31", "cfs")
hy.add("Qcfs2", "Design flow, cfs (turbine maker's form)", "Q_cfs2", "={Q}*3.281", "cfs",
       planted=("unit-scale", "m³/s to cfs with the length factor 3.281: should be 35.31"))
hy.add("Qcomp", "Compensation (residual) flow left in the river", "Q_comp", 0.25, "m³/s")
hy.heading("Penstock")
hy.add("L", "Penstock length", "L", 650, "m")
hy.add("D", "Penstock inside diameter", "D", 900, "mm")
hy.add("mat", "Penstock material", "material", "Steel, welded")
hy.add("eps", "Absolute roughness", "ε", "=VLOOKUP({mat},Pipe!A5:C8,2,FALSE)", "mm")
hy.add("C", "Hazen-Williams C", "C_HW", "=VLOOKUP({mat},Pipe!A5:C8,3,FALSE)", "-")
hy.add("nu", "Kinematic viscosity of water (10 °C)", "ν", 1.31E-6, "m²/s")
hy.add("A", "Penstock bore area", "A", "=PI()/4*({D}/1000)^2", "m²")
hy.add("v", "Mean velocity", "v", "={Q}/{A}", "m/s")
hy.add("Re", "Reynolds number", "Re", "={v}*{D}/1000/{nu}", "-")
hy.add("f", "Darcy friction factor (Swamee-Jain)", "f",
       "=0.25/LOG10({eps}/(3.7*{D})+5.74/{Re}^0.9)^2", "-")
hy.add("hf", "Friction loss (Darcy-Weisbach)", "h_f", "={f}*{L}/({D}/1000)*{v}^2/(2*9.81)", "m")
hy.add("hf2", "Friction loss (first draft)", "h_f2", "={f}*{L}/{D}*{v}^2/(2*9.81)", "m",
       planted=("unit-scale", "diameter in mm where m belongs: 1000 too small"))
hy.add("hf3", "Friction loss (hand check)", "h_f3", "={f}*{L}/({D}/1000)*{v}^2/2", "m",
       planted=("result-unit", "v²/2 without g: gives J/kg, not m"))
hy.add("hfHW", "Friction loss (Hazen-Williams, SI)", "h_f,HW",
       "=10.67*{L}*{Q}^1.852/({C}^1.852*({D}/1000)^4.8704)", "m")
hy.add("Lft", "Penstock length, ft", "L_ft", "={L}*3.281", "ft")
hy.add("hfUS", "Friction loss (Hazen-Williams, US units)", "h_f,US",
       "=4.73*{Lft}*{Qcfs}^1.852/({C}^1.852*({D}/304.8)^4.87)", "ft")
hy.add("K", "Minor loss coefficients (intake, bends, valve)", "ΣK", 3.2, "-")
hy.add("hm", "Minor losses", "h_m", "={K}*{v}^2/(2*9.81)", "m")
hy.add("Hn", "Net head", "H_n", "={Hg}-{hf}-{hm}", "m")
hy.add("Hnft", "Net head, ft", "H_n,ft", "={Hn}*3.281", "ft")
hy.heading("Power and energy")
hy.add("rho", "Water density (10 °C)", "rho", 999.7, "kg/m³")
hy.add("eta", "Overall efficiency (turbine, generator, transformer)", "eta", 82, "%")
hy.add("P", "Electrical output at design flow", "P", "={rho}*9.81*{Q}*{Hn}*{eta}/100/1000", "kW")
hy.add("P2", "Electrical output (grid application)", "P_2", "={rho}*9.81*{Q}*{Hn}*{eta}/1000",
       "kW", planted=("unit-scale", "efficiency in % used as a fraction: 100 too large"))
hy.add("Php", "Electrical output, hp", "P_hp", "={P}/0.7457", "hp")
hy.add("Php2", "Electrical output, hp (turbine maker's form)", "P_hp2", "={P}*0.7457", "hp",
       planted=("unit-scale", "kW to hp multiplied by 0.7457: wrong way round"))
hy.add("PUS", "Electrical output by the US rule (check)", "P_US", "={Qcfs}*{Hnft}*{eta}/100/11.8",
       "kW")
hy.add("pst", "Static pressure at the turbine inlet valve", "p_st", "={rho}*9.81*{Hg}/1000",
       "kPa g")
hy.add("ppsig", "Static pressure at the inlet valve, psig", "p_st,US", "={pst}/6.895", "psig")
hy.add("ppsia", "Static pressure at the inlet valve, absolute", "p_st,a", "={ppsig}+14.7", "psia")
hy.add("ppsia2", "Static pressure at the inlet valve, absolute (valve datasheet)", "p_st,a2",
       "={pst}/6.895", "psia", planted=("offset-scale", "gauge pressure written as absolute"))
hy.add("CF", "Capacity factor (from the flow duration sheet)", "CF",
       "=FDC!F9/({P}*8760/1000)*100", "%")
hy.add("E", "Annual energy", "E", "={P}*8760*{CF}/100/1000", "MWh/yr")
hy.add("E2", "Annual energy (grid application)", "E_2", "={P}*8760*{CF}/100", "MWh/yr",
       planted=("unit-scale", "kWh/yr written as MWh/yr: the /1000 missing"))
HYDRO = hy.finish()

Hr = hy.ref
FDC = {
    "A1": "Afon Garw: flow duration bands at the intake (invented gauged record, 12 years)",
    "A2": ("Sources: as the Hydro sheet; usable flow = river flow less the compensation flow, "
           "capped at the design flow; power taken in proportion to flow (head loss and part-load "
           "efficiency neglected, a first estimate; common practice)."),
    "A3": CAUTION,
    "A4": "Band", "B4": "Share of year [%]", "C4": "River flow [m³/s]",
    "D4": "Usable flow [m³/s]", "E4": "Power [kW]", "F4": "Energy [MWh/yr]",
    "A9": "Total", "B9": "=SUM(B5:B8)", "F9": "=SUM(F5:F8)",
}
for r, (band, share, q) in enumerate([("0-15 %", 15, 5.8), ("15-40 %", 25, 2.6),
                                      ("40-75 %", 35, 1.5), ("75-100 %", 25, 0.7)], start=5):
    FDC[f"A{r}"], FDC[f"B{r}"], FDC[f"C{r}"] = band, share, q
    FDC[f"D{r}"] = f"=MAX(0,MIN(C{r}-{Hr('Qcomp')},{Hr('Q')}))"
    FDC[f"E{r}"] = f"={Hr('P')}*D{r}/{Hr('Q')}"
    FDC[f"F{r}"] = f"=E{r}*B{r}/100*8760/1000"
FDC["E7"] = f"={Hr('P')}*D7/{Hr('Q')}*1000"     # planted: W in the kW column

PIPE = {
    "A1": ("Penstock materials: absolute roughness and Hazen-Williams C (from memory of Crane "
           "TP-410 and common practice; check before use)"),
    "A4": "Material", "B4": "Roughness [mm]", "C4": "Hazen-Williams C [-]",
}
for r, row in enumerate([("Steel, welded", 0.045, 120), ("Ductile iron, lined", 0.03, 130),
                         ("GRP", 0.01, 145), ("HDPE", 0.007, 150)], start=5):
    for c, v in zip("ABC", row):
        PIPE[f"{c}{r}"] = v

HYDB = {
    "trade": "small hydropower: run-of-river penstock, power and annual energy",
    "sheets": [("Hydro", HYDRO), ("FDC", FDC), ("Pipe", PIPE)],
    "planted": {**hy.planted,
                "FDC!E7": ("unit-scale", "power × 1000 (W) in the kW column: 1000 too large")},
}

# --------------------------------------------------------------------------------------------
# Book 3: oilfield three-phase separator (bbl/d and m³/d, MMscfd, psig, psia and kPa, °F and °R,
# ft, in and mm, lb/ft³ and kg/m³, cP, µm)
# --------------------------------------------------------------------------------------------
SEP_SRC = (
    "Sources: three-phase horizontal separator sizing by retention time and gas capacity, K. "
    "Arnold and M. Stewart, Surface Production Operations vol. 1, 3rd ed. (2008) ch. 4-5 (from "
    "memory); Souders-Brown V_max = K·√((ρ_l − ρ_g)/ρ_g), K = 0.5 ft/s horizontal with mesh pad, "
    "GPSA Engineering Data Book 13th ed. (2012) sec. 7 (from memory); gas density ρ_g = "
    "p·M_a·SG/(Z·R·T), M_a = 28.97 lb/lbmol, R = 10.73 psia·ft³/(lbmol·°R) (GPSA sec. 1, from "
    "memory); actual gas flow = standard flow × (14.7/p)·(T/520)·Z, standard conditions 14.7 "
    "psia and 60 °F (common practice); SG_o = 141.5/(131.5 + °API), API definition (common "
    "practice); Stokes settling v_t = g·d²·Δρ/(18·μ) (common practice); water 62.4 lb/ft³ at 60 "
    "°F (from memory); NIST SP 811 (2008) App. B.8: 1 bbl = 0.159 m³ = 5.615 ft³, 1 psi = 6.895 "
    "kPa, 1 lb/ft³ = 16.02 kg/m³, 1 in = 25.4 mm, 1 m = 39.37 in, °R = °F + 459.67. Field, wells "
    "and readings invented.")
sp = ItemSheet("Separator", "Kestrel Ridge field (invented): production separator V-110, "
               "three-phase horizontal", SEP_SRC)
sp.heading("Streams")
sp.add("Qo", "Oil rate (sum of wells)", "Q_o", "=Wells!B9", "bbl/d")
sp.add("Qw", "Produced water rate (sum of wells)", "Q_w", "=Wells!C9", "bbl/d")
sp.add("Qg", "Gas rate (sum of wells)", "Q_g", "=Wells!D9", "MMscfd")
sp.add("Qom", "Oil rate, m³/d", "Q_o,SI", "={Qo}*0.159", "m³/d")
sp.add("Qom2", "Oil rate, m³/d (partner report)", "Q_o,SI2", "={Qo}/0.159", "m³/d",
       planted=("unit-scale", "bbl/d to m³/d divided by 0.159: wrong way round"))
sp.add("Qwm", "Produced water rate, m³/d", "Q_w,SI", "={Qw}*0.159", "m³/d")
sp.add("API", "Oil gravity (°API)", "API", 35, "-")
sp.add("SGo", "Oil specific gravity", "SG_o", "=141.5/(131.5+{API})", "-")
sp.add("SGw", "Produced water specific gravity", "SG_w", 1.07, "-")
sp.heading("Operating conditions")
sp.add("pg", "Operating pressure", "p_g", 150, "psig")
sp.add("pa", "Operating pressure, absolute", "p_a", "={pg}+14.7", "psia")
sp.add("pk", "Operating pressure, kPa absolute (simulation)", "p_kPa", "={pa}*6.895", "kPa")
sp.add("pk2", "Operating pressure, kPa absolute (vendor datasheet)", "p_kPa2", "={pg}*6.895",
       "kPa", planted=("offset-scale", "gauge pressure converted into an absolute kPa cell"))
sp.add("pbg", "Operating pressure, bar g", "p_bar", "={pg}*0.06895", "bar g")
sp.add("TF", "Operating temperature", "t", 100, "°F")
sp.add("TR", "Operating temperature, absolute", "T", "={TF}+459.67", "°R")
sp.add("Z", "Gas compressibility factor", "Z", 0.92, "-")
sp.add("SGg", "Gas specific gravity (air = 1)", "SG_g", 0.70, "-")
sp.add("Ma", "Molar mass of air", "M_a", 28.97, "lb/lbmol")
sp.add("R", "Gas constant", "R", 10.73, "psia·ft³/(lbmol·°R)")
sp.add("rg", "Gas density at operating conditions", "rho_g", "={pa}*{Ma}*{SGg}/({Z}*{R}*{TR})",
       "lb/ft³")
sp.add("rg2", "Gas density (first draft)", "rho_g2", "={pa}*{Ma}*{SGg}/({Z}*{R}*{TF})", "lb/ft³",
       planted=("offset-scale", "°F reading in a gas law where °R belongs"))
sp.add("Qga", "Actual gas flow at operating conditions", "Q_g,a",
       "={Qg}*10^6/86400*(14.7/{pa})*({TR}/520)*{Z}", "ft³/s")
sp.add("Qga2", "Actual gas flow (vendor enquiry)", "Q_g,a2",
       "={Qg}*10^6/24*(14.7/{pa})*({TR}/520)*{Z}", "ft³/s",
       planted=("unit-scale", "per hour where per second belongs: 3600 too large"))
sp.heading("Gas capacity and liquid retention")
sp.add("ro", "Oil density", "rho_o", "={SGo}*62.4", "lb/ft³")
sp.add("rw", "Produced water density", "rho_w", "={SGw}*62.4", "lb/ft³")
sp.add("K", "Souders-Brown factor (horizontal, mesh pad)", "K", 0.5, "ft/s")
sp.add("Vmax", "Allowable gas velocity", "V_max", "={K}*SQRT(({ro}-{rg})/{rg})", "ft/s")
sp.add("Ag", "Gas flow area required", "A_g", "={Qga}/{Vmax}", "ft²")
sp.add("tro", "Oil retention time", "t_ro", 10, "min")
sp.add("trw", "Water retention time", "t_rw", 10, "min")
sp.add("Vl", "Liquid volume held", "V_l", "=({Qo}*{tro}+{Qw}*{trw})/1440*5.615", "ft³")
sp.add("Vl2", "Liquid volume held (rev. A)", "V_l2", "=({Qo}*{tro}+{Qw}*{trw})/24*5.615", "ft³",
       planted=("unit-scale", "minutes over 24 h/d where 1440 min/d belongs: 60 too large"))
sp.add("Leff", "Effective length (seam to seam less inlet and outlet)", "L_eff", 20, "ft")
sp.add("fill", "Liquid share of the cross-section", "φ", 50, "%")
sp.add("dv", "Vessel inside diameter for retention", "d", "=SQRT(4*{Vl}/(PI()*{Leff}*{fill}/100))",
       "ft")
sp.add("din", "Vessel inside diameter, in", "d_in", "={dv}*12", "in")
sp.add("dmm", "Vessel inside diameter, mm", "d_mm", "={din}*25.4", "mm")
sp.add("dmm2", "Vessel inside diameter, mm (fabricator)", "d_mm2", "={din}/25.4", "mm",
       planted=("unit-scale", "in to mm divided by 25.4: wrong way round"))
sp.add("Agav", "Gas flow area above the liquid", "A_g,av", "=PI()/4*{dv}^2*(1-{fill}/100)", "ft²")
sp.add("gchk", "Gas capacity check", "check", "=IF({Agav}>={Ag},\"OK\",\"GAS LIMITED\")")
sp.heading("Water droplet settling out of the oil pad (Stokes)")
sp.add("ddr", "Water droplet diameter to remove", "d_m", 500, "µm")
sp.add("mu", "Oil viscosity at operating temperature", "μ_o", 10, "cP")
sp.add("roSI", "Oil density, kg/m³", "rho_o,SI", "={ro}*16.02", "kg/m³")
sp.add("rwSI", "Produced water density, kg/m³", "rho_w,SI", "={rw}*16.02", "kg/m³")
sp.add("vt", "Settling velocity of water droplets in oil", "v_t",
       "=9.81*({ddr}/10^6)^2*({rwSI}-{roSI})/(18*{mu}/1000)", "m/s")
sp.add("vt2", "Settling velocity (first draft)", "v_t2",
       "=9.81*({ddr}/10^6)^2*({rwSI}-{roSI})/(18*{mu})", "m/s",
       planted=("unit-scale", "viscosity in cP used as Pa·s: 1000 too small"))
sp.add("vtin", "Settling velocity, in/min", "v_t,US", "={vt}*39.37*60", "in/min")
sp.add("ho", "Largest oil pad the retention time clears", "h_o", "={tro}*60*{vt}*1000", "mm")
SEP = sp.finish()

WELLS = {
    "A1": "Kestrel Ridge: well tests feeding V-110 (invented readings)",
    "A2": ("Sources: as the Separator sheet; GOR = gas rate / oil rate in scf/bbl (1 MMscf = "
           "10^6 scf); water cut = water / (oil + water) (common practice)."),
    "A3": CAUTION,
    "A4": "Well", "B4": "Oil [bbl/d]", "C4": "Water [bbl/d]", "D4": "Gas [MMscfd]",
    "E4": "GOR [scf/bbl]", "F4": "Water cut [%]",
    "A9": "Total", "B9": "=SUM(B5:B8)", "C9": "=SUM(C5:C8)", "D9": "=SUM(D5:D8)",
}
for r, (w, o, wa, g) in enumerate([("KR-3", 2400, 650, 1.9), ("KR-5", 1850, 1200, 1.6),
                                   ("KR-7", 3100, 400, 2.8), ("KR-9", 950, 1500, 0.7)], start=5):
    WELLS[f"A{r}"], WELLS[f"B{r}"], WELLS[f"C{r}"], WELLS[f"D{r}"] = w, o, wa, g
    WELLS[f"E{r}"] = f"=D{r}*10^6/B{r}"
    WELLS[f"F{r}"] = f"=C{r}/(B{r}+C{r})*100"
WELLS["E7"] = "=D7*1000/B7"           # planted: MMscf taken as Mscf

SEPB = {
    "trade": "oil and gas: three-phase production separator",
    "sheets": [("Separator", SEP), ("Wells", WELLS)],
    "planted": {**sp.planted,
                "Wells!E7": ("unit-scale", "MMscfd × 1000 where × 10^6 belongs (Mscf for MMscf): "
                             "1000 too small")},
}

# --------------------------------------------------------------------------------------------
# Book 4: belt dryer (t/h and kg/h, % wet and dry basis, kJ/kg, kW, °C, °F and K, m³/h and cfm,
# Nm³/h, MJ/Nm³, kPa, m² and m)
# --------------------------------------------------------------------------------------------
DRY_SRC = (
    "Sources: wet basis w = water/total, dry basis X = water/dry solids = w/(1 − w); evaporation "
    "= dry solids × (X_1 − X_2), Perry's Chemical Engineers' Handbook 8th ed. (2008) sec. 12 (from "
    "memory); latent heat of water 2380 kJ/kg near 50 °C (steam tables, 2382 kJ/kg, from "
    "memory); c_p of water 4.19 kJ/(kg·K), humid air 1.02 kJ/(kg·K) (common practice); air "
    "density p/(R·T), R = 287 J/(kg·K), 101.325 kPa (ISO 2533, common practice); natural gas LHV "
    "34.0 MJ/Nm³ (from memory, check the supplier's figure); 1 kWh = 3.6 MJ (SI Brochure 9th "
    "ed.); fan power = V·Δp/η (common practice); NIST SP 811 (2008) App. B.8: 1 m³/h = 0.5886 "
    "cfm, 1 m = 3.281 ft, °F = 1.8·°C + 32. Product data in the Products sheet invented. Plant "
    "and site invented.")
dr = ItemSheet("Dryer", "Marsh End Foods (invented): three-zone belt dryer BD-2, vegetable dice",
               DRY_SRC)
dr.heading("Product and mass balance")
dr.add("prod", "Product", "product", "Carrot dice")
dr.add("F", "Wet feed rate", "F", 1.0, "t/h")
dr.add("w1", "Feed moisture, wet basis", "w_1", 85, "%")
dr.add("w2", "Product moisture, wet basis", "w_2", 6, "%")
dr.add("ms", "Dry solids rate", "m_s", "={F}*(1-{w1}/100)", "t/h")
dr.add("msk", "Dry solids rate, kg/h", "m_s,kg", "={ms}*1000", "kg/h")
dr.add("X1", "Feed moisture, dry basis", "X_1", "={w1}/(100-{w1})*100", "%")
dr.add("X1b", "Feed moisture, dry basis (lab sheet)", "X_1b", "={w1}/(100-{w1})", "%",
       planted=("unit-scale", "a fraction written in a % cell: 100 too small"))
dr.add("X2", "Product moisture, dry basis", "X_2", "={w2}/(100-{w2})*100", "%")
dr.add("E", "Evaporation", "E", "={msk}*({X1}-{X2})/100", "kg/h")
dr.add("Pk", "Product rate", "P", "={msk}/(1-{w2}/100)", "kg/h")
dr.add("Ec", "Evaporation by difference (check)", "E_c", "={F}*1000-{Pk}", "kg/h")
dr.add("Ec2", "Evaporation by difference (shift report)", "E_c2", "={F}-{Pk}", "kg/h",
       planted=("unit-scale", "feed in t/h less product in kg/h"))
dr.heading("Heat load")
dr.add("hfg", "Latent heat of evaporation (near 50 °C)", "h_fg", 2380, "kJ/kg")
dr.add("Qev", "Evaporation heat", "Q_ev", "={E}*{hfg}/3600", "kW")
dr.add("Qev2", "Evaporation heat (first draft)", "Q_ev2", "={E}*{hfg}", "kW",
       planted=("unit-scale", "kg/h used as kg/s: 3600 too large"))
dr.add("cps", "Specific heat of the dry solids", "c_p,s", "=VLOOKUP({prod},Products!A5:D8,4,FALSE)",
       "kJ/(kg·K)")
dr.add("tf", "Feed temperature", "t_f", 15, "°C")
dr.add("tp", "Product temperature leaving", "t_p", 45, "°C")
dr.add("Qs", "Sensible heat to solids and retained water", "Q_s",
       "=({msk}*{cps}+{Pk}*{w2}/100*4.19)*({tp}-{tf})/3600", "kW")
dr.add("loss", "Shell and belt losses (share of useful heat)", "r_loss", 8, "%")
dr.add("Qd", "Dryer heat load", "Q_d", "=({Qev}+{Qs})*(1+{loss}/100)", "kW")
dr.heading("Drying air")
dr.add("tin", "Air inlet temperature (product limit)", "t_in",
       "=VLOOKUP({prod},Products!A5:D8,2,FALSE)", "°C")
dr.add("tinF", "Air inlet temperature, °F", "t_in,F", "={tin}*1.8+32", "°F")
dr.add("tinK", "Air inlet temperature, K", "T_in", "={tin}+273.15", "K")
dr.add("tinK2", "Air inlet temperature, K (psychrometric program)", "T_in2", "={tin}", "K",
       planted=("offset-scale", "°C reading set equal to K"))
dr.add("tout", "Exhaust air temperature", "t_out", 50, "°C")
dr.add("tamb", "Ambient air temperature", "t_amb", 15, "°C")
dr.add("cpa", "Specific heat of humid air", "c_p,a", 1.02, "kJ/(kg·K)")
dr.add("ma", "Air mass flow", "m_a", "={Qd}/({cpa}*({tin}-{tout}))", "kg/s")
dr.add("ra", "Air density at inlet", "rho_a", "=101.325*1000/(287*({tin}+273.15))", "kg/m³")
dr.add("ra2", "Air density at inlet (first draft)", "rho_a2", "=101.325*1000/(287*{tin})",
       "kg/m³", planted=("offset-scale", "°C reading in the gas law where K belongs"))
dr.add("Va", "Air volume flow at inlet", "V_a", "={ma}/{ra}*3600", "m³/h")
dr.add("cfm", "Air volume flow at inlet, cfm", "V_a,US", "={Va}*0.5886", "cfm")
dr.add("cfm2", "Air volume flow, cfm (fan enquiry)", "V_a,US2", "={Va}*35.31", "cfm",
       planted=("unit-scale", "m³/h × 35.31 gives ft³/h, written as cfm: 60 too large"))
dr.add("dx", "Moisture pick-up of the air", "Δx", "={E}/({ma}*3600)*1000", "g/kg")
dr.heading("Burner and fan")
dr.add("Qh", "Air heater duty (once-through, from ambient)", "Q_h",
       "={ma}*{cpa}*({tin}-{tamb})", "kW")
dr.add("etab", "Burner efficiency (direct-fired, LHV)", "eta_b", 92, "%")
dr.add("Qb", "Burner firing rate", "Q_b", "={Qh}/({etab}/100)", "kW")
dr.add("LHV", "Natural gas lower heating value", "LHV", 34.0, "MJ/Nm³")
dr.add("Vgas", "Natural gas consumption", "V_gas", "={Qb}*3.6/{LHV}", "Nm³/h")
dr.add("Vgas2", "Natural gas consumption (gas supplier form)", "V_gas2", "={Qb}/3.6/{LHV}",
       "Nm³/h", planted=("unit-scale", "kW to MJ/h divided by 3.6: wrong way round"))
dr.add("SEC", "Specific energy per kg of water evaporated", "SEC", "={Qb}*3600/{E}", "kJ/kg")
dr.add("eff", "Dryer thermal efficiency (evaporation heat over firing)", "η_d",
       "={Qev}/{Qb}*100", "%")
dr.add("dpf", "Fan static pressure rise", "Δp_f", 1.8, "kPa")
dr.add("etaf", "Fan efficiency", "eta_f", 70, "%")
dr.add("Pf", "Fan shaft power", "P_f", "={Va}/3600*{dpf}/({etaf}/100)", "kW")
dr.add("PfW", "Fan shaft power, W (motor list)", "P_f,W", "={Pf}*1000", "W")
dr.add("Pt", "Energy input, firing plus fan", "P_t", "={Qb}+{Pf}", "kW")
dr.add("Pt2", "Energy input (energy audit sheet)", "P_t2", "={Qb}+{PfW}", "kW",
       planted=("unit-scale", "fan power in W added to firing in kW"))
dr.heading("Belt")
dr.add("spec", "Specific evaporation rate for the product", "e_s",
       "=VLOOKUP({prod},Products!A5:D8,3,FALSE)", "kg/(m²·h)")
dr.add("Ab", "Belt area required", "A_b", "={E}/{spec}", "m²")
dr.add("Wb", "Belt width", "W_b", 2.5, "m")
dr.add("Lb", "Belt length", "L_b", "={Ab}/{Wb}", "m")
dr.add("Lbft", "Belt length, ft", "L_b,ft", "={Lb}*3.281", "ft")
DRYER = dr.finish()

Dr = dr.ref
ZONES = {
    "A1": "BD-2: heat put into the air, zone by zone (invented commissioning readings)",
    "A2": ("Sources: as the Dryer sheet; heat = V·ρ·c_p·(t − t_amb), ρ = p/(R·T) with p = 101.325 "
           "kPa, R = 287 J/(kg·K) (common practice)."),
    "A3": CAUTION,
    "A4": "Zone", "B4": "Air temperature [°C]", "C4": "Air flow [m³/h]", "D4": "Heat [kW]",
    "A8": "Total", "C8": "=SUM(C5:C7)", "D8": "=SUM(D5:D7)",
}
for r, (z, t, q) in enumerate([("Zone 1", 100, 18000), ("Zone 2", 90, 16000),
                               ("Zone 3", 70, 12000)], start=5):
    ZONES[f"A{r}"], ZONES[f"B{r}"], ZONES[f"C{r}"] = z, t, q
    ZONES[f"D{r}"] = (f"=C{r}/3600*101.325*1000/(287*(B{r}+273.15))*{Dr('cpa')}"
                      f"*(B{r}-{Dr('tamb')})")
ZONES["D7"] = (f"=C7/3600*101.325*1000/(287*(B7+273.15))*{Dr('cpa')}*(B7-{Dr('tamb')})"
               "*1000")                       # planted: W in the kW column

PRODUCTS = {
    "A1": ("Belt drying data by product (invented stand-ins for pilot trials; dry-solids c_p "
           "from memory, common practice)"),
    "A4": "Product", "B4": "Max. air inlet [°C]", "C4": "Specific evaporation [kg/(m²·h)]",
    "D4": "Dry-solids c_p [kJ/(kg·K)]",
}
for r, row in enumerate([("Onion flakes", 70, 8, 1.5), ("Carrot dice", 100, 14, 1.5),
                         ("Apple slices", 80, 10, 1.6), ("Pet food kibble", 130, 25, 1.7)],
                        start=5):
    for c, v in zip("ABCD", row):
        PRODUCTS[f"{c}{r}"] = v

DRYB = {
    "trade": "food processing: belt dryer heat and air balance",
    "sheets": [("Dryer", DRYER), ("Zones", ZONES), ("Products", PRODUCTS)],
    "planted": {**dr.planted,
                "Zones!D7": ("unit-scale", "heat × 1000 (W) in the kW column: 1000 too "
                             "large")},
}

BOOKS = {"glycol-chiller": BREW, "hydro-scheme": HYDB, "three-phase-separator": SEPB,
         "belt-dryer": DRYB}


EXTRA = {}
MISSED = {}
RENAMED = {}
MESSAGES = {}
HEADNOTE = {}
try:
    from review_notes import EXTRA, MISSED, RENAMED, MESSAGES, HEADNOTE  # noqa: F401,F811
except ImportError:
    pass


def main():
    write_books(HERE, BOOKS, {"EXTRA": EXTRA, "MISSED": MISSED, "RENAMED": RENAMED,
                              "MESSAGES": MESSAGES, "HEADNOTE": HEADNOTE})


if __name__ == "__main__":
    main()
