// Sign-off and repository support: accepted findings (inline marks and the file of accepted
// findings), the settings file, Markdown calc notes, exclude patterns, file digests, SARIF
// and the HTML report's content; and the command line around them.
#include "check/path_patterns.hpp"
#include "check/statement_text.hpp"
#include "notation/markdown.hpp"
#include "plumb/accepted.hpp"
#include "plumb/provenance.hpp"
#include "plumb/render.hpp"
#include "plumb/rules.hpp"
#include "plumb/settings.hpp"
#include "process_support.hpp"

#include <doctest/doctest.h>

#include <algorithm>
#include <string>

namespace {

using plumb::severity;
using plumb_test::run_process;
using plumb_test::scratch_folder;

bool contains(std::string_view haystack, std::string_view needle) {
    return haystack.find(needle) != std::string_view::npos;
}

std::vector<const plumb::diagnostic*> with_rule(const plumb::check_report& r,
                                                std::string_view rule) {
    std::vector<const plumb::diagnostic*> out;
    for (const auto& d : r.diagnostics)
        if (d.rule == rule)
            out.push_back(&d);
    return out;
}

// Hazen-Williams in US units, V = 1.318 C R^0.63 S^0.54 (ft/s, ft; Mays, Water Resources
// Engineering, from memory): an empirical fit whose sides differ in dimension, and a team that
// uses it inside its range accepts the finding.
constexpr std::string_view pipe_declarations = "V : ft/s\nR_h : ft\nS, C_hw : 1\n";

plumb_test::process_result plumb_run(const std::vector<std::string>& args,
                                     const std::filesystem::path& folder) {
    std::vector<std::string> argv{PLUMB_CLI_PATH};
    argv.insert(argv.end(), args.begin(), args.end());
    return run_process(argv, folder);
}

} // namespace

TEST_CASE("inline mark: accepts the named rule on its statement, with its reason") {
    const std::string text = std::string(pipe_declarations) +
                             "@hw V = 1.318*C_hw*R_h^0.63*S^0.54   # reviewed side-mismatch: "
                             "empirical, US units, water at 40-75 °F\n";
    const auto report = plumb::check_text("mains.plumb", text);
    const auto found = with_rule(report, plumb::rules::side_mismatch);
    REQUIRE(found.size() == 1);
    REQUIRE(found[0]->accepted.has_value());
    CHECK(found[0]->accepted->reason == "empirical, US units, water at 40-75 °F");
    CHECK(found[0]->accepted->by_inline_mark);
    CHECK(report.count(severity::error) == 0);
    CHECK(report.count_accepted() == 1);
    // Without the mark the same formula is an error that counts.
    const auto unmarked = plumb::check_text(
        "mains.plumb", std::string(pipe_declarations) + "@hw V = 1.318*C_hw*R_h^0.63*S^0.54\n");
    CHECK(unmarked.count(severity::error) == 1);
    CHECK(unmarked.count_accepted() == 0);
}

TEST_CASE("inline mark: a continued formula, several rules, and a mark on another line") {
    const auto report = plumb::check_text("c.plumb", "x, y : m\nz : s\nk : 1\n"
                                                     "y = x + \\\n"
                                                     "    z   # reviewed sum-mismatch, unused: z "
                                                     "is a placeholder until rev B\n"
                                                     "y = x + z\n");
    const auto sums = with_rule(report, plumb::rules::sum_mismatch);
    REQUIRE(sums.size() == 2);
    CHECK(sums[0]->accepted.has_value());  // the continued statement carries the mark
    CHECK(!sums[1]->accepted.has_value()); // the same text on its own line does not
    // 'unused' is named but k's finding is on another statement: the mark says so.
    const auto stale = with_rule(report, plumb::rules::stale_acceptance);
    REQUIRE(stale.size() == 1);
    CHECK(contains(stale[0]->message, "'unused'"));
    CHECK(report.count(severity::error) == 1);
}

TEST_CASE("inline mark: no reason, an unknown rule, and an ordinary comment") {
    const auto no_reason = plumb::check_text("a.plumb", "x, y : m\nz : s\ny = x + z  # reviewed "
                                                        "sum-mismatch\n");
    REQUIRE(with_rule(no_reason, plumb::rules::acceptance_problem).size() == 1);
    CHECK(!with_rule(no_reason, plumb::rules::sum_mismatch)[0]->accepted);
    CHECK(no_reason.count(severity::error) == 2);

    const auto empty_reason =
        plumb::check_text("a.plumb", "x, y : m\nz : s\ny = x + z  # reviewed sum-mismatch:   \n");
    CHECK(with_rule(empty_reason, plumb::rules::acceptance_problem).size() == 1);

    const auto misspelt = plumb::check_text(
        "b.plumb", "x, y : m\nz : s\ny = x + z  # reviewed sum-mismatsh: checked by hand\n");
    const auto problems = with_rule(misspelt, plumb::rules::acceptance_problem);
    REQUIRE(problems.size() == 1);
    REQUIRE(!problems[0]->notes.empty());
    CHECK(contains(problems[0]->notes[0].message, "sum-mismatch"));

    // Every item of the list is read: an empty one is skipped, each unknown one is a finding
    // of its own, and a missing reason is reported besides.
    const auto listed = plumb::check_text(
        "e.plumb", "x, y : m\nz : s\ny = x + z  # reviewed sum-mismatsh,, unusd, sum-mismatch\n");
    const auto listed_problems = with_rule(listed, plumb::rules::acceptance_problem);
    REQUIRE(listed_problems.size() == 3);
    CHECK(contains(listed_problems[0]->message, "'sum-mismatsh'"));
    CHECK(contains(listed_problems[1]->message, "'unusd'"));
    CHECK(contains(listed_problems[2]->message, "needs a reason"));
    CHECK(!with_rule(listed, plumb::rules::sum_mismatch)[0]->accepted);
    const auto skipped = plumb::check_text(
        "f.plumb", "x, y : m\nz : s\ny = x + z  # reviewed sum-mismatch,,: checked by hand\n");
    CHECK(with_rule(skipped, plumb::rules::acceptance_problem).empty());
    CHECK(with_rule(skipped, plumb::rules::sum_mismatch)[0]->accepted.has_value());

    // A remark that happens to start with the word is no mark.
    const auto remark = plumb::check_text(
        "c.plumb", "x, y : m\ny = x   # reviewed by the second checker, 3 March\n");
    CHECK(remark.diagnostics.empty());
    // Inside a description's quotes a '#' starts no comment.
    const auto quoted =
        plumb::check_text("d.plumb", "x : m \"# reviewed unused: no\"\ny : m\ny = 2*y\n");
    CHECK(with_rule(quoted, plumb::rules::acceptance_problem).empty());
    CHECK(with_rule(quoted, plumb::rules::unused).size() == 1);
}

TEST_CASE("statement keys: the label, or the text without blanks and comments") {
    const plumb::source_file labelled("f", "x : m\n@head-loss  h = a +\\\n  b  # note\n");
    CHECK(plumb::statement_key(labelled, labelled.line_start(3) + 2) == "@head-loss");
    const plumb::source_file plain("f", "y =  x +\\   # first\n    z # second\n");
    CHECK(plumb::statement_key(plain, plain.line_start(2) + 4) == "y=x+z");
    const auto range = plumb::logical_line_around(plain, 2);
    CHECK(range.first == 1);
    CHECK(range.last == 2);
}

TEST_CASE("accepted-findings file: written by accept, matched by statement, stale reported") {
    scratch_folder dir("accepted");
    dir.write("plumb.toml", "include = [\"calcs\"]\n");
    dir.write("calcs/pipe.plumb", "x, y : m\nz : s\nw : 1\n@odd y = x + z\nw = 2*w\n");
    auto first = plumb_run({"check", "--quiet"}, dir.path());
    CHECK(first.status == 1);
    CHECK(contains(first.out, "FAILED"));

    auto refused = plumb_run({"accept"}, dir.path());
    CHECK(refused.status == 2);
    CHECK(contains(refused.err, "--reason"));
    CHECK(!std::filesystem::exists(dir.path() / "plumb-accepted.toml"));

    auto accepted = plumb_run({"accept", "--reason", "z is replaced in rev B"}, dir.path());
    REQUIRE(accepted.status == 0);
    const auto ledger = dir.path() / "plumb-accepted.toml";
    REQUIRE(std::filesystem::exists(ledger));

    // Edits elsewhere in the file (new lines above) keep the entry matching.
    dir.write("calcs/pipe.plumb", "# rev A2\n\nx, y : m\nz : s\nw : 1\n@odd y = x + z\nw = 2*w\n");
    auto second = plumb_run({"check", "--format", "json"}, dir.path());
    CHECK(second.status == 0);
    CHECK(contains(second.out, "\"reason\": \"z is replaced in rev B\""));
    CHECK(contains(second.out, "\"by\": \"accepted-findings\""));
    CHECK(contains(second.out, "\"accepted\": 1"));

    // A new finding still fails; the fixed one leaves a stale entry.
    dir.write("calcs/pipe.plumb", "x, y : m\nz : s\nw : 1\n@odd y = x + x\nw = 2*w\ny = z\n");
    auto third = plumb_run({"check"}, dir.path());
    CHECK(third.status == 1);
    CHECK(contains(third.out, "[stale-acceptance]"));
    CHECK(contains(third.out, "[side-mismatch]"));

    // Rewriting drops the stale entry and keeps nothing else unreviewed.
    auto rewrite = plumb_run({"accept", "--reason", "kept until the pump is chosen"}, dir.path());
    CHECK(rewrite.status == 0);
    auto fourth = plumb_run({"check"}, dir.path());
    CHECK(fourth.status == 0);
    CHECK(!contains(fourth.out, "stale-acceptance"));
}

TEST_CASE("accepted-findings file: problems in it are findings, not silence") {
    scratch_folder dir("accepted-bad");
    dir.write("plumb.toml", "");
    dir.write("a.plumb", "x, y : m\nz : s\ny = x + z\n");
    dir.write("plumb-accepted.toml", "[[accepted]]\nfile = \"a.plumb\"\nrule = \"sum-mismatch\"\n"
                                     "statement = \"y=x+z\"\nreason = \"\"\ncolour = \"red\"\n");
    auto r = plumb_run({"check", "a.plumb"}, dir.path());
    CHECK(r.status == 1);
    CHECK(contains(r.out, "unknown key 'colour'"));
    CHECK(contains(r.out, "plumb-accepted.toml:6:1"));
    dir.write("plumb-accepted.toml", "[[accepted]\nfile = 1\n");
    auto broken = plumb_run({"check", "a.plumb"}, dir.path());
    CHECK(broken.status == 1);
    CHECK(contains(broken.out, "not valid TOML"));
    CHECK(contains(broken.out, "[sum-mismatch]")); // the calc is still checked
}

TEST_CASE("settings: dictionaries, include, exclude, rule levels, fail-on; unknown keys refused") {
    scratch_folder dir("settings");
    dir.write("plumb.toml", "dictionaries = [\"dict/common.plumb\"]\n"
                            "include = [\"calcs\"]\n"
                            "exclude = [\"calcs/old/**\"]\n"
                            "fail-on = \"warning\"\n"
                            "[rules]\nunused = \"error\"\n");
    dir.write("dict/common.plumb", "g : m/s^2\n");
    dir.write("calcs/a.plumb", "h, v : m\nt : s\nv = h\n");
    dir.write("calcs/old/broken.plumb", "x = \n");
    dir.write("calcs/sub/b.plumb", "u : m/s\nh2 : m\nu = sqrt(2*g*h2)\n");
    // Found by searching upward from a folder inside the project.
    auto r = plumb_run({"check", "."}, dir.path() / "calcs" / "sub");
    CHECK(r.status == 0);
    CHECK(contains(r.out, "1 formula in 1 file"));
    auto all = plumb_run({"check"}, dir.path() / "calcs");
    CHECK(all.status == 1); // 'unused' made an error; old/ never read
    CHECK(contains(all.out, "error: 't' is declared but never used [unused]"));
    CHECK(!contains(all.out, "broken"));

    dir.write("plumb.toml", "[rules]\nunused = \"off\"\n");
    auto off = plumb_run({"check", "calcs/a.plumb"}, dir.path());
    CHECK(off.status == 0);
    CHECK(!contains(off.out, "[unused]"));
    dir.write("plumb.toml", "");
    auto plain = plumb_run({"check", "calcs/a.plumb"}, dir.path());
    CHECK(plain.status == 0);
    auto strict = plumb_run({"check", "--fail-on", "warning", "calcs/a.plumb"}, dir.path());
    CHECK(strict.status == 1);

    dir.write("plumb.toml", "dictionaries = \"dict/common.plumb\"\nstrictness = 3\n"
                            "fail-on = \"never\"\n[rules]\nsum-mismatsh = \"off\"\n"
                            "unused = \"loud\"\n");
    auto bad = plumb_run({"check", "calcs/a.plumb"}, dir.path());
    CHECK(bad.status == 2);
    CHECK(contains(bad.err, "plumb.toml:1:16: 'dictionaries' must be a list"));
    CHECK(contains(bad.err, "plumb.toml:2:1: unknown key 'strictness'"));
    CHECK(contains(bad.err, "'fail-on' is \"error\" or \"warning\""));
    CHECK(contains(bad.err, "'sum-mismatsh' is not a rule id"));
    CHECK(contains(bad.err, "\"error\", \"warning\" or \"off\""));
    CHECK(bad.out.empty());
}

TEST_CASE("settings: every key of the reference is accepted by the reader") {
    scratch_folder dir("settings-reference");
    const auto file = dir.write("plumb.toml", plumb::settings_reference());
    const auto read = plumb::read_settings(file);
    for (const auto& p : read.problems)
        FAIL_CHECK(p.line << ":" << p.column << ": " << p.message);
    CHECK(read.settings.fail_on == severity::warning);
    CHECK(read.settings.rule_levels.size() == 2);
    CHECK(read.settings.restate_in == std::vector<std::string>{"ft", "lb", "s"});
    CHECK(plumb::find_settings(dir.path() / "deeper" / "file.plumb") == file);
}

TEST_CASE("quiet mode: failing findings, one summary line, the caution once") {
    scratch_folder dir("quiet");
    dir.write("a.plumb", "x, y : m\nz : s\ny = x + z\nw : m\n");
    auto r = plumb_run({"check", "--quiet", "a.plumb"}, dir.path());
    CHECK(r.status == 1);
    const auto lines = std::count(r.out.begin(), r.out.end(), '\n');
    CHECK(lines == 3); // the error, the summary and the caution; the warning does not fail
    CHECK(contains(r.out, "plumb: FAILED: 1 formulas in 1 files, 1 errors, 1 warnings"));
    CHECK(contains(r.out, std::string("caution: ") + std::string(plumb::caution_text())));
    auto strict = plumb_run({"check", "-q", "--fail-on=warning", "a.plumb"}, dir.path());
    CHECK(std::count(strict.out.begin(), strict.out.end(), '\n') == 4);
}

TEST_CASE("Markdown notes: plumb blocks are checked with the .md file's lines and columns") {
    const std::string note = "# Pump note\n\nText with `code`.\n\n```plumb\nQ : m^3/s\nA : m^2\n"
                             "V : m\nV = Q/A\n```\n\n```python\nx = 1\n```\n~~~~ plumb extra\n"
                             "y : s\n~~~~\n";
    CHECK(plumb::has_plumb_blocks(note));
    CHECK(!plumb::has_plumb_blocks("```plumbing\nx\n```\n"));
    const std::string blocks = plumb::plumb_blocks_of(note);
    CHECK(std::count(blocks.begin(), blocks.end(), '\n') ==
          std::count(note.begin(), note.end(), '\n'));
    scratch_folder dir("markdown");
    dir.write("notes/pump.md", note);
    dir.write("notes/plain.md", "# nothing to check\n```\nV = Q/A\n```\n");
    auto r = plumb_run({"check", "notes"}, dir.path());
    CHECK(r.status == 1);
    CHECK(contains(r.out, "notes/pump.md:9:5: error: the two sides of this equation differ"));
    CHECK(contains(r.out, "notes/pump.md:16:1: warning: 'y' is declared but never used"));
    CHECK(contains(r.out, "in 1 file"));
}

TEST_CASE("exclude patterns: *, ** and ?, and folders") {
    CHECK(plumb::path_matches("calcs/old/**", "calcs/old/a.plumb"));
    CHECK(plumb::path_matches("calcs/old", "calcs/old/deep/a.plumb"));
    CHECK(plumb::path_matches("**/draft-*.plumb", "a/b/draft-3.plumb"));
    CHECK(plumb::path_matches("**/draft-*.plumb", "draft-3.plumb"));
    CHECK(plumb::path_matches("*.md", "notes.md"));
    CHECK(!plumb::path_matches("*.md", "notes/a.md"));
    CHECK(plumb::path_matches("rev?.plumb", "revB.plumb"));
    CHECK(!plumb::path_matches("rev?.plumb", "rev10.plumb"));
    CHECK(!plumb::path_matches("calcs/old/**", "calcs/older.plumb"));
    CHECK(!plumb::path_matches("", "a.plumb"));
    // A pathological pattern ends quickly.
    CHECK(!plumb::path_matches("*a*a*a*a*a*a*a*a*b", std::string(200, 'a')));
}

TEST_CASE("--with-users: a changed dictionary brings the calcs that use it") {
    scratch_folder dir("users");
    dir.write("plumb.toml", "");
    dir.write("dict/base.plumb", "g : m/s^2\n");
    dir.write("dict/fluids.plumb", "use \"base.plumb\"\nρ : kg/m^3\n");
    dir.write("calcs/head.plumb", "use \"../dict/fluids.plumb\"\np : Pa\nh : m\nh = p/(ρ*g)\n");
    dir.write("calcs/other.plumb", "a, b : m\na = b\n");
    dir.write("notes/n.md", "```plumb\nuse \"../dict/base.plumb\"\nz : m\nt : s\nz = g*t\n```\n");
    auto r = plumb_run({"check", "--with-users", "dict/base.plumb"}, dir.path());
    CHECK(contains(r.out, "notes/n.md:5:5"));
    CHECK(contains(r.out, "2 formulas in 4 files")); // base, fluids, head and n.md
    plumb::check_options options;
    options.project_root = dir.path();
    const auto users = plumb::files_using({dir.path() / "dict/base.plumb"}, options);
    REQUIRE(users.size() == 3);
    CHECK(users[0].filename() == "head.plumb");
    CHECK(users[1].filename() == "fluids.plumb");
    CHECK(users[2].filename() == "n.md");
}

TEST_CASE("SHA-256: the example messages of FIPS 180-2, appendix B") {
    CHECK(plumb::sha256_hex("abc") ==
          "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
    CHECK(plumb::sha256_hex("abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq") ==
          "248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1");
    CHECK(plumb::sha256_hex(std::string(1000000, 'a')) ==
          "cdc76e5c9914fb9281a1c7e284d73e67f1809a48a497200e046d39ccc7112cd0");
    // NIST CAVP SHA256ShortMsg, Len = 0.
    CHECK(plumb::sha256_hex("") ==
          "e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855");
}

TEST_CASE("git commit: read from HEAD, a loose ref or packed-refs, without git") {
    scratch_folder dir("git");
    const std::string id = "0123456789abcdef0123456789abcdef01234567";
    dir.write(".git/HEAD", "ref: refs/heads/main\n");
    dir.write(".git/packed-refs", "# pack-refs with: peeled\n" + id + " refs/heads/main\n");
    std::filesystem::create_directories(dir.path() / "calcs");
    CHECK(plumb::git_commit_of(dir.path() / "calcs") == id);
    const std::string loose = "fedcba9876543210fedcba9876543210fedcba98";
    dir.write(".git/refs/heads/main", loose + "\n");
    CHECK(plumb::git_commit_of(dir.path()) == loose);
    scratch_folder none("no-git");
    CHECK(plumb::git_commit_of(none.path()).empty() == !std::filesystem::exists("/.git"));
}

TEST_CASE("SARIF: rules, locations, related locations and suppressions") {
    const std::string text = std::string(pipe_declarations) +
                             "@hw V = 1.318*C_hw*R_h^0.63*S^0.54   # reviewed side-mismatch: field "
                             "units\nx, y : m\nz : s\ny = x + z\n";
    const auto report = plumb::check_text("calc.plumb", text);
    const std::string sarif = plumb::render_sarif(report, ".");
    CHECK(contains(sarif, "\"version\": \"2.1.0\""));
    CHECK(contains(sarif, "\"id\": \"sum-mismatch\""));
    CHECK(contains(sarif, "\"ruleId\": \"sum-mismatch\", \"ruleIndex\": 1, \"level\": \"error\""));
    CHECK(contains(sarif, "\"uri\": \"calc.plumb\", \"uriBaseId\": \"PROJECTROOT\""));
    CHECK(contains(sarif, "\"startLine\": 7, \"startColumn\": 9"));
    CHECK(contains(sarif, "\"relatedLocations\""));
    CHECK(contains(sarif, "\"kind\": \"inSource\", \"status\": \"accepted\", "
                          "\"justification\": \"field units\""));
}

TEST_CASE("sign-off report: header, summary, formulas with side dimensions, caution") {
    scratch_folder dir("report");
    dir.write("plumb.toml", "");
    dir.write("calcs/mains.plumb",
              std::string(pipe_declarations) +
                  "@hw V = 1.318*C_hw*R_h^0.63*S^0.54   # reviewed side-mismatch: field units\n"
                  "F_D : N\nρ : kg/m^3\nV : m/s\nD : m\nμ : Pa*s\nstudy sphere: F_D depends on ρ, "
                  "V, D, μ\n"
                  "x, y : m\nz : s\ny = x + z\ny <= 3*x\n");
    auto r = plumb_run({"report", "calcs", "-o", "check.html"}, dir.path());
    CHECK(r.status == 1);
    CHECK(contains(r.out, "caution:"));
    std::ifstream in(dir.path() / "check.html");
    const std::string html{std::istreambuf_iterator<char>(in), std::istreambuf_iterator<char>()};
    CHECK(contains(html, "default-src 'none'"));
    CHECK(!contains(html, "http://"));
    CHECK(!contains(html, "<script"));
    CHECK(contains(html, "<td id=\"formula-count\">4</td>"));
    CHECK(contains(html, "<td id=\"accepted-count\">1</td>"));
    CHECK(contains(html, "reason"));
    CHECK(contains(html, "field units"));
    CHECK(contains(html, "@media print"));
    std::ifstream calc(dir.path() / "calcs/mains.plumb", std::ios::binary);
    const std::string bytes{std::istreambuf_iterator<char>(calc), std::istreambuf_iterator<char>()};
    CHECK(contains(html, plumb::sha256_hex(bytes)));
    CHECK(contains(html, "[L] (length) <b>&lt;=</b> [L] (length)"));
    CHECK(contains(html, "Reynolds number"));
    CHECK(std::count(html.begin(), html.end(), '\n') > 20);
    CHECK(contains(html, plumb::caution_text().substr(1))); // capitalised there
    auto missing = plumb_run({"report", "calcs"}, dir.path());
    CHECK(missing.status == 2);
}

TEST_CASE("formula list: the sides' dimensions are worked out only for the sign-off report") {
    // The JSON list gives each formula's place, label and result; the second walk that finds
    // each side's dimension is the report's alone (issue 12), and must not change the list.
    const std::string text = "x, y : m\nz : s\n@sum y = x + z\n@bound y <= 3*x\n";
    plumb::check_options listing;
    listing.record_formulas = true;
    plumb::check_options with_sides = listing;
    with_sides.record_side_dimensions = true;
    const auto lean = plumb::check_text("bounds.plumb", text, listing);
    const auto full = plumb::check_text("bounds.plumb", text, with_sides);
    REQUIRE(lean.formulas.size() == 2);
    REQUIRE(full.formulas.size() == 2);
    CHECK(lean.formulas[0].sides.empty());
    CHECK(lean.formulas[0].relations.empty());
    REQUIRE(full.formulas[1].sides.size() == 2);
    REQUIRE(full.formulas[1].sides[0].has_value());
    CHECK(full.formulas[1].sides[0]->to_string() == "[L]");
    CHECK(full.formulas[1].relations == std::vector<std::string>{"<="});
    CHECK(!full.formulas[0].sides[1].has_value()); // x + z is in error
    CHECK(lean.formulas[0].worst == severity::error);
    CHECK(!lean.formulas[1].worst.has_value());
    CHECK(plumb::render_json(lean) == plumb::render_json(full));
}
