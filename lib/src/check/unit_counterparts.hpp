// The unit the other system writes for the same quantity: ft for m, psi for kPa, gpm for
// m³/h, °R-sized degrees for K. A trade's constant typed as a number belongs to one system,
// and the commonest way to misuse it is beside a symbol declared in the other system's unit.
#pragma once

#include "units/compact_dimension.hpp"

#include <optional>
#include <string>

#include <span>
#include <string_view>

namespace plumb {

struct unit_counterpart {
    std::string_view name; // as an engineer writes it
    double si_scale = 1.0; // SI value of one unit
};

struct counterparts_of_unit {
    std::string_view declared;                // the table's name of the unit asked about
    std::span<const unit_counterpart> others; // the other system's units for its quantity
};

// The other system's units for a quantity of dimension `dim` declared in a unit of SI value
// `si_scale`; none where that unit is not one of the table's (a unit of neither system, or
// one no trade constant is written beside).
counterparts_of_unit unit_counterparts(const compact_dimension& dim, double si_scale);

// "E : ton*h" beside kWh, "q : ton" beside kW: the table's ton is the short ton, a mass, where
// the cooling trades mean a ton of refrigeration (TR). The note to add where a unit text holds
// the word "ton" and the two sides are exactly a power per mass apart; empty otherwise.
std::optional<std::string> ton_of_refrigeration_note(std::string_view unit_text,
                                                     const dimension& apart);

} // namespace plumb
