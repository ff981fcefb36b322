// Checks every formula cell of a workbook, in dependency order, through the one checker.
#pragma once

#include "plumb/check.hpp"
#include "sheets/unit_text.hpp"
#include "sheets/workbook.hpp"

#include <string>
#include <unordered_map>
#include <vector>

namespace plumb::sheets {

// A unit given to cells by a sidecar or a dictionary, with where it was given.
struct declared_unit {
    written_unit unit;
    std::string origin; // "the sidecar pump.cells.plumb", "the dictionary fluids.plumb"
};

// Units given outside the workbook: defined names declared as symbols (upper-cased names).
struct outside_units {
    std::unordered_map<std::string, declared_unit> names;
    // Cells, ranges or whole columns given a unit by a sidecar: sheet (empty: any) and area.
    // The sidecar beside the workbook first, then those given with --dict: the first that
    // holds a cell gives its unit, and another that gives it a different one is reported.
    struct area_unit {
        std::string sheet;
        cell_area area;
        declared_unit unit;
        location where{}; // the cells line
    };
    std::vector<area_unit> areas;
    // The `measure` lines of the sidecar and dictionaries, one a line: the unit text beside a
    // cell may use the units they define, as a cells line may.
    std::string measures;
};

// Appends the findings to report.diagnostics and the listing to report.sources; with
// `record_cells`, each formula cell checked to report.formulas as well.
void check_workbook(const workbook& book, const std::string& path, const outside_units& units,
                    check_report& report, bool record_cells = false);

} // namespace plumb::sheets
