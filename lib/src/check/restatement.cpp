// The scale of every part of a formula, followed to the factor of a unit-bound coefficient.
#include "check/restatement.hpp"

#include "check/functions.hpp"
#include "plumb/source.hpp"
#include "plumb/unit_table.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>
#include <optional>
#include <vector>

namespace plumb {

std::string_view call_name(const source_file& src, const syntax::expr_node& n) {
    const std::string_view t = src.text(n.range);
    const std::size_t begin = t.find_first_not_of("( \t\r\n\\");
    if (begin == std::string_view::npos)
        return {};
    std::size_t end = t.find('(', begin);
    if (end == std::string_view::npos)
        end = t.size();
    while (end > begin && (t[end - 1] == ' ' || t[end - 1] == '\t'))
        --end;
    return t.substr(begin, end - begin);
}

std::optional<rational> constant_of(const syntax::parsed_file& file, std::uint32_t index) {
    using syntax::expr_kind;
    // Post-order over an explicit stack: an exponent written as a sum of 100,000 numbers must
    // not recurse once per term.
    struct visit {
        std::uint32_t node;
        bool operands_done;
    };
    std::vector<visit> pending{{index, false}};
    std::vector<rational> values;
    try {
        while (!pending.empty()) {
            const visit v = pending.back();
            pending.pop_back();
            const syntax::expr_node& n = file.nodes[v.node];
            switch (n.kind) {
            case expr_kind::number: {
                const auto parsed = rational::parse(file.source->text(n.range));
                if (!parsed)
                    return std::nullopt;
                values.push_back(*parsed);
                break;
            }
            case expr_kind::group:
            case expr_kind::negate:
                if (!v.operands_done) {
                    pending.push_back({v.node, true});
                    pending.push_back({n.lhs, false});
                } else if (n.kind == expr_kind::negate) {
                    values.back() = -values.back();
                }
                break;
            case expr_kind::add:
            case expr_kind::subtract:
            case expr_kind::multiply:
            case expr_kind::divide: {
                if (!v.operands_done) {
                    pending.push_back({v.node, true});
                    pending.push_back({n.rhs, false});
                    pending.push_back({n.lhs, false}); // taken first, so its value lies below
                    break;
                }
                const rational b = values.back();
                values.pop_back();
                rational& a = values.back();
                if (n.kind == expr_kind::add)
                    a = a + b;
                else if (n.kind == expr_kind::subtract)
                    a = a - b;
                else if (n.kind == expr_kind::multiply)
                    a = a * b;
                else if (b.is_zero())
                    return std::nullopt;
                else
                    a = a / b;
                break;
            }
            default:
                return std::nullopt;
            }
        }
    } catch (const arithmetic_overflow&) {
        return std::nullopt;
    }
    if (values.size() != 1)
        return std::nullopt;
    return values.back();
}

namespace {

using syntax::expr_kind;

// σ = σ0 · c^k_power, for one subexpression.
struct scale {
    std::vector<scale_factor> factors; // σ0
    rational k_power = 0;
    const unit_definition* offset = nullptr; // on an offset scale (°F, psig): not a pure scale
    bool number = false;                     // a bare number: it has no unit of its own
    bool zero = false;                       // the literal 0: agrees with any scale
};

double value_of(const std::vector<scale_factor>& factors) {
    double v = 1.0;
    for (const auto& f : factors)
        v *= std::pow(f.si, f.power.to_double());
    return v;
}

void append(std::vector<scale_factor>& to, const std::vector<scale_factor>& from, rational times) {
    if (times.is_zero())
        return;
    for (const auto& f : from) {
        const rational p = f.power * times;
        if (!p.is_zero())
            to.push_back({f.unit, f.si, p, f.at});
    }
}

class tracer {
  public:
    tracer(const syntax::parsed_file& file, symbol_table& symbols, std::uint32_t coefficient)
        : file_(file), symbols_(symbols), coefficient_(coefficient) {}

    coefficient_trace run(const syntax::formula& f) {
        std::vector<scale> sides;
        std::vector<std::uint32_t> roots;
        for (std::uint32_t i = 0; i < f.side_count; ++i) {
            roots.push_back(file_.sides[f.first_side + i].root);
            std::optional<scale> s = eval(roots.back());
            if (!s)
                return failed();
            sides.push_back(std::move(*s));
        }
        for (std::size_t i = 1; i < sides.size(); ++i) {
            if (sides[0].offset != sides[i].offset)
                return fail_with(fmt::format(
                    "{} is on an offset scale ({}) and {} is not, so their scales cannot be "
                    "compared",
                    quote(sides[0].offset != nullptr ? roots[0] : roots[i]),
                    (sides[0].offset != nullptr ? sides[0].offset : sides[i].offset)->symbol,
                    quote(sides[0].offset != nullptr ? roots[i] : roots[0])));
            apart_ratio_.reset();
            if (!agree(sides[0], sides[i], roots[0], roots[i])) {
                coefficient_trace t = failed();
                if (apart_ratio_ && !sides[0].number && !sides[i].number)
                    t.apart = sides_apart{roots[0], roots[i], *apart_ratio_};
                return t;
            }
        }
        if (!c_)
            return fail_with("no comparison in the formula fixes its scale (the coefficient "
                             "cancels, or stands only where any scale will do)");
        coefficient_trace t;
        t.traced = true;
        t.factor = std::move(*c_);
        std::stable_sort(t.factor.begin(), t.factor.end(),
                         [](const scale_factor& a, const scale_factor& b) { return a.at < b.at; });
        std::stable_sort(bound_.begin(), bound_.end());
        for (auto& b : bound_)
            t.bound.push_back(std::move(b.second));
        return t;
    }

  private:
    const syntax::parsed_file& file_;
    symbol_table& symbols_;
    std::uint32_t coefficient_;
    std::optional<std::vector<scale_factor>> c_; // the coefficient's factor, once fixed
    std::uint32_t fixed_by_ = syntax::no_index;  // the term it was fixed against
    std::string why_not_;
    std::vector<std::pair<std::uint32_t, std::string>> bound_; // position, "V in ft/s"
    std::optional<double> apart_ratio_; // the last comparison's ratio where it failed alone

    coefficient_trace failed() {
        coefficient_trace t;
        t.why_not = why_not_.empty() ? std::string("its scale cannot be followed") : why_not_;
        return t;
    }
    coefficient_trace fail_with(std::string why) {
        why_not_ = std::move(why);
        return failed();
    }
    std::nullopt_t fail(std::string why) {
        if (why_not_.empty())
            why_not_ = std::move(why);
        return std::nullopt;
    }

    std::string quote(std::uint32_t node) const {
        std::string t = single_line(file_.source->text(file_.nodes[node].range));
        constexpr std::size_t limit = 40;
        if (t.size() > limit) {
            std::size_t cut = limit;
            while (cut > 0 && (static_cast<unsigned char>(t[cut]) & 0xC0) == 0x80)
                --cut;
            t = t.substr(0, cut) + "\u2026";
        }
        return fmt::format("'{}'", t);
    }

    // The scale with the coefficient's factor put in, once it is known.
    scale settled(const scale& s) const {
        if (!c_ || s.k_power.is_zero())
            return s;
        scale out = s;
        append(out.factors, *c_, s.k_power);
        out.k_power = 0;
        return out;
    }

    // The two scales are equal; with different powers of the coefficient, that fixes it.
    bool agree(const scale& a, const scale& b, std::uint32_t node_a, std::uint32_t node_b) {
        if (a.zero || b.zero)
            return true;
        const scale x = settled(a);
        const scale y = settled(b);
        if (x.k_power == y.k_power) {
            const double ratio = value_of(x.factors) / value_of(y.factors);
            if (std::abs(ratio - 1.0) <= 1e-9)
                return true;
            apart_ratio_ = ratio;
            why_not_ = fmt::format(
                "{} and {} are not in the same units (as written, one counts "
                "{:.6g} times the other){}",
                quote(node_a), quote(node_b), ratio,
                fixed_by_ == syntax::no_index
                    ? std::string()
                    : fmt::format(", once {} has fixed the coefficient's units", quote(fixed_by_)));
            return false;
        }
        // c^(px - py) = σ0_y / σ0_x.
        const rational e = rational(1) / (x.k_power - y.k_power);
        std::vector<scale_factor> c;
        append(c, y.factors, e);
        append(c, x.factors, -e);
        c_ = std::move(c);
        fixed_by_ = x.k_power.is_zero() ? node_a : node_b;
        return true;
    }

    // A pure number's scale: 1, whatever units the formula is read in.
    bool pure(const scale& s, std::uint32_t node, std::string_view where) {
        if (s.offset != nullptr) {
            why_not_ = fmt::format("{} is on the {} scale, whose zero is arbitrary, and stands {}",
                                   quote(node), s.offset->symbol, where);
            return false;
        }
        const scale x = settled(s);
        if (!x.k_power.is_zero())
            return agree(x, scale{}, node, node); // fixes the coefficient
        const double v = value_of(x.factors);
        if (std::abs(v - 1.0) <= 1e-9)
            return true;
        why_not_ = fmt::format("{} stands {}, but its units do not cancel (they leave a factor "
                               "of {:.6g} against SI)",
                               quote(node), where, v);
        return false;
    }

    std::optional<scale> eval(std::uint32_t index) {
        const syntax::expr_node& n = file_.nodes[index];
        switch (n.kind) {
        case expr_kind::number: {
            scale s;
            s.number = true;
            const auto v = rational::parse(file_.source->text(n.range));
            s.zero = v && v->is_zero();
            return s;
        }
        case expr_kind::pi: {
            scale s;
            s.number = true;
            return s;
        }
        case expr_kind::symbol:
            return eval_symbol(n);
        case expr_kind::negate:
        case expr_kind::group:
            return eval(n.lhs);
        case expr_kind::add:
        case expr_kind::subtract:
            return eval_sum(index);
        case expr_kind::multiply:
        case expr_kind::divide:
            return eval_product(index);
        case expr_kind::power:
            return eval_power(n.lhs, n.rhs);
        case expr_kind::call:
            return eval_call(index);
        case expr_kind::quantity:
            return eval_quantity(n);
        case expr_kind::reference:
        case expr_kind::compare:
            return fail(fmt::format("{} is a cell or a comparison, which carries no unit here",
                                    quote(index)));
        case expr_kind::inferred:
            if (index != coefficient_)
                return fail(fmt::format("another coefficient marked ?, {}, stands in the formula",
                                        quote(index)));
            {
                scale s;
                s.k_power = 1;
                return s;
            }
        }
        return fail("the formula holds a term whose scale cannot be followed");
    }

    std::optional<scale> eval_symbol(const syntax::expr_node& n) {
        const std::string_view name = file_.source->text(n.range);
        const symbol_entry* e = symbols_.find(name);
        if (e == nullptr)
            return fail(fmt::format("'{}' is not declared", name));
        if (e->to_infer)
            return fail(fmt::format("'{}' is declared with ?, so its unit is not known", name));
        if (!e->dim)
            return fail(fmt::format("the declaration of '{}' has an error", name));
        scale s;
        s.offset = e->offset_unit;
        if (e->si_factor != 1.0 || s.offset != nullptr) {
            const std::string unit =
                e->unit_text.empty() ? std::string("?") : std::string(e->unit_text);
            s.factors.push_back({unit, e->si_factor, rational(1), n.range.begin});
            std::string entry = fmt::format("{} in {}", name, unit);
            if (std::none_of(bound_.begin(), bound_.end(),
                             [&](const auto& b) { return b.second == entry; }))
                bound_.emplace_back(n.range.begin, std::move(entry));
        }
        return s;
    }

    std::optional<scale> eval_quantity(const syntax::expr_node& n) {
        if (n.lhs >= file_.quantities.size() || !file_.quantities[n.lhs].dim)
            return fail("a quantity in braces has an unknown unit");
        const syntax::quantity_literal& q = file_.quantities[n.lhs];
        scale s;
        if (q.constant)
            return s; // a named constant stands for its SI value in every reading
        if (q.single_unit != nullptr && q.single_unit->scale != unit_scale::absolute)
            s.offset = q.single_unit;
        if (q.si_factor != 1.0 || s.offset != nullptr) {
            const std::string_view t = file_.source->text(n.range);
            const std::size_t open = t.find('{');
            const std::size_t close = t.rfind('}');
            std::string unit = open != std::string_view::npos && close > open
                                   ? std::string(t.substr(open + 1, close - open - 1))
                                   : std::string(t);
            unit.erase(0, unit.find_first_not_of(" \t"));
            unit.erase(unit.find_last_not_of(" \t") + 1);
            s.factors.push_back({std::move(unit), q.si_factor, rational(1), n.range.begin});
        }
        return s;
    }

    std::optional<scale> eval_sum(std::uint32_t index) {
        // Along the left spine, iteratively: a long sum must not recurse once per term.
        std::vector<std::uint32_t> spine;
        std::uint32_t n = index;
        while (file_.nodes[n].kind == expr_kind::add ||
               file_.nodes[n].kind == expr_kind::subtract) {
            spine.push_back(n);
            n = file_.nodes[n].lhs;
        }
        std::vector<scale> terms;
        std::vector<std::uint32_t> nodes;
        int balance = 0; // offset terms added less those subtracted
        const unit_definition* offset = nullptr;
        bool bare_number = false;
        for (std::size_t k = 0; k <= spine.size(); ++k) {
            const std::uint32_t op = k == 0 ? 0 : spine[spine.size() - k];
            const std::uint32_t node = k == 0 ? n : file_.nodes[op].rhs;
            const bool subtracted = k > 0 && file_.nodes[op].kind == expr_kind::subtract;
            std::optional<scale> t = eval(node);
            if (!t)
                return std::nullopt;
            if (t->offset != nullptr) {
                if (offset != nullptr && offset != t->offset)
                    return fail(fmt::format("the sum {} mixes two offset scales", quote(index)));
                offset = t->offset;
                balance += subtracted ? -1 : 1;
            }
            bare_number = bare_number || (t->number && !t->zero);
            terms.push_back(std::move(*t));
            nodes.push_back(node);
        }
        if (offset != nullptr && bare_number)
            return fail(fmt::format("the sum {} adds a number to a value on the {} scale (a "
                                    "change of scale, not a pure factor)",
                                    quote(index), offset->symbol));
        std::optional<std::size_t> reference;
        for (std::size_t i = 0; i < terms.size(); ++i) {
            if (terms[i].zero)
                continue;
            if (!reference) {
                reference = i;
                continue;
            }
            scale a = terms[*reference];
            scale b = terms[i];
            a.offset = b.offset = nullptr; // offsets are followed by the balance
            if (!agree(a, b, nodes[*reference], nodes[i]))
                return std::nullopt;
        }
        if (!reference) {
            scale z;
            z.number = z.zero = true;
            return z;
        }
        scale result = settled(terms[*reference]);
        result.number = false;
        result.offset = balance == 0 ? nullptr : offset;
        return result;
    }

    std::optional<scale> eval_product(std::uint32_t index) {
        std::vector<std::uint32_t> spine;
        std::uint32_t n = index;
        while (file_.nodes[n].kind == expr_kind::multiply ||
               file_.nodes[n].kind == expr_kind::divide) {
            spine.push_back(n);
            n = file_.nodes[n].lhs;
        }
        std::optional<scale> result = eval(n);
        if (!result)
            return std::nullopt;
        std::uint32_t offset_node = n;
        bool all_numbers = result->number;
        for (std::size_t k = spine.size(); k > 0; --k) {
            const syntax::expr_node& op = file_.nodes[spine[k - 1]];
            const bool divided = op.kind == expr_kind::divide;
            std::optional<scale> t = eval(op.rhs);
            if (!t)
                return std::nullopt;
            if (t->offset != nullptr)
                offset_node = op.rhs;
            // A value on an offset scale may be halved ((T_1 + T_2)/2), not multiplied by a
            // quantity: then no pure factor relates the two readings.
            const bool offset_scaled_by_number =
                (result->offset != nullptr && t->number) ||
                (t->offset != nullptr && result->offset == nullptr && all_numbers && !divided);
            if ((result->offset != nullptr || t->offset != nullptr) && !offset_scaled_by_number)
                return fail(fmt::format("{} is on the {} scale, whose zero is arbitrary, and is {}",
                                        quote(offset_node),
                                        (t->offset != nullptr ? t->offset : result->offset)->symbol,
                                        divided ? "used in a quotient" : "multiplied"));
            const rational sign = divided ? rational(-1) : rational(1);
            append(result->factors, t->factors, sign);
            result->k_power += sign * t->k_power;
            if (t->offset != nullptr)
                result->offset = t->offset;
            all_numbers = all_numbers && t->number;
            result->zero = false;
        }
        result->number = all_numbers;
        return result;
    }

    std::optional<scale> raise(std::optional<scale> base, std::uint32_t base_node,
                               std::uint32_t exponent_node) {
        if (!base)
            return std::nullopt;
        if (const auto p = constant_of(file_, exponent_node)) {
            if (base->offset != nullptr && *p != rational(1))
                return fail(fmt::format("{} is on the {} scale, whose zero is arbitrary, and is "
                                        "raised to a power",
                                        quote(base_node), base->offset->symbol));
            scale out;
            append(out.factors, base->factors, *p);
            out.k_power = base->k_power * *p;
            out.offset = base->offset;
            out.number = base->number;
            return out;
        }
        // A variable exponent: base and exponent are pure numbers, and so is the power.
        std::optional<scale> e = eval(exponent_node);
        if (!e || !pure(*base, base_node, "under a variable exponent") ||
            !pure(*e, exponent_node, "in an exponent"))
            return std::nullopt;
        return scale{};
    }

    std::optional<scale> eval_power(std::uint32_t base_node, std::uint32_t exponent_node) {
        return raise(eval(base_node), base_node, exponent_node);
    }

    std::optional<scale> eval_call(std::uint32_t index) {
        const syntax::expr_node& n = file_.nodes[index];
        const builtin_function* f = find_function(call_name(*file_.source, n));
        const std::uint32_t count = n.rhs;
        if (f == nullptr || count < f->min_args ||
            (f->max_args != unlimited_args && count > f->max_args))
            return fail(fmt::format("{} is not a function call plumb can follow", quote(index)));
        const auto arg = [&](std::uint32_t i) { return file_.call_args[n.lhs + i]; };
        if (f->rule == function_rule::power)
            return raise(eval(arg(0)), arg(0), arg(1));
        std::vector<scale> args;
        for (std::uint32_t i = 0; i < count; ++i) {
            if (f->rule == function_rule::derivative && i == 2)
                break; // the order is a number
            std::optional<scale> a = eval(arg(i));
            if (!a)
                return std::nullopt;
            args.push_back(std::move(*a));
        }
        const auto no_offsets = [&]() -> bool {
            for (std::uint32_t i = 0; i < args.size(); ++i)
                if (args[i].offset != nullptr) {
                    why_not_ = fmt::format("{} is on the {} scale, whose zero is arbitrary, and "
                                           "is passed to a function",
                                           quote(arg(i)), args[i].offset->symbol);
                    return false;
                }
            return true;
        };
        switch (f->rule) {
        case function_rule::root: {
            if (!no_offsets())
                return std::nullopt;
            scale out;
            append(out.factors, args[0].factors, f->power);
            out.k_power = args[0].k_power * f->power;
            return out;
        }
        case function_rule::same:
            if (!no_offsets())
                return std::nullopt;
            return args[0];
        case function_rule::dimensionless:
        case function_rule::log_base:
            for (std::uint32_t i = 0; i < args.size(); ++i)
                if (!pure(args[i], arg(i), "in a function of a pure number"))
                    return std::nullopt;
            return scale{};
        case function_rule::angle_of:
        case function_rule::common: {
            if (!no_offsets())
                return std::nullopt;
            for (std::uint32_t i = 1; i < args.size(); ++i)
                if (!agree(args[0], args[i], arg(0), arg(i)))
                    return std::nullopt;
            if (f->rule == function_rule::angle_of)
                return scale{};
            scale out = settled(args[0]);
            out.number = false;
            return out;
        }
        case function_rule::derivative: {
            if (!no_offsets())
                return std::nullopt;
            rational order = 1;
            if (count == 3) {
                const auto v = constant_of(file_, arg(2));
                if (!v || !v->is_integer() || v->num() < 1)
                    return fail("the order of a derivative is not a whole number");
                order = *v;
            }
            scale out = args[0];
            append(out.factors, args[1].factors, -order);
            out.k_power -= args[1].k_power * order;
            return out;
        }
        case function_rule::integral: {
            if (!no_offsets())
                return std::nullopt;
            if (count == 4 && (!agree(args[1], args[2], arg(1), arg(2)) ||
                               !agree(args[1], args[3], arg(1), arg(3))))
                return std::nullopt;
            if (count == 3)
                return fail("an integral with one limit cannot be followed");
            scale out = args[0];
            append(out.factors, args[1].factors, rational(1));
            out.k_power += args[1].k_power;
            return out;
        }
        case function_rule::power:
            break;
        default: // the spreadsheet front ends' functions carry no coefficient to restate
            break;
        }
        return fail(fmt::format("{} is not a function call plumb can follow", quote(index)));
    }
};

} // namespace

coefficient_trace trace_coefficient(const syntax::parsed_file& file, const syntax::formula& f,
                                    std::uint32_t coefficient, symbol_table& symbols) {
    tracer t(file, symbols, coefficient);
    return t.run(f);
}

} // namespace plumb
