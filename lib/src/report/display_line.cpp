#include "report/display_line.hpp"

namespace plumb {
namespace {

bool is_continuation_byte(char c) {
    return (static_cast<unsigned char>(c) & 0xC0) == 0x80;
}

// U+0300-U+036F: drawn over the character before it (the dot of Q̇), so it takes no cell.
bool is_combining_mark(std::string_view text, std::size_t i) {
    if (i + 1 >= text.size())
        return false;
    const auto c0 = static_cast<unsigned char>(text[i]);
    const auto c1 = static_cast<unsigned char>(text[i + 1]);
    return (c0 == 0xCC && c1 >= 0x80 && c1 <= 0xBF) || (c0 == 0xCD && c1 >= 0x80 && c1 <= 0xAF);
}

} // namespace

bool starts_a_cell(std::string_view text, std::size_t i) {
    return !is_continuation_byte(text[i]) && !is_combining_mark(text, i);
}

display_line layout(std::string_view line) {
    display_line d;
    d.cell.resize(line.size() + 1);
    std::uint32_t col = 0;
    for (std::size_t i = 0; i < line.size(); ++i) {
        d.cell[i] = col;
        const char c = line[i];
        if (c == '\t') {
            const std::uint32_t next = (col / 4 + 1) * 4;
            d.text.append(next - col, ' ');
            col = next;
        } else {
            d.text += (static_cast<unsigned char>(c) < 0x20) ? ' ' : c;
            if (starts_a_cell(line, i))
                ++col;
        }
    }
    d.cell[line.size()] = col;
    return d;
}

std::size_t byte_at_cell(std::string_view text, std::uint32_t target) {
    std::uint32_t col = 0;
    for (std::size_t i = 0; i < text.size(); ++i) {
        if (!starts_a_cell(text, i))
            continue;
        if (col == target)
            return i;
        ++col;
    }
    return text.size();
}

std::uint32_t cell_count(std::string_view text) {
    std::uint32_t cells = 0;
    for (std::size_t i = 0; i < text.size(); ++i)
        if (starts_a_cell(text, i))
            ++cells;
    return cells;
}

} // namespace plumb
