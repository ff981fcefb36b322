// The scale of a term beside its dimension: the units' factor and the numbers written along its
// multiplicative path, and which of those numbers reconcile one term's units with another's.
#pragma once

#include "plumb/rational.hpp"

#include <cstdint>
#include <optional>
#include <span>
#include <string>
#include <string_view>

namespace plumb {

// A number that multiplies (exponent > 0) or divides (< 0) a term: physics (2, 8, π) or a
// conversion factor (1000, 3.281). Which it is is decided where terms meet.
struct scale_literal {
    double value = 1.0;     // as written, without sign
    double tolerance = 0.0; // relative: half a unit in the last printed digit, at most 1 %
    // The same exactly: the least and greatest values the printed digits may round from
    // (7757.5 and 7758.5 for 7758). Empty where the number does not fit a 64-bit fraction.
    std::optional<rational> low;
    std::optional<rational> high;
    double exponent = 1.0;  // along the path: L/1000 gives -1, (L/1000)^2 gives -2
    std::uint32_t node = 0; // where it is written, to mark it
    std::int8_t power = 0;  // the power, when the value is a power of ten
    bool power_of_ten = false;
    bool factor_like = false;  // written to 3 or more digits (3.28, 5.615, 43560), as factors are
    bool table_digits = false; // to 4 or more (3.281, 0.3048): precise enough to name a unit ratio
    bool may_be_cut = false;   // high lies a whole unit above the digits, low half a unit below
};

// The number now stands for a quantity (g_n, the atmosphere, a reference temperature), not
// a factor for the scale rules to weigh: its value becomes exactly 1.
inline void read_as_quantity(scale_literal& l) {
    l.value = 1.0;
    l.tolerance = 0.0;
    l.low = rational(1);
    l.high = rational(1);
    l.power_of_ten = false;
    l.factor_like = false;
    l.table_digits = false;
}

// One operand where terms meet: the SI value of one written unit of it, and its numbers.
struct scaled_operand {
    double scale = 1.0;
    const rational* exact_scale = nullptr; // the same exactly, where every unit is exact
    std::span<const scale_literal> literals;
};

// The literal's interval and how it is written, from its text ("8.34", "1e6"). `exact` is its
// value when the caller knows it (a sum of numbers); else the text is read.
scale_literal read_literal(std::string_view text, double value, std::uint32_t node,
                           std::optional<rational> exact = std::nullopt);

// Whether the operands can agree: each one's value in a common unit, some of its numbers taken
// as conversion factors. `flip` inverts one literal (operand index, literal index) first, to
// ask whether a factor written the wrong way round explains a disagreement.
struct flipped_literal {
    std::size_t operand = static_cast<std::size_t>(-1);
    std::size_t literal = 0;
};
struct reconciliation {
    bool agree = false;
    double unit = 1.0;          // the common unit's SI value (the reference's, as converted)
    std::size_t reference = 0;  // the operand most others agree with
    std::size_t odd = 0;        // the first that does not, when they disagree
    bool used_literals = false; // some number was taken as a conversion
};
reconciliation reconcile(std::span<const scaled_operand> ops, flipped_literal flip = {});

// The literal looks like a conversion (a power of ten of 100 or more either way, or the ratio of
// two table units of one dimension written to 3 or more digits).
bool looks_like_conversion(const scale_literal& l, bool allow_hundred);

// 24 h/d, 60 min/h and s/min, 1440 min/d, 3600 s/h, 86400 s/d: exact by definition, and
// written with too few digits to look like conversions by themselves (SI Brochure 9th ed.,
// Table 8).
inline bool is_time_ratio(const scale_literal& l) {
    return l.value == 24 || l.value == 60 || l.value == 1440 || l.value == 3600 || l.value == 86400;
}

// The literal is, within its printed digits, the ratio of two table units of one dimension (24
// for h/d, 5.615 for ft³/bbl), however few digits it is written to.
bool is_ratio_of_units(const scale_literal& l);

// The operand's value per SI unit once its conversion-like numbers are applied: what an
// engineer reads the term as.
double apparent_scale(const scaled_operand& op);
std::optional<rational> apparent_exact_scale(const scaled_operand& op); // empty if not exact

// The literal as printed, raised to a whole power, exactly; empty where that does not fit.
std::optional<rational> printed_power(const scale_literal& l, double exponent);

// 1000, 0.001, 10⁶, 10⁻⁶, 0.0438126, 2.5 × 10⁷: as an engineer reads a factor.
// From the exact value where there is one: 1/3600, 0.3048, 5/9.
std::string format_factor(double factor);
std::string format_factor(const std::optional<rational>& exact, double approx);

} // namespace plumb
