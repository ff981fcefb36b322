// Strict UTF-8 (RFC 3629; the Unicode Standard, table 3-7): the one check every reader of text
// and every renderer uses, so that no invalid byte reaches JSON, SARIF or HTML.
#pragma once

#include <cstddef>
#include <optional>
#include <string>
#include <string_view>

namespace plumb {

// The length of the well-formed character starting at text[at], or 0 when the bytes there are
// not one: a stray continuation byte, C0, C1 or F5-FF, an overlong form, a surrogate
// (U+D800-DFFF), a code point past U+10FFFF, or a sequence cut short.
[[nodiscard]] std::size_t utf8_length_at(std::string_view text, std::size_t at);

// The offset of the first byte that does not begin a well-formed character, if any.
[[nodiscard]] std::optional<std::size_t> first_invalid_utf8(std::string_view text);

// `text` with each byte that does not begin a well-formed character replaced by U+FFFD.
[[nodiscard]] std::string repaired_utf8(std::string_view text);

// "0xC0", "0xED 0xA0 0x80": the bytes of an invalid sequence as a message shows them.
[[nodiscard]] std::string invalid_bytes_text(std::string_view text, std::size_t at);

} // namespace plumb
