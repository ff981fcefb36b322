// Model planning, step three: judge each group. A group agrees within the tolerance, or its
// model value is off from the prototype's by a ratio whose direction says what the scale effect
// is.
#include "groups/planner.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <cmath>
#include <optional>
#include <string>
#include <string_view>
#include <utility>
#include <vector>

namespace plumb::planning {

std::optional<signed_log>
planner::evaluate(std::size_t g, const std::vector<std::optional<signed_log>>& values) const {
    if (!group_ok_[g])
        return std::nullopt;
    signed_log out;
    const auto& a = exponents(g);
    for (std::size_t j = 0; j < a.size(); ++j) {
        if (a[j].is_zero())
            continue;
        if (!values[j])
            return std::nullopt;
        out.log += a[j].to_double() * values[j]->log;
        // Negative values only reach here with whole exponents (checked_value).
        if (values[j]->sign < 0 && a[j].num() % 2 != 0)
            out.sign = -out.sign;
    }
    return out;
}

std::vector<std::optional<signed_log>> planner::model_values() const {
    std::vector<std::optional<signed_log>> out;
    out.reserve(model_.size());
    for (const auto& m : model_)
        out.push_back(m.value);
    return out;
}

bool planner::agree(const signed_log& a, const signed_log& b) const {
    return a.sign == b.sign && std::fabs(std::expm1(a.log - b.log)) <= r_.tolerance;
}

void planner::check(std::size_t g) {
    resolved_[g] = true;
    const auto model = evaluate(g, model_values());
    if (!model || agree(*model, *group_proto_[g]))
        return;
    // A group the user did not choose may be off: that is the scale effect the choice accepts,
    // reported with the group's values, not as a conflict.
    if (choice_.chosen_by_user && !chosen(g))
        return;
    std::vector<std::size_t> fixers;
    const auto& a = exponents(g);
    for (std::size_t j = 0; j < a.size(); ++j)
        if (!a[j].is_zero())
            for (const std::size_t f : model_[j].fixed_by)
                if (std::find(fixers.begin(), fixers.end(), f) == fixers.end())
                    fixers.push_back(f);
    std::sort(fixers.begin(), fixers.end());
    unmatched_groups conflict;
    conflict.groups = fixers;
    conflict.groups.push_back(g);
    conflict.explanation = explain_conflict(g, fixers, *model);
    plan_.conflicts.push_back(std::move(conflict));
}

group_values planner::judge(std::size_t g) const {
    group_values gv;
    gv.group = g;
    const auto model = evaluate(g, model_values());
    const bool prototype_shown = group_proto_[g] && representable(*group_proto_[g]);
    const bool model_shown = model && representable(*model);
    if (prototype_shown)
        gv.prototype = group_proto_[g]->value();
    if (model_shown)
        gv.model = model->value();
    // A value of 0, infinity or NaN never matches, however well the logarithms agree.
    gv.matched = prototype_shown && model_shown && agree(*model, *group_proto_[g]);
    if (!gv.matched && prototype_shown && model_shown && model->sign == group_proto_[g]->sign) {
        gv.ratio = std::exp(model->log - group_proto_[g]->log);
        gv.scale_effect = scale_effect(g, *gv.ratio);
    }
    return gv;
}

// A group whose value is beyond a double in the model or the prototype is neither matched nor
// off by a ratio anyone could read: say so instead of printing 0 or infinity.
void planner::report_unrepresentable_groups() {
    const auto model = model_values();
    for (std::size_t g = 0; g < r_.analysis.groups.size(); ++g) {
        for (const auto& [which, value] :
             {std::pair{"prototype", group_proto_[g]}, std::pair{"model", evaluate(g, model)}}) {
            if (!value || representable(*value))
                continue;
            plan_.problems.push_back(fmt::format(
                "{} is about {} in the {}, beyond the numbers plumb can compute with, so it is "
                "not counted as matched",
                label(g), log_number_text(value->sign, value->log), which));
        }
    }
}

namespace {

// How far off, in words that never read as matched: near 1 a ratio at three figures would say
// "1 times", so the difference is given in per cent to two figures ("0.15 % above");
// further off, a ratio ("6.49 times", "1/6.49 of"), exponents written short as in the table.
std::string ratio_words(double shown) {
    constexpr double near_one = 0.1;
    if (std::fabs(shown - 1.0) < near_one)
        return fmt::format("{} % {}", number_text(std::fabs(shown - 1.0) * 100.0, 2),
                           shown < 1.0 ? "below" : "above");
    return shown < 1.0 ? "1/" + number_text(1.0 / shown) + " of" : number_text(shown) + " times";
}

} // namespace

// Which way a group that is off goes, and for the numbers whose meaning is a ratio of forces,
// what then counts for more in the model than at full size (the usual reading of each number,
// e.g. White, Fluid Mechanics, ch. 5, on ship and hydraulic models; from memory).
std::string planner::scale_effect(std::size_t g, double ratio) const {
    struct meaning {
        std::string_view number;
        std::string_view what; // what the number's denominator stands for, with its verb
        bool more_when_lower;  // a lower number gives it more weight
    };
    static constexpr meaning meanings[] = {
        {"Reynolds number", "viscous forces count", true},
        {"Froude number", "gravity counts", true},
        {"Weber number", "surface tension counts", true},
        {"Mach number", "compressibility counts", false},
        {"Cauchy number", "compressibility counts", false},
        {"Grashof number", "buoyancy against viscosity counts", false},
        {"Rayleigh number", "buoyancy against viscosity and diffusion counts", false},
        {"Galilei number", "gravity against viscosity counts", false},
    };
    const auto matches = recognise_group(r_.variables, exponents(g));
    std::optional<double> number_ratio;
    std::string_view number;
    if (!matches.empty()) {
        number = matches.front().name;
        number_ratio = std::pow(ratio, 1.0 / matches.front().power.to_double());
    }
    const double shown = number_ratio.value_or(ratio);
    const bool lower = shown < 1.0;
    std::string out = fmt::format(
        "{} in the model: {} {} the prototype's", lower ? "lower" : "higher",
        number.empty() ? std::string("its value is") : "the " + std::string(number) + " is",
        ratio_words(shown));
    for (const meaning& m : meanings) {
        if (m.number != number)
            continue;
        const bool more = lower == m.more_when_lower;
        out += fmt::format(", so {} for {} in the model than at full size", m.what,
                           more ? "more" : "less");
    }
    return out;
}

} // namespace plumb::planning
