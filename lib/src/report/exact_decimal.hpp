// Exact numbers written for people: a decimal when it ends, else its leading digits and "…"
// beside the exact fraction. No binary floating point touches the digits.
#pragma once

#include "plumb/rational.hpp"

#include <optional>
#include <string>
#include <string_view>

namespace plumb {

struct exact_number {
    rational mantissa;    // the value is mantissa × 10^power_of_ten
    int power_of_ten = 0; // lets 1.66e-27 or a quecto prefix stay exact beyond 64 bits
};

// "0.3048", "1.5e-3", "5/9", "1.66053906660e-27"; empty when the text is none of these.
std::optional<exact_number> read_exact(std::string_view text);

// The number as a decimal: every digit when it terminates ("0.3048", "3600000000"), else
// twelve significant digits, "…" and the fraction ("0.555555555555… (5/9)"). Very large and
// very small values are written "d.ddd × 10^n".
std::string decimal_text(const exact_number& n);

} // namespace plumb
