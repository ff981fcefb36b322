// The checker of one formula, shared by the files that hold its rules (check/formula/*.cpp):
// it gives every subexpression a dimension and applies the rules where dimensions meet: the
// terms of a sum, the sides of a formula, function arguments and exponents. The class lists
// its members by the file that defines them.
#pragma once

#include "check/constant_in_other_units.hpp"
#include "check/edit_distance.hpp"
#include "check/formula_checker.hpp"
#include "check/functions.hpp"
#include "check/gravity_number.hpp"
#include "check/number_reading.hpp"
#include "check/reference_state.hpp"
#include "check/scale_match.hpp"
#include "check/trade_constants.hpp"
#include "check/type_stack.hpp"
#include "check/typed_term.hpp"
#include "model/difference_name.hpp"
#include "model/subtree_search.hpp"
#include "plumb/rules.hpp"
#include "units/compact_dimension.hpp"
#include "units/exact_factor.hpp"

#include <algorithm>
#include <array>
#include <bit>
#include <cassert>
#include <cctype>
#include <cmath>
#include <cstddef>
#include <cstdlib>
#include <fmt/format.h>
#include <initializer_list>
#include <limits>
#include <numbers>
#include <span>
#include <type_traits>
#include <unordered_map>

namespace plumb::formula_check {

using syntax::expr_kind;
using syntax::search_step;

inline typed_term unknown_type(bool inferred = false) {
    typed_term t;
    t.known = false;
    t.inferred = inferred;
    return t;
}

// The dimensions the rules compare with, as compile-time constants in the exponents' order
// M, L, T, Θ, N, I, J: every factor of every product is compared with some of them, and a
// comparison with a constant is two compares with numbers the code holds.
constexpr compact_dimension acceleration = compact_dimension::whole({0, 1, -2, 0, 0, 0, 0});
constexpr compact_dimension temperature = compact_dimension::whole({0, 0, 0, 1, 0, 0, 0});
constexpr compact_dimension pressure = compact_dimension::whole({1, -1, -2, 0, 0, 0, 0});
constexpr compact_dimension force_dim = compact_dimension::whole({1, 1, -2, 0, 0, 0, 0});
constexpr compact_dimension force_per_length_dim = compact_dimension::whole({1, 0, -2, 0, 0, 0, 0});
constexpr compact_dimension length_dim = compact_dimension::whole({0, 1, 0, 0, 0, 0, 0});
constexpr compact_dimension time_dim = compact_dimension::whole({0, 0, 1, 0, 0, 0, 0});
constexpr compact_dimension velocity_squared_dim = compact_dimension::whole({0, 2, -2, 0, 0, 0, 0});
constexpr compact_dimension area_dim = compact_dimension::whole({0, 2, 0, 0, 0, 0, 0});
// A pressure over a length: a column's gradient (psi/ft, kPa/m), or a specific weight.
constexpr compact_dimension pressure_gradient_dim =
    compact_dimension::whole({1, -2, -2, 0, 0, 0, 0});
constexpr const compact_dimension& acceleration_dimension() {
    return acceleration;
}
constexpr const compact_dimension& temperature_dimension() {
    return temperature;
}
constexpr const compact_dimension& pressure_dimension() {
    return pressure;
}
constexpr const compact_dimension& force_dimension() {
    return force_dim;
}
constexpr const compact_dimension& force_per_length_dimension() {
    return force_per_length_dim;
}
constexpr const compact_dimension& length_dimension() {
    return length_dim;
}
constexpr const compact_dimension& time_dimension() {
    return time_dim;
}
constexpr const compact_dimension& velocity_squared_dimension() {
    return velocity_squared_dim;
}
constexpr compact_dimension volume_flow_dim = compact_dimension::whole({0, 3, -1, 0, 0, 0, 0});
constexpr compact_dimension volume_dim = compact_dimension::whole({0, 3, 0, 0, 0, 0, 0});
constexpr compact_dimension energy_dim = compact_dimension::whole({1, 2, -2, 0, 0, 0, 0});
constexpr compact_dimension power_dim = compact_dimension::whole({1, 2, -3, 0, 0, 0, 0});
constexpr compact_dimension frequency_dim = compact_dimension::whole({0, 0, -1, 0, 0, 0, 0});
constexpr compact_dimension velocity_dim = compact_dimension::whole({0, 1, -1, 0, 0, 0, 0});
constexpr compact_dimension specific_heat_dim = compact_dimension::whole({0, 2, -2, -1, 0, 0, 0});
constexpr compact_dimension moment_of_inertia_dim = compact_dimension::whole({1, 2, 0, 0, 0, 0, 0});
constexpr compact_dimension mass_dim = compact_dimension::whole({1, 0, 0, 0, 0, 0, 0});
constexpr compact_dimension mass_flow_dim = compact_dimension::whole({1, 0, -1, 0, 0, 0, 0});
constexpr compact_dimension density_dim = compact_dimension::whole({1, -3, 0, 0, 0, 0, 0});
constexpr compact_dimension per_kelvin = compact_dimension::whole({0, 0, 0, -1, 0, 0, 0});
constexpr compact_dimension capacitance_dim = compact_dimension::whole({-1, -2, 4, 0, 0, 2, 0});
constexpr compact_dimension inductance_dim = compact_dimension::whole({1, 2, -2, 0, 0, -2, 0});
constexpr compact_dimension resistance_dim = compact_dimension::whole({1, 2, -3, 0, 0, -2, 0});
// A volume flow times a specific energy: cfm·Δh in q = 4.5·cfm·Δh (common practice).
constexpr compact_dimension volume_flow_enthalpy_dim =
    compact_dimension::whole({0, 5, -3, 0, 0, 0, 0});
constexpr const compact_dimension& volume_flow_dimension() {
    return volume_flow_dim;
}
constexpr const compact_dimension& area_dimension() {
    return area_dim;
}

// The table's offset and gauge units with their dimensions, for naming a scale by its zero.
struct offset_row {
    const unit_definition* unit;
    compact_dimension dim;
};
inline const std::vector<offset_row>& offset_rows() {
    static const std::vector<offset_row> rows = [] {
        std::vector<offset_row> out;
        for (const auto& u : unit_table::standard().units())
            if (u.scale != unit_scale::absolute)
                out.push_back({&u, compact_dimension(u.dim())});
        return out;
    }();
    return rows;
}

// The Celsius scale however it is spelled (°C, degC): degrees of a kelvin, zero at 273.15 K.
inline bool is_celsius(const unit_definition* unit) {
    return unit != nullptr && unit->scale == unit_scale::offset &&
           std::abs(unit->factor - 1.0) < 1e-12 && std::abs(unit->offset - 273.15) < 1e-9;
}

// The absolute unit a gauge unit reads in (psi for psig, kPa for kPag); the symbol itself for
// any other unit.
// "bar(g)" and "bar g" read in bar, as "barg" does.
inline std::string absolute_symbol(const unit_definition& unit) {
    std::string symbol(unit.symbol);
    if (unit.scale != unit_scale::gauge || symbol.size() < 2)
        return symbol;
    if (symbol.ends_with("(g)"))
        symbol.resize(symbol.size() - 3);
    else if (symbol.ends_with(" g"))
        symbol.resize(symbol.size() - 2);
    else if (symbol.back() == 'g')
        symbol.pop_back();
    while (!symbol.empty() && symbol.back() == ' ')
        symbol.pop_back();
    return symbol;
}

// A value rounded to `digits` significant digits, as a message quotes a measure (8.618 MPa,
// 12.7 psi).
inline double rounded_to_digits(double v, int digits) {
    const double step =
        std::pow(10.0, std::floor(std::log10(std::max(std::abs(v), 1e-9))) - digits + 1);
    return std::round(v / step) * step;
}

inline std::string describe(const dimension& d) {
    const std::string_view name = quantity_name(d);
    if (name.empty() || d.is_dimensionless())
        return d.is_dimensionless() ? std::string("[1] (dimensionless)") : d.to_string();
    return fmt::format("{} ({})", d.to_string(), name);
}
inline std::string describe(const compact_dimension& d) {
    return describe(d.expand());
}

// The standard atmosphere, 101325 Pa (SI Brochure 9th ed., Table 8); the units calcs write
// it in are pressure_units (reference_state.hpp).
constexpr double standard_atmosphere = 101325.0;
// How far two reference temperatures may differ and still count as one: 15 °C against 60 °F,
// and the gas trade's 14.73 psia beside 14.696, are 0.2 % apart (from memory).
constexpr double reference_temperature_slack = 0.003;
// The atmosphere at the highest sites plants are built on, about 5200 m (mines in the Andes,
// observatories), as a share of the standard atmosphere: h = 44330.8·(1 - 0.52^0.190263) m in
// the standard atmosphere's barometric formula (from memory).
constexpr double highest_site_atmosphere = 0.52;
// And at the deepest levels a barometer is read at, some 4 km down a mine (the standard
// atmosphere's formula carried below sea level gives about 1.6 times its pressure there, from
// memory): a mine's or a site's below sea level, above the standard atmosphere.
constexpr double deepest_site_atmosphere = 1.6;
// How far the sea-level atmosphere written into a sum of pressures may stand from the
// barometer the file declares for its site. Added to a gauge reading, 1.5 % (about 125 m of
// height in the standard atmosphere, from memory): the error is a small share of the absolute
// pressure, but 1.8 kPa is still 0.18 m of a deaerator pump's NPSH. Beside an absolute reading
// taken off it or from it (an NPSH from an open sump, an absolute piezometer made gauge), the
// result is a small difference that carries the whole error: 0.5 %, about 40 m, or a
// barometer rounded to 101 kPa; 0.9 kPa is 0.09 m of a piezometer's head.
constexpr double site_barometer_slack = 0.015;
constexpr double site_barometer_slack_in_difference = 0.005;
// How an actual gas volume becomes one at reference conditions (ideal gas, common practice).
constexpr std::string_view state_correction_advice =
    "an actual volume becomes a normal one times (p/p_n)*(T_n/T), with absolute pressures and "
    "temperatures (p_n = 101.325 kPa; T_n = 273.15 K for Nm\u00B3, 288.15 K for Sm\u00B3)";
// Beside every empirical fit read with its constants typed bare in a workbook.
constexpr std::string_view fit_units_note =
    "the fit holds only with its inputs in the units it was made for";

// A number the trades write in place of a conversion (8.34, water's weight per gallon): where
// the units agree without it, it is as much a factor not needed as a conversion would be
// (the pounds formula pasted into a sheet whose ML/d × mg/L is already kg/d).
inline bool stands_for_a_conversion(const scale_literal& l, bool allow_hundred) {
    if (looks_like_conversion(l, allow_hundred))
        return true;
    // The inch's 25.4 mm, 2.54 cm and 0.0254 m, exact (NIST SP 811 (2008), B.8), and 86.4
    // m³/d per L/s: too few digits to look like conversions, yet nothing else.
    if (std::abs(l.exponent) == 1.0 &&
        (l.value == 25.4 || l.value == 2.54 || l.value == 0.0254 || l.value == 86.4))
        return true;
    if (!l.factor_like || std::abs(l.exponent) != 1.0)
        return false;
    const std::optional<rational> printed = printed_power(l, 1.0);
    return printed && trade_constant_for(*printed) != nullptr;
}

// The trades' conversions printed to three digits (NIST SP 811 (2008), B.8 and B.9): too
// short to look like conversions among all the table's ratios, where three digits match some
// ratio by chance, but unmistakable as a conversion of the term's own quantity where its units
// already agree: "Q_ls = Q*0.0631" with Q in L/s converts gallons that are not there.
inline bool is_three_digit_conversion_of(double value, double tolerance,
                                         const compact_dimension& d) {
    static const struct {
        double ratio;
        const compact_dimension& dim;
    } conversions[] = {
        {0.0630901964, volume_flow_dim}, // L/s per gpm
        {0.2271247, volume_flow_dim},    // m³/h per gpm
        {0.0689475729, pressure},        // bar per psi
        {6.89475729, pressure},          // kPa per psi
        {0.3048, length_dim},            // m per ft
        {2.54, length_dim},              // cm per in
        {1.609344, length_dim},          // km per mi
        {0.09290304, area_dim},          // m² per ft²
        {3.785411784, volume_dim},       // L per US gal
        {0.028316846592, volume_dim},    // m³ per ft³
        {0.745699872, power_dim},        // kW per hp
        {3.516852842, power_dim},        // kW per ton of refrigeration
        {0.29307107, power_dim},         // W per Btu/h
        {0.45359237, mass_dim},          // kg per lb
        {0.45359237, mass_flow_dim},     // kg/h per lb/h
        {3.785411784, volume_flow_dim},  // L/min per gpm
        {0.3048, velocity_dim},          // m/s per ft/s
        {4.4482216152605, force_dim},    // N per lbf
        {1.0 / 1.8, temperature},        // K per °F of difference
    };
    // Printed to its digits: within half a unit of the last of them (the literal's tolerance).
    const auto printed = [&](double v) {
        return std::abs(v / value - 1.0) <= tolerance * (1.0 + 1e-9);
    };
    return value > 0 &&
           std::any_of(std::begin(conversions), std::end(conversions), [&](const auto& c) {
               return c.dim == d && (printed(c.ratio) || printed(1.0 / c.ratio));
           });
}

// The operands of one meeting point (terms of a sum, arguments, sides of a formula). The type
// is held on the checker's type stack, shared among operands of one type: a long sum keeps
// one of these per term, and its size is most of the memory such a line takes.
struct operand {
    const typed_term& type;
    std::uint32_t node;
    bool subtracted = false; // a term after '-'
};
static_assert(sizeof(operand) <= 16, "a long sum keeps one operand per term");

struct dimension_hash {
    std::size_t operator()(const compact_dimension& d) const noexcept { return d.hash(); }
};

// A reading's weight as a fraction, or nothing where it is not followed.
inline std::optional<rational> weight_of(const typed_term& t) {
    if (t.weight_denominator == 0)
        return std::nullopt;
    if (t.weight_denominator == 1) // nearly every reading: whole, with no gcd to take
        return rational(t.weight_numerator);
    return rational(t.weight_numerator, t.weight_denominator);
}

inline void set_weight(typed_term& t, const std::optional<rational>& w) {
    if (!w || w->num() < -127 || w->num() > 127 || w->den() > 255) {
        t.weight_denominator = 0;
        return;
    }
    t.weight_numerator = static_cast<std::int8_t>(w->num());
    t.weight_denominator = static_cast<std::uint8_t>(w->den());
    if (*w == rational(1))
        t.weighted_sum = false; // (T_1 + T_2)/2: a reading again
}

// How far a reading's zero may lie from its origin. A sum of readings on one scale leaves it
// open (infinite) until weighed: its mean, (t_1 + t_2)/2, 0.5*(t_1 + t_2) or t_1/2 + t_2/2,
// weighs 1 and is a reading on that scale, held to its zero like one (T_K = (t_1 + t_2)/2
// with °C readings is the finding T_K = t_1 is).
// A mean taken to °F or from it ((t_1 + t_2)/2*1.8) weighs the degree's 9/5 or 5/9, which
// converts it and leaves it one reading.
inline double reading_tolerance(const typed_term& t) {
    const bool one = t.weight_numerator == 1 && t.weight_denominator == 1;
    const bool degree_ratio = (std::abs(t.weight_numerator) == 9 && t.weight_denominator == 5) ||
                              (std::abs(t.weight_numerator) == 5 && t.weight_denominator == 9);
    if (std::isinf(t.origin_tolerance) && (one || degree_ratio))
        return 0.0;
    return t.origin_tolerance;
}

inline void scale_weight(typed_term& t, const rational& by) {
    const std::optional<rational> w = weight_of(t);
    if (!w)
        return;
    try {
        set_weight(t, *w * by);
    } catch (const std::exception&) {
        t.weight_denominator = 0;
    }
}

// The bare numbers and the temperatures and pressures among a product's factors, each with the
// sign of its power (+1 multiplied, -1 divided), for read_reference_states. A pressure is an
// absolute reading or a difference (free air from a receiver, V_r*(p_2 - p_1)/101.325; gas
// expansion from 0 °C, ΔT/273.15), never a reading on an offset scale: p_g/101.325 stays a
// gas law in gauge pressure. A few of each are enough (V_b/1000*Δp/1.01325*273.15/T
// holds three numbers); a product is rarely longer.
struct reference_state_pairs {
    struct number {
        std::uint32_t node;
        int sign;
        double value;
    };
    struct reading {
        std::uint32_t node;
        int sign;
        compact_dimension dim;
        double scale;
        bool paired = false;
    };
    // Left unset: the counts say how many are filled, and this is made for every product.
    std::array<number, 4> numbers;
    std::array<reading, 2> readings;
    std::size_t number_count = 0;
    std::size_t reading_count = 0;

    void note(const typed_term& t, std::uint32_t node, int sign,
              std::span<const scale_literal> literals) {
        if (!t.known)
            return;
        if (t.numeric && t.literal_count == 1 && number_count < numbers.size()) {
            const scale_literal& l = literals[t.literal_begin];
            // 1 atm and 1 bar are no number to read: a ratio with 1 changes nothing.
            if (l.value > 1.0 && l.exponent == sign)
                numbers[number_count++] = {l.node, sign, l.value};
        } else if (t.offset == nullptr && !t.numeric && t.zero_of == nullptr &&
                   (t.dim == temperature_dimension() || t.dim == pressure_dimension())) {
            if (reading_count < readings.size())
                readings[reading_count++] = {node, sign, t.dim, t.scale};
            // Q_n*T/T_n*101.325/p: two temperatures and then the pressure 101.325 pairs with,
            // which takes the second temperature's place.
            else if (readings[0].dim == readings[1].dim && !(t.dim == readings[0].dim))
                readings[1] = {node, sign, t.dim, t.scale};
        }
    }
    // The numbers written directly in a grouped product among the factors, as in
    // V_r*(p_2 - p_1)/(101.325*t_fill): each with its sign along the whole product, which
    // its literal's exponent already holds.
    void note_grouped_numbers(const syntax::parsed_file& file, std::uint32_t factor,
                              const typed_term& t, std::span<const scale_literal> literals) {
        const syntax::expr_node& group = file.nodes[factor];
        if (group.kind != syntax::expr_kind::group || !t.known || t.numeric)
            return;
        // The walk goes right to left and the literals lie left to right, so one cursor moving
        // back finds each number's literal: linear in the product's length however long it is,
        // and it stops once the numbers are full.
        std::uint32_t cursor = t.literal_count;
        for (std::uint32_t n = group.lhs; number_count < numbers.size();) {
            const syntax::expr_node& node = file.nodes[n];
            const bool product =
                node.kind == syntax::expr_kind::multiply || node.kind == syntax::expr_kind::divide;
            const std::uint32_t written = product ? node.rhs : n;
            if (file.nodes[written].kind == syntax::expr_kind::number) {
                std::uint32_t at = cursor;
                while (at > 0 && literals[t.literal_begin + at - 1].node != written)
                    --at;
                if (at > 0) {
                    cursor = at - 1;
                    const scale_literal& l = literals[t.literal_begin + cursor];
                    if (l.value > 1.0 && std::abs(l.exponent) == 1.0)
                        numbers[number_count++] = {l.node, static_cast<int>(l.exponent), l.value};
                }
            }
            if (!product)
                return;
            n = node.lhs;
        }
    }
    bool any() const { return number_count > 0 && reading_count > 0; }
};

// What a unit-scale finding calls the operands it compares: "terms of this sum", or
// "arguments" of "max". Kept in two parts and joined only for a finding, so that a call of
// max or atan2 formats no name of its own (issue 12).
struct meeting_point {
    meeting_point(const char* what) : what(what) {}                // NOLINT: as a string_view
    meeting_point(std::string_view what, std::string_view of = {}) // NOLINT: as above
        : what(what), of(of) {}
    [[nodiscard]] std::string name() const {
        return of.empty() ? std::string(what) : fmt::format("{} of {}", what, of);
    }
    std::string_view what;
    std::string_view of; // the function whose arguments they are, or empty
};

struct agreement {
    std::optional<compact_dimension> reference; // the dimension most operands share
    std::vector<std::size_t> odd;               // operands that differ from it
};

// The reference is the dimension most operands share (the first such on a tie), so that one
// wrong term among several right ones is the one pointed at.
[[gnu::noinline]] inline agreement find_agreement_in_full(std::span<const operand> ops,
                                                          bool prefer_dimensionless) {
    agreement result;
    // In the argument of ln, exp or sin the dimensionless terms are the right ones.
    if (prefer_dimensionless &&
        std::any_of(ops.begin(), ops.end(),
                    [](const operand& op) {
                        return op.type.known && !op.type.zero && op.type.dim.is_dimensionless();
                    }) &&
        std::any_of(ops.begin(), ops.end(), [](const operand& op) {
            return op.type.known && !op.type.zero && !op.type.dim.is_dimensionless();
        })) {
        result.reference = compact_dimension{};
        for (std::size_t i = 0; i < ops.size(); ++i)
            if (ops[i].type.known && !ops[i].type.zero && !ops[i].type.dim.is_dimensionless())
                result.odd.push_back(i);
        return result;
    }
    // Fast path: nearly every meeting point in a real calc agrees.
    const operand* first_known = nullptr;
    bool all_same = true;
    for (const auto& op : ops) {
        if (!op.type.known || op.type.zero)
            continue;
        if (first_known == nullptr)
            first_known = &op;
        else if (!(op.type.dim == first_known->type.dim)) {
            all_same = false;
            break;
        }
    }
    if (all_same) {
        if (first_known != nullptr)
            result.reference = first_known->type.dim;
        return result;
    }
    // Counted in a hash map, since a sum may have thousands of terms of as many dimensions;
    // `counts` keeps the order of first appearance, which breaks ties.
    std::vector<std::pair<compact_dimension, std::size_t>> counts;
    std::unordered_map<compact_dimension, std::size_t, dimension_hash> index;
    for (const auto& op : ops) {
        if (!op.type.known || op.type.zero)
            continue;
        const auto [it, added] = index.try_emplace(op.type.dim, counts.size());
        if (added)
            counts.emplace_back(op.type.dim, 1);
        else
            ++counts[it->second].second;
    }
    if (counts.empty())
        return result;
    std::size_t best = 0;
    for (std::size_t i = 1; i < counts.size(); ++i)
        if (counts[i].second > counts[best].second)
            best = i;
    result.reference = counts[best].first;
    for (std::size_t i = 0; i < ops.size(); ++i)
        if (ops[i].type.known && !ops[i].type.zero && !(ops[i].type.dim == *result.reference))
            result.odd.push_back(i);
    return result;
}

// Nearly every meeting point agrees, and outside the argument of ln, exp or sin that is found
// here in one pass over the operands, as find_agreement_in_full's own first pass finds it,
// without its frame; anything else is left to it.
[[gnu::always_inline]] inline agreement find_agreement(std::span<const operand> ops,
                                                       bool prefer_dimensionless = false) {
    if (prefer_dimensionless)
        return find_agreement_in_full(ops, prefer_dimensionless);
    const operand* first_known = nullptr;
    for (const auto& op : ops) {
        if (!op.type.known || op.type.zero)
            continue;
        if (first_known == nullptr)
            first_known = &op;
        else if (!(op.type.dim == first_known->type.dim))
            return find_agreement_in_full(ops, prefer_dimensionless);
    }
    agreement result;
    if (first_known != nullptr)
        result.reference = first_known->type.dim;
    return result;
}

struct scratch_stacks {
    std::vector<std::uint32_t> spine;
    std::vector<operand> operands;
    type_stack types; // of the operands
    std::vector<scale_literal> literals;
    std::vector<scaled_operand> scaled;
    std::vector<std::size_t> scaled_index; // which operand each scaled one stands for
};

inline scratch_stacks& scratch() {
    thread_local scratch_stacks stacks;
    return stacks;
}

// The operands a caller pushed above `base` on a scratch stack, and their types above
// `types_base`, popped when it goes.
class scratch_region {
  public:
    scratch_region(std::vector<operand>& stack, std::size_t base, type_stack& types,
                   std::size_t types_base)
        : stack_(stack), base_(base), types_(types), types_base_(types_base) {}
    scratch_region(const scratch_region&) = delete;
    scratch_region& operator=(const scratch_region&) = delete;
    ~scratch_region() {
        // Not resize or erase: an operand holds a reference, so it cannot be assigned. Counted
        // first, so that the pops fold into one step rather than a test of the size each.
        const std::size_t size = stack_.size();
        for (std::size_t n = size > base_ ? size - base_ : 0; n > 0; --n)
            stack_.pop_back();
        types_.pop_to(types_base_);
    }
    [[nodiscard]] std::span<const operand> view() const {
        return {stack_.data() + base_, stack_.size() - base_};
    }

  private:
    std::vector<operand>& stack_;
    std::size_t base_;
    type_stack& types_;
    std::size_t types_base_;
};

// Thrown out of a check that meets a name not declared yet, when the caller will retry.
struct symbol_not_yet_declared {};

class checker {
  public:
    checker(const syntax::parsed_file& file, symbol_table& symbols, std::vector<diagnostic>& out)
        : file_(file),
          source_text_(file.source != nullptr ? file.source->text() : std::string_view()),
          symbols_(symbols), out_(out), spine_(scratch().spine), operands_(scratch().operands),
          types_(scratch().types), literals_(scratch().literals), scaled_(scratch().scaled),
          scaled_index_(scratch().scaled_index) {
        abandon(); // a check of an earlier checker on this thread may have been abandoned
    }

    // Made ready for the next check: one checker serves a file's formulas in turn. A check
    // gives back what it pushed on the scratch stacks, except the literal stack's numbers;
    // one abandoned by an exception has its stacks emptied by abandon.
    void begin(bool defer_unknown = false) {
        defer_unknown_ = defer_unknown;
        current_ = nullptr;
        prefer_dimensionless_ = syntax::no_index;
        square_root_argument_ = syntax::no_index;
        side_hint_ = nullptr;
        side_hint_node_ = syntax::no_index;
        // No dimension of an earlier check is alive: their spilled exponents may go.
        compact_dimension::reset_arena();
        literals_.clear();
        // One generated formula of millions of terms must not keep its stacks' memory for the
        // rest of the run; ordinary formulas never come near this.
        constexpr std::size_t kept_capacity = 1U << 16;
        if (operands_.capacity() > kept_capacity) [[unlikely]]
            give_back_memory();
    }

    // Out of line, so that every check does not save registers for these calls.
    [[gnu::noinline, gnu::cold]] void give_back_memory() {
        operands_.shrink_to_fit();
        spine_.shrink_to_fit();
        literals_.shrink_to_fit();
        scaled_.shrink_to_fit();
        scaled_index_.shrink_to_fit();
        common_numbers_.shrink_to_fit();
    }

    // Drops what a check abandoned by an exception left on the scratch stacks.
    void abandon() {
        spine_.clear();
        operands_.clear();
        types_.clear();
        literals_.clear();
        common_numbers_.clear();
        scaled_.clear();
        scaled_index_.clear();
    }

    [[nodiscard]] const syntax::parsed_file& file() const { return file_; }

    // A node's type, with the numbers along its multiplicative path left on the literal stack
    // from where it started.
    typed_term eval(std::uint32_t index) {
        const auto start = static_cast<std::uint32_t>(literals_.size());
        // (x) is x: its parentheses are stepped through here rather than evaluated as a node
        // of their own, which would set the same literal range a second time.
        while (file_.nodes[index].kind == expr_kind::group) {
            if (index == prefer_dimensionless_)
                prefer_dimensionless_ = file_.nodes[index].lhs;
            index = file_.nodes[index].lhs;
        }
        typed_term t = eval_node(index);
        t.literal_begin = start;
        t.literal_count = static_cast<std::uint32_t>(literals_.size()) - start;
        return t;
    }

    // A plain dispatcher: every case is a call whose result is the return value, so this
    // frame stays small (it is entered once per node). The cases kept out of line are the
    // ones whose locals would otherwise make every node pay for them.
    typed_term eval_node(std::uint32_t index) {
        const syntax::expr_node& n = file_.nodes[index];
        switch (n.kind) {
        case expr_kind::number:
            return eval_number(n, index);
        case expr_kind::pi:
            return eval_pi(index);
        case expr_kind::symbol:
            return eval_symbol(n);
        case expr_kind::negate:
            return eval_negate(n);
        case expr_kind::add:
        case expr_kind::subtract:
            // Only where the file has readings to mix: a workbook, or an offset unit declared.
            if ((symbols_.unit_marks() & offset_scale_readings) != 0 ||
                file_.functions == syntax::function_names::spreadsheet) [[unlikely]]
                return eval_mix_or_sum(index);
            return eval_sum(index);
        case expr_kind::multiply:
        case expr_kind::divide:
            return eval_product(index);
        case expr_kind::power:
            return eval_power(n);
        case expr_kind::call:
            return eval_call(n);
        case expr_kind::group:
            if (index == prefer_dimensionless_)
                prefer_dimensionless_ = n.lhs;
            return eval(n.lhs);
        case expr_kind::quantity:
            return eval_quantity(n);
        case expr_kind::inferred:
            // Its dimension is inferred afterwards, not checked here; the rules that do not
            // need it still apply around it.
            return unknown_type(true);
        case expr_kind::reference:
            return eval_reference(n);
        case expr_kind::compare:
            return eval_compare(n);
        }
        return unknown_type();
    }

    // check/formula/side_rules.cpp
    [[gnu::noinline]] void note_unit_read_past_a_slash(diagnostic& d) const;
    [[gnu::noinline]] void note_ton_beside_power(diagnostic& d, std::span<const operand> sides);
    [[gnu::noinline]] bool fit_constant_carries_cell_unit(std::span<const operand> sides);
    bool report_hazen_williams_constant(std::span<const operand> sides, std::uint32_t constant);
    bool lone_symbol_at_reference(std::span<const operand> sides) const;
    bool names_inertia_constant(std::span<const operand> sides) const;
    // Whether the formula being checked relates its sides by <, <=, > or >=.
    bool current_is_limit() const {
        if (current_ == nullptr)
            return false;
        for (std::uint32_t i = 1; i < current_->side_count; ++i) {
            const syntax::relation_kind r = file_.sides[current_->first_side + i].relation_before;
            if (r != syntax::relation_kind::none && r != syntax::relation_kind::equal)
                return true;
        }
        return false;
    }
    [[gnu::noinline]] void ask_of_marked_units(const syntax::formula& f,
                                               std::span<const operand> sides, bool noted);
    [[gnu::noinline]] void report_angular_frequency_as_cycles(std::span<const operand> sides);
    bool report_apparent_power_without_factor(const operand& side, const operand& other);
    bool declares_real_energy(std::uint32_t node) const;
    bool ratio_of_gauge_readings(std::uint32_t node);
    static bool names_power_factor(std::string_view name);
    static bool names_efficiency(std::string_view name);
    [[gnu::noinline]] void report_apparent_as_real_power(std::span<const operand> sides);
    [[gnu::noinline]] void report_cooling_efficiency_inverted(std::span<const operand> sides,
                                                              std::size_t findings_before);
    static bool is_gas_volume_or_flow(const compact_dimension& dim);

    // Visits the factors of a product, through '*', '/' and groups, each with the power it
    // stands in (+1, or -1 below a division); anything else is a factor. Stops where `visit`
    // returns true, and says whether it did.
    template <class Visit> bool for_each_factor(std::uint32_t k, Visit&& visit) const {
        std::vector<std::pair<std::uint32_t, int>> pending{{k, 1}};
        while (!pending.empty()) {
            const auto [at, sign] = pending.back();
            pending.pop_back();
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::multiply || n.kind == expr_kind::divide) {
                pending.emplace_back(n.lhs, sign);
                pending.emplace_back(n.rhs, n.kind == expr_kind::divide ? -sign : sign);
            } else if (n.kind == expr_kind::group) {
                pending.emplace_back(n.lhs, sign);
            } else if (visit(at, sign)) {
                return true;
            }
        }
        return false;
    }

    // check/formula/reference_volumes.cpp
    std::optional<std::string_view> declared_unit_text(std::uint32_t at) const;
    std::uint32_t sole_symbol_times_conversions(std::uint32_t k, bool cells_too = false) const;
    std::uint32_t sole_symbol_times_numbers(std::uint32_t k) const;
    static std::optional<reference_volume> stated_reference_volume(const symbol_entry& e);
    std::optional<reference_volume> reference_volume_of_sum(std::uint32_t k) const;
    std::optional<reference_volume> reference_volume_of(std::uint32_t k) const;
    [[gnu::noinline]] void report_reference_temperatures_left_out(std::span<const operand> sides);
    bool reference_temperatures_reconcile(std::uint32_t odd_node, std::uint32_t reference_node,
                                          const scaled_operand& odd,
                                          const scaled_operand& reference) const;
    [[gnu::noinline]] void report_actual_volume_as_normal(std::span<const operand> sides);
    bool describes_reference_state(std::uint32_t node) const;
    static bool describes_free_air(const symbol_entry& e);
    bool report_normal_measure_times_actual_volume(const operand& side);
    bool report_power_from_normal_flow(const operand& side);
    static bool names_actual_volume(const symbol_entry& e);
    void report_actual_product_as_normal(std::span<const operand> sides);
    bool only_volumes_and_conversions(std::uint32_t k, bool volume) const;
    bool could_correct_state(std::uint32_t at) const;
    bool plain_conversion_number(std::uint32_t at) const;
    bool circle_folded_with_conversion(std::uint32_t at, bool pi_written) const;
    void report_flow_at_reference(std::uint32_t flow, const reference_volume& normal,
                                  std::string_view wanted, std::uint32_t side);
    bool report_area_from_normal_flow(const operand& side);
    bool report_reference_states_in_ratio(const operand& side);
    bool report_velocity_from_normal_flow(const operand& side);

    // A symbol or a cell as the rotation rules read it: its name (a cell's address), or none for
    // the workbook cell written to, and its unit as written.
    struct rotating_part {
        std::string_view name;
        std::string_view unit;
        // 'n_p', 'C12', or "the cell"
        [[nodiscard]] std::string shown() const {
            return name.empty() ? std::string("the cell") : fmt::format("'{}'", name);
        }
    };

    // What a formula holds that the rotation rules weigh: its parts by kind, and counts.
    struct rotation_census {
        rotating_part torque;
        rotating_part speed;
        rotating_part partner; // an angular speed in radians, or an inertia
        rotating_part rim;     // a speed along a path (m/s, fpm)
        rotating_part length;
        round_length length_round = round_length::none;
        int torques = 0;
        int speeds = 0;
        int powers = 0;
        int energies = 0; // in an energy unit (J, kWh), which no torque is written in
        int angular_speeds = 0;
        int inertias = 0;
        int rim_speeds = 0;
        int lengths = 0;
        int other_numbers = 0; // not powers of ten or 60: π/12, a screw's 2 strokes
        int displacements = 0; // a volume per revolution (cm³/rev): a pump's or motor's
        int pressures = 0;
        int capacitors = 0;                    // a capacitance or an inductance
        int reactives = 0;                     // a reactive power (var, kvar)
        int pis = 0;                           // π written as π, not folded into a number
        int numbers_not_clock_conversions = 0; // neither 10^k nor 60·10^k, as 2 or 30
    };

    // check/formula/rotation.cpp
    void warn_of_missing_pi(const syntax::formula& f, std::string message, std::string fix);
    static bool is_rotating_power_or_torque(const compact_dimension& dim);
    static bool asks_for_two_pi(const compact_dimension& dim);
    [[gnu::noinline]] void report_revolution_without_two_pi(const syntax::formula& f,
                                                            const compact_dimension& sides_dim);
    void report_rim_speed_without_pi(const syntax::formula& f, const rotating_part& speed,
                                     const rotating_part& rim, const rotating_part& length,
                                     bool radius);
    void report_half_of_two_pi(const syntax::formula& f, const rotation_census& c);
    void report_revolutions_beside_radians(const syntax::formula& f, const rotating_part& speed,
                                           const rotating_part& partner, bool angular);

    // The notes that say what a mismatch's slip is look at sums of a formula's size only; a
    // generated sum of 400,000 terms gets the finding without them, in linear time.
    static constexpr std::size_t notes_for_terms_up_to = 16;

    // check/formula/explanations.cpp
    void note_count_of_periods_left_out(diagnostic& d, std::span<const operand> ops,
                                        const agreement& a) const;
    void note_bare_quantity_apart(diagnostic& d, std::span<const operand> ops,
                                  const agreement& a) const;
    std::optional<compact_dimension> odd_one_apart(std::span<const operand> ops,
                                                   const agreement& a) const;
    void note_acceleration_or_density_apart(diagnostic& d, std::span<const operand> ops,
                                            const agreement& a) const;
    void note_specific_weight_apart(diagnostic& d, std::span<const operand> ops,
                                    const agreement& a) const;
    const operand* plain_reference_term(std::span<const operand> ops, const agreement& a) const;
    std::optional<std::string> coefficient_for_other_unit(const operand& term,
                                                          const operand& other_term,
                                                          const scale_literal& number,
                                                          double needed, double& folded) const;
    std::optional<declared_factor> declared_factor_of(std::uint32_t k, double exponent) const;
    std::optional<std::pair<std::uint32_t, declared_factor>> declared_factor_at(std::uint32_t at,
                                                                                int sign) const;
    [[gnu::noinline]] bool
    note_constant_for_other_units(diagnostic& d, std::span<const operand> ops, const agreement& a);
    bool note_gravity_in_other_units(diagnostic& d, std::span<const operand> ops,
                                     const agreement& a);
    void note_fraction_beside_concentration(diagnostic& d, std::span<const operand> sides);
    void note_bare_number_side(diagnostic& d, std::span<const operand> sides) const;
    std::string display_text(span s) const { return single_line(file_.source->text(s)); }

    // check/formula/evaluate.cpp
    [[gnu::noinline]] typed_term eval_pi(std::uint32_t index);
    [[gnu::noinline]] typed_term eval_negate(const syntax::expr_node& n);
    [[gnu::noinline]] typed_term eval_power(const syntax::expr_node& n);
    [[gnu::noinline]] std::optional<typed_term> eval_log_difference(std::uint32_t index);
    bool force_over_area(std::uint32_t k) const;
    bool names_a_stress_symbol(std::uint32_t k) const;
    bool gradient_times_depth(std::uint32_t k) const;
    bool declared_pressure_difference(const operand& o) const;
    bool has_factor_of_dimension(std::uint32_t k, const compact_dimension& wanted, int sign) const;
    std::optional<double> scale_left_for_sum(std::uint32_t root, const typed_term& other,
                                             std::uint32_t sum) const;
    void check_formula(const syntax::formula& f);
    void mark_symbols_used(const syntax::formula& f);
    std::optional<value_type> check_value(const syntax::formula& f);

  private:
    const syntax::parsed_file& file_;
    // The text its ranges index, held here: a range is read at every symbol and number.
    std::string_view source_text_;
    symbol_table& symbols_;
    std::vector<diagnostic>& out_;
    bool defer_unknown_ = false;
    // Scratch stacks shared by nested sums and products, so checking allocates nothing once
    // warm. Each user takes the part above the size it found and gives it back.
    std::vector<std::uint32_t>& spine_;
    std::vector<operand>& operands_;
    type_stack& types_;
    std::vector<scale_literal>& literals_;
    std::vector<scale_literal> common_numbers_; // a sum's common factors, while it is weighed
    std::vector<scaled_operand>& scaled_;
    std::vector<std::size_t>& scaled_index_;
    const syntax::formula* current_ = nullptr; // the formula being checked
    // The argument of ln, exp, sin...: in a sum there, the dimensionless terms are right.
    std::uint32_t prefer_dimensionless_ = syntax::no_index;
    // The argument of the square root being checked: sqrt(2*p_g/ρ) is a jet's velocity.
    std::uint32_t square_root_argument_ = syntax::no_index;
    // The other side of the equation whose side is the sum at side_hint_node_.
    const typed_term* side_hint_ = nullptr;
    std::uint32_t side_hint_node_ = syntax::no_index;
    std::uint32_t sum_checked_ = syntax::no_index; // the sum whose terms check_scales weighs
    // While a sum is weighed, where the numbers all its terms carry lie on common_numbers_.
    std::pair<std::size_t, std::size_t> sum_common_numbers_{};
    const typed_term* sum_side_hint_ = nullptr; // while a side's sum is checked, the other side
    // The site's barometer where the file declares one: see declared_site_barometer.
    struct site_barometer {
        std::string_view name;
        double pascals = 0.0;
        double unit = 1.0; // SI value of its declared unit
    };
    site_barometer site_barometer_;
    bool site_barometer_settled_ = false;         // none, and none to come
    std::size_t site_barometer_declarations_ = 0; // declarations searched so far
    std::size_t pressure_declarations_seen_ = 0;  // by declares_gauge_or_absolute_pressure
    bool gauge_or_absolute_declared_ = false;
    // The ratio of the last scale warning inside the formula being checked, 0 where none.
    double inner_scale_ratio_ = 0.0;
    // The side set equal to a specific enthalpy (h_f, "enthalpy"): see enthalpy_above_ice_point.
    std::uint32_t enthalpy_side_ = syntax::no_index;

    // Inline: every symbol and call is looked up by its text, and a call here cost more than
    // the view it makes. The parser made every range from this text, so each lies within it
    // and is read without substr's test (which source_file::text keeps for other callers).
    [[gnu::always_inline]] std::string_view text(span s) const {
        assert(s.begin <= s.end && s.end <= source_text_.size());
        return {source_text_.data() + s.begin, static_cast<std::size_t>(s.end - s.begin)};
    }

    // The literal stack cut back to `count`, as resize would: the numbers are trivially
    // destroyed, so a cut (nearly every one) is a few pointer decrements here, inline, where
    // resize is a call.
    [[gnu::always_inline]] void cut_literals_to(std::size_t count) {
        static_assert(std::is_trivially_destructible_v<scale_literal>);
        if (count > literals_.size()) [[unlikely]]
            literals_.resize(count);
        while (literals_.size() > count)
            literals_.pop_back();
    }

    // An operand's type, on the type stack; shared with an equal one of the same meeting point
    // where there are many, since looking for one costs more than a short one saves. Most
    // sides, and many terms and arguments, are symbols: a symbol's type is copied from where
    // its entry keeps it, as a product's factors are read, without the walk's dispatch. In
    // line: out of line, with eval inlined into it, it cost more than it saved.
    [[gnu::always_inline]] const typed_term&
    push_operand_type(std::uint32_t node, std::size_t region, std::size_t operands) {
        constexpr std::size_t shared_from = 16;
        if (operands >= shared_from)
            return types_.push_shared(eval(node), region);
        if (const typed_term* kept = kept_symbol_type(node)) {
            typed_term& t = types_.push(*kept);
            t.literal_begin = static_cast<std::uint32_t>(literals_.size()); // as eval sets it
            return t;
        }
        return types_.push_made([&] { return eval(node); });
    }

    // check/formula/gravity_numbers.cpp
    bool read_column_and_atmosphere(std::size_t base, std::uint32_t sum_node);

    // check/formula/air_enthalpy.cpp
    const symbol_entry* air_enthalpy_symbol(std::uint32_t node, bool said_air) const;
    bool read_air_enthalpy_datum(std::size_t base);
    [[gnu::noinline]] bool read_moist_air_enthalpy_fit(const syntax::formula& f);
    bool report_moist_air_enthalpy_units(std::uint32_t right, const symbol_entry& h,
                                         const symbol_entry& reading, const symbol_entry& ratio,
                                         double dry, double latent);

    // check/formula/net_force.cpp
    bool declares_gauge_or_absolute_pressure();
    std::uint32_t absolute_pressure_in_factor(std::uint32_t at) const;
    [[gnu::noinline]] void report_force_from_absolute_pressure(std::span<const operand> sides);
    [[gnu::noinline]] void report_air_enthalpy_datum_left_out(std::span<const operand> sides);
    bool numbers_could_carry(std::span<const scale_literal> numbers, const dimension& lacking,
                             std::span<std::string_view> texts) const;
    static carried_quantity::term_kind kind_of(const typed_term& t);
    static carried_quantity::term_kind kind_of(const typed_term& t,
                                               const compact_dimension& reference);
    [[gnu::noinline]] void read_gravity_number_in_argument(std::size_t base, std::size_t k);
    bool read_gravity_numbers_either_way(std::size_t base, const agreement& a,
                                         std::uint32_t sum_node = syntax::no_index);
    bool read_gravity_numbers(std::size_t base, const agreement& a,
                              std::uint32_t sum_node = syntax::no_index,
                              double reference_scale = std::numeric_limits<double>::quiet_NaN());
    [[gnu::noinline]] void report_specific_gravity_against_water(const operand& term,
                                                                 const gravity_reading& reading,
                                                                 bool multiplies,
                                                                 const std::string& written);
    [[gnu::noinline]] void report_standard_air_number_on_actual_flow(const operand& term,
                                                                     const gravity_reading& reading,
                                                                     const std::string& written,
                                                                     std::uint32_t node);
    static bool is_water_density_or_weight(const carried_quantity& q);
    [[gnu::noinline]] bool report_molar_volume_off_reference(std::size_t base, std::size_t count,
                                                             std::size_t odd, double written,
                                                             bool multiplies,
                                                             const gravity_reading& reading,
                                                             std::uint32_t node);

    // check/formula/explanations.cpp
    void add_term_and_units(diagnostic& d, const operand& op) const;
    void add_term(diagnostic& d, const operand& op, bool differs = false) const;
    void add_number_term(diagnostic& d, const operand& number,
                         const compact_dimension& read_as) const;
    void explain(diagnostic& d, std::span<const operand> ops, const agreement& a,
                 std::string_view others) const;

    // A symbol's type as its entry keeps it, marked used as eval_symbol marks it; null where
    // eval_symbol has more to do (not a symbol, undeclared, first use). Valid until the next
    // symbol is declared, which no check does.
    [[gnu::always_inline]] const typed_term* kept_symbol_type(std::uint32_t index) {
        const syntax::expr_node& n = file_.nodes[index];
        if (n.kind != expr_kind::symbol)
            return nullptr;
        symbol_entry* entry = symbols_.find(text(n.range));
        if (entry == nullptr || !entry->checked_type || entry->checked_type->reading_or_difference)
            return nullptr;
        entry->used = true;
        return &*entry->checked_type;
    }

    // "F = m_1*g/1000 + m_2*g/1000" into kN is "(m_1*g + m_2*g)/1000": a number that every term
    // carries, to the same power, is a factor of the whole sum. It is taken out of each term
    // (left there as a 1) for the terms to be weighed against one another, and given to the sum,
    // to be weighed where the sum meets the rest of the formula.
    [[gnu::always_inline]] void factor_out_common_numbers(std::span<const operand> terms) {
        if (terms.size() >= 2 && terms.front().type.literal_count != 0) [[unlikely]]
            factor_out_common_numbers_of(terms);
    }

    // Calls `visit(written, value)` for each bare number among a mismatch's odd terms, until
    // it returns true.
    template <class Visit>
    void for_each_odd_number(std::span<const operand> terms, const agreement& a,
                             Visit&& visit) const {
        for (const std::size_t i : a.odd) {
            const syntax::expr_node& n = file_.nodes[terms[i].node];
            if (n.kind != expr_kind::number)
                continue;
            const std::string_view written = text(n.range);
            if (visit(written, read_number(written).literal.value))
                return;
        }
    }

    // A number or a quantity in a sum on an offset scale may shift the zero: 273.15 from °C to
    // K, 32 between °F and °C, 14.696 psi or {p_atm} from gauge to absolute.
    struct shift {
        double written = 0.0;   // in the sum's unit (bare numbers), signed
        double si = 0.0;        // already in SI (quantities), signed
        double tolerance = 0.0; // relative
    };

    // The scale and zero of a sum with a value on an offset scale. Values on one scale subtract
    // to an ordinary difference; a shift by the scale's zero converts it; an absolute pressure
    // added to a gauge one (+ p_atm) gives an absolute pressure.
    // "(p_k*1000 + 101325 - p_vk*1000)": every value with a unit converted by its numbers to
    // one unit, and the numbers added in that unit. Where taking each term's numbers as its
    // conversion gives all the terms the same unit and lands the zero where a scale has one,
    // that is the sum's unit (`unit`); otherwise the scale rule weighs the terms as usual.
    template <class Shifted>
    bool converted_alike(std::span<const operand> terms, const Shifted& shifted,
                         const compact_dimension& dim, double& unit) const {
        double common = std::numeric_limits<double>::quiet_NaN();
        for (const auto& t : terms) {
            if (!t.type.known || t.type.zero || is_shift_candidate(t))
                continue;
            if (t.type.literal_count == 0)
                return false;
            // Only conversions: the 0.5 of "0.5*t_1 + 0.5*t_2 + 273.15" is a mean's.
            for (std::uint32_t l = 0; l < t.type.literal_count; ++l)
                if (!looks_like_conversion(literals_[t.type.literal_begin + l], true))
                    return false;
            const double u = unit_as_written(t.type);
            if (!std::isfinite(u))
                return false;
            if (!std::isfinite(common))
                common = u;
            else if (std::abs(u / common - 1.0) > 1e-9)
                return false;
        }
        if (!std::isfinite(common))
            return false;
        double tolerance = 0.0;
        const double origin = shifted(common, 0.0, &tolerance);
        if (!recognised_origin(origin, tolerance, dim, terms))
            return false;
        unit = common;
        return true;
    }

    // check/formula/offset_sums.cpp
    void note_scale_zero_beside_difference(diagnostic& d, std::span<const operand> terms,
                                           const agreement& a);
    [[gnu::noinline]] void note_zero_added_to_converted_temperature(diagnostic& d,
                                                                    std::span<const operand> terms,
                                                                    const agreement& a);
    bool holds_absolute_pressure(std::uint32_t term) const;
    void note_atmosphere_in_another_unit(diagnostic& d, std::span<const operand> terms,
                                         const agreement& a);
    void adopt_numbers_in_scaled_unit(std::size_t base, bool bounds = false);
    void adopt_numbers_beside_cells(std::size_t base);
    bool atmosphere_among_numbers(std::size_t base) const;
    const typed_term* adopt_numbers_on_offset_scale(std::size_t base);
    bool converts_to_a_named_unit(const typed_term& t) const;
    bool is_shift_candidate(const operand& op) const;
    shift shift_of(const operand& op) const;
    bool recognised_origin(double origin, double tolerance, const compact_dimension& dim,
                           std::span<const operand> terms) const;
    bool report_zero_beside_difference_of_readings(std::span<const operand> terms, double unit,
                                                   const compact_dimension& dim);
    const unit_definition* scale_named(double origin, double tolerance,
                                       const compact_dimension& dim,
                                       std::span<const operand> terms) const;
    bool column_pressure(std::uint32_t node) const;
    bool report_vacuum_added_to_barometer(std::span<const operand> terms);
    static bool gauge_divided_into_absolute_unit(std::span<const operand> terms, double scale);
    typed_term finish_offset_sum(std::span<const operand> terms, typed_term result,
                                 std::size_t literal_base, std::uint32_t index);

    // check/formula/offset_sum_reports.cpp
    void report_atmosphere_not_the_site(std::uint32_t number, std::string_view what, double pascals,
                                        const site_barometer& site, double unit,
                                        bool added_to_gauge = true, bool number_subtracted = false);
    bool declares_a_barometer(const syntax::declaration& decl) const;
    std::optional<std::string> barometer_converted_to(double unit) const;
    std::string barometer_advice(std::uint32_t reading, double unit) const;
    std::optional<std::string_view> barometer_in_unit(double unit) const;
    std::string atmosphere_in(double unit, std::string_view unit_name) const;
    std::optional<std::string> site_atmosphere_advice(std::string_view reading, double unit,
                                                      std::string_view unit_name);
    const site_barometer* declared_site_barometer();
    double declared_number(const syntax::declaration& decl) const;
    void warn_sea_level_atmosphere_at_site(std::span<const operand> terms, double unit);
    void warn_atmosphere_number_at_site(std::span<const operand> terms, double unit);
    bool named_gauge(std::uint32_t node) const;
    bool report_zero_added_twice(std::span<const operand> terms, double unit,
                                 const compact_dimension& dim);
    bool report_zero_in_another_unit_added(const operand& t, const shift& sh, double unit,
                                           const compact_dimension& dim,
                                           std::span<const operand> terms);
    const unit_definition* offset_unit_of(std::uint32_t node) const;
    bool is_whole_side(std::uint32_t node) const;
    const unit_definition* subtracted_scale_zero(std::span<const operand> terms,
                                                 double final_origin, double slack) const;
    void report_mixed_scales(std::span<const operand> terms, double difference);
    void report_shifted_difference(std::span<const operand> terms, double difference,
                                   bool temperature);
    bool report_atmosphere_taken_twice(std::span<const operand> terms, std::size_t only);
    bool names_atmosphere(std::uint32_t node) const;

    // Terms of one dimension in different units give numbers off by a factor, unless numbers
    // in the formula supply that conversion, the right way round. `unit` receives the SI value
    // of the unit they agree in. False when a finding was reported.
    [[gnu::always_inline]] bool check_scales(std::span<const operand> ops, meeting_point what,
                                             double& unit,
                                             optional_rational* exact_unit = nullptr) {
        if (exact_unit != nullptr)
            exact_unit->reset();
        // Fast path: nearly every meeting point has one unit and no numbers to weigh. Where
        // every scale is exact they are compared exactly, else as doubles.
        {
            const rational* exact_first = nullptr;
            bool all_exact = true;
            double first = 0.0;
            bool plain = true;
            bool with_numbers = false;
            for (const auto& op : ops) {
                if (!op.type.known || op.type.zero || !std::isfinite(op.type.scale))
                    continue;
                const bool number = op.type.numeric;
                if (number && !op.type.dim.is_dimensionless())
                    continue; // a number in the others' unit
                if (!number && op.type.literal_count != 0) {
                    with_numbers = true;
                    break;
                }
                const double s = number ? 1.0 : op.type.scale;
                static const rational one(1);
                const rational* exact =
                    number ? &one : (op.type.exact_scale ? &*op.type.exact_scale : nullptr);
                all_exact = all_exact && exact != nullptr;
                if (first == 0.0) {
                    first = s;
                    exact_first = exact;
                } else if (all_exact ? !(*exact == *exact_first) : s != first) {
                    plain = false;
                    break;
                }
            }
            if (plain && !with_numbers) {
                unit = first == 0.0 ? 1.0 : first;
                if (exact_unit != nullptr && all_exact)
                    *exact_unit = exact_first != nullptr ? *exact_first : rational(1);
                return true;
            }
            return reconcile_scales(ops, what, unit, with_numbers);
        }
    }

    // "W = 8.34*Q*C" (lb/d from mgd and mg/L): not the conversion, 8.3454, but water's weight
    // per gallon, which the trade writes there. Accepted where the number is a published value
    // of the property and the exact conversion would reconcile the units; a note says so.
    // A number among the parts that one of the trade constants stands for, where reading it so
    // reconciles the units as written or, with `flipped`, only the other way round.
    struct trade_constant_reading {
        const scale_literal* literal;
        const trade_constant* constant;
        double unit;
        rational decade; // the power of ten the number is printed apart from the property
    };
    // A conversion folded with a coefficient into one number: "π*D_mm^2/4e6" (4 × 10⁶ mm²/m²),
    // "(D_mm/4000)" for R = D/4 in metres, "0.4085*Q/d^2" (4/π times gpm per in² in ft/s). A
    // number that is one digit times a power of ten is tried as that power of ten, and any
    // number as 4/π or π/4 times a conversion; where the units then reconcile, the rest is a
    // dimensionless coefficient, as the formula means it.
    // The constants of well-known formulas that the trades fold with a unit conversion into one
    // printed number, written to 3 or more digits: 0.4085*Q_gpm/d_in^2 (4/π), the well-flow
    // formulas' T = 528*Q*log10(r_2/r_1)/Δs and T = 264*Q/Δs in gal/(d·ft) from gpm and ft
    // (1440 min/d times ln 10/(2π), Thiem, and ln 10/(4π), Cooper-Jacob; Freeze and Cherry,
    // Groundwater, 1979, ch. 8, from memory). A number that needs one the wrong way round is
    // not read so.
    struct folded_constant {
        double value;
        const char* written;
        const char* what;
        bool whole_three_digits;          // also read in a whole number of 3 digits (528, 264)
        bool circle = false;              // a circle's area: read only beside a square (D^2)
        bool whole_two_digits = false;    // also in a whole number of 2 digits (24 = 2 × 12)
        bool beside_power_of_ten = false; // only with a power of ten (622 = 0.622 × 1000)
        // Only where the formula can hold a half or a 2 (may_hold_a_half). "Q_m = 0.8494*Q_cfm"
        // is half of 1.699 m³/h per cfm, a conversion with no half in it: a slip, not a fold.
        bool half_of_a_square_or_radius = false;
        bool beside_pi = false;        // only where π is written beside it (π*D^2/576)
        bool beside_logarithm = false; // only in a formula that takes a logarithm (well flow)
    };

    // check/formula/scale_reconcile.cpp
    double written_number(span range) const;
    double quantity_si_value(const syntax::expr_node& n) const;
    scaled_operand scaled(const typed_term& t, bool as_number) const;
    bool converts_in_term(const scale_literal& l, const typed_term& term, bool allow_hundred) const;
    [[gnu::always_inline]] inline bool units_agree_with_plain_numbers(std::span<const operand> ops,
                                                                      double& unit) const;
    static bool said_absolute(const symbol_entry& e);
    [[gnu::noinline]] void report_barometer_added_to_absolute(std::span<const operand> terms);
    [[gnu::noinline]] void report_absolute_set_to_difference(std::span<const operand> sides);
    [[gnu::noinline]] void report_barometer_reading_as_absolute(std::span<const operand> sides);
    [[gnu::noinline]] void report_head_from_absolute(std::span<const operand> sides);
    [[gnu::noinline]] void report_difference_set_to_absolute(std::span<const operand> sides);
    [[gnu::noinline]] void report_sea_level_atmosphere_in_products(const syntax::formula& f);
    bool names_a_vacuum(std::uint32_t node) const;
    [[gnu::noinline]] bool report_share_of_gauge_beside_absolute(std::span<const operand> terms);
    std::optional<double> unit_the_sum_needs() const;
    bool report_term_left_unconverted(std::span<const operand> ops,
                                      std::span<const std::size_t> index,
                                      std::span<const scaled_operand> parts);
    static bool units_agree_within_a_millionth(std::span<const operand> ops, double& unit);
    [[gnu::noinline]] bool reconcile_scales(std::span<const operand> ops, meeting_point what,
                                            double& unit, bool with_numbers);
    bool report_pound_mass_without_gc(const operand& op, const operand& reference,
                                      const scaled_operand& odd, const scaled_operand& in_unit);
    [[gnu::noinline]] bool reconcile_in_full(std::span<const operand> ops, meeting_point what,
                                             double& unit);
    static int significant_digits(std::string_view written);
    static bool near_power_of_ten(double v, double tolerance);
    std::optional<double> ratio_with_numbers(const scaled_operand& reference,
                                             const scaled_operand& odd, double ratio,
                                             bool reference_holds_pi, bool odd_holds_pi) const;
    static std::optional<double> common_conversion(double v, double slack);
    std::optional<double> ratio_with_folded_constant(const scaled_operand& reference,
                                                     const scaled_operand& odd, double ratio) const;
    bool spare_time_ratio(const scale_literal& l, const typed_term& t, std::uint32_t term) const;
    static bool names_a_time_unit(std::string_view unit);
    static bool time_ratio_number(const scale_literal& l);
    bool spare_speed_ratio(const scale_literal& l, std::uint32_t term) const;
    // Nearly every number is no 1.8 or 5/9: that is asked here, in line at every call.
    [[gnu::always_inline]] bool spare_degree_ratio(const scale_literal& l,
                                                   std::uint32_t term) const {
        if (std::abs(l.exponent) != 1.0 ||
            (l.value != 1.8 && std::abs(l.value * 1.8 - 1.0) > l.tolerance * 1.8 + 1e-9))
            return false;
        return degree_ratio_beside_temperature(term);
    }
    [[gnu::noinline]] bool degree_ratio_beside_temperature(std::uint32_t term) const;
    static bool is_power_trade_constant(double written);
    std::optional<std::string> folded_conversion_note(const scaled_operand& odd,
                                                      double ratio) const;
    bool densities_of_water_and_air(const scaled_operand& odd, const scaled_operand& reference,
                                    double ratio);

    // check/formula/scale_factors.cpp
    static std::optional<trade_constant_reading>
    read_trade_constant(std::span<const scaled_operand> parts, bool flipped);
    bool accept_trade_constant(std::span<const scaled_operand> parts, double& unit);
    bool report_inverted_trade_constant(std::span<const operand> ops,
                                        std::span<const std::size_t> index,
                                        std::span<const scaled_operand> parts);
    static std::span<const folded_constant> folded_constants();
    bool may_hold_a_half(const operand& term) const;
    bool squares_something(std::uint32_t node) const;
    bool accept_operating_time(std::span<const scaled_operand> parts, double& unit);
    bool accept_folded_coefficient(std::span<const operand> ops, std::span<const std::size_t> index,
                                   std::span<const scaled_operand> parts, double& unit);
    static scale_literal exact_conversion_literal(const scale_literal& l, const rational& value);
    static scale_literal power_of_ten_literal(const scale_literal& l, double power);
    static std::optional<scale_literal> twice_a_conversion(const scale_literal& l);
    std::optional<double> folded_power_of_ten(std::span<const operand> ops,
                                              std::span<const std::size_t> index, std::size_t i,
                                              const scale_literal& l, bool second) const;
    bool holds_pi(std::uint32_t k) const;
    bool holds_number(std::uint32_t k, double value) const;
    bool formula_takes_a_logarithm(std::uint32_t term) const;
    bool holds_standard_gravity(std::uint32_t k) const;
    bool conversions_all_needed(std::span<const operand> ops, std::span<const std::size_t> index,
                                std::span<const scaled_operand> parts, bool dimensionless) const;
    bool report_extra_factor(std::span<const operand> ops, std::span<const std::size_t> index,
                             std::span<const scaled_operand> parts, bool dimensionless);
    bool report_unneeded_factor(std::span<const operand> ops, std::span<const std::size_t> index,
                                std::span<const scaled_operand> parts, bool dimensionless);
    double counted_multiple(std::uint32_t k) const;
    bool percentage_written_out(const scale_literal& l) const;
    bool hundred_over_percent_sum(std::uint32_t term, const scale_literal& l) const;
    std::uint32_t raised_number(std::uint32_t root, std::uint32_t number) const;
    bool report_unneeded(const operand& op, const scale_literal& l,
                         std::optional<double> folded_power = std::nullopt);
    bool report_two_of_two_pi_twice(const operand& op, const scale_literal& l);
    void report_inverted_factor(const operand& op, const scale_literal& l);
    bool report_inverted_and_decade_short(std::span<const operand> ops,
                                          std::span<const std::size_t> index,
                                          std::span<const scaled_operand> parts);
    [[gnu::noinline]] bool report_circle_left_out(std::span<const operand> ops,
                                                  std::span<const std::size_t> index,
                                                  std::span<const scaled_operand> parts);
    [[gnu::noinline]] bool report_angle_conversion(std::span<const operand> ops,
                                                   std::span<const std::size_t> index,
                                                   std::span<const scaled_operand> parts,
                                                   bool turned);
    [[gnu::always_inline]] void check_origins(std::span<const operand> sides,
                                              std::string_view relation) {
        // Nearly every formula: no scale's zero as a reading, no weighted readings and every
        // origin absolute, where each step of compare_origins does nothing. One pass says so.
        // A loop of its own: std::all_of was left a call.
        for (const operand& side : sides)
            if (side.type.zero_of != nullptr || side.type.weighted_sum || side.type.origin != 0.0) {
                compare_origins(sides, relation);
                return;
            }
    }

    // check/formula/origins.cpp
    static bool celsius_reading(const operand& o);
    bool magnus_solved_for_reading(const operand& o) const;
    std::uint32_t magnus_solved_constant(std::uint32_t node) const;
    bool explain_reversed_fahrenheit(diagnostic& d, const operand& a, const operand& b);
    [[gnu::noinline]] void compare_origins(std::span<const operand> sides,
                                           std::string_view relation);
    std::optional<double> number_taken_after_division_by_1_8(const operand& o) const;
    std::uint32_t fraction_of_a_reading(const syntax::expr_node& product) const;
    std::uint32_t number_added(std::uint32_t node) const;
    std::string atmosphere_in_other_unit(const operand& side, double reading_unit) const;
    std::optional<std::string> atmosphere_in_unit_of_other(const operand& side,
                                                           const operand& other,
                                                           double reading_unit) const;
    std::optional<std::string> atmosphere_added_to_gauge(const operand& absolute,
                                                         const operand& gauge,
                                                         bool temperature) const;
    bool read_local_atmosphere_taken_off(const operand& difference);
    bool read_number_as_local_atmosphere(std::uint32_t number, double unit);
    bool read_local_atmosphere(const operand& sum, double other_scale);
    bool read_site_atmosphere_in_sum(std::span<const operand> terms, double unit,
                                     double shifted_origin, double tolerance);
    void settle_rounded_side(typed_term& side, std::size_t literal_base) const;
    void report_unbalanced_readings(const operand& side);
    bool report_scale_zero_beside_difference(std::span<const operand> sides);
    std::string units_in(std::uint32_t root) const;
    unsigned clock_units_of_formula() const;
    std::string days_a_year_note() const;
    std::optional<std::string_view>
    declared_in_units(std::initializer_list<std::string_view> units) const;
    bool multiplies_by_gravity_number(std::uint32_t literals_begin) const;
    bool divides_by_gravity_number(std::uint32_t literals_begin) const;
    static bool is_typed_gravity(const scale_literal& l);
    static bool written_whole(std::string_view written);
    double unit_of_written_numbers(const typed_term& t) const;
    std::pair<double, std::string> unit_of_numbers(const typed_term& t,
                                                   const unit_definition& scale) const;
    bool mixes_units_of_one_kind(std::uint32_t root) const;
    // Whether a declared symbol of the formula being checked passes `test(name, entry)`.
    template <typename Test> bool formula_has_symbol(Test&& test) const {
        bool found = false;
        visit_nodes([&](const syntax::expr_node& n) {
            if (found || n.kind != expr_kind::symbol)
                return;
            const std::string_view name = text(n.range);
            const symbol_entry* e = symbols_.find(name);
            found = e != nullptr && test(name, *e);
        });
        return found;
    }
    template <typename F> void visit_nodes(F&& f) const {
        // An expression on its own (expression_dimension: a query, or a side's dimension for
        // the list of formulas) belongs to no formula.
        if (current_ == nullptr)
            return;
        std::vector<std::uint32_t> stack;
        for (std::uint32_t i = 0; i < current_->side_count; ++i)
            stack.push_back(file_.sides[current_->first_side + i].root);
        while (!stack.empty()) {
            const syntax::expr_node& n = file_.nodes[stack.back()];
            stack.pop_back();
            f(n);
            if (n.kind == expr_kind::call) {
                for (std::uint32_t i = 0; i < n.rhs; ++i)
                    stack.push_back(file_.call_args[n.lhs + i]);
            } else if (n.kind != expr_kind::number && n.kind != expr_kind::pi &&
                       n.kind != expr_kind::symbol && n.kind != expr_kind::quantity &&
                       n.kind != expr_kind::inferred && n.kind != expr_kind::reference) {
                if (n.rhs != syntax::no_index)
                    stack.push_back(n.rhs);
                if (n.lhs != syntax::no_index)
                    stack.push_back(n.lhs);
            }
        }
    }

    // check/formula/offset_readings.cpp
    void report_lethality_reference_on_other_scale(std::uint32_t index);
    static bool is_heat_per_degree(const compact_dimension& partner);
    static bool is_per_degree_coefficient(const compact_dimension& partner);
    static bool is_slope_of_property(const compact_dimension& partner);
    bool gas_constant_in_formula() const;
    bool heat_capacity_in_formula(const compact_dimension& partner) const;
    bool linear_fit_on_reading(std::uint32_t node) const;
    void report_offset(std::uint32_t node, const unit_definition& unit, std::string_view where,
                       const compact_dimension* partner = nullptr);
    std::string reference_temperature() const;
    static bool pair_number_with_reading(const reference_state_pairs::number& number,
                                         reference_state_pairs::reading& reading,
                                         typed_term& result);
    [[gnu::noinline]] bool read_gauge_plus_atmosphere(const reference_state_pairs::number& number,
                                                      reference_state_pairs::reading& reading,
                                                      typed_term& result);
    void read_reference_states(reference_state_pairs& pairs, typed_term& result);
    bool pressure_scaled_by_shape(std::uint32_t product, bool with_gauge,
                                  bool* geometric = nullptr) const;
    bool holds_gauge(std::uint32_t node) const;
    bool gauge_over_modulus(std::uint32_t product) const;

    // One term of a product expanded into a sum: a number times declared symbols.
    struct expanded_term {
        double coefficient = 1.0;
        std::array<std::uint32_t, 6> symbols{};
        std::size_t count = 0;
    };
    static constexpr std::size_t most_expanded_terms = 16;
    using expansion = std::vector<expanded_term>;

    // check/formula/fits_on_scales.cpp
    std::optional<typed_term> eval_reading_from_inferred_zero(std::uint32_t index);
    bool expand(std::uint32_t i, expansion& out) const;
    static void sort_names(std::array<std::string_view, 6>& names, std::size_t size);
    typed_term expanded_factor_type(const syntax::expr_node& factor);
    static bool joins_readings(std::optional<typed_term>& readings, const typed_term& s);
    static bool half_converted(const typed_term& t);
    [[gnu::noinline]] static bool
    settle_half_conversion(typed_term& result, const typed_term* factor, std::byte* evaluated);
    bool from_inferred_zero_of_resistance(std::uint32_t node, bool numbers_only = false) const;
    bool reference_rise_from_inferred_zero(std::uint32_t numerator,
                                           std::uint32_t denominator) const;
    bool number_beside_one_cell(std::uint32_t node) const;
    [[gnu::noinline]] void settle_percent_divisor(typed_term& result, const typed_term& factor,
                                                  const syntax::expr_node& op);
    std::optional<std::pair<std::uint32_t, std::uint32_t>>
    number_beside_symbol(std::uint32_t k, bool cells = false) const;
    std::optional<double> gauge_reading_unit(std::uint32_t node) const;
    [[gnu::noinline]] void note_bare_fit_on_scale(std::uint32_t denominator);
    bool holds_symbol_in_unit(std::uint32_t node,
                              std::initializer_list<std::string_view> parts) const;
    bool in_circular_mils(std::uint32_t node) const;
    [[gnu::noinline]] bool oxygen_share_of_air(std::uint32_t k) const;
    std::uint32_t number_leading_sum(std::uint32_t k, bool numbers_only) const;
    [[gnu::noinline]] bool report_oxygen_correction_upside_down(std::uint32_t numerator,
                                                                std::uint32_t denominator);
    [[gnu::noinline]] bool carries_number_of_sum(std::uint32_t numerator,
                                                 std::uint32_t denominator) const;
    [[gnu::noinline]] bool same_number_over_its_sum(std::uint32_t numerator,
                                                    std::uint32_t denominator) const;
    [[gnu::noinline]] bool fitted_on_scale(std::uint32_t numerator, std::uint32_t denominator,
                                           const typed_term& top, const typed_term& below) const;
    [[gnu::noinline]] void report_celsius_fit_beside_kelvins(std::uint32_t denominator);
    [[gnu::noinline]] void report_celsius_fit_on_other_scale(std::uint32_t denominator,
                                                             const unit_definition& scale);
    [[gnu::noinline]] void report_reference_on_other_scale(std::uint32_t difference);
    bool empirical_over_reading(std::uint32_t numerator, const typed_term& below) const;
    bool holds_specific_energy_term(std::uint32_t root) const;
    [[gnu::noinline]] void note_enthalpy_side(const operand& first, std::uint32_t root);
    bool names_specific_enthalpy(const operand& side) const;
    bool enthalpy_above_ice_point(std::uint32_t reading_node, const typed_term& reading,
                                  const typed_term& by);
    static void read_as_rise(typed_term& t);
    bool reading_from_ice_point_reference(std::uint32_t reading_node);
    static bool described_at_ice_point(std::string_view description);

    // check/formula/means.cpp
    [[gnu::noinline]] std::optional<typed_term> weighted_mean(std::uint32_t index);
    [[gnu::noinline]] std::optional<typed_term> sheet_weighted_mean(std::uint32_t index);
    [[gnu::noinline]] typed_term eval_mix_or_sum(std::uint32_t index);
    bool mixing_shape(const syntax::expr_node& n) const;
    bool one_less_weights(const syntax::expr_node& group) const;
    [[gnu::noinline]] std::optional<typed_term> mixing_mean(std::uint32_t index);

    // ---- Spreadsheet operands and functions ----------------------------------------------

    // check/formula/function_arguments.cpp
    diagnostic* report_units_not_cancelling(const operand& a, std::string_view what);
    bool holds_scaled_ratio_unit(std::uint32_t k) const;
    bool holds_percentage(std::uint32_t k) const;
    std::optional<double> dimensionless_unit_size(std::uint32_t at) const;
    bool conversion_folded_with_coefficient(const operand& a, const scaled_operand& part);
    static bool takes_an_angle(std::string_view name);
    bool report_angle_conversion_in_argument(const builtin_function& f, const operand& a);
    bool angle_written_in_degrees(const operand& a) const;
    void report_degrees_taken_as_radians(const builtin_function& f, const operand& a);
    void require_unit_free(const builtin_function& f, const operand& a);
    bool require_dimensionless(const builtin_function& f, const operand& a);
    bool reference_value_typed_in_cell_unit(const builtin_function& f, const operand& a);

    // check/formula/evaluate.cpp
    std::string quote(std::uint32_t node) const;
    diagnostic& report(std::string_view rule, std::string message, span where);
    double unit_as_written(const typed_term& t) const;
    [[gnu::noinline]] typed_term eval_quantity(const syntax::expr_node& n) const;
    static typed_term number_type(const number_reading& reading);
    [[gnu::noinline]] typed_term eval_number(const syntax::expr_node& n, std::uint32_t index);
    [[gnu::noinline]] typed_term eval_symbol(const syntax::expr_node& n);
    [[gnu::noinline]] typed_term first_use_type(symbol_entry* entry, std::string_view name);
    [[gnu::noinline, gnu::cold]] typed_term report_undeclared(const syntax::expr_node& n,
                                                              std::string_view name);
    static typed_term declared_type(symbol_entry* entry, std::string_view name);
    typed_term eval_sum(std::uint32_t index);
    [[gnu::noinline]] void factor_out_common_numbers_of(std::span<const operand> terms);
    [[gnu::noinline]] typed_term eval_product(std::uint32_t index);
    void read_ratio_of_whole_numbers(std::uint32_t literals_begin);
    void read_angle_over_right_angles(typed_term& t, std::uint32_t literals_begin,
                                      std::uint32_t index);
    // In line in eval_product, its one caller, as it was before the rules left its file.
    [[gnu::always_inline]] inline typed_term eval_factors(std::uint32_t index);
    static double unit_power(double scale, double exponent);
    typed_term apply_power(const typed_term& base, const typed_term& exponent,
                           std::uint32_t base_node, std::uint32_t exponent_node);
    static bool counts_degrees_above_a_reference(const typed_term& base,
                                                 const typed_term& exponent);
    typed_term temperature_correction(const typed_term& base, const typed_term& exponent,
                                      std::uint32_t exponent_node);
    double reference_subtracted(std::uint32_t node) const;
    static std::optional<rational> exact_power(const std::optional<rational>& base,
                                               const std::optional<rational>& exponent);
    span call_name_range(const syntax::expr_node& n) const;
    typed_term eval_call(const syntax::expr_node& n);
    [[gnu::noinline]] typed_term eval_reference(const syntax::expr_node& n) const;
    static bool is_bare_number(const typed_term& t);
    std::span<const operand> with_bare_numbers_in_their_unit(std::span<const operand> values,
                                                             std::vector<operand>& kept) const;
    [[gnu::noinline]] typed_term eval_compare(const syntax::expr_node& n);
    typed_term agreeing(const builtin_function& f, std::span<const operand> args, std::size_t first,
                        std::string_view others);
    typed_term eval_sheet_call(const builtin_function& f, std::span<const operand> args);
    typed_term derivative(std::span<const operand> args);
    typed_term integral(std::span<const operand> args);
};

} // namespace plumb::formula_check
