#!/usr/bin/env python3
"""Four review workbooks for plumb's workbook checking (review 21), written with the standard
zipfile module (review4's xlsx_writer.py, shared).

Trades and scenarios (all invented):
  1. bayside-chiller-cw: a medical office building's central plant, condenser water and cooling
     towers in US units (tons, MBH, gpm, °F, ft of head, psi/psig/psia, hp, kW; 500·gpm·ΔT,
     3960, 2.31, 0.4085).
  2. kestrel-dc-electrical: a distribution centre's 480 V load schedule, service transformer,
     feeder voltage drop in AWG/kcmil and ft, and a metric recheck of one feeder in mm² and m
     for an IEC cable offer (kW, kVA, pf, A, V, %, Ω·cmil/ft, Ω·mm²/m, Ω/km).
  3. alder-st-framing: a mixed-use building's level-2 framing: W-shape section table (in³, in⁴
     to mm³, mm⁴), an SI steel beam schedule (kPa, kN/m, kN·m, MPa, span/360 in mm), a girder
     check in US units for the fabricator (kip/ft, ft, ksi, in³) and an NDS timber joist and
     glulam schedule (plf, ft, psi, in³, in⁴).
  4. millbrook-biogas-chp: a dairy co-digestion plant's feed table, digester heating, gas
     normalisation and a 500 kW gas-engine CHP (t/d, % TS, Nm³/d, % CH4, MJ/Nm³, kWh/Nm³, °C,
     mbar, kW electric and thermal, h/yr).

Every formula cell is either a planted mistake (its row carries the rule I expect and what is
wrong) or a correct formula that must stay clean. Item sheets are rows (label, symbol, value,
unit); a formula names rows of its own sheet as {sym} and rows of another item sheet as
{Sheet.sym}; these become cell addresses.

Run: python3 make_books.py  ->  *.xlsx, *.cells.plumb (sidecars), *.planted, manifest.json

The *.expect files beside the books are the *.planted lists plus every finding plumb makes on a
correct cell, and the planted mistake it still misses, each with why, kept by hand.
"""
import json
import os
import re
import sys

HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, os.path.join(HERE, "..", "review4"))
from xlsx_writer import write_xlsx  # noqa: E402  (review4's writer, which this review shares)
SYMBOLS = {}  # (sheet, symbol) -> "C<row>"


def item_sheet(name, title, source, rows, first_row=5):
    """rows: (label, sym, value, unit[, rule, what]); a 1-tuple is a section heading."""
    cells = {"A1": title, "A2": source, f"A{first_row - 1}": "Item",
             f"B{first_row - 1}": "Symbol", f"C{first_row - 1}": "Value",
             f"D{first_row - 1}": "Unit"}
    plants = {}
    r = first_row
    for row in rows:
        if len(row) == 1:
            cells[f"A{r}"] = row[0]
            r += 1
            continue
        label, sym, value, unit = row[:4]
        cells[f"A{r}"] = label
        if sym:
            cells[f"B{r}"] = sym
            SYMBOLS[(name, sym)] = f"C{r}"
        cells[f"C{r}"] = value
        if unit:
            cells[f"D{r}"] = unit
        if len(row) > 4:
            plants[f"{name}!C{r}"] = (row[4], row[5])
        r += 1
    return cells, plants


def resolve(sheets):
    for name, cells in sheets:
        for key, val in cells.items():
            if isinstance(val, str) and val.startswith("="):
                def sub(m):
                    ref = m.group(1)
                    if "." in ref:
                        sh, sym = ref.split(".", 1)
                        return f"{sh}!{SYMBOLS[(sh, sym)]}"
                    return SYMBOLS[(name, ref)]
                cells[key] = re.sub(r"\{([A-Za-z_][A-Za-z0-9_.]*)\}", sub, val)


def table(cells, first_row, rows, formulas):
    """rows: lists of inputs for columns A...; formulas: {col: template with {r}}."""
    for i, row in enumerate(rows):
        r = first_row + i
        for j, v in enumerate(row):
            if v is not None:
                cells[f"{chr(65 + j)}{r}"] = v
        for col, tmpl in formulas.items():
            if f"{col}{r}" not in cells:
                cells[f"{col}{r}"] = tmpl.replace("{r}", str(r))


# ============================================================================================
# Book 1: chiller plant condenser water and cooling towers (US units)
# ============================================================================================
CHILLERS = {
    "A1": "Bayside Medical Pavilion central plant: chiller schedule, condenser side "
          "(invented project)",
    "A2": "Sources: heat rejected = tons × 12,000 Btu/h + compressor kW × 3,412 Btu/h (ASHRAE "
          "Handbook—Fundamentals ch. 38 conversion factors, rounded); condenser flow gpm = "
          "Btu/h ÷ (500 × ΔT), 500 = 8.33 lb/gal × 60 min/h × 1 Btu/(lb·°F) (common practice); "
          "chiller selections invented",
    "A4": "Tag", "B4": "Capacity [tons]", "C4": "Efficiency [kW/ton]", "D4": "Input [kW]",
    "E4": "Heat rejected [MBH]", "F4": "CW ΔT [°F]", "G4": "CW flow [gpm]",
    "H4": "Flow per ton [gpm/ton]",
    "A8": "Plant total",
    "B8": "=SUM(B5:B7)", "C8": "=D8/B8", "D8": "=SUM(D5:D7)", "E8": "=SUM(E5:E7)",
    "G8": "=SUM(G5:G7)", "H8": "=G8/B8",
}
table(CHILLERS, 5,
      [["CH-1", 500, 0.56, None, None, 10], ["CH-2", 500, 0.56, None, None, 10],
       ["CH-3 (swing)", 300, 0.60, None, None, 10]],
      {"D": "=B{r}*C{r}", "E": "=(B{r}*12000+D{r}*3412)/1000", "G": "=E{r}*1000/(500*F{r})",
       "H": "=G{r}/B{r}"})
CHILLERS["E6"] = "=(B6*12000+D6)/1000"   # planted
CHILLERS["G7"] = "=E7/(500*F7)"          # planted
CHILLER_PLANTS = {
    "Chillers!E6": ("unit-scale", "CH-2 heat rejected: compressor kW added to Btu/h without ×3412"),
    "Chillers!G7": ("unit-scale", "CH-3 flow: MBH used as Btu/h in gpm = Btu/h/(500·ΔT), "
                                  "1000 times too small"),
}

TOWER, TOWER_PLANTS = item_sheet(
    "Tower",
    "Bayside Medical Pavilion: cooling towers CT-1/CT-2, water balance (invented project)",
    "Sources: range and approach (ASHRAE Handbook—HVAC Systems and Equipment, ch. 40 cooling "
    "towers); evaporation = heat rejected ÷ (h_fg × 8.33 lb/gal × 60 min/h), h_fg ≈ 1045 Btu/lb "
    "at 85 °F (steam tables, from memory); blowdown B = E/(C − 1) (common practice); drift "
    "0.005 % of flow (tower vendor's data, invented); °C = (°F − 32)/1.8 (NIST SP 811); "
    "1 psi of water = 2.31 ft (common practice)",
    [
        ("Design ambient wet-bulb", "WB", 78, "°F"),
        ("Hot water to tower (CW return)", "T_hw", 95, "°F"),
        ("Cold water from tower (CW supply)", "T_cw", 85, "°F"),
        ("Range (hot − cold water)", "R", "={T_hw}-{T_cw}", "°F"),
        ("Approach (cold water − wet-bulb)", "Ap", "={T_cw}-{WB}", "°F"),
        ("Tower effectiveness, range/(range + approach)", "eff", "={R}/({R}+{Ap})*100", "%"),
        ("Heat rejected, plant", "Q", "=Chillers!E8", "MBH"),
        ("CW flow, plant", "q", "=Chillers!G8", "gpm"),
        ("Range from heat balance", "R_hb", "={Q}*1000/(500*{q})", "°F"),
        ("Latent heat of evaporation at 85 °F", "h_fg", 1045, "Btu/lb"),
        ("Water, weight per gallon", "w_g", 8.33, "lb/gal"),
        ("Evaporation", "E", "={Q}*1000/({h_fg}*{w_g})", "gpm",
         "unit-scale", "evaporation: Btu/h ÷ (Btu/lb·lb/gal) is gal/h, written as gpm (no /60)"),
        ("Evaporation, % of circulating flow", "e_pct", "={E}/{q}*100", "%"),
        ("Cycles of concentration", "COC", 4, "-"),
        ("Blowdown", "B", "={E}/({COC}-1)", "gpm"),
        ("Drift rate (tower vendor)", "dr", 0.005, "%"),
        ("Drift loss", "D", "={q}*{dr}", "gpm",
         "unit-scale", "drift 0.005 % used as a fraction: 100 times too large"),
        ("Makeup water", "M", "={E}+{B}+{D}", "gpm"),
        ("Cooling season, full-load equivalent hours", "t_op", 3200, "h"),
        ("Annual makeup", "V_a", "={M}*60*{t_op}", "gal"),
        ("Design wet-bulb for the tower vendor", "WB_C", "=({WB}-32)/1.8", "°C"),
        ("Cold water temperature for the tower vendor", "T_cwC", "=({T_cw}-32)*1.8", "°C",
         "unit-scale", "°F to °C multiplied by 1.8: the factor the wrong way round"),
        ("Static lift, basin to spray header", "h_s", 14, "ft"),
        ("Spray nozzle pressure (tower vendor)", "p_n", 5, "psi"),
        ("Nozzle pressure as head", "h_n", "={p_n}*2.31", "ft"),
        ("Approach check", None, '=IF({Ap}<7,"TIGHT","OK")', None),
    ])

PUMP = {
    "A1": "Bayside Medical Pavilion: condenser water pumps CWP-1/2/3 (2 duty, 1 standby), head "
          "and NPSH (invented project)",
    "A2": "Sources: friction per 100 ft, Sch 40 steel, from Cameron Hydraulic Data tables "
          "(values read from memory for the demo); v = 0.4085·gpm/d² with d in inches (common "
          "practice); water hp = gpm·ft/3960, bhp = whp/η (Hydraulic Institute, SG 1); "
          "1 hp = 0.746 kW (NIST SP 811: 745.7 W); 1 psi = 2.31 ft of water (common practice); "
          "NPSHa = (p_atm − p_v)·2.31 + z_s − h_fs (Hydraulic Institute); p_v 0.596 psia at "
          "85 °F (steam tables, from memory); g = 32.2 ft/s² (common practice)",
    "A4": "Segment", "B4": "Flow [gpm]", "C4": "Pipe ID [in]", "D4": "Equiv. length [ft]",
    "E4": "Velocity [ft/s]", "F4": "Loss [ft/100 ft]", "G4": "Friction loss [ft]",
    "A9": "Total / max", "E9": "=MAX(E5:E8)", "G9": "=SUM(G5:G8)",
}
table(PUMP, 5,
      [["Basin to pump suction header", "=Chillers!G8", 15.0, 120, None, 0.5],
       ["Pump discharge header to chillers", "=Chillers!G8", 15.0, 180, None, 0.5],
       ["Branch to CH-1 (index run)", "=Chillers!G5", 10.02, 85, None, 1.3],
       ["Chillers back to tower", "=Chillers!G8", 15.0, 240, None, 0.5]],
      {"E": "=0.4085*B{r}/C{r}^2", "G": "=D{r}*F{r}/100"})
PUMP_ITEMS, PUMP_PLANTS = item_sheet(
    "Pump", "", "",
    [
        ("Pipe friction (table)", "h_f", "=G9", "ft"),
        ("Chiller condenser pressure drop (CH-1 selection)", "dp_c", 9.5, "psi"),
        ("Condenser drop as head", "h_c", "={dp_c}*2.31", "ft"),
        ("Tower static lift", "h_s", "={Tower.h_s}", "ft"),
        ("Tower nozzle head", "h_n", "={Tower.h_n}", "ft"),
        ("Strainer, valves and fittings allowance", "h_v", 8, "ft"),
        ("Total dynamic head (+10 %)", "TDH", "=ROUND(({h_f}+{dp_c}+{h_s}+{h_n}+{h_v})*1.1,0)",
         "ft", "sum-mismatch", "TDH sums the condenser drop in psi with heads in ft"),
        ("Total dynamic head", "TDH_p", "={TDH}/2.31", "psi"),
        ("Duty pumps", "n", 2, "-"),
        ("Flow per pump", "q_p", "={Tower.q}/{n}", "gpm"),
        ("Water horsepower", "whp", "={q_p}*{TDH}/3960", "hp"),
        ("Pump efficiency (selection)", "eta_p", 0.82, "-"),
        ("Brake horsepower", "bhp", "={q_p}*{TDH_p}/(3960*{eta_p})", "hp",
         "unit-scale", "bhp from the head in psi in gpm·ft/3960 (needs ft, or /1714 with psi)"),
        ("Motor efficiency (NEMA premium)", "eta_m", 94.5, "%"),
        ("Motor input power", "P_m", "={bhp}*0.746/({eta_m}/100)", "kW"),
        ("Motor nameplate", "hp_m", 30, "hp"),
        ("Motor loading", "LF", "={bhp}/{hp_m}*100", "%"),
        ("Annual pump energy, duty pumps", "E_p", "={n}*{P_m}*{Tower.t_op}", "kWh"),
        ("NPSH",),
        ("Atmospheric pressure (site near sea level)", "p_atm", 14.7, "psia"),
        ("Vapour pressure of water at 85 °F", "p_v", 0.596, "psia"),
        ("Basin water level above pump centreline", "z_s", 6, "ft"),
        ("Suction friction loss", "h_fs", "=G5", "ft"),
        ("Suction velocity", "v_s", "=E5", "ft/s"),
        ("NPSH available", "NPSHa", "=({p_atm}-{p_v})*2.31+{z_s}-{h_fs}", "ft"),
        ("Suction gauge reading at commissioning", "p_sg", 2.1, "psig"),
        ("NPSH available from the suction gauge", "NPSHg",
         "=({p_sg}-{p_v})*2.31+{v_s}^2/(2*32.2)", "ft",
         "offset-scale", "suction gauge psig less vapour pressure psia, no atmosphere added"),
        ("NPSH required (pump curve at duty point)", "NPSHr", 18, "ft"),
        ("NPSH margin", "m_n", "={NPSHa}-{NPSHr}", "ft"),
        ("NPSH check", None, '=IF({m_n}<5,"LOW","OK")', None),
        ("Pump discharge pressure (gauge)", "p_d", "={p_sg}+{TDH_p}", "psig"),
        ("Pump discharge pressure, absolute", "p_da", "={p_d}+14.7", "psia"),
        ("Maximum pipe velocity", "v_max", "=E9", "ft/s"),
        ("Velocity check", None, '=IF({v_max}>10,"HIGH","OK")', None),
    ], first_row=13)
PUMP_ITEMS.pop("A1")
PUMP_ITEMS.pop("A2")
PUMP.update(PUMP_ITEMS)

BOOK1 = {
    "name": "bayside-chiller-cw",
    "trade": "HVAC central plant: condenser water, cooling towers and CW pumps (US units)",
    "sheets": [("Chillers", CHILLERS), ("Tower", TOWER), ("Pump", PUMP)],
    "names": {},
    "plants": {**CHILLER_PLANTS, **TOWER_PLANTS, **PUMP_PLANTS},
    "sidecar": [
        "# Units the plant sheets use that plumb's table lacks (review 21)",
        "measure tons = 1 TR \"ton of refrigeration, 12,000 Btu/h, as HVAC sheets write it\"",
        "measure MBH = 1000 Btu/h \"thousand Btu per hour (common practice)\"",
    ],
}

# ============================================================================================
# Book 2: electrical load schedule, service, feeder voltage drop (480 V) and a metric recheck
# ============================================================================================
SERVICE, SERVICE_PLANTS = item_sheet(
    "Service",
    "Kestrel Park distribution centre: 480Y/277 V service and MDP-1 (invented project)",
    "Sources: three-phase I = S/(√3·V_LL), V_LN = V_LL/√3 (any electrical handbook); fault "
    "current at the transformer secondary with an infinite primary I_sc = I_FL/(Z%/100) (IEEE "
    "Std 141, common practice); motor input kW = hp × 0.746/η (NIST SP 811: hp = 745.7 W); "
    "motor FLA = hp·746/(√3·V·η·pf); locked rotor ≈ 6 × FLA (common practice)",
    [
        ("System voltage, line to line", "V_LL", 480, "V"),
        ("Voltage, line to neutral", "V_LN", "={V_LL}/SQRT(3)", "V"),
        ("Demand load (schedule)", "P_d", "=Loads!F11", "kW"),
        ("Demand apparent power (schedule)", "S_d", "=Loads!G11", "kVA"),
        ("Emergency lighting inverter", "P_em", 3500, "W"),
        ("Demand load incl. emergency lighting", "P_t", "={P_d}+{P_em}", "kW",
         "unit-scale", "kW demand plus the inverter in W"),
        ("Overall power factor", "pf", "={P_d}/{S_d}", "-"),
        ("Growth allowance", "g", 25, "%"),
        ("Design apparent power", "S_des", "={S_d}*(1+{g}/100)", "kVA"),
        ("Transformer rating", "S_T", 1500, "kVA"),
        ("Transformer check", None, '=IF({S_des}<={S_T},"OK","UPSIZE")', None),
        ("Transformer impedance", "Z", 5.75, "%"),
        ("Secondary full-load current", "I_FL", "={S_T}*1000/(SQRT(3)*{V_LL})", "A"),
        ("Available fault current at MDP", "I_sc", "={I_FL}/{Z}", "A",
         "unit-scale", "5.75 % impedance used as 5.75: fault current 100 times too small"),
        ("Available fault current", "I_sc_kA", "={I_sc}/1000", "kA"),
        ("MDP bus rating", "I_bus", 2000, "A"),
        ("Bus check", None, '=IF({I_FL}<={I_bus},"OK","UPSIZE")', None),
        ("Air compressor AC-1",),
        ("Motor rating", "P_hp", 75, "hp"),
        ("Motor efficiency", "eta", 95.4, "%"),
        ("Motor power factor", "pf_m", 0.86, "-"),
        ("Motor input power", "P_in", "={P_hp}*0.746/({eta}/100)", "kW"),
        ("Motor full-load current", "I_m", "={P_hp}*746/(SQRT(3)*{V_LL}*{eta}/100*{pf_m})", "A"),
        ("Locked-rotor current", "I_lr", "=6*{I_m}", "A"),
    ])

LOADS = {
    "A1": "Kestrel Park distribution centre: MDP-1 load schedule (invented project)",
    "A2": "Sources: demand kW = qty × kW × demand factor; kVA = kW/pf; I = kVA·1000/(√3·V_LL) "
          "(common practice); demand factors after NEC Article 220 (values invented for the "
          "demo); kVA summed arithmetically (conservative, common practice)",
    "A4": "Load", "B4": "Qty", "C4": "Rating [kW]", "D4": "pf [-]", "E4": "Demand factor [%]",
    "F4": "Demand [kW]", "G4": "Demand [kVA]", "H4": "Current [A]",
    "A11": "Total", "F11": "=SUM(F5:F10)", "G11": "=SUM(G5:G10)",
    "H11": "=G11*1000/(SQRT(3)*Vll)",
}
table(LOADS, 5,
      [["Warehouse and dock lighting (LED)", 1, 42, 0.95, 100],
       ["Conveyor MCC-1", 1, 185, 0.85, 80],
       ["Forklift battery chargers", 24, 6.5, 0.92, 70],
       ["Dock door operators", 40, 0.75, 0.80, 25],
       ["Office rooftop units RTU-1 to 3", 3, 38, 0.88, 100],
       ["Air compressor AC-1", 1, "={Service.P_in}", 0.86, 100]],
      {"F": "=B{r}*C{r}*E{r}/100", "G": "=F{r}/D{r}", "H": "=G{r}*1000/(SQRT(3)*Vll)"})
LOADS["F7"] = "=B7*C7*E7"
LOADS["H8"] = "=G8/(SQRT(3)*Vll)"
LOADS_PLANTS = {
    "Loads!F7": ("unit-scale", "chargers: demand factor 70 % used as 70: 100 times too large"),
    "Loads!H8": ("unit-scale", "door operators: kVA/(√3·V) without ×1000 gives kA in an A column"),
}

CONDUCTORS = {
    "A1": "Copper conductors, THHN/THWN-2 in conduit (reference table)",
    "A2": "Sources: areas NEC Chapter 9 Table 8 (from memory); ampacity at 75 °C NEC Table "
          "310.16 (from memory); 1 kcmil = 0.5067 mm² (NIST SP 811: cmil = 5.067075E-10 m², "
          "rounded)",
    "A4": "Size", "B4": "Area [kcmil]", "C4": "Area [mm²]", "D4": "Ampacity 75 °C [A]",
}
table(CONDUCTORS, 5,
      [["2", 66.36, None, 115], ["1/0", 105.6, None, 150], ["2/0", 133.1, None, 175],
       ["3/0", 167.8, None, 200], ["4/0", 211.6, None, 230], ["250", 250, None, 255],
       ["350", 350, None, 310], ["500", 500, None, 380], ["600", 600, None, 420]],
      {"C": "=B{r}*0.5067"})

FEEDERS = {
    "A1": "Kestrel Park distribution centre: feeder sizing and voltage drop (invented project)",
    "A2": "Sources: three-phase VD = √3·K·I·L/CM with K = 12.9 Ω·cmil/ft for copper at 75 °C "
          "(common practice, after NEC Chapter 9 Table 8); % drop = VD/V_LL × 100; NEC 215.2(A) "
          "informational note: 3 % on a feeder, 5 % feeder plus branch",
    "A4": "Item", "B4": "Symbol", "C4": "Value", "D4": "Unit",
    "A5": "Conductor constant, copper at 75 °C", "B5": "K", "C5": 12.9, "D5": "Ω·cmil/ft",
    "A7": "Feeder", "B7": "Load [A]", "C7": "Size", "D7": "Sets", "E7": "Length [ft]",
    "F7": "Area [kcmil]", "G7": "VD [V]", "H7": "VD [%]", "I7": "Ampacity [A]", "J7": "Check",
    "A13": "Worst feeder", "H13": "=MAX(H8:H12)", "J13": '=IF(H13<=3,"OK","REVIEW")',
}
table(FEEDERS, 8,
      [["F1 Transformer to MDP-1", "={Service.I_FL}", "600", 5, 45],
       ["F2 MDP-1 to MCC-1", "=Loads!H6", "4/0", 1, 320],
       ["F3 MDP-1 to DP-CHG", "=Loads!H7", "1/0", 1, 410],
       ["F4 MDP-1 to LP-DOCK", "=Loads!H5", "2", 1, 520],
       ["F5 MDP-1 to AC-1", "={Service.I_m}", "2", 1, 180]],
      {"F": "=VLOOKUP(C{r},Conductors!$A$5:$D$13,2,FALSE)*D{r}",
       "G": "=SQRT(3)*K_cu*B{r}*E{r}/(F{r}*1000)",
       "H": "=G{r}/Vll*100",
       "I": "=VLOOKUP(C{r},Conductors!$A$5:$D$13,4,FALSE)*D{r}",
       "J": '=IF(B{r}<=I{r},IF(H{r}<=3,"OK","VD"),"AMPACITY")'})
FEEDERS["G10"] = "=SQRT(3)*K_cu*B10*E10/F10"
FEEDERS["H11"] = "=G11/Vll"
FEEDERS_PLANTS = {
    "Feeders!G10": ("unit-scale", "F3: area in kcmil used as circular mils: VD 1000 times too large"),
    "Feeders!H11": ("unit-scale", "F4: VD/V without ×100 into a % column"),
}

METRIC, METRIC_PLANTS = item_sheet(
    "Metric",
    "Kestrel Park: feeder F2 rechecked for the conveyor vendor's IEC cable offer (invented)",
    "Sources: ΔU = √3·ρ·L·I·cos φ/S (common practice); ΔU = √3·I·L·(R cos φ + X sin φ) with R, "
    "X in Ω/km and L in km (IEC 60364-5-52 Annex G); ρ_T = ρ_20·(1 + α(T − 20)), ρ_20 = 0.01724 "
    "Ω·mm²/m, α = 0.00393 /K (IEC 60028 annealed copper); 120 mm² Cu cable data invented; "
    "1 ft = 0.3048 m (NIST SP 811)",
    [
        ("Feeder F2 current", "I", "=Feeders!B9", "A"),
        ("Route length (drawing)", "L_ft", "=Feeders!E9", "ft"),
        ("Route length", "L", "={L_ft}/0.3048", "m",
         "unit-scale", "ft to m divided by 0.3048: the factor the wrong way round"),
        ("4/0 AWG conductor area", "S_awg", '=VLOOKUP("4/0",Conductors!$A$5:$C$13,3,FALSE)',
         "mm²"),
        ("IEC conductor offered", "S", 120, "mm²"),
        ("Offered area over 4/0 AWG", "r_S", "={S}/{S_awg}", "-"),
        ("IEC size in kcmil", "S_kc", "={S}/0.5067", "kcmil"),
        ("Resistivity of copper at 20 °C", "rho20", 0.01724, "Ω·mm²/m"),
        ("Temperature coefficient of copper", "alpha", 0.00393, "1/K"),
        ("Conductor operating temperature", "T_c", 75, "°C"),
        ("Resistivity at operating temperature", "rho", "={rho20}*(1+{alpha}*({T_c}-20))",
         "Ω·mm²/m"),
        ("Power factor, MCC-1", "cphi", "=Loads!D6", "-"),
        ("sin φ", "sphi", "=SQRT(1-{cphi}^2)", "-"),
        ("Voltage drop, resistance only", "dU", "=SQRT(3)*{rho}*{L}*{I}*{cphi}/{S}", "V"),
        ("Voltage drop, contractor's check from drawing", "dU_c",
         "=SQRT(3)*{rho}*{L_ft}*{I}*{cphi}/{S}", "V",
         "unit-scale", "length in ft with resistivity per metre"),
        ("Cable AC resistance at 90 °C", "R", 0.196, "Ω/km"),
        ("Cable reactance", "X", 0.08, "Ω/km"),
        ("Voltage drop, R and X", "dU_RX", "=SQRT(3)*{I}*{L}*({R}*{cphi}+{X}*{sphi})", "V",
         "unit-scale", "Ω/km with the length in m: 1000 times too large"),
        ("Voltage drop", "dU_pct", "={dU}/Vll*100", "%"),
    ])

BOOK2 = {
    "name": "kestrel-dc-electrical",
    "trade": "building electrical: load schedule, service, feeder voltage drop (AWG/kcmil, "
             "ft) and an IEC recheck (mm², m)",
    "sheets": [("Service", SERVICE), ("Loads", LOADS), ("Conductors", CONDUCTORS),
               ("Feeders", FEEDERS), ("Metric", METRIC)],
    "names": {"Vll": ("Service", "$C$5"), "K_cu": ("Feeders", "$C$5")},
    "plants": {**SERVICE_PLANTS, **LOADS_PLANTS, **FEEDERS_PLANTS, **METRIC_PLANTS},
    "sidecar": None,
}

# ============================================================================================
# Book 3: steel and timber beam schedule
# ============================================================================================
BASIS, BASIS_PLANTS = item_sheet(
    "Basis",
    "Alder Street mixed-use, level 2 framing: design basis (invented project)",
    "Sources: ASCE 7-16 §2.3.1 (1.2D + 1.6L); ASCE 7-16 Table 4.3-1 office 50 psf plus 15 psf "
    "partitions (§4.3.2); AISC 360-16 F2 (φ = 0.90, M_n = F_y·Z_x); A992 F_y = 50 ksi = 345 MPa, "
    "E = 29,000 ksi ≈ 200,000 MPa; concrete 24 kN/m³ (EN 1991-1-1 Table A.1, from memory); "
    "1 psf = 0.04788 kPa, 1 ksi = 6.895 MPa (NIST SP 811, rounded)",
    [
        ("Steel yield strength, ASTM A992", "Fy", 345, "MPa"),
        ("Steel yield strength", "Fy_ksi", "={Fy}*6.895", "ksi",
         "unit-scale", "MPa to ksi multiplied by 6.895: the factor the wrong way round"),
        ("Modulus of elasticity, steel", "Es", 200000, "MPa"),
        ("Modulus of elasticity", "Es_ksi", "={Es}/6.895", "ksi"),
        ("Resistance factor, flexure", "phi", 0.9, "-"),
        ("Slab on metal deck, equivalent solid thickness", "t_s", 110, "mm"),
        ("Concrete unit weight", "gam", 24, "kN/m³"),
        ("Slab self-weight", "q_s", "={t_s}*{gam}", "kPa",
         "unit-scale", "slab thickness in mm times kN/m³ into kPa: 1000 times too large"),
        ("Superimposed dead load (finishes, MEP, ceiling)", "q_sdl", 1.2, "kPa"),
        ("Dead load", "q_D", "={q_s}+{q_sdl}", "kPa"),
        ("Office live load incl. partitions", "q_Lpsf", 65, "psf"),
        ("Live load", "q_L", "={q_Lpsf}*0.04788", "kPa"),
    ])

SECTIONS = {
    "A1": "W-shapes used on level 2 (reference table)",
    "A2": "Sources: AISC Steel Construction Manual 15th ed. Table 1-1 (from memory); 1 in³ = "
          "16,387 mm³, 1 in⁴ = 416,231 mm⁴ (NIST SP 811, rounded); self-weight 1 lb/ft × g = "
          "0.0146 kN/m (common practice)",
    "A4": "Shape", "B4": "d [in]", "C4": "Z_x [in³]", "D4": "S_x [in³]", "E4": "I_x [in⁴]",
    "F4": "Z_x [mm³]", "G4": "I_x [mm⁴]", "H4": "Weight [lb/ft]", "I4": "Self-weight [kN/m]",
}
table(SECTIONS, 5,
      [["W12x26", 12.2, 37.2, 33.4, 204, None, None, 26],
       ["W14x30", 13.8, 47.3, 42.0, 291, None, None, 30],
       ["W16x31", 15.9, 54.0, 47.2, 375, None, None, 31],
       ["W18x35", 17.7, 66.5, 57.6, 510, None, None, 35],
       ["W21x44", 20.7, 95.4, 81.6, 843, None, None, 44]],
      {"F": "=C{r}*16387", "G": "=E{r}*416231", "I": "=H{r}*0.0146"})

STEEL = {
    "A1": "Alder Street level 2: steel beam schedule, simply supported, composite action "
          "ignored (invented project)",
    "A2": "Sources: w = tributary width × area load + self-weight; w_u = 1.2w_D + 1.6w_L (ASCE "
          "7-16); M_u = w_u·L²/8 (simple span); φM_n = φ·F_y·Z_x (AISC 360-16 F2, braced by the "
          "deck); Δ_L = 5·w_L·L⁴/(384·E·I) with w in kN/m = N/mm and L in mm; limit L/360 "
          "(IBC 2018 Table 1604.3)",
    "A4": "Mark", "B4": "Section", "C4": "Span [m]", "D4": "Trib. width [m]",
    "E4": "w_D [kN/m]", "F4": "w_L [kN/m]", "G4": "w_u [kN/m]", "H4": "M_u [kN·m]",
    "I4": "V_u [kN]", "J4": "φM_n [kN·m]", "K4": "Ratio [-]", "L4": "Δ_L [mm]",
    "M4": "L/360 [mm]", "N4": "Check",
    "A9": "Governing", "K9": "=MAX(K5:K8)", "N9": '=IF(K9<=1,"OK","REVIEW")',
}
table(STEEL, 5,
      [["B1", "W16x31", 8.5, 2.8], ["B2", "W18x35", 9.5, 2.8], ["B3", "W14x30", 7.2, 2.8],
       ["B4", "W21x44", 11.0, 3.0]],
      {"E": "=D{r}*Basis!$C$14+VLOOKUP(B{r},Sections!$A$5:$I$9,9,FALSE)",
       "F": "=D{r}*Basis!$C$16",
       "G": "=1.2*E{r}+1.6*F{r}",
       "H": "=G{r}*C{r}^2/8",
       "I": "=G{r}*C{r}/2",
       "J": "=Basis!$C$9*Basis!$C$5*VLOOKUP(B{r},Sections!$A$5:$I$9,6,FALSE)/10^6",
       "K": "=H{r}/J{r}",
       "L": "=5*F{r}*(C{r}*1000)^4/(384*Basis!$C$7*VLOOKUP(B{r},Sections!$A$5:$I$9,7,FALSE))",
       "M": "=C{r}*1000/360",
       "N": '=IF(K{r}<=1,IF(L{r}<=M{r},"OK","DEFL"),"FLEX")'})
STEEL["M6"] = "=C6/360"
STEEL["L7"] = "=5*F7*C7^4/(384*Basis!$C$7*VLOOKUP(B7,Sections!$A$5:$I$9,7,FALSE))"
STEEL_PLANTS = {
    "Steel!M6": ("unit-scale", "B2: span/360 with the span in m into a mm column"),
    "Steel!L7": ("unit-scale", "B3: deflection with L in m beside I in mm⁴ and E in MPa "
                               "(needs (L·1000)⁴): 10¹² times too small"),
}

GIRDER, GIRDER_PLANTS = item_sheet(
    "Girder",
    "Alder Street level 2: beam B4 restated in US units for the fabricator's check (invented)",
    "Sources: 1 kN/m = 0.06852 kip/ft, 1 ft = 0.3048 m, 1 in = 25.4 mm (NIST SP 811, rounded); "
    "Z_req = M_u·12/(φ·F_y) with M in kip-ft and F_y in ksi (AISC Manual, common practice); "
    "φV_n = 1.0·0.6·F_y·d·t_w (AISC 360-16 G2.1(a), rolled I-shapes); t_w of W21x44 = 0.350 in "
    "(AISC Manual Table 1-1, from memory)",
    [
        ("Factored load (schedule, B4)", "w_u", "=Steel!G8", "kN/m"),
        ("Factored load", "w_uk", "={w_u}*0.06852", "kip/ft"),
        ("Span (schedule, B4)", "L", "=Steel!C8", "m"),
        ("Span", "L_ft", "={L}*0.3048", "ft",
         "unit-scale", "m to ft multiplied by 0.3048: the factor the wrong way round"),
        ("Factored moment", "M_u", "={w_u}*{L}^2/8", "kip-ft",
         "unit-scale", "M_u from the SI cells (kN/m, m) gives kN·m, written as kip-ft"),
        ("Required plastic modulus", "Z_req", "={M_u}/({Basis.phi}*{Basis.Fy_ksi})", "in³",
         "unit-scale", "Z_req from kip-ft and ksi without ×12 in/ft: 12 times too small"),
        ("Section", "sec", "W21x44", None),
        ("Plastic modulus of the section", "Zx", "=VLOOKUP({sec},Sections!$A$5:$I$9,3,FALSE)",
         "in³"),
        ("Utilisation, flexure", "u", "={Z_req}/{Zx}", "-"),
        ("Factored shear", "V_u", "={w_uk}*{L_ft}/2", "kips"),
        ("Depth", "d", "=VLOOKUP({sec},Sections!$A$5:$I$9,2,FALSE)", "in"),
        ("Web thickness", "t_w", 0.35, "in"),
        ("Design shear strength", "phiVn", "=1.0*0.6*{Basis.Fy_ksi}*{d}*{t_w}", "kips"),
        ("Shear check", None, '=IF({V_u}<={phiVn},"OK","NG")', None),
        ("Live-load deflection (schedule)", "D_L", "=Steel!L8/25.4", "in"),
        ("Deflection limit, span/360", "D_lim", "={L_ft}*12/360", "in"),
    ])

TIMBER = {
    "A1": "Alder Street level 3 (residential over podium): joists and glulam beams, NDS ASD "
          "(invented project)",
    "A2": "Sources: NDS 2018: f_b = M/S ≤ F'_b (F'_b entered after C_D, C_M, C_t, C_L, C_F, "
          "C_r); M = wL²/8; Δ_L = 5·w_L·L⁴/(384·E·I) with w in lb/in (plf/12) and L in in; limit "
          "L/360 (IBC 2018 Table 1604.3); 2x10, 2x12 and 5-1/8 in glulam properties from the "
          "NDS Supplement (from memory); E: DF-L No. 2 1.6×10⁶ psi, 24F-V4 1.8×10⁶ psi",
    "A4": "Mark", "B4": "Member", "C4": "Span [ft]", "D4": "w_D [plf]", "E4": "w_L [plf]",
    "F4": "w [plf]", "G4": "M [lb-ft]", "H4": "S [in³]", "I4": "I [in⁴]", "J4": "E [psi]",
    "K4": "F'b [psi]", "L4": "fb [psi]", "M4": "Δ_L [in]", "N4": "L/360 [in]", "O4": "Check",
    "A9": "Governing", "L9": "=MAX(L5:L8)", "M9": "=MAX(M5:M8)",
}
table(TIMBER, 5,
      [["J1", "2x10 DF-L No.2 @ 16 in", 14, 20, 53.3, None, None, 21.39, 98.93, 1600000, 1138],
       ["J2", "2x12 DF-L No.2 @ 16 in", 16, 20, 53.3, None, None, 31.64, 177.98, 1600000, 1035],
       ["GB1", "5-1/8 x 15 24F-V4", 20, 180, 420, None, None, 192.2, 1441, 1800000, 2350],
       ["GB2", "5-1/8 x 18 24F-V4", 24, 200, 460, None, None, 276.8, 2491, 1800000, 2300]],
      {"F": "=D{r}+E{r}", "G": "=F{r}*C{r}^2/8", "L": "=G{r}*12/H{r}",
       "M": "=5*(E{r}/12)*(C{r}*12)^4/(384*J{r}*I{r})", "N": "=C{r}*12/360",
       "O": '=IF(L{r}<=K{r},IF(M{r}<=N{r},"OK","DEFL"),"FLEX")'})
TIMBER["L7"] = "=G7/H7"
TIMBER["M8"] = "=5*E8*(C8*12)^4/(384*J8*I8)"
TIMBER_PLANTS = {
    "Timber!L7": ("unit-scale", "GB1: f_b = M/S with M in lb-ft and S in in³ (no ×12): 12 times "
                                "too small"),
    "Timber!M8": ("unit-scale", "GB2: deflection with w in plf and L in in (no /12): 12 times "
                                "too large"),
}

BOOK3 = {
    "name": "alder-st-framing",
    "trade": "structural: steel beam schedule (SI), girder check (US) and NDS timber schedule",
    "sheets": [("Basis", BASIS), ("Sections", SECTIONS), ("Steel", STEEL), ("Girder", GIRDER),
               ("Timber", TIMBER)],
    "names": {},
    "plants": {**BASIS_PLANTS, **STEEL_PLANTS, **GIRDER_PLANTS, **TIMBER_PLANTS},
    "sidecar": [
        "# Units the framing sheets use that plumb's table lacks (review 21)",
        "measure psf = 1 lbf/ft^2 \"pound-force per square foot\"",
        "measure plf = 1 lbf/ft \"pound-force per linear foot\"",
        "measure kips = 1 kip \"kips, as AISC writes the plural\"",
    ],
}

# ============================================================================================
# Book 4: biogas digester and CHP
# ============================================================================================
FEED = {
    "A1": "Millbrook dairy co-digestion plant: daily feed and biogas potential (invented)",
    "A2": "Sources: VS = fresh mass × TS × VS/TS; biogas = VS × specific yield (KTBL "
          "Faustzahlen Biogas, typical yields, from memory); methane = biogas × CH4 content; "
          "substrate data invented",
    "A4": "Substrate", "B4": "Fresh mass [t/d]", "C4": "TS [%]", "D4": "VS/TS [%]",
    "E4": "VS [kg/d]", "F4": "Yield [Nm³/kg]", "G4": "Biogas [Nm³/d]", "H4": "CH4 [%]",
    "I4": "CH4 [Nm³/d]",
    "A9": "Total / mean", "B9": "=SUM(B5:B8)", "E9": "=SUM(E5:E8)", "G9": "=SUM(G5:G8)",
    "H9": "=SUMPRODUCT(G5:G8,H5:H8)/G9", "I9": "=SUM(I5:I8)",
}
table(FEED, 5,
      [["Cattle slurry", 60, 8, 80, None, 0.25, None, 55],
       ["Maize silage", 18, 33, 95, None, 0.60, None, 52],
       ["Grass silage", 6, 30, 90, None, 0.55, None, 54],
       ["Food waste (depackaged)", 8, 22, 90, None, 0.70, None, 60]],
      {"E": "=B{r}*1000*C{r}/100*D{r}/100", "G": "=E{r}*F{r}", "I": "=G{r}*H{r}/100"})
FEED["E6"] = "=B6*1000*C6*D6/100"
FEED_PLANTS = {
    "Feed!E6": ("unit-scale", "maize: TS 33 % used as 33: VS 100 times too large"),
}

DIGESTER, DIGESTER_PLANTS = item_sheet(
    "Digester",
    "Millbrook: mesophilic digesters D1/D2, loading and heat demand (invented)",
    "Sources: HRT = V/Q, OLR = VS/V (Metcalf & Eddy, Wastewater Engineering, 5th ed., ch. 13); "
    "feed heating Φ = ṁ·c·(T_d − T_f), c ≈ 4.0 kJ/(kg·K) for slurry (common practice, from "
    "memory); wall, roof and floor loss Φ = U·A·ΔT (any heat transfer text); 86,400 s/d",
    [
        ("Digesters in service", "n", 2, "-"),
        ("Working volume, each", "V1", 2000, "m³"),
        ("Working volume, total", "V", "={n}*{V1}", "m³"),
        ("Feed, fresh mass", "m", "=Feed!B9", "t/d"),
        ("Feed density", "rho", 1.02, "t/m³"),
        ("Feed volume", "Q", "={m}/{rho}", "m³/d"),
        ("Hydraulic retention time", "HRT", "={V}/{Q}", "d"),
        ("VS load", "VS", "=Feed!E9", "kg/d"),
        ("Organic loading rate", "OLR", "={VS}/{V}", "kg/(m³·d)"),
        ("OLR check", None, '=IF({OLR}>3.5,"HIGH","OK")', None),
        ("Digester temperature", "T_d", 39, "°C"),
        ("Feed temperature, winter", "T_f", 8, "°C"),
        ("Specific heat of feed", "c", 4.0, "kJ/(kg·K)"),
        ("Feed heating", "P_f", "={m}*1000*{c}*({T_d}-{T_f})/86400", "kW"),
        ("Wall, roof and floor area, each", "A1", 1150, "m²"),
        ("Mean U-value", "U", 0.40, "W/(m²·K)"),
        ("Design ambient temperature", "T_a", -12, "°C"),
        ("Heat loss, both digesters", "P_l", "={n}*{U}*{A1}*({T_d}-{T_a})", "kW",
         "unit-scale", "U·A·ΔT in W written into a kW cell (no /1000)"),
        ("Heat demand, digesters", "P_h", "={P_f}+{P_l}", "kW"),
        ("Daily heat demand", "E_h", "={P_h}*24", "kWh/d"),
        ("Daily heat demand", "E_hMJ", "={E_h}*3.6", "MJ/d"),
    ])

GAS, GAS_PLANTS = item_sheet(
    "Gas",
    "Millbrook: biogas metering, normal volume and fuel energy (invented)",
    "Sources: normal state 0 °C and 1013.25 mbar (DIN 1343); V_N = V·273.15/(273.15 + t)·"
    "(p_b + p_g)/1013.25 (ideal gas, common practice); LHV of methane 35.8 MJ/Nm³ (ISO 6976, "
    "from memory); 1 kWh = 3.6 MJ (SI Brochure 9th ed., Table 8); 1 MJ/d = 1/86.4 kW",
    [
        ("Gas meter, actual volume", "Q_a", 6850, "m³/d"),
        ("Gas temperature at meter", "t_g", 35, "°C"),
        ("Gas pressure at meter", "p_g", 18, "mbar(g)"),
        ("Barometric pressure (site)", "p_b", 1005, "mbar"),
        ("Biogas, normal volume", "Q_N", "={Q_a}*273.15/(273.15+{t_g})*({p_b}+{p_g})/1013.25",
         "Nm³/d"),
        ("Expected meter reading from the feed table", "Q_ex",
         "=Feed!G9*{t_g}/273.15*1013.25/({p_b}+{p_g})", "m³/d",
         "offset-scale", "gas temperature in °C where the gas law needs K"),
        ("Metered over expected", "r_m", "={Q_a}/{Q_ex}", "-"),
        ("Biogas per hour", "Q_Nh", "={Q_N}*24", "Nm³/h",
         "unit-scale", "per day to per hour multiplied by 24: the factor the wrong way round"),
        ("CH4 content (analyser)", "x", 53.5, "%"),
        ("Methane, normal volume", "Q_CH4", "={Q_N}*{x}/100", "Nm³/d"),
        ("LHV of methane", "H_CH4", 35.8, "MJ/Nm³"),
        ("LHV of methane", "H_CH4k", "={H_CH4}/3.6", "kWh/Nm³"),
        ("LHV of biogas", "H_b", "={H_CH4k}*{x}/100", "kWh/Nm³"),
        ("Fuel energy available", "P_fuel", "={Q_N}*{H_b}/24", "kW"),
        ("Fuel energy, methane basis", "P_fuel2", "={Q_CH4}*{H_CH4}/24", "kW",
         "unit-scale", "MJ/Nm³ used as kWh/Nm³ in /24: 3.6 times too large"),
        ("Methane energy per day", "E_d", "={Q_CH4}*{H_CH4}", "MJ/d"),
        ("Fuel energy from MJ/d", "P_fuel3", "={E_d}/86.4", "kW"),
        ("Gas holder volume", "V_gh", 1200, "m³"),
        ("Storage time at mean production", "t_st", "={V_gh}/{Q_N}*24", "h"),
        ("Gas holder pressure", "p_gk", "={p_g}/10", "kPa(g)"),
    ])

CHP, CHP_PLANTS = item_sheet(
    "CHP",
    "Millbrook: 500 kW biogas engine CHP, output and annual yield (invented)",
    "Sources: engine data sheet (invented, typical of a 500 kW biogas engine, efficiencies on "
    "LHV per ISO 3046-1); P_el = η_el·P_fuel limited to the rating; P_th = η_th·P_fuel; heating "
    "water q[m³/h] = P_th[kW]/(1.163·ΔT), 1.163 kWh/(m³·K) for water (common practice); year "
    "of 8760 h",
    [
        ("Rated electrical output", "P_r", 500, "kW"),
        ("Electrical efficiency", "eta_el", 40.5, "%"),
        ("Thermal efficiency", "eta_th", 44.0, "%"),
        ("Fuel energy available", "P_f", "={Gas.P_fuel}", "kW"),
        ("Electrical output", "P_el", "=MIN({P_f}*{eta_el}/100,{P_r})", "kW"),
        ("Fuel used by the engine", "P_fu", "={P_el}/({eta_el}/100)", "kW"),
        ("Thermal output", "P_th", "={P_fu}*{eta_th}/100", "kW"),
        ("Surplus gas to boiler or flare", "P_sur", "=MAX({P_f}-{P_fu},0)", "kW"),
        ("Gas use at rated output", "Q_g", "={P_r}/({eta_el}/100)/{Gas.H_b}", "Nm³/h"),
        ("Overall efficiency", "eta_t", "=({P_el}+{P_th})/{P_fu}*100", "%"),
        ("Heat-to-power ratio", "r_hp", "={P_th}/{P_el}", "-"),
        ("Operating hours", "t", 8200, "h/yr"),
        ("Availability", "av", "={t}/8760*100", "%"),
        ("Annual electricity", "E_el", "={P_el}*{t}/1000", "MWh/yr"),
        ("Annual heat", "E_th", "={P_th}*{t}", "MWh/yr",
         "unit-scale", "kW × h/yr written as MWh/yr without /1000"),
        ("Parasitic load (mixers, pumps, blowers)", "x_p", 8, "%"),
        ("Net electricity export", "E_net", "={E_el}*(1-{x_p}/100)", "MWh/yr"),
        ("Electricity per tonne of feed", "e_t", "={E_el}*1000/{Digester.m}", "kWh/t",
         "unit-scale", "MWh per year over tonnes per day without /365"),
        ("Heat surplus after digester heating", "P_hs", "={P_th}-{Digester.P_h}", "kW"),
        ("Heating water flow temperature", "T_fl", 90, "°C"),
        ("Heating water return temperature", "T_rt", 70, "°C"),
        ("Heating water flow", "q_hw", "={P_th}/(1.163*({T_fl}-{T_rt}))", "m³/h"),
        ("Heating water flow for the pump schedule", "q_pump",
         "={P_th}/(4.19*({T_fl}-{T_rt}))", "m³/h",
         "unit-scale", "P/(4.19·ΔT) gives L/s, written as m³/h: 3.6 times too small"),
    ])

BOOK4 = {
    "name": "millbrook-biogas-chp",
    "trade": "biogas: co-digestion feed, digester heating, gas normalisation and CHP",
    "sheets": [("Feed", FEED), ("Digester", DIGESTER), ("Gas", GAS), ("CHP", CHP)],
    "names": {},
    "plants": {**FEED_PLANTS, **DIGESTER_PLANTS, **GAS_PLANTS, **CHP_PLANTS},
    "sidecar": [
        "# Units the biogas sheets use that plumb's table lacks (review 21)",
        "measure yr = 365 d \"year of 365 days (common practice)\"",
    ],
}

BOOKS = [BOOK1, BOOK2, BOOK3, BOOK4]


def main():
    for book in BOOKS:
        resolve(book["sheets"])
    manifest = {}
    for book in BOOKS:
        name = book["name"]
        write_xlsx(os.path.join(HERE, name + ".xlsx"), book["sheets"], book["names"])
        side = os.path.join(HERE, name + ".cells.plumb")
        if book["sidecar"]:
            with open(side, "w") as f:
                f.write("\n".join(book["sidecar"]) + "\n")
        elif os.path.exists(side):
            os.remove(side)
        formulas = {}
        for sheet, cells in book["sheets"]:
            for key, val in cells.items():
                if isinstance(val, str) and val.startswith("="):
                    formulas[f"{sheet}!{key}"] = val
        for cell in book["plants"]:
            assert cell in formulas, cell
        manifest[name] = {
            "trade": book["trade"],
            "planted": {c: {"rule": r, "what": w, "formula": formulas[c]}
                        for c, (r, w) in book["plants"].items()},
            "correct": {c: f for c, f in formulas.items() if c not in book["plants"]},
        }
        with open(os.path.join(HERE, name + ".planted"), "w") as f:
            f.write("# sheet!cell rule: the planted mistakes plumb must report; every other\n"
                    "# formula cell must stay clean (written by make_books.py)\n")
            for c, (r, w) in book["plants"].items():
                f.write(f"# planted: {w}\n{c} {r}\n")
    with open(os.path.join(HERE, "manifest.json"), "w") as f:
        json.dump(manifest, f, indent=1, ensure_ascii=False)
    for name, m in manifest.items():
        print(f"{name}: {len(m['planted'])} planted, {len(m['correct'])} correct formula cells")


if __name__ == "__main__":
    main()
