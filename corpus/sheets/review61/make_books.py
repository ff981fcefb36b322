#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review61), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; pattern after
corpus/sheets/review55/make_books.py.

Trades: a restaurant's kitchen hood and make-up air; a gas well's wellhead and flowline; a
reservoir dam's spillway and bottom outlet; a plastics plant's process cooling water loop. All
scenarios, sites, firms, readings and maker's data are invented (demonstration only); the
formulas and published factors are the trade's own, with their sources named in a text cell at
the top of each sheet ("from memory" where recalled and not checked, "common practice" for a
fact of the trade with no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and
its messages that mislead, are recorded in review_notes.py after running the round's build.

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
# Book 1: restaurant kitchen hood and make-up air (ft, in, ft², m², cfm/ft, cfm, m³/h, m³/s,
# fpm, m/s, in. w.c., Pa, %, kW, bhp, °F, °C, Δ°F, K, kPa, J/(kg·K), kg/m³, Btu/h, Btu/ft³, cfh)
# --------------------------------------------------------------------------------------------
HOOD_SRC = (
    "Sources: 1 ft = 0.3048 m, 1 in = 0.0254 m, 1 cfm = 1.699 m³/h = 0.4719 L/s, 1 fpm = "
    "0.00508 m/s, 1 in. w.c. = 249.1 Pa, 1 kW = 3412 Btu/h, 1 ft³ = 0.02832 m³ (NIST SP 811 "
    "(2008) App. B.8); °C = (°F − 32)/1.8, K = °C + 273.15 (SI Brochure 9th ed.); exhaust per "
    "linear foot of wall canopy hood, 200/300/400 cfm/ft for light/medium/heavy duty "
    "appliances (IMC (2021) 507.5 and ASHRAE Handbook HVAC Applications (2019) ch. 34, from "
    "memory); grease duct velocity at least 500 fpm (NFPA 96 (2021), from memory); fan power "
    "P = q·Δp/η and the US form bhp = cfm·in. w.c./(6356·η) (ASHRAE Handbook HVAC Systems "
    "and Equipment (2020) ch. 21, from memory); sensible heat 1.08·cfm·ΔT (Btu/h, °F) and "
    "1.2·q·ΔT (kW, m³/s, K) (ASHRAE Handbook Fundamentals (2021) ch. 18, from memory); "
    "ρ = p/(R·T), R = 287 J/(kg·K) for dry air (common practice); natural gas 1030 Btu/ft³ "
    "(common practice, invented supplier figure). Restaurant, hood, maker's data and "
    "readings invented.")
hd = ItemSheet("Hood", "Bramblecote Bistro (invented): cook-line wall canopy hood, grease "
               "duct, exhaust fan and direct-fired make-up air unit, winter design", HOOD_SRC)
hd.heading("Exhaust (hood schedule on the Sections sheet)")
hd.add("Lh", "Hood length, all sections (Sections sheet)", "L_h", "=Sections!C9", "ft")
hd.add("Dh", "Hood depth, front overhang included", "D_h", 4.5, "ft")
hd.add("Qex", "Hood exhaust, all sections (Sections sheet)", "Q_ex", "=Sections!E9", "cfm")
hd.add("Qh", "Hood exhaust, m³/h", "Q_ex,h", "={Qex}*1.699", "m³/h")
hd.add("Qh2", "Hood exhaust, m³/h (fan maker's enquiry)", "Q_ex,h2", "={Qex}/1.699", "m³/h",
       planted=("unit-scale", "cfm to m³/h divided by 1.699: wrong way round"))
hd.add("Qs", "Hood exhaust, m³/s", "Q_ex,s", "={Qh}/3600", "m³/s")
hd.heading("Hood face")
hd.add("Af", "Hood face area", "A_f", "={Lh}*{Dh}", "ft²")
hd.add("vf", "Mean velocity across the hood face (capture)", "v_f", "={Qex}/{Af}", "fpm")
hd.add("vfm", "Mean velocity across the hood face, m/s", "v_f,SI", "={vf}*0.00508", "m/s")
hd.add("vfm2", "Mean velocity across the hood face, m/s (first draft)", "v_f,SI2",
       "={vf}*0.3048", "m/s",
       planted=("unit-scale", "ft/min times 0.3048 gives m/min, written as m/s: /60 missing"))
hd.heading("Grease duct")
hd.add("wd", "Grease duct width", "w_d", 20, "in")
hd.add("hdd", "Grease duct height", "h_d", 14, "in")
hd.add("Ad", "Grease duct area", "A_d", "={wd}*{hdd}/144", "ft²")
hd.add("vd", "Grease duct velocity (at least 500 fpm)", "v_d", "={Qex}/{Ad}", "fpm")
hd.add("Adm", "Grease duct area, m²", "A_d,SI", "={wd}*0.0254*{hdd}*0.0254", "m²")
hd.add("vdm", "Grease duct velocity, m/s", "v_d,SI", "={Qs}/{Adm}", "m/s")
hd.add("vdm2", "Grease duct velocity, m/s (first draft)", "v_d,SI2", "={Qh}/{Adm}", "m/s",
       planted=("unit-scale", "m³/h over m² gives m/h, written as m/s: 3600 too large"))
hd.heading("Static pressure")
hd.add("ph", "Hood and baffle filter static pressure loss (maker, invented)", "Δp_h", 0.625,
       "in. w.c.")
hd.add("Ld", "Grease duct length, hood to roof fan", "L_d", 45, "ft")
hd.add("fr", "Duct friction rate (duct friction chart)", "f_r", 0.25, "in. w.c./100 ft")
hd.add("pf", "Duct friction loss", "Δp_f", "={fr}*{Ld}/100", "in. w.c.")
hd.add("pfit", "Fittings, fan inlet and discharge losses", "Δp_fit", 0.40, "in. w.c.")
hd.add("ps", "Fan static pressure rise", "Δp_s", "={ph}+{pf}+{pfit}", "in. w.c.")
hd.add("psPa", "Fan static pressure rise, Pa", "Δp_s,SI", "={ps}*249.1", "Pa")
hd.add("psPa2", "Fan static pressure rise, Pa (first draft)", "Δp_s,SI2", "={ps}*249.1/1000",
       "Pa", planted=("unit-scale", "in. w.c. to Pa with a /1000 that does not belong"))
hd.heading("Exhaust fan")
hd.add("eta", "Fan static efficiency at duty (maker's curve, invented)", "η_f", 55, "%")
hd.add("Pf", "Fan shaft power", "P_f", "={Qs}*{psPa}/({eta}/100)/1000", "kW")
hd.add("Pf2", "Fan shaft power (first draft)", "P_f2", "={Qs}*{psPa}/({eta}/100)", "kW",
       planted=("unit-scale", "m³/s × Pa gives W, written as kW: /1000 missing"))
hd.add("bhp", "Fan brake horsepower, US form", "bhp", "={Qex}*{ps}/(6356*{eta}/100)", "bhp")
hd.add("Ra", "Gas constant of dry air", "R_a", 287, "J/(kg·K)")
hd.add("pb", "Site barometer (invented, about 250 m above sea level)", "p_b", 98.4, "kPa")
hd.add("tex", "Exhaust temperature at the fan", "t_ex", 100, "°F")
hd.add("texC", "Exhaust temperature at the fan, °C", "t_ex,C", "=({tex}-32)/1.8", "°C")
hd.add("rho", "Exhaust air density", "ρ_ex", "={pb}*1000/({Ra}*({texC}+273.15))", "kg/m³")
hd.add("rho2", "Exhaust air density (first draft)", "ρ_ex2", "={pb}*1000/({Ra}*{texC})",
       "kg/m³", planted=("offset-scale", "a °C reading in the gas law where kelvins belong"))
hd.heading("Make-up air")
hd.add("sMU", "Make-up air, share of exhaust (rest transferred from the dining room)", "s_MU",
       85, "%")
hd.add("Qmu", "Make-up air flow", "Q_MU", "={Qex}*{sMU}/100", "cfm")
hd.add("Qmu2", "Make-up air flow (first draft)", "Q_MU2", "={Qex}*{sMU}", "cfm",
       planted=("unit-scale", "a % used as a fraction: 100 too large"))
hd.add("Qmus", "Make-up air flow, m³/s", "Q_MU,s", "={Qmu}*0.4719/1000", "m³/s")
hd.add("to", "Outdoor winter design temperature (invented)", "t_o", 10, "°F")
hd.add("ts", "Make-up air discharge temperature", "t_s", 60, "°F")
hd.add("dTF", "Temperature rise through the heater", "ΔT_F", "={ts}-{to}", "Δ°F")
hd.add("toC", "Outdoor winter design temperature, °C", "t_o,C", "=({to}-32)/1.8", "°C")
hd.add("dTK", "Temperature rise through the heater, K", "ΔT_K", "={dTF}/1.8", "K")
hd.add("H", "Make-up air heating", "H_MU", "=1.08*{Qmu}*{dTF}", "Btu/h")
hd.add("HkW", "Make-up air heating, kW", "H_MU,kW", "={H}/3412", "kW")
hd.add("HSI", "Make-up air heating, SI check", "H_MU,SI", "=1.2*{Qmus}*{dTK}", "kW")
hd.add("HSI2", "Make-up air heating, SI check (first draft)", "H_MU,SI2", "=1.2*{Qmus}*{dTF}",
       "kW", planted=("unit-scale", "a rise in °F used as kelvins: 1.8 too large"))
hd.add("effb", "Burner efficiency, direct-fired (maker, invented)", "η_b", 92, "%")
hd.add("Hin", "Burner input", "H_in", "={H}/({effb}/100)", "Btu/h")
hd.add("HV", "Natural gas heating value (supplier, invented)", "HV", 1030, "Btu/ft³")
hd.add("Vg", "Gas flow to the burner", "V_g", "={Hin}/{HV}", "cfh")
hd.add("Vgm", "Gas flow to the burner, m³/h", "V_g,SI", "={Vg}*0.02832", "m³/h")
HOODS = hd.finish()

SECT = {
    "A1": "Bramblecote Bistro (invented): hood schedule by appliance duty (wall canopy)",
    "A2": "Sources: exhaust per linear foot by duty (IMC (2021) 507.5, from memory); 1 cfm = "
          "1.699 m³/h (NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Section", "B5": "Appliance duty", "C5": "Length [ft]", "D5": "Rate [cfm/ft]",
    "E5": "Exhaust [cfm]", "F5": "Exhaust [m³/h]",
    "A9": "Total", "C9": "=SUM(C6:C8)", "E9": "=SUM(E6:E8)", "F9": "=SUM(F6:F8)",
}
for r, (sec, duty, length, rate) in enumerate([("Charbroiler and griddle", "heavy", 6, 400),
                                               ("Range and fryers", "medium", 7, 300),
                                               ("Combi ovens", "light", 3, 200)], start=6):
    SECT[f"A{r}"], SECT[f"B{r}"], SECT[f"C{r}"], SECT[f"D{r}"] = sec, duty, length, rate
    SECT[f"E{r}"] = f"=C{r}*D{r}"
    SECT[f"F{r}"] = f"=E{r}*1.699"
SECT["F7"] = "=E7/1.699"
SECT["F8"] = "=E8*0.4719"
SECT_PLANTED = {"Sections!F7": ("unit-scale", "cfm to m³/h divided by 1.699: wrong way round"),
                "Sections!F8": ("unit-scale", "the L/s factor 0.4719 where m³/h (1.699) belongs")}

HOODB = {
    "trade": "building services: restaurant kitchen hood exhaust, grease duct, fan and make-up air",
    "sheets": [("Hood", HOODS), ("Sections", SECT)],
    "planted": {**hd.planted, **SECT_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 2: gas well wellhead and flowline (Mscf/d, MMscf/d, m³/d, m³/h, psig, psia, MPa(g), °F,
# °C, °R, in, mm, mi, km, ft/s, m/s, m³/s, m², lb/ft³, kg/m³, Btu/h, kW, Btu/scf, scf/h)
# --------------------------------------------------------------------------------------------
GAS_SRC = (
    "Sources: 1 Mscf = 28.32 m³, 1 psi = 6.895 kPa, 1 in = 25.4 mm, 1 mi = 1.609 km, 1 ft = "
    "0.3048 m, 1 lb/ft³ = 16.02 kg/m³, 1 kW = 3412 Btu/h (NIST SP 811 (2008) App. B.8); "
    "°R = °F + 459.67, °C = (°F − 32)/1.8; absolute = gauge + site barometer (common "
    "practice); Weymouth Q(scf/d) = 433.5·E·(T_b/p_b)·[(p₁² − p₂²)/(G·T_f·L·Z)]^0.5·D^2.667, "
    "p in psia, T in °R, L in mi, D in in (GPSA Engineering Data Book, 13th ed. (2012), "
    "sect. 17, from memory); gas velocity v(ft/s) = 60·Z·Q(MMscf/d)·T(°R)/(d²(in)·p(psia)), "
    "erosional velocity v_e = C/√ρ with C = 100 (ft/s, lb/ft³), and gas density "
    "ρ = 2.7·G·p/(Z·T) (lb/ft³, psia, °R) (API RP 14E, 5th ed. (1991), from memory). Well, "
    "pad, line, analysis and readings invented.")
gw = ItemSheet("Well", "Kestrel Draw 4-12H (invented): dry gas well, wellhead, choke and "
               "3.4 mi flowline to the central facility, design rate", GAS_SRC)
gw.heading("Rate")
gw.add("Q", "Gas rate at the wellhead meter (test, invented)", "Q", 4200, "Mscf/d")
gw.add("QMM", "Gas rate, MMscf/d", "Q_MM", "={Q}/1000", "MMscf/d")
gw.add("Qm3", "Gas rate, m³/d (same base conditions)", "Q_SI", "={Q}*28.32", "m³/d")
gw.add("Qm32", "Gas rate, m³/d (regulator's return)", "Q_SI2", "={Q}*0.02832", "m³/d",
       planted=("unit-scale", "Mscf taken as scf: the ×1000 missing"))
gw.add("Qm3h", "Gas rate, m³/h", "Q_SI,h", "={Qm3}/24", "m³/h")
gw.add("Qm3h2", "Gas rate, m³/h (first draft)", "Q_SI,h2", "={Qm3}/86400", "m³/h",
       planted=("unit-scale", "per day to per hour divided by 86400 (seconds): 3600 too small"))
gw.heading("Wellhead")
gw.add("pb", "Site barometer at the pad (invented, about 1000 m above sea level)", "p_bar",
       13.0, "psia")
gw.add("pwh", "Flowing wellhead pressure (tubing)", "p_wh", 1150, "psig")
gw.add("pwha", "Flowing wellhead pressure, absolute", "p_wh,a", "={pwh}+{pb}", "psia")
gw.add("pwha2", "Flowing wellhead pressure, absolute (first draft)", "p_wh,a2", "={pwh}",
       "psia", planted=("offset-scale", "a gauge reading set equal to an absolute one"))
gw.add("pwhM", "Flowing wellhead pressure, MPa(g)", "p_wh,M", "={pwh}*0.006895", "MPa(g)")
gw.add("pwhM2", "Flowing wellhead pressure, MPa(g) (partner's report)", "p_wh,M2",
       "={pwh}*6.895", "MPa(g)",
       planted=("unit-scale", "psi to kPa factor written into an MPa cell: 1000 too large"))
gw.add("twh", "Flowing wellhead temperature", "t_wh", 118, "°F")
gw.add("twhC", "Flowing wellhead temperature, °C", "t_wh,C", "=({twh}-32)/1.8", "°C")
gw.add("twhR", "Flowing wellhead temperature, °R", "T_wh", "={twh}+459.67", "°R")
gw.add("twhR2", "Flowing wellhead temperature, °R (first draft)", "T_wh2", "={twhC}+459.67",
       "°R", planted=("offset-scale", "the Rankine zero added to a °C reading"))
gw.heading("Flowline capacity (Weymouth)")
gw.add("D", "Flowline bore (4 in Sch 40)", "D", 4.026, "in")
gw.add("Dmm", "Flowline bore, mm", "D_SI", "={D}*25.4", "mm")
gw.add("L", "Flowline length", "L", 3.4, "mi")
gw.add("Lkm", "Flowline length, km", "L_SI", "={L}*1.609", "km")
gw.add("p1", "Flowline inlet pressure, downstream of the choke", "p_1g", 1000, "psig")
gw.add("p2", "Arrival pressure at the central facility", "p_2g", 900, "psig")
gw.add("p1a", "Flowline inlet pressure, absolute", "p_1", "={p1}+{pb}", "psia")
gw.add("p2a", "Arrival pressure, absolute", "p_2", "={p2}+{pb}", "psia")
gw.add("G", "Gas specific gravity (air = 1, invented analysis)", "G", 0.65, "-")
gw.add("Tf", "Mean flowing temperature", "t_f", 80, "°F")
gw.add("TfR", "Mean flowing temperature, °R", "T_f", "={Tf}+459.67", "°R")
gw.add("Z", "Compressibility factor at line conditions", "Z", 0.87, "-")
gw.add("E", "Pipeline efficiency factor", "E", 0.92, "-")
gw.add("Tb", "Contract base temperature", "t_b", 60, "°F")
gw.add("TbR", "Contract base temperature, °R", "T_b", "={Tb}+459.67", "°R")
gw.add("Pbase", "Contract base pressure", "p_b", 14.73, "psia")
gw.add("QW", "Flowline capacity, Weymouth", "Q_W",
       "=433.5*{E}*({TbR}/{Pbase})*(({p1a}^2-{p2a}^2)/({G}*{TfR}*{L}*{Z}))^0.5*{D}^2.667/1000",
       "Mscf/d")
gw.add("QW2", "Flowline capacity, Weymouth (first draft)", "Q_W2",
       "=433.5*{E}*({TbR}/{Pbase})*(({p1}^2-{p2}^2)/({G}*{TfR}*{L}*{Z}))^0.5*{D}^2.667/1000",
       "Mscf/d", planted=("offset-scale", "gauge pressures squared where absolute belong"))
gw.heading("Velocity and erosion at the arrival end (API RP 14E)")
gw.add("v", "Gas velocity at the arrival end", "v", "=60*{Z}*{QMM}*{TfR}/({D}^2*{p2a})", "ft/s")
gw.add("v2", "Gas velocity at the arrival end (first draft)", "v_2",
       "=60*{Z}*{QMM}*{Tf}/({D}^2*{p2a})", "ft/s",
       planted=("offset-scale", "a °F reading in a ratio where °R belongs"))
gw.add("vms", "Gas velocity, m/s", "v_SI", "={v}*0.3048", "m/s")
gw.add("qa", "Actual gas flow at the arrival end", "q_a",
       "={Qm3}/86400*({Pbase}/{p2a})*({TfR}/{TbR})*{Z}", "m³/s")
gw.add("A", "Flowline bore area", "A", "=PI()*({Dmm}/1000)^2/4", "m²")
gw.add("vSI", "Gas velocity, SI check", "v_SI,c", "={qa}/{A}", "m/s")
gw.add("rhog", "Gas density at the arrival end", "ρ_g", "=2.7*{G}*{p2a}/({Z}*{TfR})", "lb/ft³")
gw.add("rhoSI", "Gas density, kg/m³", "ρ_g,SI", "={rhog}*16.02", "kg/m³")
gw.add("rhoSI2", "Gas density, kg/m³ (first draft)", "ρ_g,SI2", "={rhog}/16.02", "kg/m³",
       planted=("unit-scale", "lb/ft³ to kg/m³ divided by 16.02: wrong way round"))
gw.add("ve", "Erosional velocity, C = 100", "v_e", "=100/SQRT({rhog})", "ft/s")
gw.heading("Line heater fuel (hydrate prevention at the choke)")
gw.add("Hh", "Line heater firing rate (maker, invented)", "H_h", 500000, "Btu/h")
gw.add("HhkW", "Line heater firing rate, kW", "H_h,SI", "={Hh}/3412", "kW")
gw.add("HV", "Fuel gas heating value (HHV, invented analysis)", "HV", 1020, "Btu/scf")
gw.add("qf", "Fuel gas to the heater", "q_f", "={Hh}/{HV}", "scf/h")
gw.add("qfd", "Fuel gas to the heater, Mscf/d", "q_f,d", "={qf}*24/1000", "Mscf/d")
gw.add("qfd2", "Fuel gas to the heater, Mscf/d (allocation sheet)", "q_f,d2", "={qf}*24",
       "Mscf/d", planted=("unit-scale", "scf/d written as Mscf/d: /1000 missing"))
WELLS = gw.finish()

_PB = gw.ref("pb")
TEST = {
    "A1": "Kestrel Draw 4-12H (invented): four-point flow test after completion",
    "A2": "Sources: absolute = gauge + site barometer (common practice); 1 Mscf = 28.32 m³ "
          "(NIST SP 811 (2008) App. B.8); °C = (°F − 32)/1.8.",
    "A3": CAUTION,
    "A5": "Test point", "B5": "Choke (64ths of an inch)", "C5": "Rate [Mscf/d]",
    "D5": "FWHP [psig]", "E5": "FWHP [psia]", "F5": "Rate [m³/d]", "G5": "FWHT [°F]",
    "H5": "FWHT [°C]",
}
for r, (pt, ch, q, p, t) in enumerate([("1", 16, 2150, 1480, 104), ("2", 20, 3100, 1340, 111),
                                       ("3", 24, 4200, 1150, 118)], start=6):
    TEST[f"A{r}"], TEST[f"B{r}"], TEST[f"C{r}"], TEST[f"D{r}"], TEST[f"G{r}"] = pt, ch, q, p, t
    TEST[f"E{r}"] = f"=D{r}+{_PB}"
    TEST[f"F{r}"] = f"=C{r}*28.32"
    TEST[f"H{r}"] = f"=(G{r}-32)/1.8"
TEST["H7"] = "=(G7-32)*1.8"
TEST_PLANTED = {"Test!H7": ("unit-scale", "°F to °C multiplied by 1.8 where it divides")}

GASB = {
    "trade": "oil and gas production: gas wellhead, flowline capacity, velocity and heater fuel",
    "sheets": [("Well", WELLS), ("Test", TEST)],
    "planted": {**gw.planted, **TEST_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 3: reservoir dam spillway and bottom outlet (m, ft, mm, m^0.5/s, ft^0.5/s, m³/s, cfs,
# ML/d, m/s, ft/s, kPa(g), psig, ML, acre-ft, km², m³, hm³, d, -)
# --------------------------------------------------------------------------------------------
DAM_SRC = (
    "Sources: 1 m = 3.281 ft, 1 m³/s = 35.31 cfs, 1 acre-ft = 1233.5 m³ = 1.2335 ML, "
    "1 km² = 247.1 acre, 1 psi = 6.895 kPa (NIST SP 811 (2008) App. B.8); 1 m³/s = 86.4 ML/d, "
    "1 km²·mm = 1 ML (common practice); g_n = 9.81 m/s² = 32.2 ft/s² (SI Brochure 9th ed.); "
    "ogee crest Q = C·L·H^1.5, C ≈ 2.1 to 2.2 m^0.5/s at design head, C(ft^0.5/s) = "
    "1.811·C(m^0.5/s) (USBR Design of Small Dams, 3rd ed. (1987), ch. 9, from memory); "
    "sluice gate free discharge Q = C_d·b·a·√(2gH) (Chow, Open-Channel Hydraulics (1959), "
    "from memory); water pressure ρ_w·g·h with ρ_w·g = 9.81 kN/m³ (common practice). "
    "Reservoir, dam, catchment, storm and readings invented.")
dm = ItemSheet("Dam", "Harrowgill Reservoir (invented): earthfill dam, uncontrolled ogee "
               "spillway and bottom outlet, design flood check", DAM_SRC)
dm.heading("Spillway (uncontrolled ogee crest)")
dm.add("Ls", "Net crest length", "L_s", 42, "m")
dm.add("Hd", "Design head on the crest (flood routing, invented)", "H_d", 2.6, "m")
dm.add("Cs", "Discharge coefficient at design head (ogee)", "C", 2.15, "m^0.5/s")
dm.add("Qs", "Spillway discharge at design head", "Q_s", "={Cs}*{Ls}*{Hd}^1.5", "m³/s")
dm.add("Qscfs", "Spillway discharge, cfs", "Q_s,US", "={Qs}*35.31", "cfs")
dm.add("Qscfs2", "Spillway discharge, cfs (US consultant's check sheet)", "Q_s,US2",
       "={Qs}*3.281", "cfs",
       planted=("unit-scale", "the foot's 3.281 on a volume flow where 35.31 belongs"))
dm.add("Lsft", "Net crest length, ft", "L_s,ft", "={Ls}*3.281", "ft")
dm.add("Hdft", "Design head on the crest, ft", "H_d,ft", "={Hd}*3.281", "ft")
dm.add("CsUS", "Discharge coefficient, foot units", "C_US", "={Cs}*1.811", "ft^0.5/s")
dm.add("CsUS2", "Discharge coefficient, foot units (first draft)", "C_US2", "={Cs}/1.811",
       "ft^0.5/s", planted=("unit-scale", "C from metre to foot units divided by 1.811: "
                                          "wrong way round"))
dm.add("QsUS", "Spillway discharge, US check", "Q_s,c", "={CsUS}*{Lsft}*{Hdft}^1.5", "cfs")
dm.add("QsUS2", "Spillway discharge, US check (first draft)", "Q_s,c2",
       "={Cs}*{Lsft}*{Hdft}^1.5", "cfs",
       planted=("unit-scale", "the metre coefficient in the foot form: 1.811 too small"))
dm.heading("Levels")
dm.add("zc", "Spillway crest level = top water level", "z_c", 312.4, "m")
dm.add("zmax", "Maximum flood level", "z_max", "={zc}+{Hd}", "m")
dm.add("zd", "Dam crest level", "z_d", 316.0, "m")
dm.add("fb", "Freeboard at the design flood", "f_b", "={zd}-{zmax}", "m")
dm.add("fbft", "Freeboard at the design flood, ft", "f_b,ft", "={fb}*3.281", "ft")
dm.add("ztoe", "Stilling basin floor level", "z_toe", 285.0, "m")
dm.add("vt", "Velocity at the chute toe, no losses (upper bound)", "v_t",
       "=SQRT(2*9.81*({zmax}-{ztoe}))", "m/s")
dm.add("vt2", "Velocity at the chute toe (first draft)", "v_t2",
       "=SQRT(2*32.2*({zmax}-{ztoe}))", "m/s",
       planted=("gravity-number", "g in ft/s² beside a fall in metres"))
dm.add("vtft", "Velocity at the chute toe, ft/s", "v_t,ft", "={vt}*3.281", "ft/s")
dm.heading("Bottom outlet (vertical sluice gate, free discharge)")
dm.add("zg", "Gate sill level", "z_g", 290.0, "m")
dm.add("bg", "Gate width", "b", 1.5, "m")
dm.add("ag", "Gate opening", "a", 800, "mm")
dm.add("Cd", "Discharge coefficient, free flow", "C_d", 0.61, "-")
dm.add("Hg", "Head over the centre of the opening, at top water level", "H_g",
       "={zc}-{zg}-{ag}/1000/2", "m")
dm.add("Qg", "Outlet discharge at top water level", "Q_g",
       "={Cd}*{bg}*{ag}/1000*SQRT(2*9.81*{Hg})", "m³/s")
dm.add("Qg2", "Outlet discharge (first draft)", "Q_g2", "={Cd}*{bg}*{ag}*SQRT(2*9.81*{Hg})",
       "m³/s", planted=("unit-scale", "the opening in mm: /1000 missing"))
dm.add("QgUS", "Outlet discharge, US check", "Q_g,US",
       "={Cd}*{bg}*3.281*{ag}/1000*3.281*SQRT(64.4*{Hg}*3.281)", "cfs")
dm.add("QgML", "Outlet discharge, ML/d", "Q_g,ML", "={Qg}*86.4", "ML/d")
dm.add("pg", "Water pressure on the gate sill at top water level", "p_g",
       "=9.81*({zc}-{zg})", "kPa(g)")
dm.add("pgpsi", "Water pressure on the gate sill, psig", "p_g,US", "={pg}/6.895", "psig")
dm.heading("Storage")
dm.add("Vt", "Storage at top water level (Storage sheet)", "V_t",
       "=VLOOKUP({zc},Storage!A6:D10,3,TRUE)", "ML")
dm.add("Vtaf", "Storage at top water level, acre-ft", "V_t,US", "={Vt}/1.2335", "acre-ft")
dm.add("As", "Water surface area at top water level", "A_s", 1.85, "km²")
dm.add("dV", "Flood surcharge storage, prism approximation", "ΔV", "={As}*1000000*{Hd}", "m³")
dm.add("dVhm", "Flood surcharge storage, hm³", "ΔV_hm", "={dV}/1000000", "hm³")
dm.add("dVaf", "Flood surcharge storage, acre-ft", "ΔV_US", "={As}*247.1*{Hd}*3.281",
       "acre-ft")
dm.add("dVaf2", "Flood surcharge storage, acre-ft (first draft)", "ΔV_US2",
       "={As}*247.1*{Hd}", "acre-ft",
       planted=("unit-scale", "head in m where ft belongs: 3.281 too small"))
dm.add("td", "Time to empty through the outlet at the full-head rate (lower bound)", "t_d",
       "={Vt}*1000/{Qg}/86400", "d")
dm.add("td2", "Time to empty through the outlet (first draft)", "t_d2",
       "={Vt}*1000/{Qg}/3600", "d",
       planted=("unit-scale", "seconds to days divided by 3600: 24 too large"))
dm.heading("Storm runoff volume")
dm.add("Ac", "Catchment area", "A_c", 48, "km²")
dm.add("Pst", "Storm rainfall depth, 24 h (invented)", "P", 210, "mm")
dm.add("Cr", "Volumetric runoff coefficient", "C_r", 0.70, "-")
dm.add("Vr", "Storm runoff volume (1 km²·mm = 1 ML)", "V_r", "={Ac}*{Pst}*{Cr}", "ML")
dm.add("Vrm", "Storm runoff volume, m³", "V_r,m", "={Ac}*{Pst}*{Cr}*1000", "m³")
dm.add("Vrm2", "Storm runoff volume, m³ (first draft)", "V_r,m2", "={Ac}*{Pst}*{Cr}*1000000",
       "m³", planted=("unit-scale", "km²·mm to m³ multiplied by 10⁶: 1000 too large"))
dm.add("Vraf", "Storm runoff volume, acre-ft", "V_r,US", "={Vr}/1.2335", "acre-ft")
DAMS = dm.finish()

STOR = {
    "A1": "Harrowgill Reservoir (invented): level–area–storage table from the bathymetric "
          "survey",
    "A2": "Sources: survey (invented); 1 acre-ft = 1.2335 ML (NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Level [m]", "B5": "Area [km²]", "C5": "Storage [ML]", "D5": "Storage [acre-ft]",
}
for r, (z, a, v) in enumerate([(300.0, 0.42, 1850), (305.0, 0.88, 5050), (310.0, 1.41, 10800),
                               (312.4, 1.85, 14690), (316.0, 2.30, 22160)], start=6):
    STOR[f"A{r}"], STOR[f"B{r}"], STOR[f"C{r}"] = z, a, v
    STOR[f"D{r}"] = f"=C{r}/1.2335"
STOR["D8"] = "=C8*1.2335"
STOR_PLANTED = {"Storage!D8": ("unit-scale", "ML to acre-ft multiplied by 1.2335: wrong way "
                                             "round")}

DAMB = {
    "trade": "water resources: reservoir spillway, bottom outlet, storage and flood volume",
    "sheets": [("Dam", DAMS), ("Storage", STOR)],
    "planted": {**dm.planted, **STOR_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 4: process cooling water loop (kW, Btu/h, tons, °C, °F, K, Δ°F, kJ/(kg·K), kg/m³, kg/s,
# m³/h, L/s, gpm, m, ft, kPa, psi, bar(g), bar a, %, hp/bhp, W, kJ/kg, kg/h, mm, m/s, ft/s)
# --------------------------------------------------------------------------------------------
CW_SRC = (
    "Sources: 1 kW = 3412 Btu/h, 1 ton of refrigeration = 3.517 kW, 1 m³/h = 4.403 US gpm, "
    "1 m = 3.281 ft, 1 hp = 0.7457 kW (NIST SP 811 (2008) App. B.8); °F = 1.8·°C + 32; "
    "g_n = 9.81 m/s² (SI Brochure 9th ed.); Q = ṁ·c_p·ΔT, and the US forms gpm = "
    "Btu/h/(500·ΔT°F) and tons = gpm·ΔT°F/24 (common practice); 2.31 ft of water per psi "
    "(common practice); hydraulic power ρ·g·Q·H and bhp = gpm·ft/(3960·η) (Hydraulic "
    "Institute, from memory); NPSHa = (p_s,abs − p_v)/(ρ·g) at the suction flange, velocity "
    "head left out (Hydraulic Institute, from memory); p_v = 4.01 kPa at 29 °C, h_fg = 2420 "
    "kJ/kg near 30 °C, ρ = 994 kg/m³ at 35 °C (IAPWS-IF97 tables, from memory); evaporation "
    "= Q/h_fg, blowdown = E/(cycles − 1) (Cooling Technology Institute, common practice). "
    "Plant, tower, exchanger, pump and readings invented.")
cw = ItemSheet("Cooling", "Calder Mere Extrusions (invented): open tower loop serving the "
               "extruder barrels and mould chillers through a plate heat exchanger", CW_SRC)
cw.heading("Heat load")
cw.add("Q", "Process heat rejected to the loop (invented)", "Q", 420, "kW")
cw.add("QB", "Process heat, Btu/h (US tower maker)", "Q_US", "={Q}*3412", "Btu/h")
cw.add("Qt", "Process heat, tons", "Q_t", "={Q}/3.517", "tons")
cw.add("Qt2", "Process heat, tons (first draft)", "Q_t2", "={Q}*3.517", "tons",
       planted=("unit-scale", "kW to tons multiplied by 3.517: wrong way round"))
cw.heading("Temperatures")
cw.add("ts", "Supply temperature from the tower", "t_s", 29, "°C")
cw.add("tr", "Return temperature to the tower", "t_r", 35, "°C")
cw.add("tsF", "Supply temperature, °F", "t_s,F", "={ts}*1.8+32", "°F")
cw.add("dT", "Temperature rise across the process (tower range)", "ΔT", "={tr}-{ts}", "K")
cw.add("dTF", "Temperature rise, °F", "ΔT_F", "={dT}*1.8", "Δ°F")
cw.add("dTF2", "Temperature rise, °F (first draft)", "ΔT_F2", "={dT}*1.8+32", "Δ°F",
       planted=("offset-scale", "a difference converted with the +32 of a reading"))
cw.add("twb", "Design wet-bulb temperature (invented)", "t_wb", 21, "°C")
cw.add("ap", "Tower approach", "Δt_ap", "={ts}-{twb}", "K")
cw.heading("Flow")
cw.add("cp", "Specific heat of water", "c_p", 4.18, "kJ/(kg·K)")
cw.add("rho", "Density of water at 35 °C", "ρ", 994, "kg/m³")
cw.add("m", "Circulating mass flow", "ṁ", "={Q}/({cp}*{dT})", "kg/s")
cw.add("V", "Circulating flow", "V̇", "={m}/{rho}*3600", "m³/h")
cw.add("V2", "Circulating flow (first draft)", "V̇_2", "={m}/{rho}*60", "m³/h",
       planted=("unit-scale", "per second to per hour by 60: 60 too small"))
cw.add("VLs", "Circulating flow, L/s", "V̇_L", "={V}/3.6", "L/s")
cw.add("gpm", "Circulating flow, US gpm", "V̇_US", "={V}*4.403", "gpm")
cw.add("gpmUS", "Circulating flow, US check (500 per gpm·°F)", "V̇_US,c", "={QB}/(500*{dTF})",
       "gpm")
cw.add("tUS", "Process heat, US check (gpm·°F/24)", "Q_t,c", "={gpm}*{dTF}/24", "tons")
cw.heading("Pump head")
cw.add("hst", "Static lift, tower basin to spray header", "H_st", 4.2, "m")
cw.add("hf", "Pipe and fittings friction (Piping sheet)", "h_f", "=Piping!H9", "m")
cw.add("dpX", "Plate heat exchanger pressure drop (maker, invented)", "Δp_X", 62, "kPa")
cw.add("hX", "Plate heat exchanger loss, head", "h_X", "={dpX}*1000/({rho}*9.81)", "m")
cw.add("hX2", "Plate heat exchanger loss, head (first draft)", "h_X2", "={dpX}*1000/{rho}",
       "m", planted=("result-unit", "Δp/ρ with g left out"))
cw.add("pN", "Spray nozzle pressure at the header (tower maker, invented)", "Δp_N", 2.0, "psi")
cw.add("hN", "Spray nozzle pressure, head", "h_N", "={pN}*2.31*0.3048", "m")
cw.add("H", "Pump total head", "H", "={hst}+{hf}+{hX}+{hN}", "m")
cw.add("Hft", "Pump total head, ft", "H_ft", "={H}*3.281", "ft")
cw.heading("Pump power")
cw.add("eta", "Pump efficiency at duty (maker's curve, invented)", "η_p", 74, "%")
cw.add("Ph", "Hydraulic power", "P_h", "={rho}*9.81*{V}/3600*{H}/1000", "kW")
cw.add("Psh", "Pump shaft power", "P_sh", "={Ph}/({eta}/100)", "kW")
cw.add("bhp", "Pump brake horsepower, US check", "bhp", "={gpm}*{Hft}/(3960*{eta}/100)", "bhp")
cw.add("bhp2", "Pump brake horsepower, US check (first draft)", "bhp_2",
       "={gpm}*{Hft}/(3960*{eta})", "bhp",
       planted=("unit-scale", "a % used as a fraction: 100 too small"))
cw.add("etam", "Motor efficiency (IE3, invented)", "η_m", 93, "%")
cw.add("Pin", "Pump motor input", "P_in", "={Psh}/({etam}/100)", "kW")
cw.add("Pfan", "Tower fan motor input", "P_fan", 7.5, "kW")
cw.add("Pctl", "Controls and water treatment dosing", "P_ctl", 350, "W")
cw.add("Pel", "Electrical load of the loop", "P_el", "={Pin}+{Pfan}+{Pctl}/1000", "kW")
cw.add("Pel2", "Electrical load of the loop (first draft)", "P_el2", "={Pin}+{Pfan}+{Pctl}",
       "kW", planted=("unit-scale", "W added to kW"))
cw.heading("Pump suction (flooded from the tower basin)")
cw.add("psg", "Pump suction gauge reading", "p_s", 0.35, "bar(g)")
cw.add("pb", "Site barometer (invented)", "p_b", 1.005, "bar a")
cw.add("pv", "Vapour pressure of water at 29 °C", "p_v", 4.01, "kPa")
cw.add("NPSH", "NPSH available", "NPSHa", "=(({psg}+{pb})*100-{pv})*1000/({rho}*9.81)", "m")
cw.add("NPSH2", "NPSH available (first draft)", "NPSHa2",
       "=({psg}*100-{pv})*1000/({rho}*9.81)", "m",
       planted=("offset-scale", "a gauge reading less an absolute vapour pressure"))
cw.heading("Tower make-up water")
cw.add("hfg", "Latent heat of water near 30 °C", "h_fg", 2420, "kJ/kg")
cw.add("me", "Evaporation", "ṁ_e", "={Q}/{hfg}*3600", "kg/h")
cw.add("Ve", "Evaporation, volume", "V̇_e", "={me}/{rho}", "m³/h")
cw.add("CoC", "Cycles of concentration", "N_c", 4, "-")
cw.add("Vb", "Blowdown", "V̇_b", "={Ve}/({CoC}-1)", "m³/h")
cw.add("Vmu", "Make-up water", "V̇_mu", "={Ve}+{Vb}", "m³/h")
cw.add("Vmug", "Make-up water, US gpm", "V̇_mu,US", "={Vmu}*4.403", "gpm")
CWS = cw.finish()

_V = cw.ref("V")
PIPE = {
    "A1": "Calder Mere Extrusions (invented): loop friction by segment, Darcy–Weisbach with "
          "fittings",
    "A2": "Sources: h = (f·L/d + ΣK)·v²/(2g), g_n = 9.81 m/s² (Crane TP-410 (2013), from "
          "memory); 1 m = 3.281 ft (NIST SP 811 (2008) App. B.8); friction factors from the "
          "Moody chart for commercial steel (invented reading).",
    "A3": CAUTION,
    "A5": "Segment", "B5": "Length [m]", "C5": "Bore [mm]", "D5": "Velocity [m/s]",
    "E5": "Friction factor [-]", "F5": "Fittings ΣK [-]", "G5": "Velocity [ft/s]",
    "H5": "Loss [m]",
    "A9": "Total", "H9": "=SUM(H6:H8)",
}
for r, (seg, length, bore, f, k) in enumerate([("Tower basin to pump, DN150", 18, 154.1, 0.018,
                                                3.5),
                                               ("Pump to exchanger, DN125", 85, 128.2, 0.019, 8),
                                               ("Exchanger return to tower, DN150", 95, 154.1,
                                                0.018, 6)], start=6):
    PIPE[f"A{r}"], PIPE[f"B{r}"], PIPE[f"C{r}"] = seg, length, bore
    PIPE[f"E{r}"], PIPE[f"F{r}"] = f, k
    PIPE[f"D{r}"] = f"={_V}/3600/(PI()*(C{r}/1000)^2/4)"
    PIPE[f"G{r}"] = f"=D{r}*3.281"
    PIPE[f"H{r}"] = f"=(E{r}*B{r}/(C{r}/1000)+F{r})*D{r}^2/(2*9.81)"
PIPE["G7"] = "=D7/3.281"
PIPE_PLANTED = {"Piping!G7": ("unit-scale", "m/s to ft/s divided by 3.281: wrong way round")}

CWB = {
    "trade": "process utilities: cooling water loop flow, temperatures, pump head and power, "
             "NPSH, tower make-up",
    "sheets": [("Cooling", CWS), ("Piping", PIPE)],
    "planted": {**cw.planted, **PIPE_PLANTED},
}

BOOKS = {"kitchen-hood-bramblecote": HOODB, "gas-well-kestrel-draw": GASB,
         "spillway-harrowgill": DAMB, "cooling-water-calder-mere": CWB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()
