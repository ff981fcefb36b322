// `# reviewed unit-scale, unused: 7758 is bbl per acre-ft` accepts the findings of the named
// rules on the statement that carries the mark, and only with a reason.
#include "check/acceptance.hpp"
#include "check/edit_distance.hpp"
#include "check/statement_text.hpp"
#include "plumb/rules.hpp"

#include <fmt/format.h>

namespace plumb {
namespace {

constexpr std::string_view mark_word = "reviewed";

struct mark {
    location where; // the comment
    line_range lines;
    std::vector<std::string> rules;
    std::vector<bool> used;
    std::string reason;
};

bool is_rule_id(std::string_view id) {
    for (const auto& r : rules::all())
        if (r.id == id)
            return true;
    return false;
}

bool looks_like_rule_id(std::string_view word) {
    if (word.empty() || word.find('-') == std::string_view::npos)
        return false;
    for (const char c : word)
        if (!((c >= 'a' && c <= 'z') || c == '-'))
            return false;
    return true;
}

std::string_view trim(std::string_view s) {
    while (!s.empty() && (s.front() == ' ' || s.front() == '\t'))
        s.remove_prefix(1);
    while (!s.empty() && (s.back() == ' ' || s.back() == '\t' || s.back() == '\r'))
        s.remove_suffix(1);
    return s;
}

diagnostic problem(std::string_view rule, severity level, std::string message, location where) {
    diagnostic d;
    d.level = level;
    d.rule = std::string(rule);
    d.message = std::move(message);
    d.where = where;
    return d;
}

std::string nearest_rule(std::string_view word) {
    std::string best;
    std::size_t best_distance = 4;
    for (const auto& r : rules::all()) {
        const std::size_t d = edit_distance(word, r.id, 3);
        if (d < best_distance) {
            best_distance = d;
            best = std::string(r.id);
        }
    }
    return best;
}

// The mark on one line, if it has one, into `marks`; a malformed mark becomes a finding in
// `out`.
void read_mark(const source_file& file, std::uint32_t line, std::vector<mark>& marks,
               std::vector<diagnostic>& out) {
    const std::string_view text = file.line_text(line);
    const std::size_t hash = comment_start(text);
    if (hash == std::string_view::npos)
        return;
    const std::string_view comment = trim(text.substr(hash + 1));
    if (comment.substr(0, mark_word.size()) != mark_word || comment.size() == mark_word.size() ||
        (comment[mark_word.size()] != ' ' && comment[mark_word.size()] != '\t'))
        return;
    const std::string_view body = trim(comment.substr(mark_word.size()));
    const std::size_t colon = body.find(':');
    const std::string_view list = body.substr(0, std::min(colon, body.size()));
    // Only a comment whose first word is a rule id is a mark: "# reviewed by the checker"
    // is an ordinary remark.
    const std::string_view first_word = trim(list.substr(0, list.find_first_of(", \t")));
    if (!is_rule_id(first_word) && !looks_like_rule_id(first_word))
        return;
    const std::uint32_t begin = file.line_start(line) + static_cast<std::uint32_t>(hash);
    const location where{&file, {begin, begin + static_cast<std::uint32_t>(text.size() - hash)}};
    mark m;
    m.where = where;
    m.lines = logical_line_around(file, line);
    bool usable = true;
    std::string_view rest = list;
    while (!rest.empty()) {
        const std::size_t comma = rest.find(',');
        const std::string_view id = trim(rest.substr(0, comma));
        rest = comma == std::string_view::npos ? std::string_view{} : rest.substr(comma + 1);
        if (id.empty())
            continue;
        if (id == rules::acceptance_problem || id == rules::stale_acceptance || !is_rule_id(id)) {
            const std::string near = nearest_rule(id);
            diagnostic d =
                problem(rules::acceptance_problem, severity::error,
                        fmt::format("'{}' is not a rule that a mark can accept", id), where);
            d.notes.push_back({near.empty() || near == id
                                   ? std::string("'plumb rules' lists the rule ids")
                                   : fmt::format("did you mean '{}'?", near),
                               {}});
            out.push_back(std::move(d));
            usable = false;
            continue;
        }
        m.rules.emplace_back(id);
    }
    const std::string_view reason =
        colon == std::string_view::npos ? std::string_view{} : trim(body.substr(colon + 1));
    if (reason.empty()) {
        diagnostic d = problem(rules::acceptance_problem, severity::error,
                               "a 'reviewed' mark needs a reason after a colon, so that "
                               "the checker can see why the finding is accepted",
                               where);
        d.notes.push_back({"for example: # reviewed unit-scale: 7758 is bbl per acre-ft, from the "
                           "field-units table",
                           {}});
        out.push_back(std::move(d));
        usable = false;
    }
    if (!usable)
        return; // nothing is accepted by a mark that is not complete
    m.reason = std::string(reason);
    m.used.assign(m.rules.size(), false);
    marks.push_back(std::move(m));
}

// The marks of one file; malformed marks become findings in `out`. A mark is a comment, so
// only the lines with a '#' are read: found by one search of the whole text rather than one
// per line (issue 12).
std::vector<mark> read_marks(const source_file& file, std::vector<diagnostic>& out) {
    std::vector<mark> marks;
    const std::string_view text = file.text();
    std::uint32_t line = 1;
    for (std::size_t from = 0;;) {
        const std::size_t hash = text.find('#', from);
        if (hash == std::string_view::npos)
            break;
        while (line < file.line_count() && file.line_start(line + 1) <= hash)
            ++line;
        read_mark(file, line, marks, out);
        if (line == file.line_count())
            break;
        from = file.line_start(line + 1);
    }
    return marks;
}

} // namespace

void apply_inline_marks(check_report& report) {
    std::vector<diagnostic> found;
    for (const source_file* file : report.checked_files) {
        std::vector<mark> marks = read_marks(*file, found);
        if (marks.empty())
            continue;
        for (auto& d : report.diagnostics) {
            if (d.where.file != file || d.accepted || d.rule == rules::acceptance_problem)
                continue;
            const std::uint32_t line = file->position(d.where.range.begin).line;
            for (auto& m : marks) {
                if (line < m.lines.first || line > m.lines.last)
                    continue;
                for (std::size_t i = 0; i < m.rules.size(); ++i)
                    if (m.rules[i] == d.rule) {
                        d.accepted = acceptance{m.reason, m.where, true};
                        m.used[i] = true;
                    }
            }
        }
        for (const auto& m : marks)
            for (std::size_t i = 0; i < m.rules.size(); ++i)
                if (!m.used[i]) {
                    diagnostic d =
                        problem(rules::stale_acceptance, severity::warning,
                                fmt::format("this mark accepts '{}', but the statement has no such "
                                            "finding any more",
                                            m.rules[i]),
                                m.where);
                    d.notes.push_back(
                        {"remove the rule from the mark (or the mark), so that a new finding "
                         "here is not taken as reviewed",
                         {}});
                    found.push_back(std::move(d));
                }
    }
    report.diagnostics.insert(report.diagnostics.end(), std::make_move_iterator(found.begin()),
                              std::make_move_iterator(found.end()));
}

} // namespace plumb
