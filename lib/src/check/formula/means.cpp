// Weighted and mixing means of readings: a mean of °C values stays a °C reading.
#include "check/formula/checker.hpp"

namespace plumb::formula_check {

std::optional<typed_term> checker::weighted_mean(std::uint32_t index) {
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
typed_term checker::eval_mix_or_sum(std::uint32_t index) {
    if (mixing_shape(file_.nodes[index]))
        if (const auto mean = mixing_mean(index))
            return *mean;
    return eval_sum(index);
}

bool checker::mixing_shape(const syntax::expr_node& n) const {
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
            if (file_.nodes[t.rhs].kind == expr_kind::group && one_less_weights(file_.nodes[t.rhs]))
                return true;
            term = t.lhs;
        }
    return false;
}

// "(1 - x)", "(1 - x - y)", "(100 - OA)": the rest of a whole after its other parts.
bool checker::one_less_weights(const syntax::expr_node& group) const {
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
std::optional<typed_term> checker::mixing_mean(std::uint32_t index) {
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

// "=SUMPRODUCT(C6:C9,D6:D9)/SUM(C6:C9)": a workbook's mean of readings (°C cells) weighted by
// another range, over the sum of those weights. Its weights sum to one, so the scale's zero
// cancels as in (q_h*T_h + q_c*T_c)/(q_h + q_c): the result is a reading on the same scale.
std::optional<typed_term> checker::sheet_weighted_mean(std::uint32_t index) {
    const syntax::expr_node& n = file_.nodes[index];
    const syntax::expr_node& top = file_.nodes[n.lhs];
    const syntax::expr_node& below = file_.nodes[syntax::inside_brackets(file_, n.rhs)];
    if (top.kind != expr_kind::call || top.rhs != 2 || below.kind != expr_kind::call ||
        below.rhs != 1 || text(call_name_range(top)) != "SUMPRODUCT" ||
        text(call_name_range(below)) != "SUM")
        return std::nullopt;
    const std::uint32_t weights = syntax::inside_brackets(file_, file_.call_args[below.lhs]);
    for (std::uint32_t i = 0; i < 2; ++i) {
        const std::uint32_t reading = syntax::inside_brackets(file_, file_.call_args[top.lhs + i]);
        const std::uint32_t weight =
            syntax::inside_brackets(file_, file_.call_args[top.lhs + 1 - i]);
        if (file_.nodes[reading].kind != expr_kind::reference ||
            file_.nodes[weight].kind != expr_kind::reference ||
            text(file_.nodes[weight].range) != text(file_.nodes[weights].range))
            continue;
        const syntax::reference_value& r = file_.references[file_.nodes[reading].lhs];
        const syntax::reference_value& w = file_.references[file_.nodes[weight].lhs];
        if (r.offset == nullptr || !r.dim || !w.dim || w.offset != nullptr)
            continue;
        return eval(reading);
    }
    return std::nullopt;
}

} // namespace plumb::formula_check
