#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review41), written with the
standard library only (corpus/sheets/xlsx_writer.py and item_sheet.py, shared by the review
books), adapted from corpus/sheets/review19/make_books.py.

Trades: a landfill's gas collection field and enclosed flare; an indoor swimming pool's heating
and evaporation; a tower crane's pad foundation (overturning, sliding and bearing); a
compressed-air plant's refrigerated dryer and its condensate. All scenarios, sites, readings and
catalogue data are invented (demonstration only); the formulas and published factors are the
trade's own, with their sources named in a text cell at the top of each sheet ("from memory" or
"common practice" where no published table was at hand).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. The findings plumb makes beyond the planted ones, and the planted cells it
misses, are recorded with their reasons in review_notes.py (EXTRA, MISSED, RENAMED, MESSAGES)
after running the binary of the day.

Run: python3 make_books.py  ->  *.xlsx, *.expect (where absent; --expect rewrites them) in this
folder (these books need no .cells.plumb sidecar)
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
# Book 1: landfill gas collection and flare (scfm and Nm³/h, %, Btu/scf and MJ/Nm³, MMBtu/h
# and MW, inH2O and kPa)
# --------------------------------------------------------------------------------------------
LFG_SRC = (
    "Sources: methane HHV 1012 Btu/scf at 60 °F and LHV 35.8 MJ/Nm³ at 0 °C, GPSA Engineering "
    "Data Book 13th ed. (2012) sec. 23 (from memory); 1 scfm (60 °F, 14.696 psia) = 1.607 Nm³/h "
    "(0 °C, 101.325 kPa): 0.028317 m³ × 60 × 273.15/288.71, NIST SP 811 (2008) App. B.8 and the "
    "ideal gas law (common practice); 1 MMBtu/h = 0.2931 MW, NIST SP 811 (2008) App. B.8; 1 "
    "inH2O = 0.2491 kPa, NIST SP 811 (2008) App. B.8; 1 psi = 6.895 kPa; standard atmosphere "
    "101.325 kPa; methane density 0.717 kg/Nm³ (from memory); stoichiometric air 9.52 Nm³ per "
    "Nm³ of methane (common practice); enclosed flare residence time ≥ 0.6 s at ≥ 1000 °C "
    "(common practice, check the permit); GWP of methane 28, IPCC AR5 (2014). Well readings, "
    "flare data and site invented.")
fl = ItemSheet("Flare", "Brackwater Hill landfill: gas collection and enclosed flare sizing "
               "(invented scenario)", LFG_SRC)
fl.add("Q", "Landfill gas flow to flare (sum of wells)", "Q", "=Wells!B11", "scfm")
fl.add("QN", "Landfill gas flow, normal", "Q_N", "={Q}*1.607", "Nm³/h")
fl.add("x", "Methane content, flow-weighted", "x_CH4", "=Wells!C11", "%")
fl.add("QCH4", "Methane flow", "Q_CH4", "={Q}*{x}/100", "scfm")
fl.add("QCH4b", "Methane flow (permit form)", "Q_CH4,2", "={Q}*{x}", "scfm",
       planted=("unit-scale", "methane in % used as a fraction: 100 too large"))
fl.add("QCH4N", "Methane flow, normal", "Q_CH4,N", "={QN}*{x}/100", "Nm³/h")
fl.add("HHVm", "Methane higher heating value", "HHV_CH4", 1012, "Btu/scf")
fl.add("LHVm", "Methane lower heating value", "LHV_CH4", 35.8, "MJ/Nm³")
fl.add("HHV", "Landfill gas HHV", "HHV", "={HHVm}*{x}/100", "Btu/scf")
fl.add("LHV", "Landfill gas LHV", "LHV", "={LHVm}*{x}/100", "MJ/Nm³")
fl.add("D", "Flare heat release (HHV)", "Q_fl", "={Q}*{HHV}*60/10^6", "MMBtu/h")
fl.add("D2", "Flare heat release (HHV), rev. A", "Q_fl,2", "={Q}*{HHV}*60/1000", "MMBtu/h",
       planted=("unit-scale", "Btu/h divided by 1000 written as MMBtu/h: 1000 too large"))
fl.add("DMW", "Flare heat release (HHV), MW", "Q_fl,MW", "={D}*0.2931", "MW")
fl.add("DMW2", "Flare heat release (HHV), MW (vendor form)", "Q_fl,MW2", "={D}/0.2931", "MW",
       planted=("unit-scale", "MMBtu/h to MW divided by 0.2931: wrong way round"))
fl.add("DL", "Flare heat release (LHV)", "Q_fl,LHV", "={QN}*{LHV}/3600", "MW")
fl.add("DL2", "Flare heat release (LHV), check", "Q_fl,LHV2", "={QN}*{LHV}/3.6", "MW",
       planted=("unit-scale", "MJ/h divided by 3.6 gives kW, written under MW: 1000 too large"))
fl.add("model", "Flare model", "model", "EF-12")
fl.add("cap", "Flare rated heat release", "Q_cap", "=VLOOKUP({model},Models!A5:D8,2,FALSE)",
       "MMBtu/h")
fl.add("turn", "Flare turndown (minimum share of rating)", "r_td",
       "=VLOOKUP({model},Models!A5:D8,3,FALSE)", "%")
fl.add("util", "Flare loading", "u", "={D}/{cap}*100", "%")
fl.add("chk", "Capacity check", "check", "=IF({D}<={cap},IF({util}>={turn},\"OK\",\"BELOW TURNDOWN\"),\"OVER\")")
fl.add("EA", "Excess air", "EA", 150, "%")
fl.add("Qair", "Combustion air", "Q_air", "={QCH4N}*9.52*(1+{EA}/100)", "Nm³/h")
fl.add("Qflue", "Flue gas flow (LFG + air, volume change neglected)", "Q_flue", "={QN}+{Qair}",
       "Nm³/h")
fl.add("Tf", "Combustion temperature", "t_f", 1000, "°C")
fl.add("TfF", "Combustion temperature, °F (permit)", "t_f,F", "={Tf}*1.8+32", "°F")
fl.add("Qact", "Flue gas flow at combustion temperature", "Q_act", "={Qflue}*({Tf}+273.15)/273.15",
       "m³/h")
fl.add("Qact2", "Flue gas flow at combustion temperature (hand check)", "Q_act,2",
       "={Qflue}*{Tf}/273.15", "m³/h",
       planted=("offset-scale", "temperature ratio with °C where K belongs"))
fl.add("Dst", "Flare shell inside diameter", "D_st", 8.5, "ft")
fl.add("Hst", "Shell height above the burner", "H_st", 30, "ft")
fl.add("Vst", "Combustion zone volume", "V_st", "=PI()/4*({Dst}*0.3048)^2*{Hst}*0.3048", "m³")
fl.add("tres", "Residence time", "t_res", "={Vst}/({Qact}/3600)", "s")
fl.add("tres2", "Residence time (first draft)", "t_res,2", "={Vst}/{Qact}", "s",
       planted=("unit-scale", "m³ over m³/h gives hours, written as s: 3600 too small"))
fl.add("tchk", "Residence time check (0.6 s)", "check_t", "=IF({tres}>=0.6,\"OK\",\"SHORT\")")
fl.add("vst", "Shell velocity", "v_st", "={Qact}/3600/(PI()/4*({Dst}*0.3048)^2)", "m/s")
fl.add("pvac", "Mean wellhead vacuum", "p_vac", "=Wells!F11", "kPa")
fl.add("pin", "Blower inlet pressure, absolute", "p_in", "=101.325-{pvac}", "kPa")
fl.add("pdis", "Blower discharge pressure", "p_dis", 5, "psig")
fl.add("pout", "Blower discharge pressure, absolute", "p_out", "={pdis}*6.895+101.325", "kPa")
fl.add("PR", "Blower pressure ratio", "PR", "={pout}/{pin}", "-")
fl.add("PR2", "Blower pressure ratio (blower enquiry)", "PR_2", "={pdis}*6.895/{pin}", "-",
       planted=("offset-scale", "gauge discharge pressure over absolute inlet pressure"))
fl.add("mCH4", "Methane destroyed per year", "m_CH4", "={QCH4N}*0.717*8760/1000", "t/yr")
fl.add("CO2e", "Emission reduction", "CO2e", "={mCH4}*28", "t/yr")
FLARE = fl.finish()

WELLS = {
    "A1": "Brackwater Hill: wellhead readings, monthly monitoring round (invented readings)",
    "A2": ("Sources: as the Flare sheet; methane flow = LFG flow × CH4 %; 1 inH2O = 0.2491 kPa "
           "(NIST SP 811 (2008) App. B.8); vacuum recorded as a positive suction, a difference "
           "from the atmosphere (common practice)."),
    "A3": CAUTION,
    "A4": "Well", "B4": "LFG flow [scfm]", "C4": "CH4 [%]", "D4": "O2 [%]",
    "E4": "Vacuum [inH2O]", "F4": "Vacuum [kPa]", "G4": "CH4 flow [scfm]",
    "A11": "Total / weighted mean",
    "B11": "=SUM(B5:B10)", "C11": "=SUMPRODUCT(B5:B10,C5:C10)/B11",
    "D11": "=AVERAGE(D5:D10)", "F11": "=AVERAGE(F5:F10)", "G11": "=SUM(G5:G10)",
    "A12": "Highest vacuum", "B12": "=MAX(E5:F10)", "C12": "inH2O",
    "A13": "Oxygen alarm (any well over 5 %)", "B13": "=IF(MAX(D5:D10)>5,\"CHECK\",\"OK\")",
}
for r, (w, q, c, o, v) in enumerate([("GW-01", 62, 52.1, 0.8, 12.0), ("GW-02", 48, 49.5, 1.2, 14.5),
                                    ("GW-03", 75, 54.0, 0.4, 10.2), ("GW-04", 55, 47.8, 2.1, 16.0),
                                    ("GW-05", 81, 53.3, 0.6, 11.4), ("GW-06", 39, 45.2, 3.4, 18.8)],
                                   start=5):
    WELLS[f"A{r}"], WELLS[f"B{r}"], WELLS[f"C{r}"], WELLS[f"D{r}"], WELLS[f"E{r}"] = w, q, c, o, v
    WELLS[f"F{r}"] = f"=E{r}*0.2491"
    WELLS[f"G{r}"] = f"=B{r}*C{r}/100"
WELLS["F8"] = "=E8*0.2491*1000"       # planted: Pa value in the kPa column

MODELS = {
    "A1": "Enclosed flares: rated heat release and turndown (invented catalogue data)",
    "A4": "Model", "B4": "Rating [MMBtu/h]", "C4": "Turndown [%]", "D4": "Shell ID [ft]",
}
for r, row in enumerate([("EF-6", 6, 20, 6.0), ("EF-9", 9, 20, 7.0), ("EF-12", 12, 25, 8.5),
                         ("EF-18", 18, 25, 10.0)], start=5):
    for c, v in zip("ABCD", row):
        MODELS[f"{c}{r}"] = v

LFG = {
    "trade": "landfill gas: collection field and enclosed flare",
    "sheets": [("Flare", FLARE), ("Wells", WELLS), ("Models", MODELS)],
    "planted": {**fl.planted,
                "Wells!F8": ("unit-scale", "inH2O × 0.2491 × 1000 gives Pa, written in the kPa "
                             "column: 1000 too large"),
                "Wells!B12": ("mixed-range", "highest vacuum over the inH2O and kPa columns "
                              "together")},
}

# --------------------------------------------------------------------------------------------
# Book 2: indoor swimming pool heating and evaporation (m² and ft², °C and °F, kW and Btu/h,
# L/d and gal/d)
# --------------------------------------------------------------------------------------------
POOL_SRC = (
    "Sources: evaporation w_p = A·(p_w − p_a)·(0.089 + 0.0782·V)/Y·F_a (w_p kg/s, A m², p kPa, "
    "V m/s, Y kJ/kg) and activity factors, ASHRAE Handbook — HVAC Applications (2019) ch. 6 "
    "(from memory); saturation pressure over water p = 0.61094·exp(17.625·t/(t + 243.04)) kPa "
    "with t in °C, Alduchov & Eskridge (1996) (from memory); radiation σ·ε·A·(T_w⁴ − T_s⁴), "
    "σ = 5.67E-8 W/(m²·K⁴), Incropera et al., Fundamentals of Heat and Mass Transfer 7th ed. "
    "(2011) ch. 1; convection h = 3 W/(m²·K) still indoor air over water (common practice, from "
    "memory); latent heat 2430 kJ/kg near 30 °C, steam tables (from memory); c_p = 4.19 "
    "kJ/(kg·K), water 996 kg/m³ (common practice). NIST SP 811 (2008) App. B.8: 1 m² = 10.76 "
    "ft², 1 kW = 3412 Btu/h, 1 gal = 3.785 L, 1 m³ = 264.2 gal. US heater rule Btu/h = 500 × "
    "gpm × ΔT°F (8.34 lb/gal × 60 min/h, common practice). Pool and hall data invented.")
po = ItemSheet("Pool", "Larchmere Leisure Centre, 25 m pool: heat loss and make-up water "
               "(invented scenario)", POOL_SRC)
po.add("L", "Pool length", "L", 25, "m")
po.add("W", "Pool width", "W", 12.5, "m")
po.add("A", "Water surface area", "A", "={L}*{W}", "m²")
po.add("Aft", "Water surface area, ft²", "A_ft", "={A}*10.76", "ft²")
po.add("Aft2", "Water surface area, ft² (heater enquiry)", "A_ft2", "={A}*3.281", "ft²",
       planted=("unit-scale", "m² to ft² with the length factor 3.281: should be 10.76"))
po.add("h", "Mean water depth", "h", 1.5, "m")
po.add("Vw", "Pool water volume", "V_w", "={A}*{h}", "m³")
po.add("tw", "Water temperature", "t_w", 28, "°C")
po.add("twF", "Water temperature, °F", "t_w,F", "={tw}*1.8+32", "°F")
po.add("ta", "Hall air temperature", "t_a", 30, "°C")
po.add("RH", "Hall relative humidity", "RH", 60, "%")
po.add("pw", "Saturation pressure at the water surface", "p_w",
       "=0.61094*EXP(17.625*{tw}/({tw}+243.04))", "kPa")
po.add("pas", "Saturation pressure at hall air temperature", "p_a,sat",
       "=0.61094*EXP(17.625*{ta}/({ta}+243.04))", "kPa")
po.add("pa", "Vapour pressure of hall air", "p_a", "={pas}*{RH}/100", "kPa")
po.add("v", "Air velocity over the water", "V", 0.1, "m/s")
po.add("Y", "Latent heat of evaporation", "Y", 2430, "kJ/kg")
po.add("type", "Pool type", "type", "Public")
po.add("Fa", "Activity factor", "F_a", "=VLOOKUP({type},Activity!A5:B10,2,FALSE)", "-")
po.add("wp", "Evaporation rate", "w_p", "={A}*({pw}-{pa})*(0.089+0.0782*{v})/{Y}*{Fa}", "kg/s")
po.add("wph", "Evaporation rate, per hour", "w_p,h", "={wp}*3600", "kg/h")
po.add("rho", "Water density", "rho", 996, "kg/m³")
po.add("mu", "Make-up water (evaporation)", "V_mu", "={wph}*24/{rho}*1000", "L/d")
po.add("mug", "Make-up water, gal/d", "V_mu,gal", "={mu}/3.785", "gal/d")
po.add("mug2", "Make-up water, gal/d (water bill check)", "V_mu,gal2", "={mu}*3.785", "gal/d",
       planted=("unit-scale", "L/d to gal/d multiplied by 3.785: wrong way round"))
po.add("Qe", "Evaporation heat loss", "Q_e", "={wp}*{Y}", "kW")
po.add("Qe2", "Evaporation heat loss (from kg/h)", "Q_e2", "={wph}*{Y}", "kW",
       planted=("unit-scale", "kg/h used as kg/s: 3600 too large"))
po.add("hc", "Convection coefficient, water to air", "h_c", 3, "W/(m²·K)")
po.add("Qc", "Convection loss (negative: hall warmer)", "Q_c", "={hc}*{A}*({tw}-{ta})", "W")
po.add("eps", "Emissivity of water", "eps", 0.95, "-")
po.add("ts", "Mean surface temperature of hall enclosure", "t_s", 26, "°C")
po.add("Qr", "Radiation loss", "Q_r", "=5.67E-8*{eps}*{A}*(({tw}+273.15)^4-({ts}+273.15)^4)", "W")
po.add("Qr2", "Radiation loss (first draft)", "Q_r2", "=5.67E-8*{eps}*{A}*({tw}^4-{ts}^4)", "W",
       planted=("offset-scale", "σT⁴ with temperatures in °C, not K"))
po.add("tm", "Mains water temperature", "t_m", 10, "°C")
po.add("Qm", "Heating the make-up water", "Q_m", "={mu}/86400*{rho}/1000*4.19*({tw}-{tm})",
       "kW")
po.add("Qtot", "Total surface and make-up loss", "Q_tot", "=Losses!B9", "kW")
po.add("Qtot2", "Total loss (summary sheet, rev. A)", "Q_tot2", "={Qe}+{Qc}+{Qr}/1000+{Qm}", "kW",
       planted=("unit-scale", "convection in W added to losses in kW"))
po.add("QBtu", "Total loss, Btu/h", "Q_tot,US", "={Qtot}*3412", "Btu/h")
po.add("QBtu2", "Total loss, Btu/h (US supplier)", "Q_tot,US2", "={Qtot}*3.412", "Btu/h",
       planted=("unit-scale", "kW × 3.412 (the W factor): 1000 too small"))
po.add("tf", "Fill water temperature", "t_fill", 10, "°C")
po.add("Eh", "Heat to warm a fresh fill", "E_h", "={Vw}*{rho}*4.19*({tw}-{tf})/3600", "kWh")
po.add("Ph", "Heater output", "P_h", 250, "kW")
po.add("th", "Heat-up time (losses neglected)", "t_h", "={Eh}/({Ph}-{Qtot})", "h")
po.add("turn", "Turnover period", "t_to", 4, "h")
po.add("gpm", "Circulation flow", "Q_c", "={Vw}*264.2/({turn}*60)", "gpm")
po.add("dT", "Temperature rise across heater", "ΔT", 5, "Δ°F")
po.add("PhUS", "Heater output needed to hold the loss (US rule)", "P_h,US",
       "=500*{gpm}*{dT}", "Btu/h")
po.add("ok", "Heater rise check", "check", "=IF({PhUS}>={QBtu},\"OK\",\"RAISE ΔT\")")
POOL = po.finish()

Pr = po.ref
LOSSES = {
    "A1": "Larchmere Leisure Centre: loss summary for the heating engineer",
    "A2": "Sources: as the Pool sheet; 1 kW = 3412 Btu/h (NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A4": "Loss", "B4": "Heat [kW]", "C4": "Heat [Btu/h]", "D4": "Share [%]",
    "A5": "Evaporation", "B5": f"={Pr('Qe')}",
    "A6": "Convection", "B6": f"={Pr('Qc')}/1000",
    "A7": "Radiation", "B7": f"={Pr('Qr')}/1000",
    "A8": "Make-up water", "B8": f"={Pr('Qm')}",
    "A9": "Total", "B9": "=SUM(B5:B8)", "C9": "=SUM(C5:C8)",
    "A10": "Mean of the four", "B10": "=AVERAGE(B5:B8)",
}
for r in range(5, 9):
    LOSSES[f"C{r}"] = f"=B{r}*3412"
    LOSSES[f"D{r}"] = f"=B{r}/$B$9*100"
LOSSES["B6"] = f"={Pr('Qc')}"                   # planted: W in the kW column

ACTIVITY = {
    "A1": "Activity factors for evaporation (from memory of ASHRAE HVAC Applications (2019) "
          "ch. 6, Table 1)",
    "A4": "Type", "B4": "Activity factor [-]",
}
for r, (t, f) in enumerate([("Residential", 0.5), ("Condominium", 0.65), ("Therapy", 0.65),
                            ("Hotel", 0.8), ("Public", 1.0), ("Wave pool", 1.5)], start=5):
    ACTIVITY[f"A{r}"], ACTIVITY[f"B{r}"] = t, f

POOLB = {
    "trade": "building services: indoor pool heat loss and make-up water",
    "sheets": [("Pool", POOL), ("Losses", LOSSES), ("Activity", ACTIVITY)],
    "planted": {**po.planted,
                "Losses!B6": ("unit-scale", "convection loss in W put in the kW column")},
}

# --------------------------------------------------------------------------------------------
# Book 3: tower crane foundation overturning (kN·m and kip·ft, m and ft, kPa and ksf)
# --------------------------------------------------------------------------------------------
CRANE_SRC = (
    "Sources: foundation loads from the crane maker's data sheet (invented here); eccentricity "
    "e = M/V and bearing q = V/B²·(1 + 6e/B) for e ≤ B/6, q = 2V/(3B·(B/2 − e)) beyond, J. E. "
    "Bowles, Foundation Analysis and Design 5th ed. (1996) ch. 4 (from memory); overturning "
    "factor V·(B/2)/M ≥ 1.5 and sliding factor V·tan δ/H ≥ 1.5 (common practice; CIRIA C654 "
    "(2006) for tower crane bases, from memory); reinforced concrete 25 kN/m³, EN 1991-1-1:2002 "
    "Table A.1; g = 9.81 m/s². NIST SP 811 (2008) App. B.8: 3.281 ft/m, 1 kip = 4.448 kN, 1 "
    "kip·ft = 1.356 kN·m, 1 ksf = 47.88 kPa, 1 kN/m³ = 6.366 lbf/ft³. Soil and site data "
    "invented.")
cb = ItemSheet("Base", "Tower crane TC-2, Fennick Quay block C: pad foundation check "
               "(invented scenario)", CRANE_SRC)
cb.add("case", "Governing load case", "case", "Out of service (storm)")
cb.add("Mc", "Overturning moment from the crane", "M_c", "=VLOOKUP({case},Loads!A5:E7,2,FALSE)",
       "kN·m")
cb.add("Vc", "Vertical load from the crane", "V_c", "=VLOOKUP({case},Loads!A5:E7,3,FALSE)", "kN")
cb.add("Hc", "Horizontal load from the crane", "H_c", "=VLOOKUP({case},Loads!A5:E7,4,FALSE)", "kN")
cb.add("B", "Base width (square)", "B", 7.0, "m")
cb.add("Bft", "Base width, ft", "B_ft", "={B}*3.281", "ft")
cb.add("D", "Base depth", "D", 1.6, "m")
cb.add("gc", "Unit weight of reinforced concrete", "gamma_c", 25, "kN/m³")
cb.add("gcus", "Unit weight of reinforced concrete, US", "gamma_c,US", "={gc}*6.366", "lbf/ft³")
cb.add("rc", "Density of reinforced concrete", "rho_c", 2500, "kg/m³")
cb.add("W", "Base self weight", "W", "={B}^2*{D}*{gc}", "kN")
cb.add("W2", "Base self weight (from density)", "W_2", "={B}^2*{D}*{rc}", "kN",
       planted=("result-unit", "density used where unit weight belongs: g missing (and kg as kN)"))
cb.add("mt", "Base mass (for the lifting plan)", "m", "={B}^2*{D}*{rc}/1000", "t")
cb.add("V", "Total vertical load at underside", "V", "={Vc}+{W}", "kN")
cb.add("M", "Total overturning moment at underside", "M", "={Mc}+{Hc}*{D}", "kN·m")
cb.add("e", "Eccentricity", "e", "={M}/{V}", "m")
cb.add("kern", "Kern limit B/6", "e_k", "={B}/6", "m")
cb.add("kchk", "Resultant within the middle third?", "check_k", "=IF({e}<={kern},\"YES\",\"NO - part uplift\")")
cb.add("q", "Maximum bearing pressure", "q_max",
       "=IF({e}<={kern},{V}/{B}^2*(1+6*{e}/{B}),2*{V}/(3*{B}*({B}/2-{e})))", "kPa")
cb.add("qksf", "Maximum bearing pressure, ksf", "q_max,ksf", "={q}/47.88", "ksf")
cb.add("qksf2", "Maximum bearing pressure, ksf (US reviewer)", "q_max,ksf2", "={q}*20.89", "ksf",
       planted=("unit-scale", "kPa × 20.89 gives psf, written as ksf: 1000 too large"))
cb.add("qa", "Allowable bearing pressure (site investigation)", "q_a", 300, "kPa")
cb.add("uq", "Bearing utilisation", "u_q", "={q}/{qa}*100", "%")
cb.add("FOS", "Factor against overturning", "F_ot", "={V}*{B}/2/{M}", "-")
cb.add("FOS2", "Factor against overturning (hand check)", "F_ot,2", "={V}*{Bft}/2/{M}", "-",
       planted=("unit-scale", "base width in ft against a moment in kN·m: 3.281 too large"))
cb.add("delta", "Base friction angle", "delta", 25, "°")
cb.add("FS", "Factor against sliding", "F_sl", "={V}*TAN(RADIANS({delta}))/{Hc}", "-")
cb.add("FS2", "Factor against sliding (rev. A)", "F_sl,2", "={V}*TAN({delta})/{Hc}", "-",
       planted=("unit-scale", "TAN of an angle in degrees read as radians"))
cb.add("chk", "Stability check (1.5)", "check", "=IF(MIN({FOS},{FS})>=1.5,\"OK\",\"FAIL\")")
BASE = cb.finish()

B_ = cb.ref
us = ItemSheet("US", "TC-2 base: check in US units for the crane hire company's engineer",
               "Sources: as the Base sheet; NIST SP 811 (2008) App. B.8 (1 kip·ft = 1.356 kN·m, "
               "1 kip = 4.448 kN, 3.281 ft/m, 1 ksf = 47.88 kPa).")
us.add("M", "Overturning moment", "M", f"={B_('M')}/1.356", "kip·ft")
us.add("V", "Vertical load", "V", f"={B_('V')}/4.448", "kip")
us.add("W", "Base self weight", "W", f"={B_('W')}/4.448", "kip")
us.add("W2", "Base self weight (from US unit weight)", "W_2",
       f"={B_('Bft')}^2*{B_('D')}*3.281*{B_('gcus')}/1000", "kip")
us.add("Wb", "Base self weight (hire company form)", "W_3", f"={B_('W')}*4.448", "kip",
       planted=("unit-scale", "kN to kip multiplied by 4.448: wrong way round"))
us.add("e", "Eccentricity", "e", "={M}/{V}", "ft")
us.add("e2", "Eccentricity (first pass)", "e_2", f"={B_('M')}/{{V}}", "ft",
       planted=("unit-scale", "moment in kN·m over load in kip"))
us.add("q", "Maximum bearing pressure (e within B/6)", "q_max",
       f"={{V}}/{B_('Bft')}^2*(1+6*{{e}}/{B_('Bft')})", "ksf")
US = us.finish()

LOADS = {
    "A1": "TC-2 foundation loads at the top of the base (invented data sheet values, "
          "unfactored)",
    "A2": "Sources: crane maker's data sheet (invented); 1 kip·ft = 1.356 kN·m (NIST SP 811 (2008) "
          "App. B.8).",
    "A3": CAUTION,
    "A4": "Load case", "B4": "M [kN·m]", "C4": "V [kN]", "D4": "H [kN]", "E4": "M [kip·ft]",
    "A8": "Largest", "B8": "=MAX(B5:B7)", "C8": "=MAX(C5:C7)", "D8": "=MAX(D5:D7)",
    "E8": "=MAX(E5:E7)",
    "A9": "Mean moment of the cases", "B9": "=AVERAGE(B5:B7)",
    "A10": "Storm moment over in-service moment", "B10": "=B6/B5", "C10": "-",
}
for r, (c, m, v, h) in enumerate([("In service", 3150, 720, 32),
                                  ("Out of service (storm)", 4420, 640, 118),
                                  ("Erection", 2280, 510, 45)], start=5):
    LOADS[f"A{r}"], LOADS[f"B{r}"], LOADS[f"C{r}"], LOADS[f"D{r}"] = c, m, v, h
    LOADS[f"E{r}"] = f"=B{r}/1.356"
LOADS["E7"] = "=B7*1.356"            # planted: wrong way round

CRANE = {
    "trade": "temporary works: tower crane pad foundation overturning and bearing",
    "sheets": [("Base", BASE), ("US", US), ("Loads", LOADS)],
    "planted": {**cb.planted, **us.planted,
                "Loads!E7": ("unit-scale", "kN·m to kip·ft multiplied by 1.356: wrong way "
                             "round")},
}

# --------------------------------------------------------------------------------------------
# Book 4: compressed-air dryer and condensate (°C and °F dew points, m³/min, Nm³/min and scfm,
# g/m³ and gr/ft³, bar g and kPa)
# --------------------------------------------------------------------------------------------
AIR_SRC = (
    "Sources: pressure dew point classes, ISO 8573-1:2010 Table 2 (from memory); saturation "
    "pressure over water e = 6.1094·exp(17.625·t/(t + 243.04)) hPa with t in °C, Alduchov & "
    "Eskridge (1996) (from memory); water vapour content ρ_v = 216.7·e/T g/m³ with e in hPa and "
    "T in K (ideal gas, R_w = 461.5 J/(kg·K); common practice); free air delivery at inlet "
    "conditions, ISO 1217:2009 (from memory); normal conditions 0 °C and 101.325 kPa, DIN 1343 "
    "(from memory); 1 Nm³/min = 37.33 scfm at 60 °F and 14.696 psia (35.31 ft³/m³ × "
    "288.71/273.15, NIST SP 811 (2008) App. B.8 and the ideal gas law, common practice); 1 "
    "g/m³ = 0.437 gr/ft³ (7000 gr/lb, NIST SP 811 (2008) App. B.8); 1 gal = 3.785 L. Dryer "
    "correction factors and data invented (stand-ins for a maker's table). Plant data invented.")
ai = ItemSheet("Air", "Oxley Bank bottling plant, compressor house 2: dryer selection and "
               "condensate load (invented scenario)", AIR_SRC)
ai.add("FAD", "Compressor free air delivery (at inlet conditions)", "FAD", "=SUM(Compressors!B5:B7)",
       "m³/min")
ai.add("ta", "Intake air temperature (summer design)", "t_a", 35, "°C")
ai.add("RH", "Intake relative humidity", "RH", 70, "%")
ai.add("pa", "Intake pressure (barometric)", "p_a", 100.2, "kPa")
ai.add("QN", "Flow at normal conditions", "Q_N", "={FAD}*{pa}/101.325*273.15/({ta}+273.15)",
       "Nm³/min")
ai.add("QN2", "Flow at normal conditions (dryer enquiry)", "Q_N2",
       "={FAD}*{pa}/101.325*273.15/{ta}", "Nm³/min",
       planted=("offset-scale", "intake temperature in °C where K belongs"))
ai.add("scfm", "Flow, scfm", "Q_scfm", "={QN}*37.33", "scfm")
ai.add("es", "Saturation pressure at intake temperature", "e_s",
       "=6.1094*EXP(17.625*{ta}/({ta}+243.04))", "hPa")
ai.add("e", "Vapour pressure at intake", "e", "={es}*{RH}/100", "hPa")
ai.add("AH", "Water content of intake air", "rho_v", "=216.7*{e}/({ta}+273.15)", "g/m³")
ai.add("AHgr", "Water content of intake air, gr/ft³", "rho_v,gr", "={AH}*0.437", "gr/ft³")
ai.add("AHgr2", "Water content, gr/ft³ (US dryer form)", "rho_v,gr2", "={AH}*15.43", "gr/ft³",
       planted=("unit-scale", "g to gr converted, m³ to ft³ left out: 35.31 too large"))
ai.add("mw", "Water entering with the air", "m_in", "={FAD}*{AH}*60/1000", "kg/h")
ai.add("mwg", "Water entering with the air, g/h", "m_in,g", "={FAD}*{AH}*60", "g/h")
ai.add("pg", "Line pressure at the dryer", "p_g", 7.5, "bar g")
ai.add("pabs", "Line pressure, absolute", "p_abs", "={pg}*100+{pa}", "kPa")
ai.add("cls", "Required ISO 8573-1 humidity class", "class", 4)
ai.add("pdp", "Pressure dew point for the class", "t_pdp", "=VLOOKUP({cls},Classes!A5:C9,2,FALSE)",
       "°C")
ai.add("pdpF", "Pressure dew point, °F", "t_pdp,F", "={pdp}*1.8+32", "°F")
ai.add("pdpF2", "Pressure dew point, °F (US datasheet)", "t_pdp,F2", "={pdp}*1.8", "°F",
       planted=("offset-scale", "°C to °F without the +32"))
ai.add("esd", "Saturation pressure at the dew point", "e_d",
       "=6.1094*EXP(17.625*{pdp}/({pdp}+243.04))", "hPa")
ai.add("AHd", "Water content of the dried air (at line pressure)", "rho_v,d",
       "=216.7*{esd}/({pdp}+273.15)", "g/m³")
ai.add("Qact", "Actual flow at line pressure and dew point", "Q_act",
       "={QN}*101.325/{pabs}*({pdp}+273.15)/273.15", "m³/min")
ai.add("Qact2", "Actual flow at line pressure (first draft)", "Q_act2",
       "={QN}*101.325/({pg}*100)*({pdp}+273.15)/273.15", "m³/min",
       planted=("offset-scale", "gauge line pressure where absolute belongs"))
ai.add("mo", "Water leaving with the dried air", "m_out", "={Qact}*{AHd}*60/1000", "kg/h")
ai.add("mc", "Condensate removed", "m_c", "={mw}-{mo}", "kg/h")
ai.add("mc2", "Condensate removed (rev. A)", "m_c2", "={mwg}-{mo}", "kg/h",
       planted=("unit-scale", "water in g/h less water in kg/h"))
ai.add("rho", "Condensate density", "rho", 1000, "kg/m³")
ai.add("Vc", "Condensate volume per day", "V_c", "={mc}*24/{rho}*1000", "L/d")
ai.add("Vcg", "Condensate volume per day, US gal", "V_c,gal", "={Vc}/3.785", "gal/d")
ai.add("Kt", "Correction factor, inlet temperature", "K_t", "=VLOOKUP({ta},Factors!A5:B9,2)", "-")
ai.add("Kp", "Correction factor, line pressure", "K_p", "=VLOOKUP({pg},Factors!D5:E9,2)", "-")
ai.add("Qreq", "Dryer nominal capacity required", "Q_req", "={QN}/({Kt}*{Kp})", "Nm³/min")
ai.add("Qdry", "Dryer nominal capacity (RD-60)", "Q_dry", 60, "Nm³/min")
ai.add("dchk", "Dryer capacity check", "check", "=IF({Qdry}>={Qreq},\"OK\",\"UPSIZE\")")
ai.add("purge", "Purge air of a heatless desiccant alternative", "r_p", 15, "%")
ai.add("Qp", "Purge air lost", "Q_p", "={QN}*{purge}/100", "Nm³/min")
ai.add("Qp2", "Purge air lost (desiccant option, rev. A)", "Q_p2", "={QN}*{purge}", "Nm³/min",
       planted=("unit-scale", "purge share in % used as a fraction: 100 too large"))
ai.add("Pspec", "Specific power of the compressors", "P_spec", 6.2, "kW/(m³/min)")
ai.add("Pp", "Compressor power spent on purge (purge taken back to inlet conditions)", "P_p",
       "={Qp}*{FAD}/{QN}*{Pspec}", "kW")
AIR = ai.finish()

COMP = {
    "A1": "Compressor house 2: compressors (invented nameplate data at 7.5 bar g)",
    "A2": "Sources: free air delivery to ISO 1217:2009 (from memory); 35.31 ft³/m³ (NIST SP 811 "
          "(2008) App. B.8).",
    "A3": CAUTION,
    "A4": "Compressor", "B4": "FAD [m³/min]", "C4": "FAD [ft³/min]", "D4": "Power [kW]",
    "E4": "Specific power [kW/(m³/min)]",
    "A8": "Total / mean", "B8": "=SUM(B5:B7)", "C8": "=SUM(C5:C7)", "D8": "=SUM(D5:D7)",
    "E8": "=D8/B8",
}
for r, (c, q, p) in enumerate([("C-21", 18.5, 110), ("C-22", 18.5, 110), ("C-23 (VSD)", 11.0, 75)],
                              start=5):
    COMP[f"A{r}"], COMP[f"B{r}"], COMP[f"D{r}"] = c, q, p
    COMP[f"C{r}"] = f"=B{r}*35.31"
    COMP[f"E{r}"] = f"=D{r}/B{r}"
COMP["C7"] = "=B7*3.281"             # planted: the length factor for a volume

CLASSES = {
    "A1": "ISO 8573-1:2010 humidity classes, pressure dew point (from memory; check the standard)",
    "A4": "Class", "B4": "PDP [°C]", "C4": "PDP [°F]",
}
for r, (c, t) in enumerate([(2, -40), (3, -20), (4, 3), (5, 7), (6, 10)], start=5):
    CLASSES[f"A{r}"], CLASSES[f"B{r}"] = c, t
    CLASSES[f"C{r}"] = f"=B{r}*1.8+32"

FACTORS = {
    "A1": "Refrigerated dryer correction factors (invented, stand-ins for the maker's table)",
    "A4": "Inlet temperature [°C]", "B4": "K_t [-]", "D4": "Line pressure [bar g]", "E4": "K_p [-]",
}
for r, (t, kt, p, kp) in enumerate([(25, 1.10, 5, 0.90), (30, 1.00, 6, 0.96), (35, 0.82, 7, 1.00),
                                    (40, 0.68, 8, 1.04), (45, 0.57, 10, 1.10)], start=5):
    FACTORS[f"A{r}"], FACTORS[f"B{r}"], FACTORS[f"D{r}"], FACTORS[f"E{r}"] = t, kt, p, kp

AIRB = {
    "trade": "compressed air: refrigerated dryer selection and condensate load",
    "sheets": [("Air", AIR), ("Compressors", COMP), ("Classes", CLASSES), ("Factors", FACTORS)],
    "planted": {**ai.planted,
                "Compressors!C7": ("unit-scale", "m³/min × 3.281 (the ft/m factor) into "
                                   "ft³/min: should be 35.31")},
}

BOOKS = {"landfill-flare": LFG, "pool-heating": POOLB, "crane-base": CRANE,
         "air-dryer": AIRB}

EXTRA = {}    # stem -> list of (comment, "Sheet!Cell rule")
MISSED = {}   # stem -> {"Sheet!Cell": "why"}
RENAMED = {}  # stem -> {"Sheet!Cell": rule plumb names, or (rule, why)}
MESSAGES = {}  # stem -> {"Sheet!Cell": "plumb's message, where it misleads"}
try:
    from review_notes import EXTRA, MISSED, RENAMED, MESSAGES  # noqa: F401,F811
except ImportError:
    pass


def main():
    write_books(HERE, BOOKS, {"EXTRA": EXTRA, "MISSED": MISSED, "RENAMED": RENAMED,
                              "MESSAGES": MESSAGES})


if __name__ == "__main__":
    main()
