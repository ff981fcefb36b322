// Exact Gauss–Jordan elimination over 64-bit rationals. Dimension matrices are small (at most
// seven rows), so clarity and exactness matter more than cache behaviour; what does matter is
// keeping numerators and denominators small, since every entry must stay within 64 bits.
#include "plumb/groups.hpp"

#include <cstdint>
#include <utility>

namespace plumb {
namespace {

// The larger of |num| and den, unsigned so that INT64_MIN has a size too.
std::uint64_t entry_size(const rational& x) {
    const std::int64_t n = x.num();
    const std::uint64_t magnitude =
        n < 0 ? std::uint64_t{0} - static_cast<std::uint64_t>(n) : static_cast<std::uint64_t>(n);
    const auto den = static_cast<std::uint64_t>(x.den());
    return magnitude > den ? magnitude : den;
}

void swap_rows(rational_matrix& m, std::size_t a, std::size_t b) {
    for (std::size_t c = 0; c < m.cols(); ++c)
        std::swap(m.at(a, c), m.at(b, c));
}

} // namespace

std::vector<std::size_t> row_reduce(rational_matrix& m) {
    std::vector<std::size_t> pivots;
    std::size_t row = 0;
    for (std::size_t col = 0; col < m.cols() && row < m.rows(); ++col) {
        // The smallest candidate keeps the multipliers below, and so every intermediate, small:
        // with whole exponents a pivot of ±1 means elimination adds no denominators at all.
        std::size_t best = m.rows();
        for (std::size_t r = row; r < m.rows(); ++r) {
            if (m.at(r, col).is_zero())
                continue;
            if (best == m.rows() || entry_size(m.at(r, col)) < entry_size(m.at(best, col)))
                best = r;
        }
        if (best == m.rows())
            continue;
        swap_rows(m, row, best);
        const rational pivot = m.at(row, col);
        if (pivot != rational(1))
            for (std::size_t c = col; c < m.cols(); ++c)
                m.at(row, c) = m.at(row, c) / pivot;
        for (std::size_t r = 0; r < m.rows(); ++r) {
            if (r == row || m.at(r, col).is_zero())
                continue;
            const rational factor = m.at(r, col);
            for (std::size_t c = col; c < m.cols(); ++c)
                if (!m.at(row, c).is_zero())
                    m.at(r, c) -= factor * m.at(row, c);
        }
        pivots.push_back(col);
        ++row;
    }
    return pivots;
}

std::size_t matrix_rank(const rational_matrix& m) {
    rational_matrix copy = m;
    return row_reduce(copy).size();
}

rational_matrix nullspace_basis(const rational_matrix& m) {
    rational_matrix reduced = m;
    const std::vector<std::size_t> pivots = row_reduce(reduced);
    std::vector<bool> is_pivot(m.cols(), false);
    for (std::size_t p : pivots)
        is_pivot[p] = true;
    rational_matrix basis(m.cols(), m.cols() - pivots.size());
    std::size_t out = 0;
    // Each free column gives one vector: that column set to 1, the pivot variables solved from
    // the reduced rows, so the vector's last nonzero entry is the free column itself.
    for (std::size_t free = 0; free < m.cols(); ++free) {
        if (is_pivot[free])
            continue;
        basis.at(free, out) = 1;
        for (std::size_t i = 0; i < pivots.size(); ++i)
            basis.at(pivots[i], out) = -reduced.at(i, free);
        ++out;
    }
    return basis;
}

} // namespace plumb
