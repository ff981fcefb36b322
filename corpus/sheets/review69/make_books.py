#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review69), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; the layout
follows corpus/sheets/review64/make_books.py.

Trades: a sewage treatment works' anaerobic digesters and CHP engine; a quarry's secondary
crushing, conveying, screening and dust suppression; a hospital's medical oxygen supply from a
vacuum-insulated evaporator (VIE); a road tunnel's groundwater drainage, sump pumps and fire
main. All scenarios, sites, firms, readings and maker's data are invented (demonstration
only); the formulas and published factors are the trade's own, with their sources named in a
text cell at the top of each sheet ("from memory" where recalled and not checked, "common
practice" for a fact of the trade with no single source).

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
# Book 1: sewage works anaerobic digesters and CHP (m³/d, gal/d, %, kg/m³, kg/d, lb/d, m³, d, h,
# kg/(m³·d), Nm³/kg, Nm³/d, scf/d, MJ/Nm³, kW, kPa(g), kPa, K, °C, °F, W/(m²·K), m², W, kg/s,
# m³/h, gpm, Btu/h)
# --------------------------------------------------------------------------------------------
DIG_SRC = (
    "Sources: 1 m³ = 264.2 US gal, 1 m³ = 35.31 ft³, 1 m³/h = 4.403 gpm "
    "(NIST SP 811 (2008) App. B.8, rounded); °F = 1.8·°C + 32, K = °C + 273.15 (SI Brochure "
    "9th ed.); water 8.34 lb/US gal (common practice); specific gravity = ρ/1000 kg/m³ (common "
    "practice); volatile solids destroyed V_d = 13.7·ln(SRT) + 18.9 %, SRT in days, for "
    "high-rate complete-mix mesophilic digestion (Metcalf & Eddy, Wastewater Engineering, 5th "
    "ed. (2014), ch. 13, from memory); biogas 0.75 to 1.12 m³ per kg VS destroyed (same, from "
    "memory; 0.90 Nm³/kg invented within it); methane net calorific value 35.8 MJ/Nm³ at 0 °C, "
    "101.325 kPa (from memory); scf at 60 °F (288.71 K) and 14.696 psia, Nm³ at 0 °C and "
    "101.325 kPa, so 1 Nm³ = 35.31 × 288.71/273.15 scf (common practice); 1 kW = 86.4 MJ/d; "
    "sludge heating Q = ṁ·c_p·ΔT with c_p of water 4.19 kJ/(kg·K) (common practice); fabric "
    "loss Q = U·A·ΔT (common practice); US check Btu/h = 500·gpm·ΔT(°F), 500 = 8.33 lb/gal × "
    "60 min/h × 1 Btu/(lb·°F) (ASHRAE Handbook, HVAC Applications, from memory); SRT = HRT for "
    "a digester without recycle (common practice). Works, digesters, CHP maker's data and "
    "readings invented.")
dg = ItemSheet("Digester", "Hobbs Marsh sewage treatment works (invented): two mesophilic "
               "anaerobic digesters and a biogas CHP engine, average day", DIG_SRC)
dg.heading("Sludge feed")
dg.add("Q", "Thickened sludge feed", "Q", 420, "m³/d")
dg.add("Qgal", "Thickened sludge feed, US gal/d", "Q_US", "={Q}*264.2", "gal/d")
dg.add("Qgal2", "Thickened sludge feed, US gal/d (first draft)", "Q_US2", "={Q}/264.2", "gal/d",
       planted=("unit-scale", "m³ to US gal divided by 264.2: wrong way round"))
dg.add("DS", "Dry solids of the feed", "DS", 4.5, "%")
dg.add("rhos", "Density of the thickened sludge", "ρ_s", 1020, "kg/m³")
dg.add("SG", "Specific gravity of the sludge", "SG", "={rhos}/1000", "-")
dg.add("mDS", "Dry solids load", "ṁ_DS", "={Q}*{rhos}*{DS}/100", "kg DS/d")
dg.add("mDS2", "Dry solids load (first draft)", "ṁ_DS2", "={Q}*{rhos}*{DS}", "kg DS/d",
       planted=("unit-scale", "a % used as a fraction: 100 too large"))
dg.add("mDSlb", "Dry solids load, lb/d (US check, 8.34 lb/gal)", "ṁ_DS,US",
       "={Qgal}*8.34*{SG}*{DS}/100", "lb/d")
dg.add("VSf", "Volatile share of the dry solids", "VS/DS", 75, "%")
dg.add("mVS", "Volatile solids load", "ṁ_VS", "={mDS}*{VSf}/100", "kg/d")
dg.heading("Digesters")
dg.add("Vdig", "Working volume, both digesters (Tanks sheet)", "V", "=Tanks!D9", "m³")
dg.add("HRT", "Hydraulic retention time (= SRT, no recycle)", "HRT", "={Vdig}/{Q}", "d")
dg.add("HRTh", "Hydraulic retention time, hours", "HRT_h", "={Vdig}/{Q}*24", "h")
dg.add("OLR", "Volatile solids loading rate", "OLR", "={mVS}/{Vdig}", "kg/(m³·d)")
dg.add("Vd", "Volatile solids destroyed, Metcalf & Eddy (SRT in days)", "V_d",
       "=13.7*LN({HRT})+18.9", "%")
dg.add("mVSd", "Volatile solids destroyed", "ṁ_VSd", "={mVS}*{Vd}/100", "kg/d")
dg.add("Td", "Digester operating temperature", "T_d", 37, "°C")
dg.add("TdK", "Digester operating temperature, absolute", "T_d,K", "={Td}+273.15", "K")
dg.add("TdK2", "Digester operating temperature, absolute (first draft)", "T_d,K2", "={Td}",
       "K", planted=("offset-scale", "a °C reading set equal to kelvins"))
dg.heading("Biogas")
dg.add("y", "Biogas yield per kg VS destroyed (0 °C, 101.325 kPa)", "y", 0.90, "Nm³/kg")
dg.add("Qb", "Biogas production", "Q_b", "={mVSd}*{y}", "Nm³/d")
dg.add("Qbscf", "Biogas production, scf/d (60 °F, 14.696 psia)", "Q_b,US",
       "={Qb}*35.31*288.71/273.15", "scf/d")
dg.add("Qbscf2", "Biogas production, scf/d (first draft)", "Q_b,US2", "={Qb}/35.31", "scf/d",
       planted=("unit-scale", "m³ to ft³ divided by 35.31: wrong way round"))
dg.add("CH4", "Methane in the biogas", "x_CH4", 63, "%")
dg.add("QCH4", "Methane production", "Q_CH4", "={Qb}*{CH4}/100", "Nm³/d")
dg.add("LHV", "Net calorific value of methane (0 °C, 101.325 kPa)", "H_i", 35.8, "MJ/Nm³")
dg.add("Pf", "Fuel power in the biogas", "P_f", "={QCH4}*{LHV}/86.4", "kW")
dg.add("Pf2", "Fuel power in the biogas (first draft)", "P_f2", "={QCH4}*{LHV}/24", "kW",
       planted=("unit-scale", "MJ/d to kW divided by 24 only: MJ/h written as kW, 3.6 too large"))
dg.add("pg", "Gas pressure in the digester roof space", "p_g", 2.5, "kPa(g)")
dg.add("pb", "Site barometer (invented)", "p_b", 100.6, "kPa")
dg.add("pa", "Gas pressure in the roof space, absolute", "p_a", "={pg}+{pb}", "kPa")
dg.add("Qact", "Biogas at roof-space conditions (dry)", "Q_act",
       "={Qb}*{TdK}/273.15*101.325/{pa}", "m³/d")
dg.add("Qact2", "Biogas at roof-space conditions (first draft)", "Q_act2",
       "={Qb}*{TdK}/273.15*101.325/{pg}", "m³/d",
       planted=("offset-scale", "a gauge pressure in a gas-law ratio: absolute belongs"))
dg.heading("CHP engine")
dg.add("etae", "Electrical efficiency (maker, invented)", "η_e", 38, "%")
dg.add("etat", "Recoverable heat efficiency (maker, invented)", "η_th", 44, "%")
dg.add("Pel", "Electrical output", "P_el", "={Pf}*{etae}/100", "kW")
dg.add("Pth", "Recoverable heat output", "P_th", "={Pf}*{etat}/100", "kW")
dg.heading("Digester heating")
dg.add("msl", "Sludge mass fed", "ṁ_sl", "={Q}*{rhos}", "kg/d")
dg.add("cp", "Specific heat of the sludge (as water)", "c_p", 4.19, "kJ/(kg·K)")
dg.add("Tf", "Feed sludge temperature, winter", "T_f", 12, "°C")
dg.add("dT", "Temperature rise of the feed", "ΔT", "={Td}-{Tf}", "K")
dg.add("Qsl", "Heat to raise the feed", "Q_sl", "={msl}*{cp}*{dT}/86400", "kW")
dg.add("Qsl2", "Heat to raise the feed (first draft)", "Q_sl2", "={msl}*{cp}*{dT}/3600", "kW",
       planted=("unit-scale", "kg/d taken as kg/h: /3600 where /86 400 belongs, 24 too large"))
dg.add("U", "Heat loss coefficient, insulated walls and roof", "U", 0.7, "W/(m²·K)")
dg.add("A", "Wall and roof area, both digesters (Tanks sheet)", "A", "=Tanks!E9", "m²")
dg.add("Ta", "Outside air, winter design", "T_a", -3, "°C")
dg.add("dTa", "Digester to outside air", "ΔT_a", "={Td}-{Ta}", "K")
dg.add("Qloss", "Fabric heat loss", "Q_loss", "={U}*{A}*{dTa}", "W")
dg.add("Qdem", "Digester heat demand", "Q_dem", "={Qsl}+{Qloss}/1000", "kW")
dg.add("Qdem2", "Digester heat demand (first draft)", "Q_dem2", "={Qsl}+{Qloss}", "kW",
       planted=("unit-scale", "W added to kW"))
dg.add("Qsur", "CHP heat left after the digesters", "Q_sur", "={Pth}-{Qdem}", "kW")
dg.heading("Heating water to the sludge heat exchangers")
dg.add("tw1", "Heating water flow temperature", "t_w1", 80, "°C")
dg.add("tw2", "Heating water return temperature", "t_w2", 70, "°C")
dg.add("rhow", "Density of water at 75 °C", "ρ_w", 975, "kg/m³")
dg.add("mw", "Heating water mass flow", "ṁ_w", "={Qdem}/({cp}*({tw1}-{tw2}))", "kg/s")
dg.add("Vw", "Heating water flow", "V̇_w", "={mw}*3600/{rhow}", "m³/h")
dg.add("Vwgpm", "Heating water flow, US gpm (US pump maker)", "V̇_w,US", "={Vw}*4.403", "gpm")
dg.add("tw1F", "Flow temperature, °F", "t_w1,F", "={tw1}*1.8+32", "°F")
dg.add("tw2F", "Return temperature, °F", "t_w2,F", "={tw2}*1.8+32", "°F")
dg.add("QdemUS", "Digester heat demand, Btu/h (US check, 500·gpm·ΔT)", "Q_dem,US",
       "=500*{Vwgpm}*({tw1F}-{tw2F})", "Btu/h")
DIGS = dg.finish()

TANKS = {
    "A1": "Hobbs Marsh digesters: volume and heat-losing area (invented dimensions; digester 3 "
          "is proposed, its diameter taken from a drawing in mm)",
    "A2": "Sources: cylinder V = π·D²/4·H, wall and flat roof area π·D·H + π·D²/4 (geometry); "
          "1 m = 1000 mm (SI Brochure 9th ed.).",
    "A3": CAUTION,
    "A5": "Digester", "B5": "Diameter [m]", "C5": "Wall height [m]", "D5": "Volume [m³]",
    "E5": "Wall and roof area [m²]", "F5": "Diameter [mm]",
    "A9": "Total, digesters 1 and 2", "D9": "=SUM(D6:D7)", "E9": "=SUM(E6:E7)",
}
for r, (name, d, h) in enumerate([("Digester 1", 22.0, 8.6), ("Digester 2", 21.5, 8.8)],
                                 start=6):
    TANKS[f"A{r}"], TANKS[f"B{r}"], TANKS[f"C{r}"] = name, d, h
    TANKS[f"D{r}"] = f"=PI()*B{r}^2/4*C{r}"
    TANKS[f"E{r}"] = f"=PI()*B{r}*C{r}+PI()*B{r}^2/4"
TANKS.update({"A8": "Digester 3 (proposed)", "F8": 20000, "B8": "=F8/1000", "C8": 9.0,
              "D8": "=PI()*F8^2/4*C8"})
TANKS_PLANTED = {"Tanks!D8": ("unit-scale", "a diameter in mm squared into m³: 10⁶ too large")}

DIGB = {
    "trade": "wastewater: anaerobic digesters, biogas and CHP, digester heating",
    "sheets": [("Digester", DIGS), ("Tanks", TANKS)],
    "planted": {**dg.planted, **TANKS_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 2: quarry secondary crushing and screening (t/h, ton/h, h/yr, t/yr, kWh/t, kWh/ton, mm,
# µm, kW, hp, MWh/yr, m, m/s, ft/min, t/m³, kg/s, kg/m, kg/m², t/(h·m²), m², ft², L/min, gpm,
# bar(g), psig, kPa(g), m³/yr)
# --------------------------------------------------------------------------------------------
QRY_SRC = (
    "Sources: 1 t = 1.1023 short ton, 1 short ton = 0.9072 t, 1 hp = 0.7457 kW, 1 ft = 0.3048 m "
    "(1 m/s = 196.85 ft/min), 1 m² = 10.764 ft², 1 US gal = 3.785 L, 1 bar = 14.50 psi = 100 "
    "kPa (NIST SP 811 (2008) App. B.8, rounded); Bond's third theory W = 10·W_i·(1/√P80 − "
    "1/√F80), W and W_i in kWh per tonne, P80 and F80 in µm (F. C. Bond (1961); B. A. Wills, "
    "Mineral Processing Technology, 8th ed. (2016), ch. 5, from memory); crusher power = W × "
    "throughput (same); belt conveyor resistance P = C·f·L·g·(m'_R + m'_B + m'_G)·v + m'_G·g·H·v "
    "with f = 0.025 and C = 1.6 for a 180 m belt (DIN 22101 (2011), from memory); throughput "
    "t/h ÷ 3.6 = kg/s; belt capacity Q = 3600·A·v·ρ (common practice); screen area A = U/(B·"
    "f_h·f_o·f_d), basic capacity B read from the maker's chart for the aperture (common "
    "practice; chart value invented); dust suppression water 0.5 % of the throughput by mass "
    "(common practice, value invented within the usual 0.5 to 1 %); pump power P = Q·Δp/η and "
    "US hp = gpm·psi/(1714·η) (common practice). Quarry, plant, test results and readings "
    "invented.")
qy = ItemSheet("Plant", "Greyscar Edge quarry (invented): secondary cone crusher, conveyor "
               "CV-3, double-deck screen and dust suppression, design year", QRY_SRC)
qy.heading("Throughput")
qy.add("T", "Secondary circuit throughput", "T", 450, "t/h")
qy.add("Tst", "Secondary circuit throughput, short tons/h (US crusher maker)", "T_US",
       "={T}*1.1023", "ton/h")
qy.add("Tst2", "Secondary circuit throughput, short tons/h (first draft)", "T_US2",
       "={T}*0.9072", "ton/h",
       planted=("unit-scale", "t to short tons multiplied by 0.9072: wrong way round"))
qy.add("hrs", "Running hours per year", "t_op", 2200, "h/yr")
qy.add("Ann", "Output per year", "M_a", "={T}*{hrs}", "t/yr")
qy.heading("Secondary cone crusher, Bond")
qy.add("Wi", "Bond crushing work index (laboratory, invented)", "W_i", 14.5, "kWh/t")
qy.add("F80", "Feed 80 % passing size", "F80", 100, "mm")
qy.add("P80", "Product 80 % passing size", "P80", 30, "mm")
qy.add("F80u", "Feed 80 % passing size, µm", "F80_µm", "={F80}*1000", "µm")
qy.add("P80u", "Product 80 % passing size, µm", "P80_µm", "={P80}*1000", "µm")
qy.add("Rr", "Reduction ratio", "R_r", "={F80}/{P80}", "-")
qy.add("W", "Specific crushing energy, Bond", "W",
       "=10*{Wi}*(1/SQRT({P80u})-1/SQRT({F80u}))", "kWh/t")
qy.add("Wst", "Specific crushing energy per short ton", "W_US", "={W}*0.9072", "kWh/ton")
qy.add("Pc", "Crushing power at the shaft", "P_c", "={W}*{T}", "kW")
qy.add("Pc2", "Crushing power at the shaft (first draft)", "P_c2", "={W}*{Tst}", "kW",
       planted=("unit-scale", "energy per tonne times short tons per hour: 10 % high"))
qy.add("etad", "Motor and V-belt drive efficiency", "η_d", 94, "%")
qy.add("Pm", "Crusher motor input", "P_m", "={Pc}/({etad}/100)", "kW")
qy.add("Pmhp", "Crusher motor input, hp (US crusher maker)", "P_m,US", "={Pm}/0.7457", "hp")
qy.add("Ey", "Crusher energy per year", "E_a", "={Pm}*{hrs}/1000", "MWh/yr")
qy.add("Ey2", "Crusher energy per year (first draft)", "E_a2", "={Pm}*{hrs}", "MWh/yr",
       planted=("unit-scale", "kWh written as MWh: 1000 too large"))
qy.heading("Conveyor CV-3, crusher to screen")
qy.add("Bmm", "Belt width", "B_mm", 800, "mm")
qy.add("B", "Belt width, m", "B", "={Bmm}/1000", "m")
qy.add("v", "Belt speed", "v", 2.5, "m/s")
qy.add("vfpm", "Belt speed, ft/min (US idler maker)", "v_US", "={v}*196.85", "ft/min")
qy.add("L", "Centre length", "L", 180, "m")
qy.add("H", "Lift, tail to head", "H", 14, "m")
qy.add("mdot", "Mass flow on the belt", "ṁ", "={T}/3.6", "kg/s")
qy.add("mG", "Load per metre of belt", "m'_G", "={mdot}/{v}", "kg/m")
qy.add("qB", "Belt mass per square metre (maker, invented)", "q_B", 12, "kg/m²")
qy.add("mB", "Belt mass per metre, carry and return", "m'_B", "={qB}*{B}*2", "kg/m")
qy.add("mB2", "Belt mass per metre (first draft)", "m'_B2", "={qB}*{Bmm}*2", "kg/m",
       planted=("unit-scale", "belt width in mm used as metres: 1000 too large"))
qy.add("mR", "Idler rotating mass per metre, carry and return (maker, invented)", "m'_R", 22,
       "kg/m")
qy.add("f", "Artificial friction factor", "f", 0.025, "-")
qy.add("C", "Length coefficient for secondary resistances", "C", 1.6, "-")
qy.add("PH", "Power for the main and secondary resistances", "P_H",
       "={C}*{f}*{L}*9.81*({mR}+{mB}+{mG})*{v}/1000", "kW")
qy.add("PSt", "Power to lift the load", "P_St", "={mdot}*9.81*{H}/1000", "kW")
qy.add("PSt2", "Power to lift the load (first draft)", "P_St2", "={mdot}*{H}/1000", "kW",
       planted=("result-unit", "ṁ·H with g left out"))
qy.add("PSt3", "Power to lift the load (site check)", "P_St3", "={T}*1000*9.81*{H}/1000", "kW",
       planted=("unit-scale", "t/h taken as t/s: the /3600 missing"))
qy.add("Pd", "Conveyor drive motor input", "P_d", "=({PH}+{PSt})/({etad}/100)", "kW")
qy.add("Ac", "Load cross-section, 30° troughing, 20° surcharge (maker, invented)", "A_c",
       0.069, "m²")
qy.add("rhob", "Bulk density of the crushed rock", "ρ_b", 1.6, "t/m³")
qy.add("Qcap", "Belt capacity", "Q_cap", "=3600*{Ac}*{v}*{rhob}", "t/h")
qy.add("util", "Belt capacity used", "u", "={T}/{Qcap}*100", "%")
qy.heading("Double-deck screen, bottom deck 25 mm")
qy.add("pu", "Feed passing 25 mm (grading, invented)", "s_u", 55, "%")
qy.add("U", "Undersize through the bottom deck", "U", "={T}*{pu}/100", "t/h")
qy.add("Bc", "Basic capacity for a 25 mm aperture (maker's chart, invented)", "B_c", 38,
       "t/(h·m²)")
qy.add("fh", "Half-size factor", "f_h", 1.2, "-")
qy.add("fo", "Oversize factor", "f_o", 1.05, "-")
qy.add("fd", "Deck factor, bottom deck", "f_d", 0.9, "-")
qy.add("As", "Screen area required, bottom deck", "A_s", "={U}/({Bc}*{fh}*{fo}*{fd})", "m²")
qy.add("Asft", "Screen area required, ft² (US screen maker)", "A_s,US", "={As}*10.764", "ft²")
qy.add("Asft2", "Screen area required, ft² (first draft)", "A_s,US2", "={As}*3.281", "ft²",
       planted=("unit-scale", "m² to ft² by the linear factor 3.281: 10.764 belongs"))
qy.heading("Dust suppression water")
qy.add("add", "Water added, share of the throughput by mass", "w", 0.5, "%")
qy.add("mw", "Water added", "ṁ_w", "={T}*{add}/100", "t/h")
qy.add("rhow", "Density of water", "ρ_w", 1.0, "kg/L")
qy.add("Vw", "Spray water flow", "V̇_w", "={mw}*1000/{rhow}/60", "L/min")
qy.add("Vwgpm", "Spray water flow, US gpm (US nozzle maker)", "V̇_w,US", "={Vw}/3.785", "gpm")
qy.add("Vwgpm2", "Spray water flow, US gpm (first draft)", "V̇_w,US2", "={Vw}*3.785", "gpm",
       planted=("unit-scale", "L/min to gpm multiplied by 3.785: wrong way round"))
qy.add("qn", "Flow per nozzle at 3 bar (maker, invented)", "q_n", 2.5, "L/min")
qy.add("nn", "Nozzles needed", "n", "={Vw}/{qn}", "-")
qy.add("pn", "Spray pressure at the nozzles", "p_n", 3.0, "bar(g)")
qy.add("pnpsig", "Spray pressure, psig", "p_n,US", "={pn}*14.5", "psig")
qy.add("pnpsig2", "Spray pressure, psig (first draft)", "p_n,US2", "={pn}*14.5+14.7", "psig",
       planted=("offset-scale", "the atmosphere added to a gauge reading written as gauge"))
qy.add("pnkPa", "Spray pressure, kPa(g)", "p_n,kPa", "={pn}*100", "kPa(g)")
qy.add("etap", "Spray pump efficiency", "η_p", 55, "%")
qy.add("Pp", "Spray pump power", "P_p", "={Vw}/60000*{pnkPa}/({etap}/100)", "kW")
qy.add("Pphp", "Spray pump power, hp (US check, gpm·psi/1714)", "P_p,US",
       "={Vwgpm}*{pnpsig}/(1714*{etap}/100)", "hp")
qy.add("Vy", "Spray water per year", "V_a", "={Vw}*60*{hrs}/1000", "m³/yr")
QRYS = qy.finish()

QRYB = {
    "trade": "quarrying: secondary crushing (Bond), belt conveyor, screen and dust suppression",
    "sheets": [("Plant", QRYS)],
    "planted": dict(qy.planted),
}

# --------------------------------------------------------------------------------------------
# Book 3: hospital medical oxygen from a VIE (L/min, m³/h, scfh, m³/d, kg/m³, kg/d, L/d, L, %,
# d, gal, bar(g), bar a, psig, psia, kPa(g), °C, K, kJ/kg, kJ/(kg·K), kg/h, kW, Btu/h, Nm³/h,
# W, mm, m², m/s, ft/s, h, kg/mol, J/(mol·K))
# --------------------------------------------------------------------------------------------
OXY_SRC = (
    "Sources: liquid oxygen 1141 kg/m³ at its normal boiling point, −183.0 °C; oxygen gas "
    "1.326 kg/m³ at 21.1 °C (70 °F) and 101.325 kPa, 1.429 kg/Nm³ at 0 °C; latent heat 213 "
    "kJ/kg; mean c_p of the gas 0.92 kJ/(kg·K) (CGA and gas suppliers' data, from memory); so "
    "1 L of liquid gives about 860 L of gas at 21.1 °C, 1 atm (same, from memory); design "
    "flows by department with diversity (HTM 02-01 (2006) Part A, method from memory, figures "
    "invented); nominal pipeline pressure 4 bar(g) (HTM 02-01, from memory); 1 bar = 14.50 "
    "psi = 100 kPa, 1 ft³ = 28.32 L, 1 US gal = 3.785 L, 1 m = 3.281 ft, 1 kW = 3412 Btu/h "
    "(NIST SP 811 (2008) App. B.8, rounded); scfh at 70 °F (21.1 °C) and 14.696 psia, the "
    "compressed gas trade's base (CGA, from memory), the same base as the litres of demand; "
    "ideal gas ρ = p·M/(R·T), R = 8.314 J/(mol·K), M_O2 = 0.032 kg/mol (CODATA 2018, rounded); "
    "copper tube 54 × 1.2 mm (EN 13348, from memory); J cylinder 6800 L of gas (supplier's "
    "data, from memory); vaporiser rated at twice the peak for icing (common practice). "
    "Hospital, departments, vessel and readings invented.")
ox = ItemSheet("Oxygen", "Larchmont Infirmary (invented): medical oxygen from a 12 000 L "
               "VIE, ambient vaporisers and the main riser, design case", OXY_SRC)
ox.heading("Demand")
ox.add("Q", "Diversified design flow (Zones sheet)", "Q", "=Zones!E10", "L/min")
ox.add("Qm3h", "Diversified design flow, m³/h", "Q_h", "={Q}*60/1000", "m³/h")
ox.add("Qscfh", "Diversified design flow, scfh (70 °F base, US vaporiser maker)", "Q_US",
       "={Q}*60/28.32", "scfh")
ox.add("Qd", "Oxygen used per day", "Q_d", "={Q}*1440/1000", "m³/d")
ox.add("pf", "Peak factor over the diversified flow", "f_pk", 1.5, "-")
ox.heading("Liquid")
ox.add("rhol", "Density of liquid oxygen at −183 °C", "ρ_l", 1141, "kg/m³")
ox.add("rhog", "Density of oxygen gas at 21.1 °C, 101.325 kPa", "ρ_g", 1.326, "kg/m³")
ox.add("X", "Liquid to gas expansion ratio", "X", "={rhol}/{rhog}", "-")
ox.add("md", "Oxygen mass per day", "ṁ_d", "={Qd}*{rhog}", "kg/d")
ox.add("Vld", "Liquid used per day", "V_l", "={md}/{rhol}*1000", "L/d")
ox.add("Vld2", "Liquid used per day (check by the expansion ratio)", "V_l2",
       "={Q}*1440/{X}", "L/d")
ox.add("Vld3", "Liquid used per day (first draft)", "V_l3", "={Q}*1440*{X}", "L/d",
       planted=("unit-scale", "gas litres to liquid multiplied by the expansion ratio: wrong "
                              "way round"))
ox.add("Vt", "VIE gross liquid capacity (invented)", "V_t", 12000, "L")
ox.add("Vtgal", "VIE gross liquid capacity, US gal", "V_t,US", "={Vt}/3.785", "gal")
ox.add("use", "Usable share of the capacity (above the reorder level)", "s_u", 80, "%")
ox.add("days", "Days of supply between deliveries", "t_s", "={Vt}*{use}/100/{Vld}", "d")
ox.add("days2", "Days of supply between deliveries (first draft)", "t_s2", "={Vt}*{use}/{Vld}",
       "d", planted=("unit-scale", "a % used as a fraction: 100 too large"))
ox.add("Vcyl", "Gas in one J cylinder", "V_cyl", 6800, "L")
ox.add("ncyl", "Cylinders on the emergency manifold, both banks", "n_cyl", 20, "-")
ox.add("tb", "Emergency manifold endurance at the design flow", "t_b",
       "={ncyl}*{Vcyl}/{Q}/60", "h")
ox.heading("Pressures")
ox.add("ptk", "VIE working pressure", "p_tk", 10.5, "bar(g)")
ox.add("ptkpsig", "VIE working pressure, psig", "p_tk,US", "={ptk}*14.5", "psig")
ox.add("pb", "Site barometer (invented)", "p_b", 1.005, "bar a")
ox.add("ptka", "VIE working pressure, absolute", "p_tk,a", "={ptk}+{pb}", "bar a")
ox.add("ptkpsia", "VIE working pressure, psia", "p_tk,US,a", "={ptka}*14.5", "psia")
ox.add("ptkpsia2", "VIE working pressure, psia (first draft)", "p_tk,US,a2", "={ptk}*14.5",
       "psia", planted=("offset-scale", "a gauge reading written as absolute"))
ox.add("pl", "Pipeline distribution pressure", "p_l", 4.0, "bar(g)")
ox.add("plkPa", "Pipeline distribution pressure, kPa(g)", "p_l,kPa", "={pl}*100", "kPa(g)")
ox.add("pla", "Pipeline distribution pressure, absolute", "p_l,a", "={pl}+{pb}", "bar a")
ox.heading("Vaporiser")
ox.add("tsat", "Boiling point of oxygen at 1 atm", "t_sat", -183.0, "°C")
ox.add("tout", "Gas leaving the vaporiser, winter design", "t_out", 15, "°C")
ox.add("dT", "Warming of the gas", "ΔT", "={tout}-{tsat}", "K")
ox.add("hfg", "Latent heat of oxygen at 1 atm", "h_fg", 213, "kJ/kg")
ox.add("cpg", "Mean specific heat of oxygen gas", "c_p", 0.92, "kJ/(kg·K)")
ox.add("dh", "Heat to vaporise and warm one kg", "Δh", "={hfg}+{cpg}*{dT}", "kJ/kg")
ox.add("mpk", "Peak oxygen mass flow", "ṁ_pk", "={Qm3h}*{pf}*{rhog}", "kg/h")
ox.add("Qv", "Vaporiser duty at the peak", "Q_v", "={mpk}*{dh}/3600", "kW")
ox.add("Qv2", "Vaporiser duty at the peak (first draft)", "Q_v2", "={mpk}*{dh}", "kW",
       planted=("unit-scale", "kg/h × kJ/kg written as kW: the /3600 missing"))
ox.add("QvB", "Vaporiser duty, Btu/h", "Q_v,US", "={Qv}*3412", "Btu/h")
ox.add("rhoN", "Density of oxygen at 0 °C, 101.325 kPa", "ρ_N", 1.429, "kg/Nm³")
ox.add("VN", "Peak flow, Nm³/h", "V̇_N", "={mpk}/{rhoN}", "Nm³/h")
ox.add("VNr", "Vaporiser rating required (twice the peak, for icing)", "V̇_r", "={VN}*2",
       "Nm³/h")
ox.add("Pctl", "Standby electric vaporiser controls and trace heating", "P_ctl", 450, "W")
ox.add("Pe", "Standby electric vaporiser supply", "P_e", "={Qv}+{Pctl}/1000", "kW")
ox.add("Pe2", "Standby electric vaporiser supply (first draft)", "P_e2", "={Qv}+{Pctl}", "kW",
       planted=("unit-scale", "W added to kW"))
ox.heading("Main riser from the VIE compound")
ox.add("OD", "Outside diameter, copper 54 mm", "D_o", 54, "mm")
ox.add("wt", "Wall thickness", "t", 1.2, "mm")
ox.add("ID", "Bore", "D_i", "={OD}-2*{wt}", "mm")
ox.add("A", "Bore area", "A", "=PI()/4*({ID}/1000)^2", "m²")
ox.add("A2", "Bore area (first draft)", "A_2", "=PI()/4*{ID}^2", "m²",
       planted=("unit-scale", "a bore in mm squared into m²: 10⁶ too large"))
ox.add("TK", "Gas in the riser, absolute", "T", "={tout}+273.15", "K")
ox.add("tref", "Reference temperature of the demand litres", "t_ref", 21.1, "°C")
ox.add("TrefK", "Reference temperature, absolute", "T_ref", "={tref}+273.15", "K")
ox.add("Qact", "Peak flow at riser conditions", "Q_act",
       "={Qm3h}*{pf}*1.01325/{pla}*{TK}/{TrefK}", "m³/h")
ox.add("Qact2", "Peak flow at riser conditions (first draft)", "Q_act2",
       "={Qm3h}*{pf}*1.01325/{pla}*{tout}/{TrefK}", "m³/h",
       planted=("offset-scale", "a °C reading in a ratio of absolute temperatures"))
ox.add("v", "Gas velocity in the riser", "v", "={Qact}/3600/{A}", "m/s")
ox.add("v2", "Gas velocity in the riser (first draft)", "v_2", "={Qact}/60/{A}", "m/s",
       planted=("unit-scale", "per hour over 60 taken as per second: 60 where 3600 belongs"))
ox.add("vfps", "Gas velocity, ft/s", "v_US", "={v}*3.281", "ft/s")
ox.add("M", "Molar mass of oxygen", "M", 0.032, "kg/mol")
ox.add("R", "Molar gas constant", "R", 8.314, "J/(mol·K)")
ox.add("rhor", "Gas density in the riser, ideal gas", "ρ_r", "={pla}*100000*{M}/({R}*{TK})",
       "kg/m³")
OXYS = ox.finish()

_Q = ox.ref("Q")
ZONES = {
    "A1": "Larchmont Infirmary: oxygen design flows by department (invented counts, flows "
          "and diversities)",
    "A2": "Sources: design flow = units × flow per unit × diversity (HTM 02-01 (2006) Part A, "
          "method from memory; figures invented); 1 m³ = 1000 L, 1 h = 60 min (SI Brochure 9th "
          "ed.).",
    "A3": CAUTION,
    "A5": "Department", "B5": "Terminal units [-]", "C5": "Flow per unit [L/min]",
    "D5": "Diversity [%]", "E5": "Design flow [L/min]", "F5": "Design flow [m³/h]",
    "A10": "Total", "E10": "=SUM(E6:E9)", "F10": "=SUM(F6:F9)",
}
for r, (dep, n, q, dv) in enumerate([("Wards", 300, 10, 17), ("Critical care", 24, 10, 75),
                                      ("Theatres and recovery", 12, 40, 50),
                                      ("Emergency department", 30, 10, 40)], start=6):
    ZONES[f"A{r}"], ZONES[f"B{r}"], ZONES[f"C{r}"], ZONES[f"D{r}"] = dep, n, q, dv
    ZONES[f"E{r}"] = f"=B{r}*C{r}*D{r}/100"
    ZONES[f"F{r}"] = f"=E{r}*60/1000"
ZONES["F8"] = "=E8/60*1000"
ZONES_PLANTED = {"Zones!F8": ("unit-scale", "L/min to m³/h by /60 ×1000: both factors turned "
                                            "over")}

OXYB = {
    "trade": "medical gases: hospital oxygen from a VIE, vaporiser and main riser",
    "sheets": [("Oxygen", OXYS), ("Zones", ZONES)],
    "planted": {**ox.planted, **ZONES_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 4: road tunnel drainage and fire main (L/s per 100 m, m, L/s, m³/h, L/min, gpm, 1/h, m³,
# mm, kg/m³, kW, hp, ft, m/s, kPa, psi, in, %, bar(g), kPa(g), psig, W/m, W)
# --------------------------------------------------------------------------------------------
TUN_SRC = (
    "Sources: Hazen-Williams in SI h_f = 10.67·L·Q^1.852/(C^1.852·D^4.8704), h_f and L in m, "
    "Q in m³/s, D in m (common practice; e.g. D. A. Chin, Water-Resources Engineering, 3rd ed. "
    "(2013), from memory); in US units p = 4.52·Q^1.85/(C^1.85·d^4.87) psi per foot, Q in gpm, "
    "d in inches (NFPA 13 (2022), hydraulic calculations, from memory); C = 120 for cement-"
    "lined ductile iron (common practice); pump power P = ρ·g·Q·H/η and P = Q·Δp/η, g_n = "
    "9.80665 m/s² (SI Brochure 9th ed.); US checks hp = gpm·ft/(3960·η), hp = gpm·psi/(1714·η), "
    "psi = 0.433·ft of water (common practice); sump volume V = Q·T/4 with T = 3600/Z s for Z "
    "starts per hour (common practice, pump makers' guidance, from memory); 1 US gal = 3.785 "
    "L (1 L/s = 15.85 gpm), 1 m = 3.281 ft, 1 in = 25.4 mm, 1 psi = 6.895 kPa, 1 bar = 100 kPa "
    "(NIST SP 811 (2008) App. B.8, rounded); two hydrants at 1900 L/min each and 7 bar(g) "
    "residual (design basis invented for this demonstration; check the tunnel's fire "
    "engineering strategy and NFPA 502 or the local rules). Tunnel, inflow readings, pumps "
    "and pipes invented.")
tn = ItemSheet("Tunnel", "Hartside Gill road tunnel (invented): 2.4 km twin-portal bore, "
               "low-point sump, rising main and fire main, design case", TUN_SRC)
tn.heading("Inflow to the low-point sump")
tn.add("L", "Tunnel length", "L", 2400, "m")
tn.add("qg", "Groundwater inflow per 100 m of tunnel (probe-hole readings, invented)", "q_g",
       0.6, "L/s per 100 m")
tn.add("Qg", "Groundwater inflow", "Q_g", "={qg}*{L}/100", "L/s")
tn.add("nh", "Hydrants in use at once", "n_h", 2, "-")
tn.add("qh", "Flow per hydrant", "q_h", 1900, "L/min")
tn.add("Qh", "Hydrant demand", "Q_h", "={nh}*{qh}", "L/min")
tn.add("Qhgpm", "Hydrant demand, US gpm", "Q_h,US", "={Qh}/3.785", "gpm")
tn.add("Qhgpm2", "Hydrant demand, US gpm (first draft)", "Q_h,US2", "={Qh}*3.785", "gpm",
       planted=("unit-scale", "L/min to gpm multiplied by 3.785: wrong way round"))
tn.add("Qhs", "Hydrant demand, L/s", "Q_h,s", "={Qh}/60", "L/s")
tn.add("Qp", "Sump pump duty: groundwater plus fire water", "Q_p", "={Qg}+{Qhs}", "L/s")
tn.add("Qpm3h", "Sump pump duty, m³/h", "Q_p,h", "={Qp}*3.6", "m³/h")
tn.add("Qpm3h2", "Sump pump duty, m³/h (first draft)", "Q_p,h2", "={Qp}*3600", "m³/h",
       planted=("unit-scale", "L/s to m³/h by 3600: the /1000 from litres missing"))
tn.add("Z", "Pump starts per hour, maximum (motor maker)", "Z", 10, "1/h")
tn.add("Vs", "Sump working volume between start and stop", "V_s", "={Qp}/1000*3600/{Z}/4",
       "m³")
tn.heading("Rising main, sump to outfall (Hazen-Williams)")
tn.add("Drm", "Rising main bore", "D_mm", 250, "mm")
tn.add("D", "Rising main bore, m", "D", "={Drm}/1000", "m")
tn.add("Lrm", "Rising main length", "L_rm", 350, "m")
tn.add("C", "Hazen-Williams C, cement-lined ductile iron", "C", 120, "-")
tn.add("hf", "Friction loss in the rising main", "h_f",
       "=10.67*{Lrm}*({Qp}/1000)^1.852/({C}^1.852*{D}^4.8704)", "m")
tn.add("Hs", "Static lift, sump to outfall (invented)", "H_s", 18, "m")
tn.add("H", "Pump head", "H", "={Hs}+{hf}", "m")
tn.add("v", "Velocity in the rising main", "v", "={Qp}/1000/(PI()/4*{D}^2)", "m/s")
tn.add("v2", "Velocity in the rising main (first draft)", "v_2",
       "={Qp}/1000/(PI()/4*{Drm}^2)", "m/s",
       planted=("unit-scale", "a bore in mm used as metres: 10⁶ too small"))
tn.add("rho", "Density of water", "ρ", 1000, "kg/m³")
tn.add("eta", "Sump pump efficiency at duty", "η", 72, "%")
tn.add("P", "Sump pump shaft power", "P", "={rho}*9.81*{Qp}/1000*{H}/({eta}/100)/1000", "kW")
tn.add("P2", "Sump pump shaft power (first draft)", "P_2",
       "={rho}*{Qp}/1000*{H}/({eta}/100)/1000", "kW",
       planted=("result-unit", "ρ·Q·H/η with g left out"))
tn.add("Qpgpm", "Sump pump duty, US gpm", "Q_p,US", "={Qp}*15.85", "gpm")
tn.add("Hft", "Pump head, ft", "H_US", "={H}*3.281", "ft")
tn.add("Php", "Sump pump shaft power, hp (US check, gpm·ft/3960)", "P_US",
       "={Qpgpm}*{Hft}/(3960*{eta}/100)", "hp")
tn.heading("Fire main to the remote hydrant (Hazen-Williams)")
tn.add("Dfmm", "Fire main bore", "D_f,mm", 204, "mm")
tn.add("Dfm", "Fire main bore, m", "D_f", "={Dfmm}/1000", "m")
tn.add("Lfm", "Length to the hydraulically remote hydrant", "L_f", 1200, "m")
tn.add("hff", "Friction loss in the fire main", "h_ff",
       "=10.67*{Lfm}*({Qhs}/1000)^1.852/({C}^1.852*{Dfm}^4.8704)", "m")
tn.add("dpf", "Friction loss in the fire main, kPa", "Δp_f", "={rho}*9.81*{hff}/1000", "kPa")
tn.add("dpfpsi", "Friction loss in the fire main, psi", "Δp_f,US", "={dpf}/6.895", "psi")
tn.add("dpfpsi2", "Friction loss in the fire main, psi (first draft)", "Δp_f,US2",
       "={dpf}*6.895", "psi",
       planted=("unit-scale", "kPa to psi multiplied by 6.895: wrong way round"))
tn.add("din", "Fire main bore, in", "d", "={Dfmm}/25.4", "in")
tn.add("Lft", "Length to the remote hydrant, ft", "L_US", "={Lfm}*3.281", "ft")
tn.add("dpUS", "Friction loss in the fire main, psi (NFPA 13 form, check)", "Δp_f,NFPA",
       "=4.52*{Qhgpm}^1.85/({C}^1.85*{din}^4.87)*{Lft}", "psi")
tn.add("hfft", "Friction loss in the fire main, ft of water", "h_ff,US", "={hff}*3.281", "ft")
tn.add("dpft", "Friction loss in the fire main, psi (0.433 psi/ft check)", "Δp_f,ft",
       "={hfft}*0.433", "psi")
tn.add("gr", "Tunnel gradient, rising from the pump to the remote hydrant", "i", 2.5, "%")
tn.add("dz", "Rise to the remote hydrant", "Δz", "={Lfm}*{gr}/100", "m")
tn.add("dz2", "Rise to the remote hydrant (first draft)", "Δz_2", "={Lfm}*{gr}", "m",
       planted=("unit-scale", "a % used as a fraction: 100 too large"))
tn.add("pst", "Static pressure for the rise", "p_st", "={rho}*9.81*{dz}/1000", "kPa")
tn.add("pr", "Residual pressure at the remote hydrant", "p_r", 7.0, "bar(g)")
tn.add("prk", "Residual pressure at the remote hydrant, kPa(g)", "p_r,kPa", "={pr}*100",
       "kPa(g)")
tn.add("pd", "Fire pump discharge pressure", "p_d", "={prk}+{dpf}+{pst}", "kPa(g)")
tn.add("pd2", "Fire pump discharge pressure (first draft)", "p_d2", "={pr}+{dpf}+{pst}",
       "kPa(g)", planted=("unit-scale", "bar(g) added to kPa"))
tn.add("pdbar", "Fire pump discharge pressure, bar(g)", "p_d,bar", "={pd}/100", "bar(g)")
tn.add("pdpsig", "Fire pump discharge pressure, psig", "p_d,US", "={pd}/6.895", "psig")
tn.add("ps", "Fire pump suction pressure from the break tank", "p_s", 30, "kPa(g)")
tn.add("dpp", "Fire pump pressure rise", "Δp_p", "={pd}-{ps}", "kPa")
tn.add("etaf", "Fire pump efficiency at duty", "η_f", 70, "%")
tn.add("Pf", "Fire pump shaft power", "P_f", "={Qhs}/1000*{dpp}/({etaf}/100)", "kW")
tn.add("dppsi", "Fire pump pressure rise, psi", "Δp_p,US", "={dpp}/6.895", "psi")
tn.add("Pfhp", "Fire pump shaft power, hp (US check, gpm·psi/1714)", "P_f,US",
       "={Qhgpm}*{dppsi}/(1714*{etaf}/100)", "hp")
tn.heading("Frost protection at the portals")
tn.add("qt", "Trace heating rating", "q_t", 20, "W/m")
tn.add("Lt", "Fire main traced, both portal zones", "L_t", 300, "m")
tn.add("Pt", "Trace heating load", "P_t", "={qt}*{Lt}/1000", "kW")
tn.add("Pt2", "Trace heating load (first draft)", "P_t2", "={qt}*{Lt}", "kW",
       planted=("unit-scale", "W written as kW: 1000 too large"))
TUNS = tn.finish()

TUNB = {
    "trade": "civil: road tunnel drainage, sump pumps and fire main",
    "sheets": [("Tunnel", TUNS)],
    "planted": dict(tn.planted),
}

BOOKS = {"digester-chp-hobbs-marsh": DIGB, "crushing-plant-greyscar-edge": QRYB,
         "oxygen-vie-larchmont-infirmary": OXYB, "tunnel-drainage-hartside-gill": TUNB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()

# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.
