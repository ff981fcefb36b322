// Whether the terms of a meeting point agree in scale (mm beside m, kW beside W) once the
// numbers written into them are read as conversions.
#include "check/formula/checker.hpp"
#include "check/trade_constants.hpp"

#include <charconv>

namespace plumb::formula_check {

// A number as written, read as a double: "0.5886", "1055", "2.31".
double checker::written_number(span range) const {
    return std::strtod(std::string(text(range)).c_str(), nullptr);
}

// The SI value of "14.7 {psi}" or "{p_atm}".
double checker::quantity_si_value(const syntax::expr_node& n) const {
    const syntax::quantity_literal& q = file_.quantities[n.lhs];
    if (q.constant)
        return q.si_factor;
    const std::string_view t = text(n.range);
    const auto number = rational::parse(t.substr(0, t.find_first_of(" \t{")));
    return number ? number->to_double() * q.si_factor : 0.0;
}

// A side or term's units and numbers, for reconcile().
scaled_operand checker::scaled(const typed_term& t, bool as_number) const {
    static const rational one(1);
    if (as_number)
        return {1.0, &one, {}};
    return {t.scale, t.exact_scale ? &*t.exact_scale : nullptr,
            std::span<const scale_literal>(literals_.data() + t.literal_begin, t.literal_count)};
}

// A number that stands for a conversion, or a trade's conversion to three digits of the
// term's own quantity (is_three_digit_conversion_of).
bool checker::converts_in_term(const scale_literal& l, const typed_term& term,
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
bool checker::units_agree_with_plain_numbers(std::span<const operand> ops, double& unit) const {
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
                spare_time_ratio(number, op.type, op.node) || spare_speed_ratio(number, op.node) ||
                spare_degree_ratio(number, op.node))
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

// p_torr = p_mmHg: units defined apart that agree to within a part in a million (the torr,
// 101 325/760 Pa, and the mmHg, 133.322 387 Pa, 1.4e-7 apart; NIST SP 811 (2008), B.8) are one
// unit to any reading a calc holds. The US survey foot, 2e-6 from the foot, is not.
bool checker::units_agree_within_a_millionth(std::span<const operand> ops, double& unit) {
    double first = 0.0;
    for (const auto& op : ops) {
        if (!op.type.known || op.type.zero || !std::isfinite(op.type.scale))
            continue;
        if (op.type.numeric && !op.type.dim.is_dimensionless())
            continue; // a number in the others' unit
        const double s = op.type.numeric ? 1.0 : op.type.scale;
        if (first == 0.0)
            first = s;
        else if (std::abs(s / first - 1.0) > 1e-6)
            return false;
    }
    if (first == 0.0)
        return false;
    unit = first;
    return true;
}

// check_scales past its fast path, out of line so that the meeting points it settles do
// not pay for this one's frame.
bool checker::reconcile_scales(std::span<const operand> ops, meeting_point what, double& unit,
                               bool with_numbers) {
    if (with_numbers && units_agree_with_plain_numbers(ops, unit))
        return true;
    if (!with_numbers && units_agree_within_a_millionth(ops, unit))
        return true;
    return reconcile_in_full(ops, what, unit);
}

// The unit the sum being weighed must be in: the other side's, where the sum is a side, or
// what the other side leaves it once the side's other factors are taken out ("(b + z*y)*y" =
// A in m², asked only of an equation of two sides). Empty where neither is known.
std::optional<double> checker::unit_the_sum_needs() const {
    std::optional<double> scale;
    if (sum_side_hint_ != nullptr) {
        if (sum_side_hint_->known && sum_side_hint_->literal_count == 0)
            scale = sum_side_hint_->scale;
    } else if (sum_checked_ != syntax::no_index && side_hint_ != nullptr &&
               side_hint_node_ != syntax::no_index && current_ != nullptr &&
               current_->side_count == 2) {
        scale = scale_left_for_sum(side_hint_node_, *side_hint_, sum_checked_);
    }
    if (!scale || !std::isfinite(*scale) || !(*scale > 0))
        return std::nullopt;
    // "t = V/Q/60 + V/(ΔQ/1000)/60" in min: the 60 both terms carry is the sum's, taken out
    // of them, so the terms must be in the side's unit times it (here seconds).
    for (std::size_t k = sum_common_numbers_.first; k < sum_common_numbers_.second; ++k)
        *scale *= std::pow(common_numbers_[k].value, common_numbers_[k].exponent);
    return scale;
}

// "z_ft = z_m*3.281 + h_m": the terms agree without the 3.281 (both in m), but the sum is set
// equal to a side in ft, which the converted term is in: the conversion is needed, and the
// other term lacks it. Said so, rather than that the factor is not needed, whose advice
// would leave a length in m under ft.
bool checker::report_term_left_unconverted(std::span<const operand> ops,
                                           std::span<const std::size_t> index,
                                           std::span<const scaled_operand> parts) {
    const std::optional<double> side = unit_the_sum_needs();
    if (!side)
        return false;
    // Rounded conversions (3.281 for 3.28084) land within a few parts in ten thousand. So does
    // "1.488*m_lb" in kg/m beside "w_d*1000/{g_n}": 1.488 is lb/ft to kg/m, a ratio of
    // compound units the table of conversions does not hold, but it lands its term all the
    // same.
    const auto lands = [&](double scale) { return std::abs(scale / *side - 1.0) < 1e-3; };
    const auto in_side_unit = [&](std::size_t i) {
        return lands(apparent_scale(parts[i])) ||
               std::any_of(parts[i].literals.begin(), parts[i].literals.end(),
                           [&](const scale_literal& l) {
                               return lands(parts[i].scale / std::pow(l.value, l.exponent));
                           });
    };
    const auto converts = [&](std::size_t i) {
        return std::abs(apparent_scale(parts[i]) / parts[i].scale - 1.0) > 1e-9;
    };
    std::size_t converted = 0;
    if (in_side_unit(1) && !in_side_unit(0))
        converted = 1;
    else if (!(in_side_unit(0) && !in_side_unit(1)))
        return false;
    const std::size_t plain = 1 - converted;
    if (!converts(converted) || converts(plain))
        return false;
    const operand& odd = ops[index[plain]];
    const operand& reference = ops[index[converted]];
    diagnostic& d = report(
        rules::unit_scale,
        fmt::format("{} converts to the unit of {}, but {} beside it does not: as "
                    "written, {} counts {} times as much as it should in this sum",
                    quote(reference.node),
                    file_.functions == syntax::function_names::spreadsheet ? "its cell"
                                                                           : "the other side",
                    quote(odd.node), quote(odd.node), format_factor(*side / parts[plain].scale)),
        file_.nodes[odd.node].range);
    d.level = severity::warning;
    add_term(d, odd, true);
    add_term(d, reference);
    d.notes.push_back({fmt::format("multiply {} by {}, as the term beside it is", quote(odd.node),
                                   format_factor(parts[plain].scale / *side)),
                       {}});
    return true;
}

// reconcile_scales past its test of plain numbers, which most meeting points with numbers
// pass: out of line, so that those do not pay for this one's frame.
// "Δp = f*(L/(d/12))*ρ*v^2/(2*144)" in psi with ρ in lb/ft³: every number converts (in to
// ft, ft² to in²), and what is left is g_c = 32.174 lbm·ft/(lbf·s²), which a density in
// pounds of mass needs to give pounds of force (NIST SP 811 (2008), B.8: 1 lbf = 32.174 lb·ft/s²
// as g_n/0.3048 m). Said so, rather than that the numbers are coefficients, whose advice
// (divide by 386.089, 12 × 32.174) would leave the line 12 times too small.
bool checker::report_pound_mass_without_gc(const operand& op, const operand& reference,
                                           const scaled_operand& odd,
                                           const scaled_operand& in_unit) {
    // Every number taken as written, but a formula's own small whole number (v²/2).
    const auto with_numbers = [](const scaled_operand& p) {
        double s = p.scale;
        for (const auto& l : p.literals)
            if (!(l.value < 10.0 && l.value == std::round(l.value)))
                s /= std::pow(l.value, l.exponent);
        return s;
    };
    const double full = with_numbers(in_unit) / with_numbers(odd);
    constexpr double g_c = 9.80665 / 0.3048;
    const bool too_large = std::abs(full / g_c - 1.0) < 2e-3;
    if (!too_large && std::abs(full * g_c - 1.0) >= 2e-3)
        return false;
    const std::string units = units_in(op.node) + " " + units_in(reference.node);
    if (units.find("lb") == std::string::npos)
        return false;
    diagnostic& d = report(
        rules::unit_scale,
        fmt::format("as written, {} counts {} as much as {}: a mass in pounds needs g_c = "
                    "32.174 lbm\u00B7ft/(lbf\u00B7s\u00B2) to give pounds of force",
                    quote(op.node), too_large ? "32.174 times" : "1/32.174", quote(reference.node)),
        file_.nodes[op.node].range);
    d.level = severity::warning;
    add_term(d, op);
    add_term(d, reference);
    d.notes.push_back({fmt::format("{} {} by g_c, 32.174 (32.2 as the trades round it)",
                                   too_large ? "divide" : "multiply", quote(op.node)),
                       {}});
    return true;
}

bool checker::reconcile_in_full(std::span<const operand> ops, meeting_point what, double& unit) {
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
    if (r.agree && what.what.starts_with("terms") && parts.size() == 2 &&
        report_term_left_unconverted(ops, index, parts)) [[unlikely]]
        return false;
    if (r.agree) {
        unit = r.unit;
        // "LG = 62.4*Q/(0.075*V)" with both flows in ft³/min: the densities' ratio, no
        // conversion to weigh.
        // A power of ten beside them ("*1000") is one the units agree without: not read so.
        const auto no_power_of_ten = [&] {
            return std::none_of(parts.begin(), parts.end(), [](const scaled_operand& p) {
                return std::any_of(
                    p.literals.begin(), p.literals.end(),
                    [](const scale_literal& l) { return l.power_of_ten && l.value != 1.0; });
            });
        };
        if (parts.size() == 2 && dimensionless && no_power_of_ten() &&
            (densities_of_water_and_air(parts[0], parts[1], 1.0) ||
             densities_of_water_and_air(parts[1], parts[0], 1.0))) [[unlikely]]
            return true;
        if (!r.used_literals)
            return !report_unneeded_factor(ops, index, parts, dimensionless);
        if (parts.size() <= 16 && report_angle_conversion(ops, index, parts, false)) [[unlikely]]
            return false;
        if (parts.size() <= 4 && report_circle_left_out(ops, index, parts)) [[unlikely]]
            return false;
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
    if (parts.size() <= max_operands_for_flips && accept_operating_time(parts, unit)) [[unlikely]]
        return true;
    if (parts.size() <= max_operands_for_flips && report_angle_conversion(ops, index, parts, true))
        [[unlikely]]
        return false;
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
            if (report_two_of_two_pi_twice(ops[index[i]], parts[i].literals[k])) [[unlikely]]
                return false;
            report_inverted_factor(ops[index[i]], parts[i].literals[k]);
            return false;
        }
    if (parts.size() <= max_operands_for_flips && accept_trade_constant(parts, unit))
        return true;
    if (parts.size() <= max_operands_for_flips && report_inverted_trade_constant(ops, index, parts))
        return false;
    if (parts.size() == 2 && report_inverted_and_decade_short(ops, index, parts)) [[unlikely]]
        return false;
    // "P*d_pct + P_base" with d_pct in %: in a sum of two the term with the percentage is
    // the one off, whichever came first; and beside a bare number ("f*L/d_mm + 4") the
    // term with units, since the number is the formula's own.
    // In a dimensionless sum ("ε/(3.7*D) + 5.74/Re^0.9" with ε in mm and D in m), the
    // term whose units do not cancel is the one named, beside one whose units do; in any
    // sum of two, the term that mixes units of one kind (mm over in) beside one that does not.
    const auto cancels = [&](std::size_t i) {
        return std::abs(apparent_scale(parts[i]) - 1.0) < 1e-12;
    };
    if (what.what.starts_with("terms") && parts.size() == 2 &&
        ((holds_percentage(ops[index[r.reference]].node) &&
          !holds_percentage(ops[index[r.odd]].node)) ||
         (ops[index[r.odd]].type.numeric && !ops[index[r.reference]].type.numeric) ||
         (dimensionless && cancels(r.odd) && !cancels(r.reference) &&
          !holds_percentage(ops[index[r.reference]].node)) ||
         (!mixes_units_of_one_kind(ops[index[r.odd]].node) &&
          mixes_units_of_one_kind(ops[index[r.reference]].node))))
        std::swap(r.odd, r.reference);
    // "n*F_h*η_i >= F_req" with η_i in %: of two sides, the product with the percentage in it
    // is the one to take the 100, not the plain side beside it.
    if (what.what.starts_with("sides") && parts.size() == 2 &&
        holds_percentage(ops[index[r.reference]].node) &&
        !holds_percentage(ops[index[r.odd]].node) &&
        file_.nodes[syntax::inside_brackets(file_, ops[index[r.reference]].node)].kind !=
            expr_kind::symbol)
        std::swap(r.odd, r.reference);
    // "1/(C_w/S_s + 1 - C_w)" with C_w in %: beside unity the shares in % are the terms off,
    // however many of them there are; the 1 is the whole, not a percent.
    bool unity_beside_percent = false;
    if (what.what.starts_with("terms") && ops[index[r.odd]].type.numeric &&
        ops[index[r.odd]].type.value && *ops[index[r.odd]].type.value == rational(1) &&
        holds_percentage(ops[index[r.reference]].node)) {
        std::swap(r.odd, r.reference);
        unity_beside_percent = parts.size() > 2;
    }
    // "D_drum/d_r >= 18" with the drum in m and the rope in mm: the bare number is the
    // code's limit, and the ratio beside it is what to convert.
    if (what.what == "sides of this limit" && parts.size() == 2 && ops[index[r.odd]].type.numeric &&
        !ops[index[r.reference]].type.numeric)
        std::swap(r.odd, r.reference);
    // "w = q*s + g_sw" with w and g_sw in kN/m and q in Pa: the term in the other side's
    // unit is right, whichever came first.
    if (what.what.starts_with("terms") && parts.size() >= 2) [[unlikely]]
        if (const std::optional<double> side = unit_the_sum_needs()) {
            const auto in_side_unit = [&](std::size_t i) {
                return std::abs(apparent_scale(parts[i]) / *side - 1.0) < 1e-9;
            };
            if (in_side_unit(r.odd) && !in_side_unit(r.reference))
                std::swap(r.odd, r.reference);
        }
    const operand& op = ops[index[r.odd]];
    const operand& reference = ops[index[r.reference]];
    // What the numbers as written give: the conversion-like ones taken as conversions.
    double ratio = apparent_scale(parts[r.reference]) / apparent_scale(parts[r.odd]);
    std::optional<rational> exact_ratio = exact_product(apparent_exact_scale(parts[r.reference]),
                                                        apparent_exact_scale(parts[r.odd]), true);
    // "f = M*12/S" with M in kip·ft, S in in³ and f in psi: the 12 is no conversion by
    // itself but part of one, and the units are off by 1000, not 12000. Where taking some
    // of the other numbers in makes the ratio a clean power of ten, that is the ratio as
    // written, so that following the message fixes the formula.
    if (densities_of_water_and_air(parts[r.odd], parts[r.reference], ratio)) [[unlikely]] {
        unit = parts[r.reference].scale;
        return true;
    }
    const auto clean = ratio_with_numbers(parts[r.reference], parts[r.odd], ratio,
                                          holds_pi(reference.node), holds_pi(op.node));
    if (clean) {
        ratio = *clean;
        exact_ratio.reset();
    }
    if (report_pound_mass_without_gc(op, reference, parts[r.odd], parts[r.reference])) [[unlikely]]
        return false;
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
        !holds_pi(ops[index[r.odd]].node) && !holds_pi(ops[index[r.reference]].node)) [[unlikely]] {
        unit = parts[r.reference].scale;
        return true;
    }
    // Q = C·i·A in cfs from in/h and acres, the US rational method: 1 acre·in/h is
    // 43560/43200 = 1.0083 cfs, which the method leaves out by convention (common practice).
    if (std::abs(ratio * 121.0 / 120.0 - 1.0) < 1e-5 ||
        std::abs(ratio * 120.0 / 121.0 - 1.0) < 1e-5) {
        diagnostic& d =
            report(rules::trade_constant,
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
    // "Q*Δp/6356", "12/kWpt": a number that looks like no conversion is counted as a
    // coefficient; the finding says so, since it may be the conversion the engineer meant.
    std::string coefficients;
    std::size_t coefficient_count = 0;
    // The factor the one coefficient would have to be, were it the conversion.
    double needed = 0.0;
    double written = 0.0;
    double coefficient_exponent = 0.0;
    int coefficient_digits = 0;
    bool on_odd_side = false; // the one coefficient's
    std::optional<std::string> other_unit_note;
    // "60*W*L*c*ΔT/(h_fg*t)" into lb/h with t in min and h_fg in kJ/kg: the clock's 60 is
    // the conversion it was written as, and the factor advised (2.326) leaves it in, as the
    // workbook's checker does.
    const auto clock_ratio = [&](const scale_literal& l) {
        return is_time_ratio(l) && !looks_like_conversion(l, true) &&
               file_.nodes[l.node].kind == expr_kind::number;
    };
    // "q_gpm = q_L*42/1440" from bbl/d: 42 US gallons a barrel (NIST SP 811 (2008), B.8),
    // the conversion it is where the formula counts in both, whatever else is off.
    // The formula is searched once, at the first 42 met.
    std::optional<bool> counts_barrels_and_gallons;
    const auto gallons_a_barrel = [&](const scale_literal& l) {
        if (l.value != 42.0 || file_.nodes[l.node].kind != expr_kind::number)
            return false;
        if (counts_barrels_and_gallons)
            return *counts_barrels_and_gallons;
        if (current_ == nullptr) // an expression on its own: no formula to search
            return false;
        bool barrels = false;
        bool gallons = false;
        syntax::search_formula(file_, *current_, [&](std::uint32_t, const syntax::expr_node& n) {
            if (n.kind == expr_kind::symbol)
                if (const symbol_entry* e = symbols_.find(text(n.range)); e != nullptr) {
                    barrels = barrels || e->unit_text.find("bbl") != std::string_view::npos ||
                              e->unit_text.find("bpd") != std::string_view::npos ||
                              e->unit_text.find("BPD") != std::string_view::npos;
                    gallons = gallons || e->unit_text.find("gal") != std::string_view::npos ||
                              e->unit_text.find("gpm") != std::string_view::npos ||
                              e->unit_text.find("gph") != std::string_view::npos ||
                              e->unit_text.find("gpd") != std::string_view::npos;
                }
            return search_step::descend;
        });
        counts_barrels_and_gallons = barrels && gallons;
        return *counts_barrels_and_gallons;
    };
    // "m*v/(3600*pi*D_mm^2/4e6)": a circle's 4 folded into the 10⁶ of mm² to m², as the
    // scales' search reads it where the units agree; the factor advised keeps the 10⁶.
    const auto folded_power = [&](const scale_literal& l) {
        if (file_.nodes[l.node].kind != expr_kind::number || l.power_of_ten)
            return 0;
        const std::string_view written = text(file_.nodes[l.node].range);
        const std::size_t e = written.find_first_of("eE");
        if (e != 1 || written[0] < '2' || written[0] > '9')
            return 0;
        int power = 0;
        const auto [end, error] =
            std::from_chars(written.data() + e + 1, written.data() + written.size(), power);
        return error == std::errc() && end == written.data() + written.size() &&
                       std::abs(power) >= 2 && std::abs(power) <= 12
                   ? power
                   : 0;
    };
    if (!clean)
        for (const std::size_t side : {r.odd, r.reference})
            for (const scale_literal& l : parts[side].literals) {
                double f = 1.0;
                if (clock_ratio(l) || gallons_a_barrel(l))
                    f = std::pow(l.value, l.exponent);
                else if (const int power = folded_power(l); power != 0)
                    f = std::pow(10.0, power * l.exponent);
                if (f != 1.0) {
                    ratio = side == r.odd ? ratio * f : ratio / f;
                    exact_ratio.reset();
                }
            }
    const scale_literal* coefficient = nullptr;
    if (!clean) {
        for (const std::size_t side : {r.odd, r.reference})
            for (const scale_literal& l : parts[side].literals)
                if (l.value != 1.0 && !looks_like_conversion(l, true) && !clock_ratio(l) &&
                    !gallons_a_barrel(l) && file_.nodes[l.node].kind == expr_kind::number &&
                    significant_digits(text(file_.nodes[l.node].range)) >= 2 &&
                    coefficients.size() < 80) {
                    coefficients += fmt::format("{}{}", coefficients.empty() ? "" : ", ",
                                                text(file_.nodes[l.node].range));
                    ++coefficient_count;
                    written = l.value;
                    needed = side == r.odd ? 1.0 / ratio : ratio;
                    coefficient_exponent = l.exponent;
                    coefficient_digits = significant_digits(text(file_.nodes[l.node].range));
                    coefficient = &l;
                    on_odd_side = side == r.odd;
                }
        // "P_hp = T_e*v/33000" with v in m/s: the number is the conversion these units
        // need with one symbol in the other system's unit. It is counted as the conversion
        // it is, so that the factor advised keeps it.
        if (coefficient_count == 1 && std::abs(written / needed - 1.0) > 0.05) {
            double folded = 1.0;
            other_unit_note = coefficient_for_other_unit(on_odd_side ? op : reference,
                                                         on_odd_side ? reference : op, *coefficient,
                                                         needed, folded);
            if (other_unit_note) {
                // The conversion in the number, without the circle's 4/π it may fold in.
                const double as_factor =
                    std::pow(coefficient->value, coefficient->exponent) / folded;
                ratio = on_odd_side ? ratio * as_factor : ratio / as_factor;
                exact_ratio.reset();
            }
        }
        // "Q_s = Q_n/37.33" (Nm³/min into scfm): the number is the factor these units need,
        // within its rounding, applied the other way. 37.33 scf per Nm³ holds the two
        // reference temperatures as well as the units, so it is no ratio of table units, and
        // only here is it seen turned over.
        if (coefficient_count == 1 && std::abs(coefficient_exponent) == 1.0 &&
            std::abs(written * std::pow(needed, coefficient_exponent) - 1.0) <=
                std::max(2.0 * coefficient->tolerance, 1e-3)) {
            report_inverted_factor(on_odd_side ? op : reference, *coefficient);
            return false;
        }
    }
    const bool sides = what.what.starts_with("sides of");
    if (sides && inner_scale_ratio_ != 0.0 &&
        (std::abs(ratio / inner_scale_ratio_ - 1.0) < 1e-6 ||
         std::abs(ratio * inner_scale_ratio_ - 1.0) < 1e-6))
        return false;
    if (!sides)
        inner_scale_ratio_ = ratio;
    const std::optional<rational> exact_inverse = exact_product(rational(1), exact_ratio, true);
    // "P_ahp = Q_cfm*Δp_wg/3960": the pump trade's 3960 where a fan's 6356 belongs. Where
    // the one number printed as a conversion is within a factor of five of the one these
    // units need in its place (1714 and 600, 3960 and 6343), it may be either a coefficient
    // or the conversion meant; the finding is counted both ways, so that neither advice,
    // followed alone, leaves the other reading's slip.
    const double in_place = std::pow(needed, coefficient_exponent);
    const bool one_coefficient = !other_unit_note && coefficient_count == 1 &&
                                 std::isfinite(in_place) && in_place > 0 &&
                                 std::abs(coefficient_exponent) == 1.0;
    // Not the 384 of a beam's deflection 5·w·L⁴/(384·E·I) (and 185 and 192 for a propped or
    // fixed end; common practice), which is the formula's own, never a conversion mistaken.
    const bool formula_whole_number = written == 384.0 || written == 185.0 || written == 192.0;
    const bool in_place_offered = one_coefficient && std::abs(written / needed - 1.0) > 0.05 &&
                                  std::abs(std::log10(in_place / written)) <= std::log10(5.0) &&
                                  (written >= 10.0 || coefficient_digits >= 3) &&
                                  !formula_whole_number;
    // "I_in4 = I_cm4/2.54": a length's ratio where these units need its fourth power (cm⁴ to
    // in⁴ is 2.54⁴ = 41.6231, NIST SP 811 (2008), B.8). The power, or 0 where none fits.
    int power_of_ratio = 0;
    if (one_coefficient && coefficient_digits >= 3 && written > 1.0)
        for (const int k : {2, 3, 4})
            if (std::abs(in_place / std::pow(written, k) - 1.0) < 2e-3 * k)
                power_of_ratio = k;
    // "p_bar = 10*F_kN/A_cm2": a power of ten where these units need another one (1 kN/cm²
    // is 100 bar) is most likely the conversion mistaken, but may be a coefficient; the finding
    // is counted both ways, as for a trade's constant.
    const bool power_for_power =
        one_coefficient && written != in_place && near_power_of_ten(written, 1e-12) &&
        near_power_of_ten(in_place, 1e-9) && std::abs(std::log10(in_place / written)) > 0.5;
    // "E_in = E_l/25.4" (mm/d into in/yr), "W_lb = 8.34*Q*C" with Q in m³/d: the one number
    // is a conversion, or a trade's constant, of its own; taken as one, the units still need
    // another common factor (365 days a year; 3785.41 m³ per million US gallons, NIST SP 811
    // (2008), B.8). The finding is counted both ways, and the advice names that factor.
    // "P = Q_h*Δp/(10*η)" in kW from m³/h and mbar: a power of ten that converts (mbar·m³/s to
    // kW), with the hour's 3600 left out; taken as a coefficient, the advice to divide by 36000
    // would leave the line ten times too small.
    std::optional<double> also_needed;
    if (one_coefficient && coefficient != nullptr && !in_place_offered && power_of_ratio == 0 &&
        !power_for_power) {
        const double left = std::pow(written / in_place, coefficient_exponent);
        const double whole_left = left >= 1.0 ? left : 1.0 / left;
        if (coefficient_digits >= 3 && std::isfinite(whole_left)) {
            const std::optional<rational> printed = printed_power(*coefficient, 1.0);
            const bool conversion_itself =
                common_conversion(written, std::max(2.0 * coefficient->tolerance, 1e-4)) ||
                (printed && trade_constant_for(*printed) != nullptr);
            const double slack = std::max(3.0 * coefficient->tolerance, 2e-3);
            if (conversion_itself) {
                for (const double known :
                     {365.0, 365.25, 8760.0, 1000.0, 100.0, 1.0e6, 3785.41, 1440.0, 86400.0})
                    if (std::abs(whole_left / known - 1.0) <= slack)
                        also_needed = known;
                if (!also_needed)
                    if (const auto c = common_conversion(whole_left, slack); c && *c > 1.0)
                        also_needed = *c;
            }
        }
        if (!also_needed && coefficient->power_of_ten && written >= 10.0)
            for (const double clock : {60.0, 3600.0, 86400.0, 1440.0, 24.0})
                if (std::abs(whole_left / clock - 1.0) <= 1e-6)
                    also_needed = clock;
        if (also_needed && left < 1.0)
            also_needed = -*also_needed; // negative: multiply by it
    }
    const bool counted_both_ways = (in_place_offered && is_power_trade_constant(written)) ||
                                   power_of_ratio != 0 || power_for_power || also_needed;
    const std::string in_place_text =
        power_of_ratio != 0
            ? fmt::format("{}^{} ({})", coefficients, power_of_ratio, format_factor(in_place))
            : format_factor(in_place);
    std::string counted = fmt::format("{} times as much as {}", format_factor(exact_ratio, ratio),
                                      quote(reference.node));
    if (counted_both_ways)
        counted = fmt::format(
            "{} times as much as {} if {} was meant as the conversion, {} times as much if it is "
            "a coefficient",
            format_factor(std::pow(on_odd_side ? written / in_place : in_place / written,
                                   coefficient_exponent)),
            quote(reference.node), coefficients, format_factor(exact_ratio, ratio));
    std::string headline =
        fmt::format("as written, {} counts {}: the {} agree in dimension but not in unit",
                    quote(op.node), counted, what.name());
    // A warning: in a unit-aware calc the units convert themselves; where numbers are
    // put in as declared (spreadsheets, code), the result is off by the ratio.
    diagnostic& d = report(rules::unit_scale, std::move(headline), file_.nodes[op.node].range);
    d.level = severity::warning;
    add_term(d, op);
    add_term(d, reference);
    for (const operand* side : {&op, &reference}) {
        const std::string units = units_in(side->node);
        if (!units.empty())
            d.notes.push_back({fmt::format("in {}: {}", quote(side->node), units), {}});
    }
    // "u_fpm = 200*u" (m/s): a rule of thumb for 196.85. Taken as a coefficient, the
    // advice would multiply it by the conversion; say how far it is from the factor.
    const double off = written / in_place - 1.0;
    const bool near_the_factor =
        coefficient_count == 1 && std::isfinite(off) && std::abs(off) <= 0.05;
    if (near_the_factor)
        d.notes.push_back({fmt::format("{} is {:.2g} % {} {}, the factor these units need; if "
                                       "it was meant to convert them, write that factor",
                                       coefficients, std::abs(off) * 100.0,
                                       off > 0 ? "above" : "below", format_factor(in_place)),
                           {}});
    else if (other_unit_note)
        d.notes.push_back({std::move(*other_unit_note), {}});
    // "V_hL = 1.59*V_bb", "COP = 12/kWpt": a number within a factor of five of the one these
    // units need, printed as a conversion is, may be either, and the advice below gives both;
    // a formula's own 384 beside a 10, or its 0.75, is left a coefficient.
    else if (!coefficients.empty() && !counted_both_ways && !in_place_offered)
        d.notes.push_back({fmt::format("{} counted as a coefficient, not a unit conversion; if "
                                       "it was meant to convert units, it is not the factor "
                                       "these units need",
                                       coefficients),
                           {}});
    // "V_min = 0.9*Q_p/Z_s" (m³ from L/s over starts per hour): 0.9 is the 3.6 these units
    // need with a wet well's quarter cycle folded in (Q·T/4; common practice). Either reading
    // may be meant, so the warning stands and says both.
    if (std::optional<std::string> folded = folded_conversion_note(parts[r.odd], ratio))
        d.notes.push_back({std::move(*folded), {}});
    // "divide by 3.28084 (1/0.3048)" reads better as "multiply by 0.3048".
    bool multiply = ratio < 1;
    std::string factor =
        multiply ? format_factor(exact_inverse, 1.0 / ratio) : format_factor(exact_ratio, ratio);
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
    // "1/(C_w/S_s + 1 - C_w)": the share stands in more than one term; each takes the 100.
    if (unity_beside_percent)
        d.notes.push_back({"beside the 1, every share in % in this sum is off by 100: divide it "
                           "by 100 in each term it stands in",
                           {}});
    if (!state_note.empty())
        d.notes.push_back({std::move(state_note), {}});
    // "RH <= 0.6" with RH in %: a fraction's bound beside a percentage, or a bound of 0.6 %.
    if (what.what == "sides of this limit" && reference.type.numeric && holds_percentage(op.node)) {
        const std::string bound = display_text(file_.nodes[reference.node].range);
        d.notes.push_back({fmt::format("a bound up to 1 beside a percentage reads as a "
                                       "fraction: write {} for {} as a fraction, or {} {{%}} "
                                       "if {} % is meant",
                                       format_factor(reference.type.value
                                                         ? reference.type.value->to_double() * 100.0
                                                         : 100.0),
                                       bound, bound, bound),
                           {}});
        return false;
    }
    // "c_v = 3.154e7*c_v_lab" (cm²/s into m²/yr): 10001.3 is the 10⁴ of cm² to m² seen
    // through the rounded 3.154e7 s/yr; the power of ten is what the engineer left out.
    double rounding = 0.0;
    for (const std::size_t side : {r.odd, r.reference})
        for (const scale_literal& l : parts[side].literals)
            rounding += l.tolerance * std::abs(l.exponent);
    // So is the 59.9971 of "v_fpm = 3.281*v" the minute's 60.
    const double advised = multiply ? 1.0 / ratio : ratio;
    // Weighed as the whole number it may round, whichever way the advice went: "v_fpm/3.281"
    // into m/s is "divide by 60", not "multiply by 0.01666748".
    const double whole = ratio >= 1.0 ? ratio : 1.0 / ratio;
    std::optional<double> round_factor;
    if (rounding > 0.0 && near_power_of_ten(whole, rounding))
        round_factor = std::pow(10.0, std::round(std::log10(whole)));
    for (const double clock : {60.0, 3600.0, 86400.0, 24.0, 1440.0})
        if (rounding > 0.0 && std::abs(whole / clock - 1.0) <= rounding + 1e-9)
            round_factor = clock;
    if (round_factor)
        if (std::string power = format_factor(*round_factor); power != format_factor(whole)) {
            factor = fmt::format("{} ({} with the rounded numbers as written)", power,
                                 format_factor(whole));
            multiply = ratio < 1.0;
        }
    // "W_lbf = m_lb*{g_n}": the pound-force is a pound's weight at standard gravity (NIST SP
    // 811 (2008), B.8), so a mass in lb weighs the same number of lbf, and so a kg in kgf.
    if (std::abs(whole / 9.80665 - 1.0) < 1e-9 &&
        (holds_standard_gravity(op.node) || holds_standard_gravity(reference.node))) [[unlikely]]
        d.notes.push_back({"a pound-force is the weight of a pound at standard gravity (and a "
                           "kilogram-force a kilogram's): a mass in lb weighs the same number "
                           "of lbf, with g in the unit already; {g_n} turns a mass into a "
                           "force in N where the mass is in kg",
                           {}});
    // "σ_s <= 1.25 {ksi}" beside σ_s in MPa: a value typed with its unit reads right to a
    // person, but its number is not in the other side's; the cure is to type it in that unit.
    const syntax::expr_node& typed = file_.nodes[syntax::inside_brackets(file_, op.node)];
    const syntax::expr_node& plain = file_.nodes[syntax::inside_brackets(file_, reference.node)];
    const symbol_entry* plain_entry =
        plain.kind == expr_kind::symbol ? symbols_.find(text(plain.range)) : nullptr;
    if (typed.kind == expr_kind::quantity && !file_.quantities[typed.lhs].constant &&
        plain_entry != nullptr && !plain_entry->unit_text.empty() &&
        plain_entry->offset_unit == nullptr && plain_entry->si_factor > 0 &&
        std::isfinite(quantity_si_value(typed))) {
        d.notes.push_back(
            {fmt::format("type it in the unit of {}: {} {{{}}}", quote(reference.node),
                         format_factor(rounded_to_digits(
                             quantity_si_value(typed) / plain_entry->si_factor, 4)),
                         plain_entry->unit_text),
             {}});
        return false;
    }
    if (also_needed)
        d.notes.push_back(
            {fmt::format("{} is a conversion of its own; taken as one, the units need {} as well: "
                         "{} {} by {}; if it is a coefficient of the formula, {} it by {}",
                         coefficients, format_factor(std::abs(*also_needed)),
                         *also_needed < 0 ? "multiply" : "divide", quote(op.node),
                         format_factor(std::abs(*also_needed)), multiply ? "multiply" : "divide",
                         factor),
             {}});
    else if (counted_both_ways || in_place_offered)
        d.notes.push_back({fmt::format("if {} was meant as the conversion, write {} in its "
                                       "place; if it is a coefficient of the formula, {} {} by {}",
                                       coefficients, in_place_text,
                                       multiply ? "multiply" : "divide", quote(op.node), factor),
                           {}});
    // "E_lbh = 7938*E_kgs": 2.205 × 3600 for the 7936.64 these units need; multiplying the
    // term by the factor as well would leave it 7938 times too large.
    else if (near_the_factor)
        d.notes.push_back(
            {fmt::format("if {} is a coefficient of the formula and not the "
                         "conversion, {} {} by {}",
                         coefficients, multiply ? "multiply" : "divide", quote(op.node), factor),
             {}});
    else
        d.notes.push_back({fmt::format("{} {} by {} (declare the symbols in coherent units, or "
                                       "write the conversion factor into the formula)",
                                       multiply ? "multiply" : "divide", quote(op.node), factor),
                           {}});
    // "(P_ax/P_std_kip)^4", "(v_bw/v_t)^0.22": the units differ inside the power, where the
    // conversion belongs (4.44822 kN per kip, 3600 s per h); the factor outside is its power.
    if (const syntax::expr_node& power = file_.nodes[syntax::inside_brackets(file_, op.node)];
        power.kind == expr_kind::power && file_.nodes[power.rhs].kind == expr_kind::number) {
        const double exponent = written_number(file_.nodes[power.rhs].range);
        const double inside = std::pow(whole, 1.0 / std::abs(exponent));
        const bool divides = (ratio >= 1.0) == (exponent > 0);
        if (std::isfinite(inside) && std::abs(exponent) != 1.0 && exponent != 0.0 &&
            inside > 1.0 + 1e-6)
            d.notes.push_back(
                {fmt::format("the units differ inside the power: as written, {} counts {} times "
                             "as much as it should; convert there ({} it by {}), and the power "
                             "follows",
                             display_text(file_.nodes[power.lhs].range),
                             format_factor(divides ? inside : 1.0 / inside),
                             divides ? "divide" : "multiply", format_factor(inside)),
                 {}});
    }
    // "E_yr = E_d/1000" beside "d_w : d/yr": 365 counts every day of a year, but a rate kept
    // on working days counts those.
    if (std::abs(advised / 365.0 - 1.0) < 1e-3 || std::abs(advised / 365.25 - 1.0) < 1e-6)
        d.notes.push_back({days_a_year_note(), {}});
    // "Q_cf = M/(ρ*c/100)" from m³/d into m³/h beside "t_cf : h/d": a centrifuge that runs
    // 20 h a day takes its feed in those hours, not in 24.
    if (std::abs(advised / 24.0 - 1.0) < 1e-3)
        if (const std::optional<std::string_view> hours =
                declared_in_units({"h/d", "h/day", "hr/d", "hr/day"}))
            d.notes.push_back({fmt::format("24 counts every hour of the day; a plant that runs "
                                           "fewer hours a day takes their number, '{}'",
                                           *hours),
                               {}});
    return false;
}

// "V_min = 0.9*Q_p/Z_s": the one plain number of a term that is off by `ratio` may be the
// conversion these units need (1/ratio) with a half, a quarter, a double or a quadruple of
// the formula's own folded in (m·v²/2, Q·T/4, π·D²/4). The note that says so, if it is.
std::optional<std::string> checker::folded_conversion_note(const scaled_operand& odd,
                                                           double ratio) const {
    static constexpr std::array<double, 4> folded_parts{0.5, 0.25, 2.0, 4.0};
    const scale_literal* number = nullptr;
    for (const scale_literal& l : odd.literals) {
        if (file_.nodes[l.node].kind != expr_kind::number || looks_like_conversion(l, true))
            continue;
        if (number != nullptr || std::abs(l.exponent) != 1.0)
            return std::nullopt;
        number = &l;
    }
    if (number == nullptr)
        return std::nullopt;
    const double conversion = 1.0 / ratio;
    const double part = std::pow(number->value, number->exponent) / conversion;
    if (!std::isfinite(part) || !(part > 0) || near_power_of_ten(conversion, 1e-9) ||
        std::none_of(folded_parts.begin(), folded_parts.end(),
                     [&](double k) { return std::abs(part / k - 1.0) < 2e-3; }))
        return std::nullopt;
    return fmt::format("{} is {} times {}, the factor these units need: if it holds that "
                       "conversion with the formula's own {}, no factor is missing",
                       text(file_.nodes[number->node].range), format_factor(part),
                       format_factor(conversion), format_factor(part));
}

// "β_r = β*180/pi" with β in °, "β_r = β*pi/180*pi/180": π over 180 is the degree in radians
// (SI Brochure 9th ed., Table 8) and never a coefficient of a formula. A pair of them that the
// others reconcile without is the angle converted twice; one that reconciles only turned over
// is the conversion the wrong way round. Asked with `turned` where the scales disagree, and
// without it where they agree.
bool checker::report_angle_conversion(std::span<const operand> ops,
                                      std::span<const std::size_t> index,
                                      std::span<const scaled_operand> parts, bool turned) {
    constexpr std::size_t most_numbers = 8;
    for (std::size_t i = 0; i < parts.size(); ++i) {
        const std::span<const scale_literal> literals = parts[i].literals;
        if (literals.size() < 2 || literals.size() > most_numbers)
            continue;
        for (std::size_t p = 0; p < literals.size(); ++p) {
            if (file_.nodes[literals[p].node].kind != expr_kind::pi ||
                std::abs(literals[p].exponent) != 1.0)
                continue;
            for (std::size_t k = 0; k < literals.size(); ++k) {
                if (literals[k].value != 180.0 || literals[k].exponent != -literals[p].exponent ||
                    text(file_.nodes[literals[k].node].range) != "180")
                    continue;
                std::array<scale_literal, most_numbers> changed{};
                std::copy(literals.begin(), literals.end(), changed.begin());
                for (const std::size_t at : {p, k}) {
                    if (turned) {
                        changed[at].exponent = -changed[at].exponent;
                    } else {
                        read_as_quantity(changed[at]);
                        changed[at].power = 0;
                    }
                }
                std::vector<scaled_operand> trial(parts.begin(), parts.end());
                trial[i].literals = {changed.data(), literals.size()};
                if (!reconcile(trial).agree)
                    continue;
                const bool to_degrees = literals[p].exponent < 0;
                const std::string_view written = to_degrees ? "180/π" : "π/180";
                const operand& op = ops[index[i]];
                diagnostic& d = report(
                    rules::unit_scale,
                    turned ? fmt::format("the angle's conversion {} is the wrong way round: the "
                                         "units of {} need {}",
                                         written, quote(op.node), to_degrees ? "π/180" : "180/π")
                           : fmt::format("the angle's conversion {} is not needed: the units of {} "
                                         "already agree without it, so the angle is converted "
                                         "twice",
                                         written, quote(op.node)),
                    file_.nodes[literals[to_degrees ? k : p].node].range);
                add_term_and_units(d, op);
                d.notes.push_back(
                    {turned ? fmt::format("as written the result is {} times its true value",
                                          format_factor(std::pow(180.0 / std::numbers::pi,
                                                                 to_degrees ? 2.0 : -2.0)))
                            : std::string("a degree is π/180 rad: convert the angle once"),
                     {}});
                return true;
            }
        }
    }
    return false;
}

// "LG = 8.34*Q_gpm/(0.075*V_cfm)", a cooling tower's liquid-to-gas ratio: water's 8.34 lb/gal
// (or 62.4 lb/ft³) over standard air's 0.075 lb/ft³ (ASHRAE Fundamentals, ch. 18, the
// densities inside 500 and 1.08; common practice) turn a gallon against a cubic foot into
// pounds against pounds. Read as those densities in those units, where that is what the
// units lack, with a note.
bool checker::densities_of_water_and_air(const scaled_operand& odd, const scaled_operand& reference,
                                         double ratio) {
    struct typed_density {
        double least;
        double greatest;
        double si; // kg/m³ per unit (NIST SP 811 (2008), B.8)
        bool water;
    };
    static constexpr std::array<typed_density, 3> densities{{{8.33, 8.35, 119.8264, true},
                                                             {62.2, 62.5, 16.01846, true},
                                                             {0.0735, 0.0765, 16.01846, false}}};
    const auto read = [&](const scaled_operand& part, double& factor, int& waters, int& airs,
                          const scale_literal*& first) {
        for (const scale_literal& l : part.literals)
            for (const typed_density& t : densities)
                if (std::abs(l.exponent) == 1.0 && l.value >= t.least && l.value <= t.greatest) {
                    factor *= std::pow(t.si, l.exponent);
                    (t.water ? waters : airs) += l.exponent > 0 ? 1 : -1;
                    if (first == nullptr)
                        first = &l;
                }
    };
    double on_odd = 1.0;
    double on_reference = 1.0;
    int waters = 0;
    int airs = 0;
    const scale_literal* first = nullptr;
    read(odd, on_odd, waters, airs, first);
    int reference_waters = 0;
    int reference_airs = 0;
    read(reference, on_reference, reference_waters, reference_airs, first);
    // One density of each, one above the line and one below, on the same side.
    const bool on_odd_side =
        std::abs(waters) == 1 && waters == -airs && reference_waters == 0 && reference_airs == 0;
    const bool on_reference_side = std::abs(reference_waters) == 1 &&
                                   reference_waters == -reference_airs && waters == 0 && airs == 0;
    if (first == nullptr || !(on_odd_side || on_reference_side))
        return false;
    const double left = on_odd_side ? ratio / on_odd : ratio * on_reference;
    if (!(std::abs(left - 1.0) < 2e-3))
        return false;
    diagnostic& d = report(rules::trade_constant,
                           "the numbers are read as the densities of water and of standard air in "
                           "the units around them (8.34 lb/gal or 62.4 lb/ft\u00B3, 0.075 "
                           "lb/ft\u00B3): their ratio makes a ratio of volumes one of masses",
                           file_.nodes[first->node].range);
    d.level = severity::note;
    d.notes.push_back({"declare the two densities with their units to say so, the air's at the "
                       "site's altitude and temperature",
                       {}});
    return true;
}

// The numbers the pump, fan, drive and refrigeration trades print to turn their units of flow,
// pressure, torque and speed into horsepower, kilowatts or tons (Hydraulic Institute, AMCA,
// ASHRAE; common practice): gpm·ft/3960, gpm·psi/1714, cfm·in. w.g./6356, L/min·bar/600,
// m³/h·m/367, L/s·m/102, ft·lbf/min/33000, ft·lbf/s/550, lbf·ft·rpm/5252, lbf·in·rpm/63025,
// N·m·rpm/9549, Btu/h per hp 2545 and per kW 3412, 12000 Btu/h per ton, gpm per ft³/s 448.8.
// Each is a conversion for one set of units, and put beside another set it is the wrong
// conversion, not a coefficient of the formula.
bool checker::is_power_trade_constant(double written) {
    static constexpr std::array<double, 18> constants{
        3960.0, 1714.0,  6356.0, 6350.0, 600.0,  367.0,  102.0,  33000.0, 550.0,
        5252.0, 63025.0, 9549.0, 9550.0, 2545.0, 3412.0, 3413.0, 12000.0, 448.8};
    return std::any_of(constants.begin(), constants.end(),
                       [&](double c) { return std::abs(written / c - 1.0) < 1e-9; });
}

// The one symbol the file declares in one of `units` as written, where there is one.
std::optional<std::string_view>
checker::declared_in_units(std::initializer_list<std::string_view> units) const {
    for (const syntax::declaration& decl : file_.declarations) {
        const std::string_view unit = text(decl.spec);
        if (decl.name_count == 1 && std::find(units.begin(), units.end(), unit) != units.end())
            return text(file_.names[decl.first_name].name);
    }
    return std::nullopt;
}

// The days a year a rate runs: 365 for a calendar year, or the symbol the file declares in
// days a year, where it declares one.
std::string checker::days_a_year_note() const {
    if (const auto days = declared_in_units({"d/yr", "d/a", "day/yr", "days/yr", "d/y"}))
        return fmt::format("365 counts every day of the year; a rate that runs on fewer days "
                           "takes their number, '{}'",
                           *days);
    return "365 counts every day of the year; a rate that runs on fewer days takes their number";
}

// "0.5", "2", "4e3": one digit, as a formula's own numbers (½ρv², 2πr) are written, and
// no conversion is; not worth a note beside a finding.
int checker::significant_digits(std::string_view written) {
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

bool checker::near_power_of_ten(double v, double tolerance) {
    if (!(v > 0) || !std::isfinite(v))
        return false;
    const double k = std::round(std::log10(v));
    return k != 0.0 && std::abs(v / std::pow(10.0, k) - 1.0) <= tolerance + 1e-9;
}

std::optional<double> checker::ratio_with_numbers(const scaled_operand& reference,
                                                  const scaled_operand& odd, double ratio,
                                                  bool reference_holds_pi,
                                                  bool odd_holds_pi) const {
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
std::optional<double> checker::common_conversion(double v, double slack) {
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
std::optional<double> checker::ratio_with_folded_constant(const scaled_operand& reference,
                                                          const scaled_operand& odd,
                                                          double ratio) const {
    for (const auto* part : {&odd, &reference})
        for (const auto& l : part->literals) {
            // Written to three digits or more, as folded and trade constants are (0.1399,
            // 1714, 550): a 2 or a 0.95 is the formula's own.
            if (looks_like_conversion(l, true) || !(l.value > 0) || l.value == 1.0 ||
                significant_digits(text(file_.nodes[l.node].range)) < 3)
                continue;
            // 0.693 in t½ = 0.693·V/Q is ln 2, a half-life's own (common practice), never a
            // folded constant that would leave a power of ten for the gallons' 264.17.
            if (std::abs(l.value / std::numbers::ln2 - 1.0) < 1e-3)
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
                if (const auto folded = c.beside_pi ? std::nullopt : leaves(c.value);
                    folded && (digits_enough || near_power_of_ten(*folded, 0.0)))
                    return folded;
        }
    return std::nullopt;
}

// t = V/Q*24 with t in d and Q in m³/d: a ratio of time units (24 h/d, 60, 1440, 8760, 3.6)
// beside units that already agree, in a quantity that holds time. Without time in it (a
// count per day from a count per hour, both declared 1) the number may be the formula's.
// "I = 1.1*C_Ah/(H_h*60)": a term whose time cancels among its symbols (Ah over h) holds
// time too, in its units.
bool checker::spare_time_ratio(const scale_literal& l, const typed_term& t,
                               std::uint32_t term) const {
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
bool checker::names_a_time_unit(std::string_view unit) {
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
bool checker::time_ratio_number(const scale_literal& l) {
    if (std::abs(l.exponent) != 1.0)
        return false;
    // NIST SP 811 (2008), B.8: 1 d = 24 h = 1440 min = 86 400 s; 1 h = 60 min = 3600 s;
    // 3.6 for m³/h and L/s, km/h and m/s; 8760 h in a (365-day) year.
    static constexpr std::array<double, 7> ratios{24.0, 60.0, 1440.0, 3600.0, 86400.0, 8760.0, 3.6};
    return std::any_of(ratios.begin(), ratios.end(), [&](double r) { return l.value == r; });
}

// "d_r = 0.278*v*t_r" with v in m/s: km/h to m/s (1/3.6), mph to ft/s (1.467) or m/s
// (0.447), km to miles, written to three digits beside a speed whose units agree without
// it (NIST SP 811 (2008), B.8).
bool checker::spare_speed_ratio(const scale_literal& l, std::uint32_t term) const {
    if (std::abs(l.exponent) != 1.0 || !l.factor_like)
        return false;
    static constexpr std::array<double, 8> ratios{3.6,      1.0 / 3.6, 1.466667, 0.44704,
                                                  0.681818, 2.236936,  1.609344, 0.621371};
    if (std::none_of(ratios.begin(), ratios.end(),
                     [&](double r) { return std::abs(l.value / r - 1.0) <= l.tolerance + 1e-9; }))
        return false;
    return has_factor_of_dimension(term, velocity_dim, 0);
}

// "c_p = 4.187*1.8*c_p_us" from Btu/(lb·°F): 4.1868 kJ/(kg·K) holds the degree's 1.8
// already (NIST SP 811 (2008), B.8), and a 1.8 or a 5/9 beside it, where the units agree
// without it, converts the degree twice. Only beside a symbol or cell that carries a
// temperature: elsewhere 1.8 is as likely a coefficient.
bool checker::degree_ratio_beside_temperature(std::uint32_t term) const {
    const auto carries_temperature = [](const std::optional<dimension>& d) {
        return d && !d->exponent(base_dimension::temperature).is_zero();
    };
    return for_each_factor(term, [&](std::uint32_t at, int) {
        const syntax::expr_node& n = file_.nodes[at];
        if (n.kind == expr_kind::symbol) {
            const symbol_entry* e = symbols_.find(text(n.range));
            return e != nullptr && carries_temperature(e->dim);
        }
        return n.kind == expr_kind::reference && carries_temperature(file_.references[n.lhs].dim);
    });
}

// "v_fps = 0.3208*Q_gpm/d_in^2", "A_ft2 = D_in^2/144": a diameter squared where an area belongs,
// with a number that is only the units' conversion (0.3208 ft/s per gpm/in², 144 in² per ft²),
// leaves the circle's π/4 out: the area of a circle is π·d²/4, and the trade's 0.4085 and 576
// fold it in (common practice). Asked only where the units reconciled through the number and
// no π stands in the term; a warning, as a square's side squared is an area too.
bool checker::report_circle_left_out(std::span<const operand> ops,
                                     std::span<const std::size_t> index,
                                     std::span<const scaled_operand> parts) {
    for (std::size_t i = 0; i < parts.size(); ++i) {
        if (parts[i].literals.empty() || parts[i].literals.size() > 2)
            continue;
        std::uint32_t diameter = syntax::no_index;
        for_each_factor(ops[index[i]].node, [&](std::uint32_t at, int) {
            const syntax::expr_node& n = file_.nodes[at];
            if (n.kind != expr_kind::power || file_.nodes[n.rhs].kind != expr_kind::number ||
                text(file_.nodes[n.rhs].range) != "2")
                return false;
            const syntax::expr_node& base = file_.nodes[syntax::inside_brackets(file_, n.lhs)];
            if (base.kind != expr_kind::symbol)
                return false;
            const std::string_view name = text(base.range);
            const symbol_entry* e = symbols_.find(name);
            if (e == nullptr || !e->compact_dim || !(*e->compact_dim == length_dimension()))
                return false;
            const bool named = (name.starts_with("d") || name.starts_with("D")) &&
                               (name.size() == 1 || name[1] == '_' || name == "ID" || name == "OD");
            const bool described = e->description.find("diameter") != std::string_view::npos ||
                                   e->description.find("bore") != std::string_view::npos;
            if ((named || described) && e->description.find("side") == std::string_view::npos) {
                diameter = at;
                return true;
            }
            return false;
        });
        if (diameter == syntax::no_index || holds_pi(ops[index[i]].node))
            continue;
        // The diameter squared is the term's area: alone with its numbers (an area), or under
        // a flow (a velocity); beside any other quantity (ρ·N·D²/μ, c_v·t/d², a rope's K·d²·R)
        // the square is no area.
        int flows = 0;
        const bool other = for_each_factor(ops[index[i]].node, [&](std::uint32_t at, int sign) {
            const syntax::expr_node& n = file_.nodes[at];
            if (at == diameter || n.kind == expr_kind::number)
                return false;
            if (n.kind != expr_kind::symbol || sign < 0)
                return true;
            const symbol_entry* e = symbols_.find(text(n.range));
            if (e == nullptr || !e->compact_dim || !(*e->compact_dim == volume_flow_dim))
                return true;
            ++flows;
            return false;
        });
        if (other || flows > 1)
            continue;
        // Every number the term holds is a conversion of the units' (none a coefficient
        // the circle could hide in).
        const bool only_conversions = std::all_of(
            parts[i].literals.begin(), parts[i].literals.end(),
            [&](const scale_literal& l) { return file_.nodes[l.node].kind == expr_kind::number; });
        if (!only_conversions)
            continue;
        diagnostic& d = report(
            rules::unit_scale,
            fmt::format("{} stands where a circle's area belongs, and the numbers of {} only "
                        "convert its units: the area of a circle is \u03C0\u00B7d\u00B2/4, so "
                        "the result is off by 4/\u03C0 (1.27324)",
                        quote(diameter), quote(ops[index[i]].node)),
            file_.nodes[diameter].range);
        d.level = severity::warning;
        add_term(d, ops[index[i]], true);
        d.notes.push_back({"write pi*d^2/4 for the area, or fold 4/\u03C0 into the number (the "
                           "trade's 0.4085 for 0.3208, 576 for 144); a square's side squared is "
                           "an area as it is",
                           {}});
        return true;
    }
    return false;
}

} // namespace plumb::formula_check
