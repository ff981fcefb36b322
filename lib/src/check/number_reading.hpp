// What a number written in a formula stands for: its exact value and how it reads as a
// possible conversion factor (its interval, its digits). Working that out exactly costs a few
// hundred instructions, and the same few numbers (2, 4, 0.5, 1000) recur in every formula, so
// each thread remembers the readings of the numbers it met last.
#pragma once

#include "check/scale_match.hpp"
#include "check/typed_term.hpp"
#include "plumb/rational.hpp"

#include <optional>
#include <string_view>

namespace plumb {

struct number_reading {
    optional_rational value; // exact, when it fits 64-bit fractions; copied into a term as is
    bool zero = false;       // the literal 0, which has no reading as a factor
    scale_literal literal;   // its node is 0: the caller sets where it stands
};

// The reading of `written` (digits, point, exponent as the grammar accepts them). The
// reference stays valid until the next call on the same thread.
const number_reading& read_number(std::string_view written);

} // namespace plumb
