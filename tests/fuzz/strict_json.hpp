// A strict validator for RFC 8259 JSON: what a consumer of plumb's JSON and SARIF output would
// accept, with strings that must be valid UTF-8 (RFC 3629: no overlong forms, no surrogates,
// nothing above U+10FFFF) and escapes that must pair surrogates.
#pragma once

#include <string>
#include <string_view>

namespace plumb::fuzz {

// True when `bytes` is valid UTF-8.
bool valid_utf8(std::string_view bytes);

// Empty when `text` is one valid JSON document (whitespace around it allowed); otherwise why
// not, with the byte offset.
std::string json_problem(std::string_view text);

} // namespace plumb::fuzz
