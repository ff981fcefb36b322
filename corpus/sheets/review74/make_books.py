#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review74), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; the layout
follows corpus/sheets/review64/make_books.py and review55/make_books.py.

Trades: a brewery's wort boiling and copper steam demand; a marina fuel dock's pumps and
dispensers; a school sports hall's air handling and heating; a sewage rising main and its
pumping station. All scenarios, sites, firms, readings and maker's data are invented
(demonstration only); the formulas and published factors are the trade's own, with their sources
named in a text cell at the top of each sheet ("from memory" where recalled and not checked,
"common practice" for a fact of the trade with no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and
its messages that mislead, are recorded in review_notes.py after running the round's build of the time.

Run: python3 make_books.py [--expect]  ->  *.xlsx (and *.expect) in this folder only
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
# Book 1: brewery wort boiling and copper steam demand (hL, L, bbl, US gal, %/h, min, kg/L, kg,
# kg/h, lb/h, kJ/(kg·K), °C, °F, Δ°F, K, kJ, kWh, kW, W, Btu/h, bar(g), bar a, psig, psia,
# kJ/kg, m³, kWh/hL, mg/L, oz, gpm, mm, m, m², kPa, m³/h)
# --------------------------------------------------------------------------------------------
BRW_SRC = (
    "Sources: 1 hL = 100 L = 0.1 m³ (SI Brochure 9th ed., Table 8 and prefixes); 1 US gal = "
    "3.785 L, 1 kg = 2.205 lb, 1 kg = 35.27 oz (avoirdupois), 1 bar = 14.50 psi, 1 kW = 3412 "
    "Btu/h (NIST SP 811 (2008) App. B.8); 1 US beer barrel = 31 US gal = "
    "117.3 L (NIST Handbook 44, App. C, from memory); °F = 1.8·°C + 32, K = °C + 273.15, a "
    "difference of 1 K = 1.8 Δ°F (SI Brochure 9th ed.; NIST SP 811); copper evaporation 4 to 8 % "
    "of the pre-boil volume per hour (W. Kunze, Technology Brewing and Malting, 6th English ed. "
    "(2019), from memory; 6 %/h invented within it); density of 12 °P wort 1.048 kg/L and its "
    "c_p about 4.0 kJ/(kg·K) (Kunze, from memory); water at 100 °C 0.958 kg/L, h_fg 2257 kJ/kg "
    "at 1.013 bar a, and h_fg 2133 kJ/kg, t_sat 143.6 °C at 4 bar a (IAPWS-IF97 steam tables, "
    "from memory); heat Q = m·c_p·ΔT and steam = Q/h_fg with condensate leaving saturated "
    "(common practice); hydrostatic p = ρ·g·h, g_n = 9.81 m/s² (SI Brochure 9th ed.); bitterness "
    "IBU (mg/L iso-α) = W·U·α/V and in US units oz·U·α·7490/gal, 7490 = 28 350 mg/oz ÷ 3.785 "
    "L/gal (J. Palmer, How to Brew, 4th ed. (2017), from memory); cooler liquor side Btu/h = "
    "500·gpm·Δ°F and water 8.34 lb/US gal (ASHRAE Handbook, HVAC Applications, from memory; "
    "common practice); natural gas gross calorific value 39.5 MJ/m³ (typical UK supply, from "
    "memory). Brewery, copper, steam plant and readings invented.")
bw = ItemSheet("Copper", "Hobcross Brewing Co., Tallow Lane brewhouse (invented): 50 hL copper "
               "with external calandria on 3 bar(g) steam, one brew of the house bitter", BRW_SRC)
bw.heading("Brew length")
bw.add("Vc", "Cast-out volume to the whirlpool", "V_c", 50, "hL")
bw.add("VcL", "Cast-out volume, litres", "V_c,L", "={Vc}*100", "L")
bw.add("Vbbl", "Cast-out volume, US beer barrels (31 US gal, US distributor's form)", "V_c,bbl",
       "={VcL}/117.3", "bbl")
bw.add("Vbbl2", "Cast-out volume, US beer barrels (first draft)", "V_c,bbl2", "={VcL}*117.3",
       "bbl", planted=("unit-scale", "L to beer barrels multiplied by 117.3: wrong way round"))
bw.add("Vgal", "Cast-out volume, US gal", "V_c,US", "={VcL}/3.785", "US gal")
bw.add("evr", "Evaporation rate, share of pre-boil volume", "e", 6, "%/h")
bw.add("tb", "Boil time", "t_b", 75, "min")
bw.add("Vpre", "Pre-boil volume in the copper", "V_pre", "={Vc}/(1-{evr}/100*{tb}/60)", "hL")
bw.add("Vpre2", "Pre-boil volume in the copper (first draft)", "V_pre2",
       "={Vc}/(1-{evr}*{tb}/60)", "hL",
       planted=("unit-scale", "a %/h used as a fraction per hour: 100 too large"))
bw.add("Vev", "Water evaporated in the boil", "V_ev", "={Vpre}-{Vc}", "hL")
bw.add("rhoe", "Density of water at 100 °C", "ρ_100", 0.958, "kg/L")
bw.add("mev", "Mass evaporated", "m_ev", "={Vev}*100*{rhoe}", "kg")
bw.add("mevh", "Evaporation rate by mass", "ṁ_ev", "={mev}/({tb}/60)", "kg/h")
bw.heading("Copper geometry")
bw.add("Dc", "Copper internal diameter", "D_c", 2900, "mm")
bw.add("Ac", "Copper plan area", "A_c", "=PI()*({Dc}/1000)^2/4", "m²")
bw.add("hw", "Wort depth at the start of the boil", "h_w", "={Vpre}*0.1/{Ac}", "m")
bw.add("hw2", "Wort depth at the start of the boil (first draft)", "h_w2",
       "={Vpre}*0.1/(PI()*{Dc}^2/4)", "m",
       planted=("unit-scale", "diameter in mm used as metres: 10⁶ too small"))
bw.add("rhow", "Density of 12 °P wort", "ρ_w", 1.048, "kg/L")
bw.add("pbt", "Wort pressure on the copper floor", "p_fl", "={rhow}*9.81*{hw}", "kPa")
bw.heading("Heating to the boil")
bw.add("mw", "Wort mass in the copper", "m_w", "={Vpre}*100*{rhow}", "kg")
bw.add("cpw", "Specific heat of wort", "c_p", 4.0, "kJ/(kg·K)")
bw.add("tl", "Wort temperature from the lauter tun", "t_l", 74, "°C")
bw.add("tbp", "Boiling point at the site (barometer 99.5 kPa, invented)", "t_bp", 99.6, "°C")
bw.add("tbpF", "Boiling point, °F (US maker's form)", "t_bp,F", "={tbp}*1.8+32", "°F")
bw.add("TbpK", "Boiling point, absolute", "T_bp", "={tbp}+273.15", "K")
bw.add("TbpK2", "Boiling point, absolute (first draft)", "T_bp2", "={tbp}", "K",
       planted=("offset-scale", "a °C reading set equal to kelvins"))
bw.add("dT", "Temperature rise to the boil", "ΔT", "={tbp}-{tl}", "K")
bw.add("dTF", "Temperature rise, Δ°F", "ΔT_F", "={dT}*1.8", "Δ°F")
bw.add("th", "Heat-up time, lauter fill to the boil", "t_h", 30, "min")
bw.add("Qh", "Heat to bring the wort to the boil", "Q_h", "={mw}*{cpw}*{dT}", "kJ")
bw.add("Qhk", "Heat to bring the wort to the boil, kWh", "Q_h,kWh", "={Qh}/3600", "kWh")
bw.add("Ph", "Heat-up duty", "P_h", "={Qh}/({th}*60)", "kW")
bw.add("Ph2", "Heat-up duty (first draft)", "P_h2", "={Qh}/{th}", "kW",
       planted=("unit-scale", "kJ over minutes written as kW: the ×60 missing"))
bw.heading("Boil")
bw.add("hfg0", "Latent heat of water at 1.013 bar a", "h_fg0", 2257, "kJ/kg")
bw.add("Pev", "Evaporation duty", "P_ev", "={mevh}*{hfg0}/3600", "kW")
bw.add("Pev2", "Evaporation duty (first draft)", "P_ev2", "={mevh}*{hfg0}", "kW",
       planted=("unit-scale", "kg/h × kJ/kg written as kW: the /3600 missing"))
bw.add("Pl", "Copper shell and vapour stack loss (survey, invented)", "P_l", 4200, "W")
bw.add("Pb", "Boil duty", "P_b", "={Pev}+{Pl}/1000", "kW")
bw.add("Pb2", "Boil duty (first draft)", "P_b2", "={Pev}+{Pl}", "kW",
       planted=("unit-scale", "W added to kW"))
bw.heading("Steam")
bw.add("pg", "Steam pressure at the calandria valve", "p_g", 3.0, "bar(g)")
bw.add("pbar", "Site barometer (invented)", "p_bar", 0.995, "bar a")
bw.add("pa", "Steam pressure, absolute", "p_a", "={pg}+{pbar}", "bar a")
bw.add("pgpsi", "Steam pressure, psig (US valve maker)", "p_g,US", "={pg}*14.5", "psig")
bw.add("papsi", "Steam pressure, psia (US valve maker)", "p_a,US", "={pa}*14.5", "psia")
bw.add("papsi2", "Steam pressure, psia (first draft)", "p_a,US2", "={pg}*14.5", "psia",
       planted=("offset-scale", "a gauge reading converted straight into psia: the "
                                "atmosphere left out"))
bw.add("hfg4", "Latent heat at 4 bar a (tables)", "h_fg4", 2133, "kJ/kg")
bw.add("ms", "Steam during the boil", "ṁ_s", "={Pb}*3600/{hfg4}", "kg/h")
bw.add("msh", "Steam during heat-up", "ṁ_s,h", "={Ph}*3600/{hfg4}", "kg/h")
bw.add("mspk", "Peak steam demand of the copper", "ṁ_s,pk", "=MAX({ms},{msh})", "kg/h")
bw.add("mbrew", "Steam per brew", "m_s", "={Qh}/{hfg4}+{ms}*{tb}/60", "kg")
bw.heading("Fuel")
bw.add("E", "Heat to the wort per brew", "E", "={Qhk}+{Pb}*{tb}/60", "kWh")
bw.add("eta", "Boiler and steam main efficiency, gross (invented)", "η", 80, "%")
bw.add("Ef", "Fuel per brew", "E_f", "={E}/({eta}/100)", "kWh")
bw.add("CV", "Gross calorific value of the gas", "CV", 39.5, "MJ/m³")
bw.add("Vg", "Gas per brew", "V_g", "={Ef}*3.6/{CV}", "m³")
bw.add("Esp", "Fuel per hectolitre cast out", "e_f", "={Ef}/{Vc}", "kWh/hL")
bw.heading("Bitterness")
bw.add("Wh", "Bittering hops at the start of the boil", "W_h", 4.5, "kg")
bw.add("alf", "Alpha acid of the hop lot (certificate, invented)", "α", 11, "%")
bw.add("U", "Hop utilisation, 75 min boil", "U", 27, "%")
bw.add("IBU", "Bitterness of the cast wort", "IBU",
       "={Wh}*1000*{U}/100*{alf}/100*1000/{VcL}", "mg/L")
bw.add("IBU2", "Bitterness of the cast wort (first draft)", "IBU2",
       "={Wh}*{U}/100*{alf}/100*1000/{VcL}", "mg/L",
       planted=("unit-scale", "hops in kg taken as grams: 1000 too small"))
bw.add("Whoz", "Bittering hops, oz (US recipe form)", "W_h,US", "={Wh}*35.27", "oz")
bw.add("IBUus", "Bitterness, US recipe form (7490)", "IBU_US",
       "={Whoz}*{U}/100*{alf}/100*7490/{Vgal}", "mg/L")
bw.heading("Wort cooler (liquor side)")
bw.add("tp", "Pitching temperature", "t_p", 18, "°C")
bw.add("tk", "Knock-out time", "t_k", 50, "min")
bw.add("Qc", "Wort cooler duty", "Q_c", "={VcL}*{rhow}*{cpw}*({tbp}-{tp})/({tk}*60)", "kW")
bw.add("QcB", "Wort cooler duty, Btu/h", "Q_c,US", "={Qc}*3412", "Btu/h")
bw.add("tcl", "Cold liquor in", "t_cl", 10, "°C")
bw.add("thl", "Hot liquor out to the hot liquor tank", "t_hl", 80, "°C")
bw.add("gliq", "Liquor flow, US gpm (500 rule)", "V̇_l,US", "={QcB}/(500*({thl}-{tcl})*1.8)",
       "gpm")
bw.add("lbh", "Liquor flow, lb/h (8.34 lb/gal)", "ṁ_l,US", "={gliq}*8.34*60", "lb/h")
bw.add("mliq", "Liquor flow by mass", "ṁ_l", "={Qc}/(4.19*({thl}-{tcl}))", "kg/s")
bw.add("Vliq", "Liquor flow, m³/h", "V̇_l", "={mliq}*3600/1000", "m³/h")
BRWS = bw.finish()

BRWB = {
    "trade": "brewing: wort boiling, copper steam demand, bitterness and wort cooling",
    "sheets": [("Copper", BRWS)],
    "planted": dict(bw.planted),
}

# --------------------------------------------------------------------------------------------
# Book 2: marina fuel dock pumps and dispensers (L/min, L/s, m³/s, m³/h, gpm, in, mm, m, m²,
# m/s, ft/s, kg/L, mPa·s, bar, kPa, kPa(g), psi, ft, kW, hp, W, %, °C, 1/K, L, L/d, US gal/d,
# kWh/d, h/d)
# --------------------------------------------------------------------------------------------
FUEL_SRC = (
    "Sources: 1 US gal = 3.785 L, 1 imperial gal = 4.546 L, 1 in = 25.4 mm, 1 ft = 0.3048 m, "
    "1 psi = 6.895 kPa, 1 bar = 100 kPa, 1 hp = 0.7457 kW (NIST SP 811 (2008) App. B.8); "
    "g_n = 9.81 m/s² (SI Brochure 9th ed.); marine diesel 0.835 kg/L and 3.0 mPa·s at 15 °C "
    "(within EN 590, from memory), petrol 0.745 kg/L (within EN 228, from memory), petrol true "
    "vapour pressure 55 kPa abs at 25 °C (from memory, summer grade); 2 in schedule 40 steel "
    "pipe bore 2.067 in (ASME B36.10M, from memory), roughness 0.045 mm (common practice); "
    "Darcy–Weisbach h_f = f·(L/D)·v²/(2g) and Swamee–Jain f = 0.25/[log10(ε/3.7D + "
    "5.74/Re^0.9)]² (common practice; Swamee and Jain 1976, from memory); hydraulic power "
    "ρ·g·Q·H and shaft power over efficiency (common practice); US forms hp = gpm·ft·SG/(3960·η), "
    "hp = gpm·psi/(1714·η), psi = 0.433·SG·ft (Cameron Hydraulic Data, 19th ed., from memory); "
    "NPSHa = (p_atm − p_v)/(ρ·g) − z_lift − h_f,s (common practice); diesel volume correction "
    "to 15 °C ≈ 1 − 0.00083·(t − 15) (ASTM D1250 / ISO 91 tables, linearised, from memory). "
    "Marina, dock, pumps, dispensers, sales and readings invented.")
fd = ItemSheet("Dock", "Skerrow Quay marina fuel berth, Gullhaven Marine Services (invented): "
               "diesel line from the yard tank to two high-flow dispensers on the floating "
               "pontoon, petrol suction dispenser, summer peak", FUEL_SRC)
fd.heading("Flow")
fd.add("Qd", "Diesel dispenser rated flow (maker, invented)", "Q_d", 130, "L/min")
fd.add("nd", "Diesel hoses in use at once", "n", 2, "-")
fd.add("Q", "Diesel line design flow", "Q", "={Qd}*{nd}", "L/min")
fd.add("Qs", "Diesel line design flow, m³/s", "Q_s", "={Q}/60000", "m³/s")
fd.add("Qh", "Diesel line design flow, m³/h", "Q_h", "={Q}*0.06", "m³/h")
fd.add("Qgpm", "Diesel line design flow, US gpm (US pump maker)", "Q_US", "={Q}/3.785", "gpm")
fd.add("Qgpm2", "Diesel line design flow, US gpm (first draft)", "Q_US2", "={Q}/4.546", "gpm",
       planted=("unit-scale", "the imperial gallon's 4.546 used for US gallons: the wrong "
                              "factor"))
fd.add("Qig", "Diesel line design flow, imperial gpm (UK boat owners)", "Q_imp", "={Q}/4.546",
       "igpm")
fd.heading("Diesel line")
fd.add("Din", "Pipe bore, 2 in schedule 40", "D_in", 2.067, "in")
fd.add("Dm", "Pipe bore, m", "D", "={Din}*0.0254", "m")
fd.add("Dmm", "Pipe bore, mm", "D_mm", "={Din}*25.4", "mm")
fd.add("A", "Bore area", "A", "=PI()*{Dm}^2/4", "m²")
fd.add("v", "Velocity in the line", "v", "={Qs}/{A}", "m/s")
fd.add("v2", "Velocity in the line (first draft)", "v2", "={Qs}/(PI()*{Dmm}^2/4)", "m/s",
       planted=("unit-scale", "bore in mm used as metres: 10⁶ too small"))
fd.add("vft", "Velocity in the line, ft/s", "v_US", "={v}/0.3048", "ft/s")
fd.add("rho", "Density of the diesel", "ρ", 0.835, "kg/L")
fd.add("mu", "Viscosity of the diesel at 15 °C", "μ", 3.0, "mPa·s")
fd.add("Re", "Reynolds number", "Re", "={rho}*1000*{v}*{Dm}/({mu}/1000)", "-")
fd.add("eps", "Pipe roughness", "ε", 0.045, "mm")
fd.add("f", "Friction factor, Swamee–Jain", "f",
       "=0.25/LOG10({eps}/1000/(3.7*{Dm})+5.74/{Re}^0.9)^2", "-")
fd.add("L", "Line length, tank to the far dispenser", "L", 145, "m")
fd.add("hf", "Friction loss in the line", "h_f", "={f}*{L}/{Dm}*{v}^2/(2*9.81)", "m")
fd.add("K", "Fittings, hose and breakaway, sum of K (invented)", "ΣK", 14, "-")
fd.add("hm", "Fittings loss", "h_m", "={K}*{v}^2/(2*9.81)", "m")
fd.heading("Head at high water springs")
fd.add("zs", "Pump centreline above chart datum", "z_s", 5.2, "m")
fd.add("zd", "Dispenser inlet above chart datum, pontoon at high water springs", "z_d", 6.8,
       "m")
fd.add("Hs", "Static head", "H_s", "={zd}-{zs}", "m")
fd.add("pdi", "Pressure wanted at the dispenser inlet (maker, invented)", "p_di", 1.0, "bar")
fd.add("Hp", "Dispenser inlet pressure as head", "H_p", "={pdi}*100/({rho}*9.81)", "m")
fd.add("Hp2", "Dispenser inlet pressure as head (first draft)", "H_p2", "={pdi}*100/{rho}",
       "m", planted=("result-unit", "a pressure over a density: g missing"))
fd.add("H", "Pump total head", "H", "={Hs}+{hf}+{hm}+{Hp}", "m")
fd.add("Hft", "Pump total head, ft", "H_US", "={H}/0.3048", "ft")
fd.add("dp", "Pump differential pressure", "Δp", "={rho}*9.81*{H}", "kPa")
fd.add("dppsi", "Pump differential pressure, psi", "Δp_US", "={dp}/6.895", "psi")
fd.add("SG", "Specific gravity of the diesel", "SG", "={rho}/0.999", "-")
fd.add("dppsi3", "Pump differential pressure, psi (0.433 check)", "Δp_US c",
       "={Hft}*0.433*{SG}", "psi")
fd.heading("Power")
fd.add("eta", "Pump efficiency at duty (maker, invented)", "η_p", 62, "%")
fd.add("Ph", "Hydraulic power", "P_h", "={rho}*9.81*{Qs}*{H}", "kW")
fd.add("Psh", "Shaft power", "P_sh", "={Ph}/({eta}/100)", "kW")
fd.add("Psh2", "Shaft power (first draft)", "P_sh2", "={Ph}/{eta}", "kW",
       planted=("unit-scale", "a % used as a fraction: 100 too small"))
fd.add("hpa", "Shaft power, hp", "P_sh,US", "={Psh}/0.7457", "hp")
fd.add("hpa2", "Shaft power, hp (first draft)", "P_sh,US2", "={Psh}*0.7457", "hp",
       planted=("unit-scale", "kW to hp multiplied by 0.7457: wrong way round"))
fd.add("hpb", "Shaft power, hp (3960 check)", "P_sh,US b",
       "={Qgpm}*{Hft}*{SG}/(3960*{eta}/100)", "hp")
fd.add("hpc", "Shaft power, hp (1714 check)", "P_sh,US c", "={Qgpm}*{dppsi}/(1714*{eta}/100)",
       "hp")
fd.add("etam", "Motor efficiency (invented)", "η_m", 88, "%")
fd.add("Pm", "Motor input", "P_m", "={Psh}/({etam}/100)", "kW")
fd.add("Pn", "Motor nameplate (invented)", "P_n", 4000, "W")
fd.add("mg", "Motor margin over the shaft power", "ΔP", "={Pn}/1000-{Psh}", "kW")
fd.add("mg2", "Motor margin over the shaft power (first draft)", "ΔP2", "={Pn}-{Psh}", "kW",
       planted=("unit-scale", "a nameplate in W less a power in kW"))
fd.heading("Petrol suction dispenser (NPSH)")
fd.add("patm", "Site barometer on the design day (invented)", "p_atm", 100.8, "kPa")
fd.add("pvent", "Petrol tank ullage pressure, vent open", "p_t", 0, "kPa(g)")
fd.add("pv", "True vapour pressure of the petrol at 25 °C", "p_v", 55, "kPa")
fd.add("rhop", "Density of the petrol", "ρ_p", 0.745, "kg/L")
fd.add("zl", "Suction lift, lowest tank level to the pump", "z_l", 3.2, "m")
fd.add("hfs", "Suction line loss at dispenser flow", "h_f,s", 0.9, "m")
fd.add("npsh", "NPSH available", "NPSHa", "=({patm}-{pv})/({rhop}*9.81)-{zl}-{hfs}", "m")
fd.add("npsh2", "NPSH available (first draft)", "NPSHa2",
       "=({pvent}-{pv})/({rhop}*9.81)-{zl}-{hfs}", "m",
       planted=("offset-scale", "a gauge tank pressure less an absolute vapour pressure"))
fd.heading("Stock, temperature and energy")
fd.add("Vs", "Diesel sold on the busiest day (invented)", "V_s", 6200, "L/d")
fd.add("Vsg", "Diesel sold, US gal/d", "V_s,US", "={Vs}/3.785", "US gal/d")
fd.add("tf", "Fuel temperature at the meter", "t_f", 24, "°C")
fd.add("alv", "Volume correction coefficient of diesel", "α_v", 0.00083, "1/K")
fd.add("VCF", "Volume correction factor to 15 °C", "VCF", "=1-{alv}*({tf}-15)", "-")
fd.add("VCF2", "Volume correction factor to 15 °C (first draft)", "VCF2", "=1-{alv}*{tf}", "-",
       planted=("offset-scale", "a °C reading used as the difference from 15 °C"))
fd.add("V15", "Diesel sold at 15 °C", "V_15", "={Vs}*{VCF}", "L/d")
fd.add("Vt", "Yard tank working capacity (invented)", "V_t", 22000, "L")
fd.add("days", "Days of stock at the busiest rate", "t_st", "={Vt}/{Vs}", "d")
fd.add("hr", "Pump running time", "t_r", "={Vs}/{Q}/60", "h/d")
fd.add("E", "Pump energy on the busiest day", "E", "={Pm}*{hr}", "kWh/d")
fd.add("E2", "Pump energy on the busiest day (first draft)", "E2", "={Pm}*{Vs}/{Q}", "kWh/d",
       planted=("unit-scale", "running time left in minutes: the /60 missing"))
FUELS = fd.finish()

FUELB = {
    "trade": "marina fuel dock: diesel line, dispensers, pump power and petrol suction NPSH",
    "sheets": [("Dock", FUELS)],
    "planted": dict(fd.planted),
}

# --------------------------------------------------------------------------------------------
# Book 3: school sports hall air handling and heating (m, m², m³, L/s, 1/h, m³/s, m³/h, cfm,
# mm, m/s, fpm, W/K, °C, °F, K, kW, %, kJ/(m³·K), Btu/h, kPa, kg/m³, kg/s, kg/L, gpm, Pa, W,
# W/(L/s), h, kWh, K·d, kg/kWh, t, £/kWh, £)
# --------------------------------------------------------------------------------------------
HALL_SRC = (
    "Sources: four-court hall 34.5 m × 20 m × 7.5 m clear (Sport England, Sports Halls Design "
    "and Layouts (2012), from memory); outdoor air 10 L/s per person and a hall temperature of "
    "12 to 15 °C for sport (CIBSE Guide A (2015) and BB101 (2018), from memory); 1 L/s = 2.119 "
    "cfm, 1 m/s = 196.85 ft/min, 1 kW = 3412 Btu/h, 1 US gal = 3.785 L (NIST SP 811 (2008) App. "
    "B.8); °F = 1.8·°C + 32, K = °C + 273.15, 1 K = 1.8 Δ°F (SI Brochure 9th ed.; NIST SP 811); "
    "air ρ·c_p = 1.2 kJ/(m³·K) (CIBSE Guide C (2007), from memory) and the US 1.08 Btu/h per "
    "cfm·Δ°F (ASHRAE Fundamentals (2021), ch. 18, from memory); air density p/(R·T), R = 0.287 "
    "kJ/(kg·K) (common practice); water c_p 4.19 kJ/(kg·K), 0.978 kg/L at 70 °C, and the US "
    "Btu/h = 500·gpm·Δ°F (ASHRAE Handbook, from memory); fan power V̇·Δp/η and SFP in W/(L/s) "
    "(Approved Document L (2021), from memory); annual heat = H·DD·24 with degree-days in K·d "
    "(CIBSE TM41 (2006), from memory); gas 0.183 kg CO2e/kWh gross (UK conversion factors, from "
    "memory). School, hall, takeoff, tariff and readings invented.")
hl = ItemSheet("Hall", "Larchmere Academy sports hall (invented): AHU-1 with plate heat "
               "recovery, LTHW heating coil and fabric loss, winter design", HALL_SRC)
hl.heading("Hall")
hl.add("Lh", "Hall length", "L", 34.5, "m")
hl.add("Wh", "Hall width", "W", 20, "m")
hl.add("Hh", "Clear height", "H", 7.5, "m")
hl.add("Af", "Floor area", "A_f", "={Lh}*{Wh}", "m²")
hl.add("Vh", "Hall volume", "V_h", "={Af}*{Hh}", "m³")
hl.heading("Air")
hl.add("N", "Occupants, two matches and spectators (invented)", "N", 120, "-")
hl.add("qp", "Outdoor air per person", "q_p", 10, "L/s")
hl.add("Vp", "Outdoor air for the occupants", "V̇_p", "={N}*{qp}", "L/s")
hl.add("ach", "Air change rate for the hall (brief, invented)", "n", 1.5, "1/h")
hl.add("Va", "Air for the air change rate", "V̇_n", "={ach}*{Vh}/3.6", "L/s")
hl.add("Va2", "Air for the air change rate, m³/s (first draft)", "V̇_n2", "={ach}*{Vh}", "m³/s",
       planted=("unit-scale", "air changes per hour × m³ written as m³/s: /3600 missing"))
hl.add("Vd", "Design supply air", "V̇", "=MAX({Vp},{Va})", "L/s")
hl.add("Vdm", "Design supply air, m³/s", "V̇_s", "={Vd}/1000", "m³/s")
hl.add("Vdh", "Design supply air, m³/h", "V̇_h", "={Vd}*3.6", "m³/h")
hl.add("Vcfm", "Design supply air, cfm (US AHU maker)", "V̇_US", "={Vd}*2.119", "cfm")
hl.add("Vcfm2", "Design supply air, cfm (first draft)", "V̇_US2", "={Vd}/2.119", "cfm",
       planted=("unit-scale", "L/s to cfm divided by 2.119: wrong way round"))
hl.add("wd", "Main supply duct, width", "w", 1000, "mm")
hl.add("hd", "Main supply duct, height", "h", 600, "mm")
hl.add("vd", "Velocity in the main duct", "v", "={Vdm}/({wd}/1000*{hd}/1000)", "m/s")
hl.add("vd2", "Velocity in the main duct (first draft)", "v2", "={Vdm}/({wd}*{hd})", "m/s",
       planted=("unit-scale", "duct sides in mm used as metres: 10⁶ too small"))
hl.add("fpm", "Velocity in the main duct, ft/min", "v_US", "={vd}*196.85", "ft/min")
hl.heading("Design heat loss")
hl.add("ti", "Hall temperature for sport", "t_i", 15, "°C")
hl.add("to", "Outdoor design temperature (invented site)", "t_o", -3, "°C")
hl.add("toF", "Outdoor design temperature, °F (US AHU maker)", "t_o,F", "={to}*1.8+32", "°F")
hl.add("toF2", "Outdoor design temperature, °F (first draft)", "t_o,F2", "={to}*1.8", "°F",
       planted=("offset-scale", "°C to °F without the + 32"))
hl.add("dT", "Design temperature difference", "ΔT", "={ti}-{to}", "K")
hl.add("Hf", "Fabric heat loss coefficient, ΣU·A (takeoff, invented)", "H_f", 1450, "W/K")
hl.add("Qf", "Fabric heat loss", "Q_f", "={Hf}*{dT}/1000", "kW")
hl.add("Qf2", "Fabric heat loss (first draft)", "Q_f2", "={Hf}*{dT}", "kW",
       planted=("unit-scale", "W/K × K written as kW: the /1000 missing"))
hl.add("Qv", "Ventilation load without recovery", "Q_v", "={Vdm}*1.2*{dT}", "kW")
hl.add("eff", "Heat recovery effectiveness (maker, invented)", "ε", 72, "%")
hl.add("ts", "Air off the heat recovery plate", "t_s", "={to}+{eff}/100*({ti}-{to})", "°C")
hl.add("ts2", "Air off the heat recovery plate (first draft)", "t_s2",
       "={to}+{eff}*({ti}-{to})", "°C",
       planted=("unit-scale", "a % used as a fraction: the rise 100 times too large"))
hl.add("Qvr", "Ventilation load after recovery", "Q_v,r", "={Qv}*(1-{eff}/100)", "kW")
hl.add("Qt", "Heating coil and fabric load", "Q_t", "={Qf}+{Qvr}", "kW")
hl.add("QtB", "Heating load, Btu/h", "Q_t,US", "={Qt}*3412", "Btu/h")
hl.add("QvB", "Ventilation load, Btu/h (US check, 1.08·cfm·Δ°F)", "Q_v,US",
       "=1.08*{Vcfm}*{dT}*1.8", "Btu/h")
hl.heading("Air density and mass flow")
hl.add("pb", "Site barometer (invented)", "p_b", 99.8, "kPa")
hl.add("TsK", "Air off the plate, absolute", "T_s", "={ts}+273.15", "K")
hl.add("rhoa", "Air density off the plate", "ρ_a", "={pb}/(0.287*{TsK})", "kg/m³")
hl.add("rhoa2", "Air density off the plate (first draft)", "ρ_a2", "={pb}/(0.287*{ts})",
       "kg/m³", planted=("offset-scale", "a °C reading in the gas law: kelvins belong"))
hl.add("ma", "Supply air mass flow", "ṁ_a", "={rhoa}*{Vdm}", "kg/s")
hl.heading("LTHW heating coil")
hl.add("tfl", "LTHW flow temperature", "t_fl", 80, "°C")
hl.add("trt", "LTHW return temperature", "t_rt", 60, "°C")
hl.add("Qc", "Heating coil load (ventilation after recovery)", "Q_c", "={Qvr}", "kW")
hl.add("mw", "LTHW flow to the coil", "ṁ_w", "={Qc}/(4.19*({tfl}-{trt}))", "kg/s")
hl.add("rhow", "Density of water at 70 °C", "ρ_w", 0.978, "kg/L")
hl.add("Vw", "LTHW flow to the coil, volume", "V̇_w", "={mw}/{rhow}", "L/s")
hl.add("gpm", "LTHW flow to the coil, US gpm", "V̇_w,US", "={Vw}*60/3.785", "gpm")
hl.add("QcB", "Heating coil load, Btu/h (500 rule check)", "Q_c,US",
       "=500*{gpm}*({tfl}-{trt})*1.8", "Btu/h")
hl.add("QcB2", "Heating coil load, Btu/h (first draft)", "Q_c,US2",
       "=500*{gpm}*({tfl}-{trt})", "Btu/h",
       planted=("unit-scale", "a °C difference used as a Δ°F: the 1.8 missing"))
hl.heading("Fans")
hl.add("dpf", "Supply fan total pressure (invented)", "Δp_f", 650, "Pa")
hl.add("etaf", "Fan and motor efficiency", "η_f", 62, "%")
hl.add("Pf", "Supply fan input", "P_f", "={Vdm}*{dpf}/({etaf}/100)", "W")
hl.add("Pfk", "Supply fan input, kW", "P_f,kW", "={Pf}/1000", "kW")
hl.add("SFP", "Specific fan power, supply and extract alike (invented)", "SFP", "={Pf}*2/{Vd}",
       "W/(L/s)")
hl.add("hrs", "AHU running hours a year (invented)", "t_a", 3300, "h")
hl.add("Ef", "Fan energy a year, supply and extract", "E_f", "={Pfk}*2*{hrs}", "kWh")
hl.heading("Annual heating")
hl.add("Hv", "Ventilation heat loss coefficient after recovery", "H_v",
       "={Vdm}*1.2*(1-{eff}/100)*1000", "W/K")
hl.add("DD", "Heating degree-days, base 15.5 °C (invented site)", "DD", 2150, "K·d")
hl.add("Qa", "Annual heat to the hall", "Q_a", "=({Hf}+{Hv})*{DD}*24/1000", "kWh")
hl.add("Qa2", "Annual heat to the hall (first draft)", "Q_a2", "=({Hf}+{Hv})*{DD}/1000", "kWh",
       planted=("unit-scale", "degree-days used as degree-hours: the ×24 missing"))
hl.add("etab", "Seasonal boiler efficiency, gross", "η_b", 86, "%")
hl.add("Eg", "Gas a year", "E_g", "={Qa}/({etab}/100)", "kWh")
hl.add("cf", "Carbon factor of gas, gross", "f_C", 0.183, "kg/kWh")
hl.add("CO2", "Carbon a year", "m_CO2", "={Eg}*{cf}/1000", "t")
hl.add("tar", "Gas tariff (invented)", "c_g", 0.065, "£/kWh")
hl.add("cost", "Gas cost a year", "C_g", "={Eg}*{tar}", "£")
HALLS = hl.finish()

HALLB = {
    "trade": "building services: school sports hall AHU, heat recovery, LTHW coil and heating",
    "sheets": [("Hall", HALLS)],
    "planted": dict(hl.planted),
}

# --------------------------------------------------------------------------------------------
# Book 4: sewage rising main and pumping station (L/d, m³/d, L/s, m³/s, m³/h, mgd, mm, m, m²,
# m/s, m²/s, kPa, kPa(g), psig, ft, %, kW, hp, W, 1/h, min, m³, h, kWh/d, mg/L,
# kg/d, lb/d)
# --------------------------------------------------------------------------------------------
SEW_SRC = (
    "Sources: dry weather flow DWF = population × per-head flow + infiltration (common "
    "practice; 150 L per head a day invented within the usual 120 to 180); pass-forward of 3 DWF "
    "(common practice, chosen for this catchment); m³/d ÷ 86.4 = L/s (common practice); "
    "self-cleansing velocity in a rising main about 0.75 m/s or more (Sewers for Adoption, 7th "
    "ed., from memory); Hazen–Williams h_f = 10.67·L·Q^1.852/(C^1.852·D^4.8704) in m, m³/s, m "
    "(common practice, from memory); Darcy–Weisbach with Swamee–Jain f, k_s 0.3 mm for a "
    "slimed sewage main (HR Wallingford, Tables for the Hydraulic Design of Pipes, Sewers and "
    "Channels, 8th ed., from memory), ν 1.31e-6 m²/s at 10 °C (from memory); Joukowsky Δh = "
    "a·Δv/g and Δp = ρ·a·Δv, wave speed in ductile iron about 1050 m/s (E. B. Wylie and V. L. "
    "Streeter, Fluid Transients in Systems (1993), from memory); wet well volume between start "
    "and stop V = Q·T/4, T = 60/starts per hour (common practice); NPSHa = (p_s + p_atm − "
    "p_v)/(ρ·g) + v²/(2g) from a suction gauge, water p_v 2.34 kPa at 20 °C (IAPWS, from "
    "memory); 1 ft = 0.3048 m, 1 hp = 0.7457 kW, 1 L/s = 15.85 US gpm, "
    "1 mgd = 3785 m³/d (NIST SP 811 (2008) App. B.8); γ_w = 0.433 psi/ft and hp = gpm·ft/(3960·η) "
    "(Cameron Hydraulic Data, 19th ed., from memory); dose lb/d = 8.34 × mg/L × mgd (common "
    "practice); g_n = 9.81 m/s² (SI Brochure 9th ed.). Catchment, station, main and readings "
    "invented.")
sw = ItemSheet("Station", "Fenwick Staithe terminal pumping station and the Brackwater rising "
               "main (invented): duty/standby dry-well pumps, 250 mm ductile iron main", SEW_SRC)
sw.heading("Flows")
sw.add("P", "Population served (invented)", "P", 8400, "-")
sw.add("G", "Flow per head a day", "G", 150, "L/d")
sw.add("I", "Infiltration (flow survey, invented)", "I", 180, "m³/d")
sw.add("DWF", "Dry weather flow", "DWF", "={P}*{G}/1000+{I}", "m³/d")
sw.add("DWF2", "Dry weather flow (first draft)", "DWF2", "={P}*{G}+{I}", "m³/d",
       planted=("unit-scale", "litres a day added to m³ a day: the /1000 missing"))
sw.add("DWFs", "Dry weather flow, L/s", "DWF_s", "={DWF}/86.4", "L/s")
sw.add("mgd", "Dry weather flow, US mgd", "DWF_US", "={DWF}/3785", "mgd")
sw.add("pf", "Pass-forward multiple of DWF", "k", 3, "-")
sw.add("Qp", "Pump duty flow", "Q_p", "={DWFs}*{pf}", "L/s")
sw.add("Qpm", "Pump duty flow, m³/s", "Q", "={Qp}/1000", "m³/s")
sw.add("Qph", "Pump duty flow, m³/h", "Q_h", "={Qp}*3.6", "m³/h")
sw.add("Qgpm", "Pump duty flow, US gpm", "Q_US", "={Qp}*15.85", "gpm")
sw.heading("Rising main")
sw.add("D", "Main bore", "D", 250, "mm")
sw.add("L", "Main length", "L", 2850, "m")
sw.add("A", "Bore area", "A", "=PI()*({D}/1000)^2/4", "m²")
sw.add("v", "Velocity at duty", "v", "={Qpm}/{A}", "m/s")
sw.add("v2", "Velocity at duty (first draft)", "v2", "={Qp}/{A}", "m/s",
       planted=("unit-scale", "L/s used as m³/s: 1000 too large"))
sw.add("Vm", "Volume of the main", "V_m", "={A}*{L}", "m³")
sw.add("tr", "Retention in the main at DWF", "t_r", "={Vm}/({DWF}/24)", "h")
sw.add("tr2", "Retention in the main at DWF (first draft)", "t_r2", "={Vm}/{DWF}", "h",
       planted=("unit-scale", "m³ over m³/d gives days, written as hours: ×24 missing"))
sw.add("CHW", "Hazen–Williams C, ductile iron, slimed", "C", 110, "-")
sw.add("hHW", "Friction loss, Hazen–Williams", "h_f,HW",
       "=10.67*{L}*{Qpm}^1.852/({CHW}^1.852*({D}/1000)^4.8704)", "m")
sw.add("nu", "Kinematic viscosity of sewage at 10 °C", "ν", 1.31E-06, "m²/s")
sw.add("Re", "Reynolds number", "Re", "={v}*{D}/1000/{nu}", "-")
sw.add("ks", "Roughness, slimed sewage main", "k_s", 0.3, "mm")
sw.add("f", "Friction factor, Swamee–Jain", "f", "=0.25/LOG10({ks}/(3.7*{D})+5.74/{Re}^0.9)^2",
       "-")
sw.add("hf", "Friction loss, Darcy–Weisbach", "h_f", "={f}*{L}/({D}/1000)*{v}^2/(2*9.81)", "m")
sw.add("hf2", "Friction loss, Darcy–Weisbach (first draft)", "h_f2",
       "={f}*{L}/{D}*{v}^2/(2*9.81)", "m",
       planted=("unit-scale", "bore in mm beside length in m: 1000 too small"))
sw.add("Km", "Valves, bends and exit, sum of K", "ΣK", 9, "-")
sw.add("hm", "Minor losses", "h_m", "={Km}*{v}^2/(2*9.81)", "m")
sw.heading("Head and power")
sw.add("zb", "Pumps stop level (wet well)", "z_b", 2.4, "m")
sw.add("zd", "Discharge level at the receiving chamber", "z_d", 19.6, "m")
sw.add("zp", "Pump centreline", "z_p", 0.8, "m")
sw.add("Hs", "Static head", "H_s", "={zd}-{zb}", "m")
sw.add("H", "Pump total head", "H", "={Hs}+{hf}+{hm}", "m")
sw.add("Hft", "Pump total head, ft", "H_US", "={H}/0.3048", "ft")
sw.add("rho", "Density of the sewage", "ρ", 1.0, "kg/L")
sw.add("pd", "Delivery gauge at the pump", "p_d", "={rho}*9.81*({zd}-{zp}+{hf}+{hm})",
       "kPa(g)")
sw.add("pdpsi3", "Delivery gauge at the pump, psig (0.433 check)", "p_d,US c",
       "=({zd}-{zp}+{hf}+{hm})/0.3048*0.433", "psig")
sw.add("eta", "Pump efficiency at duty (maker, invented)", "η_p", 68, "%")
sw.add("Ph", "Hydraulic power", "P_h", "={rho}*9.81*{Qpm}*{H}", "kW")
sw.add("Psh", "Shaft power", "P_sh", "={Ph}/({eta}/100)", "kW")
sw.add("Psh2", "Shaft power (first draft)", "P_sh2", "={Ph}/{eta}", "kW",
       planted=("unit-scale", "a % used as a fraction: 100 too small"))
sw.add("bhp", "Shaft power, hp (3960 check)", "P_sh,US", "={Qgpm}*{Hft}/(3960*{eta}/100)", "hp")
sw.add("etam", "Motor efficiency", "η_m", 93, "%")
sw.add("Pm", "Motor input", "P_m", "={Psh}/({etam}/100)", "kW")
sw.heading("Suction (NPSH from the suction gauge at duty)")
sw.add("ps", "Suction gauge at duty", "p_s", 13, "kPa(g)")
sw.add("patm", "Site barometer (invented)", "p_atm", 100.6, "kPa")
sw.add("pv", "Vapour pressure of the sewage at 20 °C", "p_v", 2.34, "kPa")
sw.add("vs", "Velocity in the suction branch", "v_s", 1.4, "m/s")
sw.add("npsh", "NPSH available", "NPSHa",
       "=({ps}+{patm}-{pv})/({rho}*9.81)+{vs}^2/(2*9.81)", "m")
sw.add("npsh2", "NPSH available (first draft)", "NPSHa2",
       "=({ps}-{pv})/({rho}*9.81)+{vs}^2/(2*9.81)", "m",
       planted=("offset-scale", "a gauge suction reading less an absolute vapour pressure"))
sw.heading("Surge on pump trip")
sw.add("a", "Wave speed, ductile iron main (from memory)", "a", 1050, "m/s")
sw.add("dh", "Joukowsky head rise, full stop", "Δh", "={a}*{v}/9.81", "m")
sw.add("dh2", "Joukowsky head rise, full stop (first draft)", "Δh2", "={a}*{v}", "m",
       planted=("result-unit", "a·Δv is not a head: g missing"))
sw.add("dps", "Joukowsky pressure rise", "Δp", "={rho}*{a}*{v}", "kPa")
sw.add("pmax", "Peak pressure at the pump", "p_max", "={pd}+{dps}", "kPa(g)")
sw.heading("Wet well")
sw.add("st", "Maximum starts per hour (maker, invented)", "z", 10, "1/h")
sw.add("Tc", "Minimum cycle time", "T", "=60/{st}", "min")
sw.add("Vww", "Wet well volume between start and stop", "V_ww", "={Qpm}*{Tc}*60/4", "m³")
sw.add("Vww2", "Wet well volume between start and stop (first draft)", "V_ww2",
       "={Qph}*{Tc}/4", "m³",
       planted=("unit-scale", "m³/h × min written as m³: the /60 missing"))
sw.heading("Energy and dosing")
sw.add("hr", "Pump running hours at DWF", "t_r,p", "={DWF}/{Qph}", "h/d")
sw.add("E", "Pump energy a day", "E", "={Pm}*{hr}", "kWh/d")
sw.add("Pst", "Panel, telemetry and dehumidifier standing load", "P_st", 850, "W")
sw.add("Et", "Station energy a day", "E_t", "={E}+{Pst}*24/1000", "kWh/d")
sw.add("Et2", "Station energy a day (first draft)", "E_t2", "={E}+{Pst}*24", "kWh/d",
       planted=("unit-scale", "W × h added to kWh: the /1000 missing"))
sw.add("cd", "Nitrate dose against septicity (invented)", "c_d", 12, "mg/L")
sw.add("md", "Nitrate dose a day", "ṁ_d", "={cd}*{DWF}/1000", "kg/d")
sw.add("mdlb", "Nitrate dose a day, lb/d (8.34 form)", "ṁ_d,US", "=8.34*{cd}*{mgd}", "lb/d")
SEWS = sw.finish()

_Q, _V = sw.ref("Qp"), sw.ref("Vww")
CYC = {
    "A1": "Fenwick Staithe: wet well cycles at four inflows (duty pump at duty flow; inflows "
          "invented)",
    "A2": "Sources: fill time V/Q_in, pump-down time V/(Q_p − Q_in), starts per hour 60 over "
          "the cycle in minutes (common practice).",
    "A3": CAUTION,
    "A5": "Case", "B5": "Inflow [L/s]", "C5": "Fill time [min]", "D5": "Pump-down time [min]",
    "E5": "Starts [1/h]",
}
for r, (case, qin) in enumerate([("Night minimum", 8), ("Average DWF", 20),
                                 ("Morning peak", 45)], start=6):
    CYC[f"A{r}"], CYC[f"B{r}"] = case, qin
    CYC[f"C{r}"] = f"={_V}/(B{r}/1000)/60"
    CYC[f"D{r}"] = f"={_V}/(({_Q}-B{r})/1000)/60"
    CYC[f"E{r}"] = f"=60/(C{r}+D{r})"
CYC["D8"] = f"={_V}/({_Q}-B8)/60"
CYC_PLANTED = {"Cycles!D8": ("unit-scale", "L/s used as m³/s in the pump-down time: 1000 too "
                                           "small")}

SEWB = {
    "trade": "wastewater: sewage pumping station, rising main, surge, wet well and dosing",
    "sheets": [("Station", SEWS), ("Cycles", CYC)],
    "planted": {**sw.planted, **CYC_PLANTED},
}

BOOKS = {"brewhouse-tallow-lane": BRWB, "fuel-dock-skerrow-quay": FUELB,
         "sports-hall-larchmere": HALLB, "rising-main-fenwick-staithe": SEWB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()

# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.
