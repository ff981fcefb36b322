// The two workbook readers and the OpenFormula-to-A1 translation they need.
#pragma once

#include "sheets/archive.hpp"
#include "sheets/workbook.hpp"

#include <string>
#include <string_view>

namespace plumb::sheets {

workbook read_xlsx(archive& zip, const read_limits& limits);
workbook read_ods(archive& zip, const read_limits& limits);

// "of:=[.C42]+[$Sheet2.A1]" -> "=C42+Sheet2!A1": the formula as a spreadsheet shows it.
// Throws workbook_error with the grammar's message when the text is not OpenFormula.
std::string openformula_to_a1(std::string_view formula);
// "$Sheet1.$B$3" or "$'Pump data'.$B$3:.$B$9" (a named range's address) -> A1 text.
std::string openformula_address_to_a1(std::string_view address);

} // namespace plumb::sheets
