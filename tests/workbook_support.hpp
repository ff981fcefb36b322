// Workbooks built in memory for tests: a zip package, a one-sheet .xlsx, and the findings of
// one as "Sheet!B4 rule".
#pragma once

#include "plumb/check.hpp"
#include "test_support.hpp"

#include <algorithm>
#include <cstdio>
#include <string>
#include <utility>
#include <vector>
#include <zip.h>

namespace plumb::test {

// A zip package built in memory (libzip), for files no spreadsheet would save.
inline std::string make_zip(const std::vector<std::pair<std::string, std::string>>& parts) {
    zip_error_t error;
    zip_error_init(&error);
    zip_source_t* buffer = zip_source_buffer_create(nullptr, 0, 0, &error);
    REQUIRE(buffer != nullptr);
    zip_source_keep(buffer);
    zip_t* z = zip_open_from_source(buffer, ZIP_TRUNCATE, &error);
    REQUIRE(z != nullptr);
    for (const auto& [name, data] : parts) {
        zip_source_t* s = zip_source_buffer(z, data.data(), data.size(), 0);
        REQUIRE(zip_file_add(z, name.c_str(), s, ZIP_FL_OVERWRITE) >= 0);
    }
    REQUIRE(zip_close(z) == 0);
    REQUIRE(zip_source_open(buffer) == 0);
    zip_source_seek(buffer, 0, SEEK_END);
    const zip_int64_t size = zip_source_tell(buffer);
    zip_source_seek(buffer, 0, SEEK_SET);
    std::string out(static_cast<std::size_t>(size), '\0');
    zip_source_read(buffer, out.data(), static_cast<zip_uint64_t>(size));
    zip_source_close(buffer);
    zip_source_free(buffer);
    zip_error_fini(&error);
    return out;
}

// A one-sheet .xlsx package built by hand: the least ECMA-376 parts a reader needs.
inline std::string xlsx_of_one_sheet(const std::string& name, const std::string& sheet) {
    return make_zip({{"[Content_Types].xml",
                      "<Types><Override PartName=\"/xl/workbook.xml\" ContentType=\"application/"
                      "vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml\"/></Types>"},
                     {"xl/workbook.xml", "<workbook><sheets><sheet name=\"" + name +
                                             "\" sheetId=\"1\" id=\"rId1\"/></sheets></workbook>"},
                     {"xl/_rels/workbook.xml.rels",
                      "<Relationships><Relationship Id=\"rId1\" Target=\"worksheets/sheet1.xml\"/>"
                      "</Relationships>"},
                     {"xl/worksheets/sheet1.xml", sheet}});
}

// The report on a one-sheet workbook, with `sidecar` beside it when it is not empty.
inline check_report check_one_sheet(const std::string& name, const std::string& sheet,
                                    const std::string& sidecar = {}) {
    temp_dir dir;
    const auto path = dir.write(name + ".xlsx", xlsx_of_one_sheet(name, sheet));
    if (!sidecar.empty())
        (void)dir.write(name + ".cells.plumb", sidecar);
    return check_paths({path});
}

// A report's findings at workbook cells, each as "Sheet!B4 rule", sorted.
inline std::vector<std::string> cell_findings(const check_report& report) {
    std::vector<std::string> found;
    for (const auto& d : report.diagnostics)
        if (const cell_place* c =
                d.where.file != nullptr ? d.where.file->cell_at(d.where.range.begin) : nullptr)
            found.push_back(cell_text(*c) + " " + d.rule);
    std::sort(found.begin(), found.end());
    return found;
}

// The findings of a one-sheet workbook, each as "Sheet!B4 rule", sorted.
inline std::vector<std::string> cell_findings_of_one_sheet(const std::string& name,
                                                           const std::string& sheet) {
    return cell_findings(check_one_sheet(name, sheet));
}

// One worksheet row: the value or formula in column B, its unit text in column C.
inline std::string value_and_unit_row(int r, const std::string& value, const std::string& unit) {
    const std::string n = std::to_string(r);
    const bool formula = value.front() == '=';
    return "<row r=\"" + n + "\"><c r=\"B" + n + "\">" +
           (formula ? "<f>" + value.substr(1) + "</f><v>0</v>" : "<v>" + value + "</v>") +
           "</c><c r=\"C" + n + "\" t=\"inlineStr\"><is><t>" + unit + "</t></is></c></row>";
}

} // namespace plumb::test
