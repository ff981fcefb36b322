// Model planning, step one: fix the given values. The inputs are checked, the model's given
// values taken, lengths scaled by the length scale and gravity kept.
#include "groups/planner.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <cmath>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace plumb::planning {
namespace {

// Agreement at which a given model value counts as the prototype's own (the same fluid): far
// below any measurement, far above the rounding of a logarithm and an exponential.
constexpr double same_fluid = 1e-9;

} // namespace

std::optional<double> planner::prototype_input(std::size_t j) const {
    return j < r_.prototype.size() ? r_.prototype[j] : std::nullopt;
}

std::optional<double> planner::model_input(std::size_t j) const {
    return j < r_.model.size() ? r_.model[j] : std::nullopt;
}

// A value the groups can use: finite, non-zero (a zero makes every group that holds it zero or
// unbounded, which sets no scale), and positive wherever a group takes a fractional power.
std::optional<signed_log> planner::checked_value(std::size_t j, double v, std::string_view whose) {
    const std::string& name = r_.variables[j].name;
    const auto holders = groups_with(j);
    if (!std::isfinite(v)) {
        plan_.problems.push_back(
            fmt::format("the {} value of {} is not a finite number", whose, name));
        return std::nullopt;
    }
    if (v == 0.0) {
        if (!holders.empty())
            plan_.problems.push_back(fmt::format(
                "the {} value of {} is zero, which makes {} zero or unbounded, so it cannot set a "
                "scale",
                whose, name, labels(holders)));
        return std::nullopt;
    }
    if (v < 0.0) {
        for (const std::size_t g : holders) {
            if (!exponents(g)[j].is_integer()) {
                plan_.problems.push_back(fmt::format(
                    "the {} value of {} is negative ({}), but {} takes its {} power, which has no "
                    "real value for a negative number",
                    whose, name, number_text(v), label(g), exponents(g)[j].to_string()));
                return std::nullopt;
            }
        }
    }
    return to_signed_log(v);
}

void planner::validate_inputs() {
    const std::size_t n = r_.variables.size();
    if (!r_.analysis.problems.empty())
        plan_.problems.push_back("the dimensionless groups could not be formed: " +
                                 join(r_.analysis.problems, "; "));
    if (r_.prototype.size() != n)
        plan_.problems.push_back(fmt::format(
            "{} prototype values were given for {} variables; one per variable is needed",
            r_.prototype.size(), n));
    if (r_.model.size() > n)
        plan_.problems.push_back(
            fmt::format("{} model values were given for {} variables; the extra ones are ignored",
                        r_.model.size(), n));
    group_ok_.assign(r_.analysis.groups.size(), true);
    for (std::size_t g = 0; g < r_.analysis.groups.size(); ++g) {
        if (exponents(g).size() != n) {
            group_ok_[g] = false;
            plan_.problems.push_back(
                fmt::format("{} has {} exponents for {} variables, so it is left out", label(g),
                            exponents(g).size(), n));
        }
    }
    const double lambda = r_.length_scale;
    if (!std::isfinite(lambda) || lambda <= 0.0)
        plan_.problems.push_back(fmt::format(
            "the length scale (model length / prototype length) must be a positive number, not {}",
            number_text(lambda)));

    prototype_.assign(n, std::nullopt);
    for (std::size_t j = 0; j < n; ++j) {
        const auto v = prototype_input(j);
        if (v) {
            prototype_[j] = checked_value(j, *v, "prototype");
            continue;
        }
        const auto holders = groups_with(j);
        if (!holders.empty())
            plan_.problems.push_back(
                fmt::format("no prototype value is given for {}, so {} cannot be evaluated",
                            r_.variables[j].name, labels(holders)));
    }
    group_proto_.assign(r_.analysis.groups.size(), std::nullopt);
    for (std::size_t g = 0; g < r_.analysis.groups.size(); ++g)
        group_proto_[g] = evaluate(g, prototype_);
}

void planner::assign_known_model_values() {
    const double lambda = r_.length_scale;
    const auto log_lambda = std::log(lambda);
    model_.assign(r_.variables.size(), {});
    for (std::size_t j = 0; j < r_.variables.size(); ++j) {
        model_state& m = model_[j];
        const dimension& d = r_.variables[j].dim;
        if (const auto v = model_input(j)) {
            m.from = origin::given;
            m.value = checked_value(j, *v, "model");
            // The same fluid in model and prototype is the common case; saying so as λ^0 lets
            // the conflict explanations give their ratios as powers of λ.
            if (m.value && prototype_[j] && m.value->sign == prototype_[j]->sign &&
                std::fabs(std::expm1(m.value->log - prototype_[j]->log)) <= same_fluid)
                m.power = rational(0);
        } else if (is_length(d)) {
            m.from = origin::scaled;
            if (prototype_[j])
                m.value = signed_log{prototype_[j]->sign, prototype_[j]->log + log_lambda};
            m.power = rational(1);
        } else if (is_acceleration(d)) {
            // Gravity cannot be scaled outside a centrifuge, so an acceleration nobody gave
            // keeps its prototype value; common practice for hydraulic and ship models.
            m.from = origin::gravity;
            m.value = prototype_[j];
            m.power = rational(0);
        }
    }
}

} // namespace plumb::planning
