// The A1 (.xlsx) formula grammar and its lowering: each input line is a formula cell of a
// small workbook whose other cells carry units, checked and rendered every way.
#include "fuzz_support.hpp"
#include "sheet_support.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    using namespace plumb::fuzz;
    try {
        check_formulas_in_workbook(lines_of(as_text(data, size), 64));
    } catch (...) {
        fail("checking A1 formulas threw an exception");
    }
    return 0;
}
