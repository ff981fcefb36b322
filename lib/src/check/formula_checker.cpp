// Gives every subexpression a dimension and applies the rules where dimensions meet: the
// terms of a sum, the sides of a formula, function arguments and exponents.
#include "check/formula_checker.hpp"

#include "check/constant_in_other_units.hpp"
#include "check/edit_distance.hpp"
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

namespace plumb {
namespace {

using syntax::expr_kind;
using syntax::search_step;

typed_term unknown_type(bool inferred = false) {
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
const std::vector<offset_row>& offset_rows() {
    static const std::vector<offset_row> rows = [] {
        std::vector<offset_row> out;
        for (const auto& u : unit_table::standard().units())
            if (u.scale != unit_scale::absolute)
                out.push_back({&u, compact_dimension(u.dim())});
        return out;
    }();
    return rows;
}

// The absolute unit a gauge unit reads in (psi for psig, kPa for kPag); the symbol itself for
// any other unit.
std::string absolute_symbol(const unit_definition& unit) {
    std::string symbol(unit.symbol);
    if (unit.scale == unit_scale::gauge && symbol.size() > 1 && symbol.back() == 'g')
        symbol.pop_back();
    return symbol;
}

std::string describe(const dimension& d) {
    const std::string_view name = quantity_name(d);
    if (name.empty() || d.is_dimensionless())
        return d.is_dimensionless() ? std::string("[1] (dimensionless)") : d.to_string();
    return fmt::format("{} ({})", d.to_string(), name);
}
std::string describe(const compact_dimension& d) {
    return describe(d.expand());
}

// The pressure units calcs write the atmosphere in, for naming the one a bare number was
// written in (NIST SP 811 (2008), B.8), and the standard atmosphere itself, 101325 Pa (SI
// Brochure 9th ed., Table 8).
struct pressure_unit {
    std::string_view name;
    double pascals;
};
constexpr std::array<pressure_unit, 7> pressure_units{{
    {"Pa", 1.0},
    {"kPa", 1e3},
    {"MPa", 1e6},
    {"bar", 1e5},
    {"psi", 6894.757293168361},
    {"mmHg", 133.322387415},
    {"inHg", 3386.388640341},
}};
constexpr double standard_atmosphere = 101325.0;
// How far two reference temperatures may differ and still count as one: 15 °C against 60 °F,
// and the gas trade's 14.73 psia beside 14.696, are 0.2 % apart (from memory).
constexpr double reference_temperature_slack = 0.003;
// The atmosphere at the highest sites plants are built on, about 5200 m (mines in the Andes,
// observatories), as a share of the standard atmosphere: h = 44330.8·(1 - 0.52^0.190263) m in
// the standard atmosphere's barometric formula (from memory).
constexpr double highest_site_atmosphere = 0.52;
// How an actual gas volume becomes one at reference conditions (ideal gas, common practice).
constexpr std::string_view state_correction_advice =
    "an actual volume becomes a normal one times (p/p_n)*(T_n/T), with absolute pressures and "
    "temperatures (p_n = 101.325 kPa; T_n = 273.15 K for Nm\u00B3, 288.15 K for Sm\u00B3)";

// A number the trades write in place of a conversion (8.34, water's weight per gallon): where
// the units agree without it, it is as much a factor not needed as a conversion would be
// (the pounds formula pasted into a sheet whose ML/d × mg/L is already kg/d).
bool stands_for_a_conversion(const scale_literal& l, bool allow_hundred) {
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
bool is_three_digit_conversion_of(double value, double tolerance, const compact_dimension& d) {
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
std::optional<rational> weight_of(const typed_term& t) {
    if (t.weight_denominator == 0)
        return std::nullopt;
    if (t.weight_denominator == 1) // nearly every reading: whole, with no gcd to take
        return rational(t.weight_numerator);
    return rational(t.weight_numerator, t.weight_denominator);
}

void set_weight(typed_term& t, const std::optional<rational>& w) {
    if (!w || w->num() < -127 || w->num() > 127 || w->den() > 255) {
        t.weight_denominator = 0;
        return;
    }
    t.weight_numerator = static_cast<std::int8_t>(w->num());
    t.weight_denominator = static_cast<std::uint8_t>(w->den());
    if (*w == rational(1))
        t.weighted_sum = false; // (T_1 + T_2)/2: a reading again
}

void scale_weight(typed_term& t, const rational& by) {
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
[[gnu::noinline]] agreement find_agreement_in_full(std::span<const operand> ops,
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

scratch_stacks& scratch() {
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

    [[gnu::noinline]] typed_term eval_pi(std::uint32_t index) {
        typed_term t;
        t.numeric = true;
        scale_literal l;
        l.value = 3.14159265358979323846;
        l.tolerance = 1e-12;
        l.node = index;
        literals_.push_back(l);
        return t;
    }

    [[gnu::noinline]] typed_term eval_negate(const syntax::expr_node& n) {
        typed_term t = eval(n.lhs);
        if (t.value)
            t.value = -*t.value;
        return t;
    }

    [[gnu::noinline]] typed_term eval_power(const syntax::expr_node& n) {
        const typed_term* kept = kept_symbol_type(n.lhs); // V^2: most bases are symbols
        typed_term base = kept != nullptr ? *kept : eval(n.lhs);
        if (kept != nullptr)
            base.literal_begin = static_cast<std::uint32_t>(literals_.size());
        const syntax::expr_node& e = file_.nodes[n.rhs];
        if (e.kind == expr_kind::number) {
            // V^2: the exponent's own number is no factor of the power, and apply_power would
            // only drop it from the literal stack again, so it is read without going there.
            typed_term exponent = number_type(read_number(text(e.range)));
            exponent.literal_begin = static_cast<std::uint32_t>(literals_.size());
            return apply_power(base, exponent, n.lhs, n.rhs);
        }
        const typed_term exponent = eval(n.rhs);
        return apply_power(base, exponent, n.lhs, n.rhs);
    }

    // A product of one force above the line and lengths or areas below it, with numbers:
    // a load over the area it acts on (F/A), no reading.
    bool force_over_area(std::uint32_t k) const {
        int forces = 0;
        bool other = false;
        for_each_factor(k, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::number || n.kind == expr_kind::pi)
                return false;
            std::optional<compact_dimension> dim;
            if (n.kind == expr_kind::symbol) {
                if (const symbol_entry* e = symbols_.find(text(n.range)); e != nullptr)
                    dim = e->compact_dim;
            } else if (n.kind == expr_kind::power && file_.nodes[n.lhs].kind == expr_kind::symbol &&
                       sign < 0) {
                if (const symbol_entry* e = symbols_.find(text(file_.nodes[n.lhs].range));
                    e != nullptr && e->compact_dim && *e->compact_dim == length_dimension())
                    return false; // D^2 below
            }
            if (dim && *dim == force_dimension() && sign > 0)
                ++forces;
            else if (!(dim && sign < 0 && (*dim == length_dimension() || *dim == area_dimension())))
                other = true;
            return other;
        });
        return !other && forces == 1;
    }

    // A product of one pressure gradient (psi/ft, kPa/m) and one length, with numbers.
    bool gradient_times_depth(std::uint32_t k) const {
        int gradients = 0;
        int lengths = 0;
        const bool other = for_each_factor(k, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::number)
                return false;
            const symbol_entry* e =
                n.kind == expr_kind::symbol ? symbols_.find(text(n.range)) : nullptr;
            if (sign < 0 || e == nullptr || !e->compact_dim)
                return true;
            if (*e->compact_dim == pressure_gradient_dim)
                ++gradients;
            else if (*e->compact_dim == length_dimension())
                ++lengths;
            else
                return true;
            return false;
        });
        return !other && gradients == 1 && lengths == 1;
    }

    // Whether a product has a symbol or a cell of the given dimension standing with `sign`
    // (+1 above the line, -1 below it, 0 either).
    bool has_factor_of_dimension(std::uint32_t k, const compact_dimension& wanted, int sign) const {
        return for_each_factor(k, [&](std::uint32_t at, int stands) {
            if (sign != 0 && stands != sign)
                return false;
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::symbol) {
                const symbol_entry* e = symbols_.find(text(n.range));
                return e != nullptr && e->compact_dim && *e->compact_dim == wanted;
            }
            if (n.kind == expr_kind::reference) {
                const syntax::reference_value& r = file_.references[n.lhs];
                return r.dim && compact_dimension::fitted(*r.dim) == std::optional(wanted);
            }
            return false;
        });
    }

    // A side that is a product of one bracketed sum and symbols or cells: the sum's unit is
    // the other side's over theirs, which says which of its terms is off. The scale that
    // leaves for the sum at `sum`, if `root` is such a product.
    std::optional<double> scale_left_for_sum(std::uint32_t root, const typed_term& other,
                                             std::uint32_t sum) const {
        const expr_kind kind = file_.nodes[root].kind;
        if (!std::isfinite(other.scale) || !(other.scale > 0) ||
            (kind != expr_kind::multiply && kind != expr_kind::divide))
            return std::nullopt;
        bool found = false;
        double scale = other.scale;
        double sum_power = 1.0; // "ρ*A*(u_v - u_t)^2": the sum squared
        const bool other_factor = for_each_factor(root, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            if (at == sum && sign > 0) {
                found = true;
                return false;
            }
            if (n.kind == expr_kind::power && sign > 0 &&
                syntax::inside_brackets(file_, n.lhs) == sum &&
                file_.nodes[n.rhs].kind == expr_kind::number) {
                sum_power = written_number(file_.nodes[n.rhs].range);
                found = sum_power > 0 && std::isfinite(sum_power);
                return !found;
            }
            double factor = 0.0;
            if (n.kind == expr_kind::symbol) {
                if (const symbol_entry* e = symbols_.find(text(n.range));
                    e != nullptr && e->dim && e->offset_unit == nullptr)
                    factor = e->si_factor;
            } else if (n.kind == expr_kind::reference) {
                const syntax::reference_value& r = file_.references[n.lhs];
                if (r.dim && r.offset == nullptr)
                    factor = r.scale;
            }
            if (!(factor > 0) || !std::isfinite(factor))
                return true;
            scale = sign > 0 ? scale / factor : scale * factor;
            return false;
        });
        if (other_factor || !found || !std::isfinite(scale) || !(scale > 0))
            return std::nullopt;
        return sum_power == 1.0 ? scale : std::pow(scale, 1.0 / sum_power);
    }

    void check_formula(const syntax::formula& f) {
        current_ = &f;
        inner_scale_ratio_ = 0.0;
        const std::size_t base = operands_.size();
        const std::size_t types_base = types_.size();
        // Reserved once: a generated chain of many relations must not grow it by doubling.
        operands_.reserve(base + f.side_count);
        bool equation = true;
        for (std::uint32_t i = 0; i < f.side_count; ++i) {
            const syntax::formula_side& s = file_.sides[f.first_side + i];
            if (s.relation_before != syntax::relation_kind::none &&
                s.relation_before != syntax::relation_kind::equal)
                equation = false;
            // A sum on the right of "p_abs = 9.81*h + 101.325" may need the left side's unit to
            // read its numbers (read_column_and_atmosphere).
            if (i > 0 && operands_[base].type.known && operands_[base].type.literal_count == 0) {
                side_hint_ = &operands_[base].type; // on the type stack, which never moves
                side_hint_node_ = s.root;
            }
            if (i > 0 && operands_[base].type.dim == velocity_squared_dim) [[unlikely]]
                note_enthalpy_side(operands_[base], s.root);
            operands_.push_back({push_operand_type(s.root, types_base, f.side_count), s.root});
            side_hint_node_ = syntax::no_index;
            enthalpy_side_ = syntax::no_index;
        }
        const scratch_region region(operands_, base, types_, types_base);
        const std::span<const operand> sides = region.view();
        agreement a = find_agreement(sides);
        if (!a.odd.empty() && read_gravity_numbers_either_way(base, a))
            a = find_agreement(sides);
        const char* what = equation ? "equation" : "limit";
        if (a.odd.empty()) {
            // "40 <= OB <= 50" with OB in %: the bounds are percentages, as in a sum (but not
            // "η <= 1", a fraction's bound beside a percentage).
            if (!equation && sides[0].type.known && sides[0].type.dim.is_dimensionless() &&
                std::any_of(sides.begin(), sides.end(),
                            [](const operand& side) { return side.type.numeric; }))
                adopt_numbers_in_scaled_unit(base, true);
            double unit = 1.0;
            // Views of known length: from a const char* each formula paid for a strlen.
            const std::string_view sides_what = equation
                                                    ? std::string_view("sides of this equation")
                                                    : std::string_view("sides of this limit");
            // "T_K = T_F": where a side is a reading on a scale whose zero differs from the
            // other's, that is the finding; the degrees' size alone would advise a wrong fix.
            const bool on_offset_scale =
                std::any_of(sides.begin(), sides.end(), [](const operand& side) {
                    return side.type.known && side.type.offset != nullptr;
                });
            if (on_offset_scale) {
                const std::size_t findings_before = out_.size();
                check_origins(sides, what);
                if (out_.size() == findings_before)
                    check_scales(sides, sides_what, unit);
            } else if (const std::size_t findings_before = out_.size();
                       check_scales(sides, sides_what, unit)) {
                check_origins(sides, what);
                if ((symbols_.unit_marks() &
                     (counts_revolutions | at_reference_conditions | apparent_power)) != 0 &&
                    out_.size() == findings_before && equation)
                    ask_of_marked_units(f, sides);
                else if (file_.functions == syntax::function_names::spreadsheet &&
                         out_.size() == findings_before && equation && sides.size() == 2 &&
                         sides[0].type.known && sides[0].type.dim == power_dim) [[unlikely]]
                    report_apparent_as_real_power(sides);
                else if (file_.functions == syntax::function_names::spreadsheet &&
                         out_.size() == findings_before && equation && sides.size() == 2 &&
                         is_gas_volume_or_flow(sides[0].type.dim)) [[unlikely]]
                    // Not the actual-against-normal rule: sheets write "m³/d" for standard
                    // volumes as often as for actual ones.
                    report_reference_temperatures_left_out(sides);
                // A workbook's cells declare no units up front: the rotation rules are asked
                // of the formulas whose sides could hold them.
                if (file_.functions == syntax::function_names::spreadsheet && equation &&
                    sides.size() == 2 && sides[0].type.known && out_.size() == findings_before &&
                    (is_rotating_power_or_torque(sides[0].type.dim) ||
                     sides[0].type.dim == frequency_dim || sides[0].type.dim == velocity_dim))
                    [[unlikely]]
                    report_revolution_without_two_pi(f, sides[0].type.dim);
                if (equation && sides.size() == 2 && sides[0].type.dim == frequency_dim &&
                    out_.size() == findings_before) [[unlikely]]
                    report_angular_frequency_as_cycles(sides);
            }
            return;
        }
        if (file_.functions == syntax::function_names::spreadsheet && sides.size() == 2 &&
            fit_constant_carries_cell_unit(sides)) [[unlikely]]
            return;
        std::string message =
            sides.size() == 2 ? fmt::format("the two sides of this {} differ in dimension", what)
                              : fmt::format("the sides of this {} differ in dimension", what);
        diagnostic& d = report(rules::side_mismatch, std::move(message),
                               file_.nodes[sides[a.odd.front()].node].range);
        // A generated chain of thousands of relations is explained as a long sum is: the odd
        // sides up to a limit, a few of the others, and counts.
        constexpr std::size_t max_sides_listed = 16;
        if (sides.size() > max_sides_listed) {
            explain(d, sides, a, "sides");
            return;
        }
        std::vector<bool> is_odd(sides.size(), false);
        for (const std::size_t k : a.odd)
            is_odd[k] = true;
        for (std::size_t i = 0; i < sides.size(); ++i) {
            if (!sides[i].type.known)
                continue;
            add_term(d, sides[i], is_odd[i]);
            const char* position = sides.size() == 2 ? (i == 0 ? "left side " : "right side ") : "";
            d.notes.push_back({fmt::format("{}{} is {}", position, quote(sides[i].node),
                                           describe(sides[i].type.dim)),
                               {},
                               true});
        }
        note_bare_number_side(d, sides);
        if (!note_gravity_in_other_units(d, sides, a) &&
            !note_constant_for_other_units(d, sides, a))
            note_acceleration_or_density_apart(d, sides, a);
        note_bare_quantity_apart(d, sides, a);
        note_unit_read_past_a_slash(d);
        if ((symbols_.unit_marks() & mass_fractions) != 0) [[unlikely]]
            note_fraction_beside_concentration(d, sides);
        if ((symbols_.unit_marks() & tons) != 0 && sides.size() == 2 && sides[0].type.known &&
            sides[1].type.known) [[unlikely]]
            note_ton_beside_power(d, sides);
    }

    // "c_c : $/TR·h", "k : W/m·K": a product after a slash, which reads left to right as
    // ($/TR)·h (NIST SP 811 (2008), 6.1.6, asks for parentheses); a mismatch in a formula that
    // uses such a symbol says how it was read.
    [[gnu::noinline]] void note_unit_read_past_a_slash(diagnostic& d) const {
        std::string named;
        visit_nodes([&](const syntax::expr_node& n) {
            if (n.kind != expr_kind::symbol || !named.empty())
                return;
            const symbol_entry* e = symbols_.find(text(n.range));
            if (e == nullptr)
                return;
            const std::string_view unit = e->unit_text;
            const std::size_t slash = unit.find('/');
            if (slash == std::string_view::npos || unit.find('(', slash) != std::string_view::npos)
                return;
            // The first multiplication after the slash: "*", a space or "·".
            std::size_t product = std::string_view::npos;
            std::size_t mark_size = 1;
            for (const std::string_view mark : {"*", " ", "\u00B7"})
                if (const std::size_t at = unit.find(mark, slash); at < product) {
                    product = at;
                    mark_size = mark.size();
                }
            if (product == std::string_view::npos)
                return;
            named = fmt::format(
                "'{}' is declared in {}, which reads left to right as ({})\u00B7{}: "
                "if all of it after the slash is below the line, write {}({})",
                text(n.range), unit, unit.substr(0, product), unit.substr(product + mark_size),
                unit.substr(0, slash + 1), unit.substr(slash + 1));
        });
        if (!named.empty())
            d.notes.push_back({std::move(named), {}});
    }

    // "E_c : ton*h" beside kWh: the short ton where a ton of refrigeration was meant.
    [[gnu::noinline]] void note_ton_beside_power(diagnostic& d, std::span<const operand> sides) {
        dimension apart;
        try {
            apart = (sides[0].type.dim / sides[1].type.dim).expand();
        } catch (const std::exception&) {
            return;
        }
        for (const operand& side : sides) {
            bool noted = false;
            for_each_factor(side.node, [&](std::uint32_t at, int) {
                const syntax::expr_node& n = file_.nodes[at];
                if (n.kind != expr_kind::symbol)
                    return false;
                const symbol_entry* e = symbols_.find(text(n.range));
                if (e == nullptr)
                    return false;
                if (auto note = ton_of_refrigeration_note(e->unit_text, apart)) {
                    d.notes.push_back({std::move(*note), {}});
                    noted = true;
                }
                return noted;
            });
            if (noted)
                return;
        }
    }

    // "=0.61094*EXP(17.625*C4/(C4+243.04))" beside kPa (the Magnus fit of saturation
    // pressure): a workbook's numbers carry no units, so a number times a function of
    // dimensionless arguments is an empirical fit whose constant is in the cell's unit. Read
    // so, with a note; in the notation the constant is written with its unit.
    [[gnu::noinline]] bool fit_constant_carries_cell_unit(std::span<const operand> sides) {
        const operand& formula = sides[1];
        if (!formula.type.known || !sides[0].type.known || sides[0].type.offset != nullptr ||
            formula.type.offset != nullptr)
            return false;
        std::uint32_t constant = syntax::no_index;
        bool function = false;
        bool fractional_power = false;
        bool flow_power = false;     // Hazen-Williams' 1.85 or 1.852 on the flow
        bool diameter_power = false; // and its 4.87 on the bore
        const bool other = for_each_factor(formula.node, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::number && sign > 0 && constant == syntax::no_index) {
                constant = at;
                return false;
            }
            if (n.kind == expr_kind::call) {
                function = true;
                return false;
            }
            // "=0.0195*C12^0.77*C13^-0.385" (Kirpich's time of concentration): a power law
            // fitted to data, its exponents not whole.
            if (n.kind == expr_kind::power) {
                std::uint32_t e = n.rhs;
                if (file_.nodes[e].kind == expr_kind::negate)
                    e = file_.nodes[e].lhs;
                if (file_.nodes[e].kind != expr_kind::number)
                    return true;
                const double v = written_number(file_.nodes[e].range);
                fractional_power = fractional_power || v != std::round(v);
                flow_power = flow_power || (v >= 1.85 && v <= 1.852);
                diameter_power = diameter_power || (v >= 4.86 && v <= 4.871);
                return false;
            }
            return n.kind != expr_kind::reference;
        });
        // A function's fit gives a pure number scaled by its constant; a power law, any
        // dimension, which its constant makes up.
        if (other || constant == syntax::no_index ||
            !(fractional_power || (function && formula.type.dim.is_dimensionless())))
            return false;
        std::string carries;
        try {
            carries = describe((sides[0].type.dim / formula.type.dim).expand());
        } catch (const std::exception&) {
            return false;
        }
        if (flow_power && diameter_power && report_hazen_williams_constant(sides, constant))
            return true;
        diagnostic& d = report(rules::trade_constant,
                               fmt::format("{} is read as an empirical fit's constant, carrying "
                                           "{} for the unit written for its cell",
                                           display_text(file_.nodes[constant].range), carries),
                               file_.nodes[constant].range);
        d.level = severity::note;
        d.notes.push_back({"the fit holds only with its inputs in the units it was made for", {}});
        return true;
    }

    // "=4.52*Q^1.85/(C^1.85*D^4.87)" in psi/ft with Q in gpm and D in inches (Hazen-Williams as
    // the fire-protection and water trades print it, from memory): the constant is 10.67 in SI
    // units for a head, and 10.67 times water's specific weight (9.76 to 9.81 kN/m³) for a
    // pressure. Restated for the cell's units it must land on one of them; a bore in mm where
    // the form takes inches lands far off, and the cell is then wrong, not a fit.
    bool report_hazen_williams_constant(std::span<const operand> sides, std::uint32_t constant) {
        // Every number of the formula counts: 6.05*10^5 and a 3.785 for gpm to L/min too.
        double written = 1.0;
        for (std::uint32_t k = 0; k < sides[1].type.literal_count; ++k) {
            const scale_literal& l = literals_[sides[1].type.literal_begin + k];
            written *= std::pow(l.value, l.exponent);
        }
        if (!(written > 0) || !std::isfinite(written) || !std::isfinite(sides[0].type.scale) ||
            !std::isfinite(sides[1].type.scale) || !(sides[1].type.scale > 0))
            return false;
        const double si = written * sides[0].type.scale / sides[1].type.scale;
        bool pressure = false;
        try {
            pressure = !sides[0].type.dim.expand().exponent(base_dimension::mass).is_zero();
        } catch (const std::exception&) {
            return false;
        }
        // Water's specific weight between 0 and 30 °C, in N/m³ (kg/L × 1000 × g_n).
        const double gamma_low = water_density_least().to_double() * 1000.0 * 9.80665;
        const double gamma_high = water_density_greatest().to_double() * 1000.0 * 9.80665;
        const double low = hazen_williams_si * (pressure ? gamma_low : 1.0);
        const double high = hazen_williams_si * (pressure ? gamma_high : 1.0);
        if (si >= low * 0.97 && si <= high * 1.03)
            return false;
        diagnostic& d = report(
            rules::unit_scale,
            fmt::format("{} restated for the units of the cell and its inputs is {:.4g} in SI "
                        "units, where Hazen-Williams' constant is 10.67 for a head{}: an input "
                        "is in a unit its form does not take",
                        display_text(file_.nodes[constant].range), si,
                        pressure ? ", 104,600 for a pressure in water" : ""),
            file_.nodes[sides[1].node].range);
        d.level = severity::warning;
        d.notes.push_back({"4.52 takes gpm and inches for psi/ft, 10.67 m³/s and metres for m/m, "
                           "6.05e5 L/min and mm for bar/m (the form's source names its units)",
                           {}});
        return true;
    }

    // Rules for units that the file declares (symbol_table::unit_marks), asked of an equation
    // whose sides agree.
    [[gnu::noinline]] void ask_of_marked_units(const syntax::formula& f,
                                               std::span<const operand> sides) {
        if (sides.size() != 2 || !sides[0].type.known)
            return;
        const std::uint8_t marks = symbols_.unit_marks();
        if ((marks & counts_revolutions) != 0 &&
            (is_rotating_power_or_torque(sides[0].type.dim) || sides[0].type.dim == frequency_dim ||
             sides[0].type.dim == velocity_dim))
            report_revolution_without_two_pi(f, sides[0].type.dim);
        else if ((marks & at_reference_conditions) != 0 &&
                 is_gas_volume_or_flow(sides[0].type.dim)) {
            const std::size_t findings_before = out_.size();
            report_actual_volume_as_normal(sides);
            if (out_.size() == findings_before)
                report_reference_temperatures_left_out(sides);
        } else if ((marks & at_reference_conditions) != 0) {
            for (const operand& side : sides)
                if (report_normal_measure_times_actual_volume(side) ||
                    (sides[0].type.dim == power_dim && report_power_from_normal_flow(side)) ||
                    (sides[0].type.dim == velocity_dim && report_velocity_from_normal_flow(side)) ||
                    report_reference_states_in_ratio(side))
                    break;
        }
        if ((marks & apparent_power) != 0 && sides[0].type.dim == power_dim)
            report_apparent_as_real_power(sides);
        else if ((marks & apparent_power) != 0)
            for (const operand& side : sides)
                if (report_energy_over_apparent_power(side))
                    break;
    }

    // "f_1 = sqrt(k/M)" with f_1 in Hz: √(k/m) and √(g/δ) are angular frequencies, in rad/s,
    // and a frequency in cycles is that over 2π (f = √(k/m)/(2π), Chopra, Dynamics of
    // Structures, ch. 2, from memory). The units cannot say so, as a radian is 1. Asked where
    // one side is a symbol in Hz and the other a square root with no number beside it.
    [[gnu::noinline]] void report_angular_frequency_as_cycles(std::span<const operand> sides) {
        for (std::size_t i = 0; i < 2; ++i) {
            const std::uint32_t cycles = syntax::inside_brackets(file_, sides[i].node);
            const std::uint32_t root = syntax::inside_brackets(file_, sides[1 - i].node);
            const syntax::expr_node& c = file_.nodes[cycles];
            const syntax::expr_node& r = file_.nodes[root];
            if (c.kind != expr_kind::symbol || r.kind != expr_kind::call)
                continue;
            const symbol_entry* e = symbols_.find(text(c.range));
            if (e == nullptr || e->unit_text.find("Hz") == std::string_view::npos ||
                text(call_name_range(r)) != "sqrt")
                continue;
            // sqrt(f_1*f_2), a mean of two frequencies, is in cycles already.
            const bool frequencies_inside =
                syntax::search_subtree(file_, root, [&](std::uint32_t, const syntax::expr_node& n) {
                    if (n.kind != expr_kind::symbol)
                        return search_step::descend;
                    const symbol_entry* inner = symbols_.find(text(n.range));
                    return inner != nullptr && inner->compact_dim &&
                                   *inner->compact_dim == frequency_dim
                               ? search_step::found
                               : search_step::skip;
                });
            if (frequencies_inside)
                continue;
            diagnostic& d = report(
                rules::unit_scale,
                fmt::format("{} is in cycles per second ({}), but {} is an angular frequency, "
                            "in radians per second: a cycle is 2\u03C0 radians, so as written "
                            "it is 6.28319 times too high",
                            quote(cycles), e->unit_text, quote(root)),
                file_.nodes[root].range);
            d.level = severity::warning;
            d.notes.push_back({fmt::format("write {}/(2*pi), or declare {} in rad/s as \u03C9",
                                           display_text(r.range), text(c.range)),
                               {}});
            return;
        }
    }

    // "t = 60*E_bat/S_ups" with E in kWh and S in kVA: a battery's or a tank's energy lasts
    // as long as the real power drawn from it, the apparent power times the power factor
    // (and over the inverter's efficiency; IEEE 1184, from memory). Asked of a product that
    // divides an energy by an apparent power with no power factor beside it.
    bool report_energy_over_apparent_power(const operand& side) {
        std::uint32_t energy = syntax::no_index;
        std::uint32_t apparent = syntax::no_index;
        bool factor_beside = false;
        for_each_factor(side.node, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind != expr_kind::symbol)
                return false;
            const std::string_view name = text(n.range);
            const symbol_entry* e = symbols_.find(name);
            if (e == nullptr || !e->compact_dim)
                return false;
            if ((unit_marks_of(e->unit_text) & apparent_power) != 0 && sign < 0)
                apparent = at;
            else if (*e->compact_dim == energy_dim && sign > 0 &&
                     (e->unit_text.find("Wh") != std::string_view::npos ||
                      e->unit_text.find('J') != std::string_view::npos))
                energy = at;
            else if (e->compact_dim->is_dimensionless() && names_power_factor(name))
                factor_beside = true;
            return false;
        });
        if (energy == syntax::no_index || apparent == syntax::no_index || factor_beside)
            return false;
        const symbol_entry& s = *symbols_.find(text(file_.nodes[apparent].range));
        diagnostic& d = report(
            rules::unit_scale,
            fmt::format("{} is an apparent power ({}): {} lasts as long as the real power drawn "
                        "from it, which is the apparent power times the power factor, and this "
                        "formula leaves the power factor out",
                        quote(apparent), s.unit_text, quote(energy)),
            file_.nodes[side.node].range);
        d.level = severity::warning;
        d.notes.push_back({"divide by the real power, S*pf (and over the inverter's or the "
                           "drive's efficiency where there is one)",
                           {}});
        return true;
    }

    // A power factor or an efficiency by its name: pf, cosφ, η. Not by a description, which
    // "pf, DoD : 1 "power factor, depth of discharge"" shares between two names.
    static bool names_power_factor(std::string_view name) {
        for (const std::string_view part : {"pf", "PF", "cos", "\u03B7", "eta", "eff"})
            if (name.find(part) != std::string_view::npos)
                return true;
        return false;
    }

    // "P_e = S" with S in kVA and P_e in kW: apparent power is the real power over the power
    // factor; the units alone cannot say so, as both are watts to the dimension.
    // A workbook's cells count as symbols here: "=C11" under kW with C11 in kVA.
    [[gnu::noinline]] void report_apparent_as_real_power(std::span<const operand> sides) {
        const std::uint32_t left = sole_symbol_times_conversions(sides[0].node, true);
        const std::uint32_t right = sole_symbol_times_conversions(sides[1].node, true);
        if (left == syntax::no_index || right == syntax::no_index)
            return;
        const std::optional<std::string_view> a = declared_unit_text(left);
        const std::optional<std::string_view> b = declared_unit_text(right);
        if (!a || !b)
            return;
        const bool a_apparent = (unit_marks_of(*a) & apparent_power) != 0;
        const bool b_apparent = (unit_marks_of(*b) & apparent_power) != 0;
        if (a_apparent == b_apparent)
            return;
        const std::uint32_t apparent_node = a_apparent ? left : right;
        const std::uint32_t real_node = a_apparent ? right : left;
        const std::string_view apparent = a_apparent ? *a : *b;
        const std::string_view real = a_apparent ? *b : *a;
        if (real.find('W') == std::string_view::npos)
            return;
        diagnostic& d = report(
            rules::unit_scale,
            fmt::format("'{}' is an apparent power ({}) and '{}' a real power ({}): they differ by "
                        "the power factor, which this formula leaves out",
                        text(file_.nodes[apparent_node].range), apparent,
                        text(file_.nodes[real_node].range), real),
            file_.nodes[sides[1].node].range);
        d.level = severity::warning;
        d.notes.push_back({"real power is the apparent power times the power factor, P = S*pf "
                           "(and S = sqrt(3)*V*I for three phases)",
                           {}});
    }

    static bool is_gas_volume_or_flow(const compact_dimension& dim) {
        return dim == volume_dim || dim == volume_flow_dim;
    }

    // The unit a symbol is declared in, or a workbook cell's written unit.
    std::optional<std::string_view> declared_unit_text(std::uint32_t at) const {
        const syntax::expr_node& n = file_.nodes[at];
        if (n.kind == expr_kind::symbol) {
            const symbol_entry* e = symbols_.find(text(n.range));
            return e != nullptr ? std::optional(e->unit_text) : std::nullopt;
        }
        if (n.kind == expr_kind::reference && !file_.references[n.lhs].unit_text.empty())
            return file_.references[n.lhs].unit_text;
        return std::nullopt;
    }

    // The one symbol of a product of it and numbers that only convert units, else no_index;
    // with `cells_too`, a workbook's cell counts as a symbol.
    std::uint32_t sole_symbol_times_conversions(std::uint32_t k, bool cells_too = false) const {
        std::uint32_t found = syntax::no_index;
        const bool other = for_each_factor(k, [&](std::uint32_t at, int) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::symbol || (cells_too && n.kind == expr_kind::reference)) {
                const bool second = found != syntax::no_index;
                found = at;
                return second;
            }
            // Conversions only: 600 (LNG's expansion) or 0.95 could be the correction itself.
            return n.kind != expr_kind::number || !plain_conversion_number(at);
        });
        return other ? syntax::no_index : found;
    }

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

    // "Q_s : scfm "exhaust, standard at 68 °F"": a gas volume whose description states a
    // reference temperature other than its unit's usual one (the US EPA's standard cubic foot
    // at 68 °F, 40 CFR 60.2, from memory, beside the gas trade's 60 °F): the stated one rules.
    // Read from the first temperature written in °C or °F between -10 and 40 °C.
    static std::optional<reference_volume> stated_reference_volume(const symbol_entry& e) {
        std::optional<reference_volume> v = reference_volume_in(e.unit_text);
        const std::string_view d = e.description;
        if (!v || d.empty())
            return v;
        const auto digit = [](char c) { return c >= '0' && c <= '9'; };
        for (std::size_t at = 0; at < d.size(); ++at) {
            if (!digit(d[at]) || (at > 0 && (digit(d[at - 1]) || d[at - 1] == '.')))
                continue;
            std::size_t end = at;
            while (end < d.size() && (digit(d[end]) || d[end] == '.'))
                ++end;
            std::size_t unit = end;
            while (unit < d.size() && d[unit] == ' ')
                ++unit;
            std::string_view rest = d.substr(unit);
            std::size_t mark = 0;
            if (rest.starts_with("\u00B0"))
                mark = 2;
            else if (rest.starts_with("deg "))
                mark = 4;
            if (rest.size() <= mark || (rest[mark] != 'C' && rest[mark] != 'F') ||
                (rest.size() > mark + 1 &&
                 std::isalpha(static_cast<unsigned char>(rest[mark + 1])) != 0))
                continue;
            const double value = std::strtod(std::string(d.substr(at, end - at)).c_str(), nullptr);
            const double kelvins =
                rest[mark] == 'C' ? value + 273.15 : (value + 459.67) * 5.0 / 9.0;
            if (kelvins < 263.15 || kelvins > 313.15)
                continue;
            v->kelvins = kelvins;
            v->name = d.substr(at, unit + mark + 1 - at);
            return v;
        }
        return v;
    }

    // The reference state every term of a short sum shares, as a term's power 1; empty where
    // one has none or another.
    std::optional<reference_volume> reference_volume_of_sum(std::uint32_t k) const {
        constexpr int most_terms = 8;
        std::optional<reference_volume> shared;
        int terms = 0;
        while (file_.nodes[k].kind == expr_kind::add ||
               file_.nodes[k].kind == expr_kind::subtract) {
            const std::optional<reference_volume> r = reference_volume_of(file_.nodes[k].rhs);
            if (!r || r->power != 1 || ++terms > most_terms ||
                (shared && shared->kelvins != r->kelvins))
                return std::nullopt;
            shared = r;
            k = file_.nodes[k].lhs;
        }
        const std::optional<reference_volume> first = reference_volume_of(k);
        if (!first || first->power != 1 || (shared && shared->kelvins != first->kelvins))
            return std::nullopt;
        reference_volume sum = *first;
        sum.numbers = 1.0;
        sum.rounding = 0.0;
        return sum;
    }

    // A product of symbols and numbers whose gas volumes at reference conditions all share one
    // reference temperature: that temperature, and the net power the volumes stand in.
    std::optional<reference_volume> reference_volume_of(std::uint32_t k) const {
        std::optional<reference_volume> found;
        double numbers = 1.0;
        double rounding = 0.0;
        bool other = false;
        for_each_factor(k, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            std::optional<reference_volume> r;
            if (n.kind == expr_kind::number) {
                const scale_literal& l = read_number(text(n.range)).literal;
                if (!(l.value > 0.0))
                    return other = true;
                numbers *= sign > 0 ? l.value : 1.0 / l.value;
                rounding += l.tolerance;
                return false;
            }
            if (n.kind == expr_kind::add || n.kind == expr_kind::subtract) {
                // "(V_a + V_n)/A": a sum of gas volumes at one reference state is at it too.
                r = reference_volume_of_sum(at);
                if (!r)
                    return other = true;
            } else if (n.kind == expr_kind::reference) {
                // A workbook's cell carries the reference state its unit text names.
                const syntax::reference_value& cell = file_.references[n.lhs];
                if (cell.reference_power == 0)
                    return false;
                r = reference_volume{cell.reference_kelvins, cell.reference_power,
                                     cell.reference_name};
            } else if (n.kind == expr_kind::symbol) {
                const symbol_entry* e = symbols_.find(text(n.range));
                if (e == nullptr || (unit_marks_of(e->unit_text) & at_reference_conditions) == 0)
                    return false;
                r = stated_reference_volume(*e);
            } else {
                return other = true;
            }
            if (!r || (found && found->kelvins != r->kelvins))
                return other = true;
            const int power = (found ? found->power : 0) + sign * r->power;
            found = *r;
            found->power = power;
            return false;
        });
        if (other || !found || found->power == 0)
            return std::nullopt;
        found->numbers = numbers;
        found->rounding = rounding;
        return found;
    }

    // "V_scf = 35.31*V_Nm3": the two sides agree as volumes, but a normal cubic metre is gas
    // at 0 °C and a standard cubic foot at 60 °F: the same gas fills 5.7 % more at 60 °F, which
    // a volume factor alone leaves out (1 Nm³ = 37.33 scf). Where the reference temperatures
    // differ by less than the base pressures' spread (15 °C and 60 °F: 0.2 %), nothing is said.
    [[gnu::noinline]] void report_reference_temperatures_left_out(std::span<const operand> sides) {
        const std::optional<reference_volume> a = reference_volume_of(sides[0].node);
        const std::optional<reference_volume> b = reference_volume_of(sides[1].node);
        if (!a || !b || a->power != b->power || std::abs(a->power) != 1 ||
            std::abs(a->kelvins / b->kelvins - 1.0) <= reference_temperature_slack)
            return;
        // The sides' values in SI per number written, every number counted: equal as volumes
        // is the slip; equal as amounts of gas (V_n = V_s*273.15/288.15) is the conversion.
        const double as_volumes =
            (sides[0].type.scale / a->numbers) / (sides[1].type.scale / b->numbers);
        const double rounding = a->rounding + b->rounding + 1e-9;
        if (!(std::abs(as_volumes - 1.0) <= rounding))
            return;
        diagnostic& d = report(
            rules::unit_scale,
            fmt::format("the sides agree as volumes, but {} is gas at {} and {} at {}: a volume "
                        "factor alone leaves out the reference temperatures, {} %",
                        quote(sides[0].node), a->name, quote(sides[1].node), b->name,
                        format_factor(std::round((std::max(a->kelvins, b->kelvins) /
                                                      std::min(a->kelvins, b->kelvins) -
                                                  1.0) *
                                                 1000.0) /
                                      10.0)),
            file_.nodes[sides[1].node].range);
        d.level = severity::warning;
        d.notes.push_back({"at one pressure, a gas volume at reference conditions scales with its "
                           "reference temperature: 1 Nm³ (0 °C) = 1.0549 Sm³ (15 °C) = 37.33 scf "
                           "(60 °F), all at 101.325 kPa",
                           {}});
    }

    // Whether two operands that disagree as volumes agree as amounts of gas, each volume at
    // its reference temperature, within the rounding of their numbers.
    bool reference_temperatures_reconcile(std::uint32_t odd_node, std::uint32_t reference_node,
                                          const scaled_operand& odd,
                                          const scaled_operand& reference) const {
        const std::optional<reference_volume> a = reference_volume_of(odd_node);
        const std::optional<reference_volume> b = reference_volume_of(reference_node);
        if (!a || !b || a->power != b->power || a->kelvins == b->kelvins)
            return false;
        const double rounding = reference_temperature_slack + a->rounding + b->rounding;
        // Each side's SI value per number written, every number counted. A volume at T_ref
        // holds 1/T_ref of gas per unit: the sides agree as amounts where the ratio of their
        // volume scales is the reference temperatures' ratio.
        const double ratio = (reference.scale / b->numbers) / (odd.scale / a->numbers);
        const double wanted = std::pow(b->kelvins / a->kelvins, a->power);
        return std::abs(ratio / wanted - 1.0) <= rounding;
    }

    // "Q_n = Q_act" with Q_n in Nm3/h and Q_act in m³/h: a normal or standard volume is the
    // gas's volume at the reference pressure and temperature, and the actual one needs
    // (p/p_n)·(T_n/T) to become it; the units alone cannot say so, as both are volumes.
    // Asked only where one side is a symbol at reference conditions and the other an actual
    // volume times numbers, with nothing that could correct it.
    [[gnu::noinline]] void report_actual_volume_as_normal(std::span<const operand> sides) {
        const auto symbol_of = [&](std::uint32_t k) -> const symbol_entry* {
            k = syntax::inside_brackets(file_, k);
            return file_.nodes[k].kind == expr_kind::symbol
                       ? symbols_.find(text(file_.nodes[k].range))
                       : nullptr;
        };
        for (std::size_t i = 0; i < 2; ++i) {
            const symbol_entry* normal = symbol_of(sides[i].node);
            if (normal == nullptr ||
                (unit_marks_of(normal->unit_text) & at_reference_conditions) == 0)
                continue;
            const std::uint32_t actual_node = sole_symbol_times_conversions(sides[1 - i].node);
            if (actual_node == syntax::no_index)
                return;
            const std::string_view actual_name = text(file_.nodes[actual_node].range);
            const symbol_entry* actual = symbols_.find(actual_name);
            if (actual == nullptr || actual->unit_text.empty() ||
                (unit_marks_of(actual->unit_text) & at_reference_conditions) != 0)
                return;
            // Free air is at the intake, some 15 to 35 °C: near a standard volume's 15 °C or
            // 60 °F, but 5 to 13 % from a normal one's 0 °C.
            const std::optional<reference_volume> reference = reference_volume_of(sides[i].node);
            if (describes_free_air(*actual) && reference && reference->kelvins >= 288.0) {
                diagnostic& d = report(
                    rules::trade_constant,
                    fmt::format("'{}' is free air, a volume at the compressor's intake, near the "
                                "atmosphere, and is read as one at {}'s reference conditions",
                                actual_name, normal->unit_text),
                    file_.nodes[sides[1 - i].node].range);
                d.level = severity::note;
                d.notes.push_back({"free air delivered is stated at the intake's pressure and "
                                   "temperature (ISO 1217, from memory), a few per cent from the "
                                   "reference state; correct it by (p/p_n)*(T_n/T) where that "
                                   "matters",
                                   {}});
                return;
            }
            diagnostic& d =
                report(rules::unit_scale,
                       fmt::format(
                           "'{}' is a volume of gas at its actual pressure and temperature ({}) "
                           "and {} one at reference conditions ({}): they differ by the gas's "
                           "state, which this formula does not correct for",
                           actual_name, actual->unit_text, quote(sides[i].node), normal->unit_text),
                       file_.nodes[sides[1 - i].node].range);
            d.level = severity::warning;
            d.notes.push_back({std::string(state_correction_advice), {}});
            return;
        }
        report_actual_product_as_normal(sides);
    }

    // "Q_cfm : cfm "air flow for the blower vendor, normal"": a volume in a plain unit that
    // its description puts at reference conditions.
    bool describes_reference_state(std::uint32_t node) const {
        node = syntax::inside_brackets(file_, node);
        if (file_.nodes[node].kind != expr_kind::symbol)
            return false;
        const symbol_entry* e = symbols_.find(text(file_.nodes[node].range));
        if (e == nullptr)
            return false;
        for (const std::string_view word : {"normal", "standard", "Normal", "Standard"})
            if (e->description.find(word) != std::string_view::npos)
                return true;
        return false;
    }

    // A volume described as free air ("l/min FAD", "free-air consumption"): the compressor
    // trade's air at the intake, which it converts to standard volumes by the unit alone.
    static bool describes_free_air(const symbol_entry& e) {
        std::string lower(e.description);
        for (char& c : lower)
            c = static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
        return e.description.find("FAD") != std::string_view::npos ||
               lower.find("free air") != std::string::npos ||
               lower.find("free-air") != std::string::npos;
    }

    // "ṁ = C_mg*Q_a*..." with C in mg/Sm³ and Q_a in acfm: a concentration per volume at
    // reference conditions times a volume at the gas's actual state counts the gas as if it
    // were at the reference state, some 5 to 15 % off at a blower's inlet. Asked where the
    // product holds nothing that could correct it: no pressure, no temperature, no number
    // but plain conversions.
    bool report_normal_measure_times_actual_volume(const operand& side) {
        const std::optional<reference_volume> normal = reference_volume_of(side.node);
        if (!normal || normal->power != -1)
            return false;
        std::uint32_t actual_node = syntax::no_index;
        std::uint32_t normal_node = syntax::no_index;
        const bool other = for_each_factor(side.node, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::number) {
                // A state correction is a number near 1 (0.95, 1.07); 453592 mg/lb is none.
                const double v = written_number(n.range);
                return !plain_conversion_number(at) && !(v >= 10.0 || (v > 0 && v <= 0.1));
            }
            if (n.kind != expr_kind::symbol)
                return true;
            const symbol_entry* e = symbols_.find(text(n.range));
            if (e == nullptr || !e->compact_dim || *e->compact_dim == pressure_dimension() ||
                *e->compact_dim == temperature_dimension())
                return true;
            if ((unit_marks_of(e->unit_text) & at_reference_conditions) != 0) {
                normal_node = at;
                return false;
            }
            if (sign > 0 && is_gas_volume_or_flow(*e->compact_dim) && names_actual_volume(*e))
                actual_node = at;
            return false;
        });
        if (other || actual_node == syntax::no_index || normal_node == syntax::no_index)
            return false;
        const symbol_entry& actual = *symbols_.find(text(file_.nodes[actual_node].range));
        diagnostic& d = report(
            rules::unit_scale,
            fmt::format("{} counts per volume at reference conditions ({}) and {} is a volume of "
                        "gas at its actual pressure and temperature ({}): their product takes "
                        "the actual volume as if it were at the reference state, which this "
                        "formula does not correct for",
                        quote(normal_node),
                        symbols_.find(text(file_.nodes[normal_node].range))->unit_text,
                        quote(actual_node), actual.unit_text),
            file_.nodes[side.node].range);
        d.level = severity::warning;
        d.notes.push_back({std::string(state_correction_advice), {}});
        return true;
    }

    // "P_f = V_n*Δp_f/(3600*1000*η_f)" with V_n in Nm³/h: a fan's or a blower's power is the
    // actual volume flow through it times its pressure rise (P = Q·Δp/η, common practice);
    // the normal flow leaves out the gas's state, some 2.5 times at a kiln's 350 °C exit.
    // Asked of a product of one normal flow and one pressure with no temperature or other
    // pressure beside them that could correct it.
    bool report_power_from_normal_flow(const operand& side) {
        const std::optional<reference_volume> normal = reference_volume_of(side.node);
        if (!normal || normal->power != 1)
            return false;
        std::uint32_t pressure = syntax::no_index;
        int pressures = 0;
        bool correction = false;
        std::uint32_t flow = syntax::no_index;
        for_each_factor(side.node, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            // p_n*V_n*ln(p_2/p_1): a compressor's isothermal work, its pressure at the flow's
            // own reference state; no fan's Q·Δp.
            if (n.kind == expr_kind::call || n.kind == expr_kind::power)
                correction = true;
            if (n.kind != expr_kind::symbol)
                return false;
            const symbol_entry* e = symbols_.find(text(n.range));
            if (e == nullptr || !e->compact_dim)
                return false;
            if ((unit_marks_of(e->unit_text) & at_reference_conditions) != 0)
                flow = at;
            else if (*e->compact_dim == pressure_dimension()) {
                if (names_atmosphere(at) || describes_reference_state(at))
                    correction = true;
                ++pressures;
                if (sign > 0)
                    pressure = at;
            } else if (*e->compact_dim == temperature_dimension())
                correction = true;
            return false;
        });
        if (pressures != 1 || pressure == syntax::no_index || correction ||
            flow == syntax::no_index)
            return false;
        diagnostic& d = report(
            rules::unit_scale,
            fmt::format("{} is a flow at reference conditions ({}), but a fan's or a compressor's "
                        "power is the actual volume flow through it times {}: this formula does "
                        "not correct for the gas's state",
                        quote(flow), normal->name, quote(pressure)),
            file_.nodes[side.node].range);
        d.level = severity::warning;
        d.notes.push_back({std::string(state_correction_advice), {}});
        return true;
    }

    // A volume the file says is at the gas's actual state: acfm, Am³, or "actual" in its
    // description.
    static bool names_actual_volume(const symbol_entry& e) {
        if (e.unit_text.find("acf") != std::string_view::npos ||
            e.unit_text.find("Am3") != std::string_view::npos ||
            e.unit_text.find("Am\u00B3") != std::string_view::npos)
            return true;
        // "wet flue gas at stack temperature and pressure", "at line conditions".
        for (const std::string_view words :
             {"actual", "temperature and pressure", "line conditions", "operating conditions",
              "flowing conditions", "stack conditions", "inlet conditions"})
            if (e.description.find(words) != std::string_view::npos)
                return true;
        return false;
    }

    // "Q_act = r_air*A_f" with r_air in Nm³/(m²·h) and Q_act in m³/h: the same where a side
    // is a product, as long as neither holds a pressure, a temperature or a number that could
    // correct for the gas's state.
    void report_actual_product_as_normal(std::span<const operand> sides) {
        const std::optional<reference_volume> a = reference_volume_of(sides[0].node);
        const std::optional<reference_volume> b = reference_volume_of(sides[1].node);
        if (a.has_value() == b.has_value() || !(a ? a->power == 1 : b->power == 1))
            return;
        const std::size_t normal = a ? 0 : 1;
        const std::size_t actual = 1 - normal;
        if (!only_volumes_and_conversions(sides[actual].node, true) ||
            !only_volumes_and_conversions(sides[normal].node, false) ||
            describes_reference_state(sides[actual].node))
            return;
        diagnostic& d = report(
            rules::unit_scale,
            fmt::format("{} is a volume of gas at its actual pressure and temperature and {} one "
                        "at reference conditions ({}): they differ by the gas's state, which this "
                        "formula does not correct for",
                        quote(sides[actual].node), quote(sides[normal].node), (a ? a : b)->name),
            file_.nodes[sides[1].node].range);
        d.level = severity::warning;
        d.notes.push_back({std::string(state_correction_advice), {}});
    }

    // A product of symbols with no pressure or temperature in them, and numbers that convert
    // units only; `volume`: one of the symbols is a volume or a flow declared in a unit.
    bool only_volumes_and_conversions(std::uint32_t k, bool volume) const {
        bool found_volume = !volume;
        const bool other = for_each_factor(k, [&](std::uint32_t at, int) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::number)
                return !plain_conversion_number(at) && could_correct_state(at);
            if (n.kind != expr_kind::symbol)
                return true;
            const symbol_entry* e = symbols_.find(text(n.range));
            if (e == nullptr || !e->compact_dim || e->unit_text.empty() ||
                *e->compact_dim == pressure_dimension() ||
                *e->compact_dim == temperature_dimension())
                return true;
            found_volume = found_volume || is_gas_volume_or_flow(*e->compact_dim);
            return false;
        });
        return !other && found_volume;
    }

    // A number that could be a correction for a gas's state, (p/p_n)·(T_n/T) folded into one:
    // between 0.7 and 1.43 (a plant from 3000 m up to a few bar, from -80 to 120 °C... taken
    // as it comes). 0.5886 m³/h to cfm, or 1.699, can be no such thing.
    bool could_correct_state(std::uint32_t at) const {
        const double v = written_number(file_.nodes[at].range);
        return v >= 0.7 && v <= 1.43;
    }

    // A number that only converts units: a power of ten, a time ratio, or a ratio of table
    // units (Q_cfm/35.31, ft³ to m³); never one that could be a correction (0.95, 273.15,
    // 600 for LNG's expansion).
    bool plain_conversion_number(std::uint32_t at) const {
        const double v = written_number(file_.nodes[at].range);
        if (!(v > 0))
            return false;
        const double decade = std::round(std::log10(v));
        if (std::abs(v / std::pow(10.0, decade) - 1.0) < 1e-12)
            return true;
        // A time ratio, also with a power of ten folded in: 0.06 is 60 min/h over 1000 L/m³,
        // 3.6 is 3600 s/h over 1000.
        for (const double time : {60.0, 3600.0, 24.0, 1440.0, 86400.0}) {
            // (Over a power of ten only: LNG's 600, 60 × 10, is a ratio of volumes.)
            const double tens = std::round(std::log10(v / time));
            if ((tens == 0.0 || tens <= -2.0) &&
                std::abs(v / (time * std::pow(10.0, tens)) - 1.0) < 1e-9)
                return true;
        }
        return looks_like_conversion(read_literal(text(file_.nodes[at].range), v, at), false);
    }

    // "t_fill = V_u/Q_cn*60" with V_u in Sm³ and Q_cn in Nm³/h: gas volumes at two reference
    // states in a ratio count a standard cubic metre as a normal one, 5.5 % apart (1 Nm³ =
    // 1.0549 Sm³, ISO 13443, from memory). Asked where the product holds one of each, above
    // and below, and no number but plain conversions.
    bool report_reference_states_in_ratio(const operand& side) {
        std::uint32_t above = syntax::no_index;
        std::uint32_t below = syntax::no_index;
        std::optional<reference_volume> top;
        std::optional<reference_volume> bottom;
        bool other = false;
        for_each_factor(side.node, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::number) {
                other = other || !plain_conversion_number(at);
                return false;
            }
            if (n.kind != expr_kind::symbol)
                return false;
            const symbol_entry* e = symbols_.find(text(n.range));
            if (e == nullptr || (unit_marks_of(e->unit_text) & at_reference_conditions) == 0) {
                other = other || (e != nullptr && e->compact_dim &&
                                  (*e->compact_dim == pressure_dimension() ||
                                   *e->compact_dim == temperature_dimension()));
                return false;
            }
            const std::optional<reference_volume> v = stated_reference_volume(*e);
            if (!v || std::abs(v->power) != 1)
                return other = true;
            const bool up = v->power * sign > 0;
            if ((up ? above : below) != syntax::no_index)
                return other = true;
            (up ? above : below) = at;
            (up ? top : bottom) = v;
            return false;
        });
        if (other || above == syntax::no_index || below == syntax::no_index ||
            std::abs(top->kelvins / bottom->kelvins - 1.0) <= reference_temperature_slack)
            return false;
        diagnostic& d = report(
            rules::unit_scale,
            fmt::format("{} is gas at {} and {} gas at {}: their ratio counts the one as the "
                        "other, {:.1f} % apart, which this formula does not correct for",
                        quote(above), top->name, quote(below), bottom->name,
                        std::abs(top->kelvins / bottom->kelvins - 1.0) * 100.0),
            file_.nodes[side.node].range);
        d.level = severity::warning;
        d.notes.push_back({"at one pressure a gas's volume follows its absolute temperature: 1 "
                           "Nm\u00B3 (0 \u00B0C) = 1.0549 Sm\u00B3 (15 \u00B0C) = 37.33 scf "
                           "(60 \u00B0F), all at 101.325 kPa",
                           {}});
        return true;
    }

    // "V_d = Q_n/(3600*A_d)" with Q_n in Nm³/h: a gas's velocity in a duct is its actual
    // volume flow over the area; the normal flow leaves out its state (2.3 times at a smelter's
    // 350 °C off-gas). Asked of a product of one flow at reference conditions over an area,
    // with no temperature or pressure beside them that could correct it.
    bool report_velocity_from_normal_flow(const operand& side) {
        std::optional<reference_volume> normal;
        std::uint32_t flow = syntax::no_index;
        bool correction = false;
        const bool circle = holds_pi(side.node);
        for_each_factor(side.node, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::number) {
                // The 4 of 4·Q/(π·D²) is the circle's.
                const double v = written_number(n.range);
                correction = correction ||
                             !(plain_conversion_number(at) || (circle && (v == 4.0 || v == 2.0)));
                return false;
            }
            // D^2, (D_mm/1000)^2: a power of a symbol, or of a symbol over a conversion, is
            // read as the symbol.
            std::uint32_t base = at;
            if (n.kind == expr_kind::power) {
                const std::uint32_t inner = syntax::inside_brackets(file_, n.lhs);
                const syntax::expr_node& in = file_.nodes[inner];
                if (in.kind == expr_kind::symbol)
                    base = inner;
                else if ((in.kind == expr_kind::divide || in.kind == expr_kind::multiply) &&
                         file_.nodes[in.lhs].kind == expr_kind::symbol &&
                         file_.nodes[in.rhs].kind == expr_kind::number &&
                         plain_conversion_number(in.rhs))
                    base = in.lhs;
            }
            // "(V_a + V_n)/(3600*A)": air and fuel gas in Nm³/h added, as if they were the
            // flue gas at its temperature.
            if (n.kind == expr_kind::add || n.kind == expr_kind::subtract) {
                const std::optional<reference_volume> v = reference_volume_of_sum(at);
                if (!v || sign != 1 || flow != syntax::no_index)
                    correction = true;
                flow = at;
                normal = v;
                return false;
            }
            if (file_.nodes[base].kind != expr_kind::symbol) {
                correction = correction || n.kind != expr_kind::pi;
                return false;
            }
            const symbol_entry* e = symbols_.find(text(file_.nodes[base].range));
            if (e == nullptr || !e->compact_dim)
                return false;
            if ((unit_marks_of(e->unit_text) & at_reference_conditions) != 0) {
                const std::optional<reference_volume> v = stated_reference_volume(*e);
                if (flow != syntax::no_index || base != at || !v || v->power * sign != 1)
                    correction = true; // two, or a volume at reference conditions below
                flow = at;
                normal = v;
            } else if (*e->compact_dim == pressure_dimension() ||
                       *e->compact_dim == temperature_dimension() ||
                       e->compact_dim->is_dimensionless())
                correction = true;
            return false;
        });
        if (correction || flow == syntax::no_index || !normal)
            return false;
        diagnostic& d = report(
            rules::unit_scale,
            fmt::format("{} is a flow at reference conditions ({}), but a gas's velocity is its "
                        "actual volume flow over the area: this formula does not correct for the "
                        "gas's state",
                        quote(flow), normal->name),
            file_.nodes[side.node].range);
        d.level = severity::warning;
        d.notes.push_back({std::string(state_correction_advice), {}});
        return true;
    }

    static bool is_rotating_power_or_torque(const compact_dimension& dim) {
        return dim == energy_dim || dim == power_dim;
    }

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

    // "M = 60000*P/n" with M in kN·m, P in kW and n in rpm: revolutions count as cycles, so
    // the units agree without the 2π radians of a revolution that P = 2π·n·M needs (ω = 2π·n),
    // and the torque comes out 2π times too large. Asked only of an equation that relates one
    // torque, one power and one speed in revolutions, with no π or 2π written in it.
    // The same holds where a speed in revolutions meets one in radians ("ω = n/60" with ω in
    // rad/s) or a moment of inertia in a kinetic energy ("E = 0.5*I*(n/60)^2"), and a speed
    // along a rim meets one in revolutions and a diameter (v = π·D·n).
    [[gnu::noinline]] void report_revolution_without_two_pi(const syntax::formula& f,
                                                            const compact_dimension& sides_dim) {
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
        const auto classify = [&](rotating_part part, const compact_dimension& dim,
                                  round_length round) {
            if ((unit_marks_of(part.unit) & counts_revolutions) != 0) {
                speed = part;
                ++speeds;
            } else if (dim == frequency_dim && part.unit.find("rad") != std::string_view::npos) {
                partner = part;
                ++angular_speeds;
            } else if (dim == moment_of_inertia_dim) {
                if (angular_speeds == 0)
                    partner = part;
                ++inertias;
            } else if (dim == energy_dim) {
                bool energy_unit_named = part.unit.empty();
                for (const std::string_view energy_unit :
                     {"J", "Wh", "Btu", "BTU", "cal", "erg", "eV", "therm"})
                    energy_unit_named =
                        energy_unit_named || part.unit.find(energy_unit) != std::string_view::npos;
                if (energy_unit_named) {
                    ++energies;
                } else {
                    torque = part;
                    ++torques;
                }
            } else if (dim == power_dim) {
                ++powers;
            } else if (dim == velocity_dim) {
                rim = part;
                ++rim_speeds;
            } else if (dim == length_dim) {
                length = part;
                length_round = round;
                ++lengths;
            }
        };
        // Found: a 2π written in the formula, or a term this rule cannot read.
        const std::uint32_t first_root = file_.sides[f.first_side].root;
        const bool not_for_this_rule =
            syntax::search_formula(file_, f, [&](std::uint32_t at, const syntax::expr_node& n) {
                switch (n.kind) {
                case expr_kind::pi:
                    return search_step::found;
                case expr_kind::number: {
                    // 2π, π or their inverses written as numbers (6.283, 3.1416, 0.159), and with a
                    // minute folded in (2π/60 = 0.1047 rad/s per rpm, 60/2π = 9.549).
                    const double v = written_number(n.range);
                    for (const double c :
                         {2.0 * std::numbers::pi, std::numbers::pi, 0.5 / std::numbers::pi,
                          1.0 / std::numbers::pi, std::numbers::pi / 30.0, 30.0 / std::numbers::pi})
                        if (std::abs(v / c - 1.0) < 0.003)
                            return search_step::found;
                    // Unit conversions of length and time (10^k, 12 in/ft, 60 s/min, and
                    // their products: 720, 60000) are no pitch count or stroke factor.
                    bool conversion = false;
                    for (const double clock : {1.0, 60.0, 1.0 / 60.0})
                        for (const double inches : {1.0, 12.0, 1.0 / 12.0}) {
                            const double rest = v / (clock * inches);
                            conversion = conversion || near_power_of_ten(rest, 1e-12) ||
                                         std::abs(rest - 1.0) < 1e-12;
                        }
                    if (!conversion)
                        ++other_numbers;
                    return search_step::skip;
                }
                case expr_kind::symbol: {
                    const std::string_view name = text(n.range);
                    const symbol_entry* e = symbols_.find(name);
                    if (e == nullptr || !e->compact_dim)
                        return search_step::found;
                    classify({name, e->unit_text}, *e->compact_dim,
                             names_a_diameter_or_radius(name, e->description));
                    return search_step::skip;
                }
                case expr_kind::reference: {
                    // A workbook's cell: its unit as written, and a length's row label.
                    const syntax::reference_value& r = file_.references[n.lhs];
                    const std::optional<compact_dimension> dim =
                        r.dim ? compact_dimension::fitted(*r.dim) : std::nullopt;
                    if (!dim)
                        return search_step::found;
                    // The cell written to stands first, named by its unit in the tree.
                    const bool written =
                        file_.functions == syntax::function_names::spreadsheet && at == first_root;
                    classify({written ? std::string_view() : text(n.range), r.unit_text}, *dim,
                             r.round);
                    return search_step::skip;
                }
                case expr_kind::call:
                case expr_kind::negate:
                case expr_kind::group:
                case expr_kind::add:
                case expr_kind::subtract:
                case expr_kind::multiply:
                case expr_kind::divide:
                case expr_kind::power:
                    return search_step::descend;
                default:
                    return search_step::found;
                }
            });
        if (not_for_this_rule)
            return;
        if (speeds >= 1 &&
            (angular_speeds >= 1 || (inertias >= 1 && is_rotating_power_or_torque(sides_dim)))) {
            report_revolutions_beside_radians(f, speed, partner, angular_speeds >= 1);
            return;
        }
        if (speeds == 1 && rim_speeds == 1 && lengths == 1 && torques == 0 && powers == 0 &&
            energies == 0 && angular_speeds == 0 && inertias == 0 && other_numbers == 0 &&
            length_round != round_length::none) {
            report_rim_speed_without_pi(f, speed, rim, length,
                                        length_round == round_length::radius);
            return;
        }
        if (torques != 1 || speeds != 1 || powers != 1 || energies != 0)
            return;
        diagnostic& d =
            report(rules::unit_scale,
                   fmt::format("{} is a torque ({}) and {} a speed in revolutions ({}): power and "
                               "torque meet through the 2\u03C0 radians of each revolution, P = "
                               "2\u03C0\u00B7n\u00B7M, and this formula has no 2\u03C0, so it is "
                               "off by 6.28319",
                               torque.shown(), torque.unit, speed.shown(), speed.unit),
                   file_.nodes[file_.sides[f.first_side].root].range);
        d.level = severity::warning;
        d.notes.push_back({"revolutions count as cycles: write 2*pi*n for the angular speed "
                           "(M = 60000*P/(2*pi*n) in N·m from kW and rpm is M = 9549*P/n), or "
                           "declare the speed in rad/s",
                           {}});
    }

    // "n_d = v/D" in rpm from a rope speed and a drum's diameter: a point on the rim travels
    // π·D per revolution, v = π·D·n (2π·r·n with a radius), which the units cannot say. Only
    // for a length named as a diameter or a radius (names_a_diameter_or_radius): a screw's
    // pitch, a chain's or a stroke travel without π (v = p·n).
    void report_rim_speed_without_pi(const syntax::formula& f, const rotating_part& speed,
                                     const rotating_part& rim, const rotating_part& length,
                                     bool radius) {
        diagnostic& d =
            report(rules::unit_scale,
                   fmt::format("{} is a speed in revolutions ({}) and {} a speed along the rim of "
                               "{}: a point on the rim travels {} per revolution, and this formula "
                               "has no π, so it is off by {}",
                               speed.shown(), speed.unit, rim.shown(), length.shown(),
                               radius ? "2π·r" : "π·D", radius ? "6.28319" : "3.14159"),
                   file_.nodes[file_.sides[f.first_side].root].range);
        d.level = severity::warning;
        d.notes.push_back(
            {file_.functions == syntax::function_names::spreadsheet
                 ? fmt::format("put the {} in: multiply by {}PI(), with this formula's unit "
                               "conversions kept beside it (a speed in revolutions counts cycles)",
                               radius ? "2\u03C0" : "\u03C0", radius ? "2*" : "")
                 : fmt::format("put the {} in: {} = {}*{}*{}, with this formula's unit "
                               "conversions kept beside it (a speed in revolutions counts cycles)",
                               radius ? "2\u03C0" : "\u03C0", rim.name, radius ? "2*pi" : "pi",
                               length.name, speed.name),
             {}});
    }

    void report_revolutions_beside_radians(const syntax::formula& f, const rotating_part& speed,
                                           const rotating_part& partner, bool angular) {
        const std::string partner_is =
            angular
                ? fmt::format("{} an angular speed in radians ({})", partner.shown(), partner.unit)
                : fmt::format("{} a moment of inertia ({}), whose kinetic energy "
                              "\u00BDI\u03C9\u00B2 takes the speed in radians",
                              partner.shown(), partner.unit);
        diagnostic& d =
            report(rules::unit_scale,
                   fmt::format("{} is a speed in revolutions ({}) and {}: a revolution is 2\u03C0 "
                               "radians, and this formula has no 2\u03C0, so it is off by {}",
                               speed.shown(), speed.unit, partner_is,
                               angular ? "6.28319" : "6.28319 for each power of the speed"),
                   file_.nodes[file_.sides[f.first_side].root].range);
        d.level = severity::warning;
        d.notes.push_back({"revolutions count as cycles: the angular speed is \u03C9 = 2*pi*n "
                           "(2*pi*n/60 in rad/s from rpm), or declare the speed in rad/s",
                           {}});
    }

    // "E_a = P*8760" with E_a in kWh, "m = V*7850" with m in kg: the sides differ by exactly a
    // time or a density, and a number in the formula is one the trades write for it. It
    // carries no unit, so the formula needs one given.
    void note_bare_quantity_apart(diagnostic& d, std::span<const operand> ops,
                                  const agreement& a) const {
        const std::optional<compact_dimension> apart = odd_one_apart(ops, a);
        if (!apart)
            return;
        struct bare_quantity {
            bool time; // else a density
            double value;
            const char* unit;
            const char* meaning;
        };
        // NIST SP 811 (2008), B.8: 1 d = 24 h = 1440 min = 86 400 s, 1 h = 3600 s; a year of
        // 365 d is 8760 h, a week 168 h. Densities: carbon steel 7850 kg/m³ (490 lb/ft³),
        // normal-weight concrete 2400 kg/m³ (150 lb/ft³), aluminium 2700 kg/m³ (common
        // practice; from memory).
        static constexpr std::array<bare_quantity, 12> quantities{{
            {true, 8760.0, "h", "the hours in a year"},
            {true, 365.0, "d", "the days in a year"},
            {true, 168.0, "h", "the hours in a week"},
            {true, 24.0, "h", "the hours in a day"},
            {true, 1440.0, "min", "the minutes in a day"},
            {true, 3600.0, "s", "the seconds in an hour"},
            {true, 86400.0, "s", "the seconds in a day"},
            {false, 7850.0, "kg/m^3", "steel's density"},
            {false, 490.0, "lb/ft^3", "steel's density"},
            {false, 2400.0, "kg/m^3", "concrete's density"},
            {false, 150.0, "lb/ft^3", "concrete's density"},
            {false, 2700.0, "kg/m^3", "aluminium's density"},
        }};
        bool time = false;
        try {
            time = *apart == time_dimension() || *apart == time_dimension().pow(-1);
            if (!time && !(*apart == density_dim) && !(*apart == density_dim.pow(-1)))
                return;
        } catch (const std::exception&) {
            return;
        }
        for (const operand& op : ops)
            for (std::uint32_t i = 0; i < op.type.literal_count; ++i) {
                const scale_literal& l = literals_[op.type.literal_begin + i];
                if (file_.nodes[l.node].kind != expr_kind::number)
                    continue;
                for (const bare_quantity& q : quantities)
                    if (q.time == time && l.value == q.value) {
                        const std::string_view written = text(file_.nodes[l.node].range);
                        d.notes.push_back(
                            {fmt::format("the sides differ by exactly a {}, and {} reads as {}: "
                                         "a number carries no unit, so write it with its own, "
                                         "{} {{{}}}",
                                         time ? "time" : "density", written, q.meaning, written,
                                         q.unit),
                             {}});
                        return;
                    }
            }
    }

    // What the first odd operand lacks against the others' dimension (their quotient), in a
    // mismatch of a formula's size; nothing where it is not known.
    std::optional<compact_dimension> odd_one_apart(std::span<const operand> ops,
                                                   const agreement& a) const {
        if (!a.reference || ops.size() > notes_for_terms_up_to || a.odd.empty() ||
            !ops[a.odd.front()].type.known)
            return std::nullopt;
        try {
            return *a.reference / ops[a.odd.front()].type.dim;
        } catch (const std::exception&) {
            return std::nullopt;
        }
    }

    // "p = ρ*h", "H = p/ρ": the odd term differs from the others by exactly an acceleration,
    // the most common slip of all, a missing (or doubled) g. Said outright, since the two
    // dimensions alone ("momentum", "areal density") do not point at it.
    // "is a g missing?", "is a density missing?": the two factors engineers leave out most, and
    // the only ones a side can differ by exactly and be named for.
    void note_acceleration_or_density_apart(diagnostic& d, std::span<const operand> ops,
                                            const agreement& a) const {
        const std::optional<compact_dimension> apart = odd_one_apart(ops, a);
        if (!apart)
            return;
        try {
            const std::string odd = quote(ops[a.odd.front()].node);
            if (*apart == acceleration_dimension() || *apart == acceleration_dimension().pow(-1))
                d.notes.push_back(
                    {fmt::format("{} differs from the rest by exactly an acceleration: {}", odd,
                                 *apart == acceleration_dimension()
                                     ? "times g it would match; is a g missing from it (ρ*g*h)?"
                                     : "divided by g it would match; is a g missing from its "
                                       "denominator (p/(ρ*g)), or is one there too many?"),
                     {}});
            // Not a fraction against a concentration (ppm against mg/L or mg/Nm³), which has
            // notes of its own.
            else if ((*apart == density_dim || *apart == density_dim.pow(-1)) &&
                     std::none_of(ops.begin(), ops.end(), [](const operand& op) {
                         return op.type.known && op.type.dim.is_dimensionless();
                     }))
                d.notes.push_back(
                    {fmt::format("{} differs from the rest by exactly a density (a mass "
                                 "against a volume): {} From a specific gravity, the density is "
                                 "SG times water's",
                                 odd,
                                 *apart == density_dim
                                     ? "times a density it would match; is one missing (m = ρ*V)?"
                                     : "divided by a density it would match; is one missing "
                                       "from its denominator (V = m/ρ)?"),
                     {}});
        } catch (const std::exception&) {
        }
    }

    // The notes that say what a mismatch's slip is look at sums of a formula's size only; a
    // generated sum of 400,000 terms gets the finding without them, in linear time.
    static constexpr std::size_t notes_for_terms_up_to = 16;

    // The first term of the reference's dimension that is plainly in its unit: no numbers.
    const operand* plain_reference_term(std::span<const operand> ops, const agreement& a) const {
        if (!a.reference || ops.size() > notes_for_terms_up_to)
            return nullptr;
        for (std::size_t i = 0; i < ops.size(); ++i) {
            const typed_term& t = ops[i].type;
            if (std::find(a.odd.begin(), a.odd.end(), i) == a.odd.end() && t.known && !t.zero &&
                !t.numeric && t.dim == *a.reference && t.literal_count == 0 &&
                std::isfinite(t.scale) && t.scale > 0)
                return &ops[i];
        }
        return nullptr;
    }

    // A symbol, a cell, or a sum or difference of two symbols in one unit ("(h_o + z_b)" in ft,
    // "(t_s - t_o)" in °C, a difference of kelvin size), with the unit it is declared in. Asked
    // only of a term with no offset, where every reading in it is a difference.
    std::optional<declared_factor> declared_factor_of(std::uint32_t k, double exponent) const {
        const syntax::expr_node& n = file_.nodes[k];
        if (n.kind == expr_kind::subtract || n.kind == expr_kind::add) {
            const syntax::expr_node& l = file_.nodes[syntax::inside_brackets(file_, n.lhs)];
            const syntax::expr_node& r = file_.nodes[syntax::inside_brackets(file_, n.rhs)];
            if (l.kind != expr_kind::symbol || r.kind != expr_kind::symbol)
                return std::nullopt;
            const symbol_entry* a = symbols_.find(text(l.range));
            const symbol_entry* b = symbols_.find(text(r.range));
            if (a == nullptr || b == nullptr || !a->compact_dim || a->unit_text != b->unit_text)
                return std::nullopt;
            return declared_factor{*a->compact_dim, a->si_factor, exponent, a->unit_text};
        }
        if (n.kind == expr_kind::symbol) {
            const symbol_entry* e = symbols_.find(text(n.range));
            // In a term with no offset a symbol in °C is a difference, of kelvin size.
            if (e == nullptr || !e->compact_dim)
                return std::nullopt;
            return declared_factor{*e->compact_dim, e->si_factor, exponent, e->unit_text};
        }
        if (n.kind == expr_kind::reference) {
            const syntax::reference_value& cell = file_.references[n.lhs];
            if (!cell.dim || cell.offset != nullptr)
                return std::nullopt;
            const auto dim = compact_dimension::fitted(*cell.dim);
            if (!dim)
                return std::nullopt;
            return declared_factor{*dim, cell.scale, exponent, {}};
        }
        return std::nullopt;
    }

    // A trade's constant typed for one unit system beside a symbol declared in the other's
    // (check/constant_in_other_units.hpp). In "0.433*h_m + p_psi" the term with the number is
    // the majority's, so every term with numbers is tried against the first plain term of
    // another dimension.
    [[gnu::noinline]] bool
    note_constant_for_other_units(diagnostic& d, std::span<const operand> ops, const agreement& a) {
        if (!a.reference || ops.size() > notes_for_terms_up_to)
            return false;
        for (std::size_t i = 0; i < ops.size(); ++i) {
            const typed_term& t = ops[i].type;
            std::array<std::string_view, 8> texts{};
            if (!t.known || t.numeric || t.offset != nullptr || t.literal_count == 0 ||
                t.literal_count > texts.size() || !std::isfinite(t.scale) || !(t.scale > 0))
                continue;
            const auto plain = std::find_if(ops.begin(), ops.end(), [&](const operand& o) {
                return o.type.known && !o.type.zero && !o.type.numeric &&
                       o.type.literal_count == 0 && o.type.offset == nullptr &&
                       std::isfinite(o.type.scale) && o.type.scale > 0 && !(o.type.dim == t.dim);
            });
            if (plain == ops.end())
                continue;
            const operand* reference = &*plain;
            dimension lacking;
            try {
                lacking = (reference->type.dim / t.dim).expand();
            } catch (const std::exception&) {
                continue;
            }
            const std::span<const scale_literal> numbers(literals_.data() + t.literal_begin,
                                                         t.literal_count);
            // The cheap test first: most mismatches hold no number a quantity could be.
            if (!numbers_could_carry(numbers, lacking, texts))
                continue;
            std::array<declared_factor, 8> factors{};
            std::array<std::uint32_t, 8> factor_nodes{};
            std::size_t factor_count = 0;
            // Every factor but the numbers must be one the search can weigh: a factor it
            // cannot (a function's value, a sum) might hold the unit that is off, and a
            // reading that passed it by would name the wrong symbol.
            bool unweighed = false;
            for_each_factor(ops[i].node, [&](std::uint32_t at, int sign) {
                const syntax::expr_node& n = file_.nodes[at];
                if (n.kind == expr_kind::number || n.kind == expr_kind::pi)
                    return false;
                std::uint32_t base = at;
                double exponent = sign;
                if (n.kind == expr_kind::power) {
                    base = syntax::inside_brackets(file_, n.lhs);
                    if (file_.nodes[n.rhs].kind != expr_kind::number)
                        return unweighed = true;
                    exponent = sign * written_number(file_.nodes[n.rhs].range);
                }
                const std::optional<declared_factor> factor = declared_factor_of(base, exponent);
                if (!factor)
                    return unweighed = true;
                factor_nodes[factor_count] = base;
                factors[factor_count++] = *factor;
                return unweighed = factor_count == factors.size();
            });
            if (unweighed)
                continue;
            // "u_psi = 62.4*h_ft": the number fits where the result's unit is the other one.
            if (factor_count < factors.size()) {
                const std::uint32_t plain_node = syntax::inside_brackets(file_, reference->node);
                if (const auto factor = declared_factor_of(plain_node, -1.0)) {
                    factor_nodes[factor_count] = plain_node;
                    factors[factor_count++] = *factor;
                }
            }
            const auto found = read_constant_in_other_units(
                t.scale, reference->type.scale, numbers, {texts.data(), numbers.size()}, lacking,
                kind_of(t), {factors.data(), factor_count});
            if (!found)
                continue;
            d.notes.push_back(
                {constant_in_other_units_message(
                     quote(numbers[found->reading.literal].node),
                     fmt::format("'{}'",
                                 display_text(file_.nodes[factor_nodes[found->factor]].range)),
                     *found),
                 {}});
            return true;
        }
        return false;
    }

    // "u = 9.81*z_ft": standard gravity written for metres and seconds in a term whose units are
    // feet (or 32.2 beside metres). The dimensions show a missing acceleration, but the
    // acceleration is there: the slip is the units around it, which this note names.
    bool note_gravity_in_other_units(diagnostic& d, std::span<const operand> ops,
                                     const agreement& a) {
        const operand* reference = plain_reference_term(ops, a);
        if (reference == nullptr)
            return false;
        const double reference_scale = reference->type.scale;
        struct gravity_unit {
            const char* name;
            const char* system;
            double metres; // NIST SP 811 (2008), B.8: 1 ft = 0.3048 m exactly
        };
        static constexpr std::array<gravity_unit, 2> units{
            {{"m/s\u00B2", "metres", 1.0}, {"ft/s\u00B2", "feet", 0.3048}}};
        constexpr double standard_gravity = 9.80665; // SI Brochure 9th ed., Table 8 (g_n)
        for (const std::size_t i : a.odd) {
            const typed_term& t = ops[i].type;
            if (!t.known || t.numeric || t.literal_count == 0 || !std::isfinite(t.scale))
                continue;
            try {
                if (!(*a.reference / t.dim == acceleration_dimension()))
                    continue;
            } catch (const std::exception&) {
                continue;
            }
            for (std::uint32_t k = 0; k < t.literal_count; ++k) {
                const scale_literal& l = literals_[t.literal_begin + k];
                if (l.exponent != 1.0)
                    continue;
                const std::string written = display_text(file_.nodes[l.node].range);
                for (const gravity_unit& u : units) {
                    const double g = standard_gravity / u.metres;
                    if (std::abs(l.value - g) > half_unit_in_last_digit(written) * (1.0 + 1e-9) ||
                        std::abs(l.value / g - 1.0) > 0.005)
                        continue;
                    // As the unit-scale findings count it: the value as written over the value
                    // in the reference's unit.
                    const double ratio = reference_scale / (u.metres * t.scale);
                    if (std::abs(ratio - 1.0) < 0.01)
                        continue;
                    d.notes.push_back(
                        {fmt::format("{} is standard gravity in {}, but the other units of {} are "
                                     "not all {} and seconds: read so, it counts {:.6g} times as "
                                     "much as {}; write gravity in the units around it, or "
                                     "convert them first",
                                     written, u.name, quote(ops[i].node), u.system, ratio,
                                     quote(reference->node)),
                         {}});
                    return true;
                }
            }
        }
        return false;
    }

    // "Cl_ppm = Cl_mgL": ppm by mass is a fraction, mg/L a mass per volume; in dilute water the
    // trades take them as equal (common practice), the water's density, 1 kg/L, between them.
    // The sides differ in dimension by exactly a density: say so, and how to write it.
    void note_fraction_beside_concentration(diagnostic& d, std::span<const operand> sides) {
        constexpr compact_dimension density = compact_dimension::whole({1, -3, 0, 0, 0, 0, 0});
        if (sides.size() != 2 || !sides[0].type.known || !sides[1].type.known)
            return;
        try {
            const dimension apart = (sides[0].type.dim / sides[1].type.dim).expand();
            const auto fitted = compact_dimension::fitted(apart);
            if (!fitted || !(*fitted == density || *fitted == compact_dimension{} / density))
                return;
        } catch (const std::exception&) {
            return;
        }
        if (!holds_symbol_in_unit(sides[0].node, {"ppm", "ppb"}) &&
            !holds_symbol_in_unit(sides[1].node, {"ppm", "ppb"}))
            return;
        // Per litre of water, not mg/Nm³ of a flue gas (where ppm is by volume).
        if (!holds_symbol_in_unit(sides[0].node, {"/L", "/l"}) &&
            !holds_symbol_in_unit(sides[1].node, {"/L", "/l"}))
            return;
        d.notes.push_back({"ppm and ppb by mass are fractions, mg/L a mass per volume: in dilute "
                           "water 1 mg/L is taken as 1 ppm, the water's density (1 kg/L) between "
                           "them; write it (ρ_w : kg/L = 1) on the side in mg/L to say so",
                           {}});
    }

    // "V <= 7.5": a limit typed as a bare number has no unit; say how to give it one, in the
    // unit of the other side when that side is one symbol declared by unit.
    void note_bare_number_side(diagnostic& d, std::span<const operand> sides) const {
        if (sides.size() != 2)
            return;
        for (std::size_t i = 0; i < 2; ++i) {
            const syntax::expr_node& bare = file_.nodes[sides[i].node];
            const syntax::expr_node& other = file_.nodes[sides[1 - i].node];
            if (bare.kind != syntax::expr_kind::number || !sides[1 - i].type.known)
                continue;
            std::string unit = "<unit>";
            if (other.kind == syntax::expr_kind::symbol)
                if (const symbol_entry* e = symbols_.find(text(other.range));
                    e != nullptr && !e->unit_text.empty())
                    unit = std::string(e->unit_text);
            d.notes.push_back({fmt::format("a bare number has no unit; give it the other side's, "
                                           "as in {} {{{}}}",
                                           display_text(bare.range), unit),
                               {}});
            return;
        }
        // "TDS = 0.7*κ": a number times one symbol, where the number is an empirical factor
        // with units of its own (ppm per µS/cm).
        for (std::size_t i = 0; i < 2; ++i) {
            const syntax::expr_node& product = file_.nodes[sides[i].node];
            if (product.kind != syntax::expr_kind::multiply &&
                product.kind != syntax::expr_kind::divide)
                continue;
            const syntax::expr_node& left = file_.nodes[product.lhs];
            const syntax::expr_node& right = file_.nodes[product.rhs];
            const bool number_left =
                left.kind == syntax::expr_kind::number && right.kind == syntax::expr_kind::symbol;
            const bool number_right =
                right.kind == syntax::expr_kind::number && left.kind == syntax::expr_kind::symbol;
            if (!number_left && !number_right)
                continue;
            const std::string number = display_text((number_left ? left : right).range);
            d.notes.push_back({fmt::format("if {} is an empirical factor that carries units of "
                                           "its own, write it as {}? for plumb to work out its "
                                           "dimension, and state it once reviewed ({}?[...])",
                                           number, number, number),
                               {}});
            return;
        }
    }

    std::string display_text(span s) const { return single_line(file_.source->text(s)); }

    // A spreadsheet formula: one side, whose type the front end compares with the unit
    // written beside its cell.
    void mark_symbols_used(const syntax::formula& f) {
        syntax::search_formula(file_, f, [&](std::uint32_t, const syntax::expr_node& n) {
            if (n.kind == expr_kind::symbol)
                if (symbol_entry* e = symbols_.find(text(n.range)))
                    e->used = true;
            return search_step::descend;
        });
    }

    std::optional<value_type> check_value(const syntax::formula& f) {
        current_ = &f;
        const typed_term t = eval(file_.sides[f.first_side].root);
        if (!t.known)
            return std::nullopt;
        return value_type{t.dim.expand(), t.scale, t.offset, t.zero, t.exact_scale, t.numeric};
    }

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
    const typed_term* sum_side_hint_ = nullptr;    // while a side's sum is checked, the other side
    // The site's barometer where the file declares one: see declared_site_barometer.
    struct site_barometer {
        std::string_view name;
        double pascals = 0.0;
    };
    site_barometer site_barometer_;
    bool site_barometer_searched_ = false;
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

    // 'text' for messages, shortened so one long term cannot swamp a line.
    std::string quote(std::uint32_t node) const {
        std::string t = display_text(file_.nodes[node].range);
        constexpr std::size_t limit = 48;
        if (t.size() > limit) {
            std::size_t cut = limit;
            while (cut > 0 && (static_cast<unsigned char>(t[cut]) & 0xC0) == 0x80)
                --cut;
            t = t.substr(0, cut) + "\u2026";
        }
        const syntax::expr_node& n = file_.nodes[node];
        if (n.kind == expr_kind::symbol) {
            if (const symbol_entry* e = symbols_.find(text(n.range));
                e != nullptr && !e->description.empty())
                return fmt::format("'{}' ({})", t, e->description);
        }
        return fmt::format("'{}'", t);
    }

    diagnostic& report(std::string_view rule, std::string message, span where) {
        diagnostic d;
        d.level = severity::error;
        d.rule = std::string(rule);
        d.message = std::move(message);
        d.where = {file_.source, where};
        out_.push_back(std::move(d));
        return out_.back();
    }

    // The SI value of one written unit of a term with its numbers taken as conversions:
    // ρ*g*h/1000 is in kPa (1000 Pa). NaN where that is no finite positive number.
    double unit_as_written(const typed_term& t) const {
        double u = t.scale;
        // Only the numbers that convert: the 0.55 of 0.55*RH_pct/100 is a coefficient.
        for (std::uint32_t l = 0; l < t.literal_count; ++l)
            if (const scale_literal& number = literals_[t.literal_begin + l];
                looks_like_conversion(number, true))
                u /= std::pow(number.value, number.exponent);
        return u > 0 && std::isfinite(u) ? u : std::numeric_limits<double>::quiet_NaN();
    }

    // "p_abs = 9.81*h + 101.325", "p_a = 0.433*h_ft + 14.7", "ρ*g*h/1000 + 101.325": a
    // column's pressure plus the atmosphere written as a bare number, the absolute pressure at
    // depth. The number is read as a standard reference pressure in the unit of the sum's
    // pressure term, or of the equation's other side where no term of the sum is a pressure
    // yet, and the column's number against that unit as the gravity readings are. Tried on
    // short sums with one such number only, and undone unless every term then agrees.
    bool read_column_and_atmosphere(std::size_t base, std::uint32_t sum_node) {
        // Below the count where equal types are shared (push_operand_type), so that each term's
        // type is its own to change.
        constexpr std::size_t most_terms = 15;
        const std::size_t count = operands_.size() - base;
        if (count > most_terms)
            return false;
        const compact_dimension& pressure = pressure_dimension();
        double unit = std::numeric_limits<double>::quiet_NaN(); // SI per written value
        for (std::size_t i = 0; i < count && !std::isfinite(unit); ++i) {
            const typed_term& t = operands_[base + i].type;
            if (t.known && !t.numeric && t.dim == pressure)
                unit = unit_as_written(t);
        }
        if (!std::isfinite(unit) && sum_node == side_hint_node_ && side_hint_ != nullptr &&
            side_hint_->known && !side_hint_->numeric && side_hint_->dim == pressure)
            unit = side_hint_->scale;
        if (!(unit > 0) || !std::isfinite(unit))
            return false;
        std::size_t atmosphere = count;
        for (std::size_t i = 0; i < count; ++i) {
            const operand& op = operands_[base + i];
            const typed_term& t = op.type;
            if (op.subtracted || !t.known || !t.numeric || t.zero || t.literal_count != 1)
                continue;
            const scale_literal& l = literals_[t.literal_begin];
            if (l.exponent != 1.0 ||
                read_reference_state(pressure, l.value, text(file_.nodes[l.node].range), unit) ==
                    nullptr)
                continue;
            if (atmosphere != count)
                return false; // two atmospheres: no reading
            atmosphere = i;
        }
        if (atmosphere == count)
            return false;
        // p_2/6.895 + 14.7 with p_2 an absolute reading in kPa: its atmosphere is in it already,
        // and no column's pressure is there for the number to be added to.
        for (std::size_t i = 0; i < count; ++i) {
            const typed_term& t = operands_[base + i].type;
            if (i != atmosphere && t.known && t.point && t.offset == nullptr &&
                !t.absolute_pressure_difference && t.dim == pressure)
                return false;
        }
        // Kept to undo the readings.
        std::array<typed_term, most_terms> saved_types;
        for (std::size_t i = 0; i < count; ++i)
            saved_types[i] = operands_[base + i].type;
        std::uint32_t literal_from = static_cast<std::uint32_t>(literals_.size());
        for (std::size_t i = 0; i < count; ++i)
            literal_from = std::min(literal_from, operands_[base + i].type.literal_begin);
        const std::vector<scale_literal> saved_literals(literals_.begin() + literal_from,
                                                        literals_.end());
        const std::size_t findings_before = out_.size();

        auto& t = const_cast<typed_term&>(operands_[base + atmosphere].type);
        scale_literal& number = literals_[t.literal_begin];
        const std::uint32_t number_node = number.node;
        const reference_state* state = read_reference_state(
            pressure, number.value, text(file_.nodes[number_node].range), unit);
        t.dim = pressure;
        t.scale = unit;
        t.exact_scale.reset();
        t.numeric = false;
        t.value.reset();
        t.point = true; // the atmosphere is an absolute reading
        t.origin = 0.0;
        t.origin_tolerance = 0.0;
        read_as_quantity(number);
        const std::span<const operand> terms(operands_.data() + base, count);
        agreement a = find_agreement(terms);
        if (!a.odd.empty() || !a.reference || !(*a.reference == pressure)) {
            agreement towards_pressure;
            towards_pressure.reference = pressure;
            for (std::size_t i = 0; i < count; ++i)
                if (terms[i].type.known && !terms[i].type.zero && !(terms[i].type.dim == pressure))
                    towards_pressure.odd.push_back(i);
            read_gravity_numbers(base, towards_pressure, syntax::no_index, unit);
            a = find_agreement(terms);
        }
        if (!a.odd.empty() || !a.reference || !(*a.reference == pressure)) {
            for (std::size_t i = 0; i < count; ++i)
                const_cast<typed_term&>(operands_[base + i].type) = saved_types[i];
            cut_literals_to(literal_from);
            literals_.insert(literals_.end(), saved_literals.begin(), saved_literals.end());
            out_.erase(out_.begin() + static_cast<std::ptrdiff_t>(findings_before), out_.end());
            return false;
        }
        diagnostic& d = report(
            rules::trade_constant,
            fmt::format("'{}' is read as the atmospheric pressure added to a column's pressure: "
                        "{} in the units around it",
                        display_text(file_.nodes[number_node].range), state->what),
            file_.nodes[number_node].range);
        d.level = severity::note;
        d.notes.push_back(
            {fmt::format("the trades' choices: {}; above sea level the atmosphere is less",
                         state->choices),
             {}});
        d.notes.push_back({"declare it with its unit (p_atm : kPa = 101.325) to say so", {}});
        return true;
    }

    // Whether any of a term's numbers could carry a quantity the term lacks (the cheap test
    // before a reading); their texts go to `texts`, as the reading wants them.
    bool numbers_could_carry(std::span<const scale_literal> numbers, const dimension& lacking,
                             std::span<std::string_view> texts) const {
        bool any = false;
        for (std::size_t k = 0; k < numbers.size() && k < texts.size(); ++k) {
            texts[k] = text(file_.nodes[numbers[k].node].range);
            any = any || lacks_gravity_number(lacking, numbers[k].exponent);
        }
        return any;
    }

    // The air's density in a total load, 4.5·cfm·Δh or 1.2·(L/s)·Δh, as in its moisture.
    static carried_quantity::term_kind kind_of(const typed_term& t) {
        using term_kind = carried_quantity::term_kind;
        return t.numeric ? term_kind::any
               : t.dim == volume_flow_dimension() || t.dim == volume_flow_enthalpy_dim
                   ? term_kind::volume_flow
               : t.dim == velocity_squared_dimension() ? term_kind::velocity_squared
                                                       : term_kind::any;
    }

    // As read_gravity_numbers, and where that fails because the number stands in the terms that
    // make the majority ("0.433*h_s + p_t": one term each way, the first taken as reference),
    // read them against the dimension of the first plain term that differs instead.
    bool read_gravity_numbers_either_way(std::size_t base, const agreement& a,
                                         std::uint32_t sum_node = syntax::no_index) {
        if (read_gravity_numbers(base, a, sum_node))
            return true;
        const std::size_t count = operands_.size() - base;
        agreement flipped;
        for (const std::size_t i : a.odd) {
            const typed_term& t = operands_[base + i].type;
            if (t.known && !t.zero && !t.numeric && t.literal_count == 0) {
                flipped.reference = t.dim;
                break;
            }
        }
        // Or the dimension of the equation's other side, where the odd terms all convert.
        if (!flipped.reference && sum_node != syntax::no_index && sum_node == side_hint_node_ &&
            side_hint_ != nullptr && side_hint_->known && !(side_hint_->dim == *a.reference))
            flipped.reference = side_hint_->dim;
        if (!flipped.reference)
            return false;
        for (std::size_t i = 0; i < count; ++i) {
            const typed_term& t = operands_[base + i].type;
            if (t.known && !t.zero && !(t.dim == *flipped.reference))
                flipped.odd.push_back(i);
        }
        return read_gravity_numbers(base, flipped, sum_node);
    }

    // Where the odd operands lack exactly an acceleration (or have one too many) and each holds
    // g_n written as a number in its own units, the number is read as g_n: the operand takes the
    // reference's dimension and the scale g_n gives it, and a note says which number was read so.
    bool read_gravity_numbers(std::size_t base, const agreement& a,
                              std::uint32_t sum_node = syntax::no_index,
                              double reference_scale = std::numeric_limits<double>::quiet_NaN()) {
        if (!a.reference)
            return false;
        const std::size_t count = operands_.size() - base;
        const auto is_odd = [&](std::size_t i) {
            return std::find(a.odd.begin(), a.odd.end(), i) != a.odd.end();
        };
        for (std::size_t i = 0; i < count && !std::isfinite(reference_scale); ++i) {
            const typed_term& t = operands_[base + i].type;
            if (!is_odd(i) && t.known && !t.zero && !t.numeric && t.dim == *a.reference &&
                t.literal_count == 0 && std::isfinite(t.scale)) {
                reference_scale = t.scale;
                break;
            }
        }
        // "H_ft = 2.31*p + z_m/0.3048": no term of the sum is plainly in the head's unit, but
        // the equation's other side is.
        if (!std::isfinite(reference_scale) && sum_node != syntax::no_index &&
            sum_node == side_hint_node_ && side_hint_ != nullptr && side_hint_->known &&
            side_hint_->dim == *a.reference && side_hint_->literal_count == 0)
            reference_scale = side_hint_->scale;
        if (!std::isfinite(reference_scale))
            return false;
        struct found {
            std::size_t operand;
            gravity_reading reading;
        };
        std::array<found, 4> readings{};
        std::size_t found_count = 0;
        std::array<std::string_view, 8> texts{};
        for (const std::size_t i : a.odd) {
            const typed_term& t = operands_[base + i].type;
            // 2.31*p_g beside a head: a gauge pressure in feet of water, as p_g/(ρ*g) is.
            const bool gauge_to_head = t.offset != nullptr &&
                                       compact_dimension(t.offset->dim()) == pressure_dimension() &&
                                       *a.reference == length_dimension();
            // A bare number is read too when it stands for the whole quantity: the 9.81 of
            // (γ_sat - 9.81)*z is water's specific weight in kN/m³.
            if (found_count == readings.size() || !t.known || (t.numeric && t.literal_count != 1) ||
                (t.offset != nullptr && !gauge_to_head) || t.literal_count == 0 ||
                t.literal_count > texts.size())
                return false;
            dimension lacking;
            try {
                lacking = (*a.reference / t.dim).expand();
            } catch (const std::exception&) {
                return false;
            }
            const std::span<const scale_literal> numbers(literals_.data() + t.literal_begin,
                                                         t.literal_count);
            if (!numbers_could_carry(numbers, lacking, texts))
                return false;
            const auto reading =
                read_gravity_number(t.scale, reference_scale, numbers,
                                    {texts.data(), numbers.size()}, lacking, true, kind_of(t));
            // A bare number standing for the whole quantity is that quantity in the others'
            // unit or nothing: "ρ_p - 1" beside kg/m³ is no water density a thousand apart.
            if (!reading || (t.numeric && reading->shifted))
                return false;
            readings[found_count++] = {i, *reading};
        }
        for (std::size_t r = 0; r < found_count; ++r) {
            // Its own type: a term with numbers shares it with no other operand.
            auto& t = const_cast<typed_term&>(operands_[base + readings[r].operand].type);
            scale_literal& number = literals_[t.literal_begin + readings[r].reading.literal];
            t.dim = *a.reference;
            t.scale = readings[r].reading.term_scale;
            t.exact_scale.reset();
            t.offset = nullptr;
            t.point = false;
            t.origin = 0.0;
            t.origin_tolerance = 0.0;
            // A column's pressure written with its number (0.433*h, ρ*9.81*h) is a difference
            // a gauge may read, as ρ*g*h is.
            t.absolute_pressure_difference = t.dim == pressure_dimension();
            const std::uint32_t node = number.node;
            const double written_value = number.value;
            const bool multiplies = number.exponent > 0;
            // The number is g_n now, not a factor for the scale rules to weigh.
            read_as_quantity(number);
            const std::string written = display_text(file_.nodes[node].range);
            const gravity_reading& reading = readings[r].reading;
            if (reading.flipped) {
                // "Q*H*3960": the number fits only as a divisor; as written the term is off by
                // its square and differs in dimension, and the cure is to move the number.
                const bool divides = number.exponent > 0;
                diagnostic& d = report(
                    rules::unit_scale,
                    fmt::format("the factor {} is the wrong way round: it carries {} and needs {}",
                                written, reading.quantity->what,
                                divides ? "a division by it, not a multiplication"
                                        : "a multiplication by it, not a division"),
                    file_.nodes[node].range);
                add_term(d, operands_[base + readings[r].operand]);
                d.notes.push_back({gravity_message(written, reading), {}});
                continue;
            }
            if (((symbols_.unit_marks() & at_reference_conditions) != 0 ||
                 file_.functions == syntax::function_names::spreadsheet) &&
                is_molar_volume(*reading.quantity) &&
                report_molar_volume_off_reference(base, count, readings[r].operand, written_value,
                                                  multiplies, reading, node)) [[unlikely]]
                continue;
            diagnostic& d = report(reading.quantity->rule, gravity_message(written, reading),
                                   file_.nodes[node].range);
            d.level = severity::note;
            // "W_kip = 2.2046*m_t": g and kN per kip in one number; {g_n} alone would drop
            // the conversion, which the advice keeps.
            const carried_quantity& q = *reading.quantity;
            if (!reading.reciprocal && !q.named.empty() && q.least > 0 &&
                std::abs(reading.stands_for / q.least - 1.0) > 1e-3) [[unlikely]] {
                const std::string conversion = format_factor(reading.stands_for / q.least);
                d.notes.push_back(
                    {fmt::format("{} holds a conversion between the units around it as well "
                                 "({} times {}): write {}*{} instead to say so, or declare the "
                                 "symbols in coherent units",
                                 written, q.named, conversion, q.named, conversion),
                     {}});
            } else {
                d.notes.push_back({std::string(q.advice_in_notation), {}});
            }
            if (is_water_density_or_weight(*reading.quantity)) [[unlikely]]
                report_specific_gravity_against_water(operands_[base + readings[r].operand],
                                                      reading, multiplies, written);
            else if (reading.quantity->only_in == carried_quantity::term_kind::volume_flow ||
                     reading.quantity->what == "the heat capacity of a volume of air") [[unlikely]]
                report_standard_air_number_on_actual_flow(operands_[base + readings[r].operand],
                                                          reading, written, node);
        }
        return true;
    }

    // "H = p*2.31*SG": a liquid's specific weight is its specific gravity times water's, so
    // the SG goes wherever γ_w goes: above with 0.433 psi/ft, below with 2.31 ft/psi and 3960.
    // The units cannot see an SG on the wrong side (it is a pure number), but the number read
    // as water's says which side that is. A symbol is taken for an SG by its description
    // ("specific gravity", "relative density") or its name (SG, SG_m).
    [[gnu::noinline]] void report_specific_gravity_against_water(const operand& term,
                                                                 const gravity_reading& reading,
                                                                 bool multiplies,
                                                                 const std::string& written) {
        const int water_power = (reading.reciprocal ? -1 : 1) * (multiplies ? 1 : -1);
        std::uint32_t against = syntax::no_index;
        for_each_factor(term.node, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::reference) {
                // A workbook's cell whose row label says so (the front end reads it).
                if (!file_.references[n.lhs].specific_gravity)
                    return false;
            } else {
                if (n.kind != expr_kind::symbol)
                    return false;
                const std::string_view name = text(n.range);
                const symbol_entry* e = symbols_.find(name);
                if (e == nullptr || !e->compact_dim || !e->compact_dim->is_dimensionless() ||
                    !names_specific_gravity(name, e->description))
                    return false;
            }
            if (sign != water_power)
                against = at;
            return against != syntax::no_index;
        });
        if (against == syntax::no_index)
            return;
        const char* water_at = water_power > 0 ? "numerator" : "denominator";
        const char* sg_at = water_power > 0 ? "denominator" : "numerator";
        diagnostic& d =
            report(rules::gravity_number,
                   fmt::format("{} is a specific gravity, but it stands in the {} while the "
                               "specific weight of water that {} carries stands in the {}: a "
                               "liquid's specific weight is its specific gravity times water's, "
                               "so as written the result is off by SG squared",
                               quote(against), sg_at, written, water_at),
                   file_.nodes[against].range);
        d.level = severity::warning;
        add_term(d, term);
        d.notes.push_back({fmt::format("move {} to the {}, beside water's specific weight, as in "
                                       "p*2.31/SG, 0.433*SG*h and Q*H*SG/3960",
                                       quote(against), water_at),
                           {}});
    }

    // "1.08*Q_acfm*ΔT" on a dryer's exhaust: the air trade's numbers hold the density of
    // standard air (0.075 lb/ft³, ASHRAE Fundamentals, ch. 1, from memory), so they want a flow
    // at standard conditions; a flow in actual cubic feet at 300 °F is some 30 % less dense.
    // Said where a flow in the term is declared in acfm or described as actual.
    [[gnu::noinline]] void report_standard_air_number_on_actual_flow(const operand& term,
                                                                     const gravity_reading& reading,
                                                                     const std::string& written,
                                                                     std::uint32_t node) {
        std::uint32_t actual = syntax::no_index;
        for_each_factor(term.node, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind != expr_kind::symbol || sign < 0)
                return false;
            const symbol_entry* e = symbols_.find(text(n.range));
            if (e == nullptr || !e->compact_dim || !(*e->compact_dim == volume_flow_dim))
                return false;
            std::string lower(e->description);
            for (char& c : lower)
                c = static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
            if (e->unit_text.find("acfm") != std::string_view::npos ||
                lower.find("actual") != std::string::npos ||
                lower.find("line conditions") != std::string::npos)
                actual = at;
            return actual != syntax::no_index;
        });
        if (actual == syntax::no_index)
            return;
        diagnostic& d = report(
            rules::trade_constant,
            fmt::format("{} carries {} for standard air, but {} is a flow at actual conditions: "
                        "at another temperature or pressure the air's density, and the number, "
                        "differ",
                        written, reading.quantity->what, quote(actual)),
            file_.nodes[node].range);
        d.level = severity::warning;
        add_term(d, term);
        d.notes.push_back({"correct the flow to standard conditions first, or write the air's "
                           "density at its temperature and pressure with c_p",
                           {}});
    }

    static bool is_water_density_or_weight(const carried_quantity& q) {
        return q.what == "the specific weight of water" || q.what == "the density of water";
    }

    // "C_mg = C_ppm*M/24.45" in mg/Nm³: 24.45 L/mol is a gas at 25 °C, and a normal cubic metre
    // one at 0 °C, where the molar volume is 22.41 L/mol (V_m = R·T/p at 101.325 kPa, R from
    // CODATA 2018): the result is 9 % off. Within 2 % nothing is said, for the US trades'
    // 385.3 scf/lbmol at 68 °F beside a standard cubic foot at 60 °F is their convention.
    [[gnu::noinline]] bool report_molar_volume_off_reference(std::size_t base, std::size_t count,
                                                             std::size_t odd, double written,
                                                             bool multiplies,
                                                             const gravity_reading& reading,
                                                             std::uint32_t node) {
        std::optional<reference_volume> volume;
        std::uint32_t volume_node = syntax::no_index;
        for (std::size_t j = 0; j < count; ++j) {
            const std::optional<reference_volume> v = reference_volume_of(operands_[base + j].node);
            if (!v)
                continue;
            if (volume && volume->kelvins != v->kelvins)
                return false; // two reference states: the reference-temperature rule speaks
            volume = v;
            if (volume_node == syntax::no_index || j != odd)
                volume_node = operands_[base + j].node;
        }
        if (!volume)
            return false;
        const std::optional<molar_volume_mismatch> off =
            molar_volume_off_reference(reading, written, multiplies, volume->kelvins);
        if (!off)
            return false;
        diagnostic& d =
            report(rules::unit_scale,
                   molar_volume_message(quote(node), reading, *off,
                                        fmt::format("of {}", quote(volume_node)), volume->name),
                   file_.nodes[node].range);
        d.level = severity::warning;
        add_term(d, operands_[base + odd]);
        d.notes.push_back({molar_volume_advice(*off), {}});
        return true;
    }

    // The term, and the units of the symbols in it, which say where a factor comes from.
    void add_term_and_units(diagnostic& d, const operand& op) const {
        add_term(d, op);
        const std::string units = units_in(op.node);
        if (!units.empty())
            d.notes.push_back({units, {}});
    }

    void add_term(diagnostic& d, const operand& op, bool differs = false) const {
        d.terms.push_back({{file_.source, file_.nodes[op.node].range},
                           display_text(file_.nodes[op.node].range),
                           op.type.dim.expand(),
                           differs});
    }

    // Notes for operands that disagree: each odd one with its dimension, then the rest.
    void explain(diagnostic& d, std::span<const operand> ops, const agreement& a,
                 std::string_view others) const {
        // A sum of thousands of terms must not bury the finding (or slow the renderers):
        // the odd ones are all named, the agreeing ones up to a handful.
        constexpr std::size_t max_listed = 8;
        constexpr std::size_t max_odd = 32;
        for (std::size_t k = 0; k < a.odd.size() && k < max_odd; ++k) {
            add_term(d, ops[a.odd[k]], true);
            d.notes.push_back({fmt::format("{} is {}", quote(ops[a.odd[k]].node),
                                           describe(ops[a.odd[k]].type.dim)),
                               {},
                               true});
        }
        if (a.odd.size() > max_odd)
            d.notes.push_back({fmt::format("and {} more that differ", a.odd.size() - max_odd), {}});
        std::vector<bool> is_odd(ops.size(), false);
        for (const std::size_t k : a.odd)
            is_odd[k] = true;
        std::vector<std::size_t> agreeing_index;
        for (std::size_t i = 0; i < ops.size(); ++i)
            if (ops[i].type.known && !ops[i].type.zero && !is_odd[i])
                agreeing_index.push_back(i);
        const std::size_t agreeing_count = agreeing_index.size();
        if (agreeing_count > max_listed) {
            // Keep the ones nearest the first odd term: they are what the reader sees beside it.
            const std::size_t odd = a.odd.front();
            std::stable_sort(
                agreeing_index.begin(), agreeing_index.end(), [odd](std::size_t x, std::size_t y) {
                    return (x > odd ? x - odd : odd - x) < (y > odd ? y - odd : odd - y);
                });
            agreeing_index.resize(max_listed);
            std::sort(agreeing_index.begin(), agreeing_index.end());
        }
        std::vector<std::string> agreeing;
        for (std::size_t i : agreeing_index) {
            add_term(d, ops[i]);
            agreeing.push_back(quote(ops[i].node));
        }
        if (agreeing_count > max_listed)
            agreeing.push_back(fmt::format("and {} more", agreeing_count - max_listed));
        // With more than are listed, the note's count is news the terms do not carry.
        const bool restates = agreeing_count <= max_listed;
        if (agreeing_count == 1)
            d.notes.push_back(
                {fmt::format("{} is {}", agreeing.front(), describe(*a.reference)), {}, restates});
        else if (agreeing_count > 1)
            d.notes.push_back({fmt::format("the other {} are {}: {}", others,
                                           describe(*a.reference), fmt::join(agreeing, ", ")),
                               {},
                               restates});
    }

    [[gnu::noinline]] typed_term eval_quantity(const syntax::expr_node& n) const {
        const syntax::quantity_literal& q = file_.quantities[n.lhs];
        if (!q.dim)
            return unknown_type();
        typed_term t;
        t.dim = compact_dimension(*q.dim);
        // A constant stands for its SI value; a number in braces is in the unit written.
        t.scale = q.constant ? 1.0 : q.si_factor;
        t.exact_scale = q.constant ? std::optional<rational>(rational(1)) : q.si_exact;
        if (q.single_unit != nullptr && q.single_unit->scale != unit_scale::absolute) {
            t.offset = q.single_unit;
            t.origin = q.single_unit->offset;
            t.point = true;
        }
        return t;
    }

    static typed_term number_type(const number_reading& reading) {
        typed_term t;
        t.numeric = true;
        t.value = reading.value;
        t.zero = reading.zero;
        return t;
    }

    [[gnu::noinline]] typed_term eval_number(const syntax::expr_node& n, std::uint32_t index) {
        const number_reading& reading = read_number(text(n.range));
        // "y*1e400": a number past a double's range would weigh as infinity, and a scale
        // rule weighing infinity sees nothing wrong; it is a finding, and the formula's
        // scale is not weighed.
        if (!reading.value && !reading.zero &&
            !std::isfinite(std::strtod(std::string(text(n.range)).c_str(), nullptr))) [[unlikely]] {
            report(rules::overflow,
                   fmt::format("the number {} is beyond the range plumb can weigh (about "
                               "1.8e308), so the formula's units cannot be compared",
                               display_text(n.range)),
                   n.range);
            return unknown_type();
        }
        typed_term t = number_type(reading);
        if (!t.zero) {
            literals_.push_back(reading.literal);
            literals_.back().node = index;
        }
        return t;
    }

    // Every symbol of every formula comes here: the rare cases are kept out of line, so that
    // the common one, a known symbol's kept type, needs no large frame.
    [[gnu::noinline]] typed_term eval_symbol(const syntax::expr_node& n) {
        const std::string_view name = text(n.range);
        symbol_entry* entry = symbols_.find(name);
        if (entry == nullptr) [[unlikely]]
            return report_undeclared(n, name);
        if (entry->checked_type) {
            entry->used = true;
            return *entry->checked_type;
        }
        return first_use_type(entry, name);
    }

    [[gnu::noinline]] typed_term first_use_type(symbol_entry* entry, std::string_view name) {
        typed_term t = declared_type(entry, name);
        // A dimension past the 16-bit form is held in this check's arena only, so a type
        // that refers to it must not outlive the check.
        if (!entry->dim || entry->compact_dim)
            entry->checked_type = t;
        return t;
    }

    [[gnu::noinline, gnu::cold]] typed_term report_undeclared(const syntax::expr_node& n,
                                                              std::string_view name) {
        {
            if (defer_unknown_)
                throw symbol_not_yet_declared{};
            diagnostic& d =
                report(rules::undeclared, fmt::format("'{}' is not declared", name), n.range);
            d.mark_label = "not declared";
            const auto near = symbols_.nearest(name);
            if (!near.empty()) {
                std::string list;
                for (std::size_t i = 0; i < near.size(); ++i)
                    list += fmt::format(
                        "{}'{}'", i == 0 ? "" : (i + 1 == near.size() ? " or " : ", "), near[i]);
                d.notes.push_back({fmt::format("did you mean {}?", list), {}});
            }
            if (symbols_.suggestions_cut_short())
                d.notes.push_back(
                    {fmt::format("similar names are no longer looked for in this file: the "
                                 "search for them stops after {} name comparisons, so that a "
                                 "file with thousands of undeclared names is still checked "
                                 "quickly",
                                 symbol_table::max_suggestion_comparisons),
                     {}});
            if (find_function(name) != nullptr)
                d.notes.push_back(
                    {fmt::format("'{}' is a function; call it as {}(x)", name, name), {}});
            else if (name == "e")
                d.notes.push_back({"for Euler's number raised to a power, e^x, write exp(x)", {}});
            else
                d.notes.push_back({fmt::format("declare it with its unit or its dimension, as in "
                                               "'{} : <unit>' or '{} : [<dimension>]'",
                                               name, name),
                                   {}});
            return unknown_type();
        }
    }

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

    // Worked out on a symbol's first use and kept in its entry.
    static typed_term declared_type(symbol_entry* entry, std::string_view name) {
        entry->used = true;
        typed_term t;
        if (!entry->dim) {
            t.known = false;
            return t;
        }
        t.dim = entry->compact_dim ? *entry->compact_dim : compact_dimension(*entry->dim);
        t.scale = entry->si_factor;
        t.exact_scale = entry->si_exact;
        t.offset = entry->offset_unit;
        if (t.offset != nullptr) {
            t.origin = t.offset->offset;
            t.point = true;
        } else if (entry->reading == 1) {
            t.point = true;
        } else if (entry->reading == -1) {
            // Declared in Δ°C or Δ°F, a temperature is a difference whatever its name.
            const bool difference_unit = entry->unit_text.starts_with("\u0394");
            const bool reading =
                (t.dim == temperature_dimension() ||
                 (t.dim == pressure_dimension() && !names_a_stress(name, entry->description))) &&
                !difference_unit && !names_a_difference(name, entry->description);
            entry->reading = reading ? 1 : 0;
            t.point = reading;
        }
        return t;
    }

    typed_term eval_sum(std::uint32_t index) {
        const bool prefer_dimensionless = index == prefer_dimensionless_;
        // Walk the left spine iteratively: a long sum must not recurse once per term.
        const std::size_t spine_base = spine_.size();
        std::uint32_t n = index;
        while (file_.nodes[n].kind == expr_kind::add ||
               file_.nodes[n].kind == expr_kind::subtract) {
            spine_.push_back(n);
            n = file_.nodes[n].lhs;
        }
        const std::size_t term_count = spine_.size() - spine_base + 1;

        const std::size_t base = operands_.size();
        const std::size_t types_base = types_.size();
        // Reserved once: growing by doubling would leave the stack up to twice the size a long
        // sum needs, and briefly three times while it moves.
        operands_.reserve(base + term_count);
        const std::size_t literal_base = literals_.size();
        typed_term result;
        result.numeric = true;
        result.zero = true;
        result.value = rational(0);
        bool inferred = false;
        for (std::size_t k = 0; k < term_count; ++k) {
            // Term k is the leftmost leaf for k == 0, else the right child of the spine node
            // k levels up from it.
            const std::uint32_t node = k == 0 ? n : file_.nodes[spine_[spine_.size() - k]].rhs;
            const bool subtracted =
                k > 0 && file_.nodes[spine_[spine_.size() - k]].kind == expr_kind::subtract;
            const operand term{push_operand_type(node, types_base, term_count), node, subtracted};
            const typed_term& t = term.type;
            result.known = result.known && t.known;
            result.numeric = result.numeric && t.numeric;
            result.zero = result.zero && t.zero;
            inferred = inferred || t.inferred;
            if (result.value && t.value) {
                try {
                    result.value = subtracted ? *result.value - *t.value : *result.value + *t.value;
                } catch (const arithmetic_overflow&) {
                    result.value.reset(); // as in a product: the value only matters to exponents
                }
            } else {
                result.value.reset();
            }
            operands_.push_back(term);
        }
        const bool last_subtracted = file_.nodes[index].kind == expr_kind::subtract;
        spine_.resize(spine_base);

        if (file_.functions == syntax::function_names::spreadsheet) [[unlikely]]
            adopt_numbers_beside_cells(base);
        const typed_term* offset_term = adopt_numbers_on_offset_scale(base);
        const scratch_region region(operands_, base, types_, types_base);
        const std::span<const operand> terms = region.view();
        agreement a = find_agreement(terms, prefer_dimensionless);
        if (!a.odd.empty() && !prefer_dimensionless &&
            read_gravity_numbers_either_way(base, a, index))
            a = find_agreement(terms, prefer_dimensionless);
        if (!a.odd.empty() && !prefer_dimensionless && read_column_and_atmosphere(base, index))
            a = find_agreement(terms, prefer_dimensionless);
        // "M = M_tm + H*t" with M in kN·m, "W_s = ρ_s*A_s + ρ_c*A_c + m_c - B_w" in N/m: the
        // terms with the other side's dimension are right, however few and wherever they are.
        if (!a.odd.empty() && a.reference && index == side_hint_node_ && side_hint_ != nullptr &&
            side_hint_->known && !(side_hint_->dim == *a.reference)) [[unlikely]] {
            const bool odd_share_the_side =
                std::all_of(a.odd.begin(), a.odd.end(), [&](std::size_t i) {
                    return terms[i].type.known && side_hint_->dim == terms[i].type.dim;
                });
            if (odd_share_the_side) {
                std::vector<std::size_t> others;
                for (std::size_t i = 0; i < terms.size(); ++i)
                    if (terms[i].type.known && !terms[i].type.zero &&
                        !(terms[i].type.dim == side_hint_->dim))
                        others.push_back(i);
                a.reference = side_hint_->dim;
                a.odd = std::move(others);
            }
        }
        if (!a.odd.empty()) {
            const std::size_t first_odd = a.odd.front();
            std::string message;
            if (terms.size() == 2) {
                message = fmt::format("cannot {} {} {} {}: their dimensions differ",
                                      last_subtracted ? "subtract" : "add", quote(terms[1].node),
                                      last_subtracted ? "from" : "to", quote(terms[0].node));
            } else {
                message =
                    fmt::format("{} does not have the dimension of the other terms of this sum",
                                quote(terms[first_odd].node));
            }
            diagnostic& d = report(rules::sum_mismatch, std::move(message),
                                   file_.nodes[terms[first_odd].node].range);
            explain(d, terms, a, "terms");
            note_atmosphere_in_another_unit(d, terms, a);
            if (a.reference && *a.reference == temperature_dimension()) [[unlikely]]
                note_zero_added_to_converted_temperature(d, terms, a);
            note_scale_zero_beside_difference(d, terms, a);
            if (!note_gravity_in_other_units(d, terms, a) &&
                !note_constant_for_other_units(d, terms, a))
                note_acceleration_or_density_apart(d, terms, a);
            note_unit_read_past_a_slash(d);
            cut_literals_to(literal_base);
            result = unknown_type();
            return result; // every return is of `result`, built in the caller's return object
        }
        if (!result.known) {
            cut_literals_to(literal_base);
            result = unknown_type(inferred);
            return result; // as above
        }
        if (a.reference)
            result.dim = *a.reference;
        if (!result.numeric)
            result.value.reset();
        if (result.numeric) {
            // A sum of numbers is one number: physics or a conversion as a whole.
            cut_literals_to(literal_base);
            if (result.value && !result.value->is_zero())
                literals_.push_back(read_literal(text(file_.nodes[index].range),
                                                 result.value->to_double(), index, result.value));
            return result;
        }
        if (offset_term != nullptr) {
            result = finish_offset_sum(terms, result, literal_base, index);
            return result; // as above
        }
        if (result.dim.is_dimensionless())
            adopt_numbers_in_scaled_unit(base);
        const std::size_t common_base = common_numbers_.size();
        factor_out_common_numbers(terms);
        // After a unit-scale finding the scale is unknown (NaN), so it is not reported again
        // further up; the dimension stays known.
        double unit = 1.0;
        // A sum that is a side of an equation: the other side says which term is off.
        sum_side_hint_ = index == side_hint_node_ ? side_hint_ : nullptr;
        sum_checked_ = index;
        result.scale = check_scales(terms, "terms of this sum", unit, &result.exact_scale)
                           ? unit
                           : std::numeric_limits<double>::quiet_NaN();
        sum_side_hint_ = nullptr;
        sum_checked_ = syntax::no_index;
        if (index == side_hint_node_) [[unlikely]]
            settle_rounded_side(result, literal_base);
        cut_literals_to(literal_base);
        if (common_numbers_.size() > common_base) [[unlikely]] {
            literals_.insert(literals_.end(), common_numbers_.begin() + common_base,
                             common_numbers_.end());
            common_numbers_.resize(common_base);
        }
        int points = 0;
        for (const auto& t : terms)
            if (t.type.point)
                points += t.subtracted ? -1 : 1;
        result.point = points == 1;
        return result;
    }

    // "F = m_1*g/1000 + m_2*g/1000" into kN is "(m_1*g + m_2*g)/1000": a number that every term
    // carries, to the same power, is a factor of the whole sum. It is taken out of each term
    // (left there as a 1) for the terms to be weighed against one another, and given to the sum,
    // to be weighed where the sum meets the rest of the formula.
    [[gnu::always_inline]] void factor_out_common_numbers(std::span<const operand> terms) {
        if (terms.size() >= 2 && terms.front().type.literal_count != 0) [[unlikely]]
            factor_out_common_numbers_of(terms);
    }

    // The numbers taken out go on common_numbers_, for the sum to put on the literal stack once
    // its terms are weighed.
    [[gnu::noinline]] void factor_out_common_numbers_of(std::span<const operand> terms) {
        constexpr std::size_t most_common = 4;
        const std::size_t base = common_numbers_.size();
        constexpr std::size_t most_terms = 16;
        if (terms.size() < 2 || terms.size() > most_terms)
            return;
        for (const auto& t : terms)
            if (!t.type.known || t.type.zero || t.type.numeric || t.type.literal_count == 0)
                return;
        const typed_term& first = terms.front().type;
        for (std::uint32_t k = 0;
             k < first.literal_count && common_numbers_.size() - base < most_common; ++k) {
            const scale_literal& candidate = literals_[first.literal_begin + k];
            if (candidate.value == 1.0)
                continue;
            std::array<std::uint32_t, most_terms> at{};
            bool everywhere = true;
            for (std::size_t i = 1; i < terms.size() && everywhere; ++i) {
                const typed_term& t = terms[i].type;
                everywhere = false;
                for (std::uint32_t j = 0; j < t.literal_count; ++j) {
                    const scale_literal& l = literals_[t.literal_begin + j];
                    if (l.value == candidate.value && l.exponent == candidate.exponent) {
                        at[i] = t.literal_begin + j;
                        everywhere = true;
                        break;
                    }
                }
            }
            if (!everywhere)
                continue;
            common_numbers_.push_back(candidate);
            read_as_quantity(literals_[first.literal_begin + k]);
            for (std::size_t i = 1; i < terms.size(); ++i)
                read_as_quantity(literals_[at[i]]);
        }
    }

    // "(R_F - 32)/1.8" with R_F a range in Δ°F: a scale's zero beside a temperature difference,
    // which has no zero to move. The finding stands; the note names the slip.
    void note_scale_zero_beside_difference(diagnostic& d, std::span<const operand> terms,
                                           const agreement& a) {
        if (!a.reference || !(*a.reference == temperature_dimension()) ||
            terms.size() > notes_for_terms_up_to)
            return;
        const operand* difference = nullptr;
        for (std::size_t i = 0; i < terms.size(); ++i) {
            const typed_term& t = terms[i].type;
            if (std::find(a.odd.begin(), a.odd.end(), i) != a.odd.end() || !t.known || t.zero)
                continue;
            if (t.point || t.offset != nullptr || !std::isfinite(t.scale))
                return;
            difference = &terms[i];
        }
        if (difference == nullptr)
            return;
        struct scale_zero {
            const char* scales;
            double value;  // the zero as written, in the difference's degrees
            double degree; // the degree's size in kelvins
        };
        // 32 °F and 273.15 K for 0 °C, 459.67 °R for 0 °F (NIST SP 811 (2008), 4.2.1.1).
        static constexpr std::array<scale_zero, 3> zeros{
            {{"\u00B0F and \u00B0C", 32.0, 5.0 / 9.0},
             {"K and \u00B0C", 273.15, 1.0},
             {"\u00B0R and \u00B0F", 459.67, 5.0 / 9.0}}};
        for_each_odd_number(terms, a, [&](std::string_view written, double value) {
            for (const scale_zero& z : zeros) {
                if (std::abs(difference->type.scale / z.degree - 1.0) > 1e-9 ||
                    std::abs(value - z.value) > half_unit_in_last_digit(written) * (1.0 + 1e-9))
                    continue;
                d.notes.push_back(
                    {fmt::format("{} is the offset between the {} scales, but {} is a "
                                 "temperature difference, which takes no offset: convert a "
                                 "difference by the size of the degree alone ({})",
                                 written, z.scales, quote(difference->node),
                                 z.degree == 1.0 ? "a kelvin and a degree Celsius are the same"
                                                 : "1 K = 1.8 \u0394\u00B0F"),
                     {}});
                return true;
            }
            return false;
        });
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

    // "ρ*g*h + 101.325" with the column in Pa: the atmosphere was written in kPa. The finding
    // stands (a bare number has no unit), but the fix is the unit, not the physics.
    // "1.8*T_K + 459.67", "T_R/1.8 + 273.15": an absolute temperature converted by its factor
    // to the other absolute scale, with that scale's offset zero added as well; as
    // "14.5*p_abs + 14.7" is for pressures, the zero counted twice.
    [[gnu::noinline]] void note_zero_added_to_converted_temperature(diagnostic& d,
                                                                    std::span<const operand> terms,
                                                                    const agreement& a) {
        if (terms.size() != 2 || a.odd.size() != 1)
            return;
        const operand& number = terms[a.odd.front()];
        const operand& reading = terms[1 - a.odd.front()];
        const typed_term& t = reading.type;
        if (!number.type.known || !number.type.numeric || number.type.literal_count != 1 ||
            number.subtracted || !t.known || t.offset != nullptr || t.literal_count == 0 ||
            !std::isfinite(t.scale))
            return;
        bool absolute_reading = false;
        for_each_factor(reading.node, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind != expr_kind::symbol || sign < 0)
                return false;
            const symbol_entry* e = symbols_.find(text(n.range));
            absolute_reading = e != nullptr && e->compact_dim &&
                               *e->compact_dim == temperature_dimension() &&
                               e->offset_unit == nullptr && e->reading == 1;
            return absolute_reading;
        });
        if (!absolute_reading)
            return;
        double converted = t.scale;
        for (std::uint32_t k = 0; k < t.literal_count; ++k) {
            const scale_literal& l = literals_[t.literal_begin + k];
            converted /= std::pow(l.value, l.exponent);
        }
        // Each absolute scale with the offset scale whose zero is a number in it (NIST SP 811
        // (2008), 4.2.1.1: 0 °C = 273.15 K, 0 °F = 459.67 °R).
        struct absolute_scale {
            const char* name;
            double kelvins;
            double other_zero;
            const char* other;
        };
        static constexpr std::array<absolute_scale, 2> scales{
            {{"K", 1.0, 273.15, "\u00B0C"}, {"\u00B0R", 5.0 / 9.0, 459.67, "\u00B0F"}}};
        const double value = literals_[number.type.literal_begin].value;
        for (const absolute_scale& sc : scales) {
            if (std::abs(converted / sc.kelvins - 1.0) > 0.005 ||
                std::abs(value / sc.other_zero - 1.0) > 3e-4)
                continue;
            d.rule = std::string(rules::offset_scale);
            d.message =
                fmt::format("{} is the zero of the {} scale in {}, added to {}, an "
                            "absolute temperature converted to {} already: the sum "
                            "counts that zero twice",
                            quote(number.node), sc.other, sc.name, quote(reading.node), sc.name);
            d.notes.push_back({fmt::format("drop the {}; it belongs only to a reading in {}",
                                           display_text(file_.nodes[number.node].range), sc.other),
                               {}});
            return;
        }
    }

    // A product with an absolute pressure reading among its factors ("14.5*p_abs").
    bool holds_absolute_pressure(std::uint32_t term) const {
        return for_each_factor(term, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind != expr_kind::symbol || sign < 0)
                return false;
            const symbol_entry* e = symbols_.find(text(n.range));
            return e != nullptr && e->compact_dim && *e->compact_dim == pressure_dimension() &&
                   e->offset_unit == nullptr && e->reading == 1;
        });
    }

    void note_atmosphere_in_another_unit(diagnostic& d, std::span<const operand> terms,
                                         const agreement& a) {
        if (!a.reference || !(*a.reference == pressure_dimension()) ||
            terms.size() > notes_for_terms_up_to)
            return;
        double others = 0.0;    // the scale the other pressures share
        double converted = 0.0; // and as their conversion factors make it
        bool readings = true;   // each other term holds an absolute reading
        for (std::size_t i = 0; i < terms.size(); ++i) {
            const typed_term& t = terms[i].type;
            if (!t.known || t.zero || std::find(a.odd.begin(), a.odd.end(), i) != a.odd.end())
                continue;
            if (!(t.dim == pressure_dimension()) || t.offset != nullptr ||
                !std::isfinite(t.scale) || (others != 0.0 && t.scale != others))
                return;
            others = t.scale;
            double scale = t.scale;
            for (std::uint32_t k = 0; k < t.literal_count; ++k) {
                const scale_literal& l = literals_[t.literal_begin + k];
                scale /= std::pow(l.value, l.exponent);
            }
            converted = scale;
            readings = readings && t.literal_count > 0 && holds_absolute_pressure(terms[i].node);
        }
        const auto named = [](double scale, double within = 1e-6) -> const pressure_unit* {
            for (const auto& u : pressure_units)
                if (std::abs(scale / u.pascals - 1.0) < within)
                    return &u;
            return nullptr;
        };
        const pressure_unit* theirs = named(others);
        if (theirs == nullptr)
            return;
        // "14.5*p_abs + 14.7", "p_2/6.895 + 14.7": the reading converted by its factor is in
        // the atmosphere's unit already, and absolute; the atmosphere is the slip, not its unit.
        // Its numbers as rounded conversions (14.5 psi per bar is 14.5038).
        const pressure_unit* as_converted = readings ? named(converted, 0.005) : nullptr;
        for_each_odd_number(terms, a, [&](std::string_view written, double value) {
            if (as_converted != nullptr && as_converted != theirs &&
                read_reference_state(pressure_dimension(), value, written, as_converted->pascals) !=
                    nullptr) {
                const std::string other = terms.size() == 2
                                              ? quote(terms[a.odd.front() == 0 ? 1 : 0].node)
                                              : std::string("the other term");
                // The zero, not the dimension, is the finding, as for "p_psia + 14.7".
                d.rule = std::string(rules::offset_scale);
                d.message = fmt::format("{} is the atmosphere in {}, added to {}, an absolute "
                                        "pressure already: the sum counts that zero twice",
                                        written, as_converted->name, other);
                d.notes.push_back({fmt::format("{} is an absolute pressure converted to {} by its "
                                               "factor; drop the {}, or convert a gauge reading",
                                               other, as_converted->name, written),
                                   {}});
                return true;
            }
            for (const auto& u : pressure_units) {
                if (&u == theirs || read_reference_state(pressure_dimension(), value, written,
                                                         u.pascals) == nullptr)
                    continue;
                // The standard atmosphere where it is one, rather than 14.7 psi's 101.353 kPa.
                double pascals = value * u.pascals;
                if (std::abs(pascals / standard_atmosphere - 1.0) < 0.005)
                    pascals = standard_atmosphere;
                const std::string others_named =
                    terms.size() == 2 ? quote(terms[a.odd.front() == 0 ? 1 : 0].node) + " is"
                                      : std::string("the other terms are");
                d.notes.push_back(
                    {fmt::format("{} reads as the atmosphere in {}, but {} in {}: write it as "
                                 "{:.6g} {}, or convert to {} first",
                                 written, u.name, others_named, theirs->name, pascals / others,
                                 theirs->name, u.name),
                     {}});
                return true;
            }
            return false;
        });
    }

    // "20.9 - O2" with O2 in %, "θ + 90" with θ in degrees: in a sum whose other terms are all
    // in one scaled dimensionless unit, a bare number is a value in that unit, as engineers
    // mean it. Where the terms are plain fractions ("1 - S/100") the number stays one too.
    // In a limit (`bounds`), no number up to 1: "RH <= 0.6" beside RH in % is a fraction's bound
    // as often as a percentage's, and the finding asks which.
    void adopt_numbers_in_scaled_unit(std::size_t base, bool bounds = false) {
        double unit = std::numeric_limits<double>::quiet_NaN();
        bool numbers = false;
        for (std::size_t i = base; i < operands_.size(); ++i) {
            const typed_term& t = operands_[i].type;
            if (!t.known || t.zero)
                continue;
            if (t.numeric) {
                numbers = true;
                continue;
            }
            const double u = unit_as_written(t);
            if (!std::isfinite(u))
                return;
            if (!std::isfinite(unit))
                unit = u;
            else if (std::abs(u / unit - 1.0) > 1e-9)
                return; // terms in different units: the scale rule speaks
        }
        if (!numbers || !std::isfinite(unit) || std::abs(unit - 1.0) <= 1e-9)
            return;
        // Only where the scale is a unit numbers are written in (%, °, ppm): in "f*L/d_mm + 4"
        // the 1000 of L in m over d in mm is no unit the 4 is in.
        // Nor where the term converts out of it: "θ_deg*pi/180 + 0.005" is in radians.
        for (std::size_t i = base; i < operands_.size(); ++i) {
            const typed_term& t = operands_[i].type;
            if (t.known && !t.zero && !t.numeric &&
                (!holds_scaled_ratio_unit(operands_[i].node) ||
                 (t.literal_count > 0 && holds_pi(operands_[i].node))))
                return;
        }
        // A number's type is shared only with numbers equal to it, which change alike.
        // But not 1: "1 - L" with L in % is the complement of a fraction written beside a
        // percentage, the slip, far more often than 1 % less L.
        for (std::size_t i = base; i < operands_.size(); ++i) {
            auto& t = const_cast<typed_term&>(operands_[i].type);
            if (t.known && !t.zero && t.numeric && !(t.value && *t.value == rational(1)) &&
                !(bounds && t.value && !(rational(1) < *t.value)))
                t.scale = std::numeric_limits<double>::quiet_NaN(); // the others' unit
        }
    }

    // "=(C22 + C37 + 50 + 75)/1000" with the cells in mm: a spreadsheet's numbers carry no
    // units, so an allowance typed into a sum of cells of one unit is in that unit, as the
    // engineer means it. Not beside pressures and temperatures, where a number is a zero or
    // the atmosphere and the rules for those read it.
    void adopt_numbers_beside_cells(std::size_t base) {
        const typed_term* unit = nullptr;
        bool numbers = false;
        for (std::size_t i = base; i < operands_.size(); ++i) {
            const typed_term& t = operands_[i].type;
            if (!t.known || t.zero)
                continue;
            if (t.numeric) {
                numbers = numbers || t.dim.is_dimensionless();
                continue;
            }
            if (t.offset != nullptr || t.dim.is_dimensionless() || t.dim == pressure_dimension() ||
                t.dim == temperature_dimension() ||
                (unit != nullptr && !(t.dim == unit->dim && t.scale == unit->scale)))
                return;
            unit = &t;
        }
        if (!numbers || unit == nullptr)
            return;
        // "=9.81*C21 + 101.325": a term with a number that may be a quantity's (a column's
        // pressure), beside the atmosphere, is for the sum's rules to read.
        if (unit->literal_count > 0 && atmosphere_among_numbers(base)) [[unlikely]]
            return;
        const compact_dimension dim = unit->dim;
        for (std::size_t i = base; i < operands_.size(); ++i) {
            auto& t = const_cast<typed_term&>(operands_[i].type);
            if (t.known && !t.zero && t.numeric && t.dim.is_dimensionless()) {
                t.dim = dim;
                t.scale = std::numeric_limits<double>::quiet_NaN(); // the others' unit
            }
        }
    }

    // Whether a bare number among the sum's terms is the standard atmosphere in one of the
    // trades' pressure units (101.325, 14.7, 1.01325).
    bool atmosphere_among_numbers(std::size_t base) const {
        for (std::size_t i = base; i < operands_.size(); ++i) {
            const typed_term& t = operands_[i].type;
            if (!t.known || !t.numeric || t.literal_count != 1)
                continue;
            const scale_literal& l = literals_[t.literal_begin];
            const std::string_view written = text(file_.nodes[l.node].range);
            for (const auto& u : pressure_units)
                if (read_reference_state(pressure_dimension(), l.value, written, u.pascals) !=
                    nullptr)
                    return true;
        }
        return false;
    }

    // In a sum with a value on an offset scale, a bare number is a value in that unit
    // ("T_F = 1.8*T_C + 32"). Returns the first such value, or null.
    const typed_term* adopt_numbers_on_offset_scale(std::size_t base) {
        const typed_term* offset_term = nullptr;
        for (std::size_t i = base; i < operands_.size() && offset_term == nullptr; ++i)
            if (operands_[i].type.known && operands_[i].type.offset != nullptr)
                offset_term = &operands_[i].type;
        // A reading on an absolute scale may be shifted onto an offset one (T_K - 273.15).
        for (std::size_t i = base; i < operands_.size() && offset_term == nullptr; ++i)
            if (operands_[i].type.known && operands_[i].type.point &&
                operands_[i].type.literal_count == 0)
                offset_term = &operands_[i].type;
        if (offset_term == nullptr)
            return nullptr;
        for (std::size_t i = base; i < operands_.size(); ++i) {
            // Shared only among operands of one type, which all change alike.
            auto& t = const_cast<typed_term&>(operands_[i].type);
            if (t.numeric && t.value && !t.zero && t.dim.is_dimensionless()) {
                t.dim = offset_term->dim;
                t.scale = std::numeric_limits<double>::quiet_NaN(); // the others' unit
                t.exact_scale.reset();
            }
        }
        return offset_term;
    }

    // A number or a quantity in a sum on an offset scale may shift the zero: 273.15 from °C to
    // K, 32 between °F and °C, 14.696 psi or {p_atm} from gauge to absolute.
    struct shift {
        double written = 0.0;   // in the sum's unit (bare numbers), signed
        double si = 0.0;        // already in SI (quantities), signed
        double tolerance = 0.0; // relative
    };

    bool is_shift_candidate(const operand& op) const {
        if (!op.type.known || op.type.zero)
            return false;
        if (op.type.numeric && op.type.value)
            return true;
        return file_.nodes[op.node].kind == expr_kind::quantity && op.type.offset == nullptr;
    }

    shift shift_of(const operand& op) const {
        shift s;
        const double sign = op.subtracted ? -1.0 : 1.0;
        if (op.type.numeric && op.type.value) {
            s.written = sign * op.type.value->to_double();
            // Handbooks print the atmosphere 101.35 kPa (Metcalf & Eddy's saturator pressure,
            // from memory) as well as 101.3 and 101.325: a zero is read within 0.03 % of its
            // value whatever the digits. The scales' zeros lie far further apart than that.
            s.tolerance = std::max(
                op.type.literal_count == 1 ? literals_[op.type.literal_begin].tolerance : 1e-9,
                3e-4);
            return s;
        }
        const syntax::expr_node& n = file_.nodes[op.node];
        const syntax::quantity_literal& q = file_.quantities[n.lhs];
        s.si = sign * quantity_si_value(n);
        const std::string_view t = text(n.range);
        const std::string_view number = t.substr(0, t.find_first_of(" \t{"));
        s.tolerance = q.constant || number.empty()
                          ? 1e-9
                          : read_literal(number, std::abs(s.si) / q.si_factor, 0).tolerance;
        return s;
    }

    // Where a scale of this dimension can have its zero: absolute, or an offset unit's zero.
    bool recognised_origin(double origin, double tolerance, const compact_dimension& dim,
                           std::span<const operand> terms) const {
        const double slack = tolerance + 1e-9 * std::abs(origin) + 1e-9;
        if (std::abs(origin) <= slack)
            return true;
        for (const auto& t : terms)
            if (t.type.offset != nullptr && std::abs(t.type.offset->offset - origin) <= slack)
                return true;
        for (const auto& row : offset_rows())
            if (row.dim == dim && std::abs(row.unit->offset - origin) <= slack)
                return true;
        return false;
    }

    // "(T_ho - t_ci - 32)/1.8", "(p_1g - p_2g) + 14.7": a scale's zero, or the step between
    // two scales' zeros, added to a difference of readings, which has no zero to move. The
    // reading conversion applied to a difference; a difference converts by the factor alone.
    bool report_zero_beside_difference_of_readings(std::span<const operand> terms, double unit,
                                                   const compact_dimension& dim) {
        bool readings = false;
        for (const auto& t : terms)
            readings = readings || (t.type.known && t.type.point && !is_shift_candidate(t));
        if (!readings || !(unit > 0) || !std::isfinite(unit))
            return false;
        for (const auto& t : terms) {
            if (!is_shift_candidate(t))
                continue;
            const shift sh = shift_of(t);
            const double si = std::abs(sh.si + sh.written * unit);
            const double slack = si * sh.tolerance + 1e-9 * si;
            if (!(si > 0))
                continue;
            const auto& rows = offset_rows();
            for (std::size_t a = 0; a < rows.size(); ++a) {
                if (!(rows[a].dim == dim))
                    continue;
                for (std::size_t b = a; b < rows.size(); ++b) {
                    if (!(rows[b].dim == dim))
                        continue;
                    // A zero itself (b == a), or the step between two zeros.
                    const double step = b == a
                                            ? rows[a].unit->offset
                                            : std::abs(rows[a].unit->offset - rows[b].unit->offset);
                    if (!(step > 0) || std::abs(si - step) > slack)
                        continue;
                    diagnostic& d = report(
                        rules::offset_scale,
                        fmt::format(
                            "{} is {} but is added to a difference of readings, which "
                            "has no zero to move",
                            display_text(file_.nodes[t.node].range),
                            b == a ? fmt::format("the zero of the {} scale", rows[a].unit->symbol)
                                   : fmt::format("the step between the zeros of the {} "
                                                 "and {} scales",
                                                 rows[a].unit->symbol, rows[b].unit->symbol)),
                        file_.nodes[t.node].range);
                    add_term(d, t);
                    d.notes.push_back({"a difference of two readings converts by the factor "
                                       "between the units alone (a °F difference / 1.8 is a K "
                                       "difference); only a single reading needs the zero",
                                       {}});
                    return true;
                }
            }
        }
        return false;
    }

    // The table's (or the formula's) offset unit whose zero is `origin`, to name the scale.
    const unit_definition* scale_named(double origin, double tolerance,
                                       const compact_dimension& dim,
                                       std::span<const operand> terms) const {
        const double slack = tolerance + 1e-9 * std::abs(origin) + 1e-9;
        for (const auto& t : terms)
            if (t.type.offset != nullptr && std::abs(t.type.offset->offset - origin) <= slack)
                return t.type.offset;
        // A zero known to no bound names no scale of the table: any would match.
        if (std::isfinite(slack))
            for (const auto& row : offset_rows())
                if (row.dim == dim && std::abs(row.unit->offset - origin) <= slack)
                    return row.unit;
        for (const auto& t : terms)
            if (t.type.offset != nullptr)
                return t.type.offset;
        return nullptr;
    }

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

    // Whether an absolute pressure among the sum's plain terms is in the unit `scale` (SI per
    // written value), the unit a gauge term's divisor takes it into.
    static bool gauge_divided_into_absolute_unit(std::span<const operand> terms, double scale) {
        return std::any_of(terms.begin(), terms.end(), [&](const operand& o) {
            return o.type.known && o.type.point && o.type.offset == nullptr &&
                   o.type.dim == pressure_dimension() && o.type.literal_count == 0 &&
                   std::abs(o.type.scale / scale - 1.0) < 1e-9;
        });
    }

    typed_term finish_offset_sum(std::span<const operand> terms, typed_term result,
                                 std::size_t literal_base, std::uint32_t index) {
        // The terms with units (not the numbers that shift the zero).
        std::size_t unit_terms = 0;
        std::size_t only = 0;
        for (std::size_t i = 0; i < terms.size(); ++i)
            if (terms[i].type.known && !terms[i].type.zero && !is_shift_candidate(terms[i])) {
                ++unit_terms;
                only = i;
            }
        // Zeros of the values on a scale, signed, and the absolute pressures added to gauge ones.
        double origin = 0.0;
        double origin_tolerance = 0.0;
        int points = 0;
        int gauges = 0;
        int absolute_pressures_added = 0;
        int absolute_pressures_subtracted = 0;
        int offset_temperatures = 0;
        int kelvins_added = 0;
        double gauge_zero = 0.0;
        // The same with each reading's weight (T_1/2 + T_2/2 is one reading, T_s + T_a/2 is
        // not), where every weight is followed.
        std::optional<rational> weight = rational(0);
        double weighted_origin = 0.0;
        for (const auto& t : terms) {
            if (!t.type.known || t.type.zero || is_shift_candidate(t) || !t.type.point)
                continue;
            const double sign = t.subtracted ? -1.0 : 1.0;
            // "c + (γ*z - u)": a group that subtracts a reading counts as one subtracted.
            const bool negative = t.type.weight_denominator != 0 && t.type.weight_numerator < 0;
            origin += (negative ? -sign : sign) * t.type.origin;
            origin_tolerance += t.type.origin_tolerance;
            points += (t.subtracted != negative) ? -1 : 1;
            // A mean's weights are small fractions (1/2, 1/3, 3/5); a larger number beside a
            // reading (100*p_bar to kPa, 6.895*p_psig) converts it, and is no weight.
            std::optional<rational> w = weight_of(t.type);
            if (w && (std::abs(w->num()) > 12 || w->den() > 12))
                w.reset();
            // "p_b + p_sup/10" with p_sup in mbar g and p_b in kPa: the 10 takes the gauge
            // reading into the barometer's unit, and weighs nothing; "p_b + p_g/10" with both
            // in kPa weighs a tenth of the reading.
            if (w && w->num() == 1 && w->den() > 1 && t.type.offset != nullptr &&
                t.type.offset->scale == unit_scale::gauge &&
                gauge_divided_into_absolute_unit(terms, t.type.scale * w->den())) [[unlikely]]
                w = rational(1);
            if (weight && w && std::isfinite(t.type.origin_tolerance)) {
                try {
                    weight = t.subtracted ? *weight - *w : *weight + *w;
                    weighted_origin += sign * w->to_double() * t.type.origin;
                } catch (const std::exception&) {
                    weight.reset();
                }
            } else {
                weight.reset();
            }
            if (t.type.offset != nullptr && t.type.offset->scale == unit_scale::gauge &&
                !t.subtracted) {
                ++gauges;
                gauge_zero = t.type.offset->offset;
            } else if (t.type.offset == nullptr && t.type.dim == pressure_dimension() &&
                       !t.subtracted) {
                ++absolute_pressures_added;
            } else if (t.type.offset == nullptr && t.type.dim == pressure_dimension() &&
                       !negative) {
                ++absolute_pressures_subtracted;
            } else if (t.type.offset != nullptr && t.type.dim == temperature_dimension() &&
                       !t.subtracted) {
                ++offset_temperatures;
            } else if (t.type.offset == nullptr && t.type.dim == temperature_dimension() &&
                       !t.subtracted) {
                ++kelvins_added;
            }
        }
        // "t_j = t_v + BPE" with BPE in K: a temperature on an absolute scale added to a °C
        // reading is a difference (the SI Brochure, 2.3.1, gives differences in K); two
        // readings added make no temperature. (T_K - T_C, the ice point, subtracts the °C one.)
        if (offset_temperatures > 0 && kelvins_added > 0) {
            points -= kelvins_added;
            if (weight)
                weight = *weight - rational(kelvins_added);
        }
        // "p_g + p_atm": an absolute pressure added to a gauge reading supplies its zero, and
        // any further ones ("p_g + p_atm + p_fric") are drops: one atmosphere at most. Where a
        // number is added too ("p_g + p_fric + p_static + 14.7"), the number is the
        // atmosphere and every absolute pressure added is a drop.
        bool number_added = false;
        bool number_subtracted = false;
        for (const auto& t : terms)
            if (is_shift_candidate(t))
                (t.subtracted ? number_subtracted : number_added) = true;
        if (gauges > 0 && absolute_pressures_added > 0) {
            if (!number_added) {
                origin -= gauge_zero;
                weighted_origin -= gauge_zero;
            }
            // The gauge reading and the atmosphere make one reading; drops are no readings.
            points -= absolute_pressures_added;
            if (weight)
                weight = *weight - rational(absolute_pressures_added);
        }
        // "p_sat + p_air": absolute pressures added are partial pressures making one absolute
        // reading (Dalton's law), not a reading weighing two; set equal to a gauge reading its
        // zero is the finding.
        if (!number_added && !number_subtracted && gauges == 0 && points >= 2 &&
            absolute_pressures_added == points && absolute_pressures_subtracted == 0 &&
            result.dim == pressure_dimension()) {
            points = 1;
            weight = rational(1);
        }
        // The mirror: "p_bh - 14.7 - p_hyd", an absolute reading less the atmosphere written as
        // a number, is a gauge reading, and the further pressures subtracted are drops; unless
        // one of them names the atmosphere, which would then be taken off twice.
        if (gauges == 0 && number_subtracted && absolute_pressures_added == 1 &&
            absolute_pressures_subtracted > 0) [[unlikely]] {
            const bool atmosphere_subtracted =
                std::any_of(terms.begin(), terms.end(), [&](const operand& t) {
                    return t.subtracted && names_atmosphere(t.node);
                });
            if (atmosphere_subtracted && report_atmosphere_taken_twice(terms, only)) {
                cut_literals_to(literal_base);
                return unknown_type();
            }
            if (!number_added && !atmosphere_subtracted) {
                points += absolute_pressures_subtracted;
                if (weight)
                    weight = *weight + rational(absolute_pressures_subtracted);
            }
        }
        // `unit_tolerance`: how far the unit may be off, relative, when rounded numbers
        // converted it (6.895 for 6.894757 in "6.895*p_g + 101.325").
        const auto shifted = [&](double unit, double unit_tolerance, double* tolerance) {
            double o = origin;
            double tol = origin_tolerance;
            for (const auto& t : terms)
                if (is_shift_candidate(t)) {
                    const shift s = shift_of(t);
                    const double si = s.si + s.written * unit;
                    o -= si;
                    tol += std::abs(si) * s.tolerance + std::abs(s.written * unit) * unit_tolerance;
                }
            *tolerance = tol;
            return o;
        };
        double unit_tolerance = 0.0;
        bool has_shift = false;
        for (const auto& t : terms)
            has_shift = has_shift || is_shift_candidate(t);

        double unit = terms[only].type.scale;
        bool keep_literals = false;
        bool one_bar_atmosphere = false;
        if (unit_terms == 1) {
            // "1.8*T_C + 32": the numbers that multiply the one value with a unit may convert
            // it; the choice that puts the zero where some scale has one is the conversion.
            const operand& term = terms[only];
            keep_literals = true;
            if (has_shift) {
                const std::span<const scale_literal> lits(
                    literals_.data() + term.type.literal_begin,
                    std::min<std::size_t>(term.type.literal_count, 8));
                // A number times one reading, with a number added ("6.895*p_g + 14.7"): the
                // added number is in the product's unit, so the multiplier must be a
                // conversion. Only a mean ((T_1 + T_2)/2 + 273.15) keeps the reading's unit.
                const bool multiplied_reading =
                    !lits.empty() && std::isfinite(term.type.origin_tolerance);
                bool found = false;
                for (std::uint32_t mask = multiplied_reading ? 1 : 0; mask < (1U << lits.size());
                     ++mask) {
                    double product = 1.0;
                    double product_tolerance = 0.0;
                    for (std::size_t k = 0; k < lits.size(); ++k)
                        if ((mask >> k) & 1U) {
                            product *= std::pow(lits[k].value, lits[k].exponent);
                            product_tolerance += lits[k].tolerance * std::abs(lits[k].exponent);
                        }
                    double tol = 0.0;
                    const double o = shifted(term.type.scale / product, product_tolerance, &tol);
                    if (recognised_origin(o, tol, term.type.dim, terms)) {
                        unit = term.type.scale / product;
                        unit_tolerance = product_tolerance;
                        // The numbers stay with the term: where its sides meet, a rounded
                        // factor (14.5 for 14.5038) is weighed with its printed digits.
                        keep_literals = true;
                        found = true;
                        break;
                    }
                }
                // "1.1*p_set + 14.7": a gauge reading scaled by an allowance (10 % over the set
                // pressure) keeps its zero at the atmosphere, so the added number is in the
                // reading's own unit. Tried only after every conversion, and only for numbers
                // near 1 that look like no conversion.
                const bool allowance_only =
                    multiplied_reading && term.type.offset != nullptr &&
                    term.type.offset->scale == unit_scale::gauge &&
                    std::all_of(lits.begin(), lits.end(), [](const scale_literal& l) {
                        return std::abs(l.exponent) == 1.0 && l.value >= 0.5 && l.value <= 2.0 &&
                               !looks_like_conversion(l, true);
                    });
                if (!found && allowance_only) {
                    double tol = 0.0;
                    const double o = shifted(term.type.scale, 0.0, &tol);
                    if (recognised_origin(o, tol, term.type.dim, terms)) {
                        unit = term.type.scale;
                        found = true;
                    }
                }
                // "(p_e + 1)/(p_e - p_0)" in bar g: EN 12828's expansion vessel takes the
                // atmosphere as 1 bar (100 kPa), 1.3 % under the standard one; only that round
                // figure, added to a gauge reading in bar or kPa inside a side (a whole side
                // set equal to an absolute pressure is read as the site's barometer instead).
                if (!found && lits.empty() && !is_whole_side(index) &&
                    term.type.offset != nullptr && term.type.offset->scale == unit_scale::gauge &&
                    (term.type.scale == 1e5 || term.type.scale == 1e3)) {
                    bool round_atmosphere = true;
                    for (const auto& t : terms)
                        if (is_shift_candidate(t))
                            round_atmosphere = round_atmosphere && t.type.numeric &&
                                               !t.subtracted &&
                                               shift_of(t).written * term.type.scale == 1e5;
                    double tol = 0.0;
                    one_bar_atmosphere =
                        round_atmosphere && std::abs(shifted(term.type.scale, 0.0, &tol)) <=
                                                0.014 * standard_atmosphere;
                }
                if (multiplied_reading && !found) {
                    // No conversion lands the zero: read every number as one, so that the sum
                    // is the reading moved by a difference and its zero is compared as such.
                    double product = 1.0;
                    for (const auto& l : lits) {
                        product *= std::pow(l.value, l.exponent);
                        unit_tolerance += l.tolerance * std::abs(l.exponent);
                    }
                    unit = term.type.scale / product;
                }
            }
        } else if (!(has_shift && converted_alike(terms, shifted, result.dim, unit))) {
            // Where every term has a unit (p_2 + ρ*g*Δz, T_1 - T_2), they are the terms
            // themselves, in order: no list to allocate.
            std::vector<operand> unit_operands;
            if (unit_terms != terms.size())
                for (const auto& t : terms)
                    if (t.type.known && !t.type.zero && !is_shift_candidate(t))
                        unit_operands.push_back(t);
            if (!check_scales(unit_terms == terms.size() ? terms
                                                         : std::span<const operand>(unit_operands),
                              "terms of this sum", unit)) {
                cut_literals_to(literal_base);
                return unknown_type();
            }
        }
        double tolerance = origin_tolerance;
        double final_origin = origin;
        bool shifted_to_a_zero = false;
        if (has_shift) {
            double tol = 0.0;
            const double o = shifted(unit, unit_tolerance, &tol);
            // A number that does not land the zero on a scale is a difference (T + 5).
            if (recognised_origin(o, tol, result.dim, terms)) {
                final_origin = o;
                tolerance = tol;
                shifted_to_a_zero = true;
            } else if (one_bar_atmosphere) {
                final_origin = 0.0;
                tolerance = std::abs(o);
                shifted_to_a_zero = true;
            }
        }
        if (shifted_to_a_zero && gauges > 0 && std::abs(final_origin) <= tolerance + 1e-9)
            warn_sea_level_atmosphere_at_site(terms, unit);
        if (has_shift && !shifted_to_a_zero && points == 0 && unit_terms >= 2 &&
            report_zero_beside_difference_of_readings(terms, unit, result.dim)) {
            cut_literals_to(literal_base);
            return unknown_type();
        }
        if (has_shift && !shifted_to_a_zero && points == 1 && std::abs(origin) <= 1e-9 &&
            report_zero_added_twice(terms, unit, result.dim)) {
            cut_literals_to(literal_base);
            return unknown_type();
        }
        // "(10 - T_w)": a reference less a reading, the difference the other way round.
        if (has_shift && !shifted_to_a_zero && points == -1 &&
            std::any_of(terms.begin(), terms.end(),
                        [&](const operand& t) { return is_shift_candidate(t) && !t.subtracted; }))
            result.reading_or_difference = true;
        if (has_shift && !shifted_to_a_zero && points == 1) {
            for (const auto& t : terms) {
                if (!is_shift_candidate(t) || !t.subtracted)
                    continue;
                const shift sh = shift_of(t);
                const double si = std::abs(sh.si + sh.written * unit);
                // "T_C - 273.15": the conversion, with the wrong sign.
                if (origin > 0 && std::abs(si - origin) <= si * sh.tolerance + 1e-9 * origin) {
                    const unit_definition* named = scale_named(origin, 0.0, result.dim, terms);
                    diagnostic& d = report(
                        rules::offset_scale,
                        fmt::format("{} is subtracted from a reading on the {} scale: that moves "
                                    "its zero twice as far, it does not convert it",
                                    display_text(file_.nodes[t.node].range),
                                    named != nullptr ? named->symbol : "offset"),
                        file_.nodes[t.node].range);
                    add_term(d, t);
                    d.notes.push_back({fmt::format("to convert to the absolute scale, add it: "
                                                   "(... + {})",
                                                   display_text(file_.nodes[t.node].range)),
                                       {}});
                    cut_literals_to(literal_base);
                    return unknown_type();
                }
                // "(T - 20)": the difference from a reference reading, where a factor.
                result.reading_or_difference = true;
            }
        }
        if (keep_literals) {
            // Pass the one term's numbers on: the conversion may be decided further up.
            const operand& term = terms[only];
            std::copy(literals_.begin() + term.type.literal_begin,
                      literals_.begin() + term.type.literal_begin + term.type.literal_count,
                      literals_.begin() + static_cast<std::ptrdiff_t>(literal_base));
            cut_literals_to(literal_base + term.type.literal_count);
            unit = terms[only].type.scale;
        } else {
            cut_literals_to(literal_base);
        }
        result.scale = unit;
        result.exact_scale.reset();
        const double slack = tolerance + 1e-9 * std::abs(final_origin) + 1e-9;
        // Readings whose weights make neither one reading nor a difference: "T_s + T_a/2",
        // "T_hi + T_ho" before it is halved. Kept with their weight, for a factor to bring it
        // to 1 ((T_1 + T_2)/2) or for the equation to report.
        // Where every weight is 1 or -1 the count of readings below says the same.
        if (!has_shift && unit_terms >= 2 && weight && !(*weight == rational(1)) &&
            !weight->is_zero() && !(*weight == rational(points))) {
            const double w = weight->to_double();
            result.point = true;
            result.origin = weighted_origin / w;
            result.origin_tolerance = tolerance / std::abs(w);
            result.offset = std::abs(result.origin) > slack
                                ? scale_named(result.origin, slack, result.dim, terms)
                                : nullptr;
            set_weight(result, weight);
            result.weighted_sum = result.weight_denominator != 0;
            return result;
        }
        if (points == 0) {
            if (std::abs(final_origin) > slack) {
                const unit_definition* zero =
                    has_shift || !is_whole_side(index)
                        ? nullptr
                        : subtracted_scale_zero(terms, final_origin, slack);
                if (zero != nullptr) {
                    result.point = true;
                    result.origin = 0.0;
                    result.origin_tolerance = tolerance;
                    result.zero_of = zero;
                    return result;
                }
                report_mixed_scales(terms, final_origin);
                cut_literals_to(literal_base);
                return unknown_type();
            }
            result.absolute_pressure_difference =
                !has_shift && result.dim == pressure_dimension() &&
                std::all_of(terms.begin(), terms.end(), [](const operand& t) {
                    return !t.type.known || !t.type.point || t.type.offset == nullptr;
                });
            return result; // an ordinary difference
        }
        result.point = true;
        if (points != 1) {
            // A sum of two readings on one scale, halved for the mean: its zero is the scale's.
            result.offset = scale_named(final_origin / points, slack, result.dim, terms);
            result.origin = final_origin / points;
            result.origin_tolerance = std::numeric_limits<double>::infinity();
            // Until halved, the sum weighs 2: "T_m = T_hi + T_ho" is reported at the equation.
            if (weight && !has_shift && !weight->is_zero()) {
                set_weight(result, weight);
                result.weighted_sum = result.weight_denominator != 0 && !(*weight == rational(1));
            }
            return result;
        }
        result.origin = final_origin;
        result.origin_tolerance = tolerance;
        result.offset = std::abs(final_origin) > slack
                            ? scale_named(final_origin, slack, result.dim, terms)
                            : nullptr;
        return result;
    }

    // The site's barometer, where the file declares one that is not the standard atmosphere:
    // "p_b : kPa "site barometric pressure, 96.2 kPa"" or "p_atm : psia = 12.2". Worked out at
    // the first gauge reading made absolute with a number, once per file.
    const site_barometer* declared_site_barometer() {
        if (site_barometer_searched_)
            return site_barometer_.name.empty() ? nullptr : &site_barometer_;
        site_barometer_searched_ = true;
        for (const syntax::declaration& decl : file_.declarations) {
            if (!decl.kind.dim || decl.name_count == 0 ||
                (decl.kind.single_unit != nullptr && decl.kind.single_unit->offset != 0.0))
                continue;
            const std::optional<compact_dimension> dim = compact_dimension::fitted(*decl.kind.dim);
            if (!dim || !(*dim == pressure_dimension()))
                continue;
            const std::string_view name = text(file_.names[decl.first_name].name);
            const std::string_view description = text(decl.description);
            const auto says = [&](std::string_view word) {
                return description.find(word) != std::string_view::npos;
            };
            // "suction vacuum gauge, 62 kPa below atmosphere" names the atmosphere but is none.
            if (!names_the_atmosphere(name, description) || says("standard") || says("vacuum") ||
                says("below") || says("gauge"))
                continue;
            const double written = declared_number(decl);
            const double pascals = written * decl.kind.si_factor;
            // The file's atmosphere is the sea level's: no site barometer to hold sums to.
            if (pascals > 0.99 * standard_atmosphere && pascals <= 1.005 * standard_atmosphere)
                return nullptr;
            // A site below sea level by more than the Dead Sea is no site; above 5200 m the air
            // is thinner than any plant is built in (the highest mines and observatories; the
            // standard atmosphere, from memory, has 52.7 kPa there).
            if (!(pascals >= highest_site_atmosphere * standard_atmosphere &&
                  pascals <= 0.99 * standard_atmosphere))
                continue;
            site_barometer_ = {name, pascals};
            return &site_barometer_;
        }
        return nullptr;
    }

    // The value a declaration gives, after its `=` or in its description beside its unit
    // ("..., 96.2 kPa"); NaN where it gives none.
    double declared_number(const syntax::declaration& decl) const {
        constexpr double none = std::numeric_limits<double>::quiet_NaN();
        if (decl.value.end > decl.value.begin)
            return written_number(decl.value);
        const std::string_view description = text(decl.description);
        const std::string_view unit = text(decl.spec);
        if (unit.empty())
            return none;
        for (std::size_t at = description.find(unit); at != std::string_view::npos;
             at = description.find(unit, at + 1)) {
            std::size_t end = at;
            while (end > 0 && description[end - 1] == ' ')
                --end;
            std::size_t begin = end;
            while (begin > 0 && (std::isdigit(static_cast<unsigned char>(description[begin - 1])) ||
                                 description[begin - 1] == '.'))
                --begin;
            const bool unit_ends =
                at + unit.size() == description.size() ||
                !std::isalnum(static_cast<unsigned char>(description[at + unit.size()]));
            if (begin < end && unit_ends &&
                std::isdigit(static_cast<unsigned char>(description[begin])))
                return std::strtod(std::string(description.substr(begin, end - begin)).c_str(),
                                   nullptr);
        }
        return none;
    }

    // "p_g + 101.325" in a file that declares the site's barometer at 96.2 kPa: the gauge
    // reading is made absolute with the sea-level atmosphere, several kPa off at the site.
    void warn_sea_level_atmosphere_at_site(std::span<const operand> terms, double unit) {
        for (const auto& t : terms) {
            if (!is_shift_candidate(t) || t.subtracted)
                continue;
            const shift sh = shift_of(t);
            const double added = sh.si + sh.written * unit;
            if (std::abs(added / standard_atmosphere - 1.0) > 0.015)
                continue;
            const site_barometer* site = declared_site_barometer();
            if (site == nullptr || std::abs(added / site->pascals - 1.0) <= 0.02)
                return;
            const double height =
                44330.8 * (1.0 - std::pow(site->pascals / standard_atmosphere, 0.190263));
            diagnostic& d = report(
                rules::offset_scale,
                fmt::format("{} is the atmosphere at sea level, but this file declares the "
                            "site's barometer '{}' ({} kPa, as the standard atmosphere has about "
                            "{} m up): the absolute pressure comes out {} kPa high",
                            display_text(file_.nodes[t.node].range), site->name,
                            format_factor(site->pascals / 1000.0),
                            static_cast<long>(std::round(std::max(0.0, height) / 10.0) * 10),
                            format_factor(std::round((added - site->pascals) / 100.0) / 10.0)),
                file_.nodes[t.node].range);
            d.level = severity::warning;
            d.notes.push_back({fmt::format("a gauge reading plus the local atmosphere is "
                                           "absolute: write (... + {})",
                                           site->name),
                               {}});
            return;
        }
    }

    // Whether a symbol's name or description calls it a gauge reading (p_g, "gauge pressure").
    bool named_gauge(std::uint32_t node) const {
        if (file_.nodes[node].kind != expr_kind::symbol)
            return false;
        const std::string_view name = text(file_.nodes[node].range);
        const symbol_entry* entry = symbols_.find(name);
        const std::string_view description = entry != nullptr ? entry->description : "";
        // "p_mg : psia "memory gauge, which records absolute"": a unit or a description that
        // says absolute outright wins over the instrument's name.
        const std::string_view unit = entry != nullptr ? entry->unit_text : "";
        if (unit.find("psia") != std::string_view::npos ||
            unit.find("bara") != std::string_view::npos ||
            unit.find("abs") != std::string_view::npos ||
            description.find("absolute") != std::string_view::npos)
            return false;
        return name.ends_with("_g") || name.find("gauge") != std::string_view::npos ||
               name.find("_g_") != std::string_view::npos ||
               description.find("gauge") != std::string_view::npos;
    }

    // "p_1 = p_2 + 14.7" with both in psia, "T_2 = T_1 + 460" in °R: a scale's zero added to a
    // reading that is already absolute, so the atmosphere or the 459.67 is counted twice.
    bool report_zero_added_twice(std::span<const operand> terms, double unit,
                                 const compact_dimension& dim) {
        for (const auto& t : terms) {
            if (!is_shift_candidate(t) || t.subtracted)
                continue;
            const shift sh = shift_of(t);
            const double si = std::abs(sh.si + sh.written * unit);
            for (const auto& row : offset_rows()) {
                const double zero = std::abs(row.unit->offset);
                if (!(row.dim == dim) || zero == 0.0 ||
                    std::abs(si - zero) > si * sh.tolerance + 1e-9 * zero)
                    continue;
                const operand* reading = nullptr;
                for (const auto& r : terms)
                    if (!is_shift_candidate(r) && r.type.known && r.type.point)
                        reading = &r;
                // "p_g : psi "gauge pressure"": declared loosely in an absolute unit, but named
                // a gauge reading, which is what the atmosphere is added to.
                if (reading != nullptr && row.unit->scale == unit_scale::gauge &&
                    named_gauge(reading->node))
                    return false;
                const bool gauge = row.unit->scale == unit_scale::gauge;
                const std::string zero_of =
                    gauge ? std::string("the atmosphere, the zero of gauge pressures")
                          : fmt::format("the zero of the {} scale", row.unit->symbol);
                diagnostic& d = report(
                    rules::offset_scale,
                    fmt::format("{} is {}, added to {}, a reading already on an absolute scale: "
                                "the sum counts that zero twice",
                                display_text(file_.nodes[t.node].range), zero_of,
                                reading != nullptr ? quote(reading->node) : "a reading"),
                    file_.nodes[t.node].range);
                add_term(d, t);
                if (reading != nullptr)
                    add_term(d, *reading);
                d.notes.push_back(
                    {gauge ? std::string("a gauge reading plus the atmosphere is absolute; a "
                                         "reading declared absolute needs nothing added (declare "
                                         "it in psig, barg or kPag if it is a gauge reading)")
                           : fmt::format("a {} reading plus {:g} is absolute; a reading declared "
                                         "absolute needs nothing added (declare it in {} if it "
                                         "is a {} reading)",
                                         row.unit->symbol, row.unit->offset / row.unit->factor,
                                         row.unit->symbol, row.unit->symbol),
                     {}});
                return true;
            }
            if (report_zero_in_another_unit_added(t, sh, unit, dim, terms))
                return true;
        }
        return false;
    }

    // "p_k + 14.7" with p_k an absolute reading in kPa, "T_K + 459.67": a scale's zero as
    // printed in another unit (the atmosphere in psi, the °F scale's zero in °R) is added to a
    // reading already absolute. Read in the sum's own unit it would be a small shift (14.7
    // kPa), but no engineer writes 14.7 or 459.67 for that.
    bool report_zero_in_another_unit_added(const operand& t, const shift& sh, double unit,
                                           const compact_dimension& dim,
                                           std::span<const operand> terms) {
        // Printed to three digits or more: "p + 0.1" is no atmosphere in MPa.
        if (sh.si != 0.0 || sh.written <= 0.0 || sh.tolerance > 0.005)
            return false;
        struct printed_zero {
            std::string_view unit;  // the unit it is printed in
            std::string_view scale; // whose zero it is
            double value;           // in that unit
            double factor;          // SI value of that unit
        };
        // The °C and °F zeros in K and °R (NIST SP 811 (2008), 4.2.1.1).
        std::array<printed_zero, 9> zeros{};
        std::size_t count = 0;
        for (const auto& u : pressure_units)
            zeros[count++] = {u.name, "", standard_atmosphere / u.pascals, u.pascals};
        zeros[count++] = {"K", "\u00B0C", 273.15, 1.0};
        zeros[count++] = {"\u00B0R", "\u00B0F", 459.67, 5.0 / 9.0};
        const bool pressure = dim == pressure_dimension();
        if (!pressure && !(dim == temperature_dimension()))
            return false;
        for (const printed_zero& z : std::span(zeros.data(), count)) {
            if (z.scale.empty() != pressure || std::abs(z.factor / unit - 1.0) < 1e-9 ||
                std::abs(sh.written - z.value) > sh.written * sh.tolerance + 1e-9 * z.value)
                continue;
            const operand* reading = nullptr;
            for (const auto& r : terms)
                if (!is_shift_candidate(r) && r.type.known && r.type.point)
                    reading = &r;
            if (reading != nullptr && pressure && named_gauge(reading->node))
                return false;
            diagnostic& d =
                report(rules::offset_scale,
                       fmt::format("{} is {} in {}, added to {}, a reading already on an absolute "
                                   "scale and in another unit: the sum counts that zero twice",
                                   display_text(file_.nodes[t.node].range),
                                   pressure ? std::string("the atmosphere")
                                            : fmt::format("the zero of the {} scale", z.scale),
                                   z.unit, reading != nullptr ? quote(reading->node) : "a reading"),
                       file_.nodes[t.node].range);
            add_term(d, t);
            if (reading != nullptr)
                add_term(d, *reading);
            d.notes.push_back({"a reading declared absolute needs nothing added; where it is a "
                               "gauge or a \u00B0C or \u00B0F reading, declare it so, and add "
                               "the zero in its own unit",
                               {}});
            return true;
        }
        return false;
    }

    // Whether the node is one whole side of a formula of two or more sides (in parentheses or
    // not): there alone "p_abs - p_g" can stand for the atmosphere, set equal to a reading of
    // it. Inside a product or a sum it is a slip (a bar value less a barg one).
    bool is_whole_side(std::uint32_t node) const {
        if (current_ == nullptr || current_->side_count < 2)
            return false;
        for (std::uint32_t i = 0; i < current_->side_count; ++i) {
            std::uint32_t root = file_.sides[current_->first_side + i].root;
            root = syntax::inside_brackets(file_, root);
            if (root == node)
                return true;
        }
        return false;
    }

    // "p_abs - p_g": one absolute reading less one reading on an offset scale leaves that
    // scale's zero (the atmosphere for a gauge): the offset unit, or null when the terms are
    // anything else.
    const unit_definition* subtracted_scale_zero(std::span<const operand> terms,
                                                 double final_origin, double slack) const {
        const operand* added = nullptr;
        const operand* subtracted = nullptr;
        for (const auto& t : terms) {
            if (!t.type.known || !t.type.point)
                continue;
            const operand*& slot = t.subtracted ? subtracted : added;
            if (slot != nullptr)
                return nullptr;
            slot = &t;
        }
        if (added == nullptr || subtracted == nullptr || added->type.offset != nullptr ||
            added->type.origin != 0.0 || subtracted->type.offset == nullptr)
            return nullptr;
        if (std::abs(subtracted->type.origin + final_origin) > slack)
            return nullptr;
        return subtracted->type.offset;
    }

    // "T_C - T_K", "p_bar - p_barg": readings on two scales with different zeros.
    void report_mixed_scales(std::span<const operand> terms, double difference) {
        const operand* on_offset = nullptr;
        const operand* other = nullptr;
        for (const auto& t : terms) {
            if (!t.type.known || !t.type.point)
                continue;
            if (t.type.offset != nullptr && on_offset == nullptr)
                on_offset = &t;
            else if (other == nullptr)
                other = &t;
        }
        if (on_offset == nullptr)
            on_offset = &terms.front();
        const bool temperature = on_offset->type.dim == temperature_dimension();
        const unit_definition* named =
            scale_named(on_offset->type.origin, 0.0, on_offset->type.dim, terms);
        if (named == nullptr) {
            report_shifted_difference(terms, difference, temperature);
            return;
        }
        const unit_definition& unit = *named;
        diagnostic& d = report(
            rules::offset_scale,
            other != nullptr
                ? fmt::format("{} is on the {} scale and {} on an absolute one, so their "
                              "difference is off by the {} scale's zero",
                              quote(on_offset->node), unit.symbol, quote(other->node), unit.symbol)
                : fmt::format("{} is on the {} scale, and the other terms do not cancel its zero",
                              quote(on_offset->node), unit.symbol),
            file_.nodes[on_offset->node].range);
        add_term(d, *on_offset);
        if (other != nullptr)
            add_term(d, *other);
        d.notes.push_back(
            {fmt::format("as written the result is off by {} {}",
                         format_factor(std::abs(difference)), temperature ? "K" : "Pa"),
             {}});
        if (other != nullptr && !on_offset->subtracted && other->subtracted &&
            other->type.offset == nullptr)
            d.notes.push_back(
                {fmt::format("{} less {} would be the {} scale's zero as an absolute reading; "
                             "this way round it is its negative",
                             quote(other->node), quote(on_offset->node), unit.symbol),
                 {}});
        d.notes.push_back(
            {temperature
                 ? fmt::format("convert first: a {} reading plus {:g} is in K", unit.symbol,
                               unit.offset / unit.factor)
                 : std::string("convert first: a gauge reading plus the atmospheric pressure is "
                               "absolute"),
             {}});
    }

    // "p_a - 14.7 - p_h" with every pressure absolute: the readings cancel to a difference,
    // which has no zero for the number to move. Most often one of the pressures subtracted is
    // a drop, not a reading, and only its name does not say so.
    void report_shifted_difference(std::span<const operand> terms, double difference,
                                   bool temperature) {
        const operand* number = nullptr;
        const operand* subtracted = nullptr;
        for (const auto& t : terms) {
            if (is_shift_candidate(t) && number == nullptr)
                number = &t;
            else if (t.subtracted && t.type.known && t.type.point && subtracted == nullptr)
                subtracted = &t;
        }
        const operand& at = number != nullptr ? *number : terms.front();
        diagnostic& d = report(
            rules::offset_scale,
            fmt::format("the readings in this sum cancel to a difference, which has no zero, "
                        "yet {} moves the zero by {} {}",
                        number != nullptr ? quote(number->node) : std::string("a number"),
                        format_factor(std::abs(difference)), temperature ? "K" : "Pa"),
            file_.nodes[at.node].range);
        add_term(d, at);
        if (subtracted != nullptr)
            d.notes.push_back(
                {fmt::format("{} is read as a reading on an absolute scale; if it is a drop or "
                             "a rise (a loss, a column of liquid), say so in its name (\u0394{}) "
                             "or its description (\"... drop\"), and the number is then the "
                             "scale's zero",
                             quote(subtracted->node), text(file_.nodes[subtracted->node].range)),
                 {}});
    }

    // "p_bh - p_atm - 14.7": the atmosphere taken off as a symbol and again as a number.
    bool report_atmosphere_taken_twice(std::span<const operand> terms, std::size_t only) {
        double taken = 0.0;
        const operand* number = nullptr;
        const operand* atmosphere = nullptr;
        for (const auto& t : terms) {
            if (is_shift_candidate(t) && t.subtracted) {
                const shift s = shift_of(t);
                taken -= s.si + s.written * terms[only].type.scale;
                number = &t;
            } else if (t.subtracted && names_atmosphere(t.node)) {
                atmosphere = &t;
            }
        }
        if (number == nullptr || atmosphere == nullptr ||
            !(std::abs(taken / standard_atmosphere - 1.0) < 0.05))
            return false;
        diagnostic& d = report(rules::offset_scale,
                               fmt::format("{} and {} both take off the atmosphere: the result is "
                                           "one atmosphere below the gauge reading",
                                           quote(atmosphere->node), quote(number->node)),
                               file_.nodes[number->node].range);
        add_term(d, *atmosphere);
        add_term(d, *number);
        d.notes.push_back({"an absolute pressure less the atmosphere is the gauge reading; take "
                           "it off once",
                           {}});
        return true;
    }

    // Whether a term is a symbol named or described as the atmosphere or a barometer.
    bool names_atmosphere(std::uint32_t node) const {
        node = syntax::inside_brackets(file_, node);
        if (file_.nodes[node].kind != expr_kind::symbol)
            return false;
        const std::string_view name = text(file_.nodes[node].range);
        const symbol_entry* e = symbols_.find(name);
        return names_the_atmosphere(name, e != nullptr ? e->description : std::string_view());
    }

    // A number as written, read as a double: "0.5886", "1055", "2.31".
    double written_number(span range) const {
        return std::strtod(std::string(text(range)).c_str(), nullptr);
    }

    // The SI value of "14.7 {psi}" or "{p_atm}".
    double quantity_si_value(const syntax::expr_node& n) const {
        const syntax::quantity_literal& q = file_.quantities[n.lhs];
        if (q.constant)
            return q.si_factor;
        const std::string_view t = text(n.range);
        const auto number = rational::parse(t.substr(0, t.find_first_of(" \t{")));
        return number ? number->to_double() * q.si_factor : 0.0;
    }

    // A side or term's units and numbers, for reconcile().
    scaled_operand scaled(const typed_term& t, bool as_number) const {
        static const rational one(1);
        if (as_number)
            return {1.0, &one, {}};
        return {
            t.scale, t.exact_scale ? &*t.exact_scale : nullptr,
            std::span<const scale_literal>(literals_.data() + t.literal_begin, t.literal_count)};
    }

    // A number that stands for a conversion, or a trade's conversion to three digits of the
    // term's own quantity (is_three_digit_conversion_of).
    bool converts_in_term(const scale_literal& l, const typed_term& term,
                          bool allow_hundred) const {
        return stands_for_a_conversion(l, allow_hundred) ||
               (std::abs(l.exponent) == 1.0 && file_.nodes[l.node].kind == expr_kind::number &&
                significant_digits(text(file_.nodes[l.node].range)) == 3 &&
                is_three_digit_conversion_of(l.value, l.tolerance, term.dim));
    }

    // The route below for "A = π*D^2/4": every operand in one unit (as reconcile() finds at
    // its first step, without its search) and no number that looks like a conversion (which
    // report_unneeded_factor() would name). True, with `unit` as that route sets it, exactly
    // where that route would return true without a finding; false leaves it to that route.
    bool units_agree_with_plain_numbers(std::span<const operand> ops, double& unit) const {
        static const rational one(1);
        const typed_term* first = nullptr;
        bool dimensionless = false;
        for (const auto& op : ops) {
            if (!op.type.known || op.type.zero || !std::isfinite(op.type.scale))
                continue;
            dimensionless = op.type.dim.is_dimensionless();
            if (op.type.numeric && !dimensionless)
                continue;
            if (first == nullptr) {
                first = &op.type;
                continue;
            }
            const double s = op.type.numeric ? 1.0 : op.type.scale;
            const double s0 = first->numeric ? 1.0 : first->scale;
            if (s != s0)
                return false;
            const rational* exact =
                op.type.numeric ? &one : (op.type.exact_scale ? &*op.type.exact_scale : nullptr);
            const rational* exact0 =
                first->numeric ? &one : (first->exact_scale ? &*first->exact_scale : nullptr);
            if (exact != nullptr && exact0 != nullptr && !(*exact == *exact0))
                return false;
        }
        for (const auto& op : ops) {
            if (!op.type.known || op.type.zero || !std::isfinite(op.type.scale) || op.type.numeric)
                continue;
            for (std::uint32_t l = 0; l < op.type.literal_count; ++l) {
                const scale_literal& number = literals_[op.type.literal_begin + l];
                if (converts_in_term(number, op.type, !dimensionless) ||
                    spare_time_ratio(number, op.type, op.node) ||
                    spare_speed_ratio(number, op.node))
                    return false;
                // A 100 in a term in percent: see report_unneeded_factor.
                if (dimensionless && number.power_of_ten &&
                    std::abs(number.power * number.exponent) == 2 &&
                    std::abs(op.type.scale - 0.01) < 1e-12)
                    return false;
            }
        }
        unit = first == nullptr ? 1.0 : (first->numeric ? 1.0 : first->scale);
        return true;
    }

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

    // check_scales past its fast path, out of line so that the meeting points it settles do
    // not pay for this one's frame.
    [[gnu::noinline]] bool reconcile_scales(std::span<const operand> ops, meeting_point what,
                                            double& unit, bool with_numbers) {
        if (with_numbers && units_agree_with_plain_numbers(ops, unit))
            return true;
        return reconcile_in_full(ops, what, unit);
    }

    // reconcile_scales past its test of plain numbers, which most meeting points with numbers
    // pass: out of line, so that those do not pay for this one's frame.
    [[gnu::noinline]] bool reconcile_in_full(std::span<const operand> ops, meeting_point what,
                                             double& unit) {
        const std::size_t base = scaled_.size();
        bool dimensionless = false;
        for (std::size_t i = 0; i < ops.size(); ++i) {
            const operand& op = ops[i];
            if (!op.type.known || op.type.zero || !std::isfinite(op.type.scale))
                continue;
            dimensionless = op.type.dim.is_dimensionless();
            const bool number = op.type.numeric;
            if (number && !dimensionless)
                continue;
            scaled_.push_back(scaled(op.type, number));
            scaled_index_.push_back(i);
        }
        struct release {
            std::vector<scaled_operand>& v;
            std::vector<std::size_t>& w;
            std::size_t base;
            ~release() {
                v.resize(base);
                w.resize(base);
            }
        } const keep{scaled_, scaled_index_, base};
        const std::span<const scaled_operand> parts(scaled_.data() + base, scaled_.size() - base);
        const std::span<const std::size_t> index(scaled_index_.data() + base, parts.size());
        unit = parts.empty() ? 1.0 : parts.front().scale;
        if (parts.size() < 2)
            return true;
        reconciliation r = reconcile(parts);
        if (r.agree) {
            unit = r.unit;
            if (!r.used_literals)
                return !report_unneeded_factor(ops, index, parts, dimensionless);
            return !report_extra_factor(ops, index, parts, dimensionless);
        }
        // A conversion factor written the wrong way round (asked of the short meeting points
        // that formulas have; a sum of thousands of terms is not searched term by term).
        constexpr std::size_t max_operands_for_flips = 16;
        // A coefficient folded into a conversion (1.075 = 1.467²/2 beside 1.47*V*t) reconciles
        // the formula as written, which a flip of another number would only seem to.
        if (parts.size() <= max_operands_for_flips &&
            accept_folded_coefficient(ops, index, parts, unit))
            return true;
        for (std::size_t i = 0; i < parts.size() && parts.size() <= max_operands_for_flips; ++i)
            for (std::size_t k = 0; k < parts[i].literals.size() && k < 10; ++k) {
                // Any number may be the conversion written upside down (/60 for *60, /3.6,
                // *360): only a flip that reconciles every operand counts, and the formula is
                // reported either way; this only chooses the clearer message.
                if (parts[i].literals[k].value == 1.0)
                    continue;
                const reconciliation flipped = reconcile(parts, {i, k});
                if (!flipped.agree)
                    continue;
                report_inverted_factor(ops[index[i]], parts[i].literals[k]);
                return false;
            }
        if (parts.size() <= max_operands_for_flips && accept_trade_constant(parts, unit))
            return true;
        if (parts.size() <= max_operands_for_flips &&
            report_inverted_trade_constant(ops, index, parts))
            return false;
        // "P*d_pct + P_base" with d_pct in %: in a sum of two the term with the percentage is
        // the one off, whichever came first; and beside a bare number ("f*L/d_mm + 4") the
        // term with units, since the number is the formula's own.
        // In a dimensionless sum ("ε/(3.7*D) + 5.74/Re^0.9" with ε in mm and D in m), the
        // term whose units do not cancel is the one named, beside one whose units do.
        const auto cancels = [&](std::size_t i) {
            return std::abs(apparent_scale(parts[i]) - 1.0) < 1e-12;
        };
        if (what.what.starts_with("terms") && parts.size() == 2 &&
            ((holds_percentage(ops[index[r.reference]].node) &&
              !holds_percentage(ops[index[r.odd]].node)) ||
             (ops[index[r.odd]].type.numeric && !ops[index[r.reference]].type.numeric) ||
             (dimensionless && cancels(r.odd) && !cancels(r.reference) &&
              !holds_percentage(ops[index[r.reference]].node))))
            std::swap(r.odd, r.reference);
        // "D_drum/d_r >= 18" with the drum in m and the rope in mm: the bare number is the
        // code's limit, and the ratio beside it is what to convert.
        if (what.what == "sides of this limit" && parts.size() == 2 &&
            ops[index[r.odd]].type.numeric && !ops[index[r.reference]].type.numeric)
            std::swap(r.odd, r.reference);
        // A sum among a side's factors, "(b + z*y)*y" = A in m²: asked only here, once the
        // terms are known to disagree, of an equation of two sides.
        const typed_term* hint = sum_side_hint_;
        typed_term factor_hint;
        if (what.what.starts_with("terms") && parts.size() >= 2 && hint == nullptr &&
            sum_checked_ != syntax::no_index && side_hint_ != nullptr &&
            side_hint_node_ != syntax::no_index && current_->side_count == 2) [[unlikely]]
            if (const std::optional<double> scale =
                    scale_left_for_sum(side_hint_node_, *side_hint_, sum_checked_)) {
                factor_hint.scale = *scale;
                hint = &factor_hint;
            }
        // "w = q*s + g_sw" with w and g_sw in kN/m and q in Pa: the term in the other side's
        // unit is right, whichever came first.
        if (what.what.starts_with("terms") && parts.size() >= 2 && hint != nullptr && hint->known &&
            hint->literal_count == 0 && std::isfinite(hint->scale) && hint->scale > 0)
            [[unlikely]] {
            const auto in_side_unit = [&](std::size_t i) {
                return std::abs(apparent_scale(parts[i]) / hint->scale - 1.0) < 1e-9;
            };
            if (in_side_unit(r.odd) && !in_side_unit(r.reference))
                std::swap(r.odd, r.reference);
        }
        const operand& op = ops[index[r.odd]];
        const operand& reference = ops[index[r.reference]];
        // What the numbers as written give: the conversion-like ones taken as conversions.
        double ratio = apparent_scale(parts[r.reference]) / apparent_scale(parts[r.odd]);
        std::optional<rational> exact_ratio = exact_product(
            apparent_exact_scale(parts[r.reference]), apparent_exact_scale(parts[r.odd]), true);
        // "f = M*12/S" with M in kip·ft, S in in³ and f in psi: the 12 is no conversion by
        // itself but part of one, and the units are off by 1000, not 12000. Where taking some
        // of the other numbers in makes the ratio a clean power of ten, that is the ratio as
        // written, so that following the message fixes the formula.
        const auto clean = ratio_with_numbers(parts[r.reference], parts[r.odd], ratio,
                                              holds_pi(reference.node), holds_pi(op.node));
        if (clean) {
            ratio = *clean;
            exact_ratio.reset();
        }
        // "V_scf = 37.3*V_Nm3": the factor holds the reference temperatures beside the volume
        // factor (35.31 × 288.7/273.15), which is the conversion between the two.
        if (((symbols_.unit_marks() & at_reference_conditions) != 0 ||
             file_.functions == syntax::function_names::spreadsheet) &&
            reference_temperatures_reconcile(ops[index[r.odd]].node, ops[index[r.reference]].node,
                                             parts[r.odd], parts[r.reference])) {
            unit = parts[r.reference].scale;
            return true;
        }
        // "V_N = Q_scfh + V_Nm3": gas volumes at 60 °F and at 0 °C; the factor between them
        // holds the reference temperatures' ratio as well as the units' (37.33 scf per Nm³,
        // not 35.31), which the advice must give.
        std::string state_note;
        if (const auto a = reference_volume_of(ops[index[r.odd]].node),
            b = reference_volume_of(ops[index[r.reference]].node);
            a && b && a->power == b->power && a->kelvins != b->kelvins) [[unlikely]] {
            ratio /= std::pow(b->kelvins / a->kelvins, a->power);
            exact_ratio.reset();
            state_note = fmt::format("{} is gas at {} and {} at {}: the factor between them "
                                     "holds the ratio of those temperatures as well as the "
                                     "units'",
                                     quote(ops[index[r.odd]].node), a->name,
                                     quote(ops[index[r.reference]].node), b->name);
        }
        // A_cmil = d_mil^2: the circular mil is π/4 mil², so that a round wire's area in cmil is
        // its diameter in mils squared (NIST SP 811 (2008), B.8): the circle's π/4 is the unit's,
        // and a π written beside it counts the circle twice.
        if ((std::abs(ratio / (std::numbers::pi / 4.0) - 1.0) < 1e-9 ||
             std::abs(ratio * std::numbers::pi / 4.0 - 1.0) < 1e-9) &&
            (in_circular_mils(ops[index[r.odd]].node) ||
             in_circular_mils(ops[index[r.reference]].node)) &&
            !holds_pi(ops[index[r.odd]].node) && !holds_pi(ops[index[r.reference]].node))
            [[unlikely]] {
            unit = parts[r.reference].scale;
            return true;
        }
        // Q = C·i·A in cfs from in/h and acres, the US rational method: 1 acre·in/h is
        // 43560/43200 = 1.0083 cfs, which the method leaves out by convention (common practice).
        if (std::abs(ratio * 121.0 / 120.0 - 1.0) < 1e-5 ||
            std::abs(ratio * 120.0 / 121.0 - 1.0) < 1e-5) {
            diagnostic& d = report(
                rules::trade_constant,
                fmt::format("{} and {} are 1.0083 apart, an acre-inch per hour against a "
                            "cubic foot per second, a factor that the rational method "
                            "(Q = C·i·A in cfs) and the irrigator's rule (1 cfs for an "
                            "hour is an acre-inch) leave out by convention",
                            quote(ops[index[r.odd]].node), quote(ops[index[r.reference]].node)),
                file_.nodes[ops[index[r.odd]].node].range);
            d.level = severity::note;
            unit = parts[r.reference].scale;
            return true;
        }
        // "c = x_pct*c_1 + (1 - x_pct)*c_2": the sides are off by the 100 already reported in
        // the sum inside; a second warning would advise dividing the whole side by it.
        const bool sides = what.what.starts_with("sides of");
        if (sides && inner_scale_ratio_ != 0.0 &&
            (std::abs(ratio / inner_scale_ratio_ - 1.0) < 1e-6 ||
             std::abs(ratio * inner_scale_ratio_ - 1.0) < 1e-6))
            return false;
        if (!sides)
            inner_scale_ratio_ = ratio;
        const std::optional<rational> exact_inverse = exact_product(rational(1), exact_ratio, true);
        // A warning: in a unit-aware calc the units convert themselves; where numbers are
        // put in as declared (spreadsheets, code), the result is off by the ratio.
        diagnostic& d =
            report(rules::unit_scale,
                   fmt::format("as written, {} counts {} times as much as {}: the {} agree in "
                               "dimension but not in unit",
                               quote(op.node), format_factor(exact_ratio, ratio),
                               quote(reference.node), what.name()),
                   file_.nodes[op.node].range);
        d.level = severity::warning;
        add_term(d, op);
        add_term(d, reference);
        for (const operand* side : {&op, &reference}) {
            const std::string units = units_in(side->node);
            if (!units.empty())
                d.notes.push_back({fmt::format("in {}: {}", quote(side->node), units), {}});
        }
        // "Q*Δp/6356", "12/kWpt": a number that looks like no conversion is counted as a
        // coefficient; say so, since it may be the conversion the engineer meant, wrongly.
        if (!clean) {
            std::string coefficients;
            std::size_t coefficient_count = 0;
            // The factor the one coefficient would have to be, were it the conversion.
            double needed = 0.0;
            double written = 0.0;
            for (const std::size_t side : {r.odd, r.reference})
                for (const scale_literal& l : parts[side].literals)
                    if (l.value != 1.0 && !looks_like_conversion(l, true) &&
                        file_.nodes[l.node].kind == expr_kind::number &&
                        significant_digits(text(file_.nodes[l.node].range)) >= 2 &&
                        coefficients.size() < 80) {
                        coefficients += fmt::format("{}{}", coefficients.empty() ? "" : ", ",
                                                    text(file_.nodes[l.node].range));
                        ++coefficient_count;
                        written = l.value;
                        needed = side == r.odd ? 1.0 / ratio : ratio;
                    }
            // "u_fpm = 200*u" (m/s): a rule of thumb for 196.85. Taken as a coefficient, the
            // advice would multiply it by the conversion; say how far it is from the factor.
            if (const double off = written / needed - 1.0;
                coefficient_count == 1 && std::isfinite(off) && std::abs(off) <= 0.05)
                d.notes.push_back(
                    {fmt::format("{} is {:.2g} % {} {}, the factor these units need; if it was "
                                 "meant to convert them, write that factor",
                                 coefficients, std::abs(off) * 100.0, off > 0 ? "above" : "below",
                                 format_factor(needed)),
                     {}});
            else if (!coefficients.empty())
                d.notes.push_back(
                    {fmt::format("{} counted as a coefficient, not a unit conversion; if it was "
                                 "meant to convert units, it is not the factor these units need",
                                 coefficients),
                     {}});
        }
        // "divide by 3.28084 (1/0.3048)" reads better as "multiply by 0.3048".
        bool multiply = ratio < 1;
        std::string factor = multiply ? format_factor(exact_inverse, 1.0 / ratio)
                                      : format_factor(exact_ratio, ratio);
        // Where the advice is to multiply already, it stays so: "multiply by 10.7639", not
        // "divide by 0.09290304"; "multiply by 59.9971", not "divide by 0.01666748".
        if (const std::size_t inverse = factor.find(" (1/");
            inverse != std::string::npos && factor.ends_with(")")) {
            if (multiply) {
                factor.erase(inverse);
            } else {
                factor = factor.substr(inverse + 4, factor.size() - inverse - 5);
                multiply = true;
            }
        } else if (factor.starts_with("1/")) {
            factor.erase(0, 2);
            multiply = !multiply;
        }
        // "t_wo - T_2" with a °F and a °C reading: the degrees' 1.8 alone leaves the scales'
        // zeros 32 °F apart.
        if (op.type.offset != nullptr && reference.type.offset != nullptr &&
            op.type.offset != reference.type.offset && op.type.dim == temperature_dimension()) {
            const bool op_celsius = std::abs(op.type.offset->factor - 1.0) < 1e-12;
            // Readings on scales with different zeros: the offset-scale error it is where
            // they are set equal, not a warning about the size of their degrees alone.
            d.rule = std::string(rules::offset_scale);
            d.level = severity::error;
            d.message = fmt::format("{} is on the {} scale but {} is on the {} scale: their "
                                    "degrees differ in size and their zeros lie 32 \u00B0F apart",
                                    quote(op.node), op.type.offset->symbol, quote(reference.node),
                                    reference.type.offset->symbol);
            d.notes.push_back(
                {fmt::format(
                     "convert the reading, not only its degrees: {} on the {} scale is {}",
                     quote(op.node), reference.type.offset->symbol,
                     op_celsius
                         ? fmt::format("(1.8*{} + 32)", display_text(file_.nodes[op.node].range))
                         : fmt::format("({} - 32)/1.8", display_text(file_.nodes[op.node].range))),
                 {}});
            return false;
        }
        if (!state_note.empty())
            d.notes.push_back({std::move(state_note), {}});
        // "RH <= 0.6" with RH in %: a fraction's bound beside a percentage, or a bound of 0.6 %.
        if (what.what == "sides of this limit" && reference.type.numeric &&
            holds_percentage(op.node)) {
            const std::string bound = display_text(file_.nodes[reference.node].range);
            d.notes.push_back(
                {fmt::format("a bound up to 1 beside a percentage reads as a "
                             "fraction: write {} for {} as a fraction, or {} {{%}} "
                             "if {} % is meant",
                             format_factor(reference.type.value
                                               ? reference.type.value->to_double() * 100.0
                                               : 100.0),
                             bound, bound, bound),
                 {}});
            return false;
        }
        d.notes.push_back({fmt::format("{} {} by {} (declare the symbols in coherent units, or "
                                       "write the conversion factor into the formula)",
                                       multiply ? "multiply" : "divide", quote(op.node), factor),
                           {}});
        return false;
    }

    // "0.5", "2", "4e3": one digit, as a formula's own numbers (½ρv², 2πr) are written, and
    // no conversion is; not worth a note beside a finding.
    static int significant_digits(std::string_view written) {
        int digits = 0;
        bool leading = true;
        for (const char c : written) {
            if (c == 'e' || c == 'E')
                break;
            if (c < '0' || c > '9')
                continue;
            if (leading && c == '0')
                continue;
            leading = false;
            ++digits;
        }
        return digits;
    }

    static bool near_power_of_ten(double v, double tolerance) {
        if (!(v > 0) || !std::isfinite(v))
            return false;
        const double k = std::round(std::log10(v));
        return k != 0.0 && std::abs(v / std::pow(10.0, k) - 1.0) <= tolerance + 1e-9;
    }

    std::optional<double> ratio_with_numbers(const scaled_operand& reference,
                                             const scaled_operand& odd, double ratio,
                                             bool reference_holds_pi, bool odd_holds_pi) const {
        if (near_power_of_ten(ratio, 0.0) || !(ratio > 0) || !std::isfinite(ratio))
            return std::nullopt;
        struct candidate {
            double factor;
            double tolerance;
        };
        std::array<candidate, 8> numbers{};
        std::size_t count = 0;
        for (const auto* part : {&odd, &reference})
            for (const auto& l : part->literals) {
                if (count == numbers.size() || looks_like_conversion(l, true) || !(l.value > 0))
                    continue;
                // The 4 of π/4·D² and the 2 of 2π are the circle's, never part of a conversion.
                if ((l.value == 4.0 || l.value == 2.0) &&
                    (part == &odd ? odd_holds_pi : reference_holds_pi))
                    continue;
                const double e = part == &odd ? l.exponent : -l.exponent;
                numbers[count++] = {std::pow(l.value, e), l.tolerance * std::abs(e)};
            }
        // The fewest numbers first: each is more likely physics than part of a conversion.
        std::optional<double> best;
        int best_size = 9;
        for (std::uint32_t mask = 1; mask < (1U << count); ++mask) {
            const int size = std::popcount(mask);
            if (size >= best_size)
                continue;
            double v = ratio;
            double tolerance = 0.0;
            for (std::size_t k = 0; k < count; ++k)
                if ((mask >> k) & 1U) {
                    v *= numbers[k].factor;
                    tolerance += numbers[k].tolerance;
                }
            if (near_power_of_ten(v, tolerance)) {
                best = std::pow(10.0, std::round(std::log10(v)));
                best_size = size;
            }
        }
        // "m_lb*c_us*(T_d - T_s)/24" (lb/d, Btu/(lb·°F), a °C rise, Btu/h): 24 h/d is a
        // conversion too, and what is left is the 1.8 of the degrees. Only numbers that are
        // conversions themselves are taken in: the 2 of 2g in f*(L/d)*V^2/(2*g) with d in
        // inches is the formula's own, and what is missing is 12, not 24.
        for (std::uint32_t mask = 1; !best && mask < (1U << count); ++mask) {
            double v = ratio;
            bool conversions = true;
            for (std::size_t k = 0; k < count; ++k)
                if ((mask >> k) & 1U) {
                    v *= numbers[k].factor;
                    conversions = conversions && (numbers[k].factor == 1.0 ||
                                                  common_conversion(numbers[k].factor, 0.002));
                }
            if (conversions)
                best = common_conversion(v, 0.002);
        }
        if (!best)
            best = ratio_with_folded_constant(reference, odd, ratio);
        return best;
    }

    // NIST SP 811 (2008), B.8: in/ft, in²/ft², in³/ft³, ft/m, mm/in, cm/in, min/h, s/h, h/d,
    // gal/ft³, L/gal, lb/kg, psi/bar, kPa/psi, bbl/ft³, ft³/m³, °F/K; and the flows' m³/h per
    // L/s, gpm per L/s and per m³/h, cfm per L/s and m³/h per cfm: a ratio within `slack` of
    // one of them, or of its inverse.
    static std::optional<double> common_conversion(double v, double slack) {
        static constexpr std::array<double, 22> common{
            12.0, 144.0,   1728.0,  3.28084, 25.4,    2.54,    60.0,    3600.0,
            24.0, 7.48052, 3.78541, 2.20462, 14.5038, 6.89476, 5.61458, 35.3147,
            1.8,  3.6,     15.8503, 4.40287, 2.11888, 1.69901};
        for (const double r : common)
            for (const double candidate : {r, 1.0 / r})
                if (std::abs(v / candidate - 1.0) <= slack)
                    return candidate;
        return std::nullopt;
    }

    // "V_L = 0.1399*D^2*h_in" (bbl from ft and a height in inches): 0.1399 is π/4 times
    // 0.1781 bbl/ft³, so what is missing is the 12 of the inches, not 67.375. Where one
    // number read as a folded constant times a conversion leaves a common conversion as the
    // ratio, that ratio is the one the message advises.
    std::optional<double> ratio_with_folded_constant(const scaled_operand& reference,
                                                     const scaled_operand& odd,
                                                     double ratio) const {
        for (const auto* part : {&odd, &reference})
            for (const auto& l : part->literals) {
                // Written to three digits or more, as folded and trade constants are (0.1399,
                // 1714, 550): a 2 or a 0.95 is the formula's own.
                if (looks_like_conversion(l, true) || !(l.value > 0) || l.value == 1.0 ||
                    significant_digits(text(file_.nodes[l.node].range)) < 3)
                    continue;
                const double e = part == &odd ? l.exponent : -l.exponent;
                // The number as a conversion by itself first ((T_1 - T_2)*V_fpm/550 with V in
                // ft/min: 550 ft·lbf/s per hp leaves the 60 of the minutes), then as each folded
                // constant times one (9550*P_W/n: 60000/(2π) leaves the 1000 of the watts).
                // Within the number's own printed digits: 0.2 % would let some common
                // conversion fit one time in six, and advise it (√3 as 1.732 had left the
                // US gallon).
                const double slack = std::min(0.002, 2.0 * l.tolerance + 1e-4);
                const auto leaves = [&](double constant) -> std::optional<double> {
                    const double v = ratio * std::pow(l.value / constant, e);
                    if (near_power_of_ten(v, slack) && std::abs(std::log10(v)) > 0.5)
                        return std::pow(10.0, std::round(std::log10(v)));
                    return common_conversion(v, slack);
                };
                if (const auto whole = leaves(1.0))
                    return whole;
                // Folded with a constant, a number of three digits leaves a power of ten only:
                // with a dozen constants and as many conversions some pairing fits almost any
                // number (25.4 as ln 10/(4π) times 139 had left the 1.8 of the degrees).
                const bool digits_enough = significant_digits(text(file_.nodes[l.node].range)) >= 4;
                for (const folded_constant& c : folded_constants())
                    if (const auto folded = leaves(c.value);
                        folded && (digits_enough || near_power_of_ten(*folded, 0.0)))
                        return folded;
            }
        return std::nullopt;
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
    };
    static std::optional<trade_constant_reading>
    read_trade_constant(std::span<const scaled_operand> parts, bool flipped) {
        for (std::size_t i = 0; i < parts.size(); ++i)
            for (std::size_t k = 0; k < parts[i].literals.size() && k < 10; ++k) {
                const scale_literal& l = parts[i].literals[k];
                const std::optional<rational> printed = printed_power(l, 1.0);
                if (!printed)
                    continue;
                for (const trade_constant& c : trade_constants()) {
                    // A property's range is read from a number printed to three digits or more;
                    // an exact constant (the 120 of n = 120*f/p) from its value alone.
                    if (*printed < c.least || c.greatest < *printed ||
                        (!l.factor_like && c.least != c.greatest))
                        continue;
                    std::vector<scale_literal> literals(parts[i].literals.begin(),
                                                        parts[i].literals.end());
                    literals[k].low = c.exact_conversion;
                    literals[k].high = c.conversion_high;
                    literals[k].value = c.exact_conversion.to_double();
                    literals[k].tolerance = 0.0;
                    std::vector<scaled_operand> changed(parts.begin(), parts.end());
                    changed[i].literals = literals;
                    const reconciliation r =
                        flipped ? reconcile(changed, {i, k}) : reconcile(changed);
                    if (r.agree)
                        return trade_constant_reading{&l, &c, r.unit};
                }
            }
        return std::nullopt;
    }

    bool accept_trade_constant(std::span<const scaled_operand> parts, double& unit) {
        const auto reading = read_trade_constant(parts, false);
        if (!reading)
            return false;
        const scale_literal& l = *reading->literal;
        const trade_constant& c = *reading->constant;
        unit = reading->unit;
        diagnostic& d = report(
            rules::trade_constant,
            fmt::format("{} is read as {}, not as a unit conversion: the units "
                        "need {}, {}",
                        text(file_.nodes[l.node].range), c.name,
                        format_factor(std::nullopt, c.exact_conversion.to_double()), c.conversion),
            file_.nodes[l.node].range);
        d.level = severity::note;
        d.notes.push_back({fmt::format("{}; source: {}", c.range_text, c.source), {}});
        d.notes.push_back({std::string(c.caveat), {}});
        return true;
    }

    // "Q*Δp*6356/η": a trade constant that reconciles the units only written the other way
    // round. Said as such, rather than as the ratio of about 6343 that it leaves.
    bool report_inverted_trade_constant(std::span<const operand> ops,
                                        std::span<const std::size_t> index,
                                        std::span<const scaled_operand> parts) {
        const auto reading = read_trade_constant(parts, true);
        if (!reading)
            return false;
        const scale_literal& l = *reading->literal;
        const bool divides = l.exponent < 0;
        diagnostic& d =
            report(rules::unit_scale,
                   fmt::format("the factor {} is the wrong way round: it is {}, and the units "
                               "need {} by it, not {}",
                               text(file_.nodes[l.node].range), reading->constant->name,
                               divides ? "a multiplication" : "a division",
                               divides ? "a division" : "a multiplication"),
                   file_.nodes[l.node].range);
        for (std::size_t i = 0; i < parts.size(); ++i)
            for (const scale_literal& mine : parts[i].literals)
                if (&mine == &l)
                    add_term_and_units(d, ops[index[i]]);
        return true;
    }

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
    };
    static std::span<const folded_constant> folded_constants() {
        static const std::array<folded_constant, 13> constants{{
            {4.0 / std::numbers::pi, "4/\u03C0", "the area of a circle", false, true},
            {std::numbers::pi / 4.0, "\u03C0/4", "the area of a circle", false, true},
            // 9550 = 60000/(2π) in M = 9550*P/n (kW, rpm to N·m), 5252 = 33000/(2π) (hp, rpm
            // to lbf·ft); 191.5 = 2π × 30.48 in the Wenner array's ρ = 2π·a·R (ft to Ω·cm).
            {1.0 / (2.0 * std::numbers::pi), "1/(2\u03C0)",
             "a revolution's 2\u03C0 radians (P = 2\u03C0\u00B7n\u00B7M)", false},
            // 25.92 = 2 × 3.6² in s = v²/(25.92*a) (km/h to m/s), 1.075 = 1.467²/2 in
            // AASHTO's 1.075*V²/a (mph to ft/s): the 2 of v²/(2a) folded in.
            // 24 = 2 × 12 in r = d/24 (a radius in ft from a diameter in inches, common
            // practice).
            {0.5, "1/2", "the formula's own half (v\u00B2/(2a), a diameter from a radius)", false,
             false, true, false, true},
            {2.0, "2", "the formula's own 2 (v\u00B2/(2a), a radius from a diameter)", false, false,
             true, false, true},
            {2.0 * std::numbers::pi, "2\u03C0",
             "the formula's 2\u03C0 (radians per revolution; the Wenner array's \u03C1 = "
             "2\u03C0\u00B7a\u00B7R)",
             false},
            // 0.262 = π/12 in the belt maker's V = 0.262*D*n (in and rpm to ft/min), 0.05236 =
            // π/60 in v = π·D·n/60 (m and rpm to m/s): a circumference's π.
            {std::numbers::pi, "\u03C0", "a circumference's \u03C0 (v = \u03C0\u00B7D\u00B7n)",
             false},
            // 3.82 = 12/π in the machine shop's n = 3.82*V/D (sfm and inches to rpm; Machinery's
            // Handbook, speeds and feeds, from memory): the same π, dividing. Whole numbers of
            // three digits too: 318 = 1000/π (m/min and mm to rpm), 229 = 720/π (a pump's tip
            // speed in ft/s from inches and rpm; common practice).
            {1.0 / std::numbers::pi, "1/\u03C0", "a circumference's \u03C0 (n = V/(\u03C0\u00B7D))",
             true},
            {std::numbers::ln10 / (2.0 * std::numbers::pi), "ln 10/(2\u03C0)",
             "the steady well-flow (Thiem) formula's constant, with log10 for ln,", true},
            {std::numbers::ln10 / (4.0 * std::numbers::pi), "ln 10/(4\u03C0)",
             "the straight-line (Cooper-Jacob) well-test formula's constant", true},
            // 1055 = 1440 × ln 10/π in the unconfined (Dupuit) well's Q = K(H² - h²)/(1055
            // log10(R/r)) in gpm from gpd/ft², ft (US field form, from memory).
            {std::numbers::ln10 / std::numbers::pi, "ln 10/\u03C0",
             "the unconfined well-flow (Dupuit) formula's constant, with log10 for ln,", true},
            // 622 = 0.622 × 1000 in W = 622*p_w/(p - p_w) in g/kg: the molar masses of water
            // and dry air, 18.015/28.965 (ASHRAE Fundamentals, ch. 1, from memory).
            {18.015 / 28.965, "0.622", "the ratio of the molar masses of water and dry air", true,
             false, false, true},
            // 0.463 = 1.486 × 0.3117 in Manning's full-pipe Q = 0.463/n*D^(8/3)*S^(1/2) (cfs, ft):
            // a full circle's area π/4·D² and hydraulic radius D/4 (common practice).
            {std::numbers::pi / 4.0 * std::pow(4.0, -2.0 / 3.0), "(\u03C0/4)\u00B74^(-2/3)",
             "a full pipe's area and hydraulic radius (Manning's full-bore form)", false},
        }};
        return constants;
    }

    // Where a formula's own half or 2 may stand: a square (v²/(2a)), a length from a length
    // (a radius from a diameter), or two lengths in one product (the hoop stress p·D/(2t)).
    bool may_hold_a_half(const operand& term) const {
        if (term.type.dim == length_dimension() || squares_something(term.node))
            return true;
        int lengths = 0;
        for_each_factor(term.node, [&](std::uint32_t at, int) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::symbol)
                if (const symbol_entry* e = symbols_.find(text(n.range));
                    e != nullptr && e->compact_dim && *e->compact_dim == length_dimension())
                    ++lengths;
            return lengths >= 2;
        });
        return lengths >= 2;
    }

    // Whether a subtree squares something (D^2, d*d), as the area of a circle needs.
    bool squares_something(std::uint32_t node) const {
        return syntax::search_subtree(file_, node, [&](std::uint32_t, const syntax::expr_node& n) {
            if (n.kind == expr_kind::power && file_.nodes[n.rhs].kind == expr_kind::number &&
                text(file_.nodes[n.rhs].range) == "2")
                return search_step::found;
            if (n.kind == expr_kind::multiply && file_.nodes[n.rhs].kind == expr_kind::symbol &&
                file_.nodes[n.lhs].kind == expr_kind::symbol &&
                text(file_.nodes[n.lhs].range) == text(file_.nodes[n.rhs].range))
                return search_step::found;
            return search_step::descend;
        });
    }

    bool accept_folded_coefficient(std::span<const operand> ops, std::span<const std::size_t> index,
                                   std::span<const scaled_operand> parts, double& unit) {
        constexpr std::size_t most_numbers = 8;
        std::array<scale_literal, most_numbers> changed_literals{};
        std::vector<scaled_operand> changed;
        // Whether the units reconcile with the k-th number of operand i replaced by `as`.
        const auto reconciles_with = [&](std::size_t i, std::size_t k, const scale_literal& as) {
            std::copy(parts[i].literals.begin(), parts[i].literals.end(), changed_literals.begin());
            changed_literals[k] = as;
            changed.assign(parts.begin(), parts.end());
            changed[i].literals = {changed_literals.data(), parts[i].literals.size()};
            const reconciliation r = reconcile(changed);
            if (r.agree)
                unit = r.unit;
            return r.agree;
        };
        // Pass 0 reads a power of ten; each later pass one folded constant, in the table's
        // order, over every number, so that the half of 1.075 is found before a 2 in 1.47.
        const std::span<const folded_constant> constants = folded_constants();
        for (std::size_t pass = 0; pass <= constants.size(); ++pass) {
            const bool circle_pass = pass > 0;
            for (std::size_t i = 0; i < parts.size(); ++i) {
                if (parts[i].literals.size() > most_numbers)
                    continue;
                for (std::size_t k = 0; k < parts[i].literals.size(); ++k) {
                    const scale_literal& l = parts[i].literals[k];
                    if (!(l.value > 0) || !std::isfinite(l.value) || l.value == 1.0 ||
                        file_.nodes[l.node].kind != expr_kind::number)
                        continue;
                    scale_literal as = l;
                    if (!circle_pass) {
                        const std::optional<double> found =
                            folded_power_of_ten(ops, index, i, l, false);
                        if (!found)
                            continue;
                        double power = *found;
                        // 1.6e7 is 16 × 10⁶ as well as 1.6 × 10⁷: the second reading where the
                        // first does not reconcile.
                        if (const std::optional<double> second =
                                folded_power_of_ten(ops, index, i, l, true);
                            second && !reconciles_with(i, k, power_of_ten_literal(l, power)))
                            power = *second;
                        as = power_of_ten_literal(l, power);
                        if (!reconciles_with(i, k, as))
                            continue;
                        // "16e6*Q/(π*d^3)", "20*PI()": beyond one digit, a note says how the
                        // number was read, as it may be a coefficient that only looks so.
                        const std::string_view written = text(file_.nodes[l.node].range);
                        const double digit = l.value / as.value;
                        if (digit >= 10.0 || std::abs(power) < 2 ||
                            std::abs(digit - std::round(digit)) > 1e-9) {
                            diagnostic& d = report(
                                rules::trade_constant,
                                fmt::format("{} is read as {} \u00D7 {}, the {} converting the "
                                            "units",
                                            written, format_factor(digit), format_factor(as.value),
                                            format_factor(as.value)),
                                file_.nodes[l.node].range);
                            d.level = severity::note;
                        }
                        return true;
                    }
                    // Only numbers written to 3 or more digits, as folded factors are (528
                    // too, where whole numbers must otherwise reach 1000).
                    const bool whole_two_digits =
                        l.value >= 10.0 && l.value < 100.0 && l.value == std::round(l.value);
                    // Konya's 0.34*ρ*d^2 (π/4 × 0.4335, in² and g/cm³ to lb/ft; Konya and
                    // Walter, Surface Blast Design, from memory): a circle's constant is printed
                    // to two digits too, and read so beside a square alone, to those digits.
                    const std::string_view printed = text(file_.nodes[l.node].range);
                    const bool two_digit_decimal = printed.find('.') != std::string_view::npos &&
                                                   significant_digits(printed) == 2 &&
                                                   !l.factor_like;
                    if (!l.factor_like && !(l.value >= 100.0 && l.value < 1000.0) &&
                        !whole_two_digits && !two_digit_decimal)
                        continue;
                    // A folded factor is printed from a product worked out by hand, and its
                    // last digit is often cut rather than rounded (AASHTO's 1.075 for
                    // 1.0756): a thousandth either way.
                    as.tolerance = std::max(as.tolerance, 1e-3);
                    // 9550 for 9549.3: a whole number's trailing zeros may only place the
                    // point, and a folded factor is rounded to its significant digits.
                    // Three significant digits at least: 12000 is no rounded 15279.
                    const std::string_view written = text(file_.nodes[l.node].range);
                    const std::size_t digits = written.find_last_not_of('0') + 1;
                    if (written.find_first_of(".eE") == std::string_view::npos && digits >= 3 &&
                        digits < written.size())
                        as.tolerance =
                            std::max(as.tolerance, half_unit_in_last_digit(written) / l.value);
                    {
                        const folded_constant& c = constants[pass - 1];
                        if (!l.factor_like && !c.whole_three_digits &&
                            !(whole_two_digits && c.whole_two_digits) && !two_digit_decimal)
                            continue;
                        if (whole_two_digits && !c.whole_two_digits)
                            continue;
                        if (two_digit_decimal && !c.circle)
                            continue;
                        if (two_digit_decimal)
                            as.tolerance =
                                std::max(as.tolerance, half_unit_in_last_digit(printed) / l.value);
                        // 0.1166*S*N*A_p with the plunger's area declared: its π/4 would be
                        // counted twice; a circle's area is read only beside a square.
                        if (c.circle && !squares_something(ops[index[i]].node))
                            continue;
                        if (c.half_of_a_square_or_radius && !may_hold_a_half(ops[index[i]]))
                            continue;
                        as.value = l.value / c.value;
                        if (c.beside_power_of_ten && !near_power_of_ten(as.value, 1e-3))
                            continue;
                        as.low.reset();
                        as.high.reset();
                        as.power_of_ten = false;
                        if (!reconciles_with(i, k, as))
                            continue;
                        // The conversion to as many digits as the number has: 9550 is 1/(2π)
                        // times 60000, not 60004.4.
                        int significant = 0;
                        for (const char ch : written.substr(0, written.find_first_of("eE")))
                            if (ch >= '1' && ch <= '9')
                                significant = significant + 1;
                            else if (ch == '0' && significant > 0)
                                significant = significant + 1;
                        if (written.find('.') == std::string_view::npos)
                            significant = static_cast<int>(written.find_last_not_of('0') + 1);
                        const double place = std::pow(10.0, std::floor(std::log10(as.value)) -
                                                                std::max(significant, 3) + 1);
                        const double shown = std::round(as.value / place) * place;
                        diagnostic& d =
                            report(rules::trade_constant,
                                   fmt::format("{} is read as {} times the unit conversion {}: {} "
                                               "folded into the factor",
                                               written, c.written, format_factor(shown), c.what),
                                   file_.nodes[l.node].range);
                        d.level = severity::note;
                        return true;
                    }
                }
            }
        }
        return false;
    }

    // The power of ten a number folds beside its coefficient, where it may: one digit times a
    // power of ten (4e6, 0.004); a whole coefficient to 99 (16e6 in τ = 16e6*T/(π*d^3) from
    // kN·m and mm to MPa); any coefficient written with that exponent (5.093e6); and ten
    // beside π (20*PI() in T = V_g*Δp/(20π) from cm³ and bar to N·m, 1 cm³·bar = 0.1 J).
    static scale_literal power_of_ten_literal(const scale_literal& l, double power) {
        scale_literal as = l;
        std::int64_t ten = 1;
        for (int p = 0; p < std::abs(static_cast<int>(power)); ++p)
            ten *= 10;
        as.value = std::pow(10.0, power);
        as.tolerance = 0.0;
        as.power_of_ten = true;
        as.power = static_cast<std::int8_t>(power);
        as.factor_like = true;
        as.table_digits = false;
        as.low = power > 0 ? rational(ten) : rational(1, ten);
        as.high = as.low;
        return as;
    }

    // `second`: the reading one power lower, where the number has one (1.6e7 as 16 × 10⁶).
    std::optional<double> folded_power_of_ten(std::span<const operand> ops,
                                              std::span<const std::size_t> index, std::size_t i,
                                              const scale_literal& l, bool second) const {
        // 3600 is the seconds of an hour, no 36 × 100: a number that is a conversion itself
        // is read as one, and where the units need another, that is the finding.
        if (l.value >= 10.0 && common_conversion(l.value, 0.0))
            return std::nullopt;
        const std::string_view written = text(file_.nodes[l.node].range);
        const std::size_t e = written.find_first_of("eE");
        const double top = std::floor(std::log10(l.value) + 1e-12);
        bool first_found = false;
        for (const double power : {top, top - 1.0}) {
            if (std::abs(power) > 18 || power == 0.0)
                continue;
            const double digit = l.value / std::pow(10.0, power);
            const bool whole = std::abs(digit - std::round(digit)) <= 1e-9 * digit;
            const bool folds =
                // (1000 is no 10 × 100: a coefficient of ten would be a power of ten itself.)
                // Two digits only before a large power (16e6), never in a fraction (0.5 is no
                // 50 × 0.01).
                (std::abs(power) >= 2 && whole && digit >= 2.0 &&
                 (power == top ? digit < 10.0
                               : power > 0 && digit < 100.0 && std::round(digit) != 10.0)) ||
                (std::abs(power) >= 2 && power == top && e != std::string_view::npos &&
                 std::strtol(std::string(written.substr(e + 1)).c_str(), nullptr, 10) == power) ||
                (power == 1.0 && whole && digit >= 2.0 && digit < 10.0 && power == top &&
                 holds_pi(ops[index[i]].node)) ||
                // 3700 in Swamee-Jain's ε/(3700*D) with ε in mm and D in m: a published
                // constant of two digits (3.7) beside a thousand.
                (power >= 3.0 && power == top && digit > 1.0 &&
                 std::abs(digit * 10.0 - std::round(digit * 10.0)) <= 1e-9 * digit);
            if (!folds)
                continue;
            if (!second || first_found)
                return power;
            first_found = true;
        }
        return std::nullopt;
    }

    bool holds_pi(std::uint32_t k) const {
        return for_each_factor(
            k, [&](std::uint32_t at, int) { return file_.nodes[at].kind == expr_kind::pi; });
    }

    // "E = C*M*Q/22.4/1e6*3600" with E in kg/h: the 1e6 converts, and the 3600 beside it is a
    // conversion the units do not need. A conversion-like number that the others reconcile
    // without is reported as not needed.
    bool report_extra_factor(std::span<const operand> ops, std::span<const std::size_t> index,
                             std::span<const scaled_operand> parts, bool dimensionless) {
        constexpr std::size_t most_numbers = 8;
        for (std::size_t i = 0; i < parts.size(); ++i) {
            if (parts[i].literals.size() > most_numbers)
                continue;
            for (std::size_t k = 0; k < parts[i].literals.size(); ++k) {
                const scale_literal& l = parts[i].literals[k];
                // "Q_m3h = Q_cfm*1.699*60": 1.699 is m³/h per cfm already, and the minutes
                // in an hour beside it are counted twice.
                if (!(looks_like_conversion(l, !dimensionless) ||
                      converts_in_term(l, ops[index[i]].type, !dimensionless) ||
                      spare_time_ratio(l, ops[index[i]].type, ops[index[i]].node)) ||
                    (l.exponent == 1.0 && (l.value == 1e3 || l.value == 1e6 || l.value == 1e9) &&
                     l.value == counted_multiple(ops[index[i]].node)))
                    continue;
                std::array<scale_literal, most_numbers> without{};
                std::copy(parts[i].literals.begin(), parts[i].literals.end(), without.begin());
                without[k].value = 1.0;
                without[k].tolerance = 0.0;
                without[k].low = rational(1);
                without[k].high = rational(1);
                without[k].power_of_ten = false;
                without[k].power = 0;
                without[k].factor_like = false;
                without[k].table_digits = false;
                std::vector<scaled_operand> changed(parts.begin(), parts.end());
                changed[i].literals = {without.data(), parts[i].literals.size()};
                if (reconcile(changed).agree)
                    return report_unneeded(ops[index[i]], l);
            }
        }
        return false;
    }

    // "P = E*I/L^2/1000" with P already in kN: the units agree without the factor.
    bool report_unneeded_factor(std::span<const operand> ops, std::span<const std::size_t> index,
                                std::span<const scaled_operand> parts, bool dimensionless) {
        for (std::size_t i = 0; i < parts.size(); ++i) {
            // "E_pct = f_pct*100": a percentage made a percentage again, where the term holds
            // one and the units agree in percent without the 100.
            const bool in_percent =
                dimensionless && std::abs(parts[i].scale - 0.01) < 1e-12 &&
                for_each_factor(ops[index[i]].node, [&](std::uint32_t at, int) {
                    return dimensionless_unit_size(at) == std::optional<double>(0.01);
                });
            // V*1000*L^3/(3*E*1000*I): conversions that cancel each other are none.
            double net = 1.0;
            const scale_literal* first = nullptr;
            for (const auto& l : parts[i].literals)
                if (converts_in_term(l, ops[index[i]].type, !dimensionless || in_percent) ||
                    spare_time_ratio(l, ops[index[i]].type, ops[index[i]].node) ||
                    spare_speed_ratio(l, ops[index[i]].node)) {
                    net *= std::pow(l.value, l.exponent);
                    if (first == nullptr)
                        first = &l;
                }
            if (first != nullptr && std::abs(net - 1.0) > 1e-9 &&
                std::abs(net / counted_multiple(ops[index[i]].node) - 1.0) > 1e-9)
                return report_unneeded(ops[index[i]], *first);
        }
        return false;
    }

    // "L_10 : 1 "basic rating life, millions of revolutions"" (ISO 281): a symbol whose
    // description says it counts in thousands, millions or billions, multiplied in the term,
    // so that 1e6*L_10 is its count; 1 where none does.
    double counted_multiple(std::uint32_t k) const {
        double multiple = 1.0;
        for_each_factor(k, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            if (sign < 0 || n.kind != expr_kind::symbol)
                return false;
            const symbol_entry* e = symbols_.find(text(n.range));
            if (e == nullptr)
                return false;
            const std::string_view d = e->description;
            multiple = d.find("millions") != std::string_view::npos    ? 1e6
                       : d.find("thousands") != std::string_view::npos ? 1e3
                       : d.find("billions") != std::string_view::npos  ? 1e9
                                                                       : 1.0;
            return multiple != 1.0;
        });
        return multiple;
    }

    // t = V/Q*24 with t in d and Q in m³/d: a ratio of time units (24 h/d, 60, 1440, 8760, 3.6)
    // beside units that already agree, in a quantity that holds time. Without time in it (a
    // count per day from a count per hour, both declared 1) the number may be the formula's.
    // "I = 1.1*C_Ah/(H_h*60)": a term whose time cancels among its symbols (Ah over h) holds
    // time too, in its units.
    bool spare_time_ratio(const scale_literal& l, const typed_term& t, std::uint32_t term) const {
        if (!t.known || !time_ratio_number(l))
            return false;
        try {
            if (!t.dim.expand().exponent(base_dimension::time).is_zero())
                return true;
        } catch (const std::exception&) {
            return false;
        }
        // Only a unit that names minutes, hours or days: a beam's w·L³/(24·E·I) has time in
        // its newtons and pascals, and its 24 is the formula's.
        return for_each_factor(term, [&](std::uint32_t at, int) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::symbol) {
                const symbol_entry* e = symbols_.find(text(n.range));
                return e != nullptr && names_a_time_unit(e->unit_text);
            }
            return n.kind == expr_kind::reference &&
                   names_a_time_unit(file_.references[n.lhs].unit_text);
        });
    }

    // Whether a unit's text names a time unit longer than the second, alone or inside a row
    // (A*h, L/min, kWh, gpm).
    static bool names_a_time_unit(std::string_view unit) {
        static constexpr std::array<std::string_view, 22> words{
            "min", "h",   "hr",  "d",   "day", "yr",  "Ah",   "kWh",  "Wh",   "MWh", "gpm",
            "cfm", "gph", "mgd", "rpm", "mph", "fpm", "scfm", "acfm", "scfh", "cfh", "tph"};
        std::size_t at = 0;
        while (at < unit.size()) {
            const auto letter = [&](std::size_t i) {
                const char c = unit[i];
                return (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z') || c == '_';
            };
            while (at < unit.size() && !letter(at))
                ++at;
            std::size_t end = at;
            while (end < unit.size() && letter(end))
                ++end;
            const std::string_view word = unit.substr(at, end - at);
            if (!word.empty() && std::find(words.begin(), words.end(), word) != words.end())
                return true;
            at = end;
        }
        return false;
    }

    // Whether `l` is a ratio of time units, multiplying or dividing.
    static bool time_ratio_number(const scale_literal& l) {
        if (std::abs(l.exponent) != 1.0)
            return false;
        // NIST SP 811 (2008), B.8: 1 d = 24 h = 1440 min = 86 400 s; 1 h = 60 min = 3600 s;
        // 3.6 for m³/h and L/s, km/h and m/s; 8760 h in a (365-day) year.
        static constexpr std::array<double, 7> ratios{24.0,    60.0,   1440.0, 3600.0,
                                                      86400.0, 8760.0, 3.6};
        return std::any_of(ratios.begin(), ratios.end(), [&](double r) { return l.value == r; });
    }

    // "d_r = 0.278*v*t_r" with v in m/s: km/h to m/s (1/3.6), mph to ft/s (1.467) or m/s
    // (0.447), km to miles, written to three digits beside a speed whose units agree without
    // it (NIST SP 811 (2008), B.8).
    bool spare_speed_ratio(const scale_literal& l, std::uint32_t term) const {
        if (std::abs(l.exponent) != 1.0 || !l.factor_like)
            return false;
        static constexpr std::array<double, 8> ratios{3.6,      1.0 / 3.6, 1.466667, 0.44704,
                                                      0.681818, 2.236936,  1.609344, 0.621371};
        if (std::none_of(ratios.begin(), ratios.end(), [&](double r) {
                return std::abs(l.value / r - 1.0) <= l.tolerance + 1e-9;
            }))
            return false;
        return has_factor_of_dimension(term, velocity_dim, 0);
    }

    // "p_g*10/100": a percentage written as its number over 100 (10 % of the supply
    // pressure), no unit conversion, where the number just before the /100 is a whole one up
    // to 100.
    // "Q*0.005/100", a drift of 0.005 % of the circulation, too: a decimal number up to 100
    // that does not look like a conversion itself.
    bool percentage_written_out(const scale_literal& l) const {
        if (l.exponent != -1.0 || l.value != 100.0)
            return false;
        const std::string_view all = file_.source->text(span{0, file_.nodes[l.node].range.begin});
        std::size_t at = all.find_last_not_of(' ');
        if (at == std::string_view::npos || all[at] != '/')
            return false;
        const std::size_t end = all.find_last_not_of(' ', at - 1);
        if (end == std::string_view::npos || !std::isdigit(static_cast<unsigned char>(all[end])))
            return false;
        std::size_t begin = end;
        bool point = false;
        while (begin > 0 && (std::isdigit(static_cast<unsigned char>(all[begin - 1])) ||
                             (all[begin - 1] == '.' && !point))) {
            point = point || all[begin - 1] == '.';
            --begin;
        }
        if (begin > 0 &&
            (all[begin - 1] == '.' || std::isalpha(static_cast<unsigned char>(all[begin - 1])) ||
             all[begin - 1] == '_'))
            return false;
        const std::string_view written = all.substr(begin, end - begin + 1);
        const number_reading& number = read_number(written);
        const double value = number.literal.value;
        if (point && looks_like_conversion(number.literal, true))
            return false;
        return value > 0 && value <= 100 && (point || value >= 1);
    }

    // "F*100/(100 + S)", "100*S/(100 - w)" with S in % or per 100 g: the 100 above is the
    // leading 100 of the sum below, in its unit, as the solids and solubility balances write
    // it (Mullin, Crystallization, 4th ed., ch. 11, from memory).
    bool hundred_over_percent_sum(std::uint32_t term, const scale_literal& l) const {
        if (l.value != 100.0 || l.exponent != 1.0)
            return false;
        return for_each_factor(term, [&](std::uint32_t at, int sign) {
            const std::uint32_t leading =
                sign < 0 ? number_leading_sum(at, false) : syntax::no_index;
            return leading != syntax::no_index &&
                   written_number(file_.nodes[leading].range) == 100.0;
        });
    }

    bool report_unneeded(const operand& op, const scale_literal& l) {
        if (percentage_written_out(l) || hundred_over_percent_sum(op.node, l))
            return false;
        const double factor = std::pow(l.value, l.exponent);
        diagnostic& d =
            report(rules::unit_scale,
                   fmt::format("the factor {} is not needed: the units of {} already agree, so "
                               "as written it is {} times its true value",
                               text(file_.nodes[l.node].range), quote(op.node),
                               format_factor(printed_power(l, l.exponent), factor)),
                   file_.nodes[l.node].range);
        add_term_and_units(d, op);
        // 8.34 pasted from a US sheet into an SI one: say what the number is.
        if (const std::optional<rational> printed = printed_power(l, 1.0);
            printed && !looks_like_conversion(l, true))
            if (const trade_constant* c = trade_constant_for(*printed))
                d.notes.push_back(
                    {fmt::format("{} is {}; it stands for {}, and these units need no such "
                                 "conversion",
                                 text(file_.nodes[l.node].range), c->name, c->conversion),
                     {}});
        d.notes.push_back(
            {"remove the factor, or declare the symbols in the units it converts from", {}});
        return true;
    }

    // "M = w*L^2/8*1e6" with L in mm: the factor is needed, but the other way round.
    void report_inverted_factor(const operand& op, const scale_literal& l) {
        const double factor = std::pow(l.value, l.exponent);
        const std::string_view written = text(file_.nodes[l.node].range);
        const bool divides = l.exponent < 0;
        diagnostic& d =
            report(rules::unit_scale,
                   fmt::format("the factor {} is the wrong way round: the units of {} "
                               "need {} by it, not {}",
                               written, quote(op.node), divides ? "a multiplication" : "a division",
                               divides ? "a division" : "a multiplication"),
                   file_.nodes[l.node].range);
        add_term_and_units(d, op);
        // The square of a factor reads best as a decimal: 0.556516, not 1/0.556516.
        std::string times = format_factor(printed_power(l, 2 * l.exponent), factor * factor);
        if ((times.starts_with("1/") && times.find('.') != std::string::npos) ||
            times.find(" (1/") != std::string::npos)
            times = format_factor(factor * factor);
        d.notes.push_back(
            {fmt::format("as written the result is {} times its true value", times), {}});
    }

    static bool celsius_reading(const operand& o) {
        return o.type.known && o.type.point && o.type.offset != nullptr &&
               o.type.dim == temperature_dimension() &&
               std::abs(o.type.offset->offset - 273.15) < 1e-9;
    }

    // "t_dp = 243.04 {Δ°C}*γ/(17.625 - γ)": the Magnus fit solved for the temperature (the dew
    // point from γ = ln φ + 17.625·t/(243.04 + t), Alduchov and Eskridge 1996, from memory)
    // gives a reading on the °C scale the fit was made on, though its form is a difference
    // times a ratio. Known by its constants: b from 235 to 260 °C and a from 17 to 18 over
    // water, and over ice b = 272.62 °C with a = 22.46 (WMO-No. 8, 2008, Annex 4.B, from memory).
    bool magnus_solved_for_reading(const operand& o) const {
        if (!o.type.known || o.type.point || !(o.type.dim == temperature_dimension()))
            return false;
        bool b_constant = false;
        bool a_over = false;
        const bool other = for_each_factor(o.node, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::quantity && sign > 0) {
                const double v = quantity_si_value(n);
                b_constant = b_constant || (v >= 235.0 && v <= 260.0) || (v >= 270.0 && v <= 275.0);
                return false;
            }
            if ((n.kind == expr_kind::add || n.kind == expr_kind::subtract) && sign < 0) {
                const std::uint32_t first = syntax::inside_brackets(file_, n.lhs);
                if (n.kind == expr_kind::subtract && file_.nodes[first].kind == expr_kind::number) {
                    const double a = written_number(file_.nodes[first].range);
                    a_over = a_over || (a >= 17.0 && a <= 18.0) || (a >= 22.0 && a <= 23.0);
                }
                return false;
            }
            return n.kind != expr_kind::symbol && n.kind != expr_kind::number;
        });
        return !other && b_constant && a_over;
    }

    // "T_K = T_C": readings on scales with different zeros set equal or compared.
    // `relation`: "equation", "limit" or "lookup", as the finding names what it is in.
    // "T_F = (T_C - 32)/1.8": the °F-to-°C conversion applied to a °C reading to give one in °F,
    // the conversion run the wrong way (and "T_C = 1.8*T_F + 32" the other way round). Read
    // where one side is a reading and the other holds one reading and the number 32.
    bool explain_reversed_fahrenheit(diagnostic& d, const operand& a, const operand& b) {
        const auto scale_of = [&](std::string_view name) -> int {
            const symbol_entry* e = symbols_.find(name);
            if (e == nullptr || e->offset_unit == nullptr || !e->compact_dim ||
                !(*e->compact_dim == temperature_dimension()))
                return 0;
            if (std::abs(e->offset_unit->factor - 1.0) < 1e-12)
                return 1;                                                       // the Celsius scale
            return std::abs(e->offset_unit->factor * 1.8 - 1.0) < 1e-9 ? 2 : 0; // Fahrenheit
        };
        for (const auto& [target, conversion] : {std::pair{&a, &b}, std::pair{&b, &a}}) {
            const syntax::expr_node& t = file_.nodes[syntax::inside_brackets(file_, target->node)];
            if (t.kind != expr_kind::symbol)
                continue;
            const int target_scale = scale_of(text(t.range));
            std::string_view reading;
            int symbols = 0;
            bool less_32 = false;
            bool plus_32 = false;
            syntax::search_subtree(
                file_, conversion->node, [&](std::uint32_t, const syntax::expr_node& n) {
                    if (n.kind == expr_kind::symbol) {
                        reading = text(n.range);
                        ++symbols;
                    } else if ((n.kind == expr_kind::subtract || n.kind == expr_kind::add) &&
                               file_.nodes[n.rhs].kind == expr_kind::number &&
                               written_number(file_.nodes[n.rhs].range) == 32.0) {
                        (n.kind == expr_kind::subtract ? less_32 : plus_32) = true;
                    }
                    return search_step::descend;
                });
            if (symbols != 1 || target_scale == 0)
                continue;
            const int reading_scale = scale_of(reading);
            const std::string_view target_name = text(t.range);
            // Wanting °F from a °C reading with (t - 32)/1.8, or °C from a °F one with 1.8*t + 32.
            const bool wants_fahrenheit = less_32 && reading_scale == 1 && target_scale == 2;
            if (wants_fahrenheit || (plus_32 && reading_scale == 2 && target_scale == 1)) {
                const auto form = [&](bool to_fahrenheit) {
                    return to_fahrenheit ? fmt::format("1.8*{} + 32", reading)
                                         : fmt::format("({} - 32)/1.8", reading);
                };
                const char* has = wants_fahrenheit ? "°C" : "°F";
                const char* wants = wants_fahrenheit ? "°F" : "°C";
                d.notes.push_back(
                    {fmt::format("{} turns a {} reading into {}, but '{}' is in {} "
                                 "already and '{}' wants {}: the conversion runs "
                                 "the other way, {} = {}",
                                 form(!wants_fahrenheit), wants, has, reading, has, target_name,
                                 wants, target_name, form(wants_fahrenheit)),
                     {}});
                return true;
            }
        }
        return false;
    }

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

    [[gnu::noinline]] void compare_origins(std::span<const operand> sides,
                                           std::string_view relation) {
        if (report_scale_zero_beside_difference(sides))
            return;
        for (const auto& side : sides)
            if (side.type.known && side.type.point && side.type.weighted_sum &&
                std::abs(side.type.origin) > 1e-9 + (std::isfinite(side.type.origin_tolerance)
                                                         ? side.type.origin_tolerance
                                                         : 0.0)) {
                report_unbalanced_readings(side);
                return;
            }
        if (std::all_of(sides.begin(), sides.end(),
                        [](const operand& side) { return side.type.origin == 0.0; }))
            return;
        const operand* reference = nullptr;
        for (const auto& side : sides) {
            if (!side.type.known || side.type.zero || side.type.numeric ||
                !std::isfinite(side.type.origin_tolerance))
                continue;
            if (reference == nullptr) {
                reference = &side;
                continue;
            }
            const double slack = side.type.origin_tolerance + reference->type.origin_tolerance +
                                 1e-9 * (std::abs(side.type.origin) + 1.0);
            const double difference = side.type.origin - reference->type.origin;
            if (std::abs(difference) <= slack)
                continue;
            // "p_g = p_abs - p_atm": a gauge reads the difference from the atmosphere.
            const auto on_gauge = [](const operand& o) {
                return o.type.offset != nullptr && o.type.offset->scale == unit_scale::gauge;
            };
            // "P_d = 2*S*t/D": a stress times the shape of a wall is a net pressure too; and
            // "p_w = 100*F/A_p", a cylinder's load over its bore, the gauge reading that holds
            // it with the other side at the atmosphere.
            // And "FG*TVD", a gradient times a depth: the column's pressure, as 0.052*MW*TVD
            // is (a fracture gradient from a leak-off test is gauge-based; Bourgoyne et al.,
            // Applied Drilling Engineering, 1986, ch. 6, from memory).
            const auto net_pressure = [&](const operand& o) {
                return o.type.absolute_pressure_difference ||
                       (!o.type.point && o.type.dim == pressure_dimension() &&
                        (pressure_scaled_by_shape(o.node, false) || force_over_area(o.node) ||
                         gradient_times_depth(o.node)));
            };
            if ((on_gauge(*reference) && net_pressure(side)) ||
                (on_gauge(side) && net_pressure(*reference)))
                continue;
            // "H_R = p_s - 20" with H_R a drop, "dT = t_op - 20": a reading less a bare number
            // set equal to a difference reads the number on the reading's own scale.
            const auto reading_less_a_number = [](const operand& o) {
                return o.type.point && o.type.reading_or_difference && o.type.offset != nullptr;
            };
            const auto a_difference = [](const operand& o) {
                return !o.type.point && !o.type.numeric && o.type.offset == nullptr &&
                       o.type.origin == 0.0;
            };
            if ((reading_less_a_number(*reference) && a_difference(side)) ||
                (reading_less_a_number(side) && a_difference(*reference)))
                continue;
            // "Δp_max = 0.05*p_O2": a share of a gauge pressure, the rise above the atmosphere,
            // set equal to a quantity declared a difference.
            const auto share_of_gauge = [&](const operand& o) {
                return on_gauge(o) && o.type.weight_denominator != 0 &&
                       !(o.type.weight_numerator == 1 && o.type.weight_denominator == 1);
            };
            if ((share_of_gauge(*reference) && a_difference(side)) ||
                (share_of_gauge(side) && a_difference(*reference)))
                continue;
            if ((celsius_reading(*reference) && magnus_solved_for_reading(side)) ||
                (celsius_reading(side) && magnus_solved_for_reading(*reference)))
                continue;
            const operand& off = side.type.offset != nullptr ? side : *reference;
            const operand& other = &off == &side ? *reference : side;
            const unit_definition* unit = off.type.offset;
            const bool temperature = off.type.dim == temperature_dimension();
            if (!temperature && unit != nullptr && unit->scale == unit_scale::gauge &&
                other.type.offset == nullptr && other.type.point && read_local_atmosphere(off))
                return;
            const std::string scale_of_other =
                other.type.offset != nullptr
                    ? fmt::format("the {} scale", other.type.offset->symbol)
                    : std::string(!temperature ? "the absolute scale (Pa, bar, psia)"
                                  : std::abs(other.type.scale * 1.8 - 1.0) < 1e-9
                                      ? "the absolute scale (°R)"
                                      : "the absolute scale (K)");
            // "14.5*p_g + 14.7" moves the zero by 14.7 psi seen through the rounded 14.5: the
            // step is the atmosphere, and the stray digits would only puzzle.
            const bool one_atmosphere =
                !temperature && std::abs(std::abs(difference) / standard_atmosphere - 1.0) < 5e-3;
            diagnostic& d = report(
                rules::offset_scale,
                fmt::format(
                    "{} is on the {} scale but {} is on {}: the {} of this {} differ by {}",
                    quote(off.node), unit != nullptr ? unit->symbol : "offset", quote(other.node),
                    scale_of_other, "zeros", relation,
                    one_atmosphere
                        ? fmt::format("one atmosphere ({} Pa)", format_factor(standard_atmosphere))
                        : fmt::format("{} {}", format_factor(std::abs(difference)),
                                      temperature ? "K" : "Pa")),
                file_.nodes[off.node].range);
            add_term(d, off);
            add_term(d, other);
            if (temperature && explain_reversed_fahrenheit(d, side, *reference))
                return;
            if (unit != nullptr && other.type.offset == nullptr) {
                // "T_K = T_F + 273.15": where a number is added already, it is the wrong one;
                // the advice names the reading, not the whole side with that number in it.
                const expr_kind kind = file_.nodes[off.node].kind;
                const bool has_number = kind == expr_kind::add || kind == expr_kind::subtract;
                const std::string reading = has_number ? std::string("the reading")
                                                       : display_text(file_.nodes[off.node].range);
                std::string zero = format_factor(unit->offset / unit->factor);
                std::string absolute_unit = absolute_symbol(*unit);
                // "p_kPa = 6.895*p_g": the expression's numbers are in kPa by then, and so
                // must the atmosphere added to them be.
                // Its numbers as rounded conversions too (14.5 psi per bar is 14.5038).
                double written_unit = off.type.scale;
                for (std::uint32_t l = 0; l < off.type.literal_count; ++l) {
                    const scale_literal& number = literals_[off.type.literal_begin + l];
                    written_unit /= std::pow(number.value, number.exponent);
                }
                if (!temperature && std::isfinite(written_unit) &&
                    std::abs(written_unit / unit->factor - 1.0) > 1e-3)
                    for (const auto& u : pressure_units)
                        if (std::abs(written_unit / u.pascals - 1.0) < 5e-3) {
                            zero = format_factor(standard_atmosphere / u.pascals);
                            absolute_unit = std::string(u.name);
                        }
                // A degree the size of the kelvin reads in kelvins from its zero; the °F's in
                // degrees Rankine, which are 1.8 to the kelvin.
                const bool kelvin_sized = std::abs(unit->factor - 1.0) < 1e-12;
                std::string advice =
                    temperature
                        ? (kelvin_sized
                               ? fmt::format("a {} reading plus {} is in kelvins: write ({} + {}) "
                                             "beside K, ({} + {})*1.8 beside °R",
                                             unit->symbol, zero, reading, zero, reading, zero)
                               : fmt::format("a {} reading plus {} is in degrees Rankine, and "
                                             "that divided by 1.8 in kelvins: write ({} + {}) "
                                             "beside °R, ({} + {})/1.8 beside K",
                                             unit->symbol, zero, reading, zero, reading, zero))
                        : fmt::format("a gauge reading plus the atmospheric pressure is "
                                      "absolute: write ({} + p_atm), or ({} + {}) at sea level, "
                                      "the standard atmosphere in {}",
                                      reading, reading, zero, absolute_unit);
                // "Δθ_h = θ_h" with Δθ_h in K "rise above ambient": the kelvins are a rise's,
                // and a reading made absolute would only hide the slip.
                if (temperature && file_.nodes[other.node].kind == expr_kind::symbol) {
                    const std::string_view name = text(file_.nodes[other.node].range);
                    const symbol_entry* e = symbols_.find(name);
                    const std::string_view about = e != nullptr ? e->description : "";
                    if (names_a_difference(name, about) ||
                        about.find("rise") != std::string_view::npos)
                        advice = fmt::format("'{}' is a rise, the difference of two readings: "
                                             "write it as one, such as ({} - T_ref), not as the "
                                             "reading made absolute",
                                             name, reading);
                }
                if (has_number) {
                    advice = fmt::format("the number added does not put the zero where the other "
                                         "side has it; {}{}",
                                         atmosphere_in_other_unit(off, written_unit), advice);
                    if (std::optional<std::string> in_unit_of_other =
                            atmosphere_in_unit_of_other(off, other, written_unit))
                        advice = std::move(*in_unit_of_other);
                }
                if (const std::optional<std::string> added =
                        atmosphere_added_to_gauge(other, off, temperature))
                    advice = *added;
                d.notes.push_back({std::move(advice), {}});
            } else if (unit != nullptr && other.type.offset != nullptr && temperature) {
                // "T_C = T_F/1.8 - 32", "T_F = 1.8*T_C": the conversion between the two
                // scales with its zero left out or put in the wrong place.
                d.notes.push_back({"a \u00B0F reading is (T_F - 32)/1.8 on the \u00B0C scale, "
                                   "32 subtracted before dividing; a \u00B0C reading is "
                                   "1.8*T_C + 32 on the \u00B0F scale",
                                   {}});
            }
            return;
        }
    }

    // The number added to a side "reading + number", groups stripped; no_index otherwise.
    std::uint32_t number_added(std::uint32_t node) const {
        node = syntax::inside_brackets(file_, node);
        if (file_.nodes[node].kind != expr_kind::add)
            return syntax::no_index;
        const std::uint32_t rhs = syntax::inside_brackets(file_, file_.nodes[node].rhs);
        return file_.nodes[rhs].kind == expr_kind::number ? rhs : syntax::no_index;
    }

    // "p_0a = p_0g + 14.7" on a sheet in bar: the number is the atmosphere, in another unit.
    std::string atmosphere_in_other_unit(const operand& side, double reading_unit) const {
        const std::uint32_t number = number_added(side.node);
        if (number == syntax::no_index || !std::isfinite(reading_unit))
            return {};
        const std::string_view written = text(file_.nodes[number].range);
        const double value = read_number(written).literal.value;
        for (const auto& u : pressure_units)
            if (std::abs(reading_unit / u.pascals - 1.0) > 5e-3 &&
                read_reference_state(pressure_dimension(), value, written, u.pascals) != nullptr)
                return fmt::format("{} is the atmosphere in {}, not in the reading's unit; ",
                                   written, u.name);
        return {};
    }

    // "p_wh = p_whb + 14.7" with p_wh in psia and p_whb in bar g: the atmosphere is typed in
    // the other side's unit, and the reading needs that unit too, not only the zero.
    std::optional<std::string> atmosphere_in_unit_of_other(const operand& side,
                                                           const operand& other,
                                                           double reading_unit) const {
        const std::uint32_t number = number_added(side.node);
        if (number == syntax::no_index || !std::isfinite(reading_unit) ||
            !std::isfinite(other.type.scale) || other.type.literal_count != 0 ||
            std::abs(other.type.scale / reading_unit - 1.0) < 5e-3)
            return std::nullopt;
        const std::string_view written = text(file_.nodes[number].range);
        const double value = read_number(written).literal.value;
        for (const auto& u : pressure_units) {
            if (std::abs(other.type.scale / u.pascals - 1.0) > 5e-3 ||
                read_reference_state(pressure_dimension(), value, written, u.pascals) == nullptr)
                continue;
            const syntax::expr_node& sum = file_.nodes[syntax::inside_brackets(file_, side.node)];
            return fmt::format("{} is the atmosphere in {}, the unit of {}, but the reading is "
                               "not in {}: convert it as well, ({}*{} + {})",
                               written, u.name, quote(other.node), u.name,
                               format_factor(reading_unit / u.pascals),
                               display_text(file_.nodes[sum.lhs].range), written);
        }
        return std::nullopt;
    }

    // "p_psig = 14.5*p_barg + 14.7": a gauge reading, converted, with the atmosphere added is
    // absolute; the side it is set equal to is gauge, so the atmosphere is the slip.
    std::optional<std::string> atmosphere_added_to_gauge(const operand& absolute,
                                                         const operand& gauge,
                                                         bool temperature) const {
        const std::uint32_t number = number_added(absolute.node);
        if (temperature || number == syntax::no_index ||
            file_.nodes[syntax::inside_brackets(file_, gauge.node)].kind != expr_kind::symbol ||
            !holds_gauge(file_.nodes[syntax::inside_brackets(file_, absolute.node)].lhs))
            return std::nullopt;
        const std::string written = display_text(file_.nodes[number].range);
        return fmt::format("{} adds {}, the atmosphere, to a gauge reading, which makes it "
                           "absolute, while {} is gauge: drop the {}, or declare {} absolute",
                           quote(absolute.node), written,
                           display_text(file_.nodes[gauge.node].range), written,
                           display_text(file_.nodes[gauge.node].range));
    }

    // "p_abs = p_max + 92.1" in kPa, "p_a = p_g + 1" in bar: a number added to a gauge reading
    // that falls short of the standard atmosphere by no more than the air above the highest
    // sites does (5200 m, see declared_site_barometer) is the site's barometer, or a rounded
    // one; a note says which height it stands for.
    bool read_local_atmosphere(const operand& sum) {
        std::uint32_t k = sum.node;
        k = syntax::inside_brackets(file_, k);
        // Beside the gauge symbol alone, so that the number is in the symbol's unit (in
        // 6.895*p_g + 14.7 the sum is in kPa, and 14.7 kPa no atmosphere).
        const auto parts = number_beside_symbol(k);
        if (!parts || !std::isfinite(sum.type.scale))
            return false;
        const std::uint32_t number = parts->first;
        const double pressure = written_number(file_.nodes[number].range) * sum.type.scale;
        if (!(pressure >= highest_site_atmosphere * standard_atmosphere &&
              pressure <= 1.005 * standard_atmosphere))
            return false;
        // The barometric formula of the standard atmosphere, h = 44330.8·(1 - (p/p0)^0.190263) m.
        const double height = 44330.8 * (1.0 - std::pow(pressure / standard_atmosphere, 0.190263));
        diagnostic& d = report(
            rules::trade_constant,
            fmt::format("{} is read as the atmospheric pressure where the gauge is, {} kPa, which "
                        "the standard atmosphere has about {} m above sea level",
                        display_text(file_.nodes[number].range), format_factor(pressure / 1000.0),
                        static_cast<long>(std::round(std::max(0.0, height) / 10.0) * 10)),
            file_.nodes[number].range);
        d.level = severity::note;
        d.notes.push_back({"a gauge reading plus the local atmosphere is absolute; at sea level "
                           "the standard atmosphere is 101.325 kPa (14.696 psi, 1.01325 bar)",
                           {}});
        return true;
    }

    // "SSD_ft = 1.47*V_mph*t + 1.075*V_mph^2/a": a side whose terms agree only through
    // rounded factors (1.47 for 1.4667) takes the unit those factors round, where the other
    // side's unit lies within their rounding, rather than the first one's 0.2 % off.
    void settle_rounded_side(typed_term& side, std::size_t literal_base) const {
        if (side_hint_ == nullptr || !side_hint_->known || !side.known ||
            !(side_hint_->dim == side.dim) || !std::isfinite(side.scale) ||
            !std::isfinite(side_hint_->scale) || side_hint_->scale <= 0.0)
            return;
        double rounding = 0.0;
        for (std::size_t l = literal_base; l < literals_.size(); ++l)
            if (literals_[l].exponent != 0.0)
                rounding =
                    std::max(rounding, literals_[l].tolerance * std::abs(literals_[l].exponent));
        if (rounding > 0.0 && std::abs(side.scale / side_hint_->scale - 1.0) <= rounding) {
            side.scale = side_hint_->scale;
            side.exact_scale = side_hint_->exact_scale;
        }
    }

    // "T_m = T_hi + T_ho", "t_film = T_s + T_a/2": readings on a scale with an arbitrary zero
    // added with weights that make neither one reading (they sum to 1) nor a difference (0).
    void report_unbalanced_readings(const operand& side) {
        const std::optional<rational> w = weight_of(side.type);
        const unit_definition* scale = side.type.offset;
        diagnostic& d = report(
            rules::offset_scale,
            fmt::format("{} adds readings on the {} scale with weights that sum to {}, not 1: "
                        "its value depends on where the scale's zero is",
                        quote(side.node), scale != nullptr ? scale->symbol : "offset",
                        w ? (w->is_integer() ? fmt::format("{}", w->num())
                                             : fmt::format("{}/{}", w->num(), w->den()))
                          : std::string("another number")),
            file_.nodes[side.node].range);
        add_term(d, side);
        d.notes.push_back({"a mean of two readings is (T_1 + T_2)/2, weights 1/2 and 1/2; a "
                           "difference is T_1 - T_2, weights 1 and -1",
                           {}});
    }

    // "dp = p_abs - p_g": the right side is the atmosphere, a reading, not a difference.
    bool report_scale_zero_beside_difference(std::span<const operand> sides) {
        for (const auto& zero : sides) {
            if (!zero.type.known || zero.type.zero_of == nullptr)
                continue;
            for (const auto& other : sides) {
                if (&other == &zero || !other.type.known || other.type.zero || other.type.numeric ||
                    other.type.point)
                    continue;
                const unit_definition& scale = *zero.type.zero_of;
                diagnostic& d =
                    report(rules::offset_scale,
                           fmt::format("{} is the zero of the {} scale ({} {}) as a reading on the "
                                       "absolute scale, but {} is a difference",
                                       quote(zero.node), scale.symbol, format_factor(scale.offset),
                                       zero.type.dim == temperature_dimension() ? "K" : "Pa",
                                       quote(other.node)),
                           file_.nodes[zero.node].range);
                add_term(d, zero);
                add_term(d, other);
                d.notes.push_back(
                    {scale.scale == unit_scale::gauge
                         ? std::string("an absolute pressure less a gauge reading of it is the "
                                       "atmospheric pressure; a gauge reading is the absolute "
                                       "pressure less the atmosphere's (p_abs - p_atm)")
                         : fmt::format("a kelvin reading less a {} reading of it is the {} "
                                       "scale's zero; a difference needs two readings on one "
                                       "scale",
                                       scale.symbol, scale.symbol),
                     {}});
                return true;
            }
        }
        return false;
    }

    // "'D' is in mm, 'Q' in L/s": the symbols under a node declared in non-coherent units.
    std::string units_in(std::uint32_t root) const {
        std::string out;
        // "OB/100*Q_r" with OB in % and Q_r in kg: were only the percentage named, the kilograms
        // that make the term's unit would be missing; coherent units are named then too.
        std::string coherent;
        bool only_pure_numbers = true;
        std::vector<std::uint32_t> stack{root};
        std::size_t listed = 0;
        while (!stack.empty() && listed < 6) {
            const syntax::expr_node& n = file_.nodes[stack.back()];
            stack.pop_back();
            if (n.kind == expr_kind::symbol) {
                const symbol_entry* e = symbols_.find(text(n.range));
                if (e != nullptr && !e->unit_text.empty() && std::abs(e->si_factor - 1.0) > 1e-12 &&
                    out.find(fmt::format("'{}'", text(n.range))) == std::string::npos) {
                    out += fmt::format("{}'{}' is in {}", out.empty() ? "" : ", ", text(n.range),
                                       e->unit_text);
                    only_pure_numbers = only_pure_numbers && e->dim && e->dim->is_dimensionless();
                    ++listed;
                } else if (e != nullptr && !e->unit_text.empty() && e->dim &&
                           !e->dim->is_dimensionless() && coherent.size() < 120 &&
                           coherent.find(fmt::format("'{}'", text(n.range))) == std::string::npos) {
                    coherent += fmt::format(", '{}' is in {}", text(n.range), e->unit_text);
                }
            } else if (n.kind == expr_kind::call) {
                for (std::uint32_t i = 0; i < n.rhs; ++i)
                    stack.push_back(file_.call_args[n.lhs + i]);
            } else if (n.kind != expr_kind::number && n.kind != expr_kind::pi &&
                       n.kind != expr_kind::quantity && n.kind != expr_kind::inferred &&
                       n.kind != expr_kind::reference) {
                if (n.rhs != syntax::no_index)
                    stack.push_back(n.rhs);
                if (n.lhs != syntax::no_index)
                    stack.push_back(n.lhs);
            }
        }
        if (!out.empty() && only_pure_numbers)
            out += coherent;
        return out;
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

    // W/K or W/(m²·K) times a temperature: a heat flow or a heat flux. Not J/K, which n·R_u
    // is as well as m·c_p: a gas law's p·V is an energy.
    static bool is_heat_per_degree(const compact_dimension& partner) {
        const std::string_view name = quantity_name((partner * temperature_dimension()).expand());
        return name == "power" || name == "heat flux or irradiance";
    }

    // α, β·V, R_20·α: a coefficient per degree of whatever it scales. Not where the product
    // with a temperature could be a gas law's or a heat's: an energy (n·R·T, m·c_p·T), a
    // pressure (ρ·R_s·T), an energy per mass (R_s·T) or per mole (R·T).
    static bool is_per_degree_coefficient(const compact_dimension& partner) {
        if (is_heat_per_degree(partner))
            return false;
        try {
            const dimension d = partner.expand();
            if (d.exponent(base_dimension::temperature) != rational(-1))
                return false;
            // Per mole as well (R·T with a current beside it, Faraday's gas volume): a gas law,
            // which wants the absolute temperature, not a difference.
            if (d.exponent(base_dimension::amount) < rational(0))
                return false;
            const dimension scaled = (partner * temperature_dimension()).expand();
            const auto is = [&](int m, int l, int t, int n) {
                return scaled.exponent(base_dimension::mass) == rational(m) &&
                       scaled.exponent(base_dimension::length) == rational(l) &&
                       scaled.exponent(base_dimension::time) == rational(t) &&
                       scaled.exponent(base_dimension::amount) == rational(n) &&
                       scaled.exponent(base_dimension::current).is_zero() &&
                       scaled.exponent(base_dimension::luminous_intensity).is_zero();
            };
            return !(is(1, 2, -2, 0) || is(1, -1, -2, 0) || is(0, 2, -2, 0) || is(1, 2, -2, -1));
        } catch (const std::exception&) {
            return false;
        }
    }

    // "(0.7 + 0.03*t)": a number other than 1 plus a number times a symbol, in either order;
    // "1 + α*t" is a coefficient per degree, whose reference the reading should be taken from.
    bool linear_fit_on_reading(std::uint32_t node) const {
        node = syntax::inside_brackets(file_, node);
        const syntax::expr_node& sum = file_.nodes[node];
        if (sum.kind != expr_kind::add)
            return false;
        const auto number_times_symbol = [&](std::uint32_t k) {
            const syntax::expr_node& n = file_.nodes[syntax::inside_brackets(file_, k)];
            if (n.kind != expr_kind::multiply)
                return false;
            const expr_kind a = file_.nodes[n.lhs].kind;
            const expr_kind b = file_.nodes[n.rhs].kind;
            return (a == expr_kind::number && b == expr_kind::symbol) ||
                   (a == expr_kind::symbol && b == expr_kind::number);
        };
        for (const auto& [constant, slope] :
             {std::pair{sum.lhs, sum.rhs}, std::pair{sum.rhs, sum.lhs}}) {
            const syntax::expr_node& c = file_.nodes[syntax::inside_brackets(file_, constant)];
            if (c.kind == expr_kind::number && number_times_symbol(slope) &&
                read_number(text(c.range)).literal.value != 1.0)
                return true;
        }
        return false;
    }

    // A value on an offset scale used where only an absolute one makes sense.
    void report_offset(std::uint32_t node, const unit_definition& unit, std::string_view where,
                       const compact_dimension* partner = nullptr) {
        const bool temperature =
            unit.exponents[static_cast<std::size_t>(base_dimension::temperature)] != 0;
        diagnostic& d =
            report(rules::offset_scale,
                   fmt::format("{} is on the {} scale, whose zero is arbitrary, so it cannot be {}",
                               quote(node), unit.symbol, where),
                   file_.nodes[node].range);
        d.mark_label = fmt::format("on the {} scale, whose zero is arbitrary", unit.symbol);
        if (where == "used in a quotient" && file_.nodes[node].kind != expr_kind::symbol)
            note_bare_fit_on_scale(node);
        // "ΔT : °F": a difference declared in the scale's unit; the Δ unit says what is meant.
        if (file_.nodes[node].kind == expr_kind::symbol) {
            const std::string_view name = text(file_.nodes[node].range);
            const symbol_entry* entry = symbols_.find(name);
            // "θ_max : °C "oil temperature range, -20 to 105 °C"": an end of a range is a
            // reading, whatever the description shared with the other end says.
            const bool range_end = name.ends_with("max") || name.ends_with("min") ||
                                   name.find("_max") != std::string_view::npos ||
                                   name.find("_min") != std::string_view::npos;
            if (entry != nullptr && entry->offset_unit == &unit && !range_end &&
                names_a_difference(name, entry->description)) {
                d.notes.push_back(
                    {fmt::format("its name or description says it is a difference: declare it "
                                 "as '{} : \u0394{}', a difference on the {} scale, which may be "
                                 "multiplied and divided freely",
                                 name, unit.symbol, unit.symbol),
                     {}});
                return;
            }
        }
        // "k*(0.7 + 0.03*t)", Hazen's correction of a permeability to the water's temperature
        // (Terzaghi, Peck and Mesri, 1996, from memory): an empirical fit made on the °C scale
        // holds with the reading as it is, and kelvins would break it.
        if (temperature && linear_fit_on_reading(node)) {
            d.notes.push_back(
                {fmt::format("{} reads as an empirical fit made on the {} scale: it holds only "
                             "with the reading in {}, so adding 273.15 would break it; where the "
                             "fit is the published one, accept this finding with a '# reviewed "
                             "offset-scale: ...' mark naming its source",
                             quote(node), unit.symbol, unit.symbol),
                 {}});
            return;
        }
        // A coefficient per degree (α in R_20*(1 + α*T), β in V*β*T) multiplies a difference
        // from its reference temperature, not an absolute temperature.
        if (temperature && partner != nullptr && is_per_degree_coefficient(*partner)) {
            const std::string reference = reference_temperature();
            d.notes.push_back(
                {fmt::format("a coefficient per degree multiplies a temperature difference: "
                             "write ({} - {}) with {} the coefficient's reference temperature "
                             "in {}",
                             display_text(file_.nodes[node].range), reference, reference,
                             unit.symbol),
                 {}});
            return;
        }
        // U·A·T, ṁ·c_p·T: a heat flow per degree times a reading. What is meant is a
        // difference of two temperatures; converting the reading to kelvins would pass the
        // check and give a value many times too large.
        if (temperature && partner != nullptr && is_heat_per_degree(*partner)) {
            d.notes.push_back(
                {fmt::format("a heat flow per degree (U·A, ṁ·c_p) multiplies a "
                             "temperature difference: write ({} - T_other), with T_other the "
                             "other stream's or side's temperature; the reading converted to "
                             "kelvins would pass this check and be many times too large",
                             display_text(file_.nodes[node].range)),
                 {}});
            d.notes.push_back({"a difference of two values on the same scale, such as T_2 - T_1, "
                               "is an ordinary quantity and may be used freely",
                               {}});
            return;
        }
        // The physics decides which fix is right, and a dimension cannot tell ρ·c_p·T from
        // ρ·R·T: each fix is given with the formulas it suits.
        d.notes.push_back(
            {temperature
                 ? fmt::format("if the law needs absolute temperature (gas laws, Arrhenius, "
                               "radiation): declare it in K (or °R), or convert the {} value "
                               "first by adding {:g}",
                               unit.symbol, unit.offset / unit.factor)
                 : fmt::format("gas laws and pressure ratios need absolute pressure: add the "
                               "atmospheric pressure, or declare it as an absolute pressure "
                               "(Pa, bar, psia)"),
             {}});
        d.notes.push_back(
            {temperature
                 ? std::string("if it stands for a rise or a drop (a heat balance, an "
                               "expansion): write the difference of two readings, such as "
                               "T_2 - T_1, an ordinary quantity that may be used freely")
                 : std::string("a difference of two values on the same scale, such as p_2 - p_1, "
                               "is an ordinary quantity and may be used freely"),
             {}});
    }

    // "20" from R_20 or T_20 in the formula: the reference temperature a coefficient per
    // degree is tabulated at; "T_ref" when the formula names none.
    std::string reference_temperature() const {
        std::string found;
        visit_nodes([&](const syntax::expr_node& n) {
            if (n.kind != expr_kind::symbol || !found.empty())
                return;
            const std::string_view name = text(n.range);
            const std::size_t underscore = name.rfind('_');
            if (underscore == std::string_view::npos || underscore + 1 >= name.size())
                return;
            const std::string_view digits = name.substr(underscore + 1);
            // R_20, ρ_15, C_25: the temperatures tables are given at. k_1 or C_10 (the
            // ten-hour rate) number something else.
            if (digits.size() <= 3 && std::all_of(digits.begin(), digits.end(),
                                                  [](char c) { return c >= '0' && c <= '9'; })) {
                const int value = std::stoi(std::string(digits));
                if (value >= 15 && value <= 100)
                    found = std::string(digits);
            }
        });
        return found.empty() ? std::string("T_ref") : found;
    }

    // A number read as a reference state, or a gauge reading with its atmosphere, in ratio
    // with an absolute reading: the product takes the reading's dimension and unit in its
    // place, a pure ratio, and is no reading. False where the dimension overflowed (the
    // product is then unknown).
    static bool pair_number_with_reading(const reference_state_pairs::number& number,
                                         reference_state_pairs::reading& reading,
                                         typed_term& result) {
        reading.paired = true;
        try {
            result.dim = number.sign > 0 ? result.dim * reading.dim : result.dim / reading.dim;
        } catch (const std::exception&) {
            result = unknown_type();
            return false;
        }
        result.scale =
            number.sign > 0 ? result.scale * reading.scale : result.scale / reading.scale;
        result.exact_scale.reset();
        result.value.reset();
        result.numeric = false;
        result.point = false;
        result.origin = 0.0;
        result.origin_tolerance = 0.0;
        return true;
    }

    // "F*(p_g + 14.7)/(100 + 14.7)" in a sheet (a leak's flow scaled from the table's 100 psig
    // by absolute pressure; common practice): the added numbers are a gauge reading and the
    // atmosphere in the unit of the absolute pressure they stand in ratio with, which the
    // notation would write 100 {psig}; read so, the ratio is pure, with a note.
    [[gnu::noinline]] bool read_gauge_plus_atmosphere(const reference_state_pairs::number& number,
                                                      reference_state_pairs::reading& reading,
                                                      typed_term& result) {
        const syntax::expr_node& sum = file_.nodes[syntax::inside_brackets(file_, number.node)];
        if (sum.kind != expr_kind::add || !(reading.dim == pressure_dimension()) ||
            file_.nodes[sum.lhs].kind != expr_kind::number ||
            file_.nodes[sum.rhs].kind != expr_kind::number)
            return false;
        std::uint32_t atmosphere = syntax::no_index;
        const reference_state* state = nullptr;
        for (const std::uint32_t side : {sum.rhs, sum.lhs}) {
            const std::string_view written = text(file_.nodes[side].range);
            state = read_reference_state(reading.dim, written_number(file_.nodes[side].range),
                                         written, reading.scale);
            if (state != nullptr) {
                atmosphere = side;
                break;
            }
        }
        if (atmosphere == syntax::no_index)
            return false;
        if (!pair_number_with_reading(number, reading, result))
            return true;
        for (std::uint32_t l = result.literal_begin; l < literals_.size(); ++l)
            if (literals_[l].node == number.node || literals_[l].node == sum.lhs ||
                literals_[l].node == sum.rhs)
                read_as_quantity(literals_[l]);
        const std::uint32_t gauge = atmosphere == sum.rhs ? sum.lhs : sum.rhs;
        diagnostic& d = report(
            rules::trade_constant,
            fmt::format("'{}' is read as a gauge reading, {}, plus the atmosphere, {}, in the unit "
                        "of {}: an absolute pressure, which it stands in ratio with",
                        display_text(file_.nodes[number.node].range),
                        display_text(file_.nodes[gauge].range),
                        display_text(file_.nodes[atmosphere].range), quote(reading.node)),
            file_.nodes[number.node].range);
        d.level = severity::note;
        d.notes.push_back(
            {fmt::format("the trades' atmospheres: {}; above sea level it is less", state->choices),
             {}});
        return true;
    }

    // "V*273.15/T": each bare number of the product that stands for a standard reference
    // temperature or pressure in the unit of an absolute reading it is in ratio with makes,
    // with it, a pure ratio. The number is then a quantity, not a factor for the scale rules.
    void read_reference_states(reference_state_pairs& pairs, typed_term& result) {
        if (!result.known)
            return;
        for (std::size_t i = 0; i < pairs.number_count; ++i) {
            const reference_state_pairs::number& number = pairs.numbers[i];
            for (std::size_t k = 0; k < pairs.reading_count; ++k) {
                reference_state_pairs::reading& reading = pairs.readings[k];
                if (reading.paired || reading.sign == number.sign)
                    continue;
                // "(100 + 14.7)": one number to the product, a sum in the text; (68 + 459.67)
                // is one too, a reference temperature in °R, read below.
                if (file_.nodes[syntax::inside_brackets(file_, number.node)].kind ==
                        expr_kind::add &&
                    read_gauge_plus_atmosphere(number, reading, result)) [[unlikely]]
                    break;
                const std::string_view written = text(file_.nodes[number.node].range);
                // p_b/1000 with p_b in mbar: a power of ten beside a pressure converts its unit
                // (a barometer in mbar added in bar) far more often than it is 1000 mbar.
                const double power = std::round(std::log10(number.value));
                if (power != 0.0 && reading.dim == pressure_dimension() &&
                    std::abs(number.value / std::pow(10.0, power) - 1.0) < 1e-12)
                    continue;
                const reference_state* state =
                    read_reference_state(reading.dim, number.value, written, reading.scale);
                if (state == nullptr)
                    continue;
                if (!pair_number_with_reading(number, reading, result))
                    return;
                for (std::uint32_t l = result.literal_begin; l < literals_.size(); ++l) {
                    scale_literal& literal = literals_[l];
                    if (literal.node != number.node)
                        continue;
                    read_as_quantity(literal);
                }
                diagnostic& d = report(
                    rules::trade_constant,
                    fmt::format("'{}' is read as {} in the unit of {}, which it stands in ratio "
                                "with",
                                display_text(file_.nodes[number.node].range), state->what,
                                quote(reading.node)),
                    file_.nodes[number.node].range);
                d.level = severity::note;
                d.notes.push_back({fmt::format("the trades' choices: {}; the contract or permit "
                                               "decides which",
                                               state->choices),
                                   {}});
                d.notes.push_back({std::string(state->advice), {}});
                break;
            }
        }
    }

    // Whether a product is a pressure scaled by the shape of a wall: every factor beside its
    // pressures, looked at through parentheses, powers and sums, is a number, a pure ratio, a
    // length or an area (p_g*D/(2*t), 2*S*t/D, p_g/SG), not the state of a gas (p_g*V_1/V_2,
    // p_g*(T_2/T_1), ρ*R*T). Such a product is a net pressure across the wall, which a gauge
    // reads. With a gauge pressure in it, any number of gauge pressures may stand; without,
    // exactly one pressure of another kind (the allowable stress). Walked with a stack of its
    // own, as a product may be nested a million deep.
    bool pressure_scaled_by_shape(std::uint32_t product, bool with_gauge,
                                  bool* geometric = nullptr) const {
        const syntax::expr_node& root = file_.nodes[product];
        if (root.kind != expr_kind::multiply && root.kind != expr_kind::divide)
            return false;
        int other_pressures = 0;
        int stresses = 0;
        bool shape = false;
        if (geometric != nullptr)
            *geometric = false;
        std::vector<std::uint32_t> pending{product};
        while (!pending.empty()) {
            const syntax::expr_node& n = file_.nodes[pending.back()];
            pending.pop_back();
            switch (n.kind) {
            case expr_kind::multiply:
            case expr_kind::divide:
                // p_1g*p_2g/(p_1g + p_2g): gauge pressures multiplied or divided by one
                // another are a gas law's, not a gauge reading scaled.
                if (with_gauge && holds_gauge(n.lhs) && holds_gauge(n.rhs))
                    return false;
                pending.push_back(n.lhs);
                pending.push_back(n.rhs);
                break;
            case expr_kind::add:
            case expr_kind::subtract:
                pending.push_back(n.lhs);
                pending.push_back(n.rhs);
                break;
            case expr_kind::group:
            case expr_kind::negate:
            case expr_kind::power: // (D/t)^2: the base decides
                pending.push_back(n.lhs);
                break;
            case expr_kind::number:
            case expr_kind::pi:
                break;
            case expr_kind::symbol:
            case expr_kind::reference: { // a workbook's cell, typed by the unit written for it
                typed_term cell;
                const typed_term* found = &cell;
                if (n.kind == expr_kind::reference) {
                    const syntax::reference_value& r = file_.references[n.lhs];
                    if (!r.dim)
                        return false;
                    cell.dim = compact_dimension(*r.dim);
                    cell.offset = r.offset;
                } else {
                    const symbol_entry* entry = symbols_.find(text(n.range));
                    if (entry == nullptr || !entry->checked_type || !entry->checked_type->known)
                        return false;
                    found = &*entry->checked_type;
                }
                const typed_term& t = *found;
                if (t.dim == pressure_dimension()) {
                    const bool gauge = t.offset != nullptr && t.offset->scale == unit_scale::gauge;
                    // 1.3*MAWP*S_amb/S, the hydrotest pressure: a ratio of stresses is pure.
                    if (with_gauge && !gauge && !t.point) {
                        ++stresses;
                        break;
                    }
                    if (gauge != with_gauge || (!gauge && ++other_pressures > 1))
                        return false;
                } else if (t.dim.is_dimensionless() || t.dim == length_dimension() ||
                           t.dim == area_dimension()) {
                    shape = true;
                    if (geometric != nullptr && !t.dim.is_dimensionless())
                        *geometric = true;
                } else {
                    return false;
                }
                break;
            }
            default:
                return false;
            }
        }
        return with_gauge ? stresses % 2 == 0 : (other_pressures == 1 && shape);
    }

    // Whether a subtree holds a gauge pressure (a symbol or a workbook cell declared on one).
    bool holds_gauge(std::uint32_t node) const {
        return syntax::search_subtree(file_, node, [&](std::uint32_t, const syntax::expr_node& n) {
            switch (n.kind) {
            case expr_kind::symbol: {
                const symbol_entry* entry = symbols_.find(text(n.range));
                return entry != nullptr && entry->offset_unit != nullptr &&
                               entry->offset_unit->scale == unit_scale::gauge
                           ? search_step::found
                           : search_step::skip;
            }
            case expr_kind::reference: {
                const syntax::reference_value& r = file_.references[n.lhs];
                return r.offset != nullptr && r.offset->scale == unit_scale::gauge
                           ? search_step::found
                           : search_step::skip;
            }
            case expr_kind::call:
                return search_step::skip;
            default:
                return search_step::descend;
            }
        });
    }

    // One term of a product expanded into a sum: a number times declared symbols.
    struct expanded_term {
        double coefficient = 1.0;
        std::array<std::uint32_t, 6> symbols{};
        std::size_t count = 0;
    };
    static constexpr std::size_t most_expanded_terms = 16;
    using expansion = std::vector<expanded_term>;

    // The node multiplied out into numbers times declared symbols, or nothing where it holds
    // anything else (a call, a power, a difference) or grows past a formula's size.
    bool expand(std::uint32_t i, expansion& out) const {
        const syntax::expr_node& n = file_.nodes[i];
        switch (n.kind) {
        case expr_kind::group:
            return expand(n.lhs, out);
        case expr_kind::number: {
            const std::optional<rational> v = rational::parse(text(n.range));
            if (!v)
                return false;
            out.push_back({v->to_double(), {}, 0});
            return true;
        }
        case expr_kind::symbol:
            if (symbols_.find(text(n.range)) == nullptr)
                return false;
            out.push_back({1.0, {i}, 1});
            return true;
        case expr_kind::reference: // a workbook's cell, as a symbol is
            if (!file_.references[n.lhs].dim)
                return false;
            out.push_back({1.0, {i}, 1});
            return true;
        case expr_kind::add: {
            if (!expand(n.lhs, out) || !expand(n.rhs, out))
                return false;
            return out.size() <= most_expanded_terms;
        }
        case expr_kind::subtract:
        case expr_kind::negate: {
            const std::size_t first = out.size();
            if (n.kind == expr_kind::subtract && !expand(n.lhs, out))
                return false;
            const std::size_t negated = out.size();
            if (!expand(n.kind == expr_kind::subtract ? n.rhs : n.lhs, out))
                return false;
            for (std::size_t k = n.kind == expr_kind::subtract ? negated : first; k < out.size();
                 ++k)
                out[k].coefficient = -out[k].coefficient;
            return out.size() <= most_expanded_terms;
        }
        case expr_kind::divide: {
            // By a number only (x/100): a weight written as a percentage.
            const syntax::expr_node& d = file_.nodes[syntax::inside_brackets(file_, n.rhs)];
            const std::optional<rational> v =
                d.kind == expr_kind::number ? rational::parse(text(d.range)) : std::nullopt;
            const std::size_t first = out.size();
            if (!v || v->is_zero() || !expand(n.lhs, out))
                return false;
            for (std::size_t k = first; k < out.size(); ++k)
                out[k].coefficient /= v->to_double();
            return true;
        }
        case expr_kind::multiply: {
            expansion left;
            expansion right;
            if (!expand(n.lhs, left) || !expand(n.rhs, right) ||
                left.size() * right.size() > most_expanded_terms)
                return false;
            for (const auto& a : left)
                for (const auto& b : right) {
                    if (a.count + b.count > a.symbols.size())
                        return false;
                    expanded_term t = a;
                    t.coefficient *= b.coefficient;
                    for (std::size_t k = 0; k < b.count; ++k)
                        t.symbols[t.count++] = b.symbols[k];
                    out.push_back(t);
                }
            return out.size() <= most_expanded_terms;
        }
        default:
            return false;
        }
    }

    // An expanded term's few names in order: an insertion sort (std::sort's bounds puzzle GCC
    // here).
    static void sort_names(std::array<std::string_view, 6>& names, std::size_t size) {
        for (std::size_t a = 1; a < size && a < names.size(); ++a)
            for (std::size_t b = a; b > 0 && names[b] < names[b - 1]; --b)
                std::swap(names[b], names[b - 1]);
    }

    // The type of a factor of an expanded term: a declared symbol or a workbook's cell.
    typed_term expanded_factor_type(const syntax::expr_node& factor) {
        return factor.kind == expr_kind::reference ? eval_reference(factor) : eval_symbol(factor);
    }

    // Whether a reading joins those of a mean so far, on the same scale and unit; the first
    // one sets them.
    static bool joins_readings(std::optional<typed_term>& readings, const typed_term& s) {
        if (!readings) {
            readings = s;
            return true;
        }
        return s.offset == readings->offset && s.scale == readings->scale && s.dim == readings->dim;
    }

    // "(q_h*T_h + q_c*T_c)/(q_h + q_c)", "(0.22*(T_a*W_a + T_c*W_c) + T_w*W_w)/(0.22*(W_a +
    // W_c) + W_w)": readings on one offset scale, each times a weight, over the sum of the
    // same weights, are their weighted mean, a reading on that scale whatever the scale's zero
    // (mixing and blending; the fresh-concrete temperature; common practice). Only where
    // every factor is a number or a declared symbol, so that nothing is reported twice.
    // A reading moved to a scale's zero with its degrees not yet converted: T_F - 32 is on
    // the °C scale only once divided by 1.8.
    static bool half_converted(const typed_term& t) {
        return t.known && t.offset != nullptr && t.offset->scale == unit_scale::offset &&
               t.dim == temperature_dimension() && std::isfinite(t.scale) &&
               std::abs(t.scale / t.offset->factor - 1.0) > 1e-6;
    }

    // True where the factor, made in `evaluated`, was read as a rise (the product so far may
    // have been instead).
    [[gnu::noinline]] static bool
    settle_half_conversion(typed_term& result, const typed_term* factor, std::byte* evaluated) {
        if (half_converted(result) && factor->known && !factor->numeric)
            read_as_rise(result);
        if (factor != reinterpret_cast<const typed_term*>(evaluated) || !half_converted(*factor) ||
            !result.known || result.numeric)
            return false;
        read_as_rise(*reinterpret_cast<typed_term*>(evaluated));
        return true;
    }

    // "(235 + θ_1)": a °C reading plus a conductor's inferred zero of resistance, 234.5 or 235
    // for copper and 225 or 228 for aluminium (IEC 60034-1 and IEEE 112, from memory).
    bool from_inferred_zero_of_resistance(std::uint32_t node) const {
        node = syntax::inside_brackets(file_, node);
        const syntax::expr_node& n = file_.nodes[node];
        if (n.kind != expr_kind::add)
            return false;
        const std::uint32_t number = file_.nodes[n.lhs].kind == expr_kind::number ? n.lhs : n.rhs;
        const std::uint32_t reading = number == n.lhs ? n.rhs : n.lhs;
        if (file_.nodes[number].kind != expr_kind::number ||
            file_.nodes[reading].kind != expr_kind::symbol)
            return false;
        const symbol_entry* e = symbols_.find(text(file_.nodes[reading].range));
        if (e == nullptr || e->offset_unit == nullptr || e->offset_unit->symbol != "\u00B0C")
            return false;
        const std::string_view written = text(file_.nodes[number].range);
        return written == "234.5" || written == "235" || written == "225" || written == "228";
    }

    bool number_beside_one_cell(std::uint32_t node) const {
        node = syntax::inside_brackets(file_, node);
        const syntax::expr_node& n = file_.nodes[node];
        if (n.kind != expr_kind::divide)
            return false;
        const expr_kind a = file_.nodes[n.lhs].kind;
        const expr_kind b = file_.nodes[n.rhs].kind;
        const std::uint32_t number = a == expr_kind::number ? n.lhs : n.rhs;
        if (!((a == expr_kind::number && b == expr_kind::reference) ||
              (a == expr_kind::reference && b == expr_kind::number)))
            return false;
        // (Q/1000)^1.852 in Hazen-Williams with Q in L/s: a power of ten from a hundred up
        // converts the cell's unit; it is no reference value (a wind profile's 10 m is).
        const double v = written_number(file_.nodes[number].range);
        const double decade = std::round(std::log10(v));
        return !(v >= 100.0 && std::abs(v / std::pow(10.0, decade) - 1.0) < 1e-12);
    }

    // "21/(21 - O2)" with O2 in %, the excess-air ratio from the flue gas's oxygen (common
    // practice): the number over the sum that reads it in the sum's unit is in that unit too.
    // "1 - O2/21" with O2 in % (CO2 = CO2_max·(1 - O2/21), common practice): 21 is oxygen's
    // share of dry air in %, so the quotient is a ratio of two percentages. And a number over
    // a sum in % that the sum starts with ("21/(21 - O2)") is in % too, as is one among the
    // product's factors (see carries_number_of_sum).
    [[gnu::noinline]] void settle_percent_divisor(typed_term& result, const typed_term& factor,
                                                  const syntax::expr_node& op) const {
        // "(53 - C_v)/53" with C_v in % (Arterburn's solids correction, from memory): a sum
        // in % over the number it starts with is a ratio of two percentages too.
        if (factor.numeric && result.known && !result.numeric && result.scale == 0.01 &&
            result.dim.is_dimensionless() &&
            (oxygen_share_of_air(op.rhs) || same_number_over_its_sum(op.rhs, op.lhs))) {
            result.scale = 1.0;
            result.exact_scale = rational(1);
            return;
        }
        if (factor.scale == 1.0 || factor.numeric || !factor.known ||
            !factor.dim.is_dimensionless())
            return;
        if (result.numeric && same_number_over_its_sum(op.lhs, op.rhs)) {
            result.scale = factor.scale;
            result.exact_scale = factor.exact_scale;
        } else if (carries_number_of_sum(op.lhs, op.rhs)) {
            result.scale *= factor.scale;
            result.exact_scale = exact_product(result.exact_scale, factor.exact_scale, false);
        }
    }

    // "233.426 + t", "p_g + 92.1": a sum of a number and a symbol, in either order, as the
    // number's node and the symbol's; empty for any other node.
    std::optional<std::pair<std::uint32_t, std::uint32_t>>
    number_beside_symbol(std::uint32_t k) const {
        const syntax::expr_node& n = file_.nodes[k];
        if (n.kind != expr_kind::add)
            return std::nullopt;
        if (file_.nodes[n.lhs].kind == expr_kind::number &&
            file_.nodes[n.rhs].kind == expr_kind::symbol)
            return std::pair{n.lhs, n.rhs};
        if (file_.nodes[n.rhs].kind == expr_kind::number &&
            file_.nodes[n.lhs].kind == expr_kind::symbol)
            return std::pair{n.rhs, n.lhs};
        return std::nullopt;
    }

    // "1730.63/(233.426 + t)" with t in °C: Antoine's fit (and Magnus's) typed with bare
    // constants, which are temperatures on the °C scale. Adding 273.15, as the gauge advice
    // says, would break the fit; saying the constants' units is the cure.
    [[gnu::noinline]] void note_bare_fit_on_scale(std::uint32_t denominator) {
        const std::uint32_t below = syntax::inside_brackets(file_, denominator);
        const auto parts = number_beside_symbol(below);
        if (!parts)
            return;
        const auto [shift, reading] = *parts;
        const std::string fit =
            shift == file_.nodes[below].lhs
                ? fmt::format("B {{K}}/({} {{K}} + {})", display_text(file_.nodes[shift].range),
                              display_text(file_.nodes[reading].range))
                : fmt::format("B {{K}}/({} + {} {{K}})", display_text(file_.nodes[reading].range),
                              display_text(file_.nodes[shift].range));
        out_.back().notes.insert(
            out_.back().notes.begin(),
            {fmt::format("if this is a fit made on the \u00B0C scale (Antoine's, Magnus's), its "
                         "constants are temperatures: write {}, B the fit's constant over it, to "
                         "say so, and do not add 273.15",
                         fit),
             {}});
    }

    // Whether a symbol under `node` is declared in a unit whose text holds one of `parts`.
    bool holds_symbol_in_unit(std::uint32_t node,
                              std::initializer_list<std::string_view> parts) const {
        return syntax::search_subtree(file_, node, [&](std::uint32_t, const syntax::expr_node& n) {
            if (n.kind != expr_kind::symbol)
                return search_step::descend;
            const symbol_entry* e = symbols_.find(text(n.range));
            const bool in = e != nullptr && std::any_of(parts.begin(), parts.end(), [&](auto p) {
                                return e->unit_text.find(p) != std::string_view::npos;
                            });
            return in ? search_step::found : search_step::skip;
        });
    }

    // Whether a symbol under `node` is declared in circular mils (cmil, kcmil, MCM).
    bool in_circular_mils(std::uint32_t node) const {
        return holds_symbol_in_unit(node, {"cmil", "MCM"});
    }

    // 20.9 % or 21 % (20.95 % by volume, the US Standard Atmosphere's dry air, from memory).
    [[gnu::noinline]] bool oxygen_share_of_air(std::uint32_t k) const {
        k = syntax::inside_brackets(file_, k);
        if (file_.nodes[k].kind != expr_kind::number)
            return false;
        const std::string_view written = text(file_.nodes[k].range);
        return written == "21" || written == "20.9" || written == "20.95" || written == "20.946";
    }

    // The number a sum starts with ("21" of 21 - O2), brackets aside; with `numbers_only`,
    // only where all its terms are numbers. no_index for anything else.
    std::uint32_t number_leading_sum(std::uint32_t k, bool numbers_only) const {
        k = syntax::inside_brackets(file_, k);
        if (file_.nodes[k].kind != expr_kind::add && file_.nodes[k].kind != expr_kind::subtract)
            return syntax::no_index;
        while (file_.nodes[k].kind == expr_kind::add ||
               file_.nodes[k].kind == expr_kind::subtract) {
            if (numbers_only && file_.nodes[file_.nodes[k].rhs].kind != expr_kind::number)
                return syntax::no_index;
            k = file_.nodes[k].lhs;
        }
        return file_.nodes[k].kind == expr_kind::number ? k : syntax::no_index;
    }

    // "C*21/(21 - O2)", "C*(21 - 3)/(21 - O2)", "C*F*20.9/(20.9 - O2)" with O2 in %: the
    // correction to a reference oxygen (Directive 2010/75/EU, Annex VI; US EPA Method 19, from
    // memory) writes above the number that leads the % sum below, alone or less the reference
    // O2, and there it is in % too.
    [[gnu::noinline]] bool carries_number_of_sum(std::uint32_t numerator,
                                                 std::uint32_t denominator) const {
        const std::uint32_t below = number_leading_sum(denominator, false);
        if (below == syntax::no_index)
            return false;
        const std::string_view written = text(file_.nodes[below].range);
        // "C*5.9/(20.9 - O2)": the reference oxygen taken off already, as US EPA Method 20
        // prints it (20.9 - 15 = 5.9; from memory); the references the codes use are 3, 6, 7,
        // 8, 11 and 15 % (boilers, solid fuels, waste incinerators, turbines).
        const bool oxygen = oxygen_share_of_air(below);
        const double share = oxygen ? read_number(written).literal.value : 0.0;
        const auto folded_reference = [&](std::uint32_t at) {
            if (!oxygen)
                return false;
            const double value = read_number(text(file_.nodes[at].range)).literal.value;
            for (const double reference : {3.0, 6.0, 7.0, 8.0, 11.0, 15.0})
                if (std::abs(value - (share - reference)) < 0.051)
                    return true;
            return false;
        };
        return for_each_factor(numerator, [&](std::uint32_t at, int sign) {
            if (sign < 0)
                return false;
            if (file_.nodes[at].kind == expr_kind::number)
                return text(file_.nodes[at].range) == written || folded_reference(at);
            const std::uint32_t above = number_leading_sum(at, true);
            return above != syntax::no_index && text(file_.nodes[above].range) == written;
        });
    }

    [[gnu::noinline]] bool same_number_over_its_sum(std::uint32_t numerator,
                                                    std::uint32_t denominator) const {
        numerator = syntax::inside_brackets(file_, numerator);
        denominator = syntax::inside_brackets(file_, denominator);
        const syntax::expr_node& top = file_.nodes[numerator];
        const syntax::expr_node& sum = file_.nodes[denominator];
        if (top.kind != expr_kind::number ||
            (sum.kind != expr_kind::add && sum.kind != expr_kind::subtract))
            return false;
        std::uint32_t first = sum.lhs;
        while (file_.nodes[first].kind == expr_kind::add ||
               file_.nodes[first].kind == expr_kind::subtract)
            first = file_.nodes[first].lhs;
        return file_.nodes[first].kind == expr_kind::number &&
               text(file_.nodes[first].range) == text(top.range);
    }

    // "17.625*t/(t + 243.04 {Δ°C})" (the Magnus fit of saturation pressure) and
    // "1730.63 {K}/(233.426 {K} + t)" (Antoine's) with t in °C: fits made on a temperature
    // scale with an arbitrary zero, whose constant is fitted to that zero, so they hold on
    // that scale alone. A constant that moves the zero to the absolute scale (t + 273.15) is
    // a conversion instead, and read as one.
    [[gnu::noinline]] bool fitted_on_scale(std::uint32_t numerator, std::uint32_t denominator,
                                           const typed_term& top, const typed_term& below) const {
        if (!below.known || !below.point || !(below.dim == temperature_dimension()) ||
            std::abs(below.origin) <= 1.0)
            return false;
        const auto constant = [&](std::uint32_t k) {
            const expr_kind kind = file_.nodes[k].kind;
            return kind == expr_kind::number || kind == expr_kind::quantity;
        };
        const syntax::expr_node& sum = file_.nodes[syntax::inside_brackets(file_, denominator)];
        if (sum.kind != expr_kind::add)
            return false;
        // The reading is a symbol, or a group that makes one ((T_K - 273.15), the °C reading of
        // a kelvin one).
        const auto reading_like = [&](std::uint32_t k) {
            const expr_kind kind = file_.nodes[k].kind;
            return kind == expr_kind::symbol || kind == expr_kind::group ||
                   kind == expr_kind::reference;
        };
        const std::uint32_t reading = reading_like(sum.lhs) ? sum.lhs : sum.rhs;
        const std::uint32_t shift = reading == sum.lhs ? sum.rhs : sum.lhs;
        if (!reading_like(reading) || !constant(shift))
            return false;
        const std::uint32_t top_node = syntax::inside_brackets(file_, numerator);
        if (constant(top_node))
            return top.known && top.offset == nullptr && !top.point &&
                   top.dim == temperature_dimension();
        if (top.offset == nullptr)
            return false;
        // The same reading times numbers: 17.625*t.
        const std::string_view name =
            text(file_.nodes[syntax::inside_brackets(file_, reading)].range);
        std::size_t readings = 0;
        std::uint32_t k = top_node;
        for (;;) {
            const syntax::expr_node& f = file_.nodes[k];
            const std::uint32_t factor =
                f.kind == expr_kind::multiply ? syntax::inside_brackets(file_, f.rhs) : k;
            const expr_kind kind = file_.nodes[factor].kind;
            if (kind == expr_kind::symbol || kind == expr_kind::reference ||
                kind == expr_kind::add || kind == expr_kind::subtract) {
                if (text(file_.nodes[factor].range) != name)
                    return false;
                ++readings;
            } else if (file_.nodes[factor].kind != expr_kind::number) {
                return false;
            }
            if (f.kind != expr_kind::multiply)
                break;
            k = syntax::inside_brackets(file_, f.lhs);
        }
        return readings == 1;
    }

    // "17.269*T/(237.3 + T)" with T in K: the Magnus fit of saturation pressure (and Antoine's,
    // Tetens') is made on the °C reading, its constant 230 to 245 °C (Alduchov and Eskridge
    // 1996; ISO 13788, from memory); beside a kelvin reading the sum is some 273 K off.
    [[gnu::noinline]] void report_celsius_fit_beside_kelvins(std::uint32_t denominator) {
        denominator = syntax::inside_brackets(file_, denominator);
        const syntax::expr_node& sum = file_.nodes[denominator];
        if (sum.kind != expr_kind::add)
            return;
        const std::uint32_t number =
            file_.nodes[sum.lhs].kind == expr_kind::number ? sum.lhs : sum.rhs;
        const std::uint32_t reading = number == sum.lhs ? sum.rhs : sum.lhs;
        if (file_.nodes[number].kind != expr_kind::number ||
            file_.nodes[reading].kind != expr_kind::symbol)
            return;
        const double constant = written_number(file_.nodes[number].range);
        const symbol_entry* e = symbols_.find(text(file_.nodes[reading].range));
        if (!(constant >= 200.0 && constant <= 260.0) || e == nullptr ||
            e->offset_unit != nullptr || e->unit_text != "K")
            return;
        diagnostic& d = report(
            rules::offset_scale,
            fmt::format("{} reads like a Magnus or Antoine fit's constant, made for a \u00B0C "
                        "reading, but {} is in K: the sum is some 273 K off",
                        display_text(file_.nodes[number].range), quote(reading)),
            file_.nodes[denominator].range);
        d.level = severity::warning;
        d.notes.push_back({fmt::format("write the \u00B0C reading, ({} - 273.15), wherever the "
                                       "fit takes the temperature",
                                       text(file_.nodes[reading].range)),
                           {}});
    }

    // "150 {psf} + 9000?*R/t_F" (ACI 347's wall pressure, T the concrete's °F reading): a
    // coefficient marked `?` over a temperature reading is a fit made on that reading's scale,
    // which the `?` declares empirical; its note says it holds only in the declared units.
    // Not where a pressure stands above the reading: p·M/(R·T) is a gas law's density, whose
    // T is absolute whatever constant is folded in (AP-42's loading loss 12.46·S·P·M/T in
    // lb/10³ gal wants °R; EPA AP-42, 5th ed., section 5.2, from memory).
    bool empirical_over_reading(std::uint32_t numerator, const typed_term& below) const {
        if (!below.known || !below.point || !(below.dim == temperature_dimension()))
            return false;
        bool inferred = false;
        bool pressure = false;
        for_each_factor(numerator, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            inferred = inferred || n.kind == expr_kind::inferred;
            if (n.kind == expr_kind::symbol && sign > 0)
                if (const symbol_entry* e = symbols_.find(text(n.range));
                    e != nullptr && e->compact_dim && *e->compact_dim == pressure_dimension())
                    pressure = true;
            return false;
        });
        return inferred && !pressure;
    }

    // "h_2 = h_1 + c_p*t_2": beside another enthalpy, c·t would be a change from it, which a
    // reading is not; the datum is read only where the side builds the enthalpy from readings.
    // A specific energy inside a product is part of the same build, counted from the same
    // datum: the latent heat in h = c_a*t + W*(h_g0 + c_v*t) (ASHRAE Fundamentals, ch. 1,
    // moist air; from memory) or in h = c_w*t + x*h_fg.
    bool holds_specific_energy_term(std::uint32_t root) const {
        return syntax::search_subtree(file_, root, [&](std::uint32_t, const syntax::expr_node& n) {
            switch (n.kind) {
            case expr_kind::symbol: {
                const symbol_entry* e = symbols_.find(text(n.range));
                return e != nullptr && e->compact_dim && *e->compact_dim == velocity_squared_dim
                           ? search_step::found
                           : search_step::skip;
            }
            case expr_kind::add:
            case expr_kind::subtract:
            case expr_kind::group:
            case expr_kind::negate:
                return search_step::descend;
            default:
                return search_step::skip;
            }
        });
    }

    [[gnu::noinline]] void note_enthalpy_side(const operand& first, std::uint32_t root) {
        if (names_specific_enthalpy(first) && !holds_specific_energy_term(root))
            enthalpy_side_ = root;
    }

    // A side that is one symbol of specific energy named or described as an enthalpy.
    bool names_specific_enthalpy(const operand& side) const {
        if (!side.type.known || !(side.type.dim == velocity_squared_dim) ||
            file_.nodes[side.node].kind != expr_kind::symbol)
            return false;
        const std::string_view name = text(file_.nodes[side.node].range);
        const symbol_entry* e = symbols_.find(name);
        return (name.starts_with("h_") || name == "h") ||
               (e != nullptr && e->description.find("enthalpy") != std::string_view::npos);
    }

    // "h_f = c_w*t" with t in °C, set equal to a specific enthalpy: the steam tables count
    // liquid water's enthalpy from 0.01 °C (IAPWS-IF97, from memory) and the psychrometric
    // tables dry air's from 0 °C (ASHRAE Fundamentals, ch. 1, h = 1.006·t), so c·t is the
    // enthalpy above that datum, as the trades write it. A note says so; °F readings, whose
    // US tables count from 32 °F, are no such thing.
    bool enthalpy_above_ice_point(std::uint32_t reading_node, const typed_term& reading,
                                  const typed_term& by) {
        if (!reading.known || reading.offset == nullptr || !by.known || by.numeric ||
            !(reading.dim == temperature_dimension()) ||
            std::abs(reading.offset->offset - 273.15) > 1e-9 || !(by.dim == specific_heat_dim))
            return false;
        diagnostic& d = report(rules::trade_constant,
                               fmt::format("{} is read as the rise above 0 \u00B0C, the datum of "
                                           "the steam and psychrometric tables, as the enthalpy "
                                           "on the other side counts it",
                                           quote(reading_node)),
                               file_.nodes[reading_node].range);
        d.level = severity::note;
        d.notes.push_back({"write (t - 0 {\u00B0C}) to say so; for a heat balance between two "
                           "states, the difference of two readings",
                           {}});
        return true;
    }

    static void read_as_rise(typed_term& t) {
        t.offset = nullptr;
        t.point = false;
        t.origin = 0.0;
        t.origin_tolerance = 0.0;
    }

    [[gnu::noinline]] std::optional<typed_term> weighted_mean(std::uint32_t index) {
        const syntax::expr_node& n = file_.nodes[index];
        // The weights below are a sum: most quotients are not, and are not expanded.
        std::uint32_t denominator = n.rhs;
        denominator = syntax::inside_brackets(file_, denominator);
        if (file_.nodes[denominator].kind != expr_kind::add)
            return std::nullopt;
        expansion top;
        expansion below;
        if (!expand(n.lhs, top) || !expand(n.rhs, below) || top.size() < 2 ||
            top.size() != below.size())
            return std::nullopt;
        // Each numerator term: one reading on an offset scale and its weight, the rest.
        std::optional<typed_term> reading;
        std::optional<compact_dimension> weight_dim;
        double weight_scale = 0.0;
        std::array<bool, most_expanded_terms> matched{};
        for (const auto& t : top) {
            std::optional<std::size_t> at;
            typed_term weight;
            for (std::size_t k = 0; k < t.count; ++k) {
                const syntax::expr_node& factor = file_.nodes[t.symbols[k]];
                const typed_term s = expanded_factor_type(factor);
                if (!s.known)
                    return std::nullopt;
                if (s.offset != nullptr) {
                    if (at || !joins_readings(reading, s))
                        return std::nullopt;
                    at = k;
                    continue;
                }
                weight.dim = weight.dim * s.dim;
                weight.scale *= s.scale;
            }
            if (!at)
                return std::nullopt;
            if (!weight_dim) {
                weight_dim = weight.dim;
                weight_scale = weight.scale;
            } else if (!(weight.dim == *weight_dim) || weight.scale != weight_scale) {
                return std::nullopt;
            }
            // The same weight, with the same number, below.
            const auto same_weight = [&](const expanded_term& b) {
                if (b.count + 1 != t.count ||
                    std::abs(b.coefficient - t.coefficient) > 1e-12 * std::abs(t.coefficient))
                    return false;
                std::array<std::string_view, 6> names_top{};
                std::array<std::string_view, 6> names_below{};
                std::size_t m = 0;
                for (std::size_t k = 0; k < t.count; ++k)
                    if (k != *at)
                        names_top[m++] = text(file_.nodes[t.symbols[k]].range);
                for (std::size_t k = 0; k < b.count; ++k)
                    names_below[k] = text(file_.nodes[b.symbols[k]].range);
                sort_names(names_top, m);
                sort_names(names_below, b.count);
                for (std::size_t k = 0; k < m && k < names_top.size(); ++k)
                    if (names_top[k] != names_below[k])
                        return false;
                return true;
            };
            bool found = false;
            for (std::size_t w = 0; w < below.size() && !found; ++w)
                if (!matched[w] && same_weight(below[w]))
                    matched[w] = found = true;
            if (!found)
                return std::nullopt;
        }
        return reading;
    }

    // "x*T_o + (1 - x)*T_r": a term of the sum is a product that holds (1 - w) or
    // (100 - w), the shape of a mix's weights. Syntax only, so that other sums pay nothing.
    // Out of line, with its optional type, so that eval's frame stays small.
    [[gnu::noinline]] typed_term eval_mix_or_sum(std::uint32_t index) {
        if (mixing_shape(file_.nodes[index]))
            if (const auto mean = mixing_mean(index))
                return *mean;
        return eval_sum(index);
    }

    bool mixing_shape(const syntax::expr_node& n) const {
        if (n.kind != expr_kind::add)
            return false;
        for (std::uint32_t term : {n.lhs, n.rhs})
            for (int depth = 0; depth < 8; ++depth) {
                const syntax::expr_node& t = file_.nodes[term];
                if (t.kind == expr_kind::group) {
                    if (one_less_weights(t))
                        return true;
                    break;
                }
                if (t.kind != expr_kind::multiply && t.kind != expr_kind::divide)
                    break;
                if (file_.nodes[t.rhs].kind == expr_kind::group &&
                    one_less_weights(file_.nodes[t.rhs]))
                    return true;
                term = t.lhs;
            }
        return false;
    }

    // "(1 - x)", "(1 - x - y)", "(100 - OA)": the rest of a whole after its other parts.
    bool one_less_weights(const syntax::expr_node& group) const {
        std::uint32_t inner = group.lhs;
        for (int depth = 0; depth < 8 && file_.nodes[inner].kind == expr_kind::subtract; ++depth) {
            const syntax::expr_node& first = file_.nodes[file_.nodes[inner].lhs];
            if (first.kind == expr_kind::number) {
                const std::string_view whole = text(first.range);
                return whole == "1" || whole == "100";
            }
            inner = file_.nodes[inner].lhs;
        }
        return false;
    }

    // "T_m = x*T_o + (1 - x)*T_r", "=C5/100*C7 + (1 - C5/100)*C6": readings on one offset
    // scale, each times a pure-number weight, whose weights add up to 1 whatever the symbols
    // in them are, are a weighted mean, a reading on that scale (the mixed-air and blended-
    // water temperatures; ASHRAE Fundamentals, ch. 1, from memory). The weights are
    // multiplied out and summed as a polynomial in their symbols.
    [[gnu::noinline]] std::optional<typed_term> mixing_mean(std::uint32_t index) {
        expansion terms;
        if (!expand(index, terms) || terms.size() < 2)
            return std::nullopt;
        std::optional<typed_term> reading;
        // Each term's weight: its coefficient and its weight symbols' names, sorted.
        struct weight {
            double coefficient;
            std::array<std::string_view, 6> names;
            std::size_t count;
            double per_fraction; // the coefficient on the weights' values as fractions
        };
        std::vector<weight> weights;
        for (const auto& t : terms) {
            bool has_reading = false;
            weight w{t.coefficient, {}, 0, t.coefficient};
            for (std::size_t k = 0; k < t.count; ++k) {
                const syntax::expr_node& factor = file_.nodes[t.symbols[k]];
                const typed_term s = expanded_factor_type(factor);
                if (!s.known)
                    return std::nullopt;
                if (s.offset != nullptr) {
                    if (has_reading || !joins_readings(reading, s))
                        return std::nullopt;
                    has_reading = true;
                    continue;
                }
                // A weight is a pure number: a fraction, or a percentage in % over 100.
                if (!s.dim.is_dimensionless() || !(s.scale > 0) || s.point)
                    return std::nullopt;
                w.per_fraction /= s.scale;
                w.names[w.count++] = text(factor.range);
            }
            // Each weight a fraction itself, ±x or ±OA/100 with OA in %: OA alone beside the 1
            // of (1 - OA) is a percentage used as a fraction, for the sum's rules to report.
            if (!has_reading || (w.count > 0 && std::abs(std::abs(w.per_fraction) - 1.0) > 1e-9))
                return std::nullopt;
            sort_names(w.names, w.count);
            weights.push_back(w);
        }
        // Like monomials gathered: the constant must come to 1 and every other to 0.
        double constant = 0.0;
        for (std::size_t i = 0; i < weights.size(); ++i) {
            if (weights[i].count == 0) {
                constant += weights[i].coefficient;
                continue;
            }
            double sum = 0.0;
            for (const auto& other : weights)
                if (other.count == weights[i].count &&
                    std::equal(other.names.begin(),
                               other.names.begin() + static_cast<std::ptrdiff_t>(other.count),
                               weights[i].names.begin()))
                    sum += other.coefficient;
            if (std::abs(sum) > 1e-9)
                return std::nullopt;
        }
        if (std::abs(constant - 1.0) > 1e-9)
            return std::nullopt;
        return reading;
    }

    // Out of line, so that eval's frame, entered for every node, stays small.
    [[gnu::noinline]] typed_term eval_product(std::uint32_t index) {
        if (file_.nodes[index].kind == expr_kind::divide &&
            file_.nodes[file_.nodes[index].lhs].kind == expr_kind::group) [[unlikely]]
            if (const auto mean = weighted_mean(index))
                return *mean;
        return eval_factors(index);
    }

    // A product's factors, multiplied out. Every return is of `result`, so that it is built
    // in the caller's return object rather than copied there (a type is 112 bytes).
    typed_term eval_factors(std::uint32_t index) {
        const std::size_t spine_base = spine_.size();
        std::uint32_t n = index;
        while (file_.nodes[n].kind == expr_kind::multiply ||
               file_.nodes[n].kind == expr_kind::divide) {
            spine_.push_back(n);
            n = file_.nodes[n].lhs;
        }
        const typed_term* kept = kept_symbol_type(n);
        typed_term result = kept != nullptr ? *kept : eval(n);
        if (kept != nullptr)
            result.literal_begin = static_cast<std::uint32_t>(literals_.size());
        result.zero = false;
        std::uint32_t offset_node = n;
        std::size_t arena_place = compact_dimension::no_place;
        if (result.reading_or_difference)
            result.offset = nullptr;
        // A gauge pressure over a specific weight (p_g/(ρ*g)) is a head above the level where
        // the pressure is atmospheric, an ordinary length, and over an area (p_g*A) the net
        // force where the atmosphere acts on the other face. Scaled by lengths, areas and
        // pure ratios (p_g*D/(2*t), p_g/SG, p_g*A_1/A_2) it is the net pressure carried by a
        // wall, a stress. Any other product of a gauge pressure (p_g*V, p_g*M/(R*T),
        // p_g*V_1/V_2, p_g*T_2/T_1) is a gas law or a pressure ratio, which needs absolute
        // pressure: an error, known only once the whole product is.
        struct deferred_offset {
            std::uint32_t node;
            const unit_definition* unit;
            std::string_view where;
            bool divisor = false; // P/p_g: a load over a gauge pressure, the area it acts on
        };
        std::optional<deferred_offset> gauge_in_product;
        // ρ*g*h: the pressure of a column, a difference a gauge may read (p_g = ρ*g*h).
        bool has_gravity = result.known && result.dim == acceleration_dimension();
        reference_state_pairs pairs;
        pairs.note(result, n, +1, literals_);
        // Spine nodes were pushed outermost first; the innermost applies first.
        for (std::size_t k = spine_.size(); k > spine_base; --k) {
            const syntax::expr_node& op = file_.nodes[spine_[k - 1]];
            const bool divided = op.kind == expr_kind::divide;
            // Most factors are symbols, whose types are read where their entries keep them
            // rather than copied; any other is made in `evaluated`.
            alignas(typed_term) std::byte evaluated[sizeof(typed_term)];
            const typed_term* factor = kept_symbol_type(op.rhs);
            if (factor == nullptr) {
                typed_term* made = ::new (static_cast<void*>(evaluated)) typed_term(eval(op.rhs));
                if (made->reading_or_difference)
                    made->offset = nullptr;
                factor = made;
            }
            // A divisor or a product so far in %: see settle_percent_divisor.
            if (divided && (result.scale == 0.01 || (factor->scale != 1.0 && !factor->numeric)))
                [[unlikely]]
                settle_percent_divisor(result, *factor, op);
            // (R_2 - R_1)/R_1*(235 + θ_1): a winding's temperature from its inferred zero of
            // resistance, times a ratio, is a rise; and so is each bracket of the correction
            // R_2 = R_1*(235 + θ_2)/(235 + θ_1) (IEC 60076-1's load loss at 75 °C, from memory),
            // a temperature counted from the conductor's zero of resistance.
            if (factor->offset != nullptr && result.known && !result.numeric &&
                result.offset == nullptr && from_inferred_zero_of_resistance(op.rhs)) {
                if (factor != reinterpret_cast<const typed_term*>(evaluated))
                    factor = ::new (static_cast<void*>(evaluated)) typed_term(*factor);
                read_as_rise(*reinterpret_cast<typed_term*>(evaluated));
            } else if (!divided && result.offset != nullptr && factor->known && !factor->numeric &&
                       factor->offset == nullptr && factor->dim.is_dimensionless() &&
                       from_inferred_zero_of_resistance(n) && k == spine_.size()) {
                read_as_rise(result);
            }
            if (!divided && enthalpy_side_ != syntax::no_index &&
                (factor->offset != nullptr) != (result.offset != nullptr)) [[unlikely]] {
                if (factor->offset != nullptr &&
                    enthalpy_above_ice_point(op.rhs, *factor, result)) {
                    if (factor != reinterpret_cast<const typed_term*>(evaluated))
                        factor = ::new (static_cast<void*>(evaluated)) typed_term(*factor);
                    read_as_rise(*reinterpret_cast<typed_term*>(evaluated));
                } else if (result.offset != nullptr &&
                           enthalpy_above_ice_point(offset_node, result, *factor)) {
                    read_as_rise(result);
                }
            }
            if (divided && factor->offset == nullptr && factor->point &&
                factor->dim == temperature_dimension()) [[unlikely]]
                report_celsius_fit_beside_kelvins(op.rhs);
            if (divided && factor->offset != nullptr &&
                (fitted_on_scale(op.lhs, op.rhs, result, *factor) ||
                 empirical_over_reading(op.lhs, *factor))) {
                read_as_rise(result);
                if (factor != reinterpret_cast<const typed_term*>(evaluated))
                    factor = ::new (static_cast<void*>(evaluated)) typed_term(*factor);
                read_as_rise(*reinterpret_cast<typed_term*>(evaluated));
            }
            // "500*Q*(t_w - 32)" with t_w in °F: 32 lands the °C zero only where 1.8 follows
            // to convert the degrees; times a quantity the sum is the rise above 32 °F.
            if ((result.offset != nullptr || factor->offset != nullptr) &&
                settle_half_conversion(result, factor, evaluated))
                factor = reinterpret_cast<const typed_term*>(evaluated);
            const typed_term& t = *factor;
            if (divided)
                for (std::uint32_t i = 0; i < t.literal_count; ++i)
                    literals_[t.literal_begin + i].exponent =
                        -literals_[t.literal_begin + i].exponent;
            // Nearly every factor, and the product so far, is neither a reading nor on an
            // offset scale, where the rules below have nothing to do but say so.
            if (result.offset == nullptr && t.offset == nullptr && !result.point && !t.point) {
                result.origin = 0.0;
                result.origin_tolerance = 0.0;
            } else {
                // An offset value may be scaled by a pure number (the mean (T_1 + T_2)/2), not
                // multiplied by a quantity, nor by a `?` coefficient (which has a dimension).
                const auto scales_a_reading = [](const typed_term& reading,
                                                 const typed_term& other) {
                    return reading.known && reading.offset != nullptr &&
                           (other.known ? !other.numeric : other.inferred);
                };
                const bool left_off = scales_a_reading(result, t);
                // A number over a reading (1/T_a in Arrhenius's 1/T_1 - 1/T_2) is no scaling.
                const bool right_off =
                    (scales_a_reading(t, result) &&
                     !(result.known && result.numeric && !divided)) ||
                    (divided && t.known && t.offset != nullptr && result.known && result.numeric);
                const bool gauge_over_something =
                    (left_off || (right_off && !divided)) &&
                    compact_dimension((left_off ? result : t).offset->dim()) ==
                        pressure_dimension();
                // A = F/p_g: a load over a gauge pressure (a tyre's contact area, a cylinder's
                // bore), one gauge only; p_1g/p_2g stays a ratio of readings.
                const bool gauge_divisor =
                    !left_off && right_off && divided && !gauge_in_product &&
                    compact_dimension(t.offset->dim()) == pressure_dimension();
                if (gauge_over_something || gauge_divisor) {
                    if (!gauge_in_product)
                        gauge_in_product = deferred_offset{
                            left_off ? offset_node : op.rhs, left_off ? result.offset : t.offset,
                            divided ? "used in a quotient" : "multiplied", gauge_divisor};
                } else if (left_off || right_off) {
                    report_offset(left_off ? offset_node : op.rhs,
                                  left_off ? *result.offset : *t.offset,
                                  divided ? "used in a quotient" : "multiplied",
                                  left_off ? (t.known ? &t.dim : nullptr)
                                           : (result.known ? &result.dim : nullptr));
                    spine_.resize(spine_base);
                    result = unknown_type();
                    return result; // the one return object, built in place
                }
                if (t.offset != nullptr) {
                    result.offset = t.offset;
                    result.origin = t.origin;
                    result.origin_tolerance = t.origin_tolerance;
                    offset_node = op.rhs;
                }
                // A reading's weight follows the numbers that scale it: (T_1 + T_2)/2 weighs 1.
                // (t_F - 32)/1.8: the 1.8 converts the degrees to the scale's, and weighs
                // nothing.
                const bool converts_degrees =
                    result.point && t.numeric && t.value && !t.value->is_zero() &&
                    result.offset != nullptr && half_converted(result) &&
                    std::abs((divided
                                  ? t.value->to_double() * result.scale / result.offset->factor
                                  : t.value->to_double() * result.offset->factor / result.scale) -
                             1.0) < 1e-3;
                if (converts_degrees) {
                } else if (result.point && t.numeric && t.value && !t.value->is_zero()) {
                    scale_weight(result, divided ? rational(1) / *t.value : *t.value);
                } else if (t.point && result.numeric && result.value && !divided) {
                    const rational by = *result.value;
                    result.weight_numerator = t.weight_numerator;
                    result.weight_denominator = t.weight_denominator;
                    result.weighted_sum = t.weighted_sum;
                    scale_weight(result, by);
                }
                // A reading scaled by a number is still a reading; times a quantity it is not.
                // An absolute temperature times a pure ratio is one too (T_1*(p_2/p_1)^n, the
                // temperature after compression), with a weight no longer followed. Not a
                // pressure: an allowable stress in psi times a joint efficiency (S*E) is none.
                const auto ratio_of = [](const typed_term& by) {
                    return by.known && !by.numeric && by.offset == nullptr && !by.point &&
                           by.dim.is_dimensionless();
                };
                // Not (T_F - 58), a reading less a number, which is a difference there.
                const auto absolute_temperature = [](const typed_term& reading) {
                    return reading.point && reading.offset == nullptr &&
                           !reading.reading_or_difference && reading.dim == temperature_dimension();
                };
                const bool absolute_reading_by_ratio =
                    (absolute_temperature(result) && ratio_of(t) && !divided) ||
                    (absolute_temperature(t) && ratio_of(result));
                if (absolute_reading_by_ratio)
                    result.weight_denominator = 0;
                result.point = (result.point && t.numeric) || (t.point && result.numeric) ||
                               absolute_reading_by_ratio;
                if (!result.point) {
                    result.origin = 0.0;
                    result.origin_tolerance = 0.0;
                }
            }
            result.inferred = result.inferred || t.inferred;
            has_gravity = has_gravity || (t.known && !divided && t.dim == acceleration_dimension());
            pairs.note(t, op.rhs, divided ? -1 : +1, literals_);
            pairs.note_grouped_numbers(file_, op.rhs, t, literals_);
            result.scale = divided ? result.scale / t.scale : result.scale * t.scale;
            // Most factors are in SI units: times or over exactly 1 leaves the scale as it is.
            if (!(t.exact_scale && *t.exact_scale == rational(1)))
                result.exact_scale = exact_product(result.exact_scale, t.exact_scale, divided);
            result.known = result.known && t.known;
            result.numeric = result.numeric && t.numeric;
            if (result.known) {
                result.dim = divided ? result.dim / t.dim : result.dim * t.dim;
                // a*a*a*... past the 16-bit form: one arena entry for the chain, not one per
                // factor (t, the only other holder of entries made here, is done with).
                if (result.dim.in_arena())
                    result.dim = compact_dimension::settle_in_arena(result.dim, arena_place);
            }
            if (result.value && t.value && !(divided && t.value->is_zero())) {
                try {
                    result.value = divided ? *result.value / *t.value : *result.value * *t.value;
                } catch (const arithmetic_overflow&) {
                    result.value.reset(); // the value only matters to exponents; see apply_power
                }
            } else {
                result.value.reset();
            }
        }
        spine_.resize(spine_base);
        // "P = V*Δp_mbar/(3600*1000*η)": a side that already has the other side's dimension
        // holds no reference state; its numbers are conversions.
        if (pairs.any() && !(index == side_hint_node_ && side_hint_ != nullptr &&
                             side_hint_->known && result.known && side_hint_->dim == result.dim))
            read_reference_states(pairs, result);
        if (gauge_in_product) {
            bool geometric = false;
            const bool scaled_by_shape = result.known && result.dim == pressure_dimension() &&
                                         pressure_scaled_by_shape(index, true, &geometric);
            // p_set*(1 + OP/100), k_t*p_design: a gauge reading scaled by pure ratios alone is
            // still a gauge reading (its zero, the atmosphere, stays where it was), so that
            // setting it equal to an absolute pressure is reported, as 1.1*p_set is.
            // After a unit-scale finding inside it the scale is unknown: read on as before,
            // with no second finding about the same product.
            const bool scale_known = std::isfinite(result.scale);
            if (scaled_by_shape && !geometric && scale_known) {
                result.offset = gauge_in_product->unit;
                result.point = true;
                result.origin = gauge_in_product->unit->offset;
                result.origin_tolerance = 0.0;
                result.weight_denominator = 0; // scaled by symbols: not followed
                result.weighted_sum = false;
                return result;
            }
            const bool wall_stress = scaled_by_shape && (geometric || !scale_known);
            // p_g*D/2: the hoop tension a gauge pressure puts in a pipe or tank wall per unit of
            // its length, a net load as p_g*A is.
            const bool ring_tension = result.known && result.dim == force_per_length_dimension() &&
                                      pressure_scaled_by_shape(index, true);
            // sqrt(2*p_g/ρ): a gauge pressure over a density, under a square root, is the
            // velocity of a jet into the atmosphere (Torricelli's and Bernoulli's).
            const bool jet = result.known && index == square_root_argument_ &&
                             result.dim == velocity_squared_dimension();
            const bool bearing_area =
                gauge_in_product->divisor && result.known && result.dim == area_dimension();
            // H = p_g*1000/ρ_w: a gauge pressure over a density set equal to a head lacks g,
            // and p_g/(ρ*g) would be a head a gauge may give. The sides' mismatch says so,
            // which is the slip; its zero is no fault of it.
            const bool head_without_g = index == side_hint_node_ && side_hint_ != nullptr &&
                                        side_hint_->known &&
                                        side_hint_->dim == length_dimension() && result.known &&
                                        result.dim == velocity_squared_dimension();
            // SIDPP/(0.052*TVD), p_LOT/TVD: a gauge reading at the top of a column open to the
            // atmosphere over its depth is the column's gradient, or the mud weight that
            // balances it (Bourgoyne et al., Applied Drilling Engineering, 1986, ch. 4, from
            // memory).
            const bool column_gradient = result.known && result.dim == pressure_gradient_dim &&
                                         has_factor_of_dimension(index, length_dimension(), -1);
            // P = p_g*Q/600, p_psig*Q_gpm/1714: a pump's hydraulic power is the pressure it
            // adds times the flow, and from a vented tank that is the outlet's gauge reading
            // (common practice).
            // Only set equal to a power: "F*p_g/100" into scfm is a pressure ratio.
            const bool hydraulic_power = result.known && result.dim == power_dim &&
                                         index == side_hint_node_ && side_hint_ != nullptr &&
                                         side_hint_->known && side_hint_->dim == power_dim &&
                                         has_factor_of_dimension(index, volume_flow_dim, 1);
            if (result.known &&
                (result.dim == length_dimension() || result.dim == force_dimension() ||
                 wall_stress || ring_tension || jet || bearing_area || head_without_g ||
                 column_gradient || hydraulic_power)) {
                result.offset = nullptr;
                result.point = false;
                result.origin = 0.0;
                result.origin_tolerance = 0.0;
                result.absolute_pressure_difference = wall_stress;
            } else {
                report_offset(gauge_in_product->node, *gauge_in_product->unit,
                              gauge_in_product->where);
                // z + h_f + p_g*1000/ρ: over a density alone a gauge reading gives an energy per
                // mass; where a head was meant, the slip is the missing g, not the zero.
                if (result.known && result.dim == velocity_squared_dimension())
                    out_.back().notes.insert(
                        out_.back().notes.begin(),
                        {"if a head was meant, g is missing: p/(\u03C1*g) is a head, which a "
                         "gauge reading may give as it is",
                         {}});
                result = unknown_type();
                return result; // as above
            }
        }
        if (!result.known)
            result = unknown_type(result.inferred);
        else if (has_gravity && !result.point && result.dim == pressure_dimension())
            result.absolute_pressure_difference = true;
        return result;
    }

    // A scale raised to a power: most are SI units, whose scale 1 stays 1 (as std::pow gives
    // for any exponent) without a call.
    static double unit_power(double scale, double exponent) {
        return scale == 1.0 ? 1.0 : std::pow(scale, exponent);
    }

    typed_term apply_power(const typed_term& base, const typed_term& exponent,
                           std::uint32_t base_node, std::uint32_t exponent_node) {
        // Every return is of `result`, so that it is built in the caller's return object.
        typed_term result;
        if (counts_degrees_above_a_reference(base, exponent)) {
            result = temperature_correction(base, exponent, exponent_node);
            return result;
        }
        // =B5*(50/H5)^$C$19, a radiator's output at another temperature difference (EN 442):
        // a spreadsheet's number carries no unit, and over or under one cell, raised to a
        // power that is no constant or no whole number or root (1.3, the radiator's
        // exponent), it can only be a value in that cell's unit.
        if (file_.functions == syntax::function_names::spreadsheet &&
            (!exponent.value || exponent.value->den() > 3) && exponent.known && base.known &&
            !base.numeric && base.offset == nullptr && !base.dim.is_dimensionless() &&
            number_beside_one_cell(base_node)) [[unlikely]] {
            typed_term ratio = base;
            ratio.dim = compact_dimension{};
            ratio.scale = 1.0;
            ratio.exact_scale = rational(1);
            ratio.point = false;
            ratio.origin = 0.0;
            ratio.origin_tolerance = 0.0;
            result = apply_power(ratio, exponent, base_node, exponent_node);
            return result;
        }
        if (exponent.known && !exponent.dim.is_dimensionless()) {
            diagnostic& d = report(rules::dimensioned_exponent,
                                   fmt::format("the exponent {} has a dimension; an exponent must "
                                               "be dimensionless",
                                               quote(exponent_node)),
                                   file_.nodes[exponent_node].range);
            add_term(d, {exponent, exponent_node});
            d.notes.push_back(
                {fmt::format("{} is {}", quote(exponent_node), describe(exponent.dim)), {}, true});
            result = unknown_type();
            return result;
        }
        // 10^((t - t_ref)/z) with z in Δ°F beside °C: the exponent's units must cancel, as a
        // function's argument's must.
        if (exponent.known && !exponent.numeric && exponent.dim.is_dimensionless())
            report_units_not_cancelling({exponent, exponent_node},
                                        fmt::format("the exponent {}", quote(exponent_node)));
        // v_ref*(h_ft/h_ref)^α: under an exponent that is not a constant number the base's
        // units must cancel, for the factor between them would be raised to a power no one
        // can know.
        bool base_units_cancel = true;
        if (!exponent.value && exponent.known && base.known && !base.numeric &&
            base.dim.is_dimensionless() && std::isfinite(base.scale))
            base_units_cancel =
                report_units_not_cancelling(
                    {base, base_node}, fmt::format("the base {}", quote(base_node))) == nullptr;
        // The exponent's own numbers are not factors of the power; the base's are, raised.
        cut_literals_to(base.literal_begin + base.literal_count);
        if (exponent.value)
            for (std::uint32_t i = 0; i < base.literal_count; ++i)
                literals_[base.literal_begin + i].exponent *= exponent.value->to_double();
        else
            cut_literals_to(base.literal_begin);
        if (!base.known || !exponent.known) {
            result = unknown_type(base.inferred || exponent.inferred);
            return result;
        }
        if (base.offset != nullptr && !base.reading_or_difference &&
            !(exponent.value && *exponent.value == rational(1))) {
            report_offset(base_node, *base.offset, "raised to a power");
            result = unknown_type();
            return result;
        }
        result.numeric = base.numeric && exponent.numeric;
        result.exact_scale.reset();
        if (exponent.value) {
            result.scale = unit_power(base.scale, exponent.value->to_double());
            // A whole power stays exact; a rational one falls back to the double.
            result.exact_scale = plumb::exact_power(base.exact_scale, *exponent.value);
        }
        if (base.dim.is_dimensionless()) {
            result.value = exact_power(base.value, exponent.value);
            if (!base_units_cancel)
                result.scale = std::numeric_limits<double>::quiet_NaN(); // reported once
            return result;
        }
        if (!exponent.value) {
            const char* why = exponent.numeric ? "is not a number plumb can hold exactly"
                                               : "is not a constant number";
            diagnostic& d = report(
                rules::variable_exponent,
                fmt::format(
                    "{} has a dimension, so its exponent must be a constant number, but {} {}",
                    quote(base_node), quote(exponent_node), why),
                file_.nodes[exponent_node].range);
            add_term(d, {base, base_node});
            d.notes.push_back(
                {fmt::format("{} is {}", quote(base_node), describe(base.dim)), {}, true});
            d.notes.push_back({"the dimension of the power would depend on the exponent's value; "
                               "make the base dimensionless (divide by a reference value) first",
                               {}});
            result = unknown_type();
            return result;
        }
        result.dim = base.dim.pow(*exponent.value);
        return result;
    }

    // k_T = k_20*θ^(T - 20): the trades' temperature correction of a rate (the van 't Hoff-
    // Arrhenius form of water and wastewater treatment; common practice) raises a number θ to
    // the kelvins, or degrees Celsius, above a reference temperature. θ is per kelvin, a unit
    // the formula leaves unwritten, so the exponent must count kelvins: a difference of
    // readings, or a reading less its reference.
    static bool counts_degrees_above_a_reference(const typed_term& base,
                                                 const typed_term& exponent) {
        return base.known && exponent.known && base.dim.is_dimensionless() &&
               base.offset == nullptr && !exponent.numeric &&
               exponent.dim == temperature_dimension() &&
               (exponent.reading_or_difference ||
                (!exponent.point && exponent.offset == nullptr && exponent.zero_of == nullptr));
    }

    typed_term temperature_correction(const typed_term& base, const typed_term& exponent,
                                      std::uint32_t exponent_node) {
        cut_literals_to(base.literal_begin);
        typed_term result;
        // θ^(T_K - 20): a kelvin reading less a reference in °C counts from 20 K, some 273
        // kelvins below the reference the number was fitted at.
        if (const double reference = reference_subtracted(exponent_node);
            exponent.reading_or_difference && exponent.offset == nullptr && reference > 0.0 &&
            reference < 200.0) {
            diagnostic& d = report(
                rules::offset_scale,
                fmt::format("the exponent {} counts a reading on the absolute scale from {}: the "
                            "reference of a temperature correction is a reading in °C (20 °C "
                            "is 293.15 K), so this counts from {} K",
                            quote(exponent_node), format_factor(reference),
                            format_factor(reference)),
                file_.nodes[exponent_node].range);
            add_term(d, {exponent, exponent_node});
            d.notes.push_back({"write the reading in °C, or subtract the reference in kelvins "
                               "(T - 293.15 for 20 °C)",
                               {}});
            result = unknown_type();
            return result;
        }
        // A reading converted to another scale ((T_F - 32)/1.8) counts that scale's degrees.
        const double degree = exponent.offset != nullptr ? exponent.offset->factor : exponent.scale;
        if (std::isfinite(degree) && std::abs(degree - 1.0) < 1e-9) {
            diagnostic& d = report(
                rules::temperature_correction,
                fmt::format("the exponent {} is read as the kelvins (degrees Celsius) above a "
                            "reference temperature, as in a rate's temperature correction",
                            quote(exponent_node)),
                file_.nodes[exponent_node].range);
            d.level = severity::note;
            d.notes.push_back({"the number raised to it is then per kelvin: the formula holds "
                               "only with the reference on the scale it was fitted on, most "
                               "often 20 °C",
                               {}});
            return result;
        }
        diagnostic& d =
            report(rules::unit_scale,
                   fmt::format("the exponent {} counts degrees of another size than the kelvin; "
                               "a temperature correction's number is per kelvin (degree Celsius)",
                               quote(exponent_node)),
                   file_.nodes[exponent_node].range);
        add_term(d, {exponent, exponent_node});
        if (std::isfinite(degree))
            d.notes.push_back(
                {fmt::format("as written the exponent is {} times the kelvins it stands for",
                             format_factor(1.0 / degree)),
                 {}});
        d.notes.push_back({"convert the readings to °C first, and the reference with them "
                           "(20 °C is 68 °F)",
                           {}});
        result.scale = std::numeric_limits<double>::quiet_NaN(); // reported once
        return result;
    }

    // The number a reading less a number subtracts ("(T - 20)" gives 20), or 0.
    // The number a temperature correction's exponent counts from, either way round: the 20
    // of (T - 20), or of (20 - T), as viscosity corrections write it.
    double reference_subtracted(std::uint32_t node) const {
        node = syntax::inside_brackets(file_, node);
        const syntax::expr_node& n = file_.nodes[node];
        if (n.kind != expr_kind::subtract)
            return 0.0;
        if (file_.nodes[n.rhs].kind == expr_kind::number)
            return written_number(file_.nodes[n.rhs].range);
        if (file_.nodes[n.lhs].kind == expr_kind::number)
            return written_number(file_.nodes[n.lhs].range);
        return 0.0;
    }

    // b^e exactly, for the whole exponents that constant exponents such as 2^3 need.
    static std::optional<rational> exact_power(const std::optional<rational>& base,
                                               const std::optional<rational>& exponent) {
        if (!base || !exponent || !exponent->is_integer() || exponent->num() > 64 ||
            exponent->num() < -64 || (base->is_zero() && exponent->num() < 0))
            return std::nullopt;
        try {
            rational r = 1;
            for (std::int64_t k = 0; k < (exponent->num() < 0 ? -exponent->num() : exponent->num());
                 ++k)
                r *= *base;
            return exponent->num() < 0 ? rational(1) / r : r;
        } catch (const arithmetic_overflow&) {
            return std::nullopt;
        }
    }

    // The function's name and where it stands. A call in parentheses, as in x^(sin(a)), has
    // its range widened to the parentheses, so skip those first.
    span call_name_range(const syntax::expr_node& n) const {
        const std::string_view t = text(n.range);
        const std::size_t begin = t.find_first_not_of("( \t\r\n\\");
        std::size_t end = t.find('(', begin);
        while (end > begin && (t[end - 1] == ' ' || t[end - 1] == '\t'))
            --end;
        return {n.range.begin + static_cast<std::uint32_t>(begin),
                n.range.begin + static_cast<std::uint32_t>(end)};
    }

    typed_term eval_call(const syntax::expr_node& n) {
        const span name_range = call_name_range(n);
        const std::string_view name = text(name_range);
        const bool sheet = file_.functions == syntax::function_names::spreadsheet;
        const builtin_function* f = sheet ? find_sheet_function(name) : find_function(name);
        const bool wants_number = f != nullptr && (f->rule == function_rule::dimensionless ||
                                                   f->rule == function_rule::log_base);
        const std::size_t literal_start = literals_.size();
        // The arguments go on the scratch stack: no allocation per call.
        const std::size_t args_base = operands_.size();
        const std::size_t types_base = types_.size();
        const bool square_root = f != nullptr && f->rule == function_rule::root &&
                                 f->power.num() == 1 && f->power.den() == 2 && n.rhs == 1;
        for (std::uint32_t i = 0; i < n.rhs; ++i) {
            const std::uint32_t node = file_.call_args[n.lhs + i];
            const std::uint32_t saved = prefer_dimensionless_;
            const std::uint32_t saved_root = square_root_argument_;
            if (wants_number)
                prefer_dimensionless_ = node;
            if (square_root)
                square_root_argument_ = node;
            operands_.push_back({push_operand_type(node, types_base, 0), node});
            prefer_dimensionless_ = saved;
            square_root_argument_ = saved_root;
        }
        const scratch_region region(operands_, args_base, types_, types_base);
        const std::span<const operand> args = region.view();
        // Only a root or abs passes its argument's numbers on, as factors of the result.
        const auto keep_first_argument_numbers = [&](double power) {
            if (args.empty()) {
                cut_literals_to(literal_start);
                return;
            }
            cut_literals_to(args[0].type.literal_begin + args[0].type.literal_count);
            for (std::uint32_t i = 0; i < args[0].type.literal_count; ++i)
                literals_[args[0].type.literal_begin + i].exponent *= power;
        };
        if (f == nullptr) {
            diagnostic& d = report(rules::unknown_function,
                                   fmt::format("'{}' is not a known function", name), name_range);
            std::string_view best;
            const std::size_t allowed = std::max<std::size_t>(1, name.size() / 3);
            std::size_t best_distance = allowed + 1;
            for (const auto& candidate : sheet ? sheet_functions() : builtin_functions()) {
                const std::size_t dist = edit_distance(name, candidate.name, allowed);
                if (dist < best_distance) {
                    best_distance = dist;
                    best = candidate.name;
                }
            }
            if (!best.empty())
                d.notes.push_back({fmt::format("did you mean '{}'?", best), {}});
            if (symbols_.find(name) != nullptr)
                d.notes.push_back(
                    {fmt::format("'{}' is a declared symbol; write a product with '*', "
                                 "as in {}*(...)",
                                 name, name),
                     {}});
            return unknown_type();
        }
        const std::size_t count = args.size();
        if (count < f->min_args || (f->max_args != unlimited_args && count > f->max_args) ||
            (f->rule == function_rule::integral && count == 3)) {
            std::string expected;
            if (f->rule == function_rule::integral)
                expected = "2 arguments (or 4, with the limits)";
            else if (f->min_args == f->max_args)
                expected = fmt::format("{} argument{}", f->min_args, f->min_args == 1 ? "" : "s");
            else if (f->max_args == unlimited_args)
                expected = fmt::format("at least {} arguments", f->min_args);
            else
                expected = fmt::format("{} to {} arguments", f->min_args, f->max_args);
            report(rules::wrong_arity,
                   fmt::format("{} takes {}, but {} {} given", f->name, expected, count,
                               count == 1 ? "is" : "are"),
                   n.range);
            if (f->rule == function_rule::log_base && count == 1)
                out_.back().notes.push_back(
                    {"log needs its base as the second argument, as in log(x, 2); write ln(x) "
                     "for the natural logarithm and log10(x) for the common one",
                     {}});
            return unknown_type();
        }
        typed_term result;
        result.numeric =
            std::all_of(args.begin(), args.end(), [](const operand& a) { return a.type.numeric; });
        switch (f->rule) {
        case function_rule::root:
            keep_first_argument_numbers(f->power.to_double());
            if (!args[0].type.known)
                return unknown_type(args[0].type.inferred);
            // Q = K*sqrt(p_g): a gauge pressure under a square root is the difference that
            // drives a discharge to the atmosphere, as in a sprinkler's or a nozzle's flow.
            if (args[0].type.offset != nullptr && !args[0].type.reading_or_difference &&
                !(square_root && args[0].type.offset->scale == unit_scale::gauge)) {
                report_offset(args[0].node, *args[0].type.offset,
                              fmt::format("the argument of {}", f->name));
                return unknown_type();
            }
            result.dim = args[0].type.dim.pow(f->power);
            result.scale = unit_power(args[0].type.scale, f->power.to_double());
            result.exact_scale = plumb::exact_power(args[0].type.exact_scale, f->power);
            return result;
        case function_rule::same:
            keep_first_argument_numbers(1.0);
            if (!args[0].type.known)
                return unknown_type(args[0].type.inferred);
            result.dim = args[0].type.dim;
            result.scale = args[0].type.scale;
            result.exact_scale = args[0].type.exact_scale;
            result.offset = args[0].type.offset;
            return result;
        case function_rule::dimensionless:
        case function_rule::log_base:
            for (const auto& a : args) {
                if (a.type.known && a.type.offset != nullptr && !a.type.reading_or_difference)
                    report_offset(a.node, *a.type.offset,
                                  fmt::format("the argument of {}", f->name));
                else if (require_dimensionless(*f, a))
                    require_unit_free(*f, a);
            }
            cut_literals_to(literal_start);
            return result;
        case function_rule::angle_of:
        case function_rule::common: {
            std::vector<operand> kept;
            const std::span<const operand> values = with_bare_numbers_in_their_unit(args, kept);
            // =CEILING(C23*1000, 50) in mm: the significance is in the number's unit, as
            // written, and the number keeps its own conversion, as ABS's argument does.
            if (values.size() == 1 && args.size() > 1 && values[0].node == args[0].node &&
                args[0].type.known) [[unlikely]] {
                keep_first_argument_numbers(1.0);
                result.dim = args[0].type.dim;
                result.scale = args[0].type.scale;
                result.exact_scale = args[0].type.exact_scale;
                result.offset = args[0].type.offset;
                result.origin = args[0].type.origin;
                result.origin_tolerance = args[0].type.origin_tolerance;
                result.point = args[0].type.point;
                return result;
            }
            const agreement a = find_agreement(values);
            if (!a.odd.empty()) {
                cut_literals_to(literal_start);
                diagnostic& d =
                    report(rules::argument_mismatch,
                           fmt::format("the arguments of {} differ in dimension", f->name),
                           file_.nodes[values[a.odd.front()].node].range);
                explain(d, values, a, "arguments");
                return unknown_type();
            }
            double unit = 1.0;
            const bool scales_agree =
                check_scales(values, {"arguments", f->name}, unit, &result.exact_scale);
            cut_literals_to(literal_start);
            if (f->rule == function_rule::angle_of)
                return result;
            // max(p_a, p_g): readings on scales with different zeros are not compared.
            if (scales_agree && values.size() >= 2 &&
                std::any_of(values.begin(), values.end(), [](const operand& v) {
                    return v.type.zero_of != nullptr || v.type.weighted_sum || v.type.origin != 0.0;
                })) {
                const std::size_t findings_before = out_.size();
                compare_origins(values, fmt::format("call of {}", f->name));
                if (out_.size() != findings_before)
                    return unknown_type();
            }
            if (!std::all_of(args.begin(), args.end(),
                             [](const operand& o) { return o.type.known; }))
                return unknown_type();
            result.dim = a.reference.value_or(compact_dimension{});
            result.scale = scales_agree ? unit : std::numeric_limits<double>::quiet_NaN();
            result.offset = values[0].type.offset;
            result.origin = values[0].type.origin;
            result.origin_tolerance = values[0].type.origin_tolerance;
            result.point = values[0].type.point;
            return result;
        }
        case function_rule::power:
            return apply_power(args[0].type, args[1].type, args[0].node, args[1].node);
        case function_rule::derivative:
            cut_literals_to(literal_start);
            return derivative(args);
        case function_rule::integral:
            cut_literals_to(literal_start);
            return integral(args);
        default:
            return eval_sheet_call(*f, args);
        }
        return unknown_type();
    }

    // ---- Spreadsheet operands and functions ----------------------------------------------

    [[gnu::noinline]] typed_term eval_reference(const syntax::expr_node& n) const {
        const syntax::reference_value& r = file_.references[n.lhs];
        if (!r.dim)
            return unknown_type();
        typed_term t;
        t.dim = compact_dimension(*r.dim);
        t.scale = r.scale;
        t.exact_scale = r.exact_scale;
        t.offset = r.offset;
        t.value = r.value;
        // A cell holds a reading, as a declared temperature or pressure does; a cell has no
        // name to say it is a difference, so a gauge cell less an absolute one is reported.
        if (r.difference && (t.dim == temperature_dimension() || t.dim == pressure_dimension())) {
            // "Friction loss [psi]", "Temperature rise [°C]": a difference in the unit's size.
            t.offset = nullptr;
        } else if (t.offset != nullptr) {
            t.origin = t.offset->offset;
            t.point = true;
        } else {
            t.point = t.dim == temperature_dimension() || t.dim == pressure_dimension();
        }
        return t;
    }

    // A number typed into a formula, with no unit and not zero (zero is in every unit).
    static bool is_bare_number(const typed_term& t) {
        return t.known && t.numeric && !t.zero && t.dim.is_dimensionless();
    }

    // =MAX(B2, 0.3), =IF(B2>1, B2, 0.6): a spreadsheet's numbers carry no units, so a bare
    // number among values that come from cells is in their unit, as the engineer typed it, and
    // only those values must agree; they are copied to `kept`. Elsewhere, and in the notation
    // (where a number can be given its unit, and a bare one beside a quantity stays a
    // finding), the values themselves.
    std::span<const operand> with_bare_numbers_in_their_unit(std::span<const operand> values,
                                                             std::vector<operand>& kept) const {
        if (file_.functions != syntax::function_names::spreadsheet)
            return values;
        const bool some_bare = std::any_of(values.begin(), values.end(),
                                           [](const operand& o) { return is_bare_number(o.type); });
        // Dimensionless values (a ratio, a count) meet a number as one: their scales are
        // weighed with it, as in the notation.
        const bool some_from_cells =
            std::any_of(values.begin(), values.end(), [](const operand& o) {
                return o.type.known && !o.type.numeric && !o.type.dim.is_dimensionless();
            });
        if (!some_bare || !some_from_cells)
            return values;
        for (const operand& o : values)
            if (!is_bare_number(o.type))
                kept.push_back(o);
        return kept;
    }

    // A comparison inside a formula (IF's condition): its sides agree as a limit's do.
    [[gnu::noinline]] typed_term eval_compare(const syntax::expr_node& n) {
        // The condition's numbers are settled here: its truth value carries none of them out
        // (=IF(C30*1000>C3, ...) converts MW to kW for the comparison alone).
        const std::size_t literal_start = literals_.size();
        const std::size_t base = operands_.size();
        const std::size_t types_base = types_.size();
        operands_.push_back({types_.push(eval(n.lhs)), n.lhs});
        operands_.push_back({types_.push(eval(n.rhs)), n.rhs});
        const scratch_region region(operands_, base, types_, types_base);
        const std::span<const operand> sides = region.view();
        // =IF(E9<25, ...): a spreadsheet's numbers carry no units, so a threshold typed against
        // a cell is in that cell's unit, as an engineer reads it. (In the notation a bare
        // number beside a quantity stays a finding: there it can be given its unit.)
        if (file_.functions == syntax::function_names::spreadsheet &&
            (is_bare_number(sides[0].type) || is_bare_number(sides[1].type))) {
            cut_literals_to(literal_start);
            return typed_term{};
        }
        agreement a = find_agreement(sides);
        if (!a.odd.empty() && read_gravity_numbers_either_way(base, a))
            a = find_agreement(sides);
        if (!a.odd.empty()) {
            diagnostic& d =
                report(rules::side_mismatch, "the two sides of this comparison differ in dimension",
                       file_.nodes[sides[a.odd.front()].node].range);
            for (std::size_t i = 0; i < sides.size(); ++i) {
                add_term(d, sides[i]);
                d.notes.push_back({fmt::format("{}{} is {}", i == 0 ? "left side " : "right side ",
                                               quote(sides[i].node), describe(sides[i].type.dim)),
                                   {}});
            }
            return unknown_type();
        }
        double unit = 1.0;
        // =IF(C28>C27, ...) with a bar a reading against a bar g limit: 1 atm apart.
        if (check_scales(sides, "sides of this comparison", unit))
            check_origins(sides, "comparison");
        cut_literals_to(literal_start);
        return typed_term{}; // true or false: a dimensionless number
    }

    // Arguments from `first` on must agree; their common type, or unknown after a finding.
    typed_term agreeing(const builtin_function& f, std::span<const operand> args, std::size_t first,
                        std::string_view others) {
        std::vector<operand> kept;
        const std::span<const operand> tail =
            with_bare_numbers_in_their_unit(args.subspan(first), kept);
        const agreement a = find_agreement(tail);
        if (!a.odd.empty()) {
            diagnostic& d = report(rules::argument_mismatch,
                                   fmt::format("the {} of {} differ in dimension", others, f.name),
                                   file_.nodes[tail[a.odd.front()].node].range);
            explain(d, tail, a, others);
            return unknown_type();
        }
        double unit = 1.0;
        const bool scales_agree = check_scales(tail, {others, f.name}, unit);
        if (!std::all_of(tail.begin(), tail.end(), [](const operand& o) { return o.type.known; }))
            return unknown_type();
        typed_term result;
        result.dim = a.reference.value_or(compact_dimension{});
        result.zero =
            std::all_of(tail.begin(), tail.end(), [](const operand& o) { return o.type.zero; });
        result.numeric =
            std::all_of(tail.begin(), tail.end(), [](const operand& o) { return o.type.numeric; });
        result.scale = scales_agree ? unit : std::numeric_limits<double>::quiet_NaN();
        result.exact_scale.reset();
        for (const auto& o : tail)
            if (o.type.offset != nullptr)
                result.offset = o.type.offset;
        return result;
    }

    typed_term eval_sheet_call(const builtin_function& f, std::span<const operand> args) {
        switch (f.rule) {
        case function_rule::choice:
            return agreeing(f, args, 1, "branches");
        case function_rule::product: {
            typed_term result;
            for (const auto& a : args) {
                if (!a.type.known)
                    return unknown_type();
                if (a.type.offset != nullptr) {
                    report_offset(a.node, *a.type.offset, fmt::format("multiplied in {}", f.name));
                    return unknown_type();
                }
                result.dim = result.dim * a.type.dim;
                result.scale *= a.type.scale;
                // Both forms of the scale: the exact one is compared first where it is held.
                result.exact_scale = exact_product(result.exact_scale, a.type.exact_scale, false);
            }
            return result;
        }
        case function_rule::keep_first:
            for (std::size_t i = 1; i < args.size(); ++i)
                require_dimensionless(f, args[i]);
            return args[0].type.known ? args[0].type : unknown_type();
        case function_rule::lookup: {
            // A steam table in absolute pressure looked up with a gauge reading: the key and
            // the column must agree in their zeros too.
            const std::span<const operand> key_and_column = std::span<const operand>(args).first(2);
            if (agreeing(f, key_and_column, 0, "key and column").known)
                check_origins(key_and_column, "lookup");
            return args[2].type.known ? args[2].type : unknown_type();
        }
        case function_rule::pick:
            for (std::size_t i = 1; i < args.size(); ++i)
                require_dimensionless(f, args[i]);
            return args[0].type.known ? args[0].type : unknown_type();
        case function_rule::position:
            (void)agreeing(f, std::span<const operand>(args).first(2), 0, "key and range");
            return typed_term{};
        case function_rule::count:
        case function_rule::logical:
            return typed_term{};
        case function_rule::to_radians:
        case function_rule::to_degrees: {
            if (!args[0].type.known)
                return unknown_type();
            if (!require_dimensionless(f, args[0]))
                return unknown_type();
            typed_term result;
            // The value in degrees counts π/180 of the radian.
            result.scale = f.rule == function_rule::to_degrees ? std::numbers::pi / 180.0 : 1.0;
            if (f.rule == function_rule::to_degrees)
                result.exact_scale.reset();
            return result;
        }
        default:
            return unknown_type();
        }
    }

    // A dimensionless argument or exponent written in mixed units (ln(p/p_ref) with p in kPa
    // and p_ref in Pa; 10^(ΔT/z) with ΔT in K and z in Δ°F) is off by the factor between them.
    // The finding, or null where the units cancel or a factor the wrong way round was reported.
    diagnostic* report_units_not_cancelling(const operand& a, std::string_view what) {
        if (!a.type.known || !std::isfinite(a.type.scale) || a.type.numeric)
            return nullptr;
        const std::array<scaled_operand, 2> parts{scaled(a.type, false), scaled_operand{}};
        if (reconcile(parts).agree)
            return nullptr;
        for (std::size_t k = 0; k < parts[0].literals.size() && k < 10; ++k)
            if ((looks_like_conversion(parts[0].literals[k], true) ||
                 parts[0].literals[k].factor_like) &&
                reconcile(parts, {0, k}).agree) {
                report_inverted_factor(a, parts[0].literals[k]);
                return nullptr;
            }
        if (conversion_folded_with_coefficient(a, parts[0]))
            return nullptr;
        diagnostic& d = report(rules::unit_scale,
                               fmt::format("as written, {} is {} times its true value: its units "
                                           "do not cancel",
                                           what, format_factor(1.0 / apparent_scale(parts[0]))),
                               file_.nodes[a.node].range);
        d.level = severity::warning;
        add_term(d, a);
        const std::string units = units_in(a.node);
        if (!units.empty())
            d.notes.push_back({units, {}});
        return &d;
    }

    // Whether a product holds a symbol or a cell in a dimensionless unit with a size of its
    // own (%, °, ppm), the unit a number beside it may be written in.
    bool holds_scaled_ratio_unit(std::uint32_t k) const {
        return for_each_factor(k, [&](std::uint32_t at, int) {
            if (const std::optional<double> size = dimensionless_unit_size(at))
                return *size != 1.0;
            // A group or a call that is itself in such a unit ((θ_1 + θ_2)/2) counts too.
            const expr_kind kind = file_.nodes[at].kind;
            return kind == expr_kind::call || kind == expr_kind::add ||
                   kind == expr_kind::subtract || kind == expr_kind::power ||
                   kind == expr_kind::negate;
        });
    }

    // Whether a product holds a symbol or a cell in percent, a dimensionless unit of 1/100.
    // A percentage among a product's factors, not converted by a 100 beside it (P/(η/100)
    // holds its η as a fraction).
    bool holds_percentage(std::uint32_t k) const {
        bool percentage = false;
        bool hundred = false;
        for_each_factor(k, [&](std::uint32_t at, int) {
            percentage = percentage || dimensionless_unit_size(at) == std::optional<double>(0.01);
            hundred = hundred || (file_.nodes[at].kind == expr_kind::number &&
                                  written_number(file_.nodes[at].range) == 100.0);
            return false;
        });
        return percentage && !hundred;
    }

    // The size of the dimensionless unit a symbol or a cell is declared in (0.01 for %, π/180
    // for °); empty for anything else.
    std::optional<double> dimensionless_unit_size(std::uint32_t at) const {
        const syntax::expr_node& n = file_.nodes[at];
        if (n.kind == expr_kind::symbol) {
            const symbol_entry* e = symbols_.find(text(n.range));
            if (e != nullptr && e->dim && e->dim->is_dimensionless())
                return e->si_factor;
        } else if (n.kind == expr_kind::reference) {
            const syntax::reference_value& cell = file_.references[n.lhs];
            if (cell.dim && cell.dim->is_dimensionless())
                return cell.scale;
        }
        return std::nullopt;
    }

    // "sin(pi*θ/360)" with θ in degrees, "ln(8000*L/d)" with L in m and d in mm (a ground
    // rod's 8L/d): the numbers hold the conversion (π/180, 1000) with the formula's own small
    // coefficient (1/2, 8) folded in. Read so, with a note, where the numbers together are far
    // from 1 and what is left is a small whole number or its inverse.
    bool conversion_folded_with_coefficient(const operand& a, const scaled_operand& part) {
        double numbers = 1.0;
        for (const scale_literal& l : part.literals)
            numbers *= std::pow(l.value, l.exponent);
        if (!(numbers > 0) || !std::isfinite(part.scale) || std::abs(std::log10(numbers)) < 1.5)
            return false;
        const double left = part.scale / numbers;
        for (const double k : {2.0, 3.0, 4.0, 8.0})
            for (const double coefficient : {k, 1.0 / k})
                if (std::abs(left / coefficient - 1.0) < 1e-9) {
                    diagnostic& d = report(
                        rules::trade_constant,
                        fmt::format("the numbers in {} are read as the unit conversion {} with the "
                                    "formula's own factor {} folded in",
                                    quote(a.node),
                                    std::abs(part.scale * 180.0 / std::numbers::pi - 1.0) < 1e-9
                                        ? std::string("\u03C0/180 (degrees to radians)")
                                        : format_factor(part.scale),
                                    format_factor(1.0 / coefficient)),
                        file_.nodes[a.node].range);
                    d.level = severity::note;
                    return true;
                }
        return false;
    }

    // The functions that take an angle: sin, cos and tan, and the reciprocal ones, in either
    // front end's spelling (not asin, whose argument is a ratio, nor sinh).
    static bool takes_an_angle(std::string_view name) {
        if (name.size() != 3)
            return false;
        for (const std::string_view angle : {"sin", "cos", "tan", "cot", "sec", "csc"})
            if (std::equal(name.begin(), name.end(), angle.begin(), [](char a, char b) {
                    return std::tolower(static_cast<unsigned char>(a)) == b;
                }))
                return true;
        return false;
    }

    // "sin(180 {deg}/N)": an angle whose degrees the formula writes out as a quantity is an
    // angle, whatever its unit, and sin of it is the sine of that angle. A symbol declared in
    // degrees stays a number in degrees, which a spreadsheet or a script would take as radians.
    bool angle_written_in_degrees(const operand& a) const {
        if (!a.type.known || std::abs(a.type.scale * 180.0 / std::numbers::pi - 1.0) > 1e-9)
            return false;
        bool quantity_in_degrees = false;
        const bool other = for_each_factor(a.node, [&](std::uint32_t at, int) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::quantity) {
                const syntax::quantity_literal& q = file_.quantities[n.lhs];
                if (q.dim && q.dim->is_dimensionless() &&
                    std::abs(q.si_factor * 180.0 / std::numbers::pi - 1.0) < 1e-9)
                    quantity_in_degrees = true;
                return false;
            }
            const std::optional<double> size = dimensionless_unit_size(at);
            return size && *size != 1.0;
        });
        return quantity_in_degrees && !other;
    }

    // "sin(180/N)": the handbook's sin(180°/N) typed without its degree sign, so the sine of
    // 180/N radians. A whole 90, 180 or 360 multiplying the argument, with no π anywhere in it,
    // reads as degrees.
    void report_degrees_taken_as_radians(const builtin_function& f, const operand& a) {
        if (!a.type.known || !a.type.dim.is_dimensionless())
            return;
        const std::string_view written = text(file_.nodes[a.node].range);
        if (written.find("90") == std::string_view::npos &&
            written.find("180") == std::string_view::npos &&
            written.find("360") == std::string_view::npos)
            return;
        std::uint32_t degrees = syntax::no_index;
        bool pi_written = false;
        for_each_factor(a.node, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind == expr_kind::pi || n.kind == expr_kind::quantity ||
                (dimensionless_unit_size(at).value_or(1.0) != 1.0)) {
                pi_written = true;
                return true;
            }
            if (n.kind != expr_kind::number)
                return false;
            const double v = written_number(n.range);
            for (const double c :
                 {std::numbers::pi, 2.0 * std::numbers::pi, std::numbers::pi / 180.0,
                  180.0 / std::numbers::pi, std::numbers::pi / 2.0})
                if (std::abs(v / c - 1.0) < 0.003) {
                    pi_written = true;
                    return true;
                }
            if (sign > 0 && (v == 90.0 || v == 180.0 || v == 360.0))
                degrees = at;
            return false;
        });
        if (pi_written || degrees == syntax::no_index)
            return;
        const std::string_view number = text(file_.nodes[degrees].range);
        diagnostic& d =
            report(rules::unit_scale,
                   fmt::format("{} in the argument of {} reads as degrees, but {} "
                               "takes radians: as written it is {} radians",
                               number, f.name, f.name, display_text(file_.nodes[a.node].range)),
                   file_.nodes[degrees].range);
        d.level = severity::warning;
        d.notes.push_back(
            {file_.functions == syntax::function_names::spreadsheet
                 ? fmt::format("write PI() for 180 (or RADIANS() around the angle)")
                 : fmt::format("write the angle in radians ({} for {}), or give the degrees "
                               "their unit: {} {{deg}}",
                               number == "90" ? "\u03C0/2"
                                              : (number == "180" ? "\u03C0" : "2\u03C0"),
                               number, number),
             {}});
    }

    void require_unit_free(const builtin_function& f, const operand& a) {
        const bool angle = takes_an_angle(f.name);
        if (angle && angle_written_in_degrees(a))
            return;
        diagnostic* found =
            report_units_not_cancelling(a, fmt::format("the argument of {}", f.name));
        if (found == nullptr) {
            if (angle)
                report_degrees_taken_as_radians(f, a);
            return;
        }
        diagnostic& d = *found;
        const std::array<scaled_operand, 2> parts{scaled(a.type, false), scaled_operand{}};
        // sin(β) with β in degrees: the written number is taken as radians where the formula is
        // evaluated with its numbers (a spreadsheet, a script), so say how to convert it.
        const bool trig = f.name.find("sin") != std::string_view::npos ||
                          f.name.find("cos") != std::string_view::npos ||
                          f.name.find("tan") != std::string_view::npos;
        const double ratio = 1.0 / apparent_scale(parts[0]);
        if (trig && std::abs(ratio * std::numbers::pi / 180.0 - 1.0) < 1e-9) {
            // tan(45 - φ/2): the whole sum is in degrees, so the whole sum is converted.
            const expr_kind kind = file_.nodes[a.node].kind;
            const std::string angle = display_text(file_.nodes[a.node].range);
            const bool sum = kind == expr_kind::add || kind == expr_kind::subtract;
            d.notes.push_back({fmt::format("{} takes radians: write {}({}{}{}*\u03C0/180), or "
                                           "declare the angle in rad",
                                           f.name, f.name, sum ? "(" : "", angle, sum ? ")" : ""),
                               {}});
        }
    }

    // True when the argument is dimensionless (or unknown), false when a finding was made.
    bool require_dimensionless(const builtin_function& f, const operand& a) {
        if (!a.type.known || a.type.dim.is_dimensionless())
            return true;
        const bool trig = f.name.find("sin") != std::string_view::npos ||
                          f.name.find("cos") != std::string_view::npos ||
                          f.name.find("tan") != std::string_view::npos;
        diagnostic& d = report(rules::dimensioned_argument,
                               fmt::format("{} needs a dimensionless argument, but {} is {}",
                                           f.name, quote(a.node), describe(a.type.dim)),
                               file_.nodes[a.node].range);
        add_term(d, a);
        d.notes.push_back({trig ? std::string("an angle is dimensionless: give it in radians, or "
                                              "as a ratio of two lengths")
                                : std::string("divide by a reference value of the same dimension, "
                                              "as in ln(p/p_ref)"),
                           {}});
        return false;
    }

    typed_term derivative(std::span<const operand> args) {
        rational order = 1;
        if (args.size() == 3) {
            const typed_term& n = args[2].type;
            if (!n.value || !n.value->is_integer() || n.value->num() < 1) {
                report(rules::variable_exponent,
                       fmt::format("the order of deriv must be a whole number such as 2, but {} is "
                                   "not",
                                   quote(args[2].node)),
                       file_.nodes[args[2].node].range);
                return unknown_type();
            }
            order = *n.value;
        }
        if (!args[0].type.known || !args[1].type.known)
            return unknown_type();
        typed_term result;
        result.dim = args[0].type.dim / args[1].type.dim.pow(order);
        result.scale = args[0].type.scale / std::pow(args[1].type.scale, order.to_double());
        result.exact_scale = exact_product(
            args[0].type.exact_scale, plumb::exact_power(args[1].type.exact_scale, order), true);
        return result;
    }

    typed_term integral(std::span<const operand> args) {
        // The limits answer to the variable of integration, however many of them there are.
        if (args.size() == 4 && args[1].type.known) {
            const operand* odd = nullptr;
            for (std::size_t i = 2; i < 4 && odd == nullptr; ++i)
                if (args[i].type.known && !args[i].type.zero &&
                    !(args[i].type.dim == args[1].type.dim))
                    odd = &args[i];
            if (odd != nullptr) {
                diagnostic& d = report(
                    rules::argument_mismatch,
                    fmt::format("the limits of integral must have the dimension of the variable {}",
                                quote(args[1].node)),
                    file_.nodes[odd->node].range);
                for (std::size_t i = 1; i < 4; ++i) {
                    if (!args[i].type.known)
                        continue;
                    add_term(d, args[i], &args[i] == odd);
                    d.notes.push_back(
                        {fmt::format("{} is {}", quote(args[i].node), describe(args[i].type.dim)),
                         {},
                         true});
                }
                return unknown_type();
            }
        }
        if (!args[0].type.known || !args[1].type.known)
            return unknown_type();
        typed_term result;
        result.dim = args[0].type.dim * args[1].type.dim;
        result.scale = args[0].type.scale * args[1].type.scale;
        result.exact_scale =
            exact_product(args[0].type.exact_scale, args[1].type.exact_scale, false);
        return result;
    }
};

} // namespace

// Exponents beyond the exact range: the formula's partial findings give way to one that says so.
static void replace_with_overflow(const syntax::parsed_file& file, const syntax::formula& formula,
                                  std::vector<diagnostic>& out, std::size_t before) {
    out.resize(before);
    diagnostic d;
    d.rule = std::string(rules::overflow);
    d.message = "the exponents in this formula exceed the exact range (64-bit numerator "
                "and denominator)";
    d.where = {file.source, formula.range};
    out.push_back(std::move(d));
}

static bool check_with(checker& c, const syntax::formula& formula, std::vector<diagnostic>& out,
                       bool defer_unknown) {
    c.begin(defer_unknown);
    const std::size_t before = out.size();
    try {
        c.check_formula(formula);
    } catch (const symbol_not_yet_declared&) {
        c.abandon();
        out.resize(before);
        return false;
    } catch (const arithmetic_overflow&) {
        c.abandon();
        replace_with_overflow(c.file(), formula, out, before);
    } catch (...) {
        c.abandon();
        throw;
    }
    // A formula reported stops being read at its first fault; the symbols after it are still
    // used by it, and no "never used" warning may follow.
    if (out.size() != before) [[unlikely]]
        c.mark_symbols_used(formula);
    return true;
}

bool check_formula(const syntax::parsed_file& file, const syntax::formula& formula,
                   symbol_table& symbols, std::vector<diagnostic>& out, bool defer_unknown) {
    checker c(file, symbols, out);
    return check_with(c, formula, out, defer_unknown);
}

struct formula_checker::state {
    state(const syntax::parsed_file& file, symbol_table& symbols, std::vector<diagnostic>& out)
        : c(file, symbols, out), out(out) {}
    checker c;
    std::vector<diagnostic>& out;
};

formula_checker::formula_checker(const syntax::parsed_file& file, symbol_table& symbols,
                                 std::vector<diagnostic>& out)
    : state_(std::make_unique<state>(file, symbols, out)) {}

formula_checker::~formula_checker() = default;

const syntax::parsed_file& formula_checker::file() const {
    return state_->c.file();
}

bool formula_checker::check(const syntax::formula& formula, bool defer_unknown) {
    return check_with(state_->c, formula, state_->out, defer_unknown);
}

std::optional<value_type> check_sheet_formula(const syntax::parsed_file& file,
                                              const syntax::formula& formula, symbol_table& symbols,
                                              std::vector<diagnostic>& out) {
    checker c(file, symbols, out);
    c.begin();
    const std::size_t before = out.size();
    try {
        return c.check_value(formula);
    } catch (const arithmetic_overflow&) {
        replace_with_overflow(file, formula, out, before);
        return std::nullopt;
    }
}

std::optional<dimension> expression_dimension(const syntax::parsed_file& file, std::uint32_t root,
                                              symbol_table& symbols, std::vector<diagnostic>& out) {
    checker c(file, symbols, out);
    c.begin();
    const std::size_t before = out.size();
    try {
        const auto t = c.eval(root);
        // A warning (an angle in degrees, a reading on an offset scale) leaves the dimension
        // known; only an error takes it away.
        const bool erred =
            std::any_of(out.begin() + static_cast<std::ptrdiff_t>(before), out.end(),
                        [](const diagnostic& d) { return d.level == severity::error; });
        if (!t.known || erred)
            return std::nullopt;
        return t.dim.expand();
    } catch (const arithmetic_overflow&) {
        diagnostic d;
        d.rule = std::string(rules::overflow);
        d.message = "the exponents in this expression exceed the exact range";
        d.where = {file.source, file.nodes[root].range};
        out.push_back(std::move(d));
        return std::nullopt;
    }
}

} // namespace plumb
