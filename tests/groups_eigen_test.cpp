// Cross-check of the exact rank against Eigen's full-pivoting LU (floating point with a rank
// threshold), an independent implementation. Compiled only where CMake found Eigen and defined
// PLUMB_HAVE_EIGEN; elsewhere this file is empty.
#ifdef PLUMB_HAVE_EIGEN

#include "groups_examples.hpp"

#include "plumb/groups.hpp"

#include <Eigen/Dense>
#include <doctest/doctest.h>

#include <cstdint>
#include <random>

namespace {

using plumb::rational_matrix;

// Fixed so a disagreement can be replayed; mt19937_64's output sequence is fixed by the C++
// standard, and the mapping to entries below is ours, so every library gives the same matrices.
constexpr std::uint64_t rng_start = 20'240'611;

Eigen::MatrixXd to_eigen(const rational_matrix& m) {
    Eigen::MatrixXd out(static_cast<Eigen::Index>(m.rows()), static_cast<Eigen::Index>(m.cols()));
    for (std::size_t r = 0; r < m.rows(); ++r)
        for (std::size_t c = 0; c < m.cols(); ++c)
            out(static_cast<Eigen::Index>(r), static_cast<Eigen::Index>(c)) =
                m.at(r, c).to_double();
    return out;
}

std::size_t eigen_rank(const rational_matrix& m) {
    if (m.rows() == 0 || m.cols() == 0)
        return 0;
    const Eigen::FullPivLU<Eigen::MatrixXd> lu(to_eigen(m));
    return static_cast<std::size_t>(lu.rank());
}

// An integer in [-3, 3]: the size of exponents in real dimension matrices.
std::int64_t small(std::mt19937_64& rng) {
    return static_cast<std::int64_t>(rng() % 7) - 3;
}

// A rows x cols matrix of rank at most `inner`, as a product of two random factors, so that
// deficient ranks (rare among random matrices) are well represented.
rational_matrix random_matrix(std::mt19937_64& rng, std::size_t rows, std::size_t cols,
                              std::size_t inner) {
    rational_matrix left(rows, inner);
    rational_matrix right(inner, cols);
    for (std::size_t r = 0; r < rows; ++r)
        for (std::size_t k = 0; k < inner; ++k)
            left.at(r, k) = small(rng);
    for (std::size_t k = 0; k < inner; ++k)
        for (std::size_t c = 0; c < cols; ++c)
            right.at(k, c) = small(rng);
    rational_matrix out(rows, cols);
    for (std::size_t r = 0; r < rows; ++r)
        for (std::size_t c = 0; c < cols; ++c)
            for (std::size_t k = 0; k < inner; ++k)
                out.at(r, c) += left.at(r, k) * right.at(k, c);
    return out;
}

} // namespace

TEST_SUITE_BEGIN("groups: eigen cross-check");

TEST_CASE("exact rank agrees with Eigen's FullPivLU on random small-integer matrices") {
    std::mt19937_64 rng(rng_start);
    std::size_t deficient = 0;
    for (int trial = 0; trial < 3000; ++trial) {
        const std::size_t rows = 1 + rng() % 7; // at most the seven base dimensions
        const std::size_t cols = 1 + rng() % 12;
        const std::size_t inner = 1 + rng() % 7;
        const rational_matrix m = random_matrix(rng, rows, cols, inner);
        const std::size_t exact = plumb::matrix_rank(m);
        INFO("trial " << trial << ": " << rows << " x " << cols << ", inner " << inner);
        CHECK(exact == eigen_rank(m));
        CHECK(plumb::nullspace_basis(m).cols() == cols - exact);
        if (exact < std::min(rows, cols))
            ++deficient;
    }
    // The product construction must actually exercise deficient ranks.
    CHECK(deficient > 300);
}

TEST_CASE("exact rank agrees with Eigen on every worked example's dimension matrix") {
    for (const auto& ex : plumb::test::all_worked_examples()) {
        INFO(ex.name);
        const auto matrix = plumb::build_dimension_matrix(ex.variables);
        const std::size_t exact = plumb::matrix_rank(matrix.values);
        CHECK(exact == eigen_rank(matrix.values));
        CHECK(plumb::analyse_groups(ex.request()).rank == exact);
    }
}

TEST_SUITE_END();

#endif
