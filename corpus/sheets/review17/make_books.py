#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review64), written with the
standard zipfile module (corpus/sheets/xlsx_writer.py, shared by the review books).
Adapted from review13's make_books.py: same ItemSheet helper, new trades and new books.

Trades: a district heating network's pipe schedule; a fire water tank and diesel fire pump
sheet; a truck fleet's fuel and CO2 return; a compressed-air leak survey. All scenarios, sites,
readings and catalogue data are invented (Invented scenario) and for demonstration only; the
formulas and published factors are the trade's own, with sources named in a text cell at the
top of each sheet.

A dimensionally consistent formula can still be wrong, and this check does not replace
independent review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
should stay clean. Each book also gets a sidecar (<book>.cells.plumb) for the unit texts plumb's
table does not read (yr, mpg, $, L/100 km, CO2 in a unit); see SIDECARS below.

Run: python3 make_books.py  ->  *.xlsx, *.cells.plumb, *.expect, expect.json in this folder
"""
import json
import os
import re

import sys
sys.path.insert(0, os.path.dirname(os.path.dirname(os.path.abspath(__file__))))
from xlsx_writer import write_xlsx  # noqa: E402 (the shared writer in corpus/sheets)

HERE = os.path.dirname(os.path.abspath(__file__))

CAUTION = ("Invented scenario: every size, load, reading and price here is made up for "
           "demonstration only. A dimensionally consistent formula can still be wrong; this "
           "check does not replace independent review under local codes and licensed practice.")


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
        if absolute:
            return f"{self.name}!$C${self.keys[key]}"
        return f"{self.name}!C{self.keys[key]}"

    def cell(self, key):
        return f"C{self.keys[key]}"

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


def table_sheet(title, sources, headings, rows, first_row=5):
    """A table: title in A1, sources in A2, the caution in A3, headings in row first_row-1."""
    cells = {"A1": title, "A2": sources, "A3": CAUTION}
    for i, h in enumerate(headings):
        cells[f"{chr(65 + i)}{first_row - 1}"] = h
    for r, row in enumerate(rows, start=first_row):
        for i, v in enumerate(row):
            if v is not None:
                cells[f"{chr(65 + i)}{r}"] = v
    return cells


# --------------------------------------------------------------------------------------------
# Book 1: district heating pipe schedule (kW, MW, kg/s, m³/h, °C ΔT, m/s, Pa/m, kPa, bar)
# --------------------------------------------------------------------------------------------
DH_SRC = ("Sources: heat carried Φ = ṁ·c_p·ΔT; Darcy–Weisbach R = λ·ρ·v²/(2·d) and Re = ρ·v·d/μ "
          "(F. M. White, Fluid Mechanics, 8th ed., ch. 6); Swamee–Jain friction factor "
          "λ = 0.25/[log10(ε/(3.7·d) + 5.74/Re^0.9)]² (Swamee and Jain 1976, as given in White "
          "8th ed.); pump power V̇·Δp/η (common practice); steel service pipe inner diameters "
          "after EN 253:2019 (from memory: check against the pipe maker's table); water at "
          "62 °C: ρ = 982 kg/m³, μ = 0.45 mPa·s, c_p = 4.19 kJ/(kg·K), and saturation pressure "
          "47.4 kPa abs at 80 °C (from memory of IAPWS-IF97 steam tables); standard atmosphere "
          "101.325 kPa (ISO 2533:1975); g_n = 9.80665 m/s², 9.81 used (SI Brochure 9th ed.). "
          "Roughness 0.05 mm, 75 % simultaneity, 100 Pa/m design gradient and a 50 kPa margin "
          "against boiling: common practice.")
net = ItemSheet("Network", "Kestrel Lane district heating extension: design data and pump "
                "duty (Invented scenario)", DH_SRC)
net.add("Ts", "Supply temperature", "T_s", 80, "°C")
net.add("Tr", "Return temperature", "T_r", 45, "°C")
net.add("dT", "Design temperature difference", "ΔT", "={Ts}-{Tr}", "K")
net.add("Tm", "Mean water temperature (for properties)", "T_m", "=({Ts}+{Tr})/2", "°C")
net.add("cp", "Specific heat of water at the mean temperature", "c_p", 4.19, "kJ/(kg·K)")
net.add("rho", "Density of water at the mean temperature", "ρ", 982, "kg/m³")
net.add("mu", "Dynamic viscosity of water at the mean temperature", "μ", 0.45, "mPa·s")
net.add("eps", "Pipe roughness (steel service pipe)", "ε", 0.05, "mm")
net.add("Qc", "Connected heat load (first segment from the plant)", "Φ_c", "=Pipes!B5", "kW")
net.add("fs", "Simultaneity factor", "f_s", 75, "%")
net.add("Qd", "Design heat load at the plant", "Φ_d", "={Qc}*{fs}/100", "kW")
net.add("Lr", "Route length, plant to last consumer", "L_r", "=SUM(Pipes!E5:E9)", "m")
net.add("ql", "Heat loss per trench metre, flow and return pair (maker's table)", "q_l", 24,
        "W/m")
net.add("Ql", "Network heat loss", "Φ_l", "={ql}*{Lr}/1000", "kW")
net.add("Qp", "Plant heat output required", "Φ_p", "={Qd}+{Ql}", "kW")
net.add("Qp2", "Plant heat output required (check sheet)", "Φ_p2", "={Qd}+{ql}*{Lr}", "kW",
        planted=("unit-scale", "heat loss in W (W/m × m) added to kW loads"))
net.add("QpM", "Plant heat output required, MW", "Φ_pM", "={Qp}/1000", "MW")
net.add("m", "Design mass flow at the plant", "ṁ", "={Qp}/({cp}*{dT})", "kg/s")
net.add("m2", "Design mass flow at the plant (from the supply temperature)", "ṁ_2",
        "={Qp}/({cp}*{Ts})", "kg/s",
        planted=("offset-scale", "the supply temperature in °C where the formula wants ΔT"))
net.add("V", "Design volume flow at the plant", "V̇", "={m}/{rho}*3600", "m³/h")
net.add("dpP", "Pipe loss along the index route, flow and return", "Δp_pipe",
        "=2*SUM(Pipes!K5:K9)", "kPa")
net.add("dpHX", "Substation heat exchanger, primary side (maker's datasheet)", "Δp_HX", 0.35,
        "bar")
net.add("dpCV", "Substation control valve (authority 0.5)", "Δp_CV", 40, "kPa")
net.add("dpPR", "Plant room: boilers, strainers, heat meter", "Δp_PR", 60, "kPa")
net.add("dpT", "Pump differential pressure", "Δp_pump", "=SUM({dpP}:{dpPR})", "kPa",
        planted=("mixed-range", "SUM over a block holding the heat exchanger's loss in bar "
                 "beside kPa"))
net.add("dpTb", "Pump differential pressure, bar", "Δp_pump,bar", "={dpT}/100", "bar")
net.add("etap", "Pump and motor efficiency", "η_p", 62, "%")
net.add("Pp", "Pump electrical power", "P_p", "={V}*{dpT}/3600/({etap}/100)", "kW")
net.add("Pp2", "Pump electrical power (quick check)", "P_p2", "={V}*{dpT}/({etap}/100)", "kW",
        planted=("unit-scale", "m³/h × kPa with the /3600 left out: 3600 too large"))
net.add("hb", "Height of the highest building above the plant", "h_b", 28, "m")
net.add("g", "Gravity", "g", 9.81, "m/s²")
net.add("pst", "Static pressure of the water column to the highest building", "p_st",
        "={rho}*{g}*{hb}/1000", "kPa")
net.add("pst2", "Static pressure to the highest building (riser schedule)", "p_st2",
        "={rho}*{hb}/1000", "kPa",
        planted=("result-unit", "ρ·h with g left out: gives kg/m², not kPa"))
net.add("pf", "Pressurisation set point at the plant", "p_f", 400, "kPa(g)")
net.add("ptop", "Pressure at the top of the highest building, pumps stopped", "p_top",
        "={pf}-{pst}", "kPa(g)")
net.add("psat", "Saturation pressure of water at the supply temperature", "p_sat", 47.4,
        "kPa(a)")
net.add("ok", "Boiling check at the top (50 kPa margin)", "check",
        "=IF({ptop}+101.325>{psat}+50,\"OK\",\"RAISE SET POINT\")")
net.add("ok2", "Boiling check at the top (rev. A)", "check_2",
        "=IF({ptop}>{psat},\"OK\",\"RAISE SET POINT\")",
        planted=("offset-scale", "a gauge pressure compared with an absolute one"))
net.add("dM", "Inner diameter of the main (first segment)", "d_M", "=Pipes!D5", "mm")
net.add("vM", "Velocity in the main", "v_M", "=Pipes!H5", "m/s")
net.add("Re", "Reynolds number in the main", "Re", "={rho}*{vM}*{dM}/1000/({mu}/1000)", "-")
net.add("lam", "Friction factor in the main (Swamee–Jain)", "λ",
        "=0.25/LOG10({eps}/(3.7*{dM})+5.74/{Re}^0.9)^2", "-")
net.add("RM", "Pressure gradient in the main (check of Pipes!J5)", "R_M",
        "={lam}*{rho}*{vM}^2/(2*{dM}/1000)", "Pa/m")
NETWORK = net.finish()

R = {k: net.ref(k) for k in ("fs", "cp", "dT", "rho")}
DN_ROWS = [(50, 54.5, 160), (65, 70.3, 180), (80, 82.5, 200), (100, 107.1, 250),
           (125, 132.5, 280), (150, 160.3, 315), (200, 210.1, 400)]
DN = table_sheet("Kestrel Lane: steel service pipe sizes (pre-insulated, series 2)",
                 "Sources: inner diameters after EN 253:2019 and casing sizes of series 2 "
                 "insulation, from memory: check against the pipe maker's catalogue.",
                 ["DN", "Inner diameter [mm]", "Casing outer diameter [mm]"], DN_ROWS)
PIPE_ROWS = [("S1 plant to J1", 3200, 150, 420, 0.018), ("S2 J1 to J2", 2300, 125, 310, 0.019),
             ("S3 J2 to J3", 1500, 100, 260, 0.020), ("S4 J3 to J4", 900, 80, 180, 0.021),
             ("S5 J4 to school", 400, 65, 150, 0.023)]
PIPES = table_sheet(
    "Kestrel Lane district heating extension: pipe schedule, index route (Invented scenario)",
    "Sources: as the Network sheet. Flow ṁ = Φ·f_s/(c_p·ΔT); V̇ = ṁ/ρ·3600; v = V̇/(3600·πd²/4); "
    "R = λ·ρ·v²/(2d) (White, Fluid Mechanics 8th ed.); friction factors read from the pipe "
    "maker's design program (invented readings).",
    ["Segment", "Heat load carried [kW]", "DN", "Inner diameter [mm]", "Trench length [m]",
     "Mass flow [kg/s]", "Volume flow [m³/h]", "Velocity [m/s]", "Friction factor [-]",
     "Pressure gradient [Pa/m]", "Pressure drop [kPa]"],
    [(s, q, dn, None, L, None, None, None, lam, None, None) for s, q, dn, L, lam in PIPE_ROWS])
for r in range(5, 10):
    PIPES[f"D{r}"] = f"=VLOOKUP(C{r},DN!$A$5:$C$11,2,FALSE)"
    PIPES[f"F{r}"] = f"=B{r}*{R['fs']}/100/({R['cp']}*{R['dT']})"
    PIPES[f"G{r}"] = f"=F{r}/{R['rho']}*3600"
    PIPES[f"H{r}"] = f"=G{r}/3600/(PI()*(D{r}/1000)^2/4)"
    PIPES[f"J{r}"] = f"=I{r}*{R['rho']}*H{r}^2/(2*D{r}/1000)"
    PIPES[f"K{r}"] = f"=J{r}*E{r}/1000"
PIPES["A10"] = "Mean / total"
PIPES["H10"] = "=AVERAGE(H5:H9)"
PIPES["J10"] = "=AVERAGE(J5:J9)"
# planted in the schedule
PIPES["H6"] = f"=F6/{R['rho']}/3600/(PI()*(D6/1000)^2/4)"
PIPES["G7"] = f"=F7/{R['rho']}/3600"
PIPES["K8"] = "=J8*E8"

DHEAT = {
    "trade": "district heating: network pipe schedule, pump duty and pressurisation",
    "sheets": [("Network", NETWORK), ("Pipes", PIPES), ("DN", DN)],
    "planted": {**net.planted,
                "Pipes!H6": ("unit-scale", "kg/s ÷ ρ is already m³/s, divided by 3600 again: "
                             "the conversion doubled, 3600 too small"),
                "Pipes!G7": ("unit-scale", "m³/s to m³/h divided by 3600: wrong way round"),
                "Pipes!K8": ("unit-scale", "Pa/m × m gives Pa, typed in the kPa column: the "
                             "/1000 missing")},
}

# --------------------------------------------------------------------------------------------
# Book 2: fire water tank and diesel fire pump (gpm, L/min, L/s, m³, US gal, bar, psi, kPa)
# --------------------------------------------------------------------------------------------
FW_SRC = ("Sources: NFPA 13 (2022) Table 19.2.3.1.2, hose stream allowance and duration by "
          "hazard (from memory); NFPA 20 (2022): pump to give at least 65 % of rated pressure "
          "at 150 % of rated flow, churn not over 140 % of rated pressure, diesel fuel 1 gal per "
          "engine hp plus 5 % expansion and 5 % sump (from memory); NFPA 22 (2023), refill "
          "within 8 h (from memory); 175 psi component rating, NFPA 13 (2022). NIST SP 811 "
          "(2008) App. B.8: 1 gal = 3.785 L, 1 gpm = 0.0631 L/s, 1 m³ = 264.2 gal, 1 bar = "
          "14.5 psi, 1 hp = 0.7457 kW, 1 lb = 0.4536 kg. Water 8.34 lb per US gal and 0.0981 bar "
          "per metre of water: common practice. Hydraulic hp = gpm·psi/1714 (Cameron Hydraulic "
          "Data, 19th ed.). Vapour pressure of water at 20 °C 2.34 kPa and density 998 kg/m³ "
          "(from memory, steam tables); standard atmosphere 101.325 kPa (ISO 2533:1975).")
dem = ItemSheet("Demand", "Harlow Fen cold store: fire water demand and storage tank "
                "(Invented scenario)", FW_SRC)
dem.add("haz", "Occupancy hazard classification (NFPA 13)", "hazard", "OH2")
dem.add("Qs", "Sprinkler system demand at the base of the riser (hydraulic calc)", "Q_s", 385,
        "gpm")
dem.add("Qir", "In-rack sprinkler demand (rack supplier's calc)", "Q_ir", 380, "L/min")
dem.add("Qh", "Hose stream allowance", "Q_h", "=VLOOKUP({haz},Hazard!$A$5:$C$9,2,FALSE)", "gpm")
dem.add("dur", "Required duration of supply", "t_d", "=VLOOKUP({haz},Hazard!$A$5:$C$9,3,FALSE)",
        "min")
dem.add("Qt", "Total water demand", "Q_t", "={Qs}+{Qir}/3.785+{Qh}", "gpm")
dem.add("Qt2", "Total water demand (summary table)", "Q_t2", "=SUM({Qs}:{Qh})", "gpm",
        planted=("mixed-range", "SUM over gpm cells and the in-rack demand in L/min"))
dem.add("QtL", "Total water demand, L/min", "Q_tL", "={Qt}*3.785", "L/min")
dem.add("QtLs", "Total water demand, L/s", "Q_tLs", "={Qt}*0.0631", "L/s")
dem.add("Qtm", "Total water demand, m³/h", "Q_tm", "={QtL}*60/1000", "m³/h")
dem.add("Vr", "Water required for the duration", "V_r", "={Qt}*{dur}", "US gal")
dem.add("Vrm", "Water required, m³", "V_rm", "={Vr}*0.003785", "m³")
dem.add("Vrm2", "Water required, m³ (metric route)", "V_rm2", "={QtL}*{dur}*60/1000", "m³",
        planted=("unit-scale", "L/min × min already gives L; the extra ×60 makes it 60 too "
                 "large"))
dem.add("fa", "Design margin on tank capacity (insurer)", "f_a", 10, "%")
dem.add("Vmin", "Minimum effective tank capacity", "V_min", "={Vrm}*(1+{fa}/100)", "m³")
dem.add("D", "Tank inside diameter", "D", 7.5, "m")
dem.add("H", "Height to the overflow", "H", 8.2, "m")
dem.add("hd", "Dead water depth below the anti-vortex plate", "h_d", 0.3, "m")
dem.add("Veff", "Effective tank capacity", "V_eff", "=PI()*{D}^2/4*({H}-{hd})", "m³")
dem.add("Vg", "Effective tank capacity, US gal", "V_g", "={Veff}*264.2", "US gal")
dem.add("Vg2", "Effective tank capacity, US gal (insurer's form)", "V_g2", "={Veff}/264.2",
        "US gal", planted=("unit-scale", "m³ to US gal divided by 264.2: wrong way round"))
dem.add("okV", "Tank capacity check", "check_V",
        "=IF({Veff}>={Vmin},\"OK\",\"TANK TOO SMALL\")")
dem.add("mw", "Mass of water in the tank", "m_w", "={Vg}*8.34", "lb")
dem.add("mwk", "Mass of water in the tank, kg", "m_wk", "={mw}*0.4536", "kg")
dem.add("Wf", "Water load on the ring foundation", "W_f", "={mwk}*9.81/1000", "kN")
dem.add("Wf2", "Water load on the foundation (to the structural engineer)", "W_f2",
        "={mwk}/1000", "kN", planted=("result-unit", "kg ÷ 1000 is tonnes, not kN: g missing"))
dem.add("qf", "Refill supply from the town main", "q_f", 12, "L/s")
dem.add("tr", "Refill time", "t_r", "={Veff}/({qf}*3.6)", "h")
dem.add("okR", "Refill within 8 h (NFPA 22, from memory)", "check_R",
        "=IF({tr}<=8,\"OK\",\"REFILL TOO SLOW\")")
DEMAND = dem.finish()

pump = ItemSheet("Pump", "Harlow Fen cold store: diesel fire pump selection and checks "
                 "(Invented scenario)", FW_SRC)
pump.add("model", "Selected fire pump", "model", "FP-750")
pump.add("Qr", "Rated flow", "Q_r", "=VLOOKUP({model},Pumps!$A$5:$E$8,2,FALSE)", "gpm")
pump.add("pr", "Rated net pressure", "p_r", "=VLOOKUP({model},Pumps!$A$5:$E$8,3,FALSE)", "psi")
pump.add("pso", "Churn (shutoff) net pressure", "p_so",
         "=VLOOKUP({model},Pumps!$A$5:$E$8,4,FALSE)", "psi")
pump.add("Pe", "Diesel engine rating", "P_e", "=VLOOKUP({model},Pumps!$A$5:$E$8,5,FALSE)", "hp")
pump.add("okQ", "Rated flow covers the total demand", "check_Q",
         f"=IF({{Qr}}>={dem.ref('Qt')},\"OK\",\"UNDERSIZED\")")
pump.add("pd", "System demand pressure at the pump discharge (hydraulic calc)", "p_d", 6.1,
         "bar")
pump.add("hs", "Minimum water level above the pump centreline", "h_s", 1.2, "m")
pump.add("ps", "Static suction gain at the minimum level", "p_s", "={hs}*0.0981", "bar")
pump.add("pn", "Net pressure the pump must add", "p_n", "={pd}-{ps}", "bar")
pump.add("pnp", "Net pressure the pump must add, psi", "p_np", "={pn}*14.5", "psi")
pump.add("pnk", "Net pressure the pump must add (metric submittal)", "p_nk", "={pn}*14.5",
         "kPa", planted=("unit-scale", "the psi formula under a kPa unit (bar × 14.5 is psi; "
                         "kPa wants × 100)"))
pump.add("okP", "Rated pressure covers the demand", "check_p",
         "=IF({pr}>={pnp},\"OK\",\"UNDERSIZED\")")
pump.add("f150", "Minimum pressure at 150 % of rated flow (NFPA 20)", "f_150", 65, "%")
pump.add("Q150", "Flow at 150 % of rating", "Q_150", "=1.5*{Qr}", "gpm")
pump.add("p150", "Minimum net pressure at 150 % flow", "p_150", "={pr}*{f150}/100", "psi")
pump.add("p150b", "Minimum net pressure at 150 % flow (test sheet)", "p_150b", "={pr}*{f150}",
         "psi", planted=("unit-scale", "65 % used as 65: 100 too large"))
pump.add("okC", "Churn pressure within 140 % of rated", "check_c",
         "=IF({pso}<={pr}*1.4,\"OK\",\"EXCEEDS 140 %\")")
pump.add("hfull", "Full tank level above the pump centreline", "h_full",
         f"={{hs}}+{dem.ref('H')}-{dem.ref('hd')}", "m")
pump.add("pmax", "Maximum pressure at churn with a full tank", "p_max",
         "={pso}+{hfull}*0.0981*14.5", "psi")
pump.add("okM", "Components rated 175 psi (NFPA 13)", "check_m",
         "=IF({pmax}>175,\"RELIEF VALVE NEEDED\",\"OK\")")
pump.add("Ph", "Hydraulic power at the rated point", "P_h", "={Qr}*{pr}/1714", "hp")
pump.add("PhkW", "Hydraulic power at the rated point, kW", "P_hkW", "={Ph}*0.7457", "kW")
pump.add("PekW", "Engine rating, kW", "P_ekW", "={Pe}/0.7457", "kW",
         planted=("unit-scale", "hp to kW divided by 0.7457: wrong way round"))
pump.add("fuel", "Fuel allowance per engine horsepower (NFPA 20)", "f_fuel", 1, "gal/hp")
pump.add("fx", "Allowance for expansion and sump (NFPA 20)", "f_x", 10, "%")
pump.add("Vf", "Diesel tank capacity", "V_f", "={Pe}*{fuel}*(1+{fx}/100)", "gal")
pump.add("VfL", "Diesel tank capacity, L", "V_fL", "={Vf}*3.785", "L")
pump.add("patm", "Atmospheric pressure at site (standard atmosphere)", "p_atm", 101.325, "kPa")
pump.add("pv", "Vapour pressure of water at 20 °C", "p_v", 2.34, "kPa")
pump.add("rho", "Density of water at 20 °C", "ρ", 998, "kg/m³")
pump.add("g", "Gravity", "g", 9.81, "m/s²")
pump.add("hfs", "Suction friction loss at 150 % flow", "h_fs", 0.6, "m")
pump.add("NPSHa", "NPSH available at the minimum level, 150 % flow", "NPSH_a",
         "=({patm}-{pv})*1000/({rho}*{g})+{hs}-{hfs}", "m")
pump.add("psg", "Suction gauge reading on the acceptance test, 150 % flow", "p_sg", 0.08,
         "bar(g)")
pump.add("NPSHt", "NPSH available from the test gauge (velocity head neglected)", "NPSH_t",
         "=({psg}*100+{patm}-{pv})*1000/({rho}*{g})", "m")
pump.add("NPSHt2", "NPSH available from the test gauge (commissioning sheet, velocity head "
         "neglected)", "NPSH_t2",
         "=({psg}*100-{pv})*1000/({rho}*{g})", "m",
         planted=("offset-scale", "a gauge reading less an absolute vapour pressure"))
PUMP = pump.finish()

HAZARD = table_sheet("Hose stream allowance and duration by hazard",
                     "Source: NFPA 13 (2022) Table 19.2.3.1.2, upper durations, from memory: "
                     "check against the standard.",
                     ["Hazard", "Hose allowance [gpm]", "Duration [min]"],
                     [("LH", 100, 30), ("OH1", 250, 60), ("OH2", 250, 90), ("EH1", 500, 90),
                      ("EH2", 500, 120)])
PUMPS = table_sheet("Diesel fire pump range (invented catalogue data)",
                    "Listed ratings at the rated point; churn from the maker's curves "
                    "(invented).",
                    ["Model", "Rated flow [gpm]", "Rated pressure [psi]",
                     "Churn pressure [psi]", "Engine rating [hp]"],
                    [("FP-500", 500, 100, 125, 95), ("FP-750", 750, 95, 122, 135),
                     ("FP-1000", 1000, 100, 128, 180), ("FP-1250", 1250, 105, 135, 230)])

FIREWATER = {
    "trade": "fire protection: fire water demand, storage tank and diesel fire pump",
    "sheets": [("Demand", DEMAND), ("Pump", PUMP), ("Hazard", HAZARD), ("Pumps", PUMPS)],
    "planted": {**dem.planted, **pump.planted},
}

# --------------------------------------------------------------------------------------------
# Book 3: truck fleet fuel and CO2 (km, mi, L, US gal, L/100 km, mpg, kg CO2/L, t CO2/yr)
# --------------------------------------------------------------------------------------------
FL_SRC = ("Sources: UK government GHG conversion factors for company reporting 2023 (DESNZ): "
          "diesel, 100 % mineral, 2.66 kg CO2 per litre (from memory: check the year's table); "
          "CO2 of the biodiesel share reported outside the scopes (GHG Protocol Corporate "
          "Standard, common practice); EN 590 diesel density 820–845 kg/m³ and a carbon mass "
          "fraction of 0.862 (from memory); molar masses C 12.011 and CO2 44.009 g/mol (IUPAC "
          "standard atomic weights, from memory); NIST SP 811 (2008) App. B.8: 1 mi = "
          "1.609344 km, 1 US gal = 3.785412 L; US mpg = 235.2/(L/100 km) follows from those two "
          "(common practice). mpg here are US miles per US gallon, for the group's US report. "
          "Fuel-use targets by vehicle class: company policy (invented).")
FLEET = table_sheet(
    "Marsh Lane Haulage: annual fuel and CO2 return by truck (Invented scenario)", FL_SRC,
    ["Truck", "Class", "Distance [km/yr]", "Fuel used [L/yr]", "Fuel use [L/100 km]",
     "Fuel economy [mpg]", "CO2 [t/yr]", "Target [L/100 km]", "Excess fuel [L/yr]"],
    [("T01", "Artic 44t", 142000, 48900), ("T02", "Artic 44t", 128500, 42100),
     ("T03", "Rigid 26t", 96000, 31900), ("T04", "Rigid 18t", 88200, 24800),
     ("T05", "Rigid 18t", 74600, 22300), ("T06", "Rigid 7.5t", 61000, 11800)])
summ = ItemSheet("Summary", "Marsh Lane Haulage: fleet fuel and CO2 summary, 2023 "
                 "(Invented scenario)", FL_SRC)
summ.add("rhoD", "Diesel density at 15 °C (EN 590: 820 to 845 kg/m³)", "ρ_D", 0.835, "kg/L")
summ.add("wC", "Carbon mass fraction of diesel", "w_C", 0.862, "kg/kg")
summ.add("EF0", "CO2 per litre burned, from the fuel's carbon", "EF_0",
         "={rhoD}*{wC}*44.009/12.011", "kg CO2/L")
summ.add("EFd", "CO2 per litre, 100 % mineral diesel (DESNZ 2023)", "EF_D", 2.66, "kg CO2/L")
summ.add("bio", "Biodiesel (FAME) share of pump diesel, by volume", "x_bio", 7, "%")
summ.add("EF", "CO2 per litre reported (fossil share)", "EF", "={EFd}*(1-{bio}/100)",
         "kg CO2/L")
summ.add("EF2", "CO2 per litre reported (rev. 2)", "EF_2", "={EFd}*(1-{bio})", "kg CO2/L",
         planted=("unit-scale", "7 % used as 7 in (1 − x): a negative factor"))
summ.add("EFg", "CO2 per US gallon, for the group report", "EF_gal", "={EF}*3.785",
         "kg CO2/gal")
summ.add("Fl", "Fleet fuel used", "F", "=Fleet!D11", "L/yr")
summ.add("Fg", "Fleet fuel used, US gal", "F_gal", "={Fl}/3.785", "gal/yr")
summ.add("Fg2", "Fleet fuel used, US gal (group template)", "F_gal2", "={Fl}*3.785", "gal/yr",
         planted=("unit-scale", "L to US gal multiplied by 3.785: wrong way round"))
summ.add("Dk", "Fleet distance", "D", "=Fleet!C11", "km/yr")
summ.add("Dmi", "Fleet distance, miles", "D_mi", "={Dk}/1.609", "mi/yr")
summ.add("mpgF", "Fleet fuel economy", "FE", "={Dmi}/{Fg}", "mpg")
summ.add("Ct", "Trucks' CO2", "C_t", "=Fleet!G11", "t CO2/yr")
summ.add("Cfl", "Forklifts and yard shunter (site energy report)", "C_fl", 18400, "kg CO2/yr")
summ.add("Crf", "Trailer refrigeration units", "C_rf", 41.5, "t CO2/yr")
summ.add("Ctot", "Total transport CO2", "C_tot", "=SUM({Ct}:{Crf})", "t CO2/yr",
         planted=("mixed-range", "SUM over t CO2/yr cells and the forklifts' kg CO2/yr"))
summ.add("Ctot2", "Total transport CO2 (checked)", "C_tot2", "={Ct}+{Cfl}/1000+{Crf}",
         "t CO2/yr")
summ.add("CI", "Trucks' CO2 per kilometre", "CI", "={Ct}*1000/{Dk}", "kg CO2/km")
summ.add("CI2", "Trucks' CO2 per kilometre (tender form)", "CI_2", "={Ct}*1000/{Dk}",
         "g CO2/km", planted=("unit-scale", "the kg/km formula under a g/km unit: 1000 too "
                              "small"))
summ.add("tgt", "Reduction target on last year (board)", "r", 8, "%")
summ.add("Cly", "Trucks' CO2 last year", "C_ly", 505, "t CO2/yr")
summ.add("Cgoal", "Trucks' CO2 goal this year", "C_goal", "={Cly}*(1-{tgt}/100)", "t CO2/yr")
summ.add("ok", "Goal met?", "check", "=IF({Ct}<={Cgoal},\"MET\",\"NOT MET\")")
summ.add("Ex", "Fuel used over the class targets", "F_ex", "=Fleet!I11", "L/yr")
summ.add("Exc", "CO2 from the fuel over target", "C_ex", "={Ex}*{EF}/1000", "t CO2/yr")
SUMMARY = summ.finish()
EF_ref = summ.ref("EF")
for r in range(5, 11):
    FLEET[f"E{r}"] = f"=D{r}/C{r}*100"
    FLEET[f"F{r}"] = f"=235.2/E{r}"
    FLEET[f"G{r}"] = f"=D{r}*{EF_ref}/1000"
    FLEET[f"H{r}"] = f"=VLOOKUP(B{r},Classes!$A$5:$C$8,2,FALSE)"
    FLEET[f"I{r}"] = f"=IF(E{r}>H{r},(E{r}-H{r})*C{r}/100,0)"
FLEET["A11"] = "Fleet"
FLEET["C11"] = "=SUM(C5:C10)"
FLEET["D11"] = "=SUM(D5:D10)"
FLEET["E11"] = "=D11/C11*100"
FLEET["F11"] = "=235.2/E11"
FLEET["A12"] = "Mean of trucks (unweighted)"
FLEET["E12"] = "=AVERAGE(E5:E10)"
FLEET["G11"] = "=SUM(G5:G10)"
FLEET["I11"] = "=SUM(I5:I10)"
FLEET["E7"] = "=D7/C7"                    # planted: the ×100 of L/100 km left out
FLEET["F8"] = "=282.5/E8"                 # planted: imperial mpg factor in a US mpg column
FLEET["G9"] = f"=D9*{EF_ref}"             # planted: kg CO2 typed as t CO2
CLASSES = table_sheet("Fuel-use targets by vehicle class (company policy, invented)",
                      "Targets set by the transport manager for 2023 (invented).",
                      ["Class", "Target [L/100 km]", "Typical payload [t]"],
                      [("Rigid 7.5t", 20, 3.5), ("Rigid 18t", 28, 8),
                       ("Rigid 26t", 32, 13), ("Artic 44t", 34, 22)])
FLEETBOOK = {
    "trade": "road transport: fleet fuel use and CO2 return",
    "sheets": [("Summary", SUMMARY), ("Fleet", FLEET), ("Classes", CLASSES)],
    "planted": {**summ.planted,
                "Fleet!E7": ("unit-scale", "fuel ÷ distance is L/km; the ×100 for L/100 km "
                             "left out: 100 too small"),
                "Fleet!F8": ("unit-scale", "282.5, the factor for imperial mpg, in a column of "
                             "US mpg: 1.2 too large"),
                "Fleet!G9": ("unit-scale", "L × kg CO2/L gives kg, typed as t: the /1000 "
                             "missing")},
}

# --------------------------------------------------------------------------------------------
# Book 4: compressed-air leak survey (L/s, scfm, m³/min, h/yr, kWh/yr, $/yr, bar(g), °C)
# --------------------------------------------------------------------------------------------
CA_SRC = ("Sources: NIST SP 811 (2008) App. B.8 (1 L/s = 2.119 ft³/min); specific power in "
          "kW per m³/min of free air delivered, from the compressor's CAGI data sheet at 7 "
          "bar(g) (invented value); ISO 1217:2009 reference inlet conditions 20 °C, 1 bar abs "
          "(from memory); pressure-decay leak test, leakage = V·(p1 − p2)/(t·p_atm) × 1.25 "
          "(US DOE, Improving Compressed Air System Performance: A Sourcebook for Industry, "
          "3rd ed. 2016, from memory) with 1.013 bar standard atmosphere (ISO 2533:1975); leak "
          "flow through a choked orifice in proportion to the absolute upstream pressure "
          "(common practice); leak flows estimated by the ultrasonic detector's software "
          "(invented readings).")
LEAKS = table_sheet(
    "Coldharbour Pressings: compressed-air leak survey, week 12 (Invented scenario)", CA_SRC,
    ["Tag", "Area", "Leak flow [L/s]", "Leak flow [scfm]", "Hours pressurised [h/yr]",
     "Air lost [m³/yr]", "Energy [kWh/yr]", "Cost [$/yr]"],
    [("L01", "Press shop", 4.2), ("L02", "Press shop", 9.5), ("L03", "Assembly", 2.8),
     ("L04", "Assembly", 6.1), ("L05", "Paint line", 3.4), ("L06", "Stores", 1.9)])
air = ItemSheet("Summary", "Coldharbour Pressings: leak survey summary and tests "
                "(Invented scenario)", CA_SRC)
air.add("Pspec", "Compressor package specific power (CAGI data sheet, 7 bar(g))", "SP", 6.6,
        "kW/(m³/min)")
air.add("SEC", "Energy per m³ of free air delivered", "e", "={Pspec}/60", "kWh/m³")
air.add("tariff", "Electricity price (site contract)", "c_e", 0.14, "$/kWh")
air.add("Ql", "Total leak flow found", "Q_l", "=Leaks!C11", "L/s")
air.add("Qo", "Open blowing on press 4 (nozzle catalogue)", "Q_o", 35, "scfm")
air.add("Qdr", "Timer condensate drains (measured)", "Q_dr", 3.5, "L/s")
air.add("Qun", "Unproductive air demand", "Q_un", "=SUM({Ql}:{Qdr})", "L/s",
        planted=("mixed-range", "SUM over L/s cells and the blowing flow in scfm"))
air.add("Qun2", "Unproductive air demand (checked)", "Q_un2", "={Ql}+{Qo}/2.119+{Qdr}", "L/s")
air.add("Qlm", "Total leak flow, m³/min", "Q_lm", "={Ql}*60/1000", "m³/min")
air.add("Qlh", "Total leak flow, m³/h", "Q_lh", "={Ql}*60/1000", "m³/h",
        planted=("unit-scale", "the m³/min formula under an m³/h unit: 60 too small"))
air.add("Pl", "Compressor power spent on leaks", "P_l", "={Qlm}*{Pspec}", "kW")
air.add("Qc", "Average compressor delivery (free air at inlet, from logged power)", "Q_c", 260,
        "L/s")
air.add("Tin", "Compressor inlet temperature during logging", "T_in", 35, "°C")
air.add("Tref", "Reference inlet temperature (ISO 1217)", "T_ref", 20, "°C")
air.add("Qcr", "Average delivery at reference temperature", "Q_cr",
        "={Qc}*({Tref}+273.15)/({Tin}+273.15)", "L/s")
air.add("Qcr2", "Average delivery at reference temperature (energy report)", "Q_cr2",
        "={Qc}*({Tref}+273.15)/{Tin}", "L/s",
        planted=("offset-scale", "inlet temperature in °C where the gas law wants K"))
air.add("share", "Leakage share of average delivery", "s_l", "={Ql}/{Qcr}*100", "%")
air.add("tl", "Load time, no-production test (mean of 5 cycles)", "t_load", 42, "s")
air.add("tu", "Unload time, no-production test (mean of 5 cycles)", "t_unload", 71, "s")
air.add("shT", "Leakage share from the load/unload test", "s_T", "={tl}/({tl}+{tu})*100", "%")
air.add("Vs", "System volume, receivers and mains", "V_s", 12, "m³")
air.add("p1", "Pressure-decay test, start pressure", "p_1", 7.0, "bar(g)")
air.add("p2", "Pressure-decay test, end pressure", "p_2", 6.0, "bar(g)")
air.add("td", "Pressure-decay test, time to fall", "t_d", 190, "s")
air.add("Qdec", "Leakage from the pressure-decay test", "Q_dec",
        "={Vs}*({p1}-{p2})/({td}*1.013)*1.25*1000", "L/s")
air.add("pnew", "Proposed system pressure", "p_new", 6.2, "bar(g)")
air.add("Qln", "Leak flow at the proposed pressure", "Q_ln",
        "={Ql}*({pnew}+1.013)/({p1}+1.013)", "L/s")
air.add("Qln2", "Leak flow at the proposed pressure (energy team)", "Q_ln2",
        "={Ql}*{pnew}/{p1}", "L/s",
        planted=("offset-scale", "a ratio of gauge pressures where the flow follows absolute "
                 "pressure"))
air.add("El", "Energy spent on leaks", "E_l", "=Leaks!G11", "kWh/yr")
air.add("Cl", "Cost of leaks", "C_l", "=Leaks!H11", "$/yr")
air.add("rep", "Leaks repaired in the programme (share of flow)", "f_rep", 80, "%")
air.add("Es", "Energy saved by the programme", "E_s", "={El}*{rep}/100", "kWh/yr")
air.add("Es2", "Energy saved by the programme (board paper)", "E_s2", "={El}*{rep}", "kWh/yr",
        planted=("unit-scale", "80 % used as 80: 100 too large"))
air.add("Cs", "Cost saved by the programme", "C_s", "={Es}*{tariff}", "$/yr")
air.add("okS", "Programme worth doing (over $5000/yr)", "check",
        "=IF({Cs}>5000,\"YES\",\"NO\")")
AIRSUM = air.finish()
SEC_ref, tar_ref, Ps_ref = air.ref("SEC"), air.ref("tariff"), air.ref("Pspec")
for r in range(5, 11):
    LEAKS[f"D{r}"] = f"=C{r}*2.119"
    LEAKS[f"E{r}"] = f"=VLOOKUP(B{r},Areas!$A$5:$B$8,2,FALSE)"
    LEAKS[f"F{r}"] = f"=C{r}*E{r}*3.6"
    LEAKS[f"G{r}"] = f"=F{r}*{SEC_ref}"
    LEAKS[f"H{r}"] = f"=G{r}*{tar_ref}"
LEAKS["A11"] = "Total"
for c in "CDFGH":
    LEAKS[f"{c}11"] = f"=SUM({c}5:{c}10)"
LEAKS["D6"] = "=C6/2.119"                 # planted: L/s to scfm the wrong way round
LEAKS["F7"] = "=C7*E7*3600"               # planted: L, not m³ (the /1000 missing)
LEAKS["G8"] = f"=F8*{Ps_ref}"             # planted: kW per m³/min used as kWh per m³
AREAS = table_sheet("Hours the mains are pressurised, by area (site shift pattern, invented)",
                    "Shift patterns from the site's production plan (invented).",
                    ["Area", "Hours pressurised [h/yr]"],
                    [("Press shop", 6240), ("Assembly", 4160), ("Paint line", 4992),
                     ("Stores", 2080)])
AIRBOOK = {
    "trade": "compressed air: leak survey, leak tests and savings",
    "sheets": [("Summary", AIRSUM), ("Leaks", LEAKS), ("Areas", AREAS)],
    "planted": {**air.planted,
                "Leaks!D6": ("unit-scale", "L/s to scfm divided by 2.119: wrong way round"),
                "Leaks!F7": ("unit-scale", "L/s × h × 3600 gives L, typed as m³: 1000 too "
                             "large"),
                "Leaks!G8": ("unit-scale", "kW per m³/min used as kWh per m³: the /60 "
                             "missing, 60 too large")},
}

BOOKS = {"dh-network": DHEAT, "fire-water": FIREWATER, "fleet-fuel": FLEETBOOK,
         "air-leaks": AIRBOOK}

# --------------------------------------------------------------------------------------------
# Sidecars: what the firm writes so that plumb reads the units its table lacks. The workbooks
# keep the unit texts engineers type; these lines only say what those texts mean.
# --------------------------------------------------------------------------------------------
SIDE_HEAD = ("# Sidecar for {stem}.xlsx (review64). Invented scenario; demonstration only.\n"
             "# A dimensionally consistent formula can still be wrong, and this check does "
             "not replace\n# independent review under local codes and licensed practice.\n")
YEAR = 'measure yr = 365 d "a year of 365 days, 8760 h (common practice in energy and fleet returns)"\n'
def rows(sheet, *keys):
    return [f"{sheet.name}!{sheet.cell(k)}" for k in keys]


def cells_lines(refs, unit, text):
    return "".join(f'cells {r} : {unit} "{text}"\n' for r in refs)


SIDECARS = {
    "dh-network": None,
    "fire-water": (
        "# 'US gal' is how the insurer's form writes the US gallon (NIST SP 811 (2008) B.8)\n"
        + cells_lines(rows(dem, "Vr", "Vg", "Vg2"), "gal", "US gal")),
    "fleet-fuel": (
        YEAR
        + 'measure mpg = 1 mi/gal "US miles per US gallon (NIST SP 811 (2008) B.8)"\n'
        + 'measure km100 = 100 km "the 100 km of L/100 km"\n'
        + "# unit texts with CO2 in them, and L/100 km, which plumb does not read as written\n"
        + cells_lines(["Fleet!E5:E12", "Fleet!H5:H10", "Classes!B5:B8"], "L/km100", "L/100 km")
        + cells_lines(rows(summ, "EF0", "EFd", "EF", "EF2"), "kg/L", "kg CO2/L")
        + cells_lines(rows(summ, "EFg"), "kg/gal", "kg CO2/gal")
        + cells_lines(rows(summ, "Ct", "Crf", "Ctot", "Ctot2", "Cly", "Cgoal", "Exc"), "t/yr",
                      "t CO2/yr")
        + cells_lines(rows(summ, "Cfl"), "kg/yr", "kg CO2/yr")
        + cells_lines(rows(summ, "CI"), "kg/km", "kg CO2/km")
        + cells_lines(rows(summ, "CI2"), "g/km", "g CO2/km")),
    "air-leaks": (
        YEAR
        + 'measure USD = 1 1 "US dollar, counted as a pure number: plumb has no money '
          'dimension"\n'
        + "# '$' does not read as a unit name\n"
        + cells_lines(rows(air, "tariff"), "USD/kWh", "$/kWh")
        + cells_lines(rows(air, "Cl", "Cs") + ["Leaks!H5:H11"], "USD/yr", "$/yr")),
}

# Findings beyond the planted mistakes, filled in after running the frozen plumb:
# cell -> list of (rule, comment). A correct cell plumb flags gets a comment starting
# "a correct cell plumb still flags: why".
NOTE = "a note on a trade's number, read as such"
DN_KEY = ("an input plumb flags (not a formula cell): the nominal size DN is a designation "
          "(ISO 6708) used only as VLOOKUP's key; it needs no unit, and the diameter looked up "
          "has one")
EXTRA = {
    "dh-network": [
        # Network!C39, p_top = p_set - ρ·g·h, was flagged until a row labelled a water column
        # read as the difference it is.
    ] + [(f"Pipes!C{r}", "no-unit", DN_KEY) for r in range(5, 10)]
        + [(f"DN!A{r}", "no-unit", DN_KEY) for r in range(5, 12)],
    "fire-water": [
        ("Demand!C27", "trade-constant", NOTE + " (8.34 lb per US gal of water)"),
        ("Demand!C29", "gravity-number", NOTE + " (9.81 as g)"),
        ("Pump!C13", "gravity-number", NOTE + " (0.0981 bar per metre of water)"),
        ("Pump!C24", "gravity-number", NOTE + " (0.0981 bar per metre of water)"),
    ],
    "fleet-fuel": [],
    "air-leaks": [
        ("Summary!C29", "trade-constant",
         NOTE + " (1.013 bar, the standard atmosphere, in the pressure-decay test)"),
    ],
}
# What the sidecar changes, for each book's .expect header (the findings listed are with it).
NO_SIDECAR = {
    "fire-water": ("without the sidecar, 'US gal' beside the formula cells C15, C24 and C25 gets "
                   "no finding at all, so Demand!C25 is missed silently, and Demand!C27 "
                   "(=C24*8.34 into lb) becomes a false result-unit error"),
    "fleet-fuel": ("without the sidecar, 27 correct formula cells get no-unit warnings (yr, "
                   "mpg), and the cells under 'L/100 km', 't CO2/yr', 'kg CO2/km' and 'g CO2/km' "
                   "get no finding at all: Fleet!E7, Summary!C22 and Summary!C25 are missed "
                   "silently"),
    "air-leaks": ("without the sidecar, 20 correct formula cells get no-unit warnings (yr); "
                  "the cells under '$/yr' get no finding at all; every planted cell is still "
                  "reported"),
}
# Planted cells plumb misses: cell -> why (written as '# a slip plumb still misses: ...').
MISSED = {
    "Demand!C17": ("=C12*C9*60/1000: L/min × min is already L, so the ×60 makes the m³ 60 "
                   "times too large; once the /1000 reconciles L with m³, plumb takes the 60 "
                   "as a plain coefficient of the formula and says nothing (probes: ×36/1000 "
                   "and ×30/1000 pass too, and =L/min×min×60 into L passes) (expected "
                   "unit-scale)"),
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
        side = SIDECARS.get(stem)
        side_path = os.path.join(HERE, stem + ".cells.plumb")
        if side:
            with open(side_path, "w", encoding="utf-8") as f:
                f.write(SIDE_HEAD.format(stem=stem) + side)
        elif os.path.exists(side_path):
            os.remove(side_path)
        formulas = formula_cells(book)
        for cell in book["planted"]:
            assert cell in formulas, f"{stem}: {cell} is not a formula cell"
        correct = [c for c in formulas if c not in book["planted"]]
        with open(os.path.join(HERE, stem + ".expect"), "w", encoding="utf-8") as f:
            f.write("# sheet!cell rule: the planted mistakes plumb must report; every other\n"
                    "# formula cell must stay clean (written by make_books.py, review64).\n"
                    "# Invented scenario. A dimensionally consistent formula can still be "
                    "wrong; this check\n# does not replace independent review under local "
                    "codes and licensed practice.\n")
            if SIDECARS.get(stem):
                f.write(f"# Units plumb's table lacks come from the sidecar {stem}.cells.plumb; "
                        f"{NO_SIDECAR[stem]}.\n")
            for cell, (rule, what) in book["planted"].items():
                if cell in MISSED:
                    f.write(f"# planted: {what}\n# a slip plumb still misses: {cell} "
                            f"{MISSED[cell]}\n")
                else:
                    f.write(f"# planted: {what}\n{cell} {rule}\n")
            extra = EXTRA.get(stem) or []
            if extra:
                f.write("\n# found beyond the planted mistakes (kept so that any change "
                        "shows):\n")
                for cell, rule, comment in extra:
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
