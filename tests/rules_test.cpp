// One test case per rule id: a text that must trigger the rule (its id, severity, place and
// the key words of its message) and near misses that must not. Places and dimensions were
// worked out by hand from the text, never copied from a run.
#include "plumb/check.hpp"
#include "plumb/diagnostic.hpp"
#include "plumb/dimension.hpp"
#include "plumb/rules.hpp"

#include "test_support.hpp"

#include <doctest/doctest.h>

#include <chrono>
#include <cstdint>
#include <filesystem>
#include <fstream>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace {

namespace fs = std::filesystem;
using plumb::check_report;
using plumb::diagnostic;
using plumb::dimension;
using plumb::rational;
using plumb::severity;

plumb::line_column position(const diagnostic& d) {
    REQUIRE(d.where.file != nullptr);
    return d.where.file->position(d.where.range.begin);
}

std::string listing(const check_report& report) {
    std::string out;
    for (const auto& d : report.diagnostics) {
        if (d.where.file != nullptr) {
            const auto at = d.where.file->position(d.where.range.begin);
            out += d.where.file->path() + ":" + std::to_string(at.line) + ":" +
                   std::to_string(at.column) + ": ";
        }
        out += d.rule + ": " + d.message + "\n";
        for (const auto& n : d.notes)
            out += "    note: " + n.message + "\n";
    }
    return out.empty() ? std::string("(no findings)") : out;
}

std::vector<const diagnostic*> of_rule(const check_report& report, std::string_view rule) {
    std::vector<const diagnostic*> out;
    for (const auto& d : report.diagnostics)
        if (d.rule == rule)
            out.push_back(&d);
    return out;
}

bool contains(std::string_view text, std::string_view part) {
    return text.find(part) != std::string_view::npos;
}

bool any_note_contains(const diagnostic& d, std::string_view part) {
    for (const auto& n : d.notes)
        if (contains(n.message, part))
            return true;
    return false;
}

// The only finding of `rule` on a 1-based line, which must be the only finding on that line.
const diagnostic& finding_on(const check_report& report, std::string_view rule,
                             std::uint32_t line) {
    std::vector<const diagnostic*> on_line;
    for (const auto& d : report.diagnostics)
        if (d.where.file != nullptr && position(d).line == line)
            on_line.push_back(&d);
    INFO("line ", line, ", rule ", rule);
    INFO(listing(report));
    REQUIRE(on_line.size() == 1);
    REQUIRE(on_line.front()->rule == rule);
    return *on_line.front();
}

void at(const diagnostic& d, std::uint32_t line, std::uint32_t column) {
    const auto where = position(d);
    INFO(d.rule, ": ", d.message);
    CHECK(where.line == line);
    CHECK(where.column == column);
}

// Asserts that `text` gives no finding at all.
void clean(const std::string& text) {
    const auto report = plumb::check_text("near-miss.plumb", text);
    INFO("text:\n", text);
    INFO(listing(report));
    CHECK(report.diagnostics.empty());
}

// Asserts that `text` gives no finding of `rule`.
void not_triggered(const std::string& text, std::string_view rule) {
    const auto report = plumb::check_text("near-miss.plumb", text);
    INFO("text:\n", text);
    INFO(listing(report));
    CHECK(of_rule(report, rule).empty());
}

check_report check(const std::string& text) {
    return plumb::check_text("rules.plumb", text);
}

// A fresh folder under the system's temporary directory, removed with everything in it.
using plumb::test::temp_dir;

using plumb::test::typed;

dimension length_to(rational p) {
    return dimension::from_exponents({0, p, 0, 0, 0, 0, 0});
}

} // namespace

TEST_CASE("sum-mismatch") {
    const auto report = check("x, y : m\n"
                              "t : s\n"
                              "y = x + t\n"
                              "y = x - t\n"
                              "y = x + t + y\n"
                              "y = t + x + y\n");
    const diagnostic& add = finding_on(report, plumb::rules::sum_mismatch, 3);
    CHECK(add.level == severity::error);
    at(add, 3, 9);
    CHECK(contains(add.message, "cannot add 't' to 'x'"));
    CHECK(contains(add.message, "dimensions differ"));
    CHECK(add.terms.size() == 2);
    CHECK(any_note_contains(add, "'t' is [T]"));
    CHECK(any_note_contains(add, "'x' is [L]"));

    const diagnostic& subtract = finding_on(report, plumb::rules::sum_mismatch, 4);
    at(subtract, 4, 9);
    CHECK(contains(subtract.message, "cannot subtract 't' from 'x'"));

    // With three terms the odd one is named, whichever place it takes.
    const diagnostic& third = finding_on(report, plumb::rules::sum_mismatch, 5);
    at(third, 5, 9);
    CHECK(contains(third.message, "'t' does not have the dimension of the other terms"));
    const diagnostic& first = finding_on(report, plumb::rules::sum_mismatch, 6);
    at(first, 6, 5);
    CHECK(contains(first.message, "'t'"));
    CHECK(report.diagnostics.size() == 4);

    // Near misses: a literal 0 agrees with any dimension (NOTATION.md); like terms add.
    clean("x, y : m\ny = x - 0");
    clean("x, y : m\ny = 0 + x");
    clean("x, y : m\ny = x + y - x");
    clean("r : 1\nr = 1 + r - 2.5");
}

TEST_CASE("side-mismatch") {
    const auto report = check("x : m\n"
                              "t : s\n"
                              "g : [L T^-2] \"gravity\"\n"
                              "x = t\n"
                              "x <= t\n"
                              "0 <= x <= t\n"
                              "x = g\n");
    const diagnostic& equation = finding_on(report, plumb::rules::side_mismatch, 4);
    CHECK(equation.level == severity::error);
    at(equation, 4, 5);
    CHECK(contains(equation.message, "two sides of this equation differ in dimension"));
    CHECK(any_note_contains(equation, "left side 'x' is [L]"));
    CHECK(any_note_contains(equation, "right side 't' is [T]"));

    const diagnostic& limit = finding_on(report, plumb::rules::side_mismatch, 5);
    at(limit, 5, 6);
    CHECK(contains(limit.message, "limit"));

    // A chain: 0 agrees with anything, x and t disagree; t is pointed at.
    const diagnostic& chain = finding_on(report, plumb::rules::side_mismatch, 6);
    at(chain, 6, 11);
    CHECK(contains(chain.message, "sides of this limit differ"));

    // The description is quoted (NOTATION.md, "Declarations").
    const diagnostic& described = finding_on(report, plumb::rules::side_mismatch, 7);
    CHECK(any_note_contains(described, "gravity"));
    CHECK(report.diagnostics.size() == 4);

    // Near misses: a 0 side agrees with any dimension.
    clean("v : m/s\nv >= 0");
    clean("x, L : m\n0 <= x <= L");
    clean("x, L : m\n0 \u2264 x < L");
    clean("v, V_max : m/s\nv <= V_max");
    clean("x : m\nt : s\nx/t = x/t");
}

TEST_CASE("dimensioned-argument") {
    const auto report = check("p, p_ref : Pa\n"
                              "r : 1\n"
                              "x : m\n"
                              "r = ln(p)\n"
                              "r = sin(x)\n"
                              "r = log(r, x)\n");
    const diagnostic& ln = finding_on(report, plumb::rules::dimensioned_argument, 4);
    CHECK(ln.level == severity::error);
    at(ln, 4, 8);
    CHECK(contains(ln.message, "ln needs a dimensionless argument"));
    CHECK(contains(ln.message, "'p' is [M L^-1 T^-2]"));
    CHECK(any_note_contains(ln, "ln(p/p_ref)"));

    const auto sin = of_rule(report, plumb::rules::dimensioned_argument);
    REQUIRE(sin.size() == 3);
    at(*sin[1], 5, 9);
    CHECK(contains(sin[1]->message, "sin needs a dimensionless argument"));
    CHECK(any_note_contains(*sin[1], "radians"));
    // log(x, b): both must be dimensionless; the base is the second argument.
    at(*sin[2], 6, 12);
    CHECK(contains(sin[2]->message, "'x' is [L]"));

    // Near misses.
    clean("p, p_ref : Pa\nr : 1\nr = ln(p/p_ref)");
    clean("p, p_ref : Pa\nr : 1\nr = log10(p/p_ref) + log(p/p_ref, 10) + exp(r)");
    clean("theta : rad\nr : 1\nr = sin(theta) + cos(2*theta) + tanh(r)");
    clean("x, y : m\nr : 1\nr = atan(y/x) + asin(y/x)");
}

TEST_CASE("dimensioned-exponent") {
    const auto report = check("r, n : 1\n"
                              "x : m\n"
                              "n = r^x\n"
                              "n = pow(r, x)\n");
    const diagnostic& caret = finding_on(report, plumb::rules::dimensioned_exponent, 3);
    CHECK(caret.level == severity::error);
    at(caret, 3, 7);
    CHECK(contains(caret.message, "the exponent 'x' has a dimension"));
    CHECK(contains(caret.message, "must be dimensionless"));
    const diagnostic& call = finding_on(report, plumb::rules::dimensioned_exponent, 4);
    at(call, 4, 12);
    CHECK(report.diagnostics.size() == 2);

    // Near misses: a dimensionless exponent, even one built from dimensioned symbols.
    clean("r, n : 1\nn = r^n");
    clean("r, n : 1\nx, y : m\nn = r^(x/y)");
    clean("r, n : 1\nn = (1 + r)^n");
}

TEST_CASE("variable-exponent") {
    const auto report = check("n : 1\n"
                              "x : m\n"
                              "A : m^2\n"
                              "t : s\n"
                              "A = x^n\n"
                              "A = pow(x, n)\n"
                              "x = deriv(x, t, n)\n");
    const diagnostic& caret = finding_on(report, plumb::rules::variable_exponent, 5);
    CHECK(caret.level == severity::error);
    at(caret, 5, 7);
    CHECK(contains(caret.message, "'x' has a dimension"));
    CHECK(contains(caret.message, "'n' is not a constant number"));
    CHECK(any_note_contains(caret, "'x' is [L]"));
    const diagnostic& call = finding_on(report, plumb::rules::variable_exponent, 6);
    at(call, 6, 12);
    // The order of deriv must be a whole number (NOTATION.md, "Functions").
    const diagnostic& order = finding_on(report, plumb::rules::variable_exponent, 7);
    at(order, 7, 17);
    CHECK(contains(order.message, "whole number"));

    // Near misses: a dimensionless base may take any dimensionless exponent (NOTATION.md).
    clean("r, n : 1\nn = (1 + r)^n");
    clean("x : m\nA : m^2\nA = x^2");
    clean("x : m\nA : m^2\nA = pow(x, 2)");
    clean("x : m\nA : m^2\nA = x^(4/2)");
    clean("x : m\nA : m^2\nA = x^(1 + 1)");
    clean("x : m\nt : s\na : m/s^2\na = deriv(x, t, 2)");
}

TEST_CASE("argument-mismatch") {
    const auto report = check("x, y : m\n"
                              "t, t1, t2 : s\n"
                              "n : 1\n"
                              "p : Pa\n"
                              "V, V_1 : m^3\n"
                              "W : J\n"
                              "y = max(x, t)\n"
                              "y = hypot(x, y, t)\n"
                              "n = atan2(y, t)\n"
                              "W = integral(p, V, V_1, t)\n");
    const diagnostic& max = finding_on(report, plumb::rules::argument_mismatch, 7);
    CHECK(max.level == severity::error);
    at(max, 7, 12);
    CHECK(contains(max.message, "the arguments of max differ in dimension"));
    CHECK(any_note_contains(max, "'t' is [T]"));
    at(finding_on(report, plumb::rules::argument_mismatch, 8), 8, 17);
    at(finding_on(report, plumb::rules::argument_mismatch, 9), 9, 14);
    const diagnostic& limits = finding_on(report, plumb::rules::argument_mismatch, 10);
    at(limits, 10, 25);
    CHECK(contains(limits.message, "limits of integral"));
    CHECK(contains(limits.message, "'V'"));

    // Near misses.
    clean("x, y, z : m\ny = max(x, y, z) + min(y, 0) + hypot(x, y, z)");
    clean("x, y : m\nn : 1\nn = atan2(y, x)");
    clean("p : Pa\nV, V_1, V_2 : m^3\nW : J\nW = integral(p, V, V_1, V_2)");
    clean("u : m/s\nt, t2 : s\nx : m\nx = integral(u, t, 0, t2)");
}

TEST_CASE("argument-mismatch points at the limits, not at the variable of integration") {
    // Both limits are times while the variable is a volume: the message is about the limits,
    // so the underline belongs on the first limit (t1, column 20), not on V.
    const auto report = check("p : Pa\nV : m^3\nt1, t2 : s\nW : J\n"
                              "W = integral(p, V, t1, t2)\n");
    const diagnostic& d = finding_on(report, plumb::rules::argument_mismatch, 5);
    CHECK(contains(d.message, "limits of integral must have the dimension of the variable 'V'"));
    at(d, 5, 20);
}

TEST_CASE("undeclared, with its 'did you mean' note") {
    const auto report = check("velocity : m/s\n"
                              "t : s\n"
                              "x, h_f : m\n"
                              "x = velocty*t\n"
                              "x = h + h_f\n"
                              "x = sqrt\n");
    const diagnostic& typo = finding_on(report, plumb::rules::undeclared, 4);
    CHECK(typo.level == severity::error);
    at(typo, 4, 5);
    CHECK(typo.message == "'velocty' is not declared");
    CHECK(any_note_contains(typo, "did you mean 'velocity'?"));
    // A short name is near its subscripted forms.
    const diagnostic& subscript = finding_on(report, plumb::rules::undeclared, 5);
    at(subscript, 5, 5);
    CHECK(any_note_contains(subscript, "'h_f'"));
    // A function's name without parentheses.
    const diagnostic& function = finding_on(report, plumb::rules::undeclared, 6);
    CHECK(any_note_contains(function, "sqrt(x)"));
    // The misspelt use leaves the real symbol unused, which is worth its warning too.
    CHECK(finding_on(report, plumb::rules::unused, 1).level == severity::warning);
    CHECK(report.diagnostics.size() == 4);

    // Near misses: spelled right; function names may be declared as symbols (NOTATION.md).
    clean("velocity : m/s\nt : s\nx : m\nx = velocity*t");
    clean("exp, n : 1\nn = exp");
}

TEST_CASE("unused is a warning, and only where formulas could use the symbol") {
    const auto report = check("x, y : m\n"
                              "z : m \"spare\"\n"
                              "y = x\n");
    const diagnostic& d = finding_on(report, plumb::rules::unused, 2);
    CHECK(d.level == severity::warning);
    at(d, 2, 1);
    CHECK(d.message == "'z' is declared but never used");
    CHECK(report.count(severity::warning) == 1);
    CHECK(report.count(severity::error) == 0);
    CHECK(report.diagnostics.size() == 1);

    // A file of declarations only is a dictionary: nothing is unused.
    clean("a, b : m\nc : s \"spare\"\nd : [M]\n");

    // Symbols from a `use`d dictionary or a --dict file are not the checking file's to use.
    const temp_dir dir;
    dir.write("dict.plumb", "a : m\nb : s\nc : kg\n");
    {
        const auto used = plumb::check_text((dir.path() / "main.plumb").string(),
                                            "use \"dict.plumb\"\nx : m\nx = a\n");
        INFO(listing(used));
        CHECK(used.diagnostics.empty());
    }
    {
        plumb::check_options options;
        options.dictionaries.push_back(dir.path() / "dict.plumb");
        const auto dict = plumb::check_text("main.plumb", "x : m\nx = a\n", options);
        INFO(listing(dict));
        CHECK(dict.diagnostics.empty());
    }
}

TEST_CASE("conflicting-declaration names both places") {
    const auto report = check("w : m\n"
                              "w : s\n"
                              "w = w\n");
    const diagnostic& d = finding_on(report, plumb::rules::conflicting_declaration, 2);
    CHECK(d.level == severity::error);
    at(d, 2, 1);
    CHECK(contains(d.message, "'w' is declared again with a different dimension"));
    CHECK(contains(d.message, "[T] here"));
    CHECK(contains(d.message, "[L] before"));
    REQUIRE(!d.notes.empty());
    bool names_first = false;
    for (const auto& n : d.notes) {
        if (n.where.file == nullptr)
            continue;
        const auto first = n.where.file->position(n.where.range.begin);
        // The note's own place is the first declaration; renderers print it before the text.
        names_first = names_first || (first.line == 1 && first.column == 1 &&
                                      contains(n.message, "first declared here"));
    }
    CHECK(names_first);

    // Across files: the note names the dictionary.
    const temp_dir dir;
    dir.write("dict.plumb", "v : m/s\n");
    const auto across = plumb::check_text((dir.path() / "main.plumb").string(),
                                          "use \"dict.plumb\"\nv : s\nv = v\n");
    const diagnostic& c = finding_on(across, plumb::rules::conflicting_declaration, 2);
    bool names_dictionary = false;
    for (const auto& n : c.notes)
        names_dictionary =
            names_dictionary ||
            (n.where.file != nullptr && contains(n.where.file->path(), "dict.plumb") &&
             n.where.file->position(n.where.range.begin).line == 1 &&
             contains(n.message, "first declared here"));
    CHECK(names_dictionary);

    // Near misses: the same dimension twice, by unit and by brackets, is allowed, as is the
    // same scale spelled another way.
    clean("v : m/s\nv : [L T^-1]\nv : m*s^-1\nv = v");
    clean("ρ : kg/m^3\nρ : kg/m3\nρ : kg m\u207B\u00B3\nρ = ρ");
    const auto same = plumb::check_text((dir.path() / "same.plumb").string(),
                                        "use \"dict.plumb\"\nv : [L T^-1]\nv = v\n");
    INFO(listing(same));
    CHECK(same.diagnostics.empty());
}

TEST_CASE("conflicting-declaration: one dimension in units of different scales, both places") {
    // A density declared in kg/m^3 and in lb/ft^3 (1 lb/ft^3 = 16.01846 kg/m^3, NIST SP 811
    // (2008), B.8, from memory): the numbers put in for it mean different amounts.
    const auto report = check("ρ : kg/m^3\n"
                              "ρ : lb/ft^3\n"
                              "ρ = ρ\n");
    const diagnostic& d = finding_on(report, plumb::rules::conflicting_declaration, 2);
    CHECK(d.level == severity::error);
    at(d, 2, 1);
    CHECK(contains(d.message, "lb/ft^3 here, kg/m^3 before"));
    bool names_first = false;
    for (const auto& n : d.notes)
        names_first = names_first || (n.where.file != nullptr &&
                                      n.where.file->position(n.where.range.begin).line == 1 &&
                                      contains(n.message, "first declared here"));
    CHECK(names_first);
    bool states_factor = false;
    for (const auto& n : d.notes)
        states_factor = states_factor || contains(n.message, "16.01846");
    CHECK(states_factor);

    // An offset scale differs from the absolute one though the degree is the same size.
    const auto celsius = check("T : K\nT : \u00B0C\nT = T\n");
    finding_on(celsius, plumb::rules::conflicting_declaration, 2);

    // Across two dictionaries that a file uses: the second names the first.
    const temp_dir dir;
    dir.write("si.plumb", "ρ : kg/m^3\n");
    dir.write("us.plumb", "ρ : lb/ft^3\n");
    const auto across = plumb::check_text((dir.path() / "main.plumb").string(),
                                          "use \"si.plumb\"\nuse \"us.plumb\"\nx : 1\nx = ρ/ρ\n");
    const auto conflicts = of_rule(across, plumb::rules::conflicting_declaration);
    REQUIRE(conflicts.size() == 1);
    CHECK(contains(conflicts[0]->where.file->path(), "us.plumb"));
    bool names_si = false;
    for (const auto& n : conflicts[0]->notes)
        names_si =
            names_si || (n.where.file != nullptr && contains(n.where.file->path(), "si.plumb"));
    CHECK(names_si);
}

TEST_CASE("reserved-name") {
    const auto report = check("pi : m\n"
                              "\u03C0 : 1\n");
    const diagnostic& ascii = finding_on(report, plumb::rules::reserved_name, 1);
    CHECK(ascii.level == severity::error);
    at(ascii, 1, 1);
    CHECK(contains(ascii.message, "'pi' is the number"));
    CHECK(contains(ascii.message, "cannot be declared"));
    const diagnostic& greek = finding_on(report, plumb::rules::reserved_name, 2);
    at(greek, 2, 1);

    // Near misses: names that only start with pi, and pi used as the number.
    clean("pi_r, pie, \u03C0r : m\nA : m^2\nA = pi*pi_r*pie + \u03C0*\u03C0r^2");
}

TEST_CASE("unknown-unit, with a suggestion") {
    const auto report = check("t : sec\n"
                              "v : m/sec\n");
    const diagnostic& d = finding_on(report, plumb::rules::unknown_unit, 1);
    CHECK(d.level == severity::error);
    at(d, 1, 5);
    CHECK(contains(d.message, "unknown unit 'sec'"));
    CHECK(contains(d.message, "did you mean"));
    CHECK(contains(d.message, "'s'"));
    // Inside a compound unit, the unknown symbol itself is pointed at.
    at(finding_on(report, plumb::rules::unknown_unit, 2), 2, 7);

    // Near misses: prefixed SI units, the micro sign and its ASCII stand-in, customary units.
    clean("t : s\nv : km/h\nd, d2 : \u00B5m\nd3 : um\np : psi\nT : \u00B0F\nq : MW\nm_1 : kg");
}

TEST_CASE("unknown-function") {
    const auto report = check("A : m^2\n"
                              "x : m\n"
                              "x = sqr(A)\n"
                              "x = x(2)\n");
    const diagnostic& d = finding_on(report, plumb::rules::unknown_function, 3);
    CHECK(d.level == severity::error);
    at(d, 3, 5);
    CHECK(d.message == "'sqr' is not a known function");
    CHECK(any_note_contains(d, "did you mean 'sqrt'?"));
    // A declared symbol followed by '(' is a call (NOTATION.md); the note says so.
    const diagnostic& product = finding_on(report, plumb::rules::unknown_function, 4);
    at(product, 4, 5);
    CHECK(any_note_contains(product, "write a product with '*'"));

    // Near misses.
    clean("A : m^2\nx : m\nx = sqrt(A)");
    clean("x : m\nx = x*(2)");
}

TEST_CASE("wrong-arity") {
    const auto report = check("x, y : m\n"
                              "p : Pa\n"
                              "V, V_1 : m^3\n"
                              "W : J\n"
                              "x = sqrt(x, y)\n"
                              "x = hypot(x)\n"
                              "x = max(x)\n"
                              "W = integral(p, V, V_1)\n");
    const diagnostic& d = finding_on(report, plumb::rules::wrong_arity, 5);
    CHECK(d.level == severity::error);
    at(d, 5, 5);
    CHECK(d.message == "sqrt takes 1 argument, but 2 are given");
    CHECK(finding_on(report, plumb::rules::wrong_arity, 6).message ==
          "hypot takes 2 to 3 arguments, but 1 is given");
    CHECK(contains(finding_on(report, plumb::rules::wrong_arity, 7).message,
                   "max takes at least 2 arguments"));
    CHECK(contains(finding_on(report, plumb::rules::wrong_arity, 8).message,
                   "(or 4, with the limits)"));

    // Near misses.
    clean("x, y, z : m\nx = hypot(x, y, z)");
    clean("x : m\nt : s\na : m/s^2\na = deriv(x, t, 2)");
}

TEST_CASE("wrong-arity: min and max take any number of arguments") {
    // NOTATION.md: "min(a, b, ...)". 300 arguments is many, but not wrong.
    std::string text = "x : m\nx = max(x";
    for (int i = 1; i < 300; ++i)
        text += ", x";
    text += ")\n";
    clean(text);
}

TEST_CASE("overflow") {
    const auto report = check("x, y : m\n"
                              "y = (x^9223372036854775807)^2\n"
                              "w : [M^9223372036854775807 M]\n"
                              "a : m^9223372036854775807*m\n");
    // L^(2^63 - 1) fits; squaring it does not.
    const diagnostic& squared = finding_on(report, plumb::rules::overflow, 2);
    CHECK(squared.level == severity::error);
    at(squared, 2, 1);
    CHECK(contains(squared.message, "exceed the exact range"));
    // M^(2^63 - 1) * M does not fit either, in brackets or in a unit.
    at(finding_on(report, plumb::rules::overflow, 3), 3, 1);
    at(finding_on(report, plumb::rules::overflow, 4), 4, 1);

    // Near misses: the largest exponent itself fits, and so does a quotient that brings it
    // back down to L.
    not_triggered("w : [M^9223372036854775807]\n", plumb::rules::overflow);
    clean("x, y : m\ny = x^9223372036854775807/x^9223372036854775806");
}

TEST_CASE("exponents past 16 bits keep their dimensions from one formula to the next") {
    // The checker holds such dimensions apart from its common 16-bit form, one check at a
    // time; each symbol's type is kept between formulas. Worked out by hand: L^40000 = L^40000
    // whatever came before, and L^40000 is not T^40000.
    const auto report = check("x, y : [L^40000]\n"
                              "t : [T^40000]\n"
                              "y = x\n"
                              "t = t\n"
                              "y = x\n"
                              "y = t\n"
                              "y*t = x*t\n");
    INFO(listing(report));
    REQUIRE(report.diagnostics.size() == 1);
    const diagnostic& d = finding_on(report, plumb::rules::side_mismatch, 6);
    REQUIRE(d.terms.size() == 2);
    CHECK(d.terms[0].dim.to_string() == "[L^40000]");
    CHECK(d.terms[1].dim.to_string() == "[T^40000]");
}

TEST_CASE("a long product past 16-bit exponents keeps its exact dimension") {
    // 40000 factors of a length after the first: L^40001, worked out by hand. The product
    // passes the checker's 16-bit form at factor 32767 and goes on in full.
    std::string product = "a";
    for (int i = 0; i < 40000; ++i)
        product += i % 2 == 0 ? "*a" : "*(a*b/b)";
    clean("a : m\nb : s\ny : [L^40001]\ny = " + product + "\n");
    const auto report = check("a : m\nb : s\ny : [L^40000]\ny = " + product + "\n");
    const diagnostic& d = finding_on(report, plumb::rules::side_mismatch, 4);
    REQUIRE(d.terms.size() == 2);
    CHECK(d.terms[0].dim.to_string() == "[L^40000]");
    CHECK(d.terms[1].dim.to_string() == "[L^40001]");
}

TEST_CASE("overflow: a parenthesised huge exponent, squared") {
    const auto report = check("x, y : m\ny = (x^(9223372036854775807))^2\n");
    const diagnostic& d = finding_on(report, plumb::rules::overflow, 2);
    at(d, 2, 1);
}

TEST_CASE("unreadable") {
    const temp_dir dir;
    const auto report = plumb::check_text((dir.path() / "main.plumb").string(),
                                          "use \"missing.plumb\"\nx : m\nx = x\n");
    const diagnostic& d = finding_on(report, plumb::rules::unreadable, 1);
    CHECK(d.level == severity::error);
    at(d, 1, 1);
    CHECK(contains(d.message, "missing.plumb"));
    CHECK(contains(d.message, "no such file"));
    CHECK(report.input_failed);

    // A path given to check_paths that does not exist: a finding with no place.
    const auto missing = plumb::check_paths({dir.path() / "nowhere.plumb"});
    const auto unreadable = of_rule(missing, plumb::rules::unreadable);
    REQUIRE(unreadable.size() == 1);
    CHECK(unreadable.front()->where.file == nullptr);
    CHECK(contains(unreadable.front()->message, "nowhere.plumb"));
    CHECK(missing.input_failed);

    // Near miss: `use` paths are relative to the file that says `use`, at every level.
    dir.write("lib/fluids.plumb", "use \"base.plumb\"\nrho : kg/m^3\n");
    dir.write("lib/base.plumb", "g : m/s^2\n");
    const auto main = dir.write("main.plumb", "use \"lib/fluids.plumb\"\np : Pa\nh : m\n"
                                              "p = rho*g*h\n");
    const auto found = plumb::check_paths({main});
    INFO(listing(found));
    CHECK(found.diagnostics.empty());
    CHECK(!found.input_failed);
}

TEST_CASE("include-cycle") {
    const temp_dir dir;
    const auto a = dir.write("a.plumb", "use \"b.plumb\"\np : m\np = q\n");
    dir.write("b.plumb", "use \"a.plumb\"\nq : m\n");
    const auto report = plumb::check_paths({a});
    INFO(listing(report));
    const auto cycles = of_rule(report, plumb::rules::include_cycle);
    REQUIRE(cycles.size() == 1);
    const diagnostic& d = *cycles.front();
    CHECK(d.level == severity::error);
    // Reading a, then b: b's `use "a.plumb"` closes the cycle.
    REQUIRE(d.where.file != nullptr);
    CHECK(fs::path(d.where.file->path()).filename() == "b.plumb");
    at(d, 1, 1);
    CHECK(contains(d.message, "'a.plumb'"));
    CHECK(contains(d.message, "cycle"));
    CHECK(report.diagnostics.size() == 1);

    // A file that uses itself.
    const auto self = dir.write("self.plumb", "use \"self.plumb\"\nx : m\n");
    CHECK(of_rule(plumb::check_paths({self}), plumb::rules::include_cycle).size() == 1);

    // Near miss: a diamond (top uses left and right, both use base) is no cycle, and base is
    // read once.
    dir.write("base.plumb", "g : m/s^2\n");
    dir.write("left.plumb", "use \"base.plumb\"\nh : m\n");
    dir.write("right.plumb", "use \"base.plumb\"\nt : s\n");
    const auto top = dir.write("top.plumb", "use \"left.plumb\"\nuse \"right.plumb\"\n"
                                            "use \"base.plumb\"\nh = g*t^2\n");
    const auto diamond = plumb::check_paths({top});
    INFO(listing(diamond));
    CHECK(diamond.diagnostics.empty());
    CHECK(diamond.sources.size() == 4);
}

TEST_CASE("near misses: parentheses and a unary plus keep an operand's meaning") {
    // Each formula is homogeneous; wrapping an operand in parentheses or writing a unary
    // plus changes nothing about its dimension or its value.
    const char* formulas[] = {
        "y = (x)",         "y = +x",      "y = (+x)",    "y = -(x)",
        "A = x^(2)",       "A = x^((2))", "y = x - (0)", "y = (sqrt(A))",
        "A = pow(x, (2))", "A = x^2^1",   "A = (x)*(y)", "y = (((x)))",
    };
    for (const char* formula : formulas)
        // The last line uses every symbol, whatever the formula under test uses.
        clean(std::string("x, y : m\nA : m^2\n") + formula + "\nA = x*y\n");
}

TEST_CASE("function results: dimensions from query_dimension") {
    const temp_dir dir;
    const auto context = dir.write("context.plumb", "x, y, z : m\n"
                                                    "A : m^2\n"
                                                    "V, V_1, V_2 : m^3\n"
                                                    "t, t_1 : s\n"
                                                    "u : m/s\n"
                                                    "p : Pa\n"
                                                    "T : K\n"
                                                    "n : 1\n");
    const auto dim = [&](const char* expression) {
        return plumb::query_dimension(expression, {context});
    };
    const auto is = [&](const char* expression, const dimension& expected) {
        const auto q = dim(expression);
        INFO("expression: ", expression);
        INFO(listing(q.report));
        CHECK(q.dim.has_value());
        if (!q.dim)
            return;
        CHECK(q.dim->to_string() == expected.to_string());
    };
    const dimension one{};
    // NOTATION.md, "Functions"; each expected dimension worked out by hand.
    is("sqrt(A)", typed(0, 1, 0));
    is("sqrt(x)", length_to(rational(1, 2)));
    is("cbrt(V)", typed(0, 1, 0));
    is("cbrt(x)", length_to(rational(1, 3)));
    is("abs(-u)", typed(0, 1, -1));
    is("pow(x, 3)", typed(0, 3, 0));
    is("pow(x, -1/2)", length_to(rational(-1, 2)));
    is("pow(n, n)", one);
    is("hypot(x, y)", typed(0, 1, 0));
    is("hypot(x, y, z)", typed(0, 1, 0));
    is("min(t, t_1)", typed(0, 0, 1));
    is("max(u, u, u)", typed(0, 1, -1));
    is("max(x, 0)", typed(0, 1, 0));
    is("atan2(y, x)", one);
    is("exp(n) + ln(n) + log10(n) + log(n, 10) + sin(n) + acosh(n)", one);
    is("deriv(u, t)", typed(0, 1, -2));
    is("deriv(x, t, 1)", typed(0, 1, -1));
    is("deriv(x, t, 2)", typed(0, 1, -2));
    is("deriv(T, x, 2)", typed(0, -2, 0, 1));
    is("deriv(x, t, 3)", typed(0, 1, -3));
    is("integral(p, V)", typed(1, 2, -2));
    is("integral(p, V, V_1, V_2)", typed(1, 2, -2));
    is("integral(u, t, 0, t_1)", typed(0, 1, 0));
    is("integral(x, x)", typed(0, 2, 0));

    // The order of deriv must be a whole number of at least 1: no dimension otherwise.
    for (const char* bad : {"deriv(x, t, n)", "deriv(x, t, 1.5)", "deriv(x, t, 0)"}) {
        const auto q = dim(bad);
        INFO("expression: ", bad);
        INFO(listing(q.report));
        CHECK(!q.dim.has_value());
        CHECK(of_rule(q.report, plumb::rules::variable_exponent).size() == 1);
    }
}
