// The README's two set-up commands are the project's promise to a newcomer; CI must run the
// test command exactly as written there.
#include <doctest/doctest.h>

#include <filesystem>
#include <fstream>
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
