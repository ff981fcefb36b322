// A small direct-mapped memo per thread: a fixed number of slots, so memory stays bounded
// whatever the input, and a miss simply recomputes and takes the slot.
#include "check/number_reading.hpp"

#include <array>
#include <cstdint>
#include <cstdlib>
#include <cstring>
#include <string>

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

struct slot {
    std::array<char, max_key_length> key{};
    std::uint8_t length = 0xFF; // 0xFF: empty
    number_reading reading;
};

struct memo {
    std::array<slot, slot_count> slots;
    number_reading uncached; // for texts too long to key a slot
};

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
    thread_local memo m;
    if (written.size() > max_key_length) {
        m.uncached = compute(written);
        return m.uncached;
    }
    slot& s = m.slots[slot_of(written)];
    if (s.length != written.size() ||
        std::memcmp(s.key.data(), written.data(), written.size()) != 0) {
        s.reading = compute(written);
        std::memcpy(s.key.data(), written.data(), written.size());
        s.length = static_cast<std::uint8_t>(written.size());
    }
    return s.reading;
}

} // namespace plumb
