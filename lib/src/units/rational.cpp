// Exact rational arithmetic with checked 64-bit intermediates.
#include "plumb/rational.hpp"

#include <cstdlib>
#include <numeric>

namespace plumb {
namespace {

// 128-bit products make comparison exact without a second overflow check; __extension__
// keeps -Wpedantic quiet about a type both supported compilers have.
__extension__ typedef __int128 wide_int;

[[noreturn]] void overflow() {
    throw arithmetic_overflow("exponent arithmetic exceeds the 64-bit range");
}

std::int64_t checked_mul(std::int64_t a, std::int64_t b) {
    std::int64_t r = 0;
    if (__builtin_mul_overflow(a, b, &r))
        overflow();
    return r;
}

std::int64_t checked_add(std::int64_t a, std::int64_t b) {
    std::int64_t r = 0;
    if (__builtin_add_overflow(a, b, &r))
        overflow();
    return r;
}

std::int64_t checked_neg(std::int64_t a) {
    if (a == INT64_MIN)
        overflow();
    return -a;
}

} // namespace

rational::rational(std::int64_t num, std::int64_t den) {
    // A whole number is already reduced: no gcd (the common case).
    if (den == 1 && num != INT64_MIN) {
        num_ = num;
        return;
    }
    if (den == 0)
        throw std::domain_error("rational with zero denominator");
    if (den < 0) {
        num = checked_neg(num);
        den = checked_neg(den);
    }
    // std::gcd on INT64_MIN is undefined; checked_neg above already rejects it for den,
    // and a numerator of INT64_MIN cannot be reduced safely either.
    if (num == INT64_MIN)
        overflow();
    const std::int64_t g = std::gcd(num, den);
    num_ = num / g;
    den_ = den / g;
}

rational rational::add_slow(rational a, rational b) {
    if (a.den_ == 1 && b.den_ == 1)
        return rational(checked_add(a.num_, b.num_));
    // Reduce by the gcd of the denominators first so small operands stay small.
    const std::int64_t g = std::gcd(a.den_, b.den_);
    const std::int64_t lhs = checked_mul(a.num_, b.den_ / g);
    const std::int64_t rhs = checked_mul(b.num_, a.den_ / g);
    return {checked_add(lhs, rhs), checked_mul(a.den_, b.den_ / g)};
}

rational rational::operator-() const {
    rational r;
    r.num_ = checked_neg(num_);
    r.den_ = den_;
    return r;
}

rational rational::multiply_slow(rational a, rational b) {
    // A zero exponent times a fraction (M^0 in sqrt's [L^(1/2)]) is the common case here.
    if (a.num_ == 0 || b.num_ == 0)
        return {};
    // std::gcd is undefined for INT64_MIN, and no product with it can be reduced safely.
    if (a.num_ == INT64_MIN || b.num_ == INT64_MIN)
        overflow();
    if (a.den_ == 1 && b.den_ == 1)
        return rational(checked_mul(a.num_, b.num_));
    // Cross-cancel before multiplying to keep intermediates small.
    const std::int64_t g1 = std::gcd(a.num_, b.den_);
    const std::int64_t g2 = std::gcd(b.num_, a.den_);
    const std::int64_t n = checked_mul(a.num_ / (g1 ? g1 : 1), b.num_ / (g2 ? g2 : 1));
    const std::int64_t d = checked_mul(a.den_ / (g2 ? g2 : 1), b.den_ / (g1 ? g1 : 1));
    // Reduced operands cross-cancelled give a reduced product with d > 0: no gcd needed.
    if (n == INT64_MIN)
        overflow();
    rational r;
    r.num_ = n;
    r.den_ = d;
    return r;
}

rational operator/(rational a, rational b) {
    if (b.num_ == 0)
        throw std::domain_error("division of exponents by zero");
    rational inv;
    inv.num_ = b.den_;
    inv.den_ = b.num_;
    if (inv.den_ < 0) {
        inv.num_ = checked_neg(inv.num_);
        inv.den_ = checked_neg(inv.den_);
    }
    return a * inv;
}

bool operator<(rational a, rational b) {
    // Compare a.num/a.den < b.num/b.den without overflow using 128-bit products.
    const wide_int lhs = static_cast<wide_int>(a.num_) * b.den_;
    const wide_int rhs = static_cast<wide_int>(b.num_) * a.den_;
    return lhs < rhs;
}

std::string rational::to_string() const {
    if (den_ == 1)
        return std::to_string(num_);
    return std::to_string(num_) + "/" + std::to_string(den_);
}

std::optional<rational> rational::parse(std::string_view text) {
    // Read sign, digits, fraction and exponent first, then scale once: trailing zeros and
    // powers of ten cancel before anything is multiplied, so every value that fits is exact.
    std::size_t i = 0;
    bool negative = false;
    if (i < text.size() && (text[i] == '-' || text[i] == '+')) {
        negative = text[i] == '-';
        ++i;
    }
    const auto digits_from = [&](std::size_t from) {
        std::size_t to = from;
        while (to < text.size() && text[to] >= '0' && text[to] <= '9')
            ++to;
        return to;
    };
    const std::size_t whole_end = digits_from(i);
    std::string_view whole = text.substr(i, whole_end - i);
    i = whole_end;
    try {
        if (i < text.size() && text[i] == '/') {
            const std::size_t den_end = digits_from(i + 1);
            const std::string_view den_text = text.substr(i + 1, den_end - i - 1);
            if (whole.empty() || den_text.empty() || den_end != text.size())
                return std::nullopt;
            std::int64_t num = 0;
            std::int64_t den = 0;
            for (char c : whole)
                num = checked_add(checked_mul(num, 10), c - '0');
            for (char c : den_text)
                den = checked_add(checked_mul(den, 10), c - '0');
            if (den == 0)
                return std::nullopt;
            return rational(negative ? -num : num, den);
        }
        std::string_view fraction;
        if (i < text.size() && text[i] == '.') {
            const std::size_t fraction_end = digits_from(i + 1);
            fraction = text.substr(i + 1, fraction_end - i - 1);
            i = fraction_end;
        }
        if (whole.empty() && fraction.empty())
            return std::nullopt;
        std::int64_t exponent = 0;
        if (i < text.size() && (text[i] == 'e' || text[i] == 'E')) {
            ++i;
            bool exponent_negative = false;
            if (i < text.size() && (text[i] == '-' || text[i] == '+')) {
                exponent_negative = text[i] == '-';
                ++i;
            }
            const std::size_t exponent_end = digits_from(i);
            if (exponent_end == i || exponent_end - i > 6)
                return std::nullopt;
            for (; i < exponent_end; ++i)
                exponent = exponent * 10 + (text[i] - '0');
            if (exponent_negative)
                exponent = -exponent;
        }
        if (i != text.size())
            return std::nullopt;
        while (!fraction.empty() && fraction.back() == '0')
            fraction.remove_suffix(1);
        while (whole.size() > 1 && whole.front() == '0')
            whole.remove_prefix(1);
        std::int64_t num = 0;
        for (char c : whole)
            num = checked_add(checked_mul(num, 10), c - '0');
        for (char c : fraction)
            num = checked_add(checked_mul(num, 10), c - '0');
        std::int64_t scale = exponent - static_cast<std::int64_t>(fraction.size());
        if (num == 0)
            return rational(0);
        while (scale < 0 && num % 10 == 0) {
            num /= 10;
            ++scale;
        }
        // Past 10^±40 no 64-bit value fits however it reduces; stop before looping long.
        if (scale > 40 || scale < -40)
            return std::nullopt;
        std::int64_t den = 1;
        for (; scale > 0; --scale)
            num = checked_mul(num, 10);
        for (; scale < 0; ++scale) {
            den = checked_mul(den, 10);
            const std::int64_t g = std::gcd(num, den);
            num /= g;
            den /= g;
        }
        return rational(negative ? -num : num, den);
    } catch (const arithmetic_overflow&) {
        return std::nullopt;
    }
}

} // namespace plumb
