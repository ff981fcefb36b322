// The checker's 16-byte dimension: its products, quotients and powers, which take shortcuts
// for whole and fractional exponents, must give what `dimension` gives for the same operands.
#include "units/compact_dimension.hpp"

#include <doctest/doctest.h>

#include <array>
#include <cstdint>
#include <vector>

using plumb::base_dimension_count;
using plumb::compact_dimension;
using plumb::dimension;
using plumb::rational;

namespace {

dimension with_exponents(std::initializer_list<rational> first) {
    std::array<rational, base_dimension_count> e{};
    std::size_t i = 0;
    for (const rational& r : first)
        e[i++] = r;
    return dimension::from_exponents(e);
}

// Whole, half, third and sixth exponents, and the dimensionless one, in a few mixes: the
// products of every pair cover results that are whole, fractional and of either sign.
std::vector<dimension> samples() {
    return {
        dimension{},
        with_exponents({1, 0, -2}),
        with_exponents({rational(1, 2), 0, rational(-1, 2)}),
        with_exponents({rational(1, 2), rational(1, 3)}),
        with_exponents({rational(-1, 2), rational(2, 3), 1}),
        with_exponents({rational(1, 6), 0, 0, rational(-5, 6)}),
        with_exponents({2, 0, -1, 0, 0, 0, rational(3, 2)}),
        with_exponents({rational(1, 3), rational(1, 3), rational(1, 3)}),
    };
}

} // namespace

TEST_CASE("compact dimensions multiply and divide as dimension does, fractions included") {
    for (const dimension& a : samples())
        for (const dimension& b : samples()) {
            CAPTURE(a.to_string());
            CAPTURE(b.to_string());
            const compact_dimension ca(a);
            const compact_dimension cb(b);
            CHECK((ca * cb).expand() == a * b);
            CHECK((ca / cb).expand() == a / b);
            // Equal dimensions are equal bits, however they were reached.
            CHECK(ca * cb == compact_dimension(a * b));
            CHECK(ca / cb == compact_dimension(a / b));
        }
}

TEST_CASE("compact dimensions raised to whole and fractional powers agree with dimension") {
    const std::array<rational, 7> powers = {rational(2),    rational(-1),   rational(1, 2),
                                            rational(1, 3), rational(2, 3), rational(-1, 2),
                                            rational(1, 4)};
    std::vector<dimension> bases = samples();
    bases.push_back(with_exponents({2, 0, -2}));   // a root that divides every exponent
    bases.push_back(with_exponents({3, 0, 0, 6})); // and a cube root that does
    for (const dimension& d : bases)
        for (const rational& p : powers) {
            CAPTURE(d.to_string());
            CAPTURE(p.to_string());
            const compact_dimension c(d);
            CHECK(c.pow(p).expand() == d.pow(p));
            CHECK(c.pow(p) == compact_dimension(d.pow(p)));
        }
}

TEST_CASE("a root of whole exponents it does not divide gives the fraction") {
    const compact_dimension c(with_exponents({1, 0, -2}));
    CHECK(c.pow(rational(1, 2)).expand() == with_exponents({rational(1, 2), 0, rational(-1)}));
}

TEST_CASE("a dimension made from whole exponents at compile time is the fitted one") {
    // Pressure, M L^-1 T^-2, and a temperature, Θ: the bits must be those fitting gives, as
    // equality compares bits first.
    constexpr compact_dimension pressure = compact_dimension::whole({1, -1, -2, 0, 0, 0, 0});
    constexpr compact_dimension temperature = compact_dimension::whole({0, 0, 0, 1, 0, 0, 0});
    CHECK(pressure == compact_dimension(with_exponents({1, -1, -2})));
    CHECK(pressure.expand() == with_exponents({1, -1, -2}));
    CHECK(temperature == compact_dimension(with_exponents({0, 0, 0, 1})));
    CHECK_FALSE(pressure == temperature);
    CHECK(compact_dimension::whole({0, 0, 0, 0, 0, 0, 0}).is_dimensionless());
}
