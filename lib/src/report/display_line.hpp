// Display cells of a source line: one cell per code point (none for a combining mark), tabs to the
// next multiple of 4, so the excerpt's formula and the braces under it line up.
#pragma once

#include <cstdint>
#include <string>
#include <string_view>
#include <vector>

namespace plumb {

struct display_line {
    std::string text;                // control characters blanked, tabs expanded
    std::vector<std::uint32_t> cell; // display cell of each byte of the original line, and
                                     // one past the end
};

display_line layout(std::string_view line);

// Byte index in `text` (already laid out) where display cell `target` starts; text.size()
// when the text is shorter.
std::size_t byte_at_cell(std::string_view text, std::uint32_t target);

// Whether the byte at text[i] starts a display cell: not a UTF-8 continuation byte, nor a
// combining mark, which is drawn over the character before it.
bool starts_a_cell(std::string_view text, std::size_t i);

// Display cells that laid-out text takes.
std::uint32_t cell_count(std::string_view text);

} // namespace plumb
