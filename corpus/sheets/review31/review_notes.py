"""The reviewer's record of plumb's findings beyond the planted mistakes, and the planted cells
it misses (review31, as first recorded). Invented scenarios; a dimensionally consistent formula
can still be wrong, and this check does not replace independent review under local codes and
licensed practice."""
N = "a note on a correct cell, a trade's number read as such (right reading)"
EXTRA = {
    "crusher-conveyor": [
        (N + ": 367 in the shop rule P = Q·H/367 kW (Q in t/h, H in m) is 3600/9.81, one over g "
         "in these units (common practice)", "Plant!C39 gravity-number"),
    ],
    "mine-ventilation": [
        (N + ": 6356 cfm·in. w.g. per hp is the fan trade's constant (common practice); plumb "
         "rightly says the conventional inch of water makes it 6343", "Vent!C45 trade-constant"),
        ("a correct cell plumb still flags: k = k(1.2)·ρ/1.2, the friction factor corrected to "
         "the airway's density (McPherson 1993 ch. 5, from memory); the 1.2 is the standard air "
         "density in kg/m³, typed bare as the trade types it, and plumb reads it as a pure number, "
         "so ρ/1.2 keeps the dimension of density", "Airways!H5 result-unit"),
        ("a correct cell plumb still flags: the same ρ/1.2 density correction", "Airways!H6 result-unit"),
        ("a correct cell plumb still flags: the same ρ/1.2 density correction (this row also "
         "feeds the planted I7)", "Airways!H7 result-unit"),
        ("a correct cell plumb still flags: the same ρ/1.2 density correction", "Airways!H8 result-unit"),
        ("a correct cell plumb still flags: fan static pressure at standard density, p·1.2/ρ "
         "(fan laws, common practice); the bare 1.2 kg/m³ is read as a pure number",
         "Vent!C39 result-unit"),
    ],
    "station-battery": [],
    "ice-storage": [
        ("a correct cell plumb still flags: lb of ice = TR·h × 12 000 Btu/(TR·h) / 144 Btu/lb, "
         "the US trade's check (144 Btu/lb latent heat of fusion, CRC Handbook, from memory); "
         "the 144 is a property typed bare and plumb reads it as a pure number, so the result "
         "stays an energy", "Storage!C28 result-unit"),
        (N + ": 500 in gpm = Btu/h/(500·ΔT°F) is water's 8.33 lb/gal × 60 min/h × 1 Btu/(lb·°F)",
         "Storage!C46 trade-constant"),
        (N + ": 9.81 m/s² in P = ρ·g·Q·H/η", "Storage!C49 gravity-number"),
    ],
}
MISSED = {
    "station-battery": {
        "Battery!C36": ("the recharge time, already in h, multiplied by 60 in 1.1·C/H + L: the "
                        "recharge term is 60 times too small; expected unit-scale (a factor the "
                        "units do not need). plumb takes a bare 60 as a dimensionless "
                        "coefficient once Ah/h has cancelled to A (it does flag 'H*60' into h "
                        "and 'A*h*60' into Ah, and '*1000' here)"),
    },
}
RENAMED = {
    "ice-storage": {
        "Storage!C41": ("sum-mismatch", "it reads the 32 as a bare number that cannot be added "
                        "to a temperature difference in K; right cell, and the message does not "
                        "say that + 32 belongs only to readings"),
    },
}
MESSAGES = {
    "station-battery": {
        "Battery!C17": ("right cell and rule, but its advice names a cell the formula does not "
                        "use: 'a °C reading on the °F scale is =B4*1.8+32' (the input is C15)"),
        "Battery!C19": ("right cell, misleading advice: 'divide C14*(C16-25) by 1.8'; the 25 is "
                        "the 25 °C reference, so the fix is (C16-77)/1.8 or the °C cell; dividing "
                        "by 1.8 gives -0.042 V/cell where +0.045 is right"),
    },
    "crusher-conveyor": {
        "Conveyors!E6": ("right cell and factor (60 too small), but 'its inputs give numbers in "
                         "units of 1/0.00508 fpm' is a hard way to say 196.85 fpm (m/s)"),
    },
}
