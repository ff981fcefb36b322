#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review39), written with the
standard library only (corpus/sheets/xlsx_writer.py and item_sheet.py, shared by the review
books), adapted from corpus/sheets/review19/make_books.py.

Trades: a fan and pump variable-speed drive energy savings sheet; a steam trap survey; a road
culvert hydraulics sheet; an ice rink refrigeration load sheet. All scenarios, sites, readings
and catalogue data are invented (demonstration only); the formulas and published factors are the
trade's own, with their sources named in a text cell at the top of each sheet.

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. The findings plumb makes beyond the planted ones, and the planted cells it
misses, are recorded with their reasons in review_notes.py (EXTRA, MISSED, RENAMED, MESSAGES)
after running the binary of the day.

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
# Book 1: fan and pump variable-speed drive energy savings (hp and kW, cfm and m³/s,
# in. w.g. and Pa, gpm, ft and m, % and rpm, h/yr, $/kWh)
# --------------------------------------------------------------------------------------------
VSD_SRC = (
    "Sources: affinity laws Q ∝ N, H ∝ N², P ∝ N³, Hydraulic Institute & Europump, 'Variable "
    "Speed Pumping: A Guide to Successful Applications' (2004) ch. 2, and AMCA Publication "
    "201-02 'Fans and Systems' (both from memory); fan air power = cfm × in. w.g. / 6356 hp, "
    "ASHRAE Handbook—HVAC Systems and Equipment (2020) ch. 21 (from memory); pump bhp = gpm × "
    "ft / (3960 × η), Cameron Hydraulic Data 19th ed. (from memory); Δp = ρ·g·H and "
    "P = Q·Δp/η: common practice; air density ρ = p/(R·T), R = 287.05 J/(kg·K) for dry air, "
    "ISO 2533:1975 (from memory); standard air 1.2 kg/m³, AMCA 210 (from memory); NIST SP 811 "
    "(2008) App. B.8 (1 hp = 0.7457 kW; 1 m³/s = 2119 cfm; 1 in. H₂O = 249.1 Pa; 3.281 ft/m); "
    "NEMA Premium full-load efficiencies, NEMA MG 1-2016 Table 12-12, 4-pole enclosed (from "
    "memory). Outlet-damper part-load power shape after US DOE 'Improving Fan System "
    "Performance: A Sourcebook for Industry' (2003) (from memory; values invented). System "
    "curve with a differential-pressure setpoint H = H_c + (H_d − H_c)·(Q/Q_d)²: common "
    "practice. Efficiencies held at their design values at part load (a simplification). "
    "Tariff, hours, costs and all plant data invented.")

basis = ItemSheet("Basis", "Hallow Street distribution centre: AHU-3 supply fan and CHW pump P-2 "
                  "variable-speed drive retrofit, basis (invented scenario)", VSD_SRC)
basis.add("tariff", "Blended electricity tariff", "c_e", 0.118, "$/kWh")
basis.add("hours", "Operating hours (AHU-3 and CHW plant)", "t_op", 6240, "h/yr")
basis.add("etav", "VFD efficiency at part load", "eta_VFD", 96.5, "%")
basis.add("cost", "Installed cost, two VFDs with bypass", "C_inst", 41500, "$")
basis.add("rebate", "Utility rebate", "R_util", 6000, "$")
basis.add("ef", "Grid emission factor", "EF", 0.42, "kg/kWh")
basis.add("ctrl", "Drive cooling fans and controls, both drives", "P_ctrl", 380, "W")
basis.add("hurdle", "Simple payback hurdle", "n_max", 3, "yr")
BASIS = basis.finish()

fan = ItemSheet("Fan", "AHU-3 supply fan SF-3: design point and constant-speed baseline",
                "Sources: as the Basis sheet (fan air power cfm × in. w.g. / 6356, ASHRAE "
                "HVAC S&E 2020 ch. 21; NIST SP 811 factors 0.7457 kW/hp, 2119 cfm per m³/s, "
                "249.1 Pa per in. H₂O; ρ = p/(R·T), R = 287.05 J/(kg·K)).")
fan.add("hp", "Motor nameplate", "P_n,hp", 60, "hp")
fan.add("kWn", "Motor rating", "P_n", "={hp}*0.7457", "kW")
fan.add("etam", "Motor full-load efficiency (NEMA Premium)", "eta_m",
        "=VLOOKUP({hp},Motors!A5:C12,2,FALSE)", "%")
fan.add("rpm", "Motor full-load speed", "N_d", "=VLOOKUP({hp},Motors!A5:C12,3,FALSE)", "rpm")
fan.add("Q", "Design airflow", "Q_d", 36000, "cfm")
fan.add("Qsi", "Design airflow, SI", "Q_d,SI", "={Q}/2119", "m³/s")
fan.add("dp", "Fan total pressure at design", "p_t", 4.2, "in. w.g.")
fan.add("dpPa", "Fan total pressure, SI", "p_t,SI", "={dp}*249.1", "Pa")
fan.add("etaf", "Fan total efficiency at design (fan curve)", "eta_f", 66, "%")
fan.add("bhp", "Fan shaft power at design (standard air)", "P_sh,hp", "={Q}*{dp}/(6356*{etaf}/100)",
        "hp")
fan.add("Psh", "Fan shaft power at design, kW", "P_sh", "={bhp}*0.7457", "kW")
fan.add("Psh2", "Fan shaft power, SI check", "P_sh,SI", "={Qsi}*{dpPa}/({etaf}/100)", "kW",
        planted=("unit-scale", "Q·Δp/η in m³/s and Pa gives W, written as kW: 1000 too large"))
fan.add("LF", "Motor load at design", "LF", "={Psh}/{kWn}*100", "%")
fan.add("pamb", "Site barometric pressure (invented)", "p_b", 97.8, "kPa")
fan.add("tair", "Supply air temperature at the fan", "t_a", 16, "°C")
fan.add("rho", "Air density at the fan", "rho_a", "={pamb}*1000/(287.05*({tair}+273.15))",
        "kg/m³")
fan.add("tcoil", "Air temperature leaving the cooling coil", "t_c", 13, "°C")
fan.add("rhoc", "Air density leaving the coil (for the coil selection)", "rho_c",
        "={pamb}*1000/(287.05*{tcoil})", "kg/m³",
        planted=("offset-scale", "ρ = p/(R·T) with the temperature in °C, not K"))
fan.add("rhostd", "Standard air density", "rho_std", 1.2, "kg/m³")
fan.add("Psite", "Fan shaft power at site density", "P_sh,site", "={Psh}*{rho}/{rhostd}", "kW")
fan.add("Pin", "Motor input at design (constant speed)", "P_in", "={Psite}/({etam}/100)", "kW")
fan.add("minspd", "Minimum speed (motor cooling, common practice)", "n_min", 40, "%")
FAN = fan.finish()

pump = ItemSheet("Pump", "CHW secondary pump P-2: design point, baseline and VFD at average flow",
                 "Sources: as the Basis sheet (bhp = gpm × ft / (3960 × η), Cameron Hydraulic "
                 "Data 19th ed.; Δp = ρ·g·H; system curve with a DP setpoint, common practice; "
                 "NIST SP 811 factors 0.7457 kW/hp and 3.281 ft/m). Baseline: constant speed "
                 "with three-way valves, input taken as the design input all year (common "
                 "practice).")
pump.add("hp", "Motor nameplate", "P_n,hp", 40, "hp")
pump.add("kWn", "Motor rating", "P_n", "={hp}/0.7457", "kW",
         planted=("unit-scale", "hp to kW divided by 0.7457: wrong way round"))
pump.add("etam", "Motor full-load efficiency (NEMA Premium)", "eta_m",
         "=VLOOKUP({hp},Motors!A5:C12,2,FALSE)", "%")
pump.add("Q", "Design flow", "Q_d", 1100, "gpm")
pump.add("H", "Design head", "H_d", 92, "ft")
pump.add("Hc", "Control head (DP sensor setpoint)", "H_c", 35, "ft")
pump.add("etap", "Pump efficiency at design", "eta_p", 79, "%")
pump.add("bhp", "Pump shaft power at design", "P_sh", "={Q}*{H}/(3960*{etap}/100)", "hp")
pump.add("Hm", "Design head, m", "H_d,m", "={H}/3.281", "m")
pump.add("rho", "Chilled water density", "rho", 999, "kg/m³")
pump.add("g", "Gravity", "g", 9.81, "m/s²")
pump.add("dpk", "Pump differential pressure at design", "Δp",
         "={rho}*{Hm}/1000", "kPa",
         planted=("result-unit", "Δp = ρ·g·H with g left out"))
pump.add("Pin", "Motor input, constant speed", "P_in", "={bhp}*0.7457/({etam}/100)", "kW")
pump.add("favg", "Average flow, share of design (trend logs)", "f_avg", 60, "%")
pump.add("Havg", "Head at average flow on the system curve", "H_avg",
         "={Hc}+({H}-{Hc})*({favg}/100)^2", "ft")
pump.add("bhpavg", "Pump shaft power at average flow", "P_sh,avg",
         "={Q}*{favg}/100*{Havg}/(3960*{etap}/100)", "hp")
pump.add("Pvfd", "Input with VFD at average flow", "P_VFD",
         "={bhpavg}*0.7457/({etam}/100)/({Basis.etav}/100)", "kW")
pump.add("Esave", "Pump energy saving", "ΔE_p", "=({Pin}-{Pvfd})*{Basis.hours}", "kWh/yr")
PUMP = pump.finish([basis])

MOTORS = {
    "A2": CAUTION,
    "A1": "Motors: NEMA Premium full-load efficiency, 4-pole enclosed (from memory of NEMA MG "
          "1-2016 Table 12-12; check the nameplate) and typical full-load speed (invented)",
    "A4": "Motor [hp]", "B4": "Full-load efficiency [%]", "C4": "Full-load speed [rpm]",
}
for r, (hp, eff, n) in enumerate([(15, 92.4, 1765), (20, 93.0, 1765), (25, 93.6, 1770),
                                  (30, 93.6, 1770), (40, 94.1, 1775), (50, 94.5, 1775),
                                  (60, 95.0, 1780), (75, 95.4, 1780)], start=5):
    MOTORS[f"A{r}"], MOTORS[f"B{r}"], MOTORS[f"C{r}"] = hp, eff, n

DAMPER = {
    "A2": CAUTION,
    "A1": "Outlet damper: motor input at part flow, share of design input (shape after US DOE "
          "fan sourcebook 2003 curves, from memory; values invented)",
    "A4": "Airflow [%]", "B4": "Input, outlet damper [%]",
}
for r, (q, p) in enumerate([(40, 72), (55, 80), (70, 87), (85, 94), (100, 100)], start=5):
    DAMPER[f"A{r}"], DAMPER[f"B{r}"] = q, p

F = fan.ref
PROFILE = {
    "A1": "AHU-3 supply fan: airflow bins over the year, VFD against outlet damper (invented "
          "trend data)",
    "A2": ("Sources: as the Basis sheet: speed ratio = flow ratio, floored at the minimum speed; "
           "shaft power ∝ (speed ratio)³ (fan laws, AMCA 201-02, from memory); damper input from "
           "the Damper sheet; energy = input × operating hours × time share."),
    "A3": CAUTION,
    "A4": "Airflow [%]", "B4": "Time at this flow [%]", "C4": "Fan speed [%]",
    "D4": "Fan speed [rpm]", "E4": "Input with VFD [kW]", "F4": "Input with damper [kW]",
    "G4": "Energy with VFD [kWh/yr]", "H4": "Energy with damper [kWh/yr]",
    "A9": "Total / time-weighted",
    "B9": "=SUM(B5:B8)", "D9": "=SUMPRODUCT(B5:B8,D5:D8)/100", "G9": "=SUM(G5:G8)",
    "H9": "=SUM(H5:H8)",
    "A10": "Lowest speed in the profile", "C10": "=MIN(C5:D8)",
}
hours = basis.ref("hours")
etav = basis.ref("etav")
for r, (q, share) in enumerate([(100, 10), (85, 30), (70, 35), (55, 25)], start=5):
    PROFILE[f"A{r}"], PROFILE[f"B{r}"] = q, share
    PROFILE[f"C{r}"] = f"=MAX(A{r},{F('minspd')})"
    PROFILE[f"D{r}"] = f"={F('rpm')}*C{r}/100"
    PROFILE[f"E{r}"] = f"={F('Psite')}*(C{r}/100)^3/({F('etam')}/100)/({etav}/100)"
    PROFILE[f"F{r}"] = f"={F('Pin')}*VLOOKUP(A{r},Damper!A5:B9,2,FALSE)/100"
    PROFILE[f"G{r}"] = f"=E{r}*{hours}*B{r}/100"
    PROFILE[f"H{r}"] = f"=F{r}*{hours}*B{r}/100"
PROFILE["D7"] = f"={F('rpm')}*C7"                                               # planted
PROFILE["E6"] = f"={F('Psite')}*C6^3/({F('etam')}/100)/({etav}/100)"            # planted

summ = ItemSheet("Summary", "Hallow Street VFD retrofit: savings summary for the capital request",
                 "Sources: as the Basis sheet; simple payback = net cost / annual cost saving "
                 "(common practice).")
summ.add("Esave", "Annual energy saving, fan and pump", "ΔE",
         "=FanProfile!H9-FanProfile!G9+{Pump.Esave}", "kWh/yr")
summ.add("EsaveM", "Annual energy saving (M&V report table)", "ΔE_MWh", "={Esave}", "MWh/yr",
         planted=("unit-scale", "kWh/yr figure carried into a MWh/yr cell: 1000 too large"))
summ.add("pct", "Saving, share of baseline", "s",
         "={Esave}/(FanProfile!H9+{Pump.Pin}*{Basis.hours})*100", "%")
summ.add("Csave", "Annual cost saving", "ΔC", "={Esave}*{Basis.tariff}", "$/yr")
summ.add("pb", "Simple payback", "n_pb", "=({Basis.cost}-{Basis.rebate})/{Csave}", "yr")
summ.add("pbchk", "Payback check", "check", "=IF({pb}<={Basis.hurdle},\"Meets hurdle\",\"Review\")")
summ.add("co2", "Avoided emissions", "ΔCO2", "={Esave}*{Basis.ef}/1000", "t/yr")
summ.add("conn", "Connected load, both drives (for the MCC schedule)", "P_conn",
         "={Fan.kWn}+{Pump.kWn}+{Basis.ctrl}", "kW",
         planted=("unit-scale", "control load in W added to motor ratings in kW"))
SUMMARY = summ.finish([basis, fan, pump])

VSD = {
    "trade": "HVAC energy: fan and pump variable-speed drive savings",
    "sheets": [("Basis", BASIS), ("Fan", FAN), ("Pump", PUMP), ("FanProfile", PROFILE),
               ("Summary", SUMMARY), ("Motors", MOTORS), ("Damper", DAMPER)],
    "planted": {**fan.planted, **pump.planted, **summ.planted,
                "FanProfile!D7": ("unit-scale", "rpm × speed in % without the /100: 100 too "
                                  "large"),
                "FanProfile!E6": ("unit-scale", "fan law with the speed in % cubed as if a "
                                  "fraction: 10⁶ too large"),
                "FanProfile!C10": ("mixed-range", "lowest speed taken over the % and rpm "
                                   "columns together")},
}


# --------------------------------------------------------------------------------------------
# Book 2: steam trap survey (lb/h and kg/h, psig and bar g, in and mm, $/1000 lb, Btu/lb, kW)
# --------------------------------------------------------------------------------------------
TRAP_SRC = (
    "Sources: steam loss through a failed-open trap W = 24.24 · P · D² (W in lb/h, P in psia, "
    "D orifice in in), US DOE Steam Tip Sheet #1 'Inspect and Repair Steam Traps' (2012) (from "
    "memory); cost of steam = fuel price × (h_steam − h_feedwater) / boiler efficiency, US DOE "
    "Steam Tip Sheet #15 'Benchmark the Fuel Cost of Steam Generation' (2012) (from memory); "
    "enthalpies and latent heats from the steam tables as printed in Spirax Sarco, 'The Steam "
    "and Condensate Loop' (2007) Block 2 (from memory); loss factor by trap status (leaking 25 %, "
    "blowing 100 %): common practice of survey reports (from memory); CO₂ 53.06 kg per MMBtu "
    "of natural gas, US EPA 40 CFR 98 Subpart C Table C-1 (from memory); NIST SP 811 (2008) "
    "App. B.8 (1 lb = 0.4536 kg, 2.205 lb/kg; 1 in = 25.4 mm; 1 bar = 14.50 psi; 1 kW = 3412 "
    "Btu/h); standard atmosphere 14.7 psia (common practice; site barometer differs). "
    "Plant, trap readings and prices invented.")
tb = ItemSheet("Basis", "Oakhurst Dairy, Fenwick Road plant: steam trap survey, basis (invented "
               "scenario)", TRAP_SRC)
tb.add("patm", "Atmospheric pressure", "p_atm", 14.7, "psia")
tb.add("hours", "Steam system operating hours", "t_op", 8400, "h/yr")
tb.add("fuel", "Natural gas price", "c_f", 7.20, "$/MMBtu")
tb.add("etab", "Boiler efficiency, fuel to steam", "eta_b", 82, "%")
tb.add("hs", "Enthalpy of steam leaving the boiler (125 psig, saturated)", "h_s", 1193, "Btu/lb")
tb.add("hfw", "Enthalpy of feedwater (227 °F)", "h_fw", 195, "Btu/lb")
tb.add("cost", "Cost of steam", "c_s", "={fuel}*({hs}-{hfw})/10^6*1000/({etab}/100)",
       "$/1000 lb")
tb.add("costt", "Cost of steam per tonne", "c_s,t", "={cost}*2.205", "$/t")
tb.add("repair", "Repair cost per trap (invented quote)", "c_r", 450, "$")
tb.add("co2f", "CO₂ per MMBtu of natural gas", "EF", 53.06, "kg/MMBtu")
TBASIS = tb.finish()

FACTORS = {
    "A2": CAUTION,
    "A1": "Steam loss factor by trap status (share of the full-orifice loss; common practice of "
          "survey reports, from memory)",
    "A4": "Status", "B4": "Loss factor [%]",
}
for r, (s, f) in enumerate([("OK", 0), ("Leaking", 25), ("Blowing", 100), ("Cold", 0),
                            ("Plugged", 0)], start=5):
    FACTORS[f"A{r}"], FACTORS[f"B{r}"] = s, f

STEAM = {
    "A2": CAUTION,
    "A1": "Saturated steam: latent heat by gauge pressure (steam tables as printed in Spirax "
          "Sarco 2007, Block 2, from memory; look-up takes the next lower pressure)",
    "A4": "Pressure [psig]", "B4": "Latent heat [Btu/lb]",
}
for r, (p, h) in enumerate([(0, 970), (15, 945), (50, 912), (100, 881), (125, 868), (150, 857)],
                           start=5):
    STEAM[f"A{r}"], STEAM[f"B{r}"] = p, h

CONTR = {
    "A1": "Boiler house and evaporator traps: contractor's ultrasonic survey in SI units "
          "(invented readings)",
    "A2": ("Sources: 1 bar = 14.50 psi; 1 in = 25.4 mm (NIST SP 811 (2008) App. B.8). "
           "Contractor's pressures are gauge readings at the trap inlet."),
    "A3": CAUTION,
    "A4": "Tag", "B4": "Pressure [bar g]", "C4": "Orifice [mm]", "D4": "Pressure [psig]",
    "E4": "Orifice [in]",
}
for r, (tag, p, d) in enumerate([("ST-05", 8.6, 4.8), ("ST-06", 3.5, 6.4), ("ST-07", 1.0, 4.0)],
                                start=5):
    CONTR[f"A{r}"], CONTR[f"B{r}"], CONTR[f"C{r}"] = tag, p, d
    CONTR[f"D{r}"] = f"=B{r}*14.5"
    CONTR[f"E{r}"] = f"=C{r}/25.4"
CONTR["D7"] = "=(B7+1.013)*14.5"          # planted: absolute pressure written as psig

T = tb.ref
SURVEY = {
    "A1": "Fenwick Road plant: steam trap survey, March (invented readings)",
    "A2": ("Sources: as the Basis sheet: W = 24.24 · P_abs · D² × loss factor (US DOE Steam Tip "
           "Sheet #1, from memory); kg/h = lb/h × 0.4536; annual cost = W × hours × cost per "
           "1000 lb / 1000."),
    "A3": CAUTION,
    "A4": "Tag", "B4": "Service", "C4": "Inlet pressure [psig]", "D4": "Orifice [in]",
    "E4": "Status", "F4": "Loss factor [%]", "G4": "Steam loss [lb/h]", "H4": "Steam loss [kg/h]",
    "I4": "Annual cost [$/yr]",
    "A12": "Total", "G12": "=SUM(G5:G11)", "H12": "=SUM(H5:H11)", "I12": "=SUM(I5:I11)",
}
rows = [("ST-01", "Main header drip, boiler house", 125, 0.1875, "Blowing"),
        ("ST-02", "Pasteuriser HX-1", 50, 0.25, "OK"),
        ("ST-03", "Tracer, cream tank farm", 15, 0.125, "Leaking"),
        ("ST-04", "CIP heater", 100, 0.3125, "Blowing"),
        ("ST-05", "Deaerator drip", "=Contractor!D5", "=Contractor!E5", "Leaking"),
        ("ST-06", "Evaporator steam chest", "=Contractor!D6", "=Contractor!E6", "Blowing"),
        ("ST-07", "Boiler feed tank coil", "=Contractor!D7", "=Contractor!E7", "Cold")]
for r, (tag, svc, p, d, status) in enumerate(rows, start=5):
    SURVEY[f"A{r}"], SURVEY[f"B{r}"], SURVEY[f"C{r}"] = tag, svc, p
    SURVEY[f"D{r}"], SURVEY[f"E{r}"] = d, status
    SURVEY[f"F{r}"] = f"=VLOOKUP(E{r},Factors!A5:B9,2,FALSE)"
    SURVEY[f"G{r}"] = f"=24.24*(C{r}+{T('patm')})*D{r}^2*F{r}/100"
    SURVEY[f"H{r}"] = f"=G{r}*0.4536"
    SURVEY[f"I{r}"] = f"=G{r}*{T('hours')}*{T('cost')}/1000"
SURVEY["H5"] = "=G5*2.205"                                            # planted: wrong way
SURVEY["G7"] = f"=24.24*(C7+{T('patm')})*D7^2*F7"                     # planted: % as fraction
SURVEY["G8"] = "=24.24*C8*D8^2*F8/100"                                # planted: gauge for abs.
SURVEY["I9"] = f"=G9*{T('hours')}*{T('cost')}"                        # planted: no /1000
SURVEY["D10"] = "=Contractor!C6"                                      # planted: mm as in

ts = ItemSheet("Summary", "Fenwick Road steam trap survey: summary for the maintenance plan",
               "Sources: as the Basis sheet (heat = W × h_fg / 3412 kW; fuel = W × (h_s − h_fw) "
               "× hours / 10⁶ / η_b MMBtu; CO₂ per EPA 40 CFR 98 Table C-1).")
ts.add("W", "Steam lost through failed traps", "W", "=Survey!G12", "lb/h")
ts.add("Wkg", "Steam lost through failed traps, SI", "W_SI", "=Survey!H12", "kg/h")
ts.add("pmax", "Highest trap inlet pressure surveyed", "p_max",
       "=MAX(Survey!C5:C8,Contractor!B5:B7)", "psig",
       planted=("mixed-range", "maximum over the psig column and the contractor's bar g column"))
ts.add("klb", "Steam lost per year", "m_yr", "={W}*{Basis.hours}/1000", "klb/yr")
ts.add("t", "Steam lost per year, tonnes (for the sustainability report)", "m_t",
       "={W}*{Basis.hours}/1000", "t/yr",
       planted=("unit-scale", "lb/h × h/yr / 1000 taken as tonnes: the lb-to-kg 0.4536 left "
                "out"))
ts.add("hfg", "Latent heat at the main header", "h_fg", "=VLOOKUP(Survey!C5,Steam!A5:B10,2)",
       "Btu/lb")
ts.add("Qkw", "Heat lost with the steam (latent)", "Q", "={W}*{hfg}/3412", "kW")
ts.add("valves", "Bare valve bodies beside the failed traps (6 × 180 W)", "Q_v", 1080, "W")
ts.add("Qtot", "Heat lost, traps and bare valves", "Q_tot", "={Qkw}+{valves}", "kW",
       planted=("unit-scale", "valve losses in W added to a heat loss in kW"))
ts.add("fuelw", "Fuel wasted", "E_f",
       "={W}*({Basis.hs}-{Basis.hfw})*{Basis.hours}/10^6/({Basis.etab}/100)", "MMBtu/yr")
ts.add("cost", "Cost of lost steam", "C", "=Survey!I12", "$/yr")
ts.add("co2", "CO₂ from the wasted fuel", "CO2", "={fuelw}*{Basis.co2f}/1000", "t/yr")
ts.add("nfail", "Traps to repair (blowing or leaking)", "n_r", 5, "-")
ts.add("pb", "Simple payback of the repairs", "n_pb", "={nfail}*{Basis.repair}/{cost}", "yr")
ts.add("prio", "Repair priority", "priority",
       "=IF({pb}<=0.25,\"Repair now\",\"Next planned shutdown\")")
TSUMMARY = ts.finish([tb])

TRAPS = {
    "trade": "steam systems: steam trap survey and loss costing",
    "sheets": [("Basis", TBASIS), ("Survey", SURVEY), ("Contractor", CONTR),
               ("Summary", TSUMMARY), ("Factors", FACTORS), ("Steam", STEAM)],
    "planted": {**ts.planted,
                "Survey!H5": ("unit-scale", "lb/h to kg/h multiplied by 2.205: wrong way round"),
                "Survey!G7": ("unit-scale", "loss factor in % used as a fraction: 100 too large"),
                "Survey!G8": ("offset-scale", "gauge pressure in psig where the formula needs "
                              "psia"),
                "Survey!I9": ("unit-scale", "cost per 1000 lb applied without the /1000: 1000 "
                              "too large"),
                "Survey!D10": ("unit-scale", "orifice in mm carried into the in column"),
                "Contractor!D7": ("offset-scale", "bar g made absolute (+1.013) and written "
                                  "as psig")},
}


# --------------------------------------------------------------------------------------------
# Book 3: road culvert hydraulics (m³/s and cfs, m and ft, ha and acres, mm/h and in/h,
# Manning n, m/s and ft/s)
# --------------------------------------------------------------------------------------------
CULV_SRC = (
    "Sources: FHWA HDS-5 'Hydraulic Design of Highway Culverts' 3rd ed. (FHWA-HIF-12-026, 2012): "
    "outlet control H = (1 + k_e + K_u·n²·L/R^1.33)·V²/(2g), K_u = 19.63 SI and 29 US "
    "customary; h_o = max(TW, (d_c + D)/2); HW_o = H + h_o − L·S; inlet-control HW/D and d_c "
    "read from its charts; entrance loss k_e and Manning n tables (Appendix, from memory). "
    "Manning full-bore capacity Q = (K_u/n)·A·R^(2/3)·S^(1/2), K_u = 1.0 SI, 1.486 US, V. T. "
    "Chow, Open-Channel Hydraulics (1959) ch. 5. Rational method Q = C·i·A/360 (m³/s, mm/h, ha) "
    "and Q = C·i·A (cfs, in/h, acres; the 1.008 taken as 1), FHWA HEC-22 3rd ed. (2009) ch. 3 "
    "(from memory). Kirpich t_c = 0.0195·L^0.77·S^−0.385 (min, L in m), Chow, Maidment & Mays, "
    "Applied Hydrology (1988) ch. 15 (from memory). NIST SP 811 (2008) App. B.8 (3.281 ft/m, "
    "35.31 ft³/m³, 2.471 acres/ha, 25.4 mm/in); g = 9.81 m/s² = 32.2 ft/s² (common practice). "
    "0.3 m freeboard below the road low point: common practice (the local design manual "
    "governs). Catchment, rainfall, levels and chart readings invented.")
hyd = ItemSheet("Hydrology", "Route 14 crossing of Tullow Brook at Marsh Lane: catchment "
                "(invented scenario)", CULV_SRC)
hyd.add("A", "Catchment area", "A", 42, "ha")
hyd.add("Aac", "Catchment area, acres", "A_ac", "={A}*2.471", "acres")
hyd.add("C", "Runoff coefficient (rural, mixed cover)", "C", 0.45, "-")
hyd.add("L", "Longest flow path", "L", 1350, "m")
hyd.add("S", "Average slope of the flow path", "S", 0.018, "m/m")
hyd.add("tc", "Time of concentration (Kirpich)", "t_c", "=0.0195*{L}^0.77*{S}^(-0.385)", "min")
HYD = hyd.finish()

TABLES = {
    "A2": CAUTION,
    "A1": "HDS-5 tables (from memory; check against the manual): Manning n for culvert barrels "
          "and entrance loss coefficients for outlet control",
    "A4": "Material", "B4": "Manning n [-]", "D4": "Inlet", "E4": "Entrance loss k_e [-]",
}
for r, (m, n) in enumerate([("Concrete pipe", 0.012), ("Corrugated metal pipe", 0.024),
                            ("HDPE, smooth wall", 0.012), ("Concrete box", 0.012)], start=5):
    TABLES[f"A{r}"], TABLES[f"B{r}"] = m, n
for r, (i, k) in enumerate([("Headwall, square edge", 0.5), ("Headwall, groove end", 0.2),
                            ("Projecting, groove end", 0.2), ("Mitred to slope", 0.7),
                            ("Projecting, CMP", 0.9)], start=5):
    TABLES[f"D{r}"], TABLES[f"E{r}"] = i, k

cv = ItemSheet("Culvert", "Marsh Lane culvert: 1500 mm concrete pipe, outlet and inlet control "
               "at the 50-year flow", "Sources: as the Hydrology sheet (HDS-5 3rd ed. 2012 "
               "outlet control with K_u = 19.63 SI, 29 US; Manning, Chow 1959; 3.281 ft/m).")
cv.add("mat", "Barrel material", "material", "Concrete pipe")
cv.add("inlet", "Inlet configuration", "inlet", "Headwall, square edge")
cv.add("Dmm", "Barrel diameter", "D_mm", 1500, "mm")
cv.add("D", "Barrel diameter, m", "D", "={Dmm}/1000", "m")
cv.add("A", "Barrel area, full", "A", "=PI()*{D}^2/4", "m²")
cv.add("R", "Hydraulic radius, full", "R", "={Dmm}/4", "m",
       planted=("unit-scale", "R = D/4 from the diameter in mm, written in m: 1000 too large"))
cv.add("L", "Barrel length", "L", 28, "m")
cv.add("S", "Barrel slope", "S_o", 0.012, "m/m")
cv.add("n", "Manning n", "n", "=VLOOKUP({mat},Tables!A5:B8,2,FALSE)", "-")
cv.add("ke", "Entrance loss coefficient", "k_e", "=VLOOKUP({inlet},Tables!D5:E9,2,FALSE)", "-")
cv.add("Qfull", "Full-bore capacity (Manning)", "Q_full", "=1/{n}*{A}*{R}^(2/3)*{S}^0.5", "m³/s")
cv.add("Qd", "Design flow (50-year)", "Q_50", "=Flows!C7", "m³/s")
cv.add("qchk", "Capacity check", "check_Q", "=IF({Qd}<={Qfull},\"OK\",\"SURCHARGED\")")
cv.add("V", "Barrel velocity, full bore", "V", "={Qd}/{A}", "m/s")
cv.add("g", "Gravity", "g", 9.81, "m/s²")
cv.add("hv", "Velocity head", "h_v", "={V}^2/(2*{g})", "m")
cv.add("kf", "Friction term K_u·n²·L/R^1.33 (SI, K_u = 19.63)", "k_f",
       "=19.63*{n}^2*{L}/{R}^1.33", "-")
cv.add("H", "Outlet-control head loss", "H", "=(1+{ke}+{kf})*{hv}", "m")
cv.add("dc", "Critical depth (HDS-5 chart, invented reading)", "d_c", 1.05, "m")
cv.add("TW", "Tailwater depth (channel normal depth, invented)", "TW", 0.70, "m")
cv.add("ho", "Outlet reference depth h_o", "h_o", "=MAX({TW},({dc}+{D})/2)", "m")
cv.add("HWo", "Headwater, outlet control", "HW_o", "={H}+{ho}-{L}*{S}", "m")
cv.add("HWD", "Inlet control HW/D (HDS-5 chart, invented reading)", "HW/D", 1.02, "-")
cv.add("HWi", "Headwater, inlet control", "HW_i", "={HWD}*{D}", "m")
cv.add("HW", "Design headwater", "HW", "=MAX({HWi},{HWo})", "m")
cv.add("ctrl", "Governing control", "control",
       "=IF({HWi}>={HWo},\"Inlet control\",\"Outlet control\")")
cv.add("inv", "Inlet invert level", "z_inv", 101.20, "m")
cv.add("road", "Road low point level", "z_road", 104.10, "m")
cv.add("fb", "Freeboard required (common practice)", "fb_req", 0.3, "m")
cv.add("EL", "Headwater level", "z_HW", "={inv}+{HW}", "m")
cv.add("fbp", "Freeboard provided", "fb", "={road}-{EL}", "m")
cv.add("chk", "Freeboard check", "check_fb", "=IF({fbp}>={fb},\"OK\",\"RAISE ROAD / UPSIZE\")")
cv.add("Lft", "Barrel length, ft (US reviewer's check)", "L_ft", "={L}*3.281", "ft")
cv.add("Rft", "Hydraulic radius, ft", "R_ft", "={R}*3.281", "ft")
cv.add("Vft", "Barrel velocity, ft/s", "V_ft", "={V}*3.281", "ft/s")
cv.add("gus", "Gravity, US", "g_US", 32.2, "ft/s²")
cv.add("hvft", "Velocity head, ft", "h_v,ft", "={Vft}^2/(2*{g})", "ft",
       planted=("unit-scale", "V² in ft²/s² over 2g with g in m/s²: 3.281 too large"))
cv.add("Hus", "Outlet-control head loss, US form (K_u = 29)", "H_US",
       "=(1+{ke}+29*{n}^2*{Lft}/{Rft}^1.33)*{Vft}^2/(2*{gus})", "ft")
cv.add("HWft", "Design headwater, ft", "HW_ft", "={HW}*3.281", "ft")
cv.add("ELft", "Headwater level, ft (US drawing datum)", "z_HW,ft", "={inv}*3.281+{HW}", "ft",
       planted=("unit-scale", "headwater in m added to an invert level converted to ft"))
CULVERT = cv.finish()

FLOWS = {
    "A1": "Marsh Lane: design flows by return period (rational method) and barrel velocity",
    "A2": ("Sources: as the Hydrology sheet: Q = C·i·A/360 (SI) and Q = C·i·A (US, 1.008 taken "
           "as 1), FHWA HEC-22 3rd ed. (2009) ch. 3 (from memory); intensities at t_c read from "
           "an invented IDF curve; 35.31 ft³/m³, 25.4 mm/in, 3.281 ft/m (NIST SP 811)."),
    "A3": CAUTION,
    "A4": "Return period [yr]", "B4": "Intensity at t_c [mm/h]", "C4": "Peak flow [m³/s]",
    "D4": "Peak flow [cfs]", "E4": "Intensity [in/h]", "F4": "Peak flow, US check [cfs]",
    "G4": "Barrel velocity [m/s]", "H4": "Barrel velocity [ft/s]",
    "A9": "Maximum", "C9": "=MAX(C5:C8)", "G9": "=MAX(G5:H8)",
}
H = hyd.ref
for r, (T_, i) in enumerate([(10, 62), (25, 74), (50, 83), (100, 92)], start=5):
    FLOWS[f"A{r}"], FLOWS[f"B{r}"] = T_, i
    FLOWS[f"C{r}"] = f"={H('C')}*B{r}*{H('A')}/360"
    FLOWS[f"D{r}"] = f"=C{r}*35.31"
    FLOWS[f"E{r}"] = f"=B{r}/25.4"
    FLOWS[f"F{r}"] = f"={H('C')}*E{r}*{H('Aac')}"
    FLOWS[f"G{r}"] = f"=C{r}/{cv.ref('A')}"
    FLOWS[f"H{r}"] = f"=G{r}*3.281"
FLOWS["C5"] = f"={H('C')}*B5*{H('A')}"              # planted: no /360
FLOWS["D6"] = "=C6*3.281"                           # planted: ft/m factor for ft³/m³
FLOWS["G7"] = f"=D7/{cv.ref('A')}"                  # planted: cfs over m²
FLOWS["H8"] = "=G8/3.281"                           # planted: wrong way round

CULV = {
    "trade": "highway drainage: road culvert hydraulics (HDS-5 outlet and inlet control)",
    "sheets": [("Hydrology", HYD), ("Flows", FLOWS), ("Culvert", CULVERT), ("Tables", TABLES)],
    "planted": {**cv.planted,
                "Flows!C5": ("unit-scale", "C·i·A with i in mm/h and A in ha without the /360: "
                             "360 too large"),
                "Flows!D6": ("unit-scale", "m³/s × 3.281 (the ft/m factor) into cfs: should be "
                             "35.31"),
                "Flows!G7": ("unit-scale", "flow in cfs over an area in m²: 35.31 too large"),
                "Flows!H8": ("unit-scale", "m/s to ft/s divided by 3.281: wrong way round"),
                "Flows!G9": ("mixed-range", "maximum velocity over the m/s and ft/s columns "
                             "together")},
}


# --------------------------------------------------------------------------------------------
# Book 4: ice rink refrigeration load (kW, TR and Btu/h, °C and °F, m² and ft², L/s and gpm)
# --------------------------------------------------------------------------------------------
RINK_SRC = (
    "Sources: ice rink load components (convection, radiation, floor conduction, lighting, "
    "resurfacing, brine pump heat) and a convective coefficient of about 3.4 W/(m²·K), ASHRAE "
    "Handbook—Refrigeration (2018) ch. 44 'Ice Rinks' (from memory); radiation q = σ·ε·A·"
    "(T_c⁴ − T_i⁴) with ε = 1/(1/ε₁ + 1/ε₂ − 1) for two large parallel grey surfaces, "
    "Incropera et al., Fundamentals of Heat and Mass Transfer 7th ed. (2011) ch. 13; σ = "
    "5.670×10⁻⁸ W/(m²·K⁴), CODATA 2018; water c_p 4.19 kJ/(kg·K), latent heat of fusion 334 "
    "kJ/kg, ice c_p 2.1 kJ/(kg·K) (US: 1 Btu/(lb·°F), 144 Btu/lb, 0.5 Btu/(lb·°F), 8.34 "
    "lb/gal): common practice; calcium chloride brine density, specific heat and specific "
    "gravity, ASHRAE Handbook—Fundamentals (2017) ch. 31 (from memory); gpm = Btu/h / (500 · "
    "SG · c_p · Δt), 500 = 8.34 lb/gal × 60 min/h: common practice; NIST SP 811 (2008) App. B.8 "
    "(1 TR = 3.517 kW = 12 000 Btu/h; 1 kW = 3412 Btu/h; 1 m² = 10.76 ft²; 1 L/s = 15.85 gpm; "
    "1 m³ = 264.2 gal; 1 Btu = 1.055 kJ; t/°F = 1.8·t/°C + 32; T/K = t/°C + 273.15). Rink "
    "60 m × 30 m with 8.5 m corners: IIHF rule book range (from memory). Arena, temperatures "
    "and plant data invented.")
rk = ItemSheet("Rink", "Carrick Vale community arena: ice sheet and design conditions (invented "
               "scenario)", RINK_SRC)
rk.add("Lr", "Ice sheet length", "L", 60, "m")
rk.add("Wr", "Ice sheet width", "W", 30, "m")
rk.add("rc", "Corner radius", "r_c", 8.5, "m")
rk.add("A", "Ice area", "A", "={Lr}*{Wr}-(4-PI())*{rc}^2", "m²")
rk.add("Aft", "Ice area, ft²", "A_ft", "={A}*10.76", "ft²")
rk.add("Aft2", "Ice area for the US ice-plant quote", "A_quote", "={Aft}*10.76", "ft²",
       planted=("unit-scale", "an area already in ft² converted again: 10.76 too large"))
rk.add("tice", "Ice surface temperature", "t_i", -5, "°C")
rk.add("tiF", "Ice surface temperature, °F", "t_i,F", "={tice}*1.8+32", "°F")
rk.add("tair", "Air temperature 1 m above the ice", "t_a", 10, "°C")
rk.add("tceil", "Ceiling underside temperature", "t_c", 14, "°C")
rk.add("tg", "Heated sub-floor temperature", "t_g", 5, "°C")
rk.add("TiK", "Ice surface temperature, absolute", "T_i", "={tice}+273.15", "K")
rk.add("TcK", "Ceiling temperature, absolute", "T_c", "={tceil}+273.15", "K")
rk.add("h", "Convective coefficient, air to ice", "h", 3.4, "W/m²·K")
rk.add("U", "Floor U-value, slab over insulation", "U", 0.28, "W/m²·K")
rk.add("sig", "Stefan–Boltzmann constant", "sigma", 5.670E-08, "W/m²·K⁴")
rk.add("ei", "Emissivity of ice", "eps_i", 0.95, "-")
rk.add("ec", "Emissivity of ceiling (painted steel deck)", "eps_c", 0.90, "-")
rk.add("ee", "Effective emissivity", "eps", "=1/(1/{ei}+1/{ec}-1)", "-")
rk.add("PlW", "Lighting over the ice (LED)", "P_L", 32000, "W")
rk.add("fl", "Share of lighting heat reaching the ice", "f_L", 60, "%")
rk.add("nfl", "Resurfacing floods per day", "n_f", 10, "floods/d")
rk.add("Vw", "Water per flood", "V_w", 0.45, "m³")
rk.add("tw", "Flood water temperature", "t_w", 60, "°C")
rk.add("tf", "Freezing point", "t_f", 0, "°C")
rk.add("rhow", "Water density at 60 °C", "rho_w", 983, "kg/m³")
rk.add("cpw", "Specific heat of water", "c_w", 4.19, "kJ/kg·K")
rk.add("hif", "Latent heat of fusion", "h_if", 334, "kJ/kg")
rk.add("cpi", "Specific heat of ice", "c_i", 2.1, "kJ/kg·K")
rk.add("qfl", "Heat removed per kg of flood water", "q_f",
       "={cpw}*({tw}-{tf})+{hif}+{cpi}*({tf}-{tice})", "kJ/kg")
rk.add("Efl", "Heat removed per flood", "E_f", "={Vw}*{rhow}*{qfl}", "kJ")
rk.add("EflkWh", "Heat removed per flood, kWh (operator's log)", "E_f,kWh", "={Efl}/3.6", "kWh",
       planted=("unit-scale", "kJ to kWh divided by 3.6 (the MJ factor): 1000 too large"))
rk.add("Vgal", "Water per flood, US gal", "V_gal", "={Vw}*264.2", "gal")
rk.add("twF", "Flood water temperature, °F", "t_w,F", "={tw}*1.8+32", "°F")
rk.add("tfF", "Freezing point, °F", "t_f,F", 32, "°F")
rk.add("cpwu", "Specific heat of water, US", "c_w,US", 1.0, "Btu/lb·°F")
rk.add("hifu", "Latent heat of fusion, US", "h_if,US", 144, "Btu/lb")
rk.add("cpiu", "Specific heat of ice, US", "c_i,US", 0.5, "Btu/lb·°F")
rk.add("Eflu", "Heat removed per flood, US check", "E_f,US",
       "={Vgal}*8.34*({cpwu}*({twF}-{tfF})+{hifu}+{cpiu}*({tfF}-{tiF}))", "Btu")
rk.add("margin", "Design margin", "m", 10, "%")
RINK = rk.finish()

R = rk.ref
LOADS = {
    "A1": "Carrick Vale arena: refrigeration load at design conditions",
    "A2": ("Sources: as the Rink sheet (ASHRAE Refrigeration 2018 ch. 44; Incropera 7th ed. ch. "
           "13; 1 TR = 3.517 kW, 1 kW = 3412 Btu/h, NIST SP 811). Resurfacing as a daily "
           "average (heat per flood × floods per day / 86 400 s)."),
    "A3": CAUTION,
    "A4": "Component", "B4": "Load [kW]", "C4": "Load [TR]", "D4": "Load [Btu/h]",
    "E4": "Share [%]",
    "A5": "Convection from the air",
    "B5": f"={R('h')}*{R('A')}*({R('tair')}-{R('tice')})/1000",
    "A6": "Radiation from the ceiling",
    "B6": f"={R('sig')}*{R('ee')}*{R('A')}*({R('tceil')}^4-{R('tice')}^4)/1000",   # planted
    "A7": "Floor conduction",
    "B7": f"={R('U')}*{R('A')}*({R('tg')}-{R('tice')})/1000",
    "A8": "Lighting",
    "B8": f"={R('PlW')}*{R('fl')}/100",                                            # planted
    "A9": "Resurfacing (daily average)",
    "B9": f"={R('Efl')}*{R('nfl')}/86400",
    "A10": "Brine pump heat",
    "A11": "Total",
    "B11": "=SUM(B5:B10)", "C11": "=SUM(C5:C10)", "D11": "=SUM(D5:D10)",
    "A12": "Design load (with margin)",
    "B12": f"=B11*(1+{R('margin')}/100)", "C12": "=B12/3.517",
    "A13": "Largest single load", "B13": "=MAX(B5:C10)",                          # planted
}
for r in range(5, 11):
    LOADS[f"C{r}"] = f"=B{r}/3.517"
    LOADS[f"D{r}"] = f"=B{r}*3412"
    LOADS[f"E{r}"] = f"=B{r}/B$11*100"
LOADS["C7"] = "=B7*3.517"                                                          # planted

br = ItemSheet("Brine", "Carrick Vale arena: brine flow, brine pump and compressor duty",
               "Sources: as the Rink sheet (Q = P/(ρ·c_p·Δt); P_pump = ρ·g·Q·H/η; gpm = Btu/h / "
               "(500·SG·c_p·Δt); 1 Btu/(lb·°F) = 4.187 kJ/(kg·K), 15.85 gpm per L/s, 3412 Btu/h "
               "per kW, NIST SP 811). Compressor COP at −10 °C brine: invented.")
br.add("conc", "Calcium chloride concentration (by mass)", "w", 25, "%")
br.add("rho", "Brine density", "rho_b", "=VLOOKUP({conc},Props!A5:D8,2,FALSE)", "kg/m³")
br.add("cp", "Brine specific heat", "c_b", "=VLOOKUP({conc},Props!A5:D8,3,FALSE)", "kJ/kg·K")
br.add("SG", "Brine specific gravity", "SG", "=VLOOKUP({conc},Props!A5:D8,4,FALSE)", "-")
br.add("Q", "Refrigeration design load", "Q_r", "=Loads!B12", "kW")
br.add("dT", "Brine temperature rise through the floor", "Δt_b", 1.5, "K")
br.add("Qb", "Brine flow", "Q_b", "={Q}/({rho}*{cp}*{dT})*1000", "L/s")
br.add("Qbg", "Brine flow, gpm", "Q_b,gpm", "={Qb}*15.85", "gpm")
br.add("H", "Brine pump head", "H", 32, "m")
br.add("etap", "Brine pump efficiency", "eta_p", 72, "%")
br.add("g", "Gravity", "g", 9.81, "m/s²")
br.add("Psh", "Brine pump shaft power", "P_sh", "={rho}*{g}*{Qb}/1000*{H}/{etap}/1000", "kW",
       planted=("unit-scale", "pump efficiency in % used as a fraction: power 100 too small"))
br.add("Pm", "Brine pump motor, selected (heat to the brine)", "P_m", 37, "kW")
br.add("mchk", "Motor check", "check_m", "=IF({Psh}<={Pm},\"OK\",\"UPSIZE MOTOR\")")
br.add("dTF", "Brine temperature rise, °F", "Δt_b,F", "={dT}*1.8+32", "Δ°F",
       planted=("offset-scale", "a temperature rise converted with the +32 of a reading"))
br.add("cpu", "Brine specific heat, US", "c_b,US", "={cp}/4.187", "Btu/lb·°F")
br.add("Qbu", "Brine flow, US check", "Q_b,US", "=Loads!D12/(500*{SG}*{cpu}*{dTF})", "gpm")
br.add("Dh", "Supply header bore", "D_h", 200, "mm")
br.add("V", "Header velocity", "V_h", "={Qb}/1000/(PI()*({Dh}/1000)^2/4)", "m/s")
br.add("COP", "Compressor COP at design (invented)", "COP", 2.8, "-")
br.add("Pc", "Compressor input", "P_c", "={Q}/{COP}", "kW")
br.add("Qcd", "Condenser heat rejection", "Q_cd", "={Q}+{Pc}", "kW")
br.add("QcdM", "Condenser heat rejection, MBH", "Q_cd,MBH", "={Qcd}*3412/1000", "MBH")
br.add("QcdM2", "Condenser heat rejection (cooling-tower selection form)", "Q_cd,ct",
       "={Qcd}*3412", "MBH",
       planted=("unit-scale", "Btu/h figure written under MBH: 1000 too large"))
BRINE = br.finish()
LOADS["B10"] = f"={br.ref('Pm')}"       # pump heat: the selected motor (avoids a circular
#                                          reference through the brine flow)

LOADS["D12"] = "=B12*3412"

PROPS = {
    "A2": CAUTION,
    "A1": "Calcium chloride brine near −10 °C (from memory of ASHRAE Handbook—Fundamentals "
          "(2017) ch. 31; check against the supplier's data)",
    "A4": "Concentration [%]", "B4": "Density [kg/m³]", "C4": "Specific heat [kJ/kg·K]",
    "D4": "Specific gravity [-]",
}
for r, (c, rho, cp, sg) in enumerate([(20, 1188, 3.05, 1.19), (22, 1205, 2.95, 1.21),
                                      (25, 1230, 2.83, 1.23), (28, 1262, 2.72, 1.26)], start=5):
    PROPS[f"A{r}"], PROPS[f"B{r}"], PROPS[f"C{r}"], PROPS[f"D{r}"] = c, rho, cp, sg

ICE = {
    "trade": "refrigeration: ice rink refrigeration load, brine flow and plant duty",
    "sheets": [("Rink", RINK), ("Loads", LOADS), ("Brine", BRINE), ("Props", PROPS)],
    "sidecar": ("# Invented scenario. A dimensionally consistent formula can still be wrong; this\n"
                "# check does not replace independent review under local codes and licensed practice.\n"
                "# Carrick Vale arena: the rink operator's count of resurfacing floods.\n"
                "measure floods = 1 1 \"a resurfacing flood (a count)\"\n"),
    "planted": {**rk.planted, **br.planted,
                "Loads!B6": ("offset-scale", "σ·ε·A·(T_c⁴ − T_i⁴) with the temperatures in °C, "
                             "not K"),
                "Loads!B8": ("unit-scale", "lighting in W carried into the kW column: 1000 too "
                             "large"),
                "Loads!C7": ("unit-scale", "kW to TR multiplied by 3.517: wrong way round"),
                "Loads!B13": ("mixed-range", "largest load taken over the kW and TR columns "
                              "together")},
}

BOOKS = {"fan-pump-vsd": VSD, "steam-traps": TRAPS, "road-culvert": CULV, "ice-rink": ICE}

EXTRA = {}    # stem -> list of (comment, "Sheet!Cell rule")
MISSED = {}   # stem -> {"Sheet!Cell": "why"}
RENAMED = {}  # stem -> {"Sheet!Cell": rule plumb names, or (rule, why)}
MESSAGES = {}  # stem -> {"Sheet!Cell": "plumb's message, where it misleads"}
try:
    from review_notes import EXTRA, MISSED, RENAMED, MESSAGES  # noqa: F401,F811
except ImportError:
    pass


def main():
    write_books(HERE, BOOKS, {"EXTRA": EXTRA, "MISSED": MISSED, "RENAMED": RENAMED,
                              "MESSAGES": MESSAGES})


if __name__ == "__main__":
    main()
