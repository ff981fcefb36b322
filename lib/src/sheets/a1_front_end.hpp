// The A1 front end: a workbook's formulas, parsed with the A1 grammar and lowered into the
// expression model the checker reads (cells and ranges become reference nodes).
#pragma once

#include "model/syntax_tree.hpp"
#include "sheets/workbook.hpp"

#include <optional>
#include <string>
#include <vector>

namespace plumb::sheets {

// A cell or range a formula names, resolved against the workbook.
struct lowered_reference {
    std::uint32_t reference = 0; // index into parsed_file::references
    std::size_t sheet = 0;
    cell_area area;
    span where;
};

struct lowered_formula {
    std::uint32_t formula = syntax::no_index; // into parsed_file::formulas; none after an error
    std::uint32_t first_reference = 0;        // into lowered_book::references
    std::uint32_t reference_count = 0;
    std::string not_checked; // why the formula cannot be checked, when it cannot
    std::string syntax_error;
    span syntax_at{};
};

struct lowered_book {
    syntax::parsed_file tree;
    std::vector<lowered_reference> references;
};

// Parses the formula at [begin, end) of `tree.source` (A1 text with its '='), written in cell
// `home` of sheet `sheet`, and appends it to `book`. `hundred` is a span of the text "100",
// for the percent operator.
lowered_formula lower_formula(lowered_book& book, const workbook& wb, std::size_t sheet,
                              std::uint32_t begin, std::uint32_t end, span hundred);

// "Pump!$B$3", "'Pump data'!B3:B9", "C4": the sheet (defaulting to `home`) and area.
std::optional<std::pair<std::size_t, cell_area>>
resolve_reference(const workbook& wb, std::size_t home, std::string_view text);

} // namespace plumb::sheets
