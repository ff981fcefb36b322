// Corpus regression: `plumb check corpus/` must report exactly the findings that the
// `# expect: rule-id` comments in the corpus files record, and nothing else.
#include "plumb/check.hpp"

#include <doctest/doctest.h>
#include <fmt/format.h>

#include <algorithm>
#include <filesystem>
#include <fstream>
#include <map>
#include <set>
#include <sstream>
#include <string>
#include <vector>

namespace fs = std::filesystem;

namespace {

const fs::path corpus_dir = fs::path(PLUMB_SOURCE_DIR) / "corpus";

// "file:line: rule" strings, so a mismatch prints as a readable list.
using finding_set = std::multiset<std::string>;

std::string key(const fs::path& file, std::uint32_t line, std::string_view rule) {
    return fmt::format("{}:{}: {}", fs::relative(file, corpus_dir).generic_string(), line, rule);
}

bool is_sidecar(const fs::path& p) {
    const std::string name = p.filename().string();
    return name.size() > 12 && name.substr(name.size() - 12) == ".cells.plumb";
}

std::vector<fs::path> corpus_files() {
    std::vector<fs::path> files;
    for (const auto& entry : fs::recursive_directory_iterator(corpus_dir))
        if (entry.is_regular_file() && entry.path().extension() == ".plumb" &&
            !is_sidecar(entry.path()))
            files.push_back(entry.path());
    std::sort(files.begin(), files.end());
    return files;
}

// Workbooks saved by LibreOffice (corpus/sheets/make-workbooks.sh), each .xlsx and .ods with
// the findings its book.expect records as "Sheet!Cell rule".
std::vector<fs::path> corpus_workbooks() {
    std::vector<fs::path> files;
    for (const auto& entry : fs::recursive_directory_iterator(corpus_dir))
        if (entry.is_regular_file() &&
            (entry.path().extension() == ".xlsx" || entry.path().extension() == ".ods"))
            files.push_back(entry.path());
    std::sort(files.begin(), files.end());
    return files;
}

std::string trim(std::string s) {
    const auto b = s.find_first_not_of(" \t\r");
    const auto e = s.find_last_not_of(" \t\r");
    return b == std::string::npos ? std::string() : s.substr(b, e - b + 1);
}

// Words a workbook's .expect says a finding must contain, by finding.
std::multimap<std::string, std::string>& expected_words() {
    static std::multimap<std::string, std::string> words;
    return words;
}

finding_set expected_findings() {
    expected_words().clear();
    finding_set expected;
    for (const auto& file : corpus_files()) {
        std::ifstream in(file);
        std::string line;
        for (std::uint32_t n = 1; std::getline(in, line); ++n) {
            const auto at = line.find("# expect:");
            if (at == std::string::npos)
                continue;
            std::stringstream ids(line.substr(at + 9));
            std::string id;
            while (std::getline(ids, id, ','))
                if (!trim(id).empty())
                    expected.insert(key(file, n, trim(id)));
        }
    }
    for (const auto& book : corpus_workbooks()) {
        fs::path record = book;
        record.replace_extension(".expect");
        std::ifstream in(record);
        REQUIRE_MESSAGE(in, "no " << record.string());
        std::string line;
        while (std::getline(in, line)) {
            line = trim(line);
            if (line.empty() || line[0] == '#')
                continue;
            // "Pump!C35 no-unit ~ used as a length": the finding's words must hold the text
            // after '~'.
            const auto tilde = line.find(" ~ ");
            const std::string words =
                tilde == std::string::npos ? "" : trim(line.substr(tilde + 3));
            line = trim(line.substr(0, tilde));
            const auto space = line.find(' ');
            const std::string k =
                fmt::format("{}:{} {}", fs::relative(book, corpus_dir).generic_string(),
                            line.substr(0, space), trim(line.substr(space + 1)));
            // A finding named on several lines for its words is still one finding.
            if (words.empty() || expected.find(k) == expected.end())
                expected.insert(k);
            if (!words.empty())
                expected_words().emplace(k, words);
        }
    }
    return expected;
}

std::string difference(const finding_set& a, const finding_set& b) {
    std::vector<std::string> out;
    std::set_difference(a.begin(), a.end(), b.begin(), b.end(), std::back_inserter(out));
    std::string text;
    for (const auto& s : out)
        text += "  " + s + "\n";
    return text;
}

} // namespace

TEST_CASE("corpus: every finding is recorded with '# expect:' and every record is found") {
    REQUIRE(fs::is_directory(corpus_dir));
    const plumb::check_report report = plumb::check_paths({corpus_dir});
    finding_set actual;
    std::multimap<std::string, std::string> said; // a finding's message and notes, by key
    for (const auto& d : report.diagnostics) {
        REQUIRE_MESSAGE(d.where.file != nullptr, d.message);
        if (const plumb::cell_place* cell = d.where.file->cell_at(d.where.range.begin)) {
            const std::string k = fmt::format(
                "{}:{} {}", fs::relative(d.where.file->path(), corpus_dir).generic_string(),
                plumb::cell_text(*cell), d.rule);
            actual.insert(k);
            std::string words = d.message;
            for (const auto& n : d.notes)
                words += "\n" + n.message;
            said.emplace(k, std::move(words));
        } else
            actual.insert(key(d.where.file->path(),
                              d.where.file->position(d.where.range.begin).line, d.rule));
    }
    const finding_set expected = expected_findings();
    INFO("reported but not expected:\n" << difference(actual, expected));
    INFO("expected but not reported:\n" << difference(expected, actual));
    CHECK(actual == expected);
    CHECK(report.files_checked == corpus_files().size() + corpus_workbooks().size());
    // Clang 14 cannot capture structured bindings, so the pair is taken whole.
    for (const auto& entry : expected_words()) {
        const std::string& words = entry.second;
        const auto range = said.equal_range(entry.first);
        INFO(entry.first << " should say: " << words);
        CHECK(std::any_of(range.first, range.second, [&](const auto& s) {
            return s.second.find(words) != std::string::npos;
        }));
    }
}

TEST_CASE("corpus: published formulas name their source and there are at least 40 of them") {
    std::size_t formula_files = 0;
    std::size_t formulas = 0;
    for (const auto& file : corpus_files()) {
        const std::string folder = fs::relative(file, corpus_dir).begin()->string();
        if (folder == "demo" || folder == "mistakes" || folder == "dictionaries")
            continue;
        std::ifstream in(file);
        const std::string text((std::istreambuf_iterator<char>(in)),
                               std::istreambuf_iterator<char>());
        const plumb::check_report one = plumb::check_paths({file});
        if (one.formulas_checked == 0)
            continue; // a dictionary kept beside its formulas
        ++formula_files;
        formulas += one.formulas_checked;
        INFO(file.string());
        // Every file names where its formulas come from, under "Source:" or "Sources:".
        CHECK((text.find("Source:") != std::string::npos ||
               text.find("Sources:") != std::string::npos));
    }
    CHECK(formula_files >= 40);
    CHECK(formulas >= 40);
}
