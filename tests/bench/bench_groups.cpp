// plumb_bench_groups: microseconds per group analysis (Buckingham's pi theorem by exact
// elimination) for random problems of 8 to 128 variables over the seven base dimensions. It
// prints figures; it never fails on time. It does fail when an answer is wrong: a group with a
// dimension, a count other than n - rank, or an overflow that is not reported as a problem.
#include "plumb/dimension.hpp"
#include "plumb/groups.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <chrono>
#include <cstdint>
#include <cstdlib>
#include <random>
#include <string>
#include <vector>

#ifndef PLUMB_BUILD_TYPE
#define PLUMB_BUILD_TYPE ""
#endif

namespace {

using plumb::group_variable;
using plumb::rational;
using clock_type = std::chrono::steady_clock;

// Fixed so every run times the same problems.
constexpr std::uint64_t rng_start = 0x5eed'9a1e;

// Real dimensions are sparse with small exponents: each base dimension occurs with
// probability 2/5, with an exponent in [-3, 3] other than 0.
std::vector<group_variable> random_variables(std::mt19937_64& rng, std::size_t count) {
    std::vector<group_variable> out;
    for (std::size_t i = 0; i < count; ++i) {
        std::array<rational, plumb::base_dimension_count> e{};
        for (auto& x : e)
            if (rng() % 5 < 2)
                x = (static_cast<std::int64_t>(rng() % 3) + 1) * ((rng() & 1) != 0u ? 1 : -1);
        out.push_back({"x" + std::to_string(i + 1), plumb::dimension::from_exponents(e)});
    }
    return out;
}

// Everything an answer must satisfy, checked by the dimension algebra rather than by the
// elimination that produced it.
std::string wrong_answer(const plumb::group_request& request, const plumb::group_analysis& a) {
    if (!a.problems.empty())
        return "unexpected problem: " + a.problems.front();
    if (a.groups.size() != request.variables.size() - a.rank)
        return fmt::format("{} groups for {} variables of rank {}", a.groups.size(),
                           request.variables.size(), a.rank);
    if (a.repeating.size() != a.rank)
        return "repeating set of the wrong size";
    for (const auto& g : a.groups) {
        plumb::dimension d;
        for (std::size_t i = 0; i < request.variables.size(); ++i)
            d = d * request.variables[i].dim.pow(g.exponents[i]);
        if (!d.is_dimensionless())
            return "group " + g.formula + " has the dimension " + d.to_string();
    }
    return {};
}

struct timing {
    double best_us = 0;
    double median_us = 0;
};

timing time_runs(const plumb::group_request& request, std::size_t runs) {
    std::vector<double> us;
    for (std::size_t i = 0; i < runs; ++i) {
        const auto start = clock_type::now();
        const auto a = plumb::analyse_groups(request);
        const auto stop = clock_type::now();
        // Keeps the analysis from being optimised away.
        if (a.groups.empty() && a.problems.empty())
            std::abort();
        us.push_back(std::chrono::duration<double, std::micro>(stop - start).count());
    }
    std::sort(us.begin(), us.end());
    return {us.front(), us[us.size() / 2]};
}

} // namespace

int main(int argc, char** argv) {
    std::size_t runs = 1000;
    if (argc > 1)
        runs = std::max<std::size_t>(1, std::strtoull(argv[1], nullptr, 10));
    fmt::print("plumb_bench_groups ({} build): {} analyses per size, generator start {:#x}\n",
               PLUMB_BUILD_TYPE, runs, rng_start);
    bool ok = true;
    std::mt19937_64 rng(rng_start);

    fmt::print("{:>9} {:>5} {:>7} {:>12} {:>12}\n", "variables", "rank", "groups", "best µs",
               "median µs");
    for (std::size_t n : {8, 16, 32, 64, 128}) {
        const plumb::group_request request{random_variables(rng, n), {0}, {}};
        const auto a = plumb::analyse_groups(request);
        const std::string wrong = wrong_answer(request, a);
        if (!wrong.empty()) {
            fmt::print("{:>9}  WRONG: {}\n", n, wrong);
            ok = false;
            continue;
        }
        const timing t = time_runs(request, runs);
        fmt::print("{:>9} {:>5} {:>7} {:>12.2f} {:>12.2f}\n", n, a.rank, a.groups.size(), t.best_us,
                   t.median_us);
    }

    // Exponents near 2^62: any group needs a product of two of them, so the only right answer
    // is a reported overflow; a group here would mean a wrapped value got through.
    std::vector<group_variable> huge;
    for (std::int64_t i = 0; i < 8; ++i) {
        std::array<rational, plumb::base_dimension_count> e{};
        e[static_cast<std::size_t>(i % 7)] = 4'000'000'000'000'000'000 + i;
        e[static_cast<std::size_t>((i + 3) % 7)] = 3 + i;
        huge.push_back({"y" + std::to_string(i + 1), plumb::dimension::from_exponents(e)});
    }
    const plumb::group_request overflow_request{huge, {}, {}};
    const auto a = plumb::analyse_groups(overflow_request);
    const bool reported = a.groups.empty() && !a.problems.empty() &&
                          a.problems.front().find("64-bit") != std::string::npos;
    fmt::print("overflow, 8 variables with exponents near 4e18: {}\n",
               reported ? "reported as a problem: " + a.problems.front()
                        : std::string("NOT REPORTED"));
    ok = ok && reported;
    const timing t = time_runs(overflow_request, runs);
    fmt::print("overflow case: best {:.2f} µs, median {:.2f} µs\n", t.best_us, t.median_us);

    fmt::print("{}\n", ok ? "all answers exact" : "WRONG ANSWERS: see above");
    return ok ? 0 : 1;
}
