#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review55), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; pattern after
corpus/sheets/review54/make_books.py.

Trades: a food plant's clean-in-place (CIP) skid; a hotel laundry's steam tumblers and ironer;
a mine's dewatering pumps in series; a school's rainwater harvesting tank and pump. All
scenarios, sites, firms, readings and maker's data are invented (demonstration only); the
formulas and published factors are the trade's own, with their sources named in a text cell at
the top of each sheet ("from memory" where recalled and not checked, "common practice" for a
fact of the trade with no single source).

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
# Book 1: food plant CIP skid (in, mm, m, m/s, L/min, gpm, m³/h, L, US gal, % w/w, kg/L, °C,
# °F, K, kJ, kWh, kW, W, Btu/h, bar(g), psig, bar a, bar, hp, mPa·s, min)
# --------------------------------------------------------------------------------------------
CIP_SRC = (
    "Sources: 1 in = 25.4 mm, 1 US gal = 3.785 L, 1 bar = 14.50 psi, 1 kW = 3412 Btu/h, "
    "1 kWh = 3600 kJ, 1 lb = 0.4536 kg (NIST SP 811 (2008) App. B.8); "
    "°F = 1.8·°C + 32, K = °C + 273.15 (SI Brochure 9th ed.); CIP line velocity of at least "
    "1.5 m/s (common practice); 3 in sanitary tube, 0.065 in wall, bore 2.87 in (ASME BPE "
    "tube tables, from memory); density of 50 % w/w NaOH 1.52 kg/L and of 1.5 % w/w NaOH "
    "1.015 kg/L at 20 °C (Perry's Chemical Engineers' Handbook, 8th ed., sect. 2, from "
    "memory); c_p of dilute caustic ≈ 4.0 kJ/(kg·K) (from memory); heat Q = m·c_p·ΔT (common "
    "practice); h_fg of steam 2133 kJ/kg at 4 bar a (IAPWS-IF97 steam tables, from memory); "
    "pump hydraulic power P(kW) = Q(L/min)·Δp(bar)/600 (common practice, 1 bar·L/min = "
    "1.667 W); head H = Δp/(ρ·g), g_n = 9.81 m/s² (SI Brochure 9th ed.); Re = ρ·v·d/μ "
    "(common practice); site barometer 1.013 bar (near sea level, invented). Plant, skid, "
    "circuit, maker's data and readings invented.")
cp_ = ItemSheet("Skid", "Harrow Dene Dairy (invented): CIP skid 2, caustic wash of the "
                "pasteuriser-to-filler circuit, design cycle", CIP_SRC)
cp_.heading("Circuit and flow")
cp_.add("din", "Return line bore, 3 in sanitary tube", "d_in", 2.87, "in")
cp_.add("d", "Return line bore, mm", "d", "={din}*25.4", "mm")
cp_.add("Lc", "Circuit length, supply and return", "L_c", 85, "m")
cp_.add("v", "Design velocity in the circuit", "v", 1.8, "m/s")
cp_.add("Q", "CIP supply flow", "Q", "={v}*PI()*({d}/1000)^2/4*60000", "L/min")
cp_.add("Qgpm", "CIP supply flow, US gpm", "Q_US", "={Q}/3.785", "gpm")
cp_.add("Qgpm2", "CIP supply flow, US gpm (US pump maker's enquiry)", "Q_US2", "={Q}*3.785",
        "gpm", planted=("unit-scale", "L/min to US gpm multiplied by 3.785: wrong way round"))
cp_.add("Qm3h", "CIP supply flow, m³/h", "Q_h", "={Q}*0.06", "m³/h")
cp_.add("Vl", "Liquid hold-up of the circuit", "V_l", "=PI()*({d}/1000)^2/4*{Lc}*1000", "L")
cp_.heading("Caustic make-up")
cp_.add("Vt", "Caustic tank working volume", "V_t", 1500, "L")
cp_.add("c", "Target caustic strength", "c", 1.5, "% w/w")
cp_.add("rhos", "Density of the 1.5 % caustic solution", "ρ_s", 1.015, "kg/L")
cp_.add("ms", "Mass of caustic solution in the tank", "m_s", "={Vt}*{rhos}", "kg")
cp_.add("mN", "NaOH in the tank", "m_NaOH", "={ms}*{c}/100", "kg")
cp_.add("mN2", "NaOH in the tank (first draft)", "m_NaOH2", "={ms}*{c}", "kg",
        planted=("unit-scale", "a % w/w used as a fraction: 100 too large"))
cp_.add("cst", "Stock caustic strength (delivered)", "c_st", 50, "% w/w")
cp_.add("rhost", "Density of the stock caustic", "ρ_st", 1.52, "kg/L")
cp_.add("mst", "Stock caustic per make-up", "m_st", "={mN}/({cst}/100)", "kg")
cp_.add("Vst", "Stock caustic per make-up, volume", "V_st", "={mst}/{rhost}", "L")
cp_.add("Vstgal", "Stock caustic per make-up, US gal", "V_st,US", "={Vst}/3.785", "US gal")
cp_.heading("Heating the wash")
cp_.add("t1", "Make-up water temperature", "t_1", 12, "°C")
cp_.add("t2", "Caustic wash temperature", "t_2", 75, "°C")
cp_.add("t2F", "Caustic wash temperature, °F", "t_2,F", "={t2}*1.8+32", "°F")
cp_.add("T2K", "Caustic wash temperature, absolute (gasket maker's data sheet)", "T_2",
        "={t2}+273.15", "K")
cp_.add("T2K2", "Caustic wash temperature, absolute (first draft)", "T_22", "={t2}", "K",
        planted=("offset-scale", "a °C reading set equal to kelvins: the 273.15 missing"))
cp_.add("dT", "Temperature rise of the wash", "ΔT", "={t2}-{t1}", "K")
cp_.add("cp", "Specific heat of the dilute caustic", "c_p", 4.0, "kJ/(kg·K)")
cp_.add("E", "Heat to bring the tank to temperature", "E", "={ms}*{cp}*{dT}", "kJ")
cp_.add("EkWh", "Heat to bring the tank to temperature, kWh", "E_kWh", "={E}/3600", "kWh")
cp_.add("EkWh2", "Heat per make-up, kWh (energy report)", "E_kWh2", "={E}/1000", "kWh",
        planted=("unit-scale", "kJ to kWh divided by 1000 where 3600 belongs"))
cp_.add("th", "Heat-up time allowed", "t_h", 25, "min")
cp_.add("Ph", "Heat-up duty", "P_h", "={E}/({th}*60)", "kW")
cp_.add("Ph2", "Heat-up duty (first draft)", "P_h2", "={E}/{th}", "kW",
        planted=("unit-scale", "kJ per minute written as kW: the ×60 missing"))
cp_.add("Pl", "Tank shell and pipe loss at 75 °C (insulated, invented)", "P_l", 1800, "W")
cp_.add("Pt", "Heater duty including losses", "P_t", "={Ph}+{Pl}/1000", "kW")
cp_.add("Pt2", "Heater duty including losses (heat exchanger enquiry)", "P_t2", "={Ph}+{Pl}",
        "kW", planted=("unit-scale", "W added to kW"))
cp_.add("PtB", "Heater duty, Btu/h (US heat exchanger maker)", "P_t,US", "={Pt}*3412",
        "Btu/h")
cp_.heading("Steam to the heater")
cp_.add("ps", "Steam pressure at the heat exchanger control valve", "p_s", 3.0, "bar(g)")
cp_.add("pspsig", "Steam pressure, psig", "p_s,US", "={ps}*14.5", "psig")
cp_.add("pspsig2", "Steam pressure, psig (US valve maker's data sheet)", "p_s,US2",
        "={ps}*14.5+14.7", "psig",
        planted=("offset-scale", "the atmosphere added to a gauge reading written as psig"))
cp_.add("psa", "Steam pressure, absolute", "p_s,a", "={ps}+1.013", "bar a")
cp_.add("hfg", "Latent heat of steam at 4 bar a", "h_fg", 2133, "kJ/kg")
cp_.add("mss", "Steam flow", "ṁ_st", "={Pt}*3600/{hfg}", "kg/h")
cp_.add("msslb", "Steam flow, lb/h", "ṁ_st,US", "={mss}/0.4536", "lb/h")
cp_.heading("Supply pump")
cp_.add("dp", "Supply pump differential pressure at duty", "Δp", 3.5, "bar")
cp_.add("eta", "Pump efficiency at duty (maker's curve, invented)", "η", 60, "%")
cp_.add("Phy", "Pump hydraulic power", "P_hy", "={Q}*{dp}/600", "kW")
cp_.add("Phy2", "Pump hydraulic power (first draft)", "P_hy2", "={Q}*{dp}*100/1000", "kW",
        planted=("unit-scale", "L/min × kPa over 1000 taken as kW: the /60 missing"))
cp_.add("Psh", "Pump shaft power", "P_sh", "={Phy}/({eta}/100)", "kW")
cp_.add("H", "Pump head on the caustic solution", "H", "={dp}*100000/({rhos}*1000*9.81)",
        "m")
cp_.add("mu", "Viscosity of the dilute caustic at 75 °C (from memory)", "μ", 0.40, "mPa·s")
cp_.add("Re", "Reynolds number in the return line", "Re",
        "={rhos}*1000*{v}*{d}/1000/({mu}/1000)", "-")
cp_.heading("Rinse water per cycle (Program sheet)")
cp_.add("Wc", "Water to drain per CIP cycle", "W_c", "=Program!D10", "L")
cp_.add("nc", "CIP cycles of this circuit per week", "n_c", 12, "-")
cp_.add("Ww", "Water to drain per week", "W_w", "={Wc}*{nc}/1000", "m³")
CIPS = cp_.finish()

PROG = {
    "A1": "Harrow Dene Dairy CIP skid 2: once-through water steps of the design cycle (invented "
          "durations; flow at the skid's supply rate)",
    "A2": "Sources: water per step = duration × flow (common practice); 1 US gal = 3.785 L "
          "(NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Step", "B5": "Duration [min]", "C5": "Flow [L/min]", "D5": "Water [L]",
    "E5": "Water [US gal]",
    "A10": "Total", "B10": "=SUM(B6:B9)", "D10": "=SUM(D6:D9)",
}
for r, (step, dur, q) in enumerate([("Pre-rinse to drain", 6, 450),
                                    ("Intermediate rinse to drain", 4, 450),
                                    ("Final rinse to drain", 5, 450),
                                    ("Tank and spray-ball flush", 2, 200)], start=6):
    PROG[f"A{r}"], PROG[f"B{r}"], PROG[f"C{r}"] = step, dur, q
    PROG[f"D{r}"] = f"=B{r}*C{r}"
    PROG[f"E{r}"] = f"=D{r}/3.785"
PROG["E8"] = "=D8*3.785"
PROG_PLANTED = {"Program!E8": ("unit-scale", "L to US gal multiplied by 3.785: wrong way round")}

CIPB = {
    "trade": "food process: CIP skid flow, caustic make-up, heating, steam and pump",
    "sheets": [("Skid", CIPS), ("Program", PROG)],
    "planted": {**cp_.planted, **PROG_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 2: hotel laundry, steam tumblers and ironer (kg/d, h/d, kg/h, lb/h, %, °C, °F, K,
# kJ/kg, kW, W, Btu/h, bar(g), psig, kPa(g), bar a, kPa, g/kg, kg/m³, m³/h, cfm, kWh/kg)
# --------------------------------------------------------------------------------------------
LDY_SRC = (
    "Sources: 1 kg = 2.205 lb, 1 kW = 3412 Btu/h, 1 bar = 14.50 psi = 100 kPa, 1 cfm = 1.699 "
    "m³/h (1 ft³ = 0.02832 m³) (NIST SP 811 (2008) App. B.8); "
    "°F = 1.8·°C + 32; linen per occupied room and the residual moisture after extraction "
    "and after drying (common practice, figures invented); heat to evaporate = c_p·(t_ev − "
    "t_in) + h_fg, c_p = 4.19 kJ/(kg·K), h_fg = 2358 kJ/kg at 60 °C (IAPWS-IF97 steam tables, "
    "from memory); saturated steam properties on the Steam sheet (IAPWS-IF97, from memory); "
    "exhaust air mass = water removed/(x_out − x_in) (common practice); dry air density "
    "ρ = p/(R·T), R = 0.287 kJ/(kg·K) (common practice); make-up air heating 1.2·q·ΔT (kW, "
    "m³/s, K) and 1.08·cfm·ΔT (Btu/h, °F) (ASHRAE Handbook, Fundamentals (2021), ch. 18, "
    "from memory). Hotel, laundry, maker's data and readings invented.")
ld = ItemSheet("Laundry", "Grand Sable Hotel (invented): on-premises laundry, four steam "
               "tumblers and one steam ironer, design day", LDY_SRC)
ld.heading("Linen")
ld.add("rooms", "Guest rooms", "N_r", 320, "-")
ld.add("occ", "Design occupancy", "φ", 82, "%")
ld.add("lpr", "Linen per occupied room per day (dry weight)", "m_r", 4.2, "kg/d")
ld.add("fb", "Food and beverage and spa linen (dry weight)", "m_fb", 180, "kg/d")
ld.add("md", "Linen per day", "m_d", "={rooms}*{occ}/100*{lpr}+{fb}", "kg/d")
ld.add("hrs", "Laundry operating hours", "t_op", 14, "h/d")
ld.add("mh", "Linen throughput", "ṁ", "={md}/{hrs}", "kg/h")
ld.add("mhlb", "Linen throughput, lb/h (US equipment maker)", "ṁ_US", "={mh}*2.205", "lb/h")
ld.add("mhlb2", "Linen throughput, lb/h (first draft)", "ṁ_US2", "={mh}/2.205", "lb/h",
       planted=("unit-scale", "kg to lb divided by 2.205: wrong way round"))
ld.heading("Water to evaporate")
ld.add("sT", "Share of the linen to the tumblers (terry, robes)", "s_T", 40, "%")
ld.add("RMCi", "Residual moisture after extraction, of dry weight", "RMC_in", 50, "%")
ld.add("RMCo", "Residual moisture leaving the tumblers", "RMC_T", 5, "%")
ld.add("RMCr", "Residual moisture leaving the ironer", "RMC_I", 2, "%")
ld.add("mT", "Linen to the tumblers", "ṁ_T", "={mh}*{sT}/100", "kg/h")
ld.add("mI", "Linen to the ironer (flatwork)", "ṁ_I", "={mh}-{mT}", "kg/h")
ld.add("wT", "Water evaporated in the tumblers", "ṁ_wT", "={mT}*({RMCi}-{RMCo})/100", "kg/h")
ld.add("wT2", "Water evaporated in the tumblers (first draft)", "ṁ_wT2",
       "={mT}*({RMCi}-{RMCo})", "kg/h",
       planted=("unit-scale", "a difference of % used as a fraction: 100 too large"))
ld.add("wI", "Water evaporated in the ironer", "ṁ_wI", "={mI}*({RMCi}-{RMCr})/100", "kg/h")
ld.heading("Drying heat")
ld.add("tin", "Linen temperature leaving the washer-extractors", "t_in", 30, "°C")
ld.add("tev", "Evaporation temperature in the drum and on the bed", "t_ev", 60, "°C")
ld.add("cpw", "Specific heat of water", "c_p", 4.19, "kJ/(kg·K)")
ld.add("hfg60", "Latent heat of water at 60 °C", "h_fg,60", 2358, "kJ/kg")
ld.add("qw", "Heat per kg of water evaporated", "q_w", "={cpw}*({tev}-{tin})+{hfg60}", "kJ/kg")
ld.add("QT", "Heat into the water, tumblers", "Q_T", "={wT}*{qw}/3600", "kW")
ld.add("QT2", "Heat into the water, tumblers (first draft)", "Q_T2", "={wT}*{qw}", "kW",
       planted=("unit-scale", "kg/h × kJ/kg written as kW: the /3600 missing"))
ld.add("effT", "Tumbler thermal efficiency (maker, invented)", "η_T", 55, "%")
ld.add("effI", "Ironer thermal efficiency (maker, invented)", "η_I", 70, "%")
ld.add("QTc", "Steam coil duty, tumblers", "Q_T,c", "={QT}/({effT}/100)", "kW")
ld.add("QIc", "Steam duty, ironer", "Q_I,c", "={wI}*{qw}/3600/({effI}/100)", "kW")
ld.add("Qc", "Steam duty, tumblers and ironer", "Q_c", "={QTc}+{QIc}", "kW")
ld.add("QcB", "Steam duty, Btu/h (US maker's data)", "Q_c,US", "={Qc}*3412", "Btu/h")
ld.heading("Steam")
ld.add("pg", "Steam pressure at the laundry header", "p_g", 8.0, "bar(g)")
ld.add("pgpsi", "Steam pressure, psig", "p_g,US", "={pg}*14.5", "psig")
ld.add("pgkPa", "Steam pressure, kPa(g) (metric gauge schedule)", "p_g,k", "={pg}*1000",
       "kPa(g)", planted=("unit-scale", "bar to kPa multiplied by 1000 where 100 belongs"))
ld.add("pa", "Steam pressure, absolute", "p_a", "={pg}+1.013", "bar a")
ld.add("tsat", "Saturation temperature (Steam sheet)", "t_sat",
       "=VLOOKUP({pa},Steam!A6:F9,2,TRUE)", "°C")
ld.add("tsat2", "Saturation temperature (first draft)", "t_sat2",
       "=VLOOKUP({pg},Steam!A6:F9,2,TRUE)", "°C",
       planted=("offset-scale", "a gauge pressure looked up in a table of absolute pressures"))
ld.add("hfg", "Latent heat at the header pressure (Steam sheet)", "h_fg",
       "=VLOOKUP({pa},Steam!A6:F9,4,TRUE)", "kJ/kg")
ld.add("hg", "Enthalpy of dry saturated steam (Steam sheet)", "h_g",
       "=VLOOKUP({pa},Steam!A6:F9,5,TRUE)", "kJ/kg")
ld.add("mst", "Steam flow, tumblers and ironer", "ṁ_s", "={Qc}*3600/{hfg}", "kg/h")
ld.add("mstlb", "Steam flow, lb/h", "ṁ_s,US", "={mst}*2.205", "lb/h")
ld.add("hfw", "Feedwater enthalpy at 80 °C (tables)", "h_fw", 335, "kJ/kg")
ld.add("Qb", "Boiler output for the laundry", "Q_b", "={mst}*({hg}-{hfw})/3600", "kW")
ld.add("QbB", "Boiler output for the laundry, Btu/h", "Q_b,US", "={Qb}*3412", "Btu/h")
ld.heading("Exhaust and make-up air")
ld.add("xi", "Moisture content of the room air drawn in", "x_in", 8, "g/kg")
ld.add("xo", "Moisture content of the exhaust (maker's design)", "x_out", 25, "g/kg")
ld.add("ma", "Exhaust dry air flow", "ṁ_a", "=({wT}+{wI})/(({xo}-{xi})/1000)", "kg/h")
ld.add("pb", "Site barometer", "p_b", 101.3, "kPa")
ld.add("Ra", "Gas constant of dry air", "R_a", 0.287, "kJ/(kg·K)")
ld.add("tex", "Exhaust temperature at the fans", "t_ex", 55, "°C")
ld.add("rhoe", "Exhaust air density", "ρ_ex", "={pb}/({Ra}*({tex}+273.15))", "kg/m³")
ld.add("rhoe2", "Exhaust air density (first draft)", "ρ_ex2", "={pb}/({Ra}*{tex})", "kg/m³",
       planted=("offset-scale", "a °C reading in the gas law: absolute belongs"))
ld.add("Ve", "Exhaust air flow", "V̇_ex", "={ma}/{rhoe}", "m³/h")
ld.add("Vcfm", "Exhaust air flow, cfm", "V̇_ex,US", "={Ve}/1.699", "cfm")
ld.add("Vcfm2", "Exhaust air flow, cfm (duct contractor)", "V̇_ex,US2", "={Ve}*35.31", "cfm",
       planted=("unit-scale", "m³/h times 35.31 gives ft³/h, written as cfm: the /60 missing"))
ld.add("to", "Outdoor design temperature, winter", "t_o", -2, "°C")
ld.add("tr", "Laundry room temperature", "t_r", 20, "°C")
ld.add("Qmu", "Make-up air heating", "Q_mu", "=1.2*{Ve}/3600*({tr}-{to})", "kW")
ld.add("QmuB", "Make-up air heating, Btu/h (US check)", "Q_mu,US",
       "=1.08*{Vcfm}*({tr}-{to})*1.8", "Btu/h")
ld.heading("Electricity and energy per kg")
ld.add("Pd", "Tumbler drums and fans, 4 × 1100 W (maker)", "P_d", 4400, "W")
ld.add("Pir", "Ironer drive and vacuum fan (maker)", "P_ir", 3.0, "kW")
ld.add("Pel", "Electrical load", "P_el", "={Pd}/1000+{Pir}", "kW")
ld.add("Pel2", "Electrical load (first draft)", "P_el2", "={Pd}+{Pir}", "kW",
       planted=("unit-scale", "W added to kW"))
ld.add("e", "Energy per kg of linen (steam at the boiler and electricity)", "e",
       "=({Qb}+{Pel})/{mh}", "kWh/kg")
LDYS = ld.finish()

STEAM = {
    "A1": "Saturated steam by absolute pressure (IAPWS-IF97 steam tables, rounded, from memory; "
          "check against the tables before use)",
    "A2": "Sources: IAPWS-IF97 (from memory); °F = 1.8·°C + 32.",
    "A3": CAUTION,
    "A5": "Pressure [bar a]", "B5": "t_sat [°C]", "C5": "h_f [kJ/kg]", "D5": "h_fg [kJ/kg]",
    "E5": "h_g [kJ/kg]", "F5": "t_sat [°F]",
}
for r, (p, t, hf, hfg, hg) in enumerate([(5, 151.8, 640.1, 2107.4, 2747.5),
                                         (7, 165.0, 697.1, 2064.9, 2762.0),
                                         (9, 175.4, 742.6, 2030.5, 2773.0),
                                         (11, 184.1, 781.1, 1999.6, 2780.7)], start=6):
    STEAM[f"A{r}"], STEAM[f"B{r}"], STEAM[f"C{r}"] = p, t, hf
    STEAM[f"D{r}"], STEAM[f"E{r}"] = hfg, hg
    STEAM[f"F{r}"] = f"=B{r}*1.8+32"
STEAM["F8"] = "=B8*1.8"
STEAM_PLANTED = {"Steam!F8": ("offset-scale", "°C to °F by the 1.8 alone: the +32 missing")}

LDYB = {
    "trade": "building services: hotel laundry tumblers and ironer, steam and exhaust",
    "sheets": [("Laundry", LDYS), ("Steam", STEAM)],
    "planted": {**ld.planted, **STEAM_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 3: mine dewatering pumps in series (L/s, US gpm, m³/h, ML/d, SG, kg/m³, m, ft, mm, m²,
# m/s, kPa, psi, °C, °F, %, kW, hp, kWh/ML, MWh, $)
# --------------------------------------------------------------------------------------------
MINE_SRC = (
    "Sources: 1 L/s = 15.85 US gpm, 1 m = 3.281 ft, 1 psi = 6.895 kPa, 1 hp = "
    "0.7457 kW (NIST SP 811 (2008) App. B.8); °F = 1.8·°C + 32; g_n = 9.81 m/s² (SI "
    "Brochure 9th ed.); Darcy–Weisbach h_f = f·L/d·v²/(2g) and fittings K·v²/(2g) (Crane "
    "TP-410 (2013), from memory); NPSHa = (p_b − p_v)/(ρ·g) + z_s − h_fs (Hydraulic "
    "Institute, from memory); vapour pressure of water 2.98 kPa at 24 °C (IAPWS, from "
    "memory); Δp = ρ·g·H, and the US forms psi = 0.433·ft·SG and bhp = gpm·ft·SG/(3960·η) "
    "(common practice); hydraulic power ρ·g·Q·H (common practice); specific energy kWh/ML "
    "= P_in/(ML/h), and the check 2.725 kWh per ML per metre lifted (= g_n/3.6, common "
    "practice). Mine, shaft, pumps, maker's curve and readings invented.")
mn = ItemSheet("Dewatering", "Corrie Bend Mine (invented): main dewatering station at the "
               "420 m level, three multistage pumps in series to surface", MINE_SRC)
mn.heading("Flow")
mn.add("Q", "Design inflow to the main sump (hydrogeologist, invented)", "Q", 85, "L/s")
mn.add("Qgpm", "Design flow, US gpm", "Q_US", "={Q}*15.85", "gpm")
mn.add("Qgpm2", "Design flow, US gpm (US pump maker's enquiry)", "Q_US2", "={Q}/15.85", "gpm",
       planted=("unit-scale", "L/s to US gpm divided by 15.85: wrong way round"))
mn.add("QML", "Design flow, ML/d", "Q_ML", "={Q}*86400/1000000", "ML/d")
mn.add("QML2", "Design flow, ML/d (water licence return)", "Q_ML2", "={Q}*86400/1000", "ML/d",
       planted=("unit-scale", "L/d to ML/d divided by 1000 where 10⁶ belongs"))
mn.add("SG", "Specific gravity of the mine water (suspended solids, lab, invented)", "SG",
       1.08, "SG")
mn.add("rhow", "Density of clean water at 24 °C", "ρ_w", 997, "kg/m³")
mn.add("rho", "Density of the mine water", "ρ", "={SG}*{rhow}", "kg/m³")
mn.heading("Levels and column")
mn.add("zs", "Sump water level below the shaft collar (lowest)", "z_s", 418, "m")
mn.add("zd", "Discharge point above the shaft collar", "z_d", 6, "m")
mn.add("Hs", "Static lift", "H_s", "={zs}+{zd}", "m")
mn.add("d", "Column pipe bore (8 in, standard wall)", "d", 202.7, "mm")
mn.add("L", "Column length, shaft and surface", "L", 560, "m")
mn.add("A", "Column bore area", "A", "=PI()*({d}/1000)^2/4", "m²")
mn.add("v", "Velocity in the column", "v", "={Q}/1000/{A}", "m/s")
mn.add("f", "Darcy friction factor (Moody, commercial steel, invented roughness)", "f",
       0.017, "-")
mn.add("hf", "Friction loss in the column", "h_f", "={f}*{L}/({d}/1000)*{v}^2/(2*9.81)", "m")
mn.add("hf2", "Friction loss in the column (first draft)", "h_f2",
       "={f}*{L}/{d}*{v}^2/(2*9.81)", "m",
       planted=("unit-scale", "L in m over d in mm: 1000 too small"))
mn.add("K", "Fittings and valves, sum of K", "ΣK", 14, "-")
mn.add("hm", "Fittings loss", "h_m", "={K}*{v}^2/(2*9.81)", "m")
mn.add("H", "Total dynamic head", "H", "={Hs}+{hf}+{hm}", "m")
mn.add("Hft", "Total dynamic head, ft", "H_ft", "={H}*3.281", "ft")
mn.add("n", "Pumps in series", "n", 3, "-")
mn.add("Hp", "Head per pump", "H_p", "={H}/{n}", "m")
mn.add("Hc", "Head per pump on the maker's curve at the design flow (Curve sheet)", "H_c",
       "=VLOOKUP({Q},Curve!A6:E10,2,FALSE)", "m")
mn.add("dHc", "Head margin per pump", "ΔH", "={Hc}-{Hp}", "m")
mn.heading("Pressures")
mn.add("dp", "Pressure rise across the three pumps", "Δp", "={rho}*9.81*{H}/1000", "kPa")
mn.add("dppsi", "Pressure rise, psi", "Δp_US", "={dp}/6.895", "psi")
mn.add("dppsiUS", "Pressure rise, psi (US check)", "Δp_US,c", "={Hft}*0.433*{SG}", "psi")
mn.add("dppsi2", "Pressure rise, psi (US pump maker's check)", "Δp_US2", "={Hft}*0.433/{SG}",
       "psi", planted=("gravity-number", "the specific gravity divides where it multiplies"))
mn.heading("Suction of the first pump")
mn.add("pb", "Barometer at the 420 m level (survey, invented)", "p_b", 106.0, "kPa")
mn.add("tw", "Mine water temperature", "t_w", 24, "°C")
mn.add("twF", "Mine water temperature, °F", "t_w,F", "={tw}*1.8+32", "°F")
mn.add("pv", "Vapour pressure of water at 24 °C", "p_v", 2.98, "kPa")
mn.add("zsub", "Sump level above the first pump's impeller eye", "z_sub", 1.5, "m")
mn.add("hfs", "Suction pipe friction loss", "h_fs", 0.6, "m")
mn.add("NPSH", "NPSH available", "NPSHa", "=({pb}-{pv})*1000/({rho}*9.81)+{zsub}-{hfs}", "m")
mn.add("NPSH2", "NPSH available (first draft)", "NPSHa2",
       "=({pb}-{pv})*1000/{rho}+{zsub}-{hfs}", "m",
       planted=("sum-mismatch", "Δp/ρ with g left out, added to heads"))
mn.heading("Power and energy")
mn.add("eta", "Pump efficiency at the design flow (Curve sheet)", "η",
       "=VLOOKUP({Q},Curve!A6:E10,3,FALSE)", "%")
mn.add("Ph", "Hydraulic power", "P_h", "={rho}*9.81*{Q}/1000*{H}/1000", "kW")
mn.add("Ph2", "Hydraulic power (first draft)", "P_h2", "={rho}*9.81*{Q}/1000*{H}", "kW",
       planted=("unit-scale", "ρ·g·Q·H in W written as kW: the /1000 missing"))
mn.add("Psh", "Shaft power, three pumps", "P_sh", "={Ph}/({eta}/100)", "kW")
mn.add("Pp", "Shaft power per pump", "P_p", "={Psh}/{n}", "kW")
mn.add("Pphp", "Shaft power per pump, hp", "P_p,US", "={Pp}/0.7457", "hp")
mn.add("bhp", "Shaft power per pump, hp (US check)", "bhp",
       "={Qgpm}*{Hp}*3.281*{SG}/(3960*{eta}/100)", "hp")
mn.add("etam", "Motor efficiency (maker, invented)", "η_m", 95.5, "%")
mn.add("Pin", "Electrical input, three motors", "P_in", "={Psh}/({etam}/100)", "kW")
mn.add("e", "Specific energy", "e", "={Pin}/({Q}*3600/1000000)", "kWh/ML")
mn.add("e2", "Specific energy (monthly report)", "e_2", "={Pin}/({Q}*3.6)", "kWh/ML",
       planted=("unit-scale", "per m³ written as per ML: 1000 too small"))
mn.add("ec", "Specific energy, check by 2.725 kWh/ML per metre", "e_c",
       "=2.725*{H}*{SG}/({eta}/100*{etam}/100)", "kWh/ML")
mn.add("ut", "Pumping utilisation over the year", "u", 70, "%")
mn.add("Ea", "Energy per year", "E_a", "={Pin}*8760*{ut}/100/1000", "MWh")
MINES = mn.finish()

CURVE = {
    "A1": "Maker's curve for one pump of the series (invented, 1480 rpm, water SG 1)",
    "A2": "Sources: maker's curve (invented); 1 L/s = 15.85 US gpm, 1 m = 3.281 ft (NIST SP "
          "811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Flow [L/s]", "B5": "Head [m]", "C5": "Efficiency [%]", "D5": "Flow [US gpm]",
    "E5": "Head [ft]",
}
for r, (q, h, eff) in enumerate([(65, 163, 68.0), (75, 158, 71.5), (85, 151, 73.5),
                                 (95, 142, 74.5), (105, 131, 73.5)], start=6):
    CURVE[f"A{r}"], CURVE[f"B{r}"], CURVE[f"C{r}"] = q, h, eff
    CURVE[f"D{r}"] = f"=A{r}*15.85"
    CURVE[f"E{r}"] = f"=B{r}*3.281"
CURVE["E8"] = "=B8/3.281"
CURVE["D9"] = "=A9*3.6"
CURVE_PLANTED = {"Curve!E8": ("unit-scale", "m to ft divided by 3.281: wrong way round"),
                 "Curve!D9": ("unit-scale", "the m³/h factor 3.6 where US gpm (15.85) belongs")}

MINEB = {
    "trade": "mining: dewatering pumps in series, head, pressures, NPSH, power and energy",
    "sheets": [("Dewatering", MINES), ("Curve", CURVE)],
    "planted": {**mn.planted, **CURVE_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 4: school rainwater harvesting (mm, in, m², ft², m³, US gal, L/d, US gal/d, d, h/d,
# mm/h, L/s, gpm, m/s, kg/m³, m, %, kW, W, kWh/d, kWh/m³, $/m³, $)
# --------------------------------------------------------------------------------------------
RWH_SRC = (
    "Sources: 1 m² = 10.76 ft², 1 in = 25.4 mm, 1 m³ = 264.2 US gal, 1 L = 0.2642 US gal, "
    "1 L/s = 15.85 US gpm (NIST SP 811 (2008) App. B.8); 1 in of rain on 1 ft² = 0.623 US gal "
    "(common practice); yield = A·R·C·η (BS EN 16941-1:2018, from memory); simplified tank "
    "size 5 % of the lesser of yearly yield and yearly demand (BS EN 16941-1:2018, from "
    "memory); peak inflow Q = C·i·A/3600 (L/s from mm/h and m², rational method, common "
    "practice); pump power ρ·g·Q·H/η, g_n = 9.81 m/s² (SI Brochure 9th ed.). School, roof, "
    "rainfall, demand, tariff and maker's data invented.")
hv = ItemSheet("Harvest", "Wrenfield Primary School (invented): rainwater harvesting for WC "
               "flushing and garden, below-ground tank and booster pump", RWH_SRC)
hv.heading("Catchment and yield")
hv.add("A", "Roof catchment, plan area", "A", 1850, "m²")
hv.add("Aft", "Roof catchment, ft²", "A_US", "={A}*10.76", "ft²")
hv.add("Aft2", "Roof catchment, ft² (US tank supplier's form)", "A_US2", "={A}/10.76", "ft²",
       planted=("unit-scale", "m² to ft² divided by 10.76: wrong way round"))
hv.add("R", "Mean yearly rainfall (invented)", "R", 780, "mm")
hv.add("Rin", "Mean yearly rainfall, in", "R_in", "={R}/25.4", "in")
hv.add("C", "Runoff coefficient, pitched tiled roof", "C", 0.85, "-")
hv.add("eta", "Filter efficiency", "η_f", 90, "%")
hv.add("Y", "Yearly yield", "Y", "={A}*{R}/1000*{C}*{eta}/100", "m³")
hv.add("Y2", "Yearly yield (first draft)", "Y_2", "={A}*{R}*{C}*{eta}/100", "m³",
       planted=("unit-scale", "mm × m² gives litres, written as m³: the /1000 missing"))
hv.add("Ygal", "Yearly yield, US gal", "Y_US", "={Y}*264.2", "US gal")
hv.add("YgalUS", "Yearly yield, US gal (US check, 0.623 gal per in·ft²)", "Y_US,c",
       "={Aft}*{Rin}*0.623*{C}*{eta}/100", "US gal")
hv.add("YLd", "Mean daily yield", "Y_d", "={Y}*1000/365", "L/d")
hv.heading("Demand")
hv.add("np", "Pupils and staff", "N", 675, "-")
hv.add("wc", "WC and urinal flushing per person per school day (invented)", "q_wc", 8, "L/d")
hv.add("irr", "Garden irrigation, school-day average (invented)", "q_irr", 600, "L/d")
hv.add("Dd", "Demand per school day", "D_d", "={np}*{wc}+{irr}", "L/d")
hv.add("Ddgal", "Demand per school day, US gal/d", "D_d,US", "={Dd}*0.2642", "US gal/d")
hv.add("days", "School days per year", "n_d", 190, "d")
hv.add("Da", "Yearly demand", "D_a", "={Dd}*{days}/1000", "m³")
hv.heading("Tank")
hv.add("sh", "Tank size, share of the lesser of yield and demand", "s", 5, "%")
hv.add("V", "Tank size, simplified approach", "V", "=MIN({Y},{Da})*{sh}/100", "m³")
hv.add("V2", "Tank size (first draft)", "V_2", "=MIN({Y},{Da})*{sh}", "m³",
       planted=("unit-scale", "a % used as a fraction: 100 too large"))
hv.add("Vs", "Tank selected (maker's size, invented)", "V_s", 60, "m³")
hv.add("Vsgal", "Tank selected, US gal", "V_s,US", "={Vs}*264.2", "US gal")
hv.add("Dt", "Tank diameter", "D_t", 5.0, "m")
hv.add("ht", "Tank working depth", "h_t", "={Vs}/(PI()*{Dt}^2/4)", "m")
hv.add("st", "Storage, school days of demand", "t_s", "={Vs}*1000/{Dd}", "d")
hv.heading("Storm inflow and overflow")
hv.add("i", "Design rainfall intensity, 5 min storm (invented)", "i", 75, "mm/h")
hv.add("Qp", "Peak inflow to the tank", "Q_p", "={C}*{i}*{A}/3600", "L/s")
hv.add("Qp2", "Peak inflow to the tank (first draft)", "Q_p2", "={C}*{i}*{A}/3.6", "L/s",
       planted=("unit-scale", "mm/h × m² over 3.6 taken as L/s: 1000 too large"))
hv.add("Qpgpm", "Peak inflow, US gpm", "Q_p,US", "={Qp}*15.85", "gpm")
hv.add("dov", "Overflow pipe bore", "d_o", 150, "mm")
hv.add("vov", "Velocity in the overflow pipe, full bore", "v_o",
       "={Qp}/1000/(PI()*({dov}/1000)^2/4)", "m/s")
hv.heading("Booster pump to the roof header tank")
hv.add("Qpu", "Pump flow", "Q_pu", 1.5, "L/s")
hv.add("Hst", "Static lift, tank low level to header tank", "H_st", 16, "m")
hv.add("Hf", "Rising main friction loss", "h_f", 5, "m")
hv.add("Hpu", "Pump head", "H_pu", "={Hst}+{Hf}", "m")
hv.add("rho", "Density of water at 10 °C", "ρ", 999.7, "kg/m³")
hv.add("etap", "Pump and motor efficiency (maker, invented)", "η_p", 55, "%")
hv.add("P", "Pump input power", "P", "={rho}*9.81*{Qpu}/1000*{Hpu}/1000/({etap}/100)", "kW")
hv.add("P2", "Pump input power (first draft)", "P_2",
       "={rho}*{Qpu}/1000*{Hpu}/1000/({etap}/100)", "kW",
       planted=("result-unit", "ρ·Q·H with g left out"))
hv.add("trun", "Pump running time per school day", "t_run", "={Dd}/({Qpu}*3600)", "h/d")
hv.add("trun2", "Pump running time per school day (first draft)", "t_run2",
       "={Dd}/({Qpu}*60)", "h/d",
       planted=("unit-scale", "L/d over L/min taken as h/d: 60 too large"))
hv.add("Ep", "Pump energy per school day", "E_p", "={P}*{trun}", "kWh/d")
hv.add("PUV", "UV steriliser lamp (maker)", "P_UV", 55, "W")
hv.add("Ed", "Electricity per school day, pump and UV (24 h)", "E_d", "={Ep}+{PUV}*24/1000",
       "kWh/d")
hv.add("Ed2", "Electricity per school day (first draft)", "E_d2", "={Ep}+{PUV}*24", "kWh/d",
       planted=("unit-scale", "Wh/d added to kWh/d"))
hv.add("es", "Pump energy per m³ delivered", "e_s", "={P}/({Qpu}*3.6)", "kWh/m³")
hv.heading("Saving")
hv.add("tar", "Mains water and sewerage tariff (invented)", "c_w", 2.60, "$/m³")
hv.add("S", "Yearly saving on mains water", "S", "=MIN({Y},{Da})*{tar}", "$")
RWHS = hv.finish()

TERMS = {
    "A1": "Wrenfield Primary School: rainfall and demand by term (invented rainfall; school "
          "days from the invented calendar)",
    "A2": "Sources: yield = R·A·C·η/1000 in m³ from mm and m², demand = days × L/d / 1000 "
          "(common practice).",
    "A3": CAUTION,
    "A5": "Term", "B5": "Rainfall [mm]", "C5": "Yield [m³]", "D5": "School days [d]",
    "E5": "Demand [m³]",
    "A10": "Total", "B10": "=SUM(B6:B9)", "C10": "=SUM(C6:C9)", "E10": "=SUM(E6:E9)",
}
_A, _C, _E, _D = hv.ref("A"), hv.ref("C"), hv.ref("eta"), hv.ref("Dd")
for r, (term, rain, days) in enumerate([("Autumn (Sep to Dec)", 300, 72),
                                        ("Spring (Jan to Apr)", 230, 68),
                                        ("Summer (May to Jul)", 170, 50),
                                        ("Holiday (Aug)", 80, 0)], start=6):
    TERMS[f"A{r}"], TERMS[f"B{r}"], TERMS[f"D{r}"] = term, rain, days
    TERMS[f"C{r}"] = f"=B{r}*{_A}*{_C}*{_E}/100/1000"
    TERMS[f"E{r}"] = f"=D{r}*{_D}/1000"
TERMS["C7"] = f"=B7*{_A}*{_C}*{_E}/100/1000000"
TERMS["E8"] = f"=D8*{_D}"
TERMS_PLANTED = {"Terms!C7": ("unit-scale", "mm × m² to m³ divided by 10⁶: the /1000 doubled"),
                 "Terms!E8": ("unit-scale", "days × L/d gives litres, written as m³: /1000 "
                                            "missing")}

RWHB = {
    "trade": "public health engineering: school rainwater harvesting tank and pump",
    "sheets": [("Harvest", RWHS), ("Terms", TERMS)],
    "planted": {**hv.planted, **TERMS_PLANTED},
}

BOOKS = {"cip-skid-harrow-dene": CIPB, "laundry-grand-sable": LDYB,
         "dewatering-corrie-bend": MINEB, "rainwater-wrenfield": RWHB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()
