// The built-in functions and how each treats the dimensions of its arguments.
#pragma once

#include "plumb/rational.hpp"

#include <cstdint>
#include <span>
#include <string_view>

namespace plumb {

enum class function_rule : std::uint8_t {
    root,          // sqrt, cbrt: dim(x)^power
    same,          // abs: dim(x)
    dimensionless, // exp, ln, log10, trig and hyperbolic: argument and result dimensionless
    log_base,      // log(x, b): both dimensionless
    angle_of,      // atan2(y, x): arguments agree, result dimensionless
    common,        // min, max, hypot: arguments agree, result is their dimension
    power,         // pow(x, p): as x^p
    derivative,    // deriv(y, x[, n]): dim(y) / dim(x)^n
    integral,      // integral(f, x[, a, b]): dim(f) * dim(x); a and b agree with x
    // Spreadsheet functions:
    choice,     // IF(c, a, b): a and b agree; the result is theirs
    product,    // PRODUCT, SUMPRODUCT: the product of the arguments' dimensions
    keep_first, // ROUND(x, n): dim(x); the other arguments dimensionless
    lookup,     // VLOOKUP lowered to (key, key column, result column): key agrees with its
                // column; the result is the result column's
    pick,       // INDEX lowered to (column, i[, j]): the column's; positions dimensionless
    position,   // MATCH(key, range[, type]): key agrees with the range; result dimensionless
    count,      // COUNT, COUNTA: arguments not needed; result dimensionless
    logical,    // AND, OR, NOT: arguments checked as they stand; result dimensionless
    to_radians, // RADIANS(x): x an angle in degrees, result in radians
    to_degrees, // DEGREES(x): x in radians, result in degrees
};

inline constexpr std::uint8_t unlimited_args = 255;

struct builtin_function {
    std::string_view name;
    function_rule rule;
    std::uint8_t min_args;
    std::uint8_t max_args; // unlimited_args: no limit
    rational power;        // for root
};

const builtin_function* find_function(std::string_view name);
// A spreadsheet's function by its name as stored (upper case; "_xlfn." and "COM.MICROSOFT."
// prefixes dropped); null for one plumb does not know.
const builtin_function* find_sheet_function(std::string_view name);
std::span<const builtin_function> sheet_functions();
std::span<const builtin_function> builtin_functions();

} // namespace plumb
