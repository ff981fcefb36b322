// Follows the unit scale of every part of a formula to find the factor that turns a unit-bound
// coefficient ("1.486?") into its value for coherent SI units.
//
// Each subexpression's value with SI numbers is its value with the numbers as declared times a
// scale σ = σ0 · c^p: σ0 a product of unit factors (0.3048 for ft), c the unknown factor of the
// coefficient (k_SI = c·k) and p the power the coefficient has there. Wherever two values must
// agree (the sides of a formula, the terms of a sum, the arguments of min) their scales must be
// equal, and wherever a value must be a pure number (the argument of ln, a base under a
// variable exponent) its scale must be 1; an equation with different powers of c fixes c. A
// formula whose scales cannot be followed (a term in other units, a value on an offset scale
// in a product, another unknown) is not restated, and the reason is given.
#pragma once

#include "model/symbol_table.hpp"
#include "model/syntax_tree.hpp"
#include "plumb/rational.hpp"

#include <cstdint>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace plumb {

// One unit factor of a scale: the unit as declared, its SI value and its power.
struct scale_factor {
    std::string unit;     // "ft/s", "psi"
    double si = 1.0;      // 0.3048
    rational power = 1;   // in the scale it belongs to
    std::uint32_t at = 0; // where the symbol stands, to list factors in the order written
};

// Two sides of a formula whose units disagree by a ratio the coefficient plays no part in:
// it cancels between them, or a sum has already fixed its units ("1 + k?*x").
struct sides_apart {
    std::uint32_t first = 0; // the sides' roots
    std::uint32_t other = 0;
    double ratio = 1.0; // as written, `first` counts this many times `other`
};

struct coefficient_trace {
    bool traced = false;
    std::string why_not;              // when not traced: what stops it, for a note
    std::vector<scale_factor> factor; // k_SI = k · Π si^power, in the order written
    std::vector<std::string> bound;   // "V in ft/s": the symbols in units other than SI's
    std::optional<sides_apart> apart; // when not traced because of that
};

// The function's name in a call's range, which may start with the parentheses of a group.
std::string_view call_name(const source_file& src, const syntax::expr_node& n);

// The value of a constant expression such as 2, -1, 0.54 or (2/3); none when it is not one.
std::optional<rational> constant_of(const syntax::parsed_file& file, std::uint32_t index);

// Traces the scales of formula `f` to fix the factor of the coefficient at node `coefficient`.
// May throw arithmetic_overflow (exponent arithmetic).
coefficient_trace trace_coefficient(const syntax::parsed_file& file, const syntax::formula& f,
                                    std::uint32_t coefficient, symbol_table& symbols);

} // namespace plumb
