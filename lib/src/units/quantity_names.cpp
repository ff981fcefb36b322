// Conventional names of common dimensions, for diagnostics such as "left side is a pressure".
#include "plumb/dimension.hpp"

#include <cstdint>

namespace plumb {
namespace {

using exponents = std::array<std::int8_t, base_dimension_count>;

struct named_dimension {
    exponents e; // M L T Θ N I J
    std::string_view name;
};

constexpr exponents dims(int m, int l, int t, int th = 0, int n = 0, int i = 0, int j = 0) {
    return {static_cast<std::int8_t>(m),  static_cast<std::int8_t>(l), static_cast<std::int8_t>(t),
            static_cast<std::int8_t>(th), static_cast<std::int8_t>(n), static_cast<std::int8_t>(i),
            static_cast<std::int8_t>(j)};
}

// One name per dimension. Where quantities an engineer tells apart share a dimension (energy
// and torque, frequency and angular velocity), the name lists them, the most common first.
// Names are common practice in engineering texts; the electrical and photometric ones follow
// the quantity names of the SI Brochure 9th ed., Table 4.
constexpr named_dimension names[] = {
    {dims(0, 0, 0), "dimensionless"},

    // Base quantities.
    {dims(1, 0, 0), "mass"},
    {dims(0, 1, 0), "length"},
    {dims(0, 0, 1), "time"},
    {dims(0, 0, 0, 1), "temperature"},
    {dims(0, 0, 0, 0, 1), "amount of substance"},
    {dims(0, 0, 0, 0, 0, 1), "electric current"},
    {dims(0, 0, 0, 0, 0, 0, 1), "luminous intensity or luminous flux"},

    // Geometry and kinematics.
    {dims(0, 2, 0), "area"},
    {dims(0, 3, 0), "volume"},
    {dims(0, 4, 0), "second moment of area"},
    {dims(0, -1, 0), "wavenumber or curvature"},
    {dims(0, -3, 0), "number density"},
    {dims(0, 0, -1), "frequency or angular velocity"},
    {dims(0, 0, -2), "angular acceleration"},
    {dims(0, 1, -1), "velocity"},
    {dims(0, 1, -2), "acceleration"},
    {dims(0, 1, -3), "jerk"},
    {dims(0, 3, -1), "volumetric flow rate"},
    {dims(0, 2, -1), "kinematic viscosity or diffusivity"},

    // Mechanics.
    {dims(1, -3, 0), "density"},
    {dims(1, -2, 0), "areal density"},
    {dims(1, -1, 0), "linear density"},
    {dims(-1, 3, 0), "specific volume"},
    {dims(1, 2, 0), "moment of inertia"},
    {dims(1, 1, -1), "momentum"},
    {dims(1, 2, -1), "angular momentum"},
    {dims(1, 1, -2), "force"},
    {dims(1, -1, -2), "pressure or stress"},
    {dims(-1, 1, 2), "compressibility"},
    {dims(1, -2, -2), "specific weight or pressure gradient"},
    {dims(1, 0, -2), "surface tension, spring stiffness or line load"},
    {dims(1, 2, -2), "energy, work, heat or torque"},
    {dims(0, 2, -2), "specific energy or absorbed dose"},
    {dims(1, 2, -3), "power"},
    {dims(1, -1, -3), "power density (per volume)"},
    {dims(1, 0, -3), "heat flux or irradiance"},
    {dims(1, -1, -1), "dynamic viscosity"},
    {dims(1, 0, -1), "mass flow rate"},
    {dims(1, -2, -1), "mass flux"},

    // Heat.
    {dims(0, 0, 0, -1), "per kelvin (a temperature coefficient)"},
    {dims(0, -1, 0, 1), "temperature gradient"},
    {dims(1, 2, -2, -1), "heat capacity or entropy"},
    {dims(0, 2, -2, -1), "specific heat capacity or specific entropy"},
    {dims(1, 1, -3, -1), "thermal conductivity"},
    {dims(1, 0, -3, -1), "heat transfer coefficient"},
    {dims(-1, -2, 3, 1), "thermal resistance"},
    {dims(-1, 0, 3, 1), "thermal insulance (area-specific thermal resistance)"},

    // Chemistry.
    {dims(0, -3, 0, 0, 1), "molar concentration"},
    {dims(1, 0, 0, 0, -1), "molar mass"},
    {dims(-1, 0, 0, 0, 1), "molality"},
    {dims(0, 3, 0, 0, -1), "molar volume"},
    {dims(1, 2, -2, 0, -1), "molar energy"},
    {dims(1, 2, -2, -1, -1), "molar heat capacity or molar entropy (gas constant)"},
    {dims(0, 0, -1, 0, 1), "molar flow rate or catalytic activity"},
    {dims(0, -3, -1, 0, 1), "reaction rate (per volume)"},

    // Electricity and magnetism.
    {dims(0, 0, 1, 0, 0, 1), "electric charge"},
    {dims(1, 2, -3, 0, 0, -1), "voltage (electric potential difference)"},
    {dims(1, 2, -3, 0, 0, -2), "electrical resistance"},
    {dims(-1, -2, 3, 0, 0, 2), "electrical conductance"},
    {dims(-1, -2, 4, 0, 0, 2), "capacitance"},
    {dims(1, 2, -2, 0, 0, -2), "inductance"},
    {dims(1, 2, -2, 0, 0, -1), "magnetic flux"},
    {dims(1, 0, -2, 0, 0, -1), "magnetic flux density"},
    {dims(0, -1, 0, 0, 0, 1), "magnetic field strength"},
    {dims(0, -2, 0, 0, 0, 1), "current density"},
    {dims(1, 1, -3, 0, 0, -1), "electric field strength"},
    {dims(1, 3, -3, 0, 0, -2), "electrical resistivity"},
    {dims(-1, -3, 3, 0, 0, 2), "electrical conductivity"},
    {dims(0, -3, 1, 0, 0, 1), "electric charge density"},
    {dims(0, -2, 1, 0, 0, 1), "electric displacement or surface charge density"},
    {dims(1, 1, -2, 0, 0, -2), "magnetic permeability"},
    {dims(-1, -3, 4, 0, 0, 2), "permittivity"},

    // Photometry: the steradian is dimensionless, so lux and candela per square metre agree.
    {dims(0, -2, 0, 0, 0, 0, 1), "illuminance or luminance"},
};

// A second entry for one dimension would never be reached; catch it when compiling.
constexpr bool all_dimensions_distinct() {
    constexpr std::size_t count = sizeof(names) / sizeof(names[0]);
    for (std::size_t a = 0; a < count; ++a)
        for (std::size_t b = a + 1; b < count; ++b)
            if (names[a].e == names[b].e)
                return false;
    return true;
}
static_assert(all_dimensions_distinct(), "two quantity names share one dimension");

} // namespace

std::string_view quantity_name(const dimension& d) {
    exponents wanted{};
    for (std::size_t i = 0; i < base_dimension_count; ++i) {
        const rational e = d.exponent(static_cast<base_dimension>(i));
        // Every named dimension has small whole exponents; anything else has no name.
        if (!e.is_integer() || e.num() < -8 || e.num() > 8)
            return {};
        wanted[i] = static_cast<std::int8_t>(e.num());
    }
    for (const named_dimension& entry : names)
        if (entry.e == wanted)
            return entry.name;
    return {};
}

} // namespace plumb
