// Studies and model plans: the input is a .plumb file (starting from studies, prototype and
// model lines); the groups and plans are worked out and rendered as text and JSON. The first
// line is also given as `groups --vars` gives its argument, as a study of its own.
#include "fuzz_support.hpp"
#include "plumb/render.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    using namespace plumb::fuzz;
    const std::string text = as_text(data, size);
    try {
        const auto report = plumb::check_text("fuzz.plumb", text, sandboxed_options());
        check_everything(report);
        for (const auto& study : report.studies) {
            require(study.analysis.groups.empty() || study.analysis.problems.empty(),
                    "a study has both groups and problems");
            if (study.plan) {
                require(study.plan->groups.size() <= study.analysis.groups.size(),
                        "a model plan lists more groups than the study has");
            }
        }
        const std::string vars = text.substr(0, text.find('\n'));
        check_everything(plumb::check_text(
            "fuzz.plumb", "use \"fluids.plumb\"\nstudy command-line: " + vars + "\n",
            sandboxed_options()));
    } catch (...) {
        fail("working out studies threw an exception");
    }
    return 0;
}
