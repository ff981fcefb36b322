// The scale model: which numbers in a formula are conversion factors, which way round they must
// stand, and readings on scales with different zeros (°C beside K, gauge beside absolute).
#include "check/scale_match.hpp"
#include "plumb/check.hpp"
#include "plumb/rules.hpp"

#include <doctest/doctest.h>

#include <algorithm>
#include <string>
#include <vector>

namespace {

std::vector<const plumb::diagnostic*> findings(const plumb::check_report& r,
                                               std::string_view rule) {
    std::vector<const plumb::diagnostic*> out;
    for (const auto& d : r.diagnostics)
        if (d.rule == rule)
            out.push_back(&d);
    return out;
}

bool mentions(const plumb::diagnostic& d, std::string_view text) {
    if (d.message.find(text) != std::string::npos)
        return true;
    return std::any_of(d.notes.begin(), d.notes.end(),
                       [&](const auto& n) { return n.message.find(text) != std::string::npos; });
}

// The text the diagnostic marks.
std::string marked(const plumb::check_report& r, const plumb::diagnostic& d) {
    static_cast<void>(r);
    return std::string(d.where.file->text(d.where.range));
}

// Nothing found but declarations the formula under test leaves unused.
bool clean(const plumb::check_report& r) {
    return std::all_of(r.diagnostics.begin(), r.diagnostics.end(),
                       [](const plumb::diagnostic& d) { return d.rule == plumb::rules::unused; });
}

plumb::check_report check(const std::string& declarations, const std::string& formula) {
    return plumb::check_text("s.plumb", declarations + formula + "\n");
}

} // namespace

TEST_CASE("conversion factors: the wrong way round, or not needed at all, are errors") {
    // Simply supported beam under uniform load: M = w L²/8 (common practice; any structural
    // analysis text, from memory). With L in mm, L² is in mm², and 1 mm² = 10⁻⁶ m² (SI Brochure
    // 9th ed., Table 7: milli = 10⁻³).
    const std::string beam = "M : kN*m\nw : kN/m\nL : mm\n";
    SUBCASE("M = w*L^2/8*1e6 multiplies where it must divide") {
        const auto r = check(beam, "M = w*L^2/8*1e6");
        const auto f = findings(r, plumb::rules::unit_scale);
        REQUIRE(f.size() == 1);
        CHECK(f[0]->level == plumb::severity::error);
        CHECK(marked(r, *f[0]) == "1e6");
        CHECK(mentions(*f[0], "wrong way round"));
        CHECK(mentions(*f[0], "10¹² times"));
    }
    SUBCASE("the right way round passes, whether written /1e6 or as (L/1000)^2") {
        CHECK(clean(check(beam, "M = w*L^2/8/1e6")));
        CHECK(clean(check(beam, "M = w*L^2/8*1e-6")));
        CHECK(clean(check(beam, "M = w*(L/1000)^2/8")));
    }
    // Euler buckling P = π² E I / L² (common practice, from memory): GPa·mm⁴/mm² = 10⁹·10⁻⁶ N
    // = 1 kN (SI Brochure 9th ed., Table 7), so with P in kN no factor is needed.
    const std::string strut = "P : kN\nP_N : N\nE : GPa\nI : mm^4\nL : mm\n";
    SUBCASE("P = E*I/L^2/1000 with P in kN: the 1000 is not needed") {
        const auto r = check(strut, "P = pi^2*E*I/L^2/1000");
        const auto f = findings(r, plumb::rules::unit_scale);
        REQUIRE(f.size() == 1);
        CHECK(f[0]->level == plumb::severity::error);
        CHECK(marked(r, *f[0]) == "1000");
        CHECK(mentions(*f[0], "not needed"));
        CHECK(clean(check(strut, "P = pi^2*E*I/L^2")));
    }
    SUBCASE("with P in N the factor is needed, as a multiplication") {
        CHECK(clean(check(strut, "P_N = pi^2*E*I/L^2*1000")));
        const auto r = check(strut, "P_N = pi^2*E*I/L^2/1000");
        const auto f = findings(r, plumb::rules::unit_scale);
        REQUIRE(f.size() == 1);
        CHECK(mentions(*f[0], "wrong way round"));
    }
    SUBCASE("a hydraulic diameter in m from sides in mm: divide by 1000, not multiply") {
        // D_h = 4A/P = 2ab/(a + b) for a rectangular duct (common practice, from memory).
        const std::string duct = "D_h : m\na, b : mm\n";
        CHECK(clean(check(duct, "D_h = 2*a*b/(a + b)/1000")));
        const auto r = check(duct, "D_h = 2*a*b/(a + b)*1000");
        const auto f = findings(r, plumb::rules::unit_scale);
        REQUIRE(f.size() == 1);
        CHECK(marked(r, *f[0]) == "1000");
        CHECK(mentions(*f[0], "wrong way round"));
    }
    SUBCASE("physics numbers are never taken for conversions: 2, 8 and π stay") {
        // A missing conversion is still the warning, with the factor that fixes it.
        const auto r = check("Q : m^3/s\nV : m/s\nD : mm\n", "Q = V*pi*D^2/4");
        const auto f = findings(r, plumb::rules::unit_scale);
        REQUIRE(f.size() == 1);
        CHECK(f[0]->level == plumb::severity::warning);
        CHECK(mentions(*f[0], "counts 10⁻⁶ times") == false);
        CHECK(mentions(*f[0], "10⁶"));
    }
    SUBCASE("the factor in the message accounts for the numbers already written") {
        // h = p/(ρ g) with p in kPa: 1 kPa = 1000 Pa (SI Brochure 9th ed., Table 7), so a
        // written 100 leaves the head 10 times too small.
        const auto r = check("h : m\np : kPa\nρ : kg/m^3\ng : m/s^2\n", "h = p*100/(ρ*g)");
        const auto f = findings(r, plumb::rules::unit_scale);
        REQUIRE(f.size() == 1);
        CHECK(mentions(*f[0], "counts 0.1 times"));
        CHECK(mentions(*f[0], "multiply 'p*100/(ρ*g)' by 10"));
        CHECK(clean(check("h : m\np : kPa\nρ : kg/m^3\ng : m/s^2\n", "h = p*1000/(ρ*g)")));
    }
}

TEST_CASE("rounded published factors agree within one unit of their last digit") {
    SUBCASE("oil in place: 7758 bbl per acre-ft") {
        // 1 acre·ft = 43560 ft³ and 1 bbl = 5.614583 ft³ (NIST SP 811 (2008), B.8: acre
        // 4046.873 m², barrel 0.1589873 m³), so 7758.37 bbl per acre·ft.
        const auto r = check("N : bbl\nA : acre\nh : ft\nφ, S_w, B_o : 1\nV : ft^3\nA_f : ft^2\n",
                             "N = 7758*A*h*φ*(1 - S_w)/B_o\nV = 5.615*N\nA_f = 43560*A");
        CHECK(clean(r));
    }
    SUBCASE("gpm to L/s, ft per m, Manning's 1.486") {
        // 1 US gal = 3.785411784 L (NIST SP 811 (2008), B.8): 1 gpm = 0.0630902 L/s; 1 ft =
        // 0.3048 m exactly: 3.28084 ft/m; (1/0.3048)^(1/3) = 1.48592 (Manning, US customary
        // units; V. T. Chow, Open-Channel Hydraulics, 1959, ch. 5, from memory).
        const auto r = check(
            "Q_g : gpm\nQ_l : L/s\nx_m : m\nx_f : ft\nV : ft/s\nR : ft\nn : s/m^(1/3)\nS : 1\n",
            "Q_l = 0.0631*Q_g\nx_f = 3.281*x_m\nV = 1.486/n*R^(2/3)*S^(1/2)");
        CHECK(clean(r));
        const auto wrong = check("Q_g : gpm\nQ_l : L/s\n", "Q_l = Q_g/0.0631");
        REQUIRE(findings(wrong, plumb::rules::unit_scale).size() == 1);
        CHECK(mentions(*findings(wrong, plumb::rules::unit_scale)[0], "wrong way round"));
    }
    SUBCASE("a load in lb/d from mgd and mg/L with 8.34") {
        // 1 MG × 1 mg/L = 3.785411784 kg = 8.3454 lb (NIST SP 811 (2008), B.8: gallon, pound
        // 0.45359237 kg). 8.34 is not that factor rounded (8.3454 is 0.0054 from it, more than
        // half a unit in its last digit) but the weight of a US gallon of water, 8.31 to 8.35 lb
        // between 0 and 30 °C (water 995.65 to 999.975 kg/m³, CRC Handbook, from memory), as the
        // trade prints it (common practice): accepted for that reason, with a note saying so.
        const std::string load = "W : lb/d\nQ : mgd\nC : mg/L\n";
        const auto r = check(load, "W = 8.34*Q*C");
        const auto notes = findings(r, plumb::rules::trade_constant);
        REQUIRE(notes.size() == 1);
        CHECK(notes[0]->level == plumb::severity::note);
        CHECK(marked(r, *notes[0]) == "8.34");
        CHECK(mentions(*notes[0], "water"));
        CHECK(mentions(*notes[0], "8.3454"));
        CHECK(findings(r, plumb::rules::unit_scale).empty());
        // 8.345 is the factor itself, rounded: no note.
        CHECK(clean(check(load, "W = 8.345*Q*C")));
        // 8.3 is the factor to two digits (8.3454 is within 8.3 ± 0.05); 8.2 and 8.0 are
        // neither the factor nor water's weight per gallon.
        CHECK(clean(check(load, "W = 8.3*Q*C")));
        CHECK(findings(check(load, "W = 8.2*Q*C"), plumb::rules::unit_scale).size() == 1);
        CHECK(findings(check(load, "W = 8.0*Q*C"), plumb::rules::unit_scale).size() == 1);
        // Divided instead of multiplied, 8.34 is still the wrong way round.
        const auto inverted = check(load, "W = Q*C/8.34");
        CHECK(findings(inverted, plumb::rules::trade_constant).empty());
        CHECK(findings(inverted, plumb::rules::unit_scale).size() == 1);
    }
}

TEST_CASE("a rounded factor agrees when the exact one is within half a unit of its last digit") {
    // 1 gpm = 3.785411784/60 L/s = 0.06309020 L/s; 1 acre·ft = 7758.367 bbl; 1 m = 3.280840 ft
    // (NIST SP 811 (2008), B.8: gallon, acre-foot, barrel, foot 0.3048 m exactly).
    const std::string flows = "Q_g : gpm\nQ_l : L/s\n";
    CHECK(clean(check(flows, "Q_l = 0.0631*Q_g")));  // 0.0630902 within 0.0631 ± 0.00005
    CHECK(clean(check(flows, "Q_l = 0.06309*Q_g"))); // within 0.06309 ± 0.000005
    CHECK(findings(check(flows, "Q_l = 0.0630*Q_g"), plumb::rules::unit_scale).size() == 1);
    CHECK(findings(check(flows, "Q_l = 0.0632*Q_g"), plumb::rules::unit_scale).size() == 1);
    const std::string oil = "N : bbl\nA : acre\nh : ft\n";
    CHECK(clean(check(oil, "N = 7758*A*h")));
    // Four digits stand for at least 0.03 % either way (a table's older or chained rounding):
    // 7759 and 7757 lie within it, 7750 (0.1 % low) and 7766 (0.1 % high) do not.
    CHECK(clean(check(oil, "N = 7759*A*h")));
    CHECK(clean(check(oil, "N = 7757*A*h")));
    CHECK(findings(check(oil, "N = 7750*A*h"), plumb::rules::unit_scale).size() == 1);
    CHECK(findings(check(oil, "N = 7766*A*h"), plumb::rules::unit_scale).size() == 1);
    const std::string lengths = "x_m : m\nx_f : ft\n";
    CHECK(clean(check(lengths, "x_f = 3.28*x_m")));
    CHECK(clean(check(lengths, "x_f = 3.2808*x_m")));
    CHECK(findings(check(lengths, "x_f = 3.29*x_m"), plumb::rules::unit_scale).size() == 1);
    CHECK(findings(check(lengths, "x_f = 3.2809*x_m"), plumb::rules::unit_scale).size() == 1);
    // The exact factor written out in full agrees exactly.
    CHECK(clean(check(lengths, "x_m = 0.3048*x_f")));
    CHECK(findings(check(lengths, "x_m = 0.3049*x_f"), plumb::rules::unit_scale).size() == 1);
}

TEST_CASE("factors are printed from their exact values") {
    // 1 h = 3600 s; 1 ft = 0.3048 m exactly (NIST SP 811 (2008), B.8); 1 mm² = 10⁻⁶ m².
    const auto hours = check("Q_s : m^3/s\nQ_h : m^3/h\n", "Q_s = Q_h + Q_s");
    REQUIRE(findings(hours, plumb::rules::unit_scale).size() == 1);
    const auto& h = *findings(hours, plumb::rules::unit_scale)[0];
    CHECK((mentions(h, "3600 times") || mentions(h, "1/3600 times")));
    CHECK(!mentions(h, "0.000277778"));
    const auto feet = check("x_m : m\nx_f : ft\n", "x_m = x_f");
    REQUIRE(findings(feet, plumb::rules::unit_scale).size() == 1);
    CHECK(mentions(*findings(feet, plumb::rules::unit_scale)[0], "1/0.3048"));
    CHECK(plumb::format_factor(plumb::rational(1000000), 1e6) == "10⁶");
    CHECK(plumb::format_factor(plumb::rational(1, 3600), 1.0 / 3600) == "1/3600");
    CHECK(plumb::format_factor(plumb::rational(381, 1250), 0.3048) == "0.3048");
    CHECK(plumb::format_factor(plumb::rational(5, 9), 5.0 / 9) == "1/1.8");
    CHECK(plumb::format_factor(plumb::rational(7, 9), 7.0 / 9) == "7/9");
    CHECK(plumb::format_factor(plumb::rational(1250, 381), 1250.0 / 381) == "3.28084 (1/0.3048)");
    CHECK(plumb::format_factor(plumb::rational(1000), 1e3) == "1000");
    CHECK(plumb::format_factor(plumb::rational(1, 1000000), 1e-6) == "10⁻⁶");
    CHECK(plumb::format_factor(std::nullopt, 2.5e7) == "2.5 × 10⁷");
    for (const std::string& text : {plumb::format_factor(plumb::rational(1000000), 1e6),
                                    plumb::format_factor(std::nullopt, 1e6)})
        CHECK(text.find('e') == std::string::npos);
}

TEST_CASE("a literal's interval is exact: half a unit in its last printed digit (a unit above from "
          "four digits, and at four digits at least 0.03 %), at most 1 %") {
    // A table's four digits are cut as often as rounded (5.614 ft³/bbl in US EPA AP-42 for
    // 5.6146), and rounded from older or chained values (3413 Btu/h per kW): 7758 stands for
    // 7758 - 2.3274 to 7758 + 2 × 2.3274 (0.03 % of it, wider than its half unit), 5.614 for
    // 5.614 - 0.0016842 to 5.614 + 0.0033684; 0.0631 (three digits) for 0.06305 to 0.06315;
    // 2 for 1.98 to 2.02 (the 1 % cap: a 2 is never a 2.2).
    const auto oil = plumb::read_literal("7758", 7758.0, 0);
    REQUIRE(oil.low);
    CHECK(*oil.low == plumb::rational(38778363, 5000));
    CHECK(*oil.high == plumb::rational(19406637, 2500));
    const auto barrel = plumb::read_literal("5.614", 5.614, 0);
    REQUIRE(barrel.low);
    CHECK(*barrel.low == plumb::rational(56123158, 10000000));
    CHECK(*barrel.high == plumb::rational(56173684, 10000000));
    // The value as printed is still the digits themselves, as the advised factors show it.
    CHECK(plumb::printed_power(barrel, 1.0) == plumb::rational(5614, 1000));
    CHECK(plumb::printed_power(oil, 1.0) == plumb::rational(7758));
    const auto gpm = plumb::read_literal("0.0631", 0.0631, 0);
    REQUIRE(gpm.low);
    CHECK(*gpm.low == plumb::rational(6305, 100000));
    CHECK(*gpm.high == plumb::rational(6315, 100000));
    const auto two = plumb::read_literal("2", 2.0, 0);
    REQUIRE(two.low);
    CHECK(*two.low == plumb::rational(198, 100));
    CHECK(*two.high == plumb::rational(202, 100));
    const auto mega = plumb::read_literal("1e6", 1e6, 0);
    REQUIRE(mega.low);
    CHECK(*mega.low == plumb::rational(990000));
}

TEST_CASE("readings on scales with different zeros") {
    const std::string temps = "T_K, T_K2 : K\nT_C, T_1, T_2 : °C\nT_F : °F\nΔT : K\n";
    SUBCASE("a kelvin symbol set equal to a °C one, or to T_C - 273.15") {
        const auto r = check(temps, "T_K = T_C");
        const auto f = findings(r, plumb::rules::offset_scale);
        REQUIRE(f.size() == 1);
        CHECK(marked(r, *f[0]) == "T_C");
        CHECK(mentions(*f[0], "(T_C + 273.15)"));
        const auto minus = check(temps, "T_K = T_C - 273.15");
        REQUIRE(findings(minus, plumb::rules::offset_scale).size() == 1);
        CHECK(marked(minus, *findings(minus, plumb::rules::offset_scale)[0]) == "273.15");
    }
    SUBCASE("the conversions of NIST SP 811 (2008), B.9 pass") {
        // T/K = t/°C + 273.15; t/°F = 1.8 t/°C + 32; T/K = (t/°F + 459.67)/1.8.
        for (const std::string formula :
             {"T_K = T_C + 273.15", "T_F = 1.8*T_C + 32", "T_C = (T_F - 32)/1.8",
              "T_C = 5/9*(T_F - 32)", "T_K = (T_F + 459.67)/1.8", "T_C = T_K - 273.15"}) {
            CAPTURE(formula);
            CHECK(clean(check(temps, formula)));
        }
    }
    SUBCASE("a °C reading minus a kelvin reading; a difference in K is fine") {
        const auto r = check(temps, "ΔT = T_C - T_K");
        REQUIRE(findings(r, plumb::rules::offset_scale).size() == 1);
        CHECK(clean(check(temps, "T_1 = T_2 - ΔT")));
        CHECK(clean(check(temps, "ΔT = T_2 - T_1")));
    }
    const std::string pressures =
        "p_a, p_atm, p_a2 : bar\np_g : barg\nΔp : bar\np_s : psig\np_sa : psia\n";
    SUBCASE("absolute set equal to gauge; a bar reading minus a barg one") {
        REQUIRE(findings(check(pressures, "p_a = p_g"), plumb::rules::offset_scale).size() == 1);
        // As a difference, or inside a product, absolute less gauge is off by the atmosphere.
        const auto difference = check(pressures, "Δp = p_a - p_g");
        REQUIRE(findings(difference, plumb::rules::offset_scale).size() == 1);
        CHECK(mentions(*findings(difference, plumb::rules::offset_scale)[0], "is a difference"));
        CHECK(findings(check(pressures + "F : N\nA : m^2\n", "F = (p_a - p_g)*A"),
                       plumb::rules::offset_scale)
                  .size() == 1);
    }
    SUBCASE("absolute less gauge is the atmosphere; absolute less the atmosphere is gauge") {
        // A gauge reads absolute pressure less the atmosphere's: p_g = p_abs - p_atm, so
        // p_atm = p_abs - p_g (common practice; 1 atm = 101325 Pa, NIST SP 811 (2008), B.8).
        CHECK(clean(check(pressures, "p_atm = p_a - p_g")));
        CHECK(clean(check(pressures, "p_atm = (p_a - p_g)")));
        CHECK(clean(check(pressures, "p_g = p_a - p_atm")));
        CHECK(clean(check(pressures + "p_o : psia\n", "p_s = p_sa - p_o")));
        // The wrong neighbours: gauge set equal to absolute, the subtraction reversed (minus
        // the atmosphere), and absolute less gauge set equal to a gauge reading.
        CHECK(findings(check(pressures, "p_a = p_g"), plumb::rules::offset_scale).size() == 1);
        const auto reversed = check(pressures, "p_atm = p_g - p_a");
        REQUIRE(findings(reversed, plumb::rules::offset_scale).size() == 1);
        CHECK(mentions(*findings(reversed, plumb::rules::offset_scale)[0], "its negative"));
        CHECK(findings(check(pressures + "p_g2 : barg\n", "p_g = p_a - p_g2"),
                       plumb::rules::offset_scale)
                  .size() == 1);
        // The same origin arithmetic for temperatures: K less °C is the ice point, 273.15 K.
        CHECK(clean(check(temps, "T_K2 = T_K - T_C")));
        CHECK(findings(check(temps, "ΔT = T_K - T_C"), plumb::rules::offset_scale).size() == 1);
    }
    SUBCASE("gauge + atmosphere, in any declared absolute pressure or the rounded number") {
        // 1 atm = 101.325 kPa = 1.01325 bar = 14.696 psi (NIST SP 811 (2008), B.8).
        for (const std::string formula :
             {"p_a = p_g + p_atm", "p_a = p_g + 1.01325", "p_sa = p_s + 14.696",
              "p_sa = p_s + 14.7", "p_a = p_g + {p_atm}", "p_g = p_g + Δp"}) {
            CAPTURE(formula);
            CHECK(clean(check(pressures, formula)));
        }
    }
    SUBCASE("a unit measured in a gauge unit is gauge (1 bar = 100 kPa, SI Brochure Table 8)") {
        const std::string own = "measure kPa_g = 0.01 barg\np_k : kPa_g\np_abs : kPa\n";
        CHECK(findings(check(own, "p_abs = p_k"), plumb::rules::offset_scale).size() == 1);
        CHECK(clean(check(own, "p_abs = p_k + 101.325")));
    }
}

TEST_CASE("offset values as factors: the fix fits the case") {
    SUBCASE("R = R_20 (1 + α T) with T in °C: a difference from 20 °C") {
        // Resistance against temperature with α tabulated at 20 °C (common practice, e.g.
        // copper α_20 = 0.00393 /K, from memory).
        const std::string d = "R, R_20 : ohm\nα : 1/K\nT : °C\n";
        const auto r = check(d, "R = R_20*(1 + α*T)");
        const auto f = findings(r, plumb::rules::offset_scale);
        REQUIRE(f.size() == 1);
        CHECK(mentions(*f[0], "(T - 20)"));
        CHECK_FALSE(mentions(*f[0], "273.15"));
        CHECK(clean(check(d, "R = R_20*(1 + α*(T - 20))")));
        // A battery's capacity at the ten-hour rate, C_10, and a fit's constant k_1 name no
        // temperature: the advice says T_ref rather than 10 or 1 (IEEE 485's correction is
        // from 25 °C, from memory).
        const auto battery = check("C_t, C_10 : A*h\nλ : 1/K\nθ : °C\n", "C_t = C_10*(1 + λ*θ)");
        const auto b = findings(battery, plumb::rules::offset_scale);
        REQUIRE(b.size() == 1);
        CHECK(mentions(*b[0], "(θ - T_ref)"));
        CHECK_FALSE(mentions(*b[0], "(θ - 10)"));
    }
    SUBCASE("a `?` coefficient does not switch the °F check off") {
        const auto r = check("q : W\nA : m^2\nT_F : °F\n", "q = 1.3?*T_F*A");
        CHECK(findings(r, plumb::rules::offset_scale).size() == 1);
        CHECK(findings(r, plumb::rules::inferred_dimension).size() == 1);
    }
    SUBCASE("temperature differences in Δ°C and compound units with °F pass") {
        // Q = U A ΔT_lm (Incropera et al., 6th ed., eq. 11.14, from memory); 1 Btu/(h·ft²·°F)
        // = 5.678263 W/(m²·K) (NIST SP 811 (2008), B.8).
        CHECK(clean(check("Q : W\nU : W/(m^2*K)\nA : m^2\nΔT : Δ°C\n", "Q = U*A*ΔT")));
        CHECK(clean(check("Q : Btu/h\nU : Btu/(h*ft^2*°F)\nA : ft^2\nT_1, T_2 : °F\n",
                          "Q = U*A*(T_2 - T_1)")));
    }
}

TEST_CASE("in the argument of exp or ln, the terms with a dimension are the odd ones") {
    const auto r = check("x, y : m\nz : 1\n", "z = ln(x + y + 1)");
    const auto f = findings(r, plumb::rules::sum_mismatch);
    REQUIRE(f.size() == 1);
    CHECK(marked(r, *f[0]) == "x");
}

TEST_CASE("exact scales: units defined exactly agree exactly, and differ when they differ") {
    // NIST SP 811 (2008), B.8: gallon (U.S.) = 3.785412E-03 m³, exactly 0.003785411784 m³;
    // minute = 60 s (SI Brochure 9th ed., Table 8). So gal/min is exactly one gpm row.
    SUBCASE("gal/min beside gpm, and ft^3 beside ft3, agree") {
        CHECK(clean(check("Q_1 : gal/min\nQ_2 : gpm\n", "Q_1 = Q_2")));
        CHECK(clean(check("V_1 : ft^3\nV_2 : ft3\n", "V_1 = V_2")));
    }
    SUBCASE("gal/min beside L/s is off by a factor and is found") {
        const auto r = check("Q_1 : gal/min\nQ_2 : L/s\n", "Q_1 = Q_2");
        CHECK(findings(r, plumb::rules::unit_scale).size() == 1);
    }
    SUBCASE("m^3/s beside 1000 L/s agree; (L/1000)^2 with L in mm is m²") {
        // SI Brochure 9th ed., Table 8: 1 L = 10⁻³ m³.
        CHECK(clean(check("Q_1 : m^3/s\nQ_2 : L/s\n", "Q_1 = Q_2/1000")));
        CHECK(clean(check("A : m^2\nL : mm\n", "A = (L/1000)^2")));
    }
    SUBCASE("a rational power falls back to the double and still agrees") {
        // v = sqrt(g h) in coherent units (shallow-water wave speed, common practice).
        CHECK(clean(check("v : m/s\ng : m/s^2\nh : m\n", "v = (g*h)^(1/2)")));
        CHECK(clean(check("v : m/s\nk : m^(1/2)\nh : m\ng : m^(1/2)/s\n", "v = g*h^(1/2)")));
    }
}
