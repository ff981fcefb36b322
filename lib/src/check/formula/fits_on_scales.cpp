// Products that hold readings: a product multiplied out to name its readings, a percentage
// divided by 100, empirical fits written on a scale (a number over a sum of readings, a
// winding's inferred zero of resistance) and specific enthalpies reckoned from 0 °C.
#include "check/formula/checker.hpp"
#include "check/unit_counterparts.hpp"

namespace plumb::formula_check {

// The node multiplied out into numbers times declared symbols, or nothing where it holds
// anything else (a call, a power, a difference) or grows past a formula's size.
bool checker::expand(std::uint32_t i, expansion& out) const {
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
        for (std::size_t k = n.kind == expr_kind::subtract ? negated : first; k < out.size(); ++k)
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
void checker::sort_names(std::array<std::string_view, 6>& names, std::size_t size) {
    for (std::size_t a = 1; a < size && a < names.size(); ++a)
        for (std::size_t b = a; b > 0 && names[b] < names[b - 1]; --b)
            std::swap(names[b], names[b - 1]);
}

// The type of a factor of an expanded term: a declared symbol or a workbook's cell.
typed_term checker::expanded_factor_type(const syntax::expr_node& factor) {
    return factor.kind == expr_kind::reference ? eval_reference(factor) : eval_symbol(factor);
}

// Whether a reading joins those of a mean so far, on the same scale and unit; the first
// one sets them.
bool checker::joins_readings(std::optional<typed_term>& readings, const typed_term& s) {
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
bool checker::half_converted(const typed_term& t) {
    return t.known && t.offset != nullptr && t.offset->scale == unit_scale::offset &&
           t.dim == temperature_dimension() && std::isfinite(t.scale) &&
           std::abs(t.scale / t.offset->factor - 1.0) > 1e-6;
}

// True where the factor, made in `evaluated`, was read as a rise (the product so far may
// have been instead).
bool checker::settle_half_conversion(typed_term& result, const typed_term* factor,
                                     std::byte* evaluated) {
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
bool checker::from_inferred_zero_of_resistance(std::uint32_t node, bool numbers_only) const {
    node = syntax::inside_brackets(file_, node);
    const syntax::expr_node& n = file_.nodes[node];
    if (n.kind != expr_kind::add)
        return false;
    const std::uint32_t number = file_.nodes[n.lhs].kind == expr_kind::number ? n.lhs : n.rhs;
    const std::uint32_t reading = number == n.lhs ? n.rhs : n.lhs;
    if (file_.nodes[number].kind != expr_kind::number)
        return false;
    const std::string_view written = text(file_.nodes[number].range);
    if (!(written == "234.5" || written == "235" || written == "225" || written == "228"))
        return false;
    // The reference as a °C reading (20, 75), not one in kelvins (293).
    if (numbers_only)
        return file_.nodes[reading].kind == expr_kind::number &&
               written_number(file_.nodes[reading].range) <= 200.0;
    if (file_.nodes[reading].kind != expr_kind::symbol)
        return false;
    const symbol_entry* e = symbols_.find(text(file_.nodes[reading].range));
    return e != nullptr && is_celsius(e->offset_unit);
}

// "R_20*(234.5 + θ_c)/(234.5 + 20)": the reference's rise above the inferred zero typed in
// numbers, under a product that holds a reading's rise above it (IEC 60228, Annex B, from
// memory): the numbers are degrees as the reading's bracket is, and the ratio has none.
bool checker::reference_rise_from_inferred_zero(std::uint32_t numerator,
                                                std::uint32_t denominator) const {
    return from_inferred_zero_of_resistance(denominator, true) &&
           for_each_factor(numerator, [&](std::uint32_t at, int sign) {
               return sign > 0 && from_inferred_zero_of_resistance(at);
           });
}

bool checker::number_beside_one_cell(std::uint32_t node) const {
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
    if (v >= 100.0 && std::abs(v / std::pow(10.0, decade) - 1.0) < 1e-12)
        return false;
    // (B6/3.785)^1.85 with B6 in L/min, (C6/25.4)^4.87 with C6 in mm (Hazen-Williams's US form
    // fed from SI cells): the number takes the cell into the other system's unit (gpm, in;
    // NIST SP 811 (2008), B.8), which is no reference value in the cell's own unit either.
    const syntax::reference_value& cell =
        file_.references[file_.nodes[a == expr_kind::reference ? n.lhs : n.rhs].lhs];
    if (!cell.dim || cell.offset != nullptr || !(cell.scale > 0))
        return true;
    const std::optional<compact_dimension> dim = compact_dimension::fitted(*cell.dim);
    if (!dim)
        return true;
    // Over the number the cell counts in a unit v times its own; under it, 1/v times.
    const double other = a == expr_kind::reference ? cell.scale * v : cell.scale / v;
    for (const unit_counterpart& u : unit_counterparts(*dim, cell.scale).others)
        if (std::abs(other / u.si_scale - 1.0) < 2e-3)
            return false;
    return true;
}

// "21/(21 - O2)" with O2 in %, the excess-air ratio from the flue gas's oxygen (common
// practice): the number over the sum that reads it in the sum's unit is in that unit too.
// "1 - O2/21" with O2 in % (CO2 = CO2_max·(1 - O2/21), common practice): 21 is oxygen's
// share of dry air in %, so the quotient is a ratio of two percentages. And a number over
// a sum in % that the sum starts with ("21/(21 - O2)") is in % too, as is one among the
// product's factors (see carries_number_of_sum).
void checker::settle_percent_divisor(typed_term& result, const typed_term& factor,
                                     const syntax::expr_node& op) {
    // "(53 - C_v)/53" with C_v in % (Arterburn's solids correction, from memory): a sum
    // in % over the number it starts with is a ratio of two percentages too.
    if (factor.numeric && result.known && !result.numeric && result.scale == 0.01 &&
        result.dim.is_dimensionless() &&
        (oxygen_share_of_air(op.rhs) || same_number_over_its_sum(op.rhs, op.lhs))) {
        result.scale = 1.0;
        result.exact_scale = rational(1);
        // "(100 - y_CH4)/100*Q_p": the 100 below is a percentage too, not the conversion
        // from % that "x/100" holds, and no rule may count it as one a second time.
        const std::uint32_t divisor = syntax::inside_brackets(file_, op.rhs);
        for (std::size_t i = literals_.size(); i > 0; --i)
            if (literals_[i - 1].node == divisor) {
                read_as_quantity(literals_[i - 1]);
                break;
            }
        return;
    }
    if (factor.scale == 1.0 || factor.numeric || !factor.known || !factor.dim.is_dimensionless())
        return;
    if (result.numeric && same_number_over_its_sum(op.lhs, op.rhs)) {
        result.scale = factor.scale;
        result.exact_scale = factor.exact_scale;
    } else if (carries_number_of_sum(op.lhs, op.rhs)) {
        result.scale *= factor.scale;
        result.exact_scale = exact_product(result.exact_scale, factor.exact_scale, false);
        // "Q*(21 - 11)/(21 - O2_m)": a concentration's correction applied to a flow, which
        // corrects the other way so that the mass emitted stays as measured.
        // Only with a reference taken off above: 20.9/(20.9 - O2) alone is the dilution of a
        // stoichiometric flue gas by its excess air, right for a flow.
        const auto reference_above = [&] {
            return for_each_factor(op.lhs, [&](std::uint32_t at, int sign) {
                return sign > 0 &&
                       file_.nodes[syntax::inside_brackets(file_, at)].kind ==
                           expr_kind::subtract &&
                       number_leading_sum(at, true) != syntax::no_index;
            });
        };
        if (const std::uint32_t below = number_leading_sum(op.rhs, false);
            below != syntax::no_index && oxygen_share_of_air(below) &&
            has_factor_of_dimension(op.lhs, volume_flow_dim, 1) && reference_above()) [[unlikely]] {
            diagnostic& d = report(
                rules::unit_scale,
                fmt::format("{} corrects a flow to a reference oxygen as a concentration is "
                            "corrected: a flow takes the reciprocal, (21 - O2_measured)/(21 - "
                            "O2_ref), so that concentration times flow stays the mass emitted",
                            quote(op.lhs)),
                file_.nodes[op.rhs].range);
            d.level = severity::warning;
        }
    }
}

// "233.426 + t", "p_g + 92.1": a sum of a number and a symbol, in either order, as the
// number's node and the symbol's; empty for any other node. With `cells`, a workbook's cell
// ("=C63+99.8") stands where the symbol does.
std::optional<std::pair<std::uint32_t, std::uint32_t>>
checker::number_beside_symbol(std::uint32_t k, bool cells) const {
    const syntax::expr_node& n = file_.nodes[k];
    if (n.kind != expr_kind::add)
        return std::nullopt;
    const auto reading = [&](std::uint32_t at) {
        const expr_kind kind = file_.nodes[at].kind;
        return kind == expr_kind::symbol || (cells && kind == expr_kind::reference);
    };
    if (file_.nodes[n.lhs].kind == expr_kind::number && reading(n.rhs))
        return std::pair{n.lhs, n.rhs};
    if (file_.nodes[n.rhs].kind == expr_kind::number && reading(n.lhs))
        return std::pair{n.rhs, n.lhs};
    return std::nullopt;
}

// "1730.63/(233.426 + t)" with t in °C: Antoine's fit (and Magnus's) typed with bare
// constants, which are temperatures on the °C scale. Adding 273.15, as the gauge advice
// says, would break the fit; saying the constants' units is the cure.
void checker::note_bare_fit_on_scale(std::uint32_t denominator) {
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
bool checker::holds_symbol_in_unit(std::uint32_t node,
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
bool checker::in_circular_mils(std::uint32_t node) const {
    return holds_symbol_in_unit(node, {"cmil", "MCM"});
}

// 20.9 % or 21 % (20.95 % by volume, the US Standard Atmosphere's dry air, from memory).
bool checker::oxygen_share_of_air(std::uint32_t k) const {
    k = syntax::inside_brackets(file_, k);
    if (file_.nodes[k].kind != expr_kind::number)
        return false;
    const std::string_view written = text(file_.nodes[k].range);
    return written == "21" || written == "20.9" || written == "20.95" || written == "20.946";
}

// The number a sum starts with ("21" of 21 - O2), brackets aside; with `numbers_only`,
// only where all its terms are numbers. no_index for anything else.
std::uint32_t checker::number_leading_sum(std::uint32_t k, bool numbers_only) const {
    k = syntax::inside_brackets(file_, k);
    if (file_.nodes[k].kind != expr_kind::add && file_.nodes[k].kind != expr_kind::subtract)
        return syntax::no_index;
    while (file_.nodes[k].kind == expr_kind::add || file_.nodes[k].kind == expr_kind::subtract) {
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
bool checker::carries_number_of_sum(std::uint32_t numerator, std::uint32_t denominator) const {
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

// "C*(21 - O2)/(21 - 6)" with O2 in %: the correction to a reference oxygen upside down,
// the measured oxygen above and the reference below, where the codes write
// C·(21 - O2_ref)/(21 - O2_meas) (Directive 2010/75/EU, Annex VI; US EPA Method 19, from
// memory). Said as such, and the % settled as the right form settles it, so that no advice
// on the unit follows that would leave the correction upside down.
bool checker::report_oxygen_correction_upside_down(std::uint32_t numerator,
                                                   std::uint32_t denominator) {
    const std::uint32_t below = number_leading_sum(denominator, true);
    if (below == syntax::no_index || !oxygen_share_of_air(below))
        return false;
    const std::string_view share = text(file_.nodes[below].range);
    std::uint32_t measured = syntax::no_index;
    for_each_factor(numerator, [&](std::uint32_t at, int sign) {
        const std::uint32_t above = number_leading_sum(at, false);
        if (sign < 0 || above == syntax::no_index || text(file_.nodes[above].range) != share)
            return false;
        const syntax::expr_node& sum = file_.nodes[syntax::inside_brackets(file_, at)];
        if (sum.kind != expr_kind::subtract ||
            dimensionless_unit_size(sum.rhs) != std::optional<double>(0.01))
            return false;
        measured = at;
        return true;
    });
    if (measured == syntax::no_index)
        return false;
    // "Q_N*(21 - O2_m)/(21 - 11)": a flow corrects the other way round, so that concentration
    // times flow, the mass emitted, stays as measured (EN 15259, from memory). The form is
    // right there, and its % is settled as the concentration's is.
    if (has_factor_of_dimension(numerator, volume_flow_dim, 1))
        return true;
    const auto bracketed = [&](std::uint32_t k) {
        const std::string written = display_text(file_.nodes[k].range);
        return written.starts_with('(') ? written : "(" + written + ")";
    };
    const std::string above_text = bracketed(measured);
    const std::string below_text = bracketed(denominator);
    diagnostic& d = report(
        rules::unit_scale,
        fmt::format("the correction to a reference oxygen is upside down: {} holds the measured "
                    "oxygen and stands above, {} the reference and stands below",
                    above_text, below_text),
        file_.nodes[measured].range);
    d.level = severity::warning;
    d.notes.push_back({fmt::format("the codes correct to the reference oxygen by "
                                   "C*(21 - O2_ref)/(21 - O2_measured): write {} above and {} "
                                   "below",
                                   below_text, above_text),
                       {}});
    return true;
}

bool checker::same_number_over_its_sum(std::uint32_t numerator, std::uint32_t denominator) const {
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
bool checker::fitted_on_scale(std::uint32_t numerator, std::uint32_t denominator,
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
    const std::string_view name = text(file_.nodes[syntax::inside_brackets(file_, reading)].range);
    std::size_t readings = 0;
    std::uint32_t k = top_node;
    for (;;) {
        const syntax::expr_node& f = file_.nodes[k];
        const std::uint32_t factor =
            f.kind == expr_kind::multiply ? syntax::inside_brackets(file_, f.rhs) : k;
        const expr_kind kind = file_.nodes[factor].kind;
        if (kind == expr_kind::symbol || kind == expr_kind::reference || kind == expr_kind::add ||
            kind == expr_kind::subtract) {
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

// "R_20*(1 + α_R*(T_K - 20))": a coefficient per kelvin times a reading less the reference
// the coefficient was fitted at, as in a conductor's resistance R = R_20·(1 + α_20·(θ - 20))
// with θ in °C (IEC 60287-1-1, from memory). The reference is on the reading's scale: 20
// beside a kelvin reading counts from 20 K, and 293 beside a °C reading from 293 °C.
void checker::report_reference_on_other_scale(std::uint32_t difference) {
    difference = syntax::inside_brackets(file_, difference);
    const syntax::expr_node& n = file_.nodes[difference];
    if (n.kind != expr_kind::subtract || file_.nodes[n.lhs].kind != expr_kind::symbol ||
        file_.nodes[n.rhs].kind != expr_kind::number)
        return;
    const symbol_entry* e = symbols_.find(text(file_.nodes[n.lhs].range));
    if (e == nullptr)
        return;
    const double reference = written_number(file_.nodes[n.rhs].range);
    const unit_definition* scale = e->offset_unit;
    const bool kelvin = scale == nullptr && e->unit_text == "K";
    const bool celsius = is_celsius(scale);
    const std::string reading = quote(n.lhs);
    const std::string number = display_text(file_.nodes[n.rhs].range);
    if (kelvin && reference > 0.0 && reference < 200.0) {
        diagnostic& d = report(
            rules::offset_scale,
            fmt::format("{} is subtracted from {}, a reading in K, as a reference in °C: "
                        "the reference of a temperature correction is on the reading's scale, "
                        "so this counts from {} K ({} °C is {} K)",
                        number, reading, number, number, format_factor(reference + 273.15)),
            file_.nodes[difference].range);
        d.notes.push_back(
            {fmt::format("write the reading in °C, or subtract the reference "
                         "in kelvins ({} - {})",
                         text(file_.nodes[n.lhs].range), format_factor(reference + 273.15)),
             {}});
    } else if (celsius && reference >= 200.0 && reference <= 400.0) {
        diagnostic& d = report(
            rules::offset_scale,
            fmt::format("{} is subtracted from {}, a reading in °C, as a reference in K: "
                        "the reference of a temperature correction is on the reading's scale, "
                        "so this counts from {} °C ({} K is {} °C)",
                        number, reading, number, number, format_factor(reference - 273.15)),
            file_.nodes[difference].range);
        d.notes.push_back(
            {fmt::format("subtract the reference in °C ({} - {})", text(file_.nodes[n.lhs].range),
                         format_factor(reference - 273.15)),
             {}});
    }
}

// "17.269*T/(237.3 + T)" with T in K: the Magnus fit of saturation pressure (and Antoine's,
// Tetens') is made on the °C reading, its constant 230 to 245 °C (Alduchov and Eskridge
// 1996; ISO 13788, from memory); beside a kelvin reading the sum is some 273 K off.
void checker::report_celsius_fit_beside_kelvins(std::uint32_t denominator) {
    denominator = syntax::inside_brackets(file_, denominator);
    const auto parts = number_beside_symbol(denominator);
    if (!parts)
        return;
    const auto [number, reading] = *parts;
    const double constant = written_number(file_.nodes[number].range);
    const symbol_entry* e = symbols_.find(text(file_.nodes[reading].range));
    if (!(constant >= 200.0 && constant <= 260.0) || e == nullptr || e->offset_unit != nullptr ||
        e->unit_text != "K")
        return;
    diagnostic& d =
        report(rules::offset_scale,
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

// "17.625*t_F/(t_F + 243.04)" with t_F in °F: the Magnus fit's constants (230 to 260) are
// fitted to the °C reading; on the °F scale its shift is some 400 (237.3·1.8 + 32 = 459.1
// less the 32 carried above), so the fit holds on the scale it was written for alone.
void checker::report_celsius_fit_on_other_scale(std::uint32_t denominator,
                                                const unit_definition& scale) {
    denominator = syntax::inside_brackets(file_, denominator);
    const auto parts = number_beside_symbol(denominator);
    if (!parts)
        return;
    const auto [number, reading] = *parts;
    const double constant = written_number(file_.nodes[number].range);
    if (!(constant >= 230.0 && constant <= 260.0))
        return;
    diagnostic& d = report(
        rules::offset_scale,
        fmt::format("{} reads like a Magnus fit's constant, made for a \u00B0C reading, but {} "
                    "is in {}: the fit holds on the scale it was made on alone",
                    display_text(file_.nodes[number].range), quote(reading), scale.symbol),
        file_.nodes[denominator].range);
    d.level = severity::warning;
    const std::string_view name = text(file_.nodes[reading].range);
    const bool fahrenheit = std::abs(scale.factor * 1.8 - 1.0) < 1e-9;
    d.notes.push_back(
        {fahrenheit ? fmt::format("write the \u00B0C reading, ({} - 32)/1.8, wherever the fit "
                                  "takes the temperature",
                                  name)
                    : std::string("write the \u00B0C reading wherever the fit takes the "
                                  "temperature"),
         {}});
}

// "150 {psf} + 9000?*R/t_F" (ACI 347's wall pressure, T the concrete's °F reading): a
// coefficient marked `?` over a temperature reading is a fit made on that reading's scale,
// which the `?` declares empirical; its note says it holds only in the declared units.
// Not where a pressure stands above the reading: p·M/(R·T) is a gas law's density, whose
// T is absolute whatever constant is folded in (AP-42's loading loss 12.46·S·P·M/T in
// lb/10³ gal wants °R; EPA AP-42, 5th ed., section 5.2, from memory).
bool checker::empirical_over_reading(std::uint32_t numerator, const typed_term& below) const {
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
bool checker::holds_specific_energy_term(std::uint32_t root) const {
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

void checker::note_enthalpy_side(const operand& first, std::uint32_t root) {
    if (names_specific_enthalpy(first) && !holds_specific_energy_term(root))
        enthalpy_side_ = root;
}

// A side that is one symbol of specific energy named or described as an enthalpy.
bool checker::names_specific_enthalpy(const operand& side) const {
    if (!side.type.known || !(side.type.dim == velocity_squared_dim))
        return false;
    if (file_.nodes[side.node].kind == expr_kind::reference)
        return file_.references[file_.nodes[side.node].lhs].enthalpy;
    if (file_.nodes[side.node].kind != expr_kind::symbol)
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
bool checker::enthalpy_above_ice_point(std::uint32_t reading_node, const typed_term& reading,
                                       const typed_term& by) {
    if (!reading.known || reading.offset == nullptr || !by.known || by.numeric ||
        !(reading.dim == temperature_dimension()) ||
        std::abs(reading.offset->offset - 273.15) > 1e-9 || !(by.dim == specific_heat_dim))
        return false;
    // "c*(t_F - 32)": the rise above the ice point written out (a reading less any other
    // number is a difference already, and comes nowhere near here) needs no note.
    const syntax::expr_node& n = file_.nodes[syntax::inside_brackets(file_, reading_node)];
    if (n.kind == expr_kind::subtract &&
        file_.nodes[syntax::inside_brackets(file_, n.rhs)].kind == expr_kind::number)
        return true;
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

// "Pt500 resistance at 0 °C", "length at 0°C": a reference taken at the ice point (not at
// 10 or 20 °C).
bool checker::described_at_ice_point(std::string_view description) {
    for (const std::string_view mark : {"0 \u00B0C", "0\u00B0C"})
        for (std::size_t at = description.find(mark); at != std::string_view::npos;
             at = description.find(mark, at + 1))
            if (at == 0 || (std::isdigit(static_cast<unsigned char>(description[at - 1])) == 0 &&
                            description[at - 1] != '.' && description[at - 1] != ','))
                return true;
    return false;
}

// "R_0*(1 + A*t + B*t^2)" with t in °C and R_0 declared at 0 °C: the Callendar-Van Dusen
// equation of a platinum thermometer (IEC 60751, from memory), and any law X = X_0·(1 + α·t)
// whose reference is taken at 0 °C, counts t from 0 °C, so the °C reading there is its rise
// above the reference. Whether `reading_node` lies in such a bracket; a note says so once in
// each formula. R_20*(1 + α*t) stays an error: its t must be counted from 20 °C.
bool checker::reading_from_ice_point_reference(std::uint32_t reading_node) {
    const span at = file_.nodes[reading_node].range;
    // 1 + α·t: a bracketed sum, holding the reading, whose leading term is the number 1.
    const auto from_one = [&](const syntax::expr_node& g) {
        if (g.kind != expr_kind::group || at.begin < g.range.begin || at.end > g.range.end)
            return false;
        std::uint32_t lead = syntax::inside_brackets(file_, g.lhs);
        if (file_.nodes[lead].kind != expr_kind::add &&
            file_.nodes[lead].kind != expr_kind::subtract)
            return false;
        while (file_.nodes[lead].kind == expr_kind::add ||
               file_.nodes[lead].kind == expr_kind::subtract)
            lead = syntax::inside_brackets(file_, file_.nodes[lead].lhs);
        return file_.nodes[lead].kind == expr_kind::number && text(file_.nodes[lead].range) == "1";
    };
    std::optional<std::uint32_t> reference;
    bool fitted = false;
    visit_nodes([&](const syntax::expr_node& n) {
        if (reference)
            return;
        // "ν = 0.0178 {St}/(1 + 0.0337?*t + 0.000221?*t^2)": coefficients marked as fitted in
        // a bracket from 1 are a fit made on the scale the reading is in (Poiseuille's for
        // water's viscosity, as the handbooks print it; from memory).
        if (!fitted && from_one(n) &&
            syntax::search_subtree(file_, n.lhs, [](std::uint32_t, const syntax::expr_node& k) {
                return k.kind == expr_kind::inferred ? search_step::found : search_step::descend;
            }))
            fitted = true;
        if (n.kind != expr_kind::multiply)
            return;
        for (const auto& [symbol, bracket] : {std::pair{n.lhs, n.rhs}, std::pair{n.rhs, n.lhs}}) {
            const syntax::expr_node& s = file_.nodes[syntax::inside_brackets(file_, symbol)];
            if (s.kind != expr_kind::symbol || !from_one(file_.nodes[bracket]))
                continue;
            const symbol_entry* e = symbols_.find(text(s.range));
            if (e != nullptr && described_at_ice_point(e->description))
                reference = syntax::inside_brackets(file_, symbol);
        }
    });
    if (!reference && !fitted)
        return false;
    // Once for each formula, though its readings may be read more than once.
    std::string message =
        reference ? fmt::format("{} is read as the rise above 0 \u00B0C, the temperature {} is "
                                "taken at",
                                quote(reading_node), quote(*reference))
                  : fmt::format("{} is read as counted from 0 \u00B0C, in a fit whose "
                                "coefficients (marked ?) were made on the \u00B0C scale",
                                quote(reading_node));
    const std::uint32_t begins = file_.nodes[file_.sides[current_->first_side].root].range.begin;
    const std::size_t since = out_.size() > 8 ? out_.size() - 8 : 0;
    if (std::none_of(out_.begin() + static_cast<std::ptrdiff_t>(since), out_.end(),
                     [&](const diagnostic& d) {
                         return d.message == message && d.where.range.begin >= begins;
                     })) {
        diagnostic& d =
            report(rules::trade_constant, std::move(message), file_.nodes[reading_node].range);
        d.level = severity::note;
        d.notes.push_back({reference ? "write (t - 0 {\u00B0C}) to say so; a reference taken at "
                                       "another temperature needs the difference from it, "
                                       "(t - t_ref)"
                                     : "the fit holds only with the reading in \u00B0C, as "
                                       "published; write (t - 0 {\u00B0C}) to say so",
                           {}});
    }
    return true;
}

void checker::read_as_rise(typed_term& t) {
    t.offset = nullptr;
    t.point = false;
    t.origin = 0.0;
    t.origin_tolerance = 0.0;
}

// "R_2/R_1*(235 + θ_1) - 235" (IEC 60076-2's winding temperature from its resistance, from
// memory): the product is the rise above the conductor's inferred zero of resistance, and the
// same 235 taken off it again leaves a reading on the °C scale.
std::optional<typed_term> checker::eval_reading_from_inferred_zero(std::uint32_t index) {
    const syntax::expr_node& n = file_.nodes[index];
    const std::string_view zero = text(file_.nodes[n.rhs].range);
    if (zero != "235" && zero != "234.5" && zero != "225" && zero != "228")
        return std::nullopt;
    std::uint32_t bracket = syntax::no_index;
    for_each_factor(n.lhs, [&](std::uint32_t at, int sign) {
        if (sign > 0 && from_inferred_zero_of_resistance(at)) {
            const syntax::expr_node& sum = file_.nodes[syntax::inside_brackets(file_, at)];
            const std::uint32_t number =
                file_.nodes[sum.lhs].kind == expr_kind::number ? sum.lhs : sum.rhs;
            if (text(file_.nodes[number].range) == zero)
                bracket = syntax::inside_brackets(file_, at);
        }
        return bracket != syntax::no_index;
    });
    if (bracket == syntax::no_index)
        return std::nullopt;
    const syntax::expr_node& sum = file_.nodes[bracket];
    const std::uint32_t reading =
        file_.nodes[sum.lhs].kind == expr_kind::symbol ? sum.lhs : sum.rhs;
    const symbol_entry* e = symbols_.find(text(file_.nodes[reading].range));
    if (e == nullptr || e->offset_unit == nullptr)
        return std::nullopt;
    const std::size_t findings_before = out_.size();
    const std::size_t literal_base = literals_.size();
    typed_term rise = eval(n.lhs);
    cut_literals_to(literal_base);
    rise.literal_count = 0;
    if (!rise.known)
        return rise; // reported already
    if (!(rise.dim == temperature_dimension()) || rise.offset != nullptr) {
        out_.resize(findings_before); // the sum reads the product again, and says so
        return std::nullopt;
    }
    rise.offset = e->offset_unit;
    rise.origin = e->offset_unit->offset;
    rise.point = true;
    rise.numeric = false;
    rise.value.reset();
    return rise;
}

} // namespace plumb::formula_check
