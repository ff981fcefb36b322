// `plumb dim`: the input is an expression, asked against the sandbox's dictionaries.
#include "fuzz_support.hpp"
#include "plumb/render.hpp"
#include "plumb/unit_table.hpp"
#include "strict_json.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    using namespace plumb::fuzz;
    try {
        const auto& root = sandbox();
        const auto result = plumb::query_dimension(
            as_text(data, size),
            {root / "fluids.plumb", root / "thermal.plumb", root / "units.plumb"},
            sandboxed_options());
        check_ranges(result.report);
        check_json(plumb::render_json(result.report), "render_json");
        // The expression is quoted as written: the text is valid UTF-8 when the input is.
        const std::string expression = as_text(data, size);
        if (valid_utf8(expression))
            check_utf8(plumb::render_text(result.report, {false}), "render_text");
        if (result.dim) {
            require(!result.report.input_failed, "a dimension given for input that failed");
            check_utf8(result.dim->to_string(), "dimension::to_string");
            check_utf8(plumb::quantity_name(*result.dim), "quantity_name");
        }
    } catch (...) {
        fail("query_dimension threw an exception");
    }
    return 0;
}
