// The table of named physical constants. Expected values are typed here from the publication
// named beside them, never read back from the table, and the constants that follow from others
// are re-derived from the SI defining constants, so a wrong digit in a row fails here.
#include "plumb/constants.hpp"
#include "plumb/unit_table.hpp"

#include <doctest/doctest.h>

#include <cmath>
#include <cstdlib>
#include <numbers>
#include <set>
#include <string>
#include <string_view>

using plumb::dimension;
using plumb::find_constant;
using plumb::physical_constant;
using plumb::unit_table;

namespace {

const physical_constant& must_find(std::string_view symbol) {
    const physical_constant* c = find_constant(symbol);
    REQUIRE_MESSAGE(c != nullptr, "unknown constant: ", std::string(symbol));
    return *c;
}

// The dimension of a unit symbol, from the built-in unit table.
dimension unit(std::string_view symbol) {
    const auto r = unit_table::standard().resolve(symbol);
    REQUIRE_MESSAGE(r.has_value(), "unresolved unit: ", std::string(symbol));
    return r->dim();
}

double parse(std::string_view text) {
    const std::string s(text);
    char* end = nullptr;
    const double v = std::strtod(s.c_str(), &end);
    REQUIRE_MESSAGE(end == s.c_str() + s.size(), "not a number: ", s);
    return v;
}

// One unit in the last place of a published decimal: "5.670374419e-8" -> 1e-17.
double last_place(std::string_view text) {
    const std::size_t e = text.find_first_of("eE");
    const std::string_view mantissa = text.substr(0, e);
    const int exponent =
        e == std::string_view::npos ? 0 : std::atoi(std::string(text.substr(e + 1)).c_str());
    const std::size_t point = mantissa.find('.');
    const int decimals =
        point == std::string_view::npos ? 0 : static_cast<int>(mantissa.size() - point - 1);
    return std::pow(10.0, exponent - decimals);
}

bool close(double a, double b, double relative) {
    return std::abs(a - b) <= relative * std::abs(b);
}

// SI defining constants, typed from SI Brochure 9th ed. (2019), Table 1.
constexpr double c_si = 299792458.0;
constexpr double h_si = 6.62607015e-34;
constexpr double e_si = 1.602176634e-19;
constexpr double k_si = 1.380649e-23;
constexpr double na_si = 6.02214076e23;

} // namespace

TEST_CASE("constants: each dimension equals that of its SI unit from the unit table") {
    const dimension one;
    const dimension m = unit("m");
    const dimension s = unit("s");
    const dimension kg = unit("kg");
    const dimension K = unit("K");
    const dimension mol = unit("mol");

    CHECK(must_find("c_0").dim() == m / s);
    CHECK(must_find("h").dim() == unit("J") * s);
    CHECK(must_find("q_e").dim() == unit("C"));
    CHECK(must_find("k_B").dim() == unit("J") / K);
    CHECK(must_find("N_A").dim() == one / mol);
    CHECK(must_find("R").dim() == unit("J") / (mol * K));
    CHECK(must_find("F").dim() == unit("C") / mol);
    CHECK(must_find("\u03C3").dim() == unit("W") / (m.pow(2) * K.pow(4)));
    CHECK(must_find("G").dim() == m.pow(3) / (kg * s.pow(2)));
    CHECK(must_find("g_n").dim() == m / s.pow(2));
    CHECK(must_find("p_atm").dim() == unit("Pa"));

    // The forms in which a formula uses them: a weight is m·g_n, p·V = n·R·T, q = ε·σ·T^4.
    CHECK(kg * must_find("g_n").dim() == unit("N"));
    CHECK(unit("Pa") * m.pow(3) == mol * must_find("R").dim() * K);
    CHECK(must_find("\u03C3").dim() * K.pow(4) == unit("W") / m.pow(2));
}

TEST_CASE("constants: values typed from their publications") {
    // SI Brochure 9th ed., Table 1: the defining constants are exact decimals.
    CHECK(must_find("c_0").value == c_si);
    CHECK(must_find("h").value == h_si);
    CHECK(must_find("q_e").value == e_si);
    CHECK(must_find("k_B").value == k_si);
    CHECK(must_find("N_A").value == na_si);
    // 3rd CGPM (1901): 980.665 cm/s²; 10th CGPM (1954), Resolution 4: 101 325 N/m².
    CHECK(must_find("g_n").value == 9.80665);
    CHECK(must_find("p_atm").value == 101325.0);
    // CODATA 2018: G = 6.674 30(15) × 10^-11 m^3 kg^-1 s^-2.
    CHECK(must_find("G").value == 6.67430e-11);
}

TEST_CASE("constants: R, F and sigma follow from the SI defining constants") {
    // SI Brochure 9th ed. (2019): R = N_A·k and F = N_A·e, both exact.
    CHECK(close(must_find("R").value, na_si * k_si, 1e-15));
    CHECK(close(must_find("F").value, na_si * e_si, 1e-15));
    // σ = 2π^5 k^4 / (15 h^3 c^2). The row holds the expression evaluated to 40 digits, so it
    // agrees with this double evaluation far inside the 1e-9 that CODATA's 10 printed digits
    // would allow.
    const double pi = std::numbers::pi;
    const double sigma =
        2.0 * std::pow(pi, 5) * std::pow(k_si, 4) / (15.0 * std::pow(h_si, 3) * std::pow(c_si, 2));
    CHECK(close(must_find("\u03C3").value, sigma, 1e-13));
    CHECK(close(must_find("\u03C3").value, sigma, 1e-9));
}

TEST_CASE("constants: published text agrees with the value") {
    for (const physical_constant& c : plumb::constants()) {
        CAPTURE(std::string(c.symbol));
        CAPTURE(std::string(c.exact_text));
        const double printed = parse(c.exact_text);
        if (c.symbol == "R" || c.symbol == "F" || c.symbol == "\u03C3") {
            // CODATA prints these exact values cut short with "...": the value must round to
            // the printed digits, and the printed digits are not the whole value.
            CHECK(std::abs(c.value - printed) <= 0.5 * last_place(c.exact_text));
            CHECK(c.value != printed);
        } else {
            CHECK(c.value == printed);
        }
    }
    // The printed digits themselves, typed from CODATA 2018's listing.
    CHECK(must_find("R").exact_text == "8.314462618");
    CHECK(must_find("F").exact_text == "96485.33212");
    CHECK(must_find("\u03C3").exact_text == "5.670374419e-8");
}

TEST_CASE("constants: exact by definition or derivation, G measured") {
    for (std::string_view s : {"c_0", "h", "q_e", "k_B", "N_A"}) {
        CAPTURE(std::string(s));
        CHECK(must_find(s).exact);
        CHECK(must_find(s).source.find("SI Brochure 9th ed.") != std::string_view::npos);
        CHECK(must_find(s).source.find("Table 1") != std::string_view::npos);
    }
    for (std::string_view s : {"R", "F", "\u03C3", "g_n", "p_atm"}) {
        CAPTURE(std::string(s));
        CHECK(must_find(s).exact);
    }
    CHECK_FALSE(must_find("G").exact);
    CHECK(must_find("G").source.find("CODATA 2018") != std::string_view::npos);
    CHECK(must_find("g_n").source.find("3rd CGPM (1901)") != std::string_view::npos);
    CHECK(must_find("p_atm").source.find("10th CGPM (1954)") != std::string_view::npos);
}

TEST_CASE("constants: lookup, aliases and unknown names") {
    const physical_constant& sigma = must_find("\u03C3");
    CHECK(find_constant("sigma") == &sigma);
    CHECK(find_constant("sigma_SB") == &sigma);
    CHECK(must_find("g_n").name == "standard acceleration of gravity");

    // `e` stays Euler's number: the elementary charge is q_e.
    CHECK(find_constant("e") == nullptr);
    CHECK(must_find("q_e").name == "elementary charge");
    // Case matters: G is gravitation, g is no constant (local gravity varies).
    CHECK(find_constant("g") == nullptr);
    CHECK(find_constant("r") == nullptr);
    CHECK(find_constant("SIGMA") == nullptr);
    CHECK(find_constant("") == nullptr);
    CHECK(find_constant("{R}") == nullptr);
    CHECK(find_constant("R ") == nullptr);
    // Left out on purpose: water's density depends on temperature.
    CHECK(find_constant("rho_w") == nullptr);
    CHECK(find_constant("rho_water") == nullptr);
}

TEST_CASE("constants: the table is well formed") {
    std::set<std::string_view> symbols;
    for (const physical_constant& c : plumb::constants()) {
        CAPTURE(std::string(c.symbol));
        CHECK(symbols.insert(c.symbol).second);
        CHECK(find_constant(c.symbol) == &c);
        CHECK_FALSE(c.name.empty());
        CHECK_FALSE(c.source.empty());
        CHECK(c.value > 0.0);
        CHECK_FALSE(c.dim().is_dimensionless());
    }
    CHECK(symbols.size() == 11);
    // Aliases are not rows of their own.
    CHECK(symbols.count("sigma") == 0);
    CHECK(symbols.count("sigma_SB") == 0);
}
