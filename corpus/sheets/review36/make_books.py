#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review36), written with the
standard library only (corpus/sheets/xlsx_writer.py and item_sheet.py, shared by the review
books), adapted from corpus/sheets/review19/make_books.py.

Trades: a quarry's haul and load-out cost sheet; a belt conveyor drive sheet; a boiler house
water heat balance; a railway drainage and gradient sheet. All scenarios, sites, readings and
catalogue data are invented (demonstration only); the formulas and published factors are the
trade's own, with their sources named in a text cell at the top of each sheet.

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. The findings plumb makes beyond the planted ones, and the planted cells it
misses, are recorded with their reasons in review_notes.py (EXTRA, MISSED, RENAMED) after
running the binary of the day.

Run: python3 make_books.py  ->  *.xlsx, *.cells.plumb, *.expect (where absent; --expect rewrites
them) in this folder
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
# Book 1: quarry haul and load-out cost sheet (t/h and short tons, km and mi, $/t, $/h, $/km,
# L/h and gal/h)
# --------------------------------------------------------------------------------------------
QUARRY_SRC = (
    "Sources: truck cycle time = load + travel loaded + travel empty + dump + spot, travel time "
    "= distance / average speed from the maker's rimpull-speed chart, loader passes = payload / "
    "bucket payload rounded up, job efficiency of a 50-minute hour, Caterpillar Performance "
    "Handbook 48th ed. (2018), 'Mining and earthmoving' section (from memory); cost per tonne = "
    "owning and operating cost per hour / productivity per hour: common practice; fleet size "
    "rounded up to whole trucks: common practice. NIST SP 811 (2008) App. B.8: 1 short ton = "
    "2000 lb = 0.9072 t (so 1.1023 short ton per tonne), 1 mi = 1.609 km, 1 US gal = 3.785 L. "
    "Money is in US dollars throughout. Fleet rates, fuel burn, prices and haul profile are "
    "invented (demonstration only).")
inp = ItemSheet("Inputs", "Brackenhow Quarry: pit-to-load-out haul, productivity and cost "
                "(invented scenario)", QUARRY_SRC)
inp.add("out", "Load-out rate (sales plan)", "Q", 650, "t/h")
inp.add("outst", "Load-out rate, short tons (US customer)", "Q_st", "={out}*1.1023", "ton/h")
inp.add("hday", "Operating hours per day", "h_d", 20, "h/d")
inp.add("days", "Operating days per year", "d_y", 240, "d/yr")
inp.add("hyr", "Scheduled hours per year", "H", "={hday}*{days}", "h/yr")
inp.add("util", "Utilisation (availability × use of availability)", "U", 82, "%")
inp.add("Ayr", "Annual tonnage hauled", "M_yr", "={out}*{hyr}*{util}/100", "t/yr")
inp.add("Ayrst", "Annual tonnage, short tons (US customer report)", "M_yr,st", "={Ayr}/1.1023",
        "ton/yr", planted=("unit-scale", "t to short tons divided by 1.1023: wrong way round"))
inp.add("truck", "Haul truck class", "class", "60 t rigid")
inp.add("pay", "Rated payload", "m_p", "=VLOOKUP({truck},Fleet!A5:D7,2,FALSE)", "t")
inp.add("fill", "Payload achieved (fill factor)", "k_f", 92, "%")
inp.add("payact", "Average payload carried", "m_a", "={pay}*{fill}/100", "t")
inp.add("own", "Truck owning and operating cost, excluding fuel", "c_o",
        "=VLOOKUP({truck},Fleet!A5:D7,3,FALSE)", "$/h")
inp.add("fuel", "Truck fuel burn (medium duty)", "F", "=VLOOKUP({truck},Fleet!A5:D7,4,FALSE)",
        "L/h")
inp.add("fuelg", "Truck fuel burn, US gal/h", "F_gal", "={fuel}/3.785", "gal/h")
inp.add("price", "Diesel price, delivered", "p_f", 1.38, "$/L")
inp.add("priceg", "Diesel price per US gallon (US fleet comparison)", "p_f,gal", "={price}*3.785",
        "$/gal")
inp.add("fuelc", "Truck fuel cost", "c_f", "={fuel}*{price}", "$/h")
inp.add("truckc", "Truck cost per operating hour", "c_t", "={own}+{fuelc}", "$/h")
inp.add("lbkt", "Loader bucket payload", "m_b", 11.5, "t")
inp.add("lcyc", "Loader cycle time", "t_lc", 0.55, "min")
inp.add("lcost", "Loader owning and operating cost, including fuel", "c_l", 240, "$/h")
inp.add("tyre", "Tyre and haul-road wear per truck-km travelled", "c_km", 0.95, "$/km")
inp.add("contract", "Contract haul quote (US contractor)", "c_c", 0.32, "$/ton·mi")
inp.add("eff", "Job efficiency (50-minute hour)", "E", "=50/60", "-")
INPUTS = inp.finish()

HAUL = {
    "A1": "Brackenhow Quarry: haul profile, face to load-out (invented survey and speeds)",
    "A2": ("Sources: travel time = distance / average speed × 60 min/h; speeds read from the "
           "maker's rimpull-speed-gradeability chart for total resistance = grade + rolling "
           "resistance (Caterpillar Performance Handbook 48th ed. (2018), from memory); 1 mi = "
           "1.609 km (NIST SP 811 (2008) App. B.8)."),
    "A3": CAUTION,
    "A4": "Segment", "B4": "Distance [km]", "C4": "Distance [mi]", "D4": "Grade [%]",
    "E4": "Speed loaded [km/h]", "F4": "Speed empty [km/h]", "G4": "Time loaded [min]",
    "H4": "Time empty [min]",
    "A10": "Total / length-weighted grade",
    "B10": "=SUM(B5:B9)", "C10": "=SUM(C5:C9)", "D10": "=SUMPRODUCT(B5:B9,D5:D9)/B10",
    "G10": "=SUM(G5:G9)", "H10": "=SUM(H5:H9)",
}
for r, (seg, km, gr, vl, ve) in enumerate([("Face to ramp foot", 0.45, 2, 18, 25),
                                           ("Main ramp", 1.20, 8, 11, 30),
                                           ("Plateau haul road", 2.10, 1, 38, 45),
                                           ("Stockpile approach", 0.35, 0, 20, 25),
                                           ("Load-out pad", 0.15, 0, 12, 15)], start=5):
    HAUL[f"A{r}"], HAUL[f"B{r}"], HAUL[f"D{r}"] = seg, km, gr
    HAUL[f"C{r}"] = f"=B{r}/1.609"
    HAUL[f"E{r}"], HAUL[f"F{r}"] = vl, ve
    HAUL[f"G{r}"] = f"=B{r}/E{r}*60"
    HAUL[f"H{r}"] = f"=B{r}/F{r}*60"
HAUL["C7"] = "=B7*1.609"          # planted: km to mi multiplied by 1.609
HAUL["G8"] = "=B8/E8"             # planted: hours written in the min column

cst = ItemSheet("Costs", "Brackenhow Quarry: truck cycle, fleet and cost per tonne",
                "Sources: as the Inputs sheet (Caterpillar Performance Handbook 48th ed. (2018), "
                "from memory; cost per tonne = $/h ÷ t/h, common practice; 1.1023 short ton per "
                "tonne and 1 US gal = 3.785 L, NIST SP 811 (2008) App. B.8).")
cst.add("passes", "Loader passes per truck", "n_p", "=ROUNDUP({Inputs.pay}/{Inputs.lbkt},0)",
        "-")
cst.add("tload", "Loading time", "t_l", "={passes}*{Inputs.lcyc}", "min")
cst.add("tdump", "Dump time", "t_d", 1.1, "min")
cst.add("tspot", "Spot and manoeuvre time", "t_s", 0.9, "min")
cst.add("thaul", "Travel time loaded", "t_h", "=Haul!G10", "min")
cst.add("tret", "Travel time empty", "t_r", "=Haul!H10", "min")
cst.add("tcyc", "Truck cycle time", "t_c", "={tload}+{thaul}+{tret}+{tdump}+{tspot}", "min")
cst.add("trips", "Trips per truck per hour", "n_t", "=60/{tcyc}*{Inputs.eff}", "trips/h")
cst.add("prodt", "Productivity per truck", "P_t", "={trips}*{Inputs.payact}", "t/h")
cst.add("ntr", "Trucks required", "N", "=ROUNDUP({Inputs.out}/{prodt},0)", "-")
cst.add("ntr2", "Trucks required (from the US customer's rate)", "N_2",
        "=ROUNDUP({Inputs.outst}/{prodt},0)", "-",
        planted=("unit-scale", "short tons per hour over tonnes per hour: ratio 1.1023 too "
                 "large"))
cst.add("fleet", "Fleet productivity", "P_f", "={ntr}*{prodt}", "t/h")
cst.add("fleetchk", "Fleet check", "check", "=IF({fleet}>={Inputs.out},\"OK\",\"SHORT\")")
cst.add("haulc", "Haul cost per tonne", "c_h", "={Inputs.truckc}/{prodt}", "$/t")
cst.add("lrate", "Loader output", "P_l", "={Inputs.lbkt}/{Inputs.lcyc}*60*{Inputs.eff}", "t/h")
cst.add("loadc", "Loading cost per tonne", "c_ld", "={Inputs.lcost}/{lrate}", "$/t")
cst.add("tyrec", "Tyre and road wear per tonne", "c_w",
        "=2*Haul!B10*{Inputs.tyre}/{Inputs.payact}", "$/t")
cst.add("unitc", "Load and haul cost per tonne", "c", "={haulc}+{loadc}+{tyrec}", "$/t")
cst.add("unitst", "Load and haul cost per short ton", "c_st", "={unitc}/1.1023", "$/ton")
cst.add("unitst2", "Load and haul cost per short ton (quote form)", "c_st2", "={unitc}*1.1023",
        "$/ton", planted=("unit-scale", "$/t to $/short ton multiplied by 1.1023: wrong way "
                          "round"))
cst.add("tkm", "Haul cost per tonne-kilometre", "c_tkm", "={haulc}/Haul!B10", "$/t·km")
cst.add("contr", "Contract haul cost per tonne", "c_con", "={Inputs.contract}*Haul!C10*1.1023",
        "$/t")
cst.add("tmi", "Haul cost per short ton-mile (against the contract quote)", "c_tmi",
        "={haulc}/1.1023/Haul!C10", "$/ton·mi")
cst.add("roadlen", "Haul road length (grading contract)", "L_road", "=SUM(Haul!B5:C9)", "km",
        planted=("mixed-range", "the km and mi columns summed together"))
cst.add("annc", "Annual load and haul cost", "C_yr", "={unitc}*{Inputs.Ayr}", "$/yr")
cst.add("annfuel", "Annual fuel use, haul fleet", "F_yr",
        "={ntr}*{Inputs.fuel}*{Inputs.hyr}*{Inputs.util}/100", "L/yr")
cst.add("annfuel2", "Annual fuel use, haul fleet (budget form)", "F_yr2",
        "={ntr}*{Inputs.fuel}*{Inputs.hyr}*{Inputs.util}", "L/yr",
        planted=("unit-scale", "82 % used as 82: fuel 100 times too large"))
cst.add("annfuelg", "Annual fuel use, US gal", "F_yr,gal", "={annfuel}/3.785", "gal/yr")
cst.add("fuelpt", "Fuel cost per tonne (US gal basis)", "c_fuel",
        "={ntr}*{Inputs.fuelg}*{Inputs.price}/{fleet}", "$/t",
        planted=("unit-scale", "gal/h times a price in $/L: 3.785 too small"))
COSTS = cst.finish([inp])

FLEET = {
    "A1": "Haul truck classes: payload, owning and operating cost excluding fuel, fuel burn at "
          "medium duty (invented rates for demonstration; use the dealer's figures)",
    "A4": "Class", "B4": "Payload [t]", "C4": "Owning and operating [$/h]", "D4": "Fuel [L/h]",
}
for r, row in enumerate([("40 t articulated", 39, 165, 32), ("60 t rigid", 58, 215, 48),
                         ("90 t rigid", 90, 305, 72)], start=5):
    for c, v in zip("ABCD", row):
        FLEET[f"{c}{r}"] = v

QUARRY = {
    "trade": "quarrying: haul truck cycle, fleet size and load-and-haul cost",
    "sheets": [("Inputs", INPUTS), ("Haul", HAUL), ("Costs", COSTS), ("Fleet", FLEET)],
    "sidecar": ("# Invented scenario. A dimensionally consistent formula can still be wrong; this\n"
                "# check does not replace independent review under local codes and licensed practice.\n"
                "# Brackenhow Quarry: the counting word the trade writes into a rate\n"
                "# (truck trips per hour: common practice).\n"
                "measure trips = 1 1 \"truck trips (a count)\"\n"),
    "planted": {**inp.planted, **cst.planted,
                "Haul!C7": ("unit-scale", "km to mi multiplied by 1.609: wrong way round"),
                "Haul!G8": ("unit-scale", "km over km/h gives hours, written in the min "
                            "column: 60 too small")},
}


# --------------------------------------------------------------------------------------------
# Book 2: belt conveyor drive (mm and in, rpm, m/s and fpm, kW and hp)
# --------------------------------------------------------------------------------------------
CONV_SRC = (
    "Sources: belt speed v = π·D·n (D the lagged drive pulley diameter), load per metre q_G = "
    "Q/(3.6·v) with Q in t/h and v in m/s: common practice; main resistance F_H = C·f·L·g·(q_R + "
    "2·q_B + q_G) and slope resistance F_St = q_G·H·g, DIN 22101:2011 §6 (from memory, the "
    "cos δ of a gentle slope taken as 1); power at the drive pulley P_A = F_U·v, DIN 22101:2011 "
    "(from memory); CEMA, Belt Conveyors for Bulk Materials 7th ed. (2014) ch. 6: hp = T_e·V/"
    "33 000 with T_e in lbf and V in fpm (from memory); torque T = 9549·P/n (P in kW, n in rpm, "
    "9549 = 60 000/2π) and T = 5252·hp/n (lbf·ft, 5252 = 33 000/2π): common practice; Euler-"
    "Eytelwein T1/T2 = e^(μθ), Shigley's Mechanical Engineering Design 10th ed. (2015) §17-2; "
    "NIST SP 811 (2008) App. B.8: 1 in = 25.4 mm, 1 ft = 0.3048 m (3.281 ft/m, 196.85 fpm per "
    "m/s), 1 hp = 745.7 W (1.341 hp/kW), 1 lbf = 4.448 N (0.2248 lbf/N), 1 N·m = 0.7376 "
    "lbf·ft, 1 N/mm = 5.710 lbf/in; 0.2618 = π/12 in fpm = 0.2618·D[in]·n[rpm]: common "
    "practice. Conveyor data invented (demonstration only).")
drv = ItemSheet("Drive", "Gallowmere Wharf CV-03 overland belt conveyor: drive sizing "
                "(invented scenario)", CONV_SRC)
drv.add("Q", "Design capacity", "Q", 1400, "t/h")
drv.add("B", "Belt width", "B", 1200, "mm")
drv.add("D", "Drive pulley diameter (lagged)", "D", 800, "mm")
drv.add("Din", "Drive pulley diameter, in", "D_in", "={D}/25.4", "in")
drv.add("nm", "Motor speed at full load", "n_m", 1485, "rpm")
drv.add("i", "Gear ratio", "i", 25, "-")
drv.add("n", "Drive pulley speed", "n", "={nm}/{i}", "rpm")
drv.add("v", "Belt speed", "v", "=PI()*{D}/1000*{n}/60", "m/s")
drv.add("v2", "Belt speed (quick check)", "v_2", "={D}/1000*{n}/60", "m/s",
        planted=("unit-scale", "rim speed without π: D·n instead of π·D·n, 3.14 too small"))
drv.add("vf", "Belt speed, fpm", "v_fpm", "={v}*196.85", "fpm")
drv.add("vf2", "Belt speed, fpm (from the diameter in inches)", "v_fpm2", "=0.2618*{Din}*{n}",
        "fpm")
drv.add("vf3", "Belt speed, fpm (US datasheet)", "v_fpm3", "={v}*3.281", "fpm",
        planted=("unit-scale", "m/s to fpm with 3.281 alone: the 60 s/min left out"))
drv.add("vchk", "Belt speed check (4.0 m/s limit)", "check_v",
        "=IF({v}<=4,\"OK\",\"TOO FAST\")")
drv.add("L", "Conveyor length, pulley centres", "L", 420, "m")
drv.add("H", "Net lift, tail to head", "H", 16, "m")
drv.add("qB", "Belt mass", "q_B", 32, "kg/m")
drv.add("qR", "Idler rotating mass, carry and return", "q_R", 24, "kg/m")
drv.add("qG", "Load per metre", "q_G", "={Q}/(3.6*{v})", "kg/m")
drv.add("C", "Secondary resistance coefficient C (L = 420 m)", "C", 1.14, "-")
drv.add("f", "Artificial friction factor f", "f", 0.02, "-")
drv.add("g", "Gravity", "g", 9.81, "m/s²")
drv.add("FH", "Main resistance", "F_H", "={C}*{f}*{L}*{g}*({qR}+2*{qB}+{qG})", "N")
drv.add("FSt", "Slope resistance", "F_St", "={qG}*{H}*{g}", "N")
drv.add("FSt2", "Slope resistance (rev. A)", "F_St2", "={qG}*{H}", "N",
        planted=("result-unit", "q_G·H without g: kg, not N"))
drv.add("FU", "Effective tension at the drive pulley", "F_U", "={FH}+{FSt}", "N")
drv.add("FUk", "Effective tension, kN", "F_U,kN", "={FU}/1000", "kN")
drv.add("PA", "Power at the drive pulley", "P_A", "={FU}*{v}/1000", "kW")
drv.add("eta", "Drive efficiency (gearbox, coupling)", "eta", 94, "%")
drv.add("PM", "Motor power required", "P_M", "={PA}/({eta}/100)", "kW")
drv.add("PMhp", "Motor power required, hp", "P_M,hp", "={PM}*1.341", "hp")
drv.add("Te", "Effective tension, lbf (CEMA check)", "T_e", "={FU}*0.2248", "lbf")
drv.add("hpC", "Power at the drive pulley, CEMA (T_e·V/33 000)", "P_CEMA", "={Te}*{vf}/33000",
        "hp")
drv.add("PAc", "Power at the drive pulley, CEMA check in kW", "P_CEMA,kW", "={hpC}/1.341",
        "kW")
drv.add("hpC2", "Motor power, hp (vendor enquiry)", "P_hp2", "={PMhp}*1.341", "hp",
        planted=("unit-scale", "a power already in hp converted again: 1.341 too large"))
drv.add("Psel", "Selected motor rating", "P_sel", 250, "kW")
drv.add("mchk", "Motor check (10 % margin)", "check_m",
        "=IF({Psel}>={PM}*1.1,\"OK\",\"UPSIZE\")")
drv.add("nfl", "Selected motor, full-load speed", "n_fl", "=VLOOKUP({Psel},Motors!A5:C9,2,FALSE)",
        "rpm")
drv.add("Tp", "Drive pulley torque", "T_p", "={PA}*9549/{n}", "N·m")
drv.add("Tp2", "Drive pulley torque (from the effective tension)", "T_p2", "={FU}*{D}/2000",
        "N·m")
drv.add("Tp3", "Drive pulley torque (gearbox enquiry)", "T_p3", "={PA}*60000/{n}", "N·m",
        planted=("unit-scale", "60 000·P/n without the 2π: torque 6.28 times too large"))
drv.add("Tpl", "Drive pulley torque, lbf·ft", "T_p,US", "={Tp}*0.7376", "lbf·ft")
drv.add("Tpl2", "Drive pulley torque, lbf·ft (5252 rule)", "T_p,US2", "={hpC}*5252/{n}",
        "lbf·ft")
drv.add("Tm", "Motor full-load torque", "T_m", "=9549*{Psel}/{nfl}", "N·m")
drv.add("mu", "Friction coefficient, lagged pulley to belt", "mu", 0.35, "-")
drv.add("theta", "Wrap angle on the drive pulley", "theta", 210, "°")
drv.add("ew", "Euler factor e^(μθ)", "e_mt", "=EXP({mu}*RADIANS({theta}))", "-")
drv.add("ew2", "Euler factor (drive catalogue check)", "e_mt2", "=EXP({mu}*{theta})", "-",
        planted=("unit-scale", "wrap angle in degrees inside EXP: should be radians"))
drv.add("T1", "Tight side tension", "T_1", "={FU}*{ew}/({ew}-1)", "N")
drv.add("T2", "Slack side tension", "T_2", "={T1}-{FU}", "N")
drv.add("Tw", "Belt tension per unit width", "T_w", "={T1}/{B}", "N/mm")
drv.add("PIW", "Belt tension per unit width, lbf/in", "T_w,US", "={Tw}*5.71", "lbf/in")
drv.add("SF", "Belt safety factor (textile, steady running)", "S", 10, "-")
drv.add("kN", "Belt rating required", "k_N", "={Tw}*{SF}", "N/mm")
DRIVE = drv.finish()

PULLEYS = {
    "A1": "Gallowmere Wharf CV-03: pulley schedule (invented diameters)",
    "A2": ("Sources: pulley speed n = v/(π·D) × 60 s/min; rim speed π·D·n (m/s with D in mm: "
           "/60 000), in fpm π·D[in]·n/12: common practice; 1 in = 25.4 mm (NIST SP 811 (2008) "
           "App. B.8)."),
    "A3": CAUTION,
    "A4": "Pulley", "B4": "Diameter [mm]", "C4": "Diameter [in]", "D4": "Speed [rpm]",
    "E4": "Rim speed [m/s]", "F4": "Rim speed [fpm]",
    "A10": "Mean rim speed (each should equal the belt speed)", "E10": "=AVERAGE(E5:E9)",
    "F10": "=AVERAGE(F5:F9)",
}
V = drv.ref("v")
for r, (name, dia) in enumerate([("Drive", 800), ("Tail", 630), ("Snub", 500), ("Bend", 500),
                                 ("Take-up", 630)], start=5):
    PULLEYS[f"A{r}"], PULLEYS[f"B{r}"] = name, dia
    PULLEYS[f"C{r}"] = f"=B{r}/25.4"
    PULLEYS[f"D{r}"] = f"={V}*60/(PI()*B{r}/1000)"
    PULLEYS[f"E{r}"] = f"=PI()*B{r}*D{r}/60000"
    PULLEYS[f"F{r}"] = f"=PI()*C{r}*D{r}/12"
PULLEYS["C7"] = "=B7*25.4"              # planted: mm to in multiplied by 25.4
PULLEYS["E8"] = "=B8*D8/60000"          # planted: rim speed without π
PULLEYS["F9"] = "=PI()*C9*D9"           # planted: in·rpm without /12

MOTORS = {
    "A1": "Four-pole 400 V motors: full-load speed and the nearest US frame rating (invented "
          "catalogue data; use the maker's list)",
    "A4": "Rating [kW]", "B4": "Full-load speed [rpm]", "C4": "US rating [hp]",
}
for r, row in enumerate([(160, 1485, 215), (200, 1486, 270), (250, 1488, 335), (315, 1489, 425),
                         (355, 1490, 475)], start=5):
    for c, v in zip("ABC", row):
        MOTORS[f"{c}{r}"] = v

CONV = {
    "trade": "bulk handling: belt conveyor drive power, speed, torque and tension",
    "sheets": [("Drive", DRIVE), ("Pulleys", PULLEYS), ("Motors", MOTORS)],
    "planted": {**drv.planted,
                "Pulleys!C7": ("unit-scale", "mm to in multiplied by 25.4: wrong way round"),
                "Pulleys!E8": ("unit-scale", "rim speed D·n/60 000 without π: 3.14 too small"),
                "Pulleys!F9": ("unit-scale", "π·D[in]·n gives in/min, column is fpm: 12 too "
                               "large")},
}


# --------------------------------------------------------------------------------------------
# Book 3: boiler house water heat balance (kg/h and lb/h, °C and °F, specific heat, kW and
# Btu/h)
# --------------------------------------------------------------------------------------------
BOIL_SRC = (
    "Sources: specific heat of liquid water 4.19 kJ/(kg·K), 1.0 Btu/(lb·°F), ASHRAE Handbook—"
    "Fundamentals (2017) ch. 33 (from memory); enthalpy of compressed water ≈ c·t above 0 °C, "
    "the steam tables' reference (common practice, within 1 % below 150 °C); saturation "
    "properties (Steam sheet) rounded from IAPWS-IF97 tables, Rogers & Mayhew, Thermodynamic "
    "and Transport Properties of Fluids 5th ed. (1995) (from memory); blowdown rate = F·S/(B − "
    "F), Spirax Sarco, The Steam and Condensate Loop (2007), 'Boiler blowdown' (from memory); "
    "Q[Btu/h] = 500·gpm·ΔT[°F] (500 = 8.34 lb/gal × 60 min/h × 1 Btu/(lb·°F)) and gpm = "
    "lb/h ÷ 500: common practice; 1 boiler horsepower = 33 475 Btu/h = 9.81 kW: common "
    "practice; air density 1.293 kg/m³ at 0 °C and 101.325 kPa, ρ ∝ 273.15/T (ideal gas): common "
    "practice; NIST SP 811 (2008) App. B.8: 1 lb = 0.4536 kg (2.2046 lb/kg), 1 kW = 3412 "
    "Btu/h, t/°F = 1.8·t/°C + 32, a difference of 1 K = 1.8 °F, 1 bar = 14.5 psi, standard "
    "atmosphere 1.013 bar = 14.7 psi; T/K = t/°C + 273.15, SI Brochure 9th ed. (2019). Plant "
    "readings invented (demonstration only).")
bal = ItemSheet("Balance", "Harwick Mills boiler house: feedwater, deaerator and boiler heat "
                "balance (invented scenario)", BOIL_SRC)
bal.add("pB", "Boiler operating pressure", "p_B", 10, "bar g")
bal.add("pBa", "Boiler pressure, absolute", "p_B,a", "={pB}+1.013", "bar a")
bal.add("pBpsig", "Boiler pressure, psig", "p_B,psig", "={pB}*14.5", "psig")
bal.add("pBpsia", "Boiler pressure, psia", "p_B,psia", "={pBpsig}+14.7", "psia")
bal.add("pBpsia2", "Boiler pressure, psia (burner vendor form)", "p_B,psia2", "={pB}*14.5",
        "psia", planted=("offset-scale", "a gauge pressure converted to psi and written as "
                         "psia: the atmosphere left out"))
bal.add("tsat", "Saturation temperature at boiler pressure", "t_sat",
        "=VLOOKUP({pBa},Steam!A5:D11,2,TRUE)", "°C")
bal.add("hf", "Enthalpy of saturated water", "h_f", "=VLOOKUP({pBa},Steam!A5:D11,3,TRUE)",
        "kJ/kg")
bal.add("hg", "Enthalpy of saturated steam", "h_g", "=VLOOKUP({pBa},Steam!A5:D11,4,TRUE)",
        "kJ/kg")
bal.add("hg2", "Enthalpy of saturated steam (rev. A)", "h_g2",
        "=VLOOKUP({pB},Steam!A5:D11,4,TRUE)", "kJ/kg",
        planted=("offset-scale", "gauge pressure looked up in a table of absolute pressures"))
bal.add("ms", "Steam flow (meter)", "m_s", 10400, "kg/h")
bal.add("F", "Feedwater TDS", "F", 220, "ppm")
bal.add("Bmax", "Boiler water TDS limit", "B", 3000, "ppm")
bal.add("mbd", "Blowdown flow", "m_bd", "={F}*{ms}/({Bmax}-{F})", "kg/h")
bal.add("mfw", "Feedwater flow", "m_fw", "={ms}+{mbd}", "kg/h")
bal.add("mfwlb", "Feedwater flow, lb/h", "m_fw,lb", "={mfw}*2.2046", "lb/h")
bal.add("rc", "Condensate return, share of steam", "r_c", 70, "%")
bal.add("mc", "Condensate returned", "m_c", "={ms}*{rc}/100", "kg/h")
bal.add("mmu", "Make-up water", "m_mu", "={mfw}-{mc}", "kg/h")
bal.add("tmu", "Make-up water temperature", "t_mu", 11, "°C")
bal.add("tc", "Condensate return temperature", "t_c", 78, "°C")
bal.add("tmix", "Mixed temperature into the deaerator (mass-weighted)", "t_mix",
        "=({mmu}*{tmu}+{mc}*{tc})/({mmu}+{mc})", "°C")
bal.add("tDA", "Deaerator temperature", "t_DA", 105, "°C")
bal.add("dT", "Temperature rise in the deaerator", "ΔT", "={tDA}-{tmix}", "K")
bal.add("cp", "Specific heat of water", "c", 4.19, "kJ/(kg·K)")
bal.add("QDA", "Deaerator heating duty", "Q_DA", "={mfw}/3600*{cp}*{dT}", "kW")
bal.add("QDA2", "Deaerator heating duty (hand check)", "Q_DA2", "={mfw}*4.19*{dT}/3600", "kW")
bal.add("dTF", "Temperature rise in the deaerator, °F", "ΔT_F", "={dT}*1.8", "Δ°F")
bal.add("dTF2", "Temperature rise in the deaerator, °F (US check)", "ΔT_F2", "={dT}*1.8+32",
        "Δ°F", planted=("offset-scale", "a temperature rise converted with the +32 of a "
                        "reading"))
bal.add("cpus", "Specific heat of water, US units", "c_US", 1.0, "Btu/lb·°F")
bal.add("QDAus", "Deaerator duty, US check (m·c·ΔT)", "Q_US", "={mfwlb}*{cpus}*{dTF}", "Btu/h")
bal.add("QDAkw", "Deaerator duty, US check in kW", "Q_US,kW", "={QDAus}/3412", "kW")
bal.add("QDAus2", "Deaerator duty, US check (water, c = 1)", "Q_US2", "={mfwlb}*{dTF}", "Btu/h")
bal.add("gpm", "Feedwater flow, gpm", "q_gpm", "={mfwlb}/500", "gpm")
bal.add("Q500", "Deaerator duty, 500 rule", "Q_500", "=500*{gpm}*{dTF}", "Btu/h")
bal.add("hfw", "Feedwater enthalpy (c·t above 0 °C)", "h_fw", "={cp}*{tDA}", "kJ/kg")
bal.add("Qb", "Boiler output to steam and blowdown", "Q_B",
        "=({ms}*({hg}-{hfw})+{mbd}*({hf}-{hfw}))/3600", "kW")
bal.add("QbMM", "Boiler output, MMBtu/h", "Q_B,MM", "={Qb}*3412/10^6", "MMBtu/h")
bal.add("QbMM2", "Boiler output, MMBtu/h (insurer's form)", "Q_B,MM2", "={Qb}*3412/1000",
        "MMBtu/h", planted=("unit-scale", "kW × 3412 / 1000 gives MBH, written as MMBtu/h: "
                            "1000 too large"))
bal.add("BHP", "Boiler output, boiler horsepower", "Q_BHP", "={Qb}/9.81", "BHP")
bal.add("eta", "Boiler efficiency (gross)", "eta", 84, "%")
bal.add("Qf", "Fuel input", "Q_f", "={Qb}/({eta}/100)", "kW")
bal.add("Qbd", "Blowdown heat loss (to drain at make-up temperature)", "Q_bd",
        "={mbd}/3600*({hf}-{cp}*{tmu})", "kW")
bal.add("Qrad", "Shell radiation and convection loss (maker's figure)", "Q_rad", 15600, "W")
bal.add("Qloss", "Blowdown and shell losses", "Q_loss", "={Qbd}+{Qrad}/1000", "kW")
bal.add("Qloss2", "Blowdown and shell losses (summary page)", "Q_loss2", "={Qbd}+{Qrad}", "kW",
        planted=("unit-scale", "kW added to W"))
bal.add("tst", "Flue gas temperature at the stack", "t_st", 195, "°C")
bal.add("rhof", "Flue gas density at the stack (taken as air)", "rho_f",
        "=1.293*273.15/({tst}+273.15)", "kg/m³")
bal.add("rhof2", "Flue gas density at the stack (rev. A)", "rho_f2", "=1.293*273.15/{tst}",
        "kg/m³", planted=("offset-scale", "°C where the absolute temperature in K belongs"))
bal.add("mflue", "Flue gas mass flow (combustion calculation)", "m_fl", 14200, "kg/h")
bal.add("Vflue", "Flue gas volume flow at the stack", "V_fl", "={mflue}/{rhof}/3600", "m³/s")
BALANCE = bal.finish()

B_ = bal.ref
STREAMS = {
    "A1": "Harwick Mills: water streams around the deaerator (heat flow above 0 °C)",
    "A2": ("Sources: as the Balance sheet: heat flow = m·c·t/3600 kW (m in kg/h, c = 4.19 "
           "kJ/(kg·K), t above 0 °C); 2.2046 lb/kg and t/°F = 1.8·t/°C + 32 (NIST SP 811 (2008) "
           "App. B.8)."),
    "A3": CAUTION,
    "A4": "Stream", "B4": "Flow [kg/h]", "C4": "Flow [lb/h]", "D4": "Temperature [°C]",
    "E4": "Temperature [°F]", "G4": "Heat flow [kW]",
    "A9": "Heat added by deaerator steam", "G9": "=G7-G5-G6",
}
for r, (name, m, t) in enumerate([("Make-up water", "mmu", "tmu"),
                                  ("Condensate return", "mc", "tc"),
                                  ("Feedwater from deaerator", "mfw", "tDA"),
                                  ("Blowdown", "mbd", "tsat")], start=5):
    STREAMS[f"A{r}"] = name
    STREAMS[f"B{r}"] = f"={B_(m)}"
    STREAMS[f"C{r}"] = f"=B{r}*2.2046"
    STREAMS[f"D{r}"] = f"={B_(t)}"
    STREAMS[f"E{r}"] = f"=D{r}*1.8+32"
    STREAMS[f"G{r}"] = f"=B{r}*4.19*D{r}/3600"
STREAMS["C6"] = "=B6/2.2046"            # planted: kg to lb divided by 2.2046
STREAMS["E7"] = "=D7*1.8"               # planted: °C to °F without +32
STREAMS["G8"] = "=B8*4.19*D8"           # planted: kg/h without /3600

STEAM = {
    "A1": "Saturated water and steam (rounded from IAPWS-IF97 tables, from memory; check against "
          "a current table before use)",
    "A4": "Pressure [bar a]", "B4": "t_sat [°C]", "C4": "h_f [kJ/kg]", "D4": "h_g [kJ/kg]",
}
for r, row in enumerate([(1.0, 99.6, 417, 2675), (2.0, 120.2, 505, 2706), (4.0, 143.6, 605, 2738),
                         (6.0, 158.8, 670, 2756), (8.0, 170.4, 721, 2768), (10.0, 179.9, 763, 2777),
                         (12.0, 188.0, 798, 2784)], start=5):
    for c, v in zip("ABCD", row):
        STEAM[f"{c}{r}"] = v

BOILER = {
    "trade": "boiler house: feedwater, deaerator and boiler heat balance",
    "sheets": [("Balance", BALANCE), ("Streams", STREAMS), ("Steam", STEAM)],
    "planted": {**bal.planted,
                "Streams!C6": ("unit-scale", "kg/h to lb/h divided by 2.2046: wrong way round"),
                "Streams!E7": ("offset-scale", "°C to °F without the +32"),
                "Streams!G8": ("unit-scale", "kg/h × kJ/kg without /3600: kJ/h written as kW, "
                               "3600 too large")},
}


# --------------------------------------------------------------------------------------------
# Book 4: railway drainage and gradient (‰ and %, mm/h and in/h, m² and ft², L/s and cfs)
# --------------------------------------------------------------------------------------------
RAIL_SRC = (
    "Sources: rational method Q = C·i·A in consistent units; with i in mm/h and A in m², Q[L/s] "
    "= C·i·A/3600 (1 mm × 1 m² = 1 L): common practice; the US form Q[cfs] = C·i[in/h]·A[acres] "
    "(1 acre·in/h = 1.008 cfs, taken as 1), FHWA HEC-22 Urban Drainage Design Manual 3rd ed. "
    "(2009) eq. 3-1 (from memory); Kirpich time of concentration t_c = 0.0195·L^0.77·S^−0.385 "
    "(t_c in min, L in m, S in m/m), Kirpich (1940) as quoted in HEC-22 (2009) (from memory); "
    "Manning V = (1/n)·R^(2/3)·S^(1/2) in SI, V. T. Chow, Open-Channel Hydraulics (1959) ch. 5; "
    "trapezoidal channel area (b + z·y)·y and wetted perimeter b + 2y·√(1 + z²), Chow (1959) "
    "ch. 2; railway gradients in ‰ (per mille), '1 in N' = 1000/‰, % = ‰/10: common practice; "
    "NIST SP 811 (2008) App. B.8: 1 in = 25.4 mm, 1 m² = 10.764 ft², 1 acre = 43 560 ft², 1 cfs = "
    "28.32 L/s. Track profile, catchments and the IDF table are invented (demonstration only).")

GRAD = {
    "A1": "Fenwyke Junction – Callow Bank up line: vertical profile (invented survey)",
    "A2": ("Sources: rise = length × gradient[‰]/1000; '1 in N' = 1000/gradient[‰]; % = ‰/10: "
           "common practice. Mean gradient = total rise / total length."),
    "A3": CAUTION,
    "A4": "Section", "B4": "Length [m]", "C4": "Gradient [‰]", "D4": "Gradient [%]",
    "E4": "Gradient, 1 in [-]", "F4": "Rise [m]",
    "A9": "Total / ruling / mean",
    "B9": "=SUM(B5:B8)", "C9": "=MAX(C5:C8)", "D9": "=F9/B9*100", "F9": "=SUM(F5:F8)",
    "A10": "Ruling gradient check (12.5 ‰ limit for mixed traffic, invented route standard)",
    "C10": "=IF(C9<=12.5,\"OK\",\"TOO STEEP\")",
}
for r, (name, length, g) in enumerate([("Fenwyke Junction to Moss Lane", 1250, 4.5),
                                       ("Moss Lane cutting", 840, 8.0),
                                       ("Callow viaduct", 620, 2.5),
                                       ("Callow Bank", 1480, 12.5)], start=5):
    GRAD[f"A{r}"], GRAD[f"B{r}"], GRAD[f"C{r}"] = name, length, g
    GRAD[f"D{r}"] = f"=C{r}/10"
    GRAD[f"E{r}"] = f"=1000/C{r}"
    GRAD[f"F{r}"] = f"=B{r}*C{r}/1000"
GRAD["D7"] = "=C7*10"               # planted: ‰ to % multiplied by 10
GRAD["F8"] = "=B8*C8"               # planted: ‰ used as a fraction

dit = ItemSheet("Ditch", "Callow Bank cess ditch: design flow and capacity (invented scenario)",
                RAIL_SRC)
dit.add("Lc", "Longest flow path along the cess", "L_c", 640, "m")
dit.add("S", "Ditch gradient (follows the track, Callow Bank)", "S", "=Gradients!C8", "‰")
dit.add("Sf", "Ditch slope as a fraction", "S_f", "={S}/1000", "m/m")
dit.add("tc", "Time of concentration (Kirpich)", "t_c", "=0.0195*{Lc}^0.77*{Sf}^-0.385", "min")
dit.add("tcd", "Storm duration (5 min minimum)", "t_d", "=MAX({tc},5)", "min")
dit.add("i", "Design rainfall intensity, 10-year return", "i",
        "=VLOOKUP({tcd},IDF!A5:B11,2,TRUE)", "mm/h")
dit.add("iin", "Design rainfall intensity, in/h", "i_in", "={i}/25.4", "in/h")
dit.add("iin2", "Design rainfall intensity, in/h (US consultant)", "i_in2", "={i}*25.4", "in/h",
        planted=("unit-scale", "mm/h to in/h multiplied by 25.4: wrong way round"))
dit.add("Aft", "Total catchment, ft²", "A_ft2", "=Catchments!C9", "ft²")
dit.add("Aac", "Total catchment, acres", "A_ac", "={Aft}/43560", "acre")
dit.add("Q", "Design flow", "Q", "=Catchments!E9", "L/s")
dit.add("Qus", "Design flow, US check (C·i·A)", "Q_US", "=Catchments!D9*{iin}*{Aac}", "cfs")
dit.add("Qusl", "Design flow, US check in L/s", "Q_US,L/s", "={Qus}*28.32", "L/s")
dit.add("Qus2", "Design flow, US check (from ft²)", "Q_US2", "=Catchments!D9*{iin}*{Aft}/3600",
        "cfs", planted=("unit-scale", "in/h × ft² / 3600 gives 12 × cfs: the 12 in/ft left out"))
dit.add("alw", "Climate change allowance on rainfall", "a", 20, "%")
dit.add("Qd", "Design flow with allowance", "Q_d", "={Q}*(1+{alw}/100)", "L/s")
dit.add("Qd2", "Design flow with allowance (drainage schedule)", "Q_d2", "={Q}*(1+{alw})", "L/s",
        planted=("unit-scale", "20 % used as 20: flow 21 times, not 1.2 times"))
dit.add("n", "Manning n (grass-lined ditch)", "n", 0.035, "-")
dit.add("b", "Ditch bed width", "b", 600, "mm")
dit.add("y", "Design flow depth", "y", 300, "mm")
dit.add("z", "Side slope, 1 vertical : z horizontal", "z", 1.5, "-")
dit.add("Af", "Flow area", "A", "=({b}+{z}*{y})*{y}/10^6", "m²")
dit.add("Pw", "Wetted perimeter", "P", "=({b}+2*{y}*SQRT(1+{z}^2))/1000", "m")
dit.add("R", "Hydraulic radius", "R", "={Af}/{Pw}", "m")
dit.add("V", "Velocity (Manning)", "V", "=1/{n}*{R}^(2/3)*SQRT({Sf})", "m/s")
dit.add("V2", "Velocity (Manning, drainage schedule)", "V_2", "=1/{n}*{R}^(2/3)*SQRT({S})", "m/s",
        planted=("unit-scale", "slope in ‰ under the root: velocity 31.6 times too large"))
dit.add("Qcap", "Ditch capacity", "Q_cap", "={V}*{Af}*1000", "L/s")
dit.add("chk", "Capacity check", "check", "=IF({Qcap}>={Qd},\"OK\",\"ENLARGE\")")
dit.add("Amix", "Total catchment (drainage summary)", "A_tot", "=SUM(Catchments!B5:C8)", "m²",
        planted=("mixed-range", "the m² and ft² columns summed together"))
DITCH = dit.finish()

I_ = dit.ref("i")
CATCH = {
    "A1": "Callow Bank: catchments draining to the up-side cess ditch (invented areas)",
    "A2": ("Sources: Q[L/s] = C·i[mm/h]·A[m²]/3600, rational method (common practice); 10.764 "
           "ft² per m² and 28.32 L/s per cfs (NIST SP 811 (2008) App. B.8); runoff coefficients "
           "from memory of HEC-22 (2009) Table 3-1."),
    "A3": CAUTION,
    "A4": "Catchment", "B4": "Area [m²]", "C4": "Area [ft²]", "D4": "Runoff coefficient C [-]",
    "E4": "Flow [L/s]", "F4": "Flow [cfs]",
    "A9": "Total / weighted C",
    "B9": "=SUM(B5:B8)", "C9": "=SUM(C5:C8)", "D9": "=SUMPRODUCT(B5:B8,D5:D8)/B9",
    "E9": "=SUM(E5:E8)", "F9": "=SUM(F5:F8)",
}
for r, (name, area, c) in enumerate([("Track formation and ballast", 8900, 0.45),
                                     ("Cutting slope, up side", 12400, 0.35),
                                     ("Access road and compound", 2100, 0.85),
                                     ("Farmland above the cutting", 31500, 0.20)], start=5):
    CATCH[f"A{r}"], CATCH[f"B{r}"], CATCH[f"D{r}"] = name, area, c
    CATCH[f"C{r}"] = f"=B{r}*10.764"
    CATCH[f"E{r}"] = f"=D{r}*{I_}*B{r}/3600"
    CATCH[f"F{r}"] = f"=E{r}/28.32"
CATCH["E7"] = f"=D7*{I_}*B7/360"        # planted: the hectare form's 360 used with m²
CATCH["F8"] = "=E8*28.32"               # planted: L/s to cfs multiplied by 28.32

IDF = {
    "A1": "Intensity-duration table, 10-year return period (invented for demonstration; use the "
          "local design rainfall)",
    "A4": "Duration [min]", "B4": "Intensity [mm/h]",
}
for r, (d, i) in enumerate([(5, 118), (10, 92), (15, 76), (20, 65), (30, 51), (45, 39),
                            (60, 32)], start=5):
    IDF[f"A{r}"], IDF[f"B{r}"] = d, i

RAIL = {
    "trade": "railway: track gradient profile and cess ditch drainage",
    "sheets": [("Gradients", GRAD), ("Ditch", DITCH), ("Catchments", CATCH), ("IDF", IDF)],
    "planted": {**dit.planted,
                "Gradients!D7": ("unit-scale", "‰ to % multiplied by 10: wrong way round"),
                "Gradients!F8": ("unit-scale", "gradient in ‰ used as a fraction: rise 1000 "
                                 "times too large"),
                "Catchments!E7": ("unit-scale", "the hectare form's /360 used with m²: flow 10 "
                                  "times too large"),
                "Catchments!F8": ("unit-scale", "L/s to cfs multiplied by 28.32: wrong way "
                                  "round")},
}

BOOKS = {"quarry-haul": QUARRY, "conveyor-drive": CONV, "boiler-water": BOILER,
         "rail-drainage": RAIL}

EXTRA = {}     # stem -> list of (comment, "Sheet!Cell rule")
MISSED = {}    # stem -> {"Sheet!Cell": "why"}
RENAMED = {}   # stem -> {"Sheet!Cell": rule plumb names, or (rule, why)}
MESSAGES = {}  # stem -> {"Sheet!Cell": plumb's message on a planted cell, where it misleads}
HEADNOTE = {}  # stem -> comment lines written at the head of the .expect
try:
    from review_notes import EXTRA, MISSED, RENAMED, MESSAGES, HEADNOTE  # noqa: F401,F811
except ImportError:
    pass


def main():
    write_books(HERE, BOOKS, {"EXTRA": EXTRA, "MISSED": MISSED, "RENAMED": RENAMED,
                              "MESSAGES": MESSAGES, "HEADNOTE": HEADNOTE})


if __name__ == "__main__":
    main()
