#!/usr/bin/env python3
"""Four review workbooks for plumb's workbook checking (review51), written with the standard
zipfile module (xlsx_writer.py, copied from corpus/sheets/review2 and extended).

Trades: an HVAC air-handler schedule (cfm, L/s, Btu/h, kW, 1.08 and 4.5, tons of
refrigeration); a process pump list with NPSH available (kPa(g), kPa abs, psia, m and ft of
head); a solar PV array yield and inverter sizing (kWp, kWh/yr, 8760 h, % losses); a storm
sewer design table (rational method, L/s and cfs, Manning in SI and US units).

All projects, tags and data are invented, for review only. Every formula cell is either a
planted mistake (PLANTED, with the rule expected) or a correct cell that must stay clean.

Run: python3 make_books.py  ->  *.xlsx (+ sidecar), *.expect, expect.json
"""
import json
import os

from xlsx_writer import write_xlsx

HERE = os.path.dirname(os.path.abspath(__file__))


def column_block(rows, first_row):
    """Item / Symbol / Value / Unit rows, the layout of a calculation sheet."""
    out = {}
    for i, row in enumerate(rows):
        r = first_row + i
        label, sym, value, unit = row
        out[f"A{r}"] = label
        out[f"B{r}"] = sym
        out[f"C{r}"] = value
        if unit is not None:
            out[f"D{r}"] = unit
    return out


# --------------------------------------------------------------------------------------------
# Book 1: HVAC air-handler schedule (cfm, °F, Btu/h, Btu/lb, TR; L/s, kW, °C)
# --------------------------------------------------------------------------------------------
SCHEDULE = {
    "A1": "Harbour Point clinic: air-handler cooling coil schedule (invented project)",
    "A2": "Sources: sensible q = 1.08·cfm·ΔT (Btu/h, °F) and total q = 4.5·cfm·Δh (Btu/h, "
          "Btu/lb), ASHRAE Handbook—Fundamentals 2017, ch. 18 (standard air, from memory); "
          "1 TR = 12 000 Btu/h (NIST SP 811, B.8); face velocity = cfm/ft² (common practice)",
    "A4": "Tag", "B4": "Supply air [cfm]", "C4": "Entering air [°F]", "D4": "Leaving air [°F]",
    "E4": "Coil ΔT [°F]", "F4": "Sensible [Btu/h]", "G4": "h entering [Btu/lb]",
    "H4": "h leaving [Btu/lb]", "I4": "Total [Btu/h]", "J4": "Cooling [TR]", "K4": "SHR [-]",
    "L4": "Coil face area [ft2]", "M4": "Face velocity [fpm]",
}
AHUS = [("AHU-1", 12000, 80, 55, 31.5, 22.8, 24),
        ("AHU-2", 8500, 78, 55, 30.8, 22.6, 17),
        ("AHU-3", 15000, 82, 54, 33.0, 22.3, 32),
        ("AHU-4", 6000, 79, 56, 31.0, 23.2, 12),
        ("AHU-5", 4200, 76, 55, 29.5, 22.6, 9)]
for i, (tag, cfm, te, tl, he, hl, face) in enumerate(AHUS):
    r = 5 + i
    SCHEDULE.update({f"A{r}": tag, f"B{r}": cfm, f"C{r}": te, f"D{r}": tl, f"G{r}": he,
                     f"H{r}": hl, f"L{r}": face,
                     f"E{r}": f"=C{r}-D{r}", f"F{r}": f"=1.08*B{r}*E{r}",
                     f"I{r}": f"=4.5*B{r}*(G{r}-H{r})", f"J{r}": f"=I{r}/12000",
                     f"K{r}": f"=F{r}/I{r}", f"M{r}": f"=B{r}/L{r}"})
SCHEDULE["F7"] = "=1.08*B7*C7"   # planted: entering temperature in place of the coil ΔT
SCHEDULE["J8"] = "=I8/12"        # planted: Btu/h to tons by /12 (the MBH habit)
SCHEDULE.update({
    "A10": "Total / max", "B10": "=SUM(B5:B9)", "F10": "=SUM(F5:F9)", "I10": "=SUM(I5:I9)",
    "J10": "=SUM(J5:J9)", "M10": "=MAX(M5:M9)",
    "A11": "Face velocity check (500 fpm limit)", "B11": "=IF(M10>500,\"REDUCE\",\"OK\")",
})

DESIGN = {
    "A1": "Harbour Point clinic: air-handler design checks (invented project)",
    "A2": "Sources: ASHRAE Handbook—Fundamentals 2017, ch. 18 (SI: q_s = 1.23·Q·Δt, W, L/s, "
          "K; latent q = 0.68·cfm·ΔW, Btu/h, gr/lb; from memory); chilled water gpm = "
          "Btu/h/(500·ΔT) (common practice); fan bhp = cfm·in.w.g./(6356·η) (common practice); "
          "1 cfm = 0.4719 L/s, 1 kW = 3412 Btu/h, 1 TR = 3.517 kW, 1 hp = 0.7457 kW, "
          "1 gpm = 0.06309 L/s (NIST SP 811, B.8, rounded); mixed air by mass-weighted mean "
          "(common practice)",
    "A4": "Item", "B4": "Symbol", "C4": "Value", "D4": "Unit",
}
DESIGN.update(column_block([
    ("Outdoor air fraction", "x_oa", 30, "%"),                                      # 5
    ("Return air temperature", "T_ra", 75, "°F"),                                   # 6
    ("Outdoor air temperature, 0.4 % cooling design", "T_oa", 94, "°F"),            # 7
    ("Mixed air temperature", "T_ma", "=C5/100*C7+(1-C5/100)*C6", "°F"),             # 8
    ("Mixed air temperature (second copy)", "T_ma2", "=C5*C7+(1-C5)*C6", "°F"),      # 9 P
    ("Outdoor air flow", "q_oa", "=Schedule!B10*C5/100", "cfm"),                    # 10
    ("Outdoor air flow, L/s", "q_oaL", "=C10*0.4719", "L/s"),                       # 11
    ("Supply air, all units", "q_s", "=Schedule!B10*0.4719", "L/s"),                # 12
    ("Supply air, all units, m³/h", "q_sh", "=C12*3600", "m³/h"),                   # 13 P
    ("Total cooling, kW", "Q_kW", "=Schedule!I10/3412", "kW"),                      # 14
    ("Total cooling, kW (from Btu/h, copy)", "Q_kW2", "=Schedule!I10*3412", "kW"),  # 15 P
    ("Total cooling", "Q_TR", "=Schedule!J10", "TR"),                               # 16
    ("Total cooling from TR", "Q_kW3", "=C16*3.517", "kW"),                         # 17
    ("Supply air temperature AHU-1", "T_s1", "=(Schedule!D5-32)/1.8", "°C"),         # 18
    ("Supply air temperature AHU-3", "T_s3", "=(Schedule!D7-32)*1.8", "°C"),         # 19 P
    ("Coil temperature drop AHU-1", "dT_1", "=Schedule!E5/1.8", "K"),                # 20
    ("Sensible load AHU-1, SI check", "q_s1",
     "=1.23*Schedule!B5*0.4719*C20/1000", "kW"),                                    # 21
    ("Sensible load AHU-1, SI check (copy)", "q_s1x",
     "=1.23*Schedule!B5*0.4719*C20", "kW"),                                         # 22 P
    ("Fan total static pressure", "TSP", 3.5, "in. w.g."),                          # 23
    ("Fan total efficiency", "eta_f", 0.65, "-"),                                   # 24
    ("Fan brake power AHU-1", "P_b", "=Schedule!B5*C23/(6356*C24)", "hp"),          # 25
    ("Fan shaft power AHU-1", "P_bk", "=C25*0.7457", "kW"),                         # 26
    ("Fan motor power AHU-1", "P_m", "=Schedule!B5*C23/(6356*C24)", "kW"),          # 27 P
    ("Fan heat to airstream AHU-1", "q_f", "=C26*3412", "Btu/h"),                    # 28
    ("Supply air temperature rise from fan heat", "dT_f",
     "=C28/(1.08*Schedule!B5)", "°F"),                                              # 29
    ("Room humidity ratio difference", "dW", 14, "gr/lb"),                          # 30
    ("Latent load AHU-1", "q_l", "=0.68*Schedule!B5*C30", "Btu/h"),                 # 31
    ("Coil duty AHU-3 (from schedule)", "Q_3",
     "=VLOOKUP(\"AHU-3\",Schedule!A5:J9,10,FALSE)", "TR"),                            # 32
    ("Coil selected AHU-3, next 5 TR", "Q_3s", "=ROUNDUP(C32/5,0)*5", "TR"),         # 33
    ("Chilled water temperature rise", "dT_w", 10, "°F"),                           # 34
    ("Chilled water flow, all coils", "q_w", "=Schedule!I10/(500*C34)", "gpm"),      # 35
    ("Chilled water flow, L/s", "q_wL", "=C35*0.06309", "L/s"),                      # 36
    ("Chilled water flow (from TR, copy)", "q_wx", "=Schedule!J10/(500*C34)", "gpm"),  # 37 P
], 5))

HVAC = {
    "trade": "HVAC: air-handler cooling coil schedule (cfm, Btu/h, TR; L/s, kW)",
    "sheets": [("Schedule", SCHEDULE), ("Design", DESIGN)],
    "planted": {
        "Schedule!F7": ("offset-scale", "sensible heat from the entering temperature (°F), not ΔT"),
        "Schedule!J8": ("unit-scale", "Btu/h to TR divided by 12 (MBH habit): 1000 times too large"),
        "Design!C9": ("unit-scale", "outdoor-air % used as a fraction in the mixed-air mean"),
        "Design!C13": ("unit-scale", "L/s times 3600 gives L/h, written as m³/h (1000 too large)"),
        "Design!C15": ("unit-scale", "Btu/h to kW multiplied by 3412: wrong way round"),
        "Design!C19": ("unit-scale", "°F to °C with (T-32)*1.8 in place of /1.8"),
        "Design!C22": ("unit-scale", "1.23·L/s·K gives W, written as kW (no /1000)"),
        "Design!C27": ("unit-scale", "fan bhp formula (hp) typed as kW, no 0.7457"),
        "Design!C37": ("unit-scale", "tons where Btu/h is needed in gpm = q/(500·ΔT)"),
    },
}

# --------------------------------------------------------------------------------------------
# Book 2: process pump list with NPSH available (kPa(g), kPa abs, m; psig, psia, ft)
# --------------------------------------------------------------------------------------------
PUMPLIST = {
    "A1": "Tarnwick solvent recovery unit: pump list, NPSH available (invented plant)",
    "A2": "Sources: NPSHa = (p_abs − p_v)/(ρ·g) + z − h_f, Karassik et al., Pump Handbook, "
          "4th ed., ch. 2 (from memory); 101.325 kPa standard atmosphere (ISO 2533); "
          "1 m = 3.281 ft (NIST SP 811, B.8, rounded); 0.6 m minimum margin (common practice); "
          "water vapour pressures from steam tables (from memory)",
    "A5": "Tag", "B5": "Service", "C5": "Vessel pressure [kPa(g)]",
    "D5": "Liquid level above pump [m]", "E5": "Suction friction loss [m]",
    "F5": "Temperature [°C]", "G5": "Density [kg/m³]", "H5": "Vapour pressure [kPa abs]",
    "I5": "NPSHa [m]", "J5": "NPSHr [m]", "K5": "Margin [m]", "L5": "NPSHa/NPSHr [-]",
    "M5": "NPSHa [ft]",
}
PUMPS = [("P-101", "Column reflux", 150, 3.2, 0.6, 45, 990, 9.59, 3.5),
         ("P-102", "Boiler feed", 20, 5.5, 0.8, 105, 955, 120.8, 4.0),
         ("P-103", "Condensate from hotwell", -60, 2.8, 0.4, 75, 975, 38.6, 2.0),
         ("P-104", "Cooling water", 0, 1.5, 0.9, 30, 996, 4.25, 5.0),
         ("P-105", "Lean amine", 35, 2.0, 0.5, 55, 1010, 15.8, 3.2),
         ("P-106", "Hot oil", 250, 3.0, 1.1, 210, 820, 95, 4.5)]
for i, (tag, svc, p, z, hf, t, rho, pv, npshr) in enumerate(PUMPS):
    r = 6 + i
    PUMPLIST.update({f"A{r}": tag, f"B{r}": svc, f"C{r}": p, f"D{r}": z, f"E{r}": hf,
                     f"F{r}": t, f"G{r}": rho, f"H{r}": pv, f"J{r}": npshr,
                     f"I{r}": f"=(C{r}+101.325-H{r})*1000/(G{r}*9.81)+D{r}-E{r}",
                     f"K{r}": f"=I{r}-J{r}", f"L{r}": f"=I{r}/J{r}", f"M{r}": f"=I{r}*3.281"})
PUMPLIST["I8"] = "=(C8-H8)*1000/(G8*9.81)+D8-E8"            # planted: gauge minus absolute
PUMPLIST["I9"] = "=(C9+101.325-H9)/(G9*9.81)+D9-E9"         # planted: kPa used as Pa
PUMPLIST["I11"] = "=(C11+101.325-H11)*1000/G11+D11-E11"     # planted: no g
PUMPLIST.update({
    "A12": "Minimum", "I12": "=MIN(I6:I11)", "K12": "=MIN(K6:K11)",
    "A13": "Margin check", "K13": "=IF(K12<0.6,\"CHECK\",\"OK\")",
})

DUTY = {
    "A1": "Tarnwick SRU: P-104 cooling water pump, vendor data sheet check in US units "
          "(invented plant)",
    "A2": "Sources: NPSHa = 2.31·(p_abs − p_v)/SG + z − h_f (ft, psia), Hydraulic Institute "
          "form (from memory); P = ρ·g·Q·H (Pump Handbook, ch. 2, from memory); 1 psi = "
          "6.895 kPa, 14.7 psia atmosphere, 1 m = 3.281 ft, 1 m³/h = 4.403 gpm (NIST SP 811, "
          "B.8, rounded); T[°F] = 1.8·t[°C] + 32 (NIST SP 811, B.8)",
    "A4": "Item", "B4": "Symbol", "C4": "Value", "D4": "Unit",
}
DUTY.update(column_block([
    ("Suction vessel pressure", "p_s", 12, "psig"),                                 # 5
    ("Atmospheric pressure", "p_atm", 14.7, "psia"),                                # 6
    ("Liquid temperature", "T", 60, "°C"),                                          # 7
    ("Liquid temperature, °F", "T_F", "=C7*1.8+32", "°F"),                          # 8
    ("Liquid temperature, °F (data sheet copy)", "T_Fx", "=C7*1.8", "°F"),          # 9 P
    ("Liquid temperature, absolute", "T_K", "=C7+273.15", "K"),                     # 10
    ("Vapour pressure at 60 °C", "p_v", 2.889, "psia"),                             # 11
    ("Specific gravity", "SG", 0.983, "-"),                                         # 12
    ("Static suction head", "z", 6, "ft"),                                          # 13
    ("Suction friction loss", "h_f", 2.2, "ft"),                                    # 14
    ("NPSH available", "NPSHa", "=2.31*(C5+C6-C11)/C12+C13-C14", "ft"),              # 15
    ("NPSH available (vendor form)", "NPSHa_x", "=2.31*(C5-C11)/C12+C13-C14", "ft"),  # 16 P
    ("NPSH available, m", "NPSHa_m", "=C15/3.281", "m"),                            # 17
    ("NPSH available, m (copy)", "NPSHa_mx", "=C15*3.281", "m"),                    # 18 P
    ("Suction pressure, absolute", "p_sa", "=(C5+C6)*6.895", "kPa abs"),             # 19
    ("Suction pressure, absolute (copy)", "p_sax", "=C5*6.895", "kPa abs"),          # 20 P
    ("Vapour pressure, kPa", "p_vk", "=C11*6.895", "kPa abs"),                       # 21
    ("Rated flow", "Q", 120, "m³/h"),                                               # 22
    ("Rated flow, US", "Q_gpm", "=C22*4.403", "gpm"),                               # 23
    ("Rated flow, L/s", "Q_Ls", "=C22/3.6", "L/s"),                                 # 24
    ("Suction pipe inside diameter", "D", 154.1, "mm"),                             # 25
    ("Suction velocity", "v", "=C22/3600/(PI()*(C25/1000)^2/4)", "m/s"),            # 26
    ("Suction velocity (copy)", "v_x", "=C22/3600/(PI()*C25^2/4)", "m/s"),          # 27 P
    ("Velocity head", "h_v", "=C26^2/(2*9.81)", "m"),                               # 28
    ("Differential head", "H", 48, "m"),                                            # 29
    ("Liquid density", "rho", "=C12*1000", "kg/m³"),                                # 30
    ("Hydraulic power", "P_h", "=C30*9.81*C22/3600*C29/1000", "kW"),                 # 31
    ("Pump efficiency at duty", "eta", 71, "%"),                                     # 32
    ("Shaft power", "P_s", "=C31/(C32/100)", "kW"),                                  # 33
    ("Shaft power (copy)", "P_sx", "=C31/C32", "kW"),                                # 34 P
    ("NPSH required (from pump list)", "NPSHr",
     "=VLOOKUP(\"P-104\",PumpList!A6:J11,10,FALSE)*3.281", "ft"),                      # 35
    ("NPSH margin ratio", "r_npsh", "=C15/C35", "-"),                               # 36
], 5))

PUMPBOOK = {
    "trade": "process: pump list NPSH available (kPa(g), kPa abs, m; psig, psia, ft)",
    "sheets": [("PumpList", PUMPLIST), ("Duty", DUTY)],
    "planted": {
        "PumpList!I8": ("offset-scale", "vessel pressure in kPa(g) minus vapour pressure in kPa abs"),
        "PumpList!I9": ("unit-scale", "kPa used as Pa: no *1000, head 1000 times too small"),
        "PumpList!I11": ("dimension", "pressure over density with no g: not a head"),
        "Duty!C9": ("offset-scale", "°C to °F with *1.8 and no +32"),
        "Duty!C16": ("offset-scale", "psig minus psia in the NPSH formula"),
        "Duty!C18": ("unit-scale", "ft to m multiplied by 3.281: wrong way round"),
        "Duty!C20": ("offset-scale", "gauge pressure converted and written as kPa abs"),
        "Duty!C27": ("unit-scale", "diameter in mm squared as if in m"),
        "Duty!C34": ("unit-scale", "efficiency in % used as a fraction"),
    },
}

# --------------------------------------------------------------------------------------------
# Book 3: solar PV array yield and inverter sizing (kWp, kWh/yr, %, W, V, mm)
# --------------------------------------------------------------------------------------------
PV_SIDECAR = """# Units the PV sheets use that plumb's table lacks (common practice: a module's peak watt is
# its DC rating at STC, 1000 W/m² and 25 °C, IEC 61215; the year of an energy yield is 365 d)
measure Wp = 1 W "watt peak, DC rating at STC"
measure kWp = 1 kW "kilowatt peak, DC rating at STC"
measure yr = 8760 h "a 365-day year, as yield estimates count it"
"""

LOSSES = {
    "A1": "Sellick Farm 3.6 MWp ground-mount: system losses (invented project)",
    "A2": "Sources: loss categories and default values after NREL PVWatts v5 manual, "
          "TP-6A20-62641 (from memory); combined multiplicatively, derate = Π(1 − loss) "
          "(same source)",
    "A4": "Loss", "B4": "Loss [%]", "C4": "Derate [-]",
}
for i, (name, loss) in enumerate([("Soiling", 2), ("Shading", 3), ("Mismatch", 2),
                                  ("DC wiring", 2), ("Connections", 0.5),
                                  ("Light-induced degradation", 1.5),
                                  ("Nameplate rating", 1), ("Availability", 3)]):
    r = 5 + i
    LOSSES.update({f"A{r}": name, f"B{r}": loss, f"C{r}": f"=1-B{r}/100"})
LOSSES["C10"] = "=1-B10"        # planted: % used as a fraction
LOSSES.update({
    "A13": "Sum / combined derate", "B13": "=SUM(B5:B12)", "C13": "=PRODUCT(C5:C12)",
    "A14": "Combined loss", "B14": "=(1-C13)*100",
})

ARRAY = {
    "A1": "Sellick Farm ground-mount PV: yield and inverter sizing (invented project)",
    "A2": "Sources: E = P_dc·(H/G_stc)·365·PR and PR, IEC 61724-1 (from memory); CF = "
          "E/(P_dc·8760) (common practice); V_oc(T) = V_oc·(1 + β·(T − 25 °C)), module data "
          "sheet convention; T_cell = T_a + (NOCT − 20)/800·G (NOCT method, from memory); "
          "string ΔV = 2·L·I·ρ/A (common practice); design current 1.25·I_sc (NEC 690.8, "
          "from memory); ρ_Cu = 0.0175 Ω·mm²/m at 20 °C (common practice)",
    "A4": "Item", "B4": "Symbol", "C4": "Value", "D4": "Unit",
}
ARRAY.update(column_block([
    ("Module rating at STC", "P_mod", 550, "Wp"),                                   # 5
    ("Modules per string", "N_s", 26, "-"),                                         # 6
    ("Strings", "N_p", 252, "-"),                                                   # 7
    ("Array DC capacity", "P_dc", "=C5*C6*C7/1000", "kWp"),                         # 8
    ("Array DC capacity (summary copy)", "P_dcx", "=C5*C6*C7", "kWp"),               # 9 P
    ("Plane-of-array irradiation, annual mean", "H", 4.8, "kWh/m²/d"),              # 10
    ("STC irradiance", "G_stc", 1, "kW/m²"),                                        # 11
    ("Peak sun hours", "PSH", "=C10/C11", "h/d"),                                   # 12
    ("Temperature loss, annual", "x_T", 5.5, "%"),                                  # 13
    ("Inverter loss", "x_inv", 2.5, "%"),                                           # 14
    ("Performance ratio", "PR", "=Losses!C13*(1-C13/100)*(1-C14/100)", "-"),        # 15
    ("Annual yield", "E", "=C8*C12*365*C15", "kWh/yr"),                             # 16
    ("Annual yield, MWh", "E_M", "=C16/1000", "MWh/yr"),                            # 17
    ("Annual yield, MWh (summary copy)", "E_Mx", "=C16*1000", "MWh/yr"),            # 18 P
    ("Specific yield", "Y_f", "=C16/C8", "kWh/kWp/yr"),                             # 19
    ("Capacity factor", "CF", "=C16/(C8*8760)*100", "%"),                            # 20
    ("Inverter rated AC power", "P_inv", 125000, "W"),                              # 21
    ("Number of inverters", "N_inv", 24, "-"),                                      # 22
    ("DC/AC ratio", "r_dcac", "=C8/(C21*C22/1000)", "-"),                           # 23
    ("DC/AC ratio (summary copy)", "r_dcacx", "=C8/(C21*C22)", "-"),                 # 24 P
    ("Inverters needed at DC/AC 1.25", "N_req", "=ROUNDUP(C8/1.25/(C21/1000),0)", "-"),  # 25
    ("Module V_oc at STC", "V_oc", 49.6, "V"),                                      # 26
    ("Temperature coefficient of V_oc", "beta", -0.27, "%/K"),                      # 27
    ("Record low ambient", "T_min", -18, "°C"),                                     # 28
    ("Module V_oc at T_min", "V_ocm", "=C26*(1+C27/100*(C28-25))", "V"),             # 29
    ("Module V_oc at T_min (copy)", "V_ocmx", "=C26*(1+C27*(C28-25))", "V"),         # 30 P
    ("String V_oc at T_min", "V_str", "=C29*C6", "V"),                              # 31
    ("Inverter maximum DC input voltage", "V_max", 1500, "V"),                      # 32
    ("Maximum modules per string", "N_smax", "=ROUNDDOWN(C32/C29,0)", "-"),          # 33
    ("String voltage check", "flag", "=IF(C31<C32,\"OK\",\"TOO LONG\")", None),      # 34
    ("Module NOCT", "T_noct", 45, "°C"),                                            # 35
    ("Design ambient temperature", "T_a", 38, "°C"),                                # 36
    ("Design irradiance", "G", 1000, "W/m²"),                                       # 37
    ("Cell temperature at design", "T_c", "=C36+(C35-20)/800*C37", "°C"),            # 38
    ("Cell temperature at STC irradiance", "T_cx", "=C36+(C35-20)/800*C11", "°C"),   # 39 P
    ("String cable length, one way", "L", 85, "m"),                                 # 40
    ("Module current at MPP", "I_mp", 13.2, "A"),                                   # 41
    ("String cable cross-section", "A_c", 6, "mm²"),                                # 42
    ("Copper resistivity at 20 °C", "rho", 0.0175, "Ω·mm²/m"),                       # 43
    ("String cable voltage drop", "dV", "=2*C40*C41*C43/C42", "V"),                  # 44
    ("Module voltage at MPP", "V_mp", 41.8, "V"),                                   # 45
    ("String voltage at MPP", "V_mps", "=C45*C6", "V"),                             # 46
    ("String voltage drop", "x_dV", "=C44/C46*100", "%"),                            # 47
    ("String voltage drop (copy)", "x_dVx", "=C44/C46", "%"),                        # 48 P
    ("Module short-circuit current", "I_sc", 14.0, "A"),                            # 49
    ("String design current", "I_d", "=1.25*C49", "A"),                             # 50
    ("Module length", "a", 2278, "mm"),                                             # 51
    ("Module width", "b", 1134, "mm"),                                              # 52
    ("Module area", "A_m", "=C51*C52/1000000", "m²"),                               # 53
    ("Array module area", "A_a", "=C53*C6*C7", "m²"),                               # 54
    ("Array module area (copy)", "A_ax", "=C51*C52*C6*C7/1000", "m²"),               # 55 P
    ("Module efficiency", "eta_m", "=C5/(C53*C11*1000)*100", "%"),                  # 56
], 5))

PVBOOK = {
    "trade": "solar PV: array yield and inverter sizing (kWp, kWh/yr, %, W, V)",
    "sheets": [("Losses", LOSSES), ("Array", ARRAY)],
    "sidecar": PV_SIDECAR,
    "planted": {
        "Losses!C10": ("unit-scale", "loss in % used as a fraction: 1 − 1.5"),
        "Array!C9": ("unit-scale", "Wp × count written as kWp, no /1000"),
        "Array!C18": ("unit-scale", "kWh to MWh multiplied by 1000: wrong way round"),
        "Array!C24": ("unit-scale", "kWp over inverter W: DC/AC 1000 times too small"),
        "Array!C30": ("unit-scale", "β in %/K used as a fraction"),
        "Array!C39": ("unit-scale", "irradiance in kW/m² where the NOCT rule's 800 W/m² needs W/m²"),
        "Array!C48": ("unit-scale", "voltage drop ratio written into a % cell, no *100"),
        "Array!C55": ("unit-scale", "mm × mm to m² divided by 1000, not 10⁶"),
    },
}

# --------------------------------------------------------------------------------------------
# Book 4: storm sewer design table (rational method, Manning full bore; SI and US units)
# --------------------------------------------------------------------------------------------
IDF = {
    "A1": "Brackley Fields estate: design rainfall, 1 in 10 yr (invented IDF data, demo only)",
    "A2": "Source: invented intensity-duration table for the demo; 1 in = 25.4 mm "
          "(NIST SP 811, B.8)",
    "A4": "Duration [min]", "B4": "Intensity [mm/h]", "C4": "Intensity [in/h]",
}
for i, (d, mm) in enumerate([(5, 150), (10, 118), (15, 98), (20, 84), (30, 66), (45, 51),
                             (60, 42)]):
    r = 5 + i
    IDF.update({f"A{r}": d, f"B{r}": mm, f"C{r}": f"=B{r}/25.4"})
IDF["C8"] = "=B8*25.4"          # planted: wrong way round

SEWER = {
    "A1": "Brackley Fields estate: storm sewer run 1, design table (invented scheme)",
    "A2": "Sources: rational method Q = 2.778·C·i·A (L/s, mm/h, ha), ASCE MOP 77 / WEF FD-20 "
          "(from memory); Manning full bore Q = (0.312/n)·D^(8/3)·S^(1/2) (m³/s, m), from "
          "V = (1/n)·R^(2/3)·S^(1/2), R = D/4, V. T. Chow, Open-Channel Hydraulics, 1959 (from "
          "memory); t_c = inlet time + Σ L/V (common practice); intensity read from IDF sheet "
          "at the duration at or below t_c (common practice)",
    "A3": "Manning n, concrete pipe", "B3": "n", "C3": 0.013, "D3": "s/m^(1/3)",
    "A4": "Inlet time", "B4": "t_i", "C4": 10, "D4": "min",
    "A6": "Pipe", "B6": "Length [m]", "C6": "Area [ha]", "D6": "Runoff C [-]",
    "E6": "C·A [ha]", "F6": "ΣC·A [ha]", "G6": "t_c [min]", "H6": "i [mm/h]",
    "I6": "Q design [L/s]", "J6": "Slope [%]", "K6": "Diameter [mm]", "L6": "Q full [L/s]",
    "M6": "V full [m/s]", "N6": "Travel time [min]", "O6": "Q/Q full [-]", "P6": "Check",
}
PIPES = [("1.1", 62, 0.42, 0.75, 1.2, 300), ("1.2", 78, 0.55, 0.70, 1.0, 375),
         ("1.3", 85, 0.61, 0.65, 0.8, 450), ("1.4", 70, 0.38, 0.80, 0.8, 450),
         ("1.5", 95, 0.74, 0.60, 0.6, 525), ("1.6", 88, 0.50, 0.70, 0.5, 600)]
for i, (name, length, area, c, slope, dia) in enumerate(PIPES):
    r = 7 + i
    SEWER.update({
        f"A{r}": name, f"B{r}": length, f"C{r}": area, f"D{r}": c, f"J{r}": slope,
        f"K{r}": dia,
        f"E{r}": f"=C{r}*D{r}",
        f"F{r}": f"=E{r}" if r == 7 else f"=F{r - 1}+E{r}",
        f"G{r}": "=$C$4" if r == 7 else f"=G{r - 1}+N{r - 1}",
        f"H{r}": f"=VLOOKUP(G{r},IDF!$A$5:$B$11,2,TRUE)",
        f"I{r}": f"=2.778*F{r}*H{r}",
        f"L{r}": f"=1000*0.312/$C$3*(K{r}/1000)^(8/3)*(J{r}/100)^0.5",
        f"M{r}": f"=L{r}/1000/(PI()*(K{r}/1000)^2/4)",
        f"N{r}": f"=B{r}/M{r}/60",
        f"O{r}": f"=I{r}/L{r}",
        f"P{r}": f"=IF(O{r}>1,\"SURCHARGED\",\"OK\")",
    })
SEWER["I9"] = "=F9*H9/3.6"                                      # planted: km² form with ha
SEWER["L10"] = "=1000*0.312/$C$3*K10^(8/3)*(J10/100)^0.5"       # planted: D in mm
SEWER["L11"] = "=1000*0.312/$C$3*(K11/1000)^(8/3)*J11^0.5"      # planted: slope % under root
SEWER["N8"] = "=B8/M8"                                          # planted: seconds in min
SEWER["M12"] = "=L12/(PI()*(K12/1000)^2/4)"                     # planted: L/s as m³/s
SEWER.update({
    "A13": "Total / max", "B13": "=SUM(B7:B12)", "C13": "=SUM(C7:C12)", "I13": "=MAX(I7:I12)",
    "M13": "=MAX(M7:M12)",
})

US = {
    "A1": "Brackley Fields estate: reviewer's US-unit check of pipe 1.6 (invented scheme)",
    "A2": "Sources: Q = C·i·A (cfs, in/h, acres) and full-bore Q = (0.463/n)·D^(8/3)·S^(1/2) "
          "(cfs, ft), FHWA HEC-22 (from memory); 1 ha = 2.471 acres, 1 cfs = 28.32 L/s, "
          "1 m³/s = 35.31 cfs, 1 in = 25.4 mm, 1 ft = 0.3048 m (NIST SP 811, B.8, rounded)",
    "A3": "Item", "B3": "Symbol", "C3": "Value", "D3": "Unit",
}
US.update(column_block([
    ("Contributing C·A, pipe 1.6", "CA", "=Sewer!F12*2.471", "acres"),               # 4
    ("Design intensity", "i", "=Sewer!H12/25.4", "in/h"),                            # 5
    ("Design flow", "Q", "=C4*C5", "cfs"),                                           # 6
    ("Design flow, L/s", "Q_L", "=C6*28.32", "L/s"),                                 # 7
    ("Design flow from the SI table", "Q_x", "=Sewer!I12*35.31", "cfs"),              # 8 P
    ("Pipe diameter", "D_in", "=Sewer!K12/25.4", "in"),                              # 9
    ("Pipe diameter, ft", "D", "=C9/12", "ft"),                                      # 10
    ("Slope", "S", "=Sewer!J12/100", "ft/ft"),                                       # 11
    ("Manning n", "n", "=Sewer!C3", "s/m^(1/3)"),                                     # 12
    ("Full-bore capacity", "Q_f", "=0.463/C12*C10^(8/3)*C11^0.5", "cfs"),             # 13
    ("Full-bore capacity, L/s", "Q_fL", "=C13*28.32", "L/s"),                        # 14
    ("Full-bore capacity (first pass)", "Q_fx", "=0.463/C12*C9^(8/3)*C11^0.5", "cfs"),  # 15 P
    ("Full-bore velocity", "V", "=C13/(PI()*C10^2/4)", "ft/s"),                       # 16
    ("Full-bore velocity, m/s", "V_m", "=C16*0.3048", "m/s"),                         # 17
    ("Full-bore velocity, m/s (copy)", "V_mx", "=C16*3.281", "m/s"),                  # 18 P
    ("Fall over pipe length", "dz", "=Sewer!B12*3.281*C11", "ft"),                    # 19
    ("Capacity check", "flag", "=IF(C13>=C6,\"OK\",\"UPSIZE\")", None),               # 20
], 4))

STORMBOOK = {
    "trade": "drainage: storm sewer design table (rational method, Manning SI and US)",
    "sheets": [("IDF", IDF), ("Sewer", SEWER), ("US", US)],
    "planted": {
        "IDF!C8": ("unit-scale", "mm/h to in/h multiplied by 25.4: wrong way round"),
        "Sewer!I9": ("unit-scale", "C·i·A/3.6 (the km² form) with A in ha: 10 times too small"),
        "Sewer!L10": ("unit-scale", "Manning full bore with D in mm"),
        "Sewer!L11": ("unit-scale", "Manning with the slope in % under the root"),
        "Sewer!N8": ("unit-scale", "travel time L/V in s into the min column, no /60"),
        "Sewer!M12": ("unit-scale", "velocity from L/s over m², no /1000"),
        "US!C8": ("unit-scale", "L/s times 35.31 as if m³/s: 1000 times too large"),
        "US!C15": ("unit-scale", "US Manning full bore with D in inches, not ft"),
        "US!C18": ("unit-scale", "ft/s to m/s multiplied by 3.281: wrong way round"),
    },
}

BOOKS = {
    "ahu-schedule": HVAC,
    "pump-npsh": PUMPBOOK,
    "pv-yield": PVBOOK,
    "storm-sewer": STORMBOOK,
}


def formula_cells(book):
    return [f"{name}!{cell}" for name, cells in book["sheets"] for cell, v in cells.items()
            if isinstance(v, str) and v.startswith("=")]


def book_formula(book, ref):
    sheet, cell = ref.split("!")
    return dict(book["sheets"])[sheet][cell]


def main():
    summary = {}
    for stem, book in BOOKS.items():
        write_xlsx(os.path.join(HERE, stem + ".xlsx"), book["sheets"], book.get("names"))
        if "sidecar" in book:
            with open(os.path.join(HERE, stem + ".cells.plumb"), "w", encoding="utf-8") as f:
                f.write(book["sidecar"])
        formulas = formula_cells(book)
        for cell in book["planted"]:
            assert cell in formulas, f"{stem}: {cell} is not a formula cell"
        correct = [c for c in formulas if c not in book["planted"]]
        with open(os.path.join(HERE, stem + ".expect"), "w", encoding="utf-8") as f:
            f.write("# sheet!cell rule: the planted mistakes plumb must report; every other\n"
                    "# formula cell must stay clean (written by make_books.py)\n")
            for cell, (rule, what) in book["planted"].items():
                f.write(f"# planted: {what}\n{cell} {rule}\n")
        summary[stem] = {
            "trade": book["trade"],
            "planted": {c: {"rule": r, "what": w} for c, (r, w) in book["planted"].items()},
            "correct": correct,
            "formulas": {c: book_formula(book, c) for c in formulas},
        }
    with open(os.path.join(HERE, "expect.json"), "w", encoding="utf-8") as f:
        json.dump(summary, f, indent=1, ensure_ascii=False)


if __name__ == "__main__":
    main()
