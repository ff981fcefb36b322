// Dimension inference. Each subexpression gets a linear form: a known dimension plus a rational
// combination of the unknowns' dimensions (the exponents of a product add, of a power scale).
// Wherever the checker compares two dimensions, the difference of the two forms must vanish;
// wherever it wants a dimensionless value, the form must. Those equations share one
// coefficient matrix for all seven base dimensions (only the right-hand sides differ), so one
// exact elimination of [A | B] answers every base dimension at once.
#include "check/inference.hpp"

#include "check/functions.hpp"
#include "check/restatement.hpp"
#include "check/trade_constants.hpp"
#include "model/subtree_search.hpp"
#include "plumb/check.hpp"
#include "plumb/groups.hpp"
#include "plumb/rules.hpp"
#include "plumb/unit_table.hpp"

#include <algorithm>
#include <cmath>
#include <cstdlib>
#include <fmt/format.h>
#include <iterator>
#include <numeric>
#include <optional>
#include <string>
#include <unordered_map>

namespace plumb {
namespace {

using syntax::expr_kind;

// Σ c_k·u_k, sorted by unknown, without zero coefficients.
using combination = std::vector<std::pair<std::uint32_t, rational>>;

// a + s·b.
combination combine(const combination& a, const combination& b, rational s) {
    combination out;
    out.reserve(a.size() + b.size());
    std::size_t i = 0;
    std::size_t j = 0;
    while (i < a.size() || j < b.size()) {
        if (j == b.size() || (i < a.size() && a[i].first < b[j].first)) {
            out.push_back(a[i++]);
        } else if (i == a.size() || b[j].first < a[i].first) {
            out.emplace_back(b[j].first, s * b[j].second);
            ++j;
        } else {
            const rational c = a[i].second + s * b[j].second;
            if (!c.is_zero())
                out.emplace_back(a[i].first, c);
            ++i;
            ++j;
        }
    }
    return out;
}

struct linear_form {
    dimension known;
    combination unknowns;
    // Nothing can be said about it (an undeclared symbol, an unknown function, a power we give
    // up on): it constrains nothing, and what contains it is opaque too.
    bool opaque = false;
    bool zero = false;             // the literal 0, which agrees with any dimension
    std::optional<rational> value; // exact value of an expression of numbers alone
    // An unknown it mentions, even when all have cancelled (X/X): X + X*t = d has no unknown
    // left in X − X*t, yet it cannot hold, and the unknown is what the finding is about.
    std::uint32_t anchor = syntax::no_index;
};

std::uint32_t either(std::uint32_t a, std::uint32_t b) {
    return a != syntax::no_index ? a : b;
}

linear_form opaque_form() {
    linear_form f;
    f.opaque = true;
    return f;
}

linear_form product(const linear_form& a, const linear_form& b, bool divide) {
    if (a.opaque || b.opaque)
        return opaque_form();
    linear_form r;
    r.known = divide ? a.known / b.known : a.known * b.known;
    r.unknowns = combine(a.unknowns, b.unknowns, divide ? rational(-1) : rational(1));
    r.anchor = either(a.anchor, b.anchor);
    return r;
}

linear_form scaled(const linear_form& a, rational p) {
    if (a.opaque)
        return opaque_form();
    linear_form r;
    r.known = a.known.pow(p);
    r.anchor = a.anchor;
    if (!p.is_zero())
        for (const auto& [u, c] : a.unknowns)
            r.unknowns.emplace_back(u, c * p);
    return r;
}

// Σ c_k·u_k = rhs, in every base dimension; from formula number `formula`.
struct equation {
    combination unknowns;
    dimension rhs;
    std::uint32_t formula = 0;
    std::uint32_t anchor = 0; // an unknown mentioned, for an equation whose unknowns cancelled

    // The unknown whose tangle this equation belongs to.
    [[nodiscard]] std::uint32_t owner() const {
        return unknowns.empty() ? anchor : unknowns.front().first;
    }
};

struct unknown {
    bool coefficient = false;
    std::string name;          // the symbol, or the coefficient's number as written ("1.486")
    location where;            // the declaration, or the coefficient in its formula
    std::uint32_t formula = 0; // a coefficient's formula
    std::uint32_t node = syntax::no_index; // a coefficient's node
    // What a coefficient written "k?[...]" is stated to be: index into coefficient_statements.
    std::uint32_t statement = syntax::no_index;
    std::vector<std::uint32_t> formulas; // every formula it occurs in, ascending, once each
};

// b^e exactly, for the whole exponents that constant exponents such as 2^3 need.
std::optional<rational> exact_power(const std::optional<rational>& base,
                                    const std::optional<rational>& exponent) {
    if (!base || !exponent || !exponent->is_integer() || exponent->num() > 64 ||
        exponent->num() < -64 || (base->is_zero() && exponent->num() < 0))
        return std::nullopt;
    try {
        rational r = 1;
        const std::int64_t n = exponent->num() < 0 ? -exponent->num() : exponent->num();
        for (std::int64_t k = 0; k < n; ++k)
            r *= *base;
        return exponent->num() < 0 ? rational(1) / r : r;
    } catch (const arithmetic_overflow&) {
        return std::nullopt;
    }
}

// Collects the equations of a file's formulas, and the unknowns they mention.
class equation_builder {
  public:
    equation_builder(const syntax::parsed_file& file, symbol_table& symbols)
        : file_(file), symbols_(symbols) {}

    std::vector<unknown> unknowns;
    std::vector<equation> equations;
    std::unordered_map<const symbol_entry*, std::uint32_t> by_symbol;

    // May throw arithmetic_overflow; the caller then drops this formula's equations.
    void add_formula(std::uint32_t index, const syntax::formula& f) {
        current_ = index;
        spine_.clear(); // an earlier formula abandoned by an exception may have left its part
        std::vector<linear_form> sides;
        for (std::uint32_t i = 0; i < f.side_count; ++i)
            sides.push_back(eval(file_.sides[f.first_side + i].root));
        agree_all(sides);
    }

  private:
    const syntax::parsed_file& file_;
    symbol_table& symbols_;
    std::uint32_t current_ = 0;
    std::vector<std::uint32_t> spine_; // shared by nested sums and products, as in the checker

    std::string_view text(span s) const { return file_.source->text(s); }

    void occurs(std::uint32_t u) {
        auto& fs = unknowns[u].formulas;
        if (fs.empty() || fs.back() != current_)
            fs.push_back(current_);
    }

    linear_form of_unknown(std::uint32_t u) {
        occurs(u);
        linear_form f;
        f.unknowns.emplace_back(u, rational(1));
        f.anchor = u;
        return f;
    }

    void agree(const linear_form& a, const linear_form& b) {
        if (a.opaque || b.opaque || a.zero || b.zero)
            return;
        add(combine(a.unknowns, b.unknowns, rational(-1)), b.known / a.known,
            either(a.anchor, b.anchor));
    }

    void require_dimensionless(const linear_form& a) {
        if (a.opaque)
            return;
        add(a.unknowns, dimension{} / a.known, a.anchor);
    }

    void add(combination c, const dimension& rhs, std::uint32_t anchor) {
        // Without any unknown, a disagreement is the checker's to report, not ours to solve.
        if (anchor == syntax::no_index)
            return;
        // Unknowns that cancelled leave 0 = rhs: nothing when rhs is [1], else a disagreement
        // the checker cannot see (it does not know the unknown's dimension).
        if (c.empty() && rhs.is_dimensionless())
            return;
        equations.push_back({std::move(c), rhs, current_, anchor});
    }

    // Every usable operand agrees with the first; returns that one's index.
    std::optional<std::size_t> agree_all(const std::vector<linear_form>& ops) {
        std::optional<std::size_t> reference;
        for (std::size_t i = 0; i < ops.size(); ++i) {
            if (ops[i].opaque || ops[i].zero)
                continue;
            if (!reference)
                reference = i;
            else
                agree(ops[*reference], ops[i]);
        }
        return reference;
    }

    linear_form eval(std::uint32_t index) {
        const syntax::expr_node& n = file_.nodes[index];
        switch (n.kind) {
        case expr_kind::number: {
            linear_form f;
            f.value = rational::parse(text(n.range));
            f.zero = f.value && f.value->is_zero();
            return f;
        }
        case expr_kind::pi:
            return {};
        case expr_kind::symbol:
            return eval_symbol(n);
        case expr_kind::negate: {
            linear_form f = eval(n.lhs);
            if (f.value)
                f.value = -*f.value;
            return f;
        }
        case expr_kind::add:
        case expr_kind::subtract:
            return eval_sum(index);
        case expr_kind::multiply:
        case expr_kind::divide:
            return eval_product(index);
        case expr_kind::power: {
            const linear_form base = eval(n.lhs);
            return power(base, eval(n.rhs));
        }
        case expr_kind::call:
            return eval_call(n);
        case expr_kind::group:
            return eval(n.lhs);
        case expr_kind::quantity: {
            if (n.lhs >= file_.quantities.size() || !file_.quantities[n.lhs].dim)
                return opaque_form(); // an unknown unit, already reported
            linear_form f;
            f.known = *file_.quantities[n.lhs].dim;
            return f;
        }
        case expr_kind::inferred: {
            // Each coefficient is an unknown of its own, even when two are written alike.
            unknown u;
            u.coefficient = true;
            std::string_view t = text(n.range);
            t = t.substr(0, t.find('?')); // "1.486?[L^(1/3) T^-1]" is the coefficient 1.486
            while (!t.empty() && (t.back() == ' ' || t.back() == '\t'))
                t.remove_suffix(1);
            u.name = std::string(t);
            u.where = {file_.source, n.range};
            u.formula = current_;
            u.node = index;
            u.statement = n.lhs < file_.coefficient_statements.size() ? n.lhs : syntax::no_index;
            unknowns.push_back(std::move(u));
            return of_unknown(static_cast<std::uint32_t>(unknowns.size() - 1));
        }
        case expr_kind::reference: // spreadsheet operands: no unknowns to infer there
        case expr_kind::compare:
            return opaque_form();
        }
        return opaque_form();
    }

    linear_form eval_symbol(const syntax::expr_node& n) {
        const std::string_view name = text(n.range);
        symbol_entry* entry = symbols_.find(name);
        if (entry == nullptr)
            return opaque_form(); // undeclared: the checker says so
        if (entry->to_infer) {
            auto [it, inserted] =
                by_symbol.try_emplace(entry, static_cast<std::uint32_t>(unknowns.size()));
            if (inserted) {
                unknown u;
                u.name = std::string(name);
                u.where = entry->declared_at;
                unknowns.push_back(std::move(u));
            }
            return of_unknown(it->second);
        }
        if (!entry->dim)
            return opaque_form(); // its declaration had an error, already reported
        linear_form f;
        f.known = *entry->dim;
        return f;
    }

    linear_form eval_sum(std::uint32_t index) {
        // Along the left spine, iteratively: a long sum must not recurse once per term.
        const std::size_t spine_base = spine_.size();
        std::uint32_t n = index;
        while (file_.nodes[n].kind == expr_kind::add ||
               file_.nodes[n].kind == expr_kind::subtract) {
            spine_.push_back(n);
            n = file_.nodes[n].lhs;
        }
        const std::size_t term_count = spine_.size() - spine_base + 1;
        std::vector<linear_form> terms;
        terms.reserve(term_count);
        std::optional<rational> value = rational(0);
        bool all_zero = true;
        bool any_opaque = false;
        for (std::size_t k = 0; k < term_count; ++k) {
            const std::uint32_t op = k == 0 ? 0 : spine_[spine_.size() - k];
            const std::uint32_t node = k == 0 ? n : file_.nodes[op].rhs;
            const bool subtracted = k > 0 && file_.nodes[op].kind == expr_kind::subtract;
            terms.push_back(eval(node));
            const linear_form& t = terms.back();
            all_zero = all_zero && t.zero;
            any_opaque = any_opaque || t.opaque;
            if (value && t.value) {
                try {
                    value = subtracted ? *value - *t.value : *value + *t.value;
                } catch (const arithmetic_overflow&) {
                    value.reset(); // a value only serves as an exponent
                }
            } else {
                value.reset();
            }
        }
        spine_.resize(spine_base);
        const std::optional<std::size_t> reference = agree_all(terms);
        if (!reference) {
            if (all_zero) {
                linear_form z;
                z.zero = true;
                z.value = rational(0);
                return z;
            }
            return opaque_form();
        }
        // Every term has the reference's dimension once the equations hold; an opaque term
        // does not change that.
        linear_form result = terms[*reference];
        result.zero = false;
        for (const auto& t : terms)
            result.anchor = either(result.anchor, t.anchor);
        result.value = any_opaque ? std::nullopt : value;
        return result;
    }

    linear_form eval_product(std::uint32_t index) {
        const std::size_t spine_base = spine_.size();
        std::uint32_t n = index;
        while (file_.nodes[n].kind == expr_kind::multiply ||
               file_.nodes[n].kind == expr_kind::divide) {
            spine_.push_back(n);
            n = file_.nodes[n].lhs;
        }
        linear_form result = eval(n);
        result.zero = false;
        // Spine nodes were pushed outermost first; the innermost applies first.
        for (std::size_t k = spine_.size(); k > spine_base; --k) {
            const syntax::expr_node& op = file_.nodes[spine_[k - 1]];
            const bool divided = op.kind == expr_kind::divide;
            const linear_form t = eval(op.rhs);
            std::optional<rational> value;
            if (result.value && t.value && !(divided && t.value->is_zero())) {
                try {
                    value = divided ? *result.value / *t.value : *result.value * *t.value;
                } catch (const arithmetic_overflow&) {
                    value.reset();
                }
            }
            // Keep walking an opaque product: its other factors may still hold equations.
            result = product(result, t, divided);
            result.value = value;
        }
        spine_.resize(spine_base);
        return result;
    }

    linear_form power(const linear_form& base, const linear_form& exponent) {
        require_dimensionless(exponent);
        if (base.opaque)
            return opaque_form();
        if (exponent.value) {
            linear_form r = scaled(base, *exponent.value);
            r.value = exact_power(base.value, exponent.value);
            return r;
        }
        if (base.unknowns.empty() && base.known.is_dimensionless())
            return {}; // (1 + r)^n: any dimensionless exponent will do
        // The exponent is not a constant number (a symbol, a coefficient, a number too long to
        // hold exactly) and the base is not known to be dimensionless. One could conclude that
        // the base must be dimensionless, since only then may the exponent vary; but the
        // notation treats a variable exponent on a dimensioned base as a mistake for the
        // checker to report, and inferring "dimensionless" would turn that possible mistake into
        // a silent assumption about the unknowns. So this power constrains nothing.
        return opaque_form();
    }

    linear_form eval_call(const syntax::expr_node& n) {
        std::vector<linear_form> args;
        args.reserve(n.rhs);
        for (std::uint32_t i = 0; i < n.rhs; ++i)
            args.push_back(eval(file_.call_args[n.lhs + i]));
        const builtin_function* f = find_function(call_name(*file_.source, n));
        const std::size_t count = args.size();
        // An unknown function or a wrong count: the checker reports it; it tells us nothing.
        if (f == nullptr || count < f->min_args ||
            (f->max_args != unlimited_args && count > f->max_args) ||
            (f->rule == function_rule::integral && count == 3))
            return opaque_form();
        switch (f->rule) {
        case function_rule::root:
            return scaled(args[0], f->power);
        case function_rule::same: {
            linear_form r = args[0];
            r.value.reset();
            r.zero = false;
            return r;
        }
        case function_rule::dimensionless:
        case function_rule::log_base:
            for (const auto& a : args)
                require_dimensionless(a);
            return {};
        case function_rule::angle_of:
            agree_all(args);
            return {};
        case function_rule::common: {
            const std::optional<std::size_t> reference = agree_all(args);
            if (!reference) {
                if (std::all_of(args.begin(), args.end(),
                                [](const linear_form& a) { return a.zero; })) {
                    linear_form z;
                    z.zero = true;
                    return z;
                }
                return opaque_form();
            }
            linear_form r = args[*reference];
            r.value.reset();
            return r;
        }
        case function_rule::power:
            return power(args[0], args[1]);
        case function_rule::derivative: {
            rational order = 1;
            if (count == 3) {
                const auto& v = args[2].value;
                if (!v || !v->is_integer() || v->num() < 1)
                    return opaque_form(); // the checker reports the order
                order = *v;
            }
            return product(args[0], scaled(args[1], order), true);
        }
        case function_rule::integral:
            if (count == 4) {
                // The limits answer to the variable, and so to each other when it is opaque.
                if (!args[1].opaque && !args[1].zero) {
                    agree(args[1], args[2]);
                    agree(args[1], args[3]);
                } else {
                    agree(args[2], args[3]);
                }
            }
            return product(args[0], args[1], false);
        default: // spreadsheet functions: never met in the notation
            return opaque_form();
        }
        return opaque_form();
    }
};

// ---- Solving --------------------------------------------------------------------------------

// Exact elimination over a dense matrix costs about unknowns³ rational operations: a few
// hundred unknowns tied together solve in well under a second, thousands would take minutes.
// A larger tangle is reported as too large rather than solved.
constexpr std::size_t max_unknowns_solved_together = 500;

struct solution {
    bool consistent = true;
    std::size_t rank = 0;
    std::vector<std::optional<dimension>> values; // per column: set when determined
    rational_matrix reduced;                      // [A | B] in reduced row echelon form
};

// Formulas that disagree, found by find_conflict.
struct conflict_set {
    std::vector<std::uint32_t> formulas;
    bool each_settles = false;     // leaving out any one of them restores agreement
    std::vector<solution> without; // with each_settles: the solution without each one
    std::vector<bool> on_its_own;  // the formula cannot hold even alone
    // Per formula, per column: what the formula alone makes each unknown, where it fixes it.
    std::vector<std::vector<std::optional<dimension>>> alone;
    bool searched = false; // false when there were too many formulas to search
};

// Solves the equations of one component, leaving out those of the formulas in `left_out`
// (sorted). `column` maps an unknown to its column; `n` is the number of columns.
solution solve(const std::vector<const equation*>& equations,
               const std::vector<std::uint32_t>& column, std::size_t n,
               const std::vector<std::uint32_t>& left_out) {
    std::vector<const equation*> kept;
    for (const equation* e : equations)
        if (!std::binary_search(left_out.begin(), left_out.end(), e->formula))
            kept.push_back(e);
    solution s;
    s.values.resize(n);
    s.reduced = rational_matrix(kept.size(), n + base_dimension_count);
    for (std::size_t r = 0; r < kept.size(); ++r) {
        for (const auto& [u, c] : kept[r]->unknowns)
            s.reduced.at(r, column[u]) = c;
        for (std::size_t d = 0; d < base_dimension_count; ++d)
            s.reduced.at(r, n + d) = kept[r]->rhs.exponents()[d];
    }
    if (kept.empty())
        return s;
    // Elimination runs column by column, so a pivot among the right-hand sides belongs to a row
    // whose unknowns all vanished: 0 = nonzero in some base dimension.
    const std::vector<std::size_t> pivots = row_reduce(s.reduced);
    for (std::size_t r = 0; r < pivots.size(); ++r) {
        const std::size_t p = pivots[r];
        if (p >= n) {
            s.consistent = false;
            continue;
        }
        ++s.rank;
        // Determined exactly when the pivot row names no other unknown (no free column).
        bool alone = true;
        for (std::size_t c = 0; c < n && alone; ++c)
            alone = c == p || s.reduced.at(r, c).is_zero();
        if (!alone)
            continue;
        std::array<rational, base_dimension_count> e{};
        for (std::size_t d = 0; d < base_dimension_count; ++d)
            e[d] = s.reduced.at(r, n + d);
        s.values[p] = dimension::from_exponents(e);
    }
    return s;
}

// ---- Reporting ------------------------------------------------------------------------------

std::string describe(const dimension& d) {
    if (d.is_dimensionless())
        return "[1] (dimensionless)";
    const std::string_view name = quantity_name(d);
    return name.empty() ? d.to_string() : fmt::format("{} ({})", d.to_string(), name);
}

// "'X'" or "the coefficient 1.486".
std::string who(const unknown& u) {
    return u.coefficient ? fmt::format("the coefficient {}", u.name) : fmt::format("'{}'", u.name);
}

// A formula as written, on one line.
std::string one_line(std::string_view raw) {
    return single_line(raw);
}

// A formula for a note: its label when it has one, else its text, shortened.
std::string formula_name(const syntax::parsed_file& file, const syntax::formula& f) {
    if (f.label.end > f.label.begin)
        return fmt::format("@{}", file.source->text(f.label));
    std::string t = one_line(file.source->text(f.range));
    constexpr std::size_t limit = 48;
    if (t.size() > limit) {
        std::size_t cut = limit;
        while (cut > 0 && (static_cast<unsigned char>(t[cut]) & 0xC0) == 0x80)
            --cut;
        t = t.substr(0, cut) + "\u2026";
    }
    return fmt::format("'{}'", t);
}

std::string exponent_text(rational e) {
    return e.is_integer() ? e.to_string() : fmt::format("({})", e.to_string());
}

// "a*b^2/(c*d^(1/3))" from bases and exponents; a base with an operator in it is bracketed.
std::string render_product(const std::vector<std::pair<std::string, rational>>& factors) {
    auto append = [](std::string& side, const std::string& base, rational e) {
        if (!side.empty())
            side += '*';
        const bool product = base.find_first_of("/* ") != std::string::npos ||
                             base.find("\u00B7") != std::string::npos;
        if (e == rational(1)) {
            side += product ? "(" + base + ")" : base;
            return;
        }
        side += product || base.find('^') != std::string::npos ? "(" + base + ")" : base;
        side += '^';
        side += exponent_text(e);
    };
    std::string numerator;
    std::string denominator;
    std::size_t below = 0;
    for (const auto& [base, e] : factors) {
        if (e.is_zero())
            continue;
        if (e.num() > 0) {
            append(numerator, base, e);
        } else {
            append(denominator, base, -e);
            ++below;
        }
    }
    if (numerator.empty())
        numerator = "1";
    if (below == 0)
        return numerator;
    return below > 1 ? numerator + "/(" + denominator + ")" : numerator + "/" + denominator;
}

// Unit factors with their exponents, for display: a factor that is a small rational power of
// one listed before it joins it (ft^3/s is 0.3048^3, ft^2 is 0.3048^2), so that the derivation
// reads 3.33 × 0.3048^(1/2) rather than 3.33 × 0.02831685/0.3048^(5/2). Display only: the
// value itself is computed from the factors as they are.
std::vector<std::pair<double, rational>>
merge_powers(const std::vector<std::pair<double, rational>>& factors) {
    std::vector<std::pair<double, rational>> out;
    for (const auto& [factor, g] : factors) {
        bool merged = false;
        for (auto& [base, sum] : out) {
            if (base == factor) {
                sum += g;
                merged = true;
                break;
            }
            const double ratio = std::log(factor) / std::log(base);
            for (std::int64_t q = 1; q <= 6 && !merged; ++q) {
                const double p = std::round(ratio * static_cast<double>(q));
                if (std::abs(p) > 0 && std::abs(p) <= 60 &&
                    std::abs(ratio * static_cast<double>(q) - p) < 1e-9) {
                    const rational r(static_cast<std::int64_t>(p), q);
                    if (std::abs(ratio) >= 1) {
                        sum += g * r;
                    } else {
                        // The newcomer is the smaller power (ft after ft^2): it becomes the base.
                        sum = sum / r + g;
                        base = factor;
                    }
                    merged = true;
                }
            }
            if (merged)
                break;
        }
        if (!merged)
            out.emplace_back(factor, g);
    }
    std::erase_if(out, [](const auto& p) { return p.second.is_zero(); });
    return out;
}

// The SI value of the coherent unit of `dim` in the set `target`.
double coherent_unit_value(const dimension& dim, const coherent_units& target) {
    double v = 1.0;
    for (std::size_t b = 0; b < base_dimension_count; ++b)
        v *= std::pow(target.base_factor[b],
                      dim.exponent(static_cast<base_dimension>(b)).to_double());
    return v;
}

// Notes restating a determined coefficient for coherent SI units and for `restate_in`, or
// saying why it cannot be; the values also go to d.restated. Returns the SI value.
std::optional<double> restate_coefficient(const syntax::parsed_file& file, const syntax::formula& f,
                                          const unknown& u, const dimension& dim,
                                          symbol_table& symbols, diagnostic& d,
                                          const coherent_units* restate_in,
                                          std::optional<sides_apart>* apart) {
    const coefficient_trace trace = trace_coefficient(file, f, u.node, symbols);
    if (apart != nullptr)
        *apart = trace.apart;
    if (!trace.traced) {
        d.notes.push_back({fmt::format("the coefficient is not restated for coherent SI units: "
                                       "{}; it holds only with the symbols in the units they are "
                                       "declared in",
                                       trace.why_not),
                           {}});
        return std::nullopt;
    }
    std::vector<std::pair<std::string, rational>> units; // by unit text
    std::vector<std::pair<double, rational>> numbers;    // by SI factor
    for (const scale_factor& s : trace.factor) {
        auto ut = std::find_if(units.begin(), units.end(),
                               [&](const auto& p) { return p.first == s.unit; });
        if (ut == units.end())
            units.emplace_back(s.unit, s.power);
        else
            ut->second += s.power;
        numbers.emplace_back(s.si, s.power);
    }
    std::erase_if(units, [](const auto& p) { return p.first.empty() || p.second.is_zero(); });
    const std::string value_text(u.name);
    char* end = nullptr;
    const double k = std::strtod(value_text.c_str(), &end);
    if (end == value_text.c_str() || !std::isfinite(k))
        return std::nullopt;
    double factor = 1.0;
    for (const auto& [si, power] : numbers)
        factor *= std::pow(si, power.to_double());
    const std::vector<std::pair<double, rational>> merged = merge_powers(numbers);
    restated_coefficient si;
    si.units = "SI";
    si.holds_with = trace.bound;
    if (!trace.bound.empty()) {
        constexpr std::size_t max_listed = 6;
        std::string list;
        for (std::size_t i = 0; i < trace.bound.size() && i < max_listed; ++i)
            list +=
                fmt::format("{}{}", i == 0 ? "" : (i + 1 == trace.bound.size() ? " and " : ", "),
                            trace.bound[i]);
        if (trace.bound.size() > max_listed)
            list += fmt::format(" and {} more", trace.bound.size() - max_listed);
        d.notes.push_back({fmt::format("{} holds only with {}, as declared", u.name, list), {}});
    }
    if (merged.empty()) {
        factor = 1.0; // the factors cancel exactly; rounding must not say otherwise
        d.notes.push_back(
            {trace.bound.empty()
                 ? fmt::format("the symbols are declared in coherent SI units, so {} is the "
                               "coefficient for coherent SI units",
                               u.name)
                 : fmt::format("the unit factors cancel, so the coefficient is {} in coherent SI "
                               "units too",
                               u.name),
             {}});
        si.factor = "1";
        si.factor_digits = "1";
    } else {
        std::vector<std::pair<std::string, rational>> number_text;
        for (const auto& [value, g] : merged) {
            // 1.840131e-06^(1/3) would read ambiguously.
            std::string t = fmt::format("{:.7g}", value);
            if (t.find('e') != std::string::npos && g != rational(1) && g != rational(-1))
                t = "(" + t + ")";
            number_text.emplace_back(std::move(t), g);
        }
        si.factor = render_product(units);
        si.factor_digits = render_product(number_text);
    }
    const double k_si = k * factor;
    si.value = k_si;
    si.factor_value = factor;
    if (!merged.empty())
        d.notes.push_back(
            {fmt::format("in coherent SI units the coefficient is {} \u00D7 {} = {} \u00D7 {} = {}",
                         u.name, si.factor, u.name, si.factor_digits,
                         std::isfinite(k_si) && k_si != 0.0
                             ? fmt::format("{:.6g}", k_si)
                             : std::string("a number beyond floating-point range")),
             {}});
    if (!std::isfinite(k_si) || !std::isfinite(factor))
        return std::nullopt;
    d.restated.push_back(si);
    if (restate_in != nullptr) {
        const double divisor = coherent_unit_value(dim, *restate_in);
        const double k_target = k_si / divisor;
        if (std::isfinite(k_target) && divisor != 0.0) {
            d.notes.push_back(
                {fmt::format("in coherent units of {} the coefficient is {:.6g} / {:.6g} = {:.6g} "
                             "(the SI value of their unit of {})",
                             restate_in->label, k_si, divisor, k_target, dim.to_string()),
                 {}});
            restated_coefficient other;
            other.units = restate_in->label;
            other.value = k_target;
            other.factor = fmt::format("{} per coherent unit of {} in {}", si.factor,
                                       dim.to_string(), restate_in->label);
            other.factor_digits = fmt::format("{} / {}", si.factor_digits, divisor);
            other.factor_value = factor / divisor;
            other.holds_with = trace.bound;
            d.restated.push_back(std::move(other));
        }
    }
    return k_si;
}

diagnostic make(severity level, std::string_view rule, std::string message, location where) {
    diagnostic d;
    d.level = level;
    d.rule = std::string(rule);
    d.message = std::move(message);
    d.where = where;
    return d;
}

class reporter {
  public:
    reporter(const syntax::parsed_file& file, std::span<const syntax::formula> formulas,
             symbol_table& symbols, const std::vector<unknown>& unknowns,
             const std::vector<bool>& overflowed, std::vector<diagnostic>& out,
             const coherent_units* restate_in = nullptr)
        : file_(file), formulas_(formulas), symbols_(symbols), unknowns_(unknowns),
          overflowed_(overflowed), out_(out), restate_in_(restate_in) {}

    void determined(std::uint32_t u, const dimension& dim) {
        const unknown& x = unknowns_[u];
        std::string message;
        if (x.coefficient)
            message = dim.is_dimensionless()
                          ? fmt::format("the coefficient {} must be dimensionless", x.name)
                          : fmt::format("the coefficient {} must carry {}", x.name, describe(dim));
        else
            message = dim.is_dimensionless()
                          ? fmt::format("'{}' must be dimensionless", x.name)
                          : fmt::format("'{}' must have dimension {}", x.name, describe(dim));
        diagnostic d = make(severity::note, rules::inferred_dimension, std::move(message), x.where);
        d.terms.push_back({x.where, x.coefficient ? x.name + "?" : x.name, dim});
        std::optional<double> k_si;
        std::optional<sides_apart> apart;
        std::string why_not;
        if (x.coefficient) {
            try {
                k_si = restate_coefficient(file_, formulas_[x.formula], x, dim, symbols_, d,
                                           restate_in_, &apart);
            } catch (const arithmetic_overflow&) {
                d.notes.push_back({"the coefficient is not restated for coherent SI units: its "
                                   "exponents exceed the exact range",
                                   {}});
            }
        }
        out_.push_back(std::move(d));
        if (x.statement != syntax::no_index)
            check_statement(x, dim, k_si, out_.back());
        else if (x.coefficient && k_si) {
            check_manning_factor(x, dim, *k_si);
            check_hazen_williams_factor(x, dim, *k_si);
        }
        if (apart)
            report_sides_apart(x, *apart);
    }

    // "σ_y = 0.08*x_km*(1 + 0.0001?*x_km)^(-1/2)" with σ_y in m (Briggs's rural σ_y, x in m;
    // from memory): the sum fixes the coefficient's units, and the sides are still 1000 apart,
    // whatever the coefficient is. A warning, as the same sides without a coefficient get,
    // unless the formula's other numbers could be that very conversion.
    void report_sides_apart(const unknown& x, const sides_apart& apart) {
        if (!(apart.ratio > 0) || !std::isfinite(apart.ratio) ||
            numbers_could_convert(formulas_[x.formula], apart.ratio))
            return;
        const auto where = [&](std::uint32_t node) {
            return location{file_.source, file_.nodes[node].range};
        };
        const auto shown = [&](std::uint32_t node) {
            return std::string(file_.source->text(file_.nodes[node].range));
        };
        diagnostic d = make(
            severity::warning, rules::unit_scale,
            fmt::format("as written, '{}' counts {:.6g} times as much as '{}', whatever units "
                        "the coefficient {}? carries: the sides agree in dimension but not in unit",
                        shown(apart.other), apart.ratio, shown(apart.first), x.name),
            where(apart.other));
        d.notes.push_back({fmt::format("{} '{}' by {:.6g} (declare the symbols in the units the "
                                       "formula was fitted for, or write the conversion into it)",
                                       apart.ratio < 1 ? "multiply" : "divide", shown(apart.other),
                                       apart.ratio < 1 ? 1.0 / apart.ratio : apart.ratio),
                           {}});
        out_.push_back(std::move(d));
    }

    // Whether some of the formula's numbers, multiplied or divided, make `ratio` (or its
    // inverse): they may be the conversion the trace, which reads units alone, does not see.
    bool numbers_could_convert(const syntax::formula& f, double ratio) const {
        std::vector<double> values;
        syntax::search_formula(file_, f, [&](std::uint32_t, const syntax::expr_node& n) {
            if (n.kind == syntax::expr_kind::number) {
                const double v =
                    std::strtod(std::string(file_.source->text(n.range)).c_str(), nullptr);
                if (v > 0 && v != 1.0 && std::isfinite(v))
                    values.push_back(v);
            }
            return values.size() > 8 ? syntax::search_step::found : syntax::search_step::descend;
        });
        if (values.size() > 8)
            return true; // too many to try: say nothing rather than guess
        std::size_t combinations = 1;
        for (std::size_t k = 0; k < values.size(); ++k)
            combinations *= 3;
        for (std::size_t c = 1; c < combinations; ++c) {
            double product = 1.0;
            for (std::size_t k = 0, code = c; k < values.size(); ++k, code /= 3)
                product *= code % 3 == 1 ? values[k] : (code % 3 == 2 ? 1.0 / values[k] : 1.0);
            for (const double target : {ratio, 1.0 / ratio})
                if (std::abs(product / target - 1.0) < 0.005)
                    return true;
        }
        return false;
    }

    // Whether the coefficient's formula holds numbers other than it and the exponents.
    bool holds_other_numbers(const unknown& x) const {
        return syntax::search_formula(
            file_, formulas_[x.formula], [](std::uint32_t, const syntax::expr_node& n) {
                switch (n.kind) {
                case syntax::expr_kind::number:
                case syntax::expr_kind::quantity:
                    return syntax::search_step::found;
                case syntax::expr_kind::call:
                    return syntax::search_step::skip;
                default: // a power's exponent, which is the formula's, is not searched
                    return syntax::search_step::descend;
                }
            });
    }

    // Hazen-Williams h_f = k·L·Q^1.852/(C^1.852·D^4.87): k is 10.67 in SI units (metres,
    // m³/s), and the trade's other forms (4.52 with psi per ft, gpm and in; 10.44 with ft, gpm
    // and in; 4.73 with ft, cfs and ft) come to the same once restated (Hazen-Williams as
    // printed in the AWWA and ASCE manuals, from memory). A k marked `?` whose value in SI
    // units is far from 10.67 has a symbol in a unit its form does not take, a warning where no
    // reviewed statement says otherwise. Known by the coefficient's dimension: time to the
    // flow's power (1.85 to 1.852) and length to about -0.69.
    void check_hazen_williams_factor(const unknown& x, const dimension& dim, double k_si) {
        double time = 0.0;
        double length = 0.0;
        try {
            time = dim.exponent(base_dimension::time).to_double();
            length = dim.exponent(base_dimension::length).to_double();
        } catch (const std::exception&) {
            return;
        }
        if (!(time >= 1.849 && time <= 1.853) || !(length >= -0.72 && length <= -0.66))
            return;
        for (const base_dimension other :
             {base_dimension::mass, base_dimension::temperature, base_dimension::amount,
              base_dimension::current, base_dimension::luminous_intensity})
            if (!dim.exponent(other).is_zero())
                return;
        // Restated, the coefficient leaves out the formula's other numbers: where it has any
        // ((Q_Ls/1000)^1.852, a conversion written in), the restated value says nothing.
        if (std::abs(k_si / hazen_williams_si - 1.0) <= 0.03 || holds_other_numbers(x))
            return;
        diagnostic d = make(severity::warning, rules::unit_scale,
                            fmt::format("the coefficient {} reads as Hazen-Williams', but the "
                                        "symbols' units make it {:.4g} in SI units, where the "
                                        "formula's is 10.67: a symbol is in a unit this form "
                                        "of the formula does not take",
                                        x.name, k_si),
                            x.where);
        d.terms.push_back({x.where, x.name + "?", dim});
        d.notes.push_back({"Hazen-Williams' coefficient is 10.67 "
                           "with metres and m³/s, 4.52 for "
                           "psi per ft with gpm and inches, 10.44 "
                           "for feet with gpm and inches",
                           {}});
        out_.push_back(std::move(d));
    }

    // Manning's V = (k/n)·R^(2/3)·S^(1/2): k is 1 in SI units and 1.486 (1/0.3048^(1/3)) with
    // feet and seconds (Chow, Open-Channel Hydraulics, 1959, 5-6, from memory). A k marked `?`
    // whose value in SI units comes to 1.486, or to 0.673 (the SI 1 with feet), is the other
    // system's, a warning where no reviewed statement says otherwise.
    void check_manning_factor(const unknown& x, const dimension& dim, double k_si) {
        static const dimension manning =
            dimension::base(base_dimension::length).pow(rational(1, 3)) /
            dimension::base(base_dimension::time);
        if (!(dim == manning))
            return;
        const double us = 1.0 / std::cbrt(0.3048);
        const bool feet_in_si = std::abs(k_si / us - 1.0) < 0.006;
        const bool si_in_feet = std::abs(k_si * us - 1.0) < 0.006;
        if (!feet_in_si && !si_in_feet)
            return;
        diagnostic d = make(
            severity::warning, rules::unit_scale,
            feet_in_si ? fmt::format("the coefficient {} reads as Manning's factor for feet "
                                     "and seconds, but the symbols' units make it {:.4g} in SI "
                                     "units, where Manning's factor is 1: the flow comes out "
                                     "{:.0f} % high",
                                     x.name, k_si, (k_si - 1.0) * 100.0)
                       : fmt::format("the coefficient {} reads as Manning's SI factor, but with "
                                     "the symbols in feet it comes to {:.4g} in SI units, where "
                                     "Manning's factor is 1: the flow comes out {:.0f} % low",
                                     x.name, k_si, (1.0 - k_si) * 100.0),
            x.where);
        d.terms.push_back({x.where, x.name + "?", dim});
        d.notes.push_back({"Manning's factor is 1 with metres and seconds and 1.486 (written "
                           "1.49) with feet and seconds",
                           {}});
        out_.push_back(std::move(d));
    }

    // The product of the plain numbers written beside a coefficient in its term, with their
    // powers: the 1.811² of "0.0398?*(1.811*Q/(A*D^0.5))^2", HDS-5's K_u (FHWA HDS-5, 3rd ed.,
    // from memory), which holds a conversion the statement's SI value may count. Empty where
    // the term has none.
    std::optional<double> numbers_beside(const unknown& x) const {
        using syntax::expr_kind;
        const syntax::formula& f = formulas_[x.formula];
        // The top of the product the coefficient stands in.
        std::uint32_t top = syntax::no_index;
        std::vector<std::pair<std::uint32_t, std::uint32_t>> stack; // node, its product's top
        for (std::uint32_t i = 0; i < f.side_count && top == syntax::no_index; ++i) {
            const std::uint32_t root = file_.sides[f.first_side + i].root;
            stack.assign(1, {root, root});
            while (!stack.empty() && top == syntax::no_index) {
                const auto [k, product] = stack.back();
                stack.pop_back();
                if (k == x.node) {
                    top = product;
                    break;
                }
                const syntax::expr_node& n = file_.nodes[k];
                switch (n.kind) {
                case expr_kind::multiply:
                case expr_kind::divide:
                    stack.push_back({n.lhs, product});
                    stack.push_back({n.rhs, product});
                    break;
                case expr_kind::group:
                case expr_kind::negate:
                    stack.push_back({n.lhs, product});
                    break;
                case expr_kind::power:
                    stack.push_back({n.lhs, product});
                    stack.push_back({n.rhs, n.rhs});
                    break;
                case expr_kind::add:
                case expr_kind::subtract:
                case expr_kind::compare:
                    stack.push_back({n.lhs, n.lhs});
                    stack.push_back({n.rhs, n.rhs});
                    break;
                case expr_kind::call:
                    for (std::uint32_t a = 0; a < n.rhs; ++a)
                        stack.push_back({file_.call_args[n.lhs + a], file_.call_args[n.lhs + a]});
                    break;
                default:
                    break;
                }
            }
        }
        if (top == syntax::no_index)
            return std::nullopt;
        double product = 1.0;
        bool found = false;
        std::vector<std::pair<std::uint32_t, double>> walk{{top, 1.0}}; // node, its power
        while (!walk.empty()) {
            const auto [k, power] = walk.back();
            walk.pop_back();
            const syntax::expr_node& n = file_.nodes[k];
            if (n.kind == expr_kind::number && k != x.node) {
                const double v =
                    std::strtod(std::string(file_.source->text(n.range)).c_str(), nullptr);
                if (v > 0 && std::isfinite(v) && v != 1.0) {
                    product *= std::pow(v, power);
                    found = true;
                }
            } else if (n.kind == expr_kind::multiply || n.kind == expr_kind::divide) {
                walk.push_back({n.lhs, power});
                walk.push_back({n.rhs, n.kind == expr_kind::divide ? -power : power});
            } else if (n.kind == expr_kind::group || n.kind == expr_kind::negate) {
                walk.push_back({n.lhs, power});
            } else if (n.kind == expr_kind::power && file_.nodes[n.rhs].kind == expr_kind::number) {
                const double e = std::strtod(
                    std::string(file_.source->text(file_.nodes[n.rhs].range)).c_str(), nullptr);
                if (std::isfinite(e) && std::abs(e) <= 8)
                    walk.push_back({n.lhs, power * e});
            }
        }
        if (!found || !(product > 0) || !std::isfinite(product))
            return std::nullopt;
        return product;
    }

    // A coefficient written "k?[...]": what the formula makes it against what was stated.
    void check_statement(const unknown& x, const dimension& dim, std::optional<double> k_si,
                         diagnostic& inferred) {
        const syntax::coefficient_statement& st = file_.coefficient_statements[x.statement];
        const location stated_at{file_.source, st.range};
        const std::string stated_text = single_line(file_.source->text(st.range));
        if (st.dim && !(*st.dim == dim)) {
            diagnostic d = make(severity::error, rules::coefficient_mismatch,
                                fmt::format("the coefficient {} carries {}, not the {} stated "
                                            "for it",
                                            x.name, describe(dim), describe(*st.dim)),
                                x.where);
            d.terms.push_back({x.where, x.name + "?", dim});
            d.notes.push_back({fmt::format("stated as {}", stated_text), stated_at});
            d.notes.push_back({"the formula around the coefficient has changed since it was "
                               "reviewed, or the statement is wrong: check both against the "
                               "source of the formula",
                               {}});
            out_.push_back(std::move(d));
            return; // its value in SI is of another quantity: comparing it says nothing more
        }
        if (st.dim)
            inferred.notes.push_back(
                {fmt::format("its dimension is the {} stated for it", describe(*st.dim)), {}});
        if (!st.si_value)
            return;
        const std::string value_text = single_line(file_.source->text(st.value_text));
        if (!k_si || !std::isfinite(*st.si_value) || !std::isfinite(st.tolerance)) {
            diagnostic d = make(severity::warning, rules::coefficient_mismatch,
                                fmt::format("the value stated for the coefficient {} ({}) cannot "
                                            "be checked: {}",
                                            x.name, value_text,
                                            k_si ? "the stated value is beyond floating-point "
                                                   "range"
                                                 : "it is not restated for coherent SI units"),
                                x.where);
            d.notes.push_back({fmt::format("stated as {}", stated_text), stated_at});
            for (const auto& n : inferred.notes)
                if (n.message.starts_with("the coefficient is not restated"))
                    d.notes.push_back(n);
            out_.push_back(std::move(d));
            return;
        }
        const double low = *st.si_value - st.tolerance;
        const double high = *st.si_value + st.tolerance;
        // A relative 1e-12 keeps a value printed at its full precision from failing on rounding.
        const auto within = [&](double k) {
            const double slack = 1e-12 * std::max(std::abs(*st.si_value), std::abs(k));
            return k >= low - slack && k <= high + slack;
        };
        if (within(*k_si)) {
            inferred.notes.push_back(
                {fmt::format("{:.6g} lies within the stated {} ({:.6g} to {:.6g})", *k_si,
                             value_text, low, high),
                 {}});
            return;
        }
        // "0.0398?[..., SI 0.1306 ± 1%]*(1.811*Q/(A*D^0.5))^2": the statement counts the
        // term's own numbers with the coefficient, as the source prints its SI value.
        const std::optional<double> beside = numbers_beside(x);
        if (beside && within(*k_si * *beside)) {
            inferred.notes.push_back(
                {fmt::format("with the numbers beside it in its term folded in, {:.6g} lies "
                             "within the stated {} ({:.6g} to {:.6g})",
                             *k_si * *beside, value_text, low, high),
                 {}});
            return;
        }
        diagnostic d =
            make(severity::error, rules::coefficient_mismatch,
                 fmt::format("restated for coherent SI units the coefficient {} is {:.6g}, outside "
                             "the stated {} ({:.6g} to {:.6g})",
                             x.name, *k_si, value_text, low, high),
                 x.where);
        d.terms.push_back({x.where, x.name + "?", dim});
        d.notes.push_back({fmt::format("stated as {}", stated_text), stated_at});
        for (const auto& n : inferred.notes)
            if (n.message.starts_with("in coherent SI units") ||
                n.message.find(" holds only with ") != std::string::npos)
                d.notes.push_back(n);
        if (beside)
            d.notes.push_back({fmt::format("with the numbers beside it in its term folded in, it "
                                           "is {:.6g}, outside the statement too",
                                           *k_si * *beside),
                               {}});
        d.notes.push_back({"the coefficient, a unit of a symbol or the formula has changed since "
                           "it was reviewed, or the statement is wrong",
                           {}});
        out_.push_back(std::move(d));
    }

    // Not fixed by the formulas that settle it: say what they do fix, and what would fix it.
    // Columns marked in `disputed` belong to unknowns reported as in conflict; they have no
    // equations in `s` and are not counted.
    void free(std::uint32_t u, const solution& s, const std::vector<std::uint32_t>& members,
              const std::vector<bool>& disputed, std::size_t column) {
        const unknown& x = unknowns_[u];
        const std::size_t n = members.size();
        const auto open =
            static_cast<std::size_t>(std::count(disputed.begin(), disputed.end(), false));
        const std::size_t freedom = open - s.rank;
        // The coefficient matrix is the same in every base dimension, so an unknown is fixed in
        // all of them or in none: there is no "fixed in M and L, free in T" to report. What can
        // be said is which combinations of unknowns the formulas do fix.
        diagnostic d =
            make(severity::warning, rules::inferred_dimension,
                 fmt::format("the formulas leave the dimension of {} free ({} degree{} of freedom)",
                             who(x), freedom, freedom == 1 ? "" : "s"),
                 x.where);
        std::vector<group_variable> names;
        for (std::uint32_t m : members)
            names.push_back(
                {unknowns_[m].coefficient ? unknowns_[m].name + "?" : unknowns_[m].name, {}});
        std::size_t listed = 0;
        constexpr std::size_t max_listed = 3;
        for (std::size_t r = 0; r < s.reduced.rows(); ++r) {
            if (s.reduced.at(r, column).is_zero())
                continue;
            if (listed++ == max_listed)
                break;
            std::vector<rational> exponents(n);
            std::array<rational, base_dimension_count> rhs{};
            for (std::size_t c = 0; c < n; ++c)
                exponents[c] = s.reduced.at(r, c);
            for (std::size_t b = 0; b < base_dimension_count; ++b)
                rhs[b] = s.reduced.at(r, n + b);
            d.notes.push_back(
                {fmt::format("the formulas fix only '{}', as {}", group_formula(names, exponents),
                             describe(dimension::from_exponents(rhs))),
                 {}});
        }
        const bool lost = std::any_of(x.formulas.begin(), x.formulas.end(),
                                      [&](std::uint32_t f) { return overflowed_[f]; });
        if (lost)
            d.notes.push_back(
                {"a formula it stands in exceeds the exact range and is left out", {}});
        if (listed == 0 && !lost) {
            d.notes.push_back({"nothing in the formulas constrains it: it cancels out, or stands "
                               "where its dimension cannot be followed (under a variable "
                               "exponent, in an unknown function)",
                               {}});
        } else if (open > 1) {
            // Fixing the free columns of the reduced matrix fixes every pivot column.
            std::vector<bool> pivot(n, false);
            for (std::size_t r = 0; r < s.reduced.rows(); ++r)
                for (std::size_t c = 0; c < n; ++c)
                    if (!s.reduced.at(r, c).is_zero()) {
                        pivot[c] = true;
                        break;
                    }
            std::vector<std::string> free_names;
            for (std::size_t c = 0; c < n; ++c)
                if (!pivot[c] && !disputed[c])
                    free_names.push_back(fmt::format("'{}'", names[c].name));
            d.notes.push_back(
                {fmt::format("declaring the dimension of {} would fix the rest",
                             fmt::join(free_names, free_names.size() == 2 ? " and " : ", ")),
                 {}});
        }
        unchecked_statement(x, d);
        out_.push_back(std::move(d));
    }

    // A stated coefficient whose dimension is not settled: what was stated goes unchecked, and
    // the finding says so rather than letting the statement look satisfied.
    void unchecked_statement(const unknown& x, diagnostic& d) const {
        if (x.statement == syntax::no_index)
            return;
        const syntax::coefficient_statement& st = file_.coefficient_statements[x.statement];
        d.notes.push_back({fmt::format("what is stated for it, {}, cannot be checked until its "
                                       "dimension is settled",
                                       single_line(file_.source->text(st.range))),
                           {file_.source, st.range}});
    }

    void conflict(std::uint32_t u, const conflict_set& set, std::size_t column) {
        const unknown& x = unknowns_[u];
        diagnostic d =
            make(severity::error, rules::inference_conflict,
                 fmt::format("the formulas disagree about the dimension of {}", who(x)), x.where);
        constexpr std::size_t max_listed = 8;
        for (std::size_t i = 0; i < set.formulas.size() && i < max_listed; ++i) {
            const syntax::formula& f = formulas_[set.formulas[i]];
            const std::string name = formula_name(file_, f);
            std::string message;
            const line_column at = file_.source->position(f.range.begin);
            const std::optional<dimension>& alone = set.alone[i][column];
            const std::optional<dimension> others =
                set.each_settles ? set.without[i].values[column] : std::nullopt;
            if (set.on_its_own[i])
                message = fmt::format("{} cannot hold on its own, whatever dimensions its "
                                      "unknowns have",
                                      name);
            else if (alone && others)
                message = fmt::format("{} at {}:{} on its own makes {} {}; the other formulas "
                                      "make it {}",
                                      name, at.line, at.column, who(x), describe(*alone),
                                      describe(*others));
            else if (alone)
                message = fmt::format("{} at {}:{} on its own makes {} {}", name, at.line,
                                      at.column, who(x), describe(*alone));
            else if (others)
                message = fmt::format("{}: the other formulas make {} {}", name, who(x),
                                      describe(*others));
            else if (!set.searched)
                message = fmt::format("{} involves {}", name, who(x));
            else
                message = fmt::format("{} is one of the formulas that disagree", name);
            d.notes.push_back({std::move(message), {file_.source, f.range}});
        }
        if (set.formulas.size() > max_listed)
            d.notes.push_back(
                {fmt::format("and {} more formulas", set.formulas.size() - max_listed), {}});
        if (!set.each_settles)
            d.notes.push_back({set.searched ? "no one formula's removal settles it: these "
                                              "cannot all hold together"
                                            : "too many formulas are tangled here to find the "
                                              "few that disagree",
                               {}});
        unchecked_statement(x, d);
        out_.push_back(std::move(d));
    }

    void undecided(std::uint32_t u, const std::vector<std::string>& disputed) {
        const unknown& x = unknowns_[u];
        diagnostic d = make(severity::warning, rules::inferred_dimension,
                            fmt::format("the dimension of {} cannot be inferred while the "
                                        "formulas disagree about {}",
                                        who(x), fmt::join(disputed, ", ")),
                            x.where);
        unchecked_statement(x, d);
        out_.push_back(std::move(d));
    }

    void too_many(std::uint32_t u, std::size_t tied) {
        const unknown& x = unknowns_[u];
        diagnostic d =
            make(severity::warning, rules::inferred_dimension,
                 fmt::format("the dimension of {} is not inferred: the formulas tie it to {} other "
                             "unknowns, more than the {} that plumb solves together",
                             who(x), tied - 1, max_unknowns_solved_together),
                 x.where);
        d.notes.push_back({"the formulas that use it are not checked either; declare the "
                           "dimensions of some of these symbols, so that fewer are left to infer "
                           "together",
                           {}});
        unchecked_statement(x, d);
        out_.push_back(std::move(d));
    }

    void overflow(std::uint32_t u) {
        out_.push_back(make(severity::error, rules::overflow,
                            fmt::format("inferring the dimension of {} needs exponents beyond the "
                                        "exact range (64-bit numerator and denominator)",
                                        who(unknowns_[u])),
                            unknowns_[u].where));
    }

  private:
    const syntax::parsed_file& file_;
    std::span<const syntax::formula> formulas_;
    symbol_table& symbols_;
    const std::vector<unknown>& unknowns_;
    const std::vector<bool>& overflowed_; // per formula: left out of the equations
    std::vector<diagnostic>& out_;
    const coherent_units* restate_in_;
};

// Finding the formulas to blame solves the tangle once per formula, each solve costing about
// rows × columns² rational operations. Up to this many formulas the search always runs; beyond,
// only while the total stays within the budget (a fraction of a second); otherwise every
// formula involved is named.
constexpr std::size_t always_searched = 64;
constexpr double search_budget = 2e7;

struct component {
    std::vector<std::uint32_t> members; // unknowns, ascending
    std::vector<const equation*> equations;
    std::vector<std::uint32_t> formulas; // those with equations, ascending
};

// a \ b, both sorted.
std::vector<std::uint32_t> without_these(const std::vector<std::uint32_t>& a,
                                         const std::vector<std::uint32_t>& b) {
    std::vector<std::uint32_t> out;
    std::set_difference(a.begin(), a.end(), b.begin(), b.end(), std::back_inserter(out));
    return out;
}

// Finds a small set of formulas that disagree among the `active` ones (inconsistent): those
// whose removal alone restores agreement, or else a minimal set that cannot all hold (each
// member dropped in turn, kept out when the rest still disagree).
conflict_set find_conflict(const component& c, const std::vector<std::uint32_t>& column,
                           const std::vector<std::uint32_t>& active) {
    const std::size_t n = c.members.size();
    auto solve_only = [&](const std::vector<std::uint32_t>& these) {
        return solve(c.equations, column, n, without_these(c.formulas, these));
    };
    conflict_set set;
    const double columns = static_cast<double>(n + base_dimension_count);
    const double cost = static_cast<double>(active.size()) *
                        static_cast<double>(c.equations.size()) * columns * columns;
    if (active.size() > always_searched && cost > search_budget) {
        set.formulas = active;
        set.on_its_own.assign(active.size(), false);
        return set;
    }
    set.searched = true;
    for (std::uint32_t f : active) {
        try {
            solution s = solve_only(without_these(active, {f}));
            if (s.consistent) {
                set.formulas.push_back(f);
                set.without.push_back(std::move(s));
            }
        } catch (const arithmetic_overflow&) {
            // Too large to tell: this formula is simply not named as one to blame.
        }
    }
    set.each_settles = !set.formulas.empty();
    if (!set.each_settles) {
        std::vector<std::uint32_t> kept = active;
        for (std::uint32_t f : active) {
            std::vector<std::uint32_t> fewer = without_these(kept, {f});
            try {
                if (!solve_only(fewer).consistent)
                    kept = std::move(fewer);
            } catch (const arithmetic_overflow&) {
                // Keep it: the set stays one that disagrees, if not the smallest.
            }
        }
        set.formulas = std::move(kept);
    }
    for (std::uint32_t f : set.formulas) {
        bool alone = false;
        std::vector<std::optional<dimension>> values(n);
        try {
            solution s = solve_only({f});
            alone = !s.consistent;
            if (s.consistent)
                values = std::move(s.values);
        } catch (const arithmetic_overflow&) {
            alone = false;
        }
        set.on_its_own.push_back(alone);
        set.alone.push_back(std::move(values));
    }
    return set;
}

void settle(const component& c, const std::vector<unknown>& unknowns,
            std::vector<std::uint32_t>& column, reporter& report) {
    const std::size_t n = c.members.size();
    if (n > max_unknowns_solved_together) {
        for (const std::uint32_t u : c.members)
            report.too_many(u, n);
        return;
    }
    for (std::size_t i = 0; i < n; ++i)
        column[c.members[i]] = static_cast<std::uint32_t>(i);
    try {
        // Each round finds formulas that disagree; the unknowns they name are in dispute, and
        // every formula naming one of those leaves the active set: a value that leans on a
        // disputed unknown (Z = X*t while X is in dispute) would be as doubtful as it. What
        // remains is solved again, until it agrees.
        std::vector<std::uint32_t> active = c.formulas;
        std::vector<conflict_set> sets;
        std::vector<std::size_t> set_of(n, 0); // read only for disputed unknowns
        std::vector<bool> disputed(n, false);
        solution current = solve(c.equations, column, n, {});
        while (!current.consistent) {
            conflict_set set = find_conflict(c, column, active);
            std::vector<std::uint32_t> gone;
            for (std::size_t i = 0; i < n; ++i) {
                const auto& fs = unknowns[c.members[i]].formulas;
                if (disputed[i] ||
                    std::none_of(set.formulas.begin(), set.formulas.end(), [&](std::uint32_t f) {
                        return std::binary_search(fs.begin(), fs.end(), f);
                    }))
                    continue;
                disputed[i] = true;
                set_of[i] = sets.size();
                gone.insert(gone.end(), fs.begin(), fs.end());
            }
            sets.push_back(std::move(set));
            std::sort(gone.begin(), gone.end());
            active = without_these(active, gone);
            current = solve(c.equations, column, n, without_these(c.formulas, active));
        }
        std::vector<std::string> disputed_names;
        for (std::size_t i = 0; i < n && disputed_names.size() < 3; ++i)
            if (disputed[i])
                disputed_names.push_back(who(unknowns[c.members[i]]));
        for (std::size_t i = 0; i < n; ++i) {
            const auto& fs = unknowns[c.members[i]].formulas;
            const bool lost_some = std::any_of(fs.begin(), fs.end(), [&](std::uint32_t f) {
                return std::binary_search(c.formulas.begin(), c.formulas.end(), f) &&
                       !std::binary_search(active.begin(), active.end(), f);
            });
            if (disputed[i])
                report.conflict(c.members[i], sets[set_of[i]], i);
            else if (current.values[i])
                report.determined(c.members[i], *current.values[i]);
            else if (lost_some)
                report.undecided(c.members[i], disputed_names);
            else
                report.free(c.members[i], current, c.members, disputed, i);
        }
    } catch (const arithmetic_overflow&) {
        report.overflow(c.members.front());
    }
}

std::uint32_t find_root(std::vector<std::uint32_t>& parent, std::uint32_t x) {
    while (parent[x] != x) {
        parent[x] = parent[parent[x]];
        x = parent[x];
    }
    return x;
}

} // namespace

double coherent_coefficient(double k, double f_y,
                            std::span<const std::pair<double, rational>> factors_and_exponents) {
    double result = k * f_y;
    for (const auto& [factor, exponent] : factors_and_exponents)
        result *= std::pow(factor, -exponent.to_double());
    return result;
}

std::optional<coherent_units> coherent_units_from(const std::vector<std::string>& symbols,
                                                  std::string& why) {
    const std::size_t n = symbols.size();
    std::vector<std::array<rational, base_dimension_count>> exponents;
    std::vector<double> logs;
    std::array<bool, base_dimension_count> touched{};
    for (std::size_t i = 0; i < n; ++i) {
        const std::string& symbol = symbols[i];
        if (std::find(symbols.begin(), symbols.begin() + static_cast<std::ptrdiff_t>(i), symbol) !=
            symbols.begin() + static_cast<std::ptrdiff_t>(i)) {
            why = fmt::format("'{}' is named twice; give one unit per base dimension, such as "
                              "ft, lb, s",
                              symbol);
            return std::nullopt;
        }
        const auto unit = unit_table::standard().resolve(symbol);
        if (!unit) {
            why = fmt::format("'{}' is not a unit plumb knows", symbol);
            return std::nullopt;
        }
        if (unit->unit->scale == unit_scale::gauge) {
            why = fmt::format("'{}' is a gauge pressure, not a unit of a consistent set", symbol);
            return std::nullopt;
        }
        if (unit->unit->scale == unit_scale::offset) {
            why = fmt::format("'{}' reads from an arbitrary zero, so it is no unit of a consistent "
                              "set; name K or °R",
                              symbol);
            return std::nullopt;
        }
        exponents.push_back(unit->dim().exponents());
        logs.push_back(std::log(unit->factor()));
        for (std::size_t b = 0; b < base_dimension_count; ++b)
            touched[b] = touched[b] || !exponents.back()[b].is_zero();
    }
    std::vector<std::size_t> bases;
    for (std::size_t b = 0; b < base_dimension_count; ++b)
        if (touched[b])
            bases.push_back(b);
    rational_matrix m(n, bases.size());
    for (std::size_t r = 0; r < n; ++r)
        for (std::size_t c = 0; c < bases.size(); ++c)
            m.at(r, c) = exponents[r][bases[c]];
    if (n == 0 || bases.size() != n || matrix_rank(m) != n) {
        why = fmt::format("{} do not fix one unit for each base dimension they involve (give one "
                          "unit per base dimension, such as ft, lb, s or ft, lbf, s)",
                          fmt::join(symbols, ", "));
        return std::nullopt;
    }
    // Solve for the logarithms of the base factors: Gaussian elimination with partial pivoting
    // on a small, non-singular system (its rank was checked exactly above).
    // At most seven base dimensions (checked above: as many units as bases), so a fixed array.
    std::array<std::array<double, base_dimension_count + 1>, base_dimension_count> a{};
    for (std::size_t r = 0; r < n; ++r) {
        for (std::size_t c = 0; c < n; ++c)
            a[r][c] = exponents[r][bases[c]].to_double();
        a[r][base_dimension_count] = logs[r];
    }
    for (std::size_t c = 0; c < n; ++c) {
        std::size_t pivot = c;
        for (std::size_t r = c + 1; r < n; ++r)
            if (std::abs(a[r][c]) > std::abs(a[pivot][c]))
                pivot = r;
        std::swap(a[c], a[pivot]);
        for (std::size_t r = 0; r < n; ++r) {
            if (r == c)
                continue;
            const double f = a[r][c] / a[c][c];
            for (std::size_t k = c; k < n; ++k)
                a[r][k] -= f * a[c][k];
            a[r][base_dimension_count] -= f * a[c][base_dimension_count];
        }
    }
    coherent_units target;
    for (std::size_t c = 0; c < n; ++c)
        target.base_factor[bases[c]] = std::exp(a[c][base_dimension_count] / a[c][c]);
    target.label = fmt::format("{}", fmt::join(symbols, ", "));
    return target;
}

std::optional<std::string> restate_units_problem(const std::vector<std::string>& restate_in) {
    if (restate_in.empty())
        return std::nullopt;
    std::string why;
    if (!coherent_units_from(restate_in, why))
        return why;
    return std::nullopt;
}

void infer_dimensions(const syntax::parsed_file& file, std::span<const syntax::formula> formulas,
                      symbol_table& symbols, std::vector<diagnostic>& out,
                      const coherent_units* restate_in) {
    if (file.source == nullptr)
        return;
    equation_builder builder(file, symbols);
    std::vector<bool> overflowed(formulas.size(), false);
    for (std::uint32_t i = 0; i < formulas.size(); ++i) {
        const std::size_t before = builder.equations.size();
        try {
            builder.add_formula(i, formulas[i]);
        } catch (const arithmetic_overflow&) {
            builder.equations.erase(builder.equations.begin() + static_cast<std::ptrdiff_t>(before),
                                    builder.equations.end());
            overflowed[i] = true;
            // Worded as the checker words it, so that the two findings merge into one.
            out.push_back(make(severity::error, rules::overflow,
                               "the exponents in this formula exceed the exact range (64-bit "
                               "numerator and denominator)",
                               {file.source, formulas[i].range}));
        }
    }
    std::vector<unknown>& unknowns = builder.unknowns;

    // A `?` declaration of this file that no formula mentions (a dictionary, with no formulas,
    // is exempt, as it is from the unused-symbol warning).
    if (!formulas.empty()) {
        for (const auto& decl : file.declarations) {
            if (!decl.kind.to_infer)
                continue;
            for (std::uint32_t k = 0; k < decl.name_count; ++k) {
                const syntax::declared_name& dn = file.names[decl.first_name + k];
                const std::string_view name = file.source->text(dn.name);
                const symbol_entry* e = symbols.find(name);
                if (e == nullptr || !e->to_infer || e->declared_at.file != file.source ||
                    e->declared_at.range.begin != dn.name.begin || builder.by_symbol.contains(e))
                    continue;
                out.push_back(
                    make(severity::warning, rules::inferred_dimension,
                         fmt::format("'{}' is declared with ? but no formula uses it", name),
                         {file.source, dn.name}));
            }
        }
    }
    if (unknowns.empty())
        return;

    // Unknowns tied by an equation are solved together; the rest do not affect them, and a
    // disagreement stays within the tangle that holds it.
    std::vector<std::uint32_t> parent(unknowns.size());
    std::iota(parent.begin(), parent.end(), 0U);
    for (const equation& e : builder.equations)
        for (std::size_t i = 1; i < e.unknowns.size(); ++i)
            parent[find_root(parent, e.unknowns[i].first)] = find_root(parent, e.owner());
    std::vector<std::uint32_t> component_of(unknowns.size(), syntax::no_index);
    std::vector<component> components;
    for (std::uint32_t u = 0; u < unknowns.size(); ++u) {
        const std::uint32_t root = find_root(parent, u);
        if (component_of[root] == syntax::no_index) {
            component_of[root] = static_cast<std::uint32_t>(components.size());
            components.emplace_back();
        }
        components[component_of[root]].members.push_back(u);
    }
    for (const equation& e : builder.equations) {
        component& c = components[component_of[find_root(parent, e.owner())]];
        c.equations.push_back(&e);
        if (c.formulas.empty() || c.formulas.back() != e.formula)
            c.formulas.push_back(e.formula); // equations come in formula order
    }

    reporter report(file, formulas, symbols, unknowns, overflowed, out, restate_in);
    std::vector<std::uint32_t> column(unknowns.size(), 0);
    for (const component& c : components)
        settle(c, unknowns, column, report);
}

} // namespace plumb
