"""review38: what plumb reported on these books beyond the planted mistakes, and the planted cells
it names under another rule, each with the reviewer's reason (as first recorded on an older
binary; the .expect files are kept by hand since). Read by make_books.py when it writes the
.expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.
"""

CORRECT = "a correct cell plumb still flags: "
NOTE = "a note on a correct cell: "

J_NOTE = (NOTE + "P_h = Q[m³/h]·H[m]·SG·9.81/3600 kW (Cameron Hydraulic Data 19th ed., from "
          "memory): 9.81 read as water's specific weight in kN/m³, which it is (SG carries the "
          "liquid)")
N_NOTE = (NOTE + "bhp = gpm·ft·SG/(3960·η) (Cameron Hydraulic Data 19th ed., from memory): 3960 "
          "read as one over water's specific weight in those units (33 000 ft·lbf/min per hp ÷ "
          "8.33 lb/gal), which it is")
L_WHY = (CORRECT + "ACI 347R-14 §2.2.2 (from memory), SI form p = C_w·C_c·(7.2 + 785·R/(T + "
         "17.8)) kPa, not less than 30·C_w kPa nor more than ρ·g·h: the code's coefficients (7.2 "
         "and 30 kPa, 785 kPa·°C·h/m, 17.8 °C) are printed and typed bare. plumb reads 30·C_w "
         "as a pure number and the fit as [L T^-1 Θ^-1] and reports MAX's arguments as differing "
         "in dimension; it knows other trades' fits (Hazen-Williams, Antoine, Magnus) but not "
         "this one. The value is right (P1: 59.9 kPa)")

EXTRA = {
    "pump-schedule": [
        (NOTE + "P_h = Q[m³/h]·H[m]·SG/367 kW (367 = 3.6·10⁶/(1000·9.81), Cameron Hydraulic Data "
         "19th ed., from memory) read as one over water's specific weight, which it is",
         "Duty!C24 gravity-number"),
        (NOTE + "v[ft/s] = 0.4085·gpm/d[in]² (common practice) read as 4/π times the gpm-to-"
         "ft³/s-per-in² factor 0.3208 (144/448.8), which it is", "Duty!C27 trade-constant"),
        (J_NOTE, "Schedule!J5 gravity-number"),
        (N_NOTE, "Schedule!N5 gravity-number"),
        (J_NOTE, "Schedule!J6 gravity-number"),
        ("a note on the planted cell N6 as well (the same reading of 3960)",
         "Schedule!N6 gravity-number"),
        (J_NOTE, "Schedule!J7 gravity-number"),
        (N_NOTE, "Schedule!N7 gravity-number"),
        (J_NOTE, "Schedule!J8 gravity-number"),
        (N_NOTE, "Schedule!N8 gravity-number"),
        (J_NOTE, "Schedule!J9 gravity-number"),
        (N_NOTE, "Schedule!N9 gravity-number"),
    ],
    "boiler-blowdown": [
        (CORRECT + "mixed temperature of condensate and make-up, t_mix = (m_c·t_c + (m_fw − "
         "m_c)·t_mu)/m_fw, a mass-weighted mean of two °C readings (Spirax Sarco, The Steam and "
         "Condensate Loop (2007), from memory; common practice). plumb knows weighted means only "
         "when the divisor is written as the sum of the weights: with /(m_c + (m_fw − m_c)) the "
         "cell is clean (checked on a scratch copy). Its advice, to add 273.15 as for a gas "
         "law, does not fit a weighted mean. Reported once for each reading",
         "Plant!C49 offset-scale"),
        (CORRECT + "as above, the second reading", "Plant!C49 offset-scale"),
    ],
    "transformer-loading": [
        (CORRECT + "aging acceleration F_AA = exp(15000/383 − 15000/(θ_H + 273)), IEEE Std "
         "C57.91-2011 eq. 2 (from memory), as the standard prints it: 15000 is a temperature "
         "(K) and 383 = 110 °C + 273 K, both bare. plumb says the argument is [Θ^-1] and advises "
         "dividing by a reference value 'as in ln(p/p_ref)', which does not fit an Arrhenius "
         "form; with 15000 in a cell of unit K the bare 383 is then flagged instead (scratch "
         "copy). It does read the +273 of the hot spot correctly", "Rating!C28 "
         "dimensioned-argument"),
        (CORRECT + "daily energy = Σ P × 4 h per block (the sheet's A1 and A2 say 4-hour "
         "blocks): the 4 h is typed bare. plumb: 'computes power but kWh is energy'. A "
         "defensible flag (the hours are not in a cell), right words; it accepts a bare 8760 h/yr "
         "elsewhere but not 24 h/d or 4 h (checked on a scratch copy)", "Profile!B11 result-unit"),
        (CORRECT + "daily loss energy Σ P_loss × 4 h, as B11", "Profile!B12 result-unit"),
    ],
    "concrete-pour": [
        (CORRECT + "unit weight coefficient C_w = 0.5·(1 + ρ/2320) ≥ 0.8 below 2240 kg/m³, 1.0 "
         "up to 2400, ρ/2320 above: ACI 347R-14 §2.2.2 (from memory), 2320 kg/m³ typed bare as "
         "the code prints it. plumb: cannot add ρ/2320 to 1. Defensible (the 2320 carries "
         "kg/m³), right words", "Design!C14 sum-mismatch"),
        (CORRECT + "full liquid head 24·h kPa (unit weight of fresh concrete about 24 kN/m³, "
         "common practice; 2.4 t/m³ × 9.81 = 23.5): plumb reads the bare 24 as a pure number "
         "and says the cell computes a length. Defensible, but it reads 9.81 and 3960 as water's "
         "specific weight and has no such reading for concrete's", "Design!C24 result-unit"),
        (NOTE + "in misleading words: p[psf] = ρ[lb/ft³]·h[m]·3.281 (US practice, lb/ft³ as "
         "unit weight) — the 3.281 is the ft-per-m factor of NIST SP 811 and the g is hidden in "
         "lb read as lbf; plumb calls 3.281 'standard gravity in the units around it' and "
         "advises writing {g_n}*0.334553", "Design!C25 gravity-number"),
        (L_WHY, "Pours!L5 argument-mismatch"),
        (CORRECT + "as Pours!L5", "Pours!L7 argument-mismatch"),
        (CORRECT + "as Pours!L5", "Pours!L8 argument-mismatch"),
        (CORRECT + "as Pours!L5", "Pours!L9 argument-mismatch"),
    ],
}

MISSED = {}

RENAMED = {
    "concrete-pour": {
        "Pours!L6": ("argument-mismatch", "flagged only for the MAX finding it shares with the "
                     "correct L5, L7-L9; the planted slip (ρ in kg/m³ where t/m³ belongs, ρ·g·h "
                     "1000 too large) is not named. In effect a miss masked by a false positive"),
    },
}

MESSAGES = {
    "concrete-pour": {
        "Pours!L6": "the arguments of MAX differ in dimension",
    },
}

HEADNOTE = {}
