#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review51), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; pattern after
corpus/sheets/review50/make_books.py.

Trades: an airport's de-icing truck fill and fluid heater; a recirculating fish farm's oxygen
and pumping; a winery's must chiller on a glycol loop; a cutter suction dredger's slurry
pipeline to a reclamation site. All scenarios, sites, firms, readings and catalogue data are
invented (demonstration only); the formulas and published factors are the trade's own, with
their sources named in a text cell at the top of each sheet ("from memory" where recalled and
not checked, "common practice" for a fact of the trade with no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and
its messages that mislead, are recorded in review_notes.py after running the frozen binary.

Run: python3 make_books.py  ->  *.xlsx and *.expect in this folder (nothing written elsewhere)
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
# Book 1: airport de-icing truck fill and fluid heater (US gal, L, %, kg/L, kg, lb, °C, °F, K,
# Δ°F, kJ/(kg·K), Btu/(lb·°F), kJ, kWh, Btu, Btu/h, kW, W, min, MJ/kg, gpm, L/s, m³/h, psig,
# psi, kPa, psia, bar(g), hp)
# --------------------------------------------------------------------------------------------
DEICE_SRC = (
    "Sources: Type I fluid sprayed heated, not below 60 °C (140 °F) at the nozzle, and a "
    "freeze-point buffer of at least 10 °C below the outside air temperature, SAE AS6285 / "
    "ARP4737 (from memory); propylene glycol and water freezing points, densities and specific "
    "heats, ASHRAE Handbook — Fundamentals (2017) ch. 31 (from memory; the fluid maker's data "
    "sheet governs); sensible heat Q = m·c_p·ΔT and heater time t = Q/P (common practice); "
    "tank loss Q = U·A·ΔT (common practice); ullage air expelled on heating by Charles's law at "
    "constant pressure, V_2 = V_1·T_2/T_1 with absolute temperatures (common practice); diesel "
    "lower heating value 42.8 MJ/kg and density 0.84 kg/L (EN 590 range, from memory); pump "
    "hydraulic power P = Q·Δp and hp = gpm·psi/(1714·η) (common practice); NIST SP 811 (2008) "
    "App. B.8: 1 US gal = 3.785 L, 1 lb = 0.4536 kg, 1 kW = 3412 Btu/h, 1 kJ = 0.9478 Btu, "
    "1 Btu/(lb·°F) = 4.187 kJ/(kg·K), 1 gpm = 0.06309 L/s, 1 psi = 6.895 kPa, "
    "1 bar = 14.5 psi; standard atmosphere 14.7 psia; °F = 1.8·°C + 32. Airport, truck, heater "
    "and readings invented.")
de = ItemSheet("Heater", "Kestrel Field Regional Airport (invented): remote de-icing pad, Type I "
               "truck fill and on-board fluid heater", DEICE_SRC)
de.heading("Truck tank and mix")
de.add("Vg", "Truck Type I tank, fill volume (US-built truck)", "V_t", 1800, "US gal")
de.add("VL", "Truck Type I tank, fill volume, L", "V_L", "={Vg}*3.785", "L")
de.add("VL2", "Truck Type I tank, fill volume, L (fuel-farm log)", "V_L2", "={Vg}/3.785", "L",
       planted=("unit-scale", "US gal to L divided by 3.785: wrong way round"))
de.add("cg", "Glycol in the mix, by volume (tonight's dilution)", "c_g", 40, "%")
de.add("Vc", "Glycol concentrate drawn for the fill", "V_c", "={VL}*{cg}/100", "L")
de.add("Vc2", "Glycol concentrate drawn (dispenser set-up)", "V_c2", "={VL}*{cg}", "L",
       planted=("unit-scale", "% used as a fraction: 100 too large"))
de.add("toat", "Outside air temperature, tonight's forecast low", "t_OAT", -9, "°C")
de.add("tfp", "Freezing point of the mix (Fluid sheet)", "t_fp",
       "=VLOOKUP({cg},Fluid!A6:E9,2,FALSE)", "°C")
de.add("buf", "Freeze-point buffer below the outside air (10 K at least)", "Δt_buf",
       "={toat}-{tfp}", "K")
de.add("rho", "Density of the mix (Fluid sheet)", "ρ", "=VLOOKUP({cg},Fluid!A6:E9,4,FALSE)",
       "kg/L")
de.add("cp", "Specific heat of the mix (Fluid sheet)", "c_p",
       "=VLOOKUP({cg},Fluid!A6:E9,5,FALSE)", "kJ/(kg·K)")
de.add("m", "Mass of fluid in the tank", "m", "={VL}*{rho}", "kg")
de.add("mlb", "Mass of fluid in the tank, lb", "m_lb", "={m}/0.4536", "lb")
de.heading("Heat-up")
de.add("t1", "Fluid temperature at fill (unheated storage tank)", "t_1", 5, "°C")
de.add("t2", "Tank set point for spraying", "t_2", 80, "°C")
de.add("dT", "Temperature rise", "ΔT", "={t2}-{t1}", "K")
de.add("t2F", "Tank set point, °F", "t_2,F", "={t2}*1.8+32", "°F")
de.add("dTF", "Temperature rise, Δ°F", "ΔT_F", "={dT}*1.8", "Δ°F")
de.add("dTF2", "Temperature rise, Δ°F (US maker's heater form)", "ΔT_F2", "={dT}*1.8+32", "Δ°F",
       planted=("offset-scale", "the +32 of a reading added to a difference"))
de.add("Q", "Heat to raise the tank", "Q", "={m}*{cp}*{dT}", "kJ")
de.add("QkWh", "Heat to raise the tank, kWh", "Q_kWh", "={Q}/3600", "kWh")
de.add("QBtu", "Heat to raise the tank, Btu", "Q_Btu", "={Q}*0.9478", "Btu")
de.add("cpUS", "Specific heat of the mix, US units", "c_p,US", "={cp}/4.187", "Btu/(lb·°F)")
de.add("QBtuc", "Heat to raise the tank, Btu (US check)", "Q_Btu,chk", "={mlb}*{cpUS}*{dTF}",
       "Btu")
de.heading("Heater and heat-up time")
de.add("Ph", "On-board heater output (maker's plate, invented)", "P_h", 1000000, "Btu/h")
de.add("PkW", "On-board heater output, kW", "P_kW", "={Ph}/3412", "kW")
de.add("PkW2", "On-board heater output, kW (fleet register)", "P_kW2", "={Ph}*0.2931", "kW",
       planted=("unit-scale", "Btu/h times 0.2931 gives W (0.2931 is kW per MBH), written as "
                              "kW: the /1000 missing"))
de.add("th", "Heat-up time, no losses", "t_h", "={Q}/{PkW}/60", "min")
de.add("th2", "Heat-up time (shift briefing)", "t_h2", "={Q}/{PkW}/3600", "min",
       planted=("unit-scale", "kJ over kW is seconds; /3600 gives hours, written as min: 60 too "
                              "small"))
de.add("U", "Tank shell overall coefficient (insulated, invented)", "U", 0.6, "W/(m²·K)")
de.add("At", "Tank shell area", "A_t", 28, "m²")
de.add("Ql", "Tank loss at the set point (upper bound)", "Q_l", "={U}*{At}*({t2}-{toat})", "W")
de.add("Pn", "Net heating into the fluid", "P_n", "={PkW}-{Ql}/1000", "kW")
de.add("Pn2", "Net heating into the fluid (first draft)", "P_n2", "={PkW}-{Ql}", "kW",
       planted=("unit-scale", "a loss in W taken from an output in kW"))
de.add("thn", "Heat-up time with the tank loss", "t_h,n", "={Q}/{Pn}/60", "min")
de.add("eta", "Heater efficiency (maker's figure, invented)", "η", 80, "%")
de.add("LHV", "Diesel lower heating value", "LHV", 42.8, "MJ/kg")
de.add("rhod", "Diesel density", "ρ_d", 0.84, "kg/L")
de.add("mf", "Diesel burnt per heat-up", "m_f", "={Q}/({eta}/100)/({LHV}*1000)", "kg")
de.add("mf2", "Diesel burnt per heat-up (fuel budget)", "m_f2",
       "={Q}/({eta}/100)/({LHV}*1000000)", "kg",
       planted=("unit-scale", "kJ over MJ/kg times a million: the 1000 doubled, 1000 too small"))
de.add("Vf", "Diesel burnt per heat-up, L", "V_f", "={mf}/{rhod}", "L")
de.heading("Tank vent")
de.add("Vug", "Ullage above the fill (tank drawing)", "V_u,gal", 150, "US gal")
de.add("Vu", "Ullage above the fill, L", "V_u", "={Vug}*3.785", "L")
de.add("Ve", "Air pushed out of the vent on heating", "V_e",
       "={Vu}*(({t2}+273.15)/({t1}+273.15)-1)", "L")
de.add("Ve2", "Air pushed out of the vent (vent sizing note)", "V_e2", "={Vu}*({t2}/{t1}-1)", "L",
       planted=("offset-scale", "°C readings in a gas-law ratio: absolute belongs"))
de.heading("Fill pump")
de.add("Qf", "Fill pump rate", "Q_f", 150, "gpm")
de.add("QfLs", "Fill pump rate, L/s", "Q_f,L", "={Qf}*0.06309", "L/s")
de.add("tf", "Fill time", "t_f", "={Vg}/{Qf}", "min")
de.add("ps", "Pump suction pressure (flooded from storage)", "p_s", 3, "psig")
de.add("pd", "Pump discharge pressure", "p_d", 55, "psig")
de.add("dp", "Pump differential pressure", "Δp", "={pd}-{ps}", "psi")
de.add("dpk", "Pump differential pressure, kPa", "Δp_kPa", "={dp}*6.895", "kPa")
de.add("etap", "Pump efficiency (maker's curve)", "η_p", 60, "%")
de.add("Pp", "Pump shaft power", "P_p", "={QfLs}*{dpk}/({etap}/100)/1000", "kW")
de.add("Php", "Pump brake horsepower (US check)", "P_hp", "={Qf}*{dp}/(1714*{etap}/100)", "hp")
de.add("pda", "Pump discharge pressure, absolute (site near sea level)", "p_d,a", "={pd}+14.7",
       "psia")
de.add("pdb", "Pump discharge pressure, bar(g)", "p_d,bar", "={pd}/14.5", "bar(g)")
de.add("pdb2", "Pump discharge pressure, bar a (hose rating form)", "p_d,bar2", "={pd}/14.5",
       "bar a", planted=("offset-scale", "a gauge reading converted and written as absolute: "
                                         "the atmosphere missing"))
DEICES = de.finish()

FLUID = {
    "A1": "Propylene glycol and water mixes (ASHRAE Fundamentals (2017) ch. 31 figures, from "
          "memory, rounded; the fluid maker's data sheet governs)",
    "A2": "Sources: ASHRAE Handbook — Fundamentals (2017) ch. 31 (from memory); °F = 1.8·°C + 32 "
          "(NIST SP 811 (2008) App. B.9).",
    "A3": CAUTION,
    "A5": "Glycol by volume [%]", "B5": "Freezing point [°C]", "C5": "Freezing point [°F]",
    "D5": "Density at 20 °C [kg/L]", "E5": "Specific heat at 40 °C [kJ/(kg·K)]",
}
for r, (c, tf, d, cp) in enumerate([(30, -12.8, 1.026, 3.87), (40, -21.1, 1.033, 3.74),
                                    (50, -33.5, 1.040, 3.56), (60, -51.1, 1.047, 3.39)],
                                   start=6):
    FLUID[f"A{r}"], FLUID[f"B{r}"], FLUID[f"D{r}"], FLUID[f"E{r}"] = c, tf, d, cp
    FLUID[f"C{r}"] = f"=B{r}*1.8+32"
FLUID["C8"] = "=B8/1.8+32"
FLUID_PLANTED = {"Fluid!C8": ("unit-scale", "°C to °F divided by 1.8: wrong way round")}

DEICEB = {
    "trade": "airport de-icing: Type I truck fill, glycol mix and on-board fluid heater",
    "sheets": [("Heater", DEICES), ("Fluid", FLUID)],
    "planted": {**de.planted, **FLUID_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 2: recirculating fish farm oxygen and pumping (t, %/d, kg/d, kg/h, kg/kg, mg/L, m³/h,
# m³/s, L/s, gpm, m³, min, 1/h, %, bar(g), bar a, kg/Nm³, Nm³/d, kWh/Nm³, kWh, mm, m², m/s, m,
# ft, kg/m³, kW, hp, MWh, °C, °F)
# --------------------------------------------------------------------------------------------
RAS_SRC = (
    "Sources: oxygen demand as a rate per kg of feed, 0.5 kg O2/kg feed for fish, biofilter and "
    "heterotrophs together, Timmons & Ebeling, Recirculating Aquaculture, 3rd ed. (2013) "
    "(from memory); flow to carry the oxygen Q = ṁ_O2/(DO_in − DO_out), 1 mg/L = 1 g/m³ "
    "(common practice); dissolved oxygen at air saturation 10.8 mg/L in fresh water at 12 °C "
    "and 101.325 kPa, Standard Methods 4500-O (from memory); saturation under pure oxygen in a "
    "pressurised cone scales with the oxygen's absolute partial pressure, Henry's law (common "
    "practice); oxygen 1.429 kg/Nm³ (0 °C, 101.325 kPa, from memory); PSA generator 1.0 kWh/Nm³ "
    "(maker's figure, invented); pump power P = ρ·g·Q·H (common practice), the pump trade's "
    "P(kW) = Q(m³/h)·H(m)/(367·η) and bhp = gpm·ft/(3960·η) (Hydraulic Institute, from "
    "memory); water 999.5 kg/m³ at 12 °C (from memory); g_n = 9.81 m/s² (SI Brochure 9th ed.); "
    "NIST SP 811 (2008) App. B.8: 1 m³/h = 4.403 gpm, 1 ft = 0.3048 m; °F = 1.8·°C + 32. Farm, "
    "tanks and readings invented.")
ox = ItemSheet("Oxygen", "Loch Varrish Smolt (invented): recirculating hatchery, oxygen demand, "
               "oxygen cone and main recirculation pumps", RAS_SRC)
ox.heading("Feed and oxygen demand")
ox.add("F", "Feed on the peak day (Tanks sheet)", "F", "=Tanks!G10", "kg/d")
ox.add("kO", "Oxygen per kg of feed (design allowance)", "k_O2", 0.5, "kg/kg")
ox.add("MO", "Oxygen demand", "ṁ_O2", "={F}*{kO}", "kg/d")
ox.add("MOh", "Oxygen demand, per hour", "ṁ_O2,h", "={MO}/24", "kg/h")
ox.heading("Recirculation flow")
ox.add("DOin", "Dissolved oxygen at the tank inlets (after the cone)", "DO_in", 14, "mg/L")
ox.add("DOout", "Dissolved oxygen at the tank outlets (design minimum)", "DO_out", 8, "mg/L")
ox.add("dDO", "Oxygen taken up across the tanks", "ΔDO", "={DOin}-{DOout}", "mg/L")
ox.add("Q", "Recirculation flow to carry the oxygen", "Q", "={MOh}*1000/{dDO}", "m³/h")
ox.add("Q2", "Recirculation flow (first draft)", "Q_2", "={MOh}/{dDO}", "m³/h",
       planted=("unit-scale", "kg/h over mg/L (g/m³) without the 1000: 1000 too small"))
ox.add("Qs", "Recirculation flow, m³/s", "Q_s", "={Q}/3600", "m³/s")
ox.add("QLs", "Recirculation flow, L/s", "Q_L", "={Q}/3.6", "L/s")
ox.add("Qgpm", "Recirculation flow, US gpm (pump maker)", "Q_US", "={Q}*4.403", "gpm")
ox.add("Vt", "Water in the tanks (Tanks sheet)", "V_t", "=Tanks!D10", "m³")
ox.add("HRT", "Mean hydraulic retention in the tanks", "HRT", "={Vt}/{Q}*60", "min")
ox.heading("Saturation and oxygen cone")
ox.add("tw", "Water temperature", "t_w", 12, "°C")
ox.add("twF", "Water temperature, °F (US feed supplier's tables)", "t_w,F", "={tw}*1.8+32", "°F")
ox.add("twF2", "Water temperature, °F (first draft)", "t_w,F2", "=({tw}-32)/1.8", "°F",
       planted=("unit-scale", "°C to °F by the °F-to-°C formula: wrong way round"))
ox.add("DOs", "Dissolved oxygen at air saturation, 12 °C fresh water", "DO_sat", 10.8, "mg/L")
ox.add("xO2", "Oxygen in air, by volume", "x_O2", 20.95, "%")
ox.add("Cp", "Saturation under pure oxygen at 1 atm", "C_O2", "={DOs}/({xO2}/100)", "mg/L")
ox.add("pc", "Oxygen cone operating pressure", "p_c", 1.2, "bar(g)")
ox.add("pat", "Atmospheric pressure (site near sea level)", "p_atm", 1.013, "bar a")
ox.add("pca", "Oxygen cone pressure, absolute", "p_c,a", "={pc}+{pat}", "bar a")
ox.add("Cc", "Saturation in the cone", "C_c", "={Cp}*{pca}/{pat}", "mg/L")
ox.add("Cc2", "Saturation in the cone (maker's form)", "C_c2", "={Cp}*{pc}/{pat}", "mg/L",
       planted=("offset-scale", "a gauge reading in the ratio of pressures: absolute belongs"))
ox.heading("Oxygen supply")
ox.add("ea", "Cone absorption efficiency", "η_a", 85, "%")
ox.add("MOs", "Oxygen to supply", "ṁ_s", "={MO}/({ea}/100)", "kg/d")
ox.add("MOs2", "Oxygen to supply (PSA order form)", "ṁ_s2", "={MO}/{ea}", "kg/d",
       planted=("unit-scale", "efficiency in % used as a fraction: 100 too small"))
ox.add("rN", "Oxygen, normal density", "ρ_N", 1.429, "kg/Nm³")
ox.add("VN", "Oxygen to supply, Nm³ per day", "V_N", "={MOs}/{rN}", "Nm³/d")
ox.add("spsa", "PSA generator specific power (maker, invented)", "e_PSA", 1.0, "kWh/Nm³")
ox.add("Epsa", "PSA electricity per day", "E_PSA", "={VN}*{spsa}", "kWh/d")
ox.heading("Main recirculation pumps")
ox.add("D", "Pump header, inside diameter", "D", 900, "mm")
ox.add("A", "Pump header, bore area", "A", "=PI()*({D}/1000)^2/4", "m²")
ox.add("v", "Velocity in the header", "v", "={Qs}/{A}", "m/s")
ox.add("v2", "Velocity in the header (first draft)", "v_2", "={Q}/{A}", "m/s",
       planted=("unit-scale", "a flow in m³/h over m² written as m/s: 3600 too large"))
ox.add("Hs", "Static lift, sump to degasser distribution", "H_s", 2.2, "m")
ox.add("Hf", "Friction and fittings, header and returns", "H_f", 1.4, "m")
ox.add("Hm", "UV channel and distribution losses", "H_m", 0.9, "m")
ox.add("H", "Total dynamic head", "H", "={Hs}+{Hf}+{Hm}", "m")
ox.add("Hft", "Total dynamic head, ft", "H_ft", "={H}/0.3048", "ft")
ox.add("Hft2", "Total dynamic head, ft (US pump curve)", "H_ft2", "={H}*0.3048", "ft",
       planted=("unit-scale", "m to ft multiplied by 0.3048: wrong way round"))
ox.add("rw", "Water density at 12 °C", "ρ_w", 999.5, "kg/m³")
ox.add("Ph", "Hydraulic power", "P_h", "={rw}*9.81*{Qs}*{H}/1000", "kW")
ox.add("Ph2", "Hydraulic power (first draft)", "P_h2", "={rw}*{Qs}*{H}/1000", "kW",
       planted=("result-unit", "g missing: ρ·Q·H is not a power"))
ox.add("etap", "Pump and motor efficiency (maker's curve)", "η_p", 72, "%")
ox.add("Pin", "Electrical input, pumps", "P_in", "={Ph}/({etap}/100)", "kW")
ox.add("Pin367", "Electrical input, 367 rule (check)", "P_in,chk", "={Q}*{H}/(367*{etap}/100)",
       "kW")
ox.add("bhp", "Brake horsepower, US check", "P_hp", "={Qgpm}*{Hft}/(3960*{etap}/100)", "hp")
ox.add("Ey", "Pump electricity per year (8760 h)", "E_y", "={Pin}*8760/1000", "MWh")
ox.add("Ey2", "Pump electricity per year (budget sheet)", "E_y2", "={Pin}*8760/1000/1000", "MWh",
       planted=("unit-scale", "kWh to MWh divided by 1000 twice: 1000 too small"))
OXS = ox.finish()

TANKS = {
    "A1": "Tank groups on the peak day (invented stock plan)",
    "A2": "Sources: feed = biomass × feeding rate (common practice); feeding rates from the "
          "invented feed table; stocking density = biomass/volume.",
    "A3": CAUTION,
    "A5": "Group", "B5": "Tanks [-]", "C5": "Volume each [m³]", "D5": "Volume [m³]",
    "E5": "Biomass [t]", "F5": "Feeding [%/d]", "G5": "Feed [kg/d]",
    "H5": "Stocking density [kg/m³]",
    "A10": "Total", "D10": "=SUM(D7:D9)", "E10": "=SUM(E7:E9)", "G10": "=SUM(G7:G9)",
}
for r, (name, n, v, b, f) in enumerate([("Fry", 8, 40, 12, 2.0), ("Parr", 6, 120, 38, 1.4),
                                        ("Smolt", 4, 250, 70, 1.0)], start=7):
    TANKS[f"A{r}"], TANKS[f"B{r}"], TANKS[f"C{r}"], TANKS[f"E{r}"], TANKS[f"F{r}"] = \
        name, n, v, b, f
    TANKS[f"D{r}"] = f"=B{r}*C{r}"
    TANKS[f"G{r}"] = f"=E{r}*1000*F{r}/100"
    TANKS[f"H{r}"] = f"=E{r}*1000/D{r}"
TANKS["H8"] = "=E8/D8"
TANKS_PLANTED = {"Tanks!H8": ("unit-scale", "t/m³ written as kg/m³: the ×1000 missing")}

RASB = {
    "trade": "aquaculture: recirculating hatchery oxygen demand, oxygen cone and pumping",
    "sheets": [("Oxygen", OXS), ("Tanks", TANKS)],
    "planted": {**ox.planted, **TANKS_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 3: winery must chiller on a glycol loop (t, h, t/h, %, kg/s, °C, °F, K, Δ°F,
# kJ/(kg·K), kW, TR, Btu/h, kg/L, L/s, m³/h, gpm, W/(m²·K), m², Btu/(W·h), kWh, L, kJ, min, kPa)
# --------------------------------------------------------------------------------------------
WINE_SRC = (
    "Sources: must heat capacity about 3.7 kJ/(kg·K), Boulton, Singleton, Bisson & Kunkee, "
    "Principles and Practices of Winemaking (1996) (from memory); stems 3 to 5 % of the fruit "
    "(common practice); sensible heat Q = ṁ·c_p·ΔT (common practice); 35 % propylene glycol "
    "by mass, 1.035 kg/L and 3.80 kJ/(kg·K) near 0 °C, ASHRAE Handbook — Fundamentals (2017) "
    "ch. 31 (from memory); LMTD = (ΔT_1 − ΔT_2)/ln(ΔT_1/ΔT_2) in counterflow and A = "
    "Q/(U·LMTD), Incropera, Fundamentals of Heat and Mass Transfer, 7th ed., ch. 11 (from "
    "memory); Carnot COP of a refrigerator T_e/(T_c − T_e) with absolute T_e (common "
    "practice); EER = 3.412·COP (common practice); pump power P = V̇·Δp/η (common practice); "
    "NIST SP 811 (2008) App. B.8: 1 TR = 3.517 kW = 12 000 Btu/h, 1 kW = 3412 Btu/h, 1 L/s = "
    "15.85 gpm = 3.6 m³/h; °F = 1.8·°C + 32. Winery, blocks "
    "and readings invented.")
wn = ItemSheet("Chiller", "Domaine des Trois Chênes (invented): white must chiller on the "
               "cellar's glycol loop, peak harvest day", WINE_SRC)
wn.heading("Must")
wn.add("Mg", "Grapes received on the peak day (Crush sheet)", "M_g", "=Crush!C10", "t")
wn.add("hc", "Crushing hours", "t_c", 10, "h")
wn.add("Mgh", "Crushing rate", "Ṁ_g", "={Mg}/{hc}", "t/h")
wn.add("ym", "Must after destemming, share of the grapes", "y_m", 96, "%")
wn.add("mm", "Must mass flow", "ṁ_m", "={Mgh}*1000*{ym}/100/3600", "kg/s")
wn.add("mm2", "Must mass flow (first draft)", "ṁ_m2", "={Mgh}*1000*{ym}/3600", "kg/s",
       planted=("unit-scale", "% used as a fraction: 100 too large"))
wn.add("tmi", "Must into the chiller, weighted mean fruit temperature (Crush sheet)", "t_mi",
       "=Crush!D10", "°C")
wn.add("tmo", "Must out of the chiller (settling)", "t_mo", 12, "°C")
wn.add("dTm", "Must temperature drop", "ΔT_m", "={tmi}-{tmo}", "K")
wn.add("tmiF", "Must into the chiller, °F", "t_mi,F", "={tmi}*1.8+32", "°F")
wn.add("tmiF2", "Must into the chiller, °F (US chiller maker's form)", "t_mi,F2", "={tmi}*1.8",
       "°F", planted=("offset-scale", "°C to °F without the +32"))
wn.add("cpm", "Specific heat of must", "c_p,m", 3.7, "kJ/(kg·K)")
wn.heading("Cooling load")
wn.add("Q", "Must cooling load", "Q", "={mm}*{cpm}*{dTm}", "kW")
wn.add("Q2", "Must cooling load (first draft)", "Q_2", "={Mgh}*1000*{ym}/100*{cpm}*{dTm}", "kW",
       planted=("unit-scale", "kg/h in a kW formula: kJ/h written as kW, the /3600 missing"))
wn.add("QTR", "Must cooling load, TR", "Q_TR", "={Q}/3.517", "TR")
wn.add("QTR2", "Must cooling load, TR (US chiller quote)", "Q_TR2", "={Q}*3.517", "TR",
       planted=("unit-scale", "kW to TR multiplied by 3.517: wrong way round"))
wn.add("QBtu", "Must cooling load, Btu/h", "Q_Btu", "={Q}*3412", "Btu/h")
wn.add("QTRc", "Must cooling load, TR (12 000 Btu/h check)", "Q_TR,chk", "={QBtu}/12000", "TR")
wn.heading("Glycol loop")
wn.add("rg", "Glycol density (35 % by mass, near 0 °C)", "ρ_g", 1.035, "kg/L")
wn.add("cpg", "Glycol specific heat (35 % by mass, near 0 °C)", "c_p,g", 3.80, "kJ/(kg·K)")
wn.add("tgs", "Glycol supply", "t_gs", -4, "°C")
wn.add("tgr", "Glycol return from the must chiller", "t_gr", 3, "°C")
wn.add("dTg", "Glycol temperature rise", "ΔT_g", "={tgr}-{tgs}", "K")
wn.add("Vg", "Glycol flow to the must chiller", "V_g", "={Q}/({rg}*{cpg}*{dTg})", "L/s")
wn.add("Vgm", "Glycol flow, m³/h", "V_g,h", "={Vg}*3.6", "m³/h")
wn.add("Vgm2", "Glycol flow, m³/h (valve schedule)", "V_g,h2", "={Vg}/3.6", "m³/h",
       planted=("unit-scale", "L/s to m³/h divided by 3.6: wrong way round"))
wn.add("Vggpm", "Glycol flow, gpm (US pump curve)", "V_g,US", "={Vg}*15.85", "gpm")
wn.add("dpg", "Glycol pump head (loop and chiller)", "Δp_g", 210, "kPa")
wn.add("etag", "Glycol pump and motor efficiency", "η_g", 62, "%")
wn.add("Pg", "Glycol pump input power", "P_g", "={Vg}*{dpg}/1000/({etag}/100)", "kW")
wn.heading("Must chiller (tube in tube, counterflow)")
wn.add("dT1", "Temperature difference, must inlet end", "ΔT_1", "={tmi}-{tgr}", "K")
wn.add("dT2", "Temperature difference, must outlet end", "ΔT_2", "={tmo}-{tgs}", "K")
wn.add("LMTD", "Log mean temperature difference", "LMTD", "=({dT1}-{dT2})/LN({dT1}/{dT2})", "K")
wn.add("U", "Overall coefficient (maker's selection, invented)", "U", 450, "W/(m²·K)")
wn.add("A", "Heat transfer area needed", "A", "={Q}*1000/({U}*{LMTD})", "m²")
wn.add("A2", "Heat transfer area needed (first draft)", "A_2", "={Q}/({U}*{LMTD})", "m²",
       planted=("unit-scale", "kW over W/(m²·K): 1000 too small"))
wn.heading("Chiller")
wn.add("te", "Evaporating temperature", "t_e", -9, "°C")
wn.add("tc", "Condensing temperature (air-cooled, harvest afternoon)", "t_c", 38, "°C")
wn.add("COPc", "Carnot COP", "COP_C", "=({te}+273.15)/({tc}-{te})", "-")
wn.add("COPc2", "Carnot COP (first draft)", "COP_C2", "={te}/({tc}-{te})", "-",
       planted=("offset-scale", "a °C reading in a ratio where the absolute temperature "
                                "belongs"))
wn.add("eII", "Second-law efficiency of the packaged chiller (invented)", "η_II", 50, "%")
wn.add("COP", "Expected COP", "COP", "={COPc}*{eII}/100", "-")
wn.add("EER", "Expected EER", "EER", "={COP}*3.412", "Btu/(W·h)")
wn.add("Pc", "Compressor input at the must load", "P_c", "={Q}/{COP}", "kW")
wn.heading("Day's energy")
wn.add("Ed", "Heat removed from the day's must (Crush sheet)", "E_d", "=Crush!E10", "kWh")
wn.add("Ehc", "Heat removed, load × crushing hours (check)", "E_chk", "={Q}*{hc}", "kWh")
wn.add("Vb", "Glycol buffer tank", "V_b", 6000, "L")
wn.add("tb0", "Buffer tank at start of the morning", "t_b0", 5, "°C")
wn.add("Qb", "Heat to pull the buffer down to the supply temperature", "Q_b",
       "={Vb}*{rg}*{cpg}*({tb0}-{tgs})", "kJ")
wn.add("Qch", "Chiller rated capacity at −4 °C glycol (maker, invented)", "Q_ch", 180, "kW")
wn.add("tpd", "Buffer pull-down time", "t_pd", "={Qb}/{Qch}/60", "min")
WINES = wn.finish()

CRUSH = {
    "A1": "Fruit received on the peak day, by block (invented weighbridge and probe readings)",
    "A2": "Sources: mean temperature weighted by mass (common practice); heat = mass × must "
          "share × c_p × (t − t_out), kJ/3600 = kWh (NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Block", "B5": "Variety", "C5": "Grapes [t]", "D5": "Fruit temperature [°C]",
    "E5": "Heat to remove [kWh]", "F5": "Must after destemming [kg]",
    "A10": "Total / weighted mean", "C10": "=SUM(C6:C9)",
    "D10": "=SUMPRODUCT(C6:C9,D6:D9)/SUM(C6:C9)", "E10": "=SUM(E6:E9)",
}
YM, CPM, TMO = wn.ref("ym"), wn.ref("cpm"), wn.ref("tmo")
for r, (blk, var, t, temp) in enumerate([("B3 east", "Chardonnay", 38, 27),
                                         ("B7 terrace", "Sauvignon blanc", 30, 24),
                                         ("C2 river", "Pinot gris", 22, 29),
                                         ("C5 slope", "Viognier", 10, 31)], start=6):
    CRUSH[f"A{r}"], CRUSH[f"B{r}"], CRUSH[f"C{r}"], CRUSH[f"D{r}"] = blk, var, t, temp
    CRUSH[f"E{r}"] = f"=C{r}*1000*{YM}/100*{CPM}*(D{r}-{TMO})/3600"
    CRUSH[f"F{r}"] = f"=C{r}*1000*{YM}/100"
CRUSH["F8"] = f"=C8*{YM}/100"
CRUSH_PLANTED = {"Crush!F8": ("unit-scale", "t written as kg: the ×1000 missing")}

WINEB = {
    "trade": "winery refrigeration: must chiller, glycol loop and chiller",
    "sheets": [("Chiller", WINES), ("Crush", CRUSH)],
    "planted": {**wn.planted, **CRUSH_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 4: dredger slurry pipeline (mm, m, m², m/s, ft/s, m³/s, m³/h, -, %, kg/m³, t/h, t/d,
# t/m³, m³/d, ha, d, kPa, bar, bar(g), bar a, kW, hp)
# --------------------------------------------------------------------------------------------
DREDGE_SRC = (
    "Sources: delivered volumetric concentration C_v = (S_m − S_w)/(S_s − S_w) and dry solids "
    "= Q·C_v·ρ_s; head loss of a settling slurry at high velocity taken as the equivalent "
    "fluid, i_m = i_w in m of mixture per m, with Darcy's h_f = f·(L/D)·v²/(2g) and minor "
    "losses K·v²/(2g); Durand's limit deposit velocity V_L = F_L·√(2·g·D·(S_s − S_w)/S_w), "
    "F_L 0.95 for fine sand d50 0.2 mm at C_v 15 % (Wilson, Addie & Clift, Slurry Transport "
    "Using Centrifugal Pumps, 3rd ed. (2006), from memory); quartz sand S_s 2.65, sea water "
    "S_w 1.025 (common practice); f = 0.0115 from Colebrook for new steel at Re ≈ 3.5·10⁶ "
    "(from memory); suction loss of the heavier column z·(S_m − S_w)/S_m (common practice); "
    "p = S_m·γ_w·H with γ_w = 9.81 kN/m³, head in m of water = S_m × head in m of mixture, "
    "P = S_m·γ_w·Q·H/η (common practice); NPSH_a = (p_abs − p_v)/(S_m·γ_w) + v²/(2g), "
    "sea water's vapour pressure 2.3 kPa at 20 °C (from memory); NIST SP 811 (2008) App. "
    "B.8: 1 ft = 0.3048 m (3.281 ft/m), 1 hp = 0.7457 kW, 1 bar = 100 kPa, 1 ha = 10 000 m²; "
    "site barometer 1.013 bar a. Dredger, site and readings invented.")
dr = ItemSheet("Pipeline", "Port Halvard reclamation (invented): cutter suction dredger Marram "
               "(invented), 700 mm discharge line to the fill area", DREDGE_SRC)
dr.heading("Line and flow")
dr.add("Dmm", "Discharge pipe, inside diameter", "D_mm", 700, "mm")
dr.add("D", "Discharge pipe, inside diameter, m", "D", "={Dmm}/1000", "m")
dr.add("A", "Bore area", "A", "=PI()*{D}^2/4", "m²")
dr.add("v", "Mixture velocity (design)", "v", 5.2, "m/s")
dr.add("vft", "Mixture velocity, ft/s", "v_ft", "={v}*3.281", "ft/s")
dr.add("Q", "Mixture flow", "Q", "={v}*{A}", "m³/s")
dr.add("Qh", "Mixture flow, m³/h", "Q_h", "={Q}*3600", "m³/h")
dr.heading("Mixture and production")
dr.add("Sw", "Sea water, specific gravity", "S_w", 1.025, "-")
dr.add("Ss", "Sand grains, specific gravity (quartz)", "S_s", 2.65, "-")
dr.add("Sm", "Mixture, specific gravity (density gauge)", "S_m", 1.28, "-")
dr.add("Cv", "Delivered volumetric concentration", "C_v", "=({Sm}-{Sw})/({Ss}-{Sw})*100", "%")
dr.add("rhos", "Sand grain density", "ρ_s", "={Ss}*1000", "kg/m³")
dr.add("Ws", "Dry solids delivered", "W_s", "={Qh}*{Cv}/100*{rhos}/1000", "t/h")
dr.add("Ws2", "Dry solids delivered (daily report)", "W_s2", "={Qh}*{Cv}*{rhos}/1000", "t/h",
       planted=("unit-scale", "% used as a fraction: 100 too large"))
dr.add("Ws3", "Dry solids delivered (first draft)", "W_s3", "={Qh}*{Cv}/100*{rhos}", "t/h",
       planted=("unit-scale", "kg/h written as t/h: the /1000 missing"))
dr.add("hrs", "Pumping hours per day", "t_p", 20, "h/d")
dr.add("Wd", "Dry solids per day", "W_d", "={Ws}*{hrs}", "t/d")
dr.add("rf", "Dry density of the placed fill", "ρ_f", 1.65, "t/m³")
dr.add("Vfd", "Fill placed per day", "V_f", "={Wd}/{rf}", "m³/d")
dr.add("Ar", "Reclamation area", "A_r", 42, "ha")
dr.add("hr", "Fill height", "h_r", 3.2, "m")
dr.add("Vr", "Fill volume needed", "V_r", "={Ar}*10000*{hr}", "m³")
dr.add("days", "Pumping days to finish", "n_d", "={Vr}/{Vfd}", "d")
dr.heading("Heads (m of mixture)")
dr.add("f", "Darcy friction factor", "f", 0.0115, "-")
dr.add("hv", "Velocity head", "h_v", "={v}^2/(2*9.81)", "m")
dr.add("Hf", "Line losses, friction and fittings (Line sheet)", "H_f", "=Line!E9", "m")
dr.add("Hst", "Static head, sea level to the discharge outlet", "H_st", 6.5, "m")
dr.add("zd", "Dredging depth below sea level", "z_d", 18, "m")
dr.add("hs", "Suction loss from the heavier column", "h_s", "={zd}*({Sm}-{Sw})/{Sm}", "m")
dr.add("H", "Total head on the pumps, m of mixture", "H", "={Hf}+{Hst}+{hv}+{hs}", "m")
dr.add("Hw", "Total head on the pumps, m of water column", "H_w", "={H}*{Sm}", "m")
dr.add("Hw2", "Total head on the pumps, m of water column (pump maker's form)", "H_w2",
       "={H}/{Sm}", "m",
       planted=("unit-scale", "head of mixture to head of water divided by S_m: wrong way round"))
dr.heading("Pumps")
dr.add("dp", "Pressure rise across the pumps", "Δp", "={H}*{Sm}*9.81", "kPa")
dr.add("dp2", "Pressure rise across the pumps (first draft)", "Δp_2", "={H}*{Sm}", "kPa",
       planted=("result-unit", "γ_w (g) missing: m times a pure number is not a pressure"))
dr.add("dpb", "Pressure rise across the pumps, bar", "Δp_bar", "={dp}/100", "bar")
dr.add("psg", "Suction gauge at the inboard pump (vacuum)", "p_s", -0.45, "bar(g)")
dr.add("pdg", "Discharge pressure", "p_d", "={psg}+{dpb}", "bar(g)")
dr.add("pat", "Site barometer", "p_atm", 1.013, "bar a")
dr.add("psa", "Suction pressure, absolute", "p_s,a", "={psg}+{pat}", "bar a")
dr.add("pv", "Vapour pressure of sea water at 20 °C", "p_v", 2.3, "kPa")
dr.add("NPSH", "NPSH available at the inboard pump", "NPSH_a",
       "=({psa}*100-{pv})/({Sm}*9.81)+{hv}", "m")
dr.add("NPSH2", "NPSH available (first draft)", "NPSH_a2", "=({psg}*100-{pv})/({Sm}*9.81)+{hv}",
       "m", planted=("offset-scale", "a gauge reading less an absolute vapour pressure"))
dr.add("eta", "Pump efficiency on slurry (water curve derated)", "η", 75, "%")
dr.add("P", "Pump shaft power, all pumps", "P", "={Sm}*9.81*{Q}*{H}/({eta}/100)", "kW")
dr.add("P2", "Pump shaft power (first draft)", "P_2", "={Sm}*9.81*{Qh}*{H}/({eta}/100)", "kW",
       planted=("unit-scale", "a flow in m³/h in a kW formula: 3600 too large"))
dr.add("Php", "Pump shaft power, hp", "P_hp", "={P}/0.7457", "hp")
dr.add("Php2", "Pump shaft power, hp (owner's report)", "P_hp2", "={P}*0.7457", "hp",
       planted=("unit-scale", "kW to hp multiplied by 0.7457: wrong way round"))
dr.heading("Deposit velocity")
dr.add("FL", "Durand's coefficient, fine sand at C_v 15 %", "F_L", 0.95, "-")
dr.add("VD", "Limit deposit velocity", "V_D", "={FL}*SQRT(2*9.81*{D}*({Ss}-{Sw})/{Sw})", "m/s")
dr.add("VD2", "Limit deposit velocity (first draft)", "V_D2",
       "={FL}*SQRT(2*9.81*{Dmm}*({Ss}-{Sw})/{Sw})", "m/s",
       planted=("unit-scale", "the diameter in mm under the root: √1000 too large"))
dr.add("VDft", "Limit deposit velocity, ft/s", "V_D,ft", "={VD}*3.281", "ft/s")
dr.add("mg", "Margin of the design velocity over the deposit velocity", "Δv", "={v}-{VD}", "m/s")
DREDGES = dr.finish()

F_, D_, HV = dr.ref("f"), dr.ref("D"), dr.ref("hv")
LINE = {
    "A1": "Discharge line sections (invented survey lengths; K from the invented fittings count)",
    "A2": "Sources: section loss = (f·L/D + ΣK)·v²/(2g), Darcy and the loss-coefficient method "
          "(Crane TP-410 (2009), from memory); equivalent fluid, m of mixture.",
    "A3": CAUTION,
    "A5": "Section", "B5": "Length [m]", "C5": "Length [ft]", "D5": "Fittings ΣK [-]",
    "E5": "Section loss [m]",
    "A9": "Total", "B9": "=SUM(B6:B8)", "E9": "=SUM(E6:E8)",
}
for r, (name, length, k) in enumerate([("Floating line (ball joints, rubber sleeves)", 600, 6.0),
                                       ("Submerged line", 1400, 2.0),
                                       ("Shore line to the outlet", 2300, 3.5)], start=6):
    LINE[f"A{r}"], LINE[f"B{r}"], LINE[f"D{r}"] = name, length, k
    LINE[f"C{r}"] = f"=B{r}*3.281"
    LINE[f"E{r}"] = f"=({F_}*B{r}/{D_}+D{r})*{HV}"
LINE["C7"] = "=B7/3.281"
LINE_PLANTED = {"Line!C7": ("unit-scale", "m to ft divided by 3.281: wrong way round")}

DREDGEB = {
    "trade": "dredging: slurry pipeline, concentration, production, heads and pump power",
    "sheets": [("Pipeline", DREDGES), ("Line", LINE)],
    "planted": {**dr.planted, **LINE_PLANTED},
}

BOOKS = {"deicing-truck-heater": DEICEB, "ras-oxygen-pumping": RASB,
         "winery-must-chiller": WINEB, "dredge-slurry-pipeline": DREDGEB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()
