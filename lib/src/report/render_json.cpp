// The JSON report: one document, schema described in the README ("JSON output").
#include "plumb/render.hpp"
#include "plumb/version.hpp"

#include <fmt/format.h>

namespace plumb {
namespace {

void append_string(std::string& out, std::string_view s) {
    out += '"';
    for (const char c : s) {
        switch (c) {
        case '"':
            out += "\\\"";
            break;
        case '\\':
            out += "\\\\";
            break;
        case '\n':
            out += "\\n";
            break;
        case '\r':
            out += "\\r";
            break;
        case '\t':
            out += "\\t";
            break;
        default:
            if (static_cast<unsigned char>(c) < 0x20)
                out +=
                    fmt::format("\\u{:04x}", static_cast<unsigned>(static_cast<unsigned char>(c)));
            else
                out += c;
        }
    }
    out += '"';
}

// Invalid UTF-8 in a source line must not make the document invalid JSON.
std::string valid_utf8(std::string_view s) {
    std::string out;
    out.reserve(s.size());
    for (std::size_t i = 0; i < s.size();) {
        const auto c = static_cast<unsigned char>(s[i]);
        std::size_t len = c < 0x80           ? 1
                          : (c >> 5) == 0x6  ? 2
                          : (c >> 4) == 0xE  ? 3
                          : (c >> 3) == 0x1E ? 4
                                             : 0;
        bool ok = len > 0 && i + len <= s.size();
        for (std::size_t k = 1; ok && k < len; ++k)
            ok = (static_cast<unsigned char>(s[i + k]) & 0xC0) == 0x80;
        if (ok) {
            out.append(s.substr(i, len));
            i += len;
        } else {
            out += "\uFFFD";
            ++i;
        }
    }
    return out;
}

void append_location(std::string& out, const location& where) {
    if (where.file == nullptr)
        return;
    if (const cell_place* place = where.file->cell_at(where.range.begin)) {
        out += "\"file\": ";
        append_string(out, valid_utf8(where.file->path()));
        out += ", \"sheet\": ";
        append_string(out, valid_utf8(place->sheet));
        out += ", \"cell\": ";
        append_string(out, place->cell);
        out += ", ";
        return;
    }
    const line_column b = where.file->position(where.range.begin);
    const line_column e = where.file->position(where.range.end);
    out += "\"file\": ";
    append_string(out, valid_utf8(where.file->path()));
    out += fmt::format(", \"line\": {}, \"column\": {}, \"end_line\": {}, \"end_column\": {}, ",
                       b.line, b.column, e.line, e.column);
}

void append_dimension(std::string& out, const dimension& d) {
    static constexpr std::array<std::string_view, base_dimension_count> keys = {
        "mass", "length", "time", "temperature", "amount", "current", "luminous_intensity"};
    out += "\"dimension\": ";
    append_string(out, d.to_string());
    out += ", \"exponents\": {";
    for (std::size_t i = 0; i < base_dimension_count; ++i) {
        out += fmt::format("{}\"{}\": \"{}\"", i == 0 ? "" : ", ", keys[i],
                           d.exponent(static_cast<base_dimension>(i)).to_string());
    }
    out += "}, \"quantity\": ";
    append_string(out, quantity_name(d));
}

std::string_view severity_name(severity s) {
    switch (s) {
    case severity::error:
        return "error";
    case severity::warning:
        return "warning";
    case severity::note:
        return "note";
    }
    return "error";
}

} // namespace

std::string render_json(const check_report& report) {
    std::string out;
    out += fmt::format(
        "{{\n  \"tool\": \"plumb\",\n  \"version\": \"{}\",\n  \"schema\": 1,\n  \"findings\": [",
        version());
    bool first = true;
    for (const auto& d : report.diagnostics) {
        out += first ? "\n    {" : ",\n    {";
        first = false;
        append_location(out, d.where);
        out += fmt::format("\"severity\": \"{}\", \"rule\": ", severity_name(d.level));
        append_string(out, d.rule);
        out += ", \"message\": ";
        append_string(out, valid_utf8(d.message));
        out += ",\n      \"terms\": [";
        for (std::size_t i = 0; i < d.terms.size(); ++i) {
            out += i == 0 ? "{" : ", {";
            if (!d.terms[i].cell.empty()) {
                // A term that names a cell or range: that cell, not the formula's.
                out += "\"file\": ";
                append_string(out, valid_utf8(d.terms[i].where.file->path()));
                out += ", \"sheet\": ";
                append_string(out, valid_utf8(d.terms[i].sheet));
                out += ", \"cell\": ";
                append_string(out, d.terms[i].cell);
                out += ", ";
            } else {
                append_location(out, d.terms[i].where);
            }
            out += "\"text\": ";
            append_string(out, valid_utf8(d.terms[i].text));
            out += ", ";
            append_dimension(out, d.terms[i].dim);
            out += "}";
        }
        out += "],\n      \"notes\": [";
        for (std::size_t i = 0; i < d.notes.size(); ++i) {
            out += i == 0 ? "{" : ", {";
            append_location(out, d.notes[i].where);
            out += "\"message\": ";
            append_string(out, valid_utf8(d.notes[i].message));
            out += "}";
        }
        out += "]}";
    }
    out += first ? "],\n" : "\n  ],\n";
    out += fmt::format(
        "  \"summary\": {{\"files_checked\": {}, \"formulas_checked\": {}, \"errors\": {}, "
        "\"warnings\": {}, \"input_failed\": {}, \"formula_cells_checked\": {}, "
        "\"cells_not_checked\": {}, \"inputs_without_units\": {}}},\n",
        report.files_checked, report.formulas_checked, report.count(severity::error),
        report.count(severity::warning), report.input_failed ? "true" : "false",
        report.cells_checked, report.cells_not_checked, report.inputs_without_units);
    out += "  \"caution\": ";
    append_string(out, caution_text());
    out += "\n}\n";
    return out;
}

} // namespace plumb
