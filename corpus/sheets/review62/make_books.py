#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review62), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; pattern after
corpus/sheets/review55/make_books.py.

Trades: a hospital's chilled-water plant and its energy metering; an ethanol plant's fermenter
cooling by glycol through a plate exchanger; a quarry pit's storm dewatering by a diesel pump;
a school's water-to-water heat pump on a borehole loop. All scenarios, sites, firms, readings
and maker's data are invented (demonstration only); the formulas and published factors are the
trade's own, with their sources named in a text cell at the top of each sheet ("from memory"
where recalled and not checked, "common practice" for a fact of the trade with no single
source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and
its messages that mislead, are recorded in review_notes.py after running the frozen binary.

Run: python3 make_books.py  ->  *.xlsx and *.expect in this folder (nothing written elsewhere)
A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.
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
# Book 1: hospital chilled-water plant and energy metering (°C, °F, K, Δ°F, L/s, gpm, kW, W,
# Btu/h, TR, kW/TR, Btu/(W·h), bar(g), bar a, bar, kPa, m, kg/m³, %, h, kWh, MWh, TR·h, $)
# --------------------------------------------------------------------------------------------
CHW_SRC = (
    "Sources: 1 TR (ton of refrigeration) = 12 000 Btu/h = 3.517 kW, 1 kW = 3412 Btu/h, "
    "1 L/s = 15.85 US gpm (NIST SP 811 (2008) App. B.8); °F = 1.8·°C + 32, K = °C + 273.15, "
    "g_n = 9.81 m/s² (SI Brochure 9th ed.); chilled-water load Q(kW) = 4.19·q(L/s)·ΔT(K), "
    "Q(Btu/h) = 500·gpm·ΔT(°F) and TR = gpm·ΔT(°F)/24 (ASHRAE Handbook, HVAC Systems and "
    "Equipment, common practice); COP = Q/P and EER = 12/(kW/TR) in Btu/(W·h) (AHRI 550/590, "
    "from memory); Carnot COP of a chiller = T_e/(T_c − T_e), absolute temperatures "
    "(thermodynamics textbooks, common practice); head H = Δp/(ρ·g), hydraulic power = Δp·q "
    "(kPa × L/s = W) (common practice); water 999.7 kg/m³ at 10 °C (IAPWS, from memory); "
    "1 bar = 100 kPa (SI Brochure 9th ed.). Hospital, plant, meters, tariff and readings "
    "invented.")
ch = ItemSheet("Plant", "St Aldric's Hospital (invented): central chilled-water plant, two "
               "of three 600 TR centrifugal chillers on line, July metering review", CHW_SRC)
ch.heading("Chilled-water flow and load")
ch.add("ts", "Chilled-water supply temperature (plant header)", "t_s", 6.7, "°C")
ch.add("tr", "Chilled-water return temperature (plant header)", "t_r", 12.8, "°C")
ch.add("tsF", "Chilled-water supply temperature, °F (US chiller maker)", "t_s,F",
       "={ts}*1.8+32", "°F")
ch.add("dT", "Chilled-water temperature difference, return less supply", "ΔT",
       "={tr}-{ts}", "K")
ch.add("dTF", "Chilled-water temperature difference, °F", "ΔT_F", "={dT}*1.8", "Δ°F")
ch.add("q", "Chilled-water flow (ultrasonic meter on the common return)", "q", 95, "L/s")
ch.add("qgpm", "Chilled-water flow, US gpm", "q_US", "={q}*15.85", "gpm")
ch.add("Q", "Cooling load", "Q", "=4.19*{q}*{dT}", "kW")
ch.add("QB", "Cooling load, Btu/h (US check, 500·gpm·ΔT)", "Q_US", "=500*{qgpm}*{dTF}",
       "Btu/h")
ch.add("QTR", "Cooling load, tons of refrigeration", "Q_TR", "={Q}/3.517", "TR")
ch.add("QTR2", "Cooling load, tons (monthly report, first draft)", "Q_TR2", "={Q}*3.517", "TR",
       planted=("unit-scale", "kW to TR multiplied by 3.517: wrong way round"))
ch.add("QTRus", "Cooling load, tons (US check, gpm·ΔT/24)", "Q_TR,US", "={qgpm}*{dTF}/24",
       "TR")
ch.add("QTRb", "Cooling load, tons from Btu/h", "Q_TR,B", "={QB}/12000", "TR")
ch.add("QTRb2", "Cooling load, tons from Btu/h (first draft)", "Q_TR,B2", "={QB}/3412", "TR",
       planted=("unit-scale", "Btu/h to TR divided by 3412 (the kW factor) where 12 000 "
                              "belongs: 3.517 too large"))
ch.add("cap", "Chiller nameplate capacity, each", "Q_n", 600, "TR")
ch.add("non", "Chillers on line", "n_on", 2, "-")
ch.add("load", "Load on the chillers on line", "φ", "={QTR}/({non}*{cap})*100", "%")
ch.heading("Chiller efficiency")
ch.add("Pch", "Chiller electrical input, two machines (power meter)", "P_ch", 412, "kW")
ch.add("kWpt", "Chiller efficiency", "kW/TR", "={Pch}/{QTR}", "kW/TR")
ch.add("COP", "Chiller coefficient of performance", "COP", "={Q}/{Pch}", "-")
ch.add("EER", "Energy efficiency ratio (US maker's data)", "EER", "=12/{kWpt}", "Btu/(W·h)")
ch.add("te", "Evaporating temperature (chiller panel)", "t_e", 4.0, "°C")
ch.add("tc", "Condensing temperature (chiller panel)", "t_c", 37.0, "°C")
ch.add("TeK", "Evaporating temperature, absolute", "T_e", "={te}+273.15", "K")
ch.add("TcK", "Condensing temperature, absolute", "T_c", "={tc}+273.15", "K")
ch.add("COPc", "Carnot COP between the evaporating and condensing temperatures", "COP_C",
       "={TeK}/({TcK}-{TeK})", "-")
ch.add("COPc2", "Carnot COP (first draft)", "COP_C2", "={te}/({tc}-{te})", "-",
       planted=("offset-scale", "a °C reading in a ratio where the kelvin reading belongs"))
ch.add("eta2", "Chiller efficiency against Carnot", "η_II", "={COP}/{COPc}*100", "%")
ch.heading("Chilled-water pumps (commissioning readings)")
ch.add("pd", "Pump discharge pressure (dial gauge)", "p_d", 4.6, "bar(g)")
ch.add("psa", "Pump suction pressure (absolute transmitter on the BMS)", "p_s,a", 3.3, "bar a")
ch.add("pb", "Site barometer on the day", "p_b", 1.005, "bar a")
ch.add("psg", "Pump suction pressure, gauge", "p_s", "={psa}-{pb}", "bar(g)")
ch.add("dp", "Pump differential pressure", "Δp", "={pd}-{psg}", "bar")
ch.add("dp2", "Pump differential pressure (first draft)", "Δp_2", "={pd}-{psa}", "bar",
       planted=("offset-scale", "a gauge reading less an absolute one"))
ch.add("dpk", "Pump differential pressure, kPa", "Δp_k", "={dp}*100", "kPa")
ch.add("rho", "Density of chilled water at 10 °C", "ρ", 999.7, "kg/m³")
ch.add("H", "Pump head", "H", "={dpk}*1000/({rho}*9.81)", "m")
ch.add("npu", "Pumps running", "n_p", 2, "-")
ch.add("qp", "Flow per pump", "q_p", "={q}/{npu}", "L/s")
ch.add("Ph", "Hydraulic power per pump", "P_h", "={dpk}*{qp}/1000", "kW")
ch.add("Ph2", "Hydraulic power per pump (first draft)", "P_h2", "={dpk}*{qp}", "kW",
       planted=("unit-scale", "kPa × L/s gives W, written as kW: the /1000 missing"))
ch.add("etap", "Pump efficiency at duty (maker's curve, invented)", "η_p", 79, "%")
ch.add("Psh", "Pump shaft power, each", "P_sh", "={Ph}/({etap}/100)", "kW")
ch.add("etam", "Motor and drive efficiency (maker, invented)", "η_m", 94.5, "%")
ch.add("Ppu", "Electrical input, chilled-water pumps running", "P_pu",
       "={Psh}/({etam}/100)*{npu}", "kW")
ch.heading("Plant efficiency")
ch.add("Pcwp", "Condenser water pumps (power meter)", "P_cwp", 38, "kW")
ch.add("Pct", "Cooling tower fans, on VSD (power meter)", "P_ct", 30, "kW")
ch.add("Pvent", "Plant room ventilation fans (nameplate)", "P_v", 3500, "W")
ch.add("Ppl", "Plant electrical input", "P_pl", "={Pch}+{Ppu}+{Pcwp}+{Pct}+{Pvent}/1000",
       "kW")
ch.add("Ppl2", "Plant electrical input (first draft)", "P_pl2",
       "={Pch}+{Ppu}+{Pcwp}+{Pct}+{Pvent}", "kW",
       planted=("unit-scale", "W added to kW"))
ch.add("kWptp", "Plant efficiency", "kW/TR_pl", "={Ppl}/{QTR}", "kW/TR")
ch.heading("Energy for the month")
ch.add("hm", "Run hours at this mean load in July (BMS, invented)", "t_m", 540, "h")
ch.add("Epl", "Plant electricity for the month", "E_pl", "={Ppl}*{hm}", "kWh")
ch.add("Ec", "Cooling delivered for the month", "E_c", "={Q}*{hm}/1000", "MWh")
ch.add("Ec2", "Cooling delivered for the month (first draft)", "E_c2", "={Q}*{hm}/3600",
       "MWh", planted=("unit-scale", "kW × h divided by 3600 as if it were kW·s: 3.6 too "
                                     "small"))
ch.add("TRh", "Cooling delivered, ton-hours", "E_TRh", "={QTR}*{hm}", "TR·h")
ch.add("tar", "Electricity tariff (invented)", "c_e", 0.145, "$/kWh")
ch.add("Cost", "Plant electricity cost for the month", "C", "={Epl}*{tar}", "$")
ch.add("Ecm", "Cooling metered in July (Meter sheet)", "E_m",
       "=VLOOKUP(7,Meter!A6:G9,2,FALSE)", "MWh")
CHWS = ch.finish()

METER = {
    "A1": "St Aldric's Hospital: monthly readings of the chilled-water heat meter and the "
          "chiller power meters (invented)",
    "A2": "Sources: 1 TR = 3.517 kW (NIST SP 811 (2008) App. B.8); ton-hours = kWh/3.517; "
          "COP = cooling kWh / electrical kWh (common practice).",
    "A3": CAUTION,
    "A5": "Month no. [-]", "B5": "Cooling [MWh]", "C5": "Chiller energy [kWh]",
    "D5": "Run hours [h]", "E5": "Cooling [TR·h]", "F5": "Mean load [TR]", "G5": "COP [-]",
}
for r, (mo, mwh, kwh, hrs) in enumerate([(6, 1180, 205000, 620), (7, 1420, 243000, 720),
                                         (8, 1390, 238000, 700), (9, 1010, 178000, 580)],
                                        start=6):
    METER[f"A{r}"], METER[f"B{r}"], METER[f"C{r}"], METER[f"D{r}"] = mo, mwh, kwh, hrs
    METER[f"E{r}"] = f"=B{r}*1000/3.517"
    METER[f"G{r}"] = f"=B{r}*1000/C{r}"
METER["F7"] = "=E7/D7"
METER["E8"] = "=B8*1000*3.517"
METER["G9"] = "=B9/C9"
METER_PLANTED = {
    "Meter!E8": ("unit-scale", "kWh to ton-hours multiplied by 3.517: wrong way round"),
    "Meter!G9": ("unit-scale", "MWh over kWh taken as a COP: the ×1000 missing"),
}

CHWB = {
    "trade": "building services: hospital chilled-water plant, load, efficiency and metering",
    "sheets": [("Plant", CHWS), ("Meter", METER)],
    "planted": {**ch.planted, **METER_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 2: ethanol plant fermenter cooling (m³, g/(L·h), kg/h, t/h, kJ/kg, kW, W, Btu/h,
# kg/s, L/s, m³/h, gpm, °C, °F, Δ°F, K, kPa(g), kPa a, kJ/(kmol·K), W/(m²·K), m², h, %,
# MWh, US gal, kWh/m³)
# --------------------------------------------------------------------------------------------
ETH_SRC = (
    "Sources: heat of fermentation, design figure 1170 kJ per kg of ethanol formed (fuel-"
    "ethanol practice, from memory; the reaction C6H12O6 → 2 C2H5OH + 2 CO2 alone gives about "
    "750 kJ/kg from standard enthalpies of formation, CRC Handbook, from memory); molar masses "
    "CO2 44.01 and ethanol 46.07 g/mol (IUPAC standard atomic weights); R = 8.314 kJ/(kmol·K) "
    "(CODATA 2018); ethanol 789 kg/m³ at 20 °C (Perry's Chemical Engineers' Handbook, 8th ed., "
    "from memory); propylene glycol properties on the Glycol sheet (ASHRAE Handbook, "
    "Fundamentals (2021), ch. 31, from memory); 1 g/L = 1 kg/m³, 1 kW = 3412 Btu/h, "
    "1 L/s = 15.85 US gpm, 1 m³ = 264.2 US gal, 1 Btu/(lb·°F) = 4.187 kJ/(kg·K) (NIST SP 811 "
    "(2008) App. B.8); °F = 1.8·°C + 32, K = °C + 273.15 (SI Brochure 9th ed.); Q = m·c_p·ΔT, "
    "counterflow LMTD and Q = U·A·LMTD (Perry's 8th ed., sect. 11, common practice); plate "
    "exchanger U for glycol against mash 2600 W/(m²·K) (maker, invented). Plant, fermenters, "
    "maker's data and readings invented.")
et = ItemSheet("Fermenter", "Marrow Flats Bioenergy (invented): fermenter 4, external "
               "recirculation through a plate exchanger cooled by 30 % propylene glycol, peak "
               "of the batch", ETH_SRC)
et.heading("Heat of fermentation at the peak")
et.add("V", "Fermenter working volume", "V", 1900, "m³")
et.add("r", "Peak ethanol productivity (lab, invented)", "r", 2.4, "g/(L·h)")
et.add("me", "Ethanol formed at the peak", "ṁ_e", "={r}*{V}", "kg/h")
et.add("me2", "Ethanol formed at the peak (first draft)", "ṁ_e2", "={r}*{V}/1000", "kg/h",
       planted=("unit-scale", "a /1000 the units do not need: g/L is kg/m³ already"))
et.add("met", "Ethanol formed at the peak, t/h", "ṁ_e,t", "={me}/1000", "t/h")
et.add("dH", "Heat of fermentation per kg of ethanol", "Δh_f", 1170, "kJ/kg")
et.add("Qf", "Heat of fermentation", "Q_f", "={me}*{dH}/3600", "kW")
et.add("Qf2", "Heat of fermentation (first draft)", "Q_f2", "={me}*{dH}/60", "kW",
       planted=("unit-scale", "kJ/h divided by 60 taken as kW: 60 too large"))
et.add("Pag", "Agitator shaft power, all to heat (maker)", "P_ag", 55, "kW")
et.add("Qt", "Heat to remove", "Q_t", "={Qf}+{Pag}", "kW")
et.add("QtB", "Heat to remove, Btu/h (US exchanger maker)", "Q_t,US", "={Qt}*3412", "Btu/h")
et.add("mco2", "CO2 evolved, 2 mol per 2 mol of ethanol", "ṁ_CO2", "={me}*44.01/46.07",
       "kg/h")
et.heading("CO2 vent to the scrubber")
et.add("tm", "Mash temperature", "t_m", 32, "°C")
et.add("pvg", "Fermenter head-space pressure (gauge)", "p_v", 4.5, "kPa(g)")
et.add("pb", "Site barometer (invented)", "p_b", 99.6, "kPa a")
et.add("pva", "Head-space pressure, absolute", "p_v,a", "={pvg}+{pb}", "kPa a")
et.add("TK", "Mash temperature, absolute", "T_m", "={tm}+273.15", "K")
et.add("qco2", "CO2 vent flow, wet gas taken as ideal (at head-space conditions)", "V̇_CO2",
       "={mco2}/44.01*8.314*{TK}/{pva}", "m³/h")
et.add("qco2b", "CO2 vent flow (first draft)", "V̇_CO2,2", "={mco2}/44.01*8.314*{tm}/{pva}",
       "m³/h", planted=("offset-scale", "a °C reading in the gas law"))
et.add("qco2c", "CO2 vent flow (scrubber vendor's sheet)", "V̇_CO2,3",
       "={mco2}/44.01*8.314*{TK}/{pvg}", "m³/h",
       planted=("offset-scale", "a gauge pressure in the gas law where the absolute belongs"))
et.heading("Plate exchanger and glycol")
et.add("tm2", "Mash returning to the fermenter", "t_m2", 28, "°C")
et.add("tg1", "Glycol supply temperature", "t_g1", 4, "°C")
et.add("tg2", "Glycol return temperature", "t_g2", 12, "°C")
et.add("dTg", "Glycol temperature rise", "ΔT_g", "={tg2}-{tg1}", "K")
et.add("dTm", "Mash temperature drop across the exchanger", "ΔT_m", "={tm}-{tm2}", "K")
et.add("cpm", "Specific heat of the mash (from memory)", "c_p,m", 3.9, "kJ/(kg·K)")
et.add("mm", "Mash recirculation", "ṁ_m", "={Qt}/({cpm}*{dTm})", "kg/s")
et.add("xg", "Propylene glycol strength", "x_g", 30, "% w/w")
et.add("cpg", "Specific heat of the glycol (Glycol sheet)", "c_p,g",
       "=VLOOKUP({xg},Glycol!A6:F9,2,FALSE)", "kJ/(kg·K)")
et.add("rhog", "Density of the glycol (Glycol sheet)", "ρ_g",
       "=VLOOKUP({xg},Glycol!A6:F9,3,FALSE)", "kg/m³")
et.add("mg", "Glycol mass flow", "ṁ_g", "={Qt}/({cpg}*{dTg})", "kg/s")
et.add("qg", "Glycol volume flow", "q_g", "={mg}/{rhog}*1000", "L/s")
et.add("qgh", "Glycol volume flow, m³/h (pump schedule)", "q_g,h", "={mg}/{rhog}*3600", "m³/h")
et.add("qgh2", "Glycol volume flow, m³/h (first draft)", "q_g,h2",
       "={mg}/{rhog}*3600/1000", "m³/h",
       planted=("unit-scale", "the /1000 doubled: m³/s to m³/h needs ×3600 alone"))
et.add("qggpm", "Glycol volume flow, US gpm", "q_g,US", "={qg}*15.85", "gpm")
et.add("tg1F", "Glycol supply temperature, °F", "t_g1,F", "={tg1}*1.8+32", "°F")
et.add("dTgF", "Glycol temperature rise, °F", "ΔT_g,F", "={dTg}*1.8", "Δ°F")
et.add("dTgF2", "Glycol temperature rise, °F (first draft)", "ΔT_g,F2", "={dTg}*1.8+32",
       "Δ°F", planted=("offset-scale", "a temperature difference converted with the +32 of a "
                                       "reading"))
et.add("dT1", "Temperature difference at the mash inlet end", "ΔT_1", "={tm}-{tg2}", "K")
et.add("dT2", "Temperature difference at the mash outlet end", "ΔT_2", "={tm2}-{tg1}", "K")
et.add("LMTD", "Log mean temperature difference, counterflow", "ΔT_lm",
       "=({dT2}-{dT1})/LN({dT2}/{dT1})", "K")
et.add("U", "Overall heat transfer coefficient (maker, invented)", "U", 2600, "W/(m²·K)")
et.add("A", "Plate area required", "A", "={Qt}*1000/({U}*{LMTD})", "m²")
et.add("A2", "Plate area required (first draft)", "A_2", "={Qt}/({U}*{LMTD})", "m²",
       planted=("unit-scale", "kW over W/(m²·K): the ×1000 missing"))
et.add("dpg", "Glycol pressure drop across the plates (maker)", "Δp_g", 70, "kPa")
et.add("Ppg", "Hydraulic power to push the glycol through the plates", "P_g",
       "={qg}*{dpg}/1000", "kW")
et.heading("Glycol chiller over the year")
et.add("COPg", "Glycol chiller COP at 4 °C leaving glycol (maker, invented)", "COP_g", 4.6,
       "-")
et.add("Pel", "Glycol chiller electrical input at the peak", "P_el", "={Qt}/{COPg}", "kW")
et.add("hy", "Fermentation hours per year", "t_y", 7900, "h")
et.add("lf", "Mean load over the batch, share of the peak", "φ", 65, "%")
et.add("Ea", "Glycol chiller electricity per year", "E_a", "={Pel}*{hy}*{lf}/100/1000", "MWh")
et.add("Ea2", "Glycol chiller electricity per year (first draft)", "E_a2",
       "={Pel}*{hy}*{lf}/1000", "MWh",
       planted=("unit-scale", "a % used as a fraction: 100 too large"))
et.add("rhoe", "Density of ethanol at 20 °C", "ρ_e", 789, "kg/m³")
et.add("Ve", "Ethanol from this fermenter per year", "V_e", "={me}*{hy}*{lf}/100/{rhoe}",
       "m³")
et.add("VeG", "Ethanol from this fermenter per year, US gal", "V_e,US", "={Ve}*264.2",
       "US gal")
et.add("eV", "Chiller electricity per m³ of ethanol", "e", "={Ea}*1000/{Ve}", "kWh/m³")
ETHS = et.finish()

GLY = {
    "A1": "Aqueous propylene glycol, properties near 5 °C (ASHRAE Handbook, Fundamentals (2021), "
          "ch. 31, rounded, from memory; check against the tables before use)",
    "A2": "Sources: ASHRAE Fundamentals (2021) ch. 31 (from memory); °F = 1.8·°C + 32; "
          "1 Btu/(lb·°F) = 4.187 kJ/(kg·K) (NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Glycol [% w/w]", "B5": "c_p [kJ/(kg·K)]", "C5": "Density [kg/m³]",
    "D5": "Freezing point [°C]", "E5": "Freezing point [°F]", "F5": "c_p [Btu/(lb·°F)]",
}
for r, (x, cp, rho, tf) in enumerate([(20, 3.93, 1020, -7), (30, 3.85, 1030, -13),
                                      (40, 3.68, 1037, -21), (50, 3.50, 1045, -34)], start=6):
    GLY[f"A{r}"], GLY[f"B{r}"], GLY[f"C{r}"], GLY[f"D{r}"] = x, cp, rho, tf
    GLY[f"E{r}"] = f"=D{r}*1.8+32"
    GLY[f"F{r}"] = f"=B{r}/4.187"
GLY["F8"] = "=B8*4.187"
GLY["E9"] = "=D9+273.15"
GLY_PLANTED = {
    "Glycol!F8": ("unit-scale", "kJ/(kg·K) to Btu/(lb·°F) multiplied by 4.187: wrong way round"),
    "Glycol!E9": ("offset-scale", "the kelvin conversion (+273.15) in a °F column"),
}

ETHB = {
    "trade": "process: ethanol fermenter cooling, heat of fermentation, CO2 vent, plate "
             "exchanger and glycol",
    "sheets": [("Fermenter", ETHS), ("Glycol", GLY)],
    "planted": {**et.planted, **GLY_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 3: quarry pit storm dewatering (ha, mm, m³, h, L/s, m³/h, gpm, m, ft, mm, m/s, kg/m³,
# kPa, bar, bar(g), kPa a, kPa(g), %, kW, hp, g/kWh, kg/L, L/h, L, L/m³, kWh, $)
# --------------------------------------------------------------------------------------------
QRY_SRC = (
    "Sources: 1 ha = 10 000 m², so 1 ha·mm = 10 m³; 1 L/s = 3.6 m³/h = 15.85 US gpm; 1 m = "
    "3.281 ft; 1 hp = 0.7457 kW; 1 bar = 100 kPa (NIST SP 811 (2008) App. B.8); g_n = 9.81 "
    "m/s² (SI Brochure 9th ed.); storm runoff V = C·P·A (rational volume, common practice); "
    "design 24 h rainfall by return period on the Rain sheet (invented, as a hydrologist would "
    "take from the national depth-duration-frequency tables); Hazen–Williams in SI, h_f = "
    "10.67·L·Q^1.852/(C^1.852·d^4.87) with m, m³/s, C = 140 for HDPE (AWWA M11 / common "
    "practice, from memory); fittings K·v²/(2g) (Crane TP-410 (2013), from memory); NPSHa = "
    "(p_b − p_v)/(ρ·g) − z_lift − h_fs (Hydraulic Institute, from memory); vapour pressure of "
    "water 1.705 kPa at 15 °C (IAPWS, from memory); hydraulic power ρ·g·Q·H (common "
    "practice); diesel 0.835 kg/L (EN 590 range 0.820–0.845, from memory) and engine specific "
    "fuel consumption 225 g/kWh at 75 % load (maker, invented). Quarry, pit, pump, engine and "
    "readings invented.")
qy = ItemSheet("Dewatering", "Brackenhurst Quarry (invented): pumping the pit sump to the "
               "settling pond after the design storm, one diesel-driven end-suction pump on a "
               "pontoon", QRY_SRC)
qy.heading("Storm inflow and pump duty")
qy.add("A", "Catchment draining to the pit floor", "A", 18.5, "ha")
qy.add("Tr", "Design return period", "T_r", 10, "yr")
qy.add("P", "Design 24 h rainfall (Rain sheet)", "P", "=VLOOKUP({Tr},Rain!A6:D9,2,FALSE)",
       "mm")
qy.add("C", "Runoff coefficient, benches and haul roads", "C", 0.65, "-")
qy.add("Vr", "Storm runoff to the sump", "V_r", "={A}*10000*{P}/1000*{C}", "m³")
qy.add("Vrc", "Storm runoff, check by 10 m³ per ha·mm", "V_r,c", "={A}*{P}*{C}*10", "m³")
qy.add("Vr2", "Storm runoff to the sump (first draft)", "V_r2", "={A}*10000*{P}*{C}", "m³",
       planted=("unit-scale", "mm × m² taken as m³: the /1000 missing"))
qy.add("tp", "Pump-out time allowed (quarry licence)", "t_p", 72, "h")
qy.add("Qr", "Pump rate for the storm water", "Q_r", "={Vr}*1000/({tp}*3600)", "L/s")
qy.add("Qr2", "Pump rate for the storm water (first draft)", "Q_r2", "={Vr}*1000/{tp}", "L/s",
       planted=("unit-scale", "L per h written as L/s: the ×3600 missing"))
qy.add("Qgw", "Groundwater seepage to the pit (hydrogeologist, invented)", "Q_gw", 14, "L/s")
qy.add("Q", "Pump duty flow", "Q", "={Qr}+{Qgw}", "L/s")
qy.add("Qh", "Pump duty flow, m³/h (pump hire schedule)", "Q_h", "={Q}*3.6", "m³/h")
qy.add("Qh2", "Pump duty flow, m³/h (first draft)", "Q_h2", "={Q}/3.6", "m³/h",
       planted=("unit-scale", "L/s to m³/h divided by 3.6: wrong way round"))
qy.add("Qgpm", "Pump duty flow, US gpm (US pump maker)", "Q_US", "={Q}*15.85", "gpm")
qy.heading("Head")
qy.add("zs", "Sump water level, lowest (survey RL)", "z_s", 112.0, "m")
qy.add("zd", "Discharge at the settling pond inlet (survey RL)", "z_d", 171.5, "m")
qy.add("Hs", "Static lift", "H_s", "={zd}-{zs}", "m")
qy.add("d", "Discharge main bore, HDPE DN250 SDR17", "d", 220.4, "mm")
qy.add("L", "Discharge main length", "L", 850, "m")
qy.add("CHW", "Hazen–Williams coefficient, HDPE", "C_HW", 140, "-")
qy.add("v", "Velocity in the discharge main", "v", "={Q}/1000/(PI()*({d}/1000)^2/4)", "m/s")
qy.add("hf", "Friction loss in the discharge main (Hazen–Williams)", "h_f",
       "=10.67*{L}*({Q}/1000)^1.852/({CHW}^1.852*({d}/1000)^4.87)", "m")
qy.add("K", "Fittings, valves and outlet, sum of K", "ΣK", 6.5, "-")
qy.add("hm", "Fittings loss", "h_m", "={K}*{v}^2/(2*9.81)", "m")
qy.add("H", "Total dynamic head", "H", "={Hs}+{hf}+{hm}", "m")
qy.add("Hft", "Total dynamic head, ft (US pump maker)", "H_ft", "={H}*3.281", "ft")
qy.add("rho", "Density of the silty pit water (lab, invented)", "ρ", 1010, "kg/m³")
qy.add("dp", "Pressure rise across the pump", "Δp", "={rho}*9.81*{H}/1000", "kPa")
qy.add("dp2", "Pressure rise across the pump (first draft)", "Δp_2", "={rho}*9.81*{H}", "kPa",
       planted=("unit-scale", "ρ·g·H gives Pa, written as kPa: the /1000 missing"))
qy.add("dpbar", "Pressure rise across the pump, bar", "Δp_bar", "={dp}/100", "bar")
qy.heading("Pump gauges at the commissioning test")
qy.add("pdg", "Pump discharge pressure (dial gauge)", "p_d", 6.9, "bar(g)")
qy.add("psa", "Pump suction pressure (absolute transducer)", "p_s,a", 71, "kPa a")
qy.add("pb", "Site barometer (RL 170 m, invented)", "p_b", 98.3, "kPa a")
qy.add("psg", "Pump suction pressure, gauge", "p_s", "={psa}-{pb}", "kPa(g)")
qy.add("dpm", "Measured pressure rise across the pump", "Δp_m", "={pdg}*100-{psg}", "kPa")
qy.add("dpm2", "Measured pressure rise across the pump (first draft)", "Δp_m2",
       "={pdg}*100-{psa}", "kPa",
       planted=("offset-scale", "a gauge reading less an absolute one"))
qy.add("Hm", "Measured pump head", "H_m", "={dpm}*1000/({rho}*9.81)", "m")
qy.heading("Suction")
qy.add("pv", "Vapour pressure of water at 15 °C", "p_v", 1.705, "kPa a")
qy.add("zl", "Suction lift, sump level to impeller eye", "z_l", 3.2, "m")
qy.add("hfs", "Suction hose and strainer loss", "h_fs", 0.4, "m")
qy.add("NPSH", "NPSH available", "NPSHa", "=({pb}-{pv})*1000/({rho}*9.81)-{zl}-{hfs}", "m")
qy.heading("Power and fuel")
qy.add("eta", "Pump efficiency at duty (maker's curve, invented)", "η", 71, "%")
qy.add("Ph", "Hydraulic power", "P_h", "={rho}*9.81*{Q}/1000*{H}/1000", "kW")
qy.add("Ph2", "Hydraulic power (first draft)", "P_h2", "={rho}*{Q}/1000*{H}/1000", "kW",
       planted=("result-unit", "ρ·Q·H with g left out"))
qy.add("Psh", "Pump shaft power", "P_sh", "={Ph}/({eta}/100)", "kW")
qy.add("Psh2", "Pump shaft power (first draft)", "P_sh2", "={Ph}/{eta}", "kW",
       planted=("unit-scale", "a % used as a fraction: 100 too small"))
qy.add("etam", "Electric motor efficiency, if driven from the grid (maker)", "η_m", 93, "%")
qy.add("Pin", "Electrical input, if driven from the grid", "P_in", "={Psh}/({etam}/100)", "kW")
qy.add("bsfc", "Engine specific fuel consumption at this load (maker, invented)", "b", 225,
       "g/kWh")
qy.add("rhod", "Density of diesel", "ρ_d", 0.835, "kg/L")
qy.add("fuel", "Diesel burned", "ḟ", "={Psh}*{bsfc}/1000/{rhod}", "L/h")
qy.add("fuel2", "Diesel burned (first draft)", "ḟ_2", "={Psh}*{bsfc}/{rhod}", "L/h",
       planted=("unit-scale", "g taken as kg: the /1000 missing"))
qy.add("Fev", "Diesel for the pump-out", "F", "={fuel}*{tp}", "L")
qy.add("fm3", "Diesel per m³ pumped", "f_V", "={fuel}/{Qh}", "L/m³")
qy.add("tank", "Pontoon day tank", "V_tk", 1200, "L")
qy.add("nref", "Refills of the day tank over the pump-out", "n_r", "={Fev}/{tank}", "-")
qy.add("Eev", "Electricity for the pump-out, if driven from the grid", "E", "={Pin}*{tp}",
       "kWh")
qy.add("tar", "Electricity tariff (invented)", "c_e", 0.19, "$/kWh")
qy.add("Cost", "Electricity cost for the pump-out, if driven from the grid", "C",
       "={Eev}*{tar}", "$")
QRYS = qy.finish()

RAIN = {
    "A1": "Brackenhurst Quarry: design 24 h rainfall by return period (invented), with the "
          "runoff to the sump and the pump rate to empty it in the licensed time",
    "A2": "Sources: V = C·P·A, 1 ha·mm = 10 m³ (common practice; NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Return period [yr]", "B5": "24 h rainfall [mm]", "C5": "Runoff [m³]",
    "D5": "Pump rate [m³/h]",
}
_A, _C, _T = qy.ref("A"), qy.ref("C"), qy.ref("tp")
for r, (t, p) in enumerate([(2, 52), (5, 66), (10, 78), (50, 106)], start=6):
    RAIN[f"A{r}"], RAIN[f"B{r}"] = t, p
    RAIN[f"C{r}"] = f"=B{r}*{_A}*{_C}*10"
    RAIN[f"D{r}"] = f"=C{r}/{_T}"
RAIN["D8"] = f"=C8/({_T}*3600)"
RAIN_PLANTED = {"Rain!D8": ("unit-scale", "m³ over hours divided by 3600 as if to m³/s, "
                                          "written as m³/h")}

QRYB = {
    "trade": "mining and quarrying: pit storm dewatering, head, gauges, NPSH, power and diesel",
    "sheets": [("Dewatering", QRYS), ("Rain", RAIN)],
    "planted": {**qy.planted, **RAIN_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 4: school water-to-water heat pump on a borehole loop (kW, W, Btu/h, °C, °F, K, Δ°F,
# L/s, gpm, kJ/(kg·K), kg/m³, kg/s, W/m, m, kPa, %, MWh, kWh, h, $/kWh, $, kg/kWh, t)
# --------------------------------------------------------------------------------------------
HP_SRC = (
    "Sources: 1 kW = 3412 Btu/h, 1 L/s = 15.85 US gpm (NIST SP 811 (2008) App. B.8); °F = "
    "1.8·°C + 32, K = °C + 273.15, g_n = 9.81 m/s² (SI Brochure 9th ed.); heating capacity "
    "and COP at B0/W45 to EN 14511 (maker, invented); source heat = heating − electrical input "
    "(energy balance, common practice); water Q(kW) = 4.19·q(L/s)·ΔT(K) and Q(Btu/h) = "
    "500·gpm·ΔT(°F) (common practice); 25 % monoethylene glycol c_p 3.70 kJ/(kg·K), ρ 1040 "
    "kg/m³ near 0 °C (ASHRAE Handbook, Fundamentals (2021), ch. 31, from memory); specific "
    "heat extraction 50 W/m of borehole in average consolidated rock for about 1800 h/yr "
    "(VDI 4640 Part 2, from memory); Carnot heating COP = T_c/(T_c − T_e), absolute "
    "temperatures (common practice); pump power ρ·g·q·H/η (common practice); CO2 factors "
    "0.207 kg/kWh for grid electricity and 0.183 kg/kWh for natural gas (UK government GHG "
    "conversion factors 2023, from memory). School, plant, boreholes, tariffs and readings "
    "invented.")
hp = ItemSheet("HeatPump", "Ashgrove Primary School (invented): one water-to-water heat pump "
               "on a closed borehole loop, replacing a gas boiler, design and first year", HP_SRC)
hp.heading("Heat pump rating")
hp.add("Qh", "Heating capacity at B0/W45 (maker, EN 14511)", "Q_h", 92, "kW")
hp.add("COP", "COP at B0/W45 (maker, EN 14511)", "COP", 3.9, "-")
hp.add("Pel", "Electrical input at B0/W45", "P_el", "={Qh}/{COP}", "kW")
hp.add("Qsrc", "Heat drawn from the ground loop", "Q_src", "={Qh}-{Pel}", "kW")
hp.add("QhB", "Heating capacity, Btu/h (US tender form)", "Q_h,US", "={Qh}*3412", "Btu/h")
hp.add("QhB2", "Heating capacity, Btu/h (first draft)", "Q_h,US2", "={Qh}*3.412", "Btu/h",
       planted=("unit-scale", "the Btu/h per W factor (3.412) used on kW: 1000 too small"))
hp.add("QusB", "Alternative unit's heating capacity (US maker's data)", "Q_alt,US", 290000,
       "Btu/h")
hp.add("Qus", "Alternative unit's heating capacity, kW", "Q_alt", "={QusB}/3412", "kW")
hp.add("Qus2", "Alternative unit's heating capacity, kW (first draft)", "Q_alt2",
       "={QusB}*3412", "kW",
       planted=("unit-scale", "Btu/h to kW multiplied by 3412: wrong way round"))
hp.heading("Heating water (load side)")
hp.add("tf", "Heating flow temperature", "t_f", 45, "°C")
hp.add("tret", "Heating return temperature", "t_ret", 40, "°C")
hp.add("dTl", "Heating water temperature difference, flow less return", "ΔT_l",
       "={tf}-{tret}", "K")
hp.add("ql", "Heating water flow", "q_l", "={Qh}/(4.19*{dTl})", "L/s")
hp.add("qlgpm", "Heating water flow, US gpm", "q_l,US", "={ql}*15.85", "gpm")
hp.add("dTlF", "Heating water temperature difference, °F", "ΔT_l,F", "={dTl}*1.8", "Δ°F")
hp.add("QhBc", "Heating capacity, Btu/h (US check, 500·gpm·ΔT)", "Q_h,c", "=500*{qlgpm}*{dTlF}",
       "Btu/h")
hp.heading("Borehole loop (source side)")
hp.add("ts1", "Loop fluid entering the heat pump, design", "t_s1", 0, "°C")
hp.add("ts2", "Loop fluid leaving the heat pump, design", "t_s2", -3, "°C")
hp.add("ts2F", "Loop fluid leaving the heat pump, °F (US maker's curve)", "t_s2,F",
       "={ts2}*1.8+32", "°F")
hp.add("ts2F2", "Loop fluid leaving the heat pump, °F (first draft)", "t_s2,F2", "={ts2}*1.8",
       "°F", planted=("offset-scale", "°C to °F by the 1.8 alone: the +32 missing"))
hp.add("dTs", "Loop fluid temperature drop across the evaporator", "ΔT_s", "={ts1}-{ts2}", "K")
hp.add("cps", "Specific heat of 25 % monoethylene glycol", "c_p,s", 3.70, "kJ/(kg·K)")
hp.add("rhos", "Density of 25 % monoethylene glycol", "ρ_s", 1040, "kg/m³")
hp.add("ms", "Loop mass flow", "ṁ_s", "={Qsrc}/({cps}*{dTs})", "kg/s")
hp.add("qs", "Loop volume flow", "q_s", "={ms}/{rhos}*1000", "L/s")
hp.add("qs2", "Loop volume flow (first draft)", "q_s2", "={ms}/{rhos}", "L/s",
       planted=("unit-scale", "m³/s written as L/s: the ×1000 missing"))
hp.add("qsgpm", "Loop volume flow, US gpm", "q_s,US", "={qs}*15.85", "gpm")
hp.add("qsp", "Specific heat extraction of the ground", "q'", 50, "W/m")
hp.add("Lb", "Borehole length required", "L_b", "={Qsrc}*1000/{qsp}", "m")
hp.add("Lb2", "Borehole length required (first draft)", "L_b2", "={Qsrc}/{qsp}", "m",
       planted=("unit-scale", "kW over W/m: the ×1000 missing"))
hp.add("Hb", "Depth of each borehole (driller, invented)", "H_b", 130, "m")
hp.add("nb", "Boreholes", "n_b", "=ROUNDUP({Lb}/{Hb},0)", "-")
hp.add("Hsp", "Loop pump head at design flow", "H_sp", 22, "m")
hp.add("etasp", "Loop pump wire-to-water efficiency (maker, invented)", "η_sp", 55, "%")
hp.add("Psp", "Loop pump electrical input", "P_sp",
       "={rhos}*9.81*{qs}/1000*{Hsp}/1000/({etasp}/100)", "kW")
hp.add("Psp2", "Loop pump electrical input (first draft)", "P_sp2",
       "={rhos}*{qs}/1000*{Hsp}/1000/({etasp}/100)", "kW",
       planted=("result-unit", "ρ·q·H with g left out"))
hp.add("dpsp", "Loop pump pressure rise", "Δp_sp", "={rhos}*9.81*{Hsp}/1000", "kPa")
hp.heading("Against Carnot")
hp.add("tc", "Condensing temperature at B0/W45 (maker)", "t_c", 48, "°C")
hp.add("te", "Evaporating temperature at B0/W45 (maker)", "t_e", -6, "°C")
hp.add("TcK", "Condensing temperature, absolute", "T_c", "={tc}+273.15", "K")
hp.add("TcK2", "Condensing temperature, absolute (first draft)", "T_c2", "={tc}", "K",
       planted=("offset-scale", "a °C reading set equal to kelvins: the 273.15 missing"))
hp.add("TeK", "Evaporating temperature, absolute", "T_e", "={te}+273.15", "K")
hp.add("COPc", "Carnot heating COP", "COP_C", "={TcK}/({TcK}-{TeK})", "-")
hp.add("eta2", "Heat pump COP against Carnot", "η_II", "={COP}/{COPc}*100", "%")
hp.heading("First year")
hp.add("Eh", "Heat delivered per year (degree-day estimate, invented)", "E_h", 168, "MWh")
hp.add("SCOP", "Seasonal COP including the loop pump (invented)", "SCOP", 3.6, "-")
hp.add("Eel", "Electricity per year", "E_el", "={Eh}*1000/{SCOP}", "kWh")
hp.add("Eel2", "Electricity per year (first draft)", "E_el2", "={Eh}/{SCOP}", "kWh",
       planted=("unit-scale", "MWh written as kWh: the ×1000 missing"))
hp.add("flh", "Equivalent full-load hours", "t_fl", "={Eh}*1000/{Qh}", "h")
hp.add("tare", "Electricity tariff (invented)", "c_e", 0.24, "$/kWh")
hp.add("Ce", "Electricity cost per year", "C_e", "={Eel}*{tare}", "$")
hp.add("etab", "Seasonal efficiency of the old gas boiler", "η_b", 88, "%")
hp.add("Eg", "Gas the boiler would burn per year", "E_g", "={Eh}*1000/({etab}/100)", "kWh")
hp.add("Eg2", "Gas the boiler would burn per year (first draft)", "E_g2", "={Eh}*1000/{etab}",
       "kWh", planted=("unit-scale", "a % used as a fraction: 100 too small"))
hp.add("targ", "Gas tariff (invented)", "c_g", 0.075, "$/kWh")
hp.add("Cg", "Gas cost per year", "C_g", "={Eg}*{targ}", "$")
hp.add("Sav", "Running cost saved per year", "S", "={Cg}-{Ce}", "$")
hp.add("cfe", "CO2 factor, grid electricity", "f_e", 0.207, "kg/kWh")
hp.add("cfg", "CO2 factor, natural gas", "f_g", 0.183, "kg/kWh")
hp.add("CO2", "CO2 saved per year", "ΔCO2", "=({Eg}*{cfg}-{Eel}*{cfe})/1000", "t")
HPS = hp.finish()

MONTH = {
    "A1": "Ashgrove Primary School: first winter's heat meter and heat pump electricity meter, "
          "by month (invented)",
    "A2": "Sources: electricity = heat/COP, cost = kWh × tariff (common practice).",
    "A3": CAUTION,
    "A5": "Month no. [-]", "B5": "Heat delivered [MWh]", "C5": "Monthly COP [-]",
    "D5": "Electricity [kWh]", "E5": "Cost [$]",
}
_T = hp.ref("tare")
for r, (mo, mwh, cop) in enumerate([(11, 22.5, 3.7), (12, 31.0, 3.5), (1, 34.2, 3.4),
                                    (2, 27.8, 3.5)], start=6):
    MONTH[f"A{r}"], MONTH[f"B{r}"], MONTH[f"C{r}"] = mo, mwh, cop
    MONTH[f"D{r}"] = f"=B{r}*1000/C{r}"
    MONTH[f"E{r}"] = f"=D{r}*{_T}"
MONTH["D8"] = "=B8/C8"
MONTH_PLANTED = {"Monthly!D8": ("unit-scale", "MWh written as kWh: the ×1000 missing")}

HPB = {
    "trade": "building services: school water-to-water heat pump, borehole loop, running cost",
    "sheets": [("HeatPump", HPS), ("Monthly", MONTH)],
    "planted": {**hp.planted, **MONTH_PLANTED},
}

BOOKS = {"chw-plant-st-aldric": CHWB, "fermenter-marrow-flats": ETHB,
         "dewatering-brackenhurst": QRYB, "heat-pump-ashgrove": HPB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()
