// A workbook file on disk: read read-only, its sidecar and dictionaries found, checked.
#pragma once

#include "model/syntax_tree.hpp"
#include "plumb/check.hpp"

#include <filesystem>

namespace plumb::sheets {

// True for .xlsx and .ods (and .xlsm, whose formulas are the same).
bool is_workbook_path(const std::filesystem::path& path);
// True for book.cells.plumb: a workbook's sidecar, read with it and never checked alone.
bool is_sidecar_path(const std::filesystem::path& path);
// The sidecar that belongs beside a workbook: pump-station.xlsx -> pump-station.cells.plumb.
std::filesystem::path sidecar_for(const std::filesystem::path& workbook);

// A `cells` line in a file that is not a workbook's sidecar gives no cell a unit: each is a
// finding that says where it belongs.
void report_cells_outside_sidecar(const syntax::parsed_file& tree, std::vector<diagnostic>& out);

// Checks one workbook; an unreadable one is an `unreadable` finding and input_failed.
void check_workbook_file(const std::filesystem::path& path, const check_options& options,
                         check_report& report);

// The same for a workbook's bytes already in memory, named `path`; `sidecar` is read unless
// empty.
void check_workbook_bytes(std::string_view bytes, const std::filesystem::path& path,
                          const std::filesystem::path& sidecar, const check_options& options,
                          check_report& report);

} // namespace plumb::sheets
