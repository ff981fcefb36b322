// Standard gravity written as a number: the forms engineers type (9.81, 32.2, the oilfield's
// 0.052 psi/ft per ppg) are read as g_n with a note, and a missing g is still an error.
#include "check/gravity_number.hpp"
#include "plumb/check.hpp"
#include "plumb/rules.hpp"
#include "test_support.hpp"

#include <doctest/doctest.h>

#include <algorithm>
#include <initializer_list>
#include <numbers>
#include <string>

namespace {

using plumb::test::count_of;
using plumb::test::first_under;
using plumb::test::problems_in;
using plumb::test::says;
constexpr auto fails_with = plumb::test::each_fails_with;
constexpr auto passes = plumb::test::each_passes;

plumb::check_report run(const std::string& text) {
    return plumb::check_text("g.plumb", text);
}

// The message of the report's first finding under `rule`; fails the test when there is none.
std::string message_of(const plumb::check_report& r, std::string_view rule) {
    const auto found = std::find_if(r.diagnostics.begin(), r.diagnostics.end(),
                                    [&](const auto& d) { return d.rule == rule; });
    REQUIRE(found != r.diagnostics.end());
    return found->message;
}

// Each formula, after the declarations, passes with exactly one note under `rule`: the number
// read for the quantity it carries.
void passes_with_one_note(const std::string& declarations,
                          std::initializer_list<const char*> formulas, std::string_view rule) {
    for (const char* formula : formulas) {
        CAPTURE(formula);
        const auto r = run(declarations + formula + "\n");
        CHECK(problems_in(r) == 0);
        CHECK(count_of(r, rule) == 1);
    }
}

const std::string hydrostatic = "ρ : kg/m^3\nh : m\np : Pa\np_k : kPa\nV : m/s\n";

} // namespace

TEST_CASE("half a unit in the last printed digit") {
    CHECK(plumb::half_unit_in_last_digit("9.81") == doctest::Approx(0.005));
    CHECK(plumb::half_unit_in_last_digit("32") == doctest::Approx(0.5));
    CHECK(plumb::half_unit_in_last_digit("0.052") == doctest::Approx(0.0005));
    CHECK(plumb::half_unit_in_last_digit("9.8e3") == doctest::Approx(50.0));
    // Trailing zeros of a whole number place the point (common practice: 9810 N/m³ is the
    // 9.81 kN/m³ of the same calc).
    CHECK(plumb::half_unit_in_last_digit("9810") == doctest::Approx(5.0));
    CHECK(plumb::half_unit_in_last_digit("1000") == doctest::Approx(500.0));
    CHECK(plumb::half_unit_in_last_digit("0") == doctest::Approx(0.5));
}

// p = ρ g h with g_n = 9.80665 m/s² (3rd CGPM, 1901; SI Brochure 9th ed.); 9.81 and 9.8 are
// its usual roundings (common practice).
TEST_CASE("gravity as a number: ρ*9.81*h is a pressure, with a note") {
    passes_with_one_note(hydrostatic,
                         {"p = ρ*9.81*h", "p = ρ*9.8*h", "p = 9.807*ρ*h", "p_k = ρ*9.81*h/1000",
                          "h = p_k*1000/(ρ*9.81)", "h = p/(ρ*9.81)", "V = sqrt(2*9.81*h)"},
                         plumb::rules::gravity_number);
}

TEST_CASE("gravity as a number: a missing g and the wrong numbers are still errors") {
    // No number at all: the classic missing g.
    CHECK(count_of(run(hydrostatic + "p = ρ*h\n"), plumb::rules::side_mismatch) == 1);
    // 10 is 2 % from g_n, more than a rounding: read as a plain number (common practice: some
    // rough hand calcs use g = 10, and a reviewer should see it).
    CHECK(count_of(run(hydrostatic + "p = ρ*10*h\n"), plumb::rules::side_mismatch) == 1);
    CHECK(count_of(run(hydrostatic + "p = ρ*2*h\n"), plumb::rules::side_mismatch) == 1);
    // g read, but the kPa beside Pa is still off by 1000.
    const auto kpa = run(hydrostatic + "p_k = ρ*9.81*h\n");
    CHECK(count_of(kpa, plumb::rules::unit_scale) == 1);
    CHECK(count_of(kpa, plumb::rules::gravity_number) == 1);
    // A factor not needed once g is read.
    CHECK(count_of(run(hydrostatic + "p = ρ*9.81*h*1000\n"), plumb::rules::unit_scale) == 1);
    // A term with g and a number 9.81 too: nothing is missing, so 9.81 is a plain number and
    // the sides differ by nothing; the product is simply 9.81 times too large.
    const auto both = run(hydrostatic + "p = ρ*{g_n}*h*9.81\n");
    CHECK(count_of(both, plumb::rules::gravity_number) == 0);
}

// A Froude number is v/√(g·y) (Chow, Open-Channel Hydraulics, 1959, from memory), and a
// cold-store door's air exchange carries √(g·H) (Gosney and Olama, as ASHRAE Refrigeration
// prints it, from memory): a g left out of the root leaves the term √g apart.
TEST_CASE("a g left out of a square root is named as the square root of an acceleration") {
    const std::string decl = "Fr : 1\nv : m/s\ny : m\ng : m/s^2\n";
    const auto missing = run(decl + "Fr = v/sqrt(y)\n");
    REQUIRE(count_of(missing, plumb::rules::side_mismatch) == 1);
    CHECK(plumb::test::says(plumb::test::first_under(missing, plumb::rules::side_mismatch),
                            "is a g missing from a square root below it"));
    const auto extra = run(decl + "v = Fr*sqrt(y)\n");
    REQUIRE(count_of(extra, plumb::rules::side_mismatch) == 1);
    CHECK(plumb::test::says(plumb::test::first_under(extra, plumb::rules::side_mismatch),
                            "times \u221Ag it would match"));
    CHECK(run(decl + "Fr = v/sqrt(g*y)\n").diagnostics.empty());
}

TEST_CASE("gravity as a number: a head from a gauge reading with g left out says so") {
    // H = p/(ρ*g) (common practice); a gauge reading may give a head, so the slip is the
    // missing g, not the reading's zero.
    const std::string pump = "H : m\np_g : kPag\nρ_w : kg/m^3\ng : m/s^2\n";
    const auto missing = run(pump + "H = p_g*1000/ρ_w\n");
    CHECK(count_of(missing, plumb::rules::side_mismatch) == 1);
    CHECK(count_of(missing, plumb::rules::offset_scale) == 0);
    std::string said;
    for (const auto& d : missing.diagnostics)
        for (const auto& note : d.notes)
            said += note.message;
    CHECK(said.find("is a g missing") != std::string::npos);
    // With g it is a head, and a gauge reading's head is allowed.
    CHECK(run(pump + "H = p_g*1000/(ρ_w*g)\n").diagnostics.empty());
    // In a sum of heads the gauge's finding stands, and says what is missing first.
    const auto in_sum = run(pump + "z : m\nH = z + p_g*1000/ρ_w\n");
    REQUIRE(count_of(in_sum, plumb::rules::offset_scale) == 1);
    const auto& gauge_finding = plumb::test::first_under(in_sum, plumb::rules::offset_scale);
    REQUIRE_FALSE(gauge_finding.notes.empty());
    CHECK(gauge_finding.notes.front().message.find("g is missing") != std::string::npos);
    // The same quotient as a specific energy, where no head is asked for, stays the gauge's
    // finding.
    const auto energy = run("e : J/kg\np_g : kPag\nρ_w : kg/m^3\ne = p_g*1000/ρ_w\n");
    CHECK(count_of(energy, plumb::rules::offset_scale) == 1);
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
    CHECK(problems_in(right) == 0);
    REQUIRE(count_of(right, plumb::rules::gravity_number) == 1);
    CHECK(message_of(right, plumb::rules::gravity_number).find("0.051948") != std::string::npos);
    // Depth in metres with the feet factor: 0.052 is not g in those units.
    CHECK(problems_in(run(well + "p_h = 0.052*MW*TVD_m\n")) == 1);
    // Gauge wellhead plus the column plus the atmosphere is absolute; without it, it is not.
    CHECK(problems_in(run(well + "p_bh = p_wh + 14.696 + 0.052*MW*TVD\n")) == 0);
    CHECK(count_of(run(well + "p_bh = p_wh + 0.052*MW*TVD\n"), plumb::rules::offset_scale) == 1);
}

// Feet and pounds: h = p/(ρ g) with ρ in lb/ft^3 and p in lbf/ft^2 needs g_c too; with p in psf
// and ρ in slug/ft^3 the number is 32.2 ft/s² (g_n = 32.174 ft/s², NIST SP 811 App. B).
TEST_CASE("gravity as a number: in 2*9.81 the 9.81 is g, not the 2 twice it") {
    // h_v = V²/(2g) (common practice): the note marks the number that is g.
    const auto r = run("h : m\nv : m/s\nh = v^2/(2*9.81)\n");
    REQUIRE(count_of(r, plumb::rules::gravity_number) == 1);
    CHECK(plumb::test::first_under(r, plumb::rules::gravity_number).message.find("'9.81'") !=
          std::string::npos);
}

TEST_CASE("gravity as a number: twice a rounded g in a velocity head") {
    // h_v = V²/(2g) (common practice): 19.62 = 2 × 9.81 and 64.4 = 2 × 32.2, twice g rounded
    // as sheets round it, though 2·g_n is 19.613 and 64.348 (g_n = 9.80665 m/s², 3rd CGPM).
    const std::string head = "h_v : m\nV : m/s\nh_f : ft\nV_f : ft/s\n";
    for (const char* formula : {"h_v = V^2/19.62", "h_f = V_f^2/64.4", "h_v = V^2/19.6"}) {
        CAPTURE(formula);
        const auto r = run(head + formula + "\n");
        CHECK(problems_in(r) == 0);
        CHECK(count_of(r, plumb::rules::gravity_number) == 1);
    }
    // 19.7 is no twice of any rounded g (its half, 9.85, rounds none), nor is 20.
    CHECK(count_of(run(head + "h_v = V^2/19.7\n"), plumb::rules::side_mismatch) == 1);
    CHECK(count_of(run(head + "h_v = V^2/20\n"), plumb::rules::side_mismatch) == 1);
}

TEST_CASE("gravity as a number: 32.2 in foot units") {
    const std::string feet = "ρ_s : slug/ft^3\np_f : lbf/ft^2\nh_f : ft\n";
    const auto r = run(feet + "h_f = p_f/(ρ_s*32.2)\n");
    CHECK(problems_in(r) == 0);
    CHECK(count_of(r, plumb::rules::gravity_number) == 1);
    // The metric 9.81 in a foot calc is not g there.
    CHECK(problems_in(run(feet + "h_f = p_f/(ρ_s*9.81)\n")) == 1);
}

namespace {
// The note of the report's first finding under `rule` that holds `words`, or "".
std::string note_with(const plumb::check_report& r, std::string_view rule, std::string_view words) {
    for (const auto& d : r.diagnostics)
        if (d.rule == rule)
            for (const auto& n : d.notes)
                if (n.message.find(words) != std::string::npos)
                    return n.message;
    return "";
}
} // namespace

TEST_CASE("gravity as a number beside the other system's units: the finding says so") {
    // 1 ft = 0.3048 m exactly (NIST SP 811 (2008), B.8), so g_n written for metres beside a
    // length in feet, or for feet beside metres, leaves the term off by 1/0.3048 = 3.28084.
    const std::string mixed = "z_ft : ft\nz : m\nu : J/kg\nρ : kg/m^3\nh_ft : ft\np_1, p_2 : Pa\n";
    const auto metric_g = run(mixed + "u = 9.81*z_ft\n");
    REQUIRE(count_of(metric_g, plumb::rules::side_mismatch) == 1);
    const std::string note = note_with(metric_g, plumb::rules::side_mismatch, "standard gravity");
    CHECK(note.find("9.81 is standard gravity in m/s") != std::string::npos);
    CHECK(note.find("3.28084 times") != std::string::npos);
    const auto foot_g = run(mixed + "u = 32.2*z\n");
    CHECK(
        note_with(foot_g, plumb::rules::side_mismatch, "32.2 is standard gravity in ft/s").size() >
        0);
    const auto column = run(mixed + "p_2 = p_1 + ρ*9.81*h_ft\n");
    CHECK(note_with(column, plumb::rules::sum_mismatch, "3.28084 times").size() > 0);
    // Not said where the units are right and the slip is elsewhere (a missing density).
    const auto no_density = run(mixed + "p_2 = p_1 + 9.81*z\n");
    CHECK(note_with(no_density, plumb::rules::sum_mismatch, "standard gravity").empty());
}

// A velocity head V²/(2g) in ft with g typed for metres, 2*9.81 or 19.62 (the velocity head
// of any hydraulics text; g_n = 9.80665 m/s² = 32.174 ft/s², NIST SP 811 (2008), B.8): the
// finding names the metric g, where it once asked whether a g was missing.
TEST_CASE("gravity typed for the other system under a velocity head") {
    const std::string d = "h_ft : ft\nV : ft/s\nh_m : m\nV_m : m/s\n";
    for (const char* formula : {"h_ft = V^2/(2*9.81)", "h_ft = V^2/19.62"}) {
        CAPTURE(formula);
        const auto r = run(d + formula + "\n");
        REQUIRE(count_of(r, plumb::rules::side_mismatch) == 1);
        CHECK(note_with(r, plumb::rules::side_mismatch, "standard gravity in m/s").size() > 0);
        CHECK(note_with(r, plumb::rules::side_mismatch, "3.28084 times").size() > 0);
    }
    const auto foot_g = run(d + "h_m = V_m^2/(2*32.2)\n");
    CHECK(note_with(foot_g, plumb::rules::side_mismatch, "standard gravity in ft/s").size() > 0);
    CHECK(problems_in(run(d + "h_m = V_m^2/(2*9.81)\n")) == 0);
}

// A pore pressure u = γ_w·z_w in kPa from m with water's 62.4 lbf/ft³ typed in (ρ_w·g_n =
// 9.807 kN/m³ at 1000 kg/m³; NIST SP 811 (2008), B.8): the sides differ by exactly a specific
// weight, and the finding gives water's in the units written, 9.81.
TEST_CASE("a specific weight typed for the other system names water's in the units written") {
    const auto r = run("u_b : kPa\nz_w : m\nu_b = 62.4*z_w\n");
    REQUIRE(count_of(r, plumb::rules::side_mismatch) == 1);
    CHECK(note_with(r, plumb::rules::side_mismatch, "is about 9.81 in the units written here")
              .size() > 0);
}

// Water's specific weight written as a number, γ_w = ρ_w·g_n with ρ_w from 995.65 to 999.975
// kg/m³ between 0 and 30 °C (CRC Handbook of Chemistry and Physics; from memory). Each printed
// number is worked out here from NIST SP 811 (2008) App. B factors (ft = 0.3048 m, lbf =
// 4.4482216152605 N, psi = 6894.757293168 Pa, US gal = 3.785411784e-3 m³, hp = 745.69987158 W)
// and must lie within its rounding of that range; the trade prints 62.4, 0.433, 2.31, 3960 and
// 367 (common practice).
TEST_CASE("water's specific weight as a number: the trade's printed values are in range") {
    const double least = 995.65 * 9.80665;
    const double greatest = 999.975 * 9.80665;
    const double lbf_per_ft3 = 4.4482216152605 / (0.3048 * 0.3048 * 0.3048);
    const double psi_per_ft = 6894.757293168 / 0.3048;
    CHECK(least / lbf_per_ft3 <= 62.45);
    CHECK(greatest / lbf_per_ft3 >= 62.35);
    CHECK(least / psi_per_ft <= 0.4335);
    CHECK(greatest / psi_per_ft >= 0.4325);
    CHECK(psi_per_ft / greatest <= 2.315);
    // hp per (gpm·ft) over γ_w: water horsepower Q·H/3960.
    const double gpm_ft = 3.785411784e-3 / 60.0 * 0.3048;
    CHECK(745.69987158 / (greatest * gpm_ft) <= 3960.5);
    CHECK(745.69987158 / (least * gpm_ft) >= 3959.5);
    // kW per (m³/h·m) over γ_w: P = Q·H/367.
    CHECK(3600.0 * 1000.0 / greatest <= 367.5);
}

TEST_CASE("water's specific weight as a number: pump power and pressure head pass with a note") {
    const std::string pump = "Q_gpm : gal/min\nH_ft : ft\nSG : 1\nη : 1\nP_hp : hp\n"
                             "p_psi : psi\nh_ft : ft\nQ_m3h : m^3/h\nH_m : m\nP_kW : kW\n"
                             "p_kPa : kPa\nh_m : m\np_Pa : Pa\np_psf : lbf/ft^2\n";
    passes_with_one_note(pump,
                         {"P_hp = Q_gpm*H_ft*SG/(3960*η)", "P_kW = Q_m3h*H_m*SG/(367*η)",
                          "p_psi = 0.433*h_ft*SG", "h_ft = 2.31*p_psi/SG", "p_kPa = 9.81*h_m*SG",
                          "p_Pa = 9810*h_m", "p_psf = 62.4*h_ft", "p_kPa = 9.79*h_m"},
                         plumb::rules::gravity_number);
    SUBCASE("the note names the water and the range") {
        const std::string note =
            message_of(run(pump + "h_ft = 2.31*p_psi/SG\n"), plumb::rules::gravity_number);
        CHECK(note.find("one over the specific weight of water") != std::string::npos);
        CHECK(note.find("2.306 to 2.317") != std::string::npos);
    }
    SUBCASE("the mistakes are still found") {
        // A missing g: 1000 kg/m³ times a head is not a pressure.
        CHECK(count_of(run(pump + "p_Pa = 1000*h_m\n"), plumb::rules::side_mismatch) == 1);
        // The kN/m³ number beside Pa: read as γ_w, and the 1000 is named.
        const auto pa = run(pump + "p_Pa = 9.81*h_m\n");
        CHECK(count_of(pa, plumb::rules::unit_scale) == 1);
        // The factors written the wrong way round: named as such.
        const auto upside = run(pump + "P_hp = Q_gpm*H_ft*SG*3960/η\n");
        CHECK(problems_in(upside) == 1);
        REQUIRE(count_of(upside, plumb::rules::unit_scale) == 1);
        CHECK(message_of(upside, plumb::rules::unit_scale).find("3960 is the wrong way round") !=
              std::string::npos);
        CHECK(problems_in(run(pump + "h_ft = p_psi/(2.31*SG)\n")) == 1);
        CHECK(problems_in(run(pump + "P_kW = Q_m3h*H_m*SG*367/η\n")) == 1);
        // A bare number in a sum is read when it is the whole quantity: the buoyant unit weight
        // (γ_sat - γ_w) with γ_w = 9.81 kN/m³ (common practice), but not a 10 % error.
        const std::string soil = "γ_sat : kN/m^3\nz : m\nσ : kPa\n";
        const auto buoyant = run(soil + "σ = (γ_sat - 9.81)*z\n");
        CHECK(problems_in(buoyant) == 0);
        CHECK(count_of(buoyant, plumb::rules::gravity_number) == 1);
        CHECK(count_of(run(soil + "σ = (γ_sat - 9)*z\n"), plumb::rules::sum_mismatch) == 1);
        // Too far from any water: 0.45 psi/ft is 4 % off (a brine's gradient needs its SG).
        CHECK(problems_in(run(pump + "p_psi = 0.45*h_ft\n")) == 1);
        // 62.4 with the head in metres is not water in those units.
        CHECK(problems_in(run(pump + "p_psf = 62.4*h_m\n")) == 1);
    }
}

// A pump's total head in feet from a gauge reading in psi (2.31 ft of water per psi, common
// practice) plus static heights surveyed in metres and converted (1 ft = 0.3048 m exactly,
// NIST SP 811 (2008), B.8): no term of the sum is plainly in feet, so 2.31 is read against
// the equation's other side. Unconverted metres, or a head in metres, stay errors.
TEST_CASE("water's specific weight as a number beside heights converted from metres") {
    const std::string decl = "H_ft : ft\nH_m : m\np : psi\nz_s, h_m : m\n";
    passes_with_one_note(decl,
                         {"H_ft = 2.31*p + (z_s + h_m)/0.3048", "H_ft = 2.31*p + 3.281*z_s",
                          "H_ft = 2.31*p + z_s/0.3048", "H_m = 0.703*p + z_s"},
                         plumb::rules::gravity_number);
    CHECK(problems_in(run(decl + "H_ft = 2.31*p + z_s\n")) == 1);
    CHECK(problems_in(run(decl + "H_m = 2.31*p + z_s\n")) == 1);
}

// The gas law's constant as the gas trades type it: R = 8.314462618 J/(mol·K) (CODATA 2018)
// is 10.732 psia·ft³/(lbmol·°R) with 1 lbmol = 453.59237 mol and the NIST SP 811 (2008), B.8
// factors; a gas's molar mass as 28.97 times its specific gravity (dry air's 28.96 to 28.97
// g/mol, common practice). Each passes with a note; R in the wrong units stays an error.
TEST_CASE("the molar gas constant and air's molar mass typed as numbers") {
    const std::string decl = "ρ : lb/ft^3\np : psia\nM : lb/lbmol\nT : °R\nz : 1\nSG : 1\n"
                             "V : ft^3\nn : lbmol\nV_m : m^3\nn_m : mol\np_Pa : Pa\nT_K : K\n";
    passes_with_one_note(
        decl,
        {"ρ = p*M/(z*10.73*T)", "M = 28.97*SG", "p*V = n*10.73*T", "p_Pa*V_m = n_m*8.314*T_K"},
        plumb::rules::trade_constant);
    CHECK(problems_in(run(decl + "ρ = p*M/(z*8.314*T)\n")) == 1);
    CHECK(problems_in(run(decl + "M = 18.02*SG\n")) == 1);
}

// Dry air's specific gas constant R/M_a = 8.314462618/0.0289647 = 287.05 J/(kg·K) (CODATA
// 2018; ISO 2533's molar mass, from memory), typed 0.287 beside kPa, 287 beside Pa and 53.35
// in ft·lbf/(lb·°R): ρ = p/(R·T), with a note. 287 beside kPa is 1000 off; a °C reading in
// place of the absolute temperature is still an error.
TEST_CASE("dry air's gas constant typed as a number") {
    const std::string decl = "ρ : kg/m^3\np_b : kPa\nt_a : °C\nT : K\np : Pa\n"
                             "ρ_lb : lb/ft^3\np_psf : lbf/ft^2\nT_R : °R\n";
    passes_with_one_note(
        decl, {"ρ = p_b/(0.287*(t_a + 273.15))", "ρ = p/(287*T)", "ρ_lb = p_psf/(53.35*T_R)"},
        plumb::rules::trade_constant);
    CHECK(count_of(run(decl + "ρ = p_b/(287*T)\n"), plumb::rules::unit_scale) == 1);
    CHECK(count_of(run(decl + "ρ = p_b/(0.287*t_a)\n"), plumb::rules::offset_scale) == 1);
}

// A hot gas's density at ambient pressure, ρ = 353/T from kelvins (smoke control, CIBSE Guide E,
// from memory): 353 = p_0/R_a = 101325/287.05 kg·K/m³ (as above). A °C reading in its place is
// still an error, and 353 beside a temperature that multiplies is no density.
TEST_CASE("one atmosphere over air's gas constant, the 353 of a smoke layer's density") {
    const std::string decl = "ρ_s : kg/m^3\nT_s : K\nt_s : °C\n";
    passes_with_one_note(decl, {"ρ_s = 353/T_s", "ρ_s = 353/(t_s + 273.15)"},
                         plumb::rules::trade_constant);
    CHECK(count_of(run(decl + "ρ_s = 353/t_s\n"), plumb::rules::offset_scale) == 1);
    CHECK(problems_in(run(decl + "ρ_s = 353*T_s\n")) == 1);
    CHECK(problems_in(run(decl + "ρ_s = 35.3/T_s\n")) == 1);
}

// A gauge pressure over a specific weight is a head above the level where the pressure is
// atmospheric, over an area the net force where the atmosphere acts on the other face, and the
// pressure of a column, ρ g h, is what a gauge at its foot reads (common practice; e.g. Çengel
// and Cimbala, Fluid Mechanics, Sec. 3-1, from memory). Gas laws, work and ratios of gauge
// pressures stay errors.
TEST_CASE("gauge pressures: heads, forces and columns pass; gas laws, work and ratios do not") {
    const std::string gauge = "p_g : kPag\np_psig : psig\nρ : kg/m^3\nh : m\nh_ft : ft\n"
                              "R_a : J/(kg*K)\nT : K\nV_1, V_2 : m^3\np_2 : kPag\nA : m^2\nF : N\n"
                              "A_in2 : in^2\nF_lbf : lbf\nW : J\n";
    for (const char* formula :
         {"h = p_g*1000/(ρ*{g_n})", "h = 1000*p_g/(ρ*{g_n})", "p_g = ρ*{g_n}*h/1000",
          "h_ft = 2.31*p_psig", "p_g = ρ*9.81*h/1000", "F = p_g*1000*A", "F_lbf = p_psig*A_in2"}) {
        CAPTURE(formula);
        CHECK(problems_in(run(gauge + formula + "\n")) == 0);
    }
    for (const char* formula : {"p_g = ρ*R_a*T/1000", "p_2 = p_g*V_1/V_2", "h = p_g/(ρ*{g_n})*V_1",
                                "W = p_g*1000*V_1", "ρ = p_g*1000/(R_a*T)"}) {
        CAPTURE(formula);
        CHECK(count_of(run(gauge + formula + "\n"), plumb::rules::offset_scale) == 1);
    }
    // A head with g left out is reported as the missing g it is.
    CHECK(count_of(run(gauge + "h = p_g*1000/ρ\n"), plumb::rules::side_mismatch) == 1);
    // The kPa of the gauge still needs its 1000 once the head is read.
    CHECK(count_of(run(gauge + "h = p_g/(ρ*{g_n})\n"), plumb::rules::unit_scale) == 1);
}

// The HVAC trade's load numbers carry a volume's heat capacity, ρ·c_p. Worked out here from NIST
// SP 811 (2008) App. B (Btu_IT/h = 0.29307107 W, ft³ = 0.028316846592 m³, US gal =
// 3.785411784e-3 m³, Δ°F = 5/9 K): 1.08 Btu/h per cfm·°F is 1207 J/(m³·K), inside dry air's
// 1133-1301 between 0 and 40 °C at 101.325 kPa; 500 Btu/h per gpm·°F is 4181 kJ/(m³·K),
// inside water's 4162-4219 between 0 and 30 °C (the ranges: see check/gravity_number.cpp).
TEST_CASE("heat capacity of a volume as a number: the trade's 1.08 and 500") {
    const double btu_per_h = 0.29307107;
    const double per_cfm_degree_f = 0.028316846592 / 60.0 * 5.0 / 9.0;
    const double per_gpm_degree_f = 3.785411784e-3 / 60.0 * 5.0 / 9.0;
    CHECK(1.08 * btu_per_h / per_cfm_degree_f == doctest::Approx(1207.4).epsilon(1e-3));
    CHECK(500.0 * btu_per_h / per_gpm_degree_f == doctest::Approx(4180.7e3).epsilon(1e-3));
    const std::string hvac = "Q : Btu/h\ncfm : ft^3/min\ngpm : gal/min\nq : L/s\n"
                             "ΔT : Δ°F\nΔT_K : K\nP : W\nT_1, T_2 : °F\n";
    passes_with_one_note(hvac,
                         {"Q = 1.08*cfm*ΔT", "Q = 500*gpm*ΔT", "P = 1.2*q*ΔT_K", "P = 4190*q*ΔT_K",
                          "Q = 1.1*cfm*(T_1 - T_2)"},
                         plumb::rules::trade_constant);
    // Air's number on water, water's on air, litres per second with the cfm number, and a
    // number that is no heat capacity: each stays an error.
    for (const char* formula : {"Q = 1.08*gpm*ΔT", "Q = 500*cfm*ΔT", "Q = 1.08*q*ΔT",
                                "Q = 1.5*cfm*ΔT", "P = 1.2*q*ΔT_K*1000"}) {
        CAPTURE(formula);
        CHECK(problems_in(run(hvac + formula + "\n")) == 1);
    }
}

// The hydronic trade's 500 for a water-glycol loop: ρ·c_p of 20 to 50 % ethylene or propylene
// glycol between -10 and 40 °C is about 3.45 to 4.10 MJ/(m³·K) (ASHRAE Handbook—Fundamentals,
// the glycol tables, from memory), 413 to 490 in Btu/(h·gpm·°F) (NIST SP 811 (2008), B.8, as
// the case above works out). Printed in 400s it is a note naming the mix; water's own number
// with air's flow, the glycol figure on a cfm, and one that divides stay errors.
TEST_CASE("the hydronic 500 printed for a water-glycol mix") {
    const std::string loop = "Q : Btu/h\nQ_k : kW\ngpm : gal/min\ncfm : ft^3/min\nΔT : Δ°F\n";
    passes_with_one_note(
        loop, {"gpm = Q/(465*ΔT)", "gpm = 3412*Q_k/(450*ΔT)", "Q = 485*gpm*ΔT", "Q = 430*gpm*ΔT"},
        plumb::rules::trade_constant);
    CHECK(message_of(run(loop + "Q = 465*gpm*ΔT\n"), plumb::rules::trade_constant)
              .find("a water-glycol mix") != std::string::npos);
    for (const char* formula : {"Q = 465*cfm*ΔT", "Q = 380*gpm*ΔT", "Q = gpm*ΔT/465"}) {
        CAPTURE(formula);
        CHECK(problems_in(run(loop + formula + "\n")) == 1);
    }
}

// The air trade's moisture numbers (common practice), worked out here from NIST SP 811 (2008)
// App. B (lb = 0.45359237 kg, ft³ = 0.028316846592 m³, grain = 64.79891 mg, Btu_IT/h =
// 0.29307107 W): 4.5 lb/h per cfm is 1.201 kg/m³ of air, inside dry air's 1.13-1.29 between 0
// and 40 °C at 101.325 kPa; 0.68 Btu/h per cfm per gr/lb is 2.956 MJ/m³, ρ_a·h_fg with h_fg
// 2460 kJ/kg, inside 2.71-3.23. Read only in a term that is a volume flow times numbers.
TEST_CASE("the air trade's moisture numbers: 4.5, 0.68 and 4840") {
    const double cfm = 0.028316846592 / 60.0;
    CHECK(4.5 * 0.45359237 / 3600.0 / cfm == doctest::Approx(1.2014).epsilon(1e-3));
    CHECK(0.68 * 0.29307107 / (cfm / 7000.0) == doctest::Approx(2.956e6).epsilon(1e-3));
    const std::string air = "measure gr = 64.79891 mg\nq_L : Btu/h\nQ_cfm : cfm\n"
                            "W_1, W_2 : gr/lb\nw_1, w_2 : 1\nm_lb : lb/h\nm : kg\nV : m^3\n"
                            "F : MN\nA : m^2\n";
    passes_with_one_note(air,
                         {"q_L = 0.68*Q_cfm*(W_2 - W_1)", "q_L = 4840*Q_cfm*(w_2 - w_1)",
                          "m_lb = 4.5*Q_cfm*(W_2 - W_1)/7000", "m_lb = 4.5*Q_cfm*(w_2 - w_1)"},
                         plumb::rules::trade_constant);
    // The grains not converted, the density left out, grains' number on lb/lb, and the same
    // numbers where no volume flows: each stays an error.
    for (const char* formula : {"m_lb = 4.5*Q_cfm*(W_2 - W_1)", "m_lb = Q_cfm*(w_2 - w_1)",
                                "q_L = 0.68*Q_cfm*(w_2 - w_1)", "m = 1.2*V", "F = 3*A"}) {
        CAPTURE(formula);
        CHECK(problems_in(run(air + formula + "\n")) == 1);
    }
}

// The moisture load solved for the outdoor air that carries it away, Q = m/(4.5·ΔW) in cfm
// from lb/h (common practice; 4.5 = 0.075 lb/ft³ × 60 min/h): the flow is the other side,
// and the 4.5 below is air's density as it is above. Without the 4.5 the density is missing;
// with grains and no 7000 the unit is off.
TEST_CASE("the air trade's 4.5 below the line, the load solved for the flow") {
    const std::string air = "measure gr = 64.79891 mg\nQ_cfm : cfm\nW_1, W_2 : gr/lb\n"
                            "w_1, w_2 : 1\nm_lb : lb/h\n";
    passes_with_one_note(air,
                         {"Q_cfm = m_lb/(4.5*(w_1 - w_2))", "Q_cfm = 7000*m_lb/(4.5*(W_1 - W_2))"},
                         plumb::rules::trade_constant);
    fails_with(air, {"Q_cfm = m_lb/(w_1 - w_2)"}, plumb::rules::side_mismatch);
    fails_with(air, {"Q_cfm = m_lb/(4.5*(W_1 - W_2))"}, plumb::rules::unit_scale);
}

// Water's molar concentration: ρ_w/M_w, 998.2 kg/m³ at 20 °C (CRC Handbook, from memory) over
// 18.015 g/mol (IUPAC standard atomic weights, from memory), 55.41 kmol/m³; a Henry constant
// on the mole-fraction basis over 55.5 is the same on the concentration basis for dilute water
// (common practice). The hours of a year: 8760 (365 d), in annual energies (common practice).
TEST_CASE("water's molar concentration and the hours of a year as numbers") {
    CHECK(998.2 / 18.015 == doctest::Approx(55.41).epsilon(1e-3));
    const std::string decl = "H_x : bar\nH_c : bar*m^3/kmol\nE_MWh : MWh\nP_kW : kW\n"
                             "E_kWh : kWh\nL_d : m\n";
    passes_with_one_note(decl, {"H_c = H_x/55.5", "E_MWh = P_kW*8760/1000", "P_kW = E_kWh/8760"},
                         plumb::rules::trade_constant);
    // The 1000 left out, days for hours, and 55.5 where no amount is missing stay findings.
    for (const char* formula :
         {"E_MWh = P_kW*8760", "E_MWh = P_kW*365/1000", "H_c = H_x/56.5", "L_d = 55.5"}) {
        CAPTURE(formula);
        CHECK(problems_in(run(decl + formula + "\n")) == 1);
    }
}

// The same density of air in a coil's total load from the enthalpy difference (ASHRAE
// Fundamentals, ch. 1 and the air trade's q = 4.5·cfm·Δh in Btu/h with h in Btu/lb, 1.2·(L/s)·Δh
// in W with h in kJ/kg; common practice): 1.2 kg/m³ × 0.001 m³/s × 1000 J/kg is 1.2 W.
TEST_CASE("the density of air in a total load from an enthalpy difference") {
    const std::string decl = "q_B : Btu/h\nQ_cfm : cfm\nh_1B, h_2B : Btu/lb\nq_W : W\nq_kW : kW\n"
                             "Q_ls : L/s\nh_1, h_2 : kJ/kg\n";
    passes_with_one_note(decl, {"q_B = 4.5*Q_cfm*(h_1B - h_2B)", "q_W = 1.20*Q_ls*(h_1 - h_2)"},
                         plumb::rules::trade_constant);
    // kW for W, kJ/kg in the I-P form, and the density left out stay findings.
    for (const char* formula : {"q_kW = 1.20*Q_ls*(h_1 - h_2)", "q_B = 4.5*Q_cfm*(h_1 - h_2)",
                                "q_W = Q_ls*(h_1 - h_2)"}) {
        CAPTURE(formula);
        CHECK(problems_in(run(decl + formula + "\n")) >= 1);
    }
}

// Alkalinity in mg/L as CaCO3 to meq/L: over 50, calcium carbonate's equivalent weight
// (100.09 g/mol over 2, IUPAC standard atomic weights, from memory; common practice).
TEST_CASE("calcium carbonate's equivalent weight as a number") {
    CHECK(100.09 / 2.0 == doctest::Approx(50.04).epsilon(1e-4));
    const std::string decl = "Alk_m : mmol/L\nAlk : mg/L\n";
    passes_with_one_note(decl, {"Alk_m = Alk/50"}, plumb::rules::trade_constant);
    CHECK(problems_in(run(decl + "Alk_m = Alk/61\n")) == 1);
    CHECK(problems_in(run(decl + "Alk_m = Alk*50\n")) >= 1);
}

// ppm by volume to mass concentration: c = C·M/V_m, with V_m = R·T/p (R = 8.314462618 J/(mol·K),
// CODATA 2018): 24.465 L/mol at 25 °C and 101.325 kPa, which the air trade prints as 24.45;
// 385.3 scf/lbmol at 68 °F (ft³ = 0.028316846592 m³, lb = 0.45359237 kg: NIST SP 811 (2008)
// App. B). The numbers are worked out here, then read in formulas.
TEST_CASE("molar volume as a number: it follows the gas volumes' reference state") {
    // V_m = R·T/p at 101.325 kPa (CODATA 2018): 22.414 L/mol at 0 °C, the normal cubic metre's
    // (DIN 1343), 23.645 at 15 °C, the standard cubic metre's (ISO 13443), 24.465 at 25 °C.
    CHECK(8.314462618 * 273.15 / 101325.0 * 1000.0 == doctest::Approx(22.414).epsilon(1e-4));
    CHECK(8.314462618 * 288.15 / 101325.0 * 1000.0 == doctest::Approx(23.645).epsilon(1e-4));
    const std::string stack = "C : ppm\nM : g/mol\nc_n : mg/Nm3\nc_s : mg/Sm3\nE : lb/h\n"
                              "Q_s : scf/min\n";
    passes_with_one_note(stack,
                         {"c_n = C*M/22.41", "c_n = C*M/22.4", "c_s = C*M/23.64", "C = c_n*22.4/M",
                          "E = C*M*Q_s*60/379.5e6",
                          // 385.3 scf/lbmol at 68 °F, the US air trade's, beside a
                          // 60 °F standard cubic foot: within 2 %, its convention.
                          "E = C*M*Q_s*60/385.3e6"},
                         plumb::rules::trade_constant);
    // 24.45 (25 °C) into mg/Nm³ (0 °C): 22.41/24.45, 8.3 % low; the other way, 9.1 % high.
    const auto low = run(stack + "c_n = C*M/24.45\n");
    REQUIRE(count_of(low, plumb::rules::unit_scale) == 1);
    CHECK(plumb::test::says(plumb::test::first_under(low, plumb::rules::unit_scale),
                            "8.3 % too small"));
    CHECK(plumb::test::says(plumb::test::first_under(low, plumb::rules::unit_scale), "22.41"));
    const auto high = run(stack + "C = c_n*24.45/M\n");
    CHECK(plumb::test::says(plumb::test::first_under(high, plumb::rules::unit_scale),
                            "9.1 % too large"));
    CHECK(count_of(run(stack + "c_s = C*M/24.45\n"), plumb::rules::unit_scale) == 1);
    // 359 scf/lbmol is the 0 °C one (379.5 × 273.15/288.71): said as 0 °C, never "-0 °C".
    const auto ice = run(stack + "E = C*M*Q_s*60/359e6\n");
    CHECK(
        plumb::test::says(plumb::test::first_under(ice, plumb::rules::unit_scale), "at 0 \u00B0C"));
    CHECK_FALSE(plumb::test::says(plumb::test::first_under(ice, plumb::rules::unit_scale), "-0"));
}

// A membrane bioreactor's specific aeration demand, SAD_m = Q_air/A_m in Nm³/(m²·h) (Judd, The
// MBR Book, 2nd ed., 2011; from memory), is stated at reference conditions itself and is no
// gas's speed; a speed in m/s from a normal flow still takes the gas's state.
TEST_CASE("a rate per area stated at reference conditions is no velocity") {
    const std::string decl = "A_m, A_d : m^2\nQ_air : Nm3/h\nSAD_m : Nm3/(m^2*h)\nv : m/s\n";
    CHECK(problems_in(run(decl + "SAD_m = Q_air/A_m\n")) == 0);
    CHECK(count_of(run(decl + "v = Q_air/3600/A_d\n"), plumb::rules::unit_scale) == 1);
}

TEST_CASE("molar volume as a number: ppm conversions") {
    const double at_25_c = 8.314462618 * 298.15 / 101325.0 * 1000.0; // L/mol
    CHECK(at_25_c == doctest::Approx(24.465).epsilon(1e-4));
    const double at_68_f = 8.314462618 * (20.0 + 273.15) / 101325.0; // m³/mol
    CHECK(at_68_f / 0.028316846592 * 453.59237 == doctest::Approx(385.3).epsilon(5e-4));
    const std::string air = "C : ppm\nM : g/mol\nc : mg/m^3\nQ_s : ft^3/min\nE : lb/h\n"
                            "E_k : kg/h\nQ_n : m^3/h\n";
    passes_with_one_note(air, {"c = C*M/24.45", "E = C*M*Q_s*60/385.3e6", "E_k = C*M*Q_n/22.4/1e6"},
                         plumb::rules::trade_constant);
    // Upside down; the metric number with feet and pounds; an hour's 3600 the units do not
    // need beside the 10⁶ they do.
    CHECK(count_of(run(air + "c = C*M*24.45\n"), plumb::rules::unit_scale) == 1);
    CHECK(problems_in(run(air + "E = C*M*Q_s*60/24.45e6\n")) == 1);
    const auto extra = run(air + "E_k = C*M*Q_n/22.4/1e6*3600\n");
    CHECK(count_of(extra, plumb::rules::unit_scale) == 1);
    // The same with the molar volume declared: the rule is about the 3600, not the 22.4.
    CHECK(count_of(run(air + "V_m : L/mol = 22.4\nE_k = C*M*Q_n/V_m/1e6*3600\n"),
                   plumb::rules::unit_scale) == 1);
    CHECK(problems_in(run(air + "V_m : L/mol = 22.4\nE_k = C*M*Q_n/V_m/1e6\n")) == 0);
    // Two conversions that are both needed stay clean: m³/h to L/s.
    CHECK(problems_in(run("Q_h : m^3/h\nQ_l : L/s\nQ_l = Q_h*1000/3600\n")) == 0);
}

// Water's density written as a number: 8.34 lb/gal and 62.4 lb/ft³ (common practice) and 1000
// kg/m³, inside 995.65-999.975 kg/m³ between 0 and 30 °C (CRC Handbook, from memory) once
// converted with NIST SP 811 (2008) App. B factors (lb = 0.45359237 kg, gal = 3.785411784e-3
// m³, ft³ = 0.028316846592 m³).
TEST_CASE("water's density as a number: 8.34 lb/gal, 62.4 lb/ft³, 1000 kg/m³") {
    CHECK(8.34 * 0.45359237 / 3.785411784e-3 == doctest::Approx(999.4).epsilon(1e-3));
    CHECK(62.4 * 0.45359237 / 0.028316846592 == doctest::Approx(999.6).epsilon(1e-3));
    const std::string water = "W : lb\nV_g : gal\nV_f : ft^3\nm : kg\nV : m^3\nSG : 1\n"
                              "W_d : lb/d\nq : gal/d\n";
    passes_with_one_note(water, {"V_g = W/8.34", "V_f = W/62.4", "m = 1000*V", "q = W_d/(8.34*SG)"},
                         plumb::rules::trade_constant);
    // A missing density, the number upside down, and a density 10 % off stay errors.
    for (const char* formula : {"m = V", "V_g = W*8.34", "m = 900*V"}) {
        CAPTURE(formula);
        CHECK(problems_in(run(water + formula + "\n")) == 1);
    }
}

// Power and torque meet through the 2π radians of a revolution, P = 2π·n·M (ISO 80000-4,
// power as torque times angular velocity; from memory). The trades fold the 2π into their
// constants: M = 9549·P/n in N·m from kW and rpm, T = 5252·hp/n in lbf·ft (common practice),
// and ρ = 191.5·a·R in Ω·cm with the pin spacing a in ft (2π × 30.48, the Wenner array of ASTM
// G57; from memory). Revolutions count as cycles, so the same formulas without the 2π agree
// in units as written: that is reported where a torque, a power and a speed in revolutions
// meet with no π.
TEST_CASE("a revolution's 2π between power, torque and speed") {
    const std::string decl = "M : N*m\nM_k : kN*m\nP : kW\nP_w : W\nn : rpm\nT_lb : lbf*ft\n"
                             "hp : hp\nω : rad/s\nn_2 : rpm\nρ_cm : ohm*cm\na_ft : ft\nR_w : ohm\n";
    for (const char* formula : {"M = 9550*P/n", "M = 9549*P/n", "M_k = 9.55*P/n",
                                "T_lb = 5252*hp/n", "ρ_cm = 191.5*a_ft*R_w", "P_w = 0.10472*M*n"}) {
        CAPTURE(formula);
        const auto found = run(decl + formula + "\n");
        CHECK(problems_in(found) == 0);
        CHECK(count_of(found, plumb::rules::trade_constant) == 1);
    }
    for (const char* formula : {"M = 60*P_w/(2*pi*n)", "P_w = 2*pi*M*n/60", "M = P_w/ω",
                                "M = M*n/n_2", "M = 60*P_w/(6.2832*n)"}) {
        CAPTURE(formula);
        CHECK(problems_in(run(decl + formula + "\n")) == 0);
    }
    for (const char* formula :
         {"M = 60000*P/n", "M = 60*P_w/n", "T_lb = 33000*hp/n", "P_w = M*n/60", "M = 9550*P_w/n"}) {
        CAPTURE(formula);
        const auto found = run(decl + formula + "\n");
        CHECK(problems_in(found) == 1);
        CHECK(count_of(found, plumb::rules::unit_scale) == 1);
    }
}

// The same 2π where a speed in revolutions becomes an angular speed in rad/s, ω = 2π·n/60
// from rpm, and in a flywheel's kinetic energy E = ½·I·ω² (Shigley's Mechanical Engineering
// Design, 10th ed., 16-12; from memory): ω = n/60 is 2π low, the energy (2π)² low. The
// folded 2π/60 = 0.1047 and 60/2π = 9.549 (common practice) pass.
TEST_CASE("a revolution's 2π between revolutions and radians, and in a flywheel's energy") {
    const std::string decl = "ω : rad/s\nn : rpm\nI : kg*m^2\nE : J\nE_k : kJ\nP : kW\n"
                             "T : N*m\n";
    for (const char* formula :
         {"ω = 2*pi*n/60", "ω = 0.1047*n", "n = 9.549*ω", "n = 60*ω/(2*pi)",
          "E = 0.5*I*(2*pi*n/60)^2", "E_k = 0.5*I*ω^2/1000", "P = T*ω/1000"}) {
        CAPTURE(formula);
        CHECK(problems_in(run(decl + formula + "\n")) == 0);
    }
    for (const char* formula : {"ω = n/60", "E = 0.5*I*(n/60)^2", "n = 60*ω"}) {
        CAPTURE(formula);
        const auto found = run(decl + formula + "\n");
        CHECK(problems_in(found) == 1);
        CHECK(plumb::test::says(plumb::test::first_under(found, plumb::rules::unit_scale),
                                "has no 2π"));
    }
}

// ω = 2π·f (ISO 80000-3, from memory): a frequency in Hz counts cycles as rpm counts
// revolutions; the synchronous speed n = 120·f/p, a reactance 2π·f·L and f = 1/T need no 2π.
TEST_CASE("a frequency in Hz beside an angular speed in radians") {
    const std::string decl = "ω : rad/s\nf : Hz\nn_s : rpm\nN_p : 1\nX_L : ohm\nL : H\n"
                             "T_p : s\nM : N*m\nP : W\n";
    for (const char* formula :
         {"ω = 2*pi*f", "n_s = 120*f/N_p", "X_L = 2*pi*f*L", "f = 1/T_p", "P = 2*pi*f*M"}) {
        CAPTURE(formula);
        CHECK(problems_in(run(decl + formula + "\n")) == 0);
    }
    for (const char* formula : {"ω = f", "f = ω", "P = f*M"}) {
        CAPTURE(formula);
        CHECK(count_of(run(decl + formula + "\n"), plumb::rules::unit_scale) == 1);
    }
}

// A capacitor bank's reactive power Q = 3·2π·f·C·V_ph² in delta, X_C = 1/(2π·f·C) and
// X_L = 2π·f·L (IEEE Std 18-2012, 3, from memory): the same ω = 2π·f, which a formula with a
// reactance or a reactive power and no π leaves out. A switching loss ½·C·V²·f in W is energy
// per cycle times cycles, and needs none.
TEST_CASE("a capacitor's or reactor's reactance takes 2π times the frequency") {
    const std::string decl = "Q_c : kvar\nf : Hz\nV_LL : V\nC_d : µF\nL_r : mH\n"
                             "X_C, X_L : ohm\nP_sw : W\n";
    passes(decl,
           {"C_d = 1e9*Q_c/(3*2*pi*f*V_LL^2)", "X_C = 1e6/(2*pi*f*C_d)", "X_L = 2*pi*f*L_r/1000",
            "X_C = 1e6/(6.2832*f*C_d)", "P_sw = 0.5*C_d/1e6*V_LL^2*f"});
    for (const char* formula :
         {"C_d = 1e9*Q_c/(3*f*V_LL^2)", "X_C = 1e6/(f*C_d)", "X_L = f*L_r/1000"}) {
        CAPTURE(formula);
        const auto found = run(decl + formula + "\n");
        CHECK(count_of(found, plumb::rules::unit_scale) == 1);
        CHECK(plumb::test::says(plumb::test::first_under(found, plumb::rules::unit_scale),
                                "has no 2π"));
    }
}

// A hydraulic motor's torque T = Δp·V_g/(2π) from its displacement per revolution
// (ISO 4391; in N·m from bar and cm³/rev, T = Δp·V_g/(20π); from memory): without the 2π it is
// the work per revolution. A pump's flow V_g·n has a speed beside it and needs no 2π.
TEST_CASE("a hydraulic motor's torque from its displacement per revolution") {
    const std::string decl = "T_in : lbf*in\nΔp : psi\nD_m : in^3/rev\nη_m : 1\nQ_g : gpm\n"
                             "n : rpm\nT_Nm : N*m\nΔp_b : bar\nV_g : cm^3/rev\n";
    // In lbf·ft from psi and in³/rev the divisor is 2π × 12 in/ft, typed 24·π or 75.4.
    passes(decl + "T_ft : lbf*ft\n",
           {"T_in = η_m*Δp*D_m/(2*pi)", "Q_g = D_m*n/231", "T_Nm = Δp_b*V_g/(20*pi)",
            "T_ft = Δp*D_m/(24*pi)", "T_ft = Δp*D_m/75.4"});
    CHECK(count_of(run(decl + "T_ft : lbf*ft\nT_ft = Δp*D_m/(2*pi)\n"), plumb::rules::unit_scale) ==
          1);
    for (const char* formula : {"T_in = η_m*Δp*D_m", "T_Nm = Δp_b*V_g/10"}) {
        CAPTURE(formula);
        const auto found = run(decl + formula + "\n");
        CHECK(count_of(found, plumb::rules::unit_scale) == 1);
        CHECK(plumb::test::says(plumb::test::first_under(found, plumb::rules::unit_scale),
                                "has no 2π"));
    }
}

// An angular speed from a speed in rpm, ω = 2π·n/60 (ISO 80000-3), is as often written π·n/30,
// the 2 taken into the 60, and so is a shaft's power P = T·π·n/30; the speed back in rpm is
// 30·ω/π. A 30 beside π with a 2 written as well is the 2 twice, and stays a finding.
TEST_CASE("a speed in rpm turned into radians per second with pi over 30") {
    const std::string decl = "n : rpm\nω : rad/s\nP : kW\nT : kN*m\n";
    passes(decl, {"ω = pi*n/30", "ω = n*pi/30", "n = 30*ω/pi", "P = T*pi*n/30", "ω = 2*pi*n/60"});
    const auto r = run(decl + "ω = pi*n/30\n");
    CHECK(plumb::test::says(plumb::test::first_under(r, plumb::rules::trade_constant),
                            "30 is read as 60 \u00F7 2"));
    CHECK(count_of(run(decl + "ω = 2*pi*n/30\n"), plumb::rules::unit_scale) == 1);
    CHECK(count_of(run(decl + "ω = pi*n/3\n"), plumb::rules::unit_scale) == 1);
}

// π written where 2π belongs, "ω = π·n/60", halves the angular speed and the power from a
// torque (ω = 2π·n, ISO 80000-3; P = 2π·n·M, ISO 80000-4). A rim speed takes π alone,
// v = π·D·n, and 30000 beside π is 60000 ÷ 2 as 30 is 60 ÷ 2 (kW from N·m and rpm).
// "2*pi*n/30" takes the 2 twice and is twice its true value, not four times.
TEST_CASE("a speed in rpm with pi alone where 2 pi belongs") {
    const std::string decl =
        "n : rpm\nω : rad/s\nP : kW\nT : N*m\nD : m \"wheel diameter\"\nv : m/s\n";
    passes(decl, {"ω = 2*pi*n/60", "ω = pi*2*n/60", "P = 2*pi*T*n/60000", "P = T*pi*n/30000",
                  "v = pi*D*n/60", "ω = 0.10472*n"});
    const auto note = run(decl + "P = T*pi*n/30000\n");
    CHECK(plumb::test::says(plumb::test::first_under(note, plumb::rules::trade_constant),
                            "30000 is read as 60000 \u00F7 2"));
    for (const char* half : {"ω = pi*n/60\n", "P = pi*T*n/60000\n", "ω = pi*(n/60)\n"}) {
        CAPTURE(half);
        const auto r = run(decl + half);
        CHECK(count_of(r, plumb::rules::unit_scale) == 1);
        CHECK(plumb::test::says(plumb::test::first_under(r, plumb::rules::unit_scale),
                                "half its true value"));
    }
    const auto twice = run(decl + "ω = 2*pi*n/30\n");
    CHECK(plumb::test::says(plumb::test::first_under(twice, plumb::rules::unit_scale),
                            "2 times its true value"));
    CHECK_FALSE(
        plumb::test::says(plumb::test::first_under(twice, plumb::rules::unit_scale), "4 times"));
}

// The US rational method Q = C·i·A gives cfs from in/h and acres, leaving out 1 acre·in/h =
// 43560 ft² × (1/12 ft)/3600 s = 1.00833 cfs (NIST SP 811 (2008), B.8, acre and inch; the
// convention is common practice): a note, not a warning. In mm/h the units are 100 times or
// more apart and stay a warning.
TEST_CASE("the rational method's acre-inch per hour as a cubic foot per second") {
    CHECK(43560.0 / 12.0 / 3600.0 == doctest::Approx(1.00833).epsilon(1e-5));
    const std::string decl = "Q_cfs : cfs\nC : 1\ni_in : in/h\ni_mm : mm/h\nA_ac : acre\n";
    const auto right = run(decl + "Q_cfs = C*i_in*A_ac\n");
    CHECK(problems_in(right) == 0);
    CHECK(count_of(right, plumb::rules::trade_constant) == 1);
    CHECK(count_of(run(decl + "Q_cfs = C*i_mm*A_ac\n"), plumb::rules::unit_scale) == 1);
}

// A battery's charge in ampere hours, 1 A·h = 3600 C (SI Brochure 9th ed., Table 8), and an
// empirical factor with units of its own (TDS ≈ 0.7 ppm per µS/cm of conductivity, common
// practice): the side-mismatch says how to mark it.
TEST_CASE("ampere hours, and an empirical factor times one symbol") {
    const std::string decl = "C_b : Ah\nC_m : mAh\nI : A\nt : h\nQ : C\nTDS : mg/L\nκ : uS/cm\n";
    CHECK(problems_in(run(decl + "C_b = I*t\n")) == 0);
    CHECK(problems_in(run(decl + "Q = C_b*3600\n")) == 0);
    CHECK(problems_in(run(decl + "C_m = I*t*1000\n")) == 0);
    CHECK(count_of(run(decl + "Q = C_b\n"), plumb::rules::unit_scale) == 1);
    const auto r = run(decl + "TDS = 0.7*κ\n");
    REQUIRE(count_of(r, plumb::rules::side_mismatch) == 1);
    CHECK(plumb::test::says(plumb::test::first_under(r, plumb::rules::side_mismatch),
                            "write it as 0.7?"));
    CHECK(problems_in(run(decl + "TDS = 0.7?*κ\n")) == 0);
}

// A rod pump's displacement PD = 0.1166·S·N·D² in bbl/d with the stroke S and plunger D in
// inches and N in strokes per minute (common practice): 0.1166 is π/4 times the conversion
// 0.14846 (in³/min to bbl/d: 1440/9702, NIST SP 811 (2008), B.8 for the barrel of 9702 in³).
// Beside a declared area the π/4 would count twice: no reading, and the units stay a warning.
TEST_CASE("a circle's π/4 folded into a factor is read only beside a square") {
    CHECK(std::numbers::pi / 4.0 * 1440.0 / 9702.0 == doctest::Approx(0.1166).epsilon(1e-3));
    const std::string decl = "PD : bbl/d\nS_p, D_p, d_in : in\nN : 1/min\nA_p : in^2\n"
                             "Q_gpm : gpm\nV : ft/s\n";
    for (const char* formula :
         {"PD = 0.1166*S_p*N*D_p^2", "V = 0.4085*Q_gpm/d_in^2", "V = 0.4085*Q_gpm/(d_in*d_in)"}) {
        CAPTURE(formula);
        const auto r = run(decl + formula + "\n");
        CHECK(problems_in(r) == 0);
        CHECK(count_of(r, plumb::rules::trade_constant) == 1);
    }
    CHECK(count_of(run(decl + "PD = 0.1166*S_p*N*A_p\n"), plumb::rules::unit_scale) == 1);
}

// Wind's velocity pressure q_z = 0.00256·K_z·K_zt·K_d·V² in psf with V in mph (ASCE 7-16, eq.
// 26.10-1, from memory) and 0.613·K_z·V² in Pa with V in m/s: half the density of air, 0.0765
// lb/ft³ at 15 °C (from memory), worked out here with NIST SP 811 (2008), B.8 (mph = 0.44704
// m/s, lbf/ft² = 47.880259 Pa). Read only in a term that is a velocity squared times numbers.
TEST_CASE("the wind codes' velocity pressure: half the density of air") {
    CHECK(0.00256 * 47.880259 / (0.44704 * 0.44704) == doctest::Approx(0.6133).epsilon(1e-3));
    const std::string decl = "q_h : lbf/ft^2\nq_Pa : Pa\nK_z, K_zt, K_d : 1\nV : mph\nV_ms : m/s\n"
                             "m : kg\nL : m\n";
    for (const char* formula : {"q_h = 0.00256*K_z*K_zt*K_d*V^2", "q_Pa = 0.613*K_z*V_ms^2"}) {
        CAPTURE(formula);
        const auto r = run(decl + formula + "\n");
        CHECK(problems_in(r) == 0);
        CHECK(count_of(r, plumb::rules::trade_constant) == 1);
    }
    for (const char* formula : {"q_h = K_z*V^2", "q_Pa = 0.613*K_z*V^2", "m = 0.613*L^3"}) {
        CAPTURE(formula);
        CHECK(problems_in(run(decl + formula + "\n")) == 1);
    }
}

// Braking and stopping distances as road and rail texts write them (AASHTO, from memory):
// d = V²/(254·(f + G)) in m from km/h, 254 = 2·g·3.6², and V²/(30·(f + G)) in ft from mph,
// 30 ≈ 2·g/1.467²; s = v²/(25.92·a), 25.92 = 2·3.6²; 1.075·V²/a in ft, 1.075 = 1.467²/2 (mph
// = 22/15 ft/s, NIST SP 811 (2008), B.8). The 2 of v²/(2a) and 2g are read with a note.
TEST_CASE("the 2 of v²/(2a) folded into a braking distance's number") {
    const std::string decl = "s_b, d_b : m\nv_b, V_kmh : km/h\na_b : m/s^2\nV_mph : mph\n"
                             "d_ft : ft\na_us : ft/s^2\nf, G : 1\n";
    for (const char* formula : {"s_b = v_b^2/(25.92*a_b)", "d_b = V_kmh^2/(254*(f + G))",
                                "d_ft = V_mph^2/(30*(f + G))", "d_ft = 1.075*V_mph^2/a_us"}) {
        CAPTURE(formula);
        const auto r = run(decl + formula + "\n");
        CHECK(problems_in(r) == 0);
        CHECK(count_of(r, plumb::rules::trade_constant) +
                  count_of(r, plumb::rules::gravity_number) ==
              1);
    }
    for (const char* formula : {"d_b = V_kmh^2/(f + G)", "s_b = v_b^2/(2*a_b)"}) {
        CAPTURE(formula);
        CHECK(problems_in(run(decl + formula + "\n")) == 1);
    }
}

// Apparent power S in kVA is the real power over the power factor, P = S·pf (IEC 80000-6,
// from memory): set equal with nothing between them, the real power comes out 1/pf too high.
// A conversion between kVA and VA is still no power factor.
TEST_CASE("an apparent power set equal to a real power") {
    const std::string decl = "P_e, P_w : kW\nS : kVA\npf : 1\nS_va : VA\n";
    for (const char* formula : {"P_e = S", "S = P_e", "P_e = S_va/1000"}) {
        CAPTURE(formula);
        const auto r = run(decl + formula + "\n");
        CHECK(count_of(r, plumb::rules::unit_scale) == 1);
    }
    for (const char* formula : {"P_e = S*pf", "P_e = P_w", "S = S_va/1000"}) {
        CAPTURE(formula);
        CHECK(problems_in(run(decl + formula + "\n")) == 0);
    }
}

// A UPS battery's autonomy t = E·DoD/P with P the real power the inverter draws (IEEE 1184,
// from memory): divided by the UPS's kVA rating the autonomy is pf times too long. With a
// power factor or an efficiency beside it, or the kW, it is not asked.
TEST_CASE("an energy over an apparent power") {
    const std::string decl =
        "t : min\nE : kWh\nS : kVA\nP : kW\npf, DoD : 1 \"power factor, depth of discharge\"\n";
    for (const char* formula : {"t = 60*E/S", "t = 60*DoD*E/S"}) {
        CAPTURE(formula);
        CHECK(count_of(run(decl + formula + "\n"), plumb::rules::unit_scale) == 1);
    }
    for (const char* formula : {"t = 60*E/(S*pf)", "t = 60*DoD*E/P"}) {
        CAPTURE(formula);
        CHECK(problems_in(run(decl + formula + "\n")) == 0);
    }
    // A machine's inertia constant H = E/S_rated, in seconds, is defined on the apparent
    // power (Kundur, Power System Stability and Control, 1994, ch. 3; from memory).
    CHECK(problems_in(run(decl + "H : s \"inertia constant\"\nE_k : kJ\nH = E_k/S\n")) == 0);
}

// A generating set's fuel burn is its specific fuel consumption, per kWh of real energy,
// times the real power, the kVA rating times the power factor and the load (ISO 8528-1
// rates a set in kVA at 0.8 power factor, from memory); an energy into kWh or a tariff per
// kWh counts the same real power. With the power factor beside the kVA, typed as 0.8 or
// named, or a charge per kVA, or an energy in kVA·h, nothing is asked.
TEST_CASE("an apparent power times a rate per unit of real energy") {
    const std::string decl = "S_r : kVA\nP_e : kW\npf, x_L : 1\nSFC : g/kWh\nm_f : kg/h\n"
                             "E : kWh\nE_s : kVA*h\nt_r : h\nc_e : $/kWh\nc_d : $/kVA\n"
                             "C : $\nq_f : L/kWh\nQ_f : L/h\n";
    for (const char* formula :
         {"m_f = SFC*x_L*S_r/1000", "E = S_r*t_r", "C = c_e*S_r*t_r", "Q_f = q_f*S_r"}) {
        CAPTURE(formula);
        const auto r = run(decl + formula + "\n");
        CHECK(count_of(r, plumb::rules::unit_scale) == 1);
        CHECK(says(first_under(r, plumb::rules::unit_scale), "power factor"));
    }
    for (const char* formula :
         {"m_f = SFC*x_L*pf*S_r/1000", "m_f = SFC*S_r*0.8/1000", "m_f = SFC*P_e/1000",
          "E_s = S_r*t_r", "E = S_r*pf*t_r", "C = c_d*S_r", "C = c_e*E"}) {
        CAPTURE(formula);
        CHECK(problems_in(run(decl + formula + "\n")) == 0);
    }
}

// AASHTO's stopping sight distance in US units, SSD = 1.47·V·t + 1.075·V²/a in ft with V in
// mph (from memory; 1 mph = 1.4667 ft/s, NIST SP 811 (2008), B.8): both terms agree through
// rounded factors, and the sum takes the unit they round, ft, not 1.47's 0.23 % off. The
// second term without its conversion stays a finding.
TEST_CASE("a side whose terms agree through rounded factors takes the unit they round") {
    const std::string decl = "SSD_ft : ft\nV_mph : mph\nt_pr : s\na_us : ft/s^2\n";
    for (const char* formula : {"SSD_ft = 1.47*V_mph*t_pr + 1.075*V_mph^2/a_us",
                                "SSD_ft = 1.47*V_mph*t_pr + 1.47^2*V_mph^2/(2*a_us)"}) {
        CAPTURE(formula);
        CHECK(problems_in(run(decl + formula + "\n")) == 0);
    }
    for (const char* formula : {"SSD_ft = 1.47*V_mph*t_pr + V_mph^2/(2*a_us)",
                                "SSD_ft = 1.5*V_mph*t_pr + 1.5^2*V_mph^2/(2*a_us)"}) {
        CAPTURE(formula);
        CHECK(problems_in(run(decl + formula + "\n")) == 1);
    }
}

// A liquid's specific weight is its specific gravity times water's (common practice: head
// H = 2.31·p/SG in ft from psi, p = 0.433·SG·h in psi from ft, P = Q·H·SG/3960 in hp from gpm
// and ft; Hydraulic Institute, from memory). The SG is a pure number, so the units cannot place
// it; the number read as water's says where it belongs.
TEST_CASE("a specific gravity on the wrong side of water's specific weight") {
    const std::string liquid = "p : psi\nH : ft\nSG : 1 \"specific gravity of the crude\"\nh : "
                               "ft\nQ : gpm\nP : hp\nη : 1\nS_m : 1 \"slurry relative density\"\n";
    for (const char* right :
         {"H = p*2.31/SG", "p = 0.433*SG*h", "P = Q*H*SG/(3960*η)", "P = Q*H*S_m/(3960*η)"}) {
        CAPTURE(right);
        const auto r = run(liquid + right + "\n");
        CHECK(problems_in(r) == 0);
    }
    for (const char* wrong :
         {"H = p*2.31*SG", "p = 0.433*h/SG", "P = Q*H/(3960*η*SG)", "P = Q*H/(S_m*3960*η)"}) {
        CAPTURE(wrong);
        const auto r = run(liquid + wrong + "\n");
        CHECK(problems_in(r) == 1);
        CHECK(std::any_of(r.diagnostics.begin(), r.diagnostics.end(), [](const auto& d) {
            return d.rule == plumb::rules::gravity_number && d.level == plumb::severity::warning &&
                   d.message.find("off by SG squared") != std::string::npos;
        }));
    }
}

// A bare number standing for the whole quantity in a sum is read only in the units around it:
// the pulp-density form of solids by mass, C_w = 100·S·(ρ_p − ρ_w)/(ρ_p·(S − 1)) (Wills'
// Mineral Processing Technology, 8th ed., ch. 3, from memory), takes 1 beside t/m³ and 1000
// beside kg/m³; the other way round it is three orders of magnitude off.
TEST_CASE("water's density typed as a bare number in a sum, in the units around it only") {
    const std::string pulp = "ρ_p : kg/m^3\nρ_t : t/m^3\nS : 1\nC_w : %\n";
    for (const char* right :
         {"C_w = 100*S*(ρ_t - 1)/(ρ_t*(S - 1))", "C_w = 100*S*(ρ_p - 1000)/(ρ_p*(S - 1))"}) {
        CAPTURE(right);
        CHECK(problems_in(run(pulp + right + "\n")) == 0);
    }
    for (const char* wrong :
         {"C_w = 100*S*(ρ_p - 1)/(ρ_p*(S - 1))", "C_w = 100*S*(ρ_t - 1000)/(ρ_t*(S - 1))"}) {
        CAPTURE(wrong);
        CHECK(count_of(run(pulp + wrong + "\n"), plumb::rules::sum_mismatch) == 1);
    }
}

// Beside a number that is a unit conversion itself (1000 Pa per kPa or N per kN, 86400 s per
// day; NIST SP 811 (2008), B.8), the number read as gravity or water is the other one: the
// note names 9.81, not the conversion.
// The 3.6e6 of ρ·g·Q·H/(3.6e6·η) with Q in m³/h is 3600 s/h × 1000 W/kW (1 kWh = 3.6 MJ,
// SI Brochure 9th ed., Table 8), though as one over g it fits a little closer than the 9.81
// does as g.
TEST_CASE("a conversion beside 9.81 is not the number read as gravity or water") {
    const std::string d = "Δp : kPa\nρ : kg/m^3\nH : m\nm : kg\nF : kN\nSG : 1\nq : m^3/d\n"
                          "P : kW\nQ_h : m^3/h\nη : 1\n";
    for (const char* formula : {"H = Δp*1000/(ρ*9.81)", "F = m*9.81/1000", "P = 9.81*SG*q*H/86400",
                                "P = ρ*9.81*Q_h*H/(3.6e6*η)", "P = ρ*9.81*Q_h*H/(3600*1000*η)",
                                "P = ρ*9.81*Q_h*H/3.6e6"}) {
        CAPTURE(formula);
        const auto r = run(d + formula + "\n");
        CHECK(problems_in(r) == 0);
        CHECK(message_of(r, plumb::rules::gravity_number).rfind("'9.81' is read as", 0) == 0);
    }
}

// The sensible load q = 1.08·cfm·ΔT in Btu/h (ASHRAE Fundamentals, ch. 18, from memory) holds
// the density of standard air: on a flow in actual cubic feet (a hot exhaust) it is a warning.
TEST_CASE("the air trade's 1.08 on a flow at actual conditions") {
    const std::string d = "q : Btu/h\nQ_s : cfm \"supply air\"\nQ_a : acfm \"dryer exhaust\"\n"
                          "Q_x : cfm \"exhaust, actual at 300 °F\"\nΔT : °R\n";
    const auto standard = run(d + "q = 1.08*Q_s*ΔT\n");
    CHECK(problems_in(standard) == 0);
    for (const char* actual : {"q = 1.08*Q_a*ΔT", "q = 1.08*Q_x*ΔT"}) {
        CAPTURE(actual);
        const auto r = run(d + actual + "\n");
        CHECK(problems_in(r) == 1);
        CHECK(std::any_of(r.diagnostics.begin(), r.diagnostics.end(), [](const auto& x) {
            return x.rule == plumb::rules::trade_constant && x.level == plumb::severity::warning;
        }));
    }
}

// Ground engineers round water's unit weight to 10 kN/m³ (EN 1997-1 worked examples, common
// practice): γ' = γ_sat - 10 and u = 10·h_w in kPa read it so, with a note. A 10 in pcf, a 10
// for g beside a density, and a 1 for water stay findings.
TEST_CASE("the ground engineer's round 10 kN/m³ for water") {
    const std::string decl = "g_s, g_b : kN/m^3\ng_p, g_bp : lbf/ft^3\nρ : kg/m^3\nh : m\n"
                             "p, u : kPa\n";
    for (const char* right : {"g_b = g_s - 10", "u = 10*h"}) {
        CAPTURE(right);
        const auto r = plumb::test::check_after(decl, right);
        CHECK(plumb::test::problems_in(r) == 0);
        CHECK(plumb::test::count_of(r, plumb::rules::gravity_number) == 1);
    }
    for (const char* wrong : {"g_bp = g_p - 10", "p = ρ*10*h/1000", "g_b = g_s - 1"}) {
        CAPTURE(wrong);
        CHECK(plumb::test::problems_in(plumb::test::check_after(decl, wrong)) > 0);
    }
}

// A cooling water flow from a duty, V = 3.6·Q/(c_p·ΔT) in m³/h from kW (water's density
// 1000 kg/m³ folded into 3.6, common practice): written with 3600, the density is missing, and
// the seconds of an hour are not read as one over it. The chiller rule's 24 (12 000/500) still
// reads as water's heat capacity per gpm.
TEST_CASE("the clock's 3600 is no property of water") {
    const std::string decl = "V : m^3/h\nQ : kW\nc_p : kJ/(kg*K)\nΔT : K\nTR : TR\nq : gpm\n"
                             "ΔT_F : Δ°F\n";
    const auto r = plumb::test::check_after(decl, "V = 3600*Q/(c_p*ΔT)");
    CHECK(plumb::test::problems_in(r) > 0);
    CHECK(plumb::test::count_of(r, plumb::rules::gravity_number) == 0);
    CHECK(plumb::test::count_of(r, plumb::rules::trade_constant) == 0);
    CHECK(plumb::test::problems_in(plumb::test::check_after(decl, "TR = q*ΔT_F/24")) == 0);
}

// A solution's dosing pump: kg/d of product over the mass fraction into L/h needs the 24 h/d
// and the solution's density (sodium bisulphite 38 % is about 1.34 kg/L, from memory). The 24
// alone is no density of water in disguise; the density missing is named, as a g is.
TEST_CASE("a 24 is never read as water's density, and a missing density is named") {
    const std::string d = "W : kg/d\nw : 1\nV : L/h\nρ : kg/L\nC : kg/m^3\nSG : 1\nV_c : m^3\n"
                          "m : kg\n";
    const auto missing = run(d + "V = W/(24*w)\n");
    REQUIRE(count_of(missing, plumb::rules::side_mismatch) == 1);
    CHECK(count_of(missing, plumb::rules::trade_constant) == 0);
    std::string said;
    for (const auto& diag : missing.diagnostics)
        for (const auto& note : diag.notes)
            said += note.message;
    CHECK(said.find("exactly a density") != std::string::npos);
    CHECK(said.find("(V = m/ρ)") != std::string::npos);
    CHECK(problems_in(run(d + "V = W/(24*w*ρ)\n")) == 0);
    CHECK(message_of(run(d + "V_c = m/SG\n"), plumb::rules::side_mismatch).size() > 0);
}

// A drum's, a wheel's or a workpiece's speed from the speed along its rim: v = π·D·n, or
// n = 1000·v_c/(π·D) in rpm from m/min and mm (Machinery's Handbook, 30th ed., cutting speed;
// from memory). Without the π the units still agree, as a revolution counts one cycle. Not
// where the length is a screw's or a chain's pitch or a stroke (v = p·n), nor where π is
// folded into a number (0.262 = π/12 for sfm from inches).
TEST_CASE("a speed along a rim and a speed in revolutions meet through π") {
    const std::string d = "n : rpm\nv : m/min\nD : m \"drum diameter\"\nr_w : m \"wheel radius\"\n"
                          "p : m \"screw pitch\"\nv_c : m/min\nD_w : mm\nV_s : ft/min\nD_in : in\n";
    fails_with(d, {"n = v/D", "v = D*n", "v = r_w*n", "n = 1000*v_c/D_w"},
               plumb::rules::unit_scale);
    passes(d, {"n = v/(pi*D)", "v = pi*D*n", "v = 2*pi*r_w*n", "v = p*n", "n = 1000*v_c/(pi*D_w)",
               "V_s = 0.262*D_in*n"});
}

// A frequency in Hz over a diameter is no rim speed: vortex shedding f = St·V/d (the Strouhal
// number, ISO 80000-11) and a duct's acoustic mode f = c/(2·W) (Blevins, Flow-Induced
// Vibration, 2nd ed., ch. 3 and 10, from memory) have no π.
TEST_CASE("a frequency in Hz over a diameter is no rim speed") {
    const std::string d = "f_vs, f_a : Hz\nSt : 1\nV_g : m/s\nd_o : mm \"tube outside diameter\"\n"
                          "c_g : m/s\nW_sh : m \"shell inside diameter\"\n";
    passes(d, {"f_vs = 1000*St*V_g/d_o", "f_a = c_g/(2*W_sh)"});
}

// Water's specific heat typed bare on a mass flow, Φ = m·4.19·ΔT/3600 in kW from kg/h (4.180
// to 4.220 kJ/(kg·K) between 0 and 30 °C; IAPWS-95 values as tabulated in the CRC Handbook,
// from memory): a note, as the 4.19 on a volume flow is. Left out, the sides still disagree;
// without the 3600 the 4.19 is still read, and the warning names the hour left out.
TEST_CASE("water's specific heat typed as a number on a mass flow") {
    const std::string d = "m : kg/h\nm_s : kg/s\nΦ : kW\nT_1, T_2 : degC\n";
    passes_with_one_note(d, {"Φ = m*4.19*(T_1 - T_2)/3600", "Φ = m_s*4.186*(T_1 - T_2)"},
                         plumb::rules::trade_constant);
    const auto hour = run(d + "Φ = m*4.19*(T_1 - T_2)\n");
    CHECK(count_of(hour, plumb::rules::unit_scale) == 1);
    CHECK(plumb::test::says(plumb::test::first_under(hour, plumb::rules::unit_scale),
                            "counts 3600 times"));
    CHECK(count_of(run(d + "Φ = m*(T_1 - T_2)/3600\n"), plumb::rules::side_mismatch) == 1);
    CHECK(count_of(run(d + "Φ = m*2.1*(T_1 - T_2)/3600\n"), plumb::rules::side_mismatch) == 1);
}

// A crane's hook load in kip from tonnes, W = 2.2046·m (1 t·g_n = 9.80665 kN = 2.2046 kip; NIST
// SP 811 (2008), B.8: 1 kip = 4.448222 kN): g and the kip in one number, so the advice to name
// g keeps the conversion beside it, and the form it gives passes.
TEST_CASE("a number holding g and a conversion keeps the conversion in the advice") {
    const std::string d = "W_kip : kip\nm : t\n";
    const auto r = run(d + "W_kip = 2.2046*m\n");
    REQUIRE(count_of(r, plumb::rules::gravity_number) == 1);
    CHECK(note_with(r, plumb::rules::gravity_number, "write {g_n}*0.224809 instead").size() > 0);
    CHECK(problems_in(run(d + "W_kip = {g_n}*0.224809*m\n")) == 0);
}

// A circumference's π folded with a conversion into a whole number of three digits: the
// machinist's n = 318·v_c/D (1000/π, m/min and mm to rpm) and the pump maker's u = D·n/229
// (720/π, inches and rpm to ft/s); common practice. A note says how each was read.
TEST_CASE("one over pi folded into whole numbers of three digits") {
    const std::string d = "n : rpm\nv_c : m/min\nD_mm : mm\nu : ft/s\nD_in : in\n";
    passes_with_one_note(d, {"n = 318*v_c/D_mm", "u = D_in*n/229"}, plumb::rules::trade_constant);
    CHECK(count_of(run(d + "n = 1000*v_c/D_mm\n"), plumb::rules::unit_scale) == 1);
    CHECK(count_of(run(d + "u = D_in*n/720\n"), plumb::rules::unit_scale) == 1);
}

// A density corrected to a site from a standard state, ρ = ρ_0·(p/p_0)·(T_0/T), with ρ_0 =
// 1.225 kg/m³ at 15 °C and 101.325 kPa (ISO 2533:1975, the standard atmosphere at sea level,
// from memory), and a wind rotor's power ½·ρ·A·v³ with that density typed: 1.225 is read as
// air's density, and the reference pressure and temperature beside it as theirs. A factor's
// 1.25 or 1.2 is printed too coarsely to be one: a density left out stays an error.
TEST_CASE("a gas's density at a standard state typed as a number") {
    const std::string decl =
        "ρ : kg/m^3\np : kPa\nT : K\nP : W\nA : m^2\nv : m/s\nm : kg\nV : m^3\n";
    const auto site = run(decl + "ρ = 1.225*(p/101.325)*(288.15/T)\n");
    CHECK(problems_in(site) == 0);
    CHECK(message_of(site, plumb::rules::trade_constant)
              .find("'1.225' is read as the density "
                    "of air") != std::string::npos);
    passes_with_one_note(decl, {"P = 0.5*1.225*A*v^3", "m = 1.204*V"},
                         plumb::rules::trade_constant);
    fails_with(decl, {"m = 1.25*V", "m = 1.2*V"}, plumb::rules::side_mismatch);
}

// A radiant loss q = σ·ε·A·(T_1⁴ - T_2⁴) with σ = 5.670374419e-8 W/(m²·K⁴) (CODATA 2018)
// typed as 5.67e-8, and a vapour density ρ_v = e/(R_w·T) with water vapour's R_w = 461.52
// J/(kg·K) (CODATA 2018's R over 18.015 g/mol, from memory) as 216.7 in g/m³ from hPa and K:
// each read as the constant with a note. Left out, they stay errors.
TEST_CASE("the Stefan-Boltzmann constant and water vapour's gas constant typed as numbers") {
    const std::string decl = "q : W\nε : 1\nA : m^2\nT_1, T_2 : K\nρ_v : g/m^3\ne : hPa\n"
                             "T : K\nρ_s : kg/m^3\np : kPa\n";
    passes_with_one_note(
        decl, {"q = 5.67e-8*ε*A*(T_1^4 - T_2^4)", "ρ_v = 216.7*e/T", "ρ_s = p/(0.4615*T)"},
        plumb::rules::trade_constant);
    fails_with(decl, {"q = ε*A*(T_1^4 - T_2^4)", "ρ_v = e/T"}, plumb::rules::side_mismatch);
}

// The specific gas constants R/M of the gases plants store (CODATA 2018's R = 8.314462618
// J/(mol·K) over IUPAC molar masses, from memory): nitrogen 296.80 J/(kg·K) in a buffer tank's
// stored mass m = p·V/(R·T), bar to Pa by 10⁵ (NIST SP 811 (2008), B.8); oxygen 259.84, carbon
// dioxide 188.92 in kJ/(kg·K) beside kPa, methane 518.28, hydrogen 4124.2. Each was flagged as
// a side-mismatch in a workbook; now a note. A gauge reading in the gas law stays an error, and
// the constant left out or 1000 off is still reported.
TEST_CASE("the gas constants of nitrogen, oxygen, carbon dioxide, methane and hydrogen") {
    const std::string decl = "m : kg\nV : m^3\np_a : bar\np_g : barg\nT : K\np : kPa\n"
                             "ρ : kg/m^3\n";
    passes_with_one_note(decl,
                         {"m = p_a*V*100000/(296.8*T)", "ρ = p/(0.2598*T)", "ρ = p/(0.1889*T)",
                          "ρ = p/(0.5183*T)", "ρ = p*1000/(4124*T)"},
                         plumb::rules::trade_constant);
    CHECK(count_of(run(decl + "m = p_g*V*100000/(296.8*T)\n"), plumb::rules::offset_scale) == 1);
    fails_with(decl, {"m = p_a*V*100000/T"}, plumb::rules::side_mismatch);
    CHECK(count_of(run(decl + "ρ = p/(296.8*T)\n"), plumb::rules::unit_scale) == 1);
}

// A property typed as a number beside a formula that leaves out the clock's or the grain's
// factor: a pump's ρ·9.81·Q·H/1000 in kW with Q in m³/h (3600 s/h, SI Brochure 9th ed.,
// Table 8), a humidifier's 4.5·cfm·ΔW in lb/h with ΔW in gr/lb (7000 gr/lb, NIST SP 811
// (2008), B.8; 4.5 = 0.075 lb/ft³ × 60 min/h, common practice). The number is read, and the
// warning names the factor; the slip was reported as a dimension (momentum, a missing density).
// A kW put in the 1.08 formula, which wants Btu/h (3412 missing), is no hour left out: no unit
// of the formula counts hours, and the sides still differ in dimension.
TEST_CASE("a number read as a property where the formula leaves out 3600 or 7000") {
    const std::string pump = "ρ : kg/m^3\nQ : m^3/h\nH : m\nP : kW\n";
    const auto r = run(pump + "P = ρ*9.81*Q*H/1000\n");
    CHECK(count_of(r, plumb::rules::unit_scale) == 1);
    CHECK(plumb::test::says(plumb::test::first_under(r, plumb::rules::unit_scale), "3600"));
    CHECK(count_of(r, plumb::rules::side_mismatch) == 0);
    passes_with_one_note(pump, {"P = ρ*9.81*Q*H/3.6e6"}, plumb::rules::gravity_number);
    const std::string air = "Q_cfm : cfm\nW_1, W_2 : gr/lb\nm_lb : lb/h\nq : kW\nΔT : Δ°F\n";
    const auto g = run(air + "m_lb = 4.5*Q_cfm*(W_1 - W_2)\n");
    CHECK(count_of(g, plumb::rules::unit_scale) == 1);
    CHECK(plumb::test::says(plumb::test::first_under(g, plumb::rules::unit_scale), "divide"));
    CHECK(plumb::test::says(plumb::test::first_under(g, plumb::rules::unit_scale), "by 7000"));
    passes_with_one_note(air, {"m_lb = 4.5*Q_cfm*(W_1 - W_2)/7000"}, plumb::rules::trade_constant);
    fails_with(air, {"Q_cfm = q/(1.08*ΔT)"}, plumb::rules::side_mismatch);
}

// A pump's head from its discharge gauge, H = p_d·1000/(ρ·9.81) + z_g (kPa to Pa, NIST SP 811
// (2008), B.8; g as 9.81, common practice): a gauge pressure over ρ·g is a head, in a sum as
// on its own. Inside the sum the 9.81 was read as g only after the product had reported the
// gauge reading in a quotient, an error on a correct line. Without the 1000 the sum's terms
// disagree by it; a gauge over a density alone, with no g, stays an error.
TEST_CASE("a gauge pressure over a density and a typed g, in a sum with a height") {
    const std::string d = "p_d : kPag\nρ_l : kg/m^3\nz_g, H_p : m\n";
    passes_with_one_note(d, {"H_p = p_d*1000/(ρ_l*9.81) + z_g", "H_p = z_g + p_d*1000/(ρ_l*9.81)"},
                         plumb::rules::gravity_number);
    CHECK(count_of(run(d + "H_p = p_d/(ρ_l*9.81) + z_g\n"), plumb::rules::unit_scale) == 1);
    CHECK(problems_in(run(d + "H_p = p_d*1000/ρ_l + z_g\n")) >= 1);
}

// A bar screen's loss as an orifice, h = (V_b² - v²)/(2·g·C²) (common practice), with one
// velocity in ft/s beside one in m/s: the sum inside is a unit-scale warning, and its scale is
// then unknown, so the 9.81 could not be weighed as g; a second finding, "is a g missing", was
// made. The g is read by its value there, and the slip is reported once.
TEST_CASE("a typed g beside a sum already found in two units is still read as g") {
    const std::string d = "V_b, v_a : m/s\nv_fps : ft/s\nh_L : m\n";
    const auto r = run(d + "h_L = (V_b^2 - v_fps^2)/(2*9.81*0.7)\n");
    CHECK(count_of(r, plumb::rules::unit_scale) == 1);
    CHECK(count_of(r, plumb::rules::side_mismatch) == 0);
    passes_with_one_note(d, {"h_L = (V_b^2 - v_a^2)/(2*9.81*0.7)"}, plumb::rules::gravity_number);
    // Without a g the sides still differ, beside the warning.
    CHECK(count_of(run(d + "h_L = (V_b^2 - v_fps^2)/(2*0.7)\n"), plumb::rules::side_mismatch) == 1);
}

// The hours of a year, 8760 (NIST SP 811 (2008), B.8: 1 a = 365 d), are a time and nothing
// else: methane destroyed in t/yr from Nm³/h holds methane's density, and 8760 is not read as
// water's.
TEST_CASE("the hours of a year are not read as a density") {
    const auto r = run("Q_n : m^3/h\nm_yr : t/yr\nm_yr = Q_n*0.717*8760/1000\n");
    // Methane's 0.717 kg/Nm³ is no quantity plumb knows: the line is still reported.
    REQUIRE(problems_in(r) >= 1);
    for (const auto& d : r.diagnostics)
        CHECK(d.message.find("'8760' is read as the density") == std::string::npos);
}

// Dry air at 0 °C and 101.325 kPa is 1.293 kg/m³ as the tables print it (DIN 1343's normal
// state, from memory), the ideal gas's 1.2922 rounded up by the real gas's compressibility: a
// compressor's free air delivery in normal cubic metres times 1.293 is its mass flow.
TEST_CASE("air's density at the normal state typed as a number") {
    const std::string d = "m : kg/s\nm_h : kg/h\nQ_N : Nm3/min\nQ_Nh : Nm3/h\n";
    passes_with_one_note(d, {"m = Q_N*1.293/60", "m_h = Q_Nh*1.293", "m_h = 1.2929*Q_Nh"},
                         plumb::rules::trade_constant);
    // 1.30 is past it, and a missing /60 stays a finding.
    CHECK(problems_in(run(d + "m = Q_N*1.31/60\n")) > 0);
    CHECK(problems_in(run(d + "m = Q_N*1.293\n")) > 0);
}

// A separator's efficiency η = 1 - C_out/C_in (common practice) with the outlet in mg/L and the
// inlet in ppm: the sum is set equal to a pure number, so its 1 is unity, not water's density
// in kg/L, and the term in two units is the one named, with the ppm against mg/L note.
TEST_CASE("a bare 1 in a sum set equal to a pure number is unity") {
    const std::string d = "η : 1\nC_out : mg/L\nC_in, C_o : ppm\n";
    const auto r = run(d + "η = 1 - C_out/C_in\n");
    CHECK(count_of(r, plumb::rules::trade_constant) == 0);
    CHECK(count_of(r, plumb::rules::sum_mismatch) == 1);
    CHECK(message_of(r, plumb::rules::sum_mismatch).find("'C_out/C_in'") != std::string::npos);
    CHECK(problems_in(run(d + "η = 1 - C_o/C_in\n")) == 0);
}

// A cooling tower's liquid-to-gas ratio L/G = 8.34·gpm/(0.075·cfm) (common practice; water's
// 8.34 lb/gal and 62.4 lb/ft³, standard air's 0.075 lb/ft³, the densities inside the air
// trade's 500 and 1.08, ASHRAE Fundamentals ch. 18, from memory): the two densities make the
// volumes' ratio a ratio of masses. Without them, or with water's per-gallon density on a flow
// in cubic feet, the units stay a finding.
TEST_CASE("water's and air's densities typed as numbers in a mass ratio") {
    const std::string d = "LG : 1\nQ : gpm\nV : cfm\nQ_ft : ft^3/min\n";
    passes_with_one_note(d, {"LG = 8.34*Q/(0.075*V)", "LG = 62.4*Q_ft/(0.075*V)"},
                         plumb::rules::trade_constant);
    // A 1000 beside the two densities is one the units agree without: 1000 times too large.
    for (const char* wrong : {"LG = Q/V", "LG = 8.34*Q/V", "LG = 8.34*Q_ft/(0.075*V)",
                              "LG = 62.4*Q_ft/(0.075*V)*1000"}) {
        CAPTURE(wrong);
        CHECK(problems_in(run(d + wrong + "\n")) > 0);
    }
}

// A day is 24 h, 1440 min or 86400 s (NIST SP 811 (2008), B.8), never a power of ten: where a
// formula counts hours per day (h/d), a season's energy from a day's leaves out the number of
// days, and the /1000 from kW·h to MWh must not be read as the day that is missing.
TEST_CASE("a power of ten is never read as the length of a day or a year") {
    const std::string decl = "P_d : kW\nf_L : %\nh_d : h/d\nN_d : d\nE_s : MWh\nE_d : kWh\n"
                             "E_a : MWh\nP_kW : kW\n";
    for (const char* formula : {"E_s = f_L/100*P_d*h_d/1000", "E_s = P_d*h_d/1000",
                                "E_s = 0.6*P_d*h_d/1000", "E_a = P_kW/1000"}) {
        CAPTURE(formula);
        const auto r = run(decl + formula + "\n");
        CHECK(count_of(r, plumb::rules::side_mismatch) == 1);
        CHECK(count_of(r, plumb::rules::trade_constant) == 0);
    }
    // The note names the rate counted per day, and the count the total needs.
    CHECK(message_of(run(decl + "E_s = P_d*h_d/1000\n"), plumb::rules::side_mismatch).size() > 0);
    const auto r = run(decl + "E_s = P_d*h_d/1000\n");
    bool named = false;
    for (const auto& d : r.diagnostics)
        for (const auto& n : d.notes)
            named = named || n.message.find("'h_d' is counted per day (h/d)") != std::string::npos;
    CHECK(named);
    // With the days written in, and a day's hours typed as 24, the lines pass.
    CHECK(problems_in(run(decl + "E_s = f_L/100*P_d*h_d*N_d/1000\n")) == 0);
    passes_with_one_note(decl, {"E_d = P_kW*24"}, plumb::rules::trade_constant);
}

// Pipeline natural gas carries about 1000 to 1050 Btu/ft³, 37 to 39 MJ/m³ (GPSA Engineering
// Data Book, sec. 23, from memory); the fuel gas codes size a burner's gas at 1000 Btu per
// cubic foot (common practice), and meters bill at about 10.5 kWh/m³. 1000 Btu/ft³ is
// 1000 × 1055.056 J / 0.0283168 m³ = 37.26 MJ/m³ (NIST SP 811 (2008), B.8).
TEST_CASE("a natural gas heating value typed as a number in a burner's gas flow") {
    CHECK(1000.0 * 1055.05585262 / 0.028316846592 == doctest::Approx(37.26e6).epsilon(1e-3));
    const std::string decl = "V_scfh : scfh\nQ_Btuh : Btu/h\nE_kWh : kWh\nV_m3 : m^3\n"
                             "Q_kW : kW\nV_m3h : m^3/h\nP_kPa : kPa\n";
    passes_with_one_note(decl,
                         {"V_scfh = Q_Btuh/1000", "Q_Btuh = 1030*V_scfh", "E_kWh = 10.5*V_m3",
                          "V_m3h = Q_kW*3.6/38"},
                         plumb::rules::trade_constant);
    // The heat set equal to the gas flow, a number that is no heating value, and a pressure
    // lacking from a pressure's formula stay findings.
    for (const char* formula : {"V_scfh = Q_Btuh", "V_scfh = Q_Btuh/600", "P_kPa = 1000*Q_kW"}) {
        CAPTURE(formula);
        CHECK(problems_in(run(decl + formula + "\n")) >= 1);
    }
}

// h = c·(t_F - 32) counts liquid water's enthalpy from 32 °F as the US tables do (common
// practice): the rise above the ice point written out needs no note, while c·t with t in °C
// beside an enthalpy is read as that rise with one.
TEST_CASE("an enthalpy from a reading less its ice point written out passes without a note") {
    const std::string decl = "h_f : Btu/lb \"feedwater enthalpy\"\nc : Btu/(lb*degF)\n"
                             "t_F : degF\nh_c : kJ/kg \"enthalpy\"\nc_w : kJ/(kg*K)\nt_c : degC\n";
    const std::string us = "h_f : Btu/lb \"feedwater enthalpy\"\nc : Btu/(lb*degF)\nt_F : degF\n";
    CHECK(run(us + "h_f = c*(t_F - 32)\n").diagnostics.empty());
    passes_with_one_note(decl, {"h_c = c_w*t_c"}, plumb::rules::trade_constant);
}

// ρ = p·M/(Z·R·T) with R = 8314.46 J/(kmol·K) (CODATA 2018's 8.314462618 J/(mol·K) × 1000),
// p in psia turned to Pa by the rounded 6895 (6894.757 Pa per psi, NIST SP 811 (2008), B.8):
// the conversion's own rounding moves R in the units around it by 3.5e-5, and 8314 is read as
// R all the same. The 8314 left out, or 6895 the wrong way round, stay findings.
TEST_CASE("the molar gas constant per kmol beside a rounded conversion") {
    CHECK(6895.0 / 6894.757293168 - 1.0 == doctest::Approx(3.52e-5).epsilon(1e-2));
    const std::string decl = "p : psia\nM : kg/kmol\nZ : [1]\nT : K\nρ : kg/m^3\n";
    passes_with_one_note(decl, {"ρ = p*6895*M/(Z*8314*T)", "ρ = p*6894.76*M/(Z*8314.46*T)"},
                         plumb::rules::trade_constant);
    for (const char* formula : {"ρ = p*6895*M/(Z*T)", "ρ = p/6895*M/(Z*8314*T)"}) {
        CAPTURE(formula);
        CHECK(problems_in(run(decl + formula + "\n")) >= 1);
    }
}

// An inch of water at 60 °F is 248.84 Pa (NIST SP 811 (2008), B.8), the gas-measurement
// standards' inch, against the conventional 249.089: 27.707 inches per psi. Read as the inch
// at the water's temperature, with a note; 248.84 the wrong way round stays a finding.
TEST_CASE("the inch of water at 60 °F in a meter's differential") {
    CHECK(6894.757293168 / 248.84 == doctest::Approx(27.707).epsilon(1e-4));
    const std::string decl = "h_w : inH2O\nΔp_Pa : Pa\nΔp_psi : psi\n";
    passes_with_one_note(decl, {"Δp_Pa = 248.84*h_w", "Δp_psi = h_w/27.707"},
                         plumb::rules::trade_constant);
    CHECK(problems_in(run(decl + "Δp_Pa = h_w/248.84\n")) >= 1);
}

// P = ρ·g·Q·H (any hydraulics text): in W with every input in SI, a /10^6 is not needed, and
// the finding names the power 10^6 rather than its base 10.
TEST_CASE("a power of ten not needed is named as the power written") {
    const auto r = run("P : W\nm : kg/s\nh : m\nP = m*9.81*h/10^6\n");
    CHECK(message_of(r, plumb::rules::unit_scale).find("the factor 10^6 is not needed") !=
          std::string::npos);
}

// A pump's hydraulic power is the pressure it adds times the flow (common practice): a
// discharge gauge reading stands for it only from a vented tank, and the finding on ṁ/ρ times
// a gauge reading says to take the rise, not to add the atmosphere.
TEST_CASE("a gauge reading in a pump's power is told to take the rise") {
    const auto r = run("m : kg/h\nρ : kg/m^3\np_d, p_s : barg\nP : kW\n"
                       "P = m/(3600*ρ)*p_d*100\n");
    REQUIRE(count_of(r, plumb::rules::offset_scale) == 1);
    bool told = false;
    for (const auto& d : r.diagnostics)
        for (const auto& n : d.notes)
            told = told || n.message.find("the discharge less the suction") != std::string::npos;
    CHECK(told);
    CHECK(problems_in(run("m : kg/h\nρ : kg/m^3\np_d, p_s : barg\nP : kW\n"
                          "P = m/(3600*ρ)*(p_d - p_s)*100\n")) == 0);
}

// API 650's one-foot method, t = 4.9·D·(H - 0.3)·G/S in mm from m and MPa, and its US form
// 2.6·D·(H - 1)·G/S in inches from ft and psi (API 650, 5.6.3.2, from memory): 4.9 and 2.6 are
// half water's specific weight in the units around them (9.80665 kN/m³ / 2 = 4.903e-3 MPa/m,
// times 1000 mm/m; 62.4 lb/ft³ / 2 / 144 × 12 = 2.6).
TEST_CASE("half the specific weight of water in a tank shell's one-foot method") {
    CHECK(62.4 / 2.0 / 144.0 * 12.0 == doctest::Approx(2.6));
    const std::string decl = "t_mm : mm\nD : m\nH : m\nG : [1]\nS : MPa\n"
                             "t_in : in\nD_ft, H_ft : ft\nS_psi : psi\n";
    passes_with_one_note(
        decl, {"t_mm = 4.9*D*(H - 0.3 {m})*G/S", "t_in = 2.6*D_ft*(H_ft - 1 {ft})*G/S_psi"},
        plumb::rules::gravity_number);
    // The number left out, or a mm result from the US form, stay findings.
    for (const char* formula :
         {"t_mm = D*(H - 0.3 {m})*G/S", "t_mm = 2.6*D_ft*(H_ft - 1 {ft})*G/S_psi"}) {
        CAPTURE(formula);
        CHECK(problems_in(run(decl + formula + "\n")) >= 1);
    }
}

// A total per year from a rate per hour and a count per year lacks the hours of each count,
// not a count of years: the per-period note is kept for a side that is no rate itself.
TEST_CASE("the count of periods is not named where the other side is counted per period too") {
    const auto r = run("F_yr : L/yr\nFC : L/h\nn_sh : 1/yr\nF_yr = FC*n_sh/1000\n");
    REQUIRE(count_of(r, plumb::rules::side_mismatch) == 1);
    for (const auto& d : r.diagnostics)
        for (const auto& n : d.notes)
            CHECK(n.message.find("is counted per") == std::string::npos);
}

// The water rule's 500 is Btu/h per gpm·°F (8.33 lb/gal × 60 min/h × 1 Btu/(lb·°F); ASHRAE
// Fundamentals, common practice). Beside a flow in gal/h it is still water's heat capacity, 60
// times too much: the scale rule names the 60 rather than a dimension that differs.
TEST_CASE("the water rule's 500 beside a flow per hour") {
    const std::string booster =
        "Q_gph : gal/h\nQ_gpm : gpm\n\u0394T_F : \u0394\u00B0F\nq : Btu/h\n";
    passes(booster, {"q = 500*Q_gpm*\u0394T_F", "q = 8.33*Q_gph*\u0394T_F"});
    const auto r = plumb::test::check_after(booster, "q = 500*Q_gph*\u0394T_F");
    CHECK(count_of(r, plumb::rules::trade_constant) == 1);
    CHECK(plumb::test::first_under(r, plumb::rules::unit_scale)
              .message.find("counts 60 times as much") != std::string::npos);
}

// 0.433 psi/ft is water's weight per foot of column (62.4 lbf/ft³ over 144 in²/ft²; common
// practice): g is in it. Beside a density the slip is the density, and the note says so rather
// than asking for a g.
TEST_CASE("water's gradient beside a density is no missing g") {
    const std::string column = "\u0394p : psi\n\u03C1_w : lb/ft^3\nL : ft\nSG : 1\n";
    passes(column, {"\u0394p = 0.433*SG*L"});
    const auto r = plumb::test::check_after(column, "\u0394p = 0.433*\u03C1_w*L");
    const auto& d = plumb::test::first_under(r, plumb::rules::side_mismatch);
    const bool density_named = std::any_of(d.notes.begin(), d.notes.end(), [](const auto& n) {
        return n.message.find("water's weight per unit depth") != std::string::npos;
    });
    const bool g_asked = std::any_of(d.notes.begin(), d.notes.end(), [](const auto& n) {
        return n.message.find("is a g missing") != std::string::npos;
    });
    CHECK(density_named);
    CHECK_FALSE(g_asked);
}

// A half-life from a first-order rate, t½ = ln 2/k (0.693; common practice): written
// 0.693*k the sides are reciprocals, and the note says the rate belongs below the line rather
// than offering 0.693 as a fit's constant with units. A dead load in kN/m² from kg/m² over
// 1000 lacks a g, which its own note names; 1000 is offered as no fit's constant.
TEST_CASE("reciprocal sides and a power of ten are no fit's constant") {
    const std::string decay = "t_half : d\nk_tot : 1/d\ng_k : kN/m^2\nm_dead : kg/m^2\n";
    const auto r = plumb::test::check_after(decay, "t_half = 0.693*k_tot");
    const auto& d = plumb::test::first_under(r, plumb::rules::side_mismatch);
    CHECK(std::any_of(d.notes.begin(), d.notes.end(), [](const auto& n) {
        return n.message.find("reciprocals of each other: 'k_tot' may belong below the line, "
                              "as in 0.693/k_tot") != std::string::npos;
    }));
    const auto g = plumb::test::check_after(decay, "g_k = m_dead/1000");
    const auto& dg = plumb::test::first_under(g, plumb::rules::side_mismatch);
    CHECK(std::none_of(dg.notes.begin(), dg.notes.end(),
                       [](const auto& n) { return n.message.find("1000?") != std::string::npos; }));
    CHECK(std::any_of(dg.notes.begin(), dg.notes.end(), [](const auto& n) {
        return n.message.find("is a g missing") != std::string::npos;
    }));
}

// A static gas column, p_2 = p_1·exp(0.01875·γ_g·D/(z·T)) in psia from ft and °R (GPSA
// Engineering Data Book, from memory): 0.01875 °R/ft is g·M_air/R (g_n and R from CODATA 2018,
// M_air 28.96 g/mol: 0.018743 °R/ft, 0.03416 K/m). Inside exp it makes the argument a pure
// number, as a number carrying g does in a sum; the same number beside metres and kelvins, or
// with the temperature left out, still fails.
TEST_CASE("the gas column's constant inside exp is read as g·M_air/R") {
    const std::string column = "p_1, p_2 : psia\nγ_g, z : 1\nD : ft\nT : °R\nD_m : m\nT_K : K\n";
    for (const char* formula :
         {"p_2 = p_1*exp(0.01875*γ_g*D/(z*T))", "p_2 = p_1*exp(0.0342*γ_g*D_m/(z*T_K))"}) {
        CAPTURE(formula);
        const auto r = plumb::test::check_after(column, formula);
        CHECK(problems_in(r) == 0);
        CHECK(count_of(r, plumb::rules::gravity_number) == 1);
    }
    fails_with(column, {"p_2 = p_1*exp(0.01875*γ_g*D_m/(z*T_K))", "p_2 = p_1*exp(0.01875*γ_g*D/z)"},
               plumb::rules::dimensioned_argument);
}

// The pump trade's P = Q·H/367 takes the flow in m³/h (kW, m; 367 = 3600/(ρ_w·g_n) in those
// units, common practice); in L/s the number is about 101.9, in L/min about 6117. The message
// names the flow's unit, not a specific weight the 367 already holds.
TEST_CASE("a pump's 367 beside a flow in L/s names the m³/h it takes") {
    const std::string decl = "P_p : kW\nQ_Ls : L/s\nH_p : m\nη : 1\n";
    const auto r = plumb::test::check_after(decl, "P_p = Q_Ls*H_p/(367*η)");
    REQUIRE(count_of(r, plumb::rules::side_mismatch) == 1);
    CHECK(plumb::test::says(plumb::test::first_under(r, plumb::rules::side_mismatch),
                            "'367' is one over the specific weight of water for 'Q_Ls' in m³/h"));
}

// Hydraulic horsepower, HHP = Δp·Q/1714 from psi and gpm (common practice): 1714.29 =
// 33 000·12/231, a horsepower being 33 000 ft·lbf/min and a US gallon 231 in³ (NIST SP 811
// (2008), B.8). A barrel is 42 US gal (ibid.), so 1 gpm is 34.2857 bbl/d. Beside a rate in
// bbl/d the message names the flow's unit and the 34.29 the formula is off by, not 58 776 as
// though 1714 were no constant.
TEST_CASE("the pump trade's 1714 beside a flow in bbl/d names the gpm it takes") {
    const std::string decl = "HHP : hp\np_d, p_s : psig\nq_b : bbl/d\nQ : gpm\n";
    CHECK(problems_in(plumb::test::check_after(decl, "HHP = (p_d - p_s)*Q/1714")) == 0);
    const auto r = plumb::test::check_after(decl, "HHP = (p_d - p_s)*q_b/1714");
    REQUIRE(count_of(r, plumb::rules::unit_scale) == 1);
    const auto& d = plumb::test::first_under(r, plumb::rules::unit_scale);
    CHECK(plumb::test::says(d, "34.29"));
    CHECK(plumb::test::says(d, "1714 fits these units with 'q_b'"));
    CHECK(plumb::test::says(d, "in gpm"));
    CHECK_FALSE(plumb::test::says(d, "58775"));
}

// Q = C_d·b·a·√(2·g·H) with the opening in mm over 1000 (common practice): the 9.81 is g, the
// 2 the formula's own, never "twice g" beside a 9.81 taken for a conversion.
TEST_CASE("a typed g is read as g, not as a conversion beside a twice-g 2") {
    const auto r = plumb::test::check_after("Q : m^3/s\nC_d : 1\nb : m\na_mm : mm\nH : m\n",
                                            "Q = C_d*b*a_mm/1000*sqrt(2*9.81*H)");
    CHECK(problems_in(r) == 0);
    REQUIRE(count_of(r, plumb::rules::gravity_number) == 1);
    CHECK(plumb::test::says(plumb::test::first_under(r, plumb::rules::gravity_number),
                            "'9.81' is read as standard gravity"));
}

// Torricelli's v = √(2·g·h) with √(2·g_n) outside the root: 4.43 m^½/s and 8.02 ft^½/s (g_n =
// 9.80665 m/s², 1 ft = 0.3048 m, NIST SP 811 (2008), B.8; the orifice forms Q = 8.02*C*a*√H of
// King and Brater, Handbook of Hydraulics, from memory). The 3 of a weir's 2/3 is no such
// number, nor 8.02 beside a head in m.
TEST_CASE("the square root of twice g written outside the root") {
    const std::string decl = "Q_cfs : ft^3/s\nC : 1\na_ft : ft^2\nH_ft : ft\nQ : m^3/s\na : m^2\n"
                             "H : m\nv : m/s\nv_f : ft/s\n";
    passes_with_one_note(decl,
                         {"Q_cfs = 8.02*C*a_ft*sqrt(H_ft)", "Q = 4.43*C*a*sqrt(H)",
                          "v = 4.43*sqrt(H)", "v_f = 8.02*sqrt(H_ft)", "v = sqrt(H)*4.429"},
                         plumb::rules::gravity_number);
    fails_with(decl, {"v = 8.02*sqrt(H)", "v = 3*sqrt(H)", "v_f = 4.43*sqrt(H_ft)"},
               plumb::rules::side_mismatch);
}

// A chip store's days of storage, V·f/(ṁ_d/ρ_b) (common practice): with the bulk density left
// out, the /100 beside a fill in % is the percentage's, not one over water's density that the
// % makes of it. A pumping energy's 2.725 kWh/ML per metre is 1000 × 9.81/3600, water's
// specific weight as the trade rounds it, beside an efficiency in % over its 100.
TEST_CASE("a 100 beside a percentage carries no quantity") {
    const std::string store = "V_s : m^3\nf : %\nm_d : t/d\nρ_b : kg/m^3\nt_s : d\n";
    CHECK(count_of(run(store + "t_s = V_s*f/100/m_d\n"), plumb::rules::side_mismatch) == 1);
    passes(store, {"t_s = V_s*f/100*ρ_b/1000/m_d"});
    const std::string pumping = "e : kWh/ML\nH : m\nη : %\n";
    passes_with_one_note(pumping, {"e = 2.725*H/(η/100)"}, plumb::rules::gravity_number);
}

// A drill string's buoyancy factor BF = 1 − ρ_mud/ρ_steel, 1 − MW/65.5 with the mud in lb/gal
// (API RP 7G, from memory; 65.5 lb/gal = 7849 kg/m³), a plate's mass 7850 kg/m³ and a member's
// self-weight 77 kN/m³ (EN 1991-1-1, Table A.4, from memory). Steel's 489.5 lb/ft³ beside a mud
// weight in lb/gal is no density in those units, and stays an error.
TEST_CASE("steel's density and unit weight typed as numbers") {
    const std::string d = "MW : lb/gal\nρ_m : kg/m^3\nBF : 1\nw_a : kN/m\nA : m^2\n"
                          "m : kg\nV_mm : mm^3\n";
    passes_with_one_note(d, {"BF = 1 - MW/65.5", "BF = 1 - ρ_m/7850", "m = V_mm*7850/1e9"},
                         plumb::rules::trade_constant);
    passes_with_one_note(d, {"w_a = 77*A", "w_a = 78.5*A"}, plumb::rules::gravity_number);
    fails_with(d, {"BF = 1 - MW/489.5", "BF = 1 - MW/60"}, plumb::rules::sum_mismatch);
}

// Real power is the apparent power times the power factor, P = S·pf, so S = P/pf (IEC 80000-6,
// from memory): the power factor is at most 1 and the apparent power the larger. Written the
// other way round (S = P·pf, P = S/pf) the kVA comes out pf² of its value; the units cannot
// say so, as the power factor is a pure number. An efficiency beside it changes nothing.
TEST_CASE("a power factor on the wrong side of an apparent power") {
    const std::string decl =
        "S : kVA\nP : kW\nP_w : MW\npf : 1 \"power factor\"\nη : 1 \"efficiency\"\n";
    for (const char* formula : {"S = P*pf", "P = S/pf", "S = 1000*P_w*pf"}) {
        CAPTURE(formula);
        const auto r = run(decl + formula + "\n");
        CHECK(count_of(r, plumb::rules::unit_scale) == 1);
        CHECK(says(first_under(r, plumb::rules::unit_scale), "wrong way round"));
    }
    for (const char* formula : {"S = P/pf", "P = S*pf", "S = P/(η*pf)", "P = η*pf*S"}) {
        CAPTURE(formula);
        CHECK(problems_in(run(decl + formula + "\n")) == 0);
    }
}

// Sea water is about 1025 kg/m³ (ITTC 7.5-02-01-03, 2011, from memory), 64 lb/ft³ and 1.99
// slug/ft³ (NIST SP 811 (2008), B.8: 1 lb/ft³ = 16.01846 kg/m³, 1 slug/ft³ = 515.3788 kg/m³);
// its weight, 10.05 kN/m³ or 0.445 psi per foot, gives a sea wall's or a caisson's pressure.
// A bare 1000 beside a pump's flow and head into kW is water's density with g left out, and
// stays a finding.
TEST_CASE("sea water's density and specific weight typed as numbers") {
    const std::string decl = "p_psi : psi\nh_ft : ft\nγ_sat, γ_b : kN/m^3\nγ_pcf, γ_bp : lbf/ft^3\n"
                             "p_kPa : kPa\nh : m\nρ_lb : slug/ft^3\nP : kW\nQ : m^3/s\nη : 1\n";
    passes_with_one_note(
        decl, {"p_psi = 0.445*h_ft", "γ_b = γ_sat - 10.05", "γ_bp = γ_pcf - 64", "p_kPa = 10.05*h"},
        plumb::rules::gravity_number);
    passes_with_one_note(decl, {"ρ_lb = 1.99"}, plumb::rules::trade_constant);
    CHECK(problems_in(run(decl + "P = 1000*Q*h/η\n")) >= 1);
    CHECK(problems_in(run(decl + "p_kPa = 10.05*h_ft\n")) >= 1);
}

// Hot water's density, 983.2 kg/m³ at 60 °C to 958.4 at 100 °C (CRC Handbook of Chemistry and
// Physics, water's density by temperature; from memory): a heating flow in L/s from kg/s
// divides by it. Sea water's 1.025 multiplied where it divides stays a finding, and so does
// a density far from water's.
TEST_CASE("hot water's density typed as a number") {
    const std::string decl = "m : kg/s\nQ : L/s\n";
    passes_with_one_note(decl, {"Q = m/0.978", "Q = m/0.9718", "Q = m/0.9832", "Q = m/0.998"},
                         plumb::rules::trade_constant);
    CHECK(problems_in(run(decl + "Q = m*1.025\n")) >= 1);
    CHECK(problems_in(run(decl + "Q = m/0.90\n")) >= 1);
}

// A gas line's friction in psi from a density in lb/ft³, Δp = f·(L/D)·ρ·v²/(2·g_c·144) (Crane
// TP-410, from memory), with the bore in inches over 12: every number converts (in to ft, ft²
// to in²), and what the line lacks is g_c = 32.174 lbm·ft/(lbf·s²) (NIST SP 811 (2008), B.8:
// 1 lbf = 4.448222 N, g_n/0.3048 m = 32.174 ft/s²). The finding names g_c, and its advice,
// followed, gives the right line, which passes.
TEST_CASE("a pound-mass density into pounds of force without g_c") {
    const std::string decl = "Δp : psi\nf : 1\nL, d : in\nρ : lb/ft^3\nv : ft/s\nL_ft : ft\n";
    for (const char* formula :
         {"Δp = f*(L_ft/(d/12))*ρ*v^2/(2*144)", "Δp = f*(L/d)*ρ*v^2/(2*144)"}) {
        CAPTURE(formula);
        const auto r = run(decl + formula + "\n");
        CHECK(count_of(r, plumb::rules::unit_scale) == 1);
        CHECK(says(first_under(r, plumb::rules::unit_scale), "g_c = 32.174"));
        CHECK(says(first_under(r, plumb::rules::unit_scale), "divide"));
    }
    CHECK(problems_in(run(decl + "Δp = f*(L_ft/(d/12))*ρ*v^2/(2*32.174*144)\n")) == 0);
    CHECK(problems_in(run(decl + "Δp = f*(L/d)*ρ*v^2/(2*32.2*144)\n")) == 0);
}

// Moist air's enthalpy counts from dry air at 0 °C on the SI chart and at 0 °F on the I-P chart
// (ASHRAE Handbook—Fundamentals, ch. 1, from memory): 1.006 × (−17.78 °C) = −17.88 kJ/kg, so a
// reading converts as h_IP = h_SI/2.326 + 7.687 Btu/lb (1 Btu/lb = 2.326 kJ/kg, NIST SP 811
// (2008), B.8). The factor alone is the slip; a difference converts by it alone, and a steam
// table's enthalpies share one zero in both systems.
TEST_CASE("moist air's enthalpy between the SI and I-P charts") {
    const std::string decl =
        "h_o : kJ/kg \"outdoor air enthalpy\"\n"
        "h_oI : Btu/lb \"outdoor air enthalpy, I-P chart\"\n"
        "Δh : kJ/kg \"air enthalpy difference across the coil\"\n"
        "Δh_I : Btu/lb \"the same difference, I-P\"\n"
        "h_s : kJ/kg \"steam enthalpy\"\nh_sI : Btu/lb \"steam enthalpy, I-P\"\n";
    for (const char* formula : {"h_oI = h_o/2.326", "h_o = 2.326*h_oI", "h_oI = 0.4299*h_o"}) {
        CAPTURE(formula);
        const auto r = run(decl + formula + "\n");
        CHECK(count_of(r, plumb::rules::offset_scale) == 1);
        CHECK(says(first_under(r, plumb::rules::offset_scale), "7.687 Btu/lb"));
    }
    passes_with_one_note(decl, {"h_oI = h_o/2.326 + 7.68", "h_o = 2.326*(h_oI - 7.687)"},
                         plumb::rules::trade_constant);
    for (const char* formula :
         {"h_oI = h_o/2.326 + 7.68 {Btu/lb}", "Δh_I = Δh/2.326", "h_sI = h_s/2.326"}) {
        CAPTURE(formula);
        CHECK(problems_in(run(decl + formula + "\n")) == 0);
    }
    CHECK(problems_in(run(decl + "h_oI = h_o/2.326 + 7.0\n")) >= 1);
}

// The chart's own formula typed with bare numbers (ASHRAE Handbook—Fundamentals, ch. 1,
// from memory): h = 1.006·t + W·(2501 + 1.86·t) kJ/kg with t in °C, h = 0.240·t + W·(1061 +
// 0.444·t) Btu/lb with t in °F. Its numbers carry units, and t counts from the chart's zero;
// the SI numbers with a °F reading, or an enthalpy in J/kg, or grams per kilogram without
// the 1000, stay findings.
TEST_CASE("moist air's enthalpy typed with the chart's bare numbers") {
    const std::string decl = "t, t_2 : °C \"supply air\"\nt_F : °F \"supply air\"\n"
                             "W : kg/kg \"humidity ratio\"\nW_g : g/kg \"humidity ratio\"\n"
                             "W_gr : gr/lb \"humidity ratio\"\nh : kJ/kg \"moist air enthalpy\"\n"
                             "h_J : J/kg \"moist air enthalpy\"\nh_ip : Btu/lb \"enthalpy\"\n";
    passes_with_one_note(decl,
                         {"h = 1.006*t + W*(2501 + 1.86*t)", "h = 1.005*t + W*(2500 + 1.88*t)",
                          "h = 1.006*t + W_g/1000*(2501 + 1.86*t)",
                          "h = 1.006*t + 2501*W + 1.86*W*t", "h = W*(1.86*t + 2501) + t*1.006",
                          "h_ip = 0.240*t_F + W*(1061 + 0.444*t_F)",
                          "h_ip = 0.24*t_F + W_gr/7000*(1061 + 0.444*t_F)"},
                         plumb::rules::trade_constant);
    for (const char* slip :
         {"h = 1.006*t_F + W*(2501 + 1.86*t_F)", "h_J = 1.006*t + W*(2501 + 1.86*t)",
          "h_ip = 0.240*t + W*(1061 + 0.444*t)", "h = 1.006*t + W_g*(2501 + 1.86*t)",
          "h = 1.006*t + W*(2501 + 1.86*t_2)", "h_ip = 0.240*t_F + W*(2501 + 0.444*t_F)"}) {
        CAPTURE(slip);
        CHECK(problems_in(run(decl + slip + "\n")) >= 1);
    }
    // Said for what it is, not as a fit to be accepted with a reviewed mark.
    const auto fahrenheit = run(decl + "h = 1.006*t_F + W*(2501 + 1.86*t_F)\n");
    CHECK(says(first_under(fahrenheit, plumb::rules::offset_scale), "the reading is in \u00B0F"));
    CHECK_FALSE(says(first_under(fahrenheit, plumb::rules::offset_scale), "reviewed"));
    const auto grams = run(decl + "h = 1.006*t + W_g*(2501 + 1.86*t)\n");
    CHECK(says(first_under(grams, plumb::rules::unit_scale), "divide it by 1000"));
}
