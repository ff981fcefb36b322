// Checking on several threads: the output must not depend on how many there are, and a
// dictionary that two threads both read must still be reported on once.
#include "check/parallel_check.hpp"
#include "plumb/check.hpp"
#include "plumb/render.hpp"
#include "test_support.hpp"

#include <doctest/doctest.h>
#include <filesystem>
#include <string>

namespace fs = std::filesystem;
using plumb::test::temp_dir;

namespace {

const fs::path corpus_dir = fs::path(PLUMB_SOURCE_DIR) / "corpus";

struct rendered {
    std::string text, json, sarif, html;
};

rendered check_with_jobs(const std::vector<fs::path>& paths, unsigned jobs,
                         std::vector<fs::path> dictionaries = {}) {
    plumb::check_options options;
    options.jobs = jobs;
    options.record_formulas = true;
    options.record_side_dimensions = true;
    options.dictionaries = std::move(dictionaries);
    const plumb::check_report report = plumb::check_paths(paths, options);
    plumb::signoff_context context;
    context.paths_checked = {"corpus"};
    context.checked_at = "2026-01-01T00:00:00Z"; // fixed: the page must differ only by threads
    return {plumb::render_text(report), plumb::render_json(report),
            plumb::render_sarif(report, PLUMB_SOURCE_DIR),
            plumb::render_signoff_html(report, context)};
}

// Every place a finding points at is a file the report owns.
bool points_into_sources(const plumb::check_report& report, const plumb::location& where) {
    if (where.file == nullptr)
        return true;
    for (const auto& s : report.sources)
        if (s.get() == where.file)
            return true;
    return false;
}

} // namespace

TEST_CASE("parallel: the whole corpus gives byte-identical text, JSON, SARIF and HTML on 1 and "
          "4 threads") {
    REQUIRE(fs::is_directory(corpus_dir));
    const rendered one = check_with_jobs({corpus_dir}, 1);
    const rendered four = check_with_jobs({corpus_dir}, 4);
    CHECK(one.text.size() > 1000); // the corpus has findings: the comparison means something
    CHECK(one.text == four.text);
    CHECK(one.json == four.json);
    CHECK(one.sarif == four.sarif);
    CHECK(one.html == four.html);
    // With the corpus's own dictionaries given as --dict files too (read by every thread).
    const std::vector<fs::path> dicts = {corpus_dir / "dictionaries" / "fluids.plumb"};
    const rendered one_dict = check_with_jobs({corpus_dir}, 1, dicts);
    const rendered three_dict = check_with_jobs({corpus_dir}, 3, dicts);
    CHECK(one_dict.text == three_dict.text);
    CHECK(one_dict.json == three_dict.json);
}

TEST_CASE("parallel: a dictionary used from every thread's files is reported on once") {
    const temp_dir dir;
    // The dictionary has a line that does not parse and a name that cannot be declared.
    dir.write("shared/dict.plumb", "g : m/s^2\npi : 1\nh : m (\n");
    for (int i = 0; i < 8; ++i)
        dir.write("calc/f" + std::to_string(i) + ".plumb",
                  "use \"../shared/dict.plumb\"\nz : m\nV : m/s\n@head z = V^2/(2*g)\n");
    // One file reaches the dictionary by another path: it must still be the one file.
    dir.write("calc/sub/other.plumb",
              "use \"../../calc/../shared/dict.plumb\"\nt : s\nL : m\nL = g*t\n");
    for (unsigned jobs : {1U, 2U, 4U, 9U}) {
        CAPTURE(jobs);
        plumb::check_options options;
        options.jobs = jobs;
        options.record_formulas = true;
        const plumb::check_report report = plumb::check_paths({dir.path() / "calc"}, options);
        std::size_t syntax = 0;
        std::size_t reserved = 0;
        for (const auto& d : report.diagnostics) {
            CHECK(points_into_sources(report, d.where));
            for (const auto& t : d.terms)
                CHECK(points_into_sources(report, t.where));
            for (const auto& n : d.notes)
                CHECK(points_into_sources(report, n.where));
            syntax += d.rule == "syntax" ? 1 : 0;
            reserved += d.rule == "reserved-name" ? 1 : 0;
        }
        CHECK(syntax == 1);
        CHECK(reserved == 1);
        CHECK(report.files_checked == 9);
        CHECK(report.formulas.size() == 9);
        for (const auto& f : report.formulas)
            CHECK(points_into_sources(report, f.where));
        // The dictionary is one source, shown by the path of the first file that used it.
        std::size_t dict_sources = 0;
        for (const auto& s : report.sources)
            if (fs::path(s->path()).filename() == "dict.plumb") {
                ++dict_sources;
                CHECK(s->path().find("sub") == std::string::npos);
            }
        CHECK(dict_sources == 1);
    }
}

TEST_CASE("parallel: a file named twice, or by two paths, is checked once") {
    const temp_dir dir;
    const fs::path a = dir.write("a.plumb", "x : m\ny : m\nx = y\n");
    const fs::path b = dir.write("b.plumb", "x : m\nt : s\nx = t\n");
    plumb::check_options options;
    options.jobs = 4;
    const plumb::check_report report =
        plumb::check_paths({a, b, dir.path() / "." / "a.plumb", dir.path()}, options);
    CHECK(report.files_checked == 2);
    CHECK(report.count(plumb::severity::error) == 1);
}

TEST_CASE("parallel: the number of threads") {
    using plumb::detail::worker_count;
    CHECK(worker_count(1, 0) == 1); // one file: no thread to start
    CHECK(worker_count(0, 0) == 1);
    CHECK(worker_count(3, 8) == 3); // never more threads than files
    CHECK(worker_count(100, 2) == 2);
    CHECK(worker_count(100, 0) >= 1);
    CHECK(worker_count(100, 0) <= 8);
}
