#!/usr/bin/env python3
"""Four review workbooks for plumb's workbook checking (review63), written with the standard
zipfile module (corpus/sheets/xlsx_writer.py, shared by the review books).

Trades: a boiler's stack emissions report; a gas pressure-reducing and metering station's flow
correction to reference conditions; a shell-and-tube heat exchanger rating sheet; an elevator
traffic and motor sheet. Invented scenario: all sites, readings, sizes and catalogue data are
invented for demonstration only; the formulas and published factors are the trade's own, with
their sources named in a text cell at the top of each sheet.

Caution: a dimensionally consistent formula can still be wrong, and this check does not replace
independent review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
should stay clean. After plumb was run, the findings beyond the planted mistakes were judged one
by one and recorded in EXTRA (with the reason), and the planted cells plumb misses in MISSED.

Run: python3 make_books.py  ->  *.xlsx, *.expect, expect.json in this folder
"""
import json
import os
import re

import sys
sys.path.insert(0, os.path.dirname(os.path.dirname(os.path.abspath(__file__))))
from xlsx_writer import write_xlsx  # noqa: E402 (the shared writer in corpus/sheets)

HERE = os.path.dirname(os.path.abspath(__file__))

CAUTION = ("Caution: a dimensionally consistent formula can still be wrong; a unit check does not "
           "replace independent review under local codes and licensed practice. Invented "
           "scenario: readings, sizes and catalogue data are invented for demonstration only.")


class ItemSheet:
    """An 'Item | Symbol | Value | Unit' sheet. Formulas name other rows as {key} and other
    sheets' rows as {Sheet.key}; planted rows carry (rule, what)."""

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
        assert key not in self.keys, key
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

    def cell(self, key):
        return f"C{self.keys[key]}"

    def finish(self, others=None):
        others = others or {}

        def sub(m):
            k = m.group(1)
            if "." in k:
                sheet, key = k.split(".")
                return others[sheet].ref(key)
            return f"C{self.keys[k]}"

        for r, value in self.pending:
            if isinstance(value, str) and value.startswith("="):
                value = re.sub(r"\{([A-Za-z0-9_.]+)\}", sub, value)
            self.cells[f"C{r}"] = value
        return self.cells


# --------------------------------------------------------------------------------------------
# Book 1: boiler stack emissions report (ppm, % O2, 3 % and 15 % O2, mg/Nm³, lb/MMBtu, Nm³/h)
# --------------------------------------------------------------------------------------------
STACK_SRC = (
    "Sources: O2 correction C_ref = C·(20.9 − O2_ref)/(20.9 − O2), dry basis; reference 3 % O2 "
    "for gas-fired boilers and 15 % O2 for gas turbines (Directive 2010/75/EU, Annex V; EN 14792 "
    "(2017) for NOx sampling). ppm to mg/Nm³: C·M/22.414 with M in g/mol and the molar volume "
    "22.414 L/mol at 0 °C, 101.325 kPa (CODATA 2018: 22.413 969 54 L/mol). US route: 40 CFR 60 "
    "App. A, Method 19 (E = C_d·F_d·20.9/(20.9 − %O2d); F_d = 8710 dscf/MMBtu for natural gas, "
    "Table 19-2; 1.194×10⁻⁷ lb/scf per ppm NOx as NO2, Table 19-1). Dry normal flue gas flow "
    "Q·(273.15/T)·(p/1013.25 mbar)·(1 − B_ws), EN ISO 16911-1 (2013). NIST SP 811 (2008) App. "
    "B.8 (1 MW = 3.412 MMBtu/h; 1 kg = 2.205 lb; 1 m/s = 196.85 ft/min). Molar masses: IUPAC "
    "standard atomic weights, rounded. Gross CV 40.6 MJ/Nm³ and flue-gas molar mass 27.7 "
    "kg/kmol: from memory. Test data invented.")
rep = ItemSheet("Report", "Ashby Lane creamery, boiler B-2 (natural gas, 11 MW): stack emissions "
                "test report (invented scenario)", STACK_SRC)
rep.add("pb", "Barometric pressure during test", "p_b", 1008, "mbar")
rep.add("NOx", "NOx, mean of three runs (dry)", "C_NOx", "=Runs!C9", "ppm")
rep.add("CO", "CO, mean of three runs (dry)", "C_CO", "=Runs!D9", "ppm")
rep.add("O2", "O2, mean of three runs (dry)", "O2", "=Runs!E9", "%")
rep.add("O2r", "Reference O2, boilers", "O2_ref", 3, "%")
rep.add("O2t", "Reference O2, gas turbines", "O2_GT", 15, "%")
rep.add("NOx3", "NOx at 3 % O2", "C_NOx,3", "={NOx}*(20.9-{O2r})/(20.9-{O2})", "ppm")
rep.add("NOx3b", "NOx at 3 % O2 (site engineer's check)", "C_NOx,3b",
        "={NOx}*(20.9-{O2})/(20.9-{O2r})", "ppm",
        planted=("unit-scale", "O2 correction factor the wrong way round (ratio inverted)"))
rep.add("CO3", "CO at 3 % O2", "C_CO,3", "={CO}*(20.9-{O2r})/(20.9-{O2})", "ppm")
rep.add("NOx15", "NOx at 15 % O2 (for comparison with turbine limits)", "C_NOx,15",
        "={NOx}*(20.9-{O2t})/(20.9-{O2})", "ppm")
rep.add("MNOx", "Molar mass, NOx as NO2", "M_NOx", "=VLOOKUP(\"NOx\",Gases!$A$4:$B$7,2,FALSE)",
        "g/mol")
rep.add("MCO", "Molar mass, CO", "M_CO", "=VLOOKUP(\"CO\",Gases!$A$4:$B$7,2,FALSE)", "g/mol")
rep.add("cNOx", "NOx at 3 % O2, mass concentration", "c_NOx,3", "={NOx3}*{MNOx}/22.414",
        "mg/Nm³")
rep.add("cNOxb", "NOx at 3 % O2, mass concentration (from the analyser's 25 °C table)",
        "c_NOx,3b", "={NOx3}*{MNOx}/24.45", "mg/Nm³",
        planted=("unit-scale", "molar volume at 25 °C (24.45) on a 0 °C normal basis: result 8 % "
                 "low (22.414 wanted)"))
rep.add("cCO", "CO at 3 % O2, mass concentration", "c_CO,3", "={CO3}*{MCO}/22.414", "mg/Nm³")
rep.add("cNOxR", "NOx at 3 % O2, mean of the runs' values", "c_NOx,R", "=Runs!L9", "mg/Nm³")
rep.add("cmax", "Highest run, NOx at 3 % O2", "c_max", "=MAX(Runs!K6:L8)", "mg/Nm³",
        planted=("mixed-range", "range takes the ppm column K with the mg/Nm³ column L"))
rep.add("lim", "NOx emission limit (permit)", "ELV_NOx", 100, "mg/Nm³")
rep.add("pct", "NOx as a share of the limit", "r_NOx", "={cNOx}/{lim}*100", "%")
rep.add("pass", "NOx compliance", "check_NOx", "=IF({cNOx}<={lim},\"PASS\",\"FAIL\")")
rep.add("limCO", "CO emission limit (permit)", "ELV_CO", 100, "mg/Nm³")
rep.add("passCO", "CO compliance", "check_CO", "=IF({cCO}<={limCO},\"PASS\",\"FAIL\")")
rep.add("EA", "Excess air", "EA", "={O2}/(20.9-{O2})*100", "%")
rep.add("Qn", "Flue gas flow, dry normal (mean of runs)", "Q_N", "=Runs!J9", "Nm³/h")
rep.add("cNOxm", "NOx at measured O2, mass concentration", "c_NOx", "={NOx}*{MNOx}/22.414",
        "mg/Nm³")
rep.add("mNOx", "NOx mass emission", "m_NOx", "={cNOxm}*{Qn}/1000000", "kg/h")
rep.add("mNOxb", "NOx mass emission (monthly return)", "m_NOx,b", "={cNOxm}*{Qn}/1000", "kg/h",
        planted=("unit-scale", "mg/h to kg/h divided by 1000, not 10⁶: 1000 too large"))
rep.add("hrs", "Operating hours per year", "t_op", 6200, "h/yr")
rep.add("tNOx", "Annual NOx", "M_NOx", "={mNOx}*{hrs}/1000", "t/yr")
rep.add("Qf", "Fuel gas flow (utility meter, corrected)", "Q_f", 1000, "Nm³/h")
rep.add("GCV", "Gross calorific value of the gas", "GCV", 40.6, "MJ/Nm³")
rep.add("HI", "Heat input (gross)", "HI", "={Qf}*{GCV}/3600", "MW")
rep.add("HIk", "Heat input (gross), summary table", "HI_b", "={Qf}*{GCV}/3.6", "MW",
        planted=("unit-scale", "MJ/h ÷ 3.6 gives kW, written under MW: 1000 too large"))
rep.add("HIb", "Heat input (gross), MMBtu/h", "HI_US", "={HI}*3.412", "MMBtu/h")
rep.add("Cd", "NOx concentration, lb/scf (Method 19)", "C_d", "={NOx}*1.194E-7", "lb/scf")
rep.add("Fd", "F-factor, natural gas (dry)", "F_d", 8710, "scf/MMBtu")
rep.add("E", "NOx emission rate", "E", "={Cd}*{Fd}*20.9/(20.9-{O2})", "lb/MMBtu")
rep.add("Eb", "NOx emission rate (draft report)", "E_b", "={Cd}*{Fd}*20.9/(20.9-{O2}/100)",
        "lb/MMBtu",
        planted=("unit-scale", "O2 in % divided by 100 beside 20.9 %: correction almost lost"))
rep.add("mlb", "NOx mass emission, lb/h (Method 19)", "m_lb", "={E}*{HIb}", "lb/h")
rep.add("mlb2", "NOx mass emission, lb/h (from kg/h)", "m_lb2", "={mNOx}*2.205", "lb/h")
rep.add("D", "Stack internal diameter", "D", 1.1, "m")
rep.add("A", "Stack cross-section", "A", "=PI()*{D}^2/4", "m²")
rep.add("Qa", "Flue gas flow, actual (mean of runs)", "Q_a", "=Runs!I9", "m³/h")
rep.add("v", "Stack gas velocity", "v", "={Qa}/3600/{A}", "m/s")
rep.add("vf", "Stack gas velocity, US", "v_US", "={v}*196.85", "fpm")
rep.add("pabs", "Stack absolute pressure", "p_s", "={pb}+Runs!G9", "mbar")
rep.add("pabs2", "Stack absolute pressure, kPa (for the density)", "p_s,kPa",
        "={pb}/10+Runs!G9", "kPa",
        planted=("unit-scale", "static pressure in mbar added to kPa without ÷10"))
rep.add("Mfg", "Flue gas molar mass (wet)", "M_fg", 27.7, "kg/kmol")
rep.add("rho", "Flue gas density at the stack", "rho_fg",
        "={pabs}*100*{Mfg}/(8314*(Runs!F9+273.15))", "kg/m³")
rep.add("rho2", "Flue gas density at the stack (velocity traverse sheet)", "rho_fg2",
        "=Runs!G9*100*{Mfg}/(8314*(Runs!F9+273.15))", "kg/m³",
        planted=("offset-scale", "static gauge pressure where the gas law wants absolute"))

GASES = {
    "A1": "Molar masses for ppm conversions (IUPAC standard atomic weights, rounded)",
    "A2": CAUTION,
    "A3": "Species", "B3": "M [g/mol]", "C3": "Note",
    "A4": "NOx", "B4": 46.01, "C4": "NOx reported as NO2",
    "A5": "CO", "B5": 28.01,
    "A6": "SO2", "B6": 64.07,
    "A7": "CO2", "B7": 44.01,
}

RUNS = {
    "A1": "Ashby Lane creamery, boiler B-2: three test runs at high fire (invented data)",
    "A2": ("Sources: as the Report sheet. Dry normal flow Q·273.15/(t + 273.15)·(p_b + p_s)/"
           "1013.25·(1 − B_ws/100), EN ISO 16911-1 (2013); O2 correction and 22.414 L/mol as "
           "the Report sheet."),
    "A3": CAUTION,
    "A5": "Run", "B5": "Time", "C5": "NOx [ppm]", "D5": "CO [ppm]", "E5": "O2 [%]",
    "F5": "Stack temp [°C]", "G5": "Static pressure [mbar g]", "H5": "Moisture [%]",
    "I5": "Flow, actual [m³/h]", "J5": "Flow, dry normal [Nm³/h]",
    "K5": "NOx at 3 % O2 [ppm]", "L5": "NOx at 3 % O2 [mg/Nm³]",
    "A9": "Mean of 3 runs",
}
pb_ref = rep.ref("pb")
for r, (run, time, nox, co, o2, t, ps, h2o, q) in enumerate([
        ("Run 1", "09:10-10:10", 38.2, 12, 4.1, 168, 1.8, 17.5, 21400),
        ("Run 2", "10:30-11:30", 40.1, 15, 4.3, 171, 1.9, 17.2, 21650),
        ("Run 3", "11:50-12:50", 37.6, 11, 4.0, 166, 1.7, 17.8, 21200)], start=6):
    RUNS.update({f"A{r}": run, f"B{r}": time, f"C{r}": nox, f"D{r}": co, f"E{r}": o2,
                 f"F{r}": t, f"G{r}": ps, f"H{r}": h2o, f"I{r}": q})
    RUNS[f"J{r}"] = f"=I{r}*273.15/(F{r}+273.15)*({pb_ref}+G{r})/1013.25*(1-H{r}/100)"
    RUNS[f"K{r}"] = f"=C{r}*(20.9-3)/(20.9-E{r})"
    RUNS[f"L{r}"] = f"=K{r}*Gases!$B$4/22.414"
RUNS["J7"] = f"=I7*273.15/F7*({pb_ref}+G7)/1013.25*(1-H7/100)"  # planted: °C for K
for c in "CDEFGHIJKL":
    RUNS[f"{c}9"] = f"=AVERAGE({c}6:{c}8)"

REPORT = rep.finish()
STACK = {
    "trade": "combustion: boiler stack emissions test report (EU and US Method 19 routes)",
    "sheets": [("Report", REPORT), ("Runs", RUNS), ("Gases", GASES)],
    "planted": {**rep.planted,
                "Runs!J7": ("offset-scale", "normal-flow correction 273.15/t with t in °C, "
                            "not t + 273.15")},
}

# --------------------------------------------------------------------------------------------
# Book 2: gas pressure-reducing and metering station (Nm³/h, scfh, bar g, mbar g, °C, VCF)
# --------------------------------------------------------------------------------------------
GAS_SRC = (
    "Sources: volume conversion C = (p/p_n)·(T_n/T)·(Z_n/Z), EN 12405-1 (2018) and DIN 1343 "
    "(normal conditions 0 °C, 1.01325 bar); Z from ISO 12213-3 (2006) / AGA Report No. 8 "
    "gross method: 0.985 at 8 bar abs and 7 °C and Z_n = 0.9976, from memory. US base "
    "conditions 60 °F and 14.73 psia (AGA Report No. 7, 2006): 1 Nm³ = 37.24 scf (ideal-gas "
    "ratio 35.3147·(288.71/273.15)·(14.696/14.73), ISO 13443 (1996) method). Joule–Thomson "
    "drop about 0.5 K per bar for natural gas: common practice, from memory. Gas c_p 2.2 "
    "kJ/(kg·K) and ρ_n 0.78 kg/Nm³: from memory. NIST SP 811 (2008) App. B.8 (1 bar = "
    "14.504 psi; 1 kWh = 3412 Btu). Filter change-out at 500 mbar and 20 m/s velocity limit "
    "in the meter run: common practice. Meter error from the calibration certificate "
    "(invented).")
stn = ItemSheet("Station", "Kelby Moor PRMS, district offtake: flow correction to reference "
                "conditions (invented scenario)", GAS_SRC)
stn.add("pa", "Site barometric pressure", "p_atm", 1009, "mbar")
stn.add("pin", "Station inlet pressure", "p_in", 38.0, "bar(g)")
stn.add("pfo", "Filter outlet pressure", "p_fo", 37.86, "bar(g)")
stn.add("pout", "Regulator outlet (metering) pressure", "p_out", 7.0, "bar(g)")
stn.add("tin", "Inlet gas temperature", "t_in", 9.0, "°C")
stn.add("dpf", "Filter differential pressure", "dp_f", "=({pin}-{pfo})*1000", "mbar")
stn.add("dpf2", "Filter differential pressure (daily log)", "dp_f2", "={pin}-{pfo}", "mbar",
        planted=("unit-scale", "bar difference written under mbar without ×1000"))
stn.add("dpmax", "Filter change-out differential", "dp_max", 500, "mbar")
stn.add("chk", "Filter check", "check_f", "=IF({dpf}>{dpmax},\"CHANGE ELEMENT\",\"OK\")")
stn.add("muJT", "Joule–Thomson coefficient, natural gas", "mu_JT", 0.5, "K/bar")
stn.add("dTJT", "Temperature drop across the regulators", "dT_JT", "={muJT}*({pin}-{pout})",
        "K")
stn.add("tout", "Outlet temperature without preheat", "t_out", "={tin}-{dTJT}", "°C")
stn.add("tset", "Minimum outlet temperature (preheat set point)", "t_set", 5, "°C")
stn.add("dTh", "Preheat temperature rise needed", "dT_h", "=MAX({tset}-{tout},0)", "K")
stn.add("Qn", "Station flow, normal (from Runs)", "Q_n", "=Runs!H9", "Nm³/h")
stn.add("rn", "Gas density at normal conditions", "rho_n", 0.78, "kg/Nm³")
stn.add("cp", "Gas specific heat", "c_p", 2.2, "kJ/(kg·K)")
stn.add("mg", "Gas mass flow", "m_g", "={Qn}*{rn}/3600", "kg/s")
stn.add("Ph", "Preheater duty", "Q_h", "={mg}*{cp}*{dTh}", "kW")
stn.add("Ph2", "Preheater duty (heater schedule)", "Q_h2", "={mg}*{cp}*{dTh}", "W",
        planted=("unit-scale", "kg/s × kJ/(kg·K) × K gives kW, written under W: 1000 too small"))
stn.add("eta", "Water-bath heater efficiency", "eta_h", 80, "%")
stn.add("Pf", "Heater fuel input", "P_f", "={Ph}/({eta}/100)", "kW")
stn.add("pabs", "Metering pressure, absolute", "p_m", "={pout}+{pa}/1000", "bar")
stn.add("pabs2", "Metering pressure, absolute (hand calc)", "p_m2", "={pout}+{pa}", "bar",
        planted=("unit-scale", "barometer in mbar added to bar g without ÷1000"))
stn.add("tm", "Metering temperature", "t_m", "={tout}+{dTh}", "°C")
stn.add("Tm", "Metering temperature, absolute", "T_m", "={tm}+273.15", "K")
stn.add("Z", "Compressibility at metering conditions", "Z", 0.985, "-")
stn.add("Zn", "Compressibility at normal conditions", "Z_n", 0.9976, "-")
stn.add("VCF", "Volume conversion factor", "C", "={pabs}/1.01325*273.15/{Tm}*{Zn}/{Z}", "-")
stn.add("VCF2", "Volume conversion factor (commissioning sheet)", "C_2",
        "={pout}/1.01325*273.15/{Tm}*{Zn}/{Z}", "-",
        planted=("offset-scale", "gauge pressure in the conversion that wants absolute"))
stn.add("Qm", "Run A flow at line conditions (index)", "Q_m", "=Runs!C6", "m³/h")
stn.add("e", "Run A meter error at this flow (certificate)", "e", 0.4, "%")
stn.add("Qmc", "Run A flow corrected for meter error", "Q_mc", "={Qm}/(1+{e}/100)", "m³/h")
stn.add("Qmc2", "Run A flow corrected for meter error (rev. B)", "Q_mc2", "={Qm}/(1+{e})",
        "m³/h", planted=("unit-scale", "0.4 % used as 0.4 in (1 + e)"))
stn.add("QnA", "Run A flow, normal", "Q_nA", "={Qmc}*{VCF}", "Nm³/h")
stn.add("QnB", "Run B flow, normal", "Q_nB", "=Runs!H7", "Nm³/h")
stn.add("QnC", "Run C flow, normal", "Q_nC", "=Runs!H8", "Nm³/h")
stn.add("Qcust", "Farm take-off upstream of metering (US rotary meter, 60 °F / 14.73 psia)",
        "Q_cust", 18500, "scfh")
stn.add("Qtot", "Station throughput with the take-off", "Q_tot", "=SUM({QnA}:{Qcust})",
        "Nm³/h", planted=("mixed-range", "SUM over Nm³/h rows and a scfh row"))
stn.add("Qtot2", "Station throughput with the take-off (converted)", "Q_tot2",
        "={QnA}+{QnB}+{QnC}+{Qcust}/37.24", "Nm³/h")
stn.add("Qs", "Station flow, US base conditions", "Q_s", "={Qn}*37.24", "scfh")
stn.add("Qs2", "Station flow, US base conditions (vendor's sheet)", "Q_s2", "={Qn}*35.31",
        "scfh", planted=("unit-scale", "Nm³ to scf by the volume factor alone: 0 °C/1.01325 "
                         "bar to 60 °F/14.73 psia ignored, 5 % low"))
stn.add("Qd", "Daily volume", "V_d", "={Qn}*24", "Nm³/d")
stn.add("GCV", "Gross calorific value (normal basis)", "GCV", 41.0, "MJ/Nm³")
stn.add("E", "Energy flow", "E", "={Qn}*{GCV}/3600", "MW")
stn.add("E2", "Energy flow (nomination form)", "E_2", "={Qn}*{GCV}/3.6", "MW",
        planted=("unit-scale", "MJ/h ÷ 3.6 gives kW, written under MW"))
stn.add("Ed", "Daily energy", "E_d", "={Qd}*{GCV}/3.6", "kWh/d")
stn.add("EdM", "Daily energy, MMBtu", "E_dUS", "={Ed}*0.003412", "MMBtu/d")
stn.add("Dm", "Meter run bore (DN 150, Sch 40)", "D_m", 154.1, "mm")
stn.add("v", "Gas velocity in Run A", "v", "={Qm}/3600/(PI()*({Dm}/1000)^2/4)", "m/s")
stn.add("v2", "Gas velocity in Run A (design basis)", "v_2",
        "={QnA}/3600/(PI()*({Dm}/1000)^2/4)", "m/s",
        planted=("unit-scale", "velocity from the normal flow, not the flow at line "
                 "conditions: 7.9 times too high"))
stn.add("vmax", "Velocity limit in the meter run", "v_max", 20, "m/s")
stn.add("vchk", "Velocity check", "check_v", "=IF({v}>{vmax},\"TOO FAST\",\"OK\")")
stn.add("pinUS", "Station inlet pressure, US", "p_in,US", "={pin}*14.504", "psig")
stn.add("tinF", "Inlet gas temperature, US", "t_in,US", "={tin}*1.8+32", "°F")
STATION = None  # finished after the Runs sheet is laid out

dm_ref = stn.ref("Dm")
GRUNS = {
    "A1": "Kelby Moor PRMS: meter runs, hourly averages 14:00-15:00 (invented data)",
    "A2": ("Sources: as the Station sheet: C = (p_g + p_atm)/1.01325·273.15/(t + 273.15)·Z_n/Z "
           "(EN 12405-1, DIN 1343); velocity Q/A (common practice)."),
    "A3": CAUTION,
    "A5": "Meter run", "B5": "Meter", "C5": "Flow at line conditions [m³/h]",
    "D5": "Pressure [bar g]", "E5": "Temperature [°C]", "F5": "Z at line conditions [-]",
    "G5": "VCF [-]", "H5": "Flow [Nm³/h]", "I5": "Velocity [m/s]",
    "A9": "Station total / mean",
}
pa_ref, zn_ref = stn.ref("pa"), stn.ref("Zn")
for r, (run, meter, q, p, t, z) in enumerate([
        ("Run A", "G400 turbine", 420, 7.00, 6.8, 0.985),
        ("Run B", "G400 turbine", 405, 7.00, 6.9, 0.985),
        ("Run C", "G400 turbine", 398, 6.98, 7.0, 0.985)], start=6):
    GRUNS.update({f"A{r}": run, f"B{r}": meter, f"C{r}": q, f"D{r}": p, f"E{r}": t, f"F{r}": z})
    GRUNS[f"G{r}"] = f"=(D{r}+{pa_ref}/1000)/1.01325*273.15/(E{r}+273.15)*{zn_ref}/F{r}"
    GRUNS[f"H{r}"] = f"=C{r}*G{r}"
    GRUNS[f"I{r}"] = f"=C{r}/3600/(PI()*({dm_ref}/1000)^2/4)"
GRUNS["G7"] = f"=(D7+{pa_ref}/1000)/1.01325*273.15/E7*{zn_ref}/F7"  # planted: °C for K
GRUNS.update({"C9": "=SUM(C6:C8)", "D9": "=AVERAGE(D6:D8)", "E9": "=AVERAGE(E6:E8)",
              "H9": "=SUM(H6:H8)", "I9": "=MAX(I6:I8)"})
STATION = stn.finish()
GASMETER = {
    "trade": "gas distribution: pressure-reducing and metering station, volume conversion",
    "sheets": [("Station", STATION), ("Runs", GRUNS)],
    "planted": {**stn.planted,
                "Runs!G7": ("offset-scale", "conversion factor 273.15/t with t in °C")},
}

# --------------------------------------------------------------------------------------------
# Book 3: heat exchanger rating sheet (LMTD from °C and °F, U in SI and US units, m² and ft²)
# --------------------------------------------------------------------------------------------
HX_SRC = (
    "Sources: LMTD = (ΔT1 − ΔT2)/ln(ΔT1/ΔT2) and the 1-2 exchanger correction F(R, P), Kern, "
    "Process Heat Transfer (1950) ch. 7, and Incropera et al., Fundamentals of Heat and Mass "
    "Transfer (7th ed.) §11.3; Q = U·A·F·LMTD; 1/U_d = 1/U_c + R_f, TEMA Standards (10th ed.) "
    "for fouling resistances. Typical clean U by service: Perry's Chemical Engineers' "
    "Handbook (9th ed.) §11, mid-range values, from memory. Water side Q_US = 500·gpm·ΔT (°F) "
    "(common practice: 8.33 lb/gal × 60 min/h). NIST SP 811 (2008) App. B.8: 1 Btu/(h·ft²·°F) "
    "= 5.678 W/(m²·K), so 1 W/(m²·K) = 0.1761 Btu/(h·ft²·°F); 1 W = 3.412 Btu/h; 1 m² = "
    "10.764 ft²; 1 ft = 0.3048 m; 1 m³/h = 4.403 gpm. Oil c_p 0.48 Btu/(lb·°F): vendor datasheet "
    "(invented). 10 % minimum overdesign and 1 m/s minimum tube velocity: common practice.")
hx = ItemSheet("Rating", "Corrin Bay compressor station, lube oil cooler E-301 (water in "
               "tubes, oil in shell): rating check (invented scenario)", HX_SRC)
hx.add("svc", "Service (for the U lookup)", "service", "Water - lube oil")
hx.add("mo", "Oil flow (design case)", "m_o", "=Cases!B5", "lb/h")
hx.add("cpo", "Oil specific heat", "c_p,o", 0.48, "Btu/(lb·°F)")
hx.add("Thi", "Oil inlet temperature", "T_hi", "=Cases!C5", "°F")
hx.add("Tho", "Oil outlet temperature", "T_ho", "=Cases!D5", "°F")
hx.add("Tci", "Cooling water inlet temperature", "T_ci", "=Cases!E5", "°C")
hx.add("Vw", "Cooling water flow", "V_w", "=Cases!F5", "m³/h")
hx.add("rhow", "Water density at 32 °C", "rho_w", 995.0, "kg/m³")
hx.add("cpw", "Water specific heat", "c_p,w", 4.18, "kJ/(kg·K)")
hx.add("Qh", "Oil-side duty", "Q_h", "={mo}*{cpo}*({Thi}-{Tho})", "Btu/h")
hx.add("QhkW", "Oil-side duty, kW", "Q", "={Qh}/3412", "kW")
hx.add("mw", "Water mass flow", "m_w", "={Vw}*{rhow}/3600", "kg/s")
hx.add("dTw", "Water temperature rise", "dT_w", "={QhkW}/({mw}*{cpw})", "K")
hx.add("Tco", "Cooling water outlet temperature", "T_co", "={Tci}+{dTw}", "°C")
hx.add("ThiC", "Oil inlet temperature, °C", "T_hi,C", "=({Thi}-32)/1.8", "°C")
hx.add("ThoC", "Oil outlet temperature, °C", "T_ho,C", "=({Tho}-32)/1.8", "°C")
hx.add("TciF", "Cooling water inlet, °F", "T_ci,F", "={Tci}*1.8+32", "°F")
hx.add("TcoF", "Cooling water outlet, °F", "T_co,F", "={Tco}*1.8+32", "°F")
hx.add("dT1", "Terminal temperature difference, hot end", "dT_1", "={ThiC}-{Tco}", "K")
hx.add("dT2", "Terminal temperature difference, cold end", "dT_2", "={ThoC}-{Tci}", "K")
hx.add("dT1b", "Terminal temperature difference, hot end (from datasheet)", "dT_1b",
       "={Thi}-{Tco}", "K",
       planted=("offset-scale", "oil inlet in °F less water outlet in °C"))
hx.add("LMTD", "Log mean temperature difference", "LMTD", "=({dT1}-{dT2})/LN({dT1}/{dT2})", "K")
hx.add("LMTDF", "LMTD, °F", "LMTD_F", "={LMTD}*1.8", "Δ°F")
hx.add("LMTDF2", "LMTD from the °F temperatures", "LMTD_F2",
       "=(({Thi}-{TcoF})-({Tho}-{TciF}))/LN(({Thi}-{TcoF})/({Tho}-{TciF}))", "Δ°F")
hx.add("LMTDF3", "LMTD, °F (rev. A)", "LMTD_F3", "={LMTD}*1.8+32", "Δ°F",
       planted=("offset-scale", "a temperature difference converted with +32"))
hx.add("R", "Capacity ratio R", "R", "=({ThiC}-{ThoC})/({Tco}-{Tci})", "-")
hx.add("P", "Thermal effectiveness P", "P", "=({Tco}-{Tci})/({ThiC}-{Tci})", "-")
hx.add("F", "LMTD correction, 1 shell pass, 2 tube passes", "F",
       "=SQRT({R}^2+1)/({R}-1)*LN((1-{P})/(1-{R}*{P}))/LN((2-{P}*({R}+1-SQRT({R}^2+1)))"
       "/(2-{P}*({R}+1+SQRT({R}^2+1))))", "-")
hx.add("U", "Clean overall coefficient (typical, by service)", "U_c",
       "=VLOOKUP({svc},Services!$A$4:$C$8,2,FALSE)", "W/(m²·K)")
hx.add("Rf", "Fouling resistance (typical, by service)", "R_f",
       "=VLOOKUP({svc},Services!$A$4:$C$8,3,FALSE)", "m²·K/W")
hx.add("Ud", "Design overall coefficient (fouled)", "U_d", "=1/(1/{U}+{Rf})", "W/(m²·K)")
hx.add("RfT", "Fouling resistance, TEMA oil side", "R_f,TEMA", 0.002, "h·ft²·°F/Btu")
hx.add("Ud2", "Design overall coefficient with TEMA fouling", "U_d2", "=1/(1/{U}+{RfT})",
       "W/(m²·K)", planted=("unit-scale", "TEMA fouling in h·ft²·°F/Btu added to 1/U in "
                            "m²·K/W"))
hx.add("UdUS", "Design overall coefficient, US", "U_d,US", "={Ud}*0.1761", "Btu/(h·ft²·°F)")
hx.add("UdUS2", "Design overall coefficient, US (vendor form)", "U_d,US2", "={Ud}*5.678",
       "Btu/(h·ft²·°F)", planted=("unit-scale", "W/(m²·K) to US multiplied by 5.678: wrong "
                                  "way round"))
hx.add("Areq", "Required area", "A_req", "={QhkW}*1000/({Ud}*{F}*{LMTD})", "m²")
hx.add("Areq2", "Required area (first pass)", "A_req2", "={QhkW}/({Ud}*{F}*{LMTD})", "m²",
       planted=("unit-scale", "duty in kW over U in W/(m²·K): 1000 too small"))
hx.add("Areqft", "Required area, ft²", "A_req,US", "={Areq}*10.764", "ft²")
hx.add("AreqUS", "Required area, US route", "A_req,US2", "={Qh}/({UdUS}*{F}*{LMTDF2})", "ft²")
hx.add("Nt", "Number of tubes", "N_t", 248, "-")
hx.add("do", "Tube outside diameter (3/4 in)", "d_o", 19.05, "mm")
hx.add("di", "Tube inside diameter (3/4 in, 16 BWG)", "d_i", 15.75, "mm")
hx.add("Lt", "Tube length", "L_t", 16, "ft")
hx.add("np", "Tube passes", "n_p", 2, "-")
hx.add("Aav", "Area available", "A_av", "={Nt}*PI()*{do}/1000*{Lt}*0.3048", "m²")
hx.add("Aav2", "Area available (from the drawing)", "A_av2", "={Nt}*PI()*{do}/1000*{Lt}", "m²",
       planted=("unit-scale", "tube length in ft used as m"))
hx.add("OD", "Overdesign", "OD", "=({Aav}/{Areq}-1)*100", "%")
hx.add("OD2", "Overdesign (summary page)", "OD2", "={Aav}/{Areq}-1", "%",
       planted=("unit-scale", "a fraction written under %: 100 too small"))
hx.add("chk", "Rating check", "check", "=IF({OD}>=10,\"OK\",\"UNDERSIZED\")")
hx.add("Tcom", "Cooling water outlet, measured at test", "T_co,m", 35.1, "°C")
hx.add("Qw", "Water-side duty at test", "Q_w", "={mw}*{cpw}*({Tcom}-{Tci})", "kW")
hx.add("imb", "Heat balance error", "e_Q", "=({QhkW}-{Qw})/{Qw}*100", "%")
hx.add("imb2", "Heat balance error (test sheet)", "e_Q2", "=({Qh}-{Qw})/{Qw}*100", "%",
       planted=("unit-scale", "oil duty in Btu/h less water duty in kW"))
hx.add("Vg", "Cooling water flow, US", "V_gpm", "={Vw}*4.403", "gpm")
hx.add("QwUS", "Water-side duty at test, US", "Q_w,US", "=500*{Vg}*({Tcom}-{Tci})*1.8", "Btu/h")
hx.add("vt", "Tube-side velocity", "v_t", "={Vw}/3600/({Nt}/{np}*PI()*({di}/1000)^2/4)", "m/s")
RATING = hx.finish()

SERVICES = {
    "A1": ("Typical clean overall coefficients and fouling resistances (Perry's 9th ed. §11 "
           "ranges, mid-values; TEMA 10th ed.), from memory: preliminary rating only"),
    "A2": CAUTION,
    "A3": "Service", "B3": "U [W/(m²·K)]", "C3": "Fouling [m²·K/W]",
}
for r, (svc, u, rf) in enumerate([("Water - water", 1400, 0.00035),
                                  ("Water - light oil", 400, 0.00035),
                                  ("Water - lube oil", 250, 0.0005),
                                  ("Steam - water", 2500, 0.0001),
                                  ("Water - gas", 60, 0.0003)], start=4):
    SERVICES.update({f"A{r}": svc, f"B{r}": u, f"C{r}": rf})

cpo_ref, rhow_ref, cpw_ref = hx.ref("cpo"), hx.ref("rhow"), hx.ref("cpw")
CASES = {
    "A1": "Lube oil cooler E-301: operating cases (vendor oil data in US units, site water in SI)",
    "A2": ("Sources: as the Rating sheet (duty m·c_p·ΔT, 1 W = 3.412 Btu/h, °C = (°F − 32)/1.8, "
           "LMTD). Data invented."),
    "A3": CAUTION,
    "A4": "Case", "B4": "Oil flow [lb/h]", "C4": "Oil in [°F]", "D4": "Oil out [°F]",
    "E4": "Water in [°C]", "F4": "Water flow [m³/h]", "G4": "Duty [kW]", "H4": "Water out [°C]",
    "I4": "LMTD [K]", "J4": "Duty [Btu/h]",
    "A8": "Max / min / mean",
}
for r, (case, m, ti, to, tw, vw) in enumerate([
        ("Summer design", 66000, 160, 120, 30, 60),
        ("Winter", 66000, 155, 115, 18, 45),
        ("Part load", 42000, 150, 122, 30, 40)], start=5):
    CASES.update({f"A{r}": case, f"B{r}": m, f"C{r}": ti, f"D{r}": to, f"E{r}": tw, f"F{r}": vw})
    CASES[f"G{r}"] = f"=B{r}*{cpo_ref}*(C{r}-D{r})/3412"
    CASES[f"H{r}"] = f"=E{r}+G{r}/(F{r}*{rhow_ref}/3600*{cpw_ref})"
    CASES[f"I{r}"] = (f"=(((C{r}-32)/1.8-H{r})-((D{r}-32)/1.8-E{r}))"
                      f"/LN(((C{r}-32)/1.8-H{r})/((D{r}-32)/1.8-E{r}))")
    CASES[f"J{r}"] = f"=G{r}*3412"
CASES["J6"] = "=G6*3.412"   # planted: kW × 3.412 gives kBtu/h (MBH), column is Btu/h
CASES.update({"G8": "=MAX(G5:G7)", "E8": "=AVERAGE(E5:E7)", "I8": "=MIN(I5:I7)"})

HEATX = {
    "trade": "process: shell-and-tube heat exchanger rating (mixed SI and US data)",
    "sheets": [("Rating", RATING), ("Cases", CASES), ("Services", SERVICES)],
    "planted": {**hx.planted,
                "Cases!J6": ("unit-scale", "kW × 3.412 gives MBH, column is Btu/h: 1000 too small")},
}

# --------------------------------------------------------------------------------------------
# Book 4: elevator traffic and motor sheet (m/s and fpm, kg and lb, kW and hp, kWh/d)
# --------------------------------------------------------------------------------------------
LIFT_SRC = (
    "Sources: CIBSE Guide D (2020) 'Transportation systems in buildings' ch. 3, up-peak round "
    "trip time RTT = 2·H·t_v + (S + 1)·t_s + 2·P·t_p with S = N·(1 − (1 − 1/N)^P), H = N − "
    "Σ(i/N)^P, t_s = t_f(1) − t_v + t_c + t_o + t_sd, interval RTT/L, handling capacity "
    "HC5 = 300·P·L/RTT; 80 % car loading, 10 m² per person, interval ≤ 30 s and HC5 ≥ 12 % for "
    "offices: CIBSE Guide D guidance, from memory. Rated load by persons: EN 81-20 (2020) "
    "Table 6, from memory. Door and transfer times: common practice.")
MOTOR_SRC = (
    "Sources: traction motor power P = (1 − balance)·Q·g·v/η, common practice (CIBSE Guide D "
    "(2020) ch. 9); US form hp = (1 − balance)·load (lb)·speed (fpm)/(33000·η), common practice "
    "(1 hp = 33 000 ft·lbf/min, NIST SP 811 (2008) B.8); counterweight = car + 40-50 % of rated "
    "load, common practice; M = 9549·P/n (kW, rpm) = P/(2πn/60). Daily energy from motor power, "
    "starts per day and mean trip time with standby power, after ISO 25745-2 (2015), "
    "simplified, from memory. NIST SP 811 (2008) App. B.8: 1 kg = 2.205 lb; 1 hp = 0.7457 kW; "
    "1 m/s = 196.85 fpm. Car and rope masses from the vendor's datasheet (invented).")
trf = ItemSheet("Traffic", "Harrowgate House (10 office floors above the lobby): lift traffic "
                "analysis, up-peak (invented scenario)", LIFT_SRC)
mot = ItemSheet("Motor", "Harrowgate House: lift motor, counterweight and energy (invented "
                "scenario)", MOTOR_SRC)
trf.add("N", "Floors served above the main terminal", "N", 10, "-")
trf.add("df", "Average interfloor distance", "d_f", 3.6, "m")
trf.add("Af", "Net usable area per floor", "A_f", 1200, "m²")
trf.add("dens", "Occupant density", "a_p", 10, "m²/person")
trf.add("U", "Building population", "U", "={N}*{Af}/{dens}", "persons")
trf.add("CC", "Rated car capacity", "CC", 21, "persons")
trf.add("RL", "Rated load", "Q", "=VLOOKUP({CC},Cars!$A$4:$C$8,2,FALSE)", "kg")
trf.add("Acar", "Maximum available car area", "A_car", "=VLOOKUP({CC},Cars!$A$4:$C$8,3,FALSE)",
        "m²")
trf.add("P", "Average passengers per trip (80 % of capacity)", "P", "=0.8*{CC}", "persons")
trf.add("L", "Number of cars", "L", 4, "-")
trf.add("v", "Rated speed", "v", 2.5, "m/s")
trf.add("a", "Acceleration", "a", 1.0, "m/s²")
trf.add("vfpm", "Rated speed, US", "v_US", "={v}*196.85", "fpm")
trf.add("vfpm2", "Rated speed, US (tender form)", "v_US2", "={v}*3.281", "fpm",
        planted=("unit-scale", "m/s × 3.281 gives ft/s, written under fpm: 60 too small"))
trf.add("tv", "Time to pass one floor at rated speed", "t_v", "={df}/{v}", "s")
trf.add("tv2", "Time to pass one floor (from the US speed)", "t_v2", "={df}/{vfpm}", "s",
        planted=("unit-scale", "floor height in m over a speed in fpm"))
trf.add("S", "Probable number of stops", "S", "={N}*(1-(1-1/{N})^{P})", "-")
trf.add("H", "Highest reversal floor", "H", "={N}-Floors!B14", "-")
trf.add("da", "Distance to reach rated speed", "d_a", "={v}^2/(2*{a})", "m")
trf.add("tf1", "Single-floor flight time", "t_f1",
        "=IF({df}>=2*{da},{df}/{v}+{v}/{a},2*SQRT({df}/{a}))", "s")
trf.add("to", "Door opening time", "t_o", 2.0, "s")
trf.add("tc", "Door closing time", "t_c", 3.0, "s")
trf.add("tsd", "Start delay", "t_sd", 0.5, "s")
trf.add("ts", "Time consumed per stop", "t_s", "={tf1}-{tv}+{tc}+{to}+{tsd}", "s")
trf.add("tp", "Passenger transfer time", "t_p", 1.2, "s")
trf.add("RTT", "Round trip time", "RTT", "=2*{H}*{tv}+({S}+1)*{ts}+2*{P}*{tp}", "s")
trf.add("INT", "Up-peak interval", "INT", "={RTT}/{L}", "s")
trf.add("HC5", "Handling capacity in 5 minutes", "HC5", "=300*{P}*{L}/{RTT}", "persons")
trf.add("pHC", "Handling capacity, share of population", "%HC", "={HC5}/{U}*100", "%")
trf.add("chk", "Performance check (office)", "check",
        "=IF(AND({INT}<=30,{pHC}>=12),\"OK\",\"REVIEW\")")

mot.add("Mcar", "Car mass (empty, with sling)", "M_car", 2100, "kg")
mot.add("Q", "Rated load", "Q", "={Traffic.RL}", "kg")
mot.add("Mtc", "Travelling cable and compensation chain (vendor)", "M_tc", 480, "lb")
mot.add("Msus", "Suspended mass, car side, full load", "M_sus", "=SUM({Mcar}:{Mtc})", "kg",
        planted=("mixed-range", "SUM over two kg rows and a lb row"))
mot.add("Qlb", "Rated load, lb", "Q_lb", "={Q}*2.205", "lb")
mot.add("B", "Counterweight balance", "B", 45, "%")
mot.add("Mcw", "Counterweight mass", "M_cw", "={Mcar}+{B}/100*{Q}", "kg")
mot.add("Mcw2", "Counterweight mass (site check)", "M_cw2", "={Mcar}+{B}*{Q}", "kg",
        planted=("unit-scale", "45 % used as 45"))
mot.add("Mcwlb", "Counterweight mass, lb", "M_cw,lb", "={Mcw}*2.205", "lb")
mot.add("McwV", "Counterweight on the vendor's drawing", "M_cw,V", 6400, "lb")
mot.add("McwVk", "Counterweight on the vendor's drawing, kg", "M_cw,Vk", "={McwV}*2.205", "kg",
        planted=("unit-scale", "lb to kg multiplied by 2.205: wrong way round"))
mot.add("eta", "Overall efficiency (gearless machine and drive)", "eta", 80, "%")
mot.add("Pm", "Motor power", "P_m", "=(1-{B}/100)*{Q}*9.81*{Traffic.v}/({eta}/100)/1000", "kW")
mot.add("Pm2", "Motor power (quick check)", "P_m2", "=(1-{B}/100)*{Q}*{Traffic.v}/({eta}/100)/1000",
        "kW", planted=("result-unit", "g left out: kg·m/s is not a power"))
mot.add("PmUS", "Motor power, US formula", "P_hp", "=(1-{B}/100)*{Qlb}*{Traffic.vfpm}/(33000*{eta}/100)",
        "hp")
mot.add("Pmhp", "Motor power in hp", "P_m,hp", "={Pm}/0.7457", "hp")
mot.add("Pmhp2", "Motor power in hp (motor list)", "P_m,hp2", "={Pm}*0.7457", "hp",
        planted=("unit-scale", "kW to hp multiplied by 0.7457: wrong way round"))
mot.add("Dsh", "Traction sheave diameter", "D_sh", 640, "mm")
mot.add("r", "Roping ratio (2:1)", "r", 2, "-")
mot.add("nsh", "Sheave speed at rated speed", "n_sh", "={Traffic.v}*{r}*60/(PI()*{Dsh}/1000)",
        "rpm")
mot.add("T", "Motor torque at rated power", "M", "=9549*{Pm}/{nsh}", "N·m")
mot.add("ns", "Starts per day", "n_s", 1200, "starts/d")
mot.add("tt", "Mean trip time", "t_t", 12, "s")
mot.add("kL", "Mean load factor of a trip", "k_L", 0.5, "-")
mot.add("Erun", "Running energy per day", "E_run", "={Pm}*{ns}*{tt}/3600*{kL}", "kWh/d")
mot.add("Pst", "Standby power (controller, car light, fan)", "P_st", 350, "W")
mot.add("Est", "Standby energy per day", "E_st", "={Pst}*(24-{ns}*{tt}/3600)/1000", "kWh/d")
mot.add("Est2", "Standby energy per day (first estimate)", "E_st2", "={Pst}*24", "kWh/d",
        planted=("unit-scale", "W × h written under kWh: 1000 too large"))
mot.add("Eday", "Energy per day per car", "E_d", "={Erun}+{Est}", "kWh/d")
mot.add("Eyr", "Energy per year, all cars", "E_yr", "={Eday}*{Traffic.L}*365/1000", "MWh/yr")
TRAFFIC = trf.finish({"Motor": mot})
MOTOR = mot.finish({"Traffic": trf})

n_ref, p_ref = trf.ref("N"), trf.ref("P")
FLOORS = {
    "A1": "Harrowgate House: highest reversal floor, Σ(i/N)^P (CIBSE Guide D (2020) ch. 3)",
    "A2": CAUTION,
    "A4": "Floor i [-]", "B4": "(i/N)^P [-]", "A14": "Sum",
}
for i, r in enumerate(range(5, 14), start=1):
    FLOORS[f"A{r}"] = i
    FLOORS[f"B{r}"] = f"=(A{r}/{n_ref})^{p_ref}"
FLOORS["B14"] = "=SUM(B5:B13)"

CARS = {
    "A1": "Rated load and maximum car area by persons (EN 81-20 (2020) Table 6, from memory)",
    "A2": CAUTION,
    "A3": "Persons", "B3": "Rated load [kg]", "C3": "Max. car area [m²]",
}
for r, (n, q, a) in enumerate([(8, 630, 1.66), (13, 1000, 2.40), (16, 1275, 2.95),
                               (21, 1600, 3.56), (26, 2000, 4.20)], start=4):
    CARS.update({f"A{r}": n, f"B{r}": q, f"C{r}": a})

LIFT = {
    "trade": "vertical transportation: lift traffic (CIBSE) and traction motor sizing",
    "sheets": [("Traffic", TRAFFIC), ("Motor", MOTOR), ("Floors", FLOORS), ("Cars", CARS)],
    "planted": {**trf.planted, **mot.planted},
}

BOOKS = {"stack-emissions": STACK, "gas-metering": GASMETER, "hx-rating": HEATX,
         "lift-traffic": LIFT}

# Findings beyond the planted mistakes, judged after the run: cell -> [(rule, comment)].
CORRECT = "a correct cell plumb still flags: "
NOTE = "a note on a correct cell, read as such: "
MOLAR = NOTE + "22.414 read as the ideal gas's molar volume at 0 °C (L/mol = m³/kmol)"
REF_T = NOTE + "273.15 read as the reference temperature of the normal state"
REF_P = NOTE + "1013.25 (mbar) read as the reference pressure of the normal state"
BARO = (CORRECT + "{f} adds the site barometer in mbar, converted to bar by /1000, to a bar g "
        "reading: the absolute pressure the conversion factor needs (EN 12405-1, DIN 1343). plumb "
        "reads the 1000 as a standard reference pressure (1000 mbar = 100 kPa), so "
        "p_atm/1000 as a pressure ratio, and reports a sum of a pressure and a number; "
        "'*0.001' passes; the same sum in a .plumb file draws the same error")
EXTRA = {
    "stack-emissions": {
        "Report!C17": [("trade-constant", MOLAR)],
        "Report!C18": [("trade-constant", "the one finding on the planted cell C18: a note that "
                        "accepts 24.45 as a molar volume (see the slip above)")],
        "Report!C19": [("trade-constant", MOLAR)],
        "Report!C29": [("trade-constant", MOLAR)],
        "Runs!L6": [("trade-constant", MOLAR)],
        "Runs!L7": [("trade-constant", MOLAR)],
        "Runs!L8": [("trade-constant", MOLAR)],
        "Runs!J6": [("trade-constant", REF_T), ("trade-constant", REF_P)],
        "Runs!J8": [("trade-constant", REF_T), ("trade-constant", REF_P)],
        "Report!C39": [("result-unit", CORRECT + "=C6*1.194E-7 is Method 19's Table 19-1 "
                        "factor, 1.194×10⁻⁷ lb/scf per ppm NOx (46.01 lb/lbmol ÷ 385.3 "
                        "scf/lbmol × 10⁻⁶ at 68 °F), typed as 40 CFR 60 App. A prints it; the "
                        "factor carries lb/scf, which a bare number cannot show, so plumb sees "
                        "ppm against lb/scf")],
        "Report!C33": [("no-unit", CORRECT + "=C30*C32/1000 is kg/h × h/yr ÷ 1000 = t/yr; "
                        "plumb's unit table has no year (neither 'yr' nor 'a'; NIST SP 811 "
                        "(2008) B.8 lists the year of 365 d), so 't/yr' does not read")],
        "Report!C32": [("no-unit", "the input 6200 h/yr, for the same missing year (an input "
                        "cell, not a formula)")],
        "Report!C53": [("trade-constant", NOTE + "the cell passes, but the words mislead: "
                        "'100' is read as one over the molar gas constant; the 100 converts "
                        "mbar to Pa and 8314 is R in J/(kmol·K)")],
    },
    "gas-metering": {
        "Station!C27": [("sum-mismatch", BARO.format(f="=C8+C5/1000")),
                        ("trade-constant", "the note that comes with it: '1000' read as a "
                         "standard reference pressure, wrong words for a mbar-to-bar factor")],
        "Runs!G6": [("sum-mismatch", BARO.format(f="(D6+Station!$C$5/1000)")),
                    ("trade-constant", "the note that comes with it, as on Station!C27")],
        "Runs!G8": [("sum-mismatch", BARO.format(f="(D8+Station!$C$5/1000)")),
                    ("trade-constant", "the note that comes with it, as on Station!C27")],
        "Runs!G7": [("trade-constant", "the note on the planted cell G7, as on Station!C27")],
        "Station!C33": [("trade-constant", NOTE + "1.01325 (bar) read as the normal reference "
                         "pressure"), ("trade-constant", REF_T)],
        "Station!C34": [("trade-constant", "a note on the planted cell C34: 273.15 read as "
                         "the reference temperature")],
    },
    "hx-rating": {
        "Rating!C59": [("trade-constant", NOTE + "500 read as water's ρ·c_p in Btu/(h·gpm·°F)")],
    },
    "lift-traffic": {
        "Motor!C17": [("gravity-number", NOTE + "9.81 read as standard gravity")],
        "Motor!C19": [("gravity-number", NOTE + "the cell passes, but the words mislead: "
                       "'33000' is read as one over standard gravity; it is 33 000 ft·lbf/min "
                       "per hp, with the load's lb taken as lbf (g folded in)")],
        "Motor!C25": [("trade-constant", NOTE + "9549 read as 60000/(2π)")],
        "Motor!C34": [("no-unit", CORRECT + "=C33*Traffic!$C$14*365/1000 is kWh/d × cars × "
                       "365 d/yr ÷ 1000 = MWh/yr; plumb's unit table has no year, so 'MWh/yr' "
                       "does not read")],
        "Traffic!C8": [("no-unit", "an input: 'm²/person' does not read (no unit for a count "
                        "of persons)")],
        "Traffic!C10": [("no-unit", "an input: 'persons' does not read; rated load, car area and P "
                         "(and what is built on P) are checked without it")],
        "Motor!C26": [("no-unit", "an input: 'starts/d' does not read (no unit for a count "
                       "of starts)")],
        "Cars!A4": [("no-unit", "the VLOOKUP key column, headed 'Persons' without brackets: "
                     "a key that is matched, not computed with, is still asked for a unit")],
        "Cars!A5": [("no-unit", "as Cars!A4")],
        "Cars!A6": [("no-unit", "as Cars!A4")],
        "Cars!A7": [("no-unit", "as Cars!A4")],
        "Cars!A8": [("no-unit", "as Cars!A4")],
    },
}
# Planted cells plumb misses: cell -> why (written as '# a slip plumb still misses:').
MISSED = {
    "Report!C12": ("=C6*(20.9-C8)/(20.9-C9) turns the O2 correction upside down "
                   "((20.9 − O2)/(20.9 − 3) for (20.9 − 3)/(20.9 − O2)): both are % over %, so "
                   "no unit check sees it; plumb knows the correction's form (README, "
                   "unit-scale row) and could say when the measured O2 is on top; expected at "
                   "most a note"),
    "Report!C18": ("=C11*C15/24.45 under mg/Nm³ takes the molar volume at 25 °C on the 0 °C "
                   "normal basis, 8 % low; plumb gives only a trade-constant note accepting "
                   "24.45, while the same line in a .plumb file (c : mg/Nm3) gets the README's "
                   "unit-scale warning 'write 22.41 there'; expected unit-scale (an error in a "
                   "workbook)"),
    "Report!C42": ("=C39*C40*20.9/(20.9-C8/100) divides the O2 reading in % by 100 beside "
                   "20.9, oxygen's share of air in %, so the factor is 1.002 for 1.246; plumb "
                   "takes the bare 20.9 in the unit of C8/100 and reports nothing, though it "
                   "reads 20.9 beside a % reading as oxygen's share of air; expected unit-scale"),
    "Station!C55": ("=C39/3600/(PI()*(C53/1000)^2/4) takes the normal flow (Nm³/h, C39) for "
                    "the velocity in the pipe, where the flow at line conditions belongs: 7.9 "
                    "times too fast; plumb keeps Nm³ at its reference state, yet divides it by "
                    "a pipe area into m/s without remark; expected a unit-scale warning like "
                    "its 'actual gas volume set equal to one at reference conditions'"),
}
# Planted cells plumb reports under another rule than planted: cell -> plumb's rule.
NAMED = {"Rating!C29": "sum-mismatch"}
# A planted cell plumb reports, but not for its planted mistake: cell -> comment.
WRONG_REASON = {
    "Runs!G7": ("plumb reports this cell, but only for the barometer term p_atm/1000 it "
                "misreads (as on G6 and G8); the °C slip 273.15/E7 is not named (a probe with "
                "the pressure written (D7+C5) in bar names it offset-scale)"),
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
            f.write("# sheet!cell rule: the planted mistakes plumb must report; every other\n"
                    "# formula cell must stay clean (written by make_books.py).\n"
                    "# Invented scenario. Caution: a dimensionally consistent formula can still\n"
                    "# be wrong; this check does not replace independent review under local\n"
                    "# codes and licensed practice.\n")
            for cell, (rule, what) in book["planted"].items():
                f.write(f"# planted: {what}\n")
                if cell in MISSED:
                    f.write(f"# a slip plumb still misses: {cell} {MISSED[cell]}\n")
                elif cell in NAMED:
                    f.write(f"# planted as {rule}; plumb names it {NAMED[cell]}\n"
                            f"{cell} {NAMED[cell]}\n")
                elif cell in WRONG_REASON:
                    f.write(f"# planted as {rule}; {WRONG_REASON[cell]}\n{cell} sum-mismatch\n")
                else:
                    f.write(f"{cell} {rule}\n")
            extra = [(c, r, w) for c, items in EXTRA.get(stem, {}).items() for r, w in items]
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
