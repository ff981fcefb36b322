// XML parts parsed with pugixml, refusing what a workbook never needs: a document type
// declaration (and with it every entity trick) and nesting beyond a limit.
#pragma once

#include "sheets/workbook.hpp"

#include <pugixml.hpp>
#include <string>
#include <string_view>

namespace plumb::sheets {

// Parses `text` (kept alive by the document). Throws workbook_error naming `part`.
void parse_xml(pugi::xml_document& doc, std::string& text, std::string_view part,
               const read_limits& limits);

// The element's name without its namespace prefix ("table:table-cell" -> "table-cell").
std::string_view local_name(const pugi::xml_node& node);
// The first child element with that local name; empty when none.
pugi::xml_node child_named(const pugi::xml_node& node, std::string_view local);
// An attribute by local name, whatever its prefix.
pugi::xml_attribute attribute_named(const pugi::xml_node& node, std::string_view local);

} // namespace plumb::sheets
