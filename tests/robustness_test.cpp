// Robustness: thousands of malformed, truncated, mutated and deeply nested inputs go through
// plumb::check_text. Whatever the input, the checker must return normally, and every place a
// diagnostic points to (its range, its terms' and its notes' ranges) must lie inside a file of
// the report. The renderers run on every report too, so a bad range cannot hide there either.
#include "plumb/check.hpp"
#include "plumb/render.hpp"

#include <doctest/doctest.h>
#include <fmt/format.h>

#include <algorithm>
#include <array>
#include <cstdint>
#include <exception>
#include <filesystem>
#include <fstream>
#include <iterator>
#include <random>
#include <string>
#include <string_view>
#include <vector>

namespace fs = std::filesystem;

namespace {

// Fixed, so that a failure reproduces; change it to explore other inputs.
constexpr std::uint64_t rng_start = 0x706c756d62ULL;

// std::mt19937_64's output is fully specified by the standard, unlike the distributions, so
// draws are made from it directly and the inputs are the same with every standard library.
class generator {
  public:
    explicit generator(std::uint64_t start) : engine_(start) {}
    std::size_t below(std::size_t n) {
        return n == 0 ? 0 : static_cast<std::size_t>(engine_() % n);
    }
    bool chance(unsigned percent) { return below(100) < percent; }
    template <typename Container> const auto& pick(const Container& c) {
        return c[below(std::size(c))];
    }

  private:
    std::mt19937_64 engine_;
};

constexpr std::string_view tokens[] = {
    // names, including Greek, primes, subscripts and the reserved pi
    "a", "b", "x", "V", "D", "L", "g", "h_f", "V_1", "ρ", "μ", "Δp", "φ'", "c''", "T_in", "µm",
    "pi", "π", "Re", "use", "T_∞", "É", "×", "÷",
    // numbers
    "0", "1", "2", "0.5", "1.2e-3", "6.02E23", "1e308", "1e999", "9223372036854775807",
    "99999999999999999999", ".5", "1.", "-0",
    // operators and relations
    "+", "-", "*", "/", "·", "×", "^", "^-", "^(", "=", "<", "<=", ">", ">=", "≤", "≥", "==",
    // brackets, separators and notation punctuation
    "(", ")", "(", ")", "[", "]", ",", ":", "@", "@eq-4.2", "#", "# expect: sum-mismatch", "\"",
    "\"description\"", "\\", "\\\n", "'", " ", " ", " ", "\t", "\n", "\n", "\r\n", "\r",
    // dimensions and units
    "[M L^-3]", "[L T^-2]", "[1]", "[-]", "[]", "[M^(1/2)]", "[L^(-3/2)]", "[Θ]", "[Th N I J]",
    "kg/m^3", "m/s", "Pa*s", "W/(m*K)", "kN*m", "°C", "kPa", "m^(1/2)", "m^3/s", "cP",
    // functions
    "sqrt(", "cbrt(", "abs(", "exp(", "ln(", "log10(", "log(", "sin(", "atan2(", "min(", "max(",
    "hypot(", "pow(", "deriv(", "integral(", "nosuch(",
    // exponents that stress the exact arithmetic
    "^(1/3)", "^(2/3)", "^9223372036854775807", "^(1/9223372036854775807)", "^-1/2", "^0.54",
    // awkward bytes
    std::string_view("\0", 1), "\xff", "\xc3", "\xe2\x82", "\xef\xbb\xbf",
    // statement heads
    "use \"no-such-dictionary.plumb\""};

// Small statement templates: valid lines that mutations and truncation then break.
constexpr std::string_view statements[] = {"rho : kg/m^3 \"density\"\n",
                                           "V, D : m/s\n",
                                           "g_n : m/s^2 = 9.80665 \"standard gravity\"\n",
                                           "k : W/(m*K)\n",
                                           "x : [M L^-1 T^-2]\n",
                                           "Re : 1\n",
                                           "@darcy h_f = f*(L/D)*V^2/(2*g)\n",
                                           "0 <= x <= L\n",
                                           "y = deriv(u, x, 2) + integral(p, V, V_1, V_2)\n",
                                           "q = -k * deriv(T, x)\n",
                                           "z = (1 + r)^n - a^b^c\n",
                                           "w = min(a, b, c) + hypot(a, b) * atan2(y, x)\n",
                                           "h = a + \\\n    b\n",
                                           "T = T_1*(p_2/p_1)^((g-1)/g)\n"};

std::vector<std::string> corpus_texts() {
    std::vector<std::string> texts;
    const fs::path root = fs::path(PLUMB_SOURCE_DIR) / "corpus";
    std::error_code ec;
    std::vector<fs::path> files;
    for (fs::recursive_directory_iterator it(root, ec), end; !ec && it != end; it.increment(ec))
        if (it->is_regular_file() && it->path().extension() == ".plumb")
            files.push_back(it->path());
    std::sort(files.begin(), files.end()); // directory order varies; the inputs must not
    for (const auto& f : files) {
        std::ifstream in(f, std::ios::binary);
        texts.emplace_back(std::istreambuf_iterator<char>(in), std::istreambuf_iterator<char>());
    }
    return texts;
}

std::string random_bytes(generator& g) {
    std::string s(g.below(160), '\0');
    for (char& c : s) {
        // Mostly printable ASCII, so that some inputs get past the first token.
        c = g.chance(70) ? static_cast<char>(0x20 + g.below(95)) : static_cast<char>(g.below(256));
    }
    return s;
}

std::string token_soup(generator& g) {
    std::string s;
    const std::size_t n = 1 + g.below(60);
    for (std::size_t i = 0; i < n; ++i) {
        s += g.pick(tokens);
        if (g.chance(40))
            s += ' ';
    }
    return s;
}

// A well-formed file of a few statements with one formula made from random tokens.
std::string statements_and_soup(generator& g) {
    std::string s;
    for (std::size_t i = 0, n = 1 + g.below(6); i < n; ++i)
        s += g.pick(statements);
    s += "a = " + token_soup(g) + "\n";
    for (std::size_t i = 0, n = g.below(3); i < n; ++i)
        s += g.pick(statements);
    return s;
}

std::string mutate(generator& g, std::string s) {
    for (std::size_t i = 0, n = 1 + g.below(8); i < n; ++i) {
        const std::size_t at = g.below(s.size() + 1);
        switch (g.below(4)) {
        case 0: // delete a few bytes (possibly cutting a UTF-8 sequence)
            s.erase(std::min(at, s.size()), 1 + g.below(4));
            break;
        case 1: // insert a token
            s.insert(at, g.pick(tokens));
            break;
        case 2: // overwrite a byte
            if (at < s.size())
                s[at] = static_cast<char>(g.below(256));
            break;
        default: // duplicate a slice
            if (at < s.size())
                s.insert(at, s.substr(at, 1 + g.below(20)));
            break;
        }
    }
    return s;
}

std::string truncated(generator& g, const std::string& text) {
    return text.substr(0, g.below(text.size() + 1));
}

// Nesting of every recursive construct, from shallow to far past any sensible formula.
std::string deep(generator& g) {
    static constexpr std::array<std::size_t, 7> depths = {1, 8, 64, 255, 256, 257, 3000};
    const std::size_t depth = g.pick(depths);
    std::string open;
    std::string close;
    switch (g.below(7)) {
    case 0:
        open = "(", close = ")";
        break;
    case 1:
        open = "sqrt(", close = ")";
        break;
    case 2:
        open = "-", close = "";
        break;
    case 3:
        open = "a^", close = "";
        break;
    case 4:
        open = "min(a, ", close = ")";
        break;
    case 5:
        open = "(-(", close = "))";
        break;
    default:
        open = "2^(", close = ")";
        break;
    }
    std::string inner;
    inner.reserve(depth * (open.size() + close.size()) + 1);
    for (std::size_t i = 0; i < depth; ++i)
        inner += open;
    inner += "a";
    const bool balanced = g.chance(80);
    for (std::size_t i = 0; i < (balanced ? depth : depth / 2); ++i)
        inner += close;
    std::string head = "a : m\n";
    if (g.chance(30)) // nested dimension brackets and units as well
        head += "b : " + std::string(std::min<std::size_t>(depth, 300), '(') + "m" +
                std::string(std::min<std::size_t>(depth, 300), ')') + "\n";
    return head + "@deep a = " + inner + "\n";
}

// Empty when every place in the report lies inside its file; otherwise what is wrong.
std::string check_places(const plumb::check_report& report) {
    const auto inside = [&](const plumb::location& where, std::string_view what) -> std::string {
        if (where.file == nullptr)
            return {};
        const bool known =
            std::any_of(report.sources.begin(), report.sources.end(),
                        [&](const auto& source) { return source.get() == where.file; });
        if (!known)
            return fmt::format("{} points into a file the report does not hold", what);
        const std::size_t size = where.file->text().size();
        if (where.range.begin > where.range.end || where.range.end > size)
            return fmt::format("{} range [{}, {}) is outside the text of {} bytes", what,
                               where.range.begin, where.range.end, size);
        return {};
    };
    for (const auto& d : report.diagnostics) {
        if (auto problem = inside(d.where, "diagnostic '" + d.rule + "'"); !problem.empty())
            return problem;
        for (const auto& t : d.terms)
            if (auto problem = inside(t.where, "a term of '" + d.rule + "'"); !problem.empty())
                return problem;
        for (const auto& n : d.notes)
            if (auto problem = inside(n.where, "a note of '" + d.rule + "'"); !problem.empty())
                return problem;
        if (d.rule.empty())
            return "a diagnostic without a rule id";
    }
    return {};
}

// The input as a C string literal, so a failure can be pasted into a test.
std::string escaped(std::string_view s) {
    std::string out = "\"";
    for (const char c : s.substr(0, 2000)) {
        const auto u = static_cast<unsigned char>(c);
        if (c == '"' || c == '\\')
            out += fmt::format("\\{}", c);
        else if (c == '\n')
            out += "\\n";
        else if (u < 0x20 || u >= 0x7f)
            out += fmt::format("\\x{:02x}\"\"", u);
        else
            out += c;
    }
    return out + (s.size() > 2000 ? "\"..." : "\"");
}

} // namespace

TEST_CASE("check_text survives arbitrary input and keeps every range inside the text") {
    generator g(rng_start);
    const std::vector<std::string> corpus = corpus_texts();
    REQUIRE_FALSE(corpus.empty());

    constexpr int inputs = 2000;
    int failures = 0;
    std::size_t diagnostics_seen = 0;
    for (int i = 0; i < inputs && failures < 5; ++i) {
        std::string text;
        switch (i % 7) {
        case 0:
            text = random_bytes(g);
            break;
        case 1:
            text = token_soup(g);
            break;
        case 2:
            text = statements_and_soup(g);
            break;
        case 3:
            text = truncated(g, g.pick(corpus));
            break;
        case 4:
            text = mutate(g, g.pick(corpus));
            break;
        case 5:
            text = deep(g);
            break;
        default:
            text = mutate(g, statements_and_soup(g));
            break;
        }
        std::string problem;
        try {
            const plumb::check_report report = plumb::check_text("fuzz.plumb", text);
            problem = check_places(report);
            diagnostics_seen += report.diagnostics.size();
            if (problem.empty()) {
                (void)plumb::render_text(report, {true});
                (void)plumb::render_json(report);
            }
        } catch (const std::exception& e) {
            problem = fmt::format("threw: {}", e.what());
        } catch (...) {
            problem = "threw something that is not a std::exception";
        }
        if (!problem.empty()) {
            ++failures;
            FAIL_CHECK(fmt::format("input #{} (generator start {:#x}): {}\n  input: {}", i,
                                   rng_start, problem, escaped(text)));
        }
    }
    CHECK(failures == 0);
    // The generators must reach the checks, not only the parser's first error.
    CHECK(diagnostics_seen > inputs);
}

TEST_CASE("the nesting limit is reported as a finding, not a crash") {
    for (const std::size_t depth : {300U, 10000U}) {
        CAPTURE(depth);
        const std::string text =
            "a : m\n@deep a = " + std::string(depth, '(') + "a" + std::string(depth, ')') + "\n";
        const plumb::check_report report = plumb::check_text("deep.plumb", text);
        CHECK(check_places(report).empty());
        REQUIRE(report.diagnostics.size() == 1);
        CHECK(report.diagnostics[0].rule == "syntax");
        CHECK(report.input_failed);
    }
    // Just inside the limit, the formula is checked as usual.
    const std::string text =
        "a : m\n@shallow a = " + std::string(100, '(') + "a" + std::string(100, ')') + "\n";
    const plumb::check_report report = plumb::check_text("shallow.plumb", text);
    CHECK(report.diagnostics.empty());
    CHECK(report.formulas_checked == 1);
}
