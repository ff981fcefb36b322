// Fenced code blocks as CommonMark describes them: a line of three or more backticks or
// tildes, indented at most three spaces, opens a block; its info string's first word is the
// tag; a line of at least as many of the same character closes it.
#include "notation/markdown.hpp"

namespace plumb {
namespace {

struct fence {
    char mark = 0;
    std::size_t length = 0;
    std::string_view info;
};

// The fence a line opens or closes, if it is one.
fence fence_of(std::string_view line) {
    std::size_t indent = 0;
    while (indent < line.size() && indent < 4 && line[indent] == ' ')
        ++indent;
    if (indent > 3 || indent >= line.size() || (line[indent] != '`' && line[indent] != '~'))
        return {};
    const char mark = line[indent];
    std::size_t end = indent;
    while (end < line.size() && line[end] == mark)
        ++end;
    if (end - indent < 3)
        return {};
    std::string_view info = line.substr(end);
    while (!info.empty() && (info.front() == ' ' || info.front() == '\t'))
        info.remove_prefix(1);
    while (!info.empty() && (info.back() == ' ' || info.back() == '\t' || info.back() == '\r'))
        info.remove_suffix(1);
    if (mark == '`' && info.find('`') != std::string_view::npos)
        return {};
    return {mark, end - indent, info};
}

bool tagged_plumb(std::string_view info) {
    const std::string_view word = info.substr(0, info.find_first_of(" \t{"));
    return word == markdown_block_tag;
}

template <typename OnLine> void walk(std::string_view text, OnLine on_line) {
    fence open;
    bool in_plumb = false;
    std::size_t begin = 0;
    while (begin <= text.size()) {
        std::size_t end = text.find('\n', begin);
        if (end == std::string_view::npos)
            end = text.size();
        const std::string_view line = text.substr(begin, end - begin);
        const fence f = fence_of(line);
        bool keep = false;
        if (open.mark == 0) {
            if (f.mark != 0) {
                open = f;
                in_plumb = tagged_plumb(f.info);
            }
        } else if (f.mark == open.mark && f.length >= open.length && f.info.empty()) {
            open = {};
            in_plumb = false;
        } else {
            keep = in_plumb;
        }
        if (!on_line(line, keep, end == text.size()))
            return;
        if (end == text.size())
            break;
        begin = end + 1;
    }
}

} // namespace

std::string plumb_blocks_of(std::string_view markdown) {
    std::string out;
    out.reserve(markdown.size());
    walk(markdown, [&](std::string_view line, bool keep, bool last) {
        if (keep)
            out += line;
        if (!last)
            out += '\n';
        return true;
    });
    return out;
}

bool has_plumb_blocks(std::string_view markdown) {
    if (markdown.find(markdown_block_tag) == std::string_view::npos)
        return false;
    bool found = false;
    walk(markdown, [&](std::string_view, bool keep, bool) {
        found = found || keep;
        return !found;
    });
    return found;
}

} // namespace plumb
