// Exact rational exponents: the checker's verdicts are only as good as this arithmetic, so the
// edges (INT64 limits, reduction, parsing of decimal exponents) are pinned down here.
#include "plumb/rational.hpp"

#include <doctest/doctest.h>

#include <cstdint>
#include <functional>
#include <limits>
#include <stdexcept>

using plumb::arithmetic_overflow;
using plumb::rational;

namespace {

constexpr std::int64_t max64 = std::numeric_limits<std::int64_t>::max();
constexpr std::int64_t min64 = std::numeric_limits<std::int64_t>::min();

// Where the exact result fits but a naive intermediate would not, the library may either get it
// right or report overflow; what it must never do is hand back a wrapped value.
void check_exact_or_overflow(const std::function<rational()>& op, rational expected) {
    try {
        const rational got = op();
        CHECK(got == expected);
    } catch (const arithmetic_overflow&) {
        CHECK(true);
    }
}

} // namespace

TEST_CASE("a rational is kept reduced with a positive denominator") {
    CHECK(rational(6, 8).num() == 3);
    CHECK(rational(6, 8).den() == 4);
    CHECK(rational(-6, 8) == rational(-3, 4));
    CHECK(rational(6, -8).num() == -3);
    CHECK(rational(6, -8).den() == 4);
    CHECK(rational(-6, -8) == rational(3, 4));
    CHECK(rational(0, 5).den() == 1);
    CHECK(rational(0, -5).num() == 0);
    CHECK(rational(0, -5).den() == 1);
    CHECK(rational(10, 5).is_integer());
    CHECK(rational(10, 5) == rational(2));
    CHECK_FALSE(rational(1, 3).is_integer());
    CHECK(rational().is_zero());
    CHECK(rational(0, 7).is_zero());
    CHECK_FALSE(rational(1, 7).is_zero());
    CHECK(rational(max64, max64) == rational(1));
    CHECK(rational(1, 4).to_double() == doctest::Approx(0.25));
}

TEST_CASE("a zero denominator is a domain error") {
    CHECK_THROWS_AS(rational(1, 0), std::domain_error);
    CHECK_THROWS_AS(rational(0, 0), std::domain_error);
    CHECK_THROWS_AS(rational(1, 2) / rational(0), std::domain_error);
    CHECK_THROWS_AS(rational(0) / rational(0, 3), std::domain_error);
}

TEST_CASE("sums and differences are exact and reduced") {
    CHECK(rational(1, 2) + rational(1, 3) == rational(5, 6));
    CHECK(rational(1, 6) + rational(1, 3) == rational(1, 2));
    CHECK(rational(1, 2) + rational(1, 2) == rational(1));
    CHECK((rational(1, 2) + rational(1, 2)).is_integer());
    CHECK(rational(3) + rational(4) == rational(7));
    CHECK(rational(1, 2) - rational(3, 4) == rational(-1, 4));
    CHECK(rational(2, 3) - rational(2, 3) == rational(0));
    CHECK((rational(2, 3) - rational(2, 3)).den() == 1);
    CHECK(rational(-5) - rational(-7) == rational(2));
    CHECK(-rational(3, 4) == rational(-3, 4));
    CHECK(-rational(0) == rational(0));

    rational acc(1, 4);
    acc += rational(1, 4);
    CHECK(acc == rational(1, 2));
    acc -= rational(1);
    CHECK(acc == rational(-1, 2));
    acc *= rational(-4);
    CHECK(acc == rational(2));
}

TEST_CASE("products and quotients are exact and reduced") {
    CHECK(rational(2, 3) * rational(3, 4) == rational(1, 2));
    CHECK(rational(-2, 3) * rational(3, 2) == rational(-1));
    CHECK(rational(4) * rational(1, 4) == rational(1));
    CHECK(rational(0) * rational(7, 9) == rational(0));
    CHECK((rational(0) * rational(7, 9)).den() == 1);
    CHECK(rational(6) * rational(-7) == rational(-42));
    CHECK(rational(1, 2) / rational(1, 4) == rational(2));
    CHECK(rational(3, 4) / rational(-3, 8) == rational(-2));
    CHECK((rational(3, 4) / rational(-3, 8)).den() == 1);
    CHECK(rational(5) / rational(10) == rational(1, 2));
    CHECK(rational(-1, 3) / rational(-1, 3) == rational(1));
    // The exponents a formula actually produces: (2/3) * (3/2) from a root of a power.
    CHECK(rational(2, 3) * rational(3, 2) == rational(1));
}

TEST_CASE("comparison is by value") {
    CHECK(rational(1, 3) < rational(1, 2));
    CHECK_FALSE(rational(1, 2) < rational(1, 3));
    CHECK_FALSE(rational(1, 2) < rational(2, 4));
    CHECK(rational(-1, 2) < rational(-1, 3));
    CHECK(rational(-1) < rational(0));
    CHECK(rational(2, 4) == rational(1, 2));
    CHECK(rational(1, 2) != rational(1, 3));
    CHECK(rational(3) != rational(3, 2));
    // Cross products of these would overflow 64 bits; the ordering must still be right.
    CHECK(rational(max64 - 1, max64) < rational(max64, max64 - 1));
    CHECK_FALSE(rational(max64, max64 - 1) < rational(max64 - 1, max64));
    CHECK(rational(min64) < rational(-max64));
    CHECK(rational(-max64, 2) < rational(max64, 3));
}

TEST_CASE("to_string prints whole numbers bare and fractions with a slash") {
    CHECK(rational(3).to_string() == "3");
    CHECK(rational(0).to_string() == "0");
    CHECK(rational(-2).to_string() == "-2");
    CHECK(rational(1, 2).to_string() == "1/2");
    CHECK(rational(2, -4).to_string() == "-1/2");
    CHECK(rational(-3, 2).to_string() == "-3/2");
    CHECK(rational(max64).to_string() == "9223372036854775807");
    CHECK(rational(min64).to_string() == "-9223372036854775808");
}

TEST_CASE("parse reads decimal and fraction literals exactly") {
    // Empirical exponents such as Hazen-Williams' 0.54 are written as decimals; they must come out
    // as the exact fraction, not a rounded double.
    CHECK(rational::parse("0.54") == rational(27, 50));
    CHECK(rational::parse("2") == rational(2));
    CHECK(rational::parse("-1/2") == rational(-1, 2));
    CHECK(rational::parse("2/4") == rational(1, 2));
    CHECK(rational::parse("+3") == rational(3));
    CHECK(rational::parse("-0") == rational(0));
    CHECK(rational::parse("1.5e-3") == rational(3, 2000));
    CHECK(rational::parse("1.5E-3") == rational(3, 2000));
    CHECK(rational::parse("-1.5e-3") == rational(-3, 2000));
    CHECK(rational::parse("2.5e2") == rational(250));
    CHECK(rational::parse("2.5e+2") == rational(250));
    CHECK(rational::parse("0.001") == rational(1, 1000));
    CHECK(rational::parse("1.85") == rational(37, 20));
    CHECK(rational::parse("0.667") == rational(667, 1000));
    CHECK(rational::parse("9223372036854775807") == rational(max64));
}

TEST_CASE("parse stops exactly at the 64-bit limit") {
    // 10^18 is the largest power of ten below INT64_MAX (about 9.22e18); 10^19 is not.
    CHECK(rational::parse("1e-18") == rational(1, 1'000'000'000'000'000'000));
    CHECK(rational::parse("1e18") == rational(1'000'000'000'000'000'000));
    CHECK_FALSE(rational::parse("1e-19").has_value());
    CHECK_FALSE(rational::parse("1e19").has_value());
    CHECK_FALSE(rational::parse("1e999999999999").has_value());
    CHECK_FALSE(rational::parse("9223372036854775808").has_value());
    CHECK_FALSE(rational::parse("-9223372036854775809").has_value());
    CHECK_FALSE(rational::parse("1/9223372036854775808").has_value());
    CHECK_FALSE(rational::parse("0.00000000000000000001").has_value());
}

TEST_CASE("parse does not give up on a literal whose reduced value fits") {
    // The header promises an empty result only when the text "does not fit". These values fit
    // in 64 bits once reduced (3/(2*10^18) has a denominator below INT64_MAX), so an empty
    // result here is a false "does not fit".
    CHECK(rational::parse("1.5e-18") == rational(3, 2'000'000'000'000'000'000));
    CHECK(rational::parse("0.50000000000000000000") == rational(1, 2));
}

TEST_CASE("parse rejects text that is not a number") {
    for (const char* junk : {"",      "-",     "+",     ".",   "e5",  "1e", "1e+", "abc", "1a",
                             "0x10",  "1..2",  "1.2.3", " 2",  "2 ",  "1/", "/2",  "1/0", "1/-2",
                             "1/2e3", "1/2/3", "--1",   "+-1", "1,5", "∞",  "NaN", "inf"}) {
        CAPTURE(junk);
        CHECK_FALSE(rational::parse(junk).has_value());
    }
}

TEST_CASE("arithmetic near INT64_MAX throws arithmetic_overflow instead of wrapping") {
    CHECK_THROWS_AS(rational(max64) + 1, arithmetic_overflow);
    CHECK_THROWS_AS(rational(max64) + rational(1, 2), arithmetic_overflow);
    CHECK_THROWS_AS(rational(max64 / 2 + 1) * 2, arithmetic_overflow);
    CHECK_THROWS_AS(rational(1, max64) + rational(1, max64 - 1), arithmetic_overflow);
    CHECK_THROWS_AS(rational(1, max64) * rational(1, max64 - 1), arithmetic_overflow);
    CHECK_THROWS_AS(rational(-max64) - 2, arithmetic_overflow);
    CHECK_THROWS_AS(rational(max64) / rational(1, 2), arithmetic_overflow);
    CHECK_THROWS_AS(rational(1, 3) / rational(max64, 2) / rational(max64, 5), arithmetic_overflow);

    rational acc(max64);
    CHECK_THROWS_AS(acc += 1, arithmetic_overflow);
    CHECK_THROWS_AS(acc *= 2, arithmetic_overflow);

    // The overflow is also an std::overflow_error, so callers catching the standard type work.
    CHECK_THROWS_AS(rational(max64) * 2, std::overflow_error);

    // Right at the edge the exact value is still delivered.
    CHECK(rational(max64 - 1) + 1 == rational(max64));
    CHECK(rational(max64 / 2) * 2 == rational(max64 - 1));
    CHECK(rational(max64, 2) * 2 == rational(max64));
    CHECK(rational(1, max64) * max64 == rational(1));
}

TEST_CASE("results that fit are never wrapped even when intermediates are large") {
    check_exact_or_overflow([] { return rational(max64, 2) + rational(max64, 2); },
                            rational(max64));
    check_exact_or_overflow([] { return rational(-1) - rational(min64); }, rational(max64));
    check_exact_or_overflow([] { return rational(min64, 2); }, rational(min64 / 2));
    check_exact_or_overflow([] { return rational(2) / rational(min64); },
                            rational(-1, max64 / 2 + 1));
}

TEST_CASE("INT64_MIN is handled without undefined negation") {
    // -INT64_MIN does not exist in 64 bits, so every path that would need it must throw.
    const rational lowest(min64);
    CHECK(lowest.num() == min64);
    CHECK(lowest.den() == 1);
    CHECK_THROWS_AS(-lowest, arithmetic_overflow);
    CHECK_THROWS_AS(rational(min64, -1), arithmetic_overflow);
    CHECK_THROWS_AS(rational(1, min64), arithmetic_overflow);
    CHECK_THROWS_AS(lowest - 1, arithmetic_overflow);
    CHECK_THROWS_AS(lowest * -1, arithmetic_overflow);
    CHECK_THROWS_AS(lowest / -1, arithmetic_overflow);
    CHECK_THROWS_AS(rational(1) / lowest, arithmetic_overflow);
    CHECK_THROWS_AS(rational(0) - lowest, arithmetic_overflow);
    CHECK_THROWS_AS(lowest + rational(1, 2), arithmetic_overflow);
    CHECK(lowest + 1 == rational(min64 + 1));
    CHECK(lowest / 1 == lowest);
    CHECK(lowest * 1 == lowest);
    CHECK(rational(min64 + 1) - 1 == lowest);
    CHECK(-rational(min64 + 1) == rational(max64));
}

TEST_CASE("INT64_MIN times a fraction is exact or an overflow, with no undefined behaviour") {
    // operator* cross-cancels with std::gcd(num, den); std::gcd is undefined when |num| does not
    // fit ([numeric.ops.gcd]), which is the case for INT64_MIN. Plain builds usually get away
    // with it; the sanitizer (debug preset) and _GLIBCXX_ASSERTIONS builds stop here.
    check_exact_or_overflow([] { return rational(min64) * rational(1, 2); }, rational(min64 / 2));
    check_exact_or_overflow([] { return rational(3, 4) * rational(min64); },
                            rational(min64 / 4 * 3));
}
