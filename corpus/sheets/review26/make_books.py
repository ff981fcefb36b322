#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review26), written with the
standard library only (corpus/sheets/xlsx_writer.py and item_sheet.py, shared by the review books).

Trades: a municipal pool's water treatment sheet; a cold storage warehouse's refrigeration
energy sheet; a road job's earthworks and haul sheet; an industrial boiler's stack emission sheet.
All scenarios, sites, readings and catalogue data are invented (demonstration only); the formulas
and published factors are the trade's own, with their sources named in a text cell at the top of
each sheet.

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

# --------------------------------------------------------------------------------------------
# Book 1: municipal pool water treatment (m³ and US gal, h, mg/L and lb/d, m/h and gpm/ft²)
# --------------------------------------------------------------------------------------------
POOL_SRC = (
    "Sources: turnover periods and maximum filtration rates by pool type, PWTAG 'Swimming Pool "
    "Water: Treatment and Quality Standards for Pools and Spas' (2017) (from memory); "
    "dilution 30 L per bather, PWTAG (2017) (from memory); chlorine feed kg/d = mg/L × m³/d / "
    "1000 (common practice); the 'pounds formula' lb/d = mg/L × MGD × 8.34 (AWWA Water "
    "Treatment Plant Operation, common practice); NIST SP 811 (2008) App. B.8 (1 m³ = 264.2 US "
    "gal; 1 m³/h = 4.403 gpm; 1 m² = 10.76 ft²; 1 m/h = 0.409 gpm/ft²; 1 kg = 2.205 lb); water "
    "c_p = 4.19 kJ/(kg·K) and 1000 kg/m³ (common practice). Sodium hypochlorite at 150 g/L "
    "available chlorine (supplier's sheet, invented). Pool sizes, bathers and readings invented.")
pool = ItemSheet("Pool", "Harwick Leisure Centre main pool: circulation, filtration and "
                 "chlorine dosing (invented scenario)", POOL_SRC)
pool.add("type", "Pool type", "type", "Competition")
pool.add("L", "Pool length", "L", 25, "m")
pool.add("W", "Pool width", "W", 12.5, "m")
pool.add("hs", "Depth, shallow end", "h_s", 1.0, "m")
pool.add("hd", "Depth, deep end", "h_d", 2.0, "m")
pool.add("hav", "Mean depth", "h_av", "=AVERAGE({hs},{hd})", "m")
pool.add("Vp", "Pool water volume", "V_p", "={L}*{W}*{hav}", "m³")
pool.add("Vbt", "Balance tank working volume", "V_bt", 28, "m³")
pool.add("V", "System water volume", "V", "={Vp}+{Vbt}", "m³")
pool.add("Vgal", "System water volume, US gal", "V_gal", "={V}*264.2", "gal")
pool.add("Vgal2", "System water volume, US gal (chemical supplier form)", "V_gal2",
         "={V}*3.785", "gal",
         planted=("unit-scale", "m³ to gal with the L-per-gal factor 3.785: should be ×264.2"))
pool.add("tt", "Turnover period", "t_t", "=VLOOKUP({type},Types!A5:C8,2,FALSE)", "h")
pool.add("Q", "Circulation rate", "Q", "={Vp}/{tt}", "m³/h")
pool.add("QLs", "Circulation rate, L/s", "Q_Ls", "={Q}/3.6", "L/s")
pool.add("Qgpm", "Circulation rate, gpm", "Q_gpm", "={Q}*4.403", "gpm")
pool.add("Qgpm2", "Circulation rate, gpm (pump enquiry)", "Q_gpm2", "={Q}/4.403", "gpm",
         planted=("unit-scale", "m³/h to gpm divided by 4.403: wrong way round"))
pool.add("At", "Total filter area", "A_f", "=Filters!C8", "m²")
pool.add("vf", "Filtration rate", "v_f", "={Q}/{At}", "m/h")
pool.add("vf2", "Filtration rate (from the L/s figure)", "v_f2", "={QLs}/{At}", "m/h",
         planted=("unit-scale", "L/s over m² without ×3.6 into m/h"))
pool.add("vmax", "Maximum filtration rate for this pool type", "v_max",
         "=VLOOKUP({type},Types!A5:C8,3,FALSE)", "m/h")
pool.add("vchk", "Filtration rate check", "check_v", "=IF({vf}<={vmax},\"OK\",\"TOO FAST\")")
pool.add("vfus", "Filtration rate, gpm/ft²", "v_f,US", "={vf}*0.409", "gpm/ft²")
pool.add("vfus2", "Filtration rate, gpm/ft² (from gpm and ft²)", "v_f,US2",
         "={Qgpm}/({At}*10.76)", "gpm/ft²")
pool.add("vbw", "Backwash rate", "v_bw", 30, "m/h")
pool.add("Qbw", "Backwash flow, one filter", "Q_bw", "={vbw}*Filters!C5", "m³/h")
pool.add("tbw", "Backwash duration", "t_bw", 5, "min")
pool.add("Vbw", "Backwash water per filter", "V_bw", "={Qbw}*{tbw}/60", "m³")
pool.add("Vbw2", "Backwash water, all filters (weekly sheet)", "V_bw2",
         "={Qbw}*{tbw}*Filters!B8", "m³",
         planted=("unit-scale", "m³/h × min without the /60: 60 too large"))
pool.add("nb", "Bathers per day (design)", "n_b", 650, "1/d")
pool.add("qd", "Dilution per bather", "q_d", 30, "L")
pool.add("Vmk", "Make-up water per day", "V_mk", "={nb}*{qd}/1000", "m³/d")
pool.add("Tp", "Pool water temperature", "T_p", 28, "°C")
pool.add("Tm", "Mains water temperature (winter)", "T_m", 8, "°C")
pool.add("cp", "Specific heat of water", "c_p", 4.19, "kJ/(kg·K)")
pool.add("Emk", "Heat to warm make-up water", "E_mk", "={Vmk}*1000*{cp}*({Tp}-{Tm})/3600",
         "kWh/d")
pool.add("Emk2", "Heat to warm make-up water (boiler sizing sheet)", "E_mk2",
         "={Vmk}*1000*{cp}*{Tp}/3600", "kWh/d",
         planted=("offset-scale", "pool temperature in °C used where the rise T_p − T_m belongs"))
pool.add("Cl", "Chlorine demand dose on the circulation", "c_Cl", 1.5, "mg/L")
pool.add("al", "Allowance for peak bather load", "a", 20, "%")
pool.add("Cld", "Design dose", "c_d", "={Cl}*(1+{al}/100)", "mg/L")
pool.add("Cld2", "Design dose (rev. A)", "c_d2", "={Cl}*(1+{al})", "mg/L",
         planted=("unit-scale", "20 % used as 20 in (1 + a)"))
pool.add("mCl", "Chlorine feed", "m_Cl", "={Cld}*{Q}*24/1000", "kg/d")
pool.add("mCl2", "Chlorine feed (first draft)", "m_Cl2", "={Cld}*{Q}*24", "kg/d",
         planted=("unit-scale", "mg/L × m³/d gives g/d, written as kg/d: 1000 too large"))
pool.add("mlb", "Chlorine feed, lb/d", "m_lb", "={mCl}*2.205", "lb/d")
pool.add("MGD", "Circulation, million US gal per day", "Q_MGD", "={Qgpm}*1440/10^6", "mgd")
pool.add("mlb2", "Chlorine feed, pounds formula", "m_lb2", "={Cld}*{MGD}*8.34", "lb/d")
pool.add("mlb3", "Chlorine feed, pounds formula (US contractor)", "m_lb3", "={Cld}*{Qgpm}*8.34",
         "lb/d", planted=("unit-scale", "pounds formula with gpm in place of MGD"))
pool.add("ch", "Hypochlorite strength, available chlorine", "c_h", 150, "g/L")
pool.add("Vh", "Hypochlorite used", "V_h", "={mCl}*1000/{ch}", "L/d")
POOL = pool.finish()

FILTERS = {
    "A1": "Harwick main pool: pressure sand filters (invented plant data)",
    "A2": ("Sources: area = π·D²/4; 1 m² = 10.76 ft² (NIST SP 811 (2008) App. B.8); filtration "
           "rate = flow / area (PWTAG 2017, from memory); flow shared equally between filters "
           "(common practice)."),
    "A3": CAUTION,
    "A4": "Filter", "B4": "Count [-]", "C4": "Area [m²]", "D4": "Area [ft²]",
    "E4": "Diameter [m]", "F4": "Flow [m³/h]", "G4": "Rate [m/h]",
    "A8": "Total / max", "B8": "=SUM(B5:B7)", "C8": "=SUM(C5:C7)", "D8": "=SUM(D5:D7)",
    "F8": "=SUM(F5:F7)", "G8": "=MAX(G5:G7)",
    "A10": "Area, all filters (summary)", "B10": "=SUM(C5:D7)", "C10": "m²",
}
Qref = pool.ref("Q")
for r, d in zip((5, 6, 7), (2.4, 2.4, 2.4)):
    FILTERS[f"A{r}"] = f"F{r - 4}"
    FILTERS[f"B{r}"] = 1
    FILTERS[f"E{r}"] = d
    FILTERS[f"C{r}"] = f"=PI()*E{r}^2/4"
    FILTERS[f"D{r}"] = f"=C{r}*10.76"
    FILTERS[f"F{r}"] = f"={Qref}/3"
    FILTERS[f"G{r}"] = f"=F{r}/C{r}"
FILTERS["D6"] = "=C6/10.76"    # planted: m² to ft² divided: wrong way round

TYPES = {
    "A1": "Turnover period and maximum filtration rate by pool type (from memory of PWTAG 2017; "
          "check the current edition)",
    "A3": CAUTION,
    "A4": "Pool type", "B4": "Turnover [h]", "C4": "Max filtration rate [m/h]",
}
for r, (t, h, v) in enumerate([("Competition", 3, 25), ("Leisure", 1.5, 25), ("Teaching", 1, 25),
                               ("Spa", 0.1, 25)], start=5):
    TYPES[f"A{r}"], TYPES[f"B{r}"], TYPES[f"C{r}"] = t, h, v

POOLBOOK = {
    "trade": "pool water treatment",
    "sheets": [("Pool", POOL), ("Filters", FILTERS), ("Types", TYPES)],
    "planted": {**pool.planted,
                "Filters!D6": ("unit-scale", "m² to ft² divided by 10.76: wrong way round"),
                "Filters!B10": ("mixed-range", "total area summed over the m² and ft² columns")},
}

# --------------------------------------------------------------------------------------------
# Book 2: cold storage warehouse refrigeration load and energy (kW and TR, COP and kW/TR)
# --------------------------------------------------------------------------------------------
COLD_SRC = (
    "Sources: refrigerated-facility load components (transmission Q = U·A·ΔT, product pull-down "
    "Q = m·c·ΔT, infiltration Q = V̇·ρ·Δh, internal loads), ASHRAE Handbook—Refrigeration (2018) "
    "ch. 24 (from memory); US infiltration check Q[Btu/h] = 4.5·cfm·Δh[Btu/lb] (4.5 = 60 min/h × "
    "0.075 lb/ft³): common practice; 18 h/d compressor run time and 10 % safety factor: common "
    "practice; NIST SP 811 (2008) App. B.8 (1 TR = 12 000 Btu/h = 3.517 kW; 1 m³/h = 0.5886 "
    "cfm; 1 kJ/kg = 0.4299 Btu/lb; 1 kW = 3412 Btu/h); COP = 3.517 / (kW/TR) (common practice). "
    "Plant efficiencies by system type (Plant sheet) from memory, check with the supplier. "
    "Sizes, door counts and loads invented.")
cs = ItemSheet("Loads", "Fenmoor Foods frozen store, chamber 2 (-22 °C): refrigeration load and "
               "annual energy (invented scenario)", COLD_SRC)
cs.add("L", "Chamber length", "L", 60, "m")
cs.add("W", "Chamber width", "W", 40, "m")
cs.add("H", "Clear height", "H", 11, "m")
cs.add("Af", "Floor area", "A_f", "={L}*{W}", "m²")
cs.add("Vr", "Chamber volume", "V_r", "={Af}*{H}", "m³")
cs.add("Tr", "Chamber temperature", "T_r", -22, "°C")
cs.add("Qtr", "Transmission load", "Q_tr", "=Surfaces!F10", "kW")
cs.add("Vinf", "Infiltration, door openings", "V_inf", "=Doors!E9", "m³/h")
cs.add("cfm", "Infiltration, cfm", "V_cfm", "={Vinf}*0.5886", "cfm")
cs.add("cfm2", "Infiltration, cfm (US insulated-door supplier)", "V_cfm2", "={Vinf}*35.31",
       "cfm", planted=("unit-scale", "m³/h × 35.31 gives ft³/h, written as cfm: 60 too large"))
cs.add("rho", "Density of outside air", "rho", 1.2, "kg/m³")
cs.add("dh", "Enthalpy difference, dock air to chamber air", "Δh", 48, "kJ/kg")
cs.add("Qinf", "Infiltration load", "Q_inf", "={Vinf}*{rho}*{dh}/3600", "kW")
cs.add("Qinf2", "Infiltration load (rev. A)", "Q_inf2", "={Vinf}*{rho}*{dh}", "kW",
       planted=("unit-scale", "m³/h × kg/m³ × kJ/kg without the /3600: 3600 too large"))
cs.add("dhus", "Enthalpy difference, Btu/lb", "Δh_US", "={dh}*0.4299", "Btu/lb")
cs.add("dhus2", "Enthalpy difference, Btu/lb (US check)", "Δh_US2", "={dh}*2.326", "Btu/lb",
       planted=("unit-scale", "kJ/kg to Btu/lb multiplied by 2.326: wrong way round"))
cs.add("Qinfus", "Infiltration load, US check", "Q_inf,US", "=4.5*{cfm}*{dhus}", "Btu/h")
cs.add("Qinftr", "Infiltration load, US check in TR", "Q_inf,TR", "={Qinfus}/12000", "TR")
cs.add("mp", "Product received per day", "m_p", 120, "t/d")
cs.add("cpp", "Specific heat of frozen product", "c_p", 1.8, "kJ/(kg·K)")
cs.add("Tin", "Product temperature on arrival", "T_in", -15, "°C")
cs.add("Qpr", "Product pull-down load", "Q_pr", "={mp}*1000*{cpp}*({Tin}-{Tr})/86400", "kW")
cs.add("Qpr2", "Product pull-down load (first draft)", "Q_pr2",
       "={mp}*{cpp}*({Tin}-{Tr})/86400", "kW",
       planted=("unit-scale", "t/d used as kg/d: 1000 too small"))
cs.add("LPD", "Lighting power density (LED high bay)", "LPD", 4, "W/m²")
cs.add("Qli", "Lighting", "Q_li", "={LPD}*{Af}", "W")
cs.add("np", "People in the chamber", "n_p", 6, "-")
cs.add("qp", "Heat per person at -22 °C", "q_p", 0.4, "kW")
cs.add("Qpe", "People", "Q_pe", "={np}*{qp}", "kW")
cs.add("Qft", "Forklift trucks (4 × 6 kW, 60 % duty)", "Q_ft", "=4*6*0.6", "kW")
cs.add("Qev", "Evaporator fans", "Q_ev", 28, "kW")
cs.add("Qsum", "Sum of loads", "Q_sum", "={Qtr}+{Qinf}+{Qpr}+{Qli}/1000+{Qpe}+{Qft}+{Qev}", "kW")
cs.add("Qsum2", "Sum of loads (summary page)", "Q_sum2",
       "={Qtr}+{Qinf}+{Qpr}+{Qli}+{Qpe}+{Qft}+{Qev}", "kW",
       planted=("unit-scale", "lighting in W added to loads in kW"))
cs.add("sf", "Safety factor", "sf", 10, "%")
cs.add("Qd", "Design load, 24 h basis", "Q_d", "={Qsum}*(1+{sf}/100)", "kW")
cs.add("trun", "Compressor run time", "t_run", 18, "h/d")
cs.add("Qc", "Plant capacity required", "Q_c", "={Qd}*24/{trun}", "kW")
cs.add("QTR", "Plant capacity required, TR", "Q_TR", "={Qc}/3.517", "TR")
cs.add("QTR2", "Plant capacity required, TR (tender form)", "Q_TR2", "={Qc}*3.517", "TR",
       planted=("unit-scale", "kW to TR multiplied by 3.517: wrong way round"))
cs.add("sys", "Plant type", "system", "Ammonia two-stage")
cs.add("kwtr", "Plant efficiency at design", "kW/TR", "=VLOOKUP({sys},Plant!A5:B8,2,FALSE)",
       "kW/TR")
cs.add("COP", "Coefficient of performance", "COP", "=3.517/{kwtr}", "-")
cs.add("Pc", "Compressor and condenser power", "P_c", "={QTR}*{kwtr}", "kW")
cs.add("COP2", "COP, check", "COP_2", "={Qc}/{Pc}", "-")
cs.add("Ea", "Annual energy", "E_a", "={Pc}*{trun}*365/1000", "MWh/yr")
cs.add("Ea2", "Annual energy (utility form)", "E_a2", "={Pc}*{trun}*365/1000", "kWh/yr",
       planted=("unit-scale", "MWh/yr formula written under kWh/yr: 1000 too small"))
LOADS = cs.finish()

SURF = {
    "A1": "Fenmoor chamber 2: transmission through the envelope (invented U values and areas)",
    "A2": ("Sources: Q = U·A·(t_out − t_room), ASHRAE Handbook—Refrigeration (2018) ch. 24 "
           "(from memory); ground under a heated floor taken at +10 °C (common practice)."),
    "A3": CAUTION,
    "A4": "Surface", "B4": "Area [m²]", "C4": "U [W/(m²·K)]", "D4": "Outside [°C]",
    "E4": "ΔT [K]", "F4": "Load [kW]",
    "A10": "Total", "B10": "=SUM(B5:B9)", "F10": "=SUM(F5:F9)",
}
Tr = cs.ref("Tr")
for r, (s, a, u, to) in enumerate([("Roof", "=" + cs.ref("Af"), 0.14, 30), ("Floor", "=" + cs.ref("Af"), 0.17, 10),
                                   ("Walls, north and east", 1100, 0.16, 25),
                                   ("Walls to dock (chilled +5 °C)", 660, 0.16, 5),
                                   ("Walls, south and west", 1100, 0.16, 30)], start=5):
    SURF[f"A{r}"], SURF[f"B{r}"], SURF[f"C{r}"], SURF[f"D{r}"] = s, a, u, to
    SURF[f"E{r}"] = f"=D{r}-{Tr}"
    SURF[f"F{r}"] = f"=B{r}*C{r}*E{r}/1000"
SURF["F7"] = "=B7*C7*D7/1000"   # planted: outside temperature in °C, not ΔT

DOORS = {
    "A1": "Fenmoor chamber 2: door openings and infiltration (invented door log)",
    "A2": ("Sources: mean infiltration = openings × open time × flow while open (ASHRAE Handbook—"
           "Refrigeration (2018) ch. 24, from memory; flow while open from the door supplier's "
           "test with strip curtain, invented)."),
    "A3": CAUTION,
    "A4": "Door", "B4": "Openings [1/d]", "C4": "Open time [s]", "D4": "Flow while open [m³/h]",
    "E4": "Mean infiltration [m³/h]",
    "A9": "Total", "B9": "=SUM(B5:B8)", "C9": "=AVERAGE(C5:C8)", "E9": "=SUM(E5:E8)",
}
for r, (d, n, t, q) in enumerate([("D1 dock", 180, 25, 5200), ("D2 dock", 160, 25, 5200),
                                  ("D3 dock", 140, 30, 5200), ("D4 personnel", 60, 8, 1800)],
                                 start=5):
    DOORS[f"A{r}"], DOORS[f"B{r}"], DOORS[f"C{r}"], DOORS[f"D{r}"] = d, n, t, q
    DOORS[f"E{r}"] = f"=B{r}*C{r}*D{r}/86400"

PLANT = {
    "A1": "Plant efficiency at -22 °C room, 35 °C condensing (from memory; check with supplier)",
    "A3": CAUTION,
    "A4": "Plant type", "B4": "Efficiency [kW/TR]",
}
for r, (t, k) in enumerate([("Ammonia two-stage", 1.9), ("Ammonia single-stage", 2.3),
                            ("CO2 transcritical", 2.4), ("HFC packaged", 2.8)], start=5):
    PLANT[f"A{r}"], PLANT[f"B{r}"] = t, k

COLDBOOK = {
    "trade": "cold storage refrigeration energy",
    "sheets": [("Loads", LOADS), ("Surfaces", SURF), ("Doors", DOORS), ("Plant", PLANT)],
    "planted": {**cs.planted,
                "Surfaces!F7": ("offset-scale", "U·A·t with the outside temperature in °C, "
                                "not the difference")},
}

# --------------------------------------------------------------------------------------------
# Book 3: road earthworks (m³ and yd³ bank and loose, swell %, t/m³ and lb/yd³, truck loads)
# --------------------------------------------------------------------------------------------
EARTH_SRC = (
    "Sources: average end area V = (A1 + A2)/2 · L; swell, loose = bank × (1 + swell) and "
    "shrinkage, bank needed = compacted / (1 − shrinkage), R. L. Peurifoy et al., Construction "
    "Planning, Equipment, and Methods 9th ed. (2018) ch. 4 (from memory); swell, shrinkage and "
    "bank densities by material (Materials sheet): from memory of the Caterpillar Performance "
    "Handbook tables, check against site tests; truck cycle = load + haul + dump + return, "
    "50-min hour (83 % job efficiency): common practice. NIST SP 811 (2008) App. B.8 (1 m³ = "
    "1.308 yd³; 1 t = 2205 lb = 1.102 short ton; 1 t/m³ = 1686 lb/yd³; 1 mi = 1.609 km). "
    "BCM, LCM, BCY and LCY are the trade's bank and loose cubic metres and yards (sidecar). "
    "Chainages, areas and fleet invented.")
hl = ItemSheet("Haul", "A47 Bellstone bypass, cut 3 to fill 4: earthworks balance and haul "
               "(invented scenario)", EARTH_SRC)
hl.add("mat", "Material in cut 3", "material", "Common earth")
hl.add("Vb", "Cut volume, bank", "V_b", "=Sections!E11", "BCM")
hl.add("Vbcy", "Cut volume, bank cubic yards", "V_BCY", "={Vb}*1.308", "BCY")
hl.add("Vbcy2", "Cut volume, BCY (US subcontractor)", "V_BCY2", "={Vb}*0.7646", "BCY",
       planted=("unit-scale", "m³ to yd³ multiplied by 0.7646: wrong way round"))
hl.add("sw", "Swell", "s", "=VLOOKUP({mat},Materials!A5:D8,2,FALSE)", "%")
hl.add("Vl", "Cut volume, loose", "V_l", "={Vb}*(1+{sw}/100)", "LCM")
hl.add("Vl2", "Cut volume, loose (rev. A)", "V_l2", "={Vb}*(1+{sw})", "LCM",
       planted=("unit-scale", "swell in % used as a fraction: (1 + 25)"))
hl.add("Vlcy", "Cut volume, loose cubic yards", "V_LCY", "={Vl}*1.308", "LCY")
hl.add("Vlcy2", "Cut volume, LCY (from BCY)", "V_LCY2", "={Vbcy}*(1+{sw}/100)*1.308", "LCY",
       planted=("unit-scale", "BCY already in yd³ converted again: 1.308 too large"))
hl.add("rb", "Bank density", "rho_b", "=VLOOKUP({mat},Materials!A5:D8,3,FALSE)", "t/m³")
hl.add("rl", "Loose density", "rho_l", "={rb}/(1+{sw}/100)", "t/m³")
hl.add("rbus", "Bank density, lb/yd³", "rho_b,US", "={rb}*1686", "lb/yd³")
hl.add("rbus2", "Bank density, lb/yd³ (spec sheet)", "rho_b,US2", "={rb}*2205", "lb/yd³",
       planted=("unit-scale", "t/m³ × 2205 gives lb/m³: the /1.308 m³-to-yd³ step missing"))
hl.add("M", "Mass to move", "M", "={Vb}*{rb}", "t")
hl.add("Mton", "Mass to move, short tons", "M_ton", "={M}*1.102", "ton")
hl.add("Mton2", "Mass to move, short tons (US form)", "M_ton2", "={M}*2205", "ton",
       planted=("unit-scale", "tonnes × 2205 gives lb, written as short tons"))
hl.add("M2", "Mass to move (from the US density)", "M_2", "={Vbcy}*{rbus}/2205", "t")
hl.add("Vf", "Fill 4, compacted volume", "V_f", "=Sections!F11", "m³")
hl.add("sh", "Shrinkage", "sh", "=VLOOKUP({mat},Materials!A5:D8,4,FALSE)", "%")
hl.add("Vbf", "Bank volume needed for fill 4", "V_bf", "={Vf}/(1-{sh}/100)", "BCM")
hl.add("bal", "Balance, cut less fill need (+ = surplus)", "bal", "={Vb}-{Vbf}", "BCM")
hl.add("cap", "Truck heaped capacity", "cap", 14, "LCM")
hl.add("pay", "Truck rated payload", "pay", 28, "t")
hl.add("ld", "Load per truck, loose", "load_l", "=MIN({cap},{pay}/{rl})", "LCM")
hl.add("ldb", "Load per truck, bank", "load_b", "={ld}/(1+{sw}/100)", "BCM")
hl.add("trips", "Truck loads to move cut 3", "n_loads", "=ROUNDUP({Vb}/{ldb},0)", "-")
hl.add("tl", "Load time (excavator, 5 passes)", "t_l", 3.5, "min")
hl.add("dh", "Haul distance, one way", "d_h", 2.8, "km")
hl.add("dhmi", "Haul distance, mi", "d_h,mi", "={dh}/1.609", "mi")
hl.add("vl", "Speed loaded", "v_l", 25, "km/h")
hl.add("ve", "Speed empty", "v_e", 35, "km/h")
hl.add("th", "Haul time", "t_h", "={dh}/{vl}*60", "min")
hl.add("tr", "Return time", "t_r", "={dh}/{ve}", "min",
       planted=("unit-scale", "km over km/h gives h, written as min: the ×60 missing"))
hl.add("td", "Dump and manoeuvre", "t_d", 1.5, "min")
hl.add("tcy", "Truck cycle time", "t_cy", "=SUM({tl},{th},{tr},{td})", "min")
hl.add("eff", "Job efficiency (50-min hour)", "E", 83, "%")
hl.add("Pt", "Production per truck", "P_t", "=60/{tcy}*{ldb}*{eff}/100", "BCM/h")
hl.add("Pt2", "Production per truck (site diary)", "P_t2", "=60/{tcy}*{ld}*{eff}/100", "BCM/h",
       planted=("unit-scale", "loose load per truck (LCM) counted as bank production: 25 % high"))
hl.add("Pe", "Excavator production", "P_e", 420, "BCM/h")
hl.add("nt", "Trucks to keep the excavator busy", "n_t", "=ROUNDUP({Pe}/{Pt},0)", "-")
hl.add("hd", "Working hours per day", "h_d", 10, "h/d")
hl.add("days", "Days to move cut 3", "days", "={Vb}/(MIN({Pe},{nt}*{Pt})*{hd})", "d")
HAUL = hl.finish()

SECT = {
    "A1": "A47 Bellstone bypass, ch. 3+200 to 3+800: cross-section areas (invented survey)",
    "A2": ("Sources: average end area method, V = (A1 + A2)/2 × L (Peurifoy et al. 9th ed. (2018) "
           "ch. 4, from memory); 1 m³ = 1.308 yd³ (NIST SP 811 (2008) App. B.8). Cut volumes are "
           "bank, fill volumes compacted."),
    "A3": CAUTION,
    "A4": "Chainage [m]", "B4": "Cut area [m²]", "C4": "Fill area [m²]", "D4": "Length [m]",
    "E4": "Cut volume [BCM]", "F4": "Fill volume [m³]", "G4": "Cut volume [BCY]",
    "A11": "Total", "D11": "=SUM(D6:D10)", "E11": "=SUM(E6:E10)", "F11": "=SUM(F6:F10)",
    "G11": "=SUM(G6:G10)",
    "A13": "Cut, both columns (quick total)", "B13": "=SUM(E6:G10)", "C13": "BCM",
    "A14": "Largest cut area", "B14": "=MAX(B5:B10)", "C14": "m²",
}
rows = [(3200, 42.0, 0.0), (3320, 58.5, 0.0), (3440, 61.2, 3.5), (3560, 37.8, 12.4),
        (3680, 9.6, 38.2), (3800, 0.0, 51.7)]
for i, (ch, ac, af) in enumerate(rows):
    r = 5 + i
    SECT[f"A{r}"], SECT[f"B{r}"], SECT[f"C{r}"] = ch, ac, af
    if i:
        SECT[f"D{r}"] = f"=A{r}-A{r - 1}"
        SECT[f"E{r}"] = f"=(B{r - 1}+B{r})/2*D{r}"
        SECT[f"F{r}"] = f"=(C{r - 1}+C{r})/2*D{r}"
        SECT[f"G{r}"] = f"=E{r}*1.308"

MATS = {
    "A1": "Swell, bank density and shrinkage by material (from memory of the Caterpillar "
          "Performance Handbook tables; replace with site test results)",
    "A3": CAUTION,
    "A4": "Material", "B4": "Swell [%]", "C4": "Bank density [t/m³]", "D4": "Shrinkage [%]",
}
for r, (m, s, d, k) in enumerate([("Clay, dry", 40, 1.85, 10), ("Common earth", 25, 1.90, 10),
                                  ("Sand and gravel", 12, 2.00, 8), ("Rock, blasted", 65, 2.60, -30)],
                                 start=5):
    MATS[f"A{r}"], MATS[f"B{r}"], MATS[f"C{r}"], MATS[f"D{r}"] = m, s, d, k

EARTHBOOK = {
    "trade": "road earthworks",
    "sheets": [("Haul", HAUL), ("Sections", SECT), ("Materials", MATS)],
    "sidecar": ("# Invented scenario. A dimensionally consistent formula can still be wrong; this\n"
                "# check does not replace independent review under local codes and licensed practice.\n"
                "# A47 Bellstone bypass: the trade's bank and loose volume units (Peurifoy et al.,\n"
                "# 9th ed. (2018) ch. 4). Bank and loose are states of the same material, not\n"
                "# different units of volume, so they are declared as plain m³ and yd³.\n"
                "measure BCM = 1 m3 \"bank cubic metre\"\n"
                "measure LCM = 1 m3 \"loose cubic metre\"\n"
                "measure BCY = 1 yd3 \"bank cubic yard\"\n"
                "measure LCY = 1 yd3 \"loose cubic yard\"\n"),
    "planted": {**hl.planted,
                "Sections!B13": ("mixed-range", "cut total over the BCM and BCY columns together")},
}

# --------------------------------------------------------------------------------------------
# Book 4: industrial boiler stack emissions (ppm and mg/Nm³ at 3 % O2, Nm³/h and scfm, kg/h, lb/h)
# --------------------------------------------------------------------------------------------
STACK_SRC = (
    "Sources: O2 correction C_ref = C_m·(20.9 − O2_ref)/(20.9 − O2_m), 40 CFR Part 60 App. A "
    "Method 19 and EN 14792 practice (from memory); reference 3 % O2 for gas-fired boilers, "
    "Directive (EU) 2015/2193 (MCPD) Annex II (from memory); ppm to mg/Nm³ = ppm × M / V_m, "
    "V_m = 22.414 L/mol at 0 °C and 101.325 kPa (CODATA 2018 molar gas constant, from memory); "
    "NOx as NO2, M = 46.01 g/mol (IUPAC atomic weights, from memory); the trade's quick factor "
    "2.05 mg/Nm³ per ppm NO2 (common practice); lb/h = ppm × M × scfm × 60 / (379.5 × 10⁶), "
    "379.5 scf/lbmol at 60 °F and 14.696 psia (GPSA Engineering Data Book 13th ed., from "
    "memory); Method 19 NOx factor 1.194 × 10⁻⁷ lb/scf per ppm and F_d = 8710 dscf/MMBtu for "
    "natural gas (40 CFR 60 App. A Method 19 Tables 19-1 and 19-2, from memory); 1 Nm³ = 37.33 "
    "scf (0 °C vs 60 °F, ideal gas with NIST SP 811 (2008) App. B.8 ft³); 1 kg = 2.205 lb; 1 MW "
    "= 3.412 MMBtu/h (NIST SP 811). Actual flow V = V_n·(T/273.15)·(101.325/p) (ideal gas, "
    "common practice). Fuel, stack test readings and permit limit invented.")
sk = ItemSheet("Stack", "Ormsby Paper Mill boiler B2 (natural gas, 18 MW): NOx stack test "
               "summary (invented scenario)", STACK_SRC)
sk.add("Vfuel", "Fuel gas flow", "V_fuel", 1850, "Nm³/h")
sk.add("Hv", "Fuel gross calorific value", "H_v", 39.8, "MJ/Nm³")
sk.add("Pin", "Heat input", "P_in", "={Vfuel}*{Hv}/3600", "MW")
sk.add("Pin2", "Heat input (permit form)", "P_in2", "={Vfuel}*{Hv}", "MW",
       planted=("unit-scale", "Nm³/h × MJ/Nm³ gives MJ/h, written as MW: 3600 too large"))
sk.add("Pmm", "Heat input, MMBtu/h", "P_MMBtu", "={Pin}*3.412", "MMBtu/h")
sk.add("Vw", "Flue gas flow, wet (average of runs)", "V_w", "=Runs!D9", "Nm³/h")
sk.add("xw", "Flue gas moisture", "x_w", 17.5, "%")
sk.add("Vd", "Flue gas flow, dry", "V_d", "={Vw}*(1-{xw}/100)", "Nm³/h")
sk.add("Vd2", "Flue gas flow, dry (rev. A)", "V_d2", "={Vw}*(1-{xw})", "Nm³/h",
       planted=("unit-scale", "17.5 % moisture used as 17.5 in (1 − x)"))
sk.add("scfm", "Flue gas flow, dry, scfm", "V_scfm", "={Vd}*37.33/60", "scfm")
sk.add("scfm2", "Flue gas flow, dry, scfm (US parent's form)", "V_scfm2", "={Vd}*35.31/60",
       "scfm", planted=("unit-scale", "Nm³ (0 °C) to scf (60 °F) with the volume factor alone: "
                        "5.4 % low"))
sk.add("Ts", "Stack gas temperature", "T_s", 165, "°C")
sk.add("pb", "Barometric pressure (test day)", "p_b", 99.6, "kPa")
sk.add("ps", "Stack static pressure", "p_s", -1.2, "mbar g")
sk.add("pa", "Stack absolute pressure", "p_a", "={pb}+{ps}/10", "kPa")
sk.add("pa2", "Stack absolute pressure (first draft)", "p_a2", "={pb}+{ps}", "kPa",
       planted=("unit-scale", "static pressure in mbar added to kPa without the /10"))
sk.add("Va", "Flue gas flow at stack conditions", "V_a",
       "={Vw}*({Ts}+273.15)/273.15*101.325/{pa}", "m³/h")
sk.add("Va2", "Flue gas flow at stack conditions (fan check)", "V_a2",
       "={Vw}*{Ts}/273.15*101.325/{pa}", "m³/h",
       planted=("offset-scale", "stack temperature in °C where the absolute K belongs"))
sk.add("Ds", "Stack internal diameter", "D_s", 1.1, "m")
sk.add("vs", "Stack exit velocity", "v_s", "={Va}/3600/(PI()*{Ds}^2/4)", "m/s")
sk.add("ppm", "NOx, dry, as measured (average of runs)", "c_ppm", "=Runs!B9", "ppm")
sk.add("O2", "O2, dry, as measured (average of runs)", "O2", "=Runs!C9", "%")
sk.add("O2r", "Reference O2", "O2_ref", 3, "%")
sk.add("ppm3", "NOx at 3 % O2", "c_ppm,3", "={ppm}*(20.9-{O2r})/(20.9-{O2})", "ppm")
sk.add("M", "Molar mass of NO2", "M", 46.01, "g/mol")
sk.add("Vm", "Molar volume at 0 °C, 101.325 kPa", "V_m", 22.414, "L/mol")
sk.add("c3", "NOx at 3 % O2, mg/Nm³", "c_3", "={ppm3}*{M}/{Vm}", "mg/Nm³")
sk.add("c3q", "NOx at 3 % O2, mg/Nm³ (quick factor)", "c_3q", "={ppm3}*2.05", "mg/Nm³")
sk.add("lim", "Permit limit at 3 % O2", "c_lim", 100, "mg/Nm³")
sk.add("chk", "Compliance", "check", "=IF({c3}<={lim},\"COMPLIES\",\"EXCEEDS\")")
sk.add("cm", "NOx as measured, mg/Nm³", "c_m", "={ppm}*{M}/{Vm}", "mg/Nm³")
sk.add("mk", "NOx mass rate", "m_NOx", "={cm}*{Vd}/10^6", "kg/h")
sk.add("mk2", "NOx mass rate (from the 3 % figure)", "m_NOx2", "={c3}*{Vd}", "kg/h",
       planted=("unit-scale", "mg/Nm³ × Nm³/h gives mg/h, written as kg/h: 10⁶ too large"))
sk.add("mlb", "NOx mass rate, lb/h", "m_lb", "={mk}*2.205", "lb/h")
sk.add("mlb2", "NOx mass rate, lb/h (US parent's form)", "m_lb2", "={mk}/2.205", "lb/h",
       planted=("unit-scale", "kg/h to lb/h divided by 2.205: wrong way round"))
sk.add("Mus", "Molar mass of NO2, US", "M_US", 46.01, "lb/lbmol")
sk.add("Vmus", "Molar volume at 60 °F, 14.696 psia", "V_m,US", 379.5, "scf/lbmol")
sk.add("mlb3", "NOx mass rate, lb/h (from ppm and scfm)", "m_lb3",
       "={ppm}*{Mus}*{scfm}*60/({Vmus}*10^6)", "lb/h")
sk.add("EF", "NOx emission rate on heat input", "E_h", "={mlb}/{Pmm}", "lb/MMBtu")
sk.add("Fd", "F factor, dry, natural gas", "F_d", 8710, "scf/MMBtu")
sk.add("EF19", "NOx emission rate, Method 19", "E_19", "={ppm}*1.194E-7*{Fd}*20.9/(20.9-{O2})",
       "lb/MMBtu")
sk.add("hy", "Operating hours per year", "t_a", 7800, "h/yr")
sk.add("ma", "Annual NOx", "m_a", "={mk}*{hy}/1000", "t/yr")
STACK = sk.finish()

RUNS = {
    "A1": "Ormsby boiler B2: stack test runs (invented readings, dry basis)",
    "A2": ("Sources: as the Stack sheet; each run corrected to 3 % O2 with C_ref = C_m·(20.9 − 3)"
           "/(20.9 − O2_m) (40 CFR 60 App. A Method 19, from memory) and converted with M/V_m = "
           "46.01/22.414 (from memory)."),
    "A3": CAUTION,
    "A4": "Run", "B4": "NOx [ppm]", "C4": "O2 [%]", "D4": "Flue flow, wet [Nm³/h]",
    "E4": "NOx at 3 % O2 [ppm]", "F4": "NOx at 3 % O2 [mg/Nm³]", "G4": "NOx [kg/h]",
    "A9": "Average", "B9": "=AVERAGE(B5:B8)", "C9": "=AVERAGE(C5:C8)", "D9": "=AVERAGE(D5:D8)",
    "E9": "=AVERAGE(E5:E8)", "F9": "=AVERAGE(F5:F8)", "G9": "=AVERAGE(G5:G8)",
    "A10": "Highest", "F10": "=MAX(F5:F8)",
    "A11": "Average NOx, both columns (report table)", "B11": "=AVERAGE(E5:F8)", "C11": "mg/Nm³",
}
M, Vm, xw = sk.ref("M"), sk.ref("Vm"), sk.ref("xw")
for r, (n, c, o, q) in enumerate([(1, 41.5, 3.9, 21900), (2, 43.8, 4.1, 22300),
                                  (3, 40.2, 3.8, 21700), (4, 42.6, 4.0, 22100)], start=5):
    RUNS[f"A{r}"], RUNS[f"B{r}"], RUNS[f"C{r}"], RUNS[f"D{r}"] = n, c, o, q
    RUNS[f"E{r}"] = f"=B{r}*(20.9-3)/(20.9-C{r})"
    RUNS[f"F{r}"] = f"=E{r}*{M}/{Vm}"
    RUNS[f"G{r}"] = f"=B{r}*{M}/{Vm}*D{r}*(1-{xw}/100)/10^6"

STACKBOOK = {
    "trade": "boiler stack emissions",
    "sheets": [("Stack", STACK), ("Runs", RUNS)],
    "planted": {**sk.planted,
                "Runs!B11": ("mixed-range", "average over the ppm and mg/Nm³ columns together")},
}

BOOKS = {"pool-treatment": POOLBOOK, "cold-store": COLDBOOK, "earthworks": EARTHBOOK,
         "stack-emissions": STACKBOOK}

EXTRA = {}
MISSED = {}
RENAMED = {}
try:
    from review_notes import EXTRA, MISSED, RENAMED  # noqa: F401,F811
except ImportError:
    pass


def main():
    write_books(HERE, BOOKS, {"EXTRA": EXTRA, "MISSED": MISSED, "RENAMED": RENAMED})


if __name__ == "__main__":
    main()
