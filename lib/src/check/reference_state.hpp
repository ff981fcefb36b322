// "V*273.15/T", "Q*(p/14.7)*(520/T)": a bare number in a ratio with an absolute temperature or
// pressure, standing for the standard reference state the volume is corrected to. Gas
// engineers write T_n and p_n as numbers in the reading's own unit far more often than as
// symbols; such a pair is a pure ratio.
#pragma once

#include "units/compact_dimension.hpp"

#include <array>
#include <string_view>

namespace plumb {

// A standard reference state quantity with the range of SI values the trades' choices span.
struct reference_state {
    std::string_view what;    // "a standard reference temperature"
    std::string_view choices; // "0 °C (273.15 K), 15 °C, 60 °F (519.67 °R), 20 °C or 25 °C"
    std::string_view advice;  // how to say it outright in a .plumb file
    compact_dimension dim;    // Θ or pressure
    double least = 0.0;       // SI
    double greatest = 0.0;    // SI
};

// The pressure units calcs write the atmosphere in, for naming the one a bare number was
// written in (NIST SP 811 (2008), B.8).
struct pressure_unit {
    std::string_view name;
    double pascals;
};
constexpr std::array<pressure_unit, 7> pressure_units{{
    {"Pa", 1.0},
    {"kPa", 1e3},
    {"MPa", 1e6},
    {"bar", 1e5},
    {"psi", 6894.757293168361},
    {"mmHg", 133.322387415},
    {"inHg", 3386.388640341},
}};

// The reference state that `written` (the number as printed, with value `value`) stands for
// when it is in the same unit as a reading of dimension `dim` whose unit is `unit_scale` SI
// per written unit; null when it stands for none. The number must round a value in the range
// to its last printed digit, as the gravity readings must.
const reference_state* read_reference_state(const compact_dimension& dim, double value,
                                            std::string_view written, double unit_scale);

// Whether a pressure unit of `si_scale` Pa is a column of water (inH2O, ftH2O): gauges and
// drops are read in it, and an absolute pressure never is (common practice).
bool is_water_column(double si_scale);

} // namespace plumb
