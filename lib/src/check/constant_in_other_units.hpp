// "Q_gpm*H_m/(3960*η)", "0.433*h_m", "1.08*cfm*ΔT_K": a trade's constant typed for one unit
// system beside a symbol or cell declared in the other's. In the units written the number is
// no quantity, so the term differs in dimension; this reading says which unit the number was
// written for and what it comes to in the unit declared. Both front ends ask it once their
// own reading of the number (check/gravity_number.hpp) has failed.
#pragma once

#include "check/gravity_number.hpp"
#include "check/unit_counterparts.hpp"

#include <optional>
#include <span>
#include <string>
#include <string_view>

namespace plumb {

// A symbol or cell among a product's factors, with the power it enters with.
struct declared_factor {
    compact_dimension dim;
    double si_scale = 1.0;
    double exponent = 1.0;
    std::string_view unit_text; // as declared; empty for the table's own name of the unit
};

struct constant_in_other_units {
    std::size_t factor = 0; // which of the factors is in the other system's unit
    std::string_view declared;
    const unit_counterpart* other = nullptr;
    gravity_reading reading;
    double in_declared = 0.0; // the number for the unit declared
};

// The one factor whose change of system makes a number of the term a carried quantity; where
// two do, the one whose reading lies nearest the middle of the quantity's range (1.08*cfm*ΔT_K
// fits with ΔT in °F, and at the edge of air's range with the flow in m³/h). Empty where none
// does, or two do equally well.
std::optional<constant_in_other_units> read_constant_in_other_units(
    double term_scale, double reference_scale, std::span<const scale_literal> numbers,
    std::span<const std::string_view> texts, const dimension& lacking,
    carried_quantity::term_kind kind, std::span<const declared_factor> factors);

// "'3960' is one over the specific weight of water for 'H_m' in ft, but 'H_m' is in m: ..."
std::string constant_in_other_units_message(std::string_view number, std::string_view factor,
                                            const constant_in_other_units& found);

} // namespace plumb
