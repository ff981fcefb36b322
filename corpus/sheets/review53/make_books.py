#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review53), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; pattern after
corpus/sheets/review51/make_books.py.

Trades: a hospital's medical air compressor plant; a district heating network branch; a car
park's sprinkler system; a crude oil tank farm's heating and pumping. All scenarios, sites,
firms, readings and catalogue data are invented (demonstration only); the formulas and
published factors are the trade's own, with their sources named in a text cell at the top of
each sheet ("from memory" where recalled and not checked, "common practice" for a fact of the
trade with no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and
its messages that mislead, are recorded in review_notes.py after running the frozen binary.

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
# Book 1: hospital medical air compressor plant (scfm, Nm³/h, psig, psia, psi, bar(g), bar a,
# bar, °C, °F, hPa, ppm, m³, US gal, hp, kW, kW/100 scfm, m³/s, m³/h, kWh/a)
# --------------------------------------------------------------------------------------------
AIR_SRC = (
    "Sources: medical air plant sized to meet the peak demand with the largest compressor out "
    "of service, nominal distribution 50 to 55 psig, NFPA 99 (2021) ch. 5 (from memory); peak "
    "demand = outlets × flow per outlet × simultaneous use (designer's figures in the manner of "
    "NFPA 99 annex tables, invented here); water content of medical air not above 67 vpm, about "
    "−46 °C atmospheric dew point, HTM 02-01 (2006) Part A (from memory); Magnus's fit over "
    "water e = 6.112 hPa·exp(17.625·t/(243.04 + t)), Alduchov & Eskridge (1996) (from memory), "
    "and its inverse for the dew point; water content by volume = e/p_abs; partial pressure "
    "scales with total pressure on expansion (Dalton, common practice); receiver draw-down "
    "V = Q_n·t·(p_n/Δp)·(T/T_n), the compressed air trade's isothermal receiver formula "
    "(Atlas Copco Compressed Air Manual, 8th ed., from memory); scf at 60 °F and 14.696 psia, "
    "Nm³ at 0 °C and 101.325 kPa (DIN 1343), so 1 scfm = 1.699 m³/h × 273.15/288.71 = 1.607 "
    "Nm³/h (NIST SP 811 (2008) App. B.8 for the cubic foot); plant room air rise Q = P/(ρ·c_p"
    "·ΔT) with ρ·c_p = 1.2 kJ/(m³·K) (ASHRAE Fundamentals (2017) ch. 1, from memory); "
    "NIST SP 811 (2008) App. B.8: 1 bar = 14.50 psi, 1 hp = 0.7457 kW, 1 m³ = 264.2 US gal, "
    "1 ft³ = 7.481 US gal; °F = 1.8·°C + 32, °R = °F + 459.67. Hospital, plant and readings "
    "invented.")
ai = ItemSheet("Plant", "St Brannoc's General Hospital (invented): medical air compressor plant, "
               "triplex scroll compressors, desiccant dryers and receiver", AIR_SRC)
ai.heading("Demand and compressors")
ai.add("Qpk", "Peak demand of the pipeline (Demand sheet)", "Q_pk", "=Demand!E10", "scfm")
ai.add("Qpkn", "Peak demand, normal volume", "Q_pk,n", "={Qpk}*1.607", "Nm³/h")
ai.add("n", "Compressors in the plant", "n", 3, "-")
ai.add("Qc", "Compressor rated free air delivery at 100 psig (maker, invented)", "Q_c", 55,
       "scfm")
ai.add("Qcap", "Plant capacity with the largest compressor on standby", "Q_cap",
       "=({n}-1)*{Qc}", "scfm")
ai.add("marg", "Capacity margin over the peak demand", "m", "=({Qcap}/{Qpk}-1)*100", "%")
ai.add("marg2", "Capacity margin over the peak demand (handover summary)", "m_2",
       "={Qcap}/{Qpk}-1", "%", planted=("unit-scale", "a fraction written as %: 100 too small"))
ai.heading("Pressures")
ai.add("pat", "Atmosphere, the standard reference for scf (site near sea level)", "p_atm", 14.7,
       "psia")
ai.add("patb", "Atmosphere, metric (site near sea level)", "p_atm,b", 1.013, "bar a")
ai.add("pU", "Lead compressor cut-out pressure", "p_U", 100, "psig")
ai.add("pL", "Lead compressor cut-in pressure", "p_L", 80, "psig")
ai.add("pUb", "Cut-out pressure, bar(g)", "p_U,b", "={pU}/14.5", "bar(g)")
ai.add("pUa", "Cut-out pressure, absolute", "p_U,a", "={pUb}+{patb}", "bar a")
ai.add("pUa2", "Cut-out pressure, absolute (dryer data sheet)", "p_U,a2", "={pU}/14.5", "bar a",
       planted=("offset-scale", "a gauge reading converted and written as absolute: the "
                                "atmosphere missing"))
ai.add("pLb", "Cut-in pressure, bar(g)", "p_L,b", "={pL}/14.5", "bar(g)")
ai.add("pLa", "Cut-in pressure, absolute", "p_L,a", "={pLb}+{patb}", "bar a")
ai.add("pr", "Compression ratio at cut-out", "r", "=({pU}+{pat})/{pat}", "-")
ai.add("pr2", "Compression ratio at cut-out (maker's selection form)", "r_2", "={pU}/{pat}", "-",
       planted=("offset-scale", "a gauge reading in a ratio of pressures: absolute belongs"))
ai.add("dp", "Receiver pressure band, cut-out less cut-in", "Δp", "={pU}-{pL}", "psi")
ai.add("dpb", "Receiver pressure band, bar", "Δp_b", "={dp}/14.5", "bar")
ai.heading("Receiver")
ai.add("td", "Draw-down time at the peak demand, cut-out to cut-in (design minimum)", "t_d", 1,
       "min")
ai.add("pn", "Normal reference pressure (DIN 1343)", "p_n", 1.01325, "bar a")
ai.add("tr", "Air temperature in the receiver", "t_r", 35, "°C")
ai.add("Vr", "Receiver volume needed", "V_r",
       "={Qpkn}/60*{td}*{pn}/{dpb}*({tr}+273.15)/273.15", "m³")
ai.add("Vr2", "Receiver volume needed (first draft)", "V_r2",
       "={Qpkn}/60*{td}*{pn}/{dpb}*{tr}/273.15", "m³",
       planted=("offset-scale", "a °C reading in a ratio of temperatures: absolute belongs"))
ai.add("VrG", "Receiver volume needed, US gal", "V_r,gal", "={Vr}*264.2", "US gal")
ai.add("VrG2", "Receiver volume needed, US gal (vessel enquiry)", "V_r,gal2", "={Vr}/264.2",
       "US gal", planted=("unit-scale", "m³ to US gal divided by 264.2: wrong way round"))
ai.add("trF", "Air temperature in the receiver, °F", "t_r,F", "={tr}*1.8+32", "°F")
ai.add("VrGc", "Receiver volume needed, US gal (US check in scfm and psi)", "V_r,chk",
       "={Qpk}*{td}*{pat}/{dp}*({trF}+459.67)/519.67*7.481", "US gal")
ai.heading("Dryer and dew point")
ai.add("PDP", "Pressure dew point at the dryer outlet (desiccant dryer, maker)", "t_PDP", -40,
       "°C")
ai.add("e0", "Magnus coefficient (vapour pressure at 0 °C)", "e_0", 6.112, "hPa")
ai.add("es", "Water vapour pressure at the pressure dew point", "e_s",
       "={e0}*EXP(17.625*{PDP}/(243.04+{PDP}))", "hPa")
ai.add("x", "Water content at the dryer outlet, by volume (at cut-in pressure)", "x_w",
       "={es}/({pLa}*1000)*1000000", "ppm")
ai.add("x2", "Water content at the dryer outlet, by volume (first draft)", "x_w2",
       "={es}/{pLa}*1000000", "ppm",
       planted=("unit-scale", "hPa over bar without the 1000: 1000 too large"))
ai.add("eat", "Water vapour partial pressure, expanded to atmosphere", "e_atm",
       "={es}*{patb}/{pLa}", "hPa")
ai.add("ADP", "Atmospheric dew point", "t_ADP",
       "=243.04*LN({eat}/{e0})/(17.625-LN({eat}/{e0}))", "°C")
ai.add("ADPF", "Atmospheric dew point, °F", "t_ADP,F", "={ADP}*1.8+32", "°F")
ai.heading("Power and plant room ventilation")
ai.add("Pm", "Compressor motor rating (nameplate, invented)", "P_m", 20, "hp")
ai.add("PkW", "Compressor motor rating, kW", "P_kW", "={Pm}*0.7457", "kW")
ai.add("PkW2", "Compressor motor rating, kW (electrical schedule)", "P_kW2", "={Pm}*745.7", "kW",
       planted=("unit-scale", "hp times 745.7 gives W, written as kW: the /1000 missing"))
ai.add("Prun", "Power of the compressors running at the peak", "P_run", "={PkW}*({n}-1)", "kW")
ai.add("spec", "Specific power at the plant capacity", "SP", "={Prun}/{Qcap}*100",
       "kW/100 scfm")
ai.add("dTv", "Plant room air temperature rise allowed", "ΔT_v", 8, "K")
ai.add("Qv", "Ventilation air to carry the compressors' heat", "Q_v", "={Prun}/(1.2*{dTv})",
       "m³/s")
ai.add("Qvh", "Ventilation air, m³/h", "Q_v,h", "={Qv}*3600", "m³/h")
ai.add("Qvh2", "Ventilation air, m³/h (fan schedule)", "Q_v,h2", "={Qv}*60", "m³/h",
       planted=("unit-scale", "m³/s to m³/h times 60: the minute where the hour belongs, 60 "
                              "too small"))
ai.add("LF", "Mean load of the running compressors over the year", "LF", 45, "%")
ai.add("hrs", "Hours in the year", "t_a", 8760, "h/a")
ai.add("E", "Electricity per year", "E", "={Prun}*{LF}/100*{hrs}", "kWh/a")
AIRS = ai.finish()

DEMAND = {
    "A1": "Medical air peak demand by zone (invented outlet counts; flow per outlet and "
          "simultaneous use are the designer's, in the manner of NFPA 99 annex tables, from "
          "memory)",
    "A2": "Sources: peak = outlets × flow per outlet × simultaneous use (common practice); "
          "1 scfm = 1.607 Nm³/h (scf at 60 °F, Nm³ at 0 °C, both 101.325 kPa; NIST SP 811 "
          "(2008) App. B.8 for the cubic foot).",
    "A3": CAUTION,
    "A5": "Zone", "B5": "Outlets [-]", "C5": "Flow per outlet [scfm]",
    "D5": "Simultaneous use [%]", "E5": "Peak demand [scfm]", "F5": "Peak demand [Nm³/h]",
    "A10": "Total", "B10": "=SUM(B6:B9)", "E10": "=SUM(E6:E9)",
}
for r, (zone, outlets, q, use) in enumerate([("Intensive care (30 beds)", 30, 2.0, 50),
                                             ("Operating theatres (6)", 12, 3.0, 100),
                                             ("Emergency department", 20, 1.0, 50),
                                             ("Wards and recovery", 140, 0.5, 20)], start=6):
    DEMAND[f"A{r}"], DEMAND[f"B{r}"], DEMAND[f"C{r}"], DEMAND[f"D{r}"] = zone, outlets, q, use
    DEMAND[f"E{r}"] = f"=B{r}*C{r}*D{r}/100"
    DEMAND[f"F{r}"] = f"=E{r}*1.607"
DEMAND["F8"] = "=E8*1.699"
DEMAND_PLANTED = {"Demand!F8": ("unit-scale", "scfm to m³/h by the cubic foot alone (1.699, "
                                              "60 °F) written as Nm³/h (0 °C): 5.7 % high")}

AIRB = {
    "trade": "hospital medical air: compressor plant, receiver, dryer dew point and power",
    "sheets": [("Plant", AIRS), ("Demand", DEMAND)],
    "planted": {**ai.planted, **DEMAND_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 2: district heating network branch (kW, MBH, Btu/h, °C, °F, K, Δ°F, kg/m³, kJ/(kg·K),
# Pa·s, L/s, gpm, mm, in, m/s, ft/s, Pa/m, kPa/m, ft/100 ft, m, %, kPa, psi, W/m)
# --------------------------------------------------------------------------------------------
DH_SRC = (
    "Sources: heat carried Q = ρ·V̇·c_p·ΔT (common practice); water at 60 °C, ρ = 983.2 kg/m³, "
    "c_p = 4.185 kJ/(kg·K), μ = 0.000466 Pa·s (Incropera, Fundamentals of Heat and Mass "
    "Transfer, 7th ed., Table A.6, from memory); Darcy–Weisbach R = f·ρ·v²/(2·D) and the "
    "Swamee–Jain friction factor f = 0.25/[log10(ε/(3.7·D) + 5.74/Re^0.9)]² (Swamee & Jain "
    "(1976), from memory), ε = 0.05 mm for steel service pipe (common practice); design "
    "pressure gradient 100 to 200 Pa/m for branches (common practice); head loss in ft per 100 ft "
    "= R/(ρ·g) × 100 with g_n = 9.81 m/s² (SI Brochure 9th ed.); fittings as a percentage of "
    "the route (common practice); steel service pipe bores after EN 253 / EN 10217-2 (from "
    "memory); heat loss per metre of twin pipe from the maker's catalogue (invented); NIST SP 811 "
    "(2008) App. B.8: 1 kW = 3.412 MBH = 3412 Btu/h, 1 L/s = 15.85 US gpm, 1 in = 25.4 mm, "
    "1 ft = 0.3048 m (3.281 ft/m), 1 psi = 6.895 kPa; °F = 1.8·°C + 32, K = °C + 273.15. "
    "Network, estate and readings invented.")
dh = ItemSheet("Branch", "Norrvik Energi (invented): district heating branch B7 to the Sjöängen "
               "housing estate, design winter day", DH_SRC)
dh.heading("Load")
dh.add("Qsum", "Sum of the blocks' peak demands (Loads sheet)", "ΣQ", "=Loads!D10", "kW")
dh.add("div", "Simultaneity factor for the estate (designer's figure)", "f_s", 55, "%")
dh.add("Q", "Branch design load", "Q", "={Qsum}*{div}/100", "kW")
dh.add("QMBH", "Branch design load, MBH (US consultant's summary)", "Q_MBH", "={Q}*3.412",
       "MBH")
dh.add("QMBH2", "Branch design load, MBH (first draft)", "Q_MBH2", "={Q}/3.412", "MBH",
       planted=("unit-scale", "kW to MBH divided by 3.412: wrong way round"))
dh.heading("Temperatures")
dh.add("ts", "Flow temperature at the branch tee (design winter day)", "t_s", 80, "°C")
dh.add("tr", "Return temperature (design)", "t_r", 45, "°C")
dh.add("dT", "Flow less return", "ΔT", "={ts}-{tr}", "K")
dh.add("tsF", "Flow temperature, °F", "t_s,F", "={ts}*1.8+32", "°F")
dh.add("trF", "Return temperature, °F", "t_r,F", "={tr}*1.8+32", "°F")
dh.add("trF2", "Return temperature, °F (first draft)", "t_r,F2", "={tr}*1.8", "°F",
       planted=("offset-scale", "°C to °F without the +32"))
dh.add("dTF", "Flow less return, Δ°F", "ΔT_F", "={dT}*1.8", "Δ°F")
dh.add("tm", "Mean water temperature", "t_m", "=({ts}+{tr})/2", "°C")
dh.add("TmK", "Mean water temperature, absolute (property tables in K)", "T_m", "={tm}+273.15",
       "K")
dh.add("TmK2", "Mean water temperature, absolute (first draft)", "T_m2", "={tm}", "K",
       planted=("offset-scale", "a °C reading set equal to kelvins"))
dh.heading("Flow")
dh.add("rho", "Water density at 60 °C", "ρ", 983.2, "kg/m³")
dh.add("cp", "Water specific heat at 60 °C", "c_p", 4.185, "kJ/(kg·K)")
dh.add("mu", "Water viscosity at 60 °C", "μ", 0.000466, "Pa·s")
dh.add("q", "Branch flow", "V̇", "={Q}/({rho}*{cp}*{dT})*1000", "L/s")
dh.add("q2", "Branch flow (first draft)", "V̇_2", "={Q}/({rho}*{cp}*{dT})", "L/s",
       planted=("unit-scale", "kW/(kg/m³·kJ/(kg·K)·K) gives m³/s, written as L/s: the ×1000 "
                              "missing"))
dh.add("qgpm", "Branch flow, US gpm (substation maker)", "V̇_US", "={q}*15.85", "gpm")
dh.heading("Pipe and pressure gradient")
dh.add("DN", "Pipe size chosen (DN)", "DN", 80, "-")
dh.add("di", "Inside diameter (Pipe sheet)", "d_i", "=VLOOKUP({DN},Pipe!A6:F9,4,FALSE)", "mm")
dh.add("diin", "Inside diameter, in", "d_i,in", "={di}/25.4", "in")
dh.add("v", "Velocity", "v", "={q}/1000/(PI()*({di}/1000)^2/4)", "m/s")
dh.add("v2", "Velocity (first draft)", "v_2", "={q}/1000/(PI()*{di}^2/4)", "m/s",
       planted=("unit-scale", "the bore in mm squared against a flow in m³/s: 10⁶ too small"))
dh.add("vft", "Velocity, ft/s", "v_ft", "={v}*3.281", "ft/s")
dh.add("Re", "Reynolds number", "Re", "={rho}*{v}*{di}/1000/{mu}", "-")
dh.add("eps", "Pipe roughness", "ε", 0.05, "mm")
dh.add("f", "Darcy friction factor (Swamee–Jain)", "f",
       "=0.25/LOG10({eps}/(3.7*{di})+5.74/{Re}^0.9)^2", "-")
dh.add("R", "Pressure gradient (friction loss per metre)", "R", "={f}*{rho}*{v}^2/(2*{di}/1000)",
       "Pa/m")
dh.add("Rk", "Pressure gradient, kPa/m", "R_k", "={R}/1000", "kPa/m")
dh.add("hft", "Friction loss per 100 ft, ft of water flowing (US check)", "h_100",
       "={Rk}*1000/({rho}*9.81)*100", "ft/100 ft")
dh.add("hft2", "Friction loss per 100 ft (first draft)", "h_100,2", "={Rk}*1000/{rho}*100",
       "ft/100 ft", planted=("result-unit", "g missing: a pressure gradient over a density is "
                                            "not a head gradient"))
dh.heading("Branch pressure loss")
dh.add("L", "Branch route length (flow and return pipes each)", "L", 420, "m")
dh.add("allow", "Fittings and valves, allowance on the route", "a_f", 30, "%")
dh.add("dp", "Branch pressure loss, flow and return with fittings", "Δp",
       "={Rk}*2*{L}*(1+{allow}/100)", "kPa")
dh.add("dp2", "Branch pressure loss (first draft)", "Δp_2", "={R}*2*{L}*(1+{allow}/100)", "kPa",
       planted=("unit-scale", "a gradient in Pa/m times metres written as kPa: 1000 too large"))
dh.add("dppsi", "Branch pressure loss, psi", "Δp_psi", "={dp}/6.895", "psi")
dh.add("dpav", "Differential pressure available at the branch tee (network model)", "Δp_av",
       250, "kPa")
dh.add("marg", "Differential pressure left for the last substation", "Δp_m", "={dpav}-{dp}",
       "kPa")
dh.heading("Heat loss")
dh.add("ql", "Heat loss per metre of twin pipe (Pipe sheet)", "q_l",
       "=VLOOKUP({DN},Pipe!A6:F9,6,FALSE)", "W/m")
dh.add("Ql", "Branch heat loss", "Q_l", "={ql}*{L}/1000", "kW")
dh.add("Qlsh", "Branch heat loss, share of the design load", "s_l", "={Ql}/{Q}*100", "%")
dh.add("Qlsh2", "Branch heat loss, share of the design load (first draft)", "s_l2", "={Ql}/{Q}",
       "%", planted=("unit-scale", "a fraction written as %: 100 too small"))
dh.add("QlBtu", "Branch heat loss, Btu/h", "Q_l,Btu", "={Ql}*3412", "Btu/h")
DHS = dh.finish()

LOADS = {
    "A1": "Sjöängen estate: peak heat demand by block (invented dwelling counts; peak per "
          "dwelling for space heating and hot water with storage, designer's figure)",
    "A2": "Sources: block peak = dwellings × peak per dwelling (common practice).",
    "A3": CAUTION,
    "A5": "Block", "B5": "Dwellings [-]", "C5": "Peak per dwelling [kW]",
    "D5": "Peak demand [kW]",
    "A10": "Total", "B10": "=SUM(B6:B9)", "D10": "=SUM(D6:D9)",
}
for r, (blk, n, q) in enumerate([("Block A (1968, renovated)", 48, 10.0),
                                 ("Block B (1968, renovated)", 36, 10.0),
                                 ("Block C (new build)", 60, 8.0),
                                 ("Block D (terraced houses)", 24, 12.0)], start=6):
    LOADS[f"A{r}"], LOADS[f"B{r}"], LOADS[f"C{r}"] = blk, n, q
    LOADS[f"D{r}"] = f"=B{r}*C{r}"

PIPE = {
    "A1": "Pre-insulated twin pipe, series 2 (bores after EN 253 / EN 10217-2, from memory; heat "
          "loss per metre of trench at 80/45 °C and 8 °C ground, maker's catalogue, invented)",
    "A2": "Sources: 1 in = 25.4 mm (NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "DN [-]", "B5": "Outside diameter [mm]", "C5": "Wall [mm]", "D5": "Inside diameter [mm]",
    "E5": "Inside diameter [in]", "F5": "Heat loss [W/m]",
}
for r, (dn, od, w, di, ql) in enumerate([(65, 76.1, 2.9, 70.3, 21), (80, 88.9, 3.2, 82.5, 23),
                                         (100, 114.3, 3.6, 107.1, 26),
                                         (125, 139.7, 3.6, 132.5, 29)], start=6):
    PIPE[f"A{r}"], PIPE[f"B{r}"], PIPE[f"C{r}"], PIPE[f"D{r}"], PIPE[f"F{r}"] = dn, od, w, di, ql
    PIPE[f"E{r}"] = f"=D{r}/25.4"
PIPE["E8"] = "=D8*25.4"
PIPE_PLANTED = {"Pipe!E8": ("unit-scale", "mm to in multiplied by 25.4: wrong way round")}

DHB = {
    "trade": "district heating: branch load, flow, pipe size, pressure loss and heat loss",
    "sheets": [("Branch", DHS), ("Loads", LOADS), ("Pipe", PIPE)],
    "planted": {**dh.planted, **PIPE_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 3: car park sprinkler system (mm/min, gpm/ft², m², ft², L/min/bar^0.5, gpm/psi^0.5,
# L/min, gpm, bar(g), bar, psig, psia, m, %, kW, hp, min, m³, US gal, psi/ft)
# --------------------------------------------------------------------------------------------
SPR_SRC = (
    "Sources: car parks Ordinary Hazard group 2, design density 5 mm/min over 144 m², 60 min "
    "supply, not more than 12 m² per sprinkler, 0.35 bar minimum at a sprinkler, EN 12845 "
    "(2015) (from memory); the insurer's US check: hose allowance 250 gpm, NFPA 13 (2022) ch. 19 "
    "(from memory); q = K·√p; Hazen–Williams p = 6.05×10⁵·Q^1.85/(C^1.85·d^4.87) bar/m (Q in "
    "L/min, d in mm), EN 12845 (2015) (from memory) and its US form 4.52·Q^1.85/(C^1.85·d^4.87) "
    "psi/ft (Q in gpm, d in in), NFPA 13 (2022) ch. 28 (from memory); C = 120 for steel, wet "
    "pipe (same); static pressure = γ_w·h with γ_w = 9.81 kN/m³ (common practice); pump power "
    "P(kW) = Q(L/min)·p(bar)/(600·η) (common practice); the imbalance across the design area "
    "taken from the node program's run (invented); bores after EN 10255 medium series (from "
    "memory); 1 mm/min = 1 L/(min·m²), 1 gpm/ft² = 40.75 mm/min, 1 gpm/psi^0.5 = 14.42 "
    "L/min/bar^0.5 (from NIST SP 811 (2008) App. B.8: 1 US gal = 3.785 L, 1 ft² = 0.0929 m² "
    "(10.76 ft²/m²), 1 bar = 14.50 psi, 1 in = 25.4 mm, 1 hp = 0.7457 kW, 1 m³ = 264.2 US gal); "
    "standard atmosphere 14.7 psia. Car park, layout and readings invented.")
sp = ItemSheet("Design", "Harbourgate multi-storey car park (invented): wet-pipe sprinklers, "
               "basement level −2, most remote design area", SPR_SRC)
sp.heading("Design basis (EN 12845, OH2)")
sp.add("D", "Design density", "D", 5, "mm/min")
sp.add("Ad", "Area of operation", "A_d", 144, "m²")
sp.add("Adft", "Area of operation, ft²", "A_d,ft", "={Ad}*10.76", "ft²")
sp.add("Dus", "Design density, US units", "D_US", "={D}/40.75", "gpm/ft²")
sp.add("Dus2", "Design density, US units (insurer's form)", "D_US2", "={D}*40.75", "gpm/ft²",
       planted=("unit-scale", "mm/min to gpm/ft² multiplied by 40.75: wrong way round"))
sp.add("as", "Area per sprinkler (3.0 m × 3.0 m grid)", "A_s", 9, "m²")
sp.add("n", "Sprinklers in the area of operation", "n", "={Ad}/{as}", "-")
sp.add("K", "Sprinkler K-factor (standard response pendent)", "K", 80, "L/min/bar^0.5")
sp.add("Kus", "Sprinkler K-factor, US units", "K_US", "={K}/14.42", "gpm/psi^0.5")
sp.add("Kus2", "Sprinkler K-factor, US units (first draft)", "K_US2", "={K}*14.42",
       "gpm/psi^0.5", planted=("unit-scale", "L/min/bar^0.5 to gpm/psi^0.5 multiplied by 14.42: "
                                             "wrong way round"))
sp.heading("Most remote sprinkler")
sp.add("qmin", "Flow for the density over one sprinkler's area", "q_min", "={D}*{as}", "L/min")
sp.add("qmin2", "Flow for the density over one sprinkler's area (first draft)", "q_min2",
       "={D}*{as}/1000", "L/min",
       planted=("unit-scale", "mm/min × m² is already L/min: the /1000 not needed"))
sp.add("p1", "Pressure for that flow", "p_1", "=({qmin}/{K})^2", "bar(g)")
sp.add("pmin", "Minimum pressure at a sprinkler (EN 12845, OH)", "p_min", 0.35, "bar(g)")
sp.add("pend", "Pressure at the most remote sprinkler", "p_end", "=MAX({p1},{pmin})", "bar(g)")
sp.add("q1", "Flow at the most remote sprinkler", "q_1", "={K}*SQRT({pend})", "L/min")
sp.add("Dact", "Density delivered at the most remote sprinkler", "D_act", "={q1}/{as}",
       "mm/min")
sp.add("p1psi", "Pressure at the most remote sprinkler, psig", "p_end,US", "={pend}*14.5",
       "psig")
sp.heading("Design flow")
sp.add("imb", "Flow above n × q_1 from the pressure gain across the area (node program)",
       "f_imb", 15, "%")
sp.add("Qs", "Sprinkler design flow", "Q_s", "={n}*{q1}*(1+{imb}/100)", "L/min")
sp.add("Qsgpm", "Sprinkler design flow, gpm", "Q_s,US", "={Qs}/3.785", "gpm")
sp.add("hose", "Hose allowance (insurer's US check)", "Q_h", 250, "gpm")
sp.add("Qtus", "Total demand with hose allowance (US check)", "Q_t,US", "={Qsgpm}+{hose}", "gpm")
sp.heading("Pressure at the pump")
sp.add("pf", "Friction loss, pump to the design area (Lines sheet)", "Δp_f", "=Lines!H9", "bar")
sp.add("dz", "Height of the remote sprinklers above the pump", "Δz", 8.0, "m")
sp.add("pst", "Static pressure loss, pump to the remote sprinklers", "Δp_st", "={dz}*9.81/100",
       "bar")
sp.add("pst2", "Static pressure loss (first draft)", "Δp_st2", "=1000*{dz}/100000", "bar",
       planted=("result-unit", "ρ·h/10⁵ with g left out of ρ·g·h"))
sp.add("pp", "Pump discharge pressure needed", "p_p", "={pend}+{pf}+{pst}", "bar(g)")
sp.add("pppsi", "Pump discharge pressure needed, psig", "p_p,US", "={pp}*14.5", "psig")
sp.add("pppsia", "Pump discharge pressure needed, psia (pump maker's NPSH sheet)", "p_p,abs",
       "={pppsi}+14.7", "psia")
sp.add("pppsia2", "Pump discharge pressure needed, psia (first draft)", "p_p,abs2", "={pppsi}",
       "psia", planted=("offset-scale", "a gauge reading set equal to an absolute one"))
sp.heading("Pump")
sp.add("eta", "Pump efficiency at duty (maker's curve)", "η", 65, "%")
sp.add("P", "Pump shaft power", "P", "={Qs}*{pp}/(600*{eta}/100)", "kW")
sp.add("P2", "Pump shaft power (first draft)", "P_2", "={Qs}*{pp}/(60*{eta}/100)", "kW",
       planted=("unit-scale", "L/min × bar over 60 in place of 600: 10 too large"))
sp.add("P3", "Pump shaft power (motor enquiry)", "P_3", "={Qs}*{pp}/(600*{eta})", "kW",
       planted=("unit-scale", "% used as a fraction: 100 too small"))
sp.add("Php", "Pump shaft power, hp", "P_hp", "={P}/0.7457", "hp")
sp.heading("Water supply")
sp.add("dur", "Supply duration", "t_d", 60, "min")
sp.add("Vt", "Tank effective capacity, sprinklers", "V_t", "={Qs}*{dur}/1000", "m³")
sp.add("Vt2", "Tank effective capacity (first draft)", "V_t2", "={Qs}*{dur}*60/1000", "m³",
       planted=("unit-scale", "L/min × min is already L: the ×60 not needed"))
sp.add("Vtgal", "Tank effective capacity, US gal", "V_t,gal", "={Vt}*264.2", "US gal")
sp.add("VtUS", "Water with hose allowance (insurer's US check)", "V_US", "={Qtus}*{dur}",
       "US gal")
sp.add("VtUSm", "Water with hose allowance, m³", "V_US,m", "={VtUS}/264.2", "m³")
SPRS = sp.finish()

QS = sp.ref("Qs")
LINES = {
    "A1": "Pipe runs from the pump to the design area (invented lengths; fittings as equivalent "
          "lengths from the node program); each run taken at the full design flow",
    "A2": "Sources: Hazen–Williams, EN 12845 (2015) SI form, bar/m from L/min and mm, and the "
          "NFPA 13 (2022) US form, psi/ft from gpm and in (both from memory); loss = p_f × "
          "(L + fittings) (common practice); 1 US gal = 3.785 L, 1 in = 25.4 mm, 1 bar = 14.50 "
          "psi (NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Run", "B5": "Q [L/min]", "C5": "d [mm]", "D5": "L [m]", "E5": "Fittings [m]",
    "F5": "C [-]", "G5": "p_f [bar/m]", "H5": "Loss [bar]", "J5": "p_f, US check [psi/ft]",
    "A9": "Total", "H9": "=SUM(H6:H8)",
}
for r, (run, d, length, fit) in enumerate([("Pump header and riser (DN100)", 105.3, 12, 6),
                                           ("Distribution main, level −2 (DN100)", 105.3, 85, 12),
                                           ("Cross main to the area (DN80)", 80.9, 24, 6)],
                                          start=6):
    LINES[f"A{r}"], LINES[f"C{r}"], LINES[f"D{r}"], LINES[f"E{r}"] = run, d, length, fit
    LINES[f"F{r}"] = 120
    LINES[f"B{r}"] = f"={QS}" if r == 6 else f"=B{r - 1}"
    LINES[f"G{r}"] = f"=6.05*10^5*B{r}^1.85/(F{r}^1.85*C{r}^4.87)"
    LINES[f"H{r}"] = f"=G{r}*(D{r}+E{r})"
    LINES[f"J{r}"] = f"=4.52*(B{r}/3.785)^1.85/(F{r}^1.85*(C{r}/25.4)^4.87)"
LINES["J7"] = "=4.52*(B7/3.785)^1.85/(F7^1.85*C7^4.87)"
LINES_PLANTED = {"Lines!J7": ("unit-scale", "the bore in mm in the US form, which wants in: "
                                            "25.4^4.87 too small")}

SPRB = {
    "trade": "fire protection: car park sprinklers, density, K-factor, pump and tank",
    "sheets": [("Design", SPRS), ("Lines", LINES)],
    "planted": {**sp.planted, **LINES_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 4: crude oil tank farm heating and pumping (°API, SG, kg/m³, m, m³, bbl, °C, °F, K,
# 1/K, t, cSt, W/(m²·K), m², kW, Btu/h, Btu/(lb·°F), kJ/(kg·K), h, psig, kPa(g), kPa, kJ/kg,
# kg/h, m³/h, mm, km, m/s, %)
# --------------------------------------------------------------------------------------------
CRUDE_SRC = (
    "Sources: SG at 60 °F = 141.5/(°API + 131.5), API MPMS ch. 11 / ASTM D1250 (from memory); "
    "water at 60 °F 999.0 kg/m³ (from memory); volume correction for crude oils, VCF = "
    "exp(−α·Δt·(1 + 0.8·α·Δt)) with α = 613.9723/ρ_15², Δt from 15 °C, API MPMS 11.1 Table 54A "
    "(from memory; ρ at 15 °C taken as ρ at 60 °F, 0.05 % apart); viscosity against temperature, "
    "log log(ν + 0.7) = A − B·log T with T in K, ASTM D341 (from memory); crude specific heat "
    "c_p = (0.388 + 0.00045·t_°F)/√SG Btu/(lb·°F), Cragoe, US Bureau of Standards Misc. Pub. 97 "
    "(1929) (from memory); tank loss Q = U·A·ΔT (common practice); heat-up Q = m·c_p·ΔT/t "
    "(common practice); steam latent heat from the Steam sheet; Darcy–Weisbach with Blasius's "
    "f = 0.316/Re^0.25 for smooth pipe, 4000 < Re < 10⁵ (Crane TP-410 (2009), from memory); "
    "column pressure ρ·g·h with g_n = 9.81 m/s² (SI Brochure 9th ed.); pump power P = V̇·Δp/η "
    "(common practice); NPSH_a = (p_atm + p_s − p_v)/(ρ·g) (common practice); NIST SP 811 "
    "(2008) App. B.8: 1 m³ = 6.29 bbl, 1 psi = 6.895 kPa, 1 kW = 3412 Btu/h, 1 Btu/(lb·°F) = "
    "4.187 kJ/(kg·K); standard atmosphere 101.325 kPa; °F = 1.8·°C + 32. Terminal, tank, "
    "crude and readings invented.")
cr = ItemSheet("Tank", "Saltcote crude terminal (invented): tank T-4 heating and transfer to the "
               "refinery line, waxy crude", CRUDE_SRC)
cr.heading("Crude")
cr.add("API", "API gravity (assay, invented)", "API", 24.0, "°API")
cr.add("SG", "Specific gravity at 60 °F", "SG", "=141.5/({API}+131.5)", "-")
cr.add("rho60", "Density at 60 °F", "ρ_60", "={SG}*999.0", "kg/m³")
cr.heading("Tank T-4")
cr.add("D", "Tank diameter", "D", 60, "m")
cr.add("H", "Liquid height (gauged)", "H", 14, "m")
cr.add("V", "Volume in the tank at the tank temperature", "V", "=PI()*{D}^2/4*{H}", "m³")
cr.add("Vbbl", "Volume in the tank, bbl", "V_bbl", "={V}*6.29", "bbl")
cr.add("Vbbl2", "Volume in the tank, bbl (stock report)", "V_bbl2", "={V}/6.29", "bbl",
       planted=("unit-scale", "m³ to bbl divided by 6.29: wrong way round"))
cr.heading("Storage temperature and volume correction")
cr.add("to", "Storage temperature", "t_o", 50, "°C")
cr.add("dt", "Temperature above the 15 °C base", "Δt", "={to}-15", "K")
cr.add("alpha", "Thermal expansion coefficient at 15 °C (Table 54A)", "α",
       "=613.9723/{rho60}^2", "1/K")
cr.add("VCF", "Volume correction factor to 15 °C", "VCF",
       "=EXP(-{alpha}*{dt}*(1+0.8*{alpha}*{dt}))", "-")
cr.add("rhot", "Density at the storage temperature", "ρ_t", "={rho60}*{VCF}", "kg/m³")
cr.add("m", "Mass of crude in the tank", "m", "={V}*{rhot}/1000", "t")
cr.heading("Viscosity (assay, ASTM D341)")
cr.add("t1", "Assay temperature 1", "t_1", 40, "°C")
cr.add("nu1", "Kinematic viscosity at t_1", "ν_1", 150, "cSt")
cr.add("t2", "Assay temperature 2", "t_2", 100, "°C")
cr.add("nu2", "Kinematic viscosity at t_2", "ν_2", 14, "cSt")
cr.add("B", "Walther slope", "B",
       "=(LOG10(LOG10({nu1}+0.7))-LOG10(LOG10({nu2}+0.7)))/(LOG10({t2}+273.15)-LOG10({t1}+273.15))",
       "-")
cr.add("A", "Walther intercept", "A", "=LOG10(LOG10({nu1}+0.7))+{B}*LOG10({t1}+273.15)", "-")
cr.add("nu", "Kinematic viscosity at the storage temperature", "ν",
       "=10^(10^({A}-{B}*LOG10({to}+273.15)))-0.7", "cSt")
cr.add("B2", "Walther slope (first draft)", "B_2",
       "=(LOG10(LOG10({nu1}+0.7))-LOG10(LOG10({nu2}+0.7)))/(LOG10({t2})-LOG10({t1}))", "-",
       planted=("offset-scale", "°C readings in the logarithms where absolute temperatures "
                                "belong"))
cr.heading("Heat loss (winter design)")
cr.add("tamb", "Design ambient temperature", "t_a", -5, "°C")
cr.add("Hs", "Shell height", "H_s", 16, "m")
cr.add("U", "Overall coefficient, insulated shell and roof (invented)", "U", 0.45, "W/(m²·K)")
cr.add("Aloss", "Shell and roof area", "A", "=PI()*{D}*{Hs}+PI()*{D}^2/4", "m²")
cr.add("Qloss", "Heat loss, shell and roof", "Q_l", "={U}*{Aloss}*({to}-{tamb})/1000", "kW")
cr.add("Qloss2", "Heat loss, shell and roof (first draft)", "Q_l2", "={U}*{Aloss}*({to}-{tamb})",
       "kW", planted=("unit-scale", "W/(m²·K) × m² × K gives W, written as kW: the /1000 "
                                   "missing"))
cr.heading("Heat-up before the transfer")
cr.add("tst", "Crude temperature at the start of heating", "t_st", 40, "°C")
cr.add("thu", "Heat-up time", "t_hu", 72, "h")
cr.add("tmF", "Mean crude temperature during heat-up, °F", "t_m,F", "=({tst}+{to})/2*1.8+32",
       "°F")
cr.add("cpUS", "Crude specific heat (Cragoe)", "c_p,US", "=(0.388+0.00045*{tmF})/SQRT({SG})",
       "Btu/(lb·°F)")
cr.add("cp", "Crude specific heat, SI", "c_p", "={cpUS}*4.187", "kJ/(kg·K)")
cr.add("Qhu", "Heat-up duty", "Q_hu", "={m}*1000*{cp}*({to}-{tst})/({thu}*3600)", "kW")
cr.add("Qhu2", "Heat-up duty (first draft)", "Q_hu2", "={m}*1000*{cp}*({to}-{tst})/{thu}", "kW",
       planted=("unit-scale", "kJ over hours written as kW: the 3600 missing, 3600 too large"))
cr.add("Qh", "Heater duty, heat-up and loss", "Q_h", "={Qhu}+{Qloss}", "kW")
cr.add("QhBtu", "Heater duty, Btu/h (US coil maker)", "Q_h,Btu", "={Qh}*3412", "Btu/h")
cr.add("QhBtu2", "Heater duty, Btu/h (coil enquiry)", "Q_h,Btu2", "={Qh}*3.412", "Btu/h",
       planted=("unit-scale", "kW times 3.412 gives MBH, written as Btu/h: 1000 too small"))
cr.heading("Steam to the heating coils")
cr.add("ps", "Steam pressure at the coil control valve", "p_s", 100, "psig")
cr.add("psk", "Steam pressure, kPa(g)", "p_s,k", "={ps}*6.895", "kPa(g)")
cr.add("psa", "Steam pressure, absolute", "p_s,a", "={psk}+101.325", "kPa")
cr.add("psa2", "Steam pressure, absolute (first draft)", "p_s,a2", "={psk}+14.7", "kPa",
       planted=("offset-scale", "the atmosphere in psi added to a reading in kPa(g)"))
cr.add("hfg", "Latent heat at the steam pressure (Steam sheet)", "h_fg",
       "=VLOOKUP({ps},Steam!A6:C9,3,FALSE)", "kJ/kg")
cr.add("ms", "Steam to the coils", "ṁ_s", "={Qh}/{hfg}*3600", "kg/h")
cr.heading("Transfer pump to the refinery line")
cr.add("Q", "Transfer rate", "V̇", 800, "m³/h")
cr.add("d", "Line bore (16 in, standard wall)", "d", 387.4, "mm")
cr.add("L", "Line length to the refinery", "L", 6.5, "km")
cr.add("v", "Velocity in the line", "v", "={Q}/3600/(PI()*({d}/1000)^2/4)", "m/s")
cr.add("Re", "Reynolds number", "Re", "={v}*{d}/1000/({nu}/1000000)", "-")
cr.add("Re2", "Reynolds number (first draft)", "Re_2", "={v}*{d}/1000/{nu}", "-",
       planted=("unit-scale", "a viscosity in cSt used as m²/s: 10⁶ too small"))
cr.add("f", "Darcy friction factor (Blasius)", "f", "=0.316/{Re}^0.25", "-")
cr.add("dpf", "Line friction loss", "Δp_f", "={f}*{L}*1000/({d}/1000)*{rhot}*{v}^2/2/1000", "kPa")
cr.add("hmin", "Minimum liquid level above the pump suction", "h_min", 2.5, "m")
cr.add("dz", "Lift to the refinery tank's top inlet", "Δz", 14, "m")
cr.add("pss", "Pump suction pressure at the minimum level", "p_ss", "={rhot}*9.81*{hmin}/1000",
       "kPa(g)")
cr.add("pd", "Pump discharge pressure needed", "p_d", "={dpf}+{rhot}*9.81*{dz}/1000", "kPa(g)")
cr.add("pdpsi", "Pump discharge pressure needed, psig", "p_d,US", "={pd}/6.895", "psig")
cr.add("dp", "Pump differential pressure", "Δp", "={pd}-{pss}", "kPa")
cr.add("eta", "Pump efficiency at duty (maker's curve, on this viscosity)", "η", 70, "%")
cr.add("P", "Pump shaft power", "P", "={Q}/3600*{dp}/({eta}/100)", "kW")
cr.add("P2", "Pump shaft power (first draft)", "P_2", "={Q}*{dp}/({eta}/100)", "kW",
       planted=("unit-scale", "a flow in m³/h in a kW formula: 3600 too large"))
cr.add("pat", "Site barometer", "p_atm", 101.3, "kPa")
cr.add("pv", "True vapour pressure of the crude at 50 °C (assay, invented)", "p_v", 35, "kPa")
cr.add("NPSH", "NPSH available at the minimum level (suction losses neglected)", "NPSH_a",
       "=({pat}+{pss}-{pv})*1000/({rhot}*9.81)", "m")
cr.add("NPSH2", "NPSH available (first draft)", "NPSH_a2", "=({pss}-{pv})*1000/({rhot}*9.81)",
       "m", planted=("offset-scale", "a gauge reading less an absolute vapour pressure"))
CRUDES = cr.finish()

STEAM = {
    "A1": "Saturated steam by gauge pressure (IAPWS-IF97 values, rounded, from memory; check "
          "against a steam table before use)",
    "A2": "Sources: IAPWS-IF97 (from memory), gauge pressure on the standard atmosphere.",
    "A3": CAUTION,
    "A5": "Pressure [psig]", "B5": "Saturation temperature [°C]", "C5": "Latent heat [kJ/kg]",
}
for r, (p, ts, hfg) in enumerate([(50, 147.9, 2118), (75, 160.2, 2083), (100, 170.1, 2050),
                                  (125, 178.4, 2022)], start=6):
    STEAM[f"A{r}"], STEAM[f"B{r}"], STEAM[f"C{r}"] = p, ts, hfg

CRUDEB = {
    "trade": "crude oil terminal: tank stock, volume correction, heating, steam and transfer pump",
    "sheets": [("Tank", CRUDES), ("Steam", STEAM)],
    "planted": cr.planted,
}

BOOKS = {"medical-air-plant": AIRB, "dh-branch-b7": DHB, "car-park-sprinklers": SPRB,
         "crude-tank-heating": CRUDEB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()
