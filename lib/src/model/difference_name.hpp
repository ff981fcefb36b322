// Whether a name or a description says its quantity is a difference ("ΔT", "dp", "temperature
// rise"): the notation's declarations and a workbook's headings both read it so.
#pragma once

#include <string_view>

namespace plumb {

// A temperature or pressure declared in an absolute unit is a reading on the absolute scale,
// unless its name or description says it is a difference.
bool names_a_difference(std::string_view name, std::string_view description);

// Whether a name or a description says its quantity is a stress or a strength (σ, "allowable
// stress"): a force over an area in a material, on no pressure scale, so no reading.
bool names_a_stress(std::string_view name, std::string_view description);

// Whether a pressure's name or description says it is the atmosphere or the site's barometer
// (p_atm, p_baro, "barometric pressure", "ambient"): read so where a sum adds or takes it off.
bool names_the_atmosphere(std::string_view name, std::string_view description);

// A pressure named or described as the site's barometer: the atmosphere, but not a standard
// one, a vacuum, a pressure below it or a gauge ("suction vacuum gauge, 62 kPa below
// atmosphere" names the atmosphere but is none).
bool names_a_site_barometer(std::string_view name, std::string_view description);

// Whether a pressure's name or description says it is a vacuum ("vac", "condenser vacuum,
// 27 inHg below the barometer"): a depth below the atmosphere, counted down from it as a
// gauge counts up, so a difference from the barometer and no absolute reading. Not one whose
// words call it absolute ("chamber pressure at the first vacuum pulse, absolute").
bool counts_below_the_barometer(std::string_view name, std::string_view description);

// Whether a pressure's description says a gauge reads it ("on the skid's pressure gauge",
// "psi gauge"): above the atmosphere, whatever its unit is called. Not one whose words call it
// absolute, a vacuum, a pressure said against the barometer, or another kind of gauge (a
// strain, rain, wire or track gauge).
bool describes_a_gauge_reading(std::string_view description);

// Whether a pure number's name or description says it is a liquid's specific gravity (SG,
// SG_m, "specific gravity", "relative density"), which goes wherever water's density goes.
bool names_specific_gravity(std::string_view name, std::string_view description);

// Whether a length's name or description says it is a circle's diameter (D, d_p, "pulley
// diameter") or radius (r, "wheel radius"), whose rim travels π·D per revolution; none for a
// length named as neither, or as both.
enum class round_length : unsigned char { none, diameter, radius };
round_length names_a_diameter_or_radius(std::string_view name, std::string_view description);

} // namespace plumb
