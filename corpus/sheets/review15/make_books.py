#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review58), written with the
standard zipfile module (corpus/sheets/xlsx_writer.py, shared by the review books).

Trades: a farm's irrigation schedule; an LED lighting retrofit; a ground-source heat pump's
borehole field; a bolted steel beam splice schedule. All scenarios, sites, catalogue data and
readings are invented and for demonstration only; the formulas and published factors are the
trade's own, with sources named in a text cell at the top of each sheet ("from memory" where a
value was recalled and not checked, "common practice" where the trade has no single source).

A dimensionally consistent formula can still be wrong: this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
should stay clean. The findings plumb makes beyond the planted ones are recorded, with a
reviewer's judgement on each, in EXTRA below and written into each book's .expect file.

Run: python3 make_books.py  ->  *.xlsx, *.cells.plumb, *.expect, expect.json in this folder
"""
import json
import os
import re

import sys
sys.path.insert(0, os.path.dirname(os.path.dirname(os.path.abspath(__file__))))
from xlsx_writer import write_xlsx  # noqa: E402 (the shared writer in corpus/sheets)

HERE = os.path.dirname(os.path.abspath(__file__))

CAUTION = ("Invented scenario: names, sizes, readings and prices are invented for demonstration "
           "only. A dimensionally consistent formula can still be wrong; this check does not "
           "replace independent review under local codes and licensed practice.")


class ItemSheet:
    """An 'Item | Symbol | Value | Unit' sheet. Formulas name other rows as {key}; planted rows
    carry (rule, what)."""

    def __init__(self, name, title, sources, first_row=5):
        self.name = name
        self.cells = {"A1": title, "A2": sources, "A3": CAUTION,
                      f"A{first_row - 1}": "Item", f"B{first_row - 1}": "Symbol",
                      f"C{first_row - 1}": "Value", f"D{first_row - 1}": "Unit"}
        self.row = first_row
        self.keys = {}
        self.pending = []
        self.planted = {}

    def add(self, key, label, symbol, value, unit=None, planted=None):
        r = self.row
        self.row += 1
        self.keys[key] = r
        self.cells[f"A{r}"] = label
        self.cells[f"B{r}"] = symbol
        self.pending.append((r, value))
        if unit is not None:
            self.cells[f"D{r}"] = unit
        if planted:
            self.planted[f"{self.name}!C{r}"] = planted
        return r

    def ref(self, key, absolute=True):
        r = self.keys[key]
        return f"{self.name}!$C${r}" if absolute else f"{self.name}!C{r}"

    def finish(self, outside=None):
        outside = outside or {}

        def sub(m):
            k = m.group(1)
            if k in self.keys:
                return f"C{self.keys[k]}"
            return outside[k]

        for r, value in self.pending:
            if isinstance(value, str) and value.startswith("="):
                value = re.sub(r"\{([A-Za-z0-9_]+)\}", sub, value)
            self.cells[f"C{r}"] = value
        return self.cells


# --------------------------------------------------------------------------------------------
# Book 1: a farm's irrigation schedule (mm/d, ha and acres, m³, L/s, m³/h, gpm, kPa(g), kW)
# --------------------------------------------------------------------------------------------
IRR_SRC = ("Sources: FAO Irrigation and Drainage Paper 56 (Allen et al., 1998): ETc = Kc·ET0 "
           "(eq. 56), mid-season Kc of Table 12 (values from memory), atmospheric pressure P = "
           "101.3·((293 − 0.0065·z)/293)^5.26 kPa (eq. 7) and saturation vapour pressure e° = "
           "0.6108·exp(17.27·T/(T + 237.3)) kPa with T in °C (eq. 11). Gross depth = net depth ÷ "
           "application efficiency; 1 mm over 1 ha = 10 m³: common practice. US check Q·t = "
           "453·A·d (gpm, h, acres, in): USDA NRCS National Engineering Handbook Part 652 "
           "(Irrigation Guide), from memory. NIST SP 811 (2008) App. B.8: 1 acre = 0.4047 ha, "
           "1 in = 25.4 mm, 1 gpm = 0.0631 L/s, 1 L/s = 15.85 gpm, 1 hp = 0.7457 kW. Pump power "
           "ρ·g·Q·H/η and NPSHa = (p_s + p_atm − p_v)/(ρ·g) − losses: Karassik, Pump Handbook "
           "(4th ed., 2008). 80 % pivot application efficiency and 20 h/d pumping limit: common "
           "practice. Station ET0, areas, pumps and pressures: invented.")
sch = ItemSheet("Schedule", "Karrow Flats farm: centre-pivot irrigation schedule for the "
                "peak week (invented scenario)", IRR_SRC)
sch.add("et0", "Reference evapotranspiration, 7-day mean (farm station)", "ET0", 6.2, "mm/d")
sch.add("int", "Irrigation interval", "I", 5, "d")
sch.add("pe", "Effective rainfall in the interval", "P_e", 4, "mm")
sch.add("ea", "Application efficiency (centre pivot)", "E_a", 80, "%")
sch.add("A", "Irrigated area (from Fields)", "A", "=Fields!D10", "ha")
sch.add("A2", "Irrigated area, owned plus leased (lease schedule)", "A_2",
        "=SUM(Fields!D5:D7)+SUM(Fields!C8:C9)", "ha",
        planted=("unit-scale", "leased blocks in acres added to owned fields in ha"))
sch.add("Aac", "Irrigated area, acres", "A_ac", "={A}/0.4047", "acres")
sch.add("V", "Gross volume per interval (from Fields)", "V", "=Fields!I10", "m³")
sch.add("dg", "Mean gross depth", "d_g", "={V}/({A}*10)", "mm")
sch.add("din", "Mean gross depth, inches", "d_in", "={dg}/25.4", "in")
sch.add("din2", "Mean gross depth, inches (US pivot chart)", "d_in2", "={dg}*25.4", "in",
        planted=("unit-scale", "mm to in multiplied by 25.4: wrong way round"))
sch.add("Q1", "Pump P1 duty flow", "Q_1", 130, "L/s")
sch.add("Q2g", "Pump P2 duty flow (US nameplate)", "Q_2g", 1400, "gpm")
sch.add("Q2", "Pump P2 duty flow", "Q_2", "={Q2g}*0.0631", "L/s")
sch.add("Q2b", "Pump P2 duty flow (old pump schedule)", "Q_2b", "={Q2g}/0.0631", "L/s",
        planted=("unit-scale", "gpm to L/s divided by 0.0631: wrong way round"))
sch.add("Qt", "Combined flow, both pumps", "Q_t", "={Q1}+{Q2}", "L/s")
sch.add("Qth", "Combined flow, m³/h", "Q_th", "={Qt}*3.6", "m³/h")
sch.add("Qtg", "Combined flow, gpm", "Q_tg", "={Qt}*15.85", "gpm")
sch.add("tr", "Pumping hours per interval", "t_p", "={V}/{Qth}", "h")
sch.add("tr2", "Pumping hours per interval (quick)", "t_p2", "={V}/{Qt}", "h",
        planted=("unit-scale", "m³ divided by L/s taken as hours: the 3.6 is missing"))
sch.add("tus", "Pumping hours, US check (Q·t = 453·A·d)", "t_us", "=453*{Aac}*{din}/{Qtg}", "h")
sch.add("hd", "Pumping hours per day", "t_d", "={tr}/{int}", "h/d")
sch.add("ok", "Pumping time check", "check", "=IF({hd}>20,\"EXTEND INTERVAL\",\"OK\")")
sch.add("rho", "Water density at 24 °C", "rho", 997, "kg/m³")
sch.add("g", "Gravity", "g", 9.81, "m/s²")
sch.add("z", "Static lift, pump to highest pivot pad", "z", 14, "m")
sch.add("hf", "Friction loss, mainline at combined flow (supplier)", "h_f", 9.5, "m")
sch.add("pp", "Pivot inlet pressure (gauge, nozzle package)", "p_p", 250, "kPa(g)")
sch.add("hp", "Pivot inlet pressure as head", "h_p", "={pp}*1000/({rho}*{g})", "m")
sch.add("H", "Total dynamic head", "H", "={z}+{hf}+{hp}", "m")
sch.add("etp", "Pump efficiency at duty (both pumps)", "eta_p", 74, "%")
sch.add("P", "Pump shaft power", "P", "={rho}*{g}*{Qt}/1000*{H}/({etp}/100)/1000", "kW")
sch.add("etm", "Motor efficiency", "eta_m", 93, "%")
sch.add("Pdr", "Pivot tower drive motors (10 × 0.55 kW)", "P_dr", 5500, "W")
sch.add("Pe", "Electrical demand", "P_e", "={P}/({etm}/100)+{Pdr}/1000", "kW")
sch.add("Pe2", "Electrical demand (panel schedule)", "P_e2", "={P}/({etm}/100)+{Pdr}", "kW",
        planted=("unit-scale", "tower drives in W added to kW"))
sch.add("E", "Energy per interval", "E", "={Pe}*{tr}", "kWh")
sch.add("zs", "Site elevation", "z_s", 420, "m")
sch.add("pa", "Atmospheric pressure at site (FAO-56 eq. 7)", "p_atm",
        "=101.3*((293-0.0065*{zs})/293)^5.26", "kPa")
sch.add("Tw", "Water temperature", "T_w", 24, "°C")
sch.add("pv", "Vapour pressure of water (FAO-56 eq. 11)", "p_v",
        "=0.6108*EXP(17.27*{Tw}/({Tw}+237.3))", "kPa")
sch.add("ps", "Suction pressure from the scheme pipeline", "p_s", 35, "kPa(g)")
sch.add("hs", "Suction line losses", "h_s", 0.8, "m")
sch.add("npa", "NPSH available", "NPSHa", "=({ps}+{pa}-{pv})*1000/({rho}*{g})-{hs}", "m")
sch.add("npa2", "NPSH available (commissioning sheet)", "NPSHa2",
        "=({ps}-{pv})*1000/({rho}*{g})-{hs}", "m",
        planted=("offset-scale", "gauge suction pressure beside the absolute vapour pressure"))
sch.add("npr", "NPSH required (pump curve at duty)", "NPSHr", 4.6, "m")
sch.add("npc", "NPSH check (0.5 m margin)", "check",
        "=IF({npa}>={npr}+0.5,\"OK\",\"CAVITATION RISK\")")
SCHED = sch.finish()

FIELDS = {
    "A1": "Karrow Flats farm: gross application by field for one interval",
    "A2": ("Sources: as the Schedule sheet: ETc = Kc·ET0 and Kc mid from FAO-56 Table 12 (from "
           "memory); gross = net ÷ Ea; 1 mm on 1 ha = 10 m³ (common practice); 1 acre = 0.4047 "
           "ha (NIST SP 811, 2008). Leased blocks are surveyed in acres. Areas invented."),
    "A3": CAUTION,
    "A4": "Field", "B4": "Crop", "C4": "Area [acres]", "D4": "Area [ha]", "E4": "Kc mid [-]",
    "F4": "ETc [mm/d]", "G4": "Net depth [mm]", "H4": "Gross depth [mm]", "I4": "Volume [m³]",
    "A10": "Total",
    "D10": "=SUM(D5:D9)", "I10": "=SUM(I5:I9)",
}
r_et0, r_int, r_pe, r_ea = (sch.keys[k] for k in ("et0", "int", "pe", "ea"))
for r, (field, crop, acres, ha) in enumerate([
        ("North pivot", "Maize (grain)", None, 48.0),
        ("Home block", "Potato", None, 32.5),
        ("River flats", "Alfalfa", None, 41.0),
        ("Leased: Tanner's", "Spring wheat", 60, None),
        ("Leased: old dairy", "Sugar beet", 45, None)], start=5):
    FIELDS[f"A{r}"] = field
    FIELDS[f"B{r}"] = crop
    if acres is not None:
        FIELDS[f"C{r}"] = acres
        FIELDS[f"D{r}"] = f"=C{r}*0.4047"
    else:
        FIELDS[f"D{r}"] = ha
    FIELDS[f"E{r}"] = f"=VLOOKUP(B{r},Crops!$A$5:$D$9,3,FALSE)"
    FIELDS[f"F{r}"] = f"=E{r}*Schedule!$C${r_et0}"
    FIELDS[f"G{r}"] = f"=F{r}*Schedule!$C${r_int}-Schedule!$C${r_pe}"
    FIELDS[f"H{r}"] = f"=G{r}/(Schedule!$C${r_ea}/100)"
    FIELDS[f"I{r}"] = f"=H{r}*D{r}*10"
FIELDS["D9"] = "=C9/0.4047"                       # planted: acres to ha the wrong way round
FIELDS["H6"] = f"=G6/Schedule!$C${r_ea}"          # planted: 80 % used as 80
FIELDS["I7"] = "=H7*D7"                           # planted: mm × ha without the 10

CROPS = {
    "A1": "Crop coefficients, FAO-56 Table 12 (single Kc, from memory; check against the paper)",
    "A3": "Crop", "A4": "Crop", "B4": "Kc ini [-]", "C4": "Kc mid [-]", "D4": "Kc end [-]",
}
del CROPS["A3"]
for r, (crop, ki, km, ke) in enumerate([
        ("Maize (grain)", 0.30, 1.20, 0.60), ("Potato", 0.50, 1.15, 0.75),
        ("Alfalfa", 0.40, 0.95, 0.90), ("Spring wheat", 0.30, 1.15, 0.40),
        ("Sugar beet", 0.35, 1.20, 0.70)], start=5):
    CROPS[f"A{r}"], CROPS[f"B{r}"], CROPS[f"C{r}"], CROPS[f"D{r}"] = crop, ki, km, ke

IRRIGATION = {
    "trade": "agriculture: centre-pivot irrigation schedule, pumps and NPSH",
    "sheets": [("Schedule", SCHED), ("Fields", FIELDS), ("Crops", CROPS)],
    "planted": {**sch.planted,
                "Fields!D9": ("unit-scale", "acres to ha divided by 0.4047: wrong way round"),
                "Fields!H6": ("unit-scale", "80 % used as 80: gross depth 100 too small"),
                "Fields!I7": ("unit-scale", "mm × ha gives m³ only with the 10: 10 too small")},
}

# --------------------------------------------------------------------------------------------
# Book 2: LED lighting retrofit (lm, lx and fc, m² and ft², W and kW, kWh/yr, $)
# --------------------------------------------------------------------------------------------
LED_SRC = ("Sources: IES Lighting Handbook (10th ed., 2011), lumen method: N = E·A/(Φ·CU·LLF) and "
           "E = N·Φ·CU·LLF/A, LLF = LLD·LDD. NIST SP 811 (2008) App. B.8: 1 fc = 1 lm/ft² = "
           "10.764 lx, 1 m² = 10.764 ft². ANSI/ASHRAE/IES 90.1-2019 Table 9.5.1, office "
           "allowance 0.64 W/ft² (building area method): from memory. F32T8 lamp 2800 lm, "
           "ballast factor 0.88 and 86 W per three-lamp troffer: from memory of lamp and "
           "ballast catalogues. LED troffer 4200 lm / 33 W, CU 0.72: invented maker's data. "
           "20 % occupancy-sensor saving, LLD 0.90 at L90 and LDD 0.90 for a clean office: "
           "common practice. Grid factor 0.39 kg CO₂/kWh: from memory (a US average of the "
           "2020s). Tariff, hours and quote: invented.")
led = ItemSheet("Retrofit", "Alder Street offices, floor 2: T8 to LED troffer retrofit "
                "(invented scenario)", LED_SRC)
led.add("nl", "Lamps per existing 2×4 troffer", "n_l", 3, "-")
led.add("phl", "Rated output per F32T8 lamp", "Phi_l", 2800, "lm")
led.add("bf", "Ballast factor (instant start, normal output)", "BF", 0.88, "-")
led.add("pho", "Existing troffer output", "Phi_o", "={nl}*{phl}*{bf}", "lm")
led.add("Po1", "Existing troffer input (lamps and ballast)", "P_o", 86, "W")
led.add("efo", "Existing troffer efficacy", "eff_o", "={pho}/{Po1}", "lm/W")
led.add("phn", "LED troffer output", "Phi_n", 4200, "lm")
led.add("Pn1", "LED troffer input", "P_n", 33, "W")
led.add("efn", "LED troffer efficacy", "eff_n", "={phn}/{Pn1}", "lm/W")
led.add("cu", "Coefficient of utilisation (RCR 2, 80/50/20)", "CU", 0.72, "-")
led.add("lld", "Lamp lumen depreciation (L90)", "LLD", 0.90, "-")
led.add("ldd", "Luminaire dirt depreciation (clean office)", "LDD", 0.90, "-")
led.add("llf", "Light loss factor", "LLF", "={lld}*{ldd}", "-")
led.add("N", "Troffers replaced (from Rooms)", "N", "=Rooms!I9", "-")
led.add("Af", "Floor area retrofitted (from Rooms)", "A", "=Rooms!D9", "m²")
led.add("Aft", "Floor area, ft²", "A_ft", "={Af}*10.764", "ft²")
led.add("Pko", "Existing connected load", "P_ko", "={N}*{Po1}/1000", "kW")
led.add("Pkn", "LED connected load", "P_kn", "={N}*{Pn1}/1000", "kW")
led.add("dP", "Demand reduction", "dP", "={Pko}-{Pkn}", "kW")
led.add("dP2", "Demand reduction (utility rebate form)", "dP_2", "={Pko}-{N}*{Pn1}", "kW",
        planted=("unit-scale", "LED load in W taken from the existing load in kW"))
led.add("hy", "Annual operating hours (14 h × 260 d)", "t_y", 3640, "h/yr")
led.add("Eo", "Existing energy use", "E_o", "={Pko}*{hy}", "kWh/yr")
led.add("Eo2", "Existing energy use (audit form)", "E_o2", "={N}*{Po1}*{hy}", "kWh/yr",
        planted=("unit-scale", "W × h/yr typed as kWh/yr: 1000 too large"))
led.add("ctl", "Occupancy sensor saving", "s_c", 20, "%")
led.add("En", "LED energy use with sensors", "E_n", "={Pkn}*{hy}*(1-{ctl}/100)", "kWh/yr")
led.add("En2", "LED energy use with sensors (rev. A)", "E_n2", "={Pkn}*{hy}*(1-{ctl})", "kWh/yr",
        planted=("unit-scale", "20 % used as 20 in (1 − s)"))
led.add("dE", "Annual energy saving", "dE", "={Eo}-{En}", "kWh/yr")
led.add("dEM", "Annual energy saving, MWh", "dE_M", "={dE}/1000", "MWh/yr")
led.add("tar", "Blended electricity tariff", "c_e", 0.13, "$/kWh")
led.add("S", "Annual cost saving", "S", "={dE}*{tar}", "$/yr")
led.add("cost", "Installed cost net of utility rebate (contractor quote)", "C", 14800, "$")
led.add("pb", "Simple payback", "t_pb", "={cost}/{S}", "yr")
led.add("ef", "Grid emission factor", "f_CO2", 0.39, "kg/kWh")
led.add("co2", "CO₂ avoided", "m_CO2", "={dE}*{ef}/1000", "t/yr")
led.add("co22", "CO₂ avoided (sustainability report)", "m_CO2b", "={dE}*{ef}", "t/yr",
        planted=("unit-scale", "kg/yr typed as t/yr: 1000 too large"))
led.add("lpd", "Lighting power density, LED", "LPD", "={N}*{Pn1}/{Aft}", "W/ft²")
led.add("lpdm", "Lighting power density, LED, W/m²", "LPD_m", "={lpd}*10.764", "W/m²")
led.add("lpdm2", "Lighting power density, W/m² (tenant's EU report)", "LPD_m2",
        "={lpd}/10.764", "W/m²",
        planted=("unit-scale", "W/ft² to W/m² divided by 10.764: wrong way round"))
led.add("lim", "LPD allowance, office (building area method)", "LPD_max", 0.64, "W/ft²")
led.add("chk", "LPD compliance", "check", "=IF({lpd}<={lim},\"COMPLIES\",\"EXCEEDS\")")
led.add("Eav", "Mean maintained illuminance", "E_av", "=AVERAGE(Rooms!J5:J8)", "lx")
led.add("Eav2", "Mean design illuminance (summary page)", "E_av2", "=AVERAGE(Rooms!F5:G8)", "lx",
        planted=("sum-mismatch", "range runs over the lx and the fc columns"))
RETRO = led.finish()

ROOMS = {
    "A1": "Alder Street offices, floor 2: troffers by room (lumen method)",
    "A2": ("Sources: as the Retrofit sheet: IES Lighting Handbook (10th ed.) lumen method; 1 fc = "
           "10.764 lx and 1 m² = 10.764 ft² (NIST SP 811, 2008). Room sizes and targets "
           "invented; targets in the range of IES RP-1 for offices (from memory)."),
    "A3": CAUTION,
    "A4": "Room", "B4": "Length [m]", "C4": "Width [m]", "D4": "Area [m²]", "E4": "Area [ft²]",
    "F4": "Target [lx]", "G4": "Target [fc]", "H4": "Troffers needed [-]",
    "I4": "Troffers installed [-]", "J4": "Maintained [lx]", "K4": "LPD [W/m²]",
    "A9": "Total",
    "D9": "=SUM(D5:D8)", "E9": "=SUM(E5:E8)", "I9": "=SUM(I5:I8)",
}
phn, cu, llf, pn1 = (led.ref(k) for k in ("phn", "cu", "llf", "Pn1"))
for r, (room_, L, W, E, n) in enumerate([
        ("Open office", 24, 15, 400, 60), ("Conference A", 8, 6, 300, 6),
        ("Corridor", 30, 2.4, 100, 4), ("Copy and print", 6, 5, 300, 4)], start=5):
    ROOMS[f"A{r}"] = room_
    ROOMS[f"B{r}"] = L
    ROOMS[f"C{r}"] = W
    ROOMS[f"D{r}"] = f"=B{r}*C{r}"
    ROOMS[f"E{r}"] = f"=D{r}*10.764"
    ROOMS[f"F{r}"] = E
    ROOMS[f"G{r}"] = f"=F{r}/10.764"
    ROOMS[f"H{r}"] = f"=ROUNDUP(F{r}*D{r}/({phn}*{cu}*{llf}),0)"
    ROOMS[f"I{r}"] = n
    ROOMS[f"J{r}"] = f"=I{r}*{phn}*{cu}*{llf}/D{r}"
    ROOMS[f"K{r}"] = f"=I{r}*{pn1}/D{r}"
ROOMS["G6"] = "=F6*10.764"                                  # planted: lx to fc wrong way
ROOMS["E7"] = "=D7*3.281"                                   # planted: length factor on an area
ROOMS["J8"] = f"=I8*{phn}*{cu}*{llf}/E8"                    # planted: lm/ft² into the lx column
ROOMS["H7"] = f"=ROUNDUP(G7*D7/({phn}*{cu}*{llf}),0)"      # planted: fc target over an m² area

LIGHTING = {
    "trade": "building services: LED troffer retrofit, lumen method, energy and payback",
    "sheets": [("Retrofit", RETRO), ("Rooms", ROOMS)],
    "sidecar": ('# led-retrofit.cells.plumb: units the workbook uses that plumb\'s table lacks '
                '(review58)\n'
                'measure fc = 1 lm/ft^2 "footcandle (NIST SP 811 (2008), B.8: 1 fc = 10.76391 '
                'lx)"\n'
                'measure yr = 365 d "year of 365 days, for annual energy (common practice)"\n'),
    "planted": {**led.planted,
                "Rooms!G6": ("unit-scale", "lx to fc multiplied by 10.764: wrong way round"),
                "Rooms!E7": ("unit-scale", "m² to ft² with the length factor 3.281"),
                "Rooms!J8": ("unit-scale", "lumens over ft² give fc, written under lx"),
                "Rooms!H7": ("unit-scale", "fc target times an area in m²: count 10.764 too "
                             "small")},
}

# --------------------------------------------------------------------------------------------
# Book 3: ground-source heat pump borehole field (kW, Btu/h, TR, COP, EER, L/s, °C, K, psig)
# --------------------------------------------------------------------------------------------
GS_SRC = ("Sources: ASHRAE Handbook—HVAC Applications (2019) ch. 35 'Geothermal energy': ground "
          "load Q·(1 − 1/COP) heating and Q·(1 + 1/COP) cooling; bore field by specific "
          "extraction (W/m) after MCS MIS 3005 (UK) tables, from memory, checked against a "
          "rule of thumb in m per kW (common practice); ft per ton of cooling, common "
          "practice in the US trade. NIST SP 811 (2008) App. B.8: 1 kW = 3412 Btu/h, 1 ton of "
          "refrigeration = 12 000 Btu/h, 1 m = 3.281 ft, 1 L/s = 15.85 gpm; EER in Btu/(W·h) "
          "÷ 3.412 = COP. Carnot COP = T_c/(T_c − T_e) in kelvin (any thermodynamics text, e.g. "
          "Çengel & Boles, 9th ed.). Propylene glycol–water density, specific heat, viscosity "
          "and freezing point by concentration (Glycol sheet): from memory of ASHRAE Handbook—"
          "Fundamentals (2017) ch. 31 tables. Re ≥ 2500 in U-tubes and a 5 K freeze margin: "
          "common practice. Expansion tank acceptance 1 − P_f/P_o with absolute pressures, "
          "14.7 psi atmosphere: ASHRAE Handbook—HVAC Systems and Equipment (2020) ch. 13. "
          "Loads and ratings: invented.")
gs = ItemSheet("Design", "Hollin Lane primary school: ground-source heat pump bore field "
               "(invented scenario)", GS_SRC)
gs.add("Qh", "Peak heating load (from Zones)", "Q_h", "=Zones!B10", "kW")
gs.add("div", "Diversity on the zone cooling loads", "div", 85, "%")
gs.add("Qc", "Peak block cooling load", "Q_c", "=Zones!D10*{div}/100", "kW")
gs.add("QcB", "Peak block cooling load, Btu/h (US check)", "Q_cB", "={Qc}*3412", "Btu/h")
gs.add("QcT", "Peak block cooling load, tons", "Q_cT", "={QcB}/12000", "TR")
gs.add("Qc2", "Peak block cooling load (from the US schedule)", "Q_c2",
       "=Zones!C10/3412/1000*{div}/100", "kW",
       planted=("unit-scale", "Btu/h to kW divided by 3412 and again by 1000: doubled"))
gs.add("COPh", "Heat pump COP, heating (B0/W35 rating)", "COP_h", 4.3, "-")
gs.add("EER", "Heat pump EER, cooling (ISO 13256-1 rating)", "EER", 17.1, "Btu/(W·h)")
gs.add("COPc", "Heat pump COP, cooling", "COP_c", "={EER}/3.412", "-")
gs.add("COPc2", "Heat pump COP, cooling (vendor summary)", "COP_c2", "={EER}*3.412", "-",
       planted=("unit-scale", "EER to COP multiplied by 3.412: wrong way round"))
gs.add("Qx", "Ground heat extraction, heating", "Q_x", "={Qh}*(1-1/{COPh})", "kW")
gs.add("Qr", "Ground heat rejection, cooling", "Q_r", "={Qc}*(1+1/{COPc})", "kW")
gs.add("Pel", "Compressor input, heating", "P_el", "={Qh}/{COPh}", "kW")
gs.add("Tc", "Condensing temperature (W35 flow)", "T_c", 38, "°C")
gs.add("Te", "Evaporating temperature", "T_e", -6, "°C")
gs.add("COPC", "Carnot COP, heating", "COP_C", "=({Tc}+273.15)/({Tc}-{Te})", "-")
gs.add("COPC2", "Carnot COP, heating (check)", "COP_C2", "={Tc}/({Tc}-{Te})", "-",
       planted=("offset-scale", "condensing temperature in °C where the ratio wants K"))
gs.add("eta2", "Second-law efficiency", "eta_II", "={COPh}/{COPC}*100", "%")
gs.add("EWT", "Fluid entering heat pump (from loop)", "T_in", 2, "°C")
gs.add("LWT", "Fluid leaving heat pump (to loop)", "T_out", -1, "°C")
gs.add("dT", "Fluid temperature drop", "dT", "={EWT}-{LWT}", "K")
gs.add("conc", "Propylene glycol concentration (by mass)", "x_g", 25, "%")
gs.add("rho", "Glycol mixture density at 0 °C", "rho", "=VLOOKUP({conc},Glycol!$A$5:$E$9,2,FALSE)",
       "kg/m³")
gs.add("cp", "Glycol mixture specific heat at 0 °C", "c_p",
       "=VLOOKUP({conc},Glycol!$A$5:$E$9,3,FALSE)", "kJ/(kg·K)")
gs.add("mu", "Glycol mixture viscosity at 0 °C", "mu", "=VLOOKUP({conc},Glycol!$A$5:$E$9,4,FALSE)",
       "mPa·s")
gs.add("Tf", "Glycol mixture freezing point", "T_f", "=VLOOKUP({conc},Glycol!$A$5:$E$9,5,FALSE)",
       "°C")
gs.add("V", "Loop fluid flow", "V", "={Qx}/({rho}*{cp}*{dT})*1000", "L/s")
gs.add("V2", "Loop fluid flow (from entering temperature)", "V_2",
       "={Qx}/({rho}*{cp}*{EWT})*1000", "L/s",
       planted=("offset-scale", "entering temperature in °C where the formula wants ΔT"))
gs.add("Vh", "Loop fluid flow, m³/h", "V_h", "={V}*3.6", "m³/h")
gs.add("Vg", "Loop fluid flow, gpm", "V_g", "={V}*15.85", "gpm")
gs.add("qb", "Specific heat extraction (λ 2.0 W/(m·K), 1800 h/yr)", "q_b", 45, "W/m")
gs.add("Lb", "Bore length, by specific extraction", "L_b", "={Qx}*1000/{qb}", "m")
gs.add("Lb2", "Bore length, by specific extraction (quick)", "L_b2", "={Qx}/{qb}", "m",
       planted=("unit-scale", "kW divided by W/m: 1000 too small"))
gs.add("spec", "Bore length per kW extracted (rule of thumb)", "l_kW", 22, "m/kW")
gs.add("Lc", "Bore length, by rule of thumb", "L_c", "={Qx}*{spec}", "m")
gs.add("L", "Design bore length", "L", "=MAX({Lb},{Lc})", "m")
gs.add("Lft", "Design bore length, ft", "L_ft", "={L}*3.281", "ft")
gs.add("fpt", "Bore length per ton of block cooling", "l_ton", "={Lft}/{QcT}", "ft/ton")
gs.add("D", "Bore depth (drilling rig limit)", "D", 120, "m")
gs.add("nb", "Number of bores", "n_b", "=ROUNDUP({L}/{D},0)", "-")
gs.add("Vb", "Flow per bore (U-tubes in parallel)", "V_b", "={V}/{nb}", "L/s")
gs.add("di", "U-tube inside diameter (32 mm SDR 11)", "d_i", 26.2, "mm")
gs.add("v", "Velocity in the U-tube", "v", "={Vb}/1000/(PI()*({di}/1000)^2/4)", "m/s")
gs.add("Re", "Reynolds number in the U-tube", "Re", "={rho}*{v}*({di}/1000)/({mu}/1000)", "-")
gs.add("Re2", "Reynolds number (commissioning sheet)", "Re_2", "={rho}*{v}*({di}/1000)/{mu}",
       "-", planted=("unit-scale", "viscosity in mPa·s used as Pa·s: Re 1000 too small"))
gs.add("flow", "Flow regime", "check", "=IF({Re}>=2500,\"TURBULENT\",\"LAMINAR: RAISE FLOW\")")
gs.add("dTm", "Freeze margin required", "dT_m", 5, "K")
gs.add("fz", "Freeze protection", "check", "=IF({Tf}<={LWT}-{dTm},\"OK\",\"INCREASE GLYCOL\")")
gs.add("pfg", "Loop fill pressure (cold)", "p_f", 12, "psig")
gs.add("pmg", "Relief valve setting", "p_o", 30, "psig")
gs.add("pfa", "Fill pressure, absolute", "P_f", "={pfg}+14.7", "psia")
gs.add("pma", "Relief pressure, absolute", "P_o", "={pmg}+14.7", "psia")
gs.add("af", "Expansion tank acceptance factor", "AF", "=1-{pfa}/{pma}", "-")
gs.add("af2", "Expansion tank acceptance factor (installer)", "AF_2", "=1-{pfg}/{pmg}", "-",
       planted=("offset-scale", "gauge pressures in a ratio that wants absolute"))
gs.add("dpl", "Loop pressure drop at design flow", "dp", 180, "kPa")
gs.add("etp", "Circulator wire-to-water efficiency", "eta_p", 45, "%")
gs.add("Pp", "Circulator power", "P_p", "={V}/1000*{dpl}/({etp}/100)", "kW")
gs.add("Pp2", "Circulator power (pump schedule)", "P_p2", "={V}*{dpl}/({etp}/100)", "kW",
       planted=("unit-scale", "L/s × kPa gives W, written as kW: 1000 too large"))
DESIGN = gs.finish()

ZONES = {
    "A1": "Hollin Lane primary school: zone loads (heating from the UK load calc, cooling from "
          "the US-built packaged units' schedule; heating restated in Btu/h for the US vendor)",
    "A2": ("Sources: 1 kW = 3412 Btu/h (NIST SP 811, 2008, App. B.8). Loads invented."),
    "A3": CAUTION,
    "A4": "Zone", "B4": "Heating [kW]", "C4": "Cooling [Btu/h]", "D4": "Cooling [kW]",
    "E4": "Heating [Btu/h]",
    "A10": "Total",
    "B10": "=SUM(B5:B9)", "C10": "=SUM(C5:C9)", "D10": "=SUM(D5:D9)",
}
for r, (zone, qh, qc) in enumerate([
        ("Classrooms, east wing", 48, 150000), ("Classrooms, west wing", 44, 140000),
        ("Hall", 36, 120000), ("Offices and staff room", 22, 68000),
        ("Library and ICT", 18, 56000)], start=5):
    ZONES[f"A{r}"], ZONES[f"B{r}"], ZONES[f"C{r}"] = zone, qh, qc
    ZONES[f"D{r}"] = f"=C{r}/3412"
    ZONES[f"E{r}"] = f"=B{r}*3412"
ZONES["E7"] = "=B7*3.412"          # planted: the W factor on kW, into Btu/h

GLYCOL = {
    "A1": "Propylene glycol and water at 0 °C, by mass concentration (from memory of ASHRAE "
          "Handbook—Fundamentals (2017) ch. 31; approximate, check against the Handbook)",
    "A4": "Concentration [%]", "B4": "Density [kg/m³]", "C4": "Specific heat [kJ/(kg·K)]",
    "D4": "Viscosity [mPa·s]", "E4": "Freezing point [°C]",
}
for r, row in enumerate([(20, 1022, 3.98, 3.9, -7), (25, 1027, 3.93, 4.9, -10),
                         (30, 1032, 3.87, 6.2, -13), (35, 1036, 3.80, 7.9, -17),
                         (40, 1040, 3.72, 10.0, -21)], start=5):
    for col, v in zip("ABCDE", row):
        GLYCOL[f"{col}{r}"] = v

GSHP = {
    "trade": "building services: ground-source heat pump loads, loop flow and bore field",
    "sheets": [("Design", DESIGN), ("Zones", ZONES), ("Glycol", GLYCOL)],
    "planted": {**gs.planted,
                "Zones!E7": ("unit-scale", "kW × 3.412 gives thousands of Btu/h, written under Btu/h")},
}

# --------------------------------------------------------------------------------------------
# Book 4: bolted steel beam splice (kN, kip, MPa, ksi, mm², in², mm, in, N·m)
# --------------------------------------------------------------------------------------------
ST_SRC = ("Sources: EN 1993-1-8:2005 Table 3.4 (shear F_v,Rd = α_v·f_ub·A_s/γ_M2 with α_v = 0.6 "
          "for grade 8.8 through the threads; bearing F_b,Rd = k1·α_b·f_u·d·t/γ_M2, α_b = min("
          "e1/(3·d0); f_ub/f_u; 1) for end bolts, k1 = min(2.8·e2/d0 − 1.7; 2.5) for edge "
          "bolts; γ_M2 = 1.25) and 3.6.1 / EN 1090-2 (preload F_p,C = 0.7·f_ub·A_s). EN "
          "1993-1-1 Table 3.1: S355, f_u = 490 MPa for t ≤ 40 mm (from memory). Stress areas "
          "of ISO metric bolts (EN ISO 898-1): from memory. Torque T = k·d·F_p, k ≈ 0.20: "
          "common practice. Fabricator's US check to ANSI/AISC 360-16 J3.6 and J3.10: φR_n = "
          "0.75·F_nv·A_b with F_nv = 54 ksi for A325-N (Table J3.2), bearing φ·2.4·d·t·F_u. "
          "NIST SP 811 (2008) App. B.8: 1 kN = 0.2248 kip, 1 MPa = 0.145 ksi = 145 psi, 1 in = "
          "25.4 mm, 1 in² = 645.16 mm², 1 N·m = 0.7376 ft·lbf. UKB 457×191×74 h = 457 mm, "
          "t_f = 14.5 mm: from memory of the SCI section tables. Steel density 7850 kg/m³ (EN "
          "1991-1-1 Table A.4). Forces: invented.")
st = ItemSheet("Splice", "Dunmore Road warehouse mezzanine: beam flange splice, "
               "UKB 457×191×74 (invented scenario)", ST_SRC)
st.add("M", "Design moment at the splice (analysis)", "M_Ed", 310, "kN·m")
st.add("h", "Beam depth", "h", 457, "mm")
st.add("tf", "Flange thickness", "t_f", 14.5, "mm")
st.add("F", "Flange force", "F", "={M}/(({h}-{tf})/1000)", "kN")
st.add("F2", "Flange force (hand calc)", "F_2", "={M}/({h}-{tf})", "kN",
       planted=("unit-scale", "lever arm in mm used as m: force 1000 too small"))
st.add("size", "Bolt size", "size", "M20")
st.add("d", "Bolt diameter", "d", "=VLOOKUP({size},Bolts!$A$5:$D$9,2,FALSE)", "mm")
st.add("d0", "Hole diameter", "d_0", "=VLOOKUP({size},Bolts!$A$5:$D$9,3,FALSE)", "mm")
st.add("As", "Tensile stress area", "A_s", "=VLOOKUP({size},Bolts!$A$5:$D$9,4,FALSE)", "mm²")
st.add("fub", "Bolt ultimate strength, grade 8.8", "f_ub", 800, "MPa")
st.add("av", "α_v, shear plane through the threads", "alpha_v", 0.6, "-")
st.add("gM2", "γ_M2", "gamma_M2", 1.25, "-")
st.add("ns", "Shear planes (outer and inner cover plates)", "n_s", 2, "-")
st.add("Fv", "Shear resistance per shear plane", "F_v,Rd", "={av}*{fub}*{As}/{gM2}/1000", "kN")
st.add("Fv2", "Shear resistance per shear plane (spreadsheet v1)", "F_v,Rd2",
       "={av}*{fub}*{As}/{gM2}", "kN",
       planted=("unit-scale", "MPa × mm² gives N, written as kN: 1000 too large"))
st.add("fu", "Flange ultimate strength, S355", "f_u", 490, "MPa")
st.add("tp", "Outer cover plate thickness", "t_p", 12, "mm")
st.add("ti", "Inner cover plates thickness", "t_i", 12, "mm")
st.add("t", "Thickness in bearing (flange or plates)", "t", "=MIN({tf},{tp}+{ti})", "mm")
st.add("e1", "End distance", "e_1", 40, "mm")
st.add("e2", "Edge distance", "e_2", 35, "mm")
st.add("ab", "α_b (end bolts)", "alpha_b", "=MIN({e1}/(3*{d0}),{fub}/{fu},1)", "-")
st.add("k1", "k1 (edge bolts)", "k_1", "=MIN(2.8*{e2}/{d0}-1.7,2.5)", "-")
st.add("Fb", "Bearing resistance per bolt", "F_b,Rd", "={k1}*{ab}*{fu}*{d}*{t}/{gM2}/1000", "kN")
st.add("Fr", "Resistance per bolt", "F_Rd", "=MIN({ns}*{Fv},{Fb})", "kN")
st.add("nbi", "Bolts provided each side (2 rows of 4)", "n", 8, "-")
st.add("u", "Utilisation, bolt group", "u", "={F}/({nbi}*{Fr})*100", "%")
st.add("ok", "Bolt group check", "check", "=IF({u}<=100,\"OK\",\"FAIL\")")
st.add("ok2", "Bolt group check (rev. A, Eurocode style)", "check2",
       "=IF({u}<=1,\"OK\",\"FAIL\")",
       planted=("unit-scale", "utilisation in % compared with 1.0 as if a ratio: always FAIL"))
st.add("Fpc", "Preload, grade 8.8", "F_p,C", "=0.7*{fub}*{As}/1000", "kN")
st.add("kt", "Torque factor (k-class K1)", "k", 0.2, "-")
st.add("T", "Tightening torque", "T", "={kt}*{d}*{Fpc}", "N·m")
st.add("Tft", "Tightening torque, ft·lbf (US erector)", "T_ft", "={T}*0.7376", "ft·lbf")
st.add("Fk", "Flange force, kip (fabricator's check)", "F_k", "={F}*0.2248", "kip")
st.add("Fk2", "Flange force, kip (fabricator's sheet)", "F_k2", "={F}*4.448", "kip",
       planted=("unit-scale", "kN to kip multiplied by 4.448: wrong way round"))
st.add("db", "A325 bolt diameter (alternative)", "d_b", 0.75, "in")
st.add("Ab", "A325 bolt nominal area", "A_b", "=PI()*{db}^2/4", "in²")
st.add("Abm", "A325 bolt nominal area, mm²", "A_bm", "={Ab}*645.16", "mm²")
st.add("Abm2", "A325 bolt nominal area, mm² (comparison table)", "A_bm2", "={Ab}*25.4", "mm²",
       planted=("unit-scale", "in² to mm² with the length factor 25.4"))
st.add("Fnv", "Nominal shear stress, A325-N", "F_nv", 54, "ksi")
st.add("FnvM", "Nominal shear stress, MPa", "F_nvM", "={Fnv}*1000/145", "MPa")
st.add("phv", "Design shear strength per plane", "phiR_v", "=0.75*{Fnv}*{Ab}", "kip")
st.add("tin", "Thickness in bearing, in", "t_in", "={t}/25.4", "in")
st.add("Fu", "Flange tensile strength, ksi", "F_u", "={fu}*0.145", "ksi")
st.add("phb", "Design bearing strength per bolt", "phiR_b", "=0.75*2.4*{db}*{tin}*{Fu}", "kip")
st.add("phb2", "Design bearing strength per bolt (fabricator)", "phiR_b2",
       "=0.75*2.4*{db}*{t}*{Fu}", "kip",
       planted=("unit-scale", "plate thickness in mm beside a diameter in inches"))
st.add("nU", "A325 bolts required each side", "n_US", "=ROUNDUP({Fk}/MIN({ns}*{phv},{phb}),0)",
       "-")
st.add("b", "Outer cover plate width", "b", 190, "mm")
st.add("Lp", "Cover plate length", "L_p", 620, "mm")
st.add("rs", "Steel density", "rho_s", 7850, "kg/m³")
st.add("mp", "Outer cover plate mass", "m_p", "={rs}*{b}/1000*{Lp}/1000*{tp}/1000", "kg")
st.add("Wp", "Outer cover plate weight (lifting)", "W_p", "={mp}*9.81/1000", "kN")
st.add("Wp2", "Outer cover plate weight (lifting plan, rev. A)", "W_p2", "={mp}/1000", "kN",
       planted=("result-unit", "mass in kg divided by 1000 written as kN: g left out"))
SPLICE = st.finish()

BOLTS = {
    "A1": "ISO metric bolts: nominal and hole diameters, tensile stress areas (EN ISO 898-1 and "
          "EN 1090-2 normal holes; from memory)",
    "A4": "Size", "B4": "d [mm]", "C4": "d0 [mm]", "D4": "As [mm²]",
}
for r, (s, d, d0, a) in enumerate([("M16", 16, 18, 157), ("M20", 20, 22, 245),
                                   ("M22", 22, 24, 303), ("M24", 24, 26, 353),
                                   ("M27", 27, 30, 459)], start=5):
    BOLTS[f"A{r}"], BOLTS[f"B{r}"], BOLTS[f"C{r}"], BOLTS[f"D{r}"] = s, d, d0, a

SCHEDULE = {
    "A1": "Dunmore Road warehouse mezzanine: flange splice schedule, M20 8.8 bolts in double "
          "shear",
    "A2": ("Sources: as the Splice sheet; 1 kN = 0.2248 kip and 1 MPa = 0.145 ksi (NIST SP 811, "
           "2008). Flange forces from the analysis, invented."),
    "A3": CAUTION,
    "A4": "Splice", "B4": "Flange force [kN]", "C4": "Flange force [kips]", "D4": "Bolts [-]",
    "E4": "Force per bolt [kN]", "F4": "Shear stress [MPa]", "G4": "Shear stress [ksi]",
    "H4": "Utilisation [%]",
    "A9": "Total / max",
    "D9": "=SUM(D5:D8)", "H9": "=MAX(H5:H8)",
}
fr, ns_, as_ = st.ref("Fr"), st.ref("ns"), st.ref("As")
for r, (name, f) in enumerate([("S1 gridline B/3", 520), ("S2 gridline C/3", 610),
                               ("S3 gridline D/5", 380), ("S4 gridline E/5", 455)], start=5):
    SCHEDULE[f"A{r}"], SCHEDULE[f"B{r}"] = name, f
    SCHEDULE[f"C{r}"] = f"=B{r}*0.2248"
    SCHEDULE[f"D{r}"] = f"=ROUNDUP(B{r}/{fr},0)"
    SCHEDULE[f"E{r}"] = f"=B{r}/D{r}"
    SCHEDULE[f"F{r}"] = f"=E{r}*1000/({ns_}*{as_})"
    SCHEDULE[f"G{r}"] = f"=F{r}*0.145"
    SCHEDULE[f"H{r}"] = f"=E{r}/{fr}*100"
SCHEDULE["C7"] = "=B7/0.2248"                     # planted: kN to kip the wrong way round
SCHEDULE["G8"] = "=F8*6.895"                      # planted: MPa to ksi the wrong way round
SCHEDULE["H6"] = f"=E6/{fr}"                      # planted: a fraction under a % heading

STEEL = {
    "trade": "structural steel: bolted beam flange splice, EN 1993-1-8 with an AISC check",
    "sheets": [("Splice", SPLICE), ("Bolts", BOLTS), ("Schedule", SCHEDULE)],
    "sidecar": ('# steel-splice.cells.plumb: units the workbook uses that plumb\'s table lacks '
                '(review58)\n'
                'measure kips = 1 kip "kips, as the AISC Manual\'s tables print kip"\n'),
    "planted": {**st.planted,
                "Schedule!C7": ("unit-scale", "kN to kip divided by 0.2248: wrong way round"),
                "Schedule!G8": ("unit-scale", "MPa to ksi multiplied by 6.895: wrong way round"),
                "Schedule!H6": ("unit-scale", "a fraction written under a % heading")},
}

BOOKS = {"irrigation-schedule": IRRIGATION, "led-retrofit": LIGHTING,
         "gshp-borefield": GSHP, "steel-splice": STEEL}

# Findings plumb makes beyond the planted ones, and the rule it gives a planted cell where that
# differs from the one planted, filled in after running the frozen binary (see the report).
try:
    from expect_extra import EXTRA, RENAMED, MISSED
except ImportError:
    EXTRA, RENAMED, MISSED = {}, {}, {}


def formula_cells(book):
    return [f"{name}!{cell}" for name, cells in book["sheets"] for cell, raw in cells.items()
            if isinstance(raw, str) and raw.startswith("=")]


def book_formula(book, ref):
    sheet, cell = ref.split("!")
    return dict(book["sheets"])[sheet][cell]


def main():
    summary = {}
    for stem, book in BOOKS.items():
        write_xlsx(os.path.join(HERE, stem + ".xlsx"), book["sheets"], book.get("names"))
        side = os.path.join(HERE, stem + ".cells.plumb")
        if book.get("sidecar"):
            with open(side, "w", encoding="utf-8") as f:
                f.write(book["sidecar"])
        elif os.path.exists(side):
            os.remove(side)
        formulas = formula_cells(book)
        for cell in book["planted"]:
            assert cell in formulas, f"{stem}: {cell} is not a formula cell"
        correct = [c for c in formulas if c not in book["planted"]]
        missed = MISSED.get(stem, {})
        with open(os.path.join(HERE, stem + ".expect"), "w", encoding="utf-8") as f:
            f.write("# sheet!cell rule: the planted mistakes plumb must report; every other\n"
                    "# formula cell must stay clean (written by make_books.py, review58).\n"
                    "# Invented scenario. A dimensionally consistent formula can still be wrong;\n"
                    "# this check does not replace independent review under local codes and\n"
                    "# licensed practice.\n")
            for cell, (rule, what) in book["planted"].items():
                if cell in missed:
                    f.write(f"# planted: {what}\n"
                            f"# a slip plumb still misses: {cell} {missed[cell]}\n")
                    continue
                f.write(f"# planted: {what}\n")
                got = RENAMED.get(stem, {}).get(cell)
                if got and got != rule:
                    f.write(f"# planted as {rule}; plumb names it {got}\n")
                f.write(f"{cell} {got or rule}\n")
            extra = EXTRA.get(stem, [])
            if extra:
                f.write("\n# found beyond the planted mistakes (kept so that any change shows):\n")
                for cell, rule, why in extra:
                    f.write(f"# {why}\n{cell} {rule}\n")
        summary[stem] = {
            "trade": book["trade"],
            "planted": {c: {"rule": r, "what": w} for c, (r, w) in book["planted"].items()},
            "correct": correct,
            "formulas": {c: book_formula(book, c) for c in formulas},
        }
    with open(os.path.join(HERE, "expect.json"), "w", encoding="utf-8") as f:
        json.dump(summary, f, indent=1, ensure_ascii=False)
    for stem, s in summary.items():
        print(f"{stem}: {len(s['planted'])} planted, {len(s['correct'])} correct formula cells")


if __name__ == "__main__":
    main()
