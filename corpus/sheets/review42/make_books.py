#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review42), written with the
standard library only (corpus/sheets/xlsx_writer.py and item_sheet.py, shared by the review
books), adapted like review41 and after its pattern (corpus/sheets/review41/make_books.py).

Trades: a food factory's blast freezer and frozen store refrigeration load sheet; a quarry's
sump dewatering pumps; a chemical plant's PSA nitrogen generator and buffer tank; a steam pipe
rack's thermal expansion, expansion loop and anchor loads. All scenarios, sites, firms,
readings and catalogue data are invented (demonstration only); the formulas and published
factors are the trade's own, with their sources named in a text cell at the top of each sheet
("from memory" where recalled and not checked, "common practice" where no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. The findings plumb makes beyond the planted ones, the planted cells it names
by another rule, and its messages that mislead, are recorded with their reasons in
review_notes.py (EXTRA, MISSED, RENAMED, MESSAGES) after running the binary of the day.

Run: python3 make_books.py  ->  *.xlsx, *.expect (where absent; --expect rewrites them) in this
folder (these books need no .cells.plumb sidecar)
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
# Book 1: food factory blast freezer / frozen store refrigeration load (kg/d and kg/h, kJ/kg
# and Btu/lb, kW, TR and Btu/h, °C and °F, infiltration, lighting W/m², hp fan motors)
# --------------------------------------------------------------------------------------------
REF_SRC = (
    "Sources: 1 Btu/lb = 2.326 kJ/kg exactly, so 1 kJ/kg = 0.4299 Btu/lb; 1 TR = 12 000 Btu/h = "
    "3.517 kW; 1 kW = 3412 Btu/h; 1 hp = 0.7457 kW; 1 kg = 2.205 lb; 1 m³/h = 0.5886 cfm "
    "(35.315 ft³/m³ / 60) (all NIST SP 811 (2008) App. B.8); °F = 1.8·°C + 32 (NIST SP 811 "
    "(2008) App. B.9); food properties (freezing point, specific heat above and below freezing, "
    "latent heat), ASHRAE Handbook—Refrigeration (2018) ch. 19 (from memory; check the table "
    "before use); product load q = c1·(t1 − tf) + hL + c2·(tf − t2), and occupancy heat "
    "272 − 6·t W per person with t the room temperature in °C, ASHRAE Handbook—Refrigeration "
    "(2018) ch. 24 (from memory); panel U = k/x, air-change infiltration Q = V·n·ρ·Δh (common "
    "practice); air enthalpies read from the psychrometric chart, ASHRAE Handbook—Fundamentals "
    "(2017) ch. 1; Carnot COP = Te/(Tc − Te) with absolute temperatures (common practice). "
    "Plant, firm and all readings invented.")
rf = ItemSheet("Load", "Hartwell Foods, plant 2: blast freezer refrigeration load sheet "
               "(invented scenario)", REF_SRC)
rf.heading("Product load")
rf.add("prod", "Product (key to the Products sheet)", "product", "Chicken")
rf.add("mday", "Product throughput", "m_d", 14000, "kg/d")
rf.add("tpull", "Freezing hours available per day", "t_pull", 20, "h/d")
rf.add("mh", "Product load per hour", "m_h", "={mday}/{tpull}", "kg/h")
rf.add("tin", "Product entering temperature", "t_1", 32, "°C")
rf.add("tout", "Product final core temperature", "t_2", -18, "°C")
rf.add("tf", "Initial freezing point", "t_f", "=VLOOKUP({prod},Products!A5:F9,2,FALSE)", "°C")
rf.add("c1", "Specific heat above freezing", "c_1", "=VLOOKUP({prod},Products!A5:F9,3,FALSE)",
       "kJ/(kg·K)")
rf.add("c2", "Specific heat below freezing", "c_2", "=VLOOKUP({prod},Products!A5:F9,4,FALSE)",
       "kJ/(kg·K)")
rf.add("hL", "Latent heat of fusion", "h_L", "=VLOOKUP({prod},Products!A5:F9,5,FALSE)", "kJ/kg")
rf.add("q1", "Sensible heat above freezing", "q_1", "={c1}*({tin}-{tf})", "kJ/kg")
rf.add("q3", "Sensible heat below freezing", "q_3", "={c2}*({tf}-{tout})", "kJ/kg")
rf.add("q", "Heat removed per kg of product", "q", "={q1}+{hL}+{q3}", "kJ/kg")
rf.add("qB", "Heat removed per lb of product", "q_B", "={q}*0.4299", "Btu/lb")
rf.add("qB2", "Heat removed per lb (US datasheet)", "q_B2", "={q}*2.326", "Btu/lb",
       planted=("unit-scale", "kJ/kg to Btu/lb multiplied by 2.326: wrong way round"))
rf.add("Qp", "Product load", "Q_p", "={mh}*{q}/3600", "kW")
rf.add("Qp2", "Product load (first draft)", "Q_p2", "={mday}*{q}/3600", "kW",
       planted=("unit-scale", "kg/d used with the per-hour /3600: 24 times too large"))
rf.add("toutF", "Product final temperature, °F", "t_2F", "={tout}*1.8+32", "°F")
rf.heading("Room: transmission")
rf.add("tr", "Room air temperature", "t_r", -28, "°C")
rf.add("ta", "Surrounding air temperature (all faces, conservative)", "t_a", 30, "°C")
rf.add("Lr", "Room length", "L", 24, "m")
rf.add("Wr", "Room width", "W", 12, "m")
rf.add("Hr", "Room height", "H", 6, "m")
rf.add("Af", "Floor area", "A_f", "={Lr}*{Wr}", "m²")
rf.add("Ae", "Envelope area (walls, ceiling, floor)", "A_e", "=2*({Lr}+{Wr})*{Hr}+2*{Lr}*{Wr}",
       "m²")
rf.add("Vr", "Room volume", "V", "={Lr}*{Wr}*{Hr}", "m³")
rf.add("k", "Panel core conductivity (PIR)", "k", 0.022, "W/(m·K)")
rf.add("x", "Panel core thickness", "x", 150, "mm")
rf.add("U", "Panel U-value (core only)", "U", "={k}/({x}/1000)", "W/(m²·K)")
rf.add("U2", "Panel U-value (panel maker's check)", "U_2", "={k}/{x}", "W/(m²·K)",
       planted=("unit-scale", "thickness in mm left unconverted: 1000 too small"))
rf.add("Qt", "Transmission load", "Q_t", "={U}*{Ae}*({ta}-{tr})/1000", "kW")
rf.heading("Infiltration")
rf.add("nac", "Air changes (door openings)", "n", 3.5, "1/d")
rf.add("Vi", "Infiltration air", "V_i", "={Vr}*{nac}/24", "m³/h")
rf.add("rho", "Outside air density at 30 °C", "rho", 1.165, "kg/m³")
rf.add("ho", "Outside air enthalpy (30 °C, 55 % RH)", "h_o", 67.8, "kJ/kg")
rf.add("hi", "Room air enthalpy (−28 °C, saturated)", "h_i", -27.4, "kJ/kg")
rf.add("dh", "Enthalpy difference", "Δh", "={ho}-{hi}", "kJ/kg")
rf.add("Qi", "Infiltration load", "Q_i", "={Vi}*{rho}*{dh}/3600", "kW")
rf.add("Qi2", "Infiltration load (rev. A)", "Q_i2", "={Vi}*{rho}*{dh}", "kW",
       planted=("unit-scale", "m³/h × kJ/m³ gives kJ/h, written as kW: /3600 missing"))
rf.heading("Internal gains")
rf.add("LPD", "Lighting power density", "LPD", 6, "W/m²")
rf.add("Ql", "Lighting load", "Q_l", "={LPD}*{Af}/1000", "kW")
rf.add("np", "People working in the room", "n_p", 4, "-")
rf.add("qpp", "Heat per person at room temperature", "q_p", "=272-6*{tr}", "W")
rf.add("Qpe", "Occupancy load", "Q_pe", "={np}*{qpp}/1000", "kW")
rf.add("Qint2", "Internal gains, lights and people (summary line)", "Q_int2",
       "={Ql}+{np}*{qpp}", "kW",
       planted=("unit-scale", "kW of lights added to W of people"))
rf.add("nfan", "Evaporator fans", "n_fan", 6, "-")
rf.add("Pfan", "Fan motor rating, each", "P_fan", 2, "hp")
rf.add("Qf", "Fan motor heat", "Q_f", "={nfan}*{Pfan}*0.7457", "kW")
rf.add("Qf2", "Fan motor heat (vendor form)", "Q_f2", "={nfan}*{Pfan}/0.7457", "kW",
       planted=("unit-scale", "hp to kW divided by 0.7457: wrong way round"))
rf.add("Pdef", "Defrost heaters, total", "P_def", 12, "kW")
rf.add("ndef", "Defrosts per day", "n_def", 4, "1/d")
rf.add("tdef", "Defrost duration", "t_def", 30, "min")
rf.add("Qd", "Defrost load, daily mean (all heat to the room)", "Q_d",
       "={Pdef}*{ndef}*{tdef}/60/24", "kW")
rf.heading("Totals and plant")
rf.add("Qs", "Sum of loads", "Q_s", "={Qp}+{Qt}+{Qi}+{Ql}+{Qpe}+{Qf}+{Qd}", "kW")
rf.add("SF", "Safety factor", "SF", 10, "%")
rf.add("Qdes", "Design load", "Q_des", "={Qs}*(1+{SF}/100)", "kW")
rf.add("Qdes2", "Design load (summary page)", "Q_des2", "={Qs}*(1+{SF})", "kW",
       planted=("unit-scale", "safety factor in % used as a fraction"))
rf.add("QTR", "Design load, TR", "Q_TR", "={Qdes}/3.517", "TR")
rf.add("trun", "Compressor running time", "t_run", 18, "h/d")
rf.add("Qpl", "Plant capacity at running time", "Q_pl", "={Qdes}*24/{trun}", "kW")
rf.add("TD", "Evaporator temperature difference", "ΔT_e", 7, "K")
rf.add("te", "Evaporating temperature", "t_e", "={tr}-{TD}", "°C")
rf.add("tc", "Condensing temperature", "t_c", 35, "°C")
rf.add("eta", "Share of Carnot COP reached (two-stage plant, invented)", "η_C", 42, "%")
rf.add("COP", "Plant COP (share of Carnot)", "COP", "=({te}+273.15)/({tc}-{te})*{eta}/100", "-")
rf.add("COP2", "Plant COP (hand check)", "COP_2", "={te}/({tc}-{te})*{eta}/100", "-",
       planted=("offset-scale", "°C evaporating temperature in a ratio where K belongs"))
rf.add("Pel", "Compressor electrical input", "P_el", "={Qpl}/{COP}", "kW")
rf.add("Eyr", "Compressor energy per year", "E_yr", "={Pel}*{trun}*365", "kWh/yr")
LOAD = rf.finish()

PRODUCTS = {
    "A1": "Thermal properties of foods (rounded, from memory of ASHRAE Handbook—Refrigeration "
          "(2018) ch. 19; check the table before use)",
    "A2": "Sources: as the Load sheet; 1 kJ/kg = 0.4299 Btu/lb (NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A4": "Product", "B4": "Freezing point [°C]", "C4": "c above freezing [kJ/(kg·K)]",
    "D4": "c below freezing [kJ/(kg·K)]", "E4": "Latent heat [kJ/kg]",
    "F4": "Latent heat [Btu/lb]",
}
for r, row in enumerate([("Chicken", -2.8, 3.32, 1.77, 247),
                         ("Beef, lean", -1.7, 3.52, 2.05, 240),
                         ("Cod", -2.2, 3.78, 2.14, 271),
                         ("Peas, green", -0.6, 3.31, 1.76, 264),
                         ("Ice cream", -5.6, 2.95, 1.63, 210)], start=5):
    for c, v in zip("ABCDE", row):
        PRODUCTS[f"{c}{r}"] = v
    PRODUCTS[f"F{r}"] = f"=E{r}*0.4299"
PRODUCTS["F8"] = "=E8*2.326"          # planted: wrong way round

REFRIG = {
    "trade": "food refrigeration: blast freezer load sheet",
    "sheets": [("Load", LOAD), ("Products", PRODUCTS)],
    "planted": {**rf.planted,
                "Products!F8": ("unit-scale", "kJ/kg to Btu/lb multiplied by 2.326: wrong way "
                                "round")},
}

# --------------------------------------------------------------------------------------------
# Book 2: quarry sump dewatering (m³/h, L/s, gpm; head in m and ft; kW and hp; hours per day
# and per year; energy cost)
# --------------------------------------------------------------------------------------------
PUMP_SRC = (
    "Sources: 1 L/s = 3.6 m³/h; 1 m³/h = 4.403 US gpm (264.17 gal/m³ / 60); 1 m = 3.281 ft; "
    "1 hp = 0.7457 kW; 1 psi = 6.895 kPa; 1 bar = 100 kPa (NIST SP 811 (2008) App. B.8); "
    "g = 9.81 m/s² (9.80665, SI Brochure 9th ed.); Darcy–Weisbach head loss, Crane TP-410 "
    "(2013) ch. 1 (from memory), with the Swamee–Jain friction factor f = 0.25/[log10(ε/(3.7·D) "
    "+ 5.74/Re^0.9)]² (Swamee & Jain 1976, from memory); Hazen–Williams check in SI units, "
    "h_f = 10.67·L·Q^1.852/(C^1.852·D^4.87) with Q in m³/s and D in m (common practice); "
    "water horsepower = gpm × ft × SG / 3960 (Hydraulic Institute, from memory); steel pipe "
    "roughness 0.045 mm (Crane TP-410, from memory); water at 15 °C, ν = 1.14E-6 m²/s (from "
    "memory); rational runoff Q = C·i·A (common practice). Quarry, levels, rainfall and "
    "catalogue data invented.")
pu = ItemSheet("Pumps", "Carrow Ridge quarry, north pit: sump dewatering pumps (invented "
               "scenario)", PUMP_SRC)
pu.heading("Inflow")
pu.add("Ac", "Catchment draining to the sump", "A_c", 6.2, "ha")
pu.add("Rd", "Design rainfall, 24 h (1 in 10 yr)", "R_d", 55, "mm/d")
pu.add("Cr", "Runoff coefficient (benches and haul roads)", "C", 0.85, "-")
pu.add("Qgw", "Groundwater inflow (pumping records)", "Q_gw", 140, "m³/h")
pu.add("Qr", "Storm runoff to the sump, design day", "Q_r", "={Ac}*10000*{Rd}/1000*{Cr}/24",
       "m³/h")
pu.add("Qr2", "Storm runoff (permit form)", "Q_r2", "={Ac}*10000*{Rd}/1000/1000*{Cr}/24", "m³/h",
       planted=("unit-scale", "mm to m divided by 1000 twice: 1000 too small"))
pu.add("Qin", "Design inflow", "Q_in", "={Qgw}+{Qr}", "m³/h")
pu.add("nd", "Duty pumps", "n_d", 2, "-")
pu.add("Qp", "Flow per pump", "Q_p", "={Qin}/{nd}", "m³/h")
pu.add("QpL", "Flow per pump, L/s", "Q_p,L", "={Qp}/3.6", "L/s")
pu.add("QpL2", "Flow per pump, L/s (pump curve sheet)", "Q_p,L2", "={Qp}*3.6", "L/s",
       planted=("unit-scale", "m³/h to L/s multiplied by 3.6: wrong way round"))
pu.add("Qpg", "Flow per pump, US gpm", "Q_p,gpm", "={Qp}*4.403", "gpm")
pu.add("Qps", "Flow per pump, m³/s", "Q_p,s", "={Qp}/3600", "m³/s")
pu.heading("Head")
pu.add("zs", "Sump pump-off level (RL)", "z_s", -48.5, "m")
pu.add("zd", "Discharge level at the settling pond (RL)", "z_d", 4.0, "m")
pu.add("Hs", "Static head", "H_s", "={zd}-{zs}", "m")
pu.add("D", "Rising main inside diameter", "D", 200, "mm")
pu.add("Lp", "Rising main length (ramp route)", "L", 780, "m")
pu.add("eps", "Pipe roughness", "ε", 0.045, "mm")
pu.add("nu", "Kinematic viscosity of water, 15 °C", "ν", 1.14E-6, "m²/s")
pu.add("V", "Velocity in the main", "V", "={Qps}/(PI()*({D}/1000)^2/4)", "m/s")
pu.add("Re", "Reynolds number", "Re", "={V}*{D}/1000/{nu}", "-")
pu.add("f", "Friction factor (Swamee–Jain)", "f",
       "=0.25/LOG10({eps}/(3.7*{D})+5.74/{Re}^0.9)^2", "-")
pu.add("hf", "Friction head (Darcy–Weisbach)", "h_f", "={f}*{Lp}/({D}/1000)*{V}^2/(2*9.81)", "m")
pu.add("hf2", "Friction head (first pass)", "h_f2", "={f}*{Lp}/{D}*{V}^2/(2*9.81)", "m",
       planted=("unit-scale", "L/D with D in mm: /1000 missing, 1000 too small"))
pu.add("CHW", "Hazen–Williams C (steel, some years in service)", "C_HW", 120, "-")
pu.add("hfHW", "Friction head, Hazen–Williams check", "h_f,HW",
       "=10.67*{Lp}*{Qps}^1.852/({CHW}^1.852*({D}/1000)^4.87)", "m")
pu.add("K", "Fittings loss coefficients (foot valve, bends, check valve, exit)", "ΣK", 9.5, "-")
pu.add("hm", "Fittings head loss", "h_m", "={K}*{V}^2/(2*9.81)", "m")
pu.add("hm2", "Fittings head loss (rev. A)", "h_m2", "={K}*{V}^2/2", "m",
       planted=("result-unit", "velocity head without g"))
pu.add("H", "Total dynamic head", "H", "={Hs}+{hf}+{hm}", "m")
pu.add("Hft", "Total dynamic head, ft", "H_ft", "={H}*3.281", "ft")
pu.add("Hft2", "Total dynamic head, ft (US pump supplier)", "H_ft2", "={H}*0.3048", "ft",
       planted=("unit-scale", "m to ft multiplied by 0.3048: wrong way round"))
pu.heading("Power")
pu.add("rho", "Density of the silty water", "ρ", 1010, "kg/m³")
pu.add("ep", "Pump efficiency at duty", "η_p", 74, "%")
pu.add("em", "Motor efficiency", "η_m", 94, "%")
pu.add("Ph", "Hydraulic power", "P_h", "={rho}*9.81*{Qps}*{H}/1000", "kW")
pu.add("Ph2", "Hydraulic power (first draft)", "P_h2", "={rho}*9.81*{Qp}*{H}/1000", "kW",
       planted=("unit-scale", "flow in m³/h where m³/s belongs: 3600 too large"))
pu.add("Psh", "Shaft power", "P_sh", "={Ph}/({ep}/100)", "kW")
pu.add("Pshhp", "Shaft power, hp", "P_sh,hp", "={Psh}/0.7457", "hp")
pu.add("Pshhp2", "Shaft power, hp (supplier's form)", "P_sh,hp2", "={Psh}*0.7457", "hp",
       planted=("unit-scale", "kW to hp multiplied by 0.7457: wrong way round"))
pu.add("WHP", "Water horsepower, US check", "WHP", "={Qpg}*{Hft}*{rho}/1000/3960", "hp")
pu.add("Pin", "Electrical input per pump", "P_in", "={Psh}/({em}/100)", "kW")
pu.add("Pin2", "Electrical input per pump (switchboard schedule)", "P_in2", "={Psh}/{em}", "kW",
       planted=("unit-scale", "motor efficiency in % used as a fraction"))
pu.add("mm", "Motor margin over shaft power", "margin", 10, "%")
pu.add("Pmot", "Motor rating, next size up",
       "P_mot", "=INDEX(Motors!B5:B12,MATCH({Psh}*(1+{mm}/100),Motors!B5:B12,1)+1)", "kW")
pu.heading("Running hours and energy")
pu.add("Ry", "Mean annual rainfall", "R_y", 780, "mm/yr")
pu.add("Qavg", "Mean inflow over the year", "Q_avg", "={Qgw}+{Ac}*10000*{Ry}/1000*{Cr}/8760",
       "m³/h")
pu.add("td", "Running hours per pump per day (duty pumps together)", "t_d",
       "={Qavg}*24/({nd}*{Qp})", "h/d")
pu.add("ty", "Running hours per pump per year", "t_y", "={td}*365", "h/yr")
pu.add("Eyr", "Pump energy per year", "E_yr", "={nd}*{Pin}*{ty}", "kWh/yr")
pu.add("Plt", "Sump lighting and telemetry (continuous)", "P_lt", 600, "W")
pu.add("Etot", "Site energy per year, sump", "E_tot", "={Eyr}+{Plt}*8760/1000", "kWh/yr")
pu.add("Etot2", "Site energy per year, sump (budget sheet)", "E_tot2", "={Eyr}+{Plt}*8760",
       "kWh/yr", planted=("unit-scale", "W·h of lighting added to kWh of pumping"))
pu.add("tar", "Electricity tariff", "c_e", 0.16, "$/kWh")
pu.add("cost", "Energy cost per year", "C_yr", "={Etot}*{tar}", "$/yr")
PUMPS = pu.finish()

MOTORS = {
    "A1": "Standard motor ratings (IEC 60072 series, common practice); hp = kW / 0.7457 (NIST SP "
          "811 (2008) App. B.8)",
    "A3": CAUTION,
    "A4": "Frame (invented)", "B4": "Rating [kW]", "C4": "Rating [hp]",
}
for r, (fr, kw) in enumerate([("M160M", 11), ("M160L", 15), ("M180M", 18.5), ("M180L", 22),
                              ("M200L", 30), ("M225S", 37), ("M225M", 45), ("M250M", 55)],
                             start=5):
    MOTORS[f"A{r}"], MOTORS[f"B{r}"] = fr, kw
    MOTORS[f"C{r}"] = f"=B{r}/0.7457"

QUARRY = {
    "trade": "quarry dewatering: sump pumps, rising main and running cost",
    "sheets": [("Pumps", PUMPS), ("Motors", MOTORS)],
    "planted": dict(pu.planted),
}

# --------------------------------------------------------------------------------------------
# Book 3: PSA nitrogen generator and buffer tank (Nm³/h and scfm, barg, bar a and psig, purity
# %, ppm, tank m³ and US gal, hold-up time)
# --------------------------------------------------------------------------------------------
N2_SRC = (
    "Sources: normal state 0 °C and 101.325 kPa, DIN 1343 (from memory); standard cubic foot at "
    "60 °F and 14.696 psia; 1 Nm³/h = 0.6221 scfm (35.315 ft³/m³ × 288.71 K/273.15 K / 60, "
    "NIST SP 811 (2008) App. B.8 and the ideal gas law, common practice); 1 bar = 14.504 psi = "
    "100 kPa; standard atmosphere 1.01325 bar = 14.696 psi; 1 m³ = 264.2 US gal (NIST SP 811 "
    "(2008) App. B.8); specific gas constant of nitrogen 296.8 J/(kg·K) (8.31446/0.028013, "
    "CODATA 2018); nitrogen density 1.2506 kg/Nm³ (from memory); 1 % = 10 000 ppm (NIST SP 811 "
    "(2008) 7.10); buffer hold-up t = V·(p1 − p2)/p_n · T_n/T / Q_n, ideal gas, isothermal "
    "(common practice); air factor by purity and compressor specific power: maker's data "
    "(invented). Plant, firm and all readings invented.")
n2 = ItemSheet("N2", "Saltmarsh Chemicals, unit 4: PSA nitrogen generator and buffer tank "
               "(invented scenario)", N2_SRC)
n2.heading("Demand")
n2.add("QN", "Nitrogen demand, sum of users", "Q_N", "=Users!B10", "Nm³/h")
n2.add("Qs", "Nitrogen demand, scfm", "Q_scfm", "={QN}*0.6221", "scfm")
n2.add("Qs2", "Nitrogen demand, scfm (US vendor enquiry)", "Q_scfm2", "={QN}*35.31/60", "scfm",
       planted=("unit-scale", "volume factor alone: 0 °C to 60 °F reference left out, 5.5 % low"))
n2.add("mg", "Design margin (future users)", "margin", 15, "%")
n2.add("Qd", "Generator design capacity", "Q_d", "={QN}*(1+{mg}/100)", "Nm³/h")
n2.add("Qd2", "Generator design capacity (datasheet)", "Q_d2", "={QN}*(1+{mg})", "Nm³/h",
       planted=("unit-scale", "margin in % used as a fraction"))
n2.add("P", "Purity required (highest user)", "x_N2", "=Users!D10", "%")
n2.add("O2", "Residual oxygen allowed", "x_O2", "=100-{P}", "%")
n2.add("O2p", "Residual oxygen allowed, ppm", "x_O2,ppm", "={O2}*10000", "ppm")
n2.add("O2p2", "Residual oxygen allowed, ppm (analyser setting)", "x_O2,ppm2", "={O2}*1000",
       "ppm", planted=("unit-scale", "% to ppm multiplied by 1000 where 10 000 belongs"))
n2.heading("Feed air and power")
n2.add("AF", "Air factor at that purity (maker's table)", "AF", "=VLOOKUP({P},AirFactor!A5:B10,2)",
       "-")
n2.add("Qa", "Feed air at normal state", "Q_air", "={Qd}*{AF}", "Nm³/h")
n2.add("pb", "Site barometric pressure", "p_b", 100.5, "kPa")
n2.add("ti", "Compressor intake temperature (summer)", "t_i", 30, "°C")
n2.add("FAD", "Compressor free air delivery at intake", "FAD",
       "={Qa}*101.325/{pb}*({ti}+273.15)/273.15/60", "m³/min")
n2.add("FAD2", "Compressor free air delivery (enquiry)", "FAD_2",
       "={Qa}*101.325/{pb}*{ti}/273.15/60", "m³/min",
       planted=("offset-scale", "°C intake temperature in a ratio where K belongs"))
n2.add("SP", "Compressor specific power (maker's data, 10 barg)", "SP", 6.8, "kW/(m³/min)")
n2.add("Pc", "Compressor power", "P_c", "={FAD}*{SP}", "kW")
n2.add("Pdr", "Refrigerated dryer input", "P_dr", 900, "W")
n2.add("Pt", "Package power", "P_t", "={Pc}+{Pdr}/1000", "kW")
n2.add("Pt2", "Package power (electrical load list)", "P_t2", "={Pc}+{Pdr}", "kW",
       planted=("unit-scale", "W of dryer added to kW of compressor"))
n2.add("hrs", "Running hours", "t_y", 8400, "h/yr")
n2.add("Eyr", "Energy per year", "E_yr", "={Pt}*{hrs}", "kWh/yr")
n2.heading("Pressures")
n2.add("pu", "Highest user pressure", "p_u", "=Users!C10", "barg")
n2.add("dpl", "Pressure drop, header, filters and regulator", "Δp_l", 0.6, "bar")
n2.add("pmin", "Minimum tank pressure", "p_min", "={pu}+{dpl}", "barg")
n2.add("pmax", "Generator outlet and tank maximum pressure", "p_max", 9.0, "barg")
n2.add("pmaxa", "Tank maximum pressure, absolute", "p_max,a", "={pmax}+1.01325", "bar a")
n2.add("pmaxp", "Tank maximum pressure, psig", "p_max,psig", "={pmax}*14.504", "psig")
n2.add("pmaxpa", "Tank maximum pressure, psia", "p_max,psia", "={pmaxp}+14.696", "psia")
n2.add("pmaxpa2", "Tank maximum pressure, psia (vessel nameplate draft)", "p_max,psia2",
       "={pmaxp}+1.01325", "psia",
       planted=("offset-scale", "the atmosphere in bar added to a reading in psi"))
n2.heading("Buffer tank")
n2.add("th", "Hold-up needed (generator trip to bottle bank changeover)", "t_h", 5, "min")
n2.add("tt", "Tank gas temperature", "t_t", 30, "°C")
n2.add("Vr", "Buffer volume needed", "V_req",
       "={QN}*{th}/60*1.01325/({pmax}-{pmin})*({tt}+273.15)/273.15", "m³")
n2.add("Vr2", "Buffer volume needed (vendor check)", "V_req2",
       "={QN}*{th}/60*1.01325/({pmaxa}-{pmin})*({tt}+273.15)/273.15", "m³",
       planted=("offset-scale", "absolute maximum pressure less a gauge minimum"))
n2.add("Vg", "Buffer volume needed, US gal", "V_gal", "={Vr}*264.2", "US gal")
n2.add("Vg2", "Buffer volume needed, US gal (US vessel shop)", "V_gal2", "={Vr}*0.003785",
       "US gal", planted=("unit-scale", "m³ to US gal multiplied by 0.003785: wrong way round"))
n2.add("Vs", "Tank selected (next catalogue size up)", "V_sel",
       "=INDEX(Tanks!A5:A12,MATCH({Vr},Tanks!A5:A12,1)+1)", "m³")
n2.add("tha", "Hold-up of the selected tank", "t_h,a",
       "={Vs}*({pmax}-{pmin})/1.01325*273.15/({tt}+273.15)/{QN}*60", "min")
n2.add("tha2", "Hold-up of the selected tank (operating manual)", "t_h,a2",
       "={Vs}*({pmax}-{pmin})/1.01325*273.15/({tt}+273.15)/{QN}", "min",
       planted=("unit-scale", "hours written as minutes: *60 missing"))
n2.add("mt", "Nitrogen stored at maximum pressure", "m_t",
       "={Vs}*({pmax}+1.01325)*100000/(296.8*({tt}+273.15))", "kg")
n2.add("mt2", "Nitrogen stored at maximum pressure (hand check)", "m_t2",
       "={Vs}*{pmax}*100000/(296.8*({tt}+273.15))", "kg",
       planted=("offset-scale", "gauge pressure in the gas law"))
n2.add("Dh", "Header bore (DN40 Sch 40)", "D_h", 40.9, "mm")
n2.add("Qact", "Header flow at maximum pressure, actual", "Q_act",
       "={Qd}*1.01325/({pmax}+1.01325)*({tt}+273.15)/273.15", "m³/h")
n2.add("vh", "Header velocity", "v_h", "={Qact}/3600/(PI()/4*({Dh}/1000)^2)", "m/s")
N2 = n2.finish()

USERS = {
    "A1": "Nitrogen users, unit 4 (invented demand survey)",
    "A2": "Sources: process datasheets (invented).",
    "A3": CAUTION,
    "A4": "User", "B4": "Flow [Nm³/h]", "C4": "Pressure needed [barg]", "D4": "Purity needed [%]",
    "A10": "Total / highest", "B10": "=SUM(B5:B9)", "C10": "=MAX(C5:C9)", "D10": "=MAX(D5:D9)",
}
for r, row in enumerate([("Reactor R-401 blanketing", 45, 3.5, 99.5),
                         ("Centrifuge C-402 inerting", 60, 4.5, 99.0),
                         ("Tank farm padding", 25, 1.0, 99.0),
                         ("Product dryer purge", 80, 5.2, 98.0),
                         ("Utility stations", 12, 5.5, 97.0)], start=5):
    for c, v in zip("ABCD", row):
        USERS[f"{c}{r}"] = v

AIRF = {
    "A1": "PSA air factor (feed air per unit nitrogen, both at normal state) by purity (invented "
          "maker's table)",
    "A3": CAUTION,
    "A4": "Purity [%]", "B4": "Air factor [-]",
}
for r, (p, a) in enumerate([(95.0, 2.1), (97.0, 2.5), (98.0, 2.8), (99.0, 3.3), (99.5, 3.9),
                            (99.9, 5.2)], start=5):
    AIRF[f"A{r}"], AIRF[f"B{r}"] = p, a

TANKS = {
    "A1": "Buffer tank catalogue sizes (invented); 1 m³ = 264.2 US gal (NIST SP 811 (2008) App. "
          "B.8)",
    "A3": CAUTION,
    "A4": "Volume [m³]", "B4": "Volume [US gal]",
}
for r, v in enumerate([1, 2, 3, 5, 8, 10, 15, 20], start=5):
    TANKS[f"A{r}"] = v
    TANKS[f"B{r}"] = f"=A{r}*264.2"

NITRO = {
    "trade": "process utilities: PSA nitrogen generator and buffer tank",
    "sheets": [("N2", N2), ("Users", USERS), ("AirFactor", AIRF), ("Tanks", TANKS)],
    "planted": dict(n2.planted),
}

# --------------------------------------------------------------------------------------------
# Book 4: steam main on a pipe rack: thermal expansion, loop legs and anchor loads (°C and °F,
# mm and in, expansion coefficient per °C and per °F, kN and lbf, MPa and psi)
# --------------------------------------------------------------------------------------------
RACK_SRC = (
    "Sources: ASME B31.3-2020: allowable displacement stress range S_A = f·(1.25·S_c + "
    "0.25·S_h), eq. (1a); A106 Gr. B basic allowable stress 138 MPa (20 ksi) up to 200 °C "
    "(Table A-1, from memory); modulus of elasticity of carbon steel at installation 203 GPa "
    "(29.4E6 psi, Table C-6, from memory); mean expansion coefficients of carbon steel from "
    "20 °C (Table C-1 restated per °C, from memory); guided cantilever: displacement stress "
    "σ = 3·E·D·Δ/L², end force F = 12·E·I·Δ/L³, and in US units L_ft = √(3·E·D·Δ/(144·S_A)) "
    "with E and S_A in psi, D and Δ in in (common practice; M. W. Kellogg Co., Design of Piping "
    "Systems, 2nd ed. (1956), from memory); saturation temperatures of steam, IAPWS-IF97 "
    "(rounded, from memory); 8 in Sch 40 pipe: OD 219.1 mm, wall 8.18 mm, 42.55 kg/m (ASME "
    "B36.10M, from memory); guide friction coefficient 0.3, steel on steel (common practice); "
    "1 in = 25.4 mm, 1 m = 3.281 ft, 1 kN = 224.8 lbf, 1 MPa = 145.04 psi, 1 bar = 14.504 psi "
    "(NIST SP 811 (2008) App. B.8); a difference of 1 °C = 1.8 °F, °F = 1.8·°C + 32 (NIST SP "
    "811 (2008) App. B.9); g = 9.81 m/s². Refinery, rack and all readings invented.")
rk = ItemSheet("Rack", "Penmoor refinery, rack 3: 10 barg steam main, thermal expansion, loop "
               "and anchor loads (invented scenario)", RACK_SRC)
rk.heading("Temperatures")
rk.add("pg", "Steam pressure", "p_g", 10, "barg")
rk.add("pa", "Steam pressure, absolute", "p_a", "={pg}+1.013", "bar a")
rk.add("tsat", "Saturation temperature (Steam sheet)", "t_sat", "=VLOOKUP({pa},Steam!A5:B13,2)",
       "°C")
rk.add("tsat2", "Saturation temperature (first pass)", "t_sat2", "=VLOOKUP({pg},Steam!A5:B13,2)",
       "°C", planted=("offset-scale", "gauge pressure looked up in a bar a column"))
rk.add("td", "Design temperature", "t_d", 200, "°C")
rk.add("chk", "Design temperature covers saturation", "check",
       "=IF({tsat}<={td},\"OK\",\"RAISE t_d\")")
rk.add("ti", "Installation temperature (winter tie-in)", "t_i", 5, "°C")
rk.add("dT", "Temperature rise, installation to design", "ΔT", "={td}-{ti}", "K")
rk.add("TK", "Design temperature, absolute", "T_d", "={td}+273.15", "K")
rk.add("TK2", "Design temperature, absolute (stress program input)", "T_d2", "={td}", "K",
       planted=("offset-scale", "°C reading set equal to a kelvin value"))
rk.add("tdF", "Design temperature, °F", "t_dF", "={td}*1.8+32", "°F")
rk.add("dTF", "Temperature rise, °F", "ΔT_F", "={dT}*1.8", "Δ°F")
rk.add("dTF2", "Temperature rise, °F (US check sheet)", "ΔT_F2", "={dT}*1.8+32", "Δ°F",
       planted=("offset-scale", "32 added to a temperature difference"))
rk.heading("Free expansion")
rk.add("al", "Mean expansion coefficient to design temperature", "α",
       "=VLOOKUP({td},Alpha!A5:B10,2)", "1/°C")
rk.add("alF", "Mean expansion coefficient, per °F", "α_F", "={al}/1.8", "1/°F")
rk.add("alF2", "Mean expansion coefficient, per °F (US datasheet)", "α_F2", "={al}*1.8", "1/°F",
       planted=("unit-scale", "per °C to per °F multiplied by 1.8: wrong way round"))
rk.add("L", "Anchor to anchor, loop at mid-span", "L", 64, "m")
rk.add("Lft", "Anchor to anchor, ft", "L_ft", "={L}*3.281", "ft")
rk.add("dm", "Free expansion between anchors", "δ", "={al}*{L}*1000*{dT}", "mm")
rk.add("din", "Free expansion, in", "δ_in", "={dm}/25.4", "in")
rk.add("din2", "Free expansion, in (US units throughout)", "δ_in,US", "={alF}*{Lft}*12*{dTF}", "in")
rk.heading("Pipe, 8 in Sch 40 carbon steel")
rk.add("OD", "Outside diameter", "D_o", 219.1, "mm")
rk.add("tw", "Wall thickness", "t", 8.18, "mm")
rk.add("ID", "Bore", "D_i", "={OD}-2*{tw}", "mm")
rk.add("Am", "Metal area", "A_m", "=PI()/4*({OD}^2-{ID}^2)", "mm²")
rk.add("Im", "Second moment of area", "I", "=PI()/64*({OD}^4-{ID}^4)", "mm⁴")
rk.add("ODin", "Outside diameter, in", "D_o,in", "={OD}/25.4", "in")
rk.add("E", "Modulus of elasticity at installation temperature", "E", 203, "GPa")
rk.add("EM", "Modulus of elasticity, MPa", "E_MPa", "={E}*1000", "MPa")
rk.add("Ep", "Modulus of elasticity, psi", "E_psi", "={EM}*145.04", "psi")
rk.heading("Fully restrained line (no loop), for comparison")
rk.add("sig", "Axial thermal stress, fully restrained", "σ", "={EM}*{al}*{dT}", "MPa")
rk.add("sigp", "Axial thermal stress, psi", "σ_psi", "={sig}*145.04", "psi")
rk.add("sigp2", "Axial thermal stress, psi (US check)", "σ_psi2", "={sig}*0.006895", "psi",
       planted=("unit-scale", "MPa to psi multiplied by 0.006895: wrong way round"))
rk.add("Fr", "Anchor force, fully restrained", "F_r", "={sig}*{Am}/1000", "kN")
rk.add("Fr2", "Anchor force, fully restrained (civil load list)", "F_r2", "={sig}*{Am}", "kN",
       planted=("unit-scale", "MPa × mm² gives N, written as kN: /1000 missing"))
rk.add("Frl", "Anchor force, fully restrained, lbf", "F_r,lbf", "={Fr}*224.8", "lbf")
rk.add("Frl2", "Anchor force, fully restrained, lbf (US vendor)", "F_r,lbf2", "={Fr}*4.448", "lbf",
       planted=("unit-scale", "kN to lbf multiplied by 4.448: wrong way round"))
rk.heading("Expansion loop")
rk.add("Sc", "Basic allowable stress, cold", "S_c", 138, "MPa")
rk.add("Sh", "Basic allowable stress, at design temperature", "S_h", 138, "MPa")
rk.add("fc", "Stress range factor (under 7000 cycles)", "f", 1.0, "-")
rk.add("SA", "Allowable displacement stress range", "S_A", "={fc}*(1.25*{Sc}+0.25*{Sh})", "MPa")
rk.add("SAp", "Allowable displacement stress range, psi", "S_A,psi", "={SA}*145.04", "psi")
rk.add("dl", "Displacement taken by each loop leg", "Δ_leg", "={dm}/2", "mm")
rk.add("Ll", "Loop leg length needed (guided cantilever)", "L_leg",
       "=SQRT(3*{EM}*{OD}*{dl}/{SA})/1000", "m")
rk.add("Ll2", "Loop leg length needed (rack drawing note)", "L_leg2",
       "=SQRT(3*{EM}*{OD}*{dl}/{SA})", "m",
       planted=("unit-scale", "root of mm² gives mm, written as m: /1000 missing"))
rk.add("Llf", "Loop leg length needed, US check", "L_leg,ft",
       "=SQRT(3*{Ep}*{ODin}*({dl}/25.4)/(144*{SAp}))", "ft")
rk.add("Ls", "Loop leg length chosen (next half metre)", "L_sel", "=ROUNDUP({Ll}*2,0)/2", "m")
rk.heading("Anchor loads with the loop")
rk.add("Fl", "Loop spring force at the anchor", "F_loop",
       "=12*{EM}*{Im}*{dl}/({Ls}*1000)^3/1000", "kN")
rk.add("wp", "Pipe mass per metre", "w_p", 42.55, "kg/m")
rk.add("wi", "Insulation and cladding mass per metre", "w_i", 9.5, "kg/m")
rk.add("wt", "Mass per metre, total (steam, no hydrotest)", "w", "={wp}+{wi}", "kg/m")
rk.add("mu", "Guide friction coefficient", "μ", 0.3, "-")
rk.add("Ff", "Guide friction at the anchor (half span)", "F_fr", "={mu}*{wt}*9.81*({L}/2)/1000",
       "kN")
rk.add("Ff2", "Guide friction at the anchor (civil load list)", "F_fr2", "={mu}*{wt}*({L}/2)/1000",
       "kN", planted=("result-unit", "mass per metre used as weight: g missing"))
rk.add("Fa", "Anchor load, loop and friction", "F_a", "={Fl}+{Ff}", "kN")
rk.add("Fal", "Anchor load, lbf", "F_a,lbf", "={Fa}*224.8", "lbf")
RACK = rk.finish()

ALPHA = {
    "A1": "Carbon steel: mean coefficient of thermal expansion from 20 °C (rounded, restated "
          "from memory of ASME B31.3-2020 Table C-1; check the table before use)",
    "A2": "Sources: as the Rack sheet.",
    "A3": CAUTION,
    "A4": "Temperature [°C]", "B4": "Mean coefficient [1/°C]",
}
for r, (t, a) in enumerate([(100, 11.9E-6), (150, 12.2E-6), (200, 12.5E-6), (250, 12.8E-6),
                            (300, 13.1E-6), (350, 13.4E-6)], start=5):
    ALPHA[f"A{r}"], ALPHA[f"B{r}"] = t, a

STEAM = {
    "A1": "Saturated steam: pressure and temperature (IAPWS-IF97, rounded, from memory)",
    "A2": "Sources: as the Rack sheet.",
    "A3": CAUTION,
    "A4": "Pressure [bar a]", "B4": "Saturation temperature [°C]",
}
for r, (p, t) in enumerate([(2, 120.2), (4, 143.6), (6, 158.8), (8, 170.4), (10, 179.9),
                            (11, 184.1), (12, 188.0), (14, 195.0), (16, 201.4)], start=5):
    STEAM[f"A{r}"], STEAM[f"B{r}"] = p, t

RACKB = {
    "trade": "piping: steam main thermal expansion, loop and anchor loads",
    "sheets": [("Rack", RACK), ("Alpha", ALPHA), ("Steam", STEAM)],
    "planted": dict(rk.planted),
}

BOOKS = {"blast-freezer": REFRIG, "quarry-sump": QUARRY, "nitrogen-psa": NITRO,
         "steam-rack": RACKB}

EXTRA = {}     # stem -> list of (comment, "Sheet!Cell rule")
MISSED = {}    # stem -> {"Sheet!Cell": "why"}
RENAMED = {}   # stem -> {"Sheet!Cell": rule plumb names, or (rule, why)}
MESSAGES = {}  # stem -> {"Sheet!Cell": "plumb's message, where it misleads"}
try:
    from review_notes import EXTRA, MISSED, RENAMED, MESSAGES  # noqa: F401,F811
except ImportError:
    pass


def main():
    write_books(HERE, BOOKS, {"EXTRA": EXTRA, "MISSED": MISSED, "RENAMED": RENAMED,
                              "MESSAGES": MESSAGES})


if __name__ == "__main__":
    main()
