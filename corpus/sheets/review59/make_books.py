#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review59), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; pattern after
corpus/sheets/review55/make_books.py.

Trades: a hospital's medical-surgical vacuum plant; a wastewater lift station with its force
main; a grain bin's aeration fan and in-bin drying; a cold-formed steel wall stud under wind.
All scenarios, sites, firms, readings and maker's data are invented (demonstration only); the
formulas and published factors are the trade's own, with their sources named in a text cell at
the top of each sheet ("from memory" where recalled and not checked, "common practice" for a
fact of the trade with no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and
its messages that mislead, are recorded in review_notes.py after running the round's build.

Run: python3 make_books.py  ->  *.xlsx, *.cells.plumb and *.expect in this folder (nothing
written elsewhere)
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
# Book 1: hospital medical-surgical vacuum plant (scfm, acfm, L/min, m³/h, inHg, kPa, kPa(g),
# psia, °F, hp, kW, W, Btu/h, cfm, US gal, L, ft³, in, ft², fpm, m/s, min, s, %)
# --------------------------------------------------------------------------------------------
VAC_SRC = (
    "Sources: 1 inHg (32 °F) = 3.386 kPa = 0.4912 psi, 1 ft³ = 28.32 L = 7.481 US gal, "
    "1 US gal = 3.785 L, 1 hp = 0.7457 kW, 1 kW = 3412 Btu/h, 1 cfm = 1.699 m³/h, "
    "1 ft/min = 0.00508 m/s (NIST SP 811 (2008) App. B.8); °R = °F + 459.67 (NIST SP 811); "
    "scfm at 60 °F and 29.92 inHg (common practice; the pump maker's basis must be checked); "
    "actual inlet flow = standard flow × (p_std/p_abs) × (T/T_std) (ideal gas, common "
    "practice); absolute pressure = site barometer − vacuum (common practice); NFPA 99 (2021) "
    "ch. 5: source set at about 19 inHg, at least 12 inHg at the most remote inlet, peak "
    "demand met with the largest pump out of service (from memory); pump-down time "
    "t = V/S·ln(p_1/p_2) for a constant speed S (common practice, vacuum textbooks, from "
    "memory); ventilation cfm = Btu/h / (1.08·ΔT °F) (ASHRAE Handbook, Fundamentals (2021), "
    "ch. 18, from memory); 4 in Type L copper, bore 3.857 in (ASTM B88, from memory). "
    "Hospital, plant, maker's data and readings invented.")
vp = ItemSheet("Plant", "St Aldric's Hospital (invented): medical-surgical vacuum plant, "
               "triplex rotary-vane pumps and receiver, design check", VAC_SRC)
vp.heading("Demand")
vp.add("Q", "Peak demand at the source, standard (Zones sheet)", "Q_s", "=Zones!E10", "scfm")
vp.add("QL", "Peak demand, free air (metric schedule)", "Q_L", "={Q}*28.32", "L/min")
vp.heading("Pressures at the source")
vp.add("pb", "Site barometer, design (850 ft above sea level)", "p_b", 29.0, "inHg")
vp.add("pbk", "Site barometer, kPa", "p_b,k", "={pb}*3.386", "kPa")
vp.add("vac", "Operating vacuum at the receiver (lag pump start)", "v", 19, "inHg")
vp.add("vco", "Cut-out vacuum at the receiver (lead pump stops)", "v_co", 22, "inHg")
vp.add("pa", "Absolute pressure at the receiver, operating", "p_a", "={pb}-{vac}", "inHg")
vp.add("pak", "Absolute pressure at the receiver, kPa", "p_a,k", "={pa}*3.386", "kPa")
vp.add("pak2", "Absolute pressure at the receiver, kPa (first draft)", "p_a,k2",
       "={vac}*3.386", "kPa",
       planted=("offset-scale", "a vacuum reading converted and written as an absolute pressure"))
vp.add("pak3", "Absolute pressure at the receiver, kPa (metric schedule)", "p_a,k3",
       "=101.325-3.386*{vac}", "kPa",
       planted=("offset-scale", "the sea-level atmosphere where the site's barometer (29.0 inHg "
                                "= 98.2 kPa) belongs"))
vp.add("vk", "Operating vacuum, metric gauge (below atmosphere)", "p_g", "=-{vac}*3.386",
       "kPa(g)")
vp.add("papsi", "Absolute pressure at the receiver, psia", "p_a,US", "={pa}*0.4912", "psia")
vp.add("pco", "Absolute pressure at cut-out", "p_co", "={pb}-{vco}", "inHg")
vp.heading("Pump capacity")
vp.add("pstd", "Standard atmosphere of the scfm basis", "p_std", 29.92, "inHg")
vp.add("tstd", "Standard temperature of the scfm basis", "t_std", 60, "°F")
vp.add("tin", "Air temperature at the pump inlet", "t_in", 70, "°F")
vp.add("acfm", "Peak demand, actual at the pump inlet", "Q_a",
       "={Q}*({pstd}/{pa})*(({tin}+459.67)/({tstd}+459.67))", "acfm")
vp.add("acfm2", "Peak demand, actual at the pump inlet (first draft)", "Q_a2",
       "={Q}*({pstd}/{pa})*({tin}/{tstd})", "acfm",
       planted=("offset-scale", "°F readings in a temperature ratio: °R belongs"))
vp.add("Qm3h", "Peak demand, actual, m³/h (European pump maker)", "Q_a,m", "={acfm}*1.699",
       "m³/h")
vp.add("n", "Pumps installed", "n", 3, "-")
vp.add("S", "Capacity needed per pump, largest out of service", "S", "={acfm}/({n}-1)", "acfm")
vp.heading("Motors and heat to the plant room")
vp.add("hp", "Motor nameplate, each pump (maker, invented)", "P_hp", 10, "hp")
vp.add("kW", "Motor nameplate, each pump, kW", "P_m", "={hp}*0.7457", "kW")
vp.add("kW2", "Motor nameplate, each pump, kW (first draft)", "P_m2", "={hp}/0.7457", "kW",
       planted=("unit-scale", "hp to kW divided by 0.7457: wrong way round"))
vp.add("etam", "Motor efficiency at full load (maker, invented)", "η_m", 91.7, "%")
vp.add("Pin", "Electrical input per running pump", "P_in", "={kW}/({etam}/100)", "kW")
vp.add("Pin2", "Electrical input per running pump (first draft)", "P_in2", "={kW}/{etam}",
       "kW", planted=("unit-scale", "an efficiency in % used as a fraction: 100 too small"))
vp.add("Pcp", "Control panel, dryers and drain heaters (maker, invented)", "P_cp", 450, "W")
vp.add("Qr", "Heat released in the plant room at peak", "Q_r", "=({n}-1)*{Pin}+{Pcp}/1000",
       "kW")
vp.add("Qr2", "Heat released in the plant room at peak (first draft)", "Q_r2",
       "=({n}-1)*{Pin}+{Pcp}", "kW", planted=("unit-scale", "W added to kW"))
vp.add("QrB", "Heat released, Btu/h (US ventilation contractor)", "Q_r,US", "={Qr}*3412",
       "Btu/h")
vp.add("dT", "Temperature rise allowed across the plant room", "ΔT", 15, "°F")
vp.add("dTK", "Temperature rise allowed, K", "ΔT_K", "={dT}/1.8", "K")
vp.add("dTK2", "Temperature rise allowed, K (first draft)", "ΔT_K2", "=({dT}-32)/1.8", "K",
       planted=("offset-scale", "the 32 of the °F scale taken from a temperature difference"))
vp.add("Vv", "Plant room ventilation air", "V_v", "={QrB}/(1.08*{dT})", "cfm")
vp.add("Vvm", "Plant room ventilation air, m³/h", "V_v,m", "={Vv}*1.699", "m³/h")
vp.heading("Receiver")
vp.add("Vg", "Receiver volume (maker, invented)", "V_r", 400, "US gal")
vp.add("VL", "Receiver volume, L", "V_r,L", "={Vg}*3.785", "L")
vp.add("Vft", "Receiver volume, ft³", "V_r,ft", "={Vg}/7.481", "ft³")
vp.add("tpd", "Pump-down time of the receiver, one pump, no demand", "t_pd",
       "={Vft}/{S}*LN({pa}/{pco})", "min")
vp.add("tpds", "Pump-down time, s (controls engineer)", "t_pd,s", "={tpd}*60", "s")
vp.add("tpds2", "Pump-down time, s (first draft)", "t_pd,s2", "={Vft}/{S}*LN({pa}/{pco})",
       "s", planted=("unit-scale", "ft³ over acfm gives minutes, written as seconds"))
vp.heading("Main to the pumps")
vp.add("d", "Main bore, 4 in Type L copper", "d", 3.857, "in")
vp.add("A", "Main bore area", "A", "=PI()*{d}^2/4/144", "ft²")
vp.add("v", "Air velocity in the main at peak, actual", "v", "={acfm}/{A}", "fpm")
vp.add("v2", "Air velocity in the main at peak (first draft)", "v_2",
       "={acfm}/(PI()*{d}^2/4)", "fpm",
       planted=("unit-scale", "an area in in² where ft² belongs: 144 too small"))
vp.add("vm", "Air velocity in the main, m/s", "v_m", "={v}*0.00508", "m/s")
VACS = vp.finish()

ZONES = {
    "A1": "St Aldric's Hospital medical-surgical vacuum: design demand by zone (outlet counts "
          "invented; flows and simultaneous use after NFPA 99 (2021) Annex B, from memory)",
    "A2": "Sources: demand = outlets × flow per outlet × simultaneous use (NFPA 99 (2021) "
          "Annex B, from memory); 1 ft³ = 28.32 L (NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Zone", "B5": "Outlets or rooms [-]", "C5": "Flow per outlet [scfm]",
    "D5": "Simultaneous use [%]", "E5": "Demand [scfm]", "F5": "Demand [L/min]",
    "A10": "Total", "E10": "=SUM(E6:E9)", "F10": "=SUM(F6:F9)",
}
for r, (zone, n, q, u) in enumerate([("Operating rooms (per room)", 12, 3.5, 100),
                                     ("Intensive care beds", 30, 1.0, 50),
                                     ("Emergency bays", 20, 1.0, 50),
                                     ("Ward outlets", 180, 0.25, 10)], start=6):
    ZONES[f"A{r}"], ZONES[f"B{r}"], ZONES[f"C{r}"], ZONES[f"D{r}"] = zone, n, q, u
    ZONES[f"E{r}"] = f"=B{r}*C{r}*D{r}/100"
    ZONES[f"F{r}"] = f"=E{r}*28.32"
ZONES["F8"] = "=E8/28.32"
ZONES_PLANTED = {"Zones!F8": ("unit-scale", "scfm to L/min divided by 28.32: wrong way round")}

VACB = {
    "trade": "health-care building services: medical-surgical vacuum plant",
    "sheets": [("Plant", VACS), ("Zones", ZONES)],
    "planted": {**vp.planted, **ZONES_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 2: wastewater lift station and force main (US gal/d, gpm, L/s, m³/s, in, m, ft, ft/s,
# ft/s², kg/m³, %, hp, kW, W, kWh/d, min, h/d, h, US gal, m³, ft²)
# --------------------------------------------------------------------------------------------
LS_SRC = (
    "Sources: 1 gpm = 0.06309 L/s, 1 in = 0.0254 m, 1 ft = 0.3048 m, 1 hp = 0.7457 kW, "
    "1 ft³ = 7.481 US gal (NIST SP 811 (2008) App. B.8); 100 US gal per person per day and "
    "the peaking factor (18 + √P)/(4 + √P), P in thousands (Recommended Standards for "
    "Wastewater Facilities ('Ten States Standards', 2014), from memory); force main at least "
    "2 ft/s (same, from memory); v (ft/s) = 0.4085·gpm/d² with d in inches (common practice); "
    "Hazen-Williams h_f = 10.44·L·Q^1.85/(C^1.85·d^4.87) with ft, gpm, in, and "
    "h_f = 10.67·L·Q^1.852/(C^1.852·d^4.8704) with m, m³/s, m (common practice, from memory); "
    "minor losses ΣK·v²/(2g), g = 32.2 ft/s² (Crane TP-410 (2013), from memory); "
    "bhp = gpm·ft/(3960·η) for SG 1 (Hydraulic Institute, common practice); P = ρ·g·Q·H/η, "
    "g_n = 9.81 m/s² (SI Brochure 9th ed.); minimum cycle time T = 4V/Q at inflow Q/2 "
    "(common practice). Town, station, pumps and readings invented.")
ls = ItemSheet("Station", "Kestle Brook (invented): lift station 3, duplex submersible pumps "
               "and 8 in force main to the Mill Lane manhole, design check", LS_SRC)
ls.heading("Flows")
ls.add("pop", "Population served, design year", "P", 2000, "-")
ls.add("q", "Wastewater per person per day", "q", 100, "US gal/d")
ls.add("ADFd", "Average daily flow", "Q_ad", "={pop}*{q}", "US gal/d")
ls.add("ADF", "Average daily flow, gpm", "Q_a", "={ADFd}/1440", "gpm")
ls.add("PF", "Peaking factor", "PF", "=(18+SQRT({pop}/1000))/(4+SQRT({pop}/1000))", "-")
ls.add("PHF", "Peak hourly flow", "Q_ph", "={ADF}*{PF}", "gpm")
ls.add("Qp", "Pump rated flow, one pump (firm capacity)", "Q_p", 500, "gpm")
ls.add("QpL", "Pump rated flow, L/s", "Q_p,L", "={Qp}*0.06309", "L/s")
ls.add("QpL2", "Pump rated flow, L/s (first draft)", "Q_p,L2", "={Qp}*15.85", "L/s",
       planted=("unit-scale", "gpm to L/s multiplied by 15.85: wrong way round"))
ls.add("Qps", "Pump rated flow, m³/s", "Q_p,s", "={QpL}/1000", "m³/s")
ls.heading("Force main")
ls.add("d", "Force main bore, 8 in PVC DR18 (from memory)", "d", 7.98, "in")
ls.add("dm", "Force main bore, m", "d_m", "={d}*0.0254", "m")
ls.add("L", "Force main length", "L", 3200, "ft")
ls.add("Lm", "Force main length, m", "L_m", "={L}*0.3048", "m")
ls.add("C", "Hazen-Williams C (PVC, aged allowance)", "C", 120, "-")
ls.add("v", "Velocity in the force main at the rated flow", "v", "=0.4085*{Qp}/{d}^2", "ft/s")
ls.add("zw", "Wet well pump-off level (elevation)", "z_w", 612.0, "ft")
ls.add("zd", "Force main high point (elevation)", "z_d", 668.0, "ft")
ls.add("Hs", "Static head", "H_s", "={zd}-{zw}", "ft")
ls.add("hf", "Friction loss, Hazen-Williams", "h_f",
       "=10.44*{L}*{Qp}^1.85/({C}^1.85*{d}^4.87)", "ft")
ls.add("hfm", "Friction loss, Hazen-Williams in SI (check)", "h_f,m",
       "=10.67*{Lm}*{Qps}^1.852/({C}^1.852*{dm}^4.8704)", "m")
ls.add("hf2", "Friction loss (metric contractor's sheet)", "h_f2",
       "=10.44*{L}*{QpL}^1.85/({C}^1.85*{d}^4.87)", "ft",
       planted=("unit-scale", "the US Hazen-Williams form fed the flow in L/s"))
ls.add("K", "Fittings, valves and exit, sum of K", "ΣK", 12, "-")
ls.add("hm", "Minor losses", "h_m", "={K}*{v}^2/(2*32.2)", "ft")
ls.add("hm2", "Minor losses (first draft)", "h_m2", "={K}*{v}^2/(2*9.81)", "ft",
       planted=("gravity-number", "g in m/s² beside a velocity in ft/s"))
ls.add("TDH", "Total dynamic head", "TDH", "={Hs}+{hf}+{hm}", "ft")
ls.add("TDHm", "Total dynamic head, m", "TDH_m", "={TDH}*0.3048", "m")
ls.add("TDHm2", "Total dynamic head, m (first draft)", "TDH_m2", "={TDH}*3.281", "m",
       planted=("unit-scale", "ft to m multiplied by 3.281: wrong way round"))
ls.heading("Pump power")
ls.add("eta", "Pump efficiency at the rated point (maker, invented)", "η", 68, "%")
ls.add("bhp", "Pump shaft power", "bhp", "={Qp}*{TDH}/(3960*{eta}/100)", "hp")
ls.add("bhp2", "Pump shaft power (first draft)", "bhp_2", "={Qp}*{TDH}/(3960*{eta})", "hp",
       planted=("unit-scale", "an efficiency in % used as a fraction: 100 too small"))
ls.add("Psh", "Pump shaft power, kW", "P_sh", "={bhp}*0.7457", "kW")
ls.add("rho", "Density of raw wastewater (taken as water at 15 °C)", "ρ", 999, "kg/m³")
ls.add("PshSI", "Pump shaft power, kW (SI check)", "P_sh,SI",
       "={rho}*9.81*{Qps}*{TDHm}/({eta}/100)/1000", "kW")
ls.add("PshSI2", "Pump shaft power, kW (first draft)", "P_sh,SI2",
       "={rho}*9.81*{Qps}*{TDHm}/({eta}/100)", "kW",
       planted=("unit-scale", "ρ·g·Q·H in W written as kW: the /1000 missing"))
ls.add("etam", "Motor efficiency (maker, invented)", "η_m", 90, "%")
ls.add("Pin", "Electrical input, one pump", "P_in", "={Psh}/({etam}/100)", "kW")
ls.heading("Wet well and cycling")
ls.add("T", "Minimum cycle time, one pump (6 starts per hour, maker)", "T", 10, "min")
ls.add("Vww", "Active volume between pump-on and pump-off", "V", "={T}*{Qp}/4", "US gal")
ls.add("Dww", "Wet well diameter", "D", 8, "ft")
ls.add("Aww", "Wet well plan area", "A", "=PI()*{Dww}^2/4", "ft²")
ls.add("hww", "Pump-on to pump-off depth", "h", "={Vww}/(7.481*{Aww})", "ft")
ls.add("hww2", "Pump-on to pump-off depth (first draft)", "h_2", "={Vww}*7.481/{Aww}", "ft",
       planted=("unit-scale", "US gal to ft³ multiplied by 7.481: wrong way round"))
ls.add("Tad", "Cycle time at the average daily flow", "T_ad",
       "={Vww}/{ADF}+{Vww}/({Qp}-{ADF})", "min")
ls.add("trun", "Pump running time per day", "t_run", "={ADFd}/{Qp}/60", "h/d")
ls.add("trun2", "Pump running time per day (first draft)", "t_run2", "={ADFd}/{Qp}", "h/d",
       planted=("unit-scale", "gal/d over gpm gives min/d, written as h/d"))
ls.add("Paux", "Wet well fan, controls and heater (invented)", "P_aux", 750, "W")
ls.add("E", "Electricity per day", "E", "={Pin}*{trun}+{Paux}/1000*24", "kWh/d")
ls.add("E2", "Electricity per day (first draft)", "E_2", "={Pin}*{trun}+{Paux}*24", "kWh/d",
       planted=("unit-scale", "Wh/d added to kWh/d"))
ls.heading("Detention in the force main (septicity)")
ls.add("Vfm", "Force main volume", "V_fm", "=PI()*({d}/12)^2/4*{L}*7.481", "US gal")
ls.add("tdet", "Detention time at the average daily flow", "t_det", "={Vfm}/{ADF}/60", "h")
ls.add("tdet2", "Detention time at the average daily flow (first draft)", "t_det2",
       "={Vfm}/{ADF}", "h",
       planted=("unit-scale", "gal over gpm gives minutes, written as hours"))
LSS = ls.finish()

_L, _Q, _C, _d, _K, _Hs = (ls.ref("L"), ls.ref("Qp"), ls.ref("C"), ls.ref("d"), ls.ref("K"),
                           ls.ref("Hs"))
SYSC = {
    "A1": "Kestle Brook lift station 3: system curve of the force main (invented levels; "
          "Hazen-Williams, C as on the Station sheet)",
    "A2": "Sources: h_f = 10.44·L·Q^1.85/(C^1.85·d^4.87), ft, gpm, in; v = 0.4085·gpm/d²; "
          "ΣK·v²/(2·32.2) (common practice, from memory).",
    "A3": CAUTION,
    "A5": "Point", "B5": "Flow [gpm]", "C5": "Losses [ft]", "D5": "TDH [ft]",
}
for r, (pt, q) in enumerate([("Shut-off", 0), ("Half flow", 250), ("Rated", 500),
                             ("Two pumps (run-out check)", 750)], start=6):
    SYSC[f"A{r}"], SYSC[f"B{r}"] = pt, q
    SYSC[f"C{r}"] = (f"=10.44*{_L}*B{r}^1.85/({_C}^1.85*{_d}^4.87)"
                     f"+{_K}*(0.4085*B{r}/{_d}^2)^2/(2*32.2)")
    SYSC[f"D{r}"] = f"={_Hs}+C{r}"

LSB = {
    "trade": "municipal wastewater: lift station, force main, pumps and wet well",
    "sheets": [("Station", LSS), ("System", SYSC)],
    "planted": dict(ls.planted),
}

# --------------------------------------------------------------------------------------------
# Book 3: grain bin aeration and in-bin drying (ft, ft², ft³, bu, lb/bu, kg/hL, lb, t, bu/t,
# cfm/bu, cfm, m³/s, cfm/ft², in. w.c., in. w.c./ft, Pa, Pa/m, hp, kW, h, °F, °C, K, Btu/h,
# Btu/US gal, US gal/h, %, lb/ft³, lb/h, lb/lb, d)
# --------------------------------------------------------------------------------------------
GR_SRC = (
    "Sources: 1 US bushel = 2150.42 in³ = 35.24 L = 1.2445 ft³ (0.8036 bu/ft³), 1 ft³ = "
    "0.02832 m³, 1 cfm = 0.0004719 m³/s, 1 in. w.c. (60 °F) = 249.1 Pa, 1 hp = 0.7457 kW, "
    "1 lb = 0.4536 kg, 1 lb/bu = 1.2872 kg/hL, 1 kW = 3412 Btu/h (NIST SP 811 (2008) "
    "App. B.8); shelled corn 56 lb/bu (USDA standard bushel, common practice); °C = (°F − "
    "32)/1.8 (NIST SP 811); airflow resistance of shelled corn (ASABE D272 (Shedd's data), "
    "rounded, from memory, Shedd sheet), times 1.5 for packing and fines (common practice); "
    "air hp = cfm·in. w.c./6356 (AMCA, common practice); aeration cooling time ≈ 15/(cfm/bu) "
    "hours (university extension guides, common practice, from memory); sensible heat "
    "Btu/h = 1.08·cfm·ΔT °F (ASHRAE Handbook, Fundamentals (2021), ch. 18, from memory); "
    "propane 91,500 Btu/US gal (common practice); shrink = (M_i − M_f)/(100 − M_f) wet basis "
    "(common practice); air 0.075 lb/ft³ (common practice). Farm, bin, fans and readings "
    "invented. The bushel is declared in the book's sidecar (measure bu = 35.2391 L).")
gb = ItemSheet("Bin", "Marlow Flats Co-op (invented): bin 4, 36 ft diameter, shelled corn, "
               "aeration fan and in-bin drying with supplemental heat, design check", GR_SRC)
gb.heading("Bin and grain")
gb.add("D", "Bin diameter", "D", 36, "ft")
gb.add("h", "Grain depth, levelled", "h", 28, "ft")
gb.add("A", "Floor area", "A", "=PI()*{D}^2/4", "ft²")
gb.add("V", "Grain volume", "V", "={A}*{h}", "ft³")
gb.add("bu", "Bin capacity", "N_bu", "={V}*0.8036", "bu")
gb.add("bu2", "Bin capacity (first draft)", "N_bu2", "={V}*1.2445", "bu",
       planted=("unit-scale", "ft³ to bu multiplied by 1.2445: wrong way round"))
gb.add("TW", "Test weight, shelled corn", "TW", 56, "lb/bu")
gb.add("TWm", "Test weight, kg/hL (export buyer)", "TW_m", "={TW}*1.2872", "kg/hL")
gb.add("m", "Grain in the bin", "m", "={bu}*{TW}", "lb")
gb.add("mt", "Grain in the bin, tonnes", "m_t", "={m}*0.0004536", "t")
gb.add("mt2", "Grain in the bin, tonnes (first draft)", "m_t2", "={m}*0.4536", "t",
       planted=("unit-scale", "lb to kg written as tonnes: the /1000 missing"))
gb.add("but", "Bushels per tonne", "n_t", "={bu}/{mt}", "bu/t")
gb.heading("Aeration fan")
gb.add("ra", "Aeration airflow rate", "r_a", 0.10, "cfm/bu")
gb.add("Qa", "Aeration airflow", "Q_a", "={ra}*{bu}", "cfm")
gb.add("Qas", "Aeration airflow, m³/s", "Q_a,s", "={Qa}*0.0004719", "m³/s")
gb.add("qf", "Airflow per floor area", "q_f", "={Qa}/{A}", "cfm/ft²")
gb.add("dpf", "Resistance of the corn at that airflow (Shedd sheet)", "Δp_ft",
       "=VLOOKUP({qf},Shedd!A6:C11,2,TRUE)", "in. w.c./ft")
gb.add("PF", "Packing factor", "F_p", 1.5, "-")
gb.add("SPd", "Duct, perforated floor and transition loss", "Δp_d", 0.3, "in. w.c.")
gb.add("SP", "Fan static pressure", "SP", "={dpf}*{h}*{PF}+{SPd}", "in. w.c.")
gb.add("SPPa", "Fan static pressure, Pa", "SP_Pa", "={SP}*249.1", "Pa")
gb.add("SPPa2", "Fan static pressure, Pa (first draft)", "SP_Pa2", "={SP}/249.1", "Pa",
       planted=("unit-scale", "in. w.c. to Pa divided by 249.1: wrong way round"))
gb.add("ahp", "Fan air power", "P_air", "={Qa}*{SP}/6356", "hp")
gb.add("ahp2", "Fan air power (first draft)", "P_air2", "={Qa}*{SPPa}/6356", "hp",
       planted=("unit-scale", "the pressure in Pa where in. w.c. belongs beside 6356"))
gb.add("etaf", "Fan efficiency at duty (maker, invented)", "η_f", 55, "%")
gb.add("bhp", "Fan shaft power", "P_sh", "={ahp}/({etaf}/100)", "hp")
gb.add("kW", "Fan shaft power, kW", "P_kW", "={bhp}*0.7457", "kW")
gb.add("kWSI", "Fan shaft power, kW (SI check)", "P_SI", "={Qas}*{SPPa}/({etaf}/100)/1000",
       "kW")
gb.add("tc", "Time for one cooling front through the bin", "t_c", "=15/{ra}", "h")
gb.heading("In-bin drying with supplemental heat")
gb.add("Qd", "Drying fans, two at duty (maker, invented)", "Q_d", 24000, "cfm")
gb.add("rd", "Drying airflow rate", "r_d", "={Qd}/{bu}", "cfm/bu")
gb.add("tF", "Outdoor air, design for October", "t_o", 50, "°F")
gb.add("tC", "Outdoor air, °C", "t_o,C", "=({tF}-32)/1.8", "°C")
gb.add("tC2", "Outdoor air, °C (first draft)", "t_o,C2", "={tF}-32", "°C",
       planted=("unit-scale", "°F to °C with the /1.8 missing"))
gb.add("dTF", "Temperature rise across the heater", "ΔT", 10, "°F")
gb.add("tpl", "Plenum air temperature", "t_pl", "={tF}+{dTF}", "°F")
gb.add("tplC", "Plenum air temperature, °C", "t_pl,C", "=({tpl}-32)/1.8", "°C")
gb.add("dTK", "Temperature rise across the heater, K", "ΔT_K", "={dTF}/1.8", "K")
gb.add("Qh", "Heater output", "Q_h", "=1.08*{Qd}*{dTF}", "Btu/h")
gb.add("Qh2", "Heater output (first draft)", "Q_h2", "=1.08*{Qd}*{dTK}", "Btu/h",
       planted=("unit-scale", "a rise in K beside the °F constant 1.08: 1.8 too small"))
gb.add("QhkW", "Heater output, kW", "Q_h,kW", "={Qh}/3412", "kW")
gb.add("HV", "Propane heating value", "HV", 91500, "Btu/US gal")
gb.add("gph", "Propane burned", "V̇_p", "={Qh}/{HV}", "US gal/h")
gb.add("Mi", "Harvest moisture, wet basis", "M_i", 20, "%")
gb.add("Mf", "Storage moisture, wet basis", "M_f", 15.5, "%")
gb.add("sh", "Shrink (water removed per wet weight)", "s", "=({Mi}-{Mf})/(100-{Mf})*100", "%")
gb.add("mw", "Water to remove", "m_w", "={m}*{sh}/100", "lb")
gb.add("mw2", "Water to remove (first draft)", "m_w2", "={m}*{sh}", "lb",
       planted=("unit-scale", "a % used as a fraction: 100 too large"))
gb.add("rhoa", "Density of the drying air", "ρ_a", 0.075, "lb/ft³")
gb.add("ma", "Air mass flow through the bin", "ṁ_a", "={Qd}*60*{rhoa}", "lb/h")
gb.add("ma2", "Air mass flow through the bin (first draft)", "ṁ_a2", "={Qd}*{rhoa}", "lb/h",
       planted=("unit-scale", "cfm × lb/ft³ gives lb/min, written as lb/h"))
gb.add("dW", "Moisture pick-up of the air (psychrometric chart, invented)", "ΔW", 0.004,
       "lb/lb")
gb.add("mr", "Water removal rate", "ṁ_r", "={ma}*{dW}", "lb/h")
gb.add("td", "Drying time", "t_d", "={mw}/{mr}", "h")
gb.add("tdd", "Drying time, days", "t_dd", "={td}/24", "d")
GRS = gb.finish()

SHEDD = {
    "A1": "Airflow resistance of clean shelled corn (ASABE D272, Shedd's data, read from the "
          "curves and rounded, from memory: check against the standard before use)",
    "A2": "Sources: ASABE D272 (from memory); 1 in. w.c. = 249.1 Pa, 1 ft = 0.3048 m (NIST SP "
          "811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Airflow [cfm/ft²]", "B5": "Resistance [in. w.c./ft]", "C5": "Resistance [Pa/m]",
}
for r, (q, dp) in enumerate([(0.5, 0.007), (1, 0.015), (2, 0.035), (5, 0.10), (10, 0.25),
                             (20, 0.65)], start=6):
    SHEDD[f"A{r}"], SHEDD[f"B{r}"] = q, dp
    SHEDD[f"C{r}"] = f"=B{r}*249.1/0.3048"
SHEDD["C9"] = "=B9*249.1*0.3048"
SHEDD_PLANTED = {"Shedd!C9": ("unit-scale", "per ft to per m multiplied by 0.3048: wrong way "
                                            "round")}

GRB = {
    "trade": "agricultural engineering: grain bin aeration fan and in-bin drying",
    "sheets": [("Bin", GRS), ("Shedd", SHEDD)],
    "planted": {**gb.planted, **SHEDD_PLANTED},
    "sidecar": ("# Marlow Flats Co-op (invented): bin 4. The US bushel, which plumb's table "
                "lacks.\n"
                "# A dimensionally consistent formula can still be wrong; this check does not "
                "replace independent review under local codes and licensed practice.\n"
                "measure bu = 35.2391 L \"US bushel, 2150.42 in³ (NIST SP 811 (2008) "
                "App. B.8)\"\n"),
}

# --------------------------------------------------------------------------------------------
# Book 4: cold-formed steel wall stud under wind (psf, kPa, in, mm, ft, plf, lb/in, kN/m,
# lb·ft, lb·in, kip·in, kN·m, in⁴, in³, mm⁴, mm³, ksi, MPa, lb, kN, -)
# --------------------------------------------------------------------------------------------
CFS_SRC = (
    "Sources: 1 psf = 0.04788 kPa, 1 in = 25.4 mm, 1 ft = 304.8 mm, 1 lbf·ft = 1.356 N·m, "
    "1 lbf = 4.448 N, 1 ksi = 6.895 MPa, 1 in⁴ = 416,231 mm⁴, 1 in³ = 16,387 mm³ (NIST SP 811 "
    "(2008) App. B.8); ASD wind 0.6·W (ASCE/SEI 7-16 §2.4, from memory); deflection under "
    "0.42 times the components-and-cladding load, limit L/360 for plaster or stucco finishes "
    "(IBC 2018 Table 1604.3 and note f, from memory); simple span M = wL²/8, Δ = 5wL⁴/(384EI), R = "
    "wL/2 (common practice); allowable moment S_e·F_y/Ω_b, Ω_b = 1.67, E = 29,500 ksi (AISI "
    "S100-16 §F2 and §A3, from memory); section properties on the Sections sheet "
    "(invented, near a stud maker's published table). Building, wall, loads and maker's "
    "data invented.")
st = ItemSheet("Stud", "Fenwick Row apartments (invented): exterior curtain-wall stud, "
               "fourth floor, 14 ft span, cement plaster (stucco) finish, design check", CFS_SRC)
st.heading("Wind load")
st.add("p", "Components and cladding wind pressure, strength level (zone 5)", "p", 38, "psf")
st.add("pk", "Wind pressure, kPa (metric check)", "p_k", "={p}*0.04788", "kPa")
st.add("pk2", "Wind pressure, kPa (first draft)", "p_k2", "={p}/0.04788", "kPa",
       planted=("unit-scale", "psf to kPa divided by 0.04788: wrong way round"))
st.add("pa", "Wind pressure for strength, ASD (0.6W)", "p_a", "=0.6*{p}", "psf")
st.add("pd", "Wind pressure for deflection (0.42W)", "p_d", "=0.42*{p}", "psf")
st.add("pdk", "Wind pressure for deflection, kPa", "p_d,k", "={pd}*0.04788", "kPa")
st.heading("Geometry")
st.add("s", "Stud spacing", "s", 16, "in")
st.add("sm", "Stud spacing, mm", "s_m", "={s}*25.4", "mm")
st.add("L", "Stud span, floor to floor", "L", 14, "ft")
st.add("Lin", "Stud span, in", "L_in", "={L}*12", "in")
st.add("Lmm", "Stud span, mm", "L_mm", "={L}*304.8", "mm")
st.heading("Strength")
st.add("w", "Line load on one stud, ASD", "w", "={pa}*{s}/12", "plf")
st.add("w2", "Line load on one stud, ASD (first draft)", "w_2", "={pa}*{s}", "plf",
       planted=("unit-scale", "spacing in inches where feet belong: 12 too large"))
st.add("M", "Maximum moment", "M", "={w}*{L}^2/8", "lb·ft")
st.add("Min", "Maximum moment, lb·in", "M_in", "={M}*12", "lb·in")
st.add("Mk", "Maximum moment, kN·m", "M_k", "={M}*0.001356", "kN·m")
st.add("Mk2", "Maximum moment, kN·m (first draft)", "M_k2", "={M}*1.356", "kN·m",
       planted=("unit-scale", "lbf·ft to N·m written as kN·m: the /1000 missing"))
st.add("des", "Stud designation (maker)", "desig.", "600S162-54")
st.add("Ix", "Moment of inertia (Sections sheet)", "I_x",
       "=VLOOKUP({des},Sections!A6:E9,2,FALSE)", "in⁴")
st.add("Se", "Effective section modulus (Sections sheet)", "S_e",
       "=VLOOKUP({des},Sections!A6:E9,3,FALSE)", "in³")
st.add("Fy", "Yield strength", "F_y", 50, "ksi")
st.add("FyM", "Yield strength, MPa", "F_y,M", "={Fy}*6.895", "MPa")
st.add("FyM2", "Yield strength, MPa (first draft)", "F_y,M2", "={Fy}*6895", "MPa",
       planted=("unit-scale", "the psi-to-kPa 6895 where ksi to MPa is 6.895: 1000 too large"))
st.add("Ma", "Allowable moment, ASD", "M_a", "={Se}*{Fy}/1.67", "kip·in")
st.add("Main", "Allowable moment, lb·in", "M_a,in", "={Ma}*1000", "lb·in")
st.add("U", "Bending unity check", "U", "={Min}/{Main}", "-")
st.add("U2", "Bending unity check (first draft)", "U_2", "={Min}/{Ma}", "-",
       planted=("unit-scale", "lb·in over kip·in: 1000 too large"))
st.add("fb", "Bending stress", "f_b", "={Min}/{Se}/1000", "ksi")
st.heading("Deflection")
st.add("E", "Modulus of elasticity of steel", "E", 29500, "ksi")
st.add("EM", "Modulus of elasticity, MPa", "E_M", "={E}*6.895", "MPa")
st.add("wd", "Line load for deflection", "w_d", "={pd}*{s}/144", "lb/in")
st.add("dl", "Mid-span deflection", "Δ", "=5*{wd}*{Lin}^4/(384*{E}*1000*{Ix})", "in")
st.add("dl2", "Mid-span deflection (first draft)", "Δ_2", "=5*{wd}*{Lin}^4/(384*{E}*{Ix})",
       "in", planted=("unit-scale", "E in ksi beside lb: 1000 too large"))
st.add("wdk", "Line load for deflection, kN/m", "w_d,k", "={pdk}*{sm}/1000", "kN/m")
st.add("Ixm", "Moment of inertia, mm⁴ (Sections sheet)", "I_x,m",
       "=VLOOKUP({des},Sections!A6:E9,4,FALSE)", "mm⁴")
st.add("dlm", "Mid-span deflection, mm (SI check)", "Δ_m",
       "=5*{wdk}*{Lmm}^4/(384*{EM}*{Ixm})", "mm")
st.add("da", "Deflection limit L/360", "Δ_a", "={Lin}/360", "in")
st.add("dam", "Deflection limit L/360, mm (first draft)", "Δ_a,m2", "={L}/360*25.4", "mm",
       planted=("unit-scale", "the span in ft where inches belong: 12 too small"))
st.add("Ld", "Span over deflection", "L/Δ", "={Lin}/{dl}", "-")
st.heading("End connection")
st.add("R", "End reaction, ASD", "R", "={w}*{L}/2", "lb")
st.add("Rk", "End reaction, kN", "R_k", "={R}*0.004448", "kN")
st.add("Rk2", "End reaction, kN (first draft)", "R_k2", "={R}*4.448", "kN",
       planted=("unit-scale", "lbf to N written as kN: the /1000 missing"))
st.add("Ps", "Allowable shear, one #10 screw in 54 mil (maker, invented)", "P_s", 180, "lb")
st.add("ns", "Screws needed at each clip", "n_s", "=ROUNDUP({R}/{Ps},0)", "-")
CFSS = st.finish()

SECT = {
    "A1": "Stud section properties, 600S162 series, 50 ksi (invented, near a maker's "
          "published table; check against the maker's current catalogue)",
    "A2": "Sources: 1 in⁴ = 416,231 mm⁴, 1 in³ = 16,387 mm³ (NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Designation", "B5": "I_x [in⁴]", "C5": "S_e [in³]", "D5": "I_x [mm⁴]",
    "E5": "S_e [mm³]",
}
for r, (des, ix, se) in enumerate([("600S162-33", 1.86, 0.46), ("600S162-43", 2.42, 0.70),
                                   ("600S162-54", 3.03, 0.94), ("600S162-68", 3.80, 1.24)],
                                  start=6):
    SECT[f"A{r}"], SECT[f"B{r}"], SECT[f"C{r}"] = des, ix, se
    SECT[f"D{r}"] = f"=B{r}*416231"
    SECT[f"E{r}"] = f"=C{r}*16387"
SECT["D9"] = "=B9*16387"
SECT_PLANTED = {"Sections!D9": ("unit-scale", "in⁴ to mm⁴ by the in³ factor 16,387: 25.4 too "
                                              "small")}

CFSB = {
    "trade": "structural: cold-formed steel wall stud under wind, strength and deflection",
    "sheets": [("Stud", CFSS), ("Sections", SECT)],
    "planted": {**st.planted, **SECT_PLANTED},
}

BOOKS = {"vacuum-st-aldric": VACB, "lift-station-kestle-brook": LSB,
         "grain-bin-marlow-flats": GRB, "wall-stud-fenwick-row": CFSB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()
