"""review36: what plumb reported beyond the planted mistakes, the planted cells it missed, and
the planted cells it names under another rule, each with the reviewer's reason (as first
recorded; the .expect files are kept by hand since). Read by make_books.py when it writes the
.expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.
"""

CORRECT = "a correct cell plumb still flags: "
NOTE = "a note on a correct cell: "

EXTRA = {
    "quarry-haul": [],
    "conveyor-drive": [
        (NOTE + "fpm = 0.2618·D[in]·n[rpm], 0.2618 = π/12 (common practice), read as π folded "
         "into the in-to-ft factor, which it is", "Drive!C16 trade-constant"),
        (NOTE + "T = 9549·P[kW]/n[rpm], 9549 = 60 000/2π (common practice), read as such",
         "Drive!C43 trade-constant"),
        (NOTE + "T[lbf·ft] = 5252·hp/n[rpm], 5252 = 33 000/2π (common practice), read as such",
         "Drive!C47 trade-constant"),
        (NOTE + "motor torque 9549·P/n (common practice), read as such",
         "Drive!C48 trade-constant"),
    ],
    "boiler-water": [
        (NOTE + "4.19 typed bare on a mass flow in kg/h (Q = m·4.19·ΔT/3600 kW; ASHRAE "
         "Fundamentals (2017) ch. 33), read as water's specific heat, which it is",
         "Balance!C31 trade-constant"),
        (CORRECT + "Q[Btu/h] = lb/h × ΔT[°F] for water, c = 1.0 Btu/(lb·°F) left out as the "
         "trade does (ASHRAE Fundamentals (2017) ch. 33); same value as C35, which writes c in "
         "a cell. plumb says [M T^-1 Θ] is not power: true of the symbols, not of the number. "
         "A defensible flag, but the bare 4.19 of C31 is read and an implied 1.0 is not",
         "Balance!C37 result-unit"),
        (NOTE + "gpm = lb/h ÷ 500 (8.34 lb/gal × 60 min/h, common practice); plumb calls 500 "
         "'the density of water', loosely (it is the density times 60 min/h)",
         "Balance!C38 trade-constant"),
        (NOTE + "Q = 500·gpm·ΔT[°F] (common practice), read as the heat capacity of a volume "
         "of water, which it is", "Balance!C39 trade-constant"),
        (CORRECT + "feedwater enthalpy h = c·t above 0 °C, the steam tables' datum (common "
         "practice; 4.19 × 105 = 440 kJ/kg against 440.2 in IAPWS-IF97 tables); plumb refuses "
         "any °C reading in a product and wants (t - 0)", "Balance!C40 offset-scale"),
        (CORRECT + "blowdown heat loss m·(h_f - c·t_mu)/3600, make-up enthalpy c·t above 0 °C "
         "(common practice; Spirax Sarco (2007) 'Boiler blowdown', from memory); same "
         "°C-in-a-product rule as C40", "Balance!C47 offset-scale"),
        (CORRECT + "flue gas density ρ = 1.293·273.15/(t + 273.15) kg/m³ (air 1.293 kg/m³ at "
         "0 °C and 101.325 kPa, ρ ∝ 1/T, common practice); plumb says it 'counts 0.001 times "
         "as much as kg/m³' and advises multiplying by 1000, which would make it wrong. The "
         "same formula with 1.293 in a cell of its own is clean", "Balance!C52 unit-scale"),
        (NOTE + "273.15 read as the reference temperature it is", "Balance!C52 trade-constant"),
        (NOTE + "the same 273.15 also read as 'the density of water in the units around it', "
         "which it is not; this misreading drives the 1000 of the error above",
         "Balance!C52 trade-constant"),
        (CORRECT + "heat flow above 0 °C, m·4.19·t/3600 kW (common practice in a stream table; "
         "G9 = G7 - G5 - G6 gives back the deaerator duty of Balance!C30); °C in a product",
         "Streams!G5 offset-scale"),
        (CORRECT + "as Streams!G5", "Streams!G6 offset-scale"),
        (CORRECT + "as Streams!G5", "Streams!G7 offset-scale"),
    ],
    "rail-drainage": [
        (NOTE + "Kirpich t_c = 0.0195·L^0.77·S^-0.385 (HEC-22 (2009), from memory), read as an "
         "empirical fit's constant, which it is", "Ditch!C9 trade-constant"),
        (NOTE + "Q = C·i·A in cfs with acres and in/h, the 1.008 left out by convention (HEC-22 "
         "(2009) eq. 3-1), read as such", "Ditch!C17 trade-constant"),
        (CORRECT + "SI Manning V = (1/n)·R^(2/3)·S^(1/2) (Chow (1959) ch. 5) with n written "
         "'-' as tables print it; plumb says [L^(2/3)] is not a velocity and gives no hint that "
         "n carries s/m^(1/3); with n written s/m^(1/3) the cell is clean",
         "Ditch!C30 result-unit"),
    ],
}

# Drive!C14 and Pulleys!E8 (rim speeds without π) and Drive!C45 (a torque without 2π) were
# missed when these books were written: the rotation rules read declared symbols only. Since a
# later round they read cells too (a length's row label or column heading naming a diameter).
MISSED = {}

RENAMED = {
    "boiler-water": {
        "Balance!C33": ("sum-mismatch", "the bare 32 is read as a pure number beside a "
                        "temperature difference; the right cell, and fair words"),
        "Streams!G8": ("offset-scale", "flagged only for the °C reading in a product, the same "
                       "finding as the correct G5:G7; the missing /3600 (kJ/h written as kW) "
                       "is not named"),
    },
    "rail-drainage": {
        "Ditch!C31": ("result-unit", "flagged only for Manning's n written '-', the same "
                      "finding as the correct C30; the ‰ under the root (31.6 too large) is not "
                      "named. With n written s/m^(1/3) plumb names it unit-scale, 31.6228 too "
                      "large (checked on a scratch book)"),
    },
}

MESSAGES = {
    "boiler-water": {
        "Balance!C33": "cannot add '32' to 'C28*1.8': their dimensions differ",
        "Streams!G8": "'D8' is on the °C scale, whose zero is arbitrary, so it cannot be "
                      "multiplied",
    },
    "rail-drainage": {
        "Ditch!C31": "this formula computes [L^(2/3)], but the unit written for its cell, "
                     "'m/s', is [L T^-1] (velocity)",
    },
}

# stem -> comment lines written at the head of the .expect
HEADNOTE = {
    "quarry-haul": [
        "The sidecar quarry-haul.cells.plumb ('measure trips = 1 1') names the counting word of",
        "the trade's 'trips/h', which plumb's unit table lacks. Without it plumb gives a no-unit",
        "warning on the correct formula cell Costs!C13 and a unit-scale error ('60 times too",
        "small') on the correct Costs!C14, which uses it.",
    ],
}
