// The groups corpus: every `study` line in corpus/groups carries the published dimensionless
// groups of its problem in a trailing `# expect-groups: π1; π2; ...` comment, worked out by
// hand from the source the file names. plumb must form exactly those groups, in that order;
// every group must be dimensionless, and there must be (variables - rank) of them. The model
// studies must follow the published Froude scale ratios.
#include "plumb/check.hpp"
#include "plumb/render.hpp"

#include <doctest/doctest.h>

#include <algorithm>
#include <cmath>
#include <cstdint>
#include <filesystem>
#include <fstream>
#include <map>
#include <optional>
#include <sstream>
#include <string>
#include <utility>
#include <vector>

namespace fs = std::filesystem;

namespace {

const fs::path groups_dir = fs::path(PLUMB_SOURCE_DIR) / "corpus" / "groups";

std::string trim(const std::string& s) {
    const auto b = s.find_first_not_of(" \t\r");
    const auto e = s.find_last_not_of(" \t\r");
    return b == std::string::npos ? std::string() : s.substr(b, e - b + 1);
}

struct expected_study {
    std::string name;
    std::vector<std::string> groups;
};

// "file-name:line" of a study line.
using study_key = std::pair<std::string, std::uint32_t>;

// Every `study` line of the folder with its `# expect-groups:` list (empty when it has none).
std::map<study_key, expected_study> expected_studies() {
    std::map<study_key, expected_study> out;
    for (const auto& entry : fs::directory_iterator(groups_dir)) {
        if (!entry.is_regular_file() || entry.path().extension() != ".plumb")
            continue;
        std::ifstream in(entry.path());
        std::string line;
        for (std::uint32_t n = 1; std::getline(in, line); ++n) {
            if (line.rfind("study ", 0) != 0)
                continue;
            const auto colon = line.find(':');
            REQUIRE(colon != std::string::npos);
            expected_study study{trim(line.substr(6, colon - 6)), {}};
            const std::string marker = "# expect-groups:";
            if (const auto at = line.find(marker); at != std::string::npos) {
                std::stringstream list(line.substr(at + marker.size()));
                std::string formula;
                while (std::getline(list, formula, ';'))
                    study.groups.push_back(trim(formula));
            }
            out.emplace(study_key{entry.path().filename().string(), n}, std::move(study));
        }
    }
    return out;
}

study_key key_of(const plumb::study_report& study) {
    REQUIRE(study.where.file != nullptr);
    const auto line = study.where.file->position(study.where.range.begin).line;
    return {fs::path(study.where.file->path()).filename().string(), line};
}

std::string joined(const std::vector<std::string>& formulas) {
    std::string text;
    for (const auto& f : formulas)
        text += (text.empty() ? "" : "; ") + f;
    return text;
}

const plumb::check_report& corpus_report() {
    static const plumb::check_report report = plumb::check_paths({groups_dir});
    return report;
}

const plumb::study_report& find_study(const std::string& name) {
    const auto& studies = corpus_report().studies;
    const auto it = std::find_if(studies.begin(), studies.end(),
                                 [&](const plumb::study_report& s) { return s.name == name; });
    REQUIRE_MESSAGE(it != studies.end(), "no study called " << name);
    return *it;
}

std::size_t variable_index(const plumb::study_report& study, const std::string& name) {
    for (std::size_t i = 0; i < study.variables.size(); ++i)
        if (study.variables[i].name == name)
            return i;
    FAIL("study " << study.name << " has no variable " << name);
    return 0;
}

// Model value over prototype value of one variable, both in SI units.
double model_ratio(const plumb::study_report& study, const std::string& name) {
    const std::size_t i = variable_index(study, name);
    REQUIRE(study.plan.has_value());
    REQUIRE(i < study.plan->model.size());
    REQUIRE(study.plan->model[i].variable == i);
    REQUIRE(study.plan->model[i].value.has_value());
    REQUIRE(study.prototype.at(i).has_value());
    return *study.plan->model[i].value / *study.prototype[i];
}

bool within(double actual, double expected, double relative) {
    return std::abs(actual - expected) <= relative * std::abs(expected);
}

// A group's value from SI values of its variables; nothing when one is missing.
std::optional<double> group_value(const std::vector<plumb::rational>& exponents,
                                  const std::vector<std::optional<double>>& values) {
    double product = 1.0;
    for (std::size_t j = 0; j < exponents.size(); ++j) {
        if (exponents[j].is_zero())
            continue;
        if (j >= values.size() || !values[j])
            return std::nullopt;
        product *= std::pow(*values[j], exponents[j].to_double());
    }
    return product;
}

} // namespace

TEST_SUITE("groups corpus") {

    TEST_CASE("groups corpus: every file checks clean") {
        REQUIRE(fs::is_directory(groups_dir));
        const auto& report = corpus_report();
        for (const auto& d : report.diagnostics)
            FAIL_CHECK(d.rule << ": " << d.message);
        CHECK_FALSE(report.input_failed);
        CHECK(report.files_checked >= 14);
    }

    TEST_CASE("groups corpus: each study forms the published groups recorded on its line") {
        const auto expected = expected_studies();
        const auto& report = corpus_report();
        REQUIRE(expected.size() >= 16);
        CHECK(report.studies.size() == expected.size());

        std::map<study_key, const plumb::study_report*> by_key;
        for (const auto& study : report.studies)
            by_key.emplace(key_of(study), &study);

        for (const auto& entry : expected) {
            const study_key& where = entry.first;
            const expected_study& want = entry.second;
            INFO(where.first << ":" << where.second << " study " << want.name);
            CHECK_FALSE(want.groups.empty()); // every study records what it must give
            const auto it = by_key.find(where);
            REQUIRE(it != by_key.end());
            const plumb::study_report& study = *it->second;
            CHECK(study.name == want.name);
            INFO("problems: " << joined(study.analysis.problems));
            CHECK(study.analysis.problems.empty());
            std::vector<std::string> got;
            for (const auto& g : study.analysis.groups)
                got.push_back(g.formula);
            CHECK(joined(got) == joined(want.groups));
        }
    }

    TEST_CASE("groups corpus: every group is dimensionless and there are variables - rank") {
        const auto& report = corpus_report();
        REQUIRE_FALSE(report.studies.empty());
        for (const auto& study : report.studies) {
            INFO("study " << study.name);
            const auto& a = study.analysis;
            REQUIRE(a.rank <= study.variables.size());
            CHECK(a.groups.size() == study.variables.size() - a.rank);
            for (const auto& g : a.groups) {
                INFO("group " << g.formula);
                REQUIRE(g.exponents.size() == study.variables.size());
                plumb::dimension product;
                bool any = false;
                for (std::size_t i = 0; i < g.exponents.size(); ++i) {
                    product = product * study.variables[i].dim.pow(g.exponents[i]);
                    any = any || !g.exponents[i].is_zero();
                }
                CHECK(product.is_dimensionless());
                CHECK(any);
            }
        }
    }

    TEST_CASE("groups corpus: reduced rank where two base dimensions only occur together") {
        // Çengel & Cimbala, ch. 7, Example 7-7 (from memory): M and T occur only as M T^-2, so
        // three base dimensions give rank 2 and the three variables one group. The cantilever
        // (Gere & Goodno, App. H, from memory) has the same pairing: five variables, three groups.
        for (const auto* name : {"soap-bubble", "cantilever"}) {
            INFO(name);
            const auto& study = find_study(name);
            CHECK(study.analysis.matrix.rows.size() == 3);
            CHECK(study.analysis.rank == 2);
        }
    }

    TEST_CASE("groups corpus: the pendulum's mass drops out of every group") {
        // Çengel & Cimbala, ch. 7 (from memory): T√(g/L) = f(θ_0), whatever the mass of the bob.
        const auto& study = find_study("pendulum");
        const std::size_t m = variable_index(study, "m");
        REQUIRE_FALSE(study.analysis.groups.empty());
        for (const auto& g : study.analysis.groups)
            CHECK(g.exponents.at(m).is_zero());
    }

    TEST_CASE("groups corpus: the spillway model follows the Froude scale ratios") {
        // H. Chanson, The Hydraulics of Open Channel Flow, 2nd ed., 2004, ch. 14 (from memory):
        // under Froude similitude with the same fluid and gravity, velocity scales as λ^(1/2)
        // and discharge as λ^(5/2), λ = L_model/L_prototype (here 1:50).
        const auto& study = find_study("spillway");
        REQUIRE(study.length_scale.has_value());
        const double lambda = *study.length_scale;
        CHECK(within(lambda, 1.0 / 50.0, 1e-12));
        REQUIRE(study.plan.has_value());
        INFO("problems: " << joined(study.plan->problems));
        CHECK(study.plan->problems.empty());
        CHECK(within(model_ratio(study, "V_t"), std::pow(lambda, 0.5), 1e-9));
        CHECK(within(model_ratio(study, "Q"), std::pow(lambda, 2.5), 1e-9));
        CHECK(within(model_ratio(study, "b"), lambda, 1e-9));
        // The same water cannot also keep the viscous group: one conflict. Every variable of
        // that group is given, so matching it instead is no choice, and none is offered.
        CHECK(study.plan->conflicts.size() == 1);
        CHECK(study.plan->alternatives.empty());
        REQUIRE_FALSE(study.plan->conflicts.empty());
        // Its numbers read as the plan table prints them, four figures: 5.003e12 and 6.253e17.
        CHECK(study.plan->conflicts[0].explanation.find("5.003e12 in the model against 6.253e17") !=
              std::string::npos);
    }

    TEST_CASE("groups corpus: the ship model follows the Froude scale ratios") {
        // F. M. White, Fluid Mechanics, 7th ed., Sec. 5.5, and Chanson, 2nd ed., ch. 14 (both
        // from memory): velocity λ^(1/2); force ρ_r λ^3, λ^3 in the same fluid. Here the hull is
        // towed in fresh water against a prototype in sea water, at 1:30, matching Froude.
        const auto& study = find_study("ship-resistance");
        REQUIRE(study.length_scale.has_value());
        const double lambda = *study.length_scale;
        CHECK(within(lambda, 1.0 / 30.0, 1e-12));
        REQUIRE(study.plan.has_value());
        INFO("problems: " << joined(study.plan->problems));
        CHECK(study.plan->problems.empty());
        const double density_ratio = model_ratio(study, "ρ");
        CHECK(within(density_ratio, 998.0 / 1025.0, 1e-12));
        CHECK(within(model_ratio(study, "V"), std::pow(lambda, 0.5), 1e-9));
        CHECK(within(model_ratio(study, "F"), density_ratio * std::pow(lambda, 3.0), 1e-9));
        // The Reynolds number is the accepted scale effect, lower in the model: ν_p/ν_m·λ^(3/2).
        CHECK(study.plan->conflicts.empty());
        bool reynolds_off = false;
        for (const auto& g : study.plan->groups) {
            if (g.matched)
                continue;
            reynolds_off = true;
            REQUIRE(g.ratio.has_value());
            const double nu_ratio = (1.0e-3 / 998.0) / (1.08e-3 / 1025.0);
            CHECK(within(*g.ratio, std::pow(lambda, 1.5) / nu_ratio, 1e-9));
            CHECK(g.scale_effect.find("viscous forces count for more") != std::string::npos);
        }
        CHECK(reynolds_off);
    }

    TEST_CASE("groups corpus: every study with prototype values has a usable plan") {
        // Each group is matched or reported off with its ratio; each variable has a model value
        // or waits for a choice the plan lists.
        std::size_t plans = 0;
        for (const auto& study : corpus_report().studies) {
            if (study.prototype.empty())
                continue;
            ++plans;
            INFO(study.name);
            REQUIRE(study.plan.has_value());
            CHECK(study.plan->problems.empty());
            for (const auto& g : study.plan->groups)
                CHECK((g.matched || g.ratio.has_value()));
            for (const auto& v : study.plan->model)
                CHECK((v.value.has_value() || !study.plan->alternatives.empty()));
        }
        // One plan for every prototype line in the folder, so no study's plan goes missing.
        std::size_t prototype_lines = 0;
        for (const auto& entry : fs::directory_iterator(groups_dir)) {
            if (entry.path().extension() != ".plumb")
                continue;
            std::ifstream in(entry.path());
            std::string line;
            while (std::getline(in, line))
                prototype_lines += line.rfind("prototype ", 0) == 0 ? 1 : 0;
        }
        CHECK(prototype_lines >= 12);
        CHECK(plans == prototype_lines);
    }

    TEST_CASE("groups corpus: every plan's values satisfy the groups it calls matched") {
        // The plan's own arithmetic, redone here from its SI values: a group reported matched
        // must hold, within the study's tolerance, when evaluated from the model values the
        // plan prints; the group values it prints must be those of its variables; no value is
        // 0, infinite or NaN; a chosen group is matched; and each alternative, applied to the
        // shared values, matches the group it offers to match.
        std::size_t groups_checked = 0;
        for (const auto& study : corpus_report().studies) {
            if (!study.plan)
                continue;
            INFO(study.name);
            const auto& plan = *study.plan;
            std::vector<std::optional<double>> model(study.variables.size());
            for (const auto& v : plan.model) {
                REQUIRE(v.variable < model.size());
                if (v.value) {
                    CHECK(std::isnormal(*v.value));
                    model[v.variable] = v.value;
                }
            }
            for (const auto& gv : plan.groups) {
                INFO("group " << study.analysis.groups.at(gv.group).formula);
                const auto& exponents = study.analysis.groups.at(gv.group).exponents;
                const auto from_model = group_value(exponents, model);
                const auto from_prototype = group_value(exponents, study.prototype);
                if (gv.model) {
                    REQUIRE(from_model.has_value());
                    CHECK(within(*gv.model, *from_model, 1e-9));
                }
                if (gv.prototype) {
                    REQUIRE(from_prototype.has_value());
                    CHECK(within(*gv.prototype, *from_prototype, 1e-9));
                }
                if (gv.matched) {
                    ++groups_checked;
                    REQUIRE(from_model.has_value());
                    REQUIRE(from_prototype.has_value());
                    CHECK(std::isnormal(*from_model));
                    CHECK(within(*from_model, *from_prototype, study.tolerance));
                }
                if (std::find(study.match.begin(), study.match.end(), gv.group) !=
                    study.match.end())
                    CHECK(gv.matched);
            }
            for (const auto& alternative : plan.alternatives) {
                auto chosen = model;
                for (const auto& v : alternative.fixed)
                    chosen.at(v.variable) = v.value;
                const auto& exponents = study.analysis.groups.at(alternative.group).exponents;
                const auto from_model = group_value(exponents, chosen);
                const auto from_prototype = group_value(exponents, study.prototype);
                REQUIRE(from_model.has_value());
                REQUIRE(from_prototype.has_value());
                CHECK(within(*from_model, *from_prototype, study.tolerance));
            }
        }
        CHECK(groups_checked >= 20);
    }

    TEST_CASE("groups corpus: the pump model follows the affinity laws") {
        // Karassik et al., Pump Handbook, 4th ed., sec. 2.1 (from memory): at equal flow
        // coefficient Q ∝ nD³, gH ∝ n²D², P ∝ ρn³D⁵. Here n doubles (1450 to 2900 rpm) and
        // D is quartered (1:4): Q by 2/64, gH by 4/16, P by 8/1024.
        const auto& study = find_study("pump");
        REQUIRE(study.plan.has_value());
        CHECK(within(model_ratio(study, "Q"), 2.0 / 64.0, 1e-9));
        CHECK(within(model_ratio(study, "gH"), 4.0 / 16.0, 1e-9));
        CHECK(within(model_ratio(study, "P"), 8.0 / 1024.0, 1e-9));
        CHECK(study.analysis.groups.size() == 4);
        CHECK(study.analysis.groups[1].name == "power number");
    }

    TEST_CASE("groups corpus: the propeller model keeps the advance ratio, K_T and K_Q") {
        // Carlton, Marine Propellers and Propulsion, 2nd ed., ch. 6 (from memory): at equal J,
        // V_m = V_p·(n_m D_m)/(n_p D_p) and K_T, K_Q equal, so T scales by ρ_r n_r² λ⁴ and Q by
        // ρ_r n_r² λ⁵. Here n_r = 600/120 = 5, λ = 1/12, ρ_r = 998/1025.
        const auto& study = find_study("propeller");
        REQUIRE(study.plan.has_value());
        const double rho_r = 998.0 / 1025.0;
        CHECK(within(model_ratio(study, "V"), 5.0 / 12.0, 1e-9));
        CHECK(within(model_ratio(study, "T"), rho_r * 25.0 * std::pow(1.0 / 12.0, 4.0), 1e-9));
        CHECK(within(model_ratio(study, "Q"), rho_r * 25.0 * std::pow(1.0 / 12.0, 5.0), 1e-9));
        CHECK(study.analysis.groups[2].name.rfind("advance ratio", 0) == 0);
        CHECK(study.analysis.groups[0].name == "thrust coefficient");
        CHECK(study.analysis.groups[1].name == "torque coefficient");
    }

    TEST_CASE("groups corpus: the heat-transfer rig keeps the Grashof number") {
        // Incropera et al., 6th ed., Eq. 9.12 (from memory): Gr = gβΔT L³/ν². Equal Gr at
        // λ = 1/2: ΔT_m = ΔT_p·(gβ_p/gβ_m)·(ν_m/ν_p)²·8.
        const auto& study = find_study("natural-convection");
        REQUIRE(study.plan.has_value());
        const double expected = (0.0327 / 2.707e-3) * std::pow(8.6e-7 / 1.59e-5, 2.0) * 8.0;
        CHECK(within(model_ratio(study, "ΔT"), expected, 1e-9));
    }
}

namespace {

// The value in the unit the user declared or gave, as the book prints it: rounded to `figures`
// significant figures, it must read the printed number.
bool as_printed(double value, double printed, int figures) {
    if (value == 0.0 || printed == 0.0)
        return value == printed;
    const double scale =
        std::pow(10.0, figures - 1 - static_cast<int>(std::floor(std::log10(std::abs(value)))));
    return std::abs(std::round(value * scale) / scale - printed) <= 1e-9 * std::abs(printed);
}

// A model value in its display unit (the declared or given one).
double model_in_unit(const plumb::study_report& study, const std::string& name) {
    const std::size_t i = variable_index(study, name);
    REQUIRE(study.plan.has_value());
    REQUIRE(study.plan->model.at(i).value.has_value());
    const auto& u = study.units.at(i);
    return (*study.plan->model[i].value - u.offset) / u.factor;
}

} // namespace

TEST_SUITE("groups corpus: worked examples") {
    TEST_CASE("worked example: Munson's 1:15 spillway model, width, discharge and time") {
        // Munson, Young & Okiishi, Fundamentals of Fluid Mechanics, ch. 7, spillway example
        // (from memory): 20 m wide, 125 m^3/s, 1:15 model; printed w_m = 1.33 m,
        // Q_m = 0.143 m^3/s, and 6.20 hr of model time for 24 hr of prototype time.
        const auto& study = find_study("spillway-munson");
        REQUIRE(study.plan.has_value());
        INFO("problems: " << joined(study.plan->problems));
        CHECK(study.plan->problems.empty());
        CHECK(study.plan->conflicts.empty());
        CHECK(as_printed(model_in_unit(study, "w"), 1.33, 3));
        CHECK(as_printed(model_in_unit(study, "Q"), 0.143, 3));
        CHECK(as_printed(model_in_unit(study, "t"), 6.20, 3));
        CHECK(study.units.at(variable_index(study, "t")).text == "h");
    }

    TEST_CASE("worked example: Reynolds-scaled water model of an air duct") {
        // White, Fluid Mechanics, 7th ed., Sec. 5.5 (from memory): V_m/V_p = (ν_m/ν_p)(L_p/L_m).
        // Air 1.205 kg/m^3, 1.80e-5 Pa*s; water 998 kg/m^3, 1.0e-3 Pa*s (White, Tables A.1 and
        // A.2, from memory); 12 m/s in a 0.6 m duct at 1:4: V_m = 3.22 m/s to three figures.
        const auto& study = find_study("duct");
        REQUIRE(study.plan.has_value());
        CHECK(study.plan->problems.empty());
        CHECK(as_printed(model_in_unit(study, "V"), 3.22, 3));
        CHECK(as_printed(model_in_unit(study, "D"), 0.15, 3));
        // Equal pressure coefficient: Δp_m = Δp_p (ρ_m/ρ_p)(V_m/V_p)^2.
        const double v_ratio = (1.0e-3 / 998.0) / (1.80e-5 / 1.205) * 4.0;
        CHECK(within(model_ratio(study, "Δp"), 998.0 / 1.205 * v_ratio * v_ratio, 1e-9));
        for (const auto& g : study.plan->groups)
            CHECK(g.matched);
    }

    TEST_CASE("worked example: the fan laws, 10 % more speed") {
        // Jorgensen, Fan Engineering, 9th ed., fan laws (from memory); the rule of thumb (common
        // practice): +10 % speed gives +10 % flow, +21 % pressure, +33.1 % power.
        const auto& study = find_study("fan");
        REQUIRE(study.plan.has_value());
        CHECK(study.plan->problems.empty());
        CHECK(as_printed(model_ratio(study, "Q"), 1.10, 3));
        CHECK(as_printed(model_ratio(study, "Δp"), 1.21, 3));
        CHECK(as_printed(model_ratio(study, "P"), 1.331, 4));
        CHECK(as_printed(model_in_unit(study, "P"), 8.6515, 5));
        CHECK(as_printed(model_in_unit(study, "n"), 1100, 4));
    }

    TEST_CASE("worked example: Bansal's 1:50 ship model towed at Froude similarity") {
        // R. K. Bansal, A Textbook of Fluid Mechanics and Hydraulic Machines, 9th ed., ch. 12,
        // the 1:50 ship model problem (from memory): model 1 m/s and 2 N; printed ship values
        // 7.071 m/s and 250000 N, which the prototype line carries. Back to the model: the
        // book's data, V = 1 m/s at four figures and F = 2 N (force ratio λ³ in the same water).
        const auto& study = find_study("ship-towing");
        REQUIRE(study.plan.has_value());
        INFO("problems: " << joined(study.plan->problems));
        CHECK(study.plan->problems.empty());
        CHECK(study.plan->conflicts.empty());
        CHECK(as_printed(model_in_unit(study, "V"), 1.000, 4));
        CHECK(as_printed(model_in_unit(study, "F"), 2.000, 4));
        CHECK(within(model_ratio(study, "F"), 1.0 / 125000.0, 1e-12));
        CHECK(within(model_ratio(study, "V"), 1.0 / std::sqrt(50.0), 1e-12));
        for (const auto& g : study.plan->groups)
            CHECK(g.matched);
    }

    TEST_CASE("worked example: Bansal's water and oil pipes at equal Reynolds numbers") {
        // Bansal, 9th ed., ch. 12, Reynolds' model law (from memory): water at 4 m/s in a 30 cm
        // pipe, μ = 0.01 poise; oil of specific gravity 0.8, μ = 0.025 poise, in a 10 cm pipe;
        // printed answer 37.5 m/s. The oil pipe's pressure gradient at the equal pressure
        // group: Δp_L times (ρ_o/ρ_w)(V_o/V_w)²(D_w/D_o) = 0.8 × 9.375² × 3 = 210.9375.
        const auto& study = find_study("pipe-oil");
        REQUIRE(study.plan.has_value());
        INFO("problems: " << joined(study.plan->problems));
        CHECK(study.plan->problems.empty());
        REQUIRE(study.length_scale.has_value());
        CHECK(within(*study.length_scale, 1.0 / 3.0, 1e-12));
        CHECK(as_printed(model_in_unit(study, "V"), 37.5, 3));
        CHECK(within(model_ratio(study, "Δp_L"), 0.8 * 9.375 * 9.375 * 3.0, 1e-9));
        CHECK(study.units.at(variable_index(study, "μ")).text == "P");
        for (const auto& g : study.plan->groups)
            CHECK(g.matched);
    }

    TEST_CASE("worked example: Çengel and Cimbala's one-fifth scale car in a cold tunnel") {
        // Çengel & Cimbala, Fluid Mechanics, 1st ed., Examples 7-5 and 7-6 (from memory): the
        // tunnel speed 221 mi/h as printed, and the model drag 21.2 lbf the prototype's
        // 25.25 lbf was recomputed from. By hand, F_m/F_p = (ρ_m/ρ_p)(V_m/V_p)²(1/5)².
        const auto& study = find_study("car");
        REQUIRE(study.plan.has_value());
        INFO("problems: " << joined(study.plan->problems));
        CHECK(study.plan->problems.empty());
        CHECK(as_printed(model_in_unit(study, "V"), 221, 3));
        CHECK(as_printed(model_in_unit(study, "F"), 21.2, 3));
        const double v_ratio = (1.754 / 1.849) * (1.184 / 1.269) * 5.0;
        CHECK(within(model_ratio(study, "F"), (1.269 / 1.184) * v_ratio * v_ratio / 25.0, 1e-9));
        CHECK(study.units.at(variable_index(study, "V")).text == "mi/h");
        for (const auto& g : study.plan->groups)
            CHECK(g.matched);
    }

    TEST_CASE("worked example: Mott's pump at 1250 rpm by the affinity laws") {
        // R. L. Mott, Applied Fluid Mechanics, 6th ed., ch. 13 (from memory): 1500 gal/min,
        // 130 ft and 50 hp at 1750 rpm; at 1250 rpm the book prints 1071 gal/min, 66.3 ft and
        // 18.2 hp.
        const auto& study = find_study("pump-speed");
        REQUIRE(study.plan.has_value());
        INFO("problems: " << joined(study.plan->problems));
        CHECK(study.plan->problems.empty());
        CHECK(study.plan->conflicts.empty());
        CHECK(as_printed(model_in_unit(study, "Q"), 1071, 4));
        CHECK(as_printed(model_in_unit(study, "gH"), 66.3, 3));
        CHECK(as_printed(model_in_unit(study, "P"), 18.2, 3));
        CHECK(study.units.at(variable_index(study, "P")).text == "hp");
        for (const auto& g : study.plan->groups)
            CHECK(g.matched);
    }

    TEST_CASE("groups corpus: the text report is written for a test-rig engineer") {
        const std::string text = plumb::render_groups_text(corpus_report());
        // Exponents written short, as everywhere in plumb: "6.253e17", never "6.253e+17".
        CHECK(text.find("e+") == std::string::npos);
        CHECK(text.find("e-0") == std::string::npos);
        CHECK(text.find("prototype   6.253e17  model   5.003e12  off") != std::string::npos);
        // A choice that fixes nothing and leaves its own group off is never offered.
        CHECK(text.find("fixes nothing further") == std::string::npos);
        // Munson's model time in hours, the unit of the prototype line.
        CHECK(text.find("t = 6.197 h   (prototype 24 h;") != std::string::npos);
    }

    TEST_CASE("worked example: JSON gives each plan value in its display unit beside SI") {
        const std::string json = plumb::render_groups_json(corpus_report());
        // 1100 rpm is 18.33... 1/s in SI; in its given unit it prints whole, without float noise.
        CHECK(json.find("{\"name\": \"n\", \"model\": 18.33333333, \"prototype\": 16.66666667, "
                        "\"si_unit\": \"s^-1\", \"unit\": \"rpm\", \"model_in_unit\": 1100, "
                        "\"prototype_in_unit\": 1000,") != std::string::npos);
        // 24 h of prototype time, 6.197 h of model time (Munson's 6.20 hr).
        CHECK(json.find("\"unit\": \"h\", \"model_in_unit\": 6.196773354, \"prototype_in_unit\": "
                        "24,") != std::string::npos);
    }
}
