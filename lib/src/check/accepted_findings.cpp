// The file of accepted findings (TOML 1.0, read and written with toml++): entries matched by
// file, rule and statement key, never by line number, so that edits elsewhere keep them.
#include "check/acceptance.hpp"
#include "check/statement_text.hpp"
#include "model/user_file.hpp"
#include "model/utf8.hpp"
#include "plumb/accepted.hpp"
#include "plumb/rules.hpp"

#include <algorithm>
#include <array>
#include <fmt/format.h>
#include <fstream>
#include <map>
#include <sstream>
#include <toml++/toml.h>

namespace plumb {

namespace fs = std::filesystem;

namespace {

struct entry {
    std::string file;
    std::string rule;
    std::string statement;
    std::string reason;
    std::string finding; // the message when it was accepted, for people
    location where;      // in the file of accepted findings
    bool used = false;
    bool complete = false;
};

constexpr std::array<std::string_view, 5> entry_keys = {"file", "rule", "statement", "reason",
                                                        "finding"};

diagnostic problem(std::string_view rule, severity level, std::string message, location where) {
    diagnostic d;
    d.level = level;
    d.rule = std::string(rule);
    d.message = std::move(message);
    d.where = where;
    return d;
}

location place(const source_file& file, const toml::source_region& region) {
    if (region.begin.line == 0 || region.begin.line > file.line_count())
        return {&file, {0, 0}};
    const std::uint32_t start = file.line_start(region.begin.line);
    const std::string_view line = file.line_text(region.begin.line);
    // toml++ counts columns in code points; walk them to a byte offset.
    std::uint32_t byte = 0;
    for (std::uint32_t column = 1; column < region.begin.column && byte < line.size(); ++column) {
        ++byte;
        while (byte < line.size() && (static_cast<unsigned char>(line[byte]) & 0xC0) == 0x80)
            ++byte;
    }
    return {&file, {start + byte, start + static_cast<std::uint32_t>(line.size())}};
}

// The entries of the file; problems with it become findings in `out`.
std::vector<entry> read_entries(const source_file& file, std::vector<diagnostic>& out) {
    std::vector<entry> entries;
    toml::table doc;
    try {
        doc = toml::parse(file.text(), file.path());
    } catch (const toml::parse_error& e) {
        out.push_back(problem(rules::acceptance_problem, severity::error,
                              fmt::format("not valid TOML: {}", e.description()),
                              place(file, e.source())));
        return entries;
    }
    for (const auto& [key, value] : doc) {
        if (key.str() != "accepted" || !value.is_array_of_tables()) {
            out.push_back(problem(rules::acceptance_problem, severity::error,
                                  fmt::format("unknown key '{}': this file holds only "
                                              "[[accepted]] entries",
                                              key.str()),
                                  place(file, key.source())));
        }
    }
    const toml::array* list = doc["accepted"].as_array();
    if (list == nullptr)
        return entries;
    for (const auto& node : *list) {
        const toml::table* t = node.as_table();
        if (t == nullptr)
            continue;
        entry e;
        e.where = place(file, t->source());
        bool well_formed = true;
        for (const auto& [key, value] : *t) {
            const bool known =
                std::find(entry_keys.begin(), entry_keys.end(), key.str()) != entry_keys.end();
            if (!known || !value.is_string()) {
                out.push_back(problem(
                    rules::acceptance_problem, severity::error,
                    known ? fmt::format("'{}' must be a string", key.str())
                          : fmt::format("unknown key '{}' in an accepted finding; the keys are "
                                        "file, rule, statement, reason and finding",
                                        key.str()),
                    place(file, key.source())));
                well_formed = false;
                continue;
            }
            const std::string text(*value.value<std::string_view>());
            if (key.str() == "file")
                e.file = text;
            else if (key.str() == "rule")
                e.rule = text;
            else if (key.str() == "statement")
                e.statement = text;
            else if (key.str() == "reason")
                e.reason = text;
            else
                e.finding = text;
        }
        for (const auto& [name, value] :
             {std::pair<std::string_view, const std::string*>{"file", &e.file},
              {"rule", &e.rule},
              {"statement", &e.statement}})
            if (value->empty() && well_formed) {
                out.push_back(problem(rules::acceptance_problem, severity::error,
                                      fmt::format("this accepted finding has no '{}'", name),
                                      e.where));
                well_formed = false;
            }
        if (well_formed && e.reason.find_first_not_of(" \t") == std::string::npos) {
            diagnostic d =
                problem(rules::acceptance_problem, severity::error,
                        "this accepted finding has no reason, so it accepts nothing", e.where);
            d.notes.push_back({"write why the finding is right as it stands, in 'reason'", {}});
            out.push_back(std::move(d));
            well_formed = false;
        }
        e.complete = well_formed;
        entries.push_back(std::move(e));
    }
    return entries;
}

struct relative_paths {
    fs::path root;
    std::map<const source_file*, std::string> known;
    const std::string& of(const source_file* f) {
        auto it = known.find(f);
        if (it == known.end())
            it = known.emplace(f, project_relative(f->path(), root)).first;
        return it->second;
    }
};

std::vector<entry> read_entries_of(check_report& report, const fs::path& path,
                                   std::vector<diagnostic>& out, const source_file*& source) {
    user_file read = read_user_file(path);
    if (read.missing)
        return {}; // no file yet: nothing accepted
    if (!read.problem.empty()) {
        out.push_back(problem(rules::unreadable, severity::error,
                              fmt::format("cannot read '{}': {}", path.string(), read.problem),
                              {}));
        report.input_failed = true;
        return {};
    }
    report.sources.push_back(std::make_unique<source_file>(path.string(), std::move(read.text)));
    source = report.sources.back().get();
    if (const auto bad = first_invalid_utf8(source->text())) {
        const auto at = static_cast<std::uint32_t>(*bad);
        out.push_back(problem(rules::acceptance_problem, severity::error,
                              fmt::format("this file is not valid UTF-8: the bytes {} here are "
                                          "not a character; save the file as UTF-8",
                                          invalid_bytes_text(source->text(), *bad)),
                              {source, {at, at + 1}}));
        return {};
    }
    return read_entries(*source, out);
}

} // namespace

std::string project_relative(const fs::path& path, const fs::path& project_root) {
    std::error_code ec;
    const fs::path full = fs::weakly_canonical(path, ec);
    const fs::path root = fs::weakly_canonical(project_root.empty() ? "." : project_root, ec);
    const fs::path relative = full.lexically_relative(root);
    if (relative.empty() || *relative.begin() == "..")
        return full.generic_string();
    return relative.generic_string();
}

void apply_accepted_findings(check_report& report, const fs::path& file,
                             const fs::path& project_root) {
    std::vector<diagnostic> found;
    const source_file* source = nullptr;
    std::vector<entry> entries = read_entries_of(report, file, found, source);
    relative_paths paths{project_root, {}};
    for (auto& d : report.diagnostics) {
        if (d.accepted || d.where.file == nullptr || d.level == severity::note ||
            d.rule == rules::acceptance_problem || d.rule == rules::stale_acceptance)
            continue;
        const std::string& rel = paths.of(d.where.file);
        std::string key;
        for (auto& e : entries) {
            if (!e.complete || e.used || e.file != rel || e.rule != d.rule)
                continue;
            if (key.empty())
                key = statement_key(*d.where.file, d.where.range.begin);
            if (e.statement != key)
                continue;
            e.used = true;
            d.accepted = acceptance{e.reason, e.where, false};
            break;
        }
    }
    std::vector<std::string> checked;
    for (const source_file* f : report.checked_files)
        checked.push_back(paths.of(f));
    for (const auto& e : entries) {
        if (!e.complete || e.used ||
            std::find(checked.begin(), checked.end(), e.file) == checked.end())
            continue;
        diagnostic d = problem(rules::stale_acceptance, severity::warning,
                               fmt::format("this entry accepts a '{}' finding on '{}' in '{}', "
                                           "but there is no such finding any more",
                                           e.rule, e.statement, e.file),
                               e.where);
        d.notes.push_back(
            {"remove the entry, or run 'plumb accept' again to rewrite the file", {}});
        found.push_back(std::move(d));
    }
    report.diagnostics.insert(report.diagnostics.end(), std::make_move_iterator(found.begin()),
                              std::make_move_iterator(found.end()));
}

std::string accepted_findings_text(const check_report& report, const fs::path& project_root,
                                   const fs::path& existing_file, std::string_view reason) {
    relative_paths paths{project_root, {}};
    std::vector<std::string> checked;
    for (const source_file* f : report.checked_files)
        checked.push_back(paths.of(f));
    toml::array list;
    const auto add = [&](std::string_view file, std::string_view rule, std::string_view statement,
                         std::string_view why, std::string_view finding) {
        toml::table t;
        t.insert("file", file);
        t.insert("rule", rule);
        t.insert("statement", statement);
        t.insert("reason", why);
        if (!finding.empty())
            t.insert("finding", finding);
        list.push_back(std::move(t));
    };
    // Entries about files this run did not check stay as they were.
    if (user_file read = read_user_file(existing_file); read.problem.empty()) {
        const source_file old(existing_file.string(), std::move(read.text));
        std::vector<diagnostic> ignored;
        for (const auto& e : read_entries(old, ignored))
            if (e.complete && std::find(checked.begin(), checked.end(), e.file) == checked.end())
                add(e.file, e.rule, e.statement, e.reason, e.finding);
    }
    for (const auto& d : report.diagnostics) {
        if (d.where.file == nullptr || d.level == severity::note ||
            (d.accepted && d.accepted->by_inline_mark) || d.rule == rules::acceptance_problem ||
            d.rule == rules::stale_acceptance || d.rule == rules::syntax ||
            d.rule == rules::unreadable)
            continue;
        add(paths.of(d.where.file), d.rule, statement_key(*d.where.file, d.where.range.begin),
            d.accepted ? std::string_view(d.accepted->reason) : reason, d.message);
    }
    std::ostringstream out;
    out << "# Findings this project has reviewed and accepted, each with its reason.\n"
           "# Written by 'plumb accept'; read by 'plumb check'. Entries match by file, rule and\n"
           "# statement (a formula's @label, or its text without blanks), not by line.\n\n";
    if (!list.empty()) {
        toml::table doc;
        doc.insert("accepted", std::move(list));
        out << doc << "\n";
    }
    return out.str();
}

} // namespace plumb
