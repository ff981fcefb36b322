// Scale-model plans against similarity laws worked out by hand. The groups are written out here
// as exponent vectors, so these tests rest on plan_model alone; one test at the end goes through
// analyse_groups as well. Every hand-written group is first checked to be dimensionless, so a
// slip in the inputs cannot pass for a planning error.
#include "plumb/dimension.hpp"
#include "plumb/groups.hpp"
#include "plumb/rational.hpp"

#include <doctest/doctest.h>

#include <algorithm>
#include <optional>
#include <string>
#include <vector>

namespace {

using plumb::dimension;
using plumb::group_variable;
using plumb::pi_group;
using plumb::rational;
using plumb::similitude_plan;
using plumb::similitude_request;

group_variable var(const char* name, int m, int l, int t) {
    return {name, dimension::from_exponents({rational(m), rational(l), rational(t), 0, 0, 0, 0})};
}

pi_group group(std::vector<rational> exponents, const char* formula, bool dependent = false,
               const char* name = "") {
    pi_group g;
    g.exponents = std::move(exponents);
    g.formula = formula;
    g.has_dependent = dependent;
    g.name = name;
    return g;
}

// The hand-written groups must be dimensionless, or the test would prove nothing.
void require_dimensionless(const similitude_request& r) {
    for (const auto& g : r.analysis.groups) {
        REQUIRE(g.exponents.size() == r.variables.size());
        dimension d;
        for (std::size_t j = 0; j < g.exponents.size(); ++j)
            d = d * r.variables[j].dim.pow(g.exponents[j]);
        INFO(g.formula);
        REQUIRE(d.is_dimensionless());
    }
}

bool contains(const std::string& text, const std::string& part) {
    return text.find(part) != std::string::npos;
}

bool any_contains(const std::vector<std::string>& texts, const std::string& part) {
    return std::any_of(texts.begin(), texts.end(),
                       [&](const std::string& t) { return contains(t, part); });
}

std::string all_problems(const similitude_plan& plan) {
    std::string out;
    for (const auto& p : plan.problems)
        out += p + "\n";
    return out;
}

doctest::Approx near(double v) {
    return doctest::Approx(v).epsilon(1e-9);
}

// A spillway model at Froude similarity with the prototype's water. Scale ratios for Froude
// similarity with the same fluid, for a length ratio λ (Chanson, The Hydraulics of Open Channel
// Flow, 2nd ed., ch. 14, physical modelling; from memory): velocity λ^(1/2), time λ^(1/2),
// discharge λ^(5/2), pressure λ, force λ^3. With λ = 1/25: 1/5, 1/5, 1/3125, 1/25.
// Variables: Q H W V t g ρ μ σ p
//            0 1 2 3 4 5 6 7 8 9
similitude_request spillway() {
    similitude_request r;
    r.variables = {
        var("Q", 0, 3, -1), var("H", 0, 1, 0),   var("W", 0, 1, 0),  var("V", 0, 1, -1),
        var("t", 0, 0, 1),  var("g", 0, 1, -2),  var("ρ", 1, -3, 0), var("μ", 1, -1, -1),
        var("σ", 1, 0, -2), var("p", 1, -1, -2),
    };
    const rational h(1, 2);
    const rational mh(-1, 2);
    r.analysis.rank = 3;
    r.analysis.groups = {
        group({1, rational(-5, 2), 0, 0, 0, mh, 0, 0, 0, 0}, "Q/(H^(5/2)*g^(1/2))"),
        group({0, -1, 1, 0, 0, 0, 0, 0, 0, 0}, "W/H"),
        group({0, mh, 0, 1, 0, mh, 0, 0, 0, 0}, "V/(H^(1/2)*g^(1/2))"),
        group({0, mh, 0, 0, 1, h, 0, 0, 0, 0}, "t*g^(1/2)/H^(1/2)"),
        group({0, 1, 0, 1, 0, 0, 1, -1, 0, 0}, "H*V*ρ/μ"),
        group({0, 1, 0, 2, 0, 0, 1, 0, -1, 0}, "H*V^2*ρ/σ"),
        group({0, -1, 0, 0, 0, -1, -1, 0, 0, 1}, "p/(H*g*ρ)", true),
    };
    // Prototype: a 20 m crest under 2 m of head; water at about 20 °C (ρ, μ, σ common practice).
    r.prototype = {120.0, 2.0, 20.0, 15.0, 3600.0, 9.81, 1000.0, 1.0e-3, 0.073, 5.0e4};
    r.length_scale = 1.0 / 25.0;
    r.model.assign(r.variables.size(), std::nullopt);
    r.model[6] = 1000.0;
    r.model[7] = 1.0e-3;
    r.model[8] = 0.073;
    r.match = {2}; // a free surface: Froude similarity, as a hydraulic laboratory plans it
    return r;
}

// A ship model towed in the prototype's water, λ = 1/25: Froude similarity gives the model speed
// and the resistance (force ratio λ^3 with the same fluid; Munson, Fundamentals of Fluid
// Mechanics, ch. 7, modelling and similitude; from memory). Reynolds similarity is listed first
// so that the plan must prefer the Froude number on its own account.
// Variables: F ρ μ V L g
similitude_request ship() {
    similitude_request r;
    r.variables = {var("F", 1, 1, -2), var("ρ", 1, -3, 0), var("μ", 1, -1, -1),
                   var("V", 0, 1, -1), var("L", 0, 1, 0),  var("g", 0, 1, -2)};
    const rational mh(-1, 2);
    r.analysis.rank = 3;
    r.analysis.groups = {
        group({0, 1, -1, 1, 1, 0}, "ρ*V*L/μ", false, "Reynolds number"),
        group({0, 0, 0, 1, mh, mh}, "V/(L^(1/2)*g^(1/2))", false, "Froude number"),
        group({1, -1, 0, -2, -2, 0}, "F/(ρ*V^2*L^2)", true),
    };
    // Prototype: 100 m hull at 10 m/s; sea water (ρ, μ common practice); resistance 1 MN.
    r.prototype = {1.0e6, 1025.0, 1.22e-3, 10.0, 100.0, 9.81};
    r.length_scale = 1.0 / 25.0;
    r.model = {std::nullopt, 1025.0, 1.22e-3, std::nullopt, std::nullopt, std::nullopt};
    r.match = {1}; // towing-tank practice: the Froude number
    return r;
}

} // namespace

TEST_SUITE("similitude") {

    TEST_CASE("similitude: a Froude-scaled spillway model follows the published scale ratios") {
        const auto r = spillway();
        require_dimensionless(r);
        const auto plan = plumb::plan_model(r);
        INFO(all_problems(plan));
        CHECK(plan.problems.empty());
        REQUIRE(plan.model.size() == 10);

        CHECK(plan.model[1].value == near(2.0 / 25.0)); // H
        CHECK(plan.model[1].how == "scaled by the length scale");
        CHECK(plan.model[2].value == near(20.0 / 25.0));    // W
        CHECK(plan.model[0].value == near(120.0 / 3125.0)); // Q: λ^(5/2)
        CHECK(plan.model[0].how == "from Q/(H^(5/2)*g^(1/2))");
        CHECK(plan.model[3].value == near(15.0 / 5.0)); // V: λ^(1/2)
        CHECK(plan.model[3].how == "from V/(H^(1/2)*g^(1/2))");
        CHECK(plan.model[4].value == near(3600.0 / 5.0)); // t: λ^(1/2)
        CHECK(plan.model[5].value == near(9.81));
        CHECK(plan.model[5].how == "same as the prototype (gravity)");
        CHECK(plan.model[6].how == "given");
        CHECK(plan.model[9].value == near(5.0e4 / 25.0)); // p: λ
        CHECK(plan.model[9].how == "from p/(H*g*ρ)");

        REQUIRE(plan.groups.size() == 7);
        for (const std::size_t g : {0, 1, 2, 3, 6}) {
            INFO("group " << g);
            CHECK(plan.groups[g].matched);
        }
        // Same water at 1/25 scale: the Reynolds number falls by λ^(3/2) = 1/125, from
        // 1000*15*2/1e-3 = 3e7 to 1000*3*0.08/1e-3 = 2.4e5; the Weber number by λ^2.
        CHECK_FALSE(plan.groups[4].matched);
        CHECK(plan.groups[4].prototype == near(3.0e7));
        CHECK(plan.groups[4].model == near(2.4e5));
        CHECK_FALSE(plan.groups[5].matched);
        CHECK(plan.groups[5].model == near(plan.groups[5].prototype.value_or(0) / 625.0));
    }

    TEST_CASE(
        "similitude: the spillway's Reynolds and Weber numbers conflict with its Froude number") {
        auto request = spillway();
        request.match.clear(); // no choice made: the plan must not pick one silently
        const auto plan = plumb::plan_model(request);
        REQUIRE(plan.conflicts.size() == 2);

        // Reynolds: ν_m = ν_p*λ^(3/2) = 1e-6/125 = 8e-9 m^2/s; at the same density μ_m = 8e-6 Pa*s;
        // or, at the same viscosity, a density of 1000*125 = 1.25e5 kg/m^3.
        const auto& re = plan.conflicts[0];
        CHECK(re.groups == std::vector<std::size_t>{2, 4});
        INFO(re.explanation);
        CHECK(contains(re.explanation, "H*V*ρ/μ"));
        CHECK(contains(re.explanation, "fixes V"));
        CHECK(contains(re.explanation, "8e-6 Pa*s"));
        CHECK(contains(re.explanation, "μ_model/μ_prototype = λ^(3/2) = 0.008"));
        CHECK(contains(re.explanation, "kinematic viscosity μ/ρ of 8e-9 m^2/s"));
        CHECK(contains(re.explanation, "ν_model/ν_prototype = λ^(3/2) = 0.008"));
        CHECK(contains(re.explanation, "1.25e5 kg/m^3"));
        CHECK(contains(re.explanation, "λ^(-3/2) = 125"));

        // Weber: σ_m = σ_p*λ^2 = 0.073/625 = 1.168e-4 N/m.
        const auto& we = plan.conflicts[1];
        CHECK(we.groups == std::vector<std::size_t>{2, 5});
        INFO(we.explanation);
        CHECK(contains(we.explanation, "surface tension σ of 1.168e-4 N/m"));
        CHECK(contains(we.explanation, "σ_model/σ_prototype = λ^2 = 0.0016"));

        // The choices: Froude, Reynolds or Weber, each fixing V; the speed waits for the choice.
        REQUIRE(plan.alternatives.size() == 3);
        CHECK_FALSE(plan.model[3].value.has_value());
        CHECK(plan.model[3].how == "depends on the group chosen to match");
        CHECK(plan.model[1].value == near(2.0 / 25.0)); // lengths follow the scale whatever
        const auto& froude = plan.alternatives[0];
        CHECK(froude.group == 2);
        const auto speed = std::find_if(froude.fixed.begin(), froude.fixed.end(),
                                        [](const auto& v) { return v.variable == 3; });
        REQUIRE(speed != froude.fixed.end());
        CHECK(speed->value == near(3.0)); // λ^(1/2)·15 m/s
        REQUIRE(froude.off.size() == 2);
        CHECK(froude.off[0].group == 4);
        CHECK(froude.off[0].ratio == near(1.0 / 125.0));
        CHECK(contains(froude.off[0].scale_effect, "lower in the model"));
        // Matching Reynolds in the same water: V_m = V_p/λ = 375 m/s, and the Froude group
        // V/√(gH) rises by λ^(-3/2) = 125.
        const auto& reynolds = plan.alternatives[1];
        CHECK(reynolds.group == 4);
        const auto fast = std::find_if(reynolds.fixed.begin(), reynolds.fixed.end(),
                                       [](const auto& v) { return v.variable == 3; });
        REQUIRE(fast != reynolds.fixed.end());
        CHECK(fast->value == near(375.0));
    }

    TEST_CASE("similitude: a ship model at Froude similarity and its Reynolds-number conflict") {
        const auto r = ship();
        require_dimensionless(r);
        const auto plan = plumb::plan_model(r);
        INFO(all_problems(plan));
        CHECK(plan.problems.empty());
        REQUIRE(plan.model.size() == 6);

        CHECK(plan.model[3].value == near(10.0 / 5.0)); // V: λ^(1/2)
        CHECK(plan.model[3].how == "from the Froude number");
        // The Reynolds number is the scale effect the choice accepts, not a conflict: with the
        // same water it falls by λ^(3/2) = 1/125, and friction counts for more in the model.
        CHECK(plan.conflicts.empty());
        REQUIRE(plan.groups.size() == 3);
        CHECK_FALSE(plan.groups[0].matched);
        CHECK(plan.groups[0].ratio == near(1.0 / 125.0));
        CHECK(contains(plan.groups[0].scale_effect, "lower in the model"));
        CHECK(contains(plan.groups[0].scale_effect, "viscous forces count for more"));
        CHECK(plan.model[4].value == near(4.0));
        CHECK(plan.model[0].value == near(1.0e6 / 15625.0)); // F: λ^3 = 1/15625
        CHECK(plan.model[0].how == "from F/(ρ*V^2*L^2)");

        auto unchosen = r;
        unchosen.match.clear();
        const auto open = plumb::plan_model(unchosen);
        REQUIRE(open.conflicts.size() == 1);
        const auto& c = open.conflicts[0];
        CHECK(c.groups == std::vector<std::size_t>{1, 0}); // Froude fixes V, Reynolds fails
        INFO(c.explanation);
        CHECK(contains(c.explanation, "matching the Froude number fixes V"));
        CHECK(contains(c.explanation, "To match the Reynolds number as well"));
        // ν_m = (1.22e-3/1025)/125 = 9.522e-9 m^2/s; μ_m = 1.22e-3/125 = 9.76e-6 Pa*s.
        CHECK(contains(c.explanation, "9.76e-6 Pa*s"));
        CHECK(contains(c.explanation, "9.522e-9 m^2/s (ν_model/ν_prototype = λ^(3/2) = 0.008)"));
        CHECK(open.alternatives.size() == 2);

        const auto caution = std::string(plumb::similitude_caution());
        CHECK(contains(caution, "partial similarity"));
        CHECK(contains(caution, "scale effects"));
        CHECK(contains(caution, "codes of practice"));
    }

    TEST_CASE("similitude: Reynolds similarity in another fluid, air prototype and water model") {
        // Worked by hand. Prototype in air: D = 2 m, V = 20 m/s, ρ = 1.2 kg/m^3, μ = 1.8e-5 Pa*s
        // (ν = 1.5e-5 m^2/s), drag 270 N. Model in water at λ = 1/4: ρ = 1000, μ = 1e-3 (ν = 1e-6).
        // Equal Re: V_m = V_p*(ν_m/ν_p)/λ = 20*(1/15)*4 = 16/3 m/s. Equal drag coefficient
        // F/(ρV^2D^2): F_m = F_p*(1000/1.2)*(4/15)^2*(1/4)^2 = F_p*100/27 = 1000 N. The principle
        // (match Re, carry the force by the drag coefficient) as in White, Fluid Mechanics, ch. 5;
        // from memory.
        similitude_request r;
        r.variables = {var("F", 1, 1, -2), var("ρ", 1, -3, 0), var("μ", 1, -1, -1),
                       var("V", 0, 1, -1), var("D", 0, 1, 0)};
        r.analysis.groups = {
            group({0, 1, -1, 1, 1}, "ρ*V*D/μ", false, "Reynolds number"),
            group({1, -1, 0, -2, -2}, "F/(ρ*V^2*D^2)", true),
        };
        require_dimensionless(r);
        r.prototype = {270.0, 1.2, 1.8e-5, 20.0, 2.0};
        r.length_scale = 0.25;
        r.model = {std::nullopt, 1000.0, 1.0e-3, std::nullopt, std::nullopt};
        const auto plan = plumb::plan_model(r);
        INFO(all_problems(plan));
        CHECK(plan.problems.empty());
        CHECK(plan.conflicts.empty());
        REQUIRE(plan.model.size() == 5);
        CHECK(plan.model[4].value == near(0.5));
        CHECK(plan.model[3].value == near(16.0 / 3.0));
        CHECK(plan.model[3].how == "from the Reynolds number");
        CHECK(plan.model[0].value == near(1000.0));
        REQUIRE(plan.groups.size() == 2);
        CHECK(plan.groups[0].matched);
        CHECK(plan.groups[1].matched);
        CHECK(plan.groups[1].model == near(270.0 / 1920.0)); // C = 270/(1.2*400*4)
    }

    TEST_CASE("similitude: two unknowns fixed by two groups together") {
        // Unknowns V and μ appear only together, in Re = ρVD/μ and Ca = μV/σ; by hand with
        // prototype ρ = 1000, V = 2, D = 0.1, μ = 1e-3, σ = 0.072 and model ρ = 1000, σ = 0.036,
        // λ = 1/2: V/μ = 2e5/(1000*0.05) = 4000 and V*μ = (1e-3*2/0.072)*0.036 = 1e-3, so
        // V = 2 m/s and μ = 5e-4 Pa*s.
        similitude_request r;
        r.variables = {var("ρ", 1, -3, 0), var("V", 0, 1, -1), var("D", 0, 1, 0),
                       var("μ", 1, -1, -1), var("σ", 1, 0, -2)};
        r.analysis.groups = {
            group({1, 1, 1, -1, 0}, "ρ*V*D/μ", false, "Reynolds number"),
            group({0, 1, 0, 1, -1}, "V*μ/σ", false, "capillary number"),
        };
        require_dimensionless(r);
        r.prototype = {1000.0, 2.0, 0.1, 1.0e-3, 0.072};
        r.length_scale = 0.5;
        r.model = {1000.0, std::nullopt, std::nullopt, std::nullopt, 0.036};
        const auto plan = plumb::plan_model(r);
        INFO(all_problems(plan));
        CHECK(plan.problems.empty());
        CHECK(plan.conflicts.empty());
        REQUIRE(plan.model.size() == 5);
        CHECK(plan.model[1].value == near(2.0));
        CHECK(plan.model[3].value == near(5.0e-4));
        CHECK(plan.model[1].how == "from the Reynolds number and the capillary number together");
        CHECK(plan.groups[0].matched);
        CHECK(plan.groups[1].matched);
    }

    TEST_CASE("similitude: unknowns solved together are never 0 or infinite and 'matched'") {
        // Density and speed both unknown, fixed together by the Reynolds number ρVD/μ and the
        // pressure group Δp/(ρV²): ρV = Re·μ/D and ρV² = Δp/Eu. Prototype by hand: ρ = 1000,
        // V = 2, D = 0.1, μ = 1e-3, Δp = 4000, so Re = 2e5 and Eu = 1. A model line with
        // Δp = 1e300 Pa and μ = 1e-300 Pa*s needs V = Δp·D/(Eu·Re·μ) = 5e593 m/s and
        // ρ = (Re·μ/D)²/(Δp/Eu) = 4e-888 kg/m^3: beyond a double, which once printed as a
        // speed of infinity and a density of 0, both "matched".
        similitude_request r;
        r.variables = {var("ρ", 1, -3, 0), var("V", 0, 1, -1), var("D", 0, 1, 0),
                       var("μ", 1, -1, -1), var("Δp", 1, -1, -2)};
        r.analysis.groups = {
            group({1, 1, 1, -1, 0}, "ρ*V*D/μ", false, "Reynolds number"),
            group({-1, -2, 0, 0, 1}, "Δp/(ρ*V^2)", false, "Euler number"),
        };
        require_dimensionless(r);
        r.prototype = {1000.0, 2.0, 0.1, 1.0e-3, 4000.0};
        r.length_scale = 1.0;
        SUBCASE("ordinary values: solved together and matched, by hand") {
            // Model Δp = 1000 and μ = 2e-3: ρV = 2e5·2e-3/0.1 = 4000, ρV² = 1000, so V = 0.25
            // and ρ = 16000.
            r.model = {std::nullopt, std::nullopt, std::nullopt, 2.0e-3, 1000.0};
            const auto plan = plumb::plan_model(r);
            INFO(all_problems(plan));
            CHECK(plan.problems.empty());
            CHECK(plan.model[0].value == near(16000.0));
            CHECK(plan.model[1].value == near(0.25));
            CHECK(plan.groups[0].matched);
            CHECK(plan.groups[1].matched);
        }
        SUBCASE("values beyond a double: no model value, nothing matched, said plainly") {
            r.model = {std::nullopt, std::nullopt, std::nullopt, 1.0e-300, 1.0e300};
            const auto plan = plumb::plan_model(r);
            INFO(all_problems(plan));
            CHECK(any_contains(plan.problems, "model V of about 5e593 m/s"));
            CHECK(any_contains(plan.problems, "model ρ of about 4e-888 kg/m^3"));
            CHECK(any_contains(plan.problems, "beyond the numbers plumb can compute with"));
            REQUIRE(plan.model.size() == 5);
            CHECK_FALSE(plan.model[0].value.has_value());
            CHECK_FALSE(plan.model[1].value.has_value());
            CHECK(contains(plan.model[1].how, "no model value"));
            for (const auto& g : plan.groups) {
                CHECK_FALSE(g.matched);
                CHECK_FALSE(g.model.has_value());
            }
        }
    }

    TEST_CASE("similitude: signs that differ between the lines give real values or a problem") {
        // The Reynolds and capillary numbers fix V and μ together (by hand, as above: V/μ and
        // V·μ). Prototype all positive: Re = 2e5 and Ca = 1e-3·2/0.072.
        similitude_request r;
        r.variables = {var("ρ", 1, -3, 0), var("V", 0, 1, -1), var("D", 0, 1, 0),
                       var("μ", 1, -1, -1), var("σ", 1, 0, -2)};
        r.analysis.groups = {
            group({1, 1, 1, -1, 0}, "ρ*V*D/μ", false, "Reynolds number"),
            group({0, 1, 0, 1, -1}, "V*μ/σ", false, "capillary number"),
        };
        require_dimensionless(r);
        r.prototype = {1000.0, 2.0, 0.1, 1.0e-3, 0.072};
        r.length_scale = 0.5;
        SUBCASE("both given values negative: V/μ and V·μ both negative, so V < 0 < μ") {
            // Magnitudes as in the test above: V = 2, μ = 5e-4. Keeping the prototype's
            // positive signs once gave values whose own groups came out negative.
            r.model = {-1000.0, std::nullopt, std::nullopt, std::nullopt, -0.036};
            const auto plan = plumb::plan_model(r);
            INFO(all_problems(plan));
            CHECK(plan.problems.empty());
            CHECK(plan.model[1].value == near(-2.0));
            CHECK(plan.model[3].value == near(5.0e-4));
            CHECK(plan.groups[0].matched);
            CHECK(plan.groups[1].matched);
            CHECK(plan.groups[0].model == near(2.0e5));
        }
        SUBCASE("one negative: V/μ < 0 and V·μ > 0 have no real solution") {
            r.model = {-1000.0, std::nullopt, std::nullopt, std::nullopt, 0.036};
            const auto plan = plumb::plan_model(r);
            INFO(all_problems(plan));
            CHECK(any_contains(plan.problems, "cannot all match with real values"));
            CHECK(any_contains(plan.problems, "V and μ"));
            CHECK_FALSE(plan.model[1].value.has_value());
            CHECK_FALSE(plan.model[3].value.has_value());
            CHECK_FALSE(plan.groups[0].matched);
            CHECK_FALSE(plan.groups[1].matched);
        }
        SUBCASE("an even power cannot take a sign: Δp/(ρV²) with a negative model Δp") {
            similitude_request e;
            e.variables = {var("Δp", 1, -1, -2), var("ρ", 1, -3, 0), var("V", 0, 1, -1)};
            e.analysis.groups = {group({1, -1, -2}, "Δp/(ρ*V^2)", false, "Euler number")};
            require_dimensionless(e);
            e.prototype = {4000.0, 1000.0, 2.0};
            e.model = {-1000.0, 1000.0, std::nullopt};
            const auto plan = plumb::plan_model(e);
            INFO(all_problems(plan));
            CHECK(any_contains(plan.problems, "the Euler number cannot match with real values"));
            CHECK(any_contains(plan.problems, "V enters it as its -2 power"));
            CHECK_FALSE(plan.model[2].value.has_value());
            CHECK_FALSE(plan.groups[0].matched);
        }
    }

    TEST_CASE("similitude: gravity must change only when it must, and only upwards") {
        // Reynolds VL/ν against Froude V²/(gL), by hand. Prototype V = 2 m/s, L = 10 m,
        // ν = 1e-6 m²/s, g = 9.81 m/s²; λ = 1/10. With the same ν the Reynolds number needs
        // V_m = 20 m/s, and then the Froude number needs g_m = V_m²/(Fr·L_m) = 9810 m/s², a
        // thousand times gravity (λ^-3): only a centrifuge raises gravity (common practice of
        // geotechnical centrifuge modelling). With ν_m = 1e-9 m²/s the speed is 0.02 m/s and
        // the gravity needed 0.00981 m/s², which nothing provides.
        similitude_request r;
        r.variables = {var("V", 0, 1, -1), var("L", 0, 1, 0), var("ν", 0, 2, -1),
                       var("g", 0, 1, -2)};
        r.analysis.groups = {
            group({1, 1, -1, 0}, "V*L/ν", false, "Reynolds number"),
            group({2, -1, 0, -1}, "V^2/(L*g)", false, "Froude number"),
        };
        require_dimensionless(r);
        r.prototype = {2.0, 10.0, 1.0e-6, 9.81};
        r.length_scale = 0.1;
        SUBCASE("higher gravity: a centrifuge") {
            r.model = {std::nullopt, std::nullopt, 1.0e-6, 9.81};
            const auto plan = plumb::plan_model(r);
            INFO(all_problems(plan));
            REQUIRE(plan.conflicts.size() == 1);
            const std::string& why = plan.conflicts[0].explanation;
            INFO(why);
            CHECK(contains(why, "an acceleration g of 9810 m/s^2 (g_model/g_prototype = λ^-3 = "
                                "1000), higher than the prototype's, which only a centrifuge "
                                "can provide"));
        }
        SUBCASE("lower gravity: no rig provides it, and no value is asked for") {
            r.model = {std::nullopt, std::nullopt, 1.0e-9, 9.81};
            const auto plan = plumb::plan_model(r);
            INFO(all_problems(plan));
            REQUIRE(plan.conflicts.size() == 1);
            const std::string& why = plan.conflicts[0].explanation;
            INFO(why);
            CHECK(contains(why, "would take a gravity lower than the prototype's, which no test "
                                "rig can provide"));
            CHECK_FALSE(contains(why, "0.00981"));
            CHECK_FALSE(contains(why, "only a centrifuge can provide"));
        }
        SUBCASE("another acceleration is the rig's to set, and gravity stays") {
            // A shaking table's peak acceleration a against g, a/g: prototype 3 m/s², table 6 m/s².
            similitude_request t;
            t.variables = {var("a", 0, 1, -2), var("g", 0, 1, -2)};
            t.analysis.groups = {group({1, -1}, "a/g")};
            require_dimensionless(t);
            t.prototype = {3.0, 9.81};
            t.model = {6.0, 9.81};
            t.length_scale = 0.1;
            const auto plan = plumb::plan_model(t);
            REQUIRE(plan.conflicts.size() == 1);
            const std::string& why = plan.conflicts[0].explanation;
            INFO(why);
            CHECK(contains(why, "an acceleration a of 3 m/s^2 (a_model/a_prototype = 1)."));
            CHECK_FALSE(contains(why, "centrifuge"));
        }
    }

    TEST_CASE("similitude: a group just off never reads as matched in its scale effect") {
        // a/g with a table acceleration 0.2 % above the prototype's, by hand: 3.006/3 = 1.002.
        // At three figures the ratio would read "1 times the prototype's".
        similitude_request t;
        t.variables = {var("a", 0, 1, -2), var("g", 0, 1, -2)};
        t.analysis.groups = {group({1, -1}, "a/g")};
        require_dimensionless(t);
        t.prototype = {3.0, 9.81};
        t.model = {3.006, 9.81};
        t.length_scale = 0.1;
        auto plan = plumb::plan_model(t);
        REQUIRE(plan.groups.size() == 1);
        CHECK_FALSE(plan.groups[0].matched);
        CHECK(plan.groups[0].scale_effect ==
              "higher in the model: its value is 0.2 % above the prototype's");
        // Within a tolerance of 0.5 % it is matched, and has no scale effect.
        t.tolerance = 0.005;
        plan = plumb::plan_model(t);
        CHECK(plan.groups[0].matched);
        CHECK(plan.groups[0].scale_effect.empty());
        // Far off, a ratio: 6/3 = 2 times, 1.5/3 = 1/2 of.
        t.tolerance = plumb::default_match_tolerance;
        t.model = {6.0, 9.81};
        CHECK(plumb::plan_model(t).groups[0].scale_effect ==
              "higher in the model: its value is 2 times the prototype's");
        t.model = {1.5, 9.81};
        CHECK(plumb::plan_model(t).groups[0].scale_effect ==
              "lower in the model: its value is 1/2 of the prototype's");
    }

    TEST_CASE("similitude: a variable no group fixes stays free") {
        // Pipe flow with only the model fluid's density given: Re = ρVD/μ holds both V and μ, so
        // neither is fixed, and the pressure-drop group then holds Δp and V.
        similitude_request r;
        r.variables = {var("Δp", 1, -1, -2), var("ρ", 1, -3, 0), var("μ", 1, -1, -1),
                       var("V", 0, 1, -1), var("D", 0, 1, 0)};
        r.analysis.groups = {
            group({0, 1, -1, 1, 1}, "ρ*V*D/μ", false, "Reynolds number"),
            group({1, -1, 0, -2, 0}, "Δp/(ρ*V^2)", true, "Euler number"),
        };
        require_dimensionless(r);
        r.prototype = {1.0e4, 1000.0, 1.0e-3, 2.0, 0.1};
        r.length_scale = 0.5;
        r.model = {std::nullopt, 1000.0, std::nullopt, std::nullopt, std::nullopt};
        const auto plan = plumb::plan_model(r);
        INFO(all_problems(plan));
        CHECK(plan.problems.empty());
        CHECK(plan.conflicts.empty());
        REQUIRE(plan.model.size() == 5);
        CHECK(plan.model[4].value == near(0.05));
        for (const std::size_t j : {0, 2, 3}) {
            INFO("variable " << j);
            CHECK_FALSE(plan.model[j].value.has_value());
            CHECK(plan.model[j].how == "free: no group fixes it");
        }
        REQUIRE(plan.groups.size() == 2);
        CHECK(plan.groups[0].prototype == near(2.0e5));
        CHECK_FALSE(plan.groups[0].model.has_value());
        CHECK_FALSE(plan.groups[0].matched);
    }

    TEST_CASE("similitude: problems in plain words") {
        SUBCASE("a missing prototype value") {
            auto r = ship();
            r.prototype[2] = std::nullopt; // μ
            const auto plan = plumb::plan_model(r);
            INFO(all_problems(plan));
            CHECK(any_contains(plan.problems, "no prototype value is given for μ"));
            CHECK(any_contains(plan.problems, "the Reynolds number cannot be evaluated"));
            REQUIRE(plan.groups.size() == 3);
            CHECK_FALSE(plan.groups[0].prototype.has_value());
            // The Froude number needs no μ, so the speed is still planned.
            CHECK(plan.model[3].value == near(2.0));
            CHECK(plan.conflicts.empty());
        }
        SUBCASE("a length scale that is not positive") {
            auto r = ship();
            r.length_scale = 0.0;
            const auto plan = plumb::plan_model(r);
            CHECK(any_contains(plan.problems, "the length scale"));
            CHECK(plan.model.empty());
        }
        SUBCASE("a negative value under a fractional power") {
            auto r = ship();
            r.prototype[5] = -9.81; // g under the Froude number's power -1/2
            const auto plan = plumb::plan_model(r);
            INFO(all_problems(plan));
            CHECK(any_contains(plan.problems, "prototype value of g is negative"));
            CHECK(any_contains(plan.problems, "-1/2 power"));
        }
        SUBCASE("a zero value") {
            auto r = ship();
            r.prototype[3] = 0.0; // V
            const auto plan = plumb::plan_model(r);
            INFO(all_problems(plan));
            CHECK(any_contains(plan.problems, "prototype value of V is zero"));
        }
        SUBCASE("values that do not fit the variables") {
            auto r = ship();
            r.prototype.pop_back();
            const auto plan = plumb::plan_model(r);
            CHECK(any_contains(plan.problems, "5 prototype values were given for 6 variables"));
            CHECK(any_contains(plan.problems, "no prototype value is given for g"));
        }
    }

    TEST_CASE("similitude: planned from the groups analyse_groups forms") {
        // The ship of the tests above, with ρ, V and L as repeating variables: whatever exponents
        // the analysis writes, the Froude-scaled speed and force and the Reynolds conflict follow.
        plumb::group_request request;
        request.variables = ship().variables;
        request.dependents = {0};
        request.repeating = {1, 3, 4};
        auto analysis = plumb::analyse_groups(request);
        REQUIRE(analysis.problems.empty());
        REQUIRE(analysis.groups.size() == 3);

        auto r = ship();
        r.analysis = analysis;
        // Chosen by what the group holds, not by its place: the group with g is the Froude one.
        r.match.clear();
        for (std::size_t g = 0; g < analysis.groups.size(); ++g)
            if (!analysis.groups[g].exponents[5].is_zero())
                r.match.push_back(g);
        REQUIRE(r.match.size() == 1);
        const auto plan = plumb::plan_model(r);
        INFO(all_problems(plan));
        CHECK(plan.problems.empty());
        CHECK(plan.model[3].value == near(2.0));
        CHECK(plan.model[0].value == near(64.0));
        CHECK(plan.conflicts.empty());
        std::size_t off = 0;
        for (const auto& g : plan.groups) {
            if (g.matched)
                continue;
            ++off;
            CHECK_FALSE(analysis.groups[g.group].exponents[2].is_zero()); // the group holding μ
            REQUIRE(g.ratio.has_value());
            // ρVL/μ or its inverse: 1/125 or 125 (λ^(3/2) with the same water).
            CHECK((*g.ratio == near(1.0 / 125.0) || *g.ratio == near(125.0)));
        }
        CHECK(off == 1);
    }

} // TEST_SUITE
