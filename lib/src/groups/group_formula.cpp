// The text of a group: numerator factors, then the denominator, in the variables' order.
#include "plumb/groups.hpp"

#include <cstdint>
#include <stdexcept>
#include <utility>

namespace plumb {
namespace {

// |n| as text without negating: a whole rational may hold INT64_MIN, whose negation overflows,
// and a formula is printed for reports, so it must not throw on a value it was handed.
std::string magnitude_text(std::int64_t n) {
    const std::uint64_t m =
        n < 0 ? std::uint64_t{0} - static_cast<std::uint64_t>(n) : static_cast<std::uint64_t>(n);
    return std::to_string(m);
}

// "x", "x^2", "x^(1/2)": the exponent's magnitude, since the side of the bar gives the sign.
void append_factor(std::string& out, std::string_view name, rational e) {
    out += name;
    if (e.is_integer() && (e.num() == 1 || e.num() == -1))
        return;
    out += '^';
    if (e.is_integer()) {
        out += magnitude_text(e.num());
        return;
    }
    out += '(';
    out += magnitude_text(e.num());
    out += '/';
    out += std::to_string(e.den());
    out += ')';
}

} // namespace

std::string group_formula(std::span<const group_variable> variables,
                          std::span<const rational> exponents) {
    if (variables.size() != exponents.size())
        throw std::invalid_argument("group_formula: one exponent per variable is needed");
    std::string numerator;
    std::string denominator;
    std::size_t below = 0;
    for (std::size_t i = 0; i < variables.size(); ++i) {
        const rational e = exponents[i];
        if (e.is_zero())
            continue;
        std::string& side = e.num() > 0 ? numerator : denominator;
        if (!side.empty())
            side += '*';
        append_factor(side, variables[i].name, e);
        if (e.num() < 0)
            ++below;
    }
    // Characters are appended rather than strings assigned or concatenated: g++ 12 at -O2
    // reports a false -Wrestrict on those here (GCC bug 105651), which -Werror would make fatal.
    if (numerator.empty())
        numerator += '1';
    if (below == 0)
        return numerator;
    std::string out = std::move(numerator);
    out += '/';
    if (below > 1)
        out += '(';
    out += denominator;
    if (below > 1)
        out += ')';
    return out;
}

} // namespace plumb
