// Dimensionless groups of a phenomenon (Buckingham's pi theorem, by exact rational
// elimination), the characteristic numbers they form, and scale-model similitude.
#pragma once

#include "plumb/dimension.hpp"
#include "plumb/rational.hpp"

#include <cstddef>
#include <optional>
#include <span>
#include <string>
#include <string_view>
#include <vector>

namespace plumb {

// ---- Exact linear algebra --------------------------------------------------------------
// Every operation is exact; anything that would leave 64 bits throws arithmetic_overflow.

class rational_matrix {
  public:
    rational_matrix() = default;
    rational_matrix(std::size_t rows, std::size_t cols)
        : rows_(rows), cols_(cols), data_(rows * cols) {}
    [[nodiscard]] std::size_t rows() const { return rows_; }
    [[nodiscard]] std::size_t cols() const { return cols_; }
    rational& at(std::size_t r, std::size_t c) { return data_[r * cols_ + c]; }
    [[nodiscard]] const rational& at(std::size_t r, std::size_t c) const {
        return data_[r * cols_ + c];
    }
    friend bool operator==(const rational_matrix&, const rational_matrix&) = default;

  private:
    std::size_t rows_ = 0;
    std::size_t cols_ = 0;
    std::vector<rational> data_;
};

// Reduced row echelon form in place; returns the pivot columns in order.
std::vector<std::size_t> row_reduce(rational_matrix& m);
std::size_t matrix_rank(const rational_matrix& m);
// A basis of {x : m x = 0}, one column per basis vector (cols() == m.cols() - rank).
rational_matrix nullspace_basis(const rational_matrix& m);

// ---- The problem -----------------------------------------------------------------------

struct group_variable {
    std::string name; // as written in the .plumb file: "ρ", "F_D"
    dimension dim;
    // Declared on a scale with a zero of its own (°C, psig): its values are not proportional to
    // the quantity, so it cannot be a repeating variable.
    bool offset_scale = false;
};

// Rows are the base dimensions that occur in at least one variable, in SI order.
struct dimension_matrix {
    std::vector<base_dimension> rows;
    rational_matrix values; // rows.size() x variables
};
dimension_matrix build_dimension_matrix(std::span<const group_variable> variables);

struct group_request {
    std::vector<group_variable> variables;
    std::vector<std::size_t> dependents; // indices into variables; each gets a group of its own
    std::vector<std::size_t> repeating;  // given by the user; empty: chosen by the rule
};

struct pi_group {
    std::vector<rational> exponents; // one per variable, in the request's order
    std::string formula;             // "ρ*V*D/μ", "F_D/(ρ*V^2*D^2)", "T*g^(1/2)/L^(1/2)"
    bool has_dependent = false;
    // Filled by name_groups: "Reynolds number", "inverse of the Reynolds number",
    // "square of the Froude number"; empty when no named number fits.
    std::string name;
    // How a named group was recombined from the groups elimination gave, written out with
    // their formulas ("(ρ*V*D/μ)^-1", "(g*L^3/ν^2)·(β*ΔT)"); empty when it is one of them.
    std::string recombined_from;
};

struct group_analysis {
    dimension_matrix matrix;
    std::size_t rank = 0;
    std::vector<std::size_t> repeating;
    bool repeating_chosen = false; // by the documented rule rather than by the user
    std::vector<pi_group> groups;  // variables.size() - rank of them
    // When the request cannot be answered (repeating variables not independent or not
    // spanning, the dependent variable among them, too few variables...), the reasons in
    // plain words; groups is then empty.
    std::vector<std::string> problems;
    // Remarks on an answer that is right but less complete than usual: naming cut short in a
    // study too large to search in full.
    std::vector<std::string> notes;
};

// Forms a complete set of independent groups. Each group has one non-repeating variable to
// the first power times powers of the repeating ones, scaled to the smallest whole exponents,
// except the group of the dependent variable, which keeps it to the first power.
// A study of more variables is answered with a problem rather than worked out.
constexpr std::size_t max_study_variables = 1000;
group_analysis analyse_groups(const group_request& request);

// The formula text of a group over `variables` (used by analyse_groups and by recombination).
std::string group_formula(std::span<const group_variable> variables,
                          std::span<const rational> exponents);

// ---- Named characteristic numbers -------------------------------------------------------

struct named_group_match {
    std::string_view name; // "Reynolds number"
    rational power;        // the group is the named number to this power (1, -1, 2, 1/2...)
};

// Recognises a group by the dimensions of its variables and their exponents: the named
// number's defining quantities, possibly to a power. Ambiguous cases name all candidates.
std::vector<named_group_match> recognise_group(std::span<const group_variable> variables,
                                               std::span<const rational> exponents);

// Names every group, recombining unnamed basis groups (products and powers of two of them)
// into named numbers where that keeps the set independent, and says which.
// Each group is tried with every other, so the work grows with the square of the number of
// groups: past `max_pairs` pairs (every pair of a study of up to 50 groups) the remaining groups
// keep the form elimination gave them, and a note in `analysis.notes` says so.
constexpr std::size_t default_max_group_pairs = 2500;
void name_groups(group_analysis& analysis, std::span<const group_variable> variables,
                 std::size_t max_pairs = default_max_group_pairs);

// ---- Similitude --------------------------------------------------------------------------

// How a variable's values are written: the unit the user gave or declared. SI value =
// number * factor + offset.
struct shown_unit {
    std::string text; // "kN", "rpm"; empty: dimensionless or coherent SI
    double factor = 1.0;
    double offset = 0.0;
};

// Agreement to about four significant digits: a model speed rounded to four digits still
// matches its Froude number (common practice in reporting model test conditions).
constexpr double default_match_tolerance = 1e-3;

struct similitude_request {
    std::vector<group_variable> variables;
    group_analysis analysis;                      // groups over those variables
    std::vector<std::optional<double>> prototype; // SI value per variable
    double length_scale = 1.0;                    // model length / prototype length
    std::vector<std::optional<double>> model;     // SI values given for the model (its fluid)
    // The groups the model must match, as the user chose them; empty: every group, and where
    // they cannot all match, the plan lists the alternatives instead of choosing.
    std::vector<std::size_t> match;
    double tolerance = default_match_tolerance; // relative; a group within it counts as matched
    std::vector<shown_unit> units;              // per variable; missing ones show coherent SI
    // The unit the user declared for a kinematic viscosity (a symbol ν or nu), in which a
    // conflict states the ν a model fluid needs; empty: m^2/s.
    shown_unit kinematic_viscosity_unit;
};

struct group_values {
    std::size_t group;
    std::optional<double> prototype;
    std::optional<double> model;
    bool matched = false;
    // For a group that is not matched: model / prototype, and which way the scale effect goes
    // ("lower in the model: viscous forces count for more in the model than at full size").
    std::optional<double> ratio;
    std::string scale_effect;
};

struct model_variable {
    std::size_t variable;
    std::optional<double> value; // SI; empty when it cannot be fixed
    std::string how;             // "scaled by the length scale", "given", "from the Froude number"
};

struct unmatched_groups {
    std::vector<std::size_t> groups; // groups that cannot all match at once
    std::string explanation;         // in plain words, with the property a model fluid would need
};

// One way to run a model whose groups cannot all match: match this group, and these are off.
struct plan_alternative {
    std::size_t group;                 // the group matched
    std::vector<model_variable> fixed; // the variables matching it fixes
    std::vector<group_values> off;     // the groups then not matched
};

struct similitude_plan {
    std::vector<group_values> groups;
    std::vector<model_variable> model;
    std::vector<unmatched_groups> conflicts;
    // Filled when no groups were chosen and not all can match: the plan then fixes only what
    // every choice agrees on, and lists the choices.
    std::vector<plan_alternative> alternatives;
    std::vector<std::string> problems; // missing prototype values and the like
};

similitude_plan plan_model(const similitude_request& request);

// Said with every model plan: partial similarity, scale effects, codes of practice.
std::string_view similitude_caution();

} // namespace plumb
