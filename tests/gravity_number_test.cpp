// Standard gravity written as a number: the forms engineers type (9.81, 32.2, the oilfield's
// 0.052 psi/ft per ppg) are read as g_n with a note, and a missing g is still an error.
#include "check/gravity_number.hpp"
#include "plumb/check.hpp"
#include "plumb/rules.hpp"

#include <doctest/doctest.h>

#include <algorithm>
#include <string>

namespace {

std::size_t count(const plumb::check_report& r, std::string_view rule) {
    return static_cast<std::size_t>(std::count_if(r.diagnostics.begin(), r.diagnostics.end(),
                                                  [&](const auto& d) { return d.rule == rule; }));
}

std::size_t problems(const plumb::check_report& r) {
    return static_cast<std::size_t>(
        std::count_if(r.diagnostics.begin(), r.diagnostics.end(), [](const auto& d) {
            return d.level != plumb::severity::note && d.rule != plumb::rules::unused;
        }));
}

plumb::check_report run(const std::string& text) {
    return plumb::check_text("g.plumb", text);
}

const std::string hydrostatic = "ρ : kg/m^3\nh : m\np : Pa\np_k : kPa\nV : m/s\n";

} // namespace

TEST_CASE("half a unit in the last printed digit") {
    CHECK(plumb::half_unit_in_last_digit("9.81") == doctest::Approx(0.005));
    CHECK(plumb::half_unit_in_last_digit("32") == doctest::Approx(0.5));
    CHECK(plumb::half_unit_in_last_digit("0.052") == doctest::Approx(0.0005));
    CHECK(plumb::half_unit_in_last_digit("9.8e3") == doctest::Approx(50.0));
}

// p = ρ g h with g_n = 9.80665 m/s² (3rd CGPM, 1901; SI Brochure 9th ed.); 9.81 and 9.8 are
// its usual roundings (common practice).
TEST_CASE("gravity as a number: ρ*9.81*h is a pressure, with a note") {
    for (const char* formula :
         {"p = ρ*9.81*h", "p = ρ*9.8*h", "p = 9.807*ρ*h", "p_k = ρ*9.81*h/1000",
          "h = p_k*1000/(ρ*9.81)", "h = p/(ρ*9.81)", "V = sqrt(2*9.81*h)"}) {
        CAPTURE(formula);
        const auto r = run(hydrostatic + formula + "\n");
        CHECK(problems(r) == 0);
        CHECK(count(r, plumb::rules::gravity_number) == 1);
    }
}

TEST_CASE("gravity as a number: a missing g and the wrong numbers are still errors") {
    // No number at all: the classic missing g.
    CHECK(count(run(hydrostatic + "p = ρ*h\n"), plumb::rules::side_mismatch) == 1);
    // 10 is 2 % from g_n, more than a rounding: read as a plain number (common practice: some
    // rough hand calcs use g = 10, and a reviewer should see it).
    CHECK(count(run(hydrostatic + "p = ρ*10*h\n"), plumb::rules::side_mismatch) == 1);
    CHECK(count(run(hydrostatic + "p = ρ*2*h\n"), plumb::rules::side_mismatch) == 1);
    // g read, but the kPa beside Pa is still off by 1000.
    const auto kpa = run(hydrostatic + "p_k = ρ*9.81*h\n");
    CHECK(count(kpa, plumb::rules::unit_scale) == 1);
    CHECK(count(kpa, plumb::rules::gravity_number) == 1);
    // A factor not needed once g is read.
    CHECK(count(run(hydrostatic + "p = ρ*9.81*h*1000\n"), plumb::rules::unit_scale) == 1);
    // A term with g and a number 9.81 too: nothing is missing, so 9.81 is a plain number and
    // the sides differ by nothing; the product is simply 9.81 times too large.
    const auto both = run(hydrostatic + "p = ρ*{g_n}*h*9.81\n");
    CHECK(count(both, plumb::rules::gravity_number) == 0);
}

// The oilfield hydrostatic factor: 1 ppg over 1 ft gives 0.051948 psi (computed from NIST SP 811
// (2008) App. B: lb = 0.45359237 kg, gal = 3.785411784 L, ft = 0.3048 m, psi = 6894.757 Pa, and
// g_n); drilling sheets write 0.052 (common practice).
TEST_CASE("gravity as a number: 0.052 psi/ft per ppg in a mud hydrostatic") {
    const double per_ppg_ft = 0.45359237 / 3.785411784e-3 * 0.3048 * 9.80665 / 6894.757293168;
    CHECK(per_ppg_ft == doctest::Approx(0.051948).epsilon(1e-5));
    const std::string well = "MW : ppg\nTVD : ft\nTVD_m : m\np_h : psi\np_wh : psig\n"
                             "p_bh : psi\n";
    const auto right = run(well + "p_h = 0.052*MW*TVD\n");
    CHECK(problems(right) == 0);
    REQUIRE(count(right, plumb::rules::gravity_number) == 1);
    const auto note =
        std::find_if(right.diagnostics.begin(), right.diagnostics.end(),
                     [](const auto& d) { return d.rule == plumb::rules::gravity_number; });
    CHECK(note->message.find("0.051948") != std::string::npos);
    // Depth in metres with the feet factor: 0.052 is not g in those units.
    CHECK(problems(run(well + "p_h = 0.052*MW*TVD_m\n")) == 1);
    // Gauge wellhead plus the column plus the atmosphere is absolute; without it, it is not.
    CHECK(problems(run(well + "p_bh = p_wh + 14.696 + 0.052*MW*TVD\n")) == 0);
    CHECK(count(run(well + "p_bh = p_wh + 0.052*MW*TVD\n"), plumb::rules::offset_scale) == 1);
}

// Feet and pounds: h = p/(ρ g) with ρ in lb/ft^3 and p in lbf/ft^2 needs g_c too; with p in psf
// and ρ in slug/ft^3 the number is 32.2 ft/s² (g_n = 32.174 ft/s², NIST SP 811 App. B).
TEST_CASE("gravity as a number: 32.2 in foot units") {
    const std::string feet = "ρ_s : slug/ft^3\np_f : lbf/ft^2\nh_f : ft\n";
    const auto r = run(feet + "h_f = p_f/(ρ_s*32.2)\n");
    CHECK(problems(r) == 0);
    CHECK(count(r, plumb::rules::gravity_number) == 1);
    // The metric 9.81 in a foot calc is not g there.
    CHECK(problems(run(feet + "h_f = p_f/(ρ_s*9.81)\n")) == 1);
}
