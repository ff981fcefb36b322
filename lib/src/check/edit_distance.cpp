// Edit distance with a cut-off, so suggestions over large dictionaries stay cheap.
#include "check/edit_distance.hpp"

#include <algorithm>
#include <vector>

namespace plumb {

// Only cells within `limit` of the diagonal can hold a distance of `limit` or less, so each row
// is computed over that band alone: the work is (shorter length) × (2·limit + 1), not the
// product of the lengths, however long the two names are.
std::size_t edit_distance(std::string_view a, std::string_view b, std::size_t limit) {
    const std::size_t n = a.size();
    const std::size_t m = b.size();
    if ((n > m ? n - m : m - n) > limit)
        return limit + 1;
    const std::size_t over = limit + 1; // any cell outside the band is at least this
    // Reused between calls: a suggestion search compares one name with thousands.
    thread_local std::vector<std::size_t> before, previous, current;
    before.assign(m + 1, over);
    previous.assign(m + 1, over);
    current.assign(m + 1, over);
    for (std::size_t j = 0; j <= std::min(m, limit); ++j)
        previous[j] = j;
    for (std::size_t i = 1; i <= n; ++i) {
        const std::size_t from = i > limit ? i - limit : 1;
        const std::size_t to = std::min(m, i + limit);
        // The cell left of the band, read as current[j - 1], must count as out of reach.
        current[from - 1] = from == 1 ? std::min(i, over) : over;
        std::size_t row_best = current[from - 1];
        for (std::size_t j = from; j <= to; ++j) {
            const std::size_t cost = a[i - 1] == b[j - 1] ? 0 : 1;
            current[j] = std::min({previous[j] + 1, current[j - 1] + 1, previous[j - 1] + cost});
            if (i > 1 && j > 1 && a[i - 1] == b[j - 2] && a[i - 2] == b[j - 1])
                current[j] = std::min(current[j], before[j - 2] + 1);
            current[j] = std::min(current[j], over);
            row_best = std::min(row_best, current[j]);
        }
        // The cell right of the band is read by the next row as previous[j]: out of reach.
        if (to < m)
            current[to + 1] = over;
        if (row_best > limit)
            return limit + 1;
        std::swap(before, previous);
        std::swap(previous, current);
    }
    return std::min(previous[m], limit + 1);
}

} // namespace plumb
