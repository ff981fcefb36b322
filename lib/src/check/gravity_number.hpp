// "ρ*9.81*h", "0.052*MW*TVD", "p/(ρ*32.2)": a number that stands for standard gravity in the
// units around it. Engineers write g as a number far more often than as a symbol; a term that
// lacks exactly an acceleration, and holds g_n expressed in its own units, is read that way.
#pragma once

#include "check/scale_match.hpp"
#include "plumb/dimension.hpp"

#include <optional>
#include <span>
#include <string>
#include <string_view>

namespace plumb {

struct gravity_reading {
    std::size_t literal = 0; // which of the term's numbers stands for g_n
    double stands_for = 0.0; // g_n in the units around it: what that number rounds
    double term_scale = 1.0; // the term's SI value per written value, once the number is g_n
};

// `fits[k]` says that the term lacks an acceleration to the power of number k's exponent on
// its path: 1 in ρ*9.81*h beside a pressure, -1 in p/(ρ*9.81) beside a length, 1/2 in
// sqrt(2*9.81*h) beside a speed. `texts` are the numbers as written, for how finely each is
// rounded. The number must round g_n in those units to its last printed digit
// and lie within 0.5 % of it, so that 10 is not read as g (2 % off) but 9.8, 9.81, 32.2 and
// the oilfield's 0.052 are.
std::optional<gravity_reading> read_gravity_number(double term_scale, double reference_scale,
                                                   std::span<const scale_literal> literals,
                                                   std::span<const std::string_view> texts,
                                                   std::span<const bool> fits);

// Whether a term lacking `lacking` lacks an acceleration to the power `exponent` (1, -1, 1/2...),
// the power a number enters the term with.
bool lacks_gravity_to(const dimension& lacking, double exponent);

// The note's words for a number read as g_n, `stands_for` being g_n in the units around it.
std::string gravity_message(std::string_view written, double stands_for);

// Half a unit in the last printed digit of a number as written: 0.005 for "9.81", 0.5 for
// "32", 0.0005 for "0.052", 50 for "9.8e3"'s... (mantissa digits times the exponent).
double half_unit_in_last_digit(std::string_view text);

} // namespace plumb
