// SpreadsheetML (ECMA-376 Part 1, 18): workbook.xml for the sheets and defined names, the
// workbook's relationships for each sheet's part, sharedStrings.xml, and each sheet's cells.
#include "sheets/archive.hpp"
#include "sheets/readers.hpp"
#include "sheets/safe_xml.hpp"
#include "sheets/shared_formula.hpp"

#include <fmt/format.h>
#include <map>

namespace plumb::sheets {

namespace {

std::string all_text(const pugi::xml_node& node, std::string_view element) {
    // Rich text runs (<r><t>) joined; phonetic runs (<rPh>) are not part of the value.
    std::string out;
    for (pugi::xml_node c = node.first_child(); c; c = c.next_sibling()) {
        if (c.type() != pugi::node_element)
            continue;
        if (local_name(c) == element)
            out += c.text().get();
        else if (local_name(c) == "r")
            out += all_text(c, element);
    }
    return out;
}

std::string part_path(std::string_view target) {
    if (!target.empty() && target.front() == '/')
        return std::string(target.substr(1));
    return "xl/" + std::string(target);
}

void read_sheet(archive& zip, const std::string& part, sheet& out,
                const std::vector<std::string>& shared, const read_limits& limits,
                std::size_t& cell_count) {
    auto text = zip.read(part);
    if (!text)
        throw workbook_error(
            fmt::format("the sheet '{}' has no part '{}' in the package", out.name, part));
    pugi::xml_document doc;
    parse_xml(doc, *text, part, limits);
    const pugi::xml_node data = child_named(child_named(doc, "worksheet"), "sheetData");
    std::uint32_t next_row = 0;
    std::map<std::string, std::pair<cell_address, std::string>> masters; // by "si"
    for (pugi::xml_node row = data.first_child(); row; row = row.next_sibling()) {
        if (local_name(row) != "row")
            continue;
        std::uint32_t r = next_row;
        if (const auto a = attribute_named(row, "r")) {
            const unsigned long long v = a.as_ullong();
            if (v == 0 || v > max_rows)
                throw workbook_error(fmt::format("'{}' has a row number out of range", part));
            r = static_cast<std::uint32_t>(v - 1);
        }
        next_row = r + 1;
        std::uint32_t next_column = 0;
        for (pugi::xml_node c = row.first_child(); c; c = c.next_sibling()) {
            if (local_name(c) != "c")
                continue;
            cell_address at{r, next_column};
            if (const auto a = attribute_named(c, "r")) {
                const auto parsed = parse_a1(a.value());
                if (!parsed)
                    throw workbook_error(fmt::format(
                        "'{}' has a cell named '{}', not an A1 address", part, a.value()));
                at = *parsed;
            }
            next_column = at.column + 1;
            const std::string_view type = attribute_named(c, "t").value();
            const pugi::xml_node f = child_named(c, "f");
            const pugi::xml_node v = child_named(c, "v");
            cell item;
            item.at = at;
            if (f) {
                item.kind = cell_kind::formula;
                const std::string_view body = f.text().get();
                const bool is_shared =
                    std::string_view(attribute_named(f, "t").value()) == "shared";
                const std::string index = attribute_named(f, "si").value();
                if (is_shared && !body.empty())
                    masters[index] = {at, std::string(body)};
                if (is_shared && body.empty()) {
                    // A follower: the master's formula moved to this cell; one that cannot be
                    // moved stays empty and is reported as not checked.
                    const auto master = masters.find(index);
                    std::optional<std::string> moved;
                    if (master != masters.end())
                        moved = shift_formula(master->second.second, master->second.first, at);
                    item.text = moved ? "=" + *moved : "";
                } else {
                    item.text = "=" + std::string(body);
                }
            } else if (type == "s") {
                const unsigned long long i = v.text().as_ullong(~0ULL);
                if (i >= shared.size())
                    throw workbook_error(fmt::format("'{}' refers to a shared string that does "
                                                     "not exist",
                                                     part));
                item.kind = cell_kind::text;
                item.text = shared[i];
            } else if (type == "inlineStr") {
                item.kind = cell_kind::text;
                item.text = all_text(child_named(c, "is"), "t");
            } else if (type == "str") {
                item.kind = cell_kind::text;
                item.text = v.text().get();
            } else if (type == "b") {
                item.kind = cell_kind::boolean;
                item.text = v.text().get();
            } else if (type == "e") {
                item.kind = cell_kind::error;
                item.text = v.text().get();
            } else if (v) {
                item.kind = cell_kind::number;
                item.text = v.text().get();
            } else {
                continue; // formatting only
            }
            if (++cell_count > limits.max_cells)
                throw workbook_error(fmt::format("the workbook has more than {} cells, beyond "
                                                 "the limit plumb reads",
                                                 limits.max_cells));
            out.add(std::move(item));
        }
    }
}

} // namespace

workbook read_xlsx(archive& zip, const read_limits& limits) {
    workbook book;
    auto types = zip.read("[Content_Types].xml");
    if (!types)
        throw workbook_error("it has no [Content_Types].xml, so it is not an .xlsx package");
    pugi::xml_document types_doc;
    parse_xml(types_doc, *types, "[Content_Types].xml", limits);
    bool spreadsheet = false;
    std::string workbook_part = "xl/workbook.xml";
    for (pugi::xml_node o = child_named(types_doc, "Types").first_child(); o;
         o = o.next_sibling()) {
        const std::string_view content = attribute_named(o, "ContentType").value();
        if (local_name(o) == "Override" &&
            content.find("spreadsheetml.sheet.main") != std::string_view::npos) {
            spreadsheet = true;
            workbook_part = part_path(std::string_view(attribute_named(o, "PartName").value()));
            if (workbook_part.rfind("xl/xl/", 0) == 0)
                workbook_part = workbook_part.substr(3);
        }
    }
    if (!spreadsheet) {
        if (zip.has("word/document.xml"))
            throw workbook_error("it is a word-processing document (.docx), not a workbook");
        if (zip.has("ppt/presentation.xml"))
            throw workbook_error("it is a presentation (.pptx), not a workbook");
        throw workbook_error("its content types declare no spreadsheet workbook");
    }
    auto main = zip.read(workbook_part);
    if (!main)
        throw workbook_error(fmt::format("the package has no '{}'", workbook_part));
    pugi::xml_document wb;
    parse_xml(wb, *main, workbook_part, limits);

    // Relationships: rId -> part.
    const std::size_t slash = workbook_part.rfind('/');
    const std::string folder = workbook_part.substr(0, slash + 1);
    const std::string rels_part = folder + "_rels/" + workbook_part.substr(slash + 1) + ".rels";
    std::vector<std::pair<std::string, std::string>> rels;
    if (auto rels_text = zip.read(rels_part)) {
        pugi::xml_document rd;
        parse_xml(rd, *rels_text, rels_part, limits);
        for (pugi::xml_node r = child_named(rd, "Relationships").first_child(); r;
             r = r.next_sibling()) {
            const std::string_view target = attribute_named(r, "Target").value();
            std::string path = !target.empty() && target.front() == '/'
                                   ? std::string(target.substr(1))
                                   : folder + std::string(target);
            rels.emplace_back(attribute_named(r, "Id").value(), std::move(path));
        }
    }

    std::vector<std::string> shared;
    if (auto ss = zip.read(folder + "sharedStrings.xml")) {
        pugi::xml_document sd;
        parse_xml(sd, *ss, "sharedStrings.xml", limits);
        for (pugi::xml_node si = child_named(sd, "sst").first_child(); si; si = si.next_sibling())
            if (local_name(si) == "si")
                shared.push_back(all_text(si, "t"));
    }

    const pugi::xml_node root = child_named(wb, "workbook");
    std::size_t cell_count = 0;
    for (pugi::xml_node s = child_named(root, "sheets").first_child(); s; s = s.next_sibling()) {
        if (local_name(s) != "sheet")
            continue;
        sheet sh;
        sh.name = attribute_named(s, "name").value();
        const std::string_view id = attribute_named(s, "id").value();
        std::string part;
        for (const auto& [rid, path] : rels)
            if (rid == id)
                part = path;
        if (part.empty())
            throw workbook_error(fmt::format("the sheet '{}' has no part in the package", sh.name));
        read_sheet(zip, part, sh, shared, limits, cell_count);
        book.sheets.push_back(std::move(sh));
    }
    for (pugi::xml_node n = child_named(root, "definedNames").first_child(); n;
         n = n.next_sibling()) {
        if (local_name(n) != "definedName")
            continue;
        defined_name d;
        d.name = attribute_named(n, "name").value();
        d.refers_to = n.text().get();
        if (const auto local = attribute_named(n, "localSheetId"))
            d.sheet = local.as_uint();
        book.names.push_back(std::move(d));
    }
    return book;
}

} // namespace plumb::sheets
