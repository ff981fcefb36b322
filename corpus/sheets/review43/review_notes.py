"""review43: what plumb reported on these books beyond the planted mistakes, the planted cells it
misses or names by another rule, and its messages that mislead, each with the reviewer's reason
(as first recorded on an older binary at review time, chosen per cell after reading every
finding, then brought up to date with the binary of the day when the books came into the
corpus: MMscfd, Mscfd and pcf now read as units, so the no-unit warnings on Station!C6,
Station!C46 and Purlin!C51 are gone, Station!C49 is clean and the planted Station!C47 is
reported unit-scale, 1000 times too large, as planted; with the throughput now read in MMscfd,
the GPSA gas power Station!C30 is flagged result-unit (its 0.0857 hides psia and °R); the
planted deflection Purlin!C45 (10^3 where 10^4 belongs), once passed, is now caught
unit-scale; the message on the planted Balance!C48 now names its /1000, so it is no longer
listed as misleading; and the notes plumb now adds on correct cells (water's density, specific
heat and specific weight, standard gravity, the Hazen-Williams constant) are recorded). Read by
make_books.py when it writes the .expect files (python3 make_books.py --expect).

Invented scenarios. A dimensionally consistent formula can still be wrong; this check does not
replace independent review under local codes and licensed practice.
"""

G_NOTE = "a note on a correct cell: 9.81 read as standard gravity, which it is"
GAMMA_W = ("a note on a correct cell: 9.81 in P = 9.81·Q·H/η (kW, with Q in m³/s and H in m) "
           "read as the specific weight of water, ρ_w·g = 9.81 kN/m³, which it is (common "
           "practice)")

EXTRA = {
    "brewery-boil": [
        ("a note on a correct cell: 998.2 read as the density of water in kg/m³, which it is "
         "(at 20 °C; IAPWS-IF97 as tabulated in Rogers & Mayhew, from memory, as the sheet's "
         "sources name it)", "Kettle!C17 trade-constant"),
        ("a note on a correct cell: 4.19 read as the specific heat of water in kJ/(kg·K), which "
         "it is (common practice)", "Kettle!C61 trade-constant"),
    ],
    "pit-dewatering": [
        ("a note on a correct cell: 10.67 of the SI Hazen-Williams formula read as an empirical "
         "fit's constant, which it is (common practice)", "Balance!C38 trade-constant"),
        (GAMMA_W, "Balance!C41 gravity-number"),
        ("a note on the planted cell C42, as on C41: 9.81 read as the specific weight of water "
         "(the slip is the efficiency in %, reported above)", "Balance!C42 gravity-number"),
        ("a note on the planted cell C43: 9.81 read as the specific weight of water in kN/m³; "
         "the formula's 1000·9.81 is ρ·g in N/m³, so the cell gives W under kW, and plumb's "
         "finding above names that 1000, the planted slip", "Balance!C43 gravity-number"),
        ("an input plumb warns on (not a formula cell): 'mm/month' is how the hydrologist types "
         "a month's rainfall depth; plumb has no month (a month has no fixed length, so this is "
         "defensible), but its suggestion 'did you mean $, € or £?' is noise",
         "Balance!C24 no-unit"),
    ],
    "compressor-fuel": [
        ("a correct cell plumb flags: GPSA gas power ghp = 0.0857·Q·Z·T_1·k/(k-1)·(r^((k-1)/k) "
         "- 1)/η_s with Q in MMscfd and T_1 in °R (GPSA Engineering Data Book 13th ed. (2012) "
         "sec. 13, from memory). The 0.0857 hides the standard state of the standard cubic "
         "foot, 14.696 psia and 519.67 °R (60 °F), and the hp: 14.696 × 144 lbf/ft² × 10⁶ "
         "ft³/d / 86 400 s/d / 519.67 °R / 550 ft·lbf/(s·hp) = 0.0857 hp per (MMscfd·°R); "
         "plumb takes it as a pure number and reports [L³ T⁻¹ Θ] (flagged since MMscfd came "
         "to be read). A trade constant plumb does not know, not a slip", "Station!C30 result-unit"),
    ],
    "roof-purlin": [
        ("a note on a correct cell: 9.81 read as standard gravity, which it is (kN/m² × 1000 / "
         "9.81 gives kg/m²)", "Purlin!C17 gravity-number"),
        ("a note on a correct cell: 9.81 read as standard gravity, which it is (kg/m × 9.81 / "
         "1000 gives kN/m)", "Purlin!C24 gravity-number"),
        ("a correct cell plumb flags: ASCE 7-16 eq. 7.7-1, γ = 0.13·pg + 14 ≤ 30 pcf (from "
         "memory), an empirical code equation whose 0.13 carries 1/ft; plumb calls the sum "
         "inhomogeneous (true as typed) with no hint that it may be a fit, where it accepts "
         "Hazen-Williams' 10.67 in the mine book as an empirical constant with a note",
         "Purlin!C51 sum-mismatch"),
    ],
}

MISSED = {}

RENAMED = {
    "roof-purlin": {
        "Purlin!C29": ("sum-mismatch", "planted as a missing g (kg/m beside kN/m); plumb calls "
                       "it a sum of different dimensions and its note says a g is missing, "
                       "which is the slip"),
    },
}

MESSAGES = {
    "brewery-boil": {
        "Kettle!C44": "\"to give lb/h it must multiply by 2.20462 (1/0.45359237), but it "
                      "multiplies by 0.45359237\": right cell and rule, but the formula divides "
                      "by 2.205; 'divides by 2.205 where it should multiply' would be plainer",
    },
}

LINE = ("A dimensionally consistent formula can still be wrong; this check does not replace "
        "independent review under local codes and licensed practice.")
HEADNOTE = {stem: [LINE] for stem in ("brewery-boil", "pit-dewatering", "compressor-fuel",
                                      "roof-purlin")}
