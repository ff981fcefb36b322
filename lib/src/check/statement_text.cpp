// Logical lines and statement keys, from the source text alone.
#include "check/statement_text.hpp"

#include <cstring>

namespace plumb {
namespace {

bool continues(std::string_view line) {
    std::string_view content = line.substr(0, std::min(comment_start(line), line.size()));
    while (!content.empty() &&
           (content.back() == ' ' || content.back() == '\t' || content.back() == '\r'))
        content.remove_suffix(1);
    return !content.empty() && content.back() == '\\';
}

} // namespace

std::size_t comment_start(std::string_view line) {
    // Most lines have no comment at all; one memchr settles them.
    const void* hash = line.empty() ? nullptr : std::memchr(line.data(), '#', line.size());
    if (hash == nullptr)
        return std::string_view::npos;
    // And most comments have no quote before them: the first '#' starts it, found without
    // the walk along the line that tells quoted text apart (issue 12).
    const auto first_hash = static_cast<std::size_t>(static_cast<const char*>(hash) - line.data());
    if (std::memchr(line.data(), '"', first_hash) == nullptr)
        return first_hash;
    bool in_quotes = false;
    for (std::size_t i = 0; i < line.size(); ++i) {
        if (line[i] == '"')
            in_quotes = !in_quotes;
        else if (line[i] == '#' && !in_quotes)
            return i;
    }
    return std::string_view::npos;
}

line_range logical_line_around(const source_file& file, std::uint32_t line) {
    line_range r{line, line};
    while (r.first > 1 && continues(file.line_text(r.first - 1)))
        --r.first;
    while (r.last < file.line_count() && continues(file.line_text(r.last)))
        ++r.last;
    return r;
}

std::string statement_key(const source_file& file, std::uint32_t byte_offset) {
    const line_range r = logical_line_around(file, file.position(byte_offset).line);
    std::string key;
    for (std::uint32_t l = r.first; l <= r.last; ++l) {
        std::string_view text = file.line_text(l);
        text = text.substr(0, std::min(comment_start(text), text.size()));
        if (l < r.last) {
            // Drop the continuation mark itself.
            const std::size_t mark = text.rfind('\\');
            if (mark != std::string_view::npos)
                text = text.substr(0, mark);
        }
        for (const char c : text)
            if (c != ' ' && c != '\t' && c != '\r')
                key += c;
    }
    if (!key.empty() && key.front() == '@') {
        // The label alone: the formula may be corrected and still be the one reviewed.
        const std::string_view first = file.line_text(r.first);
        const std::size_t at = first.find('@');
        std::size_t end = at + 1;
        while (end < first.size() && first[end] != ' ' && first[end] != '\t')
            ++end;
        return std::string(first.substr(at, end - at));
    }
    return key;
}

} // namespace plumb
