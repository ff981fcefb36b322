// Fitting dimensions into 16 bits per exponent, and the arena for those that do not fit.
#include "units/compact_dimension.hpp"

#include <numeric>
#include <vector>

namespace plumb {
namespace {

std::vector<dimension>& arena() {
    thread_local std::vector<dimension> kept;
    return kept;
}

} // namespace

std::optional<compact_dimension> compact_dimension::fitted(const dimension& d) {
    compact_dimension whole;
    bool all_whole = true;
    for (std::size_t i = 0; i < base_dimension_count && all_whole; ++i) {
        const rational e = d.exponents()[i];
        all_whole = e.den() == 1 && e.num() >= INT16_MIN && e.num() <= INT16_MAX;
        whole.num_[i] = static_cast<std::int16_t>(e.num());
    }
    if (all_whole) // nearly every dimension: no common denominator to find
        return whole;
    std::int64_t common = 1;
    for (const rational& e : d.exponents()) {
        common = std::lcm(common, e.den());
        if (common > INT16_MAX)
            return std::nullopt;
    }
    compact_dimension r;
    r.den_ = static_cast<std::int16_t>(common);
    for (std::size_t i = 0; i < base_dimension_count; ++i) {
        const rational e = d.exponents()[i];
        std::int64_t n = 0;
        if (__builtin_mul_overflow(e.num(), common / e.den(), &n) || n < INT16_MIN || n > INT16_MAX)
            return std::nullopt;
        r.num_[i] = static_cast<std::int16_t>(n);
    }
    return r;
}

compact_dimension::compact_dimension(const dimension& d) {
    if (const auto f = fitted(d)) {
        *this = *f;
        return;
    }
    std::vector<dimension>& kept = arena();
    const auto index = static_cast<std::uint32_t>(kept.size());
    kept.push_back(d);
    den_ = 0;
    num_[0] = static_cast<std::int16_t>(index & 0xFFFFU);
    num_[1] = static_cast<std::int16_t>(index >> 16);
}

void compact_dimension::reset_arena() {
    std::vector<dimension>& kept = arena();
    kept.clear();
    // A hostile formula may have filled it; ordinary checks never use it.
    if (kept.capacity() > 1024)
        kept.shrink_to_fit();
}

compact_dimension compact_dimension::settle_in_arena(const compact_dimension& d,
                                                     std::size_t& place) {
    const std::size_t index =
        static_cast<std::uint16_t>(d.num_[0]) |
        (static_cast<std::size_t>(static_cast<std::uint16_t>(d.num_[1])) << 16);
    if (place == no_place || index == place) {
        place = index;
        return d;
    }
    std::vector<dimension>& kept = arena();
    kept[place] = kept[index];
    kept.resize(place + 1);
    compact_dimension r;
    r.den_ = 0;
    r.num_[0] = static_cast<std::int16_t>(place & 0xFFFFU);
    r.num_[1] = static_cast<std::int16_t>(place >> 16);
    return r;
}

bool compact_dimension::equal_in_arena(const compact_dimension& a, const compact_dimension& b) {
    return a.expand() == b.expand();
}

std::optional<compact_dimension>
compact_dimension::reduced(const std::array<std::int64_t, base_dimension_count>& numerators,
                           std::int64_t common, std::int64_t g) {
    if (common / g > INT16_MAX)
        return std::nullopt;
    compact_dimension r;
    r.den_ = static_cast<std::int16_t>(common / g);
    for (std::size_t i = 0; i < base_dimension_count; ++i) {
        const std::int64_t v = numerators[i] / g;
        if (v < INT16_MIN || v > INT16_MAX)
            return std::nullopt;
        r.num_[i] = static_cast<std::int16_t>(v);
    }
    return r;
}

compact_dimension compact_dimension::product_in_full(const compact_dimension& a,
                                                     const compact_dimension& b, bool divide) {
    // Both fitted, one with a fractional exponent (sqrt(g*h)*V): over the common denominator
    // and reduced, as `dimension` would add the exponents and fitted() put them back. 16-bit
    // operands cannot overflow 64 bits here; only what does not fit goes the long way.
    if (a.den_ != 0 && b.den_ != 0) {
        const std::int64_t common = std::lcm<std::int64_t>(a.den_, b.den_);
        const std::int64_t a_by = common / a.den_;
        const std::int64_t b_by = (divide ? -1 : 1) * (common / b.den_);
        std::array<std::int64_t, base_dimension_count> n{};
        std::int64_t g = common;
        for (std::size_t i = 0; i < base_dimension_count; ++i) {
            n[i] = a.num_[i] * a_by + b.num_[i] * b_by;
            g = std::gcd(g, n[i]);
        }
        if (const auto r = reduced(n, common, g))
            return *r;
    }
    return compact_dimension(divide ? a.expand() / b.expand() : a.expand() * b.expand());
}

dimension compact_dimension::expand() const {
    if (den_ == 0) {
        const std::uint32_t index =
            static_cast<std::uint16_t>(num_[0]) |
            (static_cast<std::uint32_t>(static_cast<std::uint16_t>(num_[1])) << 16);
        return arena()[index];
    }
    std::array<rational, base_dimension_count> e{};
    for (std::size_t i = 0; i < base_dimension_count; ++i)
        e[i] = den_ == 1 ? rational(num_[i]) : rational(num_[i], den_);
    return dimension::from_exponents(e);
}

compact_dimension compact_dimension::pow(rational p) const {
    if (den_ == 1 && p.is_integer() && p.num() >= INT16_MIN && p.num() <= INT16_MAX) {
        compact_dimension r;
        bool fits = true;
        for (std::size_t i = 0; i < base_dimension_count; ++i) {
            const std::int64_t v = static_cast<std::int64_t>(num_[i]) * p.num();
            fits = fits && v >= INT16_MIN && v <= INT16_MAX;
            r.num_[i] = static_cast<std::int16_t>(v);
        }
        if (fits)
            return r;
    }
    // sqrt(g*h), cbrt(V): a root of whole exponents that it divides, without a gcd.
    if (den_ == 1 && p.num() == 1 && p.den() <= INT16_MAX) {
        compact_dimension r;
        bool divides = true;
        for (std::size_t i = 0; i < base_dimension_count; ++i) {
            divides = divides && num_[i] % p.den() == 0;
            r.num_[i] = static_cast<std::int16_t>(num_[i] / p.den());
        }
        if (divides)
            return r;
    }
    // A fractional exponent or power (sqrt, ^(2/3)): (n/d)·(pn/pd) over the common
    // denominator d·pd, reduced. Small operands cannot overflow 64 bits here, so this is the
    // exact result that `dimension` would give; only what does not fit goes there.
    if (den_ != 0 && p.num() >= INT16_MIN && p.num() <= INT16_MAX && p.den() <= INT16_MAX) {
        std::array<std::int64_t, base_dimension_count> n{};
        std::int64_t common = static_cast<std::int64_t>(den_) * p.den();
        std::int64_t g = common;
        for (std::size_t i = 0; i < base_dimension_count; ++i) {
            n[i] = static_cast<std::int64_t>(num_[i]) * p.num();
            g = std::gcd(g, n[i]);
        }
        if (const auto r = reduced(n, common, g))
            return *r;
    }
    return compact_dimension(expand().pow(p));
}

std::size_t compact_dimension::hash() const {
    if (den_ == 0) {
        const dimension full = expand();
        std::size_t h = 0;
        for (const rational& e : full.exponents())
            h = h * 1'000'003 + std::hash<std::int64_t>{}(e.num()) * 31 +
                std::hash<std::int64_t>{}(e.den());
        return h;
    }
    std::size_t h = static_cast<std::uint16_t>(den_);
    for (const std::int16_t n : num_)
        h = h * 1'000'003 + static_cast<std::uint16_t>(n);
    return h;
}

} // namespace plumb
