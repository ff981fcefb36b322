// A scale's zero printed in another unit than the sum's (14.7 psi beside kPa, 459.67 °R beside
// K) added to a reading already absolute is an offset-scale error, and a sum-mismatch where
// the atmosphere is written in kPa beside a column in Pa says which unit it was written in.
// The conversions beside them (the zero in the sum's own unit added to a gauge or °C reading,
// a small margin) still pass.
#include "plumb/check.hpp"
#include "plumb/rules.hpp"
#include "test_support.hpp"
#include "workbook_support.hpp"

#include <doctest/doctest.h>

#include <string>
#include <vector>

namespace {

using plumb::test::count_of;
using plumb::test::first_under;
using plumb::test::problems_in;
using plumb::test::says;
constexpr auto run = plumb::test::check_after;
constexpr auto fails_with = plumb::test::each_fails_with;
constexpr auto passes = plumb::test::each_passes;

const std::string readings = "p_k, p_abs : kPa\np_kg : kPag\np_pa : Pa\np_b : bar\n"
                             "T_K, T_2 : K\nT_R : °R\nt_c : °C\nt_f : °F\nρ : kg/m^3\n"
                             "g : m/s^2\nh : m\n";

} // namespace

TEST_CASE("the atmosphere or a temperature zero in another unit, added to an absolute reading") {
    // The standard atmosphere is 101325 Pa (SI Brochure 9th ed., Table 8): 14.696 psi,
    // 1.01325 bar, 101325 Pa (NIST SP 811 (2008), B.8). T/K = t/°C + 273.15 and
    // T/°R = t/°F + 459.67 (NIST SP 811 (2008), 4.2.1.1).
    fails_with(readings,
               {"@psi-atmosphere p_abs = p_k + 14.7", "@bar-atmosphere p_abs = p_k + 1.01325",
                "@pa-atmosphere p_abs = p_k + 101325", "@rankine-zero T_2 = T_K + 459.67",
                "@rankine-zero-rounded T_2 = T_K + 460", "@kelvin-zero T_R = T_R + 273.15"},
               plumb::rules::offset_scale);
    const auto r = run(readings, "@psi-atmosphere p_abs = p_k + 14.7");
    REQUIRE(count_of(r, plumb::rules::offset_scale) == 1);
    CHECK(first_under(r, plumb::rules::offset_scale).message.find("the atmosphere in psi") !=
          std::string::npos);
}

TEST_CASE("the zero in the sum's own unit, or a margin, is not read as another unit's zero") {
    // Gauge plus the atmosphere in its unit, °C to K, °F to °R (sources as above), and a
    // margin written as a bare number beside a reading (common practice: "T + 5").
    for (const char* formula : {"@gauge p_abs = p_kg + 101.325", "@celsius T_2 = t_c + 273.15",
                                "@fahrenheit T_R = t_f + 459.67", "@margin p_abs = p_k + 10",
                                "@margin-t T_2 = T_K + 5", "@short-number p_abs = p_k + 0.1"}) {
        CAPTURE(formula);
        CHECK(problems_in(run(readings, formula)) == 0);
    }
}

TEST_CASE("the atmosphere in kPa beside a column in Pa: the finding names the unit") {
    const auto r = run(readings, "@column p_pa = ρ*g*h + 101.325");
    REQUIRE(count_of(r, plumb::rules::sum_mismatch) == 1);
    CHECK(says(first_under(r, plumb::rules::sum_mismatch), "the atmosphere in kPa"));
    // In its own unit it is the column plus the atmosphere and passes (with its note).
    CHECK(problems_in(run(readings, "@column-kpa p_k = ρ*g*h/1000 + 101.325")) == 0);
}

TEST_CASE("a scale's offset beside a temperature difference: the finding says it takes none") {
    // A range or rise in Δ°F converts to kelvins by the degree alone, ΔT/K = (ΔT/Δ°F)/1.8; the
    // 32 of t/°F = 1.8 t/°C + 32 belongs to readings only (NIST SP 811 (2008), 4.2.1.1).
    const std::string ranges = "R_F : Δ°F\nR_K : K\nR_C : Δ°C\n";
    const auto r = run(ranges, "@range R_K = (R_F - 32)/1.8");
    REQUIRE(count_of(r, plumb::rules::sum_mismatch) == 1);
    CHECK(says(first_under(r, plumb::rules::sum_mismatch),
               "32 is the offset between the °F and °C scales"));
    CHECK(problems_in(run(ranges, "@range-right R_K = R_F/1.8")) == 0);
    CHECK(problems_in(run(ranges, "@range-celsius R_K = R_C")) == 0);
    // The other way, a Celsius difference times 1.8 into Δ°F, with the 32 added.
    const auto back = run(ranges, "@range-back R_F = 1.8*R_C + 32");
    REQUIRE(count_of(back, plumb::rules::sum_mismatch) == 1);
    CHECK(says(first_under(back, plumb::rules::sum_mismatch),
               "32 is the offset between the °F and °C scales"));
    CHECK(problems_in(run(ranges, "@range-back-right R_F = 1.8*R_C")) == 0);
}

// A gauge reading converted (14.5 psi per bar, NIST SP 811 (2008), B.8 rounded) with the
// atmosphere added is absolute: set equal to a gauge reading, the advice is to drop the
// atmosphere, and the step between the zeros is named as one atmosphere, not 14.7 psi seen
// through the rounded 14.5. The conversion alone still passes.
TEST_CASE("a converted gauge reading plus the atmosphere, set equal to a gauge reading") {
    const std::string d = "p_set : bar g\np_psig : psig\np_0g : bar g\np_0a : bar\n";
    CHECK(problems_in(run(d, "p_psig = 14.5*p_set")) == 0);
    const auto r = run(d, "p_psig = 14.5*p_set + 14.7");
    REQUIRE(count_of(r, plumb::rules::offset_scale) == 1);
    const auto& finding = first_under(r, plumb::rules::offset_scale);
    CHECK(says(finding, "one atmosphere (101325 Pa)"));
    bool drop = false;
    for (const auto& n : finding.notes)
        drop = drop || n.message.find("drop the 14.7") != std::string::npos;
    CHECK(drop);
    // 14.7 added to a reading in bar g: the advice says it is the atmosphere in psi.
    const auto bar = run(d, "p_0a = p_0g + 14.7");
    REQUIRE(count_of(bar, plumb::rules::offset_scale) == 1);
    bool psi = false;
    for (const auto& n : first_under(bar, plumb::rules::offset_scale).notes)
        psi = psi || n.message.find("14.7 is the atmosphere in psi") != std::string::npos;
    CHECK(psi);
    CHECK(problems_in(run(d, "p_0a = p_0g + 1.013")) == 0);
}

// A downhole memory gauge records absolute pressure (common practice): declared in psia and
// described so, the atmosphere added to it is counted twice, whatever the instrument is
// called. A loose "p_g : psi "gauge pressure"" is still read as the gauge reading it names.
TEST_CASE("a gauge by name that records absolute pressure") {
    const std::string d = "p_mg : psia \"memory gauge, which records absolute\"\n"
                          "p_g : psi \"gauge pressure\"\np_wf, p_a : psia\n";
    fails_with(d, {"p_wf = p_mg + 14.7"}, plumb::rules::offset_scale);
    CHECK(problems_in(run(d, "p_a = p_g + 14.7")) == 0);
}

// A bar g reading with 14.7 added, set equal to psia: the atmosphere is in the other side's
// psi, and the reading must be converted too (14.5038 psi per bar, NIST SP 811 (2008), B.8),
// not only given the atmosphere in bar.
TEST_CASE("the atmosphere typed in the other side's unit: the reading is converted as well") {
    const std::string d = "p_wh : psia\np_whb : bar g\n";
    const auto r = run(d, "p_wh = p_whb + 14.7");
    REQUIRE(count_of(r, plumb::rules::offset_scale) == 1);
    CHECK(says(first_under(r, plumb::rules::offset_scale), "(14.5038*p_whb + 14.7)"));
    CHECK(problems_in(run(d, "p_wh = 14.5*p_whb + 14.7")) == 0);
}

// Reverse osmosis's net driving pressure, NDP = p_f - Δp_fc/2 - p_p - (π_fc - π_p) (common
// practice; membrane makers' design guides, from memory): a difference, so an absolute feed
// pressure less a gauge permeate pressure overstates it by one atmosphere. "net" and
// "differential" in a description name a difference as "difference" does.
TEST_CASE("a net driving pressure is a difference, not a reading") {
    const std::string d = "p_fa : bar \"feed pressure, absolute\"\np_f, p_p : barg\n"
                          "Δp_fc, π_fc, π_p : bar\nNDP : bar \"net driving pressure\"\n"
                          "DP : bar \"differential pressure across the filter\"\n";
    fails_with(d, {"NDP = p_fa - Δp_fc/2 - p_p - (π_fc - π_p)", "DP = p_fa - p_p"},
               plumb::rules::offset_scale);
    passes(d, {"NDP = p_f - Δp_fc/2 - p_p - (π_fc - π_p)", "DP = p_f - p_p"});
}

// t_F = 1.8·t_C + 32 and t_C = (t_F - 32)/1.8 (NIST SP 811 (2008), 4.2.1.1 and B.9): each
// applied to a reading already on the scale it converts to is the conversion run backwards,
// and the finding says which form the line needs.
// T/K = (t/°F + 459.67)/1.8 (NIST SP 811 (2008), B.9): a °F reading divided by 1.8 into kelvins
// has kept the degree's size and lost the zero; the advice adds the zero to the reading itself,
// where keeping the /1.8 beside it would divide by 1.8 twice (267.7 K for 40 °F, not 277.6).
TEST_CASE("a reading divided by 1.8 into kelvins is advised from the reading") {
    const std::string d = "T_ev : K\nt_F : degF\nt_C : degC\n";
    const auto r = run(d, "T_ev = t_F/1.8");
    REQUIRE(count_of(r, plumb::rules::offset_scale) == 1);
    CHECK(says(first_under(r, plumb::rules::offset_scale), "(t_F + 459.67)/1.8 beside K"));
    CHECK_FALSE(says(first_under(r, plumb::rules::offset_scale), "t_F/1.8 + 459.67"));
    const auto c = run(d, "T_ev = t_C/1.8");
    CHECK(says(first_under(c, plumb::rules::offset_scale), "(t_C + 273.15) beside K"));
}

TEST_CASE("a Fahrenheit conversion run the wrong way names the right form") {
    const std::string d = "T_3 : degC\nT_F : degF\n";
    const auto backwards = run(d, "T_F = (T_3 - 32)/1.8");
    REQUIRE(count_of(backwards, plumb::rules::offset_scale) == 1);
    CHECK(says(first_under(backwards, plumb::rules::offset_scale), "T_F = 1.8*T_3 + 32"));
    const auto other_way = run(d, "T_3 = 1.8*T_F + 32");
    REQUIRE(count_of(other_way, plumb::rules::offset_scale) == 1);
    CHECK(says(first_under(other_way, plumb::rules::offset_scale), "T_3 = (T_F - 32)/1.8"));
    passes(d, {"T_F = 1.8*T_3 + 32", "T_3 = (T_F - 32)/1.8"});
}

// A nitrogen buffer tank's sheet: the header pressure in psig under psia, with bar's 1.01325
// added (1 atm = 1.01325 bar = 14.6959 psi, NIST SP 811 (2008), B.8). The cell is an
// offset-scale error, as before, and now says which unit its number is the atmosphere in;
// the right cell, 14.696 added, passes.
TEST_CASE("sheets: the atmosphere added in bar to a psig cell under psia") {
    const std::string sheet =
        "<worksheet><sheetData>" + plumb::test::value_and_unit_row(2, "95", "psig") +
        plumb::test::value_and_unit_row(3, "=B2+1.01325", "psia") +
        plumb::test::value_and_unit_row(4, "=B2+14.696", "psia") + "</sheetData></worksheet>";
    const auto r = plumb::test::check_one_sheet("N2", sheet);
    CHECK(plumb::test::cell_findings(r) == std::vector<std::string>{"N2!B3 offset-scale"});
    REQUIRE(!r.diagnostics.empty());
    CHECK(says(r.diagnostics.front(),
               "1.01325 is the atmosphere in bar, not in psia, the cell's unit: in psia it is "
               "14.6959"));
}

// 1 inch of water = 249.089 Pa (NIST SP 811 (2008), B.8; the trade rounds it to 249.1): a
// pressure declared a rise over outdoor air, converted by a number, is a difference still, and
// a manometer reading in in. w.g. reads it. The factor the wrong way round is then a scale
// finding that names the factor, not a zero an atmosphere away.
TEST_CASE("a declared pressure difference converted by a number is a gauge reading") {
    const std::string d = "Δp_i : Pa \"inflation pressure, the rise over outdoor air\"\n"
                          "p_wg : inH2Og\np_kg : kPag\n";
    passes(d, {"p_wg = Δp_i/249.1", "p_kg = Δp_i/1000", "p_kg = 0.001*Δp_i"});
    for (const char* formula : {"p_wg = 249.1*Δp_i", "p_kg = 1000*Δp_i"}) {
        CAPTURE(formula);
        const auto r = run(d, formula);
        CHECK(count_of(r, plumb::rules::offset_scale) == 0);
        REQUIRE(count_of(r, plumb::rules::unit_scale) == 1);
        CHECK(says(first_under(r, plumb::rules::unit_scale), "wrong way round"));
    }
    // A reading declared absolute is no difference, converted or not.
    fails_with("p_a : Pa \"absolute pressure in the dome\"\np_wg : inH2Og\n", {"p_wg = p_a/249.1"},
               plumb::rules::offset_scale);
}

// Dalton's law, p_i = y_i·p with p absolute (any thermodynamics text, e.g. Çengel & Boles,
// ch. 13, from memory): a mole fraction of a gauge reading is no partial pressure, and the
// advice puts the atmosphere inside the bracket the fraction scales.
TEST_CASE("a fraction of a gauge reading is advised the atmosphere inside") {
    const std::string d = "y_H2 : %\np_rg : psig\np_H2 : psia\n";
    const auto r = run(d, "p_H2 = y_H2/100*p_rg");
    REQUIRE(count_of(r, plumb::rules::offset_scale) == 1);
    CHECK(says(first_under(r, plumb::rules::offset_scale), "y_H2/100*(p_rg + 14.6959)"));
    passes(d, {"p_H2 = y_H2/100*(p_rg + 14.696)"});
}

// t_C = (t_F - 32)/1.8 (NIST SP 811 (2008), B.9): with the 32 taken after dividing, a reading
// comes out 32 - 32/1.8 = 14.2222 K low at every temperature, which the finding says instead
// of how far the two scales' zeros lie apart.
TEST_CASE("32 taken after the division by 1.8 is said with the error it makes") {
    const std::string d = "t_F : degF\nt_C : degC\n";
    for (const char* formula : {"t_C = t_F/1.8 - 32", "t_C = 0.5556*t_F - 32"}) {
        CAPTURE(formula);
        const auto r = run(d, formula);
        REQUIRE(count_of(r, plumb::rules::offset_scale) == 1);
        CHECK(says(first_under(r, plumb::rules::offset_scale), "14.2222 K too low"));
    }
    CHECK(32.0 - 32.0 / 1.8 == doctest::Approx(14.2222).epsilon(1e-5));
    passes(d, {"t_C = (t_F - 32)/1.8"});
}

// A kill sheet's final circulating pressure, FCP = p_scr·MW_kill/MW_orig (API RP 59, from
// memory): a slow-rate pressure declared a friction loss, times a ratio of mud weights, is a
// difference still, which the drill pipe gauge reads; an absolute pressure there is not.
TEST_CASE("a declared pressure difference times a ratio of symbols is a gauge reading") {
    const std::string d = "p_scr : psi \"slow-rate circulating pressure, the friction loss\"\n"
                          "FCP : psig\nMW_k, MW_o : lb/gal\np_a : psia \"absolute pressure\"\n";
    passes(d, {"FCP = p_scr*MW_k/MW_o"});
    fails_with(d, {"FCP = p_a*MW_k/MW_o"}, plumb::rules::offset_scale);
}

// A sealed piezometer reads absolute; less the site's barometer it is the pore pressure above
// the atmosphere (common practice in geotechnical instrumentation). A description that says
// "above atmospheric" declares that difference, and the sea-level 101.325 taken instead of a
// declared 94.2 kPa barometer leaves it 7.1 kPa low, as the warning says.
TEST_CASE("the sea-level atmosphere taken from an absolute reading leaves the rest too low") {
    const std::string d = "u : kPa \"pore water pressure on the slip surface, above atmospheric\"\n"
                          "p_pz : kPa \"piezometer reading, absolute\"\n"
                          "p_bar : kPa \"site barometric pressure, 94.2 kPa\"\n";
    passes(d, {"u = p_pz - p_bar"});
    const auto r = run(d, "u = p_pz - 101.325");
    CHECK(count_of(r, plumb::rules::offset_scale) == 1);
    CHECK(says(first_under(r, plumb::rules::offset_scale),
               "the pressure above the atmosphere comes out 7.1 kPa low"));
}

// A steam generator at a site whose barometer is declared 97.5 kPa (some 320 m up, by the
// standard atmosphere's barometric formula, from memory): its gauge reading converted into
// kPa or psi (1 bar = 100 kPa = 14.5038 psi, NIST SP 811 (2008), B.8) plus that barometer in
// the same unit is absolute, as the unconverted p_g + 0.975 is; the barometer added to a
// reading already absolute counts the atmosphere twice, as 14.7 does.
TEST_CASE("a converted gauge reading plus the site's barometer typed as a number") {
    const std::string d = "p_b : kPa = 97.5 \"site barometer\"\np_g : barg\np_kpa : kPa\n"
                          "p_psia, p_x : psia\n";
    passes(d, {"p_kpa = 100*p_g + 97.5", "p_psia = 14.5*p_g + 14.14", "p_psia = 14.5*(p_g + 0.975)",
               "p_kpa = 100*p_g + p_b"});
    // Not a barometer in the sum's unit: 97.5 psi, 14.14 kPa.
    fails_with(d, {"p_psia = 14.5*p_g + 97.5", "p_kpa = 100*p_g + 14.14"},
               plumb::rules::offset_scale);
    const auto twice = run(d, "p_x = p_psia + 14.14");
    REQUIRE(count_of(twice, plumb::rules::offset_scale) == 1);
    CHECK(says(first_under(twice, plumb::rules::offset_scale), "counts the atmosphere twice"));
}

// A flare tip's velocity from a flow at reference conditions (15 °C, ISO 13443, from memory)
// over the tip's area with its diameter converted from inches (1 in = 0.0254 m exactly, NIST
// SP 811 (2008), B.8): the conversion written first is a length's, not a state's correction.
TEST_CASE("a velocity from a standard flow over an area whose diameter is converted first") {
    const std::string d = "Q_S : Sm3/d\nd_in : in\nD_mm : mm\nv : m/s\n";
    fails_with(d,
               {"v = Q_S/(86400*pi*(0.0254*d_in)^2/4)", "v = Q_S/(86400*pi*(D_mm/1000)^2/4)",
                "v = Q_S/(86400*pi*(0.001*D_mm)^2/4)"},
               plumb::rules::unit_scale);
}

// 14.5 psi per bar (14.5038, NIST SP 811 (2008), B.8) turns an absolute reading in bar into psia
// already; the site's barometer typed in psi (0.950 bar = 13.78 psi) added to it counts the
// atmosphere twice, as 14.7 did.
TEST_CASE("the site's barometer in psi added to a converted absolute reading") {
    const std::string header = "p_bb : bar \"site barometric pressure, 0.950 bar\"\n"
                               "p_a : bar a \"header pressure, absolute\"\n"
                               "p_g : bar(g) \"header pressure on the gauge\"\n"
                               "p_psia : psia \"header pressure, absolute\"\n";
    const auto r = plumb::test::check_after(header, "p_psia = 14.5*p_a + 13.78");
    CHECK(plumb::test::first_under(r, plumb::rules::offset_scale)
              .message.find("13.78 is the site's barometer 'p_bb' in psi") != std::string::npos);
    plumb::test::each_passes(header, {"p_psia = 14.5*p_g + 13.78"});
}

// A vacuum counts down from the atmosphere: p_abs = p_atm − vacuum (3.386 kPa per inHg, NIST SP
// 811 (2008), B.8). With the standard atmosphere and no site barometer declared the line holds;
// where the file declares the site's barometer, the sea level's 101.325 is the slip.
TEST_CASE("the atmosphere a vacuum counts down from") {
    const std::string vacuum = "v_op : inHg \"plant operating vacuum below the barometer\"\n"
                               "p_abs : kPa \"plant pressure, absolute\"\n";
    const auto plain = plumb::test::check_after(vacuum, "p_abs = 101.325 - 3.386*v_op");
    CHECK(plumb::test::problems_in(plain) == 0);
    CHECK(plumb::test::count_of(plain, plumb::rules::trade_constant) == 1);
    const std::string site = vacuum + "p_b : kPa \"site barometric pressure, 97.5 kPa\"\n";
    plumb::test::each_passes(site, {"p_abs = p_b - 3.386*v_op", "p_abs = 97.5 - 3.386*v_op"});
    plumb::test::each_fails_with(site, {"p_abs = 101.325 - 3.386*v_op"},
                                 plumb::rules::offset_scale);
    // An absolute reading converted, with the atmosphere added: still the atmosphere twice.
    plumb::test::each_fails_with(vacuum + "p_x : inHg \"absolute pressure\"\n",
                                 {"p_abs = 101.325 + 3.386*p_x"}, plumb::rules::offset_scale);
}

// An expansion vessel's fill pressure: at least the static column above it plus a margin, 0.3
// bar (common practice). The margin typed with its unit is a difference beside the column, as
// the column is; an atmosphere typed so (101.325 kPa) is not, and added to a gauge reading it is
// still reported.
TEST_CASE("a margin typed with its unit beside a column is a difference") {
    const std::string vessel = "p_f : bar g \"fill pressure at the vessel\"\nH : m\n"
                               "\u03C1_w : kg/m3 = 999.7 \"water\"\n"
                               "p_g : kPa(g) \"pressure at the bottom, gauge\"\n";
    plumb::test::each_passes(vessel, {"p_f >= \u03C1_w*{g_n}*H/1e5 + 0.3 {bar}",
                                      "p_g = \u03C1_w*{g_n}*H/1000 + 20 {kPa}"});
    plumb::test::each_fails_with(
        vessel, {"p_g = \u03C1_w*{g_n}*H/1000 + 101.325 {kPa}", "p_f >= 0.3 {bar}"},
        plumb::rules::offset_scale);
}

// A line pack in normal cubic metres from a pressure in psia: p·6.895/101.325 is the ratio to
// the normal state, 101.325 kPa (DIN 1343, from memory; 6.895 kPa per psi, NIST SP 811 (2008),
// B.8). Read so, as 14.696 is beside psia alone; 14.696 beside the converted kPa leaves the
// 6.895 needless.
TEST_CASE("a reference pressure in the unit a conversion beside the reading gives") {
    const std::string pack = "V : m^3\np_avg : psia \"average pressure, absolute\"\nT : K\n"
                             "Z : 1\nLP : m^3\n";
    plumb::test::each_passes(
        pack, {"LP = V*(p_avg*6.895/101.325)*(273.15/T)/Z", "LP = V*(p_avg/14.696)*(273.15/T)/Z"});
    plumb::test::each_fails_with(pack, {"LP = V*(p_avg*6.895/14.696)*(273.15/T)/Z"},
                                 plumb::rules::unit_scale);
}

// A psi calc beside a barometer declared in psi (12.7 psi, about 1210 m up by the standard
// atmosphere's barometric formula, from memory): the warning says the barometer and how far off
// the sea level's 14.696 leaves the sum in psi, the sum's unit.
TEST_CASE("the site's barometer said in the sum's unit") {
    const std::string plant = "p_b : psi \"site barometric pressure, 12.7 psi\"\n"
                              "p_cg : psig \"condensing pressure on the gauge\"\n"
                              "p_ca : psia \"condensing pressure, absolute\"\n";
    const auto r = plumb::test::check_after(plant, "p_ca = p_cg + 14.696");
    const auto& d = plumb::test::first_under(r, plumb::rules::offset_scale);
    CHECK(d.message.find("'p_b' (12.7 psi") != std::string::npos);
    CHECK(d.message.find("comes out 2 psi high") != std::string::npos);
}

// psia = kPa/6.895 (NIST SP 811 (2008), B.8, rounded), less the atmosphere, 14.696 psi at sea
// level or the site's barometer typed, is the gauge reading; so are K·1.8 − 459.67 in °F and
// °R/1.8 − 273.15 in °C (NIST SP 811 (2008), 4.2.1.1). The same sums into an absolute unit, or
// with the other scale's zero, still fail, and a number added to a converted absolute reading
// still counts the atmosphere twice.
TEST_CASE("a converted absolute reading less the atmosphere is a gauge reading") {
    const std::string decl = "p_k : kPa \"suction pressure, absolute\"\np_sa : psia\n"
                             "p_psig : psig\np_psia : psia\nT_K, T_K2 : K\nT_R : °R\n"
                             "t_F : °F\nt_C : °C\n";
    plumb::test::each_passes(decl, {"p_psig = p_k/6.895 - 14.696", "p_psig = 0.145*p_k - 14.7",
                                    "t_F = T_K*1.8 - 459.67", "t_C = T_R/1.8 - 273.15"});
    plumb::test::each_fails_with(decl,
                                 {"p_psia = p_k/6.895 - 14.7", "T_K2 = T_R/1.8 - 273.15",
                                  "t_F = T_K*1.8 - 273.15", "t_C = T_K*1.8 - 459.67",
                                  "t_F = T_K*1.8", "p_psig = p_sa - 20",
                                  "p_psia = p_k/6.895 + 14.7"},
                                 plumb::rules::offset_scale);
    // The site's barometer typed, 14.2 psia about 290 m up (the standard atmosphere's
    // barometric formula): a note, not a finding; another number beside it is the slip.
    const std::string site = decl + "p_b : psia \"site barometer, 14.2 psia\"\n";
    for (const char* formula : {"p_psig = p_sa - 14.2", "p_psig = p_k/6.895 - 14.2"}) {
        CAPTURE(formula);
        const auto r = plumb::test::check_after(site, formula);
        CHECK(plumb::test::problems_in(r) == 0);
        CHECK(plumb::test::count_of(r, plumb::rules::trade_constant) == 1);
    }
    plumb::test::each_fails_with(site, {"p_psig = p_sa - 13.0", "p_psig = p_k/6.895 - 14.696"},
                                 plumb::rules::offset_scale);
}

// Air's density at the site by the gas law, ρ = p·M/(R·T) (R from CODATA 2018, M of dry air
// 28.96 kg/kmol, common practice), takes the site's barometer where the file declares one; the
// standard atmosphere typed there is 2.5 % high at 98.9 kPa. The barometric formula that gives
// the site's barometer from the sea level's (the standard atmosphere's, from memory), and a
// normal volume's correction p/101.325 kPa, keep the standard atmosphere as they should.
TEST_CASE("the sea-level atmosphere typed into a product at a site with a barometer") {
    const std::string decl = "p_b : kPa \"site barometer, 98.9 kPa\"\nρ_a : kg/m^3\n"
                             "M_a : kg/kmol = 28.96\nT_a : K \"air temperature\"\nV, V_n : m^3\n"
                             "p : kPa \"absolute\"\nz : m\n";
    const auto r = plumb::test::check_after(decl, "ρ_a = 101.325 {kPa}*M_a/({R}*T_a)");
    REQUIRE(plumb::test::count_of(r, plumb::rules::offset_scale) == 1);
    CHECK(plumb::test::says(plumb::test::first_under(r, plumb::rules::offset_scale),
                            "the product it stands in comes out 2.5 % high"));
    plumb::test::each_passes(
        decl, {"ρ_a = p_b*M_a/({R}*T_a)", "p_b = 101.325 {kPa}*(1 - 2.25577e-5 {1/m}*z)^5.2559"});
    const auto normal = plumb::test::check_after(decl, "V_n = V*p/(101.325 {kPa})*273.15/T_a");
    CHECK(plumb::test::problems_in(normal) == 0);
}

// A pressure "above the barometer" in the barometer's unit is no barometer: the advice names
// the site's barometer itself, 'p_b', whichever is declared first.
TEST_CASE("the advice names the site's barometer, not a pressure above it") {
    const std::string decl = "p_dis : kPa \"blower discharge pressure above the barometer\"\n"
                             "p_b : kPa \"site barometric pressure, 99.2 kPa\"\n"
                             "vac_kPa : kPa \"inlet vacuum\"\np_1 : kPa \"inlet, absolute\"\n";
    const auto r = plumb::test::check_after(decl, "p_1 = 101.325 - vac_kPa");
    const auto& d = plumb::test::first_under(r, plumb::rules::offset_scale);
    CHECK(plumb::test::says(d, "declares the site's barometer 'p_b'"));
    CHECK(plumb::test::says(d, "write p_b in place of 101.325"));
}

// A crude tank's vapour space on its gauge in inches of water: 1 inH2O = 249.09 Pa = 0.0361 psi
// (NIST SP 811 (2008), B.8), and a tank gauge reads above the atmosphere (common practice). A
// declaration in inH2O whose words say gauge is a gauge reading, as inH2Og is; a vacuum or a
// pressure said against the barometer stays as it was, and one said absolute is absolute.
TEST_CASE("inches of water read on a gauge are a gauge reading") {
    const std::string d = "p_in : inH2O \"tank vapour space on the tank gauge, 3 in. w.c.\"\n"
                          "p_ia : inH2O \"tank vapour space, absolute\"\n"
                          "p_tk : psig \"tank vapour space\"\np_abs : psia \"tank, absolute\"\n"
                          "p_b : psia \"site barometer\"\n";
    passes(d, {"p_tk = 0.0361*p_in", "p_abs = 0.0361*p_in + p_b", "p_abs = 0.0361*p_ia"});
    fails_with(d, {"p_abs = 0.0361*p_in", "p_tk = 0.0361*p_ia"}, plumb::rules::offset_scale);
    const std::string vacuum = "vac_in : inH2O \"suction vacuum, skid gauge\"\n"
                               "vac : kPa \"suction vacuum below the barometer\"\n";
    passes(vacuum, {"vac_in = 4.015*vac"});
}

// NPSH available is (p_s + p_atm - p_v)/(ρ·g) with the suction gauge reading p_s (Karassik et
// al., Pump Handbook, 4th ed., from memory). The site's barometer typed as a number among the
// sum's other terms (99.8 kPa about 130 m up, 62.9 kPa about 3840 m up, 1.0 bar; the standard
// atmosphere's barometric formula, from memory) puts the gauge reading on the absolute scale, as
// it does beside the reading alone. A number no atmosphere has, one subtracted, or the sea
// level's beside a declared barometer stays a finding; a gauge reading plus a number set equal
// to another gauge reading is a pump's rise, not an atmosphere.
TEST_CASE("the site's barometer typed among a sum's other terms") {
    const std::string d = "p_s : kPa(g)\np_v : kPa\nrho : kg/m^3\nH : m\nq_s : bar(g)\n"
                          "q_v : bar\np_d : kPa(g)\n";
    passes(d, {"H = (p_s + 99.8 - p_v)*1000/(rho*{g_n})", "H = 1000*(62.9 + p_s - p_v)/(rho*{g_n})",
               "H = (q_s + 1.0 - q_v)*1e5/(rho*{g_n})", "p_d = p_s + 99.8"});
    const auto read = run(d, "H = (p_s + 99.8 - p_v)*1000/(rho*{g_n})");
    CHECK(says(first_under(read, plumb::rules::trade_constant),
               "99.8 is read as the atmospheric pressure where the gauge is"));
    fails_with(d,
               {"H = (p_s + 20 - p_v)*1000/(rho*{g_n})", "H = (p_s - 99.8 - p_v)*1000/(rho*{g_n})",
                "H = (p_s - p_v)*1000/(rho*{g_n})"},
               plumb::rules::offset_scale);
    const std::string site = d + "p_b : kPa = 97.5 \"site barometer\"\n";
    const auto other = run(site, "H = (p_s + 88 - p_v)*1000/(rho*{g_n})");
    REQUIRE(count_of(other, plumb::rules::offset_scale) == 1);
    CHECK(says(first_under(other, plumb::rules::offset_scale), "site's barometer 'p_b'"));
}

// An expansion vessel's or receiver's volume by Boyle's law, V_t = V_e/(1 - p_1/p_2) with the
// pressures absolute (common practice): the gauge readings plus the site's barometer typed as a
// number (1.009 bar, about 40 m up by the standard atmosphere's barometric formula, from memory)
// make them so inside the ratio, as beside a gauge reading set equal to an absolute pressure. A
// number no atmosphere has stays an error.
TEST_CASE("the site's barometer typed beside a gauge reading inside a ratio") {
    const std::string d = "V_t, V_e : L\np_1g, p_2g : bar(g)\n";
    passes(d, {"V_t = V_e/(1 - (p_1g + 1.009)/(p_2g + 1.009))",
               "V_t = V_e*(p_2g + 1.009)/(p_2g - p_1g)"});
    const auto read = run(d, "V_t = V_e/(1 - (p_1g + 1.009)/(p_2g + 1.009))");
    CHECK(count_of(read, plumb::rules::trade_constant) == 2);
    fails_with(d, {"V_t = V_e/(1 - (p_1g + 0.5)/(p_2g + 0.5))", "V_t = V_e/(1 - p_1g/p_2g)"},
               plumb::rules::offset_scale);
}
