"""The reviewer's record of plumb's findings on the review30 books, beyond the
planted mistakes (read by make_books.py when it writes the .expect files with --expect).

Invented scenario. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.
"""

_NOTE = "a note on a correct cell, read as such: "
_FLAG = "a correct cell plumb still flags: "

EXTRA = {
    "plumbing-sizing": [
        (_NOTE + "V = 0.4085·Q/d² (gpm, in, fps): 0.4085 is 4/π times 0.3208, as plumb says",
         "Sizing!C14 trade-constant"),
        (_FLAG + "Hazen–Williams per 100 ft, =100*4.52*Q^1.852/(C^1.852*d^4.87) into psi/100 ft "
         "(4.52 for psi per ft with gpm and in: NFPA 13 and the ASPE Plumbing Engineering Design "
         "Handbook vol. 2, from memory); plumb reads a lone 4.52 as the fit's constant (the same "
         "formula into psi/ft is a note), but not beside the ×100 that makes it per 100 ft, and "
         "calls the cell result-unit",
         "Sizing!C21 result-unit"),
        (_NOTE + "0.433 psi per ft of rise, water's specific weight",
         "Sizing!C27 gravity-number"),
        (_FLAG + "Hazen–Williams in SI per metre times 9.81 kPa per m of water, "
         "=10.67*(Q/1000)^1.852/(C^1.852*(D/1000)^4.87)*9.81 into kPa/m (common practice); "
         "a lone 10.67 is read as the fit's constant (into m or m/m: a note), but the ×9.81 "
         "beside it makes plumb give up the reading",
         "Branches!I5 result-unit"),
        (_FLAG + "the same SI Hazen–Williams per metre times 9.81, another branch",
         "Branches!I6 result-unit"),
        (_FLAG + "the same SI Hazen–Williams per metre times 9.81, another branch",
         "Branches!I7 result-unit"),
    ],
    "roof-drainage": [
        (_NOTE + "EN 12056-3's eaves gutter fit 2.78×10⁻⁵·A_E^1.25 (L/s, mm²)", "Roof!C25 trade-constant"),
        (_FLAG + "Manning in US units, =1.486/n*A*R^(2/3)*S^(1/2) into cfs with n typed "
         "dimensionless ('-'), as the handbooks tabulate it (Chow 1959 ch. 5); plumb wants n's "
         "unit (with n written s/m^(1/3) the same formula passes), so it calls the cell "
         "result-unit, L^(8/3)", "Roof!C40 result-unit"),
        (_FLAG + "Manning in SI, =1/n*R^(2/3)*S^0.5 into m/s, n typed dimensionless: the same "
         "limit", "Roof!C46 result-unit"),
    ],
    "kitchen-hot-water": [
        ("a note on a planted cell, beside its error: 500 read as water's heat capacity per "
         "gpm; beside gal/h the scale rule names the 60", "Heater!C40 trade-constant"),
        (_NOTE + "8.34 lb/gal × 1 Btu/(lb·°F) in gal/h × 8.34 × ΔT, water's heat capacity per "
         "volume", "Heater!C20 trade-constant"),
        (_NOTE + "4.19 kJ/(kg·K) × 1 kg/L in L/h × 4.19 × ΔT / 3600",
         "Heater!C28 trade-constant"),
        (_NOTE + "8.34 in the recovery rate", "Heater!C34 trade-constant"),
        (_NOTE + "the 500 of 500 × gpm × ΔT (8.34 × 60)", "Heater!C39 trade-constant"),
    ],
    "steam-condensate": [
        (_NOTE + "9.81 in ρ·g·h, standard gravity", "Condensate!C28 gravity-number"),
        (_NOTE + "the 500 of gpm × 500 × ΔT / h_fg",
         "Condensate!C48 trade-constant"),
        ("a note on a correct cell, in misleading words: in =Qw*0.0631*3600*4.19*(ΔT/1.8)/h_fg "
         "the 0.0631 converts gpm to L/s (NIST SP 811) and 4.19 kJ/(kg·K) × 1 kg/L is water's "
         "heat capacity per volume; plumb names 0.0631 as water's heat capacity and says "
         "nothing of the 4.19", "Condensate!C51 trade-constant"),
    ],
}

MISSED = {}

_MANNING = ("flagged only because every Manning cell with n dimensionless is (the correct C40 "
            "gets the same words); the slip itself is not seen")
RENAMED = {
    "plumbing-sizing": {
        "Sizing!C28": ("result-unit", "0.433 not read as γ_w beside metres, so the product is "
                       "a length; the message says so and gives 1.421 psi/m"),
    },
    "roof-drainage": {
        "Roof!C41": ("result-unit", _MANNING),
        "Roof!C43": ("result-unit", _MANNING),
    },
    "kitchen-hot-water": {
        "Heater!C16": ("sum-mismatch", "its message names the −32 as an offset that a "
                       "difference does not take, and 1 K = 1.8 Δ°F"),
        "Heater!C24": ("result-unit", "8.34 not read as water's heat capacity beside L/h"),
    },
    "steam-condensate": {
        "Condensate!C49": ("result-unit", "500 not read as water's heat capacity beside an "
                           "h_fg in kJ/kg"),
    },
}

MESSAGES = {
    "plumbing-sizing": {
        "Branches!H7": ("'3280.84 times too small ... its coefficient 0.4085 aside': the "
                        "factor treats the /25.4 (mm to in) as absent; the slip is L/s where "
                        "gpm is wanted, 15.85 too small"),
    },
    "roof-drainage": {
        "Roof!C18": ("'the value shown is 8.9419176 times too large': wrong size and "
                     "direction; m² where ft² is wanted makes it 10.76 too small (the 0.0104 "
                     "gpm per ft²·in/h is left out of the weighing)"),
    },
}
