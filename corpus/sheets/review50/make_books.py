#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review50), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; pattern after
corpus/sheets/review48/make_books.py and review41/make_books.py.

Trades: a noodle bar's wok-line hood exhaust and direct-fired make-up air; a community
hospital's liquid oxygen VIE, tanker drops, vaporiser and pipeline pressures; a ready-mix plant's
day of batching with moisture corrections, cement silo and truck loads; an apartment block's
indirect district heating substation with its plate heat exchanger and secondary pump. All
scenarios, sites, firms, readings and catalogue data are invented (demonstration only); the
formulas and published factors are the trade's own, with their sources named in a text cell at
the top of each sheet ("from memory" where recalled and not checked, "common practice" for a
fact of the trade with no single source).

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
# Book 1: noodle bar wok-line hood and direct-fired make-up air (ft, in, m, ft², m², cfm/ft,
# m³/h per m, cfm, m³/h, fpm, m/s, in. w.g., Pa, hp, kW, %, °F, °C, Δ°F, K, Btu/h, MBH, ft³/h)
# --------------------------------------------------------------------------------------------
HOOD_SRC = (
    "Sources: Type I hood exhaust per linear foot by appliance duty, wall-mounted canopy 200/300/"
    "400/550 cfm/ft and single island 400/500/600/700 cfm/ft for light/medium/heavy/extra-heavy "
    "duty, International Mechanical Code (2018) 507.5 (from memory); grease duct at least 500 "
    "fpm, NFPA 96 (2021) ch. 7 (from memory); velocity pressure p_v = (V/4005)² in. w.g. for "
    "standard air, ASHRAE Handbook — Fundamentals (2021) ch. 21 (from memory); duct friction as "
    "a rate per 100 ft of duct (common practice); fan bhp = cfm·SP(in. w.g.)/(6356·η) (common "
    "practice); sensible heat of air Q = 1.08·cfm·ΔT(°F) Btu/h, standard air (ASHRAE "
    "Fundamentals, common practice); air density ρ = p/(R·T), R = 287.05 J/(kg·K), c_p 1.006 "
    "kJ/(kg·K) (ASHRAE Fundamentals ch. 1, from memory); natural gas about 1030 Btu/ft³ (common "
    "practice; the utility's figure governs); NIST SP 811 (2008) App. B.8: 1 ft = 0.3048 m, 1 "
    "cfm = 1.699 m³/h, 1 ft² = 0.0929 m², 1 ft/min = 0.00508 m/s, 1 in. of water = 249.1 Pa, 1 "
    "hp = 0.7457 kW, 1 kW = 3412 Btu/h, 1 MBH = 0.2931 kW, 1 ft³ = 0.02832 m³; °C = (°F − "
    "32)/1.8. Restaurant, hood and readings invented.")
hd = ItemSheet("Hood", "Jade Lantern Noodle Bar (invented): wok-line wall canopy, grease duct, "
               "exhaust fan and direct-fired make-up air unit", HOOD_SRC)
hd.heading("Hood exhaust")
hd.add("Lh", "Hood length, wall canopy over the wok line", "L_h", 16, "ft")
hd.add("duty", "Appliance duty class (4 = extra-heavy: woks; Rates sheet)", "k", 4, "-")
hd.add("qh", "Exhaust rate per foot of hood (Rates sheet, wall canopy)", "q_h",
       "=VLOOKUP({duty},Rates!A6:B9,2,FALSE)", "cfm/ft")
hd.add("Qe", "Hood exhaust", "Q_e", "={Lh}*{qh}", "cfm")
hd.add("Qeh", "Hood exhaust, m³/h", "Q_e,SI", "={Qe}*1.699", "m³/h")
hd.add("Qeh2", "Hood exhaust, m³/h (fan maker's selection form)", "Q_e,SI2", "={Qe}/1.699", "m³/h",
       planted=("unit-scale", "cfm to m³/h divided by 1.699: wrong way round"))
hd.add("Lhm", "Hood length, m", "L_h,m", "={Lh}*0.3048", "m")
hd.add("qhm", "Exhaust per metre of hood", "q_h,SI", "={Qeh}/{Lhm}", "m³/h·m")
hd.add("qhmc", "Exhaust per metre of hood (Rates sheet, check)", "q_h,chk",
       "=VLOOKUP({duty},Rates!A6:D9,4,FALSE)", "m³/h·m")
hd.heading("Grease duct")
hd.add("a", "Duct width", "a", 30, "in")
hd.add("b", "Duct height", "b", 24, "in")
hd.add("Ad", "Duct area", "A_d", "={a}*{b}/144", "ft²")
hd.add("Ad2", "Duct area (first draft)", "A_d2", "={a}*{b}", "ft²",
       planted=("unit-scale", "in² written as ft²: the /144 missing"))
hd.add("Adm", "Duct area, m²", "A_d,SI", "={Ad}*0.0929", "m²")
hd.add("V", "Duct velocity", "V", "={Qe}/{Ad}", "fpm")
hd.add("Vms", "Duct velocity, m/s", "V_SI", "={V}*0.00508", "m/s")
hd.add("Vms2", "Duct velocity, m/s (balancing report)", "V_SI2", "={V}*0.3048", "m/s",
       planted=("unit-scale", "ft/min times 0.3048 gives m/min, written as m/s: 60 too large"))
hd.add("pv", "Velocity pressure in the duct, standard air", "p_v", "=({V}/4005)^2", "in. w.g.")
hd.heading("Static pressure and exhaust fan")
hd.add("sph", "Hood static pressure at design flow (maker's data)", "SP_h", 0.75, "in. w.g.")
hd.add("fd", "Duct friction rate", "f_d", 0.15, "in. w.g./100 ft")
hd.add("Ld", "Duct equivalent length (riser, offsets, roof)", "L_d", 85, "ft")
hd.add("dpd", "Duct friction loss", "Δp_d", "={fd}*{Ld}/100", "in. w.g.")
hd.add("dpd2", "Duct friction loss (first draft)", "Δp_d2", "={fd}*{Ld}", "in. w.g.",
       planted=("unit-scale", "a rate per 100 ft times ft without the /100: 100 too large"))
hd.add("spf", "Fan inlet, curb and discharge allowance", "SP_f", 0.25, "in. w.g.")
hd.add("SP", "External static pressure on the exhaust fan", "SP", "={sph}+{dpd}+{spf}",
       "in. w.g.")
hd.add("SPPa", "External static pressure, Pa", "SP_SI", "={SP}*249.1", "Pa")
hd.add("SPPa2", "External static pressure, Pa (BMS point)", "SP_SI2", "={SP}*249.1/1000", "Pa",
       planted=("unit-scale", "in. w.g. to Pa then /1000: kPa written as Pa, 1000 too small"))
hd.add("etaf", "Fan total efficiency (maker's curve)", "η_f", 55, "%")
hd.add("bhp", "Exhaust fan brake horsepower", "P_f", "={Qe}*{SP}/(6356*{etaf}/100)", "hp")
hd.add("bhp2", "Exhaust fan brake horsepower (motor schedule)", "P_f2", "={Qe}*{SP}/(6356*{etaf})",
       "hp", planted=("unit-scale", "efficiency in % used as a fraction: 100 too small"))
hd.add("PkW", "Exhaust fan shaft power, kW", "P_f,kW", "={bhp}*0.7457", "kW")
hd.heading("Make-up air")
hd.add("fm", "Make-up air share of the exhaust (rest transferred from the dining room)", "f_m",
       80, "%")
hd.add("Qm", "Make-up air", "Q_m", "={Qe}*{fm}/100", "cfm")
hd.add("Qmh", "Make-up air, m³/h", "Q_m,SI", "={Qm}*1.699", "m³/h")
hd.add("to", "Outdoor winter design, 99.6 %", "t_o", 10, "°F")
hd.add("ts", "Make-up air supply temperature", "t_s", 60, "°F")
hd.add("toC", "Outdoor winter design, °C", "t_o,C", "=({to}-32)/1.8", "°C")
hd.add("tsC", "Make-up air supply temperature, °C", "t_s,C", "=({ts}-32)/1.8", "°C")
hd.add("dTF", "Temperature rise through the burner", "ΔT_F", "={ts}-{to}", "Δ°F")
hd.add("dTK", "Temperature rise through the burner, K", "ΔT_K", "={tsC}-{toC}", "K")
hd.add("Qh", "Heating, 1.08 rule", "Q_h", "=1.08*{Qm}*{dTF}", "Btu/h")
hd.add("Qh2", "Heating (with the metric data sheet's rise)", "Q_h2", "=1.08*{Qm}*{dTK}", "Btu/h",
       planted=("unit-scale", "a rise in K in the 1.08 rule that wants Δ°F: 1.8 too small"))
hd.add("pat", "Atmospheric pressure (sea-level site)", "p_atm", 101325, "Pa")
hd.add("Ra", "Gas constant of dry air", "R_a", 287.05, "J/(kg·K)")
hd.add("TsK", "Supply temperature, absolute", "T_s", "={tsC}+273.15", "K")
hd.add("TsK2", "Supply temperature, absolute (first draft)", "T_s2", "={tsC}", "K",
       planted=("offset-scale", "a °C reading set equal to a kelvin one"))
hd.add("rho", "Density of the supply air", "ρ_s", "={pat}/({Ra}*{TsK})", "kg/m³")
hd.add("ma", "Make-up air mass flow", "m_a", "={Qmh}*{rho}/3600", "kg/s")
hd.add("cpa", "Specific heat of air", "c_p", 1.006, "kJ/(kg·K)")
hd.add("QhSI", "Heating, SI check", "Q_h,SI", "={ma}*{cpa}*{dTK}", "kW")
hd.heading("Direct-fired gas burner")
hd.add("etab", "Burner efficiency (maker's figure, invented)", "η_b", 92, "%")
hd.add("Qin", "Gas input", "Q_in", "={Qh}/({etab}/100)", "Btu/h")
hd.add("QinM", "Gas input, MBH", "Q_in,M", "={Qin}/1000", "MBH")
hd.add("QinkW", "Gas input, kW", "Q_in,kW", "={QinM}*0.2931", "kW")
hd.add("QinkW2", "Gas input, kW (gas utility application)", "Q_in,kW2", "={QinM}*3.412", "kW",
       planted=("unit-scale", "MBH to kW multiplied by 3.412: wrong way round, 11.6 too large"))
hd.add("HHV", "Natural gas heating value (utility)", "HHV", 1030, "Btu/ft³")
hd.add("Vg", "Gas flow at full fire", "V_g", "={Qin}/{HHV}", "ft³/h")
hd.add("Vgm", "Gas flow at full fire, m³/h", "V_g,SI", "={Vg}*0.02832", "m³/h")
HOODS = hd.finish()

RATES = {
    "A1": "Type I hood exhaust rates by appliance duty (IMC 507.5 figures, from memory)",
    "A2": "Sources: International Mechanical Code (2018) 507.5 (from memory); m³/h per m = "
          "cfm/ft × 1.699 / 0.3048 (NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Duty class [-]", "B5": "Wall canopy [cfm/ft]", "C5": "Single island [cfm/ft]",
    "D5": "Wall canopy [m³/h·m]", "E5": "Duty",
}
for r, (k, wall, island, name) in enumerate([(1, 200, 400, "light"), (2, 300, 500, "medium"),
                                             (3, 400, 600, "heavy"),
                                             (4, 550, 700, "extra-heavy")], start=6):
    RATES[f"A{r}"], RATES[f"B{r}"], RATES[f"C{r}"], RATES[f"E{r}"] = k, wall, island, name
    RATES[f"D{r}"] = f"=B{r}*1.699/0.3048"
RATES["D8"] = "=B8*1.699*0.3048"
RATES_PLANTED = {"Rates!D8": ("unit-scale", "per ft to per m multiplied by 0.3048: wrong way "
                                            "round, 10.8 too small")}

HOODB = {
    "trade": "kitchen ventilation: wok-line hood exhaust, grease duct, fan and make-up air",
    "sheets": [("Hood", HOODS), ("Rates", RATES)],
    "planted": {**hd.planted, **RATES_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 2: hospital liquid oxygen VIE (US gal, L, kg, kg/L, %, m³, scf, Nm³, kg/Nm³, kg/d, L/d,
# L/min, scfm, m³/h, Nm³/h, d, t, °C, kJ/kg, kJ/(kg·K), kW, bar(g), bar a, psig, psia, kPa(g),
# in. H2O, Pa, m)
# --------------------------------------------------------------------------------------------
VIE_SRC = (
    "Sources: liquid oxygen 1.141 kg/L at its normal boiling point −183 °C, latent heat 213 "
    "kJ/kg, gas c_p 0.918 kJ/(kg·K) (Perry's Chemical Engineers' Handbook, 8th ed., from "
    "memory); oxygen 1.429 kg/Nm³ at 0 °C and 101.325 kPa (from memory); 1 L of liquid gives "
    "860 L of gas at 21 °C (70 °F) and 1 atm, 115 scf per US gal of liquid (CGA practice, "
    "common practice); pipeline 400 kPa nominal, HTM 02-01 (2006) Part A (from memory); design "
    "flows and diversities per terminal unit after HTM 02-01 (figures invented); normal "
    "density × flow for Nm³ with the ratio of absolute temperatures 273.15/(t + 273.15) "
    "(common practice); contents gauge level h = Δp/(ρ·g) (common practice); NIST SP 811 "
    "(2008) App. B.8: 1 US gal = 3.785 L, 1 m³ = 35.31 ft³, 1 ft³ = 28.32 L, 1 bar = 14.5 psi, "
    "1 kPa = 0.145 psi, 1 in. of water = 249.1 Pa; g_n = 9.81 m/s² (SI Brochure 9th ed.). "
    "Hospital, vessel, contract and readings invented.")
vie = ItemSheet("VIE", "Ravensmoor Community Hospital (invented): liquid oxygen VIE, tanker drops, "
                "vaporiser and pipeline pressures", VIE_SRC)
vie.heading("Vessel")
vie.add("Vg", "VIE nominal capacity (US-built vessel)", "V_n", 3000, "US gal")
vie.add("VL", "VIE capacity, L", "V_L", "={Vg}*3.785", "L")
vie.add("VL2", "VIE capacity, L (maintenance contract)", "V_L2", "={Vg}/3.785", "L",
        planted=("unit-scale", "US gal to L divided by 3.785: wrong way round"))
vie.add("rhoL", "Liquid oxygen density at the normal boiling point", "ρ_L", 1.141, "kg/L")
vie.add("mf", "Liquid oxygen when full", "m_f", "={VL}*{rhoL}", "kg")
vie.add("fmax", "Maximum fill", "f_max", 95, "%")
vie.add("fmin", "Reorder level (telemetry alarm)", "f_min", 30, "%")
vie.add("Vu", "Usable liquid between the reorder level and full", "V_u",
        "={VL}*({fmax}-{fmin})/100", "L")
vie.add("Vu2", "Usable liquid (supplier's form)", "V_u2", "={VL}*({fmax}-{fmin})", "L",
        planted=("unit-scale", "% used as a fraction: 100 too large"))
vie.add("mu", "Usable liquid, kg", "m_u", "={Vu}*{rhoL}", "kg")
vie.heading("Gas equivalent")
vie.add("r", "Expansion ratio, liquid to gas at 21 °C (70 °F) and 1 atm", "r", 860, "-")
vie.add("Vgas", "Usable gas at 21 °C", "V_gas", "={Vu}*{r}/1000", "m³")
vie.add("scf", "Usable gas, scf (70 °F)", "V_scf", "={Vgas}*35.31", "scf")
vie.add("scfc", "Usable gas, scf (115 scf per US gal of liquid, check)", "V_scf,chk",
        "={Vu}/3.785*115", "scf")
vie.add("rN", "Normal density of oxygen (0 °C, 101.325 kPa)", "ρ_N", 1.429, "kg/Nm³")
vie.add("VN", "Usable gas, Nm³", "V_N", "={mu}/{rN}", "Nm³")
vie.heading("Consumption and storage")
vie.add("md", "Average liquid withdrawn (telemetry, last 12 months)", "m_d", 610, "kg/d")
vie.add("VLd", "Average liquid withdrawn, L/d", "V_d", "={md}/{rhoL}", "L/d")
vie.add("Qavg", "Average gas flow at 21 °C", "Q_avg", "={VLd}*{r}/1440", "L/min")
vie.add("Qscfm", "Average gas flow, scfm", "Q_scfm", "={Qavg}/28.32", "scfm")
vie.add("Qscfm2", "Average gas flow, scfm (supplier's portal)", "Q_scfm2", "={Qavg}*35.31", "scfm",
        planted=("unit-scale", "the m³-to-ft³ factor applied to litres: 1000 too large"))
vie.add("days", "Days of usable storage at average use", "t_s", "={Vu}/{VLd}", "d")
vie.add("days2", "Days of usable storage (telemetry set-up)", "t_s2", "={Vu}/{VLd}*24", "d",
        planted=("unit-scale", "the 24 turns days into hours, written as days: 24 too large"))
vie.add("tload", "Tanker drop (invented contract)", "m_t", 8, "t")
vie.add("Vdel", "Tanker drop, L", "V_t", "={tload}*1000/{rhoL}", "L")
vie.heading("Design flow and vaporiser")
vie.add("Qd", "Design peak flow (Demand sheet)", "Q_d", "=Demand!E11", "L/min")
vie.add("Qdm", "Design peak flow, m³/h", "Q_d,h", "={Qd}*60/1000", "m³/h")
vie.add("tg", "Reference gas temperature", "t_g", 21.1, "°C")
vie.add("QN", "Design peak flow, Nm³/h", "Q_N", "={Qdm}*273.15/({tg}+273.15)", "Nm³/h")
vie.add("QN2", "Design peak flow, Nm³/h (first draft)", "Q_N2", "={Qdm}*273.15/{tg}", "Nm³/h",
        planted=("offset-scale", "a °C reading in a temperature ratio: absolute belongs"))
vie.add("mdot", "Peak oxygen mass flow", "ṁ", "={QN}*{rN}", "kg/h")
vie.add("hfg", "Latent heat of oxygen at 1 atm", "h_fg", 213, "kJ/kg")
vie.add("cpg", "Specific heat of oxygen gas", "c_p", 0.918, "kJ/(kg·K)")
vie.add("tb", "Boiling point of oxygen at 1 atm", "t_b", -183, "°C")
vie.add("Qv", "Heat the vaporiser takes from the air at peak", "Q_v",
        "={mdot}*({hfg}+{cpg}*({tg}-{tb}))/3600", "kW")
vie.add("Qv2", "Heat the vaporiser takes from the air (first draft)", "Q_v2",
        "={mdot}*({hfg}+{cpg}*({tg}-{tb}))", "kW",
        planted=("unit-scale", "kJ/h written as kW: the /3600 missing"))
vie.heading("Pressures")
vie.add("patm", "Atmospheric pressure", "p_atm", 1.013, "bar a")
vie.add("pv", "VIE working pressure (economiser setting)", "p_v", 10.5, "bar(g)")
vie.add("pvpsi", "VIE working pressure, psig", "p_v,psi", "={pv}*14.5", "psig")
vie.add("pva", "VIE working pressure, absolute", "p_v,a", "={pv}+{patm}", "bar a")
vie.add("pvpsia", "VIE working pressure, psia", "p_v,psia", "={pva}*14.5", "psia")
vie.add("pvpsia2", "VIE working pressure, psia (maker's data sheet)", "p_v,psia2", "={pv}*14.5",
        "psia", planted=("offset-scale", "a gauge reading converted and written as absolute: "
                                         "the atmosphere missing"))
vie.add("pl", "Pipeline distribution pressure (nominal)", "p_l", 400, "kPa(g)")
vie.add("plb", "Pipeline pressure, bar(g)", "p_l,bar", "={pl}/100", "bar(g)")
vie.add("plpsi", "Pipeline pressure, psig", "p_l,psi", "={pl}*0.145", "psig")
vie.add("dpr", "Pressure drop across the line regulators", "Δp_r", "={pv}-{plb}", "bar")
vie.add("dpr2", "Pressure drop across the line regulators (first draft)", "Δp_r2", "={pva}-{plb}",
        "bar", planted=("offset-scale", "an absolute reading less a gauge one"))
vie.add("pmawp", "VIE maximum allowable working pressure (nameplate)", "p_MAWP", 250, "psig")
vie.add("pmb", "VIE maximum allowable working pressure, bar(g)", "p_MAWP,bar", "={pmawp}/14.5",
        "bar(g)")
vie.heading("Contents gauge")
vie.add("dpc", "Contents gauge reading (differential across the liquid)", "Δp_c", 105, "in. H2O")
vie.add("dpcPa", "Contents gauge reading, Pa", "Δp_c,Pa", "={dpc}*249.1", "Pa")
vie.add("hl", "Liquid level above the bottom tapping", "h_l", "={dpcPa}/({rhoL}*1000*9.81)", "m")
vie.add("hl2", "Liquid level above the bottom tapping (first draft)", "h_l2",
        "={dpcPa}/({rhoL}*1000)", "m", planted=("result-unit", "g missing: Pa over kg/m³ is "
                                                               "m²/s², not m"))
vie.add("Vc", "Contents from the strapping table", "V_c", "=VLOOKUP({hl},Strapping!A6:B17,2)", "L")
vie.add("pct", "Contents, share of capacity", "f_c", "={Vc}/{VL}*100", "%")
VIES = vie.finish()

DEMAND = {
    "A1": "Oxygen design flow by department (invented terminal-unit counts, flows after HTM 02-01)",
    "A2": "Sources: design flow = terminal units × flow per unit × diversity/100 (HTM 02-01 "
          "(2006) Part A method, figures invented).",
    "A3": CAUTION,
    "A5": "Department", "B5": "Terminal units [-]", "C5": "Flow per unit [L/min]",
    "D5": "Diversity [%]", "E5": "Design flow [L/min]",
    "A11": "Total", "E11": "=SUM(E6:E10)",
}
for r, (name, n, q, d) in enumerate([("General wards", 96, 10, 20),
                                     ("Operating theatres", 12, 100, 30),
                                     ("Critical care", 12, 30, 75),
                                     ("Emergency department", 20, 10, 50),
                                     ("High-flow and CPAP allowance", 8, 60, 100)], start=6):
    DEMAND[f"A{r}"], DEMAND[f"B{r}"], DEMAND[f"C{r}"], DEMAND[f"D{r}"] = name, n, q, d
    DEMAND[f"E{r}"] = f"=B{r}*C{r}*D{r}/100"
DEMAND["E8"] = "=B8*C8*D8"
DEMAND_PLANTED = {"Demand!E8": ("unit-scale", "diversity in % used as a fraction: 100 too large")}

STRAP = {
    "A1": "VIE contents against liquid level (invented maker's strapping table)",
    "A2": "Sources: maker's calibration (invented).",
    "A3": CAUTION,
    "A5": "Level [m]", "B5": "Contents [L]",
}
for r, (h, v) in enumerate([(0, 0), (0.25, 260), (0.5, 720), (0.75, 1290), (1.0, 1930),
                            (1.5, 3400), (2.0, 4980), (2.5, 6550), (3.0, 8120), (3.5, 9690),
                            (4.0, 11050), (4.2, 11355)], start=6):
    STRAP[f"A{r}"], STRAP[f"B{r}"] = h, v

VIEB = {
    "trade": "medical gases: liquid oxygen VIE, tanker drops, vaporiser and pipeline pressures",
    "sheets": [("VIE", VIES), ("Demand", DEMAND), ("Strapping", STRAP)],
    "planted": {**vie.planted, **DEMAND_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 3: ready-mix batch plant (m³, yd³, kg/m³, lb/yd³, %, kg/L, L/m³, L, US gal, t, ton
# (short), t/m³, m, mL/100 kg, °C, °F)
# --------------------------------------------------------------------------------------------
RMX_SRC = (
    "Sources: absolute volume method, volume = mass/(relative density × 1000 kg/m³), ACI 211.1 "
    "(from memory); moisture correction, wet batch mass = SSD mass·(1 + (MC − absorption)/100) "
    "and free water = SSD mass·(MC − absorption)/100 (ASTM C127/C128 absorption, ASTM C566 "
    "moisture; common practice); fresh concrete temperature T = [0.22(T_a·W_a + T_c·W_c) + "
    "T_w·W_w + T_a·W_wa]/[0.22(W_a + W_c) + W_w + W_wa], ACI 305R (from memory); cement bulk "
    "density in a silo about 1.2–1.5 t/m³ (common practice); water reducer doses in mL per 100 "
    "kg of cementitious material (maker's data, invented within the usual range); water 0.998 "
    "kg/L at 20 °C (from memory); NIST SP 811 (2008) App. B.8: 1 m³ = 1.308 yd³, 1 kg/m³ = "
    "1.6856 lb/yd³ (1 lb/yd³ = 0.5933 kg/m³), 1 t = 1.1023 short tons, 1 short ton = 0.9072 t, "
    "1 US gal = 3.785 L; °F = 1.8·°C + 32. Plant, mix and readings invented.")
bt = ItemSheet("Batch", "Millbeck Ready-Mix (invented), plant 3: one day's batching of mix "
               "C32-P20 (pump mix), moisture corrections, cement silo and trucks", RMX_SRC)
bt.heading("Order and trucks")
bt.add("Vo", "Concrete ordered today (dispatch)", "V_o", 264, "m³")
bt.add("Vyd", "Concrete ordered, yd³", "V_o,yd", "={Vo}*1.308", "yd³")
bt.add("Vyd2", "Concrete ordered, yd³ (US client's confirmation)", "V_o,yd2", "={Vo}*0.7646", "yd³",
       planted=("unit-scale", "m³ to yd³ multiplied by 0.7646: wrong way round"))
bt.add("Vt", "Truck load (8 m³ drum)", "V_t", 8, "m³")
bt.add("nt", "Truck loads", "n_t", "=ROUNDUP({Vo}/{Vt},0)", "-")
bt.heading("Moisture corrections (probe and lab)")
bt.add("MCc", "Coarse aggregate moisture (probe)", "MC_c", 1.8, "%")
bt.add("Ac", "Coarse aggregate absorption (lab)", "A_c", 0.8, "%")
bt.add("MCs", "Sand moisture (probe)", "MC_s", 5.5, "%")
bt.add("As", "Sand absorption (lab)", "A_s", 1.2, "%")
bt.add("Wc", "Coarse aggregate, SSD (Mix sheet)", "W_c", "=Mix!B9", "kg/m³")
bt.add("Ws", "Sand, SSD (Mix sheet)", "W_s", "=Mix!B10", "kg/m³")
bt.add("Wcw", "Coarse aggregate, batch mass wet", "W_c,wet", "={Wc}*(1+({MCc}-{Ac})/100)", "kg/m³")
bt.add("Wsw", "Sand, batch mass wet", "W_s,wet", "={Ws}*(1+({MCs}-{As})/100)", "kg/m³")
bt.add("Wsw2", "Sand, batch mass wet (panel operator's sheet)", "W_s,wet2",
       "={Ws}*(1+{MCs}-{As})", "kg/m³",
       planted=("unit-scale", "% added to 1 as if a fraction: the correction 100 too large"))
bt.add("fwc", "Free water on the coarse aggregate", "w_c", "={Wc}*({MCc}-{Ac})/100", "kg/m³")
bt.add("fws", "Free water on the sand", "w_s", "={Ws}*({MCs}-{As})/100", "kg/m³")
bt.add("Wb", "Batch water", "W_b", "=Mix!B8-{fwc}-{fws}", "kg/m³")
bt.add("rw", "Water density (20 °C)", "ρ_w", 0.998, "kg/L")
bt.add("WbL", "Batch water, L/m³", "V_b", "={Wb}/{rw}", "L/m³")
bt.add("WtL", "Batch water per truck", "V_bt", "={WbL}*{Vt}", "L")
bt.add("Wtg", "Batch water per truck, US gal", "V_bt,US", "={WtL}/3.785", "US gal")
bt.add("Wtg2", "Batch water per truck, US gal (truck tank gauge)", "V_bt,US2", "={WtL}*3.785",
       "US gal", planted=("unit-scale", "L to US gal multiplied by 3.785: wrong way round"))
bt.heading("Cement")
bt.add("Cm", "Cement (Mix sheet)", "C", "=Mix!B6", "kg/m³")
bt.add("CmUS", "Cement, lb/yd³", "C_US", "={Cm}*1.6856", "lb/yd³")
bt.add("WcUS2", "Coarse aggregate SSD, lb/yd³ (US client's submittal)", "W_c,US2", "={Wc}*0.5933",
       "lb/yd³", planted=("unit-scale", "kg/m³ to lb/yd³ multiplied by 0.5933: wrong way round"))
bt.add("Cday", "Cement for today", "C_d", "={Cm}*{Vo}/1000", "t")
bt.add("Cday2", "Cement for today (silo report)", "C_d2", "={Cm}*{Vo}", "t",
       planted=("unit-scale", "kg written as t: the /1000 missing"))
bt.add("Cst", "Cement for today, short tons", "C_d,US", "={Cday}*1.1023", "ton")
bt.add("Ds", "Silo diameter", "D_s", 3.6, "m")
bt.add("Hs", "Silo cylinder height", "H_s", 11, "m")
bt.add("rb", "Cement bulk density in the silo", "ρ_b", 1.4, "t/m³")
bt.add("Vs", "Silo volume (cylinder only)", "V_s", "=PI()/4*{Ds}^2*{Hs}", "m³")
bt.add("Cs", "Silo capacity", "C_s", "={Vs}*{rb}", "t")
bt.add("Lev", "Silo level (radar, this morning)", "L_s", 38, "%")
bt.add("Cin", "Cement in the silo this morning", "C_in", "={Cs}*{Lev}/100", "t")
bt.add("res", "Reserve to hold at close", "C_r", 20, "t")
bt.add("Cneed", "Cement to be delivered today", "C_n", "=MAX(0,{Cday}-{Cin}+{res})", "t")
bt.add("Ctk", "Pneumatic tanker payload (US-built trailer)", "C_tk", 26, "ton")
bt.add("ntk", "Tanker deliveries", "n_tk", "=ROUNDUP({Cneed}/({Ctk}*0.9072),0)", "-")
bt.add("ntk2", "Tanker deliveries (first draft)", "n_tk2", "=ROUNDUP({Cneed}/{Ctk},0)", "-",
       planted=("unit-scale", "t over short tons without the 0.9072: 1.10 too large"))
bt.heading("Admixture")
bt.add("dose", "Water reducer dose", "d_a", 400, "mL/100 kg")
bt.add("adm", "Water reducer per m³", "a", "={dose}*{Cm}/100/1000", "L/m³")
bt.add("adm2", "Water reducer per m³ (batch panel setting)", "a_2", "={dose}*{Cm}/1000", "L/m³",
       planted=("unit-scale", "the /100 for the dose's 100 kg missing: 100 too large"))
bt.add("admd", "Water reducer today", "a_d", "={adm}*{Vo}", "L")
bt.heading("Checks")
bt.add("wcm", "Water to cementitious materials ratio", "w/cm", "=Mix!B8/(Mix!B6+Mix!B7)", "-")
bt.add("rf", "Fresh density (Mix sheet)", "ρ_f", "=Mix!B12", "kg/m³")
bt.add("mt", "Load mass per truck", "m_t", "={rf}*{Vt}/1000", "t")
bt.add("ta", "Aggregate temperature (stockpile)", "T_a", 24, "°C")
bt.add("tc", "Cement temperature (silo)", "T_c", 55, "°C")
bt.add("tw", "Batch water temperature (chilled tank)", "T_w", 12, "°C")
bt.add("Tf", "Fresh concrete temperature (ACI 305R)", "T_f",
       "=(0.22*({ta}*({Wc}+{Ws})+{tc}*({Cm}+Mix!B7))+{tw}*{Wb}+{ta}*({fwc}+{fws}))"
       "/(0.22*({Wc}+{Ws}+{Cm}+Mix!B7)+{Wb}+{fwc}+{fws})", "°C")
bt.add("TfF", "Fresh concrete temperature, °F", "T_f,F", "={Tf}*1.8+32", "°F")
bt.add("TfF2", "Fresh concrete temperature, °F (US client's report)", "T_f,F2", "={Tf}*1.8", "°F",
       planted=("unit-scale", "°C to °F without the +32"))
BATCHS = bt.finish()

MIX = {
    "A1": "Mix C32-P20 design per m³, aggregates SSD (invented mix)",
    "A2": "Sources: absolute volume = mass/(relative density × 1000 kg/m³), ACI 211.1 (from "
          "memory); relative densities from the invented lab reports; air 2 % entrapped.",
    "A3": CAUTION,
    "A5": "Material", "B5": "Mass [kg/m³]", "C5": "Relative density [-]",
    "D5": "Absolute volume [m³/m³]",
    "A11": "Entrapped air (2 %)", "D11": 0.02,
    "A12": "Total (fresh density; yield)", "B12": "=SUM(B6:B10)", "D12": "=SUM(D6:D11)",
}
for r, (name, m, rd) in enumerate([("Cement (GU)", 360, 3.15), ("Fly ash (class F)", 60, 2.30),
                                   ("Free water", 170, 1.00), ("Coarse aggregate 20 mm", 1020, 2.68),
                                   ("Sand", 760, 2.64)], start=6):
    MIX[f"A{r}"], MIX[f"B{r}"], MIX[f"C{r}"] = name, m, rd
    MIX[f"D{r}"] = f"=B{r}/(C{r}*1000)"
MIX["D7"] = "=B7/C7"
MIX_PLANTED = {"Mix!D7": ("unit-scale", "relative density used without ρ_w = 1000 kg/m³: the "
                                        "/1000 missing")}

RMXB = {
    "trade": "ready-mix concrete: batching, moisture corrections, cement silo and trucks",
    "sheets": [("Batch", BATCHS), ("Mix", MIX)],
    "planted": {**bt.planted, **MIX_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 4: district heating substation (kW, MBH, %, °C, °F, K, Δ°F, kg/m³, kJ/(kg·K), m³/h,
# m³/s, L/s, gpm, W/(m²·K), m², ft², kPa, ft, hp, bar(g), bar a, bar, MWh, h)
# --------------------------------------------------------------------------------------------
DH_SRC = (
    "Sources: heat to water Q = ρ·c_p·V̇·ΔT (common practice) and the district-heating check "
    "V̇(m³/h) = 0.86·Q(kW)/ΔT(K) (860 kcal/h per kW, common practice); US check gpm = "
    "Btu/h/(500·ΔT(°F)) (common practice); LMTD = (ΔT_1 − ΔT_2)/ln(ΔT_1/ΔT_2) in counterflow, "
    "Incropera, Fundamentals of Heat and Mass Transfer, 7th ed., ch. 11 (from memory); plate "
    "area A = Q/(U·LMTD) with U the maker's (invented); water 977.8 kg/m³ at 70 °C, 984.4 "
    "kg/m³ at 57.5 °C, c_p 4.19 kJ/(kg·K), saturation 0.702 bar a at 90 °C (steam tables, "
    "IAPWS-IF97, from memory); pump power P = V̇·Δp/η (common practice) and bhp = gpm·ft/"
    "(3960·η) (Hydraulic Institute, from memory); NIST SP 811 (2008) App. B.8: 1 kW = 3.412 "
    "MBH, 1 MBH = 0.2931 kW, 1 m³/h = 4.403 gpm, 1 m² = 10.76 ft², 1 kPa = 0.3346 ft of "
    "water, 1 bar = 100 kPa; °F = 1.8·°C + 32, 1 K = 1.8 Δ°F. Building, substation and "
    "readings invented.")
ss = ItemSheet("Substation", "Ashgrove Court apartments (invented): indirect district heating "
               "substation, plate heat exchanger and secondary pump", DH_SRC)
ss.heading("Heat load")
ss.add("Qc", "Connected load (Loads sheet)", "Q_c", "=Loads!D10", "kW")
ss.add("fd", "Diversity on the connected load", "f_d", 88, "%")
ss.add("Q", "Design load at the substation", "Q", "={Qc}*{fd}/100", "kW")
ss.add("QM", "Design load, MBH", "Q_M", "={Q}*3.412", "MBH")
ss.add("QM2", "Design load, MBH (US reviewer's sheet)", "Q_M2", "={Q}*3412", "MBH",
       planted=("unit-scale", "kW to Btu/h written as MBH: 1000 too large"))
ss.heading("Temperatures")
ss.add("tps", "Primary supply", "t_ps", 90, "°C")
ss.add("tpr", "Primary return", "t_pr", 50, "°C")
ss.add("tss", "Secondary flow", "t_ss", 70, "°C")
ss.add("tsr", "Secondary return", "t_sr", 45, "°C")
ss.add("dTp", "Primary temperature drop", "ΔT_p", "={tps}-{tpr}", "K")
ss.add("dTs", "Secondary temperature rise", "ΔT_s", "={tss}-{tsr}", "K")
ss.add("dTpF", "Primary temperature drop, Δ°F", "ΔT_p,F", "={dTp}*1.8", "Δ°F")
ss.add("dTpF2", "Primary temperature drop, Δ°F (US reviewer's sheet)", "ΔT_p,F2",
       "={dTp}*1.8+32", "Δ°F", planted=("unit-scale", "the +32 of a reading added to a "
                                                      "difference"))
ss.add("dTsF", "Secondary temperature rise, Δ°F", "ΔT_s,F", "={dTs}*1.8", "Δ°F")
ss.add("tpsF", "Primary supply, °F", "t_ps,F", "={tps}*1.8+32", "°F")
ss.heading("Flows")
ss.add("rp", "Water density at 70 °C (primary mean)", "ρ_p", 977.8, "kg/m³")
ss.add("rs", "Water density at 57.5 °C (secondary mean)", "ρ_s", 984.4, "kg/m³")
ss.add("cp", "Specific heat of water", "c_p", 4.19, "kJ/(kg·K)")
ss.add("Qp", "Primary flow", "V_p", "={Q}/({rp}*{cp}*{dTp})*3600", "m³/h")
ss.add("Qp2", "Primary flow (first draft)", "V_p2", "={Q}/({rp}*{cp}*{dTp})", "m³/h",
       planted=("unit-scale", "m³/s written as m³/h: the *3600 missing"))
ss.add("Qpc", "Primary flow, 0.86 rule (check)", "V_p,chk", "=0.86*{Q}/{dTp}", "m³/h")
ss.add("QpLs", "Primary flow, L/s", "V_p,L", "={Qp}/3.6", "L/s")
ss.add("Qs", "Secondary flow", "V_s", "={Q}/({rs}*{cp}*{dTs})*3600", "m³/h")
ss.add("QsLs2", "Secondary flow, L/s (pump schedule)", "V_s,L2", "={Qs}*3.6", "L/s",
       planted=("unit-scale", "m³/h to L/s multiplied by 3.6: wrong way round"))
ss.add("Qsg", "Secondary flow, gpm", "V_s,US", "={Qs}*4.403", "gpm")
ss.add("Qsgc", "Secondary flow, gpm (500 rule check)", "V_s,US,chk", "={QM}*1000/(500*{dTsF})",
       "gpm")
ss.heading("Plate heat exchanger")
ss.add("dT1", "Temperature difference at the hot end", "ΔT_1", "={tps}-{tss}", "K")
ss.add("dT2", "Temperature difference at the cold end", "ΔT_2", "={tpr}-{tsr}", "K")
ss.add("LMTD", "Log mean temperature difference", "LMTD", "=({dT1}-{dT2})/LN({dT1}/{dT2})", "K")
ss.add("LMTDF", "Log mean temperature difference, Δ°F", "LMTD_F", "={LMTD}*1.8", "Δ°F")
ss.add("U", "Overall coefficient (maker's selection, invented)", "U", 5200, "W/(m²·K)")
ss.add("A", "Required heat transfer area", "A", "={Q}*1000/({U}*{LMTD})", "m²")
ss.add("A2", "Required heat transfer area (first draft)", "A_2", "={Q}/({U}*{LMTD})", "m²",
       planted=("unit-scale", "kW over W/(m²·K): 1000 too small"))
ss.add("Aft", "Required heat transfer area, ft²", "A_US", "={A}*10.76", "ft²")
ss.add("np", "Plates in the selected pack", "n_p", 40, "-")
ss.add("ap", "Effective area per plate", "a_p", 0.26, "m²")
ss.add("Ain", "Installed area (end plates do not transfer)", "A_in", "=({np}-2)*{ap}", "m²")
ss.heading("Secondary pump")
ss.add("dps1", "Secondary index circuit loss", "Δp_1", 95, "kPa")
ss.add("dps2", "Exchanger secondary side loss (maker)", "Δp_2", 28, "kPa")
ss.add("dps", "Secondary pump head", "Δp", "={dps1}+{dps2}", "kPa")
ss.add("Hft", "Secondary pump head, ft", "H", "={dps}*0.3346", "ft")
ss.add("Hft2", "Secondary pump head, ft (US pump curve)", "H_2", "={dps}*2.31", "ft",
       planted=("unit-scale", "the ft-per-psi factor applied to kPa: 6.9 too large"))
ss.add("eta", "Pump and motor efficiency", "η", 62, "%")
ss.add("Pp", "Secondary pump input power", "P", "={Qs}*{dps}/3600/({eta}/100)", "kW")
ss.add("Pp2", "Secondary pump input power (load list)", "P_2", "={Qs}*{dps}/3600/{eta}", "kW",
       planted=("unit-scale", "efficiency in % used as a fraction: 100 too small"))
ss.add("bhp", "Secondary pump brake horsepower (US check)", "P_US", "={Qsg}*{Hft}/(3960*{eta}/100)",
       "hp")
ss.heading("Primary pressures")
ss.add("pps", "Primary supply pressure at the substation", "p_ps", 6.2, "bar(g)")
ss.add("ppr", "Primary return pressure at the substation", "p_pr", 4.9, "bar(g)")
ss.add("dpa", "Differential pressure available", "Δp_a", "={pps}-{ppr}", "bar")
ss.add("dpak", "Differential pressure available, kPa", "Δp_a,kPa", "={dpa}*100", "kPa")
ss.add("patm", "Atmospheric pressure", "p_atm", 1.013, "bar a")
ss.add("psat", "Saturation pressure of water at 90 °C", "p_sat", 0.702, "bar a")
ss.add("ppsa", "Primary supply pressure, absolute", "p_ps,a", "={pps}+{patm}", "bar a")
ss.add("msat", "Margin above saturation at the primary supply", "Δp_sat", "={ppsa}-{psat}", "bar")
ss.add("msat2", "Margin above saturation (first draft)", "Δp_sat2", "={pps}-{psat}", "bar",
       planted=("offset-scale", "a gauge reading less an absolute one"))
ss.heading("Annual")
ss.add("E", "Heat delivered last year (heat meter)", "E", 1150, "MWh")
ss.add("hfl", "Equivalent full-load hours", "t_fl", "={E}*1000/{Q}", "h")
SUBS = ss.finish()

LOADS = {
    "A1": "Connected heat loads by building part (invented; the retail unit's from its tenant's "
          "US engineer, in MBH)",
    "A2": "Sources: designers' load schedules (invented); 1 MBH = 0.2931 kW (NIST SP 811 (2008) "
          "App. B.8).",
    "A3": CAUTION,
    "A5": "Building part", "B5": "Space heating [kW]", "C5": "Hot water, diversified [kW]",
    "D5": "Total [kW]", "E5": "Tenant's figure [MBH]",
    "A10": "Connected load", "D10": "=SUM(D6:D9)",
}
for r, (name, h, w) in enumerate([("Block A (36 flats)", 150, 60), ("Block B (32 flats)", 140, 55),
                                  ("Block C (20 flats)", 95, 40)], start=6):
    LOADS[f"A{r}"], LOADS[f"B{r}"], LOADS[f"C{r}"] = name, h, w
    LOADS[f"D{r}"] = f"=B{r}+C{r}"
LOADS["A9"], LOADS["E9"], LOADS["C9"] = "Ground-floor retail unit", 170.6, 0
LOADS["B9"] = "=E9*293.1"
LOADS["D9"] = "=B9+C9"
LOADS_PLANTED = {"Loads!B9": ("unit-scale", "MBH times 293.1 gives W, written as kW: 1000 too "
                                            "large")}

DHB = {
    "trade": "district heating: indirect substation, plate exchanger, flows and secondary pump",
    "sheets": [("Substation", SUBS), ("Loads", LOADS)],
    "planted": {**ss.planted, **LOADS_PLANTED},
}

BOOKS = {"wok-hood-makeup-air": HOODB, "lox-vie-hospital": VIEB,
         "readymix-batching": RMXB, "dh-substation-phx": DHB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()
