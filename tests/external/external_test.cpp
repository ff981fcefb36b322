// The sign-off report as a real browser renders it, and plumb's SARIF as a real SARIF
// validator judges it. Both tools are installed by the README's test command.
#define DOCTEST_CONFIG_IMPLEMENT_WITH_MAIN
#include "process_support.hpp"

#include <doctest/doctest.h>
#include <fmt/format.h>

#include <filesystem>
#include <fstream>
#include <string>

namespace fs = std::filesystem;
using plumb_test::run_process;
using plumb_test::scratch_folder;

namespace {

bool contains(std::string_view haystack, std::string_view needle) {
    return haystack.find(needle) != std::string_view::npos;
}

std::string read(const fs::path& p) {
    std::ifstream in(p, std::ios::binary);
    return {std::istreambuf_iterator<char>(in), std::istreambuf_iterator<char>()};
}

// A calc package of our own invention: a field formula accepted with a reason (Hazen-Williams
// in US units, V = 1.318 C R^0.63 S^0.54 in ft/s and ft; Mays, Water Resources Engineering,
// from memory), a wrong one, a study and a Markdown note.
void write_package(const scratch_folder& dir) {
    dir.write("plumb.toml", "include = [\"calcs\", \"notes\"]\n");
    dir.write(
        "calcs/reserves.plumb",
        "V_hw : ft/s \"mean velocity in the main\"\nR_h : ft\nS, C_hw : 1\n"
        "@hw V_hw = 1.318*C_hw*R_h^0.63*S^0.54   # reviewed side-mismatch: an empirical fit in "
        "US units, used inside its range\n"
        "x, y : m\nz : s\n@wrong y = x + z\n"
        "F_D : N\nρ : kg/m^3\nV : m/s\nD : m\nμ : Pa*s\nstudy sphere: F_D depends on ρ, V, D, μ\n");
    dir.write("notes/pump.md", "# Pump note\n\n```plumb\nQ : m^3/s\nA : m^2\nu : m/s\n"
                               "@mean-velocity u = Q/A\n```\n");
}

// Headless Chromium with a fresh empty profile and no background traffic; `timeout` makes
// sure a stuck browser ends the test instead of hanging it.
plumb_test::process_result chromium(const scratch_folder& dir, std::vector<std::string> args) {
    std::vector<std::string> argv{"timeout",
                                  "120",
                                  "chromium",
                                  "--headless",
                                  "--no-sandbox",
                                  "--disable-gpu",
                                  "--disable-background-networking",
                                  "--disable-component-update",
                                  "--disable-sync",
                                  "--no-first-run",
                                  "--user-data-dir=" + (dir.path() / "profile").string()};
    argv.insert(argv.end(), args.begin(), args.end());
    return run_process(argv);
}

fs::path validator() {
    return fs::path(PLUMB_SOURCE_DIR) / "tests" / "sarif" / "node_modules" / "@microsoft" /
           "sarif-multitool-linux" / "Sarif.Multitool";
}

// Runs the validator on `sarif`; the results it reports at level "error" (rule id and
// message arguments), or a reason why it could not run.
std::vector<std::string> validation_errors(const scratch_folder& dir, const fs::path& sarif) {
    const fs::path tool = validator();
    REQUIRE_MESSAGE(fs::exists(tool), "the SARIF validator is missing; run 'npm ci --prefix "
                                      "tests/sarif' (the README's test command does)");
    // npm may skip the package's install script that marks the program executable.
    fs::permissions(tool, fs::perms::owner_exec, fs::perm_options::add);
    const fs::path log = dir.path() / "validation.sarif";
    fs::remove(log);
    const auto r = run_process({"timeout", "180", tool.string(), "validate", sarif.string(),
                                "--output", log.string(), "--json-schema",
                                (tool.parent_path() / "sarif-2.1.0.json").string()});
    REQUIRE_MESSAGE(r.status == 0, std::string(r.out + r.err));
    const std::string text = read(log);
    REQUIRE(!text.empty());
    // The validator's own log is SARIF: find each result whose level is "error".
    std::vector<std::string> errors;
    for (std::size_t at = text.find("\"level\": \"error\""); at != std::string::npos;
         at = text.find("\"level\": \"error\"", at + 1)) {
        const std::size_t start = text.rfind("\"ruleId\"", at);
        errors.push_back(text.substr(start == std::string::npos ? at : start, 300));
    }
    return errors;
}

} // namespace

TEST_CASE("browser: headless Chromium renders the sign-off report with its content") {
    scratch_folder dir("browser");
    write_package(dir);
    const auto made = run_process({PLUMB_CLI_PATH, "report", "-o", "calc-check.html"}, dir.path());
    REQUIRE_MESSAGE((made.status == 0 || made.status == 1), made.err);
    const fs::path page = dir.path() / "calc-check.html";
    const auto dom = chromium(dir, {"--dump-dom", "file://" + page.string()});
    REQUIRE_MESSAGE(dom.status == 0, dom.err);
    const std::string& html = dom.out;
    // What the browser built from the page, not only what plumb wrote.
    CHECK(contains(html, "<h1>Dimensional check for sign-off</h1>"));
    CHECK(contains(html, "<td id=\"formula-count\">4</td>"));
    CHECK(contains(html, "<td id=\"error-count\">1</td>"));
    CHECK(contains(html, "<td id=\"accepted-count\">1</td>"));
    CHECK(contains(html, "an empirical fit in US units, used inside its range"));
    CHECK(contains(html, "mean-velocity"));
    CHECK(contains(html, "notes/pump.md"));
    CHECK(contains(html, "Reynolds number"));
    CHECK(contains(html, "does not replace independent review"));
    // The hash of a checked file, as sha256sum would print it.
    const auto digest = run_process({"sha256sum", (dir.path() / "calcs/reserves.plumb").string()});
    REQUIRE(digest.status == 0);
    CHECK(contains(html, digest.out.substr(0, 64)));

    // A screenshot is made and is a PNG of the page's width.
    const fs::path png = dir.path() / "shot.png";
    const auto shot = chromium(dir, {"--window-size=1100,1400", "--screenshot=" + png.string(),
                                     "file://" + page.string()});
    REQUIRE_MESSAGE(shot.status == 0, shot.err);
    const std::string bytes = read(png);
    REQUIRE(bytes.size() > 24);
    CHECK(bytes.substr(1, 3) == "PNG");
    // PDF, as a checker would print it to attach to the sign-off.
    const fs::path pdf = dir.path() / "check.pdf";
    const auto printed = chromium(dir, {"--print-to-pdf=" + pdf.string(), "--no-pdf-header-footer",
                                        "file://" + page.string()});
    REQUIRE_MESSAGE(printed.status == 0, printed.err);
    CHECK(read(pdf).substr(0, 5) == "%PDF-");
}

TEST_CASE("sarif: the SARIF Multitool finds no error in plumb's SARIF 2.1.0") {
    scratch_folder dir("sarif");
    write_package(dir);
    const auto made = run_process({PLUMB_CLI_PATH, "check", "--format", "sarif"}, dir.path());
    REQUIRE(made.status == 1);
    const fs::path sarif = dir.write("plumb.sarif", made.out);
    const auto errors = validation_errors(dir, sarif);
    for (const auto& e : errors)
        FAIL_CHECK(e);
    CHECK(contains(made.out, "\"suppressions\""));
    CHECK(contains(made.out, "\"relatedLocations\""));

    // A workbook's findings: the workbook as the artifact, its sheet and cell as a logical
    // location, and no line or column of plumb's own listing of its formulas.
    const fs::path book =
        fs::path(PLUMB_SOURCE_DIR) / "corpus" / "sheets" / "review" / "separator-tank.xlsx";
    fs::copy_file(book, dir.path() / "separator-tank.xlsx");
    fs::copy_file(book.parent_path() / "separator-tank.cells.plumb",
                  dir.path() / "separator-tank.cells.plumb");
    const auto sheet = run_process(
        {PLUMB_CLI_PATH, "check", "--format", "sarif", "separator-tank.xlsx"}, dir.path());
    REQUIRE(sheet.status == 1);
    for (const auto& e : validation_errors(dir, dir.write("sheet.sarif", sheet.out)))
        FAIL_CHECK(e);
    CHECK(contains(sheet.out, "\"fullyQualifiedName\": \"Separator!C16\""));

    // The validator does find errors where there are some: this check can fail.
    const fs::path broken =
        dir.write("broken.sarif", "{\"version\": \"2.1.0\", \"runs\": [{\"results\": []}]}\n");
    CHECK(!validation_errors(dir, broken).empty());
}
