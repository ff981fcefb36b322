// The excerpt under a diagnostic's first line: the formula once, a brace with a key under each
// term that matters, and a ledger giving each key's dimension and quantity.
#pragma once

#include "plumb/diagnostic.hpp"
#include "report/palette.hpp"

#include <string>

namespace plumb {

// Appends the excerpt of a diagnostic that has a place in a file.
void render_excerpt(std::string& out, const diagnostic& d, const palette::painter& paint);

} // namespace plumb
