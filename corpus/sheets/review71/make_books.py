#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review71), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; the layout
follows corpus/sheets/review64/make_books.py and review_notes.py (and review55).

Trades: an aircraft hangar's foam-water deluge system (deluge zones, foam concentrate, water
supply, fire pump, riser); a fish farm feed barge's diesel generator and pneumatic feed
blowers; an asphalt plant's thermal-oil heater and bitumen tanks; a hospital laboratory's
fume-cupboard VAV exhaust and its make-up air. All scenarios, sites, firms, readings and
maker's data are invented (demonstration only); the formulas and published factors are the
trade's own, with their sources named in a text cell at the top of each sheet ("from memory"
where recalled and not checked, "common practice" for a fact of the trade with no single
source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted slip (planted=(rule, what)) or a correct cell that must
stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and its
messages that mislead, are recorded in review_notes.py after running the round's build of the time.

Run: python3 make_books.py  ->  *.xlsx (and *.expect where none exist yet) in this folder;
     python3 make_books.py --expect  rewrites the .expect files from review_notes.py.
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
# Book 1: aircraft hangar foam-water deluge (m, m², L/(min·m²), gpm/ft², L/min, gpm, %, min,
# L, m³, US gal, bar(g), psig, bar a, kW, hp, W, ft, bar, psi, kg/m³, mm, m/s, in,
# gpm/psi^0.5, L/min/bar^0.5; a Zones sheet read by its column headings)
# --------------------------------------------------------------------------------------------
HGR_SRC = (
    "Sources: foam-water deluge over the hangar floor at 0.16 gpm/ft² (6.5 L/(min·m²)) with "
    "AFFF, two adjacent zones at once, foam discharge 10 min, water for deluge plus hose "
    "streams 45 min (NFPA 409 (2022) and NFPA 16 (2019), from memory; the hose allowance of "
    "1900 L/min and the 15 % over-discharge are invented within the trade's range); "
    "concentrate flow = solution flow × proportioning % (3 % AFFF, maker, invented) and a 100 % "
    "reserve (NFPA 11 (2021), from memory); 1 gpm/ft² = 40.74 L/(min·m²), 1 US gal = 3.785 L, "
    "1 m³ = 264.2 US gal, 1 m³/h = 4.403 gpm, 1 m² = 10.76 ft², 1 bar = 14.50 psi, 1 hp = "
    "0.7457 kW, 1 ft = 0.3048 m, 1 in = 25.4 mm (NIST SP 811 (2008) App. B.8); hydraulic power "
    "kW = L/min × bar/600 and hp = gpm × psi/1714 (common practice; Cameron Hydraulic Data, "
    "19th ed., from memory); static head 0.0981 bar/m and 0.433 psi/ft of water, ρ·g·h with "
    "g_n = 9.81 m/s² (SI Brochure 9th ed.); Hazen-Williams p_m = 6.05×10⁵·Q^1.85/(C^1.85·"
    "d^4.87) bar/m with L/min and mm, and p = 4.52·Q^1.85/(C^1.85·d^4.87) psi/ft with gpm and "
    "in (NFPA 13 (2022) ch. 28, from memory); sprinkler Q = K·√p and K(L/min/bar^½) = 14.4 × "
    "K(gpm/psi^½) (NFPA 13 (2022), from memory). Hangar, pumps, tanks, maker's data and "
    "readings invented.")
hg = ItemSheet("Hangar", "Skellow Fen airfield, maintenance hangar 2 (invented): foam-water "
               "deluge over the hangar floor, AFFF proportioning, fire pump and riser", HGR_SRC)
hg.heading("Deluge zones")
hg.add("Lz", "Deluge zone length", "L_z", 30, "m")
hg.add("Bz", "Deluge zone width", "B_z", 25, "m")
hg.add("Az", "Deluge zone area", "A_z", "={Lz}*{Bz}", "m²")
hg.add("nz", "Zones discharging together", "n_z", 2, "-")
hg.add("Aop", "Area discharging", "A_op", "={Az}*{nz}", "m²")
hg.add("dens", "Design density of foam solution", "q''", 6.5, "L/(min·m²)")
hg.add("densUS", "Design density, US units", "q''_US", "={dens}/40.74", "gpm/ft²")
hg.add("Qs", "Deluge discharge, two zones", "Q_s", "={dens}*{Aop}", "L/min")
hg.add("Qsg", "Deluge discharge, US gpm", "Q_s,US", "={Qs}/3.785", "gpm")
hg.add("Qsg2", "Deluge discharge, US gpm (first draft)", "Q_s,US2", "={Qs}*3.785", "gpm",
       planted=("unit-scale", "L/min to gpm multiplied by 3.785: wrong way round"))
hg.add("ov", "Over-discharge of the hydraulically remote design", "f_ov", 15, "%")
hg.add("Qd", "Deluge demand with over-discharge", "Q_d", "={Qs}*(1+{ov}/100)", "L/min")
hg.add("Qh", "Hose stream allowance", "Q_h", 1900, "L/min")
hg.add("Qt", "Total water demand", "Q_t", "={Qd}+{Qh}", "L/min")
hg.add("Qtg", "Total water demand, US gpm", "Q_t,US", "={Qt}/3.785", "gpm")
hg.heading("Foam concentrate")
hg.add("cf", "Proportioning rate, AFFF", "c_f", 3, "%")
hg.add("qc", "Concentrate flow", "q_c", "={Qd}*{cf}/100", "L/min")
hg.add("qc2", "Concentrate flow (first draft)", "q_c2", "={Qd}*{cf}", "L/min",
       planted=("unit-scale", "a % used as a fraction: 100 too large"))
hg.add("tdis", "Foam discharge time", "t_f", 10, "min")
hg.add("Vc", "Concentrate for one discharge", "V_c", "={qc}*{tdis}", "L")
hg.add("rs", "Reserve supply", "r", 100, "%")
hg.add("Vct", "Concentrate with the reserve", "V_ct", "={Vc}*(1+{rs}/100)", "L")
hg.add("Vctm3", "Concentrate with the reserve, m³", "V_ct,m3", "={Vct}/1000", "m³")
hg.add("Vctm32", "Concentrate with the reserve, m³ (tank schedule)", "V_ct,m3 2", "={Vct}",
       "m³", planted=("unit-scale", "litres written as m³: the /1000 missing"))
hg.add("Vtk", "Concentrate tank provided (two bladder tanks)", "V_tk", 7.5, "m³")
hg.heading("Water supply")
hg.add("tw", "Water supply duration", "t_w", 45, "min")
hg.heading("Fire pump")
hg.add("pr", "Pump rated pressure", "p_r", 10.5, "bar(g)")
hg.add("prpsi", "Pump rated pressure, psig (US pump maker)", "p_r,US", "={pr}*14.50", "psig")
hg.add("prpsi2", "Pump rated pressure, psig (first draft)", "p_r,US2", "={pr}/14.5", "psig",
       planted=("unit-scale", "bar to psi divided by 14.5: wrong way round"))
hg.add("pb", "Site barometer (invented)", "p_b", 1.006, "bar a")
hg.add("pa", "Pump rated pressure, absolute (for the casing test)", "p_a", "={pr}+{pb}",
       "bar a")
hg.add("pa2", "Pump rated pressure, absolute (first draft)", "p_a2", "={pr}", "bar a",
       planted=("offset-scale", "a gauge pressure set equal to an absolute one"))
hg.add("Ph", "Pump hydraulic power", "P_h", "={Qt}*{pr}/600", "kW")
hg.add("PhUS", "Pump hydraulic power, US check", "P_h,US", "={Qtg}*{prpsi}/1714", "hp")
hg.add("PhUS2", "Pump hydraulic power, US check (first draft)", "P_h,US2",
       "={Qtg}*{prpsi}/3960", "hp",
       planted=("unit-scale", "3960 belongs with a head in ft; with psi the factor is 1714"))
hg.add("eta", "Pump efficiency at the rated point (maker)", "η_p", 72, "%")
hg.add("Pbr", "Pump shaft power", "P_br", "={Ph}/({eta}/100)", "kW")
hg.add("Pm", "Driver rating chosen", "P_m", 355, "kW")
hg.add("Pj", "Jockey pump motor", "P_j", 2200, "W")
hg.add("Pel", "Pump house connected load", "P_el", "={Pm}+{Pj}/1000", "kW")
hg.add("Pel2", "Pump house connected load (first draft)", "P_el2", "={Pm}+{Pj}", "kW",
       planted=("unit-scale", "W added to kW"))
hg.heading("Riser and the remote heads")
hg.add("hel", "Height of the deluge heads above the pump", "h_el", 22, "m")
hg.add("helft", "Height of the heads, ft", "h_el,US", "={hel}/0.3048", "ft")
hg.add("pel", "Static head to the heads", "Δp_el", "=0.0981*{hel}", "bar")
hg.add("pelpsi", "Static head to the heads, psi", "Δp_el,US", "=0.433*{helft}", "psi")
hg.add("rhow", "Density of water", "ρ_w", 1000, "kg/m³")
hg.add("pel3", "Static head to the heads, ρ·g·h", "Δp_el,3", "={rhow}*9.81*{hel}/100000", "bar")
hg.add("pel4", "Static head to the heads, ρ·g·h (first draft)", "Δp_el,4",
       "={rhow}*{hel}/100000", "bar", planted=("unit-scale", "ρ·h written as a pressure: g missing"))
hg.add("Dr", "Riser and main bore (lined ductile iron)", "D_r", 300, "mm")
hg.add("Ar", "Riser bore area", "A_r", "=PI()*({Dr}/1000)^2/4", "m²")
hg.add("vr", "Velocity in the main", "v_r", "={Qt}/60000/{Ar}", "m/s")
hg.add("vr2", "Velocity in the main (first draft)", "v_r2", "={Qt}/60000/(PI()*{Dr}^2/4)", "m/s",
       planted=("unit-scale", "bore in mm squared into an area in m²: 10⁶ too small"))
hg.add("Lr", "Main and riser, equivalent length with fittings", "L_r", 180, "m")
hg.add("C", "Hazen-Williams C, cement lined", "C", 120, "-")
hg.add("pf", "Friction loss in the main and riser", "Δp_f",
       "=605000*{Qt}^1.85/({C}^1.85*{Dr}^4.87)*{Lr}", "bar")
hg.add("Din", "Main bore, in", "D_US", "={Dr}/25.4", "in")
hg.add("Lft", "Equivalent length, ft", "L_US", "={Lr}/0.3048", "ft")
hg.add("pfpsi", "Friction loss, US check", "Δp_f,US",
       "=4.52*{Qtg}^1.85/({C}^1.85*{Din}^4.87)*{Lft}", "psi")
hg.add("prem", "Pressure at the remote deluge valve outlet", "p_rem", "={pr}-{pel}-{pf}",
       "bar(g)")
hg.add("KUS", "Foam-water head K-factor (maker, US)", "K_US", 5.6, "gpm/psi^0.5")
hg.add("KSI", "Foam-water head K-factor, metric", "K", "={KUS}*14.4", "L/min/bar^0.5")
hg.add("Ah", "Floor area per head", "A_h", 9.3, "m²")
hg.add("qmin", "Flow from the remote head at the design density", "q_min", "={dens}*{Ah}",
       "L/min")
hg.add("pmin", "Pressure needed at the remote head", "p_min", "=({qmin}/{KSI})^2", "bar(g)")
hg.add("pminpsi", "Pressure needed at the remote head, US check", "p_min,US",
       "=({qmin}/3.785/{KUS})^2", "psig")
HGRS = hg.finish()

_dens = hg.ref("dens")
ZONES = {
    "A1": "Skellow Fen hangar 2: deluge zone schedule (invented areas)",
    "A2": "Sources: flow = area × density (NFPA 16, from memory); 1 US gal = 3.785 L (NIST SP "
          "811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Zone", "B5": "Area [m²]", "C5": "Flow [L/min]", "D5": "Flow [gpm]",
    "A11": "Total",
}
for r, (z, ar) in enumerate([("Z1 bay north", 750), ("Z2 bay centre", 750),
                             ("Z3 bay south", 750), ("Z4 nose dock", 360)], start=6):
    ZONES[f"A{r}"], ZONES[f"B{r}"] = z, ar
    ZONES[f"C{r}"] = f"=B{r}*{_dens}"
    ZONES[f"D{r}"] = f"=C{r}/3.785"
ZONES["D8"] = "=C8/3.785/60"
ZONES["C11"] = "=SUM(C6:C9)"
ZONES_PLANTED = {"Zones!D8": ("unit-scale", "L/min to gpm with an extra /60, as if per second")}

HGRB = {
    "trade": "fire protection: aircraft hangar foam-water deluge, concentrate, water and pump",
    "sheets": [("Hangar", HGRS), ("Zones", ZONES)],
    "planted": {**hg.planted, **ZONES_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 2: fish farm feed barge, generator and feed blowers (kVA, kW, W, %, V, A, g/kWh, kg/h,
# kg/L, L/h, US gal/h, L/d, m³, d, MJ/kg, t/d, t, %/d, h/d, m³/min, kPa(g), kPa, bar(g), psig,
# °C, K, kg/m³, mm, m², m/s, fpm, cfm, L/t)
# --------------------------------------------------------------------------------------------
FB_SRC = (
    "Sources: real power P = S·pf and line current I = S/(√3·V) (common practice; IEC "
    "60034-1 for the ratings, from memory); diesel specific consumption 215 g/kWh at part load "
    "(maker, invented within the range ISO 3046-1 ratings give); diesel 0.84 kg/L at 15 °C and "
    "42.8 MJ/kg lower heating value (EN 590 range, from memory); 1 kWh = 3.6 MJ (SI Brochure "
    "9th ed.); CO₂ 3.17 kg per kg of diesel (IPCC 2006 Guidelines vol. 2, 74.1 t/TJ, from "
    "memory); daily feed = biomass × specific feeding rate (common practice, 1.1 %/d invented); "
    "air density ρ = p/(R·T), R = 287.05 J/(kg·K) for dry air (common practice), with the "
    "absolute pressure = gauge + the site barometer; solids loading ratio = feed mass flow/air "
    "mass flow (common practice); blower air power ≈ V̇·Δp/η and the adiabatic discharge "
    "temperature T₂ = T₁·[1 + ((p₂/p₁)^0.2857 − 1)/η] (common practice, k = 1.4); 1 m³ = 35.31 "
    "ft³, 1 US gal = 3.785 L, 1 kPa = 0.1450 psi, 1 m/s = 196.85 fpm (NIST SP 811 (2008) App. "
    "B.8). Site, barge, generator, blowers, maker's data and readings invented.")
fb = ItemSheet("Barge", "Skerra Voe salmon site (invented): 600 t feed barge, 500 kVA diesel "
               "generator and three feed blowers, six lines, winter feeding day", FB_SRC)
fb.heading("Generator and load")
fb.add("S", "Generator rating", "S", 500, "kVA")
fb.add("pf", "Power factor of the load", "pf", 0.8, "-")
fb.add("Pg", "Generator real power rating", "P_g", "={S}*{pf}", "kW")
fb.add("nbl", "Feed blowers running", "n_bl", 3, "-")
fb.add("Pbl", "Feed blower motor input (each)", "P_bl", 45, "kW")
fb.add("Pht", "Hotel, cameras, dosers and selector valves (invented)", "P_ht", 38, "kW")
fb.add("Pheat", "Control room and mess heaters", "P_heat", 9000, "W")
fb.add("Ptot", "Barge load", "P_tot", "={nbl}*{Pbl}+{Pht}+{Pheat}/1000", "kW")
fb.add("Ptot2", "Barge load (first draft)", "P_tot2", "={nbl}*{Pbl}+{Pht}+{Pheat}", "kW",
       planted=("unit-scale", "W added to kW"))
fb.add("Ld", "Generator loading", "L_g", "={Ptot}/{Pg}*100", "%")
fb.add("Sl", "Apparent power drawn", "S_l", "={Ptot}/{pf}", "kVA")
fb.add("V", "Line voltage, three phase", "V", 400, "V")
fb.add("I", "Line current", "I", "={Sl}*1000/(SQRT(3)*{V})", "A")
fb.add("I2", "Line current (first draft)", "I_2", "={Sl}/(SQRT(3)*{V})", "A",
       planted=("unit-scale", "kVA over V taken as A: the ×1000 missing"))
fb.add("In", "Generator rated current", "I_n", "={S}*1000/(SQRT(3)*{V})", "A")
fb.heading("Fuel")
fb.add("sfc", "Specific fuel consumption at this load (maker)", "b_e", 215, "g/kWh")
fb.add("mf", "Fuel mass flow", "ṁ_f", "={Ptot}*{sfc}/1000", "kg/h")
fb.add("rhof", "Diesel density at 15 °C", "ρ_f", 0.84, "kg/L")
fb.add("Vf", "Fuel flow", "V̇_f", "={mf}/{rhof}", "L/h")
fb.add("Vf2", "Fuel flow (first draft)", "V̇_f2", "={mf}*{rhof}", "L/h",
       planted=("result-unit", "kg/h times kg/L for L/h: the density applied the wrong way"))
fb.add("Vfg", "Fuel flow, US gal/h (generator maker's chart)", "V̇_f,US", "={Vf}/3.785",
       "US gal/h")
fb.add("Vfd", "Fuel per day", "V_fd", "={Vf}*24", "L/d")
fb.add("Vtk", "Day and bulk tanks, usable", "V_tk", 30, "m³")
fb.add("aut", "Autonomy on fuel", "t_aut", "={Vtk}*1000/{Vfd}", "d")
fb.add("LHV", "Diesel lower heating value", "LHV", 42.8, "MJ/kg")
fb.add("Pfuel", "Fuel heat input", "P_fuel", "={mf}*{LHV}/3.6", "kW")
fb.add("Pfuel2", "Fuel heat input (first draft)", "P_fuel2", "={mf}*{LHV}", "kW",
       planted=("unit-scale", "MJ/h written as kW: the /3.6 missing"))
fb.add("etag", "Generator set efficiency at this load", "η_g", "={Ptot}/{Pfuel}*100", "%")
fb.add("co2", "CO₂ per day", "m_CO2", "={mf}*24*3.17/1000", "t/d")
fb.heading("Feeding")
fb.add("B", "Standing biomass", "B", 2400, "t")
fb.add("SFR", "Specific feeding rate, winter", "SFR", 1.1, "%/d")
fb.add("Fd", "Feed per day", "F_d", "={B}*{SFR}/100", "t/d")
fb.add("Fd2", "Feed per day (first draft)", "F_d2", "={B}*{SFR}", "t/d",
       planted=("unit-scale", "a % used as a fraction: 100 too large"))
fb.add("nl", "Feed lines running", "n_l", 6, "-")
fb.add("mfeed", "Feed rate per line (doser setting)", "ṁ_feed", 1200, "kg/h")
fb.add("hrs", "Feeding hours needed", "t_feed", "={Fd}*1000/({mfeed}*{nl})", "h/d")
fb.add("Ms", "Silo capacity", "M_s", 600, "t")
fb.add("ds", "Days between feed deliveries", "t_s", "={Ms}/{Fd}", "d")
fb.add("fpt", "Diesel per tonne of feed", "f", "={Vfd}/{Fd}", "L/t")
fb.heading("Conveying air, one line")
fb.add("Qa", "Air flow per line, at the line conditions", "V̇_a", 9, "m³/min")
fb.add("Qacfm", "Air flow per line, cfm (blower maker)", "V̇_a,US", "={Qa}*35.31", "cfm")
fb.add("Qacfm2", "Air flow per line, cfm (first draft)", "V̇_a,US2", "={Qa}*35.31/60", "cfm",
       planted=("unit-scale", "m³/min to cfm with an extra /60: ft³/s written as cfm"))
fb.add("pg", "Line pressure at the blower outlet", "p_g", 40, "kPa(g)")
fb.add("pbar", "Line pressure, bar(g)", "p_g,bar", "={pg}/100", "bar(g)")
fb.add("ppsi", "Line pressure, psig", "p_g,US", "={pg}*0.1450", "psig")
fb.add("pb", "Site barometer (invented, winter low)", "p_b", 99.2, "kPa")
fb.add("pabs", "Line pressure, absolute", "p_abs", "={pg}+{pb}", "kPa")
fb.add("ta", "Air temperature after the aftercooler", "t_a", 38, "°C")
fb.add("TK", "Air temperature, kelvin", "T_a", "={ta}+273.15", "K")
fb.add("rho", "Air density in the line", "ρ_a", "={pabs}*1000/(287.05*{TK})", "kg/m³")
fb.add("rho2", "Air density in the line (first draft)", "ρ_a2", "={pg}*1000/(287.05*{TK})",
       "kg/m³", planted=("offset-scale", "a gauge pressure in the gas law"))
fb.add("rho3", "Air density in the line (second draft)", "ρ_a3", "={pabs}*1000/(287.05*{ta})",
       "kg/m³", planted=("offset-scale", "a °C reading in the gas law"))
fb.add("ma", "Air mass flow per line", "ṁ_a", "={Qa}*60*{rho}", "kg/h")
fb.add("mu", "Solids loading ratio", "μ", "={mfeed}/{ma}", "-")
fb.add("Dp", "Feed pipe bore (110 mm PE100 SDR11)", "D_p", 90, "mm")
fb.add("Ap", "Feed pipe bore area", "A_p", "=PI()*({Dp}/1000)^2/4", "m²")
fb.add("Ap2", "Feed pipe bore area (first draft)", "A_p2", "=PI()*{Dp}^2/4", "m²",
       planted=("unit-scale", "bore in mm squared into m²: 10⁶ too large"))
fb.add("v", "Air velocity in the feed pipe", "v", "={Qa}/60/{Ap}", "m/s")
fb.add("v2", "Air velocity in the feed pipe (first draft)", "v_2", "={Qa}/{Ap}", "m/s",
       planted=("unit-scale", "m³/min over m² taken as m/s: the /60 missing"))
fb.add("vfpm", "Air velocity, fpm (pellet maker's limit)", "v_US", "={v}*196.85", "fpm")
fb.heading("Blower")
fb.add("dp", "Pressure rise across the blower", "Δp", 40, "kPa")
fb.add("etab", "Blower efficiency (maker)", "η_b", 60, "%")
fb.add("Pair", "Blower air power per line", "P_air", "={Qa}/60*{dp}/({etab}/100)", "kW")
fb.add("npb", "Lines per blower", "n_pb", 2, "-")
fb.add("Pbs", "Blower shaft power", "P_bs", "={Pair}*{npb}", "kW")
fb.add("t1", "Air temperature at the blower inlet (engine room)", "t_1", 12, "°C")
fb.add("T1", "Inlet temperature, kelvin", "T_1", "={t1}+273.15", "K")
fb.add("T2", "Blower discharge temperature, adiabatic", "T_2",
       "={T1}*(1+(({pabs}/{pb})^0.2857-1)/({etab}/100))", "K")
fb.add("t2", "Blower discharge temperature", "t_2", "={T2}-273.15", "°C")
FBS = fb.finish()

FBB = {
    "trade": "aquaculture: feed barge diesel generator, fuel and pneumatic feed blowers",
    "sheets": [("Barge", FBS)],
    "planted": dict(fb.planted),
}

# --------------------------------------------------------------------------------------------
# Book 3: asphalt plant thermal-oil heater and bitumen tanks (t/h, %, h/d, t/d, kg/m³, °C,
# 1/K, lb/US gal, m³/h, L/min, gpm, m, m³, t, d, m², W/(m·K), mm, W/m², kW, Btu/h, W, kg,
# kJ/(kg·K), kWh, h, °F, Δ°F, Btu/(lb·°F), Btu, K, kg/s, m/s, MJ/kg, kg/h, kg/L, L/h)
# --------------------------------------------------------------------------------------------
AS_SRC = (
    "Sources: bitumen 5.2 % of the mix by mass (invented within the range of EN 13108-1 "
    "asphalt concrete); bitumen density 1030 kg/m³ at 15 °C and ρ_t = ρ_15/(1 + β·(t − 15)), "
    "β = 0.00063 /K (ASTM D4311, cubical expansion of asphalt, rounded, from memory); c_p of "
    "bitumen 1.9 kJ/(kg·K) at 120 to 165 °C (from memory); conduction through the tank "
    "insulation q = k·ΔT/x, surface film neglected (conservative for the heater, common "
    "practice), mineral wool k = 0.045 W/(m·K) at the mean temperature (maker, invented); "
    "radiation from an uninsulated manway lid q = ε·σ·(T⁴ − T_a⁴), σ = 5.670×10⁻⁸ W/(m²·K⁴) "
    "(CODATA 2018); heat-up Q = m·c_p·ΔT (common practice); thermal oil duty Q = ṁ·c_p·ΔT, "
    "oil 2.7 kJ/(kg·K) and 750 kg/m³ at 265 °C, 880 kg/m³ at 20 °C (maker's data sheet, "
    "invented); heater on light fuel oil, 42.6 MJ/kg lower heating value, 0.85 kg/L (from "
    "memory); 1 kW = 3412 Btu/h, 1 kg/m³ = 0.008345 lb/US gal, 1 m³/h = 4.403 gpm, 1 kg = "
    "2.205 lb, 1 Btu/(lb·°F) = 4.187 kJ/(kg·K), 1 kWh = 3412 Btu, °F = 1.8·°C + 32 (NIST SP "
    "811 (2008) App. B.8). Plant, tanks, heater, maker's data and readings invented.")
ap = ItemSheet("Bitumen", "Brackenhurst Quarry asphalt plant (invented): 240 t/h batch plant, "
               "three 60 m³ bitumen tanks and a 1.5 MW thermal-oil heater", AS_SRC)
ap.heading("Production")
ap.add("Pm", "Plant output, asphalt", "Ṁ", 240, "t/h")
ap.add("bc", "Binder content by mass", "b", 5.2, "%")
ap.add("mb", "Bitumen use", "ṁ_b", "={Pm}*{bc}/100", "t/h")
ap.add("mb2", "Bitumen use (first draft)", "ṁ_b2", "={Pm}*{bc}", "t/h",
       planted=("unit-scale", "a % used as a fraction: 100 too large"))
ap.add("mblb", "Bitumen use, lb/h (US pump maker)", "ṁ_b,US", "={mb}*2205", "lb/h")
ap.add("hrs", "Production hours", "t_op", 10, "h/d")
ap.add("mbd", "Bitumen per day", "m_bd", "={mb}*{hrs}", "t/d")
ap.heading("Bitumen density and flow")
ap.add("rho15", "Bitumen density at 15 °C (supplier)", "ρ_15", 1030, "kg/m³")
ap.add("ts", "Storage temperature", "t_s", 165, "°C")
ap.add("beta", "Cubical expansion coefficient", "β", 0.00063, "1/K")
ap.add("rhot", "Bitumen density at the storage temperature", "ρ_t",
       "={rho15}/(1+{beta}*({ts}-15))", "kg/m³")
ap.add("rholb", "Bitumen density hot, lb/US gal (US pump maker)", "ρ_t,US", "={rhot}*0.008345",
       "lb/US gal")
ap.add("rholb2", "Bitumen density hot, lb/US gal (first draft)", "ρ_t,US2",
       "={rhot}/0.008345", "lb/US gal",
       planted=("unit-scale", "kg/m³ to lb/US gal divided by 0.008345: wrong way round"))
ap.add("Vb", "Bitumen volume flow", "V̇_b", "={mb}*1000/{rhot}", "m³/h")
ap.add("VbL", "Bitumen volume flow, L/min (dosing pump)", "V̇_b,L", "={Vb}*1000/60", "L/min")
ap.add("Vbg", "Bitumen volume flow, US gpm", "V̇_b,US", "={Vb}*4.403", "gpm")
ap.heading("Tanks")
ap.add("nt", "Tanks", "n_t", 3, "-")
ap.add("Dt", "Tank diameter", "D_t", 3.4, "m")
ap.add("Ht", "Tank shell height", "H_t", 6.6, "m")
ap.add("Vt", "Tank volume", "V_t", "=PI()*{Dt}^2/4*{Ht}", "m³")
ap.add("fill", "Working fill", "φ", 85, "%")
ap.add("stock", "Bitumen in stock", "M_st", "={nt}*{Vt}*{fill}/100*{rhot}/1000", "t")
ap.add("dst", "Stock in days of production", "t_st", "={stock}/{mbd}", "d")
ap.heading("Tank heat loss")
ap.add("As", "Shell and roof area, one tank", "A_s", "=PI()*{Dt}*{Ht}+PI()*{Dt}^2/4", "m²")
ap.add("k", "Insulation conductivity, mineral wool", "k", 0.045, "W/(m·K)")
ap.add("x", "Insulation thickness", "x", 150, "mm")
ap.add("ta", "Ambient temperature, winter design", "t_a", 5, "°C")
ap.add("q", "Heat flux through the insulation", "q", "={k}*({ts}-{ta})/({x}/1000)", "W/m²")
ap.add("q2", "Heat flux through the insulation (first draft)", "q_2", "={k}*({ts}-{ta})/{x}",
       "W/m²", planted=("unit-scale", "thickness in mm where m belongs: 1000 too small"))
ap.add("Ql1", "Heat loss, one tank", "Q_l1", "={q}*{As}/1000", "kW")
ap.add("Qla", "Heat loss, three tanks", "Q_la", "={Ql1}*{nt}", "kW")
ap.add("QlaB", "Heat loss, three tanks, Btu/h", "Q_la,US", "={Qla}*3412", "Btu/h")
ap.add("eps", "Emissivity of the lid (oxidised steel)", "ε", 0.9, "-")
ap.add("tl", "Lid surface temperature", "t_l", 140, "°C")
ap.add("Al", "Manway lid area", "A_l", 0.8, "m²")
ap.add("qr", "Radiation from one lid", "Q_r",
       "={eps}*0.0000000567*(({tl}+273.15)^4-({ta}+273.15)^4)*{Al}", "W")
ap.add("qr2", "Radiation from one lid (first draft)", "Q_r2",
       "={eps}*0.0000000567*({tl}^4-{ta}^4)*{Al}", "W",
       planted=("offset-scale", "°C readings raised to the fourth power: kelvins belong"))
ap.add("Qlid", "Radiation from the three lids", "Q_lid", "={qr}*{nt}/1000", "kW")
ap.heading("Heat-up after a cold weekend")
ap.add("t1", "Bitumen temperature on Monday morning", "t_1", 120, "°C")
ap.add("dT", "Temperature rise to storage", "ΔT", "={ts}-{t1}", "K")
ap.add("mt", "Bitumen in one tank", "m_t", "={Vt}*{fill}/100*{rhot}", "kg")
ap.add("cpb", "Specific heat of bitumen", "c_p,b", 1.9, "kJ/(kg·K)")
ap.add("E", "Heat to raise one tank", "E", "={mt}*{cpb}*{dT}/3600", "kWh")
ap.add("E2", "Heat to raise one tank (first draft)", "E_2", "={mt}*{cpb}*{dT}", "kWh",
       planted=("unit-scale", "kJ written as kWh: the /3600 missing"))
ap.add("th", "Heat-up time allowed", "t_h", 12, "h")
ap.add("Pheat", "Heat-up duty", "P_heat", "={E}/{th}", "kW")
ap.add("tsF", "Storage temperature, °F (US data sheet)", "t_s,F", "={ts}*1.8+32", "°F")
ap.add("t1F", "Monday temperature, °F", "t_1,F", "={t1}*1.8+32", "°F")
ap.add("t1F2", "Monday temperature, °F (first draft)", "t_1,F2", "={t1}*1.8", "°F",
       planted=("offset-scale", "°C to °F without the +32"))
ap.add("dTF", "Temperature rise, Δ°F", "ΔT_F", "={dT}*1.8", "Δ°F")
ap.add("cpbUS", "Specific heat of bitumen, US units", "c_p,US", "={cpb}/4.187", "Btu/(lb·°F)")
ap.add("EB", "Heat to raise one tank, US check", "E_US", "={mt}*2.205*{cpbUS}*{dTF}", "Btu")
ap.add("EBk", "Heat to raise one tank, US check in kWh", "E_US,k", "={EB}/3412", "kWh")
ap.heading("Thermal-oil heater")
ap.add("Qh", "Heater rated output", "Q_h", 1500, "kW")
ap.add("QhB", "Heater rated output, Btu/h (burner maker)", "Q_h,US", "={Qh}*3412", "Btu/h")
ap.add("QhB2", "Heater rated output, Btu/h (first draft)", "Q_h,US2", "={Qh}*3.412", "Btu/h",
       planted=("unit-scale", "the W factor 3.412 applied to kW: 1000 too small"))
ap.add("tsup", "Oil supply temperature", "t_sup", 280, "°C")
ap.add("tret", "Oil return temperature", "t_ret", 250, "°C")
ap.add("dTo", "Oil temperature drop", "ΔT_o", "={tsup}-{tret}", "K")
ap.add("dTo2", "Oil temperature drop (first draft)", "ΔT_o2", "={tsup}-{tret}+273.15", "K",
       planted=("offset-scale", "a °C difference given the kelvin offset"))
ap.add("cpo", "Thermal oil specific heat at 265 °C", "c_p,o", 2.7, "kJ/(kg·K)")
ap.add("mo", "Oil mass flow", "ṁ_o", "={Qh}/({cpo}*{dTo})", "kg/s")
ap.add("rhoo", "Thermal oil density at 265 °C", "ρ_o", 750, "kg/m³")
ap.add("Vo", "Oil circulation", "V̇_o", "={mo}/{rhoo}*3600", "m³/h")
ap.add("Vog", "Oil circulation, US gpm", "V̇_o,US", "={Vo}*4.403", "gpm")
ap.add("Di", "Oil main bore, DN125", "D_i", 128.2, "mm")
ap.add("vo", "Oil velocity in the main", "v_o", "={Vo}/3600/(PI()*({Di}/1000)^2/4)", "m/s")
ap.add("LHV", "Light fuel oil lower heating value", "LHV", 42.6, "MJ/kg")
ap.add("etah", "Heater efficiency on LHV", "η_h", 85, "%")
ap.add("mfo", "Burner fuel at full output", "ṁ_fo", "={Qh}/({etah}/100)*3.6/{LHV}", "kg/h")
ap.add("mfo2", "Burner fuel at full output (first draft)", "ṁ_fo2",
       "={Qh}/({etah}/100)*3600/{LHV}", "kg/h",
       planted=("unit-scale", "kW × 3600 over MJ/kg: kJ/h treated as MJ/h, 1000 too large"))
ap.add("rhofo", "Light fuel oil density", "ρ_fo", 0.85, "kg/L")
ap.add("Vfo", "Burner fuel at full output, L/h", "V̇_fo", "={mfo}/{rhofo}", "L/h")
ap.add("Ptr", "Hot-oil tracing of the bitumen lines (invented)", "P_tr", 40, "kW")
ap.add("Qd", "Heater demand, winter Monday", "Q_d", "={Qla}+{Qlid}+{Pheat}*{nt}+{Ptr}", "kW")
ap.add("mrg", "Heater margin over the demand", "m_h", "=({Qh}-{Qd})/{Qh}*100", "%")
ap.add("Vsys", "Thermal oil in the system, cold", "V_sys", 9, "m³")
ap.add("rho20", "Thermal oil density at 20 °C", "ρ_20", 880, "kg/m³")
ap.add("dVx", "Oil expansion, cold to running", "ΔV", "={Vsys}*({rho20}/{rhoo}-1)", "m³")
APS = ap.finish()

APB = {
    "trade": "asphalt plant: thermal-oil heater, bitumen tanks, heat loss and heat-up",
    "sheets": [("Bitumen", APS)],
    "planted": dict(ap.planted),
}

# --------------------------------------------------------------------------------------------
# Book 4: hospital laboratory fume cupboards, VAV exhaust and make-up air (m, m², ft², m/s,
# fpm, m³/s, cfm, L/s, %, m³, 1/h, °C, °F, K, kg/m³, kJ/(kg·K), kW, Btu/h, W, kPa, kg/s, mm,
# Pa, in. w.c., hp, kWh/yr)
# --------------------------------------------------------------------------------------------
LAB_SRC = (
    "Sources: face velocity 0.5 m/s (100 fpm) at the design sash opening (ANSI/ASSP Z9.5 "
    "(2022) and ASHRAE Laboratory Design Guide, 2nd ed., from memory; BS EN 14175 sets no "
    "single figure); VAV diversity 70 % of the cupboards' full flow (common practice, invented "
    "within the range); minimum 6 air changes an hour occupied (ASHRAE Laboratory Design Guide, "
    "from memory); make-up 10 % below the exhaust to hold the laboratory negative (common "
    "practice); sensible heat Q = ρ·c_p·V̇·ΔT, ρ = 1.2 kg/m³, c_p = 1.005 kJ/(kg·K) (common "
    "practice), US check Btu/h = 1.08·cfm·ΔT(°F) (ASHRAE Handbook, Fundamentals (2021), from "
    "memory); ρ = p/(R·T), R = 287.05 J/(kg·K) (common practice); fan power P = V̇·Δp/η and US "
    "bhp = cfm·in. w.c./(6356·η) (AMCA 201, from memory); fan power at part flow by the cube of "
    "the flow ratio (fan laws, common practice); stack exit at least 15 m/s (3000 fpm) (ANSI/"
    "ASSP Z9.5, from memory); LPHW coil ṁ = Q/(c_p·ΔT), water 4.19 kJ/(kg·K), 0.978 kg/L at "
    "70 °C (common practice); 1 m³/s = 2119 cfm, 1 m/s = 196.85 fpm, 1 m² = 10.76 ft², 1 in. "
    "w.c. = 249.1 Pa, 1 kW = 3412 Btu/h, 1 hp = 0.7457 kW, °F = 1.8·°C + 32 (NIST SP 811 "
    "(2008) App. B.8). Hospital, laboratory, plant, maker's data and readings invented.")
lb = ItemSheet("Lab", "St Aldhelm's Hospital (invented): pathology laboratory, eight VAV fume "
               "cupboards, exhaust fan and stack, make-up air handling unit", LAB_SRC)
lb.heading("Fume cupboards (the typical one, then all eight)")
lb.add("W", "Sash opening width, typical 1.8 m cupboard", "W", 1.5, "m")
lb.add("H", "Sash working height", "H", 0.5, "m")
lb.add("A", "Sash opening area", "A", "={W}*{H}", "m²")
lb.add("Aft", "Sash opening area, ft²", "A_US", "={A}*10.76", "ft²")
lb.add("vf", "Face velocity, design", "v_f", 0.5, "m/s")
lb.add("vfpm", "Face velocity, fpm (US test report)", "v_f,US", "={vf}*196.85", "fpm")
lb.add("vfpm2", "Face velocity, fpm (first draft)", "v_f,US2", "={vf}*3.281", "fpm",
       planted=("unit-scale", "m/s to fpm by 3.281 alone: ft/s written as fpm, ×60 missing"))
lb.add("Qfc", "Exhaust per cupboard, sash open", "Q_fc", "={A}*{vf}", "m³/s")
lb.add("Qfccfm", "Exhaust per cupboard, cfm", "Q_fc,US", "={Qfc}*2119", "cfm")
lb.add("Qfccfm2", "Exhaust per cupboard, cfm (first draft)", "Q_fc,US2", "={Qfc}/2119", "cfm",
       planted=("unit-scale", "m³/s to cfm divided by 2119: wrong way round"))
lb.add("QfcUS", "Exhaust per cupboard, US check (area × face velocity)", "Q_fc,US c",
       "={Aft}*{vfpm}", "cfm")
lb.add("Qmax", "Exhaust, all sashes open (Cupboards sheet)", "Q_max", "=Cupboards!F10/1000",
       "m³/s")
lb.add("div", "VAV diversity", "d", 70, "%")
lb.add("Qex", "Exhaust, design with diversity", "Q_ex", "={Qmax}*{div}/100", "m³/s")
lb.add("Qex2", "Exhaust, design with diversity (first draft)", "Q_ex2", "={Qmax}*{div}",
       "m³/s", planted=("unit-scale", "a % used as a fraction: 100 too large"))
lb.heading("Laboratory air changes")
lb.add("Lr", "Laboratory length", "L", 18, "m")
lb.add("Br", "Laboratory width", "B", 9, "m")
lb.add("Hr", "Laboratory ceiling height", "H_r", 3.0, "m")
lb.add("Vol", "Laboratory volume", "V", "={Lr}*{Br}*{Hr}", "m³")
lb.add("ACH", "Air changes at the design exhaust", "n", "={Qex}*3600/{Vol}", "1/h")
lb.add("ACH2", "Air changes at the design exhaust (first draft)", "n_2", "={Qex}*60/{Vol}",
       "1/h", planted=("unit-scale", "m³/s over m³ times 60 for an hourly rate: 3600 belongs"))
lb.heading("Make-up air")
lb.add("off", "Offset, make-up below the exhaust", "f_off", 10, "%")
lb.add("Qsup", "Make-up air", "Q_sup", "={Qex}*(1-{off}/100)", "m³/s")
lb.add("Qsupcfm", "Make-up air, cfm", "Q_sup,US", "={Qsup}*2119", "cfm")
lb.add("tout", "Outdoor air, winter design", "t_o", -4, "°C")
lb.add("tsup", "Supply air temperature", "t_s", 18, "°C")
lb.add("dT", "Temperature rise across the heater battery", "ΔT", "={tsup}-{tout}", "K")
lb.add("rho", "Air density", "ρ", 1.2, "kg/m³")
lb.add("cp", "Specific heat of air", "c_p", 1.005, "kJ/(kg·K)")
lb.add("Qheat", "Heating of the make-up air", "Q_h", "={rho}*{cp}*{Qsup}*{dT}", "kW")
lb.add("QheatB", "Heating of the make-up air, Btu/h", "Q_h,US", "={Qheat}*3412", "Btu/h")
lb.add("toutF", "Outdoor air, °F", "t_o,F", "={tout}*1.8+32", "°F")
lb.add("tsupF", "Supply air, °F", "t_s,F", "={tsup}*1.8+32", "°F")
lb.add("QhUS", "Heating, US check (1.08·cfm·ΔT)", "Q_h,US c",
       "=1.08*{Qsupcfm}*({tsupF}-{toutF})", "Btu/h")
lb.add("QhUS2", "Heating, US check (first draft)", "Q_h,US c2", "=1.08*{Qsupcfm}*{dT}",
       "Btu/h", planted=("unit-scale", "a rise in K where 1.08 needs Δ°F: 1.8 too small"))
lb.add("pb", "Site barometer (invented)", "p_b", 100.5, "kPa")
lb.add("Ts", "Supply air temperature, kelvin", "T_s", "={tsup}+273.15", "K")
lb.add("Ts2", "Supply air temperature, kelvin (first draft)", "T_s2", "={tsup}", "K",
       planted=("offset-scale", "a °C reading set equal to kelvins"))
lb.add("rhos", "Supply air density, check", "ρ_s", "={pb}*1000/(287.05*{Ts})", "kg/m³")
lb.add("eff", "Run-around coil recovery", "ε_r", 45, "%")
lb.add("Qrec", "Heat recovered", "Q_rec", "={Qheat}*{eff}/100", "kW")
lb.add("Qnet", "Heater battery duty", "Q_net", "={Qheat}-{Qrec}", "kW")
lb.add("Prh", "Room reheat, perimeter trench heater", "P_rh", 6000, "W")
lb.add("Qtot", "Heating load, laboratory", "Q_tot", "={Qnet}+{Prh}/1000", "kW")
lb.add("Qtot2", "Heating load, laboratory (first draft)", "Q_tot2", "={Qnet}+{Prh}", "kW",
       planted=("unit-scale", "W added to kW"))
lb.add("dTw", "LPHW flow and return difference (80/60 °C)", "ΔT_w", 20, "K")
lb.add("mw", "LPHW flow to the battery", "ṁ_w", "={Qnet}/(4.19*{dTw})", "kg/s")
lb.add("Vw", "LPHW flow to the battery, L/s", "V̇_w", "={mw}/0.978", "L/s")
lb.heading("Exhaust fan, duct and stack")
lb.add("D", "Exhaust main diameter", "D", 630, "mm")
lb.add("Ad", "Exhaust main area", "A_d", "=PI()*({D}/1000)^2/4", "m²")
lb.add("vd", "Velocity in the exhaust main, all sashes open", "v_d", "={Qmax}/{Ad}", "m/s")
lb.add("Ds", "Stack diameter", "D_s", 430, "mm")
lb.add("vs", "Stack exit velocity, all sashes open", "v_s", "={Qmax}/(PI()*({Ds}/1000)^2/4)",
       "m/s")
lb.add("vsfpm", "Stack exit velocity, fpm", "v_s,US", "={vs}*196.85", "fpm")
lb.add("dpf", "Fan pressure rise, total", "Δp_f", 850, "Pa")
lb.add("dpin", "Fan pressure rise, in. w.c. (US fan maker)", "Δp_f,US", "={dpf}/249.1",
       "in. w.c.")
lb.add("dpin2", "Fan pressure rise, in. w.c. (first draft)", "Δp_f,US2", "={dpf}/25.4",
       "in. w.c.", planted=("unit-scale", "Pa read as mm w.c. and divided by 25.4"))
lb.add("etaf", "Fan and drive efficiency", "η_f", 62, "%")
lb.add("Pf", "Fan absorbed power, all sashes open", "P_f", "={Qmax}*{dpf}/({etaf}/100)/1000",
       "kW")
lb.add("Pf2", "Fan absorbed power (first draft)", "P_f2", "={Qmax}*{dpf}/({etaf}/100)", "kW",
       planted=("unit-scale", "m³/s × Pa gives W, written as kW: the /1000 missing"))
lb.add("Qmaxcfm", "Exhaust, all sashes open, cfm", "Q_max,US", "={Qmax}*2119", "cfm")
lb.add("bhp", "Fan brake horsepower, US check", "P_f,US",
       "={Qmaxcfm}*{dpin}/(6356*{etaf}/100)", "hp")
lb.add("Pex", "Fan power at the design diversity (fan laws)", "P_ex", "={Pf}*({div}/100)^3",
       "kW")
lb.add("Ey", "Fan energy a year, continuous", "E_y", "={Pex}*8760", "kWh/yr")
LABS = lb.finish()

_vf = lb.ref("vf")
CUPS = {
    "A1": "St Aldhelm's pathology laboratory: fume cupboard schedule (invented sizes)",
    "A2": "Sources: flow = sash width × height × face velocity (common practice); 1 m³/s = "
          "1000 L/s (SI Brochure 9th ed.).",
    "A3": CAUTION,
    "A5": "Cupboard type", "B5": "Number [-]", "C5": "Sash width [m]", "D5": "Sash height [m]",
    "E5": "Flow each [m³/s]", "F5": "Flow, all [L/s]",
    "A10": "Total",
}
for r, (fc, n, w) in enumerate([("1.8 m bench, microbiology and histology", 5, 1.5),
                                ("1.5 m bench, cytology", 2, 1.2),
                                ("2.1 m walk-in, chemistry", 1, 1.8)], start=6):
    CUPS[f"A{r}"], CUPS[f"B{r}"], CUPS[f"C{r}"], CUPS[f"D{r}"] = fc, n, w, 0.5
    CUPS[f"E{r}"] = f"=C{r}*D{r}*{_vf}"
    CUPS[f"F{r}"] = f"=B{r}*E{r}*1000"
CUPS["F7"] = "=B7*E7*100"
CUPS["F10"] = "=SUM(F6:F8)"
CUPS_PLANTED = {"Cupboards!F7": ("unit-scale", "m³/s to L/s by 100: 10 too small")}

LABB = {
    "trade": "hospital laboratory: VAV fume cupboard exhaust, make-up air heating, fan and stack",
    "sheets": [("Lab", LABS), ("Cupboards", CUPS)],
    "planted": {**lb.planted, **CUPS_PLANTED},
}

BOOKS = {"hangar-foam-skellow-fen": HGRB, "feed-barge-skerra-voe": FBB,
         "asphalt-heater-brackenhurst": APB, "lab-fume-exhaust-st-aldhelms": LABB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()

# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.
