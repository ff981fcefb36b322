#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review46), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from the folder above via sys.path, not copied; pattern after
corpus/sheets/review45/make_books.py.

Trades: an air-handling unit with an energy-recovery wheel; a gas production separator with an
orifice gas meter; an asphalt resurfacing job; a pumped-storage hydro unit. All scenarios,
sites, firms, readings and catalogue data are invented (demonstration only); the formulas and
published factors are the trade's own, with their sources named in a text cell at the top of each
sheet ("from memory" where recalled and not checked, "common practice" for a fact of the trade
with no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and
its messages that mislead, are recorded in review_notes.py after running the frozen binary.

Run: python3 make_books.py  ->  *.xlsx and *.expect in this folder (no sidecars: the units are
typed beside the cells, as the trades type them)
"""
import os
import sys

sys.dont_write_bytecode = True   # write nothing beside the shared modules
HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, HERE)
sys.path.insert(0, os.path.dirname(HERE))
from item_sheet import ItemSheet, write_books_with_notes  # noqa: E402 (shared, not copied)

CAUTION = ("Invented scenario, data for demonstration only. A dimensionally consistent formula can "
           "still be wrong; this check does not replace independent review under local codes and "
           "licensed practice.")
ItemSheet.caution = CAUTION

# --------------------------------------------------------------------------------------------
# Book 1: AHU with an energy-recovery wheel (m³/s and cfm, kW, Btu/h and TR, °C, °F and Δ°F,
# g/kg, Pa and in. w.g., m/s and fpm, MWh and GJ)
# --------------------------------------------------------------------------------------------
AHU_SRC = (
    "Sources: wheel effectiveness ε = m_s·(X_in − X_out)/(m_min·(X_s,in − X_e,in)) for "
    "temperature (sensible) and humidity ratio (latent), AHRI Standard 1060 and ASHRAE Handbook — "
    "HVAC Systems and Equipment (2020) ch. 26 (from memory); moist-air enthalpy h = 1.006·t + "
    "W·(2501 + 1.86·t) kJ/kg dry air, t in °C, W in kg/kg, ASHRAE Handbook — Fundamentals (2017) "
    "ch. 1 eq. 32 (from memory); standard air 1.2 kg/m³ (20 °C, 101.325 kPa, common practice); "
    "US rules Q_s = 1.08·cfm·ΔT(°F) and Q_L = 4840·cfm·ΔW(lb/lb) Btu/h (0.075 lb/ft³ × 60 min/h × "
    "0.24 Btu/(lb·°F), and × 1076 Btu/lb; common practice); NIST SP 811 (2008) App. B.8: 1 m³/s = "
    "2119 cfm, 1 m/s = 196.9 ft/min, 1 kW = 3412 Btu/h, 1 ton of refrigeration = 12 000 Btu/h, "
    "1 in. of water (39.2 °F) = 249.1 Pa, 1 kWh = 3.6 MJ; °F = 1.8·°C + 32. Building, AHU and "
    "wheel catalogue invented.")
ah = ItemSheet("AHU", "Ridgeway Clinic (invented): AHU-3 outdoor-air unit with a total-energy "
               "recovery wheel", AHU_SRC)
ah.heading("Airflows")
ah.add("Vs", "Supply (outdoor) airflow through the wheel", "V_s", 5.2, "m³/s")
ah.add("Ve", "Exhaust airflow through the wheel", "V_e", 4.8, "m³/s")
ah.add("cfm", "Supply airflow, cfm", "V_s,US", "={Vs}*2119", "cfm")
ah.add("cfm2", "Supply airflow, cfm (schedule)", "V_s,US2", "={Vs}*35.31", "cfm",
       planted=("unit-scale", "m³/s × 35.31 gives ft³/s, written as cfm: 60 too small"))
ah.add("rho", "Standard air density", "rho", 1.2, "kg/m³")
ah.add("ms", "Supply air mass flow", "m_s", "={Vs}*{rho}", "kg/s")
ah.add("me", "Exhaust air mass flow", "m_e", "={Ve}*{rho}", "kg/s")
ah.add("mmin", "Smaller of the two mass flows", "m_min", "=MIN({ms},{me})", "kg/s")
ah.heading("Wheel")
ah.add("model", "Wheel model", "model", "EW-2600")
ah.add("Af", "Wheel face area, supply half", "A_f", "=VLOOKUP({model},Wheels!A5:D8,2,FALSE)", "m²")
ah.add("vf", "Face velocity", "v_f", "={Vs}/{Af}", "m/s")
ah.add("fpm", "Face velocity, fpm", "v_f,US", "={vf}*196.9", "fpm")
ah.add("fpm2", "Face velocity, fpm (submittal review)", "v_f,US2", "={vf}*3.281", "fpm",
       planted=("unit-scale", "m/s × 3.281 gives ft/s, written as fpm: 60 too small"))
ah.add("dpw", "Wheel pressure drop, each airstream", "Δp_w", "=VLOOKUP({model},Wheels!A5:D8,4,FALSE)",
       "Pa")
ah.add("es", "Sensible effectiveness at design flow", "ε_s", 75, "%")
ah.add("eL", "Latent effectiveness at design flow", "ε_L", 68, "%")
ah.heading("Summer design (cooling)")
ah.add("toa", "Outdoor air dry bulb", "t_oa", 33, "°C")
ah.add("woa", "Outdoor air humidity ratio", "W_oa", 18.0, "g/kg")
ah.add("tra", "Return (exhaust) air dry bulb", "t_ra", 24, "°C")
ah.add("wra", "Return (exhaust) air humidity ratio", "W_ra", 9.3, "g/kg")
ah.add("tsa", "Supply air leaving the wheel", "t_sa", "={toa}-{es}/100*{mmin}/{ms}*({toa}-{tra})",
       "°C")
ah.add("tsa2", "Supply air leaving the wheel (first draft)", "t_sa2",
       "={toa}-{es}*{mmin}/{ms}*({toa}-{tra})", "°C",
       planted=("unit-scale", "effectiveness in % used as a fraction: 100 too large"))
ah.add("wsa", "Supply humidity ratio leaving the wheel", "W_sa",
       "={woa}-{eL}/100*{mmin}/{ms}*({woa}-{wra})", "g/kg")
ah.add("cp", "Specific heat of dry air", "c_p", 1.006, "kJ/(kg·K)")
ah.add("cpv", "Specific heat of water vapour", "c_pv", 1.86, "kJ/(kg·K)")
ah.add("hg0", "Enthalpy of saturated vapour at 0 °C", "h_g0", 2501, "kJ/kg")
ah.add("Qs", "Sensible heat recovered", "Q_s", "={ms}*{cp}*({toa}-{tsa})", "kW")
ah.add("QL", "Latent heat recovered", "Q_L", "={ms}*{hg0}*({woa}-{wsa})/1000", "kW")
ah.add("QL2", "Latent heat recovered (energy model input)", "Q_L2", "={ms}*{hg0}*({woa}-{wsa})",
       "kW", planted=("unit-scale", "humidity ratio in g/kg used as kg/kg: 1000 too large"))
ah.add("Qt", "Total heat recovered", "Q_t", "={Qs}+{QL}", "kW")
ah.add("hoa", "Outdoor air enthalpy", "h_oa", "={cp}*{toa}+{woa}/1000*({hg0}+{cpv}*{toa})", "kJ/kg")
ah.add("hsa", "Supply air enthalpy leaving the wheel", "h_sa",
       "={cp}*{tsa}+{wsa}/1000*({hg0}+{cpv}*{tsa})", "kJ/kg")
ah.add("Qth", "Total heat recovered from enthalpies (check)", "Q_t,h", "={ms}*({hoa}-{hsa})", "kW")
ah.add("QtB", "Total heat recovered, Btu/h", "Q_t,US", "={Qt}*3412", "Btu/h")
ah.add("QtTR", "Cooling plant relieved, tons", "Q_t,TR", "={QtB}/12000", "TR")
ah.add("QtTR2", "Cooling plant relieved, tons (chiller schedule)", "Q_t,TR2", "={Qt}*3.517", "TR",
       planted=("unit-scale", "kW to tons multiplied by 3.517: wrong way round"))
ah.add("dTF", "Supply air temperature drop across the wheel, °F", "ΔT_F", "=({toa}-{tsa})*1.8",
       "Δ°F")
ah.add("QsUS", "Sensible heat recovered by the US rule (check)", "Q_s,US", "=1.08*{cfm}*{dTF}",
       "Btu/h")
ah.add("tsaF", "Supply air leaving the wheel, °F", "t_sa,F", "={tsa}*1.8+32", "°F")
ah.add("tsaF2", "Supply air leaving the wheel, °F (controls points list)", "t_sa,F2", "={tsa}*1.8",
       "°F", planted=("offset-scale", "°C to °F without the 32"))
ah.heading("Winter design (heating)")
ah.add("tow", "Outdoor air dry bulb, winter", "t_ow", -12, "°C")
ah.add("trw", "Return air dry bulb, winter", "t_rw", 21, "°C")
ah.add("tsw", "Supply air leaving the wheel, winter", "t_sw",
       "={tow}+{es}/100*{mmin}/{ms}*({trw}-{tow})", "°C")
ah.add("Qw", "Heat recovered, winter design", "Q_w", "={ms}*{cp}*({tsw}-{tow})", "kW")
ah.add("tex", "Exhaust air leaving the wheel, winter", "t_ex", "={trw}-{ms}/{me}*({tsw}-{tow})",
       "°C")
ah.add("tfr", "Frost threshold, exhaust leaving (maker)", "t_fr", -6, "°C")
ah.add("frchk", "Frost check", "check_fr", "=IF({tex}<{tfr},\"FROST CONTROL\",\"OK\")")
ah.add("rsw", "Supply air density leaving the wheel, winter", "rho_sw",
       "={rho}*(20+273.15)/({tsw}+273.15)", "kg/m³")
ah.add("rsw2", "Supply air density leaving the wheel (duct sizing sheet)", "rho_sw2",
       "={rho}*20/{tsw}", "kg/m³",
       planted=("offset-scale", "°C readings in a density (temperature) ratio"))
ah.heading("Fan and drive penalty")
ah.add("etaf", "Fan and motor efficiency", "eta_f", 60, "%")
ah.add("Pf", "Added fan power, both airstreams", "P_f", "=({Vs}+{Ve})*{dpw}/({etaf}/100)/1000",
       "kW")
ah.add("PfW", "Added fan power, W (electrical list)", "P_f,W", "={Pf}*1000", "W")
ah.add("Pm", "Wheel drive motor", "P_m", 0.37, "kW")
ah.add("Qn", "Net heat recovered, winter design", "Q_n", "={Qw}-{Pf}-{Pm}", "kW")
ah.add("Qn2", "Net heat recovered (energy report)", "Q_n2", "={Qw}-{PfW}-{Pm}", "kW",
       planted=("unit-scale", "fan power in W subtracted from kW"))
ah.heading("Season")
ah.add("E", "Heat recovered over the heating season", "E", "=Bins!E8", "MWh")
ah.add("etab", "Boiler seasonal efficiency", "eta_b", 90, "%")
ah.add("G", "Boiler fuel saved", "G", "={E}/({etab}/100)*3.6", "GJ")
ah.add("G2", "Boiler fuel saved (grant application)", "G_2", "={E}/({etab}/100)/3.6", "GJ",
       planted=("unit-scale", "MWh to GJ divided by 3.6: wrong way round"))
AHU = ah.finish()

Ar = ah.ref
BINS = {
    "A1": "Ridgeway Clinic AHU-3: heating-season temperature bins (invented bin hours)",
    "A2": ("Sources: as the AHU sheet; heat recovered in a bin Q = m_min·c_p·ε_s·(t_rw − t_bin), "
           "energy = Q × hours (common practice; wheel taken at full speed in every bin, a first "
           "estimate)."),
    "A3": CAUTION,
    "A4": "Bin", "B4": "Outdoor air [°C]", "C4": "Hours [h]", "D4": "Heat recovered [kW]",
    "E4": "Energy [MWh]",
    "A8": "Season", "E8": "=SUM(E5:E7)",
}
for r, (b, t, h) in enumerate([("A", -10, 150), ("B", -2, 1300), ("C", 6, 1900)], start=5):
    BINS[f"A{r}"], BINS[f"B{r}"], BINS[f"C{r}"] = b, t, h
    BINS[f"D{r}"] = f"={Ar('mmin')}*{Ar('cp')}*{Ar('es')}/100*({Ar('trw')}-B{r})"
    BINS[f"E{r}"] = f"=D{r}*C{r}/1000"

WHEELS = {
    "A1": "Total-energy wheels, supply half face area (invented catalogue)",
    "A3": CAUTION,
    "A4": "Model", "B4": "Face area [m²]", "C4": "Max. face velocity [m/s]",
    "D4": "Pressure drop at max. [Pa]",
}
for r, row in enumerate([("EW-1800", 1.8, 3.2, 160), ("EW-2200", 2.2, 3.2, 150),
                         ("EW-2600", 2.6, 3.0, 135), ("EW-3200", 3.2, 3.0, 120)], start=5):
    for c, v in zip("ABCD", row):
        WHEELS[f"{c}{r}"] = v

AHUB = {
    "trade": "HVAC: air-handling unit with an energy-recovery wheel",
    "sheets": [("AHU", AHU), ("Bins", BINS), ("Wheels", WHEELS)],
    "planted": ah.planted,
}

# --------------------------------------------------------------------------------------------
# Book 2: gas production separator and orifice meter (psig, psia, kPa and bar(g), °F, °R and K,
# in. H2O and Pa, in and mm, Mscf/d and MMscf/d, ft³/s, kg/m³ and lb/ft³, bbl/d, MMBtu/d, GJ/d)
# --------------------------------------------------------------------------------------------
GAS_SRC = (
    "Sources: orifice mass flow q_m = C_d·E_v·Y·(π/4)·d²·√(2·ρ_f·Δp), E_v = 1/√(1 − β⁴), "
    "Y = 1 − (0.41 + 0.35·β⁴)·x/κ with x = Δp/p_f, AGA Report No. 3 Part 1 (1992/2012) and ISO "
    "5167-2 (from memory); inches of water at 60 °F, 1 in. H2O = 248.84 Pa and 27.707 in. H2O "
    "per psi (AGA-3, from memory); ρ = p·M/(Z·R·T), R = 8314 J/(kmol·K) (CODATA 2018 8314.46); "
    "M_air = 28.9625 kg/kmol (AGA-3, from memory); base 14.73 psia and 60 °F (common US "
    "contract practice); actual gas flow = standard flow × (p_b/p_f)·(T_f/T_b)·(Z_f/Z_b) (common "
    "practice); Souders-Brown V_t = K·√((ρ_l − ρ_g)/ρ_g), K = 0.20 ft/s for a vertical vessel "
    "with a mesh pad, GPSA Engineering Data Book 13th ed. (2012) sec. 7 (from memory); NIST SP "
    "811 (2008) App. B.8: 1 psi = 6895 Pa = 0.06895 bar, 1 in = 25.4 mm, 1 m³ = 35.31 ft³, "
    "1 lb/ft³ = 16.02 kg/m³, 1 bbl = 5.615 ft³, 1 MMBtu = 1.055 GJ; °R = °F + 459.67, K = °R/1.8. "
    "Field, wells, meter and readings invented.")
gm = ItemSheet("Meter", "Coldwater Flats pad 7 (invented): sales meter run FE-710 and inlet "
               "separator V-700", GAS_SRC)
gm.heading("Gas")
gm.add("M", "Molar mass of the gas (analysis)", "M", "=Gas!D11", "kg/kmol")
gm.add("HHV", "Gross heating value (analysis, 14.73 psia, 60 °F)", "HHV", 1.085, "MMBtu/Mscf")
gm.heading("Flowing conditions at the meter")
gm.add("pg", "Static pressure, upstream tap", "p_g", 850, "psig")
gm.add("pb", "Site barometric pressure", "p_atm", 13.9, "psia")
gm.add("pf", "Static pressure, absolute", "p_f", "={pg}+{pb}", "psia")
gm.add("pf2", "Static pressure, absolute (flow computer config)", "p_f2", "={pg}", "psia",
       planted=("offset-scale", "gauge pressure written into a psia cell"))
gm.add("pfk", "Static pressure, absolute, kPa", "p_f,kPa", "={pf}*6.895", "kPa")
gm.add("pfbar", "Static pressure, bar(g) (operator display)", "p_g,bar", "={pg}*0.06895", "bar(g)")
gm.add("tf", "Flowing temperature", "t_f", 78, "°F")
gm.add("TR", "Flowing temperature, absolute", "T_f", "={tf}+459.67", "°R")
gm.add("TK", "Flowing temperature, K", "T_f,K", "={TR}/1.8", "K")
gm.add("Zf", "Compressibility at flowing conditions (AGA-8 run)", "Z_f", 0.88, "-")
gm.add("rf", "Gas density at flowing conditions", "rho_f", "={pf}*6895*{M}/({Zf}*8314*{TK})",
       "kg/m³")
gm.add("rf2", "Gas density at flowing conditions (hand check)", "rho_f2",
       "={pf}*6895*{M}/({Zf}*8314*({tf}+273.15))", "kg/m³",
       planted=("offset-scale", "°F reading given the kelvin offset 273.15"))
gm.heading("Orifice")
gm.add("D", "Meter tube inside diameter (datasheet)", "D", 102.26, "mm")
gm.add("d", "Orifice bore (plate stamp)", "d", 2.250, "in")
gm.add("beta", "Diameter ratio", "β", "={d}*25.4/{D}", "-")
gm.add("beta2", "Diameter ratio (plate change sheet)", "β_2", "={d}/{D}", "-",
       planted=("unit-scale", "bore in in over tube in mm: 25.4 too small"))
gm.add("Ev", "Velocity of approach factor", "E_v", "=1/SQRT(1-{beta}^4)", "-")
gm.add("Cd", "Discharge coefficient (flow computer, design Re)", "C_d", 0.6025, "-")
gm.add("hw", "Differential pressure", "h_w", 64.0, "in. H2O")
gm.add("dp", "Differential pressure, Pa", "Δp", "={hw}*248.84", "Pa")
gm.add("kap", "Isentropic exponent", "κ", 1.30, "-")
gm.add("x", "Differential to static pressure ratio", "x", "={hw}/(27.707*{pf})", "-")
gm.add("x2", "Differential to static pressure ratio (first draft)", "x_2", "={hw}/{pf}", "-",
       planted=("unit-scale", "in. H2O over psia: 27.7 too large"))
gm.add("Y", "Expansion factor (upstream tap)", "Y", "=1-(0.41+0.35*{beta}^4)*{x}/{kap}", "-")
gm.add("qm", "Mass flow", "q_m", "={Cd}*{Ev}*{Y}*PI()/4*({d}*0.0254)^2*SQRT(2*{rf}*{dp})", "kg/s")
gm.heading("Base volume")
gm.add("pbase", "Base pressure (contract)", "p_b", 14.73, "psia")
gm.add("tbase", "Base temperature (contract)", "t_b", 60, "°F")
gm.add("TbR", "Base temperature, absolute", "T_b", "={tbase}+459.67", "°R")
gm.add("Zb", "Compressibility at base conditions", "Z_b", 0.998, "-")
gm.add("rb", "Gas density at base conditions", "rho_b", "={pbase}*6895*{M}/({Zb}*8314*{TbR}/1.8)",
       "kg/m³")
gm.add("qb", "Base volume flow", "q_b", "={qm}/{rb}", "m³/s")
gm.add("Qd", "Base volume flow, Mscf/d", "Q_b", "={qb}*35.31*86400/1000", "Mscf/d")
gm.add("Qd2", "Base volume flow (daily report)", "Q_b2", "={qb}*35.31*3600/1000", "Mscf/d",
       planted=("unit-scale", "s to d with 3600 (an hour): 24 too small"))
gm.add("QMM", "Base volume flow, MMscf/d", "Q_b,MM", "={Qd}/1000", "MMscf/d")
gm.add("En", "Energy delivered", "E", "={Qd}*{HHV}", "MMBtu/d")
gm.heading("Inlet separator V-700 (vertical, two-phase)")
gm.add("mar", "Design margin on metered gas", "margin", 25, "%")
gm.add("Qs", "Separator design gas rate", "Q_s", "={QMM}*(1+{mar}/100)", "MMscf/d")
gm.add("Qa", "Actual gas flow at separator conditions", "Q_a",
       "={Qs}*10^6/86400*({pbase}/{pf})*({TR}/{TbR})*({Zf}/{Zb})", "ft³/s")
gm.add("Qa2", "Actual gas flow (vendor enquiry)", "Q_a2",
       "={Qs}*10^6/86400*({pbase}/{pg})*({TR}/{TbR})*({Zf}/{Zb})", "ft³/s",
       planted=("offset-scale", "gauge pressure in the gas-law ratio where psia belongs"))
gm.add("rgUS", "Gas density, lb/ft³", "rho_g", "={rf}/16.02", "lb/ft³")
gm.add("rl", "Condensate density", "rho_l", 45.0, "lb/ft³")
gm.add("K", "Souders-Brown factor (vertical, mesh pad)", "K", 0.20, "ft/s")
gm.add("Vt", "Allowable gas velocity", "V_t", "={K}*SQRT(({rl}-{rgUS})/{rgUS})", "ft/s")
gm.add("Amin", "Minimum gas flow area", "A_min", "={Qa}/{Vt}", "ft²")
gm.add("Dmin", "Minimum vessel inside diameter", "D_min", "=SQRT(4*{Amin}/PI())*12", "in")
gm.add("Dsel", "Vessel inside diameter selected", "D_sel", 24, "in")
gm.add("Dchk", "Gas capacity check", "check_D", "=IF({Dsel}>={Dmin},\"OK\",\"LARGER VESSEL\")")
gm.add("yc", "Condensate yield", "y_c", 40, "bbl/MMscf")
gm.add("Qc", "Condensate rate", "Q_c", "={Qs}*{yc}", "bbl/d")
gm.add("tr", "Liquid retention time", "t_r", 3, "min")
gm.add("Vl", "Liquid volume held", "V_l", "={Qc}*{tr}/1440*5.615", "ft³")
gm.add("Vl2", "Liquid volume held (vendor enquiry)", "V_l2", "={Qc}*{tr}/1440*0.159", "ft³",
       planted=("unit-scale", "m³ per bbl (0.159) in a ft³ cell: 35.3 too small"))
gm.add("MAWP", "Vessel MAWP (nameplate)", "MAWP", 1000, "psig")
gm.add("pchk", "Pressure margin check (operating + 10 %)", "check_p",
       "=IF({pg}*1.1<={MAWP},\"OK\",\"REVIEW RELIEF\")")
gm.add("pchk2", "Pressure margin check (HAZOP sheet)", "check_p2",
       "=IF({pf}*1.1<={MAWP},\"OK\",\"REVIEW RELIEF\")",
       planted=("offset-scale", "absolute pressure compared with a gauge MAWP"))
METER = gm.finish()

GAS = {
    "A1": "Coldwater Flats pad 7: gas analysis (invented sample)",
    "A2": ("Sources: molar masses, GPA 2145-16 (from memory, rounded); molar mass of the mixture "
           "= Σ y_i·M_i (common practice)."),
    "A3": CAUTION,
    "A4": "Component", "B4": "Mole fraction [%]", "C4": "Molar mass [kg/kmol]",
    "D4": "Share of molar mass [kg/kmol]",
    "A11": "Gas", "B11": "=SUM(B5:B10)", "D11": "=SUM(D5:D10)",
    "A12": "Check by SUMPRODUCT", "D12": "=SUMPRODUCT(B5:B10,C5:C10)/100",
    "A13": "Check by SUMPRODUCT (lab's sheet)", "D13": "=SUMPRODUCT(B5:B10,C5:C10)",
}
for r, (c, y, m) in enumerate([("Methane", 88.5, 16.043), ("Ethane", 6.2, 30.069),
                               ("Propane", 2.3, 44.096), ("n-Butane", 0.8, 58.122),
                               ("Nitrogen", 1.2, 28.013), ("Carbon dioxide", 1.0, 44.010)],
                              start=5):
    GAS[f"A{r}"], GAS[f"B{r}"], GAS[f"C{r}"] = c, y, m
    GAS[f"D{r}"] = f"=B{r}/100*C{r}"

GASB = {
    "trade": "gas production: orifice sales meter and inlet separator",
    "sheets": [("Meter", METER), ("Gas", GAS)],
    "planted": {**gm.planted,
                "Gas!D13": ("unit-scale", "mole % used as a fraction: 100 too large")},
}

# --------------------------------------------------------------------------------------------
# Book 3: asphalt resurfacing (km, m, mm and in, m² and yd², kg/m³ and lb/ft³, t and ton,
# gal/yd² and L/m², t/h, min and h, °C and °F)
# --------------------------------------------------------------------------------------------
ASP_SRC = (
    "Sources: tonnage = area × compacted thickness × compacted density (common practice; Asphalt "
    "Institute MS-22, Construction of Hot Mix Asphalt Pavements, 2nd ed. (2001), from memory); US "
    "spread rate lb/(yd²·in) = density (lb/ft³) × 9 ft²/yd² / 12 in/ft (common practice); tack "
    "coat 0.04 to 0.08 gal/yd² of undiluted emulsion (from memory, check the agency's "
    "specification); minimum lift 3 × nominal maximum aggregate size (AASHTO R 35 / common "
    "practice, from memory); NIST SP 811 (2008) App. B.8: 1 m² = 1.196 yd², 1 in = 25.4 mm, "
    "1 lb/ft³ = 16.02 kg/m³, 1 t = 1.102 short ton, 1 US gal = 3.785 L, 1 gal/yd² = 4.527 L/m²; "
    "short ton = 2000 lb; °F = 1.8·°C + 32. Road, contractor, plant and truck data invented.")
ap = ItemSheet("Paving", "County Road 14, Harlow Township (invented): 50 mm mill-and-overlay, "
               "quantities and haul", ASP_SRC)
ap.heading("Area")
ap.add("A", "Area to pave (Sections sheet)", "A", "=Sections!E9", "m²")
ap.add("Ayd", "Area to pave, yd²", "A_yd", "={A}*1.196", "yd²")
ap.add("Ayd2", "Area to pave, yd² (bid form)", "A_yd2", "={A}/1.196", "yd²",
       planted=("unit-scale", "m² to yd² divided by 1.196: wrong way round"))
ap.heading("Mix and thickness")
ap.add("mix", "Surface mix", "mix", "SP 12.5")
ap.add("t", "Compacted lift thickness", "t", 50, "mm")
ap.add("tin", "Compacted lift thickness, in", "t_in", "={t}/25.4", "in")
ap.add("rho", "Compacted density of the mix (Mixes sheet)", "rho",
       "=VLOOKUP({mix},Mixes!A5:D8,2,FALSE)", "kg/m³")
ap.add("tmin", "Minimum lift for the mix (Mixes sheet)", "t_min",
       "=VLOOKUP({mix},Mixes!A5:D8,3,FALSE)", "mm")
ap.add("tchk", "Lift thickness check", "check_t", "=IF({t}>={tmin},\"OK\",\"TOO THIN\")")
ap.add("V", "Compacted volume", "V", "={A}*{t}/1000", "m³")
ap.add("V2", "Compacted volume (take-off sheet)", "V_2", "={A}*{t}", "m³",
       planted=("unit-scale", "thickness in mm used as m: 1000 too large"))
ap.add("W", "Mix tonnage", "W", "={V}*{rho}/1000", "t")
ap.add("W2", "Mix tonnage (foreman's note)", "W_2", "={V}*{rho}", "t",
       planted=("unit-scale", "kg written as t: the /1000 missing"))
ap.add("Wton", "Mix tonnage, short tons", "W_ton", "={W}*1.102", "ton")
ap.add("rlb", "Compacted density, lb/ft³", "rho_US", "={rho}/16.02", "lb/ft³")
ap.add("sr", "Spread rate per inch of thickness", "s", "={rlb}*9/12", "lb/(yd²·in)")
ap.add("WUS", "Mix tonnage by the US method (check)", "W_US", "={Ayd}*{tin}*{sr}/2000", "ton")
ap.add("WUS2", "Mix tonnage by the US method (bid form)", "W_US2", "={Ayd}*{tin}*{sr}", "ton",
       planted=("unit-scale", "pounds written as tons: the /2000 missing"))
ap.add("waste", "Waste and handling allowance", "a_w", 3, "%")
ap.add("Word", "Mix to order", "W_ord", "={W}*(1+{waste}/100)", "t")
ap.add("Word2", "Mix to order (plant order)", "W_ord2", "={W}*(1+{waste})", "t",
       planted=("unit-scale", "allowance in % used as a fraction"))
ap.heading("Tack coat")
ap.add("tr", "Tack application rate (undiluted emulsion)", "r_t", 0.06, "gal/yd²")
ap.add("trL", "Tack application rate, L/m²", "r_t,SI", "={tr}*4.527", "L/m²")
ap.add("trL2", "Tack application rate, L/m² (distributor setting)", "r_t,SI2", "={tr}/4.527",
       "L/m²", planted=("unit-scale", "gal/yd² to L/m² divided by 4.527: wrong way round"))
ap.add("TV", "Tack volume", "V_t", "={trL}*{A}", "L")
ap.add("TG", "Tack volume, US gal", "V_t,US", "={TV}/3.785", "gal")
ap.add("TG2", "Tack volume, US gal (check from yd²)", "V_t,US,c", "={tr}*{Ayd}", "gal")
ap.add("rt", "Emulsion density", "rho_t", 1.02, "kg/L")
ap.add("TM", "Tack mass to order", "m_t", "={TV}*{rt}/1000", "t")
ap.heading("Paving rate and haul")
ap.add("vp", "Paver speed", "v_p", 6, "m/min")
ap.add("wp", "Paving width (one lane)", "w_p", 3.65, "m")
ap.add("Pp", "Paver output at that speed", "P_p", "={vp}*{wp}*{t}/1000*{rho}/1000*60", "t/h")
ap.add("Pp2", "Paver output (first draft)", "P_p2", "={vp}*{wp}*{t}/1000*{rho}/1000", "t/h",
       planted=("unit-scale", "per minute written as per hour: 60 too small"))
ap.add("Pplant", "Plant output allotted to the job", "P_plant", 180, "t/h")
ap.add("P", "Laying rate", "P", "=MIN({Pp},{Pplant})", "t/h")
ap.add("pay", "Truck payload", "m_tr", 22, "t")
ap.add("dist", "Haul distance, one way", "L_h", 24, "km")
ap.add("spd", "Average haul speed", "v_h", 55, "km/h")
ap.add("tl", "Load time at the plant", "t_l", 6, "min")
ap.add("td", "Wait and discharge time at the paver", "t_d", 8, "min")
ap.add("tc", "Truck cycle time", "t_c", "={tl}+2*{dist}/{spd}*60+{td}", "min")
ap.add("tc2", "Truck cycle time (dispatcher's sheet)", "t_c2", "={tl}+2*{dist}/{spd}+{td}", "min",
       planted=("unit-scale", "travel time in h added to minutes"))
ap.add("n", "Trucks needed", "n", "=ROUNDUP({P}*{tc}/60/{pay},0)", "-")
ap.add("sh", "Paving hours per shift", "t_sh", 10, "h")
ap.add("Wsh", "Mix laid per shift", "W_sh", "={P}*{sh}", "t")
ap.add("nsh", "Shifts to finish", "n_sh", "=ROUNDUP({Word}/{Wsh},0)", "-")
ap.heading("Temperature")
ap.add("tlay", "Minimum mix temperature behind the screed", "t_lay", 140, "°C")
ap.add("tlayF", "Minimum mix temperature, °F", "t_lay,F", "={tlay}*1.8+32", "°F")
ap.add("tlayF2", "Minimum mix temperature, °F (inspector's card)", "t_lay,F2", "=({tlay}-32)/1.8",
       "°F", planted=("offset-scale", "°C to °F done with the °F-to-°C formula"))
PAVING = ap.finish()
Pr = ap.ref

SECTIONS = {
    "A1": "County Road 14: overlay sections (invented take-off)",
    "A2": ("Sources: as the Paving sheet; area = length × width; milled volume = area × "
           "milling depth, milled to the lift thickness (common practice)."),
    "A3": CAUTION,
    "A4": "Section", "B4": "From", "C4": "Length [km]", "D4": "Width [m]", "E4": "Area [m²]",
    "F4": "Milled volume [m³]",
    "A9": "Total", "C9": "=SUM(C5:C8)", "E9": "=SUM(E5:E8)", "F9": "=SUM(F5:F8)",
}
for r, (s, frm, L, w) in enumerate([("1", "Sta 0+000", 1.85, 7.3), ("2", "Sta 1+850", 1.20, 6.7),
                                    ("3", "Sta 3+050", 0.95, 7.9),
                                    ("4", "Sta 4+000 (turn lanes)", 0.60, 10.4)], start=5):
    SECTIONS[f"A{r}"], SECTIONS[f"B{r}"], SECTIONS[f"C{r}"], SECTIONS[f"D{r}"] = s, frm, L, w
    SECTIONS[f"E{r}"] = f"=C{r}*1000*D{r}"
    SECTIONS[f"F{r}"] = f"=C{r}*1000*D{r}*{Pr('t')}/1000"
SECTIONS["F7"] = f"=C7*D7*{Pr('t')}/1000"   # planted: km × m without the 1000

MIXES = {
    "A1": ("Surface and binder mixes: compacted density and lift limits (invented mix designs; "
           "lift limits 3 × and 5 × the nominal maximum aggregate size, common practice)"),
    "A3": CAUTION,
    "A4": "Mix", "B4": "Compacted density [kg/m³]", "C4": "Minimum lift [mm]",
    "D4": "Maximum lift [mm]",
}
for r, row in enumerate([("SP 9.5", 2360, 30, 50), ("SP 12.5", 2400, 38, 65),
                         ("SP 19", 2430, 57, 95), ("SP 25", 2450, 75, 125)], start=5):
    for c, v in zip("ABCD", row):
        MIXES[f"{c}{r}"] = v

ASPB = {
    "trade": "road works: asphalt mill-and-overlay quantities and haul",
    "sheets": [("Paving", PAVING), ("Sections", SECTIONS), ("Mixes", MIXES)],
    "planted": {**ap.planted,
                "Sections!F7": ("unit-scale", "km × m × m without the 1000: 1000 too small")},
}

# --------------------------------------------------------------------------------------------
# Book 4: pumped-storage hydro (m and ft, m³/s and cfs, hm³ and m³, ha, MW and kW, MWh, h and s,
# %, bar(g), psig and psia, $/MWh and $/kWh)
# --------------------------------------------------------------------------------------------
PSH_SRC = (
    "Sources: P = ρ·g·Q·H·η (turbine) and P = ρ·g·Q·H/η (pump), energy = ρ·g·V·H·η (common "
    "practice; e.g. USBR Engineering Monograph 20 and IEC 60041, from memory); Darcy-Weisbach "
    "h_f = f·L/D·v²/(2g), Crane TP-410 (2009) ch. 1 (from memory); stage-storage by average end "
    "areas, ΔV = (A_1 + A_2)/2·Δh, 1 ha·m = 10⁴ m³ = 0.01 hm³ (common practice); g = 9.81 m/s² "
    "(9.80665, SI Brochure 9th ed.); 1 MWh = 3.6 × 10⁹ J (SI Brochure 9th ed.); NIST SP 811 (2008) "
    "App. B.8: 1 m = 3.281 ft, 1 m³ = 35.31 ft³, 1 bar = 14.50 psi; standard atmosphere 1.013 bar "
    "= 14.7 psi. Scheme, levels, machines and prices invented.")
ps = ItemSheet("Scheme", "Carn Dubh pumped-storage scheme (invented): two reversible "
               "pump-turbines, daily cycle", PSH_SRC)
ps.heading("Levels and head")
ps.add("zuf", "Upper reservoir, full supply level", "z_uf", 640, "m")
ps.add("zum", "Upper reservoir, minimum operating level", "z_um", 622, "m")
ps.add("zl", "Lower reservoir, normal level", "z_l", 108, "m")
ps.add("Hg", "Mean gross head", "H_g", "=({zuf}+{zum})/2-{zl}", "m")
ps.heading("Waterway")
ps.add("n", "Units", "n", 2, "-")
ps.add("Qu", "Turbine flow per unit (rated)", "Q_u", 110, "m³/s")
ps.add("Q", "Turbine flow, station", "Q", "={n}*{Qu}", "m³/s")
ps.add("Qcfs", "Turbine flow, station, cfs", "Q_cfs", "={Q}*35.31", "cfs")
ps.add("L", "Headrace tunnel and penstock length", "L", 2400, "m")
ps.add("D", "Waterway inside diameter", "D", 6.5, "m")
ps.add("f", "Darcy friction factor (lined tunnel)", "f", 0.012, "-")
ps.add("A", "Waterway bore area", "A", "=PI()/4*{D}^2", "m²")
ps.add("v", "Mean velocity, generating", "v", "={Q}/{A}", "m/s")
ps.add("hf", "Head loss, generating", "h_f", "={f}*{L}/{D}*{v}^2/(2*9.81)", "m")
ps.add("Hnt", "Net head, generating", "H_n,t", "={Hg}-{hf}", "m")
ps.add("Hnp", "Total head, pumping (same loss taken)", "H_n,p", "={Hg}+{hf}", "m")
ps.heading("Generating")
ps.add("rho", "Water density", "rho", 1000, "kg/m³")
ps.add("et", "Turbine efficiency", "eta_t", 91, "%")
ps.add("eg", "Generator and transformer efficiency", "eta_g", 98.5, "%")
ps.add("Pt", "Station output, generating", "P_t", "={rho}*9.81*{Q}*{Hnt}*{et}/100*{eg}/100/10^6",
       "MW")
ps.add("Pt2", "Station output (grid code submission)", "P_t2",
       "={rho}*9.81*{Q}*{Hnt}*{et}*{eg}/10^6", "MW",
       planted=("unit-scale", "two efficiencies in % used as fractions: 10 000 too large"))
ps.heading("Pumping")
ps.add("Qp", "Pump flow per unit", "Q_p,u", 95, "m³/s")
ps.add("Qpt", "Pump flow, station", "Q_p", "={n}*{Qp}", "m³/s")
ps.add("ep", "Pump efficiency", "eta_p", 90, "%")
ps.add("em", "Motor and transformer efficiency", "eta_m", 98.3, "%")
ps.add("Pp", "Pumping input, machines", "P_p", "={rho}*9.81*{Qpt}*{Hnp}/({ep}/100*{em}/100)/10^6",
       "MW")
ps.add("aux", "Station auxiliary load while pumping", "P_aux", 3200, "kW")
ps.add("Pin", "Pumping input, station", "P_in", "={Pp}+{aux}/1000", "MW")
ps.add("Pin2", "Pumping input, station (tariff sheet)", "P_in2", "={Pp}+{aux}", "MW",
       planted=("unit-scale", "auxiliary load in kW added to MW"))
ps.heading("Storage and cycle")
ps.add("Vf", "Storage at full supply level (Stage sheet)", "V_f",
       "=VLOOKUP({zuf},Stage!A5:C10,3,FALSE)", "hm³")
ps.add("Vm", "Storage at minimum operating level (Stage sheet)", "V_m",
       "=VLOOKUP({zum},Stage!A5:C10,3,FALSE)", "hm³")
ps.add("Vu", "Usable storage", "V_u", "={Vf}-{Vm}", "hm³")
ps.add("Vum", "Usable storage, m³", "V_u,m3", "={Vu}*10^6", "m³")
ps.add("tg", "Generating time at full output", "t_g", "={Vum}/{Q}/3600", "h")
ps.add("tg2", "Generating time (operator's summary)", "t_g2", "={Vum}/{Q}", "h",
       planted=("unit-scale", "seconds written as hours: 3600 too large"))
ps.add("Eg", "Energy generated per cycle", "E_g", "={Pt}*{tg}", "MWh")
ps.add("Egc", "Energy stored, from volume and head (check)", "E_g,c",
       "={rho}*9.81*{Vum}*{Hnt}*{et}/100*{eg}/100/3600/10^6", "MWh")
ps.add("Egc2", "Energy stored (feasibility report)", "E_g,c2",
       "={rho}*9.81*{Vu}*{Hnt}*{et}/100*{eg}/100/3600/10^6", "MWh",
       planted=("unit-scale", "hm³ used as m³: 10⁶ too small"))
ps.add("tp", "Pumping time to refill", "t_p", "={Vum}/{Qpt}/3600", "h")
ps.add("Ep", "Energy taken from the grid per cycle", "E_p", "={Pin}*{tp}", "MWh")
ps.add("ert", "Round-trip efficiency", "eta_rt", "={Eg}/{Ep}*100", "%")
ps.add("ert2", "Round-trip efficiency (board paper)", "eta_rt2", "={Eg}/{Ep}", "%",
       planted=("unit-scale", "a fraction written in a % cell: 100 too small"))
ps.heading("Spiral case pressure (static, full supply level)")
ps.add("zs", "Machine centreline (below tailwater for submergence)", "z_s", 85, "m")
ps.add("pbar", "Static pressure at the spiral case", "p_s", "={rho}*9.81*({zuf}-{zs})/10^5",
       "bar(g)")
ps.add("ppsig", "Static pressure at the spiral case, psig", "p_s,US", "={pbar}*14.50", "psig")
ps.add("ppsia", "Static pressure at the spiral case, absolute", "p_s,a", "={ppsig}+14.7", "psia")
ps.add("ppsia2", "Static pressure, absolute (valve datasheet)", "p_s,a2", "={pbar}*14.50", "psia",
       planted=("offset-scale", "gauge pressure written as absolute"))
ps.heading("Cycle economics")
ps.add("cbuy", "Off-peak energy price", "c_buy", 28, "$/MWh")
ps.add("csell", "Peak energy price", "c_sell", 0.092, "$/kWh")
ps.add("cost", "Cost of pumping energy per cycle", "C_p", "={Ep}*{cbuy}", "$")
ps.add("rev", "Revenue from generation per cycle", "R_g", "={Eg}*{csell}*1000", "$")
ps.add("rev2", "Revenue per cycle (first draft)", "R_g2", "={Eg}*{csell}", "$",
       planted=("unit-scale", "$/kWh times MWh: 1000 too small"))
ps.add("marg", "Margin per cycle", "M", "={rev}-{cost}", "$")
SCHEME = ps.finish()

STAGE = {
    "A1": "Carn Dubh upper reservoir: stage-storage from the bathymetric survey (invented)",
    "A2": ("Sources: as the Scheme sheet; storage by average end areas, ΔV = (A_1 + A_2)/2·Δh, "
           "1 ha·m = 0.01 hm³ (common practice); storage below 622 m (dead storage) from the survey."),
    "A3": CAUTION,
    "A4": "Level [m]", "B4": "Surface area [ha]", "C4": "Storage [hm³]", "D4": "Storage [m³]",
}
for r, (z, a) in enumerate([(622, 31), (626, 34), (630, 36.5), (634, 39), (638, 41.5),
                            (640, 43)], start=5):
    STAGE[f"A{r}"], STAGE[f"B{r}"] = z, a
    STAGE[f"C{r}"] = 2.08 if r == 5 else f"=C{r-1}+(B{r-1}+B{r})/2*(A{r}-A{r-1})/100"
    STAGE[f"D{r}"] = f"=C{r}*10^6"
STAGE["D7"] = "=C7*1000"                   # planted: hm³ to m³ with 1000

PSHB = {
    "trade": "hydropower: pumped-storage scheme, head, power, storage and cycle",
    "sheets": [("Scheme", SCHEME), ("Stage", STAGE)],
    "planted": {**ps.planted,
                "Stage!D7": ("unit-scale", "hm³ to m³ with 1000 where 10⁶ belongs: 1000 too small")},
}

BOOKS = {"erv-wheel-ahu": AHUB, "gas-meter-separator": GASB, "asphalt-overlay": ASPB,
         "pumped-storage": PSHB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()
