// Calc notes in Markdown: the fenced blocks tagged `plumb` are the file's statements.
#pragma once

#include <string>
#include <string_view>

namespace plumb {

// The notation's name as a fenced block's tag.
inline constexpr std::string_view markdown_block_tag = "plumb";

// The text of the plumb blocks with every other line emptied (fences included), so that
// lines and columns of findings are those of the .md file itself.
std::string plumb_blocks_of(std::string_view markdown);

// Whether the text has at least one plumb block.
bool has_plumb_blocks(std::string_view markdown);

} // namespace plumb
