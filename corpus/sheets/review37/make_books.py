#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review37), written with the
standard library only (corpus/sheets/xlsx_writer.py and item_sheet.py, shared by the review
books), adapted from corpus/sheets/review19/make_books.py.

Trades: a compressed-air audit; a wet-pipe sprinkler hydraulic calculation; a stormwater
detention pond stage-storage-discharge sheet; a chilled water plant efficiency check. All
scenarios, sites, readings and catalogue data are invented (demonstration only); the formulas
and published factors are the trade's own, with their sources named in a text cell at the top of
each sheet.

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. The findings plumb makes beyond the planted ones, and the planted cells it
misses, are recorded with their reasons in review_notes.py (EXTRA, MISSED, RENAMED, MESSAGES)
after running the binary of the day.

Run: python3 make_books.py  ->  *.xlsx, *.expect (where absent; --expect rewrites them) in this
folder
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
# Book 1: compressed-air audit (cfm, scfm, m³/min; psig, psia, bar g; kW, W, hp; $/kWh)
# --------------------------------------------------------------------------------------------
AIR_SRC = (
    "Sources: US DOE / Compressed Air Challenge, 'Improving Compressed Air System Performance: A "
    "Sourcebook for Industry' (2003 ed.), fact sheets on leaks and pressure (from memory): "
    "load/unload test, leakage % = T·100/(T + t); pressure-decay test, leakage (cfm free air) = "
    "V·(P1 − P2)/(T·14.7)·1.25 with V in ft³, P in psig and T in minutes; leak table at 100 psig "
    "(Orifice sheet) scaled by absolute pressure, times 0.61 for a sharp-edged orifice; rule of "
    "thumb, 1 % of compressor power per 2 psi of discharge pressure; leak cost = cfm × kW/cfm × "
    "h/yr × $/kWh. Adiabatic compression work ∝ (p2/p1)^((k−1)/k) − 1, k = 1.4 for air, and "
    "choked flow through a leak ∝ absolute upstream pressure: Y. A. Çengel & M. A. Boles, "
    "Thermodynamics: An Engineering Approach 9th ed. (2019) ch. 7 and ch. 17. Standard air 14.7 "
    "psia and 68 °F (527.67 °R) for scfm: common practice (CAGI). NIST SP 811 (2008) App. B.8: "
    "1 hp = 0.7457 kW (0.746; 1.341 hp/kW); 1 m³ = 35.31 ft³; 1 ft³ = 7.481 US gal; 1 bar = "
    "14.50 psi; T/°R = t/°F + 459.67. Plant data, logger readings, leak tags and tariff "
    "invented.")
au = ItemSheet("Audit", "Brackenholt Castings, compressor house C-1: compressed-air audit "
               "(invented scenario)", AIR_SRC)
au.heading("Compressor C-1: 100 hp lubricated rotary screw, load/unload control")
au.add("hp", "Motor nameplate rating", "P_mot", 100, "hp")
au.add("etam", "Motor full-load efficiency (nameplate)", "eta_m", 95.0, "%")
au.add("FAD", "Rated free air delivery at 125 psig (data sheet)", "Q_FAD", 470, "cfm")
au.add("FADm", "Rated free air delivery, metric", "Q_FAD,m", "={FAD}/35.31", "m³/min")
au.add("FADh", "Rated free air delivery, for the dryer selection", "Q_FAD,h", "={FAD}/35.31",
       "m³/h", planted=("unit-scale", "cfm ÷ 35.31 gives m³/min, written as m³/h: 60 too small"))
au.add("Tin", "Intake air temperature, summer design", "t_in", 95, "°F")
au.add("prat", "Rated discharge pressure", "p_rat", 125, "psig")
au.add("pop", "Operating discharge pressure (logger mean)", "p_op", 112, "psig")
au.add("popb", "Operating discharge pressure, metric", "p_op,b", "={pop}/14.5", "bar g")
au.add("pin", "Inlet pressure (site near sea level)", "p_in", 14.7, "psia")
au.add("FADs", "Rated delivery at standard air (14.7 psia, 68 °F), summer intake", "Q_s",
       "={FAD}*{pin}/14.7*(68+459.67)/({Tin}+459.67)", "scfm")
au.add("ratio", "Compression ratio at operating pressure", "r_p", "=({pop}+14.7)/{pin}", "-")
au.add("Pcalc", "Input power at full load, from the nameplate", "P_fl,calc",
       "={hp}*0.746/({etam}/100)", "kW")
au.add("Pfl", "Input power loaded (power logger, 7-day mean)", "P_fl", 84.6, "kW")
au.add("Pflhp", "Input power loaded, hp", "P_fl,hp", "={Pfl}*1.341", "hp")
au.add("Punl", "Input power unloaded (power logger)", "P_unl", 26.1, "kW")
au.add("unl", "Unloaded power, share of loaded", "f_unl", "={Punl}/{Pfl}*100", "%")
au.add("SP", "Specific power at full load", "SP", "={Pfl}/{FAD}*100", "kW/100 cfm")
au.add("Pdry", "Refrigerated dryer D-1, input (nameplate)", "P_dry", 3700, "W")
au.add("Psys", "Compressor and dryer input, loaded", "P_sys", "={Pfl}+{Pdry}", "kW",
       planted=("unit-scale", "dryer input in W added to the compressor's kW"))
au.heading("Leak tests, production stopped (Sunday 14:00, end uses valved off)")
au.add("Tl", "Loaded time per cycle (mean of 5 cycles)", "T", 38, "s")
au.add("Tu", "Unloaded time per cycle (mean of 5 cycles)", "t", 57, "s")
au.add("leakpc", "Leakage, load/unload method", "L_pc", "={Tl}/({Tl}+{Tu})*100", "%")
au.add("leak1", "Leak flow, load/unload method", "Q_L1", "={leakpc}/100*{FAD}", "cfm")
au.add("Vr", "Receiver volume (nameplate)", "V_r", 1060, "US gal")
au.add("Vp", "Header and distribution pipework volume (pipe schedule)", "V_p", 58, "ft³")
au.add("V", "System volume under test", "V", "={Vr}*7.481+{Vp}", "ft³",
       planted=("unit-scale", "US gal to ft³ multiplied by 7.481: wrong way round"))
au.add("p1", "Pressure at the start of the decay", "p_1", 110, "psig")
au.add("p2", "Pressure at the end of the decay", "p_2", 90, "psig")
au.add("td", "Decay time (logger)", "t_d", 105, "s")
au.add("leak2", "Leak flow, pressure-decay method (at system pressure)", "Q_L2",
       "={V}*({p1}-{p2})/({td}*14.7)*1.25", "cfm",
       planted=("unit-scale", "decay time logged in s put into the formula that wants minutes: "
                "60 too small"))
au.add("leak", "Leak flow, mean of the two tests", "Q_L", "=AVERAGE({leak1},{leak2})", "cfm")
au.add("leakm", "Leak flow, metric", "Q_L,m", "={leak}/35.31", "m³/min")
au.add("leakfad", "Leak flow, share of rated delivery", "f_L", "={leak}/{FAD}*100", "%")
au.add("Cd", "Discharge coefficient for the tagged leaks (sharp-edged, conservative)", "C_d",
       0.61, "-")
au.heading("Running cost")
au.add("hrs", "Operating hours (three shifts, 48 weeks)", "t_op", 6240, "h/yr")
au.add("ld", "Loaded share of operating hours (logger)", "f_ld", 68, "%")
au.add("rate", "Electricity rate, blended (current contract)", "c_e", 0.121, "$/kWh")
au.add("E", "Annual energy, compressor", "E", "=({Pfl}*{ld}+{Punl}*(1-{ld}))*{hrs}", "kWh/yr",
       planted=("unit-scale", "loaded share in % used as a fraction, in (1 − share) as well"))
au.add("EMWh", "Annual energy, compressor", "E_MWh", "={E}/1000", "MWh/yr")
au.add("cost", "Annual running cost, compressor", "C", "={E}*{rate}", "$/yr")
au.add("leakcost", "Annual cost of leakage", "C_L", "={leak}*{SP}/100*{hrs}*{rate}", "$/yr")
au.add("survey", "Leak flow found by the tag survey (Leaks sheet)", "Q_tag", "=SUM(Leaks!E5:F10)",
       "cfm", planted=("mixed-range", "total over the cfm and m³/min columns together"))
au.add("surveycost", "Annual cost of the tagged leaks", "C_tag", "=Leaks!G11", "$/yr")
au.add("found", "Share of the measured leakage found by the survey", "f_tag",
       "={survey}/{leak}*100", "%")
au.heading("Pressure reduction (proposed, after the header loop is closed)")
au.add("pnew", "Proposed discharge pressure", "p_new", 100, "psig")
au.add("srule", "Power saving, rule of thumb (1 % per 2 psi)", "s_rule", "=({pop}-{pnew})/2", "%")
au.add("sadb", "Power saving, adiabatic compression", "s_ad",
       "=(1-((({pnew}+14.7)/{pin})^0.2857-1)/((({pop}+14.7)/{pin})^0.2857-1))*100", "%")
au.add("sE", "Annual energy saving", "dE", "={Pfl}*{ld}/100*{sadb}/100*{hrs}", "kWh/yr")
au.add("sC", "Annual cost saving", "dC", "={sE}*{rate}", "$/yr")
au.add("art", "Leak flow saved by the lower pressure (artificial demand)", "dQ_L",
       "={leak}*(1-({pnew}+14.7)/({pop}+14.7))", "cfm")
AUDIT = au.finish()

A = au.ref
LEAKS = {
    "A1": "Brackenholt Castings: ultrasonic leak survey, tags raised (invented survey)",
    "A2": ("Sources: as the Audit sheet: leak flow = table flow at 100 psig × (p + 14.7)/(100 + "
           "14.7) × C_d (DOE Sourcebook (2003 ed.) leak table, from memory; choked flow ∝ "
           "absolute pressure, Çengel & Boles 9th ed. ch. 17); 1 m³ = 35.31 ft³ (NIST SP 811 "
           "(2008) App. B.8); cost = cfm × kW/100 cfm ÷ 100 × h/yr × $/kWh. Repair priority "
           "above $2000/yr: site practice."),
    "A3": CAUTION,
    "A4": "Tag", "B4": "Location", "C4": "Equivalent orifice", "D4": "Line pressure [psig]",
    "E4": "Leak flow [cfm]", "F4": "Leak flow [m³/min]", "G4": "Annual cost [$/yr]",
    "H4": "Action",
    "A11": "Total", "E11": "=SUM(E5:E10)", "F11": "=SUM(F5:F10)", "G11": "=SUM(G5:G10)",
}
for r, (tag, where, orif, p) in enumerate([
        ("L-01", "Fettling shop, drop 4 quick coupling", "1/16 in", 98),
        ("L-02", "Core shop, FRL auto-drain stuck open", "1/8 in", 104),
        ("L-03", "Shot blast, hose reel swivel", "1/8 in", 101),
        ("L-04", "Moulding line 2, cylinder rod seal", "1/32 in", 96),
        ("L-05", "Bay 3 header, flange gasket", "1/16 in", 108),
        ("L-06", "Ladle preheat, blow-off valve left open", "1/4 in", 99)], start=5):
    LEAKS[f"A{r}"], LEAKS[f"B{r}"], LEAKS[f"C{r}"], LEAKS[f"D{r}"] = tag, where, orif, p
    LEAKS[f"E{r}"] = (f"=VLOOKUP(C{r},Orifice!$A$5:$C$10,3,FALSE)*(D{r}+14.7)/(100+14.7)"
                      f"*{A('Cd')}")
    LEAKS[f"F{r}"] = f"=E{r}/35.31"
    LEAKS[f"G{r}"] = f"=E{r}*{A('SP')}/100*{A('hrs')}*{A('rate')}"
    LEAKS[f"H{r}"] = f"=IF(G{r}>=2000,\"Repair this week\",\"Next planned shutdown\")"
LEAKS["E7"] = f"=VLOOKUP(C7,Orifice!$A$5:$C$10,3,FALSE)*D7/100*{A('Cd')}"     # planted
LEAKS["F8"] = "=E8*35.31"                                                      # planted
LEAKS["G9"] = f"=E9*{A('SP')}*{A('hrs')}*{A('rate')}"                          # planted

ORIFICE = {
    "A1": ("Leak flow through an equivalent orifice at 100 psig, discharge coefficient 1 (from "
           "memory of the DOE Sourcebook (2003 ed.) leak table; check before use)"),
    "A2": CAUTION,
    "A4": "Orifice", "B4": "Diameter [in]", "C4": "Leak flow at 100 psig [cfm]",
}
for r, (o, d, q) in enumerate([("1/64 in", 0.0156, 0.406), ("1/32 in", 0.0313, 1.62),
                               ("1/16 in", 0.0625, 6.49), ("1/8 in", 0.125, 26.0),
                               ("1/4 in", 0.25, 104), ("3/8 in", 0.375, 234)], start=5):
    ORIFICE[f"A{r}"], ORIFICE[f"B{r}"], ORIFICE[f"C{r}"] = o, d, q

AIR = {
    "trade": "compressed air: compressor and leak audit",
    "sheets": [("Audit", AUDIT), ("Leaks", LEAKS), ("Orifice", ORIFICE)],
    "planted": {**au.planted,
                "Leaks!E7": ("offset-scale", "leak table scaled by the gauge pressure over 100 "
                             "psig: the ratio wants absolute pressures (p + 14.7)/(100 + 14.7)"),
                "Leaks!F8": ("unit-scale", "cfm to m³/min multiplied by 35.31: wrong way round"),
                "Leaks!G9": ("unit-scale", "specific power in kW/100 cfm used as kW/cfm: 100 "
                             "too large")},
}

# --------------------------------------------------------------------------------------------
# Book 2: wet-pipe sprinkler hydraulic calculation (gpm, L/min; psi, bar; K-factors; H-W)
# --------------------------------------------------------------------------------------------
SPR_SRC = (
    "Sources: NFPA 13 (2022 ed.), density/area method: design density and area, hose stream "
    "allowance and duration by hazard (Hazard sheet), 30 % area increase for dry pipe, 7 psi "
    "minimum at a sprinkler (from memory of ch. 19 and ch. 28); q = K·√p; Hazen–Williams p = "
    "4.52·Q^1.85/(C^1.85·d^4.87) psi/ft (Q in gpm, d in in) and its SI form p = 6.05×10^5·"
    "Q^1.85/(C^1.85·d^4.87) bar/m (Q in L/min, d in mm), NFPA 13 (2022) ch. 28 (from memory); "
    "C = 120 for black steel, wet pipe (same, from memory); elevation 0.433 psi/ft and ρ·g·h "
    "(common practice); water supply curve p = p_s − (p_s − p_r)·(Q/Q_r)^1.85 (common practice, "
    "N^1.85 graph paper); pipe bores ASME B36.10M schedule 40 and 10 (from memory). NIST SP 811 "
    "(2008) App. B.8: 1 US gal = 3.785 L; 1 bar = 14.50 psi; 1 ft = 0.3048 m (3.281 ft/m); 1 in "
    "= 25.4 mm; K_SI = 14.4·K_US (L/min/bar^0.5 from gpm/psi^0.5). Branch lines 2 and 3 are "
    "taken as hydraulically identical to line 1 at the cross-main pressure (a simplification). "
    "Layout and flow test invented.")
de = ItemSheet("Design", "Harrowgate Mill distribution warehouse, bay B: wet-pipe sprinkler "
               "hydraulic calculation, most remote area (invented scenario)", SPR_SRC)
de.heading("Design basis")
de.add("haz", "Occupancy hazard classification", "class", "OH2")
de.add("dens", "Design density", "D", "=VLOOKUP({haz},Hazard!A5:E9,2,FALSE)", "gpm/ft²")
de.add("area", "Design area of operation", "A_d", "=VLOOKUP({haz},Hazard!A5:E9,3,FALSE)", "ft²")
de.add("hose", "Hose stream allowance (inside and outside)", "Q_h",
       "=VLOOKUP({haz},Hazard!A5:E9,4,FALSE)", "gpm")
de.add("dur", "Water supply duration", "t_d", "=VLOOKUP({haz},Hazard!A5:E9,5,FALSE)", "min")
de.add("inc", "Area increase for a dry-pipe system", "f_dry", 30, "%")
de.add("adry", "Design area if the bay is converted to dry pipe (insurer's query)", "A_dry",
       "={area}*(1+{inc})", "ft²",
       planted=("unit-scale", "30 % used as 30 in (1 + increase)"))
de.add("As", "Coverage per sprinkler (10 ft × 13 ft)", "A_s", 130, "ft²")
de.add("n", "Sprinklers in the design area", "n", "=ROUNDUP({area}/{As},0)", "-")
de.add("K", "Sprinkler K-factor (standard spray upright)", "K", 5.6, "gpm/psi^0.5")
de.add("KSI", "Sprinkler K-factor, metric", "K_SI", "={K}*14.4", "L/min/bar^0.5")
de.add("qmin", "Minimum flow at a sprinkler", "q_min", "={dens}*{As}", "gpm")
de.add("pmin", "Pressure for the minimum flow", "p_q", "=({qmin}/{K})^2", "psi")
de.add("p1", "End-sprinkler pressure (not below 7 psi)", "p_1", "=MAX({pmin},7)", "psi")
de.add("p1bar", "End-sprinkler pressure, metric", "p_1,bar", "={p1}/14.5", "bar")
de.heading("Riser and water supply")
de.add("QTOR", "Flow at the top of the riser", "Q_TOR", "=Nodes!D10", "gpm")
de.add("PTOR", "Pressure at the top of the riser", "p_TOR", "=Nodes!M10+Nodes!K10", "psi")
de.add("C", "Hazen–Williams C (black steel, wet pipe)", "C", 120, "-")
de.add("dr", "Riser bore (4 in schedule 10)", "d_r", 4.260, "in")
de.add("Lr", "Riser length (top of riser to base of riser)", "L_r", 26, "ft")
de.add("Lrf", "Riser fittings, equivalent length (alarm valve, gate valve, elbow)", "L_rf", 32,
       "ft")
de.add("pfr", "Friction loss per foot, riser", "p_f,r", "=4.52*{QTOR}^1.85/({C}^1.85*{dr}^4.87)",
       "psi/ft")
de.add("dpr", "Friction loss, riser", "dp_f,r", "={pfr}*({Lr}+{Lrf})", "psi")
de.add("z", "Elevation of the branch lines above the base of the riser", "z", 26, "ft")
de.add("pel", "Elevation pressure, riser", "p_e", "=0.433*{z}", "psi")
de.add("PBOR", "Pressure required at the base of the riser", "p_BOR", "={PTOR}+{dpr}+{pel}",
       "psi")
de.add("Qtot", "Total demand with hose allowance", "Q_tot", "={QTOR}+{hose}", "gpm")
de.add("ps", "Static pressure (flow test at hydrant H-4)", "p_s", 72, "psi")
de.add("pr", "Residual pressure (flow test report, water authority)", "p_r", 3.7, "bar")
de.add("Qr", "Flow during the test", "Q_r", 1100, "gpm")
de.add("pav", "Pressure available at the total demand", "p_av",
       "={ps}-({ps}-{pr})*({Qtot}/{Qr})^1.85", "psi",
       planted=("unit-scale", "residual pressure in bar subtracted from a static pressure in psi"))
de.add("marg", "Safety margin", "dp_m", "={pav}-{PBOR}", "psi")
de.add("chk", "Supply check (10 psi margin)", "check", "=IF({marg}>=10,\"OK\",\"Supply short\")")
de.heading("Summary for the insurer (metric)")
de.add("QL", "Total demand with hose allowance, metric", "Q_tot,L", "={Qtot}/3.785", "L/min",
       planted=("unit-scale", "gpm to L/min divided by 3.785: wrong way round"))
de.add("PBORb", "Pressure required at the base of the riser, metric", "p_BOR,bar",
       "={PBOR}/14.5", "bar")
de.add("zm", "Elevation of the branch lines, metric", "z_m", "={z}*0.3048", "m")
de.add("pst", "Static head of the riser, metric", "p_e,bar", "=1000*{zm}/100000", "bar",
       planted=("result-unit", "ρ·h/10⁵ with g left out of ρ·g·h"))
de.add("vol", "Water for the required duration", "V", "={Qtot}*{dur}*60", "US gal",
       planted=("unit-scale", "gpm × min already gives gal: the × 60 is not needed"))
de.add("volm", "Water for the required duration, metric", "V_m", "={vol}*3.785", "m³",
       planted=("unit-scale", "gal × 3.785 gives L, written as m³: 1000 too large"))
de.add("pfb", "Friction loss per metre, end branch pipe (SI Hazen–Williams check)", "p_f,SI",
       "=6.05*10^5*(Nodes!D6*3.785)^1.85/(Nodes!I6^1.85*(Nodes!F6*25.4)^4.87)", "bar/m")
de.add("pfp", "Friction loss per foot, end branch pipe (SI check)", "p_f,US", "={pfb}*14.5*3.281",
       "psi/ft", planted=("unit-scale", "per metre to per foot multiplied by 3.281: wrong way "
                          "round (10.8 too large)"))
DESIGN = de.finish()

D = de.ref
NODES = {
    "A1": "Harrowgate Mill bay B: node-by-node calculation, branch line 1 and cross main",
    "A2": ("Sources: as the Design sheet: q = K·√p at each sprinkler; Hazen–Williams p_f = 4.52·"
           "Q^1.85/(C^1.85·d^4.87) psi/ft; friction = p_f × (pipe + fitting equivalent length); "
           "the pressure at a node is the pressure at the node before plus friction and "
           "elevation; branch-line K = Q/√p at the cross main (common practice). Fitting "
           "equivalent lengths from memory of NFPA 13 (2022) ch. 28 (tee 8 ft at 1-1/2 in, 15 ft "
           "at 3 in)."),
    "A3": CAUTION,
    "A5": "Node", "B5": "K [gpm/psi^0.5]", "C5": "q [gpm]", "D5": "Q [gpm]",
    "E5": "Pipe (nominal)", "F5": "d [in]", "G5": "L [ft]", "H5": "Fittings [ft]", "I5": "C [-]",
    "J5": "Pf [psi/ft]", "K5": "Friction [psi]", "L5": "Elevation [psi]", "M5": "Pt [psi]",
}
rows = [("1 (end sprinkler)", 5.6, "1 in", 1.049, 10, 0),
        ("2", 5.6, "1 in", 1.049, 10, 0),
        ("3", 5.6, "1-1/4 in", 1.380, 10, 0),
        ("4", 5.6, "1-1/2 in", 1.610, 6.5, 8),
        ("CM (branch lines 2 and 3 join)", None, "3 in", 3.068, 30, 15)]
for r, (node, k, size, d, length, fit) in enumerate(rows, start=6):
    NODES[f"A{r}"] = node
    if k is not None:
        NODES[f"B{r}"] = k
        NODES[f"C{r}"] = f"=B{r}*SQRT(M{r})"
    NODES[f"D{r}"] = f"=D{r - 1}+C{r}" if r > 6 else "=C6"
    NODES[f"E{r}"], NODES[f"F{r}"], NODES[f"G{r}"], NODES[f"H{r}"] = size, d, length, fit
    NODES[f"I{r}"] = 120
    NODES[f"J{r}"] = f"=4.52*D{r}^1.85/(I{r}^1.85*F{r}^4.87)"
    NODES[f"K{r}"] = f"=J{r}*(G{r}+H{r})"
    NODES[f"L{r}"] = 0
    NODES[f"M{r}"] = f"=M{r - 1}+K{r - 1}+L{r - 1}" if r > 6 else f"={D('p1')}"
NODES["B10"] = "=D9/SQRT(M10)"          # the branch line's K at the cross main
NODES["C10"] = "=2*B10*SQRT(M10)"       # two more branch lines like it
NODES["C8"] = "=B8*M8"                  # planted: square root forgotten

HAZARD = {
    "A1": ("Density/area design basis and water supply by hazard (from memory of NFPA 13 (2022 "
           "ed.) ch. 19: the 1500 ft² and 2500 ft² points of the curves; hose allowance and "
           "duration; check before use)"),
    "A2": CAUTION,
    "A4": "Class", "B4": "Density [gpm/ft²]", "C4": "Area [ft²]", "D4": "Hose [gpm]",
    "E4": "Duration [min]",
}
for r, row in enumerate([("LH", 0.10, 1500, 100, 30), ("OH1", 0.15, 1500, 250, 60),
                         ("OH2", 0.20, 1500, 250, 60), ("EH1", 0.30, 2500, 500, 90),
                         ("EH2", 0.40, 2500, 500, 120)], start=5):
    for c, v in zip("ABCDE", row):
        HAZARD[f"{c}{r}"] = v

SPRINKLER = {
    "trade": "fire protection: wet-pipe sprinkler hydraulic calculation",
    "sheets": [("Design", DESIGN), ("Nodes", NODES), ("Hazard", HAZARD)],
    "planted": {**de.planted,
                "Nodes!C8": ("result-unit", "q = K·p with the square root of p forgotten")},
}

# --------------------------------------------------------------------------------------------
# Book 3: stormwater detention pond stage-storage-discharge (ft, m; acre-ft, m³; cfs, m³/s)
# --------------------------------------------------------------------------------------------
POND_SRC = (
    "Sources: rational method Q = C·i·A (cfs from acre·in/h, the 1.008 neglected) and composite "
    "C weighted by impervious share, FHWA HEC-22 'Urban Drainage Design Manual' 3rd ed. (2009) "
    "ch. 3, with C = 0.95 impervious and 0.25 lawns on clay (same, from memory); orifice Q = "
    "C_d·A·√(2·g·h), C_d = 0.61, head to the centroid, and sharp-crested weir Q = C_w·L·H^1.5, "
    "C_w = 3.33 ft^0.5/s, HEC-22 (2009) ch. 8 (from memory); broad-crested spillway C = 1.70 "
    "m^0.5/s, USBR 'Design of Small Dams' 3rd ed. (1987) ch. 9 (from memory); average-end-area "
    "storage, HEC-22 (2009) ch. 8; storage first estimate from triangular hydrographs, V = ½·"
    "(Q_post − Q_pre)·2·T_c: common practice, from memory (the routing model governs); g = 32.2 "
    "ft/s²; 1 ft freeboard: common practice (county rules vary). NIST SP 811 (2008) App. B.8: 1 "
    "ft = 0.3048 m (3.281 ft/m); 1 acre = 43 560 ft²; 1 acre-ft = 1233.5 m³; 1 cfs = 0.02832 "
    "m³/s (35.31 cfs per m³/s). Site, grading areas and routing result invented.")
po = ItemSheet("Pond", "Coldwell Business Park, detention pond DP-1: stage-storage-discharge and "
               "100-year check (invented scenario)", POND_SRC)
po.heading("Catchment and peak inflow (rational method, 100-year)")
po.add("A", "Drainage area", "A", 42.5, "acre")
po.add("Ci", "Runoff coefficient, impervious", "C_imp", 0.95, "-")
po.add("Cp", "Runoff coefficient, pervious (lawns, clay soil)", "C_perv", 0.25, "-")
po.add("Ipre", "Impervious share, before development", "I_pre", 2, "%")
po.add("Ipost", "Impervious share, after development", "I_post", 68, "%")
po.add("Cpre", "Composite runoff coefficient, before", "C_pre",
       "={Ci}*{Ipre}/100+{Cp}*(1-{Ipre}/100)", "-")
po.add("Cpost", "Composite runoff coefficient, after", "C_post",
       "={Ci}*{Ipost}+{Cp}*(1-{Ipost})", "-",
       planted=("unit-scale", "impervious share in % used as a fraction"))
po.add("Tc", "Time of concentration, after development", "T_c", 20, "min")
po.add("i", "Rainfall intensity, 100-year, 20 min (county IDF curve)", "i", 5.8, "in/h")
po.add("Qpre", "Peak flow before development (allowable release)", "Q_pre", "={Cpre}*{i}*{A}",
       "cfs")
po.add("Qpost", "Peak inflow after development", "Q_post", "={Cpost}*{i}*{A}", "cfs")
po.add("Qpostm", "Peak inflow after development, metric", "Q_post,m", "={Qpost}*0.02832", "m³/s")
po.add("Vreq", "Storage, first estimate (triangular hydrographs, base 2·Tc)", "V_est",
       "=0.5*({Qpost}-{Qpre})*2*{Tc}*3600/43560", "acre-ft",
       planted=("unit-scale", "Tc in minutes multiplied by 3600 s/h: 60 too large"))
po.add("Vreqm", "Storage, first estimate, metric", "V_est,m", "={Vreq}*1233.5", "m³")
po.heading("Outlet structure: 18 in orifice and rectangular overflow weir")
po.add("inv", "Orifice invert (pond bottom, stage datum)", "z_inv", 100.0, "ft")
po.add("Do", "Orifice diameter", "D_o", 18, "in")
po.add("Cd", "Orifice discharge coefficient", "C_d", 0.61, "-")
po.add("Ao", "Orifice area", "A_o", "=PI()*({Do}/12)^2/4", "ft²")
po.add("zc", "Orifice centroid", "z_c", "={inv}+{Do}/24", "ft")
po.add("crest", "Weir crest", "z_w", 104.5, "ft")
po.add("Lw", "Weir length", "L_w", 10, "ft")
po.add("Cw", "Weir coefficient (sharp-crested, US units)", "C_w", 3.33, "ft^0.5/s")
po.add("top", "Top of embankment", "z_top", 107.0, "ft")
po.add("hw", "Peak stage, 100-year (routing model run R-7)", "z_100", 105.6, "ft")
po.add("Qo", "Orifice flow at the peak stage", "Q_o", "={Cd}*{Ao}*SQRT(2*32.2*({hw}-{zc}))",
       "cfs")
po.add("Qw", "Weir flow at the peak stage", "Q_w", "={Cw}*{Lw}*({hw}-{crest})^1.5", "cfs")
po.add("Qout", "Peak outflow", "Q_out", "={Qo}+{Qw}", "cfs")
po.add("Qoutm", "Peak outflow, metric", "Q_out,m", "={Qout}/35.31", "m³/s")
po.add("chkQ", "Release check", "check_Q",
       "=IF({Qout}<={Qpre},\"OK\",\"Reduce the orifice\")")
po.add("Qmax", "Highest outflow in the rating table", "Q_max", "=MAX(Stage!H5:I9)", "cfs",
       planted=("mixed-range", "maximum over the cfs and m³/s columns together"))
po.add("fb", "Freeboard at the 100-year stage", "f_b", "={top}-{hw}", "ft")
po.add("fbm", "Freeboard, metric", "f_b,m", "={fb}*0.3048", "m")
po.add("chkfb", "Freeboard check (1 ft)", "check_fb", "=IF({fb}>=1,\"OK\",\"Raise the bank\")")
po.add("Vtop", "Storage at the top of the embankment", "V_top", "=Stage!D9", "acre-ft")
po.add("chkV", "Storage check", "check_V", "=IF({Vtop}>={Vreq},\"OK\",\"Enlarge the pond\")")
po.heading("Emergency spillway (county SI form)")
po.add("Ls", "Spillway crest length (metric detail S-2)", "L_s", 8.0, "m")
po.add("zs", "Spillway crest", "z_s", 106.0, "ft")
po.add("Cs", "Broad-crested weir coefficient, SI", "C_s", 1.70, "m^0.5/s")
po.add("Qs", "Spillway capacity with water at the top of the embankment", "Q_s",
       "={Cs}*{Ls}*({top}-{zs})^1.5", "m³/s",
       planted=("unit-scale", "SI weir formula with the head in ft (crest length in m)"))
po.add("Qscfs", "Spillway capacity, cfs", "Q_s,cfs", "={Qs}*35.31", "cfs")
POND = po.finish()

P = po.ref
STAGE = {
    "A1": "Coldwell Business Park DP-1: stage-storage-discharge table (invented grading areas)",
    "A2": ("Sources: as the Pond sheet: storage by average end areas, ΔV = (A1 + A2)/2·Δh, "
           "43 560 ft² per acre; 1233.5 m³ per acre-ft; orifice C_d·A·√(2·32.2·h) above the "
           "centroid; weir C_w·L·H^1.5 above the crest; 0.02832 m³/s per cfs; 3.281 ft/m (NIST "
           "SP 811 (2008) App. B.8; HEC-22 3rd ed. (2009) ch. 8, from memory)."),
    "A3": CAUTION,
    "A4": "Stage [ft]", "B4": "Stage [m]", "C4": "Area [ft²]", "D4": "Storage [acre-ft]",
    "E4": "Storage [m³]", "F4": "Orifice [cfs]", "G4": "Weir [cfs]", "H4": "Outflow [cfs]",
    "I4": "Outflow [m³/s]",
}
for r, (stage, area) in enumerate([(100.0, 28000), (102.0, 36500), (104.5, 47800),
                                   (105.5, 52600), (107.0, 60200)], start=5):
    STAGE[f"A{r}"], STAGE[f"C{r}"] = stage, area
    STAGE[f"B{r}"] = f"=A{r}/3.281"
    STAGE[f"D{r}"] = (f"=D{r - 1}+(C{r - 1}+C{r})/2*(A{r}-A{r - 1})/43560" if r > 5 else 0)
    STAGE[f"E{r}"] = f"=D{r}*1233.5"
    STAGE[f"F{r}"] = (f"=IF(A{r}>{P('zc')},{P('Cd')}*{P('Ao')}*SQRT(2*32.2*(A{r}-{P('zc')})),0)")
    STAGE[f"G{r}"] = f"=IF(A{r}>{P('crest')},{P('Cw')}*{P('Lw')}*(A{r}-{P('crest')})^1.5,0)"
    STAGE[f"H{r}"] = f"=F{r}+G{r}"
    STAGE[f"I{r}"] = f"=H{r}*0.02832"
STAGE["B6"] = "=A6*3.281"                                          # planted
STAGE["D7"] = "=D6+(C6+C7)/2*(A7-A6)"                               # planted
STAGE["E8"] = "=D8*43560"                                          # planted
STAGE["F7"] = f"=IF(A7>{P('zc')},{P('Cd')}*{P('Ao')}*SQRT(2*(A7-{P('zc')})),0)"   # planted

STORM = {
    "trade": "stormwater: detention pond stage-storage-discharge",
    "sheets": [("Pond", POND), ("Stage", STAGE)],
    "planted": {**po.planted,
                "Stage!B6": ("unit-scale", "ft to m multiplied by 3.281: wrong way round"),
                "Stage!D7": ("unit-scale", "average-end-area volume in ft³ added to acre-ft: "
                             "the ÷ 43 560 is missing"),
                "Stage!E8": ("unit-scale", "acre-ft × 43 560 gives ft³, written as m³: 35.3 too "
                             "large"),
                "Stage!F7": ("result-unit", "orifice √(2·h) with g left out")},
}

# --------------------------------------------------------------------------------------------
# Book 4: chilled water plant efficiency (kW/TR, COP; gpm, L/s; °F, °C; TR from flow and ΔT)
# --------------------------------------------------------------------------------------------
CHW_SRC = (
    "Sources: load from flow and ΔT, TR = gpm·ΔT/24 (500 Btu/(h·gpm·°F) over 12 000 Btu/h per "
    "TR) and Q = 4.19·q·ΔT kW (q in L/s, ΔT in K): common practice; 1 TR = 12 000 Btu/h = 3.517 "
    "kW, COP = 3.517/(kW/TR), EER = 12/(kW/TR): NIST SP 811 (2008) App. B.8 and common "
    "practice; chiller ratings to AHRI Standard 550/590; ASHRAE 90.1-2019 Table 6.8.1-3, "
    "water-cooled centrifugal full-load limits, path A (from memory; check the edition the "
    "authority adopts); pump brake power hp = gpm·ft/(3960·η): common practice (Hydraulic "
    "Institute); Carnot COP = T_ev/(T_cd − T_ev) in kelvins, Y. A. Çengel & M. A. Boles, "
    "Thermodynamics: An Engineering Approach 9th ed. (2019) ch. 6; heat rejected = cooling + "
    "compressor input, condenser flow gpm = Btu/h/(500·range): common practice; expansion tank "
    "V_t = V_e/(1 − P_1/P_2) with absolute pressures, ASHRAE Handbook—HVAC Systems and "
    "Equipment (2020) ch. 13 (from memory); water's expansion 40 °F to 95 °F from steam-table "
    "specific volumes (from memory). NIST SP 811 (2008) App. B.8: 1 kW = 3412 Btu/h; 1 gpm = "
    "0.0631 L/s; 1 hp = 0.746 kW; t/°C = (t/°F − 32)/1.8; 1 K = 1.8 °F; standard atmosphere "
    "14.7 psia. Plant readings, chiller data and tariff invented.")
pl = ItemSheet("Plant", "Ashdown campus central plant: chilled water plant efficiency check, "
               "design day (invented scenario)", CHW_SRC)
pl.heading("Chiller CH-2 (water-cooled centrifugal), design point")
pl.add("ch", "Chiller", "tag", "CH-2")
pl.add("TRr", "Rated capacity", "Q_r", "=VLOOKUP({ch},Chillers!A5:E8,2,FALSE)", "TR")
pl.add("kWTRr", "Rated efficiency, full load (AHRI 550/590)", "eta_r",
       "=VLOOKUP({ch},Chillers!A5:E8,3,FALSE)", "kW/TR")
pl.add("gpmr", "Rated evaporator flow", "Q_w,r", "=VLOOKUP({ch},Chillers!A5:E8,4,FALSE)", "gpm")
pl.add("chws", "Chilled water supply", "t_s", 44, "°F")
pl.add("chwr", "Chilled water return", "t_r", 56, "°F")
pl.add("dT", "Chilled water ΔT", "ΔT", "={chwr}-{chws}", "°F")
pl.add("gpm", "Design evaporator flow", "Q_w", "={TRr}*24/{dT}", "gpm")
pl.add("Ls", "Design evaporator flow, metric", "Q_w,SI", "={gpm}*0.0631", "L/s")
pl.add("chwsC", "Chilled water supply, metric", "t_s,C", "=({chws}-32)/1.8", "°C")
pl.add("chwrC", "Chilled water return, metric", "t_r,C", "=({chwr}-32)*1.8", "°C",
       planted=("unit-scale", "°F to °C multiplied by 1.8: wrong way round"))
pl.add("dTK", "Chilled water ΔT, metric", "ΔT_K", "={dT}/1.8", "K")
pl.add("qkW", "Cooling capacity from flow and ΔT, metric", "Q_kW", "=4.19*{Ls}*{dTK}", "kW")
pl.add("qTR", "Cooling capacity from flow and ΔT (check on the rating)", "Q_TR", "={qkW}/3.517",
       "TR")
pl.add("Pch", "Chiller input power at design", "P_ch", "={TRr}*{kWTRr}", "kW")
pl.add("COP", "Coefficient of performance at design", "COP", "={kWTRr}/3.517", "-",
       planted=("unit-scale", "COP = kW/TR ÷ 3.517: inverted, it is 3.517 ÷ kW/TR"))
pl.add("EER", "Energy efficiency ratio at design", "EER", "=12/{kWTRr}", "Btu/Wh")
pl.add("lim", "ASHRAE 90.1 full-load limit for this size (path A)", "eta_lim",
       "=VLOOKUP({ch},Chillers!A5:E8,5,FALSE)", "kW/TR")
pl.add("chk", "Full-load efficiency check", "check",
       "=IF({kWTRr}<={lim},\"Complies\",\"Does not comply\")")
pl.heading("Chiller lift (Carnot check)")
pl.add("Tev", "Saturated evaporating temperature (chiller panel)", "t_ev", 3.3, "°C")
pl.add("Tcd", "Saturated condensing temperature (chiller panel)", "t_cd", 37.8, "°C")
pl.add("COPc", "Carnot COP at this lift", "COP_C", "={Tev}/({Tcd}-{Tev})", "-",
       planted=("offset-scale", "evaporating temperature in °C where Carnot wants kelvins"))
pl.add("fC", "Chiller COP as a share of Carnot", "eta_C", "={COP}/{COPc}*100", "%")
pl.heading("Pumps, tower and plant total")
pl.add("H", "Chilled water pump head (design)", "H_p", 85, "ft")
pl.add("etap", "Pump efficiency at duty", "eta_p", 78, "%")
pl.add("etamo", "Motor efficiency", "eta_mo", 93.6, "%")
pl.add("bhp", "Chilled water pump brake power", "P_bhp", "={gpm}*{H}/(3960*{etap})", "hp",
       planted=("unit-scale", "pump efficiency in % used as a fraction: 100 too small"))
pl.add("Ppump", "Chilled water pump input", "P_p", "={bhp}*0.746/({etamo}/100)", "kW")
pl.add("Pcwp", "Condenser water pump input (logger)", "P_cwp", 28.5, "kW")
pl.add("Pfan", "Cooling tower fan (motor nameplate, full speed)", "P_fan", 30, "hp")
pl.add("Pplant", "Plant input power at design", "P_plant", "={Pch}+{Ppump}+{Pcwp}+{Pfan}", "kW",
       planted=("unit-scale", "tower fan in hp added to kW"))
pl.add("kWTRp", "Plant efficiency at design", "eta_plant", "={Pplant}/{TRr}", "kW/TR")
pl.add("rng", "Condenser water ΔT (tower range)", "R", 10, "°F")
pl.add("Qrej", "Heat rejected at the condenser", "Q_rej", "={TRr}*3.517+{Pch}", "kW")
pl.add("gpmc", "Condenser water flow", "Q_cw", "={Qrej}*3412/(500*{rng})", "gpm")
pl.heading("Expansion tank (closed chilled water loop)")
pl.add("Vs", "System water volume (pipe schedule)", "V_s", 6800, "US gal")
pl.add("ex", "Net expansion, 40 °F fill to 95 °F plant-room ambient", "e", 0.6, "%")
pl.add("Vex", "Expanded volume", "V_ex", "={Vs}*{ex}/100", "US gal")
pl.add("P1", "Initial (fill) pressure at the tank", "p_1", 12, "psig")
pl.add("P2", "Maximum operating pressure at the tank", "p_2", 40, "psig")
pl.add("af", "Acceptance factor", "f_a", "=1-{P1}/{P2}", "-",
       planted=("offset-scale", "gauge pressures in the ratio that wants absolute"))
pl.add("Vt", "Expansion tank total volume", "V_t", "={Vex}/{af}", "US gal")
pl.heading("Design-day log (Log sheet)")
pl.add("avgTR", "Mean load, 4-hourly readings", "Q_avg", "=AVERAGE(Log!G5:G9)", "TR")
pl.add("avgkW", "Mean chiller efficiency", "eta_avg", "=AVERAGE(Log!I5:I9)", "kW/TR")
pl.add("peak", "Peak chilled water flow", "Q_pk", "=MAX(Log!E5:F9)", "gpm",
       planted=("mixed-range", "maximum over the gpm and L/s columns together"))
pl.add("TRh", "Cooling delivered, day", "E_c", "={avgTR}*24", "TR·h")
pl.add("kWh", "Chiller energy, day", "E_ch", "={TRh}*{avgkW}", "kWh")
pl.add("rate", "Electricity rate", "c_e", 0.094, "$/kWh")
pl.add("cost", "Chiller energy cost, day", "C", "={kWh}*{rate}", "$")
PLANT = pl.finish()

LOG = {
    "A1": "Ashdown central plant: CH-2 design-day readings, 4-hourly (invented BMS trend)",
    "A2": ("Sources: as the Plant sheet: ΔT = return − supply; TR = gpm·ΔT/24; 0.0631 L/s per "
           "gpm; kW/TR = kW ÷ TR; COP = 3.517 ÷ kW/TR (NIST SP 811 (2008) App. B.8; common "
           "practice)."),
    "A3": CAUTION,
    "A4": "Time", "B4": "CHWS [°F]", "C4": "CHWR [°F]", "D4": "ΔT [°F]", "E4": "Flow [gpm]",
    "F4": "Flow [L/s]", "G4": "Load [TR]", "H4": "Chiller [kW]", "I4": "Efficiency [kW/TR]",
    "J4": "COP [-]",
}
for r, (t, s, ret, q, kw) in enumerate([("04:00", 44.1, 52.0, 1020, 196),
                                        ("08:00", 44.0, 53.8, 1020, 236),
                                        ("12:00", 44.2, 55.6, 1020, 268),
                                        ("16:00", 44.3, 56.1, 1020, 279),
                                        ("20:00", 44.1, 54.0, 1020, 240)], start=5):
    LOG[f"A{r}"], LOG[f"B{r}"], LOG[f"C{r}"], LOG[f"E{r}"], LOG[f"H{r}"] = t, s, ret, q, kw
    LOG[f"D{r}"] = f"=C{r}-B{r}"
    LOG[f"F{r}"] = f"=E{r}*0.0631"
    LOG[f"G{r}"] = f"=E{r}*D{r}/24"
    LOG[f"I{r}"] = f"=H{r}/G{r}"
    LOG[f"J{r}"] = f"=3.517/I{r}"
LOG["F6"] = "=E6*3.785"            # planted: gpm × 3.785 gives L/min
LOG["G8"] = "=500*E8*D8"           # planted: Btu/h written as TR

CHILLERS = {
    "A1": ("Chillers: rated capacity, full-load efficiency and evaporator flow (invented "
           "submittal data); ASHRAE 90.1-2019 path A full-load limit for the size (from memory)"),
    "A2": CAUTION,
    "A4": "Chiller", "B4": "Capacity [TR]", "C4": "Efficiency [kW/TR]",
    "D4": "Evaporator flow [gpm]", "E4": "90.1 limit [kW/TR]",
}
for r, row in enumerate([("CH-1", 550, 0.552, 1100, 0.576), ("CH-2", 550, 0.548, 1100, 0.576),
                         ("CH-3", 275, 0.598, 550, 0.634), ("CH-4", 200, 0.661, 400, 0.634)],
                        start=5):
    for c, v in zip("ABCDE", row):
        CHILLERS[f"{c}{r}"] = v

CHW = {
    "trade": "HVAC: chilled water plant efficiency",
    "sheets": [("Plant", PLANT), ("Log", LOG), ("Chillers", CHILLERS)],
    "planted": {**pl.planted,
                "Log!F6": ("unit-scale", "gpm × 3.785 gives L/min, column is L/s: 60 too large"),
                "Log!G8": ("unit-scale", "500·gpm·ΔT gives Btu/h, written as TR: 12 000 too "
                           "large")},
}

BOOKS = {"air-audit": AIR, "sprinkler-nodes": SPRINKLER, "pond-stage-storage": STORM,
         "chw-plant": CHW}

EXTRA = {}    # stem -> list of (comment, "Sheet!Cell rule")
MISSED = {}   # stem -> {"Sheet!Cell": "why"}
RENAMED = {}  # stem -> {"Sheet!Cell": rule plumb names, or (rule, why)}
MESSAGES = {}  # stem -> {"Sheet!Cell": "what plumb's message on it says, where it misleads"}
try:
    from review_notes import EXTRA, MISSED, RENAMED, MESSAGES  # noqa: F401,F811
except ImportError:
    pass


def main():
    write_books(HERE, BOOKS, {"EXTRA": EXTRA, "MISSED": MISSED, "RENAMED": RENAMED,
                              "MESSAGES": MESSAGES})


if __name__ == "__main__":
    main()
