// Checking many files on several threads: each worker runs a session of its own over a
// contiguous run of the files, and the findings are merged back into the order one session
// would have given them.
#pragma once

#include "plumb/check.hpp"

#include <filesystem>
#include <string>
#include <vector>

namespace plumb::detail {

// The findings a session gathered on one file it read, before they are put in order.
struct file_findings {
    const source_file* file = nullptr;
    // The file's canonical path: a dictionary read by two sessions has one key.
    std::string key;
    std::vector<diagnostic> diagnostics;
};

// A session's findings, grouped as it gathered them.
struct session_findings {
    std::vector<diagnostic> reading_dictionaries; // about the run, while reading --dict files
    std::vector<diagnostic> about_run;            // about the run after that: unreadable paths
    std::vector<file_findings> files;             // in the order the session first read them
};

// Checks `files` (none a workbook, none named twice) in one session writing into `report`;
// its findings are left grouped, not in report.diagnostics.
session_findings check_in_one_session(const std::vector<std::filesystem::path>& files,
                                      const check_options& options, check_report& report);

// The number of worker threads for `tasks` files and workbooks when `requested` were asked
// for (0: one per core, at most a few).
unsigned worker_count(std::size_t tasks, unsigned requested);

// Checks the listed files and workbooks on worker threads and merges the findings into
// `report` in file order; the result does not depend on the number of workers.
// `listing_failures` are the findings of listing the folders (a folder with nothing to check).
void check_listed_files(const std::vector<std::filesystem::path>& files,
                        const std::vector<std::filesystem::path>& workbooks,
                        std::vector<diagnostic> listing_failures, const check_options& options,
                        check_report& report);

} // namespace plumb::detail
