// Decides which numbers in a formula are conversion factors: the ones whose product reconciles
// the units of the terms that meet, found by trying the subsets of each term's numbers. The
// decision is exact: a number stands for every value its printed digits may round from (half a
// unit in its last digit), compared with the units' exact factors as fractions.
#include "check/scale_match.hpp"

#include "plumb/unit_table.hpp"
#include "units/exact_factor.hpp"

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

// Doubles decide when they are clearly apart; closer than this, the exact fractions decide.
constexpr double double_doubt = 1e-9;

// A value known as a double and, where every part of it is exact, as a fraction.
struct exact_or_double {
    double approx = 1.0;
    std::optional<rational> exact = rational(1);
};

exact_or_double times(const exact_or_double& a, const exact_or_double& b, bool divide = false) {
    return {divide ? a.approx / b.approx : a.approx * b.approx,
            exact_product(a.exact, b.exact, divide)};
}

// a ≤ b: exactly where both are exact; else as doubles, within the rounding of a table value.
bool at_most(const exact_or_double& a, const exact_or_double& b) {
    if (a.approx < b.approx * (1.0 - double_doubt))
        return true;
    if (a.approx > b.approx * (1.0 + double_doubt))
        return false;
    if (a.exact && b.exact)
        return !(*b.exact < *a.exact);
    return true;
}

// A ratio of two table units of one dimension (or a length ratio squared or cubed).
struct unit_ratio {
    double approx;
    std::optional<rational> exact;
};

// Ratios of two table units of one dimension (and of squares and cubes of lengths), sorted:
// 0.3048, 3.28084, 144, 1728, 6894.76...
const std::vector<unit_ratio>& unit_ratios() {
    static const std::vector<unit_ratio> ratios = [] {
        std::vector<unit_ratio> out;
        const auto units = unit_table::standard().units();
        const dimension length = unit_table::standard().resolve("m")->dim();
        for (const auto& a : units)
            for (const auto& b : units) {
                if (&a == &b || a.exponents != b.exponents || !(a.factor > 0) || !(b.factor > 0))
                    continue;
                const double r = a.factor / b.factor;
                if (std::abs(r - 1.0) < 1e-9 || is_power_of_ten(r))
                    continue;
                const auto exact = exact_product(exact_factor(a), exact_factor(b), true);
                out.push_back({r, exact});
                if (a.dim() == length) {
                    out.push_back({r * r, exact_power(exact, rational(2))});
                    out.push_back({r * r * r, exact_power(exact, rational(3))});
                    // Manning's 1.486 = (m/ft)^(1/3): unit-bound formulas carry cube roots of
                    // length ratios. Not square roots: √3 = 1.732 and √12 = 3.464 are
                    // coefficients far more often than roots of yd/ft and ft/in.
                    out.push_back({std::cbrt(r), std::nullopt});
                }
            }
        // The prefixed and compound units the trades write beside the table's own: kW beside
        // hp and TR (0.7457, 3.517), kPa beside psi, L/s and m³/h beside gpm and cfm (0.0631,
        // 15.85). Not every prefix: each would add as many chance matches as it adds ratios
        // (kJ per Btu, 1.055, is also the Sm³ per Nm³ of two reference states).
        for (const char* symbol : {"kW", "kPa", "MPa", "kN"}) {
            const auto a = unit_table::standard().resolve(symbol);
            if (!a)
                continue;
            for (const auto& b : units) {
                if (b.exponents != a->unit->exponents || !(b.factor > 0) || &b == a->unit)
                    continue;
                const double r = a->factor() / b.factor;
                if (std::abs(r - 1.0) < 1e-9 || is_power_of_ten(r))
                    continue;
                const auto exact = exact_product(exact_factor(*a), exact_factor(b), true);
                out.push_back({r, exact});
                out.push_back({1.0 / r, exact_product(rational(1), exact, true)});
            }
        }
        const auto* gpm = unit_table::standard().resolve("gpm")->unit;
        const std::array<std::pair<double, rational>, 2> flows{
            {{1e-3, rational(1, 1000)}, {1.0 / 3600.0, rational(1, 3600)}}}; // L/s, m³/h
        for (const auto& [factor, exact_si] : flows)
            for (const auto& b : units) {
                if (b.exponents != gpm->exponents || !(b.factor > 0))
                    continue;
                const double r = factor / b.factor;
                if (std::abs(r - 1.0) < 1e-9 || is_power_of_ten(r))
                    continue;
                const auto exact = exact_product(exact_si, exact_factor(b), true);
                out.push_back({r, exact});
                out.push_back({1.0 / r, exact_product(rational(1), exact, true)});
            }
        // Compound units of the heat trades that the table holds no row for (NIST SP 811
        // (2008), B.8 and B.9): a specific energy's 2.326 kJ/kg per Btu/lb and specific heat's
        // 4.1868 kJ/(kg·K) per Btu/(lb·°F), both exact; a U-value's 5.678263 W/(m²·K) per
        // Btu/(h·ft²·°F), a conductivity's 1.730735 W/(m·K) per Btu/(h·ft·°F) and a density's
        // 16.01846 kg/m³ per lb/ft³.
        const std::array<std::pair<double, std::optional<rational>>, 5> compound{{
            {2.326, rational(2326, 1000)},
            {4.1868, rational(41868, 10000)},
            {5.678263, std::nullopt},
            {1.730735, std::nullopt},
            {16.01846, std::nullopt},
        }};
        for (const auto& [r, exact] : compound) {
            out.push_back({r, exact});
            out.push_back({1.0 / r, exact ? exact_product(rational(1), exact, true) : exact});
        }
        std::sort(out.begin(), out.end(),
                  [](const unit_ratio& x, const unit_ratio& y) { return x.approx < y.approx; });
        return out;
    }();
    return ratios;
}

exact_or_double low_end(const scale_literal& l) {
    return {l.low ? std::min(l.low->to_double(), l.value * (1.0 - l.tolerance))
                  : l.value * (1.0 - l.tolerance),
            l.low};
}
exact_or_double high_end(const scale_literal& l) {
    return {l.high ? std::max(l.high->to_double(), l.value * (1.0 + l.tolerance))
                   : l.value * (1.0 + l.tolerance),
            l.high};
}

bool is_unit_ratio(const scale_literal& l) {
    const auto& ratios = unit_ratios();
    const exact_or_double low = low_end(l);
    const exact_or_double high = high_end(l);
    auto it = std::lower_bound(ratios.begin(), ratios.end(), low.approx * (1.0 - 2 * double_doubt),
                               [](const unit_ratio& r, double v) { return r.approx < v; });
    for (; it != ratios.end() && it->approx <= high.approx * (1.0 + 2 * double_doubt); ++it) {
        const exact_or_double r{it->approx, it->exact};
        if (at_most(low, r) && at_most(r, high))
            return true;
    }
    return false;
}

// What a subset of an operand's numbers may stand for: the least and greatest products their
// printed digits allow, and the product as written.
struct subset_value {
    exact_or_double low;
    exact_or_double high;
    double product = 1.0;
};

// l^e for the interval of l: whole powers exactly, others as doubles.
void multiply_in(subset_value& s, const scale_literal& l, double e) {
    const exact_or_double lo = low_end(l);
    const exact_or_double hi = high_end(l);
    const bool whole = e == std::round(e) && std::abs(e) <= 6;
    const auto power = [&](const exact_or_double& v) -> exact_or_double {
        return {e == 1.0 ? v.approx : (e == -1.0 ? 1.0 / v.approx : std::pow(v.approx, e)),
                whole ? exact_power(v.exact, rational(static_cast<std::int64_t>(e)))
                      : std::nullopt};
    };
    // A positive power grows with its base, a negative one shrinks.
    s.low = times(s.low, power(e > 0 ? lo : hi));
    s.high = times(s.high, power(e > 0 ? hi : lo));
    s.product *= e == 1.0 ? l.value : (e == -1.0 ? 1.0 / l.value : std::pow(l.value, e));
}

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
        double e = op.literals[k].exponent;
        if (flip.operand == index && flip.literal == k)
            e = -e;
        multiply_in(s, op.literals[k], e);
    }
    return s;
}

exact_or_double scale_of(const scaled_operand& op) {
    return {op.scale,
            op.exact_scale != nullptr ? std::optional<rational>(*op.exact_scale) : std::nullopt};
}

// Whether a's unit, its numbers `sa` taken as conversions, can equal b's with `sb`: for some
// values the digits allow, scale_a / P_a = scale_b / P_b, that is scale_a·P_b = scale_b·P_a.
bool agree(const scaled_operand& a, const subset_value& sa, const scaled_operand& b,
           const subset_value& sb) {
    const exact_or_double scale_a = scale_of(a);
    const exact_or_double scale_b = scale_of(b);
    return at_most(times(scale_a, sb.low), times(scale_b, sa.high)) &&
           at_most(times(scale_b, sa.low), times(scale_a, sb.high));
}

// Whether some choice of b's numbers as conversions meets a's unit with `sa`.
bool reaches(const scaled_operand& b, std::size_t index, std::size_t count, const scaled_operand& a,
             const subset_value& sa, flipped_literal flip, bool* without_literals) {
    const std::size_t n = searched(b, count);
    for (std::uint32_t mask = 0; mask < (1U << n); ++mask) {
        if (agree(a, sa, b, subset(b, index, mask, flip))) {
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

namespace {
// 10^k exactly, where it fits.
std::optional<rational> exact_power_of_ten(int k) {
    return exact_power(rational(10), rational(k));
}
} // namespace

scale_literal read_literal(std::string_view text, double value, std::uint32_t node,
                           std::optional<rational> exact) {
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
    // Published factors are rounded (7758 for 7758.37, 3.281 for 3.28084): the digits stand
    // for any value within half a unit in the last of them, and never for more than 1 % either
    // way, so that a 2 is never a 2.2 nor an 8 an 8.35.
    const int last_place = exponent - decimals;
    const double half_unit = power_of_ten_value(last_place) / 2.0;
    const bool half_unit_narrower = half_unit <= l.value / 100.0;
    l.tolerance = std::clamp(half_unit / l.value, 1e-12, 0.01);
    if (!exact)
        exact = rational::parse(text);
    if (exact && exact->num() < 0)
        exact = -*exact;
    if (exact && !exact->is_zero()) {
        auto width = half_unit_narrower
                         ? exact_product(exact_power_of_ten(last_place), rational(2), true)
                         : exact_product(exact, rational(100), true);
        // Tables and codes print some factors cut rather than rounded (US EPA AP-42's 5.614
        // ft³/bbl for 5.6146, 2.204 lb/kg for 2.20462): from four digits on, the value may
        // lie up to a whole unit above the digits, never more below them than half of one.
        const bool table_printed = has_point ? significant >= 4 : l.value >= 1000;
        // Tables also carry factors rounded from older definitions or chained from two rounded
        // ones (3413 Btu/h per kW for 3412.14; 249.1 Pa per in. w.g. over 0.3048 m per ft,
        // 817.3 for 817.22): printed to four digits, the half unit is at least 0.03 % of the
        // value, which no slip of units comes near. Five digits or more (273.15, 1.01325) are
        // printed that precisely on purpose. The interval stays centred as before, so the
        // digits can be read back from it (printed_value).
        if (table_printed && significant == 4 && half_unit_narrower && width) {
            const auto floor = exact_product(exact, rational(3, 10000), false);
            if (floor && *width < *floor) {
                width = floor;
                l.tolerance = std::max(l.tolerance, 3e-4);
            }
        }
        if (width) {
            try {
                l.low = *exact - *width;
                l.may_be_cut = table_printed && half_unit_narrower;
                l.high = *exact + (l.may_be_cut ? *width + *width : *width);
            } catch (const arithmetic_overflow&) {
                l.low.reset();
                l.high.reset();
            }
        }
    }
    l.power_of_ten = significant >= 1 && only_a_one;
    l.power = static_cast<std::int8_t>(std::clamp(first_place + exponent, -100, 100));
    // Printed factors that stand for a second definition or rounding besides the one the units
    // give: the range they cover reaches that one too.
    struct second_reading {
        double written;  // as printed; with `any_decade`, its digits in the first decade
        bool any_decade; // 4.184 kJ or 4184 J alike
        rational ratio;  // the other value over the written one
    };
    static const std::array<second_reading, 4> second_readings{{
        // Kinetics and thermochemistry tables work in the thermochemical calorie, 4.184 J
        // exactly (NIST SP 811 (2008), B.8), where a kcal row is the IT one, 4.1868 J.
        {4.184, true, rational(41868, 41840)},
        // Motor and gear heat tables print 2545 Btu/h per hp, the 59 °F Btu's figure (NIST SP
        // 811 (2008), B.8: 1 hp = 745.6999 W, 1 Btu_59°F = 1054.804 J); the IT Btu gives
        // 2544.43.
        {2545.0, false, rational(254443, 254500)},
        // Manning's (1/0.3048)^(2/3) = 2.20795 printed 2.22, from 1.49² (see
        // looks_like_conversion).
        {2.22, false, rational(220795, 222000)},
        // Roof drainage sheets print Q = A·i/96.23 in gpm from ft² and in/h (common
        // practice), where 231 in³/gal × 60 min/h / 144 in²/ft² is 96.25 exactly.
        {96.23, false, rational(9625, 9623)},
    }};
    for (const second_reading& r : second_readings) {
        const double compared = r.any_decade ? l.value / power_of_ten_value(l.power) : l.value;
        if (!exact || !l.low || !l.high || std::abs(compared - r.written) > 1e-12 * r.written)
            continue;
        try {
            const rational other = *exact * r.ratio;
            l.low = std::min(*l.low, other);
            l.high = std::max(*l.high, other);
        } catch (const arithmetic_overflow&) {
            l.low.reset();
            l.high.reset();
        }
    }
    const bool whole = !has_point && e == std::string_view::npos;
    l.factor_like = !l.power_of_ten && (whole ? l.value >= 1000 : significant >= 3);
    // Safety and load factors (1.15, 1.35) have 3 digits and may lie near some unit ratio
    // (nautical mile per mile, 1.151); a conversion typed to name a ratio has 4 (3.281).
    l.table_digits = !l.power_of_ten && (whole ? l.value >= 1000 : significant >= 4);
    return l;
}

bool is_ratio_of_units(const scale_literal& l) {
    return is_unit_ratio(l);
}

bool looks_like_conversion(const scale_literal& l, bool allow_hundred) {
    if (l.power_of_ten)
        return std::abs(l.power * l.exponent) >= (allow_hundred ? 2 : 3);
    // Manning's US constant (1 m / 0.3048 m)^(1/3) = 1.48592 is printed 1.49 as often as 1.486
    // (common practice); three digits are enough for that one ratio.
    // Its square printed from 1.49, 2.22 (1.49² = 2.2201; see read_literal's second
    // readings), in the friction slope n²·V²/(2.22·R^(4/3)) of US manuals (FHWA HEC-22, 3rd
    // ed., from memory).
    static const double manning_us = std::cbrt(1.0 / 0.3048);
    const auto covers = [&](double v) {
        return low_end(l).approx <= v * (1.0 + 1e-12) && v <= high_end(l).approx * (1.0 + 1e-12);
    };
    if (l.factor_like && (covers(manning_us) || covers(manning_us * manning_us)))
        return true;
    return l.table_digits && is_unit_ratio(l);
}

double apparent_scale(const scaled_operand& op) {
    double s = op.scale;
    for (const auto& l : op.literals)
        if (looks_like_conversion(l, true))
            s /= std::pow(l.value, l.exponent);
    return s;
}

std::optional<rational> printed_value(const scale_literal& l) {
    if (!l.low || !l.high)
        return std::nullopt;
    try {
        // The digits' interval is centred on them, or, where the value may be cut, spans half
        // a unit below them and a whole one above.
        return l.may_be_cut ? *l.low + (*l.high - *l.low) / rational(3)
                            : (*l.low + *l.high) / rational(2);
    } catch (const arithmetic_overflow&) {
        return std::nullopt;
    }
}

std::optional<rational> printed_power(const scale_literal& l, double exponent) {
    if (exponent != std::round(exponent) || std::abs(exponent) > 12)
        return std::nullopt;
    return exact_power(printed_value(l), rational(static_cast<std::int64_t>(exponent)));
}

std::optional<rational> apparent_exact_scale(const scaled_operand& op) {
    if (op.exact_scale == nullptr)
        return std::nullopt;
    std::optional<rational> s = *op.exact_scale;
    for (const auto& l : op.literals) {
        if (!looks_like_conversion(l, true))
            continue;
        s = exact_product(s, printed_power(l, l.exponent), true);
    }
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
            const exact_or_double a = scale_of(o);
            const exact_or_double b = scale_of(ops[0]);
            return at_most(a, b) && at_most(b, a);
        })) {
        r.agree = true;
        r.unit = ops[0].scale;
        return r;
    }
    std::size_t best_count = 0;
    std::size_t best_operand = 0;
    subset_value best_subset;
    // A long sum tries only a few distinct units, so the search stays linear in its length.
    constexpr std::size_t max_units_tried = 16;
    std::array<double, max_units_tried> tried{};
    std::size_t tried_count = 0;
    for (std::size_t i = 0; i < count && best_count < count; ++i) {
        const std::size_t n = searched(ops[i], count);
        for (std::uint32_t mask = 0; mask < (1U << n) && best_count < count; ++mask) {
            const subset_value s = subset(ops[i], i, mask, flip);
            if (n == 0) {
                const double u = ops[i].scale;
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
                if (j == i || reaches(ops[j], j, count, ops[i], s, flip, nullptr))
                    ++reached;
            if (reached > best_count) {
                best_count = reached;
                best_operand = i;
                best_subset = s;
            }
        }
    }
    r.unit = ops[best_operand].scale / best_subset.product;
    r.agree = best_count == count;
    bool reference_found = false;
    bool odd_found = false;
    // "0.04788*c_psf + p" in kPa: where the operands agree only through rounded numbers, the
    // common unit is that of an operand that needs none of its numbers, exact as declared,
    // not the rounded number's 0.999995 kPa, which the rest of the formula would find off.
    std::optional<double> plain_unit;
    for (std::size_t j = 0; j < count; ++j) {
        bool plain = j == best_operand && best_subset.product == 1.0;
        if (j == best_operand ||
            reaches(ops[j], j, count, ops[best_operand], best_subset, flip, &plain)) {
            if (!reference_found) {
                r.reference = j;
                reference_found = true;
            }
            if (plain && !plain_unit)
                plain_unit = ops[j].scale;
            r.used_literals = r.used_literals || !plain;
        } else if (!odd_found) {
            r.odd = j;
            odd_found = true;
        }
    }
    if (r.agree && plain_unit)
        r.unit = *plain_unit;
    return r;
}

namespace {

std::string power_text(int k) {
    static constexpr std::string_view superscripts[] = {"⁰", "¹", "²", "³", "⁴",
                                                        "⁵", "⁶", "⁷", "⁸", "⁹"};
    std::string out = "10";
    if (k < 0)
        out += "⁻";
    for (const char c : std::to_string(k < 0 ? -k : k))
        out += superscripts[c - '0'];
    return out;
}

std::string power_of_ten_text(int k) {
    if (k >= 0 && k <= 4)
        return "1" + std::string(static_cast<std::size_t>(k), '0');
    if (k < 0 && k >= -3)
        return "0." + std::string(static_cast<std::size_t>(-k - 1), '0') + "1";
    return power_text(k);
}

// A whole number's power of ten, when it is one (1000 gives 3).
std::optional<int> decades_of(std::int64_t n) {
    int k = 0;
    while (n > 1 && n % 10 == 0) {
        n /= 10;
        ++k;
    }
    return n == 1 ? std::optional<int>(k) : std::nullopt;
}

// Digits of a terminating fraction, when it has few of them ("0.3048"); empty otherwise.
std::optional<std::string> short_decimal(const rational& f) {
    std::int64_t rest = f.den();
    int twos = 0;
    int fives = 0;
    for (; rest % 2 == 0; rest /= 2)
        ++twos;
    for (; rest % 5 == 0; rest /= 5)
        ++fives;
    const int places = std::max(twos, fives);
    if (rest != 1 || places > 9)
        return std::nullopt;
    std::int64_t scale = 1;
    for (int i = 0; i < places; ++i)
        scale *= 10;
    std::int64_t digits = 0;
    if (__builtin_mul_overflow(f.num(), scale / f.den(), &digits))
        return std::nullopt;
    std::string text = std::to_string(digits);
    if (text.size() > 10)
        return std::nullopt;
    if (places == 0)
        return text;
    if (text.size() <= static_cast<std::size_t>(places))
        text.insert(0, static_cast<std::size_t>(places) + 1 - text.size(), '0');
    text.insert(text.size() - static_cast<std::size_t>(places), ".");
    return text;
}

} // namespace

std::string format_factor(double factor) {
    if (!std::isfinite(factor) || factor <= 0)
        return fmt::format("{:g}", factor);
    int k = 0;
    if (is_power_of_ten(factor, &k) ||
        std::abs(factor / std::pow(10.0, std::round(std::log10(factor))) - 1.0) < 1e-9)
        return power_of_ten_text(static_cast<int>(std::round(std::log10(factor))));
    std::string text = fmt::format("{:.6g}", factor);
    const std::size_t e = text.find('e');
    if (e == std::string::npos)
        return text;
    return text.substr(0, e) + " × " + power_text(std::atoi(text.c_str() + e + 1));
}

std::string format_factor(const std::optional<rational>& exact, double approx) {
    if (!exact || exact->num() <= 0)
        return format_factor(approx);
    const rational& f = *exact;
    if (f.den() == 1) {
        if (const auto k = decades_of(f.num()))
            return power_of_ten_text(*k);
        if (f.num() <= 1'000'000'000)
            return std::to_string(f.num());
    }
    if (f.num() == 1) {
        if (const auto k = decades_of(f.den()))
            return power_of_ten_text(-*k);
        return fmt::format("1/{}", f.den());
    }
    if (const auto digits = short_decimal(f))
        return *digits;
    // 3.28084 (1/0.3048) reads as the foot it is; 1250/381 does not, and 1/0.3048 alone is
    // a sum to do. Below 1, 1/1.8 is as plain as 0.555556.
    if (const auto inverse_digits = short_decimal(rational(f.den(), f.num())))
        return f.num() > f.den() ? format_factor(f.to_double()) + " (1/" + *inverse_digits + ")"
                                 : "1/" + *inverse_digits;
    if (f.num() < 100 && f.den() < 100)
        return fmt::format("{}/{}", f.num(), f.den());
    return format_factor(f.to_double());
}

} // namespace plumb
