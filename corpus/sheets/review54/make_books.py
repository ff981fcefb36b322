#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review54), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; pattern after
corpus/sheets/review53/make_books.py.

Trades: an office tower's chilled-water plant; a gas compressor station's suction and
discharge; a wastewater aeration basin; a steel warehouse's portal frame loads. All scenarios,
sites, firms, readings and catalogue data are invented (demonstration only); the formulas and
published factors are the trade's own, with their sources named in a text cell at the top of
each sheet ("from memory" where recalled and not checked, "common practice" for a fact of the
trade with no single source).

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
# Book 1: office tower chilled-water plant (TR, kW, Btu/h, kW/TR, COP, °C, °F, K, Δ°F, L/s,
# gpm, kPa, m, hp, m³/h, %)
# --------------------------------------------------------------------------------------------
CHW_SRC = (
    "Sources: 1 TR = 12 000 Btu/h = 3.517 kW, 1 hp = 0.7457 kW, 1 L/s = 15.85 US gpm, "
    "1 m³/h = 4.403 US gpm, 1 m = 3.281 ft (NIST SP 811 (2008) App. B.8); °F = 1.8·°C + 32; "
    "COP = 3.517/(kW/TR) (common practice); water flow Q = ρ·V̇·c_p·ΔT, ρ = 999.7 kg/m³ and "
    "c_p = 4.19 kJ/(kg·K) at 10 °C, ρ = 995.0 kg/m³ and c_p = 4.18 kJ/(kg·K) at 32 °C "
    "(Incropera, Fundamentals of Heat and Mass Transfer, 7th ed., Table A.6, from memory); "
    "the US hydronic form Q(Btu/h) = 500·gpm·ΔT(°F) (ASHRAE Handbook, HVAC Systems and "
    "Equipment (2020), from memory); Carnot COP = T_evap/(T_cond − T_evap) in kelvins (common "
    "practice); heat rejected = load + compressor input (common practice); pump power "
    "P = V̇·Δp/η, head H = Δp/(ρ·g) with g_n = 9.81 m/s² (SI Brochure 9th ed.), US form "
    "hp = gpm·ft/(3960·η) (common practice); evaporation = heat rejected/h_fg with h_fg = "
    "2425 kJ/kg at 32 °C (IAPWS-IF97 steam tables, from memory), the tower trade's check "
    "E ≈ 0.00085·gpm·range(°F) (Cooling Technology Institute rule of thumb, from memory); "
    "blow-down = E/(cycles − 1), drift 0.005 % of the circulating flow (common practice). "
    "Tower, plant, maker's data and readings invented.")
ch = ItemSheet("Plant", "Kestrel Quay Tower (invented): central chilled-water plant, three "
               "centrifugal chillers and cooling towers, design summer day", CHW_SRC)
ch.heading("Cooling load")
ch.add("Qb", "Sum of the zones' peak loads (Loads sheet)", "ΣQ", "=Loads!D10", "kW")
ch.add("div", "Diversity on the block peak (designer's figure)", "f_d", 90, "%")
ch.add("Q", "Plant design load", "Q", "={Qb}*{div}/100", "kW")
ch.add("QTR", "Plant design load, TR", "Q_TR", "={Q}/3.517", "TR")
ch.add("QTR2", "Plant design load, TR (chiller enquiry)", "Q_TR2", "={Q}*3.517", "TR",
       planted=("unit-scale", "kW to TR multiplied by 3.517: wrong way round"))
ch.add("QBtu", "Plant design load, Btu/h", "Q_Btu", "={QTR}*12000", "Btu/h")
ch.heading("Chilled water")
ch.add("ts", "Chilled water supply temperature", "t_s", 6.7, "°C")
ch.add("tr", "Chilled water return temperature", "t_r", 13.3, "°C")
ch.add("dT", "Chilled water temperature difference", "ΔT", "={tr}-{ts}", "K")
ch.add("tsF", "Chilled water supply temperature, °F", "t_s,F", "={ts}*1.8+32", "°F")
ch.add("dTF", "Chilled water temperature difference, Δ°F", "ΔT_F", "={dT}*1.8", "Δ°F")
ch.add("dTF2", "Chilled water temperature difference, Δ°F (US summary)", "ΔT_F2",
       "={dT}*1.8+32", "Δ°F",
       planted=("offset-scale", "a temperature difference converted with the +32 of a reading"))
ch.add("rho", "Water density at 10 °C", "ρ", 999.7, "kg/m³")
ch.add("cp", "Water specific heat at 10 °C", "c_p", 4.19, "kJ/(kg·K)")
ch.add("q", "Chilled water flow", "V̇", "={Q}/({rho}*{cp}*{dT})*1000", "L/s")
ch.add("qgpm", "Chilled water flow, US gpm", "V̇_US", "={q}*15.85", "gpm")
ch.add("qgpmUS", "Chilled water flow, US gpm (US check, 500 rule)", "V̇_500",
       "={QBtu}/(500*{dTF})", "gpm")
ch.heading("Chillers")
ch.add("kWTR", "Chiller full-load efficiency (maker, invented)", "η_kW", 0.56, "kW/TR")
ch.add("Pch", "Chillers' input power at the design load", "P_ch", "={QTR}*{kWTR}", "kW")
ch.add("Pch2", "Chillers' input power (electrical schedule)", "P_ch2", "={Q}*{kWTR}", "kW",
       planted=("unit-scale", "the load in kW times kW/TR: TR belongs, 3.517 too large"))
ch.add("COP", "Coefficient of performance", "COP", "=3.517/{kWTR}", "-")
ch.add("COP2", "Coefficient of performance (energy report)", "COP_2", "=1/{kWTR}", "-",
       planted=("unit-scale", "1/(kW/TR) without the 3.517: 3.517 too small"))
ch.add("tev", "Saturated evaporating temperature (maker's selection)", "t_ev", 5.0, "°C")
ch.add("tcd", "Saturated condensing temperature (maker's selection)", "t_cd", 36.5, "°C")
ch.add("COPc", "Carnot COP between those temperatures", "COP_C",
       "=({tev}+273.15)/({tcd}-{tev})", "-")
ch.add("COPc2", "Carnot COP (first draft)", "COP_C2", "={tev}/({tcd}-{tev})", "-",
       planted=("offset-scale", "a °C reading in a ratio of temperatures: absolute belongs"))
ch.add("eta2", "Chiller efficiency against Carnot", "η_II", "={COP}/{COPc}*100", "%")
ch.heading("Chilled water pumps")
ch.add("dpp", "Pump differential pressure (index circuit, invented)", "Δp", 300, "kPa")
ch.add("etap", "Pump efficiency at duty (maker's curve)", "η_p", 75, "%")
ch.add("H", "Pump head", "H", "={dpp}*1000/({rho}*9.81)", "m")
ch.add("H2", "Pump head (pump enquiry)", "H_2", "={dpp}*1000/{rho}", "m",
       planted=("result-unit", "Δp/ρ with g left out"))
ch.add("Pp", "Pump shaft power", "P_p", "={q}/1000*{dpp}/({etap}/100)", "kW")
ch.add("Pp2", "Pump shaft power (first draft)", "P_p2", "={q}*{dpp}/({etap}/100)", "kW",
       planted=("unit-scale", "L/s times kPa gives W, written as kW: 1000 too large"))
ch.add("Php", "Pump shaft power, hp (US check)", "P_hp", "={qgpm}*{H}*3.281/(3960*{etap}/100)",
       "hp")
ch.heading("Condenser water and cooling towers")
ch.add("Qrej", "Heat rejected at the towers", "Q_rej", "={Q}+{Pch}", "kW")
ch.add("tcs", "Condenser water supply (tower leaving) temperature", "t_cs", 29.4, "°C")
ch.add("tcr", "Condenser water return (tower entering) temperature", "t_cr", 35.0, "°C")
ch.add("dTc", "Tower range", "ΔT_c", "={tcr}-{tcs}", "K")
ch.add("rhoc", "Water density at 32 °C", "ρ_c", 995.0, "kg/m³")
ch.add("cpc", "Water specific heat at 32 °C", "c_p,c", 4.18, "kJ/(kg·K)")
ch.add("qc", "Condenser water flow", "V̇_c", "={Qrej}/({rhoc}*{cpc}*{dTc})*1000", "L/s")
ch.add("qcgpm", "Condenser water flow, US gpm", "V̇_c,US", "={qc}*15.85", "gpm")
ch.add("hfg", "Latent heat of water at 32 °C", "h_fg", 2425, "kJ/kg")
ch.add("E", "Evaporation", "ṁ_e", "={Qrej}/{hfg}", "kg/s")
ch.add("Em", "Evaporation, m³/h", "V̇_e", "={E}/{rhoc}*3600", "m³/h")
ch.add("Em2", "Evaporation, m³/h (water treatment contractor)", "V̇_e2", "={E}/{rhoc}", "m³/h",
       planted=("unit-scale", "kg/s over kg/m³ gives m³/s, written as m³/h: the ×3600 missing"))
ch.add("EUS", "Evaporation, US gpm (tower trade's check)", "V̇_e,US",
       "=0.00085*{qcgpm}*{dTc}*1.8", "gpm")
ch.add("coc", "Cycles of concentration (water treatment)", "N_c", 4, "-")
ch.add("B", "Blow-down", "V̇_b", "={Em}/({coc}-1)", "m³/h")
ch.add("drift", "Drift loss, share of the circulating flow (maker)", "d", 0.005, "%")
ch.add("D", "Drift", "V̇_d", "={qc}*3.6*{drift}/100", "m³/h")
ch.add("M", "Make-up water", "V̇_m", "={Em}+{B}+{D}", "m³/h")
ch.add("Mgpm", "Make-up water, US gpm", "V̇_m,US", "={M}*4.403", "gpm")
ch.heading("Plant efficiency")
ch.add("dpc", "Condenser pump differential pressure (invented)", "Δp_c", 220, "kPa")
ch.add("Pcp", "Condenser pump shaft power", "P_cp", "={qc}/1000*{dpc}/({etap}/100)", "kW")
ch.add("Pf", "Tower fans' input power (3 × 30 kW, maker)", "P_f", 90, "kW")
ch.add("Pt", "Plant input power at the design load", "P_t", "={Pch}+{Pp}+{Pcp}+{Pf}", "kW")
ch.add("kWTRp", "Plant efficiency", "η_plant", "={Pt}/{QTR}", "kW/TR")
CHWS = ch.finish()

LOADS = {
    "A1": "Kestrel Quay Tower: zone peak cooling loads (invented areas; loads per floor area "
          "from the designer's block load run, invented)",
    "A2": "Sources: zone peak = area × load per area / 1000 (common practice); 1 kW = 3412 "
          "Btu/h (NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Zone", "B5": "Floor area [m²]", "C5": "Peak load [W/m²]", "D5": "Peak load [kW]",
    "E5": "Peak load, US consultant [Btu/h]",
    "A10": "Total", "D10": "=SUM(D6:D9)",
}
for r, (zone, area, w) in enumerate([("Office floors L3 to L28", 42900, 80),
                                     ("Podium retail L1 and L2", 5200, 110),
                                     ("Lobby and atrium", 1200, 150),
                                     ("Data room and conference L29", 1650, 190)], start=6):
    LOADS[f"A{r}"], LOADS[f"B{r}"], LOADS[f"C{r}"] = zone, area, w
    LOADS[f"D{r}"] = f"=B{r}*C{r}/1000"
    LOADS[f"E{r}"] = f"=D{r}*3412"
LOADS["E8"] = "=D8*3.412"
LOADS_PLANTED = {"Loads!E8": ("unit-scale", "kW times 3.412 gives MBH, written as Btu/h: 1000 "
                                            "too small")}

CHWB = {
    "trade": "HVAC: office tower chilled-water plant, chillers, pumps and cooling tower make-up",
    "sheets": [("Plant", CHWS), ("Loads", LOADS)],
    "planted": {**ch.planted, **LOADS_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 2: gas compressor station (MMscf/d, Nm³/h, m³/h, kg/s, psig, psia, bar(g), bar a, °F,
# °C, K, °R, kg/kmol, kJ/kg, kW, hp, Btu/h, Btu/(hp·h), Btu/scf, scf/h, %)
# --------------------------------------------------------------------------------------------
GAS_SRC = (
    "Sources: scf at 60 °F and 14.696 psia, Nm³ at 0 °C and 101.325 kPa (DIN 1343), so 1 scf = "
    "0.028317 m³ × 273.15/288.71 = 0.026791 Nm³ and 1 MMscf/d = 1116.3 Nm³/h (NIST SP 811 "
    "(2008) App. B.8 for the cubic foot); SG = M/28.96 and molar volume 22.414 Nm³/kmol "
    "(GPSA Engineering Data Book, 13th ed., sect. 23, from memory); gas constant R = 8.314 "
    "kJ/(kmol·K) (CODATA 2018); adiabatic head H = Z·R·T_s/M · k/(k − 1) · (r^((k−1)/k) − 1) "
    "and ideal discharge temperature T_d = T_s·r^((k−1)/k) in absolute degrees (GPSA, 13th "
    "ed., sect. 13, from memory); GPSA's quick look 22 bhp per MMscf/d per unit of ratio, one "
    "stage (GPSA, 13th ed., sect. 13, from memory); actual suction volume by the pressure and "
    "temperature ratios and Z (common practice); NIST SP 811 (2008) App. B.8: 1 bar = 14.50 "
    "psi, 1 hp = 0.7457 kW, 1 kW = 3412 Btu/h; °F = 1.8·°C + 32, °R = °F + 459.67, K = °C + "
    "273.15. Station, gas analysis, site barometer, maker's data and readings invented.")
gs = ItemSheet("Station", "Brackwater Hill compressor station (invented): unit 2, one-stage "
               "reciprocating compressor, suction and discharge at design throughput", GAS_SRC)
gs.heading("Throughput")
gs.add("Q", "Design throughput (standard, 60 °F and 14.696 psia)", "Q", 120, "MMscf/d")
gs.add("Qn", "Design throughput, normal volume", "Q_n", "={Q}*1116.3", "Nm³/h")
gs.add("Qn2", "Design throughput, normal volume (operator's data sheet)", "Q_n2", "={Q}*26791",
       "Nm³/h", planted=("unit-scale", "per day written as per hour: the /24 missing"))
gs.heading("Gas")
gs.add("M", "Molar mass of the gas (Gas sheet)", "M", "=Gas!D11", "kg/kmol")
gs.add("SG", "Specific gravity (air = 1)", "SG", "={M}/28.96", "-")
gs.add("rhon", "Density at normal conditions", "ρ_n", "={M}/22.414", "kg/Nm³")
gs.add("mdot", "Mass flow", "ṁ", "={Qn}*{rhon}/3600", "kg/s")
gs.add("mdot2", "Mass flow (first draft)", "ṁ_2", "={Qn}*{rhon}", "kg/s",
       planted=("unit-scale", "per hour written as per second: the /3600 missing"))
gs.heading("Pressures")
gs.add("patm", "Site barometer (150 m above sea level)", "p_atm", 14.4, "psia")
gs.add("ps", "Suction pressure at the unit's suction flange", "p_s", 450, "psig")
gs.add("pd", "Discharge pressure at the unit's discharge flange", "p_d", 1050, "psig")
gs.add("psa", "Suction pressure, absolute", "p_s,a", "={ps}+{patm}", "psia")
gs.add("pda", "Discharge pressure, absolute", "p_d,a", "={pd}+{patm}", "psia")
gs.add("psb", "Suction pressure, bar(g)", "p_s,b", "={ps}/14.5", "bar(g)")
gs.add("psba", "Suction pressure, bar a", "p_s,ba", "={psa}/14.5", "bar a")
gs.add("psba2", "Suction pressure, bar a (metric data sheet)", "p_s,ba2", "={psa}/14.5+1.013",
       "bar a", planted=("offset-scale", "the atmosphere added to a reading already absolute"))
gs.add("r", "Compression ratio", "r", "={pda}/{psa}", "-")
gs.add("r2", "Compression ratio (first draft)", "r_2", "={pd}/{ps}", "-",
       planted=("offset-scale", "gauge readings in a ratio of pressures: absolute belongs"))
gs.heading("Temperatures")
gs.add("ts", "Suction temperature", "t_s", 80, "°F")
gs.add("tsC", "Suction temperature, °C", "t_s,C", "=({ts}-32)/1.8", "°C")
gs.add("TsK", "Suction temperature, absolute", "T_s", "={tsC}+273.15", "K")
gs.add("TsK2", "Suction temperature, absolute (first draft)", "T_s2", "={ts}+273.15", "K",
       planted=("offset-scale", "the Celsius zero added to a °F reading"))
gs.add("TsR", "Suction temperature, °R", "T_s,R", "={ts}+459.67", "°R")
gs.add("k", "Ratio of specific heats of the gas (GPSA chart, from memory)", "k", 1.28, "-")
gs.add("x", "Exponent (k − 1)/k", "x", "=({k}-1)/{k}", "-")
gs.add("TdR", "Ideal discharge temperature, absolute", "T_d,R", "={TsR}*{r}^{x}", "°R")
gs.add("tdF", "Ideal discharge temperature", "t_d", "={TdR}-459.67", "°F")
gs.add("tdF2", "Ideal discharge temperature (first draft)", "t_d2", "={ts}*{r}^{x}", "°F",
       planted=("offset-scale", "a °F reading raised by the ratio: absolute belongs"))
gs.add("tdC", "Ideal discharge temperature, °C", "t_d,C", "=({tdF}-32)/1.8", "°C")
gs.heading("Power")
gs.add("Z", "Compressibility at suction (GPSA chart, from memory)", "Z", 0.93, "-")
gs.add("R", "Molar gas constant", "R", 8.314, "kJ/(kmol·K)")
gs.add("eta", "Adiabatic efficiency (maker, invented)", "η", 78, "%")
gs.add("Hs", "Adiabatic head", "H_ad", "={Z}*{R}*{TsK}/{M}/{x}*({r}^{x}-1)", "kJ/kg")
gs.add("Pg", "Gas power", "P_g", "={mdot}*{Hs}/({eta}/100)", "kW")
gs.add("Php", "Gas power, hp", "P_hp", "={Pg}/0.7457", "hp")
gs.add("Php2", "Gas power, hp (driver enquiry)", "P_hp2", "={Pg}*0.7457", "hp",
       planted=("unit-scale", "kW to hp multiplied by 0.7457: wrong way round"))
gs.add("fG", "GPSA quick-look power per throughput per unit of ratio, one stage", "f_G", 22,
       "hp/(MMscf/d)")
gs.add("PG", "Gas power, GPSA quick look (check)", "P_G", "={fG}*{r}*{Q}", "hp")
gs.heading("Suction header")
gs.add("Qa", "Actual volume flow at suction", "Q_a",
       "={Qn}*1.01325/{psba}*{TsK}/273.15*{Z}", "m³/h")
gs.add("d", "Suction header bore (16 in, standard wall)", "d", 387.4, "mm")
gs.add("v", "Velocity in the suction header", "v", "={Qa}/3600/(PI()*({d}/1000)^2/4)", "m/s")
gs.heading("Aftercooler")
gs.add("to", "Aftercooler outlet temperature", "t_o", 120, "°F")
gs.add("toC", "Aftercooler outlet temperature, °C", "t_o,C", "=({to}-32)/1.8", "°C")
gs.add("cpg", "Gas specific heat at discharge (GPSA chart, from memory)", "c_p", 2.6,
       "kJ/(kg·K)")
gs.add("Qc", "Aftercooler duty", "Q_c", "={mdot}*{cpg}*({tdC}-{toC})", "kW")
gs.add("QcB", "Aftercooler duty, Btu/h (US cooler maker)", "Q_c,Btu", "={Qc}*3412", "Btu/h")
gs.heading("Fuel")
gs.add("HR", "Engine driver heat rate (maker, invented)", "HR", 7500, "Btu/(hp·h)")
gs.add("HHV", "Fuel gas higher heating value (analysis, invented)", "HHV", 1050, "Btu/scf")
gs.add("fuel", "Fuel gas", "Q_f", "={Php}*{HR}/{HHV}", "scf/h")
gs.add("fueld", "Fuel gas, MMscf/d", "Q_f,d", "={fuel}*24/1000000", "MMscf/d")
gs.add("fueld2", "Fuel gas, MMscf/d (gas balance)", "Q_f,d2", "={fuel}/1000000", "MMscf/d",
       planted=("unit-scale", "per hour written as per day: the ×24 missing"))
gs.add("fsh", "Fuel gas, share of the throughput", "s_f", "={fueld}/{Q}*100", "%")
GASS = gs.finish()

GAS = {
    "A1": "Brackwater Hill: suction gas analysis (invented) and its molar mass",
    "A2": "Sources: molar masses of the components (IUPAC 2013 atomic weights, from memory); "
          "M = Σ y_i·M_i, mass fraction = y_i·M_i/M (common practice).",
    "A3": CAUTION,
    "A5": "Component", "B5": "Mole fraction [%]", "C5": "Molar mass [kg/kmol]",
    "D5": "y·M [kg/kmol]", "E5": "Mass fraction [%]",
    "A11": "Total", "B11": "=SUM(B6:B10)", "D11": "=SUM(D6:D10)",
}
for r, (comp, y, mm) in enumerate([("Methane", 90.0, 16.043), ("Ethane", 5.0, 30.069),
                                   ("Propane", 2.0, 44.097), ("Nitrogen", 2.0, 28.013),
                                   ("Carbon dioxide", 1.0, 44.010)], start=6):
    GAS[f"A{r}"], GAS[f"B{r}"], GAS[f"C{r}"] = comp, y, mm
    GAS[f"D{r}"] = f"=B{r}*C{r}/100"
    GAS[f"E{r}"] = f"=D{r}/$D$11*100"
GAS["E8"] = "=D8/$D$11"
GAS_PLANTED = {"Gas!E8": ("unit-scale", "a fraction written as %: 100 too small")}

GASB = {
    "trade": "gas transmission: compressor station suction, discharge, power and fuel",
    "sheets": [("Station", GASS), ("Gas", GAS)],
    "planted": {**gs.planted, **GAS_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 3: wastewater aeration basin (m³/d, mg/L, kg/d, kg O2/d, kg O2/h, lb/d, °C, °F, K,
# kPa, kPa(g), m, ft, psi, %, Nm³/h, scfm, kg/s, kW, hp, kg O2/kWh, lb/(hp·h))
# --------------------------------------------------------------------------------------------
AER_SRC = (
    "Sources: oxygen demand ≈ 1.1 kg O2 per kg BOD removed + 4.57 kg O2 per kg NH4-N nitrified "
    "(Metcalf & Eddy, Wastewater Engineering, 5th ed., ch. 8, from memory); kg/d = m³/d × mg/L "
    "/ 1000 (common practice); field to standard transfer SOTR = AOTR/[α·F·(β·C̄_s,T,H − C_L)/"
    "C̄_s,20 · θ^(T−20)], θ = 1.024, mid-depth saturation C̄_s = C_s·½(P_d/P_atm + O_t/21), "
    "altitude by P_b/101.325 (Metcalf & Eddy, 5th ed., ch. 5, from memory); saturation DO in "
    "fresh water at 101.325 kPa on the DO sheet (Standard Methods 4500-O, from memory); air "
    "23.18 % O2 by mass and 1.293 kg/Nm³ at 0 °C and 101.325 kPa (Metcalf & Eddy, 5th ed., "
    "App. B, from memory); 1 scfm = 1.607 Nm³/h (scf at 60 °F, Nm³ at 0 °C, NIST SP 811 (2008) "
    "App. B.8 for the cubic foot); column ρ·g·h with g_n = 9.81 m/s² (SI Brochure 9th ed.); "
    "blower power P = ṁ·c_p·T_1·((p_2/p_1)^0.283 − 1)/η, air c_p = 1.005 kJ/(kg·K) (Metcalf "
    "& Eddy, 5th ed., ch. 5, from memory); NIST SP 811 (2008) App. B.8: 1 kg = 2.205 lb, "
    "1 hp = 0.7457 kW, 1 psi = 6.895 kPa, 1 m = 3.281 ft, 1 kg/kWh = 1.644 lb/(hp·h). Works, "
    "basin, maker's data and readings invented.")
ae = ItemSheet("Aeration", "Millbrook Lane WwTW (invented): activated sludge lane 2, "
               "fine-bubble aeration and blowers, summer design", AER_SRC)
ae.heading("Load")
ae.add("Q", "Design flow to lane 2", "Q", 20000, "m³/d")
ae.add("So", "Settled BOD5", "S_o", 220, "mg/L")
ae.add("S", "Effluent soluble BOD5", "S", 8, "mg/L")
ae.add("NOx", "Ammonia nitrified", "N_ox", 32, "mg/L")
ae.add("BODr", "BOD removed", "ΔBOD", "={Q}*({So}-{S})/1000", "kg/d")
ae.add("Nn", "Ammonia nitrified, load", "ΔN", "={Q}*{NOx}/1000", "kg/d")
ae.add("AOR", "Actual oxygen demand, average day", "AOR", "=1.1*{BODr}+4.57*{Nn}", "kg O2/d")
ae.add("AORlb", "Actual oxygen demand, lb/d (US blower maker)", "AOR_lb", "={AOR}*2.205",
       "lb/d")
ae.add("AORlb2", "Actual oxygen demand, lb/d (first draft)", "AOR_lb2", "={AOR}/2.205", "lb/d",
       planted=("unit-scale", "kg to lb divided by 2.205: wrong way round"))
ae.add("PF", "Peak factor on the oxygen demand (designer's)", "f_p", 1.4, "-")
ae.add("AOTR", "Actual oxygen transfer rate, peak", "AOTR", "={AOR}*{PF}/24", "kg O2/h")
ae.heading("Transfer conditions")
ae.add("T", "Mixed liquor temperature, summer", "T", 25, "°C")
ae.add("TF", "Mixed liquor temperature, °F (US blower maker's form)", "T_F", "={T}*1.8+32",
       "°F")
ae.add("CsT", "Saturation DO at T (DO sheet)", "C_s,T", "=VLOOKUP({T},DO!A6:B10,2,FALSE)",
       "mg/L")
ae.add("Cs20", "Saturation DO at 20 °C (DO sheet)", "C_s,20", "=VLOOKUP(20,DO!A6:B10,2,FALSE)",
       "mg/L")
ae.add("Pb", "Site barometer (240 m above sea level)", "P_b", 98.5, "kPa")
ae.add("Z", "Diffuser submergence", "Z", 5.5, "m")
ae.add("rho", "Water density at 25 °C", "ρ", 997, "kg/m³")
ae.add("pz", "Water column over the diffusers", "p_z", "={rho}*9.81*{Z}/1000", "kPa")
ae.add("pz2", "Water column over the diffusers (first draft)", "p_z2", "={rho}*{Z}/1000", "kPa",
       planted=("result-unit", "ρ·h/1000 with g left out of ρ·g·h"))
ae.add("Zft", "Diffuser submergence, ft", "Z_ft", "={Z}*3.281", "ft")
ae.add("pzpsi", "Water column over the diffusers, psi", "p_z,psi", "={pz}/6.895", "psi")
ae.add("Pd", "Absolute pressure at the diffusers", "P_d", "={Pb}+{pz}", "kPa")
ae.add("Ot", "Oxygen in the off-gas (maker's test, invented)", "O_t", 19, "%")
ae.add("CsTH", "Saturation DO at T and the site barometer", "C_s,T,H", "={CsT}*{Pb}/101.325",
       "mg/L")
ae.add("CbT", "Mid-depth saturation DO at T", "C̄_s,T", "={CsTH}*0.5*({Pd}/{Pb}+{Ot}/21)",
       "mg/L")
ae.add("Cb20", "Mid-depth saturation DO at standard conditions", "C̄_s,20",
       "={Cs20}*0.5*((101.325+{pz})/101.325+{Ot}/21)", "mg/L")
ae.add("alpha", "α, process water to clean water", "α", 0.5, "-")
ae.add("beta", "β, salinity and dissolved solids", "β", 0.95, "-")
ae.add("F", "Diffuser fouling factor", "F", 0.9, "-")
ae.add("theta", "Temperature correction θ", "θ", 1.024, "-")
ae.add("CL", "Operating DO", "C_L", 2.0, "mg/L")
ae.add("ratio", "AOTR/SOTR", "f_AS", "={alpha}*{F}*({beta}*{CbT}-{CL})/{Cb20}*{theta}^({T}-20)",
       "-")
ae.add("ratio2", "AOTR/SOTR (US blower maker's form)", "f_AS2",
       "={alpha}*{F}*({beta}*{CbT}-{CL})/{Cb20}*{theta}^({TF}-20)", "-",
       planted=("offset-scale", "a °F reading in the °C correction θ^(T − 20): 57 degrees "
                                "where 5 belong"))
ae.add("SOTR", "Standard oxygen transfer rate, peak", "SOTR", "={AOTR}/{ratio}", "kg O2/h")
ae.heading("Air")
ae.add("SOTE", "Standard oxygen transfer efficiency at 5.5 m (maker, invented)", "SOTE", 32,
       "%")
ae.add("Qair", "Air flow, peak", "Q_air", "={SOTR}/({SOTE}/100*0.2318*1.293)", "Nm³/h")
ae.add("Qair2", "Air flow, peak (first draft)", "Q_air2", "={SOTR}/({SOTE}*0.2318*1.293)",
       "Nm³/h", planted=("unit-scale", "% used as a fraction: 100 too small"))
ae.add("Qscfm", "Air flow, peak, scfm (US blower maker)", "Q_scfm", "={Qair}/1.607", "scfm")
ae.add("Qscfm2", "Air flow, peak, scfm (first draft)", "Q_scfm2", "={Qair}*35.31/60", "scfm",
       planted=("unit-scale", "Nm³ (0 °C) to scf (60 °F) by the cubic foot alone: the ratio 288.71/273.15 = 1.057 left out"))
ae.add("mair", "Air mass flow", "ṁ_a", "={Qair}*1.293/3600", "kg/s")
ae.add("mair2", "Air mass flow (first draft)", "ṁ_a2", "={Qair}*1.293", "kg/s",
       planted=("unit-scale", "per hour written as per second: the /3600 missing"))
ae.heading("Blowers")
ae.add("dpl", "Losses: diffusers, pipework, inlet filter and silencer", "Δp_l", 12, "kPa")
ae.add("p2", "Blower discharge pressure, absolute", "p_2", "={Pd}+{dpl}", "kPa")
ae.add("p2g", "Blower discharge pressure, gauge", "p_2,g", "={pz}+{dpl}", "kPa(g)")
ae.add("rb", "Blower pressure ratio", "r", "={p2}/{Pb}", "-")
ae.add("rb2", "Blower pressure ratio (first draft)", "r_2", "={p2g}/{Pb}", "-",
       planted=("offset-scale", "a gauge reading over an absolute one in a pressure ratio"))
ae.add("t1", "Blower inlet air temperature, summer", "t_1", 35, "°C")
ae.add("T1", "Blower inlet air temperature, absolute", "T_1", "={t1}+273.15", "K")
ae.add("cpa", "Specific heat of air", "c_p", 1.005, "kJ/(kg·K)")
ae.add("etab", "Blower wire-to-air efficiency (maker, invented)", "η_b", 70, "%")
ae.add("Pw", "Blower power, peak", "P_w", "={mair}*{cpa}*{T1}*({rb}^0.283-1)/({etab}/100)", "kW")
ae.add("Pw2", "Blower power, peak (first draft)", "P_w2",
       "={mair}*{cpa}*{t1}*({rb}^0.283-1)/({etab}/100)", "kW",
       planted=("offset-scale", "a °C reading where the absolute inlet temperature belongs"))
ae.add("Php", "Blower power, hp", "P_hp", "={Pw}/0.7457", "hp")
ae.add("SAE", "Standard aeration efficiency, wire to water", "SAE", "={SOTR}/{Pw}", "kg O2/kWh")
ae.add("SAElb", "Standard aeration efficiency, US", "SAE_US", "={SAE}*1.644", "lb/(hp·h)")
AERS = ae.finish()

DO = {
    "A1": "Saturation dissolved oxygen in fresh water at 101.325 kPa (Standard Methods 4500-O "
          "table, rounded, from memory; check against the table before use)",
    "A2": "Sources: Standard Methods for the Examination of Water and Wastewater, 4500-O (from "
          "memory); °F = 1.8·°C + 32.",
    "A3": CAUTION,
    "A5": "Temperature [°C]", "B5": "Saturation DO [mg/L]", "C5": "Temperature [°F]",
}
for r, (t, cs) in enumerate([(10, 11.29), (15, 10.08), (20, 9.09), (25, 8.26), (30, 7.56)],
                            start=6):
    DO[f"A{r}"], DO[f"B{r}"] = t, cs
    DO[f"C{r}"] = f"=A{r}*1.8+32"
DO["C9"] = "=A9*1.8"
DO_PLANTED = {"DO!C9": ("offset-scale", "°C to °F without the +32")}

AERB = {
    "trade": "wastewater: aeration basin oxygen demand, transfer, air flow and blowers",
    "sheets": [("Aeration", AERS), ("DO", DO)],
    "planted": {**ae.planted, **DO_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 4: steel warehouse portal frame loads (m, ft, kN/m², psf, kN/m, kip/ft, kN·m, kip·ft,
# kN, kip, cm³, cm⁴, MPa, ksi, mm, in, m/s, mph, °C, °F, 1/K, %)
# --------------------------------------------------------------------------------------------
PF_SRC = (
    "Sources: EN 1990 (2002) eq. 6.10, 1.35·G_k + 1.5·Q_k (from memory); roof snow s = μ1·C_e"
    "·C_t·s_k with μ1 = 0.8 for a roof below 30° (EN 1991-1-3 (2003), from memory); basic "
    "velocity pressure q_b = ½·ρ·v_b² with ρ = 1.25 kg/m³ and q_p = c_e·q_b (EN 1991-1-4 "
    "(2005), from memory); US check q = 0.00256·V² psf with V in mph (ASCE 7-16 eq. 26.10-1 "
    "with K_z = K_zt = K_d = 1, from memory); preliminary plastic moment of a low-pitch "
    "pinned-base portal w·L²/16, hinges at the eaves and near the apex, and base thrust "
    "H = M_p/h (common practice); M_pl,Rd = W_pl·f_y/γ_M0, γ_M0 = 1.0, E = 210 000 MPa, "
    "α = 12 × 10⁻⁶ /K (EN 1993-1-1 (2005), from memory); simply supported deflection "
    "5·w·L⁴/(384·E·I), limit L/200 for purlins (common practice); section properties on the "
    "Sections sheet (EN 10365 / maker's tables, from memory); self-weight = mass × g_n with "
    "g_n = 9.81 m/s² (SI Brochure 9th ed.); NIST SP 811 (2008) App. B.8: 1 kN/m² = 20.89 psf, "
    "1 kN = 0.2248 kip (1 kip = 4.448 kN), 1 kN/m = 0.06852 kip/ft, 1 kN·m = 0.7376 kip·ft, "
    "1 ksi = 6.895 MPa, 1 in = 25.4 mm, 1 m = 3.281 ft, 1 m/s = 2.237 mph; °F = 1.8·°C + 32. "
    "Warehouse, site, purlin catalogue and readings invented.")
pf = ItemSheet("Frame", "Fenwick Road distribution warehouse (invented): typical internal "
               "portal frame, preliminary loads and member check", PF_SRC)
pf.heading("Geometry")
pf.add("L", "Span", "L", 30, "m")
pf.add("a", "Frame spacing (bay)", "a", 7.5, "m")
pf.add("h", "Eaves height", "h", 8.0, "m")
pf.add("Lb", "Building length (12 bays)", "L_b", 90, "m")
pf.add("Lft", "Span, ft", "L_ft", "={L}*3.281", "ft")
pf.heading("Roof loads")
pf.add("gk", "Permanent load: cladding, purlins and services (invented)", "g_k", 0.40, "kN/m²")
pf.add("gkpsf", "Permanent load, psf", "g_k,US", "={gk}*20.89", "psf")
pf.add("sk", "Characteristic ground snow load (national annex map, invented zone)", "s_k",
       0.75, "kN/m²")
pf.add("mu1", "Snow load shape coefficient, roof pitch 6°", "μ1", 0.8, "-")
pf.add("s", "Roof snow load", "s", "={mu1}*{sk}", "kN/m²")
pf.add("spsf", "Roof snow load, psf", "s_US", "={s}*20.89", "psf")
pf.add("spsf2", "Roof snow load, psf (US reviewer's summary)", "s_US2", "={s}/20.89", "psf",
       planted=("unit-scale", "kN/m² to psf divided by 20.89: wrong way round"))
pf.add("size", "Rafter and column section, IPE depth (Sections sheet)", "h_s", 500, "mm")
pf.add("gsw", "Rafter self-weight (Sections sheet)", "g_sw",
       "=VLOOKUP({size},Sections!A6:F9,6,FALSE)", "kN/m")
pf.add("w", "Rafter line load, ULS (EN 1990 eq. 6.10)", "w_Ed", "=1.35*({gk}*{a}+{gsw})+1.5*{s}*{a}",
       "kN/m")
pf.add("wklf", "Rafter line load, ULS, kip/ft", "w_US", "={w}*0.06852", "kip/ft")
pf.heading("Frame actions (preliminary)")
pf.add("Mp", "Plastic moment needed, w·L²/16", "M_Ed", "={w}*{L}^2/16", "kN·m")
pf.add("Mkft", "Plastic moment needed, kip·ft", "M_US", "={Mp}*0.7376", "kip·ft")
pf.add("Mkft2", "Plastic moment needed, kip·ft (US reviewer's summary)", "M_US2",
       "={Mp}*737.6", "kip·ft",
       planted=("unit-scale", "kN·m to lbf·ft written as kip·ft: 1000 too large"))
pf.add("V", "Vertical reaction at each base", "V_Ed", "={w}*{L}/2", "kN")
pf.add("Vkip", "Vertical reaction, kip", "V_US", "={V}/4.448", "kip")
pf.add("Vkip2", "Vertical reaction, kip (anchor bolt supplier)", "V_US2", "={V}*4.448", "kip",
       planted=("unit-scale", "kN to kip multiplied by 4.448: wrong way round"))
pf.add("H", "Horizontal thrust at each base, M_p/h", "H_Ed", "={Mp}/{h}", "kN")
pf.add("Hkip", "Horizontal thrust, kip", "H_US", "={H}/4.448", "kip")
pf.heading("Section resistance (S355)")
pf.add("Wpl", "Plastic modulus (Sections sheet)", "W_pl", "=VLOOKUP({size},Sections!A6:F9,5,FALSE)",
       "cm³")
pf.add("fy", "Yield strength, S355, t ≤ 40 mm", "f_y", 355, "MPa")
pf.add("gM0", "Partial factor γ_M0", "γ_M0", 1.0, "-")
pf.add("MRd", "Plastic moment resistance", "M_pl,Rd", "={Wpl}*{fy}/{gM0}/1000", "kN·m")
pf.add("MRd2", "Plastic moment resistance (first draft)", "M_pl,Rd2",
       "={Wpl}*{fy}/{gM0}/1000000", "kN·m",
       planted=("unit-scale", "cm³ × MPa to kN·m divided by 10⁶: the /1000 taken twice"))
pf.add("util", "Utilisation in bending", "u", "={Mp}/{MRd}*100", "%")
pf.add("fyksi", "Yield strength, ksi", "f_y,US", "={fy}/6.895", "ksi")
pf.heading("Base plate bearing")
pf.add("bp", "Base plate width", "b_p", 300, "mm")
pf.add("dp", "Base plate length", "d_p", 500, "mm")
pf.add("sig", "Mean bearing pressure under the plate", "σ_c", "={V}*1000/({bp}*{dp})", "MPa")
pf.add("sig2", "Mean bearing pressure (first draft)", "σ_c2", "={V}/({bp}*{dp})", "MPa",
       planted=("unit-scale", "kN over mm² written as MPa: the ×1000 missing"))
pf.add("sigksi", "Mean bearing pressure, ksi", "σ_c,US", "={sig}/6.895", "ksi")
pf.heading("Purlins (serviceability)")
pf.add("sp", "Purlin spacing", "s_p", 1.8, "m")
pf.add("Ip", "Purlin second moment of area (Z250, maker's table, invented)", "I_p", 1150,
       "cm⁴")
pf.add("E", "Modulus of elasticity", "E", 210000, "MPa")
pf.add("wp", "Purlin line load, characteristic", "w_p", "=({gk}+{s})*{sp}", "kN/m")
pf.add("dl", "Purlin deflection, simply supported", "δ",
       "=5*{wp}*({a}*1000)^4/(384*{E}*{Ip}*10000)", "mm")
pf.add("dl2", "Purlin deflection (first draft)", "δ_2", "=5*{wp}*{a}^4/(384*{E}*{Ip}*10000)",
       "mm", planted=("unit-scale", "the span in m where mm belongs: 10¹² too small"))
pf.add("dlim", "Deflection limit L/200", "δ_lim", "={a}*1000/200", "mm")
pf.add("dlin", "Purlin deflection, in", "δ_US", "={dl}/25.4", "in")
pf.heading("Wind (EN 1991-1-4, with a US check)")
pf.add("vb", "Basic wind velocity (national annex map, invented)", "v_b", 26, "m/s")
pf.add("ce", "Exposure factor at eaves height (terrain II)", "c_e", 2.1, "-")
pf.add("qb", "Basic velocity pressure", "q_b", "=0.5*1.25*{vb}^2/1000", "kN/m²")
pf.add("qb2", "Basic velocity pressure (first draft)", "q_b2", "=0.5*1.25*{vb}^2", "kN/m²",
       planted=("unit-scale", "½ρv² gives Pa, written as kN/m²: the /1000 missing"))
pf.add("qp", "Peak velocity pressure", "q_p", "={ce}*{qb}", "kN/m²")
pf.add("qppsf", "Peak velocity pressure, psf", "q_p,US", "={qp}*20.89", "psf")
pf.add("vmph", "Basic wind velocity, mph", "V", "={vb}*2.237", "mph")
pf.add("qUS", "Velocity pressure, US check (K_z = K_zt = K_d = 1)", "q_US", "=0.00256*{vmph}^2",
       "psf")
pf.heading("Thermal movement between expansion joints")
pf.add("ti", "Steel temperature at erection", "t_i", 10, "°C")
pf.add("tmax", "Steel temperature, hottest day in sun", "t_max", 45, "°C")
pf.add("alpha", "Coefficient of thermal expansion, steel", "α", 0.000012, "1/K")
pf.add("dLb", "Expansion over the building length", "ΔL", "={alpha}*{Lb}*({tmax}-{ti})*1000",
       "mm")
pf.add("dLb2", "Expansion over the building length (first draft)", "ΔL_2",
       "={alpha}*{Lb}*{tmax}*1000", "mm",
       planted=("offset-scale", "a °C reading in a product where the rise belongs"))
pf.add("dLbin", "Expansion over the building length, in", "ΔL_US", "={dLb}/25.4", "in")
pf.add("tmaxF", "Steel temperature, hottest day, °F", "t_max,F", "={tmax}*1.8+32", "°F")
PFS = pf.finish()

SECTIONS = {
    "A1": "IPE sections, S355 (EN 10365 / maker's tables, rounded, from memory; check against "
          "the maker's table before use)",
    "A2": "Sources: section properties (EN 10365 (2017), from memory); self-weight = mass × "
          "g_n / 1000, g_n = 9.81 m/s² (SI Brochure 9th ed.).",
    "A3": CAUTION,
    "A5": "Depth [mm]", "B5": "Mass [kg/m]", "C5": "Area [cm²]", "D5": "I_y [cm⁴]",
    "E5": "W_pl,y [cm³]", "F5": "Self-weight [kN/m]",
}
for r, (d, m, A, Iy, Wpl) in enumerate([(400, 66.3, 84.5, 23130, 1307),
                                        (450, 77.6, 98.8, 33740, 1702),
                                        (500, 90.7, 116.0, 48200, 2194),
                                        (550, 106.0, 134.0, 67120, 2787)], start=6):
    SECTIONS[f"A{r}"], SECTIONS[f"B{r}"], SECTIONS[f"C{r}"] = d, m, A
    SECTIONS[f"D{r}"], SECTIONS[f"E{r}"] = Iy, Wpl
    SECTIONS[f"F{r}"] = f"=B{r}*9.81/1000"
SECTIONS["F9"] = "=B9/1000"
SEC_PLANTED = {"Sections!F9": ("result-unit", "kg/m over 1000 with g left out: t/m written as "
                                              "kN/m")}

PFB = {
    "trade": "structural steel: warehouse portal frame loads, actions and checks",
    "sheets": [("Frame", PFS), ("Sections", SECTIONS)],
    "planted": {**pf.planted, **SEC_PLANTED},
}

BOOKS = {"chw-plant-kestrel": CHWB, "compressor-brackwater": GASB,
         "aeration-millbrook": AERB, "portal-frame-fenwick": PFB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()
