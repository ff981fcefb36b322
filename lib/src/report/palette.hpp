// plumb's colours: a drafting-office hi-vis set from the 256-colour range, and the one helper
// that wraps text in them. The README's "Colour" table lists the same choices.
#pragma once

#include <string>
#include <string_view>

namespace plumb::palette {

inline constexpr std::string_view reset = "\x1b[0m";
inline constexpr std::string_view strong = "\x1b[1m";
inline constexpr std::string_view error = "\x1b[1;38;5;202m";   // bold safety orange
inline constexpr std::string_view warning = "\x1b[1;38;5;178m"; // bold amber
inline constexpr std::string_view note = "\x1b[38;5;73m";       // teal
inline constexpr std::string_view odd_term = "\x1b[38;5;202m";  // safety orange
inline constexpr std::string_view term = "\x1b[38;5;109m";      // steel blue
inline constexpr std::string_view rule = "\x1b[38;5;245m";      // grey

// Colour only when asked (the command line decides about terminals and NO_COLOR).
struct painter {
    bool on = false;
    [[nodiscard]] std::string operator()(std::string_view colour, std::string_view text) const {
        if (!on || text.empty())
            return std::string(text);
        std::string out;
        out.reserve(colour.size() + text.size() + reset.size());
        out.append(colour).append(text).append(reset);
        return out;
    }
};

} // namespace plumb::palette
