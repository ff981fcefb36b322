#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review72), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; the layout
follows corpus/sheets/review64/make_books.py.

Trades: a small town's water reservoir and booster pump station (demand in ML/d, L/s and gpm,
head in m and ft, pressure in kPa and psi, power in kW and hp); a dairy's skim milk evaporator
and its CIP caustic (kg/h and lb/h, % solids, steam economy, °C and K, kJ/kg); a quarry's
primary crusher and its conveyor drive (t/h and stph, kW and hp, belt speed in m/s and fpm,
g applied or left out); a greenhouse's gas-fired CHP engine and its CO2 enrichment (m³/h of
natural gas, kWh, MJ/m³ and Btu/scf, ppm CO2 and kg/h, °C). All scenarios, sites, firms,
readings and maker's data are invented (demonstration only); the formulas and published factors
are the trade's own, with their sources named in a text cell at the top of each sheet ("from
memory" where recalled and not checked, "common practice" for a fact of the trade with no single
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
# Book 1: small town water reservoir and booster pump station (L/d, ML/d, m³/h, L/s, gpm, MGD,
# h, d, m³, US gal, m², m, mm, ft, kPa, kPa(g), psi, psig, kg/m³, m/s, %, kW, hp, kWh/d,
# kWh/ML, mg/L, kg/d, lb/d)
# --------------------------------------------------------------------------------------------
WAT_SRC = (
    "Sources: 1 US gal = 3.785 L, 1 L/s = 15.85 US gpm, 1 m³ = 264.2 US gal, 1 MGD = 3.785 "
    "ML/d, 1 m = 3.281 ft, 1 psi = 6.895 kPa, 1 hp = 0.7457 kW (NIST SP 811 (2008) App. B.8); "
    "g_n = 9.80665 m/s², rounded 9.81 (SI Brochure 9th ed.); hydraulic power P = ρ·g·Q·H and "
    "NPSHa = (p_b + p_s,g − p_v)/(ρ·g) with the suction gauge at the pump centre line "
    "(Karassik et al., Pump Handbook, 4th ed. (2008), from memory); US forms bhp = "
    "gpm·ft/(3960·η) and 1 ft of water = 0.433 psi (Hydraulic Institute, common practice); "
    "Hazen-Williams in SI, h_f = 10.67·L·Q^1.852/(C^1.852·D^4.87), Q in m³/s, L and D in m "
    "(common practice); Joukowsky surge Δp = ρ·a·Δv, Δh = a·Δv/g (Wylie and Streeter, Fluid "
    "Transients in Systems (1993), from memory); chlorine feed kg/d = ML/d × mg/L and lb/d = "
    "MGD × mg/L × 8.34 (AWWA, Water Treatment Plant Design, 5th ed., the pounds formula, from "
    "memory); storage as fire reserve plus balancing 25 % of peak day plus half a day's "
    "average as emergency reserve (common practice; the local fire code governs). Town, "
    "demands, reservoir, pumps, gauges and maker's data invented.")
wa = ItemSheet("Station", "Fellbrook Cross (invented town): service reservoir and booster pump "
               "station to the high zone, peak day design", WAT_SRC)
wa.heading("Demand")
wa.add("pop", "Population served", "N", 8400, "-")
wa.add("qpc", "Average demand per person, all uses", "q", 240, "L/d")
wa.add("ADD", "Average day demand", "Q_ad", "={pop}*{qpc}/1000000", "ML/d")
wa.add("ADD2", "Average day demand (first draft)", "Q_ad2", "={pop}*{qpc}/1000", "ML/d",
       planted=("unit-scale", "L/d to ML/d divided by 1000: gives m³/d, 1000 too large"))
wa.add("pf", "Peak day factor", "f_pd", 1.7, "-")
wa.add("MDD", "Peak day demand", "Q_pd", "={ADD}*{pf}", "ML/d")
wa.add("MDDm3h", "Peak day demand, m³/h", "Q_pd,h", "={MDD}*1000/24", "m³/h")
wa.add("MDDLs", "Peak day demand, L/s", "Q_pd,s", "={MDD}*1000000/86400", "L/s")
wa.add("MDDLs2", "Peak day demand, L/s (first draft)", "Q_pd,s2", "={MDD}*1000000/3600", "L/s",
       planted=("unit-scale", "a per-day flow divided by the seconds of an hour: 24 too large"))
wa.add("MDDgpm", "Peak day demand, US gpm", "Q_pd,US", "={MDDLs}*15.85", "gpm")
wa.add("MDDgpm2", "Peak day demand, US gpm (first draft)", "Q_pd,US2", "={MDDLs}*60*3.785",
       "gpm", planted=("unit-scale", "L to US gal multiplied by 3.785: wrong way round"))
wa.add("MDDmgd", "Peak day demand, MGD (US pump maker's curve)", "Q_pd,MGD", "={MDD}/3.785",
       "MGD")
wa.heading("Reservoir")
wa.add("Qf", "Fire flow (local fire code, invented)", "Q_f", 50, "L/s")
wa.add("tf", "Fire flow duration", "t_f", 2, "h")
wa.add("Vf", "Fire reserve", "V_f", "={Qf}*{tf}*3600/1000", "m³")
wa.add("bal", "Balancing storage, share of peak day", "s_b", 25, "%")
wa.add("Vb", "Balancing storage", "V_b", "={MDD}*1000*{bal}/100", "m³")
wa.add("ed", "Emergency reserve", "t_e", 0.5, "d")
wa.add("Ve", "Emergency storage", "V_e", "={ADD}*{ed}*1000", "m³")
wa.add("Vt", "Storage needed", "V_t", "={Vf}+{Vb}+{Ve}", "m³")
wa.add("Vtg", "Storage needed, US gal", "V_t,US", "={Vt}*264.2", "US gal")
wa.add("Dr", "Reservoir inside diameter", "D_r", 26, "m")
wa.add("Ar", "Reservoir plan area", "A_r", "=PI()*{Dr}^2/4", "m²")
wa.add("hw", "Working depth needed", "h_w", "={Vt}/{Ar}", "m")
wa.heading("Head")
wa.add("BWL", "Reservoir bottom water level", "z_BWL", 112.5, "m")
wa.add("zhp", "High zone's highest service connection", "z_hp", 151.0, "m")
wa.add("Hs", "Static lift", "H_s", "={zhp}-{BWL}", "m")
wa.add("pres", "Minimum residual pressure at the highest connection", "p_res", 200, "kPa(g)")
wa.add("Hres", "Residual pressure as head", "H_res", "={pres}/9.81", "m")
wa.add("rho", "Density of water at 12 °C", "ρ", 999.5, "kg/m³")
wa.add("Hres2", "Residual pressure as head (first draft)", "H_res2", "={pres}*1000/{rho}", "m",
       planted=("result-unit", "p/ρ without g: gives J/kg, not a head"))
wa.add("hrs", "Pumping hours on the peak day", "t_p", 20, "h/d")
wa.add("np", "Duty pumps (plus one standby)", "n_p", 2, "-")
wa.add("Qs", "Station flow", "Q_s", "={MDD}*1000000/({hrs}*3600)", "L/s")
wa.add("Lm", "Rising main length", "L_m", 2400, "m")
wa.add("Dm", "Rising main bore", "D_m", 300, "mm")
wa.add("C", "Hazen-Williams C, cement-lined ductile iron", "C", 120, "-")
wa.add("hf", "Rising main friction loss, Hazen-Williams", "h_f",
       "=10.67*{Lm}*({Qs}/1000)^1.852/({C}^1.852*({Dm}/1000)^4.87)", "m")
wa.add("hm", "Station pipework and valve losses", "h_m", 1.5, "m")
wa.add("TDH", "Total dynamic head", "H", "={Hs}+{hf}+{hm}+{Hres}", "m")
wa.add("TDHft", "Total dynamic head, ft (US pump maker)", "H_US", "={TDH}*3.281", "ft")
wa.add("TDHft2", "Total dynamic head, ft (first draft)", "H_US2", "={TDH}*0.3048", "ft",
       planted=("unit-scale", "m to ft multiplied by 0.3048: wrong way round"))
wa.add("dp", "Pump differential pressure", "Δp", "={rho}*9.81*{TDH}/1000", "kPa")
wa.add("dppsi", "Pump differential pressure, psi", "Δp_US", "={dp}/6.895", "psi")
wa.add("dppsiUS", "Pump differential pressure, psi (US check, 0.433 psi/ft)", "Δp_US c",
       "={TDHft}*0.433", "psi")
wa.heading("Rising main velocity and surge")
wa.add("v", "Velocity in the rising main", "v", "={Qs}/1000/(PI()*({Dm}/1000)^2/4)", "m/s")
wa.add("v2", "Velocity in the rising main (first draft)", "v_2", "={Qs}/1000/(PI()*{Dm}^2/4)",
       "m/s", planted=("unit-scale", "a bore in mm squared beside m³/s: 10⁶ too small"))
wa.add("a", "Pressure wave speed, ductile iron main (from memory)", "a", 1050, "m/s")
wa.add("dpJ", "Surge pressure rise on a sudden stop (Joukowsky)", "Δp_J",
       "={rho}*{a}*{v}/1000", "kPa")
wa.add("dhJ", "Surge head rise on a sudden stop", "Δh_J", "={a}*{v}/9.81", "m")
wa.add("dhJ2", "Surge head rise on a sudden stop (first draft)", "Δh_J2", "={a}*{v}", "m",
       planted=("result-unit", "a·Δv without g: gives m²/s², not a head"))
wa.heading("Suction (NPSH)")
wa.add("pb", "Site barometer (station at 110 m, invented)", "p_b", 99.8, "kPa")
wa.add("psg", "Suction gauge at the pump centre line, reservoir at BWL", "p_s,g", 22, "kPa(g)")
wa.add("pv", "Vapour pressure of water at 12 °C (absolute)", "p_v", 1.40, "kPa")
wa.add("psa", "Suction pressure, absolute (barometer typed from the site log)", "p_s,a",
       "={psg}+99.8", "kPa")
wa.add("NPSHa", "NPSH available", "NPSHa", "=({pb}+{psg}-{pv})*1000/({rho}*9.81)", "m")
wa.add("NPSHa2", "NPSH available (first draft)", "NPSHa2", "=({psg}-{pv})*1000/({rho}*9.81)",
       "m", planted=("offset-scale", "a gauge reading less an absolute vapour pressure"))
wa.add("NPSHr", "NPSH required at the duty point (maker)", "NPSHr", 4.2, "m")
wa.add("mg", "NPSH margin", "ΔNPSH", "={NPSHa}-{NPSHr}", "m")
wa.heading("Power and energy")
wa.add("eta", "Pump efficiency at the duty point (maker)", "η_p", 79, "%")
wa.add("etam", "Motor efficiency (IE3)", "η_m", 95.4, "%")
wa.add("Ph", "Hydraulic power per pump", "P_h", "={rho}*9.81*{Qs}/{np}/1000*{TDH}/1000", "kW")
wa.add("Ph2", "Hydraulic power per pump (first draft)", "P_h2",
       "={rho}*9.81*{Qs}/{np}/1000*{TDH}", "kW",
       planted=("unit-scale", "ρ·g·Q·H in W written as kW: the /1000 missing"))
wa.add("Psh", "Shaft power per pump", "P_sh", "={Ph}/({eta}/100)", "kW")
wa.add("Pshhp", "Shaft power per pump, hp", "P_sh,US", "={Psh}/0.7457", "hp")
wa.add("Qpgpm", "Flow per pump, US gpm", "Q_p,US", "={Qs}/{np}*15.85", "gpm")
wa.add("bhpUS", "Shaft power per pump, hp (US check, gpm·ft/3960/η)", "P_sh,US c",
       "={Qpgpm}*{TDHft}/(3960*{eta}/100)", "hp")
wa.add("whpUS", "Water power per pump, hp (US check, gpm·psi/1714)", "P_h,US",
       "={Qpgpm}*{dppsi}/1714", "hp")
wa.add("Pin", "Motor input per pump", "P_in", "={Psh}/({etam}/100)", "kW")
wa.add("Ed", "Energy on the peak day", "E_d", "={Pin}*{np}*{hrs}", "kWh/d")
wa.add("Es", "Specific energy", "e", "={Ed}/{MDD}", "kWh/ML")
wa.add("Es2", "Specific energy (first draft)", "e_2", "={Pin}*{np}/{MDD}", "kWh/ML",
       planted=("unit-scale", "kW over ML/d: the per day left as per hour, 24 too small"))
wa.heading("Chlorine and gauges")
wa.add("dose", "Chlorine dose at the booster (sodium hypochlorite as Cl2)", "c_Cl", 1.2, "mg/L")
wa.add("Cl", "Chlorine feed", "ṁ_Cl", "={MDD}*{dose}", "kg/d")
wa.add("ClUS", "Chlorine feed, lb/d (US pounds formula)", "ṁ_Cl,US", "={MDDmgd}*{dose}*8.34",
       "lb/d")
wa.add("pdg", "Discharge gauge on test", "p_d,g", 545, "kPa(g)")
wa.add("pdpsig", "Discharge gauge on test, psig", "p_d,US", "={pdg}/6.895", "psig")
wa.add("pda", "Discharge pressure on test, absolute", "p_d,a", "={pdg}+{pb}", "kPa")
wa.add("Htest", "Pump head on test (gauges at one height)", "H_test", "=({pdg}-{psg})/9.81", "m")
WATS = wa.finish()

WATB = {
    "trade": "water supply: town service reservoir and booster pump station",
    "sheets": [("Station", WATS)],
    "planted": dict(wa.planted),
}

# --------------------------------------------------------------------------------------------
# Book 2: dairy skim milk evaporator and CIP caustic (kg/h, lb/h, %, % w/w, t/d, kg/kg,
# bar(g), bar a, kJ/kg, Btu/lb, kW, Btu/h, °C, K, °F, Δ°F, W/(m²·K), m², ft², kJ/(kg·K), kg/s,
# kg/L, m³/h, gpm, L, kg, US gal, g/mol, mol/L, min, m/s, mm, mPa·s)
# --------------------------------------------------------------------------------------------
EVA_SRC = (
    "Sources: 1 kg = 2.205 lb, 1 kJ/kg = 0.4299 Btu/lb (1 Btu/lb = 2.326 kJ/kg), 1 kW = 3412 "
    "Btu/h, 1 m² = 10.76 ft², 1 m³/h = 4.403 US gpm, 1 US gal = 3.785 L (NIST SP 811 (2008) "
    "App. B.8); K = °C + 273.15 (SI Brochure 9th ed.); °F = 1.8·°C + 32, a difference ×1.8 "
    "(NIST SP 811); solids balance F·x_F = P·x_P, evaporation E = F − P, steam economy E/ṁ_s "
    "(Walstra et al., Dairy Science and Technology, 2nd ed. (2006), from memory); steam h_fg = "
    "2031 kJ/kg at 9 bar a, 2341 kJ/kg at 66 °C, 2383 kJ/kg at 48 °C (IAPWS-IF97 steam tables, "
    "from memory); Q = U·A·ΔT and Q = ṁ·c_p·ΔT (common practice); skim milk c_p 3.93 "
    "kJ/(kg·K) (from memory). Dairy, evaporator, maker's data and readings invented.")
ev = ItemSheet("Evaporator", "Ashgill Moor creamery (invented): three-effect falling-film skim "
               "milk evaporator with thermal vapour recompression, design hour", EVA_SRC)
ev.heading("Mass balance")
ev.add("F", "Skim milk feed", "F", 24000, "kg/h")
ev.add("Flb", "Skim milk feed, lb/h (US maker's rating)", "F_US", "={F}*2.205", "lb/h")
ev.add("Flb2", "Skim milk feed, lb/h (first draft)", "F_US2", "={F}/2.205", "lb/h",
       planted=("unit-scale", "kg to lb divided by 2.205: wrong way round"))
ev.add("xF", "Feed total solids", "x_F", 9.0, "%")
ev.add("xP", "Concentrate total solids", "x_P", 48, "%")
ev.add("S", "Solids through the evaporator", "ṁ_TS", "={F}*{xF}/100", "kg/h")
ev.add("S2", "Solids through the evaporator (first draft)", "ṁ_TS2", "={F}*{xF}", "kg/h",
       planted=("unit-scale", "a % used as a fraction: 100 too large"))
ev.add("P", "Concentrate", "P", "={S}/({xP}/100)", "kg/h")
ev.add("E", "Water evaporated", "E", "={F}-{P}", "kg/h")
ev.add("Elb", "Water evaporated, lb/h", "E_US", "={E}*2.205", "lb/h")
ev.add("hrs", "Production hours between cleans", "t_op", 20, "h/d")
ev.add("Pd", "Concentrate per day", "P_d", "={P}*{hrs}/1000", "t/d")
ev.heading("Steam")
ev.add("econ", "Steam economy, kg evaporated per kg of steam (maker)", "SE", 6.5, "kg/kg")
ev.add("ms", "Motive steam to the thermocompressor", "ṁ_s", "={E}/{econ}", "kg/h")
ev.add("mslb", "Motive steam, lb/h", "ṁ_s,US", "={ms}*2.205", "lb/h")
ev.add("pg", "Motive steam pressure at the thermocompressor", "p_g", 8.0, "bar(g)")
ev.add("pb", "Site barometer (invented)", "p_b", 1.00, "bar a")
ev.add("pa", "Motive steam pressure, absolute (for the tables)", "p_a", "={pg}+{pb}", "bar a")
ev.add("pa1", "Motive steam pressure, absolute (barometer typed, as the boiler log has it)",
       "p_a,log", "={pg}+1.0", "bar a")
ev.add("pa2", "Motive steam pressure, absolute (first draft)", "p_a2", "={pg}", "bar a",
       planted=("offset-scale", "a gauge reading set equal to an absolute pressure"))
ev.add("hfg", "Latent heat at 9 bar a (tables)", "h_fg", 2031, "kJ/kg")
ev.add("hfgUS", "Latent heat, Btu/lb", "h_fg,US", "={hfg}*0.4299", "Btu/lb")
ev.add("hfgUS2", "Latent heat, Btu/lb (first draft)", "h_fg,US2", "={hfg}*2.326", "Btu/lb",
       planted=("unit-scale", "kJ/kg to Btu/lb multiplied by 2.326: wrong way round"))
ev.add("Qs", "Heat in the motive steam", "Q_s", "={ms}*{hfg}/3600", "kW")
ev.add("Qs2", "Heat in the motive steam (first draft)", "Q_s2", "={ms}*{hfg}", "kW",
       planted=("unit-scale", "kg/h × kJ/kg written as kW: the /3600 missing"))
ev.add("qE", "Steam heat per kg of water evaporated", "q_E", "={ms}*{hfg}/{E}", "kJ/kg")
ev.heading("First effect")
ev.add("th", "Heating vapour in the first calandria (after the TVR)", "t_h", 72, "°C")
ev.add("t1", "Boiling temperature, first effect", "t_1", 66, "°C")
ev.add("dT", "Temperature difference across the first calandria", "ΔT", "={th}-{t1}", "K")
ev.add("T1K", "Boiling temperature, first effect, absolute", "T_1", "={t1}+273.15", "K")
ev.add("T1K2", "Boiling temperature, first effect, absolute (first draft)", "T_12", "={t1}",
       "K", planted=("offset-scale", "a °C reading set equal to kelvins"))
ev.add("t1F", "Boiling temperature, first effect, °F (US maker)", "t_1,F", "={t1}*1.8+32", "°F")
ev.add("ne", "Effects", "n_e", 3, "-")
ev.add("hfg1", "Latent heat at 66 °C (tables)", "h_fg1", 2341, "kJ/kg")
ev.add("Q1", "First effect duty (an equal share of the evaporation)", "Q_1",
       "={E}/{ne}*{hfg1}/3600", "kW")
ev.add("U", "Overall heat transfer coefficient, falling film (maker)", "U", 2000, "W/(m²·K)")
ev.add("A1", "First effect heating surface", "A_1", "={Q1}*1000/({U}*{dT})", "m²")
ev.add("A12", "First effect heating surface (first draft)", "A_12", "={Q1}/({U}*{dT})", "m²",
       planted=("unit-scale", "kW over W/(m²·K)·K: the ×1000 missing"))
ev.add("A1ft", "First effect heating surface, ft²", "A_1,US", "={A1}*10.76", "ft²")
ev.heading("Preheat and condenser")
ev.add("tin", "Skim milk from the silo", "t_in", 6, "°C")
ev.add("tpre", "Skim milk after the preheaters", "t_pre", 72, "°C")
ev.add("cp", "Specific heat of skim milk", "c_p", 3.93, "kJ/(kg·K)")
ev.add("Qpre", "Preheat duty", "Q_pre", "={F}*{cp}*({tpre}-{tin})/3600", "kW")
ev.add("dTF", "Preheat temperature rise, °F", "ΔT_F", "=({tpre}-{tin})*1.8", "Δ°F")
ev.add("QpreB", "Preheat duty, Btu/h", "Q_pre,US", "={Qpre}*3412", "Btu/h")
ev.add("hfgc", "Latent heat at 48 °C, last effect (tables)", "h_fg,c", 2383, "kJ/kg")
ev.add("Qc", "Condenser duty (last effect's vapour)", "Q_c", "={E}/{ne}*{hfgc}/3600", "kW")
ev.add("cpw", "Specific heat of water", "c_pw", 4.19, "kJ/(kg·K)")
ev.add("dTcw", "Cooling water temperature rise", "ΔT_cw", 8, "K")
ev.add("mcw", "Cooling water flow", "ṁ_cw", "={Qc}/({cpw}*{dTcw})", "kg/s")
ev.add("rhow", "Density of cooling water", "ρ_w", 0.997, "kg/L")
ev.add("Vcw", "Cooling water flow, m³/h", "V̇_cw", "={mcw}*3.6/{rhow}", "m³/h")
ev.add("Vcwg", "Cooling water flow, US gpm", "V̇_cw,US", "={Vcw}*4.403", "gpm")
EVAS = ev.finish()

CIP_SRC = (
    "Sources: NaOH molar mass 40.00 g/mol (IUPAC standard atomic weights, from memory); molar "
    "concentration c = w·ρ/M (common practice); 50 % w/w stock density 1.525 kg/L and 1.5 % "
    "w/w density 1.015 kg/L at 20 °C (Perry's Chemical Engineers' Handbook, 8th ed., from "
    "memory); c_p of dilute caustic about 4.0 kJ/(kg·K) (from memory); CIP line velocity 1.5 "
    "to 2.0 m/s (common practice); 3 in hygienic tube bore 72.9 mm (maker, invented); Re = "
    "ρ·v·D/μ (common practice); 1 m³/h = 4.403 US gpm, 1 US gal = 3.785 L (NIST SP 811 "
    "(2008) App. B.8); K = °C + 273.15 (SI Brochure 9th ed.). Readings invented.")
ci = ItemSheet("CIP", "Ashgill Moor creamery (invented): CIP caustic make-up and heating for "
               "the evaporator clean", CIP_SRC)
ci.heading("Caustic make-up")
ci.add("Vt", "Caustic tank working volume", "V_t", 8000, "L")
ci.add("w", "Caustic strength (NaOH)", "w", 1.5, "% w/w")
ci.add("rho", "Density of the 1.5 % caustic", "ρ", 1.015, "kg/L")
ci.add("msol", "Mass of caustic solution", "m_sol", "={Vt}*{rho}", "kg")
ci.add("mN", "NaOH needed", "m_NaOH", "={msol}*{w}/100", "kg")
ci.add("w50", "Stock caustic strength", "w_st", 50, "% w/w")
ci.add("mst", "Stock caustic needed", "m_st", "={mN}/({w50}/100)", "kg")
ci.add("rst", "Density of the 50 % stock", "ρ_st", 1.525, "kg/L")
ci.add("Vst", "Stock caustic volume to dose", "V_st", "={mst}/{rst}", "L")
ci.add("Vst2", "Stock caustic volume to dose (first draft)", "V_st2", "={mst}*{rst}", "L",
       planted=("result-unit", "mass times density where mass over density belongs"))
ci.add("Vstg", "Stock caustic volume, US gal (drum pump scale)", "V_st,US", "={Vst}/3.785",
       "US gal")
ci.add("M", "Molar mass of NaOH", "M", 40.00, "g/mol")
ci.add("c", "Caustic molarity (titration check)", "c", "={w}/100*{rho}*1000/{M}", "mol/L")
ci.heading("Heating")
ci.add("tc", "Caustic after make-up", "t_c", 20, "°C")
ci.add("tcip", "Caustic set point", "t_CIP", 75, "°C")
ci.add("dT", "Temperature rise", "ΔT", "={tcip}-{tc}", "K")
ci.add("cps", "Specific heat of the caustic", "c_p", 4.0, "kJ/(kg·K)")
ci.add("th", "Heat-up time", "t_h", 25, "min")
ci.add("Qh", "Heater duty", "Q_h", "={msol}*{cps}*{dT}/({th}*60)", "kW")
ci.add("Qh2", "Heater duty (first draft)", "Q_h2", "={msol}*{cps}*{dT}/{th}", "kW",
       planted=("unit-scale", "kJ per minute written as kW: the ×60 missing"))
ci.add("msh", "Steam to the caustic heater", "ṁ_s,h", "={Qh}*3600/{Evaporator.hfg}", "kg/h")
ci.add("tcipF", "Caustic set point, °F (US valve maker)", "t_CIP,F", "={tcip}*1.8+32", "°F")
ci.add("TcipK", "Caustic set point, absolute", "T_CIP", "={tcip}+273.15", "K")
ci.heading("Flow")
ci.add("v", "CIP velocity", "v", 1.8, "m/s")
ci.add("Dt", "Tube bore, 3 in hygienic", "D", 72.9, "mm")
ci.add("Qc", "CIP supply flow", "Q_CIP", "={v}*PI()*({Dt}/1000)^2/4*3600", "m³/h")
ci.add("Qc2", "CIP supply flow (first draft)", "Q_CIP2", "={v}*PI()*{Dt}^2/4*3600", "m³/h",
       planted=("unit-scale", "a bore in mm squared beside m/s: 10⁶ too large"))
ci.add("Qcg", "CIP supply flow, US gpm", "Q_CIP,US", "={Qc}*4.403", "gpm")
ci.add("mu", "Viscosity of the hot caustic", "μ", 0.40, "mPa·s")
ci.add("Re", "Reynolds number in the tube", "Re", "={rho}*1000*{v}*{Dt}/1000/({mu}/1000)", "-")
CIPS = ci.finish(others=[ev])

EVAB = {
    "trade": "dairy: skim milk evaporator and CIP caustic",
    "sheets": [("Evaporator", EVAS), ("CIP", CIPS)],
    "planted": {**ev.planted, **ci.planted},
}

# --------------------------------------------------------------------------------------------
# Book 3: quarry primary crusher and conveyor drive (t/h, stph, h/d, t/d, kWh/t, mm, μm, kW,
# hp, %, m, °, m³, t/m³, t, d, lb/ft³, m/s, fpm, m², kg/m, N, kN, lbf, ft, rpm, N·m, V, A)
# --------------------------------------------------------------------------------------------
CRU_SRC = (
    "Sources: 1 t = 1.102 short ton, 1 kW = 1.341 hp, 1 t/m³ = 62.43 lb/ft³ (NIST SP 811 "
    "(2008) App. B.8); Bond's third theory W = 10·W_i·(1/√P80 − 1/√F80), P80 and F80 in μm, "
    "W_i as tested in kWh per short ton, ×1.102 for kWh per tonne (Wills' Mineral Processing "
    "Technology, 8th ed. (2016), from memory); conical pile V = π·r²·h/3 at the angle of "
    "repose (common practice). Quarry, rock, crusher and readings invented.")
cr = ItemSheet("Crusher", "Stainmoor Edge quarry (invented): primary jaw crusher and surge "
               "pile, limestone, design hour", CRU_SRC)
cr.heading("Throughput")
cr.add("Q", "Primary crusher throughput", "Q", 450, "t/h")
cr.add("Qst", "Primary crusher throughput, short tons (US crusher maker)", "Q_US",
       "={Q}*1.102", "stph")
cr.add("Qst2", "Primary crusher throughput, short tons (first draft)", "Q_US2", "={Q}/1.102",
       "stph", planted=("unit-scale", "t to short tons divided by 1.102: wrong way round"))
cr.add("hrs", "Crushing hours", "t_op", 10, "h/d")
cr.add("Qd", "Crushed rock per day", "Q_d", "={Q}*{hrs}", "t/d")
cr.heading("Crusher power (Bond)")
cr.add("Wis", "Bond crushing work index, as tested (kWh per short ton)", "W_i,US", 13.5, "kWh/ton")
cr.add("Wi", "Bond crushing work index, per tonne", "W_i", "={Wis}*1.102", "kWh/t")
cr.add("F80", "Feed 80 % passing size", "F80", 600, "mm")
cr.add("P80", "Product 80 % passing size", "P80", 160, "mm")
cr.add("F80u", "Feed 80 % passing size, μm", "F80_μ", "={F80}*1000", "μm")
cr.add("P80u", "Product 80 % passing size, μm", "P80_μ", "={P80}*1000", "μm")
cr.add("W", "Specific crushing energy (Bond)", "W",
       "=10*{Wi}*(1/SQRT({P80u})-1/SQRT({F80u}))", "kWh/t")
cr.add("W2", "Specific crushing energy (first draft)", "W_2",
       "=10*{Wi}*(1/SQRT({P80u})-1/SQRT({F80}))", "kWh/t",
       planted=("unit-scale", "feed size in mm beside product size in μm under Bond's roots"))
cr.add("Pc", "Crusher power draw", "P_c", "={W}*{Q}", "kW")
cr.add("Pchp", "Crusher power draw, hp", "P_c,US", "={Pc}*1.341", "hp")
cr.add("Pm", "Crusher motor rating", "P_m", 160, "kW")
cr.add("ld", "Crusher motor load", "λ", "={Pc}/{Pm}*100", "%")
cr.add("rr", "Reduction ratio", "R", "={F80}/{P80}", "-")
cr.heading("Surge pile")
cr.add("hp", "Surge pile height", "h_p", 12, "m")
cr.add("ar", "Angle of repose", "α", 37, "°")
cr.add("r", "Surge pile base radius", "r", "={hp}/TAN(RADIANS({ar}))", "m")
cr.add("Vp", "Surge pile live volume (cone)", "V_p", "=PI()*{r}^2*{hp}/3", "m³")
cr.add("rhob", "Bulk density, crushed limestone", "ρ_b", 1.60, "t/m³")
cr.add("mp", "Surge pile mass", "m_p", "={Vp}*{rhob}", "t")
cr.add("dd", "Days of crushing held in the pile", "t_s", "={mp}/{Qd}", "d")
cr.add("rhobUS", "Bulk density, lb/ft³ (US conveyor tables)", "ρ_b,US", "={rhob}*62.43",
       "lb/ft³")
CRUS = cr.finish()

CON_SRC = (
    "Sources: 1 m/s = 196.85 fpm, 1 m = 3.281 ft, 1 N = 0.2248 lbf, 1 hp = 0.7457 kW (NIST SP "
    "811 (2008) App. B.8); g_n = 9.81 m/s² (SI Brochure 9th ed.); load per metre q_G = "
    "Q/(3.6·v) kg/m with Q in t/h, capacity Q = 3600·A·v·ρ; main resistance F_H = "
    "C·f·L·g·[q_R + (2·q_B + q_G)·cos δ], slope resistance F_St = q_G·g·H, P_A = F_U·v "
    "(DIN 22101 (2011) and ISO 5048, from memory); Euler-Eytelwein T₂ ≥ F_U/(e^(μθ) − 1), θ "
    "in radians (common practice); CEMA's lift horsepower stph·ft/990 (CEMA, Belt Conveyors "
    "for Bulk Materials, 7th ed., from memory); motor current I = P/(√3·V·pf·η) (common "
    "practice); belt cross-section 0.105 m² for a 1050 mm belt in 35° troughing with a 20° "
    "surcharge (from memory, check against the maker's table). Conveyor, belt, drive and "
    "readings invented.")
co = ItemSheet("Conveyor", "Stainmoor Edge quarry (invented): CV-01 crusher discharge to the "
               "surge pile, 1050 mm belt, head drive", CON_SRC)
co.heading("Belt")
co.add("v", "Belt speed", "v", 2.5, "m/s")
co.add("vfpm", "Belt speed, fpm (US belt maker)", "v_US", "={v}*196.85", "fpm")
co.add("vfpm2", "Belt speed, fpm (first draft)", "v_US2", "={v}*3.281", "fpm",
       planted=("unit-scale", "m/s to ft/s written as fpm: the ×60 missing"))
co.add("Acs", "Load cross-section, 1050 mm belt (table)", "A", 0.105, "m²")
co.add("Qcap", "Belt capacity at this speed", "Q_cap", "=3600*{Acs}*{v}*{Crusher.rhob}", "t/h")
co.add("Qcap2", "Belt capacity at this speed (first draft)", "Q_cap2",
       "={Acs}*{v}*{Crusher.rhob}", "t/h",
       planted=("unit-scale", "m³/s × t/m³ written as t/h: the ×3600 missing"))
co.add("fill", "Belt loading, share of capacity", "φ", "={Crusher.Q}/{Qcap}*100", "%")
co.add("qG", "Load per metre of belt", "q_G", "={Crusher.Q}*1000/(3600*{v})", "kg/m")
co.add("qG2", "Load per metre of belt (first draft)", "q_G2", "={Crusher.Q}*1000/{v}", "kg/m",
       planted=("unit-scale", "t/h over m/s: the /3600 missing"))
co.heading("Resistances and drive")
co.add("L", "Conveyor length, centres", "L", 220, "m")
co.add("H", "Lift", "H", 18, "m")
co.add("qB", "Belt mass per metre", "q_B", 22, "kg/m")
co.add("qR", "Idler rotating mass per metre, carry and return", "q_R", 18, "kg/m")
co.add("f", "Artificial friction factor (DIN 22101)", "f", 0.022, "-")
co.add("Cl", "Length coefficient C (DIN 22101, for 220 m)", "C", 1.6, "-")
co.add("FH", "Main resistances", "F_H",
       "={Cl}*{f}*{L}*9.81*({qR}+(2*{qB}+{qG})*COS(ATAN({H}/{L})))", "N")
co.add("FSt", "Slope resistance (lifting the load)", "F_St", "={qG}*9.81*{H}", "N")
co.add("FSt2", "Slope resistance (first draft)", "F_St2", "={qG}*{H}", "N",
       planted=("result-unit", "q_G·H without g: gives kg, not N"))
co.add("FU", "Effective tension at the drive pulley", "F_U", "={FH}+{FSt}", "N")
co.add("FUkN", "Effective tension, kN", "F_U,kN", "={FU}/1000", "kN")
co.add("FUlbf", "Effective tension, lbf (US belt maker)", "F_U,US", "={FU}*0.2248", "lbf")
co.add("PA", "Power at the drive pulley", "P_A", "={FU}*{v}/1000", "kW")
co.add("PA2", "Power at the drive pulley (first draft)", "P_A2", "={FU}*{v}", "kW",
       planted=("unit-scale", "N·m/s in W written as kW: the /1000 missing"))
co.add("eta", "Drive efficiency, gearbox and coupling", "η", 94, "%")
co.add("PM", "Motor shaft power needed", "P_M", "={PA}/({eta}/100)", "kW")
co.add("PMhp", "Motor shaft power needed, hp", "P_M,US", "={PM}/0.7457", "hp")
co.add("PMhp2", "Motor shaft power needed, hp (first draft)", "P_M,US2", "={PM}*0.7457", "hp",
       planted=("unit-scale", "kW to hp multiplied by 0.7457: wrong way round"))
co.add("Hft", "Lift, ft", "H_US", "={H}*3.281", "ft")
co.add("PlUS", "Power to lift the load, hp (CEMA check, stph·ft/990)", "P_lift,US",
       "={Crusher.Qst}*{Hft}/990", "hp")
co.add("Pl", "Power to lift the load", "P_lift", "={Crusher.Q}/3.6*9.81*{H}/1000", "kW")
co.heading("Pulley and motor")
co.add("mu", "Friction coefficient, lagged pulley, wet", "μ", 0.30, "-")
co.add("wrap", "Angle of wrap, snubbed head pulley", "θ", 210, "°")
co.add("T2", "Slack side tension needed", "T_2", "={FU}/(EXP({mu}*RADIANS({wrap}))-1)", "N")
co.add("T2b", "Slack side tension needed (first draft)", "T_2b", "={FU}/(EXP({mu}*{wrap})-1)",
       "N", planted=("unit-scale", "the wrap angle in degrees inside EXP: radians belong"))
co.add("T1", "Tight side tension", "T_1", "={FU}+{T2}", "N")
co.add("Dp", "Drive pulley diameter, lagged", "D_p", 800, "mm")
co.add("Tq", "Drive pulley torque", "M", "={FU}*{Dp}/2/1000", "N·m")
co.add("np", "Drive pulley speed", "n_p", "={v}*60/(PI()*{Dp}/1000)", "rpm")
co.add("nm", "Motor speed, 4 pole", "n_m", 1480, "rpm")
co.add("ig", "Gearbox ratio needed", "i", "={nm}/{np}", "-")
co.add("V", "Supply voltage, three phase", "V", 400, "V")
co.add("pf", "Motor power factor", "pf", 0.86, "-")
co.add("etam", "Motor efficiency", "η_m", 95.5, "%")
co.add("I", "Motor full-load current at this duty", "I",
       "={PM}*1000/(SQRT(3)*{V}*{pf}*{etam}/100)", "A")
co.add("ekWh", "Conveyor energy per tonne", "e", "={PM}/{Crusher.Q}", "kWh/t")
CONS = co.finish(others=[cr])

CRUB = {
    "trade": "quarrying: primary jaw crusher, surge pile and belt conveyor drive",
    "sheets": [("Crusher", CRUS), ("Conveyor", CONS)],
    "planted": {**cr.planted, **co.planted},
}

# --------------------------------------------------------------------------------------------
# Book 4: greenhouse gas-fired CHP and CO2 enrichment (m³/h, MJ/m³, Btu/scf, kWh/m³, kW, W, %,
# h/d, kWh/d, $/MWh, $/d, Btu/kWh, scfh, m³/d, m³, kg/m³, kJ/(kg·K), °C, kWh, h, kg/s, gpm,
# Btu/h, MBH, m², W/(m²·K), kg/h, t/d, ppm, kPa, g/mol, J/(mol·K), K, kg, 1/h, kg/(ha·h), °F,
# lb/h)
# --------------------------------------------------------------------------------------------
CHP_SRC = (
    "Sources: 1 kWh = 3.6 MJ, 1 kW = 3412 Btu/h, 1 m³ = 35.31 ft³, 1 MJ/m³ = 26.84 Btu/ft³ "
    "(NIST SP 811 (2008) App. B.8); natural gas net calorific value 35.2 MJ/m³ at 15 °C and "
    "101.325 kPa (typical of a UK supply, from memory; the gas bill's figure governs); m³ at "
    "15 °C and 101.325 kPa (ISO 13443) against scf at 60 °F and 14.696 psia, 0.3 % apart, "
    "taken as equal (common practice); heat rate = 3412/η_e Btu/kWh (common practice); "
    "stored heat E = V·ρ·c_p·ΔT, heat loss Q = U·A·ΔT, single glazing with a cover to floor "
    "ratio of 1.3 about 6 W/(m²·K) (common practice; ASHRAE Handbook, Fundamentals, from "
    "memory). Nursery, engine, maker's data, tariff and readings invented.")
ch = ItemSheet("CHP", "Wrayholme Nurseries (invented): 4 ha glasshouse, gas engine CHP with a "
               "heat store, winter design day", CHP_SRC)
ch.heading("Fuel and output")
ch.add("Vg", "Gas to the engine (m³ at 15 °C, 101.325 kPa)", "V̇_g", 420, "m³/h")
ch.add("CV", "Net calorific value of the gas", "CV", 35.2, "MJ/m³")
ch.add("Pf", "Fuel input", "P_f", "={Vg}*{CV}/3.6", "kW")
ch.add("Pf2", "Fuel input (first draft)", "P_f2", "={Vg}*{CV}*3.6", "kW",
       planted=("unit-scale", "MJ/h to kW multiplied by 3.6: wrong way round"))
ch.add("CVUS", "Net calorific value, Btu/scf (US engine maker)", "CV_US", "={CV}*26.84",
       "Btu/scf")
ch.add("CVk", "Net calorific value, kWh/m³", "CV_kWh", "={CV}/3.6", "kWh/m³")
ch.add("ee", "Electrical efficiency (maker, net CV)", "η_e", 42.0, "%")
ch.add("et", "Thermal efficiency (maker, net CV)", "η_th", 45.0, "%")
ch.add("Pe", "Electrical output", "P_e", "={Pf}*{ee}/100", "kW")
ch.add("Pe2", "Electrical output (first draft)", "P_e2", "={Pf}*{ee}", "kW",
       planted=("unit-scale", "a % used as a fraction: 100 too large"))
ch.add("Pth", "Heat output", "P_th", "={Pf}*{et}/100", "kW")
ch.add("Paux", "Engine auxiliaries, coolant pumps and radiator fans (panel meter)", "P_aux",
       22000, "W")
ch.add("Pn", "Net electrical output", "P_n", "={Pe}-{Paux}/1000", "kW")
ch.add("Pn2", "Net electrical output (first draft)", "P_n2", "={Pe}-{Paux}", "kW",
       planted=("unit-scale", "W taken from kW"))
ch.add("hrs", "Engine running hours", "t_r", 18, "h/d")
ch.add("Ed", "Net electricity per day", "E_d", "={Pn}*{hrs}", "kWh/d")
ch.add("pr", "Export price (invented)", "c_e", 95, "$/MWh")
ch.add("rev", "Export revenue per day", "R_d", "={Ed}*{pr}/1000", "$/d")
ch.add("rev2", "Export revenue per day (first draft)", "R_d2", "={Ed}*{pr}", "$/d",
       planted=("unit-scale", "kWh times a price per MWh: 1000 too large"))
ch.add("HR", "Heat rate, net CV", "HR", "=3412/({ee}/100)", "Btu/kWh")
ch.add("Vgs", "Gas to the engine, scfh (US maker)", "V̇_g,US", "={Vg}*35.31", "scfh")
ch.add("Vgs2", "Gas to the engine, scfh (first draft)", "V̇_g,US2", "={Vg}*3.281", "scfh",
       planted=("unit-scale", "m³ to ft³ by the length factor 3.281: it must be cubed"))
ch.add("Vgd", "Gas per day", "V_g,d", "={Vg}*{hrs}", "m³/d")
ch.heading("Heat store and heating water")
ch.add("Vbuf", "Heat store water volume", "V_s", 400, "m³")
ch.add("rhow", "Density of water at 75 °C", "ρ_w", 975, "kg/m³")
ch.add("cpw", "Specific heat of water", "c_p", 4.19, "kJ/(kg·K)")
ch.add("thot", "Store top temperature, charged", "t_hot", 95, "°C")
ch.add("tcold", "Store bottom temperature, discharged", "t_cold", 60, "°C")
ch.add("Eb", "Heat store capacity", "E_s", "={Vbuf}*{rhow}*{cpw}*({thot}-{tcold})/3600", "kWh")
ch.add("Eb2", "Heat store capacity (first draft)", "E_s2",
       "={Vbuf}*{rhow}*{cpw}*({thot}-{tcold})", "kWh",
       planted=("unit-scale", "kJ written as kWh: the /3600 missing"))
ch.add("tfill", "Time to charge the store at full heat output", "t_ch", "={Eb}/{Pth}", "h")
ch.add("tf", "Engine heating water flow temperature", "t_f", 90, "°C")
ch.add("tr", "Engine heating water return temperature", "t_r", 70, "°C")
ch.add("mw", "Engine heating water flow", "ṁ_w", "={Pth}/({cpw}*({tf}-{tr}))", "kg/s")
ch.add("Vw", "Engine heating water flow, m³/h", "V̇_w", "={mw}*3600/{rhow}", "m³/h")
ch.add("VwUS", "Engine heating water flow, US gpm", "V̇_w,US", "={Vw}*4.403", "gpm")
ch.add("PthB", "Heat output, Btu/h", "P_th,US", "={Pth}*3412", "Btu/h")
ch.add("PthB5", "Heat output, Btu/h (US check, 500·gpm·ΔT)", "P_th,US c",
       "=500*{VwUS}*({tf}-{tr})*1.8", "Btu/h")
ch.add("PthM", "Heat output, MBH", "P_th,MBH", "={Pth}*3.412", "MBH")
ch.heading("Glasshouse heat loss")
ch.add("Afl", "Glasshouse floor area (4 ha)", "A_fl", 40000, "m²")
ch.add("rc", "Cover to floor area ratio", "r_c", 1.3, "-")
ch.add("Uc", "U-value of the cover, single glass", "U", 6.0, "W/(m²·K)")
ch.add("tin", "Glasshouse air set point, night", "t_in", 18, "°C")
ch.add("tout", "Outside design temperature", "t_out", -4, "°C")
ch.add("Ql", "Glasshouse heat loss at design", "Q_l", "={Uc}*{Afl}*{rc}*({tin}-{tout})/1000",
       "kW")
ch.add("Ql2", "Glasshouse heat loss at design (first draft)", "Q_l2",
       "={Uc}*{Afl}*{rc}*(({tin}+273.15)-{tout})/1000", "kW",
       planted=("offset-scale", "a kelvin reading less a °C reading"))
ch.add("sh", "CHP heat, share of the design loss", "s", "={Pth}/{Ql}*100", "%")
CHPS = ch.finish()

CO2_SRC = (
    "Sources: CO2 from burning natural gas 1.88 kg per m³ at 15 °C (from memory; it follows "
    "the gas's carbon content); ideal gas density ρ = p·M/(R·T), R = 8.314 J/(mol·K) (CODATA "
    "2018), M_CO2 = 44.01 g/mol (IUPAC standard atomic weights, from memory), so kPa·(g/mol)/"
    "(J/(mol·K)·K) is kg/m³; ppm by volume, 1 ppm = 10⁻⁶ (NIST SP 811 (2008) 7.10.3); "
    "CO2 lost by leakage = n·V·Δc·ρ and the steady rise Δc = ṁ/(n·V·ρ) (a mass balance, common "
    "practice); dosing rates of 100 to 200 kg/(ha·h) with the vents closed (common practice); "
    "K = °C + 273.15 (SI Brochure 9th ed.); °F = 1.8·°C + 32, 1 kg = 2.205 lb (NIST SP 811). "
    "Flue gas condenser Q = ṁ·c_p·ΔT, c_p of flue gas 1.07 kJ/(kg·K) (from memory). Readings "
    "invented.")
cd = ItemSheet("CO2", "Wrayholme Nurseries (invented): CO2 enrichment from the cleaned CHP "
               "exhaust, vents closed", CO2_SRC)
cd.heading("CO2 supply from the engine")
cd.add("ef", "CO2 from burning natural gas", "e_CO2", 1.88, "kg/m³")
cd.add("mC", "CO2 in the engine exhaust", "ṁ_CO2", "={CHP.Vg}*{ef}", "kg/h")
cd.add("mClb", "CO2 in the engine exhaust, lb/h", "ṁ_CO2,US", "={mC}*2.205", "lb/h")
cd.add("mCd", "CO2 in the engine exhaust per day", "m_CO2,d", "={mC}*{CHP.hrs}/1000", "t/d")
cd.heading("Glasshouse air")
cd.add("hm", "Mean height of the glasshouse", "h_m", 6.0, "m")
cd.add("Va", "Air volume", "V_a", "={CHP.Afl}*{hm}", "m³")
cd.add("c0", "Outside CO2", "c_0", 420, "ppm")
cd.add("cs", "CO2 set point", "c_s", 800, "ppm")
cd.add("pb", "Site barometer (invented)", "p_b", 100.5, "kPa")
cd.add("M", "Molar mass of CO2", "M", 44.01, "g/mol")
cd.add("R", "Molar gas constant", "R", 8.314, "J/(mol·K)")
cd.add("tg", "Glasshouse air temperature, day", "t_g", 22, "°C")
cd.add("tgF", "Glasshouse air temperature, °F (US controller)", "t_g,F", "={tg}*1.8+32", "°F")
cd.add("Tg", "Glasshouse air temperature, absolute", "T_g", "={tg}+273.15", "K")
cd.add("rC", "Density of CO2 in the glasshouse", "ρ_CO2", "={pb}*{M}/({R}*{Tg})", "kg/m³")
cd.add("rC2", "Density of CO2 in the glasshouse (first draft)", "ρ_CO2,2",
       "={pb}*{M}/({R}*{tg})", "kg/m³",
       planted=("offset-scale", "a °C reading in the gas law: kelvins belong"))
cd.heading("Dosing")
cd.add("mfill", "CO2 to raise the house from outside air to the set point", "m_fill",
       "={Va}*({cs}-{c0})/1000000*{rC}", "kg")
cd.add("n", "Air change rate, vents closed", "n", 0.4, "1/h")
cd.add("ml", "CO2 lost by leakage at the set point", "ṁ_l",
       "={n}*{Va}*({cs}-{c0})/1000000*{rC}", "kg/h")
cd.add("ml2", "CO2 lost by leakage at the set point (first draft)", "ṁ_l2",
       "={n}*{Va}*({cs}-{c0})*{rC}", "kg/h",
       planted=("unit-scale", "ppm taken as a fraction: the /10⁶ missing"))
cd.add("mha", "Dosing rate needed per hectare", "ṁ_ha", "={ml}/({CHP.Afl}/10000)", "kg/(ha·h)")
cd.add("cov", "Engine CO2 over the leakage loss", "s_CO2", "={mC}/{ml}*100", "%")
cd.add("Vl", "CO2 lost by leakage, volume", "V̇_l", "={ml}/{rC}", "m³/h")
cd.add("cmax", "Steady CO2 with all the engine's CO2 dosed", "c_max",
       "={c0}+{mC}/({n}*{Va}*{rC})*1000000", "ppm")
cd.heading("Flue gas condenser before dosing")
cd.add("mfg", "Flue gas mass flow (maker)", "ṁ_fg", 0.62, "kg/s")
cd.add("cpfg", "Specific heat of flue gas", "c_p,fg", 1.07, "kJ/(kg·K)")
cd.add("tfg1", "Flue gas after the exhaust heat exchanger", "t_fg1", 120, "°C")
cd.add("tfg2", "Flue gas to the CO2 fans", "t_fg2", 50, "°C")
cd.add("Qfg", "Flue gas condenser duty, sensible part", "Q_fg", "={mfg}*{cpfg}*({tfg1}-{tfg2})",
       "kW")
CO2S = cd.finish(others=[ch])

CHPB = {
    "trade": "horticulture: glasshouse gas engine CHP, heat store and CO2 enrichment",
    "sheets": [("CHP", CHPS), ("CO2", CO2S)],
    "planted": {**ch.planted, **cd.planted},
}

BOOKS = {"reservoir-booster-fellbrook-cross": WATB, "evaporator-cip-ashgill-moor": EVAB,
         "crusher-conveyor-stainmoor-edge": CRUB, "glasshouse-chp-co2-wrayholme": CHPB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()

# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.
