#include "check/gravity_number.hpp"

#include <cmath>
#include <cstdlib>
#include <exception>
#include <fmt/format.h>

namespace plumb {
namespace {

// 3rd CGPM (1901): g_n = 9.80665 m/s², exact by definition.
constexpr double standard_gravity = 9.80665;
constexpr double closest_reading = 0.005;
// The other numbers of the term may convert units (a /1000 to kPa); every subset of them is
// tried, so the count is kept small.
constexpr std::size_t most_numbers = 8;

const dimension& acceleration() {
    static const dimension d = dimension::base(base_dimension::length) /
                               dimension::base(base_dimension::time) /
                               dimension::base(base_dimension::time);
    return d;
}

} // namespace

bool lacks_gravity_to(const dimension& lacking, double exponent) {
    for (std::int64_t denominator = 1; denominator <= 3; ++denominator) {
        const double scaled = exponent * static_cast<double>(denominator);
        const double whole = std::round(scaled);
        if (std::abs(scaled - whole) > 1e-9 || whole == 0.0 || std::abs(whole) > 6)
            continue;
        try {
            return acceleration().pow(rational(static_cast<std::int64_t>(whole), denominator)) ==
                   lacking;
        } catch (const std::exception&) {
            return false;
        }
    }
    return false;
}

std::string gravity_message(std::string_view written, double stands_for) {
    if (std::abs(stands_for - standard_gravity) < 1e-9)
        return fmt::format("'{}' is read as standard gravity, g_n = 9.80665 m/s\u00B2", written);
    return fmt::format("'{}' is read as standard gravity in the units around it: g_n = 9.80665 "
                       "m/s\u00B2 comes to {:.5g} there",
                       written, stands_for);
}

double half_unit_in_last_digit(std::string_view text) {
    int decimals = 0;
    bool after_point = false;
    std::size_t i = 0;
    for (; i < text.size(); ++i) {
        const char c = text[i];
        if (c == '.') {
            after_point = true;
        } else if (c >= '0' && c <= '9') {
            if (after_point)
                ++decimals;
        } else {
            break;
        }
    }
    int exponent = 0;
    if (i < text.size() && (text[i] == 'e' || text[i] == 'E')) {
        const std::string tail(text.substr(i + 1));
        exponent = static_cast<int>(std::strtol(tail.c_str(), nullptr, 10));
        if (exponent > 300 || exponent < -300)
            return 0.0;
    }
    return 0.5 * std::pow(10.0, exponent - decimals);
}

std::optional<gravity_reading> read_gravity_number(double term_scale, double reference_scale,
                                                   std::span<const scale_literal> literals,
                                                   std::span<const std::string_view> texts,
                                                   std::span<const bool> fits) {
    if (literals.empty() || literals.size() > most_numbers || texts.size() != literals.size() ||
        fits.size() != literals.size() || !(term_scale > 0) || !(reference_scale > 0) ||
        !std::isfinite(term_scale) || !std::isfinite(reference_scale))
        return std::nullopt;
    std::optional<gravity_reading> best;
    double best_rank = 0.0;
    for (std::size_t k = 0; k < literals.size(); ++k) {
        const scale_literal& g = literals[k];
        const double x = g.exponent;
        if (!fits[k] || !(g.value > 0) || x == 0.0)
            continue;
        const double half_unit = half_unit_in_last_digit(texts[k]);
        const std::size_t others = literals.size() - 1;
        for (std::uint32_t mask = 0; mask < (1U << others); ++mask) {
            // The conversions C among the other numbers: written_R·s_R = written_E·s_E·(g_n/ℓ)^x/C
            // gives ℓ = g_n·(s_E / (s_R·C))^(1/x).
            double conversions = 1.0;
            for (std::size_t j = 0, bit = 0; j < literals.size(); ++j) {
                if (j == k)
                    continue;
                if ((mask >> bit++) & 1U)
                    conversions *= std::pow(literals[j].value, literals[j].exponent);
            }
            const double ratio = term_scale / (reference_scale * conversions);
            double stands_for = standard_gravity * std::pow(ratio, 1.0 / x);
            if (!(stands_for > 0) || !std::isfinite(stands_for))
                continue;
            // g in a unit a power of ten away (9.81 beside kPa where Pa was meant): read it as g
            // all the same, so that the scale rule names the 1000 rather than a missing g.
            const double shift = std::round(std::log10(stands_for / g.value));
            const bool shifted = shift != 0.0 && std::abs(shift) <= 9.0;
            if (shifted)
                stands_for /= std::pow(10.0, shift);
            const double distance = std::abs(g.value - stands_for);
            if (distance > half_unit * (1.0 + 1e-9) ||
                std::abs(g.value / stands_for - 1.0) > closest_reading)
                continue;
            const double rank = distance + (shifted ? 1e300 : 0.0);
            if (!best || rank < best_rank) {
                best_rank = rank;
                best = gravity_reading{k, stands_for,
                                       term_scale * std::pow(standard_gravity / stands_for, x)};
            }
        }
    }
    return best;
}

} // namespace plumb
