// Typed expressions and the dimension rules: sums, sides, functions, exponents, symbols.
#pragma once

#include "model/symbol_table.hpp"
#include "model/syntax_tree.hpp"

#include <memory>
#include <optional>
#include <vector>

namespace plumb {

// Checks one formula; marks the symbols it uses; appends findings to `out`. With
// `defer_unknown`, a formula that names a symbol the table lacks is left unchecked (nothing
// is reported) and false is returned: its declaration may come later in the file.
bool check_formula(const syntax::parsed_file& file, const syntax::formula& formula,
                   symbol_table& symbols, std::vector<diagnostic>& out, bool defer_unknown);

// As check_formula, for the formulas of one file in turn: the checker's working state is made
// once per file rather than once per formula (which cost about 150 instructions a formula).
class formula_checker {
  public:
    formula_checker(const syntax::parsed_file& file, symbol_table& symbols,
                    std::vector<diagnostic>& out);
    ~formula_checker();
    formula_checker(const formula_checker&) = delete;
    formula_checker& operator=(const formula_checker&) = delete;

    [[nodiscard]] const syntax::parsed_file& file() const;
    bool check(const syntax::formula& formula, bool defer_unknown);

  private:
    struct state;
    std::unique_ptr<state> state_;
};

// What a spreadsheet formula computes: its dimension, the SI value of one unit of the
// numbers it gives, and the offset scale it is on (°C, gauge), if any.
struct value_type {
    dimension dim;
    double scale = 1.0;
    const unit_definition* offset = nullptr;
    bool zero = false;                   // the literal 0
    std::optional<rational> exact_scale; // scale exactly, where every unit in it is exact
    bool numeric = false;                // built from numbers alone (=55, =IF(C2<=55,55,75))
};

// Checks the single side of a spreadsheet formula lowered into `file` (file.references typed)
// and returns its type; empty when an error was found below it or it is not known.
std::optional<value_type> check_sheet_formula(const syntax::parsed_file& file,
                                              const syntax::formula& formula, symbol_table& symbols,
                                              std::vector<diagnostic>& out);

// The dimension of one expression tree, or empty when it has an error (reported in `out`).
std::optional<dimension> expression_dimension(const syntax::parsed_file& file, std::uint32_t root,
                                              symbol_table& symbols, std::vector<diagnostic>& out);

} // namespace plumb
