// plumb.toml, read with toml++. Every key is known here and documented in
// settings_reference(); anything else is a problem, never silently ignored.
#include "plumb/settings.hpp"
#include "model/user_file.hpp"
#include "model/utf8.hpp"
#include "plumb/accepted.hpp"
#include "plumb/rules.hpp"

#include <algorithm>
#include <array>
#include <fmt/format.h>
#include <toml++/toml.h>

namespace plumb {

namespace fs = std::filesystem;

namespace {

constexpr std::string_view reference_text =
    R"(dictionaries = ["dictionaries/fluids.plumb"]  # read before every checked file
include = ["calcs", "notes"]          # checked when 'plumb check' is given no path
exclude = ["calcs/superseded/**"]     # never checked: globs (* ** ?) under the root
restate-in = ["ft", "lb", "s"]        # as --restate-in: base units of a consistent set
fail-on = "warning"                   # "error" (the default) or "warning": what fails a run
accepted-findings = "plumb-accepted.toml"  # the file 'plumb accept' writes (this default)

[rules]                               # a rule's severity: "error", "warning" or "off"
unit-scale = "error"
unused = "off"
)";

constexpr std::array<std::string_view, 7> known_keys = {
    "dictionaries", "include", "exclude", "restate-in", "fail-on", "accepted-findings", "rules"};

class reader {
  public:
    explicit reader(settings_result& out) : out_(out) {}

    void problem(const toml::source_region& at, std::string message) {
        out_.problems.push_back({at.begin.line, at.begin.column, std::move(message)});
    }

    std::optional<std::string> string(const toml::key& key, const toml::node& value) {
        if (const auto s = value.value<std::string_view>(); s && value.is_string())
            return std::string(*s);
        problem(value.source(), fmt::format("'{}' must be a string", key.str()));
        return std::nullopt;
    }

    std::vector<std::string> strings(const toml::key& key, const toml::node& value) {
        std::vector<std::string> items;
        const toml::array* list = value.as_array();
        if (list == nullptr) {
            problem(
                value.source(),
                fmt::format("'{}' must be a list of strings, such as [\"a\", \"b\"]", key.str()));
            return items;
        }
        for (const auto& item : *list) {
            if (!item.is_string()) {
                problem(item.source(), fmt::format("'{}' must hold strings only", key.str()));
                continue;
            }
            items.emplace_back(*item.value<std::string_view>());
        }
        return items;
    }

    std::optional<severity> level(const toml::node& value, bool allow_off, bool& off) {
        off = false;
        const auto s = value.value<std::string_view>();
        if (s && value.is_string()) {
            if (*s == "error")
                return severity::error;
            if (*s == "warning")
                return severity::warning;
            if (allow_off && *s == "off") {
                off = true;
                return std::nullopt;
            }
        }
        problem(value.source(), allow_off ? "a rule's severity is \"error\", \"warning\" or \"off\""
                                          : "'fail-on' is \"error\" or \"warning\"");
        return std::nullopt;
    }

  private:
    settings_result& out_;
};

bool is_rule(std::string_view id) {
    for (const auto& r : rules::all())
        if (r.id == id)
            return true;
    return false;
}

} // namespace

std::optional<fs::path> find_settings(const fs::path& start) {
    std::error_code ec;
    fs::path folder = fs::absolute(start.empty() ? fs::path(".") : start, ec);
    if (ec)
        return std::nullopt;
    if (!fs::is_directory(folder, ec))
        folder = folder.parent_path();
    folder = folder.lexically_normal();
    for (int depth = 0; depth < 256 && !folder.empty(); ++depth) {
        const fs::path candidate = folder / settings_file_name;
        if (fs::is_regular_file(candidate, ec))
            return candidate;
        const fs::path parent = folder.parent_path();
        if (parent == folder)
            break;
        folder = parent;
    }
    return std::nullopt;
}

settings_result read_settings(const fs::path& file) {
    settings_result out;
    project_settings& s = out.settings;
    s.file = file;
    s.root = fs::absolute(file).parent_path();
    s.accepted_findings = s.root / accepted_findings_name;
    reader r(out);
    user_file read = read_user_file(file);
    if (!read.problem.empty()) {
        out.problems.push_back(
            {0, 0, fmt::format("cannot read '{}': {}", file.string(), read.problem)});
        return out;
    }
    if (const auto bad = first_invalid_utf8(read.text)) {
        const std::string_view before = std::string_view(read.text).substr(0, *bad);
        const auto line =
            static_cast<std::uint32_t>(std::count(before.begin(), before.end(), '\n') + 1);
        const std::size_t line_start = before.rfind('\n');
        const auto column = static_cast<std::uint32_t>(
            *bad - (line_start == std::string_view::npos ? 0 : line_start + 1) + 1);
        out.problems.push_back({line, column,
                                fmt::format("the bytes {} are not UTF-8; save the file as UTF-8",
                                            invalid_bytes_text(read.text, *bad))});
        return out;
    }
    toml::table doc;
    try {
        doc = toml::parse(read.text, file.string());
    } catch (const toml::parse_error& e) {
        out.problems.push_back(
            {e.source().begin.line, e.source().begin.column, std::string(e.description())});
        return out;
    }
    for (const auto& [key, value] : doc) {
        const std::string_view name = key.str();
        if (std::find(known_keys.begin(), known_keys.end(), name) == known_keys.end()) {
            r.problem(key.source(),
                      fmt::format("unknown key '{}'; the keys are dictionaries, include, "
                                  "exclude, restate-in, fail-on, accepted-findings and [rules]",
                                  name));
        } else if (name == "dictionaries") {
            for (const auto& d : r.strings(key, value))
                s.dictionaries.push_back(s.root / d);
        } else if (name == "include") {
            s.include = r.strings(key, value);
        } else if (name == "exclude") {
            s.exclude = r.strings(key, value);
        } else if (name == "restate-in") {
            s.restate_in = r.strings(key, value);
        } else if (name == "fail-on") {
            bool off = false;
            if (const auto l = r.level(value, false, off))
                s.fail_on = *l;
        } else if (name == "accepted-findings") {
            if (const auto path = r.string(key, value))
                s.accepted_findings = s.root / *path;
        } else if (const toml::table* rules_table = value.as_table()) {
            for (const auto& [rule, level_node] : *rules_table) {
                if (!is_rule(rule.str())) {
                    r.problem(rule.source(),
                              fmt::format("'{}' is not a rule id ('plumb rules' lists them)",
                                          rule.str()));
                    continue;
                }
                bool off = false;
                const auto l = r.level(level_node, true, off);
                if (l || off)
                    s.rule_levels.push_back({std::string(rule.str()), l});
            }
        } else {
            r.problem(value.source(), "[rules] must be a table of rule = \"severity\"");
        }
    }
    return out;
}

std::string_view settings_reference() {
    return reference_text;
}

} // namespace plumb
