#include "notation/described_kind.hpp"

#include "model/ascii_case.hpp"

#include <algorithm>
#include <array>
#include <cctype>
#include <string>

namespace plumb {
namespace {

struct kind_word {
    std::string_view words;       // lower case; matched as whole words
    std::array<int, 4> mlt_theta; // exponents of M, L, T and Θ
};

// Words engineers write in descriptions that name one kind of quantity (common practice).
// Longer phrases are tried first, so "mass flow" is not taken for a volume flow.
constexpr kind_word kind_words[] = {
    {"mass flow", {1, 0, -1, 0}},     {"flow", {0, 3, -1, 0}},        {"discharge", {0, 3, -1, 0}},
    {"pressure", {1, -1, -2, 0}},     {"stress", {1, -1, -2, 0}},     {"temperature", {0, 0, 0, 1}},
    {"velocity", {0, 1, -1, 0}},      {"speed", {0, 1, -1, 0}},       {"density", {1, -3, 0, 0}},
    {"concentration", {1, -3, 0, 0}}, {"permeability", {0, 2, 0, 0}}, {"area", {0, 2, 0, 0}},
    {"volume", {0, 3, 0, 0}},         {"diameter", {0, 1, 0, 0}},     {"length", {0, 1, 0, 0}},
    {"depth", {0, 1, 0, 0}},          {"width", {0, 1, 0, 0}},        {"height", {0, 1, 0, 0}},
    {"force", {1, 1, -2, 0}},         {"power", {1, 2, -3, 0}},       {"energy", {1, 2, -2, 0}},
    {"time", {0, 0, 1, 0}},           {"mass", {1, 0, 0, 0}},
};

bool is_letter(char c) {
    return std::isalpha(static_cast<unsigned char>(c)) != 0;
}

// Whether `phrase` stands in `text` as whole words (plurals allowed: "flows").
bool has_words(const std::string& text, std::string_view phrase) {
    for (std::size_t at = text.find(phrase); at != std::string::npos;
         at = text.find(phrase, at + 1)) {
        const std::size_t end = at + phrase.size();
        const bool starts = at == 0 || !is_letter(text[at - 1]);
        const bool ends =
            end == text.size() || !is_letter(text[end]) ||
            (text[end] == 's' && (end + 1 == text.size() || !is_letter(text[end + 1])));
        if (starts && ends)
            return true;
    }
    return false;
}

} // namespace

std::optional<dimension> described_kind(std::string_view description) {
    std::string text = lower_ascii(description);
    std::optional<dimension> found;
    for (const kind_word& k : kind_words) {
        if (!has_words(text, k.words))
            continue;
        std::array<rational, base_dimension_count> e{};
        for (std::size_t i = 0; i < k.mlt_theta.size(); ++i)
            e[i] = rational(k.mlt_theta[i]);
        const dimension d = dimension::from_exponents(e);
        if (found && !(*found == d))
            return std::nullopt; // "flow velocity": two kinds, no preference
        found = d;
        // A longer phrase names the kind; the shorter words inside it do not name another.
        text.replace(text.find(k.words), k.words.size(), std::string(k.words.size(), ' '));
    }
    return found;
}

bool describes_a_temperature(std::string_view description) {
    const std::string text = lower_ascii(description);
    for (const std::string_view words : {"temperature", "temp", "specific heat", "heat capacity"})
        if (has_words(text, words))
            return true;
    return text.find("\u00B0c") != std::string::npos || text.find("\u00B0f") != std::string::npos;
}

} // namespace plumb
