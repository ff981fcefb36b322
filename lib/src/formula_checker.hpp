// Typed expressions and the dimension rules: sums, sides, functions, exponents, symbols.
#pragma once

#include "symbol_table.hpp"
#include "syntax_tree.hpp"

#include <optional>
#include <vector>

namespace plumb {

// Checks every formula of `file`; marks the symbols it uses; appends findings to `out`.
void check_formulas(const syntax::parsed_file& file, symbol_table& symbols,
                    std::vector<diagnostic>& out);

// The dimension of one expression tree, or empty when it has an error (reported in `out`).
std::optional<dimension> expression_dimension(const syntax::parsed_file& file, std::uint32_t root,
                                              symbol_table& symbols, std::vector<diagnostic>& out);

} // namespace plumb
