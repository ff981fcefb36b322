// Gives every subexpression a dimension and applies the rules where dimensions meet: the
// terms of a sum, the sides of a formula, function arguments and exponents.
#include "check/formula_checker.hpp"

#include "check/edit_distance.hpp"
#include "check/functions.hpp"
#include "plumb/rules.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>
#include <limits>
#include <numbers>
#include <span>

namespace plumb {
namespace {

using syntax::expr_kind;

// A subexpression's type: its dimension, and what the rules need to know about its value.
struct typed {
    dimension dim;
    bool known = true;             // false below an error already reported: stops cascades
    bool zero = false;             // the literal 0, which agrees with any dimension
    bool numeric = false;          // built from numbers alone
    std::optional<rational> value; // exact value, when numeric and exactly representable
    // SI value per written value: the product of the declared units' factors. Terms that agree
    // in dimension but not in scale give numbers off by that factor.
    double scale = 1.0;
    // Set while the value is on an offset scale (°C, °F, gauge pressure): it may be compared
    // and subtracted, but not multiplied, divided or raised to a power.
    const unit_definition* offset = nullptr;
};

typed unknown_type() {
    typed t;
    t.known = false;
    return t;
}

std::string describe(const dimension& d) {
    const std::string_view name = quantity_name(d);
    if (name.empty() || d.is_dimensionless())
        return d.is_dimensionless() ? std::string("[1] (dimensionless)") : d.to_string();
    return fmt::format("{} ({})", d.to_string(), name);
}

// The operands of one meeting point (terms of a sum, arguments, sides of a formula).
struct operand {
    std::uint32_t node;
    typed type;
    bool subtracted = false; // a term after '-'
};

struct agreement {
    std::optional<dimension> reference; // the dimension most operands share
    std::vector<std::size_t> odd;       // operands that differ from it
};

// The reference is the dimension most operands share (the first such on a tie), so that one
// wrong term among several right ones is the one pointed at.
agreement find_agreement(std::span<const operand> ops) {
    agreement result;
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
    std::vector<std::pair<dimension, std::size_t>> counts;
    for (const auto& op : ops) {
        if (!op.type.known || op.type.zero)
            continue;
        auto it = std::find_if(counts.begin(), counts.end(),
                               [&](const auto& c) { return c.first == op.type.dim; });
        if (it == counts.end())
            counts.emplace_back(op.type.dim, 1);
        else
            ++it->second;
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

struct scratch_stacks {
    std::vector<std::uint32_t> spine;
    std::vector<operand> operands;
};

scratch_stacks& scratch() {
    thread_local scratch_stacks stacks;
    return stacks;
}

// The operands a caller pushed above `base` on a scratch stack, popped when it goes.
class scratch_region {
  public:
    scratch_region(std::vector<operand>& stack, std::size_t base) : stack_(stack), base_(base) {}
    scratch_region(const scratch_region&) = delete;
    scratch_region& operator=(const scratch_region&) = delete;
    ~scratch_region() { stack_.resize(base_); }
    [[nodiscard]] std::span<const operand> view() const {
        return {stack_.data() + base_, stack_.size() - base_};
    }

  private:
    std::vector<operand>& stack_;
    std::size_t base_;
};

// Thrown out of a check that meets a name not declared yet, when the caller will retry.
struct symbol_not_yet_declared {};

class checker {
  public:
    checker(const syntax::parsed_file& file, symbol_table& symbols, std::vector<diagnostic>& out,
            bool defer_unknown = false)
        : file_(file), symbols_(symbols), out_(out), defer_unknown_(defer_unknown),
          spine_(scratch().spine), operands_(scratch().operands) {
        // A check abandoned by an exception may have left its part behind.
        spine_.clear();
        operands_.clear();
    }

    typed eval(std::uint32_t index) {
        const syntax::expr_node& n = file_.nodes[index];
        switch (n.kind) {
        case expr_kind::number:
            return eval_number(n);
        case expr_kind::pi: {
            typed t;
            t.numeric = true;
            return t;
        }
        case expr_kind::symbol:
            return eval_symbol(n);
        case expr_kind::negate: {
            typed t = eval(n.lhs);
            if (t.value)
                t.value = -*t.value;
            return t;
        }
        case expr_kind::add:
        case expr_kind::subtract:
            return eval_sum(index);
        case expr_kind::multiply:
        case expr_kind::divide:
            return eval_product(index);
        case expr_kind::power:
            return apply_power(eval(n.lhs), eval(n.rhs), n.lhs, n.rhs);
        case expr_kind::call:
            return eval_call(n);
        case expr_kind::group:
            return eval(n.lhs);
        case expr_kind::quantity:
            return eval_quantity(n);
        case expr_kind::inferred:
            return unknown_type(); // its dimension is inferred afterwards, not checked here
        case expr_kind::reference:
            return eval_reference(n);
        case expr_kind::compare:
            return eval_compare(n);
        }
        return unknown_type();
    }

    void check_formula(const syntax::formula& f) {
        current_ = &f;
        const std::size_t base = operands_.size();
        bool equation = true;
        for (std::uint32_t i = 0; i < f.side_count; ++i) {
            const syntax::formula_side& s = file_.sides[f.first_side + i];
            if (s.relation_before != syntax::relation_kind::none &&
                s.relation_before != syntax::relation_kind::equal)
                equation = false;
            typed t = eval(s.root);
            operands_.push_back({s.root, std::move(t)});
        }
        const scratch_region region(operands_, base);
        const std::span<const operand> sides = region.view();
        const agreement a = find_agreement(sides);
        const char* what = equation ? "equation" : "limit";
        if (a.odd.empty()) {
            check_scales(sides, equation ? "sides of this equation" : "sides of this limit");
            return;
        }
        std::string message =
            sides.size() == 2 ? fmt::format("the two sides of this {} differ in dimension", what)
                              : fmt::format("the sides of this {} differ in dimension", what);
        diagnostic& d = report(rules::side_mismatch, std::move(message),
                               file_.nodes[sides[a.odd.front()].node].range);
        for (std::size_t i = 0; i < sides.size(); ++i) {
            if (!sides[i].type.known)
                continue;
            add_term(d, sides[i]);
            const char* position = sides.size() == 2 ? (i == 0 ? "left side " : "right side ") : "";
            d.notes.push_back({fmt::format("{}{} is {}", position, quote(sides[i].node),
                                           describe(sides[i].type.dim)),
                               {}});
        }
    }

    std::string display_text(span s) const { return single_line(file_.source->text(s)); }

    // A spreadsheet formula: one side, whose type the front end compares with the unit
    // written beside its cell.
    std::optional<value_type> check_value(const syntax::formula& f) {
        current_ = &f;
        const typed t = eval(file_.sides[f.first_side].root);
        if (!t.known)
            return std::nullopt;
        return value_type{t.dim, t.scale, t.offset, t.zero};
    }

  private:
    const syntax::parsed_file& file_;
    symbol_table& symbols_;
    std::vector<diagnostic>& out_;
    bool defer_unknown_;
    // Scratch stacks shared by nested sums and products, so checking allocates nothing once
    // warm. Each user takes the part above the size it found and gives it back.
    std::vector<std::uint32_t>& spine_;
    std::vector<operand>& operands_;
    const syntax::formula* current_ = nullptr; // the formula being checked

    std::string_view text(span s) const { return file_.source->text(s); }

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

    void add_term(diagnostic& d, const operand& op) const {
        d.terms.push_back({{file_.source, file_.nodes[op.node].range},
                           display_text(file_.nodes[op.node].range),
                           op.type.dim});
    }

    // Notes for operands that disagree: each odd one with its dimension, then the rest.
    void explain(diagnostic& d, std::span<const operand> ops, const agreement& a,
                 std::string_view others) const {
        // A sum of thousands of terms must not bury the finding (or slow the renderers):
        // the odd ones are all named, the agreeing ones up to a handful.
        constexpr std::size_t max_listed = 8;
        constexpr std::size_t max_odd = 32;
        for (std::size_t k = 0; k < a.odd.size() && k < max_odd; ++k) {
            add_term(d, ops[a.odd[k]]);
            d.notes.push_back({fmt::format("{} is {}", quote(ops[a.odd[k]].node),
                                           describe(ops[a.odd[k]].type.dim)),
                               {}});
        }
        if (a.odd.size() > max_odd)
            d.notes.push_back({fmt::format("and {} more that differ", a.odd.size() - max_odd), {}});
        std::vector<std::size_t> agreeing_index;
        for (std::size_t i = 0; i < ops.size(); ++i)
            if (ops[i].type.known && !ops[i].type.zero &&
                std::find(a.odd.begin(), a.odd.end(), i) == a.odd.end())
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
        if (agreeing_count == 1)
            d.notes.push_back(
                {fmt::format("{} is {}", agreeing.front(), describe(*a.reference)), {}});
        else if (agreeing_count > 1)
            d.notes.push_back({fmt::format("the other {} are {}: {}", others,
                                           describe(*a.reference), fmt::join(agreeing, ", ")),
                               {}});
    }

    typed eval_quantity(const syntax::expr_node& n) const {
        const syntax::quantity_literal& q = file_.quantities[n.lhs];
        if (!q.dim)
            return unknown_type();
        typed t;
        t.dim = *q.dim;
        // A constant stands for its SI value; a number in braces is in the unit written.
        t.scale = q.constant ? 1.0 : q.si_factor;
        if (q.single_unit != nullptr && q.single_unit->scale != unit_scale::absolute)
            t.offset = q.single_unit;
        return t;
    }

    typed eval_number(const syntax::expr_node& n) const {
        typed t;
        t.numeric = true;
        t.value = rational::parse(text(n.range));
        t.zero = t.value && t.value->is_zero();
        return t;
    }

    typed eval_symbol(const syntax::expr_node& n) {
        const std::string_view name = text(n.range);
        symbol_entry* entry = symbols_.find(name);
        if (entry == nullptr) {
            if (defer_unknown_)
                throw symbol_not_yet_declared{};
            diagnostic& d =
                report(rules::undeclared, fmt::format("'{}' is not declared", name), n.range);
            const auto near = symbols_.nearest(name);
            if (!near.empty()) {
                std::string list;
                for (std::size_t i = 0; i < near.size(); ++i)
                    list += fmt::format(
                        "{}'{}'", i == 0 ? "" : (i + 1 == near.size() ? " or " : ", "), near[i]);
                d.notes.push_back({fmt::format("did you mean {}?", list), {}});
            }
            if (find_function(name) != nullptr)
                d.notes.push_back(
                    {fmt::format("'{}' is a function; call it as {}(x)", name, name), {}});
            else
                d.notes.push_back({fmt::format("declare it with its unit or its dimension, as in "
                                               "'{} : <unit>' or '{} : [<dimension>]'",
                                               name, name),
                                   {}});
            return unknown_type();
        }
        entry->used = true;
        if (!entry->dim)
            return unknown_type();
        typed t;
        t.dim = *entry->dim;
        t.scale = entry->si_factor;
        t.offset = entry->offset_unit;
        return t;
    }

    typed eval_sum(std::uint32_t index) {
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
        typed result;
        result.numeric = true;
        result.zero = true;
        result.value = rational(0);
        for (std::size_t k = 0; k < term_count; ++k) {
            // Term k is the leftmost leaf for k == 0, else the right child of the spine node
            // k levels up from it.
            const std::uint32_t node = k == 0 ? n : file_.nodes[spine_[spine_.size() - k]].rhs;
            const bool subtracted =
                k > 0 && file_.nodes[spine_[spine_.size() - k]].kind == expr_kind::subtract;
            typed t = eval(node);
            result.known = result.known && t.known;
            result.numeric = result.numeric && t.numeric;
            result.zero = result.zero && t.zero;
            if (result.value && t.value)
                result.value = subtracted ? *result.value - *t.value : *result.value + *t.value;
            else
                result.value.reset();
            operands_.push_back({node, std::move(t), subtracted});
        }
        const bool last_subtracted = file_.nodes[index].kind == expr_kind::subtract;
        spine_.resize(spine_base);

        const bool converted = recognise_offset_conversion(base);
        const scratch_region region(operands_, base);
        const std::span<const operand> terms = region.view();
        const agreement a = find_agreement(terms);
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
            return unknown_type();
        }
        if (!result.known)
            return unknown_type();
        if (a.reference)
            result.dim = *a.reference;
        if (!result.numeric)
            result.value.reset();
        // After a unit-scale warning the scale is unknown (NaN), so it is not reported again
        // further up; the dimension stays known.
        result.scale = check_scales(terms, "terms of this sum")
                           ? first_scale(terms)
                           : std::numeric_limits<double>::quiet_NaN();
        result.offset = converted ? nullptr : offset_of_sum(terms);
        return result;
    }

    // In a sum with a value on an offset scale, a bare number is a value on that scale
    // ("T_F = 1.8*T_C + 32"); one that is exactly the scale's offset, as a number (273.15,
    // 459.67) or as a quantity (273.15 {K}, 14.7 {psi}, {p_atm}), converts the sum to the
    // absolute scale.
    bool recognise_offset_conversion(std::size_t base) {
        const typed* offset_term = nullptr;
        for (std::size_t i = base; i < operands_.size(); ++i)
            if (operands_[i].type.known && operands_[i].type.offset != nullptr)
                offset_term = &operands_[i].type;
        if (offset_term == nullptr)
            return false;
        const unit_definition& unit = *offset_term->offset;
        const dimension dim = offset_term->dim;
        const double scale = offset_term->scale;
        // People write 14.7 for 14.696 psi: a relative 1e-3 covers the usual roundings.
        const auto is_shift = [&](double si_value) {
            return std::abs(si_value - unit.offset) <= 1e-3 * std::abs(unit.offset);
        };
        bool converted = false;
        for (std::size_t i = base; i < operands_.size(); ++i) {
            typed& t = operands_[i].type;
            const syntax::expr_node& n = file_.nodes[operands_[i].node];
            if (t.numeric && t.value && t.dim.is_dimensionless()) {
                t.dim = dim;
                t.scale = scale;
                converted = converted || (!operands_[i].subtracted &&
                                          is_shift(t.value->to_double() * unit.factor));
            } else if (n.kind == expr_kind::quantity && t.known && t.offset == nullptr &&
                       !operands_[i].subtracted && t.dim == dim && is_shift(quantity_si_value(n))) {
                converted = true;
                t.scale = scale; // the conversion is exact whatever unit it is written in
            }
        }
        return converted;
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

    // Offsets cancel in a difference (T_2 - T_1 is a plain temperature difference); a sum with
    // one more offset value added than subtracted is still on the offset scale.
    static const unit_definition* offset_of_sum(std::span<const operand> terms) {
        int balance = 0;
        const unit_definition* unit = nullptr;
        for (const auto& t : terms) {
            if (t.type.offset == nullptr)
                continue;
            unit = t.type.offset;
            balance += t.subtracted ? -1 : 1;
        }
        return balance == 0 ? nullptr : unit;
    }

    static double first_scale(std::span<const operand> ops) {
        for (const auto& op : ops)
            if (op.type.known && !op.type.zero && !op.type.numeric)
                return op.type.scale;
        return 1.0;
    }

    // Terms of one dimension in different units give numbers off by a factor, unless a number
    // in the formula supplies exactly that conversion. False when a finding was reported.
    bool check_scales(std::span<const operand> ops, std::string_view what) {
        const operand* reference = nullptr;
        for (const auto& op : ops) {
            if (!op.type.known || op.type.zero)
                continue;
            if (op.type.numeric && op.type.dim.is_dimensionless())
                continue; // a bare number carries no unit of its own
            if (!std::isfinite(op.type.scale))
                continue; // already reported below
            if (reference == nullptr) {
                reference = &op;
                continue;
            }
            const double ratio = reference->type.scale / op.type.scale;
            if (std::abs(ratio - 1.0) <= 1e-9 || conversion_in_formula(ratio))
                continue;
            // A warning: in a unit-aware calc the units convert themselves; where numbers are
            // put in as declared (spreadsheets, code), the result is off by the ratio.
            diagnostic& d = report(rules::unit_scale,
                                   fmt::format("as written, {} counts {} times as much as {}: the "
                                               "{} agree in dimension but not in unit",
                                               quote(op.node), format_ratio(ratio),
                                               quote(reference->node), what),
                                   file_.nodes[op.node].range);
            d.level = severity::warning;
            add_term(d, op);
            add_term(d, *reference);
            for (const operand* side : {&op, reference}) {
                const std::string units = units_in(side->node);
                if (!units.empty())
                    d.notes.push_back({fmt::format("in {}: {}", quote(side->node), units), {}});
            }
            d.notes.push_back({"convert one of them (declare the symbols in coherent units, or "
                               "write the conversion factor into the formula)",
                               {}});
            return false;
        }
        return true;
    }

    static std::string format_ratio(double r) { return fmt::format("{:.6g}", r); }

    // Whether the numbers written in the current formula supply the ratio: one of them, or a
    // product or quotient of two (5/9 for 1.8), is the ratio or its inverse.
    bool conversion_in_formula(double ratio) const {
        if (current_ == nullptr)
            return false;
        std::vector<double> numbers;
        visit_nodes([&](const syntax::expr_node& n) {
            if (n.kind != expr_kind::number || numbers.size() >= 32)
                return;
            const auto v = rational::parse(text(n.range));
            if (v && !v->is_zero())
                numbers.push_back(std::abs(v->to_double()));
        });
        const auto matches = [ratio](double x) {
            return std::abs(ratio * x - 1.0) <= 1e-6 || std::abs(ratio / x - 1.0) <= 1e-6;
        };
        for (std::size_t i = 0; i < numbers.size(); ++i) {
            if (matches(numbers[i]))
                return true;
            for (std::size_t j = i + 1; j < numbers.size(); ++j)
                if (matches(numbers[i] * numbers[j]) || matches(numbers[i] / numbers[j]))
                    return true;
        }
        return false;
    }

    // "'D' is in mm, 'Q' in L/s": the symbols under a node declared in non-coherent units.
    std::string units_in(std::uint32_t root) const {
        std::string out;
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
                    ++listed;
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
        return out;
    }

    template <typename F> void visit_nodes(F&& f) const {
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

    // A value on an offset scale used where only an absolute one makes sense.
    void report_offset(std::uint32_t node, const unit_definition& unit, std::string_view where) {
        const bool temperature =
            unit.exponents[static_cast<std::size_t>(base_dimension::temperature)] != 0;
        diagnostic& d =
            report(rules::offset_scale,
                   fmt::format("{} is on the {} scale, whose zero is arbitrary, so it cannot be {}",
                               quote(node), unit.symbol, where),
                   file_.nodes[node].range);
        d.notes.push_back(
            {temperature
                 ? fmt::format("gas laws, Arrhenius and radiation need absolute temperature: "
                               "declare it in K (or °R), or convert the {} value first by adding "
                               "{:g}",
                               unit.symbol, unit.offset / unit.factor)
                 : fmt::format("gas laws and pressure ratios need absolute pressure: add the "
                               "atmospheric pressure, or declare it as an absolute pressure "
                               "(Pa, bar, psia)"),
             {}});
        d.notes.push_back(
            {"a difference of two values on the same scale, such as T_2 - T_1, is an ordinary "
             "quantity and may be used freely",
             {}});
    }

    typed eval_product(std::uint32_t index) {
        const std::size_t spine_base = spine_.size();
        std::uint32_t n = index;
        while (file_.nodes[n].kind == expr_kind::multiply ||
               file_.nodes[n].kind == expr_kind::divide) {
            spine_.push_back(n);
            n = file_.nodes[n].lhs;
        }
        typed result = eval(n);
        result.zero = false;
        std::uint32_t offset_node = n;
        // Spine nodes were pushed outermost first; the innermost applies first.
        for (std::size_t k = spine_.size(); k > spine_base; --k) {
            const syntax::expr_node& op = file_.nodes[spine_[k - 1]];
            const bool divided = op.kind == expr_kind::divide;
            const typed t = eval(op.rhs);
            // An offset value may be scaled by a pure number (the mean (T_1 + T_2)/2), not
            // multiplied by a quantity.
            if (result.known && t.known && (result.offset != nullptr || t.offset != nullptr) &&
                !(result.offset != nullptr && t.numeric) &&
                !(t.offset != nullptr && result.numeric && !divided)) {
                const bool left = result.offset != nullptr;
                report_offset(left ? offset_node : op.rhs, left ? *result.offset : *t.offset,
                              divided ? "used in a quotient" : "multiplied");
                spine_.resize(spine_base);
                return unknown_type();
            }
            if (t.offset != nullptr) {
                result.offset = t.offset;
                offset_node = op.rhs;
            }
            result.scale = divided ? result.scale / t.scale : result.scale * t.scale;
            result.known = result.known && t.known;
            result.numeric = result.numeric && t.numeric;
            if (result.known)
                result.dim = divided ? result.dim / t.dim : result.dim * t.dim;
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
        if (!result.known)
            return unknown_type();
        return result;
    }

    typed apply_power(const typed& base, const typed& exponent, std::uint32_t base_node,
                      std::uint32_t exponent_node) {
        if (exponent.known && !exponent.dim.is_dimensionless()) {
            diagnostic& d = report(rules::dimensioned_exponent,
                                   fmt::format("the exponent {} has a dimension; an exponent must "
                                               "be dimensionless",
                                               quote(exponent_node)),
                                   file_.nodes[exponent_node].range);
            add_term(d, {exponent_node, exponent});
            d.notes.push_back(
                {fmt::format("{} is {}", quote(exponent_node), describe(exponent.dim)), {}});
            return unknown_type();
        }
        if (!base.known || !exponent.known)
            return unknown_type();
        if (base.offset != nullptr && !(exponent.value && *exponent.value == rational(1))) {
            report_offset(base_node, *base.offset, "raised to a power");
            return unknown_type();
        }
        typed result;
        result.numeric = base.numeric && exponent.numeric;
        if (exponent.value)
            result.scale = std::pow(base.scale, exponent.value->to_double());
        if (base.dim.is_dimensionless()) {
            result.value = exact_power(base.value, exponent.value);
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
            add_term(d, {base_node, base});
            d.notes.push_back({fmt::format("{} is {}", quote(base_node), describe(base.dim)), {}});
            d.notes.push_back({"the dimension of the power would depend on the exponent's value; "
                               "make the base dimensionless (divide by a reference value) first",
                               {}});
            return unknown_type();
        }
        result.dim = base.dim.pow(*exponent.value);
        return result;
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

    typed eval_call(const syntax::expr_node& n) {
        const span name_range = call_name_range(n);
        const std::string_view name = text(name_range);
        std::vector<operand> args;
        for (std::uint32_t i = 0; i < n.rhs; ++i) {
            const std::uint32_t node = file_.call_args[n.lhs + i];
            args.push_back({node, eval(node)});
        }
        const bool sheet = file_.functions == syntax::function_names::spreadsheet;
        const builtin_function* f = sheet ? find_sheet_function(name) : find_function(name);
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
            return unknown_type();
        }
        typed result;
        result.numeric =
            std::all_of(args.begin(), args.end(), [](const operand& a) { return a.type.numeric; });
        switch (f->rule) {
        case function_rule::root:
            if (!args[0].type.known)
                return unknown_type();
            if (args[0].type.offset != nullptr) {
                report_offset(args[0].node, *args[0].type.offset,
                              fmt::format("the argument of {}", f->name));
                return unknown_type();
            }
            result.dim = args[0].type.dim.pow(f->power);
            result.scale = std::pow(args[0].type.scale, f->power.to_double());
            return result;
        case function_rule::same:
            if (!args[0].type.known)
                return unknown_type();
            result.dim = args[0].type.dim;
            result.scale = args[0].type.scale;
            result.offset = args[0].type.offset;
            return result;
        case function_rule::dimensionless:
        case function_rule::log_base:
            for (const auto& a : args) {
                if (a.type.known && a.type.offset != nullptr)
                    report_offset(a.node, *a.type.offset,
                                  fmt::format("the argument of {}", f->name));
                else if (require_dimensionless(*f, a))
                    require_unit_free(*f, a);
            }
            return result;
        case function_rule::angle_of:
        case function_rule::common: {
            const agreement a = find_agreement(args);
            if (!a.odd.empty()) {
                diagnostic& d =
                    report(rules::argument_mismatch,
                           fmt::format("the arguments of {} differ in dimension", f->name),
                           file_.nodes[args[a.odd.front()].node].range);
                explain(d, args, a, "arguments");
                return unknown_type();
            }
            const bool scales_agree = check_scales(args, fmt::format("arguments of {}", f->name));
            if (f->rule == function_rule::angle_of)
                return result;
            if (!std::all_of(args.begin(), args.end(),
                             [](const operand& o) { return o.type.known; }))
                return unknown_type();
            result.dim = a.reference.value_or(dimension{});
            result.scale =
                scales_agree ? first_scale(args) : std::numeric_limits<double>::quiet_NaN();
            result.offset = args[0].type.offset;
            return result;
        }
        case function_rule::power:
            return apply_power(args[0].type, args[1].type, args[0].node, args[1].node);
        case function_rule::derivative:
            return derivative(args);
        case function_rule::integral:
            return integral(args);
        default:
            return eval_sheet_call(*f, args);
        }
        return unknown_type();
    }

    // ---- Spreadsheet operands and functions ----------------------------------------------

    typed eval_reference(const syntax::expr_node& n) const {
        const syntax::reference_value& r = file_.references[n.lhs];
        if (!r.dim)
            return unknown_type();
        typed t;
        t.dim = *r.dim;
        t.scale = r.scale;
        t.offset = r.offset;
        t.value = r.value;
        return t;
    }

    // A comparison inside a formula (IF's condition): its sides agree as a limit's do.
    typed eval_compare(const syntax::expr_node& n) {
        const std::size_t base = operands_.size();
        operands_.push_back({n.lhs, eval(n.lhs)});
        operands_.push_back({n.rhs, eval(n.rhs)});
        const scratch_region region(operands_, base);
        const std::span<const operand> sides = region.view();
        const agreement a = find_agreement(sides);
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
        check_scales(sides, "sides of this comparison");
        return typed{}; // true or false: a dimensionless number
    }

    // Arguments from `first` on must agree; their common type, or unknown after a finding.
    typed agreeing(const builtin_function& f, std::span<const operand> args, std::size_t first,
                   std::string_view others) {
        const std::span<const operand> tail = args.subspan(first);
        const agreement a = find_agreement(tail);
        if (!a.odd.empty()) {
            diagnostic& d = report(rules::argument_mismatch,
                                   fmt::format("the {} of {} differ in dimension", others, f.name),
                                   file_.nodes[tail[a.odd.front()].node].range);
            explain(d, tail, a, others);
            return unknown_type();
        }
        const bool scales_agree = check_scales(tail, fmt::format("{} of {}", others, f.name));
        if (!std::all_of(tail.begin(), tail.end(), [](const operand& o) { return o.type.known; }))
            return unknown_type();
        typed result;
        result.dim = a.reference.value_or(dimension{});
        result.zero =
            std::all_of(tail.begin(), tail.end(), [](const operand& o) { return o.type.zero; });
        result.numeric =
            std::all_of(tail.begin(), tail.end(), [](const operand& o) { return o.type.numeric; });
        result.scale = scales_agree ? first_scale(tail) : std::numeric_limits<double>::quiet_NaN();
        for (const auto& o : tail)
            if (o.type.offset != nullptr)
                result.offset = o.type.offset;
        return result;
    }

    typed eval_sheet_call(const builtin_function& f, const std::vector<operand>& args) {
        switch (f.rule) {
        case function_rule::choice:
            return agreeing(f, args, 1, "branches");
        case function_rule::product: {
            typed result;
            for (const auto& a : args) {
                if (!a.type.known)
                    return unknown_type();
                if (a.type.offset != nullptr) {
                    report_offset(a.node, *a.type.offset, fmt::format("multiplied in {}", f.name));
                    return unknown_type();
                }
                result.dim = result.dim * a.type.dim;
                result.scale *= a.type.scale;
            }
            return result;
        }
        case function_rule::keep_first:
            for (std::size_t i = 1; i < args.size(); ++i)
                require_dimensionless(f, args[i]);
            return args[0].type.known ? args[0].type : unknown_type();
        case function_rule::lookup: {
            typed key = agreeing(f, std::span<const operand>(args).first(2), 0, "key and column");
            (void)key;
            return args[2].type.known ? args[2].type : unknown_type();
        }
        case function_rule::pick:
            for (std::size_t i = 1; i < args.size(); ++i)
                require_dimensionless(f, args[i]);
            return args[0].type.known ? args[0].type : unknown_type();
        case function_rule::position:
            (void)agreeing(f, std::span<const operand>(args).first(2), 0, "key and range");
            return typed{};
        case function_rule::count:
        case function_rule::logical:
            return typed{};
        case function_rule::to_radians:
        case function_rule::to_degrees: {
            if (!args[0].type.known)
                return unknown_type();
            if (!require_dimensionless(f, args[0]))
                return unknown_type();
            typed result;
            // The value in degrees counts π/180 of the radian.
            result.scale = f.rule == function_rule::to_degrees ? std::numbers::pi / 180.0 : 1.0;
            return result;
        }
        default:
            return unknown_type();
        }
    }

    // A dimensionless argument written in mixed units (ln(p/p_ref) with p in kPa and p_ref in
    // Pa) is off by the factor between them.
    void require_unit_free(const builtin_function& f, const operand& a) {
        if (!a.type.known || !std::isfinite(a.type.scale) || std::abs(a.type.scale - 1.0) <= 1e-9 ||
            a.type.numeric || conversion_in_formula(1.0 / a.type.scale))
            return;
        diagnostic& d = report(rules::unit_scale,
                               fmt::format("as written, the argument of {} is {} times its true "
                                           "value: its units do not cancel",
                                           f.name, format_ratio(1.0 / a.type.scale)),
                               file_.nodes[a.node].range);
        d.level = severity::warning;
        add_term(d, a);
        const std::string units = units_in(a.node);
        if (!units.empty())
            d.notes.push_back({units, {}});
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

    typed derivative(const std::vector<operand>& args) {
        rational order = 1;
        if (args.size() == 3) {
            const typed& n = args[2].type;
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
        typed result;
        result.dim = args[0].type.dim / args[1].type.dim.pow(order);
        result.scale = args[0].type.scale / std::pow(args[1].type.scale, order.to_double());
        return result;
    }

    typed integral(const std::vector<operand>& args) {
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
                    add_term(d, args[i]);
                    d.notes.push_back(
                        {fmt::format("{} is {}", quote(args[i].node), describe(args[i].type.dim)),
                         {}});
                }
                return unknown_type();
            }
        }
        if (!args[0].type.known || !args[1].type.known)
            return unknown_type();
        typed result;
        result.dim = args[0].type.dim * args[1].type.dim;
        result.scale = args[0].type.scale * args[1].type.scale;
        return result;
    }
};

} // namespace

bool check_formula(const syntax::parsed_file& file, const syntax::formula& formula,
                   symbol_table& symbols, std::vector<diagnostic>& out, bool defer_unknown) {
    checker c(file, symbols, out, defer_unknown);
    const std::size_t before = out.size();
    try {
        c.check_formula(formula);
    } catch (const symbol_not_yet_declared&) {
        out.resize(before);
        return false;
    } catch (const arithmetic_overflow&) {
        out.resize(before);
        diagnostic d;
        d.rule = std::string(rules::overflow);
        d.message = "the exponents in this formula exceed the exact range (64-bit numerator "
                    "and denominator)";
        d.where = {file.source, formula.range};
        out.push_back(std::move(d));
    }
    return true;
}

std::optional<value_type> check_sheet_formula(const syntax::parsed_file& file,
                                              const syntax::formula& formula, symbol_table& symbols,
                                              std::vector<diagnostic>& out) {
    checker c(file, symbols, out);
    const std::size_t before = out.size();
    try {
        return c.check_value(formula);
    } catch (const arithmetic_overflow&) {
        out.resize(before);
        diagnostic d;
        d.rule = std::string(rules::overflow);
        d.message = "the exponents in this formula exceed the exact range (64-bit numerator "
                    "and denominator)";
        d.where = {file.source, formula.range};
        out.push_back(std::move(d));
        return std::nullopt;
    }
}

std::optional<dimension> expression_dimension(const syntax::parsed_file& file, std::uint32_t root,
                                              symbol_table& symbols, std::vector<diagnostic>& out) {
    checker c(file, symbols, out);
    const std::size_t before = out.size();
    try {
        const auto t = c.eval(root);
        if (!t.known || out.size() != before)
            return std::nullopt;
        return t.dim;
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
