// Line index of a source file.
#include "plumb/source.hpp"

#include "model/byte_blocks.hpp"

#include <algorithm>
#include <atomic>
#include <bit>
#include <cstring>
#include <iterator>

namespace plumb {

namespace {
std::atomic<std::uint64_t> next_serial{1};
} // namespace

source_file::source_file(std::string path, std::string text)
    : path_(std::move(path)), text_(std::move(text)), serial_(next_serial++) {
    // A byte-order mark is an editor's artefact: dropping it keeps columns and the shown line
    // as the engineer sees them.
    if (text_.compare(0, 3, "\xEF\xBB\xBF") == 0)
        text_.erase(0, 3);
    line_starts_.push_back(0);
    const char* data = text_.data();
    const std::size_t size = text_.size();
    // The longest line's length (with its break) as the breaks are found, so that the walk
    // for column marks below is made only when some line needs them.
    std::size_t longest = 0;
    const auto add_line_start = [&](std::size_t start) {
        longest = std::max<std::size_t>(longest, start - line_starts_.back());
        line_starts_.push_back(static_cast<std::uint32_t>(start));
    };
    std::size_t at = 0;
    for (; size - at >= byte_block_size; at += byte_block_size)
        for (std::uint32_t breaks = bytes_equal_to(data + at, '\n'); breaks != 0;
             breaks &= breaks - 1)
            add_line_start(at + static_cast<std::size_t>(std::countr_zero(breaks)) + 1);
    for (; at < size; ++at)
        if (data[at] == '\n')
            add_line_start(at + 1);
    longest = std::max<std::size_t>(longest, size - line_starts_.back());
    if (longest <= column_mark_stride)
        return;
    // Columns count code points from the line's start, so a place far along a long line would
    // cost a walk along it for every finding, term and side placed there. Marks every
    // `column_mark_stride` bytes of such a line let the walk start nearby.
    for (std::size_t line = 0; line < line_starts_.size(); ++line) {
        const std::uint32_t begin = line_starts_[line];
        const std::uint32_t end = line + 1 < line_starts_.size() ? line_starts_[line + 1]
                                                                 : static_cast<std::uint32_t>(size);
        if (end - begin <= column_mark_stride)
            continue;
        std::uint32_t column = 1;
        for (std::uint32_t i = begin; i < end; ++i) {
            if ((i - begin) % column_mark_stride == 0 && i != begin)
                column_marks_.push_back({i, column});
            if ((static_cast<unsigned char>(text_[i]) & 0xC0) != 0x80)
                ++column;
        }
    }
}

line_column source_file::position(std::uint32_t byte_offset) const {
    const auto it = std::upper_bound(line_starts_.begin(), line_starts_.end(), byte_offset);
    const auto line = static_cast<std::uint32_t>(it - line_starts_.begin());
    std::uint32_t column = 1;
    const std::uint32_t stop =
        std::min<std::uint32_t>(byte_offset, static_cast<std::uint32_t>(text_.size()));
    std::uint32_t from = line_starts_[line - 1];
    if (stop - from > column_mark_stride) {
        const auto mark = std::upper_bound(
            column_marks_.begin(), column_marks_.end(), stop,
            [](std::uint32_t offset, const column_mark& m) { return offset < m.offset; });
        if (mark != column_marks_.begin() && std::prev(mark)->offset >= from) {
            from = std::prev(mark)->offset;
            column = std::prev(mark)->column;
        }
    }
    for (std::uint32_t i = from; i < stop; ++i)
        if ((static_cast<unsigned char>(text_[i]) & 0xC0) != 0x80)
            ++column;
    return {line, column};
}

std::string_view source_file::line_text(std::uint32_t line) const {
    if (line == 0 || line > line_starts_.size())
        return {};
    const std::uint32_t begin = line_starts_[line - 1];
    std::uint32_t end = line < line_starts_.size() ? line_starts_[line] - 1
                                                   : static_cast<std::uint32_t>(text_.size());
    if (end > begin && text_[end - 1] == '\r')
        --end;
    return std::string_view(text_).substr(begin, end - begin);
}

std::string single_line(std::string_view raw) {
    std::string out;
    bool pending_space = false;
    for (std::size_t i = 0; i < raw.size(); ++i) {
        const char c = raw[i];
        if (c == '\\' || c == '#') {
            // A continuation: skip its comment and line break.
            const std::size_t nl = raw.find('\n', i);
            if (nl == std::string_view::npos)
                break;
            i = nl;
            pending_space = true;
            continue;
        }
        if (c == ' ' || c == '\t' || c == '\r' || c == '\n') {
            pending_space = true;
            continue;
        }
        if (pending_space && !out.empty())
            out += ' ';
        pending_space = false;
        out += c;
    }
    return out;
}

const cell_place* source_file::cell_at(std::uint32_t byte_offset) const {
    if (cell_places_.empty())
        return nullptr;
    const std::uint32_t line = position(byte_offset).line;
    return line <= cell_places_.size() ? &cell_places_[line - 1] : nullptr;
}

std::string cell_text(const cell_place& place) {
    const bool plain = !place.sheet.empty() &&
                       std::all_of(place.sheet.begin(), place.sheet.end(),
                                   [](char c) {
                                       return (c >= 'A' && c <= 'Z') || (c >= 'a' && c <= 'z') ||
                                              (c >= '0' && c <= '9') || c == '_';
                                   }) &&
                       !(place.sheet[0] >= '0' && place.sheet[0] <= '9');
    if (plain)
        return place.sheet + "!" + place.cell;
    std::string quoted = "'";
    for (const char c : place.sheet) {
        quoted += c;
        if (c == '\'')
            quoted += '\'';
    }
    return quoted + "'!" + place.cell;
}

} // namespace plumb
