// A dimension in 16 bytes, for the checker's hot path, where every subexpression carries one:
// the seven exponents as 16-bit numerators over one common denominator (1 for the whole
// exponents of nearly every quantity). A dimension whose exponents do not fit is kept in full
// in a per-thread arena for the current check and referred to by index, so the exact range
// and its overflow finding are those of `dimension` itself.
#pragma once

#include "plumb/dimension.hpp"

#include <array>
#include <cstdint>
#include <cstring>
#include <optional>

namespace plumb {

class compact_dimension {
  public:
    constexpr compact_dimension() = default; // dimensionless

    // `d`, fitted, or else kept in the arena until the next reset_arena().
    explicit compact_dimension(const dimension& d);
    // The dimension of these whole exponents (M, L, T, Θ, N, I, J), in the fitted form, made
    // at compile time: the rules' own dimensions (a pressure, a temperature) are such
    // constants, so comparing with one is two compares with numbers the code holds.
    static constexpr compact_dimension
    whole(const std::array<std::int16_t, base_dimension_count>& exponents) {
        compact_dimension d;
        d.num_ = exponents;
        return d;
    }
    // `d` when it fits; never uses the arena, so the value may outlive a check.
    static std::optional<compact_dimension> fitted(const dimension& d);
    // Forgets the arena's dimensions: call where no compact_dimension that used it is alive
    // (at the start of a check).
    static void reset_arena();

    [[nodiscard]] dimension expand() const;
    [[nodiscard]] bool is_dimensionless() const { return same_bits(*this, compact_dimension{}); }

    // The same bits are the same dimension: fitted ones are canonical, and an arena one's
    // bits are its index. Otherwise only two arena ones can still be equal, as a dimension
    // that fits is never in the arena.
    [[gnu::always_inline]] friend bool operator==(const compact_dimension& a,
                                                  const compact_dimension& b) {
        if (same_bits(a, b))
            return true;
        return (a.den_ | b.den_) == 0 && equal_in_arena(a, b);
    }

    // Whole exponents that stay in range are added here; anything else goes through
    // `dimension`, which reports overflow by throwing arithmetic_overflow as always.
    friend compact_dimension operator*(const compact_dimension& a, const compact_dimension& b) {
        compact_dimension r;
        if (a.den_ == 1 && b.den_ == 1 && whole_sum(a, b, 1, r))
            return r;
        return product_in_full(a, b, false);
    }
    friend compact_dimension operator/(const compact_dimension& a, const compact_dimension& b) {
        compact_dimension r;
        if (a.den_ == 1 && b.den_ == 1 && whole_sum(a, b, -1, r))
            return r;
        return product_in_full(a, b, true);
    }
    [[nodiscard]] compact_dimension pow(rational p) const;

    [[nodiscard]] bool in_arena() const { return den_ == 0; }
    // For a caller that builds one dimension step by step (a long product) and alone holds
    // every arena entry made since its first: the first call records where `d` is kept, later
    // ones move `d` there and drop the entries after it, so the chain keeps one entry rather
    // than one per step.
    static compact_dimension settle_in_arena(const compact_dimension& d, std::size_t& place);
    static constexpr std::size_t no_place = static_cast<std::size_t>(-1);

    // A hash of the exponents, for counting dimensions; equal dimensions hash alike.
    [[nodiscard]] std::size_t hash() const;

  private:
    // The rare cases, out of line so that the common ones above stay small enough to inline.
    static bool equal_in_arena(const compact_dimension& a, const compact_dimension& b);
    static compact_dimension product_in_full(const compact_dimension& a, const compact_dimension& b,
                                             bool divide);
    // Exponents numerators[i]/common, reduced by g (which divides them all), in the 16-bit
    // form; empty where one does not fit.
    static std::optional<compact_dimension>
    reduced(const std::array<std::int64_t, base_dimension_count>& numerators, std::int64_t common,
            std::int64_t g);

    // Two 8-byte compares: these run for every term that meets another.
    static bool same_bits(const compact_dimension& a, const compact_dimension& b) {
        std::array<std::uint64_t, 2> x{};
        std::array<std::uint64_t, 2> y{};
        std::memcpy(x.data(), &a, sizeof a);
        std::memcpy(y.data(), &b, sizeof b);
        return x[0] == y[0] && x[1] == y[1];
    }

    // Every factor of every product comes here: the 16-bit exponents are added (or
    // subtracted) four to a 64-bit word, the top bit of each kept out of the carry so that no
    // lane spills into the next, and a lane has overflowed where its operands' signs say the
    // result's cannot be. The denominators (1 and 1) go along and are set back to 1.
    static bool whole_sum(const compact_dimension& a, const compact_dimension& b, int sign,
                          compact_dimension& r) {
        constexpr std::uint64_t tops = 0x8000800080008000ULL;
        std::array<std::uint64_t, 2> x{};
        std::array<std::uint64_t, 2> y{};
        std::array<std::uint64_t, 2> z{};
        std::memcpy(x.data(), &a, sizeof a);
        std::memcpy(y.data(), &b, sizeof b);
        std::uint64_t overflow = 0;
        for (std::size_t w = 0; w < 2; ++w) {
            if (sign > 0) {
                z[w] = ((x[w] & ~tops) + (y[w] & ~tops)) ^ ((x[w] ^ y[w]) & tops);
                overflow |= ~(x[w] ^ y[w]) & (x[w] ^ z[w]);
            } else {
                z[w] = ((x[w] | tops) - (y[w] & ~tops)) ^ ((x[w] ^ ~y[w]) & tops);
                overflow |= (x[w] ^ y[w]) & (x[w] ^ z[w]);
            }
        }
        std::memcpy(static_cast<void*>(&r), z.data(), sizeof r);
        r.den_ = 1;
        return (overflow & tops) == 0;
    }

    std::array<std::int16_t, base_dimension_count> num_{};
    std::int16_t den_ = 1; // 0: kept in the arena, at the index held in num_[0] and num_[1]
};
static_assert(sizeof(compact_dimension) == 16, "compared as two 8-byte words");

} // namespace plumb
