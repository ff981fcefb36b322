// A workbook as plumb needs it: the sheets' non-empty cells, with formulas in A1 form, and
// the workbook's defined names. Both readers (.xlsx, .ods) produce this.
#pragma once

#include "model/user_file.hpp"

#include <cstdint>
#include <optional>
#include <stdexcept>
#include <string>
#include <string_view>
#include <unordered_map>
#include <vector>

namespace plumb::sheets {

// The largest sheet either format allows (ECMA-376 Part 1, 18.3.1.73; LibreOffice's grid).
inline constexpr std::uint32_t max_rows = 1048576;
inline constexpr std::uint32_t max_columns = 16384;

// 0-based row and column.
struct cell_address {
    std::uint32_t row = 0;
    std::uint32_t column = 0;
    friend bool operator==(const cell_address&, const cell_address&) = default;
};

// A rectangle of cells, corners included.
struct cell_area {
    cell_address first;
    cell_address last;
    [[nodiscard]] bool single() const { return first == last; }
    [[nodiscard]] bool contains(cell_address a) const {
        return a.row >= first.row && a.row <= last.row && a.column >= first.column &&
               a.column <= last.column;
    }
};

// "C", "AB" for a 0-based column; "C44" for an address; "C4:C9" for an area.
std::string column_name(std::uint32_t column);
std::string a1_name(cell_address a);
std::string a1_name(const cell_area& a);
// "C44", "$C$44" to an address; empty when the text is not one.
std::optional<cell_address> parse_a1(std::string_view text);
// A sheet name as a reference writes it: quoted when it is not a plain word.
std::string quoted_sheet_name(std::string_view name);

enum class cell_kind : std::uint8_t { number, text, formula, boolean, error };

struct cell {
    cell_address at;
    cell_kind kind = cell_kind::text;
    std::string text; // the text; the number as stored; the formula in A1 form ("=B3*B4")
};

struct sheet {
    std::string name;
    std::vector<cell> cells;
    std::unordered_map<std::uint64_t, std::uint32_t> index; // key(address) -> cells[]

    static constexpr std::uint64_t key(cell_address a) {
        return (static_cast<std::uint64_t>(a.row) << 20) | a.column;
    }
    [[nodiscard]] const cell* find(cell_address a) const {
        const auto it = index.find(key(a));
        return it == index.end() ? nullptr : &cells[it->second];
    }
    void add(cell c) {
        index[key(c.at)] = static_cast<std::uint32_t>(cells.size());
        cells.push_back(std::move(c));
    }
};

// A workbook-wide or sheet-scoped name for a cell or range, as A1 text ("Pump!$B$3").
struct defined_name {
    std::string name;
    std::string refers_to;
    std::optional<std::size_t> sheet; // scope: the sheet it belongs to, or the whole book
};

struct workbook {
    std::vector<sheet> sheets;
    std::vector<defined_name> names;
};

// Why a workbook cannot be read: said plainly, for an engineer.
struct workbook_error : std::runtime_error {
    using std::runtime_error::runtime_error;
};

// Limits that keep a hostile file from exhausting memory or time.
struct read_limits {
    std::size_t max_file_bytes = max_workbook_file_bytes;
    std::size_t max_entries = 10000;
    std::size_t max_entry_bytes = 256U << 20; // one part, uncompressed
    std::size_t max_total_bytes = 768U << 20; // all parts read, uncompressed
    double max_ratio = 250.0;                 // uncompressed / compressed, for parts over 1 MiB
    std::size_t max_xml_depth = 256;
    std::size_t max_cells = 3000000;
};

// Reads an .xlsx or .ods held in memory; the format is told by the content, and `name` (the
// file name) must agree with it. Throws workbook_error.
workbook read_workbook(std::string_view bytes, std::string_view name,
                       const read_limits& limits = {});

} // namespace plumb::sheets
