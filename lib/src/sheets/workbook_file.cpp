// Reads the workbook's bytes (never writing to it), its sidecar and the dictionaries, and
// hands them to the workbook checker. A bad file is one finding; the caller goes on.
#include "sheets/workbook_file.hpp"

#include "check/acceptance.hpp"
#include "model/ascii_case.hpp"
#include "model/user_file.hpp"
#include "model/utf8.hpp"
#include "notation/parser.hpp"
#include "plumb/rules.hpp"
#include "sheets/workbook_checker.hpp"

#include <algorithm>
#include <fmt/format.h>
#include <fmt/ranges.h>

namespace plumb::sheets {

namespace fs = std::filesystem;

namespace {

bool ends_with(const std::string& s, std::string_view tail) {
    return s.size() >= tail.size() && s.compare(s.size() - tail.size(), tail.size(), tail) == 0;
}

void fail(check_report& report, std::string message) {
    diagnostic d;
    d.level = severity::error;
    d.rule = std::string(rules::unreadable);
    d.message = std::move(message);
    report.diagnostics.push_back(std::move(d));
    report.input_failed = true;
}

bool read_bytes(const fs::path& path, std::string& out, std::string& why,
                std::uint64_t limit = max_text_file_bytes) {
    user_file read = read_user_file(path, limit);
    why = std::move(read.problem);
    out = std::move(read.text);
    return why.empty();
}

// "D" to its 0-based column; empty when the text is not a column's letters.
std::optional<std::uint32_t> parse_column(std::string_view text) {
    if (!text.empty() && text.front() == '$')
        text.remove_prefix(1);
    if (text.empty() || text.size() > 3)
        return std::nullopt;
    std::uint32_t column = 0;
    for (char c : text) {
        if (c < 'A' || c > 'Z')
            return std::nullopt;
        column = column * 26 + static_cast<std::uint32_t>(c - 'A' + 1);
    }
    if (column > max_columns)
        return std::nullopt;
    return column - 1;
}

// "C4", "C4:C9", "D", "D:F" to an area; empty when the corners mix a cell with a column or
// lie outside the sheet.
std::optional<cell_area> parse_cells_area(std::string_view text) {
    const std::size_t colon = text.find(':');
    const std::string_view first = text.substr(0, colon);
    const std::string_view last = colon == std::string_view::npos ? first : text.substr(colon + 1);
    if (const auto a = parse_a1(first)) {
        const auto b = parse_a1(last);
        if (!b)
            return std::nullopt;
        return cell_area{{std::min(a->row, b->row), std::min(a->column, b->column)},
                         {std::max(a->row, b->row), std::max(a->column, b->column)}};
    }
    const auto a = parse_column(first);
    const auto b = parse_column(last);
    if (!a || !b)
        return std::nullopt;
    return cell_area{{0, std::min(*a, *b)}, {max_rows - 1, std::max(*a, *b)}};
}

// 'Pump data' to Pump data; a doubled quote inside stands for one.
std::string sheet_name_of(std::string_view written) {
    if (written.size() < 2 || written.front() != '\'')
        return std::string(written);
    std::string name;
    for (std::size_t i = 1; i + 1 < written.size(); ++i) {
        name += written[i];
        if (written[i] == '\'' && written[i + 1] == '\'')
            ++i;
    }
    return name;
}

void sidecar_problem(check_report& report, const source_file& src, span where, std::string message,
                     std::string note) {
    diagnostic d;
    d.level = severity::error;
    d.rule = std::string(rules::sidecar_problem);
    d.message = std::move(message);
    d.where = {&src, where};
    if (!note.empty())
        d.notes.push_back({std::move(note), {}});
    report.diagnostics.push_back(std::move(d));
}

declared_unit unit_of(const syntax::declared_kind& kind, std::string text, std::string origin) {
    declared_unit u;
    u.unit.dim = *kind.dim;
    u.unit.scale = kind.si_factor;
    u.unit.exact_scale = kind.si_exact;
    if (kind.single_unit != nullptr && kind.single_unit->scale != unit_scale::absolute)
        u.unit.offset = kind.single_unit;
    u.unit.text = std::move(text);
    u.origin = std::move(origin);
    return u;
}

// A sidecar's `cells` lines: units for cells, ranges and columns of the workbook's sheets.
void take_cells(const syntax::parsed_file& tree, const source_file& src, const workbook& book,
                const std::string& origin, outside_units& units, check_report& report) {
    for (const auto& line : tree.cells) {
        if (!line.kind.dim)
            continue; // an unknown unit, already reported
        const std::string sheet = sheet_name_of(src.text(line.sheet));
        const bool known = std::any_of(book.sheets.begin(), book.sheets.end(),
                                       [&](const struct sheet& s) { return s.name == sheet; });
        if (!known) {
            std::vector<std::string> names;
            for (const auto& s : book.sheets)
                names.push_back(quoted_sheet_name(s.name));
            sidecar_problem(report, src, line.sheet,
                            fmt::format("the workbook has no sheet named '{}', so this line gives "
                                        "no cell a unit",
                                        sheet),
                            fmt::format("its sheets are: {}", fmt::join(names, ", ")));
            continue;
        }
        const auto area = parse_cells_area(src.text(line.area));
        if (!area) {
            sidecar_problem(report, src, line.area,
                            "write one cell (C4), a range of cells (C4:C9) or whole columns "
                            "(D or D:F), not a cell and a column together",
                            {});
            continue;
        }
        units.areas.push_back({sheet,
                               *area,
                               unit_of(line.kind, std::string(src.text(line.spec)), origin),
                               {&src, line.range}});
    }
}

// The whole line of each unit a sidecar or dictionary defines, for reading unit text.
void take_measures(const syntax::parsed_file& tree, const source_file& src, outside_units& units) {
    const std::string_view text = src.text();
    for (const auto& u : tree.units) {
        const std::size_t begin = text.rfind('\n', u.where.begin);
        const std::size_t end = text.find('\n', u.where.end);
        const std::size_t from = begin == std::string_view::npos ? 0 : begin + 1;
        units.measures += text.substr(from, end == std::string_view::npos ? end : end - from);
        units.measures += '\n';
    }
}

// Declarations of a dictionary or sidecar that give defined names a unit, and its `cells`
// lines.
void take_declarations(const fs::path& path, const std::string& origin, const workbook& book,
                       outside_units& units, check_report& report) {
    std::string text, why;
    if (!read_bytes(path, text, why)) {
        fail(report, fmt::format("cannot read '{}': {}", path.string(), why));
        return;
    }
    report.sources.push_back(std::make_unique<source_file>(path.string(), std::move(text)));
    const source_file& src = *report.sources.back();
    if (const auto bad = first_invalid_utf8(src.text())) {
        diagnostic d;
        d.rule = std::string(rules::syntax);
        d.message = fmt::format("this file is not valid UTF-8: the bytes {} here are not a "
                                "character; save the file as UTF-8",
                                invalid_bytes_text(src.text(), *bad));
        d.where = {&src, {static_cast<std::uint32_t>(*bad), static_cast<std::uint32_t>(*bad + 1)}};
        report.diagnostics.push_back(std::move(d));
        report.input_failed = true;
    }
    const syntax::parsed_file tree = parse_file(src);
    for (const auto& d : tree.diagnostics)
        report.diagnostics.push_back(d);
    if (tree.has_syntax_error)
        report.input_failed = true;
    for (const auto& n : tree.names) {
        const syntax::declaration& decl = tree.declarations[n.declaration];
        if (!decl.kind.dim || decl.kind.to_infer)
            continue;
        declared_unit u = unit_of(decl.kind, std::string(src.text(decl.spec)), origin);
        const std::string name = upper_ascii(src.text(n.name));
        units.names.emplace(std::move(name), std::move(u));
    }
    take_cells(tree, src, book, origin, units, report);
    take_measures(tree, src, units);
}

} // namespace

bool is_workbook_path(const fs::path& path) {
    const std::string ext = path.extension().string();
    return ext == ".xlsx" || ext == ".xlsm" || ext == ".ods";
}

bool is_sidecar_path(const fs::path& path) {
    return ends_with(path.filename().string(), ".cells.plumb");
}

fs::path sidecar_for(const fs::path& workbook) {
    fs::path p = workbook;
    p.replace_extension(".cells.plumb");
    return p;
}

void report_cells_outside_sidecar(const syntax::parsed_file& tree, std::vector<diagnostic>& out) {
    // A sidecar named on the command line is checked as it stands: its lines are in place.
    if (tree.source != nullptr && is_sidecar_path(tree.source->path()))
        return;
    for (const auto& line : tree.cells) {
        diagnostic d;
        d.level = severity::error;
        d.rule = std::string(rules::sidecar_problem);
        d.message = "a cells line gives workbook cells a unit, and belongs in a workbook's "
                    "sidecar, not here";
        d.where = {tree.source, line.range};
        d.notes.push_back({"write it in book.cells.plumb beside book.xlsx or book.ods, or pass "
                           "its file with --dict when checking the workbook",
                           {}});
        out.push_back(std::move(d));
    }
}

void check_workbook_file(const fs::path& path, const check_options& options, check_report& report) {
    std::string bytes, why;
    if (!read_bytes(path, bytes, why, read_limits{}.max_file_bytes)) {
        fail(report, fmt::format("cannot read '{}': {}", path.string(), why));
        return;
    }
    const fs::path sidecar = sidecar_for(path);
    std::error_code ec;
    check_workbook_bytes(bytes, path, fs::is_regular_file(sidecar, ec) ? sidecar : fs::path(),
                         options, report);
}

void check_workbook_bytes(std::string_view bytes, const fs::path& path, const fs::path& sidecar,
                          const check_options& options, check_report& report) {
    workbook book;
    try {
        book = read_workbook(bytes, path.filename().string());
    } catch (const workbook_error& e) {
        fail(report, fmt::format("cannot read '{}': {}", path.string(), e.what()));
        return;
    } catch (const std::bad_alloc&) {
        fail(report, fmt::format("cannot read '{}': it needs more memory than is available",
                                 path.string()));
        return;
    }
    // The sidecar found beside the workbook comes first, then those given with --dict.
    outside_units units;
    if (!sidecar.empty())
        take_declarations(sidecar, fmt::format("the sidecar {}", sidecar.filename().string()), book,
                          units, report);
    for (const auto& dict : options.dictionaries)
        take_declarations(dict, fmt::format("the dictionary {}", dict.filename().string()), book,
                          units, report);
    check_workbook(book, path.string(), units, report, options.record_formulas);
}

} // namespace plumb::sheets

namespace plumb {

check_report check_workbook_bytes(std::string name, std::string_view bytes,
                                  const check_options& options) {
    check_report report;
    sheets::check_workbook_bytes(bytes, name, {}, options, report);
    review_findings(report, options);
    return report;
}

} // namespace plumb
