#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review68), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; layout after
corpus/sheets/review64/make_books.py.

Trades: an ice cream plant's mix pasteuriser, continuous freezers, hardening tunnel and ammonia
plant; a steel mill's billet reheating furnace (heat to the steel, natural gas, combustion air
preheat, efficiency, stack loss); a metro station's tunnel ventilation (piston effect, smoke
control by critical velocity, fans, air temperature rise, shaft stack effect); a poultry
hatchery's setter and hatcher rooms (embryo heat, ventilation for CO2, humidity, humidifier
water, heating). All scenarios, sites, firms, readings and maker's data are invented
(demonstration only); the formulas and published factors are the trade's own, with their
sources named in a text cell at the top of each sheet ("from memory" where recalled and not
checked, "common practice" for a fact of the trade with no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and
its messages that mislead, are recorded in review_notes.py after running the round's build of the time.

Run: python3 make_books.py [--expect]  ->  *.xlsx (and *.expect) in this folder only
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
# Book 1: ice cream plant (L/h, kg/L, kg/h, lb/h, °C, °F, K, Δ°F, %, kJ/(kg·K), kJ/kg, kW, W,
# Btu/h, TR, L/s, gpm, m³/h, kPa, kPa a, kPa(g), psi, psig, hp, kg/s, kg/m³)
# --------------------------------------------------------------------------------------------
ICE_SRC = (
    "Sources: 1 kg = 2.205 lb, 1 kW = 3412 Btu/h, 1 TR = 12 000 Btu/h = 3.517 kW, 1 L/s = 15.85 "
    "US gpm, 1 m³/h = 4.403 US gpm, 1 kPa = 0.1450 psi (NIST SP 811 (2008) App. B.8); °F = "
    "1.8·°C + 32 and a difference ×1.8 (NIST SP 811); ice cream mix density 1.10 kg/L, specific "
    "heat 3.35 kJ/(kg·K) above freezing and 1.88 kJ/(kg·K) frozen, water 62 % of the mix, "
    "initial freezing point about −2.5 °C, about half the water frozen at draw and about 80 % at "
    "−25 °C (H. D. Goff and R. W. Hartel, Ice Cream, 7th ed. (2013), from memory; values "
    "invented within its ranges); overrun = (V_ice cream − V_mix)/V_mix ×100 (Goff and Hartel); "
    "latent heat of fusion of water 334 kJ/kg (common practice); regeneration R = (t_r − "
    "t_in)/(t_p − t_in) (common practice); Q = ṁ·c_p·ΔT; water flow q = Q/(4.19·ΔT) in L/s "
    "and US check Btu/h = 500·gpm·ΔT(°F) (ASHRAE Handbook, HVAC Applications, from memory); "
    "ammonia, IIR reference (h = 200 kJ/kg for liquid at 0 °C): saturated at −35 °C p = 93.1 "
    "kPa a, h_g = 1417 kJ/kg, liquid 683 kg/m³; liquid at −5 °C h_f = 177 kJ/kg; saturated at "
    "35 °C p = 1350 kPa a (ASHRAE Handbook, Fundamentals (2017) ch. 30, from memory: check "
    "against the tables); ammonia evaporated = Q/(h_g − h_f), pumped liquid = n × evaporated "
    "with n = 4 (common practice); pump hydraulic hp = gpm·psi/1714 (common practice); air "
    "density p/(R·T), R = 287.05 J/(kg·K) (common practice). Plant, firm and readings invented.")
ic = ItemSheet("Plant", "Brindle Moor Creamery (invented): ice cream line, HTST mix "
               "pasteuriser, four continuous freezers, hardening tunnel, ammonia plant", ICE_SRC)
ic.heading("Mix pasteuriser (HTST with regeneration)")
ic.add("Vm", "Mix flow through the pasteuriser", "V̇_m", 4000, "L/h")
ic.add("rhom", "Density of the mix", "ρ_m", 1.10, "kg/L")
ic.add("mm", "Mix mass flow", "ṁ_m", "={Vm}*{rhom}", "kg/h")
ic.add("mmlb", "Mix mass flow, lb/h (US freezer maker)", "ṁ_m,US", "={mm}*2.205", "lb/h")
ic.add("tin", "Raw mix from the blending tank", "t_in", 5, "°C")
ic.add("tp", "Pasteurising temperature", "t_p", 82, "°C")
ic.add("R", "Regeneration efficiency", "R", 75, "%")
ic.add("tr", "Raw mix leaving the regeneration section", "t_r",
       "={tin}+{R}/100*({tp}-{tin})", "°C")
ic.add("dTh", "Temperature rise in the heating section", "ΔT_h", "={tp}-{tr}", "K")
ic.add("cm", "Specific heat of the mix, above freezing", "c_m", 3.35, "kJ/(kg·K)")
ic.add("Qh", "Heating section duty", "Q_h", "={mm}*{cm}*{dTh}/3600", "kW")
ic.add("QhB", "Heating section duty, Btu/h", "Q_h,US", "={Qh}*3412", "Btu/h")
ic.add("QhB2", "Heating section duty, Btu/h (first draft)", "Q_h,US2", "={Qh}*3.412", "Btu/h",
       planted=("unit-scale", "the W to Btu/h factor put on kW: 1000 too small"))
ic.add("twi", "Hot water into the heating section", "t_wi", 90, "°C")
ic.add("two", "Hot water leaving the heating section", "t_wo", 85, "°C")
ic.add("dTw", "Hot water temperature drop", "ΔT_w", "={twi}-{two}", "K")
ic.add("Vhw", "Hot water flow", "q_hw", "={Qh}/(4.19*{dTw})", "L/s")
ic.add("dTwF", "Hot water temperature drop, °F", "ΔT_w,F", "={dTw}*1.8", "Δ°F")
ic.add("dTwF2", "Hot water temperature drop, °F (first draft)", "ΔT_w,F2", "={dTw}*1.8+32",
       "Δ°F", planted=("offset-scale", "a temperature difference given the +32 of a reading"))
ic.add("VhwUS", "Hot water flow, US check (500·gpm·ΔT)", "q_hw,US", "={QhB}/(500*{dTwF})",
       "gpm")
ic.add("tpF", "Pasteurising temperature, °F (inspector's chart)", "t_p,F", "={tp}*1.8+32", "°F")
ic.add("tc1", "Pasteurised mix leaving the regeneration section", "t_c1",
       "={tp}-{R}/100*({tp}-{tin})", "°C")
ic.add("tout", "Mix to the ageing tanks", "t_out", 4, "°C")
ic.add("Qc", "Cooling section duty (glycol)", "Q_c", "={mm}*{cm}*({tc1}-{tout})/3600", "kW")
ic.add("QcTR", "Cooling section duty, TR", "Q_c,TR", "={Qc}/3.517", "TR")
ic.heading("Continuous freezers")
ic.add("OR", "Overrun", "OR", 100, "%")
ic.add("Vic", "Ice cream leaving the freezers", "V̇_ic", "={Vm}*(1+{OR}/100)", "L/h")
ic.add("Vic2", "Ice cream leaving the freezers (first draft)", "V̇_ic2", "={Vm}*(1+{OR})",
       "L/h", planted=("unit-scale", "overrun in % used as a fraction: 1 + 100 for 1 + 1"))
ic.add("tfp", "Initial freezing point of the mix", "t_fp", -2.5, "°C")
ic.add("tdr", "Draw temperature at the freezer", "t_dr", -5.5, "°C")
ic.add("wc", "Water content of the mix", "w", 62, "%")
ic.add("x1", "Share of the water frozen at draw", "x_1", 50, "%")
ic.add("Lf", "Latent heat of fusion of water", "L_f", 334, "kJ/kg")
ic.add("cf", "Specific heat of the frozen product", "c_f", 1.88, "kJ/(kg·K)")
ic.add("qs1", "Sensible heat, ageing temperature to the freezing point", "q_s1",
       "={cm}*({tout}-{tfp})", "kJ/kg")
ic.add("ql1", "Latent heat of the water frozen in the freezer", "q_l1", "={wc}/100*{x1}/100*{Lf}",
       "kJ/kg")
ic.add("qs2", "Sensible heat, freezing point to draw", "q_s2", "={cf}*({tfp}-{tdr})", "kJ/kg")
ic.add("qfr", "Heat removed per kg of mix in the freezer", "q_fr", "={qs1}+{ql1}+{qs2}", "kJ/kg")
ic.add("Pd", "Dasher motors, four freezers (maker's data, invented)", "P_d", 44, "kW")
ic.add("Qfr", "Freezer refrigeration load", "Q_fr", "={mm}*{qfr}/3600+{Pd}", "kW")
ic.add("Qfr2", "Freezer refrigeration load (first draft)", "Q_fr2", "={mm}*{qfr}+{Pd}", "kW",
       planted=("unit-scale", "kg/h × kJ/kg written as kW: the /3600 missing"))
ic.add("QfrTR", "Freezer refrigeration load, TR", "Q_fr,TR", "={Qfr}/3.517", "TR")
ic.add("QfrTR2", "Freezer refrigeration load, TR (first draft)", "Q_fr,TR2", "={Qfr}*3.517",
       "TR", planted=("unit-scale", "kW to TR multiplied by 3.517: wrong way round"))
ic.add("QfrB", "Freezer refrigeration load, Btu/h", "Q_fr,US", "={Qfr}*3412", "Btu/h")
ic.add("QfrTRc", "Freezer refrigeration load, TR (check from Btu/h)", "Q_fr,TRc",
       "={QfrB}/12000", "TR")
ic.heading("Hardening tunnel")
ic.add("x2", "Share of the water frozen at the hardened core temperature", "x_2", 80, "%")
ic.add("th", "Hardened core temperature", "t_h", -25, "°C")
ic.add("qhd", "Heat removed per kg in hardening", "q_hd",
       "={wc}/100*({x2}-{x1})/100*{Lf}+{cf}*({tdr}-{th})", "kJ/kg")
ic.add("pk", "Packaging and carriers, allowance on the product load (invented)", "a_pk", 12, "%")
ic.add("Qpr", "Product load in the tunnel", "Q_pr", "={mm}*{qhd}/3600*(1+{pk}/100)", "kW")
ic.add("Pf", "Tunnel evaporator fans, motor input (12 × 2.2 kW, invented)", "P_f", 26400, "W")
ic.add("Qtr", "Transmission, infiltration and defrost (invented)", "Q_tr", 38, "kW")
ic.add("Qtun", "Hardening tunnel load", "Q_tun", "={Qpr}+{Pf}/1000+{Qtr}", "kW")
ic.add("Qtun2", "Hardening tunnel load (first draft)", "Q_tun2", "={Qpr}+{Pf}+{Qtr}", "kW",
       planted=("unit-scale", "fan motors in W added to kW"))
ic.add("QtunTR", "Hardening tunnel load, TR", "Q_tun,TR", "={Qtun}/3.517", "TR")
ic.add("ta", "Tunnel air temperature", "t_a", -40, "°C")
ic.add("Ta", "Tunnel air temperature, absolute", "T_a", "={ta}+273.15", "K")
ic.add("Ta2", "Tunnel air temperature, absolute (first draft)", "T_a2", "={ta}", "K",
       planted=("offset-scale", "a °C reading set equal to kelvins"))
ic.add("pb", "Site barometer (invented)", "p_b", 99.6, "kPa")
ic.add("rhoa", "Density of the tunnel air", "ρ_a", "={pb}*1000/(287.05*{Ta})", "kg/m³")
ic.heading("Ammonia (pumped recirculation, −35 °C suction)")
ic.add("Qls", "Low-stage load, freezers and tunnel", "Q_ls", "={Qfr}+{Qtun}", "kW")
ic.add("ps", "Suction pressure, saturated at −35 °C", "p_s", 93.1, "kPa a")
ic.add("hg", "Enthalpy of saturated vapour at −35 °C", "h_g", 1417, "kJ/kg")
ic.add("hf", "Enthalpy of liquid from the intercooler, saturated at −5 °C", "h_f", 177, "kJ/kg")
ic.add("dh", "Refrigerating effect", "Δh", "={hg}-{hf}", "kJ/kg")
ic.add("mr", "Ammonia evaporated", "ṁ_r", "={Qls}/{dh}", "kg/s")
ic.add("mrh", "Ammonia evaporated, kg/h", "ṁ_r,h", "={mr}*3600", "kg/h")
ic.add("mrh2", "Ammonia evaporated, kg/h (first draft)", "ṁ_r,h2", "={Qls}/{dh}", "kg/h",
       planted=("unit-scale", "kg/s written as kg/h: the ×3600 missing"))
ic.add("nc", "Recirculation rate, pumped liquid over evaporated", "n", 4, "-")
ic.add("rhol", "Density of liquid ammonia at −35 °C", "ρ_l", 683, "kg/m³")
ic.add("Vp", "Recirculation pump flow", "V̇_p", "={mrh}*{nc}/{rhol}", "m³/h")
ic.add("Vpg", "Recirculation pump flow, US gpm", "V̇_p,US", "={Vp}*4.403", "gpm")
ic.add("dpp", "Pump differential pressure (invented)", "Δp_p", 180, "kPa")
ic.add("dppsi", "Pump differential pressure, psi", "Δp_p,US", "={dpp}*0.145", "psi")
ic.add("hhp", "Pump hydraulic power, US (gpm·psi/1714)", "P_hyd", "={Vpg}*{dppsi}/1714", "hp")
ic.add("psg", "Suction pressure, gauge", "p_s,g", "={ps}-{pb}", "kPa(g)")
ic.add("pc", "Condensing pressure, saturated at 35 °C", "p_c", 1350, "kPa a")
ic.add("pcg", "Condensing pressure, gauge", "p_c,g", "={pc}-{pb}", "kPa(g)")
ic.add("pcpsig", "Condensing pressure, psig (gauge on the receiver)", "p_c,US", "={pcg}*0.145",
       "psig")
ic.add("pcpsig2", "Condensing pressure, psig (first draft)", "p_c,US2", "={pc}*0.145", "psig",
       planted=("offset-scale", "an absolute pressure converted straight into psig"))
ic.add("cr", "Overall pressure ratio", "r_p", "={pc}/{ps}", "-")
ICES = ic.finish()

ICEB = {
    "trade": "food refrigeration: ice cream mix pasteuriser, continuous freezers, hardening "
             "tunnel and ammonia",
    "sheets": [("Plant", ICES)],
    "planted": dict(ic.planted),
}

# --------------------------------------------------------------------------------------------
# Book 2: billet reheating furnace (t/h, kg/s, lb/h, ton/h, mm, m, kg, 1/h, s, °C, °F, K,
# kJ/(kg·K), kJ/kg, Btu/lb, kW, MW, GJ/h, MMBtu/h, MJ/Nm³, Nm³/h, GJ/t, MMBtu/ton, bar(g), bar a,
# psig, kPa, m³/h, m³/s, %, Nm³/Nm³, kg/Nm³, kg/h, kJ/(Nm³·K), inH2O, hp)
# --------------------------------------------------------------------------------------------
FUR_SRC = (
    "Sources: 1 t = 2205 lb = 1.1023 short ton, 1 Btu/lb = 2.326 kJ/kg, 1 MW = 3.412 MMBtu/h, "
    "1 GJ/t = 0.8598 MMBtu/short ton, 1 bar = 14.50 psi, 1 inH2O = 249.1 Pa, 1 hp = 0.7457 kW "
    "(NIST SP 811 (2008) App. B.8); °F = 1.8·°C + 32 (NIST SP 811); carbon steel density 7850 "
    "kg/m³ (common practice); mean specific heat of plain carbon steel from 25 to 1200 °C, "
    "transformation included, about 0.70 kJ/(kg·K), some 820 kJ/kg to 1200 °C (W. Trinks et al., "
    "Industrial Furnaces, 6th ed. (2004), from memory); furnace efficiency = heat to the steel / "
    "fuel input (common practice); natural gas net calorific value 35.8 MJ/Nm³ and "
    "stoichiometric air 9.5 Nm³ per Nm³ (North American Combustion Handbook, 3rd ed. (1986), "
    "from memory; take the supplier's analysis); wet flue gas ≈ air + 1 Nm³ per Nm³ of gas "
    "(CH4 + 2 O2 → CO2 + 2 H2O keeps the volume, common practice); air 1.293 kg/Nm³ at 0 °C "
    "and 101.325 kPa (Perry's Chemical Engineers' Handbook, 8th ed., from memory); mean "
    "specific heat of air 25 to 450 °C 1.04 kJ/(kg·K), mean volumetric heat capacity of the "
    "flue gas 1.40 kJ/(Nm³·K) (from memory); actual volume = normal volume × (T/273.15) × "
    "(101.325/p) (common practice); fan power = V̇·Δp/η (common practice). Mill, furnace and "
    "readings invented.")
fu = ItemSheet("Furnace", "Corbeck Mill rolling plant (invented): walking-beam billet "
               "reheating furnace, 150 mm billets, recuperative burners on natural gas", FUR_SRC)
fu.heading("Throughput and billets")
fu.add("mt", "Billet throughput", "ṁ", 150, "t/h")
fu.add("mkgs", "Billet throughput, kg/s", "ṁ_s", "={mt}/3.6", "kg/s")
fu.add("mlb", "Billet throughput, lb/h", "ṁ_US", "={mt}*2205", "lb/h")
fu.add("mst", "Billet throughput, short tons an hour (US mill data)", "ṁ_st", "={mt}*1.1023",
       "ton/h")
fu.add("b", "Billet section, side of the square", "b", 150, "mm")
fu.add("Lb", "Billet length", "L_b", 12, "m")
fu.add("rhos", "Density of carbon steel", "ρ_s", 7850, "kg/m³")
fu.add("mb", "Mass of one billet", "m_b", "=({b}/1000)^2*{Lb}*{rhos}", "kg")
fu.add("mb2", "Mass of one billet (first draft)", "m_b2", "={b}^2*{Lb}*{rhos}", "kg",
       planted=("unit-scale", "the side in mm squared beside metres: 10⁶ too large"))
fu.add("nb", "Billets charged per hour", "n_b", "={mt}*1000/{mb}", "1/h")
fu.add("tpit", "Charging interval", "t_ch", "=3600/{nb}", "s")
fu.heading("Heat to the steel")
fu.add("tc", "Charge temperature (cold charge)", "t_c", 25, "°C")
fu.add("td", "Discharge temperature", "t_d", 1200, "°C")
fu.add("cms", "Mean specific heat of the steel, 25 to 1200 °C", "c̄_s", 0.70, "kJ/(kg·K)")
fu.add("q", "Heat to the steel per kg", "q", "={cms}*({td}-{tc})", "kJ/kg")
fu.add("qB", "Heat to the steel, Btu/lb", "q_US", "={q}/2.326", "Btu/lb")
fu.add("qB2", "Heat to the steel, Btu/lb (first draft)", "q_US2", "={q}*2.326", "Btu/lb",
       planted=("unit-scale", "kJ/kg to Btu/lb multiplied by 2.326: wrong way round"))
fu.add("tdF", "Discharge temperature, °F", "t_d,F", "={td}*1.8+32", "°F")
fu.add("Qs", "Heat to the steel", "Q_s", "={mt}*1000*{q}/3600", "kW")
fu.add("Qs2", "Heat to the steel (first draft)", "Q_s2", "={mt}*1000*{q}", "kW",
       planted=("unit-scale", "kg/h × kJ/kg written as kW: the /3600 missing"))
fu.add("QsMW", "Heat to the steel, MW", "Q_s,MW", "={Qs}/1000", "MW")
fu.heading("Fuel")
fu.add("eta", "Furnace efficiency (heat to the steel over fuel, net)", "η_f", 55, "%")
fu.add("Pin", "Fuel input, net", "P_in", "={QsMW}/({eta}/100)", "MW")
fu.add("Pin2", "Fuel input, net (first draft)", "P_in2", "={QsMW}/{eta}", "MW",
       planted=("unit-scale", "a % used as a fraction: 100 too small"))
fu.add("PinGJ", "Fuel input, GJ/h", "P_in,GJ", "={Pin}*3.6", "GJ/h")
fu.add("PinMM", "Fuel input, MMBtu/h (US burner maker)", "P_in,US", "={Pin}*3.412", "MMBtu/h")
fu.add("PinMM2", "Fuel input, MMBtu/h (first draft)", "P_in,US2", "={Pin}*3412", "MMBtu/h",
       planted=("unit-scale", "the kW to Btu/h factor on MW into MMBtu/h: 1000 too large"))
fu.add("NCV", "Net calorific value of the gas", "NCV", 35.8, "MJ/Nm³")
fu.add("Vg", "Natural gas flow", "V̇_g", "={Pin}*3600/{NCV}", "Nm³/h")
fu.add("SEC", "Specific fuel consumption", "SEC", "={PinGJ}/{mt}", "GJ/t")
fu.add("SECUS", "Specific fuel consumption, MMBtu per short ton", "SEC_US", "={SEC}*0.8598",
       "MMBtu/ton")
fu.heading("Gas supply")
fu.add("pg", "Gas pressure at the furnace train", "p_g", 1.5, "bar(g)")
fu.add("pb", "Site barometer (invented)", "p_b", 100.4, "kPa")
fu.add("pa", "Gas pressure at the furnace train, absolute", "p_a", "={pg}+{pb}/100", "bar a")
fu.add("pa2", "Gas pressure at the furnace train, absolute (first draft)", "p_a2", "={pg}",
       "bar a", planted=("offset-scale", "a gauge reading set equal to an absolute pressure"))
fu.add("pgpsig", "Gas pressure, psig (US valve train)", "p_g,US", "={pg}*14.5", "psig")
fu.add("tg", "Gas temperature at the train", "t_g", 15, "°C")
fu.add("Vgl", "Gas flow at line conditions", "V̇_g,line",
       "={Vg}*1.01325/{pa}*({tg}+273.15)/273.15", "m³/h")
fu.heading("Combustion air and preheat")
fu.add("Ast", "Stoichiometric air", "A_st", 9.5, "Nm³/Nm³")
fu.add("EA", "Excess air", "EA", 10, "%")
fu.add("Va", "Combustion air flow", "V̇_a", "={Vg}*{Ast}*(1+{EA}/100)", "Nm³/h")
fu.add("Va2", "Combustion air flow (first draft)", "V̇_a2", "={Vg}*{Ast}*(1+{EA})", "Nm³/h",
       planted=("unit-scale", "excess air in % used as a fraction: 1 + 10 for 1 + 0.1"))
fu.add("rhon", "Density of air at 0 °C, 101.325 kPa", "ρ_n", 1.293, "kg/Nm³")
fu.add("ma", "Combustion air mass flow", "ṁ_a", "={Va}*{rhon}", "kg/h")
fu.add("ta", "Ambient air temperature", "t_a", 25, "°C")
fu.add("tph", "Air preheat temperature after the recuperator", "t_ph", 450, "°C")
fu.add("cpa", "Mean specific heat of air, 25 to 450 °C", "c̄_pa", 1.04, "kJ/(kg·K)")
fu.add("Qph", "Heat returned in the preheated air", "Q_ph", "={ma}*{cpa}*({tph}-{ta})/3600",
       "kW")
fu.add("shph", "Heat returned, share of the fuel input", "s_ph", "={Qph}/({Pin}*1000)*100", "%")
fu.add("tphF", "Air preheat temperature, °F", "t_ph,F", "={tph}*1.8+32", "°F")
fu.add("Tph", "Air preheat temperature, absolute", "T_ph", "={tph}+273.15", "K")
fu.add("Tph2", "Air preheat temperature, absolute (first draft)", "T_ph2", "={tph}", "K",
       planted=("offset-scale", "a °C reading set equal to kelvins"))
fu.add("Vhot", "Hot air to the burners, actual volume", "V̇_hot",
       "={Va}/3600*{Tph}/273.15*101.325/{pb}", "m³/s")
fu.heading("Combustion air fan")
fu.add("dpf", "Fan total pressure (invented)", "Δp_f", 7.5, "kPa")
fu.add("etaf", "Fan efficiency (maker's data, invented)", "η_fan", 78, "%")
fu.add("Vf", "Fan flow, actual at the inlet", "V̇_f", "={Va}/3600*({ta}+273.15)/273.15*101.325/{pb}",
       "m³/s")
fu.add("Pf", "Fan shaft power", "P_f", "={Vf}*{dpf}/({etaf}/100)", "kW")
fu.add("Pfhp", "Fan shaft power, hp", "P_f,US", "={Pf}/0.7457", "hp")
fu.add("dpfin", "Fan total pressure, inH2O (US fan curve)", "Δp_f,US", "={dpf}*1000/249.1",
       "inH2O")
fu.add("dpfin2", "Fan total pressure, inH2O (first draft)", "Δp_f,US2", "={dpf}/249.1", "inH2O",
       planted=("unit-scale", "kPa taken as Pa: 1000 too small"))
fu.heading("Recuperator and stack")
fu.add("cfg", "Mean volumetric heat capacity of the flue gas", "c̄_v", 1.40, "kJ/(Nm³·K)")
fu.add("twg", "Waste gas leaving the furnace", "t_wg", 950, "°C")
fu.add("tst", "Flue gas to the stack, after the recuperator", "t_st", 480, "°C")
fu.add("Vfg", "Wet flue gas flow", "V̇_fg", "={Vg}*(1+{Ast}*(1+{EA}/100))", "Nm³/h")
fu.add("Qrec", "Heat given up by the flue gas in the recuperator", "Q_rec",
       "={Vfg}*{cfg}*({twg}-{tst})/3600", "kW")
fu.add("erec", "Recuperator, heat to the air over heat from the gas", "ε_rec",
       "={Qph}/{Qrec}*100", "%")
fu.add("Qst", "Stack loss", "Q_st", "={Vfg}*{cfg}*({tst}-{ta})/3600", "kW")
fu.add("Lst", "Stack loss, share of the fuel input", "L_st", "={Qst}/({Pin}*1000)*100", "%")
fu.add("Qoth", "Wall, skid and opening losses (by difference)", "Q_oth",
       "={Pin}*1000+{Qph}-{Qs}-{Vfg}*{cfg}*({twg}-{ta})/3600", "kW")
fu.add("tstF", "Flue gas to the stack, °F", "t_st,F", "={tst}*1.8+32", "°F")
FURS = fu.finish()

FURB = {
    "trade": "steel: billet reheating furnace, heat to the steel, gas, air preheat and stack",
    "sheets": [("Furnace", FURS)],
    "planted": dict(fu.planted),
}

# --------------------------------------------------------------------------------------------
# Book 3: metro station tunnel ventilation (m², m, km/h, m/s, fpm, %, m³/s, cfm, kPa, kPa a,
# °C, °F, K, Δ°F, kg/m³, kJ/(kg·K), MW, kW, m/s², kg/s, Pa, inH2O, mmH2O, hp, Btu/h, m³, 1/h)
# --------------------------------------------------------------------------------------------
MET_SRC = (
    "Sources: 1 km/h = 1/3.6 m/s, 1 m/s = 196.9 fpm, 1 m³/s = 2119 cfm, 1 inH2O = 249.1 Pa, "
    "1 mmH2O = 9.81 Pa, 1 hp = 0.7457 kW, 1 kW = 3412 Btu/h (NIST SP 811 (2008) App. B.8); °F "
    "= 1.8·°C + 32 and a difference ×1.8 (NIST SP 811); air R = 287.05 J/(kg·K), c_p = 1.005 "
    "kJ/(kg·K), ρ = p/(R·T) (common practice); g_n = 9.81 m/s² (SI Brochure 9th ed.); critical "
    "velocity V_c = K_g·K_1·(g·H·Q/(ρ·c_p·A·T_f))^(1/3) with T_f = Q/(ρ·c_p·A·V_c) + T, K_1 = "
    "0.606, K_g = 1 on the level, solved by iteration (NFPA 130, Standard for Fixed Guideway "
    "Transit and Passenger Rail Systems, 2017 ed., Annex, from memory); smoke fans rated for "
    "250 °C (EN 12101-3, from memory); fan shaft power P = V̇·p_t/η, US form hp = "
    "cfm·inH2O/(6356·η) (common practice); sensible heat Btu/h = 1.08·cfm·ΔT(°F) (ASHRAE "
    "Handbook, Fundamentals, from memory); stack effect Δp = (ρ_o − ρ_i)·g·H (common "
    "practice). Station, tunnel, trains, design fire, model results and readings invented.")
me = ItemSheet("Tunnel", "Wexcombe Cross station (invented): running tunnels, tunnel "
               "ventilation fans and vent shaft, summer design and smoke control", MET_SRC)
me.heading("Tunnel and train")
me.add("At", "Tunnel cross-section (single track)", "A_t", 24, "m²")
me.add("Ht", "Tunnel height", "H_t", 5.6, "m")
me.add("vk", "Train speed at the tunnel portal", "v_tr,kmh", 80, "km/h")
me.add("vt", "Train speed", "v_tr", "={vk}/3.6", "m/s")
me.add("vt2", "Train speed (first draft)", "v_tr2", "={vk}*3.6", "m/s",
       planted=("unit-scale", "km/h to m/s multiplied by 3.6: wrong way round"))
me.add("Atr", "Train frontal area", "A_tr", 9.8, "m²")
me.add("bl", "Blockage ratio", "β", "={Atr}/{At}*100", "%")
me.add("rp", "Piston air velocity over train speed (1-D tunnel model, invented)", "r_p", 0.42,
       "-")
me.add("vp", "Piston-effect air velocity", "v_p", "={rp}*{vt}", "m/s")
me.add("vpf", "Piston-effect air velocity, fpm", "v_p,US", "={vp}*196.9", "fpm")
me.add("Qp", "Piston-effect air flow", "V̇_p", "={vp}*{At}", "m³/s")
me.add("Qpc", "Piston-effect air flow, cfm", "V̇_p,US", "={Qp}*2119", "cfm")
me.add("Qpc2", "Piston-effect air flow, cfm (first draft)", "V̇_p,US2", "={Qp}*35.31", "cfm",
       planted=("unit-scale", "m³/s to cfm by the ft³ factor alone: the ×60 missing"))
me.heading("Tunnel air")
me.add("pb", "Station barometer (invented)", "p_b", 100.8, "kPa")
me.add("ta", "Tunnel air temperature, summer", "t_a", 28, "°C")
me.add("Ta", "Tunnel air temperature, absolute", "T_a", "={ta}+273.15", "K")
me.add("rho", "Density of the tunnel air", "ρ", "={pb}*1000/(287.05*{Ta})", "kg/m³")
me.add("rho2", "Density of the tunnel air (first draft)", "ρ_2", "={pb}*1000/(287.05*{ta})",
       "kg/m³", planted=("offset-scale", "a °C reading in the gas law where kelvins belong"))
me.add("taF", "Tunnel air temperature, °F", "t_a,F", "={ta}*1.8+32", "°F")
me.add("cp", "Specific heat of air", "c_p", 1.005, "kJ/(kg·K)")
me.heading("Smoke control: critical velocity")
me.add("Qf", "Design fire (invented)", "Q_f", 10, "MW")
me.add("QfkW", "Design fire, kW", "Q_f,kW", "={Qf}*1000", "kW")
me.add("Vg", "Velocity taken for the fire temperature (last iteration)", "V_g", 2.1, "m/s")
me.add("Tf", "Mean temperature of the hot gas at the fire", "T_f",
       "={QfkW}/({rho}*{cp}*{At}*{Vg})+{Ta}", "K")
me.add("gn", "Standard gravity", "g_n", 9.81, "m/s²")
me.add("K1", "Constant K_1 (Froude number to the −1/3)", "K_1", 0.606, "-")
me.add("Kg", "Grade factor, level tunnel", "K_g", 1.0, "-")
me.add("Vc", "Critical velocity", "V_c",
       "={Kg}*{K1}*({gn}*{Ht}*{QfkW}/({rho}*{cp}*{At}*{Tf}))^(1/3)", "m/s")
me.add("Vd", "Design tunnel velocity, 10 % margin", "V_d", "={Vc}*1.1", "m/s")
me.add("Qsm", "Tunnel air flow for smoke control", "V̇_sm", "={Vd}*{At}", "m³/s")
me.add("Qsmc", "Tunnel air flow for smoke control, cfm", "V̇_sm,US", "={Qsm}*2119", "cfm")
me.add("msm", "Mass flow of the smoke and air", "ṁ_sm", "={Qsm}*{rho}", "kg/s")
me.add("ts", "Smoke temperature at the fans (fan rating)", "t_s", 250, "°C")
me.add("rhoh", "Density of the smoke at the fans", "ρ_h", "={rho}*{Ta}/({ts}+273.15)", "kg/m³")
me.add("rhoh2", "Density of the smoke at the fans (first draft)", "ρ_h2", "={rho}*{ta}/{ts}",
       "kg/m³", planted=("offset-scale", "a ratio of °C readings where kelvins belong"))
me.add("Vh", "Smoke flow at the fans, 250 °C", "V̇_h", "={msm}/{rhoh}", "m³/s")
me.heading("Tunnel ventilation fans (two in parallel)")
me.add("nf", "Fans running", "n_f", 2, "-")
me.add("Qfan", "Flow per fan", "V̇_fan", "={Vh}/{nf}", "m³/s")
me.add("Qfanc", "Flow per fan, cfm", "V̇_fan,US", "={Qfan}*2119", "cfm")
me.add("pt", "Fan total pressure (network model, invented)", "p_t", 1150, "Pa")
me.add("ptin", "Fan total pressure, inH2O", "p_t,US", "={pt}/249.1", "inH2O")
me.add("ptin2", "Fan total pressure, inH2O (first draft)", "p_t,US2", "={pt}/9.81", "inH2O",
       planted=("unit-scale", "mm of water written as inches: 25.4 times too large"))
me.add("ptmm", "Fan total pressure, mm of water", "p_t,mm", "={pt}/9.81", "mmH2O")
me.add("etaf", "Fan total efficiency (maker's data, invented)", "η_f", 72, "%")
me.add("Psh", "Fan shaft power", "P_sh", "={Qfan}*{pt}/({etaf}/100)/1000", "kW")
me.add("Psh2", "Fan shaft power (first draft)", "P_sh2", "={Qfan}*{pt}/({etaf}/100)", "kW",
       planted=("unit-scale", "m³/s × Pa gives W, written as kW: the /1000 missing"))
me.add("Phsh", "Fan shaft power, hp", "P_sh,US", "={Psh}/0.7457", "hp")
me.add("PhUS", "Fan shaft power, hp (US check, cfm·inH2O/6356)", "P_sh,US c",
       "={Qfanc}*{ptin}/(6356*{etaf}/100)", "hp")
me.add("Pm", "Motor rating, 15 % margin", "P_m", "={Psh}*1.15", "kW")
me.heading("Station air: ventilation and temperature rise")
me.add("Vpl", "Platform and ticket hall air volume", "V_pl", 14000, "m³")
me.add("ach", "Air changes (design, invented)", "n_ach", 8, "1/h")
me.add("Qach", "Station ventilation by air changes", "V̇_ach", "={Vpl}*{ach}/3600", "m³/s")
me.add("Qach2", "Station ventilation by air changes (first draft)", "V̇_ach2", "={Vpl}*{ach}",
       "m³/s", planted=("unit-scale", "m³ × 1/h written as m³/s: the /3600 missing"))
me.add("Qtr", "Train heat released in the station, braking and HVAC (invented)", "Q_tr", 1.2,
       "MW")
me.add("Qv", "Station ventilation flow (fans and piston effect, invented)", "V̇_v", 160, "m³/s")
me.add("dT", "Air temperature rise through the station", "ΔT", "={Qtr}*1000/({rho}*{cp}*{Qv})",
       "K")
me.add("dTF", "Air temperature rise, °F", "ΔT_F", "={dT}*1.8", "Δ°F")
me.add("dTF2", "Air temperature rise, °F (first draft)", "ΔT_F2", "={dT}*1.8+32", "Δ°F",
       planted=("offset-scale", "a temperature rise given the +32 of a reading"))
me.add("tex", "Air leaving the station", "t_ex", "={ta}+{dT}", "°C")
me.add("texF", "Air leaving the station, °F", "t_ex,F", "={tex}*1.8+32", "°F")
me.add("Qvc", "Station ventilation flow, cfm", "V̇_v,US", "={Qv}*2119", "cfm")
me.add("QUS", "Train heat, US check (1.08·cfm·ΔT)", "Q_US", "=1.08*{Qvc}*{dTF}", "Btu/h")
me.add("QUSkW", "Train heat, US check in kW", "Q_US,kW", "={QUS}/3412", "kW")
me.heading("Vent shaft stack effect (winter night)")
me.add("Hs", "Vent shaft height, track to grille", "H_s", 32, "m")
me.add("to", "Outdoor air", "t_o", -2, "°C")
me.add("tsh", "Air in the shaft", "t_sh", 24, "°C")
me.add("rhoo", "Density of the outdoor air", "ρ_o", "={pb}*1000/(287.05*({to}+273.15))",
       "kg/m³")
me.add("rhoi", "Density of the shaft air", "ρ_i", "={pb}*1000/(287.05*({tsh}+273.15))", "kg/m³")
me.add("dps", "Stack-effect pressure", "Δp_st", "=({rhoo}-{rhoi})*9.81*{Hs}", "Pa")
me.add("dps2", "Stack-effect pressure (first draft)", "Δp_st2", "=({rhoo}-{rhoi})*{Hs}", "Pa",
       planted=("result-unit", "the g left out: a mass per area written as a pressure"))
me.add("dpsin", "Stack-effect pressure, inH2O", "Δp_st,US", "={dps}/249.1", "inH2O")
METS = me.finish()

METB = {
    "trade": "tunnel ventilation: metro station piston effect, critical velocity, fans, heat",
    "sheets": [("Tunnel", METS)],
    "planted": dict(me.planted),
}

# --------------------------------------------------------------------------------------------
# Book 4: poultry hatchery (-, W/1000 eggs, kW, Btu/h, MBH, L/h, m³/h, m³/s, cfm, ppm, °C, °F,
# Δ°F, %, kPa, g/kg, gr/lb, kg/m³, kg/h, g, d, kg/L, gph, lb/h, kJ/(kg·K), kJ/kg, K, L/s, gpm,
# ft, psi, mm, m², m/s, fpm)
# --------------------------------------------------------------------------------------------
HAT_SRC = (
    "Sources: 1 kW = 3412 Btu/h = 3.412 MBH (thousand Btu/h), 1 L = 0.2642 US gal, 1 US gal = "
    "3.785 L, 1 m³/s = 2119 cfm, 1 m/s = 196.9 fpm, 1 psi = 6.895 kPa, 7000 grains to the "
    "pound so 1 g/kg = 7 gr/lb (NIST SP 811 (2008) App. B.8); °F = 1.8·°C + 32 and a "
    "difference ×1.8 (NIST SP 811); embryo heat some 80 W per 1000 eggs averaged over a "
    "multi-stage setter and some 140 W per 1000 eggs in the hatchers, CO2 some 10 L/h per 1000 "
    "eggs in the setters and 18 L/h in the hatchers, egg water loss some 12 % of a 62 g egg "
    "over 18 days (invented within ranges recalled from hatchery practice, from memory; take "
    "the setter maker's data); ventilation for a gas Q = G/(C_i − C_o) (common practice); "
    "humidity ratio W = 0.622·p_w/(p − p_w), saturation pressure of water 6.45 kPa at 37.5 °C "
    "(ASHRAE Handbook, Fundamentals (2017) ch. 1, from memory); moist air c_p = 1.02 kJ/(kg·K) "
    "and latent heat of water 2450 kJ/kg near 20 °C (common practice); air density p/(R·T), "
    "R = 287.05 J/(kg·K) (common practice); US checks Btu/h = 1.08·cfm·ΔT(°F) and Btu/h = "
    "500·gpm·ΔT(°F), water 8.34 lb per US gal and 0.433 psi per ft (ASHRAE Handbook, from "
    "memory); heating water q = Q/(4.19·ΔT) in L/s (common practice). Hatchery, firm and "
    "readings invented.")
ha = ItemSheet("Rooms", "Fellmoor Green hatchery (invented): eight multi-stage setters and "
               "eight hatchers, setter room air handling unit with spray humidifier, winter "
               "design", HAT_SRC)
ha.heading("Eggs and embryo heat")
ha.add("Ns", "Eggs in the setters (8 × 115 200)", "N_s", 921600, "-")
ha.add("qs", "Embryo heat, multi-stage setter average", "q_s", 80, "W/1000 eggs")
ha.add("Nh", "Eggs in the hatchers (8 × 19 200)", "N_h", 153600, "-")
ha.add("qh", "Embryo heat, hatchers (day 19 to 21)", "q_h", 140, "W/1000 eggs")
ha.add("Qes", "Embryo heat, setters", "Q_es", "={Ns}/1000*{qs}/1000", "kW")
ha.add("Qes2", "Embryo heat, setters (first draft)", "Q_es2", "={Ns}/1000*{qs}", "kW",
       planted=("unit-scale", "W per 1000 eggs times thousands of eggs written as kW: the "
                              "/1000 missing"))
ha.add("Qeh", "Embryo heat, hatchers", "Q_eh", "={Nh}/1000*{qh}/1000", "kW")
ha.add("QesB", "Embryo heat, setters, Btu/h", "Q_es,US", "={Qes}*3412", "Btu/h")
ha.heading("Ventilation for CO2")
ha.add("Gs", "CO2 given off per 1000 eggs, setters", "G_s", 10, "L/h")
ha.add("Ci", "CO2 held in the setters, upper limit", "C_i", 4000, "ppm")
ha.add("Co", "CO2 in the supply air", "C_o", 420, "ppm")
ha.add("Gt", "CO2 given off, all setters", "G_t", "={Ns}/1000*{Gs}/1000", "m³/h")
ha.add("Qco", "Setter ventilation for CO2", "V̇_s", "={Gt}/(({Ci}-{Co})/1000000)", "m³/h")
ha.add("Qco2", "Setter ventilation for CO2 (first draft)", "V̇_s2", "={Gt}/({Ci}-{Co})", "m³/h",
       planted=("unit-scale", "ppm used as a fraction: 10⁶ too small"))
ha.add("Qcos", "Setter ventilation, m³/s", "V̇_s,s", "={Qco}/3600", "m³/s")
ha.add("Qcoc", "Setter ventilation, cfm", "V̇_s,US", "={Qcos}*2119", "cfm")
ha.add("Gh", "CO2 given off per 1000 eggs, hatchers", "G_h", 18, "L/h")
ha.add("Chi", "CO2 held in the hatchers, upper limit", "C_hi", 7000, "ppm")
ha.add("Gth", "CO2 given off, all hatchers", "G_th", "={Nh}/1000*{Gh}/1000", "m³/h")
ha.add("Qhv", "Hatcher ventilation for CO2", "V̇_h", "={Gth}/(({Chi}-{Co})/1000000)", "m³/h")
ha.heading("Humidity in the setters")
ha.add("tset", "Setter dry bulb", "t_set", 37.5, "°C")
ha.add("RH", "Setter relative humidity", "φ", 55, "%")
ha.add("pws", "Saturation pressure of water at 37.5 °C (tables)", "p_ws", 6.45, "kPa")
ha.add("pb", "Site barometer (invented)", "p_b", 99.8, "kPa")
ha.add("pw", "Partial pressure of the water vapour", "p_w", "={RH}/100*{pws}", "kPa")
ha.add("pw2", "Partial pressure of the water vapour (first draft)", "p_w2", "={RH}*{pws}", "kPa",
       planted=("unit-scale", "relative humidity in % used as a fraction: 100 too large"))
ha.add("Wr", "Humidity ratio in the setters", "W_r", "=0.622*{pw}/({pb}-{pw})*1000", "g/kg")
ha.add("Wrg", "Humidity ratio in the setters, gr/lb", "W_r,US", "={Wr}*7", "gr/lb")
ha.add("Wrg2", "Humidity ratio in the setters, gr/lb (first draft)", "W_r,US2", "={Wr}*7000",
       "gr/lb", planted=("unit-scale", "the kg/kg factor put on g/kg: 1000 too large"))
ha.add("Wo", "Outdoor humidity ratio, winter design (invented)", "W_o", 2.2, "g/kg")
ha.add("to", "Outdoor air, winter design", "t_o", -5, "°C")
ha.add("rhoo", "Density of the outdoor air", "ρ_o", "={pb}*1000/(287.05*({to}+273.15))", "kg/m³")
ha.add("rhoo2", "Density of the outdoor air (first draft)", "ρ_o2", "={pb}*1000/(287.05*{to})",
       "kg/m³", planted=("offset-scale", "a °C reading in the gas law where kelvins belong"))
ha.add("ma", "Outdoor air mass flow to the setters", "ṁ_a", "={Qco}*{rhoo}", "kg/h")
ha.add("mwv", "Water to bring the air to the setter humidity", "ṁ_w", "={ma}*({Wr}-{Wo})/1000",
       "kg/h")
ha.add("meg", "Mass of an egg at setting", "m_egg", 62, "g")
ha.add("wl", "Egg water loss over the setter period", "w_l", 12, "%")
ha.add("di", "Setter period", "t_s", 18, "d")
ha.add("mel", "Water given off by the eggs", "ṁ_e", "={Ns}*{meg}*{wl}/100/({di}*24)/1000",
       "kg/h")
ha.add("mh", "Humidifier water", "ṁ_h", "={mwv}-{mel}", "kg/h")
ha.add("rhow", "Density of water", "ρ_w", 1.0, "kg/L")
ha.add("mhL", "Humidifier water, L/h", "q_h", "={mh}/{rhow}", "L/h")
ha.add("mhg", "Humidifier water, US gal/h (US humidifier maker)", "q_h,US", "={mhL}*0.2642",
       "gph")
ha.add("mhg2", "Humidifier water, US gal/h (first draft)", "q_h,US2", "={mhL}*3.785", "gph",
       planted=("unit-scale", "L to US gal multiplied by 3.785: wrong way round"))
ha.add("mhlb", "Humidifier water, lb/h (8.34 lb/gal)", "ṁ_h,US", "={mhg}*8.34", "lb/h")
ha.heading("Heating the setter room air (AHU)")
ha.add("cpa", "Specific heat of moist air", "c_p", 1.02, "kJ/(kg·K)")
ha.add("tsup", "Supply air to the setter room", "t_sup", 24, "°C")
ha.add("Qht", "Heating coil, sensible", "Q_ht", "={ma}*{cpa}*({tsup}-{to})/3600", "kW")
ha.add("Qht2", "Heating coil, sensible (first draft)", "Q_ht2", "={ma}*{cpa}*({tsup}-{to})", "kW",
       planted=("unit-scale", "kg/h × kJ/kg written as kW: the /3600 missing"))
ha.add("hfg", "Latent heat of evaporation of water", "h_fg", 2450, "kJ/kg")
ha.add("Qev", "Heat taken up by the spray humidifier", "Q_ev", "={mh}*{hfg}/3600", "kW")
ha.add("Qtot", "Heating coil duty, sensible and humidifier", "Q_tot", "={Qht}+{Qev}", "kW")
ha.add("QMBH", "Heating coil duty, MBH (US coil maker)", "Q_tot,US", "={Qtot}*3.412", "MBH")
ha.add("QMBH2", "Heating coil duty, MBH (first draft)", "Q_tot,US2", "={Qtot}*3412", "MBH",
       planted=("unit-scale", "the kW to Btu/h factor into MBH: 1000 too large"))
ha.add("dTF", "Air temperature rise across the coil, °F", "ΔT_F", "=({tsup}-{to})*1.8", "Δ°F")
ha.add("QUS", "Heating coil, sensible, US check (1.08·cfm·ΔT)", "Q_ht,US", "=1.08*{Qcoc}*{dTF}",
       "Btu/h")
ha.add("twf", "Heating water flow temperature", "t_wf", 70, "°C")
ha.add("twr", "Heating water return temperature", "t_wr", 50, "°C")
ha.add("dTw", "Heating water temperature drop", "ΔT_w", "={twf}-{twr}", "K")
ha.add("Vw", "Heating water flow", "q_w", "={Qtot}/(4.19*{dTw})", "L/s")
ha.add("Vwg", "Heating water flow, US gpm (500·gpm·ΔT)", "q_w,US", "={Qtot}*3412/(500*{dTw}*1.8)",
       "gpm")
ha.heading("Humidifier supply and duct")
ha.add("hft", "Header tank above the spray nozzles (US-built humidifier)", "h_t", 18, "ft")
ha.add("pst", "Static pressure at the nozzles", "p_st", "=0.433*{hft}", "psi")
ha.add("pstk", "Static pressure at the nozzles, kPa", "p_st,SI", "={pst}*6.895", "kPa")
ha.add("Dd", "Supply duct diameter", "D_d", 450, "mm")
ha.add("Ad", "Supply duct area", "A_d", "=PI()*({Dd}/1000)^2/4", "m²")
ha.add("Ad2", "Supply duct area (first draft)", "A_d2", "=PI()*{Dd}^2/4", "m²",
       planted=("unit-scale", "a diameter in mm squared written as m²: 10⁶ too large"))
ha.add("vd", "Supply duct velocity", "v_d", "={Qcos}/{Ad}", "m/s")
ha.add("vdf", "Supply duct velocity, fpm", "v_d,US", "={vd}*196.9", "fpm")
HATS = ha.finish()

HATB = {
    "trade": "agricultural HVAC: hatchery setters and hatchers, CO2, humidity and heating",
    "sheets": [("Rooms", HATS)],
    "planted": dict(ha.planted),
}

BOOKS = {"icecream-plant-brindle-moor": ICEB, "reheat-furnace-corbeck-mill": FURB,
         "metro-vent-wexcombe-cross": METB, "hatchery-fellmoor-green": HATB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()

# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.
