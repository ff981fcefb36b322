// Exact rational numbers for dimension exponents: overflow is reported, never wrapped.
#pragma once

#include <cstdint>
#include <optional>
#include <stdexcept>
#include <string>
#include <string_view>

namespace plumb {

// Thrown when exact arithmetic would leave the 64-bit range. Callers that check
// formulas turn it into a diagnostic; it never escapes the library's public entry points.
class arithmetic_overflow : public std::overflow_error {
  public:
    using std::overflow_error::overflow_error;
};

// A reduced fraction num/den with den > 0. Invariant kept by every operation.
class rational {
  public:
    constexpr rational() = default;
    constexpr rational(std::int64_t whole) : num_(whole) {} // NOLINT: implicit on purpose
    rational(std::int64_t num, std::int64_t den);

    [[nodiscard]] constexpr std::int64_t num() const { return num_; }
    [[nodiscard]] constexpr std::int64_t den() const { return den_; }
    [[nodiscard]] constexpr bool is_zero() const { return num_ == 0; }
    [[nodiscard]] constexpr bool is_integer() const { return den_ == 1; }
    [[nodiscard]] double to_double() const {
        return static_cast<double>(num_) / static_cast<double>(den_);
    }

    // Whole exponents are the common case; their fast paths are inline, the rest is not.
    friend rational operator+(rational a, rational b) {
        std::int64_t sum = 0;
        if (a.den_ == 1 && b.den_ == 1 && !__builtin_add_overflow(a.num_, b.num_, &sum))
            return rational(sum);
        return add_slow(a, b);
    }
    friend rational operator-(rational a, rational b) {
        std::int64_t difference = 0;
        if (a.den_ == 1 && b.den_ == 1 && !__builtin_sub_overflow(a.num_, b.num_, &difference))
            return rational(difference);
        return add_slow(a, -b);
    }
    friend rational operator*(rational a, rational b) {
        std::int64_t product = 0;
        if (a.den_ == 1 && b.den_ == 1 && !__builtin_mul_overflow(a.num_, b.num_, &product))
            return rational(product);
        return multiply_slow(a, b);
    }
    friend rational operator/(rational a, rational b); // throws std::domain_error on b == 0
    rational operator-() const;
    rational& operator+=(rational b) { return *this = *this + b; }
    rational& operator-=(rational b) { return *this = *this - b; }
    rational& operator*=(rational b) { return *this = *this * b; }

    friend constexpr bool operator==(rational a, rational b) {
        return a.num_ == b.num_ && a.den_ == b.den_;
    }
    friend bool operator<(rational a, rational b);

    // "3", "-1/2".
    [[nodiscard]] std::string to_string() const;

    // Exact value of a decimal literal such as "0.54", "2", "1.5e-3", "-1/2".
    // Empty when the text is not such a number or does not fit.
    static std::optional<rational> parse(std::string_view text);

  private:
    static rational add_slow(rational a, rational b);
    static rational multiply_slow(rational a, rational b);

    std::int64_t num_ = 0;
    std::int64_t den_ = 1;
};

} // namespace plumb
