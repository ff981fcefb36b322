// The kind of quantity a declaration's description names ("average daily flow" is a flow), so
// that "did you mean" offers units of that kind first.
#pragma once

#include "plumb/dimension.hpp"

#include <optional>
#include <string_view>

namespace plumb {

// The dimension the description's words name, or nothing when none or several kinds do.
std::optional<dimension> described_kind(std::string_view description);

// Whether the description says the symbol is a temperature or carries one ("supply temp",
// "specific heat", "°C"), for a unit that reads otherwise.
bool describes_a_temperature(std::string_view description);

} // namespace plumb
