// Decides which numbers in a formula are conversion factors: the ones whose product reconciles
// the units of the terms that meet, found by trying the subsets of each term's numbers.
#include "check/scale_match.hpp"

#include "plumb/unit_table.hpp"

#include <algorithm>
#include <array>
#include <cmath>
#include <fmt/format.h>
#include <vector>

namespace plumb {
namespace {

bool is_power_of_ten(double v, int* power = nullptr) {
    if (!(v > 0) || !std::isfinite(v))
        return false;
    const double k = std::round(std::log10(v));
    if (std::abs(v / std::pow(10.0, k) - 1.0) > 1e-12)
        return false;
    if (power != nullptr)
        *power = static_cast<int>(k);
    return true;
}

// Ratios of two table units of one dimension (and of squares and cubes of lengths), sorted:
// 0.3048, 3.28084, 144, 1728, 6894.76...
const std::vector<double>& unit_ratios() {
    static const std::vector<double> ratios = [] {
        std::vector<double> out;
        const auto units = unit_table::standard().units();
        const dimension length = unit_table::standard().resolve("m")->dim();
        for (const auto& a : units)
            for (const auto& b : units) {
                if (&a == &b || a.exponents != b.exponents || !(a.factor > 0) || !(b.factor > 0))
                    continue;
                const double r = a.factor / b.factor;
                if (std::abs(r - 1.0) < 1e-9 || is_power_of_ten(r))
                    continue;
                out.push_back(r);
                if (a.dim() == length) {
                    out.push_back(r * r);
                    out.push_back(r * r * r);
                }
            }
        std::sort(out.begin(), out.end());
        return out;
    }();
    return ratios;
}

bool is_unit_ratio(double v, double tolerance) {
    const auto& ratios = unit_ratios();
    const auto it = std::lower_bound(ratios.begin(), ratios.end(), v * (1.0 - tolerance - 1e-12));
    return it != ratios.end() && *it <= v * (1.0 + tolerance + 1e-12);
}

struct subset_value {
    double product = 1.0;
    double tolerance = 0.0;
};

// The search tries every subset of each operand's numbers against every other operand's, so
// its cost grows as (operands × 2^numbers)²: the numbers searched shrink as operands grow,
// keeping one search to about 2.6e5 steps whatever the input.
std::size_t searched(const scaled_operand& op, std::size_t operand_count) {
    std::size_t cap = 0;
    while (cap < 8 && operand_count * (std::size_t{2} << cap) <= 512)
        ++cap;
    return std::min(op.literals.size(), cap);
}

subset_value subset(const scaled_operand& op, std::size_t index, std::uint32_t mask,
                    flipped_literal flip) {
    subset_value s;
    for (std::size_t k = 0; mask != 0; ++k, mask >>= 1) {
        if ((mask & 1U) == 0)
            continue;
        const scale_literal& l = op.literals[k];
        double e = l.exponent;
        if (flip.operand == index && flip.literal == k)
            e = -e;
        s.product *= e == 1.0 ? l.value : (e == -1.0 ? 1.0 / l.value : std::pow(l.value, e));
        s.tolerance += std::abs(e) * l.tolerance;
    }
    return s;
}

// Whether some choice of the operand's numbers as conversions gives the unit u.
bool reaches(const scaled_operand& op, std::size_t index, std::size_t count, double u,
             double u_tolerance, flipped_literal flip, bool* without_literals) {
    const std::size_t n = searched(op, count);
    for (std::uint32_t mask = 0; mask < (1U << n); ++mask) {
        const subset_value s = subset(op, index, mask, flip);
        const double unit = op.scale / s.product;
        if (std::abs(unit / u - 1.0) <= s.tolerance + u_tolerance + 1e-9) {
            if (without_literals != nullptr)
                *without_literals = mask == 0;
            return true;
        }
    }
    return false;
}

} // namespace

// 10^k without a logarithm or a power function: numbers are read on the hot path.
double power_of_ten_value(int k) {
    static const std::array<double, 61> table = [] {
        std::array<double, 61> t{};
        for (int i = 0; i < 61; ++i)
            t[static_cast<std::size_t>(i)] = std::pow(10.0, i - 30);
        return t;
    }();
    return k >= -30 && k <= 30 ? table[static_cast<std::size_t>(k + 30)] : std::pow(10.0, k);
}

scale_literal read_literal(std::string_view text, double value, std::uint32_t node) {
    scale_literal l;
    l.value = std::abs(value);
    l.node = node;
    if (!(l.value > 0) || !std::isfinite(l.value)) {
        l.value = 1.0;
        return l;
    }
    const std::size_t e = text.find_first_of("eE");
    const std::string_view mantissa = text.substr(0, e);
    int exponent = 0;
    if (e != std::string_view::npos) {
        bool negative = false;
        for (std::size_t i = e + 1; i < text.size(); ++i) {
            if (text[i] == '-')
                negative = true;
            else if (text[i] >= '0' && text[i] <= '9' && exponent < 1000)
                exponent = exponent * 10 + (text[i] - '0');
        }
        exponent = negative ? -exponent : exponent;
    }
    const std::size_t point_at = mantissa.find('.');
    const bool has_point = point_at != std::string_view::npos;
    const std::size_t point = has_point ? point_at : mantissa.size();
    const int decimals = has_point ? static_cast<int>(mantissa.size() - point - 1) : 0;
    int significant = 0;
    int first_place = 0; // the power of ten of the first significant digit
    bool only_a_one = true;
    for (std::size_t i = 0; i < mantissa.size(); ++i) {
        const char c = mantissa[i];
        if (c < '0' || c > '9' || (significant == 0 && c == '0'))
            continue;
        if (significant == 0)
            first_place =
                i < point ? static_cast<int>(point - i - 1) : -static_cast<int>(i - point);
        else if (c != '0')
            only_a_one = false;
        if (significant == 0 && c != '1')
            only_a_one = false;
        ++significant;
    }
    // Trailing zeros of a whole number are not significant (1000 is written as a power of ten).
    if (!has_point)
        for (std::size_t i = mantissa.size(); i > 0 && mantissa[i - 1] == '0' && significant > 1;
             --i)
            --significant;
    // One unit in the last printed digit: published factors are rounded or cut short (8.34 for
    // 8.3454 lb per US gallon and mg/L); no more than 1 % so that a 2 is never a 2.2.
    l.tolerance = std::clamp(power_of_ten_value(exponent - decimals) / l.value, 1e-12, 0.01);
    l.power_of_ten = significant >= 1 && only_a_one;
    l.power = static_cast<std::int8_t>(std::clamp(first_place + exponent, -100, 100));
    const bool whole = !has_point && e == std::string_view::npos;
    l.factor_like = !l.power_of_ten && (whole ? l.value >= 1000 : significant >= 3);
    // Safety and load factors (1.15, 1.35) have 3 digits and may lie near some unit ratio
    // (nautical mile per mile, 1.151); a conversion typed to name a ratio has 4 (3.281).
    l.table_digits = !l.power_of_ten && (whole ? l.value >= 1000 : significant >= 4);
    return l;
}

bool looks_like_conversion(const scale_literal& l, bool allow_hundred) {
    if (l.power_of_ten)
        return std::abs(l.power * l.exponent) >= (allow_hundred ? 2 : 3);
    return l.table_digits && is_unit_ratio(l.value, l.tolerance);
}

double apparent_scale(const scaled_operand& op) {
    double s = op.scale;
    for (const auto& l : op.literals)
        if (looks_like_conversion(l, true))
            s /= std::pow(l.value, l.exponent);
    return s;
}

reconciliation reconcile(std::span<const scaled_operand> ops, flipped_literal flip) {
    reconciliation r;
    if (ops.empty()) {
        r.agree = true;
        return r;
    }
    const std::size_t count = ops.size();
    // Nearly every meeting point agrees as declared.
    if (flip.operand == static_cast<std::size_t>(-1) &&
        std::all_of(ops.begin(), ops.end(), [&](const scaled_operand& o) {
            return std::abs(o.scale / ops[0].scale - 1.0) <= 1e-9;
        })) {
        r.agree = true;
        r.unit = ops[0].scale;
        return r;
    }
    std::size_t best_count = 0;
    double best_unit = ops[0].scale;
    double best_tolerance = 0.0;
    // A long sum tries only a few distinct units, so the search stays linear in its length.
    constexpr std::size_t max_units_tried = 16;
    std::array<double, max_units_tried> tried{};
    std::size_t tried_count = 0;
    for (std::size_t i = 0; i < count && best_count < count; ++i) {
        const std::size_t n = searched(ops[i], count);
        for (std::uint32_t mask = 0; mask < (1U << n) && best_count < count; ++mask) {
            const subset_value s = subset(ops[i], i, mask, flip);
            const double u = ops[i].scale / s.product;
            if (n == 0) {
                if (std::find(tried.begin(),
                              tried.begin() + static_cast<std::ptrdiff_t>(tried_count),
                              u) != tried.begin() + static_cast<std::ptrdiff_t>(tried_count))
                    continue;
                if (tried_count == max_units_tried)
                    break;
                tried[tried_count++] = u;
            }
            std::size_t reached = 0;
            for (std::size_t j = 0; j < count; ++j)
                if (j == i || reaches(ops[j], j, count, u, s.tolerance, flip, nullptr))
                    ++reached;
            if (reached > best_count) {
                best_count = reached;
                best_unit = u;
                best_tolerance = s.tolerance;
            }
        }
    }
    r.unit = best_unit;
    r.agree = best_count == count;
    bool reference_found = false;
    bool odd_found = false;
    for (std::size_t j = 0; j < count; ++j) {
        bool plain = false;
        if (reaches(ops[j], j, count, best_unit, best_tolerance, flip, &plain)) {
            if (!reference_found) {
                r.reference = j;
                reference_found = true;
            }
            r.used_literals = r.used_literals || !plain;
        } else if (!odd_found) {
            r.odd = j;
            odd_found = true;
        }
    }
    return r;
}

std::string format_factor(double factor) {
    static constexpr std::string_view superscripts[] = {"⁰", "¹", "²", "³", "⁴",
                                                        "⁵", "⁶", "⁷", "⁸", "⁹"};
    const auto power_text = [](int k) {
        std::string out = "10";
        if (k < 0)
            out += "⁻";
        for (const char c : std::to_string(k < 0 ? -k : k))
            out += superscripts[c - '0'];
        return out;
    };
    if (!std::isfinite(factor) || factor <= 0)
        return fmt::format("{:g}", factor);
    int k = 0;
    if (is_power_of_ten(factor, &k) ||
        std::abs(factor / std::pow(10.0, std::round(std::log10(factor))) - 1.0) < 1e-9) {
        k = static_cast<int>(std::round(std::log10(factor)));
        if (k >= 0 && k <= 4)
            return "1" + std::string(static_cast<std::size_t>(k), '0');
        if (k < 0 && k >= -3)
            return "0." + std::string(static_cast<std::size_t>(-k - 1), '0') + "1";
        return power_text(k);
    }
    std::string text = fmt::format("{:.6g}", factor);
    const std::size_t e = text.find('e');
    if (e == std::string::npos)
        return text;
    return text.substr(0, e) + " × " + power_text(std::atoi(text.c_str() + e + 1));
}

} // namespace plumb
