// The notation front end: any bytes, checked as a .plumb file inside the sandbox and rendered
// every way (text, one-line, quiet, JSON, SARIF, sign-off HTML, groups).
#include "fuzz_support.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    using namespace plumb::fuzz;
    try {
        check_everything(plumb::check_text("fuzz.plumb", as_text(data, size), sandboxed_options()));
    } catch (...) {
        fail("check_text threw an exception");
    }
    return 0;
}
