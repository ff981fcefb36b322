// Words and numbers of a model plan.
#include "groups/plan_text.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <array>
#include <cmath>

namespace plumb::planning {

// "an acceleration", "a density": by the first letter, which serves the quantity names used.
std::string_view article(std::string_view noun) {
    return !noun.empty() && std::string_view("aeiou").find(noun.front()) != std::string_view::npos
               ? "an"
               : "a";
}

bool is_length(const dimension& d) {
    return d == dimension::base(base_dimension::length);
}

bool is_acceleration(const dimension& d) {
    return d ==
           dimension::base(base_dimension::length) / dimension::base(base_dimension::time).pow(2);
}

// Gravity, as engineers write it (g, g_n, g_0): an acceleration of another name, such as a
// shaking table's, is a given of the rig like any other, not the gravity only a centrifuge
// changes.
bool is_gravity(const group_variable& v) {
    return is_acceleration(v.dim) && (v.name == "g" || v.name.rfind("g_", 0) == 0);
}

bool is_dynamic_viscosity(const dimension& d) {
    return d == dimension::base(base_dimension::mass) / (dimension::base(base_dimension::length) *
                                                         dimension::base(base_dimension::time));
}

bool is_density(const dimension& d) {
    return d ==
           dimension::base(base_dimension::mass) / dimension::base(base_dimension::length).pow(3);
}

// Three significant figures, plain between 0.001 and 1e5 and with a short exponent outside:
// "0.008", "1000", "5.33", "8.43e-9", "1.25e5".
std::string number_text(double v, int figures) {
    if (!std::isfinite(v) || v == 0.0)
        return fmt::format("{}", v);
    const auto strip = [](std::string s) {
        if (s.find('.') == std::string::npos)
            return s;
        s.erase(s.find_last_not_of('0') + 1);
        if (s.back() == '.')
            s.pop_back();
        return s;
    };
    const double magnitude = std::fabs(v);
    if (magnitude >= 1e-3 && magnitude < 1e5) {
        const int digits = static_cast<int>(std::floor(std::log10(magnitude)));
        return strip(fmt::format("{:.{}f}", v, std::max(0, figures - 1 - digits)));
    }
    const std::string s = fmt::format("{:.{}e}", v, std::max(0, figures - 1));
    const auto e = s.find('e');
    const int exponent = std::stoi(s.substr(e + 1));
    return strip(s.substr(0, e)) + "e" + std::to_string(exponent);
}

// log10 splits into a whole exponent and a mantissa, which is then rounded to two figures.
std::string log_number_text(int sign, double natural_log) {
    if (!std::isfinite(natural_log))
        return natural_log > 0 ? "infinity" : "0";
    const double l = natural_log / std::log(10.0);
    auto exponent = static_cast<long long>(std::floor(l));
    double mantissa = std::round(std::pow(10.0, l - static_cast<double>(exponent)) * 10.0) / 10.0;
    if (mantissa >= 10.0) {
        mantissa /= 10.0;
        ++exponent;
    }
    return fmt::format("{}{}e{}", sign < 0 ? "-" : "", mantissa, exponent);
}

// The coherent SI unit of a dimension, as the .plumb notation writes units ("Pa*s", "m^2/s").
std::string si_unit_text(const dimension& d) {
    struct named {
        std::array<int, 3> mlt;
        std::string_view unit;
    };
    // Derived units an engineer reads more easily than their base-unit form.
    constexpr named derived[] = {
        {{1, 1, -2}, "N"},   {{1, -1, -2}, "Pa"}, {{1, -1, -1}, "Pa*s"},
        {{1, 0, -2}, "N/m"}, {{1, 2, -2}, "J"},   {{1, 2, -3}, "W"},
    };
    bool only_mlt = true;
    for (std::size_t i = 3; i < base_dimension_count; ++i)
        only_mlt = only_mlt && d.exponents()[i].is_zero();
    if (only_mlt) {
        for (const auto& n : derived) {
            bool same = true;
            for (std::size_t i = 0; i < 3; ++i)
                same = same && d.exponents()[i] == rational(n.mlt[i]);
            if (same)
                return std::string(n.unit);
        }
    }
    constexpr std::string_view symbols[base_dimension_count] = {"kg",  "m", "s", "K",
                                                                "mol", "A", "cd"};
    std::string numerator;
    std::string denominator;
    std::size_t below = 0;
    for (std::size_t i = 0; i < base_dimension_count; ++i) {
        const rational e = d.exponents()[i];
        if (e.is_zero())
            continue;
        const bool up = e.num() > 0;
        const rational magnitude = up ? e : -e;
        std::string& side = up ? numerator : denominator;
        if (!side.empty())
            side += '*';
        side += symbols[i];
        if (magnitude.is_integer() && magnitude.num() != 1)
            side += "^" + magnitude.to_string();
        else if (!magnitude.is_integer())
            side += "^(" + magnitude.to_string() + ")";
        if (!up)
            ++below;
    }
    if (numerator.empty())
        numerator = below == 0 ? "" : "1";
    if (below == 0)
        return numerator;
    return numerator + "/" + (below > 1 ? "(" + denominator + ")" : denominator);
}

// The first of the names quantity_name lists ("surface tension, spring stiffness or line load"
// names a fluid property here, never a spring).
std::string quantity_text(const dimension& d) {
    std::string name(quantity_name(d));
    if (name.empty())
        return "value";
    for (const std::string_view cut : {std::string_view(", "), std::string_view(" or ")}) {
        const auto at = name.find(cut);
        if (at != std::string::npos)
            name.erase(at);
    }
    return name;
}

// sum + a * power, or nothing once any term is unknown or the exact value would overflow:
// the power of λ only decorates an explanation, so losing it must not stop a plan.
std::optional<rational> add_power(std::optional<rational> sum, rational a,
                                  std::optional<rational> power) {
    if (!sum || !power)
        return std::nullopt;
    try {
        return *sum + a * *power;
    } catch (const arithmetic_overflow&) {
        return std::nullopt;
    }
}

std::string power_text(rational p) {
    if (p == rational(1))
        return "λ";
    if (p.is_integer())
        return "λ^" + p.to_string();
    return "λ^(" + p.to_string() + ")";
}

std::string join(const std::vector<std::string>& parts, std::string_view last_separator) {
    std::string out;
    for (std::size_t i = 0; i < parts.size(); ++i) {
        if (i > 0)
            out += i + 1 == parts.size() ? std::string(last_separator) : std::string(", ");
        out += parts[i];
    }
    return out;
}

std::string value_text(double si, const dimension& d, const shown_unit* unit, int figures) {
    if (unit != nullptr && !unit->text.empty() && unit->factor != 0.0)
        return number_text((si - unit->offset) / unit->factor, figures) + " " + unit->text;
    const std::string si_unit = si_unit_text(d);
    const std::string number = number_text(si, figures);
    return si_unit.empty() ? number : number + " " + si_unit;
}

} // namespace plumb::planning
