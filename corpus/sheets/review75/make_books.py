#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review75), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; layout after
corpus/sheets/review64/make_books.py.

Trades: a quarry's dewatering pumps and settlement lagoon; a hospital's medical gases (liquid
oxygen VIE and the medical vacuum plant); a steel portal frame's wind loads and roof purlins; a
biogas CHP engine's heat and power balance. All scenarios, sites, firms, readings and maker's
data are invented (demonstration only); the formulas and published factors are the trade's own,
with their sources named in a text cell at the top of each sheet ("from memory" where recalled
and not checked, "common practice" for a fact of the trade with no single source).

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
# Book 1: quarry dewatering pumps and settlement lagoon
# --------------------------------------------------------------------------------------------
QRY_SRC = (
    "Sources: 1 ha = 10 000 m², 1 L = 0.001 m³ (SI Brochure 9th ed., Table 8); 1 US gal = "
    "3.785 L so 1 m³/h = 4.403 US gpm, 1 imperial gal = 4.546 L, 1 ft = 0.3048 m, 1 hp = "
    "0.7457 kW (NIST SP 811 (2008) App. B.8); L/s to m³/d by 86.4 = 86 400 s/d ÷ 1000 L/m³ "
    "(common practice); rainfall runoff V = C·i·A (rational method, common practice); "
    "Hazen-Williams in SI form h_f = 10.67·L·Q^1.852/(C^1.852·D^4.87), Q in m³/s, D and L in m "
    "(common practice; C = 140 for PE, from memory); fitting losses K·v²/(2g), g_n = 9.81 m/s² "
    "(SI Brochure 9th ed. gives 9.80665); hydraulic power ρ·g·Q·H; US check hp = gpm·ft·SG/"
    "(3960·η), 3960 = 33 000 ft·lbf/min ÷ 8.33 lb/gal (Hydraulic Institute, from memory); "
    "0.433 psi per ft of water (common practice); NPSHa = (p_abs − p_v)/(ρ·g) + v²/(2g) "
    "(Karassik, Pump Handbook, 4th ed., from memory); vapour pressure of water 1.23 kPa at "
    "10 °C and viscosity 1.31 mPa·s at 10 °C (IAPWS tables, from memory); °F = 1.8·°C + 32, "
    "K = °C + 273.15 (SI Brochure 9th ed.). Quarry, pumps, readings and maker's data invented.")
qp = ItemSheet("Pumps", "Greyhope Quarry, Carrick Moss pit (invented; operator Tolland "
               "Aggregates, invented): sump dewatering pump and rising main to the lagoon, "
               "design storm day", QRY_SRC)
qp.heading("Inflow to the sump")
qp.add("A", "Pit floor and benches draining to the sump", "A", 12.5, "ha")
qp.add("i", "Design storm rainfall over 24 h (invented)", "i", 45, "mm/d")
qp.add("Cr", "Runoff coefficient, worked benches and haul roads", "C", 0.7, "-")
qp.add("Qr", "Storm runoff to the sump", "Q_r", "={A}*10000*{i}/1000*{Cr}", "m³/d")
qp.add("Qr2", "Storm runoff to the sump (first draft)", "Q_r2", "={A}*{i}*{Cr}", "m³/d",
       planted=("unit-scale", "ha × mm taken as m³: 1 ha·mm is 10 m³, ×10 missing"))
qp.add("Qg", "Groundwater inflow (pumping test, invented)", "Q_g", 38, "L/s")
qp.add("Qgd", "Groundwater inflow per day", "Q_g,d", "={Qg}*86.4", "m³/d")
qp.add("Qt", "Total inflow to be pumped", "Q_t", "={Qr}+{Qgd}", "m³/d")
qp.add("hp", "Pumping hours per day (off-peak tariff)", "t_p", 20, "h/d")
qp.add("Qh", "Pump duty flow", "Q", "={Qt}/{hp}", "m³/h")
qp.add("Qls", "Pump duty flow, L/s", "Q_Ls", "={Qh}/3.6", "L/s")
qp.add("Qls2", "Pump duty flow, L/s (telemetry set-up)", "Q_Ls2", "={Qh}*3.6", "L/s",
       planted=("unit-scale", "m³/h to L/s multiplied by 3.6: wrong way round"))
qp.add("Qs", "Pump duty flow, m³/s", "Q_s", "={Qh}/3600", "m³/s")
qp.add("Qgpm", "Pump duty flow, US gpm (US maker's curve)", "Q_US", "={Qh}*4.403", "gpm")
qp.add("Qgpm2", "Pump duty flow, US gpm (first draft)", "Q_US2", "={Qh}*3.666", "gpm",
       planted=("unit-scale", "the imperial-gallon factor 3.666 used for US gallons: 1.2 "
                              "times too small"))
qp.heading("Rising main")
qp.add("z1", "Sump water level at pump cut-out (invented)", "z_1", 62.0, "m")
qp.add("z2", "Top water level of the lagoon inlet chamber (invented)", "z_2", 104.5, "m")
qp.add("Hs", "Static lift", "H_s", "={z2}-{z1}", "m")
qp.add("Dmm", "Rising main bore, PE100 SDR17, 315 mm OD", "D_mm", 277, "mm")
qp.add("L", "Rising main length", "L", 820, "m")
qp.add("Dm", "Rising main bore, m", "D", "={Dmm}/1000", "m")
qp.add("Ap", "Bore area", "A_p", "=PI()*{Dm}^2/4", "m²")
qp.add("v", "Mean velocity in the rising main", "v", "={Qs}/{Ap}", "m/s")
qp.add("v2", "Mean velocity in the rising main (first draft)", "v_2",
       "={Qs}/(PI()*{Dmm}^2/4)", "m/s",
       planted=("unit-scale", "bore in mm used in an area in m²: 10⁶ too small"))
qp.add("CHW", "Hazen-Williams C, PE pipe", "C_HW", 140, "-")
qp.add("hf", "Friction loss in the rising main (Hazen-Williams)", "h_f",
       "=10.67*{L}*{Qs}^1.852/({CHW}^1.852*{Dm}^4.87)", "m")
qp.add("K", "Sum of fitting loss coefficients (valves, bends, outlet)", "ΣK", 8.5, "-")
qp.add("hm", "Fitting losses", "h_m", "={K}*{v}^2/(2*9.81)", "m")
qp.add("H", "Total head at duty", "H", "={Hs}+{hf}+{hm}", "m")
qp.add("Hft", "Total head, ft (US maker's curve)", "H_ft", "={H}/0.3048", "ft")
qp.heading("Power")
qp.add("rho", "Density of the silty pit water (invented)", "ρ", 1005, "kg/m³")
qp.add("SG", "Specific gravity of the pit water", "SG", "={rho}/1000", "-")
qp.add("Ph", "Hydraulic power", "P_h", "={rho}*9.81*{Qs}*{H}/1000", "kW")
qp.add("Ph2", "Hydraulic power (first draft)", "P_h2", "={rho}*{Qs}*{H}/1000", "kW",
       planted=("result-unit", "ρ·Q·H with g missing"))
qp.add("eta", "Pump efficiency at duty (maker's curve, invented)", "η_p", 74, "%")
qp.add("Psh", "Pump shaft power", "P_sh", "={Ph}/({eta}/100)", "kW")
qp.add("BHP", "Pump shaft power, hp (US check, gpm·ft·SG/(3960·η))", "P_US",
       "={Qgpm}*{Hft}*{SG}/(3960*{eta}/100)", "hp")
qp.add("etam", "Motor efficiency, IE3", "η_m", 94, "%")
qp.add("Pe", "Motor input power", "P_e", "={Psh}/({etam}/100)", "kW")
qp.add("Pctl", "Control panel, telemetry and sump lighting (invented)", "P_c", 450, "W")
qp.add("Ptot", "Site electrical load at the sump", "P_t", "={Pe}+{Pctl}/1000", "kW")
qp.add("Ptot2", "Site electrical load at the sump (first draft)", "P_t2", "={Pe}+{Pctl}", "kW",
       planted=("unit-scale", "W added to kW"))
qp.add("E", "Energy per day", "E_d", "={Ptot}*{hp}", "kWh/d")
qp.add("pdpsi", "Pressure rise across the pump, psi (0.433 psi/ft × SG)", "Δp_US",
       "={Hft}*0.433*{SG}", "psi")
qp.heading("Suction (NPSH) and temperature")
qp.add("pb", "Site barometer on the pit floor (invented)", "p_b", 100.6, "kPa")
qp.add("pv", "Vapour pressure of water at 10 °C", "p_v", 1.23, "kPa")
qp.add("psg", "Suction gauge reading at the pump inlet (invented)", "p_s,g", -38, "kPa(g)")
qp.add("psa", "Suction pressure, absolute", "p_s,a", "={psg}+{pb}", "kPa a")
qp.add("npsh", "NPSH available", "NPSHa", "=({psa}-{pv})*1000/({rho}*9.81)+{v}^2/(2*9.81)",
       "m")
qp.add("npsh2", "NPSH available (first draft)", "NPSHa2",
       "=({psg}-{pv})*1000/({rho}*9.81)+{v}^2/(2*9.81)", "m",
       planted=("offset-scale", "the suction gauge reading used as an absolute pressure"))
qp.add("tw", "Pit water temperature, winter", "t_w", 10, "°C")
qp.add("twF", "Pit water temperature, °F (US maker's data sheet)", "t_w,F", "={tw}*1.8+32",
       "°F")
qp.add("TK", "Pit water temperature, kelvin", "T_w", "={tw}+273.15", "K")
qp.add("TK2", "Pit water temperature, kelvin (first draft)", "T_w2", "={tw}", "K",
       planted=("offset-scale", "a °C reading set equal to kelvins"))
QRYP = qp.finish()

LAG_SRC = (
    "Sources: Stokes' law v_s = g·(ρ_s − ρ_w)·d²/(18·μ), valid for particle Re < 1 (Perry's "
    "Chemical Engineers' Handbook, 8th ed., sect. 6, from memory); surface overflow rate Q/A "
    "and retention time V/Q (common practice for settlement lagoons); quartz density 2650 "
    "kg/m³ (from memory); 1 µm = 10⁻⁶ m, 1 mPa·s = 10⁻³ Pa·s, mg/L = g/m³ (SI Brochure 9th "
    "ed.); solids load = Q·(C_in − C_out) (common practice). Lagoon, silt grading, consent "
    "limit and readings invented.")
lg = ItemSheet("Lagoon", "Greyhope Quarry settlement lagoon (invented): silt settling, "
               "retention and sludge storage", LAG_SRC)
lg.heading("Settling")
lg.add("d", "Design particle size to be settled (fine silt, invented)", "d", 20, "µm")
lg.add("rhos", "Particle density (quartz)", "ρ_s", 2650, "kg/m³")
lg.add("mu", "Dynamic viscosity of water at 10 °C", "μ", 1.31, "mPa·s")
lg.add("vs", "Settling velocity (Stokes)", "v_s",
       "=9.81*({rhos}-{Pumps.rho})*({d}/1000000)^2/(18*{mu}/1000)", "m/s")
lg.add("vs2", "Settling velocity (first draft)", "v_s2",
       "=9.81*({rhos}-{Pumps.rho})*({d}/1000000)^2/(18*{mu})", "m/s",
       planted=("unit-scale", "mPa·s used as Pa·s: 1000 too small"))
lg.add("nu", "Kinematic viscosity", "ν", "={mu}/1000/{Pumps.rho}", "m²/s")
lg.add("Rep", "Particle Reynolds number (Stokes valid below 1)", "Re_p",
       "={vs}*{d}/1000000/{nu}", "-")
lg.add("sf", "Factor on the settling area for short-circuiting", "f_s", 1.5, "-")
lg.add("Areq", "Settling area required", "A_req", "={Pumps.Qs}/{vs}*{sf}", "m²")
lg.heading("Lagoon")
lg.add("Ll", "Lagoon length at top water level", "L_l", 120, "m")
lg.add("Wl", "Lagoon width at top water level", "W_l", 45, "m")
lg.add("dl", "Settling depth above the sludge zone", "d_l", 2.5, "m")
lg.add("Al", "Lagoon plan area", "A_l", "={Ll}*{Wl}", "m²")
lg.add("SOR", "Surface overflow rate", "SOR", "={Pumps.Qh}/{Al}", "m/h")
lg.add("Vl", "Settling volume", "V_l", "={Al}*{dl}", "m³")
lg.add("HRT", "Retention time at duty flow", "t_r", "={Vl}/{Pumps.Qh}", "h")
lg.add("tl", "Lagoon outlet water temperature, winter (invented)", "t_l", 6, "°C")
lg.add("dT", "Temperature drop across the lagoon", "ΔT", "={Pumps.tw}-{tl}", "K")
lg.heading("Solids and sludge storage")
lg.add("TSSi", "Suspended solids in the pumped water (invented)", "C_in", 1800, "mg/L")
lg.add("TSSo", "Suspended solids consent at the outfall (invented)", "C_out", 40, "mg/L")
lg.add("rem", "Solids removal needed", "R", "=({TSSi}-{TSSo})/{TSSi}*100", "%")
lg.add("Ms", "Dry solids settled per day", "M_s", "={Pumps.Qt}*({TSSi}-{TSSo})/1000", "kg/d")
lg.add("Ms2", "Dry solids settled per day (first draft)", "M_s2",
       "={Pumps.Qt}*({TSSi}-{TSSo})", "kg/d",
       planted=("unit-scale", "m³/d × mg/L gives g/d, written as kg/d: /1000 missing"))
lg.add("ds", "Dry solids of the settled sludge", "DS", 35, "%")
lg.add("rsl", "Bulk density of the settled sludge", "ρ_sl", 1.3, "t/m³")
lg.add("Vsl", "Sludge volume per day", "V_sl", "={Ms}/({ds}/100)/({rsl}*1000)", "m³/d")
lg.add("hsl", "Sludge storage depth allowed", "h_sl", 0.6, "m")
lg.add("tfill", "Days to fill the sludge storage at the storm rate", "t_f",
       "={Al}*{hsl}/{Vsl}", "d")
LAGS = lg.finish(others=[qp])

QRYB = {
    "trade": "quarry dewatering: sump pump, rising main and settlement lagoon",
    "sheets": [("Pumps", QRYP), ("Lagoon", LAGS)],
    "planted": {**qp.planted, **lg.planted},
}

# --------------------------------------------------------------------------------------------
# Book 2: hospital medical gases, liquid oxygen VIE and medical vacuum plant
# --------------------------------------------------------------------------------------------
OXY_SRC = (
    "Sources: design flows with diversity and the 400 kPa nominal pipeline pressure (HTM 02-01 "
    "Medical gas pipeline systems, Part A, 2006, from memory; flows here invented); oxygen "
    "molar mass 31.999 g/mol, R = 8.314 J/(mol·K) (CODATA 2018), ρ = p·M/(R·T); liquid oxygen "
    "1141 kg/m³ at its normal boiling point −183 °C, latent heat 213 kJ/kg, gas c_p 0.92 "
    "kJ/(kg·K) (CRC Handbook of Chemistry and Physics, from memory); J-size oxygen cylinder "
    "6800 L of gas (common practice, from memory); 1 bar = 14.50 psi (NIST SP 811 (2008) App. "
    "B.8); K = °C + 273.15 (SI Brochure 9th ed.); absolute = gauge + site barometer (common "
    "practice). Hospital, VIE, flows and readings invented.")
ox = ItemSheet("Oxygen", "St Ebba's General Hospital, Marlow Cross (invented): liquid oxygen "
               "VIE, vaporisers and pipeline, design flows", OXY_SRC)
ox.heading("Demand")
ox.add("Qw", "Oxygen design flow, wards (HTM 02-01 diversity, invented sum)", "Q_w", 1450,
       "L/min")
ox.add("Qc", "Oxygen design flow, critical care and theatres (invented sum)", "Q_c", 980, "L/min")
ox.add("Qd", "Oxygen design flow, whole site", "Q_d", "={Qw}+{Qc}", "L/min")
ox.add("Qdm3", "Oxygen design flow, m³/h of free gas", "Q_d,h", "={Qd}*60/1000", "m³/h")
ox.add("avg", "Average flow as a share of the design flow (site records, invented)", "f_avg",
       35, "%")
ox.add("Qavg", "Oxygen average flow", "Q_avg", "={Qd}*{avg}/100", "L/min")
ox.add("Qavgd", "Oxygen average flow per day, m³/d of free gas", "Q_avg,d",
       "={Qavg}*1440/1000", "m³/d")
ox.heading("Gas density at 15 °C")
ox.add("p0", "Reference pressure for free gas", "p_0", 101.325, "kPa")
ox.add("t0", "Reference temperature for free gas", "t_0", 15, "°C")
ox.add("M", "Molar mass of oxygen", "M", 31.999, "g/mol")
ox.add("T0", "Reference temperature, kelvin", "T_0", "={t0}+273.15", "K")
ox.add("rho", "Density of oxygen gas at 15 °C, 101.325 kPa", "ρ_g", "={p0}*{M}/(8.314*{T0})",
       "kg/m³")
ox.add("rho2", "Density of oxygen gas (first draft)", "ρ_g2", "={p0}*{M}/(8.314*{t0})",
       "kg/m³", planted=("offset-scale", "a °C reading in the gas law: kelvins belong"))
ox.add("mO2", "Oxygen mass flow at design", "ṁ", "={Qdm3}*{rho}", "kg/h")
ox.add("mavg", "Oxygen used per day, average", "m_d", "={mO2}*{avg}/100*24", "kg/d")
ox.add("may", "Oxygen used per year", "m_a", "={mavg}*365/1000", "t/yr")
ox.add("mavg2", "Oxygen used per day, average (first draft)", "m_d2", "={mO2}*{avg}*24",
       "kg/d", planted=("unit-scale", "a % used as a fraction: 100 too large"))
ox.heading("VIE and vaporisers")
ox.add("Vv", "VIE vessel liquid capacity (invented)", "V_v", 11000, "L")
ox.add("rhoL", "Density of liquid oxygen", "ρ_L", 1141, "kg/m³")
ox.add("fill", "Usable share of the vessel between refills (invented)", "f_u", 85, "%")
ox.add("Mv", "Usable oxygen in the vessel", "M_v", "={Vv}/1000*{rhoL}*{fill}/100", "kg")
ox.add("Mv2", "Usable oxygen in the vessel (first draft)", "M_v2", "={Vv}*{rhoL}*{fill}/100",
       "kg", planted=("unit-scale", "litres taken as m³: /1000 missing"))
ox.add("aut", "Days of stock at the average flow", "t_s", "={Mv}/{mavg}", "d")
ox.add("Vgas", "Gas equivalent of the usable charge", "V_gas", "={Mv}/{rho}", "m³")
ox.add("xr", "Expansion ratio, liquid to gas at 15 °C", "x_r", "={rhoL}/{rho}", "-")
ox.add("tL", "Normal boiling point of oxygen", "t_L", -183, "°C")
ox.add("TL", "Normal boiling point of oxygen, kelvin", "T_L", "={tL}+273.15", "K")
ox.add("TL2", "Normal boiling point of oxygen, kelvin (first draft)", "T_L2", "={tL}", "K",
       planted=("offset-scale", "a °C reading set equal to kelvins"))
ox.add("hfg", "Latent heat of oxygen at its boiling point", "h_fg", 213, "kJ/kg")
ox.add("cpg", "Specific heat of oxygen gas", "c_p", 0.92, "kJ/(kg·K)")
ox.add("Qvap", "Vaporiser duty at design flow", "Q_vap",
       "={mO2}*({hfg}+{cpg}*({t0}-{tL}))/3600", "kW")
ox.add("Qvap2", "Vaporiser duty at design flow (first draft)", "Q_vap2",
       "={mO2}*({hfg}+{cpg}*({t0}-{tL}))", "kW",
       planted=("unit-scale", "kg/h × kJ/kg written as kW: /3600 missing"))
ox.heading("Pressures and the riser")
ox.add("pvie", "VIE working pressure", "p_v", 10.5, "barg")
ox.add("pline", "Pipeline distribution pressure (HTM 02-01 nominal 400 kPa)", "p_l", 4.0, "barg")
ox.add("pb", "Site barometer (invented)", "p_b", 1.005, "bar")
ox.add("zs", "Site altitude, plant compound (invented)", "z", 48, "m")
ox.add("pstd", "Barometer at the site altitude, standard atmosphere (check on p_b)", "p_std",
       "=101.325*(1-2.25577E-5*{zs})^5.2559", "kPa")
ox.add("pva", "VIE working pressure, absolute", "p_v,a", "={pvie}+{pb}", "bar a")
ox.add("plk", "Pipeline distribution pressure, kPa(g)", "p_l,k", "={pline}*100", "kPa(g)")
ox.add("plpsig", "Pipeline distribution pressure, psig", "p_l,US", "={pline}*14.5", "psig")
ox.add("pvpsig", "VIE working pressure, psig (US relief valve maker)", "p_v,US",
       "={pvie}*14.5", "psig")
ox.add("pvpsig2", "VIE working pressure, psig (first draft)", "p_v,US2", "={pvie}/14.5", "psig",
       planted=("unit-scale", "bar to psi divided by 14.5: wrong way round"))
ox.add("rp", "Pressure ratio across the line regulator, absolute", "r_p",
       "=({pvie}+{pb})/({pline}+{pb})", "-")
ox.add("rp2", "Pressure ratio across the line regulator (first draft)", "r_p2",
       "={pvie}/{pline}", "-",
       planted=("offset-scale", "gauge pressures in a ratio: absolute ones belong"))
ox.add("Qact", "Design flow at line pressure", "Q_act", "={Qdm3}*{p0}/(({pline}+{pb})*100)",
       "m³/h")
ox.add("D", "Main riser bore, 42 mm × 1.2 mm copper (EN 13348)", "D", 39.6, "mm")
ox.add("vr", "Gas velocity in the main riser", "v", "={Qact}/3600/(PI()*({D}/1000)^2/4)", "m/s")
ox.heading("Emergency reserve manifold")
ox.add("ncyl", "J-size cylinders on the duty bank (invented)", "n", 10, "-")
ox.add("Vcyl", "Gas in a J-size cylinder", "V_c", 6800, "L")
ox.add("tres", "Hours of supply from the bank at the average flow", "t_res",
       "={ncyl}*{Vcyl}/{Qavg}/60", "h")
ox.add("tres2", "Hours of supply from the bank (first draft)", "t_res2", "={ncyl}*{Vcyl}/{Qavg}",
       "h", planted=("unit-scale", "L over L/min written as hours: /60 missing"))
OXYS = ox.finish()

VAC_SRC = (
    "Sources: vacuum design flows in L/min of free air and the plant's 'vacuum below "
    "atmosphere' (HTM 02-01, 2006, from memory; flows invented); actual suction volume by "
    "Boyle's law V_act = V_free·p_atm/p_abs (common practice); ideal isothermal power "
    "P = p₁·V̇₁·ln(p₂/p₁) (Perry's Chemical Engineers' Handbook, 8th ed., from memory); "
    "1 mmHg = 0.1333 kPa, 1 bar = 100 kPa (NIST SP 811 (2008) App. B.8); plant room air "
    "ρ = 1.2 kg/m³, c_p = 1.005 kJ/(kg·K) (common practice). Plant, pumps and readings "
    "invented.")
vc = ItemSheet("Vacuum", "St Ebba's General Hospital (invented): medical vacuum plant, "
               "rotary vane pumps and plant room ventilation", VAC_SRC)
vc.heading("Flow and pressure")
vc.add("Qv", "Vacuum design flow, free air (HTM 02-01 diversity, invented sum)", "Q_v", 1800,
       "L/min")
vc.add("prg", "Receiver pressure at the plant (invented)", "p_r,g", -65, "kPa(g)")
vc.add("pbk", "Site barometer", "p_b", "={Oxygen.pb}*100", "kPa")
vc.add("pra", "Receiver pressure, absolute", "p_r,a", "={prg}+{pbk}", "kPa a")
vc.add("vmm", "Receiver vacuum below atmosphere, mmHg (plant gauge)", "p_vac",
       "=-{prg}/0.1333", "mmHg")
vc.add("Qa", "Actual volume flow at the pump suction", "Q_a", "={Qv}*60/1000*{pbk}/{pra}",
       "m³/h")
vc.add("Qa2", "Actual volume flow at the pump suction (first draft)", "Q_a2",
       "={Qv}*60/1000*{pbk}/{prg}", "m³/h",
       planted=("offset-scale", "the gauge (negative) receiver reading in Boyle's law"))
vc.add("Vp", "Pump displacement at the receiver pressure (maker, invented)", "V_p", 150, "m³/h")
vc.add("nd", "Duty pumps needed", "n_d", "={Qa}/{Vp}", "-")
vc.add("Qacfm", "Actual volume flow at the pump suction, acfm (US pump maker)", "Q_a,US",
       "={Qa}/1.699", "acfm")
vc.add("dpv", "Vacuum held below the site barometer", "Δp_vac", "={pbk}-{pra}", "kPa")
vc.add("Vr", "Vacuum receiver volume (invented)", "V_r", 1000, "L")
vc.add("tpd", "Time for one pump to draw the receiver down from atmosphere (no inflow)",
       "t_pd", "={Vr}/1000/{Vp}*60*LN({pbk}/{pra})", "min")
vc.heading("Power and heat")
vc.add("Piso", "Ideal isothermal power", "P_iso", "={pra}*{Qa}/3600*LN({pbk}/{pra})", "kW")
vc.add("etai", "Isothermal efficiency of the pump set (maker, invented)", "η_i", 35, "%")
vc.add("Psh", "Shaft power, duty pumps", "P_sh", "={Piso}/({etai}/100)", "kW")
vc.add("Pshhp", "Shaft power, duty pumps, hp", "P_sh,US", "={Psh}/0.7457", "hp")
vc.add("tin", "Plant room supply air temperature (invented)", "t_in", 22, "°C")
vc.add("tout", "Plant room extract air temperature, limit", "t_out", 30, "°C")
vc.add("dTr", "Temperature rise of the ventilation air", "ΔT", "={tout}-{tin}", "K")
vc.add("Vvent", "Ventilation air to remove the pump heat", "V̇_a",
       "={Psh}/(1.2*1.005*{dTr})", "m³/s")
vc.add("Vvent2", "Ventilation air to remove the pump heat (first draft)", "V̇_a2",
       "={Psh}*1000/(1.2*1.005*{dTr})", "m³/s",
       planted=("unit-scale", "kW taken to W against kJ/(kg·K): 1000 too large"))
vc.add("Vventh", "Ventilation air, m³/h", "V̇_a,h", "={Vvent}*3600", "m³/h")
VACS = vc.finish(others=[ox])

HSPB = {
    "trade": "hospital medical gases: liquid oxygen VIE, pipeline and medical vacuum plant",
    "sheets": [("Oxygen", OXYS), ("Vacuum", VACS)],
    "planted": {**ox.planted, **vc.planted},
}

# --------------------------------------------------------------------------------------------
# Book 3: steel portal frame, wind loads and roof purlins
# --------------------------------------------------------------------------------------------
WND_SRC = (
    "Sources: v_b = v_b,map·c_alt·c_dir·c_season, c_alt = 1 + 0.001·A with A in m (BS EN "
    "1991-1-4:2005 and UK National Annex, NA.2.4, from memory); q_b = ½·ρ·v_b², ρ = 1.226 "
    "kg/m³, so q_b = 0.613·v_b² in N/m² (UK NA, common practice); q_p = c_e·q_b (UK NA, c_e "
    "read from its figure, invented read); pressure coefficients c_pe,10 (EN 1991-1-4 tables "
    "7.1 and 7.4a, from memory) and c_pi; force F = c_s·c_d·c_f·q_p·A_ref (EN 1991-1-4 eq. 5.3); "
    "ASCE 7-10 eq. 29.3-1 q_z = 0.00256·K_z·K_zt·K_d·V² in psf with V in mph (from memory); "
    "1 mph = 0.44704 m/s, 1 psf = 47.88 Pa, 1 kip = 4.448 kN (NIST SP 811 (2008) App. B.8); "
    "ρ = p/(R·T), R = 287.05 J/(kg·K) for dry air (common practice). Building, site and "
    "readings invented.")
wd = ItemSheet("Wind", "Brackley Moor distribution shed (invented; engineer Halloway & Pike, "
               "invented): 24 m span portal frames at 6 m centres, wind on the roof", WND_SRC)
wd.heading("Basic and peak velocity pressure")
wd.add("vbm", "Fundamental basic wind velocity from the map (invented site)", "v_b,map", 22.5,
       "m/s")
wd.add("Alt", "Site altitude", "A", 145, "m")
wd.add("calt", "Altitude factor", "c_alt", "=1+0.001*{Alt}", "-")
wd.add("cdir", "Direction factor (all directions)", "c_dir", 1.0, "-")
wd.add("cseas", "Season factor (permanent building)", "c_season", 1.0, "-")
wd.add("vb", "Basic wind velocity", "v_b", "={vbm}*{calt}*{cdir}*{cseas}", "m/s")
wd.add("vbmph", "Basic wind velocity, mph (US parent company's sheet)", "v_b,US",
       "={vb}/0.44704", "mph")
wd.add("vbmph2", "Basic wind velocity, mph (first draft)", "v_b,US2", "={vb}*0.44704", "mph",
       planted=("unit-scale", "m/s to mph multiplied by 0.44704: wrong way round"))
wd.add("rhoa", "Air density (EN 1991-1-4 recommended value)", "ρ", 1.226, "kg/m³")
wd.add("qb", "Basic velocity pressure", "q_b", "=0.5*{rhoa}*{vb}^2", "Pa")
wd.add("qbc", "Basic velocity pressure (UK NA short form, 0.613·v_b²)", "q_b,c",
       "=0.613*{vb}^2", "Pa")
wd.add("qbpsf", "Basic velocity pressure, psf", "q_b,US", "={qb}/47.88", "psf")
wd.add("ce", "Exposure factor c_e(z), z = 8.2 m, country, 12 km from the sea (invented read)",
       "c_e", 2.35, "-")
wd.add("qp", "Peak velocity pressure", "q_p", "={ce}*{qb}/1000", "kPa")
wd.add("qp2", "Peak velocity pressure (first draft)", "q_p2", "={ce}*{qb}", "kPa",
       planted=("unit-scale", "N/m² written as kN/m²: /1000 missing"))
wd.add("qppsf", "Peak velocity pressure, psf (US parent company)", "q_p,US", "={qp}*20.89",
       "psf")
wd.add("Kz", "ASCE 7 velocity pressure exposure coefficient K_z (invented read)", "K_z", 0.85,
       "-")
wd.add("Kzt", "ASCE 7 topographic factor", "K_zt", 1.0, "-")
wd.add("Kd", "ASCE 7 directionality factor", "K_d", 0.85, "-")
wd.add("V3s", "ASCE 7 basic wind speed, 3-s gust (parent company's figure, invented)", "V",
       115, "mph")
wd.add("qz", "ASCE 7 velocity pressure (US parent company's check)", "q_z",
       "=0.00256*{Kz}*{Kzt}*{Kd}*{V3s}^2", "psf")
wd.add("qzk", "ASCE 7 velocity pressure, kPa", "q_z,SI", "={qz}*0.04788", "kPa")
wd.add("qzk2", "ASCE 7 velocity pressure, kPa (first draft)", "q_z,SI2", "={qz}*47.88", "kPa",
       planted=("unit-scale", "psf to kPa by 47.88, the factor to Pa: 1000 too large"))
wd.add("ta", "Air temperature for the density check (invented)", "t_a", 10, "°C")
wd.add("pa", "Site barometer for the density check (invented)", "p_a", 100.3, "kPa")
wd.add("TK", "Air temperature, kelvin", "T_a", "={ta}+273.15", "K")
wd.add("rhoc", "Air density at the site (check on 1.226)", "ρ_c", "={pa}*1000/(287.05*{TK})",
       "kg/m³")
wd.add("rhoc2", "Air density at the site (first draft)", "ρ_c2", "={pa}*1000/(287.05*{ta})",
       "kg/m³", planted=("offset-scale", "a °C reading in the gas law: kelvins belong"))
wd.heading("Net pressures and the gable force")
wd.add("cpeH", "External pressure coefficient, roof zone H (invented read)", "c_pe,H", -0.45,
       "-")
wd.add("cpi", "Internal pressure coefficient, worst for uplift", "c_pi", 0.2, "-")
wd.add("wroof", "Net wind pressure on the roof, zone H (negative is uplift)", "w_r",
       "={qp}*({cpeH}-{cpi})", "kPa")
wd.add("cpeD", "External pressure coefficient, windward wall zone D (invented read)", "c_pe,D",
       0.74, "-")
wd.add("cpiN", "Internal pressure coefficient, worst for the windward wall", "c_pi,N", -0.3, "-")
wd.add("wwall", "Net wind pressure on the windward wall", "w_w", "={qp}*({cpeD}-{cpiN})", "kPa")
wd.add("Sf", "Frame spacing", "S_f", 6.0, "m")
wd.add("wraf", "Net wind line load on a rafter (negative is uplift)", "w_raf", "={wroof}*{Sf}",
       "kN/m")
wd.add("wcol", "Net wind line load on a windward column", "w_col", "={wwall}*{Sf}", "kN/m")
wd.add("B", "Building width across the wind (gable)", "b", 24, "m")
wd.add("h", "Height to the ridge", "h", 8.2, "m")
wd.add("cf", "Force coefficient (invented read)", "c_f", 1.3, "-")
wd.add("cscd", "Structural factor c_s·c_d", "c_s c_d", 1.0, "-")
wd.add("Fw", "Wind force on the building", "F_w", "={cscd}*{cf}*{qp}*{B}*{h}", "kN")
wd.add("Fkip", "Wind force on the building, kip (US parent company)", "F_w,US", "={Fw}/4.448",
       "kip")
WNDS = wd.finish()

PUR_SRC = (
    "Sources: ULS combinations 1.35·G + 1.5·Q and, for uplift, 1.0·G + 1.5·W (BS EN 1990:2002 "
    "with UK NA, Table NA.A1.2(B), from memory); snow s = μ₁·C_e·C_t·s_k (BS EN 1991-1-3, "
    "from memory; s_k invented); simply supported beam M = w·L²/8, δ = 5·w·L⁴/(384·E·I) "
    "(Steel Designers' Manual, 7th ed., from memory); E = 210 000 N/mm² (BS EN 1993-1-1, 3.2.6); "
    "self weight m·g, g_n = 9.81 m/s² (SI Brochure 9th ed. gives 9.80665); 1 cm⁴ = 10⁴ mm⁴ "
    "(SI Brochure 9th ed.); thermal strain α·ΔT, α = 12×10⁻⁶ /K for steel (BS EN 1993-1-1, "
    "3.2.6). Purlin section, capacities and readings invented (maker's tables).")
pu = ItemSheet("Purlins", "Brackley Moor distribution shed (invented): cold-formed roof purlins "
               "between frames", PUR_SRC)
pu.heading("Loads")
pu.add("s", "Purlin spacing up the slope", "s", 1.8, "m")
pu.add("L", "Purlin span (frame centres)", "L", 6.0, "m")
pu.add("gcl", "Roof cladding and lining (maker, invented)", "g_cl", 0.15, "kPa")
pu.add("mp", "Purlin mass per metre (maker, invented)", "m_p", 5.2, "kg/m")
pu.add("gp", "Purlin self weight", "g_p", "={mp}*9.81/1000", "kN/m")
pu.add("mpa", "Purlin steel per m² of roof", "m_pa", "={mp}/{s}", "kg/m²")
pu.add("gp2", "Purlin self weight (first draft)", "g_p2", "={mp}/1000", "kN/m",
       planted=("result-unit", "kg/m written as kN/m: g missing"))
pu.add("sk", "Characteristic ground snow load (invented site)", "s_k", 0.50, "kPa")
pu.add("mu1", "Snow load shape coefficient, roof pitch below 30°", "μ₁", 0.8, "-")
pu.add("sn", "Roof snow load", "s", "={mu1}*{sk}", "kPa")
pu.add("wup", "Design uplift on a purlin (1.5·W − 1.0·G)", "w_up",
       "=1.5*ABS({Wind.wroof})*{s}-1.0*({gcl}*{s}+{gp})", "kN/m")
pu.add("wd", "Design gravity load on a purlin (1.35·G + 1.5·S)", "w_d",
       "=1.35*({gcl}*{s}+{gp})+1.5*{sn}*{s}", "kN/m")
pu.add("wd2", "Design gravity load on a purlin (first draft)", "w_d2",
       "=1.35*({gcl}*{s}+{gp})+1.5*{sn}", "kN/m",
       planted=("sum-mismatch", "snow in kPa added to line loads: the spacing left out"))
pu.heading("Bending and deflection")
pu.add("Lmm", "Purlin span, mm", "L_mm", "={L}*1000", "mm")
pu.add("MEd", "Design moment, gravity", "M_Ed", "={wd}*{L}^2/8", "kN·m")
pu.add("MEd2", "Design moment, gravity (first draft)", "M_Ed2", "={wd}*{Lmm}^2/8", "kN·m",
       planted=("unit-scale", "span in mm squared against kN/m: 10⁶ too large"))
pu.add("MEu", "Design moment, uplift", "M_Ed,up", "={wup}*{L}^2/8", "kN·m")
pu.add("VEd", "Design shear at the cleat, gravity", "V_Ed", "={wd}*{L}/2", "kN")
pu.add("MEdUS", "Design moment, gravity, kip·ft (US parent company)", "M_Ed,US",
       "={MEd}/1.356", "kip·ft")
pu.add("Mc", "Moment resistance, Z200 purlin (maker's table, invented)", "M_c,Rd", 9.8, "kN·m")
pu.add("ut", "Utilisation in bending, gravity", "u", "={MEd}/{Mc}*100", "%")
pu.add("Mcu", "Moment resistance under uplift, restrained by sheeting (maker, invented)",
       "M_c,up", 6.9, "kN·m")
pu.add("utu", "Utilisation in bending, uplift", "u_up", "={MEu}/{Mcu}*100", "%")
pu.add("ut2", "Utilisation in bending, gravity (first draft)", "u_2", "={MEd}/{Mc}", "%",
       planted=("unit-scale", "a ratio written as %: ×100 missing"))
pu.add("E", "Modulus of elasticity of steel", "E", 210000, "N/mm²")
pu.add("I", "Second moment of area, Z200 purlin (maker's table, invented)", "I", 450, "cm⁴")
pu.add("ws", "Serviceability load (G + S)", "w_s", "={gcl}*{s}+{gp}+{sn}*{s}", "kN/m")
pu.add("dl", "Midspan deflection, serviceability", "δ",
       "=5*{ws}*{Lmm}^4/(384*{E}*{I}*10000)", "mm")
pu.add("dl2", "Midspan deflection, serviceability (first draft)", "δ_2",
       "=5*{ws}*{Lmm}^4/(384*{E}*{I})", "mm",
       planted=("unit-scale", "I in cm⁴ used as mm⁴: ×10⁴ missing"))
pu.add("dlim", "Deflection limit, span/200", "δ_lim", "={Lmm}/200", "mm")
pu.add("sd", "Span over deflection", "L/δ", "={Lmm}/{dl}", "-")
pu.heading("Thermal movement")
pu.add("alpha", "Coefficient of thermal expansion of steel", "α", 0.000012, "1/K")
pu.add("Lb", "Building length between movement joints", "L_b", 60, "m")
pu.add("tmax", "Steel temperature, summer (invented)", "t_max", 35, "°C")
pu.add("tins", "Steel temperature at erection (invented)", "t_e", 10, "°C")
pu.add("dLb", "Thermal movement of the eaves beam", "ΔL", "={alpha}*{Lb}*1000*({tmax}-{tins})",
       "mm")
pu.add("dLbin", "Thermal movement of the eaves beam, in", "ΔL_US", "={dLb}/25.4", "in")
PURS = pu.finish(others=[wd])

WNDB = {
    "trade": "structural steel: portal frame wind loads (EN 1991-1-4 with a US check) and purlins",
    "sheets": [("Wind", WNDS), ("Purlins", PURS)],
    "planted": {**wd.planted, **pu.planted},
}

# --------------------------------------------------------------------------------------------
# Book 4: biogas CHP engine, heat and power balance
# --------------------------------------------------------------------------------------------
CHP_SRC = (
    "Sources: methane net calorific value 35.8 MJ/Nm³ (0 °C, 101.325 kPa) and density 0.717 "
    "kg/Nm³ (GPSA Engineering Data Book, 12th ed., sect. 23, from memory); 1 kWh = 3.6 MJ, "
    "1 kWh = 3412 Btu (NIST SP 811 (2008) App. B.8); Nm³ from a meter's actual m³ by "
    "V_n = V·(p_b + p_g)/101.325·273.15/(t + 273.15) (DIN 1343, common practice); "
    "1 mbar = 0.1 kPa (NIST SP 811); heat Q = ṁ·c_p·ΔT, water c_p 4.19 kJ/(kg·K) and density "
    "980 kg/m³ at 80 °C (common practice); exhaust c_p 1.10 kJ/(kg·K) and molar mass 28.4 "
    "g/mol (lean-burn gas engine, from memory); ρ = p·M/(R·T), R = 8.314 J/(mol·K) (CODATA "
    "2018); ppm by volume to mg/Nm³ by M/22.414 L/mol (molar volume at 0 °C, 101.325 kPa, "
    "CODATA 2018); digester losses U·A·ΔT (common practice). Plant, engine maker's data, "
    "tariff and readings invented.")
ch = ItemSheet("CHP", "Hollins Moor anaerobic digestion plant (invented; operator Fellgate "
               "Energy, invented): 500 kWe gas engine CHP, heat and power balance", CHP_SRC)
ch.heading("Gas metering")
ch.add("Vm", "Biogas flow at the meter, actual (invented reading)", "V̇_m", 248, "m³/h")
ch.add("pbk", "Site barometer (invented)", "p_b", 99.8, "kPa")
ch.add("pg", "Gas pressure at the meter (booster outlet)", "p_g", 25, "mbar(g)")
ch.add("tg", "Gas temperature at the meter", "t_g", 30, "°C")
ch.add("pga", "Gas pressure at the meter, absolute", "p_a", "={pbk}+{pg}/10", "kPa a")
ch.add("Vn", "Biogas flow, normal", "V̇_n", "={Vm}*{pga}/101.325*273.15/({tg}+273.15)",
       "Nm³/h")
ch.add("Vn2", "Biogas flow, normal (first draft)", "V̇_n2",
       "={Vm}*({pbk}+{pg})/101.325*273.15/({tg}+273.15)", "Nm³/h",
       planted=("unit-scale", "mbar added to kPa: /10 missing"))
ch.add("x", "Methane content (analyser)", "x_CH4", 55, "%")
ch.add("rCH4", "Density of methane, normal", "ρ_CH4", 0.717, "kg/Nm³")
ch.add("mCH4", "Methane mass flow to the engine", "ṁ_CH4", "={Vn}*{x}/100*{rCH4}", "kg/h")
ch.add("Vscfm", "Biogas flow, scfm at 60 °F and 14.696 psia (US engine maker)", "V̇_US",
       "={Vn}*0.6221", "scfm")
ch.add("H2S", "Hydrogen sulphide in the raw gas (analyser)", "y_H2S", 350, "ppm")
ch.add("cH2S", "Hydrogen sulphide, mg/Nm³ (engine maker's limit is in mg/Nm³)", "c_H2S",
       "={H2S}*34.08/22.414", "mg/Nm³")
ch.heading("Fuel and power")
ch.add("LHVm", "Net calorific value of methane", "H_i,CH4", 35.8, "MJ/Nm³")
ch.add("LHV", "Net calorific value of the biogas", "H_i", "={LHVm}*{x}/100", "MJ/Nm³")
ch.add("LHVk", "Net calorific value of the biogas, kWh/Nm³", "H_i,k", "={LHV}/3.6", "kWh/Nm³")
ch.add("Pf", "Fuel input", "P_f", "={Vn}*{LHV}/3.6", "kW")
ch.add("Pf2", "Fuel input (first draft)", "P_f2", "={Vn}*{LHV}*3.6", "kW",
       planted=("unit-scale", "MJ/h to kW multiplied by 3.6: wrong way round"))
ch.add("LHVkg", "Net calorific value of methane by mass", "H_i,m", 50.0, "MJ/kg")
ch.add("Pfm", "Fuel input, by methane mass (check)", "P_f,m", "={mCH4}*{LHVkg}/3.6", "kW")
ch.add("etae", "Electrical efficiency at full load (maker, invented)", "η_e", 40.5, "%")
ch.add("Pel", "Electrical output at the generator terminals", "P_el", "={Pf}*{etae}/100", "kW")
ch.add("Pel2", "Electrical output (first draft)", "P_el2", "={Pf}*{etae}", "kW",
       planted=("unit-scale", "a % used as a fraction: 100 too large"))
ch.add("Ppar", "Parasitic load: pumps, mixers, fans (invented)", "P_par", 38, "kW")
ch.add("Pbl", "Gas booster and chiller (invented)", "P_bl", 5500, "W")
ch.add("Pnet", "Net electrical export", "P_net", "={Pel}-{Ppar}-{Pbl}/1000", "kW")
ch.add("Pnet2", "Net electrical export (first draft)", "P_net2", "={Pel}-{Ppar}-{Pbl}", "kW",
       planted=("unit-scale", "W taken from kW"))
ch.add("HR", "Heat rate, Btu/kWh (US engine maker's data)", "HR", "=3412/({etae}/100)",
       "Btu/kWh")
ch.add("HR2", "Heat rate, Btu/kWh (first draft)", "HR2", "=3600/({etae}/100)", "Btu/kWh",
       planted=("unit-scale", "3600 kJ/kWh used for Btu: the wrong factor, 5.5 % high"))
ch.add("pbo", "Charge air pressure after the turbocharger", "p_2g", 1.9, "barg")
ch.add("rc", "Turbocharger pressure ratio", "π_c", "=({pbo}+{pbk}/100)/({pbk}/100)", "-")
ch.add("rc2", "Turbocharger pressure ratio (first draft)", "π_c2", "={pbo}/({pbk}/100)", "-",
       planted=("offset-scale", "a gauge pressure over an absolute one in a ratio"))
ch.heading("Heat recovery")
ch.add("Vjw", "Jacket water flow (maker, invented)", "V̇_jw", 13.5, "m³/h")
ch.add("rw", "Density of water at 80 °C", "ρ_w", 980, "kg/m³")
ch.add("cpw", "Specific heat of water", "c_p,w", 4.19, "kJ/(kg·K)")
ch.add("tjr", "Jacket water return temperature", "t_r", 70, "°C")
ch.add("tjf", "Jacket water flow temperature", "t_f", 90, "°C")
ch.add("Qjw", "Heat from the jacket water", "Q_jw", "={Vjw}*{rw}/3600*{cpw}*({tjf}-{tjr})",
       "kW")
ch.add("Qjw2", "Heat from the jacket water (first draft)", "Q_jw2",
       "={Vjw}*{rw}*{cpw}*({tjf}-{tjr})", "kW",
       planted=("unit-scale", "kg/h × kJ/kg written as kW: /3600 missing"))
ch.add("Vjwg", "Jacket water flow, US gpm (US pump maker)", "V̇_jw,US", "={Vjw}*4.403", "gpm")
ch.add("mex", "Exhaust mass flow (maker, invented)", "ṁ_ex", 2650, "kg/h")
ch.add("cpe", "Specific heat of the exhaust", "c_p,ex", 1.10, "kJ/(kg·K)")
ch.add("te1", "Exhaust temperature at the engine outlet", "t_1", 480, "°C")
ch.add("te2", "Exhaust temperature after the heat exchanger", "t_2", 180, "°C")
ch.add("Qex", "Heat from the exhaust", "Q_ex", "={mex}*{cpe}*({te1}-{te2})/3600", "kW")
ch.add("Qth", "Heat recovered", "Q_th", "={Qjw}+{Qex}", "kW")
ch.add("QthM", "Heat recovered, MBH (US heat exchanger maker)", "Q_th,US", "={Qth}*3.412",
       "MBH")
ch.add("etat", "Thermal efficiency", "η_th", "={Qth}/{Pf}*100", "%")
ch.add("etaT", "Overall efficiency", "η_tot", "=({Pel}+{Qth})/{Pf}*100", "%")
ch.add("te1F", "Exhaust temperature, °F (US catalyst maker)", "t_1,F", "={te1}*1.8+32", "°F")
ch.add("dteF", "Exhaust temperature drop across the heat exchanger, °F", "Δt_ex,F",
       "=({te1}-{te2})*1.8", "Δ°F")
ch.add("Mex", "Molar mass of the exhaust", "M_ex", 28.4, "g/mol")
ch.add("T2", "Exhaust temperature after the heat exchanger, kelvin", "T_2", "={te2}+273.15",
       "K")
ch.add("T22", "Exhaust temperature after the heat exchanger, kelvin (first draft)", "T_22",
       "={te2}", "K", planted=("offset-scale", "a °C reading set equal to kelvins"))
ch.add("rex", "Exhaust density at the stack", "ρ_ex", "={pbk}*{Mex}/(8.314*{T2})", "kg/m³")
ch.add("Vex", "Exhaust volume flow at the stack", "V̇_ex", "={mex}/{rex}", "m³/h")
ch.add("Ds", "Stack bore (invented)", "D_s", 0.30, "m")
ch.add("vst", "Exhaust velocity in the stack", "v_s", "={Vex}/3600/(PI()*{Ds}^2/4)", "m/s")
ch.heading("Digester heat demand")
ch.add("mf", "Digester feed (slurry and silage, invented)", "ṁ_f", 48, "t/d")
ch.add("cps", "Specific heat of the feed (invented, near water's)", "c_p,f", 4.0, "kJ/(kg·K)")
ch.add("tfd", "Feed temperature, winter", "t_feed", 8, "°C")
ch.add("tdg", "Digester operating temperature (mesophilic)", "t_d", 40, "°C")
ch.add("Qfd", "Heat to warm the feed", "Q_feed", "={mf}*1000/86400*{cps}*({tdg}-{tfd})", "kW")
ch.add("Qfd2", "Heat to warm the feed (first draft)", "Q_feed2", "={mf}/86400*{cps}*({tdg}-{tfd})",
       "kW", planted=("unit-scale", "tonnes taken as kg: ×1000 missing"))
ch.add("U", "Digester wall and roof U-value (invented)", "U", 0.45, "W/(m²·K)")
ch.add("Ad", "Digester wall and roof area", "A_d", 1350, "m²")
ch.add("tamb", "Outside air temperature, winter design", "t_amb", -3, "°C")
ch.add("Qls", "Digester heat loss", "Q_loss", "={U}*{Ad}*({tdg}-{tamb})/1000", "kW")
ch.add("Qsur", "Surplus heat for the grain dryer", "Q_s", "={Qth}-{Qfd}-{Qls}", "kW")
ch.heading("Year")
ch.add("hrs", "Running hours per year (invented availability)", "t_a", 8200, "h/yr")
ch.add("Eel", "Electricity exported per year", "E_el", "={Pnet}*{hrs}/1000", "MWh/yr")
ch.add("Eth", "Surplus heat to the grain dryer per year", "E_th", "={Qsur}*{hrs}/1000",
       "MWh/yr")
ch.add("Vyr", "Biogas burnt per year", "V_a", "={Vn}*{hrs}", "Nm³/yr")
ch.add("tar", "Export tariff (invented)", "c_e", 145, "$/MWh")
ch.add("Rev", "Export revenue per year", "R", "={Eel}*{tar}", "$/yr")
CHPS = ch.finish()

CHPB = {
    "trade": "biogas CHP: gas metering, engine heat and power balance, digester heat",
    "sheets": [("CHP", CHPS)],
    "planted": dict(ch.planted),
}

BOOKS = {"quarry-dewatering-greyhope": QRYB, "medgas-st-ebbas": HSPB,
         "portal-wind-brackley-moor": WNDB, "chp-biogas-hollins-moor": CHPB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()

# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.
