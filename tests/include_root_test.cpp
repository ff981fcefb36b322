// check_options::include_root: untrusted text may `use` files inside a sandbox folder and
// nothing outside it. Fuzz targets check their inputs this way.
#include "plumb/check.hpp"
#include "test_support.hpp"

#include <doctest/doctest.h>

#include <algorithm>
#include <filesystem>
#include <string>

namespace {

using plumb::test::temp_dir;

bool has_rule(const plumb::check_report& r, std::string_view rule, std::string_view words = {}) {
    return std::any_of(r.diagnostics.begin(), r.diagnostics.end(), [&](const auto& d) {
        return d.rule == rule && d.message.find(words) != std::string::npos;
    });
}

// A formula whose symbols come only from the used dictionary: it is checked (and its
// mistake found) only when the dictionary was read.
const std::string wrong_formula = "L = g*t\n";

} // namespace

TEST_CASE("include root: a use line inside the folder is read") {
    temp_dir dir;
    dir.write("sandbox/shared/dict.plumb", "L : m\ng : m/s^2\nt : s\n");
    plumb::check_options options;
    options.include_root = dir.path() / "sandbox";
    const auto report =
        plumb::check_text("calc.plumb", "use \"shared/dict.plumb\"\n" + wrong_formula, options);
    CHECK_FALSE(report.input_failed);
    CHECK_FALSE(has_rule(report, "unreadable"));
    CHECK(has_rule(report, "side-mismatch"));
    // A climb that comes back inside the folder is still inside it.
    const auto round_trip = plumb::check_text(
        "calc.plumb", "use \"shared/../shared/dict.plumb\"\n" + wrong_formula, options);
    CHECK_FALSE(round_trip.input_failed);
    CHECK(has_rule(round_trip, "side-mismatch"));
}

TEST_CASE("include root: paths that leave the folder are refused without being read") {
    temp_dir dir;
    dir.write("outside/dict.plumb", "L : m\ng : m/s^2\nt : s\n");
    dir.write("sandbox-2/dict.plumb", "L : m\ng : m/s^2\nt : s\n");
    std::filesystem::create_directories(dir.path() / "sandbox");
    plumb::check_options options;
    options.include_root = dir.path() / "sandbox";
    const std::string absolute = (dir.path() / "outside" / "dict.plumb").string();
    for (const std::string& written :
         {std::string("../outside/dict.plumb"), absolute, std::string("../sandbox-2/dict.plumb"),
          std::string("/dev/zero")}) {
        CAPTURE(written);
        const auto report =
            plumb::check_text("calc.plumb", "use \"" + written + "\"\n" + wrong_formula, options);
        CHECK(report.input_failed);
        CHECK(has_rule(report, "unreadable", "outside the include folder"));
        // Nothing but the checked text was read.
        CHECK(report.sources.size() == 1);
    }
    // Without an include root the same file is read: the refusal comes from the option.
    const auto unconfined =
        plumb::check_text("calc.plumb", "use \"" + absolute + "\"\n" + wrong_formula);
    CHECK_FALSE(unconfined.input_failed);
    CHECK(has_rule(unconfined, "side-mismatch"));
}

TEST_CASE("include root: a symbolic link out of the folder is refused") {
    temp_dir dir;
    dir.write("outside/dict.plumb", "L : m\ng : m/s^2\nt : s\n");
    std::filesystem::create_directories(dir.path() / "sandbox");
    std::error_code ec;
    std::filesystem::create_directory_symlink(dir.path() / "outside",
                                              dir.path() / "sandbox" / "out", ec);
    REQUIRE_FALSE(ec);
    plumb::check_options options;
    options.include_root = dir.path() / "sandbox";
    const auto report =
        plumb::check_text("calc.plumb", "use \"out/dict.plumb\"\n" + wrong_formula, options);
    CHECK(report.input_failed);
    CHECK(has_rule(report, "unreadable", "outside the include folder"));
}
