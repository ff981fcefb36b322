// The statement (logical line) that a finding is about, and the key that matches it across
// edits elsewhere in the file.
#pragma once

#include "plumb/source.hpp"

#include <cstdint>
#include <string>
#include <string_view>

namespace plumb {

// The 1-based first and last physical lines of the logical line holding `line` (a trailing
// `\` continues a line).
struct line_range {
    std::uint32_t first = 1;
    std::uint32_t last = 1;
};
line_range logical_line_around(const source_file& file, std::uint32_t line);

// Where the comment of a physical line starts ('#' outside double quotes); npos when none.
std::size_t comment_start(std::string_view line);

// "@label" for a labelled formula; otherwise the statement's text without blanks, comments
// or continuations, so that re-indenting or moving the statement keeps its key.
std::string statement_key(const source_file& file, std::uint32_t byte_offset);

} // namespace plumb
