// A small workbook built in memory around fuzzed formulas, so that the spreadsheet grammars'
// output reaches the lowering and the checker with cells that carry units.
#pragma once

#include <string>
#include <vector>

namespace plumb::fuzz {

// Checks `formulas` (A1 text, '=' added when missing), one formula cell each in column E of a
// sheet whose columns A-D hold numbers under headings with units, beside a sheet 'Pump data'
// and a defined name G; then checks the report's ranges and renders it every way.
void check_formulas_in_workbook(const std::vector<std::string>& formulas);

// The input's lines, at most `limit` of them.
std::vector<std::string> lines_of(const std::string& text, std::size_t limit);

} // namespace plumb::fuzz
