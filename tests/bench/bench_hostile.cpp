// plumb_bench_hostile: the hostile inputs of issue 12 (defects 3, 6 and 7) at full size, each
// generated, checked and rendered in a child process of its own, so that each gets its own
// peak resident memory. Prints seconds, peak RSS and RSS per input byte; never fails on time.
#include "../hostile_inputs.hpp"

#include "plumb/check.hpp"
#include "plumb/render.hpp"

#include <fmt/format.h>

#include <chrono>
#include <cstdio>
#include <functional>
#include <string>
#include <sys/resource.h>
#include <sys/wait.h>
#include <unistd.h>
#include <vector>

#ifndef PLUMB_BUILD_TYPE
#define PLUMB_BUILD_TYPE ""
#endif

namespace {

struct hostile_case {
    std::string name;
    std::function<std::string()> input;
};

// Runs one case in a child: the time is sent back through a pipe, the peak RSS comes from
// wait4's accounting of the child alone.
void run(const hostile_case& c) {
    int fds[2];
    if (pipe(fds) != 0) {
        std::perror("pipe");
        return;
    }
    const pid_t child = fork();
    if (child < 0) {
        std::perror("fork");
        return;
    }
    if (child == 0) {
        close(fds[0]);
        const std::string text = c.input();
        const auto start = std::chrono::steady_clock::now();
        const plumb::check_report report = plumb::check_text(c.name + ".plumb", text);
        const std::string out = plumb::render_text(report, {}) + plumb::render_groups_text(report);
        const double seconds =
            std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
        const std::string line =
            fmt::format("{} {} {} {}", seconds, text.size(), report.diagnostics.size(), out.size());
        const ssize_t written = write(fds[1], line.data(), line.size());
        _exit(written == static_cast<ssize_t>(line.size()) ? 0 : 1);
    }
    close(fds[1]);
    char buffer[128] = {};
    const ssize_t got = read(fds[0], buffer, sizeof buffer - 1);
    close(fds[0]);
    int status = 0;
    rusage usage{};
    wait4(child, &status, 0, &usage);
    double seconds = 0;
    unsigned long long bytes = 0;
    unsigned long long findings = 0;
    unsigned long long output = 0;
    if (got <= 0 ||
        std::sscanf(buffer, "%lf %llu %llu %llu", &seconds, &bytes, &findings, &output) != 4) {
        fmt::print("{:<34} failed (status {})\n", c.name, status);
        return;
    }
    const double peak = static_cast<double>(usage.ru_maxrss) * 1024.0; // ru_maxrss is in KiB
    fmt::print("{:<30} {:>8.1f} KB in {:>8.3f} s {:>7.1f} MB peak {:>6.1f} B/B {:>6} findings "
               "{:>8.1f} KB out\n",
               c.name, static_cast<double>(bytes) / 1e3, seconds, peak / 1e6,
               peak / static_cast<double>(bytes), findings, static_cast<double>(output) / 1e3);
    std::fflush(stdout);
}

} // namespace

int main() {
    namespace h = plumb::hostile;
    const std::vector<hostile_case> cases = {
        {"study of 680 variables", [] { return h::large_study(680); }},
        {"two names of 200k letters", [] { return h::long_names(200'000); }},
        {"20k near misses of 20k names", [] { return h::many_near_misses(20'000); }},
        {"sum of 100k dimensions", [] { return h::distinct_dimensions_sum(100'000); }},
        {"sum of 400k terms, half odd", [] { return h::half_odd_sum(400'000); }},
        {"20k findings on one line", [] { return h::findings_on_one_line(20'000); }},
        {"chain of 200k relations", [] { return h::relation_chain(200'000); }},
        {"2400 unknowns in one chain", [] { return h::inference_chain(2400); }},
        {"40k units of the file's own", [] { return h::many_units(40'000); }},
        {"one formula line of 1 MB", [] { return h::one_long_formula(1'000'000); }},
        {"one formula line of 10 MB", [] { return h::one_long_formula(10'000'000); }},
    };
    fmt::print("plumb_bench_hostile ({} build): generated, checked and rendered, one process "
               "each\n",
               PLUMB_BUILD_TYPE);
    for (const auto& c : cases)
        run(c);
    return 0;
}
