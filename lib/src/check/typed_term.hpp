// The checker's type of a subexpression, kept in a header of its own so that a symbol's entry
// can keep the type worked out at its first use.
#pragma once

#include "plumb/rational.hpp"
#include "units/compact_dimension.hpp"

#include <cstdint>
#include <optional>

namespace plumb {

struct unit_definition;

// An optional rational that lets the members after it use its spare bytes: std::optional
// keeps its padding to itself, but a class of our own marked [[no_unique_address]] does not,
// so the flags of typed_term below fit where padding would be (8 bytes less per term).
class optional_rational {
  public:
    constexpr optional_rational() = default;
    constexpr optional_rational(std::nullopt_t) {} // NOLINT: as std::optional
    constexpr optional_rational(rational r) : value_(r), engaged_(true) {} // NOLINT: as above
    constexpr optional_rational(const std::optional<rational>& o)          // NOLINT: as above
        : value_(o.value_or(rational())), engaged_(o.has_value()) {}
    operator std::optional<rational>() const { // NOLINT: passed where an optional is taken
        return engaged_ ? std::optional<rational>(value_) : std::nullopt;
    }

    [[nodiscard]] constexpr bool has_value() const { return engaged_; }
    constexpr explicit operator bool() const { return engaged_; }
    constexpr const rational& operator*() const { return value_; }
    constexpr const rational* operator->() const { return &value_; }
    constexpr void reset() { engaged_ = false; } // the value is not read again until set

  private:
    rational value_;
    bool engaged_ = false;
};

// A subexpression's type: its dimension, and what the rules need to know about its value.
// Every node gets one, and sums keep one per term, so the flags are packed at the end.
struct typed_term {
    compact_dimension dim;
    // Exact value, when numeric and exactly representable; the flags fill its spare bytes.
    [[no_unique_address]] optional_rational value;
    bool known = true;    // false below an error already reported: stops cascades
    bool zero = false;    // the literal 0, which agrees with any dimension
    bool numeric = false; // built from numbers alone
    bool point = false;   // a reading on a scale (a temperature, a pressure), not a difference
    // "(T - 20)": a reading less a number that is not a scale's zero. Beside other readings
    // it is a reading; as a factor it is the difference from a reference reading.
    bool reading_or_difference = false;
    // "p_abs - p_atm": the difference of two absolute pressures, which a gauge reads when the
    // one subtracted is the atmosphere.
    bool absolute_pressure_difference = false;
    bool inferred = false; // unknown because a `?` coefficient stands in it, not an error
    // SI value per written value: the product of the declared units' factors. Terms that agree
    // in dimension but not in scale give numbers off by that factor.
    double scale = 1.0;
    // The same exactly, where every unit along the way is defined exactly and the powers are
    // whole; empty otherwise, and the double decides. The count below fills its spare bytes.
    [[no_unique_address]] optional_rational exact_scale = rational(1);
    // A reading's weight, in the spare bytes after exact_scale: 1/2 in T_1/2, 2 in T_1 + T_2
    // before it is halved for the mean. A denominator of 0 means not followed (too large).
    std::int8_t weight_numerator = 1;
    std::uint8_t weight_denominator = 1;
    // Set where the weight comes from adding readings (T_1 + T_2, T_s + T_a/2): such a sum is
    // a reading only once scaled back to weight 1, or a difference at weight 0.
    bool weighted_sum = false;
    // The numbers along its multiplicative path, on the checker's literal stack.
    std::uint32_t literal_count = 0;
    std::uint32_t literal_begin = 0;
    // Set while the value is on an offset scale (°C, °F, gauge pressure): it may be compared
    // and subtracted, but not multiplied, divided or raised to a power. Names the scale.
    const unit_definition* offset = nullptr;
    double origin = 0.0;           // SI value of the scale's zero: 273.15 K for °C, 0 absolute
    double origin_tolerance = 0.0; // from rounded numbers that moved it (14.7 psi)
    // "p_abs - p_g": an absolute reading less a reading on an offset scale is that scale's
    // zero, the atmosphere, as a reading on the absolute scale. Names the offset scale.
    const unit_definition* zero_of = nullptr;
};

} // namespace plumb
