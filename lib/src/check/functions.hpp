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
std::span<const builtin_function> builtin_functions();

} // namespace plumb
