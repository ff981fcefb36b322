// Text for people: the GNU location line, the excerpt with its ledger, bullet notes, summary.
#include "plumb/render.hpp"

#include "report/excerpt.hpp"
#include "report/palette.hpp"
#include "report/place.hpp"

#include <fmt/format.h>

namespace plumb {

std::string_view caution_text() {
    return "a dimensionally consistent formula can still be wrong (a missing factor, a wrong "
           "coefficient, a formula used outside its range); this check does not replace "
           "independent review under the applicable local codes and licensed professional practice";
}

std::string render_text(const diagnostic& d, const text_style& style) {
    const palette::painter paint{style.colour};
    std::string out;
    out += place_text(d.where) + ":";
    const std::string_view level = d.level == severity::error     ? "error:"
                                   : d.level == severity::warning ? "warning:"
                                                                  : "note:";
    const std::string_view colour = d.level == severity::error     ? palette::error
                                    : d.level == severity::warning ? palette::warning
                                                                   : palette::note;
    out += fmt::format(" {} {} {}\n", paint(colour, level), d.message,
                       paint(palette::rule, fmt::format("[{}]", d.rule)));
    if (d.where.file != nullptr)
        render_excerpt(out, d, paint);
    const std::string bullet = paint(palette::note, "\u00B7");
    for (const auto& n : d.notes) {
        if (n.restates_terms && d.where.file != nullptr)
            continue; // the ledger has said it
        if (n.where.file != nullptr) {
            const line_column p = n.where.file->position(n.where.range.begin);
            out += fmt::format("   {} {}:{}:{}: {}\n", bullet, n.where.file->path(), p.line,
                               p.column, n.message);
        } else {
            out += fmt::format("   {} {}\n", bullet, n.message);
        }
    }
    return out;
}

std::string render_text(const check_report& report, const text_style& style) {
    const palette::painter paint{style.colour};
    std::string out;
    std::string accepted;
    for (const auto& d : report.diagnostics) {
        if (d.accepted) {
            // Reviewed already: one line with its reason, so that it is seen but not re-read.
            accepted += render_accepted_line(d) + '\n';
            continue;
        }
        out += render_text(d, style);
        out += '\n';
    }
    if (!accepted.empty())
        out += fmt::format("{}\n{}\n", paint(palette::strong, "accepted after review:"), accepted);
    const std::size_t errors = report.count(severity::error);
    const std::size_t warnings = report.count(severity::warning);
    const auto plural = [](std::size_t n, std::string_view word) {
        return fmt::format("{} {}{}", n, word, n == 1 ? "" : "s");
    };
    const std::string scope = fmt::format("{} in {}", plural(report.formulas_checked, "formula"),
                                          plural(report.files_checked, "file"));
    if (report.workbooks_checked > 0)
        out += fmt::format("{} {} checked, {} not checked, {} without units\n",
                           paint(palette::strong, "plumb:"),
                           plural(report.cells_checked, "formula cell"), report.cells_not_checked,
                           plural(report.inputs_without_units, "input cell"));
    if (errors == 0 && warnings == 0)
        out += fmt::format("{} {}: no dimensional inconsistency found\n",
                           paint(palette::strong, "plumb:"), scope);
    else
        out += fmt::format("{} {}, {} ({} checked)\n", paint(palette::strong, "plumb:"),
                           plural(errors, "error"), plural(warnings, "warning"), scope);
    if (report.count_accepted() > 0)
        out += fmt::format("{} {} accepted after review (listed above, with reasons)\n",
                           paint(palette::strong, "plumb:"),
                           plural(report.count_accepted(), "finding"));
    out += fmt::format("{} {}\n", paint(palette::warning, "caution:"), caution_text());
    return out;
}

} // namespace plumb
