#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review63), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied and not modified; pattern after
corpus/sheets/review55/make_books.py.

Trades: a crude oil tank farm's closing inventory of one tank; a highway maintenance depot's
road-salt brine plant; a farm's centre-pivot irrigation on a well; a brewery's hot liquor tank
and mash heating. All scenarios, sites, firms, readings and maker's data are invented
(demonstration only); the formulas and published factors are the trade's own, with their
sources named in a text cell at the top of each sheet ("from memory" where recalled and not
checked, "common practice" for a fact of the trade with no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and
its messages that mislead, are recorded in review_notes.py after running the frozen binary.

Run: python3 make_books.py  ->  *.xlsx and *.expect in this folder (nothing written elsewhere)
"""
import math
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
# Book 1: crude oil tank farm, closing gauge of one floating-roof tank (ft, in, m, °F, °C,
# Δ°F, °API, kg/m³, bbl, bbl/ft, bbl/in, m³, %, t, ton, bbl/h, m³/h, gpm, h)
# --------------------------------------------------------------------------------------------
OIL_SRC = (
    "Sources: 1 ft = 0.3048 m, 1 in = 25.4 mm, 1 bbl = 42 US gal = 0.158987 m³ = 5.6146 ft³, "
    "1 short ton = 0.90718 t (NIST SP 811 (2008) App. B.8); °C = (°F − 32)/1.8 (NIST SP 811 "
    "(2008)); SG60 = 141.5/(131.5 + °API) (API gravity definition, API MPMS ch. 11.1, from "
    "memory); water at 60 °F 999.016 kg/m³ (API MPMS ch. 11.1, from memory); CTL = "
    "exp(−α60·ΔT·(1 + 0.8·α60·ΔT)), α60 = K0/ρ60², K0 = 341.0957 (kg/m³)²/°F for crude oil, "
    "ΔT = t − 60 °F (API MPMS ch. 11.1 (2004), from memory); shell temperature T_s = (7·T_L + "
    "T_A)/8 for an uninsulated tank, CTSh = 1 + 2·α·ΔT_s + α²·ΔT_s², α = 6.2 × 10⁻⁶ /°F for "
    "mild steel (API MPMS ch. 12.1.1, from memory); GSV = [(TOV·CTSh) − FW − FRA]·CTL, NSV = "
    "GSV·CSW, CSW = 1 − %S&W/100 (API MPMS ch. 12.1.1, from memory); floating roof adjustment "
    "FRA = roof mass/observed density (common practice); mass in air = volume·(ρ − 1.1 "
    "kg/m³) (ASTM D1250 / API MPMS ch. 11.5 convention, from memory); capacity per foot = "
    "π·D²/4/5.615 (common practice). Terminal, tank, strapping table and readings invented.")
ok = ItemSheet("Tank", "Brackwater Terminal (invented): tank 14, crude oil, floating roof, "
               "closing gauge for the month-end inventory", OIL_SRC)
ok.heading("Gauge")
ok.add("gft", "Innage gauge, whole feet (tape and bob)", "h_ft", 38, "ft")
ok.add("gin", "Innage gauge, inches beyond the whole feet", "h_in", 7.5, "in")
ok.add("lvl", "Liquid level", "h", "={gft}+{gin}/12", "ft")
ok.add("lvl2", "Liquid level (first draft)", "h_2", "={gft}+{gin}", "ft",
       planted=("unit-scale", "inches added to feet: the /12 missing"))
ok.add("lvlm", "Liquid level, m (operator's radar gauge check)", "h_m", "={lvl}*0.3048", "m")
ok.add("fwin", "Free water cut on the bob (water paste)", "h_w", 3.25, "in")
ok.heading("Temperatures")
ok.add("tL", "Average liquid temperature (three-point)", "T_L", 78.5, "°F")
ok.add("tA", "Ambient temperature at gauging", "T_A", 64.0, "°F")
ok.add("tC", "Average liquid temperature, °C", "t_L", "=({tL}-32)/1.8", "°C")
ok.add("tC2", "Average liquid temperature, °C (first draft)", "t_L2", "=({tL}-32)*1.8", "°C",
       planted=("unit-scale", "°F to °C multiplied by 1.8: wrong way round"))
ok.add("Ts", "Tank shell temperature, uninsulated", "T_s", "=(7*{tL}+{tA})/8", "°F")
ok.add("dTs", "Shell temperature difference from the 60 °F base", "ΔT_s", "={Ts}-60", "Δ°F")
ok.add("dTL", "Liquid temperature difference from the 60 °F base", "ΔT", "={tL}-60", "Δ°F")
ok.add("dTL2", "Liquid temperature difference from the base (first draft)", "ΔT_2",
       "={tC}-60", "Δ°F",
       planted=("unit-scale", "the °C reading less the 60 °F base: 1.8 too small"))
ok.heading("Gravity and volume correction")
ok.add("API", "Oil gravity at 60 °F (lab)", "API", 32.6, "°API")
ok.add("SG", "Specific gravity at 60 °F", "SG_60", "=141.5/(131.5+{API})", "-")
ok.add("rhow", "Density of water at 60 °F", "ρ_w", 999.016, "kg/m³")
ok.add("rho60", "Density at 60 °F", "ρ_60", "={SG}*{rhow}", "kg/m³")
ok.add("K0", "Crude oil constant K0", "K_0", 341.0957, "kg²/(m⁶·Δ°F)")
ok.add("a60", "Thermal expansion coefficient at 60 °F", "α_60", "={K0}/{rho60}^2", "1/Δ°F")
ok.add("CTL", "Correction for the temperature of the liquid", "CTL",
       "=EXP(-{a60}*{dTL}*(1+0.8*{a60}*{dTL}))", "-")
ok.add("CTLt", "CTL from the table (VCF sheet), check", "CTL_t",
       "=VLOOKUP({tL},VCF!A6:C10,2,TRUE)", "-")
ok.add("rhoT", "Density at the tank temperature", "ρ_T", "={rho60}*{CTL}", "kg/m³")
ok.heading("Volumes")
ok.add("D", "Tank diameter (nominal)", "D", 120, "ft")
ok.add("capft", "Capacity per foot of height, from the diameter", "c_ft",
       "=PI()*{D}^2/4/5.615", "bbl/ft")
ok.add("capin", "Capacity per inch, from the diameter (check on the Strap sheet)", "c_in",
       "={capft}/12", "bbl/in")
ok.add("TOV", "Total observed volume (Strap sheet)", "TOV",
       "=VLOOKUP({gft},Strap!A6:C10,2,TRUE)+{gin}*VLOOKUP({gft},Strap!A6:C10,3,TRUE)", "bbl")
ok.add("TOVm3", "Total observed volume, m³", "TOV_m", "={TOV}*0.158987", "m³")
ok.add("TOVm32", "Total observed volume, m³ (first draft)", "TOV_m2", "={TOV}/0.159", "m³",
       planted=("unit-scale", "bbl to m³ divided by 0.159: wrong way round"))
ok.add("bw", "Water table capacity per inch at the bottom (invented)", "c_w", 148.0, "bbl/in")
ok.add("FW", "Free water", "FW", "={fwin}*{bw}", "bbl")
ok.add("as", "Linear expansion coefficient of the shell steel", "α_s", 0.0000062, "1/Δ°F")
ok.add("CTSh", "Correction for the temperature of the shell", "CTSh",
       "=1+2*{as}*{dTs}+{as}^2*{dTs}^2", "-")
ok.add("mroof", "Floating roof mass (nameplate)", "m_r", 62.5, "t")
ok.add("FRA", "Floating roof adjustment", "FRA", "={mroof}*1000/{rhoT}/0.158987", "bbl")
ok.add("FRA2", "Floating roof adjustment (first draft)", "FRA_2", "={mroof}/{rhoT}/0.158987",
       "bbl", planted=("unit-scale", "tonnes over kg/m³ taken as m³: the ×1000 missing"))
ok.add("GSV", "Gross standard volume", "GSV", "=({TOV}*{CTSh}-{FW}-{FRA})*{CTL}", "bbl")
ok.add("SW", "Sediment and water (centrifuge, lab)", "S&W", 0.45, "%")
ok.add("CSW", "Correction for sediment and water", "CSW", "=1-{SW}/100", "-")
ok.add("NSV", "Net standard volume", "NSV", "={GSV}*{CSW}", "bbl")
ok.add("NSV2", "Net standard volume (first draft)", "NSV_2", "={GSV}*(1-{SW})", "bbl",
       planted=("unit-scale", "a % used as a fraction in 1 − S&W"))
ok.add("NSVm3", "Net standard volume, m³", "NSV_m", "={NSV}*0.158987", "m³")
ok.heading("Mass")
ok.add("mair", "Net mass in air", "m_a", "={NSVm3}*({rho60}-1.1)/1000", "t")
ok.add("mair2", "Net mass in air (first draft)", "m_a2", "={NSVm3}*({rho60}-1.1)", "t",
       planted=("unit-scale", "m³ × kg/m³ gives kg, written as t: the /1000 missing"))
ok.add("mton", "Net mass in air, short tons (US buyer)", "m_US", "={mair}/0.90718", "ton")
ok.heading("Transfer to the pipeline")
ok.add("q", "Transfer rate to the pipeline", "q", 4200, "bbl/h")
ok.add("qm3h", "Transfer rate, m³/h", "q_m", "={q}*0.159", "m³/h")
ok.add("qgpm", "Transfer rate, US gpm (booster pump maker)", "q_US", "={q}*42/60", "gpm")
ok.add("qgpm2", "Transfer rate, US gpm (first draft)", "q_US2", "={q}*42", "gpm",
       planted=("unit-scale", "bbl/h times 42 gives gal/h, written as gpm: the /60 missing"))
ok.add("VLL", "Volume at the low-low level (Strap sheet, invented)", "V_LL", 9800, "bbl")
ok.add("tout", "Time to pump down to the low-low level", "t_out", "=({TOV}-{VLL})/{q}", "h")
OILS = ok.finish()

# Strapping table (invented): volume at each whole foot, increment per inch to the next foot.
STRAP = {
    "A1": "Brackwater Terminal tank 14: strapping table, 36 to 40 ft (invented; deadwood and "
          "roof in the critical zone not included)",
    "A2": "Sources: capacity table per API MPMS ch. 2.2A (from memory), invented figures; "
          "increment per inch = (V(n+1) − V(n))/((h(n+1) − h(n))·12 in/ft) (common practice).",
    "A3": CAUTION,
    "A5": "Gauge [ft]", "B5": "Volume [bbl]", "C5": "Increment [bbl/in]",
}
_vol = 312.0
_per_ft = [2013.9, 2014.4, 2013.7, 2014.1, 2013.8, 2014.2, 2014.0, 2013.6, 2014.3, 2014.0,
           2013.9, 2014.2, 2014.1, 2013.8, 2014.0, 2014.3, 2013.7, 2014.1, 2014.0, 2013.9,
           2014.2, 2014.1, 2013.8, 2014.0, 2014.2, 2013.9, 2014.1, 2014.0, 2013.8, 2014.2,
           2014.1, 2013.9, 2014.0, 2014.2, 2013.8, 2014.1, 2014.0, 2013.9, 2014.2, 2014.0]
_vols = [round(_vol + sum(_per_ft[:n]), 1) for n in range(41)]
for r, ft in enumerate(range(36, 41), start=6):
    STRAP[f"A{r}"], STRAP[f"B{r}"] = ft, _vols[ft]
    if ft < 40:
        STRAP[f"C{r}"] = f"=(B{r + 1}-B{r})/((A{r + 1}-A{r})*12)"
STRAP["C9"] = "=(B10-B9)/(A10-A9)"
STRAP_PLANTED = {"Strap!C9": ("unit-scale", "a volume per foot written as per inch: the ×12 "
                                            "(in/ft) missing")}
# The reviewer's first run had the increments as (V(n+1) − V(n))/12, the trade's shorthand
# that leaves the 1 ft step between rows out of the formula; plumb named them result-unit
# (volume where bbl/in belongs), fairly, and they are written with the step now
# (review_notes.py).

# VCF table for this crude (computed by the reviewer with the API MPMS 11.1 formula above and
# rounded to 5 places, as a Table 6A excerpt prints them)
_rho60 = 141.5 / (131.5 + 32.6) * 999.016
_a60 = 341.0957 / _rho60 ** 2
VCF = {
    "A1": "Brackwater Terminal: volume correction factors to 60 °F for the 32.6 °API crude of "
          "tank 14 (computed by API MPMS ch. 11.1 (2004), from memory; rounded to 5 places)",
    "A2": "Sources: API MPMS ch. 11.1 (from memory); °C = (°F − 32)/1.8 (NIST SP 811 (2008)).",
    "A3": CAUTION,
    "A5": "Temperature [°F]", "B5": "VCF [-]", "C5": "Temperature [°C]",
}
for r, tf in enumerate([77.5, 78.0, 78.5, 79.0, 79.5], start=6):
    dt = tf - 60
    VCF[f"A{r}"] = tf
    VCF[f"B{r}"] = round(math.exp(-_a60 * dt * (1 + 0.8 * _a60 * dt)), 5)
    VCF[f"C{r}"] = f"=(A{r}-32)/1.8"
VCF["C8"] = "=A8/1.8-32"
VCF_PLANTED = {"VCF!C8": ("offset-scale", "°F to °C with the brackets lost: a °F reading "
                                          "divided by 1.8")}

OILB = {
    "trade": "oil terminal: crude tank gauge, volume correction, net volume and mass",
    "sheets": [("Tank", OILS), ("Strap", STRAP), ("VCF", VCF)],
    "planted": {**ok.planted, **STRAP_PLANTED, **VCF_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 2: highway depot road-salt brine plant (US gal, L, m³, % w/w, kg/L, lb/gal, kg, lb, t,
# ton, °C, °F, gal/mi, L/km, mi, km, mph, gpm, L/min, L/s, m³/h, lb/h, kg/h, t/h, ft, psi,
# kPa, hp, kW, min)
# --------------------------------------------------------------------------------------------
BRN_SRC = (
    "Sources: 1 US gal = 3.785 L, 1 lb = 0.4536 kg (2.205 lb/kg), 1 mi = 1.609 km, 1 US gpm "
    "= 0.06309 L/s = 0.2271 m³/h, 1 psi = 6.895 kPa, 1 hp = 0.7457 kW, 1 short ton = 2000 lb "
    "(NIST SP 811 (2008) App. B.8); °F = 1.8·°C + 32 (NIST SP 811 (2008)); specific gravity "
    "of NaCl brine by strength at 60 °F on the Brine sheet (Salt Institute brine tables, from "
    "memory); water at 60 °F 8.337 lb/gal (common practice); eutectic brine 23.3 % NaCl "
    "freezing at −21.1 °C (common practice); anti-icing rate per lane-mile (state DOT "
    "guidance, common practice; this depot's rate invented); Δp = 0.433·ft·SG psi and bhp = "
    "gpm·ft·SG/(3960·η) (common practice); rock salt 95 % NaCl as delivered (invented). Depot, "
    "route, plant, pump and readings invented. Lane-miles are written in mi and the rate in "
    "gal/mi, one lane counted.")
br = ItemSheet("Plant", "Kettle Ridge Highway Maintenance Depot (invented): District 4 salt "
               "brine plant, anti-icing season plan", BRN_SRC)
br.heading("Batch")
br.add("Vb", "Batch size in the brine maker's tank", "V_b", 6000, "gal")
br.add("VbL", "Batch size, litres", "V_L", "={Vb}*3.785", "L")
br.add("VbL2", "Batch size, litres (first draft)", "V_L2", "={Vb}/3.785", "L",
       planted=("unit-scale", "US gal to L divided by 3.785: wrong way round"))
br.add("c", "Brine strength (eutectic)", "c", 23.3, "% w/w")
br.add("SG", "Brine specific gravity at 60 °F (Brine sheet)", "SG",
       "=VLOOKUP({c},Brine!A6:D10,2,TRUE)", "-")
br.add("rhow", "Density of water at 60 °F", "ρ_w", 0.999, "kg/L")
br.add("rho", "Brine density", "ρ", "={SG}*{rhow}", "kg/L")
br.add("mb", "Brine mass per batch", "m_b", "={VbL}*{rho}", "kg")
br.add("ms", "Salt (NaCl) per batch", "m_s", "={mb}*{c}/100", "kg")
br.add("ms2", "Salt (NaCl) per batch (first draft)", "m_s2", "={mb}*{c}", "kg",
       planted=("unit-scale", "a % w/w used as a fraction: 100 too large"))
br.add("mslb", "Salt per batch, lb (salt shed records)", "m_s,US", "={ms}*2.205", "lb")
br.add("mslb2", "Salt per batch, lb (first draft)", "m_s,US2", "={ms}/2.205", "lb",
       planted=("unit-scale", "kg to lb divided by 2.205: wrong way round"))
br.add("mw", "Water per batch, mass", "m_w", "={mb}-{ms}", "kg")
br.add("VwL", "Water per batch, litres", "V_w", "={mw}/{rhow}", "L")
br.add("Vwgal", "Water per batch, US gal (meter on the fill line)", "V_w,US", "={VwL}/3.785",
       "gal")
br.add("pur", "NaCl in the rock salt as delivered (invented)", "x", 95, "%")
br.add("mrs", "Rock salt per batch", "m_rs", "={ms}/({pur}/100)", "kg")
br.add("mrst", "Rock salt per batch, short tons (purchasing)", "m_rs,US",
       "={mslb}/({pur}/100)/2000", "ton")
br.heading("Freezing point")
br.add("tfC", "Freezing point of the eutectic brine", "t_f", -21.1, "°C")
br.add("tfF", "Freezing point, °F", "t_f,F", "={tfC}*1.8+32", "°F")
br.heading("Route and application")
br.add("rate", "Anti-icing rate per lane-mile", "r", 40, "gal/mi")
br.add("Lm", "Route length, lane-miles", "L_r", 145, "mi")
br.add("Vrun", "Brine per anti-icing run", "V_run", "={rate}*{Lm}", "gal")
br.add("rateL", "Anti-icing rate, L per lane-km", "r_SI", "={rate}*3.785/1.609", "L/km")
br.add("truck", "Tanker truck capacity", "V_t", 1800, "gal")
br.add("loads", "Truck loads per run", "n_l", "={Vrun}/{truck}", "-")
br.add("spd", "Spraying speed", "v", 25, "mph")
br.add("spray", "Spray bar flow at the rate and speed", "q_s", "={rate}*{spd}/60", "gpm")
br.add("spray2", "Spray bar flow (first draft)", "q_s2", "={rate}*{spd}", "gpm",
       planted=("unit-scale", "gal/mi × mph gives gal/h, written as gpm: the /60 missing"))
br.add("sprayL", "Spray bar flow, L/min (controller set-up)", "q_s,SI", "={spray}*3.785",
       "L/min")
br.add("spg", "Salt per gallon of brine (Brine sheet)", "w_s",
       "=VLOOKUP({c},Brine!A6:D10,4,TRUE)", "lb/gal")
br.add("saltrun", "Salt spread per run", "m_run", "={Vrun}*{spg}", "lb")
br.heading("Brine maker and transfer pump")
br.add("Qmk", "Brine maker output", "Q_mk", 60, "gpm")
br.add("srate", "Salt use of the brine maker", "ṁ_s", "={Qmk}*60*{spg}", "lb/h")
br.add("sratek", "Salt use of the brine maker, t/h (loader operator)", "ṁ_s,t",
       "={srate}*0.4536/1000", "t/h")
br.add("Qp", "Transfer pump flow (maker's duty point, invented)", "Q_p", 150, "gpm")
br.add("QLs", "Transfer pump flow, L/s", "Q_p,SI", "={Qp}*0.06309", "L/s")
br.add("QLs2", "Transfer pump flow, L/s (first draft)", "Q_p,SI2", "={Qp}*15.85", "L/s",
       planted=("unit-scale", "gpm to L/s multiplied by 15.85: wrong way round"))
br.add("Qm3h", "Transfer pump flow, m³/h", "Q_p,h", "={Qp}*0.2271", "m³/h")
br.add("tfill", "Time to fill a tanker truck", "t_fill", "={truck}/{Qp}", "min")
br.add("H", "Pump head at duty, feet of brine", "H", 65, "ft")
br.add("dp", "Pump pressure rise", "Δp", "={H}*0.433*{SG}", "psi")
br.add("dp2", "Pump pressure rise (first draft)", "Δp_2", "={H}*0.433/{SG}", "psi",
       planted=("gravity-number", "the specific gravity divides where it multiplies"))
br.add("dpk", "Pump pressure rise, kPa", "Δp_SI", "={dp}*6.895", "kPa")
br.add("eta", "Pump efficiency at duty (maker's curve, invented)", "η", 62, "%")
br.add("bhp", "Pump shaft power", "P_hp", "={Qp}*{H}*{SG}/(3960*{eta}/100)", "hp")
br.add("kW", "Pump shaft power, kW (motor starter)", "P", "={bhp}*0.7457", "kW")
br.add("kW2", "Pump shaft power, kW (first draft)", "P_2", "={bhp}/0.7457", "kW",
       planted=("unit-scale", "hp to kW divided by 0.7457: wrong way round"))
br.heading("Storage")
br.add("Nt", "Storage tanks", "N_t", 3, "-")
br.add("Vt", "Storage tank capacity, each", "V_st", 10000, "gal")
br.add("Vst", "Storage", "V_s", "={Nt}*{Vt}", "gal")
br.add("Vstm", "Storage, m³ (state asset register)", "V_s,SI", "={Vst}*0.003785", "m³")
br.add("Vstm2", "Storage, m³ (first draft)", "V_s,SI2", "={Vst}*3.785", "m³",
       planted=("unit-scale", "gal to L written as m³: the /1000 missing"))
br.add("runs", "Runs from full storage", "n_r", "={Vst}/{Vrun}", "-")
BRNS = br.finish()

BRINE = {
    "A1": "Sodium chloride brine by strength at 60 °F (Salt Institute brine tables, rounded, "
          "from memory; check against the tables before use)",
    "A2": "Sources: Salt Institute (from memory); density = SG × 8.337 lb/gal (water at 60 °F, "
          "common practice); salt per gallon = density × strength (common practice).",
    "A3": CAUTION,
    "A5": "NaCl [% w/w]", "B5": "SG [-]", "C5": "Density [lb/gal]", "D5": "Salt [lb/gal]",
}
for r, (pc, sg) in enumerate([(21.0, 1.160), (22.0, 1.168), (23.0, 1.176), (23.3, 1.179),
                              (24.0, 1.185)], start=6):
    BRINE[f"A{r}"], BRINE[f"B{r}"] = pc, sg
    BRINE[f"C{r}"] = f"=B{r}*8.337"
    BRINE[f"D{r}"] = f"=C{r}*A{r}/100"
BRINE["C8"] = "=B8/8.337"
BRINE_PLANTED = {"Brine!C8": ("unit-scale", "SG to lb/gal divided by 8.337: wrong way round")}

BRNB = {
    "trade": "highway maintenance: salt brine batching, anti-icing runs, transfer pump, storage",
    "sheets": [("Plant", BRNS), ("Brine", BRINE)],
    "planted": {**br.planted, **BRINE_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 3: centre-pivot irrigation on a well (ft, m, ft², acre, ha, gpm, L/s, m³/h, in/d, mm/d,
# %, ft/min, h, in, mm, psig, psia, kPa(g), bar(g), hp, kW, kg/m³, kWh, $/kWh, $, m³, acre·ft)
# --------------------------------------------------------------------------------------------
PIV_SRC = (
    "Sources: 1 acre = 43 560 ft² = 0.4047 ha, 1 ft = 0.3048 m, 1 in = 25.4 mm, 1 US gpm = "
    "0.06309 L/s, 1 psi = 6.895 kPa = 0.06895 bar, 1 hp = 0.7457 kW (NIST SP 811 (2008) App. "
    "B.8); 1 acre-inch per hour = 452.6 gpm, so the gross depth d (in/d) = 24·Q/(453·A) "
    "(common practice; USDA NRCS National Engineering Handbook part 652, from memory); "
    "1 L/s per ha = 8.64 mm/d (common practice); 2.31 ft of water per psi (common practice); "
    "water hp = gpm·ft/3960 (common practice); P = ρ·g·Q·H/η, g_n = 9.81 m/s² (SI Brochure 9th "
    "ed.); lap time = 2π·r/(v·timer) at the end tower (common practice); absolute = gauge + "
    "site barometer. Farm, field, well, pump curve, tariff and readings invented.")
pv = ItemSheet("Pivot", "Hollins Draw Farm (invented): north quarter, centre pivot 3 on well "
               "7, design check for the maize season", PIV_SRC)
pv.heading("Field")
pv.add("r", "Wetted radius (pivot length with overhang)", "r", 1310, "ft")
pv.add("Aft2", "Irrigated area, ft²", "A_ft", "=PI()*{r}^2", "ft²")
pv.add("A", "Irrigated area", "A", "={Aft2}/43560", "acre")
pv.add("A2", "Irrigated area (first draft)", "A_2", "=PI()*{r}^2/4047", "acre",
       planted=("unit-scale", "ft² divided by the m² in an acre"))
pv.add("Aha", "Irrigated area, ha (grant form)", "A_ha", "={A}*0.4047", "ha")
pv.add("Aha2", "Irrigated area, ha (first draft)", "A_ha2", "={A}/0.4047", "ha",
       planted=("unit-scale", "acres to ha divided by 0.4047: wrong way round"))
pv.add("rm", "Wetted radius, m", "r_m", "={r}*0.3048", "m")
pv.add("Ahac", "Irrigated area from the radius in m, check", "A_ha,c", "=PI()*{rm}^2/10000",
       "ha")
pv.heading("System capacity and application")
pv.add("Q", "System flow at the pivot point (flow meter)", "Q", 850, "gpm")
pv.add("QLs", "System flow, L/s", "Q_SI", "={Q}*0.06309", "L/s")
pv.add("QLs2", "System flow, L/s (first draft)", "Q_SI2", "={Q}/60", "L/s",
       planted=("unit-scale", "gal/min over 60 is gal/s, written as L/s: 3.785 missing"))
pv.add("Qm3h", "System flow, m³/h", "Q_h", "={QLs}*3.6", "m³/h")
pv.add("d", "Gross application depth", "d", "={Q}*24/(453*{A})", "in/day")
pv.add("d2", "Gross application depth (first draft)", "d_2", "={Q}/(453*{A})", "in/day",
       planted=("unit-scale", "acre-inches per hour written as per day: the 24 missing"))
pv.add("dmm", "Gross application depth, mm/day", "d_mm", "={d}*25.4", "mm/day")
pv.add("dmmc", "Gross application depth from L/s and ha, check", "d_mm,c",
       "={QLs}/{Aha}*8.64", "mm/day")
pv.add("eff", "Application efficiency (LEPA drops, invented)", "E_a", 85, "%")
pv.add("dnet", "Net application depth", "d_n", "={d}*{eff}/100", "in/day")
pv.heading("Lap time")
pv.add("rend", "Radius to the end tower", "r_e", 1265, "ft")
pv.add("vend", "End tower speed at 100 % timer (maker, invented)", "v_e", 9.2, "ft/min")
pv.add("timer", "Percentage timer setting", "τ", 50, "%")
pv.add("lap", "Lap time", "t_lap", "=2*PI()*{rend}/({vend}*{timer}/100)/60", "h")
pv.add("lap2", "Lap time (first draft)", "t_lap2", "=2*PI()*{rend}/({vend}*{timer}/100)",
       "h", planted=("unit-scale", "minutes written as hours: the /60 missing"))
pv.add("dlap", "Gross depth per lap", "d_lap", "={d}*{lap}/24", "in")
pv.add("dlapmm", "Gross depth per lap, mm", "d_lap,mm", "={dlap}*25.4", "mm")
pv.heading("Pumping head")
pv.add("zpl", "Pumping level below ground at the well (test, invented)", "z_pl", 185, "ft")
pv.add("zel", "Rise from the well head to the pivot point", "z_el", 22, "ft")
pv.add("hf", "Friction loss in the mainline", "h_f", 14, "ft")
pv.add("hc", "Column and discharge head loss", "h_c", 8, "ft")
pv.add("pp", "Pressure at the pivot point (nozzle chart)", "p_p", 42, "psig")
pv.add("pb", "Site barometer at 2900 ft (invented)", "p_b", 13.2, "psia")
pv.add("pabs", "Pressure at the pivot point, absolute (for the sizing note)", "p_a",
       "={pp}+{pb}", "psia")
pv.add("hp", "Pressure head at the pivot point", "h_p", "={pp}*2.31", "ft")
pv.add("TDH", "Total dynamic head", "TDH", "={zpl}+{zel}+{hf}+{hc}+{hp}", "ft")
pv.add("TDH2", "Total dynamic head (first draft)", "TDH_2",
       "={zpl}+{zel}+{hf}+{hc}+{pabs}*2.31", "ft",
       planted=("offset-scale", "an absolute pressure turned into head where the gauge "
                                "pressure belongs"))
pv.add("TDHm", "Total dynamic head, m", "TDH_m", "={TDH}*0.3048", "m")
pv.add("ppk", "Pressure at the pivot point, kPa(g)", "p_p,SI", "={pp}*6.895", "kPa(g)")
pv.add("ppb", "Pressure at the pivot point, bar(g) (European nozzle chart)", "p_p,b",
       "={pp}/14.5", "bar(g)")
pv.add("ppb2", "Pressure at the pivot point, bar(g) (first draft)", "p_p,b2", "={pp}*14.5",
       "bar(g)", planted=("unit-scale", "psi to bar multiplied by 14.5: wrong way round"))
pv.heading("Power")
pv.add("whp", "Water power", "P_w", "={Q}*{TDH}/3960", "hp")
pv.add("etap", "Pump efficiency at the duty flow (Curve sheet)", "η_p",
       "=VLOOKUP({Q},Curve!A6:D10,3,TRUE)", "%")
pv.add("bhp", "Pump shaft power", "P_sh,hp", "={whp}/({etap}/100)", "hp")
pv.add("Psh", "Pump shaft power, kW", "P_sh", "={bhp}*0.7457", "kW")
pv.add("rho", "Density of the groundwater at 12 °C", "ρ", 999.5, "kg/m³")
pv.add("PshSI", "Pump shaft power, SI check", "P_sh,c",
       "={rho}*9.81*{QLs}/1000*{TDHm}/1000/({etap}/100)", "kW")
pv.add("PshSI2", "Pump shaft power, SI check (first draft)", "P_sh,c2",
       "={rho}*{QLs}/1000*{TDHm}/1000/({etap}/100)", "kW",
       planted=("result-unit", "ρ·Q·H with g left out"))
pv.add("etam", "Motor efficiency (nameplate)", "η_m", 94.5, "%")
pv.add("Pin", "Motor input power", "P_in", "={Psh}/({etam}/100)", "kW")
pv.add("Pin2", "Motor input power (first draft)", "P_in2", "={Psh}/{etam}", "kW",
       planted=("unit-scale", "a % efficiency used as a fraction: 100 too small"))
pv.heading("Season")
pv.add("Ds", "Gross depth to apply over the season", "D_s", 14, "in")
pv.add("hrs", "Pumping hours in the season", "t_s", "={Ds}/{d}*24", "h")
pv.add("E", "Electricity in the season", "E", "={Pin}*{hrs}", "kWh")
pv.add("tar", "Irrigation tariff (invented)", "c_e", 0.11, "$/kWh")
pv.add("cost", "Electricity cost in the season", "C", "={E}*{tar}", "$")
pv.add("Vs", "Water pumped in the season", "V_s", "={Qm3h}*{hrs}", "m³")
pv.add("Vsaf", "Water pumped in the season, acre·ft (water right)", "V_s,US",
       "={Ds}*{A}/12", "acre·ft")
PIVS = pv.finish()

CURVE = {
    "A1": "Well 7 pump: maker's curve at 1770 rpm (invented)",
    "A2": "Sources: maker's curve (invented); 1 ft = 0.3048 m (NIST SP 811 (2008) App. B.8).",
    "A3": CAUTION,
    "A5": "Flow [gpm]", "B5": "Head [ft]", "C5": "Efficiency [%]", "D5": "Head [m]",
}
for r, (q, h, e) in enumerate([(650, 372, 72.0), (750, 352, 75.0), (850, 328, 76.5),
                               (950, 299, 76.0), (1050, 262, 73.5)], start=6):
    CURVE[f"A{r}"], CURVE[f"B{r}"], CURVE[f"C{r}"] = q, h, e
    CURVE[f"D{r}"] = f"=B{r}*0.3048"
CURVE_PLANTED = {}

PIVB = {
    "trade": "agriculture: centre-pivot irrigation, application depth, lap time, pump and energy",
    "sheets": [("Pivot", PIVS), ("Curve", CURVE)],
    "planted": {**pv.planted, **CURVE_PLANTED},
}

# --------------------------------------------------------------------------------------------
# Book 4: brewery hot liquor tank and mash heating (hL, L, %, kg/L, kg, °C, °F, K, kJ/(kg·K),
# kJ, kWh, kJ/K, bar(g), bar, bar a, psig, kJ/kg, kg/h, lb/h, kW, W, Btu/h, min, L/kg)
# --------------------------------------------------------------------------------------------
BRW_SRC = (
    "Sources: 1 hL = 100 L (SI Brochure 9th ed., Table 8 and prefixes); 1 kWh = 3600 kJ, 1 kW "
    "= 3412 Btu/h, 1 bar = 14.50 psi, 1 kg = 2.205 lb (NIST SP 811 (2008) App. B.8); °F = "
    "1.8·°C + 32, K = °C + 273.15 (SI Brochure 9th ed.); water 0.9995 kg/L at 12 °C and "
    "0.9718 kg/L at 80 °C, c_p = 4.19 kJ/(kg·K) (IAPWS, from memory); malt c_p ≈ 1.7 "
    "kJ/(kg·K) (Kunze, Technology Brewing and Malting, from memory); Q = m·c_p·ΔT (common "
    "practice); strike temperature T_s = T_m + (c_malt/c_w)·(T_m − T_g)/(R·ρ) from a heat "
    "balance of grist and water (common practice); saturated steam on the Steam sheet "
    "(IAPWS-IF97, rounded, from memory); jacket duty = ṁ·h_fg·η (common practice); site "
    "barometer 1.013 bar (invented, near sea level). Brewery, vessels, recipe and readings "
    "invented.")
bw = ItemSheet("Brewhouse", "Fellgate Brewing Co. (invented): 30 hL brewhouse, hot liquor "
               "tank and mash tun heating for a pale ale brew", BRW_SRC)
bw.heading("Hot liquor tank fill")
bw.add("VT", "Hot liquor tank working volume", "V_T", 60, "hL")
bw.add("fill", "Fill level for this brew", "φ", 90, "%")
bw.add("Vf", "Liquor to heat", "V_f", "={VT}*{fill}/100", "hL")
bw.add("VfL", "Liquor to heat, litres", "V_L", "={Vf}*100", "L")
bw.add("VfL2", "Liquor to heat, litres (first draft)", "V_L2", "={Vf}*10", "L",
       planted=("unit-scale", "hL to L multiplied by 10 where 100 belongs"))
bw.add("rho12", "Density of the town water at 12 °C", "ρ_12", 0.9995, "kg/L")
bw.add("m", "Mass of liquor", "m", "={VfL}*{rho12}", "kg")
bw.add("t1", "Town water temperature", "t_1", 12, "°C")
bw.add("t2", "Hot liquor set point", "t_2", 80, "°C")
bw.add("t2F", "Hot liquor set point, °F (US-built controller)", "t_2,F", "={t2}*1.8+32", "°F")
bw.add("t2F2", "Hot liquor set point, °F (first draft)", "t_2,F2", "={t2}*1.8", "°F",
       planted=("offset-scale", "°C to °F by the 1.8 alone: the +32 missing"))
bw.add("dT", "Temperature rise of the liquor", "ΔT", "={t2}-{t1}", "K")
bw.add("cp", "Specific heat of water", "c_p", 4.19, "kJ/(kg·K)")
bw.add("Q", "Heat to bring the liquor to the set point", "Q", "={m}*{cp}*{dT}", "kJ")
bw.add("QkWh", "Heat to bring the liquor to the set point, kWh", "Q_kWh", "={Q}/3600", "kWh")
bw.add("QkWh2", "Heat per brew, kWh (energy report, first draft)", "Q_kWh2", "={Q}/1000",
       "kWh", planted=("unit-scale", "kJ to kWh divided by 1000 where 3600 belongs"))
bw.add("rho80", "Density of water at 80 °C", "ρ_80", 0.9718, "kg/L")
bw.add("V80", "Liquor volume at 80 °C (expansion check against the tank)", "V_80",
       "={m}/{rho80}/100", "hL")
bw.heading("Steam to the tank jacket")
bw.add("psg", "Steam pressure at the jacket control valve", "p_g", 3.0, "bar(g)")
bw.add("pb", "Site barometer", "p_b", 1.013, "bar")
bw.add("psa", "Steam pressure, absolute", "p_a", "={psg}+{pb}", "bar a")
bw.add("pspsig", "Steam pressure, psig (US valve data sheet)", "p_g,US", "={psg}*14.5", "psig")
bw.add("hfg", "Latent heat of the steam (Steam sheet)", "h_fg",
       "=VLOOKUP({psa},Steam!A6:E10,4,TRUE)", "kJ/kg")
bw.add("hfg2", "Latent heat of the steam (first draft)", "h_fg2",
       "=VLOOKUP({psg},Steam!A6:E10,4,TRUE)", "kJ/kg",
       planted=("offset-scale", "a gauge pressure looked up in a table of absolute pressures"))
bw.add("tsat", "Steam temperature in the jacket (Steam sheet)", "t_sat",
       "=VLOOKUP({psa},Steam!A6:E10,2,TRUE)", "°C")
bw.add("ms", "Steam flow at the valve's rated capacity (maker, invented)", "ṁ_s", 420, "kg/h")
bw.add("eff", "Jacket heat-up efficiency (shell losses)", "η", 88, "%")
bw.add("Pj", "Jacket heat input to the liquor", "P_j", "={ms}*{hfg}/3600*{eff}/100", "kW")
bw.add("Pj2", "Jacket heat input to the liquor (first draft)", "P_j2",
       "={ms}*{hfg}*{eff}/100", "kW",
       planted=("unit-scale", "kg/h × kJ/kg written as kW: the /3600 missing"))
bw.add("PjB", "Jacket heat input, Btu/h (US boiler maker)", "P_j,US", "={Pj}*3412", "Btu/h")
bw.add("th", "Heat-up time on steam", "t_h", "={QkWh}/{Pj}*60", "min")
bw.add("th2", "Heat-up time on steam (first draft)", "t_h2", "={QkWh}/{Pj}", "min",
       planted=("unit-scale", "hours written as minutes: the ×60 missing"))
bw.heading("Electric back-up elements")
bw.add("nel", "Immersion elements", "n_e", 3, "-")
bw.add("PelW", "Element rating, each (nameplate)", "P_e", 18000, "W")
bw.add("Pel", "Element heat input", "P_el", "={nel}*{PelW}/1000", "kW")
bw.add("Pel2", "Element heat input (first draft)", "P_el2", "={nel}*{PelW}", "kW",
       planted=("unit-scale", "W written as kW: the /1000 missing"))
bw.add("thel", "Heat-up time on the elements alone", "t_el", "={QkWh}/{Pel}*60", "min")
bw.heading("Mash")
bw.add("mg", "Grist", "m_g", 1150, "kg")
bw.add("R", "Liquor-to-grist ratio", "R", 3.0, "L/kg")
bw.add("Vmw", "Strike liquor", "V_mw", "={mg}*{R}", "L")
bw.add("tg", "Grist temperature", "t_g", 16, "°C")
bw.add("tm", "Target mash temperature (saccharification rest)", "t_m", 65, "°C")
bw.add("cm", "Specific heat of malt", "c_m", 1.7, "kJ/(kg·K)")
bw.add("ts", "Strike liquor temperature", "t_s", "={tm}+{cm}/{cp}*({tm}-{tg})/({R}*{rho80})",
       "°C")
bw.add("tsF", "Strike liquor temperature, °F", "t_s,F", "={ts}*1.8+32", "°F")
bw.add("tmo", "Mash-out temperature", "t_mo", 76, "°C")
bw.add("tmoK", "Mash-out temperature, absolute (data logger)", "T_mo", "={tmo}+273.15", "K")
bw.add("tmoK2", "Mash-out temperature, absolute (first draft)", "T_mo2", "={tmo}", "K",
       planted=("offset-scale", "a °C reading set equal to kelvins: the 273.15 missing"))
bw.add("dTmo", "Temperature rise to mash-out", "ΔT_mo", "={tmo}-{tm}", "K")
bw.add("Cm", "Heat capacity of the mash", "C_m", "={Vmw}*{rho80}*{cp}+{mg}*{cm}", "kJ/K")
bw.add("Qmo", "Heat to raise the mash to mash-out", "Q_mo", "={Cm}*{dTmo}", "kJ")
bw.add("tmot", "Time allowed for the rise to mash-out", "t_mo,t", 15, "min")
bw.add("Pmo", "Mash tun jacket duty", "P_mo", "={Qmo}/({tmot}*60)", "kW")
bw.add("msmo", "Steam to the mash tun jacket", "ṁ_mo", "={Pmo}*3600/{hfg}/({eff}/100)", "kg/h")
bw.add("msmo2", "Steam to the mash tun jacket (first draft)", "ṁ_mo2",
       "={Pmo}*3600/{hfg}/{eff}", "kg/h",
       planted=("unit-scale", "a % efficiency used as a fraction: 100 too small"))
bw.add("msmolb", "Steam to the mash tun jacket, lb/h (US boiler maker)", "ṁ_mo,US",
       "={msmo}*2.205", "lb/h")
bw.heading("Energy per brew")
bw.add("E", "Heat per brew, liquor and mash-out", "E", "={QkWh}+{Qmo}/3600", "kWh")
bw.add("Vw", "Cast-out wort per brew", "V_w", 30, "hL")
bw.add("e", "Heat per hectolitre of wort", "e", "={E}/{Vw}", "kWh/hL")
BRWS = bw.finish()

STEAM = {
    "A1": "Saturated steam by absolute pressure (IAPWS-IF97 steam tables, rounded, from memory; "
          "check against the tables before use)",
    "A2": "Sources: IAPWS-IF97 (from memory); °F = 1.8·°C + 32 (NIST SP 811 (2008)).",
    "A3": CAUTION,
    "A5": "Pressure [bar a]", "B5": "t_sat [°C]", "C5": "h_f [kJ/kg]", "D5": "h_fg [kJ/kg]",
    "E5": "h_g [kJ/kg]", "F5": "t_sat [°F]",
}
for r, (p, t, hf, hfg, hg) in enumerate([(2, 120.2, 504.7, 2201.6, 2706.3),
                                         (3, 133.5, 561.4, 2163.5, 2724.9),
                                         (4, 143.6, 604.7, 2133.4, 2738.1),
                                         (5, 151.8, 640.1, 2107.4, 2747.5),
                                         (6, 158.8, 670.4, 2085.8, 2756.2)], start=6):
    STEAM[f"A{r}"], STEAM[f"B{r}"], STEAM[f"C{r}"] = p, t, hf
    STEAM[f"D{r}"], STEAM[f"E{r}"] = hfg, hg
    STEAM[f"F{r}"] = f"=B{r}*1.8+32"
STEAM_PLANTED = {}

BRWB = {
    "trade": "brewing: hot liquor tank heat-up on steam and elements, strike and mash-out",
    "sheets": [("Brewhouse", BRWS), ("Steam", STEAM)],
    "planted": {**bw.planted, **STEAM_PLANTED},
}

BOOKS = {"crude-tank-brackwater": OILB, "brine-plant-kettle-ridge": BRNB,
         "pivot-hollins-draw": PIVB, "hot-liquor-fellgate": BRWB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()
