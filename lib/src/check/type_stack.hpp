// The checker's stack of operand types: the terms of a sum, the sides of a formula and the
// arguments of a call refer to their types here rather than each holding a copy, and a long
// meeting point keeps one copy of each distinct type. A one-line sum of a million terms then
// costs a few bytes per term, not a typed_term each (issue 12: memory).
#pragma once

#include "check/typed_term.hpp"

#include <array>
#include <bit>
#include <cstddef>
#include <cstdint>
#include <memory>
#include <new>
#include <type_traits>
#include <vector>

namespace plumb {

// Whether two types are the same in every field, so that one copy may stand for both.
inline bool same_type(const typed_term& a, const typed_term& b) {
    // A field added to typed_term must be compared here too.
    static_assert(sizeof(typed_term) == 112, "compare every field of typed_term");
    const auto same_double = [](double x, double y) {
        return std::bit_cast<std::uint64_t>(x) == std::bit_cast<std::uint64_t>(y);
    };
    const auto same_rational = [](const optional_rational& x, const optional_rational& y) {
        return x.has_value() == y.has_value() && (!x || *x == *y);
    };
    return a.literal_begin == b.literal_begin && a.literal_count == b.literal_count &&
           a.known == b.known && a.zero == b.zero && a.numeric == b.numeric && a.point == b.point &&
           a.reading_or_difference == b.reading_or_difference &&
           a.absolute_pressure_difference == b.absolute_pressure_difference &&
           a.inferred == b.inferred && a.offset == b.offset && a.zero_of == b.zero_of &&
           same_double(a.scale, b.scale) && same_double(a.origin, b.origin) &&
           same_double(a.origin_tolerance, b.origin_tolerance) && a.dim == b.dim &&
           a.weight_numerator == b.weight_numerator &&
           a.weight_denominator == b.weight_denominator && a.weighted_sum == b.weighted_sum &&
           same_rational(a.value, b.value) && same_rational(a.exact_scale, b.exact_scale);
}

class type_stack {
  public:
    [[nodiscard]] std::size_t size() const { return size_; }

    [[gnu::always_inline]] typed_term& push(const typed_term& t) {
        if (size_ == chunks_.size() * chunk_size) [[unlikely]]
            grow();
        typed_term* slot = &chunks_[size_ / chunk_size][size_ % chunk_size];
        ++size_;
        return *::new (static_cast<void*>(slot)) typed_term(t);
    }

    // As push, with the type that `make` returns made in its slot rather than copied there
    // (a type is 112 bytes, and every operand is pushed). The slot is taken first, so that
    // what `make` pushes while it works goes above it.
    template <class Make> typed_term& push_made(Make&& make) {
        if (size_ == chunks_.size() * chunk_size) [[unlikely]]
            grow();
        typed_term* slot = &chunks_[size_ / chunk_size][size_ % chunk_size];
        ++size_;
        return *::new (static_cast<void*>(slot)) typed_term(make());
    }

    // As push, but a type equal to one pushed since `region` (the stack's size when the
    // meeting point began) is shared rather than copied again. Only recent types are looked
    // for, in a small table by hash: what is missed is only copied.
    typed_term& push_shared(const typed_term& t, std::size_t region) {
        std::uint32_t& recent = recent_[hash(t) % recent_.size()];
        if (recent >= region && recent < size_) {
            typed_term& earlier = at(recent);
            if (same_type(earlier, t))
                return earlier;
        }
        recent = static_cast<std::uint32_t>(size_);
        return push(t);
    }

    // Drops the types above `size`; their chunks stay for the next check, unless a huge
    // meeting point left many.
    void pop_to(std::size_t size) { size_ = size; }
    void clear() {
        size_ = 0;
        constexpr std::size_t kept_chunks = 64;
        if (chunks_.size() > kept_chunks)
            chunks_.resize(kept_chunks);
    }

  private:
    // Chunks, so that growing never moves a type an operand refers to. Raw storage: a type
    // is made in its slot when pushed, so a new chunk's pages are touched only as it fills
    // (constructing 256 types up front cost a small check seven page faults at start).
    static_assert(std::is_trivially_destructible_v<typed_term> &&
                      std::is_trivially_copyable_v<typed_term>,
                  "types are made over old ones and never destroyed");
    static constexpr std::size_t chunk_size = 256;
    struct chunk_deleter {
        void operator()(typed_term* p) const {
            ::operator delete (static_cast<void*>(p), std::align_val_t{alignof(typed_term)});
        }
    };
    using chunk = std::unique_ptr<typed_term[], chunk_deleter>;
    static chunk new_chunk() {
        return chunk(static_cast<typed_term*>(::operator new (
            sizeof(typed_term) * chunk_size, std::align_val_t{alignof(typed_term)})));
    }
    // Out of line: inlined, its call of the allocator made every push save and restore six
    // registers, more than the copy of the type itself.
    [[gnu::noinline, gnu::cold]] void grow() { chunks_.push_back(new_chunk()); }
    std::vector<chunk> chunks_;
    std::size_t size_ = 0;
    std::array<std::uint32_t, 64> recent_{};

    typed_term& at(std::size_t i) { return chunks_[i / chunk_size][i % chunk_size]; }

    static std::size_t hash(const typed_term& t) {
        std::size_t h = t.dim.hash();
        h = h * 31 + std::bit_cast<std::uint64_t>(t.scale);
        h = h * 31 + t.literal_begin + (static_cast<std::size_t>(t.literal_count) << 32);
        h = h * 31 + static_cast<std::size_t>(t.known) + 2 * static_cast<std::size_t>(t.point) +
            4 * static_cast<std::size_t>(t.numeric) + 8 * static_cast<std::size_t>(t.zero);
        return h ^ (h >> 29);
    }
};

} // namespace plumb
