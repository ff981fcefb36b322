// Model planning, step two: solve for the free variables, the chosen groups first, one unknown
// at a time where a group allows, or several groups together as one exact system.
#include "groups/planner.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <cmath>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace plumb::planning {

std::vector<std::size_t> planner::unknowns_in(std::size_t g) const {
    std::vector<std::size_t> out;
    const auto& a = exponents(g);
    for (std::size_t j = 0; j < a.size(); ++j)
        if (!a[j].is_zero() && model_[j].from == origin::unknown)
            out.push_back(j);
    return out;
}

// A group can fix or check model values only when its prototype value is known and every
// variable in it that is not an unknown has a model value.
bool planner::usable(std::size_t g) const {
    if (!group_ok_[g] || !group_proto_[g])
        return false;
    const auto& a = exponents(g);
    for (std::size_t j = 0; j < a.size(); ++j)
        if (!a[j].is_zero() && model_[j].from != origin::unknown && !model_[j].value)
            return false;
    return true;
}

std::size_t planner::given_count(std::size_t g) const {
    std::size_t n = 0;
    const auto& a = exponents(g);
    for (std::size_t j = 0; j < a.size(); ++j)
        if (!a[j].is_zero() && model_[j].from == origin::given)
            ++n;
    return n;
}

void planner::fix_single(std::size_t g, std::size_t u) {
    const auto& a = exponents(g);
    double rest = 0.0;
    int sign = group_proto_[g]->sign;
    std::optional<rational> power_rest = rational(0);
    for (std::size_t j = 0; j < a.size(); ++j) {
        if (j == u || a[j].is_zero())
            continue;
        rest += a[j].to_double() * model_[j].value->log;
        if (model_[j].value->sign < 0 && a[j].num() % 2 != 0)
            sign = -sign;
        power_rest = add_power(power_rest, a[j], model_[j].power);
    }
    model_state& m = model_[u];
    const rational au = a[u];
    // An odd whole power carries the sign through; any other power needs a positive value, so
    // the model keeps the prototype's sign there.
    const bool odd = au.is_integer() && au.num() % 2 != 0;
    const int prototype_sign = prototype_[u] ? prototype_[u]->sign : 1;
    m.value =
        signed_log{odd ? sign : prototype_sign, (group_proto_[g]->log - rest) / au.to_double()};
    m.power.reset();
    if (power_rest) {
        try {
            m.power = -(*power_rest / au);
        } catch (const arithmetic_overflow&) {
        }
    }
    m.from = origin::solved;
    m.fixed_by = {g};
    resolved_[g] = true;
}

// Several unknowns tied together: when some of the candidate groups determine them all (an
// exactly invertible square system), solve it with exact exponents; the other candidates are
// then checked like any group without unknowns.
bool planner::solve_system(const std::vector<std::size_t>& candidates) {
    std::vector<std::size_t> unknowns;
    for (const std::size_t g : candidates)
        for (const std::size_t j : unknowns_in(g))
            if (std::find(unknowns.begin(), unknowns.end(), j) == unknowns.end())
                unknowns.push_back(j);
    std::sort(unknowns.begin(), unknowns.end());
    const std::size_t k = unknowns.size();
    if (k == 0 || candidates.size() < k)
        return false;
    try {
        // Independent groups are the pivot columns of the transposed coefficients.
        rational_matrix transposed(k, candidates.size());
        for (std::size_t c = 0; c < candidates.size(); ++c)
            for (std::size_t i = 0; i < k; ++i)
                transposed.at(i, c) = exponents(candidates[c])[unknowns[i]];
        const auto pivots = row_reduce(transposed);
        if (pivots.size() != k)
            return false;
        std::vector<std::size_t> chosen;
        for (const std::size_t p : pivots)
            chosen.push_back(candidates[p]);

        rational_matrix augmented(k, 2 * k);
        for (std::size_t row = 0; row < k; ++row) {
            for (std::size_t i = 0; i < k; ++i)
                augmented.at(row, i) = exponents(chosen[row])[unknowns[i]];
            augmented.at(row, k + row) = rational(1);
        }
        row_reduce(augmented); // left half becomes the identity, right half the inverse

        std::vector<double> rhs(k);
        std::vector<std::optional<rational>> power_rhs(k);
        for (std::size_t row = 0; row < k; ++row) {
            const std::size_t g = chosen[row];
            const auto& a = exponents(g);
            double rest = 0.0;
            std::optional<rational> power_rest = rational(0);
            for (std::size_t j = 0; j < a.size(); ++j) {
                if (a[j].is_zero() || model_[j].from == origin::unknown)
                    continue;
                rest += a[j].to_double() * model_[j].value->log;
                power_rest = add_power(power_rest, a[j], model_[j].power);
            }
            rhs[row] = group_proto_[g]->log - rest;
            if (power_rest)
                power_rhs[row] = -*power_rest;
        }
        for (std::size_t i = 0; i < k; ++i) {
            double log = 0.0;
            std::optional<rational> power = rational(0);
            for (std::size_t row = 0; row < k; ++row) {
                const rational inverse = augmented.at(i, k + row);
                log += inverse.to_double() * rhs[row];
                power = add_power(power, inverse, power_rhs[row]);
            }
            model_state& m = model_[unknowns[i]];
            m.value = signed_log{prototype_[unknowns[i]] ? prototype_[unknowns[i]]->sign : 1, log};
            m.power = power;
            m.from = origin::solved;
            m.fixed_by = chosen;
        }
        std::sort(chosen.begin(), chosen.end());
        for (const std::size_t g : chosen)
            resolved_[g] = true;
        for (const std::size_t u : unknowns)
            std::sort(model_[u].fixed_by.begin(), model_[u].fixed_by.end());
        return true;
    } catch (const arithmetic_overflow&) {
        plan_.problems.push_back("the exponents of the groups are too large to solve the model "
                                 "values exactly; those variables are left free");
        return false;
    }
}

// chosen_only: only the chosen groups (and, with_dependent, the groups of the dependent
// variables) may fix or check values.
void planner::solve(bool chosen_only, bool with_dependent) {
    const std::size_t count = r_.analysis.groups.size();
    const auto in_phase = [&](std::size_t g) {
        if (resolved_[g] || !usable(g))
            return false;
        if (r_.analysis.groups[g].has_dependent)
            return with_dependent;
        return !chosen_only || chosen(g);
    };
    for (;;) {
        for (std::size_t g = 0; g < count; ++g)
            if (in_phase(g) && unknowns_in(g).empty())
                check(g);
        // Groups fixed by geometry and gravity alone go first: gravity cannot be changed, while
        // the given fluid properties are what a conflict explanation can ask to change. Without
        // a choice by the user this order is provisional: when groups then conflict, the plan
        // lists the alternatives instead (similitude.cpp).
        std::optional<std::size_t> best;
        for (std::size_t g = 0; g < count; ++g)
            if (in_phase(g) && unknowns_in(g).size() == 1 &&
                (!best || given_count(g) < given_count(*best)))
                best = g;
        if (best) {
            fix_single(*best, unknowns_in(*best).front());
            continue;
        }
        std::vector<std::size_t> candidates;
        for (std::size_t g = 0; g < count; ++g)
            if (in_phase(g))
                candidates.push_back(g);
        std::stable_sort(candidates.begin(), candidates.end(), [&](std::size_t x, std::size_t y) {
            return given_count(x) < given_count(y);
        });
        if (candidates.empty() || !solve_system(candidates))
            return;
    }
}

} // namespace plumb::planning
