// Thirty-two bytes of text looked at in one step: the line index and the UTF-8 check walk
// every byte of every file, and a call or a test per byte there cost more than the rest of
// reading a line (issue 12). Bit k of a mask stands for byte k of the block.
#pragma once

#include <cstddef>
#include <cstdint>

#if defined(__SSE2__)
#include <emmintrin.h>
#endif

namespace plumb {

inline constexpr std::size_t byte_block_size = 32;

#if defined(__SSE2__)
namespace detail {
// Two halves of sixteen bytes, each to a 16-bit mask of its bytes' high bits.
[[nodiscard]] inline std::uint32_t block_mask(__m128i low, __m128i high) {
    return static_cast<std::uint32_t>(_mm_movemask_epi8(low)) |
           (static_cast<std::uint32_t>(_mm_movemask_epi8(high)) << 16);
}
[[nodiscard]] inline __m128i load_half(const char* p) {
    return _mm_loadu_si128(reinterpret_cast<const __m128i*>(p));
}
} // namespace detail
#endif

// The bytes of the block at `p` (32 readable bytes) that equal `c`.
[[nodiscard]] inline std::uint32_t bytes_equal_to(const char* p, char c) {
#if defined(__SSE2__)
    const __m128i wanted = _mm_set1_epi8(c);
    return detail::block_mask(_mm_cmpeq_epi8(detail::load_half(p), wanted),
                              _mm_cmpeq_epi8(detail::load_half(p + 16), wanted));
#else
    std::uint32_t mask = 0;
    for (std::size_t k = 0; k < byte_block_size; ++k)
        if (p[k] == c)
            mask |= std::uint32_t{1} << k;
    return mask;
#endif
}

// The bytes of the block at `p` (32 readable bytes) that are not ASCII.
[[nodiscard]] inline std::uint32_t bytes_past_ascii(const char* p) {
#if defined(__SSE2__)
    return detail::block_mask(detail::load_half(p), detail::load_half(p + 16));
#else
    std::uint32_t mask = 0;
    for (std::size_t k = 0; k < byte_block_size; ++k)
        if (static_cast<unsigned char>(p[k]) >= 0x80)
            mask |= std::uint32_t{1} << k;
    return mask;
#endif
}

} // namespace plumb
