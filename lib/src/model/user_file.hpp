// The one way plumb reads a file a user names (a calc, a dictionary, a sidecar, plumb.toml,
// the accepted findings, a workbook): regular files only, never blocking, and never more than
// a limit, counted while reading, so /dev/zero, a FIFO with no writer or a file that grows
// while it is read is a plain refusal rather than a hang or memory running out.
#pragma once

#include <cstdint>
#include <filesystem>
#include <string>

namespace plumb {

// The largest text file plumb reads (notation, Markdown, TOML): far above any calc package,
// far below what would strain a CI machine.
inline constexpr std::uint64_t max_text_file_bytes = std::uint64_t{64} << 20;

// A workbook is a zip package, larger than the text it holds.
inline constexpr std::uint64_t max_workbook_file_bytes = std::uint64_t{256} << 20;

struct user_file {
    std::string text;
    std::string
        problem; // empty when read; else why not, in words for the person ("it is a folder")
    bool missing = false; // no file at the path (some callers treat that as "none yet")
};

[[nodiscard]] user_file read_user_file(const std::filesystem::path& path,
                                       std::uint64_t limit = max_text_file_bytes);

// "64 MiB", "1.5 KiB", "100 bytes": a limit as the messages and the README state it.
[[nodiscard]] std::string byte_size_text(std::uint64_t bytes);

} // namespace plumb
