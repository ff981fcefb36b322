// pugixml never expands entities declared in a DTD, but a DOCTYPE has no place in a
// workbook part, so it is refused outright rather than skipped.
#include "sheets/safe_xml.hpp"

#include "model/ascii_case.hpp"
#include "model/utf8.hpp"

#include <algorithm>
#include <fmt/format.h>

namespace plumb::sheets {

namespace {

bool has_doctype(std::string_view text) {
    // Case-insensitively: "<!DOCTYPE" anywhere is either a declaration or inside a comment or
    // CDATA, which a workbook part does not need either.
    for (std::size_t at = text.find("<!"); at != std::string_view::npos;
         at = text.find("<!", at + 2)) {
        const std::string_view rest = text.substr(at + 2, 7);
        const std::string upper = upper_ascii(rest);
        if (upper == "DOCTYPE")
            return true;
    }
    return false;
}

} // namespace

void parse_xml(pugi::xml_document& doc, std::string& text, std::string_view part,
               const read_limits& limits) {
    if (has_doctype(text))
        throw workbook_error(fmt::format("the part '{}' declares a document type (DOCTYPE), "
                                         "which no workbook needs; it is refused for safety",
                                         part));
    if (const auto bad = first_invalid_utf8(text))
        throw workbook_error(fmt::format("the part '{}' is not valid UTF-8 ({} at byte {}); the "
                                         "file is damaged or was not saved by a spreadsheet",
                                         part, invalid_bytes_text(text, *bad), *bad));
    const pugi::xml_parse_result result = doc.load_buffer_inplace(
        text.data(), text.size(), pugi::parse_default & ~pugi::parse_doctype, pugi::encoding_utf8);
    if (!result)
        throw workbook_error(fmt::format("the part '{}' is not well-formed XML ({} at byte {}); "
                                         "the file is damaged or truncated",
                                         part, result.description(), result.offset));
    // Walk without recursion, so depth itself cannot exhaust the stack.
    std::size_t depth = 1;
    pugi::xml_node n = doc.first_child();
    while (n) {
        if (n.first_child()) {
            n = n.first_child();
            if (++depth > limits.max_xml_depth)
                throw workbook_error(fmt::format("the part '{}' nests elements more than {} "
                                                 "deep, far beyond any workbook",
                                                 part, limits.max_xml_depth));
            continue;
        }
        while (n != doc && !n.next_sibling()) {
            n = n.parent();
            --depth;
        }
        if (n == doc)
            break;
        n = n.next_sibling();
    }
}

std::string_view local_name(const pugi::xml_node& node) {
    const std::string_view name = node.name();
    const std::size_t colon = name.find(':');
    return colon == std::string_view::npos ? name : name.substr(colon + 1);
}

pugi::xml_node child_named(const pugi::xml_node& node, std::string_view local) {
    for (pugi::xml_node c = node.first_child(); c; c = c.next_sibling())
        if (c.type() == pugi::node_element && local_name(c) == local)
            return c;
    return {};
}

pugi::xml_attribute attribute_named(const pugi::xml_node& node, std::string_view local) {
    for (pugi::xml_attribute a = node.first_attribute(); a; a = a.next_attribute()) {
        const std::string_view name = a.name();
        const std::size_t colon = name.find(':');
        if ((colon == std::string_view::npos ? name : name.substr(colon + 1)) == local)
            return a;
    }
    return {};
}

} // namespace plumb::sheets
