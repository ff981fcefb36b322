// Letter case folded byte by byte: labels, unit words and function names are ASCII, and a UTF-8
// byte (°, μ, Θ) must pass through unchanged, whatever locale a host program has set.
#pragma once

#include <string>
#include <string_view>

namespace plumb {

inline std::string lower_ascii(std::string_view text) {
    std::string out(text);
    for (char& c : out)
        if (c >= 'A' && c <= 'Z')
            c = static_cast<char>(c - 'A' + 'a');
    return out;
}

inline std::string upper_ascii(std::string_view text) {
    std::string out(text);
    for (char& c : out)
        if (c >= 'a' && c <= 'z')
            c = static_cast<char>(c - 'a' + 'A');
    return out;
}

} // namespace plumb
