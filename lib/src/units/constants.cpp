// The rows of the table of named physical constants for the `{name}` notation.
//
// Policy for the value columns (see constants.hpp):
// - A constant fixed by definition (the SI defining constants of SI Brochure 9th ed., Table 1;
//   g_n and the standard atmosphere fixed by the CGPM) has `exact_text` equal to that exact
//   decimal and `value` the same number as a double.
// - A constant exact only as a product of defining constants (R, F, σ) has `exact_text` the
//   digits CODATA 2018 prints before its "...", and `value` the exact product (R, F: finite
//   decimals) or the exact expression evaluated to 40 digits (σ, which carries π^5), rounded
//   to a double. The test re-derives each from the defining constants.
// - A measured constant (G) has the CODATA 2018 recommended value; `source` gives its
//   uncertainty.
//
// Where the digits were checked: the defining constants and G against stored copies of the
// CODATA 2018 listing and of the SI defining constants; g_n against the 3rd CGPM's declaration
// (980.665 cm/s²) and 101325 Pa against the 10th CGPM's Resolution 4 as the BIPM publishes
// them. The printed forms of R, F and σ ("8.314 462 618...", "96 485.332 12...",
// "5.670 374 419... × 10^-8") were typed from memory and then matched only against secondary
// copies of CODATA 2018, not the primary table, so their sources say "from memory"; every
// digit of them is checked in tests/constants_test.cpp against the defining constants.
//
// Left out on purpose:
// - The density of water. It is a property of a substance, not a constant: it depends on
//   temperature (and slightly on pressure and isotopic make-up) and has no defined value
//   since the kilogram stopped being a litre of water. A formula that needs it should name
//   it as a variable with its own unit.
// - Local gravity `g`. It varies with latitude and height; `g_n` is the conventional value
//   that defines the kilogram-force, not the acceleration at any given site.
#include "plumb/constants.hpp"

#include <algorithm>
#include <array>
#include <span>
#include <string_view>

namespace plumb {

dimension physical_constant::dim() const {
    std::array<rational, base_dimension_count> e{};
    for (std::size_t i = 0; i < base_dimension_count; ++i)
        e[i] = rational(exponents[i]);
    return dimension::from_exponents(e);
}

namespace {

using exponents = std::array<std::int8_t, base_dimension_count>;

// Exponents in the order M L T Θ N I J (dimension.hpp).
constexpr exponents dims(int m, int l, int t, int th = 0, int n = 0, int i = 0, int j = 0) {
    return {static_cast<std::int8_t>(m),  static_cast<std::int8_t>(l), static_cast<std::int8_t>(t),
            static_cast<std::int8_t>(th), static_cast<std::int8_t>(n), static_cast<std::int8_t>(i),
            static_cast<std::int8_t>(j)};
}

enum class exactness : bool { measured, exact };

constexpr physical_constant row(std::string_view symbol, std::string_view name, exponents e,
                                double value, std::string_view text, exactness x,
                                std::string_view source) {
    return {symbol, name, e, value, text, x == exactness::exact, source};
}

constexpr std::string_view si_table_1 = "SI Brochure 9th ed. (2019), Table 1 (defining constant)";

constexpr std::array rows{
    // The SI defining constants (SI Brochure 9th ed., Table 1), exact since 20 May 2019.
    row("c_0", "speed of light in vacuum", dims(0, 1, -1), 299792458.0, "299792458",
        exactness::exact, si_table_1),
    row("h", "Planck constant", dims(1, 2, -1), 6.62607015e-34, "6.62607015e-34", exactness::exact,
        si_table_1),
    // Written q_e, not e: inside a formula `e` is read as Euler's number (e^x), and a constant
    // spelled the same would make `{e}` and `e` mean unrelated things a brace apart.
    row("q_e", "elementary charge", dims(0, 0, 1, 0, 0, 1), 1.602176634e-19, "1.602176634e-19",
        exactness::exact, si_table_1),
    row("k_B", "Boltzmann constant", dims(1, 2, -2, -1), 1.380649e-23, "1.380649e-23",
        exactness::exact, si_table_1),
    row("N_A", "Avogadro constant", dims(0, 0, 0, 0, -1), 6.02214076e23, "6.02214076e23",
        exactness::exact, si_table_1),

    // Exact since 2019 as products of defining constants. value: the exact product
    // N_A·k = 8.31446261815324 (a finite decimal); CODATA 2018 prints 8.314 462 618...
    row("R", "molar gas constant", dims(1, 2, -2, -1, -1), 8.31446261815324, "8.314462618",
        exactness::exact,
        "CODATA 2018, printed 8.314 462 618... (from memory; digits checked as N_A·k); "
        "exact since 2019 as N_A·k (SI Brochure 9th ed., Table 1)"),
    // value: the exact product N_A·e = 96485.3321233100184 (a finite decimal).
    row("F", "Faraday constant", dims(0, 0, 1, 0, -1, 1), 96485.3321233100184, "96485.33212",
        exactness::exact,
        "CODATA 2018, printed 96 485.332 12... (from memory; digits checked as N_A·e); "
        "exact since 2019 as N_A·e (SI Brochure 9th ed., Table 1)"),
    // value: 2π^5 k^4 / (15 h^3 c^2) evaluated to 40 digits, 5.6703744191844294539...e-8.
    row("\u03C3", "Stefan\u2013Boltzmann constant", dims(1, 0, -3, -4), 5.6703744191844295e-8,
        "5.670374419e-8", exactness::exact,
        "CODATA 2018, printed 5.670 374 419... e-8 (from memory; digits checked as "
        "2\u03C0^5 k^4/(15 h^3 c^2)); exact since 2019 as derived from k, h and c"),

    // Measured.
    row("G", "Newtonian constant of gravitation", dims(-1, 3, -2), 6.67430e-11, "6.67430e-11",
        exactness::measured,
        "CODATA 2018 (measured): 6.674 30(15) e-11, relative standard uncertainty 2.2e-5"),

    // Conventional values fixed by the CGPM.
    row("g_n", "standard acceleration of gravity", dims(0, 1, -2), 9.80665, "9.80665",
        exactness::exact,
        "3rd CGPM (1901), Resolution 2: conventional value of g_n, 980.665 cm/s\u00B2"),
    row("p_atm", "standard atmosphere", dims(1, -1, -2), 101325.0, "101325", exactness::exact,
        "10th CGPM (1954), Resolution 4: 1 standard atmosphere = 101 325 N/m\u00B2"),
};

// Second spellings: ASCII for Greek symbols, so a formula typed without Unicode still works.
struct alias {
    std::string_view spelling;
    std::string_view symbol;
};

constexpr std::array aliases{
    alias{"sigma", "\u03C3"},
    alias{"sigma_SB", "\u03C3"},
};

const physical_constant* by_symbol(std::string_view symbol) {
    const auto it = std::find_if(rows.begin(), rows.end(),
                                 [&](const physical_constant& c) { return c.symbol == symbol; });
    return it == rows.end() ? nullptr : &*it;
}

} // namespace

const physical_constant* find_constant(std::string_view symbol) {
    if (const physical_constant* c = by_symbol(symbol))
        return c;
    for (const alias& a : aliases)
        if (a.spelling == symbol)
            return by_symbol(a.symbol);
    return nullptr;
}

std::span<const physical_constant> constants() {
    return rows;
}

} // namespace plumb
