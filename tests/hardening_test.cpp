// Hostile input that once crashed, hung or ate the machine: each case is a regression test
// that the input now finishes with the right finding, through the library and the binary.
#include "process_support.hpp"

#include "model/ascii_case.hpp"
#include "model/user_file.hpp"
#include "model/utf8.hpp"
#include "plumb/check.hpp"
#include "plumb/render.hpp"
#include "plumb/rules.hpp"
#include "plumb/source.hpp"
#include "sheets/workbook_checker.hpp"

#include <doctest/doctest.h>
#include <fmt/format.h>

#include <algorithm>
#include <filesystem>
#include <string>
#include <string_view>
#include <sys/stat.h>
#include <vector>

namespace {

bool contains(std::string_view text, std::string_view part) {
    return text.find(part) != std::string_view::npos;
}

plumb_test::process_result run_plumb(const std::vector<std::string>& args) {
    std::vector<std::string> argv{PLUMB_CLI_PATH};
    argv.insert(argv.end(), args.begin(), args.end());
    return plumb_test::run_process(argv);
}

// "2/3 + 0 + 0 ... " or "2/3 * 1 * 1 ...": `terms` terms whose value is 2/3.
std::string two_thirds_in_terms(std::size_t terms, char op) {
    const std::string_view unit = op == '+' ? " + 0" : " * 1";
    std::string out = "(2/3)";
    out.reserve(out.size() + terms * unit.size());
    for (std::size_t i = 1; i < terms; ++i)
        out += unit;
    return out;
}

// Manning's formula in US customary units (Chow, Open-Channel Hydraulics (1959), ch. 5, from
// memory: V = (1.49/n) R^(2/3) S^(1/2), 1.486 to more figures), with R's exponent written as a
// chain of `terms` terms. The coefficient carries [L^(1/3) T^-1]; in SI it is
// 1.486 * 0.3048^(1/3) = 1.00005 (NIST SP 811 (2008), Appendix B: ft = 0.3048 m).
std::string manning_with_long_exponent(std::size_t terms, char op) {
    return "V : ft/s\n"
           "R : ft\n"
           "n, S : 1\n"
           "@manning V = 1.486? / n * R^(" +
           two_thirds_in_terms(terms, op) + ") * S^(1/2)\n";
}

constexpr std::size_t long_chain = 100000;

} // namespace

TEST_CASE("hardening: a 100,000-term exponent beside a ? coefficient is restated, not a crash") {
    for (const char op : {'+', '*'}) {
        CAPTURE(op);
        const plumb::check_report report =
            plumb::check_text("long-exponent.plumb", manning_with_long_exponent(long_chain, op));
        REQUIRE(report.diagnostics.size() == 1);
        const plumb::diagnostic& d = report.diagnostics[0];
        CHECK(d.rule == plumb::rules::inferred_dimension);
        CHECK(d.message == "the coefficient 1.486 must carry [L^(1/3) T^-1]");
        CHECK(std::any_of(d.notes.begin(), d.notes.end(), [](const plumb::note& n) {
            return n.message.ends_with("= 1.486 \u00D7 0.3048^(1/3) = 1.00005");
        }));
    }
}

TEST_CASE("hardening: check and groups finish on a 100,000-term exponent with the findings") {
    const plumb_test::scratch_folder dir("long-exponent");
    for (const char op : {'+', '*'}) {
        CAPTURE(op);
        const auto file =
            dir.write(std::string("manning-") + (op == '+' ? "sum" : "product") + ".plumb",
                      manning_with_long_exponent(long_chain, op) +
                          "g : m/s^2\nstudy open-channel: V depends on R, g\n");
        const auto checked = run_plumb({"check", file.string()});
        CHECK(checked.status == 0); // the inferred coefficient is a note
        CHECK(contains(checked.out, "the coefficient 1.486 must carry [L^(1/3) T^-1]"));
        const auto grouped = run_plumb({"groups", file.string()});
        CHECK(grouped.status == 0);
        CHECK(contains(grouped.out, "study open-channel"));
        CHECK(contains(grouped.out, "Froude")); // V/sqrt(g R), the one group of V, R and g
    }
}

TEST_CASE("hardening: a workbook formula with 100,000 operators finishes") {
    // A1 formulas have no length limit in a hostile file: '*' chains are followed without
    // recursion, and '^' or comparison chains longer than the nesting limit are refused.
    const auto check_one_formula = [](const std::string& formula) {
        plumb::sheets::workbook book;
        book.sheets.push_back({"S", {}, {}});
        book.sheets[0].add({{0, 0}, plumb::sheets::cell_kind::number, "2"});
        book.sheets[0].add({{0, 1}, plumb::sheets::cell_kind::formula, formula});
        plumb::check_report report;
        plumb::sheets::check_workbook(book, "long.xlsx", {}, report);
        return report;
    };
    std::string product = "=A1";
    std::string power = "=A1";
    std::string comparison = "=A1";
    for (std::size_t i = 0; i < long_chain; ++i) {
        product += "*2";
        power += "^1";
        comparison += "=2";
    }
    const plumb::check_report multiplied = check_one_formula(product);
    CHECK(std::none_of(multiplied.diagnostics.begin(), multiplied.diagnostics.end(),
                       [](const plumb::diagnostic& d) { return d.rule == plumb::rules::syntax; }));
    for (const auto& chained : {power, comparison}) {
        const plumb::check_report report = check_one_formula(chained);
        REQUIRE(report.diagnostics.size() == 1);
        CHECK(report.diagnostics[0].rule == plumb::rules::not_checked);
        CHECK(contains(report.diagnostics[0].message, "nests too deeply"));
    }
}

// ---------------------------------------------------------------------------------------------
// Reading a user's file: regular files only, never blocking, within a limit

namespace {

// A calc with one real mistake (a length equated with a time), to show the rest is checked.
constexpr std::string_view good_calc = "h : m\nt : s\n@mixed h = t\n";

} // namespace

TEST_CASE("hardening: the limit is counted while reading, not taken from stat") {
    // Files under /proc report a size of 0 in stat and have content all the same.
    const plumb::user_file whole = plumb::read_user_file("/proc/self/status");
    CHECK(whole.problem.empty());
    CHECK(contains(whole.text, "Name:"));
    const plumb::user_file capped = plumb::read_user_file("/proc/self/status", 16);
    CHECK(capped.problem == "it is larger than plumb's limit of 16 bytes for one file");
    CHECK(capped.text.empty());
    const plumb::user_file missing = plumb::read_user_file("/no/such/folder/calc.plumb");
    CHECK(missing.missing);
    CHECK(missing.problem == "no such file");
}

TEST_CASE("hardening: devices, pipes, folders and oversized files are refused with exit 2") {
    const plumb_test::scratch_folder dir("reads");
    const auto good = dir.write("good.plumb", good_calc).string();
    const auto fifo = dir.path() / "pipe.plumb";
    REQUIRE(mkfifo(fifo.c_str(), 0600) == 0);
    std::filesystem::create_directories(dir.path() / "folder.plumb");
    // Sparse: 64 MiB and one byte on disk costs nothing.
    const auto big = dir.write("big.plumb", "");
    std::filesystem::resize_file(big, (std::uintmax_t{64} << 20) + 1);

    struct refused {
        std::string use_line;
        std::string why;
    };
    for (const refused& each : std::vector<refused>{
             {"/dev/zero", "it is a device, not a regular file"},
             {fifo.string(), "it is a pipe, not a regular file"},
             {(dir.path() / "folder.plumb").string(), "it is a folder"},
             {big.string(), "it is larger than plumb's limit of 64 MiB for one file"}}) {
        // Named, not bound: clang 14 cannot capture a structured binding in CAPTURE's lambda.
        const std::string& target = each.use_line;
        const std::string& why = each.why;
        CAPTURE(target);
        const std::string message = fmt::format("cannot read '{}': {}", target, why);
        const auto user = dir.write("user.plumb", fmt::format("use \"{}\"\n", target)).string();
        const auto used = run_plumb({"check", user, good});
        CHECK(used.status == 2);
        CHECK(contains(used.out, message));
        CHECK(contains(used.out, "[side-mismatch]")); // the other file is still checked
        const auto dictionary = run_plumb({"check", "--dict", target, good});
        CHECK(dictionary.status == 2);
        CHECK(contains(dictionary.out, message));
        CHECK(contains(dictionary.out, "[side-mismatch]"));
        if (why != "it is a folder") { // a folder named on the command line is searched
            const auto named = run_plumb({"check", target, good});
            CHECK(named.status == 2);
            CHECK(contains(named.out, message));
            CHECK(contains(named.out, "[side-mismatch]"));
        }
        const auto query = run_plumb({"dim", "h/t", target, good});
        CHECK(query.status == 2);
        CHECK(contains(query.out, message));
    }
}

// ---------------------------------------------------------------------------------------------
// Exit codes and findings

TEST_CASE(
    "hardening: a sum of two large numbers is no exponent overflow, as their product is not") {
    // 2^63 - 1, twice: the exact sum leaves 64 bits, which matters only where an exponent
    // needs the value.
    for (const std::string_view op : {"+", "*"}) {
        CAPTURE(op);
        const plumb::check_report report =
            plumb::check_text("large.plumb", fmt::format("x : 1\n@large x = 9223372036854775807 {} "
                                                         "9223372036854775807\n",
                                                         op));
        CHECK(std::none_of(
            report.diagnostics.begin(), report.diagnostics.end(),
            [](const plumb::diagnostic& d) { return d.rule == plumb::rules::overflow; }));
        CHECK(report.count(plumb::severity::error) == 0);
        CHECK(report.formulas_checked == 1);
    }
}

TEST_CASE("hardening: plumb dim prints the dimension when there is only a warning") {
    const plumb_test::scratch_folder dir("dim-warning");
    const auto context = dir.write("lengths.plumb", "L : m\nd : mm\n").string();
    const auto r = run_plumb({"dim", "L + d", context});
    CHECK(contains(r.out, "[unit-scale]")); // mm beside m: a warning
    CHECK(contains(r.out, "[L] (length)"));
    CHECK(r.status == 0);
}

// An expression on its own belongs to no formula: the rules that search the formula around a
// number (42 US gallons a barrel, a logarithm beside a well-flow constant) once followed a null
// pointer there, and "plumb dim 'Q_g + Q_b*42/1000'" ended in SIGSEGV.
TEST_CASE("hardening: plumb dim on a sum whose numbers the rules read against its formula") {
    const plumb_test::scratch_folder dir("dim-alone");
    const auto context = dir.write("flows.plumb", "Q_b : bbl/d\nQ_g : gpm\n").string();
    for (const std::string expression : {"Q_g + Q_b*42/1000", "Q_g + Q_b*0.6221", "Q_g*264"}) {
        CAPTURE(expression);
        const auto r = run_plumb({"dim", expression, context});
        CHECK(r.status == 0);
        CHECK(contains(r.out, "[L^3 T^-1] (volumetric flow rate)"));
        const plumb::query_result q = plumb::query_dimension(expression, {context});
        REQUIRE(q.dim.has_value());
        CHECK(q.dim->to_string() == "[L^3 T^-1]");
    }
}

TEST_CASE("hardening: plumb dim with no expression says so and exits 2") {
    for (const std::string expression : {"", "#", "   # only a comment"}) {
        CAPTURE(expression);
        const auto r = run_plumb({"dim", expression});
        CHECK(r.status == 2);
        CHECK(contains(r.out, "there is no expression here to work out"));
    }
}

TEST_CASE("hardening: a unit's size that a double cannot hold is a syntax finding, exit 2") {
    const plumb_test::scratch_folder dir("unit-size");
    struct sized {
        std::string text;
        std::string message;
    };
    for (const sized& each : std::vector<sized>{
             {"measure tiny = 1e-400 m\nx : tiny\n",
              "the size of 'tiny' in SI units is too small to hold (it comes to 0)"},
             {"measure huge = 1e308 km\nx : huge\n",
              "the size of 'huge' in SI units is too large to hold (it comes to infinity)"},
             {"x : km^400\n", "the size of this unit in SI units is too large to hold"},
             {"x : (1/km)^400\n", "the size of this unit in SI units is too small to hold"}}) {
        const std::string& text = each.text;
        const std::string& message = each.message;
        CAPTURE(text);
        // The symbol declared in it is not left without a scale: a formula mixing it with
        // metres must not pass as if the unit-scale rule had nothing to say.
        const auto file = dir.write("size.plumb", text + "y : m\n@mix y = x\n").string();
        const auto r = run_plumb({"check", file});
        CHECK(r.status == 2);
        CHECK(contains(r.out, message));
        CHECK(contains(r.out, "[syntax]"));
    }
}

// ---------------------------------------------------------------------------------------------
// Exponents, --restate-in and --vars

TEST_CASE("hardening: an exponent that divides by zero is said to, not called too large") {
    for (const std::string_view spec : {"[L^(1/0)]", "[M L^(3/00)]", "m^(1/0)"}) {
        CAPTURE(spec);
        const plumb::check_report report =
            plumb::check_text("zero.plumb", fmt::format("x : {}\n", spec));
        REQUIRE(!report.diagnostics.empty());
        CHECK(report.diagnostics[0].message == "this exponent divides by zero");
        CHECK(report.diagnostics[0].rule == plumb::rules::syntax);
        CHECK(report.input_failed);
    }
    // A divisor that only starts with zero is a number: 1/05 is 1/5.
    const plumb::check_report fifth = plumb::check_text("fifth.plumb", "x : [L^(1/05)]\n");
    CHECK(fifth.diagnostics.empty());
}

TEST_CASE("hardening: --restate-in refuses a unit named twice or a set that spans nothing new") {
    const plumb_test::scratch_folder dir("restate");
    const auto file =
        dir.write("calc.plumb", std::string(good_calc) + "study s: h depends on t, g\ng : m/s^2\n")
            .string();
    for (const std::string_view command : {"check", "groups", "dim"}) {
        CAPTURE(command);
        const std::vector<std::string> head = command == "dim"
                                                  ? std::vector<std::string>{"dim", "h/t"}
                                                  : std::vector<std::string>{std::string(command)};
        const auto with = [&](const std::string& units) {
            std::vector<std::string> args = head;
            args.insert(args.end(), {"--restate-in", units, file});
            return run_plumb(args);
        };
        const auto twice = with("ft,ft,ft");
        CHECK(twice.status == 2);
        CHECK(contains(twice.err, "'ft' is named twice"));
        const auto two_lengths = with("ft, m");
        CHECK(two_lengths.status == 2);
        CHECK(contains(two_lengths.err, "do not fix one unit for each base dimension"));
        CHECK(with("ft, lb, s").status != 2);
    }
}

TEST_CASE("hardening: groups --vars cannot add statements of its own") {
    const plumb_test::scratch_folder dir("vars");
    const auto file =
        dir.write("pendulum.plumb", "T_p : s\nL_p : m\ng : m/s^2\nm_b : kg\n").string();
    // The ordinary use still works (Rayleigh's pendulum: T sqrt(g/L) is the one group).
    const auto plain = run_plumb({"groups", "--vars", "T_p depends on L_p, g, m_b", file});
    CHECK(plain.status == 0);
    CHECK(contains(plain.out, "study command-line"));
    for (const std::string injected :
         {"T_p depends on L_p, g\nmeasure furlong = 201.168 m", "T_p depends on L_p, g \\",
          "T_p depends on L_p # g", "T_p depends on L_p, g\rstudy other: g depends on L_p"}) {
        CAPTURE(injected);
        const auto r = run_plumb({"groups", "--vars", injected, file});
        CHECK(r.status == 2);
        CHECK(contains(r.err, "--vars and --repeating take one line of names"));
        CHECK(!contains(r.out, "study other"));
    }
    const auto repeating =
        run_plumb({"groups", "--vars", "T_p depends on L_p, g", "--repeating", "L_p\ng", file});
    CHECK(repeating.status == 2);
}

// ---------------------------------------------------------------------------------------------
// UTF-8: one strict check (RFC 3629, section 4; the Unicode Standard, table 3-7)

TEST_CASE("hardening: the UTF-8 check accepts every well-formed form and nothing else") {
    struct sample {
        std::string_view bytes;
        std::string_view what;
    };
    for (const sample& each :
         std::vector<sample>{{"plain ASCII", "one byte"},
                             {"\xC3\xA9", "U+00E9, two bytes"},
                             {"\xE2\x82\xAC", "U+20AC, three bytes"},
                             {"\xED\x9F\xBF", "U+D7FF, the last code point before the surrogates"},
                             {"\xEE\x80\x80", "U+E000, the first after them"},
                             {"\xF0\x9D\x84\x9E", "U+1D11E, four bytes"},
                             {"\xF4\x8F\xBF\xBF", "U+10FFFF, the last code point"}}) {
        const std::string_view bytes = each.bytes;
        CAPTURE(each.what);
        CHECK_FALSE(plumb::first_invalid_utf8(bytes).has_value());
        CHECK(plumb::repaired_utf8(bytes) == bytes);
    }
    for (const sample& each :
         std::vector<sample>{{"\x80", "a continuation byte alone"},
                             {"\xC0\xAF", "an overlong '/' (C0)"},
                             {"\xC1\xBF", "an overlong two-byte form (C1)"},
                             {"\xE0\x80\xAF", "an overlong three-byte form"},
                             {"\xF0\x80\x80\xAF", "an overlong four-byte form"},
                             {"\xED\xA0\x80", "the surrogate U+D800"},
                             {"\xED\xBF\xBF", "the surrogate U+DFFF"},
                             {"\xF4\x90\x80\x80", "U+110000, past the last code point"},
                             {"\xF5\x80\x80\x80", "F5"},
                             {"\xF7\xBF\xBF\xBF", "F7"},
                             {"\xFF", "FF"},
                             {"\xE2\x82", "a three-byte form cut short"},
                             {"\xC3", "a two-byte form cut short"}}) {
        CAPTURE(each.what);
        const std::string text = "ok " + std::string(each.bytes) + " ok";
        CHECK(plumb::first_invalid_utf8(text) == std::optional<std::size_t>(3));
        const std::string repaired = plumb::repaired_utf8(text);
        CHECK_FALSE(plumb::first_invalid_utf8(repaired).has_value());
        CHECK(contains(repaired, "\uFFFD"));
    }
}

TEST_CASE("hardening: the UTF-8 check finds the same byte wherever a form stands in the text") {
    // The check reads the text in blocks of bytes; a form may start at any byte of one, or run
    // from one block into the next. Each is set at every offset in ASCII text longer than
    // two blocks, after another character that may itself straddle a block's end.
    const std::vector<std::string_view> well_formed{"\xC3\xA9", "\xE2\x82\xAC", "\xF0\x9D\x84\x9E"};
    const std::vector<std::string_view> ill_formed{
        "\x80", "\xC0\xAF", "\xED\xA0\x80", "\xF4\x90\x80\x80", "\xFF", "\xE2\x82"};
    for (std::size_t at = 0; at < 80; ++at) {
        for (const std::string_view good : well_formed) {
            std::string text(100, 'x');
            text.replace(at, good.size(), good);
            CAPTURE(at);
            CHECK_FALSE(plumb::first_invalid_utf8(text).has_value());
            for (const std::string_view bad : ill_formed) {
                if (at + good.size() + bad.size() > text.size())
                    continue;
                std::string spoiled = text;
                spoiled.replace(at + good.size(), bad.size(), bad);
                // "\xE2\x82" followed by 'x' is cut short all the same.
                CHECK(plumb::first_invalid_utf8(spoiled) ==
                      std::optional<std::size_t>(at + good.size()));
            }
        }
    }
    // Cut short at the very end, as the last bytes of a block or after them.
    for (std::size_t length = 30; length < 70; ++length) {
        CAPTURE(length);
        std::string text(length, 'x');
        text.back() = '\xC3';
        CHECK(plumb::first_invalid_utf8(text) == std::optional<std::size_t>(length - 1));
    }
}

TEST_CASE("hardening: letter case folds A-Z only and leaves every UTF-8 byte as it is") {
    // Labels are matched by words in lower case ("boiler", "vacuum", "tower"); a byte of °, µ or
    // Δ must come through unchanged, as it would not under a Latin-1 locale's tables.
    CHECK(plumb::lower_ascii("\u0394P Boiler Feed \u00B0C (VACUUM)") ==
          "\u0394p boiler feed \u00B0c (vacuum)");
    CHECK(plumb::upper_ascii("sum(\u00B5m) if") == "SUM(\u00B5M) IF");
    for (int byte = 0x80; byte <= 0xFF; ++byte) {
        const std::string one(1, static_cast<char>(byte));
        CAPTURE(byte);
        CHECK(plumb::lower_ascii(one) == one);
        CHECK(plumb::upper_ascii(one) == one);
    }
    CHECK(plumb::lower_ascii("@[`{") == "@[`{");
    CHECK(plumb::upper_ascii("@[`{") == "@[`{");
}

TEST_CASE("hardening: the line index finds every line break wherever it stands") {
    // The breaks are found a block of bytes at a time: lines of every length up to a few
    // blocks, with and without a break at the end, against a plain count.
    for (std::size_t length = 0; length < 70; ++length) {
        for (const bool break_at_end : {false, true}) {
            std::string text;
            for (std::size_t line = 0; line < 5; ++line)
                text += std::string(length + line, 'a') + "\n";
            if (!break_at_end)
                text += "end";
            const plumb::source_file file("lines.plumb", text);
            CAPTURE(length);
            REQUIRE(file.line_count() == 6);
            std::uint32_t start = 0;
            for (std::uint32_t line = 1; line <= 5; ++line) {
                CHECK(file.line_start(line) == start);
                CHECK(file.line_text(line) == std::string(length + line - 1, 'a'));
                start += static_cast<std::uint32_t>(length + line);
            }
            CHECK(file.line_start(6) == start);
            CHECK(file.line_text(6) == (break_at_end ? "" : "end"));
        }
    }
}

// ---------------------------------------------------------------------------------------------
// Long lines

TEST_CASE("hardening: the marked term keeps its marker on a line wider than the window") {
    // A 200-character name at the end of a long line: wider than the 140 columns shown.
    const std::string name(200, 'q');
    const plumb::check_report report =
        plumb::check_text("long.plumb", "x : m\n@long x = x + " + name + "\n");
    REQUIRE(report.diagnostics.size() == 1);
    CHECK(report.diagnostics[0].rule == plumb::rules::undeclared);
    const std::string text = plumb::render_text(report.diagnostics[0], {});
    CAPTURE(text);
    CHECK(contains(text, "\u2558")); // the double brace's left corner, under the name
    CHECK(contains(text, "\u25B6 a  not declared"));
}
