#include "check/reference_state.hpp"

#include "check/gravity_number.hpp"
#include "plumb/unit_table.hpp"

#include <algorithm>
#include <array>
#include <cmath>

namespace plumb {

bool is_water_column(double si_scale) {
    static const std::array<double, 2> columns = [] {
        const unit_table& table = unit_table::standard();
        return std::array<double, 2>{table.resolve("inH2O")->factor(),
                                     table.resolve("ftH2O")->factor()};
    }();
    return std::any_of(columns.begin(), columns.end(),
                       [&](double c) { return std::abs(si_scale / c - 1.0) < 1e-9; });
}

namespace {

const std::array<reference_state, 2>& states() {
    static const std::array<reference_state, 2> table{{
        // Standard reference temperatures in use: 0 °C (IUPAC STP; "normal" m³ in DIN 1343),
        // 15 °C (ISO 13443 for natural gas), 60 °F (US gas industry), 20 °C and 25 °C (air
        // and emission permits) (common practice). 0 °C = 273.15 K exactly (SI Brochure 9th
        // ed., 2.3.1) and 60 °F = 519.67 °R = 288.706 K (NIST SP 811, 4.2.1.1).
        {"a standard reference temperature",
         "0 \u00B0C (273.15 K), 15 \u00B0C, 60 \u00B0F (519.67 \u00B0R), 20 \u00B0C or 25 "
         "\u00B0C",
         "declare it with its unit (T_n : K = 273.15) to say so",
         compact_dimension(unit_table::standard().resolve("K")->dim()), 273.15, 298.15},
        // Standard reference pressures: 100 kPa (IUPAC STP since 1982), 101.325 kPa (the
        // standard atmosphere, 3rd CGPM and ISO 2533), 14.73 psia (the US gas industry's base
        // pressure, 101.56 kPa) (common practice).
        {"a standard reference pressure",
         "100 kPa, 101.325 kPa (14.696 psia, 1.01325 bar, 760 mmHg) or the gas trade's 14.73 "
         "psia",
         "declare it with its unit (p_n : kPa = 101.325) to say so",
         compact_dimension(unit_table::standard().resolve("Pa")->dim()), 100000.0, 101560.0},
    }};
    return table;
}

} // namespace

const reference_state* read_reference_state(const compact_dimension& dim, double value,
                                            std::string_view written, double unit_scale) {
    if (!(value > 0) || !(unit_scale > 0) || !std::isfinite(value) || !std::isfinite(unit_scale))
        return nullptr;
    // In psi the US trades' bases are 14.696, 14.7 and 14.73 psia: 14.5 there is the bar's
    // 14.5038 psi, a conversion ("C30/14.5" from psi to bar), not IUPAC's 100 kPa.
    constexpr double psi = 6894.757293168;
    const bool in_psi = std::abs(unit_scale / psi - 1.0) < 1e-6;
    for (const reference_state& s : states()) {
        if (!(dim == s.dim))
            continue;
        if (in_psi && s.greatest > 1e4 && value < 14.6)
            continue;
        const double low = s.least / unit_scale;
        const double high = s.greatest / unit_scale;
        const double nearest = std::clamp(value, low, high);
        if (std::abs(value - nearest) <= half_unit_in_last_digit(written) * (1.0 + 1e-9) &&
            std::abs(value / nearest - 1.0) <= 0.005)
            return &s;
    }
    return nullptr;
}

} // namespace plumb
