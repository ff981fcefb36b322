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

// A rule's severity as a project sets it; `off` drops its findings.
struct rule_level {
    std::string rule;
    std::optional<severity> level; // empty: off
};

struct check_options {
    std::vector<std::filesystem::path> dictionaries; // read before every checked file
    // Base units of a consistent set other than SI ("ft", "lb", "s"): coefficients marked `?`
    // are restated for it as well as for coherent SI units.
    std::vector<std::string> restate_in;

    // Project settings (see settings.hpp); all empty when there is no settings file.
    std::filesystem::path project_root;      // paths below are relative to it
    std::vector<std::string> exclude;        // glob patterns of files never checked
    std::vector<rule_level> rule_levels;     // severities changed or rules turned off
    std::filesystem::path accepted_findings; // the file of accepted findings; none when empty
    // Keep every formula's label, side dimensions and result, for the sign-off report and
    // the JSON list of formulas; off by default so that memory stays flat on large checks.
    bool record_formulas = false;
    // With record_formulas, also each side's dimension and the relations between the sides,
    // which the sign-off report prints and the JSON list does not: working the dimensions out
    // walks every formula a second time.
    bool record_side_dimensions = false;
    // Threads that check files at once; 0: one per core (at most 8). The report is the same
    // whatever the number.
    unsigned jobs = 0;
    // When set, `use` lines resolve inside this folder and may not leave it (an absolute path,
    // "..", or a link out is a finding); text checked by check_text counts as lying in it.
    std::filesystem::path include_root;
};

// One formula as the sign-off report lists it; its sides and relations only with
// check_options::record_side_dimensions.
struct formula_record {
    location where;
    std::string label;                           // without '@'; empty when none
    std::vector<std::optional<dimension>> sides; // empty optional where a side has an error
    std::vector<std::string> relations;          // "=", "<=", ... between the sides
    std::optional<severity> worst; // the most severe finding starting inside it; empty: passed
    std::string written_unit;      // a workbook cell's unit as written for it; empty when none
};

// Why `restate_in` does not name a consistent set of units, or nothing when it does: each
// must be a unit of the table, and together they must fix one unit for every base dimension
// they involve ("ft, lb, s"; or "ft, lbf, s", where the force fixes the unit of mass).
std::optional<std::string> restate_units_problem(const std::vector<std::string>& restate_in);

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
    // Per variable, the unit its values are shown in: as given on the prototype line, else as
    // declared (an offset unit such as °C is shown as declared only when given so).
    std::vector<shown_unit> units;
    std::vector<std::size_t> match; // groups the model line says to match
    double tolerance = default_match_tolerance;
    std::optional<similitude_plan> plan; // when a prototype line exists
};

struct check_report {
    // Every file read (checked files, dictionaries, `use`d files); diagnostics point into them.
    std::vector<std::unique_ptr<source_file>> sources;
    std::vector<const source_file*> checked_files; // those of `sources` checked, in order
    std::vector<diagnostic> diagnostics;
    std::vector<study_report> studies;
    std::vector<formula_record> formulas; // only with check_options::record_formulas
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

    // Findings of `level` that fail the run: accepted ones are not counted.
    [[nodiscard]] std::size_t count(severity level) const;
    [[nodiscard]] std::size_t count_accepted() const;
};

// Checks .plumb files, Markdown notes (*.md) holding ```plumb blocks, and .xlsx/.ods
// workbooks; a directory is searched recursively for them, in sorted order. A workbook's
// sidecar (book.cells.plumb beside book.xlsx) is read with its workbook, not checked alone.
check_report check_paths(const std::vector<std::filesystem::path>& paths,
                         const check_options& options = {});

// Checks text held in memory as if it were the file `name` (`use` paths resolve against
// the current directory, or inside options.include_root when set).
check_report check_text(std::string name, std::string text, const check_options& options = {});

// Checks a workbook (.xlsx, .ods) held in memory as if it were the file `name`, whose
// extension must agree with its content; the options' dictionaries are read, no sidecar is.
check_report check_workbook_bytes(std::string name, std::string_view bytes,
                                  const check_options& options = {});

// The dimension of `expression` against the symbols the context files declare. Diagnostics
// about the expression land in report.diagnostics, pointing into a source named "<query>".
struct query_result {
    check_report report;
    std::optional<dimension> dim; // empty when the expression has an error
};
query_result query_dimension(std::string expression,
                             const std::vector<std::filesystem::path>& context_files,
                             const check_options& options = {});

// A program linked statically cannot load libzip safely (a static glibc may only load shared
// libraries of its own version): such a program hands workbooks to another that can. The
// handover runs once, when the first workbook must be unpacked, and does not return if it
// succeeds; if it returns, the workbook is reported unreadable with `why` as the reason.
using workbook_handover = void (*)(std::string& why);
void set_workbook_handover(workbook_handover handover);

} // namespace plumb
