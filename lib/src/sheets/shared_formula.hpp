// Excel's shared formulas (ECMA-376 Part 1, 18.3.1.40): one master formula stored once and
// used by the cells of its `ref` area, each with its relative references moved by the
// follower's offset from the master.
#pragma once

#include "sheets/workbook.hpp"

#include <optional>
#include <string>
#include <string_view>

namespace plumb::sheets {

// The master's A1 formula (without '=') as the cell `to` reads it; empty when a reference
// would leave the sheet or the text holds a form whose shifting is not handled here (whole
// rows or columns, R1C1 forms), so that the cell is reported as not checked, never guessed.
std::optional<std::string> shift_formula(std::string_view master, cell_address from,
                                         cell_address to);

} // namespace plumb::sheets
