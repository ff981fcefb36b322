// A trade's constant typed for one unit system beside a symbol or cell declared in the other's
// (3960 with a head in metres, 0.433 with a depth in metres, 1.08 and 500 with a kelvin
// difference, 62.4 lbf/ft³ into psi): the finding stays an error, and a note names the unit
// the number was written for and what it comes to in the unit declared.
#include "check/unit_counterparts.hpp"
#include "plumb/check.hpp"
#include "plumb/rules.hpp"
#include "test_support.hpp"
#include "workbook_support.hpp"

#include <doctest/doctest.h>

#include <algorithm>
#include <string>
#include <vector>

namespace {

using plumb::test::count_of;
using plumb::test::problems_in;

// Every note of every finding, joined, for searching.
std::string notes_of(const plumb::check_report& r) {
    std::string out;
    for (const auto& d : r.diagnostics)
        for (const auto& n : d.notes)
            out += n.message + "\n";
    return out;
}

const std::string pump = "Q_gpm : gpm\nH_m : m\nH_ft : ft\nη : 1\nP_hp : hp\nh_m : m\nh_ft : ft\n"
                         "p_psi : psi\np_kPa : kPa\nq_btu : Btu/h\ncfm : cfm\nΔT_K : K\n"
                         "Q_w : gpm\nh_o : ft\nz_b : ft\n";

} // namespace

TEST_CASE("the other system's unit for a quantity: NIST SP 811 (2008), B.8") {
    const auto metre =
        plumb::unit_counterparts(plumb::compact_dimension::whole({0, 1, 0, 0, 0, 0, 0}), 1.0);
    CHECK(metre.declared == "m");
    REQUIRE(metre.others.size() == 1);
    CHECK(metre.others[0].name == "ft");
    CHECK(metre.others[0].si_scale == doctest::Approx(0.3048));
    // psi, derived from the pound, the inch and g_n, is 6894.757 Pa (B.8 prints 6.894757E+03).
    const auto psi = plumb::unit_counterparts(
        plumb::compact_dimension::whole({1, -1, -2, 0, 0, 0, 0}), 6894.757293168);
    CHECK(psi.declared == "psi");
    CHECK(psi.others.size() == 3);
    // A unit of neither system has none.
    CHECK(plumb::unit_counterparts(plumb::compact_dimension::whole({0, 1, 0, 0, 0, 0, 0}), 0.2)
              .others.empty());
}

TEST_CASE("a trade's constant beside a symbol in the other system's unit") {
    // Water horsepower Q[gpm]·H[ft]/3960 (Hydraulic Institute, common practice): with the head
    // in metres the number would be 3960 × 0.3048 = 1207.
    auto r = plumb::check_text("c.plumb", pump + "P_hp = Q_gpm*H_m/(3960*η)\n");
    CHECK(count_of(r, plumb::rules::side_mismatch) == 1);
    CHECK(notes_of(r).find("'3960' is one over the specific weight of water for 'H_m' in ft, "
                           "but 'H_m' is in m: in m the number comes to about 1207") !=
          std::string::npos);
    // 0.433 psi per ft of water (common practice): 1.421 psi per m.
    r = plumb::check_text("c.plumb", pump + "p_psi = 0.433*h_m\n");
    CHECK(count_of(r, plumb::rules::side_mismatch) == 1);
    CHECK(notes_of(r).find("about 1.421") != std::string::npos);
    // And in a sum, where the term with the number is taken as the reference.
    r = plumb::check_text("c.plumb", pump + "p_psi = 0.433*h_m + p_psi\n");
    CHECK(count_of(r, plumb::rules::sum_mismatch) == 1);
    CHECK(notes_of(r).find("about 1.421") != std::string::npos);
    // The sensible load 1.08·cfm·ΔT[°F] in Btu/h (common practice): with ΔT in K, 1.944. The
    // flow in m³/h fits air's range too, at its edge; the reading nearer the middle is named.
    r = plumb::check_text("c.plumb", pump + "q_btu = 1.08*cfm*ΔT_K\n");
    CHECK(count_of(r, plumb::rules::side_mismatch) == 1);
    CHECK(notes_of(r).find("'1.08' is the heat capacity of a volume of air for 'ΔT_K' in °F") !=
          std::string::npos);
    CHECK(notes_of(r).find("about 1.944") != std::string::npos);
    // 62.4 lbf/ft³ times feet is lbf/ft², not psi: in psi, 0.4333 (144 in² per ft²).
    r = plumb::check_text("c.plumb", pump + "p_psi = 62.4*(h_o + z_b)\n");
    CHECK(count_of(r, plumb::rules::side_mismatch) == 1);
    CHECK(notes_of(r).find("for 'p_psi' in lbf/ft², but 'p_psi' is in psi") != std::string::npos);
    CHECK(notes_of(r).find("about 0.4333") != std::string::npos);
}

TEST_CASE("the constants in their own units pass with their notes, and no unit-system note") {
    for (const char* formula : {"P_hp = Q_gpm*H_ft/(3960*η)", "p_psi = 0.433*h_ft",
                                "p_kPa = 9.81*h_m", "q_btu = 1.08*cfm*(ΔT_K*1.8)"}) {
        CAPTURE(formula);
        const auto r = plumb::check_text("c.plumb", pump + formula + "\n");
        CHECK(problems_in(r) == 0);
        CHECK(notes_of(r).find("the number comes to") == std::string::npos);
    }
}

TEST_CASE("no unit-system note where the term holds a factor it cannot weigh") {
    // The slip may sit in the function's argument; naming the head would be a guess.
    const auto r =
        plumb::check_text("c.plumb", pump + "P_hp = Q_gpm*H_m/(3960*η*sqrt(h_ft/h_ft))\n");
    CHECK(count_of(r, plumb::rules::side_mismatch) == 1);
    CHECK(notes_of(r).find("the number comes to") == std::string::npos);
}

TEST_CASE("sheets: a trade's constant beside a cell in the other system's unit") {
    // =B2*B3/3960 under hp with the head in m; =B5/(500*B6) in gpm with a K difference
    // (gpm = Btu/h / (500·ΔT[°F]), common practice): each a result-unit error with the note.
    const std::string sheet =
        "<worksheet><sheetData>" + plumb::test::value_and_unit_row(2, "450", "gpm") +
        plumb::test::value_and_unit_row(3, "36", "m") +
        plumb::test::value_and_unit_row(4, "=B2*B3/3960", "hp") +
        plumb::test::value_and_unit_row(5, "240000", "Btu/h") +
        plumb::test::value_and_unit_row(6, "10", "K") +
        plumb::test::value_and_unit_row(7, "=B5/(500*B6)", "gpm") + "</sheetData></worksheet>";
    const auto r = plumb::test::check_one_sheet("Pumps", sheet);
    CHECK(plumb::test::cell_findings(r) ==
          std::vector<std::string>{"Pumps!B4 result-unit", "Pumps!B7 result-unit"});
    const std::string notes = notes_of(r);
    CHECK(notes.find("'3960' is one over the specific weight of water for 'B3' in ft, but 'B3' "
                     "is in m: in m the number comes to about 1207") != std::string::npos);
    CHECK(notes.find("'500' is the heat capacity of a volume of water for 'B6' in °F, but 'B6' "
                     "is in K: in K the number comes to about 900") != std::string::npos);
}
