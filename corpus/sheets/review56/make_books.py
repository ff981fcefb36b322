#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review56), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; pattern after
corpus/sheets/review55/make_books.py.

Trades: a data centre's chilled-water plant and CRAH units; an oil well's continuous gas lift
design; a water tower's storage, pressure zone and fill pump; a dairy's HTST pasteuriser. All
scenarios, sites, firms, readings and maker's data are invented (demonstration only); the
formulas and published factors are the trade's own, with their sources named in a text cell at
the top of each sheet ("from memory" where recalled and not checked, "common practice" for a
fact of the trade with no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and
its messages that mislead, are recorded in review_notes.py after running the round's build.

Run: python3 make_books.py  ->  *.xlsx and *.expect in this folder (nothing written elsewhere)
     python3 make_books.py --values  ->  also prints every formula cell's value (a hand check)
"""
import os
import sys

sys.dont_write_bytecode = True   # write nothing beside the shared modules
HERE = os.path.dirname(os.path.abspath(__file__))
SHARED = os.path.dirname(HERE)
sys.path.insert(0, SHARED)
from item_sheet import ItemSheet, write_books_with_notes, formula_cells  # noqa: E402
from xlsx_writer import Evaluator  # noqa: E402 (shared, not copied)

CAUTION = ("Invented scenario, data for demonstration only. A dimensionally consistent formula can "
           "still be wrong; this check does not replace independent review under local codes and "
           "licensed practice.")
ItemSheet.caution = CAUTION

# --------------------------------------------------------------------------------------------
# Book 1: data centre chilled water and CRAH units (kW, W, W/m², Btu/h, TR, tons, °C, °F, K,
# m³/s, cfm, Pa, in. w.g., hp, L/s, gpm, mm, in, m/s, kPa, kg/m³, kW/TR)
# --------------------------------------------------------------------------------------------
DC_SRC = (
    "Sources: 1 TR = 3.517 kW = 12 000 Btu/h, 1 kW = 3412 Btu/h, 1 m³/s = 2119 cfm, 1 ft³ = "
    "0.02832 m³ (so 35.31 ft³ per m³), 1 in. w.g. = 249.1 Pa, 1 L/s = 15.85 US gpm, 1 in = "
    "25.4 mm (NIST SP 811 (2008) App. B.8); ΔT(°F) = 1.8·ΔT(K), °F = 1.8·°C + 32, K = °C + "
    "273.15 (SI Brochure 9th ed.); air side q = Q/(1.2·ΔT) in m³/s from kW and K, and Btu/h = "
    "1.08·cfm·ΔT(°F) (ASHRAE Handbook, Fundamentals (2021), ch. 18, from memory); water side "
    "Btu/h = 500·gpm·ΔT(°F) (common practice); water ρ = 998 kg/m³, c_p = 4.19 kJ/(kg·K) at "
    "15 to 25 °C (from memory); fan P = q·Δp/η, and bhp = cfm·in. w.g./(6356·η) (common "
    "practice); pump P = ρ·g·Q·H/η, g_n = 9.81 m/s² (SI Brochure 9th ed.); dry air R = 0.287 "
    "kJ/(kg·K) (common practice); EER = 3.412·COP (common practice); recommended IT inlet "
    "18 to 27 °C (ASHRAE TC 9.9 thermal guidelines, from memory); 8 in schedule 40 bore "
    "7.981 in (ASME B36.10M, from memory). Site, halls, maker's data and readings invented.")
ck = ItemSheet("Cooling", "Kestrel Moor Data Centre (invented): data hall 2, chilled-water "
               "CRAH cooling, design day", DC_SRC)
ck.heading("Heat load")
ck.add("Pit", "IT load, data hall 2 (Hall sheet)", "P_IT", "=Hall!D9", "kW")
ck.add("ups", "UPS and distribution losses, share of IT load", "s_UPS", 5, "%")
ck.add("Af", "White space floor area", "A_f", 900, "m²")
ck.add("lpd", "Lighting power density", "LPD", 8, "W/m²")
ck.add("Qlt", "Lighting heat", "Q_lt", "={Af}*{lpd}/1000", "kW")
ck.add("Qlt2", "Lighting heat (first draft)", "Q_lt2", "={Af}*{lpd}", "kW",
       planted=("unit-scale", "m² × W/m² gives W, written as kW: the /1000 missing"))
ck.add("Q", "Sensible heat to the CRAH units", "Q", "={Pit}*(1+{ups}/100)+{Qlt}", "kW")
ck.add("QB", "Sensible heat, Btu/h", "Q_US", "={Q}*3412", "Btu/h")
ck.add("QTR", "Sensible heat, refrigeration tons", "Q_TR", "={Q}/3.517", "TR")
ck.add("QTR2", "Sensible heat, tons (owner's summary)", "Q_TR2", "={Q}*3.517", "TR",
       planted=("unit-scale", "kW to TR multiplied by 3.517: wrong way round"))
ck.heading("Air side")
ck.add("tsa", "CRAH supply air (cold aisle)", "t_sa", 24, "°C")
ck.add("tra", "CRAH return air (hot aisle)", "t_ra", 36, "°C")
ck.add("dTa", "Air temperature rise across the IT", "ΔT_a", "={tra}-{tsa}", "K")
ck.add("dTaF", "Air temperature rise, °F", "ΔT_a,F", "={dTa}*1.8", "Δ°F")
ck.add("dTaF2", "Air temperature rise, °F (first draft)", "ΔT_a,F2", "={dTa}*1.8+32", "Δ°F",
       planted=("offset-scale", "°C's +32 added to a temperature difference"))
ck.add("qa", "Supply airflow, all units", "q_a", "={Q}/(1.2*{dTa})", "m³/s")
ck.add("qacfm", "Supply airflow, cfm (US check, 1.08·cfm·ΔT)", "q_a,US", "={QB}/(1.08*{dTaF})",
       "cfm")
ck.add("qacfm2", "Supply airflow, cfm (first draft)", "q_a,US2", "={QB}/(1.08*{dTa})", "cfm",
       planted=("unit-scale", "ΔT in K in the 1.08 formula, which wants °F: 1.8 too large"))
ck.add("n", "CRAH units running (plus 2 standby)", "n", 12, "-")
ck.add("qu", "Airflow per CRAH unit", "q_u", "={qa}/{n}", "m³/s")
ck.add("qucfm", "Airflow per CRAH unit, cfm (maker's selection)", "q_u,US", "={qu}*2119", "cfm")
ck.add("qucfm2", "Airflow per CRAH unit, cfm (first draft)", "q_u,US2", "={qu}*35.31", "cfm",
       planted=("unit-scale", "m³/s × 35.31 gives ft³/s, written as cfm: the ×60 missing"))
ck.add("pb", "Site barometer", "p_b", 101.3, "kPa")
ck.add("Ra", "Gas constant of dry air", "R_a", 0.287, "kJ/(kg·K)")
ck.add("TK", "Supply air, absolute temperature", "T_sa", "={tsa}+273.15", "K")
ck.add("TK2", "Supply air, absolute temperature (first draft)", "T_sa2", "={tsa}", "K",
       planted=("offset-scale", "a °C reading set equal to kelvins: the 273.15 missing"))
ck.add("rhoa", "Supply air density (check on the 1.2)", "ρ_a", "={pb}/({Ra}*{TK})", "kg/m³")
ck.heading("CRAH fans")
ck.add("dpf", "Fan total pressure (coil, filters, floor void)", "Δp_f", 400, "Pa")
ck.add("dpfin", "Fan total pressure, in. w.g.", "Δp_f,US", "={dpf}/249.1", "in. w.g.")
ck.add("etaf", "Fan and EC motor efficiency (maker, invented)", "η_f", 60, "%")
ck.add("Pf", "Fan input power per unit", "P_f", "={qu}*{dpf}/({etaf}/100)/1000", "kW")
ck.add("Pf2", "Fan input power per unit (first draft)", "P_f2", "={qu}*{dpf}/({etaf}/100)",
       "kW", planted=("unit-scale", "m³/s × Pa gives W, written as kW: the /1000 missing"))
ck.add("bhp", "Fan input power per unit, hp (US check)", "P_f,US",
       "={qucfm}*{dpfin}/(6356*{etaf}/100)", "hp")
ck.add("Pft", "Fan power, all running units", "P_ft", "={Pf}*{n}", "kW")
ck.heading("Chilled water")
ck.add("tchs", "Chilled water supply", "t_s", 16, "°C")
ck.add("tchr", "Chilled water return", "t_r", 24, "°C")
ck.add("tchsF", "Chilled water supply, °F", "t_s,F", "={tchs}*1.8+32", "°F")
ck.add("dTw", "Chilled water temperature difference", "ΔT_w", "={tchr}-{tchs}", "K")
ck.add("dTwF", "Chilled water temperature difference, °F", "ΔT_w,F", "={dTw}*1.8", "Δ°F")
ck.add("Qchw", "Chilled water load (sensible heat and fan heat)", "Q_chw", "={Q}+{Pft}", "kW")
ck.add("QchwTR", "Chilled water load, TR", "Q_chw,TR", "={Qchw}/3.517", "TR")
ck.add("rhow", "Density of chilled water", "ρ_w", 998, "kg/m³")
ck.add("cpw", "Specific heat of chilled water", "c_p", 4.19, "kJ/(kg·K)")
ck.add("qw", "Chilled water flow", "q_w", "={Qchw}/({rhow}*{cpw}*{dTw})*1000", "L/s")
ck.add("qwgpm", "Chilled water flow, US gpm", "q_w,US", "={qw}*15.85", "gpm")
ck.add("qwgpm2", "Chilled water flow, US gpm (check, 500·gpm·ΔT)", "q_w,US2",
       "={Qchw}*3412/(500*{dTwF})", "gpm")
ck.add("din", "Header bore, 8 in schedule 40", "d_in", 7.981, "in")
ck.add("d", "Header bore, mm", "d", "={din}*25.4", "mm")
ck.add("v", "Velocity in the header", "v", "={qw}/1000/(PI()*({d}/1000)^2/4)", "m/s")
ck.add("v2", "Velocity in the header (first draft)", "v_2", "={qw}/(PI()*({d}/1000)^2/4)",
       "m/s", planted=("unit-scale", "L/s taken as m³/s: the /1000 missing"))
ck.add("H", "Secondary pump head", "H", 30, "m")
ck.add("etap", "Pump and motor efficiency (maker, invented)", "η_p", 75, "%")
ck.add("Pp", "Secondary pump input power", "P_p",
       "={rhow}*9.81*{qw}/1000*{H}/1000/({etap}/100)", "kW")
ck.heading("Chiller")
ck.add("kWTR", "Chiller efficiency at design (maker, invented)", "η_ch", 0.55, "kW/TR")
ck.add("Pch", "Chiller input power", "P_ch", "={QchwTR}*{kWTR}", "kW")
ck.add("COP", "Chiller coefficient of performance", "COP", "={Qchw}/{Pch}", "-")
ck.add("EER", "Chiller energy efficiency ratio", "EER", "={COP}*3.412", "Btu/(W·h)")
ck.add("EER2", "Chiller energy efficiency ratio (first draft)", "EER_2", "={COP}/3.412",
       "Btu/(W·h)", planted=("unit-scale", "W to Btu/h divided by 3.412: wrong way round"))
COOLS = ck.finish()

HALL = {
    "A1": "Kestrel Moor Data Centre data hall 2: IT load by rack row (invented racks and loads)",
    "A2": "Sources: row load = racks × kW per rack (common practice); 1 ton of refrigeration = "
          "3.517 kW (NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Row", "B5": "Racks [-]", "C5": "Design load per rack [kW]", "D5": "Row load [kW]",
    "E5": "Row load [tons]",
    "A9": "Total", "D9": "=SUM(D6:D8)", "E9": "=SUM(E6:E8)",
}
for r, (row, racks, kw) in enumerate([("Row A (storage)", 40, 8), ("Row B (compute)", 40, 10),
                                      ("Row C (GPU)", 30, 15)], start=6):
    HALL[f"A{r}"], HALL[f"B{r}"], HALL[f"C{r}"] = row, racks, kw
    HALL[f"D{r}"] = f"=B{r}*C{r}"
    HALL[f"E{r}"] = f"=D{r}/3.517"
HALL["E8"] = "=D8*1000/3.517"
HALL_PLANTED = {"Hall!E8": ("unit-scale", "kW to tons with a spurious ×1000 (W over kW per TR)")}

DCB = {
    "trade": "building services: data centre chilled water and CRAH units",
    "sheets": [("Cooling", COOLS), ("Hall", HALL)],
    "planted": {**ck.planted, **HALL_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 2: oil well continuous gas lift (bbl/d, m³/d, %, scf/STB, scf/bbl, Mscf/d, Sm3/d, scfm,
# °API, psi/ft, kPa/m, ft, m, psig, psia, bar(g), kPa(g), °F, °R, °C, °F/100 ft)
# --------------------------------------------------------------------------------------------
GL_SRC = (
    "Sources: 1 bbl = 0.159 m³ (42 US gal), 1 Mscf = 28.32 m³, 1 ft = 0.3048 m, 1 psi = 6.895 "
    "kPa, 1 bar = 14.50 psi, 1 psi/ft = 22.62 kPa/m (NIST SP 811 (2008) App. B.8); standard "
    "atmosphere 14.7 psia (14.696, NIST SP 811 (2008) App. B.8); °R = °F + 459.67, °C = (°F − "
    "32)/1.8 (NIST SP 811 (2008)); SG_o = 141.5/(131.5 + °API) (API gravity definition, "
    "common practice); liquid gradient = 0.433·SG psi/ft (common practice); static gas column "
    "p_2 = p_1·exp(0.01875·γ_g·D/(z·T)), p in psia, D in ft, T in °R (GPSA Engineering Data "
    "Book, from memory); inflow q = J·(p_r − p_wf) (common practice); flowing gradients from "
    "gradient curves and geothermal gradient per 100 ft (common practice, figures invented). "
    "Field, well, reservoir and readings invented.")
gl = ItemSheet("Well", "Saltmarsh Flats field (invented): well SF-14, continuous gas lift "
               "design, 2-7/8 in tubing, unloading valves and operating point", GL_SRC)
gl.heading("Production target")
gl.add("qL", "Target gross liquid rate", "q_L", 1500, "bbl/d")
gl.add("WC", "Water cut", "WC", 60, "%")
gl.add("qo", "Oil rate", "q_o", "={qL}*(1-{WC}/100)", "bbl/d")
gl.add("qw", "Water rate", "q_w", "={qL}*{WC}/100", "bbl/d")
gl.add("qw2", "Water rate (first draft)", "q_w2", "={qL}*{WC}", "bbl/d",
       planted=("unit-scale", "a % used as a fraction: 100 too large"))
gl.add("qLm3", "Gross liquid rate, m³/d (partner's report)", "q_L,SI", "={qL}*0.159", "m³/d")
gl.add("qLm32", "Gross liquid rate, m³/d (first draft)", "q_L,SI2", "={qL}/0.159", "m³/d",
       planted=("unit-scale", "bbl to m³ divided by 0.159: wrong way round"))
gl.add("GOR", "Formation gas-oil ratio", "GOR", 450, "scf/STB")
gl.add("qgf", "Formation gas", "q_gf", "={qo}*{GOR}/1000", "Mscf/d")
gl.add("GLRt", "Total gas-liquid ratio wanted (gradient curves)", "GLR_t", 1400, "scf/bbl")
gl.add("qgi", "Lift gas injection rate", "q_gi", "={qL}*{GLRt}/1000-{qgf}", "Mscf/d")
gl.add("qgim3", "Lift gas injection rate, Sm³/d (partner's report)", "q_gi,SI", "={qgi}*28.32",
       "Sm3/d")
gl.add("qgis", "Lift gas injection rate, scfm (compressor)", "q_gi,m", "={qgi}*1000/1440",
       "scfm")
gl.add("qgis2", "Lift gas injection rate, scfm (first draft)", "q_gi,m2", "={qgi}*1000/24",
       "scfm", planted=("unit-scale", "per day to per minute divided by 24: hours, not minutes"))
gl.heading("Fluids and gradients")
gl.add("API", "Oil gravity", "API", 32, "°API")
gl.add("SGo", "Oil specific gravity", "SG_o", "=141.5/(131.5+{API})", "-")
gl.add("SGw", "Produced water specific gravity", "SG_w", 1.07, "-")
gl.add("gs", "Static gradient of the well fluid (unloading)", "g_s",
       "=0.433*({SGo}*(1-{WC}/100)+{SGw}*{WC}/100)", "psi/ft")
gl.add("gsk", "Static gradient, kPa/m", "g_s,SI", "={gs}*22.62", "kPa/m")
gl.add("gsk2", "Static gradient, kPa/m (first draft)", "g_s,SI2", "={gs}*6.895", "kPa/m",
       planted=("unit-scale", "psi to kPa done, ft to m forgotten: the /0.3048 missing"))
gl.add("gfa", "Flowing gradient above the injection point (curves)", "g_fa", 0.16, "psi/ft")
gl.add("gfb", "Flowing gradient below the injection point (curves)", "g_fb", 0.39, "psi/ft")
gl.heading("Depths, pressures and temperatures")
gl.add("D", "Mid-perforation depth, true vertical", "D", 8200, "ft")
gl.add("Dm", "Mid-perforation depth, m", "D_m", "={D}*0.3048", "m")
gl.add("pr", "Static reservoir pressure at mid-perforation", "p_r", 2650, "psig")
gl.add("J", "Productivity index", "J", 2.5, "bbl/d/psi")
gl.add("pwf", "Flowing bottom-hole pressure needed", "p_wf", "={pr}-{qL}/{J}", "psig")
gl.add("pwfb", "Flowing bottom-hole pressure, bar(g) (partner's report)", "p_wf,SI",
       "={pwf}/14.5", "bar(g)")
gl.add("pwh", "Flowing wellhead tubing pressure", "p_wh", 150, "psig")
gl.add("pco", "Surface operating injection (casing) pressure", "p_co", 1250, "psig")
gl.add("pcoa", "Surface operating injection pressure, absolute", "p_co,a", "={pco}+14.7", "psia")
gl.add("pcoa2", "Surface operating injection pressure, absolute (first draft)", "p_co,a2",
       "={pco}", "psia", planted=("offset-scale", "a gauge reading set equal to an absolute one"))
gl.add("SGg", "Lift gas specific gravity (air = 1)", "γ_g", 0.70, "-")
gl.add("z", "Mean gas compressibility factor in the annulus", "z", 0.88, "-")
gl.add("Ts", "Surface flowing temperature", "T_s", 90, "°F")
gl.add("gG", "Geothermal gradient", "g_G", 1.4, "°F/100 ft")
gl.add("Tb", "Bottom-hole temperature", "T_b", "={Ts}+{gG}*{D}/100", "°F")
gl.add("Tav", "Mean annulus temperature", "T_av", "=({Ts}+{Tb})/2", "°F")
gl.add("TavR", "Mean annulus temperature, absolute", "T_av,R", "={Tav}+459.67", "°R")
gl.add("pcD", "Casing gas pressure at mid-perforation depth (static gas column)", "p_cD",
       "={pcoa}*EXP(0.01875*{SGg}*{D}/({z}*{TavR}))", "psia")
gl.add("pcD2", "Casing gas pressure at depth (first draft, gauge)", "p_cD2",
       "={pco}*EXP(0.01875*{SGg}*{D}/({z}*{TavR}))", "psia",
       planted=("offset-scale", "a gauge reading in the gas column formula, which wants psia"))
gl.add("pcD3", "Casing gas pressure at depth (first draft, °F)", "p_cD3",
       "={pcoa}*EXP(0.01875*{SGg}*{D}/({z}*{Tav}))", "psia",
       planted=("offset-scale", "a °F reading where °R belongs in the gas column exponent"))
gl.add("gg", "Mean gas gradient in the annulus", "g_g", "=({pcD}-{pcoa})/{D}", "psi/ft")
gl.heading("Point of injection")
gl.add("dpv", "Injection pressure differential kept at the valve", "Δp_v", 100, "psi")
gl.add("Dinj", "Depth of the operating valve (point of balance less Δp_v)", "D_inj",
       "=({pco}-{dpv}-{pwh})/({gfa}-{gg})", "ft")
gl.add("ptinj", "Tubing pressure at the injection point", "p_t,inj", "={pwh}+{gfa}*{Dinj}",
       "psig")
gl.add("pcinj", "Casing pressure at the injection point", "p_c,inj", "={pco}+{gg}*{Dinj}",
       "psig")
gl.add("pcinja", "Casing pressure at the injection point, absolute", "p_c,inj,a",
       "={pcinj}+14.7", "psia")
gl.add("dpinj", "Casing-to-tubing differential at the injection point", "Δp_inj",
       "={pcinj}-{ptinj}", "psi")
gl.add("dpinj2", "Casing-to-tubing differential at the injection point (first draft)",
       "Δp_inj2", "={pcinja}-{ptinj}", "psi",
       planted=("offset-scale", "an absolute pressure less a gauge one"))
gl.add("pwfc", "Flowing bottom-hole pressure, by gradients", "p_wf,c",
       "={ptinj}+{gfb}*({D}-{Dinj})", "psig")
gl.add("pwfc2", "Flowing bottom-hole pressure, by gradients (first draft)", "p_wf,c2",
       "={ptinj}+{gfb}*({Dm}-{Dinj}*0.3048)", "psig",
       planted=("unit-scale", "a psi/ft gradient times a depth in m: 3.281 too small"))
WELLS = gl.finish()

_pco, _gg, _Ts, _gG = gl.ref("pco"), gl.ref("gg"), gl.ref("Ts"), gl.ref("gG")
MAND = {
    "A1": "Saltmarsh Flats well SF-14: unloading valve mandrels (invented depths and settings)",
    "A2": "Sources: pressure at depth = surface pressure + gas gradient × depth; temperature = "
          "surface + geothermal gradient × depth/100; °C = (°F − 32)/1.8 (NIST SP 811 (2008)); "
          "25 psi drop per valve (common practice).",
    "A3": CAUTION,
    "A5": "Valve", "B5": "Depth [ft]", "C5": "Surface opening pressure [psig]",
    "D5": "Opening pressure at depth [psig]", "E5": "Valve temperature [°F]",
    "F5": "Valve temperature [°C]",
}
for r, (valve, depth, pso) in enumerate([("1 (unloading)", 2400, 1325),
                                         ("2 (unloading)", 3900, 1300),
                                         ("3 (unloading)", 5000, 1275)], start=6):
    MAND[f"A{r}"], MAND[f"B{r}"], MAND[f"C{r}"] = valve, depth, pso
    MAND[f"D{r}"] = f"=C{r}+{_gg}*B{r}"
    MAND[f"E{r}"] = f"={_Ts}+{_gG}*B{r}/100"
    MAND[f"F{r}"] = f"=(E{r}-32)/1.8"
MAND["F8"] = "=(E8-32)*1.8"
MAND_PLANTED = {"Mandrels!F8": ("unit-scale", "°F to °C multiplied by 1.8: wrong way round")}

GLB = {
    "trade": "petroleum production: continuous gas lift design of one well",
    "sheets": [("Well", WELLS), ("Mandrels", MAND)],
    "planted": {**gl.planted, **MAND_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 3: water tower, storage, pressure zone and fill pump (ft, m, in, ft³, US gal, m³, mgd,
# gpm, m³/h, h, %, psi, psig, psia, kPa, hp, kW)
# --------------------------------------------------------------------------------------------
WT_SRC = (
    "Sources: 1 ft of water = 0.433 psi and 1 psi = 2.31 ft of water (water near 60 °F, common "
    "practice); 1 psi = 6.895 kPa, 1 ft = 0.3048 m, 1 ft³ = 7.481 US gal, 1 m³ = 264.2 US gal, "
    "1 gpm = 0.2271 m³/h, 1 hp = 0.7457 kW (NIST SP 811 (2008) App. B.8); p(kPa) = 9.81·h(m) "
    "for water, g_n = 9.81 m/s² (SI Brochure 9th ed.); Hazen-Williams h_f = 10.44·L·Q^1.852/"
    "(C^1.852·d^4.87), h_f and L in ft, Q in gpm, d in in (common practice, from memory); "
    "water horsepower gpm·ft/3960 (common practice); service pressure 35 to 80 psi (Recommended "
    "Standards for Water Works (Ten States Standards), from memory); equalisation storage 20 % "
    "of a maximum day (common practice); fire flow and duration (ISO needed fire flow, "
    "figures invented); site barometer 14.2 psia at about 1000 ft (from memory). Town, tower, "
    "mains, pump data and readings invented.")
wt = ItemSheet("Tower", "Town of Ashby Fen (invented): North zone elevated tank, storage, "
               "zone pressures and fill pump from the treatment works", WT_SRC)
wt.heading("Tank and storage")
wt.add("zh", "Overflow (high water level) elevation", "z_HWL", 1062, "ft")
wt.add("zl", "Low water level elevation", "z_LWL", 1032, "ft")
wt.add("Db", "Bowl equivalent diameter", "D_b", 60, "ft")
wt.add("hop", "Operating range", "h_op", "={zh}-{zl}", "ft")
wt.add("Vf", "Operating storage", "V_ft", "=PI()*{Db}^2/4*{hop}", "ft³")
wt.add("Vg", "Operating storage, US gal", "V", "={Vf}*7.481", "US gal")
wt.add("Vg2", "Operating storage, US gal (first draft)", "V_2", "={Vf}/7.481", "US gal",
       planted=("unit-scale", "ft³ to gal divided by 7.481: wrong way round"))
wt.heading("Storage needed")
wt.add("ADD", "Average day demand, North zone", "ADD", 0.9, "mgd")
wt.add("MDF", "Maximum day factor", "MDF", 1.8, "-")
wt.add("MDD", "Maximum day demand", "MDD", "={ADD}*{MDF}*1000000/1440", "gpm")
wt.add("seq", "Equalisation storage, share of a maximum day", "s_eq", 20, "%")
wt.add("teq", "Equalisation period, one maximum day", "t_eq", 24, "h")
wt.add("Veq", "Equalisation storage", "V_eq", "={MDD}*60*{teq}*{seq}/100", "US gal")
wt.add("FF", "Fire flow", "FF", 2500, "gpm")
wt.add("tf", "Fire flow duration", "t_f", 2, "h")
wt.add("Vfire", "Fire storage", "V_fire", "={FF}*60*{tf}", "US gal")
wt.add("Vfire2", "Fire storage (first draft)", "V_fire2", "={FF}*{tf}", "US gal",
       planted=("unit-scale", "gpm × h written as gal: the ×60 missing"))
wt.add("Vfm3", "Fire storage, m³", "V_fire,SI", "={Vfire}/264.2", "m³")
wt.add("Vreq", "Storage needed, equalisation and fire", "V_req", "={Veq}+{Vfire}", "US gal")
wt.heading("Zone pressures (static, from the tank)")
wt.add("zhi", "Highest service ground, Ridge Road", "z_hi", 948, "ft")
wt.add("zlo", "Lowest service ground, Mill Lane", "z_lo", 880, "ft")
wt.add("pmin", "Lowest static pressure, tank at LWL", "p_min", "=({zl}-{zhi})*0.433", "psi")
wt.add("pmax", "Highest static pressure, tank at HWL", "p_max", "=({zh}-{zlo})*0.433", "psi")
wt.add("hm", "Highest static head, m", "h_max", "=({zh}-{zlo})*0.3048", "m")
wt.add("pmax2", "Highest static pressure (first draft, from the head in m)", "p_max2",
       "={hm}*0.433", "psi",
       planted=("unit-scale", "0.433 psi per ft applied to a head in m: 3.281 too small"))
wt.add("pmaxk", "Highest static pressure, kPa", "p_max,SI", "={pmax}*6.895", "kPa")
wt.add("pmaxk2", "Highest static pressure, kPa (check, 9.81·h)", "p_max,SI2", "=9.81*{hm}",
       "kPa")
wt.add("pmaxk3", "Highest static pressure, kPa (first draft)", "p_max,SI3", "={pmax}/6.895",
       "kPa", planted=("unit-scale", "psi to kPa divided by 6.895: wrong way round"))
wt.add("pb", "Site barometer", "p_b", 14.2, "psia")
wt.add("pmaxa", "Highest static pressure, absolute (surge model input)", "p_max,a",
       "={pmax}+{pb}", "psia")
wt.add("pmaxa2", "Highest static pressure, absolute (first draft)", "p_max,a2",
       "={pmax}+14.7", "psia",
       planted=("offset-scale", "the sea-level atmosphere where the site's barometer belongs"))
wt.heading("Level transmitter at the tank base")
wt.add("zt", "Transmitter elevation", "z_t", 915, "ft")
wt.add("pLT", "Transmitter reading (SCADA, invented)", "p_LT", 58.5, "psig")
wt.add("zw", "Water surface elevation", "z_w", "={zt}+{pLT}*2.31", "ft")
wt.add("zw2", "Water surface elevation (first draft)", "z_w2", "={zt}+{pLT}*2.31*0.3048", "ft",
       planted=("unit-scale", "a head in m added to an elevation in ft"))
wt.heading("Fill pump at the treatment works")
wt.add("Qp", "Fill pump rated flow", "Q_p", 1800, "gpm")
wt.add("Qpm", "Fill pump rated flow, m³/h", "Q_p,SI", "={Qp}*0.2271", "m³/h")
wt.add("zcw", "Clearwell low level (pump suction)", "z_cw", 902, "ft")
wt.add("Lm", "Transmission main length", "L", 8400, "ft")
wt.add("dm", "Transmission main bore (16 in ductile iron)", "d", 16.4, "in")
wt.add("C", "Hazen-Williams C", "C", 130, "-")
wt.add("hf", "Friction loss in the main", "h_f",
       "=10.44*{Lm}*{Qp}^1.852/({C}^1.852*{dm}^4.87)", "ft")
wt.add("TDH", "Total dynamic head, tank at HWL", "TDH", "={zh}-{zcw}+{hf}", "ft")
wt.add("whp", "Water horsepower", "P_w", "={Qp}*{TDH}/3960", "hp")
wt.add("etap", "Pump efficiency at duty (maker's curve, invented)", "η_p", 82, "%")
wt.add("etam", "Motor efficiency (maker, invented)", "η_m", 95, "%")
wt.add("bhp", "Brake horsepower", "P_b", "={whp}/({etap}/100)", "hp")
wt.add("bhp2", "Brake horsepower (first draft)", "P_b2", "={whp}/{etap}", "hp",
       planted=("unit-scale", "a % used as a fraction: 100 too small"))
wt.add("Pin", "Motor input power", "P_in", "={bhp}*0.7457/({etam}/100)", "kW")
wt.add("Pin2", "Motor input power (first draft)", "P_in2", "={bhp}/0.7457/({etam}/100)", "kW",
       planted=("unit-scale", "hp to kW divided by 0.7457: wrong way round"))
wt.add("ADDg", "Average day demand, gpm", "ADD_g", "={ADD}*1000000/1440", "gpm")
wt.add("tfill", "Time to fill the operating range at average day demand", "t_fill",
       "={Vg}/({Qp}-{ADDg})/60", "h")
wt.add("tfill2", "Time to fill (first draft)", "t_fill2", "={Vg}/({Qp}-{ADDg})/3600", "h",
       planted=("unit-scale", "minutes to hours divided by 3600: seconds, not minutes"))
TOWERS = wt.finish()

_zh = wt.ref("zh")
ZONE = {
    "A1": "Ashby Fen North zone: static pressure at the hydrant test points, tank at HWL "
          "(invented ground levels)",
    "A2": "Sources: 1 ft of water = 0.433 psi (common practice); 1 psi = 6.895 kPa (NIST SP "
          "811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Hydrant", "B5": "Ground elevation [ft]", "C5": "Static head [ft]",
    "D5": "Static pressure [psi]", "E5": "Static pressure [kPa]",
}
for r, (hyd, z) in enumerate([("H-101 Ridge Road", 948), ("H-117 Church Street", 915),
                              ("H-132 Mill Lane", 880)], start=6):
    ZONE[f"A{r}"], ZONE[f"B{r}"] = hyd, z
    ZONE[f"C{r}"] = f"={_zh}-B{r}"
    ZONE[f"D{r}"] = f"=C{r}*0.433"
    ZONE[f"E{r}"] = f"=D{r}*6.895"
ZONE["D7"] = "=C7*2.31"
ZONE_PLANTED = {"Zone!D7": ("unit-scale", "ft of water to psi multiplied by 2.31: the ft-per-psi "
                                          "factor the wrong way round")}

WTB = {
    "trade": "water supply: elevated tank storage, pressure zone and fill pump",
    "sheets": [("Tower", TOWERS), ("Zone", ZONE)],
    "planted": {**wt.planted, **ZONE_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 4: dairy HTST pasteuriser (L/h, L/s, gpm, kg/L, kg/h, °C, °F, K, s, in, mm, m, m², m/s,
# %, kJ/(kg·K), kW, W/(m²·K), Btu/h, TR, L, h/d, kWh/d)
# --------------------------------------------------------------------------------------------
HT_SRC = (
    "Sources: 1 in = 25.4 mm, 1 US gal = 3.785 L, 1 kW = 3412 Btu/h, 1 TR = 3.517 kW (NIST SP "
    "811 (2008) App. B.8); °F = 1.8·°C + 32, K = °C + 273.15 (SI Brochure 9th ed.); HTST at "
    "least 72 °C (161 °F) for 15 s (Codex CAC/RCP 57-2004 and the US Grade \"A\" Pasteurized "
    "Milk Ordinance, from memory); holding tube L = Q·t/(A·η) with η ≈ 0.85 for turbulent flow "
    "(Dairy Processing Handbook, Tetra Pak, ch. 8, from memory); whole milk ρ = 1.030 kg/L, "
    "c_p = 3.93 kJ/(kg·K) (from memory); regeneration R = (t_r − t_in)/(t_p − t_in) (common "
    "practice); Q = ṁ·c_p·ΔT, A = Q/(U·LMTD), LMTD = (ΔT_2 − ΔT_1)/ln(ΔT_2/ΔT_1) (common "
    "practice); water c_p = 4.19 kJ/(kg·K) (from memory); 2.5 in sanitary tube, 0.065 in wall "
    "(ASME BPE tube tables, from memory). Dairy, plant, maker's data and readings invented.")
ht = ItemSheet("HTST", "Wensley Vale Creamery (invented): HTST pasteuriser 1, whole milk, "
               "plate regenerator, heater and cooler, holding tube", HT_SRC)
ht.heading("Capacity")
ht.add("Q", "Rated milk flow (timing pump)", "Q", 10000, "L/h")
ht.add("Qs", "Milk flow, L/s", "Q_s", "={Q}/3600", "L/s")
ht.add("Qs2", "Milk flow, L/s (first draft)", "Q_s2", "={Q}/60", "L/s",
       planted=("unit-scale", "per hour to per second divided by 60: 60 too large"))
ht.add("Qg", "Milk flow, US gpm (US timing pump maker)", "Q_US", "={Q}/60/3.785", "gpm")
ht.add("rho", "Density of whole milk", "ρ", 1.030, "kg/L")
ht.add("m", "Milk mass flow", "ṁ", "={Q}*{rho}", "kg/h")
ht.heading("Holding tube")
ht.add("tp", "Pasteurisation (holding) temperature", "t_p", 72, "°C")
ht.add("tpF", "Pasteurisation temperature, °F (PMO record chart)", "t_p,F", "={tp}*1.8+32", "°F")
ht.add("tpF2", "Pasteurisation temperature, °F (first draft)", "t_p,F2", "={tp}*1.8", "°F",
       planted=("offset-scale", "°C to °F by the 1.8 alone: the +32 missing"))
ht.add("tpK", "Pasteurisation temperature, absolute (maker's viscosity fit)", "T_p",
       "={tp}+273.15", "K")
ht.add("tpK2", "Pasteurisation temperature, absolute (first draft)", "T_p2", "={tp}", "K",
       planted=("offset-scale", "a °C reading set equal to kelvins"))
ht.add("th", "Minimum holding time", "t_h", 15, "s")
ht.add("OD", "Holding tube outside diameter (2.5 in sanitary)", "OD", 2.5, "in")
ht.add("wall", "Holding tube wall", "s", 0.065, "in")
ht.add("din", "Holding tube bore", "d_in", "={OD}-2*{wall}", "in")
ht.add("d", "Holding tube bore, mm", "d", "={din}*25.4", "mm")
ht.add("A", "Holding tube bore area", "A", "=PI()*({d}/1000)^2/4", "m²")
ht.add("v", "Mean velocity in the holding tube", "v", "={Qs}/1000/{A}", "m/s")
ht.add("eta", "Holding tube efficiency (fastest particle, turbulent)", "η_h", 85, "%")
ht.add("L", "Holding tube length", "L", "={v}*{th}/({eta}/100)", "m")
ht.add("Vh", "Holding tube volume", "V_h", "={A}*{L}*1000", "L")
ht.add("tr_", "Mean residence time in the holding tube (check)", "t_res", "={Vh}/{Q}*3600", "s")
ht.add("tr2_", "Mean residence time in the holding tube (first draft)", "t_res2", "={Vh}/{Q}",
       "s", planted=("unit-scale", "L over L/h gives hours, written as s: the ×3600 missing"))
ht.add("mu", "Viscosity of whole milk at 72 °C (from memory)", "μ", 0.50, "mPa·s")
ht.add("Re", "Reynolds number in the holding tube", "Re",
       "={rho}*1000*{v}*{d}/1000/({mu}/1000)", "-")
ht.heading("Regeneration, heating and cooling")
ht.add("tin", "Raw milk from the balance tank", "t_in", 4, "°C")
ht.add("R", "Regeneration efficiency (maker, invented)", "R", 90, "%")
ht.add("cp", "Specific heat of whole milk", "c_p", 3.93, "kJ/(kg·K)")
ht.add("tr", "Raw milk leaving the regenerator", "t_r", "={tin}+{R}/100*({tp}-{tin})", "°C")
ht.add("tr2", "Raw milk leaving the regenerator (first draft)", "t_r2",
       "={tin}+{R}*({tp}-{tin})", "°C",
       planted=("unit-scale", "a % used as a fraction: the rise 100 too large"))
ht.add("Qh", "Heating section duty", "Q_h", "={m}*{cp}*({tp}-{tr})/3600", "kW")
ht.add("Qh2", "Heating section duty (first draft)", "Q_h2", "={m}*{cp}*({tp}-{tr})", "kW",
       planted=("unit-scale", "kg/h × kJ/(kg·K) × K written as kW: the /3600 missing"))
ht.add("Qn", "Heating duty without regeneration", "Q_n", "={m}*{cp}*({tp}-{tin})/3600", "kW")
ht.add("Qr", "Heat recovered in the regenerator", "Q_r", "={Qn}-{Qh}", "kW")
ht.add("tci", "Pasteurised milk leaving the regenerator", "t_ci", "={tp}-({tr}-{tin})", "°C")
ht.add("tout", "Pasteurised milk to the silo", "t_out", 4, "°C")
ht.add("Qc", "Chilled water cooling section duty", "Q_c", "={m}*{cp}*({tci}-{tout})/3600",
       "kW")
ht.add("QcTR", "Chilled water cooling section duty, TR (US chiller maker)", "Q_c,TR",
       "={Qc}/3.517", "TR")
ht.heading("Hot water set (heating section)")
ht.add("thi", "Hot water into the heating section", "t_hi", 76, "°C")
ht.add("tho", "Hot water out of the heating section", "t_ho", 71, "°C")
ht.add("cpw", "Specific heat of water", "c_pw", 4.19, "kJ/(kg·K)")
ht.add("mhw", "Hot water flow", "ṁ_hw", "={Qh}*3600/({cpw}*({thi}-{tho}))", "kg/h")
ht.add("dT1", "Temperature difference at the hot end", "ΔT_1", "={thi}-{tp}", "K")
ht.add("dT2", "Temperature difference at the cold end", "ΔT_2", "={tho}-{tr}", "K")
ht.add("LMTD", "Log mean temperature difference", "LMTD", "=({dT2}-{dT1})/LN({dT2}/{dT1})",
       "K")
ht.add("LMTD2", "Log mean temperature difference (first draft)", "LMTD_2",
       "=({dT2}-{dT1})/LN({tho}/{thi})", "K",
       planted=("offset-scale", "a ratio of °C readings inside LN where the ratio of the "
                                "differences belongs"))
ht.add("U", "Overall coefficient, heating plates (maker, invented)", "U", 4000, "W/(m²·K)")
ht.add("Ah", "Heating section plate area", "A_h", "={Qh}*1000/({U}*{LMTD})", "m²")
ht.add("Ah2", "Heating section plate area (first draft)", "A_h2", "={Qh}/({U}*{LMTD})", "m²",
       planted=("unit-scale", "kW over W/(m²·K): the ×1000 missing"))
HTSTS = ht.finish()

_m, _cp = ht.ref("m"), ht.ref("cp")
SECT = {
    "A1": "Wensley Vale Creamery HTST 1: milk side of the plate sections (temperatures from "
          "the HTST sheet)",
    "A2": "Sources: Q = ṁ·c_p·ΔT, kW from kg/h and kJ/(kg·K) over 3600 (common practice); "
          "1 kW = 3412 Btu/h (NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Section", "B5": "Milk in [°C]", "C5": "Milk out [°C]", "D5": "Duty [kW]",
    "E5": "Duty [Btu/h]",
}
for r, (sec, a, b) in enumerate([("Regenerator, raw side", "tin", "tr"),
                                 ("Heating", "tr", "tp"),
                                 ("Cooling, chilled water", "tci", "tout")], start=6):
    SECT[f"A{r}"] = sec
    SECT[f"B{r}"] = f"={ht.ref(a)}"
    SECT[f"C{r}"] = f"={ht.ref(b)}"
    SECT[f"D{r}"] = f"={_m}*{_cp}*(C{r}-B{r})/3600"
    SECT[f"E{r}"] = f"=D{r}*3412"
SECT["E7"] = "=D7/3412"
SECT_PLANTED = {"Sections!E7": ("unit-scale", "kW to Btu/h divided by 3412: wrong way round")}

HTB = {
    "trade": "dairy process: HTST pasteuriser holding tube, regeneration and heating",
    "sheets": [("HTST", HTSTS), ("Sections", SECT)],
    "planted": {**ht.planted, **SECT_PLANTED},
}

BOOKS = {"dc-chw-kestrel-moor": DCB, "gas-lift-saltmarsh-sf14": GLB,
         "water-tower-ashby-fen": WTB, "htst-wensley-vale": HTB}


def print_values():
    """Every formula cell's value by the shared evaluator, for a hand check of the numbers."""
    for stem, book in BOOKS.items():
        ev = Evaluator(book["sheets"], book.get("names") or {})
        print(f"== {stem}")
        for ref in formula_cells(book):
            sheet, cell = ref.split("!")
            cells = dict(book["sheets"])[sheet]
            row = cell.lstrip("ABCDEFGHIJKLMNOPQRSTUVWXYZ")
            label = cells.get(f"A{row}", "")
            unit = cells.get(f"D{row}", "") if cell.startswith("C") else ""
            mark = "  PLANTED" if ref in book["planted"] else ""
            print(f"  {ref:14s} {ev.value(sheet, cell):14.6g} {unit:12s} {label[:60]}{mark}")


def main():
    write_books_with_notes(HERE, BOOKS)
    if "--values" in sys.argv:
        print_values()


if __name__ == "__main__":
    main()
