// Short forms of findings: one line each, for hooks and for findings already reviewed.
#include "plumb/render.hpp"

#include "report/place.hpp"

#include <fmt/format.h>

namespace plumb {
namespace {

std::string_view level_word(severity s) {
    return s == severity::error ? "error" : s == severity::warning ? "warning" : "note";
}

} // namespace

std::string render_one_line(const diagnostic& d) {
    return fmt::format("{}: {}: {} [{}]", place_text(d.where), level_word(d.level), d.message,
                       d.rule);
}

std::string render_accepted_line(const diagnostic& d) {
    if (!d.accepted)
        return render_one_line(d);
    return fmt::format("{}: accepted {}: {} [{}]\n    reason ({} {}): {}", place_text(d.where),
                       level_word(d.level), d.message, d.rule,
                       d.accepted->by_inline_mark ? "mark at" : "entry at",
                       place_text(d.accepted->mark), d.accepted->reason);
}

std::string render_quiet(const check_report& report, severity fail_on) {
    std::string out;
    for (const auto& d : report.diagnostics)
        if (!d.accepted && d.level >= fail_on)
            out += render_one_line(d) + '\n';
    const std::size_t errors = report.count(severity::error);
    const std::size_t warnings = report.count(severity::warning);
    const bool fails = errors > 0 || (fail_on == severity::warning && warnings > 0);
    out += fmt::format("plumb: {}: {} formulas in {} files, {} errors, {} warnings, {} accepted\n",
                       fails ? "FAILED" : "passed", report.formulas_checked, report.files_checked,
                       errors, warnings, report.count_accepted());
    out += fmt::format("caution: {}\n", caution_text());
    return out;
}

} // namespace plumb
