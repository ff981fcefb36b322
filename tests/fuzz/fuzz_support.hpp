// What every fuzz target checks after the library has run: ranges inside their text, JSON
// that parses, UTF-8 that is valid. A broken promise aborts, which libFuzzer reports as a
// crash with the input that caused it.
#pragma once

#include "plumb/check.hpp"

#include <cstddef>
#include <cstdint>
#include <filesystem>
#include <string>
#include <string_view>

namespace plumb::fuzz {

[[noreturn]] void fail(std::string_view what);
inline void require(bool ok, std::string_view what) {
    if (!ok)
        fail(what);
}

// The sandbox folder, made once per process and removed at exit: `use` lines in fuzz inputs
// resolve inside it (check_options::include_root) and can name its few dictionaries
// (fluids.plumb, units.plumb, thermal.plumb).
const std::filesystem::path& sandbox();

// Options for checking an input: inside the sandbox, formulas recorded for the sign-off
// report, one thread.
check_options sandboxed_options();

// Every location of every finding, formula and study points into a source the report holds,
// with a range inside its text.
void check_ranges(const check_report& report);

// Renders the report every way plumb can (text with and without colour, one-line, quiet,
// JSON, SARIF, sign-off HTML, groups as text and JSON) and checks each output.
void check_renderers(const check_report& report);

void check_json(std::string_view json, std::string_view renderer);
void check_utf8(std::string_view output, std::string_view renderer);

// Both of the above for one report.
inline void check_everything(const check_report& report) {
    check_ranges(report);
    check_renderers(report);
}

inline std::string as_text(const std::uint8_t* data, std::size_t size) {
    return {reinterpret_cast<const char*>(data), size};
}

} // namespace plumb::fuzz
