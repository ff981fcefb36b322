// The tables of built-in functions: the notation's (NOTATION.md, "Functions", lists the same)
// and the spreadsheet functions plumb checks in workbooks (README, "Spreadsheets").
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

// Argument counts as the spreadsheet applications accept them (ECMA-376 Part 1, 18.17.7;
// OpenFormula, ODF 1.2 Part 2, chapter 6).
const std::array<builtin_function, 50>& sheet_table() {
    using r = function_rule;
    static const std::array<builtin_function, 50> functions = {{
        {"SUM", r::common, 1, unlimited, 1},
        {"AVERAGE", r::common, 1, unlimited, 1},
        {"MEDIAN", r::common, 1, unlimited, 1},
        {"MIN", r::common, 1, unlimited, 1},
        {"MAX", r::common, 1, unlimited, 1},
        {"CEILING", r::common, 1, 2, 1},
        {"FLOOR", r::common, 1, 2, 1},
        {"MROUND", r::common, 2, 2, 1},
        {"PRODUCT", r::product, 1, unlimited, 1},
        {"SUMPRODUCT", r::product, 1, unlimited, 1},
        {"SQRT", r::root, 1, 1, rational(1, 2)},
        {"ABS", r::same, 1, 1, 1},
        {"EXP", r::dimensionless, 1, 1, 1},
        {"LN", r::dimensionless, 1, 1, 1},
        {"LOG10", r::dimensionless, 1, 1, 1},
        {"LOG", r::log_base, 1, 2, 1},
        {"SIN", r::dimensionless, 1, 1, 1},
        {"COS", r::dimensionless, 1, 1, 1},
        {"TAN", r::dimensionless, 1, 1, 1},
        {"ASIN", r::dimensionless, 1, 1, 1},
        {"ACOS", r::dimensionless, 1, 1, 1},
        {"ATAN", r::dimensionless, 1, 1, 1},
        {"SINH", r::dimensionless, 1, 1, 1},
        {"COSH", r::dimensionless, 1, 1, 1},
        {"TANH", r::dimensionless, 1, 1, 1},
        {"ASINH", r::dimensionless, 1, 1, 1},
        {"ACOSH", r::dimensionless, 1, 1, 1},
        {"ATANH", r::dimensionless, 1, 1, 1},
        // ATAN2(x, y) in the spreadsheet order; both agree either way.
        {"ATAN2", r::angle_of, 2, 2, 1},
        {"POWER", r::power, 2, 2, 1},
        {"IF", r::choice, 2, 3, 1},
        {"ROUND", r::keep_first, 2, 2, 1},
        {"ROUNDUP", r::keep_first, 2, 2, 1},
        {"ROUNDDOWN", r::keep_first, 2, 2, 1},
        {"TRUNC", r::keep_first, 1, 2, 1},
        {"INT", r::keep_first, 1, 1, 1},
        {"VLOOKUP", r::lookup, 3, 3, 1},
        {"HLOOKUP", r::lookup, 3, 3, 1},
        {"INDEX", r::pick, 1, 3, 1},
        {"MATCH", r::position, 2, 3, 1},
        {"COUNT", r::count, 1, unlimited, 1},
        {"COUNTA", r::count, 1, unlimited, 1},
        {"ROWS", r::count, 1, 1, 1},
        {"COLUMNS", r::count, 1, 1, 1},
        {"AND", r::logical, 1, unlimited, 1},
        {"OR", r::logical, 1, unlimited, 1},
        {"NOT", r::logical, 1, 1, 1},
        {"RADIANS", r::to_radians, 1, 1, 1},
        {"DEGREES", r::to_degrees, 1, 1, 1},
        {"SIGN", r::logical, 1, 1, 1},
    }};
    return functions;
}

std::string_view without_prefix(std::string_view name) {
    for (const std::string_view prefix : {"_xlfn.", "COM.MICROSOFT.", "ORG.OPENOFFICE."})
        if (name.substr(0, prefix.size()) == prefix)
            return name.substr(prefix.size());
    return name;
}

// Every call of every formula looks its name up: an open-addressed table on the length and
// the first, second and last bytes finds it with one compare rather than a search of the
// list (these weights put each of today's names in a slot of its own; a name added later
// that shares one is still found, a slot further on).
constexpr std::size_t function_slot_count = 64;
constexpr std::uint8_t no_function = 0xFF;

std::size_t function_slot(std::string_view name) {
    const auto byte = [&](std::size_t i) { return static_cast<unsigned char>(name[i]); };
    const std::size_t second = name.size() > 1 ? 1 : 0;
    return (name.size() + byte(0) + 2 * byte(second) + 17 * byte(name.size() - 1)) %
           function_slot_count;
}

const std::array<std::uint8_t, function_slot_count>& function_slots() {
    static const std::array<std::uint8_t, function_slot_count> slots = [] {
        std::array<std::uint8_t, function_slot_count> s{};
        s.fill(no_function);
        for (std::size_t k = 0; k < table().size(); ++k) {
            std::size_t i = function_slot(table()[k].name);
            while (s[i] != no_function)
                i = (i + 1) % function_slot_count;
            s[i] = static_cast<std::uint8_t>(k);
        }
        return s;
    }();
    return slots;
}

} // namespace

const builtin_function* find_function(std::string_view name) {
    if (name.empty())
        return nullptr;
    const auto& slots = function_slots();
    for (std::size_t i = function_slot(name);; i = (i + 1) % function_slot_count) {
        if (slots[i] == no_function)
            return nullptr;
        const builtin_function& f = table()[slots[i]];
        if (f.name == name)
            return &f;
    }
}

std::span<const builtin_function> builtin_functions() {
    return table();
}

const builtin_function* find_sheet_function(std::string_view name) {
    name = without_prefix(name);
    for (const auto& f : sheet_table())
        if (f.name == name)
            return &f;
    return nullptr;
}

std::span<const builtin_function> sheet_functions() {
    return sheet_table();
}

} // namespace plumb
