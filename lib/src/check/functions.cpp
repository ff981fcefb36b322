// The table of built-in functions (NOTATION.md, "Functions", lists the same).
#include "check/functions.hpp"

#include <array>

namespace plumb {
namespace {

constexpr std::uint8_t unlimited = unlimited_args;

const std::array<builtin_function, 26>& table() {
    using r = function_rule;
    static const std::array<builtin_function, 26> functions = {{
        {"sqrt", r::root, 1, 1, rational(1, 2)},
        {"cbrt", r::root, 1, 1, rational(1, 3)},
        {"abs", r::same, 1, 1, 1},
        {"exp", r::dimensionless, 1, 1, 1},
        {"ln", r::dimensionless, 1, 1, 1},
        {"log10", r::dimensionless, 1, 1, 1},
        {"log", r::log_base, 2, 2, 1},
        {"sin", r::dimensionless, 1, 1, 1},
        {"cos", r::dimensionless, 1, 1, 1},
        {"tan", r::dimensionless, 1, 1, 1},
        {"asin", r::dimensionless, 1, 1, 1},
        {"acos", r::dimensionless, 1, 1, 1},
        {"atan", r::dimensionless, 1, 1, 1},
        {"sinh", r::dimensionless, 1, 1, 1},
        {"cosh", r::dimensionless, 1, 1, 1},
        {"tanh", r::dimensionless, 1, 1, 1},
        {"asinh", r::dimensionless, 1, 1, 1},
        {"acosh", r::dimensionless, 1, 1, 1},
        {"atanh", r::dimensionless, 1, 1, 1},
        {"atan2", r::angle_of, 2, 2, 1},
        {"min", r::common, 2, unlimited, 1},
        {"max", r::common, 2, unlimited, 1},
        {"hypot", r::common, 2, 3, 1},
        {"pow", r::power, 2, 2, 1},
        {"deriv", r::derivative, 2, 3, 1},
        {"integral", r::integral, 2, 4, 1},
    }};
    return functions;
}

} // namespace

const builtin_function* find_function(std::string_view name) {
    for (const auto& f : table())
        if (f.name == name)
            return &f;
    return nullptr;
}

std::span<const builtin_function> builtin_functions() {
    return table();
}

} // namespace plumb
