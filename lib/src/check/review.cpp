// The review stage, after every file is checked: project rule levels, then inline marks, then
// the file of accepted findings.
#include "check/acceptance.hpp"

#include <algorithm>
#include <map>

namespace plumb {

void apply_rule_levels(check_report& report, const std::vector<rule_level>& levels) {
    if (levels.empty())
        return;
    std::erase_if(report.diagnostics, [&](diagnostic& d) {
        for (const auto& l : levels) {
            if (l.rule != d.rule)
                continue;
            if (!l.level)
                return true;
            // A note stays a note: it carries information, not a finding.
            if (d.level != severity::note)
                d.level = *l.level;
        }
        return false;
    });
}

void review_findings(check_report& report, const check_options& options) {
    apply_rule_levels(report, options.rule_levels);
    apply_inline_marks(report);
    if (!options.accepted_findings.empty())
        apply_accepted_findings(report, options.accepted_findings, options.project_root);
    // Findings added here go back into file order, as the session sorted them.
    std::map<const source_file*, std::size_t> order;
    for (std::size_t i = 0; i < report.sources.size(); ++i)
        order.emplace(report.sources[i].get(), i + 1);
    const auto before = [&](const diagnostic& a, const diagnostic& b) {
        const std::size_t fa = a.where.file ? order[a.where.file] : 0;
        const std::size_t fb = b.where.file ? order[b.where.file] : 0;
        if (fa != fb)
            return fa < fb;
        return a.where.range.begin < b.where.range.begin;
    };
    // Where nothing was added they are in order already, and a stable sort would still
    // compare and move each one some log n times (issue 12).
    if (!std::is_sorted(report.diagnostics.begin(), report.diagnostics.end(), before))
        std::stable_sort(report.diagnostics.begin(), report.diagnostics.end(), before);
}

} // namespace plumb
