// Model planning, step two: solve for the free variables, the chosen groups first, one unknown
// at a time where a group allows, or several groups together as one exact system.
#include "groups/planner.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <cmath>
#include <cstdint>
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

namespace {

// Signs of the unknowns (true: negative) that give each group the sign it needs. A product's
// sign is the sum, modulo 2, of the odd exponents of its negative factors, so this is a linear
// system over GF(2), solved by elimination with the bits packed 64 to a word. Unknowns under a
// fractional or even power in every row keep the sign they start with. Empty when no choice of
// signs works: no real values then satisfy the groups.
std::optional<std::vector<bool>> solve_signs(const std::vector<std::vector<bool>>& odd,
                                             const std::vector<bool>& needs_negative,
                                             std::vector<bool> signs) {
    const std::size_t rows = odd.size();
    const std::size_t k = signs.size();
    const std::size_t words = (k + 1 + 63) / 64; // the last bit column is the right-hand side
    const auto bit = [](const std::vector<std::uint64_t>& row, std::size_t c) {
        return ((row[c / 64] >> (c % 64)) & 1U) != 0;
    };
    const auto flip = [](std::vector<std::uint64_t>& row, std::size_t c) {
        row[c / 64] ^= std::uint64_t{1} << (c % 64);
    };
    std::vector<std::vector<std::uint64_t>> m(rows, std::vector<std::uint64_t>(words, 0));
    for (std::size_t r = 0; r < rows; ++r) {
        // Start from the given signs: the right-hand side is what they still get wrong.
        bool wrong = needs_negative[r];
        for (std::size_t c = 0; c < k; ++c) {
            if (!odd[r][c])
                continue;
            flip(m[r], c);
            wrong = wrong != signs[c];
        }
        if (wrong)
            flip(m[r], k);
    }
    std::vector<std::size_t> pivot_of_row;
    std::size_t next = 0;
    for (std::size_t c = 0; c < k && next < rows; ++c) {
        std::size_t p = next;
        while (p < rows && !bit(m[p], c))
            ++p;
        if (p == rows)
            continue;
        std::swap(m[p], m[next]);
        for (std::size_t r = 0; r < rows; ++r)
            if (r != next && bit(m[r], c))
                for (std::size_t w = 0; w < words; ++w)
                    m[r][w] ^= m[next][w];
        pivot_of_row.push_back(c);
        ++next;
    }
    for (std::size_t r = next; r < rows; ++r)
        if (bit(m[r], k))
            return std::nullopt; // 0 = 1: the needed signs contradict each other
    for (std::size_t r = 0; r < next; ++r)
        if (bit(m[r], k))
            signs[pivot_of_row[r]] = !signs[pivot_of_row[r]];
    return signs;
}

} // namespace

int planner::needed_sign(std::size_t g) const {
    int sign = group_proto_[g]->sign;
    const auto& a = exponents(g);
    for (std::size_t j = 0; j < a.size(); ++j)
        if (!a[j].is_zero() && model_[j].value && model_[j].value->sign < 0 && a[j].num() % 2 != 0)
            sign = -sign;
    return sign;
}

bool planner::satisfied(std::size_t g) const {
    const auto model = evaluate(g, model_values());
    if (!model || !group_proto_[g] || !representable(*model) || !representable(*group_proto_[g]))
        return false;
    // Far below any tolerance a user sets, far above the rounding of a few logarithms.
    constexpr double rounding = 1e-9;
    return model->sign == group_proto_[g]->sign &&
           std::fabs(model->log - group_proto_[g]->log) <=
               rounding * (1.0 + std::fabs(group_proto_[g]->log));
}

void planner::withhold(std::size_t u, const std::vector<std::size_t>& fixed_by) {
    model_state& m = model_[u];
    m.value.reset();
    m.power.reset();
    m.from = origin::no_value;
    m.fixed_by = fixed_by;
}

void planner::settle(std::size_t u, signed_log value, const std::vector<std::size_t>& fixed_by) {
    if (!representable(value)) {
        const group_variable& v = r_.variables[u];
        const std::string unit = unit_of(u) != nullptr && !unit_of(u)->text.empty()
                                     ? unit_of(u)->text
                                     : si_unit_text(v.dim);
        plan_.problems.push_back(fmt::format(
            "matching {} would take a model {} of about {}{}{}, beyond the numbers plumb can "
            "compute with, so {} has no model value; check the prototype and model values",
            labels(fixed_by), v.name, log_number_text(value.sign, value.log),
            unit.empty() ? "" : " ", unit, v.name));
        withhold(u, fixed_by);
        return;
    }
    model_state& m = model_[u];
    m.value = value;
    m.from = origin::solved;
    m.fixed_by = fixed_by;
}

void planner::fix_single(std::size_t g, std::size_t u) {
    const auto& a = exponents(g);
    double rest = 0.0;
    const int sign = needed_sign(g);
    std::optional<rational> power_rest = rational(0);
    for (std::size_t j = 0; j < a.size(); ++j) {
        if (j == u || a[j].is_zero())
            continue;
        rest += a[j].to_double() * model_[j].value->log;
        power_rest = add_power(power_rest, a[j], model_[j].power);
    }
    resolved_[g] = true;
    const rational au = a[u];
    // An odd whole power carries the sign through; any other power is positive whatever the
    // value, so the group must already have the prototype's sign, and the model keeps the
    // prototype's sign for the variable.
    const bool odd = au.is_integer() && au.num() % 2 != 0;
    if (!odd && sign < 0) {
        plan_.problems.push_back(fmt::format(
            "{} cannot match with real values: {} enters it as its {} power, which is never "
            "negative, and the other model values give it the opposite sign to the prototype's; "
            "check the signs on the prototype and model lines",
            label(g), r_.variables[u].name, au.to_string()));
        withhold(u, {g});
        return;
    }
    const int prototype_sign = prototype_[u] ? prototype_[u]->sign : 1;
    settle(u,
           signed_log{odd ? sign : prototype_sign, (group_proto_[g]->log - rest) / au.to_double()},
           {g});
    model_state& m = model_[u];
    m.power.reset();
    if (m.value && power_rest) {
        try {
            m.power = -(*power_rest / au);
        } catch (const arithmetic_overflow&) {
        }
    }
}

// Several unknowns tied together: when some of the candidate groups determine them all (an
// exactly invertible square system), solve it with exact exponents, magnitudes by the inverse
// and signs over GF(2); the other candidates are then checked like any group without unknowns.
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

        // Signs: each unknown starts with its prototype's; one under a fractional power in any
        // row must stay positive, and an even power leaves the sign to the other rows.
        std::vector<bool> negative(k, false);
        std::vector<std::vector<bool>> odd(k, std::vector<bool>(k, false));
        std::vector<bool> needs_negative(k, false);
        std::vector<bool> fractional(k, false);
        for (std::size_t row = 0; row < k; ++row) {
            const auto& a = exponents(chosen[row]);
            needs_negative[row] = needed_sign(chosen[row]) < 0;
            for (std::size_t i = 0; i < k; ++i) {
                const rational e = a[unknowns[i]];
                fractional[i] = fractional[i] || !e.is_integer();
                odd[row][i] = e.is_integer() && e.num() % 2 != 0;
            }
        }
        for (std::size_t i = 0; i < k; ++i) {
            negative[i] = prototype_[unknowns[i]] && prototype_[unknowns[i]]->sign < 0;
            if (fractional[i]) {
                negative[i] = false;
                for (std::size_t row = 0; row < k; ++row)
                    odd[row][i] = false;
            }
        }
        std::sort(chosen.begin(), chosen.end());
        for (const std::size_t g : chosen)
            resolved_[g] = true;
        const auto signs = solve_signs(odd, needs_negative, negative);
        if (!signs) {
            std::vector<std::string> names;
            for (const std::size_t u : unknowns)
                names.push_back(r_.variables[u].name);
            plan_.problems.push_back(fmt::format(
                "{} cannot all match with real values: no signs of {} give every group its "
                "prototype's sign with the given model values; check the signs on the prototype "
                "and model lines",
                labels(chosen), join(names, " and ")));
            for (const std::size_t u : unknowns)
                withhold(u, chosen);
            return true;
        }

        for (std::size_t i = 0; i < k; ++i) {
            double log = 0.0;
            std::optional<rational> power = rational(0);
            for (std::size_t row = 0; row < k; ++row) {
                const rational inverse = augmented.at(i, k + row);
                log += inverse.to_double() * rhs[row];
                power = add_power(power, inverse, power_rhs[row]);
            }
            settle(unknowns[i], signed_log{(*signs)[i] ? -1 : 1, log}, chosen);
            if (model_[unknowns[i]].value)
                model_[unknowns[i]].power = power;
        }
        // The plan's own check: the values solved for these groups must satisfy them. A
        // failure here is a fault of the solver, said plainly rather than passed off as a match.
        for (const std::size_t g : chosen) {
            bool all_valued = true;
            for (const std::size_t u : unknowns)
                all_valued = all_valued && (exponents(g)[u].is_zero() || model_[u].value);
            if (all_valued && !satisfied(g)) {
                plan_.problems.push_back(fmt::format(
                    "the model values solved for {} do not satisfy it, so they are left out",
                    label(g)));
                for (const std::size_t u : unknowns)
                    withhold(u, chosen);
                break;
            }
        }
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
