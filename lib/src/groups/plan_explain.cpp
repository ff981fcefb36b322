// Model planning, step four: explain what cannot match: which groups fixed what, and the model
// fluid (or gravity) that would reconcile a group that is off.
#include "groups/planner.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <cctype>
#include <cmath>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace plumb::planning {

// Values in an explanation are read beside the plan table, which prints four figures.
constexpr int table_figures = 4;

// The value that variable j alone would need for group g to match, every other variable at its
// model value; nothing for gravity lower than the prototype's, which no test rig can provide.
std::optional<std::string> planner::requirement(std::size_t g, std::size_t j) const {
    const auto& a = exponents(g);
    const group_variable& v = r_.variables[j];
    double rest = 0.0;
    std::optional<rational> power_rest = rational(0);
    for (std::size_t k = 0; k < a.size(); ++k) {
        if (k == j || a[k].is_zero())
            continue;
        rest += a[k].to_double() * model_[k].value->log;
        power_rest = add_power(power_rest, a[k], model_[k].power);
    }
    const double log = (group_proto_[g]->log - rest) / a[j].to_double();
    const double value = model_[j].value->sign * std::exp(log);
    if (!std::isnormal(value))
        return std::nullopt; // beyond a double: no fluid to name
    std::optional<rational> power;
    if (power_rest) {
        try {
            power = -(*power_rest / a[j]);
        } catch (const arithmetic_overflow&) {
        }
    }
    const auto ratio_text = [](std::string_view symbol, std::optional<rational> p, double ratio) {
        std::string out = fmt::format("{0}_model/{0}_prototype = ", symbol);
        if (p && !p->is_zero()) // "λ^0 = 1" says nothing the 1 does not
            out += power_text(*p) + " = ";
        return out + number_text(ratio, table_figures);
    };
    const double prototype_log = prototype_[j]->log;
    // A centrifuge raises gravity; nothing in a laboratory lowers it.
    if (is_gravity(v) && log < prototype_log)
        return std::nullopt;
    std::string out =
        fmt::format("{} {} {} of {} ({})", article(quantity_text(v.dim)), quantity_text(v.dim),
                    v.name, value_text(value, v.dim, unit_of(j), table_figures),
                    ratio_text(v.name, power, std::exp(log - prototype_log)));

    if (is_dynamic_viscosity(v.dim)) {
        // The fluid is chosen by its kinematic viscosity, so give the μ/ρ the required μ
        // implies at the model's density (a density in this group first).
        std::optional<std::size_t> rho;
        for (std::size_t k = 0; k < r_.variables.size(); ++k) {
            if (k == j || !is_density(r_.variables[k].dim) || !model_[k].value || !prototype_[k])
                continue;
            if (!rho || (a[*rho].is_zero() && !a[k].is_zero()))
                rho = k;
        }
        if (rho) {
            const group_variable& d = r_.variables[*rho];
            const double nu_log = log - model_[*rho].value->log;
            const double nu_prototype_log = prototype_log - prototype_[*rho]->log;
            std::optional<rational> nu_power;
            if (power && model_[*rho].power) {
                try {
                    nu_power = *power - *model_[*rho].power;
                } catch (const arithmetic_overflow&) {
                }
            }
            const dimension nu_dim = v.dim / d.dim;
            const shown_unit* nu_unit =
                r_.kinematic_viscosity_unit.text.empty() ? nullptr : &r_.kinematic_viscosity_unit;
            out += fmt::format(
                " at the model density {} = {}, that is a kinematic viscosity {}/{} of {} ({})",
                d.name,
                value_text(model_[*rho].value->value(), d.dim, unit_of(*rho), table_figures),
                v.name, d.name, value_text(std::exp(nu_log), nu_dim, nu_unit, table_figures),
                ratio_text("ν", nu_power, std::exp(nu_log - nu_prototype_log)));
        }
    }
    if (is_gravity(v))
        out += ", higher than the prototype's, which only a centrifuge can provide";
    return out;
}

std::string planner::explain_conflict(std::size_t g, const std::vector<std::size_t>& fixers,
                                      const signed_log& model) const {
    const signed_log& prototype = *group_proto_[g];
    std::string out;
    if (fixers.empty()) {
        out = fmt::format("With the model values that are given, scaled by the length scale or "
                          "kept from the prototype, {} is {} in the model against {} in the "
                          "prototype, so it is not matched.",
                          label(g), number_text(model.value(), table_figures),
                          number_text(prototype.value(), table_figures));
    } else {
        std::vector<std::string> fixed;
        const auto& a = exponents(g);
        for (std::size_t j = 0; j < a.size(); ++j)
            if (!a[j].is_zero() && !model_[j].fixed_by.empty())
                fixed.push_back(r_.variables[j].name);
        out = fmt::format("{} and {} cannot both be matched with the given model values: "
                          "matching {} fixes {} in the model, and {} then is {} in the model "
                          "against {} in the prototype.",
                          labels(fixers), label(g), labels(fixers), join(fixed, " and "), label(g),
                          number_text(model.value(), table_figures),
                          number_text(prototype.value(), table_figures));
        out.front() = static_cast<char>(std::toupper(static_cast<unsigned char>(out.front())));
    }

    // A fluid is sought by its viscosity or surface tension far more often than by its density,
    // so densities come last; gravity only when nothing else enters the group, since changing
    // it takes a centrifuge.
    std::vector<std::string> needs;
    std::vector<std::string> density_needs;
    std::vector<std::string> gravity_needs;
    bool gravity_enters = false;
    const auto& a = exponents(g);
    for (std::size_t j = 0; j < a.size(); ++j) {
        if (a[j].is_zero() || model_[j].from != origin::given || !prototype_[j])
            continue;
        const dimension& d = r_.variables[j].dim;
        const bool gravity = is_gravity(r_.variables[j]);
        gravity_enters = gravity_enters || gravity;
        const auto need = requirement(g, j);
        if (!need)
            continue;
        (is_density(d) ? density_needs : gravity ? gravity_needs : needs).push_back(*need);
    }
    needs.insert(needs.end(), density_needs.begin(), density_needs.end());
    if (needs.empty())
        needs = gravity_needs;
    if (needs.empty() && gravity_enters) {
        out += fmt::format(" Matching {} would take a gravity lower than the prototype's, which "
                           "no test rig can provide (a centrifuge only raises it).",
                           label(g));
        return out;
    }
    if (needs.empty()) {
        out += fmt::format(" No given model value enters {}, so only another length scale or "
                           "other model values could change it.",
                           label(g));
        return out;
    }
    out += fmt::format(" To match {} as well, the model would need {}.", label(g),
                       join(needs, "; or "));
    return out;
}

} // namespace plumb::planning
