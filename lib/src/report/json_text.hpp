// JSON strings for the JSON and SARIF renderers.
#pragma once

#include <string>
#include <string_view>

namespace plumb {

// `s` as a JSON string literal, quotes included.
void append_json_string(std::string& out, std::string_view s);

// Invalid UTF-8 in a source line must not make a document invalid: each bad byte becomes
// U+FFFD.
std::string valid_utf8(std::string_view s);

} // namespace plumb
