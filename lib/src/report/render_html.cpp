// The sign-off report: one self-contained HTML page (inline style, no scripts, no network
// resources: its Content-Security-Policy forbids them) that prints cleanly.
#include "model/user_file.hpp"
#include "plumb/accepted.hpp"
#include "plumb/provenance.hpp"
#include "plumb/render.hpp"
#include "plumb/version.hpp"
#include "report/json_text.hpp"
#include "report/place.hpp"

#include <algorithm>
#include <fmt/format.h>
#include <fstream>
#include <map>
#include <sstream>

namespace plumb {

namespace fs = std::filesystem;

namespace {

constexpr std::string_view style_sheet = R"(
body { font: 10.5pt/1.45 system-ui, sans-serif; color: #111; margin: 2em auto; max-width: 62em;
       padding: 0 1.5em; }
h1 { font-size: 1.6em; margin-bottom: .2em; }
h2 { font-size: 1.25em; border-bottom: 2px solid #333; padding-bottom: .15em; margin-top: 1.8em; }
h3 { font-size: 1.05em; margin: 1.3em 0 .4em; font-family: ui-monospace, monospace; }
table { border-collapse: collapse; width: 100%; margin: .4em 0 1em; }
th, td { border: 1px solid #bbb; padding: .25em .45em; text-align: left; vertical-align: top; }
th { background: #eee; }
code, pre, .mono { font-family: ui-monospace, "DejaVu Sans Mono", monospace; font-size: .92em; }
pre { background: #f6f6f6; border: 1px solid #ccc; padding: .6em; white-space: pre-wrap; }
.caution { border: 3px solid #a00; background: #fff3f3; padding: .8em 1em; margin: 1em 0;
           font-size: 1.05em; }
.caution strong { color: #a00; }
.finding { margin: .2em 0; padding: .15em .4em; border-left: 4px solid #999; }
.error { border-left-color: #c00; background: #fff0f0; }
.warning { border-left-color: #c80; background: #fff8e8; }
.note { border-left-color: #369; background: #f0f5fb; }
.accepted { border-left-color: #393; background: #f0f8f0; }
.reason { font-style: italic; }
.ok { color: #262; }
.hash { font-size: .8em; word-break: break-all; }
.signature td { height: 2.2em; }
@page { margin: 16mm 14mm; }
@media print {
  body { margin: 0; max-width: none; padding: 0; font-size: 9.5pt; }
  h2 { break-after: avoid; }
  tr, .finding, .caution, pre { break-inside: avoid; }
  thead { display: table-header-group; }
  .finding, .caution, th { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
}
)";

std::string esc(std::string_view s) {
    const std::string clean = valid_utf8(s);
    std::string out;
    out.reserve(clean.size());
    for (const char c : clean) {
        switch (c) {
        case '&':
            out += "&amp;";
            break;
        case '<':
            out += "&lt;";
            break;
        case '>':
            out += "&gt;";
            break;
        case '"':
            out += "&quot;";
            break;
        default:
            out += c;
        }
    }
    return out;
}

std::string_view level_word(severity s) {
    return s == severity::error ? "error" : s == severity::warning ? "warning" : "note";
}

// "file:line:column", or "book.xlsx:Sheet!C4" for a workbook's cell; nothing for the run.
std::string place(const location& where) {
    return where.file == nullptr ? std::string() : place_text(where);
}

std::string dimension_text(const std::optional<dimension>& d) {
    if (!d)
        return "(not known: see the finding)";
    if (d->is_dimensionless())
        return "[1]";
    const std::string_view name = quantity_name(*d);
    return name.empty() ? d->to_string() : fmt::format("{} ({})", d->to_string(), name);
}

std::string finding_html(const diagnostic& d) {
    std::string out = fmt::format(
        "<div class=\"finding {}\"><span class=\"mono\">{}</span> <strong>{}{}</strong>: {} "
        "<code>[{}]</code>",
        d.accepted ? "accepted" : level_word(d.level), esc(place(d.where)),
        d.accepted ? "accepted " : "", level_word(d.level), esc(d.message), esc(d.rule));
    for (const auto& t : d.terms)
        out += fmt::format("<br>&nbsp;&nbsp;term <code>{}</code> is {}", esc(t.text),
                           esc(dimension_text(t.dim)));
    for (const auto& n : d.notes)
        out += fmt::format("<br>&nbsp;&nbsp;note: {}{}", esc(n.message),
                           n.where.file ? " (" + esc(place(n.where)) + ")" : "");
    if (d.accepted)
        out += fmt::format("<br><span class=\"reason\">accepted after review ({} {}): {}</span>",
                           d.accepted->by_inline_mark ? "mark at" : "entry at",
                           esc(place(d.accepted->mark)), esc(d.accepted->reason));
    out += "</div>\n";
    return out;
}

std::string caution_html() {
    std::string text(caution_text());
    if (!text.empty() && text.front() >= 'a' && text.front() <= 'z')
        text.front() = static_cast<char>(text.front() - 'a' + 'A');
    return fmt::format("<div class=\"caution\" id=\"caution\"><strong>Caution.</strong> {}. "
                       "This report records a check of dimensions and units only; it is not an "
                       "approval of the design.</div>\n",
                       esc(text));
}

struct file_entry {
    std::string path;
    std::string role;
    std::string digest;
    std::uintmax_t bytes = 0;
};

// Digests of the files as they are on disk now (a Markdown note's whole text, not only its
// blocks; a workbook's package, not plumb's listing of its cells), each file once.
std::vector<file_entry> file_entries(const check_report& report) {
    std::vector<file_entry> out;
    for (const auto& s : report.sources) {
        if (s->path().empty() || s->path().front() == '<')
            continue;
        const bool checked = std::find(report.checked_files.begin(), report.checked_files.end(),
                                       s.get()) != report.checked_files.end();
        const std::string_view role = s->holds_cells() ? "checked (workbook)"
                                      : checked        ? "checked"
                                                       : "read (dictionary or accepted findings)";
        const auto same_path = [&](const file_entry& e) { return e.path == s->path(); };
        if (const auto seen = std::find_if(out.begin(), out.end(), same_path); seen != out.end()) {
            if (role != seen->role && role != "read (dictionary or accepted findings)")
                seen->role = role;
            continue;
        }
        file_entry e;
        e.path = s->path();
        e.role = role;
        if (const user_file read = read_user_file(s->path(), max_workbook_file_bytes);
            read.problem.empty()) {
            e.bytes = read.text.size();
            e.digest = sha256_hex(read.text);
        } else {
            e.digest = "(could not be read again to hash)";
        }
        out.push_back(std::move(e));
    }
    return out;
}

} // namespace

std::string render_signoff_html(const check_report& report, const signoff_context& context) {
    const std::size_t errors = report.count(severity::error);
    const std::size_t warnings = report.count(severity::warning);
    const std::size_t notes = report.count(severity::note);
    std::string out;
    out += "<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n";
    out += "<meta http-equiv=\"Content-Security-Policy\" content=\"default-src 'none'; "
           "style-src 'unsafe-inline'\">\n";
    out += "<meta name=\"generator\" content=\"plumb " + esc(version()) + "\">\n";
    out += "<title>Dimensional check for sign-off</title>\n<style>";
    out += style_sheet;
    out += "</style>\n</head>\n<body>\n";
    out += "<h1>Dimensional check for sign-off</h1>\n";
    out += caution_html();

    out += "<h2 id=\"header\">What was checked</h2>\n<table>\n";
    std::string paths;
    for (const auto& p : context.paths_checked)
        paths += (paths.empty() ? "" : ", ") + fmt::format("<code>{}</code>", esc(p));
    out += fmt::format("<tr><th>paths</th><td>{}</td></tr>\n", paths);
    out += fmt::format("<tr><th>checked at (UTC)</th><td id=\"checked-at\">{}</td></tr>\n",
                       esc(context.checked_at));
    out +=
        fmt::format("<tr><th>plumb version</th><td id=\"version\">{}</td></tr>\n", esc(version()));
    out += fmt::format("<tr><th>git commit</th><td class=\"mono\" id=\"commit\">{}</td></tr>\n",
                       context.git_commit.empty() ? "(not in a git repository)"
                                                  : esc(context.git_commit));
    out += fmt::format("<tr><th>settings file</th><td class=\"mono\">{}</td></tr>\n",
                       context.settings_file.empty() ? "(none)" : esc(context.settings_file));
    out += "</table>\n<table id=\"files\">\n<thead><tr><th>file</th><th>role</th><th>bytes</th>"
           "<th>SHA-256</th></tr></thead>\n<tbody>\n";
    for (const auto& f : file_entries(report))
        out += fmt::format("<tr><td class=\"mono\">{}</td><td>{}</td><td>{}</td><td "
                           "class=\"mono hash\">{}</td></tr>\n",
                           esc(f.path), esc(f.role), f.bytes, esc(f.digest));
    out += "</tbody></table>\n";

    out += "<h2 id=\"summary\">Summary</h2>\n<table>\n";
    out += fmt::format("<tr><th>files checked</th><td>{}</td></tr>\n", report.files_checked);
    out += fmt::format("<tr><th>formulas checked</th><td id=\"formula-count\">{}</td></tr>\n",
                       report.formulas_checked);
    out += fmt::format("<tr><th>errors</th><td id=\"error-count\">{}</td></tr>\n", errors);
    out += fmt::format("<tr><th>warnings</th><td id=\"warning-count\">{}</td></tr>\n", warnings);
    out += fmt::format("<tr><th>notes (inferred dimensions, restated coefficients)</th><td>{}</td>"
                       "</tr>\n",
                       notes);
    out += fmt::format("<tr><th>accepted after review</th><td id=\"accepted-count\">{}</td>"
                       "</tr>\n",
                       report.count_accepted());
    out += "</table>\n";
    if (report.input_failed)
        out += "<p class=\"finding error\"><strong>Some input could not be read or parsed; "
               "see the findings. This report is incomplete.</strong></p>\n";
    if (report.count_accepted() > 0) {
        out += "<h3>Accepted findings and their reasons</h3>\n";
        for (const auto& d : report.diagnostics)
            if (d.accepted)
                out += finding_html(d);
    }

    // Each file's formulas with the findings on them; findings elsewhere in the file after.
    // A workbook is one section, whichever of plumb's listings of it a finding stands in.
    out += "<h2 id=\"formulas\">Formulas</h2>\n";
    std::map<const source_file*, std::vector<const formula_record*>> by_file;
    for (const auto& f : report.formulas)
        by_file[f.where.file].push_back(&f);
    std::vector<std::vector<const source_file*>> sections;
    for (const source_file* file : report.checked_files)
        sections.push_back({file});
    std::map<std::string, std::size_t> workbook_section;
    for (const auto& source : report.sources)
        if (source->holds_cells()) {
            const auto [at, added] = workbook_section.emplace(source->path(), sections.size());
            if (added)
                sections.emplace_back();
            sections[at->second].push_back(source.get());
        }
    std::vector<bool> shown(report.diagnostics.size(), false);
    const auto findings_in = [&](const formula_record& f) {
        std::string findings;
        for (std::size_t i = 0; i < report.diagnostics.size(); ++i) {
            const diagnostic& d = report.diagnostics[i];
            if (d.where.file == f.where.file && d.where.range.begin >= f.where.range.begin &&
                d.where.range.begin < std::max(f.where.range.end, f.where.range.begin + 1)) {
                findings += finding_html(d);
                shown[i] = true;
            }
        }
        return findings.empty() ? std::string("<div class=\"ok\">consistent</div>") : findings;
    };
    for (const auto& section : sections) {
        const bool workbook = section.front()->holds_cells();
        out += fmt::format("<h3>{}</h3>\n", esc(section.front()->path()));
        std::vector<const formula_record*> formulas;
        for (const source_file* file : section)
            formulas.insert(formulas.end(), by_file[file].begin(), by_file[file].end());
        if (formulas.empty())
            out += workbook ? "<p>No formula cells in this workbook.</p>\n"
                            : "<p>No formulas in this file.</p>\n";
        else if (workbook)
            out += "<table class=\"formulas\">\n<thead><tr><th>cell</th><th>formula</th>"
                   "<th>unit written for the cell</th><th>result</th></tr></thead>\n<tbody>\n";
        else
            out += "<table class=\"formulas\">\n<thead><tr><th>line</th><th>label</th>"
                   "<th>formula</th><th>dimension of each side</th></tr></thead>\n<tbody>\n";
        for (const formula_record* f : formulas) {
            const source_file* file = f->where.file;
            const std::string formula = esc(single_line(file->text(f->where.range)));
            if (workbook) {
                const cell_place* cell = file->cell_at(f->where.range.begin);
                out += fmt::format("<tr><td class=\"mono\">{}</td><td class=\"mono\">{}</td>"
                                   "<td class=\"mono\">{}</td><td>{}</td></tr>\n",
                                   cell != nullptr ? esc(cell_text(*cell)) : std::string(), formula,
                                   f->written_unit.empty() ? std::string("(none)")
                                                           : esc(f->written_unit),
                                   findings_in(*f));
                continue;
            }
            std::string sides;
            for (std::size_t i = 0; i < f->sides.size(); ++i)
                sides += (i == 0 ? "" : fmt::format(" <b>{}</b> ", esc(f->relations[i - 1]))) +
                         esc(dimension_text(f->sides[i]));
            const std::string findings = findings_in(*f);
            out += fmt::format(
                "<tr><td>{}</td><td class=\"mono\">{}</td><td class=\"mono\">{}</td><td>{}{}</td>"
                "</tr>\n",
                file->position(f->where.range.begin).line, esc(f->label), formula, sides, findings);
        }
        if (!formulas.empty())
            out += "</tbody></table>\n";
        std::string rest;
        for (std::size_t i = 0; i < report.diagnostics.size(); ++i)
            if (!shown[i] && std::find(section.begin(), section.end(),
                                       report.diagnostics[i].where.file) != section.end()) {
                rest += finding_html(report.diagnostics[i]);
                shown[i] = true;
            }
        if (!rest.empty())
            out += (workbook ? "<p>Other findings in this workbook (inputs without units, "
                               "cells not checked):</p>\n"
                             : "<p>Other findings in this file (declarations, studies):</p>\n") +
                   rest;
    }
    std::string elsewhere;
    for (std::size_t i = 0; i < report.diagnostics.size(); ++i)
        if (!shown[i])
            elsewhere += finding_html(report.diagnostics[i]);
    if (!elsewhere.empty())
        out += "<h3>Findings in other files and about the run</h3>\n" + elsewhere;

    if (!report.studies.empty()) {
        out += "<h2 id=\"studies\">Dimensionless groups and model plans</h2>\n<pre>";
        out += esc(render_groups_text(report));
        out += "</pre>\n";
    }

    out += "<h2 id=\"sign-off\">Review</h2>\n";
    out += caution_html();
    out += "<table class=\"signature\"><tr><th>checked by</th><td></td><th>date</th><td></td></tr>"
           "<tr><th>remarks</th><td colspan=\"3\"></td></tr></table>\n";
    out += fmt::format("<p class=\"mono\">plumb {}</p>\n</body>\n</html>\n", esc(version()));
    return out;
}

} // namespace plumb
