// Scale-model planning: the model value of every variable that makes the dimensionless groups
// of the model equal those of the prototype, and, where they cannot all be equal, which groups
// disagree and what model fluid would reconcile them.
#include "plumb/groups.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <array>
#include <cmath>
#include <optional>
#include <string>
#include <string_view>
#include <utility>
#include <vector>

namespace plumb {
namespace {

// "an acceleration", "a density": by the first letter, which serves the quantity names used.
std::string_view article(std::string_view noun) {
    return !noun.empty() && std::string_view("aeiou").find(noun.front()) != std::string_view::npos
               ? "an"
               : "a";
}

// Shown wherever a model plan is produced: a plan states what similarity requires, and a
// reader must not take it as evidence that a model test will be representative.
constexpr std::string_view caution_text =
    "Model tests are seldom fully similar: partial similarity and scale effects apply, so "
    "model results must be interpreted with care, and model testing must follow the "
    "applicable codes of practice.";

// Relative agreement at which a model group counts as equal to the prototype's: far below any
// measurement, far above the rounding of a few logarithms and exponentials.
constexpr double match_tolerance = 1e-9;

// Values are carried as sign and logarithm of the magnitude, so that products of large powers
// (a Reynolds number of 1e9 to the third power) never overflow before the end.
struct signed_log {
    int sign = 1;
    double log = 0.0;
    [[nodiscard]] double value() const { return sign * std::exp(log); }
};

std::optional<signed_log> to_signed_log(double v) {
    if (!std::isfinite(v) || v == 0.0)
        return std::nullopt;
    return signed_log{v < 0 ? -1 : 1, std::log(std::fabs(v))};
}

enum class origin { unknown, given, scaled, gravity, solved };

struct model_state {
    origin from = origin::unknown;
    std::optional<signed_log> value;
    // model/prototype = λ^power when the ratio is a pure power of the length scale; it lets an
    // explanation say "λ^(3/2)" rather than only a number.
    std::optional<rational> power;
    std::vector<std::size_t> fixed_by; // groups that fixed a solved variable
};

bool is_length(const dimension& d) {
    return d == dimension::base(base_dimension::length);
}

bool is_acceleration(const dimension& d) {
    return d ==
           dimension::base(base_dimension::length) / dimension::base(base_dimension::time).pow(2);
}

bool is_dynamic_viscosity(const dimension& d) {
    return d == dimension::base(base_dimension::mass) / (dimension::base(base_dimension::length) *
                                                         dimension::base(base_dimension::time));
}

bool is_density(const dimension& d) {
    return d ==
           dimension::base(base_dimension::mass) / dimension::base(base_dimension::length).pow(3);
}

// Three significant figures, plain between 0.001 and 1e5 and with a short exponent outside:
// "0.008", "1000", "5.33", "8.43e-9", "1.25e5".
std::string number_text(double v) {
    if (!std::isfinite(v) || v == 0.0)
        return fmt::format("{}", v);
    const auto strip = [](std::string s) {
        if (s.find('.') == std::string::npos)
            return s;
        s.erase(s.find_last_not_of('0') + 1);
        if (s.back() == '.')
            s.pop_back();
        return s;
    };
    const double magnitude = std::fabs(v);
    if (magnitude >= 1e-3 && magnitude < 1e5) {
        const int digits = static_cast<int>(std::floor(std::log10(magnitude)));
        return strip(fmt::format("{:.{}f}", v, std::max(0, 2 - digits)));
    }
    const std::string s = fmt::format("{:.2e}", v);
    const auto e = s.find('e');
    const int exponent = std::stoi(s.substr(e + 1));
    return strip(s.substr(0, e)) + "e" + std::to_string(exponent);
}

// The coherent SI unit of a dimension, as the .plumb notation writes units ("Pa*s", "m^2/s").
std::string si_unit_text(const dimension& d) {
    struct named {
        std::array<int, 3> mlt;
        std::string_view unit;
    };
    // Derived units an engineer reads more easily than their base-unit form.
    constexpr named derived[] = {
        {{1, 1, -2}, "N"},   {{1, -1, -2}, "Pa"}, {{1, -1, -1}, "Pa*s"},
        {{1, 0, -2}, "N/m"}, {{1, 2, -2}, "J"},   {{1, 2, -3}, "W"},
    };
    bool only_mlt = true;
    for (std::size_t i = 3; i < base_dimension_count; ++i)
        only_mlt = only_mlt && d.exponents()[i].is_zero();
    if (only_mlt) {
        for (const auto& n : derived) {
            bool same = true;
            for (std::size_t i = 0; i < 3; ++i)
                same = same && d.exponents()[i] == rational(n.mlt[i]);
            if (same)
                return std::string(n.unit);
        }
    }
    constexpr std::string_view symbols[base_dimension_count] = {"kg",  "m", "s", "K",
                                                                "mol", "A", "cd"};
    std::string numerator;
    std::string denominator;
    std::size_t below = 0;
    for (std::size_t i = 0; i < base_dimension_count; ++i) {
        const rational e = d.exponents()[i];
        if (e.is_zero())
            continue;
        const bool up = e.num() > 0;
        const rational magnitude = up ? e : -e;
        std::string& side = up ? numerator : denominator;
        if (!side.empty())
            side += '*';
        side += symbols[i];
        if (magnitude.is_integer() && magnitude.num() != 1)
            side += "^" + magnitude.to_string();
        else if (!magnitude.is_integer())
            side += "^(" + magnitude.to_string() + ")";
        if (!up)
            ++below;
    }
    if (numerator.empty())
        numerator = below == 0 ? "" : "1";
    if (below == 0)
        return numerator;
    return numerator + "/" + (below > 1 ? "(" + denominator + ")" : denominator);
}

// The first of the names quantity_name lists ("surface tension or spring stiffness" names a
// fluid property here, never a spring).
std::string quantity_text(const dimension& d) {
    std::string name(quantity_name(d));
    if (name.empty())
        return "value";
    for (const std::string_view cut : {std::string_view(", "), std::string_view(" or ")}) {
        const auto at = name.find(cut);
        if (at != std::string::npos)
            name.erase(at);
    }
    return name;
}

// sum + a * power, or nothing once any term is unknown or the exact value would overflow:
// the power of λ only decorates an explanation, so losing it must not stop a plan.
std::optional<rational> add_power(std::optional<rational> sum, rational a,
                                  std::optional<rational> power) {
    if (!sum || !power)
        return std::nullopt;
    try {
        return *sum + a * *power;
    } catch (const arithmetic_overflow&) {
        return std::nullopt;
    }
}

std::string power_text(rational p) {
    if (p == rational(1))
        return "λ";
    if (p.is_integer())
        return "λ^" + p.to_string();
    return "λ^(" + p.to_string() + ")";
}

std::string join(const std::vector<std::string>& parts, std::string_view last_separator) {
    std::string out;
    for (std::size_t i = 0; i < parts.size(); ++i) {
        if (i > 0)
            out += i + 1 == parts.size() ? std::string(last_separator) : std::string(", ");
        out += parts[i];
    }
    return out;
}

class planner {
  public:
    explicit planner(const similitude_request& request) : r_(request) {}

    similitude_plan run();

  private:
    [[nodiscard]] std::string label(std::size_t g) const;
    [[nodiscard]] std::string labels(const std::vector<std::size_t>& gs) const;
    [[nodiscard]] const std::vector<rational>& exponents(std::size_t g) const {
        return r_.analysis.groups[g].exponents;
    }
    [[nodiscard]] std::vector<std::size_t> groups_with(std::size_t variable) const;
    [[nodiscard]] std::optional<double> prototype_input(std::size_t j) const;
    [[nodiscard]] std::optional<double> model_input(std::size_t j) const;
    std::optional<signed_log> checked_value(std::size_t j, double v, std::string_view whose);
    [[nodiscard]] std::optional<signed_log>
    evaluate(std::size_t g, const std::vector<std::optional<signed_log>>& values) const;
    [[nodiscard]] std::vector<std::optional<signed_log>> model_values() const;
    [[nodiscard]] std::vector<std::size_t> unknowns_in(std::size_t g) const;
    [[nodiscard]] bool usable(std::size_t g) const;
    [[nodiscard]] std::size_t given_count(std::size_t g) const;
    [[nodiscard]] static bool agree(const signed_log& a, const signed_log& b);

    void validate_inputs();
    void assign_known_model_values();
    void solve(bool with_dependent);
    void fix_single(std::size_t g, std::size_t u);
    bool solve_system(const std::vector<std::size_t>& candidates);
    void check(std::size_t g);
    [[nodiscard]] std::string requirement(std::size_t g, std::size_t j) const;
    [[nodiscard]] std::string explain_conflict(std::size_t g,
                                               const std::vector<std::size_t>& fixers,
                                               const signed_log& model) const;

    const similitude_request& r_;
    similitude_plan plan_;
    std::vector<bool> group_ok_;                         // exponents fit the variables
    std::vector<std::optional<signed_log>> prototype_;   // per variable
    std::vector<std::optional<signed_log>> group_proto_; // per group
    std::vector<model_state> model_;
    std::vector<bool> resolved_; // group used to fix a variable, or checked
};

std::string planner::label(std::size_t g) const {
    const pi_group& group = r_.analysis.groups[g];
    if (!group.name.empty())
        return "the " + group.name;
    if (!group.formula.empty())
        return group.formula;
    return "π" + std::to_string(g + 1);
}

std::string planner::labels(const std::vector<std::size_t>& gs) const {
    std::vector<std::string> parts;
    parts.reserve(gs.size());
    for (const std::size_t g : gs)
        parts.push_back(label(g));
    return join(parts, " and ");
}

std::vector<std::size_t> planner::groups_with(std::size_t variable) const {
    std::vector<std::size_t> out;
    for (std::size_t g = 0; g < r_.analysis.groups.size(); ++g)
        if (group_ok_[g] && !exponents(g)[variable].is_zero())
            out.push_back(g);
    return out;
}

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

bool planner::agree(const signed_log& a, const signed_log& b) {
    return a.sign == b.sign && std::fabs(std::expm1(a.log - b.log)) <= match_tolerance;
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
                std::fabs(std::expm1(m.value->log - prototype_[j]->log)) <= match_tolerance)
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

void planner::check(std::size_t g) {
    resolved_[g] = true;
    const auto model = evaluate(g, model_values());
    if (!model || agree(*model, *group_proto_[g]))
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

// The value that variable j alone would need for group g to match, every other variable at its
// model value.
std::string planner::requirement(std::size_t g, std::size_t j) const {
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
    std::optional<rational> power;
    if (power_rest) {
        try {
            power = -(*power_rest / a[j]);
        } catch (const arithmetic_overflow&) {
        }
    }
    const auto ratio_text = [](std::string_view symbol, std::optional<rational> p, double ratio) {
        std::string out = fmt::format("{0}_model/{0}_prototype = ", symbol);
        if (p)
            out += power_text(*p) + " = ";
        return out + number_text(ratio);
    };
    const auto unit_suffix = [](const dimension& d) {
        const std::string unit = si_unit_text(d);
        return unit.empty() ? unit : " " + unit;
    };
    const double prototype_log = prototype_[j]->log;
    std::string out =
        fmt::format("{} {} {} of {}{} ({})", article(quantity_text(v.dim)), quantity_text(v.dim),
                    v.name, number_text(value), unit_suffix(v.dim),
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
            out += fmt::format(
                " at the model density {} = {}{}, that is a kinematic viscosity {}/{} of {} "
                "m^2/s ({})",
                d.name, number_text(model_[*rho].value->value()), unit_suffix(d.dim), v.name,
                d.name, number_text(std::exp(nu_log)),
                ratio_text("ν", nu_power, std::exp(nu_log - nu_prototype_log)));
        }
    }
    if (is_acceleration(v.dim))
        out += ", which only a centrifuge can provide";
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
                          label(g), number_text(model.value()), number_text(prototype.value()));
    } else {
        std::vector<std::string> fixed;
        const auto& a = exponents(g);
        for (std::size_t j = 0; j < a.size(); ++j)
            if (!a[j].is_zero() && !model_[j].fixed_by.empty())
                fixed.push_back(r_.variables[j].name);
        out = fmt::format("Matching {} fixes {} in the model; {} then is {} in the model against "
                          "{} in the prototype, so these groups cannot all be matched with the "
                          "given model values.",
                          labels(fixers), join(fixed, " and "), label(g),
                          number_text(model.value()), number_text(prototype.value()));
    }

    // A fluid is sought by its viscosity or surface tension far more often than by its density,
    // so densities come last.
    std::vector<std::string> needs;
    std::vector<std::string> density_needs;
    const auto& a = exponents(g);
    for (std::size_t j = 0; j < a.size(); ++j)
        if (!a[j].is_zero() && model_[j].from == origin::given && prototype_[j])
            (is_density(r_.variables[j].dim) ? density_needs : needs).push_back(requirement(g, j));
    needs.insert(needs.end(), density_needs.begin(), density_needs.end());
    if (needs.empty()) {
        out += fmt::format(" No given model value enters {}, so only another length scale or "
                           "other model values could change it.",
                           label(g));
        return out;
    }
    out += fmt::format(" To match {} as well, the model would need {}.", label(g),
                       join(needs, "; or "));
    if (!fixers.empty())
        out += fmt::format(" Where no model fluid has such a property, the model can only be run "
                           "with {} matched, and the scale effects of {} have to be estimated "
                           "and corrected for.",
                           labels(fixers), label(g));
    return out;
}

void planner::solve(bool with_dependent) {
    const std::size_t count = r_.analysis.groups.size();
    const auto in_phase = [&](std::size_t g) {
        return !resolved_[g] && usable(g) &&
               (with_dependent || !r_.analysis.groups[g].has_dependent);
    };
    for (;;) {
        for (std::size_t g = 0; g < count; ++g)
            if (in_phase(g) && unknowns_in(g).empty())
                check(g);
        // Groups fixed by geometry and gravity alone go first: gravity cannot be changed, while
        // the given fluid properties are what a conflict explanation can ask to change. That is
        // how a ship or spillway model ends up at Froude similarity rather than Reynolds.
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

similitude_plan planner::run() {
    validate_inputs();
    const std::size_t count = r_.analysis.groups.size();
    const bool scale_ok = std::isfinite(r_.length_scale) && r_.length_scale > 0.0;
    if (!r_.analysis.problems.empty() || !scale_ok) {
        for (std::size_t g = 0; g < count; ++g) {
            group_values gv;
            gv.group = g;
            if (group_proto_[g])
                gv.prototype = group_proto_[g]->value();
            plan_.groups.push_back(gv);
        }
        return std::move(plan_);
    }

    assign_known_model_values();
    resolved_.assign(count, false);
    solve(false);
    solve(true);

    const auto values = model_values();
    for (std::size_t g = 0; g < count; ++g) {
        group_values gv;
        gv.group = g;
        const auto model = evaluate(g, values);
        if (group_proto_[g])
            gv.prototype = group_proto_[g]->value();
        if (model)
            gv.model = model->value();
        gv.matched = model && group_proto_[g] && agree(*model, *group_proto_[g]);
        plan_.groups.push_back(gv);
    }
    for (std::size_t j = 0; j < model_.size(); ++j) {
        const model_state& m = model_[j];
        model_variable mv;
        mv.variable = j;
        if (m.value)
            mv.value = m.value->value();
        switch (m.from) {
        case origin::given:
            mv.how = "given";
            break;
        case origin::scaled:
            mv.how = "scaled by the length scale";
            break;
        case origin::gravity:
            mv.how = "same as the prototype (gravity)";
            break;
        case origin::solved:
            mv.how = "from " + labels(m.fixed_by) + (m.fixed_by.size() > 1 ? " together" : "");
            break;
        case origin::unknown:
            mv.how = "free: no group fixes it";
            break;
        }
        plan_.model.push_back(std::move(mv));
    }
    return std::move(plan_);
}

} // namespace

similitude_plan plan_model(const similitude_request& request) {
    return planner(request).run();
}

std::string_view similitude_caution() {
    return caution_text;
}

} // namespace plumb
