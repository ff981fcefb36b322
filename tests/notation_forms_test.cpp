// The notation's own forms for studies ("depends on"), units of one's own ("measure", "zero
// at") and differences on offset scales ("Δ°C"), and the messages for the retired spellings.
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

std::uint32_t line_of(const plumb::diagnostic& d) {
    return d.where.file->position(d.where.range.begin).line;
}

std::uint32_t column_of(const plumb::diagnostic& d) {
    return d.where.file->position(d.where.range.begin).column;
}

} // namespace

TEST_CASE("study lines: 'depends on' and 'depend on' name the dependent variables") {
    // Sphere drag, F = f(ρ, V, D, μ): two groups (White, Fluid Mechanics, 7th ed., ch. 5, from
    // memory).
    const std::string decl = "F_D : N\nρ : kg/m^3\nV : m/s\nD : m\nμ : Pa*s\n";
    const auto one = plumb::check_text("s.plumb", decl + "study drag: F_D depends on ρ, V, D, μ\n");
    CHECK(one.diagnostics.empty());
    REQUIRE(one.studies.size() == 1);
    CHECK(one.studies[0].variables.size() == 5);

    SUBCASE("the plural form parses, with its dependents listed first") {
        const auto two = plumb::check_text(
            "s.plumb", decl + "M_D : N*m\nstudy drag: F_D, M_D depend on ρ, V, D, μ\n");
        CHECK(findings(two, plumb::rules::syntax).empty());
    }
    SUBCASE("a name that merely starts with 'depend' is a variable") {
        const auto r = plumb::check_text(
            "s.plumb",
            decl + "dependency : m\nstudy drag: F_D depends on ρ, V, D, μ, dependency\n");
        CHECK(findings(r, plumb::rules::syntax).empty());
        REQUIRE(r.studies.size() == 1);
        CHECK(r.studies[0].variables.size() == 6);
    }
    SUBCASE("the retired '~' gets a message that says what to write, at the '~'") {
        const auto r = plumb::check_text("s.plumb", decl + "study drag: F_D ~ ρ, V, D, μ\n");
        const auto syntax = findings(r, plumb::rules::syntax);
        REQUIRE(syntax.size() == 1);
        CHECK(syntax[0]->message.find("depends on") != std::string::npos);
        CHECK(line_of(*syntax[0]) == 6);
        CHECK(column_of(*syntax[0]) == 17);
    }
}

TEST_CASE("measure lines define units of one's own, with a zero where the scale has one") {
    SUBCASE("a size in a known unit (1 US gallon = 3.785411784 L exactly, NIST SP 811, B.8)") {
        const auto r =
            plumb::check_text("u.plumb", "measure mgd = 1e6 gal/d \"million US gallons a day\"\n"
                                         "Q_a : mgd\nQ_b : m^3/s\nQ_a = 0.0438126364*Q_b\n");
        CHECK(findings(r, plumb::rules::unknown_unit).empty());
        CHECK(findings(r, plumb::rules::syntax).empty());
    }
    SUBCASE("the size may be left out: one of the named unit") {
        const auto r = plumb::check_text("u.plumb", "measure cusec = ft^3/s\nQ : cusec\nV : m/s\n"
                                                    "A : m^2\nQ = V*A\n");
        CHECK(findings(r, plumb::rules::syntax).empty());
        CHECK(findings(r, plumb::rules::unknown_unit).empty());
    }
    SUBCASE("a reciprocal unit, written as a declaration writes it (1/min)") {
        // A metering pump's strokes per minute; 1 min = 60 s (NIST SP 811, B.8).
        const auto r = plumb::check_text("u.plumb", "measure spm = 1/min \"strokes per minute\"\n"
                                                    "n : spm\nf : Hz\nf = n/60\nf = n\n");
        CHECK(findings(r, plumb::rules::syntax).empty());
        CHECK(findings(r, plumb::rules::unknown_unit).empty());
        const auto scale = findings(r, plumb::rules::unit_scale);
        REQUIRE(scale.size() == 1);
        CHECK(line_of(*scale[0]) == 5);
    }
    SUBCASE("a gauge unit of one's own is gauge: absolute = gauge is reported") {
        // One standard atmosphere is 101.325 kPa exactly (SI Brochure 9th ed., Table 8 note;
        // NIST SP 811, B.8).
        const auto r = plumb::check_text("u.plumb", "measure kPag = kPa zero at 101.325 kPa\n"
                                                    "p_g : kPag\np_abs : kPa\n"
                                                    "V : m^3\nm : kg\nR_s : J/(kg*K)\nT : K\n"
                                                    "p_g*V = m*R_s*T\n"         // 8: gas law
                                                    "p_abs = p_g + 101.325\n"); // 9: converted
        const auto offsets = findings(r, plumb::rules::offset_scale);
        REQUIRE(!offsets.empty());
        CHECK(line_of(*offsets[0]) == 8);
        CHECK(std::none_of(offsets.begin(), offsets.end(),
                           [](const auto* d) { return line_of(*d) == 9; }));
    }
    SUBCASE("a unit measured in a gauge unit keeps its zero (1 bar = 100 kPa, SI Brochure "
            "Table 8)") {
        const auto r = plumb::check_text("u.plumb", "measure kPag = 0.01 barg\n"
                                                    "p_g : kPag\nV : m^3\nm : kg\n"
                                                    "R_s : J/(kg*K)\nT : K\np_g*V = m*R_s*T\n");
        CHECK(findings(r, plumb::rules::offset_scale).size() == 1);
    }
    SUBCASE("an offset temperature scale of one's own (Réaumur: 0.8 °Ré per K, zero at 273.15 K, "
            "from memory)") {
        const auto r = plumb::check_text("u.plumb", "measure °Re = 1.25 K zero at 273.15 K\n"
                                                    "T_r : °Re\nk : W/(m^2*K)\nq : W/m^2\n"
                                                    "q = k*T_r\n");
        CHECK(findings(r, plumb::rules::offset_scale).size() == 1);
    }
    SUBCASE("a zero in another dimension is refused") {
        const auto r = plumb::check_text("u.plumb", "measure kPag = kPa zero at 101.325 m\n");
        CHECK(findings(r, plumb::rules::conflicting_declaration).size() == 1);
    }
    SUBCASE("a missing zero value is a syntax finding with its own message") {
        const auto r = plumb::check_text("u.plumb", "measure kPag = kPa zero at\n");
        const auto syntax = findings(r, plumb::rules::syntax);
        REQUIRE(syntax.size() == 1);
        CHECK(syntax[0]->message.find("zero") != std::string::npos);
    }
    SUBCASE("the retired 'unit' spelling says to write 'measure'") {
        const auto r = plumb::check_text("u.plumb", "unit mgd = 0.0438126364 m^3/s\n");
        const auto syntax = findings(r, plumb::rules::syntax);
        REQUIRE(syntax.size() == 1);
        CHECK(syntax[0]->message.find("measure mgd") != std::string::npos);
    }
    SUBCASE("a symbol called 'unit' still works in formulas") {
        const auto r = plumb::check_text("u.plumb", "unit, x : m\nunit = x\n");
        CHECK(r.diagnostics.empty());
    }
}

TEST_CASE("Δ°C and Δ°F are differences: ordinary quantities, free in products") {
    // Q = U A ΔT_lm with ΔT_lm from a datasheet in °C (Incropera et al., Fundamentals of Heat
    // and Mass Transfer, 6th ed., eq. 11.14, from memory); 1 Δ°C = 1 K (SI Brochure 9th ed.,
    // 2.3.1: a Celsius temperature difference equals the kelvin one).
    const auto r = plumb::check_text("hx.plumb", "Q : W\nU : W/(m^2*K)\nA : m^2\n"
                                                 "ΔT_lm : Δ°C\nT_in : °C\n"
                                                 "Q = U*A*ΔT_lm\n"  // 6: fine
                                                 "Q = U*A*T_in\n"); // 7: an offset value
    const auto offsets = findings(r, plumb::rules::offset_scale);
    REQUIRE(offsets.size() == 1);
    CHECK(line_of(*offsets[0]) == 7);
    CHECK(findings(r, plumb::rules::unit_scale).empty());

    SUBCASE("a °F difference counts 5/9 K (NIST SP 811, B.9), so it is off by that factor") {
        const auto f = plumb::check_text("hx.plumb", "Q : W\nU : W/(m^2*K)\nA : m^2\n"
                                                     "ΔT : Δ°F\nQ = U*A*ΔT\n");
        CHECK(findings(f, plumb::rules::offset_scale).empty());
        CHECK(findings(f, plumb::rules::unit_scale).size() == 1);
    }
    SUBCASE("Δ before an unknown unit is an unknown unit") {
        const auto f = plumb::check_text("hx.plumb", "ΔT : Δ°X\n");
        CHECK(findings(f, plumb::rules::unknown_unit).size() == 1);
    }
}
