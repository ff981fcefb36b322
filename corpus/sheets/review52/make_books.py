#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review52), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; pattern after
corpus/sheets/review51/make_books.py.

Trades: a swimming pool hall's dehumidification and pool water heating; a quarry's belt
conveyor and crusher drive; a municipal water booster station; a brewery's wort boil and
cooling. All scenarios, sites, firms, readings and catalogue data are invented (demonstration
only); the formulas and published factors are the trade's own, with their sources named in a
text cell at the top of each sheet ("from memory" where recalled and not checked, "common
practice" for a fact of the trade with no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and
its messages that mislead, are recorded in review_notes.py after running the reviewer's binary.

Run: python3 make_books.py  ->  *.xlsx, *.expect (and one sidecar) in this folder only
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
# Book 1: swimming pool hall dehumidification and pool water heating (m, m², ft², m³, US gal,
# °C, °F, K, %, kPa, kPa a, inHg, kg/(s·m²·kPa), kg/s, kg/h, lb/h, kJ/kg, Btu/lb, kW, W,
# Btu/h, MBH, g/kg, kg/m³, m³/h, cfm, L/s, 1/h, kJ, kWh, h, d, gpm, m³/d)
# --------------------------------------------------------------------------------------------
POOL_SRC = (
    "Sources: pool evaporation w_p = 4·10⁻⁵·A·(p_w − p_a)·F_a in kg/s with A in m² and vapour "
    "pressures in kPa, the still-air form of (0.089 + 0.0782·V)/Y, and activity factor F_a "
    "0.8 for a hotel pool, ASHRAE Handbook — HVAC Applications (2019) ch. 6, Natatoriums (from "
    "memory); p_w the saturation pressure at the water temperature, p_a the room air's vapour "
    "pressure = φ·p_sat(t_a); humidity ratio W = 0.622·p_v/(p − p_v), ASHRAE Handbook — "
    "Fundamentals (2017) ch. 1 (from memory); latent heat of water 2435 kJ/kg at 28 °C (steam "
    "tables, from memory); outdoor air to remove the moisture ṁ_da = w/(W_i − W_o) (common "
    "practice); dry air c_p 1.006 kJ/(kg·K) and moist air 1.16 kg/m³ at 30 °C, ASHRAE "
    "Fundamentals ch. 1 (from memory); density at another temperature and the same pressure by "
    "the gas law with absolute temperatures (common practice); water c_p 4.19 kJ/(kg·K) and "
    "996 kg/m³ at 28 °C (from memory); sensible heat Q = m·c_p·ΔT (common "
    "practice); NIST SP 811 (2008) App. B.8: 1 lb = "
    "0.4536 kg, 1 Btu/lb = 2.326 kJ/kg, 1 kW = 3412 Btu/h, 1 cfm = 1.699 m³/h, "
    "1 inHg (32 °F) = 3.386 kPa; °F = 1.8·°C + 32. Leisure centre, pool and readings "
    "invented.")
po = ItemSheet("Pool", "Harrowfield Leisure Centre (invented): hotel-type pool hall, "
               "dehumidification by outdoor air and pool water heating", POOL_SRC)
po.heading("Pool and hall")
po.add("L", "Pool length", "L", 25, "m")
po.add("W", "Pool width", "W", 12.5, "m")
po.add("A", "Pool water surface", "A", "={L}*{W}", "m²")
po.add("dep", "Mean water depth", "d", 1.5, "m")
po.add("V", "Pool water volume", "V", "={A}*{dep}", "m³")
po.heading("Design conditions")
po.add("tw", "Pool water temperature", "t_w", 28, "°C")
po.add("twF", "Pool water temperature, °F", "t_w,F", "={tw}*1.8+32", "°F")
po.add("twF2", "Pool water temperature, °F (dehumidifier selection form)", "t_w,F2",
       "={tw}*1.8", "°F", planted=("offset-scale", "°C to °F without the +32"))
po.add("ta", "Hall air temperature (2 K above the water)", "t_a", 30, "°C")
po.add("RH", "Hall relative humidity", "φ", 60, "%")
po.add("pw", "Saturation pressure at the water temperature (Psat sheet)", "p_w",
       "=VLOOKUP({tw},Psat!$A$6:$D$9,3,FALSE)", "kPa")
po.add("pas", "Saturation pressure at the hall air temperature (Psat sheet)", "p_s,a",
       "=VLOOKUP({ta},Psat!$A$6:$D$9,3,FALSE)", "kPa")
po.add("pa", "Vapour pressure of the hall air", "p_a", "={pas}*{RH}/100", "kPa")
po.add("pa2", "Vapour pressure of the hall air (first draft)", "p_a2", "={pas}*{RH}", "kPa",
       planted=("unit-scale", "% used as a fraction: 100 too large"))
po.add("dpv", "Vapour pressure difference, water surface to hall air", "Δp_v", "={pw}-{pa}",
       "kPa")
po.heading("Evaporation and latent load")
po.add("Ce", "Evaporation coefficient, still air over the pool", "C_e", 4.0e-5,
       "kg/(s·m²·kPa)")
po.add("Fa", "Activity factor (hotel pool)", "F_a", 0.8, "-")
po.add("We", "Evaporation", "w_p", "={Ce}*{A}*{dpv}*{Fa}", "kg/s")
po.add("Weh", "Evaporation, per hour", "w_p,h", "={We}*3600", "kg/h")
po.add("Weh2", "Evaporation, per hour (dehumidifier schedule)", "w_p,h2",
       "={Ce}*{A}*{dpv}*{Fa}", "kg/h",
       planted=("unit-scale", "a rate in kg/s written as kg/h: the 3600 missing"))
po.add("Welb", "Evaporation, lb/h", "w_p,lb", "={Weh}/0.4536", "lb/h")
po.add("hfg", "Latent heat of water at 28 °C", "h_fg", 2435, "kJ/kg")
po.add("hfgUS", "Latent heat of water, Btu/lb", "h_fg,US", "={hfg}/2.326", "Btu/lb")
po.add("Ql", "Latent load from the pool", "Q_l", "={We}*{hfg}", "kW")
po.add("QlB", "Latent load from the pool, Btu/h", "Q_l,Btu", "={Ql}*3412", "Btu/h")
po.add("QlB2", "Latent load from the pool, Btu/h (US maker's form)", "Q_l,Btu2", "={Ql}/3412",
       "Btu/h", planted=("unit-scale", "kW to Btu/h divided by 3412: wrong way round"))
po.add("QlBc", "Latent load, Btu/h (lb/h check)", "Q_l,chk", "={Welb}*{hfgUS}", "Btu/h")
po.heading("Outdoor air for moisture removal")
po.add("pat", "Site barometer", "p", 101.3, "kPa")
po.add("Wi", "Humidity ratio of the hall air", "W_i", "=0.622*{pa}/({pat}-{pa})*1000", "g/kg")
po.add("Wi2", "Humidity ratio of the hall air (first draft)", "W_i2",
       "=0.622*{pa}/({pat}-{pa})", "g/kg",
       planted=("unit-scale", "kg/kg written as g/kg: the ×1000 missing"))
po.add("Wo", "Humidity ratio outdoors, summer dehumidification design", "W_o", 10.5, "g/kg")
po.add("dW", "Moisture picked up by each kg of outdoor air", "ΔW", "={Wi}-{Wo}", "g/kg")
po.add("mda", "Outdoor air, dry air mass flow", "ṁ_da", "={Weh}/({dW}/1000)", "kg/h")
po.add("rhoa", "Hall air density at 30 °C", "ρ_a", 1.16, "kg/m³")
po.add("Va", "Outdoor air volume flow", "V̇_a", "={mda}/{rhoa}", "m³/h")
po.add("Vcfm", "Outdoor air volume flow, cfm (US maker)", "V̇_cfm", "={Va}/1.699", "cfm")
po.add("Vcfm2", "Outdoor air volume flow, cfm (first draft)", "V̇_cfm2", "={Va}*1.699", "cfm",
       planted=("unit-scale", "m³/h to cfm multiplied by 1.699: wrong way round"))
po.heading("Winter: heating the outdoor air")
po.add("to", "Outdoor winter design temperature", "t_o", -4, "°C")
po.add("cpa", "Specific heat of dry air", "c_p,a", 1.006, "kJ/(kg·K)")
po.add("Qv", "Heat to warm the outdoor air to the hall", "Q_v",
       "={mda}/3600*{cpa}*({ta}-{to})", "kW")
po.add("rhoo", "Outdoor air density at the winter design (fan selection)", "ρ_o",
       "={rhoa}*({ta}+273.15)/({to}+273.15)", "kg/m³")
po.add("rhoo2", "Outdoor air density at the winter design (first draft)", "ρ_o2",
       "={rhoa}*{ta}/{to}", "kg/m³",
       planted=("offset-scale", "°C readings in a gas-law ratio: absolute belongs"))
po.heading("Pool water heating")
po.add("cw", "Specific heat of water", "c_w", 4.19, "kJ/(kg·K)")
po.add("rhow", "Density of pool water at 28 °C", "ρ_w", 996, "kg/m³")
po.add("tm", "Mains make-up water temperature", "t_m", 10, "°C")
po.add("Qmu", "Heat to warm the make-up for evaporation", "Q_mu",
       "={Weh}/3600*{cw}*({tw}-{tm})", "kW")
po.add("Qwall", "Conduction through the pool tank (estimate, invented)", "Q_wall", 2500, "W")
po.add("Pd", "Steady pool heating duty", "P_d", "={Ql}+{Qmu}+{Qwall}/1000", "kW")
po.add("Pd2", "Steady pool heating duty (first draft)", "P_d2", "={Ql}+{Qmu}+{Qwall}", "kW",
       planted=("unit-scale", "a loss in W added to loads in kW"))
po.add("mp", "Mass of pool water", "m_p", "={V}*{rhow}", "kg")
po.add("Qh", "Heat to raise a fresh fill to the water temperature", "Q_h",
       "={mp}*{cw}*({tw}-{tm})", "kJ")
po.add("QhkWh", "Heat to raise a fresh fill, kWh", "Q_h,kWh", "={Qh}/3600", "kWh")
po.add("QhkWh2", "Heat to raise a fresh fill, kWh (energy budget)", "Q_h,kWh2",
       "={Qh}/3600/1000", "kWh",
       planted=("unit-scale", "kJ to kWh divided by 1000 as well: 1000 too small"))
po.add("Ph", "Pool heater plate exchanger output (invented selection)", "P_h", 350, "kW")
po.add("th", "Heat-up time of a fresh fill", "t_h", "={QhkWh}/{Ph}", "h")
po.add("PhB", "Pool heater output, Btu/h", "P_h,Btu", "={Ph}*3412", "Btu/h")
POOLS = po.finish()

PSAT = {
    "A1": "Saturation pressure of water (absolute), ASHRAE Handbook — Fundamentals (2017) ch. 1 "
          "Table 3 (from memory, rounded)",
    "A2": "Sources: ASHRAE Fundamentals (2017) ch. 1 (from memory); °F = 1.8·°C + 32; 1 inHg "
          "(32 °F) = 3.386 kPa, NIST SP 811 (2008) App. B.8.",
    "A3": CAUTION,
    "A5": "t [°C]", "B5": "t [°F]", "C5": "p_sat [kPa]", "D5": "p_sat [inHg]",
}
for r, (t, p) in enumerate([(27, 3.567), (28, 3.782), (29, 4.008), (30, 4.246)], start=6):
    PSAT[f"A{r}"], PSAT[f"C{r}"] = t, p
    PSAT[f"B{r}"] = f"=A{r}*1.8+32"
    PSAT[f"D{r}"] = f"=C{r}/3.386"
PSAT["D8"] = "=C8*3.386"
PSAT_PLANTED = {"Psat!D8": ("unit-scale", "kPa to inHg multiplied by 3.386: wrong way round")}

POOLB = {
    "trade": "natatorium HVAC: pool evaporation, dehumidification by outdoor air, pool heating",
    "sheets": [("Pool", POOLS), ("Psat", PSAT)],
    "planted": {**po.planted, **PSAT_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 2: quarry belt conveyor and crusher drive (t/h, ton/h, t/m³, m/s, fpm, mm, in, m², ft²,
# %, kg/m, m, -, kN, lbf, kW, hp, °, N/mm, lbf/in, rpm, N·m, lbf·ft, kWh/t, µm)
# --------------------------------------------------------------------------------------------
QUARRY_SRC = (
    "Sources: belt conveyor resistances after DIN 22101 (2011): main resistance F_H = f·L·g·"
    "[m'_R + (2·m'_G + m'_L)·cos δ], cos δ taken as 1 for this 3.6° slope, f = 0.020, "
    "secondary resistances by the length coefficient C (Tables sheet), slope resistance "
    "F_St = m'_L·g·H, drive force F_U = C·F_H + F_St, minimum tension for sag T = (m'_G + "
    "m'_L)·g·a/(8·(h/a)) (from memory); load per metre m'_L = Q/(3.6·v) with Q in t/h (common "
    "practice); Euler–Eytelwein T_2 ≥ F_U/(e^(μθ) − 1), θ in radians, μ 0.35 for a lagged "
    "pulley (CEMA, Belt Conveyors for Bulk Materials, 7th ed., from memory); theoretical load "
    "areas for 35° troughs and 20° surcharge (DIN 22101 / CEMA, from memory); motor torque "
    "M = 9550·P/n (common practice); Bond's law W = 10·W_i·(1/√P80 − 1/√F80), W_i in kWh/t, "
    "sizes in µm, Wills' Mineral Processing Technology, 8th ed. (from memory); NIST SP 811 "
    "(2008) App. B.8: 1 short ton = 0.9072 t, 1 m/s = 196.85 ft/min, 1 in = 25.4 mm, "
    "1 kN = 224.8 lbf, 1 hp = 0.7457 kW, 1 N/mm = 5.71 lbf/in."
    " Quarry, plant and readings invented.")
qy = ItemSheet("Conveyor", "Carn Dubh Quarry (invented): CV-03 secondary crusher feed conveyor "
               "and cone crusher drive", QUARRY_SRC)
qy.heading("Duty")
qy.add("Q", "Design capacity", "Q", 1000, "t/h")
qy.add("Qst", "Design capacity, short tons per hour (stph)", "Q_st", "={Q}/0.9072", "ton/h")
qy.add("Qst2", "Design capacity, stph (US crusher dealer)", "Q_st2", "={Q}*0.9072", "ton/h",
       planted=("unit-scale", "t/h to short tons per hour multiplied by 0.9072: wrong way "
                              "round"))
qy.add("rhob", "Bulk density, crushed granite", "ρ_b", 1.6, "t/m³")
qy.add("v", "Belt speed", "v", 2.5, "m/s")
qy.add("vfpm", "Belt speed, fpm", "v_fpm", "={v}*196.85", "fpm")
qy.add("vfpm2", "Belt speed, fpm (idler supplier)", "v_fpm2", "={v}*3.281", "fpm",
       planted=("unit-scale", "m/s to ft/s written as ft/min: the ×60 missing"))
qy.add("B", "Belt width", "B", 1000, "mm")
qy.add("Bin", "Belt width, in", "B_in", "={B}/25.4", "in")
qy.heading("Belt loading")
qy.add("Al", "Load cross-section needed", "A_l", "={Q}/(3600*{rhob}*{v})", "m²")
qy.add("Ath", "Theoretical load cross-section, 35°/20° (Tables sheet)", "A_th",
       "=VLOOKUP({B},Tables!$A$6:$C$11,3,FALSE)", "m²")
qy.add("fill", "Belt fill", "φ", "={Al}/{Ath}*100", "%")
qy.add("mL", "Load per metre of belt", "m'_L", "={Q}/(3.6*{v})", "kg/m")
qy.add("mL2", "Load per metre of belt (first draft)", "m'_L2", "={Q}/{v}", "kg/m",
       planted=("unit-scale", "t/h over m/s without the 3.6: 3.6 too large"))
qy.add("mR", "Idler rotating parts per metre, carry and return", "m'_R", 22, "kg/m")
qy.add("mG", "Belt per metre (EP 630/4, 1000 mm)", "m'_G", 18, "kg/m")
qy.heading("Resistances and drive")
qy.add("Lc", "Conveyor length, centres", "L", 350, "m")
qy.add("H", "Lift", "H", 22, "m")
qy.add("f", "Artificial friction coefficient", "f", 0.020, "-")
qy.add("C", "Length coefficient for secondary resistances (Tables sheet)", "C",
       "=VLOOKUP({Lc},Tables!$F$6:$G$13,2,TRUE)", "-")
qy.add("FH", "Main resistance", "F_H", "={f}*{Lc}*9.81*({mR}+2*{mG}+{mL})/1000", "kN")
qy.add("FSt", "Slope resistance (lift)", "F_St", "={mL}*9.81*{H}/1000", "kN")
qy.add("FSt2", "Slope resistance (first draft)", "F_St2", "={mL}*{H}/1000", "kN",
       planted=("result-unit", "g missing: kg/m times m is a mass, not a force"))
qy.add("FU", "Drive force at the pulley", "F_U", "={C}*{FH}+{FSt}", "kN")
qy.add("FUl", "Drive force at the pulley, lbf", "F_U,lbf", "={FU}*224.8", "lbf")
qy.add("FUl2", "Drive force at the pulley, lbf (US pulley maker)", "F_U,lbf2", "={FU}/4.448",
       "lbf", planted=("unit-scale", "kN taken as N in N to lbf: 1000 too small"))
qy.add("PA", "Power at the drive pulley", "P_A", "={FU}*{v}", "kW")
qy.add("etad", "Drive efficiency, gearbox and coupling", "η_d", 94, "%")
qy.add("PM", "Motor power needed", "P_M", "={PA}/({etad}/100)", "kW")
qy.add("PMhp", "Motor power needed, hp", "P_M,hp", "={PM}/0.7457", "hp")
qy.add("PMhp2", "Motor power needed, hp (US dealer's quote)", "P_M,hp2", "={PM}*0.7457", "hp",
       planted=("unit-scale", "kW to hp multiplied by 0.7457: wrong way round"))
qy.heading("Belt tensions")
qy.add("mu", "Friction coefficient, lagged drive pulley", "μ", 0.35, "-")
qy.add("th", "Wrap angle on the drive pulley", "θ", 200, "°")
qy.add("eu", "Euler factor", "e^(μθ)", "=EXP({mu}*RADIANS({th}))", "-")
qy.add("eu2", "Euler factor (first draft)", "e^(μθ)2", "=EXP({mu}*{th})", "-",
       planted=("unit-scale", "wrap angle in degrees in the exponent: radians belong"))
qy.add("T2", "Slack-side tension for no slip", "T_2,slip", "={FU}/({eu}-1)", "kN")
qy.add("ao", "Carry idler spacing", "a_o", 1.2, "m")
qy.add("hr", "Allowed sag between carry idlers", "h/a", 1.0, "%")
qy.add("Ts", "Minimum tension for sag", "T_sag", "=({mG}+{mL})*9.81*{ao}/(8*{hr}/100)/1000",
       "kN")
qy.add("Ts2", "Minimum tension for sag (first draft)", "T_sag2",
       "=({mG}+{mL})*9.81*{ao}/(8*{hr})/1000", "kN",
       planted=("unit-scale", "% used as a fraction: 100 too small"))
qy.add("T2d", "Slack-side tension, design", "T_2", "=MAX({T2},{Ts})", "kN")
qy.add("T1d", "Tight-side tension, design", "T_1", "={T2d}+{FU}", "kN")
qy.add("kB", "Working tension per width of belt", "k", "={T1d}*1000/{B}", "N/mm")
qy.add("kBUS", "Working tension per width, lbf/in (PIW)", "k_US", "={kB}*5.71", "lbf/in")
qy.add("kN", "Belt rating, EP 630/4 breaking strength", "k_N", 630, "N/mm")
qy.add("SF", "Safety factor on the belt", "S", "={kN}/{kB}", "-")
qy.heading("Drive pulley and gearbox")
qy.add("D", "Drive pulley diameter over lagging", "D", 800, "mm")
qy.add("nd", "Drive pulley speed", "n_d", "={v}*60/(PI()*{D}/1000)", "rpm")
qy.add("nd2", "Drive pulley speed (gearbox enquiry)", "n_d2", "={v}*60/(PI()*{D})", "rpm",
       planted=("unit-scale", "the diameter in mm where m belongs: 1000 too small"))
qy.add("nm", "Motor speed, 4-pole at 50 Hz", "n_m", 1485, "rpm")
qy.add("i", "Gearbox ratio", "i", "={nm}/{nd}", "-")
qy.add("Tq", "Motor torque needed", "M", "={PM}*9550/{nm}", "N·m")
qy.heading("Cone crusher drive")
qy.add("Wi", "Bond work index, granite (lab test, invented)", "W_i", 13, "kWh/t")
qy.add("F80", "Feed, 80 % passing", "F80", 150, "mm")
qy.add("P80", "Product, 80 % passing", "P80", 38, "mm")
qy.add("Wb", "Specific energy by Bond's law", "W",
       "=10*{Wi}*(1/SQRT({P80}*1000)-1/SQRT({F80}*1000))", "kWh/t")
qy.add("Pc", "Crusher power at the shaft", "P_c", "={Wb}*{Q}", "kW")
qy.add("etac", "Crusher V-belt drive and motor efficiency", "η_c", 92, "%")
qy.add("Pcm", "Crusher motor input", "P_c,m", "={Pc}/({etac}/100)", "kW")
qy.add("es", "Energy per tonne, conveyor and crusher", "e", "=({PM}+{Pcm})/{Q}", "kWh/t")
QUARRYS = qy.finish()

TABLES = {
    "A1": "Belt widths and theoretical load areas, 35° troughing, 20° surcharge (DIN 22101 / "
          "CEMA figures from memory, rounded); length coefficient C (DIN 22101, from memory)",
    "A2": "Sources: DIN 22101 (2011) and CEMA Belt Conveyors for Bulk Materials, 7th ed. (from "
          "memory); 1 in = 25.4 mm, NIST SP 811 (2008) App. B.8.",
    "A3": CAUTION,
    "A5": "Belt width [mm]", "B5": "Belt width [in]", "C5": "Load area [m²]",
    "F5": "Length [m]", "G5": "C [-]",
}
for r, (b, a) in enumerate([(800, 0.069), (1000, 0.110), (1200, 0.162), (1400, 0.224),
                            (1600, 0.296), (1800, 0.377)], start=6):
    TABLES[f"A{r}"], TABLES[f"C{r}"] = b, a
    TABLES[f"B{r}"] = f"=A{r}/25.4"
TABLES["B9"] = "=A9*25.4"
for r, (lc, c) in enumerate([(80, 1.92), (100, 1.78), (150, 1.58), (200, 1.45), (300, 1.31),
                             (400, 1.25), (500, 1.20), (1000, 1.09)], start=6):
    TABLES[f"F{r}"], TABLES[f"G{r}"] = lc, c
TABLES_PLANTED = {"Tables!B9": ("unit-scale", "mm to in multiplied by 25.4: wrong way round")}

QUARRYB = {
    "trade": "quarrying: belt conveyor resistances, tensions and drive; cone crusher power",
    "sheets": [("Conveyor", QUARRYS), ("Tables", TABLES)],
    "planted": {**qy.planted, **TABLES_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 3: municipal water booster station (L/d, ML/d, L/s, gpm, m³/h, mgd, m³/s, kPa(g), kPa a,
# kPa, psig, m, ft, mm, m², m/s, %, kW, W, hp, V, A, kWh/ML, kWh/MG, kWh/m³, kWh/d, min, L,
# US gal)
# --------------------------------------------------------------------------------------------
WATER_SRC = (
    "Sources: peak-hour demand = population × per-capita demand × peak factor (common "
    "practice; AWWA M32, from memory); head from pressure H = Δp/(ρ·g) with ρ_w·g = 9.81 "
    "kN/m³ (common practice); Hazen–Williams h_f = 10.67·L·Q^1.852/(C^1.852·D^4.87), SI, C = "
    "130 for lined ductile iron (from memory); NPSH_a = (p_s,abs − p_v)/(ρ·g) + v²/(2g) with "
    "the suction gauge at the pump flange, water's vapour pressure 2.3 kPa at 20 °C "
    "(Hydraulic Institute, from memory); pump power P = ρ·g·Q·H/η and bhp = gpm·ft/(3960·η) "
    "(common practice); three-phase current I = P/(√3·U·cos φ) (common practice); wire-to-"
    "water efficiency = hydraulic power/electrical input (common practice); hydropneumatic "
    "tank drawdown for a minimum cycle of T: V_d = Q·T/4, and Boyle's law with absolute "
    "pressures, V_t = V_d·(p_off + p_atm)/(p_off − p_on) (common practice); site barometer "
    "100.5 kPa at 70 m (standard atmosphere, from memory); static pressure = ρ·g·Δz (common "
    "practice); NIST SP 811 (2008) App. B.8: 1 L/s = 15.85 gpm, 1 ML = 0.2642 "
    "million US gal (MG), 1 US gal = 3.785 L, 1 psi = 6.895 kPa (1 kPa = 0.145 psi), 1 ft = "
    "0.3048 m (3.281 ft/m), 1 hp = 0.7457 kW. Water company, station and readings invented.")
wb = ItemSheet("Booster", "Kellerby Heights booster station (invented): duty/assist/standby "
               "pumps from the trunk main to the upper pressure zone", WATER_SRC)
wb.heading("Demand")
wb.add("pop", "Population served, design horizon", "N", 15000, "-")
wb.add("q", "Demand per resident, average day", "q", 216, "L/d")
wb.add("Qd", "Average day demand", "Q_d", "={pop}*{q}/1000000", "ML/d")
wb.add("Qmgd", "Average day demand, mgd", "Q_d,US", "={Qd}*0.2642", "mgd")
wb.add("PF", "Peak hour factor", "PF", 2.4, "-")
wb.add("Qp", "Peak hour flow, station design flow", "Q_p", "={Qd}*{PF}*1000000/86400", "L/s")
wb.add("Qp2", "Peak hour flow (first draft)", "Q_p2", "={Qd}*{PF}*1000000/3600", "L/s",
       planted=("unit-scale", "a flow per day divided by the seconds in an hour: 24 too "
                              "large"))
wb.add("Qgpm", "Peak hour flow, US gpm", "Q_p,US", "={Qp}*15.85", "gpm")
wb.add("Qgpm2", "Peak hour flow, US gpm (US pump catalogue)", "Q_p,US2", "={Qp}/15.85", "gpm",
       planted=("unit-scale", "L/s to gpm divided by 15.85: wrong way round"))
wb.heading("Pressures and head")
wb.add("ps", "Suction pressure from the trunk main, minimum", "p_s", 180, "kPa(g)")
wb.add("pd", "Discharge pressure needed at the header", "p_d", 550, "kPa(g)")
wb.add("psis", "Suction pressure, psig", "p_s,US", "={ps}/6.895", "psig")
wb.add("psid", "Discharge pressure, psig", "p_d,US", "={pd}*0.145", "psig")
wb.add("psid2", "Discharge pressure, psig (US valve maker)", "p_d,US2", "={pd}/0.145", "psig",
       planted=("unit-scale", "kPa to psi divided by 0.145: wrong way round"))
wb.add("pat", "Site barometer (70 m above sea level)", "p_atm", 100.5, "kPa a")
wb.add("psa", "Suction pressure, absolute", "p_s,a", "={ps}+{pat}", "kPa a")
wb.add("dp", "Pressure rise across the pumps", "Δp", "={pd}-{ps}", "kPa")
wb.add("Hp", "Pressure rise as head", "H_p", "={dp}/9.81", "m")
wb.add("Lh", "Station pipework, equivalent length", "L", 180, "m")
wb.add("D", "Station header, inside diameter", "D", 300, "mm")
wb.add("Chw", "Hazen–Williams C, cement-lined ductile iron", "C", 130, "-")
wb.add("Qs", "Peak hour flow, m³/s", "Q_s", "={Qp}/1000", "m³/s")
wb.add("hf", "Friction in the station pipework", "h_f",
       "=10.67*{Lh}*{Qs}^1.852/({Chw}^1.852*({D}/1000)^4.87)", "m")
wb.add("H", "Total pump head", "H", "={Hp}+{hf}", "m")
wb.add("Hft", "Total pump head, ft", "H_ft", "={H}*3.281", "ft")
wb.heading("Suction (NPSH)")
wb.add("As", "Header bore area", "A", "=PI()*({D}/1000)^2/4", "m²")
wb.add("vs", "Velocity in the suction header", "v_s", "={Qs}/{As}", "m/s")
wb.add("pv", "Vapour pressure of water at 20 °C", "p_v", 2.3, "kPa")
wb.add("NPSH", "NPSH available", "NPSH_a", "=({psa}-{pv})/9.81+{vs}^2/(2*9.81)", "m")
wb.add("NPSH2", "NPSH available (first draft)", "NPSH_a2", "=({ps}-{pv})/9.81+{vs}^2/(2*9.81)",
       "m", planted=("offset-scale", "a gauge reading less an absolute vapour pressure"))
wb.heading("Pumps (Curve sheet)")
wb.add("np", "Duty pumps running at peak", "n", 2, "-")
wb.add("Q1", "Flow per pump", "Q_1", "={Qp}/{np}", "L/s")
wb.add("Q1g", "Flow per pump, gpm", "Q_1,US", "={Q1}*15.85", "gpm")
wb.add("eta", "Pump efficiency at the duty (Curve sheet)", "η",
       "=VLOOKUP(ROUND({Q1},0),Curve!$A$6:$E$10,5,FALSE)", "%")
wb.add("Ph1", "Hydraulic power per pump", "P_h", "=9.81*{Q1}*{H}/1000", "kW")
wb.add("Ps1", "Shaft power per pump", "P_s", "={Ph1}/({eta}/100)", "kW")
wb.add("Ps1hp", "Shaft power per pump, hp", "P_s,hp", "={Ps1}/0.7457", "hp")
wb.add("bhp", "Brake horsepower per pump (US check)", "P_bhp", "={Q1g}*{Hft}/(3960*{eta}/100)",
       "hp")
wb.add("etam", "Motor and drive efficiency (IE3 motor on a VFD)", "η_m", 94.5, "%")
wb.add("Pe", "Electrical input, duty pumps", "P_e", "={Ps1}/({etam}/100)*{np}", "kW")
wb.add("Paux", "Drive cooling fans and controls", "P_aux", 650, "W")
wb.add("Pt", "Station electrical input at peak", "P_t", "={Pe}+{Paux}/1000", "kW")
wb.add("Pt2", "Station electrical input at peak (first draft)", "P_t2", "={Pe}+{Paux}", "kW",
       planted=("unit-scale", "auxiliaries in W added to pumps in kW"))
wb.add("Ul", "Supply voltage, line to line", "U", 400, "V")
wb.add("pf", "Power factor at the drive input", "cos φ", 0.95, "-")
wb.add("I", "Line current per pump drive", "I", "={Ps1}/({etam}/100)*1000/(SQRT(3)*{Ul}*{pf})",
       "A")
wb.add("eww", "Wire-to-water efficiency", "η_ww", "={Ph1}*{np}/{Pt}*100", "%")
wb.heading("Energy intensity")
wb.add("Eml", "Energy per volume pumped at peak", "e", "={Pt}/({Qp}*3.6/1000)", "kWh/ML")
wb.add("Eml2", "Energy per volume pumped (board report)", "e_2", "={Pt}/({Qp}*3.6)", "kWh/ML",
       planted=("unit-scale", "L/s times 3.6 is m³/h, not ML/h: the /1000 missing, 1000 too "
                              "small"))
wb.add("Emg", "Energy per volume pumped, per million US gallons", "e_US", "={Eml}*3.785",
       "kWh/MG")
wb.heading("Hydropneumatic tank for low flow")
wb.add("Qj", "Jockey pump flow", "Q_j", 8, "L/s")
wb.add("tc", "Minimum motor cycle (10 starts an hour)", "T_c", 6, "min")
wb.add("Vd", "Drawdown volume needed", "V_d", "={Qj}*{tc}*60/4", "L")
wb.add("pon", "Cut-in pressure", "p_on", 550, "kPa(g)")
wb.add("poff", "Cut-out pressure", "p_off", 630, "kPa(g)")
wb.add("AF", "Drawdown as a share of the tank volume", "AF",
       "=({poff}-{pon})/({poff}+{pat})", "-")
wb.add("AF2", "Drawdown as a share of the tank volume (tank maker's form)", "AF_2",
       "=({poff}-{pon})/{poff}", "-",
       planted=("offset-scale", "a gauge reading in Boyle's ratio: absolute belongs"))
wb.add("Vt", "Tank volume", "V_t", "={Vd}/{AF}", "L")
wb.heading("Upper zone")
wb.add("dz", "Hill Crest hydrant above the station", "Δz", 28, "m")
wb.add("php", "Static pressure at Hill Crest, no flow", "p_hc", "={pd}-9.81*{dz}", "kPa(g)")
wb.add("php2", "Static pressure at Hill Crest (first draft)", "p_hc2", "={pd}-{dz}", "kPa(g)",
       planted=("sum-mismatch", "a height in m taken from a pressure: ρ·g missing"))
WATERS = wb.finish()

CURVE = {
    "A1": "Duty pump curve at rated speed (maker's test sheet, invented)",
    "A2": "Sources: maker's curve (invented, gpm column as the maker prints it); 1 m = 3.281 ft, NIST SP 811 "
          "(2008) App. B.8.",
    "A3": CAUTION,
    "A5": "Flow [L/s]", "B5": "Flow [gpm]", "C5": "Head [m]", "D5": "Head [ft]",
    "E5": "Efficiency [%]",
}
for r, (q, h, e) in enumerate([(15, 48.5, 55), (30, 45, 72), (45, 40, 79), (60, 33, 76),
                               (75, 24, 64)], start=6):
    CURVE[f"A{r}"], CURVE[f"C{r}"], CURVE[f"E{r}"] = q, h, e
    CURVE[f"B{r}"] = round(q * 15.85, 1)
    CURVE[f"D{r}"] = f"=C{r}*3.281"
CURVE["D8"] = "=C8/3.281"
CURVE_PLANTED = {"Curve!D8": ("unit-scale", "m to ft divided by 3.281: wrong way round")}

WATERB = {
    "trade": "water supply: booster station demand, heads, NPSH, power, energy intensity, tank",
    "sheets": [("Booster", WATERS), ("Curve", CURVE)],
    "planted": {**wb.planted, **CURVE_PLANTED},
    "sidecar": ("# Kellerby Heights booster (invented): the US utility's million gallons.\n"
                "# A dimensionally consistent formula can still be wrong; this check does not "
                "replace independent review under local codes and licensed practice.\n"
                "measure MG = 1000000 gal \"million US gallons\"\n"),
}

# --------------------------------------------------------------------------------------------
# Book 4: brewery wort boil and cooling (hL, bbl, % w/w (°P), -, kg/L, kg, lb, %/h, min, °C,
# °F, K, kJ/(kg·K), kJ/kg, kJ, kWh, kWh/hL, bar(g), bar a, kW, kg/h, lb/h, Btu/h, kg/s, L/s,
# hL/h, gpm, W/(m²·K), m²)
# --------------------------------------------------------------------------------------------
BREW_SRC = (
    "Sources: specific gravity from degrees Plato SG = 1 + °P/(258.6 − 227.1·°P/258.2), "
    "ASBC Methods of Analysis (from memory), °P being % extract by mass; wort density = SG × "
    "water's 0.9982 kg/L at 20 °C (from memory); US beer barrel = 31 US gal = 1.1735 hL (27 "
    "CFR 25.11, from memory; not the 42 gal oil barrel); evaporation 6 % of kettle-full per "
    "hour (common practice, Kunze, Technology Brewing and Malting, 6th ed., from memory); wort "
    "c_p 3.95 kJ/(kg·K) at 12 °P (from memory); latent heat of water at 100 °C 2257 kJ/kg and "
    "saturated steam properties, IAPWS-IF97 steam tables (from memory, Steam sheet); steam "
    "rate = heat rate/h_fg of the supply steam (common practice); sensible heat Q = m·c_p·ΔT "
    "(common practice); counterflow LMTD and A = Q/(U·LMTD), Incropera, Fundamentals of Heat "
    "and Mass Transfer, 7th ed. (from memory); water c_p 4.19 kJ/(kg·K) (from memory); NIST SP "
    "811 (2008) App. B.8: 1 lb = 0.4536 kg, 1 kW = 3412 Btu/h, 1 L/s = 36 hL/h; °F = 1.8·°C + 32, K = °C + 273.15; standard atmosphere 1.013 bar. "
    "Brewery, brewhouse and readings invented.")
br = ItemSheet("Brewhouse", "Tollgate Lane Brewing (invented): 50 hL brewhouse, kettle boil on "
               "steam and wort cooling with hot liquor recovery", BREW_SRC)
br.heading("Brew")
br.add("Vko", "Cast-out volume (knock-out), cold", "V_ko", 50, "hL")
br.add("Vbbl", "Cast-out volume, US beer barrels", "V_bbl", "={Vko}/1.1735", "bbl")
br.add("OG", "Original gravity, °P (extract by mass)", "OG", 12, "% w/w")
br.add("SG", "Specific gravity of the wort", "SG", "=1+{OG}/(258.6-({OG}/258.2)*227.1)", "-")
br.add("rw", "Density of water at 20 °C", "ρ_w", 0.9982, "kg/L")
br.add("rho", "Density of the wort at 20 °C", "ρ", "={SG}*{rw}", "kg/L")
br.add("mko", "Mass of wort cast out", "m_ko", "={Vko}*100*{rho}", "kg")
br.add("mx", "Extract in the cast-out wort", "m_x", "={mko}*{OG}/100", "kg")
br.add("mx2", "Extract in the cast-out wort (malt order check)", "m_x2", "={mko}*{OG}", "kg",
       planted=("unit-scale", "% used as a fraction: 100 too large"))
br.heading("Kettle boil")
br.add("ev", "Evaporation rate, share of kettle-full per hour", "ε", 6, "%/h")
br.add("tb", "Boil time", "t_b", 70, "min")
br.add("Vpre", "Kettle-full volume before the boil", "V_pre", "={Vko}/(1-{ev}/100*{tb}/60)",
       "hL")
br.add("Vev", "Volume evaporated", "V_ev", "={Vpre}-{Vko}", "hL")
br.add("mev", "Water evaporated", "m_ev", "={Vev}*100*{rw}", "kg")
br.add("mev2", "Water evaporated (first draft)", "m_ev2", "={Vev}*{rw}", "kg",
       planted=("unit-scale", "hL times kg/L without the 100 L/hL: 100 too small"))
br.add("mpre", "Wort in the kettle before the boil (at cast-out density)", "m_pre",
       "={Vpre}*100*{rho}", "kg")
br.add("cpw", "Specific heat of the wort", "c_p", 3.95, "kJ/(kg·K)")
br.add("tl", "Wort from the lauter tun", "t_l", 74, "°C")
br.add("tbo", "Boiling temperature at the kettle", "t_bo", 100, "°C")
br.add("tboF", "Boiling temperature, °F", "t_bo,F", "={tbo}*1.8+32", "°F")
br.add("Qhu", "Heat to bring the kettle to the boil", "Q_hu", "={mpre}*{cpw}*({tbo}-{tl})", "kJ")
br.add("hfgw", "Latent heat of water at 100 °C", "h_fg,w", 2257, "kJ/kg")
br.add("Qev", "Heat to evaporate", "Q_ev", "={mev}*{hfgw}", "kJ")
br.add("etak", "Kettle thermal efficiency (losses to the room)", "η_k", 92, "%")
br.add("Qt", "Steam heat per brew, heat-up and boil", "Q_t", "=({Qhu}+{Qev})/({etak}/100)", "kJ")
br.add("QtkWh", "Steam heat per brew, kWh", "Q_t,kWh", "={Qt}/3600", "kWh")
br.add("ehL", "Steam heat per hL cast out", "e", "={QtkWh}/{Vko}", "kWh/hL")
br.heading("Steam to the kettle")
br.add("ps", "Steam pressure at the calandria control valve outlet", "p_s", 3.0, "bar(g)")
br.add("pat", "Standard atmosphere", "p_atm", 1.013, "bar a")
br.add("psa", "Steam pressure, absolute", "p_s,a", "={ps}+{pat}", "bar a")
br.add("Ts", "Saturation temperature of the steam (Steam sheet)", "t_s",
       "=VLOOKUP({psa},Steam!$A$6:$D$9,2,TRUE)", "°C")
br.add("hfg", "Latent heat of the steam (Steam sheet)", "h_fg",
       "=VLOOKUP({psa},Steam!$A$6:$D$9,4,TRUE)", "kJ/kg")
br.add("hfg2", "Latent heat of the steam (first draft)", "h_fg2",
       "=VLOOKUP({ps},Steam!$A$6:$D$9,4,TRUE)", "kJ/kg",
       planted=("offset-scale", "a gauge pressure looked up in a table of absolute pressures"))
br.add("Pb", "Heat rate during the boil", "P_b", "={Qev}/({etak}/100)/({tb}*60)", "kW")
br.add("Pb2", "Heat rate during the boil (first draft)", "P_b2", "={Qev}/({etak}/100)/{tb}",
       "kW", planted=("unit-scale", "kJ over minutes written as kW: 60 too large"))
br.add("ms", "Steam rate during the boil", "ṁ_s", "={Pb}*3600/{hfg}", "kg/h")
br.add("mslb", "Steam rate during the boil, lb/h", "ṁ_s,lb", "={ms}/0.4536", "lb/h")
br.add("mslb2", "Steam rate during the boil, lb/h (boiler house log)", "ṁ_s,lb2",
       "={ms}*0.4536", "lb/h",
       planted=("unit-scale", "kg/h to lb/h multiplied by 0.4536: wrong way round"))
br.heading("Wort cooling, plate exchanger with hot liquor recovery")
br.add("tw1", "Wort into the cooler (after the whirlpool rest)", "t_w1", 96, "°C")
br.add("tw2", "Wort out of the cooler (ale pitching)", "t_w2", 18, "°C")
br.add("tw2K", "Pitching temperature, K (yeast lab's growth model)", "T_w2", "={tw2}+273.15",
       "K")
br.add("tw2K2", "Pitching temperature, K (first draft)", "T_w2,2", "={tw2}", "K",
       planted=("offset-scale", "a °C reading set equal to kelvins"))
br.add("tko", "Knock-out time", "t_ko", 50, "min")
br.add("mw", "Wort mass flow", "ṁ_w", "={mko}/({tko}*60)", "kg/s")
br.add("Qc", "Cooling duty", "Q_c", "={mw}*{cpw}*({tw1}-{tw2})", "kW")
br.add("QcB", "Cooling duty, Btu/h", "Q_c,Btu", "={Qc}*3412", "Btu/h")
br.add("cw", "Specific heat of water", "c_w", 4.19, "kJ/(kg·K)")
br.add("tci", "Brewing liquor in, from the cold liquor tank", "t_ci", 8, "°C")
br.add("tco", "Brewing liquor out, to the hot liquor tank", "t_co", 80, "°C")
br.add("mcl", "Liquor mass flow", "ṁ_l", "={Qc}/({cw}*({tco}-{tci}))", "kg/s")
br.add("Vcl", "Liquor flow", "V̇_l", "={mcl}/{rw}", "L/s")
br.add("Vclh", "Liquor flow, hL/h", "V̇_l,h", "={Vcl}*36", "hL/h")
br.add("Vclh2", "Liquor flow, hL/h (flowmeter set-up)", "V̇_l,h2", "={Vcl}*3.6", "hL/h",
       planted=("unit-scale", "L/s to hL/h by 3.6 (the m³/h factor): 10 too small"))
br.add("dT1", "Temperature difference, wort inlet end", "ΔT_1", "={tw1}-{tco}", "K")
br.add("dT2", "Temperature difference, wort outlet end", "ΔT_2", "={tw2}-{tci}", "K")
br.add("LMTD", "Log mean temperature difference", "LMTD", "=({dT1}-{dT2})/LN({dT1}/{dT2})", "K")
br.add("LMTD2", "Log mean temperature difference (first draft)", "LMTD_2",
       "=({tw1}-{tw2})/LN({tw1}/{tw2})", "K",
       planted=("offset-scale", "°C readings in a ratio under LN"))
br.add("U", "Overall coefficient (maker's selection, invented)", "U", 3500, "W/(m²·K)")
br.add("Ap", "Plate area needed", "A", "={Qc}*1000/({U}*{LMTD})", "m²")
br.add("Ap2", "Plate area needed (first draft)", "A_2", "={Qc}/({U}*{LMTD})", "m²",
       planted=("unit-scale", "kW over W/(m²·K): 1000 too small"))
BREWS = br.finish()

STEAM = {
    "A1": "Saturated steam by pressure (IAPWS-IF97 steam tables, from memory, rounded)",
    "A2": "Sources: IAPWS-IF97 (from memory); °F = 1.8·°C + 32, NIST SP 811 "
          "(2008) App. B.9.",
    "A3": CAUTION,
    "A5": "p [bar a]", "B5": "t_sat [°C]", "C5": "t_sat [°F]", "D5": "h_fg [kJ/kg]",
}
for r, (p, t, h) in enumerate([(2.0, 120.2, 2201.6), (3.0, 133.5, 2163.5), (4.0, 143.6, 2133.4),
                               (5.0, 151.8, 2107.4)], start=6):
    STEAM[f"A{r}"], STEAM[f"B{r}"], STEAM[f"D{r}"] = p, t, h
    STEAM[f"C{r}"] = f"=B{r}*1.8+32"
STEAM["C9"] = "=(B9-32)/1.8"
STEAM_PLANTED = {"Steam!C9": ("unit-scale", "°C to °F by the °F-to-°C formula: wrong way "
                                            "round")}

BREWB = {
    "trade": "brewing: wort boil on steam, steam rate, wort cooling with hot liquor recovery",
    "sheets": [("Brewhouse", BREWS), ("Steam", STEAM)],
    "planted": {**br.planted, **STEAM_PLANTED},
}

BOOKS = {"pool-hall-dehumidification": POOLB, "quarry-conveyor-crusher": QUARRYB,
         "water-booster-station": WATERB, "brewery-wort-boil-cooling": BREWB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()
