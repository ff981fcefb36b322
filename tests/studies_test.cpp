// Studies in the notation: parsing study, prototype and model lines, their findings, and the
// report that `plumb groups` renders.
#include "test_support.hpp"

#include "plumb/check.hpp"
#include "plumb/render.hpp"
#include "plumb/rules.hpp"

#include <doctest/doctest.h>

#include <algorithm>
#include <cmath>
#include <string>

namespace {

using plumb::check_text;

std::size_t count_rule(const plumb::check_report& r, std::string_view rule) {
    return static_cast<std::size_t>(std::count_if(r.diagnostics.begin(), r.diagnostics.end(),
                                                  [&](const auto& d) { return d.rule == rule; }));
}

const plumb::diagnostic* find_rule(const plumb::check_report& r, std::string_view rule) {
    for (const auto& d : r.diagnostics)
        if (d.rule == rule)
            return &d;
    return nullptr;
}

// Sphere drag: five variables, rank 3, two groups (F. M. White, Fluid Mechanics, 7th ed.,
// ch. 5, the sphere-drag example: C_D = f(Re); chapter from memory).
const std::string sphere = "F_D : N\n"
                           "ρ : kg/m^3\n"
                           "V : m/s\n"
                           "D : m\n"
                           "μ : Pa*s\n";

} // namespace

TEST_CASE("studies: a study line gives its variables, dependent and groups") {
    const auto r = check_text("sphere.plumb", sphere + "study drag: F_D depends on ρ, V, D, μ\n");
    CHECK(r.diagnostics.empty());
    REQUIRE(r.studies.size() == 1);
    const auto& s = r.studies.front();
    CHECK(s.name == "drag");
    REQUIRE(s.variables.size() == 5);
    CHECK(s.variables[0].name == "F_D"); // the dependent variable comes first
    CHECK(s.analysis.rank == 3);
    CHECK(s.analysis.groups.size() == 2);
    // Every symbol used by the study counts as used: no unused warnings.
    CHECK(count_rule(r, plumb::rules::unused) == 0);
}

TEST_CASE("studies: given repeating variables are used as given") {
    const auto r = check_text("sphere.plumb",
                              sphere + "study drag: F_D depends on ρ, V, D, μ repeating μ, V, D\n");
    REQUIRE(r.studies.size() == 1);
    const auto& a = r.studies.front().analysis;
    CHECK_FALSE(a.repeating_chosen);
    REQUIRE(a.repeating.size() == 3);
    // Indices in the study's order: F_D 0, ρ 1, V 2, D 3, μ 4.
    CHECK(a.repeating[0] == 4);
    CHECK(a.repeating[1] == 2);
    CHECK(a.repeating[2] == 3);
}

TEST_CASE("studies: findings on study lines") {
    SUBCASE("an undeclared variable") {
        const auto r = check_text("s.plumb", sphere + "study drag: F_D depends on ρ, V, D, nu\n");
        const auto* d = find_rule(r, plumb::rules::undeclared);
        REQUIRE(d != nullptr);
        CHECK(r.sources.front()->position(d->where.range.begin).column == 37);
        CHECK(r.studies.empty());
    }
    SUBCASE("a variable listed twice") {
        const auto r = check_text("s.plumb", sphere + "study drag: F_D depends on ρ, V, D, μ, V\n");
        REQUIRE(find_rule(r, plumb::rules::study_problem) != nullptr);
        CHECK(find_rule(r, plumb::rules::study_problem)->message.find("listed twice") !=
              std::string::npos);
    }
    SUBCASE("a repeating variable outside the study") {
        const auto r = check_text(
            "s.plumb",
            sphere + "g : m/s^2\nstudy drag: F_D depends on ρ, V, D, μ repeating ρ, V, g\n");
        REQUIRE(find_rule(r, plumb::rules::study_problem) != nullptr);
    }
    SUBCASE("repeating variables that are not independent") {
        // Two speeds cannot both repeat: U has the dimension of V.
        const auto r = check_text(
            "s.plumb",
            sphere + "U : m/s\nstudy drag: F_D depends on ρ, V, U, D, μ repeating ρ, V, U\n");
        const auto* d = find_rule(r, plumb::rules::study_problem);
        REQUIRE(d != nullptr);
        CHECK(r.studies.front().analysis.groups.empty());
    }
    SUBCASE("two studies with one name") {
        const auto r = check_text(
            "s.plumb",
            sphere +
                "study drag: F_D depends on ρ, V, D, μ\nstudy drag: F_D depends on ρ, V, D, μ\n");
        CHECK(count_rule(r, plumb::rules::study_problem) == 1);
    }
    SUBCASE("a syntax error names what was expected") {
        const auto r = check_text("s.plumb", sphere + "study drag: F_D depends on ρ, V,\n");
        const auto* d = find_rule(r, plumb::rules::syntax);
        REQUIRE(d != nullptr);
        CHECK(d->message == "expected a variable name after ','");
    }
}

TEST_CASE("studies: the keywords stay usable as symbol names") {
    const auto r = check_text("k.plumb", "study, model, scale, repeating : m\nprototype : m\n"
                                         "study = model + scale + repeating + prototype\n");
    CHECK(r.diagnostics.empty());
    CHECK(r.formulas_checked == 1);
}

TEST_CASE("studies: prototype and model values") {
    // Froude similarity at 1:25 (common practice; the ratios are in every hydraulic-model text,
    // e.g. Chanson, The Hydraulics of Open Channel Flow, 2nd ed., ch. 14, from memory):
    // velocity ratio λ^(1/2) = 0.2.
    const std::string text = "V : m/s\nL : m\ng : m/s^2\n"
                             "study wave: V depends on g, L\n"
                             "prototype wave: V = 5 m/s, L = 100 m, g = 9.81 m/s^2\n"
                             "model wave: scale = 1:25\n";
    const auto r = check_text("w.plumb", text);
    CHECK(r.diagnostics.empty());
    REQUIRE(r.studies.size() == 1);
    const auto& s = r.studies.front();
    REQUIRE(s.length_scale);
    CHECK(*s.length_scale == doctest::Approx(0.04));
    REQUIRE(s.plan);
    const auto v = std::find_if(s.plan->model.begin(), s.plan->model.end(),
                                [](const auto& m) { return m.variable == 0; });
    REQUIRE(v != s.plan->model.end());
    REQUIRE(v->value);
    CHECK(*v->value == doctest::Approx(5.0 * 0.2).epsilon(1e-9));

    SUBCASE("scale as a number") {
        std::string t = text;
        t.replace(t.find("1:25"), 4, "0.04");
        const auto r2 = check_text("w.plumb", t);
        REQUIRE(r2.studies.front().length_scale);
        CHECK(*r2.studies.front().length_scale == doctest::Approx(0.04));
    }
    SUBCASE("values in other units are converted (NIST SP 811 (2008), B.8: 1 ft = 0.3048 m)") {
        std::string t = text;
        t.replace(t.find("L = 100 m"), 9, "L = 100 ft");
        const auto r2 = check_text("w.plumb", t);
        REQUIRE(r2.studies.front().prototype.size() == 3);
        REQUIRE(r2.studies.front().prototype[2]);
        CHECK(*r2.studies.front().prototype[2] == doctest::Approx(30.48));
    }
}

TEST_CASE("studies: findings on value lines") {
    const std::string base = "V : m/s\nL : m\ng : m/s^2\nstudy wave: V depends on g, L\n";
    SUBCASE("a unit of the wrong dimension") {
        const auto r =
            check_text("w.plumb", base + "prototype wave: V = 5 m, L = 100 m, g = 9.81 m/s^2\n");
        const auto* d = find_rule(r, plumb::rules::value_mismatch);
        REQUIRE(d != nullptr);
        CHECK(d->message.find("'V'") != std::string::npos);
    }
    SUBCASE("a dimensioned variable given a bare number") {
        const auto r =
            check_text("w.plumb", base + "prototype wave: V = 5, L = 100 m, g = 9.81 m/s^2\n");
        const auto* d = find_rule(r, plumb::rules::value_mismatch);
        REQUIRE(d != nullptr);
        CHECK(d->message.find("needs a unit") != std::string::npos);
    }
    SUBCASE("a value for a variable outside the study") {
        const auto r = check_text(
            "w.plumb", base + "prototype wave: V = 5 m/s, L = 100 m, g = 9.81 m/s^2, h = 2 m\n");
        CHECK(find_rule(r, plumb::rules::study_problem) != nullptr);
    }
    SUBCASE("a prototype line for a study that does not exist") {
        const auto r = check_text("w.plumb", base + "prototype waves: V = 5 m/s\n");
        const auto* d = find_rule(r, plumb::rules::study_problem);
        REQUIRE(d != nullptr);
        CHECK(d->message.find("no study 'waves'") != std::string::npos);
    }
    SUBCASE("a scale on the prototype line") {
        const auto r = check_text(
            "w.plumb",
            base + "prototype wave: scale = 1:10, V = 5 m/s, L = 100 m, g = 9.81 m/s^2\n");
        CHECK(find_rule(r, plumb::rules::study_problem) != nullptr);
    }
    SUBCASE("a missing value is a problem of the plan") {
        const auto r = check_text("w.plumb", base + "prototype wave: V = 5 m/s, g = 9.81 m/s^2\n");
        CHECK(find_rule(r, plumb::rules::study_problem) != nullptr);
    }
}

TEST_CASE("studies: the text and JSON renderings carry the groups and the caution") {
    const auto r = check_text("sphere.plumb", sphere + "study drag: F_D depends on ρ, V, D, μ\n");
    const std::string text = plumb::render_groups_text(r);
    CHECK(text.find("study drag") != std::string::npos);
    CHECK(text.find("rank 3: 5 variables give 2 independent groups") != std::string::npos);
    CHECK(text.find("Reynolds number") != std::string::npos);
    const std::string json = plumb::render_groups_json(r);
    CHECK(json.find("\"studies\": [") != std::string::npos);
    CHECK(json.find("\"rank\": 3") != std::string::npos);
    CHECK(json.find("\"caution\":") != std::string::npos);
}

TEST_CASE("studies: several dependent variables each get a group of their own") {
    // Pump affinity: head and power depend on flow, speed, size and fluid (Karassik et al.,
    // Pump Handbook, 4th ed., sec. 2.1; from memory).
    const auto r = check_text("pump.plumb", "gH : J/kg\nP : W\nQ : m^3/s\nn : 1/s\nD : m\n"
                                            "ρ : kg/m^3\nμ : Pa*s\n"
                                            "study pump: gH, P depend on Q, n, D, ρ, μ\n");
    REQUIRE(r.studies.size() == 1);
    const auto& groups = r.studies[0].analysis.groups;
    REQUIRE(groups.size() == 4);
    for (const std::size_t dependent : {0, 1}) {
        std::size_t holders = 0;
        for (const auto& g : groups)
            holders += g.exponents[dependent].is_zero() ? 0 : 1;
        CHECK(holders == 1);
    }
    CHECK(groups[0].name == "head coefficient");
    CHECK(groups[1].name == "power number");
}

TEST_CASE("studies: a variable on an offset scale never repeats") {
    const std::string decls = "h : W/(m^2*K)\nk : W/(m*K)\nL : m\nT_s : °C\n";
    const auto chosen = check_text("t.plumb", decls + "study s: h depends on k, L, T_s\n");
    CHECK(count_rule(chosen, plumb::rules::study_problem) == 1);
    const auto named =
        check_text("t.plumb", decls + "study s: h depends on k, L, T_s repeating k, L, T_s\n");
    const auto* d = find_rule(named, plumb::rules::study_problem);
    REQUIRE(d != nullptr);
    CHECK(d->message.find("'T_s' is on a scale with a zero of its own") != std::string::npos);
}

TEST_CASE("studies: the match clause chooses the groups, and its mistakes are named") {
    // White, Fluid Mechanics, 7th ed., sec. 5.5 (from memory): a hull towed at Froude scale,
    // V_m = V_p·√λ. At 1:25, 10 m/s becomes 2 m/s.
    const std::string hull = "R : kN\nρ : kg/m^3\nV : m/s\nL : m\nμ : Pa*s\ng : m/s^2\n"
                             "study hull: R depends on ρ, V, L, μ, g\n"
                             "prototype hull: R = 1000 kN, ρ = 1000 kg/m^3, V = 10 m/s, "
                             "L = 100 m, μ = 1e-3 Pa*s, g = 9.81 m/s^2\n";
    for (const std::string how : {"match Froude", "match Fr", "match froude number", "match π3"}) {
        INFO(how);
        const auto r = check_text("h.plumb", hull + "model hull: scale = 1:25, " + how + "\n");
        REQUIRE(r.studies.size() == 1);
        REQUIRE(r.studies[0].plan.has_value());
        CHECK(r.studies[0].match == std::vector<std::size_t>{2});
        CHECK(std::fabs(*r.studies[0].plan->model[2].value - 2.0) < 1e-9);
        CHECK(count_rule(r, plumb::rules::study_problem) == 0);
    }
    SUBCASE("a name that is no group") {
        const auto r = check_text("h.plumb", hull + "model hull: scale = 1:25, match Weber\n");
        const auto* d = find_rule(r, plumb::rules::study_problem);
        REQUIRE(d != nullptr);
        CHECK(d->message == "'Weber' names no group of study 'hull'");
    }
    SUBCASE("a stated tolerance") {
        // 2.0005 m/s is 0.025 % off the Froude speed, so V²/(Lg) is 0.05 % off: matched
        // within 0.1 %, not within 0.01 %.
        const std::string model = "model hull: scale = 1:25, V = 2.0005 m/s, match Froude";
        const auto loose = check_text("h.plumb", hull + model + " within 0.1 %\n");
        const auto tight = check_text("h.plumb", hull + model + " within 0.01 %\n");
        REQUIRE(loose.studies[0].plan.has_value());
        REQUIRE(tight.studies[0].plan.has_value());
        CHECK(loose.studies[0].plan->groups[2].matched);
        CHECK_FALSE(tight.studies[0].plan->groups[2].matched);
    }
    SUBCASE("a model length that contradicts the scale") {
        const auto r = check_text("h.plumb", hull + "model hull: scale = 1:25, L = 5 m\n");
        const auto* d = find_rule(r, plumb::rules::study_problem);
        REQUIRE(d != nullptr);
        CHECK(d->message.find("the model's L is 1:20 of the prototype's") != std::string::npos);
        CHECK(d->message.find("scale = 1:25") != std::string::npos);
    }
    SUBCASE("an unknown unit on a value line is an error, not a dropped value") {
        const auto r = check_text("h.plumb", hull + "model hull: scale = 1:25, μ = 1 blorp\n");
        CHECK(count_rule(r, plumb::rules::unknown_unit) == 1);
        CHECK(count_rule(r, plumb::rules::study_problem) == 1);
    }
}

TEST_CASE("studies: a conflict gives the model fluid's ν in the unit the user declared for ν") {
    // The 1:50 spillway of corpus/groups/spillway-model.plumb (Chanson, The Hydraulics of Open
    // Channel Flow, 2nd ed., ch. 14, from memory: the viscous group cannot match with the same
    // water). By hand: ν_m = ν_p·λ^(3/2) = (1e-3/998)·0.02^1.5 = 2.834e-9 m²/s = 0.002834 mm²/s
    // (SI Brochure 9th ed., Table 7: milli = 1e-3, so 1 mm²/s = 1e-6 m²/s).
    const std::string spillway =
        "V_t : m/s\nQ : m^3/s\nb : m\nP : m\ng : m/s^2\nρ : kg/m^3\nμ : Pa*s\n"
        "study spillway: V_t depends on Q, b, g, P, ρ, μ repeating ρ, g, P\n"
        "prototype spillway: V_t = 27 m/s, Q = 2500 m^3/s, b = 60 m, P = 40 m, g = 9.81 m/s^2, "
        "ρ = 998 kg/m^3, μ = 1.0e-3 Pa*s\n"
        "model spillway: scale = 1:50, g = 9.81 m/s^2, ρ = 998 kg/m^3, μ = 1.0e-3 Pa*s\n";
    const auto explanation = [](const plumb::check_report& r) {
        REQUIRE(r.studies.size() == 1);
        REQUIRE(r.studies[0].plan.has_value());
        REQUIRE(r.studies[0].plan->conflicts.size() == 1);
        return r.studies[0].plan->conflicts[0].explanation;
    };
    const std::string in_si = explanation(check_text("s.plumb", spillway));
    CHECK(in_si.find("a kinematic viscosity μ/ρ of 2.834e-9 m^2/s") != std::string::npos);
    const std::string declared =
        explanation(check_text("s.plumb", "ν : mm^2/s \"kinematic viscosity\"\n" + spillway));
    INFO(declared);
    CHECK(declared.find("a kinematic viscosity μ/ρ of 0.002834 mm^2/s") != std::string::npos);
    CHECK(declared.find(" m^2/s") == std::string::npos);
}
