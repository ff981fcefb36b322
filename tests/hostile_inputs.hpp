// Generated inputs that once made one pass of plumb take seconds to minutes (issue 12, defects
// 3 and 6) or memory out of proportion to the file (defect 7). The regression tests check
// that each completes with the right finding; plumb_bench_hostile times them at full size.
// Every generator takes its size, so a test can use a small one and the benchmark a large one.
#pragma once

#include <cstddef>
#include <string>

namespace plumb::hostile {

// Declares a name of `length` letters and uses it with its last letter changed: the
// "did you mean" search compares two long names.
inline std::string long_names(std::size_t length) {
    const std::string declared(length, 'a');
    std::string used = declared;
    used.back() = 'b';
    return declared + " : m\ny : m\ny = " + used + "\n";
}

// `count` declared names and as many formulas each using an undeclared near miss of one:
// every finding searches all the declared names for similar ones.
inline std::string many_near_misses(std::size_t count) {
    std::string out;
    for (std::size_t i = 0; i < count; ++i)
        out += "name_" + std::to_string(i) + "_x : m\n";
    out += "z : m\n";
    for (std::size_t i = 0; i < count; ++i)
        out += "z = nome_" + std::to_string(i) + "_x\n";
    return out;
}

// `declared` long names besides q0_x, and `queries` undeclared short names q0, q1...: each
// search is cheap (the lengths differ), but together they pass the comparison budget.
inline std::string near_misses_past_budget(std::size_t declared, std::size_t queries) {
    std::string out = "q0_x : m\nz : m\n";
    for (std::size_t i = 0; i < declared; ++i)
        out += "declared_name_" + std::to_string(i) + " : m\n";
    for (std::size_t i = 0; i < queries; ++i)
        out += "z = q" + std::to_string(i) + "\n";
    return out;
}

// y = x^1 + x^2 + ... + x^count: every term of a dimension of its own, so the search for the
// dimension most terms share meets `count` different ones.
inline std::string distinct_dimensions_sum(std::size_t count) {
    std::string out = "x : m\ny : m\ny = ";
    for (std::size_t i = 1; i <= count; ++i)
        out += (i > 1 ? " + x^" : "x^") + std::to_string(i);
    return out + "\n";
}

// y = a + b + a + b ...: half the terms disagree with the other half, and the finding explains
// them.
inline std::string half_odd_sum(std::size_t count) {
    std::string out = "a : m\nb : s\ny : m\ny = a";
    for (std::size_t i = 1; i < count; ++i)
        out += i % 2 == 0 ? " + a" : " + b";
    return out + "\n";
}

// One line with `count` findings: ln of a length, over and over. Each finding's excerpt shows
// the same long line.
inline std::string findings_on_one_line(std::size_t count) {
    std::string out = "a : m\ny : 1\ny = ln(a)";
    for (std::size_t i = 1; i < count; ++i)
        out += " + ln(a)";
    return out + "\n";
}

// a = a = b = a = b ...: a chain of `count` relations on one line, half of whose sides differ.
inline std::string relation_chain(std::size_t count) {
    std::string out = "a : m\nb : s\na";
    for (std::size_t i = 0; i < count; ++i)
        out += i % 2 == 0 ? " = a" : " = b";
    return out + "\n";
}

// x0 = x1*L, x1 = x2*L, ..., x(count-1) = L: `count` symbols to infer, all tied together.
// x_i is L^(count - i).
inline std::string inference_chain(std::size_t count) {
    std::string out = "L : m\n";
    for (std::size_t i = 0; i < count; ++i)
        out += "x" + std::to_string(i) + " : ?\n";
    for (std::size_t i = 0; i + 1 < count; ++i)
        out += "x" + std::to_string(i) + " = x" + std::to_string(i + 1) + "*L\n";
    return out + "x" + std::to_string(count - 1) + " = L\n";
}

// `count` units of the file's own (u_i = (i + 1) m), and a symbol declared in the last one.
inline std::string many_units(std::size_t count) {
    std::string out;
    for (std::size_t i = 0; i < count; ++i)
        out += "measure u" + std::to_string(i) + " = " + std::to_string(i + 1) + " m\n";
    out += "q : u" + std::to_string(count - 1) + "\np : m\np = q\n";
    return out;
}

// A study of `count` variables over eight dimensions that cycle, so most groups are ratios of
// two variables of one dimension.
inline std::string large_study(std::size_t count) {
    static constexpr const char* units[] = {"m", "s", "kg", "m/s", "kg/m^3", "Pa", "N", "Pa*s"};
    std::string out;
    for (std::size_t i = 0; i < count; ++i)
        out += "v" + std::to_string(i) + " : " + units[i % std::size(units)] + "\n";
    out += "study big: v0 depends on v1";
    for (std::size_t i = 2; i < count; ++i)
        out += ", v" + std::to_string(i);
    return out + "\n";
}

// y = a + a + ... on one line of about `bytes` bytes: memory per input byte.
inline std::string one_long_formula(std::size_t bytes) {
    std::string out = "a : m\ny : m\ny = a";
    out.reserve(bytes + 16);
    while (out.size() < bytes)
        out += " + a";
    return out + "\n";
}

} // namespace plumb::hostile
