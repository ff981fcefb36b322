// The model planner, step by step: fix the given values (plan_givens.cpp), solve for the free
// ones (plan_solve.cpp), judge each group (plan_judge.cpp), explain what cannot match
// (plan_explain.cpp). similitude.cpp runs the steps and weighs the alternatives.
#pragma once

#include "groups/plan_text.hpp"
#include "plumb/groups.hpp"

#include <cmath>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace plumb::planning {

// Values are carried as sign and logarithm of the magnitude, so that products of large powers
// (a Reynolds number of 1e9 to the third power) never overflow before the end.
struct signed_log {
    int sign = 1;
    double log = 0.0;
    [[nodiscard]] double value() const { return sign * std::exp(log); }
};

inline std::optional<signed_log> to_signed_log(double v) {
    if (!std::isfinite(v) || v == 0.0)
        return std::nullopt;
    return signed_log{v < 0 ? -1 : 1, std::log(std::fabs(v))};
}

// A value that can be printed and computed with: a normal double. Zero, infinity and NaN are
// never a model value and never "matched", however well their logarithms agree.
inline bool representable(const signed_log& v) {
    return std::isnormal(v.value());
}

// no_value: a group would fix it, but no real, representable value does (the signs on the
// prototype and model lines disagree, or the value is beyond a double); the plan says which.
enum class origin { unknown, given, scaled, gravity, solved, no_value };

struct model_state {
    origin from = origin::unknown;
    std::optional<signed_log> value;
    // model/prototype = λ^power when the ratio is a pure power of the length scale; it lets an
    // explanation say "λ^(3/2)" rather than only a number.
    std::optional<rational> power;
    std::vector<std::size_t> fixed_by; // groups that fixed a solved variable
};

// Which groups may fix the model's free variables.
struct plan_choice {
    std::vector<std::size_t> match; // chosen groups; they fix variables first
    // Whether groups that were not chosen may fix what is still free (a discharge group fixing
    // the model discharge once the Froude number fixed the speed). Off for the part of a plan
    // that every alternative shares.
    bool others_may_fix = true;
    bool chosen_by_user = false; // the model line said "match"
};

class planner {
  public:
    planner(const similitude_request& request, plan_choice choice)
        : r_(request), choice_(std::move(choice)) {}

    similitude_plan run();

  private:
    // Shared by every step (similitude.cpp).
    [[nodiscard]] std::string label(std::size_t g) const;
    [[nodiscard]] std::string labels(const std::vector<std::size_t>& gs) const;
    [[nodiscard]] const std::vector<rational>& exponents(std::size_t g) const {
        return r_.analysis.groups[g].exponents;
    }
    [[nodiscard]] bool chosen(std::size_t g) const;
    [[nodiscard]] std::vector<std::size_t> groups_with(std::size_t variable) const;
    [[nodiscard]] const shown_unit* unit_of(std::size_t j) const;

    // Fix the given values: check the inputs, take the model's given values, scale the lengths,
    // keep gravity (plan_givens.cpp).
    [[nodiscard]] std::optional<double> prototype_input(std::size_t j) const;
    [[nodiscard]] std::optional<double> model_input(std::size_t j) const;
    std::optional<signed_log> checked_value(std::size_t j, double v, std::string_view whose);
    void validate_inputs();
    void assign_known_model_values();

    // Solve for the free ones (plan_solve.cpp).
    [[nodiscard]] std::vector<std::size_t> unknowns_in(std::size_t g) const;
    [[nodiscard]] bool usable(std::size_t g) const;
    [[nodiscard]] std::size_t given_count(std::size_t g) const;
    void solve(bool chosen_only, bool with_dependent);
    void fix_single(std::size_t g, std::size_t u);
    bool solve_system(const std::vector<std::size_t>& candidates);
    // Keeps a solved value only when it is representable, else says why and leaves it out.
    void settle(std::size_t u, signed_log value, const std::vector<std::size_t>& fixed_by);
    void withhold(std::size_t u, const std::vector<std::size_t>& fixed_by);
    // The sign each group's known model values give it, times the prototype's sign.
    [[nodiscard]] int needed_sign(std::size_t g) const;
    // Whether the model values satisfy group g to the rounding of the arithmetic, whatever the
    // user's tolerance: the plan's own check that what it solved matches what it solved for.
    [[nodiscard]] bool satisfied(std::size_t g) const;

    // Judge each group (plan_judge.cpp).
    [[nodiscard]] std::optional<signed_log>
    evaluate(std::size_t g, const std::vector<std::optional<signed_log>>& values) const;
    [[nodiscard]] std::vector<std::optional<signed_log>> model_values() const;
    [[nodiscard]] bool agree(const signed_log& a, const signed_log& b) const;
    void check(std::size_t g);
    [[nodiscard]] group_values judge(std::size_t g) const;
    [[nodiscard]] std::string scale_effect(std::size_t g, double ratio) const;
    void report_unrepresentable_groups();

    // Explain what cannot match (plan_explain.cpp).
    [[nodiscard]] std::optional<std::string> requirement(std::size_t g, std::size_t j) const;
    [[nodiscard]] std::string explain_conflict(std::size_t g,
                                               const std::vector<std::size_t>& fixers,
                                               const signed_log& model) const;

    const similitude_request& r_;
    plan_choice choice_;
    similitude_plan plan_;
    std::vector<bool> group_ok_;                         // exponents fit the variables
    std::vector<std::optional<signed_log>> prototype_;   // per variable
    std::vector<std::optional<signed_log>> group_proto_; // per group
    std::vector<model_state> model_;
    std::vector<bool> resolved_; // group used to fix a variable, or checked
};

} // namespace plumb::planning
