#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review27), written with the
standard library only (corpus/sheets/xlsx_writer.py and item_sheet.py, shared by the review books).

Trades: a farm's grain dryer; a compressed-air dryer and filter train; a solar PV plant's yield;
a stormwater pond's water balance. All scenarios, sites, readings and catalogue data are invented
(demonstration only); the formulas and published factors are the trade's own, with their sources
named in a text cell at the top of each sheet.

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Run: python3 make_books.py [--expect]
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
SIDE_HEAD = ("# Invented scenario. A dimensionally consistent formula can still be wrong; this\n"
             "# check does not replace independent review under local codes and licensed practice.\n")

# --------------------------------------------------------------------------------------------
# Book 1: farm grain dryer (t and bu, % wet basis, kg and lb of water, L and US gal of propane,
# kWh)
# --------------------------------------------------------------------------------------------
GRAIN_SRC = (
    "Sources: water removed m_w = m_wet·(M_i − M_f)/(100 − M_f), moisture wet basis, Brooker, "
    "Bakker-Arkema & Hall, Drying and Storage of Grains and Oilseeds (1992) ch. 2 (from memory); "
    "shelled corn market bushel 56 lb (USDA standard, common practice); 1 t = 39.37 bu of 56 lb "
    "and 1 kg = 2.205 lb, NIST SP 811 (2008) App. B.8 (lb = 0.45359237 kg); 1 US gal = 3.785 L, "
    "NIST SP 811 (2008) App. B.8; propane heating value 25.3 MJ/L (about 91 500 Btu/gal), from "
    "memory; dryer specific energy 4.5 MJ per kg of water for a high-temperature column dryer, "
    "from memory; sensible heat of air Btu/h = 1.08·cfm·ΔT(°F), ASHRAE Handbook Fundamentals "
    "(2017) ch. 1 (common practice); 1 kW = 3412 Btu/h and 1 kWh = 3.6 MJ, NIST SP 811 (2008) App. "
    "B.8; target storage moisture by storage time (Lookup sheet): extension-service tables, from "
    "memory. Farm data invented.")
dr = ItemSheet("Dryer", "Hollin Brook Farm: 2025 corn drying season (invented scenario)",
               GRAIN_SRC)
dr.add("mwet", "Wet corn delivered to the dryer", "m_wet", "=Bins!B10", "t")
dr.add("bu", "Wet corn, bushels", "n_bu", "={mwet}*39.37", "bu")
dr.add("bu2", "Wet corn, bushels (scale ticket check)", "n_bu2", "={mwet}*1000/56", "bu",
       planted=("unit-scale", "kg divided by 56 as if it were lb: the 2.205 lb/kg is missing"))
dr.add("Mi", "Mean harvest moisture (wet basis)", "M_i", "=Bins!C10", "%")
dr.add("months", "Planned storage time", "t_s", 12, "months")
dr.add("Mf", "Target storage moisture", "M_f", "=VLOOKUP({months},Lookup!A5:B8,2,TRUE)", "%")
dr.add("mdm", "Dry matter", "m_dm", "={mwet}*(1-{Mi}/100)", "t")
dr.add("mdm2", "Dry matter (shrink sheet)", "m_dm2", "={mwet}*(1-{Mi})", "t",
       planted=("unit-scale", "moisture in % used as a fraction"))
dr.add("mdry", "Dried corn out", "m_dry", "={mdm}/(1-{Mf}/100)", "t")
dr.add("shrink", "Water shrink", "s", "=({mwet}-{mdry})/{mwet}*100", "%")
dr.add("mw", "Water removed", "m_w", "={mwet}*1000*({Mi}-{Mf})/(100-{Mf})", "kg")
dr.add("mwlb", "Water removed, lb", "m_w,lb", "={mw}*2.205", "lb")
dr.add("mwlb2", "Water removed, lb (grain buyer form)", "m_w,lb2", "={mw}/2.205", "lb",
       planted=("unit-scale", "kg to lb divided by 2.205: wrong way round"))
dr.add("es", "Dryer specific energy", "e_s", 4.5, "MJ/kg")
dr.add("Q", "Heat used", "Q", "={mw}*{es}", "MJ")
dr.add("QGJ", "Heat used, GJ", "Q_GJ", "={Q}/1000", "GJ")
dr.add("QGJ2", "Heat used (energy audit), GJ", "Q_GJ2", "={mw}*{es}", "GJ",
       planted=("unit-scale", "MJ result written under GJ: 1000 too large"))
dr.add("QkWh", "Heat used, kWh equivalent", "Q_kWh", "={Q}/3.6", "kWh")
dr.add("QkWh2", "Heat used, kWh (grant form)", "Q_kWh2", "={Q}/3600", "kWh",
       planted=("unit-scale", "MJ to kWh divided by 3600 (the s/h) in place of 3.6"))
dr.add("hv", "Propane heating value", "H_v", 25.3, "MJ/L")
dr.add("VL", "Propane burned", "V_L", "={Q}/{hv}", "L")
dr.add("Vgal", "Propane burned, US gal", "V_gal", "={VL}/3.785", "gal")
dr.add("Vgal2", "Propane burned, US gal (supplier check)", "V_gal2", "={VL}*3.785", "gal",
       planted=("unit-scale", "L to US gal multiplied by 3.785: wrong way round"))
dr.add("Vtot", "Propane, season total to order", "V_tot", "=SUM({VL}:{Vgal})", "L",
       planted=("mixed-range", "SUM over a range holding L and US gal"))
dr.add("cap", "Dryer capacity at 10 points removal", "c", 12, "t/h")
dr.add("hrs", "Dryer running hours", "t_run", "={mwet}/{cap}", "h")
dr.add("Pfan", "Fan motors", "P_fan", 37, "kW")
dr.add("Paug", "Unloading auger motor", "P_aug", 750, "W")
dr.add("Pel", "Connected electrical load", "P_el", "={Pfan}+{Paug}/1000", "kW")
dr.add("Pel2", "Connected electrical load (tariff form)", "P_el2", "={Pfan}+{Paug}", "kW",
       planted=("unit-scale", "auger motor in W added to fan kW"))
dr.add("Eel", "Electricity used", "E_el", "={Pel}*{hrs}", "kWh")
dr.add("cfm", "Fan airflow", "Q_air", 42000, "cfm")
dr.add("Ta", "Ambient air", "T_a", 50, "°F")
dr.add("Tp", "Plenum air", "T_p", 180, "°F")
dr.add("Qb", "Burner output", "Q_b", "=1.08*{cfm}*({Tp}-{Ta})", "Btu/h")
dr.add("Qb2", "Burner output (quick check)", "Q_b2", "=1.08*{cfm}*{Tp}", "Btu/h",
       planted=("offset-scale", "plenum temperature used where the rise over ambient is needed"))
dr.add("QbkW", "Burner output, kW", "Q_b,kW", "={Qb}/3412", "kW")
dr.add("bph", "Drying rate", "r", "={bu}/{hrs}", "bu/h")
dr.add("chk", "Shrink check against 1.4 % per point", "chk",
       "=IF({shrink}>({Mi}-{Mf})*1.4,\"CHECK\",\"OK\")")
DRYER = dr.finish()

BINS = {
    "A1": "Hollin Brook Farm: wet corn by field, to the dryer (invented weigh tickets)",
    "A2": ("Sources: as the Dryer sheet; m_w = m·(M_i − M_f)/(100 − M_f) with M_f from the Dryer "
           "sheet (Brooker, Bakker-Arkema & Hall 1992, from memory); 1 kg = 2.205 lb and 1 t = "
           "39.37 bu of 56 lb (NIST SP 811 (2008) App. B.8; USDA 56 lb bushel, common practice)."),
    "A3": CAUTION,
    "A4": "Field", "B4": "Wet corn [t]", "C4": "Moisture [%]", "D4": "Wet corn [bu]",
    "E4": "Water removed [kg]", "F4": "Water removed [lb]",
    "A10": "Total / weighted mean",
    "B10": "=SUM(B5:B9)", "C10": "=SUMPRODUCT(B5:B9,C5:C9)/B10", "D10": "=SUM(D5:D9)",
    "E10": "=SUM(E5:E9)", "F10": "=SUM(F5:F9)",
}
Mf = dr.ref("Mf")
for r, (fld, m, mc) in enumerate([("Top Ley", 410, 24.5), ("Long Acre", 385, 26.0),
                                  ("Mill Piece", 290, 22.5), ("Brook Bottom", 350, 27.5),
                                  ("Church Field", 265, 23.0)], start=5):
    BINS[f"A{r}"], BINS[f"B{r}"], BINS[f"C{r}"] = fld, m, mc
    BINS[f"D{r}"] = f"=B{r}*39.37"
    BINS[f"E{r}"] = f"=B{r}*1000*(C{r}-{Mf})/(100-{Mf})"
    BINS[f"F{r}"] = f"=E{r}*2.205"
BINS["E8"] = f"=B8*(C8-{Mf})/(100-{Mf})"      # planted: t into a kg column

LOOKUP = {
    "A1": "Target storage moisture of shelled corn by planned storage time (from memory of "
          "extension-service tables; check the local guidance)",
    "A4": "Storage time [months]", "B4": "Target moisture [%]",
}
for r, (t, mm) in enumerate([(0, 15.5), (6, 15.0), (12, 14.0), (24, 13.0)], start=5):
    LOOKUP[f"A{r}"], LOOKUP[f"B{r}"] = t, mm

GRAIN = {
    "trade": "agriculture: farm grain dryer season sheet",
    "sheets": [("Dryer", DRYER), ("Bins", BINS), ("Lookup", LOOKUP)],
    "sidecar": (SIDE_HEAD +
                "# Hollin Brook Farm: the market bushel of shelled corn (USDA 56 lb, common\n"
                "# practice; NIST SP 811 (2008) App. B.8 for the pound).\n"
                "measure bu = 56 lb \"bushel of shelled corn, 56 lb (market weight)\"\n"
                "measure months = 30.4375 d \"a month (365.25/12 d)\"\n"),
    "planted": {**dr.planted,
                "Bins!E8": ("unit-scale", "wet corn in t into a kg column: the *1000 is missing")},
}

# --------------------------------------------------------------------------------------------
# Book 2: compressed-air dryer and filters (scfm and Nm³/min, °C and °F dew points, bar and psi)
# --------------------------------------------------------------------------------------------
AIR_SRC = (
    "Sources: ISO 8573-1:2010 purity classes (pressure dew point +3 °C class 4, −40 °C class 2); "
    "1 ft³ = 0.02832 m³, 1 bar = 14.5 psi, 1 psi = 68.95 mbar, °F = 1.8·°C + 32, NIST SP 811 "
    "(2008) App. B.8; standard atmosphere 1.013 bar = 14.7 psi, NIST SP 811 (2008) App. B.8; 1 "
    "scfm (14.7 psia, 68 °F) ≈ 0.0268 Nm³/min (0 °C, 1.013 bar), from memory; actual flow V = "
    "V_n·(T/273.15 K)·(1.013 bar/p_abs), ideal gas law, common practice; about 1 % of compressor "
    "power per 2 psi of pressure drop, US DOE 'Improving Compressed Air System Performance' "
    "sourcebook (2003), from memory; heatless desiccant purge 15 % of rated flow, common "
    "practice; dryer correction factors (Factors sheet), from memory of manufacturers' tables; "
    "saturated water content of air (Factors sheet), from memory of psychrometric tables. Plant "
    "data invented.")
ai = ItemSheet("Dryer", "Ferncliffe Plastics, compressor house B: dryer and filter train "
               "(invented scenario)", AIR_SRC)
ai.add("Qs", "Compressor free air delivery", "Q_s", 850, "scfm")
ai.add("Qn", "Free air delivery, normal", "Q_n", "={Qs}*0.0268", "Nm³/min")
ai.add("Qm3", "Free air delivery, standard m³", "Q_sm3", "={Qs}*0.02832", "Sm³/min")
ai.add("pg", "Line pressure at dryer inlet", "p_g", 7.0, "barg")
ai.add("ppsig", "Line pressure, psig", "p_psig", "={pg}*14.5", "psig")
ai.add("pabs", "Line pressure, absolute", "p_abs", "={pg}+1.013", "bar")
ai.add("ppsia", "Line pressure, psia", "p_psia", "={ppsig}+14.7", "psia")
ai.add("Tin", "Inlet air temperature", "T_in", 35, "°C")
ai.add("Vact", "Actual flow at dryer inlet", "V_act",
       "={Qn}*(273.15+{Tin})/273.15*1.013/{pabs}", "m³/min")
ai.add("Vact2", "Actual flow at dryer inlet (vendor form)", "V_act2",
       "={Qn}*(273.15+{Tin})/273.15*1.013/{pg}", "m³/min",
       planted=("offset-scale", "gauge pressure where Boyle's law wants absolute"))
ai.add("Vact3", "Actual flow, temperature only", "V_act3", "={Qn}*{Tin}/273.15", "m³/min",
       planted=("offset-scale", "inlet temperature in °C where the ratio wants K"))
ai.add("cT", "Correction factor, inlet temperature", "c_T",
       "=VLOOKUP({Tin},Factors!A5:B8,2,TRUE)", "-")
ai.add("cP", "Correction factor, pressure", "c_p", "=VLOOKUP({pg},Factors!D5:E8,2,TRUE)", "-")
ai.add("Qreq", "Required dryer rating", "Q_req", "={Qs}/({cT}*{cP})", "scfm")
ai.add("PDP", "Pressure dew point, refrigerated dryer", "PDP", 3, "°C")
ai.add("PDPF", "Pressure dew point, °F", "PDP_F", "={PDP}*1.8+32", "°F")
ai.add("PDPd", "Pressure dew point, desiccant dryer", "PDP_d", -40, "°C")
ai.add("PDPdF", "Pressure dew point, desiccant, °F", "PDP_dF", "={PDPd}*9/5", "°F",
       planted=("offset-scale", "°C to °F without the +32"))
ai.add("purge", "Heatless purge share", "s_p", 15, "%")
ai.add("Qp", "Purge air", "Q_p", "={Qs}*{purge}/100", "scfm")
ai.add("Qp2", "Purge air (desiccant quote)", "Q_p2", "={Qs}*{purge}", "scfm",
       planted=("unit-scale", "15 % used as 15"))
ai.add("dpd", "Pressure drop, dryer", "Δp_d", 0.20, "bar")
ai.add("dpf1", "Pressure drop, general-purpose filter", "Δp_f1", 0.10, "bar")
ai.add("dpf2", "Pressure drop, coalescing filter", "Δp_f2", 0.15, "bar")
ai.add("dpf3", "Pressure drop, carbon filter (US data sheet)", "Δp_f3", 1.5, "psi")
ai.add("dpt", "Pressure drop, dryer and filters", "Δp_t", "={dpd}+{dpf1}+{dpf2}+{dpf3}/14.5",
       "bar")
ai.add("dpt2", "Pressure drop, train (first draft)", "Δp_t2", "=SUM({dpd}:{dpf3})", "bar",
       planted=("mixed-range", "SUM over a range holding bar and psi"))
ai.add("dptm", "Pressure drop, train, mbar", "Δp_t,mbar", "={dpt}", "mbar",
       planted=("unit-scale", "bar result written under mbar: 1000 too small"))
ai.add("dptpsi", "Pressure drop, train, psi", "Δp_t,psi", "={dpt}*14.5", "psi")
ai.add("dptpsi2", "Pressure drop, train, psi (audit form)", "Δp_t,psi2", "={dpt}/14.5", "psi",
       planted=("unit-scale", "bar to psi divided by 14.5: wrong way round"))
ai.add("Pc", "Compressor shaft power", "P_c", 110, "kW")
ai.add("Ppen", "Power to overcome the drop", "P_pen", "={Pc}*{dptpsi}/2/100", "kW")
ai.add("hyr", "Running hours", "t_yr", 6000, "h/yr")
ai.add("Epen", "Energy penalty of the drop", "E_pen", "={Ppen}*{hyr}", "kWh/yr")
ai.add("Pdry", "Refrigerated dryer, compressor and fan", "P_dry", 4.2, "kW")
ai.add("Pdrain", "Zero-loss drain heater", "P_drain", 150, "W")
ai.add("Pel", "Dryer electrical load", "P_el", "={Pdry}+{Pdrain}/1000", "kW")
ai.add("Pel2", "Dryer electrical load (panel schedule)", "P_el2", "={Pdry}+{Pdrain}", "kW",
       planted=("unit-scale", "drain heater in W added to kW"))
ai.add("win", "Water content, saturated at inlet", "w_in",
       "=VLOOKUP({Tin},Factors!G5:H9,2,TRUE)", "g/m³")
ai.add("wout", "Water content, saturated at the dew point", "w_out",
       "=VLOOKUP({PDP},Factors!G5:H9,2,TRUE)", "g/m³")
ai.add("cond", "Condensate from the dryer", "m_c", "={Vact}*60*({win}-{wout})/1000", "kg/h")
ai.add("dpchk", "Drop check (0.5 bar budget)", "chk", "=IF({dpt}>0.5,\"REVIEW\",\"OK\")")
AIRD = ai.finish()

FILTERS = {
    "A1": "Ferncliffe Plastics: filter elements, clean and change-out drops (invented data)",
    "A2": ("Sources: 1 bar = 14.5 psi (NIST SP 811 (2008) App. B.8); change element at the "
           "maker's change-out drop (common practice)."),
    "A3": CAUTION,
    "A4": "Element", "B4": "Clean drop [bar]", "C4": "Clean drop [psi]",
    "D4": "Change-out drop [bar]", "E4": "Change-out drop [psi]", "F4": "Margin [bar]",
    "A9": "Train total",
    "B9": "=SUM(B5:B8)", "C9": "=SUM(C5:C8)", "D9": "=SUM(D5:D8)", "E9": "=SUM(E5:E8)",
}
for r, (el, c, d) in enumerate([("Pre-filter 3 µm", 0.10, 0.35), ("Coalescing 0.01 µm", 0.15, 0.6),
                                ("Carbon", 0.10, 0.35), ("Dust after-filter", 0.08, 0.35)],
                               start=5):
    FILTERS[f"A{r}"], FILTERS[f"B{r}"], FILTERS[f"D{r}"] = el, c, d
    FILTERS[f"C{r}"] = f"=B{r}*14.5"
    FILTERS[f"E{r}"] = f"=D{r}*14.5"
    FILTERS[f"F{r}"] = f"=D{r}-B{r}"
FILTERS["E7"] = "=C7*14.5"                     # planted: psi converted again

FACTORS = {
    "A1": "Dryer correction factors and saturated water content of air (from memory of "
          "manufacturers' tables and psychrometric tables; check the maker's data)",
    "A4": "Inlet temperature [°C]", "B4": "Factor c_T [-]",
    "D4": "Line pressure [barg]", "E4": "Factor c_p [-]",
    "G4": "Dew point [°C]", "H4": "Saturated water content [g/m³]",
}
for r, (t, f, p, fp) in enumerate([(25, 1.10, 4, 0.77), (30, 1.0, 5, 0.86), (35, 0.82, 7, 1.0),
                                   (40, 0.68, 10, 1.12)], start=5):
    FACTORS[f"A{r}"], FACTORS[f"B{r}"], FACTORS[f"D{r}"], FACTORS[f"E{r}"] = t, f, p, fp
for r, (t, w) in enumerate([(-40, 0.12), (3, 5.9), (25, 23.0), (35, 39.6), (40, 51.1)], start=5):
    FACTORS[f"G{r}"], FACTORS[f"H{r}"] = t, w

AIR = {
    "trade": "compressed air: refrigerated and desiccant dryer, filter train",
    "sheets": [("Dryer", AIRD), ("Filters", FILTERS), ("Factors", FACTORS)],
    "planted": {**ai.planted,
                "Filters!E7": ("unit-scale", "a drop already in psi multiplied by 14.5 again")},
}

# --------------------------------------------------------------------------------------------
# Book 3: solar PV plant yield (kWp, kWh/m²/yr, PR %, MWh, capacity factor %)
# --------------------------------------------------------------------------------------------
PV_SRC = (
    "Sources: IEC 61724-1:2017 (final yield Y_f = E/P_0, reference yield Y_r = H_POA/G_STC, "
    "PR = Y_f/Y_r; G_STC = 1 kW/m²); NOCT cell temperature T_c = T_a + (NOCT − 20 °C)·G/800 W/m², "
    "Duffie & Beckman, Solar Engineering of Thermal Processes 4th ed. (2013) ch. 23; power "
    "temperature coefficient −0.35 %/K, from memory of crystalline module datasheets; "
    "transposition gain by tilt (Tilt sheet), from memory; capacity factor = E/(P_ac·8760 h), "
    "common practice; degradation 0.5 %/yr, from memory; 1 kWh = 3.6 MJ, NIST SP 811 (2008) "
    "App. B.8. Plant data invented.")
pv = ItemSheet("Yield", "Sandwell Moor solar farm: energy yield estimate (invented scenario)",
               PV_SRC)
pv.add("n", "Modules", "n", 18480, "-")
pv.add("Wp", "Module rating at STC", "P_mod", 545, "Wp")
pv.add("P0", "DC capacity", "P_0", "={n}*{Wp}/1000", "kWp")
pv.add("P02", "DC capacity (BOM check)", "P_02", "={n}*{Wp}", "kWp",
       planted=("unit-scale", "Wp summed into a kWp cell: 1000 too large"))
pv.add("P0MW", "DC capacity, MWp", "P_0,MW", "={P0}/1000", "MWp")
pv.add("inv1", "Inverter station 1", "P_ac1", 2500, "kW")
pv.add("inv2", "Inverter station 2", "P_ac2", 2500, "kW")
pv.add("inv3", "Inverter station 3 (2024 extension)", "P_ac3", 3.6, "MW")
pv.add("Pac", "AC capacity", "P_ac", "={inv1}+{inv2}+{inv3}*1000", "kW")
pv.add("Pac2", "AC capacity (grid application)", "P_ac2", "=SUM({inv1}:{inv3})", "kW",
       planted=("mixed-range", "SUM over a range holding kW and MW"))
pv.add("PacMW", "AC capacity, MW", "P_ac,MW", "={Pac}/1000", "MW")
pv.add("ratio", "DC/AC ratio", "r", "={P0}/{Pac}", "-")
pv.add("GHI", "Global horizontal irradiation in a year (long-term mean)", "H_GHI",
       "=Monthly!B17", "kWh/m²")
pv.add("tilt", "Module tilt", "beta", 25, "°")
pv.add("gain", "Transposition gain", "k_t", "=VLOOKUP({tilt},Tilt!A5:B8,2,TRUE)", "-")
pv.add("Hpoa", "Plane-of-array irradiation", "H_POA", "={GHI}*{gain}", "kWh/m²")
pv.add("HpoaMJ", "Plane-of-array irradiation, MJ", "H_POA,MJ", "={Hpoa}*3.6", "MJ/m²")
pv.add("HpoaMJ2", "Plane-of-array irradiation (met report form)", "H_POA,MJ2", "={Hpoa}*3600",
       "MJ/m²", planted=("unit-scale", "kWh to MJ multiplied by 3600 (kWh to kJ)"))
pv.add("Gstc", "Irradiance at STC", "G_STC", 1, "kW/m²")
pv.add("PR", "Performance ratio", "PR", "=Losses!C13", "%")
pv.add("Yr", "Reference yield", "Y_r", "={Hpoa}/{Gstc}", "h")
pv.add("Yf", "Specific yield", "Y_f", "={Yr}*{PR}/100", "kWh/kWp")
pv.add("E", "Annual energy, first year", "E", "={P0}*{Yf}/1000", "MWh")
pv.add("E2", "Annual energy (bank model check)", "E_2", "={P0}*{Hpoa}/{Gstc}*{PR}/1000",
       "MWh", planted=("unit-scale", "PR in % used as a fraction: 100 too large"))
pv.add("EkWh", "Annual energy, kWh", "E_kWh", "={E}*1000", "kWh")
pv.add("EGWh", "Annual energy, GWh", "E_GWh", "={E}*1000", "GWh",
       planted=("unit-scale", "MWh to GWh multiplied by 1000: wrong way round"))
pv.add("CF", "Capacity factor, AC", "CF", "={E}/({PacMW}*8760)*100", "%")
pv.add("CF2", "Capacity factor (investor memo)", "CF_2", "={E}/({Pac}*8760)*100", "%",
       planted=("unit-scale", "MWh over kW·h: 1000 too small"))
pv.add("CFdc", "Capacity factor, DC", "CF_dc", "={E}/({P0MW}*8760)*100", "%")
pv.add("Ta", "Mean daytime ambient", "T_a", 18, "°C")
pv.add("NOCT", "Module NOCT", "NOCT", 45, "°C")
pv.add("G", "Irradiance, typical operating", "G", 800, "W/m²")
pv.add("Tc", "Cell temperature", "T_c", "={Ta}+({NOCT}-20)*{G}/800", "°C")
pv.add("gam", "Power temperature coefficient", "gamma", -0.35, "%/K")
pv.add("lT", "Temperature loss", "l_T", "=-{gam}*({Tc}-25)", "%")
pv.add("lT2", "Temperature loss (quick form)", "l_T2", "=-{gam}*{Tc}", "%",
       planted=("offset-scale", "cell temperature in °C where the rise over 25 °C is needed"))
pv.add("d", "Degradation", "d", 0.5, "%/yr")
YIELD = pv.finish()

MONTHLY = {
    "A1": "Sandwell Moor: monthly irradiation and energy (invented long-term means)",
    "A2": ("Sources: as the Yield sheet; E_month = P_0·H_GHI·k_t·PR/G_STC with G_STC = 1 kW/m² "
           "(IEC 61724-1:2017)."),
    "A3": CAUTION,
    "A4": "Month", "B4": "GHI [kWh/m²]", "C4": "Energy [MWh]",
    "A17": "Year", "B17": "=SUM(B5:B16)", "C17": "=SUM(C5:C16)",
}
P0, gain, PR, Gstc = pv.ref("P0"), pv.ref("gain"), pv.ref("PR"), pv.ref("Gstc")
for r, (m, g) in enumerate(zip(["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep",
                                "Oct", "Nov", "Dec"],
                               [22, 38, 75, 115, 150, 162, 158, 130, 90, 52, 27, 17]), start=5):
    MONTHLY[f"A{r}"], MONTHLY[f"B{r}"] = m, g
    MONTHLY[f"C{r}"] = f"={P0}*B{r}*{gain}*{PR}/100/{Gstc}/1000"

LOSSES = {
    "A1": "Sandwell Moor: loss budget to performance ratio",
    "A2": ("Sources: PR as the product of (1 − loss) over the loss chain, common practice "
           "(IEC 61724-1:2017 for PR); loss values invented for this estimate except the "
           "temperature loss, from the Yield sheet."),
    "A3": CAUTION,
    "A4": "Loss", "B4": "Loss [%]", "C4": "Factor [-]",
    "A5": "Soiling", "B5": 2.0, "A6": "Temperature", "B6": "=" + pv.ref("lT"),
    "A7": "Module mismatch", "B7": 1.0, "A8": "DC cabling", "B8": 1.5,
    "A9": "Inverter", "B9": 2.0, "A10": "AC cabling and transformer", "B10": 1.2,
    "A11": "Availability", "B11": 1.0,
    "A13": "Total loss / performance ratio", "C12": "PR [%]", "B13": "=SUM(B5:B11)", "C13": "=PRODUCT(C5:C11)*100",
}
for r in range(5, 12):
    LOSSES[f"C{r}"] = f"=1-B{r}/100"

TILT = {
    "A1": "Transposition gain by tilt, south-facing, latitude about 52° N (from memory; use the "
          "site's own transposition model)",
    "A4": "Tilt [°]", "B4": "Gain [-]",
}
for r, (t, k) in enumerate([(0, 1.00), (15, 1.08), (25, 1.12), (35, 1.14)], start=5):
    TILT[f"A{r}"], TILT[f"B{r}"] = t, k

PV = {
    "trade": "solar PV: utility plant annual energy yield",
    "sheets": [("Yield", YIELD), ("Monthly", MONTHLY), ("Losses", LOSSES), ("Tilt", TILT)],
    "sidecar": (SIDE_HEAD +
                "# Sandwell Moor: peak watts of a module's STC rating (IEC 61215, common practice).\n"
                "measure Wp = 1 W \"watt peak, DC rating at STC\"\n"
                "measure kWp = 1 kW \"kilowatt peak, DC rating at STC\"\n"
                "measure MWp = 1 MW \"megawatt peak, DC rating at STC\"\n"),
    "planted": dict(pv.planted),
}

# --------------------------------------------------------------------------------------------
# Book 4: stormwater pond water balance (mm and in, ha and acres, C, m³ and acre·ft, evaporation)
# --------------------------------------------------------------------------------------------
POND_SRC = (
    "Sources: runoff volume V = C·P·A (10 m³ per ha·mm), and US form V[acre·ft] = C·P[in]·"
    "A[acre]/12, common practice; rational method Q = C·i·A/360 (m³/s, i in mm/h, A in ha), "
    "Chow, Maidment & Mays, Applied Hydrology (1988) ch. 15; runoff coefficients by land use "
    "(Landuse sheet), from memory of the ASCE/WEF MOP 77 (1992) table; composite C = 0.95·imp + "
    "0.20·(1 − imp), common practice; orifice Q = C_d·A·√(2gh), C_d = 0.6, F. M. White, Fluid "
    "Mechanics 8th ed. (2016) ch. 6; 1 ha = 2.471 acre, 1 in = 25.4 mm, 1 acre·ft = 1233.5 m³, "
    "NIST SP 811 (2008) App. B.8; g = 9.81 m/s², common practice; pan coefficient 0.7, from "
    "memory. Site data and rainfall invented.")
pd = ItemSheet("Balance", "Ashgrove Business Park: detention pond P2 water balance "
               "(invented scenario)", POND_SRC)
pd.add("A", "Catchment area", "A", "=Catchment!B10", "ha")
pd.add("Aac", "Catchment area, acres", "A_ac", "={A}*2.471", "acre")
pd.add("Aac2", "Catchment area, acres (US reviewer)", "A_ac2", "={A}/2.471", "acre",
       planted=("unit-scale", "ha to acre divided by 2.471: wrong way round"))
pd.add("imp", "Impervious share", "imp", "=Catchment!D10", "%")
pd.add("C", "Runoff coefficient, composite", "C", "=Catchment!E10", "-")
pd.add("Cimp", "Runoff coefficient from imperviousness", "C_imp",
       "=0.95*{imp}/100+0.2*(1-{imp}/100)", "-")
pd.add("Cimp2", "Runoff coefficient (check by formula)", "C_imp2", "=0.2+0.75*{imp}", "-",
       planted=("unit-scale", "impervious share in % used as a fraction"))
pd.add("P", "Design storm depth, 100-yr 24-h", "P", 118, "mm")
pd.add("Pin", "Design storm depth, inches", "P_in", "={P}/25.4", "in")
pd.add("Pin2", "Design storm depth, inches (old sheet)", "P_in2", "={P}*25.4", "in",
       planted=("unit-scale", "mm to in multiplied by 25.4: wrong way round"))
pd.add("V", "Runoff volume, design storm", "V", "=10*{C}*{P}*{A}", "m³")
pd.add("V2", "Runoff volume (long form)", "V_2", "={C}*{P}/1000*{A}*10000", "m³")
pd.add("V3", "Runoff volume (planning note)", "V_3", "={C}*{P}*{A}*10000", "m³",
       planted=("unit-scale", "depth in mm used as m: 1000 too large"))
pd.add("Vaf", "Runoff volume, acre·ft", "V_af", "={C}*{Pin}*{Aac}/12", "acre·ft")
pd.add("Vaf2", "Runoff volume, acre·ft (US check)", "V_af2", "={C}*{Pin}*{Aac}", "acre·ft",
       planted=("unit-scale", "acre·in written as acre·ft: the /12 is missing"))
pd.add("Vaf3", "Runoff volume, acre·ft from m³", "V_af3", "={V}/1233.5", "acre·ft")
pd.add("i", "Rainfall intensity, 10-min, 10-yr", "i", 95, "mm/h")
pd.add("Qp", "Peak inflow, rational method", "Q_p", "={C}*{i}*{A}/360", "m³/s")
pd.add("Ap", "Pond water surface", "A_p", 1.8, "ha")
pd.add("Epan", "Pan evaporation, July mean", "E_pan", 5.6, "mm/d")
pd.add("kp", "Pan coefficient", "k_p", 0.7, "-")
pd.add("Ev", "Pond evaporation", "E_v", "={Epan}*{kp}/1000*{Ap}*10000", "m³/d")
pd.add("Ev2", "Pond evaporation (permit form)", "E_v2", "={Epan}*{kp}*{Ap}*10", "L/d",
       planted=("unit-scale", "m³/d written under L/d: 1000 too small"))
pd.add("Do", "Outlet orifice diameter", "D_o", 300, "mm")
pd.add("Cd", "Discharge coefficient", "C_d", 0.6, "-")
pd.add("h", "Head on orifice at top water level", "h", 1.6, "m")
pd.add("g", "Gravity", "g", 9.81, "m/s²")
pd.add("Ao", "Orifice area", "A_o", "=PI()*({Do}/1000)^2/4", "m²")
pd.add("Qo", "Orifice outflow at top water", "Q_o", "={Cd}*{Ao}*SQRT(2*{g}*{h})", "m³/s")
pd.add("Qo2", "Orifice outflow (hand check)", "Q_o2", "={Cd}*{Ao}*SQRT(2*{h})", "m³/s",
       planted=("result-unit", "√(2h) with g left out"))
pd.add("tdd", "Drawdown time (at half the peak outflow)", "t_dd", "={V}/({Qo}/2)/3600", "h")
pd.add("tchk", "Drawdown check (48 h)", "chk", "=IF({tdd}>48,\"TOO SLOW\",\"OK\")")
pd.add("Vin", "Season inflow to the pond", "V_in", "=Season!F11", "m³")
BAL = pd.finish()

CATCH = {
    "A1": "Ashgrove Business Park: sub-catchments draining to pond P2 (invented survey)",
    "A2": ("Sources: as the Balance sheet; C by land use from the Landuse sheet (from memory of "
           "ASCE/WEF MOP 77 (1992)); 1 ha = 2.471 acre (NIST SP 811 (2008) App. B.8); area-"
           "weighted means, common practice."),
    "A3": CAUTION,
    "A4": "Sub-catchment", "B4": "Area [ha]", "C4": "Land use", "D4": "Impervious [%]",
    "E4": "Runoff coefficient [-]",
    "A10": "Total / weighted mean",
    "B10": "=SUM(B5:B9)", "D10": "=SUMPRODUCT(B5:B9,D5:D9)/B10",
    "E10": "=SUMPRODUCT(B5:B9,E5:E9)/B10",
}
for r, (nm, a, lu) in enumerate([("Unit 1-4 roofs and yards", 8.2, "Industrial"),
                                 ("Spine road", 3.1, "Road"), ("Car parks", 6.4, "Paved"),
                                 ("Landscape belts", 14.3, "Grass"),
                                 ("Plots 5-7 (future)", 10.5, "Industrial")], start=5):
    CATCH[f"A{r}"], CATCH[f"B{r}"], CATCH[f"C{r}"] = nm, a, lu
    CATCH[f"D{r}"] = f"=VLOOKUP(C{r},Landuse!A5:C8,3,FALSE)"
    CATCH[f"E{r}"] = f"=VLOOKUP(C{r},Landuse!A5:C8,2,FALSE)"

LANDUSE = {
    "A1": "Runoff coefficient and imperviousness by land use (from memory of ASCE/WEF MOP 77 "
          "(1992); check the local design manual)",
    "A4": "Land use", "B4": "C [-]", "C4": "Impervious [%]",
}
for r, (lu, c, ip) in enumerate([("Industrial", 0.80, 80), ("Road", 0.90, 95),
                                 ("Paved", 0.85, 90), ("Grass", 0.20, 5)], start=5):
    LANDUSE[f"A{r}"], LANDUSE[f"B{r}"], LANDUSE[f"C{r}"] = lu, c, ip

SEASON = {
    "A1": "Ashgrove pond P2: season water balance, April to September (invented monthly means)",
    "A2": ("Sources: as the Balance sheet; inflow = 10·C·P·A m³ (ha·mm), 1 in = 25.4 mm "
           "(NIST SP 811 (2008) App. B.8); evaporation on the pond surface = depth/1000 × area (common practice)."),
    "A3": CAUTION,
    "A4": "Month", "B4": "Rain [mm]", "C4": "Pan evaporation [mm]",
    "F4": "Runoff in [m³]", "G4": "Net change [m³]", "H4": "Evaporation loss [m³]",
    "A11": "Season",
    "B11": "=SUM(B5:B10)", "C11": "=SUM(C5:C10)",
    "F11": "=SUM(F5:F10)", "G11": "=SUM(G5:G10)", "H11": "=SUM(H5:H10)",
}
C, A, Ap, kp = pd.ref("C"), pd.ref("A"), pd.ref("Ap"), pd.ref("kp")
for r, (m, rain, ev) in enumerate([("Apr", 48, 75), ("May", 55, 110), ("Jun", 62, 135),
                                   ("Jul", 58, 160), ("Aug", 66, 140), ("Sep", 60, 90)], start=5):
    SEASON[f"A{r}"], SEASON[f"B{r}"], SEASON[f"C{r}"] = m, rain, ev
    SEASON[f"F{r}"] = f"=10*{C}*B{r}*{A}"
    SEASON[f"H{r}"] = f"=C{r}*{kp}/1000*{Ap}*10000"
    SEASON[f"G{r}"] = f"=F{r}-H{r}"
SEASON["H8"] = f"=C8*{kp}/1000*{Ap}"                 # planted: ha used as m²

POND = {
    "trade": "stormwater: detention pond design storm and season water balance",
    "sheets": [("Balance", BAL), ("Catchment", CATCH), ("Landuse", LANDUSE), ("Season", SEASON)],
    "planted": {**pd.planted,
                "Season!H8": ("unit-scale", "pond area in ha used as m²: the *10000 is missing")},
}

BOOKS = {"grain-dryer": GRAIN, "air-dryer": AIR, "pv-yield": PV, "pond-balance": POND}

EXTRA = {}    # stem -> list of (comment, "Sheet!Cell rule")
MISSED = {}   # stem -> {"Sheet!Cell": "why"}
RENAMED = {}  # stem -> {"Sheet!Cell": (rule plumb names, why)}
MESSAGES = {}
try:
    from review_notes import EXTRA, MISSED, RENAMED, MESSAGES  # noqa: F401,F811
except ImportError:
    pass


def main():
    write_books(HERE, BOOKS, {"EXTRA": EXTRA, "MISSED": MISSED, "RENAMED": RENAMED,
                              "MESSAGES": MESSAGES})


if __name__ == "__main__":
    main()
