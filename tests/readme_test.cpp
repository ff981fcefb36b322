// The README's two set-up commands are the project's promise to a newcomer; CI must run the
// test command exactly as written there.
#include "plumb/check.hpp"
#include "plumb/render.hpp"

#include <doctest/doctest.h>

#include <filesystem>
#include <fstream>
#include <set>
#include <string>

namespace {

std::string read(const std::filesystem::path& p) {
    std::ifstream in(p);
    return {std::istreambuf_iterator<char>(in), std::istreambuf_iterator<char>()};
}

// The first line of the fenced block that follows `marker`.
std::string command_after(const std::string& text, const std::string& marker) {
    const auto at = text.find(marker);
    if (at == std::string::npos)
        return {};
    const auto fence = text.find("```", at);
    const auto begin = text.find('\n', fence) + 1;
    return text.substr(begin, text.find('\n', begin) - begin);
}

} // namespace

TEST_CASE("README: .ci/run runs the README's test command word for word") {
    const std::filesystem::path root(PLUMB_SOURCE_DIR);
    const std::string readme = read(root / "README.md");
    const std::string test_command = command_after(readme, "<!-- test-command -->");
    const std::string demo_command = command_after(readme, "<!-- demo-command -->");
    REQUIRE(!test_command.empty());
    REQUIRE(!demo_command.empty());
    CHECK(test_command.find("cmake --workflow --preset test") != std::string::npos);
    CHECK(demo_command.find("check corpus/demo") != std::string::npos);
    const std::string ci = read(root / ".ci" / "run");
    CHECK(ci.find("\n" + test_command + "\n") != std::string::npos);
}

TEST_CASE("README: every field of the JSON output for a calc file and a workbook is documented") {
    const std::filesystem::path root(PLUMB_SOURCE_DIR);
    const std::string readme = read(root / "README.md");
    const auto begin = readme.find("## JSON output");
    const auto end = readme.find("\n## ", begin + 1);
    REQUIRE(begin != std::string::npos);
    const std::string section = readme.substr(begin, end - begin);
    plumb::check_options options;
    options.record_formulas = true;
    const plumb::check_report report =
        plumb::check_paths({root / "corpus" / "sheets" / "pump-sizing.xlsx",
                            root / "corpus" / "practice" / "water.plumb"},
                           options);
    const std::string json = plumb::render_json(report);
    // The workbook's findings and their terms carry sheet and cell.
    CHECK(json.find("\"sheet\": \"Pump\", \"cell\": \"C12\"") != std::string::npos);
    std::set<std::string> keys;
    for (std::size_t at = json.find("\": "); at != std::string::npos;
         at = json.find("\": ", at + 1)) {
        const std::size_t open = json.rfind('"', at - 1);
        keys.insert(json.substr(open + 1, at - open - 1));
    }
    CHECK(keys.count("sheet") == 1);
    CHECK(keys.count("cell") == 1);
    for (const std::string& key : keys) {
        INFO("the JSON field '" << key << "' is not in the README's JSON section");
        CHECK((section.find("\"" + key + "\"") != std::string::npos ||
               section.find("`" + key + "`") != std::string::npos));
    }
}

TEST_CASE("README: .ci/run also runs the hardening command, after the tests") {
    const std::filesystem::path root(PLUMB_SOURCE_DIR);
    const std::string readme = read(root / "README.md");
    const std::string test_command = command_after(readme, "<!-- test-command -->");
    const std::string hardening = command_after(readme, "<!-- hardening-command -->");
    REQUIRE(!hardening.empty());
    CHECK(hardening.find("cmake --workflow --preset hardening") != std::string::npos);
    // The sanitizer and fuzz build needs Clang 14 and its libFuzzer and sanitizer runtimes,
    // which the test command installs.
    CHECK(test_command.find(" clang-14 ") != std::string::npos);
    CHECK(test_command.find(" libclang-rt-14-dev ") != std::string::npos);
    const std::string ci = read(root / ".ci" / "run");
    const auto tests_at = ci.find("\n" + test_command + "\n");
    const auto hardening_at = ci.find("\n" + hardening + "\n");
    REQUIRE(tests_at != std::string::npos);
    REQUIRE(hardening_at != std::string::npos);
    CHECK(tests_at < hardening_at);
}
