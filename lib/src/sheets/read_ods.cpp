// OpenDocument spreadsheets (ODF 1.2 Part 1, 9 "Tables"): content.xml's tables, rows and
// cells, with their repeat counts, and the named ranges.
#include "sheets/readers.hpp"
#include "sheets/safe_xml.hpp"

#include <fmt/format.h>

namespace plumb::sheets {

namespace {

// A paragraph's text with <text:s/> spaces, <text:tab/> and nested spans.
void paragraph_text(const pugi::xml_node& node, std::string& out) {
    for (pugi::xml_node c = node.first_child(); c; c = c.next_sibling()) {
        if (c.type() == pugi::node_pcdata || c.type() == pugi::node_cdata) {
            out += c.value();
        } else if (c.type() == pugi::node_element) {
            const std::string_view n = local_name(c);
            if (n == "s")
                out.append(std::min<unsigned>(attribute_named(c, "c").as_uint(1), 64U), ' ');
            else if (n == "tab")
                out += '\t';
            else if (n != "annotation")
                paragraph_text(c, out);
        }
    }
}

std::string cell_text(const pugi::xml_node& cell) {
    std::string out;
    for (pugi::xml_node p = cell.first_child(); p; p = p.next_sibling()) {
        if (local_name(p) != "p")
            continue;
        if (!out.empty())
            out += '\n';
        paragraph_text(p, out);
    }
    return out;
}

struct table_reader {
    const read_limits& limits;
    std::size_t& cell_count;
    sheet& out;
    std::uint32_t row = 0;

    void read_rows(const pugi::xml_node& parent) {
        for (pugi::xml_node r = parent.first_child(); r; r = r.next_sibling()) {
            const std::string_view n = local_name(r);
            if (n == "table-row") {
                const std::uint64_t repeat =
                    std::max(1U, attribute_named(r, "number-rows-repeated").as_uint(1));
                const bool empty = !has_content(r);
                for (std::uint64_t k = 0; k < repeat && row < max_rows; ++k) {
                    if (empty) {
                        row = static_cast<std::uint32_t>(
                            std::min<std::uint64_t>(row + repeat - k, max_rows));
                        break;
                    }
                    read_row(r);
                    ++row;
                }
            } else if (n == "table-header-rows" || n == "table-row-group" || n == "table-rows") {
                read_rows(r);
            }
        }
    }

    static bool has_content(const pugi::xml_node& r) {
        for (pugi::xml_node c = r.first_child(); c; c = c.next_sibling())
            if (attribute_named(c, "formula") || attribute_named(c, "value-type") ||
                child_named(c, "p"))
                return true;
        return false;
    }

    void read_row(const pugi::xml_node& r) {
        std::uint32_t column = 0;
        for (pugi::xml_node c = r.first_child(); c && column < max_columns; c = c.next_sibling()) {
            const std::string_view n = local_name(c);
            if (n != "table-cell" && n != "covered-table-cell")
                continue;
            const std::uint64_t repeat =
                std::max(1U, attribute_named(c, "number-columns-repeated").as_uint(1));
            const pugi::xml_attribute formula = attribute_named(c, "formula");
            const std::string_view type = attribute_named(c, "value-type").value();
            const bool has_text = static_cast<bool>(child_named(c, "p"));
            if (!formula && type.empty() && !has_text) {
                column = static_cast<std::uint32_t>(
                    std::min<std::uint64_t>(column + repeat, max_columns));
                continue;
            }
            cell item;
            if (formula) {
                item.kind = cell_kind::formula;
                try {
                    item.text = openformula_to_a1(formula.value());
                } catch (const workbook_error&) {
                    item.text = std::string("\x01") + formula.value(); // reported by the checker
                }
            } else if (type == "float" || type == "percentage" || type == "currency") {
                item.kind = cell_kind::number;
                item.text = attribute_named(c, "value").value();
            } else if (type == "boolean") {
                item.kind = cell_kind::boolean;
                item.text = attribute_named(c, "boolean-value").value();
            } else {
                item.kind = cell_kind::text;
                item.text = cell_text(c);
            }
            for (std::uint64_t k = 0; k < repeat && column < max_columns; ++k, ++column) {
                if (++cell_count > limits.max_cells)
                    throw workbook_error(fmt::format("the workbook has more than {} cells, beyond "
                                                     "the limit plumb reads",
                                                     limits.max_cells));
                item.at = {row, column};
                out.add(item);
            }
        }
    }
};

} // namespace

workbook read_ods(archive& zip, const read_limits& limits) {
    auto content = zip.read("content.xml");
    if (!content)
        throw workbook_error("the package has no content.xml, so it is not an .ods workbook");
    pugi::xml_document doc;
    parse_xml(doc, *content, "content.xml", limits);
    const pugi::xml_node spreadsheet =
        child_named(child_named(child_named(doc, "document-content"), "body"), "spreadsheet");
    if (!spreadsheet)
        throw workbook_error("its content.xml holds no spreadsheet");
    workbook book;
    std::size_t cell_count = 0;
    for (pugi::xml_node t = spreadsheet.first_child(); t; t = t.next_sibling()) {
        const std::string_view n = local_name(t);
        if (n == "table") {
            sheet sh;
            sh.name = attribute_named(t, "name").value();
            table_reader reader{limits, cell_count, sh};
            reader.read_rows(t);
            book.sheets.push_back(std::move(sh));
        } else if (n == "named-expressions") {
            for (pugi::xml_node r = t.first_child(); r; r = r.next_sibling()) {
                if (local_name(r) != "named-range")
                    continue;
                defined_name d;
                d.name = attribute_named(r, "name").value();
                try {
                    d.refers_to =
                        openformula_address_to_a1(attribute_named(r, "cell-range-address").value());
                } catch (const workbook_error&) {
                    continue; // not a plain range: not used for units
                }
                book.names.push_back(std::move(d));
            }
        }
    }
    return book;
}

workbook read_workbook(std::string_view bytes, std::string_view name, const read_limits& limits) {
    if (bytes.size() > limits.max_file_bytes)
        throw workbook_error(fmt::format("it is larger than {} MiB", limits.max_file_bytes >> 20));
    if (bytes.substr(0, 4) == std::string_view("\xD0\xCF\x11\xE0", 4))
        throw workbook_error("it is a password-protected (encrypted) workbook or an old binary "
                             ".xls file; plumb reads .xlsx and .ods: save a copy without a "
                             "password in one of those formats");
    const bool named_ods = name.size() >= 4 && name.substr(name.size() - 4) == ".ods";
    archive zip(bytes, limits);
    const auto mimetype = zip.read("mimetype");
    const bool is_ods = mimetype && mimetype->find("opendocument.spreadsheet") != std::string::npos;
    if (mimetype && !is_ods)
        throw workbook_error(fmt::format("it is an OpenDocument file of another kind ({}), not a "
                                         "spreadsheet",
                                         mimetype->substr(0, 80)));
    if (is_ods && !named_ods)
        throw workbook_error("it is named .xlsx but holds an OpenDocument spreadsheet; rename it "
                             "to .ods");
    if (!is_ods && named_ods)
        throw workbook_error("it is named .ods but is not an OpenDocument spreadsheet (it has no "
                             "mimetype part saying so)");
    return is_ods ? read_ods(zip, limits) : read_xlsx(zip, limits);
}

} // namespace plumb::sheets
