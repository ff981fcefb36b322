// plumb's command line: parses arguments, calls libplumb, prints. No checking logic here.
#include "plumb/check.hpp"
#include "plumb/render.hpp"
#include "plumb/rules.hpp"
#include "plumb/unit_table.hpp"
#include "plumb/version.hpp"

#include <algorithm>
#include <cstdio>
#include <cstdlib>
#include <cstring>
#include <exception>
#include <fmt/format.h>
#include <optional>
#include <string>
#include <unistd.h>
#include <vector>

namespace {

constexpr int exit_clean = 0;
constexpr int exit_findings = 1;
constexpr int exit_usage = 2;

constexpr std::string_view usage_text =
    R"(plumb - check engineering formulas for dimensional homogeneity

usage:
  plumb check [options] PATH...   check .plumb files (folders are searched for *.plumb)
  plumb dim EXPRESSION [FILE...]  print the dimension of an expression, using the
                                  symbols that FILEs declare
  plumb groups [options] PATH...  the dimensionless groups of each study in the files,
                                  and the model plan where prototype and model lines
                                  give values
  plumb groups --vars 'F depends on rho, V, D, mu' [--repeating 'rho, V, D'] FILE...
                                  the groups of variables that FILEs declare
  plumb units [TEXT]              list the built-in units (those matching TEXT)
  plumb rules                     list the rules and their ids
  plumb --version | --help

options for check, groups and dim:
  --dict FILE          read FILE's declarations before each file (repeatable)
  --format text|json   output format for check and groups (default: text)
  --study NAME         groups: only the study called NAME
  --restate-in UNITS   check: restate coefficients marked ? also for the consistent set
                       of units with these base units, e.g. 'ft, lb, s' or 'ft, lbf, s'
  --color auto|always|never
                       colour the text output (default: auto, which means on a
                       terminal only, and never when NO_COLOR is set or TERM=dumb)

exit status: 0 no errors (warnings allowed), 1 errors found, 2 bad usage or a file
that cannot be read or parsed.

A dimensionally consistent formula can still be wrong; plumb does not replace
independent review under the applicable codes and licensed practice.
)";

void print(std::string_view text) {
    std::fwrite(text.data(), 1, text.size(), stdout);
}

int usage_error(std::string_view message) {
    fmt::print(stderr, "plumb: {}\nrun 'plumb --help' for usage\n", message);
    return exit_usage;
}

enum class colour_choice { automatic, always, never };

// Every terminal decision lives here.
bool use_colour(colour_choice choice) {
    if (choice != colour_choice::automatic)
        return choice == colour_choice::always;
    if (const char* no_colour = std::getenv("NO_COLOR"); no_colour != nullptr && *no_colour != '\0')
        return false;
    if (const char* term = std::getenv("TERM"); term != nullptr && std::strcmp(term, "dumb") == 0)
        return false;
    return isatty(STDOUT_FILENO) != 0;
}

struct options {
    std::vector<std::string> positional;
    std::string study;
    std::string variables;
    std::string repeating;
    plumb::check_options check;
    bool json = false;
    colour_choice colour = colour_choice::automatic;
};

// Parses the options shared by check and dim; an error message when they are wrong.
std::optional<std::string> parse_options(const std::vector<std::string>& args, options& out) {
    bool only_paths = false;
    for (std::size_t i = 0; i < args.size(); ++i) {
        const std::string& a = args[i];
        const auto value = [&](std::string_view flag) -> std::optional<std::string> {
            const std::string prefix = std::string(flag) + "=";
            if (a.rfind(prefix, 0) == 0)
                return a.substr(prefix.size());
            if (i + 1 < args.size())
                return args[++i];
            return std::nullopt;
        };
        if (only_paths || a.empty() || a[0] != '-' || a == "-") {
            out.positional.push_back(a);
        } else if (a == "--") {
            only_paths = true;
        } else if (a == "--dict" || a.rfind("--dict=", 0) == 0) {
            const auto v = value("--dict");
            if (!v)
                return "--dict needs a file";
            out.check.dictionaries.emplace_back(*v);
        } else if (a == "--restate-in" || a.rfind("--restate-in=", 0) == 0) {
            const auto v = value("--restate-in");
            if (!v || v->empty())
                return "--restate-in needs base units, such as 'ft, lb, s'";
            std::string item;
            for (const char c : *v + ",") {
                if (c == ',' || c == ' ') {
                    if (!item.empty())
                        out.check.restate_in.push_back(item);
                    item.clear();
                } else {
                    item += c;
                }
            }
        } else if (a == "--study" || a.rfind("--study=", 0) == 0) {
            const auto v = value("--study");
            if (!v)
                return "--study needs a study name";
            out.study = *v;
        } else if (a == "--vars" || a.rfind("--vars=", 0) == 0) {
            const auto v = value("--vars");
            if (!v)
                return "--vars needs a list such as 'F depends on rho, V, D, mu'";
            out.variables = *v;
        } else if (a == "--repeating" || a.rfind("--repeating=", 0) == 0) {
            const auto v = value("--repeating");
            if (!v)
                return "--repeating needs a list such as 'rho, V, D'";
            out.repeating = *v;
        } else if (a == "--format" || a.rfind("--format=", 0) == 0) {
            const auto v = value("--format");
            if (!v || (*v != "text" && *v != "json"))
                return "--format takes 'text' or 'json'";
            out.json = *v == "json";
        } else if (a == "--color" || a == "--colour" || a.rfind("--color=", 0) == 0 ||
                   a.rfind("--colour=", 0) == 0) {
            const auto v = value(a.rfind("--colour", 0) == 0 ? "--colour" : "--color");
            if (!v || (*v != "auto" && *v != "always" && *v != "never"))
                return "--color takes 'auto', 'always' or 'never'";
            out.colour = *v == "always"  ? colour_choice::always
                         : *v == "never" ? colour_choice::never
                                         : colour_choice::automatic;
        } else {
            return fmt::format("unknown option '{}'", a);
        }
    }
    return std::nullopt;
}

// The units of --restate-in must make a consistent set (one base each, or force as a base).
std::optional<std::string> check_restate_units(const std::vector<std::string>& units) {
    if (units.empty())
        return std::nullopt;
    const std::string problem = plumb::restate_units_problem(units);
    if (problem.empty())
        return std::nullopt;
    return fmt::format("--restate-in: {}", problem);
}

int run_check(const std::vector<std::string>& args) {
    options opts;
    if (auto error = parse_options(args, opts))
        return usage_error(*error);
    if (auto error = check_restate_units(opts.check.restate_in))
        return usage_error(*error);
    if (opts.positional.empty())
        return usage_error("check needs at least one file or folder");
    std::vector<std::filesystem::path> paths(opts.positional.begin(), opts.positional.end());
    opts.check.record_formulas = opts.json;
    const plumb::check_report report = plumb::check_paths(paths, opts.check);
    if (opts.json)
        print(plumb::render_json(report));
    else
        print(plumb::render_text(report, {use_colour(opts.colour)}));
    if (report.input_failed)
        return exit_usage;
    return report.count(plumb::severity::error) > 0 ? exit_findings : exit_clean;
}

int run_groups(const std::vector<std::string>& args) {
    options opts;
    if (auto error = parse_options(args, opts))
        return usage_error(*error);
    if (!opts.repeating.empty() && opts.variables.empty())
        return usage_error("--repeating goes with --vars");
    plumb::check_report report;
    if (!opts.variables.empty()) {
        // The command line's variables become a study in a file that uses the given ones.
        std::string text;
        for (const auto& path : opts.positional)
            text += fmt::format("use \"{}\"\n", std::filesystem::absolute(path).string());
        text += fmt::format("study command-line: {}{}\n", opts.variables,
                            opts.repeating.empty() ? "" : " repeating " + opts.repeating);
        report = plumb::check_text("<command line>", text, opts.check);
    } else {
        if (opts.positional.empty())
            return usage_error("groups needs at least one file or folder, or --vars");
        std::vector<std::filesystem::path> paths(opts.positional.begin(), opts.positional.end());
        report = plumb::check_paths(paths, opts.check);
    }
    if (!opts.study.empty()) {
        std::erase_if(report.studies,
                      [&](const plumb::study_report& s) { return s.name != opts.study; });
        if (report.studies.empty())
            return usage_error(fmt::format("no study named '{}' in the files given", opts.study));
    }
    // Only findings that stop a study from being worked out belong here; `check` shows all.
    const plumb::text_style style{use_colour(opts.colour)};
    bool study_errors = false;
    std::string findings;
    for (const auto& d : report.diagnostics) {
        const bool about_studies = d.rule == "study-problem" || d.rule == "value-mismatch" ||
                                   d.rule == "syntax" || d.rule == "unreadable" ||
                                   (d.rule == "undeclared" && !d.notes.empty() &&
                                    d.notes.front().message.find("study") != std::string::npos);
        if (!about_studies)
            continue;
        study_errors = true;
        findings += plumb::render_text(d, style) + "\n";
    }
    if (opts.json) {
        print(plumb::render_groups_json(report));
    } else {
        print(findings);
        print(plumb::render_groups_text(report, style));
    }
    if (report.input_failed)
        return exit_usage;
    return study_errors ? exit_findings : exit_clean;
}

int run_dim(const std::vector<std::string>& args) {
    options opts;
    if (auto error = parse_options(args, opts))
        return usage_error(*error);
    if (opts.positional.empty())
        return usage_error("dim needs an expression, such as: plumb dim 'rho*V*D/mu' fluids.plumb");
    std::vector<std::filesystem::path> context(opts.positional.begin() + 1, opts.positional.end());
    const auto result = plumb::query_dimension(opts.positional.front(), context, opts.check);
    const plumb::text_style style{use_colour(opts.colour)};
    // Findings inside the context files belong to 'plumb check'; here only the expression's.
    for (const auto& d : result.report.diagnostics)
        if (d.where.file == nullptr || d.where.file->path() == "<query>")
            print(plumb::render_text(d, style) + "\n");
    if (!result.dim)
        return result.report.input_failed ? exit_usage : exit_findings;
    const std::string_view name = plumb::quantity_name(*result.dim);
    if (result.dim->is_dimensionless())
        print("[1] (dimensionless)\n");
    else if (name.empty())
        print(fmt::format("{}\n", result.dim->to_string()));
    else
        print(fmt::format("{} ({})\n", result.dim->to_string(), name));
    return exit_clean;
}

int run_units(const std::vector<std::string>& args) {
    if (args.size() > 1)
        return usage_error("units takes at most one filter text");
    const std::string filter = args.empty() ? "" : args.front();
    const auto& table = plumb::unit_table::standard();
    bool listed = false;
    for (const auto& u : table.units()) {
        if (!filter.empty() && u.symbol.find(filter) == std::string_view::npos &&
            u.name.find(filter) == std::string_view::npos)
            continue;
        listed = true;
        std::string scale;
        if (u.scale == plumb::unit_scale::offset)
            scale = fmt::format(" + {:g}", u.offset);
        else if (u.scale == plumb::unit_scale::gauge)
            scale = fmt::format(" + {:g} (gauge)", u.offset);
        print(fmt::format("{:<8} {:<32} {:<22} = {}{} SI{}\n", u.symbol, u.name,
                          u.dim().to_string(), u.exact_factor, scale,
                          u.takes_prefixes ? ", takes SI prefixes" : ""));
    }
    if (!filter.empty() && !listed) {
        // A prefixed unit is no row of its own; show how it resolves.
        const auto resolved = table.resolve(filter);
        if (!resolved) {
            fmt::print(stderr, "plumb: no unit matches '{}'\n", filter);
            return exit_findings;
        }
        print(fmt::format("{:<8} {} {} = {:g} SI {}\n", filter,
                          resolved->prefix ? resolved->prefix->name : "", resolved->unit->name,
                          resolved->factor(), resolved->dim().to_string()));
    }
    if (filter.empty()) {
        std::string prefixes;
        for (const auto& p : table.prefixes())
            prefixes += fmt::format("{}{} ({}, 1e{})", prefixes.empty() ? "" : ", ", p.symbol,
                                    p.name, p.power_of_ten);
        print(fmt::format("\nprefixes: {}\n", prefixes));
    }
    return exit_clean;
}

int run_rules() {
    for (const auto& r : plumb::rules::all())
        print(fmt::format("{:<24} {}\n", r.id, r.summary));
    return exit_clean;
}

int run(int argc, char** argv) {
    std::vector<std::string> args(argv + 1, argv + argc);
    if (args.empty()) {
        std::fwrite(usage_text.data(), 1, usage_text.size(), stderr);
        return exit_usage;
    }
    const std::string command = args.front();
    args.erase(args.begin());
    if (command == "--help" || command == "-h" || command == "help") {
        print(usage_text);
        return exit_clean;
    }
    if (command == "--version" || command == "-V") {
        print(fmt::format("plumb {}\n", plumb::version()));
        return exit_clean;
    }
    for (const auto& a : args)
        if (a == "--help" || a == "-h") {
            print(usage_text);
            return exit_clean;
        }
    if (command == "check")
        return run_check(args);
    if (command == "dim")
        return run_dim(args);
    if (command == "groups")
        return run_groups(args);
    if (command == "units")
        return run_units(args);
    if (command == "rules")
        return run_rules();
    if (command.size() > 6 && command.substr(command.size() - 6) == ".plumb")
        return usage_error(
            fmt::format("unknown command '{}'; did you mean 'plumb check {}'?", command, command));
    for (const std::string_view known : {"check", "dim", "groups", "units", "rules"}) {
        // One slip of the keyboard ("chek", "unit") deserves a pointer, not just a refusal.
        const bool near =
            command.size() + 1 >= known.size() && command.size() <= known.size() + 1 &&
            std::count_if(known.begin(), known.end(),
                          [&](char c) { return command.find(c) != std::string::npos; }) +
                    1 >=
                static_cast<std::ptrdiff_t>(known.size());
        if (near)
            return usage_error(
                fmt::format("unknown command '{}'; did you mean 'plumb {}'?", command, known));
    }
    return usage_error(fmt::format("unknown command '{}'", command));
}

} // namespace

int main(int argc, char** argv) {
    try {
        return run(argc, argv);
    } catch (const std::exception& e) {
        // A bug of ours must still end in a clear message and a defined status.
        fmt::print(stderr, "plumb: internal error: {}\n", e.what());
        return exit_usage;
    }
}
