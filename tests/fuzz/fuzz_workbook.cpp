// The workbook reader: the bytes checked in memory as an .xlsx and as an .ods package (the
// name must agree with the content, so at least one is refused with a finding).
#include "fuzz_support.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    using namespace plumb::fuzz;
    const std::string bytes = as_text(data, size);
    for (const char* name : {"fuzz.xlsx", "fuzz.ods"}) {
        try {
            const auto report = plumb::check_workbook_bytes(name, bytes, sandboxed_options());
            require(report.workbooks_checked == 1 || report.input_failed,
                    "a workbook was neither checked nor refused");
            check_everything(report);
        } catch (...) {
            fail("check_workbook_bytes threw an exception");
        }
    }
    return 0;
}
