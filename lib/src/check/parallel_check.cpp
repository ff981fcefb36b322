// Runs sessions on worker threads and merges what they found into the order one session gives.
// Sessions share nothing but read-only tables (the units, the constants), which are built
// once in function-local statics, so each worker owns its report until the merge.
#include "check/parallel_check.hpp"

#include "sheets/workbook_file.hpp"

#include <algorithm>
#include <atomic>
#include <exception>
#include <map>
#include <thread>
#include <unordered_map>

namespace plumb::detail {

namespace fs = std::filesystem;

namespace {

// More workers than this gain little: each session reads the dictionaries again.
constexpr unsigned most_workers = 8;

// What one worker produced for one task: a run of files or one workbook.
struct task_result {
    check_report report;
    session_findings findings;
    std::exception_ptr failure;
};

// Later sessions' copies of a file read by an earlier one point at the earlier copy.
using source_aliases = std::unordered_map<const source_file*, const source_file*>;

void point_at_first_copy(location& where, const source_aliases& aliases) {
    if (auto it = aliases.find(where.file); it != aliases.end())
        where.file = it->second;
}

void point_at_first_copy(diagnostic& d, const source_aliases& aliases) {
    point_at_first_copy(d.where, aliases);
    for (term& t : d.terms)
        point_at_first_copy(t.where, aliases);
    for (note& n : d.notes)
        point_at_first_copy(n.where, aliases);
}

bool same_finding(const diagnostic& a, const diagnostic& b) {
    return a.where.file == b.where.file && a.where.range.begin == b.where.range.begin &&
           a.rule == b.rule && a.message == b.message;
}

// A file's findings sorted by position, with repeats dropped: a conflict between two
// dictionaries seen from several files, or a dictionary's own findings found by two sessions.
void append_in_order(std::vector<diagnostic>& out, std::vector<diagnostic>& found) {
    const auto before = [](const diagnostic& a, const diagnostic& b) {
        return a.where.range.begin < b.where.range.begin;
    };
    // Mostly they come in order, formula by formula: then a stable sort only costs.
    if (!std::is_sorted(found.begin(), found.end(), before))
        std::stable_sort(found.begin(), found.end(), before);
    const std::size_t first_of_file = out.size();
    for (auto& d : found) {
        // Repeats sit together once sorted: look back over the same position, and over the
        // last few findings for those without a place.
        bool repeated = false;
        for (std::size_t i = out.size(); i > first_of_file && !repeated; --i) {
            const diagnostic& e = out[i - 1];
            if (e.where.range.begin != d.where.range.begin)
                break;
            repeated = same_finding(e, d);
        }
        const std::size_t window = std::min<std::size_t>(out.size(), 8);
        for (std::size_t i = out.size() - window; i < out.size() && !repeated; ++i)
            repeated = same_finding(out[i], d);
        if (!repeated)
            out.push_back(std::move(d));
    }
}

// Counts and lists of a workbook's or a session's report added to the merged one.
void add_report(check_report& into, check_report& part) {
    for (auto& s : part.sources)
        into.sources.push_back(std::move(s));
    into.checked_files.insert(into.checked_files.end(), part.checked_files.begin(),
                              part.checked_files.end());
    for (auto& d : part.diagnostics)
        into.diagnostics.push_back(std::move(d));
    for (auto& s : part.studies)
        into.studies.push_back(std::move(s));
    for (auto& f : part.formulas)
        into.formulas.push_back(std::move(f));
    into.files_checked += part.files_checked;
    into.formulas_checked += part.formulas_checked;
    into.bytes_checked += part.bytes_checked;
    into.workbooks_checked += part.workbooks_checked;
    into.cells_checked += part.cells_checked;
    into.cells_not_checked += part.cells_not_checked;
    into.inputs_without_units += part.inputs_without_units;
    into.input_failed = into.input_failed || part.input_failed;
}

// Merges the sessions' results, in file order, into `report`.
void merge_sessions(std::vector<task_result>& sessions, std::vector<diagnostic> listing_failures,
                    check_report& report) {
    // Each file once, in the order one session would first have read it: the sessions ran
    // over consecutive runs of the files, so a file's first reader is in the earliest of them.
    std::vector<file_findings> files;
    std::map<std::string, std::size_t> file_by_key;
    source_aliases aliases;
    for (auto& s : sessions)
        for (auto& f : s.findings.files) {
            const auto [it, first] = file_by_key.emplace(f.key, files.size());
            if (first || f.key.empty()) {
                files.push_back(std::move(f));
                continue;
            }
            file_findings& earlier = files[it->second];
            aliases.emplace(f.file, earlier.file);
            for (auto& d : f.diagnostics)
                earlier.diagnostics.push_back(std::move(d));
        }

    auto& out = report.diagnostics;
    // Findings about the run: reading the dictionaries (the same in every session), listing
    // the folders, then the files that could not be read.
    if (!sessions.empty())
        out = std::move(sessions.front().findings.reading_dictionaries);
    for (auto& d : listing_failures)
        out.push_back(std::move(d));
    if (!listing_failures.empty())
        report.input_failed = true;
    for (auto& s : sessions)
        for (auto& d : s.findings.about_run)
            out.push_back(std::move(d));
    for (auto& f : files) {
        for (auto& d : f.diagnostics)
            point_at_first_copy(d, aliases);
        append_in_order(out, f.diagnostics);
    }

    for (auto& s : sessions) {
        for (auto& f : s.report.formulas)
            point_at_first_copy(f.where, aliases);
        for (auto& st : s.report.studies)
            point_at_first_copy(st.where, aliases);
        for (const source_file*& f : s.report.checked_files)
            if (auto it = aliases.find(f); it != aliases.end())
                f = it->second;
        // Nothing points at a later copy any more.
        std::erase_if(s.report.sources, [&](const std::unique_ptr<source_file>& f) {
            return aliases.count(f.get()) > 0;
        });
        add_report(report, s.report);
    }
}

// Runs task(i) for every i below `count` on `workers` threads (here when one).
template <typename Task> void run_tasks(std::size_t count, unsigned workers, Task task) {
    if (workers <= 1) {
        for (std::size_t i = 0; i < count; ++i)
            task(i);
        return;
    }
    std::atomic<std::size_t> next{0};
    std::vector<std::jthread> threads;
    threads.reserve(workers);
    for (unsigned w = 0; w < workers; ++w)
        threads.emplace_back([&] {
            for (std::size_t i = next++; i < count; i = next++)
                task(i);
        });
}

} // namespace

unsigned worker_count(std::size_t tasks, unsigned requested) {
    unsigned workers = requested;
    if (tasks <= 1)
        return 1; // without asking the system how many cores it has: a file read and a close
    if (workers == 0)
        workers = std::min(std::max(std::thread::hardware_concurrency(), 1U), most_workers);
    return static_cast<unsigned>(std::max<std::size_t>(1, std::min<std::size_t>(workers, tasks)));
}

void check_listed_files(const std::vector<fs::path>& files, const std::vector<fs::path>& workbooks,
                        std::vector<diagnostic> listing_failures, const check_options& options,
                        check_report& report) {
    const unsigned workers = worker_count(files.size() + workbooks.size(), options.jobs);
    // One run of consecutive files per worker (one session reads the dictionaries once),
    // at least one so that the dictionaries' findings are reported with no file to check.
    const std::size_t runs = std::max<std::size_t>(1, std::min<std::size_t>(workers, files.size()));
    std::vector<task_result> results(runs + workbooks.size());
    run_tasks(results.size(), workers, [&](std::size_t i) {
        task_result& r = results[i];
        try {
            if (i < runs) {
                const auto begin =
                    files.begin() + static_cast<std::ptrdiff_t>(files.size() * i / runs);
                const auto end =
                    files.begin() + static_cast<std::ptrdiff_t>(files.size() * (i + 1) / runs);
                r.findings = check_in_one_session({begin, end}, options, r.report);
            } else {
                sheets::check_workbook_file(workbooks[i - runs], options, r.report);
            }
        } catch (...) {
            r.failure = std::current_exception();
        }
    });
    for (const task_result& r : results)
        if (r.failure)
            std::rethrow_exception(r.failure);
    std::vector<task_result> sessions(
        std::make_move_iterator(results.begin()),
        std::make_move_iterator(results.begin() + static_cast<std::ptrdiff_t>(runs)));
    merge_sessions(sessions, std::move(listing_failures), report);
    for (std::size_t i = runs; i < results.size(); ++i)
        add_report(report, results[i].report);
}

} // namespace plumb::detail
