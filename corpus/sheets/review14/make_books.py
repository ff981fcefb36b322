#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review57), written with the
standard zipfile module (corpus/sheets/xlsx_writer.py, shared by the review books).

Trades: a warehouse's rainwater harvesting and reuse; a boiler's flue-gas analysis and
efficiency by the Siegert formula; a pump's system curve; a mobile crane's lift plan. All
scenarios, sites, readings and catalogue or chart data are invented (Invented scenario); the
formulas and published factors are the trade's own, with sources named in a text cell at the
top of each sheet.

A dimensionally consistent formula can still be wrong, and this check does not replace
independent review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. Other findings plumb makes are recorded in OTHER (filled in after running the
frozen binary and judging each one), and written to the .expect files.

Run: python3 make_books.py  ->  *.xlsx, *.expect, expect.json in this folder
"""
import json
import os
import re

import sys
sys.path.insert(0, os.path.dirname(os.path.dirname(os.path.abspath(__file__))))
from xlsx_writer import write_xlsx  # noqa: E402 (the shared writer in corpus/sheets)

HERE = os.path.dirname(os.path.abspath(__file__))

SAFETY = ("Invented scenario: every size, reading and catalogue or chart value here is made up "
          "for demonstration only. A dimensionally consistent formula can still be wrong, and "
          "this check does not replace independent review under local codes and licensed "
          "practice.")


class ItemSheet:
    """An 'Item | Symbol | Value | Unit' sheet. Formulas name other rows as {key}; planted rows
    carry (rule, what)."""

    def __init__(self, name, title, sources, first_row=6):
        self.name = name
        self.cells = {"A1": title, "A2": sources, "A3": SAFETY,
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
# Book 1: rainwater harvesting and reuse at a warehouse (mm, m², m³, L, gal, ft², L/s, m³/h,
# gpm, kPa(g), m and ft of head, kW and hp)
# --------------------------------------------------------------------------------------------
RAIN_SRC = ("Sources: BS EN 16941-1:2018 'On-site non-potable water systems, part 1: rainwater' "
            "(yield = rainfall depth × roof area × yield coefficient × hydraulic filter "
            "efficiency); BS 8515:2009+A1:2013 simplified approach (storage = 5 % of the lesser "
            "of annual yield and annual demand), from memory; yield coefficients 0.95 metal "
            "deck, 0.80 single-ply membrane, 0.70 gravel ballast, 0.50 extensive green roof: "
            "from memory of the BS EN 16941-1 table; filter efficiency 90 %: common practice. "
            "Texas Manual on Rainwater Harvesting, 3rd ed. (2005): 0.623 US gal per ft² per inch "
            "of rain. NIST SP 811 (2008) App. B.8: 1 ft² = 0.09290 m² (10.764 ft²/m²), 1 in = "
            "25.4 mm, 1 US gal = 3.785 L (264.2 gal/m³), 1 gpm = 0.06309 L/s, 1 ft = 0.3048 m "
            "(3.281 ft/m). Pump power ρ·g·Q·H/η, and US bhp = gpm·ft/(3960·η) for water: "
            "Cameron Hydraulic Data, 19th ed. Water 998 kg/m³ at 15 °C: from memory. "
            "Flushing 20 L per person per day: from memory of BS 8515 Annex A.")

roofs = {
    "A1": "Kestrel Park distribution warehouse: roof catchments (Invented scenario)",
    "A2": RAIN_SRC,
    "A3": SAFETY,
    "A5": "Roof", "B5": "Area [m²]", "C5": "Surface", "D5": "Yield coefficient [-]",
    "E5": "Effective area [m²]",
    "G5": "Surface", "H5": "Coefficient [-]",
    "A10": "Total",
    "B10": "=SUM(B6:B9)", "E10": "=SUM(E6:E9)",
}
for r, (name, area, surf) in enumerate([("Main warehouse roof", 12400, "Metal deck"),
                                        ("Loading bay canopy", 1850, "Metal deck"),
                                        ("Office block roof", 960, "Membrane"),
                                        ("Plant deck", 310, "Gravel")], start=6):
    roofs[f"A{r}"] = name
    roofs[f"B{r}"] = area
    roofs[f"C{r}"] = surf
    roofs[f"D{r}"] = f"=VLOOKUP(C{r},$G$6:$H$9,2,FALSE)"
    roofs[f"E{r}"] = f"=B{r}*D{r}"
for r, (surf, c) in enumerate([("Metal deck", 0.95), ("Membrane", 0.80), ("Gravel", 0.70),
                               ("Green roof", 0.50)], start=6):
    roofs[f"G{r}"], roofs[f"H{r}"] = surf, c

rain = ItemSheet("Design", "Kestrel Park distribution warehouse: rainwater harvesting for WC "
                 "flushing and vehicle wash (Invented scenario)", RAIN_SRC)
rain.add("Hr", "Annual rainfall (from Monthly)", "h_a", "=Monthly!B18", "mm")
rain.add("Hm", "Mean monthly rainfall", "h_m", "=Monthly!B19", "mm")
rain.add("Ar", "Total roof area (from Roofs)", "A_r", "=Roofs!B10", "m²")
rain.add("Ae", "Effective roof area (from Roofs)", "A_e", "=Roofs!E10", "m²")
rain.add("eta", "Hydraulic filter efficiency", "eta_f", 90, "%")
rain.add("Ya", "Annual yield", "Y_a", "={Hr}/1000*{Ae}*{eta}/100", "m³")
rain.add("Ya2", "Annual yield (quick check)", "Y_a2", "={Hr}/1000*{Ae}*{eta}", "m³",
         planted=("unit-scale", "filter efficiency 90 % used as 90, not 0.90: 100 too large"))
rain.add("Ym", "Annual yield (sum of months)", "Y_m", "=Monthly!D18", "m³")
rain.add("Aft", "Total roof area, ft²", "A_ft", "={Ar}*10.764", "ft²")
rain.add("Hin", "Annual rainfall, in", "h_in", "={Hr}/25.4", "in")
rain.add("Yg", "Gross annual runoff, US gal (Texas Manual rule)", "Y_gal", "=0.623*{Aft}*{Hin}",
         "gal")
rain.add("Yg2", "Gross annual runoff, US gal (rule applied to site units)", "Y_gal2",
         "=0.623*{Ar}*{Hr}", "gal",
         planted=("unit-scale", "0.623 gal/(ft²·in) rule fed m² and mm: 2.36 too large"))
rain.add("Np", "Staff on site", "N", 180, "-")
rain.add("qwc", "WC and urinal flushing per person", "q_wc", 20, "L/d")
rain.add("Dwc", "Flushing demand", "D_wc", "={Np}*{qwc}/1000", "m³/d")
rain.add("Dvw", "Vehicle wash demand", "D_vw", 2.4, "m³/d")
rain.add("Dls", "Landscape irrigation (season averaged)", "D_ls", 650, "L/d")
rain.add("Dd", "Daily non-potable demand", "D_d", "=SUM({Dwc}:{Dls})", "m³/d",
         planted=("mixed-range", "SUM over m³/d and L/d cells: irrigation counted 1000 too large"))
rain.add("nd", "Operating days per year", "n_d", 255, "d")
rain.add("Da", "Annual demand", "D_a", "={Dd}*{nd}", "m³")
rain.add("Vs", "Storage, 5 % of the lesser of yield and demand", "V_s",
         "=0.05*MIN({Ya},{Da})", "m³")
rain.add("Vt", "Tank selected (next 5 m³)", "V_t", "=ROUNDUP({Vs}/5,0)*5", "m³")
rain.add("VtL", "Tank size, litres", "V_tL", "={Vt}*1000", "L")
rain.add("VtL2", "Tank size, litres (supplier enquiry)", "V_tL2", "={Vt}/1000", "L",
         planted=("unit-scale", "m³ to L divided by 1000: wrong way round"))
rain.add("Vtg", "Tank size, US gal", "V_tg", "={Vt}*264.2", "gal")
rain.add("td", "Days of storage at full demand", "t_d", "={Vt}/{Dd}", "d")
rain.add("Qp", "Booster pump duty flow", "Q_p", 2.5, "L/s")
rain.add("Qph", "Booster pump duty flow, m³/h", "Q_ph", "={Qp}*3.6", "m³/h")
rain.add("Qph2", "Booster pump duty flow, m³/h (schedule)", "Q_ph2", "={Qp}*3600", "m³/h",
         planted=("unit-scale", "L/s × 3600 gives L/h, typed as m³/h: 1000 too large"))
rain.add("Qg", "Booster pump duty flow, US gpm", "Q_gpm", "={Qp}/0.06309", "gpm")
rain.add("Hs", "Static lift, tank low water to highest cistern", "H_s", 14.5, "m")
rain.add("Hf", "Pipework and fittings friction loss", "H_f", 6.2, "m")
rain.add("po", "Pressure required at the highest outlet", "p_o", 100, "kPa(g)")
rain.add("rho", "Water density", "rho", 998, "kg/m³")
rain.add("g", "Gravity", "g", 9.81, "m/s²")
rain.add("H", "Pump total head", "H", "={Hs}+{Hf}+{po}*1000/({rho}*{g})", "m")
rain.add("H2", "Pump total head (rev. A)", "H_2", "={Hs}+{Hf}+{po}/({rho}*{g})", "m",
         planted=("unit-scale", "kPa over ρ·g without ×1000: outlet pressure head 1000 too small"))
rain.add("Hft", "Pump total head, ft", "H_ft", "={H}*3.281", "ft")
rain.add("dp", "Pump differential pressure", "dp", "={rho}*{g}*{H}/1000", "kPa")
rain.add("etp", "Pump efficiency at duty", "eta_p", 55, "%")
rain.add("P", "Pump shaft power", "P", "={rho}*{g}*{Qp}/1000*{H}/({etp}/100)/1000", "kW")
rain.add("P2", "Pump shaft power (supplier check)", "P_2",
         "={rho}*{g}*{Qp}/1000*{H}/({etp}/100)", "kW",
         planted=("unit-scale", "ρ·g·Q·H/η gives W, typed as kW: 1000 too large"))
rain.add("bhp", "Pump brake horsepower", "P_hp", "={Qg}*{Hft}/(3960*{etp}/100)", "hp")
DESIGN1 = rain.finish()
eta_ref = rain.ref("eta")

monthly = {
    "A1": "Kestrel Park distribution warehouse: monthly rainfall and roof yield (Invented "
          "scenario)",
    "A2": ("Sources: as the Design sheet (BS EN 16941-1:2018 yield = h·A·e·η). Monthly "
           "rainfall: invented long-term averages for a lowland site, not a station record."),
    "A3": SAFETY,
    "A5": "Month", "B5": "Rainfall [mm]", "D5": "Yield [m³]",
    "A18": "Year", "A19": "Mean month",
    "B18": "=SUM(B6:B17)", "D18": "=SUM(D6:D17)", "B19": "=AVERAGE(B6:B17)",
}
for r, (mon, mm) in enumerate(zip(["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep",
                                   "Oct", "Nov", "Dec"],
                                  [71, 52, 48, 50, 49, 54, 51, 58, 56, 73, 78, 74]), start=6):
    monthly[f"A{r}"] = mon
    monthly[f"B{r}"] = mm
    monthly[f"D{r}"] = f"=B{r}/1000*Roofs!$E$10*{eta_ref}/100"
monthly["D12"] = f"=B12*Roofs!$E$10*{eta_ref}/100"   # planted: mm used as m

RAINWATER = {
    "trade": "public health engineering: rainwater harvesting and reuse at a warehouse",
    "sheets": [("Design", DESIGN1), ("Monthly", monthly), ("Roofs", roofs)],
    "planted": {**rain.planted,
                "Monthly!D12": ("unit-scale", "rainfall in mm used as m (no /1000): 1000 too "
                                "large")},
}

# --------------------------------------------------------------------------------------------
# Book 2: boiler flue-gas analysis and efficiency by Siegert (%, ppm, °C, °F, K, kW, Btu/h,
# MBH, m³/h, MJ/m³, kg/m³)
# --------------------------------------------------------------------------------------------
FLUE_SRC = ("Sources: Siegert formula q_A = (t_A − t_L)·(A2/(21 − O2) + B), with A2 = 0.66, "
            "B = 0.009 for natural gas, A2 = 0.68, B = 0.007 for fuel oil EL and A2 = 0.63, "
            "B = 0.008 for LPG: 1. BImSchV (Germany, 2010) Anlage III, from memory. Excess air "
            "ratio λ = 21/(21 − O2) and CO2 = CO2max·(1 − O2/21), CO2max 11.7 % (natural gas), "
            "15.4 % (oil EL), 13.7 % (LPG): common practice, values from memory. CO undiluted "
            "= CO·21/(21 − O2): common practice (air-free CO). Stoichiometric air 9.6 m³ and "
            "flue gas 10.6 m³ per m³ of natural gas, flue gas density 1.25 kg/m³ at 0 °C and "
            "101.325 kPa: from memory. Net CV (H_i) of natural gas 35.9 MJ/m³ at 0 °C and "
            "101.325 kPa: from memory; the Siegert loss is referred to the net CV, so the fuel "
            "input here is on the net basis. NIST SP 811 (2008) App. B.8: 1 kW = 3412 Btu_IT/h; "
            "t/°F = 1.8·t/°C + 32.")

fuels = {
    "A1": "Siegert coefficients and CO2max by fuel",
    "A2": "Sources: as the Boiler sheet (1. BImSchV (2010) Anlage III, from memory).",
    "A4": "Fuel", "B4": "A2 [-]", "C4": "B [-]", "D4": "CO2max [%]",
}
for r, (f, a2, b, co2) in enumerate([("Natural gas", 0.66, 0.009, 11.7),
                                     ("Fuel oil EL", 0.68, 0.007, 15.4),
                                     ("LPG", 0.63, 0.008, 13.7)], start=5):
    fuels[f"A{r}"], fuels[f"B{r}"], fuels[f"C{r}"], fuels[f"D{r}"] = f, a2, b, co2

blr = ItemSheet("Boiler", "Thornbury Creamery, boiler B-2: combustion test and efficiency "
                "(Invented scenario)", FLUE_SRC)
blr.add("fuel", "Fuel fired", "fuel", "Natural gas")
blr.add("A2", "Siegert coefficient A2", "A2", "=VLOOKUP({fuel},Fuels!$A$5:$D$7,2,FALSE)", "-")
blr.add("B", "Siegert coefficient B", "B", "=VLOOKUP({fuel},Fuels!$A$5:$D$7,3,FALSE)", "-")
blr.add("CO2m", "Maximum CO2 of the fuel, dry", "CO2max",
        "=VLOOKUP({fuel},Fuels!$A$5:$D$7,4,FALSE)", "%")
blr.add("Vg", "Gas flow at high fire (meter, corrected to 0 °C, 101.325 kPa)", "V_g", 118,
        "m³/h")
blr.add("CV", "Net calorific value at 0 °C, 101.325 kPa", "H_i", 35.9, "MJ/m³")
blr.add("Qin", "Fuel input at high fire (net CV)", "Q_in", "={Vg}*{CV}/3.6", "kW")
blr.add("Qin2", "Fuel input at high fire (commissioning sheet)", "Q_in2", "={Vg}*{CV}/3600", "kW",
        planted=("unit-scale", "MJ/h to kW divided by 3600, not 3.6: 1000 too small"))
blr.add("QinB", "Fuel input (net CV), Btu/h", "Q_Btu", "={Qin}*3412", "Btu/h")
blr.add("QinB2", "Fuel input, Btu/h (US burner data)", "Q_Btu2", "={Qin}*3.412", "Btu/h",
        planted=("unit-scale", "kW × 3.412 gives MBH, typed as Btu/h: 1000 too small"))
blr.add("QinM", "Fuel input (net CV), MBH", "Q_MBH", "={Qin}*3.412", "MBH")
blr.add("qA", "Flue gas loss at high fire (from Readings)", "q_A", "=Readings!J9", "%")
blr.add("eta", "Combustion efficiency at high fire", "eta", "=Readings!K9", "%")
blr.add("Qout", "Heat output at high fire", "Q_out", "={Qin}*{eta}/100", "kW")
blr.add("QfA", "Flue gas loss at high fire, kW", "Q_A", "={Qin}*{qA}/100", "kW")
blr.add("QfA2", "Flue gas loss at high fire, kW (summary)", "Q_A2", "={Qin}*{qA}", "kW",
        planted=("unit-scale", "q_A in % used as a fraction: 100 too large"))
blr.add("Qc", "Casing and radiation loss (surface survey)", "Q_c", 4200, "W")
blr.add("Ql", "Total losses at high fire", "Q_l", "={QfA}+{Qc}", "kW",
        planted=("unit-scale", "casing loss in W added to a flue loss in kW"))
blr.add("O2", "O2 at high fire (from Readings)", "O2", "=Readings!B9", "%")
blr.add("lam", "Excess air ratio at high fire", "lambda", "=21/(21-{O2})", "-")
blr.add("Vfa", "Stoichiometric air per m³ of gas", "v_a", 9.6, "m³/m³")
blr.add("Vff", "Stoichiometric flue gas per m³ of gas", "v_f", 10.6, "m³/m³")
blr.add("Vfn", "Flue gas flow at 0 °C, 101.325 kPa", "V_fn", "={Vg}*({Vff}+({lam}-1)*{Vfa})",
        "m³/h")
blr.add("tA", "Stack temperature at high fire (from Readings)", "t_A", "=Readings!D9", "°C")
blr.add("Vfs", "Flue gas flow at stack temperature", "V_fs", "={Vfn}*({tA}+273.15)/273.15",
        "m³/h")
blr.add("rn", "Flue gas density at 0 °C, 101.325 kPa", "rho_n", 1.25, "kg/m³")
blr.add("rs", "Flue gas density at stack temperature", "rho_s", "={rn}*273.15/({tA}+273.15)",
        "kg/m³")
blr.add("rs2", "Flue gas density in the stack (draught calc)", "rho_s2", "={rn}*273.15/{tA}",
        "kg/m³", planted=("offset-scale", "stack temperature in °C where the gas law wants K"))
blr.add("mf", "Flue gas mass flow", "m_f", "={Vfn}*{rn}/3600", "kg/s")
blr.add("etm", "Mean combustion efficiency over the three firing rates", "eta_m",
        "=AVERAGE(Readings!K7:K9)", "%")
BOILER1 = blr.finish()
A2r, Br, CO2r = blr.ref("A2"), blr.ref("B"), blr.ref("CO2m")

readings = {
    "A1": "Thornbury Creamery, boiler B-2: flue-gas analyser readings at three firing rates "
          "(Invented scenario)",
    "A2": ("Sources: as the Boiler sheet. Readings are dry-basis O2 and CO from a portable "
           "analyser, stack temperature at the sampling point and combustion-air temperature "
           "at the burner intake (invented)."),
    "A3": SAFETY,
    "A6": "Firing rate [%]", "B6": "O2 [%]", "C6": "CO [ppm]", "D6": "Stack temp [°C]",
    "E6": "Air temp [°C]", "F6": "Stack temp [°F]", "G6": "Stack − air ΔT [K]",
    "H6": "CO2 [%]", "I6": "Excess air [%]", "J6": "Flue gas loss qA [%]",
    "K6": "Efficiency [%]", "L6": "CO air-free [ppm]",
    "A10": "Mean / max",
    "D10": "=MAX(D7:D9)", "K10": "=AVERAGE(K7:K9)",
}
for r, (fr, o2, co, ts, ta) in enumerate([(30, 5.8, 22, 148, 24), (60, 4.1, 14, 171, 25),
                                           (100, 3.2, 31, 196, 26)], start=7):
    readings[f"A{r}"] = fr
    readings[f"B{r}"] = o2
    readings[f"C{r}"] = co
    readings[f"D{r}"] = ts
    readings[f"E{r}"] = ta
    readings[f"F{r}"] = f"=D{r}*1.8+32"
    readings[f"G{r}"] = f"=D{r}-E{r}"
    readings[f"H{r}"] = f"={CO2r}*(1-B{r}/21)"
    readings[f"I{r}"] = f"=B{r}/(21-B{r})*100"
    readings[f"J{r}"] = f"=(D{r}-E{r})*({A2r}/(21-B{r})+{Br})"
    readings[f"K{r}"] = f"=100-J{r}"
    readings[f"L{r}"] = f"=C{r}*21/(21-B{r})"
readings["F8"] = "=D8*1.8"                                  # planted: +32 left off
readings["I7"] = "=B7/(21-B7)"                              # planted: fraction under %
readings["J8"] = f"=(F8-E8)*({A2r}/(21-B8)+{Br})"           # planted: °F stack less °C air
readings["K7"] = "=1-J7"                                    # planted: 1 − q as a fraction

FLUEGAS = {
    "trade": "boiler plant: flue-gas analysis and combustion efficiency by Siegert",
    "sheets": [("Boiler", BOILER1), ("Readings", readings), ("Fuels", fuels)],
    "planted": {**blr.planted,
                "Readings!F8": ("offset-scale", "°C to °F with the +32 left off"),
                "Readings!I7": ("unit-scale", "excess air as a fraction under a % heading: 100 "
                                "too small"),
                "Readings!J8": ("offset-scale", "Siegert with the stack temperature in °F less "
                                "the air temperature in °C"),
                "Readings!K7": ("unit-scale", "efficiency as 1 − q_A, q_A being in %: the "
                                "result is 1 % − q_A, not 100 % − q_A")},
}

# --------------------------------------------------------------------------------------------
# Book 3: pump system curve (L/s, m³/h, gpm, mm and m, mm²/s, Darcy–Weisbach with Swamee–Jain,
# static head, head in m, ft and kPa, psi, NPSH, VLOOKUP on a pump curve)
# --------------------------------------------------------------------------------------------
PUMP_SRC = ("Sources: Darcy–Weisbach h_f = f·(L/D)·v²/(2g) and minor losses ΣK·v²/(2g): "
            "Crane Technical Paper 410 (2018 ed.); Swamee–Jain friction factor f = 0.25/"
            "[log10(ε/(3.7D) + 5.74/Re^0.9)]²: Swamee & Jain, ASCE J. Hydraulics Div. "
            "102(HY5), 1976; Re = v·D/ν. NPSHa = (p_atm − p_v)/(ρ·g) + z_s − h_fs with absolute "
            "pressures: Hydraulic Institute ANSI/HI 9.6.1 (2017), from memory. Water at 20 °C: "
            "ρ = 998.2 kg/m³, ν = 1.004 mm²/s, p_v = 2.34 kPa: from memory of steam tables. "
            "Commercial steel ε = 0.045 mm: from memory (Moody). 8 in Sch 40 bore 202.7 mm: "
            "ASME B36.10M, from memory. NIST SP 811 (2008) App. B.8: 1 ft = 0.3048 m (3.281 "
            "ft/m), 1 gpm = 0.06309 L/s, 1 psi = 6.895 kPa. Pump curve: invented catalogue "
            "data; read by VLOOKUP on the next lower tabulated flow: common practice for a "
            "first pass.")

pipe = ItemSheet("Pipe", "Ashcombe water treatment works: backwash recovery pump P-3, system "
                 "curve and duty (Invented scenario)", PUMP_SRC)
pipe.add("D", "Pipe bore (8 in Sch 40)", "D", 202.7, "mm")
pipe.add("L", "Pipe length, suction and delivery", "L", 640, "m")
pipe.add("eps", "Absolute roughness", "eps", 0.045, "mm")
pipe.add("K", "Sum of fitting loss coefficients", "ΣK", 18.5, "-")
pipe.add("zs", "Suction tank bottom water level", "z_s", 102.40, "m")
pipe.add("zd", "Delivery tank top water level", "z_d", 128.75, "m")
pipe.add("Hst", "Static head", "H_st", "={zd}-{zs}", "m")
pipe.add("rho", "Water density at 20 °C", "rho", 998.2, "kg/m³")
pipe.add("nu", "Kinematic viscosity at 20 °C", "nu", 1.004, "mm²/s")
pipe.add("num", "Kinematic viscosity", "nu_SI", "={nu}/1000000", "m²/s")
pipe.add("g", "Gravity", "g", 9.81, "m/s²")
pipe.add("A", "Pipe bore area", "A", "=PI()*({D}/1000)^2/4", "m²")
pipe.add("ed", "Relative roughness", "eps/D", "={eps}/{D}", "-")
pipe.add("Qd", "Duty flow", "Q_d", 45, "L/s")
pipe.add("Qdm", "Duty flow, m³/h", "Q_dm", "={Qd}*3.6", "m³/h")
pipe.add("Qdg", "Duty flow, US gpm", "Q_dg", "={Qd}/0.06309", "gpm")
pipe.add("Hp", "Pump head at duty (curve)", "H_p", "=VLOOKUP({Qdm},Curve!$A$6:$C$15,2,TRUE)",
         "m")
pipe.add("etp", "Pump efficiency at duty (curve)", "eta_p",
         "=VLOOKUP({Qdm},Curve!$A$6:$C$15,3,TRUE)", "%")
pipe.add("Hft", "Pump head at duty, ft", "H_ft", "={Hp}*3.281", "ft")
pipe.add("dp", "Pump differential pressure at duty", "dp", "={rho}*{g}*{Hp}/1000", "kPa")
pipe.add("dp2", "Pump differential pressure (gauge check sheet)", "dp2", "={rho}*{g}*{Hp}",
         "kPa", planted=("unit-scale", "ρ·g·H gives Pa, typed as kPa: 1000 too large"))
pipe.add("dpsi", "Pump differential pressure, psi", "dp_psi", "={dp}/6.895", "psi")
pipe.add("dpsi2", "Pump differential pressure, psi (US vendor)", "dp_psi2", "={dp}*6.895", "psi",
         planted=("unit-scale", "kPa to psi multiplied by 6.895: wrong way round"))
pipe.add("P", "Pump shaft power at duty", "P",
         "={rho}*{g}*{Qd}/1000*{Hp}/({etp}/100)/1000", "kW")
pipe.add("P2", "Pump shaft power (motor selection)", "P_2",
         "={rho}*{g}*{Qd}/1000*{Hp}/{etp}/1000", "kW",
         planted=("unit-scale", "pump efficiency 79 % used as 79: 100 too small"))
pipe.add("pat", "Atmospheric pressure at site", "p_atm", 100.8, "kPa")
pipe.add("pv", "Vapour pressure of water at 20 °C", "p_v", 2.34, "kPa")
pipe.add("hs", "Suction head, tank bottom level above pump centreline", "z_ps", 2.1, "m")
pipe.add("hfs", "Suction line friction loss at duty", "h_fs", 0.35, "m")
pipe.add("NPa", "NPSH available", "NPSHa", "=({pat}-{pv})*1000/({rho}*{g})+{hs}-{hfs}", "m")
pipe.add("ps", "Suction gauge reading at duty", "p_s", 18.5, "kPa(g)")
pipe.add("NPa2", "NPSH available (from suction gauge)", "NPSHa2",
         "=({ps}-{pv})*1000/({rho}*{g})", "m",
         planted=("offset-scale", "gauge suction pressure less an absolute vapour pressure"))
PIPE = pipe.finish()

P = {k: pipe.ref(k) for k in pipe.keys}
system = {
    "A1": "Ashcombe WTW, pump P-3: system curve (Invented scenario)",
    "A2": ("Sources: as the Pipe sheet: Darcy–Weisbach with Swamee–Jain f, minor losses ΣK·"
           "v²/(2g) (Crane TP-410, 2018), static head from tank levels; pump head read from "
           "the Curve sheet by VLOOKUP on the next lower tabulated flow."),
    "A3": SAFETY,
    "A5": "Flow [L/s]", "B5": "Flow [m³/h]", "C5": "Velocity [m/s]", "D5": "Reynolds number [-]",
    "E5": "Friction factor [-]", "F5": "Friction loss [m]", "G5": "System head [m]",
    "H5": "Pump head [m]",
}
for r, q in enumerate([10, 20, 30, 40, 50], start=6):
    system[f"A{r}"] = q
    system[f"B{r}"] = f"=A{r}*3.6"
    system[f"C{r}"] = f"=A{r}/1000/{P['A']}"
    system[f"D{r}"] = f"=C{r}*{P['D']}/1000/{P['num']}"
    system[f"E{r}"] = f"=0.25/LOG10({P['ed']}/3.7+5.74/D{r}^0.9)^2"
    system[f"F{r}"] = f"=E{r}*{P['L']}/({P['D']}/1000)*C{r}^2/(2*{P['g']})"
    system[f"G{r}"] = f"={P['Hst']}+F{r}+{P['K']}*C{r}^2/(2*{P['g']})"
    system[f"H{r}"] = f"=VLOOKUP(B{r},Curve!$A$6:$C$15,2,TRUE)"
system["C7"] = f"=A7/{P['A']}"                                         # planted: L/s as m³/s
system["D8"] = f"=C8*{P['D']}/{P['num']}"                               # planted: D in mm
system["F9"] = f"=E9*{P['L']}/({P['D']}/1000)*C9^2/2"                   # planted: g left out
system["H10"] = "=VLOOKUP(A10,Curve!$A$6:$C$15,2,TRUE)"                # planted: L/s key

curve = {
    "A1": "Pump P-3 performance at 1480 rpm, 330 mm impeller (invented catalogue data)",
    "A5": "Flow [m³/h]", "B5": "Head [m]", "C5": "Efficiency [%]",
}
for r, (q, h, e) in enumerate([(0, 46.0, 0), (20, 45.6, 30), (40, 44.8, 50), (60, 43.6, 63),
                               (80, 42.0, 71), (100, 40.1, 76), (120, 38.0, 79),
                               (140, 35.8, 80), (160, 33.4, 79), (180, 30.6, 76)], start=6):
    curve[f"A{r}"], curve[f"B{r}"], curve[f"C{r}"] = q, h, e

SYSCURVE = {
    "trade": "pumping: system curve by Darcy–Weisbach and duty point on a pump curve",
    "sheets": [("Pipe", PIPE), ("System", system), ("Curve", curve)],
    "planted": {**pipe.planted,
                "System!C7": ("unit-scale", "flow in L/s divided by an area in m²: 1000 too "
                              "large"),
                "System!D8": ("unit-scale", "Reynolds number with the bore in mm: 1000 too "
                              "large"),
                "System!F9": ("result-unit", "Darcy–Weisbach with g left out of v²/(2g)"),
                "System!H10": ("mixed-range", "VLOOKUP keyed on flow in L/s into a table in "
                               "m³/h")},
}

# --------------------------------------------------------------------------------------------
# Book 4: mobile crane lift plan (t, kg, kN, lb, m, ft, °, %, kPa, t/m², m/s, m², N)
# --------------------------------------------------------------------------------------------
CRANE_SRC = ("Sources: BS 7121-1:2016 and BS 7121-3:2017 (lift planning, mobile cranes); ASME "
             "B30.5-2021 (mobile cranes). Gross load = load + hook block + lifting accessories "
             "(BS 7121-3). Radius = boom length·cos(boom angle) + boom foot offset: common "
             "practice. Lift above 75 % of chart treated as a critical lift: common practice "
             "(company procedure). Leg tension = share of load / sin(sling angle from "
             "horizontal): common practice. Outrigger bearing pressure = reaction / mat area: "
             "CIRIA C703 (2003) 'Crane stability on site', from memory. Wind pressure q = "
             "0.613·v² (Pa, v in m/s, air 1.226 kg/m³) and force F = q·A·c_w with c_w = 1.2: "
             "EN 13000:2010, from memory. g = 9.81 m/s² (SI Brochure 9th ed.: g_n = 9.80665). "
             "NIST SP 811 (2008) App. B.8: 1 lb = 0.45359237 kg (2204.6 lb/t), 1 ft = 0.3048 m "
             "(3.281 ft/m). Load chart: invented, not any maker's chart.")

lift = ItemSheet("Lift", "Holloway Street data centre: rooftop chiller lift with a 220 t "
                 "all-terrain crane (Invented scenario)", CRANE_SRC)
lift.add("W", "Chiller operating weight (maker's data)", "W", 9.8, "t")
lift.add("Wa", "Weight allowance (weight not verified)", "a_w", 5, "%")
lift.add("Wd", "Design load weight", "W_d", "={W}*(1+{Wa}/100)", "t")
lift.add("hook", "Hook block (chart notes)", "m_hb", 1.65, "t")
lift.add("spr", "Spreader beam, 4 m (test certificate)", "m_sb", 850, "kg")
lift.add("shk", "Shackles, 4 × 17 t WLL", "m_sh", 38, "kg")
lift.add("slg", "Wire rope slings, 4 × 3 m", "m_sl", 92, "kg")
lift.add("tag", "Taglines", "m_tl", 6, "kg")
lift.add("Rk", "Lifting accessories below the hook", "m_acc", "=({spr}+{shk}+{slg}+{tag})/1000",
         "t")
lift.add("Rk2", "Hook block and accessories (rigging list)", "m_rig", "=SUM({hook}:{tag})", "kg",
         planted=("mixed-range", "SUM of a hook block in t with accessories in kg"))
lift.add("G", "Gross load", "G", "={Wd}+{hook}+{Rk}", "t")
lift.add("G2", "Gross load (first issue)", "G_2", "={Wd}+{hook}+{spr}+{shk}+{slg}+{tag}", "t",
         planted=("unit-scale", "accessories in kg added to loads in t"))
lift.add("GkN", "Gross load, force", "G_F", "={G}*9.81", "kN")
lift.add("Glb", "Gross load, lb (US crane operator)", "G_lb", "={G}*2204.6", "lb")
lift.add("Lb", "Boom length (telescoped)", "L_b", 43.2, "m")
lift.add("ang", "Boom angle from horizontal", "theta", 62, "°")
lift.add("off", "Boom foot pivot to slew centre", "e", 1.2, "m")
lift.add("R", "Operating radius", "R", "={Lb}*COS(RADIANS({ang}))+{off}", "m")
lift.add("R2", "Operating radius (site check)", "R_2", "={Lb}*COS({ang})+{off}", "m",
         planted=("unit-scale", "COS of an angle in degrees without RADIANS"))
lift.add("Rft", "Operating radius, ft", "R_ft", "={R}*3.281", "ft")
lift.add("Rft2", "Operating radius, ft (operator's sheet)", "R_ft2", "={R}/3.281", "ft",
         planted=("unit-scale", "m to ft divided by 3.281: wrong way round"))
lift.add("Rc", "Chart radius used (next metre up)", "R_c", "=ROUNDUP({R},0)", "m")
lift.add("Cap", "Chart capacity at radius", "C", "=VLOOKUP({Rc},Chart!$A$6:$B$20,2,FALSE)", "t")
lift.add("pct", "Percent of chart", "u", "={G}/{Cap}*100", "%")
lift.add("pct2", "Percent of chart (lift summary)", "u_2", "={GkN}/{Cap}*100", "%",
         planted=("result-unit", "gross load in kN over a chart capacity in t"))
lift.add("cat", "Lift category", "cat", "=IF({pct}>75,\"CRITICAL\",\"STANDARD\")")
lift.add("Ro", "Highest outrigger reaction (crane planner output)", "R_o", 58.5, "t")
lift.add("Fo", "Highest outrigger reaction, force", "F_o", "={Ro}*9.81", "kN")
lift.add("mat", "Outrigger mat, side of square", "b", 1500, "mm")
lift.add("Am", "Mat area", "A_m", "=({mat}/1000)^2", "m²")
lift.add("q", "Bearing pressure under mat", "q", "={Fo}/{Am}", "kPa")
lift.add("qt", "Bearing pressure under mat, t/m²", "q_t", "={Ro}/{Am}", "t/m²")
lift.add("qa", "Allowable bearing pressure (geotechnical report)", "q_a", 250, "kPa")
lift.add("chk", "Mat check", "check", "=IF({q}<={qa},\"OK\",\"LARGER MATS\")")
lift.add("chk2", "Mat check (from planner's t/m²)", "check2",
         "=IF({qt}<={qa},\"OK\",\"LARGER MATS\")",
         planted=("result-unit", "a bearing pressure in t/m² compared with an allowable in kPa"))
lift.add("As", "Load sail area (chiller side)", "A_w", 14, "m²")
lift.add("cw", "Wind force coefficient", "c_w", 1.2, "-")
lift.add("vw", "Wind speed limit for the lift", "v", 9.8, "m/s")
lift.add("qw", "Wind pressure", "q_w", "=0.613*{vw}^2", "Pa")
lift.add("Fw", "Wind force on the load", "F_w", "={qw}*{As}*{cw}/1000", "kN")
LIFT = lift.finish()
Wd_ref = lift.ref("Wd")
Rk_ref = lift.ref("Rk")

slings = {
    "A1": "Holloway Street chiller lift: sling leg tensions below the spreader beam (Invented "
          "scenario)",
    "A2": ("Sources: as the Lift sheet; leg share from the chiller's centre of gravity "
           "(maker's drawing, invented); leg tension = share of design load / sin(angle)."),
    "A3": SAFETY,
    "A5": "Leg", "B5": "Angle from horizontal [°]", "C5": "Share of load [%]",
    "D5": "Leg tension [t]", "E5": "Leg tension [kN]", "F5": "Sling WLL [t]",
    "G5": "Utilisation [%]", "H5": "Check",
    "A10": "Max / total",
    "C10": "=SUM(C6:C9)", "D10": "=MAX(D6:D9)", "G10": "=MAX(G6:G9)",
}
for r, (leg, ang, share) in enumerate([("A", 72, 27.5), ("B", 72, 24.0), ("C", 70, 26.0),
                                       ("D", 70, 22.5)], start=6):
    slings[f"A{r}"] = leg
    slings[f"B{r}"] = ang
    slings[f"C{r}"] = share
    slings[f"D{r}"] = f"={Wd_ref}*C{r}/100/SIN(RADIANS(B{r}))"
    slings[f"E{r}"] = f"=D{r}*9.81"
    slings[f"F{r}"] = 4.0
    slings[f"G{r}"] = f"=D{r}/F{r}*100"
    slings[f"H{r}"] = f"=IF(G{r}>100,\"OVERLOAD\",\"OK\")"
slings["D8"] = f"={Wd_ref}*C8/SIN(RADIANS(B8))"            # planted: % used as a fraction
slings["E9"] = "=D9*9.81/1000"                              # planted: conversion doubled

chart = {
    "A1": "220 t all-terrain crane, 43.2 m boom, 71 t counterweight, outriggers 8.5 m × 8.5 m, "
          "360° slew (invented chart, not any maker's)",
    "A5": "Radius [m]", "B5": "Capacity [t]",
}
for r, (rad, cap) in enumerate([(8, 58.0), (9, 52.5), (10, 47.6), (11, 43.0), (12, 39.1),
                                (13, 35.6), (14, 32.4), (15, 29.6), (16, 27.1), (17, 24.9),
                                (18, 22.9), (19, 21.1), (20, 19.5), (21, 18.0), (22, 16.7)],
                               start=6):
    chart[f"A{r}"], chart[f"B{r}"] = rad, cap

CRANE = {
    "trade": "lifting: mobile crane lift plan (gross load, radius, chart, slings, mats, wind)",
    "sheets": [("Lift", LIFT), ("Slings", slings), ("Chart", chart)],
    "planted": {**lift.planted,
                "Slings!D8": ("unit-scale", "share of load 26 % used as 26: 100 too large"),
                "Slings!E9": ("unit-scale", "t × 9.81 already gives kN; the /1000 makes it "
                              "1000 too small")},
}

BOOKS = {"rainwater-harvesting": RAINWATER, "boiler-flue-gas": FLUEGAS,
         "pump-system-curve": SYSCURVE, "crane-lift-plan": CRANE}

# What the frozen binary (/work/frozen12/plumb) reports, judged finding by finding.
# SEEN: planted cells where plumb names another rule than the one planted (the message was read
# and found to describe the planted mistake).
SEEN = {
    "boiler-flue-gas": {"Readings!J8": "unit-scale"},
    "pump-system-curve": {"System!H10": "unit-scale"},
    "crane-lift-plan": {"Lift!C40": "side-mismatch"},
}
# MISSED: planted cells plumb does not report: cell -> why. (None in this run.)
MISSED = {}
CORRECT_FLAGGED = "a correct cell plumb still flags"
NOTE = "a note on a trade's number, read as such"
# OTHER: every other finding, cell -> [(rule, comment)].
OTHER = {
    "rainwater-harvesting": {
        "Design!C48": [("gravity-number",
                        "a note on a correct cell, but it names the wrong number: the '100' of "
                        "η/100 is read as water's specific weight; 3960 is the pump trade's "
                        "1/γ_w (Cameron Hydraulic Data)")],
    },
    "boiler-flue-gas": {
        "Boiler!C30": [("trade-constant", NOTE + " (273.15 K as the reference state)")],
        "Boiler!C32": [("trade-constant", NOTE + " (273.15 K as the reference state)")],
        **{f"Readings!H{r}": [("unit-scale",
                               f"{CORRECT_FLAGGED}: CO2 = CO2max·(1 − O2/21) is common practice; "
                               "the 21 is 21 % (O2 in dry air), so O2/21 is a pure ratio, but "
                               "plumb counts 21 as a bare coefficient and says O2/21 is 100 "
                               "times 1")] for r in (7, 8, 9)},
        **{f"Readings!J{r}": [("unit-scale",
                               f"{CORRECT_FLAGGED}: Siegert q_A = (t_A − t_L)·(A2/(21 − O2) + B) "
                               "(1. BImSchV) is an empirical fit whose A2 and B carry units "
                               "(%²/K and %/K) that the trade writes as bare numbers; plumb's "
                               "advice to multiply A2/(21 − O2) by 100 would make q_A wrong")]
           for r in (7, 9)},
        "Readings!J8": [("unit-scale",
                         "a second finding on the planted cell J8, the Siegert term as on J7 "
                         "and J9 (see there)")],
        **{f"Readings!L{r}": [("unit-scale",
                               f"{CORRECT_FLAGGED}: air-free CO = CO·21/(21 − O2) (common "
                               "practice) is the factor 21/(21 − O2) that plumb accepts in "
                               "Boiler!C25, but written CO*21/(21 − O2) (left to right) plumb "
                               "counts the 21 as a bare number and says 100 times too small")]
           for r in (7, 8, 9)},
    },
    "pump-system-curve": {},
    "crane-lift-plan": {
        "Lift!C18": [("gravity-number", NOTE + " (9.81 as g_n: t × 9.81 = kN)")],
        "Lift!C33": [("gravity-number", NOTE + " (9.81 as g_n: t × 9.81 = kN)")],
        "Lift!C44": [("trade-constant", NOTE + " (0.613 = ρ_air/2, the wind codes' figure)")],
        **{f"Slings!E{r}": [("gravity-number", NOTE + " (9.81 as g_n: t × 9.81 = kN)")]
           for r in (6, 7, 8, 9)},
    },
}


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
        formulas = formula_cells(book)
        for cell in book["planted"]:
            assert cell in formulas, f"{stem}: {cell} is not a formula cell"
        correct = [c for c in formulas if c not in book["planted"]]
        with open(os.path.join(HERE, stem + ".expect"), "w", encoding="utf-8") as f:
            f.write(f"# {book['trade']} (Invented scenario)\n"
                    "# A dimensionally consistent formula can still be wrong, and this check does\n"
                    "# not replace independent review under local codes and licensed practice.\n"
                    "# sheet!cell rule: the planted mistakes plumb must report; every other\n"
                    "# formula cell must stay clean (written by make_books.py)\n")
            for cell, (rule, what) in book["planted"].items():
                f.write(f"# planted: {what}\n")
                if cell in MISSED.get(stem, {}):
                    f.write(f"# a slip plumb still misses: {cell} {MISSED[stem][cell]}\n")
                    continue
                seen = SEEN.get(stem, {}).get(cell, rule)
                if seen != rule:
                    f.write(f"# planted as {rule}; plumb names it {seen}\n")
                f.write(f"{cell} {seen}\n")
            others = OTHER.get(stem, {})
            if others:
                f.write("\n# found beyond the planted mistakes (kept so that any change shows):\n")
                for cell, items in others.items():
                    for rule, comment in items:
                        f.write(f"# {comment}\n{cell} {rule}\n")
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
