// Dimension algebra: derived dimensions are built here by the same products, quotients and
// powers the checker uses, then compared with exponents typed independently from a source.
#include "plumb/dimension.hpp"

#include "test_support.hpp"

#include <doctest/doctest.h>

#include <cstdint>
#include <limits>
#include <string>

using plumb::arithmetic_overflow;
using plumb::base_dimension;
using plumb::dimension;
using plumb::rational;

namespace {

const dimension M = dimension::base(base_dimension::mass);
const dimension L = dimension::base(base_dimension::length);
const dimension T = dimension::base(base_dimension::time);
const dimension Th = dimension::base(base_dimension::temperature);
const dimension N = dimension::base(base_dimension::amount);
const dimension I = dimension::base(base_dimension::current);
const dimension J = dimension::base(base_dimension::luminous_intensity);
const dimension one{};

using plumb::test::typed;

} // namespace

TEST_CASE("base dimensions carry one unit exponent each") {
    CHECK(M.exponent(base_dimension::mass) == rational(1));
    CHECK(M.exponent(base_dimension::length) == rational(0));
    CHECK(Th.exponent(base_dimension::temperature) == rational(1));
    CHECK(J.exponent(base_dimension::luminous_intensity) == rational(1));
    CHECK(M != L);
    CHECK(L != T);
    CHECK(N != I);
    CHECK(typed(1, 0, 0) == M);
    CHECK(typed(0, 0, 0, 0, 0, 1) == I);
}

TEST_CASE("base dimension symbols follow the bracket convention") {
    CHECK(plumb::base_dimension_symbol(base_dimension::mass) == "M");
    CHECK(plumb::base_dimension_symbol(base_dimension::length) == "L");
    CHECK(plumb::base_dimension_symbol(base_dimension::time) == "T");
    CHECK(plumb::base_dimension_symbol(base_dimension::temperature) == "Θ");
    CHECK(plumb::base_dimension_symbol(base_dimension::amount) == "N");
    CHECK(plumb::base_dimension_symbol(base_dimension::current) == "I");
    CHECK(plumb::base_dimension_symbol(base_dimension::luminous_intensity) == "J");
}

TEST_CASE("products and quotients add and subtract exponents") {
    const dimension velocity = L / T;
    CHECK(velocity == typed(0, 1, -1));
    CHECK(velocity * T == L);
    CHECK(L / L == one);
    CHECK((L / L).is_dimensionless());
    CHECK(M * L * T == typed(1, 1, 1));
    CHECK(one / T == typed(0, 0, -1));
    CHECK(M * one == M);
    CHECK(L * L / (T * T) == typed(0, 2, -2));
    CHECK((M / L) * (L / M) == one);
}

TEST_CASE("rational powers scale every exponent") {
    const dimension v_squared = L.pow(2) / T.pow(2);
    CHECK(v_squared.pow(rational(1, 2)) == L / T);
    CHECK(L.pow(3).pow(rational(1, 3)) == L);
    CHECK(L.pow(rational(1, 2)).pow(2) == L);
    CHECK(L.pow(rational(2, 3)).pow(rational(3, 2)) == L);
    CHECK(L.pow(0) == one);
    CHECK((M / T).pow(-1) == T / M);
    CHECK(L.pow(rational(1, 2)).exponent(base_dimension::length) == rational(1, 2));
    CHECK(L.pow(rational(1, 2)) * L.pow(rational(1, 2)) == L);
    // Manning: hydraulic radius to the 2/3 times slope to the 1/2 with n in s m^(-1/3), from
    // memory of the SI form V = (1/n) R^(2/3) S^(1/2); the product must be a velocity.
    const dimension manning_n = T / L.pow(rational(1, 3));
    CHECK(L.pow(rational(2, 3)) / manning_n == L / T);
}

TEST_CASE("to_string uses the bracket convention") {
    CHECK(one.to_string() == "[1]");
    CHECK(L.to_string() == "[L]");
    CHECK((M / (L * T * T)).to_string() == "[M L^-1 T^-2]");
    CHECK(L.pow(rational(1, 2)).to_string() == "[L^(1/2)]");
    CHECK(L.pow(rational(-3, 2)).to_string() == "[L^(-3/2)]");
    CHECK((L * L / T).to_string() == "[L^2 T^-1]");
    CHECK((T * M).to_string() == "[M T]");
    CHECK((L * L / (T * T * Th)).to_string() == "[L^2 T^-2 Θ^-1]");
    CHECK((N / (L * L * L)).to_string() == "[L^-3 N]");
    CHECK((I * T).to_string() == "[T I]");
    CHECK(J.to_string() == "[J]");
    CHECK((M * L * T * Th * N * I * J).to_string() == "[M L T Θ N I J]");
}

TEST_CASE("dimensionless detection") {
    CHECK(one.is_dimensionless());
    CHECK(dimension().is_dimensionless());
    CHECK_FALSE(L.is_dimensionless());
    CHECK_FALSE(L.pow(rational(1, 2)).is_dimensionless());
    CHECK_FALSE(J.is_dimensionless());
    // Reynolds number rho V D / mu: common practice says it is a pure number.
    const dimension rho = M / L.pow(3);
    const dimension mu = M / (L * T);
    CHECK((rho * (L / T) * L / mu).is_dimensionless());
    // Strain: length over length.
    CHECK((L / L).is_dimensionless());
}

TEST_CASE("SI Brochure 9th ed., Table 4: coherent derived units in base units") {
    // Built by algebra the way a dictionary would; compared with exponents typed from the table.
    const dimension newton = M * L / T.pow(2);
    const dimension pascal = newton / L.pow(2);
    const dimension joule = newton * L;
    const dimension watt = joule / T;
    const dimension coulomb = I * T;
    const dimension volt = watt / I;
    const dimension hertz = one / T;

    CHECK(newton == typed(1, 1, -2));          // N = kg m s^-2
    CHECK(pascal == typed(1, -1, -2));         // Pa = kg m^-1 s^-2
    CHECK(joule == typed(1, 2, -2));           // J = kg m^2 s^-2
    CHECK(watt == typed(1, 2, -3));            // W = kg m^2 s^-3
    CHECK(coulomb == typed(0, 0, 1, 0, 0, 1)); // C = A s
    CHECK(volt == typed(1, 2, -3, 0, 0, -1));  // V = kg m^2 s^-3 A^-1
    CHECK(hertz == typed(0, 0, -1));           // Hz = s^-1
    CHECK(pascal.to_string() == "[M L^-1 T^-2]");
    // Pa = J/m^3 as well: energy density and pressure share a dimension.
    CHECK(joule / L.pow(3) == pascal);
    // W = V A.
    CHECK(volt * I == watt);
}

TEST_CASE("common practice: dynamic viscosity is M L^-1 T^-1") {
    const dimension stress = M / (L * T.pow(2));
    const dimension velocity_gradient = (L / T) / L;
    const dimension mu = stress / velocity_gradient;
    CHECK(mu == typed(1, -1, -1));
    CHECK(mu.to_string() == "[M L^-1 T^-1]");
    // Kinematic viscosity mu / rho is L^2 T^-1, the same as a diffusivity.
    CHECK(mu / (M / L.pow(3)) == typed(0, 2, -1));
}

TEST_CASE("common practice: bulk modulus has the dimension of pressure, compressibility its "
          "inverse") {
    const dimension pressure = M / (L * T.pow(2));
    // K = -V dp/dV: volume over volume cancels, leaving pressure.
    const dimension volume = L.pow(3);
    const dimension bulk_modulus = volume * (pressure / volume);
    CHECK(bulk_modulus == pressure);
    const dimension compressibility = one / bulk_modulus;
    CHECK(compressibility == typed(-1, 1, 2));
    CHECK(compressibility * pressure == one);
    CHECK(compressibility.to_string() == "[M^-1 L T^2]");
}

TEST_CASE("common practice: heat transfer dimensions") {
    const dimension watt = M * L.pow(2) / T.pow(3);
    const dimension conductivity = watt / (L * Th);
    CHECK(conductivity == typed(1, 1, -3, -1));
    const dimension film_coefficient = watt / (L.pow(2) * Th);
    CHECK(film_coefficient == typed(1, 0, -3, -1));
    // Biot number h L / k is a pure number.
    CHECK((film_coefficient * L / conductivity).is_dimensionless());
    const dimension specific_heat = (watt * T) / (M * Th);
    CHECK(specific_heat.to_string() == "[L^2 T^-2 Θ^-1]");
}

TEST_CASE("large exponents throw arithmetic_overflow rather than wrap") {
    constexpr std::int64_t max64 = std::numeric_limits<std::int64_t>::max();
    const dimension huge_l = L.pow(max64);
    CHECK(huge_l.exponent(base_dimension::length) == rational(max64));
    CHECK_THROWS_AS(static_cast<void>(huge_l.pow(2)), arithmetic_overflow);
    CHECK_THROWS_AS(huge_l * L, arithmetic_overflow);
    // L^-INT64_MAX / L is L^INT64_MIN, which still fits; one more step does not.
    CHECK((one / huge_l / L).exponent(base_dimension::length) ==
          rational(std::numeric_limits<std::int64_t>::min()));
    CHECK_THROWS_AS(one / huge_l / L / L, arithmetic_overflow);
    CHECK_THROWS_AS(static_cast<void>(L.pow(rational(1, max64)).pow(rational(1, max64 - 1))),
                    arithmetic_overflow);
    CHECK_THROWS_AS(L.pow(rational(1, max64)) * L.pow(rational(1, max64 - 1)), arithmetic_overflow);
    CHECK_THROWS_AS(static_cast<void>(L.pow(max64 / 2 + 1).pow(2)), arithmetic_overflow);
    // A dimensionless base raised to any power stays dimensionless without overflow.
    CHECK(one.pow(max64).is_dimensionless());
    CHECK(huge_l / huge_l == one);
}
