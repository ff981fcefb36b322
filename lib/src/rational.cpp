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

rational operator+(rational a, rational b) {
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

rational operator-(rational a, rational b) { return a + (-b); }

rational operator*(rational a, rational b) {
    if (a.den_ == 1 && b.den_ == 1)
        return rational(checked_mul(a.num_, b.num_));
    // Cross-cancel before multiplying to keep intermediates small.
    const std::int64_t g1 = std::gcd(a.num_, b.den_);
    const std::int64_t g2 = std::gcd(b.num_, a.den_);
    const std::int64_t n = checked_mul(a.num_ / (g1 ? g1 : 1), b.num_ / (g2 ? g2 : 1));
    const std::int64_t d = checked_mul(a.den_ / (g2 ? g2 : 1), b.den_ / (g1 ? g1 : 1));
    return {n, d};
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
    try {
        bool negative = false;
        std::size_t i = 0;
        if (i < text.size() && (text[i] == '-' || text[i] == '+')) {
            negative = text[i] == '-';
            ++i;
        }
        std::int64_t num = 0;
        std::int64_t den = 1;
        bool any_digit = false;
        for (; i < text.size() && text[i] >= '0' && text[i] <= '9'; ++i) {
            num = checked_add(checked_mul(num, 10), text[i] - '0');
            any_digit = true;
        }
        if (i < text.size() && text[i] == '/') {
            ++i;
            std::int64_t d = 0;
            bool any_den = false;
            for (; i < text.size() && text[i] >= '0' && text[i] <= '9'; ++i) {
                d = checked_add(checked_mul(d, 10), text[i] - '0');
                any_den = true;
            }
            if (!any_digit || !any_den || d == 0 || i != text.size())
                return std::nullopt;
            return rational(negative ? -num : num, d);
        }
        if (i < text.size() && text[i] == '.') {
            ++i;
            for (; i < text.size() && text[i] >= '0' && text[i] <= '9'; ++i) {
                num = checked_add(checked_mul(num, 10), text[i] - '0');
                den = checked_mul(den, 10);
                any_digit = true;
            }
        }
        if (!any_digit)
            return std::nullopt;
        if (i < text.size() && (text[i] == 'e' || text[i] == 'E')) {
            ++i;
            bool exp_negative = false;
            if (i < text.size() && (text[i] == '-' || text[i] == '+')) {
                exp_negative = text[i] == '-';
                ++i;
            }
            int exponent = 0;
            bool any_exp = false;
            for (; i < text.size() && text[i] >= '0' && text[i] <= '9'; ++i) {
                exponent = exponent * 10 + (text[i] - '0');
                if (exponent > 18)
                    overflow();
                any_exp = true;
            }
            if (!any_exp)
                return std::nullopt;
            for (int k = 0; k < exponent; ++k) {
                if (exp_negative)
                    den = checked_mul(den, 10);
                else
                    num = checked_mul(num, 10);
            }
        }
        if (i != text.size())
            return std::nullopt;
        return rational(negative ? -num : num, den);
    } catch (const arithmetic_overflow&) {
        return std::nullopt;
    }
}

} // namespace plumb
