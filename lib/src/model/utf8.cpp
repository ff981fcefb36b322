#include "model/utf8.hpp"

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

std::optional<std::size_t> first_invalid_utf8(std::string_view text) {
    constexpr std::uint64_t high_bits = 0x8080808080808080U;
    for (std::size_t i = 0; i < text.size();) {
        // ASCII runs are the common case: step over them eight bytes at a time while no byte
        // has its high bit set, then a byte at a time, without decoding (issue 12: speed).
        if (text.size() - i >= sizeof(std::uint64_t)) {
            std::uint64_t word = 0;
            std::memcpy(&word, text.data() + i, sizeof word);
            const std::uint64_t high = word & high_bits;
            if (high == 0) {
                i += sizeof word;
                continue;
            }
            // On a little-endian machine the lowest set bit is in the first non-ASCII byte.
            if constexpr (std::endian::native == std::endian::little)
                i += static_cast<std::size_t>(std::countr_zero(high)) / 8;
        }
        if (static_cast<unsigned char>(text[i]) < 0x80) {
            ++i;
            continue;
        }
        // Two-byte characters (Greek letters, the degree and micro signs) are most of the
        // non-ASCII text in a calculation: told apart here without the general decoder.
        const auto lead = static_cast<unsigned char>(text[i]);
        if (lead >= 0xC2 && lead <= 0xDF && text.size() - i >= 2 &&
            (static_cast<unsigned char>(text[i + 1]) & 0xC0) == 0x80) {
            i += 2;
            continue;
        }
        const std::size_t length = utf8_length_at(text, i);
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
