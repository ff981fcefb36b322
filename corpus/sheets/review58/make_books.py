#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review58), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; pattern after
corpus/sheets/review55/make_books.py.

Trades: an ice arena's ammonia/brine refrigeration plant; a municipal water booster pump
station; a food plant's steam boiler and condensate return; a highway bridge pier's spread
footing. All scenarios, sites, firms, readings and maker's data are invented (demonstration
only); the formulas and published factors are the trade's own, with their sources named in a
text cell at the top of each sheet ("from memory" where recalled and not checked, "common
practice" for a fact of the trade with no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and
its messages that mislead, are recorded in review_notes.py after running the round's build.

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
# Book 1: ice arena refrigeration plant (ft, ft², m², TR, kW, W/m², Btu/h, °F, °C, K, SG,
# Btu/(lb·°F), kJ/(kg·K), kg/m³, kg/s, L/s, gpm, hp, bhp/TR, psia, psig, kPa(a), %, kWh/yr)
# --------------------------------------------------------------------------------------------
ICE_SRC = (
    "Sources: 1 TR = 12 000 Btu/h = 3.517 kW, 1 kW = 3412 Btu/h, 1 hp = 0.7457 kW, 1 US gpm = "
    "0.06309 L/s, 1 ft² = 0.09290 m², 1 ft = 0.3048 m, 1 Btu/(lb·°F) = 4.187 kJ/(kg·K), "
    "1 psi = 6.895 kPa (NIST SP 811 (2008) App. B.8); °C = (°F − 32)/1.8, K = °C + 273.15 "
    "(SI Brochure 9th ed.); brine flow gpm = Btu/h / (500·SG·c_p·ΔT°F), 500 = 8.33 lb/gal × "
    "60 min/h (common practice); pump bhp = gpm·ft·SG/(3960·η) (common practice); hydraulic "
    "power ρ·g·Q·H, g_n = 9.81 m/s² (SI Brochure 9th ed.); calcium chloride brine about 25 % "
    "by mass, SG 1.24, c_p 0.68 Btu/(lb·°F) near 16 °F (ASHRAE Handbook—Fundamentals (2021) "
    "ch. 31, from memory); density of water at 60 °F 999 kg/m³ (common practice); ammonia "
    "saturation pressures on the Sat sheet (ASHRAE Handbook—Fundamentals (2021) ch. 30, from "
    "memory); condenser heat rejection = evaporator load + compressor shaft power for an open "
    "compressor (common practice); Carnot COP = T_e/(T_c − T_e) in kelvins (textbook). Arena, "
    "plant, maker's data and readings invented.")
ic = ItemSheet("Plant", "Kestrel Falls Community Ice Centre (invented): ammonia plant with "
               "calcium chloride brine for one 200 ft × 85 ft ice sheet, design day", ICE_SRC)
ic.heading("Ice sheet and load")
ic.add("Lr", "Ice sheet length", "L", 200, "ft")
ic.add("Wr", "Ice sheet width", "W", 85, "ft")
ic.add("A", "Ice sheet area", "A", "={Lr}*{Wr}", "ft²")
ic.add("Am", "Ice sheet area, m²", "A_m", "={A}*0.0929", "m²")
ic.add("QTR", "Design refrigeration load at the brine chiller (load calc, invented)", "Q_TR",
       125, "TR")
ic.add("QkW", "Design refrigeration load, kW", "Q", "={QTR}*3.517", "kW")
ic.add("QkW2", "Design refrigeration load, kW (European chiller maker's enquiry)", "Q_2",
       "={QTR}/3.517", "kW",
       planted=("unit-scale", "TR to kW divided by 3.517: wrong way round"))
ic.add("QB", "Design refrigeration load, Btu/h", "Q_B", "={QTR}*12000", "Btu/h")
ic.heading("Brine")
ic.add("tsF", "Brine supply temperature", "t_s", 16, "°F")
ic.add("trF", "Brine return temperature", "t_r", 20, "°F")
ic.add("dTF", "Brine temperature rise through the floor", "ΔT_F", "={trF}-{tsF}", "°F")
ic.add("tsC", "Brine supply temperature, °C", "t_s,C", "=({tsF}-32)/1.8", "°C")
ic.add("tsC2", "Brine supply temperature, °C (first draft)", "t_s,C2", "=({tsF}-32)*1.8", "°C",
       planted=("unit-scale", "°F to °C multiplied by 1.8: wrong way round"))
ic.add("dTK", "Brine temperature rise, K", "ΔT", "={dTF}/1.8", "K")
ic.add("SG", "Brine specific gravity (25 % CaCl₂)", "SG", 1.24, "SG")
ic.add("cpUS", "Brine specific heat", "c_p,US", 0.68, "Btu/(lb·°F)")
ic.add("cp", "Brine specific heat, SI", "c_p", "={cpUS}*4.187", "kJ/(kg·K)")
ic.add("rho", "Brine density", "ρ", "={SG}*999", "kg/m³")
ic.add("mb", "Brine mass flow", "ṁ", "={QkW}/({cp}*{dTK})", "kg/s")
ic.add("VLs", "Brine flow", "V̇", "={mb}/{rho}*1000", "L/s")
ic.add("VLs2", "Brine flow (first draft)", "V̇_2", "={mb}/{rho}", "L/s",
       planted=("unit-scale", "kg/s over kg/m³ gives m³/s, written as L/s: the ×1000 missing"))
ic.add("Vgpm", "Brine flow, US gpm", "V̇_US", "={VLs}/0.06309", "gpm")
ic.add("VgpmUS", "Brine flow, US gpm (US check by the 500 rule)", "V̇_US,c",
       "={QB}/(500*{SG}*{cpUS}*{dTF})", "gpm")
ic.heading("Brine pump")
ic.add("Hb", "Brine pump head (floor, headers and chiller, invented)", "H", 85, "ft")
ic.add("etab", "Brine pump efficiency (maker's curve, invented)", "η_b", 78, "%")
ic.add("bhpb", "Brine pump shaft power", "bhp_b", "={Vgpm}*{Hb}*{SG}/(3960*{etab}/100)", "hp")
ic.add("Pb", "Brine pump shaft power, kW", "P_b", "={bhpb}*0.7457", "kW")
ic.add("Pbchk", "Brine pump shaft power, SI check", "P_b,c",
       "={rho}*9.81*{VLs}/1000*{Hb}*0.3048/1000/({etab}/100)", "kW")
ic.heading("Compressors")
ic.add("tSST", "Saturated suction temperature", "t_e", 5, "°F")
ic.add("tSCT", "Saturated condensing temperature", "t_c", 95, "°F")
ic.add("tSSTC", "Saturated suction temperature, °C", "t_e,C", "=({tSST}-32)/1.8", "°C")
ic.add("tSCTC", "Saturated condensing temperature, °C", "t_c,C", "=({tSCT}-32)/1.8", "°C")
ic.add("psa", "Suction pressure, absolute (Sat sheet)", "p_e", "=VLOOKUP({tSST},Sat!A6:D8,2,FALSE)",
       "psia")
ic.add("pca", "Condensing pressure, absolute (Sat sheet)", "p_c",
       "=VLOOKUP({tSCT},Sat!A6:D8,2,FALSE)", "psia")
ic.add("psg", "Suction pressure, gauge (Sat sheet)", "p_e,g", "=VLOOKUP({tSST},Sat!A6:D8,3,FALSE)",
       "psig")
ic.add("pcg", "Condensing pressure, gauge (Sat sheet)", "p_c,g",
       "=VLOOKUP({tSCT},Sat!A6:D8,3,FALSE)", "psig")
ic.add("CR", "Compression ratio", "r", "={pca}/{psa}", "-")
ic.add("CR2", "Compression ratio (from the gauge readings)", "r_2", "={pcg}/{psg}", "-",
       planted=("offset-scale", "a ratio of gauge pressures: absolute belongs"))
ic.add("bpt", "Compressor specific power at 5 °F / 95 °F (maker, invented)", "b", 1.35,
       "bhp/TR")
ic.add("bhpc", "Compressor shaft power", "bhp_c", "={QTR}*{bpt}", "bhp")
ic.add("Pc", "Compressor shaft power, kW", "P_c", "={bhpc}*0.7457", "kW")
ic.add("Pc2", "Compressor shaft power, kW (motor starter schedule)", "P_c2", "={bhpc}*745.7",
       "kW", planted=("unit-scale", "hp to W (745.7) written into a kW cell: 1000 too large"))
ic.add("COP", "Coefficient of performance (shaft)", "COP", "={QkW}/{Pc}", "-")
ic.add("TeK", "Saturated suction temperature, absolute", "T_e", "={tSSTC}+273.15", "K")
ic.add("TcK", "Saturated condensing temperature, absolute", "T_c", "={tSCTC}+273.15", "K")
ic.add("COPc", "Carnot COP between the saturation temperatures", "COP_C", "={TeK}/({TcK}-{TeK})",
       "-")
ic.add("COPc2", "Carnot COP (first draft)", "COP_C2", "={tSSTC}/({tSCTC}-{tSSTC})", "-",
       planted=("offset-scale", "°C readings in Carnot's ratio: kelvins belong"))
ic.heading("Condenser and energy")
ic.add("Qcd", "Condenser heat rejection", "Q_cd", "={QkW}+{Pc}", "kW")
ic.add("Qcd2", "Condenser heat rejection (first draft)", "Q_cd2", "={QkW}+{bhpc}", "kW",
       planted=("unit-scale", "bhp added to kW"))
ic.add("hrs", "Plant operating hours per year (invented)", "t_a", 6500, "h/yr")
ic.add("LF", "Average compressor load over those hours (invented)", "LF", 55, "%")
ic.add("Ey", "Compressor shaft energy per year", "E_a", "={Pc}*{hrs}*{LF}/100", "kWh/yr")
ic.add("Ey2", "Compressor shaft energy per year (first draft)", "E_a2", "={Pc}*{hrs}*{LF}",
       "kWh/yr", planted=("unit-scale", "a % used as a fraction: 100 too large"))
ICES = ic.finish()

SAT = {
    "A1": "Saturated ammonia (R-717) by temperature (ASHRAE Handbook—Fundamentals (2021) ch. 30, "
          "rounded, from memory; check against the tables before use)",
    "A2": "Sources: as above; psig = psia − 14.7 (standard atmosphere, NIST SP 811 (2008) App. "
          "B.8: 1 atm = 14.70 psi); 1 psi = 6.895 kPa (NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Temperature [°F]", "B5": "Pressure [psia]", "C5": "Pressure [psig]",
    "D5": "Pressure [kPa(a)]",
}
for r, (t, p) in enumerate([(5, 34.27), (20, 48.21), (95, 195.8)], start=6):
    SAT[f"A{r}"], SAT[f"B{r}"] = t, p
    SAT[f"C{r}"] = f"=B{r}-14.7"
    SAT[f"D{r}"] = f"=B{r}*6.895"
SAT["C7"] = "=B7"
SAT["D8"] = "=B8/6.895"
SAT_PLANTED = {"Sat!C7": ("offset-scale", "psig set equal to psia: the atmosphere missing"),
               "Sat!D8": ("unit-scale", "psi to kPa divided by 6.895: wrong way round")}

ICEB = {
    "trade": "refrigeration: ice arena ammonia/brine plant, load, brine, compressors, condenser",
    "sheets": [("Plant", ICES), ("Sat", SAT)],
    "planted": {**ic.planted, **SAT_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 2: municipal water booster pump station (gpm, L/s, m³/h, MGD, psig, psia, psi, kPa,
# kPa(g), bar(g), ft, m, in, ft/s, hp, kW, %, h/yr, kWh/yr, kWh/MG, kWh/ML, $/kWh, $/yr)
# --------------------------------------------------------------------------------------------
BST_SRC = (
    "Sources: 1 US gpm = 0.06309 L/s, 1 psi = 6.895 kPa, 1 bar = 100 kPa, 1 ft = 0.3048 m, "
    "1 hp = 0.7457 kW (NIST SP 811 (2008) App. B.8); head in ft = psi × 2.31 for water near "
    "60 °F, and γ_w = 9.81 kN/m³ (common practice); water horsepower = gpm·ft/3960 and "
    "velocity v (ft/s) = 0.4085·gpm/d(in)² (Cameron Hydraulic Data, from memory); velocity "
    "head v²/(2g), g = 32.2 ft/s² (common practice); NPSHa = (p_s,g + p_b − p_v)·2.31 + "
    "v²/2g for water at the suction gauge (ANSI/HI 9.6.1, from memory); vapour pressure of "
    "water at 60 °F 0.256 psia (ASME steam tables, from memory); hydraulic power ρ·g·Q·H "
    "(SI Brochure 9th ed., g_n); wire-to-water efficiency = water power / electrical input "
    "(common practice); MGD = gpm × 1440/10⁶ (common practice). District, station, maker's "
    "curve, SCADA readings and tariff invented.")
bs = ItemSheet("Station", "Pine Hollow Water District (invented): Ashby Ridge booster pump "
               "station, two duty and one standby horizontal split-case pumps on VFDs", BST_SRC)
bs.heading("Flow")
bs.add("Q", "Station design flow, two duty pumps", "Q", 1800, "gpm")
bs.add("QLs", "Station design flow, L/s", "Q_L", "={Q}*0.06309", "L/s")
bs.add("QLs2", "Station design flow, L/s (state permit form)", "Q_L2", "={Q}/0.06309", "L/s",
       planted=("unit-scale", "gpm to L/s divided by 0.06309: wrong way round"))
bs.add("Qm3h", "Station design flow, m³/h", "Q_h", "={QLs}*3.6", "m³/h")
bs.add("QMGD", "Station design flow, MGD", "Q_MGD", "={Q}*1440/1000000", "MGD")
bs.heading("Pressures and head")
bs.add("pb", "Site barometer (elevation 1 480 ft, invented)", "p_b", 14.2, "psia")
bs.add("ps", "Suction pressure at the station, minimum (distribution main)", "p_s", 38, "psig")
bs.add("pd", "Discharge pressure setpoint", "p_d", 92, "psig")
bs.add("dp", "Pressure rise across the station", "Δp", "={pd}-{ps}", "psi")
bs.add("dpk", "Pressure rise across the station, kPa", "Δp_k", "={dp}*6.895", "kPa")
bs.add("pdk", "Discharge pressure, kPa(g)", "p_d,k", "={pd}*6.895", "kPa(g)")
bs.add("pdbar", "Discharge pressure, bar(g) (pump maker's data sheet)", "p_d,bar", "={pdk}/100",
       "bar(g)")
bs.add("pdbar2", "Discharge pressure, bar(g) (first draft)", "p_d,bar2", "={pdk}/1000",
       "bar(g)", planted=("unit-scale", "kPa to bar divided by 1000 where 100 belongs"))
bs.add("pda", "Discharge pressure, absolute (mechanical seal data sheet)", "p_d,a",
       "={pd}+{pb}", "psia")
bs.add("pdak", "Discharge pressure, kPa absolute (seal maker, metric)", "p_d,ak", "={pdk}+14.7",
       "kPa(a)", planted=("offset-scale", "the atmosphere in psi added to a kPa gauge reading"))
bs.add("H", "Total dynamic head", "H", "={dp}*2.31", "ft")
bs.add("H2", "Total dynamic head (first draft)", "H_2", "={dp}/2.31", "ft",
       planted=("unit-scale", "psi to ft of water divided by 2.31: wrong way round"))
bs.add("Hm", "Total dynamic head, m", "H_m", "={dpk}/9.81", "m")
bs.heading("Suction")
bs.add("ds", "Suction header bore (12 in ductile iron, invented)", "d_s", 12.2, "in")
bs.add("vs", "Velocity in the suction header", "v_s", "=0.4085*{Q}/{ds}^2", "ft/s")
bs.add("hv", "Velocity head at the suction", "h_v", "={vs}^2/(2*32.2)", "ft")
bs.add("pv", "Vapour pressure of water at 60 °F", "p_v", 0.256, "psia")
bs.add("NPSH", "NPSH available", "NPSHa", "=({ps}+{pb}-{pv})*2.31+{hv}", "ft")
bs.add("NPSH2", "NPSH available (first draft)", "NPSHa2", "=({ps}-{pv})*2.31+{hv}", "ft",
       planted=("offset-scale", "a gauge suction pressure less an absolute vapour pressure"))
bs.heading("Power and efficiency")
bs.add("whp", "Water horsepower", "whp", "={Q}*{H}/3960", "hp")
bs.add("whpk", "Water power, kW", "P_w", "={whp}*0.7457", "kW")
bs.add("rho", "Density of water at 15 °C", "ρ", 999, "kg/m³")
bs.add("Pw", "Water power, SI check", "P_w,c", "={rho}*9.81*{QLs}/1000*{Hm}/1000", "kW")
bs.add("Pw2", "Water power (first draft)", "P_w2", "={rho}*9.81*{QLs}*{Hm}/1000", "kW",
       planted=("unit-scale", "L/s used as m³/s: 1000 too large"))
bs.add("n", "Duty pumps", "n", 2, "-")
bs.add("Qp", "Flow per duty pump", "Q_p", "={Q}/{n}", "gpm")
bs.add("Hc", "Head on the maker's curve at that flow, full speed (Curve sheet)", "H_c",
       "=VLOOKUP({Qp},Curve!A6:E10,2,FALSE)", "ft")
bs.add("dH", "Head margin at full speed (taken up by the VFDs)", "ΔH", "={Hc}-{H}", "ft")
bs.add("etap", "Pump efficiency at that flow (Curve sheet)", "η_p",
       "=VLOOKUP({Qp},Curve!A6:E10,3,FALSE)", "%")
bs.add("bhp", "Pump shaft power, two pumps", "bhp", "={whp}/({etap}/100)", "hp")
bs.add("etam", "Motor efficiency (premium, maker, invented)", "η_m", 94.1, "%")
bs.add("etav", "VFD efficiency (maker, invented)", "η_v", 97, "%")
bs.add("Pest", "Electrical input, estimated", "P_in,e",
       "={bhp}*0.7457/({etam}/100)/({etav}/100)", "kW")
bs.add("Pm", "Electrical input, both drives, measured (SCADA, invented)", "P_in", 60.5, "kW")
bs.add("eww", "Wire-to-water efficiency", "η_ww", "={whpk}/{Pm}*100", "%")
bs.add("eww2", "Wire-to-water efficiency (operator's log)", "η_ww2", "={whp}/{Pm}*100", "%",
       planted=("unit-scale", "water horsepower over kW: the 0.7457 missing"))
bs.heading("Energy")
bs.add("hrs", "Pumping hours per year (SCADA, invented)", "t_a", 4380, "h/yr")
bs.add("Ey", "Electricity per year", "E_a", "={Pm}*{hrs}", "kWh/yr")
bs.add("eMG", "Specific energy", "e_MG", "={Pm}/({Q}*60/1000000)", "kWh/MG")
bs.add("eML", "Specific energy, per ML", "e_ML", "={Pm}/({QLs}*3600/1000000)", "kWh/ML")
bs.add("eML2", "Specific energy, per ML (benchmarking return)", "e_ML2",
       "={Pm}/({QLs}/1000000)", "kWh/ML",
       planted=("unit-scale", "ML per second taken as ML per hour: 3600 too large"))
bs.add("tar", "Electricity tariff, blended (invented)", "c_e", 0.14, "$/kWh")
bs.add("cost", "Electricity cost per year", "C_a", "={Ey}*{tar}", "$/yr")
BSTS = bs.finish()

CURVE = {
    "A1": "Maker's curve for one pump at full speed, 1780 rpm (invented; water at 60 °F)",
    "A2": "Sources: maker's curve (invented); 1 US gpm = 0.06309 L/s, 1 ft = 0.3048 m (NIST SP "
          "811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Flow [gpm]", "B5": "Head [ft]", "C5": "Efficiency [%]", "D5": "Flow [L/s]",
    "E5": "Head [m]",
}
for r, (q, h, eff) in enumerate([(600, 158, 71.0), (750, 152, 76.5), (900, 144, 80.0),
                                 (1050, 133, 80.5), (1200, 118, 78.0)], start=6):
    CURVE[f"A{r}"], CURVE[f"B{r}"], CURVE[f"C{r}"] = q, h, eff
    CURVE[f"D{r}"] = f"=A{r}*0.06309"
    CURVE[f"E{r}"] = f"=B{r}*0.3048"
CURVE["E7"] = "=B7/0.3048"
CURVE["D9"] = "=A9*0.2271"
CURVE_PLANTED = {"Curve!E7": ("unit-scale", "ft to m divided by 0.3048: wrong way round"),
                 "Curve!D9": ("unit-scale", "the m³/h factor 0.2271 where L/s (0.06309) "
                                            "belongs")}

BSTB = {
    "trade": "water supply: municipal booster pump station, head, NPSH, power, energy",
    "sheets": [("Station", BSTS), ("Curve", CURVE)],
    "planted": {**bs.planted, **CURVE_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 3: food plant steam boiler and condensate return (lb/h, kg/h, psig, bar(g), psia,
# bar a, °F, °C, Btu/lb, kJ/kg, Btu/(lb·°F), kJ/(kg·K), Btu/h, kW, BHP, %, therm/h, MJ/m³,
# m³/h, h/yr, therm/yr, gpm)
# --------------------------------------------------------------------------------------------
BLR_SRC = (
    "Sources: 1 lb = 0.4536 kg, 1 Btu/lb = 2.326 kJ/kg, 1 bar = 14.50 psi, 1 kW = 3412 "
    "Btu/h, 1 therm = 100 000 Btu = 105.5 MJ (NIST SP 811 (2008) App. B.8); standard "
    "atmosphere 14.7 psi = 1.013 bar (NIST SP 811 (2008) App. B.8); °C = (°F − 32)/1.8 (SI "
    "Brochure 9th ed.); saturated steam by gauge pressure on the Steam sheet (ASME Steam "
    "Tables, rounded, from memory); 1 boiler horsepower (BHP) = 33 475 Btu/h (ABMA, common "
    "practice); liquid water enthalpy h ≈ c_p·(t − 32 °F) with c_p = 1.0 Btu/(lb·°F), and "
    "h ≈ 4.19·t in kJ/kg from t in °C (steam tables' datum, common practice); flash fraction "
    "= (h_f,high − h_f,low)/h_fg,low (common practice); water 8.34 lb/US gal (common "
    "practice); natural gas HHV 1030 Btu/ft³ ≈ 38.4 MJ/m³ (utility bill, invented). Plant, "
    "boiler, survey and readings invented.")
bl = ItemSheet("Boiler", "Marlow Creek Foods (invented): snack plant, 500 BHP fire-tube boiler "
               "at 125 psig, deaerator and condensate return, design peak", BLR_SRC)
bl.heading("Steam demand and pressure")
bl.add("ms", "Plant steam demand, peak (process survey, invented)", "ṁ", 14000, "lb/h")
bl.add("mskg", "Plant steam demand, kg/h", "ṁ_kg", "={ms}*0.4536", "kg/h")
bl.add("mskg2", "Plant steam demand, kg/h (European fryer maker)", "ṁ_kg2", "={ms}/0.4536",
       "kg/h", planted=("unit-scale", "lb to kg divided by 0.4536: wrong way round"))
bl.add("pg", "Boiler operating pressure", "p_g", 125, "psig")
bl.add("pbar", "Boiler operating pressure, bar(g)", "p_g,bar", "={pg}/14.5", "bar(g)")
bl.add("pa", "Boiler operating pressure, absolute", "p_a", "={pg}+14.7", "psia")
bl.add("pbara", "Boiler operating pressure, bar a", "p_a,bar", "={pbar}+1.013", "bar a")
bl.add("pbara2", "Boiler operating pressure, bar a (first draft)", "p_a,bar2", "={pg}/14.5",
       "bar a", planted=("offset-scale", "a gauge reading set equal to an absolute one"))
bl.heading("Steam and feedwater")
bl.add("tsat", "Saturation temperature (Steam sheet)", "t_sat",
       "=VLOOKUP({pg},Steam!A6:E10,2,FALSE)", "°F")
bl.add("tsatC", "Saturation temperature, °C", "t_sat,C", "=({tsat}-32)/1.8", "°C")
bl.add("hf", "Enthalpy of saturated water at the boiler (Steam sheet)", "h_f",
       "=VLOOKUP({pg},Steam!A6:E10,3,FALSE)", "Btu/lb")
bl.add("hg", "Enthalpy of dry saturated steam (Steam sheet)", "h_g",
       "=VLOOKUP({pg},Steam!A6:E10,5,FALSE)", "Btu/lb")
bl.add("tfw", "Feedwater temperature leaving the deaerator (5 psig)", "t_fw", 227, "°F")
bl.add("tfwC", "Feedwater temperature, °C", "t_fw,C", "=({tfw}-32)/1.8", "°C")
bl.add("tfwC2", "Feedwater temperature, °C (first draft)", "t_fw,C2",
       "=({tfw}-32)/1.8+273.15", "°C", planted=("offset-scale", "kelvins written as °C"))
bl.add("cpw", "Specific heat of water", "c_p", 1.0, "Btu/(lb·°F)")
bl.add("hfw", "Feedwater enthalpy", "h_fw", "={cpw}*({tfw}-32)", "Btu/lb")
bl.heading("Boiler output")
bl.add("Q", "Boiler output", "Q", "={ms}*({hg}-{hfw})", "Btu/h")
bl.add("QkW", "Boiler output, kW", "Q_kW", "={Q}/3412", "kW")
bl.add("QkW2", "Boiler output, kW (first draft)", "Q_kW2", "={Q}/3.412", "kW",
       planted=("unit-scale", "Btu/h over 3.412 gives W, written as kW: 1000 too large"))
bl.add("BoHP", "Boiler output, boiler horsepower", "Q_BHP", "={Q}/33475", "BHP")
bl.add("cpk", "Specific heat of water, SI", "c_p,SI", 4.19, "kJ/(kg·K)")
bl.add("hgk", "Enthalpy of dry saturated steam, kJ/kg", "h_g,SI", "={hg}*2.326", "kJ/kg")
bl.add("hfwk", "Feedwater enthalpy, kJ/kg", "h_fw,SI", "={cpk}*{tfwC}", "kJ/kg")
bl.add("QkWSI", "Boiler output, SI check", "Q_SI", "={mskg}*({hgk}-{hfwk})/3600", "kW")
bl.add("QkWSI2", "Boiler output, SI check (first draft)", "Q_SI2", "={mskg}*({hgk}-{hfwk})",
       "kW", planted=("unit-scale", "kg/h × kJ/kg written as kW: the /3600 missing"))
bl.heading("Fuel")
bl.add("etab", "Boiler fuel-to-steam efficiency (combustion test, invented)", "η_b", 82, "%")
bl.add("Fin", "Fuel input", "F", "={Q}/({etab}/100)", "Btu/h")
bl.add("Fin2", "Fuel input (first draft)", "F_2", "={Q}/{etab}", "Btu/h",
       planted=("unit-scale", "a % used as a fraction: 100 too small"))
bl.add("th", "Fuel input, therms per hour", "F_th", "={Fin}/100000", "therm/h")
bl.add("HHV", "Natural gas higher heating value (invented)", "HHV", 38.4, "MJ/m³")
bl.add("Vg", "Natural gas flow", "V̇_g", "={th}*105.5/{HHV}", "m³/h")
bl.add("Vg2", "Natural gas flow (gas meter sizing)", "V̇_g2", "={th}*105.5/{HHV}/1000", "m³/h",
       planted=("unit-scale", "a /1000 that does not belong: 1000 too small"))
bl.add("hrs", "Boiler firing hours per year (invented)", "t_a", 6000, "h/yr")
bl.add("LF", "Average load over those hours (invented)", "LF", 60, "%")
bl.add("Ty", "Gas per year", "F_a", "={th}*{hrs}*{LF}/100", "therm/yr")
bl.heading("Condensate return")
bl.add("ret", "Condensate returned, share of the steam", "r", 65, "%")
bl.add("tc", "Condensate return temperature at the deaerator", "t_c", 180, "°F")
bl.add("tmu", "Make-up water temperature (softener outlet)", "t_mu", 55, "°F")
bl.add("mc", "Condensate returned", "ṁ_c", "={ms}*{ret}/100", "lb/h")
bl.add("mmu", "Make-up water", "ṁ_mu", "={ms}-{mc}", "lb/h")
bl.add("mugpm", "Make-up water, US gpm", "V̇_mu", "={mmu}/(8.34*60)", "gpm")
bl.add("tmix", "Mixed temperature of condensate and make-up into the deaerator", "t_mix",
       "=({mc}*{tc}+{mmu}*{tmu})/({mc}+{mmu})", "°F")
bl.add("Qsv", "Heat brought back by the condensate (against cold make-up)", "Q_r",
       "={mc}*{cpw}*({tc}-{tmu})", "Btu/h")
bl.add("Qsv2", "Heat brought back by the condensate (first draft)", "Q_r2",
       "={mc}*{cpw}*({tc}-({tmu}-32)/1.8)", "Btu/h",
       planted=("offset-scale", "a °C reading subtracted from a °F reading"))
bl.add("thsv", "Gas saved per year by the condensate return", "F_r",
       "={Qsv}/({etab}/100)*{hrs}*{LF}/100/100000", "therm/yr")
bl.add("plo", "Condensate receiver pressure (vented)", "p_lo", 0, "psig")
bl.add("xfl", "Flash steam from the boiler-pressure condensate at the receiver", "x",
       "=({hf}-VLOOKUP({plo},Steam!A6:E10,3,FALSE))/VLOOKUP({plo},Steam!A6:E10,4,FALSE)*100",
       "%")
BLRS = bl.finish()

STEAM = {
    "A1": "Saturated steam by gauge pressure (ASME Steam Tables, rounded, from memory; check "
          "against the tables before use)",
    "A2": "Sources: as above; °C = (°F − 32)/1.8; 1 Btu/lb = 2.326 kJ/kg (NIST SP 811 (2008) "
          "App. B.8).",
    "A3": CAUTION,
    "A5": "Pressure [psig]", "B5": "t_sat [°F]", "C5": "h_f [Btu/lb]", "D5": "h_fg [Btu/lb]",
    "E5": "h_g [Btu/lb]", "F5": "t_sat [°C]", "G5": "h_fg [kJ/kg]",
}
for r, (p, t, hf, hfg, hg) in enumerate([(0, 212.0, 180.2, 970.3, 1150.5),
                                         (15, 249.8, 218.5, 945.4, 1163.9),
                                         (50, 297.7, 267.4, 911.8, 1179.2),
                                         (100, 337.9, 309.0, 880.6, 1189.6),
                                         (125, 352.9, 324.8, 868.2, 1193.0)], start=6):
    STEAM[f"A{r}"], STEAM[f"B{r}"], STEAM[f"C{r}"] = p, t, hf
    STEAM[f"D{r}"], STEAM[f"E{r}"] = hfg, hg
    STEAM[f"F{r}"] = f"=(B{r}-32)/1.8"
    STEAM[f"G{r}"] = f"=D{r}*2.326"
STEAM["F8"] = "=B8/1.8"
STEAM["G9"] = "=D9/2.326"
STEAM_PLANTED = {"Steam!F8": ("offset-scale", "°F to °C by the 1.8 alone: the −32 missing"),
                 "Steam!G9": ("unit-scale", "Btu/lb to kJ/kg divided by 2.326: wrong way "
                                            "round")}

BLRB = {
    "trade": "food process utilities: steam boiler, feedwater, fuel and condensate return",
    "sheets": [("Boiler", BLRS), ("Steam", STEAM)],
    "planted": {**bl.planted, **STEAM_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 4: highway bridge pier spread footing (kip, kN, kip·ft, ft, m, ft², kcf, pcf, kN/m³,
# ksf, kPa, °, %)
# --------------------------------------------------------------------------------------------
FTG_SRC = (
    "Sources: 1 kip = 4.448 kN, 1 ft = 0.3048 m, 1 ksf = 47.88 kPa, 1 pcf = 0.1571 kN/m³ "
    "(NIST SP 811 (2008) App. B.8); load factors, Strength I: DC 1.25/0.90, DW 1.50/0.65, "
    "LL 1.75, EV 1.35/1.00 (AASHTO LRFD Bridge Design Specifications, 9th ed. (2020), Tables "
    "3.4.1-1 and 3.4.1-2, from memory); concrete 0.150 kcf (AASHTO LRFD Table 3.5.1-1, from "
    "memory); γ_w = 62.4 pcf = 9.81 kN/m³ (common practice); effective width B' = B − 2e "
    "(AASHTO LRFD 10.6.1.3); nominal bearing resistance of cohesionless soil with the water "
    "table at the footing base, shape, depth and inclination factors taken as 1: q_n = γ·D_f·"
    "N_q + 0.5·γ'·B'·N_γ, N_q = 18.4 and N_γ = 22.4 at φ_f = 30° (AASHTO LRFD 10.6.3.1.2a "
    "and Table 10.6.3.1.2a-1, from memory); φ_b = 0.45 (AASHTO LRFD Table 10.5.5.2.2-1, "
    "from memory); sliding resistance φ_τ·V·tan δ, tan δ = tan φ_f for concrete cast on "
    "soil, φ_τ = 0.80 (AASHTO LRFD 10.6.3.4 and Table 10.5.5.2.2-1, from memory); footing "
    "in full contact where e ≤ B/6 (common practice). Bridge, pier, soils report and loads "
    "invented.")
ft = ItemSheet("Footing", "SR 41 over Tanner Creek (invented): Pier 2 spread footing on "
               "medium dense sand, Strength I bearing and sliding", FTG_SRC)
ft.heading("Geometry")
ft.add("B", "Footing width, in the direction of the moment", "B", 18, "ft")
ft.add("L", "Footing length", "L", 24, "ft")
ft.add("t", "Footing thickness", "t", 5, "ft")
ft.add("Df", "Depth of the footing base below finished ground", "D_f", 9, "ft")
ft.add("Ap", "Pier column footprint on the footing", "A_p", 40, "ft²")
ft.add("Bm", "Footing width, m", "B_m", "={B}*0.3048", "m")
ft.add("Bm2", "Footing width, m (first draft)", "B_m2", "={B}/0.3048", "m",
       planted=("unit-scale", "ft to m divided by 0.3048: wrong way round"))
ft.add("Lm", "Footing length, m", "L_m", "={L}*0.3048", "m")
ft.add("Af", "Footing plan area", "A_f", "={B}*{L}", "ft²")
ft.heading("Unit weights")
ft.add("gc", "Reinforced concrete", "γ_c", 0.150, "kcf")
ft.add("gs", "Sand above the footing base, moist (soils report, invented)", "γ_s", 125, "pcf")
ft.add("gw", "Water", "γ_w", 62.4, "pcf")
ft.add("gsk", "Sand, kN/m³", "γ_s,SI", "={gs}*0.1571", "kN/m³")
ft.add("gsk2", "Sand, kN/m³ (first draft)", "γ_s,SI2", "={gs}*16.02/1000", "kN/m³",
       planted=("result-unit", "pcf to Mg/m³ (16.02/1000) written as kN/m³: g missing"))
ft.add("gsub", "Sand below the water table, buoyant (γ_sat taken as 125 pcf)", "γ'",
       "={gs}-{gw}", "pcf")
ft.heading("Footing and soil weights")
ft.add("Wf", "Footing weight", "W_f", "={B}*{L}*{t}*{gc}", "kip")
ft.add("hs", "Soil cover over the footing", "h_s", "={Df}-{t}", "ft")
ft.add("Ws", "Soil on the footing", "W_s", "=({Af}-{Ap})*{hs}*{gs}/1000", "kip")
ft.add("Ws2", "Soil on the footing (first draft)", "W_s2", "=({Af}-{Ap})*{hs}*{gs}", "kip",
       planted=("unit-scale", "pcf × ft³ gives lb, written as kip: the /1000 missing"))
ft.heading("Loads at the footing base (Loads sheet)")
ft.add("Ps", "Service axial load", "P_s", "=Loads!B10+{Wf}+{Ws}", "kip")
ft.add("Pu", "Factored axial load, Strength I (maximum)", "P_u",
       "=Loads!D10+1.25*{Wf}+1.35*{Ws}", "kip")
ft.add("PukN", "Factored axial load, kN", "P_u,SI", "={Pu}*4.448", "kN")
ft.add("Mu", "Factored moment about the footing base, longitudinal (invented)", "M_u", 5200,
       "kip·ft")
ft.add("e", "Eccentricity", "e", "={Mu}/{Pu}", "ft")
ft.add("e2", "Eccentricity (first draft)", "e_2", "={Mu}/{PukN}", "ft",
       planted=("unit-scale", "kip·ft over kN: the 4.448 left in"))
ft.add("ec", "Eccentricity within B/6", "—", '=IF({e}<={B}/6,"full contact","check")')
ft.heading("Bearing")
ft.add("Bp", "Effective width", "B'", "={B}-2*{e}", "ft")
ft.add("Bpm", "Effective width, m", "B'_m", "={Bp}*0.3048", "m")
ft.add("qu", "Factored bearing stress", "q_u", "={Pu}/({Bp}*{L})", "ksf")
ft.add("qukPa", "Factored bearing stress, kPa", "q_u,SI", "={qu}*47.88", "kPa")
ft.add("qukPa2", "Factored bearing stress, kPa (first draft)", "q_u,SI2", "={qu}*0.04788",
       "kPa", planted=("unit-scale", "the ksf-to-MPa factor written into a kPa cell: 1000 "
                                     "too small"))
ft.add("quSI", "Factored bearing stress, SI check", "q_u,c", "={PukN}/({Bpm}*{Lm})", "kPa")
ft.add("Nq", "Bearing capacity factor N_q, φ_f = 30°", "N_q", 18.4, "-")
ft.add("Ng", "Bearing capacity factor N_γ, φ_f = 30°", "N_γ", 22.4, "-")
ft.add("qn", "Nominal bearing resistance", "q_n", "=({gs}*{Df}*{Nq}+0.5*{gsub}*{Bp}*{Ng})/1000",
       "ksf")
ft.add("qnkPa", "Nominal bearing resistance, kPa", "q_n,SI", "={qn}*47.88", "kPa")
ft.add("qnSI", "Nominal bearing resistance, SI check", "q_n,c",
       "={gsk}*{Df}*0.3048*{Nq}+0.5*({gsk}-9.81)*{Bpm}*{Ng}", "kPa")
ft.add("phib", "Resistance factor, bearing", "φ_b", 0.45, "-")
ft.add("qR", "Factored bearing resistance", "q_R", "={phib}*{qn}", "ksf")
ft.add("util", "Bearing utilisation", "u", "={qu}/{qR}*100", "%")
ft.add("util2", "Bearing utilisation (summary table)", "u_2", "={qu}/{qR}", "%",
       planted=("unit-scale", "a fraction written as %: 100 too small"))
ft.heading("Sliding")
ft.add("Hu", "Factored horizontal load, longitudinal (invented)", "H_u", 260, "kip")
ft.add("phi", "Friction angle of the sand (soils report, invented)", "φ_f", 30, "°")
ft.add("phit", "Resistance factor, sliding", "φ_τ", 0.80, "-")
ft.add("Pmin", "Factored axial load, Strength I (minimum, no live load)", "P_min",
       "=0.9*(Loads!B6+Loads!B7+{Wf})+0.65*Loads!B8+1.0*{Ws}", "kip")
ft.add("Rt", "Factored sliding resistance", "R_τ", "={phit}*{Pmin}*TAN(RADIANS({phi}))", "kip")
ft.add("Rt2", "Factored sliding resistance (first draft)", "R_τ2", "={phit}*{Pmin}*TAN({phi})",
       "kip", planted=("unit-scale", "degrees passed to TAN, which takes radians"))
ft.add("ratio", "Sliding demand over resistance", "H/R", "={Hu}/{Rt}", "-")
FTGS = ft.finish()

LOADS = {
    "A1": "SR 41 over Tanner Creek Pier 2: axial loads at the top of the footing from the "
          "superstructure model (invented), Strength I maximum",
    "A2": "Sources: load factors, AASHTO LRFD Bridge Design Specifications, 9th ed. (2020), "
          "Tables 3.4.1-1 and 3.4.1-2 (from memory); 1 kip = 4.448 kN (NIST SP 811 (2008) "
          "App. B.8).",
    "A3": CAUTION,
    "A5": "Load", "B5": "Axial, unfactored [kip]", "C5": "γ, Strength I max [-]",
    "D5": "Axial, factored [kip]", "E5": "Axial, unfactored [kN]",
    "A10": "Total", "B10": "=SUM(B6:B9)", "D10": "=SUM(D6:D9)", "E10": "=SUM(E6:E9)",
}
for r, (case, p, g) in enumerate([("DC, superstructure", 1450, 1.25),
                                  ("DC, pier cap and column", 420, 1.25),
                                  ("DW, wearing surface and utilities", 140, 1.50),
                                  ("LL + IM, HL-93, two lanes", 610, 1.75)], start=6):
    LOADS[f"A{r}"], LOADS[f"B{r}"], LOADS[f"C{r}"] = case, p, g
    LOADS[f"D{r}"] = f"=B{r}*C{r}"
    LOADS[f"E{r}"] = f"=B{r}*4.448"
LOADS["E8"] = "=B8/4.448"
LOADS_PLANTED = {"Loads!E8": ("unit-scale", "kip to kN divided by 4.448: wrong way round")}

FTGB = {
    "trade": "bridge foundations: pier spread footing, bearing and sliding, AASHTO LRFD",
    "sheets": [("Footing", FTGS), ("Loads", LOADS)],
    "planted": {**ft.planted, **LOADS_PLANTED},
}

BOOKS = {"ice-plant-kestrel-falls": ICEB, "booster-ashby-ridge": BSTB,
         "boiler-marlow-creek": BLRB, "pier-footing-tanner-creek": FTGB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()
