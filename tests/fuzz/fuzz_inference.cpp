// Inference with many unknowns: every name-like word of the input is declared `name : ?`
// before the input, so the formulas leave many symbols for inference to solve together.
#include "fuzz_support.hpp"

#include <cctype>
#include <set>
#include <string>

namespace {

bool starts_name(unsigned char c) {
    return std::isalpha(c) != 0 || c == '_' || c >= 0x80;
}
bool continues_name(unsigned char c) {
    return starts_name(c) || std::isdigit(c) != 0;
}

// "name : ?" for up to `limit` distinct words of the text, then the text.
std::string with_unknowns(const std::string& text, std::size_t limit) {
    std::set<std::string> names;
    for (std::size_t i = 0; i < text.size() && names.size() < limit;) {
        if (!starts_name(static_cast<unsigned char>(text[i]))) {
            ++i;
            continue;
        }
        std::size_t end = i;
        while (end < text.size() && continues_name(static_cast<unsigned char>(text[end])))
            ++end;
        names.insert(text.substr(i, end - i));
        i = end;
    }
    std::string out;
    for (const auto& n : names)
        out += n + " : ?\n";
    return out + text;
}

} // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    using namespace plumb::fuzz;
    try {
        check_everything(plumb::check_text("fuzz.plumb", with_unknowns(as_text(data, size), 512),
                                           sandboxed_options()));
    } catch (...) {
        fail("inference threw an exception");
    }
    return 0;
}
