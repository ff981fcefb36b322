// check_workbook_bytes: a workbook held in memory is checked as the same file on disk is.
#include "plumb/check.hpp"

#include <doctest/doctest.h>

#include <filesystem>
#include <fstream>
#include <string>

namespace {

std::string bytes_of(const std::filesystem::path& p) {
    std::ifstream in(p, std::ios::binary);
    return {std::istreambuf_iterator<char>(in), std::istreambuf_iterator<char>()};
}

} // namespace

TEST_CASE("check_workbook_bytes finds what check_paths finds in the same workbook") {
    const std::filesystem::path sheets =
        std::filesystem::path(PLUMB_SOURCE_DIR) / "corpus" / "sheets";
    for (const char* name :
         {"pump-sizing.xlsx", "pump-sizing.ods", "runoff-and-duty.xlsx", "runoff-and-duty.ods"}) {
        CAPTURE(name);
        const auto path = sheets / name;
        // No sidecar is read from memory, so the file on disk is compared without one too.
        REQUIRE_FALSE(
            std::filesystem::exists(std::filesystem::path(path).replace_extension(".cells.plumb")));
        const auto on_disk = plumb::check_paths({path});
        const auto in_memory = plumb::check_workbook_bytes(name, bytes_of(path));
        REQUIRE(on_disk.cells_checked > 0);
        CHECK(in_memory.cells_checked == on_disk.cells_checked);
        CHECK(in_memory.workbooks_checked == 1);
        REQUIRE(in_memory.diagnostics.size() == on_disk.diagnostics.size());
        for (std::size_t i = 0; i < on_disk.diagnostics.size(); ++i) {
            CHECK(in_memory.diagnostics[i].rule == on_disk.diagnostics[i].rule);
            CHECK(in_memory.diagnostics[i].message == on_disk.diagnostics[i].message);
        }
    }
}

TEST_CASE("check_workbook_bytes: bytes that are not a workbook are one unreadable finding") {
    const auto report = plumb::check_workbook_bytes("book.xlsx", "not a zip package");
    CHECK(report.input_failed);
    REQUIRE(report.diagnostics.size() == 1);
    CHECK(report.diagnostics.front().rule == "unreadable");
    CHECK(report.diagnostics.front().message.find("not a zip package") != std::string::npos);
}
