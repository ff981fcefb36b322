"""review40: what plumb reported on these books beyond the planted mistakes, the planted cells it
names by another rule, and its messages that mislead, each with the reviewer's reason (as first
recorded on an older binary, then brought up to date with build/release/cli/plumb when the books
came into the corpus: the messages on Inflow!D8 and Temps!C8 had changed). Read by make_books.py
when it writes the .expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.
"""

EXTRA = {
    "wet-well": [
        ("a note on a correct cell: Hazen-Williams in SI, 10.67·L·Q^1.852/(C^1.852·D^4.87) with "
         "Q and D converted by /1000 inside their powers, 10.67 read as the fit's constant, "
         "which it is", "WetWell!C46 trade-constant"),
        ("a note on the planted cell C52 as well: 3960 in bhp = gpm·ft/(3960·η) read as one "
         "over water's specific weight in those units, which it is (33 000 ft·lbf/min per hp "
         "over 8.33 lb/gal)", "WetWell!C52 gravity-number"),
    ],
    "lime-kiln": [
        ("a note on the planted cell C27: 273.15 in V·p/1.01325·273.15/(t + 273.15) read as "
         "the reference temperature (0 °C, DIN 1343), which it is", "Kiln!C27 trade-constant"),
        ("a second finding on the planted cell C49: ε·σ·(T_s⁴ − T_a⁴) raises two °C readings "
         "to the fourth power, the shell's C45 and the ambient C38, and plumb reports each (the "
         "first is the planted line above)", "Kiln!C49 offset-scale"),
    ],
    "canal-balance": [],
    "brine-chiller": [
        ("a note on a correct cell: SG = ρ/1000, the 1000 read as water's density in kg/m³, "
         "which it is", "Chiller!C25 trade-constant"),
        ("a note on a correct cell: c_p/4.187, the 4.187 read as water's specific heat in "
         "kJ/(kg·K), which it is", "Chiller!C26 trade-constant"),
        ("a note on a correct cell: 500 in gpm = Btu/h/(500·SG·c_p,r·ΔT°F) read as the heat "
         "capacity of a volume of water in those units, which it is (8.33 lb/gal × 60 min/h × "
         "1 Btu/(lb·°F)); SG and the c_p ratio beside it make it the brine's", "Chiller!C27 "
         "trade-constant"),
        ("a note on a correct cell: 9.81 in H = Δp·1000/(ρ·9.81) read as standard gravity",
         "Chiller!C35 gravity-number"),
        ("a note on a correct cell: 9.81 in P = ρ·9.81·Q·H read as standard gravity",
         "Chiller!C39 gravity-number"),
        ("a note on a correct cell: 3960 in bhp = gpm·ft·SG/(3960·η) read as one over water's "
         "specific weight, with SG on the right side of the line", "Chiller!C41 gravity-number"),
    ],
}

MISSED = {}

RENAMED = {
    "wet-well": {
        "WetWell!C50": ("result-unit", "with the head in ft plumb no longer reads the 9.81 of "
                        "9.81·Q·H/1000 as water's specific weight in kN/m³, so the dimension "
                        "is off; its note names the head in ft and the number ft would need "
                        "(2.99), which is right"),
        "WetWell!C57": ("result-unit", "it does not read the 9.81 under the root as g when the "
                        "diameter is in mm, and reports a dimension, not the mm"),
    },
    "lime-kiln": {
        "Temps!C8": ("unit-scale", "it names the °F-to-°C formula (t − 32)/1.8 as a "
                     "temperature conversion run the wrong way, offset and all, and gives the "
                     "fix; an older build read it as the factor 1.8 the wrong way round and said "
                     "nothing of the offset"),
    },
    "canal-balance": {
        "Canal!C49": ("result-unit", "it reports the dimension [L^(8/3)] because Manning's n is "
                      "tabulated without a unit (as Chow tabulates it), not the 1.486; the "
                      "correct SI form 1/n·A·R^(2/3)·S^(1/2) with n in '-' gets the same "
                      "finding (checked in a scratch book, not kept); with n in s/m^(1/3) "
                      "plumb names the 1.486 as a factor not needed"),
    },
    "brine-chiller": {
        "Chiller!C18": ("sum-mismatch", "it calls the 32 a dimensionless number beside a "
                        "temperature difference, with a note that names the slip"),
        "Chiller!C55": ("result-unit", "it leaves 500 unread beside a range in K, so the "
                        "dimension is off; its note says 500 wants the range in °F (in K about "
                        "900), which is right"),
    },
}

MESSAGES = {
    "wet-well": {
        "WetWell!C57": "'this formula computes [L^(1/2) T^-1] ... is [1]': it reads as if g "
                       "were missing, but 9.81 is there; the slip is the bell diameter in mm "
                       "(Fr 31.6 too small), which the message does not name as the slip (its "
                       "notes list C55 in mm among the inputs' units). With the bell diameter "
                       "in m the same 9.81 is read as standard gravity (checked in a scratch "
                       "book, not kept)",
        "Inflow!D8": "now \"'WetWell!$C$27/((WetWell!$C$12-B8)/1000)/60' converts to the unit "
                     "of its cell, but 'WetWell!$C$27/B8/60' beside it does not ... multiply "
                     "'WetWell!$C$27/B8/60' by 1000, as the term beside it is\", which names "
                     "the fill-time term and is the fix. An older build blamed the correct "
                     "term instead ('the factor 1000 is not needed: the units of "
                     "WetWell!$C$27/((WetWell!$C$12-B8)/1000)/60 already agree'), advice that "
                     "would have left both terms 1000 too small",
    },
    "lime-kiln": {
        "Kiln!C14": "'it must multiply by 1/1.163, but it multiplies by 1.163': the factor it "
                    "wants (0.8598) is right, but the formula multiplies by 0.9478 × 1.102 = "
                    "1.0445, not 1.163; only the short-ton factor is the wrong way round, the "
                    "0.9478 MMBtu/GJ is right",
        "Temps!C8": "now 'the temperature conversion in this formula runs the wrong way for "
                    "°F', with the note '(t - 32)/1.8 turns a °F reading into °C, but B8 is in "
                    "°C already and the cell wants °F: the conversion runs the other way, "
                    "=B8*1.8+32', which is the fix. An older build said 'to give °F it must "
                    "multiply by 1.8, but it multiplies by 0.555556', half the fix: (B8 − 32)·1.8 "
                    "is still wrong (the current build flags it offset-scale in a scratch book, "
                    "not kept)",
    },
    "canal-balance": {
        "Canal!C49": "'this formula computes [L^(8/3)]': right cell, wrong reason; it points at "
                     "n's missing unit and not at the 1.486, which is the slip",
        "Canal!C19": "'its units are 70.0453 times too small for it, its coefficient 1.983 "
                     "aside': right, but roundabout; the value shown is 35.31 too small (the "
                     "cfs-day factor 1.983 applied to m³/s), which the reader must work out",
    },
    "brine-chiller": {
        "Chiller!C45": "right cell and rule; one note is muddled: \"'C43' less 'C42' would be "
                       "the kPa(g) scale's zero as an absolute reading; this way round it is its "
                       "negative\" says nothing a reader can use; the next note, add the "
                       "atmospheric pressure to the gauge reading, is the fix",
    },
}
