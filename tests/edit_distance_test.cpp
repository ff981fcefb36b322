// The banded edit distance against the full table it replaces, written out here the plain
// way: optimal string alignment (a swap of neighbours counts once), capped at limit + 1.
#include "check/edit_distance.hpp"

#include <doctest/doctest.h>

#include <algorithm>
#include <cstdint>
#include <random>
#include <string>
#include <vector>

namespace {

std::size_t full_table_distance(const std::string& a, const std::string& b) {
    const std::size_t n = a.size();
    const std::size_t m = b.size();
    std::vector<std::vector<std::size_t>> d(n + 1, std::vector<std::size_t>(m + 1));
    for (std::size_t i = 0; i <= n; ++i)
        d[i][0] = i;
    for (std::size_t j = 0; j <= m; ++j)
        d[0][j] = j;
    for (std::size_t i = 1; i <= n; ++i)
        for (std::size_t j = 1; j <= m; ++j) {
            const std::size_t cost = a[i - 1] == b[j - 1] ? 0 : 1;
            d[i][j] = std::min({d[i - 1][j] + 1, d[i][j - 1] + 1, d[i - 1][j - 1] + cost});
            if (i > 1 && j > 1 && a[i - 1] == b[j - 2] && a[i - 2] == b[j - 1])
                d[i][j] = std::min(d[i][j], d[i - 2][j - 2] + 1);
        }
    return d[n][m];
}

} // namespace

TEST_CASE("banded edit distance agrees with the full table on random short strings") {
    std::mt19937_64 rng(0x6564697473ULL); // fixed, so that a failure reproduces
    const std::string alphabet = "abc_";
    for (int trial = 0; trial < 20'000; ++trial) {
        std::string a(rng() % 9, ' ');
        std::string b(rng() % 9, ' ');
        for (char& c : a)
            c = alphabet[rng() % alphabet.size()];
        for (char& c : b)
            c = alphabet[rng() % alphabet.size()];
        const std::size_t limit = rng() % 5;
        const std::size_t expected = std::min(full_table_distance(a, b), limit + 1);
        INFO(a, " / ", b, " limit ", limit);
        REQUIRE(plumb::edit_distance(a, b, limit) == expected);
    }
}

TEST_CASE("edit distance of two long names: one change found, many changes cut off") {
    const std::string a(200'000, 'a');
    std::string b = a;
    b.back() = 'b';
    CHECK(plumb::edit_distance(a, b, 3) == 1);
    std::string c = a;
    for (std::size_t i = 0; i < c.size(); i += 1000)
        c[i] = 'z';
    CHECK(plumb::edit_distance(a, c, 3) == 4);
    CHECK(plumb::edit_distance("velocty", "velocity", 3) == 1);
    CHECK(plumb::edit_distance("hte", "the", 1) == 1); // a swap counts once
}
