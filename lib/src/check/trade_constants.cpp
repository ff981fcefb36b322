#include "check/trade_constants.hpp"

#include <algorithm>
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
    static const std::array<trade_constant, 7> table = [] {
        const rational pound = parsed("0.45359237");
        const rational gallon_of_one_kg_per_litre = parsed("3.785411784") / pound;
        const rational cubic_foot_of_one_kg_per_litre = parsed("28.316846592") / pound;
        // hp / (cfm × in. w.g.) with 1 hp = 550 ft·lbf/s = 745.69987158227022 W, 1 cfm =
        // 0.0004719474432 m³/s and the conventional inch of water 249.08891 Pa (NIST SP 811
        // (2008), B.8): 6343.3114961 (its exact fraction does not fit 64 bits, so it is
        // bracketed). A real inch of water at t °C is smaller by ρ_w(t)/1000 kg/L, so the
        // conversion is larger: up to 6371.0 at 30 °C; the fan trade's 6356 is the inch at
        // about 68 °F (common practice).
        const rational fan_power_low = parsed("6343.3114960");
        const rational fan_power_high = parsed("6343.3114962");
        // Read where the sides agree in dimension, so that the number only converts units
        // (mgd × mg/L into lb/d: a concentration in mg/L is a mass per volume already): the
        // liquid's own density does not enter.
        constexpr std::string_view for_water =
            "here it only converts units, so it holds for any liquid, within the 0.3 % that "
            "water's density spans";
        // A real inch of water at t °C is the conventional one (249.08891 Pa, NIST SP 811
        // (2008), B.8) times ρ_w(t)/(1000 kg/m³): 248.84 Pa at 60 °F, as NIST prints it and
        // the gas-measurement standards take it (AGA Report No. 3, from memory), with 27.707
        // inches per psi (1 psi = 6894.757 Pa) and 0.03609 psi per inch.
        const rational inch_of_water = parsed("249.08891");
        // psi / inch and its inverse, 27.67990471020167 and 0.03612729200008558, bracketed as
        // the fan constant is: the double path reconciles against the bracket.
        const rational inches_per_psi_low = parsed("27.679904710");
        const rational inches_per_psi_high = parsed("27.679904711");
        const rational psi_per_inch_low = parsed("0.036127292000");
        const rational psi_per_inch_high = parsed("0.036127292001");
        constexpr std::string_view inch_range =
            "an inch of water between 0 and 30 \u00B0C is 248.0 to 249.08 Pa; at 60 \u00B0F, the "
            "gas-measurement standards' inch, 248.84 Pa";
        constexpr std::string_view inch_source =
            "NIST SP 811 (2008), B.8 (inch of water, 60 \u00B0F); water's density from the CRC "
            "Handbook of Chemistry and Physics (from memory)";
        constexpr std::string_view other_liquid =
            "a gauge that reads inches of another liquid needs that liquid's density";
        return std::array<trade_constant, 7>{{
            {"the weight of a US gallon of water (lb/gal)",
             "a gallon at exactly 1 kg/L, which also turns mgd × mg/L into lb/d",
             gallon_of_one_kg_per_litre, gallon_of_one_kg_per_litre,
             gallon_of_one_kg_per_litre * water_density_least(),
             gallon_of_one_kg_per_litre * water_density_greatest(),
             "water weighs 8.31 to 8.35 lb per US gallon between 0 and 30 °C",
             "the trade prints 8.34 (common practice); water's density from the CRC Handbook "
             "of Chemistry and Physics (from memory)",
             for_water},
            {"the weight of a cubic foot of water (lb/ft³)", "a cubic foot at exactly 1 kg/L",
             cubic_foot_of_one_kg_per_litre, cubic_foot_of_one_kg_per_litre,
             cubic_foot_of_one_kg_per_litre * water_density_least(),
             cubic_foot_of_one_kg_per_litre * water_density_greatest(),
             "water weighs 62.16 to 62.43 lb per cubic foot between 0 and 30 °C",
             "the trade prints 62.4 (common practice); water's density from the CRC Handbook "
             "of Chemistry and Physics (from memory)",
             for_water},
            {"the fan trade's cfm × in. w.g. per horsepower, with the inch of water at the "
             "water's temperature",
             "hp from cfm and the conventional inch of water (249.089 Pa)", fan_power_low,
             fan_power_high, fan_power_low, fan_power_low / water_density_least(),
             "an inch of water between 0 and 30 °C makes it 6343.5 to 6371.0",
             "the trade prints 6356 (common practice); water's density from the CRC Handbook "
             "of Chemistry and Physics (from memory)",
             "a gauge that reads inches of another liquid needs that liquid's density"},
            {"an inch of water at the water's temperature (Pa per inch)",
             "the conventional inch of water, 249.089 Pa", inch_of_water, inch_of_water,
             inch_of_water * water_density_least(), inch_of_water * water_density_greatest(),
             inch_range, inch_source, other_liquid},
            {"inches of water at the water's temperature per psi",
             "the conventional inch of water, 27.680 inches per psi", inches_per_psi_low,
             inches_per_psi_high, inches_per_psi_low / water_density_greatest(),
             inches_per_psi_high / water_density_least(), inch_range, inch_source, other_liquid},
            {"psi per inch of water at the water's temperature",
             "the conventional inch of water, 0.036127 psi per inch", psi_per_inch_low,
             psi_per_inch_high, psi_per_inch_low * water_density_least(),
             psi_per_inch_high * water_density_greatest(), inch_range, inch_source, other_liquid},
            // n = 120·f/p: 60 s/min times the 2 poles of each pair, with p the number of poles
            // (IEC 60034-1 rates machines by poles; the formula is common practice).
            {"the synchronous speed's 120 in n = 120*f/p (60 s/min times 2 poles a pair)",
             "rpm from Hz (60 s/min)", parsed("60"), parsed("60"), parsed("120"), parsed("120"),
             "120 holds where p counts poles; where it counts pole pairs the constant is 60",
             "common practice", "with p in pole pairs write 60*f/p"},
        }};
    }();
    return table;
}

const trade_constant* trade_constant_for(const rational& printed) {
    const auto table = trade_constants();
    const auto found = std::find_if(table.begin(), table.end(), [&](const trade_constant& c) {
        return !(printed < c.least) && !(c.greatest < printed);
    });
    return found == table.end() ? nullptr : &*found;
}

} // namespace plumb
