// The notation's grammar: it is free of the faults PEGTL can find statically, every form
// that grammar/NOTATION.md shows parses, and typical mistakes get a plain message at the
// right line and column. Expected positions were worked out by hand from the grammar
// (where each must<> gives up), not copied from a run.
#include "plumb/check.hpp"
#include "plumb/diagnostic.hpp"
#include "plumb/dimension.hpp"
#include "plumb/notation.hpp"
#include "plumb/rules.hpp"

#include "test_support.hpp"

#include <doctest/doctest.h>
#include <tao/pegtl/contrib/analyze.hpp>

#include <chrono>
#include <cstdint>
#include <filesystem>
#include <fstream>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace {

using plumb::base_dimension;
using plumb::dimension;
using plumb::rational;

struct finding {
    std::string rule;
    plumb::severity level = plumb::severity::error;
    std::uint32_t line = 0;
    std::uint32_t column = 0;
    std::string message;
};

std::vector<finding> findings(const plumb::check_report& report) {
    std::vector<finding> out;
    for (const auto& d : report.diagnostics) {
        finding f{d.rule, d.level, 0, 0, d.message};
        if (d.where.file != nullptr) {
            const plumb::line_column at = d.where.file->position(d.where.range.begin);
            f.line = at.line;
            f.column = at.column;
        }
        out.push_back(std::move(f));
    }
    return out;
}

// One line per finding, for INFO() when an assertion fails.
std::string listing(const std::vector<finding>& all) {
    std::string out;
    for (const auto& f : all)
        out += std::to_string(f.line) + ":" + std::to_string(f.column) + ": " + f.rule + ": " +
               f.message + "\n";
    return out.empty() ? std::string("(no findings)") : out;
}

std::vector<finding> of_rule(const std::vector<finding>& all, std::string_view rule) {
    std::vector<finding> out;
    for (const auto& f : all)
        if (f.rule == rule)
            out.push_back(f);
    return out;
}

std::vector<finding> check(std::string text) {
    return findings(plumb::check_text("grammar.plumb", std::move(text)));
}

// Asserts that `text` has no syntax finding (other rules may fire: only the grammar is tested).
void parses(const std::string& text) {
    const auto all = check(text);
    INFO("text: ", text);
    INFO(listing(all));
    CHECK(of_rule(all, plumb::rules::syntax).empty());
}

struct expected_error {
    std::string text;
    std::uint32_t line;
    std::uint32_t column;
    std::string message;
};

void fails_with(const expected_error& e) {
    const auto all = check(e.text);
    INFO("text: ", e.text);
    INFO(listing(all));
    const auto syntax = of_rule(all, plumb::rules::syntax);
    REQUIRE(syntax.size() == 1);
    CHECK(syntax.front().level == plumb::severity::error);
    CHECK(syntax.front().line == e.line);
    CHECK(syntax.front().column == e.column);
    CHECK(syntax.front().message == e.message);
}

using plumb::test::typed;

// A fresh folder under the system's temporary directory, removed with everything in it.
using plumb::test::temp_dir;

// Asserts the dimension of `expression` against the symbols `context` declares.
void dimension_is(const std::string& expression, const std::filesystem::path& context,
                  const std::optional<dimension>& expected) {
    const auto q = plumb::query_dimension(expression, {context});
    INFO("expression: ", expression);
    INFO(listing(findings(q.report)));
    if (expected) {
        CHECK(q.dim.has_value());
        if (!q.dim)
            return;
        CHECK(q.dim->to_string() == expected->to_string());
        CHECK(*q.dim == *expected);
    } else {
        CHECK(!q.dim.has_value());
    }
}

// The messages of notation_errors.hpp, as the engineer reads them.
const std::string close_paren = "expected ')' to close the parenthesis";
const std::string after_relation = "expected an expression after the '=' or comparison sign";
const std::string number_into_name =
    "a number runs straight into a name; write a product with '*', as in 2*g";
const std::string double_star = "'**' is not an operator here; write a power with '^', as in V^2";
const std::string bad_bracket = "expected a base dimension (M, L, T, \u0398, N, I, J) or ']'; "
                                "write a quotient with negative exponents, as in [L T^-1]";
const std::string open_description = "the description has no closing '\"'";
const std::string no_label = "expected a label name after '@', as in @darcy";
const std::string after_plus_minus = "expected a term after '+' or '-'";
const std::string after_times_divide = "expected a term after '*' or '/'";
const std::string no_relation = "expected an operator, '=' or a comparison (<, <=, >, >=) here";
const std::string no_spec = "expected a dimension such as [M L^-3], a unit such as kg/m^3, 1 "
                            "for a dimensionless symbol, or ? for one to infer";
const std::string no_exponent = "expected an exponent such as 2, -3 or (1/2)";
const std::string line_end = "expected an operator, a comparison or the end of the line here";

} // namespace

TEST_CASE("the grammar has no infinite loops or left recursion (PEGTL analyze)") {
    CHECK(tao::pegtl::analyze<plumb::notation::line>() == 0);
    CHECK(tao::pegtl::analyze<plumb::notation::query>() == 0);
}

TEST_CASE("the declarations NOTATION.md shows parse exactly as written") {
    parses("rho : [M L^-3]");
    parses("g : [L T^-2]");
    parses("Re : 1");
    parses("V, D : m/s");
    parses("mu : Pa*s");
    parses("k : W/(m*K)");
    parses("M : kN*m");
    parses("Q : m^3/s");
    parses("T_in : \u00B0C");
    parses("g_n : m/s^2 = 9.80665 \"standard gravity\"");
    parses("use \"path/to/dictionary.plumb\"");
}

TEST_CASE("the formulas NOTATION.md shows parse exactly as written") {
    parses("h_f = f*(L/D)*V^2/(2*g)");
    parses("@darcy h_f = f*(L/D)*V^2/(2*g)");
    parses("V <= V_max");
    parses("0 <= x <= L");
    parses("x - 0 = y");
    parses("v >= 0");
    parses("y = (1 + r)^n");
    parses("tau = mu * deriv(u, y)");
    parses("q = -k * deriv(T, x)");
    parses("W = integral(p, V, V_1, V_2)");
}

TEST_CASE("names: UTF-8 letters, subscripts and primes") {
    // NOTATION.md, "Names".
    parses("\u03C1, \u03BC, \u0394p, V_1, h_f, \u03C6', c' : [M]");
    parses("y = \u03C1 + \u03BC + \u0394p + V_1 + h_f + \u03C6' + c'");
    parses("T_inf : K");
    parses("\u00E9t\u00E9, \u00F1, \u03A9_2, \u00B5x : 1"); // Latin-1 letters, Greek, micro sign
    parses("a'' : m");                                      // more than one prime
    // The dotted rates of heat and mass transfer: ṁ (U+1E41, Latin Extended Additional) and
    // Q̇, written as Q and the combining dot above (U+0307), which may follow a first letter
    // but not start a name.
    parses("\u1E41, Q\u0307, \u1E8B_1 : [M T^-1]");
    parses("y = \u1E41 + Q\u0307 + \u1E8B_1");
    const auto mark_first = check("\u0307Q : K");
    INFO(listing(mark_first));
    CHECK(of_rule(mark_first, plumb::rules::syntax).size() == 1);
    // The infinity sign is not a letter, so "T_\u221E" is not a name.
    const auto all = check("T_\u221E : K");
    INFO(listing(all));
    CHECK(of_rule(all, plumb::rules::syntax).size() == 1);
    // '\u00D7' is the multiplication sign, not a letter: "a\u00D7b" is a product.
    parses("y = a\u00D7b");
}

TEST_CASE("comments, blank lines, tabs and continuation lines") {
    parses("# a comment line\n\n   \n# another\nx : m  # trailing comment\n");
    parses("x\t:\tm\ny =\tx\t# tabs are whitespace");
    parses("h_f = f*(L/D) * \\\n    V^2/(2*g)");
    // A comment after the backslash: the line still continues.
    parses("h_f = f*(L/D) * \\   # the friction factor\n    V^2/(2*g)  # and the velocity head");
    parses("V, \\\n  D : m/s");
    parses("x : m\r\ny = x\r\n");  // CRLF line ends
    parses("\xEF\xBB\xBFx : m\n"); // a byte-order mark at the start of the file
    // The continuation really joins the lines: the missing ')' is found on the second one.
    fails_with({"x = (a + \\\n    b\ny = 1", 2, 6, close_paren});
    // A '#' inside a description is text, not a comment, and does not hide the closing quote.
    parses("n : 1 \"item #4\"");
}

TEST_CASE("labels") {
    parses("@darcy h_f = f*(L/D)*V^2/(2*g)");
    parses("@eq-4.2 0 <= x <= L");
    parses("@a_1.b-c x = y");
}

TEST_CASE("relations, limits and chains") {
    parses("0 <= x <= L");
    parses("0 \u2264 x \u2264 L");
    parses("x \u2265 0");
    parses("a < b");
    parses("a > b");
    parses("a >= b");
    parses("a = b = c");
    parses("0 < x < L <= L_max");
}

TEST_CASE("numbers") {
    parses("y = 2 + 0.5 + 1.2e-3 + 6.02E23 + .5");
    parses("y = 1.2e-3*x");
    parses("n : 1 = -0.5");
}

TEST_CASE("powers: rational, decimal, negative and unary minus") {
    parses("V = R^(2/3)*S^0.54");
    parses("y = x^-2");
    parses("y = -x^2");
    parses("y = x^(-3/2) + x^( 1 / 2 )");
    parses("y = a^b^c");
    parses("y = x^+2");
}

TEST_CASE("every built-in function parses with its documented arguments") {
    // NOTATION.md, "Functions".
    const char* calls[] = {
        "sqrt(x)",        "cbrt(x)",         "abs(x)",
        "exp(x)",         "ln(x)",           "log10(x)",
        "log(x, b)",      "sin(x)",          "cos(x)",
        "tan(x)",         "asin(x)",         "acos(x)",
        "atan(x)",        "sinh(x)",         "cosh(x)",
        "tanh(x)",        "asinh(x)",        "acosh(x)",
        "atanh(x)",       "atan2(y, x)",     "min(a, b)",
        "min(a, b, c)",   "max(a, b, c, d)", "hypot(a, b)",
        "hypot(a, b, c)", "pow(x, p)",       "deriv(u, y)",
        "deriv(T, x, 2)", "integral(p, V)",  "integral(p, V, V_1, V_2)",
    };
    for (const char* call : calls) {
        const auto all = check(std::string("y = ") + call);
        INFO("call: ", call);
        INFO(listing(all));
        CHECK(of_rule(all, plumb::rules::syntax).empty());
        CHECK(of_rule(all, plumb::rules::unknown_function).empty());
        CHECK(of_rule(all, plumb::rules::wrong_arity).empty());
    }
    parses("y = sqrt (x)"); // a space before the parenthesis
    parses("y = max(a,\\\n        b)");
}

TEST_CASE("unit forms") {
    for (const char* unit :
         {"kg/m^3", "Pa*s",      "W/(m*K)",  "kN*m",     "m^3/s", "m^(1/2)", "\u00B0C",
          "1/s",    "Pa\u00B7s", "kg*m/s^2", "m^(-3/2)", "kPa",   "mm",      "\u00B5m",
          "um",     "MW",        "%",        "1",        "m ^ 2", "(m/s)^2"}) {
        const auto all = check(std::string("x : ") + unit);
        INFO("unit: ", unit);
        INFO(listing(all));
        CHECK(of_rule(all, plumb::rules::syntax).empty());
        CHECK(of_rule(all, plumb::rules::unknown_unit).empty());
    }
}

TEST_CASE("bracket forms") {
    for (const char* spec :
         {"[M^(1/2) L]", "[1]", "[-]", "[]", "[\u0398]", "[Th]", "[M*L]", "[M\u00B7L]", "[ M L ]",
          "[L^(-3/2)]", "[M L^-1 T^-2]", "[N I J]", "[L^2 T^-2 Th^-1]"}) {
        const auto all = check(std::string("x : ") + spec);
        INFO("spec: ", spec);
        INFO(listing(all));
        CHECK(of_rule(all, plumb::rules::syntax).empty());
    }
}

TEST_CASE("bracket and unit forms mean what NOTATION.md says") {
    // Each declaration's dimension, asked back through a query; expected exponents by hand.
    const temp_dir dir;
    const auto dim_of = [&](const std::string& declaration, const dimension& expected) {
        dimension_is("x", dir.write("d.plumb", declaration + "\n"), expected);
    };
    dim_of("x : [M^(1/2) L]",
           dimension::from_exponents({rational(1, 2), rational(1), 0, 0, 0, 0, 0}));
    dim_of("x : [M*L]", typed(1, 1, 0));
    dim_of("x : [M\u00B7L]", typed(1, 1, 0));
    dim_of("x : [M L^-3]", typed(1, -3, 0));
    dim_of("x : [L^(-3/2)]", dimension::from_exponents({0, rational(-3, 2), 0, 0, 0, 0, 0}));
    dim_of("x : [1]", dimension{});
    dim_of("x : [-]", dimension{});
    dim_of("x : []", dimension{});
    dim_of("x : 1", dimension{});
    dim_of("x : [\u0398]", typed(0, 0, 0, 1));
    dim_of("x : [Th]", typed(0, 0, 0, 1));
    dim_of("x : \u00B0C", typed(0, 0, 0, 1));
    dim_of("x : 1/s", typed(0, 0, -1));
    dim_of("x : kg/m^3", typed(1, -3, 0));
    dim_of("x : Pa*s", typed(1, -1, -1));
    dim_of("x : W/(m*K)", typed(1, 1, -3, -1));
    dim_of("x : kN*m", typed(1, 2, -2));
    dim_of("x : m^3/s", typed(0, 3, -1));
    dim_of("x : m^(1/2)", dimension::from_exponents({0, rational(1, 2), 0, 0, 0, 0, 0}));
    dim_of("x : m/s^2 = 9.80665 \"standard gravity\"", typed(0, 1, -2));
}

TEST_CASE("operators bind as NOTATION.md says") {
    const temp_dir dir;
    const auto file = dir.write("d.plumb", "x, y : m\n");
    // '^' is right-associative: x^2^3 is x^(2^3) = x^8, where (x^2)^3 would be x^6.
    dimension_is("x^2^3", file, typed(0, 8, 0));
    dimension_is("(x^2)^3", file, typed(0, 6, 0));
    // '^' binds tighter than '/': x^-1/2 is (x^-1)/2, not x^(-1/2).
    dimension_is("x^-1/2", file, typed(0, -1, 0));
    dimension_is("x^(-1/2)", file, dimension::from_exponents({0, rational(-1, 2), 0, 0, 0, 0, 0}));
    // 0.54 = 54/100 = 27/50 exactly.
    dimension_is("x^0.54", file, dimension::from_exponents({0, rational(27, 50), 0, 0, 0, 0, 0}));
    dimension_is("x^(2/3)", file, dimension::from_exponents({0, rational(2, 3), 0, 0, 0, 0, 0}));
    // '*' and '/' are left-associative: x/y*x is (x/y)*x = L, where x/(y*x) would be L^-1.
    dimension_is("x/y*x", file, typed(0, 1, 0));
    dimension_is("x*y", file, typed(0, 2, 0));
    dimension_is("x\u00B7y", file, typed(0, 2, 0));
    dimension_is("x\u00D7y", file, typed(0, 2, 0));
    dimension_is("x\u22C5y", file, typed(0, 2, 0));
    // '+' and '-' are loosest: x + y*x/y is a sum of two lengths.
    dimension_is("x + y*x/y", file, typed(0, 1, 0));
    dimension_is("-x^2", file, typed(0, 2, 0));
}

constexpr const char* side_by_side =
    "two terms stand side by side; a product needs '*' between its factors, as in a*b";

TEST_CASE("typical mistakes: exact line, column and message") {
    const std::vector<expected_error> cases = {
        // Unbalanced '(': the ')' is missing at the end of the line.
        {"x = (a + b", 1, 11, close_paren},
        // Nothing after '=': the grammar stops after the space.
        {"a = ", 1, 5, after_relation},
        {"a =", 1, 4, after_relation},
        // "2g": the number runs into the name at 'g'.
        {"x = 2g", 1, 6, number_into_name},
        // "x**2": the second '*' is where a term was expected.
        {"y = x**2", 1, 7, double_star},
        // A quotient inside brackets: the '/' stops the bracket.
        {"z : [M L/T]", 1, 9, bad_bracket},
        // A description without its closing quote: reported at the end of the line.
        {"p : m \"no close", 1, 16, open_description},
        // '@' followed by a space.
        {"@ x = y", 1, 2, no_label},
        // Trailing operators.
        {"x = a +", 1, 8, after_plus_minus},
        {"x = a -", 1, 8, after_plus_minus},
        {"x = a *", 1, 8, after_times_divide},
        {"x = a / ", 1, 9, after_times_divide},
        {"x = a ^", 1, 8, "expected an exponent after '^'"},
        {"x = -", 1, 6, "expected a term after '-'"},
        // Two names side by side before the relation, and after it: a product without '*'.
        {"a b = c", 1, 3, side_by_side},
        {"x = a b", 1, 7, side_by_side},
        // An operator missing elsewhere keeps the grammar's own words.
        {"x = a 2", 1, 7, line_end},
        // A declaration without its dimension or unit.
        {"V : ", 1, 5, no_spec},
        // A unit exponent that is missing, in a unit and in brackets.
        {"w : m^", 1, 7, no_exponent},
        {"x : [L^]", 1, 8, no_exponent},
        {"x : m^(1/", 1, 10, "expected a whole number here"},
        {"x : m^(1/2", 1, 11, "expected ')' after the exponent"},
        // Function calls.
        {"x = sqrt(a", 1, 11, "expected ',' or ')' in the function's argument list"},
        {"x = max(a,)", 1, 11, "expected an argument after ','"},
        // Units.
        {"x : kg/", 1, 8, "expected a unit after '*' or '/'"},
        {"x : (m", 1, 7, "expected ')' to close the unit's parenthesis"},
        // A named constant without its value.
        {"x : m =", 1, 8, "expected a number after '=' (the constant's value in the stated unit)"},
        {"use \"foo", 1, 9, "the path has no closing '\"'"},
        {"@lab", 1, 5, "expected a space after the label"},
        // A name list that ends in a comma: notation_errors.hpp has a message for exactly this
        // (declared_name), and the place is where the missing name should be.
        {"a, b, : m", 1, 7, "expected a name after ','"},
        // The error is found on the right physical line of a file.
        {"x : m\ny : m\n\nz = x +", 4, 8, after_plus_minus},
        // Columns count characters, not bytes: each Greek letter is one column.
        {"\u03C1\u03C1 = \u03BC +", 1, 9, after_plus_minus},
    };
    for (const auto& e : cases)
        fails_with(e);
}

TEST_CASE("syntax messages name no C++ rule or type") {
    const char* broken[] = {
        "x = (a + b",  "a = ",      "x = 2g",    "y = x**2",  "z : [M L/T]",  "p : m \"x",
        "@ x = y",     "x = a +",   "a b = c",   "V : ",      "w : m^",       "x = sqrt(a",
        "x = a)",      "x = ,",     "= x",       "x = 1.2.3", "x = 1e",       "x = [a]",
        "x : [M^(1/]", "x = \"a\"", "x = a $ b", "x : m m +", "x : m = y",    "@",
        "x",           "use x",     "x : ((((m", "\x01\x02",  "x = a\u00F7b", "x <",
        "x = a,b",     "x : [Q]",   "x : m^x",   "x = max(",  "\xFF\xFE = 1", ":",
    };
    for (const char* text : broken) {
        const auto all = check(text);
        INFO("text: ", text);
        INFO(listing(all));
        const auto syntax = of_rule(all, plumb::rules::syntax);
        CHECK(!syntax.empty());
        for (const auto& f : syntax) {
            CHECK(!f.message.empty());
            CHECK(f.message.find("plumb::") == std::string::npos);
            CHECK(f.message.find("notation") == std::string::npos);
            CHECK(f.message.find("tao::") == std::string::npos);
            CHECK(f.message.find("pegtl") == std::string::npos);
            CHECK(f.message.find("::") == std::string::npos);
            CHECK(f.message.back() != '.'); // diagnostic.hpp: no trailing period
        }
    }
}

TEST_CASE("one bad line does not hide the findings after it") {
    const auto all = check("x : m\n"
                           "t : s\n"
                           "y = = x\n"          // line 3: syntax
                           "x = t\n"            // line 4: side-mismatch
                           "q : [M L/T]\n"      // line 5: syntax
                           "x = undeclared\n"); // line 6: undeclared
    INFO(listing(all));
    const auto syntax = of_rule(all, plumb::rules::syntax);
    REQUIRE(syntax.size() == 2);
    CHECK(syntax[0].line == 3);
    CHECK(syntax[1].line == 5);
    const auto sides = of_rule(all, plumb::rules::side_mismatch);
    REQUIRE(sides.size() == 1);
    CHECK(sides.front().line == 4);
    const auto undeclared = of_rule(all, plumb::rules::undeclared);
    REQUIRE(undeclared.size() == 1);
    CHECK(undeclared.front().line == 6);
    CHECK(all.size() == 4);
}

TEST_CASE("a file of garbage is cut short instead of reporting every line") {
    std::string text;
    for (int i = 0; i < 200; ++i)
        text += "this is not a calc file, line " + std::to_string(i) + "\n";
    const auto all = check(text);
    const auto syntax = of_rule(all, plumb::rules::syntax);
    CHECK(!syntax.empty());
    CHECK(syntax.size() < 200);
    bool gave_up = false;
    for (const auto& f : syntax)
        gave_up = gave_up || f.message.find("too many syntax errors") != std::string::npos;
    CHECK(gave_up);
}

TEST_CASE("deeply nested and very long input is handled without crashing") {
    SUBCASE("100000 opening parentheses") {
        const auto all = check("x : m\ny = " + std::string(100000, '('));
        INFO(listing(all).substr(0, 2000));
        CHECK(!of_rule(all, plumb::rules::syntax).empty());
    }
    SUBCASE("100000 unary minus signs") {
        const auto all = check("x : m\nx = " + std::string(100000, '-') + "x");
        CHECK(!all.empty());
    }
    SUBCASE("100000 nested unit parentheses") {
        const auto all = check("x : " + std::string(100000, '(') + "m" + std::string(100000, ')'));
        CHECK(!of_rule(all, plumb::rules::syntax).empty());
    }
    SUBCASE("a 200000-term sum of one dimension passes") {
        std::string text = "a : m\na = a";
        for (int i = 1; i < 200000; ++i)
            text += " + a";
        const auto all = check(text);
        INFO(listing(all).substr(0, 2000));
        CHECK(all.empty());
    }
    SUBCASE("a 200000-term sum with one odd term is reported") {
        std::string text = "a : m\nt : s\na = a";
        for (int i = 1; i < 199999; ++i)
            text += " + a";
        text += " + t";
        const auto all = check(text);
        const auto sums = of_rule(all, plumb::rules::sum_mismatch);
        REQUIRE(sums.size() == 1);
        CHECK(sums.front().line == 3);
        // "a = a" is 5 characters, then 199998 times " + a" (4 each), then " + " before t.
        CHECK(sums.front().column == 5 + 199998 * 4 + 3 + 1);
    }
    SUBCASE("a 200000-factor product") {
        std::string text = "n : 1\nn = n";
        for (int i = 1; i < 200000; ++i)
            text += "*n";
        CHECK(check(text).empty());
    }
}

TEST_CASE("a query is a bare expression") {
    const auto q = plumb::query_dimension("2*pi", {});
    CHECK(q.dim == dimension{});
    const auto bad = plumb::query_dimension("1 = 1", {});
    CHECK(!bad.dim);
    const auto all = findings(bad.report);
    INFO(listing(all));
    REQUIRE(all.size() == 1);
    CHECK(all.front().rule == plumb::rules::syntax);
    CHECK(all.front().column == 3);
    CHECK(all.front().message == "expected an operator or the end of the expression here");
    const auto open = plumb::query_dimension("(1 + 2", {});
    const auto open_findings = findings(open.report);
    REQUIRE(open_findings.size() == 1);
    CHECK(open_findings.front().column == 7);
    CHECK(open_findings.front().message == close_paren);
}

TEST_CASE("model lines: the match clause and its tolerance") {
    parses("model hull: scale = 1:30, match Froude");
    parses("model hull: scale = 1:30, ρ = 998 kg/m^3, match Froude number");
    parses("model pipe: match Reynolds and Froude within 0.5 %");
    parses("model pipe: match Re and π2 within 1%, μ = 1e-3 Pa*s");
    // "match" stays usable as a variable on a value line.
    parses("model pipe: match = 3 m");
    fails_with({"model pipe: match Re and ", 1, 26,
                "expected a group after 'and', such as Froude, Re or π2"});
    fails_with({"model pipe: match Re within x", 1, 29,
                "expected the tolerance as a percentage after 'within', as in: within 0.5 %"});
    fails_with({"model pipe: match Re within 2", 1, 30,
                "expected '%' after the tolerance, as in: within 0.5 %"});
}

TEST_CASE("a coefficient's statement: the forms NOTATION.md shows") {
    parses("V : ft/s\nR : ft\nn, S : 1\nV = 1.486?[L^(1/3) T^-1] / n * R^(2/3) * S^(1/2)");
    parses("Q : ft^3/s\nb, H : ft\nQ = 3.33?[L^(1/2) T^-1, SI 1.84] * b * H^(3/2)");
    parses("q, k : 1\nq = 0.5?[SI 2π ± 0.1%] * k");
    parses("q, k : 1\nq = 0.5?[SI 2 pi +- 0.001] * k");
    parses("q, k : 1\nq = 0.5?[SI 2*pi] * k");
    parses("q, k : 1\nq = 0.5?[1, SI 0.5] * k");
    parses("q, k : 1\nq = 0.5?[-] * k");
    parses("q, k : 1\nq = 0.5?[ SI 1.2e-3 ± 1e-5 ] * k");
}

TEST_CASE("a coefficient's statement: mistakes get a plain message at the right place") {
    const std::vector<expected_error> cases = {
        // A unit where a dimension or 'SI' belongs: the statement's body starts at 'k'.
        {"q = 0.5?[kg] * k", 1, 10,
         "expected what the coefficient must be: a dimension such as [L^(1/3) T^-1], its value "
         "in coherent SI units such as [SI 1 \u00B1 0.1%], or both, as in [L^(1/3) T^-1, SI 1]"},
        // 'SI' without its value.
        {"q = 0.5?[SI] * k", 1, 12,
         "expected the coefficient's value in coherent SI units after 'SI', such as 1.84 or "
         "2\u03C0"},
        // A tolerance sign without a tolerance.
        {"q = 0.5?[SI 1 ±] * k", 1, 16,
         "expected a tolerance after '\u00B1', such as 0.005 or 0.1%"},
        // After the comma only the value may follow.
        {"q = 0.5?[L, M] * k", 1, 13,
         "expected 'SI' and the coefficient's value in coherent SI units after ',', as in "
         "[L^(1/3) T^-1, SI 1]"},
        // The bracket left open.
        {"q = 0.5?[L T^-1 * k", 1, 17,
         "expected ']' to close what the coefficient must be; write the dimension first, then "
         "', SI' and the value, as in [L^(1/3) T^-1, SI 1 \u00B1 0.1%]"},
    };
    for (const auto& e : cases)
        fails_with(e);
}

TEST_CASE("a coefficient's statement is checked through the library's front door") {
    // Manning (Chow, Open-Channel Hydraulics, 1959, from memory), reviewed, then R^(2/3) edited.
    const auto good = check("V : ft/s\nR : ft\nn, S : 1\n"
                            "V = 1.486?[L^(1/3) T^-1, SI 1 ± 0.1%] / n * R^(2/3) * S^(1/2)\n");
    INFO(listing(good));
    CHECK(of_rule(good, plumb::rules::coefficient_mismatch).empty());
    const auto edited = check("V : ft/s\nR : ft\nn, S : 1\n"
                              "V = 1.486?[L^(1/3) T^-1, SI 1 ± 0.1%] / n * R^(3/2) * S^(1/2)\n");
    INFO(listing(edited));
    const auto found = of_rule(edited, plumb::rules::coefficient_mismatch);
    REQUIRE(found.size() == 1);
    CHECK(found[0].line == 4);
    CHECK(found[0].column == 5);
}

TEST_CASE("cells lines: the forms NOTATION.md shows parse, and belong in a sidecar") {
    parses("cells Duty!C4 : kPa \"suction gauge\"");
    parses("cells Duty!C4:C9 : mm");
    parses("cells 'Pump data'!D : m^3/s");
    parses("cells 'It''s'!$B$3 : [L]");
    // A symbol named "cells" is still an ordinary name: no '!' follows it.
    parses("cells : 1\nn : 1\nn = cells");
    // In a file that is not a workbook's sidecar, the line gives no cell a unit: say where it
    // belongs, once, and nothing else.
    const auto all = check("cells Duty!C4 : kPa");
    INFO(listing(all));
    const auto misplaced = of_rule(all, plumb::rules::sidecar_problem);
    REQUIRE(misplaced.size() == 1);
    CHECK(misplaced.front().line == 1);
    CHECK(misplaced.front().column == 1);
    CHECK(misplaced.front().message.find("sidecar") != std::string::npos);
    CHECK(all.size() == 1);
    // A sidecar named on the command line holds its cells lines where they belong.
    const auto sidecar = findings(plumb::check_text("book.cells.plumb", "cells Duty!C4 : kPa"));
    INFO(listing(sidecar));
    CHECK(of_rule(sidecar, plumb::rules::sidecar_problem).empty());
}

TEST_CASE("cells lines: mistakes get a plain message at the right place") {
    const std::string no_area = "expected a cell, a range or a column after the sheet's '!', as "
                                "in Duty!C4, Duty!C4:C9 or Duty!D (columns in capitals)";
    const std::string no_colon = "expected ':' and the cells' unit, as in: cells Duty!C4 : kPa";
    const std::string no_spec =
        "expected the cells' unit, such as kPa or m^3/s, or a dimension such as [L]";
    const std::vector<expected_error> cases = {
        // Lower-case column letters: the area starts right after '!'.
        {"cells Duty!c4 : kPa", 1, 12, no_area},
        // A row number glued to a name: "C4x" is no cell.
        {"cells Duty!C4x : kPa", 1, 12, no_area},
        // The unit without its ':'; the grammar stops after the space.
        {"cells Duty!C4 kPa", 1, 15, no_colon},
        // ':' with nothing after it.
        {"cells Duty!C4 :", 1, 16, no_spec},
        // A '?' infers a symbol's dimension; a cell's unit must be given.
        {"cells Duty!C4 : ?", 1, 17, no_spec},
    };
    for (const auto& e : cases)
        fails_with(e);
}
