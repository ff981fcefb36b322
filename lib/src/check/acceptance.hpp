// After the checks: project rule levels, inline `# reviewed` marks and the file of accepted
// findings turn findings into accepted ones (with their reasons), and report marks and
// entries that accept nothing.
#pragma once

#include "plumb/check.hpp"

namespace plumb {

// Changes severities or drops findings as the project's settings say.
void apply_rule_levels(check_report& report, const std::vector<rule_level>& levels);

// Reads `# reviewed rule, rule: reason` marks in the checked files and accepts the findings
// of those rules on the mark's statement.
void apply_inline_marks(check_report& report);

// Accepts findings that entries of the file of accepted findings name; entries about a
// checked file that match nothing are reported. An unreadable or malformed file is reported.
void apply_accepted_findings(check_report& report, const std::filesystem::path& file,
                             const std::filesystem::path& project_root);

// All three, in that order, then the findings sorted back into file order.
void review_findings(check_report& report, const check_options& options);

} // namespace plumb
