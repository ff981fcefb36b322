// Typed expressions and the dimension rules: sums, sides, functions, exponents, symbols.
#pragma once

#include "model/symbol_table.hpp"
#include "model/syntax_tree.hpp"

#include <optional>
#include <vector>

namespace plumb {

// Checks one formula; marks the symbols it uses; appends findings to `out`. With
// `defer_unknown`, a formula that names a symbol the table lacks is left unchecked (nothing
// is reported) and false is returned: its declaration may come later in the file.
bool check_formula(const syntax::parsed_file& file, const syntax::formula& formula,
                   symbol_table& symbols, std::vector<diagnostic>& out, bool defer_unknown);

// The dimension of one expression tree, or empty when it has an error (reported in `out`).
std::optional<dimension> expression_dimension(const syntax::parsed_file& file, std::uint32_t root,
                                              symbol_table& symbols, std::vector<diagnostic>& out);

} // namespace plumb
