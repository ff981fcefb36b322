#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review49), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied; pattern after
corpus/sheets/review48/make_books.py.

Trades: a primary school's VRF heat-pump system; a quarry's secondary crushing and conveying
line; a water treatment works' alum and hypochlorite dosing with its chlorine contact tank; a
small office's condensing gas boiler, gas supply and flue. All scenarios, sites, firms, readings
and catalogue data are invented (demonstration only); the formulas and published factors are
the trade's own, with their sources named in a text cell at the top of each sheet ("from
memory" where recalled and not checked, "common practice" for a fact of the trade with no
single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and
its messages that mislead, are recorded in review_notes.py after running the frozen binary.

Run: python3 make_books.py [--expect]  ->  *.xlsx and *.expect in this folder
"""
import os
import sys

sys.dont_write_bytecode = True   # write nothing beside the shared modules
HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, os.path.dirname(HERE))
from item_sheet import ItemSheet, write_books_with_notes  # noqa: E402 (shared, not copied)

CAUTION = ("Invented scenario, data for demonstration only. A dimensionally consistent formula can "
           "still be wrong; this check does not replace independent review under local codes and "
           "licensed practice.")
ItemSheet.caution = CAUTION

# --------------------------------------------------------------------------------------------
# Book 1: school VRF heat pump (kW, W, Btu/h, MBH, TR, m, ft, mm, m³, kg, lb, kg/m³, %, °C,
# °F, K, W/W, Btu/(W·h), kWh, h, £)
# --------------------------------------------------------------------------------------------
VRF_SRC = (
    "Sources: NIST SP 811 (2008) App. B.8: 1 kW = 3412 Btu/h, 1 TR = 12 000 Btu/h = 3.517 kW, "
    "1 m = 3.281 ft, 1 kg = 2.205 lb; MBH = 1000 Btu/h (common practice); EER and COP as "
    "capacity over power input, W/W (EN 14511-1, from memory), EER in Btu/(W·h) = Btu/h over W "
    "(AHRI 1230, from memory); AHRI rating outdoor 95 °F in cooling (from memory); equivalent "
    "length = actual length + fittings' equivalent lengths, capacity corrections for pipe "
    "length and outdoor temperature and the additional charge per metre of liquid line from "
    "the maker's design manual (invented figures, typical of R410A: 0.12 kg/m at 12.7 mm, 0.059 "
    "at 9.52 mm, 0.022 at 6.35 mm, from memory); R410A practical limit 0.44 kg/m³, EN 378-1:2016 "
    "Annex C (from memory); Carnot COP of heating T_h/(T_h − T_c) in kelvins (thermodynamics "
    "texts, common practice); °F = 1.8·°C + 32; 0 °C = 273.15 K (SI Brochure 9th ed.). School, "
    "plant and readings invented.")
vr = ItemSheet("VRF", "Brackenfield Primary School (invented): Block B classrooms, VRF heat-pump "
               "system ODU-2", VRF_SRC)
vr.heading("Design conditions")
vr.add("tsC", "Outdoor summer design dry bulb", "t_s", 30, "°C")
vr.add("tsF", "Outdoor summer design dry bulb, °F", "t_s,F", "={tsC}*1.8+32", "°F")
vr.add("twC", "Outdoor winter design dry bulb", "t_w", -4, "°C")
vr.heading("Indoor units (Indoor sheet)")
vr.add("Qi", "Sum of indoor unit nominal cooling capacities", "Q_i", "=Indoor!D10", "kW")
vr.add("QiTR", "Sum of indoor unit capacities, TR", "Q_i,TR", "={Qi}/3.517", "TR")
vr.add("QiTR2", "Sum of indoor unit capacities, TR (US maker's selection form)", "Q_i,TR2",
       "={Qi}*3.517", "TR", planted=("unit-scale", "kW to TR multiplied by 3.517: wrong way round"))
vr.add("Qo", "Outdoor unit nominal cooling capacity (catalogue)", "Q_o", 45.0, "kW")
vr.add("QoMBH", "Outdoor unit nominal cooling capacity, MBH", "Q_o,MBH", "={Qo}*3.412", "MBH")
vr.add("CR", "Combination ratio, indoor over outdoor", "CR", "={Qi}/{Qo}*100", "%")
vr.add("Ql", "Design cooling load of the rooms (Indoor sheet)", "Q_l", "=Indoor!E10/1000", "kW")
vr.add("Ql2", "Design cooling load of the rooms (summary page)", "Q_l2", "=Indoor!E10", "kW",
       planted=("unit-scale", "W written as kW: /1000 missing"))
vr.heading("Refrigerant piping")
vr.add("L", "Actual pipe length, outdoor unit to farthest indoor unit", "L", 62, "m")
vr.add("nel", "Elbows on that run", "n_el", 14, "-")
vr.add("Left", "Equivalent length of one elbow (maker's US manual)", "L_el,ft", 1.6, "ft")
vr.add("Lelm", "Equivalent length of one elbow, m", "L_el", "={Left}/3.281", "m")
vr.add("nbr", "Branch joints on that run", "n_br", 4, "-")
vr.add("Lebr", "Equivalent length of one branch joint", "L_br", 0.5, "m")
vr.add("Leq", "Equivalent pipe length", "L_eq", "={L}+{nel}*{Lelm}+{nbr}*{Lebr}", "m")
vr.add("Leq2", "Equivalent pipe length (installer's check sheet)", "L_eq2",
       "={L}+{nel}*{Left}+{nbr}*{Lebr}", "m",
       planted=("unit-scale", "elbow equivalent length in ft added to m"))
vr.add("Leqft", "Equivalent pipe length, ft", "L_eq,ft", "={Leq}*3.281", "ft")
vr.heading("Capacity corrections (Corr sheet)")
vr.add("cfL", "Cooling correction for pipe length", "f_L", "=VLOOKUP({Leq},Corr!A5:C10,2)", "%")
vr.add("cfLh", "Heating correction for pipe length", "f_L,h", "=VLOOKUP({Leq},Corr!A5:C10,3)",
       "%")
vr.add("cfT", "Cooling correction for outdoor temperature", "f_T",
       "=VLOOKUP({tsC},Corr!E5:F10,2)", "%")
vr.add("cfTh", "Heating correction for outdoor temperature", "f_T,h",
       "=VLOOKUP({twC},Corr!H5:I10,2)", "%")
vr.add("Qc", "Corrected cooling capacity", "Q_c", "={Qo}*{cfT}/100*{cfL}/100", "kW")
vr.add("Qc2", "Corrected cooling capacity (first draft)", "Q_c2", "={Qo}*{cfT}/100*{cfL}", "kW",
       planted=("unit-scale", "length correction in % used as a fraction: 100 too large"))
vr.add("QcBtu", "Corrected cooling capacity, Btu/h", "Q_c,Btu", "={Qc}*3412", "Btu/h")
vr.add("QcTR", "Corrected cooling capacity, TR", "Q_c,TR", "={QcBtu}/12000", "TR")
vr.add("marg", "Capacity margin over the design load", "m_c", "=({Qc}-{Ql})/{Ql}*100", "%")
vr.add("Qh", "Outdoor unit nominal heating capacity (catalogue)", "Q_h", 50.0, "kW")
vr.add("Qhc", "Corrected heating capacity at winter design", "Q_h,c",
       "={Qh}*{cfTh}/100*{cfLh}/100", "kW")
vr.heading("Power input and efficiency")
vr.add("Pc", "Rated cooling power input (catalogue)", "P_c", 12.6, "kW")
vr.add("EER", "EER at rating", "EER", "={Qo}/{Pc}", "W/W")
vr.add("EERus", "EER at rating, Btu/(W·h)", "EER_US", "={Qo}*3412/({Pc}*1000)", "Btu/(W·h)")
vr.add("EERus2", "EER at rating, Btu/(W·h) (tender return)", "EER_US2", "={EER}*3412",
       "Btu/(W·h)", planted=("unit-scale", "Btu/h per kW taken for Btu/h per W: 1000 too large"))
vr.add("Ph", "Rated heating power input (catalogue)", "P_h", 11.6, "kW")
vr.add("Phd", "Heating power input at winter design (maker's table)", "P_h,d", 12.9, "kW")
vr.add("COPd", "COP at winter design", "COP_d", "={Qhc}/{Phd}", "W/W")
vr.add("tcd", "Condensing temperature, heating", "t_cd", 45, "°C")
vr.add("tev", "Evaporating temperature at winter design", "t_ev", -10, "°C")
vr.add("TcK", "Condensing temperature, K", "T_cd", "={tcd}+273.15", "K")
vr.add("TeK", "Evaporating temperature, K", "T_ev", "={tev}+273.15", "K")
vr.add("TeK2", "Evaporating temperature, K (commissioning sheet)", "T_ev2", "={tev}", "K",
       planted=("offset-scale", "a °C reading set equal to K"))
vr.add("COPc", "Carnot COP of heating", "COP_C", "={TcK}/({TcK}-{TeK})", "-")
vr.add("COPc2", "Carnot COP of heating (first draft)", "COP_C2", "={tcd}/({tcd}-{tev})", "-",
       planted=("offset-scale", "°C readings in a ratio: kelvins belong"))
vr.add("pfan", "Indoor unit fan power, each (catalogue)", "p_f", 45, "W")
vr.add("nidu", "Indoor units on ODU-2 (Indoor sheet)", "n_i", "=Indoor!B10", "-")
vr.add("Ptot", "Electrical input at cooling rating with the indoor fans", "P_tot",
       "={Pc}+{nidu}*{pfan}/1000", "kW")
vr.add("Ptot2", "Electrical input with the indoor fans (electrical schedule)", "P_tot2",
       "={Pc}+{nidu}*{pfan}", "kW", planted=("unit-scale", "fan W added to kW"))
vr.heading("Refrigerant charge and room concentration")
vr.add("madd", "Additional charge for the liquid lines (Pipe sheet)", "m_add", "=Pipe!E8", "kg")
vr.add("mfac", "Factory charge of the outdoor unit", "m_fac", 11.8, "kg")
vr.add("mref", "System refrigerant charge", "m_ref", "={madd}+{mfac}", "kg")
vr.add("Ar", "Floor area of the smallest room served (IT store)", "A_r", 9.5, "m²")
vr.add("hr", "Ceiling height of that room (drawings)", "h_r", 2700, "mm")
vr.add("Vr", "Volume of that room", "V_r", "={Ar}*{hr}/1000", "m³")
vr.add("Vr2", "Volume of that room (refrigerant check, first draft)", "V_r2", "={Ar}*{hr}", "m³",
       planted=("unit-scale", "mm height times m² without /1000: 1000 too large"))
vr.add("conc", "Refrigerant concentration if the whole charge leaks there", "c",
       "={mref}/{Vr}", "kg/m³")
vr.add("PL", "Practical limit, R410A", "PL", 0.44, "kg/m³")
vr.add("rPL", "Concentration over the practical limit (over 100 %: detection needed)", "r_PL",
       "={conc}/{PL}*100", "%")
VRFS = vr.finish()

INDOOR = {
    "A1": "ODU-2 indoor unit schedule and room cooling loads (invented)",
    "A2": "Sources: room loads from the invented load calculation; capacities from the maker's "
          "catalogue (invented).",
    "A3": CAUTION,
    "A4": "Rooms", "B4": "Indoor units [-]", "C4": "Capacity each [kW]", "D4": "Capacity [kW]",
    "E4": "Room cooling load [W]",
    "A10": "Total", "B10": "=SUM(B5:B9)", "D10": "=SUM(D5:D9)", "E10": "=SUM(E5:E9)",
}
for r, (room, n, cap, load) in enumerate([
        ("Classes 1 to 4", 4, 7.1, 25400), ("Classes 5 and 6", 2, 5.6, 9900),
        ("Staff room", 1, 3.6, 3100), ("Office", 1, 2.8, 2300), ("IT store", 1, 2.2, 1900)],
        start=5):
    INDOOR[f"A{r}"], INDOOR[f"B{r}"], INDOOR[f"C{r}"], INDOOR[f"E{r}"] = room, n, cap, load
    INDOOR[f"D{r}"] = f"=B{r}*C{r}"

PIPE = {
    "A1": "ODU-2 liquid lines and additional refrigerant charge (invented lengths)",
    "A2": "Sources: charge per metre of liquid line from the maker's design manual (invented, "
          "typical R410A figures from memory).",
    "A3": CAUTION,
    "A4": "Liquid line", "B4": "Outside diameter [mm]", "C4": "Length [m]",
    "D4": "Charge per metre [kg/m]", "E4": "Additional charge [kg]",
    "A8": "Total", "E8": "=SUM(E5:E7)",
}
for r, (seg, od, ln, kgm) in enumerate([("Main to first branch", 12.7, 38, 0.12),
                                        ("Branches", 9.52, 95, 0.059),
                                        ("Tails to indoor units", 6.35, 40, 0.022)], start=5):
    PIPE[f"A{r}"], PIPE[f"B{r}"], PIPE[f"C{r}"], PIPE[f"D{r}"] = seg, od, ln, kgm
    PIPE[f"E{r}"] = f"=C{r}*D{r}"

CORR = {
    "A1": "Capacity correction factors (invented maker's tables, R410A VRF)",
    "A2": "Sources: maker's design manual (invented values of the usual shape).",
    "A3": CAUTION,
    "A4": "Equivalent length [m]", "B4": "Cooling [%]", "C4": "Heating [%]",
    "E4": "Outdoor dry bulb, cooling [°C]", "F4": "Cooling [%]",
    "H4": "Outdoor dry bulb, heating [°C]", "I4": "Heating [%]",
}
for r, (le, c, h) in enumerate([(0, 100, 100), (30, 97, 99), (50, 94, 98), (70, 91, 97),
                                (90, 88, 96), (120, 84, 95)], start=5):
    CORR[f"A{r}"], CORR[f"B{r}"], CORR[f"C{r}"] = le, c, h
for r, (t, c) in enumerate([(20, 110), (25, 107), (30, 104), (35, 100), (40, 95), (43, 90)],
                           start=5):
    CORR[f"E{r}"], CORR[f"F{r}"] = t, c
for r, (t, h) in enumerate([(-15, 68), (-10, 75), (-5, 83), (0, 91), (5, 98), (7, 100)],
                           start=5):
    CORR[f"H{r}"], CORR[f"I{r}"] = t, h

VRFB = {
    "trade": "building services: school VRF heat-pump system, capacities, piping and charge",
    "sheets": [("VRF", VRFS), ("Indoor", INDOOR), ("Pipe", PIPE), ("Corr", CORR)],
    "planted": vr.planted,
}

# --------------------------------------------------------------------------------------------
# Book 2: quarry crushing and conveying (t/h, ton/h, t, ton, h/d, d, %, kWh/t, µm, kW, hp, m,
# ft, m/s, fpm, kg/m, lb/ft, N, kN, lbf, mm, rpm, °, m³, t/m³)
# --------------------------------------------------------------------------------------------
QRY_SRC = (
    "Sources: belt load q_G = Q/(3.6·v) in kg/m from t/h and m/s (common practice); lift force "
    "F_St = q_G·g·H and lift power Q/3.6·g·H (common practice); main resistances F_H = "
    "C·f·L·g·(q_RO + q_RU + 2·q_B + q_G), cos δ taken as 1, f about 0.020–0.025, C about 1.55 "
    "at 165 m (ISO 5048:1989 / DIN 22101, from memory); drive power P = F_U·v (common "
    "practice); Bond's third theory W = 10·W_i·(1/√P80 − 1/√F80), P80 and F80 in µm, W_i in "
    "kWh/t (Wills' Mineral Processing Technology, 8th ed., from memory); bulk density of "
    "crushed gritstone about 1.6 t/m³ and angle of repose 37° (common practice); cone volume "
    "π/3·r²·h; drum speed n = 60·v/(π·D) (common practice); NIST SP 811 (2008) App. B.8: 1 t "
    "= 1.1023 short ton, 1 m = 3.281 ft, 1 m/s = 196.85 ft/min, 1 kg/m = 0.672 lb/ft, 1 kW = "
    "1.341 hp, 1 N = 0.2248 lbf; g_n = 9.81 m/s² (SI Brochure 9th ed., 9.80665). Quarry, plant "
    "and readings invented.")
qy = ItemSheet("Line", "Harrowgill Quarry (invented): gritstone secondary crushing and C4 "
               "stockpile conveyor", QRY_SRC)
qy.heading("Production")
qy.add("Q", "Design throughput to the secondary crusher", "Q", 350, "t/h")
qy.add("Qst", "Design throughput, short tons per hour (US-built crusher)", "Q_st",
       "={Q}*1.1023", "ton/h")
qy.add("Qst2", "Design throughput, short tons per hour (dealer's quote)", "Q_st2",
       "={Q}/1.1023", "ton/h", planted=("unit-scale", "t to short ton divided by 1.1023: wrong "
                                                      "way round"))
qy.add("hd", "Running hours a day", "h_d", 10, "h/d")
qy.add("dy", "Working days a year", "d_y", 240, "d")
qy.add("av", "Availability of the line", "A", 88, "%")
qy.add("Y", "Annual output", "Y", "={Q}*{hd}*{dy}*{av}/100", "t")
qy.add("Y2", "Annual output (business plan)", "Y_2", "={Q}*{hd}*{dy}*{av}", "t",
       planted=("unit-scale", "availability in % used as a fraction: 100 too large"))
qy.add("Yst", "Annual output, short tons", "Y_st", "={Y}*1.1023", "ton")
qy.heading("Secondary cone crusher (Bond)")
qy.add("Wi", "Bond work index of the gritstone (lab test)", "W_i", 16, "kWh/t")
qy.add("F80", "Feed, 80 % passing", "F_80", 150000, "µm")
qy.add("P80", "Product, 80 % passing", "P_80", 40000, "µm")
qy.add("Ec", "Specific comminution energy", "W", "=10*{Wi}*(1/SQRT({P80})-1/SQRT({F80}))",
       "kWh/t")
qy.add("Pcr", "Crusher power draw", "P_cr", "={Ec}*{Q}", "kW")
qy.add("Pcm", "Crusher motor (installed)", "P_cm", 160, "kW")
qy.add("lcr", "Crusher motor loading", "l_cr", "={Pcr}/{Pcm}*100", "%")
qy.heading("Conveyor C4, crusher to stockpile")
qy.add("L", "Centre-to-centre length", "L", 165, "m")
qy.add("H", "Lift", "H", 21.5, "m")
qy.add("Hft", "Lift, ft", "H_ft", "={H}*3.281", "ft")
qy.add("v", "Belt speed", "v", 2.5, "m/s")
qy.add("vfpm", "Belt speed, fpm", "v_fpm", "={v}*196.85", "fpm")
qy.add("vfpm2", "Belt speed, fpm (belt supplier's form)", "v_fpm2", "={v}*3.281", "fpm",
       planted=("unit-scale", "m/s to ft/s, written as fpm: 60 too small"))
qy.add("qG", "Load on the belt per metre", "q_G", "={Q}/(3.6*{v})", "kg/m")
qy.add("qG2", "Load on the belt per metre (first draft)", "q_G2", "={Q}/{v}", "kg/m",
       planted=("unit-scale", "t/h over m/s without the 3.6: 3.6 too large"))
qy.add("qGlb", "Load on the belt, lb/ft", "q_G,lb", "={qG}*0.672", "lb/ft")
qy.add("qB", "Belt mass per metre", "q_B", 16, "kg/m")
qy.add("qRO", "Rotating mass of the carrying idlers per metre", "q_RO", 12, "kg/m")
qy.add("qRU", "Rotating mass of the return idlers per metre", "q_RU", 4, "kg/m")
qy.add("f", "Artificial friction factor", "f", 0.022, "-")
qy.add("C", "Length coefficient for secondary resistances", "C", 1.55, "-")
qy.add("FH", "Main and secondary resistances", "F_H",
       "={C}*{f}*{L}*9.81*({qRO}+{qRU}+2*{qB}+{qG})", "N")
qy.add("FSt", "Lift resistance", "F_St", "={qG}*9.81*{H}", "N")
qy.add("FSt2", "Lift resistance (first draft)", "F_St2", "={qG}*{H}", "N",
       planted=("dimension", "load times lift without g: kg, not N"))
qy.add("FU", "Effective tension at the drive drum", "F_U", "={FH}+{FSt}", "N")
qy.add("FUlbf", "Effective tension, lbf", "F_U,lbf", "={FU}*0.2248", "lbf")
qy.add("PA", "Power at the drive drum", "P_A", "={FU}*{v}/1000", "kW")
qy.add("PA2", "Power at the drive drum (motor list)", "P_A2", "={FU}*{v}/1000/1000", "kW",
       planted=("unit-scale", "W to kW divided by 1000 twice"))
qy.add("Pl", "Lift power alone, check", "P_l", "={Q}/3.6*9.81*{H}/1000", "kW")
qy.add("etd", "Drive efficiency (gearbox and couplings)", "eta_d", 94, "%")
qy.add("PM", "Motor shaft power required", "P_M", "={PA}/({etd}/100)", "kW")
qy.add("PM2", "Motor shaft power required (drive supplier's form)", "P_M2", "={PA}/{etd}", "kW",
       planted=("unit-scale", "efficiency in % used as a fraction: 100 too small"))
qy.add("PMhp", "Motor shaft power required, hp", "P_M,hp", "={PM}*1.341", "hp")
qy.add("PMhp2", "Motor shaft power required, hp (US gearbox enquiry)", "P_M,hp2",
       "={PM}*0.7457", "hp", planted=("unit-scale", "kW to hp multiplied by 0.7457: wrong way "
                                                    "round"))
qy.add("Pmi", "Motor installed", "P_mi", 45, "kW")
qy.add("lm", "Motor loading", "l_m", "={PM}/{Pmi}*100", "%")
qy.add("D", "Drive drum diameter over lagging", "D", 630, "mm")
qy.add("nd", "Drive drum speed", "n_d", "=60*{v}/(PI()*{D}/1000)", "rpm")
qy.add("nm", "Motor speed (4 pole)", "n_m", 1480, "rpm")
qy.add("ig", "Gearbox ratio required", "i", "={nm}/{nd}", "-")
qy.add("PlL", "Lift power of the whole line (Conveyors sheet)", "P_l,line", "=Conveyors!F9",
       "kW")
qy.heading("Stockpile")
qy.add("hs", "Stockpile height", "h_s", 14, "m")
qy.add("rep", "Angle of repose", "alpha", 37, "°")
qy.add("rs", "Stockpile base radius", "r_s", "={hs}/TAN(RADIANS({rep}))", "m")
qy.add("Vs", "Stockpile volume", "V_s", "=PI()/3*{rs}^2*{hs}", "m³")
qy.add("rb", "Bulk density of the crushed stone", "rho_b", 1.6, "t/m³")
qy.add("Ms", "Stockpile live mass", "M_s", "={Vs}*{rb}", "t")
qy.add("ds", "Days of production held", "d_s", "={Ms}/({Q}*{hd})", "d")
QRYS = qy.finish()

CONV = {
    "A1": "Harrowgill secondary line: conveyor loads and lift power (invented layout)",
    "A2": "Sources: as the Line sheet; q = Q/(3.6·v), lift power Q/3.6·g·H/1000 (common "
          "practice).",
    "A3": CAUTION,
    "A4": "Conveyor", "B4": "Rate [t/h]", "C4": "Speed [m/s]", "D4": "Lift [m]",
    "E4": "Load [kg/m]", "F4": "Lift power [kW]",
    "A9": "Total", "F9": "=SUM(F5:F8)",
}
for r, (name, q, v, h) in enumerate([("C1 primary to scalper", 350, 1.6, 3.5),
                                     ("C2 scalper to screen", 350, 2.0, 12.0),
                                     ("C3 crusher recirculation", 120, 1.8, 9.0),
                                     ("C4 crusher to stockpile", 350, 2.5, 21.5)], start=5):
    CONV[f"A{r}"], CONV[f"B{r}"], CONV[f"C{r}"], CONV[f"D{r}"] = name, q, v, h
    CONV[f"E{r}"] = f"=B{r}/(3.6*C{r})"
    CONV[f"F{r}"] = f"=B{r}/3.6*9.81*D{r}/1000"
CONV["F7"] = "=B7/3.6*D7/1000"
CONV_PLANTED = {"Conveyors!F7": ("dimension", "lift power without g")}

QRYB = {
    "trade": "quarrying: secondary crushing, belt conveyor drive and stockpile",
    "sheets": [("Line", QRYS), ("Conveyors", CONV)],
    "planted": {**qy.planted, **CONV_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 3: water treatment dosing (ML/d, m³/h, L/s, MGD, NTU, mg/L, kg/d, kg/h, lb/d, % w/w, %,
# kg/L, L/h, L/d, gph, m³, US gal, d, min, mg·min/L, °C, °F)
# --------------------------------------------------------------------------------------------
WTP_SRC = (
    "Sources: chemical feed kg/d = dose (mg/L) × flow (ML/d), and kg/h = mg/L × m³/h / 1000 "
    "(common practice); lb/d = mg/L × MGD × 8.34 (AWWA/ASCE Water Treatment Plant Design, 5th "
    "ed., common practice); liquid alum 48.5 % w/w as Al2(SO4)3·14H2O, about 1.33 kg/L (AWWA "
    "B403, from memory); alum consumes about 0.5 mg/L of alkalinity as CaCO3 per mg/L (from "
    "memory); sodium hypochlorite about 10.5 % w/w available chlorine at 1.20 kg/L (AWWA B300, "
    "from memory); CT = C·T10, T10 = baffle factor × V/Q, required CT for 3-log Giardia with "
    "free chlorine at pH 7.5 and C ≤ 1.0 mg/L by temperature (US EPA Surface Water Treatment "
    "Rule Guidance Manual 1991, App. E, approximate values from memory); NIST SP 811 (2008) "
    "App. B.8: 1 US gal = 3.785 L, 1 m³ = 264.2 US gal, 1 L = 0.2642 US gal, 1 kg = 2.205 lb; "
    "MGD = 10⁶ US gal/d = 3.785 ML/d; °F = 1.8·°C + 32. Works and readings invented.")
wt = ItemSheet("Dosing", "Kelderby Water Treatment Works (invented): stream 2 alum coagulation, "
               "hypochlorite dosing and chlorine contact", WTP_SRC)
wt.heading("Flow")
wt.add("Q", "Stream 2 design flow", "Q", 18, "ML/d")
wt.add("Qh", "Stream 2 design flow, m³/h", "Q_h", "={Q}*1000/24", "m³/h")
wt.add("Qh2", "Stream 2 design flow, m³/h (SCADA scaling sheet)", "Q_h2", "={Q}/24", "m³/h",
       planted=("unit-scale", "ML/d over 24 without the 1000 m³/ML: 1000 too small"))
wt.add("QLs", "Stream 2 design flow, L/s", "Q_s", "={Q}*1000000/86400", "L/s")
wt.add("QMGD", "Stream 2 design flow, MGD", "Q_MGD", "={Q}/3.785", "MGD")
wt.add("QMGD2", "Stream 2 design flow, MGD (US consultant's check)", "Q_MGD2", "={Q}*3.785",
       "MGD", planted=("unit-scale", "ML/d to MGD multiplied by 3.785: wrong way round"))
wt.add("tw", "Raw water temperature (winter design)", "t_w", 8, "°C")
wt.add("twF", "Raw water temperature, °F", "t_w,F", "={tw}*1.8+32", "°F")
wt.heading("Aluminium sulfate (liquid alum)")
wt.add("turb", "Raw water turbidity (winter design)", "T_u", 14, "NTU")
wt.add("da", "Alum dose as product (jar test curve, Jar sheet)", "d_a",
       "=VLOOKUP({turb},Jar!A5:B10,2)", "mg/L")
wt.add("Ma", "Alum feed as product", "M_a", "={da}*{Q}", "kg/d")
wt.add("Mah", "Alum feed as product, kg/h", "M_a,h", "={da}*{Qh}/1000", "kg/h")
wt.add("Mah2", "Alum feed as product, kg/h (dosing pump sizing)", "M_a,h2",
       "={da}*{Qh}/1000/1000", "kg/h", planted=("unit-scale", "g/h to kg/h divided by 1000 twice"))
wt.add("Malb", "Alum feed as product, lb/d", "M_a,lb", "={da}*{QMGD}*8.34", "lb/d")
wt.add("Malbc", "Alum feed as product, lb/d (from kg/d, check)", "M_a,lb,c", "={Ma}*2.205", "lb/d")
wt.add("sa", "Liquid alum strength", "s_a", 48.5, "% w/w")
wt.add("ra", "Liquid alum density", "rho_a", 1.33, "kg/L")
wt.add("Msol", "Liquid alum solution feed", "M_sol", "={Mah}/({sa}/100)", "kg/h")
wt.add("Msol2", "Liquid alum solution feed (first draft)", "M_sol2", "={Mah}/{sa}", "kg/h",
       planted=("unit-scale", "strength in % used as a fraction: 100 too small"))
wt.add("Vsol", "Liquid alum pump rate", "V_sol", "={Msol}/{ra}", "L/h")
wt.add("Vsol2", "Liquid alum pump rate (pump datasheet)", "V_sol2", "={Msol}*{ra}", "L/h",
       planted=("dimension", "kg/h multiplied by kg/L where divided belongs"))
wt.add("Vgph", "Liquid alum pump rate, gph", "V_sol,gph", "={Vsol}/3.785", "gph")
wt.add("pmax", "Alum metering pump maximum rate", "q_max", 60, "L/h")
wt.add("str", "Alum pump stroke setting", "s", "={Vsol}/{pmax}*100", "%")
wt.add("alk", "Alkalinity consumed, as CaCO3", "Δalk", "={da}*0.5", "mg/L")
wt.add("Vta", "Alum bulk tank volume", "V_ta", 20, "m³")
wt.add("dta", "Alum storage", "d_a", "={Vta}*1000/({Vsol}*24)", "d")
wt.heading("Sodium hypochlorite")
wt.add("dem", "Chlorine demand (bench test)", "D_cl", 1.4, "mg/L")
wt.add("res", "Free chlorine residual at the contact tank outlet", "C", 1.0, "mg/L")
wt.add("dc", "Chlorine dose", "d_c", "={dem}+{res}", "mg/L")
wt.add("Mc", "Chlorine feed, as Cl2", "M_c", "={dc}*{Q}", "kg/d")
wt.add("Mclb", "Chlorine feed, as Cl2, lb/d", "M_c,lb", "={dc}*{QMGD}*8.34", "lb/d")
wt.add("sh", "Hypochlorite strength, available chlorine", "s_h", 10.5, "%")
wt.add("rh", "Hypochlorite density", "rho_h", 1.20, "kg/L")
wt.add("Vh", "Hypochlorite use", "V_h", "={Mc}/({sh}/100)/{rh}", "L/d")
wt.add("Vhh", "Hypochlorite pump rate", "V_h,h", "={Vh}/24", "L/h")
wt.add("Vhh2", "Hypochlorite pump rate (pump schedule)", "V_h,h2", "={Vh}", "L/h",
       planted=("unit-scale", "L/d written as L/h: /24 missing"))
wt.add("Vhg", "Hypochlorite pump rate, gph", "V_h,gph", "={Vhh}*0.2642", "gph")
wt.add("Vhg2", "Hypochlorite pump rate, gph (US pump catalogue)", "V_h,gph2", "={Vhh}*3.785",
       "gph", planted=("unit-scale", "L to US gal multiplied by 3.785: wrong way round"))
wt.add("Vth", "Hypochlorite bulk tank volume", "V_th", 8, "m³")
wt.add("dth", "Hypochlorite storage", "d_h", "={Vth}*1000/{Vh}", "d")
wt.heading("Chlorine contact (Contact sheet)")
wt.add("Vct", "Contact tank volume, all passes", "V_ct", "=Contact!E8", "m³")
wt.add("BF", "Baffle factor T10/T (tracer test)", "BF", 0.7, "-")
wt.add("T10", "Contact time T10", "T_10", "={Vct}/{Qh}*{BF}*60", "min")
wt.add("T102", "Contact time T10 (first draft)", "T_10,2", "={Vct}/{Qh}*{BF}", "min",
       planted=("unit-scale", "m³ over m³/h gives h, written as min: 60 too small"))
wt.add("CT", "CT achieved", "CT", "={res}*{T10}", "mg·min/L")
wt.add("CTr", "CT required, 3-log Giardia (CTtable sheet)", "CT_req",
       "=VLOOKUP({tw},CTtable!A5:B10,2)", "mg·min/L")
wt.add("CTrat", "CT ratio", "CT_r", "={CT}/{CTr}", "-")
wt.add("logi", "Giardia log inactivation credited", "log_i", "=3*{CTrat}", "-")
WTPS = wt.finish()

JAR = {
    "A1": "Alum dose against raw turbidity (invented jar-test curve, winter)",
    "A2": "Sources: works jar tests (invented).",
    "A3": CAUTION,
    "A4": "Raw turbidity [NTU]", "B4": "Alum dose as product [mg/L]",
}
for r, (t, d) in enumerate([(0, 18), (5, 24), (10, 30), (20, 38), (50, 52), (100, 70)], start=5):
    JAR[f"A{r}"], JAR[f"B{r}"] = t, d

CONTACT = {
    "A1": "Chlorine contact tank: passes (invented dimensions from the record drawings)",
    "A2": "Sources: record drawings (invented); 1 m³ = 264.2 US gal (NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A4": "Pass", "B4": "Length [m]", "C4": "Width [m]", "D4": "Water depth [m]",
    "E4": "Volume [m³]", "F4": "Volume [US gal]",
    "A8": "Total", "E8": "=SUM(E5:E7)", "F8": "=SUM(F5:F7)",
}
for r, (p, ln, w, d) in enumerate([("Pass 1", 28, 8, 4.2), ("Pass 2", 28, 8, 4.2),
                                   ("Pass 3", 28, 8, 4.2)], start=5):
    CONTACT[f"A{r}"], CONTACT[f"B{r}"], CONTACT[f"C{r}"], CONTACT[f"D{r}"] = p, ln, w, d
    CONTACT[f"E{r}"] = f"=B{r}*C{r}*D{r}"
    CONTACT[f"F{r}"] = f"=E{r}*264.2"
CONTACT["F7"] = "=E7*3.785"
CONTACT_PLANTED = {"Contact!F7": ("unit-scale", "m³ to US gal times 3.785: the L-per-gal factor, "
                                                "not 264.2")}

CTTAB = {
    "A1": "CT for 3-log Giardia inactivation, free chlorine, pH 7.5, C ≤ 1.0 mg/L",
    "A2": "Sources: US EPA SWTR Guidance Manual (1991) App. E tables (approximate, from memory).",
    "A3": CAUTION,
    "A4": "Water temperature [°C]", "B4": "CT required [mg·min/L]",
}
for r, (t, ct) in enumerate([(0.5, 195), (5, 139), (10, 104), (15, 70), (20, 52), (25, 35)],
                            start=5):
    CTTAB[f"A{r}"], CTTAB[f"B{r}"] = t, ct

WTPB = {
    "trade": "water treatment: alum and hypochlorite dosing, chlorine contact CT",
    "sheets": [("Dosing", WTPS), ("Jar", JAR), ("Contact", CONTACT), ("CTtable", CTTAB)],
    "planted": {**wt.planted, **CONTACT_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 4: office heating boiler and gas (W, kW, MBH, Btu/h, %, MJ/m³, Btu/ft³, m³/h, cfh,
# mbar(g), mbar, in. w.c., °C, °F, K, m³/m³, kg/m³, kJ/(kg·K), mm, m/s, fpm, K·d, kWh, m³,
# therm, £, kg/s, L/s, gpm)
# --------------------------------------------------------------------------------------------
BLR_SRC = (
    "Sources: room heat losses to BS EN 12831-1:2017 (invented results); 15 % margin for "
    "pipework losses and pick-up (common practice); NIST SP 811 (2008) App. B.8: 1 kW = 3412 "
    "Btu/h = 3.412 MBH, 1 m³ = 35.31 ft³, 1 MJ/m³ = 26.84 Btu/ft³, 1 inH2O = 2.491 mbar (1 mbar "
    "= 0.4015 in. w.c.), 1 therm = 29.31 kWh, 1 m/s = 196.85 ft/min, 1 L/s = 15.85 gpm; gas "
    "flow m³/h = kW × 3.6 / CV (MJ/m³) (common practice); natural gas gross CV about 39.2 "
    "MJ/m³ (UK typical, from memory); 21 mbar at the meter outlet and at most 1 mbar drop to "
    "the appliance (BS 6891 / IGE/UP/2, from memory); volume to standard conditions by "
    "absolute pressure and temperature, 1013.25 mbar and 288.15 K (ISO 13443, from memory); "
    "flue gas of methane V = V_gas·(1 + λ·9.52) m³/m³ (combustion stoichiometry, common "
    "practice), density about 1.24 kg/m³ and c_p about 1.08 kJ/(kg·K) (from memory); degree-"
    "day energy E = Q·24·HDD/ΔT/η (CIBSE TM41, from memory); water c_p 4.19 kJ/(kg·K), 977.8 "
    "kg/m³ at 70 °C (steam tables, from memory); °F = 1.8·°C + 32. Offices and readings "
    "invented.")
bo = ItemSheet("Boiler", "Thornbury House offices (invented): condensing gas boiler, gas supply "
               "and flue", BLR_SRC)
bo.heading("Heat load (Loads sheet)")
bo.add("Qr", "Sum of room heat losses", "Q_r", "=Loads!C12/1000", "kW")
bo.add("Qr2", "Sum of room heat losses (boiler enquiry)", "Q_r2", "=Loads!C12", "kW",
       planted=("unit-scale", "W written as kW: /1000 missing"))
bo.add("mg", "Margin for pipework losses and pick-up", "m", 15, "%")
bo.add("Qd", "Boiler duty required", "Q_d", "={Qr}*(1+{mg}/100)", "kW")
bo.heading("Boiler")
bo.add("Qb", "Boiler output selected (catalogue, 80/60 °C)", "Q_b", 40, "kW")
bo.add("QbMBH", "Boiler output, MBH", "Q_b,MBH", "={Qb}*3.412", "MBH")
bo.add("QbMBH2", "Boiler output, MBH (US distributor's sheet)", "Q_b,MBH2", "={Qb}*3412", "MBH",
       planted=("unit-scale", "Btu/h written as MBH: 1000 too large"))
bo.add("eff", "Boiler efficiency at full load, gross", "eta", 89, "%")
bo.add("Qin", "Boiler gas input", "Q_in", "={Qb}/({eff}/100)", "kW")
bo.add("QinBtu", "Boiler gas input, Btu/h", "Q_in,Btu", "={Qin}*3412", "Btu/h")
bo.heading("Gas supply")
bo.add("CV", "Gross calorific value of the gas", "CV", 39.2, "MJ/m³")
bo.add("Vg", "Gas rate at standard conditions", "V_g", "={Qin}*3.6/{CV}", "m³/h")
bo.add("Vg2", "Gas rate (gas supplier's application)", "V_g2", "={Qin}/{CV}", "m³/h",
       planted=("unit-scale", "kW over MJ/m³ without the 3.6: m³ per ks written as m³/h"))
bo.add("HV", "Gross heating value, Btu/ft³", "HV", "={CV}*26.84", "Btu/ft³")
bo.add("HV2", "Gross heating value, Btu/ft³ (US boiler manual check)", "HV2", "={CV}*947.8",
       "Btu/ft³", planted=("unit-scale", "MJ to Btu only: Btu/m³ written as Btu/ft³"))
bo.add("Vcfh", "Gas rate, cfh", "V_cfh", "={Vg}*35.31", "cfh")
bo.add("Vcfhc", "Gas rate, cfh (from Btu/h, check)", "V_cfh,c", "={QinBtu}/{HV}", "cfh")
bo.add("Vmx", "Gas meter maximum (U6)", "V_max", 6, "m³/h")
bo.add("lmet", "Meter loading", "l_m", "={Vg}/{Vmx}*100", "%")
bo.add("pm", "Meter outlet pressure", "p_m", 21, "mbar(g)")
bo.add("dpa", "Allowed drop, meter to appliance", "Δp", 1, "mbar")
bo.add("pa", "Pressure at the appliance inlet", "p_a", "={pm}-{dpa}", "mbar(g)")
bo.add("pain", "Pressure at the appliance inlet, in. w.c.", "p_a,in", "={pa}*0.4015",
       "in. w.c.")
bo.add("pain2", "Pressure at the appliance inlet, in. w.c. (US manual check)", "p_a,in2",
       "={pa}*2.491", "in. w.c.",
       planted=("unit-scale", "mbar to in. w.c. multiplied by 2.491: wrong way round"))
bo.add("pb", "Site barometric pressure", "p_b", 1013, "mbar")
bo.add("pab", "Meter outlet pressure, absolute", "p_m,abs", "={pm}+{pb}", "mbar")
bo.add("tg", "Gas temperature at the meter", "t_g", 10, "°C")
bo.add("Fc", "Correction factor, metered to standard volume", "F_c",
       "=({pab}/1013.25)*(288.15/({tg}+273.15))", "-")
bo.add("Fc2", "Correction factor, metered to standard volume (first draft)", "F_c2",
       "=({pm}/1013.25)*(288.15/({tg}+273.15))", "-",
       planted=("offset-scale", "gauge pressure in a gas-law ratio: absolute belongs"))
bo.add("Vm", "Gas rate at the meter (metered volume)", "V_m", "={Vg}/{Fc}", "m³/h")
bo.add("Di", "Supply pipe bore (28 mm copper)", "D_i", 26.2, "mm")
bo.add("vel", "Gas velocity in the supply pipe", "v", "={Vm}/3600/(PI()/4*({Di}/1000)^2)", "m/s")
bo.add("vel2", "Gas velocity in the supply pipe (first draft)", "v_2",
       "={Vm}/3600/(PI()/4*{Di}^2)", "m/s",
       planted=("unit-scale", "bore in mm squared without /1000: 10⁶ too small"))
bo.add("velf", "Gas velocity, fpm", "v_fpm", "={vel}*196.85", "fpm")
bo.heading("Flue")
bo.add("tf", "Flue gas temperature at full load", "t_f", 58, "°C")
bo.add("tfF", "Flue gas temperature, °F", "t_f,F", "={tf}*1.8+32", "°F")
bo.add("tai", "Combustion air temperature (plant room)", "t_a", 18, "°C")
bo.add("lam", "Excess air ratio λ", "lambda", 1.25, "-")
bo.add("Ast", "Stoichiometric air of methane", "A_st", 9.52, "m³/m³")
bo.add("Vfl", "Flue gas volume flow, standard", "V_fl", "={Vg}*(1+{lam}*{Ast})", "m³/h")
bo.add("rfl", "Flue gas density, standard", "rho_fl", 1.24, "kg/m³")
bo.add("cfl", "Flue gas specific heat", "c_fl", 1.08, "kJ/(kg·K)")
bo.add("Qfl", "Sensible heat lost up the flue", "Q_fl", "={Vfl}*{rfl}*{cfl}*({tf}-{tai})/3600",
       "kW")
bo.add("Qfl2", "Sensible heat lost up the flue (first draft)", "Q_fl2",
       "={Vfl}*{rfl}*{cfl}*{tf}/3600", "kW",
       planted=("offset-scale", "a °C reading in a product: the rise over the air belongs"))
bo.add("lfl", "Flue loss share of input", "l_fl", "={Qfl}/{Qin}*100", "%")
bo.heading("Annual gas")
bo.add("HDD", "Heating degree days (base 15.5 °C, invented site)", "HDD", 2100, "K·d")
bo.add("ti", "Inside design temperature", "t_i", 21, "°C")
bo.add("to", "Outside design temperature", "t_o", -2, "°C")
bo.add("effs", "Seasonal efficiency", "eta_s", 86, "%")
bo.add("Eh", "Annual heat to the boiler (gas input)", "E_h",
       "={Qr}*24*{HDD}/({ti}-{to})/({effs}/100)", "kWh")
bo.add("Eh2", "Annual heat to the boiler (energy budget)", "E_h2",
       "={Qr}*{HDD}/({ti}-{to})/({effs}/100)", "kWh",
       planted=("unit-scale", "degree days without the 24 h/d: 24 too small"))
bo.add("Vy", "Annual gas volume", "V_y", "={Eh}*3.6/{CV}", "m³")
bo.add("thy", "Annual gas, therms", "E_th", "={Eh}/29.31", "therm")
bo.add("gp", "Gas price (invented contract)", "c_g", 0.065, "£/kWh")
bo.add("cost", "Annual gas cost", "C", "={Eh}*{gp}", "£")
bo.heading("Heating water")
bo.add("dTw", "Flow-return temperature difference", "ΔT_w", 20, "K")
bo.add("cpw", "Specific heat of water", "c_p", 4.19, "kJ/(kg·K)")
bo.add("rw", "Density of water at 70 °C", "rho_w", 977.8, "kg/m³")
bo.add("mw", "Heating water mass flow", "m_w", "={Qb}/({cpw}*{dTw})", "kg/s")
bo.add("qw", "Heating water flow, L/s", "q_w", "={mw}/{rw}*1000", "L/s")
bo.add("qwg", "Heating water flow, gpm", "q_w,gpm", "={qw}*15.85", "gpm")
BLRS = bo.finish()

LOADS = {
    "A1": "Thornbury House: room heat losses at −2 °C outside (invented BS EN 12831 results)",
    "A2": "Sources: invented heat loss calculation; Btu/h = W × 3.412 (NIST SP 811 (2008) App. "
          "B.8).",
    "A3": CAUTION,
    "A4": "Room", "B4": "Design inside temperature [°C]", "C4": "Heat loss [W]",
    "D4": "Heat loss [Btu/h]",
    "A12": "Total", "C12": "=SUM(C5:C11)",
}
for r, (room, t, w) in enumerate([("Ground floor open office", 21, 6800),
                                  ("First floor open office", 21, 7200),
                                  ("Meeting room", 21, 2900), ("Reception", 21, 3400),
                                  ("Kitchen", 18, 1500), ("WCs and stairs", 18, 2300),
                                  ("Second floor offices", 21, 8100)], start=5):
    LOADS[f"A{r}"], LOADS[f"B{r}"], LOADS[f"C{r}"] = room, t, w
    LOADS[f"D{r}"] = f"=C{r}*3.412"
LOADS["D9"] = "=C9/3.412"
LOADS_PLANTED = {"Loads!D9": ("unit-scale", "W to Btu/h divided by 3.412: wrong way round")}

BLRB = {
    "trade": "building services: office condensing boiler, gas supply, flue and annual gas",
    "sheets": [("Boiler", BLRS), ("Loads", LOADS)],
    "planted": {**bo.planted, **LOADS_PLANTED},
}

BOOKS = {"school-vrf-heatpump": VRFB, "quarry-secondary-line": QRYB,
         "wtw-alum-hypo-dosing": WTPB, "office-boiler-gas": BLRB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()
