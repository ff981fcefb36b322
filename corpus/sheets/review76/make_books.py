#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review76), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; the layout
follows corpus/sheets/review64/make_books.py and review55.

Trades: an underground mine's compressed air network and receivers; a glasshouse's glycol
heating loop and boilers; a water tower filled by pumps at a hill site; a boiler house's natural
gas supply and metering. All scenarios, sites, firms, readings and maker's data are invented
(demonstration only); the formulas and published factors are the trade's own, with their sources
named in a text cell at the top of each sheet ("from memory" where recalled and not checked,
"common practice" for a fact of the trade with no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted slip (planted=(rule, what)) or a correct cell that must
stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and its
messages that mislead, are recorded in review_notes.py after running the round's build of the time
(plumb; count.py runs it).

Run: python3 make_books.py [--expect]  ->  *.xlsx (and *.expect) in this folder only
"""
import os
import sys

sys.dont_write_bytecode = True   # write nothing beside the shared modules
HERE = os.path.dirname(os.path.abspath(__file__))
SHARED = os.path.dirname(HERE)
sys.path.insert(0, SHARED)
from item_sheet import ItemSheet, write_books_with_notes  # noqa: E402 (shared, not copied)

CAUTION = ("Invented scenario, data for demonstration only. A dimensionally consistent formula can "
           "still be wrong; this check does not replace independent review under local codes and "
           "licensed practice.")
ItemSheet.caution = CAUTION

# --------------------------------------------------------------------------------------------
# Book 1: underground mine compressed air (m³/min, cfm, L/s, m³/s, bar(g), bar a, bar, psig,
# kPa, m, kg/m³, °C, K, J/(kg·K), Pa·s, mm, m², m/s, kW, W, hp, h/yr, kWh/yr, $/yr, m³, L,
# US gal, s, %)
# --------------------------------------------------------------------------------------------
MINE_SRC = (
    "Sources: 1 ft³ = 0.02832 m³, so 1 m³/min = 35.31 cfm; 1 m³ = 264.2 US gal; 1 bar = 14.50 "
    "psi; 1 hp = 0.7457 kW (NIST SP 811 (2008) App. B.8); g_n = 9.80665 m/s², typed 9.81, and "
    "T/K = t/°C + 273.15 (SI Brochure 9th ed.); R_air = 287.1 J/(kg·K), from R = 8.314 "
    "J/(mol·K) (CODATA 2018) over M = 28.96 g/mol (from memory); ρ = p/(R·T) (ideal gas, "
    "common practice); barometric rise down a shaft Δp ≈ ρ_air·g·Δz for a column of near-"
    "constant density (McPherson, Subsurface Ventilation Engineering, 2nd ed. (2009), from "
    "memory); free air delivery (FAD) is referred to the intake, the actual flow in the main "
    "is FAD·(p_in/p)·(T/T_in) (common practice); adiabatic compression power P = p_1·Q_1·"
    "k/(k−1)·[(p_2/p_1)^((k−1)/k) − 1]/η, k = 1.4 (Perry's Chemical Engineers' Handbook, 8th "
    "ed. (2008), from memory); receiver V = ΔQ·t·p_in/(p_1 − p_2) and leakage by pump-down "
    "Q_leak = V·(p_1 − p_2)/(p_in·t) (common practice); Darcy Δp = f·(L/D)·ρ·v²/2 and Re = "
    "ρ·v·D/μ (White, Fluid Mechanics, 7th ed. (2011)); μ of air 1.86e-5 Pa·s near 30 °C "
    "(from memory); leakage allowance 10 to 30 % of demand in a mine's air network (common "
    "practice, 20 % chosen). Mine, compressors, drills, maker's data and readings invented.")
mn = ItemSheet("Air", "Brackenfell Deep mine (invented): surface compressor house, shaft "
               "column and 840 m level ring main, receivers, winter design shift", MINE_SRC)
mn.heading("Supply and demand")
mn.add("Qc", "Compressor free air delivery, each (maker, invented)", "Q_c", 42, "m³/min")
mn.add("nc", "Compressors on line", "n_c", 3, "-")
mn.add("Qt", "Free air delivery, total", "Q_t", "={Qc}*{nc}", "m³/min")
mn.add("Qtcfm", "Free air delivery, total, cfm (US drill maker's tables)", "Q_t,US",
       "={Qt}*35.31", "cfm")
mn.add("Qtcfm2", "Free air delivery, total, cfm (first draft)", "Q_t,US2", "={Qt}/35.31", "cfm",
       planted=("unit-scale", "m³/min to cfm divided by 35.31: wrong way round"))
mn.add("Qts", "Free air delivery, total, m³/s", "Q_t,s", "={Qt}/60", "m³/s")
mn.add("Qtools", "Demand of the tools at the workings (Tools sheet)", "Q_tools",
       "=Tools!F10", "m³/min")
mn.add("lk", "Leakage allowance", "x_lk", 20, "%")
mn.add("Qdem", "Design demand with leakage", "Q_dem", "={Qtools}*(1+{lk}/100)", "m³/min")
mn.add("mrg", "Margin of supply over demand", "ΔQ", "={Qt}-{Qdem}", "m³/min")
mn.heading("Pressures")
mn.add("pg", "Compressor discharge pressure", "p_g", 7.0, "bar(g)")
mn.add("pgpsi", "Compressor discharge pressure, psig (US drill maker)", "p_g,US", "={pg}*14.5",
       "psig")
mn.add("pbs", "Barometer at the shaft collar (invented reading)", "p_in", 0.975, "bar a")
mn.add("p1", "Compressor discharge pressure, absolute", "p_1", "={pg}+{pbs}", "bar a")
mn.add("r", "Compression ratio", "r", "={p1}/{pbs}", "-")
mn.add("r2", "Compression ratio (first draft)", "r_2", "={pg}/{pbs}", "-",
       planted=("offset-scale", "a gauge discharge pressure over the absolute intake pressure"))
mn.add("dz", "Depth of the 840 level below the collar", "Δz", 840, "m")
mn.add("rhoa", "Density of the ventilating air in the shaft (invented, mean)", "ρ_a", 1.22,
       "kg/m³")
mn.add("dpb", "Barometric pressure rise down the shaft", "Δp_b", "={rhoa}*9.81*{dz}/100000",
       "bar")
mn.add("dpb2", "Barometric pressure rise down the shaft (first draft)", "Δp_b2",
       "={rhoa}*{dz}/100000", "bar", planted=("result-unit", "ρ·h with no g: not a pressure"))
mn.add("pbu", "Barometer on the 840 level", "p_b,u", "={pbs}+{dpb}", "bar a")
mn.add("pgu", "Ring main pressure at the workings (gauge reading, invented)", "p_g,u", 5.6,
       "bar(g)")
mn.add("pau", "Ring main pressure at the workings, absolute", "p_u", "={pgu}+{pbu}", "bar a")
mn.add("dpn", "Pressure loss, discharge to the workings (net of the column's gain)", "Δp_n",
       "={p1}-{pau}", "bar")
mn.add("dpn2", "Pressure loss, discharge to the workings (first draft)", "Δp_n2",
       "={pg}-{pau}", "bar",
       planted=("offset-scale", "a gauge discharge pressure less an absolute pressure"))
mn.heading("Compressor power")
mn.add("k", "Ratio of specific heats, air", "k", 1.4, "-")
mn.add("eta", "Overall efficiency, adiabatic to shaft (invented)", "η", 78, "%")
mn.add("Pad", "Compressor shaft power, total", "P_sh",
       "={pbs}*100*{Qts}*{k}/({k}-1)*({r}^(({k}-1)/{k})-1)/({eta}/100)", "kW")
mn.add("Php", "Compressor shaft power, hp", "P_sh,hp", "={Pad}/0.7457", "hp")
mn.add("etam", "Motor efficiency", "η_m", 95, "%")
mn.add("Pfan", "Aftercooler and dryer fans, total (maker, invented)", "P_fan", 7500, "W")
mn.add("Pel", "Electrical input, compressor house", "P_el", "={Pad}/({etam}/100)+{Pfan}/1000",
       "kW")
mn.add("Pel2", "Electrical input, compressor house (first draft)", "P_el2",
       "={Pad}/({etam}/100)+{Pfan}", "kW", planted=("unit-scale", "W added to kW"))
mn.add("sp", "Specific power", "SP", "={Pel}/{Qt}", "kW/(m³/min)")
mn.add("hrs", "Running hours", "t_op", 6000, "h/yr")
mn.add("Ey", "Energy per year", "E_y", "={Pel}*{hrs}", "kWh/yr")
mn.add("tar", "Electricity tariff (invented)", "c_e", 0.11, "$/kWh")
mn.add("Cy", "Energy cost per year", "C_y", "={Ey}*{tar}", "$/yr")
mn.heading("Air in the ring main")
mn.add("tin", "Intake air temperature at the collar", "t_in", 15, "°C")
mn.add("tl", "Air temperature in the ring main (invented reading)", "t_l", 28, "°C")
mn.add("Tin", "Intake air temperature, absolute", "T_in", "={tin}+273.15", "K")
mn.add("Tl", "Air temperature in the ring main, absolute", "T_l", "={tl}+273.15", "K")
mn.add("Ra", "Gas constant of air", "R_a", 287.1, "J/(kg·K)")
mn.add("rho", "Density of the compressed air at the workings", "ρ",
       "={pau}*100000/({Ra}*{Tl})", "kg/m³")
mn.add("rho2", "Density of the compressed air at the workings (first draft)", "ρ_2",
       "={pau}*100000/({Ra}*{tl})", "kg/m³",
       planted=("offset-scale", "a °C reading in the gas law: kelvins belong"))
mn.add("Qa", "Actual flow in the ring main", "Q_a", "={Qdem}/60*{pbs}/{pau}*{Tl}/{Tin}", "m³/s")
mn.add("D", "Ring main bore", "D", 200, "mm")
mn.add("A", "Ring main bore area", "A", "=PI()*({D}/1000)^2/4", "m²")
mn.add("v", "Air velocity in the ring main", "v", "={Qa}/{A}", "m/s")
mn.add("v2", "Air velocity in the ring main (first draft)", "v_2", "={Qa}/(PI()*{D}^2/4)", "m/s",
       planted=("unit-scale", "a bore in mm squared beside m³/s: 10⁶ too small"))
mn.add("mu", "Viscosity of air", "μ", 0.0000186, "Pa·s")
mn.add("Re", "Reynolds number", "Re", "={rho}*{v}*{D}/1000/{mu}", "-")
mn.add("f", "Darcy friction factor (Moody chart, invented reading)", "f", 0.018, "-")
mn.add("L", "Length, shaft column and ring main", "L", 3200, "m")
mn.add("dpf", "Friction loss, Darcy", "Δp_f", "={f}*{L}/({D}/1000)*{rho}*{v}^2/2/100000", "bar")
mn.heading("Receivers and leakage")
mn.add("dQ", "Surge of demand over supply at a face start (invented)", "ΔQ_s", 12, "m³/min")
mn.add("ts", "Duration of the surge", "t_s", 45, "s")
mn.add("pr1", "Receiver upper pressure", "p_r1", 6.2, "bar(g)")
mn.add("pr2", "Receiver lower pressure", "p_r2", 5.5, "bar(g)")
mn.add("Vr", "Receiver volume needed", "V_r", "={dQ}/60*{ts}*{pbs}/({pr1}-{pr2})", "m³")
mn.add("Vr2", "Receiver volume needed (first draft)", "V_r2", "={dQ}*{ts}*{pbs}/({pr1}-{pr2})",
       "m³", planted=("unit-scale", "m³/min times seconds: the /60 missing"))
mn.add("VrUS", "Receiver volume needed, US gal (US receiver maker)", "V_r,US", "={Vr}*264.2",
       "US gal")
mn.add("Vsys", "Volume of the receivers and main (pump-down test)", "V_sys", 38, "m³")
mn.add("pt1", "Pump-down test, start pressure (invented reading)", "p_t1", 6.0, "bar(g)")
mn.add("pt2", "Pump-down test, end pressure (invented reading)", "p_t2", 5.0, "bar(g)")
mn.add("tt", "Pump-down test, time (invented reading)", "t_t", 95, "s")
mn.add("Qlk", "Leakage, free air", "Q_lk", "={Vsys}*({pt1}-{pt2})/{pbs}/{tt}*60", "m³/min")
mn.add("slk", "Leakage, share of the free air delivery", "s_lk", "={Qlk}/{Qt}*100", "%")
mn.add("slk2", "Leakage, share of the free air delivery (first draft)", "s_lk2", "={Qlk}/{Qt}",
       "%", planted=("unit-scale", "a fraction written as %: 100 too small"))
mn.add("Clk", "Cost of the leakage per year", "C_lk", "={Cy}*{slk}/100", "$/yr")
MINES = mn.finish()

TOOLS = {
    "A1": "Brackenfell Deep, 840 level: air tools at the workings (invented makers' ratings and "
          "diversity)",
    "A2": "Sources: 1 ft³ = 0.02832 m³, so 1 m³/min = 35.31 cfm (NIST SP 811 (2008) App. B.8); "
          "demand = number × rating × diversity (common practice).",
    "A3": CAUTION,
    "A5": "Tool", "B5": "Number [-]", "C5": "Air each [cfm]", "D5": "Diversity [%]",
    "E5": "Demand [cfm]", "F5": "Demand [m³/min]",
    "A10": "Total", "E10": "=SUM(E6:E9)", "F10": "=SUM(F6:F9)",
}
for r, (tool, n, q, dv) in enumerate([("Jackleg rock drills", 14, 200, 60),
                                      ("Rocker shovel loaders", 6, 400, 50),
                                      ("Diaphragm pumps", 8, 100, 70),
                                      ("Rock bolters", 3, 250, 40)], start=6):
    TOOLS[f"A{r}"], TOOLS[f"B{r}"], TOOLS[f"C{r}"], TOOLS[f"D{r}"] = tool, n, q, dv
    TOOLS[f"E{r}"] = f"=B{r}*C{r}*D{r}/100"
    TOOLS[f"F{r}"] = f"=E{r}/35.31"
TOOLS["F8"] = "=E8*0.02832"
TOOLS["F9"] = "=E9*0.02832/60"
TOOLS_PLANTED = {"Tools!F9": ("unit-scale", "cfm to m³/min with a /60 that does not belong: "
                                             "the minute is on both sides")}

MINEB = {
    "trade": "mining: compressed air supply, shaft column, ring main, receivers and leakage",
    "sheets": [("Air", MINES), ("Tools", TOOLS)],
    "planted": {**mn.planted, **TOOLS_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 2: glasshouse glycol heating loop (ha, m², m³, W/(m²·K), °C, °F, K, Δ°F, 1/h, kW, MW,
# Btu/h, kg/L, kJ/(kg·K), kg/s, L/s, m³/h, gpm, mm, m/s, m, ft, kPa, psi, hp, bar(g), bar a,
# bar, L, K·d/yr, kW/K, kWh/yr, MJ/m³, m³/yr, kg CO2/kWh, t/yr, $/yr, %)
# --------------------------------------------------------------------------------------------
GH_SRC = (
    "Sources: 1 ha = 10 000 m², 1 kW = 3412 Btu/h, 1 L/s = 15.85 US gpm, 1 ft = 0.3048 m, "
    "1 psi = 6.895 kPa, 1 bar = 14.50 psi, 1 hp = 0.7457 kW (NIST SP 811 (2008) App. B.8); "
    "°F = 1.8·°C + 32, "
    "T/K = t/°C + 273.15, g_n = 9.81 m/s² (SI Brochure 9th ed.); covering loss Q = U·A_c·ΔT "
    "with U = 6.8 W/(m²·K) for single glass (Nelson, Greenhouse Operation and Management, 7th "
    "ed. (2012), from memory); air change loss 0.33·N·V·ΔT in W with V in m³ and N per hour, "
    "0.33 = ρ·c_p/3600 of air (CIBSE Guide A (2015), from memory); 30 % propylene glycol at "
    "70 °C: ρ = 1.03 kg/L, c_p = 3.85 kJ/(kg·K), expansion from 10 to 80 °C 3.4 % (ASHRAE "
    "Handbook, Fundamentals (2017), ch. 31, from memory; check the glycol maker's table); US "
    "check Btu/h = 500·gpm·ΔT(°F)·SG·(c_p/c_p,water) (ASHRAE, from memory, 500 = 8.33 lb/gal × "
    "60 min/h); pump P = ρ·g·Q·H/η, hp = gpm·ft·SG/(3960·η) and H = Δp/(ρ·g) (common "
    "practice); expansion "
    "vessel V = V_e/(1 − p_i/p_f) with absolute pressures (ASHRAE Handbook, HVAC Systems and "
    "Equipment (2020), ch. 13, from memory); safety valve 3.0 bar(g), working maximum 0.9 of "
    "it, fill 0.3 bar above the static head (common practice); annual heat = UA·DD·24 "
    "(CIBSE TM41 (2006), from memory); natural gas gross CV 39.5 MJ/m³ and 0.183 kg CO2/kWh "
    "gross (typical UK supply and reporting factor, from memory). Nursery, glasshouse, boilers "
    "and readings invented.")
gh = ItemSheet("Heat", "Saltmarsh Nurseries, Wrayholme (invented): 2.4 ha Venlo glasshouse, "
               "30 % propylene glycol heating loop, two gas-fired boilers, winter design",
               GH_SRC)
gh.heading("Glasshouse heat loss")
gh.add("ha", "Floor area", "A_f,ha", 2.4, "ha")
gh.add("Af", "Floor area, m²", "A_f", "={ha}*10000", "m²")
gh.add("Af2", "Floor area, m² (first draft)", "A_f2", "={ha}*1000", "m²",
       planted=("unit-scale", "ha to m² by 1000: 10 too small"))
gh.add("rc", "Covering to floor area ratio, Venlo (invented)", "r_c", 1.25, "-")
gh.add("Ac", "Covering area", "A_c", "={Af}*{rc}", "m²")
gh.add("U", "Heat transfer coefficient, single glass", "U", 6.8, "W/(m²·K)")
gh.add("ti", "Inside set point", "t_i", 18, "°C")
gh.add("to", "Outside design temperature (invented)", "t_o", -5, "°C")
gh.add("dT", "Inside to outside temperature difference", "ΔT", "={ti}-{to}", "K")
gh.add("tiF", "Inside set point, °F (US grower's guide)", "t_i,F", "={ti}*1.8+32", "°F")
gh.add("toF", "Outside design temperature, °F", "t_o,F", "={to}*1.8+32", "°F")
gh.add("dTF", "Inside to outside temperature difference, °F", "ΔT_F", "={dT}*1.8", "Δ°F")
gh.add("Qc", "Covering heat loss", "Q_c", "={U}*{Ac}*{dT}/1000", "kW")
gh.add("Qc2", "Covering heat loss (first draft)", "Q_c2", "={U}*{Ac}*{dT}", "kW",
       planted=("unit-scale", "W written as kW: the /1000 missing"))
gh.add("H", "Mean height of the glasshouse", "H", 6.5, "m")
gh.add("V", "Glasshouse air volume", "V", "={Af}*{H}", "m³")
gh.add("N", "Air change rate, closed vents (invented)", "N", 0.5, "1/h")
gh.add("Qi", "Air change heat loss", "Q_i", "=0.33*{N}*{V}*{dT}/1000", "kW")
gh.add("Q", "Design heat load", "Q", "={Qc}+{Qi}", "kW")
gh.add("QMW", "Design heat load, MW", "Q_MW", "={Q}/1000", "MW")
gh.add("QB", "Design heat load, Btu/h (US boiler maker)", "Q_US", "={Q}*3412", "Btu/h")
gh.add("QB2", "Design heat load, Btu/h (first draft)", "Q_US2", "={Q}/3412", "Btu/h",
       planted=("unit-scale", "kW to Btu/h divided by 3412: wrong way round"))
gh.heading("Glycol loop")
gh.add("tf", "Loop flow temperature", "t_f", 80, "°C")
gh.add("tr", "Loop return temperature", "t_r", 60, "°C")
gh.add("dTg", "Loop temperature drop", "ΔT_g", "={tf}-{tr}", "K")
gh.add("Tm", "Loop mean temperature, absolute (glycol maker's chart)", "T_m",
       "=({tf}+{tr})/2+273.15", "K")
gh.add("Tf2", "Loop flow temperature, absolute (first draft)", "T_f2", "={tf}", "K",
       planted=("offset-scale", "a °C reading set equal to kelvins"))
gh.add("rho", "Density of 30 % propylene glycol at 70 °C", "ρ_g", 1.03, "kg/L")
gh.add("cp", "Specific heat of 30 % propylene glycol", "c_p", 3.85, "kJ/(kg·K)")
gh.add("m", "Glycol mass flow", "ṁ", "={Q}/({cp}*{dTg})", "kg/s")
gh.add("VL", "Glycol volume flow", "V̇", "={m}/{rho}", "L/s")
gh.add("Vh", "Glycol volume flow, m³/h", "V̇_h", "={VL}*3.6", "m³/h")
gh.add("Vh2", "Glycol volume flow, m³/h (first draft)", "V̇_h2", "={VL}*3600", "m³/h",
       planted=("unit-scale", "L/s to m³/h by 3600: that gives L/h, 1000 too large"))
gh.add("gpm", "Glycol volume flow, US gpm", "V̇_US", "={VL}*15.85", "gpm")
gh.add("dTgF", "Loop temperature drop, °F", "ΔT_g,F", "={dTg}*1.8", "Δ°F")
gh.add("rhow", "Density of water at 15 °C", "ρ_w", 0.999, "kg/L")
gh.add("SG", "Specific gravity of the glycol", "SG", "={rho}/{rhow}", "-")
gh.add("cpr", "Specific heat ratio to water (4.19 kJ/(kg·K))", "c_p/c_p,w", "={cp}/4.19", "-")
gh.add("QUS", "Design heat load, Btu/h (US check, 500·gpm·ΔT)", "Q_US c",
       "=500*{gpm}*{dTgF}*{SG}*{cpr}", "Btu/h")
gh.add("D", "Main header bore", "D", 250, "mm")
gh.add("v", "Velocity in the main header", "v", "={VL}/1000/(PI()*({D}/1000)^2/4)", "m/s")
gh.add("Hp", "Loop pump head (index circuit, invented)", "H_p", 18, "m")
gh.add("etap", "Pump efficiency", "η_p", 72, "%")
gh.add("Pp", "Pump shaft power", "P_p", "={rho}*9.81*{VL}*{Hp}/({etap}/100)/1000", "kW")
gh.add("Pp2", "Pump shaft power (first draft)", "P_p2", "={rho}*9.81*{VL}*{Hp}/{etap}/1000",
       "kW", planted=("unit-scale", "a % used as a fraction: 100 too small"))
gh.add("Hft", "Loop pump head, ft", "H_ft", "={Hp}/0.3048", "ft")
gh.add("Php", "Pump shaft power, hp (US check)", "P_hp",
       "={gpm}*{Hft}*{SG}/(3960*{etap}/100)", "hp")
gh.add("dpp", "Pump differential pressure", "Δp_p", "={rho}*9.81*{Hp}", "kPa")
gh.add("Hchk", "Loop pump head from the measured differential (check)", "H_chk",
       "={dpp}/({rho}*9.81)", "m")
gh.add("dppsi", "Pump differential pressure, psi", "Δp_p,US", "={dpp}/6.895", "psi")
gh.heading("Pressurisation and expansion vessel")
gh.add("Vs", "System volume (pipes, boilers, heat exchangers; invented)", "V_s", 85, "m³")
gh.add("e", "Expansion of 30 % glycol, 10 to 80 °C", "e", 3.4, "%")
gh.add("Ve", "Expansion volume", "V_e", "={Vs}*{e}/100", "m³")
gh.add("hs", "Static height of the highest pipe above the vessel", "h_s", 7.5, "m")
gh.add("pst", "Static pressure at the vessel", "p_st", "={rho}*9.81*{hs}/100", "bar(g)")
gh.add("mg", "Fill margin above the static head", "Δp_fill", 0.3, "bar")
gh.add("pi", "Initial (fill) pressure", "p_i", "={pst}+{mg}", "bar(g)")
gh.add("psv", "Safety valve set pressure", "p_sv", 3.0, "bar(g)")
gh.add("pip", "Initial (fill) pressure, psig (US vessel maker)", "p_i,US", "={pi}*14.5", "psig")
gh.add("pip2", "Initial (fill) pressure, psig (first draft)", "p_i,US2", "={pi}*14.5+14.7",
       "psig", planted=("offset-scale", "the atmosphere added to a gauge reading that stays "
                                        "written as psig"))
gh.add("pf", "Final (working maximum) pressure", "p_f", "={psv}*0.9", "bar(g)")
gh.add("pb", "Site barometer (invented reading)", "p_b", 1.005, "bar a")
gh.add("Vv", "Expansion vessel volume", "V_v", "={Ve}/(1-({pi}+{pb})/({pf}+{pb}))", "m³")
gh.add("Vv2", "Expansion vessel volume (first draft)", "V_v2", "={Ve}/(1-{pi}/{pf})", "m³",
       planted=("offset-scale", "gauge pressures in the vessel's pressure ratio"))
gh.add("VvL", "Expansion vessel volume, L", "V_v,L", "={Vv}*1000", "L")
gh.heading("Boilers, gas and the year")
gh.add("etab", "Boiler efficiency, gross", "η_b", 88, "%")
gh.add("Pin", "Gas input at design", "P_in", "={Q}/({etab}/100)", "kW")
gh.add("CV", "Gross calorific value of the gas", "CV", 39.5, "MJ/m³")
gh.add("Vg", "Gas flow at design", "V̇_g", "={Pin}*3.6/{CV}", "m³/h")
gh.add("UA", "Heat loss coefficient of the glasshouse", "UA",
       "=({U}*{Ac}+0.33*{N}*{V})/1000", "kW/K")
gh.add("DD", "Degree days, base 18 °C (invented)", "DD", 3900, "K·d/yr")
gh.add("Ey", "Heat per year", "E_y", "={UA}*{DD}*24", "kWh/yr")
gh.add("Ey2", "Heat per year (first draft)", "E_y2", "={UA}*{DD}", "kWh/yr",
       planted=("unit-scale", "degree days times kW taken as kWh: the 24 h/d missing"))
gh.add("Egy", "Gas per year", "E_g", "={Ey}/({etab}/100)", "kWh/yr")
gh.add("Vgy", "Gas per year, volume", "V_g,y", "={Egy}*3.6/{CV}", "m³/yr")
gh.add("cf", "Emission factor, natural gas, gross", "e_CO2", 0.183, "kg CO2/kWh")
gh.add("CO2", "Carbon dioxide per year", "m_CO2", "={Egy}*{cf}/1000", "t/yr")
gh.add("CO22", "Carbon dioxide per year (first draft)", "m_CO2,2", "={Egy}*{cf}", "t/yr",
       planted=("unit-scale", "kg written as tonnes: the /1000 missing"))
gh.add("tar", "Gas tariff (invented)", "c_g", 0.045, "$/kWh")
gh.add("Cy", "Gas cost per year", "C_y", "={Egy}*{tar}", "$/yr")
GHS = gh.finish()

GHB = {
    "trade": "horticulture: glasshouse heat loss, glycol loop, expansion vessel and boilers",
    "sheets": [("Heat", GHS)],
    "planted": dict(gh.planted),
}

# --------------------------------------------------------------------------------------------
# Book 3: water tower on a hill (m, m³, US gal, ML, L/s, m³/h, m³/s, mm, m/s, kg/m³, kW, W,
# hp, gpm, ft, %, h, kWh, kWh/m³, kPa, kPa(g), psig, bar(g))
# --------------------------------------------------------------------------------------------
WT_SRC = (
    "Sources: 1 m³ = 264.2 US gal, 1 L/s = 15.85 US gpm, 1 ft = 0.3048 m, 1 psi = 6.895 kPa, "
    "1 hp = 0.7457 kW, 1 UK gal = 4.546 L so 1 L/s = 13.2 UK gpm (NIST SP 811 (2008) App. "
    "B.8); g_n = 9.81 m/s² (SI Brochure 9th ed.); tank volume π·D²/4·h (common practice); Hazen-Williams in SI h_f = 10.67·L·Q^1.852/"
    "(C^1.852·d^4.8704), Q in m³/s, d and L in m (Mays, Water Distribution Systems Handbook "
    "(2000), from memory); Darcy h_f = f·(L/d)·v²/(2g) and minor losses ΣK·v²/(2g) (White, "
    "Fluid Mechanics, 7th ed. (2011)); hydraulic power ρ·g·Q·H, P(kW) = Q(m³/h)·H(m)/367 and "
    "hp = gpm·ft/(3960·η) (common practice); water 0.433 psi per ft of head, 2.31 ft per psi "
    "(common practice); NPSHa = (p_b − p_v)/(ρ·g) + z_s − h_fs, or from a suction gauge "
    "(p_g + p_b − p_v)/(ρ·g) + v²/(2g) (ANSI/HI 9.6.1, from memory); ρ = 999.1 kg/m³ and "
    "p_v = 1.705 kPa for water at 15 °C (IAPWS, from memory); Joukowsky Δp = ρ·a·Δv, a = 1100 "
    "m/s for the ductile iron main (invented within the usual range). Water company, site, "
    "levels, maker's data and readings invented.")
wt = ItemSheet("Tower", "Carrick Hill service tower, Ellerby (invented): 600 m³ elevated tank "
               "on a 22 m shaft, filled from the valley booster station, design duty", WT_SRC)
wt.heading("Tower")
wt.add("Dt", "Tank internal diameter", "D_t", 12.0, "m")
wt.add("ht", "Tank working depth", "h_t", 5.3, "m")
wt.add("Vt", "Tank working volume", "V_t", "=PI()*{Dt}^2/4*{ht}", "m³")
wt.add("VtML", "Tank working volume, ML", "V_t,ML", "={Vt}/1000", "ML")
wt.add("VtUS", "Tank working volume, US gal (US tank fabricator)", "V_t,US", "={Vt}*264.2",
       "US gal")
wt.add("VtUS2", "Tank working volume, US gal (first draft)", "V_t,US2", "={Vt}/264.2",
       "US gal", planted=("unit-scale", "m³ to US gal divided by 264.2: wrong way round"))
wt.add("zg", "Ground level at the tower", "z_g", 212.0, "m")
wt.add("hsh", "Shaft height to the tank floor", "h_sh", 22.0, "m")
wt.add("BWL", "Bottom water level", "BWL", "={zg}+{hsh}", "m")
wt.add("TWL", "Top water level", "TWL", "={BWL}+{ht}", "m")
wt.heading("Pump and rising main")
wt.add("zp", "Sump water level at the booster station", "z_p", 78.5, "m")
wt.add("Hst", "Static lift, sump to top water level", "H_st", "={TWL}-{zp}", "m")
wt.add("Q", "Duty flow, one pump", "Q", 70, "L/s")
wt.add("Qh", "Duty flow, m³/h", "Q_h", "={Q}*3.6", "m³/h")
wt.add("Qs", "Duty flow, m³/s", "Q_s", "={Q}/1000", "m³/s")
wt.add("gpm", "Duty flow, US gpm", "Q_US", "={Q}*15.85", "gpm")
wt.add("gpm2", "Duty flow, US gpm (first draft)", "Q_US2", "={Q}*13.2", "gpm",
       planted=("unit-scale", "the imperial gallon's 13.2 gpm per L/s used for US gpm"))
wt.add("L", "Rising main length", "L", 3150, "m")
wt.add("d", "Rising main bore, DN300 ductile iron", "d", 300, "mm")
wt.add("C", "Hazen-Williams coefficient", "C", 120, "-")
wt.add("hf", "Friction loss, Hazen-Williams", "h_f",
       "=10.67*{L}*{Qs}^1.852/({C}^1.852*({d}/1000)^4.8704)", "m")
wt.add("hf2", "Friction loss, Hazen-Williams (first draft)", "h_f2",
       "=10.67*{L}*{Qs}^1.852/({C}^1.852*{d}^4.8704)", "m",
       planted=("unit-scale", "the bore in mm where Hazen-Williams wants m"))
wt.add("v", "Velocity in the rising main", "v", "={Qs}/(PI()*({d}/1000)^2/4)", "m/s")
wt.add("f", "Darcy friction factor (Moody chart, invented reading)", "f", 0.016, "-")
wt.add("hfD", "Friction loss, Darcy (check)", "h_f,D", "={f}*{L}/({d}/1000)*{v}^2/(2*9.81)",
       "m")
wt.add("K", "Sum of minor loss coefficients (valves, bends, entry, exit)", "ΣK", 12, "-")
wt.add("hm", "Minor losses", "h_m", "={K}*{v}^2/(2*9.81)", "m")
wt.add("H", "Pump duty head", "H", "={Hst}+{hf}+{hm}", "m")
wt.add("Hft", "Pump duty head, ft (US pump maker)", "H_ft", "={H}/0.3048", "ft")
wt.add("Hft2", "Pump duty head, ft (first draft)", "H_ft2", "={H}*0.3048", "ft",
       planted=("unit-scale", "m to ft multiplied by 0.3048: wrong way round"))
wt.add("rho", "Density of water at 15 °C", "ρ", 999.1, "kg/m³")
wt.add("Ph", "Hydraulic power", "P_h", "={rho}*9.81*{Qs}*{H}/1000", "kW")
wt.add("Ph2", "Hydraulic power (first draft)", "P_h2", "={rho}*{Qs}*{H}/1000", "kW",
       planted=("result-unit", "ρ·Q·H with no g: not a power"))
wt.add("Ph367", "Hydraulic power (367 check)", "P_h,c", "={Qh}*{H}/367", "kW")
wt.add("etap", "Pump efficiency at duty (maker, invented)", "η_p", 78, "%")
wt.add("etam", "Motor efficiency", "η_m", 94, "%")
wt.add("Pin", "Motor input power", "P_in", "={Ph}/({etap}/100*{etam}/100)", "kW")
wt.add("Pin2", "Motor input power (first draft)", "P_in2", "={Ph}/({etap}*{etam}/100)", "kW",
       planted=("unit-scale", "one of two % left as a number: 100 too small"))
wt.add("Php", "Pump shaft power, hp (US check)", "P_hp", "={gpm}*{Hft}/(3960*{etap}/100)", "hp")
wt.add("Paux", "Station auxiliaries: controls, lighting, heaters (invented)", "P_aux", 850, "W")
wt.add("Pst", "Station load while pumping", "P_st", "={Pin}+{Paux}/1000", "kW")
wt.add("Pst2", "Station load while pumping (first draft)", "P_st2", "={Pin}+{Paux}", "kW",
       planted=("unit-scale", "W added to kW"))
wt.add("tfill", "Time to fill the tank from bottom to top water level", "t_fill", "={Vt}/{Qh}",
       "h")
wt.add("tfill2", "Time to fill the tank (first draft)", "t_fill2", "={Vt}/({Q}/1000)", "h",
       planted=("unit-scale", "m³ over m³/s taken as hours: the /3600 missing"))
wt.add("Ef", "Energy per fill", "E_f", "={Pst}*{tfill}", "kWh")
wt.add("es", "Specific energy", "e_s", "={Pst}/{Qh}", "kWh/m³")
wt.heading("Suction and NPSH")
wt.add("pb", "Barometer at the booster station (invented reading)", "p_b", 99.9, "kPa")
wt.add("pv", "Vapour pressure of water at 15 °C", "p_v", 1.705, "kPa")
wt.add("zs", "Sump level above the impeller eye", "z_s", 2.1, "m")
wt.add("hfs", "Suction line friction loss", "h_fs", 0.4, "m")
wt.add("NPSH", "NPSH available, from levels", "NPSHa",
       "=({pb}-{pv})*1000/({rho}*9.81)+{zs}-{hfs}", "m")
wt.add("psg", "Suction gauge reading at duty (invented)", "p_sg", 16.0, "kPa(g)")
wt.add("vs", "Velocity in the suction branch", "v_s", 1.4, "m/s")
wt.add("NPSHg", "NPSH available, from the suction gauge", "NPSHa,g",
       "=({psg}+{pb}-{pv})*1000/({rho}*9.81)+{vs}^2/(2*9.81)", "m")
wt.add("NPSHg2", "NPSH available, from the suction gauge (first draft)", "NPSHa,g2",
       "=({psg}-{pv})*1000/({rho}*9.81)+{vs}^2/(2*9.81)", "m",
       planted=("offset-scale", "a gauge reading less an absolute vapour pressure: the "
                                "barometer left out"))
wt.add("psgp", "Suction gauge reading, psig", "p_sg,US", "={psg}/6.895", "psig")
wt.heading("Pressures on the hill and surge")
wt.add("zc", "Ground level at the highest customer (invented)", "z_c", 205.0, "m")
wt.add("Hc", "Static head at the highest customer, tank at bottom water level", "H_c",
       "={BWL}-{zc}", "m")
wt.add("pc", "Static pressure at the highest customer", "p_c", "={rho}*9.81*{Hc}/1000",
       "kPa(g)")
wt.add("pcb", "Static pressure at the highest customer, bar", "p_c,bar", "={pc}/100", "bar(g)")
wt.add("pcp", "Static pressure at the highest customer, psig", "p_c,US",
       "={Hc}/0.3048*0.433", "psig")
wt.add("pcp2", "Static pressure at the highest customer, psig (first draft)", "p_c,US2",
       "={Hc}/0.3048*2.31", "psig",
       planted=("unit-scale", "2.31 ft/psi used as psi per ft: 5.3 too large"))
wt.add("a", "Wave speed in the ductile iron main", "a", 1100, "m/s")
wt.add("dpJ", "Surge pressure rise on pump trip, Joukowsky", "Δp_J", "={rho}*{a}*{v}/1000",
       "kPa")
wt.add("hJ", "Surge head rise on pump trip", "Δh_J", "={a}*{v}/9.81", "m")
wt.add("pst", "Static pressure at the pump, tank full", "p_st", "={rho}*9.81*{Hst}/1000",
       "kPa(g)")
wt.add("pmax", "Maximum pressure at the pump on a trip", "p_max", "={pst}+{dpJ}", "kPa(g)")
wt.add("pall", "Allowable operating pressure of the main (maker, invented)", "p_all", 3200,
       "kPa(g)")
wt.add("pmg", "Margin of the allowable over the maximum", "Δp_m", "={pall}-{pmax}", "kPa")
WTS = wt.finish()

WTB = {
    "trade": "water supply: elevated tank on a hill, booster pumps, rising main, NPSH and surge",
    "sheets": [("Tower", WTS)],
    "planted": dict(wt.planted),
}

# --------------------------------------------------------------------------------------------
# Book 4: boiler house natural gas supply and metering (mbar(g), mbar a, mbar, kPa(g), psig,
# inH2O, °C, K, m³, ft³, MJ/m³, kWh, therm, MW, kW, Btu/h, m³/h, ft³/h, MMBtu/h, mm, m², m/s,
# kg/m³, h/yr, kWh/yr, m³/yr, t/yr, $/yr, %)
# --------------------------------------------------------------------------------------------
NG_SRC = (
    "Sources: standard reference conditions 15 °C and 101.325 kPa (1013.25 mbar) (ISO 13443); "
    "volume at the meter to standard C = (p_g + p_b)/p_s·T_s/T·Z_s/Z (common practice, with "
    "absolute pressures and temperatures); fixed correction factor 1.02264 for low-pressure "
    "(21 mbar) supplies and energy = V·C·CV/3.6 in kWh (Gas (Calculation of Thermal Energy) "
    "Regulations 1996 as amended, from memory); 1 kWh = 3.6 MJ, T/K = t/°C + 273.15 (SI "
    "Brochure 9th ed.); 1 ft³ = 0.02832 m³, 1 therm = 105.5 MJ, 1 kW = 3412 Btu/h, 1 psi = "
    "68.95 mbar, 1 inH2O = 249.1 Pa (NIST SP 811 (2008) App. B.8); natural gas gross CV "
    "39.3 MJ/m³, density 0.723 kg/m³ at standard conditions, air 1.225 kg/m³ (typical UK "
    "supply and ISO standard atmosphere, from memory); Wobbe index CV/√RD (ISO 6976, from "
    "memory); stoichiometric air 9.7 m³ per m³ of gas (common practice, from memory); Darcy "
    "Δp = (f·L/D + ΣK)·ρ·v²/2 (White, Fluid Mechanics, 7th ed. (2011)); 6 in Sch 40 bore "
    "154.1 mm (ASME B36.10M, from memory); pressure loss allowed 10 % of the meter pressure "
    "(common practice); 0.184 kg CO2/kWh gross (UK reporting factor, from memory). Works, "
    "boilers, meters, tariff and readings invented.")
ng = ItemSheet("Gas", "Skelbrook Dye Works boiler house (invented): medium-pressure gas supply, "
               "primary meter, standby low-pressure meter and two steam boilers", NG_SRC)
ng.heading("Primary meter and volume correction")
ng.add("pm", "Gas pressure at the meter (governor outlet)", "p_m", 300, "mbar(g)")
ng.add("pmk", "Gas pressure at the meter, kPa(g)", "p_m,kPa", "={pm}/10", "kPa(g)")
ng.add("pmk2", "Gas pressure at the meter, kPa(g) (first draft)", "p_m,kPa2", "={pm}*100",
       "kPa(g)", planted=("unit-scale", "mbar to kPa by ×100: 1000 too large"))
ng.add("pmp", "Gas pressure at the meter, psig", "p_m,US", "={pm}/68.95", "psig")
ng.add("pb", "Site barometer (invented reading)", "p_b", 1002, "mbar a")
ng.add("pma", "Gas pressure at the meter, absolute", "p_m,a", "={pm}+{pb}", "mbar a")
ng.add("ps", "Standard pressure", "p_s", 1013.25, "mbar a")
ng.add("tm", "Gas temperature at the meter (invented reading)", "t_m", 8, "°C")
ng.add("Tm", "Gas temperature at the meter, absolute", "T_m", "={tm}+273.15", "K")
ng.add("Ts", "Standard temperature", "T_s", 288.15, "K")
ng.add("Zr", "Compressibility ratio Z_s/Z_m (invented)", "Z_s/Z_m", 1.001, "-")
ng.add("Cf", "Volume correction factor", "C", "={pma}/{ps}*{Ts}/{Tm}*{Zr}", "-")
ng.add("Cf2", "Volume correction factor (first draft)", "C_2", "={pm}/{ps}*{Ts}/{Tm}*{Zr}", "-",
       planted=("offset-scale", "a gauge meter pressure over the absolute standard pressure"))
ng.add("Cf3", "Volume correction factor (meter reader's check)", "C_3",
       "={pma}/{ps}*{Ts}/{tm}*{Zr}", "-",
       planted=("offset-scale", "a °C reading in the temperature ratio: kelvins belong"))
ng.add("R1", "Meter index, start of the month (invented)", "R_1", 1482130, "m³")
ng.add("R2", "Meter index, end of the month (invented)", "R_2", 1717860, "m³")
ng.add("Vm", "Metered volume", "V_m", "={R2}-{R1}", "m³")
ng.add("Vs", "Volume at standard conditions", "V_s", "={Vm}*{Cf}", "m³")
ng.add("CV", "Gross calorific value (supplier's monthly average, invented)", "CV", 39.3,
       "MJ/m³")
ng.add("Em", "Energy for the month", "E_m", "={Vs}*{CV}/3.6", "kWh")
ng.add("Em2", "Energy for the month (first draft)", "E_m2", "={Vs}*{CV}*3.6", "kWh",
       planted=("unit-scale", "MJ to kWh multiplied by 3.6: wrong way round"))
ng.heading("Standby meter, low pressure (imperial)")
ng.add("R3", "Standby meter index × 100, start (invented)", "R_3", 751200, "ft³")
ng.add("R4", "Standby meter index × 100, end (invented)", "R_4", 768900, "ft³")
ng.add("Vi", "Standby metered volume", "V_i", "={R4}-{R3}", "ft³")
ng.add("Vim", "Standby metered volume, m³", "V_i,m3", "={Vi}*0.02832", "m³")
ng.add("Vim2", "Standby metered volume, m³ (first draft)", "V_i,m3 2", "={Vi}*2.832", "m³",
       planted=("unit-scale", "the per-hundred factor 2.832 applied to ft³ already ×100: 100 "
                              "too large"))
ng.add("Ei", "Standby energy, fixed correction factor", "E_i", "={Vim}*1.02264*{CV}/3.6", "kWh")
ng.heading("Boilers")
ng.add("nb", "Boilers on line", "n_b", 2, "-")
ng.add("Pb", "Boiler rated output, each (maker, invented)", "P_b", 3.0, "MW")
ng.add("Pout", "Boiler output, total", "P_out", "={nb}*{Pb}*1000", "kW")
ng.add("eta", "Boiler efficiency, gross", "η", 84, "%")
ng.add("Pin", "Gas input, boilers", "P_in", "={Pout}/({eta}/100)", "kW")
ng.add("Pin2", "Gas input, boilers (first draft)", "P_in2", "={Pout}/{eta}", "kW",
       planted=("unit-scale", "a % used as a fraction: 100 too small"))
ng.add("Puh", "Unit heaters in the boiler house, total (US maker's plates)", "P_uh", 300000,
       "Btu/h")
ng.add("Ptot", "Gas input, connected", "P_tot", "={Pin}+{Puh}/3412", "kW")
ng.add("Ptot2", "Gas input, connected (first draft)", "P_tot2", "={Pin}+{Puh}", "kW",
       planted=("unit-scale", "Btu/h added to kW"))
ng.add("MMB", "Gas input, connected, MMBtu/h", "P_tot,US", "={Ptot}*3412/1000000", "MMBtu/h")
ng.add("Qg", "Gas flow at standard conditions", "Q_g", "={Ptot}*3.6/{CV}", "m³/h")
ng.add("Qm", "Gas flow at the meter (actual)", "Q_m", "={Qg}/{Cf}", "m³/h")
ng.add("ex", "Excess air", "λ_ex", 15, "%")
ng.add("Qair", "Combustion air flow", "Q_air", "={Qg}*9.7*(1+{ex}/100)", "m³/h")
ng.heading("Pipework, meter to burners")
ng.add("D", "Pipe bore, 6 in Sch 40", "D", 154.1, "mm")
ng.add("A", "Pipe bore area", "A", "=PI()*({D}/1000)^2/4", "m²")
ng.add("v", "Gas velocity", "v", "={Qm}/3600/{A}", "m/s")
ng.add("v2", "Gas velocity (first draft)", "v_2", "={Qm}/{A}", "m/s",
       planted=("unit-scale", "m³/h over m² taken as m/s: the /3600 missing"))
ng.add("rhos", "Density of the gas at standard conditions", "ρ_s", 0.723, "kg/m³")
ng.add("RD", "Relative density (air 1.225 kg/m³)", "RD", "={rhos}/1.225", "-")
ng.add("W", "Wobbe index, gross", "W", "={CV}/SQRT({RD})", "MJ/m³")
ng.add("rho", "Density of the gas in the pipe", "ρ", "={rhos}*{Cf}", "kg/m³")
ng.add("f", "Darcy friction factor (Moody chart, invented reading)", "f", 0.017, "-")
ng.add("Lp", "Pipe length, meter to the furthest burner", "L", 65, "m")
ng.add("K", "Sum of minor loss coefficients", "ΣK", 6, "-")
ng.add("dp", "Pressure loss, meter to burners", "Δp",
       "=({f}*{Lp}/({D}/1000)+{K})*{rho}*{v}^2/2/100", "mbar")
ng.add("dpa", "Allowed pressure loss", "Δp_all", "={pm}*10/100", "mbar")
ng.add("pbr", "Gas pressure at the furthest burner", "p_br", "={pm}-{dp}", "mbar(g)")
ng.add("pbrw", "Gas pressure at the furthest burner, inH2O (US burner maker)", "p_br,US",
       "={pbr}*100/249.1", "inH2O")
ng.add("pbrw2", "Gas pressure at the furthest burner, inH2O (first draft)", "p_br,US2",
       "={pbr}/249.1", "inH2O",
       planted=("unit-scale", "the Pa factor used on mbar: 100 too small"))
ng.heading("The year")
ng.add("hrs", "Running hours", "t_op", 5200, "h/yr")
ng.add("lf", "Mean load factor (invented)", "LF", 65, "%")
ng.add("Ey", "Gas per year", "E_y", "={Ptot}*{hrs}*{lf}/100", "kWh/yr")
ng.add("Vy", "Gas per year, volume at standard conditions", "V_y", "={Ey}*3.6/{CV}", "m³/yr")
ng.add("CO2", "Carbon dioxide per year", "m_CO2", "={Ey}*0.184/1000", "t/yr")
ng.add("tar", "Gas tariff (invented)", "c_g", 0.041, "$/kWh")
ng.add("Cy", "Gas cost per year", "C_y", "={Ey}*{tar}", "$/yr")
NGS = ng.finish()

_pm, _pb, _ps, _Ts, _Zr, _CV = (ng.ref(k) for k in ("pm", "pb", "ps", "Ts", "Zr", "CV"))
METERS = {
    "A1": "Skelbrook Dye Works: primary meter, monthly readings (invented readings and mean gas "
          "temperatures)",
    "A2": "Sources: C = (p_g + p_b)/p_s·T_s/T·Z_s/Z (common practice); energy = V·C·CV/3.6 in "
          "kWh (Gas (Calculation of Thermal Energy) Regulations 1996 as amended, from memory); "
          "T/K = t/°C + 273.15 (SI Brochure 9th ed.).",
    "A3": CAUTION,
    "A5": "Month", "B5": "Index [m³]", "C5": "Use [m³]", "D5": "Mean gas temperature [°C]",
    "E5": "Correction [-]", "F5": "Energy [kWh]",
    "A10": "Total", "C10": "=SUM(C7:C9)", "F10": "=SUM(F7:F9)",
}
for r, (mo, idx, t) in enumerate([("December (closing)", 1246900, 6),
                                  ("January", 1482130, 5), ("February", 1717860, 6),
                                  ("March", 1931400, 9)], start=6):
    METERS[f"A{r}"], METERS[f"B{r}"], METERS[f"D{r}"] = mo, idx, t
    if r > 6:
        METERS[f"C{r}"] = f"=B{r}-B{r - 1}"
        METERS[f"E{r}"] = f"=({_pm}+{_pb})/{_ps}*{_Ts}/(D{r}+273.15)*{_Zr}"
        METERS[f"F{r}"] = f"=C{r}*E{r}*{_CV}/3.6"
METERS["F9"] = f"=C9*E9*{_CV}"
METERS_PLANTED = {"Meters!F9": ("unit-scale", "m³ × MJ/m³ written as kWh: the /3.6 missing")}

NGB = {
    "trade": "gas utilisation: boiler house supply, metering, volume correction and pipework",
    "sheets": [("Gas", NGS), ("Meters", METERS)],
    "planted": {**ng.planted, **METERS_PLANTED},
}

BOOKS = {"mine-air-brackenfell-deep": MINEB, "glasshouse-saltmarsh-wrayholme": GHB,
         "water-tower-carrick-hill": WTB, "gas-boiler-house-skelbrook": NGB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()

# A dimensionally consistent formula can still be wrong; this check does not replace independent
# review under local codes and licensed practice.
