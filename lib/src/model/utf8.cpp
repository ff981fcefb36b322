#include "model/utf8.hpp"

#include "model/byte_blocks.hpp"

#include <fmt/format.h>

#include <bit>
#include <cstdint>
#include <cstring>

namespace plumb {

namespace {

bool in(unsigned char b, unsigned char low, unsigned char high) {
    return b >= low && b <= high;
}

} // namespace

std::size_t utf8_length_at(std::string_view text, std::size_t at) {
    const auto byte = [&](std::size_t k) { return static_cast<unsigned char>(text[at + k]); };
    const unsigned char b0 = byte(0);
    if (b0 < 0x80)
        return 1;
    // The second byte's range depends on the first (table 3-7): that is what rules out
    // overlong forms (E0 80..9F, F0 80..8F), surrogates (ED A0..BF) and values past U+10FFFF
    // (F4 90..BF).
    std::size_t length = 0;
    unsigned char low = 0x80;
    unsigned char high = 0xBF;
    if (in(b0, 0xC2, 0xDF)) {
        length = 2;
    } else if (in(b0, 0xE0, 0xEF)) {
        length = 3;
        low = b0 == 0xE0 ? 0xA0 : 0x80;
        high = b0 == 0xED ? 0x9F : 0xBF;
    } else if (in(b0, 0xF0, 0xF4)) {
        length = 4;
        low = b0 == 0xF0 ? 0x90 : 0x80;
        high = b0 == 0xF4 ? 0x8F : 0xBF;
    } else {
        return 0; // 80..C1 (continuation or overlong lead), F5..FF
    }
    if (text.size() - at < length || !in(byte(1), low, high))
        return 0;
    for (std::size_t k = 2; k < length; ++k)
        if (!in(byte(k), 0x80, 0xBF))
            return 0;
    return length;
}

namespace {

// The length of the character at text[at], a byte that is not ASCII; 0 if it is none.
[[gnu::always_inline]] inline std::size_t non_ascii_length_at(std::string_view text,
                                                              std::size_t at) {
    // Two-byte characters (Greek letters, the degree and micro signs) are most of the
    // non-ASCII text in a calculation: told apart here without the general decoder.
    const auto lead = static_cast<unsigned char>(text[at]);
    if (lead >= 0xC2 && lead <= 0xDF && text.size() - at >= 2 &&
        (static_cast<unsigned char>(text[at + 1]) & 0xC0) == 0x80)
        return 2;
    return utf8_length_at(text, at);
}

} // namespace

std::optional<std::size_t> first_invalid_utf8(std::string_view text) {
    // A block of bytes at a time: ASCII is the common case, and only the bytes past it are
    // decoded, found from the block's mask rather than by testing each byte (issue 12: speed).
    std::size_t i = 0;
    while (text.size() - i >= byte_block_size) {
        std::size_t next = i + byte_block_size;
        for (std::uint32_t past_ascii = bytes_past_ascii(text.data() + i); past_ascii != 0;) {
            const std::size_t at = i + static_cast<std::size_t>(std::countr_zero(past_ascii));
            const std::size_t length = non_ascii_length_at(text, at);
            if (length == 0)
                return at;
            if (at + length >= next) {
                next = at + length; // the character runs to the block's end or past it
                break;
            }
            // The character's own bytes are no characters to decode.
            past_ascii &= ~std::uint32_t{0} << (at + length - i);
        }
        i = next;
    }
    while (i < text.size()) {
        if (static_cast<unsigned char>(text[i]) < 0x80) {
            ++i;
            continue;
        }
        const std::size_t length = non_ascii_length_at(text, i);
        if (length == 0)
            return i;
        i += length;
    }
    return std::nullopt;
}

std::string repaired_utf8(std::string_view text) {
    std::string out;
    out.reserve(text.size());
    for (std::size_t i = 0; i < text.size();) {
        const std::size_t length = utf8_length_at(text, i);
        if (length == 0) {
            out += "\uFFFD";
            ++i;
        } else {
            out.append(text.substr(i, length));
            i += length;
        }
    }
    return out;
}

std::string invalid_bytes_text(std::string_view text, std::size_t at) {
    // The lead byte and the continuation bytes after it, which belong to the same bad sequence.
    std::string out = fmt::format("0x{:02X}", static_cast<unsigned char>(text[at]));
    for (std::size_t k = at + 1;
         k < text.size() && k < at + 4 && (static_cast<unsigned char>(text[k]) & 0xC0) == 0x80; ++k)
        out += fmt::format(" 0x{:02X}", static_cast<unsigned char>(text[k]));
    return out;
}

} // namespace plumb
