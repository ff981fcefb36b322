// The JSON report: one document, schema described in the README ("JSON output").
#include "plumb/render.hpp"
#include "plumb/version.hpp"
#include "report/json_text.hpp"

#include <fmt/format.h>

#include <charconv>
#include <cstdint>
#include <iterator>

namespace plumb {
namespace {

void append_string(std::string& out, std::string_view s) {
    append_json_string(out, s);
}

// Each file's name as a JSON string, made once: the list of formulas names its file on every
// entry, and checking the name's UTF-8 each time cost more than the check (issue 12).
class file_names {
  public:
    const std::string& quoted(const source_file* file) {
        if (file != last_) {
            last_ = file;
            text_.clear();
            append_string(text_, valid_utf8(file->path()));
        }
        return text_;
    }

  private:
    const source_file* last_ = nullptr;
    std::string text_;
};

void append_location(std::string& out, const location& where, file_names& names) {
    if (where.file == nullptr)
        return;
    if (const cell_place* place = where.file->cell_at(where.range.begin)) {
        out += "\"file\": ";
        out += names.quoted(where.file);
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
    out += names.quoted(where.file);
    // Written by hand: formatting four numbers through fmt cost 2,000 instructions a formula.
    const auto field = [&out](std::string_view key, std::uint32_t value) {
        out += key;
        char digits[16];
        const auto written = std::to_chars(std::begin(digits), std::end(digits), value);
        out.append(digits, written.ptr);
    };
    field(", \"line\": ", b.line);
    field(", \"column\": ", b.column);
    field(", \"end_line\": ", e.line);
    field(", \"end_column\": ", e.column);
    out += ", ";
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

// A unit-bound coefficient restated for coherent units: the value to full precision (the
// shortest text that reads back as the same double), the factor that gives it, as units and
// as digits, and the units the written coefficient holds for. Only on findings that have one.
void append_restated(std::string& out, const std::vector<restated_coefficient>& restated) {
    if (restated.empty())
        return;
    out += ",\n      \"restated\": [";
    for (std::size_t i = 0; i < restated.size(); ++i) {
        const restated_coefficient& r = restated[i];
        out += i == 0 ? "{\"units\": " : ", {\"units\": ";
        append_string(out, valid_utf8(r.units));
        out += fmt::format(", \"value\": {}, \"factor\": ", r.value);
        append_string(out, valid_utf8(r.factor));
        out += ", \"factor_digits\": ";
        append_string(out, valid_utf8(r.factor_digits));
        out += fmt::format(", \"factor_value\": {}, \"holds_with\": [", r.factor_value);
        for (std::size_t k = 0; k < r.holds_with.size(); ++k) {
            if (k > 0)
                out += ", ";
            append_string(out, valid_utf8(r.holds_with[k]));
        }
        out += "]}";
    }
    out += "]";
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
    file_names names;
    bool first = true;
    for (const auto& d : report.diagnostics) {
        out += first ? "\n    {" : ",\n    {";
        first = false;
        append_location(out, d.where, names);
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
                out += names.quoted(d.terms[i].where.file);
                out += ", \"sheet\": ";
                append_string(out, valid_utf8(d.terms[i].sheet));
                out += ", \"cell\": ";
                append_string(out, d.terms[i].cell);
                out += ", ";
            } else {
                append_location(out, d.terms[i].where, names);
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
            append_location(out, d.notes[i].where, names);
            out += "\"message\": ";
            append_string(out, valid_utf8(d.notes[i].message));
            out += "}";
        }
        out += "]";
        if (d.accepted) {
            // Accepted after review: still listed, with the reason and where it was given.
            out += ",\n      \"accepted\": {";
            append_location(out, d.accepted->mark, names);
            out += fmt::format("\"by\": \"{}\", \"reason\": ",
                               d.accepted->by_inline_mark ? "mark" : "accepted-findings");
            append_string(out, valid_utf8(d.accepted->reason));
            out += "}";
        }
        append_restated(out, d.restated);
        out += "}";
    }
    out += first ? "],\n" : "\n  ],\n";
    // Every formula checked, those that passed too, when the check recorded them.
    out += "  \"formulas\": [";
    for (std::size_t i = 0; i < report.formulas.size(); ++i) {
        const formula_record& f = report.formulas[i];
        out += i == 0 ? "\n    {" : ",\n    {";
        append_location(out, f.where, names);
        out += "\"label\": ";
        append_string(out, valid_utf8(f.label));
        out += ", \"result\": \"";
        out += f.worst ? severity_name(*f.worst) : std::string_view("passed");
        out += "\"}";
    }
    out += report.formulas.empty() ? "],\n" : "\n  ],\n";
    out += fmt::format(
        "  \"summary\": {{\"files_checked\": {}, \"formulas_checked\": {}, \"errors\": {}, "
        "\"warnings\": {}, \"accepted\": {}, \"input_failed\": {}, \"formula_cells_checked\": {}, "
        "\"cells_not_checked\": {}, \"inputs_without_units\": {}}},\n",
        report.files_checked, report.formulas_checked, report.count(severity::error),
        report.count(severity::warning), report.count_accepted(),
        report.input_failed ? "true" : "false", report.cells_checked, report.cells_not_checked,
        report.inputs_without_units);
    out += "  \"caution\": ";
    append_string(out, caution_text());
    out += "\n}\n";
    return out;
}

} // namespace plumb
