#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review66), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; pattern after
corpus/sheets/review64/make_books.py and review55.

Trades: a dairy's ammonia refrigeration load (milk cooling, cold store, ice bank, compressors,
evaporative condenser); a gold mine's process water balance (leach feed at % solids, thickener,
tailings storage evaporation, decant and slurry pumps); a natural gas city gate meter station
(actual to standard volume, heating value, energy, let-down heater); a primary school's solar
hot water and rooftop PV. All scenarios, sites, firms, readings and maker's data are invented
(demonstration only); the formulas and published factors are the trade's own, with their
sources named in a text cell at the top of each sheet ("from memory" where recalled and not
checked, "common practice" for a fact of the trade with no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and
its messages that mislead, are recorded in review_notes.py after running the round's build of the time.

Run: python3 make_books.py  ->  *.xlsx (and *.expect where absent) in this folder;
     python3 make_books.py --expect rewrites the .expect files from review_notes.py.
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
# Book 1: dairy ammonia refrigeration (kg/h, lb/h, kJ/(kg·K), Btu/(lb·°F), °C, °F, K, Δ°F, kW,
# W, Btu/h, TR, kW/TR, %, bar a, bar(g), psig, kJ/kg, kg/L, L/h, gpm, m³/d, h/d, kWh/d, $/kWh,
# $/d)
# --------------------------------------------------------------------------------------------
DRY_SRC = (
    "Sources: 1 TR (ton of refrigeration) = 12 000 Btu/h = 3.517 kW, 1 kW = 3412 Btu/h, 1 kg = "
    "2.205 lb, 1 bar = 14.50 psi, 1 US gal = 3.785 L (NIST SP 811 (2008) App. B.8); °F = 1.8·°C "
    "+ 32, K = °C + 273.15 (SI Brochure 9th ed.); sensible heat Q = ṁ·c_p·ΔT (common practice); "
    "US chilled water Btu/h = 500·gpm·ΔT(°F), 500 = 8.33 lb/gal × 60 min/h × 1 Btu/(lb·°F) "
    "(ASHRAE Handbook, HVAC Systems and Equipment, from memory); c_p of whole milk above freezing 3.93 kJ/(kg·K) = 0.939 Btu/(lb·°F) (ASHRAE Handbook, "
    "Refrigeration (2018), thermal properties of foods, from memory); Carnot COP = T_e/(T_c − "
    "T_e) in kelvins (Çengel & Boles, Thermodynamics, 9th ed., ch. 6); kW/TR = 3.517/COP "
    "(common practice); ammonia (R-717) saturation: 2.91 bar a at −10 °C, 13.5 bar a at 35 °C, "
    "h_g(−10 °C) = 1450 kJ/kg, h_f(35 °C) = 366 kJ/kg, IIR reference (ASHRAE Handbook, "
    "Fundamentals (2017), ch. 30, from memory); evaporative condenser: water evaporated = heat "
    "rejected / 2430 kJ/kg, blowdown = evaporation/(cycles − 1) (common practice). Dairy, plant, "
    "maker's data, tariff and readings invented.")
dy = ItemSheet("Load", "Brackenford Creamery (invented): ammonia plant for the milk chiller, "
               "cold store and ice bank, summer design day", DRY_SRC)
dy.heading("Milk cooling (plate chiller after the well-water pre-cooler)")
dy.add("mk", "Milk through the chiller", "ṁ_m", 9000, "kg/h")
dy.add("hrs", "Plant run hours at design load", "t_op", 20, "h/d")
dy.add("cp", "Specific heat of whole milk", "c_p", 3.93, "kJ/(kg·K)")
dy.add("ti", "Milk temperature at the chiller inlet", "t_i", 18, "°C")
dy.add("to", "Milk temperature at the chiller outlet", "t_o", 4, "°C")
dy.add("tiF", "Milk inlet temperature, °F (US plate maker)", "t_i,F", "={ti}*1.8+32", "°F")
dy.add("toF", "Milk outlet temperature, °F", "t_o,F", "={to}*1.8+32", "°F")
dy.add("dT", "Temperature drop of the milk", "ΔT", "={ti}-{to}", "K")
dy.add("dTF", "Temperature drop of the milk, US", "ΔT_F", "={dT}*1.8", "Δ°F")
dy.add("Qm", "Milk cooling load", "Q_m", "={mk}*{cp}*{dT}/3600", "kW")
dy.add("Qm2", "Milk cooling load (first draft)", "Q_m2", "={mk}*{cp}*{dT}", "kW",
       planted=("unit-scale", "kg/h × kJ/(kg·K) × K written as kW: the /3600 missing"))
dy.add("QmB", "Milk cooling load, Btu/h", "Q_m,B", "={Qm}*3412", "Btu/h")
dy.add("mklb", "Milk through the chiller, lb/h", "ṁ_m,US", "={mk}*2.205", "lb/h")
dy.add("cpUS", "Specific heat of whole milk, US", "c_p,US", 0.939, "Btu/(lb·°F)")
dy.add("QmUS", "Milk cooling load, Btu/h (US check, ṁ·c_p·ΔT)", "Q_m,US",
       "={mklb}*{cpUS}*{dTF}", "Btu/h")
dy.add("QmTR", "Milk cooling load, tons of refrigeration", "Q_m,TR", "={Qm}/3.517", "TR")
dy.add("QmTR2", "Milk cooling load, TR (first draft)", "Q_m,TR2", "={Qm}*3.517", "TR",
       planted=("unit-scale", "kW to TR multiplied by 3.517: wrong way round"))
dy.heading("Other loads on the -10 °C suction")
dy.add("Qcs", "Cold store and dispatch (room load calc, invented)", "Q_cs", 140, "kW")
dy.add("Qib", "Ice bank build for the CIP rinse chiller (US maker's rating)", "Q_ib", 35, "TR")
dy.add("Qibk", "Ice bank build, kW", "Q_ib,kW", "={Qib}*3.517", "kW")
dy.add("gcw", "Chilled water from the ice bank to the CIP rinse plate (US maker)", "V̇_cw",
       45, "gpm")
dy.add("dTcw", "Chilled water temperature rise across the rinse plate", "ΔT_cw", 12, "Δ°F")
dy.add("Qcw", "Ice bank melt duty at peak rinse (500·gpm·ΔT)", "Q_cw", "=500*{gcw}*{dTcw}",
       "Btu/h")
dy.add("QcwTR", "Ice bank melt duty at peak rinse, TR", "Q_cw,TR", "={Qcw}/12000", "TR")
dy.add("Pfan", "Evaporator fan motors (heat into the rooms)", "P_fan", 22000, "W")
dy.add("Qtot", "Refrigeration load", "Q_tot", "={Qm}+{Qcs}+{Qibk}+{Pfan}/1000", "kW")
dy.add("Qtot2", "Refrigeration load (first draft)", "Q_tot2", "={Qm}+{Qcs}+{Qibk}+{Pfan}", "kW",
       planted=("unit-scale", "fan W added to kW"))
dy.add("mg", "Design margin", "m", 10, "%")
dy.add("Qd", "Design refrigeration load", "Q_d", "={Qtot}*(1+{mg}/100)", "kW")
dy.add("Qd2", "Design refrigeration load (first draft)", "Q_d2", "={Qtot}*(1+{mg})", "kW",
       planted=("unit-scale", "a % margin used as a fraction: 1 + 10 for 1.10"))
dy.add("QdTR", "Design refrigeration load, TR", "Q_d,TR", "={Qd}/3.517", "TR")
dy.add("QdTRb", "Design refrigeration load, TR (check through Btu/h)", "Q_d,TR b",
       "={Qd}*3412/12000", "TR")
dy.heading("Cycle and compressors")
dy.add("te", "Evaporating temperature", "t_e", -10, "°C")
dy.add("tc", "Condensing temperature", "t_c", 35, "°C")
dy.add("TeK", "Evaporating temperature, absolute", "T_e", "={te}+273.15", "K")
dy.add("TcK", "Condensing temperature, absolute", "T_c", "={tc}+273.15", "K")
dy.add("lift", "Temperature lift", "ΔT_lift", "={tc}-{te}", "K")
dy.add("COPc", "Carnot COP", "COP_C", "={TeK}/({TcK}-{TeK})", "-")
dy.add("COPcb", "Carnot COP (check, over the lift)", "COP_C b", "={TeK}/{lift}", "-")
dy.add("COPc2", "Carnot COP (first draft)", "COP_C2", "={te}/({tc}-{te})", "-",
       planted=("offset-scale", "Carnot's ratio with a °C evaporating temperature"))
dy.add("etc", "Cycle efficiency against Carnot (compressor maker's selection)", "η_C", 62, "%")
dy.add("COP", "Plant COP", "COP", "={COPc}*{etc}/100", "-")
dy.add("kWTR", "Compressor power per ton of refrigeration", "P/Q", "=3.517/{COP}", "kW/TR")
dy.add("P", "Compressor absorbed power", "P", "={QdTR}*{kWTR}", "kW")
dy.add("P2", "Compressor absorbed power (first draft)", "P_2", "={Qd}*{kWTR}", "kW",
       planted=("unit-scale", "kW × kW/TR: the load in kW where TR belongs, 3.517 too large"))
dy.add("Pc", "Compressor absorbed power (check, load over COP)", "P_c", "={Qd}/{COP}", "kW")
dy.add("Qrej", "Condenser heat rejection", "Q_rej", "={Qd}+{P}", "kW")
dy.add("QrejB", "Condenser heat rejection, Btu/h (US condenser maker)", "Q_rej,B",
       "={Qrej}*3412", "Btu/h")
dy.heading("Ammonia")
dy.add("pe", "Saturation pressure at the evaporating temperature (tables)", "p_e", 2.91, "bar a")
dy.add("pc", "Saturation pressure at the condensing temperature (tables)", "p_c", 13.5, "bar a")
dy.add("pb", "Site barometer (invented)", "p_b", 1.01, "bar a")
dy.add("peg", "Suction pressure on the gauge", "p_e,g", "={pe}-{pb}", "bar(g)")
dy.add("pcg", "Discharge pressure on the gauge", "p_c,g", "={pc}-{pb}", "bar(g)")
dy.add("pcg2", "Discharge pressure on the gauge (first draft)", "p_c,g2", "={pc}", "bar(g)",
       planted=("offset-scale", "an absolute pressure set equal to a gauge reading"))
dy.add("pcab", "Discharge pressure, absolute, from the gauge (check, barometer typed)", "p_c b",
       "={pcg}+1.01", "bar a")
dy.add("pcpsig", "Discharge pressure, psig (US relief valve maker)", "p_c,US", "={pcg}*14.5",
       "psig")
dy.add("rp", "Compression ratio", "r_p", "={pc}/{pe}", "-")
dy.add("rp2", "Compression ratio (first draft)", "r_p2", "={pcg}/{peg}", "-",
       planted=("offset-scale", "a ratio of two gauge readings"))
dy.add("h1", "Enthalpy of saturated vapour at −10 °C", "h_1", 1450, "kJ/kg")
dy.add("h4", "Enthalpy of saturated liquid at 35 °C", "h_4", 366, "kJ/kg")
dy.add("mr", "Ammonia circulated", "ṁ_r", "={Qd}*3600/({h1}-{h4})", "kg/h")
dy.add("mrlb", "Ammonia circulated, lb/h", "ṁ_r,US", "={mr}*2.205", "lb/h")
dy.heading("Evaporative condenser water")
dy.add("hfg", "Latent heat of water near 30 °C", "h_fg", 2430, "kJ/kg")
dy.add("rhow", "Density of water at 30 °C", "ρ_w", 0.996, "kg/L")
dy.add("Ev", "Water evaporated", "ṁ_ev", "={Qrej}*3600/{hfg}", "kg/h")
dy.add("EvL", "Water evaporated, L/h", "V̇_ev", "={Ev}/{rhow}", "L/h")
dy.add("Evg", "Water evaporated, US gpm", "V̇_ev,US", "={EvL}/3.785/60", "gpm")
dy.add("cyc", "Cycles of concentration", "N_c", 4, "-")
dy.add("Bd", "Blowdown", "V̇_bd", "={EvL}/({cyc}-1)", "L/h")
dy.add("Mu", "Make-up water", "V̇_mu", "={EvL}+{Bd}", "L/h")
dy.add("Mud", "Make-up water per day", "V_mu", "={Mu}*{hrs}/1000", "m³/d")
dy.heading("Energy")
dy.add("Ed", "Compressor energy per day", "E_d", "={P}*{hrs}", "kWh/d")
dy.add("tar", "Electricity tariff (invented)", "c_e", 0.16, "$/kWh")
dy.add("Cd", "Compressor energy cost per day", "C_d", "={Ed}*{tar}", "$/d")
dy.add("Cd2", "Compressor energy cost per day (first draft)", "C_d2",
       "={P}*{hrs}*{tar}/1000", "$/d",
       planted=("unit-scale", "kWh priced as if the power were in W: 1000 too small"))
DRYS = dy.finish()

DRYB = {
    "trade": "refrigeration: dairy ammonia plant, milk chiller, cold store and ice bank",
    "sheets": [("Load", DRYS)],
    "planted": dict(dy.planted),
}

# --------------------------------------------------------------------------------------------
# Book 2: gold mine process water balance (t/h, %, SG, t/m³, kg/m³, m³/h, L/s, gpm, m³/d,
# ML/d, ha, mm/d, m³/t, m, ft, kW, hp, kPa, bar)
# --------------------------------------------------------------------------------------------
GLD_SRC = (
    "Sources: water's density 1.0 t/m³ in the balance (common practice for process water "
    "balances), 998 kg/m³ for pump power (common practice); 1 ha = 10 000 m², 1 m³/h = 4.403 "
    "US gpm, 1 m = 3.281 ft, 1 hp = 0.7457 kW, 1 bar = 100 kPa, 1 ML = 1000 m³ (NIST SP 811 "
    "(2008) App. B.8); water carried with dry solids at C_w % solids by mass = ore·(100 − "
    "C_w)/C_w, slurry density ρ_sl = 1/(C_w/(100·SG·ρ_w) + (100 − C_w)/(100·ρ_w)) (B. A. Wills "
    "and J. A. Finch, Wills' Mineral Processing Technology, 8th ed. (2016), ch. 3, from "
    "memory); open water evaporation = pan evaporation × pan coefficient 0.7 (common practice); "
    "runoff = rainfall × catchment × runoff coefficient (common practice); water locked in "
    "settled tailings = pore volume at the settled dry density, ore/ρ_d − ore/(SG·ρ_w) (common "
    "practice); pump power P = ρ·g·Q·H/η, g_n = 9.81 m/s² (SI Brochure 9th ed.), P[kW] = "
    "Q[m³/h]·H[m]/(367·η) and P[hp] = Q[gpm]·H[ft]/(3960·η) for water, Δp[psi] = "
    "0.433·SG·H[ft] and hydraulic hp = gpm·psi/1714 (I. J. Karassik et al., "
    "Pump Handbook, 4th ed. (2008), from memory). Mine, mill, tailings facility and readings "
    "invented.")
gd = ItemSheet("Water", "Yarrabin Gold, Cutter's Flat mill (invented): carbon-in-leach plant "
               "and tailings storage facility, process water balance, dry season", GLD_SRC)
gd.heading("Leach feed")
gd.add("ore", "Ore milled (dry)", "ṁ_s", 420, "t/h")
gd.add("Cw", "Solids in the leach feed, by mass", "C_w", 45, "%")
gd.add("SG", "Specific gravity of the ore solids", "SG", 2.75, "-")
gd.add("rhow", "Density of process water (balance)", "ρ_w", 1.0, "t/m³")
gd.add("Ww", "Water in the leach feed", "ṁ_w", "={ore}*(100-{Cw})/{Cw}", "t/h")
gd.add("Ww2", "Water in the leach feed (first draft)", "ṁ_w2", "={ore}*(1-{Cw})/{Cw}", "t/h",
       planted=("unit-scale", "a % solids used as a fraction in 1 − C_w"))
gd.add("Vw", "Water in the leach feed, m³/h", "V̇_w", "={Ww}/{rhow}", "m³/h")
gd.add("Vs", "Volume of the ore solids", "V̇_s", "={ore}/({SG}*{rhow})", "m³/h")
gd.add("rhosl", "Leach feed slurry density", "ρ_sl",
       "=1/({Cw}/100/({SG}*{rhow})+(100-{Cw})/100/{rhow})", "t/m³")
gd.add("rhoslk", "Leach feed slurry density, kg/m³", "ρ_sl,kg", "={rhosl}*1000", "kg/m³")
gd.add("Vsl", "Leach feed slurry flow", "V̇_sl", "=({ore}+{Ww})/{rhosl}", "m³/h")
gd.add("Vsls", "Leach feed slurry flow, L/s", "V̇_sl,Ls", "={Vsl}/3.6", "L/s")
gd.add("Vsls2", "Leach feed slurry flow, L/s (first draft)", "V̇_sl,Ls2", "={Vsl}*1000", "L/s",
       planted=("unit-scale", "m³/h to L/s by ×1000 alone: the /3600 missing"))
gd.add("Vslg", "Leach feed slurry flow, US gpm (US pump maker)", "V̇_sl,US", "={Vsl}*4.403",
       "gpm")
gd.heading("Tailings thickener")
gd.add("Cu", "Solids in the thickener underflow, by mass", "C_u", 58, "%")
gd.add("Wu", "Water to the tailings facility with the underflow", "ṁ_u",
       "={ore}*(100-{Cu})/{Cu}", "t/h")
gd.add("Wov", "Thickener overflow returned to the mill", "ṁ_ov", "={Ww}-{Wu}", "t/h")
gd.add("Wovm", "Thickener overflow returned, m³/h", "V̇_ov", "={Wov}/{rhow}", "m³/h")
gd.heading("Tailings storage facility")
gd.add("A", "Decant pond area", "A_p", 32, "ha")
gd.add("Ep", "Pan evaporation, dry season mean", "E_pan", 7.2, "mm/d")
gd.add("kp", "Pan coefficient for open water", "k_p", 0.7, "-")
gd.add("Ev", "Evaporation from the decant pond", "V_ev", "={Ep}*{kp}/1000*{A}*10000", "m³/d")
gd.add("Ev2", "Evaporation from the decant pond (first draft)", "V_ev2",
       "={Ep}*{kp}*{A}*10000", "m³/d",
       planted=("unit-scale", "mm/d taken as m/d: 1000 too large"))
gd.add("Evh", "Evaporation from the decant pond, m³/h", "V̇_ev", "={Ev}/24", "m³/h")
gd.add("EvLs", "Evaporation from the decant pond, L/s", "V̇_ev,Ls", "={Ev}/86.4", "L/s")
gd.add("EvML", "Evaporation from the decant pond, ML/d", "V_ev,ML", "={Ev}/1000", "ML/d")
gd.add("EvML2", "Evaporation from the decant pond, ML/d (licence return)", "V_ev,ML2",
       "={Ev}/1000000", "ML/d",
       planted=("unit-scale", "m³ to ML divided by 10⁶: 1000 too small"))
gd.add("rain", "Rainfall, dry season mean", "i", 2.1, "mm/d")
gd.add("Ac", "Catchment draining to the decant pond", "A_c", 140, "ha")
gd.add("Cr", "Runoff coefficient of the beach and embankments", "C_r", 0.5, "-")
gd.add("Rn", "Runoff to the decant pond", "V_r", "={rain}/1000*{Ac}*10000*{Cr}", "m³/d")
gd.add("Rn2", "Runoff to the decant pond (first draft)", "V_r2",
       "={rain}/1000*{Ac}*1000*{Cr}", "m³/d",
       planted=("unit-scale", "ha to m² by 1000: 10 times too small"))
gd.add("rhod", "Settled dry density of the tailings", "ρ_d", 1.45, "t/m³")
gd.add("Ven", "Water locked in the settled tailings voids", "V̇_en",
       "={ore}/{rhod}-{ore}/({SG}*{rhow})", "m³/h")
gd.add("seep", "Seepage through the floor (facility model, invented)", "V̇_sp", 18, "m³/h")
gd.add("Dec", "Decant water returned to the mill", "V̇_dec",
       "={Wu}/{rhow}-{Ven}-{seep}-{Evh}+{Rn}/24", "m³/h")
gd.add("Dec2", "Decant water returned to the mill (first draft)", "V̇_dec2",
       "={Wu}/{rhow}-{Ven}-{seep}-{Ev}+{Rn}/24", "m³/h",
       planted=("unit-scale", "the pond's evaporation in m³/d taken off flows in m³/h"))
gd.add("DecLs", "Decant water returned, L/s", "V̇_dec,Ls", "={Dec}/3.6", "L/s")
gd.heading("Raw water make-up")
gd.add("gl", "Gland seal, reagent and wash water (mill survey, invented)", "V̇_gl", 25, "m³/h")
gd.add("Mu", "Raw water make-up from the borefield", "V̇_mu", "={Vw}+{gl}-{Wovm}-{Dec}", "m³/h")
gd.add("MuLs", "Raw water make-up, L/s", "V̇_mu,Ls", "={Mu}/3.6", "L/s")
gd.add("MuLs2", "Raw water make-up, L/s (borefield licence form)", "V̇_mu,Ls2", "={Mu}*3.6",
       "L/s", planted=("unit-scale", "m³/h to L/s multiplied by 3.6: wrong way round"))
gd.add("Mud", "Raw water make-up per day", "V_mu", "={Mu}*24", "m³/d")
gd.add("MuML", "Raw water make-up per day, ML/d", "V_mu,ML", "={Mu}*24/1000", "ML/d")
gd.add("wi", "Raw water per tonne milled", "w", "={Mu}/{ore}", "m³/t")
gd.add("rec", "Share of the process water recycled", "r",
       "=({Wovm}+{Dec})/({Vw}+{gl})*100", "%")
gd.heading("Decant return pump (water)")
gd.add("H", "Total head, decant barge to the process water tank", "H", 62, "m")
gd.add("eta", "Pump efficiency at duty (maker's curve, invented)", "η", 74, "%")
gd.add("rhok", "Density of decant water", "ρ", 998, "kg/m³")
gd.add("Pp", "Decant pump power", "P", "={rhok}*9.81*{Dec}/3600*{H}/({eta}/100)/1000", "kW")
gd.add("Pp2", "Decant pump power (first draft)", "P_2",
       "={rhok}*{Dec}/3600*{H}/({eta}/100)/1000", "kW",
       planted=("result-unit", "ρ·Q·H/η with the g left out"))
gd.add("Pp367", "Decant pump power (check, Q·H/367η)", "P_c", "={Dec}*{H}/(367*{eta}/100)",
       "kW")
gd.add("Decg", "Decant flow, US gpm", "V̇_dec,US", "={Dec}*4.403", "gpm")
gd.add("Hft", "Total head, ft", "H_ft", "={H}*3.281", "ft")
gd.add("Php", "Decant pump power, hp (US check, Q·H/3960η)", "P_hp",
       "={Decg}*{Hft}/(3960*{eta}/100)", "hp")
gd.add("Php2", "Decant pump power, hp (first draft)", "P_hp2",
       "={Decg}*{Hft}/(3960*{eta}/100)*0.7457", "hp",
       planted=("unit-scale", "hp to kW factor written into a cell in hp: not needed"))
gd.add("Pkw", "Decant pump power from the US check, kW", "P_kW", "={Php}*0.7457", "kW")
gd.heading("Leach feed slurry pump")
gd.add("Hs", "Total head, slurry", "H_s", 28, "m")
gd.add("etas", "Slurry pump efficiency (with the solids derating)", "η_s", 65, "%")
gd.add("Ps", "Slurry pump power (ρ in t/m³ gives kW)", "P_s",
       "={rhosl}*9.81*{Vsl}/3600*{Hs}/({etas}/100)", "kW")
gd.add("Ps2", "Slurry pump power (first draft)", "P_s2",
       "={rhosl}*9.81*{Vsl}/3600*{Hs}/({etas}/100)/1000", "kW",
       planted=("unit-scale", "a /1000 for kg/m³ with ρ already in t/m³: 1000 too small"))
gd.add("dps", "Pressure rise across the slurry pump", "Δp_s", "={rhosl}*9.81*{Hs}", "kPa")
gd.add("dpsb", "Pressure rise across the slurry pump, bar", "Δp_s,bar", "={dps}/100", "bar")
gd.add("SGsl", "Slurry specific gravity", "SG_sl", "={rhosl}/{rhow}", "-")
gd.add("Hsft", "Total head, slurry, ft", "H_s,ft", "={Hs}*3.281", "ft")
gd.add("dpsi", "Pressure rise across the slurry pump, psi (US check, 0.433·SG·H)", "Δp_s,US",
       "=0.433*{SGsl}*{Hsft}", "psi")
gd.add("hhp", "Slurry hydraulic power, hp (US check, gpm·psi/1714)", "P_h,US",
       "={Vslg}*{dpsi}/1714", "hp")
GLDS = gd.finish()

GLDB = {
    "trade": "mining: gold mill process water balance, tailings facility and pumps",
    "sheets": [("Water", GLDS)],
    "planted": dict(gd.planted),
}

# --------------------------------------------------------------------------------------------
# Book 3: natural gas meter station (m³/h, Sm³/h, Nm³/h, Sm³/d, scf/h, MMscf/d, barg, bar a,
# psig, psia, °C, °F, K, °R, MJ/Sm³, Btu/scf, GJ/d, MMBtu/d, MW, kg/Sm³, kg/h, kJ/(kg·K), kW,
# W, mm, m², m/s, ft/s, K/bar, mg/Sm³, kg/d)
# --------------------------------------------------------------------------------------------
GAS_SRC = (
    "Sources: Sm³ at 15 °C and 101.325 kPa, Nm³ at 0 °C and 101.325 kPa (ISO 13443:1996); scf "
    "at 60 °F and 14.696 psia (common practice; the invented contract's base); volume at base "
    "conditions Q_b = Q_f·(p_f/p_b)·(T_b/T_f)·(Z_b/Z_f), absolute pressures and temperatures "
    "(AGA Report No. 7 (2006), from memory); Z from AGA 8 by the station's flow computer "
    "(invented readings); 1 bar = 14.50 psi, 1 m³ = 35.31 ft³, 1 MJ = 947.8 Btu, 1 GJ = 0.9478 "
    "MMBtu, 1 m = 3.281 ft (NIST SP 811 (2008) App. B.8); °F = 1.8·°C + 32, K = °C + 273.15, "
    "°R = °F + 459.67 (SI Brochure 9th ed.; NIST SP 811); 1 Sm³ ≈ 35.31 scf when the 1 °F "
    "between 15 °C and 60 °F is let go (common practice, 0.19 %); Wobbe index = GCV/√d (ISO "
    "6976:2016, from memory); Joule-Thomson cooling of natural gas about 0.5 K per bar let down "
    "(GPSA Engineering Data Book, 12th ed., from memory); c_p of natural gas near 40 bar 2.3 "
    "kJ/(kg·K) (from memory); odorant (THT) dose 16 mg/Sm³ (common practice, from memory). "
    "Station, gas quality and readings invented.")
gs = ItemSheet("Station", "Harrow Moss city gate meter station (invented): turbine meter run "
               "B, regulators and water bath heater, winter design hour", GAS_SRC)
gs.heading("Line conditions at the turbine meter")
gs.add("Qf", "Metered flow at line conditions", "Q_f", 2150, "m³/h")
gs.add("pfg", "Meter pressure (gauge)", "p_f,g", 38.0, "barg")
gs.add("pb", "Site barometer (station at 60 m, invented)", "p_b", 1.006, "bar a")
gs.add("pf", "Meter pressure, absolute", "p_f", "={pfg}+{pb}", "bar a")
gs.add("pfb", "Meter pressure, absolute (flow computer's fixed barometer typed in)", "p_f b",
       "={pfg}+1.006", "bar a")
gs.add("pfpsig", "Meter pressure, psig (US flow computer)", "p_f,US", "={pfg}*14.5", "psig")
gs.add("pbpsia", "Site barometer, psia", "p_b,US", "={pb}*14.5", "psia")
gs.add("pfpsia", "Meter pressure, psia", "p_f,psia", "={pfpsig}+{pbpsia}", "psia")
gs.add("pfpsiab", "Meter pressure, psia (check from bar a)", "p_f,psia b", "={pf}*14.5", "psia")
gs.add("pfpsia2", "Meter pressure, psia (first draft)", "p_f,psia2", "={pfg}*14.5", "psia",
       planted=("offset-scale", "a gauge reading converted into psia: the barometer left out"))
gs.add("tf", "Meter temperature", "t_f", 9, "°C")
gs.add("Tf", "Meter temperature, absolute", "T_f", "={tf}+273.15", "K")
gs.add("tfF", "Meter temperature, °F", "t_f,F", "={tf}*1.8+32", "°F")
gs.add("TfR", "Meter temperature, °R", "T_f,R", "={tfF}+459.67", "°R")
gs.add("TfRb", "Meter temperature, °R (check from K)", "T_f,R b", "={Tf}*1.8", "°R")
gs.add("Zf", "Compressibility at the meter (AGA 8, flow computer)", "Z_f", 0.925, "-")
gs.add("Zb", "Compressibility at base conditions", "Z_b", 0.9978, "-")
gs.add("ps", "Base pressure", "p_s", 1.01325, "bar a")
gs.add("Ts", "Base temperature (15 °C)", "T_s", 288.15, "K")
gs.heading("Volume at base conditions")
gs.add("Qs", "Flow at base conditions", "Q_s", "={Qf}*({pf}/{ps})*({Ts}/{Tf})*({Zb}/{Zf})",
       "Sm³/h")
gs.add("Qs2", "Flow at base conditions (first draft)", "Q_s2",
       "={Qf}*({pfg}/{ps})*({Ts}/{Tf})*({Zb}/{Zf})", "Sm³/h",
       planted=("offset-scale", "a gauge pressure in the gas law"))
gs.add("CF", "Volume conversion factor", "C", "={Qs}/{Qf}", "-")
gs.add("Qn", "Flow at normal conditions (0 °C)", "Q_n", "={Qs}*273.15/288.15", "Nm³/h")
gs.add("Qn2", "Flow at normal conditions (first draft)", "Q_n2", "={Qs}*288.15/273.15",
       "Nm³/h", planted=("unit-scale", "Sm³ to Nm³ with the reference temperatures' ratio "
                                       "turned over"))
gs.add("Qsd", "Flow per day at base conditions", "Q_s,d", "={Qs}*24", "Sm³/d")
gs.add("Qscf", "Flow at the contract base (60 °F)", "Q_scf", "={Qs}*35.31*519.67/518.67",
       "scf/h")
gs.add("MMd", "Flow, MMscf/d", "Q_MM", "={Qscf}*24/1000000", "MMscf/d")
gs.add("MMd2", "Flow, MMscf/d (first draft)", "Q_MM2", "={Qscf}/1000000", "MMscf/d",
       planted=("unit-scale", "an hourly flow written per day: the ×24 missing"))
gs.add("MMdb", "Flow, MMscf/d (quick check, 1 Sm³ ≈ 35.31 scf)", "Q_MM b",
       "={Qsd}*35.31/1000000", "MMscf/d")
gs.heading("Heating value and energy")
gs.add("HV", "Gross heating value (chromatograph)", "H_s", 39.2, "MJ/Sm³")
gs.add("d", "Relative density (air = 1)", "d", 0.60, "-")
gs.add("WI", "Wobbe index", "W_s", "={HV}/SQRT({d})", "MJ/Sm³")
gs.add("HVB", "Gross heating value, Btu/scf (contract base)", "H_s,US",
       "={HV}*947.8/35.31*518.67/519.67", "Btu/scf")
gs.add("HVB2", "Gross heating value, Btu/scf (first draft)", "H_s,US2", "={HV}*947.8*35.31",
       "Btu/scf", planted=("unit-scale", "per m³ to per ft³ multiplied by 35.31: wrong way "
                                         "round"))
gs.add("GJd", "Energy delivered per day", "E_d", "={Qsd}*{HV}/1000", "GJ/d")
gs.add("GJd2", "Energy delivered per day (first draft)", "E_d2", "={Qn}*24*{HV}/1000", "GJ/d",
       planted=("unit-scale", "a normal (0 °C) volume times a heating value per standard "
                              "(15 °C) m³: 5.2 % low"))
gs.add("MMBd", "Energy delivered per day, MMBtu/d", "E_d,US", "={GJd}*0.9478", "MMBtu/d")
gs.add("MMBdb", "Energy delivered per day, MMBtu/d (check, MMscf/d × Btu/scf)", "E_d,US b",
       "={MMd}*{HVB}", "MMBtu/d")
gs.add("Pw", "Energy flow rate", "Φ", "={GJd}/86.4", "MW")
gs.heading("Meter run velocity")
gs.add("Dmm", "Meter run bore (NPS 8, Sch 40)", "D", 202.7, "mm")
gs.add("A", "Bore area", "A", "=PI()*({Dmm}/1000)^2/4", "m²")
gs.add("v", "Gas velocity in the meter run", "v", "={Qf}/3600/{A}", "m/s")
gs.add("v2", "Gas velocity in the meter run (first draft)", "v_2",
       "={Qf}/3600/(PI()*{Dmm}^2/4)", "m/s",
       planted=("unit-scale", "the bore in mm squared where m belongs: 10⁶ too small"))
gs.add("vft", "Gas velocity in the meter run, ft/s", "v_US", "={v}*3.281", "ft/s")
gs.heading("Let-down and water bath heater")
gs.add("pog", "Outlet pressure to the city main (gauge)", "p_o,g", 7.0, "barg")
gs.add("pogp", "Outlet pressure, psig", "p_o,US", "={pog}*14.5", "psig")
gs.add("pogp2", "Outlet pressure, psig (first draft)", "p_o,US2", "={pog}*14.7", "psig",
       planted=("unit-scale", "bar to psi by 14.7, the atmosphere's psi: 14.50 per bar belongs"))
gs.add("dpl", "Pressure let down at the regulators", "Δp", "={pfg}-{pog}", "bar")
gs.add("JT", "Joule-Thomson cooling", "μ_JT", 0.5, "K/bar")
gs.add("dTj", "Temperature drop across the regulators", "ΔT_JT", "={JT}*{dpl}", "K")
gs.add("to", "Outlet temperature without preheat", "t_o", "={tf}-{dTj}", "°C")
gs.add("tmin", "Lowest outlet temperature allowed (invented)", "t_min", 5, "°C")
gs.add("dTh", "Preheat needed (temperature rise)", "ΔT_h", "={tmin}-{to}", "K")
gs.add("rhos", "Gas density at base conditions", "ρ_s", 0.735, "kg/Sm³")
gs.add("mg", "Gas mass flow", "ṁ", "={Qs}*{rhos}", "kg/h")
gs.add("cpg", "Specific heat of the gas at line pressure", "c_p", 2.3, "kJ/(kg·K)")
gs.add("Qh", "Heater duty to the gas", "Q_h", "={mg}*{cpg}*{dTh}/3600", "kW")
gs.add("Ql", "Water bath shell and stack standing loss (maker, invented)", "Q_l", 1800, "W")
gs.add("Qht", "Heater duty with the standing loss", "Q_ht", "={Qh}+{Ql}/1000", "kW")
gs.add("Qht2", "Heater duty with the standing loss (first draft)", "Q_ht2", "={Qh}+{Ql}", "kW",
       planted=("unit-scale", "W added to kW"))
gs.add("dose", "Odorant (THT) dose", "c_o", 16, "mg/Sm³")
gs.add("od", "Odorant injected", "ṁ_o", "={Qs}*{dose}/1000000", "kg/h")
gs.add("odd", "Odorant injected per day", "m_o", "={od}*24", "kg/d")
GASS = gs.finish()

_Ts, _ps, _pb, _Zb, _Zf = (gs.ref(k) for k in ("Ts", "ps", "pb", "Zb", "Zf"))
HOURS = {
    "A1": "Harrow Moss meter run B: flow computer log, design day (invented readings), "
          "converted to base conditions",
    "A2": "Sources: Q_b = Q_f·(p_f/p_b)·(T_b/T_f)·(Z_b/Z_f), absolute values (AGA Report No. 7 "
          "(2006), from memory); Sm³ at 15 °C and 101.325 kPa (ISO 13443:1996); K = °C + 273.15 "
          "(SI Brochure 9th ed.); Z_f held at the Station sheet's value (a simplification, "
          "invented).",
    "A3": CAUTION,
    "A5": "Hour", "B5": "Q_f [m³/h]", "C5": "p_f [barg]", "D5": "t_f [°C]",
    "E5": "Q_s [Sm³/h]",
}
for r, (hr, q, p, t) in enumerate([("06:00", 1980, 38.4, 8.2), ("07:00", 2150, 38.0, 9.0),
                                   ("08:00", 2210, 37.8, 9.4), ("09:00", 2090, 38.1, 9.9)],
                                  start=6):
    HOURS[f"A{r}"], HOURS[f"B{r}"], HOURS[f"C{r}"], HOURS[f"D{r}"] = hr, q, p, t
    HOURS[f"E{r}"] = (f"=B{r}*((C{r}+{_pb})/{_ps})*({_Ts}/(D{r}+273.15))*({_Zb}/{_Zf})")
HOURS["E8"] = f"=B8*((C8+{_pb})/{_ps})*({_Ts}/D8)*({_Zb}/{_Zf})"
HOURS["A11"] = "Mean of the four hours"
HOURS["E11"] = "=AVERAGE(E6:E9)"
HOURS_PLANTED = {"Hours!E8": ("offset-scale", "a °C reading in the gas law where the kelvin "
                                               "belongs")}

GASB = {
    "trade": "gas distribution: city gate meter station, base volume, energy and preheat",
    "sheets": [("Station", GASS), ("Hours", HOURS)],
    "planted": {**gs.planted, **HOURS_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 4: school solar hot water and PV (kWh/(m²·d), m², ft², %, kWh/d, MJ/d, Btu/d, L, US gal,
# kg/L, kg, kJ/(kg·K), K, Δ°F, °C, °F, Btu, L/d, US gal/d, d/yr, $/kWh, $/yr, kWp, kW/m², h/d,
# kWh/yr, MWh/yr, W, W/m², %/K, kW, $, yr, kg/kWh, t/yr)
# --------------------------------------------------------------------------------------------
SCH_SRC = (
    "Sources: 1 m² = 10.76 ft², 1 US gal = 3.785 L, 1 imperial gal = 4.546 L, 1 kWh = 3.6 MJ = 3412 Btu (NIST SP 811 "
    "(2008) App. B.8); °F = 1.8·°C + 32 (SI Brochure 9th ed.); heat Q = m·c_p·ΔT, c_p of water "
    "4.18 kJ/(kg·K), 1 kWh = 3600 kJ (common practice); US heat of water Btu = 8.34 lb/US gal × "
    "gal × Δ°F (common practice); collector daily yield = H·A·η̄ with a daily mean system "
    "efficiency (J. A. Duffie and W. A. Beckman, Solar Engineering of Thermal Processes, 4th "
    "ed. (2013), from memory; η̄ invented); PV yield E = P_STC·(H/G_STC)·PR·days, G_STC = 1 "
    "kW/m² (IEC 61724-1:2017, performance ratio, from memory); cell temperature T_c = T_a + "
    "(NOCT − 20 °C)·G/(800 W/m²) (Duffie and Beckman, from memory); power temperature "
    "coefficient −0.35 %/K (maker's data sheet, invented); grid emission factor 0.207 kg/kWh "
    "(invented, of the order of a national figure). kWp, the array's DC power at STC, is "
    "declared in the sidecar as 1 kW. School, roof, tariffs and readings invented.")
sc = ItemSheet("Solar", "Whinmoor Lane Primary School (invented): solar hot water for the "
               "kitchen and a rooftop PV array, annual mean", SCH_SRC)
sc.heading("Solar hot water collectors")
sc.add("H", "Irradiation on the collector plane, annual daily mean", "H", 3.6, "kWh/(m²·d)")
sc.add("nc", "Collectors", "n_c", 5, "-")
sc.add("Ac", "Aperture area per collector (maker)", "A_c", 2.0, "m²")
sc.add("A", "Collector aperture area", "A", "={nc}*{Ac}", "m²")
sc.add("Aft", "Collector aperture area, ft² (US grant form)", "A_US", "={A}*10.76", "ft²")
sc.add("Aft2", "Collector aperture area, ft² (first draft)", "A_US2", "={A}*3.281", "ft²",
       planted=("unit-scale", "m² to ft² by the length factor 3.281: 10.76 belongs"))
sc.add("eta", "Daily mean system efficiency (invented)", "η̄", 48, "%")
sc.add("Qs", "Solar heat delivered", "Q_s", "={H}*{A}*{eta}/100", "kWh/d")
sc.add("Qs2", "Solar heat delivered (first draft)", "Q_s2", "={H}*{A}*{eta}", "kWh/d",
       planted=("unit-scale", "a % efficiency used as a fraction: 100 too large"))
sc.add("QsMJ", "Solar heat delivered, MJ/d", "Q_s,MJ", "={Qs}*3.6", "MJ/d")
sc.add("QsB", "Solar heat delivered, Btu/d", "Q_s,US", "={Qs}*3412", "Btu/d")
sc.heading("Solar store")
sc.add("Vt", "Solar store volume", "V_t", 750, "L")
sc.add("Vtg", "Solar store volume, US gal", "V_t,US", "={Vt}/3.785", "US gal")
sc.add("Vtg2", "Solar store volume, US gal (UK maker's sheet)", "V_t,US2", "={Vt}/4.546",
       "US gal", planted=("unit-scale", "the imperial gallon's 4.546 L where the US gallon's "
                                        "3.785 L belongs"))
sc.add("rho", "Density of water", "ρ", 0.999, "kg/L")
sc.add("cp", "Specific heat of water", "c_p", 4.18, "kJ/(kg·K)")
sc.add("mt", "Water in the store", "m_t", "={Vt}*{rho}", "kg")
sc.add("dT", "Temperature rise of the store over a mean day", "ΔT",
       "={Qs}*3600/({mt}*{cp})", "K")
sc.add("td", "Collection period", "t_d", 1, "d")
sc.add("Qday", "Solar heat delivered on a mean day", "Q_day", "={Qs}*{td}", "kWh")
sc.add("dTb", "Temperature rise of the store, from the day's heat", "ΔT_b",
       "={Qday}*3600/({mt}*{cp})", "K")
sc.add("dT2", "Temperature rise of the store (first draft)", "ΔT_2", "={Qday}/({mt}*{cp})", "K",
       planted=("unit-scale", "kWh over kJ/K: the 3600 kJ/kWh missing"))
sc.add("tc", "Cold feed temperature", "t_c", 10, "°C")
sc.add("tt", "Store temperature at the end of a mean day", "t_t", "={tc}+{dTb}", "°C")
sc.add("ttF", "Store temperature, °F", "t_t,F", "={tt}*1.8+32", "°F")
sc.add("dTF", "Temperature rise of the store, US", "ΔT_F", "={dTb}*1.8", "Δ°F")
sc.add("dTF2", "Temperature rise of the store, US (first draft)", "ΔT_F2", "={dTb}*1.8+32",
       "Δ°F", planted=("offset-scale", "a temperature rise converted with the +32 of a "
                                       "reading"))
sc.add("QtB", "Heat taken up by the store, Btu (US check, 8.34·gal·Δ°F)", "Q_t,US",
       "=8.34*{Vtg}*{dTF}", "Btu")
sc.heading("Hot water demand")
sc.add("Vd", "Hot water used (kitchen and washrooms, metered, invented)", "V_d", 1200, "L/d")
sc.add("th", "Hot water supply temperature", "t_h", 60, "°C")
sc.add("Qd", "Heat in the hot water used", "Q_d", "={Vd}*{rho}*{cp}*({th}-{tc})/3600", "kWh/d")
sc.add("Vdg", "Hot water used, US gal/d", "V_d,US", "={Vd}/3.785", "US gal/d")
sc.add("tcF", "Cold feed temperature, °F", "t_c,F", "={tc}*1.8+32", "°F")
sc.add("thF", "Hot water supply temperature, °F", "t_h,F", "={th}*1.8+32", "°F")
sc.add("QdB", "Heat in the hot water used, Btu/d (US check)", "Q_d,US",
       "=8.34*{Vdg}*({thF}-{tcF})", "Btu/d")
sc.add("Qdk", "Heat in the hot water used, kWh/d (from the US check)", "Q_d,k", "={QdB}/3412",
       "kWh/d")
sc.add("sf", "Solar fraction", "f", "={Qs}/{Qd}*100", "%")
sc.add("days", "Days the kitchen runs", "N", 190, "d/yr")
sc.add("te", "Electricity import tariff (invented)", "c_i", 0.21, "$/kWh")
sc.add("Sav", "Saving on the kitchen immersion heaters", "S_th", "={Qs}*{days}*{te}", "$/yr")
sc.heading("Rooftop PV")
sc.add("Ppv", "Array rating at STC", "P_STC", 30, "kWp")
sc.add("Hpv", "Irradiation on the array plane, annual daily mean", "H_pv", 2.9, "kWh/(m²·d)")
sc.add("G", "Irradiance at STC", "G_STC", 1, "kW/m²")
sc.add("PSH", "Peak sun hours", "PSH", "={Hpv}/{G}", "h/d")
sc.add("PR", "Performance ratio", "PR", 80, "%")
sc.add("Epv", "PV energy per year", "E_pv", "={Ppv}*{PSH}*365*{PR}/100", "kWh/yr")
sc.add("Epv2", "PV energy per year (first draft)", "E_pv2", "={Ppv}*{PSH}*365*{PR}", "kWh/yr",
       planted=("unit-scale", "a % performance ratio used as a fraction"))
sc.add("EpvM", "PV energy per year, MWh", "E_pv,M", "={Epv}/1000", "MWh/yr")
sc.add("Ysp", "Specific yield", "Y", "={Epv}/{Ppv}", "kWh/kWp")
sc.add("Wm", "Module rating (maker)", "P_m", 410, "W")
sc.add("nm", "Modules", "n_m", "=ROUNDUP({Ppv}*1000/{Wm},0)", "-")
sc.add("nm2", "Modules (first draft)", "n_m2", "=ROUNDUP({Ppv}/{Wm},0)", "-",
       planted=("unit-scale", "kWp over W: 1000 too small"))
sc.add("Am", "Module area (maker)", "A_m", 1.95, "m²")
sc.add("Apv", "Array area", "A_pv", "={nm}*{Am}", "m²")
sc.add("Apvft", "Array area, ft²", "A_pv,US", "={Apv}*10.76", "ft²")
sc.add("etm", "Array efficiency at STC", "η_m", "={Ppv}/({Apv}*{G})*100", "%")
sc.add("Inv", "Inverter AC rating", "P_AC", 25, "kW")
sc.add("dcac", "DC to AC ratio", "r_DC/AC", "={Ppv}/{Inv}", "-")
sc.heading("Hot afternoon (array temperature)")
sc.add("ta", "Ambient temperature", "t_a", 28, "°C")
sc.add("NOCT", "Nominal operating cell temperature (maker)", "NOCT", 45, "°C")
sc.add("Gw", "Irradiance on the array", "G_a", 850, "W/m²")
sc.add("tcell", "Cell temperature", "t_cell", "={ta}+({NOCT}-20)*{Gw}/800", "°C")
sc.add("Gk", "Irradiance on the array, kW/m² (monitoring export)", "G_a,k", 0.85, "kW/m²")
sc.add("tcell2", "Cell temperature (from the monitoring export)", "t_cell2",
       "={ta}+({NOCT}-20)*{Gk}/800", "°C",
       planted=("unit-scale", "kW/m² over the 800 W/m² of NOCT: 1000 too small"))
sc.add("gam", "Power temperature coefficient (maker)", "γ", -0.35, "%/K")
sc.add("Pdc", "Array DC power at that cell temperature", "P_dc",
       "={Ppv}*{Gw}/({G}*1000)*(1+{gam}/100*({tcell}-25))", "kW")
sc.heading("Savings")
sc.add("scn", "Share of the PV energy used on site", "s", 75, "%")
sc.add("tx", "Export tariff (invented)", "c_x", 0.05, "$/kWh")
sc.add("SavPV", "Saving from the PV", "S_pv",
       "={Epv}*{scn}/100*{te}+{Epv}*(1-{scn}/100)*{tx}", "$/yr")
sc.add("cost", "Installed cost, both systems (tender, invented)", "C", 41000, "$")
sc.add("pb", "Simple payback", "t_pb", "={cost}/({SavPV}+{Sav})", "yr")
sc.add("ef", "Grid emission factor", "e", 0.207, "kg/kWh")
sc.add("co2", "Carbon dioxide avoided", "m_CO2", "=({Epv}+{Qs}*{days})*{ef}/1000", "t/yr")
sc.add("co22", "Carbon dioxide avoided (first draft)", "m_CO2 2", "=({Epv}+{Qs}*{days})*{ef}",
       "t/yr", planted=("unit-scale", "kg written as t: 1000 too large"))
SCHS = sc.finish()

_Ppv, _G, _PR = sc.ref("Ppv"), sc.ref("G"), sc.ref("PR")
QTRS = {
    "A1": "Whinmoor Lane PV: energy by quarter (irradiation on the array plane, invented)",
    "A2": "Sources: E = P_STC·(H/G_STC)·PR·days (IEC 61724-1:2017, from memory).",
    "A3": CAUTION,
    "A5": "Quarter", "B5": "Days [d]", "C5": "H [kWh/(m²·d)]", "D5": "E [kWh]",
}
for r, (q, n, h) in enumerate([("Jan-Mar", 90, 1.6), ("Apr-Jun", 91, 4.5),
                               ("Jul-Sep", 92, 4.0), ("Oct-Dec", 92, 1.5)], start=6):
    QTRS[f"A{r}"], QTRS[f"B{r}"], QTRS[f"C{r}"] = q, n, h
    QTRS[f"D{r}"] = f"=B{r}*C{r}*{_Ppv}/{_G}*{_PR}/100"
QTRS["D8"] = f"=C8*{_Ppv}/{_G}*{_PR}/100"
QTRS["A10"] = "Year"
QTRS["D10"] = "=SUM(D6:D9)"
QTRS_PLANTED = {"Quarters!D8": ("unit-scale", "a quarter's energy with the days left out: "
                                               "kWh/d written as kWh")}

SCH_SIDECAR = (
    "# Units of the Whinmoor Lane workbook that plumb's table lacks (invented scenario).\n"
    "# kWp, the array's DC power at standard test conditions (IEC 61215, from memory).\n"
    "# A dimensionally consistent formula can still be wrong; this check does not replace "
    "independent review under local codes and licensed practice.\n"
    "measure kWp = 1 kW \"kilowatt peak, DC at STC\"\n")

SCHB = {
    "trade": "building services: school solar hot water and rooftop PV",
    "sheets": [("Solar", SCHS), ("Quarters", QTRS)],
    "planted": {**sc.planted, **QTRS_PLANTED},
    "sidecar": SCH_SIDECAR,
}

BOOKS = {"ammonia-brackenford-creamery": DRYB, "water-balance-cutters-flat": GLDB,
         "meter-station-harrow-moss": GASB, "solar-whinmoor-lane-school": SCHB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()

# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.
