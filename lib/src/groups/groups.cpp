// Buckingham's pi theorem by exact elimination: the dimension matrix, its rank, the repeating
// variables (given or chosen by a fixed rule) and one dimensionless group per other variable.
#include "plumb/groups.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <cstdint>
#include <numeric>
#include <optional>
#include <string>
#include <utility>

namespace plumb {
namespace {

constexpr std::string_view overflow_problem =
    "the exponents exceed the exact 64-bit range while forming the groups, so no exact answer "
    "can be given (a dimension typed with an enormous exponent is the usual cause)";

[[noreturn]] void overflow() {
    throw arithmetic_overflow("group exponents exceed the 64-bit range");
}

std::int64_t checked_lcm(std::int64_t a, std::int64_t b) {
    std::int64_t r = 0;
    if (__builtin_mul_overflow(a / std::gcd(a, b), b, &r))
        overflow();
    return r;
}

dimension dimension_of(std::int64_t m, std::int64_t l, std::int64_t t) {
    return dimension::from_exponents({rational(m), rational(l), rational(t), 0, 0, 0, 0});
}

// The rule's order of preference: a density, a speed and a length together carry mass, length
// and time in the form that yields the groups engineers recognise (Reynolds, Froude, drag
// coefficient), so they come first.
// After them, the other mechanical variables (mass, length and time only: geometry, kinematics,
// dynamics), then the rest; a coefficient per degree (an expansion coefficient) comes last,
// since repeating it would hide the temperature difference inside every group it enters.
int preference(const dimension& d) {
    if (d == dimension_of(1, -3, 0))
        return 0;
    if (d == dimension_of(0, 1, -1))
        return 1;
    if (d == dimension_of(0, 1, 0))
        return 2;
    bool mechanical = true;
    for (std::size_t b = 3; b < base_dimension_count; ++b)
        mechanical = mechanical && d.exponents()[b].is_zero();
    if (mechanical)
        return 3;
    if (d == dimension::base(base_dimension::temperature).pow(-1))
        return 5;
    return 4;
}

bool is_dependent(const group_request& request, std::size_t i) {
    return std::find(request.dependents.begin(), request.dependents.end(), i) !=
           request.dependents.end();
}

// Sum of |exponents|, exact; empty when even that sum leaves 64 bits, which sorts such a
// variable last rather than failing an analysis that might not need it.
std::optional<rational> total_exponent(const dimension& d) {
    try {
        rational total = 0;
        for (const rational& e : d.exponents())
            total += e < rational(0) ? -e : e;
        return total;
    } catch (const arithmetic_overflow&) {
        return std::nullopt;
    }
}

rational_matrix select_columns(const rational_matrix& m, std::span<const std::size_t> columns) {
    rational_matrix out(m.rows(), columns.size());
    for (std::size_t r = 0; r < m.rows(); ++r)
        for (std::size_t c = 0; c < columns.size(); ++c)
            out.at(r, c) = m.at(r, columns[c]);
    return out;
}

// "ρ", "ρ and μ", "ρ, μ and ν".
std::string join_names(const std::vector<std::string>& names) {
    std::string out;
    for (std::size_t i = 0; i < names.size(); ++i) {
        if (i > 0)
            out += i + 1 == names.size() ? " and " : ", ";
        out += names[i];
    }
    return out;
}

std::string quoted(const group_variable& v) {
    return "'" + v.name + "'";
}

// The rule, in the words the README uses: the dependent variable never repeats; the others are
// tried in this order — a density [M L^-3], a speed [L T^-1], a length [L], then the rest by the
// fewest total |exponents| — ties in the order the variables were declared; each is kept when it
// raises the rank of those kept so far, until the rank of the whole matrix is reached.
std::vector<std::size_t> choose_repeating(const group_request& request,
                                          const rational_matrix& values, std::size_t rank) {
    const auto& variables = request.variables;
    std::vector<std::size_t> candidates;
    // A value on an offset scale (°C) is not proportional to its quantity: as a repeating
    // variable it would make groups that change with the choice of zero.
    for (std::size_t i = 0; i < variables.size(); ++i)
        if (!is_dependent(request, i) && !variables[i].offset_scale)
            candidates.push_back(i);
    std::vector<std::optional<rational>> totals;
    for (const auto& v : variables)
        totals.push_back(total_exponent(v.dim));
    std::stable_sort(candidates.begin(), candidates.end(), [&](std::size_t a, std::size_t b) {
        const int pa = preference(variables[a].dim);
        const int pb = preference(variables[b].dim);
        if (pa != pb)
            return pa < pb;
        if (!totals[a] || !totals[b])
            return totals[a].has_value() && !totals[b].has_value();
        return *totals[a] < *totals[b];
    });
    std::vector<std::size_t> chosen;
    std::size_t chosen_rank = 0;
    for (std::size_t candidate : candidates) {
        if (chosen_rank == rank)
            break;
        chosen.push_back(candidate);
        const std::size_t r = matrix_rank(select_columns(values, chosen));
        if (r > chosen_rank)
            chosen_rank = r;
        else
            chosen.pop_back();
    }
    return chosen;
}

// Why the user's repeating variables cannot serve, in plain words; empty when they can.
std::vector<std::string> check_given(const group_request& request, const rational_matrix& values,
                                     std::size_t rank) {
    const auto& variables = request.variables;
    const auto& given = request.repeating;
    std::vector<std::string> problems;
    std::vector<bool> seen(variables.size(), false);
    for (std::size_t index : given) {
        if (index >= variables.size()) {
            problems.push_back("repeating variable number " + std::to_string(index + 1) +
                               " does not exist: there are " + std::to_string(variables.size()) +
                               " variables");
            continue;
        }
        if (seen[index])
            problems.push_back(quoted(variables[index]) +
                               " is named more than once among the repeating variables");
        seen[index] = true;
        if (is_dependent(request, index))
            problems.push_back(quoted(variables[index]) +
                               " is the dependent variable, so it cannot repeat: it would appear "
                               "in every group instead of standing alone in one");
        if (variables[index].offset_scale)
            problems.push_back(quoted(variables[index]) +
                               " is on a scale with a zero of its own (such as °C), so it cannot "
                               "repeat: its values are not proportional to the quantity, and the "
                               "groups would change with the choice of zero; declare it in K, or "
                               "use a temperature difference");
    }
    if (given.size() != rank)
        problems.push_back(std::to_string(rank) +
                           (rank == 1 ? " repeating variable is" : " repeating variables are") +
                           " needed (the rank of the dimension matrix), " +
                           std::to_string(given.size()) +
                           (given.size() == 1 ? " was given" : " were given"));
    if (!problems.empty())
        return problems;

    // A vector of the repeating columns' nullspace is a product of their powers that is
    // dimensionless; its last variable is the one that the earlier ones already make up.
    const rational_matrix null = nullspace_basis(select_columns(values, given));
    if (null.cols() == 0)
        return problems;
    std::vector<rational> exponents(variables.size());
    std::vector<std::string> involved;
    std::size_t last = 0;
    for (std::size_t i = 0; i < given.size(); ++i) {
        if (null.at(i, 0).is_zero())
            continue;
        involved.push_back(variables[given[i]].name);
        last = i;
    }
    // The basis vector has 1 at its last nonzero entry, so the others, negated, are the powers
    // that make up that variable's dimension.
    for (std::size_t i = 0; i < last; ++i)
        exponents[given[i]] = -null.at(i, 0);
    const group_variable& culprit = variables[given[last]];
    if (involved.size() == 1) {
        problems.push_back("repeating variables must be dimensionally independent: " +
                           quoted(culprit) + " is dimensionless, so it cannot repeat");
        return problems;
    }
    problems.push_back("repeating variables must be dimensionally independent: " + quoted(culprit) +
                       " has the dimension of " + group_formula(variables, exponents) + ", so " +
                       join_names(involved) + " are not independent");
    return problems;
}

// Smallest whole exponents with the same ratios, the group's own (non-repeating) variable's
// exponent positive, so a group reads as that variable over its repeating companions.
void scale_to_whole(std::vector<rational>& exponents, std::size_t own) {
    std::int64_t denominators = 1;
    for (const rational& e : exponents)
        denominators = checked_lcm(denominators, e.den());
    std::int64_t common = 0;
    for (rational& e : exponents) {
        e *= denominators;
        // std::gcd is undefined for INT64_MIN, and the sign rule could not negate it.
        if (e.num() == INT64_MIN)
            overflow();
        common = std::gcd(common, e.num());
    }
    if (common == 0)
        return;
    if (exponents[own].num() < 0)
        common = -common;
    for (rational& e : exponents)
        e = rational(e.num() / common);
}

dimension group_dimension(std::span<const group_variable> variables,
                          std::span<const rational> exponents) {
    dimension d;
    for (std::size_t i = 0; i < variables.size(); ++i)
        if (!exponents[i].is_zero())
            d = d * variables[i].dim.pow(exponents[i]);
    return d;
}

// One group per non-repeating variable: it to the first power, the repeating variables solving
// D_R a = -d_v. Reducing [D_R | D_other] once solves every right-hand side together, since the
// repeating columns come first and are independent, so they are exactly the pivots.
std::vector<pi_group> form_groups(const group_request& request, const rational_matrix& values,
                                  const std::vector<std::size_t>& repeating,
                                  std::vector<std::string>& problems) {
    const auto& variables = request.variables;
    std::vector<bool> repeats(variables.size(), false);
    for (std::size_t r : repeating)
        repeats[r] = true;
    std::vector<std::size_t> order = repeating;
    std::vector<std::size_t> others;
    // The dependent variables' groups come first: they are what the others are a function of.
    for (const std::size_t d : request.dependents)
        if (!repeats[d])
            others.push_back(d);
    for (std::size_t i = 0; i < variables.size(); ++i)
        if (!repeats[i] && !is_dependent(request, i))
            others.push_back(i);
    order.insert(order.end(), others.begin(), others.end());

    rational_matrix reduced = select_columns(values, order);
    const std::vector<std::size_t> pivots = row_reduce(reduced);
    // Checked, not assumed: pivots beyond the repeating columns would mean they do not span.
    bool repeating_are_pivots = pivots.size() == repeating.size();
    for (std::size_t i = 0; repeating_are_pivots && i < pivots.size(); ++i)
        repeating_are_pivots = pivots[i] == i;
    if (!repeating_are_pivots) {
        problems.emplace_back("internal error: the repeating variables are not an independent "
                              "spanning set");
        return {};
    }

    std::vector<pi_group> groups;
    for (std::size_t j = 0; j < others.size(); ++j) {
        const std::size_t v = others[j];
        pi_group g;
        g.exponents.assign(variables.size(), rational(0));
        g.exponents[v] = 1;
        for (std::size_t i = 0; i < repeating.size(); ++i)
            g.exponents[repeating[i]] = -reduced.at(i, repeating.size() + j);
        g.has_dependent = is_dependent(request, v);
        if (!g.has_dependent)
            scale_to_whole(g.exponents, v);
        g.formula = group_formula(variables, g.exponents);
        // Elimination has no business producing a group with a dimension; if it ever does, the
        // answer is withheld rather than printed wrong.
        const dimension d = group_dimension(variables, g.exponents);
        if (!d.is_dimensionless()) {
            problems.push_back("internal error: the group " + g.formula +
                               " came out with the dimension " + d.to_string());
            return {};
        }
        groups.push_back(std::move(g));
    }
    return groups;
}

void analyse(const group_request& request, group_analysis& result) {
    const auto& variables = request.variables;
    if (variables.empty()) {
        result.problems.emplace_back("no variables were given");
        return;
    }
    // Each group holds an exponent for every variable, so the answer grows with the square of
    // the study; past this size it would take memory and time out of all proportion.
    if (variables.size() > max_study_variables) {
        result.problems.push_back(fmt::format(
            "the study has {} variables, more than the {} whose groups plumb works out; split "
            "it into studies of the variables that act together",
            variables.size(), max_study_variables));
        return;
    }
    for (const std::size_t d : request.dependents) {
        if (d >= variables.size()) {
            result.problems.push_back("the dependent variable (number " + std::to_string(d + 1) +
                                      ") is not among the " + std::to_string(variables.size()) +
                                      " variables");
            return;
        }
    }
    result.matrix = build_dimension_matrix(variables);
    const rational_matrix& values = result.matrix.values;
    result.rank = matrix_rank(values);

    if (result.rank == variables.size()) {
        result.problems.push_back("no dimensionless group can be formed: the " +
                                  std::to_string(variables.size()) +
                                  (variables.size() == 1 ? " variable has a dimension"
                                                         : " variables are dimensionally "
                                                           "independent") +
                                  ", so a variable the phenomenon depends on is missing");
        return;
    }
    // Every dependent variable must be balanced by the independent ones alone.
    std::vector<std::size_t> independent;
    for (std::size_t i = 0; i < variables.size(); ++i)
        if (!is_dependent(request, i))
            independent.push_back(i);
    for (const std::size_t d : request.dependents) {
        std::vector<std::size_t> rest = independent;
        rest.push_back(d);
        if (matrix_rank(select_columns(values, independent)) <
            matrix_rank(select_columns(values, rest))) {
            const group_variable& dep = variables[d];
            result.problems.push_back(
                quoted(dep) +
                " cannot enter any dimensionless group: no combination of the "
                "other variables has its dimension " +
                dep.dim.to_string() + ", so a variable it depends on is missing");
        }
    }

    if (request.repeating.empty()) {
        result.repeating_chosen = true;
        if (!result.problems.empty())
            return;
        result.repeating = choose_repeating(request, values, result.rank);
        if (result.repeating.size() < result.rank) {
            std::vector<std::string> offset;
            for (const auto& v : variables)
                if (v.offset_scale)
                    offset.push_back(v.name);
            result.problems.push_back(
                "the repeating variables cannot be chosen without " + join_names(offset) +
                ", which " + (offset.size() == 1 ? "is" : "are") +
                " on a scale with a zero of its own (such as °C): declare it in K, or use a "
                "temperature difference");
            return;
        }
    } else {
        result.repeating = request.repeating;
        auto reasons = check_given(request, values, result.rank);
        result.problems.insert(result.problems.end(), reasons.begin(), reasons.end());
        if (!result.problems.empty())
            return;
    }
    result.groups = form_groups(request, values, result.repeating, result.problems);
}

} // namespace

dimension_matrix build_dimension_matrix(std::span<const group_variable> variables) {
    dimension_matrix m;
    std::vector<std::size_t> used;
    for (std::size_t b = 0; b < base_dimension_count; ++b) {
        const bool occurs = std::any_of(variables.begin(), variables.end(), [&](const auto& v) {
            return !v.dim.exponents()[b].is_zero();
        });
        if (occurs) {
            m.rows.push_back(static_cast<base_dimension>(b));
            used.push_back(b);
        }
    }
    m.values = rational_matrix(used.size(), variables.size());
    for (std::size_t r = 0; r < used.size(); ++r)
        for (std::size_t c = 0; c < variables.size(); ++c)
            m.values.at(r, c) = variables[c].dim.exponents()[used[r]];
    return m;
}

group_analysis analyse_groups(const group_request& request) {
    group_analysis result;
    try {
        analyse(request, result);
    } catch (const arithmetic_overflow&) {
        result.groups.clear();
        result.problems.emplace_back(overflow_problem);
    }
    if (!result.problems.empty())
        result.groups.clear();
    return result;
}

} // namespace plumb
