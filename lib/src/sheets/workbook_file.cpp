// Reads the workbook's bytes (never writing to it), its sidecar and the dictionaries, and
// hands them to the workbook checker. A bad file is one finding; the caller goes on.
#include "sheets/workbook_file.hpp"

#include "notation/parser.hpp"
#include "plumb/rules.hpp"
#include "sheets/workbook_checker.hpp"

#include <algorithm>
#include <fmt/format.h>
#include <fstream>

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

bool read_bytes(const fs::path& path, std::string& out, std::string& why) {
    std::ifstream in(path, std::ios::binary);
    if (!in) {
        why = "it cannot be opened";
        return false;
    }
    in.seekg(0, std::ios::end);
    const std::streamoff size = in.tellg();
    if (size < 0) {
        why = "its size cannot be read";
        return false;
    }
    if (static_cast<std::uint64_t>(size) > read_limits{}.max_file_bytes) {
        why = fmt::format("it is larger than {} MiB", read_limits{}.max_file_bytes >> 20);
        return false;
    }
    in.seekg(0);
    out.resize(static_cast<std::size_t>(size));
    in.read(out.data(), size);
    if (!in) {
        why = "a read error occurred";
        return false;
    }
    return true;
}

// Declarations of a dictionary or sidecar that give defined names a unit.
void take_declarations(const fs::path& path, const std::string& origin, outside_units& units,
                       check_report& report) {
    std::string text, why;
    if (!read_bytes(path, text, why)) {
        fail(report, fmt::format("cannot read '{}': {}", path.string(), why));
        return;
    }
    report.sources.push_back(std::make_unique<source_file>(path.string(), std::move(text)));
    const source_file& src = *report.sources.back();
    const syntax::parsed_file tree = parse_file(src);
    for (const auto& d : tree.diagnostics)
        report.diagnostics.push_back(d);
    if (tree.has_syntax_error)
        report.input_failed = true;
    for (const auto& n : tree.names) {
        const syntax::declaration& decl = tree.declarations[n.declaration];
        if (!decl.kind.dim || decl.kind.to_infer)
            continue;
        declared_unit u;
        u.unit.dim = *decl.kind.dim;
        u.unit.scale = decl.kind.si_factor;
        if (decl.kind.single_unit != nullptr &&
            decl.kind.single_unit->scale != unit_scale::absolute)
            u.unit.offset = decl.kind.single_unit;
        u.unit.text = std::string(src.text(decl.spec));
        u.origin = origin;
        std::string name(src.text(n.name));
        std::transform(name.begin(), name.end(), name.begin(),
                       [](unsigned char c) { return static_cast<char>(std::toupper(c)); });
        units.names.emplace(std::move(name), std::move(u));
    }
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

void check_workbook_file(const fs::path& path, const check_options& options, check_report& report) {
    std::string bytes, why;
    if (!read_bytes(path, bytes, why)) {
        fail(report, fmt::format("cannot read '{}': {}", path.string(), why));
        return;
    }
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
    outside_units units;
    for (const auto& dict : options.dictionaries)
        take_declarations(dict, fmt::format("the dictionary {}", dict.filename().string()), units,
                          report);
    const fs::path sidecar = sidecar_for(path);
    std::error_code ec;
    if (fs::is_regular_file(sidecar, ec))
        take_declarations(sidecar, fmt::format("the sidecar {}", sidecar.filename().string()),
                          units, report);
    check_workbook(book, path.string(), units, report);
}

} // namespace plumb::sheets
