// The OpenFormula (.ods) grammar: each input line is translated to A1 form as the .ods reader
// does; a refusal must be a workbook_error with a message, and what is translated must then
// check as an A1 formula in a small workbook.
#include "fuzz_support.hpp"
#include "sheet_support.hpp"
#include "sheets/readers.hpp"
#include "strict_json.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    using namespace plumb::fuzz;
    std::vector<std::string> translated;
    for (const auto& line : lines_of(as_text(data, size), 64)) {
        try {
            translated.push_back(plumb::sheets::openformula_to_a1(line));
            // Cell text is copied through, so the translation is valid UTF-8 when its input is.
            if (valid_utf8(line))
                check_utf8(translated.back(), "openformula_to_a1");
        } catch (const plumb::sheets::workbook_error& e) {
            require(*e.what() != '\0', "openformula_to_a1 refused a formula without saying why");
        } catch (...) {
            fail("openformula_to_a1 threw something other than workbook_error");
        }
        try {
            (void)plumb::sheets::openformula_address_to_a1(line);
        } catch (const plumb::sheets::workbook_error&) {
        } catch (...) {
            fail("openformula_address_to_a1 threw something other than workbook_error");
        }
    }
    try {
        check_formulas_in_workbook(translated);
    } catch (...) {
        fail("checking translated formulas threw an exception");
    }
    return 0;
}
