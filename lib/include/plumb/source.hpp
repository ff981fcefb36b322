// A source file held in memory with a line index, and byte ranges into it.
#pragma once

#include <cstdint>
#include <string>
#include <string_view>
#include <vector>

namespace plumb {

// A half-open byte range [begin, end) in one source file.
struct span {
    std::uint32_t begin = 0;
    std::uint32_t end = 0;
};

struct line_column {
    std::uint32_t line = 1;   // 1-based
    std::uint32_t column = 1; // 1-based, in characters (UTF-8 code points), as editors count
};

// Where a line of a workbook's formula listing stands in the workbook.
struct cell_place {
    std::string sheet;
    std::string cell; // A1 form, "C44"
};

class source_file {
  public:
    source_file(std::string path, std::string text);

    [[nodiscard]] const std::string& path() const { return path_; }
    // Distinct for every source_file made in this process: a key for caches that must not
    // mistake a new file at a freed one's address for it.
    [[nodiscard]] std::uint64_t serial() const { return serial_; }
    [[nodiscard]] std::string_view text() const { return text_; }
    [[nodiscard]] std::string_view text(span s) const {
        return std::string_view(text_).substr(s.begin, s.end - s.begin);
    }

    [[nodiscard]] line_column position(std::uint32_t byte_offset) const;
    // Byte offset where a 1-based line starts.
    [[nodiscard]] std::uint32_t line_start(std::uint32_t line) const {
        return line_starts_[line - 1];
    }
    // The text of a 1-based line without its line break.
    [[nodiscard]] std::string_view line_text(std::uint32_t line) const;
    [[nodiscard]] std::uint32_t line_count() const {
        return static_cast<std::uint32_t>(line_starts_.size());
    }

    // A workbook's listing has one formula (or input value) per line, each from a cell;
    // findings in it are placed by sheet and cell rather than by line and column.
    void set_cell_places(std::vector<cell_place> places) { cell_places_ = std::move(places); }
    // The cell of the line holding `byte_offset`; null for an ordinary file.
    [[nodiscard]] const cell_place* cell_at(std::uint32_t byte_offset) const;
    // Whether this is a workbook's listing (or its table of input values).
    [[nodiscard]] bool holds_cells() const { return !cell_places_.empty(); }

  private:
    struct column_mark {
        std::uint32_t offset; // a byte offset within a long line
        std::uint32_t column; // its column
    };
    static constexpr std::uint32_t column_mark_stride = 4096;

    std::string path_;
    std::string text_;
    std::uint64_t serial_ = 0;
    std::vector<std::uint32_t> line_starts_;
    std::vector<column_mark> column_marks_; // ascending by offset, for lines longer than the stride
    std::vector<cell_place> cell_places_;
};

// "Pump!C44", "'Pump data'!C44": a cell as a spreadsheet user writes it.
std::string cell_text(const cell_place& place);

// Source text shown on one line: continuation breaks and their comments folded, runs of
// blanks squeezed to one space. Messages quote terms this way.
std::string single_line(std::string_view raw);

} // namespace plumb
