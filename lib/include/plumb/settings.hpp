// A calc repository's settings file (plumb.toml at its root, TOML 1.0): dictionaries for
// every file, what to check, rule severities, --restate-in, and what fails the run.
#pragma once

#include "plumb/check.hpp"

#include <filesystem>
#include <optional>
#include <string>
#include <vector>

namespace plumb {

inline constexpr std::string_view settings_file_name = "plumb.toml";

struct project_settings {
    std::filesystem::path file; // the settings file itself
    std::filesystem::path root; // its folder: every path in it is relative to this
    std::vector<std::filesystem::path> dictionaries;
    std::vector<std::string> include; // files and folders checked when no path is given
    std::vector<std::string> exclude; // glob patterns
    std::vector<std::string> restate_in;
    std::vector<rule_level> rule_levels;
    severity fail_on = severity::error;
    std::filesystem::path accepted_findings; // absolute, or under root
};

struct settings_problem {
    std::uint32_t line = 0; // 1-based; 0 when the problem has no place
    std::uint32_t column = 0;
    std::string message;
};

struct settings_result {
    project_settings settings;
    std::vector<settings_problem> problems; // any problem: the settings are not to be used
};

// The settings file in `start` (a file's folder, or a folder) or the nearest folder above.
std::optional<std::filesystem::path> find_settings(const std::filesystem::path& start);

// Reads and checks a settings file: an unknown key, a value of the wrong type, an unknown
// rule id or severity are problems.
settings_result read_settings(const std::filesystem::path& file);

// The project's files (under options.project_root, less options.exclude) that `use` any of
// `changed`, directly or through other files: when a dictionary changes, the calcs built on
// it are checked too. In sorted order, without `changed` themselves.
std::vector<std::filesystem::path> files_using(const std::vector<std::filesystem::path>& changed,
                                               const check_options& options);

// One line per key, for `plumb settings` and the README.
std::string_view settings_reference();

} // namespace plumb
