#include "check/trade_constants.hpp"

#include <array>

namespace plumb {
namespace {

rational parsed(std::string_view text) {
    return *rational::parse(text);
}

} // namespace

// Water between 0 and 30 °C: 995.65 kg/m³ at 30 °C up to 999.975 at its densest, 4 °C
// (CRC Handbook of Chemistry and Physics, density of water 0–100 °C; from memory).
rational water_density_least() {
    return parsed("0.99565");
}
rational water_density_greatest() {
    return parsed("0.999975");
}

std::span<const trade_constant> trade_constants() {
    // US gallon 3.785411784 L, pound 0.45359237 kg, cubic foot 0.028316846592 m³ (NIST SP 811
    // (2008), Appendix B.8).
    static const std::array<trade_constant, 2> table = [] {
        const rational pound = parsed("0.45359237");
        const rational gallon_of_one_kg_per_litre = parsed("3.785411784") / pound;
        const rational cubic_foot_of_one_kg_per_litre = parsed("28.316846592") / pound;
        return std::array<trade_constant, 2>{{
            {"the weight of a US gallon of water (lb/gal)",
             "a gallon at exactly 1 kg/L, which also turns mgd × mg/L into lb/d",
             gallon_of_one_kg_per_litre, gallon_of_one_kg_per_litre * water_density_least(),
             gallon_of_one_kg_per_litre * water_density_greatest(),
             "8.31 to 8.35 lb per US gallon between 0 and 30 °C",
             "the trade prints 8.34 (common practice); water's density from the CRC Handbook "
             "of Chemistry and Physics (from memory)"},
            {"the weight of a cubic foot of water (lb/ft³)", "a cubic foot at exactly 1 kg/L",
             cubic_foot_of_one_kg_per_litre, cubic_foot_of_one_kg_per_litre * water_density_least(),
             cubic_foot_of_one_kg_per_litre * water_density_greatest(),
             "62.16 to 62.43 lb per cubic foot between 0 and 30 °C",
             "the trade prints 62.4 (common practice); water's density from the CRC Handbook "
             "of Chemistry and Physics (from memory)"},
        }};
    }();
    return table;
}

} // namespace plumb
