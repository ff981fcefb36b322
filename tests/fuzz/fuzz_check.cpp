// libFuzzer entry point: any bytes, checked as a .plumb file and rendered both ways. Crashes,
// sanitizer reports, exceptions and ranges outside the text are all failures.
#include "plumb/check.hpp"
#include "plumb/render.hpp"

#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <string>

namespace {

[[noreturn]] void fail(const char* what) {
    std::fprintf(stderr, "plumb_fuzz: %s\n", what);
    std::abort();
}

void check_place(const plumb::check_report& report, const plumb::location& where) {
    if (where.file == nullptr)
        return;
    bool known = false;
    for (const auto& source : report.sources)
        known = known || source.get() == where.file;
    if (!known)
        fail("a diagnostic points into a file the report does not hold");
    if (where.range.begin > where.range.end || where.range.end > where.file->text().size())
        fail("a diagnostic range lies outside the text");
}

} // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    std::string text(reinterpret_cast<const char*>(data), size);
    try {
        const plumb::check_report report = plumb::check_text("fuzz.plumb", std::move(text));
        for (const auto& d : report.diagnostics) {
            check_place(report, d.where);
            for (const auto& t : d.terms)
                check_place(report, t.where);
            for (const auto& n : d.notes)
                check_place(report, n.where);
        }
        (void)plumb::render_text(report, {true});
        (void)plumb::render_json(report);
    } catch (...) {
        fail("check_text threw an exception");
    }
    return 0;
}
