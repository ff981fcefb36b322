// Where a finding stands, as its first words say it: "file:line:column", or "book.xlsx:Sheet!C4"
// for a workbook's formula (its line and column are in plumb's listing, which no one can open),
// or "plumb" for a finding about no file.
#pragma once

#include "plumb/diagnostic.hpp"

#include <fmt/format.h>

#include <string>

namespace plumb {

inline std::string place_text(const location& where) {
    if (where.file == nullptr)
        return "plumb";
    if (const cell_place* cell = where.file->cell_at(where.range.begin))
        return fmt::format("{}:{}", where.file->path(), cell_text(*cell));
    const line_column p = where.file->position(where.range.begin);
    return fmt::format("{}:{}:{}", where.file->path(), p.line, p.column);
}

} // namespace plumb
