#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review47), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied; pattern after
corpus/sheets/review46/make_books.py.

Trades: a commercial kitchen's gas supply, hood exhaust and make-up air; an irrigation district's
river pumping plant; a steel storage tank's hydrostatic test and settlement survey; a data
centre's UPS, battery room and cooling. All scenarios, sites, firms, readings and catalogue data
are invented (demonstration only); the formulas and published factors are the trade's own, with
their sources named in a text cell at the top of each sheet ("from memory" where recalled and
not checked, "common practice" for a fact of the trade with no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and
its messages that mislead, are recorded in review_notes.py after running the frozen binary.

Run: python3 make_books.py  ->  *.xlsx and *.expect in this folder (no sidecars: the units are
typed beside the cells, as the trades type them)
"""
import os
import sys

sys.dont_write_bytecode = True   # write nothing beside the shared modules
HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, HERE)
sys.path.insert(0, os.path.dirname(HERE))
from item_sheet import ItemSheet, write_books_with_notes  # noqa: E402 (shared, not copied)

CAUTION = ("Invented scenario, data for demonstration only. A dimensionally consistent formula can "
           "still be wrong; this check does not replace independent review under local codes and "
           "licensed practice.")
ItemSheet.caution = CAUTION

# --------------------------------------------------------------------------------------------
# Book 1: commercial kitchen gas and ventilation (Btu/h, kW, scfh, m³/h, in. w.c., kPa(g), Pa,
# cfm, cfm/ft, L/s, m/s, fpm, °C, °F, Δ°F, kg/m³, hp, W)
# --------------------------------------------------------------------------------------------
KIT_SRC = (
    "Sources: gas flow = appliance input / higher heating value, HHV of pipeline natural gas about "
    "1030 Btu/scf (common practice; the utility states the value); wall-canopy Type I hood over a "
    "heavy-duty line (charbroiler) 400 cfm per linear foot, International Mechanical Code (2018) "
    "sec. 507 (from memory); grease duct velocity not below 500 ft/min, NFPA 96 (2017) (from "
    "memory); sensible heat Q = 1.08·cfm·ΔT(°F) Btu/h (0.075 lb/ft³ × 60 min/h × 0.24 "
    "Btu/(lb·°F), common practice) and Q = ρ·c_p·V·Δt in SI, standard air 1.2 kg/m³, c_p = 1.006 "
    "kJ/(kg·K), R_air = 287.05 J/(kg·K), ASHRAE Handbook — Fundamentals (2017) ch. 1 (from "
    "memory); direct-fired make-up air heater about 92 % efficient (common practice); fan power "
    "= V·Δp/η (common practice); 2-1/2 in. Sch 40 pipe bore 2.469 in = 62.7 mm, ASME B36.10M "
    "(from memory); NIST SP 811 (2008) App. B.8: 1 kW = 3412 Btu/h, 1 ft³ = 0.02832 m³, 1 cfm = "
    "0.4719 L/s, 1 m = 3.281 ft, 1 in. of water = 249.1 Pa, 1 m/s = 196.9 ft/min, 1 hp = 0.7457 "
    "kW; °F = 1.8·°C + 32; K = °C + 273.15. Restaurant, appliances and readings invented.")
ki = ItemSheet("Kitchen", "Harbour Lane Hotel (invented): main kitchen gas service, Type I hood "
               "and make-up air", KIT_SRC)
ki.heading("Gas load")
ki.add("Qc", "Connected gas load (Appliances sheet)", "Q_c", "=Appliances!D10", "Btu/h")
ki.add("QckW", "Connected gas load, kW", "Q_c,kW", "={Qc}/3412", "kW")
ki.add("QckW2", "Connected gas load, kW (energy model)", "Q_c,kW2", "={Qc}*3412", "kW",
       planted=("unit-scale", "Btu/h to kW multiplied by 3412: wrong way round"))
ki.add("div", "Simultaneous use for meter sizing", "f_d", 85, "%")
ki.add("Qd", "Diversified gas load", "Q_d", "={Qc}*{div}/100", "Btu/h")
ki.add("Qd2", "Diversified gas load (utility application)", "Q_d2", "={Qc}*{div}", "Btu/h",
       planted=("unit-scale", "diversity in % used as a fraction: 100 too large"))
ki.add("HHV", "Higher heating value of the gas (utility)", "HHV", 1030, "Btu/scf")
ki.add("Vc", "Connected gas flow (pipe sizing)", "V_c", "={Qc}/{HHV}", "scfh")
ki.add("Vcm", "Connected gas flow, m³/h", "V_c,SI", "={Vc}*0.02832", "m³/h")
ki.add("Vcm2", "Connected gas flow, m³/h (meter datasheet)", "V_c,SI2", "={Vc}*35.31", "m³/h",
       planted=("unit-scale", "ft³ to m³ multiplied by 35.31: wrong way round"))
ki.add("Vd", "Diversified gas flow", "V_d", "={Qd}/{HHV}", "scfh")
ki.heading("Gas supply and service pipe")
ki.add("ps", "Gas supply pressure at the meter outlet", "p_s", 7.0, "in. w.c.")
ki.add("psk", "Gas supply pressure, kPa(g)", "p_s,kPa", "={ps}*0.2491", "kPa(g)")
ki.add("Dp", "Service pipe bore (2-1/2 in. Sch 40)", "D_p", 62.7, "mm")
ki.add("Ap", "Service pipe bore area", "A_p", "=PI()/4*({Dp}/1000)^2", "m²")
ki.add("vg", "Gas velocity in the service pipe, connected flow", "v_g", "={Vcm}/3600/{Ap}", "m/s")
ki.add("vg2", "Gas velocity in the service pipe (first draft)", "v_g2", "={Vcm}/{Ap}", "m/s",
       planted=("unit-scale", "m³/h used as m³/s: 3600 too large"))
ki.heading("Hood exhaust")
ki.add("Lh", "Hood length (architect's drawing)", "L_h", 5.5, "m")
ki.add("Lhft", "Hood length, ft", "L_h,ft", "={Lh}*3.281", "ft")
ki.add("rate", "Exhaust rate per linear foot, heavy-duty wall canopy", "q_h", 400, "cfm/ft")
ki.add("Qex", "Hood exhaust airflow", "Q_ex", "={Lhft}*{rate}", "cfm")
ki.add("QexLs", "Hood exhaust airflow, L/s", "Q_ex,SI", "={Qex}*0.4719", "L/s")
ki.add("QexLs2", "Hood exhaust airflow, L/s (fan schedule)", "Q_ex,SI2", "={Qex}/0.4719", "L/s",
       planted=("unit-scale", "cfm to L/s divided by 0.4719: wrong way round"))
ki.add("dw", "Grease duct width", "w_d", 600, "mm")
ki.add("dh", "Grease duct height", "h_d", 450, "mm")
ki.add("Ad", "Grease duct area", "A_d", "={dw}*{dh}/10^6", "m²")
ki.add("vd", "Grease duct velocity", "v_d", "={QexLs}/1000/{Ad}", "m/s")
ki.add("vdf", "Grease duct velocity, fpm", "v_d,US", "={vd}*196.9", "fpm")
ki.add("dpf", "Exhaust fan static pressure rise", "Δp_f", 2.0, "in. w.c.")
ki.add("dpfPa", "Exhaust fan static pressure rise, Pa", "Δp_f,Pa", "={dpf}*249.1", "Pa")
ki.add("etaf", "Exhaust fan total efficiency", "eta_f", 55, "%")
ki.add("Pf", "Exhaust fan shaft power", "P_f", "={QexLs}/1000*{dpfPa}/({etaf}/100)/1000", "kW")
ki.add("Pfhp", "Exhaust fan shaft power, hp", "P_f,hp", "={Pf}/0.7457", "hp")
ki.heading("Make-up air")
ki.add("fm", "Make-up air as a share of exhaust (rest transferred from dining)", "f_m", 85, "%")
ki.add("Qmu", "Make-up airflow", "Q_mu", "={Qex}*{fm}/100", "cfm")
ki.add("QmuLs", "Make-up airflow, L/s", "Q_mu,SI", "={Qmu}*0.4719", "L/s")
ki.add("tod", "Outdoor winter design dry bulb", "t_od", -12, "°C")
ki.add("tsu", "Make-up air supply temperature (tempered)", "t_su", 16, "°C")
ki.add("todF", "Outdoor winter design dry bulb, °F", "t_od,F", "={tod}*1.8+32", "°F")
ki.add("tsuF", "Make-up air supply temperature, °F", "t_su,F", "={tsu}*1.8+32", "°F")
ki.add("tsuF2", "Make-up air supply temperature, °F (BMS points list)", "t_su,F2", "={tsu}*1.8",
       "°F", planted=("offset-scale", "°C to °F without the 32"))
ki.add("dTF", "Make-up air temperature rise, °F", "ΔT_F", "={tsuF}-{todF}", "Δ°F")
ki.add("Qh", "Make-up air heating load", "Q_h", "=1.08*{Qmu}*{dTF}", "Btu/h")
ki.add("Qh2", "Make-up air heating load (heater schedule)", "Q_h2", "=1.08*{Qmu}*({tsu}-{tod})",
       "Btu/h", planted=("unit-scale", "a °C difference in the °F rule: 1.8 too small"))
ki.add("rho", "Standard air density", "rho", 1.2, "kg/m³")
ki.add("cp", "Specific heat of air", "c_p", 1.006, "kJ/(kg·K)")
ki.add("Qhk", "Make-up air heating load, SI (check)", "Q_h,SI",
       "={rho}*{cp}*{QmuLs}/1000*({tsu}-{tod})", "kW")
ki.add("patm", "Site barometric pressure", "p_atm", 101.3, "kPa")
ki.add("Ra", "Gas constant of dry air", "R_a", 287.05, "J/(kg·K)")
ki.add("rhoo", "Outdoor air density at winter design", "rho_o",
       "={patm}*1000/({Ra}*({tod}+273.15))", "kg/m³")
ki.add("rhoo2", "Outdoor air density at winter design (burner sizing note)", "rho_o2",
       "={patm}*1000/({Ra}*{tod})", "kg/m³",
       planted=("offset-scale", "°C reading used as an absolute temperature in the gas law"))
ki.add("emu", "Direct-fired heater efficiency", "eta_mu", 92, "%")
ki.add("Qin", "Make-up air heater gas input", "Q_in", "={Qh}/({emu}/100)", "Btu/h")
ki.add("Vmu", "Make-up air heater gas flow", "V_mu", "={Qin}/{HHV}", "scfh")
ki.add("Vt", "Gas at the meter, diversified kitchen plus make-up air", "V_t", "={Vd}+{Vmu}",
       "scfh")
ki.heading("Fan power on the kitchen panel")
ki.add("PmuW", "Make-up air fan motor input (fan schedule)", "P_mu", 3700, "W")
ki.add("Ptot", "Kitchen ventilation fan load", "P_tot", "={Pf}+{PmuW}/1000", "kW")
ki.add("Ptot2", "Kitchen ventilation fan load (panel schedule)", "P_tot2", "={Pf}+{PmuW}", "kW",
       planted=("unit-scale", "fan input in W added to kW"))
KITCHEN = ki.finish()

APPL = {
    "A1": "Harbour Lane Hotel kitchen: gas appliance schedule (invented nameplate inputs)",
    "A2": "Sources: as the Kitchen sheet; connected load = quantity × nameplate input (common "
          "practice).",
    "A3": CAUTION,
    "A4": "Appliance", "B4": "Quantity [-]", "C4": "Input each [Btu/h]", "D4": "Input [Btu/h]",
    "A10": "Connected load", "D10": "=SUM(D5:D9)",
}
for r, (a, q, each) in enumerate([("Range, 6 burners with oven", 2, 213000),
                                  ("Fryer, 50 lb", 3, 110000), ("Charbroiler, 36 in", 1, 96000),
                                  ("Convection oven", 2, 60000),
                                  ("Tilting braising pan", 1, 100000)], start=5):
    APPL[f"A{r}"], APPL[f"B{r}"], APPL[f"C{r}"] = a, q, each
    APPL[f"D{r}"] = f"=B{r}*C{r}"

KITB = {
    "trade": "food service: commercial kitchen gas supply, hood exhaust and make-up air",
    "sheets": [("Kitchen", KITCHEN), ("Appliances", APPL)],
    "planted": ki.planted,
}

# --------------------------------------------------------------------------------------------
# Book 2: irrigation district pumping plant (cfs, ML/d, gpm, m³/s, ft, m, in, psi, psig, psia,
# hp, kW, %, MWh, acre·ft, $/kWh, $/kW)
# --------------------------------------------------------------------------------------------
IRR_SRC = (
    "Sources: pump power bhp = gpm·TDH(ft)/(3960·η) (the pump trade's constant, Hydraulic "
    "Institute / Cameron Hydraulic Data, from memory) and P = ρ·g·Q·H/η in SI; Darcy-Weisbach "
    "h_f = f·(L/D)·v²/(2g) and minor losses K·v²/(2g), g = 32.2 ft/s², Crane TP-410 (2009) ch. 1–2 "
    "(from memory); 2.31 ft of water per psi (common practice); NPSHa = (p_atm − p_v)·2.31 + "
    "submergence − intake loss, Hydraulic Institute (from memory); standard atmosphere at 2,410 ft "
    "13.46 psia (ICAO standard atmosphere, from memory); vapour pressure of water at 68 °F 0.339 "
    "psia (steam tables, from memory); NIST SP 811 (2008) App. B.8: 1 ft³ = 0.02832 m³, 1 cfs = "
    "448.8 gpm, 1 cfs = 2.447 ML/d, 1 ft = 0.3048 m, 1 hp = 0.7457 kW, 1 ML = 0.8107 acre·ft. "
    "District, plant, pumps, tariff and readings invented.")
ir = ItemSheet("Plant", "Willow Creek Irrigation District (invented): Lateral 4 river pumping "
               "plant, duty, power and season energy", IRR_SRC)
ir.heading("Flows")
ir.add("Q", "Plant design flow (diversion right)", "Q", 120, "cfs")
ir.add("QML", "Plant design flow, ML/d", "Q_ML", "={Q}*2.447", "ML/d")
ir.add("QML2", "Plant design flow, ML/d (water-right report)", "Q_ML2", "={Q}/2.447", "ML/d",
       planted=("unit-scale", "cfs to ML/d divided by 2.447: wrong way round"))
ir.add("Qm3s", "Plant design flow, m³/s", "Q_SI", "={Q}*0.02832", "m³/s")
ir.add("n", "Pumps running at design flow", "n", 4, "-")
ir.add("Qp", "Flow per pump", "Q_p", "={Q}/{n}", "cfs")
ir.add("gpm", "Flow per pump, gpm", "Q_p,gpm", "={Qp}*448.8", "gpm")
ir.add("gpm2", "Flow per pump, gpm (pump bid form)", "Q_p,gpm2", "={Qp}*7.481", "gpm",
       planted=("unit-scale", "ft³ to gallons only: gal/s written as gpm, 60 too small"))
ir.add("QpML", "Flow per pump, ML/d", "Q_p,ML", "={QML}/{n}", "ML/d")
ir.heading("Heads")
ir.add("zf", "Forebay water surface", "z_f", 2412.0, "ft")
ir.add("zc", "Canal water surface at the discharge structure", "z_c", 2498.5, "ft")
ir.add("Hs", "Static lift", "H_s", "={zc}-{zf}", "ft")
ir.add("Din", "Discharge line inside diameter", "D_in", 66, "in")
ir.add("Dft", "Discharge line inside diameter, ft", "D", "={Din}/12", "ft")
ir.add("L", "Discharge line length", "L", 2600, "ft")
ir.add("f", "Darcy friction factor (lined steel)", "f", 0.013, "-")
ir.add("K", "Minor loss coefficients, sum (3 elbows, valve, tee, exit)", "ΣK", 2.55, "-")
ir.add("A", "Discharge line bore area", "A", "=PI()/4*{Dft}^2", "ft²")
ir.add("v", "Velocity in the discharge line", "v", "={Q}/{A}", "ft/s")
ir.add("hv", "Velocity head", "h_v", "={v}^2/(2*32.2)", "ft")
ir.add("hf", "Friction loss, discharge line", "h_f", "={f}*{L}/{Dft}*{hv}", "ft")
ir.add("hm", "Minor losses", "h_m", "={K}*{hv}", "ft")
ir.add("TDH", "Total dynamic head", "TDH", "={Hs}+{hf}+{hm}", "ft")
ir.add("Hm", "Total dynamic head, m", "TDH_SI", "={TDH}*0.3048", "m")
ir.add("Hpsi", "Total dynamic head as a pressure rise", "Δp", "={TDH}/2.31", "psi")
ir.add("Hpsi2", "Total dynamic head as a pressure rise (motor sizing memo)", "Δp_2",
       "={TDH}*2.31", "psi", planted=("unit-scale", "ft to psi multiplied by 2.31: wrong way round"))
ir.heading("Pump and motor")
ir.add("eta", "Pump efficiency at duty (Curve sheet)", "eta_p",
       "=VLOOKUP({gpm},Curve!A5:C10,3)", "%")
ir.add("bhp", "Pump brake horsepower", "P_b", "={gpm}*{TDH}/(3960*{eta}/100)", "hp")
ir.add("bhp2", "Pump brake horsepower (first draft)", "P_b2", "={gpm}*{TDH}/(3960*{eta})", "hp",
       planted=("unit-scale", "efficiency in % used as a fraction: 100 too small"))
ir.add("em", "Motor efficiency at load", "eta_m", 95.4, "%")
ir.add("Pin", "Motor input per pump", "P_in", "={bhp}*0.7457/({em}/100)", "kW")
ir.add("Pin2", "Motor input per pump (utility load letter)", "P_in2", "={bhp}/0.7457/({em}/100)",
       "kW", planted=("unit-scale", "hp to kW divided by 0.7457: wrong way round"))
ir.add("rho", "Water density", "rho", 998, "kg/m³")
ir.add("Psh", "Shaft power per pump, SI (check)", "P_sh",
       "={rho}*9.81*{Qm3s}/{n}*{Hm}/({eta}/100)/1000", "kW")
ir.add("Pst", "Station input at design flow", "P_st", "={n}*{Pin}", "kW")
ir.heading("Discharge header gauge and suction")
ir.add("zg", "Discharge header gauge elevation", "z_g", 2421.0, "ft")
ir.add("pg", "Discharge header pressure at design flow", "p_g", "=({zc}-{zg}+{hf}+{hm})/2.31",
       "psig")
ir.add("pb", "Site barometric pressure (2,410 ft)", "p_atm", 13.46, "psia")
ir.add("pa", "Discharge header pressure, absolute", "p_a", "={pg}+{pb}", "psia")
ir.add("pa2", "Discharge header pressure, absolute (transmitter datasheet)", "p_a2", "={pg}+14.7",
       "psia", planted=("offset-scale", "sea-level atmosphere added at a 2,410 ft site"))
ir.add("tw", "River water temperature, design", "t_w", 68, "°F")
ir.add("pv", "Vapour pressure of water at 68 °F", "p_v", 0.339, "psia")
ir.add("zs", "Submergence of the first-stage impeller eye", "z_s", 8.5, "ft")
ir.add("hl", "Intake and screen loss", "h_l", 0.6, "ft")
ir.add("NPSHa", "NPSH available", "NPSH_a", "=({pb}-{pv})*2.31+{zs}-{hl}", "ft")
ir.heading("Season")
ir.add("E", "Energy over the irrigation season (Season sheet)", "E", "=Season!C12", "MWh")
ir.add("V", "Water delivered over the season", "V", "=Season!B12*{QpML}/24", "ML")
ir.add("VAF", "Water delivered over the season, acre·ft", "V_AF", "={V}*0.8107", "acre·ft")
ir.add("SE", "Specific energy", "e", "={E}*1000/{VAF}", "kWh/acre·ft")
ir.add("price", "Energy charge (invented tariff)", "c_e", 0.085, "$/kWh")
ir.add("Ce", "Energy cost for the season", "C_e", "={E}*1000*{price}", "$")
ir.add("Ce2", "Energy cost for the season (board budget)", "C_e2", "={E}*{price}", "$",
       planted=("unit-scale", "$/kWh times MWh: 1000 too small"))
ir.add("dem", "Demand charge per kW per billing month (invented tariff)", "c_d", 11.50, "$/kW")
ir.add("mo", "Billing months in the season", "n_mo", 6, "-")
ir.add("Cd", "Demand cost for the season", "C_d", "={dem}*{Pst}*{mo}", "$")
ir.add("Ct", "Power cost for the season", "C_t", "={Ce}+{Cd}", "$")
PLANT = ir.finish()
Ir = ir.ref

SEASON = {
    "A1": "Lateral 4 plant: pump running hours by month (invented operating plan)",
    "A2": "Sources: as the Plant sheet; energy = pump-hours × motor input per pump (common "
          "practice).",
    "A3": CAUTION,
    "A4": "Month", "B4": "Pump running hours [h]", "C4": "Energy [MWh]",
    "A12": "Season", "B12": "=SUM(B5:B10)", "C12": "=SUM(C5:C10)",
}
for r, (m, h) in enumerate([("April", 1100), ("May", 2300), ("June", 2800), ("July", 2976),
                            ("August", 2600), ("September", 1200)], start=5):
    SEASON[f"A{r}"], SEASON[f"B{r}"] = m, h
    SEASON[f"C{r}"] = f"=B{r}*{Ir('Pin')}/1000"
SEASON["A13"] = "July (operator's estimate, not in the total)"
SEASON["C13"] = f"=B8*{Ir('Pin')}"           # planted: kWh written as MWh

CURVE = {
    "A1": "Lateral 4 pumps: vertical turbine, rated curve at 1180 rpm (invented catalogue)",
    "A3": CAUTION,
    "A4": "Flow [gpm]", "B4": "Head [ft]", "C4": "Efficiency [%]",
}
for r, row in enumerate([(8000, 112, 76), (10000, 106, 81), (12000, 99, 84), (13000, 95, 85),
                         (14000, 90, 84.5), (16000, 79, 80)], start=5):
    for c, v in zip("ABC", row):
        CURVE[f"{c}{r}"] = v

IRRB = {
    "trade": "irrigation: river pumping plant, heads, power and season energy cost",
    "sheets": [("Plant", PLANT), ("Season", SEASON), ("Curve", CURVE)],
    "planted": {**ir.planted,
                "Season!C13": ("unit-scale", "kW × h written as MWh: the /1000 missing")},
}

# --------------------------------------------------------------------------------------------
# Book 3: steel storage tank hydrotest and settlement survey (m, ft, mm, in, m², m³, gal, bbl,
# t, m/h, m³/h, gpm, bbl/h, h, MPa, psi, kPa(g), psig, psia, °C, °F, K, 1/K, mm/m)
# --------------------------------------------------------------------------------------------
TNK_SRC = (
    "Sources: hydrostatic test shell stress by the one-foot method, t_t = 4.9·D·(H − 0.3)/S_t "
    "(SI: mm, m, MPa) and t_t = 2.6·D·(H − 1)/S_t (US: in, ft, psi), API 650 (13th ed.) 5.6.3.2, "
    "allowable test stresses S_t from API 650 Table 5-2 (from memory); hoop stress σ = p·D/(2·t) "
    "(common practice); p = ρ·g·h, g = 9.81 m/s² (9.80665, SI Brochure 9th ed.); water density "
    "999.9 kg/m³ at 7 °C (from memory); settlement readings at not fewer than 8 equally spaced "
    "stations at each fill stage, API 650 7.3.6 and API 653 Annex B (from memory); carbon steel "
    "expansion 12 × 10⁻⁶ /K (ASME II-D, rounded, from memory); NIST SP 811 (2008) App. B.8: "
    "1 m = 3.281 ft, 1 in = 25.4 mm, 1 m³ = 264.2 US gal = 6.290 bbl, 1 bbl = 42 US gal, "
    "1 m³/h = 4.403 gpm, 1 MPa = 145.0 psi, 1 psi = 6.895 kPa; °F = 1.8·°C + 32; K = °C + 273.15. "
    "Terminal, tank, fill plan and readings invented.")
tk = ItemSheet("Hydrotest", "Eastwick Marine Terminal (invented): tank T-204 hydrostatic test, "
               "fill plan, shell stress and settlement", TNK_SRC)
tk.heading("Tank")
tk.add("D", "Nominal diameter (120 ft)", "D", 36.58, "m")
tk.add("HL", "Test water height", "H", 14.00, "m")
tk.add("t1", "First (bottom) shell course thickness, as built", "t_1", 22.0, "mm")
tk.add("Dft", "Nominal diameter, ft", "D_ft", "={D}*3.281", "ft")
tk.add("Hft", "Test water height, ft", "H_ft", "={HL}*3.281", "ft")
tk.add("A", "Tank floor area", "A", "=PI()/4*{D}^2", "m²")
tk.add("V", "Test water volume", "V", "={A}*{HL}", "m³")
tk.add("Vgal", "Test water volume, US gal", "V_gal", "={V}*264.2", "gal")
tk.add("Vbbl", "Test water volume, bbl", "V_bbl", "={Vgal}/42", "bbl")
tk.add("Vbbl2", "Test water volume, bbl (water permit)", "V_bbl2", "={Vgal}*42", "bbl",
       planted=("unit-scale", "gal to bbl multiplied by 42: wrong way round"))
tk.add("rho", "Test water density (river water, 7 °C)", "rho", 999.9, "kg/m³")
tk.add("M", "Mass of test water", "M", "={V}*{rho}/1000", "t")
tk.add("M2", "Mass of test water (foundation note)", "M_2", "={V}*{rho}", "t",
       planted=("unit-scale", "kg written as t: the /1000 missing"))
tk.heading("Fill")
tk.add("rise", "Maximum fill rate, liquid rise (owner's spec)", "r", 0.9, "m/h")
tk.add("Qf", "Maximum fill rate", "Q_f", "={A}*{rise}", "m³/h")
tk.add("Qfg", "Maximum fill rate, gpm", "Q_f,gpm", "={Qf}*4.403", "gpm")
tk.add("Qfg2", "Maximum fill rate, gpm (pump hire order)", "Q_f,gpm2", "={Qf}*264.2", "gpm",
       planted=("unit-scale", "gallons per hour written as gpm: 60 too large"))
tk.add("Qfb", "Maximum fill rate, bbl/h", "Q_f,bbl", "={Qf}*6.290", "bbl/h")
tk.add("np", "Fill pumps on hire", "n_p", 2, "-")
tk.add("Qp1", "Fill pump capacity, each", "Q_p", 2500, "gpm")
tk.add("Qeff", "Fill rate used", "Q_e", "=MIN({Qfg},{np}*{Qp1})", "gpm")
tk.add("tf", "Filling time", "t_f", "={V}/({Qeff}/4.403)", "h")
tk.add("tf2", "Filling time (test programme)", "t_f2", "={V}/{Qeff}", "h",
       planted=("unit-scale", "m³ over gpm without the 4.403: not hours"))
tk.add("hold", "Holds at 1/4, 1/2, 3/4 and full for settlement readings, total", "t_h", 36, "h")
tk.add("tt", "Fill and hold time", "t_t", "={tf}+{hold}", "h")
tk.heading("Shell stress, bottom course (API 650 one-foot method)")
tk.add("mat", "Shell plate material", "mat", "A516-70")
tk.add("St", "Allowable hydrostatic test stress (Materials sheet)", "S_t",
       "=VLOOKUP({mat},Materials!A5:C8,3,FALSE)", "MPa")
tk.add("S1", "Test stress, bottom course", "S_1", "=4.9*{D}*({HL}-0.3)/{t1}", "MPa")
tk.add("ratio", "Test stress as a share of the allowable", "u", "={S1}/{St}*100", "%")
tk.add("pH", "Water pressure 0.3 m above the bottom of the course", "p_h",
       "={rho}*9.81*({HL}-0.3)/1000", "kPa(g)")
tk.add("sig", "Hoop stress from p·D/(2·t) (check)", "σ", "={pH}*{D}/(2*{t1})", "MPa")
tk.add("sig2", "Hoop stress (checker's recalculation, D in mm)", "σ_2",
       "={pH}*{D}*1000/(2*{t1})", "MPa",
       planted=("unit-scale", "kPa·mm/mm is kPa, written as MPa: 1000 too large"))
tk.add("tin", "First shell course thickness, in", "t_1,in", "={t1}/25.4", "in")
tk.add("SUS", "Test stress, US units (check)", "S_1,US", "=2.6*{Dft}*({Hft}-1)/{tin}", "psi")
tk.add("SUS2", "Test stress, US units (vendor comparison)", "S_1,US2",
       "=2.6*{Dft}*({Hft}-1)/{t1}", "psi",
       planted=("unit-scale", "thickness in mm used as in: 25.4 too small"))
tk.heading("Bottom pressure")
tk.add("pb", "Water pressure on the bottom at full test height", "p_b", "={rho}*9.81*{HL}/1000",
       "kPa(g)")
tk.add("pbpsi", "Water pressure on the bottom, psig", "p_b,US", "={pb}/6.895", "psig")
tk.add("pbpsia", "Water pressure on the bottom, absolute (sea-level site)", "p_b,a",
       "={pbpsi}+14.7", "psia")
tk.add("pbpsia2", "Water pressure on the bottom, absolute (level transmitter datasheet)", "p_b,a2",
       "={pbpsi}", "psia", planted=("offset-scale", "gauge pressure written as absolute"))
tk.heading("Temperatures")
tk.add("tw", "Test water temperature", "t_w", 7, "°C")
tk.add("twF", "Test water temperature, °F", "t_w,F", "={tw}*1.8+32", "°F")
tk.add("TK", "Test water temperature, K (density correlation)", "T_w", "={tw}+273.15", "K")
tk.add("TK2", "Test water temperature, K (lab request)", "T_w2", "={tw}", "K",
       planted=("offset-scale", "°C reading written as kelvin"))
tk.add("te", "Shell temperature when the bottom course was surveyed", "t_e", 25, "°C")
tk.add("alpha", "Thermal expansion coefficient, carbon steel", "α", 0.000012, "1/K")
tk.add("dD", "Change of shell diameter, survey to test", "ΔD", "={alpha}*{D}*1000*({tw}-{te})",
       "mm")
tk.heading("Settlement (Survey sheet)")
tk.add("smax", "Largest settlement at full", "s_max", "=MAX(Survey!E5:E12)", "mm")
tk.add("smin", "Smallest settlement at full", "s_min", "=MIN(Survey!E5:E12)", "mm")
tk.add("tilt", "Out-of-level across the diameter", "i", "=({smax}-{smin})/{D}", "mm/m")
TANK = tk.finish()

SURVEY = {
    "A1": "T-204: shell settlement readings, before fill and at full test height (invented)",
    "A2": "Sources: as the Hydrotest sheet; settlement = elevation before − elevation at full, "
          "levelled to the terminal benchmark (common practice).",
    "A3": CAUTION,
    "A4": "Station", "B4": "Angle [°]", "C4": "Before fill [m]", "D4": "At full [m]",
    "E4": "Settlement [mm]",
}
before = [3.214, 3.209, 3.218, 3.221, 3.216, 3.211, 3.207, 3.212]
settle = [22, 25, 19, 18, 21, 27, 29, 24]
for i, (b, s) in enumerate(zip(before, settle)):
    r = 5 + i
    SURVEY[f"A{r}"], SURVEY[f"B{r}"] = f"S{i + 1}", 45 * i
    SURVEY[f"C{r}"], SURVEY[f"D{r}"] = b, round(b - s / 1000, 3)
    SURVEY[f"E{r}"] = f"=(C{r}-D{r})*1000"
SURVEY["A14"] = "S5 (field book, not in the range)"
SURVEY["E14"] = "=C9-D9"                    # planted: m written as mm

MATERIALS = {
    "A1": "Shell plate: allowable product design and hydrostatic test stresses (API 650 Table "
          "5-2, as recalled, from memory)",
    "A3": CAUTION,
    "A4": "Material", "B4": "S_d [MPa]", "C4": "S_t [MPa]",
}
for r, row in enumerate([("A283-C", 137, 154), ("A36", 160, 171), ("A516-70", 173, 195),
                         ("A573-70", 193, 208)], start=5):
    for c, v in zip("ABC", row):
        MATERIALS[f"{c}{r}"] = v

TNKB = {
    "trade": "storage tanks: hydrostatic test fill, shell stress and settlement survey",
    "sheets": [("Hydrotest", TANK), ("Survey", SURVEY), ("Materials", MATERIALS)],
    "planted": {**tk.planted,
                "Survey!E14": ("unit-scale", "elevations in m subtracted into a mm cell: 1000 too "
                                            "small")},
}

# --------------------------------------------------------------------------------------------
# Book 4: data centre UPS and battery room (kW, kVA, W, %, V, A, Ah, min, h, yr, m³/h, m³/Ah,
# mA/Ah, cfm, cm², 1/h, Btu/h, TR, °C, °F, Δ°C, Δ°F, m³/s)
# --------------------------------------------------------------------------------------------
DC_SRC = (
    "Sources: apparent power S = P/PF (common practice); battery power = load / inverter "
    "efficiency, per-cell power to the end voltage from the maker's constant-power table "
    "(IEEE 1184 and IEEE 485 practice, from memory); battery-room hydrogen ventilation "
    "Q = v·q·s·n·I_gas·C_rt·10⁻³ m³/h with v = 24, q = 0.42 × 10⁻³ m³/Ah, s = 5, I_gas = 1 mA/Ah "
    "for VRLA on float, and free opening A = 28·Q cm² (Q in m³/h), IEC 62485-2 (2010) sec. 7 "
    "(from memory); VRLA life halves for each 8 °C above 25 °C (common practice, maker's "
    "literature); recharge to 110 % of the charge removed (common practice); Q = ρ·c_p·V·Δt, "
    "standard air 1.2 kg/m³, c_p 1.006 kJ/(kg·K), and the US rule cfm = Btu/h/(1.08·ΔT(°F)), "
    "ASHRAE Handbook — Fundamentals (2017) (from memory); NIST SP 811 (2008) App. B.8: 1 kW = "
    "3412 Btu/h, 1 ton of refrigeration = 12 000 Btu/h = 3.517 kW, 1 m³/s = 2119 cfm, 1 m³/h = "
    "0.5886 cfm; °C = (°F − 32)/1.8. Data centre, UPS, battery and readings invented.")
dc = ItemSheet("UPS", "Northgate DC2 (invented): UPS room A, battery runtime, hydrogen "
               "ventilation and cooling", DC_SRC)
dc.heading("Critical load")
dc.add("P", "Critical IT load (design)", "P", 720, "kW")
dc.add("pf", "Load power factor", "PF", 0.95, "-")
dc.add("S", "Critical load, apparent", "S", "={P}/{pf}", "kVA")
dc.add("nm", "UPS modules installed (N+1)", "n_m", 4, "-")
dc.add("Sm", "UPS module rating", "S_m", 300, "kVA")
dc.add("ld", "Module loading, all modules sharing", "x", "={S}/({nm}*{Sm})*100", "%")
dc.add("ld2", "Module loading (commissioning sheet)", "x_2", "={S}/({nm}*{Sm})", "%",
       planted=("unit-scale", "a fraction written in a % cell: 100 too small"))
dc.add("ldN", "Module loading, one module out (N)", "x_N", "={S}/(({nm}-1)*{Sm})*100", "%")
dc.add("eta", "UPS efficiency at that loading (Data sheet)", "eta",
       "=VLOOKUP({ld},Data!A5:B8,2)", "%")
dc.add("Pin", "UPS input power", "P_in", "={P}/({eta}/100)", "kW")
dc.add("Pin2", "UPS input power (utility load letter)", "P_in2", "={P}/{eta}", "kW",
       planted=("unit-scale", "efficiency in % used as a fraction: 100 too small"))
dc.add("Pl", "UPS losses (heat to the room)", "P_l", "={Pin}-{P}", "kW")
dc.add("PlB", "UPS losses, Btu/h", "P_l,US", "={Pl}*3412", "Btu/h")
dc.add("PlT", "UPS losses, tons", "P_l,TR", "={PlB}/12000", "TR")
dc.add("PlT2", "UPS losses, tons (CRAC selection)", "P_l,TR2", "={Pl}*3.517", "TR",
       planted=("unit-scale", "kW to tons multiplied by 3.517: wrong way round"))
dc.heading("Battery, per UPS module")
dc.add("nc", "Cells per string", "n_c", 240, "-")
dc.add("ns", "Strings per module", "n_s", 2, "-")
dc.add("Vf", "Float voltage, per cell", "V_f", 2.25, "V")
dc.add("Ve", "End voltage, per cell", "V_e", 1.75, "V")
dc.add("Ah", "Capacity, 10 h rate, per string", "C_10", 200, "Ah")
dc.add("einv", "Inverter efficiency, battery to output", "eta_i", 96, "%")
dc.add("Vbus", "DC bus at float", "V_bus", "={nc}*{Vf}", "V")
dc.add("Pb", "Battery power per module, load shared by all modules", "P_b",
       "={P}/{nm}/({einv}/100)", "kW")
dc.add("Pc", "Battery power per cell", "P_c", "={Pb}*1000/({nc}*{ns})", "W")
dc.add("trun", "Runtime to 1.75 V per cell, table row not exceeded (Data sheet)", "t_r",
       "=INDEX(Data!D5:D9,MATCH({Pc},Data!E5:E9,-1))", "min")
dc.add("I", "Battery current at end voltage, per module", "I", "={Pb}*1000/({nc}*{Ve})", "A")
dc.add("I2", "Battery current at end voltage (breaker sizing)", "I_2", "={Pb}/({nc}*{Ve})", "A",
       planted=("unit-scale", "kW over V gives kA, written as A: 1000 too small"))
dc.add("Is", "Battery current per string", "I_s", "={I}/{ns}", "A")
dc.add("Ahr", "Charge removed per string in the runtime", "Q_r", "={Is}*{trun}/60", "Ah")
dc.add("Ahr2", "Charge removed per string (recharge memo)", "Q_r2", "={Is}*{trun}", "Ah",
       planted=("unit-scale", "minutes used as hours: 60 too large"))
dc.add("dod", "Depth of discharge against the 10 h capacity", "DoD", "={Ahr}/{Ah}*100", "%")
dc.add("Irc", "Recharge current limit, per string", "I_rc", 20, "A")
dc.add("trc", "Time to recharge (110 % of charge removed)", "t_rc", "={Ahr}*1.1/{Irc}", "h")
dc.heading("Battery room temperature and life")
dc.add("tb", "Battery room design maximum", "t_b", 30, "°C")
dc.add("tref", "Rated temperature of the battery", "t_ref", 25, "°C")
dc.add("dth", "Temperature rise that halves VRLA life", "ΔT_h", 8, "Δ°C")
dc.add("L25", "Design life at 25 °C", "L_25", 10, "yr")
dc.add("Lt", "Expected life at the room design maximum", "L_t",
       "={L25}/2^(({tb}-{tref})/{dth})", "yr")
dc.heading("Hydrogen ventilation, battery room (IEC 62485-2)")
dc.add("nall", "Cells in the room", "n", "={nc}*{ns}*{nm}", "-")
dc.add("v", "Dilution factor (4 % H2 limit)", "v", 24, "-")
dc.add("q", "Hydrogen generated per ampere-hour", "q", 0.00042, "m³/Ah")
dc.add("s", "Safety factor", "s", 5, "-")
dc.add("Ig", "Gas-producing current, VRLA on float", "I_gas", 1, "mA/Ah")
dc.add("Qh", "Ventilation air required", "Q_v", "={v}*{q}*{s}*{nall}*{Ig}*{Ah}/1000", "m³/h")
dc.add("Qh2", "Ventilation air required (exhaust fan schedule)", "Q_v2",
       "={v}*{q}*{s}*{nall}*{Ig}*{Ah}", "m³/h",
       planted=("unit-scale", "mA/Ah × Ah taken as A: the 10⁻³ missing, 1000 too large"))
dc.add("Qhc", "Ventilation air required, cfm", "Q_v,US", "={Qh}*0.5886", "cfm")
dc.add("Qhc2", "Ventilation air required, cfm (US fan selection)", "Q_v,US2", "={Qh}*35.31",
       "cfm", planted=("unit-scale", "ft³/h written as cfm: 60 too large"))
dc.add("Aop", "Free area of each opening, natural ventilation", "A_o", "=28*{Qh}", "cm²")
dc.add("Vr", "Battery room volume", "V_r", 336, "m³")
dc.add("ach", "Air changes required", "ACH", "={Qh}/{Vr}", "1/h")
dc.heading("Cooling, UPS room")
dc.add("Plt", "Lighting, chargers and controls", "P_lt", 1.2, "kW")
dc.add("Qc", "Room sensible cooling load", "Q_c", "={Pl}+{Plt}", "kW")
dc.add("QcT", "Room sensible cooling load, tons", "Q_c,TR", "={Qc}/3.517", "TR")
dc.add("dT", "CRAC return-to-supply temperature difference", "ΔT", 11, "Δ°C")
dc.add("rho", "Standard air density", "rho", 1.2, "kg/m³")
dc.add("cp", "Specific heat of air", "c_p", 1.006, "kJ/(kg·K)")
dc.add("Va", "CRAC airflow", "V_a", "={Qc}/({rho}*{cp}*{dT})", "m³/s")
dc.add("Vacfm", "CRAC airflow, cfm", "V_a,US", "={Va}*2119", "cfm")
dc.add("dTF", "CRAC temperature difference, °F", "ΔT_F", "={dT}*1.8", "Δ°F")
dc.add("Vchk", "CRAC airflow by the US rule (check)", "V_a,chk", "={Qc}*3412/(1.08*{dTF})",
       "cfm")
dc.add("Vacfm2", "CRAC airflow by the US rule (first draft)", "V_a,2", "={Qc}*3412/(1.08*{dT})",
       "cfm", planted=("unit-scale", "a °C difference in the °F rule: 1.8 too large"))
dc.add("tRF", "CRAC return air limit (US datasheet)", "t_R,F", 95, "°F")
dc.add("tRC", "CRAC return air limit, °C", "t_R", "=({tRF}-32)/1.8", "°C")
dc.add("tRC2", "CRAC return air limit, °C (alarm setpoint list)", "t_R2", "={tRF}/1.8", "°C",
       planted=("offset-scale", "°F to °C without the 32"))
UPS = dc.finish()

DATA = {
    "A1": "UPS module efficiency and battery constant-power table (invented catalogue data)",
    "A3": CAUTION,
    "A4": "Load [%]", "B4": "Efficiency [%]",
    "D4": "Runtime [min]", "E4": "Power per cell to 1.75 V, 25 °C [W]",
}
for r, (x, e) in enumerate([(25, 94.0), (50, 95.8), (75, 96.2), (100, 96.0)], start=5):
    DATA[f"A{r}"], DATA[f"B{r}"] = x, e
for r, (m, w) in enumerate([(5, 820), (10, 560), (15, 440), (20, 360), (30, 270)], start=5):
    DATA[f"D{r}"], DATA[f"E{r}"] = m, w

DCB = {
    "trade": "data centres: UPS loading, battery runtime, hydrogen ventilation and cooling",
    "sheets": [("UPS", UPS), ("Data", DATA)],
    "planted": dc.planted,
}

BOOKS = {"kitchen-gas-ventilation": KITB, "irrigation-pumping-plant": IRRB,
         "tank-hydrotest-settlement": TNKB, "datacentre-ups-battery": DCB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()
