// JSON string escaping (RFC 8259, section 7) and UTF-8 repair.
#include "report/json_text.hpp"

#include "model/utf8.hpp"

#include <fmt/format.h>

namespace plumb {

void append_json_string(std::string& out, std::string_view s) {
    out += '"';
    for (const char c : s) {
        switch (c) {
        case '"':
            out += "\\\"";
            break;
        case '\\':
            out += "\\\\";
            break;
        case '\n':
            out += "\\n";
            break;
        case '\r':
            out += "\\r";
            break;
        case '\t':
            out += "\\t";
            break;
        default:
            if (static_cast<unsigned char>(c) < 0x20)
                out +=
                    fmt::format("\\u{:04x}", static_cast<unsigned>(static_cast<unsigned char>(c)));
            else
                out += c;
        }
    }
    out += '"';
}

// Invalid UTF-8 in a source line must not make the document invalid JSON.
std::string valid_utf8(std::string_view s) {
    return repaired_utf8(s);
}

} // namespace plumb
