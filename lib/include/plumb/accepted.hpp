// The project's file of accepted findings: findings a team has reviewed, each with a reason,
// so that only new findings fail a run. `plumb accept` writes it; `plumb check` reads it.
#pragma once

#include "plumb/check.hpp"

#include <filesystem>
#include <string>
#include <string_view>

namespace plumb {

// Its name in the project root unless the settings file names another.
inline constexpr std::string_view accepted_findings_name = "plumb-accepted.toml";

// The new text of the file: the entries that accepted findings of `report` (their reasons
// kept), an entry with `reason` for every finding not yet accepted, and the entries about
// files this run did not check, kept from `existing_file`. `report` must have been checked
// with that file, so that its entries are matched.
std::string accepted_findings_text(const check_report& report,
                                   const std::filesystem::path& project_root,
                                   const std::filesystem::path& existing_file,
                                   std::string_view reason);

// A path as the file of accepted findings and the sign-off report write it: relative to the
// project root, with '/' separators.
std::string project_relative(const std::filesystem::path& path,
                             const std::filesystem::path& project_root);

} // namespace plumb
