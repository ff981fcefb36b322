// Compiler-style text: location, message and rule, the line with the term underlined, notes.
#include "plumb/render.hpp"

#include <algorithm>
#include <fmt/format.h>

namespace plumb {
namespace {

constexpr std::string_view reset = "\x1b[0m";
constexpr std::string_view bold = "\x1b[1m";
constexpr std::string_view red = "\x1b[1;31m";
constexpr std::string_view magenta = "\x1b[1;35m";
constexpr std::string_view cyan = "\x1b[1;36m";
constexpr std::string_view green = "\x1b[1;32m";

// Lines longer than this are shown as a window around the finding.
constexpr std::size_t max_shown_columns = 140;

struct painter {
    bool on;
    [[nodiscard]] std::string operator()(std::string_view colour, std::string_view text) const {
        return on ? fmt::format("{}{}{}", colour, text, reset) : std::string(text);
    }
};

bool is_continuation_byte(char c) {
    return (static_cast<unsigned char>(c) & 0xC0) == 0x80;
}

// One display cell per code point, tabs to the next multiple of 4; the printed line and
// the underline use the same rule so they stay aligned.
struct display_line {
    std::string text;                // with tabs expanded
    std::vector<std::uint32_t> cell; // display cell of each byte of the original line
};

display_line layout(std::string_view line) {
    display_line d;
    d.cell.resize(line.size() + 1);
    std::uint32_t col = 0;
    for (std::size_t i = 0; i < line.size(); ++i) {
        d.cell[i] = col;
        const char c = line[i];
        if (c == '\t') {
            const std::uint32_t next = (col / 4 + 1) * 4;
            d.text.append(next - col, ' ');
            col = next;
        } else {
            d.text += (static_cast<unsigned char>(c) < 0x20) ? ' ' : c;
            if (!is_continuation_byte(c))
                ++col;
        }
    }
    d.cell[line.size()] = col;
    return d;
}

// Byte index in d.text where display cell `target` starts.
std::size_t byte_at_cell(const std::string& text, std::uint32_t target) {
    std::uint32_t col = 0;
    for (std::size_t i = 0; i < text.size(); ++i) {
        if (is_continuation_byte(text[i]))
            continue;
        if (col == target)
            return i;
        ++col;
    }
    return text.size();
}

void render_snippet(std::string& out, const diagnostic& d, const painter& paint) {
    const source_file& file = *d.where.file;
    const line_column start = file.position(d.where.range.begin);
    const std::string_view line = file.line_text(start.line);
    const std::uint32_t line_begin = file.line_start(start.line);
    const auto to_line = [&](std::uint32_t offset) -> std::size_t {
        return std::min<std::size_t>(offset > line_begin ? offset - line_begin : 0, line.size());
    };
    const display_line shown = layout(line);
    const std::uint32_t width = shown.cell[line.size()];

    std::string marks(width + 1, ' ');
    const auto mark = [&](span r, char head, char body) {
        const std::size_t b = to_line(r.begin);
        const std::size_t e = std::max(to_line(r.end), b + 1);
        const std::uint32_t cb = shown.cell[b];
        const std::uint32_t ce = std::max(shown.cell[std::min(e, line.size())], cb + 1);
        for (std::uint32_t c = cb; c < ce && c < marks.size(); ++c)
            if (marks[c] == ' ' || head == '^')
                marks[c] = c == cb ? head : body;
    };
    for (const auto& t : d.terms)
        if (t.where.file == &file && file.position(t.where.range.begin).line == start.line)
            mark(t.where.range, '~', '~');
    mark(d.where.range, '^', '~');
    while (!marks.empty() && marks.back() == ' ')
        marks.pop_back();

    // Window very long lines around the primary range.
    std::string text = shown.text;
    std::uint32_t first_cell = 0;
    std::string prefix, suffix;
    if (width > max_shown_columns) {
        const std::uint32_t focus = shown.cell[to_line(d.where.range.begin)];
        first_cell = focus > 40 ? focus - 40 : 0;
        const std::uint32_t last_cell =
            std::min<std::uint32_t>(width, first_cell + max_shown_columns);
        const std::size_t b = byte_at_cell(text, first_cell);
        const std::size_t e = byte_at_cell(text, last_cell);
        if (first_cell > 0)
            prefix = "\u2026";
        if (last_cell < width)
            suffix = "\u2026";
        text = text.substr(b, e - b);
        marks = marks.size() > first_cell ? marks.substr(first_cell, last_cell - first_cell) : "";
        while (!marks.empty() && marks.back() == ' ')
            marks.pop_back();
    }
    // A workbook's formula is shown under its cell, not a line number of plumb's listing.
    const cell_place* place = file.cell_at(d.where.range.begin);
    const std::string gutter =
        place != nullptr ? fmt::format("{:>5}", place->cell) : fmt::format("{:>5}", start.line);
    out += fmt::format("{} | {}{}{}\n", gutter, prefix, text, suffix);
    out += fmt::format("{} | {}{}\n", std::string(gutter.size(), ' '), prefix.empty() ? "" : " ",
                       paint(green, marks));
}

} // namespace

std::string_view caution_text() {
    return "a dimensionally consistent formula can still be wrong (a missing factor, a wrong "
           "coefficient, a formula used outside its range); this check does not replace "
           "independent review under the applicable local codes and licensed professional practice";
}

std::string render_text(const diagnostic& d, const text_style& style) {
    const painter paint{style.colour};
    std::string out;
    if (d.where.file != nullptr && d.where.file->cell_at(d.where.range.begin) != nullptr) {
        out += paint(bold, fmt::format("{}:{}:", d.where.file->path(),
                                       cell_text(*d.where.file->cell_at(d.where.range.begin))));
    } else if (d.where.file != nullptr) {
        const line_column p = d.where.file->position(d.where.range.begin);
        out += paint(bold, fmt::format("{}:{}:{}:", d.where.file->path(), p.line, p.column));
    } else {
        out += paint(bold, "plumb:");
    }
    const std::string_view level = d.level == severity::error     ? "error:"
                                   : d.level == severity::warning ? "warning:"
                                                                  : "note:";
    const std::string_view colour = d.level == severity::error     ? red
                                    : d.level == severity::warning ? magenta
                                                                   : cyan;
    out += fmt::format(" {} {} [{}]\n", paint(colour, level), d.message, d.rule);
    if (d.where.file != nullptr)
        render_snippet(out, d, paint);
    for (const auto& n : d.notes) {
        if (n.where.file != nullptr) {
            const line_column p = n.where.file->position(n.where.range.begin);
            out += fmt::format(
                "      {} {}\n",
                paint(bold, fmt::format("{}:{}:{}:", n.where.file->path(), p.line, p.column)),
                fmt::format("{} {}", paint(cyan, "note:"), n.message));
        } else {
            out += fmt::format("      {} {}\n", paint(cyan, "note:"), n.message);
        }
    }
    return out;
}

std::string render_text(const check_report& report, const text_style& style) {
    const painter paint{style.colour};
    std::string out;
    for (const auto& d : report.diagnostics) {
        out += render_text(d, style);
        out += '\n';
    }
    const std::size_t errors = report.count(severity::error);
    const std::size_t warnings = report.count(severity::warning);
    const auto plural = [](std::size_t n, std::string_view word) {
        return fmt::format("{} {}{}", n, word, n == 1 ? "" : "s");
    };
    const std::string scope = fmt::format("{} in {}", plural(report.formulas_checked, "formula"),
                                          plural(report.files_checked, "file"));
    if (report.workbooks_checked > 0)
        out +=
            fmt::format("{} {} checked, {} not checked, {} without units\n", paint(bold, "plumb:"),
                        plural(report.cells_checked, "formula cell"), report.cells_not_checked,
                        plural(report.inputs_without_units, "input cell"));
    if (errors == 0 && warnings == 0)
        out += fmt::format("{} {}: no dimensional inconsistency found\n", paint(bold, "plumb:"),
                           scope);
    else
        out += fmt::format("{} {}, {} ({} checked)\n", paint(bold, "plumb:"),
                           plural(errors, "error"), plural(warnings, "warning"), scope);
    out += fmt::format("{} {}\n", paint(cyan, "caution:"), caution_text());
    return out;
}

} // namespace plumb
