// plumb's command line: parses arguments, calls libplumb, prints. No checking logic here.
#include "plumb/accepted.hpp"
#include "plumb/check.hpp"
#include "plumb/provenance.hpp"
#include "plumb/render.hpp"
#include "plumb/rules.hpp"
#include "plumb/settings.hpp"
#include "plumb/unit_table.hpp"
#include "plumb/version.hpp"

#include <algorithm>
#include <cerrno>
#include <charconv>
#include <cstdio>
#include <cstdlib>
#include <cstring>
#include <ctime>
#include <exception>
#include <filesystem>
#include <fmt/format.h>
#include <fstream>
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
  plumb check [options] PATH...   check .plumb files and Markdown notes with ```plumb
                                  blocks (folders are searched); PATH may be left out
                                  when the settings file has 'include'
  plumb accept --reason TEXT [PATH...]
                                  accept every finding not yet accepted, writing the
                                  project's file of accepted findings
  plumb report [PATH...] -o FILE.html
                                  write the sign-off report: one self-contained page
  plumb dim EXPRESSION [FILE...]  print the dimension of an expression, using the
                                  symbols that FILEs declare
  plumb groups [options] PATH...  the dimensionless groups of each study in the files,
                                  and the model plan where prototype and model lines
                                  give values
  plumb groups --vars 'F depends on rho, V, D, mu' [--repeating 'rho, V, D'] FILE...
                                  the groups of variables that FILEs declare
  plumb catalogue [TEXT]          the built-in units by quantity, with exact factors,
                                  origins and sources (those whose symbol, name or
                                  quantity contains TEXT)
  plumb rules                     list the rules and their ids
  plumb settings                  list the keys of the settings file, plumb.toml
  plumb --version | --help

options for check, groups, dim and catalogue:
  --dict FILE          read FILE's declarations before each file (repeatable)
  --format text|json|sarif
                       output format (default: text; sarif for check only)
  --quiet              check: one line per failing finding, a summary line and the
                       caution (for commit hooks)
  --fail-on error|warning
                       check: what fails the run (default: error, or the settings)
  --with-users         check: also check the project's files that `use` the given ones
  --settings FILE      use FILE as the settings (default: plumb.toml in the checked
                       path's folder or the nearest folder above)
  --study NAME         groups: only the study called NAME
  --jobs N             check, report: check files on N threads at once (default: one
                       per core, at most 8); the output is the same for any N
  --restate-in UNITS   check: restate coefficients marked ? also for the consistent set
                       of units with these base units, e.g. 'ft, lb, s' or 'ft, lbf, s'
  --color auto|always|never
                       colour the text output (default: auto, which means on a
                       terminal only, and never when NO_COLOR is set or TERM=dumb)

A finding is accepted by a mark at the end of its line, with a reason:
  @ooip N = 7758*A*h*φ*(1 - S_w)/B_o   # reviewed unit-scale: 7758 is bbl per acre-ft
or by an entry that 'plumb accept' writes; accepted findings are still reported.

exit status: 0 nothing fails (warnings allowed unless --fail-on warning), 1 findings
fail the run, 2 bad usage, bad settings, or a file that cannot be read or parsed.

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

enum class output_format { text, json, sarif };

struct options {
    std::vector<std::string> positional;
    output_format format = output_format::text;
    bool quiet = false;
    bool with_users = false;
    std::optional<plumb::severity> fail_on;
    std::string settings_file;
    std::string output;
    std::optional<std::string> reason;
    std::string study;
    std::string variables;
    std::string repeating;
    plumb::check_options check;
    bool json = false;
    colour_choice colour = colour_choice::automatic;
};

// Parses the options shared by check and dim; an error message when they are wrong.
// The units of --restate-in must name a consistent set ("ft, lb, s" or "ft, lbf, s").
std::optional<std::string> check_restate_units(const std::vector<std::string>& units) {
    if (auto why = plumb::restate_units_problem(units))
        return fmt::format("--restate-in: {}", *why);
    return std::nullopt;
}

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
            // Refused here, for every command that takes it, not only for check.
            if (auto error = check_restate_units(out.check.restate_in))
                return *error;
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
            if (!v || (*v != "text" && *v != "json" && *v != "sarif"))
                return "--format takes 'text', 'json' or 'sarif'";
            out.json = *v == "json";
            out.format = *v == "json"    ? output_format::json
                         : *v == "sarif" ? output_format::sarif
                                         : output_format::text;
        } else if (a == "--quiet" || a == "-q") {
            out.quiet = true;
        } else if (a == "--with-users") {
            out.with_users = true;
        } else if (a == "--fail-on" || a.rfind("--fail-on=", 0) == 0) {
            const auto v = value("--fail-on");
            if (!v || (*v != "error" && *v != "warning"))
                return "--fail-on takes 'error' or 'warning'";
            out.fail_on = *v == "warning" ? plumb::severity::warning : plumb::severity::error;
        } else if (a == "--jobs" || a.rfind("--jobs=", 0) == 0) {
            const auto v = value("--jobs");
            unsigned jobs = 0;
            const char* end = v ? v->data() + v->size() : nullptr;
            if (!v || v->empty() || std::from_chars(v->data(), end, jobs).ptr != end || jobs == 0 ||
                jobs > 256)
                return "--jobs takes a number of threads from 1 to 256";
            out.check.jobs = jobs;
        } else if (a == "--settings" || a.rfind("--settings=", 0) == 0) {
            const auto v = value("--settings");
            if (!v || v->empty())
                return "--settings needs a file";
            out.settings_file = *v;
        } else if (a == "-o" || a == "--output" || a.rfind("--output=", 0) == 0) {
            const auto v = value(a == "-o" ? "-o" : "--output");
            if (!v || v->empty())
                return "-o needs a file name, such as calc-check.html";
            out.output = *v;
        } else if (a == "--reason" || a.rfind("--reason=", 0) == 0) {
            const auto v = value("--reason");
            if (!v)
                return "--reason needs a text";
            out.reason = *v;
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

// What a run checks once the settings file (if any) is read.
struct project_run {
    std::vector<std::filesystem::path> paths;
    plumb::severity fail_on = plumb::severity::error;
    std::string settings_file; // empty when none
};

// Finds and reads the settings, merges them under the command line's options, and picks the
// paths; an error message when the settings are bad or there is nothing to check.
std::optional<std::string> prepare_project(options& opts, project_run& run,
                                           std::string_view command) {
    namespace fs = std::filesystem;
    std::optional<fs::path> settings_path;
    if (!opts.settings_file.empty()) {
        settings_path = opts.settings_file;
        std::error_code ec;
        if (!fs::is_regular_file(*settings_path, ec))
            return fmt::format("--settings: cannot read '{}'", opts.settings_file);
    } else {
        settings_path = plumb::find_settings(
            opts.positional.empty() ? fs::path(".") : fs::path(opts.positional[0]));
    }
    plumb::check_options& check = opts.check;
    if (settings_path) {
        const plumb::settings_result read = plumb::read_settings(*settings_path);
        if (!read.problems.empty()) {
            std::string message = "the settings file has problems; nothing was checked";
            for (const auto& p : read.problems)
                message += fmt::format("\n  {}:{}:{}: {}", settings_path->string(), p.line,
                                       p.column, p.message);
            return message;
        }
        const plumb::project_settings& s = read.settings;
        run.settings_file = settings_path->string();
        check.dictionaries.insert(check.dictionaries.begin(), s.dictionaries.begin(),
                                  s.dictionaries.end());
        if (check.restate_in.empty())
            check.restate_in = s.restate_in;
        check.exclude = s.exclude;
        check.rule_levels = s.rule_levels;
        check.project_root = s.root;
        check.accepted_findings = s.accepted_findings;
        run.fail_on = s.fail_on;
        if (opts.positional.empty())
            for (const auto& i : s.include)
                run.paths.push_back(s.root / i);
    } else {
        // Without settings the project is the current folder.
        check.project_root = fs::current_path();
        check.accepted_findings = check.project_root / plumb::accepted_findings_name;
    }
    if (opts.fail_on)
        run.fail_on = *opts.fail_on;
    for (const auto& p : opts.positional)
        run.paths.emplace_back(p);
    if (run.paths.empty())
        return fmt::format("{} needs at least one file or folder (or a settings file with "
                           "'include')",
                           command);
    if (auto error = check_restate_units(check.restate_in))
        return error;
    return std::nullopt;
}

bool fails(const plumb::check_report& report, plumb::severity fail_on) {
    return report.count(plumb::severity::error) > 0 ||
           (fail_on == plumb::severity::warning && report.count(plumb::severity::warning) > 0);
}

int run_check(const std::vector<std::string>& args) {
    options opts;
    if (auto error = parse_options(args, opts))
        return usage_error(*error);
    project_run run;
    if (auto error = prepare_project(opts, run, "check"))
        return usage_error(*error);
    if (opts.with_users) {
        const auto users = plumb::files_using(run.paths, opts.check);
        run.paths.insert(run.paths.end(), users.begin(), users.end());
    }
    opts.check.record_formulas = opts.format == output_format::json;
    const plumb::check_report report = plumb::check_paths(run.paths, opts.check);
    if (opts.format == output_format::sarif)
        print(plumb::render_sarif(report, opts.check.project_root));
    else if (opts.format == output_format::json)
        print(plumb::render_json(report));
    else if (opts.quiet)
        print(plumb::render_quiet(report, run.fail_on));
    else
        print(plumb::render_text(report, {use_colour(opts.colour)}));
    if (report.input_failed)
        return exit_usage;
    return fails(report, run.fail_on) ? exit_findings : exit_clean;
}

int run_accept(const std::vector<std::string>& args) {
    options opts;
    if (auto error = parse_options(args, opts))
        return usage_error(*error);
    project_run run;
    if (auto error = prepare_project(opts, run, "accept"))
        return usage_error(*error);
    const plumb::check_report report = plumb::check_paths(run.paths, opts.check);
    if (report.input_failed) {
        print(plumb::render_text(report, {use_colour(opts.colour)}));
        fmt::print(stderr, "plumb: some input could not be read or parsed; nothing accepted\n");
        return exit_usage;
    }
    std::size_t to_accept = 0;
    for (const auto& d : report.diagnostics)
        if (!d.accepted && d.where.file != nullptr && d.level != plumb::severity::note &&
            d.rule != plumb::rules::acceptance_problem && d.rule != plumb::rules::stale_acceptance)
            ++to_accept;
    const std::string reason = opts.reason.value_or("");
    if (to_accept > 0 && reason.find_first_not_of(" \t") == std::string::npos)
        return usage_error(fmt::format(
            "accept needs --reason TEXT: {} finding{} would be accepted, and each needs a reason "
            "the checker can read (edit each entry's reason in the file afterwards if they differ)",
            to_accept, to_accept == 1 ? "" : "s"));
    const std::string text = plumb::accepted_findings_text(report, opts.check.project_root,
                                                           opts.check.accepted_findings, reason);
    std::ofstream out(opts.check.accepted_findings, std::ios::binary | std::ios::trunc);
    out << text;
    out.close();
    if (!out)
        return usage_error(fmt::format("cannot write '{}'", opts.check.accepted_findings.string()));
    print(fmt::format("plumb: {} new finding{} accepted in {} (with earlier entries kept); "
                      "stale entries about the checked files removed\n",
                      to_accept, to_accept == 1 ? "" : "s", opts.check.accepted_findings.string()));
    return exit_clean;
}

std::string utc_now() {
    std::time_t now = std::time(nullptr);
    // SOURCE_DATE_EPOCH makes a report reproducible byte for byte.
    if (const char* fixed = std::getenv("SOURCE_DATE_EPOCH"); fixed != nullptr && *fixed != '\0')
        now = static_cast<std::time_t>(std::strtoll(fixed, nullptr, 10));
    std::tm parts{};
    gmtime_r(&now, &parts);
    char text[32];
    std::strftime(text, sizeof text, "%Y-%m-%dT%H:%M:%SZ", &parts);
    return text;
}

int run_report(const std::vector<std::string>& args) {
    options opts;
    if (auto error = parse_options(args, opts))
        return usage_error(*error);
    if (opts.output.empty())
        return usage_error("report needs -o FILE.html");
    project_run run;
    if (auto error = prepare_project(opts, run, "report"))
        return usage_error(*error);
    opts.check.record_formulas = true;
    opts.check.record_side_dimensions = true;
    const plumb::check_report report = plumb::check_paths(run.paths, opts.check);
    plumb::signoff_context context;
    for (const auto& p : run.paths)
        context.paths_checked.push_back(p.string());
    context.checked_at = utc_now();
    context.git_commit = plumb::git_commit_of(opts.check.project_root);
    context.settings_file = run.settings_file;
    context.project_root = opts.check.project_root;
    std::ofstream out(opts.output, std::ios::binary | std::ios::trunc);
    out << plumb::render_signoff_html(report, context);
    out.close();
    if (!out)
        return usage_error(fmt::format("cannot write '{}'", opts.output));
    print(fmt::format("plumb: sign-off report written to {}: {} formulas in {} files, {} errors, "
                      "{} warnings, {} accepted\ncaution: {}\n",
                      opts.output, report.formulas_checked, report.files_checked,
                      report.count(plumb::severity::error), report.count(plumb::severity::warning),
                      report.count_accepted(), plumb::caution_text()));
    if (report.input_failed)
        return exit_usage;
    return fails(report, run.fail_on) ? exit_findings : exit_clean;
}

int run_groups(const std::vector<std::string>& args) {
    options opts;
    if (auto error = parse_options(args, opts))
        return usage_error(*error);
    if (!opts.repeating.empty() && opts.variables.empty())
        return usage_error("--repeating goes with --vars");
    plumb::check_report report;
    if (!opts.variables.empty()) {
        // The command line's variables become one study line, with the given files read as
        // dictionaries. Nothing in an argument may end that line or start another statement.
        for (const std::string* arg : {&opts.variables, &opts.repeating})
            if (std::any_of(arg->begin(), arg->end(), [](char c) {
                    return static_cast<unsigned char>(c) < 0x20 || c == '\\' || c == '#' ||
                           c == '"';
                }))
                return usage_error("--vars and --repeating take one line of names and commas, "
                                   "without line breaks, '\\', '#' or quotes");
        for (const auto& path : opts.positional)
            opts.check.dictionaries.emplace_back(path);
        const std::string text =
            fmt::format("study command-line: {}{}\n", opts.variables,
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
        // An unknown unit drops a declaration's dimension or a prototype value, so it stops
        // or changes a study wherever it stands.
        const bool about_studies = d.rule == "study-problem" || d.rule == "value-mismatch" ||
                                   d.rule == "syntax" || d.rule == "unreadable" ||
                                   d.rule == "unknown-unit" ||
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
        // With findings and no study left, the findings say why; "no study found" would not.
        if (!report.studies.empty() || findings.empty())
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
    // A context file that could not be read is a failure even when the expression was worked
    // out without it.
    return result.report.input_failed ? exit_usage : exit_clean;
}

int run_catalogue(const std::vector<std::string>& args, colour_choice colour) {
    if (args.size() > 1)
        return usage_error("catalogue takes at most one filter text");
    const std::string filter = args.empty() ? "" : args.front();
    const std::string listing = plumb::render_catalogue(filter, {use_colour(colour)});
    if (listing.empty()) {
        fmt::print(stderr, "plumb: no unit matches '{}'\n", filter);
        return exit_findings;
    }
    print(listing);
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
    if (command == "catalogue") {
        options opts;
        if (auto error = parse_options(args, opts))
            return usage_error(*error);
        return run_catalogue(opts.positional, opts.colour);
    }
    if (command == "units")
        return usage_error("'plumb units' is now 'plumb catalogue'");
    if (command == "rules")
        return run_rules();
    if (command == "accept")
        return run_accept(args);
    if (command == "report")
        return run_report(args);
    if (command == "settings") {
        print(plumb::settings_reference());
        return exit_clean;
    }
    if (command.size() > 6 && command.substr(command.size() - 6) == ".plumb")
        return usage_error(
            fmt::format("unknown command '{}'; did you mean 'plumb check {}'?", command, command));
    for (const std::string_view known :
         {"check", "dim", "groups", "catalogue", "rules", "accept", "report", "settings"}) {
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

#ifdef PLUMB_WORKBOOK_PROGRAM
namespace {

char** program_arguments = nullptr;

// This program is linked statically (cli/CMakeLists.txt) and cannot load libzip: it runs its
// dynamically linked sibling on the same arguments. Nothing has been printed yet; what the
// streams hold is flushed so that nothing is lost either way.
void hand_workbooks_over(std::string& why) {
    std::fflush(stdout);
    std::fflush(stderr);
    std::error_code ec;
    const std::filesystem::path self = std::filesystem::read_symlink("/proc/self/exe", ec);
    const std::filesystem::path sibling =
        (ec ? std::filesystem::path(".") : self.parent_path()) / PLUMB_WORKBOOK_PROGRAM;
    execv(sibling.c_str(), program_arguments);
    why = fmt::format("workbooks are read by {}, which could not be started: {}", sibling.string(),
                      std::strerror(errno));
}

} // namespace
#endif

int main(int argc, char** argv) {
#ifdef PLUMB_WORKBOOK_PROGRAM
    program_arguments = argv;
    plumb::set_workbook_handover(&hand_workbooks_over);
#endif
    try {
        return run(argc, argv);
    } catch (const std::exception& e) {
        // A bug of ours must still end in a clear message and a defined status.
        fmt::print(stderr, "plumb: internal error: {}\n", e.what());
        return exit_usage;
    }
}
