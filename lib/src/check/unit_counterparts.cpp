#include "check/unit_counterparts.hpp"

#include <algorithm>
#include <array>
#include <cctype>
#include <cmath>

namespace plumb {
namespace {

// Factors from NIST SP 811 (2008), Appendix B.8 and B.9: the pound, foot, inch and US gallon
// are exact by definition there, the pound-force and horsepower (550 ft·lbf/s) follow from
// them and g_n, and the Btu_IT is exact in joules.
constexpr double foot = 0.3048;
constexpr double inch = 0.0254;
constexpr double mile = 1609.344;
constexpr double pound = 0.45359237;
constexpr double standard_gravity = 9.80665; // SI Brochure 9th ed., the pound-force's g_n
constexpr double psi = pound * standard_gravity / (inch * inch);
constexpr double psf = pound * standard_gravity / (foot * foot);
constexpr double us_gallon = 3.785411784e-3;
constexpr double inch_of_water = 249.08891;
constexpr double cubic_foot = foot * foot * foot;
constexpr double horsepower = 550.0 * foot * pound * standard_gravity;
constexpr double btu_per_hour = 1055.05585262 / 3600.0;

struct counterpart_row {
    compact_dimension dim;
    unit_counterpart unit;
    std::array<unit_counterpart, 3> others; // an empty name ends the list
};

constexpr compact_dimension length = compact_dimension::whole({0, 1, 0, 0, 0, 0, 0});
constexpr compact_dimension degrees = compact_dimension::whole({0, 0, 0, 1, 0, 0, 0});
constexpr compact_dimension pressure = compact_dimension::whole({1, -1, -2, 0, 0, 0, 0});
constexpr compact_dimension velocity = compact_dimension::whole({0, 1, -1, 0, 0, 0, 0});
constexpr compact_dimension flow = compact_dimension::whole({0, 3, -1, 0, 0, 0, 0});
constexpr compact_dimension power = compact_dimension::whole({1, 2, -3, 0, 0, 0, 0});
constexpr compact_dimension mass = compact_dimension::whole({1, 0, 0, 0, 0, 0, 0});
constexpr compact_dimension mass_flow = compact_dimension::whole({1, 0, -1, 0, 0, 0, 0});
constexpr compact_dimension volume = compact_dimension::whole({0, 3, 0, 0, 0, 0, 0});
constexpr compact_dimension density = compact_dimension::whole({1, -3, 0, 0, 0, 0, 0});

// Each pairing both ways round. A temperature declared in K is a difference where a trade
// constant multiplies it (1.08·cfm·ΔT); its other system's degree is the °F (or °R) one.
const auto rows = std::to_array<counterpart_row>({
    {length, {"m", 1.0}, {{{"ft", foot}, {}}}},
    {length, {"ft", foot}, {{{"m", 1.0}, {}}}},
    {length, {"mm", 1e-3}, {{{"in", inch}, {}}}},
    {length, {"in", inch}, {{{"mm", 1e-3}, {}}}},
    {length, {"km", 1e3}, {{{"mi", mile}, {}}}},
    {length, {"mi", mile}, {{{"km", 1e3}, {}}}},
    {degrees, {"K", 1.0}, {{{"\u00B0F", 5.0 / 9.0}, {}}}},
    {degrees, {"\u00B0R", 5.0 / 9.0}, {{{"K", 1.0}, {}}}},
    // The fan and duct trades' inch of water (conventional, 249.08891 Pa; NIST SP 811 (2008),
    // B.8) beside the pascal.
    {pressure, {"Pa", 1.0}, {{{"in. w.g.", inch_of_water}, {}}}},
    {pressure, {"in. w.g.", inch_of_water}, {{{"Pa", 1.0}, {}}}},
    {pressure, {"kPa", 1e3}, {{{"psi", psi}, {}}}},
    {pressure, {"bar", 1e5}, {{{"psi", psi}, {}}}},
    // Beside psi, the psf of a density in lb/ft³ times a height in ft (62.4·h): 144 apart.
    {pressure, {"psi", psi}, {{{"kPa", 1e3}, {"bar", 1e5}, {"lbf/ft\u00B2", psf}}}},
    {pressure, {"lbf/ft\u00B2", psf}, {{{"psi", psi}, {"kPa", 1e3}}}},
    // And the metric flows beside each other: the pump trade's 367 takes m³/h (P = Q·H/367 in
    // kW from m³/h and m, common practice), which a flow in L/s or L/min is not.
    {flow,
     {"m\u00B3/h", 1.0 / 3600.0},
     {{{"gpm", us_gallon / 60.0}, {"cfm", cubic_foot / 60.0}, {"L/s", 1e-3}}}},
    {flow,
     {"L/s", 1e-3},
     {{{"gpm", us_gallon / 60.0}, {"cfm", cubic_foot / 60.0}, {"m\u00B3/h", 1.0 / 3600.0}}}},
    // The fire and water trades' litre a minute beside the US gallon a minute (EN 12845 beside
    // NFPA 13).
    {flow, {"L/min", 1e-3 / 60.0}, {{{"gpm", us_gallon / 60.0}, {"m\u00B3/h", 1.0 / 3600.0}, {}}}},
    {flow, {"gpm", us_gallon / 60.0}, {{{"m\u00B3/h", 1.0 / 3600.0}, {"L/s", 1e-3}}}},
    {flow, {"cfm", cubic_foot / 60.0}, {{{"m\u00B3/h", 1.0 / 3600.0}, {"L/s", 1e-3}}}},
    // The oilfield's barrel a day (42 US gal, NIST SP 811 (2008), B.8) beside the gallon a
    // minute that the pump trade's 1714 and 3960 take.
    {flow, {"bbl/d", 42.0 * us_gallon / 86400.0}, {{{"gpm", us_gallon / 60.0}, {}}}},
    {velocity, {"m/s", 1.0}, {{{"fpm", foot / 60.0}, {"ft/s", foot}}}},
    {velocity, {"fpm", foot / 60.0}, {{{"m/s", 1.0}, {}}}},
    {velocity, {"ft/s", foot}, {{{"m/s", 1.0}, {}}}},
    {velocity, {"km/h", 1.0 / 3.6}, {{{"mph", mile / 3600.0}, {}}}},
    {velocity, {"mph", mile / 3600.0}, {{{"km/h", 1.0 / 3.6}, {}}}},
    {power, {"kW", 1e3}, {{{"hp", horsepower}, {"Btu/h", btu_per_hour}}}},
    {power, {"W", 1.0}, {{{"Btu/h", btu_per_hour}, {}}}},
    {power, {"hp", horsepower}, {{{"kW", 1e3}, {}}}},
    {power, {"Btu/h", btu_per_hour}, {{{"W", 1.0}, {"kW", 1e3}}}},
    {mass, {"kg", 1.0}, {{{"lb", pound}, {}}}},
    {mass, {"lb", pound}, {{{"kg", 1.0}, {}}}},
    {mass_flow, {"kg/h", 1.0 / 3600.0}, {{{"lb/h", pound / 3600.0}, {}}}},
    {mass_flow, {"lb/h", pound / 3600.0}, {{{"kg/h", 1.0 / 3600.0}, {}}}},
    {volume, {"m\u00B3", 1.0}, {{{"ft\u00B3", cubic_foot}, {}}}},
    {volume, {"ft\u00B3", cubic_foot}, {{{"m\u00B3", 1.0}, {}}}},
    {volume, {"L", 1e-3}, {{{"gal", us_gallon}, {}}}},
    {volume, {"gal", us_gallon}, {{{"L", 1e-3}, {}}}},
    {density, {"kg/m\u00B3", 1.0}, {{{"lb/ft\u00B3", pound / cubic_foot}, {}}}},
    {density, {"lb/ft\u00B3", pound / cubic_foot}, {{{"kg/m\u00B3", 1.0}, {}}}},
});

} // namespace

counterparts_of_unit unit_counterparts(const compact_dimension& dim, double si_scale) {
    for (const counterpart_row& row : rows) {
        if (!(row.dim == dim) || std::abs(si_scale / row.unit.si_scale - 1.0) > 1e-6)
            continue;
        const auto end = std::find_if(row.others.begin(), row.others.end(),
                                      [](const unit_counterpart& u) { return u.name.empty(); });
        return {row.unit.name, {row.others.begin(), end}};
    }
    return {};
}

std::optional<std::string> ton_of_refrigeration_note(std::string_view unit_text,
                                                     const dimension& apart) {
    const std::size_t at = unit_text.find("ton");
    if (at == std::string_view::npos ||
        (at > 0 && std::isalpha(static_cast<unsigned char>(unit_text[at - 1])) != 0) ||
        (at + 3 < unit_text.size() &&
         std::isalpha(static_cast<unsigned char>(unit_text[at + 3])) != 0 &&
         unit_text[at + 3] != 's'))
        return std::nullopt;
    const dimension power_per_mass =
        dimension::from_exponents({rational(0), rational(2), rational(-3)});
    if (!(apart == power_per_mass) && !(apart == power_per_mass.pow(rational(-1))))
        return std::nullopt;
    return std::string("'ton' is read as the short ton, 2000 lb, a mass; for a ton of "
                       "refrigeration (12 000 Btu/h) write TR");
}

} // namespace plumb
