#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review44), written with the
standard library only (corpus/sheets/xlsx_writer.py and item_sheet.py, shared by the review
books), adapted like review43 and after its pattern (corpus/sheets/review43/make_books.py).

Trades: a dairy's HTST pasteurizer and its regeneration section; a wet-pipe fire sprinkler
system's hydraulic calc and fire pump; an elevated water storage tank and its booster pump; a
compressed-air plant (free air delivery, receiver, leak cost, after-cooler, dew point). All
scenarios, sites, firms, readings and catalogue data are invented (demonstration only); the
formulas and published factors are the trade's own, with their sources named in a text cell at
the top of each sheet ("from memory" where recalled and not checked, "common practice" for a
fact of the trade with no single source).

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
# Book 1: dairy HTST pasteurizer, regeneration and holding tube
# --------------------------------------------------------------------------------------------
HTST_SRC = (
    "Sources: HTST minimum 72 °C (161 °F) for 15 s, Grade \"A\" Pasteurized Milk Ordinance "
    "(2019 rev.) (from memory); whole milk cp 3.93 kJ/(kg·K), density 1030 kg/m³, viscosity "
    "about 0.8 mPa·s at 73 °C (from memory, Singh & Heldman, Introduction to Food Engineering "
    "5th ed. (2014) app. A); water cp 4.19 kJ/(kg·K) and 972 kg/m³ at 80 °C (from memory, "
    "Perry's 8th ed. table 2-30); 1 US gal = 3.785 L, 231 in³ exactly; 1 in = 0.0254 m; "
    "1 m = 3.281 ft; 1 m² = 10.76 ft²; 1 kW = 3412 Btu/h (NIST SP 811 (2008) App. B.8); "
    "regeneration % = (t_regen − t_raw)/(t_past − t_raw)·100 (common practice); fastest "
    "particle in turbulent tube flow about 1.2 × mean velocity (common practice, from memory); "
    "lethality F = t·10^((T − T_ref)/z) (Singh & Heldman ch. 5, from memory). Plant invented.")
hx = ItemSheet("HTST", "Holmfirth Vale creamery: HTST pasteurizer PHE-2, regeneration and "
               "holding tube (invented scenario)", HTST_SRC)
hx.add("Q", "Milk flow", "Q", 10000, "L/h")
hx.add("rho", "Milk density", "ρ", 1030, "kg/m³")
hx.add("cp", "Milk specific heat", "c_p", 3.93, "kJ/(kg·K)")
hx.add("t1", "Raw milk temperature from the silo", "t_raw", 4, "°C")
hx.add("tp", "Pasteurization temperature (set point)", "t_past", 73, "°C")
hx.add("R", "Regeneration", "R", 90, "%")
hx.add("th", "Hold time", "t_h", 15, "s")
hx.add("Qgpm", "Milk flow, US gpm", "Q_gpm", "={Q}/60/3.785", "gpm")
hx.add("Qgpm2", "Milk flow, US gpm (timing pump datasheet)", "Q_gpm2", "={Q}*3.785/60", "gpm",
       planted=("unit-scale", "L to US gal multiplied by 3.785: wrong way round, 14.3 too large"))
hx.add("Qm3h", "Milk flow, m³/h", "Q_m3h", "={Q}/1000", "m³/h")
hx.add("m", "Milk mass flow", "m", "={Q}*{rho}/1000/3600", "kg/s")
hx.add("m2", "Milk mass flow (rev. A)", "m_2", "={Q}*{rho}/1000/1000/3600", "kg/s",
       planted=("unit-scale", "/1000 written twice: 1000 too small"))
hx.add("mth", "Milk throughput", "m_t", "={Q}*{rho}/10^6", "t/h")
hx.add("tpF", "Pasteurization temperature, °F (PMO chart)", "t_past,F", "={tp}*1.8+32", "°F")
hx.add("tpF2", "Pasteurization temperature, °F (recorder setting sheet)", "t_past,F2",
       "={tp}*1.8", "°F", planted=("offset-scale", "°C to °F without the +32"))
hx.add("t2", "Milk temperature leaving regeneration", "t_reg",
       "={t1}+{R}/100*({tp}-{t1})", "°C")
hx.add("t2b", "Milk temperature leaving regeneration (first draft)", "t_reg2",
       "={t1}+{R}*({tp}-{t1})", "°C",
       planted=("unit-scale", "regeneration in % used as a fraction: 100 too large"))
hx.add("dTh", "Temperature rise in the heating section", "ΔT_h", "={tp}-{t2}", "K")
hx.add("Qreg", "Regeneration duty", "Φ_reg", "={m}*{cp}*({t2}-{t1})", "kW")
hx.add("Qh", "Heating section duty", "Φ_h", "={m}*{cp}*{dTh}", "kW")
hx.add("QhW", "Heating section duty, W (boiler enquiry)", "Φ_h,W", "={m}*{cp}*{dTh}", "W",
       planted=("unit-scale", "kJ/s written as W: 1000 too small"))
hx.add("QhBtu", "Heating section duty, Btu/h", "Φ_h,Btu", "={Qh}*3412", "Btu/h")
hx.add("thw", "Hot water supply temperature", "t_hw,in", 80, "°C")
hx.add("Vhw", "Hot water flow (circulating pump)", "V_hw", 40, "gpm")
hx.add("rhow", "Hot water density", "ρ_w", 972, "kg/m³")
hx.add("cpw", "Hot water specific heat", "c_p,w", 4.19, "kJ/(kg·K)")
hx.add("mhw", "Hot water mass flow", "m_hw", "={Vhw}*3.785/60/1000*{rhow}", "kg/s")
hx.add("thwo", "Hot water return temperature", "t_hw,out", "={thw}-{Qh}/({mhw}*{cpw})", "°C")
hx.add("dT1", "Temperature difference, hot end", "ΔT_1", "={thw}-{tp}", "K")
hx.add("dT2", "Temperature difference, cold end", "ΔT_2", "={thwo}-{t2}", "K")
hx.add("LMTD", "Log mean temperature difference, heating section", "ΔT_lm",
       "=({dT1}-{dT2})/LN({dT1}/{dT2})", "K")
hx.add("U", "Overall coefficient, heating section", "U_h", 3000, "W/(m²·K)")
hx.add("Ah", "Heating section plate area", "A_h", "={Qh}*1000/({U}*{LMTD})", "m²")
hx.add("Ah2", "Heating section plate area (hand check)", "A_h2", "={Qh}/({U}*{LMTD})", "m²",
       planted=("unit-scale", "kW over W/(m²·K): 1000 too small"))
hx.add("Ur", "Overall coefficient, regeneration section", "U_r", 2800, "W/(m²·K)")
hx.add("Areg", "Regeneration plate area (equal flows: constant temperature difference)", "A_r",
       "={Qreg}*1000/({Ur}*({tp}-{t2}))", "m²")
hx.add("Atot", "Plate area, heating and regeneration", "A", "={Ah}+{Areg}", "m²")
hx.add("Atotft", "Plate area, ft² (vendor quotation)", "A_ft", "={Atot}*10.76", "ft²")
hx.add("model", "Plate model", "model", "VP-40")
hx.add("Ap", "Area per plate", "A_p", "=VLOOKUP({model},Plates!A5:D8,2,FALSE)", "m²")
hx.add("Np", "Plates needed", "N_p", "=ROUNDUP({Atot}/{Ap},0)", "-")
hx.add("Qmax", "Frame rated flow", "Q_max", "=VLOOKUP({model},Plates!A5:D8,4,FALSE)", "m³/h")
hx.add("chk", "Frame flow check", "check", "=IF({Qm3h}<={Qmax},\"OK\",\"OVER\")")
hx.add("D", "Holding tube inside diameter (3 in sanitary, 0.083 in wall)", "D", 2.834, "in")
hx.add("k", "Fastest particle over mean velocity (turbulent)", "k", 1.2, "-")
hx.add("At", "Holding tube bore area", "A_t", "=PI()/4*({D}*0.0254)^2", "m²")
hx.add("v", "Mean velocity in the holding tube", "v", "={Q}/1000/3600/{At}", "m/s")
hx.add("L", "Holding tube length", "L", "={v}*{k}*{th}", "m")
hx.add("L2", "Holding tube length (first draft)", "L_2", "={Q}/1000/{At}*{k}*{th}", "m",
       planted=("unit-scale", "flow in m³/h times hold time in s: 3600 too large"))
hx.add("Lft", "Holding tube length, ft", "L_ft", "={L}*3.281", "ft")
hx.add("LftUS", "Holding tube length, ft (PMO worksheet form)", "L_ft2",
       "={Qgpm}*231*{k}*{th}/60/(PI()/4*{D}^2)/12", "ft")
hx.add("mu", "Milk viscosity at 73 °C", "μ", 0.8, "mPa·s")
hx.add("Re", "Reynolds number in the holding tube", "Re", "={rho}*{v}*{D}*0.0254/({mu}/1000)",
       "-")
hx.add("Re2", "Reynolds number (rev. A)", "Re_2", "={rho}*{v}*{D}*0.0254/{mu}", "-",
       planted=("unit-scale", "mPa·s used as Pa·s: 1000 too small"))
hx.add("tref", "Reference temperature for lethality", "T_ref", 72, "°C")
hx.add("z", "z-value (temperature change for a tenfold change in D)", "z", 5, "K")
hx.add("F", "Equivalent hold at the reference temperature", "F", "={th}*10^(({tp}-{tref})/{z})",
       "s")
hx.add("t2m", "Milk leaving regeneration, recorder reading", "t_reg,m", 65.8, "°C")
hx.add("Rm", "Regeneration, measured", "R_m", "=({t2m}-{t1})/({tp}-{t1})*100", "%")
hx.add("Rm2", "Regeneration, measured (operator's sheet)", "R_m2", "={t2m}/{tp}*100", "%",
       planted=("offset-scale", "ratio of two °C readings"))
hx.add("hop", "Operating hours", "h_op", 4500, "h/yr")
hx.add("Ereg", "Heat recovered by regeneration", "E_reg", "={Qreg}*{hop}/1000", "MWh/yr")
HTST = hx.finish()

PLATES = {
    "A1": "Plate heat exchanger frames and plates (invented catalogue data)",
    "A2": "Sources: invented vendor data; 1 US gpm = 0.2271 m³/h (NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A4": "Model", "B4": "Area per plate [m²]", "C4": "Frame rated flow [gpm]",
    "D4": "Frame rated flow [m³/h]",
}
for r, (mo, a, g) in enumerate([("VP-20", 0.20, 45), ("VP-30", 0.30, 70), ("VP-40", 0.40, 110),
                                ("VP-60", 0.60, 180)], start=5):
    PLATES[f"A{r}"], PLATES[f"B{r}"], PLATES[f"C{r}"] = mo, a, g
    PLATES[f"D{r}"] = f"=C{r}*0.2271"

DAIRY = {
    "trade": "dairy: HTST pasteurizer, regeneration section and holding tube",
    "sheets": [("HTST", HTST), ("Plates", PLATES)],
    "planted": dict(hx.planted),
}

# --------------------------------------------------------------------------------------------
# Book 2: fire sprinkler system hydraulic calc and fire pump
# --------------------------------------------------------------------------------------------
SPK_SRC = (
    "Sources: ordinary hazard group 2, 0.20 gpm/ft² over 1500 ft², hose allowance 250 gpm, "
    "60 min, NFPA 13 (2019) ch. 19 (from memory); Hazen-Williams p = 4.52·Q^1.85/(C^1.85·d^4.87) "
    "psi/ft with Q in gpm and d in inches, NFPA 13 (2019) sec. 28.2.2.1 (from memory), C = 120 "
    "for black steel wet pipe (from memory); q = K·√p; 0.433 psi/ft of water "
    "(common practice); 1 bar = 14.50 psi, 1 psi = 6.895 kPa, 1 gal = 3.785 L, 1 gpm = 0.2271 "
    "m³/h, 1 hp = 0.7457 kW (NIST SP 811 (2008) App. B.8); 1 gpm/ft² = 40.75 mm/min and K 1 "
    "gpm/psi^0.5 = 14.41 L/(min·bar^0.5) (worked from NIST factors); water hp = gpm·psi/1714 "
    "(common practice); schedule 40 inside diameters 1.049, 1.380, 1.610, 3.068 in, ASME "
    "B36.10M (from memory). Building and pump invented.")
sp = ItemSheet("Calc", "Carrow Street distribution warehouse: wet-pipe sprinkler hydraulic calc, "
               "remote area 1 (invented scenario)", SPK_SRC)
sp.add("dens", "Design density", "δ", 0.20, "gpm/ft²")
sp.add("Aop", "Design area of operation", "A_op", 1500, "ft²")
sp.add("As", "Coverage per sprinkler", "A_s", 130, "ft²")
sp.add("K", "Sprinkler K-factor", "K", 5.6, "gpm/psi^0.5")
sp.add("pmin", "Minimum end sprinkler pressure", "p_min", 7, "psi")
sp.add("qmin", "Minimum flow at the end sprinkler", "q_min", "={dens}*{As}", "gpm")
sp.add("pend", "End sprinkler pressure", "p_end", "=MAX({pmin},({qmin}/{K})^2)", "psi")
sp.add("densm", "Design density, mm/min (EN reviewer)", "δ_m", "={dens}*40.75", "mm/min")
sp.add("densm2", "Design density, mm/min (rev. A)", "δ_m2", "={dens}*3.785/10.76", "mm/min",
       planted=("unit-scale", "ft² to m² factor the wrong way round: 116 too small"))
sp.add("Km", "K-factor, metric", "K_m", "={K}*14.41", "L/(min·bar^0.5)")
sp.add("pendbar", "End sprinkler pressure, bar", "p_end,bar", "={pend}/14.50", "bar")
sp.add("qendm", "End sprinkler flow, L/min", "q_end,m", "={Km}*SQRT({pendbar})", "L/min")
sp.add("qendm2", "End sprinkler flow, L/min (first draft)", "q_end,m2", "={Km}*SQRT({pend})",
       "L/min", planted=("unit-scale", "psi under the root where bar belongs: 3.81 too large"))
sp.add("Qbr", "Branch line flow (three sprinklers)", "Q_br", "=Branch!D7", "gpm")
sp.add("pbr", "Pressure at the branch line inlet", "p_br", "=Branch!B8", "psi")
sp.add("nbr", "Branch lines flowing (taken as balanced, simplified)", "n_br", 4, "-")
sp.add("Qsys", "Sprinkler demand", "Q_s", "={Qbr}*{nbr}", "gpm")
sp.add("dchk", "Density check over the design area", "check",
       "=IF({Qsys}>={dens}*{Aop},\"OK\",\"LOW\")")
sp.add("dcm", "Cross main and riser inside diameter (3 in sch 40)", "d_cm", 3.068, "in")
sp.add("Ccm", "Hazen-Williams C", "C", 120, "-")
sp.add("Lcm", "Cross main and riser, length with fittings", "L_cm", 160, "ft")
sp.add("pfcm", "Friction loss per foot, cross main", "p_f",
       "=4.52*{Qsys}^1.85/({Ccm}^1.85*{dcm}^4.87)", "psi/ft")
sp.add("dpcm", "Friction loss, cross main and riser", "Δp_cm", "={pfcm}*{Lcm}", "psi")
sp.add("h", "Highest sprinkler above the pump discharge gauge", "h", 28, "ft")
sp.add("pe", "Elevation loss (static head difference)", "Δp_e", "=0.433*{h}", "psi")
sp.add("pe2", "Elevation loss (rev. A)", "Δp_e2", "={h}/0.433", "psi",
       planted=("unit-scale", "ft divided by 0.433 psi/ft: wrong way round"))
sp.add("preq", "Pressure required at the pump discharge", "p_req", "={pbr}+{dpcm}+{pe}", "psi")
sp.add("preqkPa", "Pressure required, kPa", "p_req,kPa", "={preq}*6.895", "kPa")
sp.add("preqkPa2", "Pressure required, kPa (rev. A)", "p_req,kPa2", "={preq}*6.895/1000",
       "kPa", planted=("unit-scale", "a /1000 too many: gives MPa, 1000 too small"))
sp.add("Qhose", "Hose stream allowance", "Q_hose", 250, "gpm")
sp.add("Qp", "Fire pump rated flow", "Q_p", 750, "gpm")
sp.add("pp", "Fire pump rated net pressure (boost)", "Δp_p", 100, "psi")
sp.add("ps", "City main residual pressure at the pump suction", "p_s", 35, "psig")
sp.add("patm", "Atmosphere", "p_atm", 14.7, "psia")
sp.add("pd", "Pump discharge pressure at rated flow", "p_d", "={ps}+{pp}", "psig")
sp.add("mg", "Pressure margin at rated flow", "Δp_m", "={pd}-{preq}", "psi")
sp.add("psa", "Pump suction pressure, absolute", "p_s,a", "={ps}+{patm}", "psia")
sp.add("mg2", "Pressure margin at rated flow (rev. A)", "Δp_m2", "={psa}+{pp}-{preq}", "psi",
       planted=("offset-scale", "absolute suction pressure beside gauge required pressure"))
sp.add("whp", "Water horsepower at rated point", "P_w", "={Qp}*{pp}/1714", "hp")
sp.add("eff", "Pump efficiency at rated point", "η", 72, "%")
sp.add("bhp", "Brake horsepower at rated point", "P_b", "={whp}/({eff}/100)", "hp")
sp.add("bhp2", "Brake horsepower (rev. A)", "P_b2", "={whp}/{eff}", "hp",
       planted=("unit-scale", "efficiency in % used as a fraction: 100 too small"))
sp.add("kW", "Brake power, kW", "P_kW", "={bhp}*0.7457", "kW")
sp.add("kW2", "Brake power, kW (motor list)", "P_kW2", "={bhp}*745.7", "kW",
       planted=("unit-scale", "hp to W written as kW: 1000 too large"))
sp.add("tdur", "Water supply duration", "t_d", 60, "min")
sp.add("Vgal", "Water supply volume (sprinklers and hose)", "V", "=({Qsys}+{Qhose})*{tdur}", "US gal")
sp.add("Vm3", "Water supply volume, m³ (tank)", "V_m3", "={Vgal}*3.785/1000", "m³")
sp.add("Vm32", "Water supply volume, m³ (tank, rev. A)", "V_m3,2", "={Vgal}*3.785", "m³",
       planted=("unit-scale", "gal to L, /1000 to m³ missing: 1000 too large"))
CALC = sp.finish()

KREF = sp.ref("K")
BRANCH = {
    "A1": "Remote branch line BL-7: node by node (invented layout)",
    "A2": ("Sources: as the Calc sheet; q = K·√p at each sprinkler, Hazen-Williams psi/ft with "
           "gpm and inches (NFPA 13 (2019) sec. 28.2.2.1, from memory); lengths include fitting "
           "equivalents."),
    "A3": CAUTION,
    "A4": "Node", "B4": "Pressure [psi]", "C4": "Sprinkler flow [gpm]", "D4": "Pipe flow [gpm]",
    "E4": "Pipe ID [in]", "F4": "C [-]", "G4": "Length [ft]", "H4": "Friction loss [psi/ft]",
    "I4": "Friction loss [psi]",
    "A8": "Branch line inlet", "B8": "=B7+I7",
    "B5": f"={sp.ref('pend')}",
}
for r, (node, d, L) in enumerate([("S1 (end)", 1.049, 10), ("S2", 1.380, 10), ("S3", 1.610, 14)],
                                 start=5):
    BRANCH[f"A{r}"], BRANCH[f"E{r}"], BRANCH[f"F{r}"], BRANCH[f"G{r}"] = node, d, 120, L
    if r > 5:
        BRANCH[f"B{r}"] = f"=B{r-1}+I{r-1}"
    BRANCH[f"C{r}"] = f"={KREF}*SQRT(B{r})"
    BRANCH[f"D{r}"] = "=C5" if r == 5 else f"=D{r-1}+C{r}"
    BRANCH[f"H{r}"] = f"=4.52*D{r}^1.85/(F{r}^1.85*E{r}^4.87)"
    BRANCH[f"I{r}"] = f"=H{r}*G{r}"
BRANCH["H7"] = "=4.52*D7^1.85/(F7^1.85*(E7*25.4)^4.87)"   # planted

SPRINK = {
    "trade": "fire protection: wet-pipe sprinkler hydraulic calc and fire pump",
    "sheets": [("Calc", CALC), ("Branch", BRANCH)],
    "planted": {**sp.planted,
                "Branch!H7": ("unit-scale", "pipe ID converted to mm in a formula that wants "
                              "inches: 25.4^4.87 too small")},
}

# --------------------------------------------------------------------------------------------
# Book 3: elevated water storage tank and booster pump
# --------------------------------------------------------------------------------------------
TANK_SRC = (
    "Sources: 1 m³ = 264.2 US gal, 1 US gal = 3.785 L, 1 L/s = 15.85 gpm, 1 psi = 6.895 kPa, "
    "1 bar = 100 kPa, 1 hp = 0.7457 kW (NIST SP 811 (2008) App. B.8); water column 9.81 kPa/m "
    "(ρ_w·g_n, common practice), 1.422 psi/m and 0.433 psi/ft (common practice); Hazen-Williams "
    "SI h_f = 10.67·L·Q^1.852/(C^1.852·D^4.87) with Q in m³/s and D, L in m (common practice, "
    "from memory); pump power P = ρ·g·Q·H/η and P[kW] = Q[m³/h]·H[m]/(367·η) (common practice); "
    "minimum service pressure 140 kPa (common practice; check the local code); NPSHa = "
    "(p_s,g + p_atm − p_v)/(ρ·g) (Hydraulic Institute, from memory); water vapour pressure and "
    "density, Perry's 8th ed. table 2-5 and 2-30 (from memory). Town and levels invented.")
tk = ItemSheet("Tank", "Kilbride Hill service tank (elevated, 1.2 ML) and Low Road booster station "
               "(invented scenario)", TANK_SRC)
tk.add("Qavg", "Average day demand", "Q_avg", 1800, "m³/d")
tk.add("PF", "Maximum day factor", "PF", 1.8, "-")
tk.add("D", "Tank inside diameter", "D", 14, "m")
tk.add("hw", "Operating depth, low to top water level", "h_w", 8, "m")
tk.add("zg", "Ground level at the tank", "z_g", 112, "m")
tk.add("hb", "Tank floor above ground", "h_b", 30, "m")
tk.add("zc", "Lowest customer ground level", "z_c", 88, "m")
tk.add("zh", "Highest customer ground level", "z_h", 118, "m")
tk.add("V", "Tank operating volume", "V", "=PI()/4*{D}^2*{hw}", "m³")
tk.add("Vgal", "Tank operating volume, US gal", "V_gal", "={V}*264.2", "US gal")
tk.add("Vgal2", "Tank operating volume, US gal (tender form)", "V_gal2", "={V}*1000*3.785",
       "US gal", planted=("unit-scale", "L to US gal multiplied by 3.785: wrong way round"))
tk.add("Qmax", "Maximum day demand", "Q_max", "={Qavg}*{PF}", "m³/d")
tk.add("Qmaxh", "Maximum day demand, hourly", "Q_max,h", "={Qmax}/24", "m³/h")
tk.add("QmaxLs", "Maximum day demand, L/s", "Q_max,s", "={Qmax}*1000/86400", "L/s")
tk.add("QmaxLs2", "Maximum day demand, L/s (rev. A)", "Q_max,s2", "={Qmax}/86400", "L/s",
       planted=("unit-scale", "m³ to L factor 1000 missing: 1000 too small"))
tk.add("tst", "Storage at the maximum day rate", "t_st", "={V}/{Qmaxh}", "h")
tk.add("zlw", "Low water level", "z_lw", "={zg}+{hb}", "m")
tk.add("ztw", "Top water level (overflow)", "z_tw", "={zlw}+{hw}", "m")
tk.add("Hmax", "Static head at the lowest customer, tank full", "H_max", "={ztw}-{zc}", "m")
tk.add("pmax", "Static pressure at the lowest customer", "p_max", "={Hmax}*9.81", "kPa")
tk.add("pmaxpsi", "Static pressure at the lowest customer, psi", "p_max,psi", "={Hmax}*1.422",
       "psi")
tk.add("pmaxpsi2", "Static pressure at the lowest customer, psi (rev. A)", "p_max,psi2",
       "={Hmax}*0.433", "psi",
       planted=("unit-scale", "psi per ft applied to metres: 3.281 too small"))
tk.add("pmaxbar", "Static pressure at the lowest customer, bar", "p_max,bar", "={pmax}/100",
       "bar")
tk.add("pmaxbar2", "Static pressure at the lowest customer, bar (valve schedule)", "p_max,bar2",
       "={Hmax}*9.81", "bar", planted=("unit-scale", "kPa written as bar: 100 too large"))
tk.add("Hmin", "Static head at the highest customer, tank at low water", "H_min",
       "={zlw}-{zh}", "m")
tk.add("pmin", "Static pressure at the highest customer", "p_min", "={Hmin}*9.81", "kPa")
tk.add("pminpsi", "Static pressure at the highest customer, psi", "p_min,psi", "={pmin}/6.895",
       "psi")
tk.add("pchk", "Minimum service pressure check (140 kPa)", "check",
       "=IF({pmin}>=140,\"OK\",\"LOW\")")
tk.add("Qp", "Booster pump duty flow", "Q_p", 180, "m³/h")
tk.add("Lm", "Rising main length", "L_m", 2400, "m")
tk.add("Dm", "Rising main inside diameter", "D_m", 0.300, "m")
tk.add("C", "Hazen-Williams C (cement-lined ductile iron)", "C", 120, "-")
tk.add("eta", "Pump and motor efficiency", "η", 78, "%")
tk.add("zs", "Ground reservoir water level at the booster", "z_s", 97, "m")
tk.add("Qps", "Booster pump duty flow, m³/s", "Q_p,s", "={Qp}/3600", "m³/s")
tk.add("hf", "Friction loss, rising main (Hazen-Williams)", "h_f",
       "=10.67*{Lm}*{Qps}^1.852/({C}^1.852*{Dm}^4.87)", "m")
tk.add("Hst", "Static lift, reservoir to top water level", "H_st", "={ztw}-{zs}", "m")
tk.add("Hp", "Pump head", "H_p", "={Hst}+{hf}", "m")
tk.add("P", "Pump input power", "P", "=9.81*{Qps}*{Hp}/({eta}/100)", "kW")
tk.add("P2", "Pump input power (rev. A)", "P_2", "=9.81*{Qp}*{Hp}/({eta}/100)", "kW",
       planted=("unit-scale", "flow in m³/h where m³/s belongs: 3600 too large"))
tk.add("Pb", "Pump input power (367 form)", "P_b", "={Qp}*{Hp}/(367*{eta}/100)", "kW")
tk.add("Pb2", "Pump input power (367 form, rev. A)", "P_b2", "={Qp}*{Hp}/(367*{eta})", "kW",
       planted=("unit-scale", "efficiency in % used as a fraction: 100 too small"))
tk.add("Php", "Pump input power, hp", "P_hp", "={P}/0.7457", "hp")
tk.add("tfill", "Fill time, low to top water, at average draw", "t_f",
       "={V}/({Qp}-{Qavg}/24)", "h")
tk.add("tfill2", "Fill time (rev. A)", "t_f2", "={V}/({Qp}-{Qavg})", "h",
       planted=("unit-scale", "m³/h less m³/d"))
tk.add("tfillm", "Fill time, min", "t_f,min", "={tfill}*60", "min")
tk.add("tfillm2", "Fill time, min (SCADA alarm)", "t_f,min2", "={tfill}/60", "min",
       planted=("unit-scale", "h to min divided by 60: wrong way round"))
tk.add("trun", "Pump running time per day at average demand", "t_run", "={Qavg}/{Qp}", "h/d")
tk.add("E", "Pump energy per day", "E", "={P}*{trun}", "kWh/d")
tk.add("e", "Specific energy", "e", "={E}/{Qavg}", "kWh/m³")
tk.add("tw", "Water temperature", "t_w", 20, "°C")
tk.add("patm", "Barometer at the booster (96 m)", "p_atm", 100.2, "kPa")
tk.add("psg", "Suction gauge reading", "p_s,g", 25, "kPa")
tk.add("pv", "Vapour pressure of water", "p_v", "=VLOOKUP({tw},Water!A5:D9,2,FALSE)", "kPa")
tk.add("rhow", "Density of water", "ρ", "=VLOOKUP({tw},Water!A5:D9,3,FALSE)", "kg/m³")
tk.add("NPSH", "NPSH available", "NPSH_a", "=({psg}+{patm}-{pv})*1000/({rhow}*9.81)", "m")
tk.add("NPSH2", "NPSH available (pump enquiry)", "NPSH_a2", "=({psg}-{pv})*1000/({rhow}*9.81)",
       "m", planted=("offset-scale", "suction gauge reading less an absolute vapour pressure"))
TANK = tk.finish()

WATER = {
    "A1": "Water: vapour pressure and density (from memory of Perry's 8th ed. tables 2-5, 2-30)",
    "A2": "Sources: as named; °F = °C·1.8 + 32 (NIST SP 811 (2008) App. B.9).",
    "A3": CAUTION,
    "A4": "Temperature [°C]", "B4": "Vapour pressure [kPa]", "C4": "Density [kg/m³]",
    "D4": "Temperature [°F]",
}
for r, (t, pv, rho) in enumerate([(10, 1.228, 999.7), (15, 1.705, 999.1), (20, 2.339, 998.2),
                                  (25, 3.169, 997.0), (30, 4.246, 995.7)], start=5):
    WATER[f"A{r}"], WATER[f"B{r}"], WATER[f"C{r}"] = t, pv, rho
    WATER[f"D{r}"] = f"=A{r}*1.8+32"

TANKB = {
    "trade": "water supply: elevated storage tank and booster pump",
    "sheets": [("Tank", TANK), ("Water", WATER)],
    "planted": dict(tk.planted),
}

# --------------------------------------------------------------------------------------------
# Book 4: compressed-air plant
# --------------------------------------------------------------------------------------------
AIR_SRC = (
    "Sources: free air delivery at intake conditions, ISO 1217:2009 (from memory); 1 m³ = 35.31 "
    "ft³, 1 m³ = 264.2 US gal, 1 kW = 3412 Btu/h, 1 bar = 100 kPa (NIST SP 811 (2008) App. "
    "B.8); normal state 0 °C, 101.325 kPa (DIN 1343); standard air for scfm here 60 °F "
    "(288.71 K, 519.67 °R), 14.696 psia (common practice; bases vary, state yours); air density "
    "1.293 kg/Nm³ (from memory); air cp 1.005 kJ/(kg·K), water cp 4.19 kJ/(kg·K) (common "
    "practice); receiver V = t·ΔQ·p_a/(p_1 − p_2) (Atlas Copco Compressed Air Manual 8th ed. "
    "(2015), from memory); leak % = T_on/(T_on + T_off)·100, US DOE Improving Compressed Air "
    "System Performance sourcebook 3rd ed. (2016) (from memory); Magnus fit 6.1094 hPa, 17.625, "
    "243.04 °C, Alduchov & Eskridge (1996) (from memory). Plant invented.")
ca = ItemSheet("Plant", "Dunmore Road packaging plant: compressed-air house, receiver, leaks, "
               "after-cooler and dew point (invented scenario)", AIR_SRC)
ca.add("FAD", "Free air delivery, all compressors", "FAD", "=Compressors!B8", "m³/min")
ca.add("acfm", "Free air delivery, ft³/min at intake", "FAD_cfm", "={FAD}*35.31", "ft³/min")
ca.add("ta", "Intake air temperature", "t_a", 30, "°C")
ca.add("pa", "Barometer (intake pressure)", "p_a", 100.5, "kPa")
ca.add("QN", "Flow at the normal state", "Q_N", "={FAD}*{pa}/101.325*273.15/({ta}+273.15)",
       "Nm³/min")
ca.add("scfm", "Flow at standard air (60 °F, 14.696 psia)", "Q_s",
       "={acfm}*{pa}/101.325*288.71/({ta}+273.15)", "scfm")
ca.add("taF", "Intake air temperature, °F", "t_a,F", "={ta}*1.8+32", "°F")
ca.add("scfm2", "Flow at standard air (US vendor form)", "Q_s2", "={acfm}*{pa}/101.325*520/{taF}",
       "scfm", planted=("offset-scale", "°F in a temperature ratio where °R belongs"))
ca.add("Qpk", "Peak demand (free air), bottling line start-up", "Q_pk", 52, "m³/min")
ca.add("tpk", "Duration of the peak", "t_pk", 2, "min")
ca.add("pu", "Compressor unload (cut-out) pressure", "p_u", 8.0, "barg")
ca.add("pl", "Lowest permissible pressure at the receiver", "p_l", 7.0, "barg")
ca.add("dQ", "Air deficit during the peak", "ΔQ", "={Qpk}-{FAD}", "m³/min")
ca.add("pab", "Barometer, bar", "p_a,bar", "={pa}/100", "bar")
ca.add("V", "Receiver volume needed", "V_r", "={tpk}*{dQ}*{pab}/({pu}-{pl})", "m³")
ca.add("pua", "Cut-out pressure, absolute", "p_u,a", "={pu}+{pab}", "bara")
ca.add("V2", "Receiver volume needed (rev. A)", "V_r2", "={tpk}*{dQ}*{pab}/({pua}-{pl})", "m³",
       planted=("offset-scale", "absolute cut-out pressure less a gauge pressure"))
ca.add("VL", "Receiver volume, litres (vessel register)", "V_L", "={V}*1000", "L")
ca.add("Ton", "Leak test: loaded time per cycle (no production)", "T_on", 18, "s")
ca.add("Toff", "Leak test: unloaded time per cycle", "T_off", 42, "s")
ca.add("leak", "Leakage share of the tested compressor's delivery", "L", "={Ton}/({Ton}+{Toff})*100",
       "%")
ca.add("Qlk", "Leakage", "Q_lk", "=Compressors!B5*{leak}/100", "m³/min")
ca.add("Qlk2", "Leakage (rev. A)", "Q_lk2", "=Compressors!B5*{leak}", "m³/min",
       planted=("unit-scale", "leakage in % used as a fraction: 100 too large"))
ca.add("Plk", "Compressor power spent on leakage", "P_lk", "={Qlk}*Compressors!E8", "kW")
ca.add("hyr", "Running hours", "h_yr", 6000, "h/yr")
ca.add("Elk", "Energy lost to leakage", "E_lk", "={Plk}*{hyr}", "kWh/yr")
ca.add("Elk2", "Energy lost to leakage (energy audit form)", "E_lk2", "={Plk}*{hyr}*3600",
       "kWh/yr", planted=("unit-scale", "hours turned into seconds: gives kJ/yr, 3600 too large"))
ca.add("price", "Electricity price", "c_e", 0.14, "$/kWh")
ca.add("cost", "Cost of leakage", "C_lk", "={Elk}*{price}", "$/yr")
ca.add("td", "Compressor discharge temperature (two-stage, oil-free)", "t_d", 170, "°C")
ca.add("tcw", "Cooling water inlet temperature", "t_cw", 25, "°C")
ca.add("app", "After-cooler approach (temperature difference, air out to water in)", "ΔT_app",
       10, "K")
ca.add("cpa", "Air specific heat", "c_p,a", 1.005, "kJ/(kg·K)")
ca.add("ma", "Air mass flow", "m_a", "={QN}*1.293/60", "kg/s")
ca.add("tout", "Air leaving the after-cooler", "t_out", "={tcw}+{app}", "°C")
ca.add("Qac", "After-cooler duty (sensible only; condensate adds its latent heat)", "Φ_ac",
       "={ma}*{cpa}*({td}-{tout})", "kW")
ca.add("QacBtu", "After-cooler duty, Btu/h", "Φ_ac,Btu", "={Qac}*3412", "Btu/h")
ca.add("QacBtu2", "After-cooler duty, Btu/h (US cooler datasheet)", "Φ_ac,Btu2", "={Qac}*3.412",
       "Btu/h", planted=("unit-scale", "Btu/h per W applied to kW: 1000 too small"))
ca.add("dTcw", "Cooling water temperature rise", "ΔT_cw", 8, "K")
ca.add("cpw", "Water specific heat", "c_p,w", 4.19, "kJ/(kg·K)")
ca.add("rhow", "Water density", "ρ_w", 997, "kg/m³")
ca.add("mcw", "Cooling water mass flow", "m_cw", "={Qac}/({cpw}*{dTcw})", "kg/s")
ca.add("Vcw", "Cooling water flow", "V_cw", "={mcw}/{rhow}*3600", "m³/h")
ca.add("pg", "Line pressure after the after-cooler", "p_g", 7.5, "barg")
ca.add("pabs", "Line pressure, absolute", "p_abs", "={pg}+{pab}", "bara")
ca.add("tpdp", "Pressure dew point (saturated at the after-cooler outlet)", "t_pdp", "={tout}",
       "°C")
ca.add("es", "Saturation vapour pressure at the pressure dew point", "e_s",
       "=6.1094*EXP(17.625*{tpdp}/({tpdp}+243.04))", "hPa")
ca.add("ea", "Vapour pressure once expanded to the atmosphere", "e_a", "={es}*{pab}/{pabs}",
       "hPa")
ca.add("ea2", "Vapour pressure once expanded (rev. A)", "e_a2", "={es}*{pab}/{pg}", "hPa",
       planted=("offset-scale", "gauge line pressure in a ratio where absolute belongs"))
ca.add("adp", "Atmospheric dew point", "t_adp", "=243.04*LN({ea}/6.1094)/(17.625-LN({ea}/6.1094))",
       "°C")
ca.add("adpK", "Atmospheric dew point, K (dryer software)", "T_adp", "={adp}+273.15", "K")
ca.add("adpK2", "Atmospheric dew point, K (rev. A)", "T_adp2", "={adp}", "K",
       planted=("offset-scale", "°C reading set equal to kelvin"))
PLANT = ca.finish()

COMP = {
    "A1": "Compressor house: compressors (invented nameplate data at 7.5 barg)",
    "A2": ("Sources: FAD to ISO 1217:2009 (from memory); 1 m³ = 35.31 ft³ (NIST SP 811 (2008) "
           "App. B.8); specific power = shaft input over FAD (common practice)."),
    "A3": CAUTION,
    "A4": "Compressor", "B4": "FAD [m³/min]", "C4": "FAD [ft³/min]", "D4": "Power [kW]",
    "E4": "Specific power [kW/(m³/min)]",
    "A8": "Total / mean", "B8": "=SUM(B5:B7)", "C8": "=SUM(C5:C7)", "D8": "=SUM(D5:D7)",
    "E8": "=D8/B8",
}
for r, (c, q, p) in enumerate([("K-1", 18.5, 110), ("K-2", 18.5, 110), ("K-3 (VSD)", 11.0, 75)],
                              start=5):
    COMP[f"A{r}"], COMP[f"B{r}"], COMP[f"D{r}"] = c, q, p
    COMP[f"C{r}"] = f"=B{r}*35.31"
    COMP[f"E{r}"] = f"=D{r}/B{r}"
COMP["E7"] = "=D7/C7"             # planted: per ft³/min in the per m³/min column

AIRB = {
    "trade": "compressed air: FAD, receiver, leakage cost, after-cooler and dew point",
    "sheets": [("Plant", PLANT), ("Compressors", COMP)],
    "planted": {**ca.planted,
                "Compressors!E7": ("unit-scale", "kW over ft³/min written as kW/(m³/min): "
                                   "35.31 too small")},
}

BOOKS = {"htst-pasteurizer": DAIRY, "sprinkler-hydraulics": SPRINK, "elevated-tank": TANKB,
         "compressed-air": AIRB}


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
