#!/usr/bin/env python3
"""Four independent review workbooks for plumb's workbook checking (review48), written with the
standard library only: the shared writer in corpus/sheets (xlsx_writer.py and
item_sheet.py) is imported from there via sys.path, not copied; pattern after
corpus/sheets/review47/make_books.py.

Trades: a hotel's domestic hot water plant; a farm's rough-rice column dryer; a ship's fuel oil
day tank and centrifugal separator; a ski area's snowmaking pumps and compressed air. All
scenarios, sites, firms, readings and catalogue data are invented (demonstration only); the
formulas and published factors are the trade's own, with their sources named in a text cell at
the top of each sheet ("from memory" where recalled and not checked, "common practice" for a
fact of the trade with no single source).

A dimensionally consistent formula can still be wrong; this check does not replace independent
review under local codes and licensed practice.

Every formula cell is either a planted mistake (planted=(rule, what)) or a correct cell that
must stay clean. What plumb reported beyond the planted ones, the planted cells it misses, and
its messages that mislead, are recorded in review_notes.py after running the frozen binary.

Run: python3 make_books.py  ->  *.xlsx, *.expect (and the dryer's sidecar) in this folder
"""
import os
import sys

sys.dont_write_bytecode = True   # write nothing beside the shared modules
HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, HERE)
sys.path.insert(0, os.path.dirname(HERE))
from item_sheet import ItemSheet, write_books_with_notes  # noqa: E402 (shared, not copied)

CAUTION = ("Invented scenario, data for demonstration only. A dimensionally consistent formula can "
           "still be wrong; this check does not replace independent review under local codes and "
           "licensed practice.")
ItemSheet.caution = CAUTION

# --------------------------------------------------------------------------------------------
# Book 1: hotel domestic hot water (US gal, L, gal/h, L/h, gpm, L/s, Btu/h, kW, W, %, °C, °F,
# Δ°F, Δ°C, K, psig, psia, kg/m³, ft, m, kWh, therm)
# --------------------------------------------------------------------------------------------
DHW_SRC = (
    "Sources: peak-hour demand with storage and recovery after ASHRAE Handbook — HVAC "
    "Applications (2019) ch. 51 Service Water Heating (from memory); heat to water Q = "
    "500·gpm·ΔT(°F) Btu/h (8.33 lb/US gal × 60 min/h × 1 Btu/(lb·°F), common practice) and "
    "recovery gal/h = Q/(8.33·ΔT) (common practice); mixing fraction (t_mix − t_cold)/(t_hot − "
    "t_cold) (common practice); storage held at 60 °C against Legionella, HSE ACOP L8 / HSG274 "
    "Part 2 (from memory); usable share of a tank about 70–75 % (ASHRAE, from memory); expansion "
    "tank V_e = V_s·(ρ_c/ρ_h − 1)/(1 − p_1/p_2) with absolute pressures, ASHRAE Handbook — HVAC "
    "Systems and Equipment (2020) ch. 13 (from memory); water 999.7 kg/m³ at 10 °C and 983.2 "
    "kg/m³ at 60 °C, c_p 4.19 kJ/(kg·K) (steam tables, from memory); loss of insulated 1 in copper "
    "about 20 Btu/(h·ft) (ASPE Data Book vol. 2, from memory); pump hp = gpm·ft/3960 (Hydraulic "
    "Institute, from memory); NIST SP 811 (2008) App. B.8: 1 US gal = 3.785 L, 1 kW = 3412 "
    "Btu/h, 1 m = 3.281 ft, 1 gpm = 0.06309 L/s, 1 therm = 29.31 kWh; °F = 1.8·°C + 32. Hotel, "
    "plant and readings invented.")
hw = ItemSheet("DHW", "Marlow Quay Hotel (invented): domestic hot water storage, recovery, "
               "expansion and recirculation", DHW_SRC)
hw.heading("Peak demand")
hw.add("N", "Guest rooms", "N", 220, "-")
hw.add("qr", "Peak-hour demand per room at 49 °C delivery (design allowance)", "q_r", 4.5,
       "US gal/h")
hw.add("Qph", "Peak-hour demand at the fixtures", "Q_ph", "={N}*{qr}", "US gal/h")
hw.add("QphL", "Peak-hour demand, L/h", "Q_ph,SI", "={Qph}*3.785", "L/h")
hw.add("QphL2", "Peak-hour demand, L/h (design brief table)", "Q_ph,SI2", "={Qph}/3.785", "L/h",
       planted=("unit-scale", "US gal to L divided by 3.785: wrong way round"))
hw.heading("Temperatures")
hw.add("tcw", "Cold water, winter main", "t_cw", 10, "°C")
hw.add("ts", "Storage set point", "t_s", 60, "°C")
hw.add("td", "Delivery temperature after the thermostatic mixing valve", "t_d", 49, "°C")
hw.add("tcwF", "Cold water, °F", "t_cw,F", "={tcw}*1.8+32", "°F")
hw.add("tsF", "Storage set point, °F", "t_s,F", "={ts}*1.8+32", "°F")
hw.add("dTF", "Temperature rise through the heaters, °F", "ΔT_F", "={tsF}-{tcwF}", "Δ°F")
hw.add("dTC", "Temperature rise through the heaters, °C", "ΔT_C", "={ts}-{tcw}", "Δ°C")
hw.add("fh", "Share of hot water in the mixed delivery", "f_h", "=({td}-{tcw})/({ts}-{tcw})", "-")
hw.add("fh2", "Share of hot water in the mixed delivery (first draft)", "f_h2", "={td}/{ts}", "-",
       planted=("offset-scale", "°C readings in a ratio: the cold-water rise belongs"))
hw.add("Qhot", "Hot water drawn from storage at peak", "Q_hot", "={Qph}*{fh}", "US gal/h")
hw.heading("Water heaters (gas, condensing)")
hw.add("nh", "Heaters", "n_h", 2, "-")
hw.add("Qin", "Gas input, each heater (nameplate)", "Q_in", 199900, "Btu/h")
hw.add("QinkW", "Gas input, each heater, kW", "Q_in,kW", "={Qin}/3412", "kW")
hw.add("QinkW2", "Gas input, each heater, kW (gas utility form)", "Q_in,kW2", "={Qin}/3.412", "kW",
       planted=("unit-scale", "Btu/h over 3.412 gives W, written as kW: 1000 too large"))
hw.add("eta", "Thermal efficiency (nameplate)", "eta", 96, "%")
hw.add("Qout", "Heat output, both heaters", "Q_out", "={nh}*{Qin}*{eta}/100", "Btu/h")
hw.add("Qout2", "Heat output, both heaters (submittal review)", "Q_out2", "={nh}*{Qin}*{eta}",
       "Btu/h", planted=("unit-scale", "efficiency in % used as a fraction: 100 too large"))
hw.add("QoutkW", "Heat output, both heaters, kW", "Q_out,kW", "={Qout}/3412", "kW")
hw.add("Rgpm", "Recovery at the full rise", "R", "={Qout}/(500*{dTF})", "gpm")
hw.add("Rgph", "Recovery at the full rise, gal/h", "R_h", "={Rgpm}*60", "US gal/h")
hw.add("Rgph2", "Recovery at the full rise, gal/h (schedule)", "R_h2", "={Qout}/(500*{dTF})",
       "US gal/h", planted=("unit-scale", "500 rule gives gpm, written as gal/h: 60 too small"))
hw.add("Rchk", "Recovery, gal/h (8.33 rule, check)", "R_chk", "={Qout}/(8.33*{dTF})", "US gal/h")
hw.add("RLh", "Recovery, L/h", "R_SI", "={Rgph}*3.785", "L/h")
hw.add("rhoc", "Density of the cold water (10 °C)", "rho_c", 999.7, "kg/m³")
hw.add("cp", "Specific heat of water", "c_p", 4.19, "kJ/(kg·K)")
hw.add("RLhc", "Recovery, L/h (SI check)", "R_SI,chk", "={QoutkW}/({rhoc}*{cp}*{dTC})*1000*3600",
       "L/h")
hw.heading("Storage")
hw.add("tpk", "Peak period", "t_pk", 2, "h")
hw.add("Vu", "Usable storage to cover the peak", "V_u", "=({Qhot}-{Rgph})*{tpk}", "US gal")
hw.add("fs", "Usable share of a tank", "f_s", 75, "%")
hw.add("Vt", "Storage required", "V_t", "={Vu}/({fs}/100)", "US gal")
hw.add("VtL", "Storage required, L", "V_t,L", "={Vt}*3.785", "L")
hw.add("Vtm3", "Storage required, m³", "V_t,SI", "={VtL}/1000", "m³")
hw.add("Vtm32", "Storage required, m³ (plant room layout)", "V_t,SI2", "={VtL}/1000/1000", "m³",
       planted=("unit-scale", "L to m³ divided by 1000 twice"))
hw.add("nt", "Storage tanks", "n_t", 2, "-")
hw.add("Vsel", "Selected tank, nominal (Tanks sheet)", "V_sel", "=Tanks!A8", "US gal")
hw.add("Vin", "Storage installed", "V_in", "={nt}*{Vsel}", "US gal")
hw.heading("Thermal expansion")
hw.add("rhoh", "Density of the stored water (60 °C)", "rho_h", 983.2, "kg/m³")
hw.add("pb", "Site barometric pressure (sea level)", "p_b", 14.7, "psia")
hw.add("p1", "Cold water pressure at the heaters (PRV outlet)", "p_1", 60, "psig")
hw.add("p2", "Maximum pressure, below the 150 psi T&P valve setting", "p_2", 125, "psig")
hw.add("p1a", "Cold water pressure, absolute", "p_1a", "={p1}+{pb}", "psia")
hw.add("p2a", "Maximum pressure, absolute", "p_2a", "={p2}+{pb}", "psia")
hw.add("Ve", "Expansion tank volume", "V_e", "={Vin}*({rhoc}/{rhoh}-1)/(1-{p1a}/{p2a})", "US gal")
hw.add("Ve2", "Expansion tank volume (supplier's selection form)", "V_e2",
       "={Vin}*({rhoc}/{rhoh}-1)/(1-{p1}/{p2})", "US gal",
       planted=("offset-scale", "gauge pressures in the ratio: absolute ones belong"))
hw.heading("Recirculation")
hw.add("Lr", "Recirculation loop length (drawings)", "L_r", 420, "m")
hw.add("Lrft", "Recirculation loop length, ft", "L_r,ft", "={Lr}*3.281", "ft")
hw.add("ql", "Heat loss per foot, insulated 1 in copper", "q_l", 20, "Btu/h·ft")
hw.add("Qrl", "Loop heat loss", "Q_rl", "={Lrft}*{ql}", "Btu/h")
hw.add("QrlkW", "Loop heat loss, kW", "Q_rl,kW", "={Qrl}/3412", "kW")
hw.add("QrlW", "Loop heat loss, W (BMS energy point)", "Q_rl,W", "={Qrl}/3412", "W",
       planted=("unit-scale", "Btu/h to kW factor under a W cell: 1000 too small"))
hw.add("dTr", "Allowed temperature drop round the loop", "ΔT_r", 10, "Δ°F")
hw.add("Qrc", "Recirculation flow", "Q_rc", "={Qrl}/(500*{dTr})", "gpm")
hw.add("QrcLs", "Recirculation flow, L/s", "Q_rc,SI", "={Qrc}*0.06309", "L/s")
hw.add("QrcLs2", "Recirculation flow, L/s (pump schedule)", "Q_rc,SI2", "={Qrc}*3.785", "L/s",
       planted=("unit-scale", "gpm times 3.785 gives L/min, written as L/s: 60 too large"))
hw.add("Hr", "Recirculation pump head", "H_r", 25, "ft")
hw.add("Ph", "Recirculation pump hydraulic power", "P_h", "={Qrc}*{Hr}/3960", "hp")
hw.add("hy", "Hours in service a year", "t_y", 8760, "h")
hw.add("Erl", "Loop heat loss over a year", "E_rl", "={QrlkW}*{hy}", "kWh")
hw.add("Grl", "Gas to make up the loop loss over a year", "G_rl", "={Erl}/({eta}/100)", "kWh")
hw.add("Gth", "Gas to make up the loop loss over a year, therms", "G_rl,th", "={Grl}/29.31",
       "therm")
hw.add("Qsb", "Standby loss of the tanks (Tanks sheet)", "Q_sb", "={nt}*Tanks!C8", "Btu/h")
DHWS = hw.finish()

TANKS = {
    "A1": "Storage tank catalogue (invented maker's data)",
    "A2": "Sources: maker's data sheet (invented); nominal US gal with the litres printed beside.",
    "A3": CAUTION,
    "A4": "Nominal [US gal]", "B4": "Capacity [L]", "C4": "Standby loss [Btu/h]",
}
for r, (g, lit, loss) in enumerate([(119, 450, 1100), (175, 662, 1350), (250, 946, 1600),
                                    (400, 1514, 2100), (500, 1893, 2400)], start=5):
    TANKS[f"A{r}"], TANKS[f"B{r}"], TANKS[f"C{r}"] = g, lit, loss

DHWB = {
    "trade": "building services: hotel domestic hot water storage, recovery and recirculation",
    "sheets": [("DHW", DHWS), ("Tanks", TANKS)],
    "planted": hw.planted,
}

# --------------------------------------------------------------------------------------------
# Book 2: farm rough-rice column dryer (t, bu, %, kg, lb, Btu, Btu/h, kW, MJ, US gal, L, kg/L,
# cfm, cfm/bu, m³/h, m³/s, °F, °C, Δ°F, Δ°C, in. w.g., Pa, hp, $)
# --------------------------------------------------------------------------------------------
DRY_SRC = (
    "Sources: water removed on a wet basis W_w = W_wet·(M_i − M_f)/(100 − M_f) (ASABE D245 / "
    "common practice, from memory); rough rice bushel 45 lb (USDA, from memory) and one bushel "
    "1.2445 ft³, so 0.8036 bu/ft³ (NIST SP 811 (2008) App. B.8: bushel 3.523907E-02 m³); column "
    "dryers use about 2,000–2,500 Btu per lb of water removed (common practice; the figure here "
    "is the invented dryer's); propane HHV 91,500 Btu/US gal and 50.35 MJ/kg, liquid 0.508 kg/L "
    "at 15 °C (GPSA Engineering Data Book, from memory); air heating Q = 1.08·cfm·ΔT(°F) Btu/h "
    "(common practice); fan hp = cfm·SP(in. w.g.)/(6356·η) (common practice); aeration about "
    "0.1–0.25 cfm/bu (extension practice, from memory); NIST SP 811 (2008) App. B.8: 1 t = "
    "2204.6 lb, 1 kg = 2.205 lb, 1 Btu = 0.001055 MJ, 1 US gal = 3.785 L, 1 cfm = 1.699 m³/h, "
    "1 m³/s = 2119 cfm, 1 in. of water = 249.1 Pa, 1 hp = 0.7457 kW, 1 kW = 3412 Btu/h; °C = "
    "(°F − 32)/1.8. Farm, dryer and readings invented.")
dr = ItemSheet("Dryer", "Coldwater Bend Farm (invented): rough-rice column dryer, one harvest "
               "day, propane and fans", DRY_SRC)
dr.heading("Harvest and shrink")
dr.add("Ww", "Wet rough rice received (scale tickets)", "W_wet", 180, "t")
dr.add("buw", "Wet rough rice, bushels", "n_w", "={Ww}*2204.6/45", "bu")
dr.add("buw2", "Wet rough rice, bushels (settlement sheet)", "n_w2", "={Ww}*2.2046/45", "bu",
       planted=("unit-scale", "t taken as kg: the 1000 kg/t missing, 1000 too small"))
dr.add("Mi", "Moisture at harvest, wet basis", "M_i", 21, "%")
dr.add("Mf", "Moisture after drying, wet basis", "M_f", 12.5, "%")
dr.add("Wr", "Water removed", "W_r", "={Ww}*({Mi}-{Mf})/(100-{Mf})", "t")
dr.add("Wrkg", "Water removed, kg", "W_r,kg", "={Wr}*1000", "kg")
dr.add("Wrkg2", "Water removed, kg (dryer log)", "W_r,kg2", "={Wr}", "kg",
       planted=("unit-scale", "t written as kg: the *1000 missing"))
dr.add("Wrlb", "Water removed, lb", "W_r,lb", "={Wrkg}*2.205", "lb")
dr.add("Wd", "Dried rough rice", "W_d", "={Ww}-{Wr}", "t")
dr.add("sh", "Shrink", "s", "={Wr}/{Ww}*100", "%")
dr.add("sh2", "Shrink (buyer's statement)", "s_2", "={Wr}/{Ww}", "%",
       planted=("unit-scale", "a fraction written under %: 100 too small"))
dr.heading("Dryer rate and burner")
dr.add("td", "Hours of drying in the day", "t_d", 20, "h")
dr.add("mw", "Water removal rate", "m_w", "={Wrlb}/{td}", "lb/h")
dr.add("es", "Dryer heat per lb of water removed (invented dryer figure)", "e_s", 2200, "Btu/lb")
dr.add("Qb", "Burner heat", "Q_b", "={mw}*{es}", "Btu/h")
dr.add("QbkW", "Burner heat, kW", "Q_b,kW", "={Qb}/3412", "kW")
dr.add("E", "Heat over the day", "E", "={Qb}*{td}", "Btu")
dr.add("EMJ", "Heat over the day, MJ", "E_MJ", "={E}*0.001055", "MJ")
dr.add("EMJ2", "Heat over the day, MJ (energy return)", "E_MJ2", "={E}*1.055", "MJ",
       planted=("unit-scale", "Btu times 1.055 gives kJ, written as MJ: 1000 too large"))
dr.heading("Propane")
dr.add("HHVg", "Propane higher heating value per gallon", "HHV_v", 91500, "Btu/US gal")
dr.add("HHVm", "Propane higher heating value per kg", "HHV_m", 50.35, "MJ/kg")
dr.add("rhop", "Liquid propane density (15 °C)", "rho_p", 0.508, "kg/L")
dr.add("Vp", "Propane burned", "V_p", "={E}/{HHVg}", "US gal")
dr.add("VpL", "Propane burned, L", "V_p,L", "={Vp}*3.785", "L")
dr.add("mp", "Propane burned, kg", "m_p", "={VpL}*{rhop}", "kg")
dr.add("mp2", "Propane burned, kg (tank delivery check)", "m_p2", "={Vp}*{rhop}", "kg",
       planted=("unit-scale", "US gal times kg/L: the 3.785 L/gal missing"))
dr.add("mpc", "Propane burned, kg (from the MJ, check)", "m_p,chk", "={EMJ}/{HHVm}", "kg")
dr.add("price", "Propane price (invented contract)", "c_p", 1.85, "$/US gal")
dr.add("cost", "Propane cost for the day", "C", "={Vp}*{price}", "$")
dr.heading("Drying air and fan")
dr.add("cap", "Grain held in the columns", "n_c", 600, "bu")
dr.add("qa", "Drying airflow per bushel in the columns", "q_a", 100, "cfm/bu")
dr.add("Qa", "Drying airflow", "Q_a", "={cap}*{qa}", "cfm")
dr.add("Qam3h", "Drying airflow, m³/h", "Q_a,h", "={Qa}*1.699", "m³/h")
dr.add("Qam3h2", "Drying airflow, m³/h (fan maker's form)", "Q_a,h2", "={Qa}*0.4719", "m³/h",
       planted=("unit-scale", "cfm to L/s factor under an m³/h cell: 3.6 too small"))
dr.add("Qam3s", "Drying airflow, m³/s", "Q_a,s", "={Qa}/2119", "m³/s")
dr.add("taF", "Ambient air", "t_a", 55, "°F")
dr.add("dTF", "Air temperature rise through the burner", "ΔT_F", "={Qb}/(1.08*{Qa})", "Δ°F")
dr.add("tpF", "Plenum air temperature", "t_p", "={taF}+{dTF}", "°F")
dr.add("tpC", "Plenum air temperature, °C", "t_p,C", "=({tpF}-32)/1.8", "°C")
dr.add("tpC2", "Plenum air temperature, °C (rice quality log)", "t_p,C2", "=({tpF}-32)*1.8", "°C",
       planted=("unit-scale", "°F to °C multiplied by 1.8: wrong way round"))
dr.add("dTC", "Air temperature rise, °C", "ΔT_C", "={dTF}/1.8", "Δ°C")
dr.add("dTC2", "Air temperature rise, °C (burner commissioning sheet)", "ΔT_C2",
       "=({dTF}-32)/1.8", "Δ°C", planted=("offset-scale", "32 taken off a temperature rise"))
dr.add("SP", "Fan static pressure rise", "SP", 3.5, "in. w.g.")
dr.add("SPPa", "Fan static pressure rise, Pa", "SP_Pa", "={SP}*249.1", "Pa")
dr.add("SPPa2", "Fan static pressure rise, Pa (controls list)", "SP_Pa2", "={SP}*25.4", "Pa",
       planted=("unit-scale", "in. of water to mm of water, written as Pa: the g (9.81) missing"))
dr.add("etaf", "Fan total efficiency", "eta_f", 65, "%")
dr.add("Pf", "Fan shaft power", "P_f", "={Qa}*{SP}/(6356*{etaf}/100)", "hp")
dr.add("PfkW", "Fan shaft power, kW", "P_f,kW", "={Pf}*0.7457", "kW")
dr.add("PSI", "Fan shaft power, SI (check)", "P_f,SI", "={Qam3s}*{SPPa}/({etaf}/100)/1000", "kW")
dr.add("PSI2", "Fan shaft power, SI (electrical load list)", "P_f,SI2",
       "={Qam3s}*{SPPa}/({etaf}/100)", "kW", planted=("unit-scale", "W written as kW: /1000 missing"))
dr.heading("Storage bins (Bins sheet)")
dr.add("qaer", "Aeration airflow per bushel", "q_aer", 0.15, "cfm/bu")
dr.add("dens", "Bushels per cubic foot of bin (rough rice)", "rho_bu", 0.8036, "bu/ft³")
DRYS = dr.finish()

BINS = {
    "A1": "Coldwater Bend Farm storage bins (invented sizes)",
    "A2": "Sources: as the Dryer sheet; bin capacity = π/4·D²·h × bushels per ft³ (common "
          "practice).",
    "A3": CAUTION,
    "A4": "Bin", "B4": "Diameter [ft]", "C4": "Grain depth [ft]", "D4": "Capacity [bu]",
    "E4": "Aeration [cfm]",
    "A8": "Total", "D8": "=SUM(D5:D7)", "E8": "=SUM(E5:E7)",
}
for r, (name, dia, depth) in enumerate([("Bin 1", 30, 24), ("Bin 2", 36, 26), ("Bin 3", 42, 28)],
                                       start=5):
    BINS[f"A{r}"], BINS[f"B{r}"], BINS[f"C{r}"] = name, dia, depth
    BINS[f"D{r}"] = f"=PI()/4*B{r}^2*C{r}*{dr.ref('dens')}"
    BINS[f"E{r}"] = f"=D{r}*{dr.ref('qaer')}"

DRYB = {
    "trade": "agriculture: rough-rice column dryer, shrink, propane and fans",
    "sheets": [("Dryer", DRYS), ("Bins", BINS)],
    "planted": dr.planted,
    "sidecar": ("# Invented scenario. A dimensionally consistent formula can still be wrong; this\n"
                "# check does not replace independent review under local codes and licensed "
                "practice.\n"
                "# The rough-rice bushel is sold by weight: 45 lb (USDA, from memory; NIST SP 811\n"
                "# (2008) App. B.8 for the pound).\n"
                "measure bu = 45 lb \"bushel of rough rice, 45 lb (market weight)\"\n"),
}

# --------------------------------------------------------------------------------------------
# Book 3: ship fuel oil day tank and separator (kW, g/kWh, kg/h, t/d, kg/m³, kg/(m³·°C), °C,
# °F, m³/h, L/h, cSt, mPa·s, kJ/(kg·K), m, m³, bbl, t, h, d, bar(g), bar a, psig, %)
# --------------------------------------------------------------------------------------------
SHIP_SRC = (
    "Sources: fuel consumption = P·SFOC (engine maker's shop test; figures invented); density at "
    "temperature ρ_t = ρ_15 − α·(t − 15) with α about 0.64 kg/(m³·°C) for residual fuel "
    "(linear form of the ASTM D1250 / ISO 91 tables, common practice, from memory); RMG 380: "
    "991 kg/m³ at 15 °C, 380 cSt at 50 °C, ISO 8217 (2017) (from memory); separator flow Q = "
    "P·b·24/(ρ·23), a day's fuel through in 23 h (separator makers' rule, common practice, from "
    "memory); residual fuel c_p about 1.9 kJ/(kg·K) (from memory); service tanks for at least "
    "8 h at MCR, SOLAS II-1 Reg. 26.11 (from memory); water saturates at 3.61 bar a at 140 °C "
    "(steam tables, from memory); μ = ν·ρ, mPa·s = cSt × kg/m³ / 1000 (SI Brochure 9th ed.); "
    "NIST SP 811 (2008) App. B.8: 1 bbl = 0.1590 m³ (1 m³ = 6.29 bbl), 1 bar = 14.50 psi; "
    "°F = 1.8·°C + 32; atmosphere 1.013 bar. Vessel, engine and readings invented.")
sh = ItemSheet("FuelOil", "MV Kestrel Sound (invented): HFO day tank, separator and heater at "
               "service speed", SHIP_SRC)
sh.heading("Engine and consumption")
sh.add("P", "Main engine output at service speed (85 % MCR)", "P", 11200, "kW")
sh.add("b", "Specific fuel oil consumption (shop test, corrected)", "b", 178, "g/kWh")
sh.add("m", "Fuel consumption", "m", "={P}*{b}/1000", "kg/h")
sh.add("m2", "Fuel consumption (voyage plan)", "m_2", "={P}*{b}", "kg/h",
       planted=("unit-scale", "g/h written as kg/h: /1000 missing"))
sh.add("mtd", "Fuel consumption, t/d", "m_d", "={m}*24/1000", "t/d")
sh.heading("Density and volume flow")
sh.add("r15", "Density at 15 °C (bunker delivery note)", "rho_15", 991, "kg/m³")
sh.add("a", "Density correction per °C", "alpha", 0.64, "kg/m³·°C")
sh.add("tdt", "Day tank temperature", "t_dt", 80, "°C")
sh.add("tsep", "Separator temperature", "t_sep", 98, "°C")
sh.add("rdt", "Density in the day tank", "rho_dt", "={r15}-{a}*({tdt}-15)", "kg/m³")
sh.add("rsep", "Density at the separator", "rho_sep", "={r15}-{a}*({tsep}-15)", "kg/m³")
sh.add("rsep2", "Density at the separator (chief engineer's sheet)", "rho_sep2",
       "={r15}-{a}*{tsep}", "kg/m³",
       planted=("offset-scale", "°C reading where its difference from 15 °C belongs"))
sh.add("vcf", "Volume correction factor, day tank", "VCF", "={rdt}/{r15}", "-")
sh.add("Q15", "Fuel flow at 15 °C", "Q_15", "={m}/{r15}", "m³/h")
sh.add("Q15L", "Fuel flow at 15 °C, L/h", "Q_15,L", "={Q15}*1000", "L/h")
sh.add("Qdt", "Fuel flow at day tank temperature", "Q_dt", "={m}/{rdt}", "m³/h")
sh.add("QdtL", "Fuel flow at day tank temperature, L/h", "Q_dt,L", "={Qdt}*1000", "L/h")
sh.add("QdtL2", "Fuel flow at day tank temperature, L/h (flowmeter check)", "Q_dt,L2",
       "={Qdt}/1000", "L/h", planted=("unit-scale", "m³ to L divided by 1000: wrong way round"))
sh.heading("Separator")
sh.add("Qs", "Separator throughput (a day's fuel in 23 h)", "Q_s", "={P}*{b}/{rsep}*24/23", "L/h")
sh.add("Qs2", "Separator throughput (purchase enquiry)", "Q_s2", "={P}*{b}/{rsep}*24/23", "m³/h",
       planted=("unit-scale", "the formula gives L/h, written as m³/h: 1000 too large"))
sh.add("nu", "Kinematic viscosity at 50 °C (RMG 380)", "nu_50", 380, "cSt")
sh.add("cap", "Separator rated capacity at that viscosity (Separator sheet)", "Q_r",
       "=VLOOKUP({nu},Separator!A5:B10,2)", "L/h")
sh.add("load", "Separator load", "l", "={Qs}/{cap}*100", "%")
sh.add("mu", "Dynamic viscosity at 50 °C", "mu_50", "={nu}*({r15}-{a}*(50-15))/1000", "mPa·s")
sh.add("mu2", "Dynamic viscosity at 50 °C (heater data sheet)", "mu_50,2", "={nu}*{r15}",
       "mPa·s", planted=("unit-scale", "cSt × kg/m³ is µPa·s: /1000 missing, 1000 too large"))
sh.heading("Separator heater")
sh.add("ms", "Fuel mass through the heater", "m_s", "={Qs}/1000*{rsep}", "kg/h")
sh.add("cpf", "Specific heat of the fuel", "c_p", 1.9, "kJ/(kg·K)")
sh.add("Qh", "Heater duty, day tank to separator temperature", "Q_h",
       "={ms}*{cpf}*({tsep}-{tdt})/3600", "kW")
sh.add("Qh2", "Heater duty (electrical load list)", "Q_h2", "={ms}*{cpf}*({tsep}-{tdt})", "kW",
       planted=("unit-scale", "kJ/h written as kW: /3600 missing"))
sh.add("Qhr", "Electric heater rating (nameplate)", "Q_hr", 24, "kW")
sh.add("mar", "Heater rating over duty", "r_h", "={Qhr}/{Qh}*100", "%")
sh.add("tsF", "Separator temperature, °F (maker's manual)", "t_sep,F", "={tsep}*1.8+32", "°F")
sh.heading("Day tank")
sh.add("L", "Tank length", "L", 4.5, "m")
sh.add("B", "Tank breadth", "B", 3.2, "m")
sh.add("H", "Tank height", "H", 3.0, "m")
sh.add("Vt", "Tank volume", "V_t", "={L}*{B}*{H}", "m³")
sh.add("fill", "Usable fill", "f", 90, "%")
sh.add("Vu", "Usable volume", "V_u", "={Vt}*{fill}/100", "m³")
sh.add("Vb", "Usable volume, bbl", "V_u,bbl", "={Vu}*6.29", "bbl")
sh.add("Vb2", "Usable volume, bbl (charterer's report)", "V_u,bbl2", "={Vu}*0.159", "bbl",
       planted=("unit-scale", "m³ to bbl multiplied by 0.159: wrong way round"))
sh.add("end", "Endurance at service output", "t_e", "={Vu}/{Qdt}", "h")
sh.add("endd", "Endurance at service output, days", "t_e,d", "={end}/24", "d")
sh.add("mt", "Fuel in the day tank", "m_t", "={Vu}*{rdt}/1000", "t")
sh.add("mt2", "Fuel in the day tank (bunker report)", "m_t2", "={Vu}*{rdt}", "t",
       planted=("unit-scale", "kg written as t: /1000 missing"))
sh.heading("Booster circuit")
sh.add("pcg", "Booster circuit pressure", "p_c", 8, "bar(g)")
sh.add("patm", "Atmospheric pressure, engine room", "p_atm", 1.013, "bar a")
sh.add("psat", "Saturation pressure of water at 140 °C", "p_sat", 3.61, "bar a")
sh.add("pca", "Booster circuit pressure, absolute", "p_c,a", "={pcg}+{patm}", "bar a")
sh.add("dpf", "Margin above saturation (difference)", "Δp_f", "={pca}-{psat}", "bar")
sh.add("dpf2", "Margin above saturation (first draft)", "Δp_f2", "={pcg}-{psat}", "bar",
       planted=("offset-scale", "gauge reading less an absolute one"))
sh.add("pcp", "Booster circuit pressure, psig (US-built module)", "p_c,psi", "={pcg}*14.5", "psig")
SHIPS = sh.finish()

SEP = {
    "A1": "Separator rated capacity against viscosity at 50 °C (invented maker's table)",
    "A2": "Sources: maker's capacity table (invented); m³/h = L/h / 1000.",
    "A3": CAUTION,
    "A4": "Viscosity at 50 °C [cSt]", "B4": "Rated capacity [L/h]", "C4": "Rated capacity [m³/h]",
}
for r, (v, c) in enumerate([(40, 5200), (80, 4500), (180, 3600), (380, 2600), (500, 2200),
                            (700, 1800)], start=5):
    SEP[f"A{r}"], SEP[f"B{r}"] = v, c
    SEP[f"C{r}"] = f"=B{r}/1000"

SHIPB = {
    "trade": "marine engineering: fuel oil day tank, centrifugal separator and heater",
    "sheets": [("FuelOil", SHIPS), ("Separator", SEP)],
    "planted": sh.planted,
}

# --------------------------------------------------------------------------------------------
# Book 4: ski-area snowmaking (L/s, gpm, m³/h, m, ft, psi, psig, psia, bar(g), kPa, kg/m³, kW,
# hp, %, Nm³/min, scfm, kW/100 scfm, Nm³/m³, °C, °F, h, m³, ha, m², cm)
# --------------------------------------------------------------------------------------------
SNOW_SRC = (
    "Sources: pump power P = ρ·g·Q·H/η (common practice) and bhp = gpm·TDH(ft)/(3960·η) "
    "(Hydraulic Institute, from memory); pressure head h = p/(ρ·g), 1 m of water = 1.422 psi "
    "(common practice); standard atmosphere 85.3 kPa = 12.37 psia at 1,420 m (ICAO standard "
    "atmosphere, from memory); normal m³ at 0 °C and standard ft³ at 60 °F, both at 101.325 kPa: "
    "1 Nm³ = 37.33 scf (NIST SP 811 (2008) App. B.8 with the temperature ratio 288.71/273.15); "
    "compressor about 18 kW per 100 scfm (common practice; invented plant figure); snowmaking "
    "wet-bulb limit about −2.5 °C (common practice); machine snow about 450 kg/m³ (common "
    "practice, from memory); steel flanges class 300 about 740 psig at ambient, ASME B16.5 "
    "(from memory); NIST SP 811 (2008) App. B.8: 1 L/s = 15.85 gpm, 1 m = 3.281 ft, 1 bar = "
    "14.50 psi, 1 ha = 10 000 m²; °F = 1.8·°C + 32. Ski area, plant and readings invented.")
sn = ItemSheet("Snow", "Tamarack Ridge (invented): Upper Lynx trail snowmaking, pumps, air and "
               "snow made in one night", SNOW_SRC)
sn.heading("Water")
sn.add("ng", "Air-water guns running on the trail", "n_g", 18, "-")
sn.add("qg", "Water per gun", "q_g", 4.5, "L/s")
sn.add("Qw", "Water to the trail", "Q_w", "={ng}*{qg}", "L/s")
sn.add("Qgpm", "Water to the trail, gpm", "Q_w,US", "={Qw}*15.85", "gpm")
sn.add("Qgpm2", "Water to the trail, gpm (pump bid)", "Q_w,US2", "={Qw}*0.2642", "gpm",
       planted=("unit-scale", "L to US gal only: gal/s written as gpm, 60 too small"))
sn.add("Qm3h", "Water to the trail, m³/h", "Q_w,h", "={Qw}*3.6", "m³/h")
sn.heading("Pump head")
sn.add("zp", "Pond water level", "z_p", 1420, "m")
sn.add("zh", "Top hydrant elevation", "z_h", 1610, "m")
sn.add("hf", "Friction loss in the mains (Pipe sheet)", "h_f", "=Pipe!E10", "m")
sn.add("pn", "Pressure needed at the top hydrant", "p_n", 15, "bar(g)")
sn.add("rho", "Density of the pond water", "rho", 1000, "kg/m³")
sn.add("Hn", "Pressure head at the top hydrant", "H_n", "={pn}*100000/({rho}*9.81)", "m")
sn.add("TDH", "Total dynamic head", "TDH", "={zh}-{zp}+{hf}+{Hn}", "m")
sn.add("TDHft", "Total dynamic head, ft", "TDH_ft", "={TDH}*3.281", "ft")
sn.add("TDHpsi", "Total dynamic head as a pressure rise", "Δp", "={TDH}*1.422", "psi")
sn.add("zs", "Pond level above the pump centreline (flooded suction)", "z_s", 3.0, "m")
sn.add("Hd", "Head at the discharge gauge", "H_d", "={TDH}-{zs}", "m")
sn.add("pdg", "Pump discharge pressure (gauge reading)", "p_d", "={Hd}*1.422", "psig")
sn.add("pdb", "Pump discharge pressure, bar(g)", "p_d,bar", "={pdg}/14.5", "bar(g)")
sn.add("pb", "Site barometric pressure (1,420 m)", "p_b", 12.37, "psia")
sn.add("pda", "Pump discharge pressure, absolute", "p_d,a", "={pdg}+{pb}", "psia")
sn.add("pda2", "Pump discharge pressure, absolute (transmitter data sheet)", "p_d,a2",
       "={pdg}+14.7", "psia",
       planted=("offset-scale", "sea-level atmosphere added at a 1,420 m site"))
sn.add("pcl", "Flange rating, class 300 steel at ambient", "p_cl", 740, "psig")
sn.add("mcl", "Margin below the flange rating (difference)", "Δp_cl", "={pcl}-{pdg}", "psi")
sn.add("mcl2", "Margin below the flange rating (first draft)", "Δp_cl2", "={pcl}-{pda}", "psi",
       planted=("offset-scale", "gauge rating less an absolute reading"))
sn.heading("Pump power")
sn.add("eta", "Pump efficiency at duty", "eta", 78, "%")
sn.add("Pw", "Pump shaft power", "P", "={rho}*9.81*{Qw}/1000*{TDH}/({eta}/100)/1000", "kW")
sn.add("bhp", "Pump brake horsepower", "P_b", "={Qgpm}*{TDHft}/(3960*{eta}/100)", "hp")
sn.add("bhp2", "Pump brake horsepower (motor enquiry)", "P_b2", "={Qgpm}*{TDH}/(3960*{eta}/100)",
       "hp", planted=("unit-scale", "head in m in the ft rule: 3.281 too small"))
sn.add("bhpkW", "Pump brake power, kW", "P_b,kW", "={bhp}*0.7457", "kW")
sn.heading("Compressed air")
sn.add("qa", "Air per gun", "q_a", 9.5, "Nm³/min")
sn.add("Qa", "Air to the trail", "Q_a", "={ng}*{qa}", "Nm³/min")
sn.add("Qscfm", "Air to the trail, scfm", "Q_a,US", "={Qa}*37.33", "scfm")
sn.add("Qscfm2", "Air to the trail, scfm (compressor rental quote)", "Q_a,US2", "={Qa}*35.31",
       "scfm", planted=("unit-scale", "m³ to ft³ only: the 0 °C to 60 °F reference ratio missing"))
sn.add("sp", "Compressor specific power", "s_p", 18, "kW/100 scfm")
sn.add("Pc", "Compressor power", "P_c", "={Qscfm}/100*{sp}", "kW")
sn.add("ar", "Air to water ratio", "r_aw", "={Qa}/({Qw}*0.06)", "Nm³/m³")
sn.heading("Weather window")
sn.add("twb", "Forecast wet bulb, tonight", "t_wb", -4.0, "°C")
sn.add("twbF", "Forecast wet bulb, °F", "t_wb,F", "={twb}*1.8+32", "°F")
sn.add("tlF", "Wet-bulb limit of the guns (maker's chart)", "t_lim,F", 27.5, "°F")
sn.add("tlC", "Wet-bulb limit of the guns, °C", "t_lim", "=({tlF}-32)/1.8", "°C")
sn.add("tlC2", "Wet-bulb limit of the guns, °C (operator's card)", "t_lim2", "={tlF}-32*5/9",
       "°C", planted=("unit-scale", "°F to °C with the brackets missing: 17.8 taken off a °F "
                                    "reading"))
sn.add("run", "Guns run tonight (1 = yes)", "run", "=IF({twb}<={tlC},1,0)", "-")
sn.add("run2", "Guns run tonight (1 = yes, first draft)", "run_2", "=IF({twbF}<={tlC},1,0)", "-",
       planted=("unit-scale", "a °F reading compared with a °C limit"))
sn.heading("Snow made")
sn.add("tr", "Hours of snowmaking tonight", "t_r", 10, "h")
sn.add("Vw", "Water made into snow", "V_w", "={Qw}*{tr}*3.6", "m³")
sn.add("Vw2", "Water made into snow (night report)", "V_w2", "={Qw}*{tr}", "m³",
       planted=("unit-scale", "L/s times h written as m³: the 3.6 missing"))
sn.add("rhos", "Density of machine snow", "rho_s", 450, "kg/m³")
sn.add("Vs", "Snow made", "V_s", "={Vw}*{rho}/{rhos}", "m³")
sn.add("Vsq", "Snow made (quick form, water at 1000 kg/m³)", "V_s,q", "={Vw}*1000/{rhos}", "m³")
sn.add("Aha", "Trail area to cover", "A_ha", 2.4, "ha")
sn.add("A", "Trail area to cover, m²", "A", "={Aha}*10000", "m²")
sn.add("d", "Mean snow depth made", "d", "={Vs}/{A}", "m")
sn.add("dcm", "Mean snow depth made, cm", "d_cm", "={d}*100", "cm")
sn.add("d2", "Mean snow depth made (grooming report)", "d_2", "={Vs}/{Aha}", "m",
       planted=("unit-scale", "hectares left unconverted: 10 000 too large"))
SNOWS = sn.finish()

PIPE = {
    "A1": "Upper Lynx snowmaking main: friction loss by segment (invented layout, chart values)",
    "A2": "Sources: head loss per 100 m read from the maker's friction chart for steel pipe "
          "(invented values); loss = length × (m per 100 m)/100; 10 % added for fittings and "
          "hydrants (common practice).",
    "A3": CAUTION,
    "A4": "Segment", "B4": "Length [m]", "C4": "Flow [L/s]", "D4": "Loss [m/100 m]",
    "E4": "Friction loss [m]",
    "A9": "Straight pipe", "E9": "=SUM(E5:E8)",
    "A10": "With fittings and hydrants", "E10": "=E9*1.1",
}
for r, (name, length, q, loss) in enumerate([("Pump house to valve pit", 900, 81, 2.9),
                                             ("Valve pit to mid station", 650, 81, 2.9),
                                             ("Mid station to T12 (DN150)", 720, 54, 3.4),
                                             ("T12 to top hydrant (DN150)", 480, 36, 1.6)],
                                            start=5):
    PIPE[f"A{r}"], PIPE[f"B{r}"], PIPE[f"C{r}"], PIPE[f"D{r}"] = name, length, q, loss
    PIPE[f"E{r}"] = f"=B{r}*D{r}/100"
PIPE["E7"] = "=B7*D7"
PIPE_PLANTED = {"Pipe!E7": ("unit-scale", "m per 100 m times m without the /100: 100 too large")}

SNOWB = {
    "trade": "ski areas: snowmaking water pumps, compressed air and snow made",
    "sheets": [("Snow", SNOWS), ("Pipe", PIPE)],
    "planted": {**sn.planted, **PIPE_PLANTED},
}

BOOKS = {"hotel-dhw-recovery": DHWB, "rice-column-dryer": DRYB,
         "ship-fuel-separator": SHIPB, "snowmaking-pumping": SNOWB}


def main():
    write_books_with_notes(HERE, BOOKS)


if __name__ == "__main__":
    main()
