// The built-in unit table. Every expected factor and dimension below is typed from the
// publication named beside it, never read back from the table, so a wrong row fails here.
#include "plumb/unit_table.hpp"

#include "test_support.hpp"
#include "units/exact_factor.hpp"

#include <doctest/doctest.h>

#include <algorithm>
#include <cmath>
#include <cstdint>
#include <map>
#include <optional>
#include <set>
#include <string>
#include <string_view>
#include <utility>
#include <vector>

using plumb::dimension;
using plumb::rational;
using plumb::resolved_unit;
using plumb::unit_definition;
using plumb::unit_scale;
using plumb::unit_table;

namespace {

using plumb::test::typed;

const unit_table& table() {
    return unit_table::standard();
}

resolved_unit must_resolve(std::string_view symbol) {
    const auto r = table().resolve(symbol);
    REQUIRE_MESSAGE(r.has_value(), "unresolved: ", std::string(symbol));
    return *r;
}

// Asserts that `symbol` has dimension `expected` and a factor equal to `exact` up to the
// rounding of a double.
void check_exact(std::string_view symbol, const dimension& expected, double exact) {
    CAPTURE(std::string(symbol));
    const resolved_unit r = must_resolve(symbol);
    CHECK(r.dim() == expected);
    CHECK(r.factor() == doctest::Approx(exact).epsilon(1e-14));
}

// Asserts a factor that the source prints rounded: the table's value must round to the printed
// digits, so it may differ by at most half a unit in the last printed place.
void check_printed(std::string_view symbol, const dimension& expected, double printed,
                   double last_place) {
    CAPTURE(std::string(symbol));
    CAPTURE(printed);
    const resolved_unit r = must_resolve(symbol);
    CHECK(r.dim() == expected);
    CHECK(std::abs(r.factor() - printed) <= 0.5 * last_place * (1.0 + 1e-9));
}

const dimension pressure = typed(1, -1, -2);
const dimension energy = typed(1, 2, -2);

} // namespace

TEST_CASE("SI base units are coherent (SI Brochure 9th ed., Table 2)") {
    check_exact("m", typed(0, 1, 0), 1.0);
    check_exact("kg", typed(1, 0, 0), 1.0);
    check_exact("s", typed(0, 0, 1), 1.0);
    check_exact("A", typed(0, 0, 0, 0, 0, 1), 1.0);
    check_exact("K", typed(0, 0, 0, 1), 1.0);
    check_exact("mol", typed(0, 0, 0, 0, 1), 1.0);
    check_exact("cd", typed(0, 0, 0, 0, 0, 0, 1), 1.0);
    // Prefixes attach to the gram (SI Brochure 9th ed., section 3).
    check_exact("g", typed(1, 0, 0), 1e-3);
}

TEST_CASE("the 22 derived units with special names, in base units (SI Brochure 9th ed., "
          "Table 4)") {
    const auto& expected = plumb::test::si_derived_units();
    CHECK(expected.size() == 22);
    for (const auto& r : expected) {
        const std::string_view symbol = r.symbol;
        CAPTURE(std::string(symbol));
        const resolved_unit u = must_resolve(r.symbol);
        CHECK(u.prefix == nullptr);
        CHECK(u.dim() == r.dim);
        CHECK(u.factor() == 1.0);
        CHECK(u.unit->takes_prefixes != (symbol == "\u00B0C"));
    }
}

TEST_CASE("spellings of the ohm and of the degrees (common practice)") {
    const dimension resistance = typed(1, 2, -3, 0, 0, -2);
    check_exact("ohm", resistance, 1.0);
    check_exact("\u2126", resistance, 1.0); // OHM SIGN
    check_exact("k\u03A9", resistance, 1e3);
    check_exact("Mohm", resistance, 1e6);
    CHECK(must_resolve("degC").unit->offset == must_resolve("\u00B0C").unit->offset);
    CHECK(must_resolve("degF").unit->offset == must_resolve("\u00B0F").unit->offset);
    check_exact("deg", typed(0, 0, 0), 3.14159265358979323846 / 180.0);
}

TEST_CASE("non-SI units accepted for use with the SI (SI Brochure 9th ed., Table 8)") {
    check_exact("min", typed(0, 0, 1), 60.0);
    check_exact("h", typed(0, 0, 1), 3600.0);
    check_exact("d", typed(0, 0, 1), 86400.0);
    check_exact("au", typed(0, 1, 0), 149597870700.0);
    const double pi = 3.14159265358979323846;
    check_exact("\u00B0", typed(0, 0, 0), pi / 180.0);
    check_exact("\u2032", typed(0, 0, 0), pi / 10800.0);
    check_exact("arcmin", typed(0, 0, 0), pi / 10800.0);
    check_exact("\u2033", typed(0, 0, 0), pi / 648000.0);
    check_exact("arcsec", typed(0, 0, 0), pi / 648000.0);
    check_exact("ha", typed(0, 2, 0), 1e4);
    check_exact("L", typed(0, 3, 0), 1e-3);
    check_exact("l", typed(0, 3, 0), 1e-3);
    check_exact("t", typed(1, 0, 0), 1e3);
    check_exact("eV", energy, 1.602176634e-19);
    // CODATA 2018 (from memory): m_u = 1.66053906660(50)e-27 kg.
    check_printed("Da", typed(1, 0, 0), 1.66053906660e-27, 1e-38);
    // Logarithmic units are deliberately absent: no factor relates them to the SI.
    CHECK_FALSE(table().resolve("dB").has_value());
    CHECK_FALSE(table().resolve("Np").has_value());
}

TEST_CASE("lengths, areas and volumes (NIST SP 811 (2008), Appendix B.8/B.9)") {
    const dimension length = typed(0, 1, 0);
    const dimension area = typed(0, 2, 0);
    const dimension volume = typed(0, 3, 0);
    check_exact("ft", length, 0.3048);    // 3.048 E-01, exact
    check_exact("in", length, 0.0254);    // 2.54 E-02, exact
    check_exact("yd", length, 0.9144);    // 9.144 E-01, exact
    check_exact("mi", length, 1609.344);  // 1.609344 E+03, exact
    check_exact("nmi", length, 1852.0);   // 1.852 E+03, exact
    check_exact("mil", length, 2.54e-5);  // 2.54 E-05, exact
    check_exact("ft2", area, 0.09290304); // 9.290304 E-02, exact
    check_exact("in2", area, 6.4516e-4);  // 6.4516 E-04, exact
    check_printed("acre", area, 4.046873e3, 1e-3);
    // Circular mil: NIST SP 811 (2008), B.8 prints 5.067075E-10 m^2; kcmil is 1000 of them.
    check_printed("cmil", area, 5.067075e-10, 1e-16);
    check_printed("kcmil", area, 5.067075e-7, 1e-13);
    check_printed("ft3", volume, 2.831685e-2, 1e-8);
    check_printed("in3", volume, 1.638706e-5, 1e-11);
    check_printed("gal", volume, 3.785412e-3, 1e-9);
    check_printed("bbl", volume, 1.589873e-1, 1e-7);
    // pint and quart (U.S. liquid), not a picotonne or a quectotonne.
    check_printed("pt", volume, 4.731765e-4, 1e-10);
    check_printed("qt", volume, 9.463529e-4, 1e-10);
    check_printed("darcy", area, 9.869233e-13, 1e-19);
    check_printed("D", area, 9.869233e-13, 1e-19);
    // The millidarcy is not printed by NIST: a thousandth of the printed darcy.
    check_printed("mD", area, 9.869233e-16, 1e-22);
}

TEST_CASE("mass and force (NIST SP 811 (2008), Appendix B.8/B.9)") {
    const dimension mass = typed(1, 0, 0);
    const dimension force = typed(1, 1, -2);
    check_printed("lb", mass, 4.535924e-1, 1e-7);
    check_printed("lbm", mass, 4.535924e-1, 1e-7);
    check_printed("oz", mass, 2.834952e-2, 1e-8); // ounce (avoirdupois)
    check_printed("slug", mass, 1.459390e1, 1e-5);
    check_printed("ton", mass, 9.071847e2, 1e-4);
    check_printed("lbf", force, 4.448222, 1e-6);
    check_printed("kip", force, 4.448222e3, 1e-3);
    check_exact("kgf", force, 9.80665); // 9.80665 E+00, exact
}

TEST_CASE("pressure (NIST SP 811 (2008), Appendix B.8/B.9)") {
    check_printed("psi", pressure, 6.894757e3, 1e-3);
    check_printed("psia", pressure, 6.894757e3, 1e-3);
    check_printed("ksi", pressure, 6.894757e6, 1.0);
    check_exact("atm", pressure, 101325.0); // 1.01325 E+05, exact
    check_exact("bar", pressure, 1e5);      // 1.0 E+05, exact
    check_printed("torr", pressure, 1.333224e2, 1e-4);
    check_printed("Torr", pressure, 1.333224e2, 1e-4);
    check_printed("mmHg", pressure, 1.333224e2, 1e-4);
    check_printed("inHg", pressure, 3.386389e3, 1e-3);
    check_printed("inH2O", pressure, 2.490889e2, 1e-4);
    check_printed("mmH2O", pressure, 9.80665, 1e-6);
    check_printed("ftH2O", pressure, 2.989067e3, 1e-3);
}

TEST_CASE("gauge pressures read from the standard atmosphere (common practice)") {
    for (std::string_view symbol : {"psig", "barg", "kPag"}) {
        CAPTURE(std::string(symbol));
        const resolved_unit r = must_resolve(symbol);
        CHECK(r.dim() == pressure);
        CHECK(r.unit->scale == unit_scale::gauge);
        // 0 gauge is one standard atmosphere, 101325 Pa (NIST SP 811 (2008), B.8).
        CHECK(r.unit->offset == 101325.0);
    }
    // 14.7 psig is roughly two atmospheres absolute: 14.7 psi ≈ 101353 Pa by NIST's printed
    // 6.894757E+03 Pa/psi.
    const unit_definition& psig = *must_resolve("psig").unit;
    CHECK(psig.factor * 14.7 + psig.offset == doctest::Approx(101325.0 + 14.7 * 6894.757));
}

TEST_CASE("energy, power and temperature (NIST SP 811 (2008), Appendix B.8/B.9)") {
    check_printed("Btu", energy, 1.055056e3, 1e-3);
    check_printed("Btu_IT", energy, 1.055056e3, 1e-3);
    check_exact("cal", energy, 4.1868);   // 4.1868 E+00, exact
    check_exact("cal_th", energy, 4.184); // 4.184 E+00, exact
    check_exact("kcal", energy, 4186.8);  // kilocalorie_IT 4.1868 E+03, exact
    check_exact("kWh", energy, 3.6e6);    // 3.6 E+06, exact
    check_exact("GWh", energy, 3.6e12);   // kW·h × 10⁶, generation reports (common practice)
    check_exact("TWh", energy, 3.6e15);   // kW·h × 10⁹
    check_printed("hp", typed(1, 2, -3), 7.456999e2, 1e-4);

    const dimension temperature = typed(0, 0, 0, 1);
    // T/K = (t/°F + 459.67)/1.8; the formula is typed here, the table's rows are not.
    const unit_definition& fahrenheit = *must_resolve("\u00B0F").unit;
    CHECK(fahrenheit.dim() == temperature);
    CHECK(fahrenheit.scale == unit_scale::offset);
    for (double t : {-459.67, -40.0, 32.0, 98.6, 212.0}) {
        CAPTURE(t);
        CHECK(fahrenheit.factor * t + fahrenheit.offset ==
              doctest::Approx((t + 459.67) / 1.8).epsilon(1e-12));
    }
    // T/K = t/°C + 273.15, the defining relation of the degree Celsius (SI Brochure 9th ed.).
    const unit_definition& celsius = *must_resolve("\u00B0C").unit;
    CHECK(celsius.factor * 100.0 + celsius.offset == doctest::Approx(373.15));
    // T/K = (T/°R)/1.8, on a ratio scale.
    const unit_definition& rankine = *must_resolve("degR").unit;
    CHECK(rankine.scale == unit_scale::absolute);
    CHECK(rankine.factor * 491.67 + rankine.offset == doctest::Approx(273.15));
}

TEST_CASE("velocity, viscosity and flow (NIST SP 811 (2008), Appendix B.8/B.9)") {
    check_exact("mph", typed(0, 1, -1), 0.44704); // 4.4704 E-01, exact
    check_printed("knot", typed(0, 1, -1), 5.144444e-1, 1e-7);
    check_printed("kn", typed(0, 1, -1), 5.144444e-1, 1e-7);
    check_exact("P", typed(1, -1, -1), 0.1);   // poise 1.0 E-01 Pa·s
    check_exact("cP", typed(1, -1, -1), 1e-3); // centipoise 1.0 E-03 Pa·s
    check_exact("St", typed(0, 2, -1), 1e-4);  // stokes 1.0 E-04 m²/s
    check_exact("cSt", typed(0, 2, -1), 1e-6); // centistokes 1.0 E-06 m²/s
    check_printed("gpm", typed(0, 3, -1), 6.309020e-5, 1e-11);
    check_printed("cfm", typed(0, 3, -1), 4.719474e-4, 1e-10);
}

TEST_CASE("units the trades type (NIST SP 811 (2008), Appendix B.8, printed digits from memory; "
          "the rest as named)") {
    const dimension flow = typed(0, 3, -1);
    const dimension volume = typed(0, 3, 0);
    const dimension power = typed(1, 2, -3);
    check_printed("cfs", flow, 2.831685e-2, 1e-8); // cubic foot per second
    check_exact("fpm", typed(0, 1, -1), 5.08e-3);  // foot per minute, 5.08 E-03, exact
    check_exact("gal_imp", volume, 4.54609e-3);    // gallon (Imperial) 4.54609 E-03, exact
    check_exact("igpm", flow, 4.54609e-3 / 60.0);  // that gallon over the minute
    check_exact("dyn", typed(1, 1, -2), 1e-5);     // dyne 1.0 E-05 N, exact
    check_exact("erg", energy, 1e-7);              // erg 1.0 E-07 J, exact
    check_printed("TR", power, 3.516853e3, 1e-3);  // ton of refrigeration (12 000 Btu_IT/h)
    check_printed("tonR", power, 3.516853e3, 1e-3);
    check_printed("ppg", typed(1, -3, 0), 1.198264e2, 1e-4); // pound per gallon (U.S.)
    check_exact("cp", typed(1, -1, -1), 1e-3); // centipoise 1.0 E-03 Pa·s, lower case
    // The day: 86 400 s (SI Brochure 9th ed., Table 8).
    check_exact("day", typed(0, 0, 1), 86400.0);
    // Million U.S. gallons a day (common practice): 1e6 × 3.785411784e-3 m³ / 86 400 s.
    check_exact("mgd", flow, 1e6 * 3.785411784e-3 / 86400.0);
    // Revolutions counted as cycles (common practice): 1 r/min = 1/60 s⁻¹, 1 rev = 1.
    check_exact("rpm", typed(0, 0, -1), 1.0 / 60.0);
    check_exact("r", typed(0, 0, 0), 1.0);
    check_exact("rev", typed(0, 0, 0), 1.0);
    // Apparent and reactive power are watts to the dimension (IEC 80000-6, from memory).
    check_exact("VA", power, 1.0);
    check_exact("kVA", power, 1e3);
    check_exact("var", power, 1.0);
    check_exact("Mvar", power, 1e6);
    // Oilfield volumes (SPE convention, from memory: M = 10^3, MM = 10^6, not the SI mega).
    check_printed("scf", volume, 2.831685e-2, 1e-8);
    check_printed("Mscf", volume, 2.831685e1, 1e-5);
    check_printed("MMscf", volume, 2.831685e4, 1e-2);
    check_printed("STB", volume, 1.589873e-1, 1e-7); // stock-tank barrel = 42 U.S. gal
    check_printed("stb", volume, 1.589873e-1, 1e-7);
    // Percent: 0.01 (SI Brochure 9th ed., 5.4.7).
    check_exact("%", typed(0, 0, 0), 0.01);
    // Gauge kilopascal: zero at one standard atmosphere (common practice), 101 325 Pa.
    const unit_definition& kpag = *must_resolve("kPag").unit;
    CHECK(kpag.dim() == pressure);
    CHECK(kpag.scale == unit_scale::gauge);
    CHECK(kpag.factor == 1000.0);
    CHECK(kpag.offset == 101325.0);
}

TEST_CASE("every exact_factor text agrees with its double") {
    const double pi = 3.14159265358979323846;
    for (const unit_definition& row : table().units()) {
        CAPTURE(std::string(row.symbol));
        CAPTURE(std::string(row.exact_factor));
        if (const auto exact = rational::parse(row.exact_factor)) {
            CHECK(row.factor == doctest::Approx(exact->to_double()).epsilon(1e-15));
        } else if (row.exact_factor.starts_with("pi/4*")) {
            // The circular mils: a circle's area, π/4 times the square of its diameter.
            const auto square = rational::parse(row.exact_factor.substr(5));
            REQUIRE(square.has_value());
            CHECK(row.factor == doctest::Approx(pi / 4.0 * square->to_double()).epsilon(1e-15));
        } else if (row.exact_factor.starts_with("pi/")) {
            const auto divisor = rational::parse(row.exact_factor.substr(3));
            REQUIRE(divisor.has_value());
            CHECK(row.factor == doctest::Approx(pi / divisor->to_double()).epsilon(1e-15));
        } else {
            // Too many digits for a 64-bit fraction (the electronvolt, the dalton): the text
            // still has to be a number the double came from.
            CHECK(row.factor ==
                  doctest::Approx(std::stod(std::string(row.exact_factor))).epsilon(1e-15));
        }
    }
}

TEST_CASE("rows are well formed") {
    std::set<std::string_view> symbols;
    for (const unit_definition& row : table().units()) {
        CAPTURE(std::string(row.symbol));
        CHECK_FALSE(row.symbol.empty());
        CHECK_FALSE(row.name.empty());
        CHECK_FALSE(row.source.empty());
        CHECK(row.factor > 0.0);
        CHECK(symbols.insert(row.symbol).second);
        CHECK((row.offset == 0.0) == (row.scale == unit_scale::absolute));
        if (row.scale != unit_scale::absolute)
            CHECK_FALSE(row.takes_prefixes);
        if (row.scale == unit_scale::gauge)
            CHECK(row.source.find("standard atmosphere") != std::string_view::npos);
        // A symbol must be resolvable as written, and to itself.
        const auto r = table().resolve(row.symbol);
        REQUIRE(r.has_value());
        CHECK(r->unit == &row);
        CHECK(r->prefix == nullptr);
    }
}

TEST_CASE("SI prefixes: SI Brochure 9th ed., Table 7, and the 27th CGPM (2022)") {
    const std::map<std::string_view, int> expected = {
        {"Q", 30},  {"R", 27},  {"Y", 24},  {"Z", 21},      {"E", 18},  {"P", 15},
        {"T", 12},  {"G", 9},   {"M", 6},   {"k", 3},       {"h", 2},   {"da", 1},
        {"d", -1},  {"c", -2},  {"m", -3},  {"\u00B5", -6}, {"n", -9},  {"p", -12},
        {"f", -15}, {"a", -18}, {"z", -21}, {"y", -24},     {"r", -27}, {"q", -30},
    };
    CHECK(table().prefixes().size() == expected.size());
    for (const auto& p : table().prefixes()) {
        CAPTURE(std::string(p.symbol));
        const auto it = expected.find(p.symbol);
        REQUIRE(it != expected.end());
        CHECK(p.power_of_ten == it->second);
    }
}

TEST_CASE("prefixed SI units resolve") {
    struct row {
        std::string_view symbol;
        std::string_view unit;
        double factor;
    };
    const row cases[] = {
        {"kPa", "Pa", 1e3},     {"mm", "m", 1e-3},
        {"\u00B5m", "m", 1e-6}, {"\u03BCm", "m", 1e-6},
        {"um", "m", 1e-6},      {"MW", "W", 1e6},
        {"GPa", "Pa", 1e9},     {"daN", "N", 10.0},
        {"mbar", "bar", 100.0}, {"mg", "g", 1e-6},
        {"kN", "N", 1e3},       {"mL", "L", 1e-6},
        {"ms", "s", 1e-3},      {"keV", "eV", 1.602176634e-16},
        {"kt", "t", 1e6},       {"hPa", "Pa", 100.0},
        {"dam", "m", 10.0},     {"QJ", "J", 1e30},
    };
    for (const row& c : cases) {
        CAPTURE(std::string(c.symbol));
        const resolved_unit r = must_resolve(c.symbol);
        CHECK(r.unit->symbol == c.unit);
        REQUIRE(r.prefix != nullptr);
        CHECK(r.factor() == doctest::Approx(c.factor).epsilon(1e-14));
    }
}

TEST_CASE("an exact symbol wins over a prefix reading") {
    CHECK(must_resolve("min").unit->name == "minute"); // not milli-inch
    CHECK(must_resolve("ft").unit->name == "foot");    // not femto-tonne
    CHECK(must_resolve("Pa").unit->name == "pascal");
    CHECK(must_resolve("cd").unit->name == "candela"); // not centi-day
    CHECK(must_resolve("mi").unit->name.starts_with("mile"));
    CHECK(must_resolve("nmi").unit->name.starts_with("nautical mile"));
    CHECK(must_resolve("kat").unit->name == "katal");
    CHECK(must_resolve("min").factor() == 60.0);
    CHECK(must_resolve("ft").prefix == nullptr);
}

// Every prefix spelling on every unit that takes prefixes must read one way only, and an
// exact row may hide a prefix reading only where the decision is documented in the table.
TEST_CASE("no prefixed spelling is ambiguous or silently shadowed") {
    std::vector<std::string_view> spellings;
    for (const auto& p : table().prefixes())
        spellings.push_back(p.symbol);
    spellings.push_back("\u03BC");
    spellings.push_back("u");

    std::map<std::string, int> readings;
    std::set<std::string> shadowed;
    for (std::string_view p : spellings) {
        for (const unit_definition& row : table().units()) {
            if (!row.takes_prefixes)
                continue;
            const std::string combined = std::string(p) + std::string(row.symbol);
            ++readings[combined];
            const resolved_unit r = must_resolve(combined);
            if (r.prefix == nullptr)
                shadowed.insert(combined);
            else
                CHECK_MESSAGE(r.unit == &row, combined);
        }
    }
    // Named members, not a structured binding: clang 14 cannot capture bindings in the
    // lambdas the assertion macros expand to.
    for (const auto& reading : readings)
        CHECK_MESSAGE(reading.second == 1, reading.first);
    // "ft" hides the femtotonne, "pt" the picotonne and "qt" the quectotonne, which nobody
    // writes (the foot, the pint and the quart are meant); "kg" hides k+g, which means the same.
    CHECK(shadowed == std::set<std::string>{"ft", "kg", "pt", "qt"});
    CHECK(must_resolve("kg").factor() == doctest::Approx(1e3 * must_resolve("g").factor()));
}

TEST_CASE("prefixes never attach to units that refuse them") {
    // "kft" is a row of its own (ohms per 1000 ft), not k + ft.
    CHECK(must_resolve("kft").unit->name == "thousand feet");
    // The plumbing trade's fps and gph are rows, no prefix on anything (NIST SP 811 (2008),
    // B.8: 1 ft = 0.3048 m, 1 gal = 3.785412 L).
    CHECK(must_resolve("fps").factor() == doctest::Approx(0.3048));
    CHECK(must_resolve("gph").factor() == doctest::Approx(3.785411784e-3 / 3600.0));
    // Line loads per linear foot, gallons a day, thousands of pounds (NIST SP 811 (2008), B.8).
    CHECK(must_resolve("plf").factor() == doctest::Approx(4.4482216152605 / 0.3048));
    CHECK(must_resolve("klf").factor() == doctest::Approx(4448.2216152605 / 0.3048));
    CHECK(must_resolve("gpd").factor() == doctest::Approx(3.785411784e-3 / 86400.0));
    CHECK(must_resolve("klb").factor() == doctest::Approx(453.59237));
    // "kcal_th" is a row too (kinetics tables' kilocalorie), never k + cal_th.
    CHECK(must_resolve("kcal_th").unit->name == "kilocalorie (thermochemical)");
    for (std::string_view symbol : {"kpsi", "Mft", "kmin", "kh", "mpsi", "kkg", "kkm", "m\u00B0C",
                                    "kdegC", "kbbl", "kcP", "mhp", "MBtu",
                                    // "M" on oilfield volumes is the trade's thousand, never
                                    // the SI mega: only the rows Mscf and MMscf read it.
                                    "Mbbl", "kscf", "MSTB", "krpm", "kmgd"}) {
        CAPTURE(std::string(symbol));
        CHECK_FALSE(table().resolve(symbol).has_value());
    }
}

TEST_CASE("unknown symbols resolve to nothing and suggest near ones") {
    for (std::string_view symbol : {"", "k", "Pas", "psq", "furlong", "u", "\u03BC", "da"}) {
        CAPTURE(std::string(symbol));
        CHECK_FALSE(table().resolve(symbol).has_value());
    }
    const auto pas = table().nearest("Pas");
    REQUIRE_FALSE(pas.empty());
    CHECK(pas.front() == "Pa");

    const auto psq = table().nearest("psq");
    CHECK(std::find(psq.begin(), psq.end(), "psi") != psq.end());
    // US floor, wall and soil loads (NIST SP 811 (2008), B.8: 1 lbf/ft² = 47.88026 Pa).
    CHECK(table().resolve("psf")->unit->factor == doctest::Approx(47.88026).epsilon(1e-7));
    CHECK(table().resolve("ksf")->unit->factor == doctest::Approx(47880.26).epsilon(1e-7));
    // Unit weights in pcf (NIST SP 811 (2008), B.8: 1 lbf/ft³ = 1.570875E+02 N/m³), and the gas
    // trade's daily rates in one word: 1 MMscfd = 28316.85 m³ over 86400 s (ft³ 2.831685E-02
    // m³, B.8; the day, SI Brochure 9th ed., Table 8).
    CHECK(table().resolve("pcf")->unit->factor == doctest::Approx(157.0875).epsilon(1e-6));
    CHECK(table().resolve("MMscfd")->unit->factor ==
          doctest::Approx(28316.846592 / 86400.0).epsilon(1e-12));
    CHECK(table().resolve("Mscfd")->unit->factor ==
          doctest::Approx(28.316846592 / 86400.0).epsilon(1e-12));
    CHECK(table().resolve("scfd")->unit->factor ==
          doctest::Approx(0.028316846592 / 86400.0).epsilon(1e-12));
    // Gas bills and heating plant (NIST SP 811 (2008), B.8: therm (EC) 1.055056E+08 J; Btu_IT
    // 1055.056 J; ft³/min 4.719474E-04 m³/s), and the gas trade's flows at reference
    // conditions (common practice).
    CHECK(table().resolve("therm")->unit->factor == doctest::Approx(1.055056e8).epsilon(1e-6));
    CHECK(table().resolve("MMBtu")->unit->factor == doctest::Approx(1.055056e9).epsilon(1e-6));
    CHECK(table().resolve("MBH")->unit->factor == doctest::Approx(293.0711).epsilon(1e-6));
    CHECK(table().resolve("scfm")->unit->factor == doctest::Approx(4.719474e-4).epsilon(1e-6));
    CHECK(table().resolve("scfh")->unit->factor == doctest::Approx(7.865791e-6).epsilon(1e-6));
    CHECK(table().resolve("acfm")->unit->factor == doctest::Approx(4.719474e-4).epsilon(1e-6));

    // A change of case is the cheapest edit.
    const auto pa = table().nearest("pa");
    REQUIRE_FALSE(pa.empty());
    CHECK(pa.front() == "Pa");

    // Names count too, as do plurals, swapped letters and abbreviations of names.
    const std::pair<std::string_view, std::string_view> first_suggestion[] = {
        {"kelvin", "K"}, {"ohms", "ohm"}, {"meter", "m"}, {"gallon", "gal"},
        {"sec", "s"},    {"lbs", "lb"},   {"Pa·s", "Pa"},
    };
    for (const auto& typed_and_expected : first_suggestion) {
        CAPTURE(std::string(typed_and_expected.first));
        const auto suggestions = table().nearest(typed_and_expected.first);
        REQUIRE_FALSE(suggestions.empty());
        CHECK(suggestions.front() == typed_and_expected.second);
    }

    // One suggestion per unit, however many spellings it has (Ω, the ohm sign, "ohm").
    const auto near_ohm = table().nearest("ohmm", 10);
    std::set<std::string_view> names;
    for (std::string_view s : near_ohm)
        CHECK_MESSAGE(names.insert(must_resolve(s).unit->name).second, std::string(s));

    CHECK(table().nearest("Pas", 1).size() == 1);
    CHECK(table().nearest("xqzwvjk").empty());
}

TEST_CASE("exact factors: read once, prefixes exact, inexact rows left to the double") {
    const auto exact = [](std::string_view symbol) {
        const auto u = table().resolve(symbol);
        REQUIRE(u.has_value());
        return plumb::exact_factor(*u);
    };
    // NIST SP 811 (2008), B.8: 1 psi = 6.894757E+03 Pa, exactly 0.45359237 kg × 9.80665 m/s² /
    // (0.0254 m)² = 8896443230521/1290320000 Pa.
    REQUIRE(exact("psi").has_value());
    CHECK(*exact("psi") == rational(8896443230521, 1290320000));
    // NIST SP 811 (2008), B.8: 1 ft = 0.3048 m exactly; 1 ft³ = 2.831685E-02 m³, exactly
    // 0.3048³ = 0.028316846592. Double arithmetic gives 0.3048³ only to within rounding.
    const rational foot = *exact("ft");
    CHECK(foot == rational(3048, 10000));
    CHECK(foot * foot * foot == rational(28316846592, 1000000000000));
    CHECK(*exact("ft3") == foot * foot * foot);
    // SI Brochure 9th ed., Table 7: milli = 10⁻³, mega = 10⁶; the litre is 10⁻³ m³ (Table 8).
    CHECK(*exact("mm") == rational(1, 1000));
    CHECK(*exact("MPa") == rational(1000000));
    CHECK(*exact("mL") == rational(1, 1000000));
    // NIST SP 811 (2008), B.8: the U.S. gallon is 3.785412E-03 m³, exactly 231 in³ =
    // 0.003785411784 m³; a gallon per minute is that over 60 s.
    CHECK(*exact("gal") == rational(3785411784, 1000000000000));
    CHECK(*exact("gal") / *exact("min") == *exact("gpm"));
    CHECK(*exact("gpm") == rational(630901964, 10000000000000));
    // SI Brochure 9th ed., Table 8: the dalton is measured (CODATA), not defined: no exact value.
    CHECK_FALSE(exact("Da").has_value());
    // NIST SP 811 (2008), B.8: the acre on the U.S. survey foot is printed rounded.
    CHECK_FALSE(exact("acre").has_value());
}

TEST_CASE("exact products and powers of factors; a rational power is left to the double") {
    // SI Brochure 9th ed., Table 7: milli = 10⁻³, so (10⁻³)² = 10⁻⁶ exactly.
    const std::optional<rational> milli = rational(1, 1000);
    CHECK(*plumb::exact_power(milli, rational(2)) == rational(1, 1000000));
    CHECK(*plumb::exact_power(milli, rational(-2)) == rational(1000000));
    CHECK_FALSE(plumb::exact_power(milli, rational(1, 2)).has_value());
    CHECK_FALSE(plumb::exact_power(std::nullopt, rational(2)).has_value());
    // NIST SP 811 (2008), B.8: 1 L/s = 10⁻³ m³/s; 1 gal/min = 6.309020E-05 m³/s.
    CHECK(*plumb::exact_product(rational(1, 1000), rational(60), false) == rational(3, 50));
    CHECK_FALSE(plumb::exact_product(rational(1), rational(0), true).has_value());
    // Too large for 64 bits: empty, never wrapped.
    const std::optional<rational> big = rational(1000000000000LL);
    CHECK_FALSE(plumb::exact_power(big, rational(2)).has_value());
}
