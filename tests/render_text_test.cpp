// The text excerpt drawn from hand-built diagnostics: shapes the checker rarely or never makes
// (nested and overlapping terms, terms on other lines and in other files, more terms than
// letters), so each layout rule is pinned on its own. The checker's own output is pinned
// end to end in cli_test.
#include "plumb/render.hpp"
#include "test_support.hpp"

#include <doctest/doctest.h>

#include <string>
#include <string_view>

namespace {

using plumb::diagnostic;
using plumb::location;
using plumb::source_file;
using plumb::span;
using plumb::test::typed;

// The range of the `nth` occurrence (from 0) of `text` in the file.
location at(const source_file& file, std::string_view text, int nth = 0) {
    std::size_t from = 0;
    std::size_t found = std::string_view::npos;
    for (int i = 0; i <= nth; ++i) {
        found = file.text().find(text, from);
        REQUIRE(found != std::string_view::npos);
        from = found + 1;
    }
    return {&file,
            {static_cast<std::uint32_t>(found), static_cast<std::uint32_t>(found + text.size())}};
}

diagnostic finding(const location& where) {
    diagnostic d;
    d.rule = "sum-mismatch";
    d.message = "a test finding";
    d.where = where;
    return d;
}

// The lines after the first.
std::string excerpt_of(const diagnostic& d) {
    const std::string text = plumb::render_text(d);
    return text.substr(text.find('\n') + 1);
}

const plumb::dimension length = typed(0, 1, 0);
const plumb::dimension duration = typed(0, 0, 1);
const plumb::dimension pressure = typed(1, -1, -2);

} // namespace

TEST_SUITE_BEGIN("render_text");

TEST_CASE("a nested term's brace sits nearer the formula than the one around it") {
    const source_file file("nest.plumb", "H = (a + b)*c + t\n");
    diagnostic d = finding(at(file, "t"));
    d.terms.push_back({at(file, "(a + b)*c"), "(a + b)*c", length});
    d.terms.push_back({at(file, "a + b"), "a + b", length});
    d.terms.push_back({at(file, "t"), "t", duration, true});
    CHECK(excerpt_of(d) == "    H = (a + b)*c + t\n"
                           "         └─b─┘      ║\n"
                           "                    c\n"
                           "        └───a───┘\n"
                           "    a  [L]  length\n"
                           "    b  [L]  length\n"
                           "  ▶ c  [T]  time    ◀ does not match\n");
}

TEST_CASE("a combining mark takes no cell, so the marks under the line stay in place") {
    // Q̇ is Q and U+0307, drawn as one character; the brace under 'Q̇*t' and the mark under 'L'
    // must start where the characters do (The Unicode Standard, 3.6: combining marks).
    const source_file file("dot.plumb", "E = Q\u0307*t + L\n");
    diagnostic d = finding(at(file, "L"));
    d.terms.push_back({at(file, "Q\u0307*t"), "Q\u0307*t", length});
    d.terms.push_back({at(file, "L"), "L", duration, true});
    CHECK(excerpt_of(d) == "    E = Q\u0307*t + L\n"
                           "        \u2514a\u2518   \u2551\n"
                           "              b\n"
                           "    a  [L]  length\n"
                           "  \u25B6 b  [T]  time    \u25C0 does not match\n");
}

TEST_CASE("overlapping terms take separate rows; keys never touch") {
    const source_file file("overlap.plumb", "x = ab + cd\n");
    diagnostic d = finding(at(file, "ab"));
    d.terms.push_back({at(file, "ab"), "ab", duration, true});
    d.terms.push_back({at(file, "b + c"), "b + c", length});
    d.terms.push_back({at(file, "cd"), "cd", length});
    CHECK(excerpt_of(d) == "    x = ab + cd\n"
                           "        ╘╛   └┘\n"
                           "        a    c\n"
                           "         └─b─┘\n"
                           "  ▶ a  [T]  time    ◀ does not match\n"
                           "    b  [L]  length\n"
                           "    c  [L]  length\n");
}

TEST_CASE("terms on other lines and in other files are in the ledger with their place") {
    const source_file other("dictionary.plumb", "p : Pa\n");
    const source_file file("here.plumb", "q : m\n"
                                         "h : s\n"
                                         "q = h\n");
    diagnostic d = finding(at(file, "h", 1));
    d.terms.push_back({at(file, "h", 1), "h", duration, true});
    d.terms.push_back({at(file, "q"), "q", length});
    d.terms.push_back({at(other, "p"), "p", pressure});
    CHECK(excerpt_of(d) ==
          "    q = h\n"
          "        ║\n"
          "        a\n"
          "  ▶ a  [T]            time                ◀ does not match\n"
          "    b  [L]            length              at line 1: 'q'\n"
          "    c  [M L^-1 T^-2]  pressure or stress  at dictionary.plumb:1: 'p'\n");
}

TEST_CASE("without a flagged term, the term at the finding's place is the marked one") {
    const source_file file("scale.plumb", "A = D^2\n");
    diagnostic d = finding(at(file, "D^2"));
    d.terms.push_back({at(file, "D^2"), "D^2", typed(0, 2, 0)});
    d.terms.push_back({at(file, "A"), "A", typed(0, 2, 0)});
    // No "does not match": the dimensions agree, the finding is about something else.
    CHECK(excerpt_of(d) == "    A = D^2\n"
                           "    │   ╘b╛\n"
                           "    a\n"
                           "    a  [L^2]  area\n"
                           "  ▶ b  [L^2]  area\n");
}

TEST_CASE("a finding's place with no term: a labelled row, or only the mark") {
    const source_file file("label.plumb", "y = k*x\n");
    diagnostic d = finding(at(file, "k"));
    d.mark_label = "not declared";
    CHECK(excerpt_of(d) == "    y = k*x\n"
                           "        ║\n"
                           "        a\n"
                           "  ▶ a  not declared\n");
    d.mark_label.clear();
    d.where = at(file, "k*x");
    CHECK(excerpt_of(d) == "    y = k*x\n"
                           "        ╘═╛\n");
}

TEST_CASE("notes: bullets, a place of their own, and restatements left to the ledger") {
    const source_file file("notes.plumb", "a : m\n"
                                          "a = 1\n");
    diagnostic d = finding(at(file, "a", 1));
    d.notes.push_back({"first remark", {}});
    d.notes.push_back({"declared here", at(file, "a")});
    d.notes.push_back({"'a' is [L] (length)", {}, true});
    const std::string text = plumb::render_text(d);
    CHECK(text.find("   · first remark\n") != std::string::npos);
    CHECK(text.find("   · notes.plumb:1:1: declared here\n") != std::string::npos);
    CHECK(text.find("is [L] (length)") == std::string::npos);
    CHECK(text.find("note:") == std::string::npos);

    // Without a place there is no ledger, so the restatement is the only record and stays.
    diagnostic placeless = d;
    placeless.where = {};
    CHECK(plumb::render_text(placeless).find("   · 'a' is [L] (length)\n") != std::string::npos);
}

TEST_CASE("more terms than letters still get distinct keys") {
    std::string formula = "s = t";
    for (int i = 0; i < 60; ++i)
        formula += " + x";
    const source_file file("many.plumb", formula + "\n");
    diagnostic d = finding(at(file, "t"));
    d.terms.push_back({at(file, "t"), "t", duration, true});
    for (int i = 0; i < 60; ++i)
        d.terms.push_back({at(file, "x", i), "x", length});
    const std::string text = excerpt_of(d);
    CHECK(text.find("\n  ▶ a  ") != std::string::npos);
    CHECK(text.find("\n    z   ") != std::string::npos);
    CHECK(text.find("\n    A   ") != std::string::npos);
    CHECK(text.find("\n    Z   ") != std::string::npos);
    CHECK(text.find("\n    a1  ") != std::string::npos);
    CHECK(text.find("\n    i1  ") != std::string::npos);
    CHECK(text.find("\n    j1  ") == std::string::npos); // 61 terms: a..z, A..Z, a1..i1
}

TEST_CASE("no caret or tilde runs, and the odd term differs from the rest without colour") {
    const source_file file("plain.plumb", "H = p/(r*g) + z + p\n");
    diagnostic d = finding(at(file, "p", 1));
    // Dimensions without exponents, so any '^' would be a caret.
    d.terms.push_back({at(file, "p", 1), "p", typed(1, 0, 0), true});
    d.terms.push_back({at(file, "p/(r*g)"), "p/(r*g)", length});
    d.terms.push_back({at(file, "z"), "z", length});
    const std::string text = plumb::render_text(d);
    CHECK(text.find('^') == std::string::npos);
    CHECK(text.find('~') == std::string::npos);
    CHECK(text.find(" | ") == std::string::npos);
    CHECK(text.find('\x1b') == std::string::npos);
    CHECK(text.find("║") != std::string::npos);
    CHECK(text.find("└──a──┘") != std::string::npos);
}

TEST_CASE("a workbook's finding is placed by its sheet and cell on one line too") {
    // The one-line form is what a commit hook prints: it must name a place the engineer can
    // open, Sheet!Cell, not a line of plumb's listing of the formulas.
    source_file listing("pump.xlsx", "=C3/1000\n=C4*2\n");
    listing.set_cell_places({{"Pump", "C8"}, {"Pump data", "D9"}});
    diagnostic d = finding(at(listing, "C4*2"));
    d.rule = "unit-scale";
    d.level = plumb::severity::error;
    CHECK(plumb::render_one_line(d) ==
          "pump.xlsx:'Pump data'!D9: error: a test finding [unit-scale]");
    CHECK(plumb::render_text(d).starts_with("pump.xlsx:'Pump data'!D9: error:"));
    // A notation file keeps its line and column.
    const source_file notation("pump.plumb", "H = a + t\n");
    CHECK(plumb::render_one_line(finding(at(notation, "t"))).starts_with("pump.plumb:1:9: error:"));
}

TEST_SUITE_END();
