// Renderers: diagnostics as text for people or as one JSON document; the unit catalogue.
#pragma once

#include "plumb/check.hpp"

#include <string>

namespace plumb {

struct text_style {
    bool colour = false;
};

// GNU form: "file:line:col: severity: message [rule]", then the formula once with a keyed
// brace under each term that matters and a ledger of their dimensions, then the notes.
std::string render_text(const diagnostic& d, const text_style& style = {});
// All diagnostics followed by a one-line summary and the caution.
std::string render_text(const check_report& report, const text_style& style = {});

// One line: "file:line:col: severity: message [rule]", and for an accepted finding its
// reason and where it was accepted.
std::string render_accepted_line(const diagnostic& d);
std::string render_one_line(const diagnostic& d);

// For hooks: one line per finding that fails, one summary line and the caution, once.
std::string render_quiet(const check_report& report, severity fail_on);

// SARIF 2.1.0 (OASIS): rules, results with locations and related locations, and accepted
// findings as suppressions. Paths are written relative to `root` when they lie under it.
std::string render_sarif(const check_report& report, const std::filesystem::path& root);

// What the sign-off report's header states about a run.
struct signoff_context {
    std::vector<std::string> paths_checked; // as given
    std::string checked_at;                 // UTC, ISO 8601
    std::string git_commit;                 // empty outside a git repository
    std::string settings_file;              // empty when none
    std::filesystem::path project_root;
};

// One self-contained HTML page (no network resources) for the independent checker: header
// with file hashes, summary, every formula with its sides' dimensions and findings, the
// studies, and the caution. `report` must come from a check with record_formulas and
// record_side_dimensions.
std::string render_signoff_html(const check_report& report, const signoff_context& context);

// Said with every report: a consistent formula can still be wrong.
std::string_view caution_text();

// Each study's dimension matrix, repeating variables, groups and model plan, for people.
std::string render_groups_text(const check_report& report, const text_style& style = {});
// The same as one JSON document (schema in the README, "Groups as JSON").
std::string render_groups_json(const check_report& report);

// The JSON document described in the README ("plumb check --format json").
std::string render_json(const check_report& report);

// The built-in units grouped by the quantity they measure: symbols, name, exact factor to the
// coherent SI unit, origin of an interval or gauge scale, source; then the SI prefixes. With a
// filter, only units whose symbol, name or quantity contains it (a prefixed symbol such as
// "kPa" is resolved). Empty when nothing matches.
std::string render_catalogue(std::string_view filter, const text_style& style = {});

} // namespace plumb
