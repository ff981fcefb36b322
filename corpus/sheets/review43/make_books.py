#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review43), written with the
standard library only (corpus/sheets/xlsx_writer.py and item_sheet.py, shared by the review
books), adapted like review41 and after its pattern (corpus/sheets/review41/make_books.py).

Trades: a brewery's wort boiling and steam demand; a mine's dewatering and pit lake water
balance; a gas compressor station's fuel use and emissions; a warehouse roof's snow load and
purlin check. All scenarios, sites, firms, readings and catalogue data are invented
(demonstration only); the formulas and published factors are the trade's own, with their sources
named in a text cell at the top of each sheet ("from memory" where recalled and not checked,
"common practice" for a fact of the trade with no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. The findings plumb makes beyond the planted ones, the planted cells it misses
or names by another rule, and its messages that mislead, are recorded with their reasons in
review_notes.py (EXTRA, MISSED, RENAMED, MESSAGES, HEADNOTE) after running the binary of the day.

Run: python3 make_books.py  ->  *.xlsx, *.expect (where absent; --expect rewrites them) in this
folder (these books need no .cells.plumb sidecar: the units are typed beside the cells, as the
trades type them)
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
# Book 1: brewery wort boiling and steam demand (hL, kg/h and lb/h, kJ/kg and Btu/lb, %,
# °C and °F, kW and MW, barg and bar(a))
# --------------------------------------------------------------------------------------------
BREW_SRC = (
    "Sources: saturated steam properties (t_sat, h_fg at 2 to 7 bar a) and latent heat of water "
    "2257 kJ/kg at 100 °C, density of water 958 kg/m³ at 100 °C, 999.5 kg/m³ at 12 °C, 998.2 "
    "kg/m³ at 20 °C: IAPWS-IF97 as tabulated in Rogers & Mayhew, Thermodynamic and Transport "
    "Properties of Fluids, 5th ed. (1995) (from memory); wort of 12 °P: specific gravity 1.048 "
    "(ASBC extract tables, from memory), specific heat 3.95 kJ/(kg·K) (common practice, from "
    "memory); evaporation 4 to 8 % per hour of boil, shrinkage on cooling about 4 % (common "
    "practice); water 4.19 kJ/(kg·K) (common practice); standard atmosphere 1.01325 bar (ISO "
    "2533:1975); NIST SP 811 (2008) App. B.8: 1 kg = 2.205 lb, 1 Btu/lb = 2.326 kJ/kg "
    "(exact), 1 kWh = 3.6 MJ, t/°F = 1.8·t/°C + 32; natural gas LHV 36.0 MJ/Nm³ (common "
    "practice, from memory). Brewery, kettle and readings invented.")
br = ItemSheet("Kettle", "Kestrel Ford Brewing Co., 130 hL brewhouse: wort boil energy and "
               "steam demand (invented scenario)", BREW_SRC)
br.add("V0", "Pre-boil wort volume (kettle full)", "V_0", 130, "hL")
br.add("ev", "Evaporation rate (share of pre-boil volume)", "e", 6, "%/h")
br.add("tb", "Boil time", "t_boil", 70, "min")
br.add("Vev", "Volume evaporated", "V_ev", "={V0}*{ev}/100*{tb}/60", "hL")
br.add("Vev2", "Volume evaporated (brewer's log sheet)", "V_ev,2", "={V0}*{ev}/100*{tb}", "hL",
       planted=("unit-scale", "boil time in min used as hours: 60 too large"))
br.add("evp", "Total evaporation", "E_tot", "={Vev}/{V0}*100", "%")
br.add("Vc", "Cast-out volume, hot", "V_c", "={V0}-{Vev}", "hL")
br.add("shr", "Shrinkage on cooling", "s", 4, "%")
br.add("Vcold", "Cast-out volume, cold (to fermenter)", "V_cold", "={Vc}*(1-{shr}/100)", "hL")
br.add("Vcold2", "Cast-out volume, cold (packaging plan)", "V_cold,2", "={Vc}*(1-{shr})", "hL",
       planted=("unit-scale", "shrinkage in % used as a fraction (1 - 4 instead of 1 - 0.04)"))
br.add("SG", "Wort specific gravity (12 °P)", "SG", 1.048, "-")
br.add("rho", "Wort density", "rho", "={SG}*998.2", "kg/m³")
br.add("m", "Wort mass in the kettle", "m", "={V0}/10*{rho}", "kg")
br.add("m2", "Wort mass in the kettle (first draft)", "m_2", "={V0}*{rho}", "kg",
       planted=("unit-scale", "hL times kg/m³ without the /10 (0.1 m³ per hL): 10 too large"))
br.add("cp", "Specific heat of wort", "c_p", 3.95, "kJ/(kg·K)")
br.add("t1", "Wort temperature from the lauter tun", "t_1", 72, "°C")
br.add("tbp", "Boiling point in the kettle", "t_b", 100, "°C")
br.add("Qh", "Heat to bring the wort to the boil", "Q_h", "={m}*{cp}*({tbp}-{t1})/1000", "MJ")
br.add("Qh2", "Heat to bring the wort to the boil (boiling point in K)", "Q_h,2",
       "={m}*{cp}*({tbp}+273.15-{t1})/1000", "MJ",
       planted=("offset-scale", "a kelvin reading less a °C reading: 273 K too much"))
br.add("rw", "Density of water at 100 °C", "rho_w", 958, "kg/m³")
br.add("mev", "Mass evaporated", "m_ev", "={Vev}/10*{rw}", "kg")
br.add("hfg0", "Latent heat of water at 100 °C", "h_fg,0", 2257, "kJ/kg")
br.add("Qev", "Heat to evaporate", "Q_ev", "={mev}*{hfg0}/1000", "MJ")
br.add("loss", "Heat loss allowance (shell, vapour stack)", "f_loss", 5, "%")
br.add("Q", "Boil energy per brew, with losses", "Q", "=({Qh}+{Qev})*(1+{loss}/100)", "MJ")
br.add("QkWh", "Boil energy per brew, kWh", "Q_kWh", "={Q}/3.6", "kWh")
br.add("ps", "Steam pressure at the kettle (gauge)", "p_s", 3.0, "barg")
br.add("pa", "Standard atmosphere", "p_atm", 1.01325, "bar")
br.add("pabs", "Steam pressure, absolute", "p_s,abs", "={ps}+{pa}", "bar(a)")
br.add("tsat", "Saturation temperature", "t_sat", "=VLOOKUP({pabs},Steam!A5:C10,2)", "°C")
br.add("hfg", "Latent heat of the steam", "h_fg", "=VLOOKUP({pabs},Steam!A5:C10,3)", "kJ/kg")
br.add("hfg2", "Latent heat of the steam (looked up at the gauge reading)", "h_fg,2",
       "=VLOOKUP({ps},Steam!A5:C10,3)", "kJ/kg",
       planted=("offset-scale", "gauge pressure used as the key of a table in bar absolute"))
br.add("hfgUS", "Latent heat of the steam, Btu/lb", "h_fg,US", "={hfg}/2.326", "Btu/lb")
br.add("hfgUS2", "Latent heat of the steam, Btu/lb (US boiler vendor form)", "h_fg,US2",
       "={hfg}*2.326", "Btu/lb",
       planted=("unit-scale", "kJ/kg to Btu/lb multiplied by 2.326: wrong way round"))
br.add("tsatF", "Saturation temperature, °F", "t_sat,F", "={tsat}*1.8+32", "°F")
br.add("ms", "Steam per brew", "m_s", "={Q}*1000/{hfg}", "kg")
br.add("msb", "Steam rate during the boil", "m_s,b",
       "={Qev}*(1+{loss}/100)*1000/{hfg}/({tb}/60)", "kg/h")
br.add("msbUS", "Steam rate during the boil, lb/h", "m_s,US", "={msb}*2.205", "lb/h")
br.add("msbUS2", "Steam rate during the boil, lb/h (boiler house log)", "m_s,US2",
       "={msb}/2.205", "lb/h",
       planted=("unit-scale", "kg/h to lb/h divided by 2.205: wrong way round"))
br.add("Pb", "Heat duty during the boil", "P_b", "={Qev}*(1+{loss}/100)*1000/({tb}*60)", "kW")
br.add("Pb2", "Heat duty during the boil (first draft)", "P_b,2",
       "={Qev}*(1+{loss}/100)*1000/{tb}", "kW",
       planted=("unit-scale", "kJ per minute written as kW: 60 too large"))
br.add("PbMW", "Heat duty during the boil, MW", "P_b,MW", "={Pb}/1000", "MW")
br.add("U", "Overall heat transfer coefficient, calandria", "U", 1800, "W/(m²·K)")
br.add("A", "Calandria heating surface", "A", 14, "m²")
br.add("dTb", "Steam to wort temperature difference at the boil", "ΔT_b", "={tsat}-{tbp}", "K")
br.add("Pcap", "Calandria capacity at the boil", "P_cap", "={U}*{A}*{dTb}/1000", "kW")
br.add("Pcap2", "Calandria capacity at the boil (vendor check)", "P_cap,2", "={U}*{A}*{dTb}",
       "kW", planted=("unit-scale", "U·A·ΔT in W written as kW: 1000 too large"))
br.add("chk", "Calandria capacity check", "check", "=IF({Pcap}>={Pb},\"OK\",\"UNDERSIZED\")")
br.add("tm", "Mean wort temperature during heat-up", "t_m", "=({t1}+{tbp})/2", "°C")
br.add("Pup", "Calandria output during heat-up", "P_up", "={U}*{A}*({tsat}-{tm})/1000", "kW")
br.add("tup", "Heat-up time", "t_up", "={Qh}*(1+{loss}/100)*1000/{Pup}/60", "min")
br.add("rec", "Vapour condenser heat recovery", "r", 80, "%")
br.add("Qrec", "Heat recovered from the vapour per brew", "Q_rec", "={Qev}*{rec}/100", "MJ")
br.add("tcw", "Brewing water into the vapour condenser", "t_cw", 12, "°C")
br.add("thw", "Hot water out of the vapour condenser", "t_hw", 80, "°C")
br.add("mhw", "Hot water produced per brew", "m_hw", "={Qrec}*1000/(4.19*({thw}-{tcw}))", "kg")
br.add("rcw", "Density of water at 12 °C", "rho_cw", 999.5, "kg/m³")
br.add("Vhw", "Hot water produced per brew, volume", "V_hw", "={mhw}/{rcw}*10", "hL")
br.add("eta", "Steam boiler efficiency (on LHV)", "eta_b", 88, "%")
br.add("LHV", "Natural gas lower heating value", "LHV", 36.0, "MJ/Nm³")
br.add("Vg", "Gas burned for the kettle per brew", "V_g", "={Q}/({eta}/100)/{LHV}", "Nm³")
br.add("nb", "Brews per week", "n_b", 18, "-")
br.add("msw", "Steam for boiling per week", "m_s,wk", "={nb}*{ms}/1000", "t")
br.add("Ew", "Boil energy per week", "E_wk", "={nb}*{QkWh}/1000", "MWh")
br.add("Vgw", "Gas for the kettle per week", "V_g,wk", "={nb}*{Vg}", "Nm³")
KETTLE = br.finish()

STEAM = {
    "A1": "Saturated steam by absolute pressure (IAPWS-IF97 values as tabulated in Rogers & "
          "Mayhew 5th ed., from memory)",
    "A2": "Sources: Rogers & Mayhew, Thermodynamic and Transport Properties of Fluids, 5th ed. "
          "(1995) (from memory; check against the tables before use).",
    "A3": CAUTION,
    "A4": "p [bar a]", "B4": "t_sat [°C]", "C4": "h_fg [kJ/kg]",
}
for r, row in enumerate([(2, 120.2, 2201.6), (3, 133.5, 2163.2), (4, 143.6, 2133.4),
                         (5, 151.8, 2107.4), (6, 158.8, 2085.8), (7, 165.0, 2066.0)], start=5):
    for c, v in zip("ABC", row):
        STEAM[f"{c}{r}"] = v

BREW = {
    "trade": "brewing: wort boil energy and steam demand",
    "sheets": [("Kettle", KETTLE), ("Steam", STEAM)],
    "planted": {**br.planted},
}

# --------------------------------------------------------------------------------------------
# Book 2: mine dewatering and pit lake water balance (mm, mm/month, mm/d, ha and m², m³/d and
# L/s, kW and kWh/yr)
# --------------------------------------------------------------------------------------------
MINE_SRC = (
    "Sources: runoff V = C·P·A (rational method volume, common practice); lake evaporation = "
    "pan coefficient 0.7 × pan evaporation, Linsley, Kohler & Paulhus, Hydrology for Engineers, "
    "3rd ed. (1982) (from memory); 1 ha = 10 000 m², SI Brochure 9th ed. Table 8; 1 L/s = 86.4 "
    "m³/d (exact); hydraulic power P = ρ·g·Q·H/η with ρ·g = 9.81 kN/m³ for water (common "
    "practice); Hazen-Williams in SI, h_f = 10.67·L·Q^1.852/(C^1.852·D^4.87) with Q in m³/s "
    "and D in m, C = 140 for HDPE (common practice, from memory); minor losses taken as 10 % "
    "of friction (common practice); 8760 h per year of 365 days. Pit, climate record, "
    "groundwater model result and tariff invented.")
mi = ItemSheet("Balance", "Corrie Dubh open pit: dewatering and pit lake water balance "
               "(invented scenario)", MINE_SRC)
mi.add("Ac", "Catchment reporting to the pit (lake included)", "A_c", 185, "ha")
mi.add("Al", "Pit lake surface area", "A_l", 42, "ha")
mi.add("Alm", "Pit lake surface area, m²", "A_l,m2", "={Al}*10000", "m²")
mi.add("Aland", "Catchment land area (lake excluded)", "A_land", "=({Ac}-{Al})*10000", "m²")
mi.add("Cr", "Runoff coefficient, pit walls and benches", "C_r", 0.45, "-")
mi.add("kp", "Pan coefficient", "k_p", 0.7, "-")
mi.add("Prain", "Annual rainfall", "P", "=Climate!C17", "mm")
mi.add("Epan", "Annual pan evaporation", "E_pan", "=Climate!B19", "mm")
mi.add("Vr", "Rain on the lake, annual", "V_r", "={Prain}/1000*{Alm}", "m³")
mi.add("Vro", "Runoff to the pit, annual", "V_ro", "={Prain}/1000*{Aland}*{Cr}", "m³")
mi.add("Vro2", "Runoff to the pit, annual (rev. A)", "V_ro,2", "={Prain}/1000*({Ac}-{Al})*{Cr}", "m³",
       planted=("unit-scale", "catchment in ha not converted to m²: 10 000 too small"))
mi.add("Ve", "Lake evaporation, annual", "V_e", "={Epan}*{kp}/1000*{Alm}", "m³")
mi.add("Qgw", "Groundwater inflow to the pit (numerical model)", "Q_gw", 2400, "m³/d")
mi.add("Vgw", "Groundwater inflow, annual", "V_gw", "={Qgw}*Climate!B17", "m³")
mi.add("Vnet", "Net annual inflow to be pumped", "V_net", "={Vr}+{Vro}+{Vgw}-{Ve}", "m³")
mi.add("Qav", "Mean pumping rate", "Q_av", "={Vnet}/Climate!B17", "m³/d")
mi.add("Qavl", "Mean pumping rate, L/s", "Q_av,L", "={Qav}/86.4", "L/s")
mi.add("Qavl2", "Mean pumping rate, L/s (pump enquiry)", "Q_av,L2", "={Qav}/86400", "L/s",
       planted=("unit-scale", "m³/d over 86 400 gives m³/s, written as L/s: 1000 too small"))
mi.add("Pd", "Design wet-month rainfall, 1 in 10 yr (31-day month)", "P_d", 310, "mm/month")
mi.add("Pdd", "Design wet-month rainfall, daily mean", "P_d,d", "={Pd}/31", "mm/d")
mi.add("Epw", "Lake evaporation in the wettest month", "E_w",
       "=INDEX(Climate!D5:D16,MATCH(Climate!C18,Climate!C5:C16,0))*{kp}", "mm/d")
mi.add("Qd", "Design inflow, wet month", "Q_d",
       "=({Pdd}-{Epw})/1000*{Alm}+{Pdd}/1000*{Aland}*{Cr}+{Qgw}", "m³/d")
mi.add("Qdl", "Design inflow, L/s", "Q_d,L", "={Qd}/86.4", "L/s")
mi.add("Np", "Duty pumps (each on its own rising main)", "N_p", 2, "-")
mi.add("Qp", "Flow per pump (design inflow + 20 %)", "Q_p", "={Qdl}*1.2/{Np}", "L/s")
mi.add("Qpm", "Flow per pump, m³/s", "Q_p,m3", "={Qp}/1000", "m³/s")
mi.add("Hs", "Static lift, sump to discharge pond", "H_s", 118, "m")
mi.add("D", "Rising main internal diameter", "D", 250, "mm")
mi.add("Lp", "Rising main length", "L", 1450, "m")
mi.add("Chw", "Hazen-Williams C (HDPE)", "C_HW", 140, "-")
mi.add("v", "Velocity in the rising main", "v", "={Qpm}/(PI()/4*({D}/1000)^2)", "m/s")
mi.add("v2", "Velocity in the rising main (hand check)", "v_2", "={Qpm}/(PI()/4*{D}^2)", "m/s",
       planted=("unit-scale", "diameter in mm used as m: 10⁶ too small"))
mi.add("hf", "Friction loss, Hazen-Williams", "h_f",
       "=10.67*{Lp}*{Qpm}^1.852/({Chw}^1.852*({D}/1000)^4.87)", "m")
mi.add("H", "Total dynamic head (minor losses 10 % of friction)", "H", "={Hs}+1.1*{hf}", "m")
mi.add("eta", "Pump efficiency", "eta_p", 74, "%")
mi.add("Pw", "Pump shaft power", "P", "=9.81*{Qpm}*{H}/({eta}/100)", "kW")
mi.add("P2", "Pump shaft power (data sheet)", "P_2", "=9.81*{Qpm}*{H}/{eta}", "kW",
       planted=("unit-scale", "efficiency in % used as a fraction: 100 too small"))
mi.add("P3", "Pump shaft power (from ρ·g·Q·H)", "P_3", "=1000*9.81*{Qpm}*{H}/({eta}/100)", "kW",
       planted=("unit-scale", "ρ·g·Q·H/η in W written under kW: 1000 too large"))
mi.add("Pm", "Motor rating (15 % margin, next 10 kW)", "P_m", "=ROUNDUP({Pw}*1.15,-1)", "kW")
mi.add("etam", "Motor efficiency", "eta_m", 95, "%")
mi.add("util", "Share of the year both pumps run", "u", "={Qav}/({Np}*{Qp}*86.4)*100", "%")
mi.add("E", "Pumping energy per year", "E", "={Np}*{Pw}/({etam}/100)*8760*{util}/100", "kWh/yr")
mi.add("E2", "Pumping energy per year (budget sheet)", "E_2",
       "={Np}*{Pw}/({etam}/100)*8760*{util}/100/1000", "kWh/yr",
       planted=("unit-scale", "MWh/yr written as kWh/yr: 1000 too small"))
mi.add("tar", "Electricity tariff", "c_e", 0.11, "$/kWh")
mi.add("cost", "Pumping cost per year", "C", "={E}*{tar}", "$/yr")
mi.add("rise", "Lake rise with all pumps stopped (wet month)", "dh/dt", "={Qd}/{Alm}*1000", "mm/d")
mi.add("rise2", "Lake rise with all pumps stopped (shift report)", "dh/dt_2", "={Qd}/{Al}", "mm/d",
       planted=("unit-scale", "lake area in ha used as m² and m as mm: 10 too large"))
BAL = mi.finish()

CLIMATE = {
    "A1": "Corrie Dubh: mean monthly rainfall and pan evaporation (invented record)",
    "A2": "Sources: site station record (invented); monthly rainfall is the month's total depth; "
          "pan evaporation is the month's mean daily rate (common practice).",
    "A3": CAUTION,
    "A4": "Month", "B4": "Days [d]", "C4": "Rain [mm]", "D4": "Pan evaporation [mm/d]",
    "A17": "Year", "B17": "=SUM(B5:B16)", "C17": "=SUM(C5:C16)",
    "A18": "Wettest month", "C18": "=MAX(C5:C16)",
    "A19": "Annual pan evaporation", "B19": "=SUMPRODUCT(B5:B16,D5:D16)", "C19": "mm",
    "A20": "Annual pan evaporation (quick sum)", "B20": "=SUM(D5:D16)", "C20": "mm",
}
for r, row in enumerate([("Jan", 31, 210, 5.8), ("Feb", 28, 185, 5.4), ("Mar", 31, 160, 5.0),
                         ("Apr", 30, 95, 4.6), ("May", 31, 40, 4.2), ("Jun", 30, 15, 3.8),
                         ("Jul", 31, 8, 4.0), ("Aug", 31, 10, 4.8), ("Sep", 30, 22, 5.9),
                         ("Oct", 31, 60, 6.8), ("Nov", 30, 120, 7.0), ("Dec", 31, 175, 6.4)],
                        start=5):
    for c, v in zip("ABCD", row):
        CLIMATE[f"{c}{r}"] = v

MINE = {
    "trade": "mine water: pit dewatering and pit lake water balance",
    "sheets": [("Balance", BAL), ("Climate", CLIMATE)],
    "planted": {**mi.planted,
                "Climate!B20": ("result-unit", "annual pan evaporation summed from the monthly "
                                "mean daily rates (mm/d), the days left out")},
}

# --------------------------------------------------------------------------------------------
# Book 3: gas compressor station fuel and emissions (MMscfd and Nm³/h, hp and kW, Btu/hp·h and
# kJ/kWh, psig, psia and bar abs, °F, °R, °C and K)
# --------------------------------------------------------------------------------------------
GAS_SRC = (
    "Sources: gas power ghp = 0.0857·Q·Z·T_1·k/(k-1)·(r^((k-1)/k) - 1)/η_s with Q in MMscfd and "
    "T_1 in °R, GPSA Engineering Data Book 13th ed. (2012) sec. 13 (from memory; 0.0857 = "
    "14.696 psia × 10⁶ ft³/d / 519.67 °R in hp); isentropic discharge temperature T_2 = "
    "T_1·r^((k-1)/k) (common practice); standard conditions 60 °F and 14.696 psia, normal 0 °C "
    "and 101.325 kPa: 1 MMscfd = 1116 Nm³/h (28 316.85 m³ × 273.15/288.71 / 24 h, NIST SP 811 "
    "(2008) App. B.8 and the ideal gas law, common practice); NIST SP 811 (2008) App. B.8: 1 hp "
    "= 0.7457 kW, 1 psi = 0.06895 bar, 1 Btu/(hp·h) = 1.415 kJ/kWh (1055.06 J over 0.7457 kW·h); "
    "T/°R = t/°F + 459.67; CO2 53.06 kg/MMBtu on HHV, US EPA 40 CFR 98 subpart C Table C-1 "
    "(from memory); pipeline gas HHV/LHV 1.109 and LHV 920 Btu/scf (common practice, from "
    "memory); discharge temperature limit 300 °F (common practice, from memory). Station, "
    "engines and readings invented.")
gs = ItemSheet("Station", "Tallow Creek compressor station: fuel gas and emissions "
               "(invented scenario)", GAS_SRC)
gs.add("Q", "Station throughput (contract)", "Q", 180, "MMscfd")
gs.add("QN", "Station throughput, normal", "Q_N", "={Q}*1116", "Nm³/h")
gs.add("ps", "Suction pressure", "p_s", 650, "psig")
gs.add("pd", "Discharge pressure", "p_d", 1150, "psig")
gs.add("pb", "Site barometric pressure", "p_b", 14.4, "psia")
gs.add("psa", "Suction pressure, absolute", "p_s,a", "={ps}+{pb}", "psia")
gs.add("pda", "Discharge pressure, absolute", "p_d,a", "={pd}+{pb}", "psia")
gs.add("psbar", "Suction pressure, bar abs", "p_s,bar", "={psa}*0.06895", "bar abs")
gs.add("psbar2", "Suction pressure, bar abs (vendor datasheet)", "p_s,bar2", "={ps}*0.06895",
       "bar abs", planted=("offset-scale", "gauge reading converted and written as absolute"))
gs.add("r", "Compression ratio", "r", "={pda}/{psa}", "-")
gs.add("r2", "Compression ratio (first pass)", "r_2", "={pd}/{ps}", "-",
       planted=("offset-scale", "ratio of gauge pressures"))
gs.add("tsF", "Suction temperature", "t_s", 80, "°F")
gs.add("tsC", "Suction temperature, °C", "t_s,C", "=({tsF}-32)/1.8", "°C")
gs.add("TsK", "Suction temperature, K", "T_s,K", "={tsC}+273.15", "K")
gs.add("TsK2", "Suction temperature, K (simulation input)", "T_s,K2", "={tsC}", "K",
       planted=("offset-scale", "°C reading set equal to kelvin"))
gs.add("TsR", "Suction temperature, °R", "T_s,R", "={tsF}+459.67", "°R")
gs.add("k", "Ratio of specific heats", "k", 1.28, "-")
gs.add("TdR", "Discharge temperature, isentropic", "T_d,R", "={TsR}*{r}^(({k}-1)/{k})", "°R")
gs.add("tdF", "Discharge temperature, °F", "t_d", "={TdR}-459.67", "°F")
gs.add("tdF2", "Discharge temperature, °F (hand check)", "t_d,2", "={tsF}*{r}^(({k}-1)/{k})",
       "°F", planted=("offset-scale", "a °F reading in a temperature ratio"))
gs.add("TdK", "Discharge temperature, K", "T_d,K", "={TdR}/1.8", "K")
gs.add("chkT", "Discharge temperature check (300 °F)", "check_T",
       "=IF({tdF}<=300,\"OK\",\"INTERSTAGE COOLER\")")
gs.add("Z", "Mean compressibility factor", "Z", 0.89, "-")
gs.add("etas", "Isentropic efficiency", "eta_s", 82, "%")
gs.add("ghp", "Gas power (GPSA)", "ghp",
       "=0.0857*{Q}*{Z}*{TsR}*{k}/({k}-1)*({r}^(({k}-1)/{k})-1)/({etas}/100)", "hp")
gs.add("etam", "Mechanical efficiency", "eta_m", 95, "%")
gs.add("bhp", "Brake power required", "bhp", "={ghp}/({etam}/100)", "hp")
gs.add("bkW", "Brake power required, kW", "P_kW", "={bhp}*0.7457", "kW")
gs.add("bkW2", "Brake power required, kW (electric drive comparison)", "P_kW2", "={bhp}*745.7",
       "kW", planted=("unit-scale", "hp × 745.7 gives W, written under kW: 1000 too large"))
gs.add("model", "Engine model", "model", "G-2500")
gs.add("nrun", "Units running", "n", 3, "-")
gs.add("rated", "Unit rated power (site)", "P_r", "=VLOOKUP({model},Units!A5:E8,2,FALSE)", "hp")
gs.add("load", "Load per unit", "LF", "={bhp}/({nrun}*{rated})*100", "%")
gs.add("HR", "Engine heat rate at load (LHV)", "HR", "=VLOOKUP({model},Units!A5:E8,3,FALSE)",
       "Btu/hp·h")
gs.add("HRsi", "Engine heat rate, kJ/kWh", "HR_SI", "={HR}*1.415", "kJ/kWh")
gs.add("HRsi2", "Engine heat rate, kJ/kWh (EU permit form)", "HR_SI2", "={HR}/1.415", "kJ/kWh",
       planted=("unit-scale", "Btu/(hp·h) to kJ/kWh divided by 1.415: wrong way round"))
gs.add("Ff", "Fuel energy (LHV)", "F", "={bhp}*{HR}/10^6", "MMBtu/h")
gs.add("Ff2", "Fuel energy (LHV), rev. A", "F_2", "={bhp}*{HR}/1000", "MMBtu/h",
       planted=("unit-scale", "Btu/h over 1000 written as MMBtu/h: 1000 too large"))
gs.add("LHV", "Fuel gas lower heating value", "LHV", 920, "Btu/scf")
gs.add("Fv", "Fuel gas flow", "F_v", "={Ff}*10^6/{LHV}", "scf/h")
gs.add("Fd", "Fuel gas flow, Mscfd", "F_d", "={Fv}*24/1000", "Mscfd")
gs.add("Fd2", "Fuel gas flow, Mscfd (daily report)", "F_d2", "={Fv}*24", "Mscfd",
       planted=("unit-scale", "scf/d written as Mscf/d: 1000 too large"))
gs.add("Fsh", "Fuel as a share of throughput", "f", "={Fd}/({Q}*1000)*100", "%")
gs.add("FN", "Fuel gas flow, normal", "F_N", "={Fd}/1000*1116", "Nm³/h")
gs.add("hh", "HHV to LHV ratio, pipeline gas", "HHV/LHV", 1.109, "-")
gs.add("hrs", "Running hours", "t_run", 8300, "h/yr")
gs.add("EF", "CO2 emission factor, natural gas (HHV)", "EF_CO2", 53.06, "kg/MMBtu")
gs.add("CO2", "CO2 from fuel", "m_CO2", "={Ff}*{hh}*{EF}*{hrs}/1000", "t/yr")
gs.add("NOxf", "NOx emission factor (engine guarantee)", "EF_NOx",
       "=VLOOKUP({model},Units!A5:E8,4,FALSE)", "g/hp·h")
gs.add("NOxh", "NOx emitted, hourly", "m_NOx,h", "={NOxf}*{bhp}/1000", "kg/h")
gs.add("NOx", "NOx emitted per year", "m_NOx", "={NOxf}*{bhp}*{hrs}/10^6", "t/yr")
gs.add("NOx2", "NOx emitted per year (permit table)", "m_NOx,2", "={NOxf}*{bhp}*{hrs}/1000",
       "t/yr", planted=("unit-scale", "grams over 1000 give kg, written as t: 1000 too large"))
STATION = gs.finish()

UNITS = {
    "A1": "Engine-driven compressor packages: site ratings and guarantees (invented catalogue)",
    "A2": "Sources: invented stand-ins for a maker's data; 1 hp = 0.7457 kW (NIST SP 811 (2008) "
          "App. B.8).",
    "A3": CAUTION,
    "A4": "Model", "B4": "Rating [hp]", "C4": "Heat rate [Btu/hp·h]", "D4": "NOx [g/hp·h]",
    "E4": "Rating [kW]",
}
for r, row in enumerate([("G-1800", 1800, 7900, 1.5), ("G-2500", 2500, 7600, 1.0),
                         ("G-3500", 3500, 7300, 0.5), ("G-4700", 4735, 7150, 0.5)], start=5):
    for c, v in zip("ABCD", row):
        UNITS[f"{c}{r}"] = v
    UNITS[f"E{r}"] = f"=B{r}*0.7457"

GAS = {
    "trade": "gas transmission: compressor station fuel use and emissions",
    "sheets": [("Station", STATION), ("Units", UNITS)],
    "planted": {**gs.planted},
}

# --------------------------------------------------------------------------------------------
# Book 4: warehouse roof snow load and purlin check (kN/m² and psf, mm and in, kN·m and
# kip·ft, MPa and ksi, cm³ and in³)
# --------------------------------------------------------------------------------------------
ROOF_SRC = (
    "Sources: roof snow s = μ1·Ce·Ct·sk, μ1 = 0.8 for 0° ≤ α ≤ 30° and 0.8·(60 - α)/30 to 60°, "
    "EN 1991-1-3:2003 eq. 5.1 and Table 5.2; settled snow 2.0 kN/m³, EN 1991-1-3 Annex E "
    "Table E.1 (from memory); γG = 1.35, γQ = 1.5, EN 1990:2002 Table A1.2(B); E = 210 000 "
    "N/mm², EN 1993-1-1:2005 3.2.6; δ = 5wL⁴/(384EI) for a simple span, Roark's Formulas for "
    "Stress and Strain 7th ed. (2002) Table 8.1 (from memory); deflection limit L/200 (common "
    "practice for purlins, check the project specification); flat roof snow pf = 0.7·Ce·Ct·Is·pg "
    "and snow density γ = 0.13·pg + 14 ≤ 30 pcf, ASCE 7-16 eqs. 7.3-1 and 7.7-1 (from memory); "
    "NIST SP 811 (2008) App. B.8: 1 psf = 0.04788 kN/m², 1 kip·ft = 1.356 kN·m, 1 in³ = 16.387 "
    "cm³, 1 ksi = 6.895 MPa, 1 in = 25.4 mm; g = 9.81 m/s². Warehouse, site snow load and "
    "purlin catalogue invented.")
rf = ItemSheet("Purlin", "Ashby Marsh distribution centre, unit 4 roof: snow load and purlin "
               "check (invented scenario)", ROOF_SRC)
rf.add("sk", "Characteristic ground snow load (site)", "s_k", 0.75, "kN/m²")
rf.add("alpha", "Roof pitch", "α", 6, "°")
rf.add("mu", "Snow load shape coefficient μ1", "μ_1",
       "=IF({alpha}<=30,0.8,0.8*(60-{alpha})/30)", "-")
rf.add("Ce", "Exposure coefficient", "C_e", 1.0, "-")
rf.add("Ct", "Thermal coefficient", "C_t", 1.0, "-")
rf.add("s", "Snow load on the roof", "s", "={mu}*{Ce}*{Ct}*{sk}", "kN/m²")
rf.add("spsf", "Snow load on the roof, psf", "s_psf", "={s}/0.04788", "psf")
rf.add("spsf2", "Snow load on the roof, psf (US parent company form)", "s_psf2",
       "={s}*0.04788", "psf",
       planted=("unit-scale", "kN/m² to psf multiplied by 0.04788: wrong way round"))
rf.add("gsn", "Weight density of settled snow", "γ_s", 2.0, "kN/m³")
rf.add("dsn", "Depth of settled snow for the roof load", "d_s", "={s}/{gsn}*1000", "mm")
rf.add("dsnin", "Depth of settled snow, in", "d_s,in", "={dsn}/25.4", "in")
rf.add("msn", "Snow mass on the roof (facilities plan)", "m_s", "={s}*1000/9.81", "kg/m²")
rf.add("msn2", "Snow mass on the roof (rev. A)", "m_s,2", "={s}*1000", "kg/m²",
       planted=("result-unit", "kN/m² × 1000 gives N/m², not kg/m²: g missing"))
rf.add("gk", "Roof sheeting, insulation and services", "g_k", 0.35, "kN/m²")
rf.add("sp", "Purlin spacing", "a", 1.8, "m")
rf.add("L", "Purlin span (simple span between rafters)", "L", 6.0, "m")
rf.add("sec", "Purlin section", "section", "Z-250-20")
rf.add("mp", "Purlin mass", "m_p", "=VLOOKUP({sec},Sections!A5:F9,2,FALSE)", "kg/m")
rf.add("gp", "Purlin self weight", "g_p", "={mp}*9.81/1000", "kN/m")
rf.add("Wel", "Elastic section modulus", "W_el", "=VLOOKUP({sec},Sections!A5:F9,3,FALSE)", "cm³")
rf.add("I", "Second moment of area", "I", "=VLOOKUP({sec},Sections!A5:F9,4,FALSE)", "cm⁴")
rf.add("fy", "Yield strength", "f_y", "=VLOOKUP({sec},Sections!A5:F9,5,FALSE)", "MPa")
rf.add("wd", "Design line load (ULS)", "w_d", "=1.35*({gk}*{sp}+{gp})+1.5*{s}*{sp}", "kN/m")
rf.add("wd2", "Design line load (ULS), rev. A", "w_d,2", "=1.35*({gk}*{sp}+{mp})+1.5*{s}*{sp}",
       "kN/m", planted=("unit-scale", "purlin mass in kg/m added to loads in kN/m: g missing"))
rf.add("Md", "Design bending moment", "M_d", "={wd}*{L}^2/8", "kN·m")
rf.add("Lmm", "Purlin span, mm", "L_mm", "={L}*1000", "mm")
rf.add("Md2", "Design bending moment (span in mm)", "M_d,2", "={wd}*{Lmm}^2/8", "kN·m",
       planted=("unit-scale", "span in mm with a load in kN/m: 10⁶ too large"))
rf.add("Mkf", "Design bending moment, kip·ft", "M_d,US", "={Md}/1.356", "kip·ft")
rf.add("Mkf2", "Design bending moment, kip·ft (US checker)", "M_d,US2", "={Md}*1.356", "kip·ft",
       planted=("unit-scale", "kN·m to kip·ft multiplied by 1.356: wrong way round"))
rf.add("Welin", "Elastic section modulus, in³", "W_el,in", "={Wel}/16.387", "in³")
rf.add("Welin2", "Elastic section modulus, in³ (cold-formed design check)", "W_el,in2",
       "={Wel}*16.387", "in³",
       planted=("unit-scale", "cm³ to in³ multiplied by 16.387: wrong way round"))
rf.add("sig", "Bending stress", "σ", "={Md}*1000/{Wel}", "MPa")
rf.add("sig2", "Bending stress (first draft)", "σ_2", "={Md}/{Wel}", "MPa",
       planted=("unit-scale", "kN·m over cm³ without the ×1000: 1000 too small"))
rf.add("sigksi", "Bending stress, ksi", "σ_US", "={sig}/6.895", "ksi")
rf.add("util", "Bending utilisation (γM0 = 1.0)", "u", "={sig}/{fy}*100", "%")
rf.add("chk", "Bending check", "check", "=IF({util}<=100,\"OK\",\"FAIL\")")
rf.add("ws", "Serviceability line load (characteristic)", "w_s", "={gk}*{sp}+{gp}+{s}*{sp}",
       "kN/m")
rf.add("E", "Modulus of elasticity, steel", "E", 210000, "MPa")
rf.add("dl", "Midspan deflection", "δ", "=5*{ws}*{Lmm}^4/(384*{E}*{I}*10^4)", "mm")
rf.add("dl2", "Midspan deflection (hand check)", "δ_2", "=5*{ws}*{Lmm}^4/(384*{E}*{I}*10^3)",
       "mm", planted=("unit-scale", "cm⁴ to mm⁴ with 10³ instead of 10⁴: 10 too large"))
rf.add("dlin", "Midspan deflection, in", "δ_in", "={dl}/25.4", "in")
rf.add("dlim", "Deflection limit L/200", "δ_lim", "={Lmm}/200", "mm")
rf.add("dchk", "Deflection check", "check_δ", "=IF({dl}<={dlim},\"OK\",\"FAIL\")")
rf.add("pg", "Ground snow load, ASCE 7 comparison", "p_g", "={sk}/0.04788", "psf")
rf.add("pf", "Flat roof snow load, ASCE 7 (Ce = Ct = Is = 1.0)", "p_f", "=0.7*{Ce}*{Ct}*1.0*{pg}",
       "psf")
rf.add("gam", "Snow density, ASCE 7 eq. 7.7-1", "γ", "=MIN(0.13*{pg}+14,30)", "pcf")
rf.add("hb", "Balanced snow height, ASCE 7", "h_b", "={pf}/{gam}", "ft")
PURLIN = rf.finish()

SECTIONS = {
    "A1": "Cold-formed Z purlins, S390GD (invented catalogue values)",
    "A2": "Sources: invented stand-ins for a maker's section table; S390GD f_y = 390 MPa, EN "
          "10346:2015 (from memory); 1 in³ = 16.387 cm³ (NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A4": "Section", "B4": "Mass [kg/m]", "C4": "W_el [cm³]", "D4": "I [cm⁴]", "E4": "f_y [MPa]",
    "F4": "W_el [in³]",
}
for r, row in enumerate([("Z-200-20", 5.9, 30.1, 301, 390), ("Z-250-20", 6.6, 39.5, 494, 390),
                         ("Z-250-25", 8.3, 49.3, 616, 390), ("Z-300-25", 9.3, 62.0, 930, 390),
                         ("Z-300-30", 11.2, 74.2, 1112, 390)], start=5):
    for c, v in zip("ABCDE", row):
        SECTIONS[f"{c}{r}"] = v
    SECTIONS[f"F{r}"] = f"=C{r}/16.387"

ROOF = {
    "trade": "structures: warehouse roof snow load and cold-formed purlin check",
    "sheets": [("Purlin", PURLIN), ("Sections", SECTIONS)],
    "planted": {**rf.planted},
}

BOOKS = {"brewery-boil": BREW, "pit-dewatering": MINE, "compressor-fuel": GAS,
         "roof-purlin": ROOF}

EXTRA = {}
MISSED = {}
RENAMED = {}
MESSAGES = {}
HEADNOTE = {}
try:
    from review_notes import EXTRA, MISSED, RENAMED, MESSAGES, HEADNOTE  # noqa: F401,F811
except ImportError:
    pass


def main():
    write_books(HERE, BOOKS, {"EXTRA": EXTRA, "MISSED": MISSED, "RENAMED": RENAMED,
                              "MESSAGES": MESSAGES, "HEADNOTE": HEADNOTE})


if __name__ == "__main__":
    main()
