#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review70), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; the layout
follows corpus/sheets/review64/make_books.py.

Trades: a pharmaceutical plant's purified water generation (RO, EDI, storage and loop, hot
water sanitisation); a small industrial coal-fired boiler's fuel, ash, combustion air and ID
fan; a marina's fuel dock (transfer pump, tank venting) and fire protection (foam concentrate,
sea water fire pump); a cold chain warehouse's rack-supported roof (snow, rack post, base
plate) and its freezer floor heating against frost heave. All scenarios, sites, firms,
readings and maker's data are invented (demonstration only); the formulas and published factors
are the trade's own, with their sources named in a text cell at the top of each sheet ("from
memory" where recalled and not checked, "common practice" for a fact of the trade with no
single source).

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
# Book 1: pharmaceutical purified water generation (m³/h, gpm, %, m², ft², L/(m²·h),
# gal/(ft²·d), °C, K, bar(g), bar a, bar, psig, mg/L, kW, hp, kWh/m³, mmol/L, C/mol, A, V,
# m³, 1/h, min, mm, m/s, ft/s, kg/m³, mPa·s, kg, kJ, kJ/(kg·K), Btu/h, gal, °F, kg/h, lb/h)
# --------------------------------------------------------------------------------------------
PW_SRC = (
    "Sources: 1 m³/h = 4.403 US gpm, 1 US gal = 3.785 L, 1 m² = 10.76 ft², 1 bar = 14.50 psi, "
    "1 kW = 3412 Btu/h, 1 hp = 0.7457 kW, 1 ft = 0.3048 m, 1 kg = 2.205 lb (NIST SP 811 (2008) "
    "App. B.8); 1 L/(m²·h) = 0.589 US gal/(ft²·d) (from the same factors); K = °C + 273.15 (SI "
    "Brochure 9th ed.); RO recovery r = Q_p/Q_f and concentration factor 1/(1 − r), flux "
    "J = Q_p/(n·A) (common practice); temperature correction factor TCF = exp[3020·(1/298 − "
    "1/(273 + t))] below 25 °C (polyamide membrane makers' design manuals, from memory); "
    "osmotic pressure about 0.7 bar per 1000 mg/L of NaCl-like TDS (common practice); net "
    "driving pressure = p_f − Δp_array/2 − p_p − π_avg (common practice); pump hydraulic power "
    "P(kW) = Q(m³/h)·Δp(bar)/36 (common practice, 1 bar·m³/h = 27.78 W); EDI current "
    "I = F·Q·c_eq/(N_cp·η_I) (Faraday's law; F = 96 485 C/mol, CODATA 2018); loop velocity "
    "of 1 to 2 m/s and hot water sanitisation at 80 °C or more (ISPE Baseline Guide vol. 4, "
    "Water and Steam Systems, 2nd ed. (2011), from memory); density 971.8 kg/m³ and viscosity "
    "0.355 mPa·s of water at 80 °C (IAPWS, from memory); heat Q = m·c_p·ΔT (common practice); "
    "US check Btu = 8.34·gal·Δ°F (common practice, 8.34 lb/gal); h_fg = 2133 kJ/kg at 4 bar a "
    "(IAPWS-IF97 steam tables, from memory); air expelled from the tank's headspace V₂ = "
    "V₁·T₂/T₁ at constant pressure (ideal gas, common practice). Plant, equipment, maker's "
    "data and readings invented.")
pw = ItemSheet("PW", "Quenby Moss sterile products plant (invented): purified water generation, "
               "double-pass RO and EDI, 8 m³ storage tank and hot loop, design case", PW_SRC)
pw.heading("RO permeate and feed")
pw.add("Qp", "Design permeate flow (RO, net to EDI)", "Q_p", 12, "m³/h")
pw.add("Qpg", "Permeate flow, US gpm (membrane maker's projection)", "Q_p,US", "={Qp}*4.403",
       "gpm")
pw.add("Qpg2", "Permeate flow, US gpm (first draft)", "Q_p,US2", "={Qp}/4.403", "gpm",
       planted=("unit-scale", "m³/h to gpm divided by 4.403: wrong way round"))
pw.add("Qpg3", "Permeate flow, US gpm (written out)", "Q_p,US3", "={Qp}*1000/3.785/60", "gpm")
pw.add("r", "RO recovery", "r", 75, "%")
pw.add("Qf", "RO feed flow", "Q_f", "={Qp}/({r}/100)", "m³/h")
pw.add("Qf2", "RO feed flow (first draft)", "Q_f2", "={Qp}/{r}", "m³/h",
       planted=("unit-scale", "a % used as a fraction: 100 too small"))
pw.add("Qc", "RO concentrate flow to drain", "Q_c", "={Qf}-{Qp}", "m³/h")
pw.add("Qcg", "Concentrate flow, US gpm", "Q_c,US", "={Qc}*4.403", "gpm")
pw.add("CF", "Concentration factor", "CF", "=1/(1-{r}/100)", "-")
pw.heading("Membranes and flux")
pw.add("n", "Elements, first pass (3 vessels × 6)", "n", 18, "-")
pw.add("Ae", "Active area per element (maker)", "A_e", 37.2, "m²")
pw.add("Aeft", "Active area per element, ft²", "A_e,US", "={Ae}*10.76", "ft²")
pw.add("J", "Average permeate flux", "J", "={Qp}*1000/({n}*{Ae})", "L/(m²·h)")
pw.add("J2", "Average permeate flux (first draft)", "J2", "={Qp}/({n}*{Ae})", "L/(m²·h)",
       planted=("unit-scale", "m³/h over m² written as L/(m²·h): the ×1000 missing"))
pw.add("Jg", "Average permeate flux, gfd", "J_US", "={J}*0.589", "gal/(ft²·d)")
pw.heading("Feed temperature correction")
pw.add("tf", "Feed water temperature, winter", "t_f", 12, "°C")
pw.add("TCF", "Temperature correction factor", "TCF", "=EXP(3020*(1/298-1/(273+{tf})))", "-")
pw.add("TCF2", "Temperature correction factor (first draft)", "TCF2",
       "=EXP(3020*(1/298-1/{tf}))", "-",
       planted=("offset-scale", "the °C reading put where kelvins belong in the Arrhenius term"))
pw.heading("Pressures")
pw.add("pfg", "Feed pressure at the first-stage inlet", "p_f", 10.5, "bar(g)")
pw.add("dpa", "Pressure drop across the array", "Δp_a", 2.0, "bar")
pw.add("ppg", "Permeate back pressure", "p_p", 0.8, "bar(g)")
pw.add("TDS", "Feed total dissolved solids", "TDS", 350, "mg/L")
pw.add("kpi", "Osmotic pressure per mg/L of TDS (common practice)", "k_π", 0.0007, "bar·L/mg")
pw.add("pif", "Feed osmotic pressure", "π_f", "={TDS}*{kpi}", "bar")
pw.add("pic", "Concentrate osmotic pressure", "π_c", "={pif}*{CF}", "bar")
pw.add("pia", "Average osmotic pressure", "π_avg", "=({pif}+{pic})/2", "bar")
pw.add("NDP", "Net driving pressure", "NDP", "={pfg}-{dpa}/2-{ppg}-{pia}", "bar")
pw.add("pb", "Site barometer (invented)", "p_b", 1.005, "bar a")
pw.add("pfa", "Feed pressure, absolute (maker's projection)", "p_f,a", "={pfg}+{pb}", "bar a")
pw.add("pfa2", "Feed pressure, absolute (first draft)", "p_f,a2", "={pfg}", "bar a",
       planted=("offset-scale", "a gauge reading set equal to an absolute pressure"))
pw.add("pfp", "Feed pressure, psig (US pump maker)", "p_f,US", "={pfg}*14.50", "psig")
pw.heading("High-pressure pump")
pw.add("psg", "Pump suction pressure", "p_s", 2.0, "bar(g)")
pw.add("dph", "Pump differential pressure", "Δp_p", "={pfg}-{psg}", "bar")
pw.add("etp", "Pump and motor efficiency", "η_p", 72, "%")
pw.add("Ph", "Hydraulic power", "P_h", "={Qf}*{dph}/36", "kW")
pw.add("Pe", "Electrical input", "P_e", "={Ph}/({etp}/100)", "kW")
pw.add("SEC", "Specific energy of the RO", "SEC", "={Pe}/{Qp}", "kWh/m³")
pw.add("Php", "Electrical input, hp (US motor list)", "P_e,US", "={Pe}/0.7457", "hp")
pw.heading("EDI")
pw.add("nst", "EDI stacks in parallel", "n_st", 4, "-")
pw.add("Ncp", "Cell pairs per stack (maker)", "N_cp", 30, "-")
pw.add("ceq", "Ions to remove, RO permeate, as monovalent equivalents", "c_eq", 0.12,
       "mmol/L")
pw.add("Fc", "Faraday constant", "F", 96485, "C/mol")
pw.add("etc", "Current efficiency", "η_I", 20, "%")
pw.add("Ist", "Minimum stack current (Faraday)", "I_st",
       "={Fc}*{Qp}/{nst}/3600*{ceq}/({Ncp}*{etc}/100)", "A")
pw.add("Ist2", "Minimum stack current (first draft)", "I_st2",
       "={Fc}*{Qp}/{nst}*{ceq}/({Ncp}*{etc}/100)", "A",
       planted=("unit-scale", "m³/h used as m³/s: the /3600 missing"))
pw.add("Vst", "Stack voltage at the set point (maker)", "U_st", 220, "V")
pw.add("Iset", "Stack current set point", "I_set", 3.5, "A")
pw.add("Pedi", "EDI DC power, all stacks", "P_EDI", "={Vst}*{Iset}*{nst}/1000", "kW")
pw.add("Pedi2", "EDI DC power, all stacks (first draft)", "P_EDI2", "={Vst}*{Iset}*{nst}",
       "kW", planted=("unit-scale", "V × A is W, written as kW"))
pw.add("Eedi", "Specific energy of the EDI", "E_EDI", "={Pedi}/{Qp}", "kWh/m³")
pw.heading("Storage tank and distribution loop")
pw.add("Vt", "Storage tank working volume", "V_t", 8, "m³")
pw.add("Ql", "Loop return flow", "Q_l", 15, "m³/h")
pw.add("turn", "Tank turnover rate", "N_t", "={Ql}/{Vt}", "1/h")
pw.add("tto", "Time for one turnover", "t_to", "={Vt}/{Ql}*60", "min")
pw.add("Qlg", "Loop flow, US gpm", "Q_l,US", "={Ql}*4.403", "gpm")
pw.add("Di", "Loop tube bore, 2.5 in BPE tube", "D_i", 60.2, "mm")
pw.add("v", "Loop return velocity", "v", "={Ql}/3600/(PI()*({Di}/1000)^2/4)", "m/s")
pw.add("v2", "Loop return velocity (first draft)", "v2", "={Ql}/3600/(PI()*{Di}^2/4)", "m/s",
       planted=("unit-scale", "the bore in mm squared where m² belongs"))
pw.add("vf", "Loop return velocity, ft/s", "v_US", "={v}/0.3048", "ft/s")
pw.add("rho8", "Density of water at 80 °C", "ρ_80", 971.8, "kg/m³")
pw.add("mu8", "Viscosity of water at 80 °C", "μ_80", 0.355, "mPa·s")
pw.add("Re", "Reynolds number in the loop return", "Re",
       "={rho8}*{v}*{Di}/1000/({mu8}/1000)", "-")
pw.heading("Hot water sanitisation heat-up")
pw.add("Vs", "Water heated (tank at sanitisation level, and loop)", "V_s", 5.6, "m³")
pw.add("rhos", "Density of water at 25 °C", "ρ_s", 997, "kg/m³")
pw.add("ms", "Mass of water heated", "m_s", "={Vs}*{rhos}", "kg")
pw.add("cpw", "Specific heat of water", "c_p", 4.18, "kJ/(kg·K)")
pw.add("mst", "Tank and loop stainless steel mass", "m_st", 2200, "kg")
pw.add("cps", "Specific heat of stainless steel", "c_st", 0.50, "kJ/(kg·K)")
pw.add("t1", "Start temperature", "t_1", 25, "°C")
pw.add("t2", "Sanitisation temperature", "t_2", 85, "°C")
pw.add("dts", "Temperature rise", "ΔT", "={t2}-{t1}", "K")
pw.add("th", "Heat-up time allowed", "t_h", 2.5, "h")
pw.add("Es", "Heat to raise water and steel", "E_s", "=({ms}*{cpw}+{mst}*{cps})*{dts}", "kJ")
pw.add("Qs", "Mean heating duty", "Q_s", "={Es}/({th}*3600)", "kW")
pw.add("QsB", "Mean heating duty, Btu/h", "Q_s,US", "={Qs}*3412", "Btu/h")
pw.add("QsB2", "Mean heating duty, Btu/h (first draft)", "Q_s,US2", "={Qs}*3.412", "Btu/h",
       planted=("unit-scale", "the W to Btu/h factor applied to kW: 1000 too small"))
pw.add("Vg", "Water heated, US gal", "V_s,US", "={Vs}*264.2", "gal")
pw.add("dtF", "Temperature rise, °F", "ΔT_F", "={dts}*1.8", "°F")
pw.add("QsU", "Heating duty, water only, Btu/h (US check)", "Q_s,US c",
       "=8.34*{Vg}*{dtF}/{th}", "Btu/h")
pw.add("hfg", "Latent heat of steam at 4 bar a", "h_fg", 2133, "kJ/kg")
pw.add("msm", "Steam to the heat exchanger", "ṁ_st", "={Qs}*3600/{hfg}", "kg/h")
pw.add("msl", "Steam to the heat exchanger, lb/h", "ṁ_st,US", "={msm}*2.205", "lb/h")
pw.heading("Tank vent filter (air expelled as the headspace heats)")
pw.add("Vh", "Headspace air at the start", "V_h", 2.4, "m³")
pw.add("T1", "Start temperature, absolute", "T_1", "={t1}+273.15", "K")
pw.add("T2", "Sanitisation temperature, absolute", "T_2", "={t2}+273.15", "K")
pw.add("T22", "Sanitisation temperature, absolute (first draft)", "T_22", "={t2}", "K",
       planted=("offset-scale", "a °C reading set equal to kelvins"))
pw.add("Vh2", "Headspace air at sanitisation temperature", "V_h2", "={Vh}*{T2}/{T1}", "m³")
pw.add("Vx", "Air expelled through the vent filter", "V_x", "={Vh2}-{Vh}", "m³")
PWS = pw.finish()

PWB = {
    "trade": "pharmaceutical utilities: purified water RO, EDI, storage loop and sanitisation",
    "sheets": [("PW", PWS)],
    "planted": dict(pw.planted),
}

# --------------------------------------------------------------------------------------------
# Book 2: small industrial coal-fired boiler (t/h, kJ/kg, MW, %, MMBtu/h, MJ/kg, Btu/lb, lb/h,
# stph, kg/t, kg/h, t/m³, m³, d, h, t/d, kg/kg, kg/Nm³, Nm³/h, scfm, °C, kPa, kPa(g), m³/s,
# acfm, inH2O, kW, hp, mg/Nm³)
# --------------------------------------------------------------------------------------------
CB_SRC = (
    "Sources: 1 MW = 3.412 MMBtu/h, 1 MJ/kg = 429.9 Btu/lb, 1 Btu/lb = 2.326 kJ/kg, 1 t = "
    "1.102 short ton, 1 kg = 2.205 lb, 1 m³/s = 2119 cfm, 1 kPa = 4.015 inH2O, 1 m³ = 35.31 "
    "ft³ (NIST SP 811 (2008) App. B.8); steam at 41 bar a, 400 °C, h = 3212 kJ/kg, feedwater "
    "at 105 °C, h = 440 kJ/kg (IAPWS-IF97 steam tables, from memory); boiler efficiency on "
    "HHV (ASME PTC 4 (2013) input-output method, from memory); Dulong's HHV = 33.82·C + "
    "144.2·(H − O/8) + 9.42·S MJ/kg, mass fractions, and stoichiometric air 11.5·C + "
    "34.5·(H − O/8) + 4.3·S kg/kg (Babcock & Wilcox, Steam: its generation and use, 41st ed., "
    "from memory); excess air = O₂/(21 − O₂), dry flue gas (common practice); air 1.293 "
    "kg/Nm³ at 0 °C, 101.325 kPa (Perry's Chemical Engineers' Handbook, 8th ed., from memory); "
    "scfm at 60 °F, 14.696 psia, 1 Nm³ = 37.33 scf, so 1 Nm³/h = 0.6221 scfm (common "
    "practice); coal flue gas 1.34 kg/Nm³ wet (from memory); flue gas mass = fuel + air − ash "
    "(common practice); fan power P(kW) = Q(m³/s)·Δp(kPa)/η and US bhp = acfm·Δp(in. w.g.)/"
    "(6356·η) (AMCA and common practice); SO₂ = 2 × S burnt (64.06/32.06, molar masses, "
    "IUPAC); concentration at 6 % O₂ by (21 − 6)/(21 − O₂) (EU Industrial Emissions "
    "Directive 2010/75/EU, reference oxygen for solid fuels, from memory); fly ash bulk "
    "density 0.75 t/m³ and coal 0.85 t/m³ (common practice). Boiler, coal analysis, site and "
    "readings invented.")
cb = ItemSheet("Coal", "Drumlaw Brae paper mill (invented): 25 t/h chain-grate coal-fired steam "
               "boiler, fuel, ash and draught, maximum continuous rating", CB_SRC)
cb.heading("Steam output and heat input")
cb.add("ms", "Steam output at MCR", "ṁ_s", 25, "t/h")
cb.add("hs", "Enthalpy of superheated steam, 41 bar a, 400 °C", "h_s", 3212, "kJ/kg")
cb.add("hfw", "Feedwater enthalpy at 105 °C", "h_fw", 440, "kJ/kg")
cb.add("Qo", "Heat to steam", "Q_o", "={ms}*({hs}-{hfw})/3600", "MW")
cb.add("eta", "Boiler efficiency, HHV basis", "η_b", 84, "%")
cb.add("Qin", "Fuel heat input", "Q_in", "={Qo}/({eta}/100)", "MW")
cb.add("Qin2", "Fuel heat input (first draft)", "Q_in2", "={Qo}/{eta}", "MW",
       planted=("unit-scale", "a % used as a fraction: 100 too small"))
cb.add("QinB", "Fuel heat input, MMBtu/h (US stoker maker)", "Q_in,US", "={Qin}*3.412",
       "MMBtu/h")
cb.heading("Coal and its heating value")
cb.add("HHV", "Higher heating value, as fired (laboratory)", "HHV", 26.5, "MJ/kg")
cb.add("HHVB", "Higher heating value, Btu/lb", "HHV_US", "={HHV}*429.9", "Btu/lb")
cb.add("HHVB1", "Higher heating value, Btu/lb (from kJ/kg)", "HHV_US1", "={HHV}*1000/2.326",
       "Btu/lb")
cb.add("HHVB2", "Higher heating value, Btu/lb (first draft)", "HHV_US2", "={HHV}/2.326",
       "Btu/lb", planted=("unit-scale", "MJ/kg treated as kJ/kg before /2.326: 1000 too small"))
cb.add("mc", "Coal feed", "ṁ_c", "={Qin}/{HHV}*3.6", "t/h")
cb.add("mc2", "Coal feed (first draft)", "ṁ_c2", "={Qin}/{HHV}*3600", "t/h",
       planted=("unit-scale", "kg/s to t/h by 3600: the /1000 missing"))
cb.add("mcl", "Coal feed, lb/h (US check)", "ṁ_c,US", "={QinB}*1000000/{HHVB}", "lb/h")
cb.add("mcs", "Coal feed, short tons per hour", "ṁ_c,st", "={mc}*1.102", "stph")
cb.add("rat", "Coal per tonne of steam", "r_c", "={mc}*1000/{ms}", "kg/t")
cb.add("hb", "Bunker holding time at MCR", "t_b", 12, "h")
cb.add("rhoc", "Bulk density of the coal", "ρ_c", 0.85, "t/m³")
cb.add("Vb", "Bunker live volume", "V_b", "={mc}*{hb}/{rhoc}", "m³")
cb.heading("Ultimate analysis, as fired (laboratory)")
cb.add("C", "Carbon", "C", 64.0, "%")
cb.add("H", "Hydrogen", "H", 4.2, "%")
cb.add("O", "Oxygen", "O", 7.5, "%")
cb.add("S", "Sulphur", "S", 1.2, "%")
cb.add("N", "Nitrogen", "N", 1.3, "%")
cb.add("M", "Moisture", "M", 9.8, "%")
cb.add("A", "Ash", "A", 12.0, "%")
cb.add("sum", "Sum of the analysis (check 100 %)", "Σ",
       "={C}+{H}+{O}+{S}+{N}+{M}+{A}", "%")
cb.add("HHVd", "Higher heating value by Dulong (check)", "HHV_D",
       "=(33.82*{C}+144.2*({H}-{O}/8)+9.42*{S})/100", "MJ/kg")
cb.heading("Ash")
cb.add("LOI", "Unburnt carbon in the ash (loss on ignition)", "LOI", 5, "%")
cb.add("fb", "Bottom ash share (chain grate)", "f_b", 20, "%")
cb.add("ma", "Ash in the coal", "ṁ_a", "={mc}*1000*{A}/100", "kg/h")
cb.add("ma2", "Ash in the coal (first draft)", "ṁ_a2", "={mc}*{A}/100", "kg/h",
       planted=("unit-scale", "t/h written as kg/h: the ×1000 missing"))
cb.add("mr", "Ash and unburnt carbon leaving the boiler", "ṁ_r", "={ma}/(1-{LOI}/100)", "kg/h")
cb.add("mba", "Bottom ash to the wet conveyor", "ṁ_ba", "={mr}*{fb}/100", "kg/h")
cb.add("mfa", "Fly ash to the bag filter", "ṁ_fa", "={mr}*(1-{fb}/100)", "kg/h")
cb.add("mfal", "Fly ash, lb/h (US conveying vendor)", "ṁ_fa,US", "={mfa}*2.205", "lb/h")
cb.add("ad", "Ash and carbon per day", "m_d", "={mr}*24/1000", "t/d")
cb.add("ds", "Fly ash silo storage", "t_s", 3, "d")
cb.add("rhoa", "Bulk density of fly ash", "ρ_a", 0.75, "t/m³")
cb.add("Vs", "Fly ash silo volume", "V_s", "={mfa}*24*{ds}/({rhoa}*1000)", "m³")
cb.add("Vs2", "Fly ash silo volume (first draft)", "V_s2", "={mfa}*24*{ds}/{rhoa}", "m³",
       planted=("unit-scale", "kg over t/m³: 1000 too large"))
cb.heading("Combustion air")
cb.add("Ast", "Stoichiometric air", "A_st", "=(11.5*{C}+34.5*({H}-{O}/8)+4.3*{S})/100", "kg/kg")
cb.add("O2", "Oxygen in the flue gas, dry (analyser)", "O₂", 4.5, "%")
cb.add("EA", "Excess air", "EA", "={O2}/(21-{O2})*100", "%")
cb.add("Aa", "Actual air", "A_a", "={Ast}*(1+{EA}/100)", "kg/kg")
cb.add("mair", "Combustion air mass flow", "ṁ_air", "={mc}*1000*{Aa}", "kg/h")
cb.add("rhoN", "Density of air at 0 °C, 101.325 kPa", "ρ_N", 1.293, "kg/Nm³")
cb.add("Vair", "Combustion air", "V̇_air", "={mair}/{rhoN}", "Nm³/h")
cb.add("Vair2", "Combustion air (first draft)", "V̇_air2", "={mair}*{rhoN}", "Nm³/h",
       planted=("result-unit", "mass over density turned over: ×1.293 where ÷ belongs"))
cb.add("Vsc", "Combustion air, scfm (60 °F, 14.696 psia)", "V̇_air,US", "={Vair}*0.6221",
       "scfm")
cb.add("Vsc2", "Combustion air, scfm (first draft)", "V̇_air,US2", "={Vair}*35.31/60", "scfm",
       planted=("unit-scale", "Nm³ to scf by the volume factor alone: 0 °C against 60 °F "
                              "left out, 5.4 % low"))
cb.heading("Flue gas and ID fan")
cb.add("mfg", "Flue gas mass flow", "ṁ_fg", "={mc}*1000*({Aa}+1-{A}/100)", "kg/h")
cb.add("rhofg", "Density of the flue gas at 0 °C, 101.325 kPa, wet", "ρ_fg", 1.34, "kg/Nm³")
cb.add("Vfg", "Flue gas", "V̇_fg", "={mfg}/{rhofg}", "Nm³/h")
cb.add("tfg", "Flue gas temperature at the ID fan inlet", "t_fg", 150, "°C")
cb.add("pbar", "Site barometer (invented)", "p_b", 99.6, "kPa")
cb.add("pin", "ID fan inlet static pressure", "p_in", -2.8, "kPa(g)")
cb.add("pout", "ID fan outlet static pressure", "p_out", 0.6, "kPa(g)")
cb.add("pab", "ID fan inlet pressure, absolute", "p_in,a", "={pbar}+{pin}", "kPa")
cb.add("Qa", "Actual flow at the ID fan inlet", "Q_a",
       "={Vfg}/3600*({tfg}+273.15)/273.15*101.325/{pab}", "m³/s")
cb.add("Qa2", "Actual flow at the ID fan inlet (first draft)", "Q_a2",
       "={Vfg}/3600*{tfg}/273.15*101.325/{pab}", "m³/s",
       planted=("offset-scale", "a °C reading in a ratio of absolute temperatures"))
cb.add("Qacf", "Actual flow at the ID fan inlet, acfm", "Q_a,US", "={Qa}*2119", "acfm")
cb.add("dpf", "ID fan static pressure rise", "Δp_f", "={pout}-{pin}", "kPa")
cb.add("dpf2", "ID fan static pressure rise (first draft)", "Δp_f2", "={pout}-{pab}", "kPa",
       planted=("offset-scale", "a gauge outlet reading less an absolute inlet pressure"))
cb.add("dpw", "ID fan static pressure rise, in. w.g.", "Δp_f,US", "={dpf}*4.015", "inH2O")
cb.add("etf", "ID fan static efficiency (maker)", "η_f", 78, "%")
cb.add("Pf", "ID fan shaft power", "P_f", "={Qa}*{dpf}/({etf}/100)", "kW")
cb.add("Pf2", "ID fan shaft power (first draft)", "P_f2", "={Qa}*{dpf}*1000/({etf}/100)",
       "kW", planted=("unit-scale", "kPa turned into Pa for a kW result: 1000 too large"))
cb.add("Pfh", "ID fan shaft power, bhp (US check)", "P_f,US",
       "={Qacf}*{dpw}/(6356*{etf}/100)", "hp")
cb.add("Pm", "ID fan motor rating with 15 % margin", "P_m", "={Pf}*1.15", "kW")
cb.heading("Sulphur dioxide")
cb.add("mSO2", "SO₂ formed (all sulphur burnt)", "ṁ_SO2", "={mc}*1000*{S}/100*2", "kg/h")
cb.add("xw", "Water vapour in the flue gas", "x_w", 8, "%")
cb.add("Vfd", "Flue gas, dry", "V̇_fg,d", "={Vfg}*(1-{xw}/100)", "Nm³/h")
cb.add("cSO2", "SO₂ in the dry flue gas, as measured", "c_SO2", "={mSO2}*1000000/{Vfd}",
       "mg/Nm³")
cb.add("cSO6", "SO₂ at 6 % reference oxygen", "c_SO2,6", "={cSO2}*(21-6)/(21-{O2})", "mg/Nm³")
CBS = cb.finish()

CBB = {
    "trade": "boiler plant: coal feed, ash, combustion air, ID fan and SO₂",
    "sheets": [("Coal", CBS)],
    "planted": dict(cb.planted),
}

# --------------------------------------------------------------------------------------------
# Book 3: marina fuel dock and fire protection (L/min, gpm, m³/h, kg/m³, 1/K, °C, in, m, m/s,
# bar, m, ft, %, kW, hp, kPa, psi, L, min, h, m³, Nm³/h, scfh, m², ft², L/(min·m²),
# gpm/ft², psig, psia)
# --------------------------------------------------------------------------------------------
FU_SRC = (
    "Sources: 1 US gal = 3.785 L, 1 in = 0.0254 m (so 1 m = 39.37 in), 1 ft = 0.3048 m, 1 hp "
    "= 0.7457 kW (NIST SP 811 (2008) App. B.8); 2 in Sch 40 bore 2.067 in (ASME B36.10M, from "
    "memory); diesel density 845 kg/m³ at 15 °C (within EN 590's range, invented) corrected "
    "by ρ_t = ρ₁₅·[1 − β·(t − 15)], β = 0.00084 /K (ASTM D1250 / API MPMS ch. 11.1 volume "
    "correction, linearised, from memory); water 999.1 kg/m³ at 15 °C (from memory); head "
    "h = Δp/(ρ·g), pump power ρ·g·Q·H/η, g_n = 9.81 m/s² (SI Brochure 9th ed.); US bhp = "
    "gpm·ft·SG/(3960·η) and psi = 0.433·ft·SG (common practice); tank filled to 90 % (common "
    "practice); normal venting for liquid movement, outbreathing 1.01 Nm³/h per m³/h filled "
    "for liquids with a flash point of 37.8 °C or above (API 2000, 6th ed., Annex A, from "
    "memory), thermal outbreathing V_OT = Y·V_tk^0.9·R_i, Nm³/h with V_tk in m³, Y = 0.32 "
    "below 42° latitude, R_i = 1 uninsulated (API 2000, 7th ed. (2014), from memory); 1 Nm³ "
    "= 37.33 scf at 60 °F (common practice). Marina, tanks, pumps and readings invented.")
fu = ItemSheet("Fuel", "Kittiwake Haven marina (invented): fuel dock, diesel dispenser supply "
               "pump and 30 000 L double-wall storage tank", FU_SRC)
fu.heading("Dispenser supply pump")
fu.add("Ql", "Rated flow, submersible pump to the dispensers", "Q", 150, "L/min")
fu.add("Qg", "Rated flow, US gpm (pump maker)", "Q_US", "={Ql}/3.785", "gpm")
fu.add("Qg2", "Rated flow, US gpm (first draft)", "Q_US2", "={Ql}*3.785", "gpm",
       planted=("unit-scale", "L to US gal multiplied by 3.785: wrong way round"))
fu.add("Qm", "Rated flow, m³/h", "Q_m", "={Ql}*60/1000", "m³/h")
fu.add("r15", "Diesel density at 15 °C (delivery note)", "ρ_15", 845, "kg/m³")
fu.add("beta", "Expansion coefficient of diesel", "β", 0.00084, "1/K")
fu.add("tfu", "Fuel temperature in the tank, summer", "t", 28, "°C")
fu.add("rt", "Diesel density at tank temperature", "ρ_t", "={r15}*(1-{beta}*({tfu}-15))",
       "kg/m³")
fu.add("rt2", "Diesel density at tank temperature (first draft)", "ρ_t2",
       "={r15}*(1-{beta}*{tfu})", "kg/m³",
       planted=("offset-scale", "the °C reading where its rise above 15 °C belongs"))
fu.add("rw", "Density of water at 15 °C", "ρ_w", 999.1, "kg/m³")
fu.add("SG", "Specific gravity of the diesel", "SG", "={rt}/{rw}", "-")
fu.heading("Line and head")
fu.add("Din", "Supply line bore, 2 in Sch 40", "D_in", 2.067, "in")
fu.add("Dm", "Supply line bore, m", "D", "={Din}*0.0254", "m")
fu.add("Dm1", "Supply line bore, m (by 39.37 in/m)", "D1", "={Din}/39.37", "m")
fu.add("v", "Velocity in the supply line", "v", "={Qm}/3600/(PI()*{Dm}^2/4)", "m/s")
fu.add("v2", "Velocity in the supply line (first draft)", "v2",
       "={Qm}/3600/(PI()*{Din}^2/4)", "m/s",
       planted=("unit-scale", "the bore in inches squared where m² belongs"))
fu.add("Hst", "Static lift, tank low level to the dispenser", "H_st", 4.5, "m")
fu.add("hf", "Pipe friction loss at rated flow", "h_f", 6.0, "m")
fu.add("dpm", "Filter, meter and nozzle pressure loss (maker)", "Δp_m", 0.7, "bar")
fu.add("hm", "Filter, meter and nozzle loss as head", "h_m", "={dpm}*100000/({rt}*9.81)", "m")
fu.add("hm2", "Filter, meter and nozzle loss as head (first draft)", "h_m2",
       "={dpm}*100000/{rt}", "m",
       planted=("result-unit", "Δp/ρ with g left out"))
fu.add("H", "Total head", "H", "={Hst}+{hf}+{hm}", "m")
fu.add("Hft", "Total head, ft", "H_US", "={H}*3.281", "ft")
fu.add("eta", "Pump and motor efficiency", "η", 55, "%")
fu.add("P", "Pump input power", "P", "={rt}*9.81*{Qm}/3600*{H}/({eta}/100)/1000", "kW")
fu.add("Php", "Pump input power, hp (US check)", "P_US", "={Qg}*{Hft}*{SG}/(3960*{eta}/100)",
       "hp")
fu.add("dp", "Pump pressure rise", "Δp", "={rt}*9.81*{H}/1000", "kPa")
fu.add("dpp", "Pump pressure rise, psi", "Δp_US", "={Hft}*0.433*{SG}", "psi")
fu.heading("Delivery and tank")
fu.add("Vtk", "Tank nominal capacity", "V_tk", 30000, "L")
fu.add("Qd", "Road tanker delivery rate", "Q_d", 600, "L/min")
fu.add("tfl", "Time to fill from empty to 90 %", "t_fill", "={Vtk}*0.9/{Qd}", "min")
fu.add("tflh", "Time to fill, hours", "t_fill,h", "={tfl}/60", "h")
fu.heading("Tank normal venting")
fu.add("Vtm", "Tank capacity, m³", "V_tk,m3", "={Vtk}/1000", "m³")
fu.add("Qdm", "Filling rate, m³/h", "Q_d,m", "={Qd}*60/1000", "m³/h")
fu.add("Vo", "Outbreathing for filling", "V̇_op", "={Qdm}*1.01", "Nm³/h")
fu.add("Vos", "Outbreathing for filling, scfh (vent maker)", "V̇_op,US", "={Vo}*37.33",
       "scfh")
fu.add("Vot", "Thermal outbreathing", "V̇_OT", "=0.32*{Vtm}^0.9*1", "Nm³/h")
fu.add("Vtot", "Outbreathing to size the vent", "V̇_out", "={Vo}+{Vot}", "Nm³/h")
FUS = fu.finish()

FI_SRC = (
    "Sources: 1 US gal = 3.785 L, 1 m² = 10.76 ft², 1 gpm/ft² = 40.75 L/(min·m²), 1 gpm = "
    "0.2271 m³/h, 1 psi = 6.895 kPa, 1 ft = 0.3048 m (NIST SP 811 (2008) App. B.8); foam "
    "solution 6.5 L/(min·m²) for 15 min on the dock's spill area and two supplementary hose "
    "lines of 190 L/min for 20 min, with a like reserve of concentrate (NFPA 11 (2021) and NFPA "
    "303 (2021), from memory); AFFF proportioned at 3 % (maker); sea water 1025 kg/m³ (common "
    "practice); head H = p/(ρ·g), g_n = 9.81 m/s² (SI Brochure 9th ed.); ft = 2.31·psi/SG "
    "(common practice); US bhp = gpm·ft·SG/(3960·η) (common practice); fire pump 150 % of "
    "rated flow at no less than 65 % of rated net pressure (NFPA 20 (2022), from memory); "
    "smooth-bore nozzle Q = 29.83·c·d²·√p, gpm, in, psi (NFPA Fire Protection Handbook, 20th "
    "ed., from memory); flow at 20 psi residual Q₂₀ = Q_t·[(p_s − 20)/(p_s − p_r)]^0.54 (NFPA "
    "291 (2022), from memory). Marina, pumps, test readings and maker's data invented.")
fi = ItemSheet("Fire", "Kittiwake Haven marina (invented): fuel dock foam protection and the "
               "pier's sea water fire pump", FI_SRC)
fi.heading("Foam for the fuel dock (AFFF 3 %)")
fi.add("As", "Protected spill area, fuel dock", "A_s", 140, "m²")
fi.add("rate", "Foam solution application rate", "q_s", 6.5, "L/(min·m²)")
fi.add("Asf", "Protected spill area, ft²", "A_s,US", "={As}*10.76", "ft²")
fi.add("Qs", "Foam solution to the monitors", "Q_s", "={As}*{rate}", "L/min")
fi.add("Qsg", "Foam solution, US gpm", "Q_s,US", "={Qs}/3.785", "gpm")
fi.add("rtu", "Application rate, gpm/ft²", "q_s,US", "={rate}/40.75", "gpm/ft²")
fi.add("Qsu", "Foam solution, US gpm (US check)", "Q_s,US c", "={Asf}*{rtu}", "gpm")
fi.add("cc", "Foam concentrate proportion", "c", 3, "%")
fi.add("Qc", "Concentrate flow to the monitors", "Q_c", "={Qs}*{cc}/100", "L/min")
fi.add("td", "Monitor discharge time", "t_d", 15, "min")
fi.add("nh", "Supplementary hose lines", "n_h", 2, "-")
fi.add("qh", "Flow per hose line", "q_h", 190, "L/min")
fi.add("th", "Hose line discharge time", "t_h", 20, "min")
fi.add("Vc", "Foam concentrate, one supply", "V_c", "=({Qs}*{td}+{nh}*{qh}*{th})*{cc}/100", "L")
fi.add("Vc2", "Foam concentrate, one supply (first draft)", "V_c2",
       "=({Qs}*{td}+{nh}*{qh}*{th})*{cc}", "L",
       planted=("unit-scale", "a % used as a fraction: 100 too large"))
fi.add("Vcg", "Foam concentrate, one supply, US gal", "V_c,US", "={Vc}/3.785", "gal")
fi.add("Vcg2", "Foam concentrate, one supply, US gal (first draft)", "V_c,US2", "={Vc}*3.785",
       "gal", planted=("unit-scale", "L to US gal multiplied by 3.785: wrong way round"))
fi.add("dr", "Drum capacity (maker)", "V_dr", 208, "L")
fi.add("ndr", "Drums on site, supply and reserve", "n_dr", "=ROUNDUP(2*{Vc}/{dr},0)", "-")
fi.heading("Sea water fire pump (vertical turbine on the pier)")
fi.add("Qfp", "Rated flow", "Q_r", 750, "gpm")
fi.add("Qfm", "Rated flow, m³/h", "Q_r,m", "={Qfp}*0.2271", "m³/h")
fi.add("pr", "Rated net pressure (pressure rise)", "p_r", 100, "psi")
fi.add("rsw", "Density of sea water", "ρ_sw", 1025, "kg/m³")
fi.add("rw", "Density of fresh water at 15 °C", "ρ_w", 999.1, "kg/m³")
fi.add("SGs", "Specific gravity of sea water", "SG_sw", "={rsw}/{rw}", "-")
fi.add("Hp", "Rated net pressure as head of sea water", "H_p",
       "={pr}*6.895*1000/({rsw}*9.81)", "m")
fi.add("Hp2", "Rated net pressure as head of sea water (first draft)", "H_p2",
       "={pr}*6.895/({rsw}*9.81)", "m",
       planted=("unit-scale", "kPa where Pa belongs: 1000 too small"))
fi.add("Hpf", "Rated net pressure as head, ft of sea water", "H_p,US", "={pr}*2.31/{SGs}", "ft")
fi.add("Hpf2", "Rated net pressure as head, ft of sea water (first draft)", "H_p,US2",
       "={pr}*2.31*{SGs}", "ft",
       planted=("gravity-number", "the specific gravity multiplies 2.31 ft/psi: it divides"))
fi.add("zl", "Lift, low water to the discharge flange", "z", 5.5, "m")
fi.add("hc", "Column and bowl losses (maker)", "h_c", 2.0, "m")
fi.add("Ht", "Total pump head", "H_t", "={Hp}+{zl}+{hc}", "m")
fi.add("etp", "Pump efficiency (maker)", "η_p", 75, "%")
fi.add("Pfp", "Pump shaft power at rated flow", "P_p",
       "={rsw}*9.81*{Qfm}/3600*{Ht}/({etp}/100)/1000", "kW")
fi.add("Pfp2", "Pump shaft power at rated flow (first draft)", "P_p2",
       "={rsw}*{Qfm}/3600*{Ht}/({etp}/100)/1000", "kW",
       planted=("result-unit", "ρ·Q·H/η with g left out"))
fi.add("Pfh", "Pump shaft power, bhp (US check)", "P_p,US",
       "={Qfp}*{Ht}*3.281*{SGs}/(3960*{etp}/100)", "hp")
fi.add("Q150", "Test flow, 150 % of rated", "Q_150", "={Qfp}*1.5", "gpm")
fi.add("p150", "Least net pressure at 150 % flow", "p_150", "={pr}*0.65", "psi")
fi.add("pdg", "Discharge pressure at rated flow (shop test)", "p_d", 104, "psig")
fi.add("pbs", "Site barometer (invented)", "p_b", 14.6, "psia")
fi.add("pda", "Discharge pressure, absolute (maker's form)", "p_d,a", "={pdg}+{pbs}", "psia")
fi.add("pda2", "Discharge pressure, absolute (first draft)", "p_d,a2", "={pdg}", "psia",
       planted=("offset-scale", "a gauge reading set equal to an absolute pressure"))
fi.heading("Monitor nozzle and fire main test")
fi.add("cd", "Nozzle discharge coefficient, smooth bore", "c", 0.97, "-")
fi.add("dn", "Monitor nozzle tip", "d", 1.25, "in")
fi.add("pn", "Nozzle pressure", "p_n", 80, "psig")
fi.add("Qn", "Monitor nozzle flow", "Q_n", "=29.83*{cd}*{dn}^2*SQRT({pn})", "gpm")
fi.add("ps", "Static pressure at the test hydrant", "p_s", 95, "psig")
fi.add("prs", "Residual pressure at the test hydrant", "p_res", 70, "psig")
fi.add("Qt", "Test flow", "Q_t", 900, "gpm")
fi.add("Q20", "Flow available at 20 psi residual", "Q_20",
       "={Qt}*(({ps}-20)/({ps}-{prs}))^0.54", "gpm")
FIS = fi.finish()

MAB = {
    "trade": "marina: fuel dock pump and venting, foam, sea water fire pump",
    "sheets": [("Fuel", FUS), ("Fire", FIS)],
    "planted": {**fu.planted, **fi.planted},
}

# --------------------------------------------------------------------------------------------
# Book 4: cold chain warehouse, rack-supported roof and freezer floor (psf, kPa, m, m², kN,
# kg, kip, %, mm, mm², MPa, psi, in, °C, K, W/(m·K), m²·K/W, W/(m²·K), Btu/(h·ft²·°F), W/m²,
# Btu/(h·ft²), kW, kJ/(kg·K), kg/s, kg/m³, L/min, gpm, W/m, kWh)
# --------------------------------------------------------------------------------------------
RF_SRC = (
    "Sources: 1 psf = 0.04788 kPa, 1 kPa = 20.89 psf, 1 kip = 4.448 kN, 1 MPa = 145.0 psi, "
    "1 in = 25.4 mm (NIST SP 811 (2008) App. B.8); flat roof snow p_f = 0.7·C_e·C_t·I_s·p_g, "
    "C_t = 1.3 for freezer buildings, minimum load I_s·p_g where p_g ≤ 20 psf, else 20·I_s "
    "(ASCE 7-16, 7.3 and 7.3.4, from memory); s = μ₁·C_e·C_t·s_k (EN 1991-1-3:2003, 5.2, from "
    "memory); factored load 1.2·D + 1.4·P + 1.6·S, product load factor 1.4 (ANSI MH16.1-2021 "
    "with ASCE 7-16 2.3, from memory; check the edition's combinations); g_n = 9.81 m/s² "
    "(SI Brochure 9th ed.); concrete bearing φ·0.85·f'c·√(A₂/A₁) ≤ 2 × , φ = 0.65 (ACI 318-19 "
    "22.8.3, from memory); base plate t = m·√(2·f_p/(0.9·F_y)), m = (N − 0.95·d)/2 (AISC "
    "Design Guide 1, 2nd ed. (2006), from memory). Warehouse, racking, maker's data and site "
    "snow invented.")
rf = ItemSheet("Roof", "Fenwold Gate cold chain hub (invented): rack-supported freezer roof, "
               "snow, interior rack upright and its base plate", RF_SRC)
rf.heading("Snow load (ASCE 7-16)")
rf.add("pg", "Ground snow load (site map, invented)", "p_g", 35, "psf")
rf.add("pgk", "Ground snow load, kPa", "p_g,SI", "={pg}*0.04788", "kPa")
rf.add("pgk1", "Ground snow load, kPa (by 20.89 psf/kPa)", "p_g,SI1", "={pg}/20.89", "kPa")
rf.add("pgk2", "Ground snow load, kPa (first draft)", "p_g,SI2", "={pg}*47.88", "kPa",
       planted=("unit-scale", "psf to Pa factor written into kPa: 1000 too large"))
rf.add("Ce", "Exposure factor, partially exposed", "C_e", 1.0, "-")
rf.add("Ct", "Thermal factor, freezer building", "C_t", 1.3, "-")
rf.add("Is", "Importance factor, risk category II", "I_s", 1.0, "-")
rf.add("pf", "Flat roof snow load", "p_f", "=0.7*{Ce}*{Ct}*{Is}*{pg}", "psf")
rf.add("pm", "Minimum snow load, low-slope roof", "p_m", "=IF({pg}<=20,{Is}*{pg},20*{Is})",
       "psf")
rf.add("ps", "Design roof snow load", "p_s", "=MAX({pf},{pm})", "psf")
rf.add("psk", "Design roof snow load, kPa", "p_s,SI", "={ps}*0.04788", "kPa")
rf.add("sk", "Characteristic ground snow load, EN check (invented)", "s_k", 1.5, "kPa")
rf.add("mu1", "Roof shape coefficient, flat", "μ₁", 0.8, "-")
rf.add("sEN", "Roof snow load, EN 1991-1-3 check", "s", "={mu1}*{Ce}*1.0*{sk}", "kPa")
rf.heading("Roof dead and collateral loads")
rf.add("Dk", "Insulated roof panels, 200 mm PIR", "D_k", 0.20, "kPa")
rf.add("Dp", "Purlins and bracing", "D_p", 0.12, "kPa")
rf.add("Dcp", "Collateral: sprinklers, lights, refrigerant piping (US sprinkler designer)",
       "D_c,US", 5, "psf")
rf.add("Dc", "Collateral load, kPa", "D_c", "={Dcp}*0.04788", "kPa")
rf.add("D", "Roof dead and collateral load", "D", "={Dk}+{Dp}+{Dc}", "kPa")
rf.add("D2", "Roof dead and collateral load (first draft)", "D2", "={Dk}+{Dp}+{Dcp}", "kPa",
       planted=("unit-scale", "a psf load added to kPa loads"))
rf.add("Dpsf", "Roof dead and collateral load, psf", "D_US", "={D}*20.89", "psf")
rf.heading("Interior rack upright axial load")
rf.add("bay", "Rack bay, upright to upright", "b", 2.7, "m")
rf.add("tw", "Roof tributary width per rack frame (two uprights)", "w_t", 4.4, "m")
rf.add("At", "Roof tributary area per upright", "A_t", "={bay}*{tw}/2", "m²")
rf.add("PD", "Roof dead load on the upright", "P_D", "={D}*{At}", "kN")
rf.add("PS", "Roof snow load on the upright", "P_S", "={psk}*{At}", "kN")
rf.add("nl", "Beam levels", "n_l", 6, "-")
rf.add("np", "Pallets per level per bay", "n_p", 3, "-")
rf.add("mp", "Pallet mass, maximum", "m_p", 1000, "kg")
rf.add("PP", "Product load on an interior upright (half a bay's)", "P_P",
       "={nl}*{np}*{mp}*9.81/2/1000", "kN")
rf.add("PP2", "Product load on an interior upright (first draft)", "P_P2",
       "={nl}*{np}*{mp}/2/1000", "kN",
       planted=("result-unit", "a mass written as a force: g left out"))
rf.add("Wr", "Rack self weight per upright (maker)", "W_r", 1.1, "kN")
rf.add("Pu", "Factored axial load", "P_u", "=1.2*({PD}+{Wr})+1.4*{PP}+1.6*{PS}", "kN")
rf.add("Puk", "Factored axial load, kips", "P_u,US", "={Pu}/4.448", "kip")
rf.add("Puk2", "Factored axial load, kips (first draft)", "P_u,US2", "={Pu}*4.448", "kip",
       planted=("unit-scale", "kN to kip multiplied by 4.448: wrong way round"))
rf.add("Pn", "Nominal axial strength of the upright (maker's test)", "P_n", 190, "kN")
rf.add("phc", "Resistance factor, compression", "φ_c", 0.90, "-")
rf.add("ut", "Upright utilisation", "U", "={Pu}/({phc}*{Pn})*100", "%")
rf.add("Aup", "Upright net area (maker)", "A_up", 620, "mm²")
rf.add("fa", "Mean axial stress in the upright", "f_a", "={Pu}*1000/{Aup}", "MPa")
rf.heading("Base plate bearing on the slab")
rf.add("B", "Base plate width", "B", 150, "mm")
rf.add("N", "Base plate length", "N", 150, "mm")
rf.add("d", "Upright depth", "d", 100, "mm")
rf.add("hsl", "Slab thickness", "h", 200, "mm")
rf.add("A1", "Base plate area", "A₁", "={B}*{N}", "mm²")
rf.add("A2", "Supporting area, geometrically similar", "A₂", "=({B}+2*{hsl})*({N}+2*{hsl})",
       "mm²")
rf.add("fp", "Bearing pressure under the plate", "f_p", "={Pu}*1000/{A1}", "MPa")
rf.add("fp2", "Bearing pressure under the plate (first draft)", "f_p2", "={Pu}/{A1}", "MPa",
       planted=("unit-scale", "kN over mm² written as MPa: the ×1000 missing"))
rf.add("fpp", "Bearing pressure, psi", "f_p,US", "={fp}*145.0", "psi")
rf.add("fc", "Slab concrete strength", "f'c", 32, "MPa")
rf.add("fpx", "Design bearing strength", "φf_p,max",
       "=0.65*0.85*{fc}*MIN(SQRT({A2}/{A1}),2)", "MPa")
rf.add("Fyp", "Base plate yield strength", "F_y", 275, "MPa")
rf.add("mc", "Plate cantilever", "m", "=({N}-0.95*{d})/2", "mm")
rf.add("tp", "Least base plate thickness", "t_p", "={mc}*SQRT(2*{fp}/(0.9*{Fyp}))", "mm")
rf.add("tpi", "Least base plate thickness, in", "t_p,US", "={tp}/25.4", "in")
RFS = rf.finish()

FL_SRC = (
    "Sources: thermal resistance R = Σ t/k + R_si, R_si = 0.10 m²·K/W for upward heat flow "
    "(ISO 6946:2017, from memory); XPS 0.034 W/(m·K), concrete 1.7 W/(m·K) (ISO 10456:2007, "
    "from memory); sub-base held at +5 °C under a −25 °C freezer, with an allowance for heat "
    "lost to the ground and 25 % margin (ASHRAE Handbook, Refrigeration (2018), refrigerated "
    "facilities, from memory); 1 W/(m²·K) = 0.1761 Btu/(h·ft²·°F), 1 W/m² = 0.3170 "
    "Btu/(h·ft²), 1 US gal = 3.785 L (NIST SP 811 (2008) App. B.8); glycol heating loop "
    "ṁ = P/(c_p·ΔT), 35 % propylene glycol c_p 3.6 kJ/(kg·K), 1040 kg/m³ (ASHRAE Handbook, "
    "Fundamentals (2017), ch. 31, from memory); heater duty 8760 h a year (common practice). "
    "Warehouse, floor build-up and readings invented.")
fl = ItemSheet("Floor", "Fenwold Gate cold chain hub (invented): freezer floor heating against "
               "frost heave, glycol loop and electric alternative", FL_SRC)
fl.heading("Floor build-up")
fl.add("tr", "Freezer room temperature", "t_r", -25, "°C")
fl.add("ts", "Sub-base temperature held by the heating", "t_s", 5, "°C")
fl.add("ti", "Insulation thickness, XPS", "t_i", 150, "mm")
fl.add("ki", "Conductivity of XPS", "k_i", 0.034, "W/(m·K)")
fl.add("tsl", "Slab and screed thickness", "t_sl", 200, "mm")
fl.add("ksl", "Conductivity of concrete", "k_sl", 1.7, "W/(m·K)")
fl.add("Rsi", "Inside surface resistance, heat flowing up", "R_si", 0.10, "m²·K/W")
fl.add("R", "Thermal resistance, room to heating plane", "R",
       "={ti}/1000/{ki}+{tsl}/1000/{ksl}+{Rsi}", "m²·K/W")
fl.add("R2", "Thermal resistance, room to heating plane (first draft)", "R2",
       "={ti}/{ki}+{tsl}/1000/{ksl}+{Rsi}", "m²·K/W",
       planted=("unit-scale", "the insulation in mm beside m: 1000 too large"))
fl.add("U", "Thermal transmittance", "U", "=1/{R}", "W/(m²·K)")
fl.add("Uu", "Thermal transmittance, US", "U_US", "={U}*0.1761", "Btu/(h·ft²·°F)")
fl.add("dT", "Temperature difference across the floor", "ΔT", "={ts}-{tr}", "K")
fl.add("q", "Heat drawn up into the freezer", "q", "={U}*{dT}", "W/m²")
fl.add("q2", "Heat drawn up into the freezer (first draft)", "q2", "={U}*({ts}+273.15-{tr})",
       "W/m²", planted=("offset-scale", "a kelvin reading less a °C reading"))
fl.add("qg", "Allowance for heat lost to the ground below (invented)", "q_g", 8, "W/m²")
fl.add("qd", "Design heating flux with 25 % margin", "q_d", "=({q}+{qg})*1.25", "W/m²")
fl.add("qdb", "Design heating flux, Btu/(h·ft²)", "q_d,US", "={qd}*0.3170", "Btu/(h·ft²)")
fl.heading("Heating plant")
fl.add("Af", "Freezer floor area", "A_f", 4200, "m²")
fl.add("Pfl", "Floor heating duty", "P_fl", "={qd}*{Af}/1000", "kW")
fl.add("Pfl2", "Floor heating duty (first draft)", "P_fl2", "={qd}*{Af}", "kW",
       planted=("unit-scale", "W written as kW"))
fl.add("cpg", "Specific heat of 35 % propylene glycol", "c_p,g", 3.6, "kJ/(kg·K)")
fl.add("dTg", "Glycol temperature drop through the floor", "ΔT_g", 5, "K")
fl.add("mg", "Glycol mass flow", "ṁ_g", "={Pfl}/({cpg}*{dTg})", "kg/s")
fl.add("rg", "Density of 35 % propylene glycol", "ρ_g", 1040, "kg/m³")
fl.add("Vg", "Glycol flow", "V̇_g", "={mg}/{rg}*60000", "L/min")
fl.add("Vg2", "Glycol flow (first draft)", "V̇_g2", "={mg}/{rg}*1000", "L/min",
       planted=("unit-scale", "m³/s to L/min by 1000: the ×60 missing"))
fl.add("Vgg", "Glycol flow, US gpm", "V̇_g,US", "={Vg}/3.785", "gpm")
fl.heading("Electric alternative and energy")
fl.add("Pc", "Heating cable output (maker)", "P_c", 12, "W/m")
fl.add("sc", "Cable spacing", "s_c", 450, "mm")
fl.add("qc", "Cable heat flux", "q_c", "={Pc}/({sc}/1000)", "W/m²")
fl.add("du", "Heater duty, share of the year", "δ", 35, "%")
fl.add("E", "Floor heating energy per year", "E", "={Pfl}*8760*{du}/100", "kWh")
FLS = fl.finish()

CSB = {
    "trade": "structural and refrigeration: rack-supported freezer roof and floor heating",
    "sheets": [("Roof", RFS), ("Floor", FLS)],
    "planted": {**rf.planted, **fl.planted},
}

BOOKS = {"purified-water-quenby-moss": PWB, "coal-boiler-drumlaw-brae": CBB,
         "marina-kittiwake-haven": MAB, "cold-store-roof-fenwold-gate": CSB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()

# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.
