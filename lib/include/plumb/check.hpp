// The library's front door: check files or text, or ask the dimension of an expression.
#pragma once

#include "plumb/diagnostic.hpp"
#include "plumb/groups.hpp"
#include "plumb/source.hpp"

#include <filesystem>
#include <memory>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace plumb {

struct check_options {
    std::vector<std::filesystem::path> dictionaries; // read before every checked file
    // Base units of a consistent set other than SI ("ft", "lb", "s"): coefficients marked `?`
    // are restated for it as well as for coherent SI units.
    std::vector<std::string> restate_in;
};

// One `study` line worked out: its groups and, when prototype and model lines give values,
// the model plan.
struct study_report {
    location where;
    std::string name;
    std::vector<group_variable> variables;
    group_analysis analysis;
    std::optional<double> length_scale;           // from the model line
    std::vector<std::optional<double>> prototype; // SI value per variable, when given
    std::vector<std::optional<double>> model;
    std::optional<similitude_plan> plan; // when a prototype line exists
};

struct check_report {
    // Every file read (checked files, dictionaries, `use`d files); diagnostics point into them.
    std::vector<std::unique_ptr<source_file>> sources;
    std::vector<diagnostic> diagnostics;
    std::vector<study_report> studies;
    std::size_t files_checked = 0;
    std::size_t formulas_checked = 0;
    std::size_t bytes_checked = 0;
    // Workbooks (.xlsx, .ods): formula cells checked, formula cells that could not be
    // (a function plumb does not know, a circular reference...), and input cells that feed
    // formulas but have no unit.
    std::size_t workbooks_checked = 0;
    std::size_t cells_checked = 0;
    std::size_t cells_not_checked = 0;
    std::size_t inputs_without_units = 0;
    // True when a path could not be read or a file could not be parsed (exit status 2).
    bool input_failed = false;

    [[nodiscard]] std::size_t count(severity level) const;
};

// Checks .plumb files and .xlsx/.ods workbooks; a directory is searched recursively for
// them, in sorted order. A workbook's sidecar (book.cells.plumb beside book.xlsx) is read
// with its workbook, not checked on its own.
check_report check_paths(const std::vector<std::filesystem::path>& paths,
                         const check_options& options = {});

// Checks text held in memory as if it were the file `name` (`use` paths resolve against
// the current directory).
check_report check_text(std::string name, std::string text, const check_options& options = {});

// The dimension of `expression` against the symbols the context files declare. Diagnostics
// about the expression land in report.diagnostics, pointing into a source named "<query>".
struct query_result {
    check_report report;
    std::optional<dimension> dim; // empty when the expression has an error
};
query_result query_dimension(std::string expression,
                             const std::vector<std::filesystem::path>& context_files,
                             const check_options& options = {});

} // namespace plumb
