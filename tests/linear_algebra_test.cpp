// Exact Gauss–Jordan elimination: the ranks and nullspaces the group analysis stands on,
// checked against matrices reduced by hand.
#include "plumb/groups.hpp"

#include <doctest/doctest.h>

#include <cstdint>
#include <initializer_list>
#include <limits>
#include <vector>

namespace {

using plumb::rational;
using plumb::rational_matrix;

rational_matrix matrix(std::initializer_list<std::initializer_list<rational>> rows) {
    rational_matrix m(rows.size(), rows.begin()->size());
    std::size_t r = 0;
    for (const auto& row : rows) {
        std::size_t c = 0;
        for (const rational& x : row)
            m.at(r, c++) = x;
        ++r;
    }
    return m;
}

} // namespace

TEST_SUITE_BEGIN("groups: linear algebra");

TEST_CASE("reduced row echelon form of a small matrix, reduced by hand") {
    // [2 4 1; 1 2 1] -> R2 - R1/2 = [0 0 1/2] -> [1 2 0; 0 0 1]: pivots in columns 0 and 2.
    auto m = matrix({{2, 4, 1}, {1, 2, 1}});
    const auto pivots = plumb::row_reduce(m);
    CHECK(pivots == std::vector<std::size_t>{0, 2});
    CHECK(m == matrix({{1, 2, 0}, {0, 0, 1}}));
}

TEST_CASE("fractions appear where the pivots force them") {
    // [3 1; 1 2]: determinant 5, so the inverse has fifths; RREF of [A | I] is [I | A^-1]
    // with A^-1 = [2/5 -1/5; -1/5 3/5].
    auto m = matrix({{3, 1, 1, 0}, {1, 2, 0, 1}});
    plumb::row_reduce(m);
    CHECK(m == matrix({{1, 0, rational(2, 5), rational(-1, 5)},
                       {0, 1, rational(-1, 5), rational(3, 5)}}));
}

TEST_CASE("rank of zero, empty and deficient matrices") {
    CHECK(plumb::matrix_rank(rational_matrix(3, 4)) == 0);
    CHECK(plumb::matrix_rank(rational_matrix(0, 5)) == 0);
    CHECK(plumb::matrix_rank(rational_matrix(4, 0)) == 0);
    // Mass and time only as M T^-2 (surface tension, pressure, length): rank 2 of 3 rows.
    CHECK(plumb::matrix_rank(matrix({{1, 0, 1}, {-1, 1, 0}, {-2, 0, -2}})) == 2);
    CHECK(plumb::matrix_rank(matrix({{1, 2}, {2, 4}})) == 1);
}

TEST_CASE("nullspace basis of the sphere-drag matrix") {
    // Columns F, ρ, V, D, μ over M, L, T. The pivots are F, ρ and V, so D and μ are free and
    // each basis vector is the product with that variable to the first power.
    const auto m = matrix({{1, 1, 0, 0, 1}, {1, -3, 1, 1, -1}, {-2, 0, -1, 0, -1}});
    const auto basis = plumb::nullspace_basis(m);
    REQUIRE(basis.rows() == 5);
    REQUIRE(basis.cols() == 2);
    // D's vector F^a ρ^b V^c D: M a+b=0, T -2a-c=0, L a-3b+c+1=0, so b=-a, c=-2a,
    // 2a+1=0: a=-1/2, b=1/2, c=1, the group D V ρ^(1/2)/F^(1/2).
    CHECK(basis.at(0, 0) == rational(-1, 2));
    CHECK(basis.at(1, 0) == rational(1, 2));
    CHECK(basis.at(2, 0) == 1);
    CHECK(basis.at(3, 0) == 1);
    CHECK(basis.at(4, 0) == 0);
    // μ's vector F^a ρ^b V^c μ: M a+b+1=0, T -2a-c-1=0, L a-3b+c-1=0, so b=-1-a, c=-1-2a,
    // 2a+1=0: a=-1/2, b=-1/2, c=0, the group μ/(F ρ)^(1/2).
    CHECK(basis.at(0, 1) == rational(-1, 2));
    CHECK(basis.at(1, 1) == rational(-1, 2));
    CHECK(basis.at(2, 1) == 0);
    CHECK(basis.at(3, 1) == 0);
    CHECK(basis.at(4, 1) == 1);
}

TEST_CASE("every nullspace vector is annihilated by the matrix") {
    const auto m = matrix({{1, 2, 3, 4, 5}, {2, 4, 6, 8, 11}, {0, 1, 0, 1, 0}});
    const auto basis = plumb::nullspace_basis(m);
    CHECK(basis.cols() == m.cols() - plumb::matrix_rank(m));
    for (std::size_t k = 0; k < basis.cols(); ++k)
        for (std::size_t r = 0; r < m.rows(); ++r) {
            rational sum = 0;
            for (std::size_t c = 0; c < m.cols(); ++c)
                sum += m.at(r, c) * basis.at(c, k);
            CHECK(sum == 0);
        }
    // A full-rank square matrix has an empty nullspace, a zero matrix the identity.
    CHECK(plumb::nullspace_basis(matrix({{1, 2}, {3, 4}})).cols() == 0);
    const auto zero = plumb::nullspace_basis(rational_matrix(2, 2));
    CHECK(zero == matrix({{1, 0}, {0, 1}}));
}

TEST_CASE("elimination that leaves 64 bits throws arithmetic_overflow") {
    constexpr std::int64_t big = std::numeric_limits<std::int64_t>::max() / 2;
    // R2 - (big/1) R1 needs big * big.
    auto m = matrix({{1, big}, {big, 1}});
    CHECK_THROWS_AS(plumb::row_reduce(m), plumb::arithmetic_overflow);
}

TEST_SUITE_END();
