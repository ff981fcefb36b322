#include "check/path_patterns.hpp"

#include <vector>

namespace plumb {
namespace {

// Iterative wildcard matching with one back-track point per kind of star, so that no pattern
// can take exponential time.
bool glob(std::string_view p, std::string_view s) {
    std::size_t pi = 0;
    std::size_t si = 0;
    std::size_t star_p = std::string_view::npos; // after the last '*' (no '/')
    std::size_t star_s = 0;
    std::size_t deep_p = std::string_view::npos; // after the last '**'
    std::size_t deep_s = 0;
    while (si < s.size()) {
        if (pi + 1 < p.size() + 1 && p.substr(pi, 2) == "**") {
            pi += 2;
            if (pi < p.size() && p[pi] == '/')
                ++pi; // "a/**/b" also matches "a/b"
            deep_p = pi;
            deep_s = si;
            star_p = std::string_view::npos;
            continue;
        }
        if (pi < p.size() && p[pi] == '*') {
            star_p = ++pi;
            star_s = si;
            continue;
        }
        if (pi < p.size() && (p[pi] == s[si] || (p[pi] == '?' && s[si] != '/'))) {
            ++pi;
            ++si;
            continue;
        }
        if (star_p != std::string_view::npos && s[star_s] != '/') {
            pi = star_p;
            si = ++star_s;
            continue;
        }
        if (deep_p != std::string_view::npos) {
            pi = deep_p;
            si = ++deep_s;
            star_p = std::string_view::npos;
            continue;
        }
        return false;
    }
    while (pi < p.size() && p[pi] == '*')
        ++pi;
    return pi == p.size();
}

} // namespace

bool path_matches(std::string_view pattern, std::string_view path) {
    while (pattern.size() > 2 && pattern.substr(0, 2) == "./")
        pattern.remove_prefix(2);
    while (!pattern.empty() && pattern.back() == '/')
        pattern.remove_suffix(1);
    if (pattern.empty())
        return false;
    if (glob(pattern, path))
        return true;
    // A folder matches what it holds.
    for (std::size_t slash = path.find('/'); slash != std::string_view::npos;
         slash = path.find('/', slash + 1))
        if (glob(pattern, path.substr(0, slash)))
            return true;
    return false;
}

} // namespace plumb
