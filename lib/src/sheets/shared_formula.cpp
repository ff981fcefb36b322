// Moves the relative parts of each A1 reference; '$' parts stay. Text in double quotes and
// quoted sheet names are copied as they are; a name followed by '(' is a function.
#include "sheets/shared_formula.hpp"

#include <cstdint>

namespace plumb::sheets {

namespace {

bool is_name_char(char c) {
    return (c >= 'A' && c <= 'Z') || (c >= 'a' && c <= 'z') || (c >= '0' && c <= '9') || c == '_' ||
           c == '.' || c == '$' || static_cast<unsigned char>(c) >= 0x80;
}

bool is_digit(char c) {
    return c >= '0' && c <= '9';
}

// One word: a cell reference ("C4", "$C$4") moved by the offsets, the word itself when it
// is no cell reference, or empty when a moved reference would leave the sheet.
std::optional<std::string> shift_word(std::string_view word, std::int64_t rows,
                                      std::int64_t columns, bool by_colon, bool& unhandled) {
    std::size_t i = 0;
    const bool column_fixed = i < word.size() && word[i] == '$';
    if (column_fixed)
        ++i;
    const std::size_t letters_begin = i;
    while (i < word.size() && word[i] >= 'A' && word[i] <= 'Z' && i - letters_begin < 4)
        ++i;
    const std::size_t letters_end = i;
    const bool row_fixed = i < word.size() && word[i] == '$';
    if (row_fixed)
        ++i;
    const std::size_t digits_begin = i;
    while (i < word.size() && is_digit(word[i]) && i - digits_begin < 8)
        ++i;
    const bool is_reference = letters_end > letters_begin && letters_end - letters_begin <= 3 &&
                              i > digits_begin && i == word.size() && word[digits_begin] != '0';
    if (!is_reference) {
        // "A", "$A", "1" and "$1" are the halves of whole-column or whole-row ranges.
        const bool only_letters = letters_end == word.size() && letters_end > letters_begin;
        const bool only_digits = letters_end == letters_begin && i == word.size() && i > 0;
        if (by_colon && (only_letters || only_digits))
            unhandled = true;
        return std::string(word);
    }
    std::int64_t column = 0;
    for (std::size_t k = letters_begin; k < letters_end; ++k)
        column = column * 26 + (word[k] - 'A' + 1);
    std::int64_t row = 0;
    for (std::size_t k = digits_begin; k < i; ++k)
        row = row * 10 + (word[k] - '0');
    if (!column_fixed)
        column += columns;
    if (!row_fixed)
        row += rows;
    if (column < 1 || column > max_columns || row < 1 || row > max_rows)
        return std::nullopt;
    std::string out = column_fixed ? "$" : "";
    out += column_name(static_cast<std::uint32_t>(column - 1));
    out += row_fixed ? "$" : "";
    out += std::to_string(row);
    return out;
}

} // namespace

std::optional<std::string> shift_formula(std::string_view master, cell_address from,
                                         cell_address to) {
    const std::int64_t rows = std::int64_t{to.row} - std::int64_t{from.row};
    const std::int64_t columns = std::int64_t{to.column} - std::int64_t{from.column};
    std::string out;
    bool unhandled = false;
    std::size_t i = 0;
    while (i < master.size()) {
        const char c = master[i];
        if (c == '"' || c == '\'') {
            // A string or a quoted sheet name; a doubled quote stays inside it.
            std::size_t j = i + 1;
            while (j < master.size()) {
                if (master[j] == c && j + 1 < master.size() && master[j + 1] == c)
                    j += 2;
                else if (master[j] == c)
                    break;
                else
                    ++j;
            }
            j = j < master.size() ? j + 1 : j;
            out.append(master.substr(i, j - i));
            i = j;
            continue;
        }
        if (!is_name_char(c)) {
            out += c;
            ++i;
            continue;
        }
        std::size_t j = i;
        while (j < master.size() && is_name_char(master[j]))
            ++j;
        const std::string_view word = master.substr(i, j - i);
        const bool is_number = is_digit(word.front()) && (j >= master.size() || master[j] != ':') &&
                               (i == 0 || master[i - 1] != ':');
        const bool before_call_or_sheet =
            j < master.size() && (master[j] == '(' || master[j] == '!');
        if (is_number || before_call_or_sheet || word.find('.') != std::string_view::npos) {
            out.append(word);
        } else {
            const bool by_colon =
                (j < master.size() && master[j] == ':') || (i > 0 && master[i - 1] == ':');
            const auto moved = shift_word(word, rows, columns, by_colon, unhandled);
            if (!moved)
                return std::nullopt;
            out += *moved;
        }
        i = j;
    }
    if (unhandled)
        return std::nullopt;
    return out;
}

} // namespace plumb::sheets
