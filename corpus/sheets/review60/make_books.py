#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review60), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; pattern after
corpus/sheets/review55/make_books.py.

Trades: a foundry's compressed air system audit; a hospital's steam humidifier on an operating
theatre air handling unit; a leisure centre's solar pool heating; a crude oil pipeline's pump
station. All scenarios, sites, firms, readings and maker's data are invented (demonstration
only); the formulas and published factors are the trade's own, with their sources named in a
text cell at the top of each sheet ("from memory" where recalled and not checked, "common
practice" for a fact of the trade with no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and
its messages that mislead, are recorded in review_notes.py after running the round's build.

Run: python3 make_books.py  ->  *.xlsx and *.expect in this folder (nothing written elsewhere)
     python3 make_books.py --values  ->  also print every formula cell's cached value
"""
import os
import sys

sys.dont_write_bytecode = True   # write nothing beside the shared modules
HERE = os.path.dirname(os.path.abspath(__file__))
SHARED = os.path.dirname(HERE)
sys.path.insert(0, SHARED)
from item_sheet import ItemSheet, write_books_with_notes, formula_cells  # noqa: E402
from xlsx_writer import Evaluator  # noqa: E402 (shared, not copied)

CAUTION = ("Invented scenario, data for demonstration only. A dimensionally consistent formula can "
           "still be wrong; this check does not replace independent review under local codes and "
           "licensed practice.")
ItemSheet.caution = CAUTION

# --------------------------------------------------------------------------------------------
# Book 1: foundry compressed air audit (kPa, psia, bar a, bar(g), psig, psi, °C, K, m³/min,
# Nm³/min, scfm, cfm, ft³, m³, s, kW, kW/100 scfm, kWh/Nm³, %, %/psi, h/yr, $/kWh, $/yr, MWh/yr)
# --------------------------------------------------------------------------------------------
AIR_SRC = (
    "Sources: 1 psi = 6.895 kPa, 1 bar = 100 kPa = 14.50 psi, 1 m³ = 35.31 ft³ (NIST SP 811 "
    "(2008) App. B.8); K = °C + 273.15 (SI Brochure 9th ed.); normal cubic metre at 0 °C and "
    "1.01325 bar (DIN 1343, from memory), standard cubic foot at 60 °F and 14.696 psia "
    "(common practice), hence 1 Nm³ = 35.31 × 288.71/273.15 = 37.33 scf; free air delivery "
    "measured at the inlet (ISO 1217, from memory) brought to normal by p/1.01325 × 273.15/T "
    "(ideal gas, common practice); specific power in kW per 100 scfm (CAGI data sheets, from "
    "memory); leakage by load/unload timing, leak % = t_load/(t_load + t_unload) × 100, and by "
    "pressure decay, leak (scfm) = V(ft³)·(p_1 − p_2)(psi)/(t(min)·14.7) × 1.25 (US DOE, "
    "Improving Compressed Air System Performance, a sourcebook for industry, 3rd ed., from "
    "memory); about 1 % of compressor power saved per 2 psi of set-point reduction (same "
    "sourcebook, from memory). Site barometer 96.8 kPa at about 380 m (invented). Foundry, "
    "compressors, tariff and readings invented.")
au = ItemSheet("Audit", "Kestrel Moor Castings (invented): compressed air system audit, "
               "two rotary screw compressors on one header, survey week", AIR_SRC)
au.heading("Site and inlet")
au.add("pb", "Site barometer during the survey (invented, 380 m)", "p_b", 96.8, "kPa")
au.add("pbpsi", "Site barometer, psia", "p_b,US", "={pb}/6.895", "psia")
au.add("pbbar", "Site barometer, bar a", "p_b,bar", "={pb}/100", "bar a")
au.add("tin", "Compressor inlet air temperature", "t_in", 25, "°C")
au.add("Tin", "Compressor inlet air temperature, absolute", "T_in", "={tin}+273.15", "K")
au.heading("Header pressure")
au.add("pd", "Header pressure at the receiver (controller reading)", "p_d", 7.2, "bar(g)")
au.add("pdpsig", "Header pressure, psig", "p_d,US", "={pd}*14.5", "psig")
au.add("pdpsig2", "Header pressure, psig (US controls contractor's sheet)", "p_d,US2",
       "={pd}/14.5", "psig",
       planted=("unit-scale", "bar to psi divided by 14.5: wrong way round"))
au.add("pda", "Header pressure, absolute", "p_d,a", "={pd}+{pbbar}", "bar a")
au.add("pda2", "Header pressure, absolute (first draft)", "p_d,a2", "={pd}+1.01325", "bar a",
       planted=("offset-scale", "the sea-level atmosphere typed where the site's barometer "
                                "(0.968 bar) belongs: 4.7 % high"))
au.add("rp", "Overall pressure ratio of the compressor", "r_p", "={pda}/{pbbar}", "-")
au.add("rp2", "Overall pressure ratio (first draft)", "r_p2", "={pd}/{pbbar}", "-",
       planted=("offset-scale", "a gauge reading over an absolute one in a pressure ratio"))
au.heading("Compressor 1 delivery and power")
au.add("Qfad", "Free air delivery at the inlet, measured (thermal mass meter corrected)",
       "Q_FAD", 28.5, "m³/min")
au.add("Qn", "Delivery, normal", "Q_n", "={Qfad}*{pbbar}/1.01325*273.15/{Tin}", "Nm³/min")
au.add("Qn2", "Delivery, normal (first draft)", "Q_n2",
       "={Qfad}*{pbbar}/1.01325*273.15/{tin}", "Nm³/min",
       planted=("offset-scale", "a °C reading in the gas-law temperature ratio"))
au.add("Qs", "Delivery, scfm", "Q_s", "={Qn}*37.33", "scfm")
au.add("Qs2", "Delivery, scfm (US maker's data sheet comparison)", "Q_s2", "={Qfad}*35.31",
       "scfm", planted=("unit-scale", "actual inlet m³/min into scfm by the volume factor "
                                      "alone: the site's barometer and inlet temperature left "
                                      "out, 8 % high"))
au.add("Pc", "Compressor 1 input power, measured (kW logger)", "P_c", 168, "kW")
au.add("SP", "Specific power", "SP", "={Pc}/{Qs}*100", "kW/100 scfm")
au.add("SP2", "Specific power (first draft)", "SP_2", "={Pc}/{Qs}", "kW/100 scfm",
       planted=("unit-scale", "kW per scfm written as kW per 100 scfm: the ×100 missing"))
au.add("SPn", "Specific energy per normal cubic metre", "e_n", "={Pc}/({Qn}*60)", "kWh/Nm³")
au.heading("Leakage, load/unload test (production stopped)")
au.add("tL", "Mean time loaded per cycle", "t_L", 38, "s")
au.add("tU", "Mean time unloaded per cycle", "t_U", 62, "s")
au.add("lk", "Leakage, share of delivery", "L", "={tL}/({tL}+{tU})*100", "%")
au.add("Qlk", "Leakage flow", "Q_lk", "={Qs}*{lk}/100", "scfm")
au.add("Qlk2", "Leakage flow (first draft)", "Q_lk2", "={Qs}*{lk}", "scfm",
       planted=("unit-scale", "a % used as a fraction: 100 too large"))
au.heading("Leakage, pressure decay test (check)")
au.add("V", "Receivers and header volume (drawings)", "V", 9.0, "m³")
au.add("Vft", "Receivers and header volume, ft³", "V_US", "={V}*35.31", "ft³")
au.add("p1", "Receiver gauge at the start of the decay", "p_1", 104, "psig")
au.add("p2", "Receiver gauge at the end of the decay", "p_2", 92, "psig")
au.add("td", "Decay time", "t_d", 55, "s")
au.add("Qdk", "Leakage flow by decay", "Q_dk", "={Vft}*({p1}-{p2})/({td}/60*14.7)*1.25",
       "scfm")
au.add("Qdk2", "Leakage flow by decay (first draft)", "Q_dk2",
       "={Vft}*({p1}-{p2})/({td}*14.7)*1.25", "scfm",
       planted=("unit-scale", "seconds where the sourcebook's minutes belong: 60 too small"))
au.heading("Cost of leakage")
au.add("hrs", "Compressor operating hours", "t_a", 6000, "h/yr")
au.add("tar", "Electricity tariff (invented)", "c_e", 0.14, "$/kWh")
au.add("Plk", "Power wasted by leaks", "P_lk", "={Qlk}*{SP}/100", "kW")
au.add("Elk", "Energy wasted by leaks", "E_lk", "={Plk}*{hrs}/1000", "MWh/yr")
au.add("Clk", "Cost of leaks", "C_lk", "={Plk}*{hrs}*{tar}", "$/yr")
au.add("Clk2", "Cost of leaks (management summary)", "C_lk2", "={Elk}*{tar}", "$/yr",
       planted=("unit-scale", "MWh times $/kWh: the ×1000 missing"))
au.heading("Distribution pressure drop and set point")
au.add("pfar", "Pressure at the far end of the header (moulding shop gauge)", "p_far", 88,
       "psig")
au.add("dph", "Pressure drop across the distribution", "Δp_h", "={pdpsig}-{pfar}", "psi")
au.add("dphb", "Pressure drop across the distribution, bar", "Δp_h,bar", "={dph}/14.5", "bar")
au.add("dpr", "Set-point reduction after the header is looped (proposed)", "Δp_r", 0.7, "bar")
au.add("k", "Power saved per psi of set-point reduction", "k", 0.5, "%/psi")
au.add("sv", "Power saved by the set-point reduction", "s", "={dpr}*14.5*{k}", "%")
au.add("Psv", "Power saved", "P_sv", "={Pc}*{sv}/100", "kW")
au.add("Csv", "Cost saved", "C_sv", "={Psv}*{hrs}*{tar}", "$/yr")
AUDS = au.finish()

LEAKS = {
    "A1": "Kestrel Moor Castings: ultrasonic leak survey, tagged leaks (invented readings; "
          "flows from the detector's estimate)",
    "A2": "Sources: 1 Nm³/min = 37.33 scfm (NIST SP 811 (2008) App. B.8 volume factor with 0 °C "
          "and 60 °F references, common practice); power = flow × specific power (common "
          "practice); cost = power × hours × tariff.",
    "A3": CAUTION,
    "A5": "Tag", "B5": "Location", "C5": "Leak flow [scfm]", "D5": "Leak flow [Nm³/h]",
    "E5": "Power [kW]", "F5": "Cost [$/yr]",
    "A10": "Total", "C10": "=SUM(C6:C9)", "F10": "=SUM(F6:F9)",
}
_SP, _H, _T = au.ref("SP"), au.ref("hrs"), au.ref("tar")
for r, (tag, loc, q) in enumerate([("L-01", "Fettling shop hose reel", 12.0),
                                   ("L-02", "Core shop drop, quick coupling", 8.5),
                                   ("L-03", "Shot blast, drain valve stuck open", 25.0),
                                   ("L-04", "Moulding line FRL", 4.0)], start=6):
    LEAKS[f"A{r}"], LEAKS[f"B{r}"], LEAKS[f"C{r}"] = tag, loc, q
    LEAKS[f"D{r}"] = f"=C{r}*60/37.33"
    LEAKS[f"E{r}"] = f"=C{r}*{_SP}/100"
    LEAKS[f"F{r}"] = f"=E{r}*{_H}*{_T}"
LEAKS["D8"] = "=C8*1.699"
LEAKS_PLANTED = {"Leaks!D8": ("unit-scale", "scfm into Nm³/h by the volume factor alone (1.699 "
                                            "m³/h per cfm): 60 °F and 0 °C left out, 5.7 % "
                                            "high")}

AIRB = {
    "trade": "industrial energy: compressed air audit, pressures, normal and standard flows, "
             "leaks and their cost",
    "sheets": [("Audit", AUDS), ("Leaks", LEAKS)],
    "planted": {**au.planted, **LEAKS_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 2: hospital AHU with steam humidifier (cfm, m³/s, °C, °F, %, kPa, g/kg, gr/lb, kg/m³,
# kg/h, lb/h, Btu/h, kW, W, psig, bar(g), bar a, kJ/kg, m³/kg, in, mm, m/s)
# --------------------------------------------------------------------------------------------
HUM_SRC = (
    "Sources: 1 cfm = 0.0004719 m³/s, 1 ft³ = 0.02832 m³, 1 kg = 2.205 lb, 1 lb = 7000 gr "
    "(so 1 g/kg = 7 gr/lb), 1 kW = 3412 Btu/h, 1 bar = 14.50 psi, 1 psi = 6.895 kPa, 1 in = "
    "25.4 mm (NIST SP 811 (2008) App. B.8); °F = 1.8·°C + 32; saturation pressure over water "
    "p_ws = 0.61094·exp(17.625·t/(t + 243.04)) kPa (Magnus form, Alduchov and Eskridge 1996, "
    "from memory); humidity ratio W = 622·p_w/(p − p_w) g/kg and dry air density p/(R·T), "
    "R = 0.287 kJ/(kg·K) (ASHRAE Handbook, Fundamentals (2021), ch. 1, from memory); the US "
    "forms lb/h = 4.5·cfm·ΔW(gr/lb)/7000, latent Btu/h = 0.68·cfm·ΔW(gr/lb) and sensible "
    "Btu/h = 1.08·cfm·ΔT(°F), and the SI 1.2 kJ/(m³·K) (ASHRAE Fundamentals (2021), ch. 18, "
    "from memory); saturated steam properties on the Steam sheet (IAPWS-IF97, from memory); "
    "2 in schedule 40 pipe bore 2.067 in (ASME B36.10M, from memory). Hospital barometer 99.0 "
    "kPa (about 190 m, invented). Hospital, plant, maker's data and readings invented.")
hu = ItemSheet("AHU", "St Aldhelm's Hospital (invented): AHU-3 serving the operating theatre "
               "suite, preheat coil and steam-injection humidifier, winter design", HUM_SRC)
hu.heading("Air flow")
hu.add("cfm", "Supply air flow at the fan, 20 °C (US-made unit's schedule)", "Q_US", 9500,
       "cfm")
hu.add("q", "Supply air flow, m³/s", "q", "={cfm}*0.0004719", "m³/s")
hu.add("q2", "Supply air flow, m³/s (balancing report)", "q_2", "={cfm}/35.31/3600", "m³/s",
       planted=("unit-scale", "cfm to m³/s divided by 3600 where 60 belongs"))
hu.heading("Moisture to add")
hu.add("pb", "Site barometer (invented, 190 m)", "p_b", 99.0, "kPa")
hu.add("ts", "Supply air temperature", "t_s", 20, "°C")
hu.add("RH", "Supply relative humidity, theatre design", "φ", 50, "%")
hu.add("pws", "Saturation pressure of water vapour at the supply temperature", "p_ws",
       "=0.61094*EXP(17.625*{ts}/({ts}+243.04))", "kPa")
hu.add("pw", "Partial pressure of water vapour in the supply air", "p_w", "={RH}/100*{pws}",
       "kPa")
hu.add("ws", "Humidity ratio of the supply air", "W_s", "=622*{pw}/({pb}-{pw})", "g/kg")
hu.add("ws2", "Humidity ratio of the supply air (first draft)", "W_s2",
       "=622*{pw}/(101.325-{pw})", "g/kg",
       planted=("offset-scale", "the sea-level atmosphere where the site's barometer "
                                "(99.0 kPa) belongs"))
hu.add("wsgr", "Humidity ratio of the supply air, gr/lb", "W_s,US", "={ws}*7", "gr/lb")
hu.add("wogr", "Outdoor humidity ratio, winter design (US weather file, invented)", "W_o,US",
       11, "gr/lb")
hu.add("wo", "Outdoor humidity ratio, g/kg", "W_o", "={wogr}/7", "g/kg")
hu.add("wo2", "Outdoor humidity ratio, g/kg (first draft)", "W_o2", "={wogr}*7", "g/kg",
       planted=("unit-scale", "gr/lb to g/kg multiplied by 7: wrong way round"))
hu.add("dw", "Moisture to add", "ΔW", "={ws}-{wo}", "g/kg")
hu.add("rho", "Air density at the fan (dry air, site barometer)", "ρ",
       "={pb}/(0.287*({ts}+273.15))", "kg/m³")
hu.add("ma", "Dry air mass flow", "ṁ_a", "={q}*{rho}*3600", "kg/h")
hu.heading("Humidifier steam")
hu.add("mst", "Humidifier steam load", "ṁ_st", "={ma}*{dw}/1000", "kg/h")
hu.add("mst2", "Humidifier steam load (first draft)", "ṁ_st2", "={ma}*{dw}", "kg/h",
       planted=("unit-scale", "g/kg used as kg/kg: the /1000 missing"))
hu.add("mstlb", "Humidifier steam load, lb/h (US humidifier maker)", "ṁ_st,US", "={mst}*2.205",
       "lb/h")
hu.add("mUS", "Humidifier steam load, lb/h (US check, 4.5·cfm·Δgr/7000)", "ṁ_US",
       "=4.5*{cfm}*({wsgr}-{wogr})/7000", "lb/h")
hu.add("mUS2", "Humidifier steam load, lb/h (maker's selection form)", "ṁ_US2",
       "=4.5*{cfm}*({wsgr}-{wogr})", "lb/h",
       planted=("unit-scale", "grains per lb used as lb per lb: the /7000 missing"))
hu.add("Qlat", "Latent load of the humidification (US check)", "Q_lat",
       "=0.68*{cfm}*({wsgr}-{wogr})", "Btu/h")
hu.heading("Steam supply")
hu.add("pst", "Steam pressure at the humidifier's control valve", "p_st", 15, "psig")
hu.add("pstg", "Steam pressure, bar(g)", "p_st,g", "={pst}/14.5", "bar(g)")
hu.add("psta", "Steam pressure, absolute", "p_st,a", "={pstg}+{pb}/100", "bar a")
hu.add("psta2", "Steam pressure, absolute (first draft)", "p_st,a2", "={pstg}+{pb}", "bar a",
       planted=("unit-scale", "the barometer in kPa added to bar: the /100 missing"))
hu.add("tsat", "Saturation temperature (Steam sheet)", "t_sat",
       "=VLOOKUP({psta},Steam!A6:G9,2,TRUE)", "°C")
hu.add("tsatF", "Saturation temperature, °F", "t_sat,F", "={tsat}*1.8+32", "°F")
hu.add("hg", "Enthalpy of dry saturated steam (Steam sheet)", "h_g",
       "=VLOOKUP({psta},Steam!A6:G9,4,TRUE)", "kJ/kg")
hu.add("vg", "Specific volume of dry saturated steam (Steam sheet)", "v_g",
       "=VLOOKUP({psta},Steam!A6:G9,5,TRUE)", "m³/kg")
hu.add("hfw", "Feedwater enthalpy at 80 °C (tables)", "h_fw", 335, "kJ/kg")
hu.add("Qb", "Boiler heat for the humidifier steam", "Q_b", "={mst}*({hg}-{hfw})/3600", "kW")
hu.add("Pj", "Humidifier jacket and manifold loss (maker)", "P_j", 650, "W")
hu.add("Qt", "Boiler heat for the humidifier, with losses", "Q_t", "={Qb}+{Pj}/1000", "kW")
hu.add("Qt2", "Boiler heat for the humidifier, with losses (first draft)", "Q_t2",
       "={Qb}+{Pj}", "kW", planted=("unit-scale", "W added to kW"))
hu.add("QtB", "Boiler heat for the humidifier, Btu/h", "Q_t,US", "={Qt}*3412", "Btu/h")
hu.add("din", "Steam branch bore, 2 in schedule 40", "d_in", 2.067, "in")
hu.add("d", "Steam branch bore, mm", "d", "={din}*25.4", "mm")
hu.add("vst", "Steam velocity in the branch", "v_st",
       "={mst}/3600*{vg}/(PI()*({d}/1000)^2/4)", "m/s")
hu.heading("Preheat coil (before the humidifier)")
hu.add("to", "Outdoor design temperature, winter", "t_o", -8, "°C")
hu.add("tsF", "Supply air temperature, °F", "t_s,F", "={ts}*1.8+32", "°F")
hu.add("toF", "Outdoor design temperature, °F", "t_o,F", "={to}*1.8+32", "°F")
hu.add("toF2", "Outdoor design temperature, °F (first draft)", "t_o,F2", "=({to}-32)/1.8",
       "°F", planted=("offset-scale", "the °F-to-°C formula applied to a °C reading"))
hu.add("Qc", "Preheat coil duty", "Q_c", "=1.2*{q}*({ts}-{to})", "kW")
hu.add("QcUS", "Preheat coil duty, Btu/h (US check)", "Q_c,US", "=1.08*{cfm}*({tsF}-{toF})",
       "Btu/h")
hu.add("QcUS2", "Preheat coil duty, Btu/h (US coil maker's form)", "Q_c,US2",
       "=1.08*{cfm}*({ts}-{to})", "Btu/h",
       planted=("unit-scale", "a °C difference where the °F difference belongs: the 1.8 "
                              "missing"))
AHUS = hu.finish()

STEAM = {
    "A1": "Saturated steam by absolute pressure (IAPWS-IF97 steam tables, rounded, from memory; "
          "check against the tables before use)",
    "A2": "Sources: IAPWS-IF97 (from memory); °F = 1.8·°C + 32; 1 bar = 14.50 psi (NIST SP 811 "
          "(2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Pressure [bar a]", "B5": "t_sat [°C]", "C5": "h_f [kJ/kg]", "D5": "h_g [kJ/kg]",
    "E5": "v_g [m³/kg]", "F5": "t_sat [°F]", "G5": "Pressure [psia]",
}
for r, (p, t, hf, hg, vg) in enumerate([(1.5, 111.4, 467.1, 2693.1, 1.159),
                                        (2.0, 120.2, 504.7, 2706.2, 0.8857),
                                        (2.5, 127.4, 535.4, 2716.5, 0.7187),
                                        (3.0, 133.5, 561.5, 2724.9, 0.6058)], start=6):
    STEAM[f"A{r}"], STEAM[f"B{r}"], STEAM[f"C{r}"] = p, t, hf
    STEAM[f"D{r}"], STEAM[f"E{r}"] = hg, vg
    STEAM[f"F{r}"] = f"=B{r}*1.8+32"
    STEAM[f"G{r}"] = f"=A{r}*14.5"
STEAM["G8"] = "=A8*14.5+14.7"
STEAM_PLANTED = {"Steam!G8": ("offset-scale", "the atmosphere added to a pressure already "
                                              "absolute: counted twice")}

HUMB = {
    "trade": "healthcare HVAC: operating theatre AHU, psychrometrics, steam humidifier and "
             "preheat coil",
    "sheets": [("AHU", AHUS), ("Steam", STEAM)],
    "planted": {**hu.planted, **STEAM_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 3: outdoor pool solar heating (m, m², ft², m³, US gal, W/m², Btu/(h·ft²), W/(m²·K), °C,
# K, Δ°F, kW, Btu/h, kWh/(m²·d), kWh/d, MJ/d, gpm/ft², gpm, L/min, m³/h, kg/m³, kJ/(kg·K), hp)
# --------------------------------------------------------------------------------------------
POOL_SRC = (
    "Sources: 1 m² = 10.76 ft², 1 m³ = 264.2 US gal, 1 US gal = 3.785 L, 1 W/m² = 0.3170 "
    "Btu/(h·ft²), 1 kW = 3412 Btu/h, 1 kWh = 3.6 MJ, 1 hp = 0.7457 kW, 1 therm = 29.31 kWh "
    "(NIST SP 811 (2008) App. B.8); a temperature difference of 1 K = 1.8 °F (SI Brochure "
    "9th ed.); collector efficiency η = F_R(τα) − F_R·U_L·(T_i − T_a)/G (Hottel-Whillier-Bliss, "
    "Duffie and Beckman, Solar Engineering of Thermal Processes, 4th ed., from memory; test "
    "figures per ISO 9806, invented); unglazed pool collector flow 0.06 gpm per ft² of "
    "collector (FSEC guidance, from memory); heat = ρ·V·c_p·ΔT, ρ = 997 kg/m³ and c_p = 4.18 "
    "kJ/(kg·K) for water at 25 °C (common practice); the US form °F rise = Btu/h/(500·gpm) "
    "(common practice); pump power ρ·g·Q·H/η, g_n = 9.81 m/s² (SI Brochure 9th ed.). Centre, "
    "pool, collectors, weather and maker's data invented.")
po = ItemSheet("Pool", "Tidewater Lane Leisure Centre (invented): outdoor 25 m pool, roof-"
               "mounted unglazed solar collectors, summer season", POOL_SRC)
po.heading("Pool")
po.add("Lp", "Pool length", "L", 25, "m")
po.add("Wp", "Pool width", "W", 12.5, "m")
po.add("hp", "Mean depth", "h", 1.4, "m")
po.add("Ap", "Pool surface area", "A_p", "={Lp}*{Wp}", "m²")
po.add("V", "Pool volume", "V", "={Ap}*{hp}", "m³")
po.add("Vgal", "Pool volume, US gal", "V_US", "={V}*264.2", "US gal")
po.heading("Collectors")
po.add("n", "Collector panels (4 ft × 10 ft)", "n", 60, "-")
po.add("Apft", "Gross area per panel", "A_1", 40, "ft²")
po.add("Acft", "Collector area, ft²", "A_c,US", "={n}*{Apft}", "ft²")
po.add("Ac", "Collector area", "A_c", "={Acft}/10.76", "m²")
po.add("G", "Design irradiance on the collector plane, clear noon", "G", 950, "W/m²")
po.add("GUS", "Design irradiance, Btu/(h·ft²) (US maker's rating)", "G_US", "={G}*0.317",
       "Btu/(h·ft²)")
po.add("FRta", "Optical efficiency F_R(τα) (test report, invented)", "F_R(τα)", 0.86, "-")
po.add("FRUL", "Loss coefficient F_R·U_L (test report, invented)", "F_R·U_L", 20, "W/(m²·K)")
po.add("Ti", "Collector inlet (pool water) temperature", "T_i", 27, "°C")
po.add("Ta", "Ambient air temperature", "T_a", 24, "°C")
po.add("eta", "Collector efficiency at design", "η", "={FRta}-{FRUL}*({Ti}-{Ta})/{G}", "-")
po.add("eta2", "Collector efficiency at design (first draft)", "η_2",
       "={FRta}-{FRUL}*{Ti}/{G}", "-",
       planted=("offset-scale", "the inlet °C reading where the difference T_i − T_a belongs"))
po.add("Qpk", "Peak collected heat", "Q_pk", "={eta}*{G}*{Ac}/1000", "kW")
po.add("Qpk2", "Peak collected heat (first draft)", "Q_pk2", "={eta}*{G}*{Ac}", "kW",
       planted=("unit-scale", "W written as kW: the /1000 missing"))
po.add("QpkB", "Peak collected heat, Btu/h", "Q_pk,US", "={Qpk}*3412", "Btu/h")
po.heading("Daily gain")
po.add("H", "Daily irradiation on the collector plane, July (invented)", "H", 6.2,
       "kWh/(m²·d)")
po.add("etad", "Daily mean collector efficiency (simulation, invented)", "η_d", 60, "%")
po.add("Ed", "Heat collected per day", "E_d", "={etad}/100*{H}*{Ac}", "kWh/d")
po.add("Ed2", "Heat collected per day (first draft)", "E_d2", "={etad}*{H}*{Ac}", "kWh/d",
       planted=("unit-scale", "a % used as a fraction: 100 too large"))
po.add("EdMJ", "Heat collected per day, MJ/d", "E_d,MJ", "={Ed}*3.6", "MJ/d")
po.add("rho", "Density of pool water at 25 °C", "ρ", 997, "kg/m³")
po.add("cp", "Specific heat of water", "c_p", 4.18, "kJ/(kg·K)")
po.add("dT", "Pool temperature rise per day from the day's gain, no losses", "ΔT",
       "={Ed}*3600/({rho}*{V}*{cp})", "K/d")
po.add("dT2", "Pool temperature rise from one day's gain (first draft)", "ΔT_2",
       "={Ed}/({rho}*{V}*{cp})", "K/d",
       planted=("unit-scale", "kWh over kJ/K: the 3600 s of the hour missing"))
po.add("dTF", "Pool temperature rise, °F", "ΔT_F", "={dT}*1.8", "Δ°F/d")
po.add("dTF2", "Pool temperature rise, °F (newsletter)", "ΔT_F2", "={dT}*1.8+32", "Δ°F/d",
       planted=("offset-scale", "a temperature rise converted with the +32 of a reading"))
po.heading("Collector loop")
po.add("qs", "Design flow per collector area (FSEC, from memory)", "q_s", 0.06, "gpm/ft²")
po.add("Qg", "Collector loop flow", "Q_US", "={qs}*{Acft}", "gpm")
po.add("QL", "Collector loop flow, L/min", "Q_L", "={Qg}*3.785", "L/min")
po.add("Qh", "Collector loop flow, m³/h", "Q_h", "={QL}*60/1000", "m³/h")
po.add("dTc", "Temperature rise across the collectors at peak", "ΔT_c",
       "={Qpk}/({QL}/60*{rho}/1000*{cp})", "K")
po.add("dTcF", "Temperature rise across the collectors, US check", "ΔT_c,F",
       "={QpkB}/(500*{Qg})", "Δ°F")
po.add("dTcF2", "Temperature rise across the collectors (first draft)", "ΔT_c,F2",
       "={QpkB}/(500*{QL})", "Δ°F",
       planted=("unit-scale", "L/min where the 500's gpm belongs: 3.785 too small"))
po.heading("Pump and saving")
po.add("Hp", "Loop pump head, roof lift and collectors", "H", 14, "m")
po.add("etap", "Pump and motor efficiency (maker, invented)", "η_p", 55, "%")
po.add("P", "Pump input power", "P", "={rho}*9.81*{QL}/60000*{Hp}/({etap}/100)/1000", "kW")
po.add("P2", "Pump input power (first draft)", "P_2",
       "={rho}*{QL}/60000*{Hp}/({etap}/100)/1000", "kW",
       planted=("result-unit", "ρ·Q·H with g left out"))
po.add("Php", "Pump input power, hp", "P_US", "={P}/0.7457", "hp")
po.add("hrs", "Pump running hours per day", "t_r", 8, "h/d")
po.add("Ep", "Pump energy per day", "E_p", "={P}*{hrs}", "kWh/d")
po.add("COP", "Heat collected per unit of pump energy", "COP", "={Ed}/{Ep}", "-")
po.add("etab", "Gas pool heater efficiency (displaced)", "η_b", 85, "%")
po.add("gas", "Gas saved per day", "E_g", "={Ed}/({etab}/100)", "kWh/d")
po.add("th", "Gas saved per day, therms", "E_g,US", "={gas}/29.31", "therm/d")
POOLS = po.finish()

MONTHS = {
    "A1": "Tidewater Lane Leisure Centre: collector gain by month of the outdoor season "
          "(invented irradiation and mean efficiency)",
    "A2": "Sources: gain = H × A_c × η × days (common practice); 1 therm = 29.31 kWh (NIST SP "
          "811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Month", "B5": "Irradiation [kWh/(m²·d)]", "C5": "Days [d]", "D5": "Efficiency [%]",
    "E5": "Gain [kWh]", "F5": "Gas saved [therm]",
    "A11": "Season", "E11": "=SUM(E6:E10)", "F11": "=SUM(F6:F10)",
}
_Ac, _eb = po.ref("Ac"), po.ref("etab")
for r, (mon, h, days, eff) in enumerate([("May", 5.1, 31, 58), ("June", 5.9, 30, 60),
                                         ("July", 6.2, 31, 60), ("August", 5.4, 31, 60),
                                         ("September", 4.0, 30, 55)], start=6):
    MONTHS[f"A{r}"], MONTHS[f"B{r}"], MONTHS[f"C{r}"], MONTHS[f"D{r}"] = mon, h, days, eff
    MONTHS[f"E{r}"] = f"=B{r}*{_Ac}*D{r}/100*C{r}"
    MONTHS[f"F{r}"] = f"=E{r}/({_eb}/100)/29.31"
MONTHS["F9"] = f"=E9/({_eb}/100)*29.31"
MONTHS_PLANTED = {"Months!F9": ("unit-scale", "kWh to therms multiplied by 29.31: wrong way "
                                              "round")}

POOLB = {
    "trade": "building services: solar heating of an outdoor pool, collector efficiency, daily "
             "gain, loop flow, pump and gas saved",
    "sheets": [("Pool", POOLS), ("Months", MONTHS)],
    "planted": {**po.planted, **MONTHS_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 4: crude oil pipeline pump station (bbl/d, m³/h, gpm, °API, SG, kg/m³, cSt, in, m, mm,
# m/s, km, kPa, kPa(g), bar, bar(g), psi, psig, ft, %, kW, hp, MWh/d, ppm, US gal/d)
# --------------------------------------------------------------------------------------------
OIL_SRC = (
    "Sources: 1 bbl = 0.158987 m³ = 42 US gal, 1 in = 0.0254 m, 1 m = 3.281 ft, 1 psi = "
    "6.895 kPa, 1 bar = 100 kPa = 14.50 psi, 1 hp = 0.7457 kW (NIST SP 811 (2008) App. B.8); "
    "SG = 141.5/(131.5 + °API) at 60 °F (API Manual of Petroleum Measurement Standards ch. 11, "
    "from memory); water at 60 °F 999.0 kg/m³ (common practice); Darcy–Weisbach Δp = "
    "f·L/d·ρ·v²/2 and the Swamee–Jain friction factor f = 0.25/[log10(ε/(3.7d) + "
    "5.74/Re^0.9)]², ε = 0.045 mm for new steel line pipe (Crane TP-410 (2013), from memory); "
    "drag reducing agent cuts frictional Δp by the drag reduction % (common practice; maker's "
    "figure invented); Δp = ρ·g·Δz, g_n = 9.81 m/s² (SI Brochure 9th ed.) and the US forms psi "
    "= 0.433·ft·SG, ft = 2.31·psi/SG, bhp = gpm·ft·SG/(3960·η) (common practice); hydraulic "
    "power kW = m³/h × bar/36 (common practice); 24 in × 0.375 in line pipe (API 5L, "
    "invented selection). Line, stations, crude, profile and readings invented.")
ol = ItemSheet("Line", "Marrow Creek crude line (invented): Station 2 to Station 3, mainline "
               "pumps, design throughput with drag reducer", OIL_SRC)
ol.heading("Throughput and crude")
ol.add("Q", "Design throughput", "Q", 180000, "bbl/d")
ol.add("Qh", "Design throughput, m³/h", "Q_h", "={Q}*0.158987/24", "m³/h")
ol.add("Qh2", "Design throughput, m³/h (pump enquiry, first draft)", "Q_h2",
       "={Q}*0.158987", "m³/h",
       planted=("unit-scale", "per day written as per hour: the /24 missing"))
ol.add("Qg", "Design throughput, US gpm", "Q_US", "={Q}*42/1440", "gpm")
ol.add("API", "Crude gravity (assay, invented)", "API", 32, "°API")
ol.add("SG", "Specific gravity of the crude at 60 °F", "SG", "=141.5/(131.5+{API})", "SG")
ol.add("rho", "Density of the crude", "ρ", "={SG}*999", "kg/m³")
ol.add("nu", "Kinematic viscosity at line temperature (assay, invented)", "ν", 12, "cSt")
ol.heading("Line and friction")
ol.add("OD", "Line pipe outside diameter", "D_o", 24, "in")
ol.add("wt", "Wall thickness", "t", 0.375, "in")
ol.add("ID", "Bore", "d_in", "={OD}-2*{wt}", "in")
ol.add("dm", "Bore, m", "d", "={ID}*0.0254", "m")
ol.add("v", "Mean velocity", "v", "={Qh}/3600/(PI()*{dm}^2/4)", "m/s")
ol.add("Re", "Reynolds number", "Re", "={v}*{dm}/({nu}/1000000)", "-")
ol.add("eps", "Pipe roughness", "ε", 0.045, "mm")
ol.add("f", "Darcy friction factor (Swamee–Jain)", "f",
       "=0.25/LOG10({eps}/1000/(3.7*{dm})+5.74/{Re}^0.9)^2", "-")
ol.add("f2", "Darcy friction factor (first draft)", "f_2",
       "=0.25/LOG10({eps}/(3.7*{dm})+5.74/{Re}^0.9)^2", "-",
       planted=("unit-scale", "roughness in mm over bore in m inside the log: /1000 missing"))
ol.add("L", "Segment length, Station 2 to Station 3", "L", 95, "km")
ol.add("dpf", "Friction loss without drag reducer", "Δp_f",
       "={f}*{L}*1000/{dm}*{rho}*{v}^2/2/1000", "kPa")
ol.add("DR", "Drag reduction at the design dose (maker, invented)", "DR", 30, "%")
ol.add("dpD", "Friction loss with drag reducer", "Δp_DR", "={dpf}*(1-{DR}/100)", "kPa")
ol.add("dpD2", "Friction loss with drag reducer (first draft)", "Δp_DR2", "={dpf}*(1-{DR})",
       "kPa", planted=("unit-scale", "a % used as a fraction beside 1"))
ol.heading("Elevation (Profile sheet)")
ol.add("dz", "Rise from Station 2 to Station 3", "Δz", "=Profile!B9-Profile!B6", "m")
ol.add("dzft", "Rise from Station 2 to Station 3, ft", "Δz_US", "={dz}*3.281", "ft")
ol.add("dpz", "Static pressure difference for the rise", "Δp_z", "={rho}*9.81*{dz}/1000",
       "kPa")
ol.add("dpzp", "Static pressure difference, psi (US check)", "Δp_z,US", "={dzft}*0.433*{SG}",
       "psi")
ol.add("dpzp2", "Static pressure difference, psi (first draft)", "Δp_z,US2",
       "={dz}*0.433*{SG}", "psi",
       planted=("unit-scale", "metres where the 0.433's feet belong: 3.281 too small"))
ol.heading("Station 2 pressures")
ol.add("parr", "Arrival pressure required at Station 3 suction", "p_arr", 350, "kPa(g)")
ol.add("pd", "Station 2 discharge pressure", "p_d", "={dpD}+{dpz}+{parr}", "kPa(g)")
ol.add("pdp", "Station 2 discharge pressure, psig", "p_d,US", "={pd}/6.895", "psig")
ol.add("ps", "Station 2 suction pressure (booster discharge)", "p_s", 4.0, "bar(g)")
ol.add("dpp", "Pressure rise across the mainline pump", "Δp_p", "={pd}/100-{ps}", "bar")
ol.add("dpp2", "Pressure rise across the mainline pump (first draft)", "Δp_p2", "={pd}-{ps}",
       "bar", planted=("unit-scale", "kPa less bar: the /100 missing"))
ol.add("H", "Pump head on the crude", "H", "={dpp}*100000/({rho}*9.81)", "m")
ol.add("Hft", "Pump head, ft", "H_US", "={H}*3.281", "ft")
ol.add("dppsi", "Pressure rise, psi", "Δp_p,US", "={dpp}*14.5", "psi")
ol.add("Hc", "Pump head, ft (US check)", "H_US,c", "={dppsi}*2.31/{SG}", "ft")
ol.add("Hc2", "Pump head, ft (US maker's form)", "H_US,c2", "={dppsi}*2.31*{SG}", "ft",
       planted=("gravity-number", "the specific gravity multiplies where it divides"))
ol.heading("Power and drag reducer")
ol.add("Ph", "Hydraulic power", "P_h", "={Qh}*{dpp}/36", "kW")
ol.add("etap", "Pump efficiency at duty (maker's curve, invented)", "η_p", 82, "%")
ol.add("Psh", "Pump shaft power", "P_sh", "={Ph}/({etap}/100)", "kW")
ol.add("Php", "Pump shaft power, hp", "P_sh,US", "={Psh}/0.7457", "hp")
ol.add("Php2", "Pump shaft power, hp (motor enquiry)", "P_sh,US2", "={Psh}*0.7457", "hp",
       planted=("unit-scale", "kW to hp multiplied by 0.7457: wrong way round"))
ol.add("bhp", "Pump shaft power, hp (US check)", "bhp", "={Qg}*{Hft}*{SG}/(3960*{etap}/100)",
       "hp")
ol.add("etam", "Motor and drive efficiency (maker, invented)", "η_m", 96, "%")
ol.add("Pin", "Electrical input", "P_in", "={Psh}/({etam}/100)", "kW")
ol.add("Ed", "Electrical energy per day", "E_d", "={Pin}*24/1000", "MWh/d")
ol.add("ppm", "Drag reducer dose, by volume", "c_DR", 15, "ppm")
ol.add("qD", "Drag reducer injection", "q_DR", "={Q}*{ppm}/1000000*42", "US gal/d")
ol.add("qD2", "Drag reducer injection (first draft)", "q_DR2", "={Q}*{ppm}/1000*42",
       "US gal/d", planted=("unit-scale", "ppm taken as parts per thousand: 1000 too large"))
LINES = ol.finish()

PROFILE = {
    "A1": "Marrow Creek crude line: elevation profile, Station 2 to Station 3 (invented survey)",
    "A2": "Sources: 1 m = 3.281 ft (NIST SP 811 (2008) App. B.8); Δp = ρ·g·Δz, g_n = 9.81 m/s² "
          "(SI Brochure 9th ed.).",
    "A3": CAUTION,
    "A5": "KP [km]", "B5": "Elevation [m]", "C5": "Elevation [ft]",
    "D5": "Δp static from Station 2 [kPa]",
}
_rho = ol.ref("rho")
for r, (kp, z) in enumerate([(0, 312), (30, 355), (62, 298), (95, 405)], start=6):
    PROFILE[f"A{r}"], PROFILE[f"B{r}"] = kp, z
    PROFILE[f"C{r}"] = f"=B{r}*3.281"
    PROFILE[f"D{r}"] = f"={_rho}*9.81*(B{r}-$B$6)/1000"
PROFILE["D8"] = f"={_rho}*9.81*(B8-$B$6)"
PROFILE_PLANTED = {"Profile!D8": ("unit-scale", "ρ·g·Δz in Pa written as kPa: the /1000 "
                                                "missing")}

OILB = {
    "trade": "pipelines: crude oil pump station, throughput, friction with drag reducer, "
             "pressures, head and power",
    "sheets": [("Line", LINES), ("Profile", PROFILE)],
    "planted": {**ol.planted, **PROFILE_PLANTED},
}

BOOKS = {"compressed-air-kestrel-moor": AIRB, "humidifier-st-aldhelm": HUMB,
         "pool-solar-tidewater": POOLB, "pipeline-marrow-creek": OILB}


def print_values():
    for stem, book in BOOKS.items():
        ev = Evaluator(book["sheets"], book.get("names") or {})
        sheets = dict(book["sheets"])
        print(f"== {stem}")
        for ref in formula_cells(book):
            sh, cell = ref.split("!")
            label = sheets[sh].get("A" + cell[1:], "")
            unit = sheets[sh].get("D" + cell[1:], "") if cell.startswith("C") else ""
            mark = " *" if ref in book["planted"] else ""
            print(f"{ref:12s} {ev.value(sh, cell):14.6g} {unit:14s} {str(label)[:60]}{mark}")


def main():
    write_books_with_notes(HERE, BOOKS)
    if "--values" in sys.argv:
        print_values()


if __name__ == "__main__":
    main()
