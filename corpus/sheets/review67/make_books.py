#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review67), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; the layout
follows corpus/sheets/review64/make_books.py and review55.

Trades: a winery's fermentation cellar (fermentation heat from sugar, glycol jacket cooling,
CO2 release and cellar ventilation); an animal-by-products rendering plant (batch cooker
steam, vapour condenser, cooling tower, odour scrubber); an organic Rankine cycle unit on a
biogas engine's jacket water and exhaust; a bascule bridge's leaf drive (counterweight,
imbalance, wind on the raised leaf, torque, speed and motor power). All scenarios, sites,
firms, readings and maker's data are invented (demonstration only); the formulas and published
factors are the trade's own, with their sources named in a text cell at the top of each sheet
("from memory" where recalled and not checked, "common practice" for a fact of the trade with
no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and
its messages that mislead, are recorded in review_notes.py after running the round's build of the time.

Run: python3 make_books.py [--expect]  ->  *.xlsx and *.expect in this folder (nothing
written elsewhere).
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
# Book 1: winery fermentation cellar (L, %, kg/L, g/L, g/(L·d), kg/d, kJ/kg, kW, TR, Btu/h,
# kJ/(kg·K), K/h, K/d, °C, °F, K, Δ°F, L/min, gpm, W/(m²·K), m², W, g/mol, kg/kg, kg/h, kPa,
# J/(mol·K), kg/m³, m³/h, ppm, cfm, m³, 1/h, Pa)
# --------------------------------------------------------------------------------------------
WIN_SRC = (
    "Sources: heat of alcoholic fermentation about 23.5 kcal per mol of hexose, so about 545 kJ "
    "per kg of sugar fermented (R. B. Boulton, V. L. Singleton, L. F. Bisson and R. E. Kunkee, "
    "Principles and Practices of Winemaking (1996), ch. 4, from memory); specific heat of must "
    "3.7 kJ/(kg·K) and must density 1.101 kg/L at 24 °Brix (from memory); sugar in the must "
    "≈ °Brix/100 × density (common practice, approximate: Brix counts all dissolved solids); "
    "stoichiometry C6H12O6 → 2 C2H5OH + 2 CO2, M(CO2) = 44.01 g/mol, M(hexose) = 180.16 g/mol "
    "(IUPAC standard atomic weights, from memory); molar gas constant R = 8.314 J/(mol·K) "
    "(CODATA 2018), ρ = p·M/(R·T); CO2 workplace exposure limit 5000 ppm, 8 h TWA (HSE EH40/2005, "
    "from memory), cellar designed to half of it; dilution ventilation Q = G/(C_lim − C_out) "
    "(ACGIH Industrial Ventilation, 28th ed., from memory); 35 % propylene glycol c_p 3.85 "
    "kJ/(kg·K), density 1.04 kg/L near 0 °C (ASHRAE Handbook, Fundamentals (2017), ch. 31, from "
    "memory); Q = U·A·LMTD and Q = ṁ·c_p·ΔT (common practice); US check Btu/h = 500·gpm·Δ°F for "
    "water, times SG and c_p/c_p,w for a glycol (500 = 8.33 lb/gal × 60 min/h × 1 Btu/(lb·°F), "
    "ASHRAE Handbook, HVAC Applications, from memory); water weighs 8.34 lb per US gallon near "
    "60 °F (common practice); 1 TR = 12 000 Btu/h = 3.517 kW, 1 kW = "
    "3412 Btu/h, 1 US gal = 3.785 L, 1 ft³ = 0.02832 m³ so 1 m³/h = 0.5886 cfm (NIST SP 811 "
    "(2008) App. B.8); °F = 1.8·°C + 32, K = °C + 273.15, a difference of 1 K = 1.8 Δ°F (SI "
    "Brochure 9th ed. and NIST SP 811); fan shaft power P = Q·Δp/η (common practice). Winery, "
    "tanks, chiller, maker's data and readings invented.")
wi = ItemSheet("Cellar", "Corbel Ridge Estate winery (invented): red fermentation hall, six "
               "20 000 L fermenters at peak, glycol jackets and CO2 extraction, vintage design day",
               WIN_SRC)
wi.heading("Must and fermentation")
wi.add("V", "Must volume per fermenter", "V", 20000, "L")
wi.add("n", "Fermenters at peak at once", "n", 6, "-")
wi.add("Bx", "Must sugar, °Brix (sucrose share by mass, hydrometer)", "Bx", 24.0, "%")
wi.add("rhom", "Must density at 24 °Brix", "ρ_m", 1.101, "kg/L")
wi.add("S", "Sugar in the must", "S", "={Bx}/100*{rhom}*1000", "g/L")
wi.add("r", "Peak sugar consumption rate (about 3.3 °Brix a day, invented)", "r", 33, "g/(L·d)")
wi.add("ms", "Sugar fermented per tank at peak", "ṁ_s", "={V}*{r}/1000", "kg/d")
wi.add("ms2", "Sugar fermented per tank at peak (first draft)", "ṁ_s2", "={V}*{r}", "kg/d",
       planted=("unit-scale", "L × g/(L·d) gives g/d, written as kg/d: /1000 missing"))
wi.add("Hf", "Heat of fermentation per kg of sugar", "ΔH_f", 545, "kJ/kg")
wi.add("Qt", "Fermentation heat per tank at peak", "Q_t", "={ms}*{Hf}/86400", "kW")
wi.add("Qt2", "Fermentation heat per tank at peak (first draft)", "Q_t2", "={ms}*{Hf}/3600",
       "kW", planted=("unit-scale", "kg/d × kJ/kg divided by 3600 as if per hour: 24 too large"))
wi.add("Qtot", "Fermentation heat, all tanks at peak", "Q_tot", "={Qt}*{n}", "kW")
wi.add("QTR", "Fermentation heat, tons of refrigeration", "Q_TR", "={Qtot}/3.517", "TR")
wi.add("QTR2", "Fermentation heat, TR (first draft)", "Q_TR2", "={Qtot}*3.517", "TR",
       planted=("unit-scale", "kW to TR multiplied by 3.517: wrong way round"))
wi.add("QB", "Fermentation heat, Btu/h", "Q_US", "={Qtot}*3412", "Btu/h")
wi.add("cpm", "Specific heat of the must", "c_p,m", 3.7, "kJ/(kg·K)")
wi.add("dTh", "Must temperature rise per hour if uncooled", "dT/dt",
       "={Qt}*3600/({V}*{rhom}*{cpm})", "K/h")
wi.add("dTd", "Must temperature rise per day if uncooled", "dT/dt_d", "={dTh}*24", "K/d")
wi.heading("Tank temperatures")
wi.add("tr", "Red fermentation setpoint", "t_r", 26, "°C")
wi.add("trF", "Red fermentation setpoint, °F (US controller)", "t_r,F", "={tr}*1.8+32", "°F")
wi.add("trK", "Red fermentation setpoint, kelvin", "T_r", "={tr}+273.15", "K")
wi.add("trK2", "Red fermentation setpoint, kelvin (first draft)", "T_r2", "={tr}", "K",
       planted=("offset-scale", "a °C reading set equal to kelvins"))
wi.add("tw", "White fermentation setpoint (Chardonnay tanks)", "t_w", 14, "°C")
wi.add("twF", "White fermentation setpoint, °F (US controller)", "t_w,F", "={tw}*1.8", "°F",
       planted=("offset-scale", "°C to °F with the +32 left out"))
wi.heading("Glycol jackets")
wi.add("tgs", "Glycol supply", "t_gs", -4, "°C")
wi.add("tgr", "Glycol return", "t_gr", 2, "°C")
wi.add("dTg", "Glycol temperature rise", "ΔT_g", "={tgr}-{tgs}", "K")
wi.add("dTgF", "Glycol temperature rise, °F difference", "ΔT_g,F", "={dTg}*1.8", "Δ°F")
wi.add("cpg", "Specific heat, 35 % propylene glycol", "c_p,g", 3.85, "kJ/(kg·K)")
wi.add("rhog", "Density, 35 % propylene glycol near 0 °C", "ρ_g", 1.04, "kg/L")
wi.add("mg", "Glycol mass flow, all tanks at peak", "ṁ_g", "={Qtot}/({cpg}*{dTg})", "kg/s")
wi.add("Vg", "Glycol volume flow", "V̇_g", "={mg}/{rhog}*60", "L/min")
wi.add("Vgpm", "Glycol volume flow, US gpm (pump maker)", "V̇_g,US", "={Vg}/3.785", "gpm")
wi.add("SGg", "Glycol specific gravity", "SG_g", 1.04, "-")
wi.add("cpr", "Glycol specific heat over water's (4.19 kJ/(kg·K))", "c_p,r", "={cpg}/4.19", "-")
wi.add("QUS", "Jacket duty, US check (500·gpm·Δ°F·SG·c_p/c_p,w)", "Q_US c",
       "=500*{Vgpm}*{dTgF}*{SGg}*{cpr}", "Btu/h")
wi.add("Vsys", "Glycol system charge (invented)", "V_sys", 1200, "L")
wi.add("Vsysg", "Glycol system charge, US gal", "V_sys,US", "={Vsys}/3.785", "US gal")
wi.add("msys", "Glycol charge mass, lb (8.34 lb/gal × SG)", "m_sys,US", "={Vsysg}*8.34*{SGg}",
       "lb")
wi.add("U", "Jacket overall coefficient, must side in natural convection (maker, invented)",
       "U", 120, "W/(m²·K)")
wi.add("Aj", "Jacket area per tank", "A_j", 3.0, "m²")
wi.add("dT1", "Must less glycol supply", "ΔT_1", "={tr}-{tgs}", "K")
wi.add("dT2", "Must less glycol return", "ΔT_2", "={tr}-{tgr}", "K")
wi.add("LMTD", "Log mean temperature difference", "LMTD", "=({dT1}-{dT2})/LN({dT1}/{dT2})", "K")
wi.add("Qj", "Jacket capacity per tank", "Q_j", "={U}*{Aj}*{LMTD}/1000", "kW")
wi.add("mrg", "Jacket margin over the peak fermentation heat", "m_j", "=({Qj}-{Qt})/{Qt}*100",
       "%")
wi.add("Pgain", "Glycol pump heat and pipe gains (invented)", "P_gain", 1800, "W")
wi.add("Qch", "Chiller load", "Q_ch", "={Qtot}+{Pgain}/1000", "kW")
wi.add("Qch2", "Chiller load (first draft)", "Q_ch2", "={Qtot}+{Pgain}", "kW",
       planted=("unit-scale", "W added to kW"))
wi.add("chTR", "Chiller rated capacity (invented)", "Q_r", 10, "TR")
wi.add("chkW", "Chiller rated capacity, kW", "Q_r,kW", "={chTR}*3.517", "kW")
wi.add("ld", "Chiller loading at peak", "f_ch", "={Qch}/{chkW}*100", "%")
wi.heading("CO2 release and cellar ventilation")
wi.add("Mco2", "Molar mass of CO2", "M_CO2", 44.01, "g/mol")
wi.add("Mhx", "Molar mass of a hexose sugar (glucose, fructose)", "M_hx", 180.16, "g/mol")
wi.add("yco2", "CO2 per kg of sugar (2 mol per mol, stoichiometric)", "y_CO2",
       "=2*{Mco2}/{Mhx}", "kg/kg")
wi.add("mco2", "CO2 release, all tanks at peak", "ṁ_CO2", "={ms}*{n}*{yco2}", "kg/d")
wi.add("fph", "Peak hour over the day's mean (invented)", "f_ph", 1.5, "-")
wi.add("mco2h", "CO2 release in the peak hour", "ṁ_CO2,h", "={mco2}/24*{fph}", "kg/h")
wi.add("pb", "Cellar barometer (invented)", "p_b", 100.8, "kPa")
wi.add("tc", "Cellar air temperature", "t_c", 15, "°C")
wi.add("Tc", "Cellar air temperature, kelvin", "T_c", "={tc}+273.15", "K")
wi.add("Rg", "Molar gas constant", "R", 8.314, "J/(mol·K)")
wi.add("rhoc", "Density of CO2 in the cellar", "ρ_CO2", "={pb}*{Mco2}/({Rg}*{Tc})", "kg/m³")
wi.add("rhoc2", "Density of CO2 in the cellar (first draft)", "ρ_CO2 2",
       "={pb}*{Mco2}/({Rg}*{tc})", "kg/m³",
       planted=("offset-scale", "a °C reading in the gas law: kelvins belong"))
wi.add("Vco2", "CO2 volume released in the peak hour", "V̇_CO2", "={mco2h}/{rhoc}", "m³/h")
wi.add("Clim", "CO2 design concentration (half the 5000 ppm limit)", "C_lim", 2500, "ppm")
wi.add("Cout", "CO2 in the outdoor air", "C_out", 420, "ppm")
wi.add("Qv", "Dilution ventilation", "Q_v", "={Vco2}/(({Clim}-{Cout})/1000000)", "m³/h")
wi.add("Qv2", "Dilution ventilation (first draft)", "Q_v2", "={Vco2}/({Clim}-{Cout})", "m³/h",
       planted=("unit-scale", "ppm taken as a fraction: 10⁶ too small"))
wi.add("Qcfm", "Dilution ventilation, cfm (US fan maker)", "Q_v,US", "={Qv}*0.5886", "cfm")
wi.add("Qcfm2", "Dilution ventilation, cfm (first draft)", "Q_v,US2", "={Qv}*35.31", "cfm",
       planted=("unit-scale", "m³/h to cfm by 35.31 alone: the /60 missing"))
wi.add("Vcel", "Fermentation hall volume", "V_h", 4200, "m³")
wi.add("ach", "Air changes at the dilution rate", "n_ac", "={Qv}/{Vcel}", "1/h")
wi.add("dpf", "Fan static pressure (invented)", "Δp_f", 350, "Pa")
wi.add("etaf", "Fan total efficiency", "η_f", 60, "%")
wi.add("Pf", "Fan shaft power", "P_f", "={Qv}/3600*{dpf}/({etaf}/100)/1000", "kW")
wi.add("Pf2", "Fan shaft power (first draft)", "P_f2", "={Qv}/3600*{dpf}/{etaf}/1000", "kW",
       planted=("unit-scale", "a % used as a fraction: 100 too small"))
WINS = wi.finish()

WINB = {
    "trade": "winery: fermentation heat, glycol jacket cooling, CO2 and cellar ventilation",
    "sheets": [("Cellar", WINS)],
    "planted": dict(wi.planted),
}

# --------------------------------------------------------------------------------------------
# Book 2: rendering plant (t, %, kg, h, kg/h, lb/h, barg, psig, bar a, °C, °F, kJ/(kg·K), kJ,
# kJ/kg, kW, BoHP, K, Δ°F, kg/s, kg/m³, m³/h, gpm, Btu/h, 1/h, cfm, m/s, m², m, mm, s, L/m³,
# L/s, kPa, hp)
# --------------------------------------------------------------------------------------------
REN_SRC = (
    "Sources: pressure sterilisation, method 1: 133 °C, 3 bar absolute, 20 min, particles of "
    "50 mm at most (Commission Regulation (EU) No 142/2011, Annex IV, ch. III, from memory); "
    "solids balance m_dry = m·(1 − x₀), cooked mass = m_dry/(1 − x_f) (common practice); c_p of "
    "raw offal 3.1 kJ/(kg·K) (from memory, within the range printed for meat by-products); heat "
    "per batch = m·c_p·ΔT + m_ev·h_fg + losses, steam = heat/h_fg of the jacket steam (common "
    "practice); saturated steam on the Steam sheet and h_fg = 2257 kJ/kg at 100 °C, 2430 "
    "kJ/kg near 30 °C (IAPWS-IF97 steam tables, from memory); c_p of water 4.19 kJ/(kg·K), "
    "density 995 kg/m³ near 30 °C (common practice); US check Btu/h = 500·gpm·Δ°F (ASHRAE "
    "Handbook, HVAC Applications, from memory); cooling tower evaporation ≈ heat rejected over "
    "latent heat, and the rule of thumb E(gpm) = 0.00085·gpm·range(°F) (Perry's Chemical "
    "Engineers' Handbook, 8th ed., sect. 12, from memory); a foot of water is 0.433 psi and a psi "
    "2.31 ft; pump power hp = gpm·ft/(3960·η) (Hydraulic Institute, from memory; common "
    "practice); blowdown = E/(cycles − 1), make-up = E + blowdown (common practice); packed "
    "scrubber superficial velocity about 2 m/s (common practice); fan shaft power P = Q·Δp/η "
    "(common practice); 1 kg = 2.205 lb, 1 bar = 14.50 psi, 1 m³/h = 4.403 US gpm = 0.5886 "
    "cfm, 1 kW = 3412 Btu/h, 1 hp = 0.7457 kW, 1 boiler horsepower = 33 475 Btu/h = 9.81 kW "
    "(NIST SP 811 (2008) App. B.8); °F = 1.8·°C + 32, a difference of 1 K = 1.8 Δ°F (SI "
    "Brochure 9th ed. and NIST SP 811). Plant, cooker, tower, scrubber, maker's data and "
    "readings invented.")
rn = ItemSheet("Cooker", "Fenwick Moss rendering plant (invented): category 3 batch cooker, "
               "vapour condenser, cooling tower and hall odour scrubber, design batch", REN_SRC)
rn.heading("Batch")
rn.add("mraw", "Raw material per batch", "m_raw", 6.0, "t")
rn.add("x0", "Raw material moisture", "x_0", 58, "%")
rn.add("xf", "Cooked material moisture (to the press)", "x_f", 8, "%")
rn.add("msol", "Dry solids per batch (fat and protein)", "m_dry", "={mraw}*1000*(1-{x0}/100)",
       "kg")
rn.add("mcook", "Cooked material per batch", "m_ck", "={msol}/(1-{xf}/100)", "kg")
rn.add("mev", "Water evaporated per batch", "m_ev", "={mraw}*1000-{mcook}", "kg")
rn.add("mev2", "Water evaporated per batch (first draft)", "m_ev2", "={mraw}-{mcook}", "kg",
       planted=("unit-scale", "tonnes less kilograms"))
rn.add("tb", "Cooking time per batch", "t_b", 2.5, "h")
rn.add("ev", "Evaporation rate, mean over the batch", "ṁ_ev", "={mev}/{tb}", "kg/h")
rn.heading("Steam to the cooker jacket")
rn.add("pg", "Jacket steam pressure", "p_g", 7.0, "barg")
rn.add("pgpsi", "Jacket steam pressure, psig (US cooker maker)", "p_g,US", "={pg}*14.5", "psig")
rn.add("pbar", "Site barometer (invented)", "p_b", 1.005, "bar a")
rn.add("pa", "Jacket steam pressure, absolute", "p_a", "={pg}+{pbar}", "bar a")
rn.add("pa2", "Jacket steam pressure, absolute (from the US gauge, first draft)", "p_a2",
       "={pgpsi}/14.5", "bar a",
       planted=("offset-scale", "a psig reading converted into bar a: the atmosphere not added"))
rn.add("tsat", "Jacket steam saturation temperature (Steam sheet)", "t_sat",
       "=VLOOKUP({pa},Steam!A6:F9,2,TRUE)", "°C")
rn.add("hfg", "Latent heat of the jacket steam (Steam sheet)", "h_fg",
       "=VLOOKUP({pa},Steam!A6:F9,4,TRUE)", "kJ/kg")
rn.add("hfg2", "Latent heat of the jacket steam (Steam sheet, first draft)", "h_fg2",
       "=VLOOKUP({pg},Steam!A6:F9,4,TRUE)", "kJ/kg",
       planted=("offset-scale", "a gauge reading looked up in a table of absolute pressures"))
rn.add("tin", "Raw material temperature in", "t_in", 8, "°C")
rn.add("tc", "Cooking end temperature (method 1)", "t_c", 133, "°C")
rn.add("cpr", "Specific heat of the raw material", "c_p,r", 3.1, "kJ/(kg·K)")
rn.add("hfgw", "Latent heat of the water driven off, at 100 °C", "h_fg,w", 2257, "kJ/kg")
rn.add("Qs", "Sensible heat per batch", "Q_s", "={mraw}*1000*{cpr}*({tc}-{tin})", "kJ")
rn.add("Qe", "Evaporation heat per batch", "Q_e", "={mev}*{hfgw}", "kJ")
rn.add("fl", "Jacket and shell losses", "f_l", 10, "%")
rn.add("Qb", "Heat per batch with losses", "Q_b", "=({Qs}+{Qe})*(1+{fl}/100)", "kJ")
rn.add("ms", "Jacket steam, mean over the batch", "ṁ_s", "={Qb}/({hfg}*{tb})", "kg/h")
rn.add("mslb", "Jacket steam, lb/h (US boiler maker)", "ṁ_s,US", "={ms}*2.205", "lb/h")
rn.add("mslb2", "Jacket steam, lb/h (first draft)", "ṁ_s,US2", "={ms}/2.205", "lb/h",
       planted=("unit-scale", "kg to lb divided by 2.205: wrong way round"))
rn.add("Pst", "Jacket heat rate, mean", "P_s", "={ms}*{hfg}/3600", "kW")
rn.add("BoHP", "Boiler load, boiler horsepower", "P_s,BoHP", "={Pst}/9.81", "BoHP")
rn.heading("Sterilisation check")
rn.add("preqa", "Cooker pressure required by method 1, absolute", "p_req", 3.0, "bar a")
rn.add("preqg", "Cooker pressure to set on the cooker gauge", "p_req,g", "={preqa}-{pbar}",
       "barg")
rn.add("dtj", "Jacket saturation over the cooking end temperature", "ΔT_j", "={tsat}-{tc}", "K")
rn.heading("Vapour condenser")
rn.add("tv", "Cooker vapour temperature", "t_v", 100, "°C")
rn.add("tco", "Condensate leaving the condenser", "t_co", 60, "°C")
rn.add("cpw", "Specific heat of water", "c_p,w", 4.19, "kJ/(kg·K)")
rn.add("Qc", "Condenser duty", "Q_c", "={ev}*({hfgw}+{cpw}*({tv}-{tco}))/3600", "kW")
rn.add("Qc2", "Condenser duty (first draft)", "Q_c2", "={ev}*({hfgw}+{cpw}*({tv}-{tco}))", "kW",
       planted=("unit-scale", "kg/h × kJ/kg written as kW: the /3600 missing"))
rn.add("tcwi", "Cooling water from the tower", "t_cwi", 29, "°C")
rn.add("tcwo", "Cooling water back to the tower", "t_cwo", 39, "°C")
rn.add("rng", "Cooling water range (temperature rise)", "ΔT_cw", "={tcwo}-{tcwi}", "K")
rn.add("rngF", "Cooling water range, °F difference", "ΔT_cw,F", "={rng}*1.8", "Δ°F")
rn.add("rngF2", "Cooling water range, °F difference (first draft)", "ΔT_cw,F2",
       "={rng}*1.8+32", "Δ°F", planted=("offset-scale", "the +32 added to a difference"))
rn.add("rngF3", "Cooling water range, °F difference (both readings converted in line)",
       "ΔT_cw,F3", "=({tcwo}*1.8+32)-({tcwi}*1.8+32)", "Δ°F")
rn.add("mcw", "Cooling water mass flow", "ṁ_cw", "={Qc}/({cpw}*{rng})", "kg/s")
rn.add("rhow", "Density of cooling water near 30 °C", "ρ_w", 995, "kg/m³")
rn.add("Vcw", "Cooling water flow", "V̇_cw", "={mcw}*3600/{rhow}", "m³/h")
rn.add("gpm", "Cooling water flow, US gpm (tower maker)", "V̇_cw,US", "={Vcw}*4.403", "gpm")
rn.add("QUS", "Condenser duty, US check (500·gpm·Δ°F)", "Q_c,US", "=500*{gpm}*{rngF}", "Btu/h")
rn.heading("Cooling water pump")
rn.add("dpcw", "Pump differential pressure (invented)", "Δp_cw", 2.5, "bar")
rn.add("dpcwpsi", "Pump differential pressure, psi", "Δp_cw,US", "={dpcw}*14.5", "psi")
rn.add("Hft", "Pump head, ft of water (2.31 ft/psi)", "H_US", "={dpcwpsi}*2.31", "ft")
rn.add("etacp", "Pump efficiency (maker, invented)", "η_p", 75, "%")
rn.add("Pcw", "Pump shaft power", "P_cw", "={Vcw}/3600*{dpcw}*100/({etacp}/100)", "kW")
rn.add("Pcwhp", "Pump shaft power, US check (gpm·ft/(3960·η))", "P_cw,US",
       "={gpm}*{Hft}/(3960*{etacp}/100)", "hp")
rn.add("zst", "Static lift, tower basin to the condenser top (invented)", "z_st", 14, "ft")
rn.add("pst", "Static pressure of that lift, psi (0.433 psi/ft)", "p_st", "={zst}*0.433", "psi")
rn.heading("Cooling tower")
rn.add("twb", "Design wet bulb (invented)", "t_wb", 21, "°C")
rn.add("hfge", "Latent heat of evaporation near 30 °C", "h_fg,30", 2430, "kJ/kg")
rn.add("Ev", "Evaporation (heat over latent heat)", "E", "={Qc}/{hfge}*3600/{rhow}", "m³/h")
rn.add("EvUS", "Evaporation, US rule of thumb (0.00085·gpm·range °F)", "E_US",
       "=0.00085*{gpm}*{rngF}", "gpm")
rn.add("coc", "Cycles of concentration", "N", 4, "-")
rn.add("Bd", "Blowdown", "B", "={Ev}/({coc}-1)", "m³/h")
rn.add("Mu", "Make-up water", "M", "={Ev}+{Bd}", "m³/h")
rn.heading("Hall odour scrubber")
rn.add("Vb", "Cooker hall volume", "V_h", 6500, "m³")
rn.add("ach", "Hall extraction, air changes (invented)", "n_ac", 15, "1/h")
rn.add("Qh", "Hall extraction", "Q_h", "={Vb}*{ach}", "m³/h")
rn.add("Qnc", "Cooker non-condensables after the condenser (invented)", "Q_nc", 450, "m³/h")
rn.add("Qa", "Scrubber air flow", "Q_a", "={Qh}+{Qnc}", "m³/h")
rn.add("Qcfm", "Scrubber air flow, cfm (US fan maker)", "Q_a,US", "={Qa}*0.5886", "cfm")
rn.add("vs", "Superficial velocity in the packed tower", "v_s", 2.0, "m/s")
rn.add("As", "Tower cross-section", "A_s", "={Qa}/3600/{vs}", "m²")
rn.add("As2", "Tower cross-section (first draft)", "A_s2", "={Qa}/{vs}", "m²",
       planted=("unit-scale", "m³/h over m/s: the /3600 missing"))
rn.add("zp", "Packing depth", "z_p", 2400, "mm")
rn.add("zf", "Sprays, demister and outlet above the packing", "z_f", 1.8, "m")
rn.add("H", "Tower shell height above the sump", "H", "={zp}/1000+{zf}", "m")
rn.add("H2", "Tower shell height above the sump (first draft)", "H_2", "={zp}+{zf}", "m",
       planted=("unit-scale", "mm added to m"))
rn.add("dps", "Scrubber and duct pressure drop", "Δp_s", 2.2, "kPa")
rn.add("eta", "Fan total efficiency", "η_f", 72, "%")
rn.add("Pfan", "Fan shaft power", "P_f", "={Qa}/3600*{dps}/({eta}/100)", "kW")
rn.add("Pfan2", "Fan shaft power (first draft)", "P_f2", "={Qa}/3600*{dps}/{eta}", "kW",
       planted=("unit-scale", "a % used as a fraction: 100 too small"))
RENS = rn.finish()

STEAM = {
    "A1": "Saturated steam by absolute pressure (IAPWS-IF97 steam tables, rounded, from memory; "
          "check against the tables before use)",
    "A2": "Sources: IAPWS-IF97 (from memory); °F = 1.8·°C + 32 (NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Pressure [bar a]", "B5": "t_sat [°C]", "C5": "h_f [kJ/kg]", "D5": "h_fg [kJ/kg]",
    "E5": "h_g [kJ/kg]", "F5": "t_sat [°F]",
}
for r, (p, t, hf, hfg, hg) in enumerate([(7, 165.0, 697.1, 2064.9, 2762.0),
                                         (8, 170.4, 721.1, 2048.0, 2769.1),
                                         (9, 175.4, 742.6, 2030.5, 2773.0),
                                         (10, 179.9, 762.6, 2014.6, 2777.1)], start=6):
    STEAM[f"A{r}"], STEAM[f"B{r}"], STEAM[f"C{r}"] = p, t, hf
    STEAM[f"D{r}"], STEAM[f"E{r}"] = hfg, hg
    STEAM[f"F{r}"] = f"=B{r}*1.8+32"
STEAM["F8"] = "=(B8-32)/1.8"
STEAM_PLANTED = {"Steam!F8": ("offset-scale", "°C to °F by the °F to °C formula: the "
                                              "conversion run the wrong way")}

RENB = {
    "trade": "rendering: batch cooker steam, vapour condenser, cooling tower, odour scrubber",
    "sheets": [("Cooker", RENS), ("Steam", STEAM)],
    "planted": {**rn.planted, **STEAM_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 3: organic Rankine cycle on a biogas engine (kW, m³/h, °C, °F, K, kg/m³, kJ/(kg·K),
# gpm, Δ°F, Btu/h, kg/h, lb/h, MMBtu/h, %, kJ/kg, kg/s, bar a, barg, bar, Pa, m³/s, cfm, hp,
# m, mm, m², m/s, W, h/yr, MWh/yr, $/MWh, $/yr)
# --------------------------------------------------------------------------------------------
ORC_SRC = (
    "Sources: heat Q = ṁ·c_p·ΔT and Q = V̇·ρ·c_p·ΔT (common practice); density of water 967.8 "
    "kg/m³ at 86 °C and c_p 4.20 kJ/(kg·K) (IAPWS-95, from memory); mean c_p of engine exhaust "
    "1.09 kJ/(kg·K) between 170 and 465 °C (common practice, from memory); exhaust cooled no "
    "lower than 170 °C to keep above the acid dew point of biogas exhaust (common practice); "
    "R245fa enthalpies and saturation pressures rounded from the fluid's tables (IIR reference "
    "state, from memory; check before use); Carnot efficiency 1 − T_c/T_h in kelvins, K = °C + "
    "273.15 (SI Brochure 9th ed.); pump power P = ṁ/ρ·Δp/η, 1 bar = 100 kPa (common practice; "
    "SI Brochure 9th ed.); cycle balance Q_out = Q_in − W_turbine + W_pump (first law, common "
    "practice); air c_p 1.006 kJ/(kg·K), specific gas constant of dry air 287.05 J/(kg·K) "
    "(CODATA 2018 R over M = 28.965 g/mol, from memory), ρ = p/(R·T); fan shaft power P = "
    "V̇·Δp/η (common practice); US check Btu/h = 500·gpm·Δ°F, 500 = 8.33 lb/gal × 60 min/h × 1 "
    "Btu/(lb·°F) at about 60 °F, scaled by the density ratio for hot water (ASHRAE Handbook, "
    "HVAC Applications, from memory); pump power hp = gpm·psi/(1714·η) (common practice); 1 m³/s "
    "= 15 850 US gpm; 1 kW = 3412 Btu/h = 0.003412 MMBtu/h, 1 kg = 2.205 lb, "
    "1 m³/h = 4.403 US gpm, 1 m³/s = 2119 cfm, 1 hp = 0.7457 kW, 1 bar = 14.50 psi (NIST SP 811 "
    "(2008) App. B.8); °F = 1.8·°C + 32, a difference of 1 K = 1.8 Δ°F (NIST SP 811). Site, "
    "engine, ORC unit, condenser, maker's data, tariff and readings invented.")
oc = ItemSheet("ORC", "Saltcote Fen biogas plant (invented): 1.56 MWe gas engine with an "
               "organic Rankine cycle unit on its jacket water and exhaust, air-cooled condenser, "
               "summer design point", ORC_SRC)
oc.heading("Engine heat sources")
oc.add("Pe", "Engine electrical output (engine maker, invented)", "P_e", 1560, "kW")
oc.add("Pfuel", "Engine fuel input, lower heating value (engine maker, invented)", "P_fuel",
       3900, "kW")
oc.add("Vjw", "Jacket water flow through the ORC preheater", "V̇_jw", 38, "m³/h")
oc.add("tjwi", "Jacket water to the ORC preheater", "t_jw,i", 92, "°C")
oc.add("tjwo", "Jacket water back to the engine", "t_jw,o", 80, "°C")
oc.add("rhojw", "Density of water at 86 °C", "ρ_jw", 967.8, "kg/m³")
oc.add("cpjw", "Specific heat of water at 86 °C", "c_p,jw", 4.20, "kJ/(kg·K)")
oc.add("dTjw", "Jacket water temperature drop in the preheater", "ΔT_jw", "={tjwi}-{tjwo}", "K")
oc.add("Qjw", "Jacket water heat", "Q_jw", "={Vjw}/3600*{rhojw}*{cpjw}*{dTjw}", "kW")
oc.add("gpmjw", "Jacket water flow, US gpm", "V̇_jw,US", "={Vjw}*4.403", "gpm")
oc.add("dTjwF", "Jacket water temperature drop, °F difference", "ΔT_jw,F", "={dTjw}*1.8", "Δ°F")
oc.add("QjwUS", "Jacket water heat, US check (500·gpm·Δ°F × ρ/999)", "Q_jw,US",
       "=500*{gpmjw}*{dTjwF}*{rhojw}/999", "Btu/h")
oc.add("mex", "Exhaust mass flow (engine maker, invented)", "ṁ_ex", 8350, "kg/h")
oc.add("mexlb", "Exhaust mass flow, lb/h (US heater maker)", "ṁ_ex,US", "={mex}*2.205", "lb/h")
oc.add("tex", "Exhaust at the turbocharger outlet", "t_ex", 465, "°C")
oc.add("texo", "Exhaust leaving the ORC heater", "t_ex,o", 170, "°C")
oc.add("cpex", "Mean specific heat of the exhaust gas", "c_p,ex", 1.09, "kJ/(kg·K)")
oc.add("Qex", "Exhaust heat recovered", "Q_ex", "={mex}/3600*{cpex}*({tex}-{texo})", "kW")
oc.add("Qex2", "Exhaust heat recovered (from the US heater sheet, first draft)", "Q_ex2",
       "={mexlb}/3600*{cpex}*({tex}-{texo})", "kW",
       planted=("unit-scale", "a flow in lb/h used as kg/h: 2.205 too large"))
oc.add("Qin", "Heat into the ORC", "Q_in", "={Qjw}+{Qex}", "kW")
oc.add("QMM", "Heat into the ORC, MMBtu/h", "Q_in,US", "={Qin}*0.003412", "MMBtu/h")
oc.add("QMM2", "Heat into the ORC, MMBtu/h (first draft)", "Q_in,US2", "={Qin}*3412/1000",
       "MMBtu/h", planted=("unit-scale", "kW to MBH written as MMBtu/h: 1000 too large"))
oc.add("QinB", "Heat into the ORC, Btu/h", "Q_in,B", "={Qin}*3412", "Btu/h")
oc.add("QinB2", "Heat into the ORC, Btu/h (first draft)", "Q_in,B2", "={Qin}*3142", "Btu/h",
       planted=("unit-scale", "3412 typed as 3142: the wrong factor, 8 % low"))
oc.heading("Temperatures")
oc.add("teva", "Evaporating temperature of the working fluid", "t_ev", 115, "°C")
oc.add("tcon", "Condensing temperature of the working fluid", "t_cd", 38, "°C")
oc.add("Teva", "Evaporating temperature, kelvin", "T_ev", "={teva}+273.15", "K")
oc.add("Tcon", "Condensing temperature, kelvin", "T_cd", "={tcon}+273.15", "K")
oc.add("Tcon2", "Condensing temperature, kelvin (first draft)", "T_cd2", "={tcon}", "K",
       planted=("offset-scale", "a °C reading set equal to kelvins"))
oc.add("tconF", "Condensing temperature, °F (US condenser maker)", "t_cd,F", "={tcon}*1.8+32",
       "°F")
oc.add("eC", "Carnot efficiency between evaporating and condensing", "η_C",
       "=(1-{Tcon}/{Teva})*100", "%")
oc.add("eC2", "Carnot efficiency (first draft)", "η_C2", "=(1-{tcon}/{teva})*100", "%",
       planted=("offset-scale", "°C readings in a ratio of temperatures"))
oc.heading("Working fluid (R245fa) and cycle")
oc.add("h1", "Enthalpy leaving the feed pump, subcooled liquid", "h_1", 248, "kJ/kg")
oc.add("h2", "Enthalpy at the turbine inlet, saturated vapour at 115 °C", "h_2", 487, "kJ/kg")
oc.add("mwf", "Working fluid flow", "ṁ_wf", "={Qin}/({h2}-{h1})", "kg/s")
oc.add("mwfh", "Working fluid flow, kg/h", "ṁ_wf,h", "={mwf}*3600", "kg/h")
oc.add("mwflb", "Working fluid flow, lb/h (US maker)", "ṁ_wf,US", "={mwfh}*2.205", "lb/h")
oc.add("eta", "ORC gross efficiency (maker, invented)", "η_g", 13.5, "%")
oc.add("Pg", "Gross power at the generator", "P_g", "={Qin}*{eta}/100", "kW")
oc.add("Pg2", "Gross power at the generator (first draft)", "P_g2", "={Qin}*{eta}", "kW",
       planted=("unit-scale", "a % used as a fraction: 100 too large"))
oc.add("shr", "Gross efficiency as a share of Carnot's", "η_g/η_C", "={eta}/{eC}*100", "%")
oc.heading("Feed pump")
oc.add("pev", "Evaporating pressure, R245fa at 115 °C", "p_ev", 14.1, "bar a")
oc.add("pcon", "Condensing pressure, R245fa at 38 °C", "p_cd", 2.35, "bar a")
oc.add("pb", "Site barometer (invented)", "p_b", 1.01, "bar a")
oc.add("pevg", "Evaporating pressure on the discharge gauge", "p_ev,g", "={pev}-{pb}", "barg")
oc.add("dpp", "Feed pump pressure rise", "Δp_p", "={pev}-{pcon}", "bar")
oc.add("dpp2", "Feed pump pressure rise (from the gauge, first draft)", "Δp_p2",
       "={pevg}-{pcon}", "bar",
       planted=("offset-scale", "a gauge reading less an absolute pressure"))
oc.add("rhol", "Liquid R245fa density at 38 °C", "ρ_l", 1320, "kg/m³")
oc.add("etap", "Feed pump efficiency", "η_p", 55, "%")
oc.add("Pp", "Feed pump power", "P_p", "={mwf}/{rhol}*{dpp}*100/({etap}/100)", "kW")
oc.add("gpmwf", "Feed pump flow, US gpm", "V̇_wf,US", "={mwf}/{rhol}*15850", "gpm")
oc.add("dppsi", "Feed pump pressure rise, psi", "Δp_p,US", "={dpp}*14.5", "psi")
oc.add("PpUS", "Feed pump power, US check (gpm·psi/(1714·η))", "P_p,US",
       "={gpmwf}*{dppsi}/(1714*{etap}/100)", "hp")
oc.heading("Air-cooled condenser")
oc.add("Qcd", "Heat rejected in the condenser", "Q_cd", "={Qin}-{Pg}+{Pp}", "kW")
oc.add("tai", "Design dry bulb, air on", "t_a,i", 25, "°C")
oc.add("tao", "Air off the coil", "t_a,o", 33, "°C")
oc.add("ITD", "Initial temperature difference", "ITD", "={tcon}-{tai}", "K")
oc.add("cpa", "Specific heat of air", "c_p,a", 1.006, "kJ/(kg·K)")
oc.add("ma", "Air mass flow", "ṁ_a", "={Qcd}/({cpa}*({tao}-{tai}))", "kg/s")
oc.add("rhoa", "Air density at the fans", "ρ_a", "={pb}*100000/(287.05*({tai}+273.15))",
       "kg/m³")
oc.add("Va", "Air volume flow", "V̇_a", "={ma}/{rhoa}", "m³/s")
oc.add("Vacfm", "Air volume flow, cfm (US fan maker)", "V̇_a,US", "={Va}*2119", "cfm")
oc.add("Vacfm2", "Air volume flow, cfm (first draft)", "V̇_a,US2", "={Va}*35.31", "cfm",
       planted=("unit-scale", "m³/s to cfm by 35.31 alone: the ×60 missing"))
oc.add("dpa", "Fan static pressure across the coil (maker, invented)", "Δp_a", 120, "Pa")
oc.add("etaf", "Fan total efficiency", "η_f", 58, "%")
oc.add("Pfan", "Fan shaft power, all fans", "P_fan", "={Va}*{dpa}/({etaf}/100)/1000", "kW")
oc.add("Pfan2", "Fan shaft power, all fans (first draft)", "P_fan2",
       "={Va}*{dpa}/({etaf}/100)", "kW", planted=("unit-scale", "W written as kW"))
oc.add("Pfhp", "Fan shaft power, hp (US motor)", "P_fan,US", "={Pfan}/0.7457", "hp")
oc.add("nf", "Fans", "n_f", 6, "-")
oc.add("Pf1", "Fan shaft power per fan", "P_f1", "={Pfan}/{nf}", "kW")
oc.add("nb", "Coil bundles", "n_b", 4, "-")
oc.add("Lc", "Bundle length", "L_b", 12.0, "m")
oc.add("Wc", "Bundle width", "W_b", 1200, "mm")
oc.add("Af", "Coil face area", "A_f", "={nb}*{Lc}*{Wc}/1000", "m²")
oc.add("Af2", "Coil face area (first draft)", "A_f2", "={nb}*{Lc}*{Wc}", "m²",
       planted=("unit-scale", "m × mm written as m²: /1000 missing"))
oc.add("vf", "Face velocity", "v_f", "={Va}/{Af}", "m/s")
oc.heading("Net output")
oc.add("Paux", "Controls, lube oil and cooling pumps (invented)", "P_aux", 4500, "W")
oc.add("Pn", "Net power", "P_n", "={Pg}-{Pp}-{Pfan}-{Paux}/1000", "kW")
oc.add("en", "Net thermal efficiency", "η_n", "={Pn}/{Qin}*100", "%")
oc.add("ee1", "Electrical efficiency, engine alone", "η_e1", "={Pe}/{Pfuel}*100", "%")
oc.add("ee2", "Electrical efficiency, engine with the ORC", "η_e2", "=({Pe}+{Pn})/{Pfuel}*100",
       "%")
oc.add("hrs", "Running hours a year", "t_a", 8000, "h/yr")
oc.add("Ey", "Net ORC output a year", "E_a", "={Pn}*{hrs}/1000", "MWh/yr")
oc.add("tar", "Export tariff (invented)", "c_e", 95, "$/MWh")
oc.add("rev", "Export revenue from the ORC", "R_a", "={Ey}*{tar}", "$/yr")
ORCS = oc.finish()

ORCB = {
    "trade": "power: organic Rankine cycle on a gas engine's jacket water and exhaust",
    "sheets": [("ORC", ORCS)],
    "planted": dict(oc.planted),
}

# --------------------------------------------------------------------------------------------
# Book 4: bascule bridge leaf drive (t, m, %, ton, t/m³, m³, kN·m, lbf·ft, kN, kip, °, rad, s,
# rad/s, rad/s², mm, rpm, km/h, m/s, mph, kg/m³, Pa, psf, m², t·m², N·m, kW, hp)
# --------------------------------------------------------------------------------------------
BAS_SRC = (
    "Sources: a bascule leaf is counterweighted slightly span-heavy so that it seats on the live "
    "load shoes; moment balance m_cw·d_cw = m_leaf·d_leaf·(1 − e) (common practice; T. E. Hool "
    "and W. S. Kinne, Movable and Long-Span Steel Bridges, 2nd ed. (1943), from memory); moments "
    "about the trunnion M = m·g·d, g_n = 9.81 m/s² (SI Brochure 9th ed.), the imbalance varying "
    "as cos θ and the wind lever as sin θ with the opening angle (common practice); trapezoidal "
    "speed profile ω_max = θ/(t_open − t_acc), α = ω_max/t_acc (common practice); trunnion "
    "friction M_f = μ·W·r_j, μ = 0.12 for greased bronze bushings (from memory); acceleration "
    "moment I·α (common practice); dynamic pressure q = ½·ρ·v², ρ = 1.25 kg/m³, force "
    "coefficient 2.0 for a flat plate normal to the wind (EN 1991-1-4 (2005) 4.5 and 7.4.3, from "
    "memory); design moment: imbalance, wind, friction and acceleration each at its worst "
    "(conservative, common practice; see AASHTO LRFD Movable Highway Bridge Design "
    "Specifications, 2nd ed. (2007), sect. 5, from memory); motor torque T = M/(i·η), power P = "
    "T·ω, ω = 2π·n/60 (common practice); US check hp = T(lbf·ft)·rpm/5252, 5252 = 33 000/(2π) "
    "(common practice); 1 N·m = 0.7376 lbf·ft, 1 kN = 0.2248 kip (1 kip = 4.448 kN), 1 short "
    "ton = 0.9072 t, 1 psf = 47.88 Pa (1 Pa = 0.02089 psf), 1 m/s = 2.237 mph, 1 hp = 0.7457 kW "
    "(NIST SP 811 (2008) App. B.8); 1 km/h = 1/3.6 m/s, π rad = 180° (SI Brochure 9th ed.). "
    "Bridge, leaf, machinery, maker's data and readings invented.")
bb = ItemSheet("Drive", "Pellow Quay bascule bridge (invented): single-leaf rolling-rack drive, "
               "leaf opening to 78°, machinery design", BAS_SRC)
bb.heading("Leaf and counterweight")
bb.add("mL", "Leaf mass (deck, girders, floor beams)", "m_L", 185, "t")
bb.add("dL", "Leaf centre of gravity forward of the trunnion, leaf down", "d_L", 9.4, "m")
bb.add("dC", "Counterweight centre of gravity behind the trunnion", "d_C", 3.6, "m")
bb.add("imb", "Design span-heavy imbalance, share of the leaf's moment (invented)", "e", 2.5,
       "%")
bb.add("mC", "Counterweight mass", "m_C", "={mL}*{dL}/{dC}*(1-{imb}/100)", "t")
bb.add("mC2", "Counterweight mass (first draft)", "m_C2", "={mL}*{dL}/{dC}*(1-{imb})", "t",
       planted=("unit-scale", "a % used as a fraction: 1 − 2.5 for 1 − 0.025"))
bb.add("mCton", "Counterweight mass, short tons (US foundry)", "m_C,US", "={mC}*1.1023", "ton")
bb.add("rhoc", "Counterweight concrete with steel punchings (invented)", "ρ_c", 3.2, "t/m³")
bb.add("Vc", "Counterweight volume", "V_c", "={mC}/{rhoc}", "m³")
bb.add("Mimb", "Imbalance moment, leaf down", "M_imb", "=({mL}*{dL}-{mC}*{dC})*9.81", "kN·m")
bb.add("Mimb2", "Imbalance moment, leaf down (first draft)", "M_imb2",
       "=({mL}*{dL}-{mC}*{dC})", "kN·m", planted=("unit-scale", "tonne-metres as kN·m: g missing"))
bb.add("Mimbft", "Imbalance moment, lbf·ft (US machinery supplier)", "M_imb,US",
       "={Mimb}*737.6", "lbf·ft")
bb.add("Lt", "Leaf length, trunnion to toe", "L", 19.0, "m")
bb.add("tip", "Reaction on the live load shoes at the toe, leaf down", "R_t", "={Mimb}/{Lt}",
       "kN")
bb.add("tipkip", "Reaction on the live load shoes, kip", "R_t,US", "={tip}/4.448", "kip")
bb.heading("Opening")
bb.add("th", "Opening angle", "θ", 78, "°")
bb.add("thr", "Opening angle, radians", "θ_r", "={th}*PI()/180", "rad")
bb.add("top", "Opening time (operating spec, invented)", "t_op", 75, "s")
bb.add("ta", "Acceleration and deceleration time, each", "t_a", 10, "s")
bb.add("wmax", "Peak angular speed of the leaf (trapezoidal profile)", "ω_L",
       "={thr}/({top}-{ta})", "rad/s")
bb.add("alpha", "Angular acceleration of the leaf", "α", "={wmax}/{ta}", "rad/s²")
bb.add("Rr", "Rack pitch radius about the trunnion", "R_r", 4.5, "m")
bb.add("rp", "Main pinion pitch radius", "r_p", 350, "mm")
bb.add("wp", "Main pinion angular speed", "ω_p", "={wmax}*{Rr}/({rp}/1000)", "rad/s")
bb.add("wp2", "Main pinion angular speed (first draft)", "ω_p2", "={wmax}*{Rr}/{rp}", "rad/s",
       planted=("unit-scale", "m over mm: 1000 too small"))
bb.add("np", "Main pinion speed", "n_p", "={wp}*60/(2*PI())", "rpm")
bb.add("np2", "Main pinion speed (first draft)", "n_p2", "={wp}*60", "rpm",
       planted=("unit-scale", "rad/s to rpm with the 2π left out: 2π too large"))
bb.add("nm", "Motor full-load speed (4-pole, 50 Hz)", "n_m", 1480, "rpm")
bb.add("i", "Reducer ratio, motor to main pinion", "i", "={nm}/{np}", "-")
bb.heading("Wind on the raised leaf")
bb.add("vkmh", "Operating wind speed limit (invented)", "v_km", 72, "km/h")
bb.add("vw", "Operating wind speed, m/s", "v", "={vkmh}/3.6", "m/s")
bb.add("vw2", "Operating wind speed, m/s (first draft)", "v_2", "={vkmh}*3.6", "m/s",
       planted=("unit-scale", "km/h to m/s multiplied by 3.6: wrong way round"))
bb.add("vmph", "Operating wind speed, mph", "v_US", "={vw}*2.237", "mph")
bb.add("rhoa", "Air density", "ρ_a", 1.25, "kg/m³")
bb.add("q", "Dynamic pressure", "q", "=0.5*{rhoa}*{vw}^2", "Pa")
bb.add("qpsf", "Dynamic pressure, psf (US spec)", "q_US", "={q}/47.88", "psf")
bb.add("qpsf2", "Dynamic pressure, psf (first draft)", "q_US2", "={q}*47.88", "psf",
       planted=("unit-scale", "Pa to psf multiplied by 47.88: wrong way round"))
bb.add("qpsf3", "Dynamic pressure, psf (second form)", "q_US3", "={q}*0.02089", "psf")
bb.add("Cf", "Force coefficient, flat leaf normal to the wind", "C_f", 2.0, "-")
bb.add("B", "Leaf width", "B", 11.5, "m")
bb.add("Aw", "Leaf area facing the wind, raised", "A_w", "={Lt}*{B}", "m²")
bb.add("Fw", "Wind force on the raised leaf", "F_w", "={q}*{Cf}*{Aw}/1000", "kN")
bb.add("Mw", "Wind moment about the trunnion, leaf at the full opening", "M_w",
       "={Fw}*{Lt}/2*SIN({thr})", "kN·m")
bb.heading("Torque and motor")
bb.add("mu", "Trunnion bushing friction coefficient", "μ", 0.12, "-")
bb.add("Dj", "Trunnion journal diameter", "D_j", 560, "mm")
bb.add("Mf", "Trunnion friction moment", "M_f", "={mu}*({mL}+{mC})*9.81*{Dj}/2000", "kN·m")
bb.add("I", "Moment of inertia of leaf and counterweight about the trunnion (invented)", "I",
       24600, "t·m²")
bb.add("Ma", "Acceleration moment", "M_a", "={I}*{alpha}", "kN·m")
bb.add("Mt", "Design moment at the trunnion", "M_t", "={Mimb}+{Mw}+{Mf}+{Ma}", "kN·m")
bb.add("etag", "Gear train efficiency, rack to motor", "η_g", 85, "%")
bb.add("Tm", "Motor torque", "T_m", "={Mt}*1000/({i}*{Rr}/({rp}/1000)*{etag}/100)", "N·m")
bb.add("Tmft", "Motor torque, lbf·ft", "T_m,US", "={Tm}*0.7376", "lbf·ft")
bb.add("Pm", "Motor power at full speed", "P_m", "={Tm}*{nm}*2*PI()/60/1000", "kW")
bb.add("Pm2", "Motor power at full speed (first draft)", "P_m2", "={Tm}*{nm}*2*PI()/60", "kW",
       planted=("unit-scale", "W written as kW"))
bb.add("Pmhp", "Motor power, hp", "P_m,US", "={Pm}/0.7457", "hp")
bb.add("Pmhp2", "Motor power, hp (first draft)", "P_m,US2", "={Pm}*0.7457", "hp",
       planted=("unit-scale", "kW to hp multiplied by 0.7457: wrong way round"))
bb.add("wm", "Motor angular speed at full load", "ω_m", "={nm}*PI()/30", "rad/s")
bb.add("Pm3", "Motor power at full speed, second form (T·ω)", "P_m3", "={Tm}*{wm}/1000", "kW")
bb.add("PmUS", "Motor power, US check (T·rpm/5252)", "P_m,US c", "={Tmft}*{nm}/5252", "hp")
bb.add("Pr", "Motor rating chosen (invented)", "P_r", 55, "kW")
bb.add("ldm", "Motor loading at the design moment", "f_m", "={Pm}/{Pr}*100", "%")
bb.add("Tr", "Motor rated torque", "T_r", "={Pr}*1000/({nm}*2*PI()/60)", "N·m")
bb.add("Tbr", "Motor brake torque, 150 % of rated", "T_br", "=1.5*{Tr}", "N·m")
BASS = bb.finish()

_Mimb, _Fw, _Lt, _Mf, _Ma = (bb.ref(k) for k in ("Mimb", "Fw", "Lt", "Mf", "Ma"))
ANGLES = {
    "A1": "Pellow Quay bascule: moments about the trunnion through the opening (invented leaf)",
    "A2": "Sources: imbalance as cos θ, wind lever as sin θ (common practice); π rad = 180° "
          "(SI Brochure 9th ed.).",
    "A3": CAUTION,
    "A5": "Angle [°]", "B5": "Imbalance moment [kN·m]", "C5": "Wind moment [kN·m]",
    "D5": "Design moment [kN·m]",
}
for r, th in enumerate([0, 40, 78], start=6):
    ANGLES[f"A{r}"] = th
    ANGLES[f"B{r}"] = f"={_Mimb}*COS(RADIANS(A{r}))"
    ANGLES[f"C{r}"] = f"={_Fw}*{_Lt}/2*SIN(RADIANS(A{r}))"
    ANGLES[f"D{r}"] = f"=B{r}+C{r}+{_Mf}+{_Ma}"
ANGLES["B7"] = f"={_Mimb}*COS(A7)"
ANGLES_PLANTED = {"Angles!B7": ("unit-scale", "COS of an angle in degrees, RADIANS left out")}

BASB = {
    "trade": "movable bridges: bascule leaf balance, wind, drive torque and motor power",
    "sheets": [("Drive", BASS), ("Angles", ANGLES)],
    "planted": {**bb.planted, **ANGLES_PLANTED},
}

BOOKS = {"winery-cellar-corbel-ridge": WINB, "rendering-cooker-fenwick-moss": RENB,
         "orc-engine-saltcote-fen": ORCB, "bascule-drive-pellow-quay": BASB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()

# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.
