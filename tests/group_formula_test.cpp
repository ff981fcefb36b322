// The text of a dimensionless group: what people read in a report and type into a spreadsheet,
// so the layout is pinned down exactly (the forms are the ones groups.hpp documents).
#include "plumb/groups.hpp"

#include <doctest/doctest.h>

#include <cstdint>
#include <limits>
#include <stdexcept>
#include <string>
#include <vector>

namespace {

using plumb::group_variable;
using plumb::rational;

std::vector<group_variable> named(std::initializer_list<const char*> names) {
    std::vector<group_variable> out;
    for (const char* n : names)
        out.push_back({n, {}});
    return out;
}

std::string formula(std::initializer_list<const char*> names, std::vector<rational> exponents) {
    const auto variables = named(names);
    return plumb::group_formula(variables, exponents);
}

} // namespace

TEST_SUITE_BEGIN("groups: formula");

TEST_CASE("numerator factors in variable order, then the denominator") {
    // Reynolds number ρVD/μ.
    CHECK(formula({"ρ", "V", "D", "μ"}, {1, 1, 1, -1}) == "ρ*V*D/μ");
    // Order follows the variables, not the sign: μ declared first still goes below.
    CHECK(formula({"μ", "ρ", "V", "D"}, {-1, 1, 1, 1}) == "ρ*V*D/μ");
}

TEST_CASE("a denominator of several factors is parenthesised") {
    // Drag coefficient form F_D/(ρ V² D²).
    CHECK(formula({"F_D", "ρ", "V", "D"}, {1, -1, -2, -2}) == "F_D/(ρ*V^2*D^2)");
    CHECK(formula({"a", "b", "c"}, {1, -1, 0}) == "a/b");
}

TEST_CASE("rational exponents are written in parentheses, by magnitude on their side") {
    // Pendulum period T sqrt(g/L).
    CHECK(formula({"T", "L", "g"}, {1, rational(-1, 2), rational(1, 2)}) == "T*g^(1/2)/L^(1/2)");
    CHECK(formula({"x"}, {rational(-3, 2)}) == "1/x^(3/2)");
    CHECK(formula({"x", "y"}, {rational(5, 3), -3}) == "x^(5/3)/y^3");
}

TEST_CASE("an empty numerator is written 1") {
    CHECK(formula({"x"}, {-1}) == "1/x");
    CHECK(formula({"x", "y"}, {-1, -2}) == "1/(x*y^2)");
}

TEST_CASE("a group with no factor is 1; unused variables are left out") {
    CHECK(formula({"x", "y"}, {0, 0}) == "1");
    CHECK(formula({}, {}) == "1");
    CHECK(formula({"ε", "D", "L"}, {1, -1, 0}) == "ε/D");
}

TEST_CASE("extreme exponents print without negation overflow") {
    constexpr std::int64_t min64 = std::numeric_limits<std::int64_t>::min();
    CHECK(formula({"x"}, {rational(min64)}) == "1/x^9223372036854775808");
    CHECK(formula({"x"}, {rational(std::numeric_limits<std::int64_t>::max())}) ==
          "x^9223372036854775807");
}

TEST_CASE("one exponent per variable is required") {
    const auto variables = named({"x", "y"});
    const std::vector<rational> exponents = {1};
    CHECK_THROWS_AS(plumb::group_formula(variables, exponents), std::invalid_argument);
}

TEST_SUITE_END();
