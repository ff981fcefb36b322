// A physical dimension: exact rational exponents over the seven SI base dimensions.
#pragma once

#include "plumb/rational.hpp"

#include <array>
#include <cstddef>
#include <string>
#include <string_view>

namespace plumb {

// Order follows the SI Brochure (9th ed., 2.3.3): mass is listed first here because the
// trade writes [M L T] in that order.
enum class base_dimension : std::size_t {
    mass,               // M
    length,             // L
    time,               // T
    temperature,        // Θ
    amount,             // N
    current,            // I
    luminous_intensity, // J
};

inline constexpr std::size_t base_dimension_count = 7;

// The letter the trade uses for each base dimension, in enum order.
std::string_view base_dimension_symbol(base_dimension d);

class dimension {
  public:
    constexpr dimension() = default;

    static dimension base(base_dimension d);
    static dimension from_exponents(const std::array<rational, base_dimension_count>& e);

    [[nodiscard]] rational exponent(base_dimension d) const {
        return exponents_[static_cast<std::size_t>(d)];
    }
    [[nodiscard]] const std::array<rational, base_dimension_count>& exponents() const {
        return exponents_;
    }
    [[nodiscard]] bool is_dimensionless() const;

    // Products, quotients and powers add, subtract and scale exponents; each may throw
    // arithmetic_overflow.
    friend dimension operator*(const dimension& a, const dimension& b) {
        dimension r;
        for (std::size_t i = 0; i < base_dimension_count; ++i)
            r.exponents_[i] = a.exponents_[i] + b.exponents_[i];
        return r;
    }
    friend dimension operator/(const dimension& a, const dimension& b) {
        dimension r;
        for (std::size_t i = 0; i < base_dimension_count; ++i)
            r.exponents_[i] = a.exponents_[i] - b.exponents_[i];
        return r;
    }
    [[nodiscard]] dimension pow(rational p) const;

    friend bool operator==(const dimension& a, const dimension& b) = default;

    // "[M L^-1 T^-2]", "[L^(1/2)]", "[1]" for dimensionless.
    [[nodiscard]] std::string to_string() const;

  private:
    std::array<rational, base_dimension_count> exponents_{};
};

// A conventional name for a dimension ("pressure or stress", "dynamic viscosity"),
// or empty when none fits. Several quantities share a dimension; the name lists the
// ones an engineer would think of first.
std::string_view quantity_name(const dimension& d);

} // namespace plumb
