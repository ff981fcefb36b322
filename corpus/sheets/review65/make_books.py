#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review65), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; the layout
follows corpus/sheets/review64/make_books.py and review55.

Trades: a water utility's non-revenue water audit (IWA water balance, UARL and ILI); a
commercial kitchen's dishwasher final rinse and its booster heater (electric, with a gas
option); a drilling rig's triplex mud pumps, annular velocity, hydrostatic pressure and pit
volumes; a biomass district heating plant's wood chip store, boiler, ash and network flow. All
scenarios, sites, firms, readings and maker's data are invented (demonstration only); the
formulas and published factors are the trade's own, with their sources named in a text cell at
the top of each sheet ("from memory" where recalled and not checked, "common practice" for a
fact of the trade with no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and
its messages that mislead, are recorded in review_notes.py after running the round's build of the time.

Run: python3 make_books.py [--expect]  ->  *.xlsx, *.cells.plumb and *.expect in this folder
(nothing written elsewhere).
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
SAFETY = ("# A dimensionally consistent formula can still be wrong; this check does not replace "
          "independent review under local codes and licensed practice.\n")

# --------------------------------------------------------------------------------------------
# Book 1: water utility non-revenue water audit (m³/d, ML/d, MGD, gal/d, %, L/s, L/d, km, mi,
# m, psi, kPa, psig, ft, $/m³, $/kgal, $/yr, kWh/m³, kWh/d, MWh/yr, ML/yr)
# --------------------------------------------------------------------------------------------
NRW_SRC = (
    "Sources: IWA standard water balance; unavoidable annual real losses UARL (L/d) = (18·L_m + "
    "0.8·N_c + 25·L_p)·P with L_m mains in km, N_c service connections, L_p km of service pipe "
    "from the property line to the customer meter, P average operating pressure in m; "
    "infrastructure leakage index ILI = CARL/UARL (A. Lambert, T. Brown, M. Takizawa and D. "
    "Weimer, 'A review of performance indicators for real losses from water supply systems', "
    "J. Water SRT – Aqua 48(6), 1999, and AWWA Manual M36, Water Audits and Loss Control "
    "Programs, 4th ed. (2016), from memory); the US form UARL (gal/d) = (5.41·L_m + 0.15·N_c + "
    "7.5·L_p)·P with miles and psi (AWWA M36, 4th ed., from memory); apparent loss from "
    "customer meter under-registration = registered·u/(1 − u) (AWWA M36, 4th ed., from memory); "
    "unauthorized consumption 0.25 % of system input (AWWA M36 default, from memory); leakage "
    "against pressure L₁ = L₀·(P₁/P₀)^N1, N1 = 1.0 for mixed pipe materials (FAVAD: J. May "
    "(1994); Thornton, Sturm and Kunkel, Water Loss Control, 2nd ed. (2008), from memory); "
    "1 US gal = 3.785 L, 1 mi = 1.609 km, 1 psi = 6.895 kPa (NIST SP 811 (2008) App. B.8); "
    "1 m of water = 9.81 kPa = 1.422 psi and 1 psi = 2.31 ft = 0.7031 m of water (common "
    "practice, g_n from the SI Brochure 9th ed.); 1 MG = 3785 m³, 1 ML = 0.2642 MG, 1 kgal = "
    "3.785 m³, 1 m³ = 264.2 gal (NIST SP 811 (2008) App. B.8, derived); net night flow × "
    "night-day factor (h/d) = daily leakage (Thornton, Sturm and Kunkel, from memory). Utility, "
    "zone, meters, tariffs and readings invented.")
nw = ItemSheet("Balance", "Culverdale Water (invented): Oxley Marsh supply zone, top-down water "
               "audit, audit year average day", NRW_SRC)
nw.heading("System input")
nw.add("SIVr", "Production meters, registered", "SIV_r", 47600, "m³/d")
nw.add("me", "Production meter error, verified (reads high)", "e_m", 0.8, "%")
nw.add("SIV", "System input volume, corrected", "SIV", "={SIVr}/(1+{me}/100)", "m³/d")
nw.add("SIVML", "System input volume, ML/d", "SIV_ML", "={SIV}/1000", "ML/d")
nw.add("SIVmgd", "System input volume, MGD (US consultant's form)", "SIV_US",
       "={SIVML}*0.2642", "MGD")
nw.add("SIVmgd2", "System input volume, MGD (first draft)", "SIV_US2", "={SIVML}*3.785", "MGD",
       planted=("unit-scale", "ML to MG multiplied by 3.785: wrong way round"))
nw.heading("Authorized consumption")
nw.add("BMC", "Billed metered consumption, registered", "BMC", 36900, "m³/d")
nw.add("BUC", "Billed unmetered consumption (estimated)", "BUC", 420, "m³/d")
nw.add("UAC", "Unbilled authorized consumption (flushing, fire)", "UAC", 310, "m³/d")
nw.add("AC", "Authorized consumption", "AC", "={BMC}+{BUC}+{UAC}", "m³/d")
nw.add("WL", "Water losses", "WL", "={SIV}-{AC}", "m³/d")
nw.heading("Apparent losses")
nw.add("u", "Customer meter under-registration (bench tests)", "u", 2.4, "%")
nw.add("ALm", "Apparent loss, customer meter under-registration", "AL_m",
       "={BMC}*({u}/100)/(1-{u}/100)", "m³/d")
nw.add("ALmc", "Apparent loss, customer meters (check, u/(100 − u))", "AL_m c",
       "={BMC}*{u}/(100-{u})", "m³/d")
nw.add("ALm2", "Apparent loss, customer meters (first draft)", "AL_m2",
       "={BMC}*{u}/(1-{u}/100)", "m³/d",
       planted=("unit-scale", "a % used as a fraction in the numerator: 100 too large"))
nw.add("UNA", "Unauthorized consumption (0.25 % of system input)", "UNA", "={SIV}*0.25/100",
       "m³/d")
nw.add("DHE", "Systematic data handling error (billing audit)", "DHE", 60, "m³/d")
nw.add("AL", "Apparent losses", "AL", "={ALm}+{UNA}+{DHE}", "m³/d")
nw.heading("Real losses and non-revenue water")
nw.add("CARL", "Current annual real losses, as a daily rate", "CARL", "={WL}-{AL}", "m³/d")
nw.add("CARLls", "Current real losses, L/s", "CARL_s", "={CARL}*1000/86400", "L/s")
nw.add("CARLls2", "Current real losses, L/s (first draft)", "CARL_s2", "={CARL}/3.6", "L/s",
       planted=("unit-scale", "m³/d to L/s by the m³/h factor 3.6: 24 times too large"))
nw.add("NRW", "Non-revenue water", "NRW", "={SIV}-{BMC}-{BUC}", "m³/d")
nw.add("NRWp", "Non-revenue water, share of system input", "NRW%", "={NRW}/{SIV}*100", "%")
nw.heading("Network and pressure")
nw.add("Lm", "Length of mains", "L_m", 412, "km")
nw.add("Nc", "Number of service connections", "N_c", 27800, "-")
nw.add("lp", "Service pipe, property line to meter, average", "l_p", 7.5, "m")
nw.add("Lp", "Service pipe, property line to meter, total", "L_p", "={Nc}*{lp}/1000", "km")
nw.add("Lp2", "Service pipe, property line to meter, total (first draft)", "L_p2",
       "={Nc}*{lp}", "km", planted=("unit-scale", "m written as km: 1000 too large"))
nw.add("P", "Average zone pressure (AZP)", "P", 46, "m")
nw.add("PkPa", "Average zone pressure, kPa", "P_kPa", "={P}*9.81", "kPa")
nw.add("Ppsi", "Average zone pressure, psi (US form of UARL)", "P_US", "={P}*1.422", "psi")
nw.add("Ppsi2", "Average zone pressure, psi (first draft)", "P_US2", "={P}*0.433", "psi",
       planted=("unit-scale", "0.433 psi per foot applied to metres: 3.28 times too small"))
nw.add("Phy", "Static pressure at the highest hydrant (gauge reading)", "p_hy", 38, "psig")
nw.add("Hhyft", "Static head at the highest hydrant, ft of water", "H_hy,ft", "={Phy}*2.31",
       "ft")
nw.heading("Unavoidable losses and ILI")
nw.add("UARL", "Unavoidable annual real losses, as a daily rate", "UARL",
       "=(18*{Lm}+0.8*{Nc}+25*{Lp})*{P}", "L/d")
nw.add("UARLm", "Unavoidable real losses, m³/d", "UARL_m3", "={UARL}/1000", "m³/d")
nw.add("ILI", "Infrastructure leakage index", "ILI", "={CARL}/{UARLm}", "-")
nw.add("ILI2", "Infrastructure leakage index (first draft)", "ILI_2", "={CARL}/{UARL}", "-",
       planted=("unit-scale", "m³/d over L/d: 1000 too large"))
nw.add("Lmmi", "Length of mains, miles", "L_m,US", "={Lm}/1.609", "mi")
nw.add("Lpmi", "Service pipe to meter, miles", "L_p,US", "={Lp}/1.609", "mi")
nw.add("UARLg", "Unavoidable real losses, US form", "UARL_US",
       "=(5.41*{Lmmi}+0.15*{Nc}+7.5*{Lpmi})*{Ppsi}", "gal/d")
nw.add("CARLg", "Current real losses, US gal/d", "CARL_US", "={CARL}*264.2", "gal/d")
nw.add("ILIus", "Infrastructure leakage index, US form (check)", "ILI_US", "={CARLg}/{UARLg}",
       "-")
nw.add("CARLc", "Real losses per service connection", "CARL_c", "={CARL}*1000/{Nc}", "L/d")
nw.heading("Pressure management (FAVAD)")
nw.add("dP", "Pressure reduction by the new PRVs", "ΔP", 12, "m")
nw.add("P1", "Average zone pressure after the PRVs", "P_1", "={P}-{dP}", "m")
nw.add("N1", "FAVAD leakage exponent, mixed materials", "N1", 1.0, "-")
nw.add("CARL1", "Real losses after the PRVs", "CARL_1", "={CARL}*({P1}/{P})^{N1}", "m³/d")
nw.add("sav", "Real losses saved", "ΔCARL", "={CARL}-{CARL1}", "m³/d")
nw.heading("Cost of losses")
nw.add("cv", "Variable production cost (power and chemicals)", "c_v", 0.38, "$/m³")
nw.add("cvk", "Variable production cost, $/kgal (US consultant's form)", "c_v,US",
       "={cv}*3.785", "$/kgal")
nw.add("cvk2", "Variable production cost, $/kgal (first draft)", "c_v,US2", "={cv}/3.785",
       "$/kgal", planted=("unit-scale", "$/m³ to $/kgal divided by 3.785: wrong way round"))
nw.add("rr", "Retail tariff, volumetric (customer rate)", "c_r", 7.20, "$/kgal")
nw.add("rrm", "Retail tariff, $/m³", "c_r,m3", "={rr}/3.785", "$/m³")
nw.add("RLc", "Cost of real losses (variable production cost)", "C_RL", "={CARL}*365*{cv}",
       "$/yr")
nw.add("ALc", "Cost of apparent losses (retail tariff)", "C_AL", "={AL}*365*{rrm}", "$/yr")
nw.add("ALc2", "Cost of apparent losses (first draft)", "C_AL2", "={AL}*365*{rr}", "$/yr",
       planted=("unit-scale", "m³ priced at the $/kgal tariff: 3.785 times too large"))
NRWS = nw.finish()

NIGHT = {
    "A1": "Oxley Marsh zone: district metered areas, minimum night flow 03:00 to 04:00 "
          "(invented loggers and readings)",
    "A2": "Sources: net night flow = minimum night flow − legitimate night use; daily leakage = "
          "net night flow × night-day factor in h/d (Thornton, Sturm and Kunkel, Water Loss "
          "Control, 2nd ed. (2008), from memory); 1 L/s = 3.6 m³/h (SI Brochure 9th ed., "
          "derived); 1 m of water = 1.422 psi (common practice).",
    "A3": CAUTION,
    "A5": "DMA", "B5": "Minimum night flow [L/s]", "C5": "Legitimate night use [L/s]",
    "D5": "Net night flow [m³/h]", "E5": "Night pressure [m]", "F5": "Night pressure [psi]",
    "G5": "Night-day factor [h/d]", "H5": "Leakage [m³/d]",
    "A9": "Total", "D9": "=SUM(D6:D8)", "H9": "=SUM(H6:H8)",
}
for r, (dma, mnf, lnu, pn, ndf) in enumerate([("OM-01 Fenside", 14.2, 3.1, 52, 20.5),
                                               ("OM-02 Reedham Lane", 9.8, 2.4, 47, 21.0),
                                               ("OM-03 Tollgate", 22.5, 5.0, 58, 19.8)],
                                              start=6):
    NIGHT[f"A{r}"], NIGHT[f"B{r}"], NIGHT[f"C{r}"] = dma, mnf, lnu
    NIGHT[f"E{r}"], NIGHT[f"G{r}"] = pn, ndf
    NIGHT[f"D{r}"] = f"=(B{r}-C{r})*3.6"
    NIGHT[f"F{r}"] = f"=E{r}*1.422"
    NIGHT[f"H{r}"] = f"=D{r}*G{r}"
NIGHT["D7"] = "=(B7-C7)*3600"
NIGHT["F8"] = "=E8/1.422"
NIGHT_PLANTED = {
    "Night!D7": ("unit-scale", "L/s to m³/h by 3600: the /1000 of the litre missing"),
    "Night!F8": ("unit-scale", "m of water to psi divided by 1.422: wrong way round"),
}

NRWB = {
    "trade": "water utility: non-revenue water audit, UARL and ILI, night flows",
    "sheets": [("Balance", NRWS), ("Night", NIGHT)],
    "planted": {**nw.planted, **NIGHT_PLANTED},
    "sidecar": ("# Units of the Culverdale audit that plumb's table lacks (invented scenario).\n"
                "# 1 kgal = 1000 US gal (common practice in US water billing; gal from NIST\n"
                "# SP 811 (2008) App. B.8).\n" + SAFETY +
                "measure kgal = 1000 gal \"thousand US gallons, a billing unit\"\n"),
}

# --------------------------------------------------------------------------------------------
# Book 2: commercial kitchen dishwasher final rinse and booster heater (gph, gpm, L/h, L/min,
# gal/d, m³/d, °F, Δ°F, °C, K, kg/L, kJ/(kg·K), Btu/h, kW, W, V, A, %, therm/h, therm/d, $/d,
# kWh/d, $/therm, $/kWh)
# --------------------------------------------------------------------------------------------
DW_SRC = (
    "Sources: hot-water sanitizing final rinse at least 180 °F (82 °C) at the manifold for a "
    "multi-tank conveyor machine (NSF/ANSI 3, Commercial warewashing equipment, from memory); "
    "booster heater output Btu/h = gph × 8.34 lb/gal × ΔT(°F) × 1 Btu/(lb·°F), kW = Btu/h ÷ "
    "3412 (ASHRAE Handbook—HVAC Applications (2019), ch. 51 Service Water Heating, from memory; "
    "8.34 lb/gal is water near 60 °F, common practice); Btu/h = 500·gpm·ΔT(°F), 500 = 8.34 "
    "lb/gal × 60 min/h (common practice); storage heater recovery gph = kW × 3412 ÷ (8.34 × "
    "ΔT) (ASHRAE, from memory); Q = ρ·V̇·c_p·ΔT with c_p of water 4.19 kJ/(kg·K) and ρ at "
    "85 °C 0.968 kg/L (common practice, from memory); 1 US gal = 3.785 L, 1 W = 3.412 Btu/h, "
    "1 Btu/h = 0.2931 W, 1 therm = 100 000 Btu, °F = 1.8·°C + 32, 1 Δ°F = 5/9 K, K = °C + "
    "273.15 (NIST SP 811 (2008) App. B.8; SI Brochure 9th ed.); three-phase line current "
    "I = P/(√3·V) for a resistive load (common practice). Kitchen, machine, maker's data, "
    "tariffs and readings invented.")
dw = ItemSheet("Booster", "Larkspur Hall conference centre kitchen (invented): flight-type "
               "dishwasher final rinse and its booster heater, banquet day", DW_SRC)
dw.heading("Final rinse demand")
dw.add("rg", "Final rinse flow (maker's data sheet)", "V̇_r", 290, "gph")
dw.add("rL", "Final rinse flow, L/h", "V̇_r,L", "={rg}*3.785", "L/h")
dw.add("rL2", "Final rinse flow, L/h (first draft)", "V̇_r,L2", "={rg}/3.785", "L/h",
       planted=("unit-scale", "gal to L divided by 3.785: wrong way round"))
dw.add("rgpm", "Final rinse flow, gpm", "V̇_r,gpm", "={rg}/60", "gpm")
dw.add("rLm", "Final rinse flow, L/min", "V̇_r,Lm", "={rL}/60", "L/min")
dw.add("hrs", "Machine running hours on a banquet day", "t_op", 6, "h/d")
dw.add("Vd", "Final rinse water per day", "V_d", "={rg}*{hrs}", "gal/d")
dw.add("VdM", "Final rinse water per day, m³/d", "V_d,SI", "={rL}*{hrs}/1000", "m³/d")
dw.heading("Temperatures")
dw.add("tc", "Cold mains water, winter", "t_c", 50, "°F")
dw.add("ts", "Building hot water to the booster", "t_s", 140, "°F")
dw.add("tr", "Final rinse leaving the booster (180 °F at the manifold plus line loss)", "t_r",
       185, "°F")
dw.add("dTF", "Booster temperature rise", "ΔT_F", "={tr}-{ts}", "Δ°F")
dw.add("tsC", "Building hot water to the booster, °C", "t_s,C", "=({ts}-32)/1.8", "°C")
dw.add("trC", "Final rinse leaving the booster, °C", "t_r,C", "=({tr}-32)/1.8", "°C")
dw.add("dTC", "Booster temperature rise, K", "ΔT", "={dTF}/1.8", "K")
dw.add("dTCc", "Booster temperature rise, K (check from the °C readings)", "ΔT c",
       "={trC}-{tsC}", "K")
dw.add("dTC2", "Booster temperature rise, K (first draft)", "ΔT_2", "=({dTF}-32)/1.8", "K",
       planted=("offset-scale", "a difference converted like a reading: the −32 does not belong"))
dw.add("trK", "Final rinse temperature, kelvin (maker's selection software)", "T_r",
       "={trC}+273.15", "K")
dw.add("trK2", "Final rinse temperature, kelvin (first draft)", "T_r2", "={trC}", "K",
       planted=("offset-scale", "a °C reading set equal to kelvins"))
dw.heading("Booster heater, electric")
dw.add("Qb", "Booster heat output", "Q_b", "={rg}*8.34*{dTF}", "Btu/h")
dw.add("Qb2", "Booster heat output (first draft)", "Q_b2", "={rg}*{dTF}", "Btu/h",
       planted=("result-unit", "gph × Δ°F written as Btu/h: the 8.34 lb/gal missing"))
dw.add("Q500", "Booster heat output (check, 500·gpm·ΔT)", "Q_b c", "=500*{rgpm}*{dTF}", "Btu/h")
dw.add("Q5002", "Booster heat output (500 rule, first draft)", "Q_b c2", "=500*{rg}*{dTF}",
       "Btu/h", planted=("unit-scale", "gph in the 500·gpm·ΔT rule: 60 times too large"))
dw.add("Qw", "Booster heat output, W", "Q_b,W", "={Qb}*0.2931", "W")
dw.add("Qkw", "Booster heat output, kW (check from W)", "Q_b,kW", "={Qw}/1000", "kW")
dw.add("kWb", "Booster heater rating needed", "P_b", "={Qb}/3412", "kW")
dw.add("kWb2", "Booster heater rating needed (first draft)", "P_b2", "={Qb}*3412", "kW",
       planted=("unit-scale", "Btu/h to kW multiplied by 3412: wrong way round"))
dw.add("rho", "Density of water at 85 °C", "ρ", 0.968, "kg/L")
dw.add("cp", "Specific heat of water", "c_p", 4.19, "kJ/(kg·K)")
dw.add("kWs", "Booster heater rating needed (SI check)", "P_b,SI",
       "={rL}*{rho}*{cp}*{dTC}/3600", "kW")
dw.add("kWs2", "Booster heater rating needed (SI, first draft)", "P_b,SI2",
       "={rL}*{rho}*{cp}*{dTC}", "kW",
       planted=("unit-scale", "L/h × kJ/L written as kW: the /3600 missing"))
dw.add("sf", "Allowance for standby loss and cold starts", "f_s", 10, "%")
dw.add("kWsel", "Booster rating with the allowance", "P_sel", "={kWb}*(1+{sf}/100)", "kW")
dw.add("kWn", "Booster selected, nameplate (next size up)", "P_n", 36, "kW")
dw.add("V", "Supply voltage, three phase", "V", 208, "V")
dw.add("I", "Booster line current", "I", "={kWn}*1000/(SQRT(3)*{V})", "A")
dw.add("Wp", "Booster circulating pump and controls", "P_p", 450, "W")
dw.add("kWc", "Booster connected load", "P_c", "={kWn}+{Wp}/1000", "kW")
dw.add("kWc2", "Booster connected load (first draft)", "P_c2", "={kWn}+{Wp}", "kW",
       planted=("unit-scale", "W added to kW"))
dw.add("lf", "Heater on-time while the machine runs", "f_on", 70, "%")
dw.add("Ed", "Booster electricity per day", "E_d", "={kWb}*{hrs}*{lf}/100", "kWh/d")
dw.add("pe", "Electricity tariff (invented)", "c_e", 0.16, "$/kWh")
dw.add("Ce", "Booster electricity cost per day", "C_e", "={Ed}*{pe}", "$/d")
dw.heading("Booster heater, gas (option)")
dw.add("eta", "Gas booster thermal efficiency", "η", 80, "%")
dw.add("Qin", "Gas booster input", "Q_in", "={Qb}/({eta}/100)", "Btu/h")
dw.add("QinM", "Gas booster input, MBH (maker's rating plate)", "Q_in,MBH", "={Qin}/1000",
       "MBH")
dw.add("Qink", "Gas booster input, kW", "Q_in,kW", "={Qin}/3412", "kW")
dw.add("Qin2", "Gas booster input (first draft)", "Q_in2", "={Qb}/{eta}", "Btu/h",
       planted=("unit-scale", "a % used as a fraction: 100 too small"))
dw.add("thr", "Gas booster input, therms per hour", "G_h", "={Qin}/100000", "therm/h")
dw.add("thr2", "Gas booster input, therms per hour (first draft)", "G_h2", "={Qin}/1000",
       "therm/h", planted=("unit-scale", "Btu/h to therm/h by 1000 (MBH taken as therms): "
                                         "100 times too large"))
dw.add("thd", "Gas use per day", "G_d", "={thr}*{hrs}*{lf}/100", "therm/d")
dw.add("pg", "Gas tariff (invented)", "c_g", 1.25, "$/therm")
dw.add("Cg", "Gas booster cost per day", "C_g", "={thd}*{pg}", "$/d")
dw.add("thk", "Gas use per day, kWh (for the energy report)", "G_d,kWh", "={thd}*29.31",
       "kWh/d")
dw.add("dC", "Gas option saving per day over electric", "ΔC", "={Ce}-{Cg}", "$/d")
dw.heading("Building water heater recovery")
dw.add("kWt", "Storage water heater elements", "P_t", 108, "kW")
dw.add("dTt", "Storage heater temperature rise", "ΔT_t", "={ts}-{tc}", "Δ°F")
dw.add("rec", "Storage heater recovery at that rise", "V̇_rec", "={kWt}*3412/(8.34*{dTt})",
       "gph")
dw.add("recL", "Storage heater recovery, L/h", "V̇_rec,L", "={rec}*3.785", "L/h")
dw.add("dem", "Hot water to the kitchen besides the booster (sinks, pre-rinse)", "V̇_k", 120,
       "gph")
dw.add("mar", "Recovery left over the booster and kitchen demand", "ΔV̇", "={rec}-{rg}-{dem}",
       "gph")
DWS = dw.finish()

DWB = {
    "trade": "commercial kitchen: dishwasher final rinse and booster heater",
    "sheets": [("Booster", DWS)],
    "planted": dict(dw.planted),
}

# --------------------------------------------------------------------------------------------
# Book 3: drilling rig mud pumps, annular velocity, hydrostatic pressure and pits (in, bbl/stk,
# gal/stk, spm, bbl/min, gpm, L/min, m³/h, ft/min, m/s, ft, m, bbl/ft, bbl, min, stk, ppg,
# kg/m³, psi, psig, psia, psi/ft, kPa/m, kPa, hp, kW, %, ft³, m³, bbl/in)
# --------------------------------------------------------------------------------------------
RIG_SRC = (
    "Sources: triplex pump output bbl/stk = 0.000243·D²·L·η_v with liner D and stroke L in "
    "inches (0.000243 = 3·π/4 ÷ 9702 in³/bbl) and gpm = bbl/stk × spm × 42; annular velocity "
    "AV (ft/min) = 24.5·Q/(D_h² − D_p²) with Q in gpm and diameters in inches, or 1029.4·Q/"
    "(D_h² − D_p²) with Q in bbl/min; annular capacity bbl/ft = (D_h² − D_p²)/1029.4; "
    "hydrostatic pressure psi = 0.052 × mud weight (ppg) × TVD (ft); ECD = MW + APL/(0.052·TVD) "
    "(N. J. Lapeyrouse, Formulas and Calculations for Drilling, Production and Workover, 2nd "
    "ed. (2002), ch. 1, from memory); hydraulic horsepower HHP = P(psi)·Q(gpm)/1714 (common "
    "practice); 1 bbl = 42 US gal = 5.615 ft³ = 0.159 m³, 1 US gal = 3.785 L, 1 ft = 0.3048 m, "
    "1 in = 25.4 mm, 1 psi = 6.895 kPa, 1 hp = 0.7457 kW, 1 ppg = 119.8 kg/m³ (NIST SP 811 "
    "(2008) App. B.8); 1 psi/ft = 22.62 kPa/m (derived); hydrostatic ρ·g·h, g_n = 9.81 m/s² "
    "(SI Brochure 9th ed.). Rig, well, pumps, pits and readings invented.")
rg = ItemSheet("Pumps", "Rig Tamarind 14 (invented): well Fellbrook D-2, 12¼ in hole section, "
               "two triplex mud pumps, drilling ahead at 9850 ft MD", RIG_SRC)
rg.heading("Triplex pump output")
rg.add("Dl", "Liner size", "D_l", 6.5, "in")
rg.add("Ls", "Stroke length", "L_s", 12, "in")
rg.add("ev", "Volumetric efficiency", "η_v", 95, "%")
rg.add("ps", "Pump output per stroke", "q_s", "=0.000243*{Dl}^2*{Ls}*{ev}/100", "bbl/stk")
rg.add("spm", "Pump speed, each pump", "N", 110, "spm")
rg.add("np", "Pumps on line", "n_p", 2, "-")
rg.add("Qbm", "Flow rate, bbl/min", "Q_b", "={ps}*{spm}*{np}", "bbl/min")
rg.add("Qg", "Flow rate, gpm", "Q", "={Qbm}*42", "gpm")
rg.add("Qg2", "Flow rate, gpm (driller's first draft)", "Q_2", "={ps}*{spm}*{np}", "gpm",
       planted=("unit-scale", "bbl/min written as gpm: the ×42 missing"))
rg.add("Qbm2", "Flow rate, bbl/min from the gpm (first draft)", "Q_b2", "={Qg}*42", "bbl/min",
       planted=("unit-scale", "gpm to bbl/min multiplied by 42: wrong way round"))
rg.add("Qm3", "Flow rate, m³/h", "Q_m3", "={Qbm}*0.159*60", "m³/h")
rg.heading("Annular velocity")
rg.add("Dh", "Hole size (bit)", "D_h", 12.25, "in")
rg.add("Dhmm", "Hole size, mm", "D_h,mm", "={Dh}*25.4", "mm")
rg.add("Dp", "Drill pipe outside diameter", "D_p", 5, "in")
rg.add("Dc", "Drill collar outside diameter", "D_c", 8, "in")
rg.add("AVp", "Annular velocity around the drill pipe", "AV_p", "=24.5*{Qg}/({Dh}^2-{Dp}^2)",
       "ft/min")
rg.add("AVp2", "Annular velocity around the drill pipe (first draft)", "AV_p2",
       "=24.5*{Qg}/({Dhmm}^2-{Dp}^2)", "ft/min",
       planted=("unit-scale", "hole size in mm beside pipe size in inches"))
rg.add("AVc", "Annular velocity around the collars", "AV_c", "=24.5*{Qg}/({Dh}^2-{Dc}^2)",
       "ft/min")
rg.add("AVb", "Annular velocity around the drill pipe (check, bbl/min)", "AV_p c",
       "=1029.4*{Qbm}/({Dh}^2-{Dp}^2)", "ft/min")
rg.add("AVms", "Annular velocity around the drill pipe, m/s", "AV_SI", "={AVp}*0.3048/60",
       "m/s")
rg.add("AVms2", "Annular velocity around the drill pipe, m/s (first draft)", "AV_SI2",
       "={AVp}*0.3048", "m/s", planted=("unit-scale", "ft/min to m/s: the /60 missing"))
rg.heading("Annular volume and circulation")
rg.add("MD", "Measured depth", "MD", 9850, "ft")
rg.add("TVD", "True vertical depth", "TVD", 9420, "ft")
rg.add("TVDm", "True vertical depth, m", "TVD_m", "={TVD}*0.3048", "m")
rg.add("Lc", "Drill collar length", "L_c", 600, "ft")
rg.add("Lp", "Drill pipe and heavyweight length", "L_p", "={MD}-{Lc}", "ft")
rg.add("Cp", "Annular capacity around the drill pipe", "C_p", "=({Dh}^2-{Dp}^2)/1029.4",
       "bbl/ft")
rg.add("Cc", "Annular capacity around the collars", "C_c", "=({Dh}^2-{Dc}^2)/1029.4", "bbl/ft")
rg.add("Van", "Annular volume", "V_an", "={Cp}*{Lp}+{Cc}*{Lc}", "bbl")
rg.add("tbu", "Bottoms-up time", "t_bu", "={Van}/{Qbm}", "min")
rg.add("tbu2", "Bottoms-up time (first draft)", "t_bu2", "={Van}/{Qg}", "min",
       planted=("unit-scale", "bbl over gpm: 42 times too small"))
rg.add("sbu", "Strokes bottoms up (both pumps)", "n_bu", "={Van}/{ps}", "stk")
rg.heading("Hydrostatic pressure")
rg.add("MW", "Mud weight", "MW", 10.8, "ppg")
rg.add("rho", "Mud density, kg/m³", "ρ_m", "={MW}*119.83", "kg/m³")
rg.add("Ph", "Hydrostatic pressure at TVD", "P_h", "=0.052*{MW}*{TVD}", "psig")
rg.add("Ph2", "Hydrostatic pressure at TVD (first draft)", "P_h2", "=0.052*{MW}*{TVDm}",
       "psig", planted=("unit-scale", "TVD in m in the 0.052 rule: 3.28 times too small"))
rg.add("Phk", "Hydrostatic pressure at TVD, kPa", "P_h,kPa", "={Ph}*6.895", "kPa(g)")
rg.add("PhSI", "Hydrostatic pressure at TVD, kPa (SI check, ρ·g·h)", "P_h,SI",
       "={rho}*9.81*{TVDm}/1000", "kPa(g)")
rg.add("grad", "Mud pressure gradient", "G_m", "=0.052*{MW}", "psi/ft")
rg.add("gradk", "Mud pressure gradient, kPa/m", "G_m,SI", "={grad}*22.62", "kPa/m")
rg.add("Pf", "Formation pressure, wireline test (absolute)", "P_f", 5120, "psia")
rg.add("patm", "Atmosphere at the rig floor", "p_atm", 14.7, "psia")
rg.add("OB", "Overbalance on the formation", "ΔP_ob", "={Ph}+{patm}-{Pf}", "psi")
rg.add("OB2", "Overbalance on the formation (first draft)", "ΔP_ob2", "={Ph}-{Pf}", "psi",
       planted=("offset-scale", "a gauge hydrostatic pressure less an absolute formation "
                                "pressure"))
rg.add("EMW", "Formation pressure as an equivalent mud weight", "EMW",
       "=({Pf}-{patm})/(0.052*{TVD})", "ppg")
rg.add("APL", "Annular pressure loss (hydraulics program)", "APL", 240, "psi")
rg.add("ECD", "Equivalent circulating density", "ECD", "={MW}+{APL}/(0.052*{TVD})", "ppg")
rg.heading("Hydraulic horsepower")
rg.add("SPP", "Standpipe pressure", "SPP", 3100, "psig")
rg.add("HHP", "Hydraulic horsepower delivered by the pumps", "HHP", "={SPP}*{Qg}/1714", "hp")
rg.add("HHP2", "Hydraulic horsepower (first draft)", "HHP_2", "={SPP}*{Qbm}/1714", "hp",
       planted=("unit-scale", "bbl/min in the 1714 rule, which takes gpm: 42 times too small"))
rg.add("HkW", "Hydraulic power, kW", "P_h", "={HHP}*0.7457", "kW")
rg.add("em", "Pump mechanical efficiency", "η_m", 90, "%")
rg.add("Hin", "Input horsepower to the pumps", "P_in", "={HHP}/({em}/100)", "hp")
RIGS = rg.finish()

PITS = {
    "A1": "Rig Tamarind 14: surface pit volumes at the 06:00 tour change (invented pits and "
          "levels; rectangular pits, level read on the pit marker)",
    "A2": "Sources: pit volume bbl = length (ft) × width (ft) × level (in) ÷ 12 ÷ 5.615, 1 bbl "
          "= 5.615 ft³ = 0.159 m³ (NIST SP 811 (2008) App. B.8; Lapeyrouse, 2nd ed. (2002), "
          "from memory).",
    "A3": CAUTION,
    "A5": "Pit", "B5": "Length [ft]", "C5": "Width [ft]", "D5": "Level [in]",
    "E5": "Volume [bbl]", "F5": "Volume [m³]", "G5": "Capacity [bbl/in]",
    "A10": "Total", "E10": "=SUM(E6:E9)", "F10": "=SUM(F6:F9)",
}
for r, (pit, ln, wd, lv) in enumerate([("Active 1 (suction)", 30, 10, 64),
                                       ("Active 2 (intermediate)", 30, 10, 58),
                                       ("Reserve", 36, 10, 45),
                                       ("Trip tank", 4, 4, 80)], start=6):
    PITS[f"A{r}"], PITS[f"B{r}"], PITS[f"C{r}"], PITS[f"D{r}"] = pit, ln, wd, lv
    PITS[f"E{r}"] = f"=B{r}*C{r}*D{r}/12/5.615"
    PITS[f"F{r}"] = f"=E{r}*0.159"
    PITS[f"G{r}"] = f"=B{r}*C{r}/12/5.615"
PITS["E7"] = "=B7*C7*D7/12*5.615"
PITS["F9"] = "=E9/0.159"
PITS_PLANTED = {
    "Pits!E7": ("unit-scale", "ft³ to bbl multiplied by 5.615: wrong way round"),
    "Pits!F9": ("unit-scale", "bbl to m³ divided by 0.159: wrong way round"),
}

RIGB = {
    "trade": "drilling: triplex mud pumps, annular velocity, hydrostatic pressure, pit volumes",
    "sheets": [("Pumps", RIGS), ("Pits", PITS)],
    "planted": {**rg.planted, **PITS_PLANTED},
    "sidecar": ("# Units of the Tamarind 14 pump sheet that plumb's table lacks (invented\n"
                "# scenario). A stroke is counted, one a stroke; strokes per minute as the\n"
                "# driller reads them (Lapeyrouse, 2nd ed. (2002), from memory).\n" + SAFETY +
                "measure stk = 1 1 \"one pump stroke, counted\"\n"
                "measure spm = 1/min \"strokes per minute\"\n"),
}

# --------------------------------------------------------------------------------------------
# Book 4: biomass district heating, wood chip store and boiler (GJ/t, MWh/t, MWh/m³, %, kg/m³,
# MW, kW, t/h, t/d, t, m³, d, kg/h, kg/d, °C, K, kJ/(kg·K), kg/s, m³/h, Nm³/kg, m³/kg, h/yr,
# MWh/yr, t/yr)
# --------------------------------------------------------------------------------------------
BIO_SRC = (
    "Sources: net calorific value as received q_net,ar = q_net,d·(1 − M/100) − 2.443·M/100 in "
    "GJ/t (= MJ/kg), M the moisture on the wet basis, 2.443 MJ/kg the enthalpy of vaporization "
    "of water at 25 °C (ISO 18125:2017, from memory); wood chip bulk density 250 kg/m³ loose "
    "at about 30 % to 35 % moisture (ISO 17225-4:2021 classes, value invented within the usual "
    "range, common practice); 1 MWh = 3.6 GJ and 1 MW = 3.6 GJ/h (SI Brochure 9th ed., from the "
    "watt and the hour); boiler efficiency on the net calorific value (EN 303-5, from memory); "
    "fuel flow = P_in ÷ q_net; ash from the ash content on dry matter A_d (ISO 18122:2015, from "
    "memory); network flow ṁ = P/(c_p·ΔT), c_p 4.19 kJ/(kg·K), water at 70 °C 978 kg/m³ "
    "(common practice); flue gas at temperature V = V_n·(t + 273.15)/273.15 at near-atmospheric "
    "pressure (ideal gas, common practice; wet flue gas about 5 Nm³ per kg of chip at this "
    "moisture and excess air, invented within the usual range). Plant, network, fuel, maker's "
    "data and readings invented.")
bo = ItemSheet("Plant", "Haverlea community heat network (invented): 2.4 MW wood chip boiler, "
               "walking-floor fuel store and ash, winter design day", BIO_SRC)
bo.heading("Fuel")
bo.add("qd", "Net calorific value, dry basis (lab report)", "q_d", 19.0, "GJ/t")
bo.add("M", "Moisture as received, wet basis", "M", 33, "%")
bo.add("q", "Net calorific value as received", "q_ar", "={qd}*(1-{M}/100)-2.443*{M}/100",
       "GJ/t")
bo.add("qkg", "Net calorific value as received, MJ/kg", "q_ar,kg", "={q}", "MJ/kg")
bo.add("q2", "Net calorific value as received (first draft)", "q_ar2",
       "={qd}*(1-{M})-2.443*{M}", "GJ/t",
       planted=("unit-scale", "moisture in % used as a fraction: 1 − 33 instead of 1 − 0.33"))
bo.add("qM", "Net calorific value as received, MWh/t", "q_ar,MWh", "={q}/3.6", "MWh/t")
bo.add("qM2", "Net calorific value as received, MWh/t (first draft)", "q_ar,MWh2", "={q}*3.6",
       "MWh/t", planted=("unit-scale", "GJ to MWh multiplied by 3.6: wrong way round"))
bo.add("rb", "Bulk density of the chip, loose, as received", "ρ_b", 250, "kg/m³")
bo.add("qv", "Energy density of the chip by volume", "q_v", "={qM}*{rb}/1000", "MWh/m³")
bo.heading("Boiler")
bo.add("Pb", "Boiler rated output", "P_b", 2.4, "MW")
bo.add("PbkW", "Boiler rated output, kW", "P_b,kW", "={Pb}*1000", "kW")
bo.add("eta", "Boiler efficiency on net calorific value, at the design load", "η", 86, "%")
bo.add("Pin", "Fuel input at rated output", "P_in", "={Pb}/({eta}/100)", "MW")
bo.add("Pin2", "Fuel input at rated output (first draft)", "P_in2", "={Pb}/{eta}", "MW",
       planted=("unit-scale", "a % used as a fraction: 100 too small"))
bo.add("mf", "Fuel feed at rated output", "ṁ_f", "={Pin}*3.6/{q}", "t/h")
bo.add("mfs", "Fuel feed at rated output, kg/s", "ṁ_f,s", "={mf}*1000/3600", "kg/s")
bo.add("mfv", "Fuel feed at rated output, loose volume", "V̇_f", "={mf}*1000/{rb}", "m³/h")
bo.add("mdry", "Dry matter fed at rated output", "ṁ_dry", "={mf}*(1-{M}/100)", "t/h")
bo.add("mf2", "Fuel feed at rated output (first draft)", "ṁ_f2", "={Pin}/{q}", "t/h",
       planted=("unit-scale", "MW over GJ/t as t/h: the 3.6 GJ/h per MW missing"))
bo.add("hrs", "Hours a day", "t_d", 24, "h/d")
bo.add("LF", "Average load on the design day, share of rated output", "f_L", 80, "%")
bo.add("md", "Fuel used on the design day", "m_d", "={mf}*{hrs}*{LF}/100", "t/d")
bo.add("Ed", "Heat from the boiler on the design day", "E_d", "={Pb}*{hrs}*{LF}/100",
       "MWh/d")
bo.add("mdc", "Fuel used on the design day (check from the heat)", "m_d c",
       "={Ed}/({eta}/100)/{qM}", "t/d")
bo.add("mdv", "Fuel used on the design day, loose volume", "V_d", "={md}*1000/{rb}", "m³/d")
bo.heading("Fuel store")
bo.add("Vs", "Fuel store volume (walking-floor bunker)", "V_s", 320, "m³")
bo.add("ff", "Usable fill of the store", "f_f", 85, "%")
bo.add("ms", "Fuel held in the store", "m_s", "={Vs}*{ff}/100*{rb}/1000", "t")
bo.add("Es", "Energy held in the store", "E_s", "={ms}*{qM}", "MWh")
bo.add("ms2", "Fuel held in the store (first draft)", "m_s2", "={Vs}*{ff}/100*{rb}", "t",
       planted=("unit-scale", "m³ × kg/m³ written as t: the /1000 missing"))
bo.add("ds", "Days of storage on the design day", "t_s", "={ms}/{md}", "d")
bo.add("ds2", "Days of storage on the design day (first draft)", "t_s2", "={Vs}*{ff}/100/{md}",
       "d", planted=("result-unit", "store volume over fuel mass a day: the bulk density "
                                    "missing"))
bo.add("Vt", "Delivery, walking-floor trailer, loose", "V_t", 90, "m³")
bo.add("dd", "Days between deliveries on the design day", "t_del", "={Vt}*{rb}/1000/{md}", "d")
bo.heading("Ash")
bo.add("Ad", "Ash content on dry matter", "A_d", 1.2, "%")
bo.add("ash", "Ash produced at rated output", "ṁ_a", "={mf}*1000*(1-{M}/100)*{Ad}/100",
       "kg/h")
bo.add("ash2", "Ash produced at rated output (first draft)", "ṁ_a2",
       "={mf}*(1-{M}/100)*{Ad}/100", "kg/h",
       planted=("unit-scale", "t/h written as kg/h: 1000 too small"))
bo.add("ashd", "Ash produced on the design day", "m_a", "={ash}*{hrs}*{LF}/100", "kg/d")
bo.add("Vbin", "Ash bin volume", "V_bin", 0.8, "m³")
bo.add("ra", "Bulk density of the bottom ash", "ρ_a", 600, "kg/m³")
bo.add("dbin", "Days to fill the ash bin on the design day", "t_bin", "={Vbin}*{ra}/{ashd}",
       "d")
bo.heading("Network")
bo.add("ts", "Network flow temperature", "t_s", 85, "°C")
bo.add("tr", "Network return temperature", "t_r", 55, "°C")
bo.add("dT", "Network temperature difference", "ΔT", "={ts}-{tr}", "K")
bo.add("cp", "Specific heat of water", "c_p", 4.19, "kJ/(kg·K)")
bo.add("mw", "Network water flow at rated output", "ṁ_w", "={Pb}*1000/({cp}*{dT})", "kg/s")
bo.add("mw2", "Network water flow at rated output (first draft)", "ṁ_w2", "={Pb}/({cp}*{dT})",
       "kg/s", planted=("unit-scale", "MW over kJ/(kg·K)·K as kg/s: the ×1000 missing"))
bo.add("rw", "Density of water at 70 °C", "ρ_w", 978, "kg/m³")
bo.add("Vw", "Network water flow, m³/h", "V̇_w", "={mw}/{rw}*3600", "m³/h")
bo.add("Po", "Standby oil boiler output", "P_o", 850, "kW")
bo.add("Pt", "Heat available with the standby boiler", "P_t", "={Pb}+{Po}/1000", "MW")
bo.add("Pt2", "Heat available with the standby boiler (first draft)", "P_t2", "={Pb}+{Po}",
       "MW", planted=("unit-scale", "kW added to MW"))
bo.heading("Flue gas")
bo.add("Vn", "Wet flue gas per kg of chip, normal conditions", "v_n", 5.0, "Nm³/kg")
bo.add("tf", "Flue gas temperature at the fan", "t_f", 160, "°C")
bo.add("Vf", "Wet flue gas per kg of chip at the fan temperature", "v_f",
       "={Vn}*({tf}+273.15)/273.15", "m³/kg")
bo.add("Vf2", "Wet flue gas per kg of chip at the fan temperature (first draft)", "v_f2",
       "={Vn}*{tf}/273.15", "m³/kg",
       planted=("offset-scale", "a °C reading in the gas law where kelvins belong"))
bo.add("Vfh", "Flue gas flow at the fan at rated output", "V̇_f", "={Vf}*{mf}*1000", "m³/h")
bo.add("Vfs", "Flue gas flow at the fan at rated output, m³/s", "V̇_f,s", "={Vfh}/3600",
       "m³/s")
bo.heading("Year")
bo.add("FLH", "Full-load hours a year (network model)", "t_FL", 3300, "h/yr")
bo.add("Ey", "Heat from the boiler a year", "E_y", "={Pb}*{FLH}", "MWh/yr")
bo.add("my", "Wood chip a year", "m_y", "={Ey}/({eta}/100)/{qM}", "t/yr")
bo.add("Ay", "Ash a year", "m_a,y", "={my}*(1-{M}/100)*{Ad}/100", "t/yr")
BIOS = bo.finish()

BIOB = {
    "trade": "biomass district heating: wood chip fuel, store, boiler, ash, network flow",
    "sheets": [("Plant", BIOS)],
    "planted": dict(bo.planted),
}

BOOKS = {"nrw-culverdale-oxley": NRWB, "dishwash-larkspur-hall": DWB,
         "mud-pumps-tamarind": RIGB, "biomass-haverlea": BIOB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()

# A dimensionally consistent formula can still be wrong; this check does not replace independent review under local codes and licensed practice.
