// What the formulas that use an input cell without a unit require of it: its dimension solved
// exactly from each use (one unknown per cell), and the unit's scale where the formula fixes it.
#pragma once

#include "model/syntax_tree.hpp"

#include <optional>
#include <span>
#include <vector>

namespace plumb::sheets {

// How a reference of the formula stands to the input being solved for.
enum class input_role : std::uint8_t {
    other,         // typed by its own unit, or unknown
    the_input,     // the input cell itself
    range_with_it, // a range that holds it: the input must agree with the range's type
};

struct input_requirement {
    dimension dim;
    // SI value of the unit the input must be in for the formula to give its result as written,
    // when the formula fixes it (no number in it that might be a conversion factor).
    std::optional<double> scale;
};

// Every requirement one formula's uses put on the input (usually one; two that differ mean the
// formula contradicts itself about it). `result` is the unit written for the formula's own cell,
// when there is one. Empty when nothing in the formula fixes the input's dimension.
std::vector<input_requirement>
requirements_of_input(const syntax::parsed_file& file, std::uint32_t root,
                      std::span<const input_role> roles,
                      const std::optional<syntax::reference_value>& result);

} // namespace plumb::sheets
