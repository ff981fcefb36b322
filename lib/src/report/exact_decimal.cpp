#include "report/exact_decimal.hpp"

#include <fmt/format.h>

namespace plumb {
namespace {

// Room for a 64-bit denominator times ten during long division.
__extension__ using wide = __int128;

constexpr std::size_t digits_when_endless = 12;
// Positional notation between 10^-6 and 10^12; beyond, a power of ten reads better.
constexpr int smallest_positional = -6;
constexpr int largest_positional = 12;

bool terminates(std::int64_t den) {
    while (den % 2 == 0)
        den /= 2;
    while (den % 5 == 0)
        den /= 5;
    return den == 1;
}

struct digits {
    std::string significant; // no leading zeros
    int exponent = 0;        // value = 0.d1d2d3… × 10^(exponent + 1), i.e. d1 is at 10^exponent
    bool complete = true;
};

// Long division of num/den (both positive): the significant digits and the place of the first.
digits divide(wide num, wide den, bool ends) {
    digits out;
    while (num >= den * 10) {
        den *= 10;
        ++out.exponent;
    }
    while (num < den) {
        num *= 10;
        --out.exponent;
    }
    // A terminating decimal of a 64-bit denominator has at most 63 places after the point.
    const std::size_t limit = ends ? 100 : digits_when_endless;
    while (num != 0 && out.significant.size() < limit) {
        out.significant += static_cast<char>('0' + static_cast<int>(num / den));
        num = (num % den) * 10;
    }
    out.complete = num == 0;
    return out;
}

std::string positional(const digits& d) {
    std::string s = d.significant;
    if (d.exponent >= 0) {
        const auto whole = static_cast<std::size_t>(d.exponent) + 1;
        if (s.size() <= whole)
            return s + std::string(whole - s.size(), '0');
        return s.substr(0, whole) + "." + s.substr(whole);
    }
    return "0." + std::string(static_cast<std::size_t>(-d.exponent - 1), '0') + s;
}

std::string scientific(const digits& d) {
    const std::string& s = d.significant;
    const std::string mantissa = s.size() == 1 ? s : s.substr(0, 1) + "." + s.substr(1);
    return fmt::format("{}{} \u00D7 10^{}", mantissa, d.complete ? "" : "\u2026", d.exponent);
}

} // namespace

std::optional<exact_number> read_exact(std::string_view text) {
    const std::size_t e = text.find_first_of("eE");
    if (e == std::string_view::npos) {
        if (auto r = rational::parse(text))
            return exact_number{*r, 0};
        return std::nullopt;
    }
    const auto mantissa = rational::parse(text.substr(0, e));
    std::string_view power = text.substr(e + 1);
    bool negative = false;
    if (!power.empty() && (power.front() == '-' || power.front() == '+')) {
        negative = power.front() == '-';
        power.remove_prefix(1);
    }
    if (!mantissa || power.empty() || power.size() > 4)
        return std::nullopt;
    int p = 0;
    for (const char c : power) {
        if (c < '0' || c > '9')
            return std::nullopt;
        p = p * 10 + (c - '0');
    }
    return exact_number{*mantissa, negative ? -p : p};
}

std::string decimal_text(const exact_number& n) {
    const rational& m = n.mantissa;
    if (m.is_zero())
        return "0";
    const bool ends = terminates(m.den());
    const bool negative = m.num() < 0;
    const wide num = negative ? -static_cast<wide>(m.num()) : static_cast<wide>(m.num());
    digits d = divide(num, static_cast<wide>(m.den()), ends);
    d.exponent += n.power_of_ten;
    const bool in_place = d.exponent >= smallest_positional && d.exponent <= largest_positional;
    std::string text = in_place ? positional(d) + (d.complete ? "" : "\u2026") : scientific(d);
    if (negative)
        text.insert(0, "-");
    if (d.complete)
        return text;
    const std::string fraction =
        n.power_of_ten == 0 ? m.to_string()
                            : fmt::format("{} \u00D7 10^{}", m.to_string(), n.power_of_ten);
    return fmt::format("{} ({})", text, fraction);
}

} // namespace plumb
