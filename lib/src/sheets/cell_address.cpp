// A1 names of cells and areas, both ways.
#include "sheets/workbook.hpp"

#include <algorithm>

namespace plumb::sheets {

std::string column_name(std::uint32_t column) {
    std::string out;
    std::uint32_t n = column + 1;
    while (n > 0) {
        const std::uint32_t r = (n - 1) % 26;
        out.push_back(static_cast<char>('A' + r));
        n = (n - 1) / 26;
    }
    std::reverse(out.begin(), out.end());
    return out;
}

std::string a1_name(cell_address a) {
    return column_name(a.column) + std::to_string(a.row + 1);
}

std::string a1_name(const cell_area& a) {
    if (a.single())
        return a1_name(a.first);
    if (a.first.row == 0 && a.last.row == max_rows - 1)
        return column_name(a.first.column) + ":" + column_name(a.last.column);
    return a1_name(a.first) + ":" + a1_name(a.last);
}

std::optional<cell_address> parse_a1(std::string_view t) {
    std::size_t i = 0;
    if (i < t.size() && t[i] == '$')
        ++i;
    std::uint64_t column = 0;
    std::size_t letters = 0;
    while (i < t.size() && ((t[i] >= 'A' && t[i] <= 'Z') || (t[i] >= 'a' && t[i] <= 'z'))) {
        column = column * 26 + static_cast<std::uint64_t>((t[i] & ~0x20) - 'A' + 1);
        ++i;
        if (++letters > 3)
            return std::nullopt;
    }
    if (letters == 0)
        return std::nullopt;
    if (i < t.size() && t[i] == '$')
        ++i;
    std::uint64_t row = 0;
    std::size_t digits = 0;
    while (i < t.size() && t[i] >= '0' && t[i] <= '9') {
        row = row * 10 + static_cast<std::uint64_t>(t[i] - '0');
        ++i;
        if (++digits > 7)
            return std::nullopt;
    }
    if (digits == 0 || i != t.size() || row == 0 || row > max_rows || column > max_columns)
        return std::nullopt;
    return cell_address{static_cast<std::uint32_t>(row - 1),
                        static_cast<std::uint32_t>(column - 1)};
}

std::string quoted_sheet_name(std::string_view name) {
    const bool plain = !name.empty() && !(name[0] >= '0' && name[0] <= '9') &&
                       std::all_of(name.begin(), name.end(), [](char c) {
                           return (c >= 'A' && c <= 'Z') || (c >= 'a' && c <= 'z') ||
                                  (c >= '0' && c <= '9') || c == '_';
                       });
    if (plain)
        return std::string(name);
    std::string out = "'";
    for (const char c : name) {
        out += c;
        if (c == '\'')
            out += '\'';
    }
    return out + "'";
}

} // namespace plumb::sheets
