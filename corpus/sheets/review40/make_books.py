#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review40), written with the
standard library only (corpus/sheets/xlsx_writer.py and item_sheet.py, shared by the review
books), adapted from corpus/sheets/review19/make_books.py.

Trades: a sewage pump station's wet well; a rotary lime kiln's heat balance; an irrigation
canal's water balance; a dairy's glycol brine chiller. All scenarios, sites, readings and
catalogue data are invented (demonstration only); the formulas and published factors are the
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
HEADER = ("# Invented scenario. A dimensionally consistent formula can still be wrong; this\n"
          "# check does not replace independent review under local codes and licensed practice.\n")


# --------------------------------------------------------------------------------------------
# Book 1: sewage pump station wet well (L/s and gpm, m and ft, m³ and gal, min, starts/h, kW, hp)
# --------------------------------------------------------------------------------------------
WW_SRC = (
    "Sources: minimum wet well working volume for one constant-speed pump V = θ·q/4 (θ = minimum "
    "cycle time, q = pump rate; the shortest cycle falls at an inflow of q/2), Jones, Sanks et "
    "al., Pumping Station Design 3rd ed. (2008) ch. 12 (from memory); cycle time = V/Q_in + "
    "V/(q − Q_in): same source; at most 6 starts per hour for submersible motors to 30 kW: "
    "common practice, check with the pump maker; 30 min maximum residence at minimum flow "
    "(septicity): common practice, from memory; Hazen–Williams in SI h_f = 10.67·L·Q^1.852/"
    "(C^1.852·D^4.87): common practice; P = ρ·g·Q·H (9.81·Q·H/1000 kW with Q in L/s), US bhp "
    "= gpm·ft/(3960·η), Cameron Hydraulic Data 19th ed. (from memory); minimum submergence S = "
    "D·(1 + 2.3·Fr), Fr = V/√(g·D), ANSI/HI 9.8-2018 (from memory). NIST SP 811 (2008) App. "
    "B.8: 1 L/s = 15.85 gpm, 1 m³ = 264.2 gal, 1 ft = 0.3048 m (3.281 ft/m). Inflows, levels "
    "and pump data invented.")
ww = ItemSheet("WetWell", "Brackenfold Road sewage pumping station SPS-7: wet well, cycle time "
               "and pump check (invented scenario)", WW_SRC)
ww.heading("Inflow (from the Inflow sheet)")
ww.add("Qavg", "Average inflow over the day", "Q_avg", "=Inflow!B12", "L/s")
ww.add("Qpk", "Peak 4-hour inflow", "Q_pk", "=Inflow!B13", "L/s")
ww.add("Qmin", "Minimum 4-hour inflow", "Q_min", "=Inflow!B14", "L/s")
ww.heading("Pump (duty + standby, from the Pumps sheet)")
ww.add("model", "Selected pump", "model", "DP-100B")
ww.add("Qp", "Pump rate at duty point", "q", "=VLOOKUP({model},Pumps!A5:E9,2,FALSE)", "L/s")
ww.add("eta", "Pump efficiency at duty point", "eta_p", "=VLOOKUP({model},Pumps!A5:E9,4,FALSE)",
       "%")
ww.add("Pm", "Motor rating", "P_m", "=VLOOKUP({model},Pumps!A5:E9,5,FALSE)", "kW")
ww.add("capchk", "Pump capacity check (peak inflow)", "check_q",
       "=IF({Qp}>={Qpk},\"OK\",\"UNDERSIZED\")")
ww.add("Qpg", "Pump rate, US", "q_gpm", "={Qp}*15.85", "gpm")
ww.heading("Working volume and well")
ww.add("Nmax", "Maximum starts per hour (motor maker)", "N_max", 6, "starts/h")
ww.add("tmin", "Minimum cycle time", "theta", "=60/{Nmax}", "min")
ww.add("Vreq", "Working volume required", "V_req", "={tmin}*60*{Qp}*60/1000/4", "m³",
       planted=("unit-scale", "the minutes-to-seconds 60 written twice: volume 60 too large"))
ww.add("Dw", "Wet well inside diameter", "D_w", 3.4, "m")
ww.add("Dwft", "Wet well inside diameter, US", "D_w,ft", "={Dw}*3.281", "ft")
ww.add("Aw", "Wet well plan area", "A_w", "=PI()*{Dw}^2/4", "m²")
ww.add("Awft", "Wet well plan area, US", "A_w,ft", "={Aw}*3.281", "ft²",
       planted=("unit-scale", "m² to ft² by the length factor 3.281: should be 10.76"))
ww.add("hreq", "Depth between pump start and stop", "h_req", "={Vreq}/{Aw}", "m")
ww.add("hset", "Set depth (rounded up to 0.1 m)", "h_set", "=ROUNDUP({hreq},1)", "m")
ww.add("Vset", "Working volume provided", "V_set", "={Aw}*{hset}", "m³")
ww.add("Vsetg", "Working volume provided, US", "V_set,gal", "={Vset}*264.2", "gal")
ww.add("tcmin", "Shortest cycle time (inflow = q/2)", "t_c,min", "=4*{Vset}/({Qp}/1000)/60",
       "min")
ww.add("Nworst", "Starts per hour, worst case", "N_worst", "=60/{tcmin}", "starts/h")
ww.add("stchk", "Starts check", "check_N", "=IF({Nworst}<={Nmax},\"OK\",\"TOO MANY STARTS\")")
ww.add("tfill", "Fill time at average inflow", "t_fill", "={Vset}/({Qavg}/1000)/60", "min")
ww.add("trun", "Pump run time at average inflow", "t_run", "={Vset}/(({Qp}-{Qavg})/1000)/60",
       "min")
ww.add("tcyc", "Cycle time at average inflow", "t_cyc", "={tfill}+{trun}", "min")
ww.add("Navg", "Starts per hour at average inflow", "N_avg", "=1/{tcyc}", "starts/h",
       planted=("unit-scale", "one over a cycle time in min gives starts per minute: 60 too "
                "small"))
ww.add("hbelow", "Depth below pump stop level (to benching)", "h_b", 0.6, "m")
ww.add("tres", "Residence time at minimum inflow", "t_res",
       "=({Vset}+{Aw}*{hbelow})/({Qmin}/1000)/60", "min")
ww.add("reschk", "Septicity check (30 min)", "check_t", "=IF({tres}<=30,\"OK\",\"SEPTICITY RISK\")")
ww.heading("Head and power")
ww.add("Zd", "Discharge level (receiving chamber)", "z_d", 48.6, "m")
ww.add("Zoff", "Pump stop level", "z_off", 39.2, "m")
ww.add("Hst", "Static lift", "H_st", "={Zd}-{Zoff}", "m")
ww.add("Lfm", "Rising main length", "L", 820, "m")
ww.add("Dfm", "Rising main inside diameter", "D", 250, "mm")
ww.add("C", "Hazen–Williams C (PE, aged)", "C", 120, "-")
ww.add("hf", "Rising main friction loss", "h_f",
       "=10.67*{Lfm}*({Qp}/1000)^1.852/({C}^1.852*({Dfm}/1000)^4.87)", "m")
ww.add("hm", "Fittings and valve losses", "h_m", 1.5, "m")
ww.add("TDH", "Total dynamic head", "TDH", "={Hst}+{hf}+{hm}", "m")
ww.add("TDHft", "Total dynamic head, US", "TDH_ft", "={TDH}*3.281", "ft")
ww.add("Ph", "Hydraulic power", "P_h", "=9.81*{Qp}*{TDHft}/1000", "kW",
       planted=("unit-scale", "9.81·Q·H/1000 with the head in ft: 3.281 too large"))
ww.add("Ps", "Pump shaft power", "P_s", "={Ph}/({eta}/100)", "kW")
ww.add("bhp", "Brake horsepower, US check", "P_bhp", "={Qpg}*{TDHft}/(3960*{eta})", "hp",
       planted=("unit-scale", "pump efficiency in % used as a fraction: 100 too small"))
ww.add("mchk", "Motor check (15 % margin)", "check_m", "=IF({Pm}>={Ps}*1.15,\"OK\",\"UPSIZE\")")
ww.heading("Pump inlet submergence (ANSI/HI 9.8)")
ww.add("Db", "Suction bell diameter", "D_b", 400, "mm")
ww.add("Vb", "Velocity at the bell", "V_b", "={Qp}/1000/(PI()*({Db}/1000)^2/4)", "m/s")
ww.add("Fr", "Froude number at the bell", "Fr", "={Vb}/SQRT(9.81*{Db})", "-",
       planted=("unit-scale", "bell diameter in mm under the root: Fr 31.6 too small"))
ww.add("S", "Minimum submergence", "S", "={Db}/1000*(1+2.3*{Fr})", "m")
ww.add("Sft", "Minimum submergence, US", "S_ft", "={S}*3.281", "ft")
WETWELL = ww.finish()

W = ww.ref
INFLOW = {
    "A1": "Brackenfold Road SPS-7: design-year diurnal inflow in 4-hour blocks (invented, from "
          "the catchment model)",
    "A2": ("Sources: cycle time = V/Q_in + V/(q − Q_in) with V the working volume provided and "
           "q the pump rate, Jones, Sanks et al., Pumping Station Design 3rd ed. (2008) ch. 12 "
           "(from memory); starts per hour = 60/cycle time in min; 1 L/s = 15.85 gpm, NIST SP "
           "811 (2008) App. B.8."),
    "A3": CAUTION,
    "A4": "Period", "B4": "Inflow [L/s]", "C4": "Inflow [gpm]", "D4": "Cycle time [min]",
    "E4": "Starts [starts/h]",
    "A12": "Mean", "B12": "=AVERAGE(B5:B10)",
    "A13": "Peak", "B13": "=MAX(B5:C10)", "E13": "=MAX(E5:E10)",
    "A14": "Minimum", "B14": "=MIN(B5:B10)",
}
Vs, Qp = W("Vset"), W("Qp")
for r, (per, q) in enumerate([("00-04", 18), ("04-08", 32), ("08-12", 61), ("12-16", 52),
                              ("16-20", 58), ("20-24", 39)], start=5):
    INFLOW[f"A{r}"], INFLOW[f"B{r}"] = per, q
    INFLOW[f"C{r}"] = f"=B{r}*15.85"
    INFLOW[f"D{r}"] = f"={Vs}/(B{r}/1000)/60+{Vs}/(({Qp}-B{r})/1000)/60"
    INFLOW[f"E{r}"] = f"=60/D{r}"
INFLOW["D8"] = f"={Vs}/B8/60+{Vs}/(({Qp}-B8)/1000)/60"   # planted: /1000 left out of one term

PUMPS = {
    "A1": "Submersible sewage pumps, 1450 rpm: duty point on the site system curve (invented "
          "catalogue data)",
    "A4": "Model", "B4": "Rated flow [L/s]", "C4": "Rated head [m]", "D4": "Efficiency [%]",
    "E4": "Motor [kW]",
}
for r, row in enumerate([("DP-80A", 60, 16, 68, 15), ("DP-80B", 70, 19, 70, 18.5),
                         ("DP-100A", 85, 20, 72, 22), ("DP-100B", 95, 22, 73, 30),
                         ("DP-150A", 120, 24, 75, 37)], start=5):
    for c, v in zip("ABCDE", row):
        PUMPS[f"{c}{r}"] = v

WET = {
    "trade": "wastewater: sewage pump station wet well sizing and pump check",
    "sheets": [("WetWell", WETWELL), ("Inflow", INFLOW), ("Pumps", PUMPS)],
    "sidecar": (HEADER +
                "# Brackenfold Road SPS-7: the count the trade writes into 'starts/h'\n"
                "# (pump starts per hour, Pumping Station Design 3rd ed. ch. 12).\n"
                "measure starts = 1 1 \"a pump start (a count)\"\n"),
    "planted": {**ww.planted,
                "Inflow!D8": ("unit-scale", "fill time m³ over L/s without the /1000 in one of "
                              "the two terms: that term 1000 too small"),
                "Inflow!B13": ("mixed-range", "peak inflow taken over the L/s and gpm columns "
                               "together")},
}


# --------------------------------------------------------------------------------------------
# Book 2: rotary lime kiln heat balance (GJ/t and MMBtu/short ton, MW, kW and MMBtu/h, Nm³/h,
# °C and °F, %)
# --------------------------------------------------------------------------------------------
KILN_SRC = (
    "Sources: heat of calcination CaCO₃ → CaO + CO₂, 3.16 GJ per t CaO, and process CO₂ 0.785 t "
    "per t CaO (44.01/56.08), T. S. R. Boynton, Chemistry and Technology of Lime and Limestone "
    "2nd ed. (1980) (from memory); net calorific values and CO₂ factors, 2006 IPCC Guidelines "
    "Vol. 2 Tables 1.2 and 1.4 (from memory); stoichiometric air per GJ of fuel: common "
    "practice, from memory; flue gas mean volumetric heat capacity 1.42 kJ/(Nm³·K) from 15 to "
    "250 °C: from memory; shell loss by convection h·ΔT and radiation ε·σ·(T_s⁴ − T_a⁴) with "
    "absolute temperatures, σ = 5.67E-8 W/(m²·K⁴) (CODATA 2018), Incropera et al., "
    "Fundamentals of Heat and Mass Transfer 7th ed. (2011) ch. 1; lime c_p 0.84 kJ/(kg·K), "
    "Perry's Chemical Engineers' Handbook 8th ed. (2008) sec. 2 (from memory); gas meter "
    "correction to 0 °C and 1.01325 bar: V_n = V·(p_g + 1.01325)/1.01325·273.15/(t + 273.15), "
    "DIN 1343 (reference state, from memory). NIST SP 811 (2008) App. B.8: 1 GJ = 0.9478 "
    "MMBtu, 1 t = 1.102 short ton, 1 MW = 3.412 MMBtu/h, 1 kW = 0.003412 MMBtu/h, t/°F = "
    "1.8·t/°C + 32. Production, readings and gas data invented.")
kn = ItemSheet("Kiln", "Corrie Ashgill lime works, rotary kiln K2: heat balance from the "
               "March performance test (invented scenario)", KILN_SRC)
kn.heading("Production and fuel")
kn.add("prod", "Quicklime output (CaO)", "m_CaO", 320, "t/d")
kn.add("prods", "Quicklime output, short tons", "m_CaO,US", "={prod}*1.102", "ton/d")
kn.add("fuel", "Fuel", "fuel", "Natural gas")
kn.add("LHV", "Net calorific value", "NCV", "=VLOOKUP({fuel},Fuels!A5:D8,2,FALSE)", "GJ/t")
kn.add("EF", "CO2 emission factor of the fuel", "EF", "=VLOOKUP({fuel},Fuels!A5:D8,3,FALSE)",
       "kg/GJ")
kn.add("Vst", "Stoichiometric air", "V_st", "=VLOOKUP({fuel},Fuels!A5:D8,4,FALSE)", "Nm³/GJ")
kn.add("SFC", "Specific heat consumption (test)", "q_sp", 5.0, "GJ/t")
kn.add("SFCus", "Specific heat consumption, US", "q_sp,US", "={SFC}*0.9478*1.102", "MMBtu/ton",
       planted=("unit-scale", "per tonne to per short ton multiplied by 1.102: wrong way round, "
                "should divide"))
kn.add("Pb", "Burner firing rate", "P_b", "={SFC}*{prod}/24/3.6", "MW")
kn.add("PbUS", "Burner firing rate, US", "P_b,US", "={Pb}*3412", "MMBtu/h",
       planted=("unit-scale", "the kW factor 3412 applied to MW: 1000 too large"))
kn.add("mf", "Fuel mass flow", "m_f", "={Pb}*3.6/{LHV}", "t/h")
kn.add("CO2f", "CO2 from fuel", "m_CO2,f", "={Pb}*3.6*{EF}/1000", "t/h")
kn.add("CO2p", "CO2 from calcination", "m_CO2,p", "={prod}/24*0.785", "t/h")
kn.add("CO2i", "CO2 intensity", "e_CO2", "=({CO2f}+{CO2p})*24/{prod}", "t/t")
kn.add("Hc", "Theoretical heat of calcination", "q_c", 3.16, "GJ/t")
kn.add("etath", "Thermal efficiency of the kiln", "eta_th", "={Hc}/{SFC}*100", "%")
kn.heading("Gas meter check (turbine meter at the burner train)")
kn.add("Va", "Meter reading (actual volume)", "V_a", 580, "m³/h")
kn.add("pg", "Gas pressure at the meter", "p_g", 2.4, "bar g")
kn.add("Tg", "Gas temperature at the meter", "t_g", 12, "°C")
kn.add("Vn", "Gas flow at reference conditions", "V_n",
       "={Va}*{pg}/1.01325*273.15/({Tg}+273.15)", "Nm³/h",
       planted=("offset-scale", "gauge pressure in the gas-law ratio that wants absolute"))
kn.add("LHVv", "Net calorific value (supplier's certificate)", "NCV_v", 35.9, "MJ/Nm³")
kn.add("Pbm", "Firing rate from the meter", "P_b,m", "={Vn}*{LHVv}/3600", "MW")
kn.add("disc", "Meter against test figure", "d_m", "=({Pbm}-{Pb})/{Pb}*100", "%")
kn.heading("Combustion air")
kn.add("EA", "Excess air (from O2 at the kiln inlet)", "EA", 10, "%")
kn.add("Vair", "Combustion air", "V_air", "={Pb}*3.6*{Vst}*(1+{EA})", "Nm³/h",
       planted=("unit-scale", "excess air in % used as a fraction: (1 + 10) in place of 1.10"))
kn.heading("Stack loss")
kn.add("Vg", "Stack gas flow (stack test, dry, normal)", "V_g", 28500, "Nm³/h")
kn.add("cpg", "Flue gas mean volumetric heat capacity", "c_p,g", 1.42, "kJ/(Nm³·K)")
kn.add("Ts", "Stack temperature", "t_s", "=Temps!B7", "°C")
kn.add("Ta", "Ambient temperature", "t_a", "=Temps!B9", "°C")
kn.add("Qs", "Stack loss", "Q_s", "={Vg}*{cpg}*({Ts}-{Ta})", "kW",
       planted=("unit-scale", "Nm³/h × kJ/(Nm³·K) × K gives kJ/h, written as kW: /3600 left "
                "out"))
kn.add("Qsp", "Stack loss, share of firing", "q_s", "={Qs}/({Pb}*1000)*100", "%")
kn.heading("Shell loss")
kn.add("Dk", "Kiln shell outside diameter", "D_k", 3.2, "m")
kn.add("Lk", "Kiln length", "L_k", 58, "m")
kn.add("Ak", "Shell area", "A_k", "=PI()*{Dk}*{Lk}", "m²")
kn.add("Tsh", "Shell temperature (scanner mean)", "t_sh", "=Temps!B8", "°C")
kn.add("hc", "Convective coefficient (wind 2 m/s)", "h_c", 12, "W/(m²·K)")
kn.add("qconv", "Convective flux", "q_conv", "={hc}*({Tsh}-{Ta})", "W/m²")
kn.add("eps", "Shell emissivity", "eps", 0.9, "-")
kn.add("qrad", "Radiant flux", "q_rad", "={eps}*5.67E-8*({Tsh}^4-{Ta}^4)", "W/m²",
       planted=("offset-scale", "ε·σ·(T_s⁴ − T_a⁴) with the temperatures in °C, not K"))
kn.add("Qsh", "Shell loss", "Q_sh", "=({qconv}+{qrad})*{Ak}/1000", "kW")
kn.heading("Sensible heat in lime")
kn.add("Tl", "Lime at cooler discharge", "t_l", "=Temps!B10", "°C")
kn.add("cpl", "Specific heat of lime", "c_p,l", 0.84, "kJ/(kg·K)")
kn.add("Ql", "Sensible heat in lime", "Q_l", "={prod}*1000/86400*{cpl}*({Tl}-{Ta})", "kW")
KILN = kn.finish()

K = kn.ref
BAL = {
    "A1": "Kiln K2 heat balance, March performance test (reference: ambient air)",
    "A2": ("Sources: as the Kiln sheet; calcination heat = q_c × output (GJ/d × 10⁶ kJ/GJ / "
           "86 400 s/d = kW); unaccounted = input − listed streams; 1 kW = 0.003412 MMBtu/h, "
           "NIST SP 811 (2008) App. B.8."),
    "A3": CAUTION,
    "A4": "Heat stream", "B4": "Heat [kW]", "C4": "Heat [MMBtu/h]", "D4": "Share of input [%]",
    "A5": "Fuel input (firing rate)", "B5": f"={K('Pb')}",
    "A6": "Calcination (theoretical)", "B6": f"={K('Hc')}*{K('prod')}*1000000/86400",
    "A7": "Stack gas", "B7": f"={K('Qs')}",
    "A8": "Shell (convection and radiation)", "B8": f"={K('Qsh')}",
    "A9": "Sensible heat in lime", "B9": f"={K('Ql')}",
    "A10": "Unaccounted (cooler air, dust, CO2 sensible)", "B10": "=B5-SUM(B6:B9)",
}
for r in range(5, 11):
    BAL[f"C{r}"] = f"=B{r}*0.003412"
    if r > 5:
        BAL[f"D{r}"] = f"=B{r}/B$5*100"

TEMPS = {
    "A1": "Kiln K2: temperatures logged during the performance test (hourly means, invented)",
    "A2": "Sources: t/°F = 1.8·t/°C + 32, NIST SP 811 (2008) App. B.8.",
    "A3": CAUTION,
    "A4": "Measuring point", "B4": "Temperature [°C]", "C4": "Temperature [°F]",
}
for r, (pt, t) in enumerate([("Burning zone (pyrometer)", 1280), ("Kiln back end gas", 880),
                             ("Stack, after the bag filter", 240),
                             ("Kiln shell (scanner mean)", 215), ("Ambient air", 15),
                             ("Lime at cooler discharge", 110)], start=5):
    TEMPS[f"A{r}"], TEMPS[f"B{r}"] = pt, t
    TEMPS[f"C{r}"] = f"=B{r}*1.8+32"
TEMPS["C8"] = "=(B8-32)/1.8"          # planted: the °F-to-°C formula used the other way

FUELS = {
    "A1": "Kiln fuels: net calorific value, CO2 factor and stoichiometric air (2006 IPCC "
          "Guidelines Vol. 2 Tables 1.2 and 1.4, from memory; air: from memory, check against "
          "the fuel analysis)",
    "A4": "Fuel", "B4": "NCV [GJ/t]", "C4": "CO2 factor [kg/GJ]", "D4": "Stoich. air [Nm³/GJ]",
}
for r, row in enumerate([("Natural gas", 48.0, 56.1, 266), ("Bituminous coal", 25.8, 94.6, 262),
                         ("Petroleum coke", 32.5, 97.5, 258),
                         ("Residual fuel oil", 40.4, 77.4, 262)], start=5):
    for c, v in zip("ABCD", row):
        FUELS[f"{c}{r}"] = v

LIME = {
    "trade": "lime burning: rotary kiln heat balance",
    "sheets": [("Kiln", KILN), ("Balance", BAL), ("Temps", TEMPS), ("Fuels", FUELS)],
    "planted": {**kn.planted,
                "Balance!B5": ("unit-scale", "firing rate in MW carried into the kW column: "
                               "1000 too small"),
                "Temps!C8": ("offset-scale", "°C to °F with the °F-to-°C formula (t − 32)/1.8")},
}


# --------------------------------------------------------------------------------------------
# Book 3: irrigation canal water balance (m³/s and cfs, m³/(m²·d) and ft/d, mm/d, ha and acres,
# m³ and acre-ft)
# --------------------------------------------------------------------------------------------
CANAL_SRC = (
    "Sources: crop water requirement ET_c = K_c·ET_0 with K_c mid-season from FAO Irrigation "
    "and Drainage Paper 56 (Allen et al., 1998) Table 12 (from memory); gross requirement = "
    "net/application efficiency, FAO Irrigation and Drainage Paper 24 (1977) (from memory); 1 "
    "mm over 1 ha = 10 m³: common practice; seepage = rate × wetted perimeter × length, rates "
    "from ponding tests, USBR Canal Linings and Methods of Reducing Seepage Losses (1963) (from "
    "memory); open-water evaporation = pan × 0.75 pan coefficient: common practice, from "
    "memory; Manning Q = A·R^(2/3)·S^(1/2)/n, n = 0.022 for a clean earth canal, V. T. Chow, "
    "Open-Channel Hydraulics (1959) Table 5-6; 20 % capacity margin: common practice. NIST SP "
    "811 (2008) App. B.8: 1 m³/s = 35.31 cfs, 3.281 ft/m, 1 ha = 2.471 acre, 1 in = 25.4 mm, "
    "1 acre-ft = 1233.5 m³; 1 cfs for a day = 1.983 acre-ft: common practice. 1 acre-inch per "
    "hour ≈ 1 cfs (1.008): common practice. District data invented.")
cn = ItemSheet("Canal", "Sallowmere main canal, Sallow Creek irrigation district: peak-month "
               "water balance (invented scenario)", CANAL_SRC)
cn.heading("Diversion and losses")
cn.add("Qd", "Diversion at the headworks", "Q_d", 12.5, "m³/s")
cn.add("Qdcfs", "Diversion at the headworks, US", "Q_d,cfs", "={Qd}*35.31", "cfs")
cn.add("days", "Irrigation season", "t_s", 184, "d")
cn.add("Vdiv", "Seasonal diversion", "V_div", "={Qd}*86400*{days}", "m³")
cn.add("Vdivaf", "Seasonal diversion, US", "V_div,af", "={Vdiv}/1233.5", "acre-ft")
cn.add("Vdivaf2", "Seasonal diversion, US (cfs-day check)", "V_div,af2", "={Qdcfs}*{days}*1.983",
       "acre-ft")
cn.add("Epan", "Class A pan evaporation, peak month", "E_pan", 9.2, "mm/d")
cn.add("Kp", "Pan coefficient", "K_p", 0.75, "-")
cn.add("Ew", "Open-water evaporation", "E_w", "={Epan}*{Kp}", "mm/d")
cn.add("Seep", "Seepage loss, all reaches", "Q_seep", "=Reaches!G10", "m³/s")
cn.add("Evap", "Evaporation loss, all reaches", "Q_evap", "=Reaches!H10", "m³/s")
cn.add("Qloss", "Conveyance loss", "Q_loss", "={Seep}+{Evap}", "m³/s")
cn.add("Vlossaf", "Seasonal conveyance loss, US", "V_loss,af", "={Qloss}*{days}*1.983", "acre-ft",
       planted=("unit-scale", "the cfs-day factor 1.983 applied to m³/s: 35.31 too small"))
cn.add("Qspill", "Operational spill at the tail escape", "Q_sp", 0.4, "m³/s")
cn.add("Qdel", "Delivered to the turnouts", "Q_del", "={Qd}-{Qloss}-{Qspill}", "m³/s")
cn.add("Qdelcfs", "Delivered to the turnouts, US", "Q_del,cfs", "={Qdel}*35.31", "cfs")
cn.add("Ec", "Conveyance efficiency", "E_c", "={Qdel}/{Qd}*100", "%")
cn.heading("Demand of the command area")
cn.add("Area", "Irrigated area", "A_irr", 8200, "ha")
cn.add("crop", "Dominant crop", "crop", "Maize")
cn.add("Kc", "Crop coefficient, mid-season", "K_c", "=VLOOKUP({crop},Crops!A5:B9,2,FALSE)", "-")
cn.add("ET0", "Reference evapotranspiration, peak month", "ET_0", 6.8, "mm/d")
cn.add("ETc", "Crop evapotranspiration", "ET_c", "={Kc}*{ET0}", "mm/d")
cn.add("Pe", "Effective rainfall, peak month", "P_e", 0.6, "mm/d")
cn.add("NIR", "Net irrigation requirement", "NIR", "={ETc}-{Pe}", "mm/d")
cn.add("Ea", "Field application efficiency (furrow)", "E_a", 70, "%")
cn.add("GIR", "Gross irrigation requirement", "GIR", "={NIR}/{Ea}", "mm/d",
       planted=("unit-scale", "application efficiency in % used as a fraction: 100 too small"))
cn.add("Qdem", "Demand at the turnouts", "Q_dem", "={GIR}*{Area}/86400", "m³/s",
       planted=("unit-scale", "mm·ha/d to m³/s without the 10 m³ per ha·mm: 10 too small"))
cn.add("Qdemcfs", "Demand at the turnouts, US", "Q_dem,cfs", "={Qdem}*35.31", "cfs")
cn.add("Aac", "Irrigated area, US", "A_ac", "={Area}*2.471", "acre")
cn.add("GIRin", "Gross irrigation requirement, US", "GIR_in", "={GIR}/25.4", "in/d")
cn.add("QdemUS", "Demand, US rule (1 acre-inch/h ≈ 1 cfs)", "Q_dem,US", "={Aac}*{GIRin}/24",
       "cfs")
cn.add("supchk", "Supply check", "check_Q", "=IF({Qdel}>={Qdem},\"OK\",\"SHORTFALL\")")
cn.heading("Canal capacity (trapezoidal earth section, Manning)")
cn.add("b", "Bed width", "b", 5.0, "m")
cn.add("y", "Full supply depth", "y", 2.4, "m")
cn.add("z", "Side slope (horizontal per vertical)", "z", 1.5, "-")
cn.add("n", "Manning's n (clean earth)", "n", 0.022, "-")
cn.add("S", "Bed slope", "S", 0.00015, "-")
cn.add("A", "Flow area", "A", "=({b}+{z}*{y})*{y}", "m²")
cn.add("P", "Wetted perimeter", "P", "={b}+2*{y}*SQRT(1+{z}^2)", "m")
cn.add("R", "Hydraulic radius", "R", "={A}/{P}", "m")
cn.add("Qcap", "Capacity at full supply depth", "Q_cap", "=1.486/{n}*{A}*{R}^(2/3)*SQRT({S})",
       "m³/s", planted=("unit-scale", "Manning's US 1.486 in an SI formula: 1.486 too large"))
cn.add("Qcapcfs", "Capacity at full supply depth, US", "Q_cap,cfs", "={Qcap}*35.31", "cfs")
cn.add("V", "Mean velocity at the diversion flow", "V", "={Qd}/{A}", "m/s")
cn.add("capchk", "Capacity check (20 % margin)", "check_cap",
       "=IF({Qcap}>={Qd}*1.2,\"OK\",\"RAISE BANKS\")")
CANAL = cn.finish()

C = cn.ref
REACHES = {
    "A1": "Sallowmere main canal: reaches between check structures (ponding tests 2023, "
          "invented)",
    "A2": ("Sources: seepage loss = rate × wetted perimeter × length / 86 400 s/d; evaporation "
           "loss = E_w/1000 × top width × length / 86 400 s/d (common practice); 3.281 ft/m and "
           "35.31 cfs per m³/s, NIST SP 811 (2008) App. B.8."),
    "A3": CAUTION,
    "A4": "Reach", "B4": "Length [km]", "C4": "Wetted perimeter [m]", "D4": "Top width [m]",
    "E4": "Seepage rate [m³/(m²·d)]", "F4": "Seepage rate [ft/d]", "G4": "Seepage loss [m³/s]",
    "H4": "Evaporation loss [m³/s]", "I4": "Total loss [cfs]",
    "A10": "Total", "B10": "=SUM(B5:B9)", "G10": "=SUM(G5:G9)", "H10": "=SUM(H5:H9)",
    "I10": "=SUM(I5:I9)",
    "A11": "Highest seepage rate", "E11": "=MAX(E5:F9)",
}
Ew = C("Ew")
for r, (name, km, p, t, s) in enumerate([("Headworks - CS1", 8.2, 10.4, 11.3, 0.12),
                                         ("CS1 - CS2", 11.5, 9.8, 10.6, 0.15),
                                         ("CS2 - CS3 (lined)", 6.8, 9.1, 9.8, 0.08),
                                         ("CS3 - CS4", 14.0, 8.2, 8.8, 0.18),
                                         ("CS4 - tail escape", 9.6, 7.0, 7.5, 0.14)], start=5):
    REACHES[f"A{r}"], REACHES[f"B{r}"], REACHES[f"C{r}"] = name, km, p
    REACHES[f"D{r}"], REACHES[f"E{r}"] = t, s
    REACHES[f"F{r}"] = f"=E{r}*3.281"
    REACHES[f"G{r}"] = f"=E{r}*C{r}*B{r}*1000/86400"
    REACHES[f"H{r}"] = f"={Ew}/1000*D{r}*B{r}*1000/86400"
    REACHES[f"I{r}"] = f"=(G{r}+H{r})*35.31"
REACHES["F7"] = "=E7/3.281"                                # planted: wrong way round
REACHES["G8"] = "=E8*C8*B8/86400"                          # planted: km not converted to m
REACHES["H6"] = f"={Ew}*D6*B6*1000/86400"                  # planted: mm/d not converted to m/d

CROPS = {
    "A1": "Crop coefficients, mid-season (FAO Irrigation and Drainage Paper 56, 1998, Table 12, "
          "from memory; sub-humid climate, no adjustment)",
    "A4": "Crop", "B4": "Kc mid [-]",
}
for r, (crop, kc) in enumerate([("Alfalfa", 0.95), ("Cotton", 1.15), ("Maize", 1.20),
                                ("Sugar beet", 1.20), ("Wheat", 1.15)], start=5):
    CROPS[f"A{r}"], CROPS[f"B{r}"] = crop, kc

CANALBOOK = {
    "trade": "irrigation: main canal water balance and capacity",
    "sheets": [("Canal", CANAL), ("Reaches", REACHES), ("Crops", CROPS)],
    "planted": {**cn.planted,
                "Reaches!F7": ("unit-scale", "m/d to ft/d divided by 3.281: wrong way round"),
                "Reaches!G8": ("unit-scale", "reach length in km not converted to m: seepage "
                               "1000 too small"),
                "Reaches!H6": ("unit-scale", "evaporation in mm/d not converted to m/d: 1000 "
                               "too large"),
                "Reaches!E11": ("mixed-range", "highest seepage rate taken over the m/d and ft/d "
                                "columns together")},
}


# --------------------------------------------------------------------------------------------
# Book 4: glycol brine chiller (kW and TR, L/s and gpm, K and °F, m and ft, kPa and kPa(g))
# --------------------------------------------------------------------------------------------
CH_SRC = (
    "Sources: Q = m·c_p·ΔT; propylene glycol properties by mass concentration near 0 °C, ASHRAE "
    "Handbook—Fundamentals (2017) ch. 31 (from memory, check against the supplier's data); "
    "gpm = Btu/h/(500·SG·c_p/c_p,w·ΔT°F), 500 = 8.33 lb/gal × 60 min/h × 1 Btu/(lb·°F) for "
    "water: common practice, ASHRAE Handbook—HVAC Systems and Equipment (2020) ch. 13 (from "
    "memory); water c_p 4.187 kJ/(kg·K) and ρ 1000 kg/m³: common practice; head from pressure "
    "drop H = Δp/(ρ·g), P = ρ·g·Q·H, US bhp = gpm·ft·SG/(3960·η), Cameron Hydraulic Data 19th "
    "ed. (from memory); NPSH_a = (p_s,abs − p_v)/(ρ·g) − h_s, ANSI/HI 9.6.1-2017 (from memory); "
    "standard atmosphere 101.325 kPa. NIST SP 811 (2008) App. B.8: 1 TR = 3.517 kW, 1 kW = "
    "3.412 MBH, 1 L/s = 15.85 gpm, 1 gpm = 0.0631 L/s, 3.281 ft/m, 1 K = 1.8 °F (difference), "
    "t/°F = 1.8·t/°C + 32. Loads, plant data and readings invented.")
ch = ItemSheet("Chiller", "Pellam Dale creamery: glycol brine chiller CH-2, design check "
               "(invented scenario)", CH_SRC)
ch.heading("Load and brine")
ch.add("Qproc", "Process load after diversity (Loads sheet)", "Q_proc", "=Loads!D10", "kW")
ch.add("allow", "Allowance for pump heat and pipe gains", "a_p", 2.5, "%")
ch.add("Qtot", "Evaporator design load", "Q_e", "={Qproc}*(1+{allow}/100)", "kW")
ch.add("TR", "Evaporator design load, US", "Q_e,TR", "={Qtot}*3.517", "TR",
       planted=("unit-scale", "kW to TR multiplied by 3.517: wrong way round"))
ch.add("conc", "Propylene glycol, mass concentration", "x_PG", 30, "%")
ch.add("cp", "Brine specific heat", "c_p", "=VLOOKUP({conc},Glycol!A5:D9,2,FALSE)", "kJ/(kg·K)")
ch.add("rho", "Brine density", "rho", "=VLOOKUP({conc},Glycol!A5:D9,3,FALSE)", "kg/m³")
ch.add("Tfr", "Brine freezing point", "t_fr", "=VLOOKUP({conc},Glycol!A5:D9,4,FALSE)", "°C")
ch.add("Tsup", "Brine supply temperature", "t_sup", -5, "°C")
ch.add("Tret", "Brine return temperature", "t_ret", 0, "°C")
ch.add("dT", "Brine temperature difference", "ΔT", "={Tret}-{Tsup}", "K")
ch.add("dTF", "Brine temperature difference, US", "ΔT_F", "={dT}*1.8+32", "°F",
       planted=("offset-scale", "a temperature difference converted with the +32 of a reading"))
ch.add("TsupF", "Brine supply temperature, US", "t_sup,F", "={Tsup}*1.8+32", "°F")
ch.add("frchk", "Freeze margin check (5 K below supply)", "check_fr",
       "=IF({Tfr}<={TsupF}-5,\"OK\",\"MORE GLYCOL\")",
       planted=("offset-scale", "freezing point in °C compared with the supply in °F"))
ch.heading("Brine flow")
ch.add("m", "Brine mass flow", "m", "={Qtot}*1000/({cp}*{dT})", "kg/s",
       planted=("unit-scale", "kW over kJ/(kg·K) with a ×1000 as if c_p were in J: 1000 too "
                "large"))
ch.add("Vls", "Brine volume flow", "V", "={m}/{rho}*1000", "L/s")
ch.add("Vgpm", "Brine volume flow, US", "V_gpm", "={Vls}*15.85", "gpm")
ch.add("SG", "Brine specific gravity", "SG", "={rho}/1000", "-")
ch.add("cpr", "Brine specific heat relative to water", "c_p,r", "={cp}/4.187", "-")
ch.add("gpmus", "Brine flow, US rule (500·SG·c_p ratio)", "V_gpm,US",
       "={TR}*12000/(500*{SG}*{cpr}*{dTF})", "gpm")
ch.add("Dp", "Main header inside diameter", "D_p", 200, "mm")
ch.add("vp", "Velocity in the main header", "v_p", "={Vls}/1000/(PI()*({Dp}/1000)^2/4)", "m/s")
ch.heading("Brine pump P-2")
ch.add("dpe", "Evaporator pressure drop (chiller data)", "Δp_e", 55, "kPa")
ch.add("dpx", "Plate heat exchangers, worst branch", "Δp_x", 40, "kPa")
ch.add("hfp", "Pipework friction loss, index circuit", "h_f", 7.5, "m")
ch.add("He", "Evaporator loss as head", "H_e", "={dpe}*1000/{rho}", "m",
       planted=("result-unit", "Δp/ρ with g left out: J/kg, not m"))
ch.add("Hx", "Exchanger loss as head", "H_x", "={dpx}*1000/({rho}*9.81)", "m")
ch.add("H", "Pump head", "H", "={He}+{Hx}+{hfp}", "m")
ch.add("Hft", "Pump head, US", "H_ft", "={H}*3.281", "ft")
ch.add("etap", "Pump efficiency at duty point", "eta_p", 72, "%")
ch.add("Ph", "Hydraulic power", "P_h", "={rho}*9.81*{Vls}/1000*{H}/1000", "kW")
ch.add("Ps", "Pump shaft power", "P_s", "={Ph}/({etap}/100)", "kW")
ch.add("bhp", "Brake horsepower, US check", "P_bhp", "={Vgpm}*{Hft}*{SG}/(3960*{etap}/100)", "hp")
ch.add("ps", "Pump suction pressure (expansion vessel)", "p_s", 120, "kPa(g)")
ch.add("pv", "Brine vapour pressure at return temperature", "p_v", 0.5, "kPa")
ch.add("hs", "Suction line losses", "h_s", 0.8, "m")
ch.add("NPSH", "NPSH available", "NPSH_a", "=({ps}-{pv})*1000/({rho}*9.81)-{hs}", "m",
       planted=("offset-scale", "gauge suction pressure less an absolute vapour pressure: "
                "the atmosphere left out"))
ch.heading("Chiller performance and heat rejection")
ch.add("Pc", "Compressor input power (chiller data)", "P_c", 285, "kW")
ch.add("COP", "Coefficient of performance", "COP", "={Qtot}/{Pc}", "-")
ch.add("kWTR", "Power per ton", "kW/TR", "={Pc}/{TR}", "kW/TR")
ch.add("EER", "Energy efficiency ratio", "EER", "={COP}*3.412", "Btu/(W·h)")
ch.add("Qrej", "Heat rejection at the condenser", "Q_c", "={Qtot}+{Pc}", "kW")
ch.add("QrejM", "Heat rejection, US", "Q_c,US", "={Qrej}*3.412", "MBH")
ch.add("dTc", "Condenser water range (temperature difference)", "ΔT_c", 5.5, "K")
ch.add("dTcF", "Condenser water range, US (temperature difference)", "ΔT_c,F", "={dTc}*1.8",
       "°F")
ch.add("gpmc", "Condenser water flow", "V_c,gpm", "={QrejM}*1000/(500*{dTc})", "gpm",
       planted=("unit-scale", "range in K put into the 500 formula that wants °F: 1.8 too "
                "large"))
ch.add("Lpsc", "Condenser water flow, SI", "V_c", "={gpmc}*0.0631", "L/s")
CHILLER = ch.finish()

LOADS = {
    "A1": "Pellam Dale creamery: brine loads on CH-2 (process engineer's schedule, invented)",
    "A2": ("Sources: design load = connected load × diversity; 1 TR = 3.517 kW, NIST SP 811 "
           "(2008) App. B.8; diversity factors: common practice for batch dairy plant, from "
           "memory."),
    "A3": CAUTION,
    "A4": "Process", "B4": "Connected load [kW]", "C4": "Diversity [%]",
    "D4": "Design load [kW]", "E4": "Design load [TR]",
    "A10": "Total", "B10": "=SUM(B5:B9)", "D10": "=SUM(D5:D9)", "E10": "=SUM(E5:E9)",
}
for r, (name, kw, div) in enumerate([("Raw milk silo cooling", 320, 80),
                                     ("Pasteuriser final cooling", 260, 100),
                                     ("Cream cooling", 140, 90), ("Cheese vat jackets", 180, 60),
                                     ("Cold store air coolers", 150, 85)], start=5):
    LOADS[f"A{r}"], LOADS[f"B{r}"], LOADS[f"C{r}"] = name, kw, div
    LOADS[f"D{r}"] = f"=B{r}*C{r}/100"
    LOADS[f"E{r}"] = f"=D{r}/3.517"
LOADS["D7"] = "=B7*C7"                # planted: diversity in % used as a fraction

GLYCOL = {
    "A1": "Propylene glycol brine near 0 °C by mass concentration (from memory of ASHRAE "
          "Handbook—Fundamentals 2017 ch. 31; check against the supplier's data)",
    "A4": "Concentration [%]", "B4": "c_p [kJ/(kg·K)]", "C4": "Density [kg/m³]",
    "D4": "Freezing point [°C]",
}
for r, row in enumerate([(20, 3.93, 1018, -7), (25, 3.87, 1023, -10), (30, 3.80, 1027, -13),
                         (35, 3.73, 1031, -17), (40, 3.65, 1035, -21)], start=5):
    for c, v in zip("ABCD", row):
        GLYCOL[f"{c}{r}"] = v

BRINE = {
    "trade": "refrigeration: dairy glycol brine chiller, brine pump and heat rejection",
    "sheets": [("Chiller", CHILLER), ("Loads", LOADS), ("Glycol", GLYCOL)],
    "planted": {**ch.planted,
                "Loads!D7": ("unit-scale", "diversity in % used as a fraction: design load 100 "
                             "too large")},
}

BOOKS = {"wet-well": WET, "lime-kiln": LIME, "canal-balance": CANALBOOK, "brine-chiller": BRINE}

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
