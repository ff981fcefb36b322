#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review38), written with the
standard library only (corpus/sheets/xlsx_writer.py and item_sheet.py, shared by the review
books), adapted from corpus/sheets/review19/make_books.py.

Trades: a pump schedule; a boiler blowdown and deaerator sheet; a distribution transformer
loading sheet; a concrete pour and formwork pressure sheet. All scenarios, sites, readings and
catalogue data are invented (demonstration only); the formulas and published factors are the
trade's own, with their sources named in a text cell at the top of each sheet.

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
# Book 1: pump schedule (m³/h and gpm with the line size typed beside them, m and ft, kW and
# hp, %)
# --------------------------------------------------------------------------------------------
PUMP_SRC = (
    "Sources: hydraulic power P_h = ρ·g·Q·H, in kW = Q[m³/h]·H[m]·SG·9.81/3600 or Q·H·SG/367; "
    "shaft power P_h/η; US brake horsepower bhp = gpm·ft·SG/(3960·η); pipe velocity v[ft/s] = "
    "0.4085·gpm/d[in]²: Cameron Hydraulic Data 19th ed. (Flowserve, 2002) sec. 1 and 3 (from "
    "memory). NPSH available = (p_s + p_atm − p_v)/(ρ·g) + z_s − h_fs and a 1 m margin over "
    "NPSHr: ANSI/HI 9.6.1-2017 (from memory). Motor rated outputs: IEC 60072-1 steps (from "
    "memory), motor at least 110 % of shaft power: common practice. NIST SP 811 (2008) App. "
    "B.8: 1 m³/h = 4.403 US gpm, 1 US gpm = 0.0631 L/s, 1 ft = 0.3048 m (3.281 ft/m), 1 kW = "
    "1.341 hp (1 hp = 0.7457 kW), standard atmosphere 101.325 kPa. Water at 40 °C: ρ = 992 "
    "kg/m³, p_v = 7.38 kPa (steam tables, from memory). Pump duties and test readings "
    "invented.")
duty = ItemSheet("Duty", "Harrowfield Works utilities: pump schedule and P-101 worked checks "
                 "(invented scenario)", PUMP_SRC)
duty.add("SG", "Specific gravity of the liquid (water, 40 °C)", "SG", 0.992, "-")
duty.add("rho", "Liquid density", "rho", 992, "kg/m³")
duty.add("g", "Gravity", "g", 9.81, "m/s²")
duty.add("patm", "Atmospheric pressure (standard)", "p_atm", 101.325, "kPa")
duty.add("ps", "Suction tank nitrogen blanket pressure", "p_s", 5, "kPa g")
duty.add("pv", "Vapour pressure of water at 40 °C (absolute)", "p_v", 7.38, "kPa")
duty.add("zs", "Liquid level above pump centreline (minimum)", "z_s", 2.5, "m")
duty.add("hfs", "Suction line friction loss at duty flow", "h_fs", 0.6, "m")
duty.add("NPSHa", "NPSH available, P-101", "NPSH_a",
         "=({ps}+{patm}-{pv})*1000/({rho}*{g})+{zs}-{hfs}", "m")
duty.add("NPSHa2", "NPSH available, P-101 (vendor enquiry form)", "NPSH_a2",
         "=({ps}-{pv})*1000/({rho}*{g})+{zs}-{hfs}", "m",
         planted=("offset-scale", "gauge blanket pressure less an absolute vapour pressure: the "
                  "atmosphere left out of NPSHa"))
duty.add("NPSHr", "NPSH required at duty flow (pump curve)", "NPSH_r", 3.2, "m")
duty.add("npchk", "NPSH margin check (1 m)", "check_NPSH",
         "=IF({NPSHa}-{NPSHr}>=1,\"OK\",\"LOW - review suction\")")
duty.add("dp", "Differential pressure across P-101 at works test", "Δp_test", 318, "kPa")
duty.add("Ht", "Differential head at works test", "H_test", "={dp}*1000/({rho}*{g})", "m")
duty.add("Ht2", "Differential head at works test (test sheet)", "H_test2", "={dp}*1000/{rho}",
         "m", planted=("result-unit", "Δp/ρ with g left out: J/kg, not a head in m"))
duty.add("Qt", "Total flow of the duty pumps", "Q_tot", "=Schedule!C10", "m³/h")
duty.add("QtLs", "Total flow, L/s (from the gpm column)", "Q_tot,Ls", "=Schedule!E10*0.0631",
         "L/s")
duty.add("Hmax", "Highest head on the schedule", "H_max", "=MAX(Schedule!G5:H9)", "m",
         planted=("mixed-range", "the maximum taken over the m and ft head columns together"))
duty.add("Pq", "Hydraulic power of P-101, quick check (Q·H·SG/367)", "P_h,q",
         "=Schedule!C5*Schedule!G5*{SG}/367", "kW")
duty.add("bore", "P-101 discharge bore (DN 200, Sch 40)", "d", 202.7, "mm")
duty.add("v", "Discharge velocity, P-101", "v", "=Schedule!C5/3600/(PI()*({bore}/1000)^2/4)", "m/s")
duty.add("vft", "Discharge velocity, P-101 (US check, 0.4085·gpm/d²)", "v_ft",
         "=0.4085*Schedule!E5/({bore}/25.4)^2", "ft/s")
duty.add("vchk", "Velocity check (3 m/s)", "check_v", "=IF({v}>3,\"HIGH\",\"OK\")")
duty.add("Pseal", "Seal flush booster pump, absorbed power", "P_seal", 750, "W")
duty.add("Ptot", "Total absorbed power incl. seal flush", "P_tot", "=Schedule!K10+{Pseal}", "kW",
         planted=("unit-scale", "shaft powers in kW added to a seal pump's 750 W"))
DUTY = duty.finish()

SG = duty.ref("SG")
SCHEDULE = {
    "A1": "Harrowfield Works utilities: pump schedule (invented duties)",
    "A2": ("Sources: as the Duty sheet: gpm = m³/h × 4.403 and ft = m × 3.281 (NIST SP 811 "
           "(2008) App. B.8); P_h[kW] = Q[m³/h]·H[m]·SG·9.81/3600, shaft power P_h/η, motor the "
           "next IEC step above 110 % of shaft power (Motors sheet), hp = kW × 1.341; bhp = "
           "gpm·ft·SG/(3960·η) (Cameron Hydraulic Data 19th ed., from memory). Line sizes as "
           "typed on the P&ID."),
    "A3": CAUTION,
    "A4": "Tag", "B4": "Service", "C4": "Flow [m³/h]", "D4": "Line size",
    "E4": "Flow [gpm]", "F4": "Line size (US)", "G4": "Head [m]", "H4": "Head [ft]",
    "I4": "Efficiency [%]", "J4": "Hydraulic power [kW]", "K4": "Shaft power [kW]",
    "L4": "Motor [kW]", "M4": "Motor [hp]", "N4": "bhp (US check) [hp]",
    "A10": "Total / mean",
    "C10": "=SUM(C5:C9)", "E10": "=SUM(E5:E9)", "I10": "=AVERAGE(I5:I9)",
    "J10": "=SUM(J5:J9)", "K10": "=SUM(K5:K9)", "L10": "=SUM(L5:L9)",
}
for r, (tag, svc, q, dn, nps, h, eta) in enumerate([
        ("P-101", "Cooling water circulation", 220, "DN 200", '8"', 32, 82),
        ("P-102", "Raw water transfer", 95, "DN 150", '6"', 45, 76),
        ("P-103", "Condensate return", 18, "DN 65", '2-1/2"', 38, 58),
        ("P-104", "Chilled water primary", 140, "DN 150", '6"', 24, 80),
        ("P-105", "Process water booster", 60, "DN 100", '4"', 55, 72)], start=5):
    SCHEDULE.update({f"A{r}": tag, f"B{r}": svc, f"C{r}": q, f"D{r}": dn, f"F{r}": nps,
                     f"G{r}": h, f"I{r}": eta})
    SCHEDULE[f"E{r}"] = f"=C{r}*4.403"
    SCHEDULE[f"H{r}"] = f"=G{r}*3.281"
    SCHEDULE[f"J{r}"] = f"=C{r}*G{r}*{SG}*9.81/3600"
    SCHEDULE[f"K{r}"] = f"=J{r}/(I{r}/100)"
    SCHEDULE[f"L{r}"] = f"=VLOOKUP(K{r}*1.1,Motors!$A$5:$B$20,2)"
    SCHEDULE[f"M{r}"] = f"=L{r}*1.341"
    SCHEDULE[f"N{r}"] = f"=E{r}*H{r}*{SG}/(3960*I{r}/100)"
SCHEDULE["E7"] = "=C7/4.403"                                   # planted: wrong way round
SCHEDULE["H8"] = "=G8*0.3048"                                  # planted: wrong way round
SCHEDULE["K9"] = "=J9/I9"                                      # planted: % as a fraction
SCHEDULE["M8"] = "=L8*0.7457"                                  # planted: kW->hp wrong way
SCHEDULE["N6"] = f"=E6*H6*3.281*{SG}/(3960*I6/100)"            # planted: ft converted twice

MOTORS = {
    "A1": "IEC motor rated outputs: the next step above the required power (from memory of "
          "IEC 60072-1; check the maker's frame table)",
    "A4": "Required from [kW]", "B4": "Motor rating [kW]",
}
steps = [0.75, 1.1, 1.5, 2.2, 3, 4, 5.5, 7.5, 11, 15, 18.5, 22, 30, 37, 45, 55, 75, 90]
for r, (lo, hi) in enumerate(zip([0] + steps[:-1], steps), start=5):
    MOTORS[f"A{r}"], MOTORS[f"B{r}"] = lo, hi

PUMP = {
    "trade": "mechanical: pump schedule with US cross-checks",
    "sheets": [("Duty", DUTY), ("Schedule", SCHEDULE), ("Motors", MOTORS)],
    "planted": {**duty.planted,
                "Schedule!E7": ("unit-scale", "m³/h to gpm divided by 4.403: wrong way round"),
                "Schedule!H8": ("unit-scale", "m to ft multiplied by 0.3048: wrong way round"),
                "Schedule!K9": ("unit-scale", "efficiency in % used as a fraction: shaft power "
                                "100 too small"),
                "Schedule!M8": ("unit-scale", "kW to hp multiplied by 0.7457: wrong way round"),
                "Schedule!N6": ("unit-scale", "head already in ft multiplied by 3.281 again in "
                                "bhp = gpm·ft/3960η")},
}


# --------------------------------------------------------------------------------------------
# Book 2: boiler blowdown and deaerator (kg/h and lb/h, bar g and psig, ppm, %, flash fraction)
# --------------------------------------------------------------------------------------------
BOILER_SRC = (
    "Sources: blowdown rate B = S·F/(A − F), F feedwater TDS and A the boiler water TDS limit; "
    "flash steam fraction (h_f1 − h_f2)/h_fg2; deaerator steam from m_s·(h_g − h_f) = "
    "m_fw·c·(t_DA − t_mix): Spirax Sarco, The Steam and Condensate Loop (2007), blocks 3 and "
    "26 (from memory). Boiler water TDS limit 3000 ppm for a shell boiler: BS 2486:1997 (from "
    "memory). Steam table (Steam sheet): from memory of a printed IAPWS-IF97 table in bar g; "
    "check before use. Steam as an ideal gas, v = R·T/p with R = 8.314/18.015 = 0.4615 "
    "kJ/(kg·K) (CODATA 2018 R; common practice, about 1 % high near saturation at low "
    "pressure). c = 4.19 kJ/(kg·K) for water: common practice. Flash steam line velocity "
    "15-25 m/s: common practice. NIST SP 811 (2008) App. B.8: 1 kg = 2.205 lb, 1 bar = 14.5 "
    "psi, standard atmosphere 14.7 psi = 1.013 bar, T/K = t/°C + 273.15. Site data invented.")
pl = ItemSheet("Plant", "Elmstead Dairy boiler house: blowdown, flash recovery and deaerator "
               "(invented scenario)", BOILER_SRC)
pl.add("S", "Steam generation (all users)", "S", "=Users!B10", "kg/h")
pl.add("Slb", "Steam generation, lb/h", "S_lb", "={S}*2.205", "lb/h")
pl.add("pb", "Boiler operating pressure", "p_b", 10, "bar g")
pl.add("pbg", "Boiler pressure, psig", "p_b,psig", "={pb}*14.5", "psig")
pl.add("pba", "Boiler pressure, psia", "p_b,psia", "={pbg}+14.7", "psia")
pl.add("pba2", "Boiler pressure, psia (burner datasheet)", "p_b,psia2", "={pb}*14.5", "psia",
       planted=("offset-scale", "a gauge pressure converted to psi and written as psia: the "
                "atmosphere left out"))
pl.add("mc", "Condensate returned", "m_c", "=SUMPRODUCT(Users!B5:B9,Users!F5:F9)/100", "kg/h")
pl.add("crp", "Condensate return, share of steam", "CR", "={mc}/{S}*100", "%")
pl.add("TDSmu", "Make-up water TDS (softened)", "TDS_mu", 250, "ppm")
pl.add("F", "Feedwater TDS", "F", "={TDSmu}*(100-{crp})/100", "ppm")
pl.add("A", "Boiler water TDS limit", "A", 3000, "ppm")
pl.add("bd", "Blowdown rate, share of steam", "b", "={F}/({A}-{F})*100", "%")
pl.add("B", "Blowdown flow", "B", "={S}*{bd}/100", "kg/h")
pl.add("Bv", "Blowdown valve sizing flow (25 % margin)", "B_v", "={S}*{bd}*1.25", "kg/h",
       planted=("unit-scale", "blowdown % used as a fraction: 100 too large"))
pl.add("Blb", "Blowdown flow, lb/h (chemical supplier's form)", "B_lb", "={B}", "lb/h",
       planted=("unit-scale", "kg/h written under lb/h: 2.205 too small"))
pl.add("FW", "Feedwater flow", "m_fw", "={S}+{B}", "kg/h")
pl.add("FWlb", "Feedwater flow, lb/h", "m_fw,lb", "={FW}*2.205", "lb/h")
pl.add("pf", "Flash vessel pressure", "p_f", 0.5, "bar g")
pl.add("hf1", "Boiler water enthalpy at boiler pressure", "h_f1",
       "=VLOOKUP({pb},Steam!$A$5:$E$14,3,FALSE)", "kJ/kg")
pl.add("hf2", "Water enthalpy at flash pressure", "h_f2",
       "=VLOOKUP({pf},Steam!$A$5:$E$14,3,FALSE)", "kJ/kg")
pl.add("hfg2", "Latent heat at flash pressure", "h_fg2",
       "=VLOOKUP({pf},Steam!$A$5:$E$14,4,FALSE)", "kJ/kg")
pl.add("x", "Flash steam fraction", "x", "=({hf1}-{hf2})/{hfg2}", "kg/kg")
pl.add("mfl", "Flash steam flow", "m_fl", "={B}*{x}", "kg/h")
pl.add("Qfl", "Heat recovered in flash steam", "Q_fl", "={mfl}*{hfg2}/3600", "kW")
pl.add("Qfl2", "Heat recovered in flash steam (energy report)", "Q_fl2", "={mfl}*{hfg2}", "kW",
       planted=("unit-scale", "kg/h × kJ/kg without /3600: kJ/h written as kW, 3600 too large"))
pl.add("tfl", "Flash vessel temperature", "t_fl", "=VLOOKUP({pf},Steam!$A$5:$E$14,2,FALSE)", "°C")
pl.add("Rs", "Gas constant of steam (ideal gas)", "R", 0.4615, "kJ/(kg·K)")
pl.add("pfa", "Flash vessel pressure, absolute", "p_f,a", "=({pf}+1.013)*100", "kPa")
pl.add("vg", "Specific volume of flash steam", "v_g", "={Rs}*({tfl}+273.15)/{pfa}", "m³/kg")
pl.add("vg2", "Specific volume of flash steam (first pass)", "v_g2", "={Rs}*{tfl}/{pfa}", "m³/kg",
       planted=("offset-scale", "°C where the absolute temperature in K belongs"))
pl.add("vg3", "Specific volume of flash steam (rev. A)", "v_g3",
       "={Rs}*({tfl}+273.15)/({pf}*100)", "m³/kg",
       planted=("offset-scale", "gauge pressure in p·v = R·T, where the absolute belongs"))
pl.add("dfl", "Flash steam line bore (DN 25)", "d_fl", 25, "mm")
pl.add("vfl", "Flash steam line velocity", "V_fl",
       "={mfl}*{vg}/3600/(PI()*({dfl}/1000)^2/4)", "m/s")
pl.add("vchk", "Velocity check (25 m/s)", "check_v", "=IF({vfl}<=25,\"OK\",\"HIGH\")")
pl.add("Bres", "Residual blowdown to the cooler", "B_res", "={B}-{mfl}", "kg/h")
pl.add("c", "Specific heat of water", "c", 4.19, "kJ/(kg·K)")
pl.add("tmu", "Make-up water temperature", "t_mu", 12, "°C")
pl.add("Qres", "Heat left in residual blowdown (above make-up)", "Q_res",
       "={Bres}*{c}*({tfl}-{tmu})/3600", "kW")
pl.add("Qrad", "Boiler shell radiation loss (maker's data)", "Q_rad", 6500, "W")
pl.add("Qloss", "Blowdown and shell losses", "Q_loss", "={Qres}+{Qrad}", "kW",
       planted=("unit-scale", "kW added to W"))
pl.add("pda", "Deaerator pressure", "p_DA", 0.2, "bar g")
pl.add("tda", "Deaerator temperature", "t_DA", "=VLOOKUP({pda},Steam!$A$5:$E$14,2,FALSE)", "°C")
pl.add("tc", "Condensate return temperature", "t_c", 80, "°C")
pl.add("tmix", "Mixed condensate and make-up temperature", "t_mix",
       "=({mc}*{tc}+({FW}-{mc})*{tmu})/{FW}", "°C")
pl.add("hgda", "Steam enthalpy at deaerator pressure", "h_g,DA",
       "=VLOOKUP({pda},Steam!$A$5:$E$14,5,FALSE)", "kJ/kg")
pl.add("hfda", "Water enthalpy at deaerator pressure", "h_f,DA",
       "=VLOOKUP({pda},Steam!$A$5:$E$14,3,FALSE)", "kJ/kg")
pl.add("msda", "Deaerator heating steam", "m_s,DA",
       "={FW}*{c}*({tda}-{tmix})/({hgda}-{hfda})", "kg/h")
pl.add("msdalb", "Deaerator heating steam, lb/h", "m_s,DA,lb", "={msda}*2.205", "lb/h")
pl.add("msnet", "Live steam to the deaerator (flash steam used first)", "m_s,net",
       "={msda}-{mfl}", "kg/h")
pl.add("share", "Live steam to the deaerator, share of generation", "s_DA", "={msnet}/{S}*100",
       "%")
PLANT = pl.finish()

USERS = {
    "A1": "Elmstead Dairy: steam users (invented loads)",
    "A2": ("Sources: as the Plant sheet: lb/h = kg/h × 2.205 and psig = bar g × 14.5 (NIST SP "
           "811 (2008) App. B.8); condensate returned = load × return share."),
    "A3": CAUTION,
    "A4": "User", "B4": "Steam [kg/h]", "C4": "Steam [lb/h]", "D4": "Pressure [bar g]",
    "E4": "Pressure [psig]", "F4": "Condensate return [%]",
    "A10": "Total / highest / weighted",
    "B10": "=SUM(B5:C9)", "C10": "=SUM(C5:C9)", "D10": "=MAX(D5:D9)", "E10": "=MAX(E5:E9)",
    "F10": "=SUMPRODUCT(B5:B9,F5:F9)/SUM(B5:B9)",
}
for r, (user, m, p, cr) in enumerate([("Pasteuriser calorifier", 1800, 7, 90),
                                      ("Spray dryer air heater", 2400, 8, 85),
                                      ("Space heating", 900, 2, 95),
                                      ("Direct steam injection", 600, 3, 0),
                                      ("Tank heating coils", 500, 5, 70)], start=5):
    USERS.update({f"A{r}": user, f"B{r}": m, f"D{r}": p, f"F{r}": cr})
    USERS[f"C{r}"] = f"=B{r}*2.205"
    USERS[f"E{r}"] = f"=D{r}*14.5"
USERS["C7"] = "=B7/2.205"          # planted: kg/h to lb/h divided: wrong way round

STEAM = {
    "A1": "Saturated steam by gauge pressure (from memory of a printed IAPWS-IF97 table, "
          "atmosphere 1.013 bar; check before use)",
    "A4": "Pressure [bar g]", "B4": "Temperature [°C]", "C4": "h_f [kJ/kg]", "D4": "h_fg [kJ/kg]",
    "E4": "h_g [kJ/kg]",
}
for r, row in enumerate([(0, 100.0, 419.0, 2257.0, 2676.0), (0.2, 105.1, 440.6, 2243.2, 2683.8),
                         (0.5, 111.6, 468.2, 2225.6, 2693.8), (1, 120.4, 505.6, 2201.1, 2706.7),
                         (2, 133.7, 562.2, 2163.3, 2725.5), (3, 143.8, 605.3, 2133.4, 2738.7),
                         (5, 158.9, 670.9, 2086.0, 2756.9), (7, 170.5, 721.4, 2047.7, 2769.1),
                         (8, 175.4, 743.1, 2031.1, 2774.2), (10, 184.1, 781.6, 2000.1, 2781.7)],
                        start=5):
    for col, v in zip("ABCDE", row):
        STEAM[f"{col}{r}"] = v

BOILER = {
    "trade": "steam: boiler blowdown, flash steam recovery and deaerator balance",
    "sheets": [("Plant", PLANT), ("Users", USERS), ("Steam", STEAM)],
    "planted": {**pl.planted,
                "Users!C7": ("unit-scale", "kg/h to lb/h divided by 2.205: wrong way round"),
                "Users!B10": ("mixed-range", "total steam summed over the kg/h and lb/h columns "
                              "together")},
}


# --------------------------------------------------------------------------------------------
# Book 3: distribution transformer loading (MVA, kVA, kW, kvar, pf, A at 11 kV and 415 V, W and
# kW losses, °C and K)
# --------------------------------------------------------------------------------------------
TX_SRC = (
    "Sources: rated current I = S/(√3·U), IEC 60076-1:2011 §3.4 (from memory); load losses "
    "vary as K², no-load losses constant (common practice); top-oil rise Δθ_TO = Δθ_TO,R·"
    "((K²R + 1)/(R + 1))^n, hot-spot gradient Δθ_H = Δθ_H,R·K^(2m), exponents n and m by "
    "cooling class (Cooling sheet), aging acceleration F_AA = exp(15000/383 − 15000/(θ_H + "
    "273)) and the 110 °C reference hot spot: IEEE Std C57.91-2011 cl. 5 and 7 (from memory; "
    "steady state, time constants ignored). Q = √(S² − P²): common practice. NIST SP 811 "
    "(2008) App. B.8: t/°F = 1.8·t/°C + 32. Nameplate, test report and load profile "
    "invented.")
rt = ItemSheet("Rating", "Ashby Cross substation T2: 1.6 MVA 11/0.415 kV ONAN transformer "
               "loading (invented scenario)", TX_SRC)
rt.add("S", "Rated power", "S_r", 1.6, "MVA")
rt.add("SkVA", "Rated power, kVA", "S_r,kVA", "={S}*1000", "kVA")
rt.add("VHV", "HV rated voltage (line)", "U_HV", 11, "kV")
rt.add("VLV", "LV rated voltage (line)", "U_LV", 415, "V")
rt.add("IHV", "HV rated current", "I_HV", "={SkVA}/(SQRT(3)*{VHV})", "A")
rt.add("ILV", "LV rated current", "I_LV", "={SkVA}*1000/(SQRT(3)*{VLV})", "A")
rt.add("PNL", "No-load loss (test report)", "P_0", 1.7, "kW")
rt.add("PLL", "Load loss at rated current, 75 °C (test report)", "P_k", 14500, "W")
rt.add("Ptot", "Total losses at rated load", "P_tot", "={PNL}+{PLL}", "kW",
       planted=("unit-scale", "no-load loss in kW added to load loss in W"))
rt.add("R", "Ratio of load loss to no-load loss", "R", "={PLL}/({PNL}*1000)", "-")
rt.add("cool", "Cooling class", "cooling", "ONAN")
rt.add("n", "Top-oil exponent", "n", "=VLOOKUP({cool},Cooling!$A$5:$C$8,2,FALSE)", "-")
rt.add("m", "Winding (hot-spot) exponent", "m", "=VLOOKUP({cool},Cooling!$A$5:$C$8,3,FALSE)",
       "-")
rt.add("tA", "Ambient temperature (design day)", "θ_A", 30, "°C")
rt.add("dTOR", "Top-oil rise over ambient at rated load (heat run)", "Δθ_TO,R", 55, "K")
rt.add("dHR", "Hot-spot rise over top oil at rated load", "Δθ_H,R", 25, "K")
rt.add("Kp", "Peak load factor", "K_p", "=MAX(Profile!E5:E10)", "-")
rt.add("dTO", "Top-oil rise at peak load", "Δθ_TO",
       "={dTOR}*(({Kp}^2*{R}+1)/({R}+1))^{n}", "K")
rt.add("tTO", "Top-oil temperature at peak load", "θ_TO", "={tA}+{dTO}", "°C")
rt.add("dH", "Hot-spot rise over top oil at peak load", "Δθ_H", "={dHR}*{Kp}^(2*{m})", "K")
rt.add("tH", "Hot-spot temperature at peak load", "θ_H", "={tTO}+{dH}", "°C")
rt.add("hchk", "Hot-spot check (110 °C)", "check_H", "=IF({tH}<=110,\"OK\",\"OVER 110 °C\")")
rt.add("FAA", "Aging acceleration factor at peak", "F_AA", "=EXP(15000/383-15000/({tH}+273))",
       "-")
rt.add("FAA2", "Aging acceleration factor (owner's spreadsheet)", "F_AA2",
       "=EXP(15000/383-15000/{tH})", "-",
       planted=("offset-scale", "hot-spot in °C where the Arrhenius form wants K"))
rt.add("tTOF", "Top-oil temperature at peak, °F (US owner's report)", "θ_TO,F", "={tTO}*1.8+32",
       "°F")
rt.add("tHF", "Hot-spot temperature at peak, °F (US owner's report)", "θ_H,F", "={tH}*1.8", "°F",
       planted=("offset-scale", "°C to °F without the +32"))
rt.add("Ppk", "Active power at peak", "P_pk",
       "=INDEX(Profile!B5:B10,MATCH(Profile!B13,Profile!D5:D10,0))", "kW")
rt.add("Qpk", "Reactive power at peak", "Q_pk", "=SQRT(Profile!B13^2-{Ppk}^2)", "kvar")
rt.add("Lpk", "Losses at peak load", "P_L,pk", "={PNL}+{PLL}*{Kp}^2/1000", "kW")
rt.add("etapk", "Efficiency at peak load", "η_pk", "={Ppk}/({Ppk}+{Lpk})", "%",
       planted=("unit-scale", "a fraction written under %: 100 too small"))
rt.add("etad", "Energy efficiency over the day", "η_d",
       "=Profile!B11/(Profile!B11+Profile!B12)*100", "%")
RATING = rt.finish()

R_ = rt.ref
PROFILE = {
    "A1": "Ashby Cross T2: design-day load profile, 4-hour blocks (invented readings)",
    "A2": ("Sources: as the Rating sheet: S = P/pf; K = S/S_r; load loss P_k·K²; total loss "
           "P_0 + P_k·K²; LV current S/(√3·U_LV) (IEC 60076-1:2011, from memory); energy = power "
           "× 4 h per block."),
    "A3": CAUTION,
    "A4": "Block", "B4": "Load [kW]", "C4": "Power factor [-]", "D4": "Load [kVA]",
    "E4": "Load factor K [-]", "F4": "Load loss [W]", "G4": "Total loss [kW]",
    "H4": "LV current [A]",
    "A11": "Energy delivered over the day", "B11": "=SUM(B5:B10)*4", "C11": "kWh",
    "A12": "Energy lost over the day", "B12": "=SUM(G5:G10)*4", "C12": "kWh",
    "A13": "Peak apparent load", "B13": "=MAX(D5:D10)", "C13": "kVA",
    "A14": "Largest loss in any block", "B14": "=MAX(F5:G10)", "C14": "kW",
    "A15": "Highest LV current", "B15": "=MAX(H5:H10)", "C15": "A",
}
for r, (blk, p, pf) in enumerate([("00-04", 420, 0.88), ("04-08", 610, 0.90),
                                  ("08-12", 1250, 0.91), ("12-16", 1380, 0.90),
                                  ("16-20", 1500, 0.92), ("20-24", 800, 0.89)], start=5):
    PROFILE.update({f"A{r}": blk, f"B{r}": p, f"C{r}": pf})
    PROFILE[f"D{r}"] = f"=B{r}/C{r}"
    PROFILE[f"E{r}"] = f"=D{r}/{R_('SkVA')}"
    PROFILE[f"F{r}"] = f"={R_('PLL')}*E{r}^2"
    PROFILE[f"G{r}"] = f"={R_('PNL')}+F{r}/1000"
    PROFILE[f"H{r}"] = f"=D{r}*1000/(SQRT(3)*{R_('VLV')})"
PROFILE["E8"] = f"=D8/{R_('S')}"                            # planted: kVA over MVA
PROFILE["F6"] = f"={R_('PLL')}*E6^2/1000"                   # planted: kW written under W
PROFILE["H9"] = f"=D9/(SQRT(3)*{R_('VLV')})"                # planted: kVA over V, no ×1000

COOLING = {
    "A1": "Exponents by cooling class (from memory of IEEE Std C57.91-2011 Table 4)",
    "A4": "Cooling", "B4": "n [-]", "C4": "m [-]",
}
for r, row in enumerate([("ONAN", 0.8, 0.8), ("ONAF", 0.9, 0.8), ("OFAF", 0.9, 0.8),
                         ("ODAF", 1.0, 1.0)], start=5):
    for col, v in zip("ABC", row):
        COOLING[f"{col}{r}"] = v

TRANSFORMER = {
    "trade": "electrical: distribution transformer loading and thermal check",
    "sheets": [("Rating", RATING), ("Profile", PROFILE), ("Cooling", COOLING)],
    "planted": {**rt.planted,
                "Profile!E8": ("unit-scale", "load in kVA divided by the rating in MVA: K 1000 "
                               "too large"),
                "Profile!F6": ("unit-scale", "load loss converted to kW and written under W: "
                               "1000 too small"),
                "Profile!H9": ("unit-scale", "kVA over volts without ×1000: current 1000 too "
                               "small"),
                "Profile!B14": ("mixed-range", "largest loss taken over the W and kW columns "
                                "together")},
}


# --------------------------------------------------------------------------------------------
# Book 4: concrete pour and formwork pressure (m³ and yd³, t/m³ and lb/ft³, m/h and ft/h, kPa
# and psf)
# --------------------------------------------------------------------------------------------
CONC_SRC = (
    "Sources: lateral pressure of fresh concrete on formwork, columns and walls with rate of "
    "rise R ≤ 2.1 m/h placed no more than 4.2 m: p = C_w·C_c·(7.2 + 785·R/(T + 17.8)) kPa, "
    "R in m/h and T in °C, not less than 30·C_w kPa nor more than ρ·g·h; unit weight "
    "coefficient C_w = 1.0 for 2240-2400 kg/m³, ρ/2320 above, 0.5·(1 + ρ/2320) ≥ 0.8 below; "
    "chemistry coefficient C_c (Mixes sheet): ACI 347R-14 §2.2.2 (from memory). Full liquid "
    "head 24 kN/m³ × h: common practice. NIST SP 811 (2008) App. B.8: 1 m³ = 1.308 yd³, "
    "1 t/m³ = 62.43 lb/ft³, 1 kPa = 20.89 psf, 1 m = 3.281 ft. Truck mixers 8 m³, waste "
    "allowance on the order: common practice. Pours, mixes and tie data invented.")
de = ItemSheet("Design", "Fenwick Quay pumping station: pour schedule and formwork pressure "
               "(invented scenario)", CONC_SRC)
de.add("rhokg", "Mix design density (C32/40, invented mix)", "ρ_kg", 2400, "kg/m³")
de.add("rho", "Concrete density", "ρ", "={rhokg}/1000", "t/m³")
de.add("rholb", "Concrete density, lb/ft³", "ρ_lb", "={rho}*62.43", "lb/ft³")
de.add("rholb2", "Unit weight for the US formwork supplier", "ρ_lb2", "={rhokg}*62.43", "lb/ft³",
       planted=("unit-scale", "the t/m³-to-lb/ft³ factor applied to kg/m³: 1000 too large"))
de.add("g", "Gravity", "g", 9.81, "m/s²")
de.add("T", "Concrete temperature at placing", "T", 15, "°C")
de.add("mix", "Mix type", "mix", "Retarded")
de.add("Cc", "Chemistry coefficient", "C_c", "=VLOOKUP({mix},Mixes!$A$5:$B$7,2,FALSE)", "-")
de.add("Cw", "Unit weight coefficient", "C_w",
       "=IF({rhokg}<2240,MAX(0.8,0.5*(1+{rhokg}/2320)),IF({rhokg}<=2400,1,{rhokg}/2320))", "-")
de.add("pd", "Design lateral pressure (highest pour)", "p_d", "=MAX(Pours!L5:L9)", "kPa")
de.add("pdpsf", "Design lateral pressure, psf", "p_d,psf", "={pd}*20.89", "psf")
de.add("sh", "Tie spacing, horizontal", "s_h", 600, "mm")
de.add("sv", "Tie spacing, vertical", "s_v", 600, "mm")
de.add("tie", "Tie load", "F_tie", "={pd}*{sh}/1000*{sv}/1000", "kN")
de.add("tie2", "Tie load (supplier's check sheet)", "F_tie2", "={pd}*{sh}*{sv}", "kN",
       planted=("unit-scale", "tie spacings in mm used as m: 10⁶ too large"))
de.add("hmax", "Tallest pour", "h_max", "=MAX(Pours!E5:E9)", "m")
de.add("phyd", "Full liquid head on the tallest pour", "p_hyd", "={rho}*{g}*{hmax}", "kPa")
de.add("phyd2", "Full liquid head (quick check)", "p_hyd2", "={rho}*{hmax}", "kPa",
       planted=("result-unit", "ρ·h with g left out: t/m², not kPa"))
de.add("p24", "Full liquid head (24 kN/m³ rule)", "p_24", "=24*{hmax}", "kPa")
de.add("phydpsf", "Full liquid head, psf (US supplier)", "p_hyd,psf", "={rholb}*{hmax}*3.281",
       "psf")
de.add("V", "Total concrete", "V", "=Pours!F10", "m³")
de.add("V2", "Total concrete (order summary)", "V_2", "=SUM(Pours!F5:G9)", "m³",
       planted=("mixed-range", "m³ and yd³ columns summed together"))
de.add("Vyd", "Total concrete, yd³", "V_yd", "=Pours!G10", "yd³")
de.add("waste", "Waste allowance on the order", "w", 5, "%")
de.add("Vord", "Order volume", "V_ord", "={V}*(1+{waste}/100)", "m³")
de.add("Vordyd", "Order volume, yd³ (US supplier)", "V_ord,yd", "={Vyd}*(1+{waste})", "yd³",
       planted=("unit-scale", "waste allowance in % used as a fraction"))
de.add("truck", "Truck mixer capacity", "V_t", 8, "m³")
de.add("nt", "Truck loads", "n_t", "=ROUNDUP({Vord}/{truck},0)", "-")
DESIGN = de.finish()

D_ = de.ref
POURS = {
    "A1": "Fenwick Quay pumping station: pours (invented dimensions and delivery rates)",
    "A2": ("Sources: as the Design sheet (ACI 347R-14 §2.2.2, from memory): p = "
           "MIN(ρ·g·h, MAX(30·C_w, C_w·C_c·(7.2 + 785·R/(T + 17.8)))) kPa; R = delivery / plan "
           "area; yd³ = m³ × 1.308, ft/h = m/h × 3.281, psf = kPa × 20.89 (NIST SP 811 (2008) "
           "App. B.8)."),
    "A3": CAUTION,
    "A4": "Pour", "B4": "Element", "C4": "Length [m]", "D4": "Width [m]", "E4": "Height [m]",
    "F4": "Volume [m³]", "G4": "Volume [yd³]", "H4": "Delivery [m³/h]",
    "I4": "Rate of rise [m/h]", "J4": "Rate of rise [ft/h]", "K4": "Duration [h]",
    "L4": "Lateral pressure [kPa]", "M4": "Lateral pressure [psf]",
    "A10": "Total",
    "F10": "=SUM(F5:F9)", "G10": "=SUM(G5:G9)", "K10": "=SUM(K5:K9)",
}
for r, (pour, el, L, W, H, q) in enumerate([("P1", "Wall W1 (wet well)", 24, 0.35, 3.0, 15),
                                            ("P2", "Wall W2 (valve chamber)", 25, 0.30, 3.6, 12),
                                            ("P3", "Column C1", 0.6, 0.6, 4.2, 6),
                                            ("P4", "Column C7", 0.45, 0.45, 3.6, 4),
                                            ("P5", "Wall W3 (core)", 18, 0.25, 3.9, 8)],
                                           start=5):
    POURS.update({f"A{r}": pour, f"B{r}": el, f"C{r}": L, f"D{r}": W, f"E{r}": H,
                  f"H{r}": q})
    POURS[f"F{r}"] = f"=C{r}*D{r}*E{r}"
    POURS[f"G{r}"] = f"=F{r}*1.308"
    POURS[f"I{r}"] = f"=H{r}/(C{r}*D{r})"
    POURS[f"J{r}"] = f"=I{r}*3.281"
    POURS[f"K{r}"] = f"=F{r}/H{r}"
    POURS[f"L{r}"] = (f"=MIN({D_('rho')}*{D_('g')}*E{r},MAX(30*{D_('Cw')},{D_('Cw')}*{D_('Cc')}"
                      f"*(7.2+785*I{r}/({D_('T')}+17.8))))")
    POURS[f"M{r}"] = f"=L{r}*20.89"
POURS["G7"] = "=F7/1.308"                                       # planted: wrong way round
POURS["J8"] = "=I8"                                             # planted: m/h under ft/h
POURS["K9"] = "=G9/H9"                                          # planted: yd³ over m³/h
POURS["L6"] = (f"=MIN({D_('rhokg')}*{D_('g')}*E6,MAX(30*{D_('Cw')},{D_('Cw')}*{D_('Cc')}"
               f"*(7.2+785*I6/({D_('T')}+17.8))))")              # planted: kg/m³ where t/m³

MIXES = {
    "A1": "Chemistry coefficient C_c (from memory of ACI 347R-14 Table 2.2.2b; check the code)",
    "A4": "Mix", "B4": "C_c [-]",
    "A5": "Plain", "B5": 1.0, "A6": "Retarded", "B6": 1.2, "A7": "Blend + retarder", "B7": 1.4,
}

CONCRETE = {
    "trade": "civil: concrete pour schedule and formwork lateral pressure",
    "sheets": [("Design", DESIGN), ("Pours", POURS), ("Mixes", MIXES)],
    "planted": {**de.planted,
                "Pours!G7": ("unit-scale", "m³ to yd³ divided by 1.308: wrong way round"),
                "Pours!J8": ("unit-scale", "rate of rise in m/h written under ft/h: 3.281 too "
                             "small"),
                "Pours!K9": ("unit-scale", "volume in yd³ over delivery in m³/h: duration 1.308 "
                             "too large"),
                "Pours!L6": ("unit-scale", "density in kg/m³ where t/m³ belongs in ρ·g·h: Pa "
                             "written as kPa, 1000 too large")},
}

BOOKS = {"pump-schedule": PUMP, "boiler-blowdown": BOILER, "transformer-loading": TRANSFORMER,
         "concrete-pour": CONCRETE}

EXTRA, MISSED, RENAMED, MESSAGES, HEADNOTE = {}, {}, {}, {}, {}
try:
    from review_notes import EXTRA, MISSED, RENAMED, MESSAGES, HEADNOTE  # noqa: F401,F811
except ImportError:
    pass


def main():
    write_books(HERE, BOOKS, {"EXTRA": EXTRA, "MISSED": MISSED, "RENAMED": RENAMED,
                              "MESSAGES": MESSAGES, "HEADNOTE": HEADNOTE})


if __name__ == "__main__":
    main()
