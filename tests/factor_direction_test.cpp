// A short factor written upside down (/60 for *60, /3.6, *360, /1.8) is named as the wrong way
// round, like the long ones, so that following the message fixes the formula.
#include "plumb/check.hpp"
#include "plumb/rules.hpp"
#include "test_support.hpp"

#include <doctest/doctest.h>

#include <string>

namespace {

std::string only_finding(const std::string& text) {
    const auto r = plumb::check_text("f.plumb", text);
    std::string out;
    for (const auto& d : r.diagnostics)
        if (d.rule != plumb::rules::unused)
            out += d.message + "\n";
    return out;
}

} // namespace

// 1 min = 60 s, 1 L/s = 3.6 m³/h, 1 K = 1.8 °F in differences (NIST SP 811 (2008), App. B and
// B.9); the metric rational method's 1/360 follows from 1 mm/h on 1 ha = 10 m³/h (common
// practice, computed from the SI prefixes).
TEST_CASE("factor direction: short factors written the wrong way round") {
    const std::string decl = "Q : m^3/s\nt : min\nV : m^3\nq : L/s\nq_h : m^3/h\n"
                             "d_C : Δ°C\nd_F : Δ°F\ni : mm/h\nA : ha\nC : 1\n";
    struct row {
        const char* wrong;
        const char* right;
        const char* factor;
    };
    for (const row& r :
         {row{"V = Q*t/60", "V = Q*t*60", "60"}, row{"q_h = q/3.6", "q_h = q*3.6", "3.6"},
          row{"d_F = d_C/1.8", "d_F = d_C*1.8", "1.8"},
          row{"Q = C*i*A*360", "Q = C*i*A/360", "360"}}) {
        CAPTURE(r.wrong);
        const std::string wrong = only_finding(decl + r.wrong + "\n");
        CHECK(wrong.find(std::string("the factor ") + r.factor + " is the wrong way round") !=
              std::string::npos);
        CHECK(only_finding(decl + r.right + "\n").empty());
    }
    // A physics number is not blamed when flipping it does not reconcile the units.
    const std::string physics = only_finding(decl + "V = Q*t/2\n");
    CHECK(physics.find("wrong way round") == std::string::npos);
    CHECK(physics.find("counts") != std::string::npos);
}

// hp to kW divided by 0.746 where it multiplies (1 hp = 745.7 W, NIST SP 811 (2008), B.8): the
// result is 1/0.746² = 1.797 times its true value, said as a decimal.
TEST_CASE("a wrong-way factor's error is said as a decimal") {
    const auto r = plumb::check_text("f.plumb", "P_kW : kW\nP_hp : hp\nP_kW = P_hp/0.746\n");
    REQUIRE(plumb::test::count_of(r, plumb::rules::unit_scale) == 1);
    CHECK(plumb::test::says(plumb::test::first_under(r, plumb::rules::unit_scale),
                            "as written the result is 1.79689 times its true value"));
}

// 1 Btu/(lb·°F) = 4.1868 kJ/(kg·K) (NIST SP 811 (2008), B.8), the degree's 1.8 inside it:
// a 1.8 or 0.5556 beside it converts the degree twice. A 1.8 beside units without a
// temperature stays a coefficient (a load factor on a pressure, common practice).
TEST_CASE("a degree's 1.8 beside a conversion that holds it already") {
    const std::string decl = "cp : kJ/(kg*K)\ncp_us : Btu/(lb*°F)\nk : W/(m*K)\n"
                             "k_us : Btu/(h*ft*°F)\np : kPa\np_psi : psi\nT_R : °R\nT_K : K\n";
    for (const char* wrong :
         {"cp = 4.187*1.8*cp_us", "cp = 1.8*cp_us*4.1868", "cp = 4.187*cp_us/1.8",
          "cp = 4.187*0.5556*cp_us", "k = 1.731*1.8*k_us"}) {
        CAPTURE(wrong);
        const std::string found = only_finding(decl + wrong + "\n");
        CHECK(found.find("the factor ") == 0);
        CHECK(found.find(" is not needed") != std::string::npos);
    }
    for (const char* right : {"cp = 4.187*cp_us", "k = 1.731*k_us", "p = 1.8*6.895*p_psi",
                              "T_R = 1.8*T_K", "T_K = T_R/1.8"}) {
        CAPTURE(right);
        CHECK(only_finding(decl + right + "\n").empty());
    }
}

// Messages that follow the slip, not a number taken for what it is not:
// - t½ = 0.693·V/Q (ln 2; common practice) with V in US gallons and Q in m³/h is off by the
//   gallons in a cubic metre, 264.172 (NIST SP 811 (2008), B.8), not by a power of ten;
// - 1/(C_w/S_s + 1 − C_w) with C_w in %: beside unity the share in % is the term off;
// - (t_F − 32)/1.8 + 273.15 into °C: the 273.15 of the kelvins is the slip (NIST SP 811 (2008),
//   4.2.1.1), and the scale named is the kelvins';
// - 0.10·p_set,g beside psia at a declared site: the barometer to add is in psi, not a tenth.
TEST_CASE("messages name the slip a formula holds") {
    const auto half = plumb::test::check_after("t_half : h\nV_gal : gal\nB_m3h : m3/h\n",
                                               "t_half = 0.693*V_gal/B_m3h");
    CHECK(plumb::test::says(plumb::test::first_under(half, plumb::rules::unit_scale),
                            "counts 264.172 times"));
    const auto share =
        plumb::test::check_after("C_w : %\nS_s, S_m : 1\n", "S_m = 1/(C_w/S_s + 1 - C_w)");
    CHECK(plumb::test::says(plumb::test::first_under(share, plumb::rules::unit_scale),
                            "divide 'C_w/S_s' by 100"));
    CHECK(plumb::test::says(plumb::test::first_under(share, plumb::rules::unit_scale),
                            "divide it by 100 in each term it stands in"));
    const auto kelvins =
        plumb::test::check_after("t_C : °C\nt_F : °F\n", "t_C = (t_F - 32)/1.8 + 273.15");
    const auto& k = plumb::test::first_under(kelvins, plumb::rules::offset_scale);
    CHECK(plumb::test::says(k, "the absolute scale (K)"));
    CHECK(plumb::test::says(k, "drop the 273.15"));
    const auto share_of_gauge = plumb::test::check_after(
        "p_baro : kPa \"site barometric pressure, 94.6 kPa\"\np_a : psia\np_set : psig\n",
        "p_a <= 0.10*p_set");
    CHECK(plumb::test::says(plumb::test::first_under(share_of_gauge, plumb::rules::offset_scale),
                            "write (0.10*p_set + 13.7206), 'p_baro' in psi"));
}

// A °F reading less a °F reading converted to °C, t_1 − (t_2 − 32)/1.8: the two scales' zeros
// (0 °F = 255.372 K, 0 °C = 273.15 K; NIST SP 811 (2008), 4.2.1.1) are the finding, not an
// absolute scale's.
TEST_CASE("a difference of readings on two offset scales names both") {
    const auto r = plumb::test::check_after("t_1, t_2 : °F\nΔT : K\n", "ΔT = t_1 - (t_2 - 32)/1.8");
    const auto& d = plumb::test::first_under(r, plumb::rules::offset_scale);
    CHECK(plumb::test::says(d, "on the °F scale and '(t_2 - 32)/1.8' on the °C scale"));
    CHECK(plumb::test::says(d, "take both readings to one scale"));
}

// Inside a sine or a tangent the angle is taken in radians; one in degrees is converted by
// π/180 once (SI Brochure 9th ed., table 8: 1° = π/180 rad). Turned over, the argument is
// 57.2958² = 3282.81 times too large; written twice, 57.2958 times too small; 180/π beside
// an angle in rad gives degrees the function does not take. Each was passed or misnamed.
TEST_CASE("the degree's conversion inside a trigonometric function") {
    const std::string decl = "α : deg\nθ : rad\nr_t, L : m\n";
    plumb::test::each_passes(decl, {"r_t = L/2*tan(α*pi/180)", "r_t = L/2*tan(θ)"});
    const auto turned = plumb::test::check_after(decl, "r_t = L/2*tan(α*180/pi)");
    CHECK(plumb::test::says(plumb::test::first_under(turned, plumb::rules::unit_scale),
                            "3282.81 times its true value"));
    const auto twice = plumb::test::check_after(decl, "r_t = L/2*tan(α*pi/180*pi/180)");
    CHECK(plumb::test::says(plumb::test::first_under(twice, plumb::rules::unit_scale),
                            "written twice"));
    const auto radians = plumb::test::check_after(decl, "r_t = L/2*tan(θ*180/pi)");
    CHECK(plumb::test::says(plumb::test::first_under(radians, plumb::rules::unit_scale),
                            "in radians already"));
}

// 1 psf = 47.88 Pa, 1 US gal = 3.785 L, 1 kW = 3412 Btu/h (NIST SP 811 (2008), B.8): a factor
// turned over with the kPa's, the litre's or the million's power of ten also left out is named
// for both, so that following the message mends the line; the right forms stay clean.
TEST_CASE("factor direction: a factor turned over and a power of ten short") {
    const std::string decl = "s_k : kPa\nq_psf : psf\nV_m3 : m^3\nV_gal : gal\nQ_kW : kW\n"
                             "Q_MM : MMBtu/h\n";
    struct row {
        const char* wrong;
        const char* right;
        const char* said;
    };
    for (const row& r :
         {row{"q_psf = 47.88*s_k", "q_psf = s_k*1000/47.88",
              "the factor 47.88 is the wrong way round, and a further 1000 is missing: the units "
              "of '47.88*s_k' need a division by 47.88 and a multiplication by 1000"},
          row{"V_gal = 3.785*V_m3", "V_gal = V_m3*1000/3.785",
              "the factor 3.785 is the wrong way round, and a further 1000 is missing"},
          row{"Q_MM = Q_kW/3412", "Q_MM = Q_kW*3412/10^6",
              "the factor 3412 is the wrong way round, and a further 10⁶ is missing: the units "
              "of 'Q_kW/3412' need a multiplication by 3412 and a division by 10⁶"}}) {
        CAPTURE(r.wrong);
        CHECK(only_finding(decl + r.wrong + "\n").find(r.said) == 0);
        CHECK(only_finding(decl + r.right + "\n").empty());
    }
    // The psi's 6.895 in place of the psf's 47.88: turned over, still no power of ten apart.
    const std::string other = only_finding(decl + "q_psf = 6.895*s_k\n");
    CHECK(other.find("a further") == std::string::npos);
    CHECK(other.find("counts") != std::string::npos);
}

// 1 kg = 2.20462 lb (NIST SP 811 (2008), B.8): 7936.64 lb/h per kg/s. 7941 is 0.055 % above it,
// further than a factor printed to four digits may stray. The finding says how near the number
// is; the factor for the term is offered only for the reading of 7941 as a coefficient, since
// with 7941 taken as the conversion, multiplying by it again would leave the line 7941 times
// too large.
TEST_CASE("factor direction: a number near the conversion is not told to take it as well") {
    const std::string found = only_finding("E_lbh : lb/h\nE_kgs : kg/s\nE_lbh = 7941*E_kgs\n");
    CHECK(found.find("counts") != std::string::npos);
    const auto r = plumb::check_text("f.plumb", "E_lbh : lb/h\nE_kgs : kg/s\nE_lbh = 7941*E_kgs\n");
    REQUIRE(plumb::test::count_of(r, plumb::rules::unit_scale) == 1);
    const plumb::diagnostic& d = plumb::test::first_under(r, plumb::rules::unit_scale);
    CHECK(plumb::test::says(d, "7941 is 0.055 % above 7936.64"));
    CHECK(plumb::test::says(d, "if 7941 is a coefficient of the formula and not the conversion, "
                               "multiply '7941*E_kgs' by 7936.64"));
    CHECK_FALSE(plumb::test::says(d, "(declare the symbols in coherent units"));
}

// Factors printed to four digits from older definitions or chained from two rounded ones pass:
// 2.205 lb/kg × 3600 s/h = 7938 (0.017 % above 7936.64); 3413 Btu/h per kW (3412.14, 0.025 %
// above; 1 Btu_IT = 1055.056 J, NIST SP 811 (2008), B.8); 249.1 Pa per in. w.g. over 0.3048 m
// per ft, 817.3 (817.22, 0.01 % above; 1 inH2O (39.2 °F) = 249.082 Pa, NIST SP 811 (2008), B.8).
// A number printed to three digits keeps its half unit, and 0.1 % off stays a finding.
TEST_CASE("factor direction: a four-digit factor rounded from a chained or older value") {
    const std::string d = "E_lbh : lb/h\nE_kgs : kg/s\nQ_B : Btu/h\nQ_k : kW\n"
                          "dp_m : Pa/m\ndp_us : inH2O/ft\n";
    for (const char* right : {"E_lbh = 7938*E_kgs", "Q_B = 3413*Q_k", "dp_m = 817.3*dp_us",
                              "Q_B = 3412*Q_k", "dp_m = 817.2*dp_us"})
        CHECK_MESSAGE(only_finding(d + right + "\n").empty(), right);
    for (const char* wrong :
         {"E_lbh = 7946*E_kgs", "Q_B = 3416*Q_k", "dp_m = 818*dp_us", "dp_m = 818.1*dp_us"})
        CHECK_MESSAGE(only_finding(d + wrong + "\n").find("counts") != std::string::npos, wrong);
}

// A fan's shaft power P = Q·Δp/η (common practice): 1 mbar·m³/s is 100 W = 0.1 kW, so /10
// converts mbar and m³/s to kW; with the flow in m³/h the hour's 3600 is left out (1 h = 3600 s,
// SI Brochure 9th ed., Table 8). Read only as a coefficient, the advice "divide by 36000" would
// leave the line ten times too small: the finding counts it both ways and names the 3600.
TEST_CASE("factor direction: a power of ten that converts, with the hour left out") {
    const auto r =
        plumb::check_text("f.plumb", "P : kW\nQ_h : m3/h\nΔp : mbar\nη : 1\nP = Q_h*Δp/(10*η)\n");
    REQUIRE(plumb::test::count_of(r, plumb::rules::unit_scale) == 1);
    const plumb::diagnostic& d = plumb::test::first_under(r, plumb::rules::unit_scale);
    CHECK(plumb::test::says(d, "counts 3600 times as much as 'P' if 10 was meant as the "
                               "conversion, 36000 times as much if it is a coefficient"));
    CHECK(plumb::test::says(d, "the units need 3600 as well: divide 'Q_h*Δp/(10*η)' by 3600"));
    CHECK(only_finding("P : kW\nQ_s : m3/s\nΔp : mbar\nη : 1\nP = Q_s*Δp/(10*η)\n").empty());
}
