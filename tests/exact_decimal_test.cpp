// Exact numbers as the catalogue writes them: whole decimals when they end, cut digits and the
// fraction when they do not. Reference digits are worked by hand from the fractions.
#include "report/exact_decimal.hpp"

#include <doctest/doctest.h>

#include <string>

namespace {

std::string shown(std::string_view text) {
    const auto n = plumb::read_exact(text);
    REQUIRE(n.has_value());
    return plumb::decimal_text(*n);
}

} // namespace

TEST_SUITE_BEGIN("exact_decimal");

TEST_CASE("a decimal that ends is written whole, without exponents or float noise") {
    CHECK(shown("0.3048") == "0.3048"); // NIST SP 811 (2008), B.8: ft
    CHECK(shown("1") == "1");
    CHECK(shown("3600000000") == "3600000000"); // MW·h = 3.6 × 10^9 J
    CHECK(shown("0.000001") == "0.000001");     // cSt in m²/s
    CHECK(shown("745.69987158227022") == "745.69987158227022");
    CHECK(shown("1/8") == "0.125"); // a fraction whose decimal ends
    CHECK(shown("1e6") == "1000000");
    CHECK(shown("-0.5") == "-0.5");
}

TEST_CASE("a decimal that does not end: twelve digits cut, then the exact fraction") {
    CHECK(shown("5/9") == "0.555555555555\u2026 (5/9)"); // NIST SP 811 (2008), B.8: °F, °R
    CHECK(shown("463/900") == "0.514444444444\u2026 (463/900)");    // 1852 m / 3600 s: knot
    CHECK(shown("20265/152") == "133.322368421\u2026 (20265/152)"); // 101325/760 Pa: torr
    // Cut, never rounded: 2/3 = 0.666…, not 0.667.
    CHECK(shown("2/3") == "0.666666666666\u2026 (2/3)");
}

TEST_CASE("very large and very small values take a power of ten") {
    // 1 D = 10^-7/101325 m² = 9.869 233 × 10^-13 m² (NIST SP 811 (2008), B.8 prints
    // 9.869233E-13).
    CHECK(shown("1/1013250000000") == "9.86923266716\u2026 \u00D7 10^-13 (1/1013250000000)");
    CHECK(shown("1.5e-30") == "1.5 \u00D7 10^-30");
    CHECK(shown("2e15") == "2 \u00D7 10^15");
    // A shift beyond what 64 bits hold stays exact: 1 quectometre.
    CHECK(plumb::decimal_text({plumb::rational(1), -30}) == "1 \u00D7 10^-30");
}

TEST_CASE("text that is no exact number is refused") {
    CHECK_FALSE(plumb::read_exact("pi/180").has_value());
    CHECK_FALSE(plumb::read_exact("1e").has_value());
    CHECK_FALSE(plumb::read_exact("").has_value());
}

TEST_SUITE_END();
