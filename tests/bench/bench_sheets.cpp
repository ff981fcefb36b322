// plumb_bench_sheets: generates a workbook of 100 000 formula cells (a pipe schedule: flow,
// diameter, velocity, head loss per row) as an .xlsx in memory, writes it once to a temporary
// folder, and prints how long `check_paths` takes on it. Figures only; it never fails on time.
#include "plumb/check.hpp"

#include <algorithm>
#include <chrono>
#include <cstdlib>
#include <filesystem>
#include <fmt/format.h>
#include <fstream>
#include <zip.h>

namespace {

std::string zip_parts(const std::vector<std::pair<std::string, std::string>>& parts) {
    zip_error_t error;
    zip_error_init(&error);
    zip_source_t* buffer = zip_source_buffer_create(nullptr, 0, 0, &error);
    zip_source_keep(buffer);
    zip_t* z = zip_open_from_source(buffer, ZIP_TRUNCATE, &error);
    for (const auto& [name, data] : parts)
        zip_file_add(z, name.c_str(), zip_source_buffer(z, data.data(), data.size(), 0),
                     ZIP_FL_OVERWRITE);
    zip_close(z);
    zip_source_open(buffer);
    zip_source_seek(buffer, 0, SEEK_END);
    const zip_int64_t size = zip_source_tell(buffer);
    zip_source_seek(buffer, 0, SEEK_SET);
    std::string out(static_cast<std::size_t>(size), '\0');
    zip_source_read(buffer, out.data(), static_cast<zip_uint64_t>(size));
    zip_source_close(buffer);
    zip_source_free(buffer);
    return out;
}

// Rows of: A flow [L/s] input, B diameter [mm] input, C velocity =A/1000/(PI()*(B/1000)^2/4),
// D head loss =0.02*G/(B/1000)*C^2/(2*H) with G the length [m] and H gravity [m/s2],
// E the running sum of D, F =A/1000: four formulas a row.
std::string sheet_xml(int rows) {
    std::string x = "<?xml version=\"1.0\" encoding=\"UTF-8\"?><worksheet xmlns=\"http://"
                    "schemas.openxmlformats.org/spreadsheetml/2006/main\"><sheetData>";
    x += "<row r=\"1\"><c r=\"A1\" t=\"inlineStr\"><is><t>Q [L/s]</t></is></c>"
         "<c r=\"B1\" t=\"inlineStr\"><is><t>D [mm]</t></is></c>"
         "<c r=\"C1\" t=\"inlineStr\"><is><t>V [m/s]</t></is></c>"
         "<c r=\"D1\" t=\"inlineStr\"><is><t>h_f [m]</t></is></c>"
         "<c r=\"E1\" t=\"inlineStr\"><is><t>Sum h_f [m]</t></is></c>"
         "<c r=\"F1\" t=\"inlineStr\"><is><t>Q [m3/s]</t></is></c>"
         "<c r=\"G1\" t=\"inlineStr\"><is><t>L [m]</t></is></c>"
         "<c r=\"H1\" t=\"inlineStr\"><is><t>g [m/s2]</t></is></c></row>";
    for (int r = 2; r < rows + 2; ++r) {
        x += fmt::format("<row r=\"{0}\"><c r=\"A{0}\"><v>{1}</v></c><c r=\"B{0}\"><v>{2}</v></c>"
                         "<c r=\"C{0}\"><f>F{0}/(PI()*(B{0}/1000)^2/4)</f></c>"
                         "<c r=\"D{0}\"><f>0.02*G{0}/(B{0}/1000)*C{0}^2/(2*H{0})</f></c>"
                         "<c r=\"E{0}\"><f>{3}</f></c><c r=\"F{0}\"><f>A{0}/1000</f></c>"
                         "<c r=\"G{0}\"><v>100</v></c><c r=\"H{0}\"><v>9.80665</v></c></row>",
                         r, 10 + r % 50, 100 + r % 200,
                         r == 2 ? std::string("D2") : fmt::format("E{}+D{}", r - 1, r));
    }
    return x + "</sheetData></worksheet>";
}

} // namespace

int main(int argc, char** argv) {
    // Four formula cells a row: 100 000. `plumb_bench_sheets ROWS PATH` keeps the workbook.
    const int rows = argc > 1 ? std::max(1, std::atoi(argv[1])) : 25000;
    const std::string book = zip_parts({
        {"[Content_Types].xml",
         "<Types xmlns=\"http://schemas.openxmlformats.org/package/2006/content-types\">"
         "<Override PartName=\"/xl/workbook.xml\" ContentType=\"application/"
         "vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml\"/></Types>"},
        {"xl/workbook.xml", "<workbook><sheets><sheet name=\"Pipes\" sheetId=\"1\" "
                            "r:id=\"rId1\" xmlns:r=\"r\"/></sheets></workbook>"},
        {"xl/_rels/workbook.xml.rels",
         "<Relationships><Relationship Id=\"rId1\" Target=\"worksheets/sheet1.xml\"/>"
         "</Relationships>"},
        {"xl/worksheets/sheet1.xml", sheet_xml(rows)},
    });
    const auto path = std::filesystem::temp_directory_path() / "plumb-bench-pipes.xlsx";
    std::ofstream(path, std::ios::binary) << book;
    double best = 1e9;
    plumb::check_report report;
    for (int run = 0; run < 3; ++run) {
        const auto start = std::chrono::steady_clock::now();
        report = plumb::check_paths({path});
        const std::chrono::duration<double> took = std::chrono::steady_clock::now() - start;
        best = std::min(best, took.count());
    }
    if (argc > 2)
        std::filesystem::rename(path, argv[2]);
    else
        std::filesystem::remove(path);
    fmt::print(
        "workbook: {} formula cells checked, {} not checked, {} findings, {:.1f} KiB packed\n",
        report.cells_checked, report.cells_not_checked, report.diagnostics.size(),
        static_cast<double>(book.size()) / 1024.0);
    fmt::print("best of 3: {:.3f} s ({:.0f} formula cells/s)\n", best,
               static_cast<double>(report.cells_checked) / best);
    return 0;
}
