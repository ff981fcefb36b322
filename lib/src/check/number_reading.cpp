// A small direct-mapped memo per thread: a fixed number of slots, so memory stays bounded
// whatever the input, and a miss simply recomputes and takes the slot.
#include "check/number_reading.hpp"

#include <array>
#include <cstdint>
#include <cstdlib>
#include <cstring>
#include <memory>
#include <new>
#include <string>
#include <type_traits>

namespace plumb {
namespace {

number_reading compute(std::string_view written) {
    number_reading r;
    r.value = rational::parse(written);
    r.zero = r.value && r.value->is_zero();
    if (!r.zero) {
        const double v =
            r.value ? r.value->to_double() : std::strtod(std::string(written).c_str(), nullptr);
        r.literal = read_literal(written, v, 0, r.value);
    }
    return r;
}

constexpr std::size_t max_key_length = 30;
constexpr std::size_t slot_count = 1024;

// Zero bytes are an empty slot (no number is written with no digits), so the memo can come
// from calloc: fresh pages the first touch maps, one at a time. With default member values it
// would sit in every thread's TLS image (about 150 KB), copied page by page at each start.
struct slot {
    std::array<char, max_key_length> key;
    std::uint8_t length; // 0: empty
    alignas(number_reading) unsigned char reading[sizeof(number_reading)];
};
static_assert(std::is_trivially_destructible_v<number_reading>,
              "a slot's reading is overwritten in place, never destroyed");

struct free_slots {
    void operator()(slot* p) const { std::free(p); }
};

number_reading& reading_in(slot& s) {
    return *std::launder(reinterpret_cast<number_reading*>(s.reading));
}

std::size_t slot_of(std::string_view s) {
    std::uint64_t h = 1469598103934665603ULL; // FNV-1a over a few bytes
    for (const char c : s) {
        h ^= static_cast<unsigned char>(c);
        h *= 1099511628211ULL;
    }
    return static_cast<std::size_t>(h ^ (h >> 32)) & (slot_count - 1);
}

} // namespace

const number_reading& read_number(std::string_view written) {
    thread_local std::unique_ptr<slot[], free_slots> slots;
    thread_local number_reading uncached; // for texts too long to key a slot
    if (written.empty() || written.size() > max_key_length) {
        uncached = compute(written);
        return uncached;
    }
    // A small file's few numbers are read without the memo: each of its slots sits on a page
    // of its own, and each page's first touch costs a fault that reading the number does not.
    thread_local std::size_t read_without_memo = 0;
    constexpr std::size_t numbers_before_memo = 512;
    if (!slots && read_without_memo < numbers_before_memo) {
        ++read_without_memo;
        uncached = compute(written);
        return uncached;
    }
    if (!slots) {
        slots.reset(static_cast<slot*>(std::calloc(slot_count, sizeof(slot))));
        if (!slots) {
            uncached = compute(written);
            return uncached;
        }
    }
    slot& s = slots[slot_of(written)];
    if (s.length != written.size() ||
        std::memcmp(s.key.data(), written.data(), written.size()) != 0) {
        new (s.reading) number_reading(compute(written));
        std::memcpy(s.key.data(), written.data(), written.size());
        s.length = static_cast<std::uint8_t>(written.size());
    }
    return reading_in(s);
}

} // namespace plumb
