// End-to-end tests of the command line: each test runs the real plumb binary on files written
// into a fresh temporary folder and checks its exit status, stdout and stderr.
#include "process_support.hpp"

#include "plumb/render.hpp"
#include "plumb/rules.hpp"
#include "plumb/version.hpp"

#include <doctest/doctest.h>
#include <fmt/format.h>

#include <algorithm>
#include <atomic>
#include <cerrno>
#include <cstring>
#include <filesystem>
#include <fstream>
#include <map>
#include <memory>
#include <optional>
#include <sstream>
#include <stdexcept>
#include <string>
#include <string_view>
#include <utility>
#include <variant>
#include <vector>

#include <fcntl.h>
#include <poll.h>
#include <spawn.h>
#include <sys/wait.h>
#include <unistd.h>

extern char** environ; // NOLINT: POSIX declares it nowhere else

namespace fs = std::filesystem;

namespace {

// ---------------------------------------------------------------------------------------------
// Running the binary

using run_result = plumb_test::process_result;

// Environment overrides: a value sets the variable, std::nullopt removes it.
using env_changes = std::map<std::string, std::optional<std::string>>;

// Runs plumb with `args`, stdout and stderr on pipes. NO_COLOR is removed from the child's
// environment unless `env` says otherwise, so the host's settings cannot change the results.
run_result run_plumb(const std::vector<std::string>& args, env_changes env = {}) {
    env.try_emplace("NO_COLOR", std::nullopt);
    std::vector<std::string> env_strings;
    for (char** e = environ; *e != nullptr; ++e) {
        const std::string_view entry(*e);
        const std::string name(entry.substr(0, entry.find('=')));
        if (env.find(name) == env.end())
            env_strings.emplace_back(entry);
    }
    for (const auto& [name, value] : env)
        if (value)
            env_strings.push_back(name + "=" + *value);
    std::vector<std::string> argv{PLUMB_CLI_PATH};
    argv.insert(argv.end(), args.begin(), args.end());
    run_result result = plumb_test::run_process(argv, {}, &env_strings);
    if (result.status == -1 && result.err.rfind("cannot run ", 0) == 0)
        throw std::runtime_error(result.err);
    return result;
}

// ---------------------------------------------------------------------------------------------
// A fresh temporary folder per test, removed afterwards

class temp_folder {
  public:
    temp_folder() {
        static std::atomic<unsigned> counter{0};
        path_ = fs::temp_directory_path() /
                fmt::format("plumb-cli-test-{}-{}", static_cast<long>(getpid()), counter++);
        fs::remove_all(path_);
        fs::create_directories(path_);
    }
    temp_folder(const temp_folder&) = delete;
    temp_folder& operator=(const temp_folder&) = delete;
    ~temp_folder() {
        std::error_code ignored;
        fs::remove_all(path_, ignored);
    }

    // Writes `content` byte for byte to `name` (which may contain folders); returns its path.
    [[nodiscard]] std::string write(const std::string& name, std::string_view content) const {
        const fs::path p = path_ / name;
        fs::create_directories(p.parent_path());
        std::ofstream out(p, std::ios::binary);
        out.write(content.data(), static_cast<std::streamsize>(content.size()));
        return p.string();
    }
    [[nodiscard]] std::string path(const std::string& name = "") const {
        return name.empty() ? path_.string() : (path_ / name).string();
    }

  private:
    fs::path path_;
};

bool contains(std::string_view haystack, std::string_view needle) {
    return haystack.find(needle) != std::string_view::npos;
}

std::vector<std::string> lines_of(std::string_view text) {
    std::vector<std::string> lines;
    std::istringstream in{std::string(text)};
    for (std::string line; std::getline(in, line);)
        lines.push_back(line);
    return lines;
}

std::size_t count_of(std::string_view haystack, std::string_view needle) {
    std::size_t n = 0;
    for (auto at = haystack.find(needle); at != std::string_view::npos;
         at = haystack.find(needle, at + needle.size()))
        ++n;
    return n;
}

// Number of UTF-8 code points in `s` (each is one display cell in plumb's output).
std::size_t code_points(std::string_view s) {
    return static_cast<std::size_t>(std::count_if(
        s.begin(), s.end(), [](char c) { return (static_cast<unsigned char>(c) & 0xC0) != 0x80; }));
}

// `s` cut into its UTF-8 code points, one string each.
std::vector<std::string> split_code_points(std::string_view s) {
    std::vector<std::string> out;
    for (const char c : s) {
        if ((static_cast<unsigned char>(c) & 0xC0) == 0x80 && !out.empty())
            out.back() += c;
        else
            out.emplace_back(1, c);
    }
    return out;
}

// The summary and caution lines that end every text report.
std::string tail(std::string_view summary) {
    return fmt::format("plumb: {}\ncaution: {}\n", summary, plumb::caution_text());
}

// ---------------------------------------------------------------------------------------------
// A small JSON reader, strict per RFC 8259 (including UTF-8 validity of strings), so the test
// needs nothing beyond the standard library.

struct json;
using json_object = std::map<std::string, json>;
using json_array = std::vector<json>;

struct json {
    std::variant<std::nullptr_t, bool, double, std::string, json_array, json_object> value;

    [[nodiscard]] bool is_object() const { return std::holds_alternative<json_object>(value); }
    [[nodiscard]] bool is_array() const { return std::holds_alternative<json_array>(value); }
    [[nodiscard]] bool is_string() const { return std::holds_alternative<std::string>(value); }
    [[nodiscard]] bool is_number() const { return std::holds_alternative<double>(value); }
    [[nodiscard]] bool is_bool() const { return std::holds_alternative<bool>(value); }
    [[nodiscard]] const json_object& object() const { return std::get<json_object>(value); }
    [[nodiscard]] const json_array& array() const { return std::get<json_array>(value); }
    [[nodiscard]] const std::string& string() const { return std::get<std::string>(value); }
    [[nodiscard]] double number() const { return std::get<double>(value); }
    [[nodiscard]] bool boolean() const { return std::get<bool>(value); }
    [[nodiscard]] bool has(const std::string& key) const {
        return is_object() && object().count(key) == 1;
    }
    [[nodiscard]] const json& operator[](const std::string& key) const { return object().at(key); }
};

class json_reader {
  public:
    explicit json_reader(std::string_view text) : text_(text) {}

    // The document, or std::nullopt with error() saying where it went wrong.
    std::optional<json> document() {
        try {
            json v = value(0);
            skip_space();
            if (pos_ != text_.size())
                fail("text after the document");
            return v;
        } catch (const std::runtime_error& e) {
            error_ = e.what();
            return std::nullopt;
        }
    }
    [[nodiscard]] const std::string& error() const { return error_; }

  private:
    std::string_view text_;
    std::size_t pos_ = 0;
    std::string error_;

    [[noreturn]] void fail(std::string_view what) const {
        throw std::runtime_error(fmt::format("{} at byte {}", what, pos_));
    }
    void skip_space() {
        while (pos_ < text_.size() && (text_[pos_] == ' ' || text_[pos_] == '\t' ||
                                       text_[pos_] == '\n' || text_[pos_] == '\r'))
            ++pos_;
    }
    [[nodiscard]] char peek() const { return pos_ < text_.size() ? text_[pos_] : '\0'; }
    void expect(char c) {
        if (peek() != c)
            fail(fmt::format("expected '{}'", c));
        ++pos_;
    }
    void literal(std::string_view word) {
        if (text_.substr(pos_, word.size()) != word)
            fail("bad literal");
        pos_ += word.size();
    }

    json value(int depth) {
        if (depth > 200)
            fail("nesting too deep");
        skip_space();
        switch (peek()) {
        case '{':
            return object(depth);
        case '[':
            return array(depth);
        case '"':
            return json{string()};
        case 't':
            literal("true");
            return json{true};
        case 'f':
            literal("false");
            return json{false};
        case 'n':
            literal("null");
            return json{nullptr};
        default:
            return json{number()};
        }
    }

    json object(int depth) {
        expect('{');
        json_object members;
        skip_space();
        if (peek() == '}') {
            ++pos_;
            return json{std::move(members)};
        }
        for (;;) {
            skip_space();
            std::string key = string();
            skip_space();
            expect(':');
            if (!members.emplace(key, value(depth + 1)).second)
                fail("duplicate key '" + key + "'");
            skip_space();
            if (peek() == ',') {
                ++pos_;
                continue;
            }
            expect('}');
            return json{std::move(members)};
        }
    }

    json array(int depth) {
        expect('[');
        json_array items;
        skip_space();
        if (peek() == ']') {
            ++pos_;
            return json{std::move(items)};
        }
        for (;;) {
            items.push_back(value(depth + 1));
            skip_space();
            if (peek() == ',') {
                ++pos_;
                continue;
            }
            expect(']');
            return json{std::move(items)};
        }
    }

    double number() {
        const std::size_t start = pos_;
        if (peek() == '-')
            ++pos_;
        const auto digits = [&] {
            const std::size_t from = pos_;
            while (peek() >= '0' && peek() <= '9')
                ++pos_;
            return pos_ - from;
        };
        if (peek() == '0')
            ++pos_;
        else if (digits() == 0)
            fail("expected a value");
        if (peek() == '.') {
            ++pos_;
            if (digits() == 0)
                fail("expected digits after '.'");
        }
        if (peek() == 'e' || peek() == 'E') {
            ++pos_;
            if (peek() == '+' || peek() == '-')
                ++pos_;
            if (digits() == 0)
                fail("expected exponent digits");
        }
        return std::stod(std::string(text_.substr(start, pos_ - start)));
    }

    unsigned hex4() {
        unsigned v = 0;
        for (int i = 0; i < 4; ++i) {
            const char c = peek();
            v <<= 4;
            if (c >= '0' && c <= '9')
                v |= static_cast<unsigned>(c - '0');
            else if (c >= 'a' && c <= 'f')
                v |= static_cast<unsigned>(c - 'a' + 10);
            else if (c >= 'A' && c <= 'F')
                v |= static_cast<unsigned>(c - 'A' + 10);
            else
                fail("bad \\u escape");
            ++pos_;
        }
        return v;
    }

    static void append_utf8(std::string& out, unsigned cp) {
        if (cp < 0x80) {
            out += static_cast<char>(cp);
        } else if (cp < 0x800) {
            out += static_cast<char>(0xC0 | (cp >> 6));
            out += static_cast<char>(0x80 | (cp & 0x3F));
        } else if (cp < 0x10000) {
            out += static_cast<char>(0xE0 | (cp >> 12));
            out += static_cast<char>(0x80 | ((cp >> 6) & 0x3F));
            out += static_cast<char>(0x80 | (cp & 0x3F));
        } else {
            out += static_cast<char>(0xF0 | (cp >> 18));
            out += static_cast<char>(0x80 | ((cp >> 12) & 0x3F));
            out += static_cast<char>(0x80 | ((cp >> 6) & 0x3F));
            out += static_cast<char>(0x80 | (cp & 0x3F));
        }
    }

    // One UTF-8 encoded code point, validated (no overlongs, surrogates or values past U+10FFFF).
    void utf8_char(std::string& out) {
        const auto b0 = static_cast<unsigned char>(text_[pos_]);
        std::size_t len = 0;
        unsigned cp = 0;
        unsigned min = 0;
        if (b0 >= 0xC2 && b0 <= 0xDF) {
            len = 2, cp = b0 & 0x1Fu, min = 0x80;
        } else if ((b0 & 0xF0) == 0xE0) {
            len = 3, cp = b0 & 0x0Fu, min = 0x800;
        } else if (b0 >= 0xF0 && b0 <= 0xF4) {
            len = 4, cp = b0 & 0x07u, min = 0x10000;
        } else {
            fail("invalid UTF-8 in a string");
        }
        if (pos_ + len > text_.size())
            fail("truncated UTF-8 in a string");
        for (std::size_t k = 1; k < len; ++k) {
            const auto b = static_cast<unsigned char>(text_[pos_ + k]);
            if ((b & 0xC0) != 0x80)
                fail("invalid UTF-8 in a string");
            cp = (cp << 6) | (b & 0x3Fu);
        }
        if (cp < min || cp > 0x10FFFF || (cp >= 0xD800 && cp <= 0xDFFF))
            fail("invalid UTF-8 in a string");
        out.append(text_.substr(pos_, len));
        pos_ += len;
    }

    std::string string() {
        expect('"');
        std::string out;
        for (;;) {
            if (pos_ >= text_.size())
                fail("unterminated string");
            const char c = text_[pos_];
            if (c == '"') {
                ++pos_;
                return out;
            }
            if (static_cast<unsigned char>(c) < 0x20)
                fail("raw control character in a string");
            if (static_cast<unsigned char>(c) >= 0x80) {
                utf8_char(out);
                continue;
            }
            ++pos_;
            if (c != '\\') {
                out += c;
                continue;
            }
            const char e = peek();
            ++pos_;
            switch (e) {
            case '"':
            case '\\':
            case '/':
                out += e;
                break;
            case 'b':
                out += '\b';
                break;
            case 'f':
                out += '\f';
                break;
            case 'n':
                out += '\n';
                break;
            case 'r':
                out += '\r';
                break;
            case 't':
                out += '\t';
                break;
            case 'u': {
                unsigned cp = hex4();
                if (cp >= 0xD800 && cp <= 0xDBFF) {
                    expect('\\');
                    expect('u');
                    const unsigned low = hex4();
                    if (low < 0xDC00 || low > 0xDFFF)
                        fail("unpaired surrogate");
                    cp = 0x10000 + ((cp - 0xD800) << 10) + (low - 0xDC00);
                } else if (cp >= 0xDC00 && cp <= 0xDFFF) {
                    fail("unpaired surrogate");
                }
                append_utf8(out, cp);
                break;
            }
            default:
                fail("bad escape");
            }
        }
    }
};

std::optional<json> parse_json(std::string_view text) {
    json_reader reader(text);
    auto doc = reader.document();
    INFO("JSON error: ", reader.error());
    CHECK(doc.has_value());
    return doc;
}

// ---------------------------------------------------------------------------------------------
// Input files used by several tests

constexpr std::string_view clean_file = "D : m \"pipe diameter\"\n"
                                        "A : m^2 \"flow area\"\n"
                                        "\n"
                                        "@circle-area A = pi*D^2/4\n";

constexpr std::string_view sum_file = "ρ : kg/m^3 \"fluid density\"\n"
                                      "g : m/s^2\n"
                                      "V : m/s\n"
                                      "p : Pa \"static pressure\"\n"
                                      "H : m \"total head\"\n"
                                      "\n"
                                      "@head H = p/(ρ*g) + V^2/(2*g) + p\n";

constexpr std::string_view side_file = "ρ : kg/m^3 \"fluid density\"\n"
                                       "h : m \"depth below the surface\"\n"
                                       "Δp : Pa \"pressure difference\"\n"
                                       "\n"
                                       "@hydrostatic Δp = ρ*h\n";

constexpr std::string_view warning_only_file = "a : m\n"
                                               "b : m\n"
                                               "c : s \"never used\"\n"
                                               "a = b\n";

} // namespace

// =============================================================================================

TEST_SUITE_BEGIN("cli");

TEST_CASE("a clean file exits 0 and says so") {
    const temp_folder dir;
    const auto file = dir.write("clean.plumb", clean_file);
    const auto r = run_plumb({"check", "--color", "never", file});
    CHECK(r.status == 0);
    CHECK(r.out == tail("1 formula in 1 file: no dimensional inconsistency found"));
    CHECK(r.err.empty());
}

TEST_CASE("a file with an error exits 1") {
    const temp_folder dir;
    const auto r = run_plumb({"check", dir.write("sum.plumb", sum_file)});
    CHECK(r.status == 1);
    CHECK(contains(r.out, "[sum-mismatch]"));
    CHECK(contains(r.out, "plumb: 1 error, 0 warnings (1 formula in 1 file checked)"));
}

TEST_CASE("warnings alone exit 0") {
    const temp_folder dir;
    const auto r =
        run_plumb({"check", "--color", "never", dir.write("w.plumb", warning_only_file)});
    CHECK(r.status == 0);
    CHECK(contains(r.out, "warning: 'c' is declared but never used [unused]"));
    CHECK(contains(r.out, "plumb: 0 errors, 1 warning (1 formula in 1 file checked)"));
}

TEST_CASE("an error in one file of several still exits 1") {
    const temp_folder dir;
    const auto r =
        run_plumb({"check", dir.write("a.plumb", clean_file), dir.write("b.plumb", side_file)});
    CHECK(r.status == 1);
    CHECK(contains(r.out, "(2 formulas in 2 files checked)"));
}

TEST_CASE("--jobs: the same output on one thread and on three; a bad count is bad usage") {
    const temp_folder dir;
    const std::string a = dir.write("a.plumb", clean_file);
    const std::string b = dir.write("b.plumb", side_file);
    const std::string c = dir.write("c.plumb", warning_only_file);
    const auto one = run_plumb({"check", "--color", "never", "--jobs", "1", a, b, c});
    const auto three = run_plumb({"check", "--color", "never", "--jobs=3", a, b, c});
    CHECK(one.status == 1);
    CHECK(contains(one.out, "in 3 files checked)"));
    CHECK(three.status == one.status);
    CHECK(three.out == one.out);
    for (const std::string bad : {"0", "x", "-2", "3x", ""}) {
        CAPTURE(bad);
        const auto r = run_plumb({"check", "--jobs", bad, a});
        CHECK(r.status == 2);
        CHECK(contains(r.err, "--jobs takes a number of threads"));
    }
}

TEST_CASE("an unreadable path exits 2 with an 'unreadable' finding") {
    const temp_folder dir;
    const auto missing = dir.path("no-such-file.plumb");
    const auto r = run_plumb({"check", "--color", "never", missing});
    CHECK(r.status == 2);
    CHECK(contains(r.out, fmt::format("plumb: error: cannot read '{}'", missing)));
    CHECK(contains(r.out, "[unreadable]"));

    SUBCASE("even next to a clean file") {
        const auto both = run_plumb({"check", dir.write("ok.plumb", clean_file), missing});
        CHECK(both.status == 2);
    }
    SUBCASE("and an unreadable --dict too") {
        const auto r2 = run_plumb({"check", "--dict", missing, dir.write("ok.plumb", clean_file)});
        CHECK(r2.status == 2);
        CHECK(contains(r2.out, "[unreadable]"));
    }
}

TEST_CASE("a syntax error exits 2") {
    const temp_folder dir;
    const auto file = dir.write("syntax.plumb", "a : m\nb : m\nb = (a +\n");
    const auto r = run_plumb({"check", "--color", "never", file});
    CHECK(r.status == 2);
    CHECK(contains(r.out, fmt::format("{}:3:9: error: ", file)));
    CHECK(contains(r.out, "[syntax]"));
}

TEST_CASE("bad usage exits 2 with a message on stderr") {
    const temp_folder dir;
    const auto file = dir.write("clean.plumb", clean_file);

    SUBCASE("an unknown option") {
        const auto r = run_plumb({"check", "--bogus", file});
        CHECK(r.status == 2);
        CHECK(r.out.empty());
        CHECK(contains(r.err, "unknown option '--bogus'"));
        CHECK(contains(r.err, "plumb --help"));
    }
    SUBCASE("a bad --format value") {
        const auto r = run_plumb({"check", "--format", "xml", file});
        CHECK(r.status == 2);
        CHECK(contains(r.err, "--format"));
    }
    SUBCASE("a bad --color value") {
        const auto r = run_plumb({"check", "--color=sometimes", file});
        CHECK(r.status == 2);
        CHECK(contains(r.err, "--color"));
    }
    SUBCASE("--dict without its file") {
        const auto r = run_plumb({"check", file, "--dict"});
        CHECK(r.status == 2);
        CHECK(contains(r.err, "--dict"));
    }
    SUBCASE("check without a path") {
        const auto r = run_plumb({"check"});
        CHECK(r.status == 2);
        CHECK(contains(r.err, "check needs at least one file or folder"));
    }
    SUBCASE("dim without an expression") {
        const auto r = run_plumb({"dim"});
        CHECK(r.status == 2);
        CHECK(contains(r.err, "dim needs an expression"));
    }
    SUBCASE("an unknown command") {
        const auto r = run_plumb({"frobnicate"});
        CHECK(r.status == 2);
        CHECK(contains(r.err, "unknown command 'frobnicate'"));
    }
    SUBCASE("a file given without 'check'") {
        const auto r = run_plumb({file});
        CHECK(r.status == 2);
        CHECK(contains(r.err, fmt::format("did you mean 'plumb check {}'?", file)));
    }
    SUBCASE("catalogue with two filters") {
        const auto r = run_plumb({"catalogue", "Pa", "m"});
        CHECK(r.status == 2);
        CHECK(contains(r.err, "catalogue takes at most one filter"));
    }
}

TEST_CASE("no arguments at all exits 2 and shows the usage") {
    const auto r = run_plumb({});
    CHECK(r.status == 2);
    CHECK(contains(r.out + r.err, "usage:"));
    CHECK(contains(r.out + r.err, "plumb check"));
}

TEST_CASE("--help and --version exit 0") {
    for (const char* flag : {"--help", "-h", "help"}) {
        CAPTURE(flag);
        const auto r = run_plumb({flag});
        CHECK(r.status == 0);
        CHECK(contains(r.out, "usage:"));
        CHECK(contains(r.out, "plumb check [options] PATH..."));
        CHECK(contains(r.out, "--format text|json"));
        CHECK(r.err.empty());
    }
    SUBCASE("--help after a command") {
        const auto r = run_plumb({"check", "--help"});
        CHECK(r.status == 0);
        CHECK(contains(r.out, "usage:"));
    }
    SUBCASE("--version") {
        const auto expected = fmt::format("plumb {}\n", plumb::version());
        CHECK(run_plumb({"--version"}).out == expected);
        CHECK(run_plumb({"--version"}).status == 0);
        CHECK(run_plumb({"-V"}).out == expected);
        CHECK(plumb::version() == "0.1.0"); // the CMake project version reaches the binary
    }
}

// --------------------------------------------------------------------------------------------
// Golden text

TEST_CASE("golden text: a term of a sum with another dimension") {
    const temp_folder dir;
    const auto file = dir.write("head.plumb", sum_file);
    const auto r = run_plumb({"check", "--color", "never", file});
    CHECK(r.status == 1);
    // The braces sit under the terms although 'ρ' takes two bytes: one cell per character.
    // The odd term, one character wide, has a double tick and its key on the line below; the
    // notes that only repeated the dimensions are left to the ledger.
    const std::string expected =
        fmt::format("{}:7:33: error: 'p' (static pressure) does not have the dimension of the "
                    "other terms of this sum [sum-mismatch]\n",
                    file) +
        "    @head H = p/(ρ*g) + V^2/(2*g) + p\n"
        "              └──a──┘   └───b───┘   ║\n"
        "                                    c\n"
        "    a  [L]            length\n"
        "    b  [L]            length\n"
        "  ▶ c  [M L^-1 T^-2]  pressure or stress  ◀ does not match\n"
        "\n" +
        tail("1 error, 0 warnings (1 formula in 1 file checked)");
    CHECK(r.out == expected);
    CHECK(r.err.empty());
}

TEST_CASE("golden text: the two sides of an equation differ") {
    const temp_folder dir;
    const auto file = dir.write("hydrostatic.plumb", side_file);
    const auto r = run_plumb({"check", "--color", "never", file});
    CHECK(r.status == 1);
    const std::string expected =
        fmt::format("{}:5:19: error: the two sides of this equation differ in dimension "
                    "[side-mismatch]\n",
                    file) +
        "    @hydrostatic Δp = ρ*h\n"
        "                 └┘   ╘b╛\n"
        "                 a\n"
        "    a  [M L^-1 T^-2]  pressure or stress\n"
        "  ▶ b  [M L^-2]       areal density       ◀ does not match\n"
        "   · 'ρ*h' differs from the rest by exactly an acceleration: times g it would match; is "
        "a g missing from it (ρ*g*h)?\n"
        "\n" +
        tail("1 error, 0 warnings (1 formula in 1 file checked)");
    CHECK(r.out == expected);
}

TEST_CASE("golden text: a term of two-byte characters beside another") {
    const temp_folder dir;
    const auto file = dir.write("viscosity.plumb", "ν : m^2/s \"kinematic viscosity\"\n"
                                                   "μ : Pa*s\n"
                                                   "ρ : kg/m^3\n"
                                                   "τ_w : Pa \"wall shear stress\"\n"
                                                   "@viscosity ν = μ/ρ + τ_w\n");
    const auto r = run_plumb({"check", "--color", "never", file});
    CHECK(r.status == 1);
    // Every name is Greek: two bytes a character, one cell each.
    const std::string expected =
        fmt::format("{}:5:22: error: cannot add 'τ_w' (wall shear stress) to 'μ/ρ': their "
                    "dimensions differ [sum-mismatch]\n",
                    file) +
        "    @viscosity ν = μ/ρ + τ_w\n"
        "                   └a┘   ╘b╛\n"
        "    a  [L^2 T^-1]     kinematic viscosity or diffusivity\n"
        "  ▶ b  [M L^-1 T^-2]  pressure or stress                  ◀ does not match\n"
        "\n" +
        tail("1 error, 0 warnings (1 formula in 1 file checked)");
    CHECK(r.out == expected);
}

TEST_CASE("golden text: an undeclared symbol is the only mark, and the comment is dropped") {
    const temp_folder dir;
    const auto file = dir.write("continuity.plumb", "Q : m^3/s\n"
                                                    "V : m/s\n"
                                                    "@continuity Q = V*A_p   # flow area\n");
    const auto r = run_plumb({"check", "--color", "never", file});
    CHECK(r.status == 1);
    const std::string expected =
        fmt::format("{}:3:19: error: 'A_p' is not declared [undeclared]\n", file) +
        "    @continuity Q = V*A_p\n"
        "                      ╘a╛\n"
        "  ▶ a  not declared\n"
        "   · declare it with its unit or its dimension, as in 'A_p : <unit>' or "
        "'A_p : [<dimension>]'\n"
        "\n" +
        tail("1 error, 0 warnings (1 formula in 1 file checked)");
    CHECK(r.out == expected);
}

TEST_CASE("golden text: a syntax error marks its place and has no ledger") {
    const temp_folder dir;
    const auto file = dir.write("open.plumb", "Q, V : m\nQ = V*(V +\n");
    const auto r = run_plumb({"check", "--color", "never", file});
    CHECK(r.status == 2);
    // The place is one past the line's last character: the mark stands there, over blank.
    const std::string expected =
        fmt::format("{}:2:11: error: expected a term after '+' or '-' [syntax]\n", file) +
        "    Q = V*(V +\n"
        "              ║\n"
        "\n" +
        tail("1 error, 0 warnings (0 formulas in 1 file checked)");
    CHECK(r.out == expected);
}

TEST_CASE("golden text: a tab before the finding keeps the braces aligned") {
    const temp_folder dir;
    const auto file =
        dir.write("tab.plumb", "a : m\nb : s\nc : m\n\tc = a +\tb\t# the tab is the point\n");
    const auto r = run_plumb({"check", "--color", "never", file});
    CHECK(r.status == 1);
    // Tabs expand to the next multiple of 4 cells in the line and under it alike; the column
    // in the location counts the tab as one character, as editors do. The file's indentation
    // and the comment are not shown.
    const std::string expected =
        fmt::format("{}:4:10: error: cannot add 'b' to 'a': their dimensions differ "
                    "[sum-mismatch]\n",
                    file) +
        "    c = a + b\n"
        "        │   ║\n"
        "        a   b\n"
        "    a  [L]  length\n"
        "  ▶ b  [T]  time    ◀ does not match\n"
        "\n" +
        tail("1 error, 0 warnings (1 formula in 1 file checked)");
    CHECK(r.out == expected);
}

TEST_CASE("a 5000-character line is shown as a window with the braces in place") {
    const temp_folder dir;
    // Greek names before the finding, so byte and character offsets disagree thousands of
    // times.
    std::string formula = "@long c = ";
    for (int i = 0; i < 600; ++i)
        formula += "ρ*a + ";
    formula += "b";
    for (int i = 0; i < 250; ++i)
        formula += " + ρ*a";
    REQUIRE(code_points(formula) >= 4000);
    REQUIRE(formula.size() >= 5000);
    const auto file = dir.write("long.plumb", "ρ : 1\na : m\nb : s\nc : m\n" + formula + "\n");
    const auto r = run_plumb({"check", "--color", "never", file});
    CHECK(r.status == 1);

    const auto lines = lines_of(r.out);
    REQUIRE(lines.size() >= 5);
    const std::size_t column = code_points(formula.substr(0, formula.find('b'))) + 1;
    CHECK(lines[0] == fmt::format("{}:5:{}: error: 'b' does not have the dimension of the other "
                                  "terms of this sum [sum-mismatch]",
                                  file, column));
    // No line of the report grows with the formula: the 800 other terms are not all listed.
    for (const auto& line : lines) {
        CAPTURE(line.substr(0, 200));
        CHECK(code_points(line) < 400);
    }
    const std::string source = lines[1];
    const std::string braces = lines[2];
    const std::string keys = lines[3];
    REQUIRE(source.rfind("    ", 0) == 0);
    REQUIRE(braces.rfind("    ", 0) == 0);
    const std::string shown = source.substr(4);
    const auto under = split_code_points(braces.substr(4));
    // Cut on both sides, marked with an ellipsis, and short enough for a terminal.
    CHECK(shown.rfind("…", 0) == 0);
    CHECK(shown.size() > 3);
    CHECK(shown.substr(shown.size() - 3) == "…");
    CHECK(code_points(shown) <= 150);
    CHECK(under.size() <= 150);
    // The double tick sits under the 'b', counting characters, not bytes, with its key below.
    REQUIRE(shown.find('b') != std::string::npos);
    const std::size_t b_cell = code_points(shown.substr(0, shown.find('b')));
    REQUIRE(under.size() > b_cell);
    CHECK(under[b_cell] == "║");
    CHECK(std::count(under.begin(), under.end(), "║") == 1);
    const auto key_cells = split_code_points(keys.substr(std::min<std::size_t>(4, keys.size())));
    REQUIRE(key_cells.size() > b_cell);
    const std::string key = key_cells[b_cell];
    CHECK(key != " ");
    CHECK(contains(r.out, fmt::format("\n  ▶ {}  [T]  time    ◀ does not match\n", key)));
    // The other terms in the window have braces too, each cell under part of a 'ρ*a'.
    const auto shown_cells = split_code_points(shown);
    CHECK(std::count(under.begin(), under.end(), "└") >= 1);
    for (std::size_t i = 0; i < under.size(); ++i)
        if (under[i] != " " && i != b_cell) {
            CAPTURE(i);
            REQUIRE(i < shown_cells.size());
            CHECK((shown_cells[i] == "ρ" || shown_cells[i] == "*" || shown_cells[i] == "a"));
        }
}

// --------------------------------------------------------------------------------------------
// Colour

TEST_CASE("colour: always, never, and auto on a pipe") {
    const temp_folder dir;
    const auto file = dir.write("side.plumb", side_file);
    const auto always = run_plumb({"check", "--color", "always", file});
    const auto never = run_plumb({"check", "--color", "never", file});
    const auto automatic = run_plumb({"check", file});
    const auto british = run_plumb({"check", "--colour=always", file});

    CHECK(contains(always.out, "\x1b["));
    CHECK(contains(always.out, "\x1b[1;38;5;202merror:\x1b[0m"));
    CHECK(contains(always.out, "\x1b[0m"));
    CHECK(always.out == british.out);
    CHECK_FALSE(contains(never.out, "\x1b"));
    CHECK_FALSE(contains(automatic.out, "\x1b")); // stdout is a pipe, not a terminal
    CHECK(never.out == automatic.out);
    CHECK(always.status == 1);
    CHECK(never.status == 1);

    // Colour changes nothing but the escapes.
    std::string stripped;
    for (std::size_t i = 0; i < always.out.size(); ++i) {
        if (always.out[i] == '\x1b') {
            i = always.out.find('m', i);
            REQUIRE(i != std::string::npos);
            continue;
        }
        stripped += always.out[i];
    }
    CHECK(stripped == never.out);

    SUBCASE("the palette: orange error and odd term, steel-blue terms, grey rule id") {
        const std::string expected =
            fmt::format("{}:5:19: \x1b[1;38;5;202merror:\x1b[0m the two sides of this equation "
                        "differ in dimension \x1b[38;5;245m[side-mismatch]\x1b[0m\n",
                        file) +
            "    @hydrostatic Δp = ρ*h\n"
            "                 \x1b[38;5;109m└┘\x1b[0m   \x1b[38;5;202m╘b╛\x1b[0m\n"
            "                 \x1b[38;5;109ma\x1b[0m\n"
            "    a  \x1b[38;5;109m[M L^-1 T^-2]\x1b[0m  pressure or stress\n"
            "  \x1b[38;5;202m▶ b  [M L^-2]       areal density       ◀ does not match\x1b[0m\n"
            "   \x1b[38;5;73m·\x1b[0m 'ρ*h' differs from the rest by exactly an acceleration: "
            "times g it would match; is a g missing from it (ρ*g*h)?\n"
            "\n"
            "\x1b[1mplumb:\x1b[0m 1 error, 0 warnings (1 formula in 1 file checked)\n"
            "\x1b[1;38;5;178mcaution:\x1b[0m " +
            std::string(plumb::caution_text()) + "\n";
        CHECK(always.out == expected);
    }
    SUBCASE("NO_COLOR and TERM=dumb turn auto off; an explicit --color always wins") {
        const auto no_colour = run_plumb({"check", "--color", "auto", file}, {{"NO_COLOR", "1"}});
        CHECK_FALSE(contains(no_colour.out, "\x1b"));
        const auto dumb = run_plumb({"check", "--color", "auto", file}, {{"TERM", "dumb"}});
        CHECK_FALSE(contains(dumb.out, "\x1b"));
        const auto forced = run_plumb({"check", "--color", "always", file}, {{"NO_COLOR", "1"}});
        CHECK(contains(forced.out, "\x1b["));
    }
}

// --------------------------------------------------------------------------------------------
// JSON

TEST_CASE("json: the report is valid JSON with every field") {
    const temp_folder dir;
    const auto file = dir.write("side.plumb", std::string(side_file) + "z : m \"unused\"\n");
    const auto r = run_plumb({"check", "--format", "json", file});
    CHECK(r.status == 1);
    const auto doc = parse_json(r.out);
    REQUIRE(doc);
    REQUIRE(doc->is_object());
    CHECK((*doc)["tool"].string() == "plumb");
    CHECK((*doc)["version"].string() == plumb::version());
    CHECK((*doc)["schema"].number() == 1);
    CHECK((*doc)["caution"].string() == plumb::caution_text());

    const auto& summary = (*doc)["summary"];
    CHECK(summary["files_checked"].number() == 1);
    CHECK(summary["formulas_checked"].number() == 1);
    CHECK(summary["errors"].number() == 1);
    CHECK(summary["warnings"].number() == 1);
    CHECK(summary["input_failed"].boolean() == false);

    const auto& findings = (*doc)["findings"].array();
    REQUIRE(findings.size() == 2);
    for (const auto& f : findings)
        for (const char* key : {"file", "line", "column", "end_line", "end_column", "severity",
                                "rule", "message", "terms", "notes"}) {
            CAPTURE(key);
            CHECK(f.has(key));
        }

    const json* side = nullptr;
    const json* unused = nullptr;
    for (const auto& f : findings)
        (f["rule"].string() == "side-mismatch" ? side : unused) = &f;
    REQUIRE(side != nullptr);
    REQUIRE(unused != nullptr);

    CHECK((*side)["file"].string() == file);
    CHECK((*side)["severity"].string() == "error");
    CHECK((*side)["message"].string() == "the two sides of this equation differ in dimension");
    // Columns count characters: "@hydrostatic Δp = " is 18 characters, 19 bytes.
    CHECK((*side)["line"].number() == 5);
    CHECK((*side)["column"].number() == 19);
    CHECK((*side)["end_line"].number() == 5);
    CHECK((*side)["end_column"].number() == 22);

    const auto& terms = (*side)["terms"].array();
    REQUIRE(terms.size() == 2);
    CHECK(terms[0]["text"].string() == "Δp");
    CHECK(terms[0]["column"].number() == 14);
    CHECK(terms[0]["end_column"].number() == 16);
    CHECK(terms[0]["dimension"].string() == "[M L^-1 T^-2]");
    CHECK(terms[0]["quantity"].string() == "pressure or stress");
    const auto& p = terms[0]["exponents"];
    CHECK(p.object().size() == 7);
    CHECK(p["mass"].string() == "1");
    CHECK(p["length"].string() == "-1");
    CHECK(p["time"].string() == "-2");
    for (const char* base : {"temperature", "amount", "current", "luminous_intensity"})
        CHECK(p[base].string() == "0");
    CHECK(terms[1]["text"].string() == "ρ*h");
    CHECK(terms[1]["dimension"].string() == "[M L^-2]");
    CHECK(terms[1]["exponents"]["length"].string() == "-2");

    const auto& notes = (*side)["notes"].array();
    REQUIRE(notes.size() == 3);
    CHECK(notes[0]["message"].string() ==
          "left side 'Δp' (pressure difference) is [M L^-1 T^-2] (pressure or stress)");
    CHECK(notes[1]["message"].string() == "right side 'ρ*h' is [M L^-2] (areal density)");
    CHECK(notes[2]["message"].string().find("is a g missing") != std::string::npos);

    CHECK((*unused)["severity"].string() == "warning");
    CHECK((*unused)["line"].number() == 6);
    CHECK((*unused)["column"].number() == 1);
    CHECK((*unused)["terms"].array().empty());
}

TEST_CASE("json: a clean run, an unreadable path and awkward bytes stay valid JSON") {
    const temp_folder dir;
    SUBCASE("clean") {
        const auto r = run_plumb({"check", "--format=json", dir.write("ok.plumb", clean_file)});
        CHECK(r.status == 0);
        const auto doc = parse_json(r.out);
        REQUIRE(doc);
        CHECK((*doc)["findings"].array().empty());
        CHECK((*doc)["summary"]["errors"].number() == 0);
    }
    SUBCASE("unreadable") {
        const auto r = run_plumb({"check", "--format", "json", dir.path("missing.plumb")});
        CHECK(r.status == 2);
        const auto doc = parse_json(r.out);
        REQUIRE(doc);
        CHECK((*doc)["summary"]["input_failed"].boolean() == true);
        REQUIRE((*doc)["findings"].array().size() == 1);
        const auto& f = (*doc)["findings"].array()[0];
        CHECK(f["rule"].string() == "unreadable");
        CHECK_FALSE(f.has("line")); // no place in a file
    }
    SUBCASE("quotes, backslashes, control and invalid UTF-8 bytes") {
        const auto file = dir.write("odd \"name\\.plumb",
                                    "p : Pa \"a \\ \x01 and \xff\xfe bytes\"\nh : m\np = h\n");
        const auto r = run_plumb({"check", "--format", "json", file});
        CHECK(r.status == 2); // bytes that are not UTF-8 make the file a bad input
        const auto doc = parse_json(r.out);
        REQUIRE(doc);
        REQUIRE_FALSE((*doc)["findings"].array().empty());
        CHECK((*doc)["findings"].array()[0]["file"].string() == file);
    }
}

TEST_CASE("json: bytes that are not UTF-8 are a finding and never reach JSON or SARIF") {
    // RFC 3629, section 4, and the Unicode Standard, table 3-7: overlong forms, C0, C1, F5-FF,
    // surrogates, code points past U+10FFFF and sequences cut short are not UTF-8.
    const temp_folder dir;
    for (const std::string bad :
         {"\xC0\xAF", "\xC1\xBF", "\xE0\x80\xAF", "\xED\xA0\x80", "\xF4\x90\x80\x80",
          "\xF5\x80\x80\x80", "\xF7\xBF\xBF\xBF", "\xFF", "\xE2\x82"}) {
        std::string shown_bytes;
        for (const char c : bad)
            shown_bytes += fmt::format("\\x{:02X}", static_cast<unsigned char>(c));
        CAPTURE(shown_bytes);
        // In a description, in a comment and in a formula; with a real mistake beside them.
        const auto file = dir.write("bytes.plumb", "p : Pa \"a " + bad + " b\"\nh : m # " + bad +
                                                       "\n@mixed p = h + x" + bad + "\n");
        const auto json = run_plumb({"check", "--format", "json", file});
        CHECK(json.status == 2);
        const auto doc = parse_json(json.out);
        REQUIRE(doc);
        bool said = false;
        for (const auto& f : (*doc)["findings"].array())
            said = said || f["message"].string().find("not valid UTF-8") != std::string::npos;
        CHECK(said);
        const auto sarif = run_plumb({"check", "--format", "sarif", file});
        CHECK(sarif.status == 2);
        CHECK(parse_json(sarif.out));
        const auto grouped = run_plumb({"groups", "--format", "json", file});
        CHECK(parse_json(grouped.out));
    }
}

TEST_CASE("json: a file name that is not UTF-8 is written with U+FFFD for each bad byte") {
    const temp_folder dir;
    const std::string file = dir.write("calc-\xC0\xAF.plumb", "h : m\nt : s\n@mixed h = t\n");
    const auto r = run_plumb({"check", "--format", "json", file});
    CHECK(r.status == 1);
    const auto doc = parse_json(r.out);
    REQUIRE(doc);
    REQUIRE((*doc)["findings"].array().size() == 1);
    const std::string shown = (*doc)["findings"].array()[0]["file"].string();
    CHECK(shown == file.substr(0, file.size() - 8) + "\uFFFD\uFFFD.plumb");
    const auto sarif = run_plumb({"check", "--format", "sarif", file});
    CHECK(parse_json(sarif.out));
}

// --------------------------------------------------------------------------------------------
// dim, units, rules

TEST_CASE("dim: the dimension of an expression against a file's symbols") {
    const temp_folder dir;
    const auto dict = dir.write("fluids.plumb", "rho : kg/m^3 \"fluid density\"\n"
                                                "mu : Pa*s \"dynamic viscosity\"\n"
                                                "V : m/s\n"
                                                "D : m\n"
                                                "g : m/s^2\n"
                                                "h : m\n"
                                                "ρ : kg/m^3\n");
    SUBCASE("Reynolds number") {
        const auto r = run_plumb({"dim", "rho*V*D/mu", dict});
        CHECK(r.status == 0);
        CHECK(r.out == "[1] (dimensionless)\n");
        CHECK(r.err.empty());
    }
    SUBCASE("a pressure") {
        const auto r = run_plumb({"dim", "ρ*g*h", dict});
        CHECK(r.status == 0);
        CHECK(r.out == "[M L^-1 T^-2] (pressure or stress)\n");
    }
    SUBCASE("a dimension without a common name") {
        const auto r = run_plumb({"dim", "rho*g^3", dict});
        CHECK(r.status == 0);
        CHECK(r.out == "[M T^-6]\n");
    }
    SUBCASE("an inconsistent expression exits 1 and shows the finding") {
        const auto r = run_plumb({"dim", "--color", "never", "rho*g*h + D", dict});
        CHECK(r.status == 1);
        CHECK(contains(r.out, "<query>:1:11: error: "));
        CHECK(contains(r.out, "[sum-mismatch]"));
        CHECK(contains(r.out, "\n    rho*g*h + D\n"));
    }
    SUBCASE("without a file only numbers and built-ins are known") {
        const auto r = run_plumb({"dim", "2*pi"});
        CHECK(r.status == 0);
        CHECK(r.out == "[1] (dimensionless)\n");
        const auto u = run_plumb({"dim", "rho"});
        CHECK(u.status == 1);
        CHECK(contains(u.out, "[undeclared]"));
    }
    SUBCASE("--dict gives the symbols too") {
        const auto r = run_plumb({"dim", "--dict", dict, "mu/rho"});
        CHECK(r.status == 0);
        CHECK(r.out == "[L^2 T^-1] (kinematic viscosity or diffusivity)\n");
    }
}

TEST_CASE("catalogue: units grouped by quantity, exact factors, origins and sources") {
    const auto all = run_plumb({"catalogue"});
    CHECK(all.status == 0);
    CHECK(all.err.empty());
    // Never float noise or C-style exponents.
    CHECK_FALSE(contains(all.out, "e+"));
    CHECK_FALSE(contains(all.out, "e-0"));
    CHECK_FALSE(contains(all.out, "0000001"));

    const auto lines = lines_of(all.out);
    const auto row_of = [&](std::string_view start) -> std::string {
        for (const auto& l : lines)
            if (l.rfind(start, 0) == 0)
                return l;
        return {};
    };
    // One heading per quantity, with its dimension; each unit under its own.
    const auto heading = [&](std::string_view h) {
        return std::find_if(lines.begin(), lines.end(),
                            [&](const std::string& l) { return l.rfind(h, 0) == 0; });
    };
    const auto pressure = heading("pressure or stress [M L^-1 T^-2]  SI: Pa");
    const auto energy = heading("energy, work, heat or torque [M L^2 T^-2]");
    const auto temperature = heading("temperature [Θ]  SI: K");
    REQUIRE(pressure != lines.end());
    REQUIRE(energy != lines.end());
    REQUIRE(temperature != lines.end());
    const auto psi = std::find_if(lines.begin(), lines.end(), [](const std::string& l) {
        return l.rfind("  psi, psia ", 0) == 0;
    });
    REQUIRE(psi != lines.end());
    CHECK(psi > pressure);
    CHECK((psi < energy || energy < pressure));

    // NIST SP 811 (2008), B.8: 1 psi = 6.894757E+03 Pa; lbf/in² exactly is
    // 4.4482216152605 N / 0.00064516 m² = 8896443230521/1290320000 Pa, which does not end.
    CHECK(contains(*psi, "pound-force per square inch"));
    CHECK(contains(*psi, "6894.75729316… (8896443230521/1290320000)"));
    CHECK(contains(*psi, "NIST SP 811 (2008)"));
    // NIST SP 811 (2008), B.8: T/K = (t/°F + 459.67)/1.8, so the degree is 5/9 K and the
    // scale's zero is 459.67 × 5/9 K = 45967/180 K.
    const std::string fahrenheit = row_of("  °F");
    CHECK(contains(fahrenheit, "0.555555555555… (5/9)"));
    CHECK(contains(fahrenheit, "zero at 255.372222222… (45967/180) K"));
    // SI Brochure 9th ed., Table 4 note: t/°C = T/K − 273.15.
    CHECK(contains(row_of("  °C"), "zero at 273.15 K"));
    // NIST SP 811 (2008), B.8: 1 ft = 0.3048 m exactly; a decimal that ends is shown whole.
    CHECK(contains(row_of("  ft "), "  0.3048  "));
    // Gauge pressure: common practice reads it against the standard atmosphere, 101325 Pa
    // (NIST SP 811 (2008), B.8, atmosphere, standard).
    CHECK(contains(row_of("  psig "), "zero at 101325 Pa"));
    // A measured value keeps its published digits: CODATA 2018, 1.660 539 066 60 × 10^-27 kg.
    CHECK(contains(row_of("  Da "), "1.66053906660 × 10^-27"));
    CHECK(contains(row_of("  Pa "), "takes SI prefixes"));
    // The prefixes come last (SI Brochure 9th ed., Table 7).
    const auto prefixes = heading("SI prefixes");
    REQUIRE(prefixes != lines.end());
    CHECK(prefixes > psi);
    CHECK(contains(all.out, "k  kilo    10^3"));
}

TEST_CASE("catalogue: the filter by symbol, name or quantity; a prefixed symbol resolves") {
    const auto pa = run_plumb({"catalogue", "Pa"});
    CHECK(pa.status == 0);
    CHECK(contains(pa.out, "\n  Pa "));
    CHECK_FALSE(contains(pa.out, "\n  psi"));       // "Pa" is no part of psi's symbol or name
    CHECK_FALSE(contains(pa.out, "\nSI prefixes")); // the prefix list comes with the full table
    CHECK(lines_of(pa.out).size() < lines_of(run_plumb({"catalogue"}).out).size());

    const auto by_name = run_plumb({"catalogue", "FAHRENHEIT"});
    CHECK(by_name.status == 0);
    CHECK(contains(by_name.out, "\n  °F, degF"));
    CHECK_FALSE(contains(by_name.out, "\n  K "));

    const auto by_quantity = run_plumb({"catalogue", "viscosity"});
    CHECK(by_quantity.status == 0);
    CHECK(contains(by_quantity.out, "dynamic viscosity [M L^-1 T^-1]"));
    CHECK(contains(by_quantity.out, "\n  cP, cp "));
    CHECK(contains(by_quantity.out, "\n  cSt "));

    // SI Brochure 9th ed., Table 7: kilo is 10^3.
    const auto prefixed = run_plumb({"catalogue", "kPa"});
    CHECK(prefixed.status == 0);
    CHECK(contains(prefixed.out, "\n  kPa "));
    CHECK(contains(prefixed.out, " kilo + pascal "));
    CHECK(contains(prefixed.out, " 1000 "));

    const auto none = run_plumb({"catalogue", "furlong"});
    CHECK(none.status == 1);
    CHECK(contains(none.err, "no unit matches 'furlong'"));

    const auto old = run_plumb({"units"});
    CHECK(old.status == 2);
    CHECK(contains(old.err, "'plumb units' is now 'plumb catalogue'"));
}

TEST_CASE("rules: every rule id is listed with its summary") {
    const auto r = run_plumb({"rules"});
    CHECK(r.status == 0);
    const auto rows = lines_of(r.out);
    CHECK(rows.size() == plumb::rules::all().size());
    for (const auto& rule : plumb::rules::all()) {
        CAPTURE(rule.id);
        const auto row = std::find_if(rows.begin(), rows.end(), [&](const std::string& line) {
            return line.rfind(std::string(rule.id) + " ", 0) == 0;
        });
        REQUIRE(row != rows.end());
        CHECK(contains(*row, rule.summary));
    }
    for (const auto id : {plumb::rules::sum_mismatch, plumb::rules::side_mismatch,
                          plumb::rules::unreadable, plumb::rules::include_cycle})
        CHECK(contains(r.out, id));
}

// --------------------------------------------------------------------------------------------
// Inputs: dictionaries, folders, line endings, byte order mark

TEST_CASE("--dict supplies declarations to every checked file") {
    const temp_folder dir;
    const auto dict = dir.write("dict/fluids.plumb", "ρ : kg/m^3\nV : m/s\nD : m\n");
    const auto a = dir.write("a.plumb", "G : [M L^-2 T^-1]\nG = ρ*V\n");
    const auto b = dir.write("b.plumb", "x : [M L^-1 T^-1]\nx = ρ*V*D\n");

    const auto without = run_plumb({"check", a, b});
    CHECK(without.status == 1);
    CHECK(contains(without.out, "'ρ' is not declared [undeclared]"));

    const auto with = run_plumb({"check", "--dict", dict, a, b});
    CHECK(with.status == 0);
    CHECK(contains(with.out, "2 formulas in 2 files: no dimensional inconsistency found"));
    // A dictionary's symbols are never unused.
    CHECK_FALSE(contains(with.out, "[unused]"));

    const auto equals_form = run_plumb({"check", "--dict=" + dict, a});
    CHECK(equals_form.status == 0);

    const auto wrong = run_plumb({"check", "--dict", dict, dir.write("c.plumb", "D = ρ*V\n")});
    CHECK(wrong.status == 1);
    CHECK(contains(wrong.out, "[side-mismatch]"));
}

TEST_CASE("a folder is searched recursively for *.plumb files only") {
    const temp_folder dir;
    (void)dir.write("tree/top.plumb", clean_file);
    (void)dir.write("tree/deep/er/side.plumb", side_file);
    (void)dir.write("tree/notes.txt", "this is (( not a plumb file\n");
    (void)dir.write("tree/deep/broken.plumb.bak", "a = = =\n");
    (void)dir.write("tree/README", "x = (\n");

    const auto r = run_plumb({"check", "--color", "never", dir.path("tree")});
    // The side mismatch; the other files would have been syntax errors (status 2).
    CHECK(r.status == 1);
    CHECK(contains(r.out, "(2 formulas in 2 files checked)"));
    CHECK(contains(r.out, fmt::format("{}:5:19: error:", dir.path("tree/deep/er/side.plumb"))));
    CHECK_FALSE(contains(r.out, "[syntax]"));

    const auto clean_only = run_plumb({"check", dir.write("clean/a/b/c.plumb", clean_file)});
    CHECK(clean_only.status == 0);
    const auto nested = run_plumb({"check", dir.path("clean")});
    CHECK(nested.status == 0);
    CHECK(contains(nested.out, "1 formula in 1 file"));
}

TEST_CASE("what a hook relies on: nothing to check is status 2, a file named twice is checked "
          "once") {
    const temp_folder dir;
    (void)dir.write("empty/notes.txt", "no calc here\n");
    const auto empty = run_plumb({"check", "--color", "never", dir.path("empty")});
    CHECK(empty.status == 2);
    CHECK(contains(empty.out, fmt::format("nothing to check in '{}'", dir.path("empty"))));

    const auto mistyped = run_plumb({"check", "--color", "never", dir.path("emtpy")});
    CHECK(mistyped.status == 2);
    CHECK(contains(mistyped.out, "no such file"));

    const auto file = dir.write("calc/side.plumb", side_file);
    const auto twice = run_plumb({"check", "--color", "never", file, file, dir.path("calc")});
    CHECK(twice.status == 1);
    CHECK(contains(twice.out, "(1 formula in 1 file checked)"));
    // One finding, not three.
    const auto first = twice.out.find("[side-mismatch]");
    REQUIRE(first != std::string::npos);
    CHECK(twice.out.find("[side-mismatch]", first + 1) == std::string::npos);
}

TEST_CASE("json: every formula with its label and result, those that passed too") {
    const temp_folder dir;
    const auto file = dir.write("calc.plumb", "a, b : m\nt : s\n\n"
                                              "@fine a = b\n"  // line 4: passes
                                              "@wrong a = t\n" // line 5: error
                                              "a = 1.5?*t\n"   // line 6: note (inferred)
                                              "b = 2 {mm}\n"); // line 7: warning (scale)
    const auto r = run_plumb({"check", "--format", "json", file});
    const auto doc = parse_json(r.out);
    REQUIRE(doc);
    const auto& formulas = (*doc)["formulas"].array();
    REQUIRE(formulas.size() == 4);
    const char* labels[] = {"fine", "wrong", "", ""};
    const char* results[] = {"passed", "error", "note", "warning"};
    for (std::size_t i = 0; i < 4; ++i) {
        CAPTURE(i);
        CHECK(formulas[i]["file"].string() == file);
        CHECK(formulas[i]["line"].number() == static_cast<double>(i + 4));
        CHECK(formulas[i]["column"].number() == 1);
        CHECK(formulas[i]["label"].string() == labels[i]);
        CHECK(formulas[i]["result"].string() == results[i]);
    }
}

TEST_CASE("--dict carries the dictionary's own units, as `use` does") {
    const temp_folder dir;
    const auto dict = dir.write("units.plumb", "measure mgal = 1e6 gal \"million US gallons\"\n"
                                               "measure kPa_g = kPa zero at 101.325 kPa\n");
    const auto calc = dir.write("calc.plumb", "V_t : mgal\nV_2 : m^3\np : kPa_g\n"
                                              "V_t >= V_2/1e6*264.172\np >= 0\n");
    const auto without = run_plumb({"check", "--color", "never", calc});
    CHECK(without.status == 1);
    CHECK(contains(without.out, "unknown unit 'mgal'"));
    const auto with = run_plumb({"check", "--color", "never", "--dict", dict, calc});
    CHECK_FALSE(contains(with.out, "[unknown-unit]"));
    CHECK(with.status == 0);
}

TEST_CASE("CRLF line endings give the same findings as LF") {
    const temp_folder dir;
    const std::string lf = std::string(sum_file) + "L : m\n" + "@cont L = \\\n    H + \\\n  V\n";
    std::string crlf;
    for (const char c : lf)
        crlf += c == '\n' ? std::string("\r\n") : std::string(1, c);

    const auto lf_run = run_plumb({"check", "--color", "never", dir.write("lf/f.plumb", lf)});
    const auto crlf_run = run_plumb({"check", "--color", "never", dir.write("crlf/f.plumb", crlf)});
    CHECK(lf_run.status == 1);
    CHECK(crlf_run.status == lf_run.status);
    CHECK(count_of(lf_run.out, " error: ") == 2);
    CHECK_FALSE(contains(crlf_run.out, "\r"));

    // The same text once the folder names are made equal.
    std::string normalised = crlf_run.out;
    const std::string from = dir.path("crlf");
    const std::string to = dir.path("lf");
    for (auto at = normalised.find(from); at != std::string::npos; at = normalised.find(from, at))
        normalised.replace(at, from.size(), to);
    CHECK(normalised == lf_run.out);

    const auto lf_json = run_plumb({"check", "--format", "json", dir.path("lf/f.plumb")});
    const auto crlf_json = run_plumb({"check", "--format", "json", dir.path("crlf/f.plumb")});
    const auto a = parse_json(lf_json.out);
    const auto b = parse_json(crlf_json.out);
    REQUIRE(a);
    REQUIRE(b);
    const auto& fa = (*a)["findings"].array();
    const auto& fb = (*b)["findings"].array();
    REQUIRE(fa.size() == fb.size());
    for (std::size_t i = 0; i < fa.size(); ++i)
        for (const char* key : {"line", "column", "end_line", "end_column"})
            CHECK(fa[i][key].number() == fb[i][key].number());
}

TEST_CASE("a file that starts with a UTF-8 byte order mark parses") {
    const temp_folder dir;
    const std::string bom = "\xEF\xBB\xBF";
    const auto clean = run_plumb({"check", dir.write("bom.plumb", bom + std::string(clean_file))});
    CHECK(clean.status == 0);
    CHECK(contains(clean.out, "1 formula in 1 file: no dimensional inconsistency found"));

    const auto with_error = run_plumb(
        {"check", "--color", "never", dir.write("bom-side.plumb", bom + std::string(side_file))});
    CHECK(with_error.status == 1);
    CHECK(contains(with_error.out, ":5:19: error: the two sides of this equation differ"));
}

TEST_CASE("groups: a study's groups, the --vars form, --study and JSON") {
    const temp_folder dir;
    // Sphere drag: F_D/(ρV²D²) = φ(ρVD/μ) (F. M. White, Fluid Mechanics, 7th ed., ch. 5,
    // chapter from memory).
    const std::string declarations = "F_D : N\nρ : kg/m^3\nV : m/s\nD : m\nμ : Pa*s\n";
    const auto file =
        dir.write("drag.plumb", declarations + "study drag: F_D depends on ρ, V, D, μ\n");

    const auto r = run_plumb({"groups", "--color", "never", file});
    CHECK(r.status == 0);
    CHECK(contains(r.out, "study drag"));
    CHECK(contains(r.out, "rank 3: 5 variables give 2 independent groups"));
    CHECK(contains(r.out, "F_D/(ρ*V^2*D^2)"));
    CHECK(contains(r.out, "ρ*V*D/μ"));

    const auto from_vars =
        run_plumb({"groups", "--vars", "F_D depends on ρ, V, D, μ", "--repeating", "ρ, V, D",
                   dir.write("dictionary.plumb", declarations)});
    CHECK(from_vars.status == 0);
    CHECK(contains(from_vars.out, "study command-line"));
    CHECK(contains(from_vars.out, "(as given)"));

    CHECK(run_plumb({"groups", "--study", "nothing-like-it", file}).status == 2);
    CHECK(run_plumb({"groups", "--repeating", "ρ", file}).status == 2);

    const auto json = run_plumb({"groups", "--format", "json", file});
    CHECK(json.status == 0);
    const auto doc = parse_json(json.out);
    REQUIRE(doc.has_value());
    CHECK(contains(json.out, "\"studies\": ["));

    // A study that cannot be worked out is a finding: exit 1, the reason on stdout.
    const auto bad = run_plumb(
        {"groups", "--color", "never",
         dir.write("bad.plumb",
                   declarations + "U : m/s\n"
                                  "study drag: F_D depends on ρ, V, U, D, μ repeating ρ, V, U\n")});
    CHECK(bad.status == 1);
    CHECK(contains(bad.out, "[study-problem]"));
}

TEST_SUITE_END();

// The release `plumb` is linked statically and hands workbooks to plumb-workbooks, the same
// program dynamically linked (cli/CMakeLists.txt); in other builds it reads them itself. Either
// way the command line gives the findings the demo workbook records, beside a notation file's.
TEST_CASE("the command line reads workbooks beside notation files") {
    temp_folder dir;
    const std::string calc = dir.write("sum.plumb", "x, y : m\nz : s\ny = x + z\n");
    const std::string book =
        std::string(PLUMB_SOURCE_DIR) + "/corpus/demo-workbook/corran-vale-station.xlsx";
    const auto r = run_plumb({"check", "--format", "json", calc, book});
    CHECK(r.status == 1);
    for (const char* cell : {"\"cell\": \"C14\"", "\"cell\": \"C21\"", "\"cell\": \"D26\""}) {
        CAPTURE(cell);
        CHECK(r.out.find(cell) != std::string::npos);
    }
    CHECK(r.out.find("\"rule\": \"sum-mismatch\"") != std::string::npos);
    // Printed once: the handover happens before anything is written.
    CHECK(r.out.find("\"tool\"") == r.out.rfind("\"tool\""));
}
