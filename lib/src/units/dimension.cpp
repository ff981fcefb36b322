// Dimension algebra and printing.
#include "plumb/dimension.hpp"

namespace plumb {

std::string_view base_dimension_symbol(base_dimension d) {
    static constexpr std::array<std::string_view, base_dimension_count> symbols = {
        "M", "L", "T", "\u0398", "N", "I", "J"};
    return symbols[static_cast<std::size_t>(d)];
}

dimension dimension::base(base_dimension d) {
    dimension r;
    r.exponents_[static_cast<std::size_t>(d)] = 1;
    return r;
}

dimension dimension::from_exponents(const std::array<rational, base_dimension_count>& e) {
    dimension r;
    r.exponents_ = e;
    return r;
}

bool dimension::is_dimensionless() const {
    for (const auto& e : exponents_)
        if (!e.is_zero())
            return false;
    return true;
}

dimension dimension::pow(rational p) const {
    dimension r;
    for (std::size_t i = 0; i < base_dimension_count; ++i)
        if (!exponents_[i].is_zero()) // most exponents are 0; 0 times anything stays 0
            r.exponents_[i] = exponents_[i] * p;
    return r;
}

std::string dimension::to_string() const {
    std::string out = "[";
    bool first = true;
    for (std::size_t i = 0; i < base_dimension_count; ++i) {
        const rational e = exponents_[i];
        if (e.is_zero())
            continue;
        if (!first)
            out += ' ';
        first = false;
        out += base_dimension_symbol(static_cast<base_dimension>(i));
        if (e == rational(1))
            continue;
        out += '^';
        if (e.is_integer())
            out += e.to_string();
        else {
            out += '(';
            out += e.to_string();
            out += ')';
        }
    }
    if (first)
        out += '1';
    out += ']';
    return out;
}

} // namespace plumb
