// Edit distance for "did you mean" suggestions.
#pragma once

#include <cstddef>
#include <string_view>

namespace plumb {

// Optimal string alignment distance (a swap of neighbours counts once), over bytes.
// Stops early and returns limit + 1 once the distance must exceed `limit`.
std::size_t edit_distance(std::string_view a, std::string_view b, std::size_t limit);

} // namespace plumb
