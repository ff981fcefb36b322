#include "report/display_line.hpp"

namespace plumb {
namespace {

bool is_continuation_byte(char c) {
    return (static_cast<unsigned char>(c) & 0xC0) == 0x80;
}

} // namespace

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
            if (!is_continuation_byte(c))
                ++col;
        }
    }
    d.cell[line.size()] = col;
    return d;
}

std::size_t byte_at_cell(std::string_view text, std::uint32_t target) {
    std::uint32_t col = 0;
    for (std::size_t i = 0; i < text.size(); ++i) {
        if (is_continuation_byte(text[i]))
            continue;
        if (col == target)
            return i;
        ++col;
    }
    return text.size();
}

std::uint32_t cell_count(std::string_view text) {
    std::uint32_t cells = 0;
    for (const char c : text)
        if (!is_continuation_byte(c))
            ++cells;
    return cells;
}

} // namespace plumb
