// Named physical constants for the `{name}` notation: `W = m * {g_n}`, `p*V = n*{R}*T`.
// Each row has its dimension, its SI value and where the value comes from.
#pragma once

#include "plumb/dimension.hpp"

#include <array>
#include <cstdint>
#include <span>
#include <string_view>

namespace plumb {

// One row of the table of constants.
//
// `value` is the double nearest the constant's SI value. For a constant fixed by definition
// (c_0, h, q_e, k_B, N_A, g_n, p_atm) `exact_text` is that exact value. For one that is exact
// only as a product of fixed constants (R = N_A·k_B, F = N_A·q_e, σ from k_B, h, c_0)
// `exact_text` holds the digits CODATA prints, which CODATA follows with "..." because the
// expansion goes on; `value` is then computed from the defining constants, not from those
// digits. For a measured constant (G) `exact_text` is the recommended value and `source`
// gives its standard uncertainty.
struct physical_constant {
    std::string_view symbol; // as written inside braces: "g_n", "R", "σ", "k_B"
    std::string_view name;   // "standard acceleration of gravity"
    std::array<std::int8_t, base_dimension_count> exponents; // M L T Θ N I J
    double value;                                            // SI value
    std::string_view exact_text; // the value as published ("9.80665", "8.314462618")
    bool exact;                  // exact by definition (SI 2019 or CGPM) vs. measured (CODATA)
    std::string_view source;     // "SI Brochure 9th ed., Table 1", "CODATA 2018", ...

    [[nodiscard]] dimension dim() const;
};

// The row written as `symbol` inside braces, or null. Symbols are case-sensitive ("G" is the
// gravitational constant, "g_n" standard gravity). ASCII spellings of Greek symbols are
// accepted too: "sigma" and "sigma_SB" find σ.
const physical_constant* find_constant(std::string_view symbol);

// All rows, each once (aliases are not rows).
std::span<const physical_constant> constants();

} // namespace plumb
