// Units' factors as exact rationals, where their definitions are exact.
#pragma once

#include "plumb/rational.hpp"
#include "plumb/unit_table.hpp"

#include <optional>

namespace plumb {

// The row's factor as an exact rational, read once from `exact_factor` into a table built on
// first use (thread-safely). Empty where the factor is not exact: the source says "rounded" or
// "measured", the text involves π, or it does not fit a 64-bit fraction. Rows outside the
// built-in table (units a file defines) are read on each call.
std::optional<rational> exact_factor(const unit_definition& row);

// A prefixed unit's factor exactly: the row's exact factor times 10^n. Empty when the row is
// not exact or the product does not fit.
std::optional<rational> exact_factor(const resolved_unit& unit);

// a × b, a / b and aⁿ for whole n, exactly; empty when either is empty or the result does
// not fit 64 bits (the caller keeps its double).
std::optional<rational> exact_product(const std::optional<rational>& a,
                                      const std::optional<rational>& b, bool divide);
std::optional<rational> exact_power(const std::optional<rational>& a, const rational& power);

} // namespace plumb
