// Readings scaled by pure ratios and allowances: a gauge reading times a ratio is still a gauge
// reading (so set equal to an absolute pressure it is reported), a gauge reading times an
// allowance plus the atmosphere is absolute, and an absolute temperature times a ratio is still
// a reading that the °C zero may be taken from. Angles in degrees inside sin, cos and tan get
// the conversion written out.
#include "plumb/check.hpp"
#include "plumb/rules.hpp"
#include "test_support.hpp"

#include <doctest/doctest.h>

#include <string>

namespace {

using plumb::test::count_of;
using plumb::test::first_under;
using plumb::test::problems_in;
using plumb::test::says;
constexpr auto run = plumb::test::check_after;
constexpr auto fails_with = plumb::test::each_fails_with;

constexpr auto passes = plumb::test::each_passes;

const std::string relief = "p_set, p_t : psig\np_1 : psia\np_k : kPa\np_kg : kPag\nOP : %\n"
                           "k_t : 1\n";

const std::string compressor = "T_1, T_2 : K\nt_1, t_2 : °C\np_1, p_2 : kPa\nn, x : 1\n";

} // namespace

TEST_CASE("a gauge reading times an allowance, plus the atmosphere, is absolute") {
    // API 520 Part I: relieving pressure = set pressure + overpressure + atmospheric pressure
    // (from memory); 10 % for a single valve, 21 % for fire (from memory); 14.7 psi and
    // 101.325 kPa for the atmosphere (NIST SP 811 (2008), B.8, rounded).
    passes(relief, {"@relieving p_1 = 1.1*p_set + 14.7", "@fire p_1 = 1.21*p_set + 14.7",
                    "@relieving-ratio p_1 = p_set*(1 + OP/100) + 14.7",
                    "@relieving-kpa p_k = 1.1*p_kg + 101.325", "@test p_t = k_t*p_set",
                    "@test-number p_t = 1.5*p_set"});
}

// The same allowance with the site's barometer declared beside the set pressure: API 520 Part
// I's P_1 = 1.10·p_set + p_atm for a single valve, 1.21·p_set + p_atm in a fire (from memory).
// A ratio under 1 taken of a gauge reading before the atmosphere is added is a gas's
// precharge written wrongly, and two gauge readings added are no allowance.
TEST_CASE("a set pressure's allowance, plus the site's barometer, is absolute") {
    const std::string decl = "p_set, p_2 : psig\np_b : psia \"site barometer\"\nP_1 : psia\n";
    passes(decl, {"P_1 = 1.10*p_set + p_b", "P_1 = 1.21*p_set + p_b", "P_1 = 1.16*p_set + p_b",
                  "P_1 = p_b + 1.1*p_set"});
    fails_with(decl, {"P_1 = 0.9*p_set + p_b", "P_1 = p_set + p_2 + p_b", "P_1 = 1.1*p_set"},
               plumb::rules::offset_scale);
}

// A wellhead's gauge pressure from the bottom-hole pressure: p_wh = p_bh - 14.7 - p_hyd (the
// hydrostatic column a drop, 14.7 psi the atmosphere, NIST SP 811 (2008), B.8, rounded;
// common practice). An absolute reading less the atmosphere as a number is a gauge reading and
// the pressures taken off besides are drops, in any order, as "p_g + p_fric + 14.7" reads the
// pressures added as drops. Taking off an atmosphere named as such as well is an error, and so
// is leaving the 14.7 out once the column is described as hydrostatic. Each once crashed or
// passed.
TEST_CASE("an absolute reading less the atmosphere and a drop is a gauge reading") {
    const std::string decl = "p_wh : psig\np_bh : psia\nb : psi\np_atm : psia\n"
                             "p_hyd : psi \"hydrostatic head of the water column\"\n"
                             "Δp_t : psi \"tubing friction\"\n";
    passes(decl,
           {"p_wh = p_bh - 14.7 - b", "p_wh = p_bh - b - 14.7", "p_wh = p_bh - 101.325 {kPa} - b",
            "p_wh = p_bh - 14.7 - p_hyd + Δp_t", "p_wh = p_bh - p_atm - p_hyd"});
    fails_with(decl,
               {"p_wh = p_bh - p_atm - 14.7", "p_wh = p_bh - p_atm - 14.7 - b",
                "p_wh = p_bh - p_hyd + Δp_t"},
               plumb::rules::offset_scale);
}

TEST_CASE("a number that moves the zero of a difference is reported, not a crash") {
    // Two absolute readings added and two taken off cancel; the number then shifts a zero no
    // term has. (With one reading added, the same sum once crashed: see the test above.)
    const std::string decl = "x : psi\np_1, p_2, p_3, p_4 : psia\n";
    const auto found = run(decl, "x = p_1 + p_2 - p_3 - p_4 - 14.7");
    REQUIRE(count_of(found, plumb::rules::offset_scale) == 1);
    CHECK(says(first_under(found, plumb::rules::offset_scale), "no zero"));
}

TEST_CASE("a gauge reading times a ratio or an allowance, set equal to an absolute pressure") {
    // Without the atmosphere, or with the atmosphere in another unit, or converted by a
    // factor with the atmosphere of the other unit: each stays on the gauge scale.
    fails_with(relief,
               {"@no-atmosphere p_1 = p_set*(1 + OP/100)", "@no-atmosphere-symbol p_1 = k_t*p_set",
                "@no-atmosphere-number p_1 = 1.1*p_set",
                "@atmosphere-in-kpa p_1 = 1.1*p_set + 101.325",
                "@atmosphere-in-psi p_k = 1.1*p_kg + 14.7",
                "@converted-psi-atmosphere p_k = 6.895*p_set + 14.7"},
               plumb::rules::offset_scale);
    const auto r = run(relief, "@no-atmosphere p_1 = p_set*(1 + OP/100)");
    REQUIRE(count_of(r, plumb::rules::offset_scale) == 1);
    CHECK(first_under(r, plumb::rules::offset_scale).message.find("psig scale") !=
          std::string::npos);
}

TEST_CASE("an absolute temperature times a pressure ratio is still a reading") {
    // T_2 = T_1·(p_2/p_1)^((k−1)/k) for isentropic compression (Cengel and Boles,
    // Thermodynamics, 8th ed., 7-9, from memory); t/°C = T/K − 273.15 (SI Brochure 9th ed.,
    // 2.3.1).
    passes(compressor,
           {"@isentropic T_2 = T_1*(p_2/p_1)^n",
            "@isentropic-celsius t_2 = T_1*(p_2/p_1)^n - 273.15",
            "@from-celsius T_2 = (t_1 + 273.15)*(p_2/p_1)^n", "@mixed T_2 = x*T_1 + (1 - x)*T_2"});
    // Still errors: °C times a ratio, and a K result set equal to °C without the zero.
    fails_with(compressor,
               {"@celsius-ratio T_2 = t_1*(p_2/p_1)^n", "@kelvin-as-celsius t_2 = T_1*(p_2/p_1)^n"},
               plumb::rules::offset_scale);
}

TEST_CASE("an angle in degrees inside sin, cos or tan: the conversion is written out") {
    const std::string angles = "β : °\nθ : deg\nT, W : kN\nn : 1\n";
    const auto r = run(angles, "@sling T = W/(n*sin(β))");
    REQUIRE(count_of(r, plumb::rules::unit_scale) == 1);
    CHECK(says(first_under(r, plumb::rules::unit_scale), "sin(β*π/180)"));
    // 1° = π/180 rad (SI Brochure 9th ed., Table 8): written so, it passes.
    passes(angles, {"@sling-radians T = W/(n*sin(β*π/180))"});
    // Rankine's K_a = tan²(45° - φ/2) (common practice): the whole angle is converted, and the
    // advice, followed, passes.
    const auto rankine = run(angles + "K_a : 1\n", "K_a = tan(45 - θ/2)^2");
    REQUIRE(count_of(rankine, plumb::rules::unit_scale) == 1);
    CHECK(says(first_under(rankine, plumb::rules::unit_scale), "tan((45 - θ/2)*π/180)"));
    passes(angles + "K_a : 1\n", {"K_a = tan((45 - θ/2)*π/180)^2"});
    // The same in radians, tan²(π/4 - φ/2), with φ left in degrees: π/4 is in radians already,
    // so only the angle is converted, and the advice, followed, passes.
    const auto radians = run(angles + "K_a : 1\n", "K_a = tan(pi/4 - θ/2)^2");
    REQUIRE(count_of(radians, plumb::rules::unit_scale) == 1);
    CHECK(says(first_under(radians, plumb::rules::unit_scale), "tan(pi/4 - θ/2*π/180)"));
    passes(angles + "K_a : 1\n", {"K_a = tan(pi/4 - θ/2*π/180)^2"});
}

// A sprocket's pitch diameter D = p/sin(180°/N) (ANSI B29.1, from memory). With the degrees
// written as a quantity the angle is plain and passes; typed bare, 180/N is taken in radians,
// the commonest slip with it, and so are 360/N and 90 beside a count. A π written out, or a 180
// that divides (sin(r/180)), is no such slip.
TEST_CASE("degrees written out in a trig function's argument, with and without their unit") {
    const std::string decl = "D, p : mm\nN, r : 1\n";
    passes(decl,
           {"D = p/sin(180 {deg}/N)", "D = p/sin(π/N)", "D = p/sin(3.1416/N)", "D = p*sin(r/180)"});
    const auto bare = run(decl, "D = p/sin(180/N)");
    REQUIRE(count_of(bare, plumb::rules::unit_scale) == 1);
    CHECK(says(first_under(bare, plumb::rules::unit_scale), "reads as degrees"));
    CHECK(says(first_under(bare, plumb::rules::unit_scale), "180 {deg}"));
    fails_with(decl, {"D = p/tan(360/N)", "D = p*cos(90*r)"}, plumb::rules::unit_scale);
    // The inverse functions take a ratio, not an angle.
    passes("φ : rad\nr : 1\n", {"φ = asin(r/2)"});
}

// A reading multiplied: the fix offered must suit the physics where the dimension can tell
// (a coefficient per degree of a volume, β·V·ΔT; a heat flow per degree, ṁ·c_p·ΔT; common
// practice) and give both fixes, each with the laws it suits, where it cannot (ρ·c_p·T has
// the dimension of ρ·R_s·T, the gas law p = ρ·R_s·T), unless a symbol's name or description
// says it is a specific heat (c_p), which makes it a heat balance.
TEST_CASE("a reading multiplied: the fix offered suits what multiplies it") {
    const std::string decl = "ΔV, V : m^3\nβ : 1/K\nT_F : °F\nT_o : °C\nQ_h : kW\nρ : kg/m^3\n"
                             "c_p : kJ/(kg*K)\nV_a : m^3/s\nm_w : kg/s\nk_x : kJ/(kg*K)\n";
    const auto expansion = run(decl, "ΔV = V*β*T_F");
    REQUIRE(count_of(expansion, plumb::rules::offset_scale) == 1);
    const auto& e = first_under(expansion, plumb::rules::offset_scale);
    CHECK(says(e, "a coefficient per degree multiplies a temperature difference"));
    CHECK_FALSE(says(e, "adding 459.67"));
    const auto heat = run(decl, "Q_h = m_w*c_p*T_o");
    REQUIRE(count_of(heat, plumb::rules::offset_scale) == 1);
    const auto& h = first_under(heat, plumb::rules::offset_scale);
    CHECK(says(h, "T_other"));
    CHECK_FALSE(says(h, "adding 273.15"));
    const auto either = run(decl, "V_a = Q_h/(ρ*k_x*T_o)");
    REQUIRE(count_of(either, plumb::rules::offset_scale) == 1);
    const auto& x = first_under(either, plumb::rules::offset_scale);
    CHECK(says(x, "if the law needs absolute temperature"));
    CHECK(says(x, "if it stands for a rise or a drop"));
    const auto balance = run(decl, "V_a = Q_h/(ρ*c_p*T_o)");
    REQUIRE(count_of(balance, plumb::rules::offset_scale) == 1);
    const auto& b = first_under(balance, plumb::rules::offset_scale);
    CHECK(says(b, "T_other"));
    CHECK_FALSE(says(b, "adding 273.15"));
}

// The mixed temperature of two streams of one liquid, T_mix = (ṁ_h·T_h + ṁ_c·T_c)/(ṁ_h + ṁ_c),
// holds on any temperature scale, since the weights sum to one (common practice).
TEST_CASE("readings times weights over the sum of the weights are their weighted mean") {
    const std::string decl = "T_mix, T_h, T_c : °C\nT_K : K\nT_F : °F\nq_h, q_c, q_m : kg/s\n"
                             "V_h : L/s\np_1, p_2, p_m : barg\nA_1, A_2 : m^2\n";
    passes(decl,
           {"T_mix = (q_h*T_h + q_c*T_c)/(q_h + q_c)", "T_mix = (T_h*q_h + T_c*q_c)/(q_c + q_h)",
            "p_m = (A_1*p_1 + A_2*p_2)/(A_1 + A_2)"});
    fails_with(
        decl,
        {"T_mix = (q_h*T_h + q_c*T_c)/q_m", "T_mix = (q_h*T_h + q_c*T_c)/(q_h + q_m)",
         "T_mix = (q_h*T_h + q_c*T_F)/(q_h + q_c)", "T_mix = (q_h*T_h + V_h*T_c)/(q_h + V_h)",
         "T_mix = (q_h*T_h + q_c*T_c)/(q_h - q_c)", "T_mix = (q_h*T_h - q_c*T_c)/(q_h + q_c)"},
        plumb::rules::offset_scale);
    // A mean in °C set equal to a reading in K is still an error of the zero.
    fails_with(decl, {"T_K = (q_h*T_h + q_c*T_c)/(q_h + q_c)"}, plumb::rules::offset_scale);
}

// A boiling-point elevation declared in K, added to a vapour temperature in °C: a difference
// in K beside a reading in °C (SI Brochure 9th ed., 2.3.1: a difference may be given in K or
// °C); an absolute temperature set equal to it, or 273.15 added, stays an error.
TEST_CASE("a temperature in K added to a reading in °C is a difference") {
    const std::string decl = "t_j, t_v : °C\nBPE : K\nT_K, T_K2 : K\n";
    passes(decl, {"t_j = t_v + BPE", "t_j = BPE + t_v", "t_j - t_v = BPE", "T_K2 = T_K - t_v"});
    fails_with(decl, {"T_K = t_v + BPE", "t_j = t_v + BPE + 273.15", "t_j = t_v + t_v + BPE"},
               plumb::rules::offset_scale);
}

// The fresh-concrete temperature T = (0.22·(T_a·W_a + T_c·W_c) + T_w·W_w)/(0.22·(W_a + W_c) +
// W_w) (ACI 305R, from memory), and two streams of different heat capacities mixed,
// T = (m_1·c_1·T_1 + m_2·c_2·T_2)/(m_1·c_1 + m_2·c_2) (common practice): weighted means.
TEST_CASE("weighted means with numbers and several factors in their weights") {
    const std::string decl = "T_c, T_a, T_k, T_w : °F\nW_a, W_c, W_w : lb\nT_1, T_2, T_m : °C\n"
                             "m_1, m_2 : kg/s\nc_1, c_2 : kJ/(kg*K)\n";
    passes(decl, {"T_c = (0.22*(T_a*W_a + T_k*W_c) + T_w*W_w)/(0.22*(W_a + W_c) + W_w)",
                  "T_m = (m_1*c_1*T_1 + m_2*c_2*T_2)/(m_1*c_1 + m_2*c_2)"});
    fails_with(decl,
               {"T_c = (0.22*(T_a*W_a + T_k*W_c) + T_w*W_w)/(0.25*(W_a + W_c) + W_w)",
                "T_c = (0.22*(T_a*W_a + T_k*W_c) + T_w*W_w)/(W_a + W_c + W_w)",
                "T_m = (m_1*c_1*T_1 + m_2*c_2*T_2)/(m_1 + m_2)"},
               plumb::rules::offset_scale);
}

// Heat to cool water to freezing in US units, Q = 500·gpm·(t_w - 32) in Btu/h with t_w in °F
// (common practice): t_w - 32 is the rise above 32 °F. Only 1.8 after it makes it a reading
// on the °C scale (NIST SP 811 (2008), B.9); a reading declared in °C, multiplied, stays an
// error.
TEST_CASE("a °F reading less 32 times a quantity is the rise above freezing") {
    const std::string decl = "Q_s : Btu/h\nQ_gpm : gpm\nt_w : °F\nT_C : °C\nm : kg/s\n"
                             "c : kJ/(kg*K)\nP : kW\nq, q_a : m^3/s\n";
    passes(decl, {"Q_s = 500*Q_gpm*(t_w - 32)", "Q_s = (t_w - 32)*500*Q_gpm",
                  "T_C = (t_w - 32)/1.8", "T_C = (t_w - 32)*5/9", "P = m*c*(t_w - 32)/1.8"});
    fails_with(decl, {"Q_s = 500*Q_gpm*t_w", "P = m*c*T_C", "q = q_a*(520/t_w)"},
               plumb::rules::offset_scale);
    fails_with(decl, {"T_C = t_w - 32"}, plumb::rules::unit_scale);
}

// The hydrant test's H_R = static less 20 psi residual (NFPA 291, from memory) and a rise above
// a 20 °C reference temperature: a reading less a bare number, set equal to a quantity declared
// a difference, reads the number on the reading's own scale. Set equal to an absolute reading,
// or with a scale's zero subtracted, it stays an error.
TEST_CASE("a reading less a bare number set equal to a difference") {
    const std::string decl = "p_s : psig\nH_R : psi \"pressure drop to 20 psi residual\"\n"
                             "p_a : psi\nt_op : °C\ndT : K\nT_K : K\nΔt : Δ°C\n";
    passes(decl, {"H_R = p_s - 20", "dT = t_op - 20", "Δt = t_op - 20", "dT = 20 - t_op"});
    fails_with(decl,
               {"p_a = p_s - 20", "T_K = t_op - 20", "H_R = p_s - 14.7", "T_K = t_op - 273.15"},
               plumb::rules::offset_scale);
}

// Fits made on the °C scale: the Magnus saturation pressure p_ws = 0.61094 kPa·exp(17.625·t/
// (t + 243.04)) (Alduchov and Eskridge 1996, from memory) and Antoine's equation for water,
// log10(p/mmHg) = 8.07131 - 1730.63/(233.426 + t) (handbook constants, from memory). Their
// constant is fitted to the °C zero; another reading in the denominator, 273.15 there, a
// reading over itself or a reading in a gas law stays an error.
TEST_CASE("empirical fits on the °C scale") {
    const std::string decl = "p_ws : kPa\nt, t_db : °C\nT : K\np_v : mmHg\nρ : kg/m^3\n"
                             "p : Pa\nR_s : J/(kg*K)\n";
    passes(decl, {"p_ws = 0.61094 {kPa}*exp(17.625*t/(t + 243.04 {Δ°C}))",
                  "p_ws = 0.61094 {kPa}*exp(17.625*t/(t + 243.04))",
                  "p_ws = 0.61094 {kPa}*exp(t*17.625/(243.04 + t))",
                  "log10(p_v/{mmHg}) = 8.07131 - 1730.63 {K}/(233.426 {K} + t)"});
    fails_with(decl,
               {"p_ws = 0.61094 {kPa}*exp(17.625*t_db/(t + 243.04))",
                "p_ws = 0.61094 {kPa}*exp(17.625*t/(t + 273.15))",
                "p_ws = 0.61094 {kPa}*exp(17.625*t/t)",
                "p_ws = 0.61094 {kPa}*exp(17.625*t/(t + T))", "ρ = p/(R_s*(t + 237))"},
               plumb::rules::offset_scale);
}

// ACI 347R-14's lateral pressure on wall formwork, p = C_w·C_c·(7.2 kPa + 785·R/(T + 17.8))
// with T the concrete's °C reading, and in inch-pound units 150 psf + 9000·R/T with T in °F
// (from memory; 17.8 is the °F scale's zero in °C). A coefficient marked `?` over the reading
// declares the fit empirical, made on that reading's scale: it passes, with the coefficient's
// note. Without the `?`, or with the reading multiplied, it stays an error.
TEST_CASE("an empirical coefficient over a temperature reading") {
    const std::string decl = "t_c : °C\nt_F : °F\nR_r : m/h\nR_ft : ft/h\np_max : kPa\n"
                             "p_psf : psf\n";
    passes(decl,
           {"p_max = 7.2 {kPa} + 785?*R_r/(t_c + 17.8 {K})", "p_psf = 150 {psf} + 9000?*R_ft/t_F"});
    fails_with(
        decl,
        {"p_psf = 150 {psf} + 9000 {psf*°F*h/ft}*R_ft/t_F", "p_psf = 150 {psf} + 9000?*R_ft*t_F"},
        plumb::rules::offset_scale);
    // A pressure above the reading makes it a gas law's density, whatever constant is folded
    // in: AP-42's loading loss L = 12.46·S·P·M/T in lb/10³ gal, P in psia and T in °R (EPA
    // AP-42, 5th ed., section 5.2, from memory). With the rack's °F reading it is an error.
    const std::string rack = "t_F : °F\nT_R : °R\nS : 1\np : psia\nM : lb/lbmol\nL : lb/gal\n";
    passes(rack, {"L = 12.46?*S*p*M/T_R"});
    fails_with(rack, {"L = 12.46?*S*p*M/t_F"}, plumb::rules::offset_scale);
}

// The infinite-slope factor of safety with the cohesion from an old report in psf:
// FS = (c' + (γ·z·cos²β - u)·tan φ')/(γ·z·sin β·cos β) (common practice), with 1 lbf/ft² =
// 47.88026 Pa (NIST SP 811 (2008), B.8) rounded to 0.04788 kPa. A sum that agrees through a
// rounded factor takes the unit of its term with none (kPa), and a group that subtracts a
// reading ((γ*z - u), u a pore pressure) counts as that reading subtracted, not as a mean.
TEST_CASE("a sum converted by a rounded factor, beside a group that subtracts a reading") {
    const std::string decl = "c_psf : lbf/ft^2\nc_e, p, q, u : kPa\na : kN/m^3\nz : m\nFS : 1\n";
    passes(decl, {"c_e = 0.04788*c_psf + p", "FS = (0.04788*c_psf + p)/q",
                  "FS = (0.04788*c_psf + (a*z - u))/q", "FS = (p + (a*z - u))/q",
                  "FS = (0.0478803*c_psf + (a*z - u)*0.5)/q"});
    fails_with(decl, {"c_e = c_psf + p", "FS = (c_psf + (a*z - u))/q", "c_e = 0.4788*c_psf + p"},
               plumb::rules::unit_scale);
}

// The excess-air ratio from the flue gas's oxygen, λ = 21/(21 - O2) with O2 in % by volume,
// dry, and the excess air O2/(21 - O2) (common practice; 20.9 % is dry air's oxygen, from
// memory): the 21 over the sum that reads it in % is in % too. A fraction's 0.21 over it, or
// beside it, stays a factor of 100 off.
TEST_CASE("a number over the sum that reads it in percent") {
    const std::string decl = "O2, O2_ref : %\nλ, EA : 1\nc, c_ref : mg/m^3\n";
    passes(decl, {"λ = 21/(21 - O2)", "λ = 20.9/(20.9 - O2)", "EA = O2/(21 - O2)",
                  "c_ref = c*(21 - O2_ref)/(21 - O2)"});
    fails_with(decl, {"λ = 0.21/(21 - O2)", "λ = 21/(0.21 - O2)", "λ = 21/(22 - O2)"},
               plumb::rules::unit_scale);
}

// max and min, and a limit, of readings on scales with different zeros (an absolute pressure
// beside a gauge one, 101.325 kPa apart; a °C reading beside kelvins, 273.15 K apart: SI
// Brochure 9th ed., 2.3.1): an error, as a sum of them is. On one scale they pass.
TEST_CASE("max, min and limits of readings on scales with different zeros") {
    const std::string decl = "p_a, x : bar\np_g, p_g2 : barg\nt_c : °C\nT_k : K\n";
    passes(decl, {"p_g = max(p_g, p_g2)", "p_a = min(p_a, p_g + 1.01325 {bar})", "p_g <= p_g2"});
    fails_with(decl, {"x = max(p_a, p_g)", "T_k = min(t_c, T_k)", "p_a <= p_g", "t_c >= T_k"},
               plumb::rules::offset_scale);
}

// A rate's temperature correction k_T = k_20·θ^(T - 20) with T in °C (Metcalf & Eddy,
// Wastewater Engineering, 4th ed., eq. 1-44, from memory): with T a kelvin reading, T - 20
// counts from 20 K, some 273 kelvins off; less 293.15 it is right.
TEST_CASE("a temperature correction's reference subtracted from a kelvin reading") {
    const std::string decl = "k_T, k_20, θ : 1\nT_w : °C\nT_wK : K\ndT : K\n";
    passes(decl, {"k_T = k_20*θ^(T_w - 20)", "k_T = k_20*θ^(T_wK - 293.15)", "k_T = k_20*θ^dT"});
    fails_with(decl, {"k_T = k_20*θ^(T_wK - 20)", "k_T = k_20*θ^(T_wK - 15)"},
               plumb::rules::offset_scale);
}

// The Arrhenius equivalent age t_e = exp(-Q·(1/T_a - 1/T_s))·Δt takes absolute temperatures
// (ASTM C1074, from memory); with °C readings each reciprocal is an error, as Q/T_a is.
TEST_CASE("the reciprocal of a reading on an offset scale") {
    const std::string decl = "t_e, Δt : h\nQ_K : K\nT_a, T_s : °C\nT_aK, T_sK : K\nx : 1/K\n";
    passes(decl, {"t_e = exp(-Q_K*(1/T_aK - 1/T_sK))*Δt",
                  "t_e = exp(-Q_K*(1/(T_a + 273.15) - 1/(T_s + 273.15)))*Δt"});
    fails_with(decl, {"t_e = exp(-Q_K*(1/T_a - 1/T_s))*Δt", "x = 1/T_a - 1/T_s", "x = 1/T_a"},
               plumb::rules::offset_scale);
}

// A chilled-water range from a return reading in °C and a supply reading in °F converted in
// line, ΔT = t_r - (t_s - 32)/1.8 (NIST SP 811 (2008), B.9): the 1.8 converts degrees and
// weighs nothing, so the two readings weigh 1 and -1. Unconverted, or added, it stays an error.
TEST_CASE("a °F reading converted in line inside a difference of readings") {
    const std::string decl = "ΔT_K : K\nt_r_C, t_s_C : °C\nt_s_F : °F\n";
    passes(decl, {"ΔT_K = t_r_C - (t_s_F - 32)/1.8", "t_s_C = (t_s_F - 32)/1.8"});
    fails_with(decl, {"ΔT_K = t_r_C - t_s_F/1.8", "ΔT_K = t_r_C + (t_s_F - 32)/1.8"},
               plumb::rules::offset_scale);
}

// °F and °C readings set equal with the conversion's zero left out or in the wrong place: the
// finding gives the conversion both ways, t_C = (t_F - 32)/1.8 and t_F = 1.8·t_C + 32 (NIST
// SP 811 (2008), B.9).
TEST_CASE("a °C and °F reading set equal says how to convert") {
    const std::string decl = "T_C : °C\nT_F : °F\n";
    for (const char* formula : {"T_C = T_F/1.8 - 32", "T_F = 1.8*T_C"}) {
        CAPTURE(formula);
        const auto r = plumb::test::check_after(decl, formula);
        REQUIRE(plumb::test::count_of(r, plumb::rules::offset_scale) == 1);
        CHECK(plumb::test::says(plumb::test::first_under(r, plumb::rules::offset_scale),
                                "(T_F - 32)/1.8 on the \u00B0C scale"));
    }
    passes(decl, {"T_C = (T_F - 32)/1.8", "T_F = 1.8*T_C + 32"});
    // Run backwards, the finding's headline says so, not how far apart the zeros land.
    const auto backwards = plumb::test::check_after(decl, "T_F = (T_C - 32)/1.8");
    REQUIRE(plumb::test::count_of(backwards, plumb::rules::offset_scale) == 1);
    const auto& reversed = plumb::test::first_under(backwards, plumb::rules::offset_scale);
    CHECK(reversed.message.find("the conversion runs the other way, T_F = 1.8*T_C + 32") !=
          std::string::npos);
    CHECK(reversed.message.find("absolute scale") == std::string::npos);
}

// A winding's temperature rise by the resistance method, Δθ = (R_2 - R_1)/R_1·(235 + θ_1) +
// θ_1 - θ_a for copper (IEC 60034-1, from memory; 234.5 in IEEE 112, 225 or 228 for
// aluminium): 235 + θ_1 is the temperature above copper's inferred zero of resistance, a
// difference, times a ratio of resistances. A reading alone times the ratio stays an error.
TEST_CASE("a winding's temperature from its inferred zero of resistance") {
    const std::string decl = "Δθ : K\nR_1, R_2 : ohm\nθ_1, θ_a : °C\n";
    passes(decl, {"Δθ = (R_2 - R_1)/R_1*(235 + θ_1) + θ_1 - θ_a",
                  "Δθ = (R_2 - R_1)/R_1*(234.5 + θ_1) + θ_1 - θ_a",
                  "Δθ = (R_2 - R_1)/R_1*(225 + θ_1) + θ_1 - θ_a"});
    fails_with(
        decl,
        {"Δθ = (R_2 - R_1)/R_1*θ_1 + θ_1 - θ_a", "Δθ = (R_2 - R_1)/R_1*(200 + θ_1) + θ_1 - θ_a"},
        plumb::rules::offset_scale);
}

// A copper conductor's resistance at θ from its value at 20 °C, R_θ = R_20·(234.5 + θ)/(234.5 +
// 20) (IEC 60228, Annex B, from memory): the denominator is the reference's rise above the
// same inferred zero, typed in numbers, and the ratio has no dimension. Not with the reference
// in kelvins (234.5 + 293).
TEST_CASE("a conductor's resistance from the inferred zero, with the reference typed in numbers") {
    const std::string decl = "R_20, R_90 : ohm\nθ_c : °C\n";
    passes(decl, {"R_90 = R_20*(234.5 + θ_c)/(234.5 + 20)", "R_90 = R_20*(235 + θ_c)/(235 + 20)"});
    fails_with(decl, {"R_90 = R_20*(234.5 + θ_c)/(234.5 + 293)"}, plumb::rules::side_mismatch);
    // The Celsius scale spelled degC reads the same.
    passes("R_20, R_90 : ohm\nθ_d : degC\n", {"R_90 = R_20*(234.5 + θ_d)/(234.5 + 20)"});
    fails_with(decl, {"R_90 = R_20*θ_c/(234.5 + 20)"}, plumb::rules::offset_scale);
}

// "T_c : K \"conductor temperature, absolute, as the loss workbook carries it\"": a
// description that calls the quantity absolute names a reading, though "loss" is among its
// words; a °C reference taken off it is then reported as such (IEC 60287-1-1, from memory).
TEST_CASE("a description that says absolute names a reading") {
    const std::string decl = "R_20, R_t : ohm\nα_20 : 1/K\n"
                             "T_c : K \"conductor temperature, absolute, as the loss workbook "
                             "carries it\"\nθ_a : °C\nΔθ : K \"rise above ambient\"\n";
    passes(decl, {"R_t = R_20*(1 + α_20*(T_c - 293.15))", "Δθ = T_c - 273.15 - θ_a"});
    const auto r = plumb::test::check_after(decl, "R_t = R_20*(1 + α_20*(T_c - 20))");
    CHECK(plumb::test::count_of(r, plumb::rules::offset_scale) == 1);
    CHECK(plumb::test::count_of(r, plumb::rules::sum_mismatch) == 0);
}

// CT halves for each 10 °C warmer, CT = CT_ref·2^((10 - T)/10) (common practice for chlorine
// contact, from memory): a reference less a reading is the difference the other way round,
// read as a temperature correction as (T - 10) is.
TEST_CASE("a reference less a reading in a temperature correction") {
    const std::string decl = "CT_req, CT_ref : mg*min/L\nT_w : °C\nk_T, k_20, θ : 1\n";
    passes(decl, {"CT_req = CT_ref*2^((10 - T_w)/10)", "k_T = k_20*θ^(20 - T_w)"});
    fails_with(decl, {"CT_req = CT_ref*2^(T_w/10)"}, plumb::rules::dimensioned_exponent);
}

// The temperature-humidity index THI = t - (0.55 - 0.55·RH)·(t - 58) with t in °F and RH a
// fraction (NRC 1971, from memory): (t - 58) is a difference from a 58 °F reading, and a
// ratio times it no absolute temperature. And 0.55 - 0.55*RH_pct/100 is a fraction: the 0.55
// beside a percentage converted by /100 is no percentage.
TEST_CASE("a ratio times a reading less a number, and a coefficient beside a converted percent") {
    const std::string decl = "THI : °F\nRH, x : 1\nT_F : °F\nRH_pct : %\n";
    passes(decl, {"THI = T_F - (0.55 - 0.55*RH)*(T_F - 58)", "x = 0.55 - 0.55*RH_pct/100",
                  "x = 0.55*(1 - RH_pct/100)"});
    fails_with(decl, {"x = 0.55 - 0.55*RH_pct"}, plumb::rules::unit_scale);
    fails_with(decl, {"THI = T_F - (0.55 - 0.55*RH)*T_F"}, plumb::rules::offset_scale);
}

// Tables count liquid water's enthalpy from 0.01 °C (IAPWS-IF97, from memory) and moist air's
// from 0 °C (ASHRAE Handbook, Fundamentals, ch. 1: h = 1.006·t + W·(2501 + 1.86·t) kJ/kg with
// t in °C, from memory), so h = c·t with t the °C reading is how the trades write an enthalpy.
// Set equal to a symbol named or described as an enthalpy it passes with a note; a heat per kg
// that is no enthalpy, a °F reading (US tables count from 32 °F) and c·t added to another
// enthalpy stay errors.
TEST_CASE("an enthalpy from the 0 °C datum of the tables") {
    const std::string decl = "h_feed : kJ/kg\nh_a : kJ/kg \"moist air enthalpy\"\nh_1 : kJ/kg\n"
                             "c_w : kJ/(kg*K)\nt : °C\nt_F : °F\nq : kJ/kg\nW : 1\n"
                             "c_us : Btu/(lb*°R)\nh_us : Btu/lb\n";
    for (const char* formula :
         {"h_feed = c_w*t", "h_feed = t*c_w",
          "h_a = 1.006 {kJ/(kg*K)}*t + W*(2501 {kJ/kg} + 1.86 {kJ/(kg*K)}*t)"}) {
        CAPTURE(formula);
        const auto found = run(decl, formula);
        CHECK(problems_in(found) == 0);
        CHECK(count_of(found, plumb::rules::trade_constant) >= 1);
    }
    passes(decl, {"h_feed = h_1 + c_w*(t - 20)"});
    fails_with(decl, {"q = c_w*t", "h_us = c_us*t_F", "h_feed = h_1 + c_w*t"},
               plumb::rules::offset_scale);
}

// The same moist-air enthalpy with its constants declared as symbols (ASHRAE Handbook,
// Fundamentals, ch. 1, from memory: c_pa 1.006, h_g0 2501 kJ/kg, c_pv 1.86): the vapour's
// enthalpy at 0 °C stands inside the product with W, counted from the same datum, and is no
// other enthalpy beside c·t. With W in g/kg the 1000 is reported, and a stand-alone enthalpy
// term still makes c·t a change from it.
TEST_CASE("moist air's enthalpy with its constants declared") {
    const std::string decl = "h_1 : kJ/kg\nh_0 : kJ/kg\nt_1 : °C\nW_1 : kg/kg\nW_g : g/kg\n"
                             "c_pa : kJ/(kg*K) = 1.006\nc_pv : kJ/(kg*K) = 1.86\n"
                             "h_g0 : kJ/kg = 2501 \"enthalpy of saturated vapour at 0 °C\"\n";
    const auto found = run(decl, "h_1 = c_pa*t_1 + W_1*(h_g0 + c_pv*t_1)");
    CHECK(problems_in(found) == 0);
    CHECK(count_of(found, plumb::rules::trade_constant) >= 1);
    fails_with(decl, {"h_1 = c_pa*t_1 + W_g*(h_g0 + c_pv*t_1)"}, plumb::rules::unit_scale);
    fails_with(decl, {"h_1 = h_0 + c_pa*t_1", "h_1 = c_pa*t_1 + h_0 + W_1*c_pv*t_1"},
               plumb::rules::offset_scale);
}

// The Magnus fit p_sat = 610.5 Pa·exp(17.269·θ/(237.3 + θ)) with θ the °C reading (ISO 13788,
// from memory) fed a kelvin temperature: a warning, since the sum is 273 K off. The °C
// reading, or the kelvin one less 273.15, passes; a kelvin reading plus a small difference
// is no fit.
TEST_CASE("a Magnus fit's constant beside a kelvin reading") {
    const std::string decl = "p_s : Pa\nT_c : K\nt : °C\nx : 1\n";
    fails_with(decl, {"p_s = 610.5 {Pa}*exp(17.269*T_c/(237.3 + T_c))"},
               plumb::rules::offset_scale);
    passes(decl, {"p_s = 610.5 {Pa}*exp(17.269*t/(237.3 + t))",
                  "p_s = 610.5 {Pa}*exp(17.269*(T_c - 273.15)/(237.3 + (T_c - 273.15)))",
                  "x = T_c/(T_c + 5)"});
}

// The same fit fed a °F reading: its 237.3 to 243.04 are °C (Alduchov and Eskridge 1996, from
// memory), so 17.625·t_F/(t_F + 243.04) is far off (at 80 °F it gives exp(4.36) where 26.7 °C
// gives exp(1.74)). A warning, with the °C reading advised; a fit whose shift is near 400,
// the same fit restated for °F, is left alone, as is the °C reading.
TEST_CASE("a Magnus fit's constant beside a Fahrenheit reading") {
    const std::string decl = "p_s : kPa\nt_F : °F\nt : °C\nx : 1\n";
    const auto r = run(decl, "p_s = 0.61094 {kPa}*exp(17.625*t_F/(t_F + 243.04))");
    REQUIRE(count_of(r, plumb::rules::offset_scale) == 1);
    CHECK(plumb::test::says(first_under(r, plumb::rules::offset_scale), "(t_F - 32)/1.8"));
    passes(decl,
           {"p_s = 0.61094 {kPa}*exp(17.625*t/(t + 243.04))", "x = 17.625*t_F/(t_F + 395.5)"});
}

// The mixed-air temperature t_m = x·t_o + (1 − x)·t_r (ASHRAE Fundamentals, ch. 1, from
// memory; common practice), with the outdoor share x a fraction or OA/100 with OA in %, and
// a third stream's share 1 − x − y: weights that add up to 1 whatever x is make a weighted
// mean, a reading whatever the scale's zero. Weights that do not (x and x, x and 1 + x), a
// percentage used as the fraction beside its 1, and readings on two scales stay findings.
TEST_CASE("a mix's readings weighted by shares that add up to 1") {
    const std::string decl = "T_m, T_o, T_r, T_3 : °F\nx, y : 1\nOA : %\nt_c : °C\n";
    passes(decl, {"T_m = x*T_o + (1 - x)*T_r", "T_m = (1 - x)*T_r + x*T_o",
                  "T_m = OA/100*T_o + (1 - OA/100)*T_r", "T_m = x*T_o + y*T_r + (1 - x - y)*T_3"});
    fails_with(decl,
               {"T_m = x*T_o + x*T_r", "T_m = x*T_o + (1 + x)*T_r", "T_m = x*T_o + (1 - x)*t_c"},
               plumb::rules::offset_scale);
    fails_with(decl, {"T_m = OA*T_o + (1 - OA)*T_r"}, plumb::rules::unit_scale);
}

// A tyre's contact area A = P/p_c with p_c the inflation pressure, gauge (FAA AC 150/5320-6,
// from memory), as a cylinder's bore area from its load: a load over one gauge pressure is the
// area it acts on, as p_g*A is the force. A ratio of two gauge pressures, or a gauge pressure
// under a number, stays an error.
TEST_CASE("a load over a gauge pressure is the area it acts on") {
    const std::string decl = "A_in2 : in^2\nP_lb : lbf\np_c, p_2 : psig\nr : 1\n";
    passes(decl, {"A_in2 = P_lb/p_c"});
    fails_with(decl, {"r = p_c/p_2", "r = 14.7/p_c", "A_in2 = P_lb*p_2/p_c/p_2"},
               plumb::rules::offset_scale);
}

// A footbridge's first frequency from its modal stiffness and mass: √(k/m) is in rad/s and
// f = √(k/m)/(2π) in Hz (Chopra, Dynamics of Structures, ch. 2, from memory). Set equal to a
// symbol in Hz without the 2π it is 6.28 times too high; a geometric mean of two frequencies
// in Hz is none of that.
TEST_CASE("an angular frequency set equal to one in cycles") {
    const std::string decl =
        "f_1, f_a, f_b : Hz\nk_N : N/m\nM_s : kg\ng : m/s^2\nδ : m\nω : rad/s\n";
    fails_with(decl, {"f_1 = sqrt(k_N/M_s)", "f_1 = sqrt(g/δ)"}, plumb::rules::unit_scale);
    passes(decl, {"f_1 = sqrt(k_N/M_s)/(2*pi)", "ω = sqrt(k_N/M_s)", "f_1 = sqrt(f_a*f_b)"});
}

// A transformer's load loss corrected to 75 °C, P_k = P_k,m·(235 + θ_ref)/(235 + θ_test) for
// copper (IEC 60076-1, from memory): each bracket counts from the conductor's inferred zero of
// resistance, -235 °C, and the ratio is a pure number. A °C reading alone in its place stays
// an error; and a formula reported stops no later symbol from counting as used.
TEST_CASE("a resistance correction's brackets from the conductor's zero") {
    const std::string decl = "P_k, P_km : kW\nR_1, R_2 : ohm\nθ_ref, θ_test : °C\n";
    passes(decl, {"P_k = P_km*(235 + θ_ref)/(235 + θ_test)",
                  "R_2 = R_1*(234.5 + θ_ref)/(234.5 + θ_test)"});
    const auto alone =
        run("P_k, P_km : kW\nθ_ref, θ_test : °C\n", "P_k = P_km*θ_ref/(235 + θ_test)");
    CHECK(count_of(alone, plumb::rules::offset_scale) == 1);
    CHECK(count_of(alone, plumb::rules::unused) == 0);
}

// The same fit solved for the temperature: the dew point t_dp = b·γ/(a − γ) with γ = ln φ +
// a·t/(b + t), a = 17.625 and b = 243.04 °C (Alduchov and Eskridge 1996, from memory), is a
// reading on the °C scale the fit was made on. Without the fit's denominator, or with a
// constant that is no Magnus b, the product is a difference set equal to a reading.
TEST_CASE("the Magnus fit solved for the dew point gives a °C reading") {
    const std::string decl = "γ_m, φ : 1\nt_dp, t_r : °C\n";
    passes(decl, {"γ_m = ln(φ) + 17.625*t_r/(243.04 {Δ°C} + t_r)",
                  "t_dp = 243.04 {Δ°C}*γ_m/(17.625 - γ_m)",
                  // Over ice, a = 22.46 and b = 272.62 °C (WMO-No. 8, 2008, from memory).
                  "t_dp = 272.62 {Δ°C}*γ_m/(22.46 - γ_m)"});
    fails_with(decl,
               {"t_dp = 243.04 {Δ°C}*γ_m", "t_dp = 100 {Δ°C}*γ_m/(17.625 - γ_m)",
                "t_dp = 243.04 {Δ°C}*γ_m/(2 - γ_m)"},
               plumb::rules::offset_scale);
}

// Advice that must not lead to a wrong formula that passes. A transformer's hot-spot rise in
// K set equal to the hot spot's °C reading (IEC 60076-7 counts the rise above ambient, from
// memory): adding 273.15 would hide the slip, so the advice names the rise. And the top end
// of a range of readings is a reading: declaring it a difference would hide α·V·θ_max.
TEST_CASE("advice for a rise set equal to a reading, and for the end of a range") {
    const std::string decl = "Δθ_h : K \"hot-spot rise above ambient\"\nθ_h : °C\nβ : 1/K\n"
                             "V, ΔV : L\nθ_max, θ_min : °C \"oil temperature range\"\n";
    const auto rise = run(decl, "Δθ_h = θ_h");
    REQUIRE(count_of(rise, plumb::rules::offset_scale) == 1);
    CHECK(says(first_under(rise, plumb::rules::offset_scale), "is a rise"));
    CHECK_FALSE(says(first_under(rise, plumb::rules::offset_scale), "(θ_h + 273.15)"));
    const auto range = run(decl, "ΔV = β*V*θ_max");
    REQUIRE(count_of(range, plumb::rules::offset_scale) == 1);
    CHECK_FALSE(says(first_under(range, plumb::rules::offset_scale), "declare it as"));
    passes(decl, {"ΔV = β*V*(θ_max - θ_min)"});
}

// A °F reading less a °C one (°F = 1.8·°C + 32, NIST SP 811 (2008), 4.2.1.1): the advice
// converts the reading with its 32, not only its degrees with 1.8, which would leave the
// difference 32 °F off.
TEST_CASE("a °F reading less a °C reading: the advice converts the reading") {
    const std::string decl = "q_w : gal/min\nQ_wB : Btu/h\nt_wo : °F\nT_2 : °C\n";
    const auto found = run(decl, "q_w = Q_wB/(500*(t_wo - T_2))");
    // Readings on scales with different zeros subtracted: the offset-scale error, as when
    // they are set equal.
    REQUIRE(count_of(found, plumb::rules::offset_scale) == 1);
    CHECK(count_of(found, plumb::rules::unit_scale) == 0);
    CHECK(first_under(found, plumb::rules::offset_scale).level == plumb::severity::error);
    CHECK(says(first_under(found, plumb::rules::offset_scale), "(1.8*T_2 + 32)"));
    CHECK_FALSE(says(first_under(found, plumb::rules::offset_scale), "multiply"));
}

// A percentage written out as its number over 100: the allowable drop is 10 % of the supply's
// gauge pressure, p_g*10/100, as 0.1*p_g (a share of a gauge reading is a rise above the
// atmosphere, common practice). The /100 is no unit conversion the units do not need.
TEST_CASE("a percentage written as its number over 100") {
    const std::string decl =
        "measure mbarg = mbar zero at 1013.25 mbar\nΔp : mbar \"allowable pressure drop\"\n"
        "p_g : mbarg\n";
    passes(decl, {"Δp = p_g*10/100", "Δp = 0.1*p_g", "Δp = p_g/10"});
}

// Antoine's equation for water, log10(p/mmHg) = 8.07131 - 1730.63/(233.426 + t) with t in °C
// (Lange's Handbook of Chemistry, from memory): typed with bare constants it is still a finding
// (the constants' units are unsaid), but the words say to write them as temperatures, not to
// add 273.15, which would break the fit.
TEST_CASE("a fit on the °C scale typed with bare constants: the advice keeps the scale") {
    const std::string decl = "p_v : mmHg\nt_w : \u00B0C\n";
    const auto r = run(decl, "p_v = 1 {mmHg}*10^(8.07131 - 1730.63/(233.426 + t_w))");
    REQUIRE(count_of(r, plumb::rules::offset_scale) == 1);
    const auto& finding = first_under(r, plumb::rules::offset_scale);
    REQUIRE_FALSE(finding.notes.empty());
    CHECK(finding.notes.front().message.find("B {K}/(233.426 {K} + t_w)") != std::string::npos);
    passes(decl, {"p_v = 1 {mmHg}*10^(8.07131 - 1730.63 {K}/(233.426 {K} + t_w))"});
}

// An absolute temperature converted to the other absolute scale by its factor, and that
// scale's offset zero added too (T_R = 1.8·T_K, T_K = T_R/1.8; NIST SP 811 (2008), 4.2.1.1):
// the zero counted twice, as "T_K + 459.67" is. From a °C reading the same zero is right.
TEST_CASE("an absolute temperature converted and given the other scale's zero as well") {
    const std::string d = "T_K, T_K2 : K \"overhead temperature, absolute\"\n"
                          "T_R : °R \"the same, absolute\"\nt_C : °C \"the same\"\n";
    passes(d, {"T_R = 1.8*T_K", "T_R = 1.8*t_C + 491.67", "T_K2 = T_R/1.8"});
    fails_with(d, {"T_R = 1.8*T_K + 459.67", "T_K2 = T_R/1.8 + 273.15"},
               plumb::rules::offset_scale);
}

// The kill mud weight KMW = MW + SIDPP/(0.052·TVD) (Bourgoyne et al., Applied Drilling
// Engineering, SPE 1986, ch. 4, from memory): the shut-in drill pipe pressure is a gauge
// reading at the top of a mud column open to the atmosphere, and over 0.052 psi/ft per ppg
// times the depth it is the density that balances it. A gauge reading in a gas law's density
// (ρ = p·M/(R·T)) still needs absolute pressure.
TEST_CASE("a gauge reading over a column's depth is its gradient") {
    const std::string decl = "MW, KMW : ppg\nSIDPP : psig\nTVD : ft\nG : psi/ft\n"
                             "ρ : lb/ft^3\nM : g/mol\nR : J/(mol*K)\nT : K\n";
    passes(decl,
           {"KMW = MW + SIDPP/(0.052*TVD)", "G = SIDPP/TVD", "SIDPP <= G*TVD", "SIDPP = G*TVD"});
    fails_with(decl, {"ρ = SIDPP*M/(R*T)"}, plumb::rules::offset_scale);
}

// US EPA Method 20 prints the correction to 15 % oxygen as C·5.9/(20.9 - O2), 20.9 - 15
// folded (from memory): the folded number is in % as the sum below it is. Typed as the
// fraction 0.059, it is 100 times too small.
TEST_CASE("a reference oxygen folded into the number above the oxygen sum") {
    const std::string decl = "O2 : %\nc, c_ref : mg/m^3\n";
    passes(decl, {"c_ref = c*5.9/(20.9 - O2)", "c_ref = c*18/(21 - O2)",
                  "c_ref = c*(20.9 - 15)/(20.9 - O2)"});
    fails_with(decl, {"c_ref = c*0.059/(20.9 - O2)", "c_ref = c*0.18/(21 - O2)"},
               plumb::rules::unit_scale);
}

// Hazen's correction of a permeability to the water's temperature, k·(0.7 + 0.03·t) with t
// in °C (Terzaghi, Peck and Mesri, 3rd ed., 1996, from memory), is a fit made on the °C scale:
// the finding stands (plumb cannot know the fit), and its advice says not to add 273.15 but
// to accept it with a reviewed mark. "1 + α·t" keeps the advice about a coefficient's
// reference temperature.
TEST_CASE("a linear fit on the °C scale multiplied: the advice keeps the reading") {
    const std::string decl = "k, k_t : m/d\nt : °C\nR, R_20 : ohm\nα : 1/K\n";
    const auto r = run(decl, "k_t = k*(0.7 + 0.03*t)");
    REQUIRE(count_of(r, plumb::rules::offset_scale) == 1);
    const auto& d = first_under(r, plumb::rules::offset_scale);
    bool fit = false;
    bool kelvin = false;
    for (const auto& n : d.notes) {
        fit = fit || n.message.find("empirical fit made on the °C scale") != std::string::npos;
        kelvin = kelvin || n.message.find("declare it in K") != std::string::npos;
    }
    CHECK(fit);
    CHECK_FALSE(kelvin);
    const auto alpha = run(decl, "R = R_20*(1 + α*t)");
    REQUIRE(count_of(alpha, plumb::rules::offset_scale) == 1);
    for (const auto& n : first_under(alpha, plumb::rules::offset_scale).notes)
        CHECK(n.message.find("empirical fit") == std::string::npos);
}

// A press cylinder's working pressure p = F/A with the rod side at tank, and a pump's
// hydraulic power p·Q from a vented tank (Parker, Industrial Hydraulic Technology, 2nd ed.,
// ch. 2, from memory): a gauge reading is what both mean. Gauge readings in a gas law stay
// errors, and a load over an area set equal to an absolute pressure is no gas law either.
TEST_CASE("a load over its area is a gauge reading, and gauge times flow a hydraulic power") {
    const std::string decl = "p_w : barg\np_psig : psig\nF : kN\nA_p : cm^2\nQ : L/min\n"
                             "Q_gpm : gpm\nP_h : kW\nP_hp : hp\nη : 1\nV_1, V_2 : L\n"
                             "p_2 : barg\n";
    passes(decl, {"p_w = 100*F/A_p", "P_h = p_w*Q/600", "P_hp = p_psig*Q_gpm/(1714*η)"});
    fails_with(decl, {"p_2 = p_w*V_1/V_2"}, plumb::rules::offset_scale);
    fails_with(decl, {"P_h = p_w*Q/60", "p_w = F/(100*A_p)"}, plumb::rules::unit_scale);
}

// Faraday's hydrogen from a charging current, V = I·R·T/(2·F·p) (ideal gas; the 2 electrons
// per H2, common practice), with the room's °C reading for T: a gas law, whose advice is the
// absolute temperature, not a difference from a coefficient's reference.
TEST_CASE("a °C reading beside the gas constant and a current: gas-law advice") {
    const std::string decl = "Q : m^3/h\nn : 1\nI : A\nt : °C\np : Pa\n";
    const auto r = run(decl, "Q = 3600*n*I*{R}*t/(2*{F}*p)");
    REQUIRE(count_of(r, plumb::rules::offset_scale) == 1);
    bool gas = false;
    bool per_degree = false;
    for (const auto& n : first_under(r, plumb::rules::offset_scale).notes) {
        gas = gas || n.message.find("adding 273.15") != std::string::npos;
        per_degree = per_degree || n.message.find("coefficient per degree") != std::string::npos;
    }
    CHECK(gas);
    CHECK_FALSE(per_degree);
}

// T/K = t/°C + 273.15 (SI Brochure 9th ed., 2.3.1): the mean of two °C readings is a °C
// reading, however it is written, and set equal to a kelvin reading or taken from one it
// is off by 273.15 K, as a single °C reading is. These passed without a word. A mean of
// readings on one scale, and a kelvin reading less a mean converted to kelvins, pass.
TEST_CASE("the mean of two readings on an offset scale is held to that scale's zero") {
    const std::string decl = "T_b, T_m : K\nt_b, t_1, t_2 : °C\nΔT : K\n";
    fails_with(decl,
               {"T_m = (t_1 + t_2)/2", "T_m = 0.5*(t_1 + t_2)", "T_m = t_1/2 + t_2/2",
                "ΔT = T_b - (t_1 + t_2)/2", "ΔT = T_b - 0.5*(t_1 + t_2)",
                "ΔT = (t_b + 273.15) - (t_1 + t_2)/2"},
               plumb::rules::offset_scale);
    passes(decl, {"ΔT = t_b - (t_1 + t_2)/2", "ΔT = T_b - ((t_1 + t_2)/2 + 273.15)",
                  "T_m = (t_1 + t_2)/2 + 273.15", "ΔT = T_b - 273.15 - 0.5*(t_1 + t_2)"});
}

// Converse-Labarre's pile group efficiency E_g = 1 − θ·((n − 1)·m + (m − 1)·n)/(90·m·n),
// θ = arctan(D/s) in degrees (Das, Principles of Foundation Engineering, 7th ed., ch. 11, from
// memory): θ over the 90 of a right angle is a ratio of angles, the 90 being in degrees too.
// An arc 2π·r·θ/360 passes as before; an angle in degrees standing for radians, or an arc
// with its π left out, is still reported.
TEST_CASE("an angle in degrees over a right angle or a turn typed as a number is a ratio") {
    const std::string decl = "θ : °\nn_r, n_c, E_g : 1\nr, L : m\n";
    passes(decl, {"E_g = 1 - θ*((n_r - 1)*n_c + (n_c - 1)*n_r)/(90*n_r*n_c)", "E_g = 1 - θ/90",
                  "E_g = θ/360", "L = 2*pi*r*θ/360", "L = r*θ*pi/180"});
    fails_with(decl, {"L = r*θ", "L = 2*r*θ/360", "E_g = 1 - θ"}, plumb::rules::unit_scale);
}

// EN 1991-1-3:2003 Table 5.2 (from memory): a roof's snow shape coefficient μ1 = 0.8 up to
// 30° and 0.8·(60 − α)/30 from 30° to 60°, a range of angles over another, every number in
// degrees. It was a unit-scale warning asking to divide by 57.2958, in notation and in a
// workbook; a range typed beside the reading reads its divisor as an angle too. An angle in
// degrees standing for radians alone is still reported.
TEST_CASE("a range of angles over a number of degrees is a ratio") {
    const std::string decl = "α : °\nμ_1 : 1\n";
    passes(decl, {"μ_1 = 0.8*(60 - α)/30", "μ_1 = 0.8*(α - 30)/30"});
    fails_with(decl, {"μ_1 = 0.8*α"}, plumb::rules::unit_scale);
}

// Water's viscosity by Vogel's fit μ = 2.414e-5 Pa·s × 10^(247.8 K/(T - 140 K)) (Al-Shemmeri,
// Engineering Fluid Mechanics, 2012, from memory) takes T in kelvins: typed in K, the 140 is an
// absolute temperature, and a °C reading beside it is an error, with the conversion advised. A
// reference typed on the reading's scale, or a bare one, is the difference from it as before.
TEST_CASE("a number typed in kelvins beside a °C reading in a fit") {
    const std::string decl = "μ : Pa*s\nT_w : °C\nT_K : K\nR, R_20 : ohm\nα : 1/K\n";
    const auto wrong =
        plumb::test::check_after(decl, "μ = 2.414e-5{Pa*s}*10^(247.8{K}/(T_w - 140{K}))");
    CHECK(plumb::test::count_of(wrong, plumb::rules::offset_scale) == 1);
    CHECK(plumb::test::says(plumb::test::first_under(wrong, plumb::rules::offset_scale),
                            "(T_w + 273.15 - 140{K})"));
    for (const char* right : {"μ = 2.414e-5{Pa*s}*10^(247.8{K}/(T_K - 140{K}))",
                              "R = R_20*(1 + α*(T_w - 20))", "R = R_20*(1 + α*(T_w - 20{°C}))"}) {
        CAPTURE(right);
        CHECK(plumb::test::problems_in(plumb::test::check_after(decl, right)) == 0);
    }
}

// A vacuum pump's isothermal power p·V̇·ln(p_b/p): the gas law's pressure is absolute (Perry's,
// 8th ed., sec. 10, isothermal compression, from memory). A gauge reading there is the slip,
// though p_g·Q alone into a power reads as a pump's hydraulic power (common practice).
TEST_CASE("a gauge reading in an isothermal compression's power is reported") {
    const std::string vacuum = "p_g : kPag\np_b, p_abs : kPa\nS_p : m^3/h\nP : kW\nQ : m^3/s\n";
    passes(vacuum, {"P = (p_g + p_b)*S_p/3600*ln(p_b/(p_g + p_b))", "P = p_g*Q"});
    fails_with(vacuum, {"P = p_g*S_p/3600*ln(p_b/p_abs)"}, plumb::rules::offset_scale);
}

// A membrane's driving force, the difference of CO2 partial pressures x·p_feed − y·p_permeate:
// partial pressures are shares of absolute pressures (Dalton's law; Perry's, 8th ed., sec. 2,
// from memory). A share of a gauge reading beside a share of an absolute one leaves the
// atmosphere's share out; the same share of the gauge reading plus the barometer does not.
TEST_CASE("a share of a gauge reading beside a share of an absolute pressure") {
    const std::string membrane = "p_g : bar(g)\np_a, p_b : bar\n\u0394p : bar\nf, y : 1\nx : %\n";
    fails_with(membrane, {"\u0394p = x/100*p_g - y*p_a", "\u0394p = f*p_g - f*p_a"},
               plumb::rules::offset_scale);
    passes(membrane, {"\u0394p = x/100*(p_g + p_b) - y*p_a", "\u0394p = f*p_g - \u0394p"});
    const auto r = run(membrane, "\u0394p = x/100*p_g - y*p_a");
    CHECK(first_under(r, plumb::rules::offset_scale)
              .message.find("partial pressures count from "
                            "vacuum") != std::string::npos);
}

// The mean of two °C readings taken to °F, (t_1 + t_2)/2·1.8 + 32 (NIST SP 811 (2008), B.8):
// the 1.8 converts the one reading the mean is; the mean left in °C beside +32, or the sum of
// two readings taken to °F, is still reported.
TEST_CASE("a mean of readings converted to another scale in one line") {
    const std::string tank = "t_1, t_2 : \u00B0C\nt_F : \u00B0F\nt_K : K\n";
    passes(tank, {"t_F = (t_1 + t_2)/2*1.8 + 32", "t_F = 1.8*(t_1 + t_2)/2 + 32",
                  "t_F = 1.8*(t_1/2 + t_2/2) + 32"});
    fails_with(tank,
               {"t_F = (t_1 + t_2)/2 + 32", "t_F = (t_1 + t_2)*1.8 + 32",
                "t_K = (t_1 + t_2)/2*1.8 + 32", "t_F = (t_1 + t_2)/2*1.8"},
               plumb::rules::offset_scale);
}

// A sprinkler's pressure from its flow, p = (q/K)² (EN 12845; NFPA 13, from memory): the drop
// across the orifice, which the gauge at the head reads.
TEST_CASE("a pressure made by squaring a flow over its K-factor is a difference") {
    const std::string head = "q : L/min\nK : L/(min*bar^0.5)\np_g : bar(g)\n";
    passes(head, {"p_g = (q/K)^2", "q = K*sqrt(p_g)"});
}

// Barlow's hoop stress on a gauge pressure with a surge's rise added, σ = (p + Δp)·D/(2t)
// (common practice): the sum is the gauge reading the wall sees. And API 520's percent back
// pressure, 100·p_b/p_set in %, a gauge reading over a gauge reading by its definition (API 520
// Part I, from memory); the same ratio as a pure number stays a gas law's slip.
TEST_CASE("a gauge reading with a rise added over a wall, and a percentage of set pressure") {
    const std::string penstock = "p_st : kPag\n\u0394p_J : kPa \"surge rise\"\nD_mm, t_w : mm\n"
                                 "\u03C3_h : MPa\np_bk, p_set : barg\nBP : %\nr_c : 1\n";
    passes(penstock, {"\u03C3_h = (p_st + \u0394p_J)*D_mm/(2*t_w*1000)", "BP = 100*p_bk/p_set"});
    fails_with(penstock, {"\u03C3_h = (p_st + \u0394p_J)*D_mm/(2*t_w)"}, plumb::rules::unit_scale);
    fails_with(penstock, {"r_c = p_bk/p_set"}, plumb::rules::offset_scale);
}

// A pressure described as a water column, ρ·g·h, is a difference, as "hydrostatic" is (White,
// Fluid Mechanics, 8th ed., ch. 2, from memory): a gauge set point less it is a gauge reading.
TEST_CASE("a pressure described as a water column is a difference") {
    const std::string network = "p_set, p_top : kPag\np_z : kPa \"water column over the top\"\n"
                                "p_c : kPa \"distillation column top pressure\"\n";
    passes(network, {"p_top = p_set - p_z"});
    fails_with(network, {"p_top = p_set - p_c"}, plumb::rules::offset_scale);
}

// The rate's temperature correction θ^(T − 20) (van 't Hoff-Arrhenius as the water trades write
// it; common practice): the exponent turned round is said to count the degrees below.
TEST_CASE("a temperature correction's exponent turned round is said so") {
    const std::string lagoon = "k_20, k_T : 1/d\n\u03B8 : 1\nT_w : \u00B0C\n";
    const auto r = run(lagoon, "k_T = k_20*\u03B8^(20 - T_w)");
    CHECK(first_under(r, plumb::rules::temperature_correction).message.find("below a reference") !=
          std::string::npos);
    const auto right = run(lagoon, "k_T = k_20*\u03B8^(T_w - 20)");
    CHECK(first_under(right, plumb::rules::temperature_correction)
              .message.find("above a reference") != std::string::npos);
}

// API MPMS ch. 11.2.1 (from memory) sets the equilibrium vapour pressure, gauge, to zero where
// the true vapour pressure is below the atmosphere: max(P_va - p_b, 0). The call keeps what
// its argument is, a gauge reading from two absolute ones; an absolute argument, or one set
// beside a gauge-like one, stays a finding.
TEST_CASE("a gauge reading from two absolute ones keeps its footing inside max and min") {
    const std::string decl = "P_va, p_b : psia\nP_e : psig\nT : K\nt, t_2 : °C\n";
    passes(decl, {"P_e = max(P_va - p_b, 0)", "P_e = max(0, P_va - p_b)", "P_e = P_va - p_b"});
    fails_with(
        decl,
        {"P_e = max(P_va, 0)", "P_e = min(P_va - p_b, P_va)", "T = max(t, 0)", "T = max(t, t_2)"},
        plumb::rules::offset_scale);
}

// A gauge pressure times an area is the net force on a face with the atmosphere on its other
// side (a jack's load from its gauge, p·A; common practice): an absolute pressure there, a
// gauge reading with the atmosphere added or a symbol said absolute, overstates it by the
// atmosphere's push, and so an area from a load over it comes out small. The atmosphere's own
// push on a face over a vacuum, and an absolute less the barometer, pass.
TEST_CASE("a force or an area from an absolute pressure") {
    const std::string decl = "p_jack : psig\nA_ram : in2\nP : kip\n"
                             "p_fa : kPa \"absolute pressure in the silo head\"\nA : m2\nF : kN\n"
                             "p_tg : psig\nW : lbf\nA_in : in^2\np_b : kPa \"site barometer\"\n"
                             "p_g : kPa(g)\np_atm : kPa \"atmospheric pressure\"\n";
    for (const char* slip : {"P = (p_jack + 14.7 {psi})*A_ram/1000", "F = p_fa*A",
                             "A_in = W/(p_tg + 14.7)", "F = (p_g + p_b)*A"}) {
        CAPTURE(slip);
        const auto r = run(decl, slip);
        CHECK(count_of(r, plumb::rules::offset_scale) == 1);
        CHECK(says(first_under(r, plumb::rules::offset_scale), "gauge pressure"));
    }
    passes(decl, {"P = p_jack*A_ram/1000", "F = (p_fa - p_b)*A", "A_in = W/p_tg", "F = p_atm*A",
                  "F = p_g*A"});
}

// A liquid's or a fill's column, ρ·g·h or γ·H, is what a gauge at its foot reads, so a gauge
// reading taken from it leaves a difference: a membrane bioreactor's transmembrane pressure,
// the column over the fibres less the permeate suction gauge (common practice), and a vacuum
// preload's fill less the membrane gauge's negative reading. Two gauge readings taken from a
// column stay a finding.
TEST_CASE("a gauge reading taken from a column's pressure is a difference") {
    const std::string decl = "ρ : kg/m^3\ng : m/s^2\nh : m\np_s, p_m : kPa(g)\nTMP, Δσ : kPa\n"
                             "γ_f : kN/m^3\nH_f : m\n";
    passes(decl, {"TMP = ρ*g*h/1000 - p_s", "Δσ = γ_f*H_f - p_m", "TMP = ρ*{g_n}*h/1000 - p_s"});
    fails_with(decl, {"TMP = ρ*g*h/1000 - p_s - p_m"}, plumb::rules::offset_scale);
}

// IEC 60076-2 (from memory): a winding's temperature from its resistance, θ_2 = R_2/R_1·(235 +
// θ_1) - 235, and the ratio written as its own equation, R_2/R_1 = (235 + θ_2)/(235 + θ_1);
// IEC 60076-1's resistance at 75 °C, R_75 = R_t·(235 + 75)/(235 + θ_t). A kelvin temperature
// set to the reading, or another zero taken off, stays a finding.
TEST_CASE("a winding's temperature and resistance from copper's inferred zero") {
    const std::string decl = "R_1, R_2, R_t, R_75 : ohm\nθ_1, θ_2, θ_t : °C\nT_2 : K\n";
    passes(decl, {"θ_2 = R_2/R_1*(235 + θ_1) - 235", "θ_2 = R_2/R_1*(234.5 + θ_1) - 234.5",
                  "R_2/R_1 = (235 + θ_2)/(235 + θ_1)", "R_75 = R_t*(235 + 75)/(235 + θ_t)",
                  "R_2 = R_1*(235 + θ_2)/(235 + θ_1)"});
    fails_with(decl, {"T_2 = R_2/R_1*(235 + θ_1) - 235"}, plumb::rules::offset_scale);
    CHECK(problems_in(run(decl, "θ_2 = R_2/R_1*(235 + θ_1) - 234.5")) >= 1);
    CHECK(problems_in(run(decl, "θ_2 = R_2*(235 + θ_1) - 235")) >= 1);
}

// A UHT holding tube is kept a bar or so above the saturation pressure of its product (common
// practice): in a limit, "+ 1.0 {bar}" is that margin even where the site's barometer is 1.002
// bar. Set against a gauge reading, the absolute side is the finding, named as such.
TEST_CASE("a typed margin in a limit is no barometer, however near its value") {
    const std::string decl = "p_hg : barg\np_b : bar = 1.002 \"site barometric pressure\"\n"
                             "p_sat : bar \"saturation pressure, 3.92 bar a\"\n";
    passes(decl, {"p_hg + p_b >= p_sat + 1.0 {bar}", "p_hg + p_b >= p_sat + 0.5 {bar}"});
    const auto r = run(decl, "p_hg >= p_sat + 1.0 {bar}");
    REQUIRE(count_of(r, plumb::rules::offset_scale) == 1);
    CHECK(says(first_under(r, plumb::rules::offset_scale), "'p_hg'"));
    CHECK_FALSE(says(first_under(r, plumb::rules::offset_scale), "counts the atmosphere twice"));
}

// A sterilising process's lethal rate L = 10^((T - 121.1)/z) with T in °C, and its D value
// D_T = D_121·10^((121.1 - T)/z) (common practice; 121.1 °C = 250 °F, NIST SP 811 (2008), B.8:
// t/°F = 1.8·t/°C + 32): the reference typed on the other scale than the reading's is warned.
TEST_CASE("a lethal rate's reference temperature typed on the other scale") {
    const std::string decl = "t : °C\nt_F : °F\nz : K\nz_F : Δ°F\nL : 1\nD, D_r : min\n";
    passes(decl,
           {"L = 10^((t - 121.1)/z)", "L = 10^((t_F - 250)/z_F)", "D = D_r*10^((121.1 - t)/z)"});
    for (const char* slip :
         {"L = 10^((t - 250)/z)", "L = 10^((t_F - 121.1)/z_F)", "D = D_r*10^((250 - t)/z)"}) {
        CAPTURE(slip);
        const auto r = run(decl, slip);
        CHECK(count_of(r, plumb::rules::offset_scale) == 1);
        CHECK(says(first_under(r, plumb::rules::offset_scale), "250 \u00B0F"));
    }
    // Not outside a power of ten: a reading less 250 is any other difference there.
    passes(decl, {"L = (t - 250)/z"});
}

// A vacuum counts down from the barometer: absolute = barometric - vacuum (common practice;
// 1 inH2O = 0.2491 kPa, NIST SP 811 (2008), B.8, rounded). Added to the barometer, the sum
// stands as far above the atmosphere as the inlet is below it.
TEST_CASE("a vacuum added to the barometer") {
    const std::string decl = "p_vac : inH2O \"vacuum at the blower inlet\"\n"
                             "p_b : kPa \"site barometric pressure\"\np_in : kPa\n"
                             "v_c : kPa \"condenser vacuum\"\nΔp_f : kPa \"filter loss\"\n"
                             "p_vg : kPag \"vacuum gauge, -69 kPa g\"\n";
    passes(decl, {"p_in = p_b - 0.2491*p_vac", "p_in = p_b - v_c", "p_in = p_b + Δp_f",
                  "p_in = p_vg + p_b"});
    for (const char* slip : {"p_in = p_b + 0.2491*p_vac", "p_in = v_c + p_b"}) {
        CAPTURE(slip);
        const auto r = run(decl, slip);
        CHECK(count_of(r, plumb::rules::offset_scale) == 1);
        CHECK(says(first_under(r, plumb::rules::offset_scale), "counts down from the barometer"));
    }
}

// Moist air's density ρ = p/(R_D·T) takes the absolute temperature (the ideal gas law, common
// practice); a mean of two °C readings written R_D*(t_w + t_a)/2 is reported, and the advice
// converts each reading (T = t + 273.15 K, SI Brochure 9th ed., 2.3.1), since "((t_w + t_a) +
// 273.15)" with the /2 outside would leave the mean 136.6 K low. The mean in its own brackets
// is converted as a whole.
TEST_CASE("a gas law's mean of two readings is converted reading by reading") {
    const std::string d = "R_D : J/(kg*K)\nt_w, t_a : °C\np : Pa\nρ : kg/m^3\n";
    const auto r = run(d, "ρ = p/(R_D*(t_w + t_a)/2)");
    REQUIRE(count_of(r, plumb::rules::offset_scale) == 1);
    CHECK(says(first_under(r, plumb::rules::offset_scale),
               "convert each reading, ((t_w + 273.15) + (t_a + 273.15)), in K"));
    CHECK_FALSE(says(first_under(r, plumb::rules::offset_scale), "((t_w + t_a) + 273.15)"));
    const auto m = run(d, "ρ = p/(R_D*((t_w + t_a)/2))");
    CHECK(says(first_under(m, plumb::rules::offset_scale), "(((t_w + t_a)/2) + 273.15)"));
    passes(d, {"ρ = p/(R_D*((t_w + 273.15) + (t_a + 273.15))/2)"});
}
