#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review35), written with the
standard library only (corpus/sheets/xlsx_writer.py and item_sheet.py, shared by the review
books), adapted from corpus/sheets/review19/make_books.py.

Trades: a water utility's reservoir and booster pumping energy sheet; a process boiler's
blowdown, feedwater and flash steam sheet; an aluminium smelter potline sheet; an infinite-slope
stability sheet for a road cutting. All scenarios, sites, readings and catalogue data are
invented (demonstration only); the formulas and published factors are the trade's own, with
their sources named in a text cell at the top of each sheet.

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. The findings plumb makes beyond the planted ones, and the planted cells it
misses, are recorded with their reasons in review_notes.py after running the binary of the day.

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
# Book 1: water utility, reservoir and booster pumping energy (ML/d and MGD, m and ft, kWh,
# kWh/ML, $/kWh)
# --------------------------------------------------------------------------------------------
WATER_SRC = (
    "Sources: demand = population × per-capita consumption (planning values invented for this "
    "scenario); 1 US gal = 3.785 L, so 1 MGD = 3.785 ML/d, and 1 ft = 0.3048 m (3.281 ft/m): "
    "NIST SP 811 (2008) App. B.8; 1 MGD = 694.4 gpm and 1 ML/d = 11.57 L/s "
    "= 1/86.4 m³/s (arithmetic on the day, 86 400 s and 1440 min): common practice; "
    "Hazen–Williams in SI, h_f = 10.67·L·Q^1.852/(C^1.852·D^4.87): common practice (from "
    "memory); hydraulic power P = ρ·g·Q·H, 9.81·Q·H kW with Q in m³/s and H in m (ρ = 1000 "
    "kg/m³, g = 9.81 m/s²): common practice; water horsepower = gpm·ft/3960, Cameron Hydraulic "
    "Data 19th ed. (from memory); 9.81 kPa per m of water: common practice; "
    "specific energy 2.725 kWh/ML per metre of head at 100 % efficiency (9.81 MJ per ML per m ÷ "
    "3.6 MJ/kWh): common practice. Tariff, levels, pipe and pump data invented.")
pu = ItemSheet("Pumping", "Brackenfold Water: Marlow Road booster station to Hollins Hill "
               "reservoir, duty and energy (invented scenario)", WATER_SRC)
pu.heading("Demand")
pu.add("Qavg", "Average day demand, zones and bulk supply", "Q_avg", "=Demand!D9", "ML/d")
pu.add("Qpd", "Peak day demand, zones and bulk supply", "Q_pd", "=Demand!G9", "ML/d")
pu.add("NRW", "Non-revenue water allowance (leakage)", "NRW", 12, "%")
pu.add("Qpump", "Pumping requirement, peak day", "Q_pump", "={Qpd}*(1+{NRW}/100)", "ML/d")
pu.add("Thr", "Pumping hours per day (off-peak tariff window)", "t_p", 20, "h/d")
pu.add("Qrun", "Station output while running", "Q_run", "={Qpump}*24/{Thr}", "ML/d")
pu.add("Qm3s", "Station output while running", "Q_run", "={Qrun}/86.4", "m³/s")
pu.add("QLs", "Station output while running", "Q_run", "={Qrun}*11.57", "L/s")
pu.add("Qgpm", "Station output, gpm (US pump catalogue)", "Q_gpm", "={Qrun}/3.785*694.4", "gpm")
pu.heading("Pumps")
pu.add("model", "Duty pump model (2 duty + 1 standby)", "model", "HSC-300")
pu.add("nd", "Duty pumps running", "n_d", 2, "-")
pu.add("Qr", "Rated flow per pump", "Q_r", "=VLOOKUP({model},Pumps!A5:E9,2,FALSE)", "L/s")
pu.add("Hr", "Rated head per pump (catalogue in ft)", "H_r",
       "=VLOOKUP({model},Pumps!A5:E9,3,FALSE)/3.281", "m")
pu.add("etap", "Pump efficiency at duty point", "eta_p", "=VLOOKUP({model},Pumps!A5:E9,4,FALSE)",
       "%")
pu.add("qchk", "Capacity check", "check_Q", "=IF({nd}*{Qr}>={QLs},\"OK\",\"UNDERSIZED\")")
pu.heading("Hydraulics")
pu.add("TWL", "Hollins Hill reservoir top water level", "z_TWL", 186.5, "m")
pu.add("LWL", "Marlow Road suction well low level", "z_LWL", 92.4, "m")
pu.add("Hst", "Static head", "H_st", "={TWL}-{LWL}", "m")
pu.add("L", "Rising main length", "L", 4.2, "km")
pu.add("D", "Rising main internal diameter", "D", 450, "mm")
pu.add("C", "Hazen–Williams C (ductile iron, cement lined)", "C", 130, "-")
pu.add("hf", "Rising main friction loss", "h_f",
       "=10.67*{L}*1000*{Qm3s}^1.852/({C}^1.852*({D}/1000)^4.87)", "m")
pu.add("hf2", "Rising main friction loss (hand check)", "h_f2",
       "=10.67*{L}*1000*{Qm3s}^1.852/({C}^1.852*{D}^4.87)", "m",
       planted=("unit-scale", "Hazen–Williams with the diameter in mm where the SI form wants m"))
pu.add("hm", "Minor losses (valves, bends, meter)", "h_m", 2.5, "m")
pu.add("TDH", "Total dynamic head", "TDH", "={Hst}+{hf}+{hm}", "m")
pu.add("TDHft", "Total dynamic head, ft", "TDH_ft", "={TDH}*3.281", "ft")
pu.add("dp", "Pressure rise across the station", "Δp", "=9.81*{TDH}", "kPa")
pu.heading("Power and energy")
pu.add("Ph", "Hydraulic power", "P_h", "=9.81*{Qm3s}*{TDH}", "kW")
pu.add("Ph2", "Hydraulic power (from the ft head)", "P_h2", "=9.81*{Qm3s}*{TDHft}", "kW",
       planted=("unit-scale", "9.81·Q·H with the head in ft: 3.281 too large"))
pu.add("Ph3", "Hydraulic power (ρ·g·Q·H)", "P_h3", "=1000*9.81*{Qm3s}*{TDH}", "kW",
       planted=("unit-scale", "ρ·g·Q·H gives W, written as kW: 1000 too large"))
pu.add("etam", "Motor efficiency", "eta_m", 95, "%")
pu.add("etav", "Variable speed drive efficiency", "eta_v", 97, "%")
pu.add("eta", "Wire-to-water efficiency", "eta", "={etap}*{etam}*{etav}/10000", "%")
pu.add("Pin", "Electrical input, station", "P_in", "={Ph}/({eta}/100)", "kW")
pu.add("Pin2", "Electrical input (pump and motor only)", "P_in2", "={Ph}/({etap}/100*{etam})",
       "kW", planted=("unit-scale", "95 % motor efficiency used as 95: input 100 too small"))
pu.add("whp", "Water horsepower, US check", "P_whp", "={Qgpm}*{TDHft}/3960", "hp")
pu.add("E", "Energy per peak day", "E", "={Pin}*{Thr}", "kWh/d")
pu.add("SE", "Specific energy", "SE", "={E}/{Qpump}", "kWh/ML")
pu.add("SE2", "Specific energy (annual report form)", "SE_2", "={E}/{Qpump}", "kWh/m³",
       planted=("unit-scale", "kWh per ML written under kWh/m³: 1000 too large"))
pu.add("SEth", "Specific energy, rule of thumb 2.725 kWh/ML per m", "SE_th",
       "=2.725*{TDH}/({eta}/100)", "kWh/ML")
pu.add("tar", "Off-peak tariff", "tariff", 0.092, "$/kWh")
pu.add("costd", "Energy cost per peak day", "cost_d", "={E}*{tar}", "$/d")
PUMPING = pu.finish()

P = pu.ref
DEMAND = {
    "A1": "Brackenfold Water: Hollins Hill supply zone demand (2035 planning horizon, invented)",
    "A2": ("Sources: average day = population × per-capita consumption / 10^6 (L/d to ML/d); "
           "peak day = average day × peaking factor (factors invented, typical 1.3–1.8: common "
           "practice); 1 MGD = 3.785 ML/d (NIST SP 811 (2008) App. B.8, 1 US gal = 3.785 L); "
           "1 ML/d = 11.57 L/s (10^6 L over 86 400 s: common practice). The bulk supply is "
           "contracted in MGD."),
    "A3": CAUTION,
    "A4": "Zone", "B4": "Population [-]", "C4": "Per capita [L/cap/d]",
    "D4": "Average day [ML/d]", "E4": "Average day [MGD]", "F4": "Peaking factor [-]",
    "G4": "Peak day [ML/d]", "H4": "Peak day [L/s]",
    "A8": "Bulk supply, Tarnbeck Foods (contract)", "E8": 0.45, "F8": 1.2,
    "D8": "=E8*3.785", "G8": "=D8*F8", "H8": "=G8*11.57",
    "A9": "Total", "B9": "=SUM(B5:B7)", "D9": "=SUM(D5:D8)", "G9": "=SUM(G5:G8)",
}
for r, (zone, pop, pc, pf) in enumerate([("Hollins Hill village", 12400, 170, 1.6),
                                         ("Marlow Road estate", 8600, 160, 1.5),
                                         ("Brackenfold town (north)", 21900, 165, 1.4)],
                                        start=5):
    DEMAND[f"A{r}"], DEMAND[f"B{r}"], DEMAND[f"C{r}"], DEMAND[f"F{r}"] = zone, pop, pc, pf
    DEMAND[f"D{r}"] = f"=B{r}*C{r}/10^6"
    DEMAND[f"E{r}"] = f"=D{r}/3.785"
    DEMAND[f"G{r}"] = f"=D{r}*F{r}"
    DEMAND[f"H{r}"] = f"=G{r}*11.57"
DEMAND["E7"] = "=D7*3.785"          # planted: ML/d to MGD multiplied by 3.785
DEMAND["H6"] = "=G6/86.4"           # planted: ML/d treated as m³/d

PUMPS = {
    "A1": "Horizontal split-case pumps, 1480 rpm: duty point data (invented catalogue, US "
          "edition in ft; check against the maker's certified curve)",
    "A2": CAUTION,
    "A4": "Model", "B4": "Rated flow [L/s]", "C4": "Rated head [ft]", "D4": "Efficiency [%]",
    "E4": "Motor [kW]",
}
for r, row in enumerate([("HSC-200", 85, 360, 76, 132), ("HSC-250", 105, 385, 78, 160),
                         ("HSC-300", 125, 410, 80, 200), ("HSC-350", 150, 420, 81, 250),
                         ("HSC-400", 180, 430, 82, 280)], start=5):
    for c, v in zip("ABCDE", row):
        PUMPS[f"{c}{r}"] = v

rs = ItemSheet("Reservoir", "Hollins Hill service reservoir: storage required and provided "
               "(invented scenario)",
               "Sources: rectangular cells, V = n·L·W·d; balancing storage = peak day demand × "
               "share of the day without pumping, fire reserve = fire flow × duration (L/s × h × "
               "3.6 = m³), emergency reserve = hours of average day demand: common practice (check "
               "the utility's own storage standard); 1 ML = 1000 m³ (SI Brochure 9th ed., Table "
               "8). Dimensions and levels invented.")
rs.heading("Storage provided")
rs.add("nc", "Number of cells", "n_c", 2, "-")
rs.add("Lr", "Cell internal length", "L_r", 48, "m")
rs.add("Wr", "Cell internal width", "W_r", 32, "m")
rs.add("dop", "Operating depth, top to bottom water level", "d_op", 5.5, "m")
rs.add("V", "Operating storage provided", "V", "={nc}*{Lr}*{Wr}*{dop}/1000", "ML")
rs.heading("Storage required")
rs.add("Qf", "Fire flow", "Q_f", 50, "L/s")
rs.add("tf", "Fire duration", "t_f", 2, "h")
rs.add("te", "Emergency reserve, hours of average day demand", "t_e", 12, "h")
rs.add("Vbal", "Balancing storage", "V_bal", "=" + P("Qpd") + "*(24-" + P("Thr") + ")/24", "ML")
rs.add("Vfire", "Fire reserve", "V_fire", "={Qf}*{tf}*3.6", "m³")
rs.add("Vem", "Emergency reserve", "V_em", "=" + P("Qavg") + "*{te}/24", "ML")
rs.add("Vreq2", "Storage required (quick sum)", "V_req2", "=SUM({Vbal}:{Vem})", "ML",
       planted=("mixed-range", "the fire reserve in m³ summed with the ML rows"))
rs.add("Vreq", "Storage required", "V_req", "={Vbal}+{Vfire}/1000+{Vem}", "ML")
rs.add("schk", "Storage check", "check_V", "=IF({V}>={Vreq},\"OK\",\"SHORTFALL\")")
rs.add("ts", "Storage time at average day demand", "t_s", "={V}/" + P("Qavg") + "*24", "h")
rs.add("ts2", "Storage time (operations summary)", "t_s2", "={V}/" + P("Qavg"), "h",
       planted=("unit-scale", "days written as hours: 24 too small"))
rs.heading("Level now")
rs.add("lev", "Level now above floor (telemetry)", "h_now", 3.9, "m")
rs.add("bwl", "Bottom water level above floor", "h_BWL", 0.5, "m")
rs.add("Vnow", "Usable volume now", "V_now", "={nc}*{Lr}*{Wr}*({lev}-{bwl})/1000", "ML")
rs.add("tleft", "Time to bottom water level at peak day demand, no pumping", "t_left",
       "={Vnow}/" + P("Qpd") + "*24", "h")
RESERVOIR = rs.finish()

WATER = {
    "trade": "water supply: reservoir storage and booster pumping energy",
    "sheets": [("Pumping", PUMPING), ("Demand", DEMAND), ("Reservoir", RESERVOIR),
               ("Pumps", PUMPS)],
    "sidecar": ("# Invented scenario. A dimensionally consistent formula can still be wrong; this\n"
                "# check does not replace independent review under local codes and licensed practice.\n"
                "# Brackenfold Water: the counting word the trade writes into per-capita\n"
                "# consumption (L/cap/d).\n"
                "measure cap = 1 1 \"a person served (a count)\"\n"),
    "planted": {**pu.planted, **rs.planted,
                "Demand!E7": ("unit-scale", "ML/d to MGD multiplied by 3.785: wrong way round"),
                "Demand!H6": ("unit-scale", "ML/d divided by 86.4 as if m³/d: L/s 1000 too "
                              "small")},
}

# --------------------------------------------------------------------------------------------
# Book 2: process boiler blowdown, feedwater and flash steam (lb/h and kg/h, ppm and mg/L, %,
# psig and kPa g, kJ/kg and Btu/lb)
# --------------------------------------------------------------------------------------------
BOILER_SRC = (
    "Sources: blowdown rate B = S·F/(T_B − F), F the feedwater TDS and T_B the boiler water "
    "limit, cycles of concentration T_B/F: Spirax Sarco, The Steam and Condensate Loop (2007), "
    "Block 3 (from memory); 3000 ppm TDS limit for a shell boiler: BS 2486:1997 (from memory; "
    "check the boiler maker's limit); TDS ≈ 0.7 × conductivity (ppm per µS/cm at 25 °C) and "
    "1 mg/L = 1 ppm in dilute water: common practice; flash fraction (h_f1 − h_f2)/h_fg2 with "
    "the Steam sheet's values: Spirax Sarco (2007) Block 2 (from memory); ideal gas density "
    "ρ = p/(R·T) with R = 0.4615 kJ/(kg·K) for water vapour (CODATA 2018 R = 8.314 J/(mol·K) "
    "over M = 18.015 g/mol); T/K = t/°C + 273.15 (SI Brochure 9th ed.); 1 lb = 0.4536 kg "
    "(2.205 lb/kg), 1 psi = 6.895 kPa (0.145 psi/kPa), 1 Btu/lb = 2.326 kJ/kg, 1 kW = 3412 "
    "Btu/h: NIST SP 811 (2008) App. B.8; standard atmosphere 101.325 kPa = 14.7 psi (NIST SP "
    "811); c_p of water 4.19 kJ/(kg·K): common practice; flash vessel upward steam velocity "
    "at most 3 m/s: common practice (from memory). Boiler data, analyses and prices invented.")
bd = ItemSheet("Blowdown", "Kellington Dairy boiler house: TDS blowdown, feedwater and flash "
               "steam recovery (invented scenario)", BOILER_SRC)
bd.heading("Steam demand")
bd.add("Sp", "Process steam (pasteurisers, evaporator)", "S_p", 4200, "kg/h")
bd.add("Sc", "CIP and tank heating", "S_c", 1100, "kg/h")
bd.add("Sdvlb", "Deaerator heating and vent (US vendor data sheet)", "S_dv,lb", 1450, "lb/h")
bd.add("Stot2", "Steam demand (quick sum)", "S_2", "=SUM({Sp}:{Sdvlb})", "kg/h",
       planted=("mixed-range", "the deaerator's lb/h summed with the kg/h rows"))
bd.add("Sdv", "Deaerator heating and vent", "S_dv", "={Sdvlb}*0.4536", "kg/h")
bd.add("Stot", "Steam demand", "S", "={Sp}+{Sc}+{Sdv}", "kg/h")
bd.add("Slb", "Steam demand, lb/h", "S_lb", "={Stot}*2.205", "lb/h")
bd.add("Scap", "Boiler capacity at full rating", "S_cap", "=Boilers!E8", "kg/h")
bd.add("capchk", "Capacity check", "check_S", "=IF({Stot}<={Scap},\"OK\",\"SHORT\")")
bd.heading("Water chemistry")
bd.add("cond", "Makeup conductivity (softened water, at 25 °C)", "κ_mu", 640, "µS/cm")
bd.add("TDSc", "Makeup TDS from conductivity (× 0.7)", "TDS_κ", "=0.7*{cond}", "ppm")
bd.add("TDSmu", "Makeup TDS (laboratory)", "TDS_mu", 455, "mg/L")
bd.add("CR", "Condensate return", "CR", 55, "%")
bd.add("TDScd", "Condensate TDS", "TDS_cd", 8, "mg/L")
bd.add("TDSF", "Feedwater TDS", "F", "=(1-{CR}/100)*{TDSmu}+{CR}/100*{TDScd}", "mg/L")
bd.add("TDSFp", "Feedwater TDS as ppm (dilute water, 1 mg/L = 1 ppm)", "F_ppm", "={TDSF}",
       "ppm")
bd.add("TDSB", "Maximum boiler water TDS (shell boiler)", "T_B", 3000, "ppm")
bd.add("cyc", "Cycles of concentration", "N_c", "={TDSB}/{TDSFp}", "-")
bd.add("BDp", "Blowdown, % of steam", "b_S", "={TDSFp}/({TDSB}-{TDSFp})*100", "%")
bd.add("BD", "Blowdown rate", "B", "={Stot}*{TDSFp}/({TDSB}-{TDSFp})", "kg/h")
bd.add("BD2", "Blowdown rate (from the %)", "B_2", "={Stot}*{BDp}", "kg/h",
       planted=("unit-scale", "blowdown % used as a fraction: 100 too large"))
bd.add("FW", "Feedwater flow", "FW", "={Stot}+{BD}", "kg/h")
bd.add("BDf", "Blowdown, % of feedwater", "b_F", "={BD}/{FW}*100", "%")
bd.add("BDf2", "Blowdown, % of feedwater (boiler log)", "b_F2", "={BD}/{FW}", "%",
       planted=("unit-scale", "a fraction written under %: 100 too small"))
bd.add("MU", "Makeup water", "MU", "={FW}*(1-{CR}/100)", "kg/h")
bd.heading("Pressures and flash steam")
bd.add("pB", "Boiler operating pressure (header)", "p_B", "=Boilers!G7", "kPa g")
bd.add("pBpsig", "Boiler operating pressure, psig", "p_B,psig", "={pB}*0.145", "psig")
bd.add("pBa", "Boiler pressure, absolute", "p_B,a", "={pB}+101.325", "kPa a")
bd.add("pBpsia", "Boiler pressure, psia", "p_B,psia", "={pBpsig}+14.7", "psia")
bd.add("pBpsia2", "Boiler pressure, psia (for the US steam tables)", "p_B,psia2", "={pB}*0.145",
       "psia", planted=("offset-scale", "a gauge pressure converted and written as absolute"))
bd.add("pF", "Flash vessel pressure (feeds the deaerator)", "p_F", 20, "kPa g")
bd.add("pFa", "Flash vessel pressure, absolute", "p_F,a", "={pF}+101.325", "kPa a")
bd.add("hf1", "Boiler water enthalpy", "h_f1", "=VLOOKUP({pB},Steam!A5:E11,3)", "kJ/kg")
bd.add("tF", "Saturation temperature in the flash vessel", "t_F",
       "=VLOOKUP({pF},Steam!A5:E11,2)", "°C")
bd.add("hf2", "Liquid enthalpy in the flash vessel", "h_f2", "=VLOOKUP({pF},Steam!A5:E11,3)",
       "kJ/kg")
bd.add("hfg2", "Latent heat in the flash vessel", "h_fg2", "=VLOOKUP({pF},Steam!A5:E11,4)",
       "kJ/kg")
bd.add("xfl", "Flash fraction", "x_fl", "=({hf1}-{hf2})/{hfg2}", "-")
bd.add("hf1B", "Boiler water enthalpy, Btu/lb (US check)", "h_f1,B", "={hf1}/2.326", "Btu/lb")
bd.add("xfl2", "Flash fraction (US check)", "x_fl2", "=({hf1B}-{hf2})/{hfg2}", "-",
       planted=("unit-scale", "Btu/lb minus kJ/kg in the flash fraction"))
bd.add("mfl", "Flash steam to the deaerator", "m_fl", "={BD}*{xfl}", "kg/h")
bd.add("Rs", "Gas constant of water vapour", "R", 0.4615, "kJ/kg·K")
bd.add("rho", "Flash steam density (ideal gas, check against v_g)", "ρ_fl",
       "={pFa}/({Rs}*({tF}+273.15))", "kg/m³")
bd.add("rho2", "Flash steam density (ideal gas, first draft)", "ρ_fl2", "={pFa}/({Rs}*{tF})",
       "kg/m³", planted=("offset-scale", "°C where the gas law needs K"))
bd.add("rhot", "Flash steam density from the table", "ρ_t", "=1/VLOOKUP({pF},Steam!A5:E11,5)",
       "kg/m³")
bd.add("Dv", "Flash vessel internal diameter", "D_v", 200, "mm")
bd.add("Av", "Flash vessel bore area", "A_v", "=PI()*({Dv}/1000)^2/4", "m²")
bd.add("vel", "Upward steam velocity in the vessel", "v", "={mfl}/3600/({rhot}*{Av})", "m/s")
bd.add("vel2", "Upward steam velocity (vendor's form)", "v_2", "={mfl}/({rhot}*{Av})", "m/s",
       planted=("unit-scale", "kg/h not turned into kg/s: 3600 too large"))
bd.add("vchk", "Velocity check (3 m/s)", "check_v", "=IF({vel}<=3,\"OK\",\"ENLARGE VESSEL\")")
bd.heading("Heat recovery")
bd.add("tout", "Blowdown leaving the heat exchanger", "t_out", 25, "°C")
bd.add("Qfl", "Heat returned in the flash steam (latent)", "Q_fl", "={mfl}*{hfg2}/3600", "kW")
bd.add("Qhx", "Heat from the residual blowdown to the makeup", "Q_hx",
       "=({BD}-{mfl})*4.19*({tF}-{tout})/3600", "kW")
bd.add("Qhx2", "Heat from the residual blowdown (rev. A)", "Q_hx2",
       "=({BD}-{mfl})*4.19*({tF}-{tout})/3.6", "kW",
       planted=("unit-scale", "kJ/h divided by 3.6 gives W, written as kW: 1000 too large"))
bd.add("Qtot", "Heat recovered", "Q", "={Qfl}+{Qhx}", "kW")
bd.add("QBtu", "Heat recovered, Btu/h", "Q_Btu", "={Qtot}*3412", "Btu/h")
bd.add("hrs", "Operating hours", "t_op", 6000, "h/yr")
bd.add("etab", "Boiler efficiency (gross)", "eta_b", 84, "%")
bd.add("Fs", "Fuel saved", "F_s", "={Qtot}*{hrs}*3.6/1000/({etab}/100)", "GJ/yr")
bd.add("gas", "Gas price", "c_gas", 11.5, "$/GJ")
bd.add("save", "Annual saving", "saving", "={Fs}*{gas}", "$/yr")
BLOWDOWN = bd.finish()

BOILERS = {
    "A1": "Kellington Dairy: boilers and set pressures (invented)",
    "A2": ("Sources: steam = rating × load; 1 lb = 0.4536 kg, 1 psi = 6.895 kPa (0.145 "
           "psi/kPa): NIST SP 811 (2008) App. B.8. B1's plate is in lb/h and psig, B2's in "
           "kPa g; both ratings are given here in lb/h for the insurer's form."),
    "A3": CAUTION,
    "A4": "Boiler", "B4": "Rating [lb/h]", "C4": "Load [%]", "D4": "Steam [lb/h]",
    "E4": "Steam [kg/h]", "F4": "Set pressure [psig]", "G4": "Set pressure [kPa g]",
    "A5": "B1 firetube (US-built, 1998)", "B5": 10000, "C5": 72, "D5": "=B5*C5/100",
    "E5": "=D5*0.4536", "F5": 150, "G5": "=F5*6.895",
    "A6": "B2 shell (2019)", "B6": 8800, "C6": 65, "D6": "=B6*C6/100",
    "E6": "=D6/0.4536", "G6": 1000, "F6": "=G6*0.145",
    "A7": "Total / header", "D7": "=SUM(D5:D6)", "E7": "=SUM(E5:E6)", "G7": "=MIN(G5:G6)",
    "A8": "Full rating", "B8": "=SUM(B5:B6)", "E8": "=B8*0.4536",
}

STEAM = {
    "A1": "Saturated steam by gauge pressure (rounded from IAPWS-IF97 tables, from memory; "
          "gauge on a 101.325 kPa atmosphere; check against published tables before use)",
    "A2": CAUTION,
    "A4": "Pressure [kPa g]", "B4": "Saturation temperature [°C]", "C4": "h_f [kJ/kg]",
    "D4": "h_fg [kJ/kg]", "E4": "v_g [m³/kg]",
}
for r, row in enumerate([(0, 100.0, 419.0, 2257.0, 1.673), (20, 105.1, 440.8, 2243.4, 1.419),
                         (100, 120.4, 505.6, 2201.1, 0.881), (200, 133.7, 562.2, 2163.3, 0.603),
                         (400, 152.0, 640.7, 2107.4, 0.375), (700, 170.5, 721.4, 2047.7, 0.240),
                         (1000, 184.1, 781.6, 1998.5, 0.177)], start=5):
    for c, v in zip("ABCDE", row):
        STEAM[f"{c}{r}"] = v

BOILER = {
    "trade": "process steam: boiler TDS blowdown, feedwater and flash steam recovery",
    "sheets": [("Blowdown", BLOWDOWN), ("Boilers", BOILERS), ("Steam", STEAM)],
    "planted": {**bd.planted,
                "Boilers!E6": ("unit-scale", "lb/h to kg/h divided by 0.4536: wrong way round")},
}

# --------------------------------------------------------------------------------------------
# Book 3: aluminium smelter potline (kA, V and mV, MW and MWh/d, kWh/kg Al, t/d, %)
# --------------------------------------------------------------------------------------------
POT_SRC = (
    "Sources: Faraday's law m = I·t·M/(z·F), electrochemical equivalent of aluminium 0.3356 "
    "kg/(kA·h), current efficiency = metal tapped / theoretical, specific DC energy W = "
    "V/(0.3356·CE) = 2.98·V/CE kWh/kg Al: K. Grjotheim and H. Kvande (eds.), Introduction to "
    "Aluminium Electrolysis, 2nd ed. (Aluminium-Verlag, 1993) (from memory); F = 96 485.332 "
    "C/mol (CODATA 2018); M(Al) = 26.98 g/mol (IUPAC standard atomic weight 26.9815); net "
    "carbon 0.40–0.45 t/t Al and alumina 1.92–1.93 t/t Al: from memory; Stefan–Boltzmann σ = "
    "5.670 × 10⁻⁸ W/(m²·K⁴) (CODATA 2018), shell emissivity 0.8 and h_c = 11 W/(m²·K): from "
    "memory; T/K = t/°C + 273.15 (SI Brochure 9th ed.); 1 t = 1.102 short ton, 1 lb = 0.4536 "
    "kg: NIST SP 811 (2008) App. B.8; anode current density limit 0.85 A/cm²: from memory, "
    "check the cell technology's design value. Line data, readings and prices invented.")
ln = ItemSheet("Line", "Strathcarron Aluminium potline 2 (prebake cells): energy and "
               "production summary (invented scenario)", POT_SRC)
ln.heading("Faraday's law")
ln.add("M", "Molar mass of aluminium", "M", 26.98, "g/mol")
ln.add("z", "Electrons per aluminium atom", "z", 3, "-")
ln.add("F", "Faraday constant", "F", 96485, "C/mol")
ln.add("ee", "Electrochemical equivalent", "e", "={M}/({z}*{F})*3600", "kg/kA·h")
ln.add("ee2", "Electrochemical equivalent (rev. A)", "e_2", "={M}/({z}*{F})", "kg/kA·h",
       planted=("unit-scale", "g/C without the 3600 s/h: 3600 too small"))
ln.heading("Line electrical")
ln.add("I", "Line current", "I", 320, "kA")
ln.add("n", "Cells in line", "n", "=Pots!B11", "-")
ln.add("Vc", "Mean cell voltage incl. busbar", "V_c", "=Pots!E11", "V")
ln.add("VcB1", "Cell voltage incl. busbar, Room B section 1 (hand check)", "V_B1",
       "=Pots!C8+Pots!D8", "V",
       planted=("unit-scale", "busbar drop in mV added to the cell voltage in V"))
ln.add("Vext", "External busbar and rectifier-side drop", "V_ext", 22, "V")
ln.add("Vline", "Potline voltage", "V_line", "={n}*{Vc}+{Vext}", "V")
ln.add("PDC", "DC power", "P_DC", "={I}*{Vline}/1000", "MW")
ln.add("PDC2", "DC power (control room form)", "P_DC2", "={I}*{Vline}/10^6", "MW",
       planted=("unit-scale", "kA taken as A: 1000 too small"))
ln.add("etar", "Rectifier efficiency", "eta_r", 97.5, "%")
ln.add("PAC", "AC power drawn", "P_AC", "={PDC}/({etar}/100)", "MW")
ln.add("EDC", "DC energy per day", "E_DC", "={PDC}*24", "MWh/d")
ln.add("EDC2", "DC energy per day (utility form)", "E_DC2", "={PDC}*24", "kWh/d",
       planted=("unit-scale", "MWh written under kWh/d: 1000 too small"))
ln.add("EAC", "AC energy per day", "E_AC", "={PAC}*24", "MWh/d")
ln.heading("Production and current efficiency")
ln.add("Pth", "Theoretical metal production", "P_th", "={n}*{ee}*{I}*24/1000", "t/d")
ln.add("Pth2", "Theoretical metal production (first draft)", "P_th2", "={n}*{ee}*{I}*24", "t/d",
       planted=("unit-scale", "kg/d written under t/d: 1000 too large"))
ln.add("Pact", "Metal tapped, 7-day mean", "P", "=Taps!B12", "t/d")
ln.add("CE", "Current efficiency", "CE", "={Pact}/{Pth}*100", "%")
ln.add("CEchk", "Current efficiency check (93 %)", "check_CE",
       "=IF({CE}>=93,\"OK\",\"INVESTIGATE\")")
ln.add("CEb", "Budget current efficiency", "CE_b", 94.5, "%")
ln.add("Pplan", "Production at the budget current efficiency", "P_b",
       "={n}*{ee}*{I}*24*{CEb}/100/1000", "t/d")
ln.add("Pplan2", "Production at the budget CE (monthly report)", "P_b2",
       "={n}*{ee}*{I}*24*{CEb}/1000", "t/d",
       planted=("unit-scale", "current efficiency in % used as a fraction: 100 too large"))
ln.add("Pton", "Metal tapped, short tons (US customer)", "P_ton", "={Pact}*1.102", "ton/d")
ln.add("WDC", "Specific DC energy", "W_DC", "={Vc}/({ee}*{CE}/100)", "kWh/kg Al")
ln.add("WDCr", "Specific DC energy, rule of thumb 2.98·V/CE", "W_DC,r",
       "=2.98*{Vc}/({CE}/100)", "kWh/kg Al")
ln.add("WDCl", "Specific DC energy, line (incl. external drop)", "W_DC,l", "={EDC}/{Pact}",
       "kWh/kg Al")
ln.add("WDCl2", "Specific DC energy, line (board report)", "W_DC,l2", "={EDC}*1000/{Pact}",
       "kWh/kg Al", planted=("unit-scale", "kWh per tonne written under kWh/kg: 1000 too large"))
ln.add("WAC", "Specific AC energy", "W_AC", "={WDC}/({etar}/100)", "kWh/kg Al")
ln.add("Wlb", "Specific AC energy, per lb (US customer)", "W_lb", "={WAC}*0.4536", "kWh/lb")
ln.heading("Anodes and materials")
ln.add("na", "Anodes per cell", "n_a", 40, "-")
ln.add("La", "Anode length", "L_a", 1.55, "m")
ln.add("Wa", "Anode width", "W_a", 0.65, "m")
ln.add("ACD", "Anode current density", "i_a", "={I}*1000/({na}*{La}*{Wa}*10^4)", "A/cm²")
ln.add("ACD2", "Anode current density (rev. A)", "i_a2", "={I}*1000/({na}*{La}*{Wa})", "A/cm²",
       planted=("unit-scale", "A/m² written under A/cm²: 10^4 too large"))
ln.add("ACDchk", "Anode current density check", "check_i", "=IF({ACD}<=0.85,\"OK\",\"HIGH\")")
ln.add("NC", "Net carbon consumption", "c_net", 0.415, "t/t Al")
ln.add("Cuse", "Net carbon used", "C_use", "={Pact}*{NC}", "t/d")
ln.add("AO", "Alumina consumption", "a", 1.925, "t/t Al")
ln.add("Ause", "Alumina used", "A_use", "={Pact}*{AO}", "t/d")
ln.heading("Side wall heat loss, one cell")
ln.add("Ts", "Shell side wall temperature (IR survey)", "t_s", 285, "°C")
ln.add("Ta", "Potroom air temperature", "t_a", 38, "°C")
ln.add("eps", "Shell emissivity", "ε", 0.8, "-")
ln.add("sig", "Stefan–Boltzmann constant", "σ", 5.670E-8, "W/m²·K⁴")
ln.add("As", "Shell side wall area", "A_s", 26, "m²")
ln.add("hc", "Convection coefficient", "h_c", 11, "W/m²·K")
ln.add("qrad", "Radiation from the side walls", "q_rad",
       "={sig}*{eps}*(({Ts}+273.15)^4-({Ta}+273.15)^4)*{As}/1000", "kW")
ln.add("qrad2", "Radiation from the side walls (first draft)", "q_rad2",
       "={sig}*{eps}*({Ts}^4-{Ta}^4)*{As}/1000", "kW",
       planted=("offset-scale", "°C raised to the fourth power where the law needs K"))
ln.add("qconv", "Convection from the side walls", "q_conv", "={hc}*({Ts}-{Ta})*{As}/1000", "kW")
ln.add("qtot", "Side wall heat loss", "q", "={qrad}+{qconv}", "kW")
ln.add("qshare", "Side wall loss, share of cell power", "q_share", "={qtot}/({Vc}*{I})*100", "%")
ln.heading("Energy cost")
ln.add("tar", "Power price (contract)", "c_e", 38, "$/MWh")
ln.add("cost", "Energy cost per tonne of metal", "c_t", "={WAC}*{tar}", "$/t")
ln.add("cost2", "Energy cost per tonne (budget sheet)", "c_t2", "={WAC}*{tar}/1000", "$/t",
       planted=("unit-scale", "kWh/kg × $/MWh is already $/t; the /1000 makes it 1000 too "
                "small"))
ln.add("costd", "Energy cost per day", "c_d", "={EAC}*{tar}", "$/d")
LINE = ln.finish()

POTS = {
    "A1": "Strathcarron potline 2: cell groups, shift means (invented readings)",
    "A2": ("Sources: voltage including the pot-to-pot busbar share = cell voltage + busbar drop "
           "(mV/1000): common practice; line means weighted by cells (SUMPRODUCT)."),
    "A3": CAUTION,
    "A4": "Group", "B4": "Cells [-]", "C4": "Cell voltage [V]", "D4": "Busbar drop [mV]",
    "E4": "Voltage incl. busbar [V]",
    "A11": "Line", "B11": "=SUM(B5:B10)", "C11": "=SUMPRODUCT(B5:B10,C5:C10)/B11",
    "D11": "=AVERAGE(D5:D10)", "E11": "=SUMPRODUCT(B5:B10,E5:E10)/B11",
}
for r, (g, v, mv) in enumerate([("Room A, section 1", 3.94, 262), ("Room A, section 2", 3.97, 255),
                                 ("Room A, section 3", 3.92, 270), ("Room B, section 1", 3.96, 248),
                                 ("Room B, section 2", 3.99, 258), ("Room B, section 3", 3.95, 265)],
                                start=5):
    POTS[f"A{r}"], POTS[f"B{r}"], POTS[f"C{r}"], POTS[f"D{r}"] = g, 48, v, mv
    POTS[f"E{r}"] = f"=C{r}+D{r}/1000"

TAPS = {
    "A1": "Strathcarron potline 2: metal tapped and bath temperatures, last 7 days (invented)",
    "A2": ("Sources: superheat = bath temperature − liquidus temperature (a difference, in K): "
           "common practice."),
    "A3": CAUTION,
    "A4": "Day", "B4": "Metal tapped [t/d]", "C4": "Bath temperature [°C]",
    "D4": "Liquidus [°C]", "E4": "Superheat [K]",
    "A12": "Mean", "B12": "=AVERAGE(B5:B11)", "C12": "=AVERAGE(C5:C11)",
    "E12": "=AVERAGE(E5:E11)",
}
for r, (day, t, tb, tl) in enumerate([("Mon", 699.4, 962, 952), ("Tue", 703.1, 964, 953),
                                      ("Wed", 697.8, 961, 951), ("Thu", 701.6, 963, 954),
                                      ("Fri", 704.0, 965, 953), ("Sat", 700.2, 962, 952),
                                      ("Sun", 698.9, 960, 951)], start=5):
    TAPS[f"A{r}"], TAPS[f"B{r}"], TAPS[f"C{r}"], TAPS[f"D{r}"] = day, t, tb, tl
    TAPS[f"E{r}"] = f"=C{r}-D{r}"

POTLINE = {
    "trade": "primary aluminium: potline energy, production and current efficiency",
    "sheets": [("Line", LINE), ("Pots", POTS), ("Taps", TAPS)],
    "sidecar": ("# Invented scenario. A dimensionally consistent formula can still be wrong; this\n"
                "# check does not replace independent review under local codes and licensed practice.\n"
                "# Strathcarron potline 2: the smelter's 'kWh/kg Al' and 't/t Al' name the metal\n"
                "# a mass is of; 'Al' is a label, not a quantity (common practice).\n"
                "measure Al = 1 1 \"of aluminium (a label on a mass)\"\n"),
    "planted": ln.planted,
}

# --------------------------------------------------------------------------------------------
# Book 4: infinite-slope stability of a road cutting (kN/m³ and pcf, kPa and psf, m and ft,
# degrees, r_u, factor of safety)
# --------------------------------------------------------------------------------------------
SLOPE_SRC = (
    "Sources: infinite slope with seepage parallel to the slope, FS = [c' + (γ·z·cos²β − u)·"
    "tanφ'] / (γ·z·sinβ·cosβ), u = γ_w·h_w·cos²β, the same as FS = A·tanφ'/tanβ + B·c'/(γ·z) "
    "with A = 1 − r_u·(1 + tan²β), B = 1/(sinβ·cosβ), r_u = u/(γ·z): J. M. Duncan, S. G. Wright "
    "and T. L. Brandon, Soil Strength and Slope Stability, 2nd ed. (Wiley, 2014), ch. 6 (from "
    "memory); γ = ρ·g with g = 9.81 m/s², γ_w = 9.81 kN/m³ = 62.4 pcf: common practice; "
    "1 pcf = 0.1571 kN/m³, 1 psf = 0.04788 kPa, 1 ft = 0.3048 m (3.281 ft/m): NIST SP 811 "
    "(2008) App. B.8; Excel's trigonometric functions take radians (RADIANS, DEGREES); target "
    "FS 1.3 for a cutting's long-term condition: common practice, check the client's standard. "
    "Soil parameters, levels and laboratory results invented.")
sl = ItemSheet("Slope", "Harrowby cutting, A-road widening: infinite-slope check of the "
               "colluvium (invented scenario)", SLOPE_SRC)
sl.heading("Design parameters")
sl.add("soil", "Soil unit on the slip plane", "unit", "CLY-1")
sl.add("gam", "Unit weight", "γ", "=VLOOKUP({soil},Soils!A5:E9,3,FALSE)", "kN/m³")
sl.add("c", "Effective cohesion", "c'", "=VLOOKUP({soil},Soils!A5:E9,4,FALSE)", "kPa")
sl.add("phi", "Effective friction angle", "φ'", "=VLOOKUP({soil},Soils!A5:E9,5,FALSE)", "deg")
sl.add("gamx", "Upper-bound unit weight (driving check, lab)", "γ_max", "=MAX(Lab!B5:C9)",
       "kN/m³", planted=("mixed-range", "the pcf and kN/m³ columns in one MAX"))
sl.add("cl", "Effective cohesion, laboratory mean", "c'_lab", "=Lab!E10", "kPa")
sl.add("cl2", "Effective cohesion, laboratory mean (summary table)", "c'_lab2",
       "=Lab!E10*0.04788", "kPa",
       planted=("unit-scale", "a cohesion already in kPa converted from psf again"))
sl.add("cpsf", "Effective cohesion, laboratory mean (US report)", "c'_psf",
       "=AVERAGE(Lab!D5:D9)", "psf")
sl.add("rhoc", "Bulk density (core, borehole BH-3)", "ρ_c", 1.94, "Mg/m³")
sl.add("gamc", "Unit weight from the core density", "γ_c", "={rhoc}*9.81", "kN/m³")
sl.add("gw", "Unit weight of water", "γ_w", 9.81, "kN/m³")
sl.add("rhow", "Density of water", "ρ_w", 1.00, "Mg/m³")
sl.heading("Geometry")
sl.add("n", "Slope gradient, horizontal per 1 vertical", "n", 2.5, "-")
sl.add("beta", "Slope angle", "β", "=DEGREES(ATAN(1/{n}))", "deg")
sl.add("beta2", "Slope angle (section drawing check)", "β_2", "=ATAN(1/{n})", "deg",
       planted=("unit-scale", "ATAN gives radians, written under degrees: 57.3 too small"))
sl.add("z", "Depth of slip plane, vertical", "z", 2.8, "m")
sl.add("zft", "Depth of slip surface, boring B-3 log", "z_ft", 9.5, "ft")
sl.add("zB3", "Depth of slip surface at B-3", "z_B3", "={zft}*0.3048", "m")
sl.add("hw", "Water table above the slip plane, vertical", "h_w", 1.6, "m")
sl.heading("Infinite slope, effective stress")
sl.add("u", "Pore pressure on the slip plane", "u", "={gw}*{hw}*COS(RADIANS({beta}))^2", "kPa")
sl.add("u2", "Pore pressure on the slip plane (rev. A)", "u_2",
       "={rhow}*{hw}*COS(RADIANS({beta}))^2", "kPa",
       planted=("result-unit", "density of water where its unit weight belongs: g left out"))
sl.add("sv", "Vertical stress on the slip surface at B-3", "σ_v", "={gam}*{zB3}", "kPa")
sl.add("sv2", "Vertical stress at B-3 (from the log)", "σ_v2", "={gam}*{zft}", "kPa",
       planted=("unit-scale", "depth in ft with a unit weight in kN/m³: 3.281 too large"))
sl.add("sn", "Normal stress on the slip plane", "σ_n", "={gam}*{z}*COS(RADIANS({beta}))^2", "kPa")
sl.add("tau", "Shear stress on the slip plane", "τ",
       "={gam}*{z}*SIN(RADIANS({beta}))*COS(RADIANS({beta}))", "kPa")
sl.add("ru", "Pore pressure ratio", "r_u", "={u}/({gam}*{z})", "-")
sl.add("tauf", "Shear strength", "τ_f", "={c}+({sn}-{u})*TAN(RADIANS({phi}))", "kPa")
sl.add("tauf2", "Shear strength (lab cohesion)", "τ_f2", "={cpsf}+({sn}-{u})*TAN(RADIANS({phi}))",
       "kPa", planted=("unit-scale", "cohesion in psf added to stresses in kPa"))
sl.add("FS", "Factor of safety", "FS", "={tauf}/{tau}", "-")
sl.add("FSd", "Factor of safety, A·tanφ'/tanβ + B·c'/(γz) form", "FS_d",
       "=(1-{ru}*(1+TAN(RADIANS({beta}))^2))*TAN(RADIANS({phi}))/TAN(RADIANS({beta}))"
       "+{c}/({gam}*{z}*SIN(RADIANS({beta}))*COS(RADIANS({beta})))", "-")
sl.add("FSc", "Factor of safety, dry and cohesionless check", "FS_c",
       "=TAN({phi})/TAN(RADIANS({beta}))", "-",
       planted=("unit-scale", "TAN of an angle in degrees"))
sl.add("FSt", "Target factor of safety (long term)", "FS_t", 1.3, "-")
sl.add("chk", "Stability check", "check", "=IF({FS}>={FSt},\"OK\",\"INADEQUATE - DRAIN\")")
sl.add("FSmin", "Lowest factor of safety along the cutting", "FS_min", "=Sections!G10", "-")
sl.heading("US check (consultant's units)")
sl.add("gpcf", "Unit weight, pcf", "γ_pcf", "={gam}/0.1571", "pcf")
sl.add("gwus", "Unit weight of water, pcf", "γ_w,pcf", 62.4, "pcf")
sl.add("cpsfd", "Effective cohesion, psf", "c'_psf,d", "={c}/0.04788", "psf")
sl.add("zf", "Depth of slip plane, ft", "z_f", "={z}*3.281", "ft")
sl.add("hwf", "Water table above the slip plane, ft", "h_w,f", "={hw}*3.281", "ft")
sl.add("upsf", "Pore pressure, psf", "u_psf", "={gwus}*{hwf}*COS(RADIANS({beta}))^2", "psf")
sl.add("taupsf", "Shear stress, psf", "τ_psf",
       "={gpcf}*{zf}*SIN(RADIANS({beta}))*COS(RADIANS({beta}))", "psf")
sl.add("tfpsf", "Shear strength, psf", "τ_f,psf",
       "={cpsfd}+({gpcf}*{zf}*COS(RADIANS({beta}))^2-{upsf})*TAN(RADIANS({phi}))", "psf")
sl.add("FSus", "Factor of safety, US check", "FS_US", "={tfpsf}/{taupsf}", "-")
SLOPE = sl.finish()

SOILS = {
    "A1": "Harrowby cutting: design soil parameters by unit (invented ground investigation "
          "values; characteristic values to be confirmed by the geotechnical design report)",
    "A2": CAUTION,
    "A4": "Unit", "B4": "Description", "C4": "γ [kN/m³]", "D4": "c' [kPa]", "E4": "φ' [deg]",
}
for r, row in enumerate([("MG", "Made ground", 18.5, 0, 30), ("CLY-1", "Colluvium, clayey", 19.0,
                                                               5, 28),
                         ("CLY-2", "Weathered mudstone", 20.5, 8, 27),
                         ("SND", "Glacial sand", 19.5, 0, 34), ("TIL", "Glacial till", 21.0, 5, 30)],
                        start=5):
    for c, v in zip("ABCDE", row):
        SOILS[f"{c}{r}"] = v

LAB = {
    "A1": "Harrowby cutting: drained direct shear tests on the colluvium, US laboratory report "
          "(invented results)",
    "A2": ("Sources: 1 pcf = 0.1571 kN/m³ and 1 psf = 0.04788 kPa (NIST SP 811 (2008) App. "
           "B.8). " + CAUTION),
    "A4": "Test", "B4": "γ moist [pcf]", "C4": "γ [kN/m³]", "D4": "c' [psf]", "E4": "c' [kPa]",
    "F4": "φ' [deg]",
    "A10": "Mean", "C10": "=AVERAGE(C5:C9)", "E10": "=AVERAGE(E5:E9)", "F10": "=AVERAGE(F5:F9)",
}
for r, (t, g, c, f) in enumerate([("DS-1", 119, 60, 29), ("DS-2", 122, 85, 27), ("DS-3", 120, 70, 28),
                                  ("DS-4", 118, 50, 30), ("DS-5", 123, 95, 27)], start=5):
    LAB[f"A{r}"], LAB[f"B{r}"], LAB[f"D{r}"], LAB[f"F{r}"] = t, g, c, f
    LAB[f"C{r}"] = f"=B{r}*0.1571"
    LAB[f"E{r}"] = f"=D{r}*0.04788"
LAB["C7"] = "=B7/0.1571"            # planted: pcf to kN/m³ divided by 0.1571

S = sl.ref
SECTIONS = {
    "A1": "Harrowby cutting: infinite-slope factor of safety at the surveyed sections (invented "
          "survey and piezometer readings)",
    "A2": ("Sources: as the Slope sheet: r_u = γ_w·h_w·cos²β/(γ·z); FS = (1 − r_u·(1 + "
           "tan²β))·tanφ'/tanβ + c'/(γ·z·sinβ·cosβ) (Duncan, Wright and Brandon 2014, ch. 6, "
           "from memory)."),
    "A3": CAUTION,
    "A4": "Section", "B4": "Chainage [m]", "C4": "Slope angle [deg]", "D4": "Slip depth [m]",
    "E4": "Water above slip [m]", "F4": "r_u [-]", "G4": "FS [-]",
    "A10": "Mean / highest / lowest", "C10": "=AVERAGE(C5:C9)", "F10": "=MAX(F5:F9)",
    "G10": "=MIN(G5:G9)",
}
for r, (sec, ch, b, d, w) in enumerate([("S1", 120, 21.8, 2.8, 1.6), ("S2", 180, 23.5, 3.2, 2.1),
                                        ("S3", 240, 19.3, 2.5, 1.2), ("S4", 300, 25.0, 3.0, 2.4),
                                        ("S5", 360, 22.0, 2.6, 1.0)], start=5):
    SECTIONS[f"A{r}"], SECTIONS[f"B{r}"], SECTIONS[f"C{r}"] = sec, ch, b
    SECTIONS[f"D{r}"], SECTIONS[f"E{r}"] = d, w
    SECTIONS[f"F{r}"] = f"={S('gw')}*E{r}*COS(RADIANS(C{r}))^2/({S('gam')}*D{r})"
    SECTIONS[f"G{r}"] = (f"=(1-F{r}*(1+TAN(RADIANS(C{r}))^2))*TAN(RADIANS({S('phi')}))"
                         f"/TAN(RADIANS(C{r}))+{S('c')}/({S('gam')}*D{r}*SIN(RADIANS(C{r}))"
                         f"*COS(RADIANS(C{r})))")
SECTIONS["F8"] = f"=E8*COS(RADIANS(C8))^2/({S('gam')}*D8)"   # planted: γ_w left out

SLOPEBOOK = {
    "trade": "geotechnics: infinite-slope stability of a road cutting",
    "sheets": [("Slope", SLOPE), ("Sections", SECTIONS), ("Soils", SOILS), ("Lab", LAB)],
    "sidecar": ("# Invented scenario. A dimensionally consistent formula can still be wrong; this\n"
                "# check does not replace independent review under local codes and licensed practice.\n"
                "# Harrowby cutting: the US laboratory's 'pcf' is pound-force per cubic foot\n"
                "# (a unit weight; NIST SP 811 (2008) App. B.8, 1 lbf/ft³ = 157.09 N/m³).\n"
                "measure pcf = 1 lbf/ft^3 \"pound-force per cubic foot (unit weight)\"\n"),
    "planted": {**sl.planted,
                "Lab!C7": ("unit-scale", "pcf to kN/m³ divided by 0.1571: wrong way round"),
                "Sections!F8": ("result-unit", "r_u without the unit weight of water: g left "
                                "out")},
}

BOOKS = {"reservoir-pumping": WATER, "boiler-blowdown": BOILER, "potline": POTLINE,
         "slope-stability": SLOPEBOOK}

# The findings plumb makes beyond the planted ones, and the planted cells it misses, each with
# the reviewer's reason (in review_notes.py, filled in after running the binary).
EXTRA, MISSED, RENAMED, MESSAGES, HEADNOTE = {}, {}, {}, {}, {}
try:
    from review_notes import EXTRA, MISSED, RENAMED, MESSAGES, HEADNOTE  # noqa: F401,F811
except ImportError:
    pass


def main():
    write_books(HERE, BOOKS, {"EXTRA": EXTRA, "MISSED": MISSED, "RENAMED": RENAMED,
                              "MESSAGES": MESSAGES, "HEADNOTE": HEADNOTE})


if __name__ == "__main__":
    main()
